//! Property tests of the radiation-thermometry functions.
//!
//! Part 1, robustness: the measurement-equation functions, in `f64` and `f32`, with arbitrary
//! inputs (NaN, ±∞, ±0, subnormals, the largest floats, raw bit patterns, every scale) return
//! `Ok` with finite values (every field of a `TemperatureUncertainty`) or an `Err` naming an
//! existing argument; never a panic, never `Ok` for a NaN input.
//!
//! Part 2, properties of the model over random physical scenes, each with its source:
//! * exact reductions of the equation (its algebra): ε = τ = 1 is the brightness temperature bit
//!   for bit; τ = 1 makes the result independent of T_path; T_refl = T_obj makes the emissivity
//!   coefficient vanish (to the rounding of the signal);
//! * round trip forward → inverse within the conditioning of the correction (module docs);
//! * the implicit-differentiation coefficients against central differences of the inverse (a
//!   test-only check; the library uses no finite differences), loose tolerance from the step;
//! * the array forms give the scalar functions' bits, per-pixel and shared, and report the first
//!   failing element;
//! * eq. 13 with the identity matrix is eq. 10; with full correlation it is |Σ cᵢuᵢ|
//!   (JCGM 100:2008 §5.2.2 note 1).

mod proptest_support;

use proptest::prelude::*;
use proptest_support::{any32, any64, cases, close, contract, log_uniform, ok, wide};
use relicore::blackbody::{self as bb, TemperatureUncertainty};
use relicore::{Error, Real, Result};

/// The contract for a struct result: every field finite on `Ok`.
fn contract_u<T: Real>(
    what: &str,
    inputs: &[f64],
    nargs: usize,
    r: Result<TemperatureUncertainty<T>>,
) -> std::result::Result<(), TestCaseError> {
    if let Ok(v) = &r {
        prop_assert!(
            v.inputs >= 1 && v.inputs <= 5,
            "{what}: inputs {}",
            v.inputs
        );
        for c in v.sensitivity_coefficients {
            prop_assert!(c.is_finite(), "{what}{inputs:?}: coefficient {c:?}");
        }
        prop_assert!(
            v.combined_standard_uncertainty_k >= T::zero(),
            "{what}{inputs:?}: u_c {:?}",
            v.combined_standard_uncertainty_k
        );
        contract(what, inputs, nargs, Ok(v.combined_standard_uncertainty_k))?;
    }
    contract(what, inputs, nargs, r.map(|v| v.temperature_k))
}

/// A scene value that is often valid: special and arbitrary values, and physical ones.
fn scene64() -> impl Strategy<Value = f64> {
    prop_oneof![3 => any64(), 2 => 0.01f64..1.0, 1 => Just(1.0), 2 => 1.0f64..3000.0, 1 => Just(0.0)]
}

fn scene32() -> impl Strategy<Value = f32> {
    prop_oneof![3 => any32(), 2 => 0.01f32..1.0, 1 => Just(1.0f32), 2 => 1.0f32..3000.0, 1 => Just(0.0f32)]
}

