import { HttpStatus, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DeletePlayerDataResponse } from '@covalent/shared-types';
import { DataSource, EntityManager } from 'typeorm';
import { ClassesService } from '../classes/classes.service';
import { closeEmptyCatchups } from '../catchup/close-empty-catchups';
import { ApiException } from '../common/api-error';
import { DELETED_NICKNAME, DELETED_NICKNAME_KEY_PREFIX } from '../debrief/player-data';
import { SessionEntity } from '../sessions/entities/session.entity';
import { SessionsService } from '../sessions/sessions.service';
import { UserEntity } from '../users/entities/user.entity';
import { scrubSnapshot } from './scrub-snapshot';

const notFound = (what: string) => new ApiException(HttpStatus.NOT_FOUND, 'not_found', `No such ${what}.`);

/**
 * Deletes players' data for real: their responses go, their row is anonymised (kept only so
 * the debrief counts them as removed), and their answers leave the stored snapshot.
 * Only ended sessions: a live session still holds its players in memory.
 */
@Injectable()
export class PlayerDataService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly sessions: SessionsService,
    private readonly classes: ClassesService,
  ) {}

  /** Inside the caller's transaction; returns how many responses were deleted. */
  async erase(m: EntityManager, sessionId: string, playerIds: string[]): Promise<number> {
    if (playerIds.length === 0) return 0;
    // Their catch-up cards (and answers, by cascade) were made from this session's responses: they go too.
    // Cards come only from a roster entry's player who was not removed; a removed earlier device of the
    // same student (same roster entry) must not take the cards of the one that stayed.
    await m.query(
      `DELETE FROM catchup_cards WHERE catchup_id IN (SELECT id FROM catchups WHERE session_id = $1)
         AND roster_entry_id IN (SELECT roster_entry_id FROM session_players
                                 WHERE session_id = $1 AND id = ANY($2) AND roster_entry_id IS NOT NULL AND removed_at IS NULL)`,
      [sessionId, playerIds],
    );
    await closeEmptyCatchups(m, { sessionId });
    const deleted: unknown[] = await m.query('DELETE FROM responses WHERE session_id = $1 AND player_id = ANY($2) RETURNING id', [sessionId, playerIds]);
    await m.query(
      `UPDATE session_players SET nickname = $3, nickname_key = $4 || id::text, roster_entry_id = NULL, table_group = NULL,
         status = 'removed', removed_at = COALESCE(removed_at, now()), token_version = token_version + 1, updated_at = now()
       WHERE session_id = $1 AND id = ANY($2)`,
      [sessionId, playerIds, DELETED_NICKNAME, DELETED_NICKNAME_KEY_PREFIX],
    );
    const row = await m.getRepository(SessionEntity).findOne({ where: { id: sessionId }, select: { id: true, snapshot: true } });
    if (row) {
      await m.query('UPDATE sessions SET snapshot = $2::jsonb WHERE id = $1', [sessionId, JSON.stringify(scrubSnapshot(row.snapshot, new Set(playerIds)))]);
    }
    // DELETE … RETURNING through the pg driver comes back as [rows, count].
    return Array.isArray(deleted[0]) ? (deleted[0] as unknown[]).length : deleted.length;
  }

  /** `DELETE /api/sessions/:id/players/:playerId/data`: anyone who may read the session's reports. */
  async deleteFromSession(user: UserEntity, sessionId: string, playerId: string): Promise<DeletePlayerDataResponse> {
    const row = await this.db.getRepository(SessionEntity).findOne({ where: { id: sessionId } });
    if (!row || !(await this.sessions.canHost(user, row))) throw notFound('session');
    if (row.status !== 'ended') {
      throw new ApiException(HttpStatus.CONFLICT, 'session_not_ended', "A student's data can be deleted once the session has ended.");
    }
    const found: unknown[] = await this.db.query('SELECT 1 FROM session_players WHERE id = $1 AND session_id = $2', [playerId, sessionId]);
    if (found.length === 0) throw notFound('player in this session');
    const deletedResponses = await this.db.transaction((m) => this.erase(m, sessionId, [playerId]));
    return { ok: true, deletedResponses };
  }

  /** `DELETE /api/classes/:classId/roster/:entryId/data`: the class's owner, across the class's ended sessions. */
  async deleteForRosterEntry(user: UserEntity, classId: string, entryId: string): Promise<DeletePlayerDataResponse> {
    await this.classes.access(user, classId, 'own');
    const players: { id: string; session_id: string }[] = await this.db.query(
      `SELECT sp.id, sp.session_id FROM session_players sp JOIN sessions s ON s.id = sp.session_id
       WHERE s.class_id = $1 AND s.status = 'ended' AND sp.roster_entry_id = $2`,
      [classId, entryId],
    );
    const entry: unknown[] = await this.db.query('SELECT 1 FROM roster_entries WHERE id = $1 AND class_id = $2', [entryId, classId]);
    if (entry.length === 0) throw notFound('roster entry');
    const bySession = new Map<string, string[]>();
    for (const p of players) bySession.set(p.session_id, [...(bySession.get(p.session_id) ?? []), p.id]);
    const deletedResponses = await this.db.transaction(async (m) => {
      let n = 0;
      for (const [sessionId, ids] of bySession) n += await this.erase(m, sessionId, ids);
      return n;
    });
    return { ok: true, deletedResponses };
  }
}
