import { assertInRange } from './assertInRange.js';
import { TEFF_MAX, TEFF_MIN } from './constants.js';
import { DWARF_TABLE } from './dwarfTable.js';

const LETTERS = 'OBAFGKMLTY';

/**
 * Teff scale of dwarf subtypes: [subtype index, Teff K], index = 10 × letter + subtype with
 * letters O B A F G K M L T Y. Rows marked C are the REFERENCES.md dwarf-table rows
 * (Pecaut & Mamajek 2013, v2024.05.15) and are overwritten from DWARF_TABLE below; every
 * other value is from memory of the same table's Teff column (O3V–Y0V) and not checked
 * against the publication. Y1 and Y2 are from memory and rougher still.
 */
const SCALE: readonly (readonly [number, number])[] = [
  [3, 44900], [4, 42900], [5, 41400], [6, 39500], [7, 37100], [8, 35100], [9, 33300 /* C */],
  [10, 31400], [11, 26000], [12, 20600], [13, 17000], [14, 16400], [15, 15700 /* C */],
  [16, 14500], [17, 14000], [18, 12300], [19, 10700],
  [20, 9700 /* C */], [21, 9300], [22, 8800], [23, 8600], [24, 8250], [25, 8100], [26, 7910],
  [27, 7760], [28, 7590], [29, 7400],
  [30, 7220 /* C */], [31, 7020], [32, 6820], [33, 6750], [34, 6670], [35, 6550], [36, 6350],
  [37, 6280], [38, 6180], [39, 6050],
  [40, 5930], [41, 5860], [42, 5770 /* C */], [43, 5720], [44, 5680], [45, 5660], [46, 5600],
  [47, 5550], [48, 5480], [49, 5380],
  [50, 5290 /* C */], [51, 5170], [52, 5100], [53, 4830], [54, 4600], [55, 4440], [56, 4300],
  [57, 4100], [58, 3990], [59, 3930],
  [60, 3850 /* C */], [61, 3660], [62, 3560], [63, 3430], [64, 3210 /* C */], [65, 3060],
  [66, 2810], [67, 2680], [68, 2570], [69, 2380],
  [70, 2270], [71, 2160], [72, 2060], [73, 1920], [74, 1870], [75, 1710], [76, 1550],
  [77, 1450], [78, 1360], [79, 1290],
  [80, 1260], [81, 1230], [82, 1200], [83, 1160], [84, 1130], [85, 1060], [86, 960],
  [87, 840], [88, 740], [89, 630],
  [90, 450], [91, 400], [92, 350],
];

// Columnar, in increasing log Teff (decreasing index) for the bisection.
const NS = SCALE.length;
const S_LOGT = new Float64Array(NS);
const S_IDX = new Float64Array(NS);
for (let i = 0; i < NS; i++) {
  const [idx, t] = SCALE[NS - 1 - i];
  let teff = t;
  for (let r = 0; r < DWARF_TABLE.type.length; r++) {
    const ty = DWARF_TABLE.type[r];
    if (LETTERS.indexOf(ty[0]) * 10 + Number(ty[1]) === idx) teff = DWARF_TABLE.teff[r];
  }
  S_LOGT[i] = Math.log10(teff);
  S_IDX[i] = idx;
}

/**
 * Luminosity-class boundaries in log g (cgs) against Teff: at each node, the lowest log g of
 * classes V, IV, III, II, Ib (below the last: Ia). Typical log g per class from calibrations of
 * log g by spectral type and class (e.g. Straizys & Kuriliene 1981, Ap&SS 80, 353; Gray &
 * Corbally 2009, "Stellar Spectral Classification") — values from memory, rounded; the class
 * ranges shrink toward hot stars, whose supergiants sit near the Eddington limit. Cool giants
 * and supergiants overlap in log g (an AGB star and a red supergiant can share it), so for
 * M stars the III/II boundary is set low and such stars are called giants.
 * Linear in log Teff between nodes, clamped beyond them.
 */
const CLASS_T = Float64Array.of(3000, 3500, 4000, 5000, 6000, 8000, 10000, 15000, 20000, 30000, 40000)
  .map(Math.log10);
