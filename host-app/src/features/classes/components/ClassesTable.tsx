import type { ClassDto } from '@covalent/shared-types';
import { Badge, Flex, Link as ThemeLink, Table } from '@radix-ui/themes';
import { Link } from 'react-router-dom';
import { routes } from '@/routes';

export interface ClassesTableProps {
  classes: ClassDto[];
}

const accessLabel = (cls: ClassDto): string =>
  cls.access === 'owner' ? 'Yours' : cls.access === 'co-teacher' ? `Co-teaching with ${cls.ownerName}` : `${cls.ownerName}'s · school view`;

export function ClassesTable({ classes }: ClassesTableProps) {
  return (
    <Table.Root variant="surface">
      <caption className="visually-hidden">Classes</caption>
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Class</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Period</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Term</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Students</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Teacher</Table.ColumnHeaderCell>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {classes.map((cls) => (
          <Table.Row key={cls.id}>
            <Table.RowHeaderCell>
              <Flex gap="2" align="center" wrap="wrap">
                <ThemeLink asChild weight="bold">
                  <Link to={routes.classDetail.build(cls.id)}>{cls.name}</Link>
                </ThemeLink>
                {cls.archivedAt && (
                  <Badge color="gray" variant="outline">
                    Archived
                  </Badge>
                )}
              </Flex>
            </Table.RowHeaderCell>
            <Table.Cell>{cls.period || '—'}</Table.Cell>
            <Table.Cell>{cls.term || '—'}</Table.Cell>
            <Table.Cell>{cls.rosterCount}</Table.Cell>
            <Table.Cell>
              <Badge color={cls.access === 'owner' ? 'teal' : 'gray'} variant="soft">
                {accessLabel(cls)}
              </Badge>
            </Table.Cell>
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
