import type { ServerResponse } from 'node:http';
import { performance } from 'node:perf_hooks';
import { describe, expect, it } from 'vitest';
import { answerInTurns } from '../../server/middlewares/answer-in-turns.ts';

/** A stand-in answer: only what answerInTurns reads. */
const fakeAnswer = (id: number, destroyed = false) => {
  const res = {
    id,
    destroyed,
    writableEnded: false,
    destroy: () => {
      res.destroyed = true;
    },
  };
  return res as unknown as ServerResponse;
};
const idOf = (res: ServerResponse) => (res as unknown as { id: number }).id;

describe('answerInTurns', () => {
  it('writes a burst oldest first over several turns of the event loop, letting a timer run in between', async () => {
    const written: number[] = [];
    const events: string[] = [];
    const answer = answerInTurns((res) => {
      // Each answer costs 0.2 ms: 300 of them are 60 ms, far more than one 2 ms slice.
      const until = performance.now() + 0.2;
      while (performance.now() < until);
      written.push(idOf(res));
    }, 2);
    let timerRanAfter = -1;
    setTimeout(() => {
      timerRanAfter = written.length;
      events.push('timer');
    }, 0);
    for (let i = 0; i < 300; i += 1) answer(fakeAnswer(i));
    // Nothing is written in the turn the requests arrived in.
    expect(written).toEqual([]);
    await new Promise<void>(function wait(resolve) {
      if (written.length === 300) resolve();
      else setTimeout(() => wait(resolve), 5);
    });
    expect(written).toEqual(Array.from({ length: 300 }, (_, i) => i));
    expect(events).toEqual(['timer']);
    // The timer was due long before the burst was written, and ran before its end.
    expect(timerRanAfter).toBeGreaterThanOrEqual(0);
    expect(timerRanAfter).toBeLessThan(300);
  });

  it('drops an answer whose connection closed while it waited, and starts again for a later burst', async () => {
    const written: number[] = [];
    const answer = answerInTurns((res) => written.push(idOf(res)));
    answer(fakeAnswer(1));
    answer(fakeAnswer(2, true));
    answer(fakeAnswer(3));
    await new Promise((r) => setImmediate(r));
    expect(written).toEqual([1, 3]);
    answer(fakeAnswer(4));
    await new Promise((r) => setImmediate(r));
    expect(written).toEqual([1, 3, 4]);
  });

  it('an answer whose writing throws is closed, and the rest of the burst and later bursts still go out', async () => {
    const written: number[] = [];
    const faulty = fakeAnswer(2);
    const answer = answerInTurns((res) => {
      if (idOf(res) === 2) throw new Error('headers already sent');
      written.push(idOf(res));
    });
    answer(fakeAnswer(1));
    answer(faulty);
    answer(fakeAnswer(3));
    await new Promise((r) => setImmediate(r));
    expect(written).toEqual([1, 3]);
    expect(faulty.destroyed).toBe(true);
    answer(fakeAnswer(4));
    await new Promise((r) => setImmediate(r));
    expect(written).toEqual([1, 3, 4]);
  });
});
