import { PAIR_KINDS, type PairKind, type PairRuleDto, type RosterEntryDto } from '@covalent/shared-types';
import { Button, Flex, Text } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import type { ApiRequestError } from '@/api/client';
import { FieldFrame } from '@/features/forms/components/FieldFrame';
import { FormErrorCallout } from '@/features/forms/components/FormErrorCallout';
import { NativeSelect } from '@/features/forms/components/NativeSelect';
import type { PairRuleInput } from '../hooks/useClassMutations';

export interface PairRulesCardProps {
  roster: RosterEntryDto[];
  pairs: PairRuleDto[];
  canEdit: boolean;
  pending: boolean;
  error: ApiRequestError | null;
  onAdd: (input: PairRuleInput, done: () => void) => void;
  onRemove: (pair: PairRuleDto) => void;
}

const KIND_LABELS: Record<PairKind, string> = { apart: 'Keep apart', together: 'Keep together' };
const KIND_OPTIONS = PAIR_KINDS.map((k) => ({ value: k, label: KIND_LABELS[k] }));

/** Two students the Mixer keeps on different teams (or on the same one). */
export function PairRulesCard({ roster, pairs, canEdit, pending, error, onAdd, onRemove }: PairRulesCardProps) {
  const [a, setA] = useState('');
  const [b, setB] = useState('');
  const [kind, setKind] = useState<PairKind>('apart');
  const names = new Map(roster.map((e) => [e.id, e.displayName]));
  const studentOptions = [{ value: '', label: 'Choose a student' }, ...roster.map((e) => ({ value: e.id, label: e.displayName }))];

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    onAdd({ kind, entryAId: a, entryBId: b }, () => {
      setA('');
      setB('');
    });
  };

  return (
    <Flex direction="column" gap="3">
      {pairs.length === 0 ? (
        <Text color="gray" size="2">
          No pair rules. The Mixer still spreads each table across teams.
        </Text>
      ) : (
        <ul className="plain-list" aria-label="Pair rules">
          {pairs.map((p) => (
            <li key={p.id}>
              <Flex gap="3" align="center" py="1">
                <Text>
                  <Text weight="bold">{KIND_LABELS[p.kind]}:</Text> {names.get(p.entryAId) ?? '?'} and {names.get(p.entryBId) ?? '?'}
                </Text>
                {canEdit && (
                  <Button size="1" variant="soft" color="gray" onClick={() => onRemove(p)}>
                    Remove
                  </Button>
                )}
              </Flex>
            </li>
          ))}
        </ul>
      )}
      {canEdit && roster.length >= 2 && (
        <form onSubmit={onSubmit} noValidate aria-label="Add a pair rule">
          <Flex direction="column" gap="3">
            <FormErrorCallout message={error && !error.body.details?.length ? error.message : undefined} />
            <Flex gap="3" wrap="wrap" align="end">
              <FieldFrame label="Rule">
                {(c) => <NativeSelect {...c} options={KIND_OPTIONS} value={kind} onChange={(e) => setKind(e.target.value as PairKind)} />}
              </FieldFrame>
              <FieldFrame label="First student" errors={error?.fieldMessages('entryAId')}>
                {(c) => <NativeSelect {...c} options={studentOptions} value={a} onChange={(e) => setA(e.target.value)} />}
              </FieldFrame>
              <FieldFrame label="Second student" errors={error?.fieldMessages('entryBId')}>
                {(c) => <NativeSelect {...c} options={studentOptions} value={b} onChange={(e) => setB(e.target.value)} />}
              </FieldFrame>
              <Button type="submit" loading={pending} disabled={!a || !b}>
                Add rule
              </Button>
            </Flex>
          </Flex>
        </form>
      )}
    </Flex>
  );
}
