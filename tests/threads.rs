//! No hidden global state: every public function of every topic is called from
//! several threads at once — each thread walking the same inputs in a different order, the
//! cosmology threads sharing the same `Universe` values by reference — and every result must
//! equal, bit for bit (or as the same error), the result of a serial run before the threads
//! start. A cache, a lazily built table or any other shared mutable state that a call could
//! see half-written, or that made a result depend on what ran before, would show as a
//! difference.

use relicore::blackbody as bb;
use relicore::cosmology::{Universe, UniverseParameters};
use relicore::decoupling::{
    HistoryOptions, ThermalHistory, drag_redshift_fit, last_scattering_redshift_fit,
    saha_ionized_fraction,
};
use relicore::{Error, Result};

/// A result as comparable bits: the value's bit pattern, or the error.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
enum Outcome {
    Value(u64),
    Failed(Error),
}

fn outcome(r: Result<f64>) -> Outcome {
    match r {
        Ok(v) => Outcome::Value(v.to_bits()),
        Err(e) => Outcome::Failed(e),
    }
}

/// An array call as one comparable outcome: its first failure, or a digest of every output bit.
fn array_outcome(r: relicore::ArrayResult, out: &[f64]) -> Outcome {
    match r {
        Err(e) => Outcome::Failed(e.error),
        Ok(()) => Outcome::Value(out.iter().fold(0u64, |h, v| h.rotate_left(7) ^ v.to_bits())),
    }
}

fn outcome32(r: Result<f32>) -> Outcome {
    match r {
        Ok(v) => Outcome::Value(u64::from(v.to_bits())),
        Err(e) => Outcome::Failed(e),
    }
}

/// Arguments: ordinary values of every scale, and a few invalid ones (errors must not depend
/// on other threads either).
const ARGS: [f64; 12] = [
    1e-7,
    3e-6,
    1e-4,
    0.01,
    0.5,
    2.7255,
    300.0,
    5800.0,
    1e9,
    1e12,
    -1.0,
    f64::NAN,
];
const REDSHIFTS: [f64; 10] = [0.0, 1e-4, 0.1, 0.5, 1.0, 3.0, 10.0, 1100.0, -1.0, f64::NAN];

