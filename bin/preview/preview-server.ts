/**
 * The local live preview: one pattern file, watched with chokidar, compiled
 * on every save, and pushed to the browser over server-sent events. It binds
 * to loopback only, needs no database and no sign-in, and serves the built
 * web app, whose /preview page draws what arrives.
 *
 * A save with errors keeps the last good model (the chart stays) and sends
 * the new diagnostics with it, so the page can show them on top.
 */
import { existsSync } from 'node:fs';
import { readFile } from 'node:fs/promises';
import type { Server } from 'node:http';
import { basename, join } from 'node:path';
import type { AddressInfo } from 'node:net';
import express, { type Request, type Response } from 'express';
import { watch, type FSWatcher } from 'chokidar';
import type { Diagnostic } from '../../shared/diagnostic.js';
import { fileStart, hasErrors } from '../../shared/diagnostic.js';
import { compile } from '../../shared/compile.js';
import type { PreviewState } from './preview-state.js';

export type { PreviewState } from './preview-state.js';

export interface PreviewOptions {
  path: string;
  port: number;
  webRoot: string;
}

export interface PreviewHandle {
  url: string;
  state(): PreviewState;
  close(): Promise<void>;
}

const readProblem = (message: string): Diagnostic => ({
  severity: 'error',
  id: 'read-failed',
  message,
  range: fileStart,
});

export async function startPreview(options: PreviewOptions): Promise<PreviewHandle> {
  const file = basename(options.path);
  let state: PreviewState = { file, revision: 0, source: '', diagnostics: [], model: null, stale: false };
  const clients = new Set<Response>();

  const refresh = async () => {
    let source: string;
    try {
      source = await readFile(options.path, 'utf8');
    } catch (error) {
      const why =
        (error as { code?: string }).code === 'ENOENT' ? 'the file is gone (renamed or deleted?)' : String(error);
      state = {
        ...state,
        revision: state.revision + 1,
        diagnostics: [readProblem(`Cannot read ${file}: ${why}.`)],
        stale: state.model !== null,
      };
      return broadcast();
    }
    const result = compile(source);
    const good = !hasErrors(result.diagnostics);
    state = {
      file,
      revision: state.revision + 1,
      source,
      diagnostics: result.diagnostics,
      model: good ? result.value.model : state.model,
      stale: !good && state.model !== null,
    };
    broadcast();
  };
  const broadcast = () => {
    const frame = `event: state\ndata: ${JSON.stringify(state)}\n\n`;
    for (const res of clients) res.write(frame);
  };

  await refresh();
  // awaitWriteFinish: editors write in several chunks; read once the file has settled.
  const watcher: FSWatcher = watch(options.path, {
    ignoreInitial: true,
    awaitWriteFinish: { stabilityThreshold: 40, pollInterval: 10 },
  });
  let queued = Promise.resolve();
  const onChange = () => {
    queued = queued.then(refresh);
  };
  watcher.on('add', onChange).on('change', onChange).on('unlink', onChange);

  const app = express();
  app.disable('x-powered-by');
  let port = options.port;
  // Loopback only, and only under our own host name: a page elsewhere cannot reach the file through DNS rebinding.
  app.use((req, res, next) => {
    const host = req.headers.host ?? '';
    if (host === `127.0.0.1:${port}` || host === `localhost:${port}`) return next();
    res.status(403).type('text/plain').send('The preview answers on 127.0.0.1 only.');
  });
  app.get('/api/preview/state', (_req, res) => {
    res.json(state);
  });
  app.get('/api/preview/events', (req: Request, res: Response) => {
    res.writeHead(200, { 'Content-Type': 'text/event-stream', 'Cache-Control': 'no-store', Connection: 'keep-alive' });
    res.write(`retry: 500\nevent: state\ndata: ${JSON.stringify(state)}\n\n`);
    clients.add(res);
    req.on('close', () => clients.delete(res));
  });
  app.get('/', (_req, res) => res.redirect('/preview'));
  app.use(express.static(options.webRoot, { index: false }));
  // The app routes on the client: every other page is its index.html.
  app.get('/{*rest}', (_req, res) => res.sendFile(join(options.webRoot, 'index.html')));

  const server: Server = await new Promise((resolve, reject) => {
    const s = app.listen(options.port, '127.0.0.1', () => resolve(s));
    s.on('error', reject);
  });
  port = (server.address() as AddressInfo).port;

  return {
    url: `http://127.0.0.1:${port}/preview`,
    state: () => state,
    close: async () => {
      await watcher.close();
      for (const res of clients) res.end();
      clients.clear();
      await new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}

/** dist/web of this checkout, from the source file or from its compiled copy in dist/. */
export function findWebRoot(from: string): string | null {
  let dir = from;
  for (let i = 0; i < 6; i++) {
    if (existsSync(join(dir, 'package.json'))) {
      const root = join(dir, 'dist', 'web');
      return existsSync(join(root, 'index.html')) ? root : null;
    }
    dir = join(dir, '..');
  }
  return null;
}
