import { describe, expect, it } from 'vitest';
import {
  awgDiameter, parseAwg, swgDiameter, parseSwg, SWG_DIAMETERS_INCH, METRIC_WIRE_DIAMETERS, enamelledDiameter, wireResistanceDc,
  resistivityAtTemperature, wireLengthForCoil, DesignError, COPPER_RESISTIVITY_20C,
} from '../../src/core';
import { fieldOf } from '../helpers/asserts';

describe('AWG diameters (ASTM B258)', () => {
  it('AWG 22 is 0.6438 mm', () => {
    // ASTM B258 formula value: 0.127 mm × 92^(14/39) = 0.6438 mm
    expect(awgDiameter(22) * 1e3).toBeCloseTo(0.6438, 4);
  });
  it('AWG 24 is 0.5106 mm', () => {
    // ASTM B258 formula value: 0.127 mm × 92^(12/39) = 0.5106 mm
    expect(awgDiameter(24) * 1e3).toBeCloseTo(0.5106, 4);
  });
  it('AWG 36 is 0.005 in = 0.127 mm exactly', () => {
    // ASTM B258: defining point of the gauge
    expect(awgDiameter(36)).toBeCloseTo(0.127e-3, 15);
  });
  it('AWG 0000 is 0.46 in = 11.684 mm exactly', () => {
    // ASTM B258: defining point of the gauge (0000 = 0.4600 in)
    expect(awgDiameter('0000') * 1e3).toBeCloseTo(11.684, 10);
    expect(awgDiameter(-3)).toBe(awgDiameter('0000'));
    expect(awgDiameter('4/0')).toBe(awgDiameter('0000'));
  });
  it('every six gauges halve the diameter, near enough (92^(6/39) ≈ 2.005)', () => {
    // consequence of the ASTM B258 formula: ratio 92^(6/39) exact
    expect(awgDiameter(10) / awgDiameter(16)).toBeCloseTo(92 ** (6 / 39), 12);
  });
  it('reads the usual spellings', () => {
    expect(parseAwg('000')).toBe(-2);
    expect(parseAwg('00')).toBe(-1);
    expect(parseAwg('2/0')).toBe(-1);
    expect(parseAwg('0')).toBe(0);
    expect(parseAwg('AWG 22')).toBe(22);
    expect(parseAwg('22 AWG')).toBe(22);
    expect(parseAwg(' 18 ')).toBe(18);
  });
  it('rejects sizes outside 0000 … 40 and nonsense', () => {
    expect(() => awgDiameter(41)).toThrow(DesignError);
    expect(() => awgDiameter(-4)).toThrow(DesignError);
    expect(() => awgDiameter(22.5)).toThrow(DesignError);
    expect(() => awgDiameter('00000')).toThrow(DesignError);
    expect(() => awgDiameter('twenty')).toThrow(DesignError);
    try {
      awgDiameter('x');
    } catch (e) {
      expect((e as DesignError).field).toBe('gauge');
    }
  });
});

