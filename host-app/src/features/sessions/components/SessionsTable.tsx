import type { SessionDto } from '@covalent/shared-types';
import { Badge, Button, Table } from '@radix-ui/themes';
import { Link } from 'react-router-dom';
import { routes } from '@/routes';
import { sessionSettingLabels as labels } from '../utils/sessionSettingLabels';

export interface SessionsTableProps {
  sessions: SessionDto[];
}

const dateFormat = new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeStyle: 'short' });

/** The teacher's sessions, with a way back onto the host screen of any that is still live. */
export function SessionsTable({ sessions }: SessionsTableProps) {
  return (
    <Table.Root variant="surface">
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Bank</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Class</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Format</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Status</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Join code</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Created</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>
            <span className="visually-hidden">Actions</span>
          </Table.ColumnHeaderCell>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {sessions.map((s) => {
          const live = s.status !== 'ended';
          return (
            <Table.Row key={s.id} align="center">
              <Table.RowHeaderCell>{s.bankTitle}</Table.RowHeaderCell>
              <Table.Cell>{s.className ?? 'Ad-hoc group'}</Table.Cell>
              <Table.Cell>
                {s.format} <span style={{ color: 'var(--gray-11)' }}>({labels.format[s.format].title})</span>
              </Table.Cell>
              <Table.Cell>
                <Badge color={live ? 'teal' : 'gray'} variant="soft">
                  {labels.status[s.status]}
                </Badge>
              </Table.Cell>
              <Table.Cell>{live ? <strong>{s.joinCode}</strong> : '—'}</Table.Cell>
              <Table.Cell>{dateFormat.format(new Date(s.createdAt))}</Table.Cell>
              <Table.Cell>
                {live ? (
                  <Button asChild size="2">
                    <Link to={routes.hostSession.build(s.id)} aria-label={`Open host screen for ${s.bankTitle}, code ${s.joinCode}`}>
                      Open host screen
                    </Link>
                  </Button>
                ) : (
                  <Button asChild size="2" variant="soft" color="gray">
                    <Link to={routes.debrief.build(s.id)}>Debrief</Link>
                  </Button>
                )}
              </Table.Cell>
            </Table.Row>
          );
        })}
      </Table.Body>
    </Table.Root>
  );
}
