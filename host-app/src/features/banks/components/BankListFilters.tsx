import { Flex, Switch, Text, TextField } from '@radix-ui/themes';
import { useId } from 'react';

export interface BankListFiltersProps {
  search: string;
  tag: string;
  showArchived: boolean;
  onSearch: (value: string) => void;
  onTag: (value: string) => void;
  onShowArchived: (value: boolean) => void;
}

/** Search by title, filter by one tag, and include archived banks. */
export function BankListFilters({ search, tag, showArchived, onSearch, onTag, onShowArchived }: BankListFiltersProps) {
  const id = useId();
  return (
    <Flex gap="4" wrap="wrap" align="end" role="search" aria-label="Filter banks">
      <Flex direction="column" gap="1">
        <Text as="label" htmlFor={`${id}-q`} size="2" weight="bold">
          Search titles
        </Text>
        <TextField.Root id={`${id}-q`} type="search" size="3" value={search} onChange={(e) => onSearch(e.target.value)} />
      </Flex>
      <Flex direction="column" gap="1">
        <Text as="label" htmlFor={`${id}-tag`} size="2" weight="bold">
          Tag
        </Text>
        <TextField.Root id={`${id}-tag`} size="3" placeholder="e.g. safety" value={tag} onChange={(e) => onTag(e.target.value)} />
      </Flex>
      <Text as="label" size="2">
        <Flex gap="2" align="center" pb="2">
          <Switch checked={showArchived} onCheckedChange={onShowArchived} />
          Show archived banks
        </Flex>
      </Text>
    </Flex>
  );
}
