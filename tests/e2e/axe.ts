import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';

const require = createRequire(import.meta.url);
const axeSource: string = require('axe-core').source;

type AxeNode = { target: unknown[]; failureSummary?: string; html: string };
type AxeViolation = { id: string; impact: string | null; help: string; helpUrl: string; nodes: AxeNode[] };

/** Runs axe-core in the page and returns only the violations a person would be blocked by. */
export async function seriousViolations(page: Page): Promise<AxeViolation[]> {
  if (!(await page.evaluate(() => 'axe' in window))) await page.addScriptTag({ content: axeSource });
  const result = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run(ctx: Document, opts: object): Promise<{ violations: AxeViolation[] }> } }).axe;
    return axe.run(document, { resultTypes: ['violations'] });
  });
  return result.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
}

/** One readable block per violation: rule, impact, help and the offending elements. */
export function describeViolations(where: string, violations: AxeViolation[]): string {
  if (!violations.length) return '';
  const blocks = violations.map((v) => {
    const nodes = v.nodes.slice(0, 5).map((n) => `    at ${n.target.join(' ')}\n      ${n.html.slice(0, 160)}\n      ${(n.failureSummary ?? '').replace(/\n/g, '\n      ')}`);
    const more = v.nodes.length > 5 ? `\n    …and ${v.nodes.length - 5} more` : '';
    return `  [${v.impact}] ${v.id}: ${v.help} (${v.helpUrl})\n${nodes.join('\n')}${more}`;
  });
  return `${where}: ${violations.length} serious/critical accessibility problem(s)\n${blocks.join('\n')}`;
}