/// Every blackbody call on the argument grid, as (label, outcome) in a fixed order.
fn blackbody_calls() -> Vec<Box<dyn Fn() -> Outcome + Send + Sync>> {
    let mut calls: Vec<Box<dyn Fn() -> Outcome + Send + Sync>> = Vec::new();
    type F2 = fn(f64, f64) -> Result<f64>;
    type F1 = fn(f64) -> Result<f64>;
    let two: [F2; 18] = [
        bb::spectral_radiance_wavelength,
        bb::spectral_radiance_frequency,
        bb::spectral_radiance_wavenumber,
        bb::photon_radiance_wavelength,
        bb::photon_radiance_frequency,
        bb::photon_radiance_wavenumber,
        bb::radiance_temperature_derivative_wavelength,
        bb::radiance_temperature_derivative_frequency,
        bb::brightness_temperature_wavelength,
        bb::brightness_temperature_frequency,
        bb::rayleigh_jeans_temperature,
        bb::thermodynamic_to_rayleigh_jeans_factor,
        bb::kcmb_to_mjy_per_sr,
        bb::thermal_sz_spectral_shape,
        bb::thermal_sz_temperature_shape,
        |a, b| bb::band_fraction_wavelength(a, a * 3.0, b),
        |a, b| bb::band_radiance_frequency(a, a * 3.0, b),
        |a, b| bb::ratio_temperature(a, a * 1.5, 0.8, b.abs().min(1.0)),
    ];
    let one: [F1; 12] = [
        bb::radiant_exitance,
        bb::photon_exitance,
        bb::peak_wavelength,
        bb::peak_frequency,
        bb::peak_wavenumber,
        bb::photon_peak_wavelength,
        bb::photon_peak_frequency,
        bb::temperature_from_peak_wavelength,
        bb::temperature_from_peak_frequency,
        bb::thermal_sz_null_frequency,
        |t| bb::band_radiance_wavelength(1e-6, 2e-5, t),
        |t| bb::band_photon_radiance_wavelength(0.0, 1e-5, t),
    ];
    for f in two {
        for a in ARGS {
            for b in ARGS {
                calls.push(Box::new(move || outcome(f(a, b))));
            }
        }
    }
    for f in one {
        for a in ARGS {
            calls.push(Box::new(move || outcome(f(a))));
        }
    }
    // the array forms, over the whole argument grid at each temperature
    type A = fn(&[f64], f64, &mut [f64]) -> relicore::ArrayResult;
    let arrays: [A; 3] = [
        bb::spectral_radiance_wavelength_array,
        bb::spectral_radiance_frequency_array,
        bb::spectral_radiance_wavenumber_array,
    ];
    for f in arrays {
        for t in ARGS {
            calls.push(Box::new(move || {
                let x: Vec<f64> = (0..200).map(|i| ARGS[i % ARGS.len()] * 1e-6).collect();
                let mut out = vec![0.0; x.len()];
                array_outcome(f(&x, t, &mut out), &out)
            }));
        }
    }
    for l in ARGS {
        calls.push(Box::new(move || {
            outcome(bb::temperature_from_band_radiance_wavelength(1e-6, 2e-5, l))
        }));
        let w = [8e-6, 1e-5, 1.2e-5, 1.4e-5];
        let r = [0.1, 0.9, 1.0, 0.2];
        calls.push(Box::new(move || {
            outcome(bb::response_weighted_radiance(&w, &r, l))
        }));
        calls.push(Box::new(move || {
            outcome(bb::temperature_from_response_weighted_radiance(&w, &r, l))
        }));
        calls.push(Box::new(move || {
            let c = bb::two_load_calibration(30e9, 2.0, 300.0, 1.0, 77.0);
            outcome(c.and_then(|c| bb::calibrated_temperature(&c, l)))
        }));
        calls.push(Box::new(move || {
            let c = bb::two_load_calibration(30e9, 2.0, 300.0, 1.0, 77.0);
            outcome(c.and_then(|c| bb::calibrated_brightness_temperature(&c, l)))
        }));
        // the f32 instantiations the C ABI exports (firmware twins)
        let x = l as f32;
        calls.push(Box::new(move || {
            outcome32(bb::spectral_radiance_wavelength(x, 300.0f32))
        }));
        calls.push(Box::new(move || {
            outcome32(bb::spectral_radiance_frequency(x * 1e14, 300.0f32))
        }));
        calls.push(Box::new(move || {
            outcome32(bb::spectral_radiance_wavenumber(x * 1e8, 300.0f32))
        }));
        calls.push(Box::new(move || {
            outcome32(bb::band_radiance_wavelength(1e-6f32, 2e-5, x * 1e3))
        }));
        calls.push(Box::new(move || {
            outcome32(bb::brightness_temperature_wavelength(1e-5f32, x))
        }));
        calls.push(Box::new(move || {
            outcome32(bb::brightness_temperature_frequency(1e11f32, x * 1e-15))
        }));
    }
    calls
}

fn universes() -> Vec<Universe<f64>> {
    let mut out = Vec::new();
    for (om, ok, t0, m) in [
        (0.3, 0.0, 2.7255, 0.0),
        (0.315, 0.0, 2.7255, 0.06),
        (0.3, 0.1, 2.7255, 0.0),
        (1.0, 0.0, 0.0, 0.0),
        (0.3, -0.05, 2.7255, 0.0),
    ] {
        let mut p = UniverseParameters::new(67.7, om);
        p.omega_curvature = ok;
        p.cmb_temperature_k = t0;
        p.neutrino_masses_ev = [m, 0.0, 0.0];
        p.w0 = -0.95;
        p.wa = 0.1;
        out.push(Universe::new(p).unwrap_or_else(|e| panic!("{e}")));
    }
    out
}

