import { describe, expect, it } from 'vitest';
import {
  designCoil, COIL_SPEC_FIELDS, coilQ, solenoidInductance, turnsForInductance, medhurstSelfCapacitance, apparentCoil,
  selfResonantFrequency, wireInternalImpedance, wireLengthForCoil, wireResistanceDc, resistivityAtTemperature, toroidInductance,
  toroidTurnsForInductance, toroidWinding, toroidCoreQ, multilayerInductance, multilayerTurnsForInductance, multilayerCapacity,
  frequencyGrid, skinDepth, type DesignCoilSpec, type DesignNote,
} from '../../src/core';
import { expectSI, fieldOf, rel } from '../helpers/asserts';

// Demo coils of a fictional workshop (invented values): a 40 m band tank coil on a 25 mm former,
// a small ferrite-free toroid and an IF multilayer coil.
const wire = { diameter: 0.5e-3, insulatedDiameter: 0.544e-3 };
const solenoidSpec = {
  form: 'solenoid', inductance: 4.7e-6, diameter: 25.544e-3, closeWound: true, wire, frequency: 7.1e6, leadLength: 0.015, temperature: 30,
} as const satisfies DesignCoilSpec;
const toroidCore = { outerDiameter: 12.7e-3, innerDiameter: 7.7e-3, height: 4.8e-3 };
const multilayerSection = { diameter: 12e-3, length: 6e-3, windingDepth: 4e-3 };

const messages = (notes: DesignNote[]) => notes.map((n) => n.message);

