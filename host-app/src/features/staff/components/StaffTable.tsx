import type { StaffUserDto } from '@covalent/shared-types';
import { Badge, Button, Table } from '@radix-ui/themes';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { useSetStaffActive } from '../hooks/useSetStaffActive';
import { staffStatus, type StaffStatus } from '../utils/staffStatus';

export interface StaffTableProps {
  staff: StaffUserDto[];
  /** The signed-in admin, who cannot deactivate themself. */
  currentUserId: string;
}

const STATUS_LABEL: Record<StaffStatus, { text: string; color: 'teal' | 'amber' | 'gray' }> = {
  active: { text: 'Active', color: 'teal' },
  invited: { text: 'Invited', color: 'amber' },
  deactivated: { text: 'Deactivated', color: 'gray' },
};

export function StaffTable({ staff, currentUserId }: StaffTableProps) {
  const setActive = useSetStaffActive();
  const busyId = setActive.isPending ? setActive.variables?.userId : undefined;

  return (
    <>
      <FormErrorCallout message={setActive.error?.message} />
      <Table.Root variant="surface">
        <Table.Header>
          <Table.Row>
            <Table.ColumnHeaderCell>Name</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>E-mail</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Role</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Status</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>
              <span className="visually-hidden">Actions</span>
            </Table.ColumnHeaderCell>
          </Table.Row>
        </Table.Header>
        <Table.Body>
          {staff.map((user) => {
            const status = STATUS_LABEL[staffStatus(user)];
            return (
              <Table.Row key={user.id}>
                <Table.RowHeaderCell>{user.displayName}</Table.RowHeaderCell>
                <Table.Cell>{user.email}</Table.Cell>
                <Table.Cell>{user.role === 'admin' ? 'Administrator' : 'Teacher'}</Table.Cell>
                <Table.Cell>
                  {/* The word carries the meaning; the colour only repeats it. */}
                  <Badge color={status.color} variant="soft">
                    {status.text}
                  </Badge>
                </Table.Cell>
                <Table.Cell>
                  {user.id !== currentUserId && (
                    <Button
                      size="2"
                      variant="soft"
                      color={user.active ? 'gray' : 'teal'}
                      loading={busyId === user.id}
                      disabled={setActive.isPending}
                      aria-label={`${user.active ? 'Deactivate' : 'Reactivate'} ${user.displayName}`}
                      onClick={() => setActive.mutate({ userId: user.id, active: !user.active })}
                    >
                      {user.active ? 'Deactivate' : 'Reactivate'}
                    </Button>
                  )}
                </Table.Cell>
              </Table.Row>
            );
          })}
        </Table.Body>
      </Table.Root>
    </>
  );
}
