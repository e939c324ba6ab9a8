import { Flex, Grid, TextField } from '@radix-ui/themes';
import { FieldFrame } from '@/features/forms/components/FieldFrame';
import { NativeSelect } from '@/features/forms/components/NativeSelect';
import type { ItemDraft } from '../utils/itemDraft';

export interface NumericKeyErrors {
  value: string[];
  unit: string[];
  toleranceKind: string[];
  toleranceValue: string[];
  sigFigs: string[];
}

export interface NumericKeyFieldsProps {
  numeric: ItemDraft['numeric'];
  onChange: (numeric: ItemDraft['numeric']) => void;
  errors: NumericKeyErrors;
}

const TOLERANCE_KINDS = [
  { value: 'absolute', label: 'Absolute (in the unit)' },
  { value: 'relative', label: 'Relative (a fraction, 0.01 = 1%)' },
] as const;

/** The correct value, its unit, how far off still counts, and optional significant figures. */
export function NumericKeyFields({ numeric, onChange, errors }: NumericKeyFieldsProps) {
  const set = (patch: Partial<ItemDraft['numeric']>) => onChange({ ...numeric, ...patch });
  return (
    <Flex direction="column" gap="4">
      <Grid columns={{ initial: '1', sm: '2' }} gap="4">
        <FieldFrame label="Correct value" hint="Keep trailing zeros, e.g. 2.80 or 6.022e23." errors={errors.value}>
          {(control) => <TextField.Root {...control} size="3" inputMode="decimal" value={numeric.value} onChange={(e) => set({ value: e.target.value })} />}
        </FieldFrame>
        <FieldFrame label="Unit" hint="mL, g/mL, kPa… Leave empty for a bare number." errors={errors.unit}>
          {(control) => <TextField.Root {...control} size="3" value={numeric.unit} onChange={(e) => set({ unit: e.target.value })} />}
        </FieldFrame>
        <FieldFrame label="Tolerance kind" errors={errors.toleranceKind}>
          {(control) => (
            <NativeSelect
              {...control}
              options={TOLERANCE_KINDS}
              value={numeric.toleranceKind}
              onChange={(e) => set({ toleranceKind: e.target.value as ItemDraft['numeric']['toleranceKind'] })}
            />
          )}
        </FieldFrame>
        <FieldFrame label="Tolerance" hint="How far from the value still counts; empty means exact." errors={errors.toleranceValue}>
          {(control) => (
            <TextField.Root {...control} size="3" inputMode="decimal" value={numeric.toleranceValue} onChange={(e) => set({ toleranceValue: e.target.value })} />
          )}
        </FieldFrame>
        <FieldFrame label="Significant figures (optional)" hint="Answers with another count earn half credit." errors={errors.sigFigs}>
          {(control) => <TextField.Root {...control} size="3" inputMode="numeric" value={numeric.sigFigs} onChange={(e) => set({ sigFigs: e.target.value })} />}
        </FieldFrame>
      </Grid>
    </Flex>
  );
}
