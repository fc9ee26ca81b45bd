/**
 * Dry-air properties at any site pressure, −50…150 °C.
 *
 * Density: ideal gas with R = 287.05 J/(kg·K). Viscosity and thermal conductivity: Lemmon &
 * Jacobsen (2004), dilute-gas plus residual terms with the reduced density of the ideal gas
 * (the critical enhancement is negligible this far from the critical point and is left out).
 * cp: linear interpolation in a handbook table (see CP_TABLE). β = 1/T (ideal gas).
 */
import { M_AIR, R_AIR, R_UNIVERSAL } from "../constants";

export interface AirProperties {
  /** Temperature, K. */
  T_K: number;
  /** Pressure, Pa. */
  p_Pa: number;
  rho_kg_m3: number;
  cp_J_kgK: number;
  mu_Pa_s: number;
  k_W_mK: number;
  Pr: number;
  nu_m2_s: number;
  alpha_m2_s: number;
  beta_1_K: number;
}

/** Validity range of the property model, K (the contract's −50…150 °C). */
export const AIR_T_MIN_K = 223.15;
export const AIR_T_MAX_K = 423.15;

// Lemmon & Jacobsen (2004), Table 1 and 3, air: reducing parameters and collision integral.
const TC = 132.6312; // K
const RHOC = 10.4477; // mol/dm³
const SIGMA_NM = 0.36; // Lennard-Jones size, nm
const EPS_K = 103.3; // ε/k, K
const OMEGA_B = [0.431, -0.4623, 0.08406, 0.005341, -0.00331];
// Residual terms of viscosity (N, t, d, l) and of conductivity, Lemmon & Jacobsen (2004) Tables 2
// and 4, air; γ = 1 where l ≠ 0. Every exponent t is a multiple of 0.05, so airProperties()
// evaluates them as powers of a = τ^0.05 (one exp for all of them; this is the hot path).
//   viscosity:    10.72 τ^0.2 δ;  1.122 τ^0.05 δ⁴;  0.002019 τ^2.4 δ⁹;  −8.876 τ^0.6 δ e^−δ;
//                 −0.02916 τ^3.6 δ⁸ e^−δ
//   conductivity: dilute 1.308 η0 + 1.405 τ^−1.1 − 1.036 τ^−0.3;  residual 8.743 τ^0.1 δ;
//                 14.76 δ²;  −16.62 τ^0.5 δ³ e^−δ²;  3.793 τ^2.7 δ⁷ e^−δ²;  −6.142 τ^0.3 δ⁷ e^−δ²;
//                 −0.3778 τ^1.3 δ¹¹ e^−δ²

/**
 * cp of dry air at atmospheric pressure, J/(kg·K), tabulated every 50 K.
 * Source (from memory): Incropera, DeWitt, Bergman & Lavine, Fundamentals of Heat and Mass Transfer,
 * Table A.4 (air at atmospheric pressure).
 */
const CP_TABLE_T = [100, 150, 200, 250, 300, 350, 400, 450, 500, 550, 600];
const CP_TABLE_V = [1032, 1012, 1007, 1006, 1007, 1009, 1014, 1021, 1030, 1040, 1051];

/** cp by linear interpolation in CP_TABLE (held constant beyond the table's ends). */
export function cpAirTable(T_K: number): number {
  if (T_K <= CP_TABLE_T[0]) return CP_TABLE_V[0];
  const n = CP_TABLE_T.length;
  if (T_K >= CP_TABLE_T[n - 1]) return CP_TABLE_V[n - 1];
  const i = Math.min(n - 2, Math.floor((T_K - CP_TABLE_T[0]) / 50));
  const f = (T_K - CP_TABLE_T[i]) / 50;
  return CP_TABLE_V[i] + f * (CP_TABLE_V[i + 1] - CP_TABLE_V[i]);
}

/** Dilute-gas viscosity of air, Pa·s: η0 = 0.0266958 √(M T) / (σ² Ω(T*)) μPa·s.  * @example 300 K → 18.52 μPa·s (dilute part; the residual adds about 0.014 μPa·s at 1 bar)
 * @see Lemmon & Jacobsen (2004), Int. J. Thermophys. 25, 21–69, eqs. 2–4 and table 1.
 */
