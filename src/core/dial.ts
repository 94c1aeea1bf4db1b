/**
 * The dial law: frequency against the rotation of the variable capacitor,
 * for straight-line-capacitance plates, straight-line-frequency plates cut
 * for this circuit, or the user's own plates given as a table of capacitance
 * at a few angles, in the capacitor network of `bandCoverage` (band.ts).
 *
 * Sources: Thomson's formula and the two classic plate shapes (Terman,
 * *Radio Engineers' Handbook*, 1943, section 3; section from memory).
 * Monotone interpolation of a plate table: Fritsch and Carlson, "Monotone
 * piecewise cubic interpolation", SIAM J. Numer. Anal. 17 (1980) 238–246,
 * with the derivative of Fritsch and Butland, SIAM J. Sci. Stat. Comput. 5
 * (1984) 300–304. Validity: as band.ts (lumped, lossless, strays constant).
 */
import { checkNetwork, checkPoints, coverageOf, monotoneInterpolator, partnerAt, requireFiniteFigure, requireWidth, thomson, totalCapacitance, variableFor } from './band';
import { DesignError, requireFinite, requireInRange, requireObject } from './errors';
import { note, type DesignNote } from './notes';
import { frequencyGrid } from './sweep';
import { tankValue } from './tankModel';
import { sayNumber, sayQuantity } from './text';

/** One point of a capacitor's measured plate table. */
export interface PlatePoint {
  /** Rotation, degrees. */
  angle: number;
  /** The variable capacitor's capacitance at that rotation, F. */
  capacitance: number;
}

/** What `dialLaw` takes. */
export interface DialLawInput {
  inductance: number;
  strayCapacitance: number;
  trimmerCapacitance?: number;
  padderCapacitance?: number;
  /**
   * 'slc': straight-line capacitance (C linear in angle); 'slf': straight-line
   * frequency (plates shaped so f is linear in angle, in this circuit); or the
   * user's own plates as a table of C at a few angles (angles rising).
   */
  plates: 'slc' | 'slf' | PlatePoint[];
  /** Variable capacitor's range, F (for 'slc' and 'slf'; a table gives its own). */
  minCapacitance?: number;
  maxCapacitance?: number;
  /** Full rotation, degrees (default 180; 'slc' and 'slf'). */
  rotation?: number;
  /** Points of the curves (default 181, 2 … 10,000). */
  points?: number;
}

/** What `dialLaw` returns: equal-length arrays ready to plot. */
export interface DialLaw {
  plates: 'slc' | 'slf' | 'table';
  /** Rotation, degrees: 0 = plates meshed for 'slc' and 'slf'; as the table gives otherwise. */
  angle: number[];
  /** Rotation as 0 … 100 % of the span. */
  percent: number[];
  /** The variable capacitor's capacitance, F. */
  capacitance: number[];
  /** Total capacitance across the coil, F. */
  totalCapacitance: number[];
  /** Tuned frequency, Hz. */
  frequency: number[];
  notes: DesignNote[];
}


/** The plate table checked: angles rising, capacitance strictly rising or strictly falling. */
function checkTable(table: unknown[]): PlatePoint[] {
  if (table.length < 2) throw new DesignError('plates', 'A plate table needs at least two points (angle and capacitance).');
  if (table.length > 10_000) throw new DesignError('plates', 'A plate table of more than 10,000 points is more than a dial needs.');
  const out: PlatePoint[] = table.map((row, i) => {
    const r = requireObject<PlatePoint>('plates', row, `Point ${i + 1} of the plate table`);
    const angle = requireInRange('plates', requireFinite('plates', r.angle, `The angle of point ${i + 1}`), -3600, 3600, `The angle of point ${i + 1}`);
    const capacitance = tankValue('plates', r.capacitance, `The capacitance of point ${i + 1}`, 'F');
    return { angle, capacitance };
  });
  for (let i = 1; i < out.length; i++) {
    if (!(out[i].angle > out[i - 1].angle)) {
      throw new DesignError('plates', `The plate table's angles must rise from point to point: point ${i + 1} (${sayNumber(out[i].angle)}°) is not beyond point ${i} (${sayNumber(out[i - 1].angle)}°).`);
    }
  }
  const rising = out[1].capacitance > out[0].capacitance;
  for (let i = 1; i < out.length; i++) {
    const step = out[i].capacitance - out[i - 1].capacitance;
    if (rising ? !(step > 0) : !(step < 0)) {
      throw new DesignError('plates', `The plate table's capacitance must ${rising ? 'rise' : 'fall'} steadily with angle, but at ${sayNumber(out[i].angle)}° it is ${sayQuantity(out[i].capacitance, 'F')}, ${step === 0 ? 'the same as' : rising ? 'less than' : 'more than'} ${sayQuantity(out[i - 1].capacitance, 'F')} at ${sayNumber(out[i - 1].angle)}°: check the table for a misread.`);
    }
  }
  return out;
}


