import { EmptyState } from '@/features/shell/components/EmptyState';
import { PageHeader } from '@/features/shell/components/PageHeader';

export function ClassesPage() {
  return (
    <>
      <PageHeader title="Classes" />
      <EmptyState title="No classes yet">Add a class to give students a place to join your review sessions.</EmptyState>
    </>
  );
}
