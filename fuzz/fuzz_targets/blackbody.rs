//! Every scalar blackbody function in `f64` and `f32` (the top bit of the first byte picks the
//! type, the rest the function group), with the contract as the oracle: no panic; `Ok` holds a
//! finite value and no NaN argument was accepted; each inverse (brightness temperature,
//! temperature from a peak, temperature from a band radiance) reproduces its forward value
//! within its documented accuracy when the forward call succeeded; the array forms
//! `spectral_radiance_*_array` equal their scalar functions bit for bit.
#![no_main]

use libfuzzer_sys::fuzz_target;
use relicore::blackbody as bb;
use relicore::{Error, Result};
use relicore_fuzz::{Float, Input, normal, rel};

// decade ranges of the log-uniform reads (the other read modes cover every bit pattern)
const WAVELENGTH: (f64, f64) = (-9.0, 0.0);
const FREQUENCY: (f64, f64) = (6.0, 17.0);
const WAVENUMBER: (f64, f64) = (0.0, 8.0);
const TEMPERATURE: (f64, f64) = (-2.0, 7.0);
const RADIANCE: (f64, f64) = (-30.0, 20.0);
const UNIT: (f64, f64) = (-3.0, 0.0);
const RATIO: (f64, f64) = (-3.0, 1.0);

fuzz_target!(|data: &[u8]| {
    let mut input = Input::new(data);
    let selector = input.byte();
    if selector & 0x80 == 0 {
        run::<f64>(selector, &mut input);
    } else {
        run::<f32>(selector & 0x7f, &mut input);
    }
});

/// The contract of a scalar result: `Ok` finite, and a NaN argument never accepted.
fn ok<T: Float>(name: &str, args: &[T], r: Result<T>) -> Option<T> {
    let v = r.ok()?;
    assert!(v.is_finite(), "{name}{args:?} = Ok({v:?}): not finite");
    assert!(
        !args.iter().any(|a| a.is_nan()),
        "{name}{args:?} = Ok({v:?}): a NaN argument was accepted"
    );
    Some(v)
}

/// The contract of a temperature with its uncertainty: every field of an `Ok` finite.
fn ok_uncertainty<T: Float>(name: &str, args: &[T], r: Result<bb::TemperatureUncertainty<T>>) {
    if let Ok(v) = r {
        assert!(
            v.temperature_k.is_finite() && v.combined_standard_uncertainty_k.is_finite(),
            "{name}{args:?} = Ok({v:?}): not finite"
        );
        let n = usize::try_from(v.inputs).unwrap_or(usize::MAX);
        assert!(
            n <= v.sensitivity_coefficients.len(),
            "{name}{args:?}: inputs {n}"
        );
        for c in v.sensitivity_coefficients.iter().take(n) {
            assert!(
                c.is_finite(),
                "{name}{args:?} = Ok({v:?}): coefficient not finite"
            );
        }
        assert!(
            !args.iter().any(|a| a.is_nan()),
            "{name}{args:?}: NaN accepted"
        );
    }
}

/// The round trip of an inverse: `back` must be within `tol` relative of `want`.
fn round_trip<T: Float>(name: &str, args: &[T], back: T, want: T, tol: f64) {
    let e = rel(back.to_f64_exact(), want.to_f64_exact());
    assert!(
        e <= tol,
        "{name}: round trip from {args:?} gives {back:?}, want {want:?} (relative error {e:.3e}, documented {tol:.1e})"
    );
}

fn is_f64<T: Float>() -> bool {
    T::MANTISSA_DIGITS == 53
}

