/** Every migration, in order. A new migration is a new file here and one line below. */
import * as m0001 from './0001-taxonomy';
import * as m0002 from './0002-accounts';
import * as m0003 from './0003-entries';
import * as m0004 from './0004-claim-checks';
import * as m0005 from './0005-submissions';
import * as m0006 from './0006-synonyms';
import * as m0007 from './0007-rate-limits';
import * as m0008 from './0008-audit-append-only';

export const migrations = [
  { name: '0001-taxonomy', ...m0001 },
  { name: '0002-accounts', ...m0002 },
  { name: '0003-entries', ...m0003 },
  { name: '0004-claim-checks', ...m0004 },
  { name: '0005-submissions', ...m0005 },
  { name: '0006-synonyms', ...m0006 },
  { name: '0007-rate-limits', ...m0007 },
  { name: '0008-audit-append-only', ...m0008 },
];
