//! The measurement equation of radiation thermometry: the signal of a real (grey, reflecting)
//! surface seen through a partly transmitting path, its inverse (the object temperature), the
//! sensitivity coefficients of that temperature and its combined standard uncertainty, for one
//! value and for images.
//!
//! # The equation
//! An instrument that sees a surface of emissivity ε at temperature T_obj, which reflects
//! surroundings at T_refl, through a path (air, a window) of transmittance τ at temperature
//! T_path, receives
//!
//! L_meas = τ [ε L(T_obj) + (1 − ε) L(T_refl)] + (1 − τ) L(T_path),
//!
//! where L(T) is the blackbody quantity the instrument measures: the spectral radiance B_λ at
//! one wavelength or B_ν at one frequency, the band radiance between two wavelengths, or the
//! response-weighted radiance of a tabulated spectral response (the conventions of
//! [`band_radiance_wavelength`] and [`response_weighted_radiance`]). The surface is opaque and
//! grey over the instrument's spectrum (reflectance 1 − ε), the path does not scatter, and the
//! reflected surroundings and the path are blackbodies at their temperatures (common practice
//! in radiation thermometry; e.g. DeWitt & Nutter (eds.), Theory and Practice of Radiation
//! Thermometry, Wiley 1988, ch. 2, and the manuals of every thermal camera).
//!
//! **Domain.** 0 < ε ≤ 1, 0 < τ ≤ 1; T_obj > 0; T_refl ≥ 0 and T_path ≥ 0, where 0 K stands for
//! surroundings or a path that emit nothing at the instrument's wavelengths (a cold sky, a
//! cryogenic shroud): L(0) = 0 and dL/dT(0) = 0. The signal is any finite number.
//!
//! **Inverse.** The corrected object radiance
//! L_obj = ([L_meas − (1 − τ) L(T_path)]/τ − (1 − ε) L(T_refl))/ε
//! must be positive; otherwise no object temperature reproduces the signal and the inverse
//! returns `OutOfDomain` naming the signal (never NaN, never a clamped value). T_obj is then the
//! brightness temperature of L_obj: the closed form [`brightness_temperature_wavelength`] or
//! [`brightness_temperature_frequency`] at one wavelength or frequency, and the shared root
//! finder through [`temperature_from_band_radiance_wavelength`] and
//! [`temperature_from_response_weighted_radiance`] for the band and response forms. With ε = 1
//! and τ = 1 the inverse is that brightness temperature bit for bit; a term whose weight is
//! exactly 0 (1 − ε for ε = 1, 1 − τ for τ = 1) is not evaluated, so its temperature only
//! needs to pass the argument checks.
//!
//! **Sensitivity coefficients** (implicit differentiation of the equation at the solution, with
//! D = τ ε L′(T_obj), L′ = dL/dT the library's own derivative):
//! ∂T/∂L_meas = 1/D, ∂T/∂ε = −τ (L_obj − L(T_refl))/D, ∂T/∂T_refl = −τ (1 − ε) L′(T_refl)/D,
//! ∂T/∂τ = −(ε L_obj + (1 − ε) L(T_refl) − L(T_path))/D, ∂T/∂T_path = −(1 − τ) L′(T_path)/D.
//! L′ is [`radiance_temperature_derivative_wavelength`] (or `_frequency`), the band form
//! [`band_radiance_temperature_derivative_wavelength`] and the response form
//! [`response_weighted_radiance_temperature_derivative`]. The `_with_uncertainty` forms return
//! them in a [`TemperatureUncertainty`] in that order (signal, emissivity, reflected
//! temperature, transmittance, path temperature) with the combined standard uncertainty of
//! uncorrelated inputs (JCGM 100:2008 eq. 10); for correlated inputs pass the coefficients to
//! [`combined_standard_uncertainty_correlated`](super::combined_standard_uncertainty_correlated) (eq. 13). They evaluate L(T_refl) and L(T_path)
//! even where their weight is 0, because ∂T/∂ε and ∂T/∂τ need them.
//!
//! **Accuracy** (`f64`, measured against mpmath at 40 digits, `tests/data/thermometry.txt`):
//! the object temperature within 1e-13 relative where the condition number of the correction
//! κ = (|L_meas| + (1 − τ) L(T_path) + τ(1 − ε) L(T_refl))/(τ ε L_obj) is at most 20 (in general
//! the error grows as κ ε times the relative sensitivity (1 − e^−x)/x of T to L); coefficients
//! within 1e-12 relative (those of ε and τ, which vanish where T_refl = T_obj or where the scene
//! is balanced, within 1e-12 of the size of their terms); `f32` temperatures within 4 `f32` ulp
//! for κ ≤ 2.
//!
//! # Cautions
//! Emissivity and reflections dominate the errors of real radiation thermometry: an emissivity
//! guessed 0.05 too high or a reflected temperature taken from the wrong wall moves T_obj by far
//! more than any rounding here, and the combined standard uncertainty covers only the inputs and
//! standard uncertainties given (not the emissivity model, the size-of-source effect, the
//! instrument's non-linearity or drift). Fever screening, furnaces, molten metal and fire safety
//! follow the applicable standards (for example the IEC 80601-2-59 and ISO/TR 13154 series for
//! screening thermographs), local codes and licensed practice; these functions are not a
//! certified measurement chain.

use super::band::{WAVELENGTH_BAND, band_radiance_and_derivative_wavelength_unchecked, check_band};
use super::inverse::{
    brightness_constants_wavelength, brightness_temperature_frequency,
    brightness_temperature_wavelength, brightness_temperature_wavelength_fast,
    brightness_temperature_wavelength_parts,
};
use super::kernel::two_h_nu3_over_c2;
use super::planck::{
    radiance_and_derivative_wavelength_fast, radiance_and_derivative_wavelength_unchecked,
    radiance_temperature_derivative_frequency, radiance_temperature_derivative_wavelength,
    spectral_radiance_frequency, spectral_radiance_wavelength,
};
use super::response::{check_table, response_weighted_derivative_unchecked};
use super::uncertainty::{SENSITIVITY_CAPACITY, TemperatureUncertainty, sum_of_squares_is_safe};
use super::{
    band_radiance_wavelength, response_weighted_radiance,
    temperature_from_band_radiance_wavelength, temperature_from_response_weighted_radiance,
};
use crate::arg;
use crate::check::{finite, finite_result, non_negative, positive, unit_interval};
use crate::constants as k;
use crate::math::dd;
use crate::{Arg, ArrayResult, ElementError, Error, Real, Result};

// ---------------------------------------------------------------------------------------------
// The blackbody quantity of each form
// ---------------------------------------------------------------------------------------------

/// The arguments the errors of the scene functions name, at their positions in the public
/// functions of a form whose signal (or object temperature) is argument `first`: ε, T_refl, τ,
/// T_path follow it, then the five standard uncertainties; the frame forms' outputs come after
/// the scene (`out`) or after the uncertainties (`out_temperature`, `out_uncertainty`, or the
/// budget forms' `out`).
#[derive(Clone, Copy)]
pub(crate) struct SceneArgs {
    signal: Arg,
    object_temperature: Arg,
    scene: [Arg; 4],
    uncertainties: [Arg; 5],
    out: Arg,
    outs_with_uncertainty: [Arg; 2],
    budget_out: Arg,
}

macro_rules! scene_args {
    ($first:literal) => {
        SceneArgs {
            signal: arg!($first, signal),
            object_temperature: arg!($first, object_temperature_k),
            scene: [
                arg!($first + 1, emissivity),
                arg!($first + 2, reflected_temperature_k),
                arg!($first + 3, transmittance),
                arg!($first + 4, path_temperature_k),
            ],
            uncertainties: [
                arg!($first + 5, signal_uncertainty),
                arg!($first + 6, emissivity_uncertainty),
                arg!($first + 7, reflected_temperature_uncertainty_k),
                arg!($first + 8, transmittance_uncertainty),
                arg!($first + 9, path_temperature_uncertainty_k),
            ],
            out: arg!($first + 5, out),
            outs_with_uncertainty: [
                arg!($first + 10, out_temperature),
                arg!($first + 11, out_uncertainty),
            ],
            budget_out: arg!($first + 10, out),
        }
    };
}

/// The blackbody quantity an instrument measures, L(T), with its derivative and its inverse.
/// Implementations are built from checked spectral arguments; `ARGS` names the scene arguments
/// of the public functions (the signal or the object temperature first).
pub(crate) trait Quantity<T: Real> {
    /// The scene arguments of the public functions of this form.
    const ARGS: SceneArgs;
    /// L(T) for T > 0.
    fn radiance(&self, t: T) -> Result<T>;
    /// dL/dT for T > 0.
    fn derivative(&self, t: T) -> Result<T>;
    /// The T > 0 with L(T) = l, for l > 0.
    fn temperature(&self, l: T) -> Result<T>;
    /// (L(T), dL/dT) for T > 0: the bits of [`Quantity::radiance`] and
    /// [`Quantity::derivative`], in one evaluation where the form has one.
    fn radiance_and_derivative(&self, t: T) -> Result<(T, T)> {
        Ok((self.radiance(t)?, self.derivative(t)?))
    }
    /// The T > 0 with L(T) = l and dL/dT there (the temperature bits of
    /// [`Quantity::temperature`]): by default [`Quantity::derivative`] at T; the one-wavelength
    /// and one-frequency forms give the derivative in closed form from l
    /// ([`derivative_at_brightness`]). The outer error is that of the temperature, the inner one
    /// that of the derivative.
    fn temperature_and_derivative(&self, l: T) -> Result<(T, Result<T>)> {
        let t = self.temperature(l)?;
        Ok((t, self.derivative(t)))
    }
    /// (L, dL/dT) at two temperatures at once, the bits of
    /// [`Quantity::radiance_and_derivative`], where the form has a straight-line kernel and
    /// both temperatures are inside its common case (positive, results normal); else `None`.
    /// Written over a pair so that the compiler may evaluate both in one SIMD register.
    fn radiance_and_derivative_pair(&self, _t1: T, _t2: T) -> Option<[(T, T); 2]> {
        None
    }
    /// The constants of the branch-free frame path of this form, where it has one.
    fn frame_constants(&self) -> Option<FrameConstants<T>> {
        None
    }
}

