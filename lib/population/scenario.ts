/**
 * # The scenario file (starclock's own JSON layout)
 *
 * A scenario names a population: how many stars, their initial mass function (IMF), when they
 * were born (the star-formation history), their metallicity, the random seed, the present
 * time, and the time grid over which `history` and the viewer follow it. Read and checked by
 * {@link parseScenario}; every key not listed here is an error, at any depth.
 *
 * ```json
 * { "name": "Harbour Cluster", "seed": 7, "size": 20000,
 *   "imf": { "kind": "kroupa" },
 *   "starFormation": { "kind": "burst", "duration": "5Myr" },
 *   "metallicity": { "z": 0.014 },
 *   "now": "650Myr",
 *   "history": { "from": "1Myr", "to": "650Myr", "steps": 60, "spacing": "log" } }
 * ```
 *
 * Times ("ages" below) are strings with a unit — `yr`, `kyr`, `Myr`, `Gyr`, exponents allowed
 * (`5e9yr`) — or bare numbers, read as Gyr (lib/io/parseAge). Time here is time since star
 * formation began: a star born at time t_b is `now − t_b` old today.
 *
 * | key | required | allowed | meaning |
 * |---|---|---|---|
 * | `name` | yes | non-empty string | the population's name |
 * | `seed` | yes | integer 0 … 2⁵³ − 1 | seed of every star's random stream |
 * | `size` | yes | integer 1 … 4 294 967 295 | number of stars |
 * | `now` | yes | age, 0 < now ≤ 100 Gyr | time since star formation began |
 * | `imf` | yes | object | initial mass function (below) |
 * | `starFormation` | yes | object | star-formation history (below) |
 * | `metallicity` | no | object | default `{ "z": 0.014 }` (solar) |
 * | `history` | no | object | time grid (below) |
 *
 * `imf`: `kind` (required) one of
 * - `salpeter` — dN/dm ∝ m^−2.35 (Salpeter 1955, ApJ 121, 161);
 * - `kroupa` — dN/dm ∝ m^−α, α = 0.3 below 0.08 Msun, 1.3 for 0.08–0.5, 2.3 above
 *   (Kroupa 2001, MNRAS 322, 231), continuous at the breaks;
 * - `chabrier` — single-star system IMF of Chabrier 2003 (PASP 115, 763): per log10 m the
 *   lognormal 0.158 exp[−(log m − log 0.079)²/(2·0.69²)] up to 1 Msun, then dN/dlog m ∝ m^−1.3,
 *   continuous at 1 Msun;
 * - `power-law` — your own: `slopes` (α of each segment, dN/dm ∝ m^−α, each finite in −10…10)
 *   and `breaks` (the masses between segments, strictly increasing, strictly inside
 *   minMass…maxMass; one fewer than `slopes`), continuous at the breaks.
 *
 * `minMass`, `maxMass` (optional, Msun): the mass limits, default 0.08 and 120; allowed
 * 0.01 ≤ minMass < maxMass ≤ 150 (below 0.08 the population includes brown dwarfs).
 * `slopes` and `breaks` belong to `power-law` only.
 *
 * `starFormation`: `kind` (required) one of
 * - `burst` with `duration` (required age, 0 … 100 Gyr): birth times uniform in [0, duration]; a burst
 *   longer than `now` is cut at `now` (no star is born after now);
 * - `constant`: uniform in [0, now];
 * - `exponential` with `tau` (required age, 0 < τ ≤ 1000 Gyr): rate ∝ exp(−t/τ) over [0, now];
 * - `table` with `points` (required, ≥ 2 pairs `[time, rate]`): times are ages ≥ 0, strictly
 *   increasing; rates finite ≥ 0 in any unit (only their ratios matter); the rate is linear
 *   between points and zero outside them, and only [0, now] is used; it must form some stars
 *   in [0, now].
 *
 * `metallicity`: one of
 * - `{ "z": Z }` — fixed metal mass fraction, 1e-4 ≤ Z ≤ 0.03 (the model's range);
 * - `{ "feh": F }` — fixed [Fe/H] (dex), Z from lib/model/zFromFeh; must map inside that range;
 * - `{ "feh": F, "spread": σ }` — [Fe/H] normal with mean F and standard deviation σ
 *   (0 < σ ≤ 1 dex), truncated to the model's Z range: a value outside is drawn again
 *   (exactly, by the truncated normal's inverse CDF, one draw per star — see
 *   {@link createMetallicityModel}), never clipped to the edge;
 * - `{ "ageMetallicity": [[age, feh], …], "spread"?: σ }` — an age–metallicity relation: the
 *   mean [Fe/H] is linear in the star's age between points (ages strictly increasing, ≥ 0;
 *   held at the end values outside them), each [Fe/H] inside the model's range; with `spread`,
 *   normal about it as above.
 *
 * `history` (optional): `from` (age > 0), `to` (age > from, ≤ 100 Gyr), `steps` (integer
 * 2 … 10 000: the number of times, both ends included), `spacing` `log` or `linear`; every key
 * optional, defaults from 1 Myr (or now/100 when now ≤ 1 Myr) to `now`, 60 steps, `log`. Times
 * after `now` show the population's future as if star formation stopped at now.
 *
 * {@link parseScenario} returns the {@link Scenario} below: ages in yr, defaults filled.
 */

/** Initial mass function, normalised (see the file layout above). */
export type ImfSpec =
  | { kind: 'salpeter'; minMass: number; maxMass: number }
  | { kind: 'kroupa'; minMass: number; maxMass: number }
  | { kind: 'chabrier'; minMass: number; maxMass: number }
  | { kind: 'power-law'; minMass: number; maxMass: number; slopes: number[]; breaks: number[] };

/** Star-formation history; times in yr since star formation began. */
export type StarFormationSpec =
  | { kind: 'burst'; duration: number }
  | { kind: 'constant' }
  | { kind: 'exponential'; tau: number }
  /** points: [time yr, rate (any unit)] */
  | { kind: 'table'; points: [number, number][] };

/** Metallicity, normalised: `fixed` (from z or feh), `spread` about a fixed [Fe/H], or an age–metallicity relation. */
export type MetallicitySpec =
  | { kind: 'fixed'; z: number }
  | { kind: 'spread'; feh: number; spread: number }
  /** points: [age yr, [Fe/H] dex]; spread 0 when none was given */
  | { kind: 'ageMetallicity'; points: [number, number][]; spread: number };

/** Time grid of the history and the viewer, yr. */
export interface HistorySpec {
  from: number;
  to: number;
  steps: number;
  spacing: 'log' | 'linear';
}

/** A checked scenario with defaults filled; every time in yr. */
export interface Scenario {
  name: string;
  seed: number;
  size: number;
  imf: ImfSpec;
  starFormation: StarFormationSpec;
  metallicity: MetallicitySpec;
  /** yr since star formation began */
  now: number;
  history: HistorySpec;
}

/** Default IMF mass limits, Msun (the hydrogen-burning limit and a common upper mass). */
export const DEFAULT_MIN_MASS = 0.08;
/** See {@link DEFAULT_MIN_MASS}. */
export const DEFAULT_MAX_MASS = 120;
/** Allowed IMF mass limits, Msun (the analytic model's mass range). */
export const IMF_MASS_LIMITS = Object.freeze({ min: 0.01, max: 150 });
