/**
 * The Band bench's hand-offs, loaded when their section comes near the
 * screen: the links that carry the band's coil to the Coil bench and the
 * tank at mid-band to the Tank bench, each written through the receiving
 * bench's own field table (documents.ts specToSnapshot, fields.ts
 * encodeLink), as the Coil bench hands its coil to the Tank bench; and the
 * coil with the capacitance across it at mid-band to the Match bench.
 */
import { specToSnapshot } from '../kit/documents';
import { encodeLink, getPath, type Choices, type SpecObject } from '../kit/fields';
import { COIL_PREFIX } from './bandFields';
import type { BandPlan } from './bandPlan';
import { COIL_FIELDS } from './coilFields';
import { matchLinkFor } from './matchLinks';
import { TANK_FIELDS } from './tankFields';

/** The Coil bench's choices that the Band bench shares (same keys). */
const COIL_CHOICE_KEYS = ['form', 'dia', 'wind', 'core', 'wire', 'awg', 'swg', 'enamel'] as const;

/**
 * The Coil bench's link for the band's coil: its former and wire as the
 * person gave them (the `coil.…` values are the Coil bench's own paths),
 * the band's inductance as the target and the mid-band frequency as the
 * working frequency, written through the Coil bench's table (specToSnapshot,
 * encodeLink). The Coil bench then winds the same turns.
 */
export function coilLink(raw: SpecObject, choices: Choices, plan: BandPlan): string {
  const coilRaw = (getPath(raw, COIL_PREFIX) ?? {}) as SpecObject;
  const spec = { ...coilRaw, inductance: plan.design.inductance, frequency: plan.selectivity.middle.frequency };
  const coilChoices: Record<string, string> = { give: 'L' };
  for (const k of COIL_CHOICE_KEYS) if (choices[k] !== undefined) coilChoices[k] = choices[k];
  return `/coil/?${encodeLink(COIL_FIELDS, specToSnapshot(COIL_FIELDS, spec, coilChoices, 6))}`;
}

/**
 * The Tank bench's link for the tank tuned to mid-band: the band's L, the
 * coil's Q there, the strays as the coil's self-capacitance (both sit across
 * the coil), the capacitance that resonates it at mid-band (variable,
 * trimmer and padder together), the capacitor's Q, source and load, and the
 * frequency of the Q figures, through the Tank bench's table.
 */
export function tankLink(plan: BandPlan): string {
  const t = plan.selectivity.middle.tank;
  const spec = {
    mode: 'parallel',
    inductance: t.inductance,
    coilQ: t.coilQ,
    coilSelfCapacitance: t.coilSelfCapacitance ?? 0,
    capacitance: t.capacitance,
    capacitorQ: t.capacitorQ,
    sourceResistance: t.sourceResistance,
    loadResistance: t.loadResistance,
    frequency: t.frequency,
  };
  return `/tank/?${encodeLink(TANK_FIELDS, specToSnapshot(TANK_FIELDS, spec, { mode: 'parallel', coilLoss: 'Q', capLoss: 'Q' }, 6))}`;
}


/**
 * The Match bench's link for the band's coil (wound as the plan winds it,
 * at mid-band) with everything across it there: the capacitance that tunes it
 * and the strays. The antenna and the next stage keep the Match bench's own
 * defaults: the Band bench's source and load are those seen across the tank.
 */
export function matchLink(plan: BandPlan): string {
  const t = plan.selectivity.middle.tank;
  return matchLinkFor({ coil: plan.coilSpec, capacitance: t.capacitance + (t.coilSelfCapacitance ?? 0), capacitorQ: t.capacitorQ });
}
