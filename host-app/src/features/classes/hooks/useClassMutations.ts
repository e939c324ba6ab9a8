import type { ClassDetailDto, ImportResultDto, PairKind, PairRuleDto, RosterEntryDto, TimeMultiplier } from '@covalent/shared-types';
import { apiClient } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import type { ClassDetailsInput } from './useCreateClass';
import { useClassCommand } from './useClassCommand';

export interface RosterEntryInput {
  displayName: string;
  tableGroup: string | null;
  seatNumber: number | null;
  timeMultiplier: TimeMultiplier;
}

export interface PairRuleInput {
  kind: PairKind;
  entryAId: string;
  entryBId: string;
}

export interface RosterImportInput {
  file: File;
  mode: 'append' | 'replace';
}

/** Every write to one class, each a TanStack mutation that refreshes the class afterwards. */
export function useClassMutations(classId: string) {
  return {
    update: useClassCommand(classId, (input: ClassDetailsInput) => apiClient.patch<ClassDetailDto>(apiPaths.class(classId), input)),
    setArchived: useClassCommand(classId, (archived: boolean) =>
      apiClient.post<ClassDetailDto>(archived ? apiPaths.classArchive(classId) : apiPaths.classUnarchive(classId)),
    ),
    addCoTeacher: useClassCommand(classId, (email: string) => apiClient.post<ClassDetailDto>(apiPaths.classCoTeachers(classId), { email })),
    removeCoTeacher: useClassCommand(classId, (userId: string) => apiClient.delete<void>(apiPaths.classCoTeacher(classId, userId))),
    addEntry: useClassCommand(classId, (input: RosterEntryInput) => apiClient.post<RosterEntryDto>(apiPaths.classRoster(classId), input)),
    updateEntry: useClassCommand(classId, ({ entryId, ...input }: RosterEntryInput & { entryId: string }) =>
      apiClient.patch<RosterEntryDto>(apiPaths.classRosterEntry(classId, entryId), input),
    ),
    removeEntry: useClassCommand(classId, (entryId: string) => apiClient.delete<void>(apiPaths.classRosterEntry(classId, entryId))),
    importRoster: useClassCommand(classId, ({ file, mode }: RosterImportInput) => {
      const form = new FormData();
      form.append('file', file);
      form.append('mode', mode);
      return apiClient.upload<ImportResultDto>(apiPaths.classRosterImport(classId), form);
    }),
    addPair: useClassCommand(classId, (input: PairRuleInput) => apiClient.post<PairRuleDto>(apiPaths.classPairs(classId), input)),
    removePair: useClassCommand(classId, (pairId: string) => apiClient.delete<void>(apiPaths.classPair(classId, pairId))),
  };
}
