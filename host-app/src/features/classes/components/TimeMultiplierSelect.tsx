import type { TimeMultiplier } from '@covalent/shared-types';
import { NativeSelect } from '@/features/forms/components/NativeSelect';
import { timeMultiplierOptions } from '../utils/timeMultiplierOptions';

export interface TimeMultiplierSelectProps {
  value: TimeMultiplier;
  onChange: (value: TimeMultiplier) => void;
  'aria-label'?: string;
  id?: string;
  disabled?: boolean;
}

/** Extended time for one student: 1, 1.25, 1.5 or 2 times the round's limit. */
export function TimeMultiplierSelect({ value, onChange, ...props }: TimeMultiplierSelectProps) {
  return (
    <NativeSelect
      {...props}
      options={timeMultiplierOptions}
      value={String(value)}
      onChange={(e) => onChange(Number(e.target.value) as TimeMultiplier)}
    />
  );
}
