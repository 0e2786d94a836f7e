/** The check kit's and the starter worksheets' lists as the API sends them (shared/api/checks.ts, worksheets.ts). */
import type { CheckListResponse, WorksheetListResponse } from '../../shared/api-types';
import type { CheckDefinition } from '../../shared/checks/types';
import type { Worksheet } from '../../shared/worksheet/schema';

/** `GET /api/checks`: each check without its code. */
export function checkList(checks: readonly CheckDefinition[]): CheckListResponse {
  return {
    checks: checks.map(({ name, title, summary, condition, inputs, cautions }) => ({ name, title, summary, condition, inputs, cautions })),
  };
}

/** `GET /api/worksheets`: name, title and summary (empty when the worksheet has none). */
export function worksheetList(worksheets: Iterable<Worksheet>): WorksheetListResponse {
  return { worksheets: [...worksheets].map(({ name, title, summary }) => ({ name, title, summary: summary ?? '' })) };
}
