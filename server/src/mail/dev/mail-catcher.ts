import { createServer, IncomingMessage, Server as HttpServer, ServerResponse } from 'node:http';
import { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

export interface CaughtMail {
  id: number;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  attachments: { filename: string; contentType: string; content: string }[];
  receivedAt: string;
}

export interface MailCatcher {
  smtpPort: number;
  httpPort: number;
  messages: CaughtMail[];
  /** Resolves with the first message (already caught or arriving) that matches. */
  waitFor(match: (m: CaughtMail) => boolean, timeoutMs?: number): Promise<CaughtMail>;
  close(): Promise<void>;
}

/**
 * A local capturing SMTP server for development and tests: accepts every message over real SMTP,
 * keeps it in memory and lists it over HTTP (`GET /messages` as JSON, `GET /` as a page).
 */
export async function startMailCatcher(opts: { smtpPort?: number; httpPort?: number; host?: string } = {}): Promise<MailCatcher> {
  const host = opts.host ?? '127.0.0.1';
  const messages: CaughtMail[] = [];
  const waiters: { match: (m: CaughtMail) => boolean; resolve: (m: CaughtMail) => void }[] = [];

  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    banner: 'Covalent local mail catcher',
    size: 25 * 1024 * 1024,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const mail: CaughtMail = {
            id: messages.length + 1,
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
            to: session.envelope.rcptTo.map((r) => r.address),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : null,
            attachments: parsed.attachments.map((a) => ({ filename: a.filename ?? '', contentType: a.contentType, content: a.content.toString('utf8') })),
            receivedAt: new Date().toISOString(),
          };
          messages.push(mail);
          for (const w of [...waiters]) {
            if (w.match(mail)) {
              waiters.splice(waiters.indexOf(w), 1);
              w.resolve(mail);
            }
          }
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  await new Promise<void>((resolve) => smtp.listen(opts.smtpPort ?? 0, host, resolve));
  const smtpPort = (smtp.server.address() as AddressInfo).port;

  const http: HttpServer = createServer((req: IncomingMessage, res: ServerResponse) => {
    if (req.url?.startsWith('/messages')) {
      res.setHeader('content-type', 'application/json');
      res.end(JSON.stringify(messages));
      return;
    }
    res.setHeader('content-type', 'text/html; charset=utf-8');
    const esc = (s: string) => s.replace(/[&<>"]/g, (c) => `&#${c.charCodeAt(0)};`);
    const rows = [...messages]
      .reverse()
      .map((m) => `<article><h2>${esc(m.subject)}</h2><p>To: ${esc(m.to.join(', '))} · ${m.receivedAt}</p><pre>${esc(m.text)}</pre></article>`)
      .join('');
    res.end(`<!doctype html><title>Covalent mail catcher</title><h1>Captured e-mail (${messages.length})</h1>${rows || '<p>None yet.</p>'}`);
  });
  await new Promise<void>((resolve) => http.listen(opts.httpPort ?? 0, host, resolve));
  const httpPort = (http.address() as AddressInfo).port;

  return {
    smtpPort,
    httpPort,
    messages,
    waitFor(match, timeoutMs = 10_000) {
      const found = messages.find(match);
      if (found) return Promise.resolve(found);
      return new Promise((resolve, reject) => {
        const waiter = { match, resolve };
        waiters.push(waiter);
        setTimeout(() => {
          const i = waiters.indexOf(waiter);
          if (i >= 0) {
            waiters.splice(i, 1);
            reject(new Error('no matching e-mail arrived in time'));
          }
        }, timeoutMs).unref();
      });
    },
    async close() {
      await new Promise<void>((resolve) => smtp.close(resolve));
      await new Promise<void>((resolve) => http.close(() => resolve()));
    },
  };
}

// Run directly: `node dist/mail/dev/mail-catcher.js` (used by npm start and the browser tests).
if (require.main === module) {
  const smtpPort = Number(process.argv[2] ?? 2525);
  const httpPort = Number(process.argv[3] ?? 8025);
  startMailCatcher({ smtpPort, httpPort })
    .then((c) => console.log(`mail catcher: SMTP 127.0.0.1:${c.smtpPort}, inbox http://127.0.0.1:${c.httpPort}/`))
    .catch((err) => {
      console.error(err);
      process.exit(1);
    });
}
