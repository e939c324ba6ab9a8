import type { CatchupBox, CatchupItemView } from '@covalent/shared-types';
import { imageUrl } from '../media/media.mapper';
import { createRng, shuffle } from '../mixer/domain';
import type { SessionItem } from '../sessions/entities/session.entity';

/** The item as the student sees it: no key, no explanation; order steps shuffled (seeded per card, so a reload shows the same order). */
export function catchupItemView(item: SessionItem, box: CatchupBox, seed: string): CatchupItemView {
  const options = item.type === 'order' ? shuffle(item.options, createRng(seed)) : item.options;
  return {
    itemId: item.id,
    box,
    type: item.type,
    prompt: item.prompt,
    options: options.map((o) => ({ id: o.id, text: o.text })),
    unitHint: item.key.type === 'numeric' ? item.key.unit : null,
    imageUrl: item.imageId ? imageUrl(item.imageId) : null,
  };
}