/// Every method of universe `i` at every redshift grid point, in a fixed order.
fn cosmology_calls<'a>(
    us: &'a [Universe<f64>],
) -> Vec<Box<dyn Fn() -> Outcome + Send + Sync + 'a>> {
    let mut calls: Vec<Box<dyn Fn() -> Outcome + Send + Sync + 'a>> = Vec::new();
    type M = fn(&Universe<f64>, f64) -> Result<f64>;
    let methods: [M; 24] = [
        Universe::dimensionless_hubble,
        Universe::hubble_parameter_km_s_mpc,
        Universe::omega_matter_at,
        Universe::omega_radiation_at,
        Universe::omega_dark_energy_at,
        Universe::omega_curvature_at,
        Universe::critical_density_kg_m3,
        Universe::cmb_temperature_at_k,
        Universe::comoving_distance_mpc,
        Universe::transverse_comoving_distance_mpc,
        Universe::angular_diameter_distance_mpc,
        Universe::luminosity_distance_mpc,
        Universe::distance_modulus,
        Universe::comoving_volume_gpc3,
        Universe::differential_comoving_volume_mpc3_sr,
        Universe::transverse_scale_kpc_per_arcsec,
        Universe::lookback_time_gyr,
        Universe::age_gyr,
        Universe::conformal_time_mpc,
        |u, z| u.angular_diameter_distance_between_mpc(z * 0.5, z),
        |u, z| u.redshift_at_age_gyr(u.hubble_time_gyr() / (1.0 + z)),
        |u, z| u.redshift_at_lookback_time_gyr(z),
        |u, z| u.redshift_at_comoving_distance_mpc(z * 1000.0),
        |u, z| u.redshift_at_luminosity_distance_mpc(z * 1000.0),
    ];
    type D = fn(&Universe<f64>, &[f64], &mut [f64]) -> relicore::ArrayResult;
    let arrays: [D; 4] = [
        Universe::comoving_distance_mpc_array,
        Universe::transverse_comoving_distance_mpc_array,
        Universe::angular_diameter_distance_mpc_array,
        Universe::luminosity_distance_mpc_array,
    ];
    for u in us {
        for m in methods {
            for z in REDSHIFTS {
                calls.push(Box::new(move || outcome(m(u, z))));
            }
        }
        for a in arrays {
            calls.push(Box::new(move || {
                let z: Vec<f64> = (0..300).map(|i| i as f64 * 0.01).collect();
                let mut out = vec![0.0; z.len()];
                array_outcome(a(u, &z, &mut out), &out)
            }));
            calls.push(Box::new(move || {
                let mut out = vec![0.0; REDSHIFTS.len()];
                array_outcome(a(u, &REDSHIFTS, &mut out), &out)
            }));
        }
        calls.push(Box::new(move || {
            outcome(u.matter_radiation_equality_redshift())
        }));
        calls.push(Box::new(move || outcome(Ok(u.hubble_distance_mpc()))));
        calls.push(Box::new(move || outcome(Ok(u.hubble_time_gyr()))));
        calls.push(Box::new(move || outcome(Ok(u.omega_radiation()))));
        calls.push(Box::new(move || outcome(Ok(u.omega_dark_energy()))));
    }
    calls
}

const THREADS: usize = 6;

