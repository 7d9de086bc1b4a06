import { Command, InvalidArgumentError, Option } from 'commander';
import type { Io } from '../io.js';
import { diagnostic } from '../io.js';
import { gridOption } from '../options.js';
import { readScenarioFile } from '../scenarioFile.js';
import { resolveSource } from '../gridSource.js';

/** `--shard i/n`: shard i (0-based) of n. */
export function parseShard(text: string): { i: number; n: number } {
  const m = /^(\d+)\/(\d+)$/.exec(text.trim());
  const i = m ? Number(m[1]) : NaN;
  const n = m ? Number(m[2]) : NaN;
  if (!m || !(n >= 1) || !(i < n) || n > 1e6) {
    throw new InvalidArgumentError(`--shard '${text}' must be i/n with 0 ≤ i < n ≤ 1000000 (e.g. 0/4 … 3/4)`);
  }
  return { i, n };
}

interface PopulationOptions {
  format: 'csv' | 'ndjson' | 'json' | 'parquet';
  output?: string;
  shard?: { i: number; n: number };
  grid?: string;
}

/** `starclock population`: sample a scenario and give each star's present state. */
export function populationCommand(io: Io): Command {
  return new Command('population')
    .description('sample a population from a scenario and give every star its present-day state')
    .argument('<scenario>', 'scenario file (JSON; "-" for standard input)')
    .addOption(new Option('--format <kind>', 'output format (parquet: Apache Parquet, needs -o)').choices(['csv', 'ndjson', 'json', 'parquet']).default('csv'))
    .option('-o, --output <file>', 'write to FILE (whole or not at all) instead of standard output')
    .addOption(new Option('--shard <i/n>', 'write only shard i of n (0-based): contiguous star indices; csv/ndjson shards concatenate to one run').argParser(parseShard))
    .addOption(gridOption())
    .addHelpText(
      'after',
      `
One row per star: index, birthTime (yr since star formation began), then the star
state at the scenario's "now" (every key of the schema). Each star is sampled from
its own seeded stream, so the output is a pure function of the scenario; with
--shard the CSV header is written by shard 0 only, and the shards of a CSV or NDJSON
run concatenate to exactly the bytes of one run. JSON wraps the stars in
{ "name", "seed", "size", "now", "stars": [...] }. Parquet (-o FILE required) holds
the same columns for data tools; it is built in memory, so shard runs of many
millions of stars into one file per shard.

Examples:
  starclock population tracks-demo/scenarios/tessel-cluster.json -o tessel.csv
  starclock population tracks-demo/scenarios/meridian-field.json --format ndjson --shard 1/4
`,
    )
    .action(async (file: string, options: PopulationOptions) => {
      const scenario = await readScenarioFile(file);
      const source = await resolveSource({ grid: options.grid }, io);
      const query = source.query!;
      const { shardRange } = await import('../../lib/population/shardRange.js');
      const { populationRows } = await import('../../lib/io/populationRows.js');
      const shard = options.shard ?? { i: 0, n: 1 };
      const { start, count } = shardRange(scenario.size, shard.i, shard.n);
      if (options.format === 'parquet') {
        if (options.output === undefined) throw new RangeError('--format parquet writes a binary file: give -o FILE');
        const { populationParquet } = await import('../../lib/io/populationParquet.js');
        const { writeFileAtomic } = await import('../../lib/io/writeFileAtomic.js');
        const t0 = performance.now();
        const bytes = populationParquet(scenario, query, { start, count });
        await writeFileAtomic(options.output, bytes, file === '-' ? [] : [file]);
        diagnostic(io, `${scenario.name}: ${count} stars${shard.n > 1 ? ` (shard ${shard.i}/${shard.n})` : ''} in ${((performance.now() - t0) / 1000).toFixed(2)} s → ${options.output} (Parquet, ${(bytes.length / 1e6).toFixed(1)} MB)`);
        return;
      }
      const format = options.format === 'json' ? 'ndjson' : options.format;
      const rows = populationRows(scenario, query, { start, count, format, header: shard.i === 0 });
      const chunks = options.format === 'json' ? jsonChunks(scenario, rows) : rows;
      const t0 = performance.now();
      if (options.output !== undefined) {
        const { writeFileAtomicChunks } = await import('../../lib/io/writeFileAtomicChunks.js');
        await writeFileAtomicChunks(options.output, chunks, file === '-' ? [] : [file]);
      } else {
        for (const chunk of chunks) {
          io.out(chunk);
          if (io.drain) await io.drain();
        }
      }
      const seconds = (performance.now() - t0) / 1000;
      diagnostic(io, `${scenario.name}: ${count} stars${shard.n > 1 ? ` (shard ${shard.i}/${shard.n})` : ''} at ${scenario.now / 1e6} Myr in ${seconds.toFixed(2)} s${options.output ? ` → ${options.output}` : ''}`);
    });
}

function* jsonChunks(scenario: { name: string; seed: number; size: number; now: number }, rows: Iterable<string>): Generator<string> {
  yield `{"name":${JSON.stringify(scenario.name)},"seed":${scenario.seed},"size":${scenario.size},"now":${scenario.now},"stars":[\n`;
  let first = true;
  for (const chunk of rows) {
    const lines = chunk.split('\n').filter((l) => l.length > 0);
    if (lines.length === 0) continue;
    yield (first ? '' : ',\n') + lines.join(',\n');
    first = false;
  }
  yield '\n]}\n';
}
