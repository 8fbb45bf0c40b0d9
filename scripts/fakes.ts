// Local stand-ins for hosted services, in one process:
//  - s3rver: S3-compatible object storage on 127.0.0.1 (photos), bucket with CORS for browser PUTs
//  - smtp-server + mailparser: an SMTP inbox; GET /messages on the HTTP port lists what arrived
//    (with each message's Message-ID); POST /smtp/stop and /smtp/start take the SMTP port down and
//    up again while the inbox keeps what it holds (the no-loss script's "mail server down")
// Run: npx tsx scripts/fakes.ts   (scripts/start.sh and scripts/test.sh start it for you)
// Each fake has its own error handlers: a client that drops its connection mid-send (ECONNRESET,
// EPIPE) is logged and forgotten, so one fake's fault never stops the other.
import { mkdirSync } from 'node:fs';
import http from 'node:http';
import { simpleParser } from 'mailparser';
import S3rver from 's3rver';
import { SMTPServer } from 'smtp-server';
import { fakes } from './fakes-config';

const dataDir = fakes.s3Dir ?? new URL('../.data/s3', import.meta.url).pathname;
mkdirSync(dataDir, { recursive: true });

const cors = `<CORSConfiguration><CORSRule>
  <AllowedOrigin>*</AllowedOrigin>
  <AllowedMethod>GET</AllowedMethod><AllowedMethod>PUT</AllowedMethod><AllowedMethod>HEAD</AllowedMethod>
  <AllowedHeader>*</AllowedHeader><ExposeHeader>ETag</ExposeHeader><MaxAgeSeconds>3000</MaxAgeSeconds>
</CORSRule></CORSConfiguration>`;

const s3 = new S3rver({
  address: '127.0.0.1',
  port: fakes.s3Port,
  directory: dataDir,
  silent: true,
  configureBuckets: [{ name: fakes.bucket, configs: [cors] }],
});
await s3.run();
const s3Server = s3.httpServer;
s3Server.on('error', (error) => logFault('s3', error));
s3Server.on('clientError', (error, socket) => {
  logFault('s3', error);
  socket.destroy();
});

type Message = {
  id: number;
  /** The Message-ID header as sent (angle brackets included), or '' when the sender gave none. */
  messageId: string;
  to: string[];
  from: string;
  subject: string;
  text: string;
  html: string;
  date: string;
};
const inbox: Message[] = [];
let nextId = 1;

const makeSmtp = () => {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'], // the built-in certificate is expired; loopback only
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((mail) => {
          inbox.push({
            id: nextId++,
            messageId: mail.messageId ? `<${mail.messageId.replace(/^<|>$/g, '')}>` : '',
            to: session.envelope.rcptTo.map((r) => r.address),
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
            subject: mail.subject ?? '',
            text: mail.text ?? '',
            html: typeof mail.html === 'string' ? mail.html : '',
            date: new Date().toISOString(),
          });
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  // smtp-server re-emits every connection's socket error on the server: unhandled, it ends the process
  server.on('error', (error) => logFault('smtp', error));
  return server;
};
let smtp: SMTPServer | null = makeSmtp();
smtp.listen(fakes.smtpPort, '127.0.0.1');

/** Closes the SMTP port (open connections are cut): senders get "connection refused". */
function stopSmtp(): Promise<void> {
  const server = smtp;
  smtp = null;
  if (!server) return Promise.resolve();
  return new Promise((resolve) => {
    server.close(() => resolve());
    // smtp-server waits for open sessions; cut them so the port is free at once
    (server as unknown as { connections: Set<{ close(): void }> }).connections?.forEach((c) => c.close());
  });
}

function startSmtp(): Promise<void> {
  if (smtp) return Promise.resolve();
  const server = makeSmtp();
  smtp = server;
  return new Promise((resolve) => server.listen(fakes.smtpPort, '127.0.0.1', () => resolve()));
}

const inboxServer = http.createServer((req, res) => {
  const url = new URL(req.url ?? '/', 'http://127.0.0.1');
  if (url.pathname === '/messages' && req.method === 'GET') {
    const to = url.searchParams.get('to');
    const list = to ? inbox.filter((m) => m.to.includes(to)) : inbox;
    res.writeHead(200, { 'content-type': 'application/json' });
    res.end(JSON.stringify(list));
  } else if (url.pathname === '/messages' && req.method === 'DELETE') {
    inbox.length = 0;
    res.writeHead(204).end();
  } else if ((url.pathname === '/smtp/stop' || url.pathname === '/smtp/start') && req.method === 'POST') {
    void (url.pathname === '/smtp/stop' ? stopSmtp() : startSmtp()).then(() => {
      res.writeHead(200, { 'content-type': 'application/json' });
      res.end(JSON.stringify({ smtp: smtp ? 'up' : 'down' }));
    });
  } else if (url.pathname === '/health') {
    res.writeHead(200).end('ok');
  } else {
    res.writeHead(200, { 'content-type': 'text/html; charset=utf-8' });
    const rows = inbox
      .slice()
      .reverse()
      .map(
        (m) =>
          `<li><b>${escape(m.subject)}</b> to ${escape(m.to.join(', '))}<pre>${escape(m.text)}</pre></li>`,
      );
    res.end(
      `<!doctype html><title>Hitchmark local inbox</title><h1>Local inbox (${inbox.length})</h1><ul>${rows.join('')}</ul>`,
    );
  }
});
inboxServer.on('error', (error) => logFault('inbox', error));
inboxServer.on('clientError', (error, socket) => {
  logFault('inbox', error);
  socket.destroy();
});
inboxServer.listen(fakes.mailHttpPort, '127.0.0.1');

/** A dropped or broken client connection: logged, never fatal. */
function logFault(fake: string, error: Error) {
  console.error(`[${fake}] ${(error as NodeJS.ErrnoException).code ?? error.name}: ${error.message}`);
}

// Last resort: a connection error that escaped a handler (a stream inside a fake) is logged and
// the fakes go on; any other error is a bug in this file and stops the process as usual.
const CONNECTION_ERRORS = new Set([
  'ECONNRESET',
  'EPIPE',
  'ECONNABORTED',
  'ETIMEDOUT',
  'ERR_STREAM_PREMATURE_CLOSE',
]);
process.on('uncaughtException', (error: NodeJS.ErrnoException) => {
  if (error.code && CONNECTION_ERRORS.has(error.code)) {
    logFault('connection', error);
    return;
  }
  console.error(error);
  process.exit(1);
});

function escape(s: string) {
  return s.replace(/[&<>"]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' })[c] ?? c);
}

console.log(
  `fakes up: s3 http://127.0.0.1:${fakes.s3Port} bucket ${fakes.bucket}; smtp 127.0.0.1:${fakes.smtpPort}; inbox http://127.0.0.1:${fakes.mailHttpPort}`,
);
const stop = () => {
  smtp?.close(() => undefined);
  inboxServer.close();
  void s3.close().finally(() => process.exit(0));
};
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
