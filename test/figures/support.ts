/** Rendering helpers for the map tests. */
import { findLunarEclipses } from '../../src/eclipses/lunar/catalogue.ts';
import type { LunarEclipse } from '../../src/eclipses/lunar/types.ts';
import { civilClock } from '../../src/ephemeris/civilTime.ts';
import type { BorderStyle } from '../../src/sphere/world.ts';
import type { View } from '../../src/figures/projection.ts';
import { THEMES, type ThemeName } from '../../src/figures/theme.ts';
import { renderMapFile, type MapFormat } from '../../src/outputs/mapFile.ts';

export function eclipseOn(date: string): LunarEclipse {
  const [e] = findLunarEclipses({ from: new Date(`${date}T00:00:00Z`), to: new Date(`${date}T23:59:59Z`) });
  if (!e) throw new Error(`no eclipse on ${date}`);
  return e;
}

export interface RenderOptions {
  date?: string;
  theme?: ThemeName;
  width?: number;
  height?: number;
  format?: MapFormat;
  view?: View;
  borders?: BorderStyle;
  title?: string;
  tz?: string;
  dpi?: number;
  areaNames?: boolean;
}

export async function render(options: RenderOptions = {}) {
  return renderMapFile({
    eclipse: eclipseOn(options.date ?? '2026-03-03'),
    style: {
      theme: THEMES[options.theme ?? 'light'],
      view: options.view ?? { projection: 'equal-earth' },
      borders: options.borders ?? 'countries',
      clock: civilClock(options.tz ?? 'UTC'),
      ...(options.title !== undefined ? { title: options.title } : {}),
      ...(options.areaNames !== undefined ? { areaNames: options.areaNames } : {}),
    },
    size: { widthPx: options.width ?? 1200, heightPx: options.height ?? 675 },
    dpi: options.dpi ?? 72,
    format: options.format ?? 'png',
    generator: 'umbracast test',
  });
}
