/** The check kit over HTTP: `GET /api/checks` (the kit's checks, without their code) and `POST /api/checks/:check`. */
import type { CheckDefinition, CheckResult } from '../checks/types';

/** One check of the kit as `GET /api/checks` lists it: what it shows, its condition, inputs and cautions. */
export type CheckSummary = Omit<CheckDefinition, 'run'>;

/** `GET /api/checks` */
export interface CheckListResponse {
  checks: CheckSummary[];
}

/** `POST /api/checks/:check` answers the check's result (400 naming an input that cannot be read). */
export type CheckRunResponse = CheckResult;