fn run<T: Float>(selector: u8, input: &mut Input<'_>) {
    let r = |input: &mut Input<'_>, range: (f64, f64)| input.real::<T>(range.0, range.1);
    match selector % 20 {
        0 => {
            let (l, t) = (r(input, WAVELENGTH), r(input, TEMPERATURE));
            if let Some(b) = ok("B_lambda", &[l, t], bb::spectral_radiance_wavelength(l, t)) {
                inverse_round_trip(
                    "T_b(lambda, B_lambda)",
                    l,
                    t,
                    b,
                    |l, b| bb::brightness_temperature_wavelength(l, b),
                    f32_wavelength_range(l),
                );
            }
        }
        1 => {
            let (nu, t) = (r(input, FREQUENCY), r(input, TEMPERATURE));
            if let Some(b) = ok("B_nu", &[nu, t], bb::spectral_radiance_frequency(nu, t)) {
                inverse_round_trip(
                    "T_b(nu, B_nu)",
                    nu,
                    t,
                    b,
                    |nu, b| bb::brightness_temperature_frequency(nu, b),
                    f32_frequency_range(nu),
                );
            }
        }
        2 => {
            let (v, t) = (r(input, WAVENUMBER), r(input, TEMPERATURE));
            ok(
                "B_wavenumber",
                &[v, t],
                bb::spectral_radiance_wavenumber(v, t),
            );
        }
        3 => {
            let (l, t) = (r(input, WAVELENGTH), r(input, TEMPERATURE));
            ok("N_lambda", &[l, t], bb::photon_radiance_wavelength(l, t));
            ok(
                "dB_lambda/dT",
                &[l, t],
                bb::radiance_temperature_derivative_wavelength(l, t),
            );
        }
        4 => {
            let (nu, t) = (r(input, FREQUENCY), r(input, TEMPERATURE));
            ok("N_nu", &[nu, t], bb::photon_radiance_frequency(nu, t));
            ok(
                "dB_nu/dT",
                &[nu, t],
                bb::radiance_temperature_derivative_frequency(nu, t),
            );
        }
        5 => {
            let (v, t) = (r(input, WAVENUMBER), r(input, TEMPERATURE));
            ok(
                "N_wavenumber",
                &[v, t],
                bb::photon_radiance_wavenumber(v, t),
            );
        }
        6 => {
            let t = r(input, TEMPERATURE);
            ok("radiant_exitance", &[t], bb::radiant_exitance(t));
            ok("photon_exitance", &[t], bb::photon_exitance(t));
            ok("photon_number_density", &[t], bb::photon_number_density(t));
            ok(
                "radiation_energy_density",
                &[t],
                bb::radiation_energy_density(t),
            );
        }
        7 => {
            let t = r(input, TEMPERATURE);
            ok("peak_wavenumber", &[t], bb::peak_wavenumber(t));
            ok(
                "photon_peak_wavelength",
                &[t],
                bb::photon_peak_wavelength(t),
            );
            ok("photon_peak_frequency", &[t], bb::photon_peak_frequency(t));
            // each 1 ulp (documented): a round trip within 2 roundings and the two rounded
            // constants' product, 4 ε
            let tol = 4.0 * T::epsilon().to_f64_exact();
            if let Some(l) = ok("peak_wavelength", &[t], bb::peak_wavelength(t)) {
                let back = ok(
                    "T(peak lambda)",
                    &[l],
                    bb::temperature_from_peak_wavelength(l),
                );
                if let Some(back) = back.filter(|_| normal(l) && normal(t)) {
                    round_trip("T(peak_wavelength(T))", &[t], back, t, tol);
                }
            }
            if let Some(nu) = ok("peak_frequency", &[t], bb::peak_frequency(t)) {
                let back = ok("T(peak nu)", &[nu], bb::temperature_from_peak_frequency(nu));
                if let Some(back) = back.filter(|b| normal(*b) && normal(t)) {
                    round_trip("T(peak_frequency(T))", &[t], back, t, tol);
                }
            }
        }
        8 => {
            let (l, nu) = (r(input, WAVELENGTH), r(input, FREQUENCY));
            ok(
                "T(peak lambda)",
                &[l],
                bb::temperature_from_peak_wavelength(l),
            );
            ok("T(peak nu)", &[nu], bb::temperature_from_peak_frequency(nu));
        }
        9 => band::<T>(input),
        10 => {
            let (lo, up, l) = (
                r(input, WAVELENGTH),
                r(input, WAVELENGTH),
                r(input, RADIANCE),
            );
            ok(
                "T(band radiance)",
                &[lo, up, l],
                bb::temperature_from_band_radiance_wavelength(lo, up, l),
            );
        }
        11 => {
            let (l, nu, b, u) = (
                r(input, WAVELENGTH),
                r(input, FREQUENCY),
                r(input, RADIANCE),
                r(input, RADIANCE),
            );
            ok(
                "T_b lambda",
                &[l, b],
                bb::brightness_temperature_wavelength(l, b),
            );
            ok(
                "T_b nu",
                &[nu, b],
                bb::brightness_temperature_frequency(nu, b),
            );
            ok("T_RJ", &[nu, b], bb::rayleigh_jeans_temperature(nu, b));
            ok_uncertainty(
                "T_b lambda with u",
                &[l, b, u],
                bb::brightness_temperature_wavelength_with_uncertainty(l, b, u),
            );
            ok_uncertainty(
                "T_b nu with u",
                &[nu, b, u],
                bb::brightness_temperature_frequency_with_uncertainty(nu, b, u),
            );
        }
        12 => {
            let a = [
                r(input, WAVELENGTH),
                r(input, WAVELENGTH),
                r(input, RATIO),
                r(input, RATIO),
            ];
            let [l1, l2, q, e] = a;
            ok("ratio_temperature", &a, bb::ratio_temperature(l1, l2, q, e));
        }
        13 => {
            let (nu, t0) = (r(input, FREQUENCY), r(input, TEMPERATURE));
            let a = [nu, t0];
            ok(
                "thermodynamic_to_rj",
                &a,
                bb::thermodynamic_to_rayleigh_jeans_factor(nu, t0),
            );
            ok("kcmb_to_mjy_per_sr", &a, bb::kcmb_to_mjy_per_sr(nu, t0));
            ok(
                "tsz temperature shape",
                &a,
                bb::thermal_sz_temperature_shape(nu, t0),
            );
            ok(
                "tsz spectral shape",
                &a,
                bb::thermal_sz_spectral_shape(nu, t0),
            );
            ok("tsz null", &[t0], bb::thermal_sz_null_frequency(t0));
        }
        14 | 15 => measurement::<T>(selector % 20 == 14, input),
        16 => band_measurement::<T>(input),
        _ => arrays::<T>(input),
    }
}

