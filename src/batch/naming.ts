/**
 * Output naming: a template of {placeholders} filled per eclipse. Kept apart
 * from the style schema so that batch workers load no schema library.
 */

/** Placeholders a naming template may use. */
export const NAMING_FIELDS = ['id', 'kind', 'year', 'saros'] as const;
export const DEFAULT_NAMING = '{id}-{kind}';

/** Fill a naming template for one eclipse. */
export function fileStem(template: string, eclipse: { id: string; kind: string; saros: number }): string {
  const values: Record<(typeof NAMING_FIELDS)[number], string> = {
    id: eclipse.id,
    kind: eclipse.kind,
    year: eclipse.id.slice(0, 4),
    saros: String(eclipse.saros),
  };
  return template.replace(/\{(id|kind|year|saros)\}/g, (_, key: (typeof NAMING_FIELDS)[number]) => values[key]);
}
