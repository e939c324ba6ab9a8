import { NAMESPACES, PROTOCOL_VERSION, type HostClientEvents, type HostHandshake, type HostServerEvents } from '@covalent/shared-types';
import { io, type Socket } from 'socket.io-client';
import type { HostSocket } from './HostSocket';

/** The real socket: the host namespace on this origin; the sign-in cookie authenticates. */
export function createIoHostSocket(sessionId: string): HostSocket {
  const auth: HostHandshake = { sessionId, protocolVersion: PROTOCOL_VERSION };
  const socket: Socket<HostServerEvents, HostClientEvents> = io(NAMESPACES.host, { auth: { ...auth }, withCredentials: true });
  return socket;
}
