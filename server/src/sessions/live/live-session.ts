import type { MixerSummary, PlayerStatus, SessionDto, TeamPattern } from '@covalent/shared-types';
import { checkAnswer } from '../../scoring/domain/answer-check';
import { createRng } from '../../mixer/domain';
import { SessionEngine, type Clock, type EngineDeps, type RoundResults, type SessionState } from '../domain';
import type { SessionItem, SessionSettings } from '../entities/session.entity';
import { SerialQueue } from './serial-queue';

export interface LivePlayer {
  id: string;
  nickname: string;
  rosterEntryId: string | null;
  tableGroup: string | null;
  timeMultiplier: number;
  teamId: string | null;
  number: number | null;
  /** Before the start (players are not in the engine yet); afterwards the engine's status wins. */
  status: PlayerStatus;
  tokenVersion: number;
}

export interface LiveTeam {
  id: string;
  position: number;
  name: string;
  colour: string;
  pattern: TeamPattern;
}

/** Everything about a session that is not the engine's: set up once, changed only inside the queue. */
export interface LiveSessionMeta {
  id: string;
  ownerId: string;
  schoolId: string;
  classId: string | null;
  className: string | null;
  bankId: string | null;
  bankTitle: string;
  joinCode: string;
  format: SessionDto['format'];
  settings: SessionSettings;
  items: SessionItem[];
  seed: string;
  mixerSeed: string | null;
  mixerSummary: MixerSummary | null;
  joiningLocked: boolean;
  createdAt: Date;
  startedAt: Date | null;
  endedAt: Date | null;
}

/**
 * A clock that can be pinned to a past instant: replaying stored answers after a
 * restart runs the engine at each answer's receipt time, so nothing closes early.
 */
export class PinnableClock implements Clock {
  private pinned: number | null = null;
  constructor(private readonly base: Clock) {}
  now(): number {
    return this.pinned ?? this.base.now();
  }
  pin(at: number | null): void {
    this.pinned = at;
  }
}

/** One live session in memory: its engine, its people, and its single queue of changes. */
export class LiveSession {
  readonly queue = new SerialQueue();
  readonly clock: PinnableClock;
  engine: SessionEngine;
  players = new Map<string, LivePlayer>();
  teams: LiveTeam[] = [];
  /** Results of revealed rounds (what players may see). */
  readonly revealed = new Map<number, RoundResults>();
  /** Rounds whose results are stored on the response rows. */
  readonly resultsStored = new Set<number>();
  /** Highest responses.seq applied to the engine. */
  lastSeq = 0;
  /** Responses applied since the last stored snapshot. */
  unsnapshotted = 0;
  timer: NodeJS.Timeout | null = null;
  /** Sockets per player, and the pending "away" marks of dropped ones. */
  readonly sockets = new Map<string, number>();
  readonly awayTimers = new Map<string, NodeJS.Timeout>();

  constructor(
    public meta: LiveSessionMeta,
    baseClock: Clock,
    snapshot: SessionState | null,
  ) {
    this.clock = new PinnableClock(baseClock);
    if (snapshot) {
      this.engine = SessionEngine.fromSnapshot(snapshot, this.deps());
    } else {
      const created = SessionEngine.create(
        {
          config: {
            format: meta.format,
            items: meta.items.map((i) => ({ id: i.id })),
            roundLimitMs: meta.settings.roundSeconds * 1000,
            speedWeight: meta.settings.speedWeight,
            standings: meta.settings.standings,
          },
        },
        this.deps(),
      );
      if (!created.ok) throw new Error(`cannot create the session engine: ${created.message}`);
      this.engine = created.engine;
    }
  }

  /** Fresh dependencies: a new rng from the seed (fromSnapshot fast-forwards it by the recorded draws). */
  deps(): EngineDeps {
    return {
      clock: this.clock,
      rng: createRng(this.meta.seed),
      check: (itemIndex, response) => {
        const item = this.meta.items[itemIndex];
        return item ? checkAnswer(item, response as never) : { credit: 0, correct: false };
      },
    };
  }

  /** Puts the engine back as it was before a change the database refused. */
  rollback(snapshot: SessionState): void {
    this.engine = SessionEngine.fromSnapshot(snapshot, this.deps());
  }

  get id(): string {
    return this.meta.id;
  }

  get started(): boolean {
    return this.engine.status !== 'lobby';
  }

  /** Players not removed, in join order. */
  activePlayers(): LivePlayer[] {
    return [...this.players.values()].filter((p) => this.statusOf(p.id) !== 'removed');
  }

  statusOf(playerId: string): PlayerStatus {
    return this.engine.player(playerId)?.status ?? this.players.get(playerId)?.status ?? 'removed';
  }

  membersOf(teamId: string): LivePlayer[] {
    return this.activePlayers()
      .filter((p) => p.teamId === teamId)
      .sort((a, b) => (a.number ?? 0) - (b.number ?? 0));
  }
}
