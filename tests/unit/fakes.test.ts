// The local fakes (scripts/fakes.ts) survive a client that drops its connection mid-send: the
// process keeps running and both the SMTP inbox and the S3 store still answer afterwards.
// Starts its own copy of the fakes on free ports with a storage folder of its own.
import { type ChildProcess, spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import net from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const probe = net.createServer().listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as net.AddressInfo;
      probe.close(() => resolve(port));
    });
  });
}

/** Speaks SMTP up to the middle of the message body, then resets the connection (TCP RST). */
function resetMidSmtpSend(port: number): Promise<void> {
  return new Promise((resolve, reject) => {
    const s = net.connect(port, '127.0.0.1');
    const script = [
      'EHLO gate-phone',
      'MAIL FROM:<desk@hitchmark.example>',
      'RCPT TO:<clerk@hitchmark.example>',
      'DATA',
    ];
    let step = 0;
    s.on('data', (chunk) => {
      const reply = chunk.toString();
      if (step < script.length) {
        s.write(`${script[step++]}\r\n`);
      } else if (reply.startsWith('354')) {
        s.write('Subject: half a message\r\n\r\nThe first half of a body');
        setTimeout(() => {
          s.resetAndDestroy();
          resolve();
        }, 50);
      }
    });
    s.on('error', (e: NodeJS.ErrnoException) => (e.code === 'ECONNRESET' ? resolve() : reject(e)));
  });
}

/** Starts a PUT of `total` bytes to the S3 fake, sends part of it, then resets the connection. */
function resetMidS3Put(port: number, bucket: string): Promise<void> {
  return new Promise((resolve) => {
    const s = net.connect(port, '127.0.0.1', () => {
      s.write(
        `PUT /${bucket}/photos/dropped.jpg HTTP/1.1\r\nHost: 127.0.0.1:${port}\r\n` +
          'Content-Type: image/jpeg\r\nContent-Length: 100000\r\n\r\n',
      );
      s.write(Buffer.alloc(20_000, 0xff));
      setTimeout(() => {
        s.resetAndDestroy();
        resolve();
      }, 50);
    });
    s.on('error', () => resolve());
  });
}

/** The first line an SMTP server sends to a new connection. */
function smtpGreeting(port: number): Promise<string> {
  return new Promise((resolve, reject) => {
    const s = net.connect(port, '127.0.0.1');
    s.once('data', (d) => {
      resolve(d.toString());
      s.end('QUIT\r\n');
    });
    s.on('error', reject);
  });
}

/** Sends one whole message through SMTP. */
function sendWholeMessage(port: number, to: string, messageId?: string): Promise<void> {
  return new Promise((resolve, reject) => {
    const s = net.connect(port, '127.0.0.1');
    const script = [
      'EHLO gate-phone',
      'MAIL FROM:<desk@hitchmark.example>',
      `RCPT TO:<${to}>`,
      'DATA',
      (messageId ? `Message-ID: ${messageId}\r\n` : '') +
        'Subject: after the reset\r\n\r\nStill delivered.\r\n.',
      'QUIT',
    ];
    let step = 0;
    s.on('data', (chunk) => {
      if (/^[45]/.test(chunk.toString())) reject(new Error(chunk.toString()));
      else if (step < script.length) s.write(`${script[step++]}\r\n`);
    });
    s.on('close', () => resolve());
    s.on('error', reject);
  });
}

