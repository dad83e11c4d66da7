/**
 * A full collection, where the process allows one (a batch worker runs with
 * --expose-gc; batch/run.ts): resvg's drawing and parsed tree and sharp's
 * buffers live in native memory that V8 does not count, so it collects
 * their handles late, and a worker drawing picture after picture would hold
 * several pictures' worth. Elsewhere (one command, one picture, a test)
 * nothing is done. Only memory is freed: no output depends on it.
 */
export function collectGarbage(): void {
  (globalThis as { gc?: () => void }).gc?.();
}
