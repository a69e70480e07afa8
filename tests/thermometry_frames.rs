//! The branch-free frame path of the one-wavelength object temperature (per-pixel ε and τ,
//! shared T_refl and T_path, several blocks of 64 pixels, bad pixels among good ones): every
//! output is the scalar function's bits, in f64 and f32, and the first failure is reported.

use relicore::Real;
use relicore::blackbody as bb;

fn check<T: Real>(l: T, n: usize) {
    let mut sig = Vec::with_capacity(n);
    let mut eps = Vec::with_capacity(n);
    let mut tau = Vec::with_capacity(n);
    for i in 0..n {
        let f = i as f64 / n as f64;
        let t = 250.0 + 900.0 * f * f;
        let e = 0.05 + 0.95 * ((i * 37) % 101) as f64 / 100.0;
        let ta = 0.3 + 0.7 * ((i * 13) % 53) as f64 / 52.0;
        let s = bb::measured_spectral_radiance_wavelength(l.to_f64_exact(), t, e, 295.0, ta, 290.0)
            .unwrap_or(f64::NAN);
        sig.push(T::c(s * (1.0 + 1e-3 * ((i % 7) as f64 - 3.0))));
        eps.push(T::c(e));
        tau.push(T::c(ta));
    }
    // bad pixels: below the surroundings, NaN, ε out of range, a negative uncertainty
    sig[70] = T::c(-1.0);
    sig[200] = T::nan();
    eps[300] = T::c(1.5);
    let mut us = vec![T::c(0.01); n];
    us[400] = T::c(-0.01);
    let (tr, tp) = ([T::c(295.0)], [T::c(290.0)]);
    let (mut out, mut out_t, mut out_u) =
        (vec![T::zero(); n], vec![T::zero(); n], vec![T::zero(); n]);
    let r = bb::object_temperature_wavelength_array(l, &sig, &eps, &tr, &tau, &tp, &mut out);
    let ru = bb::object_temperature_wavelength_with_uncertainty_array(
        l,
        &sig,
        &eps,
        &tr,
        &tau,
        &tp,
        &[T::c(1e3)],
        &us,
        &[T::c(1.0)],
        &[T::c(0.01)],
        &[T::c(2.0)],
        &mut out_t,
        &mut out_u,
    );
    let failed = bb::TemperatureUncertainty {
        temperature_k: T::zero(),
        combined_standard_uncertainty_k: T::zero(),
        sensitivity_coefficients: [T::zero(); 5],
        inputs: 9,
    };
    let mut budgets = vec![failed; n];
    let rb = bb::object_temperature_wavelength_budget_array(
        l,
        &sig,
        &eps,
        &tr,
        &tau,
        &tp,
        &[T::c(1e3)],
        &us,
        &[T::c(1.0)],
        &[T::c(0.01)],
        &[T::c(2.0)],
        &mut budgets,
    );
    let (mut first, mut first_u) = (None, None);
    for i in 0..n {
        let want = bb::object_temperature_wavelength(l, sig[i], eps[i], tr[0], tau[i], tp[0]);
        let wu = bb::object_temperature_wavelength_with_uncertainty(
            l,
            sig[i],
            eps[i],
            tr[0],
            tau[i],
            tp[0],
            T::c(1e3),
            us[i],
            T::c(1.0),
            T::c(0.01),
            T::c(2.0),
        );
        match want {
            Ok(w) => assert_eq!(
                out[i].to_f64_exact().to_bits(),
                w.to_f64_exact().to_bits(),
                "{i}"
            ),
            Err(e) => {
                assert!(out[i].is_nan(), "{i}");
                first.get_or_insert((i, e));
            }
        }
        match wu {
            Ok(w) => {
                assert_eq!(
                    out_t[i].to_f64_exact().to_bits(),
                    w.temperature_k.to_f64_exact().to_bits(),
                    "{i}"
                );
                assert_eq!(
                    out_u[i].to_f64_exact().to_bits(),
                    w.combined_standard_uncertainty_k.to_f64_exact().to_bits(),
                    "{i}"
                );
                assert_eq!(bits(&budgets[i]), bits(&w), "{i}");
            }
            Err(e) => {
                assert!(out_t[i].is_nan() && out_u[i].is_nan(), "{i}");
                assert!(
                    bits(&budgets[i])
                        .iter()
                        .take(7)
                        .all(|&b| f64::from_bits(b).is_nan()),
                    "{i}"
                );
                assert_eq!(budgets[i].inputs, 0, "{i}");
                first_u.get_or_insert((i, e));
            }
        }
    }
    assert_eq!(r.err().map(|x| (x.index, x.error)), first);
    assert_eq!(ru.err().map(|x| (x.index, x.error)), first_u);
    assert_eq!(rb.err().map(|x| (x.index, x.error)), first_u);
    assert!(first.is_some());
}

