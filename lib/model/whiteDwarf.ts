/** Chandrasekhar mass for μe = 2: 5.83/μe² Msun (Chandrasekhar 1931, ApJ 74, 81) = 1.4575 Msun. */
export const CHANDRASEKHAR_MASS = 5.83 / 4;

/**
 * White-dwarf radius from the Nauenberg 1972 (ApJ 175, 417) fit to the zero-temperature
 * mass–radius relation: R = (0.0225/μe) Rsun [(M/M3)^(-2/3) − (M/M3)^(2/3)]^(1/2),
 * M3 = 5.816/μe² Msun, μe = 2 (constants from memory; REFERENCES.md).
 *
 * @param mass Msun, 0 < mass < M3 (1.454 Msun)
 * @throws RangeError outside that range
 * @example nauenbergRadius(0.6) // ≈ 0.01258
 */
export function nauenbergRadius(mass: number, mu = 2): number {
  const m3 = 5.816 / (mu * mu);
  if (!(mass > 0 && mass < m3)) throw new RangeError(`white-dwarf mass ${mass} outside (0, ${m3.toFixed(4)}) Msun`);
  const r = mass / m3;
  return (0.0225 / mu) * Math.sqrt(r ** (-2 / 3) - r ** (2 / 3));
}

/** Mean ion mass number A of a white dwarf's core: He (4) below 0.45 Msun, C/O (≈ 14, half and half by mass) up to 1.05 Msun, O/Ne (≈ 18) above (common practice). */
export function whiteDwarfIonMass(mass: number): number {
  return mass < 0.45 ? 4 : mass < 1.05 ? 14 : 18;
}

/**
 * Mestel 1952 (MNRAS 112, 583) cooling law for a white dwarf of ion mass number A:
 * t_cool ≈ 6×10⁶ yr (A/12)^(-1) (M/Msun)^(5/7) (μ/2)^(-2/7) (L/Lsun)^(-5/7), μ = 2. The
 * coefficient is raised to 9×10⁶ yr so that a 0.6 Msun C/O white dwarf reaches 10 000 K after
 * ≈ 0.6 Gyr as in the evolutionary cooling models of Fontaine, Brassard & Bergeron 2001
 * (PASP 113, 409); REFERENCES.md notes the constant varies by ×2 between sources.
 *
 * @param coolingAge yr since the white dwarf formed (> 0)
 * @param mass Msun
 * @returns L/Lsun
 * @example mestelLuminosity(6e8, 0.6) // ≈ 1.4e-3
 */
export function mestelLuminosity(coolingAge: number, mass: number): number {
  const a = whiteDwarfIonMass(mass);
  const t0 = MESTEL_COEFFICIENT * (12 / a) * mass ** (5 / 7);
  return (coolingAge / t0) ** (-7 / 5);
}

/** Inverse of {@link mestelLuminosity}: cooling age, yr, at which the white dwarf has luminosity L. */
export function mestelCoolingAge(luminosity: number, mass: number): number {
  const a = whiteDwarfIonMass(mass);
  const t0 = MESTEL_COEFFICIENT * (12 / a) * mass ** (5 / 7);
  return t0 * luminosity ** (-5 / 7);
}

/** Mestel's time constant, yr (see {@link mestelLuminosity}). */
export const MESTEL_COEFFICIENT = 9e6;
