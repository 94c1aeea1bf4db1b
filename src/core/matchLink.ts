/**
 * Link winding: a few turns over (or beside) the cold end of the tank coil,
 * not connected to it, that couple a source (or the next stage) to the tank.
 *
 * Model: the link and the coil are coaxial single-layer windings whose turns
 * are circles; their mutual inductance M is Maxwell's formula summed over
 * every pair of turns (`mutual.ts`; Maxwell 1873, Grover 1946), the link's own
 * inductance L_link is the single-layer model of `solenoid.ts` (Nagaoka and
 * Rosa) for its turns, pitch and wire, and the coupling coefficient is
 * k = M/√(L L_link). A resistance R across the link is seen in series with
 * the tank coil as (ωM)² R/(R² + X²), X = ωL_link (coupled circuits; Terman,
 * *Radio Engineers' Handbook*, 1943), and so across the top of a high-Q tank
 * as
 *   R′ = L² (R² + X²) / (M² R)
 * (with the reactance part (ωM)² X/(R² + X²) the tank is tuned a little
 * higher; the exact circuit shows it). R′ falls as turns are added until the
 * link's reactance equals R, then rises; the design takes the fewest turns
 * that present the resistance wanted (the side where the link's reactance is
 * below R, where it is broadband and detunes least), searched from one turn
 * up to 50, and rounds to whole turns.
 *
 * Geometry: coil turn i (0 at the cold end) in the plane z = i·p; link turn j
 * at z = position + j·p_link (the link runs from `position` towards the hot
 * end). The link may not cut into the coil's wire: where they overlap along
 * the axis their radii must differ by at least half the sum of the two
 * wires' overall diameters.
 */
import { TWO_PI } from './constants';
import { type CoilWireSpec } from './coil';
import { DesignError, requireFinite, requireObject, requirePositive } from './errors';
import { analyzeMatchCircuit, type MatchCircuit, type MatchResponse } from './matchCircuit';
import {
  coilParts, estimateFigures, resolveTankForMatch, sideCircuit, sideTarget, tappable,
  type MatchEstimate, type MatchTank, type SideInput, type TankForMatch,
} from './matchTank';
import { loopMutuals, loopsOf, runInductance, type SolenoidGeometry, type WoundSolenoid } from './mutual';
import { note, type DesignNote } from './notes';
import { sayMm, sayNumber, sayQuantity } from './text';

/** The link as a technician gives it; every field has a default. SI units. */
export interface LinkSpec {
  /** Mean diameter of the link's turns, metres; default: just over the coil (its mean diameter plus both wires' overall diameters). */
  diameter?: number;
  /** Axial distance from the coil's cold-end turn to the link's first turn, metres, positive towards the hot end; default 0 (over the cold end). */
  position?: number;
  /** The link's wire; default: the coil's. */
  wire?: CoilWireSpec;
  /** Pitch of the link's turns, metres; default: close-wound (the wire's overall diameter). */
  pitch?: number;
  /** Turns of the link, when given (then it is analysed, not designed): 1 to 50. */
  turns?: number;
}

/** The link after checking. */
export interface LinkGeometry extends SolenoidGeometry {
  position: number;
  insulatedDiameter: number;
  /** Turns given (else found). */
  given?: number;
}

/** Most turns a link is searched over. */
const MAX_LINK_TURNS = 50;

/**
 * Checks the link against the coil and fills in the defaults.
 * @throws DesignError naming 'link.…' fields
 */
