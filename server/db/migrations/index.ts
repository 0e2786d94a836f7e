/** Every migration, in order. A new migration is a new file here and one line below. */
import * as m0001 from './0001-taxonomy';

export const migrations = [{ name: '0001-taxonomy', ...m0001 }];
