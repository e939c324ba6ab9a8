// npm run bench: drives the real server (B3) and the bare socket.io echo baseline (B0) with the
// same harness, interleaved, and writes bench/results/*.json and bench/RESULTS.md.
// `--smoke`: a few hundred players, one trial, fails only on broken correctness.
import { execFileSync, spawn } from 'node:child_process';
import { existsSync, readFileSync, readdirSync, writeFileSync, mkdirSync } from 'node:fs';
import { createRequire } from 'node:module';
import { cpus } from 'node:os';
import { join, dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';
import pg from 'pg';
import { median, spread } from './stats.mjs';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const smoke = process.argv.includes('--smoke');
const arg = (name, fallback) => {
  const hit = process.argv.find((a) => a.startsWith(`--${name}=`));
  return hit ? hit.split('=')[1] : fallback;
};
const STEPS = smoke ? [300] : arg('steps', '300,1500,3000,5000').split(',').map(Number);
const PATTERNS = smoke ? ['spread'] : arg('patterns', 'spread,burst').split(',');
const TRIALS = smoke ? 1 : Number(arg('trials', 5));
const ROUNDS = smoke ? 2 : Number(arg('rounds', 4));
import { createServer } from 'node:net';
// Free loopback ports, so a stray process on a fixed port can never answer for our server.
const freePort = () => new Promise((resolve) => { const srv = createServer(); srv.listen(0, '127.0.0.1', () => { const { port } = srv.address(); srv.close(() => resolve(port)); }); });
const REAL_PORT = await freePort();
const ECHO_PORT = await freePort();
const DATABASE_URL = process.env.DATABASE_URL;
if (!DATABASE_URL) throw new Error('DATABASE_URL is not set: run through `npm run bench`');
const demo = JSON.parse(readFileSync(join(root, 'fixtures/demo/staff.json'), 'utf8'));
const teacher = demo.users.find((u) => u.role === 'teacher');
const hasTaskset = (() => { try { execFileSync('taskset', ['-c', '0', 'true']); return cpus().length > 1; } catch { return false; } })();
const pin = (core, cmd, args) => (hasTaskset ? ['taskset', ['-c', String(core), cmd, ...args]] : [cmd, args]);
const sleep = (ms) => new Promise((r) => setTimeout(r, ms));

const children = new Set();
// Whatever happens to the harness, it takes its servers down with it.
process.on('exit', () => { for (const c of children) if (c.exitCode === null) c.kill('SIGKILL'); });

function start(name, core, cmd, args, env = {}) {
  const [c, a] = pin(core, cmd, args);
  const child = spawn(c, a, { cwd: root, env: { ...process.env, ...env }, stdio: ['ignore', 'pipe', 'pipe'] });
  let log = '';
  child.stdout.on('data', (d) => (log += d));
  child.stderr.on('data', (d) => (log += d));
  child.logText = () => log;
  children.add(child);
  child.label = name;
  return child;
}

async function waitFor(url, ms = 30000, child = null) {
  const end = Date.now() + ms;
  while (Date.now() < end) {
    if (child && child.exitCode !== null) throw new Error(`${child.label} exited early:\n${child.logText()}`);
    try { const r = await fetch(url); if (r.ok) return; } catch {}
    await sleep(200);
  }
  throw new Error(`${url} did not come up`);
}

function cpuMs(pid) {
  // utime + stime of the process, in clock ticks (100 per second on Linux).
  const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1].split(' ');
  return ((Number(fields[11]) + Number(fields[12])) * 1000) / 100;
}

function serverPid(child) {
  // Under taskset the node process replaces taskset (exec), so the pid is the server's.
  return child.pid;
}

