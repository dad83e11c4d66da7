/**
 * A solar eclipse as a catalogue record, in the conventions of the lunar
 * records (src/outputs/catalogueRecord.ts): times ISO 8601 UTC with seconds,
 * durations whole seconds, angles degrees, lon/lat pairs [lon, lat] to
 * 0.001°, contacts and durations that do not occur left out; plus
 * `body: 'solar'` and the Moon radii the geometry used. Plain data, ready for
 * `umbracast.catalogue/2` when the outputs take solar eclipses.
 */
import type { DeltaTSource } from '../../ephemeris/deltaT.ts';
import { isoSeconds, wholeSecondsBetween } from '../../ephemeris/time.ts';
import { SOLAR_CONTACT_ORDER, type SolarContactName, type SolarEclipse, type SolarEclipseKind } from './types.ts';

export interface SolarEclipseRecord {
  body: 'solar';
  id: string;
  kind: SolarEclipseKind;
  central: boolean;
  greatest: string;
  greatestTT: string;
  deltaT: number;
  deltaTSource: DeltaTSource;
  gamma: number;
  magnitude: number;
  saros: number;
  greatestPoint: [number, number];
  /** Geometric altitude of the Sun's centre at the greatest point, degrees. */
  sunAltitude: number;
  pathWidthKm?: number;
  contacts: Partial<Record<SolarContactName, string>>;
  /** partial: P1 → P4 on the whole Earth; central: totality or annularity at the greatest point. */
  durations: { partial: number; central?: number };
  /** Moon radius in Earth equatorial radii: k1 for the penumbra, k2 for the umbra and antumbra. */
  moonRadius: { penumbra: number; umbra: number };
}

const round = (value: number, places: number): number => {
  const factor = 10 ** places;
  const rounded = Math.round(value * factor) / factor;
  return Object.is(rounded, -0) ? 0 : rounded;
};

export function solarEclipseRecord(eclipse: SolarEclipse): SolarEclipseRecord {
  const contacts: Partial<Record<SolarContactName, string>> = {};
  for (const name of SOLAR_CONTACT_ORDER) {
    const moment = eclipse.contacts[name];
    if (moment) contacts[name] = isoSeconds(moment.utDays);
  }
  const { centralSeconds } = eclipse.durations;
  return {
    body: 'solar',
    id: eclipse.id,
    kind: eclipse.kind,
    central: eclipse.central,
    greatest: isoSeconds(eclipse.greatest.utDays),
    greatestTT: isoSeconds(eclipse.greatest.ttDays),
    deltaT: round(eclipse.deltaT.seconds, 1),
    deltaTSource: eclipse.deltaT.source,
    gamma: round(eclipse.gamma, 4),
    magnitude: round(eclipse.magnitude, 4),
    saros: eclipse.saros,
    greatestPoint: [round(eclipse.greatestPoint[0], 3), round(eclipse.greatestPoint[1], 3)],
    sunAltitude: round(eclipse.sunAltitudeDeg, 1),
    ...(eclipse.pathWidthKm !== undefined ? { pathWidthKm: round(eclipse.pathWidthKm, 1) } : {}),
    contacts,
    durations: {
      partial: wholeSecondsBetween(eclipse.contacts.P1!.utDays, eclipse.contacts.P4!.utDays),
      ...(centralSeconds !== undefined ? { central: Math.round(centralSeconds) } : {}),
    },
    moonRadius: { ...eclipse.moonRadii },
  };
}
