// The bad-input corpus as data: malformed files and requests, each with the answer it must get.
// tests/api/bad-input-corpus.test.ts sends them one test per case against fresh fixtures and
// proves nothing was partly saved.
import type { Client } from '../support/client';
import { cinderFlatBoundary } from '../support/study-area-fixture';
import { SURVEY_CSV, type CorpusFixtures } from './corpus-fixtures';
import { broken, json, multipartBody, seededBytes, shapefileZip, squareWith, tenMillionRowCsv, text, zipWithOnly } from './corpus-files';
import type { BadInputCase, Refusal } from './corpus-runner';

export type { BadInputCase } from './corpus-runner';

const v1 = (path: string): string => `/api/v1${path}`;
type Send = BadInputCase['send'];

/** A case that must be refused: a 400 unless `more.status` says otherwise, with error `code` when given. */
const refusal = (name: string, send: Send, code?: string, more: Omit<Refusal, 'code'> = {}): BadInputCase => ({ name, send, expect: { refused: { status: 400, code, ...more } } });

// Requests, with good values for everything but the part under test.
const createArea = (file: [Buffer, string], fields: Record<string, string> = {}): Send => (_c, f) =>
  f.upload(v1(`/teams/${f.teamId}/study-areas`), { file }, { ...f.areaFields, ...fields });
const cinderFlat: [Buffer, string] = [cinderFlatBoundary, 'cinder-flat.geojson'];
const postScenario = (body: (f: CorpusFixtures) => object): Send => (c, f) => c.post(v1(`/study-areas/${f.studyAreaId}/scenarios`), body(f));
const phaseWith = (matrix: unknown) => [{ fromStep: 0, toStep: null, matrix }];
const withMatrix = (matrix: unknown): Send => postScenario(() => ({ name: 'Bad matrix', phases: phaseWith(matrix) }));
const rawScenario = (contentType: string, body: string): Send => (_c, f) => f.raw('post', v1(`/study-areas/${f.studyAreaId}/scenarios`), contentType, body);
const startRun = (body: object): Send => (c, f) => c.post(v1(`/scenarios/${f.scenarioId}/runs`), { steps: 10, replicates: 1, ...body });
const plotSurvey = (csv: string | Buffer, fields: Record<string, string> = {}): Send => (_c, f) =>
  f.upload(v1(`/study-areas/${f.studyAreaId}/surveys`), { file: [Buffer.from(csv), 'plots.csv'] }, { ...f.surveyFields, ...fields });
/** Builds the request's big file only when the case runs, not when the corpus is loaded. */
const lazy = (make: () => Send): Send => (c, f) => make()(c, f);
const get = (path: (f: CorpusFixtures) => string): Send => (c, f) => c.get(v1(path(f)));
const analysis = (query: string): Send => get((f) => `/scenarios/${f.scenarioId}/analysis?${query}`);

/** A polygon cover map far larger than Cinder Flat, one attribute `veg`. */
const coverMap = json({ type: 'FeatureCollection', features: [{ type: 'Feature', properties: { veg: 'sage' }, geometry: { type: 'Polygon', coordinates: [[[-125, 35], [-110, 35], [-110, 50], [-125, 50], [-125, 35]]] } }] }, 'cover.geojson');
const earlierAndLater = { earlier: coverMap, later: coverMap };

/** Legal but awkward names: stored and shown exactly as typed (escaping is the renderer's job). */
function keptScenarioName(name: string, textSent: string): BadInputCase {
  const id = (res: { body: { scenario: { id: number } } }): number => res.body.scenario.id;
  return {
    name,
    send: postScenario((f) => ({ name: textSent, phases: phaseWith(f.matrix) })),
    expect: {
      kept: {
        text: textSent,
        readBack: async (c: Client, res) => (await c.get(v1(`/scenarios/${id(res)}`))).body.scenario.name,
        undo: async (c: Client, res) => void (await c.delete(v1(`/scenarios/${id(res)}`))),
      },
    },
  };
}

