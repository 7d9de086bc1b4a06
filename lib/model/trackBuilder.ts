import { PHASE_INDEX, type Phase, type RemnantKind } from './phases.js';
import { MAX_AGE } from './limits.js';
import type { Eep, EepName, LifeEvent, LifeEventName, Track } from '../tracks/track.js';

/**
 * Collects track points phase by phase and finishes them into a columnar {@link Track},
 * cut at {@link MAX_AGE} (the last point is interpolated onto it) unless `fullLife`.
 */
export class TrackBuilder {
  readonly age: number[] = [];
  readonly mass: number[] = [];
  readonly coreMass: number[] = [];
  readonly logL: number[] = [];
  readonly logTeff: number[] = [];
  readonly phase: number[] = [];
  readonly eeps: Eep[] = [];
  readonly events: LifeEvent[] = [];

  constructor(readonly initialMass: number, readonly z: number, readonly fullLife = false) {}

  get length(): number {
    return this.age.length;
  }

  /** Appends one point. Ages must not decrease; masses must not grow (checked). */
  push(age: number, mass: number, coreMass: number, logL: number, logTeff: number, phase: Phase): void {
    const n = this.age.length;
    if (!Number.isFinite(age) || !Number.isFinite(mass) || !Number.isFinite(coreMass) || !Number.isFinite(logL) || !Number.isFinite(logTeff)) {
      throw new RangeError(`track of ${this.initialMass} Msun, z ${this.z}: non-finite point at age ${age} in ${phase} (M ${mass}, Mc ${coreMass}, logL ${logL}, logTeff ${logTeff})`);
    }
    if (n > 0) {
      if (age < this.age[n - 1]) throw new RangeError(`track of ${this.initialMass} Msun: age decreases at ${age} yr in ${phase}`);
      if (age === this.age[n - 1] && this.phase[n - 1] === PHASE_INDEX[phase]) return; // same point twice
      mass = Math.min(mass, this.mass[n - 1]);
    }
    this.age.push(age);
    this.mass.push(mass);
    this.coreMass.push(Math.min(coreMass, mass));
    this.logL.push(logL);
    this.logTeff.push(logTeff);
    this.phase.push(PHASE_INDEX[phase]);
  }

  /** Marks the last pushed point as the primary EEP `name`. */
  mark(name: EepName): void {
    this.eeps.push({ name, index: this.age.length - 1 });
  }

  /** Records a key event of the life at `age`, yr. */
  event(event: LifeEventName, age: number): void {
    this.events.push({ event, age });
  }

  /** The last point's values. */
  last(): { age: number; mass: number; coreMass: number; logL: number; logTeff: number } {
    const i = this.age.length - 1;
    return { age: this.age[i], mass: this.mass[i], coreMass: this.coreMass[i], logL: this.logL[i], logTeff: this.logTeff[i] };
  }

  /** Finishes the track: cuts it at MAX_AGE and marks `track-end`. */
  build(msLifetime: number, remnant: RemnantKind, remnantMass: number): Track {
    let n = this.age.length;
    const cols = [this.age, this.mass, this.coreMass, this.logL, this.logTeff];
    if (!this.fullLife && this.age[n - 1] > MAX_AGE) {
      let k = this.age.findIndex((a) => a > MAX_AGE);
      // cut between k-1 and k; inside one phase interpolate a point at MAX_AGE
      if (k > 0 && this.phase[k - 1] === this.phase[k] && this.age[k - 1] < MAX_AGE) {
        const w = (MAX_AGE - this.age[k - 1]) / (this.age[k] - this.age[k - 1]);
        for (const c of cols) c[k] = c[k - 1] + w * (c[k] - c[k - 1]);
        this.age[k] = MAX_AGE;
        k += 1;
      }
      n = k;
      for (const c of cols) c.length = n;
      this.phase.length = n;
    }
    const eeps = this.eeps.filter((e) => e.index < n);
    if (eeps.length === 0 || eeps[eeps.length - 1].index !== n - 1) eeps.push({ name: 'track-end', index: n - 1 });
    else if (eeps[eeps.length - 1].name !== 'track-end') eeps.push({ name: 'track-end', index: n - 1 });
    return {
      initialMass: this.initialMass,
      z: this.z,
      n,
      age: Float64Array.from(this.age),
      mass: Float64Array.from(this.mass),
      coreMass: Float64Array.from(this.coreMass),
      logL: Float64Array.from(this.logL),
      logTeff: Float64Array.from(this.logTeff),
      phase: Uint8Array.from(this.phase),
      eeps,
      events: this.fullLife ? this.events.slice() : this.events.filter((e) => e.age <= MAX_AGE),
      msLifetime,
      remnant,
      remnantMass,
    };
  }
}
