// A small static file server for the built workbench (dist/web), on 127.0.0.1 only.
// Node built-ins only. Every response carries the Content-Security-Policy of web/index.html's
// meta tag (read from that file, so the two cannot drift) and `X-Content-Type-Options: nosniff`.
// No directory listings; a path that would leave the root is refused.
//
//   node scripts/serve.mjs [--port N]     serves dist/web on 4178 (or the next free port)
//   import { serve } from './serve.mjs'   serve({ root, port: 0 }) → { url, close }
import { createReadStream, existsSync, readFileSync } from 'node:fs';
import { realpath, stat } from 'node:fs/promises';
import { createServer } from 'node:http';
import { extname, join, resolve, sep } from 'node:path';
import { fileURLToPath } from 'node:url';

const repoRoot = join(fileURLToPath(new URL('.', import.meta.url)), '..');
export const DEFAULT_PORT = 4178;
const HOST = '127.0.0.1';
/** How many ports after the requested one to try when it is taken. */
const PORT_TRIES = 20;

export const MIME_TYPES = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.map': 'application/json; charset=utf-8',
  '.csv': 'text/csv; charset=utf-8',
  '.tsv': 'text/tab-separated-values; charset=utf-8',
  '.txt': 'text/plain; charset=utf-8',
  '.geojson': 'application/geo+json',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.ico': 'image/x-icon',
  '.wasm': 'application/wasm',
};

/** The policy in web/index.html's `<meta http-equiv="Content-Security-Policy">`. */
export function contentSecurityPolicy(indexHtml = join(repoRoot, 'web', 'index.html')) {
  const html = readFileSync(indexHtml, 'utf8');
  const meta = html.match(/<meta\s+http-equiv=["']Content-Security-Policy["']\s+content=(["'])(.*?)\1/i);
  if (!meta) throw new Error(`${indexHtml} has no <meta http-equiv="Content-Security-Policy" content="…"> tag.`);
  return meta[2];
}

/** Serves `root` on 127.0.0.1:`port` (0 = any free port). */
export async function serve({ root, port = 0 }) {
  const rootReal = await realpath(resolve(root));
  const headers = { 'Content-Security-Policy': contentSecurityPolicy(), 'X-Content-Type-Options': 'nosniff' };
  const server = createServer((request, response) => {
    respond(rootReal, headers, request, response).catch(() => {
      if (!response.headersSent) send(response, headers, 500, 'Internal error');
      else response.destroy();
    });
  });
  await new Promise((done, fail) => {
    server.once('error', fail);
    server.listen(port, HOST, () => {
      server.off('error', fail);
      done();
    });
  });
  const address = server.address();
  return {
    url: `http://${HOST}:${address.port}/`,
    close: () => new Promise((done) => {
      server.closeAllConnections();
      server.close(() => done());
    }),
  };
}

async function respond(rootReal, headers, request, response) {
  if (request.method !== 'GET' && request.method !== 'HEAD') return send(response, headers, 405, 'Method not allowed', { Allow: 'GET, HEAD' });
  const file = await fileFor(rootReal, request.url ?? '/');
  if (file === 'bad') return send(response, headers, 400, 'Bad request');
  if (file === undefined) return send(response, headers, 404, 'Not found');
  response.writeHead(200, {
    ...headers,
    'Content-Type': MIME_TYPES[extname(file.path).toLowerCase()] ?? 'application/octet-stream',
    'Content-Length': file.size,
  });
  if (request.method === 'HEAD') return response.end();
  createReadStream(file.path).pipe(response);
}

/** The regular file a URL names inside the root, `undefined` when there is none, 'bad' when refused. */
async function fileFor(rootReal, url) {
  let pathname;
  try {
    pathname = decodeURIComponent(new URL(url, 'http://localhost').pathname);
  } catch {
    return 'bad';
  }
  if (pathname.includes('\0') || pathname.includes('\\')) return 'bad';
  let path = resolve(rootReal, `.${pathname}`);
  if (!inside(rootReal, path)) return 'bad';
  try {
    // realpath also catches a symbolic link that points out of the root.
    path = await realpath(path);
    if (!inside(rootReal, path)) return 'bad';
    let info = await stat(path);
    if (info.isDirectory()) {
      path = join(path, 'index.html');
      info = await stat(path);
    }
    return info.isFile() ? { path, size: info.size } : undefined;
  } catch {
    return undefined;
  }
}

function inside(rootReal, path) {
  return path === rootReal || path.startsWith(rootReal + sep);
}

function send(response, headers, status, text, extra = {}) {
  response.writeHead(status, { ...headers, ...extra, 'Content-Type': 'text/plain; charset=utf-8', 'Content-Length': Buffer.byteLength(text) });
  response.end(text);
}

/** Serves on `port`, or on the next free one when it is taken. */
export async function serveOnFreePort({ root, port = DEFAULT_PORT }) {
  for (let candidate = port; ; candidate++) {
    try {
      return await serve({ root, port: candidate });
    } catch (error) {
      if (error?.code !== 'EADDRINUSE' || candidate >= port + PORT_TRIES) throw error;
    }
  }
}

function portArgument(argv) {
  const at = argv.findIndex((a) => a === '--port' || a.startsWith('--port='));
  if (at < 0) return DEFAULT_PORT;
  const text = argv[at].includes('=') ? argv[at].slice('--port='.length) : argv[at + 1];
  const port = Number(text);
  if (!Number.isInteger(port) || port < 1 || port > 65535) throw new Error(`--port: "${text ?? ''}" is not a port number (expected an integer from 1 to 65535).`);
  return port;
}

export async function serveWorkbench(argv = process.argv.slice(2)) {
  const root = join(repoRoot, 'dist', 'web');
  if (!existsSync(join(root, 'index.html'))) throw new Error(`${root} holds no built workbench; run "node scripts/build-web.mjs" (or "npm start") first.`);
  const { url } = await serveOnFreePort({ root, port: portArgument(argv) });
  console.log(`driftgrid workbench: ${url}`);
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  serveWorkbench().catch((error) => {
    console.error(`driftgrid: ${error.message}`);
    process.exit(1);
  });
}
