import { Inject, Logger } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { ConnectedSocket, MessageBody, OnGatewayConnection, OnGatewayDisconnect, OnGatewayInit, SubscribeMessage, WebSocketGateway } from '@nestjs/websockets';
import { NAMESPACES, PROTOCOL_VERSION, type Ack, type PlayerClientEvents, type PlayerHandshake, type PlayerServerEvents, type PlayerSessionView } from '@covalent/shared-types';
import type { Socket } from 'socket.io';
import { appConfig } from '../../config/app.config';
import type { LiveSession } from '../live/live-session';
import { LiveSessionsService } from '../live/live-sessions.service';
import { parseClockSync, parseEmpty, parseLock, parseSubmit } from '../live/payloads';
import { rooms, SessionEmitter, type PlayerNamespace } from '../live/session-emitter.service';
import { verifyPlayerToken } from '../player-token';
import { SessionsService } from '../sessions.service';
import { SESSION_TUNING, SOCKET_OPTIONS, type SessionTuning } from '../sessions.constants';
import { connectError, overLimit } from './socket-auth';

interface PlayerSocketData {
  sessionId: string;
  playerId: string;
  tokenVersion: number;
  msgWindow?: number;
  msgCount?: number;
}
type PlayerSocket = Socket<PlayerClientEvents, PlayerServerEvents, Record<string, never>, PlayerSocketData>;

const INTERNAL = { ok: false as const, error: 'internal', message: 'Something went wrong on the server. Try again.' };
const REMOVED = { ok: false as const, error: 'removed', message: 'You were removed from this session.' };

/** The students' player app: a signed player token, never an account. The player is always the token's, never the payload's. */
@WebSocketGateway({ namespace: NAMESPACES.player, ...SOCKET_OPTIONS })
export class PlayerGateway implements OnGatewayInit, OnGatewayConnection, OnGatewayDisconnect {
  private readonly logger = new Logger('PlayerGateway');

  constructor(
    private readonly live: LiveSessionsService,
    private readonly sessions: SessionsService,
    private readonly emitter: SessionEmitter,
    @Inject(SESSION_TUNING) private readonly tuning: SessionTuning,
    @Inject(appConfig.KEY) private readonly config: ConfigType<typeof appConfig>,
  ) {}

  afterInit(ns: PlayerNamespace): void {
    this.emitter.attachPlayers(ns);
    ns.use((socket, next) => {
      this.authenticate(socket as PlayerSocket).then(
        () => next(),
        (err: Error) => next(err),
      );
    });
  }

  private async authenticate(socket: PlayerSocket): Promise<void> {
    const hs = (socket.handshake.auth ?? {}) as Partial<PlayerHandshake>;
    if (hs.protocolVersion !== PROTOCOL_VERSION) throw connectError('protocol_mismatch', 'This app is out of date. Reload the page.');
    const claims = verifyPlayerToken(this.config.secret, hs.token);
    if (!claims) throw connectError('invalid_token', 'Join the session again with its code.');
    const s = this.live.get(claims.sessionId);
    if (!s) {
      const status = await this.sessions.statusOf(claims.sessionId);
      throw status === 'ended' ? connectError('session_ended', 'This session has ended.') : connectError('invalid_token', 'Join the session again with its code.');
    }
    const player = s.players.get(claims.playerId);
    if (!player) throw connectError('invalid_token', 'Join the session again with its code.');
    if (player.tokenVersion !== claims.tokenVersion || s.statusOf(player.id) === 'removed') throw connectError(REMOVED.error, REMOVED.message);
    socket.data = { sessionId: s.id, playerId: player.id, tokenVersion: claims.tokenVersion };
  }

  async handleConnection(socket: PlayerSocket): Promise<void> {
    const s = this.live.get(socket.data.sessionId);
    if (!s) {
      socket.disconnect(true);
      return;
    }
    const { playerId } = socket.data;
    await socket.join([rooms.session(s.id), rooms.player(playerId)]);
    try {
      const view = await this.live.connectPlayer(s, playerId);
      if (view.you.teamId) await socket.join(rooms.team(view.you.teamId));
      socket.emit('session:state', view);
    } catch (err) {
      this.logger.error(`connect of ${playerId} failed: ${String(err)}`);
    }
  }

  handleDisconnect(socket: PlayerSocket): void {
    const s = socket.data?.sessionId ? this.live.get(socket.data.sessionId) : undefined;
    if (s && socket.data.playerId) this.live.disconnectPlayer(s, socket.data.playerId);
  }

  @SubscribeMessage('answer:submit')
  submit(@ConnectedSocket() socket: PlayerSocket, @MessageBody() body: unknown): Promise<Ack<{ duplicate: boolean; locked: boolean; acceptedAt: number }>> {
    return this.guard<{ duplicate: boolean; locked: boolean; acceptedAt: number }>(socket, async (s) => {
      const payload = parseSubmit(body);
      if (!payload.ok) return payload;
      return this.live.submit(s, socket.data.playerId, payload.value);
    });
  }

  @SubscribeMessage('answer:lock')
  lock(@ConnectedSocket() socket: PlayerSocket, @MessageBody() body: unknown): Promise<Ack> {
    return this.guard(socket, async (s) => {
      const payload = parseLock(body);
      if (!payload.ok) return payload;
      return this.live.lock(s, socket.data.playerId, payload.value.roundIndex);
    });
  }

  @SubscribeMessage('clock:sync')
  clock(@ConnectedSocket() socket: PlayerSocket, @MessageBody() body: unknown): Promise<Ack<{ t0: number; serverNow: number }>> {
    return this.guard<{ t0: number; serverNow: number }>(socket, async () => {
      const p = parseClockSync(body);
      return p.ok ? { ok: true as const, t0: p.value.t0, serverNow: this.live.serverNow() } : p;
    });
  }

  @SubscribeMessage('session:resync')
  resync(@ConnectedSocket() socket: PlayerSocket, @MessageBody() body: unknown): Promise<Ack<{ view: PlayerSessionView }>> {
    return this.guard<{ view: PlayerSessionView }>(socket, async (s) => {
      const p = parseEmpty(body);
      return p.ok ? { ok: true as const, view: this.live.playerView(s, socket.data.playerId) } : p;
    });
  }

  /** The token must still be current (removal bumps it); every failure still gets an ack. */
  private async guard<T extends object>(socket: PlayerSocket, run: (s: LiveSession) => Promise<Ack<T>>): Promise<Ack<T>> {
    if (overLimit(socket.data, this.tuning.messagesPerSecond, Date.now())) {
      return { ok: false, error: 'rate_limited', message: 'Too many messages; slow down.' };
    }
    try {
      const s = this.live.get(socket.data.sessionId);
      if (!s) return { ok: false, error: 'session_ended', message: 'This session has ended.' };
      const player = s.players.get(socket.data.playerId);
      if (!player || player.tokenVersion !== socket.data.tokenVersion || s.statusOf(player.id) === 'removed') {
        socket.disconnect(true);
        return REMOVED;
      }
      return await run(s);
    } catch (err) {
      this.logger.error(err instanceof Error ? (err.stack ?? err.message) : String(err));
      return INTERNAL;
    }
  }
}
