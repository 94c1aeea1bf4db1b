/**
 * The built site for the scripts in this folder: which folder (dist/, or
 * TANKWRIGHT_DIST for a private build), its pages, and a static server on
 * loopback. Text is gzipped when the browser asks, as a host would serve it.
 */
import { createServer } from 'node:http';
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { extname, join, normalize, relative, resolve } from 'node:path';
import { gzipSync } from 'node:zlib';

export const dist = process.env.TANKWRIGHT_DIST ? resolve(process.env.TANKWRIGHT_DIST) : resolve(import.meta.dirname, '../../dist');

/** Exits with a message when the build is missing. */
export function requireBuild() {
  if (!existsSync(join(dist, 'index.html'))) {
    console.error(`${dist} has no index.html: build first (npm run build, or npx astro build --outDir <dir> with TANKWRIGHT_DIST=<dir>).`);
    process.exit(2);
  }
}

/** Every route with an index.html, sorted: '/', '/coil/', '/methods/tank/' … */
export function routes(dir = dist, out = []) {
  for (const name of readdirSync(dir)) {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) routes(p, out);
    else if (name === 'index.html') out.push(dir === dist ? '/' : `/${relative(dist, dir).split('\\').join('/')}/`);
  }
  return out.sort();
}

const TYPES = {
  '.html': 'text/html; charset=utf-8', '.js': 'text/javascript; charset=utf-8', '.css': 'text/css; charset=utf-8',
  '.svg': 'image/svg+xml', '.json': 'application/json', '.woff2': 'font/woff2', '.woff': 'font/woff', '.ttf': 'font/ttf',
  '.png': 'image/png', '.txt': 'text/plain; charset=utf-8', '.webmanifest': 'application/manifest+json', '.xml': 'application/xml',
};

/** Serves the build on 127.0.0.1 at a free port; resolves to { origin, close() }. */
export async function serve() {
  const server = createServer((req, res) => {
    const clean = normalize(decodeURIComponent((req.url ?? '/').split('?')[0])).replace(/^(\.\.[/\\])+/, '');
    let file = join(dist, clean);
    if (existsSync(file) && statSync(file).isDirectory()) file = join(file, 'index.html');
    if (!file.startsWith(dist) || !existsSync(file)) { res.writeHead(404); res.end('not found'); return; }
    const type = TYPES[extname(file)] ?? 'application/octet-stream';
    const body = readFileSync(file);
    if (/text|javascript|json|svg|xml/.test(type) && /\bgzip\b/.test(req.headers['accept-encoding'] ?? '')) {
      res.writeHead(200, { 'content-type': type, 'content-encoding': 'gzip', vary: 'accept-encoding' });
      res.end(gzipSync(body));
      return;
    }
    res.writeHead(200, { 'content-type': type });
    res.end(body);
  });
  await new Promise((ok) => server.listen(0, '127.0.0.1', ok));
  return { origin: `http://127.0.0.1:${server.address().port}`, close: () => new Promise((ok) => server.close(() => ok())) };
}