export function checkLink(spec: LinkSpec | undefined, w: WoundSolenoid): LinkGeometry {
  const s = spec === undefined ? {} : requireObject<LinkSpec>('link', spec, 'The link');
  const coilWire = w.geometry.insulatedDiameter ?? w.geometry.wireDiameter;
  let wireDiameter = w.geometry.wireDiameter;
  let insulatedDiameter = coilWire;
  if (s.wire !== undefined) {
    const wire = requireObject<CoilWireSpec>('link.wire', s.wire, 'The link\'s wire');
    wireDiameter = requirePositive('link.wire.diameter', wire.diameter, 'The link\'s wire diameter', 'm');
    insulatedDiameter = wire.insulatedDiameter === undefined ? wireDiameter : requirePositive('link.wire.insulatedDiameter', wire.insulatedDiameter, 'The link wire\'s overall diameter', 'm');
    if (insulatedDiameter < wireDiameter) throw new DesignError('link.wire.insulatedDiameter', `The ${sayMm(insulatedDiameter)} over the insulation is smaller than the ${sayMm(wireDiameter)} bare wire.`);
  }
  const coilDiameter = 2 * w.geometry.radius;
  const diameter = s.diameter === undefined ? coilDiameter + coilWire + insulatedDiameter : requirePositive('link.diameter', s.diameter, 'The link\'s diameter', 'm');
  if (!(diameter > insulatedDiameter)) throw new DesignError('link.diameter', `A link of ${sayMm(diameter)} mean diameter is not wider than its own ${sayMm(insulatedDiameter)} wire.`);
  if (diameter > 100 * coilDiameter) throw new DesignError('link.diameter', `A link of ${sayMm(diameter)} around a ${sayMm(coilDiameter)} coil hardly couples to it: keep it within a few times the coil's diameter.`);
  const pitch = s.pitch === undefined ? insulatedDiameter : requirePositive('link.pitch', s.pitch, 'The link\'s pitch', 'm');
  if (pitch < insulatedDiameter * (1 - 1e-12)) throw new DesignError('link.pitch', `pitch ${sayMm(pitch)} is smaller than the link wire's ${sayMm(insulatedDiameter)}: its turns would overlap.`);
  if (pitch > diameter) throw new DesignError('link.pitch', `A pitch of ${sayMm(pitch)} spreads the link's turns wider apart than its ${sayMm(diameter)} diameter: a link is wound close.`);
  const coilLength = w.geometry.turns * w.geometry.pitch;
  const position = s.position === undefined ? 0 : requireFinite('link.position', s.position, 'The link\'s position');
  if (Math.abs(position) > coilLength + 10 * coilDiameter) {
    throw new DesignError('link.position', `A link ${sayMm(position)} from the cold end is too far from a ${sayMm(coilLength)} coil to couple to it: put it over the cold end or close beside it.`);
  }
  let given: number | undefined;
  if (s.turns !== undefined) {
    given = requireFinite('link.turns', s.turns, 'The link\'s turns');
    if (given < 1 || given > MAX_LINK_TURNS) throw new DesignError('link.turns', `A link here has from 1 to ${MAX_LINK_TURNS} turns (got ${sayNumber(given)}).`);
  }
  const g: LinkGeometry = { radius: diameter / 2, pitch, wireDiameter, insulatedDiameter, turns: given ?? 1, position, ...(given === undefined ? {} : { given }) };
  checkClearance(g, w, given ?? 1);
  return g;
}

/** The link may not cut into the coil: where they overlap along the axis, their radii differ by half the two wires at least. */
function checkClearance(g: LinkGeometry, w: WoundSolenoid, turns: number): void {
  const cw = w.geometry.insulatedDiameter ?? w.geometry.wireDiameter;
  const coilEnd = (Math.ceil(w.geometry.turns) - 1) * w.geometry.pitch + cw / 2;
  const linkEnd = g.position + (Math.ceil(turns) - 1) * g.pitch + g.insulatedDiameter / 2;
  const overlap = g.position - g.insulatedDiameter / 2 < coilEnd && linkEnd > -cw / 2;
  const gap = Math.abs(g.radius - w.geometry.radius);
  const need = (cw + g.insulatedDiameter) / 2;
  if (overlap && gap < need * (1 - 1e-9)) {
    const d = 2 * w.geometry.radius;
    throw new DesignError('link.diameter', `A link of ${sayMm(2 * g.radius)} mean diameter where it lies along the ${sayMm(d)} coil would cut into its turns: make its mean diameter at least ${sayMm(d + 2 * need)} (over the coil) or at most ${sayMm(d - 2 * need)} (inside it), or move it beyond the coil's end.`);
  }
}

/** A link with the coil it couples to: its inductance and its mutual inductance with runs of the coil, by turns. */
export interface LinkModel {
  g: LinkGeometry;
  w: WoundSolenoid;
  /** The link's inductance with n turns, henries. */
  inductance(n: number): number;
  /** Mutual inductance of an n-turn link with the coil's turns a … b (from the cold end), henries. */
  mutual(n: number, a?: number, b?: number): number;
}

