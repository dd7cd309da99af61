import { createServer, type Server } from 'node:http';
import express, { type Response } from 'express';
import { inboxPage, messagePage, notFoundPage } from './mail-pages.js';
import type { MessageStore } from './message-store.js';

// Nothing on these pages loads from elsewhere or runs script; the message HTML gets a stricter policy of its own.
const pagePolicy =
  "default-src 'none'; style-src 'unsafe-inline'; frame-src 'self'; img-src data:; form-action 'self'; base-uri 'none'";
const messageHtmlPolicy = "sandbox; default-src 'none'; style-src 'unsafe-inline'; img-src data:";

export function createMailWeb(store: MessageStore): Server {
  const app = express();
  app.disable('x-powered-by');

  const html = (res: Response, status: number, body: string) =>
    res.status(status).set('Content-Security-Policy', pagePolicy).type('html').send(body);

  app.get('/', async (_req, res) => html(res, 200, inboxPage(await store.list())));

  app.get('/messages/:id', async (req, res) => {
    const message = await store.get(req.params.id);
    if (!message) return html(res, 404, notFoundPage());
    return html(res, 200, messagePage(message));
  });

  app.get('/messages/:id/html', async (req, res) => {
    const message = await store.get(req.params.id);
    if (!message) return html(res, 404, notFoundPage());
    return res.set('Content-Security-Policy', messageHtmlPolicy).type('html').send(message.html);
  });

  app.post('/clear', async (_req, res) => {
    await store.clear();
    res.redirect(303, '/');
  });

  app.get('/api/messages', async (_req, res) => {
    res.json(await store.list());
  });

  app.get('/api/messages/:id', async (req, res) => {
    const message = await store.get(req.params.id);
    if (!message) return res.status(404).json({ error: { code: 'not_found', message: 'No message with that id.' } });
    return res.json(message);
  });

  app.delete('/api/messages', async (_req, res) => {
    await store.clear();
    res.status(204).end();
  });

  return createServer(app);
}
