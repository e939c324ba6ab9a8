import * as argon2 from 'argon2';
import { randomUUID } from 'node:crypto';
import type { Role } from '@covalent/shared-types';
import request from 'supertest';
import type { App } from 'supertest/types';
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

// ---- Authoring (banks, items, classes, media) ----

/** A signed-in supertest agent for a staff user. */
export async function signedIn(http: App, user: UserEntity): Promise<ReturnType<typeof request.agent>> {
  const a = request.agent(http);
  await a.post('/api/auth/sign-in').send({ email: user.email, password: PASSWORD }).expect(200);
  return a;
}

/** Item inputs as a client sends them, one per type; options without ids, keys pointing at "#index". */
export const itemInputs = {
  single: () => ({
    type: 'single',
    prompt: 'Which glassware delivers 10.0 mL most precisely?',
    options: [{ text: 'Beaker' }, { text: 'Volumetric pipette' }, { text: 'Conical flask' }],
    key: { type: 'single', correctOptionId: '#1' },
    explanation: 'It is calibrated to one volume.',
    tags: ['glassware'],
  }),
  multi: () => ({
    type: 'multi',
    prompt: 'Which are worn as protection?',
    options: [{ text: 'Goggles' }, { text: 'Fume cupboard' }, { text: 'Gloves' }],
    key: { type: 'multi', correctOptionIds: ['#0', '#2'] },
    tags: ['ppe'],
  }),
  truefalse: () => ({ type: 'truefalse', prompt: 'Bags go under the bench.', key: { type: 'truefalse', value: false } }),
  order: () => ({
    type: 'order',
    prompt: 'Order the exit steps.',
    options: [{ text: 'Wipe the bench' }, { text: 'Wash hands' }, { text: 'Collect bag' }],
    key: { type: 'order', sequence: ['#0', '#1', '#2'] },
  }),
  numeric: () => ({
    type: 'numeric',
    prompt: 'Density of 12.6 g in 4.50 mL?',
    key: { type: 'numeric', value: '2.80', unit: 'g/mL', tolerance: { kind: 'absolute', value: 0.01 }, sigFigs: 3 },
  }),
  text: () => ({
    type: 'text',
    prompt: 'Name the station for rinsing eyes.',
    key: { type: 'text', accepted: ['eyewash station', 'eyewash'], typoTolerance: true },
  }),
};

/** A 1×1 PNG: signature (PNG spec §5.2) then IHDR, IDAT, IEND chunks. */
export const TINY_PNG = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==',
  'base64',
);

/** Roster CSV rows for tests, header included. */
export function rosterCsv(rows: string[][]): Buffer {
  return Buffer.from(['display_name,table_group,seat_number,time_multiplier', ...rows.map((r) => r.join(','))].join('\n') + '\n');
}

// ---- Live sessions ----

/** A bank of the owner's with the given item inputs (see itemInputs), created through the API; returns ids and the stored items. */
export async function makeBankWithItems(
  agent: ReturnType<typeof request.agent>,
  inputs: object[],
  title = 'Lab entry & exit procedures',
): Promise<{ bankId: string; items: { id: string; type: string; prompt: string; options: { id: string; text: string }[]; key: any }[] }> {
  const bank = (await agent.post('/api/banks').send({ title }).expect(201)).body;
  const items = [];
  for (const input of inputs) items.push((await agent.post(`/api/banks/${bank.id}/items`).send(input).expect(201)).body);
  return { bankId: bank.id, items };
}

/** A CreateSessionRequest with test-friendly defaults. */
export function sessionRequest(bankId: string, overrides: Record<string, unknown> = {}): Record<string, unknown> {
  return {
    bankId,
    classId: null,
    format: 'huddle',
    roundSeconds: 30,
    speedWeight: 0.5,
    standings: 'full',
    teamCount: 2,
    mixerMode: 'random',
    namePack: 'elements',
    ...overrides,
  };
}

// ---- Debrief and retention ----

/**
 * An ended session written straight to the database (no sockets): `players` players, each with
 * one final answer to one true/false item. For suites that need stored results of a given age.
 */
export async function makeEndedSession(
  db: DataSource,
  opts: { school: SchoolEntity; owner: UserEntity; endedAt: Date; players?: number; classId?: string | null },
): Promise<{ sessionId: string; playerIds: string[] }> {
  const itemId = randomUUID();
  const sessionId = randomUUID();
  const item = { id: itemId, type: 'truefalse', prompt: 'Bags go under the bench.', options: [], key: { type: 'truefalse', value: false }, explanation: '', tags: ['procedures'], imageId: null };
  await db.query(
    `INSERT INTO sessions (id, owner_id, school_id, bank_title, class_id, join_code, status, format, settings, item_ids, items, seed, snapshot, started_at, ended_at)
     VALUES ($1, $2, $3, 'Lab entry & exit procedures', $4, 'QQQQQQ', 'ended', 'solo', $5::jsonb, $6::uuid[], $7::jsonb, 'seed', $8::jsonb, $9, $9)`,
    [
      sessionId, opts.owner.id, opts.school.id, opts.classId ?? null,
      JSON.stringify({ roundSeconds: 30, speedWeight: 0.5, standings: 'full', teamCount: 1, targetTeamSize: null, mixerMode: 'random', namePack: 'elements' }),
      [itemId], JSON.stringify([item]), JSON.stringify({ rounds: [], acceptances: [], players: [], teams: [] }), opts.endedAt,
    ],
  );
  await db.query(`INSERT INTO session_rounds (session_id, "index", item_id, status) VALUES ($1, 0, $2, 'revealed')`, [sessionId, itemId]);
  const playerIds: string[] = [];
  for (let i = 0; i < (opts.players ?? 2); i++) {
    const [p] = await db.query(
      `INSERT INTO session_players (session_id, nickname, nickname_key, status) VALUES ($1, $2, $3, 'connected') RETURNING id`,
      [sessionId, `Player ${i + 1}`, `player ${i + 1}`],
    );
    playerIds.push(p.id);
    await db.query(
      `INSERT INTO responses (session_id, round_index, player_id, client_message_id, kind, response, locked, credit, correct, points, final, elapsed_ms, received_at)
       VALUES ($1, 0, $2, 'm1', 'answer', $3::jsonb, true, $4, $5, $6, true, 1000, $7)`,
      [sessionId, p.id, JSON.stringify({ type: 'truefalse', value: i % 2 === 1 }), i % 2 === 0 ? 1 : 0, i % 2 === 0, i % 2 === 0 ? 1000 : 0, opts.endedAt],
    );
  }
  return { sessionId, playerIds };
}
