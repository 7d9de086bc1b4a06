import { PHASE_INDEX, PHASES } from '../model/phases.js';
import { SECONDARY_EEPS } from './resampleEeps.js';
import { PRIMARY_EEPS, type Eep, type EepName } from './track.js';

const MS = PHASE_INDEX['main-sequence'];
const SGB = PHASE_INDEX.subgiant;
const RGB = PHASE_INDEX['red-giant-branch'];
const CHEB = PHASE_INDEX['core-helium-burning'];
const AGB = PHASE_INDEX['asymptotic-giant-branch'];
const REMNANT = new Set([PHASE_INDEX['white-dwarf'], PHASE_INDEX['neutron-star'], PHASE_INDEX['black-hole']]);
const NAMES: ReadonlySet<string> = new Set(PRIMARY_EEPS);

/**
 * The primary EEPs of an EEP track known only by its layout key and its phase column — what
 * a grid keeps of the tracks it blends (GridRun.layout, GridRun.phase). The layout key
 * (`resampleEeps`: `signature;names;ignition;remnant`) lists the primary EEP names and the
 * stretches between breakpoints (`|` for a phase boundary, else the phase code of a stretch
 * holding SECONDARY_EEPS[phase] points), so the breakpoint indices follow by counting; each
 * name is then put on its breakpoint by the open layout's convention (gridFileFormat.ts):
 * pms-start first, zams / tams on the first / last main-sequence EEP, ms-mid on the
 * main-sequence breakpoint between them, rgb-base on the last subgiant EEP, he-ignition on the
 * red-giant tip (the first core-helium-burning EEP without a red giant branch), cheb-start /
 * cheb-end on the first / last core-helium-burning EEP, first-thermal-pulse on the
 * asymptotic-giant-branch breakpoint before its end (else its end), agb-end on the last AGB
 * EEP, remnant-birth on the first remnant EEP, track-end last. Equal, for every track of the
 * built-in grid, to the `primary` list resampleEeps computed (test/tracks-layoutPrimaryEeps).
 *
 * @param layout the layout key of resampleEeps
 * @param phase PHASE_INDEX code of every EEP of the layout
 * @returns the EEPs in index order (life order within one index)
 * @throws RangeError when the layout does not fit the phase column
 * @example layoutPrimaryEeps('10;pms-start,track-end;none;brown-dwarf', new Uint8Array(50).fill(10))
 * // [{ name: 'pms-start', index: 0 }, { name: 'track-end', index: 49 }]
 */
export function layoutPrimaryEeps(layout: string, phase: ArrayLike<number>): Eep[] {
  const [signature, names] = layout.split(';');
  const n = phase.length;
  const fail = (why: string) => new RangeError(`layout '${layout}' does not fit a track of ${n} EEPs: ${why}`);
  if (n === 0 || signature === undefined || names === undefined) throw fail('malformed');
  const breakpoints = [0];
  let idx = 0;
  if (signature !== '') {
    for (const token of signature.split(',')) {
      if (token === '|') idx += 1;
      else {
        const code = Number(token);
        const name = PHASES[code];
        if (!Number.isInteger(code) || name === undefined) throw fail(`stretch '${token}' is not a phase code`);
        idx += SECONDARY_EEPS[name] + 1;
      }
      breakpoints.push(idx);
    }
  }
  if (idx !== n - 1) throw fail(`its stretches end at EEP ${idx}`);
  const first = (test: (p: number) => boolean): number => {
    for (let i = 0; i < n; i++) if (test(phase[i])) return i;
    return -1;
  };
  const last = (test: (p: number) => boolean): number => {
    for (let i = n - 1; i >= 0; i--) if (test(phase[i])) return i;
    return -1;
  };
  const interior = (lo: number, hi: number): number => breakpoints.find((b) => b > lo && b < hi) ?? -1;
  const is = (code: number) => (p: number) => p === code;
  const place: Record<EepName, () => number> = {
    'pms-start': () => 0,
    zams: () => first(is(MS)),
    'ms-mid': () => interior(first(is(MS)), last(is(MS))),
    tams: () => last(is(MS)),
    'rgb-base': () => last(is(SGB)),
    'he-ignition': () => (last(is(RGB)) >= 0 ? last(is(RGB)) : first(is(CHEB))),
    'cheb-start': () => first(is(CHEB)),
    'cheb-end': () => last(is(CHEB)),
    'first-thermal-pulse': () => {
      const end = last(is(AGB));
      const pulse = interior(first(is(AGB)), end);
      return pulse >= 0 ? pulse : end;
    },
    'agb-end': () => last(is(AGB)),
    'remnant-birth': () => first((p) => REMNANT.has(p)),
    'track-end': () => n - 1,
  };
  const out: Eep[] = [];
  for (const name of names === '' ? [] : names.split(',')) {
    if (!NAMES.has(name)) throw fail(`'${name}' is not a primary EEP`);
    const index = place[name as EepName]();
    if (index < 0) throw fail(`no EEP for ${name}`);
    out.push({ name: name as EepName, index });
  }
  // names come in life order; a stable sort by index keeps it within one index
  return out.sort((a, b) => a.index - b.index);
}
