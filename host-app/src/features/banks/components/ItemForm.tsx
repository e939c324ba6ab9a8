import { ITEM_TYPES, type ItemDto, type ItemType } from '@covalent/shared-types';
import { Button, Callout, Card, Flex, Grid, Heading, Text, TextArea, TextField } from '@radix-ui/themes';
import { useEffect, useRef, useState, type FormEvent } from 'react';
import { apiPaths } from '@/api/apiPaths';
import { FieldFrame } from '@/features/forms/components/FieldFrame';
import { NativeSelect } from '@/features/forms/components/NativeSelect';
import { useSaveItem } from '../hooks/useSaveItem';
import { fieldErrors } from '../utils/fieldErrors';
import { draftFromItem, emptyDraft, type DraftOption, type ItemDraft } from '../utils/itemDraft';
import { itemRequestBody } from '../utils/itemRequestBody';
import { itemTypeLabels } from '../utils/itemTypeLabels';
import { ChoiceOptionsEditor } from './ChoiceOptionsEditor';
import { ItemImageField } from './ItemImageField';
import { ItemPreview } from './ItemPreview';
import { NumericKeyFields } from './NumericKeyFields';
import { OrderStepsEditor } from './OrderStepsEditor';
import { TextKeyFields } from './TextKeyFields';
import { TrueFalseKeyField } from './TrueFalseKeyField';

export interface ItemFormProps {
  bankId: string;
  /** The item to edit; absent for a new one. */
  item?: ItemDto;
  /** Position label for the heading ("Item 3"). */
  heading: string;
  readOnly: boolean;
  onClose: (saved?: ItemDto) => void;
}

const TYPE_OPTIONS = ITEM_TYPES.map((type) => ({ value: type, label: itemTypeLabels[type] }));

/** Server messages sorted to the fields they are about; whatever fits nowhere goes to the top. */
function placeErrors(details: Parameters<typeof fieldErrors>[0], draft: ItemDraft) {
  const e = fieldErrors(details);
  const choice = draft.type === 'single' || draft.type === 'multi';
  const list = choice ? draft.options : draft.type === 'order' ? draft.steps : [];
  const placed = {
    type: e.at('type', 'key.type'),
    prompt: e.at('prompt'),
    listErrors: [...e.exactly('options'), ...e.at('key.correctOptionId', 'key.correctOptionIds', 'key.sequence')],
    perOption: list.map((_, i) => e.at(`options[${i}]`)),
    truefalse: draft.type === 'truefalse' ? e.at('key.value') : [],
    numeric: {
      value: draft.type === 'numeric' ? e.at('key.value') : [],
      unit: e.at('key.unit'),
      toleranceKind: e.at('key.tolerance.kind'),
      toleranceValue: e.at('key.tolerance.value', 'key.tolerance'),
      sigFigs: e.at('key.sigFigs'),
    },
    accepted: e.at('key.accepted', 'key.typoTolerance'),
    explanation: e.at('explanation'),
    tags: e.at('tags'),
    image: e.at('imageId'),
  };
  return { ...placed, unplaced: e.unplaced() };
}

/** The sentence at the top of the form; a lone field message is not repeated there. */
function errorSummary(message: string, detailCount: number, unplaced: { message: string }[]): string {
  if (detailCount === 1 && unplaced.length === 0) return 'One field needs attention; the message is beside it.';
  return [message, ...unplaced.map((d) => d.message)].join(' ');
}

