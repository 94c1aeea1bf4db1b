/**
 * What the Coil bench does with its table's values beyond building the spec
 * (coilFields.ts): design the coil, go back from a DesignCoilSpec to the
 * bench's state, and hand the coil to the Tank bench. Kept apart from the
 * table so that a bench that only reads a coil's link does not ship the
 * coil's physics. No Solid, no DOM: usable at build time and in tests.
 *
 * - designCoilFromFields(raw, choices): buildCoilSpec, then `designCoil`, with
 *   the core's errors said in the terms the person typed (a former diameter, bare wire).
 * - coilSnapshotFromSpec(spec): the way back, from a DesignCoilSpec (a shop-sheet
 *   file, a coil handed over) to the bench's state.
 * - tankHandOff(result, coilQuery): the link that carries the coil to the Tank
 *   bench, with the capacitance that resonates it at the coil's frequency.
 */
import { designCoil, type DesignCoilResult, type DesignCoilSpec } from '../../src/core/coil';
import { DesignError, isDesignError } from '../../src/core/errors';
import { formatQuantityCompact } from '../../src/quantity';
import { specToSnapshot } from '../kit/documents';
import type { BenchSnapshot, Choices, SpecObject } from '../kit/fields';
import { buildCoilSpec, COIL_FIELDS, mmText, type BuildOptions } from './coilFields';

/**
 * buildCoilSpec, then designCoil. The core's errors keep their spec path; a
 * few are said in the bench's terms: with bare wire the overall diameter is
 * the bare one (shown at the gauge or diameter), and a mean diameter worked
 * out from a former says so.
 * @throws DesignError with a spec path as `field`
 */
export function designCoilFromFields(raw: SpecObject, choices: Choices, options: BuildOptions = {}): DesignCoilResult {
  const spec = buildCoilSpec(raw, choices, options);
  try {
    return designCoil(spec);
  } catch (e) {
    if (!isDesignError(e)) throw e;
    if (e.field === 'wire.insulatedDiameter' && choices.enamel === 'bare') throw new DesignError('wire.diameter', e.message);
    if (e.field === 'diameter' && spec.form === 'solenoid' && choices.dia !== 'mean') {
      const overall = spec.wire.insulatedDiameter ?? spec.wire.diameter;
      throw new DesignError('diameter', `${e.message} That is the former diameter plus the wire’s ${mmText(overall)} overall diameter.`);
    }
    throw e;
  }
}

// ---------------------------------------------------------------------------
// From a spec back to the bench

/**
 * The bench's state for a DesignCoilSpec (a shop-sheet file, a coil handed
 * from another bench): the mean diameter as given, the wire as a metric bare
 * diameter with its measured overall diameter (or bare), close-wound or the
 * pitch, AL or μ′. Values are written compactly with up to 9 figures.
 */
export function coilSnapshotFromSpec(spec: DesignCoilSpec): BenchSnapshot {
  const choices: Record<string, string> = {
    form: spec.form,
    give: spec.inductance === undefined ? 'N' : 'L',
    wire: 'mm',
    enamel: spec.wire?.insulatedDiameter === undefined ? 'bare' : 'measured',
  };
  if (spec.form === 'solenoid') {
    choices.dia = 'mean';
    choices.wind = spec.closeWound ? 'close' : 'pitch';
  }
  if (spec.form === 'toroid') choices.core = spec.al === undefined ? 'mu' : 'al';
  return specToSnapshot(COIL_FIELDS, spec, choices);
}

// ---------------------------------------------------------------------------
// Coil → Tank

export interface TankHandOff {
  /** The Tank bench's link, with the coil's own link as `coil`. */
  href: string;
  /** Capacitance to add across the coil for resonance at f (total less self-capacitance), farads; undefined when none can. */
  capacitance?: number;
  /** Why no capacitance is handed over (the self-capacitance alone already tunes below f). */
  problem?: string;
  /** What the link carries, in words. */
  carries: string[];
}

/**
 * The link that carries a coil to the Tank bench: L at the working frequency,
 * the coil's Q, its self-capacitance, f, the capacitance that resonates it at
 * f — C = 1/(ω² L_f) − C_s (Thomson's formula; the tank adds C_s back) — and
 * the coil's own link (`coil`), so the Tank bench can offer the way back.
 * Values are written with 5 significant figures.
 */
export function tankHandOff(r: DesignCoilResult, coilQuery: string): TankHandOff | undefined {
  if (r.frequency === undefined) return undefined;
  const f = r.frequency;
  const lf = r.inductanceAtFrequency ?? r.inductance;
  const cs = r.selfCapacitance ?? 0;
  const w = 2 * Math.PI * f;
  const total = 1 / (w * w * lf);
  const c = total - cs;
  const params = new URLSearchParams();
  const carries = ['L at f'];
  params.set('L', formatQuantityCompact(lf, 'H', 5));
  if (r.q !== undefined && Number.isFinite(r.q)) {
    params.set('coilQ', String(Number(r.q.toPrecision(5))));
    carries.push(r.form === 'toroid' ? 'Q (an upper bound)' : 'Q');
  }
  if (r.selfCapacitance !== undefined) {
    params.set('Cself', formatQuantityCompact(r.selfCapacitance, 'F', 5));
    carries.push('self-capacitance');
  }
  params.set('f', formatQuantityCompact(f, 'Hz', 5));
  carries.push('f');
  let capacitance: number | undefined;
  let problem: string | undefined;
  if (c > 0 && Number.isFinite(c)) {
    capacitance = c;
    params.set('C', formatQuantityCompact(c, 'F', 5));
    carries.push(`C = ${formatQuantityCompact(c, 'F', 4)} to resonate at f`);
  } else {
    problem = `No capacitance can tune this coil to ${formatQuantityCompact(f, 'Hz', 4)}: its own self-capacitance (${formatQuantityCompact(cs, 'F', 3)}) already needs ${formatQuantityCompact(total, 'F', 3)} or less. Use fewer turns or a lower frequency.`;
  }
  params.set('coil', coilQuery);
  return { href: `/tank/?${params.toString()}`, capacitance, problem, carries };
}
