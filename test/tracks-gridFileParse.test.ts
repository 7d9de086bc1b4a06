import { describe, expect, test } from 'vitest';
import { generateTrack } from '../lib/model/generateTrack.js';
import { PHASE_INDEX } from '../lib/model/phases.js';
import { parseGridFile } from '../lib/tracks/parseGridFile.js';
import { placePrimaryEeps } from '../lib/tracks/placePrimaryEeps.js';
import { GRID_FILE_COLUMNS, type GridProblem } from '../lib/tracks/gridFileFormat.js';

// A small hand-made grid: a labelled 1 Msun track (lines 3–8) and an unlabelled 2 Msun track
// (lines 9–11). Radii are exactly √L / (Teff / 5772)².
const BASE_LINES = [
  '# starclock-grid v1',
  'initialMass,z,age,eep,phase,mass,coreMass,luminosity,teff,radius',
  '1,0.014,0,pms-start,pre-main-sequence,1,0,4,5772,2',
  '1,0.014,1e7,zams,main-sequence,1,0,1,5772,1',
  '1,0.014,5e9,ms-mid,main-sequence,1,0,1,5772,1',
  '1,0.014,1e10,tams,main-sequence,1,0,1,5772,1',
  '1,0.014,1e10,,subgiant,1,0.1,1,5772,1',
  '1,0.014,1.1e10,rgb-base track-end,subgiant,0.99,0.2,4,5772,2',
  '2,0.014,0,,pre-main-sequence,2,0,16,5772,4',
  '2,0.014,1e6,,main-sequence,2,0,16,11544,1',
  '2,0.014,1e9,,main-sequence,1.9,0,16,11544,1',
];
const BASE = BASE_LINES.join('\n') + '\n';

/** The base file with the cell at (1-based line, column name) replaced. */
function edit(line: number, column: (typeof GRID_FILE_COLUMNS)[number], value: string, lines = BASE_LINES): string {
  const out = lines.slice();
  const cells = out[line - 1].split(',');
  cells[GRID_FILE_COLUMNS.indexOf(column)] = value;
  out[line - 1] = cells.join(',');
  return out.join('\n') + '\n';
}
const lines = (...ls: string[]) => ls.join('\n') + '\n';
/** Stefan–Boltzmann radius, Rsun, of L (Lsun) and Teff (K), as the layout defines it. */
const sb = (L: number, T: number) => Math.sqrt(L) / (T / 5772) ** 2;
const keys = (text: string) => parseGridFile(text).tracks.map((t) => `${t.initialMass},${t.z}`);

