import { optionLetter } from '@covalent/shared-types';
import { Card, Flex, Heading, Text, TextField } from '@radix-ui/themes';
import type { ItemDraft } from '../utils/itemDraft';

export interface ItemPreviewProps {
  draft: ItemDraft;
}

function OptionList({ texts }: { texts: string[] }) {
  return (
    <ol className="plain-list preview-options" aria-label="Options as students see them">
      {texts.map((text, i) => (
        <li key={i} className="preview-option">
          <span className="preview-letter">{optionLetter(i)}</span>
          <span>{text || <Text color="gray">(empty)</Text>}</span>
        </li>
      ))}
    </ol>
  );
}

/**
 * The item as a student's device shows it during a round, without the key: options lettered
 * A, B, C… in one neutral style, nothing told apart by colour or shape.
 */
export function ItemPreview({ draft }: ItemPreviewProps) {
  return (
    <Card size="2" variant="surface" asChild>
      <section aria-label="Student preview">
        <Flex direction="column" gap="3">
          <Heading as="h3" size="2" color="gray">
            Student preview
          </Heading>
          {draft.imageUrl && <img src={draft.imageUrl} alt="" className="preview-image" />}
          <Text as="p" size="4" weight="bold">
            {draft.prompt.trim() || <Text color="gray">The prompt appears here.</Text>}
          </Text>
          {(draft.type === 'single' || draft.type === 'multi') && (
            <>
              <Text size="2" color="gray">
                {draft.type === 'multi' ? 'Choose every answer that applies.' : 'Choose one answer.'}
              </Text>
              <OptionList texts={draft.options.map((o) => o.text)} />
            </>
          )}
          {draft.type === 'truefalse' && <OptionList texts={['True', 'False']} />}
          {draft.type === 'order' && (
            <>
              <Text size="2" color="gray">
                Shown here in your order; each student gets the steps shuffled and puts them in order.
              </Text>
              <OptionList texts={draft.steps.map((s) => s.text)} />
            </>
          )}
          {draft.type === 'numeric' && (
            <Flex gap="2" align="center">
              <TextField.Root size="3" aria-label="Answer (preview)" placeholder="Your answer" readOnly tabIndex={-1} />
              {draft.numeric.unit.trim() && (
                <Text size="3" weight="bold" data-testid="preview-unit">
                  {draft.numeric.unit.trim()}
                </Text>
              )}
            </Flex>
          )}
          {draft.type === 'text' && <TextField.Root size="3" aria-label="Answer (preview)" placeholder="Type your answer" readOnly tabIndex={-1} />}
        </Flex>
      </section>
    </Card>
  );
}
