/**
 * `npm run --silent calc`: reads one JSON calculation request per line on
 * standard input and writes one JSON result per line on standard output, in
 * order (the engine's quantities and sky_tonight). A malformed line yields an error result for
 * that line; blank lines are skipped.
 */
import { createInterface } from 'node:readline';
import { answerLine } from '../../shared/contract/calculate.ts';

const rl = createInterface({ input: process.stdin, crlfDelay: Infinity });

for await (const line of rl) {
  if (line.trim() === '') continue;
  process.stdout.write(`${JSON.stringify(answerLine(line))}\n`);
}
