// The ordered list of migrations. Add new files here; never edit one that has shipped.
import * as accounts from './0001-accounts';
import * as studyAreas from './0002-study-areas';
import * as scenarios from './0003-scenarios';
import * as runs from './0004-runs';
import * as audit from './0005-audit';

export const migrations = [
  { name: '0001-accounts', ...accounts },
  { name: '0002-study-areas', ...studyAreas },
  { name: '0003-scenarios', ...scenarios },
  { name: '0004-runs', ...runs },
  { name: '0005-audit', ...audit },
];
