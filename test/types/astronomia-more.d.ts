/** The slices of astronomia (Meeus, Astronomical Algorithms) used to check local altitudes. */
declare module 'astronomia/moonposition' {
  const moonposition: { position(jde: number): { lon: number; lat: number; range: number } };
  export default moonposition;
}
declare module 'astronomia/nutation' {
  const nutation: { nutation(jde: number): [number, number]; meanObliquity(jde: number): number };
  export default nutation;
}
declare module 'astronomia/sidereal' {
  const sidereal: { apparent(jd: number): number };
  export default sidereal;
}
declare module 'astronomia/coord' {
  export class Ecliptic {
    constructor(lon: number, lat: number);
    toEquatorial(obliquity: number): { ra: number; dec: number };
  }
}
declare module 'astronomia/globe' {
  const globe: { Earth76: { parallaxConstants(latRad: number, heightM: number): [number, number] } };
  export default globe;
}
declare module 'astronomia/parallax' {
  const parallax: { topocentric(c: { ra: number; dec: number; range: number }, rhoSinPhi: number, rhoCosPhi: number, lonWestRad: number, jd: number): { ra: number; dec: number } };
  export default parallax;
}
declare module 'astronomia/refraction' {
  const refraction: { saemundsson(trueAltitudeRad: number): number; bennett(apparentAltitudeRad: number): number };
  export default refraction;
}
declare module 'astronomia/julian' {
  interface CalendarDay { year: number; month: number; day: number }
  const julian: {
    JDToCalendarJulian(jd: number): CalendarDay;
    JDToCalendarGregorian(jd: number): CalendarDay;
    CalendarJulianToJD(year: number, month: number, day: number): number;
    CalendarGregorianToJD(year: number, month: number, day: number): number;
  };
  export default julian;
}
