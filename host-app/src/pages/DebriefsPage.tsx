import { EmptyState } from '@/features/shell/components/EmptyState';
import { PageHeader } from '@/features/shell/components/PageHeader';

export function DebriefsPage() {
  return (
    <>
      <PageHeader title="Debriefs" />
      <EmptyState title="No debriefs yet">After a session ends, its debrief appears here.</EmptyState>
    </>
  );
}
