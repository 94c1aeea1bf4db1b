import { describe, expect, it } from 'vitest';
import {
  toroidInductance, toroidTurnsForInductance, inductanceFromAl, turnsFromAl, toroidCoreQ, toroidWinding, DesignError, MU_0,
} from '../../src/core';
import { fieldOf } from '../helpers/asserts';

// Invented demo core (no maker's size): OD 20 mm, ID 10 mm, height 5 mm, μr 10, 20 turns.
const core = { outerDiameter: 0.02, innerDiameter: 0.01, height: 0.005, relativePermeability: 10 };

describe('toroidInductance', () => {
  it('hand calculation of μ0 μr N² h ln(OD/ID) / 2π', () => {
    // Grover 1946 / Snelling 1988, rectangular-section toroid; by hand with μ0 ≈ 4π × 1e-7:
    // μ0/2π = 2e-7; × μr 10 = 2e-6; × N² 400 = 8e-4; × h 0.005 = 4e-6; × ln 2 (0.693147) = 2.77259e-6 H
    // AL = 2.77259e-6 / 400 = 6.93147e-9 H/turn² (6.93 nH/turn²)
    const t = toroidInductance({ ...core, turns: 20 });
    expect(t.inductance / 2.77259e-6).toBeCloseTo(1, 5);
    expect(t.al / 6.93147e-9).toBeCloseTo(1, 5);
    expect(t.inductance / ((MU_0 * 10 * 400 * 0.005 * Math.log(2)) / (2 * Math.PI))).toBeCloseTo(1, 14);
  });

  it('effective path length and area reproduce L = μ0 μr N² Ae / le', () => {
    // IEC 60205: le = C1²/C2, Ae = C1/C2; for this core by hand: le = 2π ln2 / (200 − 100) = 43.55 mm,
    // Ae = 0.005 × ln²2 / 100 = 24.02 mm²
    const t = toroidInductance({ ...core, turns: 20 });
    expect(t.effectivePathLength * 1e3).toBeCloseTo(43.55, 2);
    expect(t.effectiveArea * 1e6).toBeCloseTo(24.02, 2);
    expect((MU_0 * 10 * 400 * t.effectiveArea) / t.effectivePathLength / t.inductance).toBeCloseTo(1, 12);
    // thin ring: le → π × mean diameter (common practice, no published source)
    const thin = toroidInductance({ turns: 10, outerDiameter: 0.0201, innerDiameter: 0.0199, height: 0.001, relativePermeability: 1 });
    expect(thin.effectivePathLength / (Math.PI * 0.02)).toBeCloseTo(1, 4);
  });

  it('notes: permeability spread, few turns on a low-μ core', () => {
    expect(toroidInductance({ ...core, turns: 20 }).notes.some((n) => n.field === 'relativePermeability')).toBe(true);
    const air = toroidInductance({ ...core, relativePermeability: 1, turns: 4 });
    expect(air.notes.some((n) => n.level === 'validity' && n.field === 'turns')).toBe(true);
  });

  it('rejects bad geometry naming the field', () => {
    expect(fieldOf(() => toroidInductance({ ...core, turns: 20, innerDiameter: 0.03 }))).toBe('innerDiameter');
    expect(fieldOf(() => toroidInductance({ ...core, turns: 20, innerDiameter: 0 }))).toBe('innerDiameter');
    expect(fieldOf(() => toroidInductance({ ...core, turns: 20, height: -1 }))).toBe('height');
    expect(fieldOf(() => toroidInductance({ ...core, turns: Number.NaN }))).toBe('turns');
    expect(fieldOf(() => toroidInductance({ ...core, turns: 20, relativePermeability: 0 }))).toBe('relativePermeability');
    expect(fieldOf(() => toroidInductance({ ...core, turns: 20, outerDiameter: Number.POSITIVE_INFINITY }))).toBe('outerDiameter');
  });
});

describe('toroidTurnsForInductance and AL', () => {
  it('round trip and whole practical turns', () => {
    const t = toroidTurnsForInductance({ ...core, inductance: 10e-6 });
    // √(10e-6 / 6.93147e-9) = 37.98 turns by hand
    expect(t.turns).toBeCloseTo(37.98, 2);
    expect(t.practicalTurns).toBe(38);
    expect(t.practicalInductance).toBeCloseTo(toroidInductance({ ...core, turns: 38 }).inductance, 20);
  });

  it('warns when even one turn is too much', () => {
    const t = toroidTurnsForInductance({ ...core, relativePermeability: 5000, inductance: 1e-6 });
    expect(t.practicalTurns).toBe(1);
    expect(t.notes.some((n) => n.field === 'inductance')).toBe(true);
  });

  it('L = AL N² with AL in H/turn² (a maker\'s 250 nH/turn² is 250e-9 here)', () => {
    // common practice: 250 nH/turn² × 10² = 25 µH
    expect(inductanceFromAl(250e-9, 10)).toBeCloseTo(25e-6, 18);
    expect(turnsFromAl(250e-9, 25e-6)).toBeCloseTo(10, 12);
    expect(fieldOf(() => inductanceFromAl(0, 10))).toBe('al');
    expect(fieldOf(() => turnsFromAl(250e-9, -1))).toBe('inductance');
  });
});