fn f32_wavelength_range<T: Float>(l: T) -> bool {
    let l = l.to_f64_exact();
    (2e-7..=1e-1).contains(&l)
}

fn f32_frequency_range<T: Float>(nu: T) -> bool {
    let nu = nu.to_f64_exact();
    (1e9..=3e14).contains(&nu)
}

/// The round trip T → B → T of a brightness temperature. `f64`: documented within 1e-14
/// relative wherever the radiance is a normal number (its forward accuracy, ≤ 4 ulp, holds for
/// normal results). `f32`: no accuracy is documented for the inverse; inside the range where
/// the forward function is documented to 4 `f32` ulp the fuzz checks 32 ε (3.8e-6), its own
/// choice, and reports a breach as a finding to judge, not as a broken promise.
fn inverse_round_trip<T: Float>(
    name: &str,
    x: T,
    t: T,
    b: T,
    inverse: impl Fn(T, T) -> Result<T>,
    f32_documented: bool,
) {
    // a normal radiance, and a T whose documented neighbourhood (1e-14 relative) is finite: the
    // inverse of the radiance of T = MAX may round above MAX and is then refused as out of domain
    if !normal(b) || t.to_f64_exact() * (1.0 + 1e-13) > T::max_value().to_f64_exact() {
        return;
    }
    let back = inverse(x, b);
    match back {
        Ok(back) => {
            assert!(back.is_finite(), "{name}({x:?}, {b:?}) = Ok({back:?})");
            if is_f64::<T>() {
                round_trip(name, &[x, t], back, t, 1e-14);
            } else if f32_documented {
                round_trip(name, &[x, t], back, t, 32.0 * f64::from(f32::EPSILON));
            }
        }
        Err(e) => panic!("{name}: forward ({x:?}, {t:?}) = {b:?} but the inverse fails: {e:?}"),
    }
}

