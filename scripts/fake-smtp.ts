import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { pathToFileURL } from 'node:url';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';

/**
 * A local stand-in for an SMTP provider: accepts any message on loopback, parses it, and keeps
 * it in memory where a developer (web page) or a test (JSON) can read it. Never relays mail.
 *
 *   GET    /              the outbox as a page
 *   GET    /messages      every message, newest last (JSON, without attachment bodies)
 *   GET    /messages/:id  one message with its attachments (content as UTF-8 text and base64)
 *   DELETE /messages      empties the outbox
 */

export interface OutboxAttachment {
  filename: string;
  contentType: string;
  size: number;
  text: string;
  base64: string;
}

export interface OutboxMessage {
  id: number;
  receivedAt: string;
  /** The Message-ID header, which the sender records as its provider message id. */
  messageId: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
  attachments: OutboxAttachment[];
}

export interface FakeSmtp {
  smtpPort: number;
  httpPort: number;
  /** The outbox's base URL, e.g. http://127.0.0.1:1080. */
  outboxUrl: string;
  messages: OutboxMessage[];
  clear(): void;
  /** Resolves with the first message (already received or arriving) that `match` accepts. */
  waitFor(match: (m: OutboxMessage) => boolean, timeoutMs?: number): Promise<OutboxMessage>;
  stop(): Promise<void>;
}

const host = '127.0.0.1';
const maxMessageBytes = 25 * 1024 * 1024;

