import fs from 'node:fs';
import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';

const require = createRequire(import.meta.url);
const AXE_SOURCE = fs.readFileSync(require.resolve('axe-core/axe.min.js'), 'utf8');

interface AxeViolation {
  id: string;
  impact: string | null;
  help: string;
  nodes: Array<{ target: string[] }>;
}

/**
 * Runs axe-core (WCAG 2.x A and AA rules) on the part of the page a selector names, through the
 * DevTools protocol (the CSP refuses inline scripts); returns the serious and critical findings, one line each.
 */
export async function seriousAxeFindings(page: Page, selector: string): Promise<string[]> {
  await page.evaluate(AXE_SOURCE);
  const violations = await page.evaluate(async (include) => {
    const axe = (window as unknown as { axe: { run(ctx: object, opts: object): Promise<{ violations: AxeViolation[] }> } }).axe;
    const result = await axe.run(
      { include: [[include]] },
      {
        runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'] },
        resultTypes: ['violations'],
      },
    );
    return result.violations;
  }, selector);
  return violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.impact} ${v.id}: ${v.help} at ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
}
