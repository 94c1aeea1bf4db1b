/**
 * A matched front end as a circuit, and its exact response: the plain
 * description every matching option produces (`MatchCircuit`), solved by
 * nodal analysis at any frequency, with the loaded resonance, the −3 dB
 * bandwidth, the input impedance at the source, the return and mismatch
 * loss and the transducer loss found from the complex response itself.
 *
 * Model: lumped parts between named nodes (node "0" is ground): resistors,
 * capacitors, inductors with a series loss resistance, and groups of coupled
 * windings (a tapped coil's sections, a link) given by their inductances,
 * series resistances and coupling coefficients k_ij (M_ij = k_ij √(L_i L_j)).
 * The source is an EMF of 1 V behind its resistance R_s at `sourceNode`; the
 * load a resistance R_load from `loadNode` to ground.
 *
 * Method: modified nodal analysis with the source as its Norton equivalent;
 * a group of coupled windings enters as the inverse of its branch impedance
 * matrix R + jωL (the usual stamp of a coupled-inductor group; Ho, Ruehli and
 * Brennan, "The modified nodal approach to network analysis", IEEE Trans.
 * Circuits and Systems 22, 1975). Complex Gaussian elimination with partial
 * pivoting. Definitions of the figures:
 * - transducer loss −10 log10(P_load/P_available), P_available = |V_s|²/(4 R_s)
 *   (Pozar, *Microwave Engineering*, transducer power gain);
 * - return loss −20 log10|Γ| and mismatch loss −10 log10(1 − |Γ|²) at the
 *   source, Γ = (Z_in − R_s)/(Z_in + R_s) (Pozar, ch. 2);
 * - loaded resonance: where the output (the load's voltage, or the top of the
 *   tank when there is no load) peaks; bandwidth: the −3 dB width of that
 *   peak; loaded Q = resonance / bandwidth.
 */
import { TWO_PI } from './constants';
import { DesignError, requireObject } from './errors';
import { type Complex } from './complex';
import { checkSweepOptions, frequencyGrid, type SweepOptions } from './sweep';
import { tankValue } from './tankModel';
import { mismatchLoss } from './terminations';
import { sayNumber, sayQuantity } from './text';

/** One winding of a coupled group. */
export interface CircuitWinding {
  /** Name (letters, digits, underscore; starts with a letter). */
  name: string;
  /** Node the winding starts from (its dotted end). */
  from: string;
  /** Node it ends at. */
  to: string;
  /** Self-inductance, henries. */
  inductance: number;
  /** Series loss resistance, ohms (≥ 0). */
  resistance: number;
}

/** A part of the circuit. Node "0" is ground. */
export type MatchPart =
  | { kind: 'resistor'; name: string; from: string; to: string; resistance: number }
  | { kind: 'capacitor'; name: string; from: string; to: string; capacitance: number }
  | { kind: 'inductor'; name: string; from: string; to: string; inductance: number; resistance?: number }
  | { kind: 'windings'; name: string; windings: CircuitWinding[]; coupling: number[][] };

/** A matched circuit: plain, serialisable, SI units. */
export interface MatchCircuit {
  /** The tank's design resonance f0, Hz (where analysis looks first). */
  frequency: number;
  /** Node the source drives (1 V EMF behind `sourceResistance` to ground). */
  sourceNode: string;
  /** Source resistance R_s, ohms. */
  sourceResistance: number;
  /** Node of the load (omit for none). */
  loadNode?: string;
  /** Load resistance to ground, ohms (with `loadNode`). */
  loadResistance?: number;
  /** The top (hot end) of the tank. */
  topNode: string;
  parts: MatchPart[];
}

const NAME = /^[A-Za-z][A-Za-z0-9_]{0,15}$/;
/** Node names are lower case: SPICE does not tell upper from lower case. */
const NODE = /^(0|[a-z][a-z0-9_]{0,15})$/;
const MAX_PARTS = 64;
const MAX_WINDINGS = 8;

/** A circuit after checking, with node indices. */
interface Checked {
  c: MatchCircuit;
  nodes: Map<string, number>;
  groups: Array<{ windings: CircuitWinding[]; l: number[][] }>;
  /** Made on first use (`solverOf`). */
  solver?: (f: number) => Solution;
}

