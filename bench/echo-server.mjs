// Baseline B0: a bare socket.io server with the same namespaces, transport settings and
// acknowledgement shapes as Covalent's, but no game logic and no database.
import { createServer } from 'node:http';
import { randomUUID } from 'node:crypto';
import { monitorEventLoopDelay } from 'node:perf_hooks';
import { Server } from 'socket.io';

const port = Number(process.argv[2] ?? 3300);
const loop = monitorEventLoopDelay({ resolution: 10 });
loop.enable();
const sessions = new Map(); // id -> { roundIndex }

const http = createServer((req, res) => {
  const send = (status, body) => {
    res.writeHead(status, { 'content-type': 'application/json' });
    res.end(JSON.stringify(body));
  };
  let body = '';
  req.on('data', (d) => (body += d));
  req.on('end', () => {
    if (req.url === '/api/bench/metrics') return send(200, metrics());
    if (req.method === 'POST' && req.url === '/api/bench/metrics/reset') { loop.reset(); return send(200, { ok: true }); }
    if (req.method === 'POST' && req.url === '/api/sessions') {
      const id = randomUUID();
      sessions.set(id, { roundIndex: -1 });
      return send(201, { id, joinCode: id.slice(0, 6).toUpperCase() });
    }
    if (req.method === 'POST' && req.url === '/api/play/join') {
      const { code } = JSON.parse(body || '{}');
      const session = [...sessions.keys()].find((k) => k.slice(0, 6).toUpperCase() === code);
      return send(200, { ok: true, sessionId: session, playerId: randomUUID(), playerToken: `${session}.${randomUUID()}` });
    }
    send(200, { ok: true });
  });
});

function metrics() {
  const m = process.memoryUsage();
  return { eventLoopP99Ms: Math.max(0, loop.percentile(99) / 1e6 - 10), heapUsed: m.heapUsed, rss: m.rss, sockets: io.of('/play').sockets.size };
}

const io = new Server(http, { serveClient: false, perMessageDeflate: false, maxHttpBufferSize: 16 * 1024 });
io.of('/play').on('connection', (socket) => {
  const sessionId = String(socket.handshake.auth?.token ?? '').split('.')[0];
  socket.join(`session:${sessionId}`);
  socket.on('answer:submit', (payload, ack) => {
    if (typeof ack === 'function') ack({ ok: true, duplicate: false, locked: true, acceptedAt: Date.now() });
  });
  socket.on('clock:sync', (p, ack) => typeof ack === 'function' && ack({ ok: true, t0: p?.t0, serverNow: Date.now() }));
});
io.of('/host').on('connection', (socket) => {
  const sessionId = String(socket.handshake.auth?.sessionId ?? '');
  socket.on('host:command', (cmd, ack) => {
    const s = sessions.get(sessionId);
    if (!s) return ack?.({ ok: false, error: 'unknown_session', message: 'no such session' });
    if (cmd?.type === 'open_round') {
      s.roundIndex += 1;
      io.of('/play').to(`session:${sessionId}`).emit('round:opened', {
        roundIndex: s.roundIndex,
        itemCount: 99,
        item: { type: 'single', prompt: 'Baseline item', options: [{ id: 'a', text: 'A' }, { id: 'b', text: 'B' }], unitHint: null, imageUrl: null },
        timing: { roundIndex: s.roundIndex, status: 'open', deadlineAt: Date.now() + 30000, limitMs: 30000, paused: false, serverNow: Date.now() },
        calledPlayerId: null,
      });
    }
    ack?.({ ok: true, view: { round: { itemIndex: s.roundIndex } } });
  });
});
http.listen(port, '127.0.0.1', () => console.log(`echo baseline on ${port}`));
