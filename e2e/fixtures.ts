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

/** The local demo sign-on provider's accounts (fixtures/demo/sign-on.json, demo only). */
const signOn = JSON.parse(readFileSync(join(__dirname, '../fixtures/demo/sign-on.json'), 'utf8')) as {
  accounts: { login: string; password: string; email: string; email_verified: boolean; name: string }[];
};
/** The demo teacher's school account at the demo provider. */
export const demoTeacherSignOn = signOn.accounts.find((a) => a.email === demoTeacher.email)!;
/** A school account whose e-mail has no Covalent account. */
export const signOnWithoutAccount = signOn.accounts.find((a) => !staff.users.some((u) => u.email === a.email))!;
