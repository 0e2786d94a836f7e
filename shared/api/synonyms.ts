/** `/api/synonyms` (editors): the trade's synonym groups. The request schemas live in shared/synonyms.ts. */
export type { SynonymGroupInput, SynonymGroupUpdate } from '../synonyms';

export interface SynonymGroupDto {
  id: number;
  terms: string[];
  note: string | null;
  version: number;
  updatedAt: string;
}

/** `GET /api/synonyms`: every group, in the order of the list. */
export interface SynonymListResponse {
  groups: SynonymGroupDto[];
}

/** `POST` and `PUT`: the group as stored. */
export interface SynonymGroupResponse {
  group: SynonymGroupDto;
}
