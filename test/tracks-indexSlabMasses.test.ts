import { expect, test } from 'vitest';
import fc from 'fast-check';
import { indexSlabMasses, MASS_BINS } from '../lib/tracks/grid.js';

// The definition the index must meet, bin by bin: the last track (at most the last but one)
// whose log mass is at or below the bin's lower edge.
function reference(logM: Float64Array): Int32Array {
  const n = logM.length;
  const lo = logM[0];
  const scale = n > 1 ? MASS_BINS / (logM[n - 1] - lo) : 0;
  const out = new Int32Array(MASS_BINS + 1);
  let k = 0;
  for (let b = 0; b <= MASS_BINS; b++) {
    const edge = lo + b / scale;
    while (k + 1 < n - 1 && logM[k + 1] <= edge) k++;
    out[b] = k;
  }
  return out;
}

test('indexSlabMasses gives, bin by bin, the last track at or below the bin\'s lower edge (property)', () => {
  fc.assert(
    fc.property(
      fc.uniqueArray(fc.double({ min: -2, max: 2.2, noNaN: true }), { minLength: 2, maxLength: 200 }),
      (xs) => {
        const logM = Float64Array.from(xs).sort();
        expect(Array.from(indexSlabMasses(logM).massIndex)).toEqual(Array.from(reference(logM)));
      },
    ),
    { numRuns: 300 },
  );
});

test('indexSlabMasses matches the definition where tracks sit exactly on bin edges', () => {
  const logM = Float64Array.from({ length: 65 }, (_, i) => -1 + i / 16); // bins of 4 / 4096 dex: every track on an edge
  expect(Array.from(indexSlabMasses(logM).massIndex)).toEqual(Array.from(reference(logM)));
  const two = Float64Array.of(0, 1);
  expect(Array.from(indexSlabMasses(two).massIndex)).toEqual(Array.from(reference(two)));
});