describe('parseGridFile(text) on a good file', () => {
  test('parseGridFile(text) reads both tracks of the base file without problems', () => {
    const { tracks, problems } = parseGridFile(BASE);
    expect(problems).toEqual([]);
    expect(tracks.map((t) => [t.initialMass, t.z, t.n])).toEqual([[1, 0.014, 6], [2, 0.014, 3]]);
    const [one] = tracks;
    expect(Array.from(one.age)).toEqual([0, 1e7, 5e9, 1e10, 1e10, 1.1e10]);
    expect(Array.from(one.logL)).toEqual([Math.log10(4), 0, 0, 0, 0, Math.log10(4)]);
    expect(Array.from(one.logTeff)).toEqual(new Array(6).fill(Math.log10(5772)));
    expect(Array.from(one.phase)).toEqual([0, 1, 1, 1, 2, 2]);
    expect(one.eeps).toEqual([
      { name: 'pms-start', index: 0 }, { name: 'zams', index: 1 }, { name: 'ms-mid', index: 2 },
      { name: 'tams', index: 3 }, { name: 'rgb-base', index: 5 }, { name: 'track-end', index: 5 },
    ]);
  });

  test('parseGridFile(text) places the EEPs of an unlabelled track with placePrimaryEeps (ms-mid: earlier row on a tie)', () => {
    const two = parseGridFile(BASE).tracks[1];
    expect(two.eeps).toEqual(placePrimaryEeps(two.phase, two.age));
    expect(two.eeps).toEqual([
      { name: 'pms-start', index: 0 }, { name: 'zams', index: 1 }, { name: 'ms-mid', index: 1 },
      { name: 'tams', index: 2 }, { name: 'track-end', index: 2 },
    ]);
  });

  const accepted: { name: string; text: string; tracks: number }[] = [
    { name: 'a UTF-8 BOM and CRLF line ends', text: '\uFEFF' + BASE.replaceAll('\n', '\r\n'), tracks: 2 },
    { name: 'RFC 4180 quoted fields', text: edit(5, 'eep', '"ms-mid"', BASE_LINES.map((l, i) => (i === 3 ? l.replace('main-sequence', '"main-sequence"') : l))), tracks: 2 },
    { name: 'a quoted header', text: BASE.replace('initialMass,z,', '"initialMass","z",'), tracks: 2 },
    { name: 'comments and empty lines anywhere after the first line', text: lines(...BASE_LINES.slice(0, 2), '# a note', ...BASE_LINES.slice(2, 5), '# inside a track', '', ...BASE_LINES.slice(5), ''), tracks: 2 },
    { name: 'no line end after the last row', text: BASE.slice(0, -1), tracks: 2 },
    { name: '1.0 and 1 as the same initialMass', text: edit(5, 'initialMass', '1.0'), tracks: 2 },
    { name: 'initialMass and z outside the model\'s ranges', text: BASE.replaceAll('\n2,0.014,', '\n200,0.5,'), tracks: 2 },
    { name: 'a radius within 1 % of Stefan–Boltzmann', text: edit(5, 'radius', '1.0099'), tracks: 2 },
    { name: 'numbers with exponents and blanks around them', text: edit(5, 'age', ' 5.0E+9 '), tracks: 2 },
  ];
  test.each(accepted)('parseGridFile(text) accepts $name', ({ text, tracks }) => {
    const got = parseGridFile(text);
    expect(got.problems).toEqual([]);
    expect(got.tracks).toHaveLength(tracks);
  });

  test('parseGridFile(text) counts rows as an editor does: comments, blank lines and CRLF included', () => {
    const text = lines(...BASE_LINES.slice(0, 2), '# a note', '', ...BASE_LINES.slice(2)).replaceAll('\n', '\r\n');
    const bad = text.replace('1,0.014,5e9,ms-mid', '1,0.014,5e9x,ms-mid');
    expect(parseGridFile(bad).problems.map((p) => [p.row, p.column, p.value])).toEqual([[7, 'age', '5e9x']]);
  });
});