function nodeName(field: string, v: unknown, groundAllowed: boolean): string {
  if (typeof v !== 'string' || !NODE.test(v) || (!groundAllowed && v === '0')) {
    throw new DesignError(field, `A node name must be "0" (ground)${groundAllowed ? '' : ' — not allowed here —'} or a short name of lower-case letters, digits and underscores starting with a letter (got ${typeof v === 'string' ? JSON.stringify(v.slice(0, 20)) : typeof v}).`);
  }
  return v;
}

/** Cholesky test: is the symmetric matrix positive definite? */
function positiveDefinite(a: number[][]): boolean {
  const n = a.length;
  const l = a.map((row) => row.map(() => 0));
  for (let i = 0; i < n; i++) {
    for (let j = 0; j <= i; j++) {
      let s = a[i][j];
      for (let k = 0; k < j; k++) s -= l[i][k] * l[j][k];
      if (i === j) {
        if (!(s > 0)) return false;
        l[i][i] = Math.sqrt(s);
      } else l[i][j] = s / l[j][j];
    }
  }
  return true;
}

/**
 * Checks a circuit: names, nodes, values (each within the tank's value
 * range), coupling coefficients (symmetric, |k| < 1, a physically possible
 * group: its inductance matrix positive definite).
 * @throws DesignError naming the field at fault ('frequency', 'parts', 'sourceResistance', …)
 */
export function checkMatchCircuit(circuit: MatchCircuit): Checked {
  const c = requireObject<MatchCircuit>('circuit', circuit, 'The circuit');
  tankValue('frequency', c.frequency, 'The design frequency', 'Hz');
  nodeName('sourceNode', c.sourceNode, false);
  tankValue('sourceResistance', c.sourceResistance, 'The source resistance', 'Ω');
  nodeName('topNode', c.topNode, false);
  if (c.loadNode !== undefined || c.loadResistance !== undefined) {
    nodeName('loadNode', c.loadNode, false);
    tankValue('loadResistance', c.loadResistance, 'The load resistance', 'Ω');
  }
  if (!Array.isArray(c.parts) || c.parts.length === 0 || c.parts.length > MAX_PARTS) {
    throw new DesignError('parts', `The circuit's parts must be a list of 1 to ${MAX_PARTS} parts.`);
  }
  const nodes = new Map<string, number>();
  const use = (field: string, v: unknown) => {
    const name = nodeName(field, v, true);
    if (name !== '0' && !nodes.has(name)) nodes.set(name, nodes.size);
  };
  const names = new Set<string>();
  const named = (v: unknown) => {
    if (typeof v !== 'string' || !NAME.test(v) || names.has(v.toLowerCase())) {
      throw new DesignError('parts', `Every part needs its own short name of letters, digits and underscores, starting with a letter (${typeof v === 'string' ? JSON.stringify(v.slice(0, 20)) : typeof v} is not one, or is used twice).`);
    }
    names.add(v.toLowerCase());
  };
  const groups: Checked['groups'] = [];
  for (const raw of c.parts) {
    const p = requireObject<MatchPart>('parts', raw, 'A part');
    named(p.name);
    if (p.kind === 'resistor' || p.kind === 'capacitor' || p.kind === 'inductor') {
      use('parts', p.from);
      use('parts', p.to);
      if (p.from === p.to) throw new DesignError('parts', `Part ${p.name} has both ends on node ${p.from}.`);
      if (p.kind === 'resistor') tankValue('parts', p.resistance, `Resistor ${p.name}`, 'Ω');
      if (p.kind === 'capacitor') tankValue('parts', p.capacitance, `Capacitor ${p.name}`, 'F');
      if (p.kind === 'inductor') {
        tankValue('parts', p.inductance, `Inductor ${p.name}`, 'H');
        if (p.resistance !== undefined && p.resistance !== 0) tankValue('parts', p.resistance, `The loss resistance of ${p.name}`, 'Ω');
      }
    } else if (p.kind === 'windings') {
      const ws = p.windings;
      if (!Array.isArray(ws) || ws.length === 0 || ws.length > MAX_WINDINGS) {
        throw new DesignError('parts', `A group of coupled windings needs 1 to ${MAX_WINDINGS} windings.`);
      }
      const k = p.coupling;
      if (!Array.isArray(k) || k.length !== ws.length || k.some((row) => !Array.isArray(row) || row.length !== ws.length)) {
        throw new DesignError('parts', `The coupling of ${p.name} must be a square table, one row and column per winding.`);
      }
      for (const wRaw of ws) {
        const w = requireObject<CircuitWinding>('parts', wRaw, 'A winding');
        named(w.name);
        use('parts', w.from);
        use('parts', w.to);
        if (w.from === w.to) throw new DesignError('parts', `Winding ${w.name} has both ends on node ${w.from}.`);
        tankValue('parts', w.inductance, `Winding ${w.name}`, 'H');
        if (w.resistance !== 0) tankValue('parts', w.resistance, `The loss resistance of ${w.name}`, 'Ω');
      }
      const l = ws.map((wi, i) => ws.map((wj, j) => {
        const kij = i === j ? 1 : k[i][j];
        if (i !== j && (typeof kij !== 'number' || !Number.isFinite(kij) || !(Math.abs(kij) < 1) || kij !== k[j][i])) {
          throw new DesignError('parts', `The coupling coefficients of ${p.name} must be numbers between −1 and 1, the same both ways (k between ${wi.name} and ${wj.name} is ${String(kij)}).`);
        }
        return kij * Math.sqrt(wi.inductance) * Math.sqrt(wj.inductance);
      }));
      if (!positiveDefinite(l)) {
        throw new DesignError('parts', `The windings of ${p.name} cannot be coupled that tightly all at once (their inductance table is not positive definite): no real windings have these couplings.`);
      }
      groups.push({ windings: ws, l });
    } else {
      throw new DesignError('parts', `A part's kind must be "resistor", "capacitor", "inductor" or "windings" (got ${typeof (p as { kind?: unknown }).kind === 'string' ? JSON.stringify((p as { kind: string }).kind) : typeof (p as { kind?: unknown }).kind}).`);
    }
  }
  for (const [field, n] of [['sourceNode', c.sourceNode], ['topNode', c.topNode], ...(c.loadNode === undefined ? [] : [['loadNode', c.loadNode]])] as Array<[string, string]>) {
    if (!nodes.has(n)) throw new DesignError(field, `Node ${n} is not connected to any part.`);
  }
  return { c, nodes, groups };
}

