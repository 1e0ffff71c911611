// The workbench's static server (scripts/serve.mjs): content types, the page's own CSP as a
// header, no directory listings, and no way out of the served folder.
import { mkdirSync, mkdtempSync, readFileSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { request } from 'node:http';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Window } from 'happy-dom';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { serve, type Served } from '../../scripts/serve.mjs';

const SECRET = 'outside-the-root-secret';

interface Reply { status: number; headers: Record<string, string | string[] | undefined>; body: string }

/** A raw GET: node:http sends the path exactly as written (no URL normalisation), as an attacker would. */
function get(base: string, rawPath: string, method = 'GET'): Promise<Reply> {
  const { hostname, port } = new URL(base);
  return new Promise((resolve, reject) => {
    const req = request({ hostname, port, path: rawPath, method }, (res) => {
      let body = '';
      res.setEncoding('utf8');
      res.on('data', (chunk: string) => (body += chunk));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body }));
    });
    req.on('error', reject);
    req.end();
  });
}

const dir = mkdtempSync(join(tmpdir(), 'driftgrid-serve-'));
let server: Served;
beforeAll(async () => {
  writeFileSync(join(dir, 'secret.txt'), SECRET);
  const root = join(dir, 'site');
  mkdirSync(join(root, 'assets'), { recursive: true });
  mkdirSync(join(root, 'empty'));
  writeFileSync(join(root, 'index.html'), '<!doctype html><title>t</title>');
  for (const ext of ['js', 'mjs', 'css', 'json', 'csv', 'geojson', 'svg', 'png', 'wasm', 'xyz']) writeFileSync(join(root, 'assets', `f.${ext}`), 'x');
  symlinkSync(join(dir, 'secret.txt'), join(root, 'link.txt'));
  server = await serve({ root, port: 0 });
});
afterAll(async () => {
  await server?.close();
  rmSync(dir, { recursive: true, force: true });
});

describe('the static server', () => {
  test('listens on 127.0.0.1 only and serves index.html for the root path', async () => {
    expect(server.url).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/$/);
    const reply = await get(server.url, '/');
    expect(reply.status).toBe(200);
    expect(reply.headers['content-type']).toBe('text/html; charset=utf-8');
    expect(reply.body).toContain('<title>t</title>');
  });

  // Types registered with IANA: text/javascript (RFC 9239), text/css (RFC 2318), application/json
  // (RFC 8259), text/csv (RFC 4180), application/geo+json (RFC 7946 §12), image/svg+xml (SVG 1.1
  // appendix P), image/png (RFC 2083), application/wasm (WebAssembly Web API, "application/wasm").
  test.each([
    ['js', 'text/javascript'], ['mjs', 'text/javascript'], ['css', 'text/css'], ['json', 'application/json'],
    ['csv', 'text/csv'], ['geojson', 'application/geo+json'], ['svg', 'image/svg+xml'], ['png', 'image/png'],
    ['wasm', 'application/wasm'], ['xyz', 'application/octet-stream'],
  ])('serves a .%s file as %s, with nosniff', async (ext, type) => {
    const reply = await get(server.url, `/assets/f.${ext}`);
    expect(reply.status).toBe(200);
    expect(String(reply.headers['content-type']).split(';')[0]).toBe(type);
    expect(reply.headers['x-content-type-options']).toBe('nosniff');
  });

  test("sends the Content-Security-Policy of web/index.html's meta tag, read by an HTML parser, on every response", async () => {
    const document = new Window().document;
    document.write(readFileSync(join(import.meta.dirname, '../../web/index.html'), 'utf8'));
    const policy = document.querySelector('meta[http-equiv="Content-Security-Policy"]')?.getAttribute('content');
    expect(policy).toMatch(/^default-src /);
    for (const path of ['/', '/assets/f.js', '/missing']) expect((await get(server.url, path)).headers['content-security-policy']).toBe(policy);
  });

  test('lists no directory and answers 404 for what is not there', async () => {
    expect((await get(server.url, '/assets/')).status).toBe(404);
    expect((await get(server.url, '/empty')).status).toBe(404);
    expect((await get(server.url, '/nothing.js')).status).toBe(404);
  });

  test.each([
    '/../secret.txt', '/assets/../../secret.txt', '/..%2fsecret.txt', '/assets/..%2F..%2Fsecret.txt',
    '/%2e%2e/secret.txt', '/..%5csecret.txt', '/link.txt', '/%2e%2e%2fsecret.txt', `/${encodeURIComponent(join(dir, 'secret.txt'))}`,
  ])('refuses %s, which would leave the served folder', async (path) => {
    const reply = await get(server.url, path);
    expect([400, 404]).toContain(reply.status);
    expect(reply.body).not.toContain(SECRET);
  });

  test('answers 400 to a malformed escape or a NUL byte, and 405 to a POST', async () => {
    expect((await get(server.url, '/%E0%A4%A')).status).toBe(400);
    expect((await get(server.url, '/index.html%00.js')).status).toBe(400);
    expect((await get(server.url, '/', 'POST')).status).toBe(405);
  });
});
