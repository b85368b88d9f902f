// The bad-input corpus, one test per case: each malformed file or request gets a 4xx in the one
// error shape with a message that says what is wrong (legal but awkward text is kept verbatim),
// and after all of them nothing has been partly saved.
import { recordReliability } from '../support/reliability-log';
import { startTestApp, type TestApp } from '../support/test-app';
import { BAD_INPUT_CASES } from '../reliability/bad-input-corpus';
import { openCorpus, type Corpus } from '../reliability/corpus-runner';

let t: TestApp;
let corpus: Corpus;
/** Cases answered as they must be, for the reliability table. */
let answeredCleanly = 0;
beforeAll(async () => {
  t = await startTestApp();
  corpus = await openCorpus(t);
});
afterAll(() => t.close());

test('the corpus has at least 40 cases, each named once', () => {
  const names = BAD_INPUT_CASES.map((c) => c.name);
  expect(names.length).toBeGreaterThanOrEqual(40);
  expect(new Set(names).size).toBe(names.length);
});

test.each(BAD_INPUT_CASES.map((c) => [c.name, c] as const))('%s', async (_name, kase) => {
  const problem = await corpus.check(kase);
  if (problem === null) answeredCleanly += 1;
  expect(problem).toBeNull();
});

test('after every case, no table has gained or lost rows and the fixtures are unchanged', async () => {
  const changes = await corpus.changes();
  const refused = BAD_INPUT_CASES.filter((c) => 'refused' in c.expect).length;
  recordReliability({
    kind: 'bad input',
    name: 'malformed requests and files',
    tried: BAD_INPUT_CASES.length,
    refusedCleanly: answeredCleanly,
    detail: `${refused} to refuse with a 4xx, ${BAD_INPUT_CASES.length - refused} legal but awkward (kept verbatim or ignored); ${changes.length === 0 ? 'nothing partly saved' : `changed: ${changes.join('; ')}`}`,
  });
  expect(changes).toEqual([]);
});