/** Node voltages at one frequency (1 V source EMF), as re/im arrays by node index (shared buffers: read before the next solve). */
interface Solution {
  re: Float64Array;
  im: Float64Array;
}

/**
 * Complex Gauss–Jordan inverse of an m×m matrix held as [A | I] in the
 * row-major m×2m buffers (re, im); the inverse is left in the right half.
 */
function invertInPlace(m: number, re: Float64Array, im: Float64Array): void {
  const w = 2 * m;
  for (let col = 0; col < m; col++) {
    let piv = col;
    for (let r = col + 1; r < m; r++) if (Math.hypot(re[r * w + col], im[r * w + col]) > Math.hypot(re[piv * w + col], im[piv * w + col])) piv = r;
    if (piv !== col) {
      for (let j = 0; j < w; j++) {
        [re[col * w + j], re[piv * w + j]] = [re[piv * w + j], re[col * w + j]];
        [im[col * w + j], im[piv * w + j]] = [im[piv * w + j], im[col * w + j]];
      }
    }
    const pr = re[col * w + col];
    const pi = im[col * w + col];
    const d = pr * pr + pi * pi;
    if (!(d > 0)) throw new DesignError('parts', 'A group of windings has no inverse at this frequency.');
    const qr = pr / d;
    const qi = -pi / d;
    for (let j = 0; j < w; j++) {
      const xr = re[col * w + j];
      const xi = im[col * w + j];
      re[col * w + j] = xr * qr - xi * qi;
      im[col * w + j] = xr * qi + xi * qr;
    }
    for (let r = 0; r < m; r++) {
      if (r === col) continue;
      const fr = re[r * w + col];
      const fi = im[r * w + col];
      if (fr === 0 && fi === 0) continue;
      for (let j = 0; j < w; j++) {
        re[r * w + j] -= fr * re[col * w + j] - fi * im[col * w + j];
        im[r * w + j] -= fr * im[col * w + j] + fi * re[col * w + j];
      }
    }
  }
}

