import { checkSection, type CheckResult, type SteelGrade, type SteelSection } from '@binsupport/steel';
import type { Station } from '@binsupport/girder';

/** The stations of one analysis, with what is needed to name the place and the case. */
export interface StationSet {
  combination: string;
  scenario: string;
  stations: Station[];
}

/** The largest utilisation of one check over all stations of all analyses, and where it occurred. */
export interface CheckEnvelope {
  check: CheckResult;
  combination: string;
  scenario: string;
  station: Station;
}

/**
 * Evaluate every check of a section at every station of every analysis, and keep, per check and per
 * (combination, scenario), the station that gives the largest utilisation.
 */
export function envelopeChecks(section: SteelSection, grade: SteelGrade, sets: StationSet[]): CheckEnvelope[] {
  const envelopes: CheckEnvelope[] = [];
  for (const set of sets) {
    const worst = new Map<string, CheckEnvelope>();
    for (const station of set.stations) {
      const results = checkSection(section, grade, { N: station.N, Vy: station.Vy, Vz: station.Vz, Tsv: station.Tsv, Tw: station.Tw, My: station.My, Mz: station.Mz, B: station.B });
      for (const check of results) {
        const current = worst.get(check.id);
        if (!current || check.utilisation > current.check.utilisation) {
          worst.set(check.id, { check, combination: set.combination, scenario: set.scenario, station });
        }
      }
    }
    envelopes.push(...worst.values());
  }
  return envelopes;
}

/** The largest utilisation over a set of envelopes (0 for an empty set). */
export function maxUtilisation(envelopes: CheckEnvelope[]): number {
  return envelopes.reduce((max, envelope) => Math.max(max, envelope.check.utilisation), 0);
}

export function governingEnvelope(envelopes: CheckEnvelope[]): CheckEnvelope | undefined {
  let governing: CheckEnvelope | undefined;
  for (const envelope of envelopes) {
    if (!governing || envelope.check.utilisation > governing.check.utilisation) governing = envelope;
  }
  return governing;
}

/**
 * The largest utilisation of any check of the section at any station, in one pass: stations in order
 * of decreasing strong-axis moment, stopping at the first utilisation above 1 (then Infinity), so a
 * failing section is rejected after a few evaluations and a passing one costs a single pass.
 */
export function maxStationUtilisation(section: SteelSection, grade: SteelGrade, sets: StationSet[]): number {
  const ordered = sets.flatMap((set) => set.stations).sort((a, b) => Math.abs(b.My) - Math.abs(a.My) || Math.abs(b.B) - Math.abs(a.B));
  let max = 0;
  for (const station of ordered) {
    const results = checkSection(section, grade, { N: station.N, Vy: station.Vy, Vz: station.Vz, Tsv: station.Tsv, Tw: station.Tw, My: station.My, Mz: station.Mz, B: station.B });
    for (const check of results) {
      if (!(check.utilisation <= 1)) return Infinity;
      if (check.utilisation > max) max = check.utilisation;
    }
  }
  return max;
}
