import { FORMATS, MIXER_MODES, NAME_PACKS, STANDINGS_VIEWS, classLabel, type SessionDto } from '@covalent/shared-types';
import { Button, Card, Flex, RadioCards, RadioGroup, Text, TextField } from '@radix-ui/themes';
import { useId, useState, type FormEvent, type ReactNode } from 'react';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { useCreateSession } from '../hooks/useCreateSession';
import { useSetupBankItems } from '../hooks/useSetupBankItems';
import { useSetupBanks } from '../hooks/useSetupBanks';
import { useSetupClasses } from '../hooks/useSetupClasses';
import {
  buildCreateSessionRequest,
  DEFAULT_SETUP,
  type SessionSetupField,
  type SessionSetupValues,
} from '../utils/buildCreateSessionRequest';
import { sessionSettingLabels as labels } from '../utils/sessionSettingLabels';
import { ItemPicker } from './ItemPicker';
import '../sessionSetup.css';

export interface SessionSetupFormProps {
  initialBankId?: string;
  /** From a class's page: the class is chosen already. */
  initialClassId?: string;
  onCreated: (session: SessionDto) => void;
}

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Card size="3">
      <Flex direction="column" gap="4">
        <Text as="p" size="4" weight="bold">
          {title}
        </Text>
        {children}
      </Flex>
    </Card>
  );
}

function FieldError({ id, message }: { id: string; message?: string }) {
  if (!message) return null;
  return (
    <Text id={id} size="2" color="red">
      {message}
    </Text>
  );
}

