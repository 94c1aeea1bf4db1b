/**
 * SPICE netlists of the circuits the core analyses, for cross-checking with a
 * circuit simulator (ngspice batch mode, `ngspice -b file.cir`).
 *
 * The netlist uses standard SPICE element lines (R, L, C, I, V), a `.ac`
 * sweep and an ngspice `.control` block that runs the sweep and writes the
 * terminated network's impedance to a data file with `wrdata`: one header
 * line, then columns frequency (Hz), Re Z (Ω), Im Z (Ω). Parallel tanks are
 * driven by a 1 A AC current source, so the tank node voltage is Z; series
 * circuits by a 1 V AC source, so Z = −1 / I(source).
 * Sources: the SPICE2 input format (Nagel, 1975) as implemented by ngspice
 * (ngspice user manual: `.ac`, `.control`, `wrdata`).
 */
import { DesignError, requireObject } from './errors';
import { checkSweepOptions, type SweepOptions } from './sweep';
import { analyzeTank } from './tank';
import { resolveTank, type TankInput } from './tankModel';
import { sayQuantity } from './text';

/** Options of `tankNetlist`. */
export interface TankNetlistOptions {
  /** Frequency sweep; default: linear, 2001 points over ±5 bandwidths around the loaded resonance. */
  sweep?: SweepOptions;
  /** File the `.control` block writes (frequency, Re Z, Im Z); default 'tank-ac.data'. No spaces. */
  dataFile?: string;
  /** Text for the title line (one line, ASCII). */
  title?: string;
}

/** A number in SPICE syntax, 12 significant digits, exponent form. */
export function num(x: number): string {
  return x.toExponential(11);
}

/**
 * The data file and title of a netlist's options, checked: a file name of
 * letters, digits, dot, dash, underscore and slash; a title as one ASCII line.
 * @throws DesignError at 'dataFile' or 'title'
 */
export function netlistNames(opts: { dataFile?: unknown; title?: unknown }, defaultFile: string, defaultTitle: string): { dataFile: string; title: string } {
  const dataFile = opts.dataFile ?? defaultFile;
  if (typeof dataFile !== 'string' || !/^[A-Za-z0-9._\/-]+$/.test(dataFile)) {
    throw new DesignError('dataFile', 'The data file name may use only letters, digits, dot, dash, underscore and slash (no spaces).');
  }
  if (opts.title !== undefined && typeof opts.title !== 'string') throw new DesignError('title', 'The title must be text.');
  return { dataFile, title: ((opts.title as string | undefined) ?? defaultTitle).replace(/[^\x20-\x7e]/g, ' ') };
}

/**
 * Write a SPICE netlist of the tank with its source and load, ready for
 * `ngspice -b`. Pure: returns the text.
 *
 * Elements (node names of our own): Rcoil + Lcoil in series with Cself across
 * both; Ctank + Resr; Rsource and Rload across the tank (parallel) or in
 * series (series mode). Log sweeps become `.ac dec N` with
 * N = ⌈(points − 1) / decades⌉ points per decade; linear sweeps `.ac lin`.
 * @param tank tank inputs in SI units (as for `analyzeTank`)
 * @param options sweep (Hz), data file name, title
 * @throws DesignError naming the input at fault
 */