/**
 * A solver for the checked circuit: node voltages at any frequency, with the
 * frequency-independent stamps (resistors, source, load) made once and every
 * buffer reused.
 */
function solverOf(k: Checked): (f: number) => Solution {
  if (k.solver) return k.solver;
  const { c, nodes, groups } = k;
  const n = nodes.size;
  const idx = (name: string) => (name === '0' ? -1 : (nodes.get(name) as number));
  const base = new Float64Array(n * n);
  const yr = new Float64Array(n * n);
  const yi = new Float64Array(n * n);
  const br = new Float64Array(n);
  const bi = new Float64Array(n);
  const vr = new Float64Array(n);
  const vi = new Float64Array(n);
  /** Adds admittance (gr + j gi) between nodes a and b (−1 = ground) to (re, im). */
  const stamp = (re: Float64Array, im: Float64Array | null, a: number, b: number, gr: number, gi: number) => {
    if (a >= 0) { re[a * n + a] += gr; if (im) im[a * n + a] += gi; }
    if (b >= 0) { re[b * n + b] += gr; if (im) im[b * n + b] += gi; }
    if (a >= 0 && b >= 0) {
      re[a * n + b] -= gr; re[b * n + a] -= gr;
      if (im) { im[a * n + b] -= gi; im[b * n + a] -= gi; }
    }
  };
  const caps: Array<[number, number, number]> = [];
  const coils: Array<[number, number, number, number]> = [];
  for (const p of c.parts) {
    if (p.kind === 'resistor') stamp(base, null, idx(p.from), idx(p.to), 1 / p.resistance, 0);
    else if (p.kind === 'capacitor') caps.push([idx(p.from), idx(p.to), p.capacitance]);
    else if (p.kind === 'inductor') coils.push([idx(p.from), idx(p.to), p.inductance, p.resistance ?? 0]);
  }
  const s = idx(c.sourceNode);
  base[s * n + s] += 1 / c.sourceResistance;
  if (c.loadNode !== undefined) {
    const l = idx(c.loadNode);
    base[l * n + l] += 1 / (c.loadResistance as number);
  }
  const sets = groups.map((g) => {
    const m = g.windings.length;
    return { m, g, from: g.windings.map((w) => idx(w.from)), to: g.windings.map((w) => idx(w.to)), re: new Float64Array(2 * m * m), im: new Float64Array(2 * m * m) };
  });
  k.solver = (f: number): Solution => {
    const w = TWO_PI * f;
    yr.set(base);
    yi.fill(0);
    br.fill(0);
    bi.fill(0);
    br[s] = 1 / c.sourceResistance;
    for (const [a, b, cap] of caps) stamp(yr, yi, a, b, 0, w * cap);
    for (const [a, b, l, r] of coils) {
      const x = w * l;
      const d = r * r + x * x;
      stamp(yr, yi, a, b, r / d, -x / d);
    }
    for (const t of sets) {
      const { m, g } = t;
      const wd = 2 * m;
      t.re.fill(0);
      t.im.fill(0);
      for (let i = 0; i < m; i++) {
        t.re[i * wd + i] = g.windings[i].resistance;
        t.re[i * wd + m + i] = 1;
        for (let j = 0; j < m; j++) t.im[i * wd + j] = w * g.l[i][j];
      }
      invertInPlace(m, t.re, t.im);
      for (let i = 0; i < m; i++) {
        for (let j = 0; j < m; j++) {
          const gr = t.re[i * wd + m + j];
          const gi = t.im[i * wd + m + j];
          const add = (r: number, q: number, sign: number) => {
            if (r < 0 || q < 0) return;
            yr[r * n + q] += sign * gr;
            yi[r * n + q] += sign * gi;
          };
          add(t.from[i], t.from[j], 1); add(t.from[i], t.to[j], -1); add(t.to[i], t.from[j], -1); add(t.to[i], t.to[j], 1);
        }
      }
    }
    // Gaussian elimination with partial pivoting
    for (let col = 0; col < n; col++) {
      let piv = col;
      let best = Math.hypot(yr[col * n + col], yi[col * n + col]);
      for (let r = col + 1; r < n; r++) {
        const v = Math.hypot(yr[r * n + col], yi[r * n + col]);
        if (v > best) { best = v; piv = r; }
      }
      if (!(best > 0) || !Number.isFinite(best)) {
        throw new DesignError('parts', 'The circuit has a node with no path to ground at this frequency (a part is left floating), so it cannot be solved.');
      }
      if (piv !== col) {
        for (let j = 0; j < n; j++) {
          [yr[col * n + j], yr[piv * n + j]] = [yr[piv * n + j], yr[col * n + j]];
          [yi[col * n + j], yi[piv * n + j]] = [yi[piv * n + j], yi[col * n + j]];
        }
        [br[col], br[piv]] = [br[piv], br[col]];
        [bi[col], bi[piv]] = [bi[piv], bi[col]];
      }
      const pr = yr[col * n + col];
      const pi = yi[col * n + col];
      const d = pr * pr + pi * pi;
      for (let r = col + 1; r < n; r++) {
        const ar = yr[r * n + col];
        const ai = yi[r * n + col];
        if (ar === 0 && ai === 0) continue;
        const fr = (ar * pr + ai * pi) / d;
        const fi = (ai * pr - ar * pi) / d;
        for (let j = col; j < n; j++) {
          yr[r * n + j] -= fr * yr[col * n + j] - fi * yi[col * n + j];
          yi[r * n + j] -= fr * yi[col * n + j] + fi * yr[col * n + j];
        }
        br[r] -= fr * br[col] - fi * bi[col];
        bi[r] -= fr * bi[col] + fi * br[col];
      }
    }
    for (let r = n - 1; r >= 0; r--) {
      let sr = br[r];
      let si = bi[r];
      for (let j = r + 1; j < n; j++) {
        sr -= yr[r * n + j] * vr[j] - yi[r * n + j] * vi[j];
        si -= yr[r * n + j] * vi[j] + yi[r * n + j] * vr[j];
      }
      const pr = yr[r * n + r];
      const pi = yi[r * n + r];
      const d = pr * pr + pi * pi;
      vr[r] = (sr * pr + si * pi) / d;
      vi[r] = (si * pr - sr * pi) / d;
    }
    return { re: vr, im: vi };
  };
  return k.solver;
}

