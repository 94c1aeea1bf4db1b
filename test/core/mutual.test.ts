/**
 * Mutual inductance (src/core/mutual.ts): Maxwell's formula for coaxial
 * loops against an independent numerical integration of Neumann's formula,
 * against the usual elliptic form evaluated with an independent library
 * (@stdlib), and against the published close-loop and distant-loop forms;
 * the sections of a tapped solenoid against the whole coil (designCoil),
 * against sums of Maxwell's formula over the turns, and in their limits.
 * Coils are demo values (invented).
 */
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { MU_0 } from '../../src/core/constants';
import { designCoil } from '../../src/core/coil';
import { nagaokaCoefficient } from '../../src/core/solenoid';
import {
  mutualInductanceCoaxialLoops, mutualInductanceCoaxialWindings, tappedCoilSections, tappedInductorRatio,
} from '../../src/core/mutual';
import { fieldOf, rel } from '../helpers/asserts';

const require = createRequire(import.meta.url);
// CommonJS, both take the parameter m = k²
const ellipk = require('@stdlib/math-base-special-ellipk') as (m: number) => number;
const ellipe = require('@stdlib/math-base-special-ellipe') as (m: number) => number;

/**
 * Composite Gauss–Legendre quadrature (10 points per panel) of f over [a, b],
 * the panels graded towards a (where a close pair of loops peaks) geometrically
 * down to `finest`. Nodes and weights: Abramowitz & Stegun, Table 25.4.
 */
const GL_X = [0.1488743389816312, 0.4333953941292472, 0.6794095682990244, 0.8650633666889845, 0.9739065285171717];
const GL_W = [0.2955242247147529, 0.2692667193099963, 0.2190863625159820, 0.1494513491505806, 0.0666713443086881];
function gauss(f: (x: number) => number, a: number, b: number): number {
  const h = (b - a) / 2;
  const c = (a + b) / 2;
  let s = 0;
  for (let i = 0; i < 5; i++) s += GL_W[i] * (f(c - h * GL_X[i]) + f(c + h * GL_X[i]));
  return s * h;
}
function integrate(f: (x: number) => number, a: number, b: number, finest: number): number {
  // panels [a, a + finest], then each twice as wide as the one before (ratio 1.5 keeps the rule exact to 1e-15), then even panels
  const edges = [a];
  let w = finest;
  while (edges[edges.length - 1] + w < b && w < (b - a) / 200) {
    edges.push(edges[edges.length - 1] + w);
    w *= 1.5;
  }
  const rest = b - edges[edges.length - 1];
  const n = Math.max(1, Math.ceil(rest / w));
  const start = edges[edges.length - 1];
  for (let i = 1; i <= n; i++) edges.push(start + (rest * i) / n);
  let s = 0;
  for (let i = 1; i < edges.length; i++) s += gauss(f, edges[i - 1], edges[i]);
  return s;
}

/**
 * Neumann's formula for two coaxial circles (Neumann 1845; Grover 1946):
 * M = (μ0/4π) ∮∮ dl₁·dl₂ / r = μ0 a b ∫₀^π cos φ / √(a² + b² + z² − 2ab cos φ) dφ,
 * integrated numerically here (nothing of the core used).
 */
function neumann(a: number, b: number, z: number): number {
  // φ from 0 to π; the integrand peaks at φ = 0 with a width about √(z² + (a − b)²)/√(ab)
  const f = (phi: number) => Math.cos(phi) / Math.sqrt((a - b) ** 2 + z * z + 4 * a * b * Math.sin(phi / 2) ** 2);
  const width = Math.sqrt(((a - b) ** 2 + z * z) / (a * b));
  return MU_0 * a * b * integrate(f, 0, Math.PI, Math.min(0.05, width / 20));
}

/** The usual form M = μ0 √(ab) [(2/k − k) K − (2/k) E] with @stdlib's K and E (an independent library). */
function classicMaxwell(a: number, b: number, z: number): number {
  const m = (4 * a * b) / ((a + b) ** 2 + z * z);
  const k = Math.sqrt(m);
  return MU_0 * Math.sqrt(a * b) * ((2 / k - k) * ellipk(m) - (2 / k) * ellipe(m));
}