/// Runs `calls` serially, then from THREADS threads at once, thread k starting at a different
/// offset and walking backwards when k is odd, and compares every result with the serial one.
fn compare_threads(what: &str, calls: &[Box<dyn Fn() -> Outcome + Send + Sync + '_>]) {
    let serial: Vec<Outcome> = calls.iter().map(|c| c()).collect();
    let n = calls.len();
    let results: Vec<Vec<Outcome>> = std::thread::scope(|s| {
        let handles: Vec<_> = (0..THREADS)
            .map(|k| {
                s.spawn(move || {
                    let mut got = vec![Outcome::Value(0); n];
                    for step in 0..n {
                        let i = if k % 2 == 0 {
                            (step + k * n / THREADS) % n
                        } else {
                            (n - 1 - step + k * n / THREADS) % n
                        };
                        got[i] = calls[i]();
                    }
                    got
                })
            })
            .collect();
        handles
            .into_iter()
            .map(|h| h.join().unwrap_or_else(|_| panic!("a thread panicked")))
            .collect()
    });
    let mut differences = 0;
    for (k, got) in results.iter().enumerate() {
        for (i, (g, w)) in got.iter().zip(&serial).enumerate() {
            if g != w {
                differences += 1;
                eprintln!("{what}: call {i} in thread {k}: {g:?}, serially {w:?}");
            }
        }
    }
    assert_eq!(
        differences, 0,
        "{what}: results differ between threads and the serial run"
    );
    eprintln!(
        "{what}: {n} calls, serially and in {THREADS} concurrent threads ({} calls), all identical",
        n * THREADS
    );
}

#[test]
fn blackbody_from_many_threads_equals_serial() {
    compare_threads("blackbody", &blackbody_calls());
}

#[test]
fn cosmology_from_many_threads_equals_serial() {
    let us = universes();
    compare_threads("cosmology", &cosmology_calls(&us));
}

/// Universes built concurrently are identical to one built alone (construction keeps no state
/// either).
#[test]
fn universes_built_concurrently_are_identical() {
    let serial = universes();
    let built: Vec<Vec<Universe<f64>>> = std::thread::scope(|s| {
        let hs: Vec<_> = (0..THREADS).map(|_| s.spawn(universes)).collect();
        hs.into_iter()
            .map(|h| h.join().unwrap_or_else(|_| panic!("a thread panicked")))
            .collect()
    });
    for b in built {
        assert!(
            b == serial,
            "a universe built in a thread differs from the serial one"
        );
    }
}

fn decoupling_universe() -> Universe<f64> {
    let h = 0.6736;
    let mut p = UniverseParameters::new(67.36, 0.3153);
    p.omega_baryon = 0.02237 / (h * h);
    p.neutrino_masses_ev = [0.06, 0.0, 0.0];
    Universe::new(p).unwrap_or_else(|e| panic!("{e}"))
}

fn histories(u: &Universe<f64>) -> Vec<Box<ThermalHistory<f64>>> {
    [None, Some(7.67)]
        .into_iter()
        .map(|zr| {
            Box::new(
                ThermalHistory::new(
                    u,
                    HistoryOptions {
                        reionization_redshift: zr,
                        ..HistoryOptions::default()
                    },
                )
                .unwrap_or_else(|e| panic!("{e}")),
            )
        })
        .collect()
}

/// Every decoupling function: Saha and the fits, and every query and summary value of two
/// histories shared by reference.
fn decoupling_calls<'a>(
    u: &'a Universe<f64>,
    hs: &'a [Box<ThermalHistory<f64>>],
) -> Vec<Box<dyn Fn() -> Outcome + Send + Sync + 'a>> {
    let mut calls: Vec<Box<dyn Fn() -> Outcome + Send + Sync + 'a>> = Vec::new();
    type Q = fn(&ThermalHistory<f64>, f64) -> Result<f64>;
    type S = fn(&ThermalHistory<f64>) -> f64;
    let queries: [Q; 5] = [
        ThermalHistory::ionized_fraction,
        ThermalHistory::matter_temperature_k,
        ThermalHistory::optical_depth,
        ThermalHistory::visibility,
        ThermalHistory::sound_horizon_mpc,
    ];
    let summary: [S; 10] = [
        ThermalHistory::last_scattering_redshift,
        ThermalHistory::drag_redshift,
        ThermalHistory::sound_horizon_last_scattering_mpc,
        ThermalHistory::sound_horizon_drag_mpc,
        ThermalHistory::angular_scale_last_scattering,
        ThermalHistory::age_at_last_scattering_yr,
        ThermalHistory::temperature_at_last_scattering_k,
        ThermalHistory::visibility_peak_redshift,
        ThermalHistory::thermal_decoupling_redshift,
        ThermalHistory::reionization_optical_depth,
    ];
    for z in REDSHIFTS.into_iter().chain([5000.0, 2e4]) {
        calls.push(Box::new(move || outcome(saha_ionized_fraction(u, z))));
        calls.push(Box::new(move || {
            outcome(last_scattering_redshift_fit(0.0224, z))
        }));
        calls.push(Box::new(move || outcome(drag_redshift_fit(0.0224, z))));
        for h in hs {
            for q in queries {
                calls.push(Box::new(move || outcome(q(h, z))));
            }
        }
    }
    for h in hs {
        for s in summary {
            calls.push(Box::new(move || outcome(Ok(s(h)))));
        }
    }
    calls
}

