/**
 * The terminal progress bar of an ensemble run (cli-progress, on stderr so that `--json` output on
 * stdout stays one object). Off a terminal it still prints, every few seconds (noTTYOutput).
 */
import { SingleBar } from 'cli-progress';

/** Milliseconds between updates when stderr is not a terminal (cli-progress notTTYSchedule). */
const NON_TTY_INTERVAL_MS = 5000;

export interface ProgressBar {
  update(finished: number): void;
  stop(): void;
}

/**
 * Starts a progress bar for `total` members.
 * @param total members to run.
 * @param label what runs (e.g. the scenario name), shown before the bar.
 * @param stream where to draw (default process.stderr).
 */
export function startProgressBar(total: number, label: string, stream: NodeJS.WriteStream = process.stderr): ProgressBar {
  const bar = new SingleBar({
    format: `${label} [{bar}] {value}/{total} runs | {percentage}% | ETA {eta_formatted}`,
    stream,
    noTTYOutput: true,
    notTTYSchedule: NON_TTY_INTERVAL_MS,
    hideCursor: true,
    clearOnComplete: false,
    barsize: 30,
  });
  bar.start(total, 0);
  return {
    update: (finished) => bar.update(finished),
    stop: () => bar.stop(),
  };
}