proptest! {
    #![proptest_config(cases(1000))]

    #[test]
    fn robust_object_temperature_wavelength(a in any64(), s in any64(), e in scene64(),
            tr in scene64(), tau in scene64(), tp in scene64(),
            a32 in any32(), s32 in any32(), e32 in scene32(), tr32 in scene32(),
            tau32 in scene32(), tp32 in scene32()) {
        let i = [a, s, e, tr, tau, tp];
        contract("object_temperature_wavelength", &i, 6,
            bb::object_temperature_wavelength(a, s, e, tr, tau, tp))?;
        contract("object_temperature_frequency", &i, 6,
            bb::object_temperature_frequency(a, s, e, tr, tau, tp))?;
        contract("measured_spectral_radiance_wavelength", &i, 6,
            bb::measured_spectral_radiance_wavelength(a, s, e, tr, tau, tp))?;
        contract("measured_spectral_radiance_frequency", &i, 6,
            bb::measured_spectral_radiance_frequency(a, s, e, tr, tau, tp))?;
        let i32 = wide(&[a32, s32, e32, tr32, tau32, tp32]);
        contract("object_temperature_wavelength", &i32, 6,
            bb::object_temperature_wavelength(a32, s32, e32, tr32, tau32, tp32))?;
        contract("object_temperature_frequency", &i32, 6,
            bb::object_temperature_frequency(a32, s32, e32, tr32, tau32, tp32))?;
        contract("measured_spectral_radiance_wavelength", &i32, 6,
            bb::measured_spectral_radiance_wavelength(a32, s32, e32, tr32, tau32, tp32))?;
    }

    #[test]
    fn robust_with_uncertainty_f64(a in any64(), s in any64(), e in scene64(), tr in scene64(),
            tau in scene64(), tp in scene64(), u in prop::array::uniform5(scene64())) {
        let mut i = vec![a, s, e, tr, tau, tp];
        i.extend(u);
        contract_u("object_temperature_wavelength_with_uncertainty", &i, 11,
            bb::object_temperature_wavelength_with_uncertainty(a, s, e, tr, tau, tp,
                u[0], u[1], u[2], u[3], u[4]))?;
        contract_u("object_temperature_frequency_with_uncertainty", &i, 11,
            bb::object_temperature_frequency_with_uncertainty(a, s, e, tr, tau, tp,
                u[0], u[1], u[2], u[3], u[4]))?;
        contract_u("calibrated_temperature_with_uncertainty", &i, 11,
            bb::calibrated_temperature_with_uncertainty(a, s, e, tr, tau, tp,
                u[0], u[1], u[2], u[3], u[4]))?;
        contract_u("brightness_temperature_wavelength_with_uncertainty", &i[..3], 3,
            bb::brightness_temperature_wavelength_with_uncertainty(a, s, e))?;
        contract_u("brightness_temperature_frequency_with_uncertainty", &i[..3], 3,
            bb::brightness_temperature_frequency_with_uncertainty(a, s, e))?;
    }

    #[test]
    fn robust_with_uncertainty_f32(a in any32(), s in any32(), e in scene32(), tr in scene32(),
            tau in scene32(), tp in scene32(), u in prop::array::uniform5(scene32())) {
        let mut i = wide(&[a, s, e, tr, tau, tp]);
        i.extend(wide(&u));
        contract_u("object_temperature_wavelength_with_uncertainty", &i, 11,
            bb::object_temperature_wavelength_with_uncertainty(a, s, e, tr, tau, tp,
                u[0], u[1], u[2], u[3], u[4]))?;
        contract_u("calibrated_temperature_with_uncertainty", &i, 11,
            bb::calibrated_temperature_with_uncertainty(a, s, e, tr, tau, tp,
                u[0], u[1], u[2], u[3], u[4]))?;
        contract_u("brightness_temperature_frequency_with_uncertainty", &i[..3], 3,
            bb::brightness_temperature_frequency_with_uncertainty(a, s, e))?;
    }
}

proptest! {
    // the band and response forms run a root finder and quadratures: fewer cases
    #![proptest_config(cases(200))]

    #[test]
    fn robust_band_and_response(lo in any64(), up in any64(), s in any64(), e in scene64(),
            tr in scene64(), tau in scene64(), tp in scene64(), u in scene64(),
            lo32 in any32(), up32 in any32(), s32 in any32(), e32 in scene32()) {
        let i = [lo, up, s, e, tr, tau, tp];
        contract("object_temperature_band", &i, 7,
            bb::object_temperature_band(lo, up, s, e, tr, tau, tp))?;
        contract("measured_band_radiance_wavelength", &i, 7,
            bb::measured_band_radiance_wavelength(lo, up, s, e, tr, tau, tp))?;
        contract("band_radiance_temperature_derivative_wavelength", &i[..3], 3,
            bb::band_radiance_temperature_derivative_wavelength(lo, up, s))?;
        let mut iu = i.to_vec();
        iu.extend([u; 5]);
        contract_u("object_temperature_band_with_uncertainty", &iu, 12,
            bb::object_temperature_band_with_uncertainty(lo, up, s, e, tr, tau, tp, u, u, u, u, u))?;
        let w = [8e-6, 10e-6, 12e-6, 14e-6];
        let r = [0.0, 1.0, 0.8, 0.0];
        contract("object_temperature_response", &[0.0, 0.0, s, e, tr, tau, tp], 7,
            bb::object_temperature_response(&w, &r, s, e, tr, tau, tp))?;
        contract_u("object_temperature_response_with_uncertainty", &[0.0, 0.0, s, e, tr, tau, tp], 12,
            bb::object_temperature_response_with_uncertainty(&w, &r, s, e, tr, tau, tp, u, u, u, u, u))?;
        contract("response_weighted_radiance_temperature_derivative", &[0.0, 0.0, s], 3,
            bb::response_weighted_radiance_temperature_derivative(&w, &r, s))?;
        let i32 = wide(&[lo32, up32, s32, e32, 290.0, 0.9, 280.0]);
        contract("object_temperature_band", &i32, 7,
            bb::object_temperature_band(lo32, up32, s32, e32, 290.0, 0.9, 280.0))?;
    }

    #[test]
    fn robust_combination(c in prop::collection::vec(any64(), 0..5),
            u in prop::collection::vec(any64(), 0..5),
            r in prop::collection::vec(prop_oneof![any64(), -1.0f64..1.0, Just(1.0)], 0..26)) {
        let mut i = c.clone();
        i.extend(&u);
        contract("combined_standard_uncertainty", &i, 2,
            bb::combined_standard_uncertainty(&c, &u))?;
        i.extend(&r);
        contract("combined_standard_uncertainty_correlated", &i, 3,
            bb::combined_standard_uncertainty_correlated(&c, &u, &r))?;
    }
}