#[test]
fn decoupling_from_many_threads_equals_serial() {
    let u = decoupling_universe();
    let hs = histories(&u);
    compare_threads("decoupling", &decoupling_calls(&u, &hs));
}

/// Thermal histories computed concurrently are identical to the serial ones (the stepper and
/// the table keep no shared state).
#[test]
fn histories_computed_concurrently_are_identical() {
    let u = decoupling_universe();
    let serial = histories(&u);
    let built: Vec<Vec<Box<ThermalHistory<f64>>>> = std::thread::scope(|s| {
        let hs: Vec<_> = (0..2)
            .map(|_| {
                std::thread::Builder::new()
                    .stack_size(8 << 20)
                    .spawn_scoped(s, || histories(&u))
                    .unwrap_or_else(|e| panic!("{e}"))
            })
            .collect();
        hs.into_iter()
            .map(|h| h.join().unwrap_or_else(|_| panic!("a thread panicked")))
            .collect()
    });
    for b in built {
        assert!(
            b == serial,
            "a history computed in a thread differs from the serial one"
        );
    }
}

/// The thermometry frame (image) forms on a small frame of signals with per-pixel and shared
/// parameters, from several threads at once: the serial bits.
fn thermometry_frame_calls() -> Vec<Box<dyn Fn() -> Outcome + Send + Sync>> {
    let mut calls: Vec<Box<dyn Fn() -> Outcome + Send + Sync>> = Vec::new();
    for &scale in &[0.5, 1.0, 2.0, -1.0] {
        let l = bb::spectral_radiance_wavelength(1e-5, 300.0).unwrap_or(f64::NAN) * scale;
        let signals: Vec<f64> = (0..64).map(|i| l * (0.9 + 0.01 * f64::from(i))).collect();
        let e: Vec<f64> = (0..64).map(|i| 0.6 + 0.005 * f64::from(i)).collect();
        let s1 = signals.clone();
        let e1 = e.clone();
        calls.push(Box::new(move || {
            let mut out = vec![0.0; 64];
            let r = bb::object_temperature_wavelength_array(
                1e-5,
                &s1,
                &e1,
                &[293.0],
                &[0.9],
                &[280.0],
                &mut out,
            );
            array_outcome(r, &out)
        }));
        let s2 = signals.clone();
        calls.push(Box::new(move || {
            let mut out = vec![0.0; 64];
            let s: Vec<f64> = s2.iter().map(|x| x * 3e-6).collect();
            let r = bb::object_temperature_frequency_array(
                1e8,
                &s,
                &[0.9],
                &[293.0],
                &[0.9],
                &[280.0],
                &mut out,
            );
            array_outcome(r, &out)
        }));
        let s3 = signals.clone();
        calls.push(Box::new(move || {
            let mut out = vec![0.0; 64];
            let r = bb::object_temperature_band_array(
                8e-6,
                1.4e-5,
                &s3,
                &[0.9],
                &[293.0],
                &[0.9],
                &[280.0],
                &mut out,
            );
            array_outcome(r, &out)
        }));
        for kind in 0..3 {
            let s = signals.clone();
            let e = e.clone();
            calls.push(Box::new(move || {
                let (mut t, mut u) = (vec![0.0; 64], vec![0.0; 64]);
                let us: [&[f64]; 5] = [&[1e4], &[0.01], &[1.0], &[0.01], &[1.0]];
                let r = match kind {
                    0 => bb::object_temperature_wavelength_with_uncertainty_array(
                        1e-5,
                        &s,
                        &e,
                        &[293.0],
                        &[0.9],
                        &[280.0],
                        us[0],
                        us[1],
                        us[2],
                        us[3],
                        us[4],
                        &mut t,
                        &mut u,
                    ),
                    1 => bb::object_temperature_frequency_with_uncertainty_array(
                        3e13,
                        &s,
                        &e,
                        &[293.0],
                        &[0.9],
                        &[280.0],
                        us[0],
                        us[1],
                        us[2],
                        us[3],
                        us[4],
                        &mut t,
                        &mut u,
                    ),
                    _ => bb::object_temperature_band_with_uncertainty_array(
                        8e-6,
                        1.4e-5,
                        &s,
                        &e,
                        &[293.0],
                        &[0.9],
                        &[280.0],
                        us[0],
                        us[1],
                        us[2],
                        us[3],
                        us[4],
                        &mut t,
                        &mut u,
                    ),
                };
                t.extend_from_slice(&u);
                array_outcome(r, &t)
            }));
        }
        // the budget frames: every field of each pixel's value
        for kind in 0..3 {
            let s = signals.clone();
            let e = e.clone();
            calls.push(Box::new(move || {
                let mut b = vec![bb::TemperatureUncertainty::default(); 64];
                let us: [&[f64]; 5] = [&[1e4], &[0.01], &[1.0], &[0.01], &[1.0]];
                let scene: [&[f64]; 3] = [&[293.0], &[0.9], &[280.0]];
                let r = match kind {
                    0 => bb::object_temperature_wavelength_budget_array(
                        1e-5, &s, &e, scene[0], scene[1], scene[2], us[0], us[1], us[2], us[3],
                        us[4], &mut b,
                    ),
                    1 => bb::object_temperature_frequency_budget_array(
                        3e13, &s, &e, scene[0], scene[1], scene[2], us[0], us[1], us[2], us[3],
                        us[4], &mut b,
                    ),
                    _ => bb::object_temperature_band_budget_array(
                        8e-6, 1.4e-5, &s, &e, scene[0], scene[1], scene[2], us[0], us[1], us[2],
                        us[3], us[4], &mut b,
                    ),
                };
                let flat: Vec<f64> = b
                    .iter()
                    .flat_map(|v| {
                        [
                            v.temperature_k,
                            v.combined_standard_uncertainty_k,
                            f64::from(v.inputs),
                        ]
                        .into_iter()
                        .chain(v.sensitivity_coefficients)
                    })
                    .collect();
                array_outcome(r, &flat)
            }));
        }
    }
    // the response-table forms and the combined standard uncertainty
    let w = [8e-6, 9e-6, 11e-6, 13e-6, 14e-6];
    let r = [0.1, 0.9, 1.0, 0.8, 0.1];
    for &x in &ARGS {
        calls.push(Box::new(move || {
            outcome(bb::measured_response_weighted_radiance(
                &w, &r, x, 0.9, 293.0, 0.95, 280.0,
            ))
        }));
        calls.push(Box::new(move || {
            outcome(bb::object_temperature_response(
                &w, &r, x, 0.9, 293.0, 0.95, 280.0,
            ))
        }));
        calls.push(Box::new(move || {
            outcome(
                bb::object_temperature_response_with_uncertainty(
                    &w, &r, x, 0.9, 293.0, 0.95, 280.0, 1.0, 0.01, 1.0, 0.01, 1.0,
                )
                .map(|v| v.combined_standard_uncertainty_k),
            )
        }));
        calls.push(Box::new(move || {
            outcome(bb::response_weighted_radiance_temperature_derivative(
                &w, &r, x,
            ))
        }));
        calls.push(Box::new(move || {
            outcome(bb::combined_standard_uncertainty(
                &[x, 2.0, -3.0],
                &[1.0, 0.5, 0.1],
            ))
        }));
        calls.push(Box::new(move || {
            let corr = [1.0, 0.3, 0.0, 0.3, 1.0, 0.0, 0.0, 0.0, 1.0];
            outcome(bb::combined_standard_uncertainty_correlated(
                &[x, 2.0, -3.0],
                &[1.0, 0.5, 0.1],
                &corr,
            ))
        }));
    }
    calls
}

