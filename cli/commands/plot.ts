import { Command, InvalidArgumentError, Option } from 'commander';
import { basename } from 'node:path';
import type { GridQuery } from '../../lib/interp/gridQuery.js';
import { formatAge } from '../../lib/io/formatAge.js';
import { parseAge } from '../../lib/io/parseAge.js';
import { parseNumber } from '../../lib/io/parseNumber.js';
import { writeFileAtomic } from '../../lib/io/writeFileAtomic.js';
import { MAX_AGE } from '../../lib/model/limits.js';
import { fehFromZ } from '../../lib/model/zFromFeh.js';
import type { Io } from '../io.js';
import { diagnostic } from '../io.js';
import { readInputText, resolveSource, type StarSource } from '../gridSource.js';
import {
  AGE_TEXT, MASS_TEXT, type TypedValues, ageWarning, checkMass, checkZ, fehOption, gridOption, gridZOption, parseAgeOption, rangeEnd, resolveZ,
} from '../options.js';

/** Most lines one figure takes: beyond, a legend and the styles stop being readable. */
export const MAX_LINES = 12;
/** Most stars `plot hr` samples from a scenario (about 100 MB of columns at most). */
export const MAX_SCENARIO_STARS = 5_000_000;

const number = (option: string, text: string, range: string): number => {
  try {
    return parseNumber(text);
  } catch {
    throw new InvalidArgumentError(`${option} '${text}' is not a number; valid range ${range}`);
  }
};

function list<T>(option: string, text: string, what: string, one: (part: string) => T): T[] {
  const parts = text.split(',').map((s) => s.trim());
  if (parts.some((p) => p === '')) throw new InvalidArgumentError(`${option} '${text}' has an empty item; give 1–${MAX_LINES} ${what} separated by commas`);
  if (parts.length > MAX_LINES) throw new InvalidArgumentError(`${option} gives ${parts.length} ${what}; valid range 1–${MAX_LINES}`);
  return parts.map(one);
}

/** `--mass M[,M…]` of `plot track`: 1–12 birth masses (Msun); each is range-checked against the grid later. */
export function parseMassList(text: string): number[] {
  const masses = list('--mass', text, 'masses', (p) => number('--mass', p, `${MASS_TEXT}, or the --grid file's range`));
  if (new Set(masses).size !== masses.length) throw new InvalidArgumentError(`--mass '${text}' names a mass twice; give each mass once`);
  return masses;
}

/** `--age T[,T…]` of `plot isochrone`: 1–12 ages, each as `--age` (unit; a bare number is Gyr) in (0, 100 Gyr]. */
export function parseAgeList(text: string): number[] {
  const ages = list('--age', text, 'ages', parseAgeOption);
  if (new Set(ages).size !== ages.length) throw new InvalidArgumentError(`--age '${text}' names an age twice; give each age once`);
  return ages;
}

/** `--at T` of `plot hr`: time since the scenario's star formation began, as an age, in (0, 100 Gyr]. */
export function parseAtOption(text: string): number {
  let t: number;
  try {
    t = parseAge(text);
  } catch {
    throw new InvalidArgumentError(`--at '${text}' is not a time (a number with unit yr, kyr, Myr or Gyr; a bare number is Gyr); valid range ${AGE_TEXT}`);
  }
  if (!(t > 0 && t <= MAX_AGE)) throw new InvalidArgumentError(`--at ${text} is outside the valid range ${AGE_TEXT}`);
  return t;
}

/** `--min-mass` / `--max-mass` of `plot isochrone`: a mass in Msun, range-checked against the grid later. */
const parseMassBound = (option: string) => (text: string): number => number(option, text, `${MASS_TEXT}, or the --grid file's range`);

const outputOption = () =>
  new Option('-o, --output <file>', 'the SVG file to write (written whole or not at all); - for standard output').makeOptionMandatory();
const titleOption = () => new Option('--title <text>', 'the figure title (default: made from the inputs)');

