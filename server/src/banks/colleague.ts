import { HttpStatus } from '@nestjs/common';
import { EntityManager } from 'typeorm';
import { ApiException } from '../common/api-error';
import { UserEntity } from '../users/entities/user.entity';

/**
 * An active teacher or admin of the user's own school, named by id or e-mail. Staff of other
 * schools look exactly like nobody (404), so a lookup reveals nothing outside the school.
 */
export async function findColleague(
  manager: EntityManager,
  user: UserEntity,
  by: { userId?: string; email?: string },
): Promise<UserEntity> {
  const where = by.userId ? { id: by.userId } : { email: (by.email ?? '').toLowerCase() };
  const colleague = await manager.getRepository(UserEntity).findOne({ where: { ...where, schoolId: user.schoolId, active: true } });
  if (!colleague) throw new ApiException(HttpStatus.NOT_FOUND, 'colleague_not_found', 'No active teacher with that address in your school.');
  if (colleague.id === user.id) throw new ApiException(HttpStatus.CONFLICT, 'cannot_add_self', 'You already own this.');
  return colleague;
}