/**
 * Frequency against rotation. 'slc': C_v = C_max − (C_max − C_min) θ/Θ
 * (θ = 0 plates meshed). 'slf': f rises linearly from the low to the high end
 * of this circuit's band, f(θ) = f_low + (f_high − f_low) θ/Θ, and C_v is
 * the setting that gives it (the ideal SLF shape for this circuit; real SLF
 * plates are cut for one total capacitance). Table: C_v from the user's
 * points by monotone cubic interpolation (Fritsch and Carlson 1980), over the
 * table's span. The frequency at each point is Thomson's, with the network of
 * `bandCoverage`.
 * @param input L in H, capacitances in F, rotation in degrees
 * @throws DesignError naming the input at fault ('plates' for a bad table)
 */
export function dialLaw(input: DialLawInput): DialLaw {
  requireObject<DialLawInput>('dial', input, 'The dial law');
  const l = tankValue('inductance', input.inductance, 'Inductance', 'H');
  const plates = input.plates;
  const table = Array.isArray(plates) ? checkTable(plates) : undefined;
  if (!table && plates !== 'slc' && plates !== 'slf') {
    throw new DesignError('plates', `The plates must be "slc" (straight-line capacitance), "slf" (straight-line frequency) or a table of angle and capacitance (got ${typeof plates === 'string' ? JSON.stringify(plates) : typeof plates}).`);
  }
  const points = checkPoints(input.points, 181);
  const ends = table
    ? { minCapacitance: Math.min(table[0].capacitance, table[table.length - 1].capacitance), maxCapacitance: Math.max(table[0].capacitance, table[table.length - 1].capacitance) }
    : { minCapacitance: input.minCapacitance, maxCapacitance: input.maxCapacitance };
  const n = checkNetwork({ ...input, ...ends });
  const rotation = table ? table[table.length - 1].angle - table[0].angle : input.rotation === undefined ? 180 : requireInRange('rotation', requireFinite('rotation', input.rotation, 'Rotation'), 1, 3600, 'Rotation');
  const start = table ? table[0].angle : 0;
  const angle: number[] = [];
  const percent: number[] = [];
  const capacitance: number[] = [];
  const totalC: number[] = [];
  const frequency: number[] = [];
  const notes: DesignNote[] = [];
  const fraction = (i: number) => i / (points - 1);
  if (plates === 'slf') {
    const cover = coverageOf(n, l);
    requireWidth(cover);
    const grid = frequencyGrid({ start: cover.lowFrequency, stop: cover.highFrequency, points, spacing: 'linear' });
    for (let i = 0; i < points; i++) {
      const f = grid[i];
      const total = i === 0 ? cover.lowEndCapacitance : i === points - 1 ? cover.highEndCapacitance : partnerAt(l, f);
      frequency.push(f);
      totalC.push(total);
      capacitance.push(i === 0 ? n.max : i === points - 1 ? n.min : Math.min(n.max, Math.max(n.min, variableFor(n, total))));
    }
    notes.push(note('info', 'Straight-line-frequency plates are cut for one circuit: the law shown is the ideal for this coil, strays, trimmer and padder. A capacitor cut for another circuit follows it only roughly.'));
  } else {
    const interpolate = table ? monotoneInterpolator(table.map((p) => p.angle), table.map((p) => p.capacitance)) : undefined;
    for (let i = 0; i < points; i++) {
      const cv = interpolate
        ? (i === 0 ? table![0].capacitance : i === points - 1 ? table![table!.length - 1].capacitance : interpolate(start + rotation * fraction(i)))
        : n.max - (n.max - n.min) * fraction(i);
      const total = totalCapacitance(n, cv);
      capacitance.push(cv);
      totalC.push(total);
      frequency.push(requireFiniteFigure('inductance', thomson(l, total), 'The tuned frequency'));
    }
  }
  for (let i = 0; i < points; i++) {
    angle.push(start + rotation * fraction(i));
    percent.push(100 * fraction(i));
  }
  return { plates: table ? 'table' : plates as 'slc' | 'slf', angle, percent, capacitance, totalCapacitance: totalC, frequency, notes };
}