/// What the branch-free frame path of the one-wavelength form needs: λ, c₂/λ and 2hc²/λ⁵
/// ([`brightness_constants_wavelength`]).
#[derive(Clone, Copy)]
pub(crate) struct FrameConstants<T> {
    c2_over_l: T,
    a: T,
    inv_a: T,
}

/// ∂B/∂T at the brightness temperature t of a spectral radiance l, in closed form from l:
/// with B = a/(eˣ − 1) and x = θ/t (θ = c₂/λ at a wavelength, hν/k at a frequency), at the
/// solution eˣ − 1 = a/l, so ∂B/∂T = (x/t)·B·eˣ/(eˣ − 1) = (θ/t)·(l/t)·(1 + l/a). No
/// exponential: the derivative the implicit differentiation needs comes from the same
/// constants as the temperature (`inv_a` = 1/a).
#[inline(always)]
pub(crate) fn derivative_at_brightness<T: Real>(theta: T, inv_a: T, t: T, l: T) -> T {
    let inv_t = T::one() / t;
    ((theta * inv_t) * (l * inv_t)) * (T::one() + l * inv_a)
}

#[derive(Clone, Copy)]
pub(crate) struct Wavelength<T>(pub(crate) T);
#[derive(Clone, Copy)]
pub(crate) struct Frequency<T>(pub(crate) T);
#[derive(Clone, Copy)]
struct Band<T>(T, T);
#[derive(Clone, Copy)]
struct Response<'a, T>(&'a [T], &'a [T]);

impl<T: Real> Quantity<T> for Wavelength<T> {
    const ARGS: SceneArgs = scene_args!(1);
    #[inline(always)]
    fn radiance(&self, t: T) -> Result<T> {
        spectral_radiance_wavelength(self.0, t)
    }
    #[inline(always)]
    fn derivative(&self, t: T) -> Result<T> {
        radiance_temperature_derivative_wavelength(self.0, t)
    }
    #[inline(always)]
    fn temperature(&self, l: T) -> Result<T> {
        brightness_temperature_wavelength(self.0, l)
    }
    fn radiance_and_derivative(&self, t: T) -> Result<(T, T)> {
        let t = positive(t, arg!(1, temperature_k))?;
        let (b, d) = radiance_and_derivative_wavelength_unchecked(self.0, t);
        Ok((
            finite_result(b, arg!(0, wavelength_m))?,
            finite_result(d, arg!(0, wavelength_m))?,
        ))
    }
    #[inline(always)]
    fn radiance_and_derivative_pair(&self, t1: T, t2: T) -> Option<[(T, T); 2]> {
        let r = [t1, t2].map(|t| {
            let (b, d, inside) = radiance_and_derivative_wavelength_fast(self.0, t);
            (
                (b, d),
                inside & (t >= T::min_positive_value()) & (t <= T::max_value()),
            )
        });
        match r {
            [(p1, true), (p2, true)] => Some([p1, p2]),
            _ => None,
        }
    }
    fn frame_constants(&self) -> Option<FrameConstants<T>> {
        let (c2_over_l, a) = brightness_constants_wavelength(self.0);
        Some(FrameConstants {
            c2_over_l,
            a,
            inv_a: T::one() / a,
        })
    }
    fn temperature_and_derivative(&self, l: T) -> Result<(T, Result<T>)> {
        let b = positive(l, arg!(1, spectral_radiance))?;
        let (t, c2_over_l, a) = brightness_temperature_wavelength_parts(self.0, b);
        let t = finite_result(t, arg!(1, spectral_radiance))?;
        let d = derivative_at_brightness(c2_over_l, T::one() / a, t, b);
        Ok((t, finite_result(d, arg!(1, spectral_radiance))))
    }
}

impl<T: Real> Quantity<T> for Frequency<T> {
    const ARGS: SceneArgs = scene_args!(1);
    #[inline(always)]
    fn radiance(&self, t: T) -> Result<T> {
        spectral_radiance_frequency(self.0, t)
    }
    #[inline(always)]
    fn derivative(&self, t: T) -> Result<T> {
        radiance_temperature_derivative_frequency(self.0, t)
    }
    #[inline(always)]
    fn temperature(&self, l: T) -> Result<T> {
        brightness_temperature_frequency(self.0, l)
    }
    fn temperature_and_derivative(&self, l: T) -> Result<(T, Result<T>)> {
        let t = brightness_temperature_frequency(self.0, l)?;
        let (hh, hl) = T::c2(k::PLANCK_OVER_BOLTZMANN, k::PLANCK_OVER_BOLTZMANN_LO);
        let (th, tl) = dd::mul_dd_d(hh, hl, self.0);
        let a = two_h_nu3_over_c2(self.0);
        let d = derivative_at_brightness(th + tl, T::one() / a, t, l);
        Ok((t, finite_result(d, arg!(1, spectral_radiance))))
    }
}

impl<T: Real> Quantity<T> for Band<T> {
    const ARGS: SceneArgs = scene_args!(2);
    fn radiance(&self, t: T) -> Result<T> {
        band_radiance_wavelength(self.0, self.1, t)
    }
    fn derivative(&self, t: T) -> Result<T> {
        let t = positive(t, arg!(2, temperature_k))?;
        finite_result(
            band_radiance_and_derivative_wavelength_unchecked(self.0, self.1, t).1,
            arg!(2, temperature_k),
        )
    }
    fn temperature(&self, l: T) -> Result<T> {
        temperature_from_band_radiance_wavelength(self.0, self.1, l)
    }
}

impl<T: Real> Quantity<T> for Response<'_, T> {
    const ARGS: SceneArgs = scene_args!(2);
    fn radiance(&self, t: T) -> Result<T> {
        response_weighted_radiance(self.0, self.1, t)
    }
    fn derivative(&self, t: T) -> Result<T> {
        let t = positive(t, arg!(2, temperature_k))?;
        finite_result(
            response_weighted_derivative_unchecked(self.0, self.1, t)?,
            arg!(2, temperature_k),
        )
    }
    fn temperature(&self, l: T) -> Result<T> {
        temperature_from_response_weighted_radiance(self.0, self.1, l)
    }
}

fn wavelength<T: Real>(wavelength_m: T) -> Result<Wavelength<T>> {
    Ok(Wavelength(positive(wavelength_m, arg!(0, wavelength_m))?))
}

fn frequency<T: Real>(frequency_hz: T) -> Result<Frequency<T>> {
    Ok(Frequency(positive(frequency_hz, arg!(0, frequency_hz))?))
}

fn band<T: Real>(lower_m: T, upper_m: T) -> Result<Band<T>> {
    let (lo, up) = check_band(lower_m, upper_m, WAVELENGTH_BAND)?;
    Ok(Band(lo, up))
}

fn response<'a, T: Real>(wavelengths_m: &'a [T], response: &'a [T]) -> Result<Response<'a, T>> {
    check_table(wavelengths_m, response).map_err(|e| match e.argument() {
        Some(1) => e.with_arg(arg!(1, response_table)),
        _ => e,
    })?;
    Ok(Response(wavelengths_m, response))
}

/// An error of evaluating L or L′ at a valid temperature (only overflow or a failed quadrature
/// can occur) names that temperature's argument; a failed quadrature stays `NoConvergence`.
fn at(arg: Arg) -> impl Fn(Error) -> Error {
    move |e| match e {
        Error::NoConvergence => Error::NoConvergence,
        _ => Error::OutOfDomain(arg),
    }
}

// ---------------------------------------------------------------------------------------------
// The scene: emissivity, reflected surroundings, path
// ---------------------------------------------------------------------------------------------

/// The checked scene parameters and the blackbody quantities of the surroundings and the path.
#[derive(Clone, Copy)]
struct Scene<T> {
    emissivity: T,
    transmittance: T,
    reflected: T,
    path: T,
    reflected_derivative: T,
    path_derivative: T,
}

impl<T: Real> Scene<T> {
    /// The scene of one pixel of a frame whose surroundings and path are shared:
    /// `[L(T_refl), L′(T_refl), L(T_path), L′(T_path)]` as [`shared_scene`] gives them.
    #[inline(always)]
    fn shared(emissivity: T, transmittance: T, [r, rd, p, pd]: [T; 4]) -> Self {
        Scene {
            emissivity,
            transmittance,
            reflected: r,
            path: p,
            reflected_derivative: rd,
            path_derivative: pd,
        }
    }
}

/// Checks ε, T_refl, τ, T_path (the arguments `args`) in that order.
fn check_scene<T: Real>(args: [Arg; 4], e: T, tr: T, tau: T, tp: T) -> Result<(T, T, T, T)> {
    let [ae, atr, atau, atp] = args;
    let e = unit_interval(e, ae)?;
    let tr = non_negative(tr, atr)?;
    let tau = unit_interval(tau, atau)?;
    let tp = non_negative(tp, atp)?;
    Ok((e, tr, tau, tp))
}

/// L(T) and, when `derivative`, L′(T), for T ≥ 0 (0 and 0 at T = 0).
fn quantity_at<T: Real, Q: Quantity<T>>(q: &Q, t: T, arg: Arg, derivative: bool) -> Result<(T, T)> {
    if t == T::zero() {
        return Ok((T::zero(), T::zero()));
    }
    if derivative {
        q.radiance_and_derivative(t).map_err(at(arg))
    } else {
        Ok((q.radiance(t).map_err(at(arg))?, T::zero()))
    }
}

