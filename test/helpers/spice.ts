/**
 * Running ngspice from the cross-checks in test/spice: a scratch folder per
 * test file, one netlist run in batch mode with its `wrdata` file read back
 * as numbers, |Z| columns from it, and the peak (or dip) of a sampled curve
 * by a parabola through the best sample and its two neighbours.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, expect } from 'vitest';

/** A fresh folder under the system's temporary folder, removed after the calling file's tests. */
export function spiceFolder(prefix: string): string {
  const dir = mkdtempSync(join(tmpdir(), prefix));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));
  return dir;
}

/**
 * Writes `netlist` to `<name>.cir` in `dir`, runs `ngspice -b` on it there and
 * returns the rows of `<name>.data` (the file its `wrdata` writes) as numbers,
 * without the header line `set wr_vecnames` adds.
 */
export function runNgspice(dir: string, name: string, netlist: string): number[][] {
  writeFileSync(join(dir, `${name}.cir`), netlist);
  execFileSync('ngspice', ['-b', `${name}.cir`], { cwd: dir, stdio: 'pipe', timeout: 60_000 });
  return readFileSync(join(dir, `${name}.data`), 'utf8')
    .trim()
    .split('\n')
    .map((row) => row.trim().split(/\s+/).map(Number))
    .filter((row) => row.length >= 2 && Number.isFinite(row[0]));
}

/** Frequency and |Z| columns of rows written as frequency, Re Z, Im Z (a complex vector). */
export function impedanceColumns(rows: number[][]): { f: number[]; z: number[] } {
  return { f: rows.map((r) => r[0]), z: rows.map((r) => Math.hypot(r[1], r[2])) };
}

/** The extreme of a sampled curve, refined by a parabola. */
export interface Extreme {
  /** Index of the best sample (inside the sweep, never at either end). */
  index: number;
  /** Abscissa of the parabola's vertex. */
  x: number;
  /** Value at the vertex. */
  y: number;
}

/**
 * Largest (sign = 1) or smallest (sign = −1) value of y over the samples x
 * (evenly spaced), by a parabola through the best sample and its neighbours.
 * Asserts that the best sample is not at either end of the sweep (else the
 * sweep missed the extreme).
 */
export function parabolicExtreme(x: readonly number[], y: readonly number[], sign: 1 | -1 = 1): Extreme {
  let i = 0;
  for (let j = 1; j < y.length; j++) if (sign * y[j] > sign * y[i]) i = j;
  expect(i).toBeGreaterThan(0);
  expect(i).toBeLessThan(y.length - 1);
  const [y0, y1, y2] = [y[i - 1], y[i], y[i + 1]];
  const p = (0.5 * (y0 - y2)) / (y0 - 2 * y1 + y2);
  return { index: i, x: x[i] + p * (x[i + 1] - x[i]), y: y1 - 0.25 * (y0 - y2) * p };
}
