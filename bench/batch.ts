// `starclock batch` end to end on a generated table, against a bare CSV round trip in the same
// run; peak memory of a large batch against a small one. Run: npm run build && node dist/bench/batch.js
// [--rows N] [--big-rows N] [--reps N] [--json]. Inputs are generated in a temporary folder and deleted.
import { spawn } from 'node:child_process';
import { createReadStream, createWriteStream } from 'node:fs';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { once } from 'node:events';
import { fileURLToPath, pathToFileURL } from 'node:url';

const HERE = dirname(fileURLToPath(import.meta.url));
const BIN = join(HERE, '..', '..', 'bin', 'starclock.js');
/** Computed columns batch writes by default; the round trip writes as many numbers. */
const COMPUTED = 15;

/** One figure of the report. */
export interface Figure {
  value: number;
  unit: string;
  baseline: number;
  ratio: number;
}

// Invented names from syllables; a seeded generator so every run reads the same table.
const SYLLABLES = ['ka', 'vor', 'el', 'tris', 'mun', 'oth', 'ra', 'sel', 'dun', 'ix', 'pel', 'quor', 'an', 'zed', 'lum', 'ber'];

function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Writes `rows` stars: invented name, birth mass log-uniform 0.1–100 Msun, age uniform 0–13.8 Gyr. */
export async function writeStars(path: string, rows: number, seed = 1): Promise<void> {
  const random = rng(seed);
  const out = createWriteStream(path);
  out.write('name,mass,age_Gyr\n');
  let block = '';
  for (let i = 0; i < rows; i++) {
    const name = SYLLABLES[Math.floor(random() * 16)] + SYLLABLES[Math.floor(random() * 16)] + SYLLABLES[Math.floor(random() * 16)];
    const mass = 0.1 * 1000 ** random();
    const age = 13.8 * random();
    block += `${name[0].toUpperCase()}${name.slice(1)} ${i % 7 === 0 ? 'B' : 'A'},${mass.toPrecision(5)},${age.toPrecision(4)}\n`;
    if (block.length > 1 << 16) {
      if (!out.write(block)) await once(out, 'drain');
      block = '';
    }
  }
  out.write(block);
  out.end();
  await once(out, 'finish');
}

/**
 * The baseline: a bare CSV round trip with no physics — stream the same file, split each line,
 * read its two numbers, and write the line back with as many numeric columns as batch computes
 * (String(x) of simple products, the same number formatting batch uses), to a file.
 */
export async function roundTrip(input: string, output: string): Promise<void> {
  const out = createWriteStream(output);
  let rest = '';
  let header = true;
  let text = '';
  const flush = async () => {
    if (!out.write(text)) await once(out, 'drain');
    text = '';
  };
  for await (const chunk of createReadStream(input, { encoding: 'utf8', highWaterMark: 1 << 20 })) {
    const lines = (rest + (chunk as string)).split('\n');
    rest = lines.pop()!;
    for (const line of lines) {
      if (header) {
        header = false;
        let h = line;
        for (let c = 0; c < COMPUTED; c++) h += ',c' + c;
        text += h + '\n';
        continue;
      }
      const f = line.split(',');
      const m = Number(f[1]);
      const a = Number(f[2]);
      let row = line;
      for (let c = 0; c < COMPUTED; c++) row += ',' + (m * (c + 1.37) + a / (c + 0.71));
      text += row + '\n';
      // written in pieces of about 64 KB, as a streaming writer would
      if (text.length > 1 << 16) await flush();
    }
    await flush();
  }
  out.end();
  await once(out, 'finish');
}

interface ChildRun {
  seconds: number;
  rssMB: number;
  code: number;
}