describe('designCoil: single-layer solenoid equals the functions it combines', () => {
  it('inductance given: turns, inductance, Wheeler, wire, resistance, Q, self-capacitance, apparent values', () => {
    const r = designCoil(solenoidSpec);
    const pitch = wire.insulatedDiameter; // close-wound: the pitch is the overall diameter
    const t = turnsForInductance({ inductance: 4.7e-6, diameter: solenoidSpec.diameter, pitch, wireDiameter: wire.diameter });
    expect(r.form).toBe('solenoid');
    expect(r.exactTurns).toBe(t.turns);
    expect(r.turns).toBe(t.practicalTurns);
    expect(r.turns * 2).toBe(Math.round(r.turns * 2)); // nearest half turn
    expect(r.targetInductance).toBe(4.7e-6);
    const sol = solenoidInductance({ diameter: solenoidSpec.diameter, turns: r.turns, pitch, wireDiameter: wire.diameter });
    expect(r.inductance).toBe(sol.inductance);
    expect(r.wheelerInductance).toBe(sol.wheelerInductance);
    expect(r.currentSheetInductance).toBe(sol.currentSheetInductance);
    expect(r.windingLength).toBe(sol.length);
    expect(r.pitch).toBe(pitch);
    expect(r.wireLength).toBe(wireLengthForCoil({ turns: r.turns, diameter: solenoidSpec.diameter, pitch, leadLength: 0.015 }));
    expect(r.resistanceDc).toBe(wireResistanceDc(r.wireLength, wire.diameter, 30));
    // L at f: the skin effect removes part of the wire's internal inductance
    const skin = wireInternalImpedance(wire.diameter, 7.1e6, resistivityAtTemperature(30));
    const lf = sol.inductance - sol.internalInductance * (1 - skin.internalInductanceRatio);
    expect(r.inductanceAtFrequency).toBe(lf);
    expect(r.inductanceAtFrequency!).toBeLessThan(r.inductance);
    expect(r.skinDepth).toBe(skin.skinDepth);
    const loss = coilQ({
      frequency: 7.1e6, turns: r.turns, diameter: solenoidSpec.diameter, pitch, wireDiameter: wire.diameter, leadLength: 0.015, temperature: 30, inductance: lf,
    });
    expect(r.resistanceAc).toBe(loss.acResistance);
    expect(r.q).toBe(loss.q);
    expect(r.qLow).toBe(loss.qLow);
    expect(r.qHigh).toBe(loss.qHigh);
    expect(r.qUncertainty).toEqual(loss.qUncertainty);
    const cs = medhurstSelfCapacitance(solenoidSpec.diameter, sol.length);
    expect(r.selfCapacitance).toBe(cs.selfCapacitance);
    expect(r.selfResonantFrequency).toBe(selfResonantFrequency(lf, cs.selfCapacitance));
    const app = apparentCoil({ inductance: lf, resistance: loss.acResistance, selfCapacitance: cs.selfCapacitance, frequency: 7.1e6 });
    expect(r.apparentInductance).toBe(app.apparentInductance);
    expect(r.apparentResistance).toBe(app.apparentResistance);
    expect(r.apparentQ).toBe(app.apparentQ);
    // every note of the parts is there once, under its spec path
    for (const m of [...messages(t.notes), ...messages(loss.notes), ...messages(cs.notes)]) {
      expect(messages(r.notes).filter((x) => x === m)).toHaveLength(1);
    }
    expect(new Set(messages(r.notes)).size).toBe(r.notes.length);
  });

  it('turns given: the same coil analysed, without exact turns or a target', () => {
    const r = designCoil({ form: 'solenoid', turns: 12, diameter: 20e-3, pitch: 1e-3, wire: { diameter: 0.8e-3 } });
    const sol = solenoidInductance({ diameter: 20e-3, turns: 12, pitch: 1e-3, wireDiameter: 0.8e-3 });
    expect(r.turns).toBe(12);
    expect(r.inductance).toBe(sol.inductance);
    expect(r.exactTurns).toBeUndefined();
    expect(r.targetInductance).toBeUndefined();
    // no frequency: no frequency-dependent results, but the self-capacitance and self-resonance
    expect(r.q).toBeUndefined();
    expect(r.resistanceAc).toBeUndefined();
    expect(r.selfCapacitance).toBe(medhurstSelfCapacitance(20e-3, sol.length).selfCapacitance);
    expect(r.selfResonantFrequency).toBe(selfResonantFrequency(sol.inductance, r.selfCapacitance!));
  });

  it('the single turn gets no proximity loss: Q from the skin effect alone', () => {
    // the case: one turn of 1 mm wire, 25 mm across, 14 MHz
    const r = designCoil({ form: 'solenoid', turns: 1, diameter: 25e-3, pitch: 1e-3, wire: { diameter: 1e-3 }, frequency: 14e6 });
    // independent: R_dc of the turn times the high-frequency skin ratio a/2δ + 1/4 + 3δ/32a (Ramo, Whinnery &
    // Van Duzer for the first two terms; the third from Hankel's expansion, DLMF 10.17.5)
    const len = Math.hypot(Math.PI * 25e-3, 1e-3);
    const rdc = ((1 / 58e6) * len) / (Math.PI * 0.25e-6); // IEC 60028 copper
    const s = 0.5e-3 / skinDepth(14e6);
    expect(rel(r.resistanceAc!, rdc * (s / 2 + 0.25 + 3 / (32 * s)))).toBeLessThan(1e-4);
    expect(r.q!).toBeGreaterThan(180);
    expect(r.q!).toBeLessThan(215);
  });

  it('a sweep from f/10 to 0.9 × the self-resonance whose last point is the last one computed', () => {
    const r = designCoil({ ...solenoidSpec, sweepPoints: 60 });
    const sw = r.sweep!;
    expect(sw.frequency).toHaveLength(60);
    const grid = frequencyGrid({ start: 7.1e5, stop: 0.9 * r.selfResonantFrequency!, points: 60 });
    expect(sw.frequency).toEqual(Array.from(grid));
    expect(sw.frequency.at(-1)).toBe(0.9 * r.selfResonantFrequency!);
    for (const k of [sw.q, sw.qAcrossCoil, sw.apparentInductance]) expect(k).toHaveLength(60);
    // each point equals the single-frequency functions at that frequency
    const pitch = wire.insulatedDiameter;
    const sol = solenoidInductance({ diameter: solenoidSpec.diameter, turns: r.turns, pitch, wireDiameter: wire.diameter });
    for (const i of [0, 17, 59]) {
      const f = sw.frequency[i];
      const skin = wireInternalImpedance(wire.diameter, f, resistivityAtTemperature(30));
      const lf = sol.inductance - sol.internalInductance * (1 - skin.internalInductanceRatio);
      const loss = coilQ({ frequency: f, turns: r.turns, diameter: solenoidSpec.diameter, pitch, wireDiameter: wire.diameter, leadLength: 0.015, temperature: 30, inductance: lf });
      expect(rel(sw.q[i], loss.q)).toBeLessThan(1e-12);
      const app = apparentCoil({ inductance: lf, resistance: loss.acResistance, selfCapacitance: r.selfCapacitance!, frequency: f });
      expect(rel(sw.qAcrossCoil[i], app.apparentQ)).toBeLessThan(1e-12);
      expect(rel(sw.apparentInductance[i], app.apparentInductance)).toBeLessThan(1e-12);
    }
    // the working point is inside the sweep, and above 0.9 f_sr the sweep ends at f instead
    expect(sw.frequency[0]).toBeLessThan(7.1e6);
    const near = designCoil({ ...solenoidSpec, frequency: 0.95 * r.selfResonantFrequency!, sweepPoints: 20 });
    expect(near.sweep!.frequency.at(-1)).toBe(near.frequency);
  });

  it('close-wound uses the overall diameter as pitch (the bare one for bare wire); a pitch under the enamel is refused', () => {
    const bare = designCoil({ form: 'solenoid', turns: 10, diameter: 20e-3, closeWound: true, wire: { diameter: 0.5e-3 } });
    expect(bare.pitch).toBe(0.5e-3);
    const enamelled = designCoil({ form: 'solenoid', turns: 10, diameter: 20e-3, closeWound: true, wire });
    expect(enamelled.pitch).toBe(0.544e-3);
    expect(enamelled.windingLength).toBeCloseTo(10 * 0.544e-3, 15);
    const e = (() => {
      try {
        designCoil({ form: 'solenoid', turns: 10, diameter: 20e-3, pitch: 0.52e-3, wire });
      } catch (x) {
        return x as Error & { field: string };
      }
      throw new Error('no error');
    })();
    expect(e.field).toBe('pitch');
    expect(e.message).toBe("pitch 0.52 mm is smaller than the wire's 0.544 mm diameter over its insulation: turns would overlap.");
  });
});

