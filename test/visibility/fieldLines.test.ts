/**
 * The field's lines are circles where the Moon rises or sets at one instant.
 * Each must lie where the general evaluator (minute-by-minute integration of
 * the Moon's altitude) finds that many minutes — away from the poles, where
 * the Moon can rise and set within one phase (common practice: check a
 * closed form against direct integration).
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { findLunarEclipses } from '../../src/eclipses/lunar/catalogue.ts';
import { fieldLines, fieldStepMinutes } from '../../src/visibility/lunar/fieldLines.ts';
import { visibilityEvaluator, visibilityOf } from '../../src/visibility/lunar/visibility.ts';

for (const date of ['2026-03-03', '2026-08-28', '2027-02-20']) {
  test(`${date}: points on each field line see the line's minutes, within a minute`, () => {
    const [eclipse] = findLunarEclipses({ from: new Date(`${date}T00:00:00Z`), to: new Date(`${date}T23:59:59Z`) });
    const visibility = visibilityOf(eclipse!);
    const evaluator = visibilityEvaluator(visibility);
    const lines = fieldLines(visibility);
    const step = fieldStepMinutes(visibility.fieldDurationMinutes);
    assert.ok(lines.length >= 4 && lines.length <= 12, `${lines.length} lines`);
    assert.deepEqual([...new Set(lines.map((l) => l.minutes))], Array.from({ length: lines.length / 2 }, (_, i) => step * (i + 1)));
    let checked = 0;
    for (const line of lines) {
      for (const point of line.line.filter((_, i) => i % 10 === 0)) {
        if (Math.abs(point[1]!) > 55) continue;
        const minutes = evaluator.minutesUpAt([point[0]!, point[1]!]);
        assert.ok(Math.abs(minutes - line.minutes) < 1, `${line.side} ${line.minutes} min at ${point}: ${minutes.toFixed(2)}`);
        checked++;
      }
    }
    assert.ok(checked > 100, `checked ${checked}`);
  });
}