/** Everything a session needs before students join: bank, who plays, format, timing and teams. */
export function SessionSetupForm({ initialBankId = '', initialClassId = '', onCreated }: SessionSetupFormProps) {
  const id = useId();
  const [values, setValues] = useState<SessionSetupValues>({ ...DEFAULT_SETUP, bankId: initialBankId, classId: initialClassId });
  const [errors, setErrors] = useState<Partial<Record<SessionSetupField, string>>>({});
  const banks = useSetupBanks();
  const classes = useSetupClasses();
  const items = useSetupBankItems(values.bankId);
  const create = useCreateSession();

  const set = <K extends keyof SessionSetupValues>(key: K, value: SessionSetupValues[K]) =>
    setValues((v) => ({ ...v, [key]: value }));

  // An id from the link that is not in the lists (a stale link, an archived class) shows as
  // "Choose a bank" / "Ad-hoc group", so it is sent as what the teacher sees.
  const shown = (list: { id: string }[] | undefined, chosen: string) => (list && !list.some((x) => x.id === chosen) ? '' : chosen);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const built = buildCreateSessionRequest({
      ...values,
      bankId: shown(banks.data, values.bankId),
      classId: shown(classes.data, values.classId),
    });
    if (!built.ok) {
      setErrors(built.errors);
      return;
    }
    setErrors({});
    create.mutate(built.request, { onSuccess: onCreated });
  };

  const fieldIds = {
    bank: `${id}-bank`,
    klass: `${id}-class`,
    seconds: `${id}-seconds`,
    speed: `${id}-speed`,
    team: `${id}-team`,
  };

  return (
    <form onSubmit={submit} noValidate>
      <Flex direction="column" gap="5">
        <FormErrorCallout message={create.error?.message} />

        <Section title="What to play">
          <Flex direction="column" gap="1">
            <Text as="label" htmlFor={fieldIds.bank} size="2" weight="bold">
              Bank
            </Text>
            <select
              id={fieldIds.bank}
              className="setup-select"
              value={values.bankId}
              aria-invalid={errors.bankId ? true : undefined}
              aria-describedby={errors.bankId ? `${fieldIds.bank}-error` : undefined}
              onChange={(e) => setValues((v) => ({ ...v, bankId: e.target.value, itemOrder: null, excludedItemIds: [] }))}
            >
              <option value="">{banks.isPending ? 'Loading banks…' : 'Choose a bank'}</option>
              {banks.data?.map((bank) => (
                <option key={bank.id} value={bank.id}>
                  {bank.title} ({bank.itemCount} items)
                </option>
              ))}
            </select>
            <FieldError id={`${fieldIds.bank}-error`} message={errors.bankId} />
          </Flex>
          {items.data && (
            <ItemPicker
              items={items.data}
              order={values.itemOrder}
              excluded={values.excludedItemIds}
              error={errors.items}
              onChange={(itemOrder, excludedItemIds) => setValues((v) => ({ ...v, itemOrder, excludedItemIds }))}
            />
          )}
        </Section>

        <Section title="Who is playing">
          <Flex direction="column" gap="1">
            <Text as="label" htmlFor={fieldIds.klass} size="2" weight="bold">
              Class
            </Text>
            <select id={fieldIds.klass} className="setup-select" value={values.classId} onChange={(e) => set('classId', e.target.value)}>
              <option value="">Ad-hoc group (students type a nickname)</option>
              {classes.data?.map((c) => (
                <option key={c.id} value={c.id}>
                  {classLabel(c)}
                </option>
              ))}
            </select>
            <Text size="2" color="gray">
              With a class, students pick themselves from the roster and the Mixer knows their tables.
            </Text>
          </Flex>
        </Section>

        <Section title="How rounds are played">
          <fieldset className="setup-fieldset">
            <legend className="setup-legend">Format</legend>
            <RadioCards.Root value={values.format} onValueChange={(v) => set('format', v as SessionSetupValues['format'])} columns={{ initial: '1', sm: '3' }}>
              {FORMATS.map((format) => (
                <RadioCards.Item key={format} value={format}>
                  <Flex direction="column" width="100%" gap="1">
                    <Text weight="bold">
                      {format} — {labels.format[format].title}
                    </Text>
                    <Text size="2" color="gray">
                      {labels.format[format].description}
                    </Text>
                  </Flex>
                </RadioCards.Item>
              ))}
            </RadioCards.Root>
          </fieldset>

          <Flex gap="6" wrap="wrap">
            <Flex direction="column" gap="1">
              <Text as="label" htmlFor={fieldIds.seconds} size="2" weight="bold">
                Round time (seconds)
              </Text>
              <TextField.Root
                id={fieldIds.seconds}
                size="3"
                inputMode="numeric"
                value={values.roundSeconds}
                aria-invalid={errors.roundSeconds ? true : undefined}
                aria-describedby={errors.roundSeconds ? `${fieldIds.seconds}-error` : undefined}
                onChange={(e) => set('roundSeconds', e.target.value)}
                style={{ width: 120 }}
              />
              <FieldError id={`${fieldIds.seconds}-error`} message={errors.roundSeconds} />
            </Flex>
            <Flex direction="column" gap="1" flexGrow="1">
              <Text as="label" htmlFor={fieldIds.speed} size="2" weight="bold">
                Speed weight: {values.speedWeight.toFixed(2)}
              </Text>
              <input
                id={fieldIds.speed}
                className="setup-range"
                type="range"
                min={0}
                max={1}
                step={0.05}
                value={values.speedWeight}
                aria-describedby={`${fieldIds.speed}-hint`}
                onChange={(e) => set('speedWeight', Number(e.target.value))}
              />
              <Text id={`${fieldIds.speed}-hint`} size="2" color="gray">
                How much a quick answer adds. 0 turns speed off.
              </Text>
            </Flex>
          </Flex>

          <fieldset className="setup-fieldset">
            <legend className="setup-legend">Standings shown to the class</legend>
            <RadioGroup.Root value={values.standings} onValueChange={(v) => set('standings', v as SessionSetupValues['standings'])}>
              {STANDINGS_VIEWS.map((view) => (
                <RadioGroup.Item key={view} value={view}>
                  {labels.standings[view]}
                </RadioGroup.Item>
              ))}
            </RadioGroup.Root>
          </fieldset>
        </Section>

        <Section title="Teams">
          <fieldset className="setup-fieldset">
            <legend className="setup-legend">Team size</legend>
            <Flex gap="4" align="end" wrap="wrap">
              <RadioGroup.Root
                value={values.teamSizing}
                onValueChange={(v) => setValues((s) => ({ ...s, teamSizing: v as 'count' | 'size', teamNumber: v === 'count' ? '6' : '4' }))}
              >
                <RadioGroup.Item value="size">Players per team</RadioGroup.Item>
                <RadioGroup.Item value="count">Number of teams</RadioGroup.Item>
              </RadioGroup.Root>
              <Flex direction="column" gap="1">
                <Text as="label" htmlFor={fieldIds.team} size="2" weight="bold">
                  {values.teamSizing === 'count' ? 'Teams' : 'Players per team'}
                </Text>
                <TextField.Root
                  id={fieldIds.team}
                  size="3"
                  inputMode="numeric"
                  value={values.teamNumber}
                  aria-invalid={errors.teamNumber ? true : undefined}
                  aria-describedby={errors.teamNumber ? `${fieldIds.team}-error` : undefined}
                  onChange={(e) => set('teamNumber', e.target.value)}
                  style={{ width: 120 }}
                />
              </Flex>
            </Flex>
            <FieldError id={`${fieldIds.team}-error`} message={errors.teamNumber} />
          </fieldset>

          <fieldset className="setup-fieldset">
            <legend className="setup-legend">Mixer</legend>
            <RadioCards.Root value={values.mixerMode} onValueChange={(v) => set('mixerMode', v as SessionSetupValues['mixerMode'])} columns={{ initial: '1', sm: '3' }}>
              {MIXER_MODES.map((mode) => (
                <RadioCards.Item key={mode} value={mode}>
                  <Flex direction="column" width="100%" gap="1">
                    <Text weight="bold">{labels.mixer[mode].title}</Text>
                    <Text size="2" color="gray">
                      {labels.mixer[mode].description}
                    </Text>
                  </Flex>
                </RadioCards.Item>
              ))}
            </RadioCards.Root>
          </fieldset>

          <fieldset className="setup-fieldset">
            <legend className="setup-legend">Team names</legend>
            <RadioGroup.Root value={values.namePack} onValueChange={(v) => set('namePack', v as SessionSetupValues['namePack'])}>
              {NAME_PACKS.map((pack) => (
                <RadioGroup.Item key={pack} value={pack}>
                  {labels.namePack[pack]}
                </RadioGroup.Item>
              ))}
            </RadioGroup.Root>
          </fieldset>
        </Section>

        <Flex gap="3" align="center">
          <Button type="submit" size="3" loading={create.isPending}>
            Create session and open host screen
          </Button>
        </Flex>
      </Flex>
    </form>
  );
}
