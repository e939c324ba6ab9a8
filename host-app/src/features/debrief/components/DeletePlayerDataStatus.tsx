import type { DeletePlayerDataResponse } from '@covalent/shared-types';
import { Callout, Flex } from '@radix-ui/themes';
import type { UseMutationResult } from '@tanstack/react-query';
import { useEffect, useRef } from 'react';
import type { ApiRequestError } from '@/api/client';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { countText } from '@/features/forms/utils/countText';
import type { DeleteSessionPlayerDataInput } from '../hooks/useDeleteSessionPlayerData';

export interface DeletePlayerDataStatusProps {
  mutation: UseMutationResult<DeletePlayerDataResponse, ApiRequestError, DeleteSessionPlayerDataInput>;
}

/** What the last deletion from the students table did; kept out of print like the buttons. */
export function DeletePlayerDataStatus({ mutation }: DeletePlayerDataStatusProps) {
  const done = useRef<HTMLDivElement>(null);
  // After every render: once the refetched table has dropped the row (and the button that asked),
  // focus has fallen back to the page; it goes to what happened instead of being lost.
  useEffect(() => {
    if (mutation.isSuccess && document.activeElement === document.body) done.current?.focus();
  });
  if (!mutation.isSuccess && !mutation.isError) return null;
  return (
    <Flex direction="column" gap="3" mb="3" className="debrief-no-print">
      {mutation.isSuccess && (
        <Callout.Root ref={done} tabIndex={-1} role="status" color="green" variant="surface">
          <Callout.Text>
            Deleted {mutation.variables.name}'s data from this session: {countText(mutation.data.deletedResponses, 'response')}.
          </Callout.Text>
        </Callout.Root>
      )}
      <FormErrorCallout message={mutation.error?.message} />
    </Flex>
  );
}
