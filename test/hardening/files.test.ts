/**
 * Second hardening pass, files: temporary files, paths read from manifests,
 * style files that are not files, cleanup through links, the contact
 * sheet's links, malformed shard records, merge bounds.
 *
 * Sources named beside the checks: POSIX.1-2017 open() (O_CREAT|O_EXCL,
 * O_NOFOLLOW, O_NONBLOCK on a FIFO), rename() and link(); MITRE CWE-59
 * (link following), CWE-377 (insecure temporary file), CWE-22 (path
 * traversal), CWE-400 (uncontrolled resource consumption).
 */
import assert from 'node:assert/strict';
import { execFileSync } from 'node:child_process';
import { existsSync, lstatSync, mkdirSync, readdirSync, readFileSync, symlinkSync, truncateSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { test } from 'node:test';
import { MAX_FILE_NAME_BYTES, readRegularFile, ReadRefused, temporaryNameFor, TEMPORARY_NAME } from '../../src/outputs/files.ts';
import { contactSheet } from '../../src/batch/contactSheet.ts';
import { removeLeftovers } from '../../src/batch/run.ts';
import type { Manifest } from '../../src/batch/manifest.ts';
import { assertOneLine, batchSetup, run, snapshot, TWO_ECLIPSES } from './support.ts';

const mkfifo = (path: string) => execFileSync('mkfifo', [path]);
/** A manifest as a forger edits it. */
interface Loose { eclipses: { id: string; files: { path: string; role: string; bytes: number; sha256: string }[]; record: Record<string, unknown> }[] }

test('1. temporary names are unpredictable, and a link planted at the old predictable name redirects nothing (map -o)', async () => {
  const { dir } = batchSetup();
  const victim = join(dir, 'victim.txt');
  writeFileSync(victim, 'keep me\n');
  const out = join(dir, 'maps');
  mkdirSync(out);
  // The names the previous version used (".NAME.partial-PID"), for this process, which runs the command.
  for (const name of ['m.svg', 'm.txt']) symlinkSync(victim, join(out, `.${name}.partial-${process.pid}`));
  const outcome = await run(['map', '2026-03-03', '--preset', 'card', '-o', join(out, 'm.svg')]);
  assert.equal(outcome.code, 0, outcome.stderr);
  assert.equal(readFileSync(victim, 'utf8'), 'keep me\n', 'CWE-59/CWE-377: the write did not follow the planted link');
  assert.match(readFileSync(join(out, 'm.svg'), 'utf8'), /^<svg/);
  // Two names for one path differ, and both match the cleanup pattern (48 random bits: common practice for temporary names).
  const [a, b] = [temporaryNameFor(join(out, 'm.svg')), temporaryNameFor(join(out, 'm.svg'))];
  assert.notEqual(a, b);
  assert.match(a.split('/').pop()!, /^\.m\.svg\.partial-\d+-[0-9a-f]{12}$/);
  assert.match(a.split('/').pop()!, TEMPORARY_NAME);
});

test('1. a batch with links planted at every predictable temporary name of its workers overwrites nothing outside --out', async () => {
  const { dir, style, out } = batchSetup();
  const victim = join(dir, 'victim.txt');
  writeFileSync(victim, 'keep me\n');
  mkdirSync(out);
  // Worker process ids follow this one's closely: plant the old names for the next 300 ids.
  for (let pid = process.pid + 1; pid <= process.pid + 300; pid++) {
    for (const name of ['2026-03-03-total.svg', '2026-08-28-partial.svg', 'manifest.json']) symlinkSync(victim, join(out, `.${name}.partial-${pid}`));
  }
  const outcome = await run(['batch', ...TWO_ECLIPSES, '--style', style, '--out', out, '--jobs', '2']);
  assert.equal(outcome.code, 0, outcome.stderr);
  assert.equal(readFileSync(victim, 'utf8'), 'keep me\n');
  assert.match(outcome.stderr, /removed 900 temporary file\(s\) left by an interrupted run/);
  assert.deepEqual(readdirSync(out).filter((n) => n.includes('.partial-')), []);
});

test('12. a name near 255 bytes still gets a temporary name that fits (map -o with a 250-byte name)', async () => {
  const { dir } = batchSetup();
  const name = `${'k'.repeat(246)}.svg`;
  assert.equal(Buffer.byteLength(name), 250);
  assert.ok(Buffer.byteLength(temporaryNameFor(join(dir, name)).split('/').pop()!) <= MAX_FILE_NAME_BYTES, 'NAME_MAX 255 (POSIX limits.h; ext4)');
  const outcome = await run(['map', '2026-03-03', '--preset', 'card', '-o', join(dir, name)]);
  assert.equal(outcome.code, 0, outcome.stderr);
  assert.ok(existsSync(join(dir, name)));
  // Multi-byte names are shortened on a character boundary.
  const wide = temporaryNameFor(join(dir, 'é'.repeat(126) + '.svg')).split('/').pop()!;
  assert.ok(Buffer.byteLength(wide) <= MAX_FILE_NAME_BYTES);
  assert.ok(!wide.includes('\uFFFD'));
});

/** A real two-eclipse batch in shard 1/1-like form: its folder, and a forged shard manifest to merge. */
async function shardFolder() {
  const setup = batchSetup();
  const outcome = await run(['batch', ...TWO_ECLIPSES, '--style', setup.style, '--out', setup.out, '--shard', '1/1']);
  assert.equal(outcome.code, 0, outcome.stderr);
  const path = join(setup.out, 'manifest.shard-1-of-1.json');
  const manifest = JSON.parse(readFileSync(path, 'utf8')) as Loose;
  const forge = (change: (m: Loose) => void) => {
    const copy = JSON.parse(JSON.stringify(manifest)) as Loose;
    change(copy);
    writeFileSync(path, JSON.stringify(copy));
  };
  return { ...setup, manifest, forge, path };
}

test('2/7. forged paths in a shard manifest (.., absolute, /dev/zero, //host, a FIFO, a link) are refused by --merge before any read; nothing is written', async () => {
  const { dir, out, forge } = await shardFolder();
  mkfifo(join(out, 'fifo.svg'));
  symlinkSync('/dev/zero', join(out, 'zero.svg'));
  const before = snapshot(out);
  const cases: [string, RegExp][] = [
    ['../victim.txt', /path: a plain relative path inside the folder/],
    ['/etc/passwd', /path: a plain relative path/],
    ['/dev/zero', /path: a plain relative path/],
    ['//host/track.png', /path: a plain relative path/],
    ['thumbs/../../x.png', /path: a plain relative path/],
    ['https://host/track.png', /path: a plain relative path/],
    ['a\\..\\b.png', /path: a plain relative path/],
    ['.hidden.svg', /path: a plain relative path/],
    ['fifo.svg', /--merge: expected shards whose files are in --out as their manifests list them .*fifo\.svg missing or changed/],
    ['zero.svg', /zero\.svg missing or changed/],
  ];
  for (const [path, pattern] of cases) {
    forge((m) => {
      m.eclipses[0]!.files[0]!.path = path;
    });
    const t0 = Date.now();
    const outcome = await run(['batch', '--merge', out, '--out', out]);
    assertOneLine(outcome, /^umbracast: --merge: /);
    assert.match(outcome.stderr, pattern, path);
    assert.ok(Date.now() - t0 < 10_000, 'a FIFO or device does not hang the merge (POSIX open() with O_NONBLOCK)');
    assert.ok(!existsSync(join(out, 'manifest.json')), 'CWE-22: a refused merge writes nothing');
  }
  const after = snapshot(out);
  delete before['manifest.shard-1-of-1.json'];
  delete after['manifest.shard-1-of-1.json'];
  assert.deepEqual(after, before);
  assert.ok(!existsSync(join(dir, 'victim.txt')));
});

test('2. forged paths in the folder\'s own manifest (/dev/zero, a FIFO where a file should be) are not read; the next batch rebuilds it, bounded in time', async () => {
  const { style, out } = batchSetup();
  assert.equal((await run(['batch', ...TWO_ECLIPSES, '--style', style, '--out', out])).code, 0);
  const manifestPath = join(out, 'manifest.json');
  const manifest = JSON.parse(readFileSync(manifestPath, 'utf8')) as Loose;
  manifest.eclipses[0]!.files[0]!.path = '/dev/zero';
  writeFileSync(manifestPath, JSON.stringify(manifest));
  const first = await run(['batch', ...TWO_ECLIPSES, '--style', style, '--out', out]);
  assert.equal(first.code, 0, first.stderr);
  assert.match(first.stderr, /manifest\.json: eclipses\.0\.files\.0\.path: a plain relative path inside the folder .*; rebuilding it from this run/);
  // A FIFO in place of a listed file: the file is not intact (not a regular file), so the eclipse is redone, not hung on.
  const listed = (JSON.parse(readFileSync(manifestPath, 'utf8')) as Loose).eclipses[1]!.files.find((f) => f.role === 'caption')!.path;
  execFileSync('rm', [join(out, listed)]);
  mkfifo(join(out, listed));
  const t0 = Date.now();
  const second = await run(['batch', ...TWO_ECLIPSES, '--style', style, '--out', out]);
  assert.equal(second.code, 0, second.stderr);
  assert.match(second.stdout, /2 eclipses — 1 rendered, 1 up to date, 0 failed/);
  assert.ok(Date.now() - t0 < 30_000);
  assert.ok(lstatSync(join(out, listed)).isFile(), 'rename() replaced the FIFO with the file');
});

test('3. style files that are devices, FIFOs, folders or huge sparse files are refused in one line, without reading them', async () => {
  const { dir } = batchSetup();
  symlinkSync('/dev/zero', join(dir, 'zero.yaml'));
  symlinkSync('/dev/urandom', join(dir, 'random.json'));
  mkfifo(join(dir, 'fifo.yaml'));
  mkdirSync(join(dir, 'folder.yaml'));
  writeFileSync(join(dir, 'sparse.yaml'), '');
  truncateSync(join(dir, 'sparse.yaml'), 8 * 1024 ** 3); // 8 GiB of nothing: stat says 8 GiB
  const cases: [string, RegExp][] = [
    ['zero.yaml', /^umbracast: --style: expected a regular style file, received ".*zero\.yaml" \(is a character device\)$/],
    ['random.json', /^umbracast: --style: expected a regular style file, received .* \(is a character device\)$/],
    ['fifo.yaml', /^umbracast: --style: expected a regular style file, received .* \(is a FIFO\)$/],
    ['folder.yaml', /^umbracast: --style: expected a regular style file, received .* \(is a folder\)$/],
    ['sparse.yaml', /^umbracast: --style: expected a style file of at most 256 KiB/],
  ];
  for (const [name, pattern] of cases) {
    for (const command of [['batch', '--style', join(dir, name), '--out', join(dir, 'o')], ['map', '--style', join(dir, name), '-o', join(dir, 'm.svg')]]) {
      const rss = process.memoryUsage().rss;
      const t0 = Date.now();
      const outcome = await run(command);
      assertOneLine(outcome, pattern);
      assert.ok(Date.now() - t0 < 5_000, `${name}: no hang (POSIX open() with O_NONBLOCK returns at once on a FIFO)`);
      assert.ok(process.memoryUsage().rss - rss < 64 * 1024 ** 2, `${name}: CWE-400, memory stays bounded`);
    }
  }
  assert.ok(!existsSync(join(dir, 'o')));
  // The reader itself: at most the limit is read, whatever the file.
  assert.throws(() => readRegularFile('/dev/zero', 1024), (e: unknown) => e instanceof ReadRefused && e.reason === 'not a regular file');
  assert.throws(() => readRegularFile(join(dir, 'zero.yaml'), 1024, { followLinks: false }), (e: unknown) => e instanceof ReadRefused && e.reason === 'link');
});

test('5. start-up cleanup does not follow thumbs/ when it is a link: nothing outside --out is deleted', async () => {
  const { dir, style, out } = batchSetup();
  const outside = join(dir, 'elsewhere');
  mkdirSync(outside);
  writeFileSync(join(outside, '.precious.png.partial-42'), 'keep me');
  writeFileSync(join(outside, '.other.svg.partial-7-00aa00aa00aa'), 'keep me too');
  mkdirSync(out);
  symlinkSync(outside, join(out, 'thumbs'));
  assert.equal(removeLeftovers(out), 0);
  const outcome = await run(['batch', ...TWO_ECLIPSES, '--style', style, '--out', out]);
  assertOneLine(outcome, /^umbracast: --out: expected a folder whose thumbs is a folder \(or absent\), received .* \(thumbs is a symbolic link\)$/);
  assert.deepEqual(readdirSync(outside).sort(), ['.other.svg.partial-7-00aa00aa00aa', '.precious.png.partial-42'], 'CWE-59: the link was not followed');
});

test('7. the contact sheet links only to checked relative paths, whatever a manifest holds', async () => {
  const { manifest } = await shardFolder();
  const entry = manifest.eclipses[0]!;
  entry.files = [
    ...entry.files,
    { path: '../../etc/passwd', role: 'local', bytes: 1, sha256: '0'.repeat(64) },
    { path: '//host/track.png', role: 'thumbnail', bytes: 1, sha256: '0'.repeat(64) },
    { path: 'https://host/x.png', role: 'map', bytes: 1, sha256: '0'.repeat(64) },
  ];
  const html = contactSheet(manifest as unknown as Manifest, 'Night Notes');
  const targets = [...html.matchAll(/(?:href|src)="([^"]*)"/g)].map((m) => m[1]!);
  assert.ok(targets.length >= 4);
  for (const target of targets) assert.match(target, /^(thumbs\/)?[A-Za-z0-9_-][A-Za-z0-9._%-]*$/, `RFC 3986 relative-path reference inside the folder: ${target}`);
  assert.ok(!html.includes('passwd') && !html.includes('//host') && !html.includes('https:'));
});

test('7/8. a changed file (hash), malformed records, and bounds: --merge refuses in one line and writes nothing', async () => {
  const { out, forge, path, manifest } = await shardFolder();
  const before = snapshot(out);
  const cases: [string, (m: Loose) => void, RegExp][] = [
    ['a wrong hash', (m) => { m.eclipses[0]!.files[0]!.sha256 = 'f'.repeat(64); }, /missing or changed$/],
    ['a wrong size', (m) => { m.eclipses[0]!.files[0]!.bytes += 1; }, /missing or changed$/],
    ['a record without its time', (m) => { delete m.eclipses[0]!.record.greatest; }, /eclipses\.0\.record\.greatest: /],
    ['a magnitude that is text', (m) => { m.eclipses[0]!.record.penumbralMagnitude = 'big'; }, /record\.penumbralMagnitude: /],
    ['a record of another eclipse', (m) => { m.eclipses[0]!.id = '2026-08-28'; }, /an entry whose id and kind are its record's/],
    ['an unknown record field', (m) => { m.eclipses[0]!.record['__proto__x'] = 1; }, /record: /],
    ['a record that is a string', (m) => { (m.eclipses[0] as unknown as Record<string, unknown>).record = 'x'; }, /record: /],
    ['two eclipses, one file', (m) => { m.eclipses[1]!.files[0]!.path = m.eclipses[0]!.files[0]!.path; }, /each file listed by one eclipse only/],
    ['a huge byte count', (m) => { m.eclipses[0]!.files[0]!.bytes = 1e15; }, /bytes: /],
  ];
  for (const [label, change, pattern] of cases) {
    forge(change);
    const outcome = await run(['batch', '--merge', out, '--out', out]);
    assertOneLine(outcome, /^umbracast: --merge: expected /);
    assert.match(outcome.stderr.trimEnd(), pattern, label);
    const after = snapshot(out);
    delete after['manifest.shard-1-of-1.json'];
    const expected = { ...before };
    delete expected['manifest.shard-1-of-1.json'];
    assert.deepEqual(after, expected, `${label}: nothing written`);
  }
  // A shard manifest over the 64 MiB bound is refused without being read (a sparse file: stat says 65 MiB).
  writeFileSync(path, '');
  truncateSync(path, 65 * 1024 * 1024);
  assertOneLine(await run(['batch', '--merge', out, '--out', out]), /^umbracast: --merge: expected readable umbracast manifests, received .*manifest\.shard-1-of-1\.json is larger than 64 MiB$/);
  // The genuine one merges.
  writeFileSync(path, JSON.stringify(manifest));
  const merged = await run(['batch', '--merge', out, '--out', out]);
  assert.equal(merged.code, 0, merged.stderr);
  assert.equal(JSON.parse(readFileSync(join(out, 'manifest.json'), 'utf8')).eclipses.length, 2);
});
