// Benchmarks: `npm run bench` (builds, then runs dist/bench/run.js); `-- --json` for one JSON object.
// Every figure is compared, in the same run, against a simple baseline, and the ratio is printed.
import { spawnSync } from 'node:child_process';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { generateTrack } from '../lib/model/generateTrack.js';
import { starAt } from '../lib/model/starAt.js';
import type { Track } from '../lib/tracks/track.js';
import { loadBuiltinGrid } from '../lib/io/loadBuiltinGrid.js';
import { builtinGridPath } from '../lib/io/builtinGridPath.js';
import { allocateStateColumns, createGridQuery } from '../lib/interp/gridQuery.js';
import { accuracySample, type AccuracyRow } from '../lib/interp/accuracySample.js';

const ROOT = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
const BIN = join(ROOT, 'bin', 'starclock.js');

interface Figure {
  value: number;
  unit: string;
  baseline: number;
  ratio: number;
}

function median(xs: number[]): number {
  const sorted = [...xs].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 === 1 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

const now = (): number => Number(process.hrtime.bigint()) / 1e3; // µs

/**
 * Masses spread evenly in log from 0.1 to 100 Msun. A mass the model cannot build is left out and
 * reported on stderr, so a model failure shows instead of crashing or silently shrinking the figure.
 */
function masses(count: number): Float64Array {
  const out: number[] = [];
  const failed: string[] = [];
  for (let i = 0; i < count; i++) {
    const m = 0.1 * 1000 ** (i / (count - 1));
    try {
      generateTrack(m);
      out.push(m);
    } catch (error) {
      failed.push(`${m.toPrecision(4)} Msun (${(error as Error).message})`);
    }
  }
  if (failed.length > 0) {
    process.stderr.write(`bench: generateTrack failed for ${failed.length} of ${count} masses, left out:\n  ${failed.join('\n  ')}\n`);
  }
  return Float64Array.from(out);
}

// Baseline for track generation: allocate the same columns for the same number of points and fill
// them with closed-form textbook relations (t_MS = 10 Gyr M^-2.5, L = M^3.5, R = M^0.8) — the cost of
// a track with no physics in it.
function baselineTrack(initialMass: number, n: number): Float64Array[] {
  const age = new Float64Array(n);
  const mass = new Float64Array(n);
  const coreMass = new Float64Array(n);
  const logL = new Float64Array(n);
  const logTeff = new Float64Array(n);
  const tms = 1e10 * initialMass ** -2.5;
  const l0 = 3.5 * Math.log10(initialMass);
  const r0 = 0.8 * Math.log10(initialMass);
  for (let i = 0; i < n; i++) {
    const f = i / (n - 1);
    age[i] = tms * f;
    mass[i] = initialMass;
    coreMass[i] = 0.1 * initialMass * f;
    logL[i] = l0 + 0.3 * f;
    logTeff[i] = 3.7617 + 0.25 * (logL[i] - 2 * (r0 + 0.1 * f));
  }
  return [age, mass, coreMass, logL, logTeff];
}

// Baseline for a state query: bisect the track's ages and blend log L linearly — the least a query can do.
function baselineQuery(track: Track, age: number): number {
  const ages = track.age;
  let lo = 0;
  let hi = track.n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (ages[mid] <= age) lo = mid;
    else hi = mid;
  }
  const span = ages[hi] - ages[lo];
  const f = span > 0 ? (age - ages[lo]) / span : 0;
  return track.logL[lo] + f * (track.logL[hi] - track.logL[lo]);
}

let sink = 0;

function benchTracks(rounds: number, grid: Float64Array): Figure {
  const real: number[] = [];
  const base: number[] = [];
  for (let r = 0; r < rounds; r++) {
    for (let i = 0; i < grid.length; i++) {
      let t = now();
      const track = generateTrack(grid[i]);
      real.push(now() - t);
      t = now();
      const columns = baselineTrack(grid[i], track.n);
      base.push(now() - t);
      sink += track.n + columns[3][columns[3].length - 1];
    }
  }
  const value = median(real);
  const baseline = median(base);
  return { value, unit: 'µs per track', baseline, ratio: value / baseline };
}

