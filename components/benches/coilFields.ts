/**
 * The Coil bench's field table and spec builder, kept apart from the island
 * so that other benches (the band planner, the match bench), the shop sheet
 * at build time and tests can use them: no Solid, no DOM.
 *
 * - COIL_FIELDS: every input of the bench once (link key, label, unit or
 *   plain-number rule, default, when it applies, the spec path it fills).
 * - buildCoilSpec(raw, choices): the table's values by path (what
 *   `bench.spec()` or `snapshotToSpec` gives) and the choices → the
 *   `DesignCoilSpec` that `designCoil` takes. The conversions live here: a
 *   wire gauge becomes `wire.diameter`, an enamel grade `wire.insulatedDiameter`,
 *   a former's diameter the mean winding diameter (former + one overall wire).
 * - designCoilFromFields, coilSnapshotFromSpec and tankHandOff live in
 *   coilDesign.ts (they bring the coil's physics with them) and are re-exported
 *   here; a bench that needs only the table (the Tank bench reading a coil's
 *   link) imports COIL_FIELDS and ships none of that.
 */
import type { DesignCoilSpec, MultilayerCoilSpec, ToroidCoilSpec } from '../../src/core/coil';
import { DesignError, isDesignError } from '../../src/core/errors';
import { awgDiameter, enamelledDiameter, swgDiameter, type EnamelGrade } from '../../src/core/wire';
import { defineFields, getPath, NON_NEGATIVE, POSITIVE, type Choices, type SpecObject } from '../kit/fields';

/** AWG sizes offered: 8 (3.26 mm) to 40 (0.08 mm), what coils are wound with. */
export const AWG_RANGE = [8, 40] as const;
/** SWG sizes offered: 10 (3.25 mm) to 48 (0.041 mm), the coil-winding part of BS 3737. */
export const SWG_RANGE = [10, 48] as const;

const gauges = (system: string, [from, to]: readonly [number, number]) =>
  Array.from({ length: to - from + 1 }, (_, i) => [String(from + i), `${system} ${from + i}`] as const);

/** "0.692 mm": a wire diameter in millimetres, 3 figures, as a field's text or in a sentence. */
export const mmText = (x: number) => `${Number((x * 1e3).toPrecision(3))} mm`;

/** Bare diameter of the gauge chosen (AWG or SWG), metres; undefined for a metric diameter typed. */
export function gaugeDiameter(choices: Choices): number | undefined {
  if (choices.wire === 'awg') return awgDiameter(Number(choices.awg));
  if (choices.wire === 'swg') return swgDiameter(Number(choices.swg));
  return undefined;
}

/** The measured overall diameter's default: the gauge's grade-1 enamelled diameter, or one for the default 0.5 mm wire. */
function overallDefault(c: Choices): string {
  const bare = gaugeDiameter(c);
  return mmText(enamelledDiameter(bare ?? 0.5e-3, 1));
}

const solenoid = { form: 'solenoid' } as const;
const toroid = { form: 'toroid' } as const;
const multilayer = { form: 'multilayer' } as const;

