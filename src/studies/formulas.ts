/**
 * The key formulas printed on a step's sheet in the calculation package (LaTeX, rendered at build
 * time). Each line restates an equation of the calculator's handbook page; the page holds the
 * method, sources and limits.
 */
export const KEY_FORMULAS: Readonly<Record<string, readonly string[]>> = {
  'road-power': ['\\bar P = c_{eq}\\,\\sigma_{\\dot z}^2', '\\bar P = \\pi^2 k_t\\,G_d(n_0)\\,n_0^2\\,V \\quad (w = 2)'],
  'harmonic-duty': ['E = \\oint F\\,\\mathrm{d}x', '\\bar P = E\\,f'],
  impact: ['E = \\tfrac12 m v^2 + F_p\\,s\\;(+\\,m g s)', '\\bar P = E\\,n/3600\\,\\text{s}'],
  'storey-dampers': ['\\xi_d = \\frac{\\sum_j n_j W_j}{4\\pi W_k},\\quad W_k = \\tfrac12\\omega_1^2 A^2 \\sum_i m_i\\phi_i^2', 'u = \\eta(\\xi_0 + \\xi_d)\\,u_5,\\quad \\eta = \\sqrt{10/(5 + \\xi)} \\ge 0.55', '\\bar P = W_j/T_1'],
  'forced-response': ['\\bar P = \\tfrac12 c\\,\\omega^2 Z^2'],
  'steady-temperature': ['P = h_{conv} A (T_s - T_\\infty) + \\varepsilon\\sigma A (T_s^4 - T_{sur}^4)', 'UA = (h_{conv} + h_r) A'],
  'body-cooling': ['Q = h_{conv} A (T_s - T_\\infty) + \\varepsilon\\sigma A (T_s^4 - T_{sur}^4)', 'UA = (h_{conv} + h_r) A'],
  'warm-up': ['\\tau = C/UA,\\quad T(t) = T_\\infty + \\frac{\\bar P}{UA}\\left(1 - e^{-t/\\tau}\\right)', 't_{lim} = \\tau \\ln\\frac{\\Delta T_{ss}}{\\Delta T_{ss} - \\Delta T_{lim}}'],
  'damping-fade': ['c(T) = c_{ref}\\left[s\\,\\frac{\\nu(T)}{\\nu(T_{ref})} + (1 - s)\\right]', 'P\\big(c(T_{eq})\\big) = Q(T_{eq})'],
  'power-rating': ['P_{max} = h_{conv} A (T_{max} - T_\\infty) + \\varepsilon\\sigma A (T_{max}^4 - T_{sur}^4)'],
  'gas-charge': ['p = p_0\\,\\frac{T}{T_0}\\,\\frac{V_{g0}}{V_{g0} - V_{oil}\\beta (T - T_0)}\\quad (x = 0)', 'F_{ext} = (p - p_{atm}) A_{rod},\\quad F_{c,max} = p A_p - p_{atm} A_{rod}'],
  'thermal-life': ['L(T) = L_{ref}\\exp\\!\\left[\\frac{E_a}{R}\\left(\\frac1T - \\frac1{T_{ref}}\\right)\\right]', 'D = \\int \\frac{\\mathrm{d}t}{L(T(t))},\\quad L_{hist} = t_{hist}/D'],
  'oil-viscosity': ['\\log_{10}\\log_{10}(\\nu + 0.7) = A - B\\log_{10} T'],
};
