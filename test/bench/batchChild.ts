/** One batch in its own process, for the bench: prints seconds and counts as JSON (the bench samples its memory). */
import { runBatch } from '../../src/batch/run.ts';
import { validateStyle } from '../../src/batch/style.ts';

const [out, jobs] = process.argv.slice(2);
const style = validateStyle({ size: '2400x1350', formats: ['png', 'svg'] }, 'bench style');
const summary = await runBatch({
  from: new Date('2026-01-01T00:00:00Z'),
  to: new Date('2036-01-01T00:00:00Z'),
  kinds: ['penumbral', 'partial', 'total'],
  style,
  outDir: out!,
  jobs: Number(jobs),
  force: true,
  shard: null,
  tool: 'umbracast bench',
});
process.stdout.write(JSON.stringify({ seconds: summary.seconds, eclipses: summary.rendered, maps: summary.rendered * 2 }));