/** The link's per-turn mutuals with each run of the coil, worked out once per link turn as they are needed. */
export function linkModel(g: LinkGeometry, w: WoundSolenoid): LinkModel {
  const coil = loopsOf({ position: 0, pitch: w.geometry.pitch, turns: w.geometry.turns, firstTurn: 0 });
  const rows: Float64Array[] = [];
  const row = (j: number): Float64Array => {
    if (!rows[j]) {
      const z = g.position + j * g.pitch;
      rows[j] = Float64Array.from(coil, (c) => loopMutuals(w.geometry.radius, [{ z: c.z, weight: 1 }], g.radius, z));
    }
    return rows[j];
  };
  return {
    g,
    w,
    inductance: (n) => runInductance({ ...g, turns: n }, n),
    mutual(n, a = 0, b = w.geometry.turns) {
      let sum = 0;
      for (const l of loopsOf({ position: 0, pitch: 1, turns: n, firstTurn: 0 })) {
        const r = row(Math.round(l.z));
        for (let i = 0; i < coil.length; i++) {
          const share = Math.min(i + 1, b) - Math.max(i, a);
          if (share > 0) sum += l.weight * Math.min(share, coil[i].weight) * r[i];
        }
      }
      return sum;
    },
  };
}

/** Where a link goes and what it gives. */
export interface LinkPlacement {
  /** Turns that present the resistance wanted exactly (real-valued; the turns given when given). */
  turns: number;
  /** Whole turns to wind (at least 1). */
  practicalTurns: number;
  /** Mean diameter, position of the first turn (from the cold-end turn, towards the hot end) and pitch, metres. */
  diameter: number;
  position: number;
  pitch: number;
  /** The link's inductance with the practical turns, henries. */
  linkInductance: number;
  /** Mutual inductance of the link and the whole coil, henries. */
  mutualInductance: number;
  /** k = M/√(L L_link). */
  couplingCoefficient: number;
  /** ω L_link, ohms. */
  reactance: number;
  /** The resistance across the link seen across the top, L²(R² + X²)/(M² R), ohms. */
  presentedResistance: number;
}

/** R′ of an n-turn link at ω. */
function presented(m: LinkModel, tank: MatchTank, resistance: number, n: number): number {
  const x = TWO_PI * tank.frequency * m.inductance(n);
  const mu = m.mutual(n);
  return ((tank.inductance / mu) * (tank.inductance / mu) * (resistance * resistance + x * x)) / resistance;
}

/**
 * The link turns that present `resistance` (across the link) as `wanted`
 * across the top (module header), or what given turns present.
 * @throws DesignError('link.position') when even one turn loads the tank more than wanted;
 *   DesignError('link.diameter') when no number of turns loads it enough
 */
export function placeLink(m: LinkModel, tank: MatchTank, resistance: number, wanted: number): LinkPlacement {
  const at = (n: number) => presented(m, tank, resistance, n);
  let turns: number;
  if (m.g.given !== undefined) turns = m.g.given;
  else {
    const first = at(1);
    if (first < wanted) {
      throw new DesignError('link.position', `Even a one-turn link here presents ${sayQuantity(first, 'Ω')} across the tank, below the ${sayQuantity(wanted, 'Ω')} wanted: it loads the tank too heavily. Move the link beyond the cold end or make it smaller, or use a tap.`);
    }
    let lo = 1;
    let hi = 1;
    let prev = first;
    for (;;) {
      hi = lo + 0.5;
      if (hi > MAX_LINK_TURNS) {
        throw new DesignError('link.diameter', `No link of up to ${MAX_LINK_TURNS} turns here presents as little as ${sayQuantity(wanted, 'Ω')} (the least is about ${sayQuantity(prev, 'Ω')}): couple it more tightly (over the coil, close to its diameter), or use a tap.`);
      }
      const v = at(hi);
      if (v <= wanted) break;
      if (v > prev) {
        throw new DesignError('link.diameter', `This link presents at least ${sayQuantity(prev, 'Ω')} across the tank, whatever its turns, more than the ${sayQuantity(wanted, 'Ω')} wanted: its own reactance outgrows the source first. Couple it more tightly (over the coil, close to its diameter), or use a tap.`);
      }
      prev = v;
      lo = hi;
    }
    for (let i = 0; i < 100 && hi - lo > 1e-12 * hi; i++) {
      const mid = 0.5 * (lo + hi);
      if (at(mid) > wanted) lo = mid;
      else hi = mid;
    }
    turns = 0.5 * (lo + hi);
  }
  const practicalTurns = m.g.given ?? Math.max(1, Math.round(turns));
  checkClearance(m.g, m.w, practicalTurns);
  const linkInductance = m.inductance(practicalTurns);
  const mutualInductance = m.mutual(practicalTurns);
  return {
    turns,
    practicalTurns,
    diameter: 2 * m.g.radius,
    position: m.g.position,
    pitch: m.g.pitch,
    linkInductance,
    mutualInductance,
    couplingCoefficient: mutualInductance / Math.sqrt(tank.inductance * linkInductance),
    reactance: TWO_PI * tank.frequency * linkInductance,
    presentedResistance: at(practicalTurns),
  };
}