const CLASS_B = [
  Float64Array.of(4.3, 4.3, 4.2, 4.1, 4.0, 3.9, 3.85, 3.8, 3.75, 3.7, 3.65), // V
  Float64Array.of(3.5, 3.5, 3.5, 3.5, 3.5, 3.5, 3.45, 3.4, 3.4, 3.45, 3.45), // IV
  Float64Array.of(-0.3, -0.3, 0.5, 1.5, 2.0, 2.6, 2.9, 3.1, 3.15, 3.3, 3.35), // III
  Float64Array.of(-0.6, -0.6, 0.1, 1.0, 1.5, 2.0, 2.4, 2.7, 2.9, 3.15, 3.25), // II
  Float64Array.of(-0.9, -0.9, -0.3, 0.5, 1.0, 1.5, 1.9, 2.3, 2.6, 3.0, 3.15), // Ib
];
const CLASS_NAMES = ['V', 'IV', 'III', 'II', 'Ib', 'Ia'] as const;

/** Precomputed type strings for every index 0…99 and class, so a call allocates nothing. */
const NAMES: string[][] = [];
for (let idx = 0; idx < 100; idx++) {
  NAMES.push(CLASS_NAMES.map((c) => `${LETTERS[Math.floor(idx / 10)]}${idx % 10}${c}`));
}
const IDX_MIN = S_IDX[NS - 1]; // O3
const IDX_MAX = S_IDX[0]; // Y2

/**
 * MK spectral type with luminosity class, e.g. `G2V`, `K1III`, `B5V`, from effective
 * temperature and surface gravity. Subtypes are whole numbers (no decimals).
 *
 * Method: the subtype index (O0 = 0 … Y9 = 99) is interpolated linearly in log10 Teff on the
 * dwarf Teff scale of Pecaut & Mamajek 2013 (ApJS 208, 9), table v2024.05.15 (the
 * REFERENCES.md rows exactly, other subtypes from memory of that table), then rounded to
 * the nearest subtype; L, T and Y cover brown dwarfs below ~2300 K on the same table's scale
 * (from memory). Hotter than O3 (44900 K) is written O3, cooler than Y2 (350 K) is Y2.
 * The Teff scale of dwarfs is used for every class (giants of a given type are somewhat
 * cooler; the difference is under about 2 subtypes for G–K).
 * Luminosity class from log g (the gravity-sensitive line ratios that define the classes
 * track surface gravity): Teff-dependent boundaries, see CLASS_B in the source.
 *
 * @param teff effective temperature, K, in [10, 1e9]
 * @param logg surface gravity, log10 cgs, in [−3, 10]
 * @returns spectral type, matching /^[OBAFGKMLTY][0-9](Ia|Ib|II|III|IV|V)$/
 * @throws {RangeError} when teff or logg is not finite or outside its range
 * @example
 * spectralType(5772, 4.438); // 'G2V'
 * spectralType(4700, 2.4);   // 'K4III'
 */
export function spectralType(teff: number, logg: number): string {
  assertInRange('teff', teff, TEFF_MIN, TEFF_MAX, 'K');
  assertInRange('logg', logg, -3, 10, 'dex (cgs)');
  const x = Math.log10(teff);
  let idx: number;
  if (x <= S_LOGT[0]) idx = IDX_MAX;
  else if (x >= S_LOGT[NS - 1]) idx = IDX_MIN;
  else {
    let lo = 0;
    let hi = NS - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (S_LOGT[mid] <= x) lo = mid;
      else hi = mid;
    }
    const u = (x - S_LOGT[lo]) / (S_LOGT[hi] - S_LOGT[lo]);
    idx = Math.round(S_IDX[lo] + u * (S_IDX[hi] - S_IDX[lo]));
  }
  // Luminosity class.
  let j = 0;
  let u = 0;
  const nc = CLASS_T.length;
  if (x <= CLASS_T[0]) { j = 0; u = 0; }
  else if (x >= CLASS_T[nc - 1]) { j = nc - 2; u = 1; }
  else {
    while (CLASS_T[j + 1] < x) j++;
    u = (x - CLASS_T[j]) / (CLASS_T[j + 1] - CLASS_T[j]);
  }
  let cls = 5;
  for (let k = 0; k < 5; k++) {
    const b = CLASS_B[k];
    if (logg >= b[j] + u * (b[j + 1] - b[j])) { cls = k; break; }
  }
  return NAMES[idx][cls];
}
