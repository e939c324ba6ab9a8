import { TextField } from '@radix-ui/themes';
import { FieldFrame } from '@/features/forms/components/FieldFrame';
import type { ApiRequestError } from '@/api/client';
import type { RosterRowDraft } from '../utils/rosterEntryInput';
import { TimeMultiplierSelect } from './TimeMultiplierSelect';

export interface RosterRowFieldsProps {
  draft: RosterRowDraft;
  onChange: (draft: RosterRowDraft) => void;
  error: ApiRequestError | null;
}

/** The four fields of a roster entry, used for adding and for editing a row. */
export function RosterRowFields({ draft, onChange, error }: RosterRowFieldsProps) {
  const messages = (field: string) => error?.fieldMessages(field);
  return (
    <>
      <FieldFrame label="Display name" errors={messages('displayName')}>
        {(c) => <TextField.Root {...c} size="2" autoComplete="off" value={draft.displayName} onChange={(e) => onChange({ ...draft, displayName: e.target.value })} />}
      </FieldFrame>
      <FieldFrame label="Table group" errors={messages('tableGroup')}>
        {(c) => <TextField.Root {...c} size="2" value={draft.tableGroup} onChange={(e) => onChange({ ...draft, tableGroup: e.target.value })} />}
      </FieldFrame>
      <FieldFrame label="Seat number" errors={messages('seatNumber')}>
        {(c) => <TextField.Root {...c} size="2" inputMode="numeric" value={draft.seatNumber} onChange={(e) => onChange({ ...draft, seatNumber: e.target.value })} />}
      </FieldFrame>
      <FieldFrame label="Time multiplier" errors={messages('timeMultiplier')}>
        {(c) => <TimeMultiplierSelect {...c} value={draft.timeMultiplier} onChange={(timeMultiplier) => onChange({ ...draft, timeMultiplier })} />}
      </FieldFrame>
    </>
  );
}
