/** The slice of astronomia (Meeus, Astronomical Algorithms ch. 54) that the tests use. */
declare module 'astronomia/eclipse' {
  interface LunarResult {
    type: number;
    jdeMax: number;
    magnitude: number;
    /** γ, Earth radii (Meeus ch. 54); absent when there is no eclipse. */
    distance?: number;
  }
  interface SolarResult {
    type: number;
    /** γ, Earth radii (Meeus ch. 54); absent when there is no eclipse. */
    distance?: number;
    /** The penumbra's radius on the fundamental plane, u + 0.5461, Earth radii; absent when there is no eclipse. */
    penumbral?: number;
  }
  const eclipse: {
    TYPE: { None: number; Penumbral: number; Umbral: number; Total: number };
    lunar(year: number): LunarResult;
    solar(year: number): SolarResult;
  };
  export default eclipse;
}
