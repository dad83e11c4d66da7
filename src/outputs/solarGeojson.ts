/**
 * A solar eclipse's geometry as GeoJSON (RFC 7946): the total or annular
 * path as polygons, the central line with its times, the path limits, the
 * partial limits, curves of equal obscuration or magnitude, and the curves
 * where the eclipse begins or ends at sunrise or sunset. Lon/lat in degrees
 * (WGS 84, geodetic), to 0.001°; lines cut at ±180° (RFC 7946 §3.1.9);
 * polygons traced on a global grid by sphere/regions.ts, so they are cut at
 * ±180°, closed along the poles and wound counter-clockwise (§3.1.6).
 *
 * A path narrower than about two grid cells (≈ 55 km: hybrid paths, the
 * short ends of some total ones) is traced coarsely, its polygon cutting
 * corners by up to the path's own width; the `limit` lines are exact there.
 *
 * The collection carries the eye-safety caution (long form, in `umbracast`)
 * and every feature its short form, so that a GIS table shows it too.
 */
import type { Feature, FeatureCollection, Geometry, MultiLineString, MultiPolygon, Position } from 'geojson';
import { InputError } from '../errors.ts';
import { DATA_CALENDAR } from '../ephemeris/calendar.ts';
import type { LonLat } from '../ephemeris/earth.ts';
import { isoSeconds } from '../ephemeris/time.ts';
import { K_PENUMBRA, K_UMBRA } from '../eclipses/solar/constants.ts';
import { centralLine, equalMagnitudeCurves, equalObscurationCurves, partialLimits, pathLimits, riseSetCurves, type NorthSouth, type TimedLine } from '../eclipses/solar/curves.ts';
import { localMaximumTT, localShadow, type LocalShadow } from '../eclipses/solar/localCore.ts';
import { geocentricPlace } from '../eclipses/solar/surface.ts';
import type { SolarEclipse } from '../eclipses/solar/types.ts';
import { cellNormal, gridShape, traceRegion, type PlanarMultiPolygon } from '../sphere/regions.ts';
import { safetyScopeForEclipse, solarSafetyText, type SolarWords } from '../words/solar/caution.ts';

export const SOLAR_GEOMETRY_SCHEMA = 'umbracast.solar-geometry/1';
/** Grid step for tracing the path, degrees (checked against the local circumstances in test/outputs/solarGeojson.test.ts). */
export const SOLAR_PATH_GRID_DEG = 0.25;
/** The obscuration contours written unless others are asked for. */
export const DEFAULT_OBSCURATION_LEVELS: readonly number[] = [0.2, 0.4, 0.6, 0.8];

export type SolarShadow = 'umbra' | 'antumbra';

export interface SolarGeojsonOptions {
  /** Obscurations (0 < o < 1) to draw curves of; default 0.2, 0.4, 0.6, 0.8. */
  readonly obscurationLevels?: readonly number[];
  /** Magnitudes (0 < m < 1) to draw curves of; default none. */
  readonly magnitudeLevels?: readonly number[];
  /** The reader's solar words, for the caution the collection and each feature carry (default English); the keys stay. */
  readonly solar?: SolarWords;
}

const DEG = 180 / Math.PI;
const round = (v: number) => {
  const r = Math.round(v * 1000) / 1000;
  return Object.is(r, -0) ? 0 : r;
};
const roundedPoint = ([lon, lat]: LonLat | Position): Position => [round(lon!), round(lat!)];
const roundedRegion = (region: PlanarMultiPolygon): PlanarMultiPolygon => region.map((polygon) => polygon.map((ring) => ring.map(roundedPoint)));

function checkLevels(levels: readonly number[], option: string): readonly number[] {
  for (const level of levels) {
    if (!(level > 0 && level < 1)) throw new InputError(option, 'numbers between 0 and 1, both excluded', level);
  }
  return [...new Set(levels)].sort((a, b) => a - b);
}

/** The place against the shadow at its own maximum. */
function atLocalMaximum(eclipse: SolarEclipse, lonLat: LonLat): LocalShadow {
  const place = geocentricPlace(lonLat);
  return localShadow(eclipse.elements, place, localMaximumTT(eclipse.elements, place, eclipse.greatest.ttDays));
}

