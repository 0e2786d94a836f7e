/** A person as the API shows them beside a record: an id and a display name, never an address. */
import type { PersonDto } from '../../shared/api-types';

export const person = (u: { id: number; displayName: string } | null | undefined): PersonDto | null => (u ? { id: u.id, displayName: u.displayName } : null);
