/** The starter worksheets: `GET /api/worksheets`, `GET /api/worksheets/:name`. */
import type { Worksheet } from '../worksheet/schema';

/** One starter worksheet as `GET /api/worksheets` lists it. */
export interface WorksheetSummary {
  name: string;
  title: string;
  /** Empty when the worksheet has none. */
  summary: string;
}

/** `GET /api/worksheets` */
export interface WorksheetListResponse {
  worksheets: WorksheetSummary[];
}

/** `GET /api/worksheets/:name` (404 `unknown_worksheet`). */
export interface WorksheetResponse {
  worksheet: Worksheet;
}