const boundaryCases: BadInputCase[] = [
  ...(
    [
      ['GeoJSON cut off mid-file', 'truncated.geojson', 'boundary_unreadable'],
      ['TopoJSON instead of GeoJSON', 'topojson.json', 'boundary_invalid_geojson'],
      ['a ring that is not closed', 'unclosed-ring.geojson', 'boundary_unclosed_ring'],
      ['a bow-tie polygon that crosses itself', 'bowtie.geojson', 'boundary_self_intersection'],
      ['an empty FeatureCollection', 'empty-collection.geojson', 'boundary_empty'],
      ['points and lines only', 'points-only.geojson', 'boundary_no_polygon'],
      ['a coordinate given as a string', 'bad-coordinates.geojson', 'boundary_bad_coordinates'],
      ['[latitude, longitude] order', 'swapped.geojson', 'boundary_swapped_coordinates'],
      ['UTM metres without a crs member', 'utm-without-crs.geojson', 'boundary_projected_coordinates'],
      ['an unsupported crs', 'unknown-crs.geojson', 'boundary_unsupported_crs'],
      ['a ring with no area', 'zero-area.geojson', 'boundary_zero_area'],
      ['a ring of three positions', 'short-ring.geojson', 'boundary_short_ring'],
      ['a CSV named as a boundary', 'not-a-boundary.txt', 'boundary_unknown_format'],
      ['KML cut off mid-file', 'truncated.kml', 'boundary_unreadable'],
      ['a zip without a .shp', 'no-shapefile.zip', 'boundary_unreadable'],
      ['a shapefile zip without its .prj', 'shapefile-without-prj.zip', 'boundary_projected_coordinates'],
    ] as const
  ).map(([what, file, code]) => refusal(`study area from ${what} (${file})`, createArea(broken(file)), code)),
  refusal('study area from GeoJSON of type "Circle"', createArea(json({ type: 'Circle', coordinates: [-117, 43], radius: 10 })), 'boundary_invalid_geojson'),
  refusal('study area from a Point only', createArea(json({ type: 'Point', coordinates: [-117, 43] })), 'boundary_no_polygon'),
  refusal('study area with NaN written into the coordinates', createArea(text('{"type":"Polygon","coordinates":[[[-117,43],[NaN,43],[-116.9,43.1],[-117,43]]]}', 'nan.geojson')), 'boundary_unreadable'),
  refusal('study area with a null coordinate (NaN through JSON.stringify)', createArea(json(squareWith([NaN, 43]))), 'boundary_bad_coordinates'),
  refusal('study area with coordinates of 1e308', createArea(json(squareWith([1e308, 43]))), 'boundary_projected_coordinates'),
  refusal('study area from an empty file', createArea(text('', 'empty.geojson')), 'boundary_empty'),
  refusal('study area from XML that is not KML', createArea(text('<?xml version="1.0"?><svg><path d="M0 0"/></svg>', 'map.kml')), 'boundary_unreadable'),
  refusal('study area from KML whose coordinates are words', createArea(text('<kml><Placemark><Polygon><outerBoundaryIs><LinearRing><coordinates>west,north east,south</coordinates></LinearRing></outerBoundaryIs></Polygon></Placemark></kml>', 'words.kml')), 'boundary_no_polygon'),
  refusal('study area from random bytes named .zip', createArea([seededBytes(4096), 'area.zip']), 'boundary_unknown_format'),
  refusal('study area from random bytes behind a zip signature', createArea([Buffer.concat([Buffer.from([0x50, 0x4b, 0x03, 0x04]), seededBytes(4096)]), 'area.zip']), 'boundary_unreadable'),
  refusal('study area from a zip holding only the .shp (no .dbf, .shx or .prj)', createArea([zipWithOnly(shapefileZip(), (n) => n.endsWith('.shp')), 'only-shp.zip']), 'boundary_projected_coordinates'),
];

