//! Property tests of the array functions (the `_array` forms of the core).
//!
//! Each array function promises to give, element by element, exactly the bits of its scalar
//! function, NaN where the scalar function fails, and the index and error of the first failing
//! element. These properties draw arrays that mix ordinary values with NaN, ±∞, ±0, negative,
//! subnormal and huge ones (so that some 64-element blocks take the fast path, some fall back,
//! and some are split between the two), of lengths from 0 to several blocks, at ordinary and
//! hostile temperatures or universes, in `f64` and `f32`, and compare with the scalar calls.
//!
//! The reference here is the project's own scalar function, which the mpmath vectors check; what
//! this file checks is that the vectorised path adds nothing and loses nothing.

mod proptest_support;

use proptest::prelude::*;
use proptest_support::{any32, any64, cases};
use relicore::blackbody as bb;
use relicore::cosmology::{Universe, UniverseParameters};
use relicore::{ArrayResult, ElementError, Error, Real, Result};

/// `array` against `scalar` element by element: the same bits or NaN for a failure, and the
/// first failure reported.
fn same_as_scalar<T: Real>(
    what: &str,
    x: &[T],
    array: impl Fn(&[T], &mut [T]) -> ArrayResult,
    scalar: impl Fn(T) -> Result<T>,
) -> std::result::Result<(), TestCaseError> {
    let mut out = vec![T::zero(); x.len()];
    let got = array(x, &mut out);
    let mut first: Option<ElementError> = None;
    for (i, (&xi, &oi)) in x.iter().zip(out.iter()).enumerate() {
        match scalar(xi) {
            Ok(v) => prop_assert!(
                v.to_f64_exact().to_bits() == oi.to_f64_exact().to_bits(),
                "{what}[{i}] x={:e}: array {:e}, scalar {:e}",
                xi.to_f64_exact(),
                oi.to_f64_exact(),
                v.to_f64_exact()
            ),
            Err(error) => {
                prop_assert!(
                    oi.is_nan(),
                    "{what}[{i}]: scalar failed ({error}), array gave a number"
                );
                first.get_or_insert(ElementError { index: i, error });
            }
        }
    }
    prop_assert_eq!(got, first.map_or(Ok(()), Err), "{}: reported failure", what);
    // a wrong output length is refused, the whole output NaN
    let mut short = vec![T::zero(); x.len().saturating_sub(1)];
    if !x.is_empty() {
        let r = array(x, &mut short);
        let refused = matches!(
            r,
            Err(ElementError {
                error: Error::LengthMismatch(_),
                ..
            })
        );
        prop_assert!(refused, "{}: a short output was not refused: {:?}", what, r);
        prop_assert!(short.iter().all(|v| v.is_nan()));
    }
    Ok(())
}

/// Arrays: mostly ordinary values in `ordinary`, with hostile ones sprinkled in (or none, so
/// that whole blocks take the fast path).
fn array64(ordinary: std::ops::Range<f64>) -> impl Strategy<Value = Vec<f64>> {
    let element = prop_oneof![
        30 => ordinary.prop_map(|e| 10f64.powf(e)),
        1 => any64(),
    ];
    prop_oneof![
        1 => proptest::collection::vec(element.clone(), 0..300),
        1 => proptest::collection::vec(element, 0..300).prop_map(|mut v| {
            v.iter_mut().for_each(|x| if !(x.is_finite() && *x > 0.0) { *x = 1.0 });
            v
        }),
    ]
}

fn array32(ordinary: std::ops::Range<f64>) -> impl Strategy<Value = Vec<f32>> {
    let element = prop_oneof![
        30 => ordinary.prop_map(|e| 10f64.powf(e) as f32),
        1 => any32(),
    ];
    proptest::collection::vec(element, 0..300)
}

fn temperature() -> impl Strategy<Value = f64> {
    prop_oneof![
        20 => (-1.0f64..7.0).prop_map(|e| 10f64.powf(e)),
        1 => any64(),
    ]
}