/** The tank's coil (split at `taps`) with the link coupled to each run, as one group of windings; the link from `node` to ground. */
export function linkParts(r: TankForMatch, m: LinkModel, turns: number, taps: ReadonlyArray<{ turns: number; node: string }>, node: string) {
  const { winding, nodeOf } = coilParts(r, taps);
  if (winding.kind !== 'windings') throw new DesignError('coil', 'A link needs the coil\'s geometry.');
  const N = m.w.geometry.turns;
  const bounds = [0, ...[...new Set(taps.map((t) => t.turns).filter((t) => t > 0 && t < N))].sort((a, b) => a - b), N];
  const ll = m.inductance(turns);
  const ks = winding.windings.map((w, i) => m.mutual(turns, bounds[i], bounds[i + 1]) / Math.sqrt(ll * w.inductance));
  const windings = [...winding.windings, { name: 'link', from: node, to: '0', inductance: ll, resistance: 0 }];
  const last = windings.length - 1;
  const coupling = windings.map((_, i) => windings.map((__, j) => (i === j ? 1 : i === last ? ks[j] : j === last ? ks[i] : winding.coupling[i][j])));
  return { part: { kind: 'windings' as const, name: 'coil', windings, coupling }, nodeOf };
}

/** What `designLink` takes: one side, and the link's geometry. */
export interface LinkInput extends SideInput {
  coil: NonNullable<SideInput['coil']>;
  link?: LinkSpec;
}

/** A link designed for one side. */
export interface LinkDesign {
  tank: MatchTank;
  /** Resistance this side must present across the top, ohms. */
  wantedResistance: number;
  link: LinkPlacement;
  /** High-Q figures with the practical link. */
  estimate: MatchEstimate;
  /** The exact circuit's figures with the practical link (the resistance drives the link). */
  response: MatchResponse;
  circuit: MatchCircuit;
  notes: DesignNote[];
}

/**
 * The link winding for one side of a match: the turns (real-valued and whole)
 * that present the resistance across the link as the tank needs for the
 * wanted loaded Q (or a match), from Maxwell's mutual inductance summed over
 * the link's and the coil's turns, and the loaded Q, bandwidth and mismatch
 * that the whole-turn link gives in the exact circuit.
 * @throws DesignError naming the input at fault ('link.…', 'coil.…', 'resistance', 'loadedQ', …)
 */
export function designLink(input: LinkInput): LinkDesign {
  const i = requireObject<LinkInput>('input', input, 'The link design');
  const r = resolveTankForMatch(i);
  const w = tappable(r, 'coil');
  const target = sideTarget(r.tank, i);
  const m = linkModel(checkLink(i.link, w), w);
  const link = placeLink(m, r.tank, target.resistance, target.wanted);
  const { part } = linkParts(r, m, link.practicalTurns, [], 'lk');
  const circuit = sideCircuit(r, target, [part], 'lk');
  const estimate = estimateFigures(r.tank, 1 / link.presentedResistance, target.across === undefined ? 0 : 1 / target.across, undefined, target.resistance);
  return { tank: r.tank, wantedResistance: target.wanted, link, estimate, response: analyzeMatchCircuit(circuit, { bandwidth: estimate.bandwidth }), circuit, notes: [...r.tank.notes, ...linkNotes(link, target.resistance)] };
}

/** Notes on a placed link. */
export function linkNotes(link: LinkPlacement, resistance: number): DesignNote[] {
  const notes: DesignNote[] = [];
  if (link.reactance > 0.3 * resistance) {
    notes.push(note('info', `The link's own reactance (${sayQuantity(link.reactance, 'Ω')}) is a good part of the ${sayQuantity(resistance, 'Ω')} across it: a capacitor of about ${sayQuantity(link.linkInductance / (link.reactance * link.reactance), 'F')} (1/(ωX)) in series with the link tunes it out and improves the match.`, 'link.turns'));
  }
  if (Math.abs(link.turns - link.practicalTurns) > 0.25 && link.turns > 0) {
    notes.push(note('info', `The link wants ${sayNumber(link.turns, 3)} turns; ${sayNumber(link.practicalTurns)} whole turns present ${sayQuantity(link.presentedResistance, 'Ω')}. Sliding the link along the coil trims the coupling between whole turns.`, 'link.position'));
  }
  return notes;
}