/// A physical scene: (λ, T_obj, ε, T_refl, τ, T_path).
type Scene = (f64, f64, f64, f64, f64, f64);

fn scene() -> impl Strategy<Value = Scene> {
    (
        log_uniform(-6.2, -4.7),
        log_uniform(2.3, 3.4),
        0.2f64..1.0,
        prop_oneof![Just(0.0), 200.0f64..500.0],
        0.4f64..1.0,
        prop_oneof![Just(0.0), 200.0f64..320.0],
    )
}

/// The condition number κ of the correction (module docs of the measurement equation).
fn kappa(l: f64, s: f64, e: f64, tr: f64, tau: f64, tp: f64) -> f64 {
    let b = |t: f64| {
        if t == 0.0 {
            0.0
        } else {
            bb::spectral_radiance_wavelength(l, t).unwrap_or(f64::NAN)
        }
    };
    let lobj = ((s - (1.0 - tau) * b(tp)) / tau - (1.0 - e) * b(tr)) / e;
    (s.abs() + (1.0 - tau) * b(tp) + tau * (1.0 - e) * b(tr)) / (tau * e * lobj)
}

proptest! {
    #![proptest_config(cases(500))]

    /// ε = τ = 1 gives the brightness temperature bit for bit, in f64 and f32 (the equation
    /// reduces to L_meas = L(T_obj)).
    #[test]
    fn blackbody_without_path_is_the_brightness_temperature(l in log_uniform(-7.0, -3.0),
            t in log_uniform(0.5, 4.0), tr in 0.0f64..1000.0, tp in 0.0f64..1000.0) {
        let s = ok("radiance", bb::spectral_radiance_wavelength(l, t))?;
        prop_assume!(s > 1e-300);
        let want = ok("brightness", bb::brightness_temperature_wavelength(l, s))?;
        let got = ok("object", bb::object_temperature_wavelength(l, s, 1.0, tr, 1.0, tp))?;
        prop_assert_eq!(got.to_bits(), want.to_bits());
        let u = ok("with uncertainty", bb::object_temperature_wavelength_with_uncertainty(
            l, s, 1.0, tr, 1.0, tp, 1.0, 0.0, 0.0, 0.0, 0.0))?;
        prop_assert_eq!(u.temperature_k.to_bits(), want.to_bits());
        let b = ok("brightness u", bb::brightness_temperature_wavelength_with_uncertainty(l, s, 1.0))?;
        prop_assert_eq!(u.sensitivity_coefficients[0].to_bits(), b.sensitivity_coefficients[0].to_bits());
        let (l32, s32) = (l as f32, s as f32);
        if let Ok(w32) = bb::brightness_temperature_wavelength(l32, s32) {
            let g32 = ok("object f32", bb::object_temperature_wavelength(l32, s32, 1.0, tr as f32, 1.0, tp as f32))?;
            prop_assert_eq!(g32.to_bits(), w32.to_bits());
        }
        let nu = 299_792_458.0 / l;
        let sf = ok("radiance nu", bb::spectral_radiance_frequency(nu, t))?;
        prop_assume!(sf > 1e-300);
        let wf = ok("brightness nu", bb::brightness_temperature_frequency(nu, sf))?;
        let gf = ok("object nu", bb::object_temperature_frequency(nu, sf, 1.0, tr, 1.0, tp))?;
        prop_assert_eq!(gf.to_bits(), wf.to_bits());
    }

    /// τ = 1: the path temperature drops out (bit for bit) and its coefficient is 0.
    #[test]
    fn full_transmittance_removes_the_path((l, t, e, tr, _, _) in scene(), tp1 in 0.0f64..2000.0,
            tp2 in 0.0f64..2000.0) {
        let s = ok("forward", bb::measured_spectral_radiance_wavelength(l, t, e, tr, 1.0, tp1))?;
        let a = bb::object_temperature_wavelength(l, s, e, tr, 1.0, tp1);
        let b = bb::object_temperature_wavelength(l, s, e, tr, 1.0, tp2);
        prop_assert_eq!(a.map(f64::to_bits), b.map(f64::to_bits));
        // a scene dominated by its reflection (κ beyond 1/ε) may have no object temperature
        prop_assume!(a.is_ok());
        let u = ok("u", bb::object_temperature_wavelength_with_uncertainty(l, s, e, tr, 1.0, tp1,
            s * 0.01, 0.01, 1.0, 0.01, 1.0))?;
        prop_assert_eq!(u.sensitivity_coefficients[4], 0.0);
        prop_assert_eq!(Ok(u.temperature_k.to_bits()), a.map(f64::to_bits));
    }

    /// T_refl = T_obj: the emissivity coefficient vanishes; what is left is the rounding of the
    /// signal, ≤ (κ + 4) ε of its terms τ(L + L_refl)/D (module docs).
    #[test]
    fn reflected_at_object_temperature_makes_emissivity_irrelevant(
            (l, t, e, _, tau, tp) in scene()) {
        let s = ok("forward", bb::measured_spectral_radiance_wavelength(l, t, e, t, tau, tp))?;
        let u = ok("u", bb::object_temperature_wavelength_with_uncertainty(l, s, e, t, tau, tp,
            0.0, 0.01, 0.0, 0.0, 0.0))?;
        let lt = ok("B", bb::spectral_radiance_wavelength(l, t))?;
        let terms = tau * 2.0 * lt * u.sensitivity_coefficients[0];
        let k = kappa(l, s, e, t, tau, tp);
        close("emissivity coefficient", u.sensitivity_coefficients[1], 0.0,
            (k + 4.0) * 8.0 * f64::EPSILON * terms)?;
    }

    /// Forward then inverse returns T_obj within the conditioning: relative error of L_obj
    /// ≲ 8ε(κ + 1), times (1 − e^−x)/x ≤ 1, plus the 1e-14 of the brightness temperature.
    #[test]
    fn round_trip((l, t, e, tr, tau, tp) in scene()) {
        let s = ok("forward", bb::measured_spectral_radiance_wavelength(l, t, e, tr, tau, tp))?;
        let k = kappa(l, s, e, tr, tau, tp);
        prop_assume!(k.is_finite() && k < 1e6);
        let back = ok("inverse", bb::object_temperature_wavelength(l, s, e, tr, tau, tp))?;
        close("T", back, t, t * (1e-14 + 8.0 * f64::EPSILON * (k + 1.0)))?;
        let nu = 299_792_458.0 / l;
        let sf = ok("forward nu", bb::measured_spectral_radiance_frequency(nu, t, e, tr, tau, tp))?;
        let backf = ok("inverse nu", bb::object_temperature_frequency(nu, sf, e, tr, tau, tp))?;
        close("T nu", backf, t, t * (1e-14 + 8.0 * f64::EPSILON * (k + 1.0)))?;
    }

    /// The coefficients against central differences of the inverse (step 1e-6 relative:
    /// truncation ~1e-12 of the curvature, rounding ~κε/1e-6), tolerance 1e-6 of the term size.
    #[test]
    fn coefficients_match_central_differences((l, t, e, tr, tau, tp) in scene()) {
        let s = ok("forward", bb::measured_spectral_radiance_wavelength(l, t, e, tr, tau, tp))?;
        let k = kappa(l, s, e, tr, tau, tp);
        prop_assume!(k < 100.0);
        let u = ok("u", bb::object_temperature_wavelength_with_uncertainty(l, s, e, tr, tau, tp,
            0.0, 0.0, 0.0, 0.0, 0.0))?;
        let x = [s, e, tr, tau, tp];
        let f = |x: [f64; 5]| bb::object_temperature_wavelength(l, x[0], x[1], x[2], x[3], x[4]);
        for i in 0..5 {
            if x[i] == 0.0 { continue; }
            let h = x[i] * 1e-6;
            let (mut p, mut m) = (x, x);
            p[i] += h;
            m[i] -= h;
            let (Ok(tp_), Ok(tm_)) = (f(p), f(m)) else { continue };
            let d = (tp_ - tm_) / (2.0 * h);
            // scale: the coefficient's natural size, T per unit of the input
            let scale = u.sensitivity_coefficients[i].abs() + t / x[i].abs() * 1e-3;
            close(&format!("coefficient {i}"), u.sensitivity_coefficients[i], d, 1e-5 * scale)?;
        }
    }

    /// Array forms: per-pixel and shared parameters give the scalar bits; a bad element is NaN
    /// and the first one is reported.
    #[test]
    fn arrays_are_the_scalar_function(pixels in prop::collection::vec(scene(), 1..40),
            bad in prop::option::of(0usize..40), shared in any::<bool>()) {
        let l = pixels[0].0;
        let n = pixels.len();
        let mut sig: Vec<f64> = pixels.iter().map(|p| bb::measured_spectral_radiance_wavelength(
            l, p.1, p.2, p.3, p.4, p.5).unwrap_or(f64::NAN)).collect();
        if let Some(b) = bad.filter(|&b| b < n) { sig[b] = -1.0; }
        let pick = |f: fn(&Scene) -> f64| -> Vec<f64> {
            if shared { vec![f(&pixels[0])] } else { pixels.iter().map(f).collect() }
        };
        let (e, tr, tau, tp) = (pick(|p| p.2), pick(|p| p.3), pick(|p| p.4), pick(|p| p.5));
        let us = [vec![1e3], pick(|_| 0.01), vec![1.0], vec![0.01], pick(|_| 2.0)];
        let mut out = vec![0.0; n];
        let mut out_t = vec![0.0; n];
        let mut out_u = vec![0.0; n];
        let r = bb::object_temperature_wavelength_array(l, &sig, &e, &tr, &tau, &tp, &mut out);
        let ru = bb::object_temperature_wavelength_with_uncertainty_array(l, &sig, &e, &tr, &tau,
            &tp, &us[0], &us[1], &us[2], &us[3], &us[4], &mut out_t, &mut out_u);
        let blank = bb::TemperatureUncertainty { temperature_k: 0.0, combined_standard_uncertainty_k: 0.0,
            sensitivity_coefficients: [0.0; 5], inputs: 9 };
        let mut budgets = vec![blank; n];
        let rb = bb::object_temperature_wavelength_budget_array(l, &sig, &e, &tr, &tau, &tp, &us[0], &us[1],
            &us[2], &us[3], &us[4], &mut budgets);
        let g = |v: &Vec<f64>, i: usize| if v.len() == 1 { v[0] } else { v[i] };
        let mut first = None;
        let mut first_u = None;
        for i in 0..n {
            let want = bb::object_temperature_wavelength(l, sig[i], g(&e, i), g(&tr, i), g(&tau, i), g(&tp, i));
            let wu = bb::object_temperature_wavelength_with_uncertainty(l, sig[i], g(&e, i),
                g(&tr, i), g(&tau, i), g(&tp, i), 1e3, 0.01, 1.0, 0.01, 2.0);
            match (want, wu) {
                (Ok(w), Ok(wu)) => {
                    prop_assert_eq!(out[i].to_bits(), w.to_bits());
                    prop_assert_eq!(out_t[i].to_bits(), wu.temperature_k.to_bits());
                    prop_assert_eq!(out_u[i].to_bits(), wu.combined_standard_uncertainty_k.to_bits());
                    let b = budgets[i];
                    prop_assert_eq!(b.temperature_k.to_bits(), wu.temperature_k.to_bits());
                    prop_assert_eq!(b.combined_standard_uncertainty_k.to_bits(),
                        wu.combined_standard_uncertainty_k.to_bits());
                    for k in 0..5 {
                        prop_assert_eq!(b.sensitivity_coefficients[k].to_bits(),
                            wu.sensitivity_coefficients[k].to_bits());
                    }
                    prop_assert_eq!(b.inputs, 5);
                }
                (Err(err), _) => {
                    prop_assert!(out[i].is_nan());
                    prop_assert!(budgets[i].temperature_k.is_nan() && budgets[i].inputs == 0);
                    if first.is_none() { first = Some((i, err)); }
                    if first_u.is_none() { first_u = Some(i); }
                }
                (Ok(_), Err(_)) => {
                    prop_assert!(out_t[i].is_nan());
                    prop_assert!(budgets[i].temperature_k.is_nan() && budgets[i].inputs == 0);
                    if first_u.is_none() { first_u = Some(i); }
                }
            }
        }
        prop_assert_eq!(rb.err().map(|x| x.index), first_u);
        match first {
            None => prop_assert!(r.is_ok() && ru.is_ok()),
            Some((i, err)) => {
                let e = r.err().map(|x| (x.index, x.error));
                prop_assert_eq!(e, Some((i, err)));
            }
        }
        let mut short = vec![0.0; n + 1];
        let lm = bb::object_temperature_wavelength_array(l, &sig, &e, &tr, &tau, &tp, &mut short);
        prop_assert_eq!(lm.err().map(|x| x.error), Some(Error::LengthMismatch(relicore::arg!(6, out))));
        prop_assert!(short.iter().all(|v| v.is_nan()));
    }

    /// eq. 13 with r = I is eq. 10 (to rounding); with full correlation (all rᵢⱼ = 1) u_c is
    /// |Σ cᵢuᵢ| (JCGM 100:2008 §5.2.2, note 1).
    #[test]
    fn correlation_limits(c in prop::collection::vec(-1e3f64..1e3, 1..6),
            u0 in prop::collection::vec(0.0f64..10.0, 6)) {
        let n = c.len();
        let u = &u0[..n];
        let mut id = vec![0.0; n * n];
        for i in 0..n { id[i * n + i] = 1.0; }
        let a = ok("eq10", bb::combined_standard_uncertainty(&c, u))?;
        let b = ok("eq13 identity", bb::combined_standard_uncertainty_correlated(&c, u, &id))?;
        close("identity", b, a, 4.0 * (n as f64 + 2.0) * f64::EPSILON * a)?;
        let ones = vec![1.0; n * n];
        let full = ok("eq13 full", bb::combined_standard_uncertainty_correlated(&c, u, &ones))?;
        let sum: f64 = c.iter().zip(u).map(|(c, u)| c * u).sum();
        let size: f64 = c.iter().zip(u).map(|(c, u)| (c * u).abs()).sum();
        // u_c² has absolute error ~ 4n²ε size², so u_c itself ~ sqrt of that where it cancels
        let tol = (4.0 * (n * n) as f64 * f64::EPSILON).sqrt() * size * 2.0;
        close("full correlation", full, sum.abs(), tol)?;
    }
}

