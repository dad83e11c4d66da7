/**
 * The shadow diagram's geometry: the Moon's centre against the Earth's shadow, as plain data.
 *
 * Seen from the Earth's centre, each instant's Moon is placed by its angle from the shadow axis
 * (the anti-Sun direction) and the direction of that angle on the sky, measured in the plane
 * tangent to the sky at the axis: north towards the celestial pole of date (true equator of
 * date, IAU 2006 precession and IAU 2000B nutation through astronomy-engine), east towards
 * increasing right ascension. Distances from the axis are the true angles (an azimuthal
 * equidistant view centred on the axis), so a contact sits exactly on its circle: the Moon's
 * limb on a shadow's edge (Explanatory Supplement to the Astronomical Almanac, 3rd ed., ch. 11).
 * The axis itself moves about 2.5′ an hour along the ecliptic; the diagram, as is common
 * practice, keeps the shadow still and shows the Moon's motion relative to it.
 */
import { Rotation_EQD_EQJ, RotateVector, Vector } from 'astronomy-engine';
import { ephemerisTime } from '../../ephemeris/bodies.ts';
import { momentFromTT, type Moment } from '../../ephemeris/time.ts';
import { angleBetween, cross, dot, norm, scale, unit, type Vec3 } from '../../ephemeris/vector.ts';
import { CONTACT_ORDER, type ContactName } from './contacts.ts';
import { shadowConvention, type ShadowRadii } from './conventions.ts';
import { sampleShadowTrack, type ShadowState, type ShadowTrack } from './track.ts';
import type { LunarEclipse } from './types.ts';

/** The Moon's centre relative to the shadow axis on the sky, radians; + east, + north. */
export interface SkyOffset {
  readonly eastRad: number;
  readonly northRad: number;
}

/** One Moon drawn on the diagram: where, when, and how large, with the shadow's radii at that instant. */
export interface DiagramMoon {
  readonly moment: Moment;
  readonly offset: SkyOffset;
  readonly moonSemiDiameterRad: number;
  readonly radii: ShadowRadii;
}

export interface ShadowDiagram {
  readonly eclipse: LunarEclipse;
  /** The convention's radii at greatest: the circles drawn. */
  readonly radii: ShadowRadii;
  /** The Moon's equatorial horizontal parallax at greatest: gamma's unit. */
  readonly moonParallaxRad: number;
  readonly greatest: DiagramMoon;
  /** The contacts that occur, in order. */
  readonly contacts: readonly (DiagramMoon & { readonly name: ContactName })[];
  /** The Moon's centre from before P1 to after P4, every PATH_STEP_MINUTES. */
  readonly path: readonly (SkyOffset & { readonly ttDays: number })[];
}

/** Half a window of ten hours: the longest penumbral phase (≈ 6 h 20 min) fits with room either side. */
const WINDOW_HALF_DAYS = 5 / 24;
/** The path runs this long before P1 and after P4, so that the Moon is seen entering and leaving. */
export const PATH_MARGIN_MINUTES = 20;
export const PATH_STEP_MINUTES = 4;

/** The celestial pole of date, as a unit vector in EQJ (the frame of the ephemeris positions). */
export function poleOfDate(ttDays: number): Vec3 {
  const time = ephemerisTime(ttDays);
  const v = RotateVector(Rotation_EQD_EQJ(time), new Vector(0, 0, 1, time));
  return [v.x, v.y, v.z];
}

/** The Moon's centre on the sky relative to the shadow axis at one state, north toward `pole`. */
export function skyOffset(state: ShadowState, pole: Vec3): SkyOffset {
  const axis = scale(unit(state.sunPositionKm), -1);
  const moon = unit(state.moonPositionKm);
  // East: along increasing right ascension (pole × axis); north completes the frame.
  const east = unit(cross(pole, axis));
  const north = cross(axis, east);
  const along = dot(moon, axis);
  const across: Vec3 = [moon[0] - along * axis[0], moon[1] - along * axis[1], moon[2] - along * axis[2]];
  const separationRad = angleBetween(moon, axis);
  const acrossLength = norm(across);
  if (acrossLength === 0) return { eastRad: 0, northRad: 0 };
  return { eastRad: (separationRad * dot(across, east)) / acrossLength, northRad: (separationRad * dot(across, north)) / acrossLength };
}

/** The diagram of one eclipse: its shadow circles at greatest, the Moon at greatest and at each contact, and its path. */
export function shadowDiagram(eclipse: LunarEclipse, track: ShadowTrack = trackAround(eclipse)): ShadowDiagram {
  const convention = shadowConvention(eclipse.convention);
  const pole = poleOfDate(eclipse.greatest.ttDays);
  const deltaTSeconds = eclipse.greatest.deltaTSeconds;
  const moonAt = (ttDays: number): DiagramMoon => {
    const state = track.at(ttDays);
    return { moment: momentFromTT(ttDays, deltaTSeconds), offset: skyOffset(state, pole), moonSemiDiameterRad: state.moonSemiDiameterRad, radii: convention.radii(state) };
  };
  const greatestState = track.at(eclipse.greatest.ttDays);
  const contacts = CONTACT_ORDER.flatMap((name) => {
    const moment = eclipse.contacts[name];
    return moment ? [{ ...moonAt(moment.ttDays), name }] : [];
  });
  const startTT = eclipse.contacts.P1!.ttDays - PATH_MARGIN_MINUTES / 1440;
  const endTT = eclipse.contacts.P4!.ttDays + PATH_MARGIN_MINUTES / 1440;
  const steps = Math.ceil(((endTT - startTT) * 1440) / PATH_STEP_MINUTES);
  const path = Array.from({ length: steps + 1 }, (_, i) => {
    const ttDays = startTT + ((endTT - startTT) * i) / steps;
    return { ttDays, ...skyOffset(track.at(ttDays), pole) };
  });
  return {
    eclipse,
    radii: convention.radii(greatestState),
    moonParallaxRad: greatestState.moonParallaxRad,
    greatest: moonAt(eclipse.greatest.ttDays),
    contacts,
    path,
  };
}

/** A fresh ten-hour track centred on greatest (nine ephemeris calls). */
export function trackAround(eclipse: LunarEclipse): ShadowTrack {
  const tt = eclipse.greatest.ttDays;
  return sampleShadowTrack(tt - WINDOW_HALF_DAYS, tt + WINDOW_HALF_DAYS);
}
