import { Command, InvalidArgumentError, Option } from 'commander';
import { readFile } from 'node:fs/promises';
import { createServer, type Server } from 'node:http';
import { basename, extname, resolve } from 'node:path';
import type { ViewerPayload } from '../../lib/io/viewerPayload.js';
import type { Grid } from '../../lib/tracks/grid.js';
import type { Io } from '../io.js';
import { diagnostic } from '../io.js';
import { readInputText, loadGridFile } from '../gridSource.js';
import { packageInfo } from '../packageRoot.js';
import { gridOption, parseAgeOption } from '../options.js';

/** Stars per table time grid (linear); a scenario brings its own grid (`history`). */
export const TABLE_TIME_STEPS = 200;
/** How far past a table's present the clock runs by default, yr. */
export const TABLE_DEFAULT_UNTIL = 5e9;
/** Above this many stars a page plays below 30 frames per second on a small machine (bench/viewer.ts). */
export const VIEWER_SMOOTH_STARS = 100_000;

/** Options of {@link viewerPayloadFromText}. */
export interface ViewerInputOptions {
  /** unit of bare table ages when the header names none */
  ageUnit?: string;
  /** yr past a table's present the clock runs (default 5 Gyr) */
  until?: number;
  /** the grid to embed (default: the built-in grid) */
  grid?: Grid;
  /** where warnings go */
  warn?: (message: string) => void;
}

/** A file name for a title: letters, digits and dashes. */
export function slugify(name: string): string {
  const s = name.normalize('NFKD').replace(/[\u0300-\u036f]/g, '').toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '');
  return s === '' ? 'population' : s.slice(0, 80);
}

/**
 * The payload of a viewer page from the text of a scenario (a JSON object: sampled with
 * samplePopulation, seeded, on the scenario's own time grid) or of a table of stars (CSV,
 * NDJSON or a JSON array, read by readStarTable; time runs as an offset from the table's
 * present: every star's age shifted alike, the clock linear from the oldest star's birth to
 * `until` past the present, starting at the present).
 *
 * @param text the file's content
 * @param fileName the input's name (a table's title)
 * @throws RangeError for a bad scenario, a bad table, or stars outside the grid (naming the
 *   star or line, the value and the grid's range)
 */
export async function viewerPayloadFromText(text: string, fileName: string, options: ViewerInputOptions = {}): Promise<ViewerPayload> {
  const { viewerPayload } = await import('../../lib/io/viewerPayload.js');
  const { encodeViewerGrid } = await import('../../lib/io/viewerPayloadGrid.js');
  const grid = options.grid ?? (await import('../../lib/io/loadBuiltinGrid.js')).loadBuiltinGrid();
  const { massRange, zRange, source } = grid;
  const end = (x: number) => String(Number(x.toPrecision(6)));
  const inGrid = (m: number, z: number, where: string) => {
    if (!(m >= massRange.min && m <= massRange.max)) throw new RangeError(`${where}: initialMass ${m} outside the ${source} grid's ${end(massRange.min)}–${end(massRange.max)} Msun`);
    if (!(z >= zRange.min && z <= zRange.max)) throw new RangeError(`${where}: z ${z} outside the ${source} grid's ${end(zRange.min)}–${end(zRange.max)}`);
  };
  const zSpan = (zs: ArrayLike<number>) => {
    let lo = Infinity;
    let hi = -Infinity;
    for (let i = 0; i < zs.length; i++) {
      if (zs[i] < lo) lo = zs[i];
      if (zs[i] > hi) hi = zs[i];
    }
    return [lo, hi] as const;
  };
  let doc: unknown;
  const trimmed = text.replace(/^\uFEFF/, '').trimStart();
  if (trimmed.startsWith('{')) {
    try {
      doc = JSON.parse(trimmed);
    } catch {
      doc = undefined; // NDJSON: a table
    }
  }
  if (doc !== undefined && doc !== null && typeof doc === 'object' && !Array.isArray(doc)) {
    const { parseScenario } = await import('../../lib/population/parseScenario.js');
    const { samplePopulation } = await import('../../lib/population/samplePopulation.js');
    const scenario = parseScenario(doc);
    if (scenario.size > VIEWER_SMOOTH_STARS) {
      options.warn?.(`warning: ${scenario.size} stars: the page will play below 30 frames per second on a small machine (about 30 at ${VIEWER_SMOOTH_STARS})`);
    }
    const sample = samplePopulation(scenario);
    for (let i = 0; i < sample.initialMass.length; i++) inGrid(sample.initialMass[i], sample.z[i], `star ${sample.index[i]}`);
    const [z0, z1] = zSpan(sample.z);
    const h = scenario.history;
    return viewerPayload({
      title: scenario.name,
      source: 'scenario',
      time: { from: h.from, to: h.to, steps: h.steps, spacing: h.spacing, now: scenario.now, start: scenario.now, clock: 'elapsed' },
      initialMass: sample.initialMass,
      birthTime: sample.birthTime,
      z: sample.z,
      name: null,
      massLimits: { min: Math.max(scenario.imf.minMass, massRange.min), max: Math.min(scenario.imf.maxMass, massRange.max) },
      grid: encodeViewerGrid(grid, z0, z1),
    });
  }
  const { readStarTable } = await import('../../lib/io/viewerPayloadTable.js');
  const { MAX_AGE } = await import('../../lib/model/limits.js');
  const table = readStarTable(text, { ageUnit: options.ageUnit });
  const n = table.initialMass.length;
  let now = 0;
  for (let i = 0; i < n; i++) {
    inGrid(table.initialMass[i], table.z[i], `table row ${i + 1}`);
    if (table.age[i] > now) now = table.age[i];
  }
  if (table.ageUnit.from === 'default' && now < 1e3) {
    options.warn?.(`warning: the ages in column '${table.columns.age}' were read as yr (the schema's unit) and are all below 1 kyr; pass --age-unit Gyr (or Myr, kyr) if they are not yr`);
  }
  const until = options.until ?? TABLE_DEFAULT_UNTIL;
  if (!(until > 0) || now + until > MAX_AGE) {
    throw new RangeError(`--until ${until} yr: the oldest star would be ${now + until} yr old; allowed: until > 0 with the oldest star at most ${MAX_AGE} yr (100 Gyr)`);
  }
  const birthTime = new Float64Array(n);
  for (let i = 0; i < n; i++) birthTime[i] = now - table.age[i];
  const [z0, z1] = zSpan(table.z);
  return viewerPayload({
    title: basename(fileName),
    source: 'table',
    time: { from: 0, to: now + until, steps: TABLE_TIME_STEPS, spacing: 'linear', now, start: now, clock: 'offset' },
    initialMass: table.initialMass,
    birthTime,
    z: table.z,
    name: table.name,
    grid: encodeViewerGrid(grid, z0, z1),
  });
}