/// Checks the scene and evaluates its surroundings and path. Without `derivative` (the value
/// only), a term of weight exactly 0 is not evaluated.
fn scene<T: Real, Q: Quantity<T>>(
    q: &Q,
    e: T,
    tr: T,
    tau: T,
    tp: T,
    derivative: bool,
) -> Result<Scene<T>> {
    let [_, a_tr, _, a_tp] = Q::ARGS.scene;
    let (e, tr, tau, tp) = check_scene(Q::ARGS.scene, e, tr, tau, tp)?;
    if derivative {
        if let Some([(reflected, reflected_derivative), (path, path_derivative)]) =
            q.radiance_and_derivative_pair(tr, tp)
        {
            return Ok(Scene {
                emissivity: e,
                transmittance: tau,
                reflected,
                path,
                reflected_derivative,
                path_derivative,
            });
        }
    }
    let (reflected, reflected_derivative) = if derivative || e < T::one() {
        quantity_at(q, tr, a_tr, derivative)?
    } else {
        (T::zero(), T::zero())
    };
    let (path, path_derivative) = if derivative || tau < T::one() {
        quantity_at(q, tp, a_tp, derivative)?
    } else {
        (T::zero(), T::zero())
    };
    Ok(Scene {
        emissivity: e,
        transmittance: tau,
        reflected,
        path,
        reflected_derivative,
        path_derivative,
    })
}

/// L_meas of an object of radiance `l` in the scene.
#[inline(always)]
fn forward<T: Real>(s: &Scene<T>, l: T) -> T {
    let (e, tau) = (s.emissivity, s.transmittance);
    tau * (e * l + (T::one() - e) * s.reflected) + (T::one() - tau) * s.path
}

/// The corrected object radiance L_obj of a signal (may be ≤ 0 or not finite).
#[inline(always)]
fn corrected<T: Real>(s: &Scene<T>, signal: T) -> T {
    let (e, tau) = (s.emissivity, s.transmittance);
    let a = signal - (T::one() - tau) * s.path;
    (a / tau - (T::one() - e) * s.reflected) / e
}

/// (T_obj, L_obj) of a finite signal.
fn solve<T: Real, Q: Quantity<T>>(q: &Q, s: &Scene<T>, signal: T) -> Result<(T, T)> {
    let arg = Q::ARGS.signal;
    let l = corrected(s, signal);
    if !(l > T::zero()) || !l.is_finite() {
        return Err(Error::OutOfDomain(arg));
    }
    let t = q.temperature(l).map_err(at(arg))?;
    Ok((t, l))
}

/// The object temperature of a signal with its coefficients and u_c (`u` in the order signal,
/// ε, T_refl, τ, T_path, already checked).
fn solve_with_uncertainty<T: Real, Q: Quantity<T>>(
    q: &Q,
    s: &Scene<T>,
    signal: T,
    u: [T; SENSITIVITY_CAPACITY],
) -> Result<TemperatureUncertainty<T>> {
    let arg = Q::ARGS.signal;
    let l = corrected(s, signal);
    if !(l > T::zero()) || !l.is_finite() {
        return Err(Error::OutOfDomain(arg));
    }
    let (t, dt) = q.temperature_and_derivative(l).map_err(at(arg))?;
    let dt = dt.map_err(at(arg))?;
    let (e, tau) = (s.emissivity, s.transmittance);
    let d = tau * e * dt;
    if !(d >= T::min_positive_value()) {
        return Err(Error::OutOfDomain(arg));
    }
    let inv = T::one() / d;
    let c = [
        inv,
        -(tau * (l - s.reflected)) * inv,
        -(tau * (T::one() - e) * s.reflected_derivative) * inv,
        -((e * l + (T::one() - e) * s.reflected) - s.path) * inv,
        -((T::one() - tau) * s.path_derivative) * inv,
    ];
    TemperatureUncertainty::from_parts(t, c, u, 5, arg)
}

/// Checks the five standard uncertainties (the arguments `args`).
fn check_uncertainties<T: Real>(args: [Arg; 5], u: [T; 5]) -> Result<[T; 5]> {
    let mut out = [T::zero(); 5];
    for ((o, x), a) in out.iter_mut().zip(u).zip(args) {
        *o = non_negative(x, a)?;
    }
    Ok(out)
}

fn measured<T: Real, Q: Quantity<T>>(q: Result<Q>, t: T, e: T, tr: T, tau: T, tp: T) -> Result<T> {
    let q = q?;
    let arg = Q::ARGS.object_temperature;
    let t = positive(t, arg)?;
    let s = scene(&q, e, tr, tau, tp, false)?;
    let l = q.radiance(t).map_err(at(arg))?;
    finite_result(forward(&s, l), arg)
}

fn object<T: Real, Q: Quantity<T>>(
    q: Result<Q>,
    signal: T,
    e: T,
    tr: T,
    tau: T,
    tp: T,
) -> Result<T> {
    let q = q?;
    let signal = finite(signal, Q::ARGS.signal)?;
    let s = scene(&q, e, tr, tau, tp, false)?;
    Ok(solve(&q, &s, signal)?.0)
}

#[allow(clippy::too_many_arguments)]
fn object_with_uncertainty<T: Real, Q: Quantity<T>>(
    q: Result<Q>,
    signal: T,
    e: T,
    tr: T,
    tau: T,
    tp: T,
    u: [T; 5],
) -> Result<TemperatureUncertainty<T>> {
    let q = q?;
    let signal = finite(signal, Q::ARGS.signal)?;
    let s = scene(&q, e, tr, tau, tp, true)?;
    let u = check_uncertainties(Q::ARGS.uncertainties, u)?;
    solve_with_uncertainty(&q, &s, signal, u)
}

// ---------------------------------------------------------------------------------------------
// Public scalar functions
// ---------------------------------------------------------------------------------------------

/// Measured spectral radiance at one wavelength of a scene (the forward measurement equation):
/// L_meas = τ[ε B_λ(T_obj) + (1 − ε) B_λ(T_refl)] + (1 − τ) B_λ(T_path).
///
/// * `wavelength_m`: λ in m, finite and > 0.
/// * `object_temperature_k`: T_obj in K, finite and > 0.
/// * `emissivity`: ε of the surface, finite, 0 < ε ≤ 1.
/// * `reflected_temperature_k`: T_refl of the reflected surroundings in K, finite and ≥ 0.
/// * `transmittance`: τ of the path, finite, 0 < τ ≤ 1.
/// * `path_temperature_k`: T_path in K, finite and ≥ 0.
///
/// Returns W m⁻² sr⁻¹ m⁻¹, ≥ 0. Errors: `NonFinite(i)`; `NonPositive(0|1|2|4)`;
/// `Negative(3|5)`; `OutOfDomain(2|4)` for ε or τ above 1; `OutOfDomain(i)` when a radiance
/// overflows. Domain and conventions: module documentation.
///
/// Accuracy: within 1e-14 relative (`f64`) against mpmath (a sum of non-negative terms, each
/// within 4 ulp). Reference: the measurement equation of radiation thermometry (module docs).
pub fn measured_spectral_radiance_wavelength<T: Real>(
    wavelength_m: T,
    object_temperature_k: T,
    emissivity: T,
    reflected_temperature_k: T,
    transmittance: T,
    path_temperature_k: T,
) -> Result<T> {
    measured(
        wavelength(wavelength_m),
        object_temperature_k,
        emissivity,
        reflected_temperature_k,
        transmittance,
        path_temperature_k,
    )
}

/// Measured spectral radiance at one frequency of a scene:
/// L_meas = τ[ε B_ν(T_obj) + (1 − ε) B_ν(T_refl)] + (1 − τ) B_ν(T_path).
///
/// * `frequency_hz`: ν in Hz, finite and > 0.
/// * the scene arguments as [`measured_spectral_radiance_wavelength`].
///
/// Returns W m⁻² sr⁻¹ Hz⁻¹, ≥ 0. Errors as [`measured_spectral_radiance_wavelength`].
/// Accuracy: within 1e-14 relative (`f64`) against mpmath.
pub fn measured_spectral_radiance_frequency<T: Real>(
    frequency_hz: T,
    object_temperature_k: T,
    emissivity: T,
    reflected_temperature_k: T,
    transmittance: T,
    path_temperature_k: T,
) -> Result<T> {
    measured(
        frequency(frequency_hz),
        object_temperature_k,
        emissivity,
        reflected_temperature_k,
        transmittance,
        path_temperature_k,
    )
}

/// Measured band radiance between two wavelengths of a scene: the measurement equation with
/// L = [`band_radiance_wavelength`].
///
/// * `lower_m`, `upper_m`: band edges in m, 0 ≤ λ₁ < λ₂ ≤ +∞.
/// * `object_temperature_k` (argument 2), `emissivity`, `reflected_temperature_k`,
///   `transmittance`, `path_temperature_k` (arguments 3 to 6): as
///   [`measured_spectral_radiance_wavelength`].
///
/// Returns W m⁻² sr⁻¹. Errors: those of [`band_radiance_wavelength`] for the band; the scene
/// errors of [`measured_spectral_radiance_wavelength`] at positions 2 to 6.
/// Accuracy: within 1e-14 relative (`f64`) against mpmath quadrature.
pub fn measured_band_radiance_wavelength<T: Real>(
    lower_m: T,
    upper_m: T,
    object_temperature_k: T,
    emissivity: T,
    reflected_temperature_k: T,
    transmittance: T,
    path_temperature_k: T,
) -> Result<T> {
    measured(
        band(lower_m, upper_m),
        object_temperature_k,
        emissivity,
        reflected_temperature_k,
        transmittance,
        path_temperature_k,
    )
}

