import seedrandom from 'seedrandom';
import type { Socket } from 'socket.io-client';
import type { DataSource } from 'typeorm';
import { connectHostTo, connectPlayerTo, History, hostCommand, until, type Player } from '../helpers/history';
import { openDatabase, ServerProcess, setUpSession, type LiveFixture } from '../helpers/server-process';
import { resetDatabase } from '../helpers/test-app';
import { FaultProxy, type FaultProfile } from './fault-proxy';

/** A solo session with round 0 open: each player behind a proxy of their own, so a fault hits exactly the players chosen. */
export interface FaultTable {
  fx: LiveFixture;
  players: Player[];
  proxies: FaultProxy[];
  host: Socket;
  history: History;
}

/**
 * What the fault suites share: the built server, a database handle, and the sockets and proxies
 * each test opens (closed after it). Call `hooks()` inside the suite's describe.
 */
export class FaultRig {
  server!: ServerProcess;
  db!: DataSource;
  private open: { proxies: FaultProxy[]; sockets: Socket[] } = { proxies: [], sockets: [] };

  hooks(afterEachCheck?: () => void): void {
    beforeAll(async () => {
      // Clean tables first, as every suite does: nothing stale to restore at boot, no clashing test e-mails.
      this.db = await openDatabase();
      await resetDatabase(this.db);
      this.server = await ServerProcess.start();
    }, 30_000);
    afterAll(async () => {
      await this.server?.stop();
      await this.db?.destroy().catch(() => undefined);
    });
    afterEach(async () => {
      for (const s of this.open.sockets) s.close();
      for (const p of this.open.proxies) await p.close();
      this.open = { proxies: [], sockets: [] };
      afterEachCheck?.();
    });
  }

  /** Keeps a socket to close after the test. */
  track(socket: Socket): Socket {
    this.open.sockets.push(socket);
    return socket;
  }

  /** `n` players named `<prefix><seed[0..4]><i>`, each through their own seeded proxy; the session started and round 0 open. */
  async table(n: number, roundSeconds: number, seed: string, prefix: string, profile?: Partial<FaultProfile>): Promise<FaultTable> {
    const nicknames = Array.from({ length: n }, (_, i) => `${prefix}${seed.slice(0, 4)}${i}`);
    const fx = await setUpSession(this.server, this.db, nicknames, { format: 'solo', roundSeconds, teamCount: 2, speedWeight: 0.5 });
    const proxies: FaultProxy[] = [];
    const players: Player[] = [];
    for (const [i, p] of fx.players.entries()) {
      // The proxy keeps its port across a server restart, as a player's network path would.
      const proxy = new FaultProxy(this.server.port, seedrandom(`${seed}:${i}`));
      if (profile) proxy.defaultProfile = { ...proxy.defaultProfile, ...profile };
      await proxy.listen();
      proxies.push(proxy);
      this.open.proxies.push(proxy);
      const player = await connectPlayerTo(`http://127.0.0.1:${proxy.port}`, p);
      this.track(player.socket);
      players.push(player);
    }
    const host = this.track(await connectHostTo(this.server.url, fx.sessionId, fx.cookie));
    expect(await hostCommand(host, { type: 'start' })).toMatchObject({ ok: true });
    expect(await hostCommand(host, { type: 'open_round' })).toMatchObject({ ok: true });
    await until(() => players.every((p) => p.deadlines.has(0)), 5000, 'round 0 to open for everyone');
    return { fx, players, proxies, host, history: new History() };
  }

  /** Scored final rows of one round. */
  scored(sessionId: string, round: number): Promise<{ player_id: string; points: number }[]> {
    return this.db.query(`SELECT player_id, points FROM responses WHERE session_id = $1 AND round_index = $2 AND final AND points IS NOT NULL`, [sessionId, round]);
  }
}

export const rightAnswer = (t: FaultTable, round: number) => ({ type: 'single', optionId: t.fx.items[round].key.correctOptionId as string });
export const wrongAnswer = (t: FaultTable, round: number) => ({
  type: 'single',
  optionId: t.fx.items[round].options.find((o) => o.id !== t.fx.items[round].key.correctOptionId)!.id,
});