async function startReal() {
  // BENCH_SERVER_NODE_ARGS: extra node flags for the server, e.g. "--cpu-prof --cpu-prof-dir=/tmp/prof" to profile a run.
  const extra = (process.env.BENCH_SERVER_NODE_ARGS ?? '').split(' ').filter(Boolean);
  const child = start('real', 1, process.execPath, [...extra, '--expose-gc', 'server/dist/main.js'], {
    NODE_ENV: 'production', PORT: String(REAL_PORT), HOST: '127.0.0.1', LOG_LEVEL: 'warn', DATABASE_URL,
    APP_SECRET: 'bench-secret-bench-secret-bench-secret-01', PUBLIC_URL: `http://127.0.0.1:${REAL_PORT}`,
    BENCH_METRICS: 'true', PLAY_JOIN_LIMIT: '100000', SIGNIN_LIMIT: '100000', DATABASE_POOL_SIZE: '20',
  });
  await waitFor(`http://127.0.0.1:${REAL_PORT}/api/health`, 30000, child);
  return child;
}

async function startEcho() {
  const child = start('echo', 1, process.execPath, ['--expose-gc', 'bench/echo-server.mjs', String(ECHO_PORT)]);
  await waitFor(`http://127.0.0.1:${ECHO_PORT}/api/bench/metrics`, 30000, child);
  return child;
}

async function stop(child) {
  if (!child || child.exitCode !== null) return;
  child.kill('SIGTERM');
  for (let i = 0; i < 50 && child.exitCode === null; i++) await sleep(100);
  if (child.exitCode === null) child.kill('SIGKILL');
}

async function benchBank() {
  const signIn = await fetchRetry(`http://127.0.0.1:${REAL_PORT}/api/auth/sign-in`, {
    method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email: teacher.email, password: teacher.password }),
  });
  const cookie = String(signIn.headers.get('set-cookie')).split(';')[0];
  const api = async (method, path, body) => {
    const r = await fetchRetry(`http://127.0.0.1:${REAL_PORT}${path}`, { method, headers: { 'content-type': 'application/json', cookie }, body: body && JSON.stringify(body) });
    const j = await r.json();
    if (!r.ok) throw new Error(`${method} ${path}: ${r.status} ${JSON.stringify(j)}`);
    return j;
  };
  const bank = await api('POST', '/api/banks', { title: `Bench bank ${Date.now()}` });
  for (let i = 0; i < 12; i++) {
    await api('POST', `/api/banks/${bank.id}/items`, {
      type: 'single', prompt: `Bench item ${i + 1}`, explanation: '', tags: [], imageId: null,
      options: [{ id: 'opt-a', text: 'First' }, { id: 'opt-b', text: 'Second' }],
      key: { type: 'single', correctOptionId: 'opt-a' },
    });
  }
  return bank.id;
}

function runLoad(options) {
  const [c, a] = pin(0, process.execPath, [join(root, 'bench/load.mjs'), JSON.stringify(options)]);
  const out = execFileSync(c, a, { cwd: root, maxBuffer: 64 * 1024 * 1024, encoding: 'utf8', timeout: 20 * 60 * 1000 });
  return JSON.parse(out.trim().split('\n').pop());
}

// A kept-alive connection the server has just closed fails once; ask again on a new one.
async function fetchRetry(url, init) {
  for (let i = 0; ; i++) {
    try { return await fetch(url, init); } catch (err) { if (i >= 2) throw err; await sleep(100); }
  }
}

async function metrics(port, reset = false) {
  const r = await fetchRetry(`http://127.0.0.1:${port}/api/bench/metrics${reset ? '/reset' : ''}`, { method: reset ? 'POST' : 'GET' });
  return r.json();
}

async function storedRows(client, sessionIds) {
  const r = await client.query('SELECT count(*)::int AS n FROM responses WHERE session_id = ANY($1::uuid[])', [sessionIds]);
  return r.rows[0].n;
}

/** How many of the acknowledged answers are in the database (each id is unique per player). */
async function ackedStored(client, sessionIds, ids) {
  const r = await client.query(
    'SELECT count(DISTINCT client_message_id)::int AS n FROM responses WHERE session_id = ANY($1::uuid[]) AND client_message_id = ANY($2::text[])',
    [sessionIds, ids],
  );
  return r.rows[0].n;
}