/// Measured response-weighted radiance of a scene: the measurement equation with
/// L = [`response_weighted_radiance`] (the response table linear between its points).
///
/// * `wavelengths_m`, `response`: the response table, as [`response_weighted_radiance`].
/// * `object_temperature_k` (argument 2) and the scene (arguments 3 to 6): as
///   [`measured_spectral_radiance_wavelength`].
///
/// Returns W m⁻² sr⁻¹ (times the unit of the response). Errors: those of
/// [`response_weighted_radiance`] for the table; the scene errors at positions 2 to 6.
/// Accuracy: within 1e-13 relative (`f64`) against mpmath quadrature.
pub fn measured_response_weighted_radiance<T: Real>(
    wavelengths_m: &[T],
    response_table: &[T],
    object_temperature_k: T,
    emissivity: T,
    reflected_temperature_k: T,
    transmittance: T,
    path_temperature_k: T,
) -> Result<T> {
    measured(
        response(wavelengths_m, response_table),
        object_temperature_k,
        emissivity,
        reflected_temperature_k,
        transmittance,
        path_temperature_k,
    )
}

/// Object temperature from the spectral radiance measured at one wavelength (the inverse
/// measurement equation): the brightness temperature of the corrected object radiance
/// L_obj = ([L_meas − (1 − τ)B_λ(T_path)]/τ − (1 − ε)B_λ(T_refl))/ε.
///
/// * `wavelength_m`: λ in m, finite and > 0.
/// * `signal`: L_meas in W m⁻² sr⁻¹ m⁻¹, finite.
/// * `emissivity`: ε, 0 < ε ≤ 1. `reflected_temperature_k`: T_refl ≥ 0 K.
/// * `transmittance`: τ, 0 < τ ≤ 1. `path_temperature_k`: T_path ≥ 0 K.
///
/// Returns T_obj in K, > 0. Errors: `NonFinite(i)`; `NonPositive(0|2|4)`; `Negative(3|5)`;
/// `OutOfDomain(2|4)` for ε or τ above 1; `OutOfDomain(1)` when L_obj ≤ 0 (the signal is at or
/// below what the surroundings and the path alone give: no object temperature exists) or
/// when no temperature can be formed; `OutOfDomain(3|5)` when a radiance of the surroundings
/// overflows.
///
/// Accuracy: within 1e-13 relative (`f64`) against mpmath for a correction condition number
/// κ ≤ 20 (module docs); ε = τ = 1 gives [`brightness_temperature_wavelength`] bit for bit.
/// Reference: the measurement equation (module docs), Planck's law solved for T.
pub fn object_temperature_wavelength<T: Real>(
    wavelength_m: T,
    signal: T,
    emissivity: T,
    reflected_temperature_k: T,
    transmittance: T,
    path_temperature_k: T,
) -> Result<T> {
    object(
        wavelength(wavelength_m),
        signal,
        emissivity,
        reflected_temperature_k,
        transmittance,
        path_temperature_k,
    )
}

/// Object temperature from the spectral radiance measured at one frequency: the brightness
/// temperature ([`brightness_temperature_frequency`]) of the corrected object radiance.
///
/// * `frequency_hz`: ν in Hz, finite and > 0.
/// * `signal`: L_meas in W m⁻² sr⁻¹ Hz⁻¹, finite; the scene as
///   [`object_temperature_wavelength`].
///
/// Returns T_obj in K. Errors as [`object_temperature_wavelength`]. Accuracy: within 1e-13
/// relative (`f64`) against mpmath for κ ≤ 20.
pub fn object_temperature_frequency<T: Real>(
    frequency_hz: T,
    signal: T,
    emissivity: T,
    reflected_temperature_k: T,
    transmittance: T,
    path_temperature_k: T,
) -> Result<T> {
    object(
        frequency(frequency_hz),
        signal,
        emissivity,
        reflected_temperature_k,
        transmittance,
        path_temperature_k,
    )
}

/// Object temperature from the band radiance measured between two wavelengths: the
/// temperature ([`temperature_from_band_radiance_wavelength`], the shared root finder) of the
/// corrected object band radiance.
///
/// * `lower_m`, `upper_m`: band edges in m, 0 ≤ λ₁ < λ₂ ≤ +∞.
/// * `signal` (argument 2): band radiance in W m⁻² sr⁻¹, finite.
/// * `emissivity`, `reflected_temperature_k`, `transmittance`, `path_temperature_k`
///   (arguments 3 to 6): as [`object_temperature_wavelength`].
///
/// Returns T_obj in K. Errors: the band errors of [`band_radiance_wavelength`]; the scene errors
/// of [`object_temperature_wavelength`] at positions 2 to 6 (`OutOfDomain(2)` for L_obj ≤ 0);
/// `NoConvergence` (seen only far outside physical arguments).
/// Accuracy: within 1e-13 relative (`f64`) against mpmath for κ ≤ 20.
pub fn object_temperature_band<T: Real>(
    lower_m: T,
    upper_m: T,
    signal: T,
    emissivity: T,
    reflected_temperature_k: T,
    transmittance: T,
    path_temperature_k: T,
) -> Result<T> {
    object(
        band(lower_m, upper_m),
        signal,
        emissivity,
        reflected_temperature_k,
        transmittance,
        path_temperature_k,
    )
}

/// Object temperature from a response-weighted signal: the temperature
/// ([`temperature_from_response_weighted_radiance`], the shared root finder) of the corrected
/// object radiance.
///
/// * `wavelengths_m`, `response_table`: the response table, as [`response_weighted_radiance`].
/// * `signal` (argument 2) and the scene (arguments 3 to 6): as [`object_temperature_band`].
///
/// Returns T_obj in K. Errors: the table errors of [`response_weighted_radiance`]; the scene
/// errors at positions 2 to 6; `OutOfDomain(2)` also when the response is zero everywhere;
/// `NoConvergence` when a quadrature cannot meet its tolerance.
/// Accuracy: within 1e-13 relative (`f64`) against mpmath for κ ≤ 20.
pub fn object_temperature_response<T: Real>(
    wavelengths_m: &[T],
    response_table: &[T],
    signal: T,
    emissivity: T,
    reflected_temperature_k: T,
    transmittance: T,
    path_temperature_k: T,
) -> Result<T> {
    object(
        response(wavelengths_m, response_table),
        signal,
        emissivity,
        reflected_temperature_k,
        transmittance,
        path_temperature_k,
    )
}

/// [`object_temperature_wavelength`] with its sensitivity coefficients and combined standard
/// uncertainty.
///
/// * `wavelength_m`, `signal`, `emissivity`, `reflected_temperature_k`, `transmittance`,
///   `path_temperature_k` (arguments 0 to 5): as [`object_temperature_wavelength`].
/// * `signal_uncertainty`, `emissivity_uncertainty`, `reflected_temperature_uncertainty_k`,
///   `transmittance_uncertainty`, `path_temperature_uncertainty_k` (arguments 6 to 10): the
///   standard uncertainties of the five inputs, finite and ≥ 0, in their units.
///
/// Returns a [`TemperatureUncertainty`]: the temperature (the bits of
/// [`object_temperature_wavelength`]), u_c in K (JCGM 100:2008 eq. 10, uncorrelated inputs),
/// `inputs` = 5 and the coefficients ∂T/∂(L_meas, ε, T_refl, τ, T_path) of the module
/// documentation, in K per W m⁻² sr⁻¹ m⁻¹, K, K/K, K, K/K. Errors: as
/// [`object_temperature_wavelength`] (where a term of weight 0 is evaluated here too, its
/// overflow is `OutOfDomain(3|5)`); `NonFinite(i)`, `Negative(i)` for i = 6…10;
/// `OutOfDomain(1)` when dB/dT at T_obj is not a positive normal number.
///
/// Accuracy: coefficients within 1e-12 relative (`f64`) against mpmath (module docs for those
/// of ε and τ), u_c within 1e-12 relative. Reference: JCGM 100:2008 eq. 10; implicit
/// differentiation of the measurement equation.
#[allow(clippy::too_many_arguments)]
pub fn object_temperature_wavelength_with_uncertainty<T: Real>(
    wavelength_m: T,
    signal: T,
    emissivity: T,
    reflected_temperature_k: T,
    transmittance: T,
    path_temperature_k: T,
    signal_uncertainty: T,
    emissivity_uncertainty: T,
    reflected_temperature_uncertainty_k: T,
    transmittance_uncertainty: T,
    path_temperature_uncertainty_k: T,
) -> Result<TemperatureUncertainty<T>> {
    object_with_uncertainty(
        wavelength(wavelength_m),
        signal,
        emissivity,
        reflected_temperature_k,
        transmittance,
        path_temperature_k,
        [
            signal_uncertainty,
            emissivity_uncertainty,
            reflected_temperature_uncertainty_k,
            transmittance_uncertainty,
            path_temperature_uncertainty_k,
        ],
    )
}

/// [`object_temperature_frequency`] with its sensitivity coefficients and combined standard
/// uncertainty; arguments, result and errors as
/// [`object_temperature_wavelength_with_uncertainty`] with the frequency ν in Hz first and the
/// signal in W m⁻² sr⁻¹ Hz⁻¹.
///
/// Accuracy: coefficients and u_c within 1e-12 relative (`f64`) against mpmath.
#[allow(clippy::too_many_arguments)]
pub fn object_temperature_frequency_with_uncertainty<T: Real>(
    frequency_hz: T,
    signal: T,
    emissivity: T,
    reflected_temperature_k: T,
    transmittance: T,
    path_temperature_k: T,
    signal_uncertainty: T,
    emissivity_uncertainty: T,
    reflected_temperature_uncertainty_k: T,
    transmittance_uncertainty: T,
    path_temperature_uncertainty_k: T,
) -> Result<TemperatureUncertainty<T>> {
    object_with_uncertainty(
        frequency(frequency_hz),
        signal,
        emissivity,
        reflected_temperature_k,
        transmittance,
        path_temperature_k,
        [
            signal_uncertainty,
            emissivity_uncertainty,
            reflected_temperature_uncertainty_k,
            transmittance_uncertainty,
            path_temperature_uncertainty_k,
        ],
    )
}