/** Which shadow reaches a place at its maximum: L2′ < 0 the umbra (total), else the antumbra (annular). */
const shadowAt = (eclipse: SolarEclipse, lonLat: LonLat): SolarShadow => (atLocalMaximum(eclipse, lonLat).umbra < 0 ? 'umbra' : 'antumbra');

/**
 * The path of each shadow as polygons: where, at the place's maximum, the
 * axis lies within the shadow's radius (umbra: Δ < −L2′; antumbra:
 * Δ < L2′) with the Sun on the sunward side (ζ ≥ 0). The margin
 * min(radius − Δ, ζ) is continuous, so the traced edge follows both the
 * limits and, where the path starts or ends, the sunrise and sunset limb.
 * Only places within 2° of longitude of the limits' and central line's
 * segments, and half a degree of latitude of their reach, are evaluated: the
 * path lies between its limits.
 */
function pathRegions(eclipse: SolarEclipse, limits: NorthSouth, central: readonly TimedLine[]): Record<SolarShadow, PlanarMultiPolygon> {
  const empty = { umbra: [], antumbra: [] };
  const points = [...limits.north, ...limits.south].flat();
  if (points.length === 0) return empty;
  const lats = points.map((p) => p[1]);
  // Whole degrees of longitude the limits and the central line pass through (every segment, not only its
  // ends: near the limb a minute moves the shadow by degrees), widened by two on each side, wrapping at ±180°.
  const columns = new Set<number>();
  for (const line of [...limits.north, ...limits.south, ...central.map((c) => c.points)]) {
    line.forEach(([lon], k) => {
      const previous = k > 0 ? line[k - 1]![0] : lon;
      for (let d = Math.floor(Math.min(lon, previous)) - 2; d <= Math.floor(Math.max(lon, previous)) + 2; d++) columns.add(wrapDegree(d));
    });
  }
  // The grid's normals are made only for the places evaluated: a whole 0.25° grid of them would be a million arrays.
  const grid = gridShape(SOLAR_PATH_GRID_DEG);
  const band = [Math.min(...lats) - 2 * SOLAR_PATH_GRID_DEG, Math.max(...lats) + 2 * SOLAR_PATH_GRID_DEG];
  const umbra = new Float64Array(grid.columns * grid.rows).fill(-1);
  const antumbra = new Float64Array(grid.columns * grid.rows).fill(-1);
  for (let j = 0; j < grid.rows; j++) {
    // A row's latitude, read back from its normal as every place's is (z depends on the row alone).
    const latDeg = Math.asin(Math.max(-1, Math.min(1, cellNormal(grid, j * grid.columns)[2]))) * DEG;
    if (latDeg < band[0]! || latDeg > band[1]!) continue;
    for (let k = j * grid.columns; k < (j + 1) * grid.columns; k++) {
      const n = cellNormal(grid, k);
      const lonDeg = Math.atan2(n[1], n[0]) * DEG;
      if (!columns.has(wrapDegree(Math.floor(lonDeg)))) continue;
      const s = atLocalMaximum(eclipse, [lonDeg, latDeg]);
      umbra[k] = Math.min(-s.umbra - s.distance, s.zeta);
      antumbra[k] = Math.min(s.umbra - s.distance, s.zeta);
    }
  }
  return { umbra: traceRegion(grid, umbra), antumbra: traceRegion(grid, antumbra) };
}

/** A whole degree of longitude in −180…179. */
const wrapDegree = (d: number) => ((((d + 180) % 360) + 360) % 360) - 180;

/** Split a line where the shadow changes (hybrid eclipses), the point of change ending one piece and starting the next. */
function splitByShadow<T>(eclipse: SolarEclipse, points: readonly LonLat[], extra: readonly T[]): { shadow: SolarShadow; points: LonLat[]; extra: T[] }[] {
  const pieces: { shadow: SolarShadow; points: LonLat[]; extra: T[] }[] = [];
  points.forEach((p, k) => {
    const shadow = eclipse.kind === 'total' ? 'umbra' : eclipse.kind === 'annular' ? 'antumbra' : shadowAt(eclipse, p);
    const last = pieces[pieces.length - 1];
    if (last && last.shadow === shadow) {
      last.points.push(p);
      last.extra.push(extra[k]!);
      return;
    }
    if (last) {
      last.points.push(p);
      last.extra.push(extra[k]!);
    }
    pieces.push({ shadow, points: [p], extra: [extra[k]!] });
  });
  return pieces.filter((piece) => piece.points.length >= 2);
}

