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
            }
            Err(e) => {
                assert!(out_t[i].is_nan() && out_u[i].is_nan(), "{i}");
                first_u.get_or_insert((i, e));
            }
        }
    }
    assert_eq!(r.err().map(|x| (x.index, x.error)), first);
    assert_eq!(ru.err().map(|x| (x.index, x.error)), first_u);
    assert!(first.is_some());
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
