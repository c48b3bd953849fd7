// The local SMTP fake for `npm start`: accepts every message on 127.0.0.1, keeps the last 200 in memory
// and shows them on a small inbox page (and as JSON at /messages). Nothing is delivered anywhere.
import { createServer } from 'node:http';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { ROOT } from './lib/repo.mjs';

const require = createRequire(join(ROOT, 'package.json'));
const { SMTPServer } = require('smtp-server');
const { simpleParser } = require('mailparser');

const smtpPort = Number(process.argv[2] ?? 4325);
const webPort = Number(process.argv[3] ?? 4326);
const messages = [];

const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ['STARTTLS'],
  logger: false,
  onData(stream, _session, callback) {
    simpleParser(stream)
      .then((mail) => {
        messages.unshift({
          id: messages.length + 1,
          receivedAt: new Date().toISOString(),
          from: mail.from?.text ?? '',
          to: mail.to?.text ?? '',
          subject: mail.subject ?? '',
          text: mail.text ?? '',
        });
        messages.length = Math.min(messages.length, 200);
        callback();
      })
      .catch(callback);
  },
});

const escape = (text) => String(text).replace(/[&<>"]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' })[c]);
const linkify = (text) => escape(text).replace(/(https?:\/\/[^\s<]+)/g, '<a href="$1">$1</a>');

const web = createServer((request, response) => {
  if (request.url === '/messages') {
    response.writeHead(200, { 'content-type': 'application/json' });
    response.end(JSON.stringify(messages));
    return;
  }
  const items = messages
    .map((m) => `<article><h2>${escape(m.subject)}</h2><p class="meta">${escape(m.receivedAt)} · to ${escape(m.to)} · from ${escape(m.from)}</p><pre>${linkify(m.text)}</pre></article>`)
    .join('');
  response.writeHead(200, { 'content-type': 'text/html; charset=utf-8' });
  response.end(`<!doctype html><meta charset="utf-8"><title>Leastline local inbox</title>
<style>body{font-family:system-ui,sans-serif;max-width:60rem;margin:2rem auto;padding:0 1rem;color:#1d2b2a}
article{border:1px solid #c9d6d3;border-radius:10px;padding:1rem;margin:1rem 0}.meta{color:#5a6b68;font-size:.85rem}
pre{white-space:pre-wrap;font-family:ui-monospace,monospace}</style>
<h1>Local inbox (development only)</h1><p>Mail that the API sent while running locally. Refresh to see new messages.</p>${items || '<p>No messages yet.</p>'}`);
});

smtp.listen(smtpPort, '127.0.0.1', () => {
  web.listen(webPort, '127.0.0.1', () => process.stdout.write(`mail fake: smtp 127.0.0.1:${smtpPort}, inbox http://127.0.0.1:${webPort}\n`));
});
const stop = () => {
  smtp.close(() => undefined);
  web.close(() => process.exit(0));
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