// Runs node with a preload that prints the process's peak resident memory when it exits.
async function child(args: string[], rssHook: string): Promise<ChildRun> {
  const t0 = performance.now();
  const proc = spawn(process.execPath, ['--import', pathToFileURL(rssHook).href, ...args], { stdio: ['ignore', 'ignore', 'pipe'] });
  let stderr = '';
  proc.stderr.setEncoding('utf8').on('data', (d: string) => (stderr += d));
  const [code] = (await once(proc, 'exit')) as [number];
  const seconds = (performance.now() - t0) / 1000;
  const m = /PEAK_RSS_KB (\d+)/.exec(stderr);
  if (code !== 0 || m === null) throw new Error(`${args.join(' ')} exited ${code}: ${stderr}`);
  return { seconds, rssMB: Number(m[1]) / 1024, code };
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

/** Runs the benchmark and returns its figures (rates in rows/s, memory in MB). */
export async function benchBatch(rows = 1_000_000, bigRows = 5_000_000, reps = 3): Promise<Record<string, Figure>> {
  const dir = await mkdtemp(join(tmpdir(), 'starclock-bench-batch-'));
  try {
    const rssHook = join(dir, 'rss.mjs');
    await writeFile(
      rssHook,
      "import { writeSync } from 'node:fs';\nprocess.on('exit', () => writeSync(2, `\\nPEAK_RSS_KB ${process.resourceUsage().maxRSS}\\n`));\n",
    );
    const input = join(dir, 'stars.csv');
    const output = join(dir, 'out.csv');
    await writeStars(input, rows);
    const self = fileURLToPath(import.meta.url);
    const trip: number[] = [];
    const one: number[] = [];
    const two: number[] = [];
    const pair: number[] = [];
    let oneRss = 0;
    for (let r = 0; r < reps; r++) {
      trip.push(rows / (await child([self, '--round-trip', input, output], rssHook)).seconds);
      const a = await child([BIN, 'batch', input, '-o', output, '--no-progress'], rssHook);
      one.push(rows / a.seconds);
      oneRss = Math.max(oneRss, a.rssMB);
      two.push(rows / (await child([BIN, 'batch', input, '-o', output, '--no-progress', '--workers', '2'], rssHook)).seconds);
      // the machine's own ceiling for two threads of this work: two independent one-thread
      // batches at once (nothing shared but the hardware), rows of both over the slower one's time
      const both = await Promise.all([0, 1].map((i) => child([BIN, 'batch', input, '-o', `${output}.${i}`, '--no-progress'], rssHook)));
      pair.push((2 * rows) / Math.max(both[0].seconds, both[1].seconds));
    }
    await rm(input);
    await writeStars(input, bigRows, 2);
    const big = await child([BIN, 'batch', input, '-o', output, '--no-progress'], rssHook);
    const tripRate = median(trip);
    const oneRate = median(one);
    const twoRate = median(two);
    const pairRate = median(pair);
    return {
      roundTripRate: { value: tripRate, unit: 'rows/s', baseline: tripRate, ratio: 1 },
      batchRate: { value: oneRate, unit: 'rows/s', baseline: tripRate, ratio: oneRate / tripRate },
      batch2WorkersRate: { value: twoRate, unit: 'rows/s', baseline: oneRate, ratio: twoRate / oneRate },
      twoProcessesRate: { value: pairRate, unit: 'rows/s', baseline: oneRate, ratio: pairRate / oneRate },
      peakRssSmall: { value: oneRss, unit: 'MB', baseline: oneRss, ratio: 1 },
      peakRssBig: { value: big.rssMB, unit: 'MB', baseline: oneRss, ratio: big.rssMB / oneRss },
    };
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}

const LABELS: Record<string, string> = {
  roundTripRate: 'bare CSV round trip (baseline)',
  batchRate: 'batch, 1 thread (vs round trip)',
  batch2WorkersRate: 'batch, --workers 2 (vs 1 thread)',
  twoProcessesRate: '2 separate 1-thread batches at once',
  peakRssSmall: 'peak RSS, small table',
  peakRssBig: 'peak RSS, big table (vs small)',
};

async function cli(argv: string[]): Promise<void> {
  if (argv[0] === '--round-trip') {
    await roundTrip(argv[1], argv[2]);
    return;
  }
  const arg = (name: string, fallback: number) => {
    const i = argv.indexOf(name);
    return i >= 0 ? Number(argv[i + 1]) : fallback;
  };
  const rows = arg('--rows', 1_000_000);
  const bigRows = arg('--big-rows', 5 * rows);
  const figures = await benchBatch(rows, bigRows, arg('--reps', 3));
  if (argv.includes('--json')) {
    process.stdout.write(JSON.stringify(figures) + '\n');
    return;
  }
  process.stdout.write(`batch benchmark: ${rows} rows (big table ${bigRows} rows), median of repetitions\n`);
  for (const [key, f] of Object.entries(figures)) {
    const value = f.unit === 'MB' ? f.value.toFixed(0) : Math.round(f.value).toString();
    const base = f.unit === 'MB' ? f.baseline.toFixed(0) : Math.round(f.baseline).toString();
    process.stdout.write(`${LABELS[key].padEnd(38)} ${value.padStart(9)} ${f.unit.padEnd(6)} baseline ${base.padStart(9)}  ratio ${f.ratio.toFixed(2)}\n`);
  }
}

if (process.argv[1] !== undefined && fileURLToPath(import.meta.url) === process.argv[1]) {
  await cli(process.argv.slice(2));
}