const uploadCases: BadInputCase[] = [
  refusal('a boundary larger than 25 MB', lazy(() => createArea([Buffer.alloc(26 * 1024 * 1024, 32), 'big.geojson'])), 'file_too_large', { status: 413 }),
  refusal('the boundary in the wrong form field', (_c, f) => f.upload(v1(`/teams/${f.teamId}/study-areas`), { boundary: cinderFlat }, f.areaFields), 'bad_upload'),
  refusal('two files in the one file field', async (c, f) => c.agent.post(v1(`/teams/${f.teamId}/study-areas`)).set('x-csrf-token', await c.refreshCsrf()).attach('file', ...cinderFlat).attach('file', ...cinderFlat), 'bad_upload'),
  refusal('the form fields without a file', (_c, f) => f.upload(v1(`/teams/${f.teamId}/study-areas`), {}, f.areaFields), 'file_missing'),
  refusal('a JSON body to the upload route', (c, f) => c.post(v1(`/teams/${f.teamId}/study-areas`), { ...f.areaFields, file: cinderFlatBoundary.toString() }), 'file_missing'),
  refusal('multipart without a boundary parameter', (_c, f) => f.raw('post', v1(`/teams/${f.teamId}/study-areas`), 'multipart/form-data', multipartBody('x1', cinderFlatBoundary.toString(), false)), 'bad_upload'),
  refusal('a multipart body cut off mid-file', (_c, f) => f.raw('post', v1(`/teams/${f.teamId}/study-areas`), 'multipart/form-data; boundary=x1', multipartBody('x1', cinderFlatBoundary.toString(), true)), 'bad_upload'),
];

const fieldCases: BadInputCase[] = [
  refusal('cell size of 10 m (more than 250,000 patches)', createArea(cinderFlat, { cellSize: '10' }), 'boundary_too_many_patches'),
  refusal('a 20 m boundary whose every 500 m cell keeps less than half its area', createArea(json({ type: 'Polygon', coordinates: [[[-117, 43], [-116.99975, 43], [-116.99975, 43.00018], [-117, 43.00018], [-117, 43]]] }), { minFraction: '0.5' }), 'boundary_no_patches'),
  refusal('cell size of 1,000,000 m', createArea(cinderFlat, { cellSize: '1000000' }), 'invalid_input', { message: /at most 10,000 m/ }),
  refusal('a negative cell size', createArea(cinderFlat, { cellSize: '-500' }), 'invalid_input', { message: /at least 10 m/ }),
  refusal('cell size "NaN"', createArea(cinderFlat, { cellSize: 'NaN' }), 'invalid_input', { message: /cellSize/ }),
  refusal('cell size "1e400"', createArea(cinderFlat, { cellSize: '1e400' }), 'invalid_input', { message: /cellSize/ }),
  refusal('states that are not JSON', createArea(cinderFlat, { states: '[{code: S1}' }), 'invalid_input', { message: /states must be JSON/ }),
  refusal('thirteen cover states', createArea(cinderFlat, { states: JSON.stringify(Array.from({ length: 13 }, (_, i) => ({ code: `S${i}`, name: `State ${i}`, colour: '#000000' }))) }), 'invalid_input', { message: /at most 12/ }),
  refusal('start-cover proportions with a null (NaN) share', (c, f) => c.put(v1(`/study-areas/${f.studyAreaId}/start-cover`), { method: 'exact', proportions: [0.5, null] }), 'invalid_input'),
  refusal('start-cover proportions for three states', (c, f) => c.put(v1(`/study-areas/${f.studyAreaId}/start-cover`), { method: 'exact', proportions: [0.3, 0.3, 0.4] })),
  refusal('a cover map with only points', (_c, f) => f.upload(v1(`/study-areas/${f.studyAreaId}/start-cover/map/inspect`), { file: broken('points-only.geojson') }), 'boundary_no_polygon'),
  refusal('a cover-map attribute "constructor" that no polygon has', (_c, f) => f.upload(v1(`/study-areas/${f.studyAreaId}/start-cover/map`), { file: coverMap }, { property: 'constructor', mapping: '{}', fallback: 'S1' }), 'invalid_mapping'),
];

