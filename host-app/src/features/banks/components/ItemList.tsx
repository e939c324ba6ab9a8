import type { ItemDto } from '@covalent/shared-types';
import { Badge, Button, Card, Flex, Text } from '@radix-ui/themes';
import { useState } from 'react';
import { ConfirmButton } from '@/features/forms/components/ConfirmButton';
import { itemTypeLabels } from '../utils/itemTypeLabels';
import { moveInList } from '../utils/moveInList';

export interface ItemListProps {
  items: ItemDto[];
  canEdit: boolean;
  busy: boolean;
  onOpen: (item: ItemDto) => void;
  onReorder: (itemIds: string[]) => void;
  onDelete: (item: ItemDto) => void;
}

const short = (text: string, max = 90): string => (text.length > max ? `${text.slice(0, max - 1)}…` : text);

/** The bank's items in play order; Up/Down buttons move one place, announced to screen readers. */
export function ItemList({ items, canEdit, busy, onOpen, onReorder, onDelete }: ItemListProps) {
  const [announcement, setAnnouncement] = useState('');
  const move = (index: number, to: number) => {
    const ids = moveInList(items, index, to).map((i) => i.id);
    setAnnouncement(`Moved item “${short(items[index].prompt, 40)}” to position ${to + 1} of ${items.length}.`);
    onReorder(ids);
  };

  return (
    <>
      <p role="status" className="visually-hidden">
        {announcement}
      </p>
      <Flex asChild direction="column" gap="2">
        <ol className="plain-list" aria-label="Items">
          {items.map((item, i) => (
            <li key={item.id}>
              <Card size="1">
                <Flex gap="3" align="center" justify="between" wrap={{ initial: 'wrap', sm: 'nowrap' }}>
                  <Flex gap="3" align="center" className="grow-field">
                    <Text weight="bold" color="gray" aria-hidden="true" className="preview-letter">
                      {i + 1}.
                    </Text>
                    <Flex direction="column" gap="1" className="grow-field">
                      <Text>{short(item.prompt)}</Text>
                      <Flex gap="1" wrap="wrap">
                        <Badge variant="outline" color="gray">
                          {itemTypeLabels[item.type]}
                        </Badge>
                        {item.imageId && (
                          <Badge variant="outline" color="gray">
                            Image
                          </Badge>
                        )}
                        {item.tags.map((tag) => (
                          <Badge key={tag} variant="soft" color="gray">
                            {tag}
                          </Badge>
                        ))}
                      </Flex>
                    </Flex>
                  </Flex>
                  <Flex gap="2" align="center" flexShrink="0">
                    <Button size="1" variant="soft" aria-label={`${canEdit ? 'Edit' : 'View'} item ${i + 1}`} onClick={() => onOpen(item)}>
                      {canEdit ? 'Edit' : 'View'}
                    </Button>
                    {canEdit && (
                      <>
                        <Button size="1" variant="soft" color="gray" disabled={busy || i === 0} aria-label={`Move item ${i + 1} up`} onClick={() => move(i, i - 1)}>
                          Up
                        </Button>
                        <Button
                          size="1"
                          variant="soft"
                          color="gray"
                          disabled={busy || i === items.length - 1}
                          aria-label={`Move item ${i + 1} down`}
                          onClick={() => move(i, i + 1)}
                        >
                          Down
                        </Button>
                        <ConfirmButton
                          label="Delete"
                          ariaLabel={`Delete item ${i + 1}`}
                          disabled={busy}
                          title="Delete this item?"
                          description={`“${short(item.prompt, 120)}” will be removed from the bank. Past session results keep their copy.`}
                          confirmLabel="Delete item"
                          onConfirm={() => onDelete(item)}
                        />
                      </>
                    )}
                  </Flex>
                </Flex>
              </Card>
            </li>
          ))}
        </ol>
      </Flex>
    </>
  );
}
