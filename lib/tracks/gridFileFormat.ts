/**
 * The open track-grid file layout, version 1: this project's own CSV layout for evolution
 * track grids, written by `writeGridFile`, read by `parseGridFile`, checked by
 * `checkGridTracks`. This comment is the layout's definition; the README points here.
 *
 * ## Lines
 *
 * 1. The first line is exactly `# starclock-grid v1` (an optional UTF-8 byte-order mark
 *    before it is allowed).
 * 2. Then the header line, exactly
 *    `initialMass,z,age,eep,phase,mass,coreMass,luminosity,teff,radius`.
 * 3. Then one row per track point. A **track** is a run of consecutive rows with the same
 *    (initialMass, z), compared as numbers (`1` and `1.0` are the same). Each (initialMass, z)
 *    is one run: it may not appear again later in the file.
 *
 * Lines that start with `#` after the first line are comments, allowed anywhere (also
 * inside a track). Empty lines are ignored. Lines end in LF or CRLF. Fields may be quoted
 * after RFC 4180 (`"…"`, with `""` for a quote inside); nothing in this layout needs quoting,
 * so writers never quote.
 *
 * ## Columns
 *
 * | column | unit | allowed |
 * |---|---|---|
 * | initialMass | Msun | finite, > 0 (any range: the built-in model's 0.01–150 Msun is no limit here) |
 * | z | metal mass fraction | 0 < z < 1 |
 * | age | yr since birth | finite, ≥ 0; never decreasing along a track, strictly increasing within a phase |
 * | eep | — | empty, or the primary EEP names on this row (below), separated by a space |
 * | phase | — | one of `PHASES` (lib/model/phases.ts); never earlier in life order than the row before |
 * | mass | Msun | finite, > 0; never growing along a track |
 * | coreMass | Msun | finite, 0 ≤ coreMass ≤ mass |
 * | luminosity | Lsun | finite, > 0 (bolometric) |
 * | teff | K | finite, > 0 |
 * | radius | Rsun | finite, > 0, within 1 % of the Stefan–Boltzmann radius R = √L / (Teff / 5772 K)² |
 *
 * Numbers are plain decimals with an optional exponent (`1.5`, `3e-7`, `1e+21`); `NaN`,
 * `Infinity`, hexadecimal and blanks are refused. At a phase boundary two consecutive rows
 * may share an age: the last row of one phase and the first of the next, so a state that
 * jumps there (the helium flash, the birth of a remnant) is exact.
 *
 * ## Primary EEPs
 *
 * Primary equivalent evolutionary points (names in `PRIMARY_EEPS`, lib/tracks/track.ts) sit
 * on these rows of a track; a track has only the EEPs of the phases it contains:
 *
 * | EEP | row |
 * |---|---|
 * | pms-start | the first row |
 * | zams | the first main-sequence row |
 * | ms-mid | the main-sequence row whose age is nearest the middle of the main sequence, (age of zams + age of tams) / 2; the earlier row on a tie |
 * | tams | the last main-sequence row |
 * | rgb-base | the last subgiant row |
 * | he-ignition | only on tracks with core-helium-burning rows: the last red-giant-branch row (the tip), or the first core-helium-burning row when there is no red giant branch |
 * | cheb-start | the first core-helium-burning row |
 * | cheb-end | the last core-helium-burning row |
 * | first-thermal-pulse | an asymptotic-giant-branch row (where the first thermal pulse is); the last AGB row when the track has no pulse or does not say where it is |
 * | agb-end | the last asymptotic-giant-branch row |
 * | remnant-birth | the first white-dwarf, neutron-star or black-hole row |
 * | track-end | the last row |
 *
 * Several EEPs can fall on one row (a track that starts at the ZAMS has `pms-start zams` on
 * its first row; a massive star without a red giant branch has `he-ignition cheb-start`).
 * Their names then share the `eep` cell, separated by a space, in the order of the table.
 *
 * A star whose envelope is lost on the red giant branch never ignites helium: its track has
 * red-giant-branch rows but no `he-ignition`.
 *
 * A track whose rows carry **no** EEP labels gets them placed by this table
 * (`placePrimaryEeps`; `first-thermal-pulse` then goes on the last AGB row). A track with
 * labels must carry every EEP the table gives it, each on its row (`ms-mid` on any
 * main-sequence row, `first-thermal-pulse` on any AGB row), with one exception: a track cut
 * off in mid-phase (at an age limit) may leave out the closing EEPs of the phase it stops in
 * (`ms-mid` and `tams` if it stops on the main sequence, `rgb-base` on the subgiant branch,
 * `cheb-end` in core helium burning, `first-thermal-pulse` and `agb-end` on the AGB). An
 * unlabelled track is taken to end where its last phase ends.
 *
 * @example
 * // the head of a file holding a 1 Msun track
 * // # starclock-grid v1
 * // initialMass,z,age,eep,phase,mass,coreMass,luminosity,teff,radius
 * // 1,0.014,39810.7,pms-start,pre-main-sequence,1,0,40.6,4300,11.5
 */
export const GRID_FILE_FIRST_LINE = '# starclock-grid v1';

/** The columns of the layout, in file order. */
export const GRID_FILE_COLUMNS = [
  'initialMass',
  'z',
  'age',
  'eep',
  'phase',
  'mass',
  'coreMass',
  'luminosity',
  'teff',
  'radius',
] as const;

/** One column name of the layout. */
export type GridFileColumn = (typeof GRID_FILE_COLUMNS)[number];

/** The header line (second line of the file), without line end. */
export const GRID_FILE_HEADER: string = GRID_FILE_COLUMNS.join(',');

/** Unit of each column; `—` for dimensionless or text columns. */
export const GRID_FILE_UNITS: Readonly<Record<GridFileColumn, string>> = Object.freeze({
  initialMass: 'Msun',
  z: 'metal mass fraction',
  age: 'yr',
  eep: '—',
  phase: '—',
  mass: 'Msun',
  coreMass: 'Msun',
  luminosity: 'Lsun',
  teff: 'K',
  radius: 'Rsun',
});

/** Separator between several primary EEP names in one `eep` cell. */
export const GRID_FILE_EEP_SEPARATOR = ' ';

/**
 * Largest allowed relative difference between a row's radius and the Stefan–Boltzmann
 * radius of its luminosity and teff (1 %: room for radii rounded to three digits).
 */
export const GRID_FILE_RADIUS_TOLERANCE = 0.01;

/** Nominal solar effective temperature used for the radius column, K (IAU 2015 B3). */
export const GRID_FILE_TEFF_SUN = 5772;

/**
 * One problem found in a grid file. Every problem names where it is and what is allowed.
 */
export interface GridProblem {
  /** 1-based line number in the file, as an editor shows it (a quoted field spanning lines counts from the line its row starts on) */
  row: number;
  /** the column the problem is in, or null when it concerns the whole row or file */
  column: string | null;
  /** the offending text as written, or null when something is missing */
  value: string | null;
  /** what is wrong and what is allowed */
  message: string;
}