const jsonCases: BadInputCase[] = [
  refusal('a JSON route sent text/plain', rawScenario('text/plain', JSON.stringify({ name: 'Plain', phases: phaseWith([[1, 0], [0, 1]]) })), 'unsupported_media_type', { status: 415 }),
  refusal('a JSON route sent XML', rawScenario('application/xml', '<scenario><name>XML</name></scenario>'), 'unsupported_media_type', { status: 415 }),
  refusal('malformed JSON', rawScenario('application/json', '{"name": "Cut", "phases": ['), 'malformed_json'),
  refusal('a JSON body over 100 kB', postScenario((f) => ({ name: 'Long', notes: 'x'.repeat(200_000), phases: phaseWith(f.matrix) })), 'body_too_large', { status: 413 }),
];

const matrixCases: BadInputCase[] = [
  refusal('a matrix of 3 rows for 2 states', withMatrix([[1, 0], [0, 1], [0.5, 0.5]]), 'invalid_matrix', { message: /3 rows given for 2 states/ }),
  refusal('a matrix row of 3 entries', withMatrix([[0.5, 0.25, 0.25], [0, 1]]), 'invalid_matrix', { message: /3 entries; it needs 2/ }),
  refusal('matrix rows that do not sum to 1', withMatrix([[0.5, 0.4], [0.3, 0.3]]), 'invalid_matrix', { message: /sums to 0\.9.*sums to 0\.6/ }),
  refusal('a negative matrix cell', withMatrix([[1.5, -0.5], [0, 1]]), 'invalid_matrix', { message: /-0\.5 is negative/ }),
  refusal('a matrix cell above 1', withMatrix([[0, 1], [2, 0]]), 'invalid_matrix', { message: /2 is greater than 1/ }),
  refusal('a NaN matrix cell (null in JSON)', withMatrix([[null, 1], [0, 1]]), 'invalid_input', { message: /must be a number/ }),
  refusal('a matrix cell of 1e400 (Infinity once parsed)', rawScenario('application/json', '{"name":"Huge","phases":[{"fromStep":0,"toStep":null,"matrix":[[1e400,0],[0,1]]}]}'), 'invalid_input', { message: /must be a number/ }),
  refusal('a matrix cell "Infinity"', withMatrix([['Infinity', 0], [0, 1]]), 'invalid_input', { message: /must be a number/ }),
  refusal('a matrix that is a word', withMatrix('identity'), 'invalid_input', { message: /matrix must be a list of rows/ }),
  refusal('a matrix nested 2,000 deep', withMatrix(JSON.parse(`${'['.repeat(2000)}1${']'.repeat(2000)}`)), 'invalid_input'),
  refusal('years per step of 0', postScenario((f) => ({ name: 'Zero years', yearsPerStep: 0, phases: phaseWith(f.matrix) })), 'invalid_input', { message: /yearsPerStep must be more than 0/ }),
  refusal('start-cover shares for 3 states', postScenario((f) => ({ name: 'Shares', startCover: { source: 'proportions', method: 'exact', proportions: [0.2, 0.3, 0.5] }, phases: phaseWith(f.matrix) })), 'invalid_input', { message: /3 shares for 2 states/ }),
  refusal('a phase that ends before it starts', postScenario((f) => ({ name: 'Backwards', phases: [{ fromStep: 0, toStep: 3, matrix: f.matrix }, { fromStep: 3, toStep: 1, matrix: f.matrix }] })), 'invalid_input', { message: /must end after its start/ }),
];

const runCases: BadInputCase[] = [
  refusal('a run of 0 steps', startRun({ steps: 0 }), 'invalid_input', { message: /steps must be at least 1/ }),
  refusal('a run of -5 steps', startRun({ steps: -5 }), 'invalid_input', { message: /steps must be at least 1/ }),
  refusal('a run of 1e9 steps', startRun({ steps: 1e9 }), 'invalid_input', { message: /steps must be at most 1,000/ }),
  refusal('a run of 2.5 steps', startRun({ steps: 2.5 }), 'invalid_input', { message: /whole number/ }),
  refusal('a run of "ten" steps', startRun({ steps: 'ten' }), 'invalid_input', { message: /steps must be a whole number/ }),
  refusal('a run of 501 replicates', startRun({ replicates: 501 }), 'invalid_input', { message: /replicates must be at most 500/ }),
];