/** What the circuit does at one frequency. */
export interface MatchPoint {
  frequency: number;
  /** Impedance the source looks into (not counting its own resistance), Ω. */
  inputImpedance: Complex;
  /** −20 log10|Γ| at the source, dB (≥ 0; at most 300). */
  returnLoss: number;
  /** |V_top / V_source node|: the voltage step-up from where the source connects to the top of the tank. */
  voltageRatio: number;
  /** |V_top| per volt of source EMF. */
  topVoltage: number;
  /** −10 log10(P_load/P_available), dB (only with a load). */
  transducerLoss?: number;
}

function pointOf(k: Checked, f: number): MatchPoint {
  const v = solverOf(k)(f);
  const { c, nodes } = k;
  const s = nodes.get(c.sourceNode) as number;
  const t = nodes.get(c.topNode) as number;
  const rs = c.sourceResistance;
  // I = (1 − V)/R_s, Z_in = V / I
  const ir = (1 - v.re[s]) / rs;
  const ii = -v.im[s] / rs;
  const d = ir * ir + ii * ii;
  const zin = { re: (v.re[s] * ir + v.im[s] * ii) / d, im: (v.im[s] * ir - v.re[s] * ii) / d };
  const gr = zin.re - rs;
  const gd = Math.hypot(zin.re + rs, zin.im);
  const gamma = Math.hypot(gr, zin.im) / gd;
  const top = Math.hypot(v.re[t], v.im[t]);
  const point: MatchPoint = {
    frequency: f,
    inputImpedance: zin,
    returnLoss: -20 * Math.log10(Math.max(gamma, 1e-15)),
    voltageRatio: top / Math.hypot(v.re[s], v.im[s]),
    topVoltage: top,
  };
  if (c.loadNode !== undefined) {
    const l = nodes.get(c.loadNode) as number;
    const vl = Math.hypot(v.re[l], v.im[l]);
    const gain = (4 * rs * vl * vl) / (c.loadResistance as number);
    point.transducerLoss = Math.max(0, -10 * Math.log10(gain));
  }
  for (const x of [zin.re, zin.im, point.returnLoss, point.voltageRatio, top, point.transducerLoss ?? 0]) {
    if (!Number.isFinite(x)) throw new DesignError('parts', `The circuit's response at ${sayQuantity(f, 'Hz')} is beyond what can be computed: check its values.`);
  }
  return point;
}

