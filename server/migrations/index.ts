// The ordered list of migrations. Add new files here; never edit one that has shipped.
import * as accounts from './0001-accounts';
import * as studyAreas from './0002-study-areas';

export const migrations = [
  { name: '0001-accounts', ...accounts },
  { name: '0002-study-areas', ...studyAreas },
];
