/**
 * Zones must differ in lightness, not only in hue (common practice for colour-blind readers and greyscale print), for every
 * theme, as seen by readers with protanopia, deuteranopia or tritanopia and
 * in greyscale print. Simulation: Machado, Oliveira & Fernandes (2009),
 * severity 1.0 matrices on linear sRGB (coefficients from memory);
 * lightness: CIE L* from sRGB (IEC 61966-2-1) relative luminance.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { THEMES, THEME_NAMES, type Theme } from '../../src/figures/theme.ts';
import { ZONE_ORDER } from '../../src/visibility/lunar/visibility.ts';

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

/** `top` painted over `bottom` at an opacity, in sRGB values as SVG renderers composite (SVG 1.1 §14.2, "source-over"). */
function over(bottomHex: string, topHex: string, opacity: number): string {
  const mix = (i: number) => {
    const b = parseInt(bottomHex.slice(i, i + 2), 16);
    const t = parseInt(topHex.slice(i, i + 2), 16);
    return Math.round(b * (1 - opacity) + t * opacity).toString(16).padStart(2, '0');
  };
  return `#${mix(1)}${mix(3)}${mix(5)}`;
}

/** A zone's colour where land is drawn over it (what most readers look at). */
const overLand = (theme: Theme, zoneHex: string) => over(zoneHex, theme.land, theme.landOpacity);

const MIN_LIGHTNESS_STEP = 8;
/** Land and sea inside one zone: a step readers see at a glance (from memory: about 5 L* reads as a distinct tone at map scale). */
const MIN_LAND_SEA_STEP = 5;

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
  test(`${name} theme: inside every zone land and sea differ by ≥ ${MIN_LAND_SEA_STEP} in L*, for normal, protan, deutan and tritan vision`, () => {
    for (const [vision, matrix] of Object.entries(SIMULATIONS)) {
      for (const zone of ZONE_ORDER) {
        const step = Math.abs(lightness(theme.zones[zone], matrix) - lightness(overLand(theme, theme.zones[zone]), matrix));
        assert.ok(step >= MIN_LAND_SEA_STEP, `${vision}, ${zone}: land vs sea ΔL* ${step.toFixed(1)}`);
      }
    }
  });
  test(`${name} theme: in every zone the coastline stands out more than the graticule (ΔL* against what lies under each)`, () => {
    for (const zone of ZONE_ORDER) {
      const sea = theme.zones[zone];
      const land = overLand(theme, sea);
      const standsOut = (ink: string, opacity: number, ground: string) => Math.abs(lightness(over(ground, ink, opacity), SIMULATIONS.normal!) - lightness(ground, SIMULATIONS.normal!));
      // A coastline runs between land and sea: it must stand out from at least one side well.
      const coast = Math.max(standsOut(theme.coastline, theme.coastlineOpacity, sea), standsOut(theme.coastline, theme.coastlineOpacity, land));
      // The graticule crosses both (under the land tint on land).
      const graticule = Math.max(standsOut(theme.graticule, theme.graticuleOpacity, sea), standsOut(over(theme.graticule, theme.land, theme.landOpacity), theme.graticuleOpacity, land));
      assert.ok(coast >= 10, `${zone}: coastline ΔL* ${coast.toFixed(1)}`);
      assert.ok(coast > graticule + 5, `${zone}: coastline ΔL* ${coast.toFixed(1)} vs graticule ${graticule.toFixed(1)}`);
    }
  });
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

/**
 * A solar map's stepped ramp (no eclipse, then each obscuration step, then the path) must read as ordered steps in
 * lightness for every simulated vision, at sea and under the land tint: adjacent steps at least this far apart
 * (from memory: about 5 L* reads as a distinct tone at map scale; one more for the ramp's seven steps).
 */
const MIN_RAMP_STEP = 6;
for (const name of THEME_NAMES) {
  const theme = THEMES[name];
  for (const [vision, matrix] of Object.entries(SIMULATIONS)) {
    test(`${name} theme: the solar ramp steps by ≥ ${MIN_RAMP_STEP} L* one way for ${vision} vision, over sea and land`, () => {
      const steps = [theme.zones['sees-none'], ...theme.solar.ramp, theme.solar.path];
      for (const surface of ['sea', 'land'] as const) {
        const values = steps.map((hex) => lightness(surface === 'sea' ? hex : overLand(theme, hex), matrix));
        const direction = Math.sign(values[1]! - values[0]!);
        for (let i = 1; i < values.length; i++) {
          const step = (values[i]! - values[i - 1]!) * direction;
          assert.ok(step >= MIN_RAMP_STEP, `${surface}: step ${i} ΔL* ${step.toFixed(1)}`);
        }
      }
    });
    test(`${name} theme: the solar central line stands out from the path it runs along for ${vision} vision`, () => {
      const step = Math.abs(lightness(theme.solar.centralLine, matrix) - lightness(theme.solar.path, matrix));
      // WCAG 2.x non-text contrast asks 3:1; in L* terms a gap of 40 is well beyond it (common practice).
      assert.ok(step >= 40, `ΔL* ${step.toFixed(1)}`);
    });
  }
}
