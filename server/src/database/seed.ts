import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import { getRepositoryToken } from '@nestjs/typeorm';
import { readFileSync } from 'node:fs';
import { basename, join } from 'node:path';
import { Repository } from 'typeorm';
import type { Role, ShareAccess } from '@covalent/shared-types';
import { AppModule } from '../app.module';
import { AuthService } from '../auth/auth.service';
import { BankCsvService } from '../banks/bank-csv.service';
import { BanksService } from '../banks/banks.service';
import { BankEntity } from '../banks/entities/bank.entity';
import { ClassesService } from '../classes/classes.service';
import { ClassEntity } from '../classes/entities/class.entity';
import { RosterService } from '../classes/roster.service';
import { SchoolEntity } from '../users/entities/school.entity';
import { UserEntity } from '../users/entities/user.entity';
import { seedDemoSession } from './demo-session';

interface DemoFixture {
  school: { name: string };
  users: { email: string; displayName: string; role: Role; password: string }[];
  classes: { name: string; period: string; term: string; roster: string; owner: string; coTeachers: string[]; keepApart: [string, string][] }[];
  banks: { title: string; file: string; owner: string; shareWith: [string, ShareAccess][] }[];
  /** One session already played (invented answers), so the debrief and the class page have something to show. */
  playedSession?: { class: { name: string; period: string }; bank: string; seed: string; absent: number };
}

const FIXTURES_DIR = join(__dirname, '../../../fixtures/demo');

/**
 * `npm run seed -w server`: the invented demo school, its staff, two classes with rosters and the
 * chemistry banks. Goes through the app's own services, so the demo passes the same validation as
 * an import by a teacher. Idempotent: what exists is left alone.
 */
async function main(): Promise<void> {
  const demo = JSON.parse(readFileSync(join(FIXTURES_DIR, 'staff.json'), 'utf8')) as DemoFixture;
  const app = await NestFactory.createApplicationContext(AppModule, { logger: ['error', 'warn'] });
  try {
    const schools = app.get<Repository<SchoolEntity>>(getRepositoryToken(SchoolEntity));
    const users = app.get<Repository<UserEntity>>(getRepositoryToken(UserEntity));
    const auth = app.get(AuthService);
    const school = (await schools.findOne({ where: { name: demo.school.name } })) ?? (await schools.save(schools.create(demo.school)));

    const byEmail = new Map<string, UserEntity>();
    for (const u of demo.users) {
      const user =
        (await users.findOne({ where: { email: u.email } })) ??
        (await users.save(
          users.create({ email: u.email, displayName: u.displayName, role: u.role, schoolId: school.id, passwordHash: await auth.hashPassword(u.password), active: true }),
        ));
      byEmail.set(u.email, user);
    }
    const staff = (email: string): UserEntity => {
      const user = byEmail.get(email);
      if (!user) throw new Error(`demo fixture names an unknown account: ${email}`);
      return user;
    };

    const classRepo = app.get<Repository<ClassEntity>>(getRepositoryToken(ClassEntity));
    const classes = app.get(ClassesService);
    const roster = app.get(RosterService);
    for (const c of demo.classes) {
      const owner = staff(c.owner);
      if (await classRepo.findOne({ where: { ownerId: owner.id, name: c.name, period: c.period } })) continue;
      const created = await classes.create(owner, { name: c.name, period: c.period, term: c.term });
      await roster.importCsv(owner, created.id, readFileSync(join(FIXTURES_DIR, c.roster)), 'replace');
      for (const email of c.coTeachers) await classes.addCoTeacher(owner, created.id, { email });
      const entries = await roster.list(owner, created.id);
      const entryId = (name: string) => entries.find((e) => e.displayName === name)?.id ?? '';
      for (const [a, b] of c.keepApart) await roster.addPair(owner, created.id, { kind: 'apart', entryAId: entryId(a), entryBId: entryId(b) });
    }

    const bankRepo = app.get<Repository<BankEntity>>(getRepositoryToken(BankEntity));
    const bankCsv = app.get(BankCsvService);
    const banks = app.get(BanksService);
    for (const b of demo.banks) {
      const owner = staff(b.owner);
      if (await bankRepo.findOne({ where: { ownerId: owner.id, title: b.title } })) continue;
      const result = await bankCsv.importNewBank(owner, readFileSync(join(FIXTURES_DIR, b.file)), basename(b.file), b.title);
      for (const [email, access] of b.shareWith) await banks.share(owner, result.targetId, { email, access });
    }

    const played = demo.playedSession;
    if (played) {
      const cls = demo.classes.find((c) => c.name === played.class.name && c.period === played.class.period);
      const owner = staff(cls?.owner ?? '');
      const classRow = await classRepo.findOne({ where: { ownerId: owner.id, name: played.class.name, period: played.class.period } });
      const bankRow = await bankRepo.findOne({ where: { ownerId: owner.id, title: played.bank } });
      if (!classRow || !bankRow) throw new Error('the demo fixture names a played session for an unknown class or bank');
      const id = await seedDemoSession(app, owner, classRow.id, bankRow.id, { seed: played.seed, absent: played.absent });
      if (id) console.log(`  played session: ${played.bank}, ${played.class.name} period ${played.class.period} (invented answers)`);
    }

    console.log(`demo data: ${school.name} — ${demo.classes.length} classes, ${demo.banks.length} banks`);
    for (const u of demo.users) console.log(`  ${u.role.padEnd(8)} ${u.email}  password: ${u.password}`);
  } finally {
    await app.close();
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
