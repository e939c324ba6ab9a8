import { Injectable } from '@nestjs/common';
import type { HostClientEvents, HostServerEvents, PlayerClientEvents, PlayerServerEvents } from '@covalent/shared-types';
import type { Namespace } from 'socket.io';

export type PlayerNamespace = Namespace<PlayerClientEvents, PlayerServerEvents>;
export type HostNamespace = Namespace<HostClientEvents, HostServerEvents>;

/** Room names: one place, so gateways and the emitter agree. */
export const rooms = {
  session: (sessionId: string) => `session:${sessionId}`,
  host: (sessionId: string) => `session:${sessionId}:host`,
  team: (teamId: string) => `team:${teamId}`,
  player: (playerId: string) => `player:${playerId}`,
};

/**
 * The one way services talk to sockets (STYLE.md rule 3): typed by the
 * shared-types event maps. The gateways hand over their namespaces at init.
 */
@Injectable()
export class SessionEmitter {
  private play: PlayerNamespace | null = null;
  private hosts: HostNamespace | null = null;

  attachPlayers(ns: PlayerNamespace): void {
    this.play = ns;
  }

  attachHosts(ns: HostNamespace): void {
    this.hosts = ns;
  }

  toPlayer<E extends keyof PlayerServerEvents>(playerId: string, event: E, ...args: Parameters<PlayerServerEvents[E]>): void {
    this.play?.to(rooms.player(playerId)).emit(event, ...args);
  }

  toTeam<E extends keyof PlayerServerEvents>(teamId: string, event: E, ...args: Parameters<PlayerServerEvents[E]>): void {
    this.play?.to(rooms.team(teamId)).emit(event, ...args);
  }

  toSession<E extends keyof PlayerServerEvents>(sessionId: string, event: E, ...args: Parameters<PlayerServerEvents[E]>): void {
    this.play?.to(rooms.session(sessionId)).emit(event, ...args);
  }

  toHosts<E extends keyof HostServerEvents>(sessionId: string, event: E, ...args: Parameters<HostServerEvents[E]>): void {
    this.hosts?.to(rooms.host(sessionId)).emit(event, ...args);
  }

  /** A player's sockets leave their old team room and join the new one. */
  moveToTeam(playerId: string, from: string | null, to: string | null): void {
    if (!this.play || from === to) return;
    if (from) this.play.in(rooms.player(playerId)).socketsLeave(rooms.team(from));
    if (to) this.play.in(rooms.player(playerId)).socketsJoin(rooms.team(to));
  }

  disconnectPlayer(playerId: string): void {
    this.play?.in(rooms.player(playerId)).disconnectSockets(true);
  }

  disconnectSession(sessionId: string): void {
    this.play?.in(rooms.session(sessionId)).disconnectSockets(true);
  }
}