function benchQueries(grid: Float64Array, perTrack: number): Figure {
  const tracks = Array.from(grid, (m) => generateTrack(m));
  const real: number[] = [];
  const base: number[] = [];
  for (const track of tracks) {
    const end = track.age[track.n - 1];
    const ages = new Float64Array(perTrack);
    for (let j = 0; j < perTrack; j++) ages[j] = Math.max(1, end * ((j + 0.5) / perTrack));
    let t = now();
    for (let j = 0; j < perTrack; j++) sink += starAt(track, Math.min(ages[j], 1e11)).luminosity;
    real.push((now() - t) / perTrack);
    t = now();
    for (let j = 0; j < perTrack; j++) sink += baselineQuery(track, ages[j]);
    base.push((now() - t) / perTrack);
  }
  const value = median(real);
  const baseline = median(base);
  return { value, unit: 'µs per query', baseline, ratio: value / baseline };
}

function wallMs(args: string[]): number {
  const t = now();
  const result = spawnSync(process.execPath, args, { cwd: ROOT, stdio: ['ignore', 'ignore', 'pipe'] });
  const elapsed = (now() - t) / 1e3;
  if (result.status !== 0) throw new Error(`node ${args.join(' ')} failed: ${result.stderr}`);
  return elapsed;
}

function benchStartup(runs: number): Figure {
  const real: number[] = [];
  const base: number[] = [];
  wallMs(['-e', '0']);
  wallMs([BIN, 'star', '--mass', '1', '--age', '4.6Gyr']);
  // Interleaved, so both see the same machine load.
  for (let i = 0; i < runs; i++) {
    base.push(wallMs(['-e', '0']));
    real.push(wallMs([BIN, 'star', '--mass', '1', '--age', '4.6Gyr']));
  }
  const value = median(real);
  const baseline = median(base);
  return { value, unit: 'ms per process', baseline, ratio: value / baseline };
}

/** Park & Miller 1988 minimal standard generator: a fixed, reproducible sample. */
function minstd(seed: number): () => number {
  let state = seed;
  return () => (state = (state * 16807) % 2147483647) / 2147483647;
}

/**
 * Grid queries per second, single-threaded: `createGridQuery(loadBuiltinGrid()).columns()` on
 * `count` random stars (initial mass log-uniform 0.1–100 Msun, age uniform 0–13.8 Gyr, z 0.014,
 * seed 20260101) into preallocated columns; best of `reps`. Baseline: a floor loop over the
 * same arrays doing one Math.pow per star into a preallocated column — the least any per-star
 * computation costs here. ratio = value / baseline (the fraction of the floor's rate reached).
 */
function benchInterpolate(count: number, reps: number): Figure {
  const rnd = minstd(20260101);
  const m = new Float64Array(count);
  const age = new Float64Array(count);
  for (let i = 0; i < count; i++) {
    m[i] = 0.1 * 1000 ** rnd();
    age[i] = 13.8e9 * rnd();
  }
  const query = createGridQuery(loadBuiltinGrid());
  const out = allocateStateColumns(count);
  const floorOut = new Float64Array(count);
  let best = Infinity;
  let bestFloor = Infinity;
  for (let r = 0; r < reps; r++) {
    let t = now();
    query.columns({ initialMass: m, age, z: 0.014 }, out);
    best = Math.min(best, now() - t);
    sink += out.luminosity[r];
    t = now();
    for (let i = 0; i < count; i++) floorOut[i] = Math.pow(m[i], 2.5) + age[i];
    bestFloor = Math.min(bestFloor, now() - t);
    sink += floorOut[r];
  }
  const value = count / (best / 1e6);
  const baseline = count / (bestFloor / 1e6);
  return { value, unit: 'queries/s', baseline, ratio: value / baseline };
}

/** Milliseconds from process start to the end of `script`, reported by a fresh child process. */
function childMs(script: string): number {
  const result = spawnSync(process.execPath, ['--input-type=module', '-e', `${script}\nprocess.stdout.write(String(performance.now()));`], {
    cwd: ROOT,
    encoding: 'utf8',
  });
  if (result.status !== 0) throw new Error(`child failed: ${result.stderr}`);
  return Number(result.stdout);
}

/**
 * Time from nothing to a ready built-in grid: in a fresh child process, importing
 * loadBuiltinGrid and calling it once (open the cache: its header and each slab's track masses;
 * runs are read on first use), measured
 * inside the child as performance.now() (ms since the process started) minus the same figure
 * of a bare child that imports nothing — so node's own start-up is taken out. Baseline: a child
 * that only reads the whole cache file (readFileSync), minus the bare child — what a loader that
 * reads everything up front would cost at least (this one defers the runs to their first use). Medians of `runs`, interleaved so all three see the same load.
 */
