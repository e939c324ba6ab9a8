import { EmptyState } from '@/features/shell/components/EmptyState';
import { PageHeader } from '@/features/shell/components/PageHeader';

export function BanksPage() {
  return (
    <>
      <PageHeader title="Banks" />
      <EmptyState title="No banks yet">A bank holds review items on one topic. Banks you create will be listed here.</EmptyState>
    </>
  );
}