/// [`object_temperature_band`] with its sensitivity coefficients and combined standard
/// uncertainty. The band derivative is [`band_radiance_temperature_derivative_wavelength`].
///
/// * `lower_m`, `upper_m`, `signal`, the scene (arguments 0 to 6): as
///   [`object_temperature_band`].
/// * the five standard uncertainties (arguments 7 to 11), as
///   [`object_temperature_wavelength_with_uncertainty`].
///
/// Returns a [`TemperatureUncertainty`] (coefficients in K per W m⁻² sr⁻¹, K, K/K, K, K/K).
/// Errors: as [`object_temperature_band`]; `NonFinite(i)`, `Negative(i)` for i = 7…11.
/// Accuracy: coefficients and u_c within 1e-12 relative (`f64`) against mpmath quadrature.
#[allow(clippy::too_many_arguments)]
pub fn object_temperature_band_with_uncertainty<T: Real>(
    lower_m: T,
    upper_m: T,
    signal: T,
    emissivity: T,
    reflected_temperature_k: T,
    transmittance: T,
    path_temperature_k: T,
    signal_uncertainty: T,
    emissivity_uncertainty: T,
    reflected_temperature_uncertainty_k: T,
    transmittance_uncertainty: T,
    path_temperature_uncertainty_k: T,
) -> Result<TemperatureUncertainty<T>> {
    object_with_uncertainty(
        band(lower_m, upper_m),
        signal,
        emissivity,
        reflected_temperature_k,
        transmittance,
        path_temperature_k,
        [
            signal_uncertainty,
            emissivity_uncertainty,
            reflected_temperature_uncertainty_k,
            transmittance_uncertainty,
            path_temperature_uncertainty_k,
        ],
    )
}

/// [`object_temperature_response`] with its sensitivity coefficients and combined standard
/// uncertainty. The derivative is [`response_weighted_radiance_temperature_derivative`].
///
/// * `wavelengths_m`, `response_table`, `signal`, the scene (arguments 0 to 6): as
///   [`object_temperature_response`].
/// * the five standard uncertainties (arguments 7 to 11).
///
/// Returns a [`TemperatureUncertainty`]. Errors: as [`object_temperature_response`];
/// `NonFinite(i)`, `Negative(i)` for i = 7…11.
/// Accuracy: coefficients and u_c within 1e-12 relative (`f64`) against mpmath quadrature.
#[allow(clippy::too_many_arguments)]
pub fn object_temperature_response_with_uncertainty<T: Real>(
    wavelengths_m: &[T],
    response_table: &[T],
    signal: T,
    emissivity: T,
    reflected_temperature_k: T,
    transmittance: T,
    path_temperature_k: T,
    signal_uncertainty: T,
    emissivity_uncertainty: T,
    reflected_temperature_uncertainty_k: T,
    transmittance_uncertainty: T,
    path_temperature_uncertainty_k: T,
) -> Result<TemperatureUncertainty<T>> {
    object_with_uncertainty(
        response(wavelengths_m, response_table),
        signal,
        emissivity,
        reflected_temperature_k,
        transmittance,
        path_temperature_k,
        [
            signal_uncertainty,
            emissivity_uncertainty,
            reflected_temperature_uncertainty_k,
            transmittance_uncertainty,
            path_temperature_uncertainty_k,
        ],
    )
}

/// Temperature derivative of the band radiance between two wavelengths, dL/dT with
/// L = [`band_radiance_wavelength`]: dL/dT = (4L + K T⁴ (x₁ f(x₁) − x₂ f(x₂)))/T,
/// f(t) = t³/(eᵗ − 1), x = c₂/(λT) at the band edges, K = 2k⁴/(h³c²) (the derivative of
/// K T⁴ ∫ f(t) dt under the change of variables t = c₂/(λT)).
///
/// * `lower_m`, `upper_m`: band edges in m, 0 ≤ λ₁ < λ₂ ≤ +∞.
/// * `temperature_k`: K, finite and > 0.
///
/// Returns W m⁻² sr⁻¹ K⁻¹, ≥ 0. Errors as [`band_radiance_wavelength`].
/// Accuracy: within 1e-13 relative (`f64`) against mpmath quadrature of ∂B_λ/∂T over the band
/// for x at the long-wave edge ≥ 0.05 (below, 4L and the edge terms cancel as 4/x).
pub fn band_radiance_temperature_derivative_wavelength<T: Real>(
    lower_m: T,
    upper_m: T,
    temperature_k: T,
) -> Result<T> {
    let b = band(lower_m, upper_m)?;
    b.derivative(temperature_k)
}

/// Temperature derivative of the response-weighted radiance, ∫ r(λ) ∂B_λ/∂T dλ, by the shared
/// quadrature of [`radiance_temperature_derivative_wavelength`] over the table.
///
/// * `wavelengths_m`, `response_table`: the response table, as [`response_weighted_radiance`].
/// * `temperature_k`: K, finite and > 0.
///
/// Returns W m⁻² sr⁻¹ K⁻¹ (times the unit of the response), ≥ 0. Errors as
/// [`response_weighted_radiance`]. Accuracy: within 1e-13 relative (`f64`) against mpmath
/// quadrature.
pub fn response_weighted_radiance_temperature_derivative<T: Real>(
    wavelengths_m: &[T],
    response_table: &[T],
    temperature_k: T,
) -> Result<T> {
    let r = response(wavelengths_m, response_table)?;
    r.derivative(temperature_k)
}

// ---------------------------------------------------------------------------------------------
// Array forms
// ---------------------------------------------------------------------------------------------

/// A per-pixel or shared parameter: `s[i]` when `s` has one value per element, `s[0]` when it
/// has one value for all.
#[inline(always)]
fn pick<T: Real>(s: &[T], i: usize) -> T {
    if s.len() == 1 {
        s.first().copied().unwrap_or(T::nan())
    } else {
        s.get(i).copied().unwrap_or(T::nan())
    }
}

/// `Ok` when every parameter slice holds 1 or `n` values and every output `n`; otherwise the
/// outputs are NaN and the error names the first offending argument.
fn check_lengths<T: Real>(
    n: usize,
    params: &[(&[T], Arg)],
    outs: &mut [&mut [T]],
    out_args: &[Arg],
) -> ArrayResult {
    match check_params(n, params).or_else(|| check_outs(n, outs, out_args)) {
        None => Ok(()),
        Some(e) => {
            for o in outs.iter_mut() {
                o.fill(T::nan());
            }
            Err(e)
        }
    }
}

/// The parameter slices' lengths: `Some` error naming the first that holds neither 1 nor `n`
/// values.
fn check_params<T>(n: usize, params: &[(&[T], Arg)]) -> Option<ElementError> {
    params
        .iter()
        .find(|(s, _)| s.len() != 1 && s.len() != n)
        .map(|&(s, arg)| ElementError {
            index: n.min(s.len()),
            error: Error::LengthMismatch(arg),
        })
}

/// The output slices' lengths: `Some` error naming (from `args`) the first not of length `n`.
fn check_outs<T>(n: usize, outs: &[&mut [T]], args: &[Arg]) -> Option<ElementError> {
    outs.iter()
        .zip(args)
        .find(|(o, _)| o.len() != n)
        .map(|(o, &arg)| ElementError {
            index: n.min(o.len()),
            error: Error::LengthMismatch(arg),
        })
}

/// The scene of element i, reused from the previous element when its four parameters are the
/// same (always so for shared parameters).
struct SceneCache<T> {
    key: [T; 4],
    scene: Option<Result<Scene<T>>>,
}

impl<T: Real> SceneCache<T> {
    fn new() -> Self {
        Self {
            key: [T::nan(); 4],
            scene: None,
        }
    }

    fn get<Q: Quantity<T>>(&mut self, q: &Q, key: [T; 4], derivative: bool) -> Result<Scene<T>> {
        let same = self.key.iter().zip(key.iter()).all(|(a, b)| a == b);
        match (&self.scene, same) {
            (Some(s), true) => *s,
            _ => {
                let [e, tr, tau, tp] = key;
                let s = scene(q, e, tr, tau, tp, derivative);
                self.key = key;
                self.scene = Some(s);
                s
            }
        }
    }
}

/// Records the first failure.
fn note(first: &mut Option<ElementError>, index: usize, error: Error) {
    if first.is_none() {
        *first = Some(ElementError { index, error });
    }
}

/// Square roots of a block, in place, out of line: `Real::sqrt` is `libm`'s, whose x86-64 form
/// is one legacy-SSE `sqrtsd` in inline assembly; inlined into a loop compiled for AVX (the
/// SIMD dispatch of the C and Python faces) it would pay the SSE/AVX transition penalty on
/// every pixel, while a call is preceded by `vzeroupper` once per block. Correctly rounded
/// either way (IEEE 754 square root): the same bits.
#[inline(never)]
fn sqrt_lanes<T: Real>(x: &mut [T; FRAME_BLOCK]) {
    for v in x.iter_mut() {
        *v = v.sqrt();
    }
}

/// Pixels per block of the branch-free frame path.
const FRAME_BLOCK: usize = 64;

/// Lane k of a block buffer (k < [`FRAME_BLOCK`] always: the `None` arm is never taken).
#[inline(always)]
fn lane<T: Real>(b: &[T; FRAME_BLOCK], k: usize) -> T {
    b.get(k).copied().unwrap_or(T::nan())
}

