// The load generator: real socket.io clients on loopback, a seeded random source, open-loop
// answers timed from their intended send time (so a slow server cannot hide its queueing).
// Usage: node bench/load.mjs '<json options>'  → prints one JSON result line.
import { monitorEventLoopDelay } from 'node:perf_hooks';
import { randomUUID } from 'node:crypto';
import seedrandom from 'seedrandom';
import { io } from 'socket.io-client';
import { summarise } from './stats.mjs';

const opts = {
  target: 'real', // 'real' | 'echo'
  baseUrl: 'http://127.0.0.1:3200',
  players: 300,
  roomSize: 30,
  rounds: 4, // measured rounds; one warm-up round is played first and discarded
  pattern: 'spread', // 'spread' | 'burst'
  spreadSeconds: 4,
  seed: 'bench',
  email: '',
  password: '',
  bankId: '',
  duplicateShare: 0.02,
  lateShare: 0.01,
  ackTimeoutMs: 5000,
  ...JSON.parse(process.argv[2] ?? '{}'),
};
const rng = seedrandom(`${opts.seed}\0`);
const loop = monitorEventLoopDelay({ resolution: 10 });
const socketOpts = { transports: ['websocket'], reconnection: false, forceNew: true, timeout: 20000 };
const sleep = (ms) => new Promise((r) => setTimeout(r, ms));