const multiLine = (lines: readonly (readonly LonLat[])[]): MultiLineString => ({
  type: 'MultiLineString',
  coordinates: lines.map((line) => line.map(roundedPoint)),
});

/** Every curve and the path of one solar eclipse, the caution on the collection and on each feature. */
export function solarGeoJson(eclipse: SolarEclipse, options: SolarGeojsonOptions = {}): FeatureCollection<Geometry> & { umbracast: Record<string, unknown> } {
  const obscurations = checkLevels(options.obscurationLevels ?? DEFAULT_OBSCURATION_LEVELS, 'obscurationLevels');
  const magnitudes = checkLevels(options.magnitudeLevels ?? [], 'magnitudeLevels');
  const scope = safetyScopeForEclipse(eclipse.kind);
  const safetyShort = solarSafetyText('short', scope, options.solar);
  const features: Feature<Geometry>[] = [];
  const add = (properties: Record<string, unknown>, geometry: Geometry) =>
    features.push({ type: 'Feature', properties: { ...properties, safety: safetyShort }, geometry });

  const limits = pathLimits(eclipse);
  const central = centralLine(eclipse);
  const paths = pathRegions(eclipse, limits, central);
  for (const shadow of ['umbra', 'antumbra'] as const) {
    const region = roundedRegion(paths[shadow]);
    if (region.length > 0) add({ layer: 'path', shadow }, { type: 'MultiPolygon', coordinates: region } satisfies MultiPolygon);
  }

  for (const line of central) {
    for (const piece of splitByShadow(eclipse, line.points, line.times)) {
      add(
        { layer: 'central-line', shadow: piece.shadow, times: piece.extra.map((m) => isoSeconds(m.utDays)) },
        { type: 'LineString', coordinates: piece.points.map(roundedPoint) },
      );
    }
  }

  for (const side of ['north', 'south'] as const) {
    const byShadow: Record<SolarShadow, LonLat[][]> = { umbra: [], antumbra: [] };
    for (const line of limits[side]) {
      for (const piece of splitByShadow(eclipse, line, line)) byShadow[piece.shadow].push(piece.points);
    }
    for (const shadow of ['umbra', 'antumbra'] as const) {
      if (byShadow[shadow].length > 0) add({ layer: 'limit', shadow, side }, multiLine(byShadow[shadow]));
    }
  }

  const partial = partialLimits(eclipse);
  for (const side of ['north', 'south'] as const) {
    if (partial[side].length > 0) add({ layer: 'limit', shadow: 'penumbra', side }, multiLine(partial[side]));
  }

  const contour = (measure: 'obscuration' | 'magnitude', value: number, curves: NorthSouth) => {
    const lines = [...curves.north, ...curves.south];
    if (lines.length > 0) add({ layer: 'contour', [measure]: value }, multiLine(lines));
  };
  for (const o of obscurations) contour('obscuration', o, equalObscurationCurves(eclipse, o));
  for (const m of magnitudes) contour('magnitude', m, equalMagnitudeCurves(eclipse, m));

  for (const line of riseSetCurves(eclipse)) {
    add({ layer: 'rise-set', contact: line.contact, sun: line.sun }, { type: 'LineString', coordinates: line.points.map(roundedPoint) });
  }

  return {
    type: 'FeatureCollection',
    umbracast: {
      schema: SOLAR_GEOMETRY_SCHEMA,
      body: 'solar',
      eclipse: eclipse.id,
      kind: eclipse.kind,
      calendar: DATA_CALENDAR,
      deltaT: Math.round(eclipse.deltaT.seconds * 10) / 10,
      moonRadius: { penumbra: K_PENUMBRA, umbra: K_UMBRA },
      contours: 'at each place\'s maximum, the Sun up or not; the path where the Sun is up at maximum',
      safety: solarSafetyText('long', scope, options.solar),
    },
    features,
  };
}