/// Fills the first m lanes of `buf` with the block [start, start + m) of a per-pixel slice, or
/// every lane with the one value of a shared one.
#[inline(always)]
fn load<T: Real>(buf: &mut [T; FRAME_BLOCK], s: &[T], start: usize, m: usize) {
    if s.len() == 1 {
        buf.fill(s.first().copied().unwrap_or(T::nan()));
    } else if let (Some(src), Some(dst)) = (s.get(start..start + m), buf.get_mut(..m)) {
        dst.copy_from_slice(src);
    }
}

/// Where a frame loop stores the O results of a pixel: separate output slices, or one slice of
/// [`TemperatureUncertainty`] values.
trait FrameSink<T, const O: usize> {
    /// Checks that every output holds n pixels; otherwise fills the outputs with NaN and
    /// returns the error naming the first short or long output (among the arguments `a` of the
    /// `_with_uncertainty` frame forms: `out_temperature`, `out_uncertainty` or the budget's
    /// `out`).
    fn check(&mut self, n: usize, a: &SceneArgs) -> ArrayResult;
    /// Stores the results of pixel i (NaN everywhere for a failing pixel).
    fn put(&mut self, i: usize, v: [T; O]);
    /// Fills every output with NaN (a failure of the whole call).
    fn fail_all(&mut self);
}

impl<T: Real, const O: usize> FrameSink<T, O> for [&mut [T]; O] {
    fn check(&mut self, n: usize, a: &SceneArgs) -> ArrayResult {
        match check_outs(n, self, &a.outs_with_uncertainty) {
            None => Ok(()),
            Some(e) => {
                self.fail_all();
                Err(e)
            }
        }
    }
    #[inline(always)]
    fn put(&mut self, i: usize, v: [T; O]) {
        for (o, vi) in self.iter_mut().zip(v) {
            if let Some(slot) = o.get_mut(i) {
                *slot = vi;
            }
        }
    }
    fn fail_all(&mut self) {
        for o in self.iter_mut() {
            o.fill(T::nan());
        }
    }
}

/// The uncertainty budget of each pixel: results [T, u_c, c₁ … c₅] stored as one
/// [`TemperatureUncertainty`] (five inputs; a failing pixel is NaN with `inputs` 0).
struct Budgets<'a, T>(&'a mut [TemperatureUncertainty<T>]);

impl<T: Real> FrameSink<T, 7> for Budgets<'_, T> {
    fn check(&mut self, n: usize, a: &SceneArgs) -> ArrayResult {
        if self.0.len() == n {
            return Ok(());
        }
        self.fail_all();
        Err(ElementError {
            index: n.min(self.0.len()),
            error: Error::LengthMismatch(a.budget_out),
        })
    }
    #[inline(always)]
    fn put(&mut self, i: usize, v: [T; 7]) {
        let [t, u, c0, c1, c2, c3, c4] = v;
        if let Some(slot) = self.0.get_mut(i) {
            *slot = TemperatureUncertainty {
                temperature_k: t,
                combined_standard_uncertainty_k: u,
                sensitivity_coefficients: [c0, c1, c2, c3, c4],
                inputs: if t.is_nan() { 0 } else { 5 },
            };
        }
    }
    fn fail_all(&mut self) {
        for slot in self.0.iter_mut() {
            *slot = TemperatureUncertainty {
                temperature_k: T::nan(),
                combined_standard_uncertainty_k: T::nan(),
                sensitivity_coefficients: [T::nan(); SENSITIVITY_CAPACITY],
                inputs: 0,
            };
        }
    }
}

/// The frame loop of the one-wavelength forms: blocks of [`FRAME_BLOCK`] pixels through the
/// branch-free `fast(inputs) -> (outputs before `finish`, inside)`, which the compiler turns
/// into SIMD instructions (callers pass it as an `#[inline(always)]` closure: a closure left to
/// the inliner is called per pixel once the frame function is compiled three times by the SIMD
/// dispatch); `finish` (the square root of u_c, out of line) is applied to the block while
/// storing; a block in which any pixel left the common case is recomputed pixel by pixel by
/// `scalar(i)`, the scalar function's own path. Every output is the scalar function's result
/// bit for bit; failing pixels are NaN and the first is returned.
#[inline(always)]
fn frame_blocks<T: Real, const P: usize, const O: usize>(
    n: usize,
    inputs: [&[T]; P],
    mut outs: impl FrameSink<T, O>,
    fast: impl Fn([T; P]) -> ([T; O], bool),
    finish: impl Fn(&mut [[T; FRAME_BLOCK]; O]),
    mut scalar: impl FnMut(usize) -> Result<[T; O]>,
) -> ArrayResult {
    let mut first = None;
    let mut start = 0;
    while start < n {
        let m = (n - start).min(FRAME_BLOCK);
        let mut buf = [[T::zero(); FRAME_BLOCK]; P];
        for (b, s) in buf.iter_mut().zip(inputs.iter()) {
            load(b, s, start, m);
        }
        let mut res = [[T::zero(); FRAME_BLOCK]; O];
        let mut ins = [true; FRAME_BLOCK];
        for (k, ok) in ins.iter_mut().enumerate() {
            let x = buf.each_ref().map(|b| lane(b, k));
            let (v, inside) = fast(x);
            for (r, vi) in res.iter_mut().zip(v) {
                if let Some(slot) = r.get_mut(k) {
                    *slot = vi;
                }
            }
            *ok = inside;
        }
        let all_in = ins.iter().take(m).all(|&b| b);
        finish(&mut res);
        for k in 0..m {
            outs.put(start + k, res.each_ref().map(|r| lane(r, k)));
        }
        if !all_in {
            for i in start..start + m {
                let v = scalar(i).unwrap_or_else(|err| {
                    note(&mut first, i, err);
                    [T::nan(); O]
                });
                outs.put(i, v);
            }
        }
        start += m;
    }
    first.map_or(Ok(()), Err)
}

/// The surroundings and the path of a frame whose T_refl and T_path are shared, for the
/// branch-free path: `None` (use the element loop) when they are per pixel or when evaluating
/// them fails (the element loop then reports each pixel's error as the scalar function does).
fn shared_scene<T: Real, Q: Quantity<T>>(q: &Q, tr: &[T], tp: &[T]) -> Option<[T; 4]> {
    let (&[tr], &[tp]) = (tr, tp) else {
        return None;
    };
    let [_, a_tr, _, a_tp] = Q::ARGS.scene;
    let tr = non_negative(tr, a_tr).ok()?;
    let tp = non_negative(tp, a_tp).ok()?;
    let (r, rd) = quantity_at(q, tr, a_tr, true).ok()?;
    let (p, pd) = quantity_at(q, tp, a_tp, true).ok()?;
    Some([r, rd, p, pd])
}

/// Whether ε or τ is in (0, 1] (false for NaN).
#[inline(always)]
fn is_fraction<T: Real>(x: T) -> bool {
    (x > T::zero()) & (x <= T::one())
}

/// The object temperature of one pixel as straight-line code: T and whether the pixel is
/// inside the common case, where T is the bits of [`solve`] through
/// [`brightness_temperature_wavelength`].
#[inline(always)]
fn object_fast<T: Real>(k: &FrameConstants<T>, sc: &Scene<T>, signal: T) -> (T, T, bool) {
    let l = corrected(sc, signal);
    let (t, ok) = brightness_temperature_wavelength_fast(k.c2_over_l, k.a, l);
    let valid = (signal.abs() <= T::max_value())
        & is_fraction(sc.emissivity)
        & is_fraction(sc.transmittance)
        & (l >= T::min_positive_value())
        & (l <= T::max_value());
    (t, l, ok & valid)
}

/// T_obj, the sum of squares of u_c and the five sensitivity coefficients of one pixel as
/// straight-line code (the operations of [`solve_with_uncertainty`], whose result is T, the
/// square root of the sum and the coefficients), and whether the pixel is inside the common
/// case.
#[inline(always)]
fn object_uncertainty_fast<T: Real>(
    k: &FrameConstants<T>,
    sc: &Scene<T>,
    signal: T,
    u: [T; 5],
) -> (T, T, [T; 5], bool) {
    let (t, l, ok_t) = object_fast(k, sc, signal);
    let (e, tau) = (sc.emissivity, sc.transmittance);
    let dt = derivative_at_brightness(k.c2_over_l, k.inv_a, t, l);
    let ok_d = (dt >= T::min_positive_value()) & (dt <= T::max_value());
    let d = tau * e * dt;
    let inv = T::one() / d;
    let c = [
        inv,
        -(tau * (l - sc.reflected)) * inv,
        -(tau * (T::one() - e) * sc.reflected_derivative) * inv,
        -((e * l + (T::one() - e) * sc.reflected) - sc.path) * inv,
        -((T::one() - tau) * sc.path_derivative) * inv,
    ];
    let mut ss = T::zero();
    let mut ok_c = true;
    for (&ci, &ui) in c.iter().zip(u.iter()) {
        let y = ci * ui;
        ss = ss + y * y;
        ok_c &= (ci.abs() <= T::max_value()) & (ui >= T::zero()) & (ui <= T::max_value());
    }
    let inside = ok_t & ok_d & (d >= T::min_positive_value()) & ok_c & sum_of_squares_is_safe(ss);
    (t, ss, c, inside)
}

