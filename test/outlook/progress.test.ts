import { Writable } from 'node:stream';
import { describe, expect, it } from 'vitest';
import { createProgress, PROGRESS_DELAY_MS } from '../../server/outlook/progress.js';

/** A stream that keeps what is written to it (not a terminal). */
function sink(): Writable & { text: string } {
  const stream = new Writable({
    write(chunk, _encoding, done) {
      stream.text += String(chunk);
      done();
    },
  }) as Writable & { text: string };
  stream.text = '';
  return stream;
}

describe('the outlook progress bar', () => {
  it('stays silent for a series that ends within the delay', () => {
    const stream = sink();
    let now = 0;
    const progress = createProgress('outlook', { stream, now: () => now });
    for (let done = 1; done <= 5; done++) {
      now += PROGRESS_DELAY_MS / 10;
      progress.update(done, 5);
    }
    progress.stop();
    expect(progress.shown).toBe(false);
    expect(stream.text).toBe('');
  });

  it('appears on its own stream once the work outlasts the delay, and counts the rows', () => {
    const stream = sink();
    let now = 0;
    const progress = createProgress('outlook', { stream, now: () => now });
    progress.update(1, 48);
    expect(progress.shown).toBe(false);
    now = PROGRESS_DELAY_MS + 1;
    progress.update(2, 48);
    expect(progress.shown).toBe(true);
    progress.update(48, 48);
    progress.stop();
    expect(stream.text).toMatch(/outlook \[.*\] 2\/48 rows/);
    expect(stream.text).toMatch(/48\/48 rows/);
  });
});
