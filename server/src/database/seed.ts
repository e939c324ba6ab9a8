import * as argon2 from 'argon2';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Role } from '@covalent/shared-types';
import { normalisePassword } from '../auth/password-policy';
import { SchoolEntity } from '../users/entities/school.entity';
import { UserEntity } from '../users/entities/user.entity';
import dataSource from './data-source';

interface StaffFixture {
  school: { name: string };
  users: { email: string; displayName: string; role: Role; password: string }[];
}

export const FIXTURES_DIR = process.env.FIXTURES_DIR ?? join(__dirname, '../../../fixtures');

/** Idempotent: running it twice leaves one school and one account per e-mail. */
async function main(): Promise<void> {
  const staff = JSON.parse(readFileSync(join(FIXTURES_DIR, 'demo/staff.json'), 'utf8')) as StaffFixture;
  await dataSource.initialize();
  const schools = dataSource.getRepository(SchoolEntity);
  const users = dataSource.getRepository(UserEntity);
  const school = (await schools.findOne({ where: { name: staff.school.name } })) ?? (await schools.save(schools.create(staff.school)));
  for (const u of staff.users) {
    const existing = await users.findOne({ where: { email: u.email } });
    if (existing) continue;
    const passwordHash = await argon2.hash(normalisePassword(u.password), { type: argon2.argon2id });
    await users.save(users.create({ email: u.email, displayName: u.displayName, role: u.role, schoolId: school.id, passwordHash, active: true }));
  }
  console.log(`demo data: ${school.name}`);
  for (const u of staff.users) console.log(`  ${u.role.padEnd(8)} ${u.email}  password: ${u.password}`);
  await dataSource.destroy();
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
