import { readFileSync } from 'node:fs';
import { join } from 'node:path';

/** The demo accounts `npm test` seeds into the e2e database (fixtures/demo/staff.json). */
const staff = JSON.parse(readFileSync(join(__dirname, '../fixtures/demo/staff.json'), 'utf8')) as {
  school: { name: string };
  users: { email: string; displayName: string; role: string; password: string }[];
};
export const demoSchool = staff.school;
export const demoTeacher = staff.users.find((u) => u.role === 'teacher')!;
export const demoAdmin = staff.users.find((u) => u.role === 'admin')!;
