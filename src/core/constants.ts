/**
 * Physical and standard constants, each written once with its source. A constant typed twice
 * drifts (one file rounds g_n to 9.81, another keeps 9.80665), so every module imports it from
 * here; `test/core/constants.test.ts` holds each value against its published definition.
 */

/**
 * Standard acceleration of gravity g_n, m/s², exact by definition (3rd CGPM, 1901). Used for
 * weights, decelerations in g, Grashof numbers and the unit "g".
 *
 * @source nist330 (SI Brochure, Appendix 1: declaration of the 3rd CGPM, 1901; from memory)
 */
export const STANDARD_GRAVITY = 9.80665;

/**
 * Stefan–Boltzmann constant σ, W/(m²·K⁴), CODATA 2018 recommended value. Exact since the 2019
 * SI redefinition (derived from the exact h, c, k), shown to the ten digits CODATA lists.
 *
 * $$\sigma = \frac{2\pi^5 k^4}{15 h^3 c^2}$$
 *
 * @source codata2018 (σ = 5.670 374 419… × 10⁻⁸ W m⁻² K⁻⁴)
 */
export const STEFAN_BOLTZMANN = 5.670374419e-8;

/**
 * Thermodynamic temperature of 0 °C, K, exact by definition: T/K = t/°C + 273.15. Every Celsius
 * text and the °C unit use it.
 *
 * @source nist330 (§2.3.1, Celsius temperature; from memory)
 */
export const ZERO_CELSIUS = 273.15;

/**
 * Reference spatial frequency of ISO 8608 road profiles, n₀ = 0.1 cycle/m: the class values
 * G_d(n₀) are stated at it.
 *
 * @source iso8608 (definition of the degree of roughness at n₀)
 */
export const ISO_8608_N0 = 0.1;

/**
 * n₀² in cycle²/m², written as the exact decimal 0.01. It is not `ISO_8608_N0 ** 2`, which in
 * binary floating point is 0.010000000000000002; each formula keeps the form it always had so
 * results stay bit-identical.
 *
 * @source iso8608; closed form
 */
export const ISO_8608_N0_SQUARED = 0.01;

/**
 * Temperature range of the air property table, K (rows 200–700 K). Film, body, ambient and
 * surroundings temperatures must lie inside it, and the steady-temperature search ends at its top.
 *
 * @source incropera2007 Table A.4 (Air at atmospheric pressure), rows used here (from memory)
 */
export const AIR_TABLE_RANGE = { min: 200, max: 700 } as const;

/**
 * Molar gas constant R, J/(mol·K), exact since the 2019 SI redefinition: R = N_A·k with the exact
 * Avogadro and Boltzmann constants. Used by the Arrhenius ageing law (E_a/R in kelvin).
 *
 * $$R = N_A k = 6.022\,140\,76\times10^{23}\ \text{mol}^{-1} \times 1.380\,649\times10^{-23}\ \text{J/K}$$
 *
 * @source codata2018 (R = 8.314 462 618… J mol⁻¹ K⁻¹, exact)
 */
export const MOLAR_GAS_CONSTANT = 8.31446261815324;

/**
 * Standard atmosphere, Pa, exact by definition (10th CGPM, 1954): the outside pressure a gas
 * charge's gauge pressure and rod force are reckoned against.
 *
 * @source nist811 (Appendix B.8: atmosphere, standard (atm) = 1.013 25 × 10⁵ Pa)
 */
export const STANDARD_ATMOSPHERE = 101325;
