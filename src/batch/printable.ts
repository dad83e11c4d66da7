/**
 * Text from outside (file names, style keys, paths in a manifest) made safe
 * for one line of a terminal: line breaks, other control characters (C0, DEL,
 * C1, which carry terminal escape sequences) and the invisible direction
 * marks that reorder a line (Unicode bidi controls, UAX #9) are shown as
 * escapes (\n, \u001b, \u202e) instead of acting.
 */
const UNPRINTABLE = /[\u0000-\u001f\u007f-\u009f\u061c\u200e\u200f\u2028\u2029\u202a-\u202e\u2066-\u2069]/g;
const SHORT: Record<string, string> = { '\n': '\\n', '\r': '\\r', '\t': '\\t' };

export function printable(text: string): string {
  return text.replace(UNPRINTABLE, (c) => SHORT[c] ?? `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`);
}
