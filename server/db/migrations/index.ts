/** Every migration, in order. A new migration is a new file here and one line below. */
import * as m0001 from './0001-taxonomy';
import * as m0002 from './0002-accounts';

export const migrations = [
  { name: '0001-taxonomy', ...m0001 },
  { name: '0002-accounts', ...m0002 },
];
