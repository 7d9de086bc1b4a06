import { Command } from 'commander';
import { mkdir, readdir, readFile, stat } from 'node:fs/promises';
import { dirname, join, resolve } from 'node:path';
import type { Life } from '../../lib/model/life.js';
import type { StarState } from '../../lib/model/starState.js';
import { STATE_KEYS } from '../../lib/model/starState.js';
import { formatAge } from '../../lib/io/formatAge.js';
import { formatCsv } from '../../lib/io/formatCsv.js';
import { formatStateValue } from '../../lib/io/formatStateValue.js';
import { formatTable } from '../../lib/io/formatTable.js';
import type { DemoStars } from '../../lib/io/parseDemoStars.js';
import { parseDemoStars } from '../../lib/io/parseDemoStars.js';
import { toJson } from '../../lib/io/toJson.js';
import { writeFileAtomic } from '../../lib/io/writeFileAtomic.js';
import type { Io } from '../io.js';
import { diagnostic } from '../io.js';
import { packageInfo } from '../packageRoot.js';
import { lifeTimeline } from './life.js';
import { presentState } from './star.js';

/** The demo scenario bundled with the package. */
export function demoStarsPath(): string {
  return join(packageInfo().root, 'tracks-demo', 'demo-stars.json');
}

/** File names the demo writes into its output directory. */
export const DEMO_FILES = Object.freeze({ states: 'present-states.csv', lives: 'lives.json' });

/** What the demo computed: the text for stdout and the files' contents. */
export interface DemoResult {
  summary: string;
  statesCsv: string;
  livesJson: string;
}

/**
 * Runs the demo scenario: each named star's present state and whole life.
 * Pure apart from the model's lazy import; writes nothing.
 *
 * @param scenario the validated star list
 * @returns the summary table (one row per star: present phase, type, L, Teff,
 *   main-sequence lifetime and fate), the present states as CSV (`name` then the
 *   schema's keys) and the lives as JSON (`{ region, stars: [{ name, ...life }] }`)
 */
export async function runDemo(scenario: DemoStars): Promise<DemoResult> {
  const states: StarState[] = [];
  const lives: Life[] = [];
  for (const star of scenario.stars) {
    states.push(await presentState(star.initialMass, star.age, star.z));
    lives.push(await lifeTimeline(star.initialMass, star.z));
  }
  const text = (key: keyof StarState, s: StarState): string => formatStateValue(key, s[key]).text;
  const rows = scenario.stars.map((star, i) => {
    const s = states[i];
    const age = formatAge(s.age, 3);
    const lifetime = formatAge(s.msLifetime, 3);
    return [
      star.name,
      text('initialMass', s),
      text('z', s),
      `${age.text} ${age.unit}`,
      s.phase,
      text('spectralType', s),
      text('luminosity', s),
      text('teff', s),
      s.msLifetime > 0 ? `${lifetime.text} ${lifetime.unit}` : '—',
      `${s.remnant} ${text('remnantMass', s)} Msun`,
    ];
  });
  const table = formatTable(
    ['star', 'birth mass (Msun)', 'z', 'age', 'phase now', 'type', 'L (Lsun)', 'Teff (K)', 'main sequence', 'ends as'],
    rows,
    ['left', 'right', 'right', 'right', 'left', 'left', 'right', 'right', 'right', 'left'],
  );
  const header = `${scenario.region}: ${scenario.stars.length} stars today\n\n`;
  const statesCsv = formatCsv(
    ['name', ...STATE_KEYS],
    scenario.stars.map((star, i) => [star.name, ...STATE_KEYS.map((key) => states[i][key])]),
  );
  const livesJson =
    toJson({ region: scenario.region, stars: scenario.stars.map((star, i) => ({ name: star.name, ...lives[i] })) }, 2) + '\n';
  return { summary: header + table, statesCsv, livesJson };
}

