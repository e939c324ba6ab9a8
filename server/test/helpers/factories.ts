import * as argon2 from 'argon2';
import type { Role } from '@covalent/shared-types';
import { DataSource } from 'typeorm';
import { normalisePassword } from '../../src/auth/password-policy';
import { SchoolEntity } from '../../src/users/entities/school.entity';
import { UserEntity } from '../../src/users/entities/user.entity';

/** Test data, invented. One place for every suite's factories. */
export const PASSWORD = 'violet-titration-burette-9';

let n = 0;
export async function makeSchool(db: DataSource, name = `Test School ${++n}`): Promise<SchoolEntity> {
  return db.getRepository(SchoolEntity).save({ name });
}

export async function makeUser(
  db: DataSource,
  school: SchoolEntity,
  role: Role = 'teacher',
  overrides: Partial<UserEntity> = {},
): Promise<UserEntity> {
  const i = ++n;
  return db.getRepository(UserEntity).save({
    email: `${role}${i}@school${i}.example`,
    displayName: `${role === 'admin' ? 'Admin' : 'Teacher'} Number${i}`,
    role,
    schoolId: school.id,
    passwordHash: await argon2.hash(normalisePassword(PASSWORD), { type: argon2.argon2id }),
    active: true,
    ...overrides,
  });
}