describe('metric sizes and enamel', () => {
  it('lists R20 steps from 0.02 mm to 5 mm in increasing order', () => {
    // common practice (ISO 3 R20 steps as used by IEC 60317-0-1), from memory
    expect(METRIC_WIRE_DIAMETERS[0]).toBeCloseTo(0.02e-3, 12);
    expect(METRIC_WIRE_DIAMETERS[METRIC_WIRE_DIAMETERS.length - 1]).toBeCloseTo(5e-3, 12);
    expect(METRIC_WIRE_DIAMETERS).toContain(0.5e-3);
    expect(METRIC_WIRE_DIAMETERS).toContain(1e-3);
    for (let i = 1; i < METRIC_WIRE_DIAMETERS.length; i++) {
      const step = METRIC_WIRE_DIAMETERS[i] / METRIC_WIRE_DIAMETERS[i - 1];
      expect(step).toBeGreaterThan(1.09); // R20 step is 10^(1/20) = 1.122, rounded
      expect(step).toBeLessThan(1.15);
    }
  });
  it('grade 1 and grade 2 overall diameters near the recalled IEC 60317-0-1 maxima', () => {
    // from memory: IEC 60317-0-1 maximum overall diameters (not checked against the standard)
    const recalled: Array<[number, number, number]> = [
      [0.1, 0.117, 0.125],
      [0.5, 0.544, 0.566],
      [1.0, 1.062, 1.093],
    ];
    for (const [d, g1, g2] of recalled) {
      expect(Math.abs(enamelledDiameter(d * 1e-3, 1) * 1e3 - g1)).toBeLessThan(0.004);
      expect(Math.abs(enamelledDiameter(d * 1e-3, 2) * 1e3 - g2)).toBeLessThan(0.004);
    }
  });
  it('grade 2 is thicker than grade 1, both thicker than bare', () => {
    for (const d of METRIC_WIRE_DIAMETERS) {
      expect(enamelledDiameter(d, 1)).toBeGreaterThan(d);
      expect(enamelledDiameter(d, 2)).toBeGreaterThan(enamelledDiameter(d, 1));
    }
    expect(() => enamelledDiameter(1e-3, 3 as 1)).toThrow(DesignError);
  });
});

describe('DC resistance (IEC 60028)', () => {
  it('copper is 1/58 Ω·mm²/m at 20 °C', () => {
    // IEC 60028: 1.7241e-8 Ω·m
    expect(COPPER_RESISTIVITY_20C).toBeCloseTo(1.7241e-8, 12);
    // 1 m of 1 mm² copper = 1/58 Ω = 0.017241 Ω
    const d = Math.sqrt(4e-6 / Math.PI);
    expect(wireResistanceDc(1, d)).toBeCloseTo(1 / 58, 12);
  });
  it('1 km of 1 mm wire at 20 °C is 21.95 Ω', () => {
    // IEC 60028 resistivity: 1.7241e-8 × 1000 / (π × 0.25e-6) = 21.952 Ω
    expect(wireResistanceDc(1000, 1e-3)).toBeCloseTo(21.952, 3);
  });
  it('rises 0.393 %/K (IEC 60028 coefficient)', () => {
    // IEC 60028: α20 = 0.00393 /K → at 70 °C, factor 1 + 50 × 0.00393 = 1.1965
    expect(wireResistanceDc(1, 1e-3, 70) / wireResistanceDc(1, 1e-3, 20)).toBeCloseTo(1.1965, 12);
    expect(resistivityAtTemperature(0) / ((1 / 58e6) * (1 - 20 * 0.00393))).toBeCloseTo(1, 12);
  });
  it('rejects bad inputs with the field named', () => {
    expect(() => wireResistanceDc(0, 1e-3)).toThrow(DesignError);
    expect(() => wireResistanceDc(1, -1e-3)).toThrow(DesignError);
    expect(() => wireResistanceDc(1, 1e-3, -300)).toThrow(DesignError);
    expect(() => wireResistanceDc(1, 1e-3, -260)).toThrow(/linear temperature law/);
  });
});

describe('wire length for a coil', () => {
  it('close to N π D for a tight pitch, plus both leads', () => {
    // exact geometry: one turn of a helix is √((πD)² + p²)
    const l = wireLengthForCoil({ turns: 10, diameter: 0.02, pitch: 0.001, leadLength: 0.03 });
    expect(l).toBeCloseTo(10 * Math.hypot(Math.PI * 0.02, 0.001) + 0.06, 12);
    expect(l).toBeGreaterThan(10 * Math.PI * 0.02 + 0.06);
  });
  it('a 3-4-5 turn: πD = 3 and p = 4 give 5 per turn', () => {
    // exact: Pythagoras
    expect(wireLengthForCoil({ turns: 2, diameter: 3 / Math.PI, pitch: 4 })).toBeCloseTo(10, 12);
  });
  it('rejects a negative pitch and zero turns', () => {
    expect(() => wireLengthForCoil({ turns: 0, diameter: 0.01, pitch: 0.001 })).toThrow(DesignError);
    expect(() => wireLengthForCoil({ turns: 5, diameter: 0.01, pitch: -0.001 })).toThrow(DesignError);
  });
});