export const COIL_FIELDS = defineFields([
  {
    kind: 'choice', key: 'form', path: 'form', label: 'Coil form', default: 'solenoid',
    options: [['solenoid', 'Single-layer'], ['toroid', 'Toroid'], ['multilayer', 'Multilayer']],
  },
  { kind: 'choice', key: 'give', label: 'You give', default: 'L', options: [['L', 'Inductance → turns'], ['N', 'Turns → inductance']] },
  {
    kind: 'quantity', key: 'L', path: 'inductance', label: 'Target inductance', symbol: 'L', unit: 'H', default: '1 µH',
    allowed: POSITIVE, when: { give: 'L' }, hint: 'e.g. 1 µH, 4u7, 680n',
  },
  {
    kind: 'number', key: 'N', path: 'turns', label: 'Turns', symbol: 'N', default: '12', rule: { min: 1, step: 0.5 }, when: { give: 'N' },
    hint: (c) => (c.form === 'solenoid' ? 'a plain number; half turns allowed (10.5)' : 'a plain number of whole turns'),
  },

  // — single-layer solenoid —
  {
    kind: 'choice', key: 'dia', label: 'Diameter given is', default: 'former', when: solenoid,
    options: [['former', 'the former (outside)'], ['mean', 'wire centre to centre']],
  },
  {
    kind: 'quantity', key: 'D', path: 'diameter', unit: 'm', default: '10 mm', allowed: POSITIVE, when: solenoid,
    label: (c) => (c.dia === 'mean' ? 'Mean winding diameter' : 'Former diameter'),
    symbol: (c) => (c.dia === 'mean' ? 'D' : undefined),
    hint: (c) => (c.dia === 'mean' ? 'measured wire centre to wire centre' : 'outside of the tube you wind on; the wire’s overall diameter is added'),
  },
  { kind: 'choice', key: 'wind', label: 'Winding', default: 'close', when: solenoid, options: [['close', 'Close-wound'], ['pitch', 'Spaced (give pitch)']] },
  {
    kind: 'quantity', key: 'p', path: 'pitch', label: 'Pitch, turn to turn', symbol: 'p', unit: 'm', default: '1 mm', allowed: POSITIVE,
    when: { form: 'solenoid', wind: 'pitch' }, hint: 'centre to centre, e.g. 1 mm, 2.5 mm, 0.1 in',
  },

  // — toroid —
  { kind: 'quantity', key: 'OD', path: 'outerDiameter', label: 'Core outer diameter', symbol: 'OD', unit: 'm', default: '12.7 mm', allowed: POSITIVE, when: toroid, hint: 'e.g. 12.7 mm, 0.5 in' },
  { kind: 'quantity', key: 'ID', path: 'innerDiameter', label: 'Core inner diameter', symbol: 'ID', unit: 'm', default: '7.7 mm', allowed: POSITIVE, when: toroid, hint: 'the hole' },
  { kind: 'quantity', key: 'h', path: 'height', label: 'Core height', symbol: 'h', unit: 'm', default: '4.8 mm', allowed: POSITIVE, when: toroid, hint: 'axial thickness' },
  { kind: 'choice', key: 'core', label: 'Core given by', default: 'mu', when: toroid, options: [['mu', 'permeability μ′'], ['al', 'AL (measured or stated)']] },
  {
    kind: 'quantity', key: 'AL', path: 'al', label: 'AL, inductance per turn²', what: 'AL', unit: 'H', default: '5 nH', allowed: POSITIVE,
    when: { form: 'toroid', core: 'al' }, hint: 'type it in nH: 5 nH means 5 nH/turn²',
  },
  {
    kind: 'number', key: 'mu', path: 'relativePermeability', symbol: 'μ′', default: '10', optional: true, rule: { min: 0, minExclusive: true }, when: toroid,
    label: (c) => (c.core === 'al' ? 'Permeability μ′ at f (optional)' : 'Permeability μ′ at f'),
    what: 'Permeability μ′',
    hint: (c) => (c.core === 'al'
      ? 'only for the core’s Q with μ″; AL sets the inductance'
      : 'relative, plain number; 1 for an air or plastic ring'),
  },
  {
    kind: 'number', key: 'mu2', path: 'muImag', label: 'Loss permeability μ″ at f (optional)', what: 'Loss permeability μ″', symbol: 'μ″',
    default: '0.1', optional: true, rule: { min: 0 }, when: toroid,
    hint: 'from the material’s μ′, μ″ curves; blank or 0: core loss not counted',
  },

  // — multilayer —
  { kind: 'quantity', key: 'mD', path: 'diameter', label: 'Mean winding diameter', symbol: 'D', unit: 'm', default: '12 mm', allowed: POSITIVE, when: multilayer, hint: 'to the middle of the winding depth' },
  { kind: 'quantity', key: 'mlen', path: 'length', label: 'Winding length', symbol: 'b', unit: 'm', default: '6 mm', allowed: POSITIVE, when: multilayer, hint: 'along the axis' },
  { kind: 'quantity', key: 'depth', path: 'windingDepth', label: 'Winding depth', symbol: 'c', unit: 'm', default: '4 mm', allowed: POSITIVE, when: multilayer, hint: 'radial build: outer minus inner radius' },

  // — wire —
  { kind: 'choice', key: 'wire', label: 'Wire size', default: 'awg', options: [['awg', 'AWG'], ['swg', 'SWG'], ['mm', 'Metric (bare diameter)']] },
  {
    kind: 'choice', key: 'awg', label: 'Gauge', display: 'select', default: '22', options: gauges('AWG', AWG_RANGE), when: { wire: 'awg' },
    answers: ['wire.diameter'], hint: 'American Wire Gauge (ASTM B258)',
  },
  {
    kind: 'choice', key: 'swg', label: 'Gauge', display: 'select', default: '24', options: gauges('SWG', SWG_RANGE), when: { wire: 'swg' },
    answers: ['wire.diameter'], hint: 'Imperial Standard Wire Gauge (BS 3737)',
  },
  {
    kind: 'quantity', key: 'wd', path: 'wire.diameter', label: 'Bare wire diameter', symbol: 'd', unit: 'm', default: '0.5 mm', allowed: POSITIVE,
    when: { wire: 'mm' }, hint: 'copper only, e.g. 0.5 mm, 0.71 mm',
  },
  {
    kind: 'choice', key: 'enamel', label: 'Enamel', display: 'select', default: '1', answers: ['wire.insulatedDiameter'],
    options: [['bare', 'none (bare)'], ['1', 'grade 1 (thin)'], ['2', 'grade 2 (medium)'], ['measured', 'overall diameter measured']],
  },
  {
    kind: 'quantity', key: 'wod', path: 'wire.insulatedDiameter', label: 'Overall wire diameter, measured', symbol: 'dₒ', unit: 'm',
    default: overallDefault, allowed: POSITIVE, when: { enamel: 'measured' }, hint: 'over the enamel, with a micrometer',
  },

  // — working conditions —
  { kind: 'quantity', key: 'f', path: 'frequency', label: 'Working frequency', symbol: 'f', unit: 'Hz', default: '7.1 MHz', allowed: POSITIVE, hint: 'e.g. 7.1 MHz, 455k' },
  { kind: 'quantity', key: 'lead', path: 'leadLength', label: 'Length of each lead', unit: 'm', default: '10 mm', allowed: NON_NEGATIVE, hint: 'both leads are counted; 0 for none' },
  {
    kind: 'number', key: 'T', path: 'temperature', label: 'Wire temperature, °C', what: 'Wire temperature', symbol: 'T', default: '20',
    rule: { min: -60, max: 200, unit: '°C' }, hint: 'plain number from −60 to 200; 20 for a cool bench',
  },
] as const);

