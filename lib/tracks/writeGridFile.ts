import { PHASES, isRemnantPhase } from '../model/phases.js';
import { PRIMARY_EEPS, type Track } from './track.js';
import { GRID_FILE_EEP_SEPARATOR, GRID_FILE_FIRST_LINE, GRID_FILE_HEADER, GRID_FILE_TEFF_SUN } from './gridFileFormat.js';

/** Options of {@link writeGridFile}. */
export interface WriteGridFileOptions {
  /** comment lines written after the first line, each as `# <text>` (no line breaks) */
  comments?: readonly string[];
}

/** Size, in UTF-16 code units, at which buffered rows are handed to `out`. */
const CHUNK = 1 << 16;
const EEP_SET: ReadonlySet<string> = new Set(PRIMARY_EEPS);

/**
 * Writes tracks in the open grid layout (gridFileFormat.ts) to `out`, in chunks of about
 * 64 K characters, never as one whole-file string. Every track is checked before anything is
 * written, so `out` sees either the whole file or nothing.
 *
 * Numbers are `String(x)`, the shortest decimal that reads back to the same double: age,
 * mass and coreMass round-trip exactly. The file holds luminosity = 10^logL and teff =
 * 10^logTeff; `parseGridFile` stores log10 of what it reads. That round trip is exact when
 * |logL| (or |logTeff|) ≥ 1 and within 1.2e-16 dex (2^-53, half an ulp of 1) otherwise —
 * a relative error in L or Teff of at most 2.6e-16, property-tested in
 * test/tracks-gridFileRoundTrip.test.ts. Closer to 0 the doubles of log L are finer than the
 * doubles of L can tell apart (d log L = dL / (L ln 10)), so no printing of L recovers them
 * all. radius = √L / (Teff / 5772 K)² (Stefan–Boltzmann with the IAU 2015 B3 nominal Sun).
 * Lines end in LF; nothing needs quoting.
 *
 * @param tracks the tracks, each written as one run of rows in the order given
 * @param out receives the text in order
 * @param options comment lines for the head of the file
 * @throws RangeError naming the track (initialMass, z), the point and the value when a track
 *   cannot be written as a valid file: fewer than one point, columns shorter than `n`, a value
 *   not finite or out of range (luminosity or teff that over- or underflow), ages decreasing,
 *   mass growing, phases out of life order or after a remnant, an unknown phase code or EEP,
 *   an EEP index outside the track, or two tracks with the same (initialMass, z); or when a
 *   comment holds a line break
 * @example
 * const chunks: string[] = [];
 * writeGridFile([generateTrack(1)], (c) => chunks.push(c));
 * chunks.join('').split('\n').slice(0, 2)
 * // ['# starclock-grid v1', 'initialMass,z,age,eep,phase,mass,coreMass,luminosity,teff,radius']
 */
export function writeGridFile(tracks: readonly Track[], out: (chunk: string) => void, options: WriteGridFileOptions = {}): void {
  const comments = options.comments ?? [];
  for (const c of comments) {
    if (/[\r\n]/.test(c)) throw new RangeError(`comment ${JSON.stringify(c)} holds a line break; each comment is one line`);
  }
  const keys = new Map<string, number>();
  tracks.forEach((t, k) => {
    checkTrack(t, k);
    const key = `${t.initialMass},${t.z}`;
    const before = keys.get(key);
    if (before !== undefined) {
      throw new RangeError(`tracks ${before} and ${k} both have initialMass ${t.initialMass} Msun, z ${t.z}; a grid holds each (initialMass, z) once`);
    }
    keys.set(key, k);
  });

  let buf = GRID_FILE_FIRST_LINE + '\n';
  for (const c of comments) buf += `# ${c}\n`;
  buf += GRID_FILE_HEADER + '\n';
  for (const t of tracks) {
    const head = `${String(t.initialMass)},${String(t.z)},`;
    const cells: string[] = new Array<string>(t.n).fill('');
    for (const e of t.eeps) cells[e.index] = cells[e.index] === '' ? e.name : cells[e.index] + GRID_FILE_EEP_SEPARATOR + e.name;
    const { age, mass, coreMass, logL, logTeff, phase } = t;
    for (let i = 0; i < t.n; i++) {
      const L = 10 ** logL[i];
      const T = 10 ** logTeff[i];
      const s = T / GRID_FILE_TEFF_SUN;
      const R = Math.sqrt(L) / (s * s);
      buf += `${head}${String(age[i])},${cells[i]},${PHASES[phase[i]]},${String(mass[i])},${String(coreMass[i])},${String(L)},${String(T)},${String(R)}\n`;
      if (buf.length >= CHUNK) {
        out(buf);
        buf = '';
      }
    }
  }
  if (buf.length > 0) out(buf);
}

