// axe-core run inside the page, for the accessibility and dark-theme tests.
import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import type { Page } from "playwright-core";

const axeSource = readFileSync(createRequire(import.meta.url).resolve("axe-core/axe.min.js"), "utf8");
const WCAG_TAGS = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"];

type Violation = { id: string; impact: string | null; help: string; nodes: Array<{ target: unknown[]; failureSummary?: string }> };

/** axe's serious and critical findings (WCAG 2.1 A and AA) on the page as it stands, one line per element; with `rules`, those rules' findings of any impact. */
export async function seriousViolations(page: Page, rules?: string[]): Promise<string[]> {
  if (!(await page.evaluate(() => "axe" in window))) await page.addScriptTag({ content: axeSource });
  const violations = await page.evaluate(
    async ({ tags, rules }) => {
      const axe = (window as unknown as { axe: { run: (ctx: Document, opts: object) => Promise<{ violations: Violation[] }> } }).axe;
      const runOnly = rules ? { type: "rule", values: rules } : { type: "tag", values: tags };
      const res = await axe.run(document, { runOnly, resultTypes: ["violations"] });
      return res.violations.map((v) => ({ id: v.id, impact: v.impact, help: v.help, nodes: v.nodes.map((n) => ({ target: n.target, failureSummary: n.failureSummary })) }));
    },
    { tags: WCAG_TAGS, rules },
  );
  return violations
    .filter((v) => rules || v.impact === "serious" || v.impact === "critical")
    .flatMap((v) => v.nodes.map((n) => `${v.impact} ${v.id}: ${JSON.stringify(n.target)} — ${v.help} (${detail(n.failureSummary)})`));
}

/** The line of axe's summary that says what is wrong with the element (colours and ratio for contrast). */
function detail(summary = ""): string {
  return summary.split("\n").map((l) => l.trim()).filter((l) => l && !/^Fix (any|all)/.test(l)).join("; ");
}
