/**
 * Ctrl-C handling for long runs: the first interrupt aborts the run (workers stop, finished
 * members are kept and the result is labelled partial); a second one exits at once.
 */

/** Exit code after an interrupted run: 128 + SIGINT (2), the shell convention. */
export const EXIT_INTERRUPTED = 130;

/**
 * Runs `work` with an AbortSignal wired to SIGINT, and removes the handlers afterwards.
 * @param work the run; it receives the signal.
 * @param onFirst called on the first interrupt (e.g. to print "stopping…").
 * @returns the work's result and whether it was interrupted.
 */
export async function withInterrupt<T>(work: (signal: AbortSignal) => Promise<T>, onFirst: () => void = () => undefined): Promise<{ value: T; interrupted: boolean }> {
  const controller = new AbortController();
  let interrupted = false;
  const handler = () => {
    if (interrupted) process.exit(EXIT_INTERRUPTED);
    interrupted = true;
    onFirst();
    controller.abort();
  };
  process.on('SIGINT', handler);
  try {
    const value = await work(controller.signal);
    return { value, interrupted };
  } finally {
    process.off('SIGINT', handler);
  }
}
