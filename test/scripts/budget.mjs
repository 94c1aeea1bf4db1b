#!/usr/bin/env node
/**
 * Page budget: for every page in dist/, the JavaScript it ships up front —
 * <script src>, each island's component and renderer, and everything those
 * import statically — gzip-compressed. Chunks loaded later by dynamic
 * import() (mathjs for expressions, the plot library) are listed apart.
 * Fails when a page ships more than BUDGET_KB.
 * Usage: npm run budget  (builds first)  ·  node test/scripts/budget.mjs [--json]
 * (TANKWRIGHT_DIST=dir measures another build than dist/.)
 */
import { readFileSync, readdirSync, statSync, existsSync } from 'node:fs';
import { gzipSync } from 'node:zlib';
import { join, relative, dirname, resolve, posix } from 'node:path';
import { dist, requireBuild } from './serve.mjs';

const BUDGET_KB = 60;
requireBuild();

function walk(dir, out = []) {
  for (const name of readdirSync(dir)) {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) walk(p, out);
    else out.push(p);
  }
  return out;
}

const gz = new Map();
const gzipKB = (file) => {
  if (!gz.has(file)) gz.set(file, gzipSync(readFileSync(file), { level: 9 }).length / 1024);
  return gz.get(file);
};

function urlToFile(url, fromFile) {
  if (/^(https?:)?\/\//.test(url) || url.startsWith('data:')) return null;
  const clean = url.split(/[?#]/)[0];
  const file = clean.startsWith('/') ? join(dist, clean) : resolve(dirname(fromFile), clean);
  return existsSync(file) ? file : null;
}

const STATIC_IMPORT = /(?:^|[;\s}])(?:import|export)\s*(?:[\w*{}\s,$]+from\s*)?["']([^"']+\.m?js)["']/g;
const DYNAMIC_IMPORT = /import\(\s*["']([^"']+\.m?js)["']\s*\)/g;

function closure(entries) {
  const seen = new Set();
  const lazy = new Set();
  const stack = [...entries];
  while (stack.length) {
    const file = stack.pop();
    if (seen.has(file)) continue;
    seen.add(file);
    const code = readFileSync(file, 'utf8');
    for (const m of code.matchAll(STATIC_IMPORT)) {
      const dep = urlToFile(m[1], file);
      if (dep && !seen.has(dep)) stack.push(dep);
    }
    for (const m of code.matchAll(DYNAMIC_IMPORT)) {
      const dep = urlToFile(m[1], file);
      if (dep) lazy.add(dep);
    }
  }
  for (const f of seen) lazy.delete(f);
  // What the on-demand chunks pull in statically is on demand too.
  const lazyAll = new Set();
  const more = [...lazy];
  while (more.length) {
    const file = more.pop();
    if (lazyAll.has(file) || seen.has(file)) continue;
    lazyAll.add(file);
    const code = readFileSync(file, 'utf8');
    for (const m of [...code.matchAll(STATIC_IMPORT), ...code.matchAll(DYNAMIC_IMPORT)]) {
      const dep = urlToFile(m[1], file);
      if (dep) more.push(dep);
    }
  }
  return { initial: seen, lazy: lazyAll };
}

const pages = walk(dist).filter((f) => f.endsWith('.html')).sort();
const rows = [];
let failed = false;
for (const page of pages) {
  const html = readFileSync(page, 'utf8');
  const entries = new Set();
  for (const m of html.matchAll(/<script[^>]*\ssrc="([^"]+)"/g)) {
    const f = urlToFile(m[1], page);
    if (f) entries.add(f);
  }
  for (const m of html.matchAll(/\s(?:component-url|renderer-url|before-hydration-url)="([^"]+)"/g)) {
    const f = urlToFile(m[1], page);
    if (f) entries.add(f);
  }
  let inlineKB = 0;
  for (const m of html.matchAll(/<script(?![^>]*\ssrc=)[^>]*>([\s\S]*?)<\/script>/g)) {
    inlineKB += gzipSync(Buffer.from(m[1])).length / 1024;
  }
  const { initial, lazy } = closure([...entries]);
  const initialKB = [...initial].reduce((s, f) => s + gzipKB(f), 0) + inlineKB;
  const lazyKB = [...lazy].reduce((s, f) => s + gzipKB(f), 0);
  const route = '/' + posix.normalize(relative(dist, page).split('\\').join('/')).replace(/index\.html$/, '').replace(/\.html$/, '');
  const over = initialKB > BUDGET_KB;
  failed ||= over;
  rows.push({ route, initialKB: +initialKB.toFixed(1), inlineKB: +inlineKB.toFixed(1), files: initial.size, lazyKB: +lazyKB.toFixed(1), over });
}

if (process.argv.includes('--json')) {
  console.log(JSON.stringify({ budgetKB: BUDGET_KB, pages: rows }, null, 2));
} else {
  console.log(`JavaScript shipped per page (gzip, level 9), budget ${BUDGET_KB} KB`);
  console.log('page'.padEnd(34), 'initial KB'.padStart(10), 'files'.padStart(6), 'on demand KB'.padStart(13));
  for (const r of rows) {
    console.log(r.route.padEnd(34), r.initialKB.toFixed(1).padStart(10), String(r.files).padStart(6), r.lazyKB.toFixed(1).padStart(13), r.over ? '  OVER BUDGET' : '');
  }
}
if (failed) {
  console.error(`At least one page ships more than ${BUDGET_KB} KB of JavaScript.`);
  process.exit(1);
}
