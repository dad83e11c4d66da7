/** The slice of astronomia (Meeus, Astronomical Algorithms ch. 54) that the tests use. */
declare module 'astronomia/eclipse' {
  interface LunarResult {
    type: number;
    jdeMax: number;
    magnitude: number;
    /** γ, Earth radii (Meeus ch. 54); absent when there is no eclipse. */
    distance?: number;
  }
  const eclipse: {
    TYPE: { None: number; Penumbral: number; Umbral: number; Total: number };
    lunar(year: number): LunarResult;
  };
  export default eclipse;
}