fn band<T: Float>(input: &mut Input<'_>) {
    let r = |input: &mut Input<'_>, range: (f64, f64)| input.real::<T>(range.0, range.1);
    let (lo, up, t) = (
        r(input, WAVELENGTH),
        r(input, WAVELENGTH),
        r(input, TEMPERATURE),
    );
    let (nlo, nup) = (r(input, FREQUENCY), r(input, FREQUENCY));
    let a = [lo, up, t];
    ok("band_fraction", &a, bb::band_fraction_wavelength(lo, up, t));
    ok(
        "band_photon_radiance",
        &a,
        bb::band_photon_radiance_wavelength(lo, up, t),
    );
    ok(
        "band dL/dT",
        &a,
        bb::band_radiance_temperature_derivative_wavelength(lo, up, t),
    );
    ok(
        "band_radiance_frequency",
        &[nlo, nup, t],
        bb::band_radiance_frequency(nlo, nup, t),
    );
    let Some(l) = ok("band_radiance", &a, bb::band_radiance_wavelength(lo, up, t)) else {
        return;
    };
    // documented (f64): round trip within 1e-14 relative; the inverse searches T between about
    // 1e-120 and 1e120 K, so the check is made for T inside [1e-100, 1e100] K and a normal L
    if !is_f64::<T>() || !normal(l) || !(1e-100..=1e100).contains(&t.to_f64_exact()) {
        ok(
            "T(band radiance)",
            &[lo, up, l],
            bb::temperature_from_band_radiance_wavelength(lo, up, l),
        );
        return;
    }
    match bb::temperature_from_band_radiance_wavelength(lo, up, l) {
        Ok(back) => round_trip("T(band_radiance(T))", &a, back, t, 1e-14),
        // documented: NoConvergence, seen only for arguments far outside physical ones
        Err(Error::NoConvergence) => {}
        Err(e) => panic!("band radiance {a:?} = {l:?} but its inverse fails: {e:?}"),
    }
}

fn measurement<T: Float>(wavelength: bool, input: &mut Input<'_>) {
    let r = |input: &mut Input<'_>, range: (f64, f64)| input.real::<T>(range.0, range.1);
    let x = if wavelength {
        r(input, WAVELENGTH)
    } else {
        r(input, FREQUENCY)
    };
    let a = [
        x,
        r(input, TEMPERATURE),
        r(input, UNIT),
        r(input, TEMPERATURE),
        r(input, UNIT),
        r(input, TEMPERATURE),
    ];
    let s = r(input, RADIANCE);
    let u = [
        r(input, RADIANCE),
        r(input, UNIT),
        r(input, TEMPERATURE),
        r(input, UNIT),
        r(input, TEMPERATURE),
    ];
    let [x, t, e, tr, tau, tp] = a;
    let o = [x, s, e, tr, tau, tp];
    let w = [x, s, e, tr, tau, tp, u[0], u[1], u[2], u[3], u[4]];
    if wavelength {
        ok(
            "measured L lambda",
            &a,
            bb::measured_spectral_radiance_wavelength(x, t, e, tr, tau, tp),
        );
        ok(
            "T_obj lambda",
            &o,
            bb::object_temperature_wavelength(x, s, e, tr, tau, tp),
        );
        ok_uncertainty(
            "T_obj lambda with u",
            &w,
            bb::object_temperature_wavelength_with_uncertainty(
                x, s, e, tr, tau, tp, u[0], u[1], u[2], u[3], u[4],
            ),
        );
    } else {
        ok(
            "measured L nu",
            &a,
            bb::measured_spectral_radiance_frequency(x, t, e, tr, tau, tp),
        );
        ok(
            "T_obj nu",
            &o,
            bb::object_temperature_frequency(x, s, e, tr, tau, tp),
        );
        ok_uncertainty(
            "T_obj nu with u",
            &w,
            bb::object_temperature_frequency_with_uncertainty(
                x, s, e, tr, tau, tp, u[0], u[1], u[2], u[3], u[4],
            ),
        );
    }
}

