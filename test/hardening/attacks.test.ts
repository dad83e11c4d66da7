/**
 * A fresh attack pass on the batch and its files, after the second
 * hardening pass: each attack is a test; each must end in valid output or
 * one escaped line and exit 2, touch nothing outside --out, and never hang.
 *
 * Sources: POSIX.1-2017 open() (O_NOFOLLOW, O_NONBLOCK), rename(), link();
 * Unicode UAX #15 (normalisation: compatibility forms such as fullwidth
 * braces fold to ASCII under NFKC) and UTS #39 (confusables); MITRE CWE-59,
 * CWE-22, CWE-367 (check-then-use races), CWE-400; proc(5).
 */
import assert from 'node:assert/strict';
import { execFileSync, spawn } from 'node:child_process';
import { closeSync, constants, existsSync, lstatSync, openSync, mkdirSync, readdirSync, readFileSync, symlinkSync, truncateSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { test } from 'node:test';
import { LOCK_NAME } from '../../src/batch/lock.ts';
import { assertOneLine, batchSetup, run, snapshot, TWO_ECLIPSES } from './support.ts';

const BIN = new URL('../../src/cli/bin.mjs', import.meta.url).pathname;

test('attack 1: manifest.json is a link to a file outside --out: not followed, the target untouched, the manifest rebuilt as a file', async () => {
  const { dir, style, out } = batchSetup();
  const victim = join(dir, 'victim.json');
  writeFileSync(victim, '{"schema": "umbracast.manifest/1"}');
  mkdirSync(out);
  symlinkSync(victim, join(out, 'manifest.json'));
  const outcome = await run(['batch', ...TWO_ECLIPSES, '--style', style, '--out', out]);
  assert.equal(outcome.code, 0, outcome.stderr);
  assert.match(outcome.stderr, /manifest\.json is a symbolic link \(not followed\); rebuilding it from this run/);
  assert.equal(readFileSync(victim, 'utf8'), '{"schema": "umbracast.manifest/1"}');
  assert.ok(lstatSync(join(out, 'manifest.json')).isFile(), 'rename() replaced the link itself');
});

test('attack 2: a huge manifest (a sparse 100 MiB file) is not read; the batch rebuilds it', async () => {
  const { style, out } = batchSetup();
  mkdirSync(out);
  writeFileSync(join(out, 'manifest.json'), '');
  truncateSync(join(out, 'manifest.json'), 100 * 1024 * 1024);
  const rss = process.memoryUsage().rss;
  const outcome = await run(['batch', ...TWO_ECLIPSES, '--style', style, '--out', out]);
  assert.equal(outcome.code, 0, outcome.stderr);
  assert.match(outcome.stderr, /manifest\.json is larger than 64 MiB; rebuilding it from this run/);
  assert.ok(process.memoryUsage().rss - rss < 80 * 1024 * 1024, 'CWE-400: not read into memory');
  assert.equal(JSON.parse(readFileSync(join(out, 'manifest.json'), 'utf8')).eclipses.length, 2);
});

test('attack 3: --out is a file, or a link to a file: one line, the file untouched', async () => {
  const { dir, style } = batchSetup();
  writeFileSync(join(dir, 'plain'), 'x');
  symlinkSync(join(dir, 'plain'), join(dir, 'link'));
  for (const name of ['plain', 'link']) {
    assertOneLine(await run(['batch', ...TWO_ECLIPSES, '--style', style, '--out', join(dir, name)]), /^umbracast: --out: expected a folder, or a new folder inside an existing one, received /);
    assertOneLine(await run(['batch', '--merge', dir, '--out', join(dir, name)]), /^umbracast: --out: expected a folder/);
  }
  assert.equal(readFileSync(join(dir, 'plain'), 'utf8'), 'x');
});

test('attack 4: a style that is a link to /dev/stdin (a terminal, pipe or /dev/null) is refused at once', async () => {
  const { dir, out } = batchSetup();
  symlinkSync('/dev/stdin', join(dir, 'stdin.yaml'));
  const t0 = Date.now();
  const outcome = await run(['batch', '--style', join(dir, 'stdin.yaml'), '--out', out]);
  assertOneLine(outcome, /^umbracast: --style: expected a (regular|readable) style file, received ".*stdin\.yaml"/);
  assert.ok(Date.now() - t0 < 5_000, 'no wait for input');
  // And as a child whose stdin is a pipe nobody writes to (POSIX: a read would block for ever): a FIFO, and
  // the socket Node gives a child for a 'pipe'.
  execFileSync('mkfifo', [join(dir, 'fifo')]);
  const fifo = openSync(join(dir, 'fifo'), constants.O_RDWR); // Linux: O_RDWR on a FIFO does not wait for a writer
  for (const [stdin, kind] of [[fifo, 'a FIFO'], ['pipe', 'a socket']] as const) {
    const child = spawn(process.execPath, [BIN, 'batch', '--style', join(dir, 'stdin.yaml'), '--out', out], { stdio: [stdin, 'ignore', 'pipe'] });
    let stderr = '';
    child.stderr!.on('data', (d: Buffer) => (stderr += d.toString()));
    const exited = new Promise((r) => child.once('exit', r));
    const timer = setTimeout(() => child.kill('SIGKILL'), 20_000);
    const code = await exited;
    clearTimeout(timer);
    assert.equal(code, 2, stderr);
    assert.equal(stderr, `umbracast: --style: expected a regular style file, received ${JSON.stringify(join(dir, 'stdin.yaml'))} (is ${kind})\n`);
  }
  closeSync(fifo);
});

test('attack 5: shard specs 0/3, 4/3, 1/0, 1/3/5, -1/3, fullwidth digits are one line naming --shard; nothing made', async () => {
  const { dir, style, out } = batchSetup();
  for (const spec of ['0/3', '4/3', '1/0', '1/3/5', '-1/3', '\uFF11/3', '1/\uFF13', '1\u20443', '10000/10000', '3/3 ']) {
    const outcome = await run(['batch', ...TWO_ECLIPSES, '--shard', spec, '--style', style, '--out', out]);
    if (spec === '3/3 ') {
      assert.equal(outcome.code, 0, 'surrounding spaces are allowed');
      continue;
    }
    assertOneLine(outcome, /^umbracast: --shard: expected I\/N with 1 ≤ I ≤ N ≤ 9999, e\.g\. 2\/3, received /);
  }
  assert.deepEqual(readdirSync(dir).sort(), ['out', 'style.yaml'].filter((n) => existsSync(join(dir, n))));
});

test('attack 6: naming templates with Unicode tricks (fullwidth braces, one-dot leaders, combining marks, bidi, dotless i) are refused; nothing made', async () => {
  const { dir, out } = batchSetup();
  const templates = ['\uFF5Bid\uFF5D', '{id}\u2024\u2024', '{id}\u0338', '{id}\u202e', '{\u0131d}', '{id}\uFF0Fx', '{id}\u2215x', 'e\u0301{id}', '{ID}', '{id}\u00a0x'];
  for (const naming of templates) {
    writeFileSync(join(dir, 'n.json'), JSON.stringify({ naming, formats: ['svg'], preset: 'card', sky: false }));
    const outcome = await run(['batch', ...TWO_ECLIPSES, '--style', join(dir, 'n.json'), '--out', out]);
    assertOneLine(outcome, /^umbracast: .*n\.json: naming: expected /);
    // NFKC (UAX #15) would fold some of these to ASCII: the check is on the text as given, so none slips through folded.
  }
  assert.ok(!existsSync(out));
});

test('attack 7: a lock file that is not ours (garbage, or empty as a crashed writer leaves it) is stale and taken over', async () => {
  for (const content of ['hello\n', '', '{"tool":"something else","pid":1}', 'x'.repeat(10_000)]) {
    const { style, out } = batchSetup();
    mkdirSync(out);
    writeFileSync(join(out, LOCK_NAME), content);
    const outcome = await run(['batch', ...TWO_ECLIPSES, '--style', style, '--out', out]);
    assert.equal(outcome.code, 0, outcome.stderr);
    assert.ok(!existsSync(join(out, LOCK_NAME)));
  }
});

test('attack 8: two batches start at once on a folder with a stale lock: exactly one takes it (rename, then link), the other is refused', async () => {
  const { style, out } = batchSetup('preset: card\nformats: [png, svg]\n');
  mkdirSync(out);
  writeFileSync(join(out, LOCK_NAME), '999999999\n');
  const start = () => {
    const child = spawn(process.execPath, [BIN, 'batch', '--from', '2026', '--to', '2027', '--style', style, '--out', out, '--jobs', '1'], { stdio: ['ignore', 'ignore', 'pipe'] });
    let stderr = '';
    child.stderr!.on('data', (d: Buffer) => (stderr += d.toString()));
    return new Promise<{ code: number; stderr: string }>((r) => child.once('exit', (code) => r({ code: code ?? -1, stderr })));
  };
  const results = await Promise.all([start(), start()]);
  const codes = results.map((r) => r.code).sort();
  assert.deepEqual(codes, [0, 2], JSON.stringify(results));
  assert.match(results.find((r) => r.code === 2)!.stderr, /holds \.umbracast\.lock/);
  assert.ok(!existsSync(join(out, LOCK_NAME)));
  assert.deepEqual(readdirSync(out).filter((n) => n.includes('.stale-') || n.includes('.new-')), []);
});

test('attack 9: SIGTERM at any moment of a merge leaves whole files; the next merge takes the lock over and completes', async () => {
  const { style, out } = batchSetup();
  for (const shard of ['1/2', '2/2']) assert.equal((await run(['batch', ...TWO_ECLIPSES, '--shard', shard, '--style', style, '--out', out])).code, 0);
  for (const delay of [0, 150, 300, 450, 600, 800]) {
    const child = spawn(process.execPath, [BIN, 'batch', '--merge', out, '--out', out], { stdio: 'ignore' });
    const exited = new Promise((r) => child.once('exit', r));
    await new Promise((r) => setTimeout(r, delay));
    child.kill('SIGTERM');
    await exited;
    if (existsSync(join(out, 'manifest.json'))) assert.equal(JSON.parse(readFileSync(join(out, 'manifest.json'), 'utf8')).eclipses.length, 2, `whole after SIGTERM at ${delay} ms`);
  }
  const merged = await run(['batch', '--merge', out, '--out', out]);
  assert.equal(merged.code, 0, merged.stderr);
  assert.deepEqual(readdirSync(out).filter((n) => n.includes('.partial-') || n === LOCK_NAME), [], 'no temporary file or lock left');
});

test('attack 10: thumbs is a file, manifest.json or index.html is a folder: one line before any work, nothing touched', async () => {
  for (const [name, make] of [['thumbs', 'file'], ['manifest.json', 'folder'], ['index.html', 'folder'], ['catalogue.csv', 'folder']] as const) {
    const { style, out } = batchSetup();
    mkdirSync(out);
    if (make === 'file') writeFileSync(join(out, name), 'mine');
    else mkdirSync(join(out, name));
    const before = snapshot(out);
    const outcome = await run(['batch', ...TWO_ECLIPSES, '--style', style, '--out', out]);
    assertOneLine(outcome, new RegExp(`^umbracast: --out: expected a folder whose ${name.replace('.', '\\.')} is a (file|folder) \\(or absent\\), received .*\\(${name.replace('.', '\\.')} is (not a folder|a folder)\\)$`));
    assert.deepEqual(snapshot(out), before);
  }
});

test('attack 11: an --out whose name holds a newline and an escape works, and its lines on stderr stay escaped', async () => {
  const { dir, style } = batchSetup();
  const out = join(dir, 'night\nnotes\u001b[0m');
  const outcome = await run(['batch', ...TWO_ECLIPSES, '--style', style, '--out', out]);
  assert.equal(outcome.code, 0, outcome.stderr);
  assert.ok(!outcome.stderr.includes('\u001b'));
  assert.equal(JSON.parse(readFileSync(join(out, 'manifest.json'), 'utf8')).eclipses.length, 2);
  assert.match((await run(['batch', ...TWO_ECLIPSES, '--style', style, '--out', out])).stdout, /0 rendered, 2 up to date/);
  // A failure under that folder: one escaped line.
  mkdirSync(join(out, 'x'));
  writeFileSync(join(out, 'x', LOCK_NAME), `${JSON.stringify({ tool: 'umbracast batch', pid: process.pid, start: readFileSync('/proc/self/stat', 'utf8').split(') ')[1]!.split(' ')[19], host: (await import('node:os')).hostname(), token: 'b'.repeat(24) })}\n`);
  assertOneLine(await run(['batch', ...TWO_ECLIPSES, '--style', style, '--out', join(out, 'x')]), /night\\nnotes\\u001b\[0m\/x \(batch with process \d+ holds/);
});

test('attack 12: an output folder in which no lock can be made (a read-only system folder) is one line; nothing is made', { skip: !existsSync('/sys/kernel') && 'needs /sys' }, async () => {
  const { style } = batchSetup();
  const outcome = await run(['batch', ...TWO_ECLIPSES, '--style', style, '--out', '/sys/kernel']);
  assertOneLine(outcome, /^umbracast: --out: expected a folder umbracast can write to \(its lock \.umbracast\.lock could not be made\), received \/sys\/kernel \((EACCES|EPERM|EROFS)\)$/);
  const merge = await run(['batch', '--merge', '/sys/kernel', '--out', '/sys/kernel']);
  assert.equal(merge.code, 2);
});

test('attack 13: folders and FIFOs named like temporary files are not removed as leftovers (only files we could have left)', async () => {
  const { style, out } = batchSetup();
  mkdirSync(join(out, '.keep.svg.partial-12'), { recursive: true });
  writeFileSync(join(out, '.keep.svg.partial-12', 'inside'), 'mine');
  execFileSync('mkfifo', [join(out, '.pipe.svg.partial-13')]);
  const outcome = await run(['batch', ...TWO_ECLIPSES, '--style', style, '--out', out]);
  assert.equal(outcome.code, 0, outcome.stderr);
  assert.equal(readFileSync(join(out, '.keep.svg.partial-12', 'inside'), 'utf8'), 'mine');
  assert.ok(!existsSync(join(out, '.pipe.svg.partial-13')), 'a FIFO of that name is unlinked, never opened');
});

test('attack 14: --merge given a FIFO, a link or a device as its manifest is one line, at once', async () => {
  const { dir, out } = batchSetup();
  mkdirSync(out);
  execFileSync('mkfifo', [join(dir, 'fifo.json')]);
  symlinkSync('/dev/zero', join(dir, 'zero.json'));
  const shards = join(dir, 'shards');
  mkdirSync(shards);
  symlinkSync('/dev/zero', join(shards, 'manifest.shard-1-of-2.json'));
  for (const [source, reason] of [[join(dir, 'fifo.json'), 'is a FIFO'], [join(dir, 'zero.json'), 'is a symbolic link \\(not followed\\)'], [shards, 'is a symbolic link \\(not followed\\)']]) {
    const t0 = Date.now();
    assertOneLine(await run(['batch', '--merge', source!, '--out', out]), new RegExp(`^umbracast: --merge: expected readable umbracast manifests, received .* ${reason}$`));
    assert.ok(Date.now() - t0 < 5_000);
  }
  assert.deepEqual(readdirSync(out), []);
});

test('attack 15: a NUL byte in --out, --style or --merge (no file system path holds one) is one line, not a crash', async () => {
  const { dir, style } = batchSetup();
  const cases: [string[], RegExp][] = [
    [['--out', join(dir, 'x\u0000y'), '--style', style], /^umbracast: --out: expected a folder, or a new folder inside an existing one, received ".*x\\u0000y"$/],
    [['--style', join(dir, 's\u0000.yaml'), '--out', join(dir, 'o')], /^umbracast: --style: expected a readable style file, received ".*s\\u0000\.yaml"$/],
    [['--merge', join(dir, '\u0000'), '--out', dir], /^umbracast: --merge: expected folders that exist, received ".*\\u0000"$/],
  ];
  for (const [args, pattern] of cases) assertOneLine(await run(['batch', ...TWO_ECLIPSES, ...args]), pattern);
  assert.deepEqual(readdirSync(dir), ['style.yaml']);
});

test('every command\'s error is one line with what came from outside escaped: line breaks, terminal escapes and direction marks in a place, a path or an option (ECMA-48 escapes; Unicode UAX #9 bidi controls)', async () => {
  const { main } = await import('../../src/cli/main.ts');
  const hostile = 'Spring\nfield\u001b[31m\u202e';
  for (const args of [['local', '--place', hostile], ['map', '-o', `/no/such/${hostile}/map.png`], ['list', '--from', hostile], ['map', `--${hostile}`]]) {
    let stderr = '';
    const code = await main(args, { stdout: () => undefined, stderr: (t) => (stderr += t), now: () => new Date('2026-01-10T00:00:00Z') });
    assert.equal(code, 2, `${args[0]}: ${stderr}`);
    assert.equal(stderr.split('\n').length, 2, `${args[0]}: one line, got ${JSON.stringify(stderr)}`);
    assert.ok(!/[\u0000-\u0009\u000b-\u001f\u202e]/.test(stderr), `${args[0]}: raw control or direction mark in ${JSON.stringify(stderr)}`);
  }
});