/// The bits of every field of a budget (as f64), `inputs` last.
fn bits<T: Real>(v: &bb::TemperatureUncertainty<T>) -> [u64; 8] {
    let c = v.sensitivity_coefficients;
    [
        v.temperature_k,
        v.combined_standard_uncertainty_k,
        c[0],
        c[1],
        c[2],
        c[3],
        c[4],
    ]
    .map(|x| x.to_f64_exact().to_bits())
    .into_iter()
    .chain([u64::from(v.inputs)])
    .collect::<Vec<_>>()
    .try_into()
    .unwrap_or([0; 8])
}

/// A budget output of the wrong length fails as a whole; the frequency and band budgets
/// (element loops) are the scalar function's bits.
#[test]
fn budget_lengths_and_other_quantities() {
    let failed = bb::TemperatureUncertainty {
        temperature_k: 0.0,
        combined_standard_uncertainty_k: 0.0,
        sensitivity_coefficients: [0.0; 5],
        inputs: 9,
    };
    let sig = [1e6, 2e6, -1.0];
    let one = |x: f64| [x];
    let mut short = vec![failed; 2];
    let r = bb::object_temperature_wavelength_budget_array(
        10e-6,
        &sig,
        &one(0.9),
        &one(295.0),
        &one(0.95),
        &one(290.0),
        &one(1e3),
        &one(0.01),
        &one(1.0),
        &one(0.01),
        &one(2.0),
        &mut short,
    );
    let e = r.err().map(|e| e.error);
    assert!(matches!(e, Some(relicore::Error::LengthMismatch(_))));
    assert_eq!(e.and_then(|e| e.argument()), Some(11));
    assert_eq!(e.and_then(|e| e.argument_name()), Some("out"));
    assert!(
        short
            .iter()
            .all(|v| v.temperature_k.is_nan() && v.inputs == 0)
    );
    let signals = [2.0e13, 3.0e13, -1.0];
    let mut out = vec![failed; 3];
    let r = bb::object_temperature_frequency_budget_array(
        3e13,
        &signals.map(|s| s * 1e-24),
        &one(0.9),
        &one(295.0),
        &one(0.95),
        &one(290.0),
        &one(1e-15),
        &one(0.01),
        &one(1.0),
        &one(0.01),
        &one(2.0),
        &mut out,
    );
    for (k, &s) in signals.iter().enumerate() {
        let want = bb::object_temperature_frequency_with_uncertainty(
            3e13,
            s * 1e-24,
            0.9,
            295.0,
            0.95,
            290.0,
            1e-15,
            0.01,
            1.0,
            0.01,
            2.0,
        );
        match want {
            Ok(w) => assert_eq!(bits(&out[k]), bits(&w), "{k}"),
            Err(e) => {
                assert!(out[k].temperature_k.is_nan() && out[k].inputs == 0);
                assert_eq!(r.err().map(|x| (x.index, x.error)), Some((k, e)));
            }
        }
    }
    assert!(out[0].inputs == 5 && out[1].inputs == 5);
    let band_signals = [50.0, 150.0, -1.0];
    let r = bb::object_temperature_band_budget_array(
        8e-6,
        1.4e-5,
        &band_signals,
        &one(0.9),
        &one(295.0),
        &one(0.95),
        &one(290.0),
        &one(1.0),
        &one(0.01),
        &one(1.0),
        &one(0.01),
        &one(2.0),
        &mut out,
    );
    for (k, &s) in band_signals.iter().enumerate() {
        let want = bb::object_temperature_band_with_uncertainty(
            8e-6, 1.4e-5, s, 0.9, 295.0, 0.95, 290.0, 1.0, 0.01, 1.0, 0.01, 2.0,
        );
        match want {
            Ok(w) => assert_eq!(bits(&out[k]), bits(&w), "{k}"),
            Err(e) => {
                assert!(out[k].temperature_k.is_nan() && out[k].inputs == 0);
                assert_eq!(r.err().map(|x| (x.index, x.error)), Some((k, e)));
            }
        }
    }
    assert!(out[0].inputs == 5 && out[1].inputs == 5);
}

#[test]
fn frame_path_is_the_scalar_function_f64() {
    for l in [10e-6, 3.9e-6, 1.6e-6, 0.65e-6] {
        check::<f64>(l, 1000);
        check::<f64>(l, 1027);
    }
}

#[test]
fn frame_path_is_the_scalar_function_f32() {
    for l in [10e-6f32, 3.9e-6, 1.6e-6] {
        check::<f32>(l, 1000);
        check::<f32>(l, 1027);
    }
}
