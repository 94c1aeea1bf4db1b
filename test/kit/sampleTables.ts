/**
 * Field tables modelled on the Coil and Tank benches, for testing the kit:
 * forms that change the fields, radio choices, gauge selects, optional
 * fields, either-or inputs (coil loss as Q or R), plain numbers with ranges
 * (−60…200 °C, turns ≥ 1 in half turns), defaults that follow a choice, and
 * a range field as the band planner will use. Not the benches' own tables.
 */
import { defineFields, NON_NEGATIVE, POSITIVE } from '../../components/kit/fields';

const gauges = (prefix: string, from: number, to: number) =>
  Array.from({ length: to - from + 1 }, (_, i) => [String(from + i), `${prefix} ${from + i}`] as const);

export const COIL_LIKE = defineFields([
  { kind: 'choice', key: 'form', path: 'form', label: 'Coil form', default: 'solenoid', options: [['solenoid', 'Single-layer'], ['toroid', 'Toroid'], ['multilayer', 'Multilayer']] },
  { kind: 'choice', key: 'give', label: 'You give', default: 'L', options: [['L', 'Inductance → turns'], ['N', 'Turns → inductance']] },
  { kind: 'quantity', key: 'L', path: 'inductance', label: 'Target inductance', symbol: 'L', unit: 'H', default: '1 µH', allowed: POSITIVE, when: { give: 'L' } },
  { kind: 'number', key: 'N', path: 'turns', label: 'Turns', symbol: 'N', default: '12', rule: { min: 1, max: 100000, step: 0.5 }, when: { give: 'N' } },
  { kind: 'choice', key: 'dia', label: 'Diameter given is', default: 'former', options: [['former', 'the former (outside)'], ['mean', 'wire centre to centre']], when: { form: 'solenoid' } },
  {
    kind: 'quantity', key: 'D', path: 'diameter', unit: 'm', default: '10 mm', allowed: POSITIVE, when: { form: 'solenoid' },
    label: (c) => (c.dia === 'former' ? 'Former diameter' : 'Mean winding diameter'),
  },
  { kind: 'choice', key: 'wind', label: 'Winding', default: 'close', options: [['close', 'Close-wound'], ['pitch', 'Spaced (give pitch)']], when: { form: 'solenoid' } },
  { kind: 'quantity', key: 'p', path: 'pitch', label: 'Pitch, turn to turn', unit: 'm', default: '1 mm', allowed: POSITIVE, when: { form: 'solenoid', wind: 'pitch' } },
  { kind: 'quantity', key: 'OD', path: 'outerDiameter', label: 'Core outer diameter', unit: 'm', default: '12.7 mm', allowed: POSITIVE, when: { form: 'toroid' } },
  { kind: 'quantity', key: 'ID', path: 'innerDiameter', label: 'Core inner diameter', unit: 'm', default: '7.7 mm', allowed: POSITIVE, when: { form: 'toroid' } },
  { kind: 'quantity', key: 'h', path: 'height', label: 'Core height', unit: 'm', default: '4.8 mm', allowed: POSITIVE, when: { form: 'toroid' } },
  { kind: 'choice', key: 'core', label: 'Core given by', default: 'mu', options: [['mu', 'permeability μ′'], ['al', 'AL']], when: { form: 'toroid' } },
  { kind: 'number', key: 'mu', path: 'relativePermeability', label: 'μ′', default: '10', rule: { min: 0, minExclusive: true, max: 1e6 }, when: { form: 'toroid' }, answers: ['muReal'] },
  { kind: 'number', key: 'mu2', path: 'muImag', label: 'μ″', default: '0.1', rule: { min: 0, max: 1e6 }, when: { form: 'toroid' } },
  { kind: 'quantity', key: 'AL', path: 'al', label: 'AL', unit: 'H', default: '5 nH', allowed: POSITIVE, when: { form: 'toroid', core: 'al' } },
  { kind: 'quantity', key: 'mD', path: 'diameter', label: 'Mean winding diameter', unit: 'm', default: '12 mm', allowed: POSITIVE, when: { form: 'multilayer' } },
  { kind: 'quantity', key: 'mlen', path: 'length', label: 'Winding length', unit: 'm', default: '6 mm', allowed: POSITIVE, when: { form: 'multilayer' } },
  { kind: 'quantity', key: 'depth', path: 'windingDepth', label: 'Winding depth', unit: 'm', default: '4 mm', allowed: POSITIVE, when: { form: 'multilayer' } },
  { kind: 'choice', key: 'wire', label: 'Wire', default: 'awg', options: [['awg', 'AWG'], ['swg', 'SWG'], ['mm', 'Metric bare diameter']] },
  { kind: 'choice', key: 'awg', label: 'Gauge', display: 'select', default: '22', options: gauges('AWG', 8, 40), when: { wire: 'awg' }, answers: ['wire.diameter'] },
  { kind: 'choice', key: 'swg', label: 'Gauge', display: 'select', default: '24', options: gauges('SWG', 10, 44), when: { wire: 'swg' }, answers: ['wire.diameter'] },
  { kind: 'quantity', key: 'wd', path: 'wire.diameter', label: 'Bare wire diameter', unit: 'm', default: '0.5 mm', allowed: POSITIVE, when: { wire: 'mm' } },
  { kind: 'choice', key: 'enamel', label: 'Enamel', display: 'select', default: '1', options: [['bare', 'none (bare)'], ['1', 'grade 1'], ['2', 'grade 2']] },
  { kind: 'quantity', key: 'f', path: 'frequency', label: 'Working frequency', unit: 'Hz', default: '7.1 MHz', allowed: POSITIVE },
  { kind: 'quantity', key: 'lead', path: 'leadLength', label: 'Length of each lead', unit: 'm', default: '10 mm', allowed: NON_NEGATIVE },
  { kind: 'number', key: 'T', path: 'temperature', label: 'Wire temperature, °C', what: 'Wire temperature', default: '20', rule: { min: -60, max: 200, unit: '°C' } },
]);

