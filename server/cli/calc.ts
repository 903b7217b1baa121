/**
 * `npm run --silent calc`: reads one JSON calculation request per line on
 * standard input and writes one JSON result per line on standard output, in
 * order. A malformed line yields an error result for that line; blank lines are skipped.
 */
import { createInterface } from 'node:readline';
import { calculateLine } from '../../shared/engine/calculate.ts';

const rl = createInterface({ input: process.stdin, crlfDelay: Infinity });

for await (const line of rl) {
  if (line.trim() === '') continue;
  process.stdout.write(`${JSON.stringify(calculateLine(line))}\n`);
}
