import type { ItemType } from '@covalent/shared-types';

/** The item types as the teacher reads them in menus and badges. */
export const itemTypeLabels: Record<ItemType, string> = {
  single: 'Single answer',
  multi: 'Multiple answers',
  truefalse: 'True or false',
  order: 'Put in order',
  numeric: 'Numeric',
  text: 'Short text',
};
