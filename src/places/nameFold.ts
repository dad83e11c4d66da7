/**
 * Name keys: a place name folded so that the ways people write it compare
 * equal. Case, accents and punctuation are dropped ("Saint-Étienne" and
 * "saint etienne" give one key), letters NFKD leaves alone are spelt out
 * (ß → ss, ø → o, ł → l, æ → ae), other scripts keep their letters less
 * their marks (Кёльн → кельн).
 *
 * The fold works on UTF-8 bytes, one field at a time, so that the whole
 * gazetteer (32 MB) folds in one pass without a string per name; a query is
 * folded by the same function, so both sides always agree.
 */

/** What NFKD leaves as a letter of its own, spelt the way English text writes it without accents. */
const SPELT_OUT: Record<string, string> = {
  'ß': 'ss', 'ẞ': 'ss', 'æ': 'ae', 'Æ': 'ae', 'œ': 'oe', 'Œ': 'oe', 'ø': 'o', 'Ø': 'o', 'ł': 'l', 'Ł': 'l',
  'đ': 'd', 'Đ': 'd', 'ð': 'd', 'Ð': 'd', 'þ': 'th', 'Þ': 'th', 'ħ': 'h', 'Ħ': 'h', 'ı': 'i', 'ŧ': 't', 'Ŧ': 't',
};

/** Code points below this are folded by the table; above it (CJK, most symbols) bytes are kept as they are. */
const TABLE_LIMIT = 0x2070;
const DROP = new Uint8Array(0);
const SPACE = new Uint8Array([0x20]);
let table: (Uint8Array | null)[] | undefined;

/** For each code point from U+0080: null (keep), DROP (a mark), SPACE (punctuation) or the folded bytes. */
function foldTable(): (Uint8Array | null)[] {
  if (table) return table;
  table = new Array<Uint8Array | null>(TABLE_LIMIT).fill(null);
  for (let cp = 0x80; cp < TABLE_LIMIT; cp++) {
    const char = String.fromCodePoint(cp);
    if (/\p{M}/u.test(char)) table[cp] = DROP;
    else if (!/[\p{L}\p{N}]/u.test(char)) table[cp] = SPACE;
    else {
      const folded = (SPELT_OUT[char] ?? char.normalize('NFKD').replace(/\p{M}/gu, '').toLowerCase()).replace(/[^\p{L}\p{N}]+/gu, ' ').trim();
      if (folded !== char) table[cp] = folded === '' ? DROP : Buffer.from(folded, 'utf8');
    }
  }
  return table;
}

const TAB = 0x09;
const NEWLINE = 0x0a;
const COMMA = 0x2c;

/**
 * Fold bytes `source[start, end)` into `out` at `at`; returns where reading
 * stopped (at a tab, a newline or `end`) and the new end in `out`. With
 * `list`, commas separate names: each is folded on its own and the commas are
 * kept; without, a comma is punctuation. Words are joined by one space, none
 * leading or trailing. `out` needs room for about `end - start` bytes: a fold
 * rarely makes a name longer (a few ligatures).
 */
export function foldField(source: Uint8Array, start: number, end: number, out: Uint8Array, at: number, list: boolean): { next: number; written: number } {
  const folds = foldTable();
  let first = at;
  let pendingSpace = false;
  let i = start;
  while (i < end) {
    const b = source[i]!;
    if (b === TAB || b === NEWLINE) break;
    if (b < 0x80) {
      i++;
      let lower = b;
      if (b >= 0x41 && b <= 0x5a) lower = b + 0x20;
      else if (!((b >= 0x61 && b <= 0x7a) || (b >= 0x30 && b <= 0x39))) {
        if (list && b === COMMA) {
          out[at++] = COMMA;
          first = at;
          pendingSpace = false;
        } else {
          pendingSpace = true;
        }
        continue;
      }
      if (pendingSpace && at > first) out[at++] = 0x20;
      pendingSpace = false;
      out[at++] = lower;
      continue;
    }
    const length = b >= 0xf0 ? 4 : b >= 0xe0 ? 3 : 2;
    const cp = length === 2 ? ((b & 0x1f) << 6) | (source[i + 1]! & 0x3f)
      : length === 3 ? ((b & 0x0f) << 12) | ((source[i + 1]! & 0x3f) << 6) | (source[i + 2]! & 0x3f)
      : TABLE_LIMIT;
    const folded = cp < TABLE_LIMIT ? folds[cp]! : null;
    if (folded === null) {
      if (pendingSpace && at > first) out[at++] = 0x20;
      pendingSpace = false;
      for (let k = 0; k < length && i + k < end; k++) out[at++] = source[i + k]!;
    } else if (folded === SPACE) {
      pendingSpace = true;
    } else {
      for (let k = 0; k < folded.length; k++) {
        if (folded[k] === 0x20) {
          pendingSpace = true;
          continue;
        }
        if (pendingSpace && at > first) out[at++] = 0x20;
        pendingSpace = false;
        out[at++] = folded[k]!;
      }
    }
    i += length;
  }
  return { next: i, written: at };
}

/** The key of one name (a query or a name from the gazetteer), as bytes. */
export function nameKeyBytes(name: string): Buffer {
  const source = Buffer.from(name.replace(/[\t\n,]/g, ' '), 'utf8');
  const out = Buffer.alloc(2 * source.length + 8);
  return out.subarray(0, foldField(source, 0, source.length, out, 0, false).written);
}

/** The key of one name as text: "Saint-Étienne" → "saint etienne", "Kraków" → "krakow". */
export function nameKey(name: string): string {
  return nameKeyBytes(name).toString('utf8');
}

/** Words written short in place names, and written out (both ways are tried). */
const SHORT_WORDS: Record<string, string> = { st: 'saint', ste: 'sainte', mt: 'mount', ft: 'fort' };
const LONG_WORDS = Object.fromEntries(Object.entries(SHORT_WORDS).map(([short, long]) => [long, short]));

/** A key and its spellings with St./Saint, Mt./Mount, Ft./Fort swapped: "st petersburg" → also "saint petersburg". */
export function keyVariants(key: string): string[] {
  let variants = [''];
  for (const word of key.split(' ')) {
    const other = SHORT_WORDS[word] ?? LONG_WORDS[word];
    variants = variants.flatMap((v) => (other ? [`${v} ${word}`, `${v} ${other}`] : [`${v} ${word}`]));
    if (variants.length > 16) variants = variants.slice(0, 16);
  }
  return variants.map((v) => v.trim()).filter((v) => v !== '');
}