export function muAirDiluteLemmonJacobsen(T_K: number): number {
  const lnTs = Math.log(T_K / EPS_K);
  const lnOmega =
    OMEGA_B[0] + lnTs * (OMEGA_B[1] + lnTs * (OMEGA_B[2] + lnTs * (OMEGA_B[3] + lnTs * OMEGA_B[4])));
  return (0.0266958 * Math.sqrt(M_AIR * T_K)) / (SIGMA_NM * SIGMA_NM * Math.exp(lnOmega)) * 1e-6;
}

/**
 * Dry-air properties at temperature T_K and pressure p_Pa.
 * @param T_K temperature, K
 * @param p_Pa absolute pressure, Pa
 * @returns density, cp, μ, k, Pr, ν, α, β
 * Validity: 223.15…423.15 K (−50…150 °C); callers warn outside it.
 * @example airProperties(300, 1e5).nu_m2_s ≈ 1.589e-5 (Incropera Table A.4, 300 K, from memory)
 * @see E. W. Lemmon, R. T. Jacobsen, "Viscosity and thermal conductivity equations for nitrogen,
 *   oxygen, argon, and air", Int. J. Thermophys. 25 (2004) 21–69.
 */
export function airPropertiesInto(T_K: number, p_Pa: number, out: AirProperties): AirProperties {
  out.T_K = T_K;
  out.p_Pa = p_Pa;
  return airPropertiesOf(out);
}

/**
 * airPropertiesInto at the temperature and pressure already in `out.T_K` and `out.p_Pa`. The
 * engine's iterations set those two fields and call this: an object argument passes as it is,
 * where number arguments to a call the optimiser does not inline are boxed into fresh heap numbers
 * on every call, garbage the collector then has to sweep.
 */
export function airPropertiesOf(out: AirProperties): AirProperties {
  const T_K = out.T_K;
  const p_Pa = out.p_Pa;
  const rho = p_Pa / (R_AIR * T_K);
  // Reduced density on the molar basis of Lemmon & Jacobsen (mol/dm³), from the same ideal gas.
  const delta = p_Pa / (R_UNIVERSAL * T_K) / 1000 / RHOC;
  const tau = TC / T_K;
  const eta0 = muAirDiluteLemmonJacobsen(T_K);
  const a = Math.exp(0.05 * Math.log(tau)); // τ^0.05
  const a2 = a * a;
  const a4 = a2 * a2;
  const a6 = a4 * a2;
  const a8 = a4 * a4;
  const a12 = a8 * a4;
  const t2 = tau * tau;
  const d2 = delta * delta;
  const d4 = d2 * d2;
  const d7 = d4 * d2 * delta;
  const d8 = d4 * d4;
  const e1 = Math.exp(-delta);
  const e2 = Math.exp(-d2);
  const etaR =
    10.72 * a4 * delta +
    1.122 * a * d4 +
    0.002019 * t2 * a8 * d8 * delta -
    8.876 * a12 * delta * e1 -
    0.02916 * t2 * tau * a12 * d8 * e1;
  const mu = eta0 + etaR * 1e-6;
  const lambda0 = 1.308 * (eta0 * 1e6) + 1.405 / (tau * a2) - 1.036 / a6;
  const lambdaR =
    8.743 * a2 * delta +
    14.76 * d2 +
    e2 * (-16.62 * Math.sqrt(tau) * d2 * delta + d7 * (3.793 * t2 * a12 * a2 - 6.142 * a6 - 0.3778 * tau * a6 * d4));
  const k = (lambda0 + lambdaR) * 1e-3;
  const cp = cpAirTable(T_K);
  // Written field by field into `out`, so iterations can reuse one object without allocating.
  out.rho_kg_m3 = rho;
  out.cp_J_kgK = cp;
  out.mu_Pa_s = mu;
  out.k_W_mK = k;
  out.Pr = (cp * mu) / k;
  out.nu_m2_s = mu / rho;
  out.alpha_m2_s = k / (rho * cp);
  out.beta_1_K = 1 / T_K;
  return out;
}

/** A fresh AirProperties object to fill with airPropertiesInto. */
export function newAirProperties(): AirProperties {
  return { T_K: 0, p_Pa: 0, rho_kg_m3: 0, cp_J_kgK: 0, mu_Pa_s: 0, k_W_mK: 0, Pr: 0, nu_m2_s: 0, alpha_m2_s: 0, beta_1_K: 0 };
}

/** Dry-air properties at T_K and p_Pa in a new object; see airPropertiesInto. */
export function airProperties(T_K: number, p_Pa: number): AirProperties {
  return airPropertiesInto(T_K, p_Pa, newAirProperties());
}
