/** The slices of astronomia (Meeus, Astronomical Algorithms ch. 13, 21) used to check the EQJ → EQD rotation. */
declare module 'astronomia/coord' {
  export class Equatorial {
    constructor(ra: number, dec: number);
    ra: number;
    dec: number;
    toEcliptic(obliquity: number): { lon: number; lat: number };
  }
}
declare module 'astronomia/precess' {
  import type { Equatorial } from 'astronomia/coord';
  const precess: { position(eqFrom: Equatorial, epochFrom: number, epochTo: number, mRa: number, mDec: number): Equatorial };
  export default precess;
}