#[test]
fn thermometry_frames_from_many_threads_equal_serial() {
    compare_threads("thermometry frames", &thermometry_frame_calls());
}

/// A value with its partials as one comparable outcome (a digest of every bit).
fn gradient_outcome<const N: usize>(r: Result<(f64, [f64; N])>) -> Outcome {
    match r {
        Err(e) => Outcome::Failed(e),
        Ok((v, d)) => Outcome::Value(
            d.iter()
                .fold(v.to_bits(), |h, x| h.rotate_left(7) ^ x.to_bits()),
        ),
    }
}

/// The gradient functions (dual numbers) and the seeding of a universe's parameters from many
/// threads: every outcome equals the serial one bit for bit.
#[test]
fn gradients_from_many_threads_equal_serial() {
    let mut calls: Vec<Box<dyn Fn() -> Outcome + Send + Sync>> = Vec::new();
    for &x in &ARGS {
        for &y in &ARGS {
            calls.push(Box::new(move || {
                gradient_outcome(bb::spectral_radiance_wavelength_gradient(x, y))
            }));
            calls.push(Box::new(move || {
                gradient_outcome(bb::spectral_radiance_frequency_gradient(x, y))
            }));
            calls.push(Box::new(move || {
                gradient_outcome(bb::brightness_temperature_wavelength_gradient(x, y))
            }));
            calls.push(Box::new(move || {
                gradient_outcome(bb::brightness_temperature_frequency_gradient(x, y))
            }));
            calls.push(Box::new(move || {
                gradient_outcome(bb::band_radiance_wavelength_gradient(x, x * 2.0, y))
            }));
            calls.push(Box::new(move || {
                gradient_outcome(bb::band_radiance_frequency_gradient(x, x * 2.0, y))
            }));
            calls.push(Box::new(move || {
                gradient_outcome(bb::temperature_from_band_radiance_wavelength_gradient(
                    x,
                    x * 2.0,
                    y,
                ))
            }));
        }
    }
    for &h0 in &[40.0, 67.4, 100.0] {
        calls.push(Box::new(move || {
            let s = UniverseParameters::<f64>::new(h0, 0.3).seeded();
            Outcome::Value(
                s.h0_km_s_mpc
                    .partials()
                    .iter()
                    .fold(s.h0_km_s_mpc.value().to_bits(), |h, x| {
                        h.rotate_left(7) ^ x.to_bits()
                    }),
            )
        }));
    }
    compare_threads("gradients", &calls);
}

