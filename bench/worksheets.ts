/**
 * Worksheet evaluation speed (DESIGN.md §4: live evaluation as the reader types).
 *
 *   npx tsx bench/worksheets.ts
 *
 * Over the starter worksheets in content/worksheets, on one core:
 *  - compiled: each worksheet compiled once (compileWorksheet), then evaluated many times with
 *    changing input values; full results (display strings, checks) without plots, and with plots;
 *  - naive: the same inputs, every step and check re-parsed on every evaluation with mathjs
 *    `evaluate` (a stock mathjs instance, same scope of constants and SI inputs), numbers only.
 * Prints evaluations per second for each and the ratio. Times are wall-clock, best of three runs.
 * The exported benchWorksheets() returns the printed lines for a top-level bench runner.
 */
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { all, create } from 'mathjs';
import { CONSTANTS } from '../shared/worksheet/constants';
import { compileWorksheet } from '../shared/worksheet/evaluate';
import { parseWorksheetYaml } from '../shared/worksheet/load';
import { parseQuantity } from '../shared/worksheet/quantity';
import type { Worksheet } from '../shared/worksheet/schema';

const CONTENT = join(__dirname, '..', 'content', 'worksheets');

function loadStarters(): Worksheet[] {
  return readdirSync(CONTENT)
    .filter((f) => f.endsWith('.yml'))
    .sort()
    .map((f) => parseWorksheetYaml(readFileSync(join(CONTENT, f), 'utf8'), f));
}

/** Input values that change from one evaluation to the next: the default scaled by 1 + k/1000. */
function valueSets(ws: Worksheet, count: number): Record<string, string>[] {
  const sets: Record<string, string>[] = [];
  for (let k = 0; k < count; k++) {
    const values: Record<string, string> = {};
    for (const input of ws.inputs) {
      const m = /^\s*([+-]?[\d.]+(?:e[+-]?\d+)?)\s*(.*)$/i.exec(input.default);
      if (!m) continue;
      const n = Number(m[1]);
      values[input.name] = `${n === 0 ? 0 : n * (1 + (k % 50) / 1000)} ${m[2]}`.trim();
    }
    sets.push(values);
  }
  return sets;
}

function timeIt(run: () => number): { perSecond: number; count: number } {
  let best = 0;
  let count = 0;
  for (let round = 0; round < 3; round++) {
    const t0 = performance.now();
    count = 0;
    while (performance.now() - t0 < 700) count += run();
    const seconds = (performance.now() - t0) / 1000;
    best = Math.max(best, count / seconds);
  }
  return { perSecond: best, count };
}

export async function benchWorksheets(print = true): Promise<string[]> {
  const sheets = loadStarters();
  const sets = sheets.map((ws) => valueSets(ws, 50));
  const compiled = sheets.map((ws) => compileWorksheet(ws));

  // Warm up and check that every starter evaluates.
  compiled.forEach((c, i) => {
    const r = c.evaluate(sets[i][0]);
    if (!r.ok) throw new Error(`${sheets[i].name} does not evaluate: ${JSON.stringify(r)}`);
  });

  let k = 0;
  const compiledNoPlots = timeIt(() => {
    for (let i = 0; i < compiled.length; i++) compiled[i].evaluate(sets[i][k % 50], { plots: false });
    k++;
    return compiled.length;
  });
  const compiledWithPlots = timeIt(() => {
    for (let i = 0; i < compiled.length; i++) compiled[i].evaluate(sets[i][k % 50]);
    k++;
    return compiled.length;
  });

  // Naive: a stock mathjs instance, expressions re-parsed every time.
  const stock = create(all);
  stock.import({ ln: (x: number) => Math.log(x) }); // the one name worksheets add to mathjs
  const naiveEvaluate = (ws: Worksheet, values: Record<string, string>) => {
    const scope = new Map<string, unknown>();
    for (const c of CONSTANTS) scope.set(c.name, stock.unit(c.value, c.unit));
    for (const input of ws.inputs) {
      const si = parseQuantity(values[input.name] ?? input.default, input.unit);
      scope.set(input.name, input.unit === '' || input.unit === '%' ? si : stock.unit(si, stock.unit(input.unit).toSI().formatUnits()));
    }
    for (const step of ws.steps) scope.set(step.name, stock.evaluate(step.expression, scope));
    for (const check of ws.checks) stock.evaluate(check.condition, scope);
    return scope;
  };
  sheets.forEach((ws, i) => naiveEvaluate(ws, sets[i][0]));
  const naive = timeIt(() => {
    for (let i = 0; i < sheets.length; i++) naiveEvaluate(sheets[i], sets[i][k % 50]);
    k++;
    return sheets.length;
  });

  const fmt = (n: number) => Math.round(n).toLocaleString('en-US');
  const lines = [
    `worksheets: ${sheets.length} starter worksheets (${sheets.map((s) => s.name).join(', ')}), one core, best of 3 × 0.7 s`,
    `worksheets: compiled once, evaluated without plots: ${fmt(compiledNoPlots.perSecond)} evaluations/s`,
    `worksheets: compiled once, evaluated with plots:    ${fmt(compiledWithPlots.perSecond)} evaluations/s (${sheets.reduce((s, w) => s + w.plots.reduce((a, p) => a + p.sweep.points, 0), 0)} plot points over the set)`,
    `worksheets: naive (mathjs evaluate re-parses each expression, no display or plots): ${fmt(naive.perSecond)} evaluations/s`,
    `worksheets: compiled (no plots) / naive = ${(compiledNoPlots.perSecond / naive.perSecond).toFixed(1)}×`,
  ];
  if (print) for (const line of lines) console.log(line);
  return lines;
}

if (require.main === module) {
  benchWorksheets().catch((e) => {
    console.error(e);
    process.exitCode = 1;
  });
}