describe('mutualInductanceCoaxialLoops', () => {
  const cases: Array<[number, number, number]> = [
    [10e-3, 10e-3, 1e-3], [10e-3, 20e-3, 5e-3], [10e-3, 10e-3, 0.1e-3], [25e-3, 10e-3, 0], [10e-3, 10e-3, 100e-3], [5e-3, 15e-3, 30e-3], [10e-3, 11e-3, 0.5e-3],
  ];

  it('equals Neumann\'s integral, integrated numerically, to 1e-9', () => {
    // Neumann 1845, as written in Grover 1946 for coaxial circles
    for (const [a, b, z] of cases) expect(rel(mutualInductanceCoaxialLoops(a, b, z), neumann(a, b, z)), `${a} ${b} ${z}`).toBeLessThan(1e-9);
  });

  it('equals the usual elliptic form with @stdlib\'s K and E where that form keeps its digits', () => {
    // Maxwell 1873; Grover 1946 (the form μ0 √(ab) [(2/k − k) K − (2/k) E])
    for (const [a, b, z] of cases.filter(([a, b, z]) => z < 5 * Math.max(a, b))) {
      expect(rel(mutualInductanceCoaxialLoops(a, b, z), classicMaxwell(a, b, z)), `${a} ${b} ${z}`).toBeLessThan(1e-10);
    }
  });

  it('tends to the close-loop form μ0 a (ln(8a/d) − 2) as the loops close up', () => {
    // Grover 1946 (leading terms of Maxwell's series for close circles)
    const a = 10e-3;
    const errors = [1e-1, 1e-2, 1e-3, 1e-4].map((x) => rel(mutualInductanceCoaxialLoops(a, a, x * a), MU_0 * a * (Math.log(8 / x) - 2)));
    for (let i = 1; i < errors.length; i++) expect(errors[i]).toBeLessThan(errors[i - 1]);
    expect(errors[1]).toBeLessThan(1e-4);
    expect(errors[3]).toBeLessThan(1e-7);
  });

  it('tends to the dipole form μ0 π a² b² / (2 z³) far apart, without losing digits', () => {
    // two coaxial magnetic dipoles (Grover 1946; any electromagnetism text)
    const a = 10e-3;
    const b = 15e-3;
    const dipole = (z: number) => (MU_0 * Math.PI * a * a * b * b) / (2 * z ** 3);
    expect(rel(mutualInductanceCoaxialLoops(a, b, 1000 * b), dipole(1000 * b))).toBeLessThan(1e-5);
    // at 10⁵ radii the usual form has lost most of its digits; the Landen form keeps them
    expect(rel(mutualInductanceCoaxialLoops(a, b, 1e5 * b), dipole(1e5 * b))).toBeLessThan(1e-9);
  });

  it('is symmetric in the two loops and scales with size', () => {
    // reciprocity (Neumann's formula is symmetric) and dimensional scaling M(λa, λb, λz) = λ M
    expect(mutualInductanceCoaxialLoops(10e-3, 17e-3, 4e-3)).toBe(mutualInductanceCoaxialLoops(17e-3, 10e-3, -4e-3));
    expect(rel(mutualInductanceCoaxialLoops(10, 17, 4), 1000 * mutualInductanceCoaxialLoops(10e-3, 17e-3, 4e-3))).toBeLessThan(1e-14);
  });

  it('refuses loops that are one circle, and bad sizes, at the argument', () => {
    expect(fieldOf(() => mutualInductanceCoaxialLoops(10e-3, 10e-3, 0))).toBe('separation');
    expect(fieldOf(() => mutualInductanceCoaxialLoops(0, 10e-3, 1e-3))).toBe('radiusA');
    expect(fieldOf(() => mutualInductanceCoaxialLoops(10e-3, -1, 1e-3))).toBe('radiusB');
    expect(fieldOf(() => mutualInductanceCoaxialLoops(10e-3, 10e-3, Number.NaN))).toBe('separation');
  });
});

describe('mutualInductanceCoaxialWindings', () => {
  it('sums the loop formula over the turns, part turns by their share', () => {
    const a = { radius: 10e-3, position: 0, pitch: 1e-3, turns: 3 };
    const b = { radius: 12e-3, position: 5e-3, pitch: 0.8e-3, turns: 2.5 };
    let sum = 0;
    for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) sum += (j === 2 ? 0.5 : 1) * mutualInductanceCoaxialLoops(10e-3, 12e-3, 5e-3 + j * 0.8e-3 - i * 1e-3);
    expect(rel(mutualInductanceCoaxialWindings(a, b), sum)).toBeLessThan(1e-14);
  });

  it('for fine pitch, approaches Nagaoka\'s current sheets: two halves of one long coil', () => {
    // Nagaoka 1909 (exact current-sheet inductance): M of the halves = (L(N) − 2 L(N/2)) / 2
    const r = 10e-3;
    const p = 0.2e-3;
    const n = 200;
    const sheet = (turns: number) => nagaokaCoefficient(2 * r, turns * p) * MU_0 * Math.PI * r * r * turns * turns / (turns * p);
    const halves = (sheet(n) - 2 * sheet(n / 2)) / 2;
    const loops = mutualInductanceCoaxialWindings({ radius: r, position: 0, pitch: p, turns: n / 2 }, { radius: r, position: 0, pitch: p, turns: n / 2, firstTurn: n / 2 });
    expect(rel(loops, halves)).toBeLessThan(2e-3);
  });

  it('refuses a turn lying on another, at the second winding\'s position', () => {
    expect(fieldOf(() => mutualInductanceCoaxialWindings({ radius: 1e-2, position: 0, pitch: 1e-3, turns: 2 }, { radius: 1e-2, position: 1e-3, pitch: 1e-3, turns: 1 }))).toBe('b.position');
    expect(fieldOf(() => mutualInductanceCoaxialWindings({ radius: 1e-2, position: 0, pitch: -1, turns: 2 }, { radius: 1e-2, position: 1e-3, pitch: 1e-3, turns: 1 }))).toBe('a.pitch');
  });
});