/** Writes one item of any type, with the server's field errors beside each field and a live student preview. */
export function ItemForm({ bankId, item, heading, readOnly, onClose }: ItemFormProps) {
  const [draft, setDraft] = useState<ItemDraft>(() => (item ? draftFromItem(item, item.imageId ? apiPaths.mediaImage(item.imageId) : null) : emptyDraft()));
  const save = useSaveItem(bankId);
  const headingRef = useRef<HTMLHeadingElement>(null);
  // The form opens below a possibly long list: bring it into view and tell screen readers where they are.
  useEffect(() => headingRef.current?.focus(), []);
  const errors = placeErrors(save.error?.body.details, draft);
  const set = (patch: Partial<ItemDraft>) => setDraft((d) => ({ ...d, ...patch }));
  // Adding or removing an option moves indexes; old messages would land on the wrong row.
  const setList = (field: 'options' | 'steps', list: DraftOption[]) => {
    if (list.length !== draft[field].length) save.reset();
    set({ [field]: list });
  };

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    save.mutate({ itemId: item?.id, body: itemRequestBody(draft) }, { onSuccess: (saved) => onClose(saved) });
  };

  return (
    <Card size="3" asChild>
      <section aria-labelledby="item-form-heading">
        <Flex direction="column" gap="4">
          <Heading as="h2" size="5" id="item-form-heading" ref={headingRef} tabIndex={-1}>
            {heading}
          </Heading>
          <Grid columns={{ initial: '1', md: '3fr 2fr' }} gap="5" align="start">
            <form onSubmit={onSubmit} noValidate aria-labelledby="item-form-heading">
              <fieldset disabled={readOnly} className="plain-fieldset">
                <Flex direction="column" gap="4">
                  {save.error && (
                    <Callout.Root color="red" variant="surface" role="alert">
                      <Callout.Text>{errorSummary(save.error.message, save.error.body.details?.length ?? 0, errors.unplaced)}</Callout.Text>
                    </Callout.Root>
                  )}
                  <FieldFrame label="Question type" errors={errors.type}>
                    {(control) => (
                      <NativeSelect
                        {...control}
                        options={TYPE_OPTIONS}
                        value={draft.type}
                        onChange={(e) => {
                          save.reset();
                          set({ type: e.target.value as ItemType });
                        }}
                      />
                    )}
                  </FieldFrame>
                  <FieldFrame label="Prompt" errors={errors.prompt}>
                    {(control) => <TextArea {...control} size="3" rows={3} value={draft.prompt} onChange={(e) => set({ prompt: e.target.value })} />}
                  </FieldFrame>
                  {(draft.type === 'single' || draft.type === 'multi') && (
                    <ChoiceOptionsEditor
                      multiple={draft.type === 'multi'}
                      options={draft.options}
                      onChange={(options) => setList('options', options)}
                      listErrors={errors.listErrors}
                      optionErrors={errors.perOption}
                    />
                  )}
                  {draft.type === 'order' && (
                    <OrderStepsEditor
                      steps={draft.steps}
                      onChange={(steps) => setList('steps', steps)}
                      listErrors={errors.listErrors}
                      stepErrors={errors.perOption}
                    />
                  )}
                  {draft.type === 'truefalse' && (
                    <TrueFalseKeyField value={draft.truefalse} onChange={(truefalse) => set({ truefalse })} errors={errors.truefalse} />
                  )}
                  {draft.type === 'numeric' && (
                    <NumericKeyFields numeric={draft.numeric} onChange={(numeric) => set({ numeric })} errors={errors.numeric} />
                  )}
                  {draft.type === 'text' && <TextKeyFields text={draft.text} onChange={(text) => set({ text })} errors={errors.accepted} />}
                  <FieldFrame label="Explanation" hint="Shown after the answer is revealed." errors={errors.explanation}>
                    {(control) => (
                      <TextArea {...control} size="3" rows={2} value={draft.explanation} onChange={(e) => set({ explanation: e.target.value })} />
                    )}
                  </FieldFrame>
                  <FieldFrame label="Tags" hint="Separate with commas, e.g. safety, goggles." errors={errors.tags}>
                    {(control) => <TextField.Root {...control} size="3" value={draft.tags} onChange={(e) => set({ tags: e.target.value })} />}
                  </FieldFrame>
                  <ItemImageField
                    imageUrl={draft.imageUrl}
                    errors={errors.image}
                    disabled={readOnly}
                    onChange={(image) => set({ imageId: image?.id ?? null, imageUrl: image?.url ?? null })}
                  />
                </Flex>
              </fieldset>
              <Flex gap="3" mt="5">
                {!readOnly && (
                  <Button type="submit" size="3" loading={save.isPending}>
                    {item ? 'Save item' : 'Add item'}
                  </Button>
                )}
                <Button type="button" size="3" variant="soft" color="gray" onClick={() => onClose()}>
                  {readOnly ? 'Close' : 'Cancel'}
                </Button>
              </Flex>
              {readOnly && (
                <Text as="p" size="2" color="gray" mt="3">
                  This bank is shared with you to view only. Duplicate it from the banks list to make your own copy.
                </Text>
              )}
            </form>
            <ItemPreview draft={draft} />
          </Grid>
        </Flex>
      </section>
    </Card>
  );
}