describe('parseGridFile(text) fills the Track fields the file does not carry', () => {
  test('msLifetime is the age from zams to tams; events are empty', () => {
    const [one, two] = parseGridFile(BASE).tracks;
    expect(one.msLifetime).toBe(1e10 - 1e7);
    expect(two.msLifetime).toBe(1e9 - 1e6);
    expect(one.events).toEqual([]);
  });

  test('remnant and remnantMass come from the model when the track stops before a remnant and is in its ranges', () => {
    const model = generateTrack(1, 0.014);
    const [one] = parseGridFile(BASE).tracks;
    expect([one.remnant, one.remnantMass]).toEqual([model.remnant, model.remnantMass]);
  });

  test('remnant is white-dwarf with the last core mass outside the model\'s ranges', () => {
    const text = BASE.replaceAll('\n1,0.014,', '\n200,0.014,');
    const t = parseGridFile(text).tracks.find((x) => x.initialMass === 200)!;
    expect([t.remnant, t.remnantMass]).toEqual(['white-dwarf', 0.2]);
  });

  test('remnant and remnantMass are the last row\'s when the track reaches a remnant; brown-dwarf when every row is one', () => {
    const text = lines(
      ...BASE_LINES.slice(0, 2),
      `20,0.014,0,,main-sequence,20,0,40000,35000,${sb(40000, 35000)}`,
      `20,0.014,1e7,,core-helium-burning,15,6,160000,35000,${sb(160000, 35000)}`,
      `20,0.014,1e7,,neutron-star,1.4,1.4,1e-3,1e6,${sb(1e-3, 1e6)}`,
      `20,0.014,2e7,,neutron-star,1.4,1.4,1e-4,5.6234e5,${sb(1e-4, 5.6234e5)}`,
      `0.05,0.014,1e6,,brown-dwarf,0.05,0,1e-3,2500,${sb(1e-3, 2500)}`,
      `0.05,0.014,1e9,,brown-dwarf,0.05,0,1e-5,1000,${sb(1e-5, 1000)}`,
    );
    const { tracks, problems } = parseGridFile(text);
    expect(problems).toEqual([]);
    expect(tracks.map((t) => [t.remnant, t.remnantMass])).toEqual([['neutron-star', 1.4], ['brown-dwarf', 0.05]]);
    expect(tracks[0].eeps.map((e) => e.name)).toEqual(['pms-start', 'zams', 'ms-mid', 'tams', 'he-ignition', 'cheb-start', 'cheb-end', 'remnant-birth', 'track-end']);
  });

  test('a labelled track cut on the main sequence may leave out ms-mid and tams; msLifetime comes from the model', () => {
    const text = lines(
      ...BASE_LINES.slice(0, 2),
      `0.3,0.014,1e5,pms-start,pre-main-sequence,0.3,0,0.5,3300,${sb(0.5, 3300)}`,
      `0.3,0.014,1e8,zams,main-sequence,0.3,0,0.01,3400,${sb(0.01, 3400)}`,
      `0.3,0.014,1e11,track-end,main-sequence,0.3,0,0.011,3410,${sb(0.011, 3410)}`,
    );
    const { tracks, problems } = parseGridFile(text);
    expect(problems).toEqual([]);
    expect(tracks[0].eeps.map((e) => e.name)).toEqual(['pms-start', 'zams', 'track-end']);
    expect(tracks[0].msLifetime).toBe(generateTrack(0.3, 0.014).msLifetime);
  });
});

interface Hostile {
  name: string;
  text: string;
  /** the problem that must be there: row, column, value, and a pattern of the message */
  want: { row: number; column: string | null; value: string | null; message: RegExp };
  /** how many problems in all (default 1) */
  count?: number;
  /** the tracks still returned (default: only the 2 Msun track) */
  tracks?: string[];
}
const ONLY_TWO = ['2,0.014'];
const ONLY_ONE = ['1,0.014'];