/// The array forms of the growth topic from several threads sharing one growth and one
/// spectrum: every thread's output equals the serial output bit for bit (the scalar functions
/// are reached from threads by tests/gen_regular.rs).
#[test]
fn growth_arrays_from_many_threads_equal_serial() {
    use relicore::growth::{LinearGrowth, LinearPowerSpectrum, TransferForm};
    let u = Universe::new(UniverseParameters {
        omega_baryon: 0.0493,
        ..UniverseParameters::new(67.36, 0.3153)
    })
    .expect("universe");
    let g = Box::new(LinearGrowth::new(&u).expect("growth"));
    let s = Box::new(
        LinearPowerSpectrum::with_scalar_amplitude(
            &g,
            TransferForm::BaryonOscillations,
            2.1e-9,
            0.9649,
            0.0,
        )
        .expect("spectrum"),
    );
    let zs: Vec<f64> = (0..700).map(|i| f64::from(i) * 0.37 - 3.0).collect();
    let ks: Vec<f64> = (0..300).map(|i| 1e-4 * 1.05f64.powi(i) - 1e-3).collect();
    let run = || {
        let mut d = vec![0.0; zs.len()];
        let mut f = vec![0.0; zs.len()];
        let mut p = vec![0.0; ks.len()];
        let mut t = vec![0.0; ks.len()];
        let rd = g.growth_factor_array(&zs, &mut d).is_ok();
        let rf = g.growth_rate_array(&zs, &mut f).is_ok();
        let rp = s.linear_power_spectrum_mpc3_array(&ks, 0.5, &mut p).is_ok();
        let rt = s.transfer_function_array(&ks, &mut t).is_ok();
        let bits = |v: &[f64]| v.iter().map(|x| x.to_bits()).collect::<Vec<u64>>();
        (rd, rf, rp, rt, bits(&d), bits(&f), bits(&p), bits(&t))
    };
    let serial = run();
    std::thread::scope(|scope| {
        let handles: Vec<_> = (0..4).map(|_| scope.spawn(run)).collect();
        for h in handles {
            assert_eq!(h.join().expect("thread"), serial);
        }
    });
}