describe('designCoil: toroid equals the functions it combines', () => {
  it('permeability given, turns from an inductance, core and winding Q', () => {
    const spec = { form: 'toroid', inductance: 2e-6, ...toroidCore, relativePermeability: 10, muImag: 0.1, wire, frequency: 7e6, leadLength: 0.03 } as const;
    const r = designCoil(spec);
    const t = toroidTurnsForInductance({ ...toroidCore, relativePermeability: 10, inductance: 2e-6 });
    expect(r.exactTurns).toBe(t.turns);
    expect(r.turns).toBe(t.practicalTurns);
    expect(Number.isInteger(r.turns)).toBe(true);
    expect(r.inductance).toBe(t.practicalInductance);
    expect(r.al).toBe(t.al);
    const geo = toroidInductance({ ...toroidCore, relativePermeability: 10, turns: 1 });
    expect(r.effectivePathLength).toBe(geo.effectivePathLength);
    expect(r.effectiveArea).toBe(geo.effectiveArea);
    const w = toroidWinding({ turns: r.turns, ...toroidCore, insulatedDiameter: wire.insulatedDiameter, leadLength: 0.03 });
    expect(r.wireLength).toBe(w.wireLength);
    expect(r.turnsPerLayer).toBe(w.turnsPerLayer);
    expect(r.lengthPerTurn).toBe(w.lengthPerTurn);
    expect(r.resistanceDc).toBe(wireResistanceDc(w.wireLength, wire.diameter));
    const skin = wireInternalImpedance(wire.diameter, 7e6, resistivityAtTemperature(20));
    expect(r.resistanceAc).toBe(r.resistanceDc * skin.resistanceRatio);
    const windingQ = (2 * Math.PI * 7e6 * r.inductance) / r.resistanceAc!;
    expect(rel(r.windingQ!, windingQ)).toBeLessThan(1e-15);
    expect(r.coreQ).toBe(toroidCoreQ(10, 0.1));
    expect(r.q).toBe(toroidCoreQ(10, 0.1, r.windingQ));
    // skin effect only: Q is an upper bound, and no lower figure is claimed
    expect(r.qHigh).toBe(r.q);
    expect(r.qLow).toBeUndefined();
    expect(r.selfCapacitance).toBeUndefined();
    expect(r.notes.some((n) => /No self-capacitance/.test(n.message))).toBe(true);
  });

  it('AL given: L = AL N², the permeability serves the core Q only', () => {
    const r = designCoil({ form: 'toroid', turns: 20, ...toroidCore, al: 5e-9, relativePermeability: 10, muImag: 0.2, wire, frequency: 7e6 });
    // definition of AL: 5 nH/turn² × 20² = 2 µH
    expect(r.inductance).toBeCloseTo(2e-6, 18);
    expect(r.al).toBe(5e-9);
    expect(r.inductance).toBe(toroidInductance({ ...toroidCore, al: 5e-9, turns: 20 }).inductance);
    expect(r.coreQ).toBe(50);
    // the permeability-spread remark does not apply to a measured AL
    expect(r.notes.some((n) => n.field === 'relativePermeability')).toBe(false);
    // AL without μ′ is enough for the inductance; μ″ without μ′ is not enough for the core's Q
    expect(designCoil({ form: 'toroid', turns: 20, ...toroidCore, al: 5e-9, wire }).inductance).toBeCloseTo(2e-6, 18);
    expect(fieldOf(() => designCoil({ form: 'toroid', turns: 20, ...toroidCore, al: 5e-9, muImag: 0.2, wire }))).toBe('relativePermeability');
    expect(fieldOf(() => designCoil({ form: 'toroid', turns: 20, ...toroidCore, wire }))).toBe('relativePermeability');
  });
});