const HOSTILE: Hostile[] = [
  // first line and header
  { name: 'an empty file', text: '', want: { row: 1, column: null, value: null, message: /file is empty; its first line must be exactly '# starclock-grid v1'/ }, tracks: [] },
  { name: 'a missing first line', text: lines(...BASE_LINES.slice(1)), want: { row: 1, column: null, value: BASE_LINES[1], message: /first line must be exactly '# starclock-grid v1'/ }, tracks: ['1,0.014', '2,0.014'] },
  { name: 'a wrong first line', text: BASE.replace('# starclock-grid v1', '# my grid'), want: { row: 1, column: null, value: '# my grid', message: /first line must be exactly/ }, tracks: ['1,0.014', '2,0.014'] },
  { name: 'another layout version', text: BASE.replace('v1', 'v2'), want: { row: 1, column: null, value: '# starclock-grid v2', message: /unsupported layout .* reads '# starclock-grid v1' only/ }, tracks: ['1,0.014', '2,0.014'] },
  { name: 'a missing header', text: lines(BASE_LINES[0]), want: { row: 2, column: null, value: null, message: /missing header line; expected 'initialMass,z,age,eep,phase,mass,coreMass,luminosity,teff,radius'/ }, tracks: [] },
  { name: 'a header with a wrong column name', text: BASE.replace(',teff,', ',Teff,'), want: { row: 2, column: null, value: 'initialMass,z,age,eep,phase,mass,coreMass,luminosity,Teff,radius', message: /wrong header \(missing teff; unknown 'Teff'\); the header line must be exactly 'initialMass,z,age,eep,phase,mass,coreMass,luminosity,teff,radius'/ }, tracks: [] },
  { name: 'a header with a missing column', text: BASE.replace(',radius', ''), want: { row: 2, column: null, value: 'initialMass,z,age,eep,phase,mass,coreMass,luminosity,teff', message: /missing radius/ }, tracks: [] },
  { name: 'no track rows', text: lines(...BASE_LINES.slice(0, 2), '# nothing yet'), want: { row: 2, column: null, value: null, message: /no track rows/ }, tracks: [] },
  // row shape and quoting
  { name: 'a row with a field missing', text: BASE.replace('1,0.014,5e9,ms-mid,main-sequence,1,0,1,5772,1', '1,0.014,5e9,ms-mid,main-sequence,1,0,1,5772'), want: { row: 5, column: null, value: '9 fields', message: /the row has 9 fields; the layout has 10: initialMass,z,age/ } },
  { name: 'a row with a field too many', text: edit(10, 'radius', '1,7'), want: { row: 10, column: null, value: '11 fields', message: /11 fields/ }, tracks: ONLY_ONE },
  { name: 'text after a closing quote', text: edit(5, 'phase', '"main-sequence"x'), want: { row: 5, column: null, value: null, message: /field 5 has text after its closing quote/ }, count: 2 },
  { name: 'a quote inside an unquoted field', text: edit(5, 'phase', 'main"sequence'), want: { row: 5, column: null, value: null, message: /quote inside an unquoted field/ }, count: 2 },
  { name: 'an unterminated quote', text: edit(11, 'phase', '"main-sequence'), want: { row: 11, column: null, value: null, message: /opens a quote that is never closed/ }, tracks: ONLY_ONE, count: 2 },
  // numbers
  { name: 'a mass that is not a number', text: edit(4, 'mass', 'abc'), want: { row: 4, column: 'mass', value: 'abc', message: /mass 'abc' is not a number; it must be a finite decimal number > 0 Msun/ } },
  { name: 'an age written NaN', text: edit(5, 'age', 'NaN'), want: { row: 5, column: 'age', value: 'NaN', message: /age 'NaN' is not a number; it must be a finite decimal number ≥ 0 yr/ } },
  { name: 'an infinite luminosity', text: edit(5, 'luminosity', 'Infinity'), want: { row: 5, column: 'luminosity', value: 'Infinity', message: /luminosity 'Infinity' is not a number/ } },
  { name: 'an empty teff', text: edit(5, 'teff', ''), want: { row: 5, column: 'teff', value: '', message: /teff '' is not a number/ } },
  { name: 'initialMass 0', text: edit(11, 'initialMass', '0'), want: { row: 11, column: 'initialMass', value: '0', message: /initialMass 0 Msun is out of range; it must be > 0 Msun/ }, tracks: ONLY_ONE },
  { name: 'z 0', text: edit(11, 'z', '0'), want: { row: 11, column: 'z', value: '0', message: /z 0 is out of range; it must be between 0 and 1 \(exclusive\)/ }, tracks: ONLY_ONE },
  { name: 'z 1', text: edit(11, 'z', '1'), want: { row: 11, column: 'z', value: '1', message: /z 1 is out of range/ }, tracks: ONLY_ONE },
  { name: 'a negative age', text: edit(3, 'age', '-1'), want: { row: 3, column: 'age', value: '-1', message: /age -1 yr is out of range; it must be ≥ 0 yr/ } },
  { name: 'mass 0', text: edit(8, 'mass', '0'), want: { row: 8, column: 'mass', value: '0', message: /mass 0 Msun is out of range; it must be > 0 Msun/ } },
  { name: 'a negative coreMass', text: edit(7, 'coreMass', '-0.1'), want: { row: 7, column: 'coreMass', value: '-0.1', message: /coreMass -0.1 Msun is out of range; it must be ≥ 0 Msun/ } },
  { name: 'coreMass above mass', text: edit(8, 'coreMass', '1.5'), want: { row: 8, column: 'coreMass', value: '1.5', message: /coreMass 1.5 Msun is more than the row's mass 0.99 Msun; it must be ≤ mass/ } },
  { name: 'a negative luminosity', text: edit(5, 'luminosity', '-1'), want: { row: 5, column: 'luminosity', value: '-1', message: /luminosity -1 Lsun is out of range; it must be > 0 Lsun/ } },
  { name: 'teff 0', text: edit(5, 'teff', '0'), want: { row: 5, column: 'teff', value: '0', message: /teff 0 K is out of range; it must be > 0 K/ } },
  { name: 'radius 0', text: edit(5, 'radius', '0'), want: { row: 5, column: 'radius', value: '0', message: /radius 0 Rsun is out of range; it must be > 0 Rsun/ } },
  { name: 'a radius 5 % off Stefan–Boltzmann', text: edit(5, 'radius', '1.05'), want: { row: 5, column: 'radius', value: '1.05', message: /radius 1.05 Rsun disagrees by 5.00 % with 1.00000 Rsun, the Stefan–Boltzmann radius of luminosity 1 Lsun and teff 5772 K .* at most 1 % is allowed/ } },
  // names
  { name: 'an unknown phase', text: edit(5, 'phase', 'main sequence'), want: { row: 5, column: 'phase', value: 'main sequence', message: /'main sequence' is not a phase; phases are: pre-main-sequence, main-sequence, subgiant, .*brown-dwarf/ } },
  { name: 'an unknown EEP label', text: edit(5, 'eep', 'mid-ms'), want: { row: 5, column: 'eep', value: 'mid-ms', message: /'mid-ms' is not a primary EEP; the names are: pms-start, zams, ms-mid/ } },
  { name: 'one EEP written twice on a row', text: edit(8, 'eep', 'track-end rgb-base track-end'), want: { row: 8, column: 'eep', value: 'track-end rgb-base track-end', message: /'track-end' is written twice on this row/ } },
  // order along a track
  { name: 'an age before the previous row\'s', text: edit(5, 'age', '1e6'), want: { row: 5, column: 'age', value: '1e6', message: /age 1000000 yr is before row 4's 10000000 yr; ages must not decrease along a track/ } },
  { name: 'an age repeated within a phase', text: edit(5, 'age', '1e7'), want: { row: 5, column: 'age', value: '1e7', message: /age 10000000 yr repeats row 4's within phase main-sequence; ages must increase strictly within a phase/ } },
  { name: 'mass growing', text: edit(8, 'mass', '1.2'), want: { row: 8, column: 'mass', value: '1.2', message: /mass 1.2 Msun is more than row 7's 1 Msun; mass must not grow along a track/ } },
  { name: 'a phase earlier in life order than the row before', text: edit(7, 'phase', 'pre-main-sequence'), want: { row: 7, column: 'phase', value: 'pre-main-sequence', message: /phase pre-main-sequence comes after main-sequence \(row 6\); phases must follow life order: pre-main-sequence, main-sequence/ } },
  { name: 'a second remnant kind', text: lines(...BASE_LINES, '5,0.014,0,,white-dwarf,1,1,1,5772,1', '5,0.014,1,,neutron-star,1,1,1,5772,1'), want: { row: 13, column: 'phase', value: 'neutron-star', message: /phase neutron-star follows the remnant phase white-dwarf \(row 12\); a track ends in one remnant/ }, tracks: ['1,0.014', '2,0.014'] },
  // repeated tracks
  { name: 'a track appearing again after another', text: lines(...BASE_LINES, BASE_LINES[2], BASE_LINES[3]), want: { row: 12, column: 'initialMass', value: '1', message: /the track initialMass 1 Msun, z 0.014 appears again \(first on rows 3–8\); each \(initialMass, z\) must be one run of consecutive rows/ } },
  { name: 'a track written twice in a row', text: lines(...BASE_LINES.slice(0, 8), ...BASE_LINES.slice(2, 8), ...BASE_LINES.slice(8)), want: { row: 9, column: 'age', value: '0', message: /the track initialMass 1 Msun, z 0.014 starts again here \(it began on row 3\); each \(initialMass, z\) must appear once/ } },
  // EEP labels
  { name: 'a labelled track missing a primary EEP', text: edit(6, 'eep', ''), want: { row: 6, column: 'eep', value: null, message: /missing primary EEP 'tams': the track's rows carry EEP labels, so it must mark the last main-sequence row \(row 6\) with 'tams'/ } },
  { name: 'an EEP on the wrong row', text: edit(5, 'eep', 'ms-mid tams', BASE_LINES.map((l, i) => (i === 5 ? l.replace('tams', '') : l))), want: { row: 5, column: 'eep', value: 'ms-mid tams', message: /primary EEP 'tams' goes on the last main-sequence row \(row 6\), not on this row/ } },
  { name: 'an EEP of a phase the track lacks', text: edit(7, 'eep', 'cheb-start'), want: { row: 7, column: 'eep', value: 'cheb-start', message: /primary EEP 'cheb-start' needs core-helium-burning rows, which this track does not have; its EEPs are: pms-start, zams, ms-mid, tams, rgb-base, track-end/ } },
  { name: 'an EEP on two rows', text: edit(7, 'eep', 'zams'), want: { row: 7, column: 'eep', value: 'zams', message: /primary EEP 'zams' appears again \(first on row 4\)/ } },
];

describe('parseGridFile(text) reports every problem with its row and column', () => {
  test.each(HOSTILE)('parseGridFile(text) reports $name', ({ text, want, count = 1, tracks = ONLY_TWO }) => {
    const got = parseGridFile(text);
    const hit = got.problems.find((p) => p.row === want.row && p.column === want.column && want.message.test(p.message));
    if (!hit) throw new Error(`no problem like ${JSON.stringify({ ...want, message: String(want.message) })} in ${JSON.stringify(got.problems, null, 1)}`);
    expect(hit.value).toBe(want.value);
    expect(got.problems).toHaveLength(count);
    expect(got.tracks.map((t) => `${t.initialMass},${t.z}`)).toEqual(tracks);
  });

  test('parseGridFile(text) collects every problem of a file, sorted by row, instead of stopping at the first', () => {
    let text = edit(4, 'mass', 'abc');
    text = text.replace('2,0.014,1e9,,main-sequence,1.9', '2,0.014,1e9,,main-sequence,2.5');
    text = text.replace('1,0.014,1e10,,subgiant,1,0.1,1,5772,1', '1,0.014,1e10,,giant,1,0.1,1,5772,3');
    const got = parseGridFile(text).problems.map((p: GridProblem) => [p.row, p.column]);
    expect(got).toEqual([[4, 'mass'], [7, 'radius'], [7, 'phase'], [11, 'mass']]);
    expect(keys(text)).toEqual([]);
  });

  test('parseGridFile(text) reads rows by column name when the header only reorders the columns, and says so', () => {
    const text = BASE.replace('luminosity,teff', 'teff,luminosity');
    const { problems } = parseGridFile(text);
    expect(problems[0]).toMatchObject({ row: 2, column: null, message: expect.stringMatching(/another order; .* \(rows were read by column name\)/) });
    // teff and luminosity swapped: every row's radius now disagrees with Stefan–Boltzmann
    expect(problems.slice(1).map((p) => [p.row, p.column])).toEqual([3, 4, 5, 6, 7, 8, 9, 10, 11].map((r) => [r, 'radius']));
  });
});

test('parseGridFile(text) gives phase codes of PHASE_INDEX', () => {
  expect(parseGridFile(BASE).tracks[0].phase[4]).toBe(PHASE_INDEX.subgiant);
});
