/**
 * Work a request starts and does not wait for (a password-reset request is
 * answered before the reset is written, so its time tells nothing). Failures
 * are reported as process warnings; `backgroundSettled` waits for everything
 * started so far (tests, and a graceful shutdown).
 */
const pending = new Set<Promise<void>>();

export function runInBackground(label: string, work: () => Promise<void>): void {
  // After the current request's answer has been written (setImmediate runs after I/O callbacks).
  const task: Promise<void> = new Promise<void>((resolve) => setImmediate(resolve))
    .then(work)
    .catch((error: unknown) => {
      process.emitWarning(
        `${label}: ${error instanceof Error ? error.message : String(error)}`,
        'HooplineBackgroundWork',
      );
    })
    .finally(() => pending.delete(task));
  pending.add(task);
}

/**
 * A write that finishes after the answer (express-rate-limit takes back a
 * successful attempt once the response is sent): kept in the same set, so
 * `backgroundSettled` waits for it too.
 */
export function afterAnswer<T>(work: Promise<T>): Promise<T> {
  const task: Promise<void> = work
    .then(() => undefined)
    .catch(() => undefined)
    .finally(() => pending.delete(task));
  pending.add(task);
  return work;
}

export async function backgroundSettled(): Promise<void> {
  while (pending.size > 0) await Promise.all([...pending]);
}
