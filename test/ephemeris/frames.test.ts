/**
 * The one EQJ → EQD rotation (ephemeris/frames.ts) and the one bisection
 * (ephemeris/roots.ts) that every stage shares.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import coord from 'astronomia/coord';
import precess from 'astronomia/precess';
import nutation from 'astronomia/nutation';
import { ephemerisTime, moonPositionKm } from '../../src/ephemeris/bodies.ts';
import { equatorOfDateRotation, toEquatorOfDate } from '../../src/ephemeris/frames.ts';
import { bisectSignChange, narrowBracket } from '../../src/ephemeris/roots.ts';

const DEG = Math.PI / 180;
const JD_J2000 = 2451545;

function separationArcsec(ra1: number, dec1: number, ra2: number, dec2: number): number {
  const cos = Math.sin(dec1) * Math.sin(dec2) + Math.cos(dec1) * Math.cos(dec2) * Math.cos(ra1 - ra2);
  return (Math.acos(Math.min(1, cos)) / DEG) * 3600;
}

test('a fixed J2000 direction turned to the true equator of date agrees with astronomia (Meeus, Astronomical Algorithms ch. 21 precession, ch. 22 nutation) within 0.1″ + 0.45″ a century from 2000, 1000–3000', () => {
  // Meeus's precession (Lieske et al. 1977, general precession 5029.0966″ a century) runs 0.30″ a century faster than the
  // IAU 2006 value (5028.796195″) astronomy-engine uses, so the two part steadily away from J2000: measured 0.08″ in 2024,
  // 0.35″ in 1900, 2.2″ in 1000, 3.9″ in 3000.
  for (const [raDeg, decDeg] of [[0, 0], [101.3, -16.7], [279.2, 38.8], [37.9, 89.3], [200, -60]] as const) {
    for (const year of [1000, 1500, 1700, 1900, 2024, 2100, 2300, 2500, 3000]) {
      const ttDays = (year - 2000) * 365.25;
      const time = ephemerisTime(ttDays);
      const ra0 = raDeg * DEG;
      const dec0 = decDeg * DEG;
      const [x, y, z] = toEquatorOfDate([Math.cos(dec0) * Math.cos(ra0), Math.cos(dec0) * Math.sin(ra0), Math.sin(dec0)], time);
      const jde = ttDays + JD_J2000;
      const mean = precess.position(new coord.Equatorial(ra0, dec0), 2000, 2000 + ttDays / 365.25, 0, 0);
      const [dPsi, dEps] = nutation.nutation(jde);
      const eps0 = nutation.meanObliquity(jde);
      const ecl = mean.toEcliptic(eps0);
      const meeus = new coord.Ecliptic(ecl.lon + dPsi, ecl.lat).toEquatorial(eps0 + dEps);
      const off = separationArcsec(Math.atan2(y, x), Math.atan2(z, Math.hypot(x, y)), meeus.ra, meeus.dec);
      assert.ok(off < 0.1 + 0.45 * Math.abs(year - 2000) / 100, `${raDeg}°, ${decDeg}° in ${year}: ${off.toFixed(3)}″`);
    }
  }
});

test('a rotation computed once and passed in gives the same bits as one computed per call, and keeps lengths (a rotation: common practice)', () => {
  const time = ephemerisTime(9230.5);
  const v = moonPositionKm(time);
  const once = toEquatorOfDate(v, time, equatorOfDateRotation(time));
  assert.deepEqual(once, toEquatorOfDate(v, time));
  assert.ok(Math.abs(Math.hypot(...once) - Math.hypot(...v)) < 1e-9);
});

test('narrowBracket closes on the edge of a region from either side, and bisectSignChange on a root (π/2 for cos: common knowledge)', () => {
  const up = narrowBracket(0, 3, (t) => Math.cos(t) > 0, 1e-12);
  assert.ok(up.inside < Math.PI / 2 && up.outside >= Math.PI / 2 && up.outside - up.inside <= 1e-12);
  const down = narrowBracket(3, 0, (t) => Math.cos(t) <= 0, 1e-12);
  assert.ok(down.inside >= Math.PI / 2 && down.outside < Math.PI / 2 && down.inside - down.outside <= 1e-12);
  assert.ok(Math.abs(bisectSignChange(Math.cos, 0, 3, 1, 1e-12) - Math.PI / 2) < 1e-12);
  assert.ok(Math.abs(bisectSignChange((t) => -Math.cos(t), 0, 3, -1, 1e-12) - Math.PI / 2) < 1e-12);
  // An empty bracket is returned as it came, the predicate never asked.
  assert.deepEqual(narrowBracket(1, 1, () => assert.fail('asked'), 1e-9), { inside: 1, outside: 1 });
});
