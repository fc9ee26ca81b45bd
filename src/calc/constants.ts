/** Physical constants used across the engine (SI). */

/** Stefan–Boltzmann constant, W/(m²·K⁴) (CODATA 2018). */
export const SIGMA = 5.670374419e-8;
/** Standard acceleration of gravity, m/s² (ISO 80000-3). */
export const G = 9.80665;
/** Specific gas constant of dry air, J/(kg·K), as fixed by the calculation contract. */
export const R_AIR = 287.05;
/** Molar gas constant, J/(mol·K) (CODATA 2018). */
export const R_UNIVERSAL = 8.314462618;
/** Molar mass of dry air, g/mol (Lemmon et al. 2000). */
export const M_AIR = 28.9586;
/** 0 °C in kelvin. */
export const T0 = 273.15;
/** Standard sea-level pressure, Pa. */
export const P_STD = 101325;
