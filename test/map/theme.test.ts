/**
 * Zones must differ in lightness, not only in hue (common practice for colour-blind readers and greyscale print), for every
 * theme, as seen by readers with protanopia, deuteranopia or tritanopia and
 * in greyscale print. Simulation: Machado, Oliveira & Fernandes (2009),
 * severity 1.0 matrices on linear sRGB (coefficients from memory);
 * lightness: CIE L* from sRGB (IEC 61966-2-1) relative luminance.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { THEMES, THEME_NAMES, type Theme } from '../../src/map/theme.ts';
import { ZONE_ORDER } from '../../src/visibility/visibility.ts';

type Matrix = readonly [readonly number[], readonly number[], readonly number[]];
const SIMULATIONS: Record<string, Matrix> = {
  normal: [[1, 0, 0], [0, 1, 0], [0, 0, 1]],
  protanopia: [[0.152286, 1.052583, -0.204868], [0.114503, 0.786281, 0.099216], [-0.003882, -0.048116, 1.051998]],
  deuteranopia: [[0.367322, 0.860646, -0.227968], [0.280085, 0.672501, 0.047413], [-0.01182, 0.04294, 0.968881]],
  tritanopia: [[1.255528, -0.076749, -0.178779], [-0.078411, 0.930809, 0.147602], [0.004733, 0.691367, 0.3039]],
};

const toLinear = (c: number) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4);
const hexToLinear = (hex: string) => [1, 3, 5].map((i) => toLinear(parseInt(hex.slice(i, i + 2), 16) / 255));

function lightness(hex: string, matrix: Matrix): number {
  const rgb = hexToLinear(hex);
  const [r, g, b] = matrix.map((row) => Math.min(1, Math.max(0, row[0]! * rgb[0]! + row[1]! * rgb[1]! + row[2]! * rgb[2]!))) as [number, number, number];
  const y = 0.2126 * r + 0.7152 * g + 0.0722 * b;
  return y > 216 / 24389 ? 116 * Math.cbrt(y) - 16 : (24389 / 27) * y;
}

/** A zone's colour where land is drawn over it (what most readers look at). */
function overLand(theme: Theme, zoneHex: string): string {
  const mix = (i: number) => {
    const z = parseInt(zoneHex.slice(i, i + 2), 16);
    const l = parseInt(theme.land.slice(i, i + 2), 16);
    return Math.round(z * (1 - theme.landOpacity) + l * theme.landOpacity).toString(16).padStart(2, '0');
  };
  return `#${mix(1)}${mix(3)}${mix(5)}`;
}

const MIN_LIGHTNESS_STEP = 8;

for (const name of THEME_NAMES) {
  const theme = THEMES[name];
  for (const [vision, matrix] of Object.entries(SIMULATIONS)) {
    test(`${name} theme: zones differ by ≥ ${MIN_LIGHTNESS_STEP} in L* for ${vision} vision, over sea and over land`, () => {
      for (const surface of ['sea', 'land'] as const) {
        const values = ZONE_ORDER.map((zone) => {
          const hex = surface === 'sea' ? theme.zones[zone] : overLand(theme, theme.zones[zone]);
          return { zone, l: lightness(hex, matrix) };
        });
        for (let i = 0; i < values.length; i++) {
          for (let j = i + 1; j < values.length; j++) {
            const step = Math.abs(values[i]!.l - values[j]!.l);
            assert.ok(step >= MIN_LIGHTNESS_STEP, `${surface}: ${values[i]!.zone} vs ${values[j]!.zone}: ΔL* ${step.toFixed(1)}`);
          }
        }
      }
    });
  }
  test(`${name} theme: text stands out from the paper (WCAG 2.x contrast ≥ 4.5)`, () => {
    const luminance = (hex: string) => {
      const [r, g, b] = hexToLinear(hex) as [number, number, number];
      return 0.2126 * r + 0.7152 * g + 0.0722 * b;
    };
    for (const ink of [theme.text, theme.textMuted]) {
      const [a, b] = [luminance(ink), luminance(theme.paper)].sort((x, y) => y - x) as [number, number];
      assert.ok((a + 0.05) / (b + 0.05) >= 4.5, `${ink} on ${theme.paper}`);
    }
  });
}