fn band_measurement<T: Float>(input: &mut Input<'_>) {
    let r = |input: &mut Input<'_>, range: (f64, f64)| input.real::<T>(range.0, range.1);
    let (lo, up) = (r(input, WAVELENGTH), r(input, WAVELENGTH));
    let (t, e, tr, tau, tp) = (
        r(input, TEMPERATURE),
        r(input, UNIT),
        r(input, TEMPERATURE),
        r(input, UNIT),
        r(input, TEMPERATURE),
    );
    let s = r(input, RADIANCE);
    let u = [
        r(input, RADIANCE),
        r(input, UNIT),
        r(input, TEMPERATURE),
        r(input, UNIT),
        r(input, TEMPERATURE),
    ];
    ok(
        "measured band L",
        &[lo, up, t, e, tr, tau, tp],
        bb::measured_band_radiance_wavelength(lo, up, t, e, tr, tau, tp),
    );
    ok(
        "T_obj band",
        &[lo, up, s, e, tr, tau, tp],
        bb::object_temperature_band(lo, up, s, e, tr, tau, tp),
    );
    ok_uncertainty(
        "T_obj band with u",
        &[lo, up, s, e, tr, tau, tp, u[0], u[1], u[2], u[3], u[4]],
        bb::object_temperature_band_with_uncertainty(
            lo, up, s, e, tr, tau, tp, u[0], u[1], u[2], u[3], u[4],
        ),
    );
}

type ArrayFn<T> = fn(&[T], T, &mut [T]) -> relicore::ArrayResult;
type ScalarFn<T> = fn(T, T) -> Result<T>;

/// The array forms against their scalar functions, element by element, bit for bit: a failing
/// element is NaN, and the error names the first failing index with the scalar error.
fn arrays<T: Float>(input: &mut Input<'_>) {
    let kind = input.byte() % 3;
    let (range, array, scalar): ((f64, f64), ArrayFn<T>, ScalarFn<T>) = match kind {
        0 => (
            WAVELENGTH,
            bb::spectral_radiance_wavelength_array,
            bb::spectral_radiance_wavelength,
        ),
        1 => (
            FREQUENCY,
            bb::spectral_radiance_frequency_array,
            bb::spectral_radiance_frequency,
        ),
        _ => (
            WAVENUMBER,
            bb::spectral_radiance_wavenumber_array,
            bb::spectral_radiance_wavenumber,
        ),
    };
    let t = input.real::<T>(TEMPERATURE.0, TEMPERATURE.1);
    let n = input.len(200);
    // elements: a fresh read each, or (mode byte even) a copy of the previous one with a small
    // multiplier, so whole blocks of ordinary values reach the vectorised path
    let mut x = [T::zero(); 200];
    let mut prev = T::c(1e-5);
    for slot in x.iter_mut().take(n) {
        let v = if input.byte().is_multiple_of(2) {
            prev * T::c(1.0 + f64::from(input.byte()) / 64.0)
        } else {
            input.real::<T>(range.0, range.1)
        };
        *slot = v;
        prev = v;
    }
    let x = &x[..n];
    let mut out = [T::zero(); 200];
    // a mismatched output length now and then
    let m = if input.byte() == 0xff {
        n.saturating_sub(1)
    } else {
        n
    };
    let out = &mut out[..m];
    let got = array(x, t, out);
    if m != n {
        assert_eq!(
            got.map_err(|e| e.error),
            Err(Error::LengthMismatch(relicore::arg!(2, out))),
            "mismatched out"
        );
        assert!(out.iter().all(|v| v.is_nan()), "mismatched out not all NaN");
        return;
    }
    let mut first: Option<(usize, Error)> = None;
    for (i, (&xi, &oi)) in x.iter().zip(out.iter()).enumerate() {
        match scalar(xi, t) {
            Ok(v) => assert_eq!(
                oi.bits(),
                v.bits(),
                "array kind {kind} element {i}: {xi:?} at T = {t:?} gives {oi:?}, scalar {v:?}"
            ),
            Err(e) => {
                assert!(
                    oi.is_nan(),
                    "array kind {kind} element {i}: {xi:?} failed ({e:?}) but out = {oi:?}"
                );
                first.get_or_insert((i, e));
            }
        }
    }
    match (got, first) {
        (Ok(()), None) => {}
        (Err(e), Some((i, err))) => assert_eq!(
            (e.index, e.error),
            (i, err),
            "array kind {kind}: first error"
        ),
        (g, f) => panic!("array kind {kind}: array result {g:?}, scalar first failure {f:?}"),
    }
}