#[allow(clippy::too_many_arguments)]
#[inline(always)]
fn object_array<T: Real, Q: Quantity<T>>(
    q: Result<Q>,
    signals: &[T],
    e: &[T],
    tr: &[T],
    tau: &[T],
    tp: &[T],
    out: &mut [T],
) -> ArrayResult {
    let a = Q::ARGS;
    let [ae, atr, atau, atp] = a.scene;
    let n = signals.len();
    check_lengths(
        n,
        &[(e, ae), (tr, atr), (tau, atau), (tp, atp)],
        &mut [out],
        &[a.out],
    )?;
    let q = match q {
        Ok(q) => q,
        Err(err) => {
            out.fill(T::nan());
            return if n == 0 {
                Ok(())
            } else {
                Err(ElementError {
                    index: 0,
                    error: err,
                })
            };
        }
    };
    let mut cache = SceneCache::new();
    let mut element = |i: usize| -> Result<[T; 1]> {
        let s = signals.get(i).copied().unwrap_or(T::nan());
        let key = [pick(e, i), pick(tr, i), pick(tau, i), pick(tp, i)];
        let s = finite(s, a.signal)?;
        let sc = cache.get(&q, key, false)?;
        Ok([solve(&q, &sc, s)?.0])
    };
    if let (Some(k), Some(shared)) = (q.frame_constants(), shared_scene(&q, tr, tp)) {
        return frame_blocks(
            n,
            [signals, e, tau],
            [out],
            #[inline(always)]
            |[s, e, tau]: [T; 3]| {
                let sc = Scene::shared(e, tau, shared);
                let (t, _, inside) = object_fast(&k, &sc, s);
                ([t], inside)
            },
            |_| {},
            element,
        );
    }
    let mut first = None;
    for (i, o) in out.iter_mut().enumerate() {
        match element(i) {
            Ok([t]) => *o = t,
            Err(err) => {
                *o = T::nan();
                note(&mut first, i, err);
            }
        }
    }
    first.map_or(Ok(()), Err)
}

/// The frame loop of the `_with_uncertainty` forms: `shape(T, u_c or its square, c)` gives
/// the O results a pixel stores in `outs` (u_c's square is replaced by its root while storing
/// on the branch-free path; the element loop passes u_c itself).
#[inline(always)]
fn object_uncertainty_array<T: Real, Q: Quantity<T>, const O: usize>(
    q: Result<Q>,
    signals: &[T],
    scene_params: [&[T]; 4],
    u: [&[T]; 5],
    mut outs: impl FrameSink<T, O>,
    shape: impl Fn(T, T, [T; 5]) -> [T; O] + Copy,
) -> ArrayResult {
    let a = Q::ARGS;
    let [ae, atr, atau, atp] = a.scene;
    let [au0, au1, au2, au3, au4] = a.uncertainties;
    let n = signals.len();
    let [e, tr, tau, tp] = scene_params;
    let [u0, u1, u2, u3, u4] = u;
    let params = [
        (e, ae),
        (tr, atr),
        (tau, atau),
        (tp, atp),
        (u0, au0),
        (u1, au1),
        (u2, au2),
        (u3, au3),
        (u4, au4),
    ];
    if let Some(err) = check_params(n, &params) {
        outs.fail_all();
        return Err(err);
    }
    outs.check(n, &a)?;
    let q = match q {
        Ok(q) => q,
        Err(err) => {
            outs.fail_all();
            return if n == 0 {
                Ok(())
            } else {
                Err(ElementError {
                    index: 0,
                    error: err,
                })
            };
        }
    };
    let mut cache = SceneCache::new();
    let mut element = |i: usize| -> Result<[T; O]> {
        let s = signals.get(i).copied().unwrap_or(T::nan());
        let key = [pick(e, i), pick(tr, i), pick(tau, i), pick(tp, i)];
        let us = [
            pick(u0, i),
            pick(u1, i),
            pick(u2, i),
            pick(u3, i),
            pick(u4, i),
        ];
        let s = finite(s, a.signal)?;
        let sc = cache.get(&q, key, true)?;
        let us = check_uncertainties(a.uncertainties, us)?;
        let v = solve_with_uncertainty(&q, &sc, s, us)?;
        Ok(shape(
            v.temperature_k,
            v.combined_standard_uncertainty_k,
            v.sensitivity_coefficients,
        ))
    };
    if let (Some(k), Some(shared)) = (q.frame_constants(), shared_scene(&q, tr, tp)) {
        return frame_blocks(
            n,
            [signals, e, tau, u0, u1, u2, u3, u4],
            outs,
            #[inline(always)]
            |[s, e, tau, v0, v1, v2, v3, v4]: [T; 8]| {
                let sc = Scene::shared(e, tau, shared);
                let (t, ss, c, inside) = object_uncertainty_fast(&k, &sc, s, [v0, v1, v2, v3, v4]);
                (shape(t, ss, c), inside)
            },
            |res| {
                if let Some(ss) = res.get_mut(1) {
                    sqrt_lanes(ss);
                }
            },
            element,
        );
    }
    let mut first = None;
    for i in 0..n {
        match element(i) {
            Ok(v) => outs.put(i, v),
            Err(err) => {
                outs.put(i, [T::nan(); O]);
                note(&mut first, i, err);
            }
        }
    }
    first.map_or(Ok(()), Err)
}

/// (T, u_c) of a pixel: the results of the `_with_uncertainty_array` forms.
#[inline(always)]
fn temperature_and_uncertainty<T>(t: T, u: T, _c: [T; 5]) -> [T; 2] {
    [t, u]
}

/// (T, u_c, c₁ … c₅) of a pixel: the results of the `_budget_array` forms.
#[inline(always)]
fn budget<T>(t: T, u: T, c: [T; 5]) -> [T; 7] {
    let [c0, c1, c2, c3, c4] = c;
    [t, u, c0, c1, c2, c3, c4]
}

/// [`object_temperature_wavelength`] over a frame of signals (an image), with per-pixel or
/// shared scene parameters: `out[i] = object_temperature_wavelength(wavelength_m, signals[i],
/// ε, T_refl, τ, T_path)` bit for bit, each parameter taken from its slice at i when the slice
/// has one value per signal, or from its only value when it has one.
///
/// * `wavelength_m`: λ in m (argument 0), finite and > 0 (when it is not, every element fails).
/// * `signals`: L_meas in W m⁻² sr⁻¹ m⁻¹ (argument 1), any length n.
/// * `emissivity`, `reflected_temperature_k`, `transmittance`, `path_temperature_k`
///   (arguments 2 to 5): slices of length n (per pixel) or 1 (shared), domains as the scalar
///   function.
/// * `out`: T_obj in K (argument 6), length n.
///
/// Returns `Ok(())` when every element succeeded; otherwise the failing elements are NaN, the
/// others computed, and the error names the first failing index and the scalar function's
/// error. `LengthMismatch(i)` when a parameter slice has neither 1 nor n values or `out` is
/// not of length n (then `out` is all NaN).
///
/// Accuracy: that of [`object_temperature_wavelength`]. Method: when T_refl and T_path are
/// shared (one value each), their radiances are computed once and the pixels go in blocks of
/// 64 through a branch-free form of the scalar function's operations (the logarithm of
/// [`crate::math::log`]), which the compiler vectorises; a block holding a pixel outside the
/// common case (bad input, no temperature, a value that is not a normal number) is recomputed
/// by the scalar function. Otherwise an element loop that reuses the radiances of the
/// surroundings and the path while per-pixel parameters repeat.
#[inline(always)]
pub fn object_temperature_wavelength_array<T: Real>(
    wavelength_m: T,
    signals: &[T],
    emissivity: &[T],
    reflected_temperature_k: &[T],
    transmittance: &[T],
    path_temperature_k: &[T],
    out: &mut [T],
) -> ArrayResult {
    object_array(
        wavelength(wavelength_m),
        signals,
        emissivity,
        reflected_temperature_k,
        transmittance,
        path_temperature_k,
        out,
    )
}

/// [`object_temperature_frequency`] over a frame of signals; arguments, result and errors as
/// [`object_temperature_wavelength_array`] with the frequency ν in Hz (argument 0) and signals
/// in W m⁻² sr⁻¹ Hz⁻¹. Accuracy: that of [`object_temperature_frequency`], bit for bit.
pub fn object_temperature_frequency_array<T: Real>(
    frequency_hz: T,
    signals: &[T],
    emissivity: &[T],
    reflected_temperature_k: &[T],
    transmittance: &[T],
    path_temperature_k: &[T],
    out: &mut [T],
) -> ArrayResult {
    object_array(
        frequency(frequency_hz),
        signals,
        emissivity,
        reflected_temperature_k,
        transmittance,
        path_temperature_k,
        out,
    )
}

/// [`object_temperature_band`] over a frame of signals (a thermal camera with a band filter):
/// arguments as [`object_temperature_wavelength_array`] with the band edges `lower_m`,
/// `upper_m` first (arguments 0, 1), the signals (band radiance, W m⁻² sr⁻¹) argument 2, the
/// scene slices arguments 3 to 6 and `out` argument 7. Each element costs one root finding.
/// Accuracy: that of [`object_temperature_band`], bit for bit.
#[allow(clippy::too_many_arguments)]
pub fn object_temperature_band_array<T: Real>(
    lower_m: T,
    upper_m: T,
    signals: &[T],
    emissivity: &[T],
    reflected_temperature_k: &[T],
    transmittance: &[T],
    path_temperature_k: &[T],
    out: &mut [T],
) -> ArrayResult {
    object_array(
        band(lower_m, upper_m),
        signals,
        emissivity,
        reflected_temperature_k,
        transmittance,
        path_temperature_k,
        out,
    )
}

