import { Inject, Logger } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { ConnectedSocket, MessageBody, OnGatewayConnection, OnGatewayInit, SubscribeMessage, WebSocketGateway } from '@nestjs/websockets';
import { NAMESPACES, PROTOCOL_VERSION, type Ack, type HostClientEvents, type HostHandshake, type HostServerEvents, type HostSessionView } from '@covalent/shared-types';
import type { Socket } from 'socket.io';
import { SESSION_COOKIE } from '../../auth/auth.constants';
import { AuthService } from '../../auth/auth.service';
import { appConfig } from '../../config/app.config';
import { LiveSessionsService } from '../live/live-sessions.service';
import { parseClockSync, parseEmpty, parseHostCommand } from '../live/payloads';
import { rooms, SessionEmitter, type HostNamespace } from '../live/session-emitter.service';
import { SessionsService } from '../sessions.service';
import { SESSION_TUNING, SOCKET_OPTIONS, type SessionTuning } from '../sessions.constants';
import { connectError, overLimit, readCookie, UUID } from './socket-auth';

interface HostSocketData {
  sessionId: string;
  userId: string;
  msgWindow?: number;
  msgCount?: number;
}
type HostSocket = Socket<HostClientEvents, HostServerEvents, Record<string, never>, HostSocketData>;

const INTERNAL = { ok: false as const, error: 'internal', message: 'Something went wrong on the server. Nothing was changed.' };

/** The teacher's host screen: signed-in owner, co-teacher of the class, or admin of the school only. */
@WebSocketGateway({ namespace: NAMESPACES.host, ...SOCKET_OPTIONS })
export class HostGateway implements OnGatewayInit, OnGatewayConnection {
  private readonly logger = new Logger('HostGateway');

  constructor(
    private readonly auth: AuthService,
    private readonly sessions: SessionsService,
    private readonly live: LiveSessionsService,
    private readonly emitter: SessionEmitter,
    @Inject(SESSION_TUNING) private readonly tuning: SessionTuning,
    @Inject(appConfig.KEY) private readonly config: ConfigType<typeof appConfig>,
  ) {}

  /** Authentication runs as namespace middleware, so a refused socket never reaches a handler. */
  afterInit(ns: HostNamespace): void {
    this.emitter.attachHosts(ns);
    ns.use((socket, next) => {
      this.authenticate(socket as HostSocket).then(
        () => next(),
        (err: Error) => next(err),
      );
    });
  }

  private async authenticate(socket: HostSocket): Promise<void> {
    const hs = (socket.handshake.auth ?? {}) as Partial<HostHandshake>;
    if (hs.protocolVersion !== PROTOCOL_VERSION) {
      throw connectError('protocol_mismatch', 'This screen is out of date. Reload the page.');
    }
    if (typeof hs.sessionId !== 'string' || !UUID.test(hs.sessionId)) throw connectError('invalid_handshake', 'Open a session to host it.');
    const origin = socket.handshake.headers.origin;
    if (origin && origin !== this.config.publicUrl && new URL(origin).host !== socket.handshake.headers.host) {
      throw connectError('bad_origin', 'This page may not open the host screen.');
    }
    const user = await this.auth.userForSession(readCookie(socket.handshake.headers.cookie, SESSION_COOKIE));
    if (!user) throw connectError('unauthenticated', 'Please sign in.');
    const sessionId = hs.sessionId.toLowerCase();
    const s = this.live.get(sessionId);
    if (!s) {
      const status = await this.sessions.statusOf(sessionId);
      throw status === 'ended' ? connectError('session_ended', 'This session has ended.') : connectError('not_found', 'No such session.');
    }
    if (!(await this.sessions.canHost(user, s.meta))) throw connectError('forbidden', 'You cannot host this session.');
    socket.data = { sessionId, userId: user.id };
  }

  handleConnection(socket: HostSocket): void {
    const s = this.live.get(socket.data.sessionId);
    if (!s) {
      socket.disconnect(true);
      return;
    }
    void socket.join(rooms.host(s.id));
    socket.emit('host:state', this.live.hostView(s));
  }

  @SubscribeMessage('host:command')
  command(@ConnectedSocket() socket: HostSocket, @MessageBody() body: unknown): Promise<Ack<{ view: HostSessionView }>> {
    return this.guard<{ view: HostSessionView }>(socket, async () => {
      const s = this.live.get(socket.data.sessionId);
      if (!s) return { ok: false, error: 'session_ended', message: 'This session has ended.' };
      const command = parseHostCommand(body);
      if (!command.ok) return command;
      return this.live.hostCommand(s, command.value);
    });
  }

  @SubscribeMessage('clock:sync')
  clock(@ConnectedSocket() socket: HostSocket, @MessageBody() body: unknown): Promise<Ack<{ t0: number; serverNow: number }>> {
    return this.guard<{ t0: number; serverNow: number }>(socket, async () => {
      const p = parseClockSync(body);
      return p.ok ? { ok: true as const, t0: p.value.t0, serverNow: this.live.serverNow() } : p;
    });
  }

  @SubscribeMessage('session:resync')
  resync(@ConnectedSocket() socket: HostSocket, @MessageBody() body: unknown): Promise<Ack<{ view: HostSessionView }>> {
    return this.guard<{ view: HostSessionView }>(socket, async () => {
      const p = parseEmpty(body);
      if (!p.ok) return p;
      const s = this.live.get(socket.data.sessionId);
      return s ? { ok: true as const, view: this.live.hostView(s) } : { ok: false, error: 'session_ended', message: 'This session has ended.' };
    });
  }

  /** Every handler answers with an ack, also when it fails in a way nobody planned for. */
  private async guard<T extends object>(socket: HostSocket, run: () => Promise<Ack<T>>): Promise<Ack<T>> {
    if (overLimit(socket.data, this.tuning.messagesPerSecond, Date.now())) {
      return { ok: false, error: 'rate_limited', message: 'Too many messages; slow down.' };
    }
    try {
      return await run();
    } catch (err) {
      this.logger.error(err instanceof Error ? (err.stack ?? err.message) : String(err));
      return INTERNAL;
    }
  }
}
