/**
 * Physical constants of the panel-output functions.
 */

/** Stefan–Boltzmann constant, W/(m²K⁴) (CODATA 2018 recommended value, exact in the 2019 SI) [6]. */
export const STEFAN_BOLTZMANN_W_M2K4 = 5.670374419e-8;
