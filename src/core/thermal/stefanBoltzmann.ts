/**
 * Stefan–Boltzmann constant σ, W/(m²·K⁴), CODATA 2018 recommended value. Exact since the 2019
 * SI redefinition (derived from the exact h, c, k), shown to the ten digits CODATA lists.
 *
 * $$\sigma = \frac{2\pi^5 k^4}{15 h^3 c^2}$$
 *
 * @source codata2018 (σ = 5.670 374 419… × 10⁻⁸ W m⁻² K⁻⁴)
 */
export const STEFAN_BOLTZMANN = 5.670374419e-8;

/** Standard acceleration of gravity g_n, m/s², exact by definition (used in Grashof numbers). */
export const STANDARD_GRAVITY = 9.80665;
