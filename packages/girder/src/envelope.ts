/**
 * Envelopes of station resultants over the results of several combinations (or support scenarios):
 * per element station, the largest and smallest value of each resultant and the combination that
 * gave it. Results must come from the same model and station count (stations are matched by order).
 */
import { GirderError } from './errors.js';
import type { AnalysisResult } from './results.js';

export const ENVELOPE_RESULTANTS = ['N', 'Vy', 'Vz', 'T', 'Tsv', 'Tw', 'My', 'Mz', 'B'] as const;
export type EnvelopeResultant = (typeof ENVELOPE_RESULTANTS)[number];

export interface EnvelopeExtreme {
  value: number;
  /** Name of the combination (AnalysisResult.combination) that gave it; the first one on ties. */
  combination: string;
}

export interface StationEnvelope {
  element: string;
  /** Distance from node I, m. */
  x: number;
  max: Record<EnvelopeResultant, EnvelopeExtreme>;
  min: Record<EnvelopeResultant, EnvelopeExtreme>;
}

export function envelope(results: readonly AnalysisResult[]): StationEnvelope[] {
  const first = results[0];
  if (first === undefined) throw new GirderError('BAD_MODEL', 'envelope needs at least one analysis result; got none', 'results');
  results.forEach((result, r) => {
    const mismatch = result.stations.length !== first.stations.length || result.stations.some((s, i) => s.element !== first.stations[i]?.element || s.x !== first.stations[i]?.x);
    if (mismatch) {
      throw new GirderError('BAD_MODEL', `results[${r}] ('${result.combination}') has other stations than results[0]; envelope needs results of the same model and station count`, `results[${r}]`);
    }
  });
  return first.stations.map((station, i) => {
    const max = {} as Record<EnvelopeResultant, EnvelopeExtreme>;
    const min = {} as Record<EnvelopeResultant, EnvelopeExtreme>;
    for (const name of ENVELOPE_RESULTANTS) {
      max[name] = { value: station[name], combination: first.combination };
      min[name] = { value: station[name], combination: first.combination };
    }
    for (const result of results.slice(1)) {
      const s = result.stations[i];
      if (s === undefined) continue;
      for (const name of ENVELOPE_RESULTANTS) {
        if (s[name] > max[name].value) max[name] = { value: s[name], combination: result.combination };
        if (s[name] < min[name].value) min[name] = { value: s[name], combination: result.combination };
      }
    }
    return { element: station.element, x: station.x, max, min };
  });
}
