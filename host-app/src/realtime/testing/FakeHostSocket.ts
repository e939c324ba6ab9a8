import type { Ack, HostCommand, HostSessionView } from '@covalent/shared-types';
import type { HostSocket } from '../HostSocket';

type Listener = (...args: never[]) => void;
// Loosely typed on purpose: the fake answers whichever event it is sent.
type AnyAck = (ack: never) => void;
const reply = (ack: AnyAck, value: unknown): void => (ack as (a: unknown) => void)(value);

/**
 * A stand-in for the host socket in tests: records what the app emits, lets the test push
 * server events, and answers commands with whatever `answer` returns.
 */
export class FakeHostSocket implements HostSocket {
  readonly listeners = new Map<string, Listener[]>();
  readonly commands: HostCommand[] = [];
  readonly emitted: { event: string; payload: unknown }[] = [];
  disconnected = false;
  /** How the fake server answers a command; by default it refuses politely. */
  answer: (command: HostCommand) => Ack<{ view: HostSessionView }> = () => ({ ok: false, error: 'fake', message: 'No answer set.' });
  /** The server clock the fake reports to `clock:sync`. */
  serverNow: () => number = () => Date.now();
  /** Current view returned by `session:resync`; null means the fake never answers it. */
  view: HostSessionView | null = null;

  on(event: string, listener: Listener): this {
    this.listeners.set(event, [...(this.listeners.get(event) ?? []), listener]);
    return this;
  }

  emit(event: string, payload: unknown, ack: AnyAck): this {
    this.emitted.push({ event, payload });
    if (event === 'host:command') {
      this.commands.push(payload as HostCommand);
      reply(ack, this.answer(payload as HostCommand));
    } else if (event === 'clock:sync') {
      reply(ack, { ok: true, t0: (payload as { t0: number }).t0, serverNow: this.serverNow() });
    } else if (event === 'session:resync' && this.view) {
      reply(ack, { ok: true, view: this.view });
    }
    return this;
  }

  disconnect(): this {
    this.disconnected = true;
    return this;
  }

  /** Plays a server event (or `connect`) to every registered listener. */
  serverSends(event: string, ...args: unknown[]): void {
    for (const listener of this.listeners.get(event) ?? []) (listener as (...a: unknown[]) => void)(...args);
  }
}
