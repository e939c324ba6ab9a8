import type { BankDto } from '@covalent/shared-types';
import { useQuery } from '@tanstack/react-query';
import { apiClient } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';

/** Banks the teacher can run a session from (archived ones left out), by title. */
export function useSetupBanks() {
  return useQuery({
    queryKey: ['sessions', 'setup', 'banks'],
    queryFn: () => apiClient.get<BankDto[]>(apiPaths.banks()),
    select: (banks) => banks.filter((b) => b.archivedAt === null).sort((a, b) => a.title.localeCompare(b.title)),
  });
}
