import type { SchoolSettingsDto } from '@covalent/shared-types';
import { RETENTION_DAYS_MAX, RETENTION_DAYS_MIN } from '@covalent/shared-types';
import { Button, Callout, Flex, TextField } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { FieldFrame } from '@/features/forms/components/FieldFrame';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { countText } from '@/features/forms/utils/countText';
import { useUpdateSchoolSettings } from '../hooks/useUpdateSchoolSettings';
import { parseRetentionDays } from '../utils/parseRetentionDays';

export interface RetentionFormProps {
  settings: SchoolSettingsDto;
}

/** The number of days player data is kept, checked here before the server sees it. */
export function RetentionForm({ settings }: RetentionFormProps) {
  const [draft, setDraft] = useState(String(settings.retentionDays));
  const [problem, setProblem] = useState<string>();
  const update = useUpdateSchoolSettings();

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const parsed = parseRetentionDays(draft);
    if (!parsed.ok) {
      setProblem(parsed.message);
      return;
    }
    setProblem(undefined);
    update.mutate({ retentionDays: parsed.days });
  };

  const onChange = (value: string) => {
    setDraft(value);
    // An old message about a different number would mislead.
    setProblem(undefined);
    update.reset();
  };

  return (
    <Flex asChild direction="column" gap="3" align="start">
      <form onSubmit={onSubmit} noValidate aria-label="Player data retention">
        <FormErrorCallout message={update.error?.message} />
        {update.isSuccess && (
          <Callout.Root role="status" color="green" variant="surface">
            <Callout.Text>Saved: player data is kept for {countText(update.data.retentionDays, 'day')}.</Callout.Text>
          </Callout.Root>
        )}
        <Flex gap="4" wrap="wrap" align="end">
          <FieldFrame label="Days to keep player data" errors={problem ? [problem] : update.error?.fieldMessages('retentionDays')}>
            {(control) => (
              <TextField.Root
                {...control}
                type="number"
                inputMode="numeric"
                min={RETENTION_DAYS_MIN}
                max={RETENTION_DAYS_MAX}
                step={1}
                size="3"
                value={draft}
                onChange={(e) => onChange(e.target.value)}
                style={{ width: 140 }}
              />
            )}
          </FieldFrame>
          <Button type="submit" size="3" loading={update.isPending}>
            Save
          </Button>
        </Flex>
      </form>
    </Flex>
  );
}
