import { readInputText } from './gridSource.js';
import type { Scenario } from '../lib/population/scenario.js';

/**
 * Reads a scenario file (JSON, layout in lib/population/scenario.ts) and validates it.
 * @throws RangeError (exit 2) naming the file and every problem, or the JSON syntax error
 */
export async function readScenarioFile(path: string): Promise<Scenario> {
  const text = await readInputText(path, 'SCENARIO');
  let doc: unknown;
  try {
    doc = JSON.parse(text);
  } catch (error) {
    throw new RangeError(`${path}: not valid JSON (${(error as Error).message})`);
  }
  const { parseScenario } = await import('../lib/population/parseScenario.js');
  try {
    return parseScenario(doc);
  } catch (error) {
    if (error instanceof RangeError) throw new RangeError(`${path}: ${error.message}`);
    throw error;
  }
}
