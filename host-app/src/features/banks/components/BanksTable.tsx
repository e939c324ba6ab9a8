import type { BankDto, BankSort } from '@covalent/shared-types';
import { Badge, Flex, Link as ThemeLink, Table, Text } from '@radix-ui/themes';
import { Link } from 'react-router-dom';
import { routes } from '@/routes';
import { bankAccessLabel } from '../utils/bankAccessLabel';
import type { BankAction } from '../hooks/useBankActions';
import { BankRowActions } from './BankRowActions';
import { SortableHeader } from './SortableHeader';

export interface BanksTableProps {
  banks: BankDto[];
  sort: BankSort;
  dir: 'asc' | 'desc';
  onSort: (key: BankSort) => void;
  busyBankId?: string;
  onAction: (bank: BankDto, action: BankAction) => void;
}

const dateFormat = new Intl.DateTimeFormat(undefined, { day: 'numeric', month: 'short', year: 'numeric' });

/** The teacher's banks in the server's order; headers ask the server for another. */
export function BanksTable({ banks, sort, dir, onSort, busyBankId, onAction }: BanksTableProps) {
  return (
    <Table.Root variant="surface">
      <caption className="visually-hidden">Banks</caption>
      <Table.Header>
        <Table.Row>
          <SortableHeader label="Title" sortKey="title" activeKey={sort} dir={dir} onSort={onSort} />
          <Table.ColumnHeaderCell>Tags</Table.ColumnHeaderCell>
          <SortableHeader label="Items" sortKey="itemCount" activeKey={sort} dir={dir} onSort={onSort} />
          <SortableHeader label="Updated" sortKey="updatedAt" activeKey={sort} dir={dir} onSort={onSort} />
          <Table.ColumnHeaderCell>Owner</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>
            <span className="visually-hidden">Actions</span>
          </Table.ColumnHeaderCell>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {banks.map((bank) => (
          <Table.Row key={bank.id}>
            <Table.RowHeaderCell>
              <Flex direction="column" gap="1" align="start">
                <ThemeLink asChild weight="bold">
                  <Link to={routes.bank.build(bank.id)}>{bank.title}</Link>
                </ThemeLink>
                {bank.archivedAt && (
                  <Badge color="gray" variant="outline">
                    Archived
                  </Badge>
                )}
              </Flex>
            </Table.RowHeaderCell>
            <Table.Cell>
              <Flex gap="1" wrap="wrap">
                {bank.tags.map((tag) => (
                  <Badge key={tag} color="gray" variant="soft">
                    {tag}
                  </Badge>
                ))}
              </Flex>
            </Table.Cell>
            <Table.Cell>{bank.itemCount}</Table.Cell>
            <Table.Cell>
              <Text as="span" size="2">
                <time dateTime={bank.updatedAt}>{dateFormat.format(new Date(bank.updatedAt))}</time>
              </Text>
            </Table.Cell>
            <Table.Cell>
              <Badge color={bank.access === 'owner' ? 'teal' : 'gray'} variant="soft">
                {bankAccessLabel(bank)}
              </Badge>
            </Table.Cell>
            <Table.Cell>
              <BankRowActions bank={bank} busy={busyBankId === bank.id} onAction={(action) => onAction(bank, action)} />
            </Table.Cell>
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
