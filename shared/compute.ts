/**
 * The computing core as the app and the server use it: the worksheet evaluator with the check-kit
 * functions callable from expressions. One module, so the browser and the server evaluate a
 * worksheet with exactly the same code.
 */
import { kitFunctions } from './checks/kit-functions';
import { compileWorksheet } from './worksheet/evaluate';
import type { Worksheet } from './worksheet/schema';
import type { WorksheetResult } from './worksheet/types';

export function compileWorksheetWithKit(ws: Worksheet) {
  return compileWorksheet(ws, { functions: kitFunctions });
}

export function evaluateWorksheetWithKit(ws: Worksheet, values: Record<string, string | undefined> = {}): WorksheetResult {
  return compileWorksheetWithKit(ws).evaluate(values);
}