describe('local fakes keep running when a client resets mid-send', () => {
  let fakes: ChildProcess;
  let log = '';
  let exited: number | null = null;
  const bucket = 'hitchmark-photos';
  const dir = mkdtempSync(path.join(tmpdir(), 'hm-fakes-'));
  const ports = { s3: 0, smtp: 0, http: 0 };

  beforeAll(async () => {
    ports.s3 = await freePort();
    ports.smtp = await freePort();
    ports.http = await freePort();
    fakes = spawn('node_modules/.bin/tsx', ['scripts/fakes.ts'], {
      env: {
        ...process.env,
        HM_S3_PORT: String(ports.s3),
        HM_SMTP_PORT: String(ports.smtp),
        HM_MAIL_HTTP_PORT: String(ports.http),
        HM_S3_DIR: dir,
        S3_BUCKET: bucket,
      },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    fakes.stdout?.on('data', (d) => (log += d));
    fakes.stderr?.on('data', (d) => (log += d));
    fakes.on('exit', (code) => (exited = code ?? -1));
    for (let i = 0; i < 150 && !log.includes('fakes up'); i++) await new Promise((r) => setTimeout(r, 100));
    expect(log).toContain('fakes up');
  }, 30_000);

  afterAll(() => {
    fakes?.kill('SIGTERM');
    rmSync(dir, { recursive: true, force: true });
  });

  it('SMTP reset mid-message: the process lives on, SMTP and S3 both still answer', async () => {
    await resetMidSmtpSend(ports.smtp);
    await new Promise((r) => setTimeout(r, 300));
    expect(exited).toBeNull();
    expect(log).toMatch(/\[smtp\] ECONNRESET/);

    expect(await smtpGreeting(ports.smtp)).toMatch(/^220 /);
    await sendWholeMessage(ports.smtp, 'clerk@hitchmark.example');
    const inbox = (await (
      await fetch(`http://127.0.0.1:${ports.http}/messages?to=clerk@hitchmark.example`)
    ).json()) as { subject: string }[];
    // the half message was never delivered; the whole one was
    expect(inbox.map((m) => m.subject)).toEqual(['after the reset']);

    const put = await fetch(`http://127.0.0.1:${ports.s3}/${bucket}/photos/after-smtp.txt`, {
      method: 'PUT',
      body: 'still here',
    });
    expect(put.status).toBe(200);
  });

  it('S3 reset mid-upload: the process lives on, S3 and SMTP both still answer', async () => {
    await resetMidS3Put(ports.s3, bucket);
    await new Promise((r) => setTimeout(r, 300));
    expect(exited).toBeNull();

    const put = await fetch(`http://127.0.0.1:${ports.s3}/${bucket}/photos/after-s3.txt`, {
      method: 'PUT',
      body: 'stored after the reset',
    });
    expect(put.status).toBe(200);
    const got = await fetch(`http://127.0.0.1:${ports.s3}/${bucket}/photos/after-s3.txt`);
    expect(await got.text()).toBe('stored after the reset');
    // (s3rver keeps whatever part of a dropped PUT arrived: completion's size and hash checks catch it)
    expect(await smtpGreeting(ports.smtp)).toMatch(/^220 /);
  });

  it('the SMTP port goes down and up on request; the inbox keeps its messages and lists their Message-ID', async () => {
    const inboxUrl = `http://127.0.0.1:${ports.http}`;
    await sendWholeMessage(ports.smtp, 'before@hitchmark.example', '<one@hitchmark.example>');
    const down = await fetch(`${inboxUrl}/smtp/stop`, { method: 'POST' });
    expect(await down.json()).toEqual({ smtp: 'down' });
    // a sender now finds the port closed (nodemailer's "connection refused")
    await expect(smtpGreeting(ports.smtp)).rejects.toMatchObject({ code: 'ECONNREFUSED' });
    // S3 is another fake: it keeps answering
    const put = await fetch(`http://127.0.0.1:${ports.s3}/${bucket}/photos/while-smtp-down.txt`, {
      method: 'PUT',
      body: 'x',
    });
    expect(put.status).toBe(200);

    const up = await fetch(`${inboxUrl}/smtp/start`, { method: 'POST' });
    expect(await up.json()).toEqual({ smtp: 'up' });
    expect(await smtpGreeting(ports.smtp)).toMatch(/^220 /);
    await sendWholeMessage(ports.smtp, 'after@hitchmark.example', '<two@hitchmark.example>');
    const all = (await (await fetch(`${inboxUrl}/messages`)).json()) as { to: string[]; messageId: string }[];
    expect(
      all.filter((m) => m.to[0] !== 'clerk@hitchmark.example').map((m) => [m.to[0], m.messageId]),
    ).toEqual([
      ['before@hitchmark.example', '<one@hitchmark.example>'],
      ['after@hitchmark.example', '<two@hitchmark.example>'],
    ]);
  });
});