/** Where the built viewer template is (npm run build writes it). */
export function viewerTemplatePath(): string {
  return resolve(packageInfo().root, 'dist', 'viewer', 'viewer-template.html');
}

/**
 * The whole viewer page of a payload: the built template with the payload embedded
 * (lib/io/viewerPayloadHtml.ts).
 * @throws Error naming the template and how to build it when it is missing
 */
export async function viewerPage(payload: ViewerPayload): Promise<string> {
  const { viewerHtml } = await import('../../lib/io/viewerPayloadHtml.js');
  const path = viewerTemplatePath();
  let template: string;
  try {
    template = await readFile(path, 'utf8');
  } catch {
    throw new Error(`the viewer template ${path} is missing: run \`npm run build\``);
  }
  return viewerHtml(template, payload);
}

/**
 * Writes the viewer page of a scenario or table file (or of a ready payload) to `outFile`,
 * whole or not at all; never over the input.
 *
 * @param input path of a scenario (JSON object) or a table of stars (CSV, NDJSON, JSON array), or a payload
 * @param outFile the HTML file to write
 * @returns the path written, the number of stars and the page's size in bytes
 * @example await writeViewerPage('tracks-demo/scenarios/tessel-cluster.json', 'out/tessel-cluster.html')
 */
export async function writeViewerPage(
  input: string | ViewerPayload, outFile: string, options: ViewerInputOptions = {},
): Promise<{ path: string; stars: number; bytes: number }> {
  const payload = typeof input === 'string' ? await viewerPayloadFromText(await readInputText(input, 'input'), input, options) : input;
  const html = await viewerPage(payload);
  const { writeFileAtomic } = await import('../../lib/io/writeFileAtomic.js');
  await writeFileAtomic(outFile, html, typeof input === 'string' ? [input] : []);
  return { path: outFile, stars: payload.stars.initialMass.length, bytes: Buffer.byteLength(html) };
}

/**
 * Serves one page on 127.0.0.1 (never another interface): GET or HEAD of `/` answers the page,
 * anything else 404. Nothing is read from the disk.
 *
 * @param html the page
 * @param port TCP port, 0 for any free one
 * @returns the URL and a close function
 * @throws Error naming the port when it cannot be bound
 */
export function serveViewerPage(html: string, port: number): Promise<{ url: string; server: Server; close(): Promise<void> }> {
  const body = Buffer.from(html, 'utf8');
  const server = createServer((req, res) => {
    const path = (req.url ?? '').split('?')[0];
    if (path === '/' && (req.method === 'GET' || req.method === 'HEAD')) {
      res.writeHead(200, {
        'content-type': 'text/html; charset=utf-8',
        'content-length': body.length,
        'cache-control': 'no-store',
        'x-content-type-options': 'nosniff',
      });
      res.end(req.method === 'HEAD' ? undefined : body);
      return;
    }
    res.writeHead(404, { 'content-type': 'text/plain; charset=utf-8' });
    res.end('not found: this server has only the viewer page at /\n');
  });
  return new Promise((resolvePromise, reject) => {
    server.once('error', (error: NodeJS.ErrnoException) => {
      reject(new Error(error.code === 'EADDRINUSE' ? `port ${port} on 127.0.0.1 is in use; choose another with --port` : `cannot serve on 127.0.0.1:${port}: ${error.message}`));
    });
    server.listen(port, '127.0.0.1', () => {
      const address = server.address();
      const bound = typeof address === 'object' && address ? address.port : port;
      resolvePromise({
        url: `http://127.0.0.1:${bound}/`,
        server,
        close: () => new Promise<void>((done) => {
          server.close(() => done());
          server.closeAllConnections();
        }),
      });
    });
  });
}