describe('SWG diameters (BS 3737:1964, the Imperial Standard Wire Gauge of 1883)', () => {
  it('spot values of the table', () => {
    // BS 3737:1964 table, values from memory, agreeing with the table as reproduced from the standard:
    // SWG 22 = 0.028 in, 30 = 0.0124 in, 40 = 0.0048 in, 14 = 0.080 in, 44 = 0.0032 in, 7/0 = 0.500 in, 50 = 0.001 in
    expect(swgDiameter(22)).toBeCloseTo(0.7112e-3, 15);
    expect(swgDiameter(30) * 1e3).toBeCloseTo(0.31496, 12);
    expect(swgDiameter(40) * 1e3).toBeCloseTo(0.12192, 12);
    expect(swgDiameter(14) * 1e3).toBeCloseTo(2.032, 12);
    expect(swgDiameter(44) * 1e3).toBeCloseTo(0.08128, 12);
    expect(swgDiameter('7/0') * 1e3).toBeCloseTo(12.7, 12);
    expect(swgDiameter(50) * 1e3).toBeCloseTo(0.0254, 12);
  });
  it('the table falls steadily: each gauge thinner than the one before, in whole or fractional thou', () => {
    // the gauge's construction (Order in Council 1883): steps in thousandths of an inch, never increasing
    for (let n = -6; n < 50; n++) {
      expect(swgDiameter(n + 1)).toBeLessThan(swgDiameter(n));
      const thou = swgDiameter(n) / 25.4e-6;
      expect(Math.abs(thou * 10 - Math.round(thou * 10))).toBeLessThan(1e-6); // tenths of a thou at most
    }
    expect(SWG_DIAMETERS_INCH).toHaveLength(57);
  });
  it('reads the usual spellings', () => {
    expect(parseSwg('SWG 22')).toBe(22);
    expect(parseSwg('22 swg')).toBe(22);
    expect(parseSwg('#36')).toBe(36);
    expect(parseSwg('0')).toBe(0);
    expect(parseSwg('1/0')).toBe(0);
    expect(parseSwg('2/0')).toBe(-1);
    expect(parseSwg('00')).toBe(-1);
    expect(parseSwg('7/0')).toBe(-6);
    expect(parseSwg('0000000')).toBe(-6);
  });
  it('refuses sizes outside 7/0 … 50 and nonsense with the field named', () => {
    for (const bad of [51, -7, 22.5, '8/0', 'twenty', '', 'constructor', null, undefined, Number.NaN]) {
      expect(fieldOf(() => swgDiameter(bad as number))).toBe('gauge');
      expect(fieldOf(() => awgDiameter(bad as number))).toBe('gauge');
    }
  });
  it('differs from AWG of the same number (SWG 22 = 0.711 mm, AWG 22 = 0.644 mm)', () => {
    // ASTM B258 vs BS 3737: the two gauges are not interchangeable
    expect(swgDiameter(22) / awgDiameter(22)).toBeCloseTo(0.7112 / 0.6438, 3);
  });
});

describe('hostile inputs', () => {
  it('refuses a missing options object and extreme values that would overflow', () => {
    expect(() => wireLengthForCoil(null as never)).toThrow(DesignError);
    expect(() => wireLengthForCoil({ turns: 1e300, diameter: 1e300, pitch: 0 })).toThrow(DesignError);
    expect(() => wireResistanceDc(1e300, 1e-300)).toThrow(DesignError);
    expect(() => resistivityAtTemperature('20' as never)).toThrow(DesignError);
    expect(Number.isFinite(resistivityAtTemperature(1e300))).toBe(true); // absurd, but finite
    expect(() => parseAwg(null as never)).toThrow(DesignError);
  });
});