/** Starts the fake on loopback; port 0 picks free ports (tests). */
export async function startFakeSmtp({
  smtpPort = 0,
  httpPort = 0,
}: { smtpPort?: number; httpPort?: number } = {}): Promise<FakeSmtp> {
  const messages: OutboxMessage[] = [];
  const waiters = new Set<() => void>();
  let nextId = 1;

  const smtp = new SMTPServer({
    authOptional: true,
    allowInsecureAuth: true,
    disabledCommands: ['STARTTLS'],
    size: maxMessageBytes,
    logger: false,
    onAuth: (auth, _session, callback) => callback(null, { user: auth.username ?? 'fake' }),
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          messages.push({
            id: nextId++,
            receivedAt: new Date().toISOString(),
            messageId: parsed.messageId ?? '',
            from: addressText(parsed.from),
            to: session.envelope.rcptTo.map((r) => r.address),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : '',
            attachments: parsed.attachments.map((a) => ({
              filename: a.filename ?? '',
              contentType: a.contentType,
              size: a.size,
              text: a.content.toString('utf8'),
              base64: a.content.toString('base64'),
            })),
          });
          for (const wake of waiters) wake();
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  await new Promise<void>((resolve, reject) => {
    smtp.once('error', reject);
    smtp.listen(smtpPort, host, () => resolve());
  });
  smtp.on('error', () => undefined); // a client dropping mid-message must not stop the fake

  const http: Server = createServer((req, res) => outboxHttp(req, res, messages));
  await new Promise<void>((resolve, reject) => {
    http.once('error', reject);
    http.listen(httpPort, host, () => resolve());
  });

  const boundHttpPort = (http.address() as AddressInfo).port;
  return {
    smtpPort: (smtp.server.address() as AddressInfo).port,
    httpPort: boundHttpPort,
    outboxUrl: `http://${host}:${boundHttpPort}`,
    messages,
    clear: () => void messages.splice(0),
    waitFor(match, timeoutMs = 15_000) {
      return new Promise((resolve, reject) => {
        const check = () => {
          const found = messages.find(match);
          if (!found) return false;
          waiters.delete(check);
          clearTimeout(timer);
          resolve(found);
          return true;
        };
        const timer = setTimeout(() => {
          waiters.delete(check);
          reject(
            new Error(`no matching e-mail within ${timeoutMs} ms (${messages.length} in outbox)`),
          );
        }, timeoutMs);
        if (!check()) waiters.add(check);
      });
    },
    async stop() {
      http.closeAllConnections();
      await Promise.all([
        new Promise<void>((resolve) => http.close(() => resolve())),
        new Promise<void>((resolve) => smtp.close(() => resolve())),
      ]);
    },
  };
}

function addressText(address: AddressObject | AddressObject[] | undefined): string {
  if (!address) return '';
  return (Array.isArray(address) ? address : [address]).map((a) => a.text).join(', ');
}

function outboxHttp(req: IncomingMessage, res: ServerResponse, messages: OutboxMessage[]) {
  const url = new URL(req.url ?? '/', `http://${host}`);
  const json = (status: number, body: unknown) => {
    res.writeHead(status, { 'Content-Type': 'application/json; charset=utf-8' });
    res.end(JSON.stringify(body));
  };
  if (req.method === 'GET' && url.pathname === '/messages')
    return json(
      200,
      messages.map((m) => ({
        ...m,
        attachments: m.attachments.map(({ filename, contentType, size }) => ({
          filename,
          contentType,
          size,
        })),
      })),
    );
  const one = /^\/messages\/(\d+)$/.exec(url.pathname);
  if (req.method === 'GET' && one) {
    const message = messages.find((m) => m.id === Number(one[1]));
    return message ? json(200, message) : json(404, { error: 'no such message' });
  }
  if (req.method === 'DELETE' && url.pathname === '/messages') {
    messages.splice(0);
    res.writeHead(204).end();
    return;
  }
  if (req.method === 'GET' && url.pathname === '/') {
    res.writeHead(200, {
      'Content-Type': 'text/html; charset=utf-8',
      'Content-Security-Policy': "default-src 'none'; style-src 'unsafe-inline'",
    });
    res.end(outboxPage(messages));
    return;
  }
  json(404, { error: 'not found' });
}

const escapeHtml = (s: string) =>
  s.replace(
    /[&<>"']/g,
    (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] ?? c,
  );

// A plain page: the text part of each message, newest first. Links stay visible as text.
function outboxPage(messages: OutboxMessage[]): string {
  const items = [...messages]
    .reverse()
    .map(
      (m) => `<article>
  <h2>${escapeHtml(m.subject || '(no subject)')}</h2>
  <p><b>To:</b> ${escapeHtml(m.to.join(', '))} · <b>From:</b> ${escapeHtml(m.from)} ·
     ${escapeHtml(m.receivedAt)} · <a href="/messages/${m.id}">JSON</a></p>
  ${m.attachments.length ? `<p><b>Attachments:</b> ${m.attachments.map((a) => escapeHtml(`${a.filename} (${a.contentType}, ${a.size} bytes)`)).join(', ')}</p>` : ''}
  <pre>${escapeHtml(m.text)}</pre>
</article>`,
    )
    .join('\n');
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><title>Fake SMTP outbox (${messages.length})</title>
<style>body{font:15px system-ui,sans-serif;margin:2rem;max-width:60rem}article{border-top:1px solid #ccc;padding:.5rem 0}pre{white-space:pre-wrap;background:#f6f4ee;padding:.75rem}</style>
</head><body><h1>Fake SMTP outbox</h1>
<p>${messages.length} message(s) held in memory; nothing leaves this machine. Reload to refresh.</p>
${items || '<p>No e-mail yet.</p>'}
</body></html>`;
}

// Run directly: `node --import tsx scripts/fake-smtp.ts`.
if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  const fake = await startFakeSmtp({
    smtpPort: Number(process.env.FAKE_SMTP_PORT ?? 2525),
    httpPort: Number(process.env.FAKE_SMTP_HTTP_PORT ?? 1080),
  });
  console.log(
    `[fake-smtp] SMTP on ${host}:${fake.smtpPort}; outbox at ${fake.outboxUrl}/ (JSON: ${fake.outboxUrl}/messages)`,
  );
  const stop = () => void fake.stop().finally(() => process.exit(0));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}
