import type { ItemResponse, PlayerItemView } from '@covalent/shared-types';

/** What the answer controls start from before the student touches them; null for single and true/false. */
export function emptyDraft(item: Pick<PlayerItemView, 'type' | 'options'>): ItemResponse | null {
  if (item.type === 'order') return { type: 'order', sequence: item.options.map((o) => o.id) };
  if (item.type === 'multi') return { type: 'multi', optionIds: [] };
  if (item.type === 'numeric' || item.type === 'text') return { type: item.type, text: '' };
  return null;
}

/** Whether a draft can be sent: something picked or typed. */
export function isCompleteDraft(draft: ItemResponse | null): draft is ItemResponse {
  if (!draft) return false;
  if (draft.type === 'multi') return draft.optionIds.length > 0;
  if (draft.type === 'numeric' || draft.type === 'text') return draft.text.trim() !== '';
  return true;
}