/** `starclock demo`: runs the bundled scenario and says what it wrote. */
export function demoCommand(io: Io): Command {
  return new Command('demo')
    .description('run the bundled demo scenario (an invented region) and write its results')
    .option('-o, --out-dir <dir>', 'directory for the output files (created if missing)', 'starclock-demo')
    .addHelpText(
      'after',
      `
Runs the bundled demo of an invented region end to end and says what it wrote:
tracks-demo/demo-stars.json (six named stars: a summary of each one's present state and
fate, ${DEMO_FILES.states} and ${DEMO_FILES.lives}); the catalogue
tracks-demo/orvel-catalogue.csv through batch (orvel-catalogue-states.csv); and every
scenario of tracks-demo/scenarios through population (<name>-population.csv), history
(<name>-history.json) and view (<name>.html, the animated page to open in a browser).
Each file is written to a temporary file first and renamed, so it is whole or absent.
`,
    )
    .action(async (options: { outDir: string }) => {
      const input = demoStarsPath();
      const scenario = parseDemoStars(await readFile(input, 'utf8'), input);
      const result = await runDemo(scenario);
      const dir = resolve(options.outDir);
      const existing = await stat(dir).catch(() => undefined);
      if (existing !== undefined && !existing.isDirectory()) {
        throw new RangeError(`--out-dir ${options.outDir} exists and is not a directory`);
      }
      await mkdir(dir, { recursive: true });
      const statesPath = join(dir, DEMO_FILES.states);
      const livesPath = join(dir, DEMO_FILES.lives);
      await writeFileAtomic(statesPath, result.statesCsv, [input]);
      await writeFileAtomic(livesPath, result.livesJson, [input]);
      io.out(result.summary);
      diagnostic(io, `wrote ${statesPath} (${scenario.stars.length} present states) and ${livesPath} (their lives)`);
      for (const line of await runDemoScenarios(dir, io)) diagnostic(io, line);
    });
}

/** The bundled scenarios (tracks-demo/scenarios/*.json) and the catalogue of named stars. */
export function demoScenarioDir(): string {
  return join(dirname(demoStarsPath()), 'scenarios');
}
export function demoCataloguePath(): string {
  return join(dirname(demoStarsPath()), 'orvel-catalogue.csv');
}

/**
 * The rest of the demo, end to end: the catalogue of named stars through `batch`, and every
 * bundled scenario through `population` (present states at its "now"), `history` (the
 * population over time) and `view` (the animated page). Each file is written whole or not at
 * all. Returns one line per file written, saying where to open the pages.
 */
export async function runDemoScenarios(dir: string, io: Io): Promise<string[]> {
  const said: string[] = [];
  const [{ loadBuiltinGrid }, { createGridQuery }, { runBatch }, { readScenarioFile }, { populationRows }, { populationHistory }, { writeFileAtomicChunks }, { writeViewerPage, slugify }, { historyJson }] = await Promise.all([
    import('../../lib/io/loadBuiltinGrid.js'),
    import('../../lib/interp/gridQuery.js'),
    import('../batchRun.js'),
    import('../scenarioFile.js'),
    import('../../lib/io/populationRows.js'),
    import('../../lib/population/populationHistory.js'),
    import('../../lib/io/writeFileAtomicChunks.js'),
    import('./view.js'),
    import('./history.js'),
  ]);
  const grid = loadBuiltinGrid();
  const query = createGridQuery(grid);
  const catalogue = demoCataloguePath();
  const catalogueOut = join(dir, 'orvel-catalogue-states.csv');
  const quiet: Io = { out: io.out, err: () => undefined };
  const b = await runBatch({ input: catalogue, output: catalogueOut, rejects: join(dir, 'orvel-catalogue-rejects.csv'), workers: 1, progress: false, grid, gridBytes: null }, quiet);
  said.push(`wrote ${catalogueOut} (${b.written} named stars of the catalogue through batch${b.rejected ? `, ${b.rejected} rejected` : ''})`);
  const files = (await readdir(demoScenarioDir())).filter((f) => f.endsWith('.json')).sort();
  for (const f of files) {
    const path = join(demoScenarioDir(), f);
    const scenario = await readScenarioFile(path);
    const slug = slugify(scenario.name);
    const popPath = join(dir, `${slug}-population.csv`);
    await writeFileAtomicChunks(popPath, populationRows(scenario, query, { start: 0, count: scenario.size, format: 'csv', header: true }), [path]);
    const histPath = join(dir, `${slug}-history.json`);
    await writeFileAtomic(histPath, JSON.stringify(historyJson(populationHistory(scenario, query))) + '\n', [path]);
    const page = await writeViewerPage(path, join(dir, `${slug}.html`), { grid });
    said.push(`${scenario.name}: wrote ${popPath} (${scenario.size} stars at ${scenario.now / 1e6} Myr), ${histPath}, and the viewer page ${page.path} — open it in a browser (file://${page.path})`);
  }
  return said;
}
