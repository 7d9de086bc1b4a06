/** Neutron-star radius, Rsun (12 km; Özel & Freire 2016, ARA&A 54, 401: 10–13 km). */
export const NEUTRON_STAR_RADIUS = 12e3 / 6.957e8;

/**
 * Surface temperature of a cooling neutron star, K: ≈ 10⁶ K through the neutrino-cooling era
 * (falling slowly, t^-0.1, to 10⁵ yr), then the photon-cooling decline (t^-0.5 here), the
 * shape of standard cooling curves (Yakovlev & Pethick 2004, ARA&A 42, 169; exponents from
 * memory, common practice). Ages below 10 yr are held at the 10 yr value.
 *
 * @param coolingAge yr since the supernova
 * @example neutronStarTeff(1e5) // 1e6
 */
export function neutronStarTeff(coolingAge: number): number {
  const t = Math.max(coolingAge, 10) / 1e5;
  return t <= 1 ? 1e6 * t ** -0.1 : 1e6 * t ** -0.5;
}

/** Schwarzschild radius 2GM/c², Rsun, of a black hole of mass `mass` Msun. */
export function schwarzschildRadius(mass: number): number {
  return (2 * 1.3271244e20 * mass) / 299792458 ** 2 / 6.957e8;
}
