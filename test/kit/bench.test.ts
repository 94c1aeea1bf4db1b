/**
 * createBenchState, the reactive side of a field table, run in Node with
 * Solid's browser build (the server build does not react). Checks the field
 * states, the spec of the fields in use, defaults that follow a choice, the
 * link, and a DesignError shown at the field that fills the path it names.
 * Behaviour of our own design; values worked by hand.
 */
import { describe, expect, it, vi } from 'vitest';

vi.mock('solid-js', async () => import('solid-js/dist/solid.js' as string));

const { createRoot } = await import('solid-js');
const { createBenchState } = await import('../../components/kit/bench');
const { documentToSnapshot, snapshotToDocument } = await import('../../components/kit/documents');
const { DesignError } = await import('../../src/core/errors');
const { COIL_LIKE, TANK_LIKE } = await import('./sampleTables');
const { RESONANCE_FIELDS, solveResonance } = await import('../../components/benches/ResonanceBench');
const { thomson, rel } = await import('../helpers/asserts');

/** Runs `fn` in a reactive root and disposes of it afterwards. */
async function inRoot<T>(fn: () => T | Promise<T>): Promise<T> {
  let dispose = () => {};
  try {
    return await createRoot((d) => {
      dispose = d;
      return fn();
    });
  } finally {
    dispose();
  }
}

const until = async (test: () => boolean) => {
  for (let i = 0; i < 400 && !test(); i++) await new Promise((r) => setTimeout(r, 25));
  expect(test()).toBe(true);
};