const surveyCases: BadInputCase[] = [
  refusal('a survey table of 10,000,000 rows', lazy(() => plotSurvey(tenMillionRowCsv())), 'file_too_large', { status: 413, withinMs: 30_000 }),
  refusal('a survey table without the state column', plotSurvey('plot_id,year\nP1,2001\nP1,2002\n'), 'invalid_input', { message: /no column 'cover_class'/ }),
  refusal('a survey label the mapping leaves out', plotSurvey(`${SURVEY_CSV}P3,2001,burnt\n`), 'unmapped_labels', { message: /"burnt"/ }),
  refusal('a survey mapping to an unknown state code', plotSurvey(SURVEY_CSV, { mapping: JSON.stringify({ shrub: 'S1', grass: 'XX' }) }), 'invalid_mapping', { message: /"grass" → "XX"/ }),
  refusal('a survey mapping with a "__proto__" label', plotSurvey(SURVEY_CSV, { mapping: '{"shrub":"S1","grass":"S2","__proto__":"XX"}' }), 'invalid_mapping', { message: /__proto__/ }),
  refusal('a survey year of 1e400', plotSurvey('plot_id,year,cover_class\nP1,2001,shrub\nP1,1e400,grass\n'), 'invalid_input', { message: /line 3/ }),
  refusal('a survey year written as a date', plotSurvey('plot_id,year,cover_class\nP1,2001-06-01,shrub\nP1,2002-06-01,grass\n'), 'invalid_input', { message: /'2001-06-01' is not a number/ }),
  refusal('a survey with a BOM and CRLF lines and a bad year on line 3', plotSurvey('\uFEFFplot_id,year,cover_class\r\nP1,2001,shrub\r\nP1,20O2,grass\r\n'), 'invalid_input', { message: /line 3, column 'year': '20O2'/ }),
  refusal('a PNG uploaded as the survey table', plotSurvey(Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), seededBytes(2048)])), 'invalid_input', { message: /no column/ }),
  refusal('a time step of 0', plotSurvey(SURVEY_CSV, { timeStep: '0' }), 'invalid_input', { message: /timeStep must be more than 0/ }),
  refusal('an empty file to survey inspection', (_c, f) => f.upload(v1(`/study-areas/${f.studyAreaId}/surveys/inspect`), { file: text('', 'plots.csv') }), 'empty_file'),
  refusal('map-pair dates that do not exist (2010-13-45)', (_c, f) => f.upload(v1(`/study-areas/${f.studyAreaId}/surveys/map-pair`), earlierAndLater, { name: 'Maps', property: 'veg', mapping: '{"sage":"S1"}', earlierDate: '2010-13-45', laterDate: '2017-02-30' }), 'invalid_input', { message: /earlierDate/ }),
];