const TERMINATION = (c: Readonly<Record<string, string>>) => (c.mode === 'series' ? '5 Ω' : '10 kΩ');

export const TANK_LIKE = defineFields([
  { kind: 'choice', key: 'mode', path: 'mode', label: 'Tank', default: 'parallel', options: [['parallel', 'Parallel'], ['series', 'Series']] },
  { kind: 'quantity', key: 'L', path: 'inductance', label: 'Inductance', unit: 'H', default: '4.7 µH', allowed: POSITIVE },
  { kind: 'choice', key: 'coilLoss', label: 'Coil loss given as', default: 'Q', options: [['Q', 'Q'], ['R', 'Series resistance']] },
  { kind: 'number', key: 'coilQ', path: 'coilQ', label: 'Coil Q', default: '150', rule: { min: 0, minExclusive: true }, when: { coilLoss: 'Q' }, answers: ['coilResistance'] },
  { kind: 'quantity', key: 'Rcoil', path: 'coilResistance', label: 'Coil series resistance', unit: 'Ω', default: '1.4 Ω', allowed: NON_NEGATIVE, when: { coilLoss: 'R' } },
  { kind: 'quantity', key: 'Cself', path: 'coilSelfCapacitance', label: 'Self-capacitance (optional)', what: 'Self-capacitance', unit: 'F', default: '', optional: true, allowed: NON_NEGATIVE },
  { kind: 'quantity', key: 'C', path: 'capacitance', label: 'Capacitance', unit: 'F', default: '100 pF', allowed: POSITIVE },
  { kind: 'choice', key: 'capLoss', label: 'Capacitor loss given as', default: 'Q', options: [['Q', 'Q'], ['ESR', 'ESR'], ['DF', 'tan δ']] },
  { kind: 'number', key: 'capQ', path: 'capacitorQ', label: 'Capacitor Q', default: '1000', rule: { min: 0, minExclusive: true }, when: { capLoss: 'Q' }, answers: ['capacitorEsr'] },
  { kind: 'quantity', key: 'ESR', path: 'capacitorEsr', label: 'Equivalent series resistance', unit: 'Ω', default: '20 mΩ', allowed: NON_NEGATIVE, when: { capLoss: 'ESR' } },
  { kind: 'number', key: 'DF', path: 'dissipationFactor', label: 'Dissipation factor', default: '0.001', rule: { min: 0 }, when: { capLoss: 'DF' }, answers: ['capacitorEsr'] },
  { kind: 'quantity', key: 'Rs', path: 'sourceResistance', label: 'Source resistance (optional)', what: 'Source resistance', unit: 'Ω', default: TERMINATION, optional: true, allowed: POSITIVE },
  { kind: 'quantity', key: 'Rload', path: 'loadResistance', label: 'Load resistance (optional)', what: 'Load resistance', unit: 'Ω', default: TERMINATION, optional: true, allowed: POSITIVE },
  { kind: 'quantity', key: 'f', path: 'frequency', label: 'Frequency of the Q figures (optional)', what: 'Frequency of the Q figures', unit: 'Hz', default: '', optional: true, allowed: POSITIVE },
  { kind: 'choice', key: 'drive', label: 'Drive given as', default: 'V', options: [['V', 'Voltage'], ['P', 'Power']] },
  { kind: 'quantity', key: 'V', path: 'driveVoltage', label: 'RMS voltage (optional)', what: 'Drive voltage', unit: 'V', default: '', optional: true, allowed: POSITIVE, when: { drive: 'V' } },
  { kind: 'quantity', key: 'P', path: 'drivePower', label: 'RF power (optional)', what: 'Drive power', unit: 'W', default: '', optional: true, allowed: POSITIVE, when: { drive: 'P' } },
  { kind: 'quantity', key: 'Vrating', path: 'capacitorVoltageRating', label: 'Capacitor voltage rating (optional)', unit: 'V', default: '', optional: true, allowed: POSITIVE },
]);

/** A band planner's inputs: ranges as one text each. */
export const BAND_LIKE = defineFields([
  { kind: 'range', key: 'band', low: 'lowFrequency', high: 'highFrequency', label: 'Band', unit: 'Hz', default: '5.9–6.2 MHz', allowed: POSITIVE },
  { kind: 'range', key: 'cap', low: 'minCapacitance', high: 'maxCapacitance', label: 'Tuning capacitor', unit: 'F', default: '10p..365p', allowed: POSITIVE },
  { kind: 'quantity', key: 'stray', path: 'strayCapacitance', label: 'Strays', unit: 'F', default: '15 pF', allowed: NON_NEGATIVE },
  { kind: 'number', key: 'margin', path: 'margin', label: 'Margin', default: '0.02', rule: { min: 0, max: 0.5 } },
]);