async function trial(kind, child, port, step, pattern, bankId, db, seed) {
  await metrics(port, true);
  const before = cpuMs(serverPid(child));
  const res = runLoad({
    target: kind, baseUrl: `http://127.0.0.1:${port}`, players: step, roomSize: 30, rounds: ROUNDS, pattern, seed,
    email: teacher.email, password: teacher.password, bankId, spreadSeconds: 4,
  });
  const cpu = cpuMs(serverPid(child)) - before;
  const m = await metrics(port);
  res.server = { cpuMs: cpu, cpuMsPerAnswer: res.acked ? cpu / res.acked : null, eventLoopP99Ms: m.eventLoopP99Ms, heapPerPlayer: m.heapUsed / step, rssPerPlayer: m.rss / step };
  if (kind === 'real') {
    res.storedRows = await storedRows(db, res.sessionIds);
    res.ackedStored = await ackedStored(db, res.sessionIds, res.ackedIds);
    // Every acknowledged answer is stored; beyond those, only sends whose ack the client gave up on
    // (timeouts) may have been stored too. Duplicates never add a row.
    res.rowsMatchAcks = res.ackedStored === res.acked && res.storedRows - res.ackedStored <= res.timeouts;
  }
  res.void = res.generator.eventLoopP99Ms > 5 || res.generator.cpuShare > 0.7;
  delete res.sessionIds;
  delete res.ackedIds;
  return res;
}

function mixerFigure() {
  const require = createRequire(import.meta.url);
  const mixer = require(join(root, 'server/dist/mixer/domain/index.js'));
  const players = Array.from({ length: 300 }, (_, i) => ({ id: `p${String(i).padStart(3, '0')}`, tableGroup: `t${Math.floor(i / 4)}`, priorScore: (i * 37) % 100 / 100 }));
  const time = (fn, n) => { const t = []; for (let i = 0; i < n; i++) { const s = performance.now(); fn(i); t.push(performance.now() - s); } return median(t); };
  const base = time((i) => { const ids = mixer.shuffle(players.map((p) => p.id), mixer.createRng(`b${i}`)); const teams = Array.from({ length: 75 }, () => []); ids.forEach((id, k) => teams[k % 75].push(id)); }, 30);
  const out = {};
  for (const mode of ['random', 'mix-tables', 'balanced']) {
    out[mode] = time((i) => mixer.formTeams({ players, teamCount: 75, keepApart: [], keepTogether: [], history: [], mode, seed: `s${i}` }), 15);
  }
  return { baselineShuffleMs: base, ...Object.fromEntries(Object.entries(out).map(([k, v]) => [k, { ms: v, ratioToShuffle: v / base }])) };
}

function bundleFigure() {
  const dist = join(root, 'player-app/dist');
  const html = readFileSync(join(dist, 'index.html'), 'utf8');
  const firstLoad = [...html.matchAll(/(?:src|href)="\/play\/(assets\/[^"]+\.js)"/g)].map((m) => m[1]);
  const gz = (f) => gzipSync(readFileSync(join(dist, f)), { level: 9 }).length;
  const all = readdirSync(join(dist, 'assets')).filter((f) => f.endsWith('.js')).map((f) => `assets/${f}`);
  return { firstLoadGzipBytes: firstLoad.reduce((s, f) => s + gz(f), 0), allJsGzipBytes: all.reduce((s, f) => s + gz(f), 0), firstLoadFiles: firstLoad };
}

function versions() {
  const v = (p) => { try { return JSON.parse(readFileSync(join(root, 'node_modules', p, 'package.json'), 'utf8')).version; } catch { return null; } };
  let commit = null;
  try { commit = execFileSync('git', ['rev-parse', '--short', 'HEAD'], { cwd: root, encoding: 'utf8' }).trim(); } catch {}
  return { node: process.version, 'socket.io': v('socket.io'), '@nestjs/core': v('@nestjs/core'), typeorm: v('typeorm'), pg: v('pg'), commit,
    cpu: cpus()[0]?.model, cores: cpus().length, pinned: hasTaskset };
}

