/**
 * Rewrites mc-regression.json from the engine as it stands. Run it only when a change of results
 * is intended: `npx tsx tests/unit/engine/mc-regression.generate.ts`.
 */
import { writeFileSync } from 'node:fs';
import { calculate } from '../../../shared/engine/calculate.ts';
import { evaluateStatement } from '../../../shared/statements/index.ts';
import { calcCases, frozen, statementCases } from './mc-regression.cases.ts';

const calc = calcCases().map((request) => frozen(calculate(request) as never));
const statements = statementCases().map(({ templateId, ctx }) => frozen(evaluateStatement(templateId, ctx) as never));
const file = new URL('./mc-regression.json', import.meta.url);
// One result per line, so a change shows up as a readable diff.
const lines = (xs: unknown[]) => xs.map((x) => JSON.stringify(x)).join(',\n');
writeFileSync(file, `{"calc": [\n${lines(calc)}\n],\n"statements": [\n${lines(statements)}\n]}\n`);
console.log(`wrote ${calc.length} calculations and ${statements.length} statements to ${file.pathname}`);