describe('designCoil: multilayer equals the functions it combines', () => {
  it('inductance given: whole turns, wire, and the fit of the section', () => {
    const thin = { diameter: 0.1e-3, insulatedDiameter: 0.12e-3 };
    const r = designCoil({ form: 'multilayer', inductance: 100e-6, ...multilayerSection, wire: thin, frequency: 455e3, leadLength: 0.02 });
    const t = multilayerTurnsForInductance({ ...multilayerSection, inductance: 100e-6 });
    expect(r.exactTurns).toBe(t.turns);
    expect(r.turns).toBe(t.practicalTurns);
    expect(r.inductance).toBe(t.practicalInductance);
    expect(r.termRatio).toBe(t.termRatio);
    expect(r.wireLength).toBe(wireLengthForCoil({ turns: r.turns, diameter: 12e-3, pitch: 0, leadLength: 0.02 }));
    expect(r.resistanceDc).toBe(wireResistanceDc(r.wireLength, 0.1e-3));
    expect(r.capacity).toBe(multilayerCapacity(6e-3, 4e-3, 0.12e-3));
    expect(r.fits).toBe(true);
    expect(r.inductanceAtFrequency).toBe(r.inductance);
    expect(r.q).toBeUndefined();
    expect(r.notes.some((n) => /not estimated/.test(n.message))).toBe(true);
  });

  it('turns given that do not fit: a validity note at the winding depth', () => {
    const r = designCoil({ form: 'multilayer', turns: 400, ...multilayerSection, wire: { diameter: 0.3e-3, insulatedDiameter: 0.34e-3 } });
    expect(r.inductance).toBe(multilayerInductance({ ...multilayerSection, turns: 400 }).inductance);
    // by hand: ⌊6/0.34⌋ × ⌊4/0.34⌋ = 17 × 11 = 187 turns fit (common practice, no published source)
    expect(r.capacity).toBe(187);
    expect(r.fits).toBe(false);
    const fit = r.notes.find((n) => n.field === 'windingDepth');
    expect(fit?.message).toBe('400 turns of 0.34 mm wire do not fit a 6 mm × 4 mm winding section (about 187 do, wound layer on layer): make the section bigger or the wire thinner.');
  });
});

