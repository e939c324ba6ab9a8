import { AddressInfo, connect, createServer, Server, Socket } from 'node:net';
import { FaultProxy } from './faults/fault-proxy';

/** A TCP echo server: the simplest peer whose replies show what the proxy let through. */
async function echoServer(): Promise<Server> {
  const server = createServer((s) => s.pipe(s));
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  return server;
}

function open(port: number): Promise<Socket> {
  return new Promise((resolve, reject) => {
    const s = connect(port, '127.0.0.1', () => resolve(s));
    s.once('error', reject);
  });
}

function collect(s: Socket): { text: () => string } {
  let data = '';
  s.on('data', (d) => (data += d.toString()));
  return { text: () => data };
}

const until = async (cond: () => boolean, ms = 3000): Promise<void> => {
  const end = Date.now() + ms;
  while (!cond()) {
    if (Date.now() > end) throw new Error('timed out waiting');
    await new Promise((r) => setTimeout(r, 5));
  }
};

describe(FaultProxy.name, () => {
  let echo: Server;
  let proxy: FaultProxy;

  beforeEach(async () => {
    echo = await echoServer();
    let seed = 1;
    // A fixed linear congruential sequence (Numerical Recipes constants) keeps jitter repeatable.
    proxy = new FaultProxy((echo.address() as AddressInfo).port, () => ((seed = (seed * 1664525 + 1013904223) % 2 ** 32) / 2 ** 32));
    await proxy.listen();
  });
  afterEach(async () => {
    await proxy.close();
    await new Promise((r) => echo.close(r));
  });

  it('passes bytes through unchanged when clean', async () => {
    const s = await open(proxy.port);
    const got = collect(s);
    s.write('hello');
    await until(() => got.text() === 'hello');
    s.destroy();
  });

  it('adds the configured delay in each direction and keeps byte order under jitter', async () => {
    proxy.defaultProfile = { delayMs: 40, jitterMs: 20, resetChance: 0, blackhole: false };
    const s = await open(proxy.port);
    const got = collect(s);
    const started = Date.now();
    for (let i = 0; i < 20; i++) s.write(`${i},`);
    const expected = Array.from({ length: 20 }, (_, i) => `${i},`).join('');
    await until(() => got.text() === expected);
    // Two one-way trips of at least 40 − 20 ms each.
    expect(Date.now() - started).toBeGreaterThanOrEqual(40);
    s.destroy();
  });

  it('holds traffic in a black hole and releases it, in order, when the hole closes', async () => {
    const s = await open(proxy.port);
    const got = collect(s);
    await until(() => proxy.connections === 1);
    proxy.setProfile({ blackhole: true });
    s.write('abc');
    await new Promise((r) => setTimeout(r, 150));
    expect(got.text()).toBe('');
    proxy.setProfile({ blackhole: false });
    await until(() => got.text() === 'abc');
    s.destroy();
  });

  it('resets a connection so the client sees ECONNRESET', async () => {
    const s = await open(proxy.port);
    await until(() => proxy.connections === 1);
    const err = new Promise<NodeJS.ErrnoException>((resolve) => s.once('error', resolve));
    expect(proxy.resetConnections()).toBe(1);
    expect((await err).code).toBe('ECONNRESET');
  });

  it('gives a fifth of the connections their own profile through `assign`', async () => {
    proxy.assign = (n) => ({ delayMs: 0, jitterMs: 0, resetChance: 0, blackhole: n % 5 === 0 });
    const sockets = await Promise.all(Array.from({ length: 10 }, () => open(proxy.port)));
    const got = sockets.map(collect);
    sockets.forEach((s) => s.write('x'));
    await until(() => got.filter((g) => g.text() === 'x').length === 8);
    await new Promise((r) => setTimeout(r, 100));
    expect(got.filter((g) => g.text() === '').length).toBe(2);
    sockets.forEach((s) => s.destroy());
  });
});