// Demo coils (invented): pitch at most a fifth of the radius, where Rosa's corrections hold well.
const coils = [
  { form: 'solenoid' as const, diameter: 20e-3, pitch: 1e-3, turns: 16, wire: { diameter: 0.5e-3 } },
  { form: 'solenoid' as const, diameter: 12e-3, closeWound: true, turns: 25, wire: { diameter: 0.4e-3, insulatedDiameter: 0.45e-3 } },
  { form: 'solenoid' as const, diameter: 40e-3, pitch: 3e-3, turns: 9, wire: { diameter: 1.5e-3 } },
];

/** Each turn a circle of round wire: Maxwell's formula between turns, μ0 r (ln(8r/ρ) − 7/4) for each turn itself (Grover 1946). */
function filamentCoil(c: (typeof coils)[number]) {
  const r = c.diameter / 2;
  const p = c.pitch ?? c.wire.insulatedDiameter ?? c.wire.diameter;
  const rho = c.wire.diameter / 2;
  const self = MU_0 * r * (Math.log((8 * r) / rho) - 1.75);
  const m = (i: number, j: number) => (i === j ? self : mutualInductanceCoaxialLoops(r, r, (j - i) * p));
  const linked = (n: number) => {
    let s = 0;
    for (let i = 0; i < n; i++) for (let j = 0; j < c.turns; j++) s += m(i, j);
    return s;
  };
  return { m, linked, whole: linked(c.turns) };
}

