// Every migration, in order. A new one is a new numbered file added here;
// a landed migration is never edited.
import * as m0001 from './0001-users.js';
import * as m0002 from './0002-sessions.js';
import * as m0003 from './0003-audit-events.js';
import * as m0004 from './0004-product-lines.js';
import * as m0005 from './0005-requirement-sets-and-revisions.js';
import * as m0006 from './0006-revision-freeze-triggers.js';
import * as m0007 from './0007-candidates-and-assessments.js';
import * as m0050 from './0050-mail.js';
import * as m0051 from './0051-password-tokens.js';
import * as m0100 from './0100-reports.js';
import * as m0150 from './0150-login-failures.js';
import * as m0151 from './0151-api-tokens.js';
import * as m0200 from './0200-audit-action-index.js';

export const migrations = [
  { name: '0001-users', ...m0001 },
  { name: '0002-sessions', ...m0002 },
  { name: '0003-audit-events', ...m0003 },
  { name: '0004-product-lines', ...m0004 },
  { name: '0005-requirement-sets-and-revisions', ...m0005 },
  { name: '0006-revision-freeze-triggers', ...m0006 },
  { name: '0007-candidates-and-assessments', ...m0007 },
  { name: '0050-mail', ...m0050 },
  { name: '0051-password-tokens', ...m0051 },
  { name: '0100-reports', ...m0100 },
  { name: '0150-login-failures', ...m0150 },
  { name: '0151-api-tokens', ...m0151 },
  { name: '0200-audit-action-index', ...m0200 },
];
