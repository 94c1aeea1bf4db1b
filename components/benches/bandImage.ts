/**
 * The Band bench's image rejection (superhet): the core's imageRejection of
 * the signal tank at the band's low, middle and high frequency, and along
 * the selectivity curve. Loaded with the cards (BandCards.tsx), not with the
 * answer, which does not need it. Pure: no Solid, no DOM.
 */
import { imageRejection } from '../../src/core/image';
import type { TankInput } from '../../src/core/tankModel';
import type { BandPlan, Superhet } from './bandPlan';

/** The core's image rejection of the tank tuned to f (its own loss figures at f): the image and how far below f's response, dB. */
export function imageAt(tank: TankInput, f: number, superhet: Superhet): { image: number; rejection: number } {
  const r = imageRejection({ tank, signalFrequency: f, ...superhet });
  return { image: r.imageFrequency, rejection: r.rejection };
}

export interface ImageResponse {
  /** Image frequency and rejection (dB) at the band's low, middle and high frequency. */
  low: { image: number; rejection: number };
  middle: { image: number; rejection: number };
  high: { image: number; rejection: number };
}

const images = new WeakMap<BandPlan, ImageResponse | undefined>();

/**
 * The signal tank's image rejection at the band's low, middle and high
 * frequency (superhet only), worked out on first call and kept.
 * @throws DesignError at `intermediateFrequency` (an oscillator below a signal under 2·IF)
 */
export function imageResponse(plan: BandPlan): ImageResponse | undefined {
  if (images.has(plan)) return images.get(plan);
  const sh = plan.superhet;
  const point = (p: BandPlan['selectivity']['low']) => imageAt(p.tank, p.frequency, sh!);
  const s = plan.selectivity;
  const image = sh && { low: point(s.low), middle: point(s.middle), high: point(s.high) };
  images.set(plan, image);
  return image;
}

