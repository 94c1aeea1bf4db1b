/**
 * Voltages and currents in a driven tank at its loaded resonance, and the
 * cautions they call for: capacitor voltage against its rating, the coil's
 * circulating current against the wire's, and any tank voltage above the
 * extra-low-voltage limit of IEC 61140 / IEC 60364 (50 V AC RMS).
 * That limit is a mains-frequency touch criterion: RF burns happen at lower
 * voltages, and dielectric breakdown and arcing are separate hazards. The
 * notes defer to local codes and licensed practice.
 */
import { TWO_PI } from './constants';
import { DesignError } from './errors';
import { note, type DesignNote } from './notes';
import { sayQuantity } from './text';
import { evaluate, kernelOf, scratch } from './tankKernel';
import { optionalTankValue, requireFiniteFigures, resolveTank, type TankInput } from './tankModel';
import { analyzeTank } from './tank';

/** Extra-low-voltage limit for AC, V RMS (IEC 61140 / IEC 60364; 120 V is the ripple-free DC bound). */
export const EXTRA_LOW_VOLTAGE_AC_RMS = 50;

/** Inputs of `tankStress`: a tank plus the drive and the parts' ratings. */
export interface TankStressInput extends TankInput {
  /**
   * RF power delivered into the tank and its load at resonance, W (not the
   * source's internal loss). Give this or `driveVoltage`.
   */
  drivePower?: number;
  /**
   * RMS voltage at resonance, V: across the tank (parallel) or across the
   * series circuit of tank and load (series mode).
   */
  driveVoltage?: number;
  /** Capacitor voltage rating, V peak (compare a DC working voltage with the RF peak; derate for RF as the maker says). */
  capacitorVoltageRating?: number;
  /** Current the coil's wire can carry, A RMS at this frequency. */
  wireCurrentRating?: number;
}

/** What `tankStress` returns (RMS unless the name says peak). */
export interface TankStress {
  /** Loaded resonance where the stress is evaluated, Hz. */
  frequency: number;
  /** Power into tank and load, W. */
  power: number;
  /** Drive voltage, V RMS (across the tank, or across the series circuit). */
  driveVoltage: number;
  /** Current from the drive into tank and load, A RMS. */
  lineCurrent: number;
  /** Voltage across the capacitance itself, V RMS. */
  capacitorVoltage: number;
  /** √2 × capacitorVoltage, V. */
  capacitorVoltagePeak: number;
  /** Current through the capacitor, A RMS. */
  capacitorCurrent: number;
  /** Voltage across the coil's terminals, V RMS. */
  coilVoltage: number;
  /** Current in the coil's wire: the circulating current, A RMS (≈ Q_L × line current in a parallel tank). */
  circulatingCurrent: number;
  notes: DesignNote[];
}

/**
 * Voltages and currents in a driven tank at its loaded resonance, with
 * cautions. Parallel: V across the tank, I_C = V/|ESR + 1/(jωC)|,
 * I_L = V/|R_L + jωL| ≈ Q_L × I_line (I_line the current into tank and
 * load). Series: I = V/|Z + R_load|, V_C = I/(ωC) ≈ Q × V.
 * Cautions: capacitor peak voltage above `capacitorVoltageRating`; coil
 * current above `wireCurrentRating`; any tank voltage above 50 V AC RMS, the
 * extra-low-voltage limit of IEC 61140 / IEC 60364 (120 V ripple-free DC).
 * That limit is a mains-frequency touch criterion: RF burns happen at lower
 * voltages, and dielectric breakdown and arcing are separate hazards. The
 * notes defer to local codes and licensed practice; workbenches link each
 * caution to the Cautions page.
 * @param input tank (SI) plus drivePower (W) or driveVoltage (V RMS), ratings (V peak, A RMS)
 * @throws DesignError naming the input at fault
 */
