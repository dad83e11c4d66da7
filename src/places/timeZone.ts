/** The IANA time zone at a point, from @photostructure/tz-lookup (CC0; timezone-boundary-builder data). */
import tzLookup from '@photostructure/tz-lookup';

export function timeZoneAt(latDeg: number, lonDeg: number): string {
  return tzLookup(latDeg, lonDeg);
}
