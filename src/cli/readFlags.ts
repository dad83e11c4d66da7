/**
 * The command line's flags read into the library's typed choices (the same
 * values a house style gives): text → numbers, boxes, positions, names. What
 * only text can get wrong is reported here, naming the flag; what any caller
 * can get wrong is checked by the library (src/settings/), naming its
 * parameter, which src/cli/flags.ts turns back into the flag.
 *
 * This file reads what every command shares (body, kinds, the eclipse's
 * convention and ΔT) and imports nothing of places or pictures, so that
 * `list` loads none of them; the flags of places, pages and maps are read in
 * readMapFlags.ts.
 */
import { InputError } from '../errors.ts';
import { SHADOW_CONVENTIONS } from '../eclipses/lunar/conventions.ts';
import { BODY_CHOICES, kindsOfBodies, type BodyChoice, type EclipseKindName } from '../eclipses/kinds.ts';
import type { EclipseChoice } from '../settings/choose.ts';
import { DELTA_T_LIMITS, parseChoice, parseNumber } from '../settings/read.ts';

export interface BodyFlags {
  body?: string;
  kind?: string;
}

/** --body: lunar, solar or all (the default). */
export function bodyFromFlags(flags: BodyFlags): BodyChoice {
  return flags.body === undefined ? 'all' : parseChoice('--body', flags.body, BODY_CHOICES);
}

/** The kinds --kind may name for a body: with `all`, a kind of either. */
export function kindsOfBody(body: BodyChoice): readonly EclipseKindName[] {
  return kindsOfBodies(body);
}

/**
 * --kind read against the body: the kinds chosen, or undefined for every kind.
 * A kind the body has not (annular for lunar, penumbral for solar) is one error
 * line naming --kind and the kinds allowed for that body.
 */
export function kindsFromFlags(flags: BodyFlags, body: BodyChoice = bodyFromFlags(flags)): readonly EclipseKindName[] | undefined {
  if (flags.kind === undefined) return undefined;
  const allowed = kindsOfBody(body);
  const parts = flags.kind.split(',').map((p) => p.trim().toLowerCase()).filter((p) => p.length > 0);
  const bad = parts.length === 0 || parts.some((p) => !(allowed as readonly string[]).includes(p));
  if (bad) throw new InputError('--kind', `a comma-separated list of the kinds of ${body === 'all' ? 'lunar or solar' : body} eclipses: ${allowed.join(', ')}`, flags.kind);
  return [...new Set(parts)] as EclipseKindName[];
}

export interface EclipseFlags {
  convention: string;
  deltaT?: string;
}

/**
 * With a house style, the flags the user typed win and the style fills in the rest: `typed(key)` says
 * whether a flag was typed (not a default). Without a style, every flag is read.
 */
export interface Underlay<T> {
  readonly base: T;
  readonly typed: (key: string) => boolean;
}

export function reader<F extends object, T>(flags: F, underlay: Underlay<T> | undefined) {
  const text = flags as Record<string, unknown>;
  return <V>(key: keyof F & string, fromBase: (base: T) => V, read: (value: string) => V): V | undefined => {
    if (underlay && !underlay.typed(key)) return fromBase(underlay.base);
    const value = text[key];
    return value === undefined ? undefined : read(value as string);
  };
}

export const given = <K extends string, V>(key: K, value: V | undefined): { [P in K]?: V } => (value === undefined ? {} : ({ [key]: value } as { [P in K]?: V }));

export function eclipseChoiceFromFlags(flags: EclipseFlags, underlay?: Underlay<EclipseChoice>): EclipseChoice {
  const take = reader(flags, underlay);
  const convention = take('convention', (b) => b.convention, (t) => parseChoice('--convention', t, SHADOW_CONVENTIONS))!;
  const deltaTSeconds = take('deltaT', (b) => b.deltaTSeconds, (t) => parseNumber('--delta-t', t, DELTA_T_LIMITS));
  return { convention, ...given('deltaTSeconds', deltaTSeconds) };
}
