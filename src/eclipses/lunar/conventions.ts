/**
 * How big the Earth's shadow is at the Moon's distance (Danjon 1951; Chauvenet, Manual of Spherical and Practical
 * Astronomy, 1891; Explanatory Supplement to the Astronomical Almanac, 3rd ed., ch. 11).
 * The atmosphere makes the shadow larger than pure geometry; two published
 * conventions say by how much.
 */

export type ShadowConventionName = 'danjon' | 'chauvenet';
export const SHADOW_CONVENTIONS: readonly ShadowConventionName[] = ['danjon', 'chauvenet'];

/** Angles seen from the Earth's centre, radians. */
export interface ShadowInputs {
  readonly moonParallaxRad: number;
  readonly sunParallaxRad: number;
  readonly sunSemiDiameterRad: number;
}

export interface ShadowRadii {
  readonly penumbraRad: number;
  readonly umbraRad: number;
}

export interface ShadowConvention {
  readonly name: ShadowConventionName;
  readonly citation: string;
  radii(inputs: ShadowInputs): ShadowRadii;
}

export const danjon: ShadowConvention = {
  name: 'danjon',
  citation: 'Danjon (1951): 1.01 π_M + π_S ± s_S',
  radii: ({ moonParallaxRad, sunParallaxRad, sunSemiDiameterRad }) => ({
    penumbraRad: 1.01 * moonParallaxRad + sunParallaxRad + sunSemiDiameterRad,
    umbraRad: 1.01 * moonParallaxRad + sunParallaxRad - sunSemiDiameterRad,
  }),
};

export const chauvenet: ShadowConvention = {
  name: 'chauvenet',
  citation: 'Chauvenet (1891): 1.02 (0.998340 π_M + π_S ± s_S)',
  radii: ({ moonParallaxRad, sunParallaxRad, sunSemiDiameterRad }) => ({
    penumbraRad: 1.02 * (0.99834 * moonParallaxRad + sunParallaxRad + sunSemiDiameterRad),
    umbraRad: 1.02 * (0.99834 * moonParallaxRad + sunParallaxRad - sunSemiDiameterRad),
  }),
};

export function shadowConvention(name: ShadowConventionName): ShadowConvention {
  return name === 'chauvenet' ? chauvenet : danjon;
}
