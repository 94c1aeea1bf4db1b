import { describe, expect, it } from 'vitest';
import {
  coilAcResistance, coilQ, solenoidProximityFactor, transverseFieldLoss, skinDepth,
  wireResistanceDc, wireAcResistanceRatio, DesignError, MU_0,
} from '../../src/core';

const SIGMA = 58e6; // IEC 60028 copper, S/m

describe('round wire in a transverse field (Butterworth 1922)', () => {
  // Loss per metre P = ΔR · I²/2 with ΔR/R_dc = 8π² (a H0/I)² · transverseFieldLoss(a/δ), R_dc = 1/(σπa²)
  const lossPerMetre = (a: number, f: number, H0: number) => {
    const s = a / skinDepth(f);
    const I = 1;
    const dR = (8 * Math.PI ** 2 * (a * H0 / I) ** 2 * transverseFieldLoss(s)) / (SIGMA * Math.PI * a * a);
    return (dR * I * I) / 2;
  };
  it('low-frequency limit is the classical eddy loss πσω²B²a⁴/8', () => {
    // classical result for a cylinder in a uniform transverse field (quasi-static eddy currents)
    const a = 0.1e-3, f = 1e3, H0 = 100;
    const w = 2 * Math.PI * f, B = MU_0 * H0;
    expect(lossPerMetre(a, f, H0) / ((Math.PI * SIGMA * w * w * B * B * a ** 4) / 8)).toBeCloseTo(1, 5);
  });
  it('high-frequency limit is the surface loss 2π a R_s H0² (surface field 2 H0 sin θ)', () => {
    // perfect-conductor field on a cylinder in a uniform field is 2 H0 sin θ; loss ½ R_s ∮ H² a dθ
    const a = 1e-3, f = 100e6, H0 = 10;
    const Rs = 1 / (SIGMA * skinDepth(f));
    const s = a / skinDepth(f);
    // next correction is of order 1/s (s ≈ 151 here)
    expect(Math.abs(lossPerMetre(a, f, H0) / (2 * Math.PI * a * Rs * H0 * H0) - 1)).toBeLessThan(2 / s);
    expect(s).toBeGreaterThan(150);
  });
});

describe('proximity factor of a long single-layer solenoid', () => {
  it('is 1 at DC and tends to 1 + (π²/2)(d/p)² at high frequency', () => {
    // limit of the model (module header): exact
    expect(solenoidProximityFactor({ frequency: 0, wireDiameter: 1e-3, pitch: 2e-3 }).proximityFactor).toBe(1);
    const hf = solenoidProximityFactor({ frequency: 10e9, wireDiameter: 1e-3, pitch: 2e-3 });
    expect(hf.proximityFactor).toBeCloseTo(1 + (Math.PI ** 2 / 2) * 0.25, 2);
  });
  it('vanishes as the fourth power of a/δ at low frequency', () => {
    // LF: extra = (π²/2)(d/p)² s⁴/8
    const f = 1e3;
    const d = 0.5e-3, p = 1e-3;
    const s = d / 2 / skinDepth(f);
    const r = solenoidProximityFactor({ frequency: f, wireDiameter: d, pitch: p });
    expect((r.proximityFactor - 1) / ((Math.PI ** 2 / 2) * 0.25 * s ** 4 / 8)).toBeCloseTo(1, 4);
  });
  it('refuses overlapping turns', () => {
    try {
      solenoidProximityFactor({ frequency: 1e6, wireDiameter: 1e-3, pitch: 0.5e-3 });
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(DesignError);
      expect((e as DesignError).field).toBe('pitch');
      expect((e as DesignError).message).toMatch(/overlap/);
    }
  });
});

