import type { ItemDto } from '@covalent/shared-types';
import { Button, Checkbox, Flex, Text } from '@radix-ui/themes';

export interface ItemPickerProps {
  items: ItemDto[];
  /** null: every item in bank order. */
  order: string[] | null;
  excluded: string[];
  onChange: (order: string[] | null, excluded: string[]) => void;
  error?: string;
}

function move<T>(list: T[], from: number, to: number): T[] {
  const next = [...list];
  const [moved] = next.splice(from, 1);
  next.splice(to, 0, moved!);
  return next;
}

/** Plays the whole bank by default; the teacher may leave items out and change their order. */
export function ItemPicker({ items, order, excluded, onChange, error }: ItemPickerProps) {
  const byId = new Map(items.map((item) => [item.id, item]));
  const custom = order !== null;

  return (
    <Flex direction="column" gap="3">
      <Text as="label" size="2">
        <Flex gap="2" align="center">
          <Checkbox checked={custom} onCheckedChange={(on) => onChange(on === true ? items.map((i) => i.id) : null, [])} />
          Choose and order the items myself
        </Flex>
      </Text>
      {!custom && (
        <Text size="2" color="gray">
          All {items.length} items, in the bank’s order.
        </Text>
      )}
      {custom && (
        <ol className="setup-item-list" aria-label="Items to play">
          {order.map((id, index) => {
            const item = byId.get(id);
            if (!item) return null;
            const included = !excluded.includes(id);
            const n = index + 1;
            return (
              <li key={id}>
                <Flex gap="3" align="center" py="1">
                  <Text as="label" size="2" style={{ flex: 1 }}>
                    <Flex gap="2" align="center">
                      <Checkbox
                        checked={included}
                        onCheckedChange={(on) => onChange(order, on === true ? excluded.filter((x) => x !== id) : [...excluded, id])}
                      />
                      <span>
                        {n}. {item.prompt}
                      </span>
                    </Flex>
                  </Text>
                  <Button
                    type="button"
                    size="1"
                    variant="soft"
                    color="gray"
                    disabled={index === 0}
                    aria-label={`Move item ${n} up`}
                    onClick={() => onChange(move(order, index, index - 1), excluded)}
                  >
                    Up
                  </Button>
                  <Button
                    type="button"
                    size="1"
                    variant="soft"
                    color="gray"
                    disabled={index === order.length - 1}
                    aria-label={`Move item ${n} down`}
                    onClick={() => onChange(move(order, index, index + 1), excluded)}
                  >
                    Down
                  </Button>
                </Flex>
              </li>
            );
          })}
        </ol>
      )}
      {error && (
        <Text size="2" color="red" role="alert">
          {error}
        </Text>
      )}
    </Flex>
  );
}
