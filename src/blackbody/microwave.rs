//! Microwave-sky conversions at a CMB temperature T₀: thermodynamic to Rayleigh-Jeans
//! temperature factor, K_CMB to MJy sr⁻¹, and the thermal Sunyaev-Zeldovich spectral shapes.
//!
//! With x = hν/(kT₀):
//! * dT_RJ/dT_CMB = x²eˣ/(eˣ − 1)² = ((x/2)/sinh(x/2))², below 1 (common practice in CMB
//!   analysis; the derivative of the Rayleigh-Jeans temperature of a blackbody with respect to
//!   its physical temperature);
//! * dB_ν/dT at T₀ = (2kν²/c²)·x²eˣ/(eˣ − 1)², reported in MJy sr⁻¹ K⁻¹ (1 Jy = 1e-26 W m⁻² Hz⁻¹,
//!   so the SI value times 1e20);
//! * the thermal SZ distortion ΔT/T = y f(x) with f(x) = x coth(x/2) − 4, and in intensity
//!   ΔI/I₀ = y g(x), g(x) = x⁴eˣ/(eˣ − 1)² f(x), I₀ = 2(kT₀)³/(hc)² (Sunyaev & Zeldovich 1972,
//!   Comments Astrophys. Space Phys. 4, 173; Birkinshaw 1999, Phys. Rep. 310, 97, eq. 81).
//!
//! Present CMB temperature for the callers: 2.72548 ± 0.00057 K (Fixsen 2009, ApJ 707, 916).

use super::kernel::x_frequency;
use crate::arg;
use crate::check::{finite_result, positive};
use crate::{Real, Result};

/// 1e20 · 2k/c², MJy sr⁻¹ K⁻¹ Hz⁻² (derived from the exact k and c).
const KCMB_CONST: f64 = 3.072_358_374_480_744e-20;
/// x₀k/h, Hz K⁻¹, x₀ = 3.830016… the root of x coth(x/2) = 4 (mpmath).
const SZ_NULL_PER_K: f64 = 79_804_586_635.006_09;

/// ((x/2)/sinh(x/2))² with x given to double length.
fn rj_factor<T: Real>(xh: T, xl: T) -> T {
    let half = T::c(0.5);
    let a = half * xh;
    let s = a.sinh();
    if !s.is_finite() {
        return T::zero();
    }
    let r = (a / s) * (T::one() + half * xl / a - half * xl / a.tanh());
    r * r
}

fn checked_x<T: Real>(frequency_hz: T, cmb_temperature_k: T) -> Result<(T, T)> {
    let nu = positive(frequency_hz, arg!(0, frequency_hz))?;
    let t = positive(cmb_temperature_k, arg!(1, cmb_temperature_k))?;
    Ok(x_frequency(nu, t))
}

/// Thermodynamic-to-Rayleigh-Jeans conversion factor dT_RJ/dT_CMB = x²eˣ/(eˣ − 1)².
///
/// * `frequency_hz`: Hz, finite and > 0.
/// * `cmb_temperature_k`: the CMB temperature T₀ in K, finite and > 0 (2.72548 K today).
///
/// Returns a number in (0, 1). Errors: `NonFinite(i)`, `NonPositive(i)`.
/// Accuracy: ≤ 8 ulp (`f64`) against mpmath.
pub fn thermodynamic_to_rayleigh_jeans_factor<T: Real>(
    frequency_hz: T,
    cmb_temperature_k: T,
) -> Result<T> {
    let (xh, xl) = checked_x(frequency_hz, cmb_temperature_k)?;
    finite_result(rj_factor(xh, xl), arg!(0, frequency_hz))
}

/// dB_ν/dT at the CMB temperature, in MJy sr⁻¹ per K_CMB: converts a CMB temperature
/// fluctuation to a specific-intensity fluctuation.
///
/// * `frequency_hz`: Hz, finite and > 0.
/// * `cmb_temperature_k`: T₀ in K, finite and > 0.
///
/// Returns MJy sr⁻¹ K⁻¹ (1e20 × the SI value in W m⁻² sr⁻¹ Hz⁻¹ K⁻¹). Errors: `NonFinite(i)`,
/// `NonPositive(i)`. Accuracy: ≤ 8 ulp (`f64`) against mpmath.
pub fn kcmb_to_mjy_per_sr<T: Real>(frequency_hz: T, cmb_temperature_k: T) -> Result<T> {
    let (xh, xl) = checked_x(frequency_hz, cmb_temperature_k)?;
    finite_result(
        ((T::c(KCMB_CONST) * frequency_hz) * frequency_hz) * rj_factor(xh, xl),
        arg!(0, frequency_hz),
    )
}

fn sz_f<T: Real>(x: T) -> T {
    x / (T::c(0.5) * x).tanh() - T::c(4.0)
}

/// Thermal SZ temperature shape f(x) = x coth(x/2) − 4 (ΔT_CMB/T₀ = y f(x)).
///
/// * `frequency_hz`: Hz, finite and > 0; `cmb_temperature_k`: T₀ in K, finite and > 0.
///
/// Returns a pure number: −2 in the Rayleigh-Jeans limit, 0 at the null (≈ 217.5 GHz for
/// T₀ = 2.72548 K), growing like x − 4 at high frequency. Errors: `NonFinite(i)`,
/// `NonPositive(i)`. Accuracy: within 1e-15·(x + 4) absolute (`f64`) against mpmath.
pub fn thermal_sz_temperature_shape<T: Real>(frequency_hz: T, cmb_temperature_k: T) -> Result<T> {
    let (xh, _) = checked_x(frequency_hz, cmb_temperature_k)?;
    finite_result(sz_f(xh), arg!(0, frequency_hz))
}

/// Thermal SZ intensity shape g(x) = x⁴eˣ/(eˣ − 1)² (x coth(x/2) − 4) (ΔI/I₀ = y g(x)).
///
/// * `frequency_hz`: Hz, finite and > 0; `cmb_temperature_k`: T₀ in K, finite and > 0.
///
/// Returns a pure number (negative below the null, positive above). Errors: `NonFinite(i)`,
/// `NonPositive(i)`. Accuracy: within 1e-15·(x + 4)·x⁴eˣ/(eˣ − 1)² absolute (`f64`).
pub fn thermal_sz_spectral_shape<T: Real>(frequency_hz: T, cmb_temperature_k: T) -> Result<T> {
    let (xh, xl) = checked_x(frequency_hz, cmb_temperature_k)?;
    finite_result(
        xh * xh * rj_factor(xh, xl) * sz_f(xh),
        arg!(0, frequency_hz),
    )
}

/// Frequency of the thermal SZ null, ν₀ = x₀kT₀/h with x₀ coth(x₀/2) = 4 (x₀ = 3.830016…).
///
/// * `cmb_temperature_k`: T₀ in K, finite and > 0.
///
/// Returns Hz (217.5 GHz for T₀ = 2.72548 K). Errors: `NonFinite(0)`, `NonPositive(0)`.
/// Accuracy: ≤ 2 ulp (`f64`) against mpmath (non-relativistic limit; relativistic corrections
/// move the null upward with cluster temperature and are not included).
pub fn thermal_sz_null_frequency<T: Real>(cmb_temperature_k: T) -> Result<T> {
    finite_result(
        T::c(SZ_NULL_PER_K) * positive(cmb_temperature_k, arg!(0, cmb_temperature_k))?,
        arg!(0, cmb_temperature_k),
    )
}