proptest! {
    // the faces' forms not reached above: the response-weighted forward equation and the
    // frequency and band frames (every element the scalar function's bits)
    #![proptest_config(cases(100))]

    #[test]
    fn robust_response_forward_and_frames(t in any64(), s in any64(), e in scene64(), tr in scene64(),
            tau in scene64(), tp in scene64(), u in scene64()) {
        let w = [8e-6, 10e-6, 12e-6, 14e-6];
        let r = [0.0, 1.0, 0.8, 0.0];
        contract("measured_response_weighted_radiance", &[0.0, 0.0, t, e, tr, tau, tp], 7,
            bb::measured_response_weighted_radiance(&w, &r, t, e, tr, tau, tp))?;
        let signals = [s, 2.0 * s, 0.5 * s];
        let mut out = [0.0; 3];
        let (mut ot, mut ou) = ([0.0; 3], [0.0; 3]);
        let _ = bb::object_temperature_frequency_array(3e13, &signals, &[e], &[tr], &[tau], &[tp], &mut out);
        for (k, &x) in signals.iter().enumerate() {
            let want = bb::object_temperature_frequency(3e13, x, e, tr, tau, tp);
            prop_assert!(want.map_or(out[k].is_nan(), |v| v.to_bits() == out[k].to_bits()));
        }
        let _ = bb::object_temperature_band_array(8e-6, 1.4e-5, &signals, &[e], &[tr], &[tau], &[tp], &mut out);
        for (k, &x) in signals.iter().enumerate() {
            let want = bb::object_temperature_band(8e-6, 1.4e-5, x, e, tr, tau, tp);
            prop_assert!(want.map_or(out[k].is_nan(), |v| v.to_bits() == out[k].to_bits()));
        }
        let _ = bb::object_temperature_frequency_with_uncertainty_array(3e13, &signals, &[e], &[tr], &[tau], &[tp],
            &[u], &[u], &[u], &[u], &[u], &mut ot, &mut ou);
        for (k, &x) in signals.iter().enumerate() {
            let want = bb::object_temperature_frequency_with_uncertainty(3e13, x, e, tr, tau, tp, u, u, u, u, u);
            prop_assert!(want.map_or(ot[k].is_nan() && ou[k].is_nan(),
                |v| v.temperature_k.to_bits() == ot[k].to_bits()
                    && v.combined_standard_uncertainty_k.to_bits() == ou[k].to_bits()));
        }
        let mut budgets = [bb::TemperatureUncertainty::default(); 3];
        let _ = bb::object_temperature_frequency_budget_array(3e13, &signals, &[e], &[tr], &[tau], &[tp],
            &[u], &[u], &[u], &[u], &[u], &mut budgets);
        for (k, &x) in signals.iter().enumerate() {
            let want = bb::object_temperature_frequency_with_uncertainty(3e13, x, e, tr, tau, tp, u, u, u, u, u);
            prop_assert!(same_budget(want, &budgets[k]));
        }
        let _ = bb::object_temperature_band_budget_array(8e-6, 1.4e-5, &signals, &[e], &[tr], &[tau], &[tp],
            &[u], &[u], &[u], &[u], &[u], &mut budgets);
        for (k, &x) in signals.iter().enumerate() {
            let want = bb::object_temperature_band_with_uncertainty(8e-6, 1.4e-5, x, e, tr, tau, tp, u, u, u, u, u);
            prop_assert!(same_budget(want, &budgets[k]));
        }
        let _ = bb::object_temperature_band_with_uncertainty_array(8e-6, 1.4e-5, &signals, &[e], &[tr], &[tau],
            &[tp], &[u], &[u], &[u], &[u], &[u], &mut ot, &mut ou);
        for (k, &x) in signals.iter().enumerate() {
            let want = bb::object_temperature_band_with_uncertainty(8e-6, 1.4e-5, x, e, tr, tau, tp, u, u, u, u, u);
            prop_assert!(want.map_or(ot[k].is_nan() && ou[k].is_nan(),
                |v| v.temperature_k.to_bits() == ot[k].to_bits()
                    && v.combined_standard_uncertainty_k.to_bits() == ou[k].to_bits()));
        }
    }
}

/// Whether a budget frame's value is the scalar function's result bit for bit (or the failed
/// value, NaN with no inputs, where the scalar function fails).
fn same_budget(
    want: relicore::Result<bb::TemperatureUncertainty<f64>>,
    got: &bb::TemperatureUncertainty<f64>,
) -> bool {
    match want {
        Ok(w) => {
            w.temperature_k.to_bits() == got.temperature_k.to_bits()
                && w.combined_standard_uncertainty_k.to_bits()
                    == got.combined_standard_uncertainty_k.to_bits()
                && w.sensitivity_coefficients
                    .iter()
                    .zip(got.sensitivity_coefficients.iter())
                    .all(|(a, b)| a.to_bits() == b.to_bits())
                && w.inputs == got.inputs
        }
        Err(_) => {
            got.temperature_k.is_nan()
                && got.inputs == 0
                && got.sensitivity_coefficients.iter().all(|c| c.is_nan())
        }
    }
}