describe('coil AC resistance and Q', () => {
  // demo coil for a fictional workshop: 14 turns of 1 mm copper, 25 mm diameter, 2 mm pitch (l/D = 1.12)
  const coil = { turns: 14, diameter: 25e-3, pitch: 2e-3, wireDiameter: 1e-3, leadLength: 20e-3 };
  it('DC resistance is that of the helix plus both leads (IEC 60028 copper)', () => {
    const r = coilAcResistance({ ...coil, frequency: 0 });
    const len = 14 * Math.hypot(Math.PI * 25e-3, 2e-3) + 0.04;
    expect(r.wireLength).toBeCloseTo(len, 12);
    expect(r.dcResistance).toBeCloseTo(wireResistanceDc(len, 1e-3), 12);
    expect(r.acResistance).toBeCloseTo(r.dcResistance, 12);
  });
  it('AC resistance = winding × skin × proximity + leads × skin', () => {
    const f = 7e6;
    const r = coilAcResistance({ ...coil, frequency: f });
    const F = wireAcResistanceRatio(1e-3, f);
    expect(r.skinRatio).toBeCloseTo(F, 12);
    const winding = wireResistanceDc(14 * Math.hypot(Math.PI * 25e-3, 2e-3), 1e-3);
    const leads = wireResistanceDc(0.04, 1e-3);
    expect(r.acResistance).toBeCloseTo(winding * F * r.proximityFactor + leads * F, 12);
    expect(r.proximityFactor).toBeGreaterThan(1);
    expect(r.proximityFactor).toBeLessThan(1 + (Math.PI ** 2 / 2) * 0.25);
    expect(r.uncertainty).toBeGreaterThan(0.03);
    expect(r.uncertainty).toBeLessThan(0.25);
    expect(r.notes.some((n) => n.level === 'info' && /uncertainty/.test(n.message))).toBe(true);
  });
  it('Q = ωL/R_ac', () => {
    const f = 7e6, L = 1.8e-6; // inductance given as a plain number
    const r = coilQ({ ...coil, frequency: f, inductance: L });
    expect(r.q).toBeCloseTo((2 * Math.PI * f * L) / r.acResistance, 9);
    // hand check: R_dc ≈ 0.0241 Ω, skin ratio ≈ 10.3 (a/δ ≈ 20), proximity ≈ 2.2 → R_ac ≈ 0.55 Ω, Q ≈ 145
    expect(r.q).toBeGreaterThan(130);
    expect(r.q).toBeLessThan(160);
  });
  it('copper at 70 °C raises the resistance', () => {
    const hot = coilAcResistance({ ...coil, frequency: 7e6, temperature: 70 });
    const cold = coilAcResistance({ ...coil, frequency: 7e6 });
    expect(hot.dcResistance / cold.dcResistance).toBeCloseTo(1 + 50 * 0.00393, 9);
    expect(hot.acResistance).toBeGreaterThan(cold.acResistance);
  });
  it('flags close winding and short coils, with a larger uncertainty', () => {
    const close = coilAcResistance({ ...coil, pitch: 1.05e-3, frequency: 7e6 });
    expect(close.notes.some((n) => n.level === 'validity' && n.field === 'pitch')).toBe(true);
    const short = coilAcResistance({ turns: 4, diameter: 40e-3, pitch: 2e-3, wireDiameter: 1e-3, frequency: 7e6 });
    expect(short.notes.some((n) => n.level === 'validity' && n.field === 'length')).toBe(true);
    const normal = coilAcResistance({ ...coil, frequency: 7e6 });
    expect(normal.notes.some((n) => n.level === 'validity')).toBe(false);
    expect(close.uncertainty).toBeGreaterThan(normal.uncertainty);
  });
  it('rejects bad geometry with the field named', () => {
    expect(() => coilAcResistance({ ...coil, pitch: 0.9e-3, frequency: 1e6 })).toThrow(DesignError);
    expect(() => coilAcResistance({ ...coil, wireDiameter: 30e-3, pitch: 40e-3, frequency: 1e6 })).toThrow(DesignError);
    expect(() => coilQ({ ...coil, frequency: 1e6, inductance: 0 })).toThrow(DesignError);
  });
});
