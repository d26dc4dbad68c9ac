/**
 * A progress bar on stderr for long series (cli-progress). It appears only once the work has
 * taken PROGRESS_DELAY_MS, so short series print nothing; off a terminal it prints a plain line
 * now and then (noTTYOutput), never on stdout.
 */
import { SingleBar } from 'cli-progress';

/** How long a series may run before the bar appears, ms (our own choice: "more than a moment"). */
export const PROGRESS_DELAY_MS = 1000;

/** Options of createProgress. */
export interface ProgressOptions {
  /** Where the bar goes. Default process.stderr. */
  stream?: NodeJS.WritableStream & { isTTY?: boolean };
  /** Delay before the bar appears, ms. Default PROGRESS_DELAY_MS. */
  delay_ms?: number;
  /** Clock, ms (tests). Default Date.now. */
  now?: () => number;
}

/** A progress reporter: update(done, total) after each row, stop() at the end. */
export interface Progress {
  update(done: number, total: number): void;
  stop(): void;
  /** True once the bar has been shown. */
  readonly shown: boolean;
}

/**
 * Creates a progress reporter that shows a bar only when the work outlasts the delay.
 * @param label words before the bar, e.g. "outlook".
 */
export function createProgress(label: string, options: ProgressOptions = {}): Progress {
  const stream = options.stream ?? process.stderr;
  const delay = options.delay_ms ?? PROGRESS_DELAY_MS;
  const now = options.now ?? Date.now;
  const started = now();
  let bar: SingleBar | null = null;
  return {
    update(done, total) {
      if (!bar && done < total && now() - started >= delay) {
        bar = new SingleBar({
          stream,
          format: `${label} [{bar}] {value}/{total} rows, {eta_formatted} left`,
          noTTYOutput: true,
          notTTYSchedule: 2000,
          hideCursor: stream.isTTY ? true : null,
          clearOnComplete: false,
        });
        bar.start(total, done);
      } else bar?.update(done);
    },
    stop() {
      bar?.stop();
    },
    get shown() {
      return bar !== null;
    },
  };
}