function fmt(n, d = 1) { return n === null || n === undefined ? '–' : Number(n).toFixed(d); }

function markdown(report) {
  const lines = [`# Benchmark results`, '', `${report.when} · commit ${report.versions.commit} · ${report.versions.cpu} × ${report.versions.cores} · Node ${report.versions.node} · socket.io ${report.versions['socket.io']} · Nest ${report.versions['@nestjs/core']} · pinned: ${report.versions.pinned ? 'server on CPU1, load generator and PostgreSQL on CPU0' : 'no'}`, '',
    `Trials per cell: ${report.trials} (median, min–max). Rooms of 30. Measured rounds per trial: ${report.rounds} after one warm-up round. Latency is from each answer's intended send time to its ack.`, '',
    '| players | arrival | target | p50 ms | p95 ms | p99 ms (min–max) | p99.9 ms | max ms | timeouts | answers/s | fan-out p50/max ms | server CPU-ms/answer | server loop p99 ms | heap/RSS KB per player | every ack stored once | dup absorbed | late scored | p99 ratio to B0 | void |',
    '|---|---|---|---|---|---|---|---|---|---|---|---|---|---|---|---|---|---|---|'];
  for (const cell of report.cells) {
    const t = cell.trials;
    const pick = (f) => t.map(f);
    const p99 = pick((r) => r.latency.p99);
    const s = spread(p99);
    lines.push(`| ${cell.players} | ${cell.pattern} | ${cell.target === 'real' ? 'Covalent (B3)' : 'echo (B0)'} | ${fmt(median(pick((r) => r.latency.p50)))} | ${fmt(median(pick((r) => r.latency.p95)))} | ${fmt(median(p99))} (${fmt(s.min)}–${fmt(s.max)}) | ${fmt(median(pick((r) => r.latency.p999)))} | ${fmt(median(pick((r) => r.latency.max)))} | ${t.reduce((a, r) => a + r.timeouts, 0)} | ${fmt(median(pick((r) => r.answersPerSecond)), 0)} | ${fmt(median(pick((r) => r.fanout.p50)))}/${fmt(median(pick((r) => r.fanout.max)))} | ${fmt(median(pick((r) => r.server.cpuMsPerAnswer)), 3)} | ${fmt(median(pick((r) => r.server.eventLoopP99Ms)))} | ${fmt(median(pick((r) => r.server.heapPerPlayer / 1024)))}/${fmt(median(pick((r) => r.server.rssPerPlayer / 1024)))} | ${cell.target === 'real' ? (t.every((r) => r.rowsMatchAcks) ? 'yes' : 'NO') : 'n/a'} | ${cell.target === 'real' ? t.reduce((a, r) => a + r.duplicatesAbsorbed, 0) : 'n/a'} | ${cell.target === 'real' ? t.reduce((a, r) => a + r.lateAccepted, 0) : 'n/a'} | ${cell.ratioP99 !== undefined ? fmt(cell.ratioP99, 2) : '1.00'} | ${t.some((r) => r.void) ? 'VOID (generator saturated)' : ''} |`);
  }
  lines.push('', '## Mixer: 300 players into 75 teams (median of runs, same process)', '', `Baseline (shuffle and deal, no search): ${fmt(report.mixer.baselineShuffleMs, 2)} ms.`, '');
  lines.push('| mode | ms | ratio to baseline | target < 200 ms |', '|---|---|---|---|');
  for (const mode of ['random', 'mix-tables', 'balanced']) lines.push(`| ${mode} | ${fmt(report.mixer[mode].ms, 1)} | ${fmt(report.mixer[mode].ratioToShuffle, 1)} | ${report.mixer[mode].ms < 200 ? 'met' : 'MISSED'} |`);
  lines.push('', '## Player app', '', `First-load JavaScript: ${(report.bundle.firstLoadGzipBytes / 1024).toFixed(1)} KB gzipped (${report.bundle.firstLoadFiles.join(', ')}); all JavaScript: ${(report.bundle.allJsGzipBytes / 1024).toFixed(1)} KB. Target < 100 KB: ${report.bundle.firstLoadGzipBytes < 100 * 1024 ? 'met' : 'MISSED'}.`, '');
  return lines.join('\n');
}

