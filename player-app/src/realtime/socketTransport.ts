import {
  NAMESPACES,
  type Ack,
  type AckFn,
  type PlayerClientEvents,
  type PlayerHandshake,
  type PlayerServerEvents,
} from '@covalent/shared-types';

export type CommandName = keyof PlayerClientEvents;
export type CommandPayload<E extends CommandName> = Parameters<PlayerClientEvents[E]>[0];
export type CommandAck<E extends CommandName> =
  Parameters<PlayerClientEvents[E]>[1] extends AckFn<infer T> ? Ack<T> : never;

type Listener<E extends keyof PlayerServerEvents> = PlayerServerEvents[E];

/**
 * The slice of a socket.io client socket that `PlayerSocket` uses. Narrow on purpose, so tests
 * can hand in a small fake instead of a network socket.
 */
export interface PlayerSocketTransport {
  /** socket.io: false once the client has given up reconnecting (e.g. refused by middleware). */
  readonly active: boolean;
  on(event: 'connect', listener: () => void): unknown;
  on(event: 'disconnect', listener: (reason: string) => void): unknown;
  on(event: 'connect_error', listener: (error: Error & { data?: unknown }) => void): unknown;
  on<E extends keyof PlayerServerEvents>(event: E, listener: Listener<E>): unknown;
  timeout(ms: number): {
    emitWithAck<E extends CommandName>(event: E, payload: CommandPayload<E>): Promise<CommandAck<E>>;
  };
  connect(): unknown;
  disconnect(): unknown;
}

export type SocketFactory = (auth: PlayerHandshake) => Promise<PlayerSocketTransport>;

/**
 * The real socket, same origin (the server serves this app under /play/, socket.io on its
 * default path). Loaded on demand so the join screen does not pay for socket.io-client.
 */
export const createSocketIoTransport: SocketFactory = async (auth) => {
  const { io } = await import('socket.io-client');
  const socket = io(NAMESPACES.player, {
    auth: { ...auth },
    transports: ['websocket', 'polling'],
    autoConnect: false,
  });
  // socket.io's overloaded generic signatures do not line up with the narrow interface.
  return socket as unknown as PlayerSocketTransport;
};