describe('createBenchState', () => {
  it('gives the SI spec of the fields in use, and none while one is not a value', () => inRoot(() => {
    const b = createBenchState(COIL_LIKE);
    expect(b.spec()).toEqual({ form: 'solenoid', inductance: 1e-6, diameter: 0.01, frequency: 7.1e6, leadLength: 0.01, temperature: 20 });
    b.choose('wire', 'mm');
    b.choose('wind', 'pitch');
    expect(b.spec()).toMatchObject({ pitch: 0.001, wire: { diameter: 0.0005 } });
    b.field('T').setText('\u221210');
    expect(b.spec()?.temperature).toBe(-10);
    b.field('D').setText('20');
    expect(b.field('D').error()).toBe('“20” has no unit; did you mean 20 mm? A length needs its unit: mm, cm, m, in or mil.');
    expect(b.spec()).toBeUndefined();
    expect(b.inputsStale()).toBe(true);
    b.field('D').setText('0');
    expect(b.field('D').error()).toBe('Former diameter must be greater than zero; you typed “0”.');
    b.choose('dia', 'mean');
    b.field('D').setText('-20mm');
    expect(b.field('D').error()).toBe('Mean winding diameter must be greater than zero; you typed “-20mm”.');
  }));

  it('a field that no longer applies does not hold the spec back', () => inRoot(() => {
    const b = createBenchState(COIL_LIKE);
    b.field('N').setText('ten'); // turns are not in use while an inductance is given
    expect(b.uses('N')).toBe(false);
    expect(b.spec()).toBeDefined();
    b.choose('give', 'N');
    expect(b.spec()).toBeUndefined();
    expect(b.field('N').error()).toMatch(/not a plain number/);
  }));

  it('untouched defaults follow a choice; typed values stay', () => inRoot(() => {
    const b = createBenchState(TANK_LIKE);
    b.field('Rload').setText('2k2');
    b.choose('mode', 'series');
    expect(b.field('Rs').text()).toBe('5 Ω');
    expect(b.field('Rload').text()).toBe('2k2');
    b.choose('mode', 'parallel');
    expect(b.field('Rs').text()).toBe('10 kΩ');
  }));

  it('a blank optional field is "not given"; a blank required one asks for a value', () => inRoot(() => {
    const b = createBenchState(TANK_LIKE);
    b.field('Rs').setText('');
    expect(b.field('Rs').error()).toBeNull();
    expect(b.spec()).not.toHaveProperty('sourceResistance');
    b.field('L').setText('  ');
    expect(b.field('L').error()).toBe('Enter a value.');
    expect(b.spec()).toBeUndefined();
  }));

  it('works out a calculation, then gives its value', () => inRoot(async () => {
    const b = createBenchState(RESONANCE_FIELDS);
    b.choose('solve', 'f');
    b.field('C').setText('2*47p');
    expect(b.field('C').pending()).toBe(true);
    expect(b.spec()).toBeUndefined();
    await until(() => !b.field('C').pending());
    expect(rel(b.field('C').value() as number, 94e-12)).toBeLessThan(1e-12);
    b.field('C').setText('2*47p + 10 mm');
    await until(() => !b.field('C').pending());
    expect(b.field('C').error()).toMatch(/could not be worked out|different kinds/);
  }), 120_000);

  it('shows a DesignError at the field that fills the path it names, else as a general message', () => inRoot(() => {
    const b = createBenchState(COIL_LIKE);
    let fail: string | null = 'pitch';
    const calc = b.compute(() => {
      if (fail) throw new DesignError(fail, `${fail} is wrong`);
      return 1;
    });
    // close-wound: no pitch field in use, so the message is general
    expect(b.generalError()).toBe('pitch is wrong');
    expect(b.designError('p')).toBeNull();
    b.choose('wind', 'pitch');
    expect(b.designError('p')).toBe('pitch is wrong');
    expect(b.generalError()).toBeNull();
    expect(calc.stale()).toBe(true);
    fail = null;
    b.field('p').setText('2 mm'); // a new spec runs the computation again
    expect(calc.result()).toBe(1);
    expect(calc.stale()).toBe(false);
    expect(b.designError('p')).toBeNull();
    fail = 'wire.diameter';
    b.field('p').setText('2.5 mm');
    expect(b.designError('awg')).toBe('wire.diameter is wrong');
    expect(calc.result()).toBe(1); // the last good result stays, marked stale
    expect(calc.stale()).toBe(true);
  }));

  it('reads a link and writes the state back to it', () => inRoot(() => {
    const b = createBenchState(COIL_LIKE);
    const d = b.readLink('?form=toroid&give=N&N=25&core=mu&OD=20mm&T=-10&zap=1');
    expect(d.notices).toEqual(['Ignored unknown link setting: zap.']);
    expect(b.choice('form')).toBe('toroid');
    expect(b.spec()).toMatchObject({ form: 'toroid', turns: 25, outerDiameter: 0.02, temperature: -10 });
    const q = new URLSearchParams(b.linkQuery());
    expect(q.get('T')).toBe('-10');
    expect(q.has('D')).toBe(false); // not in use for a toroid
    expect(q.get('awg')).toBe('22');
  }));

  it('stores and restores a document', () => inRoot(() => {
    const a = createBenchState(TANK_LIKE);
    a.choose('coilLoss', 'R');
    a.field('Rcoil').setText('2R2');
    a.field('Rs').setText('');
    const doc = JSON.parse(JSON.stringify(snapshotToDocument(TANK_LIKE, a.snapshot())));
    expect(doc.spec).toMatchObject({ mode: 'parallel', coilResistance: '2R2' });
    const b = createBenchState(TANK_LIKE);
    const { snapshot, notices } = documentToSnapshot(TANK_LIKE, doc);
    expect(notices).toEqual([]);
    b.load(snapshot);
    expect(b.choice('coilLoss')).toBe('R');
    expect(b.spec()).toEqual(a.spec());
  }));

  it('runs the Resonance bench’s spec through the core (Thomson’s formula, Terman 1943)', () => inRoot(() => {
    const b = createBenchState(RESONANCE_FIELDS);
    b.choose('solve', 'f');
    const calc = b.compute((spec) => solveResonance(spec as unknown as Parameters<typeof solveResonance>[0]));
    expect(rel(calc.result()!.frequency, thomson(4.7e-6, 100e-12))).toBeLessThan(1e-12);
    // (2π f)² underflows to zero: the message lands at the frequency when the core names it,
    // else (it names the capacitance being solved for, which no field fills) as a general one
    b.choose('solve', 'C');
    b.field('f').setText('1e-300');
    expect(b.designError('f') ?? b.generalError()).toMatch(/beyond what can be computed/);
    expect(calc.stale()).toBe(true);
  }));
});
