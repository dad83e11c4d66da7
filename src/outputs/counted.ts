/** "1 lunar eclipse", "23 lunar eclipses": a count with its noun in agreement. */
export function counted(count: number, singular: string, plural = `${singular}s`): string {
  return `${count} ${count === 1 ? singular : plural}`;
}
