/**
 * Map themes. Zone fills step in lightness (not only in hue), so that the
 * zones stay apart in greyscale print and for readers with a colour-vision
 * deficiency; pinned by a simulation in test/map/theme.test.ts.
 */
import type { ZoneName } from '../visibility/visibility.ts';

export type ThemeName = 'light' | 'dark' | 'print';
export const THEME_NAMES: readonly ThemeName[] = ['light', 'dark', 'print'];

export interface Theme {
  readonly name: ThemeName;
  /** Page behind everything. */
  readonly paper: string;
  readonly zones: Readonly<Record<ZoneName, string>>;
  /** Land is drawn over the zone fills in this colour at `landOpacity`. */
  readonly land: string;
  readonly landOpacity: number;
  readonly border: string;
  readonly coastline: string;
  readonly graticule: string;
  /** Moon-up edges at the start and end of the zone-defining phase. */
  readonly edgeStrong: string;
  /** Moon-up edges at the other stages. */
  readonly edgeLight: string;
  /** Lines of the continuous field. */
  readonly field: string;
  readonly marker: string;
  readonly text: string;
  readonly textMuted: string;
  /** Halo behind map labels. */
  readonly halo: string;
  readonly haloOpacity: number;
}

export const THEMES: Readonly<Record<ThemeName, Theme>> = {
  light: {
    name: 'light',
    paper: '#faf8f3',
    zones: { 'sees-all': '#27366b', 'sets-during': '#6d78b0', 'rises-during': '#a9c4d6', 'sees-none': '#eef0f2' },
    land: '#ffffff',
    landOpacity: 0.3,
    border: '#ffffff',
    coastline: '#5d6470',
    graticule: '#8a93a3',
    edgeStrong: '#10152b',
    edgeLight: '#3a4259',
    field: '#b8581c',
    marker: '#f0b429',
    text: '#161a26',
    textMuted: '#4b5263',
    halo: '#faf8f3',
    haloOpacity: 0.85,
  },
  dark: {
    name: 'dark',
    paper: '#0d111b',
    zones: { 'sees-all': '#e9d8a6', 'sets-during': '#9a86c9', 'rises-during': '#43677e', 'sees-none': '#1b2231' },
    land: '#ffffff',
    landOpacity: 0.12,
    border: '#0d111b',
    coastline: '#9aa3b5',
    graticule: '#59627a',
    edgeStrong: '#f5f1e6',
    edgeLight: '#c9cedb',
    field: '#ff9a5c',
    marker: '#ffd166',
    text: '#f1f3f8',
    textMuted: '#b4bccb',
    halo: '#0d111b',
    haloOpacity: 0.8,
  },
  print: {
    name: 'print',
    paper: '#ffffff',
    zones: { 'sees-all': '#4a4a4a', 'sets-during': '#8c8c8c', 'rises-during': '#bdbdbd', 'sees-none': '#f0f0f0' },
    land: '#ffffff',
    landOpacity: 0.28,
    border: '#ffffff',
    coastline: '#222222',
    graticule: '#777777',
    edgeStrong: '#000000',
    edgeLight: '#222222',
    field: '#000000',
    marker: '#000000',
    text: '#000000',
    textMuted: '#333333',
    halo: '#ffffff',
    haloOpacity: 0.85,
  },
};
