import { optionLetter, type AnswerDistribution, type PlayerItemView } from '@covalent/shared-types';

/** How a distribution row is named on screen: "B. Goggles on" for an option, the answer text otherwise. */
export function distributionLabel(row: AnswerDistribution['counts'][number], item: PlayerItemView): string {
  if (row.optionId === null) return row.label;
  const index = item.options.findIndex((option) => option.id === row.optionId);
  return index < 0 ? row.label : `${optionLetter(index)}. ${item.options[index]!.text}`;
}