export function tankStress(input: TankStressInput): TankStress {
  const t = resolveTank(input);
  const power = optionalTankValue('drivePower', input.drivePower, 'Drive power', 'give the RF power into the tank.', 'W');
  const volts = optionalTankValue('driveVoltage', input.driveVoltage, 'Drive voltage', 'give the RMS voltage across the tank.', 'V');
  const vRating = optionalTankValue('capacitorVoltageRating', input.capacitorVoltageRating, 'Capacitor voltage rating', 'leave it out if unknown.', 'V');
  const iRating = optionalTankValue('wireCurrentRating', input.wireCurrentRating, 'Wire current rating', 'leave it out if unknown.', 'A');
  if (power === undefined && volts === undefined) {
    throw new DesignError('drivePower', 'Give the drive: the RF power into the tank, or the RMS voltage across it.');
  }
  if (power !== undefined && volts !== undefined) {
    throw new DesignError('driveVoltage', 'Give either the drive power or the drive voltage, not both.');
  }
  const a = analyzeTank(input);
  const f = a.loadedResonantFrequency;
  const w = TWO_PI * f;
  const k = kernelOf(t);
  evaluate(k, w, w / k.w0 - 1, scratch);
  const zCap = Math.hypot(t.capacitorEsr, 1 / (w * t.capacitance));
  const zCoil = Math.hypot(t.coilResistance, w * t.inductance);
  let drive: number;
  let line: number;
  let delivered: number;
  let vCap: number;
  let iCap: number;
  let vCoil: number;
  if (t.mode === 'parallel') {
    // Admittance of tank plus load (the source resistance belongs to the source).
    const g = scratch[0] + (t.loadResistance ? 1 / t.loadResistance : 0);
    const b = scratch[1];
    if (power !== undefined && !(g > 0)) {
      throw new DesignError('drivePower', 'Nothing in this tank dissipates power (ideal parts, no load): give the drive voltage instead.');
    }
    drive = volts ?? Math.sqrt((power as number) / g);
    delivered = power ?? drive * drive * g;
    line = drive * Math.hypot(g, b);
    iCap = drive / zCap;
    vCap = iCap / (w * t.capacitance);
    vCoil = drive;
  } else {
    const rr = scratch[0] + (t.loadResistance ?? 0);
    const zAbs = Math.hypot(rr, scratch[1]);
    if (power !== undefined && !(rr > 0)) {
      throw new DesignError('drivePower', 'Nothing in this circuit dissipates power (ideal parts, no load): give the drive voltage instead.');
    }
    line = volts !== undefined ? volts / zAbs : Math.sqrt((power as number) / rr);
    drive = volts ?? line * zAbs;
    delivered = power ?? line * line * rr;
    iCap = line;
    vCap = line / (w * t.capacitance);
    // Voltage across the coil with its self-capacitance: I × |Z_coil ∥ C_s|.
    const wl = w * t.inductance;
    const d1 = t.coilResistance * t.coilResistance + wl * wl;
    const g1 = t.coilResistance / d1;
    const b1 = -wl / d1 + w * t.coilSelfCapacitance;
    vCoil = line / Math.hypot(g1, b1);
  }
  const iCoil = vCoil / zCoil;
  const vCapPeak = Math.SQRT2 * vCap;
  const notes: DesignNote[] = [...a.notes.filter((n) => n.level !== 'info')];
  const defer = 'Follow local codes and licensed practice.';
  if (vRating !== undefined) {
    if (vCapPeak > vRating) {
      notes.push(note('caution', `The capacitor sees ${sayQuantity(vCapPeak, 'V')} peak, above its ${sayQuantity(vRating, 'V')} rating: it may break down or overheat. Use a capacitor rated well above the peak RF voltage. ${defer}`, 'capacitorVoltageRating'));
    } else if (vCapPeak > 0.8 * vRating) {
      notes.push(note('info', `The capacitor sees ${sayQuantity(vCapPeak, 'V')} peak, within 20 % of its ${sayQuantity(vRating, 'V')} rating: little margin for RF derating.`, 'capacitorVoltageRating'));
    }
  }
  if (iRating !== undefined && iCoil > iRating) {
    notes.push(note('caution', `The coil carries ${sayQuantity(iCoil, 'A')} RMS, above the wire's ${sayQuantity(iRating, 'A')} rating: it will run hot, detune and may damage its insulation or former. Use heavier wire or tubing. ${defer}`, 'wireCurrentRating'));
  }
  const vMax = Math.max(vCap, vCoil, drive);
  if (vMax > EXTRA_LOW_VOLTAGE_AC_RMS) {
    notes.push(note('caution', `The tank carries ${sayQuantity(vMax, 'V')} RMS (${sayQuantity(Math.SQRT2 * vMax, 'V')} peak) at ${sayQuantity(f, 'Hz')}, above ${EXTRA_LOW_VOLTAGE_AC_RMS} V AC RMS, the extra-low-voltage limit of IEC 61140 and IEC 60364. That limit is a mains-frequency touch criterion: RF can burn at lower voltages, often without a felt shock, and high RF voltage can break down capacitor dielectrics and arc across the coil. Keep hands off the live tank and switch off before touching. ${defer}`, power !== undefined ? 'drivePower' : 'driveVoltage'));
  }
  return requireFiniteFigures({
    frequency: f,
    power: delivered,
    driveVoltage: drive,
    lineCurrent: line,
    capacitorVoltage: vCap,
    capacitorVoltagePeak: vCapPeak,
    capacitorCurrent: iCap,
    coilVoltage: vCoil,
    circulatingCurrent: iCoil,
    notes,
  }, power !== undefined ? 'drivePower' : 'driveVoltage');
}