function benchGridReady(runs: number): Figure {
  const url = new URL('../lib/io/loadBuiltinGrid.js', import.meta.url).href;
  const cache = builtinGridPath().href;
  const load = `const { loadBuiltinGrid } = await import(${JSON.stringify(url)}); loadBuiltinGrid();`;
  const read = `const { readFileSync } = await import('node:fs'); readFileSync(new URL(${JSON.stringify(cache)}));`;
  const bare = [];
  const loaded = [];
  const readOnly = [];
  childMs(load);
  for (let i = 0; i < runs; i++) {
    bare.push(childMs(''));
    loaded.push(childMs(load));
    readOnly.push(childMs(read));
  }
  const value = median(loaded) - median(bare);
  const baseline = median(readOnly) - median(bare);
  return { value, unit: 'ms to a ready grid', baseline, ratio: value / baseline };
}

const dex = (x: number): string => (x === 0 ? '0' : x.toPrecision(2));

/** The interpolator's accuracy against the direct model (accuracySample), as a text table. */
function accuracyTable(): string {
  const query = createGridQuery(loadBuiltinGrid());
  const rows: [string, AccuracyRow][] = [
    ...accuracySample(query, { count: 1000, z: 0.014 }).map((r): [string, AccuracyRow] => ['0.014 (a grid node), 1000 stars', r]),
    ...accuracySample(query, { count: 400, z: 0.0042 }).map((r): [string, AccuracyRow] => ['0.0042 (between nodes), 400 stars', r]),
  ];
  const header = ['z', 'group', 'stars', 'short phases left out', 'median |Δlog L|', 'p90 |Δlog L|', 'median |Δlog Teff|', 'p90 |Δlog Teff|', 'phase agreement'];
  const cells = rows.map(([z, r]) => [
    z, r.group, String(r.stars), String(r.shortPhasesLeftOut), dex(r.medianDLogL), dex(r.p90DLogL),
    dex(r.medianDLogTeff), dex(r.p90DLogTeff), `${(100 * r.phaseAgreement).toFixed(1)} %`,
  ]);
  const widths = header.map((h, c) => Math.max(h.length, ...cells.map((r) => r[c].length)));
  const line = (row: string[]): string => row.map((cell, c) => cell.padEnd(widths[c])).join('  ').trimEnd();
  return [
    'Interpolation accuracy against the direct model (accuracySample; ages drawn inside a phase, away from its ends):',
    line(header), line(widths.map((w) => '-'.repeat(w))), ...cells.map(line),
  ].join('\n') + '\n';
}

function run(json: boolean): void {
  const grid = masses(60);
  // Warm up the JIT before measuring.
  benchTracks(3, grid);
  const figures: Record<string, Figure> = {
    trackGeneration: benchTracks(15, grid),
    stateQuery: benchQueries(grid, 2000),
    cliStarProcess: benchStartup(15),
    interpolate: benchInterpolate(1_000_000, 7),
    gridReady: benchGridReady(15),
  };
  const accuracy = accuracyTable();
  if (json) {
    process.stdout.write(JSON.stringify(figures, null, 2) + '\n');
    process.stderr.write(accuracy);
    return;
  }
  const what: Record<string, [string, string]> = {
    trackGeneration: [`generateTrack, ${grid.length} masses 0.1–100 Msun (median)`, 'same columns filled by textbook power laws'],
    stateQuery: ['starAt on a built track (median)', 'bisect + linear blend of log L'],
    cliStarProcess: ['`starclock star --mass 1 --age 4.6Gyr` (median of 15)', '`node -e 0` (median of 15)'],
    interpolate: ['grid columns(), 10^6 random stars, one thread (best of 7)', 'one Math.pow per star'],
    gridReady: ['fresh process: loadBuiltinGrid minus bare node (median of 15)', 'readFileSync of the cache minus bare node'],
  };
  const rows = Object.entries(figures).map(([name, f]) => [
    name,
    what[name][0],
    `${f.value.toPrecision(3)} ${f.unit}`,
    what[name][1],
    `${f.baseline.toPrecision(3)} ${f.unit}`,
    `${f.ratio.toPrecision(3)}×`,
  ]);
  const header = ['figure', 'measures', 'value', 'baseline', 'baseline value', 'ratio'];
  const widths = header.map((h, c) => Math.max(h.length, ...rows.map((r) => r[c].length)));
  const line = (cells: string[]): string => cells.map((cell, c) => cell.padEnd(widths[c])).join('  ').trimEnd();
  process.stdout.write([line(header), line(widths.map((w) => '-'.repeat(w))), ...rows.map(line)].join('\n') + '\n');
  process.stdout.write(`node ${process.version}, ${process.platform}/${process.arch}; ratio = value / baseline\n\n`);
  process.stdout.write(accuracy);
  if (sink === 42) process.stdout.write('\n'); // keeps results alive
}

run(process.argv.includes('--json'));