function writeReport(report) {
  mkdirSync(join(root, 'bench/results'), { recursive: true });
  const md = markdown(report);
  const stamp = report.when.replace(/[:.]/g, '-');
  writeFileSync(join(root, `bench/results/${report.smoke ? 'smoke' : 'bench'}-${stamp}.json`), JSON.stringify(report, null, 2));
  if (!report.smoke) writeFileSync(join(root, 'bench/RESULTS.md'), md + '\n');
  return md;
}

async function main() {
  const db = new pg.Client({ connectionString: DATABASE_URL });
  db.on('error', (err) => { console.error(`database connection lost: ${err.message}`); process.exit(1); });
  await db.connect();
  const report = { when: new Date().toISOString(), smoke, trials: TRIALS, rounds: ROUNDS, versions: versions(), cells: [], mixer: mixerFigure(), bundle: bundleFigure() };
  let failures = [];
  for (const step of STEPS) {
    let real = await startReal();
    const echo = await startEcho();
    const bankId = await benchBank();
    try {
      for (const pattern of PATTERNS) {
        const cells = { real: { target: 'real', players: step, pattern, trials: [] }, echo: { target: 'echo', players: step, pattern, trials: [] } };
        for (let t = 0; t < TRIALS; t++) {
          // Interleave B0 and B3 so drift of the machine affects both alike.
          for (const kind of t % 2 === 0 ? ['echo', 'real'] : ['real', 'echo']) {
            const child = kind === 'real' ? real : echo;
            const r = await trial(kind, child, kind === 'real' ? REAL_PORT : ECHO_PORT, step, pattern, bankId, db, `trial-${step}-${pattern}-${t}`);
            cells[kind].trials.push(r);
            console.error(`[bench] ${step} ${pattern} ${kind} trial ${t + 1}: p99 ${fmt(r.latency.p99)} ms, acked ${r.acked}, timeouts ${r.timeouts}${kind === 'real' ? `, rows=acks ${r.rowsMatchAcks}` : ''}${r.void ? ' VOID' : ''}`);
            if (kind === 'real' && (!r.rowsMatchAcks || r.lateAccepted > 0 || r.duplicateMiscounted > 0)) {
              failures.push(`${step}/${pattern}/trial ${t + 1}: acked ${r.acked}, of them stored ${r.ackedStored}, rows ${r.storedRows}, timeouts ${r.timeouts}, late accepted ${r.lateAccepted}, duplicates miscounted ${r.duplicateMiscounted}`);
            }
          }
        }
        const b0 = median(cells.echo.trials.map((r) => r.latency.p99));
        cells.real.ratioP99 = b0 ? median(cells.real.trials.map((r) => r.latency.p99)) / b0 : null;
        report.cells.push(cells.echo, cells.real);
        writeReport(report); // after every cell, so a cut-short run keeps what it measured
      }
    } finally {
      await stop(real);
      await stop(echo);
    }
  }
  await db.end();
  const md = writeReport(report);
  console.log(md);
  if (failures.length) {
    console.log(`\ncorrectness failures:\n${failures.join('\n')}`);
    console.log('bench: 0 passed, 1 failed');
    process.exit(1);
  }
  console.log(smoke ? 'bench-smoke: 1 passed, 0 failed' : '');
}

main().catch((err) => {
  console.error(err);
  for (const c of children) console.error(`--- ${c.label} (exit ${c.exitCode}) log tail ---\n${c.logText().slice(-3000)}`);
  process.exit(1);
});