proptest! {
    #![proptest_config(cases(300))]

    #[test]
    fn spectral_radiance_wavelength_array_is_the_scalar_function(
        x in array64(-9.0..1.0), t in temperature(),
        x32 in array32(-8.0..0.0), t32 in temperature()
    ) {
        same_as_scalar("spectral_radiance_wavelength_array", &x,
            |x, o| bb::spectral_radiance_wavelength_array(x, t, o),
            |l| bb::spectral_radiance_wavelength(l, t))?;
        let t32 = t32 as f32;
        same_as_scalar("spectral_radiance_wavelength_array f32", &x32,
            |x, o| bb::spectral_radiance_wavelength_array(x, t32, o),
            |l| bb::spectral_radiance_wavelength(l, t32))?;
    }

    #[test]
    fn spectral_radiance_frequency_array_is_the_scalar_function(
        x in array64(6.0..17.0), t in temperature(),
        x32 in array32(8.0..15.0), t32 in temperature()
    ) {
        same_as_scalar("spectral_radiance_frequency_array", &x,
            |x, o| bb::spectral_radiance_frequency_array(x, t, o),
            |nu| bb::spectral_radiance_frequency(nu, t))?;
        let t32 = t32 as f32;
        same_as_scalar("spectral_radiance_frequency_array f32", &x32,
            |x, o| bb::spectral_radiance_frequency_array(x, t32, o),
            |nu| bb::spectral_radiance_frequency(nu, t32))?;
    }

    #[test]
    fn spectral_radiance_wavenumber_array_is_the_scalar_function(
        x in array64(-1.0..9.0), t in temperature(),
        x32 in array32(1.0..7.0), t32 in temperature()
    ) {
        same_as_scalar("spectral_radiance_wavenumber_array", &x,
            |x, o| bb::spectral_radiance_wavenumber_array(x, t, o),
            |v| bb::spectral_radiance_wavenumber(v, t))?;
        let t32 = t32 as f32;
        same_as_scalar("spectral_radiance_wavenumber_array f32", &x32,
            |x, o| bb::spectral_radiance_wavenumber_array(x, t32, o),
            |v| bb::spectral_radiance_wavenumber(v, t32))?;
    }

    #[test]
    fn a_subnormal_temperature_falls_back_element_by_element(x in array64(6.0..17.0)) {
        // 1/T overflows: the array functions of frequency and wavenumber take the scalar path
        let t = 1e-310;
        same_as_scalar("spectral_radiance_frequency_array", &x,
            |x, o| bb::spectral_radiance_frequency_array(x, t, o),
            |nu| bb::spectral_radiance_frequency(nu, t))?;
        same_as_scalar("spectral_radiance_wavenumber_array", &x,
            |x, o| bb::spectral_radiance_wavenumber_array(x, t, o),
            |v| bb::spectral_radiance_wavenumber(v, t))?;
    }
}

/// Universes: flat, open and closed, with and without radiation, massive neutrinos and w0–wa;
/// a few have no big bang and are skipped (`Universe::new` refuses them).
fn universe() -> impl Strategy<Value = Option<Universe<f64>>> {
    (
        40.0f64..100.0,
        0.02f64..1.2,
        prop_oneof![2 => Just(0.0), 1 => -0.3f64..0.3],
        prop_oneof![1 => Just(0.0), 2 => Just(2.7255)],
        prop_oneof![3 => Just(0.0), 1 => 0.0f64..0.5],
        prop_oneof![2 => Just(-1.0), 1 => -1.5f64..-0.5],
        prop_oneof![2 => Just(0.0), 1 => -0.5f64..0.5],
    )
        .prop_map(|(h0, om, ok, t0, m, w0, wa)| {
            let mut p = UniverseParameters::new(h0, om);
            p.omega_curvature = ok;
            p.cmb_temperature_k = t0;
            p.neutrino_masses_ev = [m, 0.0, 0.0];
            p.w0 = w0;
            p.wa = wa;
            Universe::new(p).ok()
        })
}

/// Redshifts from 0 to beyond the table (z > 16383 falls back to quadrature), with hostile
/// values sprinkled in.
fn redshifts() -> impl Strategy<Value = Vec<f64>> {
    let z = prop_oneof![
        30 => (-6.0f64..4.0).prop_map(|e| 10f64.powf(e)),
        2 => Just(0.0),
        1 => (4.2f64..6.0).prop_map(|e| 10f64.powf(e)),
        1 => any64(),
    ];
    proptest::collection::vec(z, 0..200)
}

proptest! {
    #![proptest_config(cases(100))]

    #[test]
    fn distance_arrays_are_the_scalar_functions(u in universe(), z in redshifts()) {
        let Some(u) = u else { return Ok(()) };
        same_as_scalar("comoving_distance_mpc_array", &z,
            |x, o| u.comoving_distance_mpc_array(x, o), |z| u.comoving_distance_mpc(z))?;
        same_as_scalar("transverse_comoving_distance_mpc_array", &z,
            |x, o| u.transverse_comoving_distance_mpc_array(x, o),
            |z| u.transverse_comoving_distance_mpc(z))?;
        same_as_scalar("angular_diameter_distance_mpc_array", &z,
            |x, o| u.angular_diameter_distance_mpc_array(x, o),
            |z| u.angular_diameter_distance_mpc(z))?;
        same_as_scalar("luminosity_distance_mpc_array", &z,
            |x, o| u.luminosity_distance_mpc_array(x, o), |z| u.luminosity_distance_mpc(z))?;
    }

    #[test]
    fn distance_arrays_in_f32_are_the_scalar_functions(
        h0 in 40.0f32..100.0, om in 0.05f32..1.0, z in proptest::collection::vec(any32(), 0..150)
    ) {
        let Ok(u) = Universe::new(UniverseParameters::new(h0, om)) else { return Ok(()) };
        same_as_scalar("luminosity_distance_mpc_array f32", &z,
            |x, o| u.luminosity_distance_mpc_array(x, o), |z| u.luminosity_distance_mpc(z))?;
        same_as_scalar("comoving_distance_mpc_array f32", &z,
            |x, o| u.comoving_distance_mpc_array(x, o), |z| u.comoving_distance_mpc(z))?;
    }
}