/**
 * The circuit's response at one frequency: the impedance the source sees, the
 * return loss, the step-up to the top and (with a load) the transducer loss.
 * @param circuit the matched circuit (SI units)
 * @param frequency Hz (> 0)
 * @throws DesignError for a circuit or frequency that cannot be solved
 */
export function matchCircuitAt(circuit: MatchCircuit, frequency: number): MatchPoint {
  const k = checkMatchCircuit(circuit);
  const f = tankValue('frequency', frequency, 'Frequency', 'Hz');
  return pointOf(k, f);
}

/** The circuit's loaded resonance and what it gives there. */
export interface MatchResponse extends MatchPoint {
  /** Where the output peaks (the load's voltage, or the top of the tank without a load), Hz. */
  frequency: number;
  /** The −3 dB edges of that peak, Hz. */
  lowerFrequency: number;
  upperFrequency: number;
  /** upper − lower, Hz. */
  bandwidth: number;
  /** frequency / bandwidth. */
  loadedQ: number;
  /** Mismatch loss at the source at the peak, −10 log10(1 − |Γ|²), dB. */
  mismatchLoss: number;
}

/** Squared output per volt of EMF at f: the load's voltage, or the top of the tank. */
function output(k: Checked, f: number): number {
  const v = solverOf(k)(f);
  const node = k.nodes.get(k.c.loadNode ?? k.c.topNode) as number;
  return v.re[node] * v.re[node] + v.im[node] * v.im[node];
}

/** Largest |ln f − ln f0| searched for the peak and its edges (a factor of about 55). */
const SEARCH_SPAN = 4;

/**
 * The loaded resonance of a matched circuit and its −3 dB bandwidth, found on
 * the exact response: a scan in ln f around the design frequency (±`span`,
 * 41 points, widened until the best point is inside), a golden-section search
 * for the peak, then the −3 dB edges by stepping out and the Illinois
 * regula falsi to about 1e-13 of their distance from the peak.
 * Figures at the peak as `matchCircuitAt` gives them.
 * @param circuit the matched circuit
 * @param options.bandwidth an estimate of the bandwidth (Hz) to start the search with
 * @throws DesignError('circuit') when there is no peak with −3 dB edges within a factor of 55 of the design frequency
 */
