import { Flex } from '@radix-ui/themes';
import { DebriefsTable } from '@/features/debrief/components/DebriefsTable';
import { useDebriefs } from '@/features/debrief/hooks/useDebriefs';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { EmptyState } from '@/features/shell/components/EmptyState';
import { PageFallback } from '@/features/shell/components/PageFallback';
import { PageHeader } from '@/features/shell/components/PageHeader';

export function DebriefsPage() {
  const debriefs = useDebriefs();
  return (
    <>
      <PageHeader title="Debriefs" description="Ended sessions: item analysis, student results and exports." />
      <Flex direction="column" gap="4">
        <FormErrorCallout message={debriefs.error?.message} />
        {debriefs.isPending ? (
          <PageFallback label="Loading debriefs…" />
        ) : debriefs.data && debriefs.data.length > 0 ? (
          <DebriefsTable debriefs={debriefs.data} />
        ) : (
          !debriefs.isError && <EmptyState title="No debriefs yet">After a session ends, its debrief appears here.</EmptyState>
        )}
      </Flex>
    </>
  );
}
