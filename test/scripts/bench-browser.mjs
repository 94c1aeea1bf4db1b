#!/usr/bin/env node
/**
 * One bench recompute — analyzeTank plus a 1,000-point sweepTank — timed in
 * Chromium and, with the same bundle and the same loop, in Node. Figures, not
 * pass/fail: prints microseconds per recompute (median and best of the
 * batches). The budget (DESIGN.md) is well under one animation frame, 16 ms.
 *
 * src/core/index.ts is bundled with esbuild (installed with vite) into one
 * script, put into a blank page in /usr/bin/chromium (or CHROME_PATH) via
 * playwright-core, and timed there with performance.now().
 * Usage: npm run bench:browser  ·  node test/scripts/bench-browser.mjs [--batches 15] [--per-batch 200] [--json]
 */
import { build } from 'esbuild';
import { chromium } from 'playwright-core';
import { existsSync } from 'node:fs';
import { resolve } from 'node:path';

const args = process.argv.slice(2);
const opt = (name, dflt) => { const i = args.indexOf(name); return i >= 0 ? Number(args[i + 1]) : dflt; };
const BATCHES = opt('--batches', 15);
const PER_BATCH = opt('--per-batch', 200);
const json = args.includes('--json');

const entry = resolve(import.meta.dirname, '../../src/core/index.ts');
const bundled = await build({
  entryPoints: [entry], bundle: true, format: 'iife', globalName: 'tankwrightCore',
  platform: 'browser', target: 'es2022', write: false, minify: true, logLevel: 'warning',
});
const coreScript = bundled.outputFiles[0].text;

/**
 * The timed loop, run as it is in both places (it must not close over
 * anything: it is sent to the page as text). Demo tank (invented values), the
 * same as test/bench/tank.bench.ts: a 7 MHz front-end tank with its coil's
 * self-capacitance; the load changes a little each time so nothing is reused.
 */
function timeRecomputes(core, batches, perBatch) {
  const tank = { inductance: 4.7e-6, capacitance: 100e-12, coilQ: 180, capacitorQ: 1500, coilSelfCapacitance: 3e-12, sourceResistance: 20e3, loadResistance: 20e3 };
  const sweep = { start: 3e6, stop: 15e6, points: 1000, spacing: 'log' };
  let k = 0;
  let sink = 0;
  const once = () => {
    const t = { ...tank, loadResistance: 20e3 + (k++ % 100) };
    const a = core.analyzeTank(t);
    const s = core.sweepTank(t, sweep);
    sink += a.loadedQ + s.response[500];
  };
  for (let i = 0; i < perBatch * 2; i++) once(); // warm-up: let the JIT settle
  const perRecompute = [];
  for (let b = 0; b < batches; b++) {
    const t0 = performance.now();
    for (let i = 0; i < perBatch; i++) once();
    perRecompute.push(((performance.now() - t0) * 1000) / perBatch);
  }
  perRecompute.sort((x, y) => x - y);
  return { medianUs: perRecompute[Math.floor(perRecompute.length / 2)], bestUs: perRecompute[0], worstUs: perRecompute[perRecompute.length - 1], check: sink };
}

// Node, from the same bundle.
const nodeCore = new Function(`${coreScript}; return tankwrightCore;`)();
const inNode = timeRecomputes(nodeCore, BATCHES, PER_BATCH);

// Chromium.
const executablePath = process.env.CHROME_PATH ?? '/usr/bin/chromium';
if (!existsSync(executablePath)) {
  console.error(`Chromium not found at ${executablePath}: apt-get install -y chromium, or set CHROME_PATH.`);
  process.exit(2);
}
const browser = await chromium.launch({
  executablePath, headless: true,
  args: ['--headless=new', '--no-sandbox', '--disable-gpu', '--disable-dev-shm-usage', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
});
let inChromium;
let version;
try {
  version = browser.version();
  const page = await browser.newPage();
  await page.setContent('<!doctype html><title>Tankwright core benchmark</title>');
  await page.addScriptTag({ content: coreScript });
  inChromium = await page.evaluate(
    ([fnText, batches, perBatch]) => (0, eval)(`(${fnText})`)(window.tankwrightCore, batches, perBatch),
    [timeRecomputes.toString(), BATCHES, PER_BATCH],
  );
} finally {
  await browser.close();
}

const round = (x) => Math.round(x * 10) / 10;
const result = {
  what: 'analyzeTank + sweepTank (1,000 points, log), one bench recompute',
  batches: BATCHES, perBatch: PER_BATCH,
  node: { version: process.version, medianUs: round(inNode.medianUs), bestUs: round(inNode.bestUs), worstUs: round(inNode.worstUs) },
  chromium: { version, medianUs: round(inChromium.medianUs), bestUs: round(inChromium.bestUs), worstUs: round(inChromium.worstUs) },
};
if (json) {
  console.log(JSON.stringify(result, null, 2));
} else {
  console.log(`${result.what}; ${BATCHES} batches of ${PER_BATCH}, µs per recompute`);
  console.log(`${'where'.padEnd(28)}${'median'.padStart(10)}${'best'.padStart(10)}${'worst'.padStart(10)}`);
  for (const [where, r] of [[`Node ${process.version}`, result.node], [`Chromium ${version}`, result.chromium]]) {
    console.log(`${where.padEnd(28)}${r.medianUs.toFixed(1).padStart(10)}${r.bestUs.toFixed(1).padStart(10)}${r.worstUs.toFixed(1).padStart(10)}`);
  }
  console.log('Budget: well under one animation frame (16 ms = 16,000 µs).');
}
