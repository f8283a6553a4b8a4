// An SMTP server on loopback that keeps every message it receives (raw .eml + parsed .json under
// .data/mail) and a small web view of them, so the demo and the tests can read what Setline sent.
import { SMTPServer } from 'smtp-server';
import { simpleParser } from 'mailparser';
import { createServer } from 'node:http';
import { mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { randomUUID } from 'node:crypto';

export async function start({ dataDir, port, webPort }) {
  const directory = path.join(dataDir, 'mail');
  mkdirSync(directory, { recursive: true });

  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'], // loopback only; the client sets ignoreTLS
    logger: false,
    size: 25 * 1024 * 1024,
    onData(stream, session, callback) {
      const chunks = [];
      stream.on('data', (chunk) => chunks.push(chunk));
      stream.on('end', async () => {
        try {
          const raw = Buffer.concat(chunks);
          const mail = await simpleParser(raw);
          const id = `${Date.now()}-${randomUUID().slice(0, 8)}`;
          writeFileSync(path.join(directory, `${id}.eml`), raw);
          writeFileSync(path.join(directory, `${id}.json`), JSON.stringify(summary(id, mail, session), null, 1));
          callback();
        } catch (error) {
          callback(error);
        }
      });
    },
  });
  await new Promise((resolve, reject) =>
    smtp.listen(port, '127.0.0.1', (error) => (error ? reject(error) : resolve())),
  );

  const list = () =>
    readdirSync(directory)
      .filter((file) => file.endsWith('.json'))
      .sort()
      .reverse()
      .map((file) => JSON.parse(readFileSync(path.join(directory, file), 'utf8')));

  // GET /messages (JSON, newest first), /messages/:id (JSON), /messages/:id.eml (raw), / (HTML list), /view/:id (the HTML body).
  const web = createServer((request, response) => {
    const url = new URL(request.url ?? '/', `http://127.0.0.1:${webPort}`);
    const send = (status, type, body) => {
      response.writeHead(status, { 'content-type': type });
      response.end(body);
    };
    const match = url.pathname.match(/^\/(messages|view)\/([\w-]+?)(\.eml)?$/);
    if (url.pathname === '/messages') return send(200, 'application/json', JSON.stringify(list()));
    if (request.method === 'DELETE' && url.pathname === '/messages') return send(405, 'text/plain', 'no');
    if (match) {
      const file = path.join(directory, `${match[2]}.${match[3] ? 'eml' : 'json'}`);
      let content;
      try {
        content = readFileSync(file);
      } catch {
        return send(404, 'text/plain', 'No such message');
      }
      if (match[3]) return send(200, 'message/rfc822', content);
      const message = JSON.parse(content.toString('utf8'));
      if (match[1] === 'view')
        return send(200, 'text/html; charset=utf-8', message.html ?? `<pre>${escape(message.text ?? '')}</pre>`);
      return send(200, 'application/json', JSON.stringify(message));
    }
    if (url.pathname === '/') {
      const rows = list().map(
        (m) =>
          `<tr><td>${escape(m.date)}</td><td>${escape(m.to)}</td><td><a href="/view/${m.id}">${escape(m.subject)}</a></td><td>${m.attachments.map((a) => escape(a.filename)).join(', ')}</td><td><a href="/messages/${m.id}.eml">.eml</a></td></tr>`,
      );
      return send(
        200,
        'text/html; charset=utf-8',
        `<!doctype html><meta charset="utf-8"><title>Local mailbox</title><style>body{font:14px system-ui;margin:2rem}td,th{padding:4px 8px;border-bottom:1px solid #ddd;text-align:left}</style><h1>Local mailbox (development only)</h1><p>Every e-mail Setline sends in development lands here; nothing leaves this machine.</p><table><tr><th>Received</th><th>To</th><th>Subject</th><th>Attachments</th><th></th></tr>${rows.join('')}</table>`,
      );
    }
    send(404, 'text/plain', 'Not found');
  });
  await new Promise((resolve) => web.listen(webPort, '127.0.0.1', resolve));

  return {
    name: 'mail',
    // The fake offers no usable certificate: the app must be told to send without TLS (SMTP_TLS=off).
    env: {
      SMTP_HOST: '127.0.0.1',
      SMTP_PORT: String(port),
      SMTP_TLS: 'off',
      MAIL_WEB_URL: `http://127.0.0.1:${webPort}`,
    },
    stop: () =>
      Promise.all([new Promise((resolve) => smtp.close(resolve)), new Promise((resolve) => web.close(resolve))]),
  };
}

function summary(id, mail, session) {
  return {
    id,
    date: new Date().toISOString(),
    from: mail.from?.text ?? session.envelope.mailFrom?.address ?? '',
    to: mail.to
      ? [mail.to]
          .flat()
          .map((a) => a.text)
          .join(', ')
      : session.envelope.rcptTo.map((r) => r.address).join(', '),
    subject: mail.subject ?? '',
    text: mail.text ?? '',
    html: typeof mail.html === 'string' ? mail.html : null,
    attachments: mail.attachments.map((a) => ({ filename: a.filename, contentType: a.contentType, size: a.size })),
  };
}

const escape = (value) => String(value).replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
