import type { HostCommand } from '@covalent/shared-types';
import { useHostSessionStore } from '@/stores/useHostSessionStore';
import { createIoHostSocket } from './createIoHostSocket';
import { HostConnection, type HostSocketFactory } from './HostConnection';

let socketFactory: HostSocketFactory = createIoHostSocket;
let connection: HostConnection | null = null;

/** Tests hand in a fake socket here; `null` restores the real one. */
export function setHostSocketFactory(factory: HostSocketFactory | null): void {
  socketFactory = factory ?? createIoHostSocket;
}

/** Connects the host screen to one session (closing any other). */
export function openHostSession(sessionId: string): void {
  closeHostSession();
  connection = new HostConnection({ sessionId, createSocket: socketFactory });
  connection.start();
}

export function closeHostSession(): void {
  connection?.stop();
  connection = null;
  useHostSessionStore.getState().reset();
}

/** Sends a command; resolves true when the server accepted it (its message lands in the store otherwise). */
export async function sendHostCommand(command: HostCommand): Promise<boolean> {
  if (!connection) return false;
  return (await connection.send(command)).ok;
}

export async function resyncHostSession(): Promise<void> {
  await connection?.resync();
}