describe('tappedCoilSections', () => {
  it('L1 + L2 + 2M is the whole coil as designCoil gives it, at any tap, also at a working frequency', () => {
    for (const coil of coils) {
      const whole = designCoil(coil).inductance;
      const atF = designCoil({ ...coil, frequency: 7e6 }).inductanceAtFrequency as number;
      for (const tap of [0.5, 1, 1.5, 2.5, 5, coil.turns - 0.5, coil.turns]) {
        const s = tappedCoilSections({ coil, tapTurns: tap });
        expect(rel(s.lowerInductance + s.upperInductance + 2 * s.mutualInductance, whole), `${coil.diameter} ${tap}`).toBeLessThan(1e-12);
        const f = tappedCoilSections({ coil, tapTurns: tap, frequency: 7e6 });
        expect(rel(f.lowerInductance + f.upperInductance + 2 * f.mutualInductance, atF)).toBeLessThan(1e-12);
      }
    }
  });

  it('a tap at the top gives a step-up of 1', () => {
    // common practice, no published source: the tap is then the top itself
    const s = tappedCoilSections({ coil: coils[0], tapTurns: 16 });
    expect(s.stepUp).toBe(1);
    expect(s.upperInductance).toBe(0);
    expect(s.mutualInductance).toBe(0);
  });

  it('M between the sections agrees with Maxwell\'s formula summed over the turn pairs across the tap', () => {
    // Maxwell 1873; Grover 1946: an independent route (no current sheet, no Rosa correction)
    for (const coil of coils) {
      const p = coil.pitch ?? coil.wire.insulatedDiameter ?? coil.wire.diameter;
      for (const n of [1, 2, Math.floor(coil.turns / 2), coil.turns - 1]) {
        let sum = 0;
        for (let i = 0; i < n; i++) for (let j = n; j < coil.turns; j++) sum += mutualInductanceCoaxialLoops(coil.diameter / 2, coil.diameter / 2, (j - i) * p);
        expect(rel(tappedCoilSections({ coil, tapTurns: n }).mutualInductance, sum), `${coil.diameter} ${n}`).toBeLessThan(1e-3);
      }
    }
  });

  it('the step-up agrees with the one from turns taken as circles of round wire, within 0.5 %', () => {
    // Maxwell 1873 between turns, Grover 1946 for each turn's own inductance: step-up L / (L1 + M),
    // L1 + M the flux the turns below the tap link per ampere in the whole coil
    for (const coil of coils) {
      const fil = filamentCoil(coil);
      for (const n of [1, 2, 3, Math.floor(coil.turns / 2)]) {
        expect(rel(tappedCoilSections({ coil, tapTurns: n }).stepUp, fil.whole / fil.linked(n)), `${coil.diameter} ${n}`).toBeLessThan(5e-3);
      }
    }
  });

  it('near the cold end the step-up is above the turns ratio: the end turns link less flux', () => {
    // the field at the end of a solenoid is weaker than in its middle (any electromagnetism text); the filament route agrees
    for (const coil of coils) {
      const s = tappedCoilSections({ coil, tapTurns: 1 });
      expect(s.stepUp).toBeGreaterThan(1.1 * s.turnsRatio);
    }
  });

  it('approaches the turns ratio as the coupling between the sections tightens', () => {
    // ideal transformer (M² = L1 L2): (L1 + L2 + 2M)/(L1 + M) = N/n, derived by hand with L ∝ turns²
    const n = 2;
    const N = 10;
    const errs = [0.9, 0.99, 0.999, 1 - 1e-9].map((k) => {
      const a = 1e-7;
      return rel(tappedInductorRatio({ lowerInductance: n * n * a, upperInductance: (N - n) ** 2 * a, mutualInductance: k * n * (N - n) * a }), N / n);
    });
    for (let i = 1; i < errs.length; i++) expect(errs[i]).toBeLessThan(errs[i - 1]);
    expect(errs[3]).toBeLessThan(1e-8);
    // and from geometry: ever shorter, wider coils couple their sections ever more tightly
    const shapes = [[20e-3, 1e-3], [100e-3, 0.5e-3], [1, 0.1e-3], [10, 0.01e-3]].map(([d, p]) =>
      tappedCoilSections({ coil: { form: 'solenoid', diameter: d, pitch: p, turns: N, wire: { diameter: p / 2 } }, tapTurns: n }));
    for (let i = 1; i < shapes.length; i++) {
      expect(shapes[i].couplingCoefficient).toBeGreaterThan(shapes[i - 1].couplingCoefficient);
      expect(rel(shapes[i].stepUp, N / n)).toBeLessThan(rel(shapes[i - 1].stepUp, N / n));
    }
    expect(rel(shapes[3].stepUp, N / n)).toBeLessThan(0.02);
  });

  it('in a long coil tends to the turns ratio as well (long-coil limit: L ∝ N²/l, so each turn links the same flux)', () => {
    // published-values.md: long-coil limit L = μ0 N² A / l (Nagaoka's K → 1)
    // the end effect shrinks as the coil grows longer than its diameter (10, 40, 160 diameters)
    const errs = [100, 400, 1600].map((n) => rel(tappedCoilSections({ coil: { form: 'solenoid', diameter: 10e-3, pitch: 1e-3, turns: n, wire: { diameter: 0.5e-3 } }, tapTurns: n / 4 }).stepUp, 4));
    expect(errs[1]).toBeLessThan(errs[0]);
    expect(errs[2]).toBeLessThan(errs[1]);
    expect(errs[2]).toBeLessThan(0.005);
  });

  it('refuses a tap beyond the coil or at its cold end, a coil that cannot be tapped, and impossible sections', () => {
    const beyond = (() => { try { tappedCoilSections({ coil: coils[0], tapTurns: 17 }); } catch (e) { return e as Error & { field: string }; } })();
    expect(beyond?.field).toBe('tapTurns');
    expect(beyond?.message).toMatch(/beyond the coil: it has only 16 turns/);
    expect(fieldOf(() => tappedCoilSections({ coil: coils[0], tapTurns: 0 }))).toBe('tapTurns');
    expect(fieldOf(() => tappedCoilSections({ coil: { ...coils[0], turns: 1.5 }, tapTurns: 1 }))).toBe('coil.turns');
    expect(fieldOf(() => tappedCoilSections({ coil: { form: 'toroid', turns: 20, outerDiameter: 12.7e-3, innerDiameter: 7.7e-3, height: 4.9e-3, relativePermeability: 10, wire: { diameter: 0.5e-3 } } as never, tapTurns: 3 }))).toBe('coil.form');
    expect(fieldOf(() => tappedCoilSections({ coil: { ...coils[0], diameter: -1 }, tapTurns: 3 }))).toBe('coil.diameter');
    expect(fieldOf(() => tappedInductorRatio({ lowerInductance: 1e-6, upperInductance: 1e-6, mutualInductance: 1.1e-6 }))).toBe('mutualInductance');
    expect(fieldOf(() => tappedInductorRatio({ lowerInductance: 0, upperInductance: 1e-6, mutualInductance: 0 }))).toBe('lowerInductance');
  });
});
