import type { INestApplicationContext } from '@nestjs/common';
import type { ItemDto, ItemResponse } from '@covalent/shared-types';
import seedrandom from 'seedrandom';
import { DataSource } from 'typeorm';
import { ItemsService } from '../banks/items.service';
import { RosterService } from '../classes/roster.service';
import { JoinService } from '../sessions/join.service';
import { LiveSessionsService } from '../sessions/live/live-sessions.service';
import { SessionEntity } from '../sessions/entities/session.entity';
import { SessionsService } from '../sessions/sessions.service';
import { UserEntity } from '../users/entities/user.entity';

/** Invented results for the demo only: how likely a student is to get an item right. */
export interface DemoAnswerModel {
  /** Seed of the answers, so every seeded demo looks the same. */
  seed: string;
  /** Students of the class list who were absent that day. */
  absent: number;
}

const PLAYED_TYPES = new Set(['single', 'truefalse', 'order']);

/** A right answer, or a plausible wrong one (another option, the other truth value, two steps swapped). */
function demoResponse(item: ItemDto, right: boolean, rng: () => number): ItemResponse {
  const key = item.key;
  switch (key.type) {
    case 'single': {
      if (right) return { type: 'single', optionId: key.correctOptionId };
      const wrong = item.options.filter((o) => o.id !== key.correctOptionId);
      return { type: 'single', optionId: wrong[Math.floor(rng() * wrong.length)].id };
    }
    case 'truefalse':
      return { type: 'truefalse', value: right ? key.value : !key.value };
    case 'order': {
      const sequence = [...key.sequence];
      if (!right) {
        const i = Math.floor(rng() * (sequence.length - 1));
        [sequence[i], sequence[i + 1]] = [sequence[i + 1], sequence[i]];
      }
      return { type: 'order', sequence };
    }
    default:
      throw new Error(`the demo session plays single, truefalse and order items, not ${key.type}`);
  }
}

/**
 * Plays one ended session for a demo class through the live runtime itself (the same code a real
 * session runs), so the debrief, the class page and each student's history have something to
 * show on first start. Students pick themselves from the class list; answers are invented from a
 * seeded model. Skipped when the class already has an ended session of that bank.
 */
export async function seedDemoSession(
  app: INestApplicationContext,
  teacher: UserEntity,
  classId: string,
  bankId: string,
  model: DemoAnswerModel,
): Promise<string | null> {
  const db = app.get(DataSource);
  const sessions = app.get(SessionsService);
  const bankTitle = (await db.query('SELECT title FROM banks WHERE id = $1', [bankId]))[0]?.title as string | undefined;
  if (await db.getRepository(SessionEntity).exists({ where: { classId, bankTitle, status: 'ended' } })) return null;

  const items = (await app.get(ItemsService).list(teacher, bankId)).filter((i) => PLAYED_TYPES.has(i.type));
  const created = await sessions.create(teacher, {
    bankId,
    itemIds: items.map((i) => i.id),
    classId,
    format: 'solo',
    roundSeconds: 60,
    speedWeight: 0,
    standings: 'full',
    targetTeamSize: 4,
    mixerMode: 'mix-tables',
    namePack: 'elements',
  });
  try {
    const rng = seedrandom(model.seed);
    const roster = await app.get(RosterService).list(teacher, classId);
    const present = roster.filter((_, i) => i >= model.absent);
    const join = app.get(JoinService);
    const players: { id: string; ability: number }[] = [];
    for (const entry of present) {
      const joined = await join.join({ code: created.joinCode, rosterEntryId: entry.id }, 'demo-seed');
      players.push({ id: joined.playerId, ability: 0.45 + 0.5 * rng() });
    }

    const live = app.get(LiveSessionsService);
    const s = live.get(created.id);
    if (!s) throw new Error('the demo session did not go live');
    // As a phone's socket would: a round waits only for players who are there.
    for (const p of players) await live.connectPlayer(s, p.id);
    const command = async (type: 'start' | 'open_round' | 'close_round' | 'reveal' | 'next' | 'end') => {
      const done = await live.hostCommand(s, { type });
      // A round closes by itself once everyone has answered.
      if (!done.ok && !(type === 'close_round' && done.error === 'round_not_open')) throw new Error(`demo ${type}: ${done.message}`);
    };
    await command('start');
    for (const [r, item] of items.entries()) {
      if (r > 0) await command('next');
      await command('open_round');
      const difficulty = 0.35 * rng();
      for (const [i, p] of players.entries()) {
        const right = rng() < Math.min(0.97, Math.max(0.1, p.ability - difficulty + 0.15));
        const ack = await live.submit(s, p.id, { clientMessageId: `demo-${r}-${i}`, roundIndex: r, response: demoResponse(item, right, rng) });
        if (!ack.ok) throw new Error(`demo answer: ${ack.message}`);
      }
      await command('close_round');
      await command('reveal');
    }
    await command('end');
  } catch (err) {
    // Never leave a half-played demo behind: it would come back live at every start and the next seed
    // would play another. End it in memory (its timers stop), then delete it so a re-run starts afresh.
    const live = app.get(LiveSessionsService);
    const s = live.get(created.id);
    if (s) await live.hostCommand(s, { type: 'end' }).catch(() => undefined);
    await db.query('DELETE FROM sessions WHERE id = $1', [created.id]);
    throw err;
  }
  return created.id;
}
