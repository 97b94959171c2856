import { checkSection, SECTION_CHECK_IDS, sectionUtilisations, type CheckResult, type InternalForces, type SteelGrade, type SteelSection } from '@binsupport/steel';
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

function forcesAt(station: Station): InternalForces {
  return { N: station.N, Vy: station.Vy, Vz: station.Vz, Tsv: station.Tsv, Tw: station.Tw, My: station.My, Mz: station.Mz, B: station.B };
}

/**
 * Evaluate every check of a section at every station of every analysis, and keep, per check and per
 * (combination, scenario), the station that gives the largest utilisation (the first of equals). The
 * stations are scanned with sectionUtilisations; only the governing station of each check is then
 * reported in full by checkSection (the two give the same utilisations, a steel test holds them equal).
 */
export function envelopeChecks(section: SteelSection, grade: SteelGrade, sets: StationSet[]): CheckEnvelope[] {
  const envelopes: CheckEnvelope[] = [];
  const count = SECTION_CHECK_IDS.length;
  const values = new Float64Array(count);
  const worstValue = new Float64Array(count);
  const worstStation = new Int32Array(count);
  for (const set of sets) {
    if (set.stations.length === 0) continue;
    worstValue.fill(-1);
    worstStation.fill(-1);
    set.stations.forEach((station, index) => {
      sectionUtilisations(section, grade, forcesAt(station), values);
      for (let k = 0; k < count; k++) {
        const value = values[k] as number;
        if (value > (worstValue[k] as number)) {
          worstValue[k] = value;
          worstStation[k] = index;
        }
      }
    });
    const reports = new Map<number, CheckResult[]>();
    for (let k = 0; k < count; k++) {
      const index = worstStation[k] as number;
      const station = set.stations[index] as Station;
      let results = reports.get(index);
      if (!results) {
        results = checkSection(section, grade, forcesAt(station));
        reports.set(index, results);
      }
      envelopes.push({ check: results[k] as CheckResult, combination: set.combination, scenario: set.scenario, station });
    }
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
  const values = new Float64Array(SECTION_CHECK_IDS.length);
  for (const station of ordered) {
    for (const utilisation of sectionUtilisations(section, grade, forcesAt(station), values)) {
      if (!(utilisation <= 1)) return Infinity;
      if (utilisation > max) max = utilisation;
    }
  }
  return max;
}