/** Mass for legends and titles: '1', '0.85', '12.5'. */
const massText = (m: number) => String(Number(m.toPrecision(4)));
const ageText = (yr: number) => {
  const a = formatAge(yr);
  return `${a.text} ${a.unit}`;
};
/** The metallicity of a figure, as z and [Fe/H]. */
function metalText(z: number): string {
  const feh = fehFromZ(z);
  const sign = feh < -0.005 ? '\u2212' : '+';
  return `z ${rangeEnd(z)} ([Fe/H] ${sign}${Math.abs(feh).toFixed(2)})`;
}
/** "1, 2 and 5" */
const joinAnd = (items: readonly string[]) => (items.length <= 1 ? items.join('') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`);
const sourceText = (source: StarSource) => `interpolated in ${source.label}`;

/**
 * Writes a figure to `output` whole or not at all, or to standard output for `-`.
 * @param inputs files the run read; `output` may not be one of them
 * @throws RangeError (exit 2) when `output` is an input of the run
 */
export async function writeFigure(io: Io, output: string, svg: string, inputs: readonly string[]): Promise<void> {
  if (output === '-') {
    io.out(svg);
    return;
  }
  try {
    await writeFileAtomic(output, svg, inputs);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    if (code === 'EINPUT') throw new RangeError(`-o ${output} is an input file of this run; choose another output file`);
    if (code === 'ENOENT') throw new RangeError(`-o ${output}: its directory does not exist`);
    throw new Error(`cannot write -o ${output}: ${(error as Error).message}`);
  }
  diagnostic(io, `wrote ${output} (${Math.ceil(Buffer.byteLength(svg) / 1024)} KB)`);
}

const gridInputs = (options: { grid?: string }) => (options.grid === undefined ? [] : [options.grid]);

interface TrackOptions { mass: number[]; z?: number; feh?: number; grid?: string; title?: string; output: string }
interface IsochroneOptions { age: number[]; z?: number; feh?: number; grid?: string; title?: string; output: string; minMass: number; maxMass?: number }
interface HrOptions { age?: number; at?: number; z?: number; feh?: number; grid?: string; title?: string; output: string }

function trackCommand(io: Io): Command {
  const typed: TypedValues = {};
  return new Command('track')
    .description('evolutionary tracks of one or more birth masses on the HR diagram, as SVG')
    .addOption(new Option('--mass <Msun[,Msun…]>', `birth masses in Msun, 1–${MAX_LINES} separated by commas, each ${MASS_TEXT}`).argParser(parseMassList).makeOptionMandatory())
    .addOption(gridZOption(typed))
    .addOption(fehOption())
    .addOption(gridOption())
    .addOption(titleOption())
    .addOption(outputOption())
    .addHelpText('after', `
One line per mass, each in its own colour and dash pattern (told apart in greyscale
print too), from the pre-main sequence to the end of the track: white dwarfs cool on
to the grid's last age (100 Gyr); tracks ending as a neutron star or black hole stop
at core collapse. Marks: circle = zero-age main sequence, square = end of main
sequence, triangle = helium ignition, diamond = remnant birth.
Axes: log Teff (K) decreasing to the right, log L (Lsun) up.

Examples:
  starclock plot track --mass 1,2,5 -o tracks.svg
  starclock plot track --mass 0.8,1 --feh -1 --title "Old halo stars" -o halo.svg
`)
    .action(async (options: TrackOptions) => {
      const z = resolveZ(options);
      const source = await resolveSource(options, io);
      for (const m of options.mass) checkMass(m, {}, source.massRange);
      checkZ(z, options, typed, source.zRange);
      const { trackLineOf } = await import('../../lib/plot/trackLineOf.js');
      const { trackFigure } = await import('../../lib/plot/trackFigure.js');
      const query = source.query as GridQuery;
      const labels = options.mass.map(massText);
      const lines = options.mass.map((m, i) => trackLineOf(query.grid, m, z, `${labels[i]} Msun`));
      const svg = trackFigure(lines, {
        title: options.title ?? `Evolutionary tracks of ${joinAnd(labels)} Msun`,
        subtitle: [`${metalText(z)}; ${sourceText(source)}; neutron stars and black holes are not drawn`],
      });
      await writeFigure(io, options.output, svg, gridInputs(options));
    });
}

function isochroneCommand(io: Io): Command {
  const typed: TypedValues = {};
  return new Command('isochrone')
    .description('isochrones of one or more ages on the HR diagram, with their main-sequence turnoffs, as SVG')
    .addOption(new Option('--age <age[,age…]>', `ages, 1–${MAX_LINES} separated by commas, e.g. 100Myr,1Gyr,10Gyr; a bare number is Gyr; each ${AGE_TEXT}`).argParser(parseAgeList).makeOptionMandatory())
    .addOption(gridZOption(typed))
    .addOption(fehOption())
    .addOption(new Option('--min-mass <Msun>', 'lowest initial mass drawn (default 0.1: hydrogen-burning stars; lower adds brown dwarfs)').argParser(parseMassBound('--min-mass')).default(0.1))
    .addOption(new Option('--max-mass <Msun>', "highest initial mass drawn (default: the grid's highest)").argParser(parseMassBound('--max-mass')))
    .addOption(gridOption())
    .addOption(titleOption())
    .addOption(outputOption())
    .addHelpText('after', `
One line per age through the stars of every initial mass at that age (in increasing
mass; the line breaks where the white dwarfs begin), its main-sequence turnoff circled,
the turnoff mass in the legend. Neutron stars and black holes are not drawn.
Axes: log Teff (K) decreasing to the right, log L (Lsun) up.

Examples:
  starclock plot isochrone --age 100Myr,1Gyr,10Gyr -o isochrones.svg
  starclock plot isochrone --age 12Gyr --feh -1.6 -o old-cluster.svg
`)
    .action(async (options: IsochroneOptions) => {
      const z = resolveZ(options);
      const source = await resolveSource(options, io);
      checkZ(z, options, typed, source.zRange);
      const query = source.query as GridQuery;
      const maxMass = options.maxMass ?? Math.min(source.massRange.max, query.grid.massRange.max);
      const bound = (option: string, m: number) => {
        const r = source.massRange;
        if (!(m >= r.min && m <= r.max)) throw new RangeError(`${option} ${m} is outside ${r.name} ${rangeEnd(r.min)}–${rangeEnd(r.max)} Msun`);
      };
      bound('--min-mass', options.minMass);
      bound('--max-mass', maxMass);
      if (!(options.minMass < maxMass)) throw new RangeError(`--min-mass ${options.minMass} must be below --max-mass ${rangeEnd(maxMass)} Msun`);
      for (const age of options.age) {
        const warning = ageWarning(age);
        if (warning !== undefined) diagnostic(io, warning);
      }
      const { isochroneLineOf } = await import('../../lib/plot/isochroneLineOf.js');
      const { isochroneFigure } = await import('../../lib/plot/isochroneFigure.js');
      const labels = options.age.map(ageText);
      const lines = options.age.map((age, i) => {
        const { line, turnoffMass } = isochroneLineOf(query, age, z, options.minMass, maxMass, labels[i]);
        return { ...line, value: line.turnoff === null ? 'no turnoff' : `${massText(turnoffMass)} Msun` };
      });
      const svg = isochroneFigure(lines, {
        title: options.title ?? `Isochrones at ${joinAnd(labels)}`,
        subtitle: [`${metalText(z)}; initial masses ${massText(options.minMass)}–${massText(maxMass)} Msun; ${sourceText(source)}; neutron stars and black holes are not drawn`],
        legendTitle: 'Age · turnoff mass',
      });
      await writeFigure(io, options.output, svg, gridInputs(options));
    });
}

function hrCommand(io: Io): Command {
  const typed: TypedValues = {};
  return new Command('hr')
    .description('a population on the HR diagram, one dot per star in its colour as seen, as SVG')
    .argument('<input>', 'a scenario (.json) or a CSV table of stars')
    .addOption(new Option('--at <time>', `scenario: time since its star formation began, e.g. 500Myr (default: the scenario's "now"); ${AGE_TEXT}`).argParser(parseAtOption).conflicts('age'))
    .addOption(new Option('--age <age>', `table: show every star at this one age instead of its own (a coeval cluster); ${AGE_TEXT}`).argParser(parseAgeOption))
    .addOption(gridZOption(typed))
    .addOption(fehOption())
    .addOption(gridOption())
    .addOption(titleOption())
    .addOption(outputOption())
    .addHelpText('after', `
INPUT is either a scenario (a .json file, as \`starclock population\` reads) or a CSV
table with a header row: initialMass (or mass) in Msun; the age in age (yr) or age_kyr,
age_Myr or age_Gyr; optionally z (else --z/--feh, default solar); other columns ignored.

A scenario is shown at --at T, T after its star formation began: the stars born by then,
each aged T minus its birth time (without --at: the scenario's "now"). A table shows
every star at its own age, or all at --age T.

Each star with light is one dot in its colour as seen (a blackbody's), thinly outlined
so white dwarfs show on the white page. Beyond 20,000 stars one dot is drawn per 2 px
cell (the brightest star in it) to keep the file small; the subtitle says so. The legend
counts stars per phase; neutron stars and black holes are counted, not drawn.

Examples:
  starclock plot hr tracks-demo/scenarios/greywake-cluster.json -o greywake.svg
  starclock plot hr tracks-demo/scenarios/velkin-nursery.json --at 2Myr -o nursery.svg
  starclock plot hr tracks-demo/orvel-catalogue.csv -o catalogue.svg
`)
    .action(async (input: string, options: HrOptions) => {
      const z = resolveZ(options);
      const source = await resolveSource(options, io);
      checkZ(z, options, typed, source.zRange);
      const query = source.query as GridQuery;
      const text = await readInputText(input, 'INPUT');
      const name = input === '-' ? 'standard input' : basename(input);
      let stars: { initialMass: Float64Array; age: Float64Array; z: Float64Array };
      let title: string;
      let what: string;
      if (/\.json$/i.test(input)) {
        if (options.age !== undefined) throw new RangeError('--age is for tables; a scenario is shown at --at T, the time since its star formation began');
        let json: unknown;
        try {
          json = JSON.parse(text);
        } catch (error) {
          throw new RangeError(`INPUT ${input} is not JSON: ${(error as Error).message}`);
        }
        const { parseScenario } = await import('../../lib/population/parseScenario.js');
        const { samplePopulation } = await import('../../lib/population/samplePopulation.js');
        let scenario;
        try {
          scenario = parseScenario(json);
        } catch (error) {
          throw new RangeError(`INPUT ${input}: ${(error as Error).message.replace(/:\n\s*/, ': ').replace(/\n\s*/g, '; ')}`);
        }
        if (scenario.size > MAX_SCENARIO_STARS) throw new RangeError(`INPUT ${input}: size ${scenario.size} is more stars than plot hr draws from; valid range 1–${MAX_SCENARIO_STARS.toLocaleString('en-US')}`);
        const t = options.at ?? scenario.now;
        const sample = samplePopulation(scenario);
        let born = 0;
        for (let i = 0; i < sample.birthTime.length; i++) if (sample.birthTime[i] < t) born++;
        if (born === 0) throw new RangeError(`--at ${ageText(t)}: no star of ${scenario.name} is born yet (star formation begins later); choose a later time`);
        const initialMass = new Float64Array(born);
        const age = new Float64Array(born);
        const zs = new Float64Array(born);
        let k = 0;
        for (let i = 0; i < sample.birthTime.length; i++) {
          if (!(sample.birthTime[i] < t)) continue;
          initialMass[k] = sample.initialMass[i];
          age[k] = t - sample.birthTime[i];
          zs[k] = sample.z[i];
          k++;
        }
        stars = { initialMass, age, z: zs };
        title = `${scenario.name} at ${ageText(t)}`;
        what = `${born.toLocaleString('en-US')} of ${scenario.size.toLocaleString('en-US')} stars of scenario ${name} born by ${ageText(t)} after star formation began`;
      } else {
        if (options.at !== undefined) throw new RangeError('--at is for scenarios; a table is shown at its own ages, or all at --age T');
        const { parseStarTable } = await import('../../lib/plot/parseStarTable.js');
        const table = parseStarTable(text, input === '-' ? '(stdin)' : input, { massRange: source.massRange, zRange: source.zRange, z, age: options.age });
        stars = table;
        const n = table.initialMass.length.toLocaleString('en-US');
        title = options.age === undefined ? `The stars of ${name}` : `The stars of ${name} at ${ageText(options.age)}`;
        what = options.age === undefined ? `${n} stars of ${name}, each at its own age (column ${table.ageColumn})` : `${n} stars of ${name}, all at age ${ageText(options.age)}`;
        if (table.zColumn === null) what += `, ${metalText(z)}`;
      }
      const { populationPoints } = await import('../../lib/plot/populationPoints.js');
      const { populationFigure } = await import('../../lib/plot/populationFigure.js');
      const svg = populationFigure(populationPoints(query, stars), {
        title: options.title ?? title,
        subtitle: [`${what}; ${sourceText(source)}`],
      });
      await writeFigure(io, options.output, svg, [...gridInputs(options), ...(input === '-' ? [] : [input])]);
    });
}

/** `starclock plot track|isochrone|hr`: static SVG figures for a reference book. */
export function plotCommand(io: Io): Command {
  return new Command('plot')
    .description('static SVG figures (evolutionary tracks, isochrones, a population on the HR diagram) for a reference book')
    .addCommand(trackCommand(io))
    .addCommand(isochroneCommand(io))
    .addCommand(hrCommand(io));
}
