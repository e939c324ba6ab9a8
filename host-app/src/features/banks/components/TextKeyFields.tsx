import { Flex, Text, TextArea } from '@radix-ui/themes';
import { FieldFrame } from '@/features/forms/components/FieldFrame';
import type { ItemDraft } from '../utils/itemDraft';

export interface TextKeyFieldsProps {
  text: ItemDraft['text'];
  onChange: (text: ItemDraft['text']) => void;
  errors: string[];
}

/** Accepted answers, one per line, and whether one typo still counts. */
export function TextKeyFields({ text, onChange, errors }: TextKeyFieldsProps) {
  return (
    <Flex direction="column" gap="3">
      <FieldFrame label="Accepted answers" hint="One per line. Case, spacing and accents are ignored when checking." errors={errors}>
        {(control) => (
          <TextArea {...control} size="3" rows={3} value={text.accepted} onChange={(e) => onChange({ ...text, accepted: e.target.value })} />
        )}
      </FieldFrame>
      <Text as="label" size="2">
        <Flex gap="2" align="center">
          <input type="checkbox" checked={text.typoTolerance} onChange={(e) => onChange({ ...text, typoTolerance: e.target.checked })} />
          Accept one typo in answers of 5 or more letters
        </Flex>
      </Text>
    </Flex>
  );
}
