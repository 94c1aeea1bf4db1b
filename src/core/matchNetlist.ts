/**
 * SPICE netlist of a matched circuit (`MatchCircuit`), for checking a match
 * with a circuit simulator (ngspice batch mode, `ngspice -b file.cir`), in the
 * style of `tankNetlist`.
 *
 * Elements: standard SPICE lines (R, L, C, V) and the K element for coupled
 * windings (K name L1 L2 k: the coupling coefficient between two inductors,
 * dots at each inductor's first node). Each winding is written as its series
 * loss resistance followed by its inductance. The source is a 1 V AC EMF
 * (Vsource) behind Rsource; an `.ac` sweep and an ngspice `.control` block
 * write, with `wrdata`, one header line and then the columns
 *   frequency, Re zin, Im zin, Re vtop, Im vtop, Re vsrc, Im vsrc[, Re vload, Im vload]
 * where zin is the impedance the source looks into (V(src) over the current
 * through Rsource), vtop the voltage at the top of the tank and vsrc at the
 * source's node, both per volt of EMF, and vload the load's voltage.
 * Sources: the SPICE2 input format (Nagel, 1975) as implemented by ngspice
 * (ngspice user manual: K coupled inductors, `.ac`, `.control`, `let`, `wrdata`).
 */
import { DesignError, requireObject } from './errors';
import { analyzeMatchCircuit, checkMatchCircuit, type MatchCircuit } from './matchCircuit';
import { checkSweepOptions, type SweepOptions } from './sweep';
import { netlistNames, num } from './netlist';
import { sayQuantity } from './text';

/** Options of `matchNetlist`. */
export interface MatchNetlistOptions {
  /** Frequency sweep; default: linear, 2001 points over ±5 bandwidths around the loaded resonance. */
  sweep?: SweepOptions;
  /** File the `.control` block writes; default 'match-ac.data'. No spaces. */
  dataFile?: string;
  /** Text for the title line (one line, ASCII). */
  title?: string;
}


/**
 * Writes a SPICE netlist of the matched circuit, ready for `ngspice -b`.
 * Pure: returns the text. See the module header for the data file's columns.
 * @param circuit the matched circuit (as a matching option returns it)
 * @param options sweep (Hz), data file name, title
 * @throws DesignError naming the input at fault
 */
export function matchNetlist(circuit: MatchCircuit, options?: MatchNetlistOptions): string {
  const opts = options === undefined ? {} : requireObject<MatchNetlistOptions>('options', options, 'The netlist options');
  const { c, nodes } = checkMatchCircuit(circuit);
  const { dataFile, title } = netlistNames(opts, 'match-ac.data', 'Tankwright matched front end');
  let sweep = opts.sweep;
  if (sweep === undefined) {
    const r = analyzeMatchCircuit(c);
    const half = Math.max(5 * r.bandwidth, 1e-9 * r.frequency);
    sweep = { start: Math.max(r.frequency - half, r.frequency / 10), stop: r.frequency + half, points: 2001, spacing: 'linear' };
  }
  const { start, stop, points, spacing } = checkSweepOptions(sweep);
  if (!(Number(num(stop)) > Number(num(start)))) {
    throw new DesignError('stop', `Sweep stop ${sayQuantity(stop, 'Hz', 12)} and start ${sayQuantity(start, 'Hz', 12)} are the same to the netlist's 12 digits: widen the sweep.`);
  }
  const acLine = spacing === 'linear'
    ? `.ac lin ${points} ${num(start)} ${num(stop)}`
    : `.ac dec ${Math.max(1, Math.ceil((points - 1) / Math.log10(stop / start)))} ${num(start)} ${num(stop)}`;

  // Node names of our own for the EMF and inside each winding, none of them the circuit's.
  const used = new Set([...nodes.keys()]);
  const fresh = (base: string) => {
    let name = base.toLowerCase();
    for (let i = 1; used.has(name); i++) name = `${base.toLowerCase()}${i}`;
    used.add(name);
    return name;
  };
  const emf = fresh('emf');
  const lines: string[] = [`* ${title}`, `* design frequency ${num(c.frequency)} Hz; source ${num(c.sourceResistance)} ohm at node ${c.sourceNode}`];
  lines.push('* drive: 1 V AC EMF behind the source resistance');
  lines.push(`Vsource ${emf} 0 DC 0 AC 1`);
  lines.push(`Rsource ${emf} ${c.sourceNode} ${num(c.sourceResistance)}`);
  let group = 0;
  for (const p of c.parts) {
    if (p.kind === 'resistor') lines.push(`R${p.name} ${p.from} ${p.to} ${num(p.resistance)}`);
    else if (p.kind === 'capacitor') lines.push(`C${p.name} ${p.from} ${p.to} ${num(p.capacitance)}`);
    else if (p.kind === 'inductor') {
      if (p.resistance !== undefined && p.resistance > 0) {
        const mid = fresh(`${p.name}_r`);
        lines.push(`R${p.name} ${p.from} ${mid} ${num(p.resistance)}`);
        lines.push(`L${p.name} ${mid} ${p.to} ${num(p.inductance)}`);
      } else lines.push(`L${p.name} ${p.from} ${p.to} ${num(p.inductance)}`);
    } else {
      group++;
      lines.push(`* coupled windings ${p.name}`);
      for (const w of p.windings) {
        // the loss resistance at the winding's far end, so its first node (the dot) is its own
        if (w.resistance > 0) {
          const mid = fresh(`${w.name}_r`);
          lines.push(`L${w.name} ${w.from} ${mid} ${num(w.inductance)}`);
          lines.push(`R${w.name} ${mid} ${w.to} ${num(w.resistance)}`);
        } else lines.push(`L${w.name} ${w.from} ${w.to} ${num(w.inductance)}`);
      }
      for (let i = 0; i < p.windings.length; i++) {
        for (let j = i + 1; j < p.windings.length; j++) {
          const k = p.coupling[i][j];
          if (k !== 0) lines.push(`K${group}_${i}_${j} L${p.windings[i].name} L${p.windings[j].name} ${num(k)}`);
        }
      }
    }
  }
  if (c.loadNode !== undefined) lines.push(`Rload ${c.loadNode} 0 ${num(c.loadResistance as number)}`);
  lines.push(acLine);
  lines.push('.control');
  lines.push('set wr_singlescale');
  lines.push('set wr_vecnames');
  lines.push('option numdgt=15');
  lines.push('run');
  lines.push(`let zin = v(${c.sourceNode})/((v(${emf})-v(${c.sourceNode}))/${num(c.sourceResistance)})`);
  lines.push(`let vtop = v(${c.topNode})`);
  lines.push(`let vsrc = v(${c.sourceNode})`);
  if (c.loadNode !== undefined) lines.push(`let vload = v(${c.loadNode})`);
  lines.push(`wrdata ${dataFile} zin vtop vsrc${c.loadNode !== undefined ? ' vload' : ''}`);
  lines.push('quit 0');
  lines.push('.endc');
  lines.push('.end');
  return lines.join('\n') + '\n';
}
