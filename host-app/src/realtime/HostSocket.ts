import type { HostClientEvents, HostServerEvents } from '@covalent/shared-types';

/**
 * The part of a socket.io client socket the host connection uses. Narrow on purpose, so a
 * test can hand in a fake instead of a network socket.
 */
export interface HostSocket {
  on<E extends keyof HostServerEvents>(event: E, listener: HostServerEvents[E]): unknown;
  on(event: 'connect' | 'disconnect', listener: () => void): unknown;
  on(event: 'connect_error', listener: (error: Error & { data?: unknown }) => void): unknown;
  emit<E extends keyof HostClientEvents>(event: E, ...args: Parameters<HostClientEvents[E]>): unknown;
  disconnect(): unknown;
}
