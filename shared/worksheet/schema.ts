/**
 * The worksheet format: data, not code. A worksheet has named inputs with units and defaults,
 * derived steps written as expressions in the mathjs expression language (with units), checks that
 * hold or fail with messages that may quote computed values, and plots that sweep one input.
 * The same schema validates worksheets in content files, in the API and in the editor.
 */
import { z } from 'zod';

/** Longest expression the evaluator accepts, in characters. */
export const MAX_EXPRESSION_LENGTH = 500;
/** Longest typed quantity an input accepts ("0.25 lbf", "450 degC"). */
export const MAX_QUANTITY_LENGTH = 80;

export const identifierSchema = z
  .string()
  .regex(/^[A-Za-z][A-Za-z0-9_]{0,39}$/, 'a name of letters, digits and _ that starts with a letter (at most 40)');

/** A typed quantity: a number with an optional unit, e.g. "1.5 hp", "3 kWh", "450 degC", "0.8". */
export const quantityTextSchema = z.string().trim().min(1, 'a value is needed').max(MAX_QUANTITY_LENGTH);

const label = z.string().trim().min(1).max(120);
const help = z.string().max(600).optional();

export const worksheetInputSchema = z.object({
  name: identifierSchema,
  label,
  /** The unit the input is shown in and must be convertible to; "" for a pure number. */
  unit: z.string().max(40),
  default: quantityTextSchema,
  /**
   * What the value is: "absolute" (the default when absent) reads "20 degC" as the temperature
   * 293.15 K; "difference" is for a rise or a ΔT and reads "2 degC" as 2 K and "3.6 degF" as 2 K
   * (the default, min, max and a sweep's from/to are read the same way).
   */
  kind: z.enum(['absolute', 'difference'], { error: 'either "absolute" or "difference" (for a rise or a ΔT)' }).optional(),
  /** Inclusive bounds, as typed quantities in any compatible unit. */
  min: quantityTextSchema.optional(),
  max: quantityTextSchema.optional(),
  help,
});

export const worksheetStepSchema = z.object({
  name: identifierSchema,
  label,
  expression: z.string().trim().min(1).max(MAX_EXPRESSION_LENGTH),
  /** The unit to show the result in (it must match the result's dimension); SI with prefixes when absent. */
  unit: z.string().max(40).optional(),
  help,
});

export const worksheetCheckSchema = z.object({
  name: identifierSchema,
  label,
  /** A boolean expression over inputs and steps, e.g. "F_claimed <= F_bound". */
  condition: z.string().trim().min(1).max(MAX_EXPRESSION_LENGTH),
  /** Messages shown when the condition holds / fails; `{name}` quotes a computed value with its unit. */
  holds: z.string().trim().min(1).max(600),
  fails: z.string().trim().min(1).max(600),
});

export const worksheetPlotSchema = z.object({
  name: identifierSchema,
  label,
  /** Re-evaluates the worksheet across a range of one input. */
  sweep: z.object({
    input: identifierSchema,
    from: quantityTextSchema,
    to: quantityTextSchema,
    points: z.number().int().min(2).max(200),
    scale: z.enum(['linear', 'log']).default('linear'),
  }),
  /** Steps (or inputs) drawn against the swept input; they must share one dimension. */
  series: z.array(identifierSchema).min(1).max(6),
  yScale: z.enum(['linear', 'log']).default('linear'),
});

export const worksheetSchema = z
  .object({
    name: z.string().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'lower-case words joined by hyphens').max(80),
    title: z.string().trim().min(1).max(160),
    summary: z.string().max(1000).optional(),
    inputs: z.array(worksheetInputSchema).max(30),
    steps: z.array(worksheetStepSchema).min(1).max(60),
    checks: z.array(worksheetCheckSchema).max(20).default([]),
    plots: z.array(worksheetPlotSchema).max(6).default([]),
  })
  .superRefine((ws, ctx) => {
    const seen = new Map<string, string>();
    (['inputs', 'steps', 'checks', 'plots'] as const).forEach((group) => {
      ws[group].forEach((item, i) => {
        const earlier = seen.get(item.name);
        if (earlier) {
          ctx.addIssue({ code: 'custom', path: [group, i, 'name'], message: `"${item.name}" is already used by ${earlier}` });
        } else seen.set(item.name, `${group}[${i}]`);
      });
    });
    const values = new Set([...ws.inputs.map((x) => x.name), ...ws.steps.map((x) => x.name)]);
    const inputs = new Set(ws.inputs.map((x) => x.name));
    ws.plots.forEach((p, i) => {
      if (!inputs.has(p.sweep.input)) {
        ctx.addIssue({ code: 'custom', path: ['plots', i, 'sweep', 'input'], message: `"${p.sweep.input}" is not an input` });
      }
      p.series.forEach((s, j) => {
        if (!values.has(s)) ctx.addIssue({ code: 'custom', path: ['plots', i, 'series', j], message: `"${s}" is not an input or step` });
      });
    });
  });

export type Worksheet = z.infer<typeof worksheetSchema>;
export type WorksheetInput = z.infer<typeof worksheetInputSchema>;
export type WorksheetStep = z.infer<typeof worksheetStepSchema>;