export type CoilFieldKey = (typeof COIL_FIELDS)[number]['key'];

// ---------------------------------------------------------------------------
// The spec builder

/** A number at a path of the raw values, or undefined. */
function num(raw: unknown, path: string): number | undefined {
  const v = getPath(raw, path);
  return typeof v === 'number' ? v : undefined;
}

/** Puts only the values that are there. */
function defined<T extends object>(o: T): T {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as T;
}

/** The bare and overall diameters of the wire chosen (metres); overall undefined for bare wire. */
export function wireDiameters(raw: unknown, choices: Choices): { diameter: number | undefined; insulatedDiameter: number | undefined } {
  const diameter = gaugeDiameter(choices) ?? num(raw, 'wire.diameter');
  const enamel = choices.enamel;
  if (enamel === 'bare') return { diameter, insulatedDiameter: undefined };
  if (enamel === 'measured') return { diameter, insulatedDiameter: num(raw, 'wire.insulatedDiameter') };
  if (diameter === undefined) return { diameter, insulatedDiameter: undefined };
  try {
    return { diameter, insulatedDiameter: enamelledDiameter(diameter, Number(enamel) as EnamelGrade) };
  } catch (e) {
    // enamelledDiameter names its argument wireDiameter: here that is the bare diameter's field
    if (isDesignError(e)) throw new DesignError(e.field === 'grade' ? 'wire.insulatedDiameter' : 'wire.diameter', e.message);
    throw e;
  }
}

export interface BuildOptions {
  /** Points of the Q and apparent-inductance sweep for a plot (solenoid); none when omitted. */
  sweepPoints?: number;
}

/**
 * The DesignCoilSpec for the bench's values by spec path (SI; what
 * `bench.spec()` or `snapshotToSpec(COIL_FIELDS, …)` gives) and its choices.
 * Pure: no checks beyond the conversions; `designCoil` checks the spec and
 * names the path at fault. A gauge sets `wire.diameter`, an enamel grade
 * `wire.insulatedDiameter` (IEC 60317-0-1 grade 1 or 2, approximate maximum),
 * and a former diameter becomes the mean winding diameter: former + one
 * overall wire diameter (the bare one for bare wire).
 */
export function buildCoilSpec(raw: SpecObject, choices: Choices, options: BuildOptions = {}): DesignCoilSpec {
  const wire = wireDiameters(raw, choices);
  const common = defined({
    inductance: choices.give === 'N' ? undefined : num(raw, 'inductance'),
    turns: choices.give === 'N' ? num(raw, 'turns') : undefined,
    wire: defined({ diameter: wire.diameter as number, insulatedDiameter: wire.insulatedDiameter }),
    frequency: num(raw, 'frequency'),
    leadLength: num(raw, 'leadLength'),
    temperature: num(raw, 'temperature'),
    sweepPoints: options.sweepPoints,
  });
  const form = choices.form ?? getPath(raw, 'form');
  /** The geometry's numbers at their paths (the table's paths are the spec's). */
  const geometry = (...paths: string[]) => Object.fromEntries(paths.map((p) => [p, num(raw, p)]));
  if (form === 'toroid') {
    return defined({
      form: 'toroid', ...common, ...geometry('outerDiameter', 'innerDiameter', 'height', 'relativePermeability', 'muImag'),
      al: choices.core === 'al' ? num(raw, 'al') : undefined,
    }) as ToroidCoilSpec;
  }
  if (form === 'multilayer') return defined({ form: 'multilayer', ...common, ...geometry('diameter', 'length', 'windingDepth') }) as MultilayerCoilSpec;
  const typed = num(raw, 'diameter');
  const overall = wire.insulatedDiameter ?? wire.diameter;
  const diameter = choices.dia === 'mean' || typed === undefined || overall === undefined ? typed : typed + overall;
  return defined({
    form: 'solenoid' as const, ...common,
    diameter: diameter as number,
    closeWound: choices.wind === 'pitch' ? undefined : true,
    pitch: choices.wind === 'pitch' ? num(raw, 'pitch') : undefined,
  });
}

export { coilSnapshotFromSpec, designCoilFromFields, tankHandOff, type TankHandOff } from './coilDesign';
