/**
 * Map themes. Zone fills step in lightness (not only in hue), so that the
 * zones stay apart in greyscale print and for readers with a colour-vision
 * deficiency; pinned by a simulation in test/figures/theme.test.ts.
 */
import type { SkyClass } from '../local/lunar.ts';
import type { ZoneName } from '../visibility/lunar/visibility.ts';

export type ThemeName = 'light' | 'dark' | 'print';
export const THEME_NAMES: readonly ThemeName[] = ['light', 'dark', 'print'];

export interface Theme {
  readonly name: ThemeName;
  /** Page behind everything. */
  readonly paper: string;
  readonly zones: Readonly<Record<ZoneName, string>>;
  /**
   * Land is drawn over the zone fills in this colour at `landOpacity`: a
   * tint that moves every zone the same way in lightness (darker in the
   * light themes, lighter in the dark one), so that land and sea stay apart
   * inside every zone and the zones stay apart on land and at sea.
   */
  readonly land: string;
  readonly landOpacity: number;
  readonly border: string;
  /** Coastlines are drawn above the graticule, and stand out more than it in every zone (test/figures/theme.test.ts). */
  readonly coastline: string;
  readonly coastlineOpacity: number;
  readonly graticule: string;
  readonly graticuleOpacity: number;
  /** Where the body rises or sets at the start and end of the phase that defines the zones. */
  readonly boundaryStrong: string;
  /** Where it rises or sets at the other stages. */
  readonly boundaryLight: string;
  /** Lines of the continuous field. */
  readonly field: string;
  /** The point under the body at greatest. */
  readonly centreMark: string;
  readonly text: string;
  readonly textMuted: string;
  /** Halo behind map labels. */
  readonly halo: string;
  readonly haloOpacity: number;
  /** The "view from here" figure: the sky's brightness behind the body's track. */
  readonly sky: Readonly<Record<SkyClass, string>>;
  readonly ground: string;
  /** Drawn under the body's track on every sky: it shows where the track's own colour would not. */
  readonly trackCasing: string;
  /** The body's track across the sky, by phase. */
  readonly track: Readonly<Record<'outside' | 'penumbral' | 'partial' | 'total', string>>;
  /** The solar map's colours. */
  readonly solar: SolarMapColours;
}

/**
 * A solar map: the partial region shaded by the greatest obscuration seen,
 * one fill per step of SOLAR_RAMP_LEVELS (a stepped ramp away from the
 * paper-like `zones['sees-none']`, in lightness, on land and at sea), the
 * total/annular path above it, and the lines.
 */
export interface SolarMapColours {
  /** Fills for obscuration above 0, 0.2, 0.4, 0.6, 0.8. */
  readonly ramp: readonly [string, string, string, string, string];
  /** The total/annular path. */
  readonly path: string;
  /** The central line (drawn on a casing of `centralCasing`, so that it shows on the path). */
  readonly centralLine: string;
  readonly centralCasing: string;
  /** Northern and southern limits of the path. */
  readonly pathLimit: string;
  /** Limits of the partial eclipse. */
  readonly partialLimit: string;
  /** Curves of equal obscuration. */
  readonly contour: string;
  /** Where the eclipse begins or ends at sunrise or sunset. */
  readonly riseSet: string;
}

/** The obscuration steps of the ramp (lower bounds): the partial region's fills and its labelled contours. */
export const SOLAR_RAMP_LEVELS: readonly number[] = [0, 0.2, 0.4, 0.6, 0.8];

