/**
 * Views of the Earth: a world equal-area map by default (Equal Earth),
 * equirectangular, an orthographic globe centred on the sub-lunar point at
 * greatest, and regional views (Lambert azimuthal equal-area fitted to a
 * bounding box, or to a centre and span).
 */
import {
  geoAzimuthalEqualArea,
  geoCircle,
  geoEqualEarth,
  geoEquirectangular,
  geoOrthographic,
  type GeoPermissibleObjects,
  type GeoProjection,
} from 'd3-geo';
import type { LonLat } from '../ephemeris/earth.ts';

export type ProjectionName = 'equal-earth' | 'equirectangular' | 'globe' | 'region';
export const PROJECTION_NAMES: readonly ProjectionName[] = ['equal-earth', 'equirectangular', 'globe', 'region'];

/** A bounding box: west, south, east, north, degrees; west > east crosses 180°. */
export type BoundingBox = readonly [west: number, south: number, east: number, north: number];

export type View =
  | { readonly projection: 'equal-earth' | 'equirectangular' }
  /** A globe looks down on `centre` (by default: where the story is, see storyCentre). */
  | { readonly projection: 'globe'; readonly centre?: LonLat }
  | { readonly projection: 'region'; readonly bbox: BoundingBox }
  | { readonly projection: 'region'; readonly centre: LonLat; readonly spanDeg: number };

export interface Frame {
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
}

export interface FittedView {
  readonly projection: GeoProjection;
  /** The outline of what is shown, for clipping and framing. */
  readonly outline: GeoPermissibleObjects;
  /** True when the view shows the whole Earth. */
  readonly world: boolean;
}

const SPHERE = { type: 'Sphere' } as const;

function bboxOutline([west, south, east, north]: BoundingBox): GeoPermissibleObjects {
  const span = east > west ? east - west : east + 360 - west;
  // Dense edges (every half degree): d3-geo's fit measures a shape at a small trial scale, where its adaptive
  // sampling would cut the bulge of a long meridian or parallel by a few pixels of the final map.
  const steps = Math.max(2, Math.ceil(span * 2));
  const sides = Math.max(2, Math.ceil((north - south) * 2));
  const northEdge = Array.from({ length: steps + 1 }, (_, i) => [west + (span * i) / steps, north]);
  const eastEdge = Array.from({ length: sides - 1 }, (_, i) => [west + span, north - ((north - south) * (i + 1)) / sides]);
  const southEdge = Array.from({ length: steps + 1 }, (_, i) => [west + span - (span * i) / steps, south]);
  const westEdge = Array.from({ length: sides - 1 }, (_, i) => [west, south + ((north - south) * (i + 1)) / sides]);
  // d3-geo winds polygons clockwise; this ring runs west→east along the north edge, then back along the south.
  return { type: 'Polygon', coordinates: [[...northEdge, ...eastEdge, ...southEdge, ...westEdge, northEdge[0]!]] };
}

export function bboxCentre([west, south, east, north]: BoundingBox): LonLat {
  const span = east > west ? east - west : east + 360 - west;
  const lon = west + span / 2;
  return [lon > 180 ? lon - 360 : lon, (south + north) / 2];
}

/**
 * Fit a view into a frame on the page. `focus` is the sub-lunar point at
 * greatest for flat world maps — centred on its meridian (to 5°), so that
 * where the eclipse is seen sits in the middle — and, for the globe, the
 * point it looks down on.
 */
export function fitView(view: View, frame: Frame, focus: LonLat): FittedView {
  const extent: [[number, number], [number, number]] = [[frame.x, frame.y], [frame.x + frame.width, frame.y + frame.height]];
  const centralMeridian = Math.round(focus[0] / 5) * 5;
  switch (view.projection) {
    case 'equal-earth':
      return { projection: geoEqualEarth().rotate([-centralMeridian, 0]).fitExtent(extent, SPHERE), outline: SPHERE, world: true };
    case 'equirectangular':
      return { projection: geoEquirectangular().rotate([-centralMeridian, 0]).fitExtent(extent, SPHERE), outline: SPHERE, world: true };
    case 'globe': {
      // The disc fills the frame's width up to 1.8 times its height; what would fall outside is cut at the frame.
      const diameter = Math.min(frame.width, frame.height * 1.8);
      const projection = geoOrthographic().rotate([-focus[0], -focus[1]]).scale(diameter / 2).translate([frame.x + frame.width / 2, frame.y + frame.height / 2]);
      if (diameter > frame.height) projection.clipExtent(extent);
      return { projection, outline: SPHERE, world: true };
    }
    case 'region': {
      const centre = 'bbox' in view ? bboxCentre(view.bbox) : view.centre;
      const projection = geoAzimuthalEqualArea().rotate([-centre[0], -centre[1]]).clipAngle(150);
      if ('bbox' in view) {
        // The box fills the frame in its longer direction; the page lays the frame out to the box's shape.
        const target = bboxOutline(view.bbox);
        projection.fitExtent(extent, target).clipExtent(extent);
        return { projection, outline: target, world: false };
      }
      // A span is the width across the frame, edge to edge through the centre: a point at
      // angular distance c from the centre lies 2·sin(c/2) radii from it (Lambert azimuthal
      // equal-area; Snyder, Map Projections — A Working Manual, eq. 24-1). The height follows the frame's shape.
      const halfSpanRad = (view.spanDeg / 2) * (Math.PI / 180);
      projection
        .scale(frame.width / 2 / (2 * Math.sin(halfSpanRad / 2)))
        .translate([frame.x + frame.width / 2, frame.y + frame.height / 2])
        .clipExtent(extent);
      return { projection, outline: geoCircle().center([centre[0], centre[1]]).radius(view.spanDeg / 2)(), world: false };
    }
  }
}

/** Pixels per degree of longitude at the centre of the view: what decides basemap detail. */
export function pixelsPerDegree(fitted: FittedView): number {
  return (fitted.projection.scale() * Math.PI) / 180;
}
