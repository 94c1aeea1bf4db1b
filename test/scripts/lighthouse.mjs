#!/usr/bin/env node
/**
 * Lighthouse on every built page, mobile defaults (Moto G-class screen,
 * simulated slow 4G and a 4× slower CPU), with the system Chromium. Prints a
 * figure per page; it is a report, not a pass/fail gate.
 *
 * Builds nothing: serves dist/ (or TANKWRIGHT_DIST) on loopback.
 * Usage: npm run lighthouse [-- /coil/ /tank/ …] [-- --runs 3] [-- --json] [-- --detail]
 *   --runs N   runs each page N times and reports the run with the median performance score
 *   --json     prints the rows as JSON
 *   --detail   also prints, per run, the long tasks Lighthouse counted and the main-thread work by kind
 * CHROME_PATH overrides /usr/bin/chromium.
 *
 * Lighthouse simulates the slow phone from the tasks it observes here, so a
 * busy machine inflates total blocking time: the load average is printed
 * before and after (compare figures taken at similar load, or use --runs).
 */
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { cpus, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { createRequire } from 'node:module';
import lighthouse from 'lighthouse';
import { dist, requireBuild, routes as builtRoutes, serve } from './serve.mjs';

const lighthouseVersion = createRequire(import.meta.url)('lighthouse/package.json').version;

const args = process.argv.slice(2);
const flag = (name) => { const i = args.indexOf(name); return i >= 0 ? (args.splice(i, 1), true) : false; };
const option = (name, dflt) => { const i = args.indexOf(name); return i >= 0 ? args.splice(i, 2)[1] : dflt; };
const asJson = flag('--json');
const detail = flag('--detail');
const runs = Math.max(1, Number(option('--runs', '1')) || 1);

requireBuild();
const load = () => loadavg().map((x) => x.toFixed(1)).join(' ');
const loadBefore = load();
const routes = args.length ? args : builtRoutes();
const site = await serve();
const origin = site.origin;

// --- the system Chromium with a DevTools port for Lighthouse ---
const profile = mkdtempSync(join(tmpdir(), 'tw-lighthouse-'));
const chrome = spawn(process.env.CHROME_PATH ?? '/usr/bin/chromium', [
  '--headless=new', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update',
  '--disable-sync', '--no-first-run', '--remote-debugging-port=0', '--remote-debugging-address=127.0.0.1',
  `--user-data-dir=${profile}`, 'about:blank',
], { stdio: ['ignore', 'ignore', 'pipe'] });
const port = await new Promise((ok, fail) => {
  let err = '';
  const timer = setTimeout(() => fail(new Error(`Chromium did not open a DevTools port:\n${err}`)), 30_000);
  chrome.stderr.on('data', (chunk) => {
    err += chunk;
    const m = /DevTools listening on ws:\/\/[^:]+:(\d+)\//.exec(err);
    if (m) { clearTimeout(timer); ok(Number(m[1])); }
  });
  chrome.on('exit', (code) => { clearTimeout(timer); fail(new Error(`Chromium exited (${code}):\n${err}`)); });
});

const kib = (bytes) => bytes / 1024;
const audit = (lhr, id) => lhr.audits[id];

function figures(route, lhr) {
  const scripts = audit(lhr, 'resource-summary')?.details?.items?.find((i) => i.resourceType === 'script');
  const dom = audit(lhr, 'dom-size')?.numericValue ?? audit(lhr, 'dom-size-insight')?.numericValue;
  return {
    route,
    performance: Math.round((lhr.categories.performance?.score ?? NaN) * 100),
    accessibility: Math.round((lhr.categories.accessibility?.score ?? NaN) * 100),
    tbtMs: Math.round(audit(lhr, 'total-blocking-time')?.numericValue ?? NaN),
    domElements: dom ?? null,
    mainThreadMs: Math.round(audit(lhr, 'mainthread-work-breakdown')?.numericValue ?? NaN),
    jsKB: scripts ? +kib(scripts.transferSize).toFixed(1) : 0,
    lcpMs: Math.round(audit(lhr, 'largest-contentful-paint')?.numericValue ?? NaN),
    failedAccessibility: Object.values(lhr.audits)
      .filter((a) => lhr.categories.accessibility?.auditRefs.some((r) => r.id === a.id && r.weight > 0) && a.score !== null && a.score < 1)
      .map((a) => a.id),
  };
}

const rows = [];
try {
  for (const route of routes) {
    const results = [];
    for (let i = 0; i < runs; i++) {
      const result = await lighthouse(origin + route, {
        port, output: 'json', logLevel: 'error', onlyCategories: ['performance', 'accessibility'],
      });
      if (!result?.lhr) throw new Error(`Lighthouse returned nothing for ${route}`);
      if (result.lhr.runtimeError) throw new Error(`${route}: ${result.lhr.runtimeError.message}`);
      results.push(figures(route, result.lhr));
      if (detail) printDetail(route, result.lhr);
    }
    results.sort((a, b) => a.performance - b.performance);
    const row = results[Math.floor((results.length - 1) / 2)];
    if (runs > 1) row.performanceRange = [results[0].performance, results[results.length - 1].performance];
    rows.push(row);
    if (!asJson) printRow(row, rows.length === 1);
  }
} finally {
  chrome.kill();
  await site.close();
  try { rmSync(profile, { recursive: true, force: true }); } catch { /* Chromium may still hold it */ }
}

/** --detail: the long tasks Lighthouse counted (as simulated on a phone) and the main-thread work by kind. */
function printDetail(route, lhr) {
  const tasks = audit(lhr, 'long-tasks')?.details?.items ?? [];
  console.log(`${route}: long tasks (simulated ms at start ms, script)`);
  for (const t of tasks) console.log(`  ${Math.round(t.duration)} ms at ${Math.round(t.startTime)}  ${String(t.url ?? '').replace(origin, '')}`);
  const work = audit(lhr, 'mainthread-work-breakdown')?.details?.items ?? [];
  console.log(`  main thread: ${work.map((w) => `${w.groupLabel ?? w.group} ${Math.round(w.duration)}`).join(', ')}`);
}

function printRow(r, header) {
  if (header) {
    console.log(`Lighthouse ${lighthouseVersion}, mobile defaults, ${dist}${runs > 1 ? `, median of ${runs} runs` : ''}; JS KB as transferred (gzip)`);
    console.log(['page'.padEnd(38), 'perf'.padStart(5), 'a11y'.padStart(5), 'TBT ms'.padStart(7), 'DOM'.padStart(6), 'main ms'.padStart(8), 'JS KB'.padStart(6), 'LCP ms'.padStart(7)].join(' '));
  }
  const perf = r.performanceRange ? `${r.performance}` : String(r.performance);
  console.log([
    r.route.padEnd(38), perf.padStart(5), String(r.accessibility).padStart(5), String(r.tbtMs).padStart(7),
    String(r.domElements ?? '—').padStart(6), String(r.mainThreadMs).padStart(8), r.jsKB.toFixed(1).padStart(6), String(r.lcpMs).padStart(7),
    r.performanceRange ? ` perf ${r.performanceRange[0]}–${r.performanceRange[1]}` : '',
    r.failedAccessibility.length ? ` a11y: ${r.failedAccessibility.join(', ')}` : '',
  ].join(' '));
}

if (asJson) console.log(JSON.stringify({ dist, runs, loadBefore, loadAfter: load(), cpus: cpus().length, pages: rows }, null, 2));
else console.log(`load average ${loadBefore} before, ${load()} after, on ${cpus().length} CPUs`);
