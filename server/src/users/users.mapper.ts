import type { MeDto, StaffUserDto } from '@covalent/shared-types';
import { UserEntity } from './entities/user.entity';

export function toMeDto(user: UserEntity): MeDto {
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    role: user.role,
    school: { id: user.schoolId, name: user.school?.name ?? '' },
  };
}

export function toStaffUserDto(user: UserEntity): StaffUserDto {
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    role: user.role,
    active: user.active,
    activated: user.passwordHash !== null,
    createdAt: user.createdAt.toISOString(),
  };
}
