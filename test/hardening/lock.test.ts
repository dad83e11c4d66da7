/**
 * Second hardening pass, point 4: the batch lock is held only by a live
 * batch of ours. Zombies (an init that does not reap, common in
 * containers) and reused process ids free the lock; a live holder, another
 * host, or a lock that is not a file keeps it.
 *
 * Sources: proc(5) (/proc/PID/stat: field 3 state, "Z" zombie; field 22
 * starttime), ps(1) (procps: STAT "Z" for a defunct process), POSIX.1-2017
 * wait() (a child that has exited stays a zombie until its parent waits).
 */
import assert from 'node:assert/strict';
import { execFileSync, spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, symlinkSync, writeFileSync } from 'node:fs';
import { hostname } from 'node:os';
import { join } from 'node:path';
import { test } from 'node:test';
import { bootId, LOCK_NAME, processState } from '../../src/batch/lock.ts';
import { assertOneLine, batchSetup, run, TWO_ECLIPSES } from './support.ts';

const linux = existsSync('/proc/self/stat');

const psState = (pid: number) => {
  try {
    return execFileSync('ps', ['-o', 'stat=', '-p', String(pid)], { encoding: 'utf8' }).trim()[0];
  } catch {
    return undefined;
  }
};

/** A process that leaves a zombie child: sh starts a short sleep, then becomes a long `sleep`, which never waits for it. */
async function zombie(): Promise<{ pid: number; parent: ChildProcess }> {
  const parent = spawn('sh', ['-c', 'sleep 0.3 & echo $!; exec sleep 30'], { stdio: ['ignore', 'pipe', 'ignore'] });
  const pid = await new Promise<number>((resolve) => parent.stdout!.once('data', (d: Buffer) => resolve(Number(d.toString().trim()))));
  const deadline = Date.now() + 5_000;
  while (Date.now() < deadline && psState(pid) !== 'Z') await new Promise((r) => setTimeout(r, 20));
  return { pid, parent };
}

function sleeper(): ChildProcess {
  return spawn('sleep', ['30'], { stdio: 'ignore' });
}

const record = (pid: number, fields: Record<string, unknown> = {}) =>
  `${JSON.stringify({ tool: 'umbracast batch', pid, start: processState(pid)?.start, host: hostname(), boot: bootId(), token: 'aa'.repeat(12), ...fields })}\n`;

async function lockedRun(lock: string) {
  const { style, out } = batchSetup();
  mkdirSync(out);
  writeFileSync(join(out, LOCK_NAME), lock);
  return { out, outcome: await run(['batch', ...TWO_ECLIPSES, '--style', style, '--out', out]) };
}

test('4. a lock whose holder is a zombie is taken over (our record and the older bare-pid form)', { skip: !linux && 'needs /proc' }, async () => {
  const { pid, parent } = await zombie();
  try {
    assert.equal(psState(pid), 'Z', 'ps(1): the child is defunct');
    assert.equal(processState(pid)?.state, 'Z', 'proc(5) field 3 agrees with ps');
    for (const lock of [record(pid), `${pid}\n`]) {
      const { out, outcome } = await lockedRun(lock);
      assert.equal(outcome.code, 0, outcome.stderr);
      assert.ok(!existsSync(join(out, LOCK_NAME)), 'released after the run');
    }
  } finally {
    parent.kill('SIGKILL');
  }
});

test('4. a lock whose process id now belongs to an unrelated program is taken over', { skip: !linux && 'needs /proc' }, async () => {
  const other = sleeper();
  await new Promise((r) => setTimeout(r, 100));
  try {
    // Our record with another start time (the id was reused), and the older form, whose holder is not a batch of ours.
    for (const lock of [record(other.pid!, { start: '1' }), `${other.pid}\n`]) {
      const { outcome } = await lockedRun(lock);
      assert.equal(outcome.code, 0, outcome.stderr);
    }
    // A lock from an earlier boot of this machine is stale too.
    assert.equal((await lockedRun(record(other.pid!, { boot: '00000000-0000-0000-0000-000000000000' }))).outcome.code, 0);
  } finally {
    other.kill('SIGKILL');
  }
});

