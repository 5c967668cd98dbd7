// Local SMTP stand-in: accepts mail over real SMTP (smtp-server), parses it (mailparser), keeps it in memory
// and shows it on a small web page plus a JSON API that the tests read to follow links.
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

export interface StoredMail {
  id: number;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
  receivedAt: string;
}

export interface MailFake {
  smtpPort: number;
  httpPort: number;
  httpUrl: string;
  messages: StoredMail[];
  close: () => Promise<void>;
}

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

export async function startMailFake(opts: { smtpPort?: number; httpPort?: number; host?: string; max?: number } = {}): Promise<MailFake> {
  const host = opts.host ?? '127.0.0.1';
  const max = opts.max ?? 5000;
  const messages: StoredMail[] = [];
  let nextId = 1;

  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    size: 10 * 1024 * 1024,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const to = session.envelope.rcptTo.map((r) => r.address.toLowerCase());
          messages.push({
            id: nextId++,
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
            to,
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : '',
            receivedAt: new Date().toISOString(),
          });
          if (messages.length > max) messages.splice(0, messages.length - max);
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  await new Promise<void>((resolve, reject) => {
    smtp.once('error', reject);
    smtp.listen(opts.smtpPort ?? 2525, host, () => resolve());
  });
  smtp.on('error', () => {});

  const web = http.createServer((req, res) => {
    const url = new URL(req.url ?? '/', 'http://x');
    const to = url.searchParams.get('to')?.toLowerCase();
    const list = to ? messages.filter((m) => m.to.includes(to)) : messages;
    if (url.pathname === '/api/messages' && req.method === 'GET') {
      res.setHeader('content-type', 'application/json');
      res.end(JSON.stringify({ messages: list }));
    } else if (url.pathname === '/api/messages' && req.method === 'DELETE') {
      messages.length = 0;
      res.statusCode = 204;
      res.end();
    } else if (/^\/messages\/\d+$/.test(url.pathname)) {
      const m = messages.find((x) => x.id === Number(url.pathname.split('/')[2]));
      if (!m) {
        res.statusCode = 404;
        res.end('not found');
        return;
      }
      res.setHeader('content-type', 'text/html; charset=utf-8');
      // The stored HTML part is shown in a sandboxed frame so its links can be followed but nothing runs.
      res.end(`<!doctype html><meta charset="utf-8"><title>${esc(m.subject)}</title>
<body style="font-family:sans-serif;margin:24px"><p><a href="/">All messages</a></p>
<h1>${esc(m.subject)}</h1><p>To: ${esc(m.to.join(', '))} — ${esc(m.receivedAt)}</p>
<h2>HTML part</h2><iframe sandbox="allow-popups allow-top-navigation-by-user-activation" style="width:100%;height:420px;border:1px solid #ccc" srcdoc="${esc(m.html)}"></iframe>
<h2>Text part</h2><pre style="white-space:pre-wrap">${esc(m.text)}</pre></body>`);
    } else if (url.pathname === '/') {
      res.setHeader('content-type', 'text/html; charset=utf-8');
      const rows = [...list].reverse().map((m) => `<tr><td>${m.id}</td><td>${esc(m.to.join(', '))}</td><td><a href="/messages/${m.id}">${esc(m.subject)}</a></td><td>${esc(m.receivedAt)}</td></tr>`);
      res.end(`<!doctype html><meta charset="utf-8"><title>Local mail stand-in</title>
<body style="font-family:sans-serif;margin:24px"><h1>Local mail stand-in</h1><p>${list.length} message(s). Nothing here leaves this machine.</p>
<table border="1" cellpadding="6" style="border-collapse:collapse"><tr><th>#</th><th>To</th><th>Subject</th><th>Received</th></tr>${rows.join('')}</table></body>`);
    } else {
      res.statusCode = 404;
      res.end('not found');
    }
  });
  await new Promise<void>((resolve, reject) => {
    web.once('error', reject);
    web.listen(opts.httpPort ?? 8025, host, () => resolve());
  });
  const smtpAddr = (smtp as unknown as { server: { address(): AddressInfo } }).server.address();
  const httpPort = (web.address() as AddressInfo).port;
  return {
    smtpPort: smtpAddr.port,
    httpPort,
    httpUrl: `http://${host}:${httpPort}`,
    messages,
    close: () =>
      new Promise<void>((resolve) => {
        web.closeAllConnections();
        web.close(() => smtp.close(() => resolve()));
      }),
  };
}
