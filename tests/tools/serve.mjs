// Tiny static server for the built app (dist/): SPA fallback to index.html, right content types, and no caching of
// the service worker script so a new version is always found. No dependencies: node:http only.
// Environment: HOST (default 127.0.0.1), PORT (default 4173; 0 picks a free port), DIST_DIR (default ./dist).
import { createServer } from 'node:http';
import { readFile, stat } from 'node:fs/promises';
import { extname, join, normalize, resolve, sep } from 'node:path';
import process from 'node:process';
import { fileURLToPath, URL } from 'node:url';

const root = resolve(process.env.DIST_DIR ?? fileURLToPath(new URL('../../dist', import.meta.url)));
const host = process.env.HOST ?? '127.0.0.1';
const port = Number(process.env.PORT ?? 4173);

const CONTENT_TYPES = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.webmanifest': 'application/manifest+json; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.ico': 'image/x-icon',
  '.txt': 'text/plain; charset=utf-8',
  '.map': 'application/json; charset=utf-8',
};

/** Resolves a URL path inside dist/, or null when it would leave it. */
function fileFor(urlPath) {
  const decoded = decodeURIComponent(urlPath.split('?')[0] ?? '/');
  const candidate = normalize(join(root, decoded));
  return candidate === root || candidate.startsWith(root + sep) ? candidate : null;
}

async function readIfFile(path) {
  try {
    const info = await stat(path);
    return info.isFile() ? await readFile(path) : null;
  } catch {
    return null;
  }
}

const server = createServer((request, response) => {
  void (async () => {
    let path = fileFor(request.url ?? '/');
    if (path === null) {
      response.writeHead(400).end('Bad path');
      return;
    }
    let body = await readIfFile(path);
    if (body === null && extname(path) === '') {
      // Client-side routes (and "/") get the app shell.
      path = join(root, 'index.html');
      body = await readIfFile(path);
    }
    if (body === null) {
      response.writeHead(404, { 'content-type': 'text/plain; charset=utf-8' }).end('Not found');
      return;
    }
    const name = path.slice(root.length + 1);
    const hashed = name.startsWith('assets' + sep);
    const cacheControl = hashed ? 'public, max-age=31536000, immutable' : 'no-cache';
    response.writeHead(200, {
      'content-type': CONTENT_TYPES[extname(path)] ?? 'application/octet-stream',
      'cache-control': cacheControl,
      ...(name === 'service-worker.js' ? { 'service-worker-allowed': '/' } : {}),
    });
    response.end(request.method === 'HEAD' ? undefined : body);
  })().catch((error) => {
    response.writeHead(500).end(String(error));
  });
});

server.listen(port, host, () => {
  const address = server.address();
  const shownPort = typeof address === 'object' && address !== null ? address.port : port;
  process.stdout.write(`Spanlog is served at http://${host}:${shownPort}/ (from ${root})\n`);
});
