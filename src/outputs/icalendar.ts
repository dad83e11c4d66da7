/**
 * iCalendar text helpers (RFC 5545), for any local format that writes a
 * calendar. The solar local formats use them; the lunar ones
 * (localFormats.ts) keep private copies of the same two rules for now.
 */
import { isoSeconds, type Moment } from '../ephemeris/time.ts';

/** A UTC DATE-TIME value (RFC 5545 §3.3.5, form #2): 20240408T181500Z. */
export const icsTime = (moment: Moment): string => isoSeconds(moment.utDays).replace(/[-:]/g, '');

/** RFC 5545 §3.3.11: escape backslash, semicolon, comma and newlines in TEXT. */
export const icsText = (text: string): string => text.replace(/\\/g, '\\\\').replace(/;/g, '\\;').replace(/,/g, '\\,').replace(/\r?\n/g, '\\n');

/** RFC 5545 §3.1: lines longer than 75 octets are folded (CRLF + space), never inside a UTF-8 sequence. */
export function foldIcsLine(line: string): string {
  const out: string[] = [];
  let current = '';
  let octets = 0;
  for (const char of line) {
    const size = Buffer.byteLength(char);
    if (octets + size > (out.length === 0 ? 75 : 74)) {
      out.push(current);
      current = '';
      octets = 0;
    }
    current += char;
    octets += size;
  }
  out.push(current);
  return out.join('\r\n ');
}
