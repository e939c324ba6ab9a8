import type { ApiError, MeDto, SchoolSettingsDto, StaffUserDto } from '@covalent/shared-types';

/** Test data in one place; override only what a test is about. */
export function makeMe(overrides: Partial<MeDto> = {}): MeDto {
  return {
    id: '5a4f1e0c-0000-4000-8000-000000000001',
    email: 'r.okafor@school.example',
    displayName: 'Ruth Okafor',
    role: 'teacher',
    school: { id: '5a4f1e0c-0000-4000-8000-0000000000aa', name: 'Northfield High School' },
    ...overrides,
  };
}

export function makeStaffUser(overrides: Partial<StaffUserDto> = {}): StaffUserDto {
  return {
    id: '5a4f1e0c-0000-4000-8000-000000000002',
    email: 'm.lindqvist@school.example',
    displayName: 'Maja Lindqvist',
    role: 'teacher',
    active: true,
    activated: true,
    createdAt: '2025-01-15T09:00:00.000Z',
    ...overrides,
  };
}

export function makeSchoolSettings(overrides: Partial<SchoolSettingsDto> = {}): SchoolSettingsDto {
  return { id: '5a4f1e0c-0000-4000-8000-0000000000aa', name: 'Northfield High School', retentionDays: 365, ...overrides };
}

export function makeApiError(error: string, message: string, details?: ApiError['details']): ApiError {
  return { ok: false, error, message, ...(details ? { details } : {}) };
}