describe('designCoil: errors name the spec path', () => {
  const base: Record<string, DesignCoilSpec> = {
    solenoid: { form: 'solenoid', turns: 10, diameter: 20e-3, pitch: 1e-3, wire: { diameter: 0.5e-3, insulatedDiameter: 0.55e-3 }, frequency: 7e6, leadLength: 0.01, temperature: 20 },
    toroid: { form: 'toroid', turns: 20, ...toroidCore, relativePermeability: 10, al: 5e-9, muImag: 0.1, wire: { diameter: 0.5e-3, insulatedDiameter: 0.55e-3 }, frequency: 7e6, leadLength: 0.01, temperature: 20 },
    multilayer: { form: 'multilayer', turns: 100, ...multilayerSection, wire: { diameter: 0.3e-3, insulatedDiameter: 0.34e-3 }, frequency: 455e3, leadLength: 0.01, temperature: 20 },
  };
  const hostile: unknown[] = ['5', Number.NaN, null, Infinity, -Infinity, -1, 1e300, 1e-300];

  it('every bad value of every field is refused at that field (or the result stays finite)', () => {
    for (const [form, spec] of Object.entries(base)) {
      const paths = Object.keys(spec).filter((k) => k !== 'form' && k !== 'wire').concat(['wire.diameter', 'wire.insulatedDiameter']);
      for (const path of paths) {
        for (const bad of hostile) {
          const s = structuredClone(spec) as unknown as Record<string, unknown>;
          if (path.startsWith('wire.')) (s.wire as Record<string, unknown>)[path.slice(5)] = bad;
          else s[path] = bad;
          let field: string | undefined;
          let result: unknown;
          try {
            result = designCoil(s as unknown as DesignCoilSpec);
          } catch (e) {
            field = (e as { field?: string }).field;
            expect((e as Error).name, `${form} ${path} = ${String(bad)}`).toBe('DesignError');
          }
          if (field === undefined) {
            // accepted: then every number in it is finite (1e-300 m of lead, say)
            expect(JSON.stringify(result), `${form} ${path} = ${String(bad)}`).not.toMatch(/null/);
            continue;
          }
          expect(COIL_SPEC_FIELDS as readonly string[], `${form} ${path} = ${String(bad)} → ${field}`).toContain(field);
          // the direct cause is named: a value of the wrong kind or size is refused at its own field
          expect(field, `${form} ${path} = ${String(bad)}`).toBe(path);
        }
      }
    }
  });

  it('geometry that cannot be wound names the field to change', () => {
    // turns overlap
    expect(fieldOf(() => designCoil({ ...base.solenoid, pitch: 0.5e-3 } as DesignCoilSpec))).toBe('pitch');
    // wire not thinner than the coil
    expect(fieldOf(() => designCoil({ ...base.solenoid, diameter: 0.5e-3, pitch: 1e-3 } as DesignCoilSpec))).toBe('wire.diameter');
    // insulation thinner than the copper
    expect(fieldOf(() => designCoil({ ...base.solenoid, wire: { diameter: 0.5e-3, insulatedDiameter: 0.4e-3 } } as DesignCoilSpec))).toBe('wire.insulatedDiameter');
    // core hole bigger than the core, wire thicker than the hole
    expect(fieldOf(() => designCoil({ ...base.toroid, innerDiameter: 13e-3 } as DesignCoilSpec))).toBe('innerDiameter');
    expect(fieldOf(() => designCoil({ ...base.toroid, innerDiameter: 0.5e-3 } as DesignCoilSpec))).toBe('wire.insulatedDiameter');
    // a winding that reaches the axis
    expect(fieldOf(() => designCoil({ ...base.multilayer, windingDepth: 13e-3 } as DesignCoilSpec))).toBe('windingDepth');
    // at or above self-resonance
    expect(fieldOf(() => designCoil({ ...base.solenoid, frequency: 5e9 } as DesignCoilSpec))).toBe('frequency');
    // a target below one turn, and more than ten million turns
    expect(fieldOf(() => designCoil({ form: 'solenoid', inductance: 1e-9, diameter: 20e-3, pitch: 1e-3, wire: { diameter: 0.5e-3 } }))).toBe('inductance');
    // both or neither of inductance and turns; no pitch; an unknown form; no spec at all
    expect(fieldOf(() => designCoil({ ...base.solenoid, inductance: 1e-6 } as DesignCoilSpec))).toBe('turns');
    expect(fieldOf(() => designCoil({ ...base.solenoid, turns: undefined } as DesignCoilSpec))).toBe('inductance');
    expect(fieldOf(() => designCoil({ ...base.solenoid, pitch: undefined } as DesignCoilSpec))).toBe('pitch');
    expect(fieldOf(() => designCoil({ ...base.solenoid, form: 'spiral' } as unknown as DesignCoilSpec))).toBe('form');
    expect(fieldOf(() => designCoil(null as unknown as DesignCoilSpec))).toBe('form');
    expect(fieldOf(() => designCoil({ ...base.solenoid, wire: null } as unknown as DesignCoilSpec))).toBe('wire');
    expect(fieldOf(() => designCoil({ ...base.solenoid, sweepPoints: 2.5 } as DesignCoilSpec))).toBe('sweepPoints');
  });

  it('spec and result are plain data: a JSON round trip gives the same design', () => {
    const spec = { ...solenoidSpec, sweepPoints: 12 };
    const again = JSON.parse(JSON.stringify(spec)) as DesignCoilSpec;
    const a = designCoil(spec);
    expect(designCoil(again)).toEqual(a);
    expect(JSON.parse(JSON.stringify(a))).toEqual(a);
    expectSI(a.inductance, designCoil(again).inductance);
  });
});
