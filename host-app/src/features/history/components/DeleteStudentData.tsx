import type { StudentHistoryDto } from '@covalent/shared-types';
import { Callout, Flex, Text } from '@radix-ui/themes';
import { ConfirmButton } from '@/features/forms/components/ConfirmButton';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { countText } from '@/features/forms/utils/countText';
import { useDeleteStudentData } from '../hooks/useDeleteStudentData';

export interface DeleteStudentDataProps {
  history: Pick<StudentHistoryDto, 'classId' | 'rosterEntryId' | 'displayName' | 'canDeleteData'>;
}

/** The class's owner deletes a student's data on request (DESIGN.md §9: deletion is real). Never printed. */
export function DeleteStudentData({ history }: DeleteStudentDataProps) {
  const remove = useDeleteStudentData(history.classId, history.rosterEntryId);
  const name = history.displayName;

  return (
    <Flex direction="column" gap="3" align="start" className="debrief-no-print">
      {history.canDeleteData ? (
        <ConfirmButton
          danger
          label="Delete this student's data"
          title={`Delete ${name}'s data?`}
          description={`Their answers in every session of this class and their catch-up cards are deleted. Their name stays on the class list, and the debriefs count them as removed. This cannot be undone.`}
          confirmLabel="Delete data"
          disabled={remove.isPending}
          onConfirm={() => remove.mutate()}
        />
      ) : (
        <Text as="p" size="2" color="gray">
          Only the class's owner can delete a student's data.
        </Text>
      )}
      {remove.isSuccess && (
        <Callout.Root role="status" color="green" variant="surface">
          <Callout.Text>
            Deleted {name}'s data: {countText(remove.data.deletedResponses, 'response')}.
          </Callout.Text>
        </Callout.Root>
      )}
      <FormErrorCallout message={remove.error?.message} />
    </Flex>
  );
}