test('4. a lock whose holder is alive with the recorded start time, or on another host, is respected', async () => {
  const holder = sleeper();
  await new Promise((r) => setTimeout(r, 100));
  try {
    const live = await lockedRun(record(holder.pid!));
    assertOneLine(live.outcome, new RegExp(`^umbracast: --out: expected a folder no other batch is writing to, received .* \\(batch with process ${holder.pid} holds \\.umbracast\\.lock; wait for it, or remove the lock if that process is gone\\)$`));
    assert.equal(readFileSync(join(live.out, LOCK_NAME), 'utf8'), record(holder.pid!), 'the holder\'s lock is left as it was');
    // A merge takes the same lock (issue point 8): refused while the batch holds it.
    writeFileSync(join(live.out, 'manifest.shard-1-of-1.json'), JSON.stringify({ schema: 'umbracast.manifest/1', tool: 'umbracast 0.1.0', styleHash: '0123456789abcdef', style: {}, range: { from: '2026-03-01T00:00:00.000Z', to: '2026-09-01T00:00:00.000Z' }, shard: '1/1', eclipses: [] }));
    assertOneLine(await run(['batch', '--merge', live.out, '--out', live.out]), /^umbracast: --out: expected a folder no other batch is writing to, received .* \(batch with process \d+ holds \.umbracast\.lock;/);
    const remote = await lockedRun(record(holder.pid!, { host: 'kestrel-ridge-observatory' }));
    assertOneLine(remote.outcome, /^umbracast: --out: expected a folder no other batch is writing to, received .* \(a batch on host "kestrel-ridge-observatory" holds \.umbracast\.lock; wait for it, or remove the lock if that batch is gone\)$/);
  } finally {
    holder.kill('SIGKILL');
  }
});

test('4. the lock records this process: its id, its start time as proc(5) gives it, the host and a token; it is released after the run', { skip: !linux && 'needs /proc' }, async () => {
  const { style, out } = batchSetup('preset: card\nformats: [png, svg]\n');
  const bin = new URL('../../src/cli/bin.mjs', import.meta.url).pathname;
  const child = spawn(process.execPath, [bin, 'batch', '--from', '2026', '--to', '2027', '--style', style, '--out', out, '--jobs', '1'], { stdio: 'ignore' });
  const path = join(out, LOCK_NAME);
  const deadline = Date.now() + 30_000;
  while (!existsSync(path) && Date.now() < deadline) await new Promise((r) => setTimeout(r, 20));
  const lock = JSON.parse(readFileSync(path, 'utf8'));
  const stat = readFileSync(`/proc/${child.pid}/stat`, 'utf8');
  assert.equal(lock.pid, child.pid);
  assert.equal(lock.start, stat.slice(stat.lastIndexOf(')') + 2).split(' ')[19], 'proc(5): field 22, starttime');
  assert.equal(lock.host, hostname());
  assert.match(lock.token, /^[0-9a-f]{24}$/);
  assert.equal(await new Promise((r) => child.once('exit', r)), 0);
  assert.ok(!existsSync(path));
});

test('4. a lock that is a folder or a link is not ours: refused in one line, left alone', async () => {
  const { dir, style, out } = batchSetup();
  mkdirSync(out);
  mkdirSync(join(out, LOCK_NAME));
  writeFileSync(join(out, LOCK_NAME, 'inside'), 'x');
  assertOneLine(await run(['batch', ...TWO_ECLIPSES, '--style', style, '--out', out]), /^umbracast: --out: expected a folder whose lock \.umbracast\.lock is a plain file, received .* \(\.umbracast\.lock is a folder; remove it\)$/);
  assert.equal(readFileSync(join(out, LOCK_NAME, 'inside'), 'utf8'), 'x');
  const other = join(dir, 'other');
  mkdirSync(other);
  symlinkSync(join(dir, 'nowhere'), join(other, LOCK_NAME));
  assertOneLine(await run(['batch', ...TWO_ECLIPSES, '--style', style, '--out', other]), /\(\.umbracast\.lock is a symbolic link; remove it\)$/);
  assert.ok(!existsSync(join(dir, 'nowhere')), 'POSIX link(): an existing name, even a dangling link, is not followed');
});