/// [`object_temperature_wavelength_with_uncertainty`] over a frame of signals: the object
/// temperature and its combined standard uncertainty per pixel, bit for bit those of the
/// scalar function.
///
/// * `wavelength_m` (argument 0), `signals` (1), `emissivity`, `reflected_temperature_k`,
///   `transmittance`, `path_temperature_k` (2 to 5): as [`object_temperature_wavelength_array`].
/// * `signal_uncertainty`, `emissivity_uncertainty`, `reflected_temperature_uncertainty_k`,
///   `transmittance_uncertainty`, `path_temperature_uncertainty_k` (6 to 10): standard
///   uncertainties, slices of length n or 1, finite and ≥ 0.
/// * `out_temperature` (11): T_obj in K; `out_uncertainty` (12): u_c in K; both of length n.
///
/// Returns and errors as [`object_temperature_wavelength_array`] (a failing element is NaN in
/// both outputs). Accuracy: that of the scalar function. Method: as
/// [`object_temperature_wavelength_array`] (blocks of 64 through a branch-free form when T_refl
/// and T_path are shared, the square root of u_c taken while storing); per pixel one
/// brightness temperature and one dB/dT.
#[allow(clippy::too_many_arguments)]
#[inline(always)]
pub fn object_temperature_wavelength_with_uncertainty_array<T: Real>(
    wavelength_m: T,
    signals: &[T],
    emissivity: &[T],
    reflected_temperature_k: &[T],
    transmittance: &[T],
    path_temperature_k: &[T],
    signal_uncertainty: &[T],
    emissivity_uncertainty: &[T],
    reflected_temperature_uncertainty_k: &[T],
    transmittance_uncertainty: &[T],
    path_temperature_uncertainty_k: &[T],
    out_temperature: &mut [T],
    out_uncertainty: &mut [T],
) -> ArrayResult {
    object_uncertainty_array(
        wavelength(wavelength_m),
        signals,
        [
            emissivity,
            reflected_temperature_k,
            transmittance,
            path_temperature_k,
        ],
        [
            signal_uncertainty,
            emissivity_uncertainty,
            reflected_temperature_uncertainty_k,
            transmittance_uncertainty,
            path_temperature_uncertainty_k,
        ],
        [out_temperature, out_uncertainty],
        temperature_and_uncertainty,
    )
}

/// [`object_temperature_frequency_with_uncertainty`] over a frame of signals; arguments,
/// result and errors as [`object_temperature_wavelength_with_uncertainty_array`] with the
/// frequency ν in Hz first. Accuracy: that of the scalar function, bit for bit.
#[allow(clippy::too_many_arguments)]
pub fn object_temperature_frequency_with_uncertainty_array<T: Real>(
    frequency_hz: T,
    signals: &[T],
    emissivity: &[T],
    reflected_temperature_k: &[T],
    transmittance: &[T],
    path_temperature_k: &[T],
    signal_uncertainty: &[T],
    emissivity_uncertainty: &[T],
    reflected_temperature_uncertainty_k: &[T],
    transmittance_uncertainty: &[T],
    path_temperature_uncertainty_k: &[T],
    out_temperature: &mut [T],
    out_uncertainty: &mut [T],
) -> ArrayResult {
    object_uncertainty_array(
        frequency(frequency_hz),
        signals,
        [
            emissivity,
            reflected_temperature_k,
            transmittance,
            path_temperature_k,
        ],
        [
            signal_uncertainty,
            emissivity_uncertainty,
            reflected_temperature_uncertainty_k,
            transmittance_uncertainty,
            path_temperature_uncertainty_k,
        ],
        [out_temperature, out_uncertainty],
        temperature_and_uncertainty,
    )
}

/// [`object_temperature_band_with_uncertainty`] over a frame of signals; arguments as
/// [`object_temperature_wavelength_with_uncertainty_array`] with the band edges first
/// (arguments 0, 1), the signals argument 2, the scene 3 to 6, the uncertainties 7 to 11 and
/// the outputs 12 and 13. Accuracy: that of the scalar function, bit for bit.
#[allow(clippy::too_many_arguments)]
pub fn object_temperature_band_with_uncertainty_array<T: Real>(
    lower_m: T,
    upper_m: T,
    signals: &[T],
    emissivity: &[T],
    reflected_temperature_k: &[T],
    transmittance: &[T],
    path_temperature_k: &[T],
    signal_uncertainty: &[T],
    emissivity_uncertainty: &[T],
    reflected_temperature_uncertainty_k: &[T],
    transmittance_uncertainty: &[T],
    path_temperature_uncertainty_k: &[T],
    out_temperature: &mut [T],
    out_uncertainty: &mut [T],
) -> ArrayResult {
    object_uncertainty_array(
        band(lower_m, upper_m),
        signals,
        [
            emissivity,
            reflected_temperature_k,
            transmittance,
            path_temperature_k,
        ],
        [
            signal_uncertainty,
            emissivity_uncertainty,
            reflected_temperature_uncertainty_k,
            transmittance_uncertainty,
            path_temperature_uncertainty_k,
        ],
        [out_temperature, out_uncertainty],
        temperature_and_uncertainty,
    )
}

/// [`object_temperature_wavelength_with_uncertainty`] over a frame of signals (an image), with
/// the whole uncertainty budget of each pixel: `out[i]` is the [`TemperatureUncertainty`] of
/// the scalar function for pixel i (T_obj, u_c and the five sensitivity coefficients ∂T/∂L_meas,
/// ∂T/∂ε, ∂T/∂T_refl, ∂T/∂τ, ∂T/∂T_path), bit for bit.
///
/// * `wavelength_m` (argument 0), `signals` (1), `emissivity`, `reflected_temperature_k`,
///   `transmittance`, `path_temperature_k` (2 to 5), the five standard uncertainties (6 to 10):
///   as [`object_temperature_wavelength_with_uncertainty_array`], each parameter a slice of
///   length n (per pixel) or 1 (shared).
/// * `out` (11): n values.
///
/// Returns `Ok(())` when every pixel succeeded; otherwise each failing pixel holds NaN in every
/// real field and `inputs` 0, the others are computed, and the error names the first failing
/// index and the scalar function's error. `LengthMismatch(i)` when a parameter slice has
/// neither 1 nor n values or `out` is not of length n (then every `out` value is the failed
/// one). Allocates nothing.
///
/// Accuracy: that of [`object_temperature_wavelength_with_uncertainty`] (the same bits).
/// Method: as [`object_temperature_wavelength_with_uncertainty_array`]; the coefficients are
/// the intermediate values of the same straight-line code.
#[allow(clippy::too_many_arguments)]
#[inline(always)]
pub fn object_temperature_wavelength_budget_array<T: Real>(
    wavelength_m: T,
    signals: &[T],
    emissivity: &[T],
    reflected_temperature_k: &[T],
    transmittance: &[T],
    path_temperature_k: &[T],
    signal_uncertainty: &[T],
    emissivity_uncertainty: &[T],
    reflected_temperature_uncertainty_k: &[T],
    transmittance_uncertainty: &[T],
    path_temperature_uncertainty_k: &[T],
    out: &mut [TemperatureUncertainty<T>],
) -> ArrayResult {
    object_uncertainty_array(
        wavelength(wavelength_m),
        signals,
        [
            emissivity,
            reflected_temperature_k,
            transmittance,
            path_temperature_k,
        ],
        [
            signal_uncertainty,
            emissivity_uncertainty,
            reflected_temperature_uncertainty_k,
            transmittance_uncertainty,
            path_temperature_uncertainty_k,
        ],
        Budgets(out),
        budget,
    )
}

/// [`object_temperature_frequency_with_uncertainty`] over a frame of signals with the whole
/// uncertainty budget of each pixel; arguments, result and errors as
/// [`object_temperature_wavelength_budget_array`] with the frequency ν in Hz first. Accuracy:
/// that of the scalar function, bit for bit. Method: an element loop that reuses the radiances
/// of the surroundings and the path while the parameters repeat.
#[allow(clippy::too_many_arguments)]
pub fn object_temperature_frequency_budget_array<T: Real>(
    frequency_hz: T,
    signals: &[T],
    emissivity: &[T],
    reflected_temperature_k: &[T],
    transmittance: &[T],
    path_temperature_k: &[T],
    signal_uncertainty: &[T],
    emissivity_uncertainty: &[T],
    reflected_temperature_uncertainty_k: &[T],
    transmittance_uncertainty: &[T],
    path_temperature_uncertainty_k: &[T],
    out: &mut [TemperatureUncertainty<T>],
) -> ArrayResult {
    object_uncertainty_array(
        frequency(frequency_hz),
        signals,
        [
            emissivity,
            reflected_temperature_k,
            transmittance,
            path_temperature_k,
        ],
        [
            signal_uncertainty,
            emissivity_uncertainty,
            reflected_temperature_uncertainty_k,
            transmittance_uncertainty,
            path_temperature_uncertainty_k,
        ],
        Budgets(out),
        budget,
    )
}

/// [`object_temperature_band_with_uncertainty`] over a frame of signals with the whole
/// uncertainty budget of each pixel; arguments as [`object_temperature_wavelength_budget_array`]
/// with the band edges first (arguments 0, 1), the signals argument 2, the scene 3 to 6, the
/// uncertainties 7 to 11 and `out` 12. Accuracy: that of the scalar function, bit for bit.
/// Method: an element loop that reuses the band radiances of the surroundings and the path
/// while the parameters repeat.
#[allow(clippy::too_many_arguments)]
pub fn object_temperature_band_budget_array<T: Real>(
    lower_m: T,
    upper_m: T,
    signals: &[T],
    emissivity: &[T],
    reflected_temperature_k: &[T],
    transmittance: &[T],
    path_temperature_k: &[T],
    signal_uncertainty: &[T],
    emissivity_uncertainty: &[T],
    reflected_temperature_uncertainty_k: &[T],
    transmittance_uncertainty: &[T],
    path_temperature_uncertainty_k: &[T],
    out: &mut [TemperatureUncertainty<T>],
) -> ArrayResult {
    object_uncertainty_array(
        band(lower_m, upper_m),
        signals,
        [
            emissivity,
            reflected_temperature_k,
            transmittance,
            path_temperature_k,
        ],
        [
            signal_uncertainty,
            emissivity_uncertainty,
            reflected_temperature_uncertainty_k,
            transmittance_uncertainty,
            path_temperature_uncertainty_k,
        ],
        Budgets(out),
        budget,
    )
}