/** `--port`: an integer 0–65535 (0: any free port). */
export function parsePort(text: string): number {
  if (!/^\d+$/.test(text.trim()) || Number(text) > 65535) {
    throw new InvalidArgumentError(`--port '${text}' must be an integer in 0–65535 (0: any free port)`);
  }
  return Number(text);
}

function parseAgeUnit(text: string): string {
  if (!['yr', 'kyr', 'Myr', 'Gyr'].includes(text)) throw new InvalidArgumentError(`--age-unit '${text}' must be one of yr, kyr, Myr, Gyr`);
  return text;
}

interface ViewOptions {
  output?: string;
  serve?: boolean;
  port: number;
  ageUnit?: string;
  until?: number;
  grid?: string;
  progress?: boolean;
}

/** `starclock view`: the animated HR diagram of a population as one self-contained HTML page. */
export function viewCommand(io: Io): Command {
  return new Command('view')
    .description('the animated HR diagram of a scenario or a table of stars, as one self-contained HTML page (or served on 127.0.0.1)')
    .argument('<input>', 'a scenario (JSON object) or a table of stars (CSV, NDJSON or JSON array with initialMass or mass, and age)')
    .option('-o, --output <file>', 'the HTML file to write (default: <name>.html in the current folder, from the scenario\u2019s name or the table\u2019s file name)')
    .option('--serve', 'serve the page on 127.0.0.1 instead of (or, with -o, as well as) writing it; stop with Ctrl-C')
    .addOption(new Option('--port <port>', 'port for --serve (0: any free port)').argParser(parsePort).default(0))
    .addOption(new Option('--age-unit <unit>', 'unit of a table\u2019s bare ages when its header names none: yr, kyr, Myr, Gyr (default yr, the schema\u2019s)').argParser(parseAgeUnit))
    .addOption(new Option('--until <age>', 'tables: how far past the present the clock runs (default 5Gyr)').argParser(parseAgeOption))
    .addOption(gridOption())
    .addHelpText(
      'after',
      `
The page shows the population on the HR diagram (or colour\u2013magnitude diagram) at any time,
each star in its own colour as seen; counts per phase, the turnoff mass and the counts over
time beside it; the isochrone and a chosen star's track as overlays. Every frame is computed
in the page by the starclock library; the page needs no network and opens from file://.

A scenario is sampled (seeded) and follows its own time grid ("history"); time is time
since star formation began. For a table, time is an offset from the table's present: every
star's age is shifted alike, stars not yet born are hidden.

Keys: space plays and pauses, the arrow keys step through the time grid.

Examples:
  starclock view tracks-demo/scenarios/tessel-cluster.json          # writes tessel-cluster.html
  starclock view tracks-demo/orvel-catalogue.csv -o orvel.html
  starclock view population.csv --age-unit Gyr --serve --port 8080
`,
    )
    .action(async (input: string, options: ViewOptions) => {
      const grid = options.grid !== undefined ? await loadGridFile(options.grid, io) : undefined;
      const text = await readInputText(input, 'input');
      const payload = await viewerPayloadFromText(text, input, {
        ageUnit: options.ageUnit, until: options.until, grid, warn: (m) => diagnostic(io, m),
      });
      const html = await viewerPage(payload);
      const stars = payload.stars.initialMass.length;
      if (options.output !== undefined || !options.serve) {
        const out = options.output ?? `${slugify(payload.source === 'table' ? basename(input, extname(input)) : payload.title)}.html`;
        const { writeFileAtomic } = await import('../../lib/io/writeFileAtomic.js');
        await writeFileAtomic(out, html, [input, ...(options.grid ? [options.grid] : [])]);
        diagnostic(io, `wrote ${out}: ${stars} stars, ${(Buffer.byteLength(html) / 1048576).toFixed(1)} MB; open it in a browser`);
      }
      if (options.serve) {
        const served = await serveViewerPage(html, options.port);
        io.out(`${served.url}\n`);
        diagnostic(io, `serving ${payload.title} (${stars} stars) at ${served.url}; press Ctrl-C to stop`);
        await new Promise<void>((done) => {
          const stop = () => {
            process.off('SIGINT', stop);
            process.off('SIGTERM', stop);
            void served.close().then(done);
          };
          process.on('SIGINT', stop);
          process.on('SIGTERM', stop);
        });
        diagnostic(io, 'stopped serving');
      }
    });
}