export function analyzeMatchCircuit(circuit: MatchCircuit, options?: { bandwidth?: number }): MatchResponse {
  const k = checkMatchCircuit(circuit);
  const f0 = k.c.frequency;
  const hint = options?.bandwidth;
  let span = typeof hint === 'number' && hint > 0 && Number.isFinite(hint) ? Math.min(1, (4 * hint) / f0) : 0.5;
  const y = (t: number) => output(k, f0 * Math.exp(t));
  let best = 0;
  let step = 0;
  for (;;) {
    const n = 41;
    step = (2 * span) / (n - 1);
    let bestY = -1;
    let bestI = 0;
    for (let i = 0; i < n; i++) {
      const v = y(-span + i * step);
      if (v > bestY) { bestY = v; bestI = i; }
    }
    best = -span + bestI * step;
    if ((bestI > 0 && bestI < n - 1) || span >= SEARCH_SPAN) break;
    span = Math.min(SEARCH_SPAN, span * 4);
  }
  // golden section on [best − step, best + step]
  let a = best - step;
  let b = best + step;
  const g = (Math.sqrt(5) - 1) / 2;
  let x1 = b - g * (b - a);
  let x2 = a + g * (b - a);
  let y1 = y(x1);
  let y2 = y(x2);
  for (let i = 0; i < 80 && b - a > 1e-8 * step; i++) {
    if (y1 < y2) { a = x1; x1 = x2; y1 = y2; x2 = a + g * (b - a); y2 = y(x2); }
    else { b = x2; x2 = x1; y2 = y1; x1 = b - g * (b - a); y1 = y(x1); }
  }
  const tPeak = 0.5 * (a + b);
  const yPeak = Math.max(y(tPeak), y1, y2);
  const half = yPeak / 2;
  const edge = (dir: 1 | -1): number => {
    let inside = tPeak;
    let h = Math.max(step / 8, 1e-9);
    let outside = tPeak + dir * h;
    while (y(outside) > half) {
      inside = outside;
      h *= 2;
      outside = tPeak + dir * h;
      if (Math.abs(outside) > SEARCH_SPAN) {
        throw new DesignError('circuit', `The circuit's response has no −3 dB edge within a factor of ${sayNumber(Math.exp(SEARCH_SPAN), 2)} of ${sayQuantity(f0, 'Hz')}: it is too broad to be called tuned (loaded Q well below 1).`);
      }
    }
    // Illinois regula falsi on y − half between the last point above and the first below
    let a0 = inside;
    let fa = y(a0) - half;
    let b0 = outside;
    let fb = y(b0) - half;
    let side = 0;
    for (let i = 0; i < 200 && Math.abs(b0 - a0) > 1e-13 * Math.max(1e-3, Math.abs(b0 - tPeak)); i++) {
      let x = (a0 * fb - b0 * fa) / (fb - fa);
      if (!(Math.min(a0, b0) < x && x < Math.max(a0, b0))) x = 0.5 * (a0 + b0);
      const fx = y(x) - half;
      if (fx === 0) return x;
      if (fx > 0) {
        a0 = x; fa = fx;
        if (side === 1) fb /= 2;
        side = 1;
      } else {
        b0 = x; fb = fx;
        if (side === -1) fa /= 2;
        side = -1;
      }
    }
    return (a0 * fb - b0 * fa) / (fb - fa);
  };
  const tLo = edge(-1);
  const tHi = edge(1);
  const fPeak = f0 * Math.exp(tPeak);
  const lowerFrequency = f0 * Math.exp(tLo);
  const upperFrequency = f0 * Math.exp(tHi);
  // upper − lower without cancellation: f0 (e^tHi − e^tLo) = f0 e^tLo expm1(tHi − tLo)
  const bandwidth = lowerFrequency * Math.expm1(tHi - tLo);
  const point = pointOf(k, fPeak);
  return {
    ...point,
    lowerFrequency,
    upperFrequency,
    bandwidth,
    loadedQ: fPeak / bandwidth,
    mismatchLoss: mismatchLoss(k.c.sourceResistance, point.inputImpedance),
  };
}

/** Curves for a plot: equal-length arrays against frequency. */
export interface MatchSweep {
  frequency: number[];
  /** Return loss at the source, dB (≥ 0, at most 300). */
  returnLoss: number[];
  /** Transducer loss source → load, dB (only with a load). */
  transducerLoss?: number[];
}

/**
 * Return loss at the source (and transducer loss to the load) over a sweep,
 * from the exact response. Default sweep: 401 points, linear, from f0/2 to 1.5 f0.
 * @param circuit the matched circuit
 * @param sweep frequencies (start, stop in Hz; points; spacing)
 */
export function sweepMatchCircuit(circuit: MatchCircuit, sweep?: SweepOptions): MatchSweep {
  const k = checkMatchCircuit(circuit);
  const f0 = k.c.frequency;
  const options = checkSweepOptions(sweep ?? { start: f0 / 2, stop: 1.5 * f0, points: 401, spacing: 'linear' });
  if (options.points > 100_000) throw new DesignError('points', 'A plot needs at most 100,000 points.');
  const out: MatchSweep = { frequency: [], returnLoss: [], ...(k.c.loadNode === undefined ? {} : { transducerLoss: [] }) };
  for (const f of frequencyGrid(options)) {
    const p = pointOf(k, f);
    out.frequency.push(f);
    out.returnLoss.push(p.returnLoss);
    if (out.transducerLoss) out.transducerLoss.push(p.transducerLoss as number);
  }
  return out;
}
