/**
 * The Band bench's fixed pairs, loaded when their section comes near the
 * screen: resonantPairs for the band's geometric centre, with the series,
 * tolerances and seed from the bench. Pure: no Solid, no DOM.
 */
import { resonantPairs, type PairSearchResult } from '../../src/core/pairs';
import type { ESeriesName } from '../../src/core/preferred';
import { getPath, type SpecObject } from '../kit/fields';
import { num } from './bandPlan';

/** Pairs listed, and Monte-Carlo units per pair. */
export const PAIR_COUNT = 6;
export const PAIR_SAMPLES = 2000;

/**
 * The fixed L–C pairs for the band's geometric centre (resonantPairs), with
 * their worst-case and Monte-Carlo spread and the trimmer range: the series,
 * tolerances (blank: the series' own) and seed from the bench.
 */
export function pairsForBand(raw: SpecObject): PairSearchResult {
  const tolC = num(raw, 'capacitanceTolerancePercent');
  const tolL = num(raw, 'inductanceTolerancePercent');
  return resonantPairs({
    lowFrequency: num(raw, 'lowFrequency') as number,
    highFrequency: num(raw, 'highFrequency') as number,
    capacitorSeries: (getPath(raw, 'capacitorSeries') as ESeriesName | undefined) ?? 'E12',
    inductorSeries: getPath(raw, 'inductorSeries') === 'E6' ? 'E6' : 'E12',
    strayCapacitance: num(raw, 'strayCapacitance'),
    ...(tolC === undefined ? {} : { capacitanceTolerance: tolC / 100 }),
    ...(tolL === undefined ? {} : { inductanceTolerance: tolL / 100 }),
    count: PAIR_COUNT,
    samples: PAIR_SAMPLES,
    seed: num(raw, 'seed'),
  });
}