async function http(method, path, body, cookie) {
  const res = await fetch(opts.baseUrl + path, {
    method,
    headers: { 'content-type': 'application/json', ...(cookie ? { cookie } : {}) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const text = await res.text();
  let json;
  try { json = JSON.parse(text); } catch { json = { raw: text }; }
  return { status: res.status, json, headers: res.headers };
}

async function pool(items, limit, fn) {
  const out = new Array(items.length);
  let next = 0;
  await Promise.all(Array.from({ length: limit }, async () => {
    while (next < items.length) { const i = next++; out[i] = await fn(items[i], i); }
  }));
  return out;
}

function connect(path, auth, headers) {
  return new Promise((resolve, reject) => {
    const s = io(opts.baseUrl + path, { ...socketOpts, auth, extraHeaders: headers });
    s.once('connect', () => resolve(s));
    s.once('connect_error', (e) => reject(new Error(`${path}: ${e.message}`)));
  });
}

async function command(host, cmd) {
  const ack = await host.socket.timeout(10000).emitWithAck('host:command', cmd);
  if (!ack?.ok) throw new Error(`host command ${cmd.type} refused: ${ack?.error} ${ack?.message}`);
  return ack;
}

async function main() {
  let cookie;
  if (opts.target === 'real') {
    const signIn = await http('POST', '/api/auth/sign-in', { email: opts.email, password: opts.password });
    if (signIn.status !== 200) throw new Error(`sign-in failed: ${signIn.status} ${JSON.stringify(signIn.json)}`);
    cookie = String(signIn.headers.get('set-cookie')).split(';')[0];
  }
  const sessionCount = Math.ceil(opts.players / opts.roomSize);
  const sessions = await pool(Array.from({ length: sessionCount }), 8, async () => {
    const res = await http('POST', '/api/sessions', {
      bankId: opts.bankId, classId: null, format: 'solo', roundSeconds: 30, speedWeight: 0.5, standings: 'none',
      targetTeamSize: 4, mixerMode: 'random', namePack: 'elements',
    }, cookie);
    if (res.status !== 201 && res.status !== 200) throw new Error(`create session: ${res.status} ${JSON.stringify(res.json)}`);
    return { id: res.json.id, joinCode: res.json.joinCode, players: [], host: null, openedAt: [], lastReceipt: [] };
  });
  const playerSpecs = Array.from({ length: opts.players }, (_, i) => ({ i, session: sessions[i % sessionCount] }));
  const connectStarted = Date.now();
  const players = await pool(playerSpecs, 50, async ({ i, session }) => {
    // Digits can read as letters to the nickname filter ("455"), so number players in consonants.
    const tag = String(i).replace(/\d/g, (d) => 'bcdghjmnpq'[Number(d)]);
    let join;
    for (const nickname of [`Player ${tag}`, `Seat ${tag} q`]) {
      join = await http('POST', '/api/play/join', { code: session.joinCode, nickname });
      if (join.json?.error !== 'nickname_not_allowed') break;
    }
    if (!join.json?.ok) throw new Error(`join: ${join.status} ${JSON.stringify(join.json)}`);
    const socket = await connect('/play', { token: join.json.playerToken, protocolVersion: 1 });
    const p = { i, session, socket, playerId: join.json.playerId, rounds: new Map() };
    socket.on('round:opened', (m) => {
      const t = performance.now();
      const r = session.rounds?.get(m.roundIndex);
      p.rounds.set(m.roundIndex, { receivedAt: t, optionId: m.item?.options?.[0]?.id ?? 'opt-a' });
      if (r) r.lastReceipt = Math.max(r.lastReceipt ?? 0, t);
      p.onOpened?.(m.roundIndex);
    });
    session.players.push(p);
    return p;
  });
  const connectMs = Date.now() - connectStarted;
  for (const s of sessions) {
    s.rounds = new Map();
    s.host = { socket: await connect('/host', { sessionId: s.id, protocolVersion: 1 }, cookie ? { cookie } : undefined) };
  }
  if (opts.target === 'real') await pool(sessions, 8, (s) => command(s.host, { type: 'start' }));

  loop.enable();
  const cpuStart = process.cpuUsage();
  const wallStart = performance.now();
  const latencies = [];
  const ackedIds = [];
  let acked = 0, duplicatesAbsorbed = 0, duplicateMiscounted = 0, timeouts = 0, refused = 0, lateRefused = 0, lateAccepted = 0;
  const fanout = [];
  const totalRounds = opts.rounds + 1;
  let measuredAnswers = 0, measuredStart = 0, measuredEnd = 0;

  for (let round = 0; round < totalRounds; round++) {
    const measured = round > 0;
    const roundStart = performance.now();
    if (round === 1) measuredStart = roundStart;
    const answers = [];
    for (const s of sessions) s.rounds.set(round, { lastReceipt: 0, sentAt: 0 });
    await Promise.all(sessions.map(async (s) => {
      const r = s.rounds.get(round);
      r.sentAt = performance.now();
      if (round > 0 && opts.target === 'real') await command(s.host, { type: 'next' });
      await command(s.host, { type: 'open_round' });
    }));
    for (const p of players) {
      const think = opts.pattern === 'burst'
        ? (opts.spreadSeconds - 1 + rng()) * 1000
        : (0.5 + rng() * (opts.spreadSeconds - 0.5)) * 1000;
      const intended = roundStart + think;
      const duplicate = rng() < opts.duplicateShare;
      answers.push(new Promise((resolve) => {
        const fire = async () => {
          const wait = intended - performance.now();
          if (wait > 0) await sleep(wait);
          const id = randomUUID();
          const payload = { clientMessageId: id, roundIndex: round, response: { type: 'single', optionId: p.rounds.get(round)?.optionId ?? 'opt-a' }, lock: true };
          try {
            const ack = await p.socket.timeout(opts.ackTimeoutMs).emitWithAck('answer:submit', payload);
            const done = performance.now();
            if (ack?.ok) {
              acked += 1;
              ackedIds.push(id);
              if (measured) { latencies.push(done - intended); measuredAnswers += 1; }
              if (duplicate) {
                const again = await p.socket.timeout(opts.ackTimeoutMs).emitWithAck('answer:submit', payload);
                if (again?.ok && again.duplicate) duplicatesAbsorbed += 1; else duplicateMiscounted += 1;
              }
            } else refused += 1;
          } catch { timeouts += 1; }
          resolve();
        };
        if (p.rounds.has(round)) fire(); else p.onOpened = (ri) => { if (ri === round) { p.onOpened = null; fire(); } };
      }));
    }
    await Promise.all(answers);
    for (const s of sessions) {
      const r = s.rounds.get(round);
      if (measured && r.lastReceipt) fanout.push(r.lastReceipt - r.sentAt);
    }
    if (opts.target === 'real') {
      // The round closes by itself once everyone has locked in; closing it again is refused harmlessly.
      await pool(sessions, 8, (s) => command(s.host, { type: 'close_round' }).catch((e) => { if (!/round_not_open/.test(e.message)) throw e; }));
      // Late answers: after the close, a few players try again; every one must be refused.
      const late = players.filter(() => rng() < opts.lateShare);
      await Promise.all(late.map(async (p) => {
        try {
          const ack = await p.socket.timeout(opts.ackTimeoutMs).emitWithAck('answer:submit', { clientMessageId: randomUUID(), roundIndex: round, response: { type: 'single', optionId: p.rounds.get(round)?.optionId ?? 'opt-a' } });
          if (ack?.ok) lateAccepted += 1; else lateRefused += 1;
        } catch { timeouts += 1; }
      }));
      await pool(sessions, 8, (s) => command(s.host, { type: 'reveal' }));
    }
    measuredEnd = performance.now();
  }
  const cpu = process.cpuUsage(cpuStart);
  const wall = performance.now() - wallStart;
  const result = {
    target: opts.target, players: opts.players, sessions: sessionCount, pattern: opts.pattern, rounds: opts.rounds,
    connectMs,
    latency: summarise(latencies),
    timeouts, refused, acked, duplicatesAbsorbed, duplicateMiscounted, lateRefused, lateAccepted,
    answersPerSecond: measuredAnswers / ((measuredEnd - measuredStart) / 1000),
    fanout: summarise(fanout),
    generator: { eventLoopP99Ms: Math.max(0, loop.percentile(99) / 1e6 - 10), cpuShare: (cpu.user + cpu.system) / 1000 / wall },
    sessionIds: sessions.map((s) => s.id),
    ackedIds,
  };
  for (const p of players) p.socket.close();
  for (const s of sessions) s.host.socket.close();
  // Exit only once the (long) line is flushed: a pipe cut short would lose the result.
  await new Promise((resolve) => process.stdout.write(`${JSON.stringify(result)}\n`, resolve));
}

main().then(() => process.exit(0), (err) => { console.error(err); process.exit(1); });