describe('toroidCoreQ', () => {
  it("Q_core = μ'/μ'', combined with the winding as 1/Q = 1/Qc + 1/Qw", () => {
    // Snelling 1988 (core Q from complex permeability); Pozar (1/Q = Σ 1/Qᵢ). By hand: 100/2 = 50; 1/(1/50 + 1/200) = 40
    expect(toroidCoreQ(100, 2)).toBe(50);
    expect(toroidCoreQ(100, 2, 200)).toBeCloseTo(40, 12);
    expect(toroidCoreQ(100, 0)).toBe(Number.POSITIVE_INFINITY);
    expect(toroidCoreQ(100, 0, 150)).toBe(150);
    expect(fieldOf(() => toroidCoreQ(100, -1))).toBe('muImag');
    expect(fieldOf(() => toroidCoreQ(100, 1, 0))).toBe('windingQ');
  });
});

describe('toroidWinding', () => {
  it('wire per turn and turns per layer by hand', () => {
    // hand calculation (common practice, no published source): core 12.7 × 7.7 × 4.8 mm, 0.5 mm wire
    // per turn = 2·4.8 + (12.7 − 7.7) + 4·0.5 = 16.6 mm; 20 turns + two 30 mm leads = 392 mm
    // per layer = ⌊π (7.7 − 0.5) / 0.5⌋ = ⌊45.24⌋ = 45
    const w = toroidWinding({ turns: 20, outerDiameter: 12.7e-3, innerDiameter: 7.7e-3, height: 4.8e-3, insulatedDiameter: 0.5e-3, leadLength: 30e-3 });
    expect(w.lengthPerTurn).toBeCloseTo(16.6e-3, 12);
    expect(w.wireLength).toBeCloseTo(0.392, 12);
    expect(w.turnsPerLayer).toBe(45);
    expect(w.notes).toEqual([]);
  });
  it('warns when the turns need a second layer, and refuses wire thicker than the hole', () => {
    const w = toroidWinding({ turns: 60, outerDiameter: 12.7e-3, innerDiameter: 7.7e-3, height: 4.8e-3, insulatedDiameter: 0.5e-3 });
    expect(w.notes.map((n) => n.field)).toEqual(['innerDiameter']);
    expect(() => toroidWinding({ turns: 5, outerDiameter: 12.7e-3, innerDiameter: 2e-3, height: 4.8e-3, insulatedDiameter: 2e-3 })).toThrow(DesignError);
  });
});

describe('AL given instead of the permeability', () => {
  it('L = AL N² (definition of AL), the core factors still from the dimensions', () => {
    // 5 nH/turn² × 20² = 2 µH; with a typed AL the permeability-spread remark does not apply
    const t = toroidInductance({ turns: 20, outerDiameter: 0.02, innerDiameter: 0.01, height: 0.005, al: 5e-9 });
    expect(t.inductance).toBeCloseTo(2e-6, 18);
    expect(t.al).toBe(5e-9);
    expect(t.effectivePathLength * 1e3).toBeCloseTo(43.55, 2); // as by hand above (IEC 60205)
    expect(t.notes.some((n) => n.field === 'relativePermeability')).toBe(false);
    // √(2 µH / 5 nH) = 20 turns
    expect(toroidTurnsForInductance({ inductance: 2e-6, outerDiameter: 0.02, innerDiameter: 0.01, height: 0.005, al: 5e-9 }).turns).toBeCloseTo(20, 12);
  });
  it('neither μ nor AL: refused at the permeability', () => {
    expect(fieldOf(() => toroidInductance({ turns: 20, outerDiameter: 0.02, innerDiameter: 0.01, height: 0.005 }))).toBe('relativePermeability');
    expect(fieldOf(() => toroidInductance({ ...core, turns: 20, al: -1 }))).toBe('al');
  });
  it('a null options object is a DesignError', () => {
    for (const f of [toroidInductance, toroidTurnsForInductance, toroidWinding] as Array<(x: unknown) => unknown>) {
      expect(() => f(null)).toThrow(DesignError);
      expect(() => f(undefined)).toThrow(DesignError);
    }
    expect(fieldOf(() => toroidCoreQ(1e300, 1e-300))).toBe('muImag');
    expect(fieldOf(() => inductanceFromAl(1e-3, 1e300))).toBe('turns');
  });
});
