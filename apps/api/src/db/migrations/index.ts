// Every migration, in order. A new one is a new numbered file added here;
// a landed migration is never edited.
import * as m0001 from './0001-users.js';
import * as m0002 from './0002-sessions.js';
import * as m0003 from './0003-audit-events.js';
import * as m0004 from './0004-product-lines.js';

export const migrations = [
  { name: '0001-users', ...m0001 },
  { name: '0002-sessions', ...m0002 },
  { name: '0003-audit-events', ...m0003 },
  { name: '0004-product-lines', ...m0004 },
];