export const THEMES: Readonly<Record<ThemeName, Theme>> = {
  light: {
    name: 'light',
    paper: '#faf8f3',
    zones: { 'sees-all': '#2f3f7a', 'sets-during': '#6d78b0', 'rises-during': '#a9c4d6', 'sees-none': '#eef0f2' },
    land: '#000000',
    landOpacity: 0.25,
    border: '#ffffff',
    coastline: '#7d8696',
    coastlineOpacity: 0.85,
    graticule: '#8a93a3',
    graticuleOpacity: 0.3,
    boundaryStrong: '#10152b',
    boundaryLight: '#3a4259',
    field: '#b8581c',
    centreMark: '#f0b429',
    text: '#161a26',
    textMuted: '#4b5263',
    halo: '#faf8f3',
    haloOpacity: 0.85,
    sky: { day: '#e7eef5', civil: '#c3d0e2', nautical: '#8c9dbd', astronomical: '#56658c', night: '#2b3457' },
    ground: '#d9d3c4',
    trackCasing: '#161a26',
    track: { outside: '#8a93a3', penumbral: '#f3e3b0', partial: '#f0b429', total: '#d1495b' },
    solar: {
      ramp: ['#ecd3a0', '#dcaa6e', '#c8834f', '#a65a3a', '#7a3529'],
      path: '#2b1838',
      centralLine: '#fff4d6',
      centralCasing: '#2b1838',
      pathLimit: '#2b1838',
      partialLimit: '#5a3a20',
      contour: '#4a2a18',
      riseSet: '#1f3b73',
    },
  },
  dark: {
    name: 'dark',
    paper: '#0d111b',
    zones: { 'sees-all': '#cdb783', 'sets-during': '#9080bd', 'rises-during': '#43677e', 'sees-none': '#1b2231' },
    land: '#ffffff',
    landOpacity: 0.24,
    border: '#0d111b',
    coastline: '#e4e8f0',
    coastlineOpacity: 0.8,
    graticule: '#59627a',
    graticuleOpacity: 0.2,
    boundaryStrong: '#f5f1e6',
    boundaryLight: '#c9cedb',
    field: '#ff9a5c',
    centreMark: '#ffd166',
    text: '#f1f3f8',
    textMuted: '#b4bccb',
    halo: '#0d111b',
    haloOpacity: 0.8,
    sky: { day: '#3b4a66', civil: '#2c3852', nautical: '#1f2840', astronomical: '#161d30', night: '#0d111b' },
    ground: '#252a33',
    trackCasing: '#05070c',
    track: { outside: '#8a93a3', penumbral: '#f3e3b0', partial: '#ffd166', total: '#ff7b7b' },
    solar: {
      ramp: ['#363a57', '#57506e', '#806479', '#ab7f77', '#d6ab78'],
      path: '#f7eab8',
      centralLine: '#0d111b',
      centralCasing: '#f7eab8',
      pathLimit: '#f7eab8',
      partialLimit: '#e8d7b0',
      contour: '#f1e6cf',
      riseSet: '#8fc1ff',
    },
  },
  print: {
    name: 'print',
    paper: '#ffffff',
    zones: { 'sees-all': '#4a4a4a', 'sets-during': '#8c8c8c', 'rises-during': '#bdbdbd', 'sees-none': '#f0f0f0' },
    land: '#000000',
    landOpacity: 0.22,
    border: '#ffffff',
    coastline: '#000000',
    coastlineOpacity: 0.8,
    graticule: '#777777',
    graticuleOpacity: 0.3,
    boundaryStrong: '#000000',
    boundaryLight: '#222222',
    field: '#000000',
    centreMark: '#000000',
    text: '#000000',
    textMuted: '#333333',
    halo: '#ffffff',
    haloOpacity: 0.85,
    sky: { day: '#f4f4f4', civil: '#dcdcdc', nautical: '#bdbdbd', astronomical: '#9a9a9a', night: '#7a7a7a' },
    ground: '#e6e6e6',
    trackCasing: '#000000',
    track: { outside: '#9a9a9a', penumbral: '#ffffff', partial: '#444444', total: '#000000' },
    solar: {
      ramp: ['#d8d8d8', '#bcbcbc', '#9f9f9f', '#818181', '#636363'],
      path: '#1e1e1e',
      centralLine: '#ffffff',
      centralCasing: '#000000',
      pathLimit: '#000000',
      partialLimit: '#000000',
      contour: '#111111',
      riseSet: '#000000',
    },
  },
};
