import { Inject, Injectable, Logger, OnApplicationBootstrap, OnModuleDestroy } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { DELETED_NICKNAME_KEY_PREFIX } from '../debrief/player-data';
import { PlayerDataService } from './player-data.service';
import { DAY_MS, RETENTION_CLOCK, RETENTION_EVERY_MS, type RetentionClock } from './retention.constants';

export interface RetentionReport {
  sessions: number;
  players: number;
  responses: number;
}

/**
 * Deletes player data older than the school's retentionDays (DESIGN.md §9: retention under
 * the school's control). A session's age is its end; sessions stay, their players counted as removed.
 */
@Injectable()
export class RetentionService implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger(RetentionService.name);
  private timer: NodeJS.Timeout | null = null;

  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly playerData: PlayerDataService,
    @Inject(RETENTION_CLOCK) private readonly clock: RetentionClock,
  ) {}

  onApplicationBootstrap(): void {
    this.timer = setInterval(() => {
      this.runOnce().catch((err: Error) => this.logger.error(`retention run failed: ${err.message}`));
    }, RETENTION_EVERY_MS);
    // Never keeps the process alive on its own.
    this.timer.unref();
  }

  onModuleDestroy(): void {
    if (this.timer) clearInterval(this.timer);
    this.timer = null;
  }

  /** One pass over every school; what the daily timer calls and tests call directly. */
  async runOnce(): Promise<RetentionReport> {
    const now = this.clock.now();
    const due: { session_id: string; player_ids: string[] }[] = await this.db.query(
      `SELECT s.id AS session_id, array_agg(sp.id) AS player_ids
       FROM sessions s JOIN schools sc ON sc.id = s.school_id JOIN session_players sp ON sp.session_id = s.id
       WHERE s.status = 'ended' AND COALESCE(s.ended_at, s.created_at) < $1::timestamptz - make_interval(secs => sc.retention_days * $2::float8)
         AND NOT starts_with(sp.nickname_key, $3)
       GROUP BY s.id`,
      [new Date(now), DAY_MS / 1000, DELETED_NICKNAME_KEY_PREFIX],
    );
    const report: RetentionReport = { sessions: 0, players: 0, responses: 0 };
    for (const { session_id, player_ids } of due) {
      report.responses += await this.db.transaction((m) => this.playerData.erase(m, session_id, player_ids));
      report.sessions += 1;
      report.players += player_ids.length;
    }
    if (report.players) this.logger.log(`retention removed ${report.players} player(s) in ${report.sessions} session(s)`);
    return report;
  }
}
