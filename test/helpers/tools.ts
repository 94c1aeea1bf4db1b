/**
 * External tools the tests use (system Chromium, ngspice). When a tool is
 * missing, a test is skipped on a developer's machine with the reason, but in
 * CI (CI=true) a missing tool is a failure, never a silent skip.
 */
import { execFileSync } from 'node:child_process';
import { existsSync } from 'node:fs';

export const inCI = process.env.CI === 'true' || process.env.CI === '1';

/** Path of the Chromium binary: CHROME_PATH, else Debian's /usr/bin/chromium. */
export function chromiumPath(): string | undefined {
  const candidates = [process.env.CHROME_PATH, '/usr/bin/chromium', '/usr/bin/chromium-browser', '/usr/bin/google-chrome'];
  return candidates.find((p): p is string => !!p && existsSync(p));
}

/** True when `ngspice -v` (batch-capable build) runs. */
export function ngspiceAvailable(): boolean {
  try {
    execFileSync('ngspice', ['-v'], { stdio: 'pipe', timeout: 10_000 });
    return true;
  } catch {
    return false;
  }
}

/**
 * Decide whether tests needing `tool` run. Returns true to run. When the tool
 * is missing: in CI, throws (the suite fails); elsewhere returns false and
 * prints how to install it.
 */
export function requireTool(tool: 'chromium' | 'ngspice', present: boolean, installHint: string): boolean {
  if (present) return true;
  const message = `${tool} not found: ${installHint}`;
  if (inCI) throw new Error(`${message} (CI=true: a missing tool fails the run)`);
  console.warn(`Skipping ${tool} tests: ${message}`);
  return false;
}