export function tankNetlist(tank: TankInput, options?: TankNetlistOptions): string {
  const opts = options === undefined ? {} : requireObject<TankNetlistOptions>('options', options, 'The netlist options');
  const t = resolveTank(tank);
  const { dataFile, title } = netlistNames(opts, 'tank-ac.data', `Tankwright ${t.mode} tank`);

  let sweep = opts.sweep;
  if (sweep === undefined) {
    const a = analyzeTank(tank);
    const f = a.loadedResonantFrequency;
    // ±5 bandwidths, but at least ±1e-9 of f so that the 12-digit numbers still differ at enormous Q.
    const half = Math.max(5 * a.bandwidth, 1e-9 * f);
    sweep = { start: Math.max(f - half, f / 10), stop: f + half, points: 2001, spacing: 'linear' };
  }
  const { start, stop, points, spacing } = checkSweepOptions(sweep);
  if (!(Number(num(stop)) > Number(num(start)))) {
    throw new DesignError('stop', `Sweep stop ${sayQuantity(stop, 'Hz', 12)} and start ${sayQuantity(start, 'Hz', 12)} are the same to the netlist's 12 digits: widen the sweep.`);
  }
  const acLine = spacing === 'linear'
    ? `.ac lin ${points} ${num(start)} ${num(stop)}`
    : `.ac dec ${Math.max(1, Math.ceil((points - 1) / Math.log10(stop / start)))} ${num(start)} ${num(stop)}`;

  const lines: string[] = [];
  lines.push(`* ${title}`);
  lines.push(`* L=${num(t.inductance)} H  C=${num(t.capacitance)} F  f0=${num(t.naturalFrequency)} Hz (lossless)`);
  const rs = t.sourceResistance;
  const rl = t.loadResistance;
  if (t.mode === 'parallel') {
    lines.push('* drive: 1 A AC into node hot, so V(hot) is the terminated tank impedance');
    lines.push('Idrive 0 hot DC 0 AC 1');
    if (rs !== undefined) lines.push(`Rsource hot 0 ${num(rs)}`);
    if (t.coilResistance > 0) {
      lines.push(`Rcoil hot coil ${num(t.coilResistance)}`);
      lines.push(`Lcoil coil 0 ${num(t.inductance)}`);
    } else {
      lines.push(`Lcoil hot 0 ${num(t.inductance)}`);
    }
    if (t.coilSelfCapacitance > 0) lines.push(`Cself hot 0 ${num(t.coilSelfCapacitance)}`);
    if (t.capacitorEsr > 0) {
      lines.push(`Ctank hot cap ${num(t.capacitance)}`);
      lines.push(`Resr cap 0 ${num(t.capacitorEsr)}`);
    } else {
      lines.push(`Ctank hot 0 ${num(t.capacitance)}`);
    }
    if (rl !== undefined) lines.push(`Rload hot 0 ${num(rl)}`);
  } else {
    lines.push('* drive: 1 V AC, so -1/I(Vdrive) is the loop impedance with source and load');
    lines.push('Vdrive feed 0 DC 0 AC 1');
    let node = 'feed';
    if (rs !== undefined) {
      lines.push(`Rsource feed hot ${num(rs)}`);
      node = 'hot';
    }
    if (t.coilResistance > 0) {
      lines.push(`Rcoil ${node} coil ${num(t.coilResistance)}`);
      lines.push(`Lcoil coil mid ${num(t.inductance)}`);
    } else {
      lines.push(`Lcoil ${node} mid ${num(t.inductance)}`);
    }
    if (t.coilSelfCapacitance > 0) lines.push(`Cself ${node} mid ${num(t.coilSelfCapacitance)}`);
    const ret = rl !== undefined ? 'ret' : '0';
    if (t.capacitorEsr > 0) {
      lines.push(`Ctank mid cap ${num(t.capacitance)}`);
      lines.push(`Resr cap ${ret} ${num(t.capacitorEsr)}`);
    } else {
      lines.push(`Ctank mid ${ret} ${num(t.capacitance)}`);
    }
    if (rl !== undefined) lines.push(`Rload ret 0 ${num(rl)}`);
  }
  lines.push(acLine);
  lines.push('.control');
  lines.push('set wr_singlescale');
  lines.push('set wr_vecnames');
  lines.push('option numdgt=15');
  lines.push('run');
  lines.push(t.mode === 'parallel' ? 'let zin = v(hot)' : 'let zin = -1/i(Vdrive)');
  lines.push(`wrdata ${dataFile} zin`);
  lines.push('quit 0');
  lines.push('.endc');
  lines.push('.end');
  return lines.join('\n') + '\n';
}
