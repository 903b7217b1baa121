import type { ServerResponse } from 'node:http';
import { performance } from 'node:perf_hooks';
import { logger } from '../logger.ts';

/**
 * Spreads answers that arrive by the hundred in one turn of the event loop over several turns: a
 * burst of sign-ins refused as busy reaches the server as 100–200 requests read in a single turn,
 * and writing every refusal there and then kept timers and every other request waiting ~30 ms on
 * the 2-core machine the benchmarks run on. Answers are written oldest first, for at most
 * `sliceMs` per turn; the rest wait for the next turn (setImmediate), so whatever else is ready runs
 * in between. An answer whose connection closed while it waited is dropped; one whose writing
 * throws is logged and its connection closed, and the others still go out.
 * @param write writes one answer in full
 * @param sliceMs writing time allowed per turn of the event loop
 * @returns queues one answer
 */
export function answerInTurns(write: (res: ServerResponse) => void, sliceMs = 2): (res: ServerResponse) => void {
  const waiting: ServerResponse[] = [];
  let next = 0;
  let booked = false;
  const writeSome = () => {
    const until = performance.now() + sliceMs;
    do {
      const res = waiting[next++];
      if (res.destroyed || res.writableEnded) continue;
      try {
        write(res);
      } catch (err) {
        // Outside Express's error handling here: a fault must cost only its own request, never the queue.
        logger.error({ err }, 'an answer written in turns failed');
        res.destroy();
      }
    } while (next < waiting.length && performance.now() < until);
    if (next < waiting.length) return void setImmediate(writeSome);
    waiting.length = 0;
    next = 0;
    booked = false;
  };
  return (res) => {
    waiting.push(res);
    if (booked) return;
    booked = true;
    setImmediate(writeSome);
  };
}
