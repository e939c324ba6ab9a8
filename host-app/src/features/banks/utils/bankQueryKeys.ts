import type { BankListQuery } from '@/api/apiPaths';

/** Cache keys of banks; invalidating `all` refreshes lists and open banks alike. */
export const bankQueryKeys = {
  all: ['banks'] as const,
  list: (query: BankListQuery) => ['banks', 'list', query] as const,
  detail: (bankId: string) => ['banks', 'detail', bankId] as const,
};
