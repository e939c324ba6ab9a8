import { EmptyState } from '@/features/shell/components/EmptyState';
import { PageHeader } from '@/features/shell/components/PageHeader';

export function SessionsPage() {
  return (
    <>
      <PageHeader title="Sessions" />
      <EmptyState title="No sessions yet">Sessions you start or schedule will be listed here.</EmptyState>
    </>
  );
}
