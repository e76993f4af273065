import express, { type Request, type Response } from 'express';
import { listPage, messagePage, notFoundPage } from './pages.js';
import { isAddressedTo, type CapturedMessage, type MessageStore } from './store.js';

/** Summary row of GET /api/messages. */
export function summary(m: CapturedMessage) {
  return { id: m.id, to: m.to, from: m.from, subject: m.subject, date: m.date, messageId: m.messageId, receivedAt: m.receivedAt };
}

/** Body of GET /api/messages/:id. */
export function detail(m: CapturedMessage) {
  return {
    ...summary(m),
    fromName: m.fromName,
    cc: m.cc,
    envelope: m.envelope,
    text: m.text,
    html: m.html,
    attachments: m.attachments.map((a) => ({ filename: a.filename, contentType: a.contentType, size: a.size, contentId: a.contentId, inline: a.inline })),
    headers: m.headers,
    size: m.raw.length,
  };
}

const PAGE_HEADERS = {
  'Content-Type': 'text/html; charset=utf-8',
  'Cache-Control': 'no-store',
  // Mail HTML sits in a sandboxed srcdoc frame, which inherits this policy: no scripts, no remote images or fonts.
  'Content-Security-Policy':
    "script-src 'none'; object-src 'none'; style-src 'unsafe-inline'; img-src 'self' data:; font-src 'none'; connect-src 'none'; media-src 'none'; base-uri 'none'",
  'Referrer-Policy': 'no-referrer',
};

export function createInboxApp(store: MessageStore) {
  const app = express();
  app.disable('x-powered-by');

  const toFilter = (req: Request) => (typeof req.query.to === 'string' ? req.query.to.trim() : '');
  const filtered = (to: string) => (to ? store.list().filter((m) => isAddressedTo(m, to)) : store.list());
  const found = (req: Request, res: Response): CapturedMessage | undefined => {
    const message = store.get(String(req.params.id));
    if (!message) res.status(404).json({ error: 'not_found', message: `no captured message ${String(req.params.id)}` });
    return message;
  };

  app.get('/api/messages', (req, res) => {
    res.set('Cache-Control', 'no-store').json(filtered(toFilter(req)).map(summary));
  });

  app.delete('/api/messages', (_req, res) => {
    store.clear();
    res.status(204).end();
  });

  app.get('/api/messages/:id', (req, res) => {
    const m = found(req, res);
    if (m) res.set('Cache-Control', 'no-store').json(detail(m));
  });

  app.delete('/api/messages/:id', (req, res) => {
    if (store.remove(String(req.params.id))) res.status(204).end();
    else res.status(404).json({ error: 'not_found' });
  });

  app.get('/api/messages/:id/raw', (req, res) => {
    const m = found(req, res);
    if (!m) return;
    res.attachment(`${m.id}.eml`).set('Content-Type', 'message/rfc822').send(m.raw);
  });

  app.get('/api/messages/:id/attachments/:index', (req, res) => {
    const m = found(req, res);
    if (!m) return;
    const index = /^\d+$/.test(String(req.params.index)) ? Number(req.params.index) : -1;
    const a = m.attachments[index];
    if (!a) {
      res.status(404).json({ error: 'not_found', message: `message ${m.id} has ${m.attachments.length} attachment(s)` });
      return;
    }
    res
      .attachment(a.filename)
      .set({
        'Content-Type': a.contentType,
        'X-Content-Type-Options': 'nosniff',
        'Content-Security-Policy': "sandbox; default-src 'none'",
      })
      .send(a.content);
  });

  app.get('/', (req, res) => {
    const to = toFilter(req);
    res.set(PAGE_HEADERS).send(listPage(filtered(to), to));
  });

  app.post('/clear', (_req, res) => {
    store.clear();
    res.redirect(303, '/');
  });

  app.get('/messages/:id', (req, res) => {
    const m = store.get(String(req.params.id));
    res.status(m ? 200 : 404).set(PAGE_HEADERS).send(m ? messagePage(m) : notFoundPage());
  });

  app.use((_req: Request, res: Response) => {
    res.status(404).json({ error: 'not_found' });
  });
  return app;
}