const nameCases: BadInputCase[] = [
  keptScenarioName('an HTML <script> name is stored as text', '<script>alert("x")</script> & <b>bold</b>'),
  keptScenarioName('a right-to-left name with emoji is stored as text', 'مراعي الشمال 🌾 שדה\u200f 👩🏽‍🌾'),
  keptScenarioName('a SQL-looking name is stored as text', "'; DROP TABLE users; --"),
  keptScenarioName('a name with SQL quotes and a comment is stored as text', "Robert'); DELETE FROM scenarios WHERE ('1'='1 /*"),
  refusal('a scenario name with a NUL byte', postScenario((f) => ({ name: 'Before\u0000after', phases: phaseWith(f.matrix) })), 'nul_character', { message: /NUL/ }),
  refusal('a study-area name with a NUL byte', createArea(cinderFlat, { name: 'Cinder\u0000Flat' }), 'nul_character', { message: /NUL/ }),
  refusal('a survey label with a NUL byte', plotSurvey('plot_id,year,cover_class\nP1,2001,shr\u0000ub\nP1,2002,grass\n', { mapping: JSON.stringify({ 'shr\u0000ub': 'S1', grass: 'S2' }) }), 'nul_character', { message: /NUL/ }),
  refusal('a boundary whose ignored point is named with a NUL byte', createArea(json({ type: 'FeatureCollection', features: [{ type: 'Feature', properties: {}, geometry: squareWith([-116.9, 43]) }, { type: 'Feature', properties: { name: 'gate\u0000' }, geometry: { type: 'Point', coordinates: [-117, 43] } }] })), 'nul_character', { message: /NUL/ }),
  refusal('a survey renamed with a NUL byte', (c, f) => c.patch(v1(`/surveys/${f.surveyId}`), { name: 'Plots\u0000' }), 'nul_character', { message: /NUL/ }),
  refusal('a scenario name of 121 characters', postScenario((f) => ({ name: 'n'.repeat(121), phases: phaseWith(f.matrix) })), 'invalid_input', { message: /at most 120 characters/ }),
  refusal('a scenario name of spaces only', postScenario((f) => ({ name: '   ', phases: phaseWith(f.matrix) })), 'invalid_input', { message: /name must not be empty/ }),
];

const pathCases: BadInputCase[] = [
  refusal('run id "abc"', get(() => '/runs/abc'), 'invalid_input', { message: /id must be a number/ }),
  refusal("study-area id 1' (SQL quote)", get(() => '/study-areas/1%27'), 'invalid_input', { message: /id must be a number/ }),
  refusal("study-area id 1' OR '1'='1", get(() => "/study-areas/1%27%20OR%20%271%27%3D%271"), 'invalid_input', { message: /id must be a number/ }),
  refusal('scenario id -3', get(() => '/scenarios/-3'), 'invalid_input', { message: /id must be 1 or more/ }),
  refusal('survey id 1.5', get(() => '/surveys/1.5'), 'invalid_input', { message: /id must be a whole number/ }),
  refusal('run id 2147483648 (past PostgreSQL integer)', get(() => '/runs/2147483648'), 'not_found', { status: 404 }),
  refusal('a broken percent-escape in the path', get(() => '/study-areas/%E0%A4%A'), 'bad_request', { message: /decode/i }),
  refusal('phase index 9', (c, f) => c.post(v1(`/scenarios/${f.scenarioId}/phases/9/use-survey`), { surveyId: f.surveyId }), 'invalid_input', { message: /phase index is at most 4/ }),
  refusal('survey id 2147483648 in a body', (c, f) => c.post(v1(`/scenarios/${f.scenarioId}/phases/0/use-survey`), { surveyId: 2147483648 }), 'invalid_survey_link'),
];

const queryCases: BadInputCase[] = [
  refusal('analysis steps "abc"', analysis('steps=abc'), 'invalid_input', { message: /steps must be a number/ }),
  refusal('analysis steps given twice', analysis('steps=5&steps=6'), 'invalid_input', { message: /steps/ }),
  refusal('analysis steps 1e400', analysis('steps=1e400'), 'invalid_input', { message: /steps/ }),
  refusal('uncertainty draws 1e9', get((f) => `/scenarios/${f.scenarioId}/uncertainty?draws=1e9`), 'invalid_input', { message: /draws must be at most 5,000/ }),
  { name: 'an unknown query parameter is ignored', send: analysis('steps=5&colour=red'), expect: { ignored: { plain: analysis('steps=5') } } },
];

export const BAD_INPUT_CASES: readonly BadInputCase[] = [
  ...boundaryCases,
  ...uploadCases,
  ...fieldCases,
  ...jsonCases,
  ...matrixCases,
  ...runCases,
  ...surveyCases,
  ...nameCases,
  ...pathCases,
  ...queryCases,
];
