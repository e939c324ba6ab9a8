import { Button, Card, Flex } from '@radix-ui/themes';
import { useCurrentUser } from '@/features/auth/hooks/useCurrentUser';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { EmptyState } from '@/features/shell/components/EmptyState';
import { PageFallback } from '@/features/shell/components/PageFallback';
import { PageHeader } from '@/features/shell/components/PageHeader';
import { InviteTeacherForm } from '@/features/staff/components/InviteTeacherForm';
import { PlayerDataCard } from '@/features/staff/components/PlayerDataCard';
import { StaffTable } from '@/features/staff/components/StaffTable';
import { useStaff } from '@/features/staff/hooks/useStaff';

export function AdminStaffPage() {
  const me = useCurrentUser();
  const staff = useStaff();

  return (
    <Flex direction="column" gap="6">
      <PageHeader
        title="Staff"
        description={`Teachers and administrators of ${me.school.name}. A deactivated account cannot sign in; its classes and results are kept.`}
      />
      <Card size="3">
        <InviteTeacherForm />
      </Card>
      {staff.isPending && <PageFallback label="Loading staff…" />}
      {staff.isError && (
        <Flex direction="column" gap="3" align="start">
          <FormErrorCallout message={staff.error.message} />
          <Button variant="soft" onClick={() => void staff.refetch()}>
            Try again
          </Button>
        </Flex>
      )}
      {staff.isSuccess &&
        (staff.data.length === 0 ? (
          <EmptyState title="No staff yet">Invite a teacher to get started.</EmptyState>
        ) : (
          <StaffTable staff={staff.data} currentUserId={me.id} />
        ))}
      <PlayerDataCard />
    </Flex>
  );
}
