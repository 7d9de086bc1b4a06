import { Command, Option } from 'commander';
import type { Io } from '../io.js';
import { diagnostic } from '../io.js';
import { gridOption, jsonOption } from '../options.js';
import { readScenarioFile } from '../scenarioFile.js';
import { resolveSource } from '../gridSource.js';
import type { PopulationHistory } from '../../lib/population/populationHistory.js';
import { PHASES } from '../../lib/model/phases.js';

/** Short column titles of the phases in the human table. */
const SHORT: Record<(typeof PHASES)[number], string> = {
  'pre-main-sequence': 'PMS', 'main-sequence': 'MS', subgiant: 'SG', 'red-giant-branch': 'RGB',
  'core-helium-burning': 'CHeB', 'asymptotic-giant-branch': 'AGB', 'post-asymptotic-giant-branch': 'pAGB',
  'white-dwarf': 'WD', 'neutron-star': 'NS', 'black-hole': 'BH', 'brown-dwarf': 'BD',
};

interface HistoryOptions {
  json?: boolean;
  format: 'table' | 'json' | 'csv';
  grid?: string;
}

/** The history as the JSON the issue specifies, plus remnantsBorn and color. */
export function historyJson(h: PopulationHistory): Record<string, unknown> {
  return {
    times: h.times, counts: h.counts, remnantsBorn: h.remnantsBorn, supernovae: h.supernovae,
    luminosity: h.luminosity, bv: h.bv, color: h.color, turnoffMass: h.turnoffMass,
  };
}

/** `starclock history`: a population over time. */
export function historyCommand(io: Io): Command {
  return new Command('history')
    .description('a population over time: counts per phase, remnants and supernovae, integrated light and colour, turnoff mass')
    .argument('<scenario>', 'scenario file (JSON; "-" for standard input)')
    .addOption(jsonOption())
    .addOption(new Option('--format <kind>', 'output format').choices(['table', 'json', 'csv']).default('table'))
    .addOption(gridOption())
    .addHelpText(
      'after',
      `
Times come from the scenario's "history" grid (default: 1 Myr to "now", 60 log
steps) and are measured from the start of star formation; stars not yet born are not
counted. Per time: stars in each phase, remnants born and supernovae since the
previous time, summed luminosity (Lsun), flux-weighted integrated B−V and colour as
seen, and the main-sequence turnoff mass of the oldest stars.

JSON: { "times": [yr…], "counts": { "<phase>": [n…] }, "remnantsBorn": [n…],
"supernovae": [n…], "luminosity": [Lsun…], "bv": [mag…], "color": ["#rrggbb"…],
"turnoffMass": [Msun…] } (null where nothing born gives light yet).

Example:
  starclock history tracks-demo/scenarios/tessel-cluster.json --json
`,
    )
    .action(async (file: string, options: HistoryOptions) => {
      const scenario = await readScenarioFile(file);
      const source = await resolveSource({ grid: options.grid }, io);
      const { populationHistory } = await import('../../lib/population/populationHistory.js');
      const t0 = performance.now();
      const h = populationHistory(scenario, source.query!);
      diagnostic(io, `${scenario.name}: ${scenario.size} stars over ${h.times.length} times in ${((performance.now() - t0) / 1000).toFixed(2)} s`);
      const format = options.json ? 'json' : options.format;
      if (format === 'json') {
        io.out(JSON.stringify(historyJson(h)) + '\n');
        return;
      }
      const phases = PHASES.filter((p) => h.counts[p].some((c) => c > 0));
      if (format === 'csv') {
        const { formatCsv } = await import('../../lib/io/formatCsv.js');
        const header = ['time', ...phases, 'remnantsBorn', 'supernovae', 'luminosity', 'bv', 'color', 'turnoffMass'];
        const rows = h.times.map((t, i) => [t, ...phases.map((p) => h.counts[p][i]), h.remnantsBorn[i], h.supernovae[i], h.luminosity[i], h.bv[i], h.color[i], h.turnoffMass[i]]);
        io.out(formatCsv(header, rows));
        return;
      }
      const { formatTable } = await import('../../lib/io/formatTable.js');
      const { formatAge } = await import('../../lib/io/formatAge.js');
      const { formatSignificant } = await import('../../lib/io/formatSignificant.js');
      const age = (t: number) => {
        const a = formatAge(t, 3);
        return `${a.text} ${a.unit}`;
      };
      const header = ['time', ...phases.map((p) => SHORT[p]), 'new remnants', 'SNe', 'L (Lsun)', 'B−V', 'colour', 'turnoff (Msun)'];
      const rows = h.times.map((t, i) => [
        age(t), ...phases.map((p) => String(h.counts[p][i])), String(h.remnantsBorn[i]), String(h.supernovae[i]),
        formatSignificant(h.luminosity[i], 4), h.bv[i] === null ? '—' : h.bv[i]!.toFixed(3), h.color[i] ?? '—',
        h.turnoffMass[i] === null ? '—' : formatSignificant(h.turnoffMass[i]!, 4),
      ]);
      io.out(`${scenario.name}: ${scenario.size} stars (phases: ${phases.map((p) => `${SHORT[p]} ${p}`).join(', ')})\n\n` + formatTable(header, rows));
    });
}