/** Throws a RangeError naming the first value of track `k` that a valid file cannot hold. */
function checkTrack(t: Track, k: number): void {
  const name = `track ${k} (initialMass ${t.initialMass} Msun, z ${t.z})`;
  if (!(Number.isFinite(t.initialMass) && t.initialMass > 0)) throw new RangeError(`${name}: initialMass must be a finite number > 0 Msun`);
  if (!(Number.isFinite(t.z) && t.z > 0 && t.z < 1)) throw new RangeError(`${name}: z must be between 0 and 1 (exclusive)`);
  const n = t.n;
  if (!(Number.isInteger(n) && n >= 1)) throw new RangeError(`${name}: n ${n} must be a whole number ≥ 1`);
  for (const c of ['age', 'mass', 'coreMass', 'logL', 'logTeff', 'phase'] as const) {
    if (t[c].length < n) throw new RangeError(`${name}: column ${c} has ${t[c].length} values, fewer than n ${n}`);
  }
  const { age, mass, coreMass, logL, logTeff, phase } = t;
  for (let i = 0; i < n; i++) {
    const at = `${name}, point ${i}`;
    if (!(Number.isFinite(age[i]) && age[i] >= 0)) throw new RangeError(`${at}: age ${age[i]} yr must be finite and ≥ 0`);
    if (!(Number.isFinite(mass[i]) && mass[i] > 0)) throw new RangeError(`${at}: mass ${mass[i]} Msun must be finite and > 0`);
    if (!(Number.isFinite(coreMass[i]) && coreMass[i] >= 0 && coreMass[i] <= mass[i])) {
      throw new RangeError(`${at}: coreMass ${coreMass[i]} Msun must be finite, ≥ 0 and ≤ mass ${mass[i]} Msun`);
    }
    const L = 10 ** logL[i];
    if (!(Number.isFinite(L) && L > 0)) throw new RangeError(`${at}: logL ${logL[i]} gives luminosity ${L} Lsun; it must be finite and > 0`);
    const T = 10 ** logTeff[i];
    if (!(Number.isFinite(T) && T > 0)) throw new RangeError(`${at}: logTeff ${logTeff[i]} gives teff ${T} K; it must be finite and > 0`);
    const s = T / GRID_FILE_TEFF_SUN;
    const R = Math.sqrt(L) / (s * s);
    if (!(Number.isFinite(R) && R > 0)) throw new RangeError(`${at}: luminosity ${L} Lsun and teff ${T} K give radius ${R} Rsun; it must be finite and > 0`);
    if (phase[i] >= PHASES.length) throw new RangeError(`${at}: phase code ${phase[i]} is not a phase; codes are 0–${PHASES.length - 1}`);
    if (i > 0) {
      if (age[i] < age[i - 1]) throw new RangeError(`${at}: age ${age[i]} yr is before the previous point's ${age[i - 1]} yr`);
      if (age[i] === age[i - 1] && phase[i] === phase[i - 1]) {
        throw new RangeError(`${at}: age ${age[i]} yr repeats the previous point's within ${PHASES[phase[i]]}; ages increase strictly within a phase`);
      }
      if (mass[i] > mass[i - 1]) throw new RangeError(`${at}: mass ${mass[i]} Msun is more than the previous point's ${mass[i - 1]} Msun`);
      if (phase[i] < phase[i - 1]) throw new RangeError(`${at}: phase ${PHASES[phase[i]]} comes after ${PHASES[phase[i - 1]]}, against life order`);
      if (phase[i] !== phase[i - 1] && isRemnantPhase(PHASES[phase[i - 1]])) {
        throw new RangeError(`${at}: phase ${PHASES[phase[i]]} follows the remnant phase ${PHASES[phase[i - 1]]}`);
      }
    }
  }
  const seen = new Set<string>();
  for (const e of t.eeps) {
    if (!EEP_SET.has(e.name)) throw new RangeError(`${name}: '${e.name}' is not a primary EEP; the names are: ${PRIMARY_EEPS.join(', ')}`);
    if (!(Number.isInteger(e.index) && e.index >= 0 && e.index < n)) throw new RangeError(`${name}: EEP ${e.name} index ${e.index} is outside 0–${n - 1}`);
    if (seen.has(e.name)) throw new RangeError(`${name}: EEP ${e.name} is listed twice`);
    seen.add(e.name);
  }
}
