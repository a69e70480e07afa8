//! Every compilation `widest!` can choose gives the scalar functions' bits: the array functions
//! are run with the level capped at 0 (baseline), 1 (AVX2) and 2 (AVX-512), as far as this CPU
//! has them, on inputs that take both the fast path and the fallback, and compared bit for bit
//! with the scalar functions (which the mpmath reference vectors check).

use relicore::blackbody as bb;
use relicore::cosmology::{Universe, UniverseParameters};
use relicore::{ArrayResult, Result};
use relicore_dispatch::{cap_level, detected_level, level, widest};

fn inputs(scale: f64) -> Vec<f64> {
    let mut x: Vec<f64> = (0..1000)
        .map(|i| scale * 10f64.powf(-3.0 + 6.0 * (i as f64 * 0.618_033_988_7).fract()))
        .collect();
    for (i, bad) in [
        (5, f64::NAN),
        (70, -1.0),
        (300, 0.0),
        (301, f64::INFINITY),
        (999, 1e-300),
    ] {
        x[i] = bad;
    }
    x
}

fn check(
    what: &str,
    x: &[f64],
    array: impl Fn(&[f64], &mut [f64]) -> ArrayResult,
    scalar: impl Fn(f64) -> Result<f64>,
) {
    let mut out = vec![0.0; x.len()];
    let r = array(x, &mut out);
    let mut first = None;
    for (i, (&xi, &oi)) in x.iter().zip(&out).enumerate() {
        match scalar(xi) {
            Ok(v) => assert_eq!(
                v.to_bits(),
                oi.to_bits(),
                "{what} level {}: element {i} x={xi:e}",
                level()
            ),
            Err(e) => {
                assert!(oi.is_nan(), "{what}: element {i} should be NaN");
                first.get_or_insert((i, e));
            }
        }
    }
    assert_eq!(
        r.err().map(|e| (e.index, e.error)),
        first,
        "{what} level {}",
        level()
    );
}

#[test]
fn every_level_gives_the_scalar_bits() {
    let mut p = UniverseParameters::new(70.0, 0.3);
    p.n_eff = 3.044;
    let flat = Universe::new(p).unwrap();
    p.omega_curvature = 0.1;
    let open = Universe::new(p).unwrap();
    let before = cap_level(2);
    for cap in 0..=detected_level() {
        cap_level(cap);
        assert_eq!(level(), cap);
        let l = inputs(1e-5);
        check(
            "spectral_radiance_wavelength_array",
            &l,
            |x, out| {
                widest!(|x: &[f64], out: &mut [f64]| -> ArrayResult {
                    bb::spectral_radiance_wavelength_array(x, 1500.0, out)
                })
            },
            |x| bb::spectral_radiance_wavelength(x, 1500.0),
        );
        let nu = inputs(1e13);
        check(
            "spectral_radiance_frequency_array",
            &nu,
            |x, out| {
                widest!(|x: &[f64], out: &mut [f64]| -> ArrayResult {
                    bb::spectral_radiance_frequency_array(x, 300.0, out)
                })
            },
            |x| bb::spectral_radiance_frequency(x, 300.0),
        );
        let k = inputs(1e5);
        check(
            "spectral_radiance_wavenumber_array",
            &k,
            |x, out| {
                widest!(|x: &[f64], out: &mut [f64]| -> ArrayResult {
                    bb::spectral_radiance_wavenumber_array(x, 300.0, out)
                })
            },
            |x| bb::spectral_radiance_wavenumber(x, 300.0),
        );
        let z = inputs(1.0);
        for u in [&flat, &open] {
            check(
                "comoving_distance_mpc_array",
                &z,
                |x, out| {
                    widest!(
                        |u: &Universe<f64>, x: &[f64], out: &mut [f64]| -> ArrayResult {
                            u.comoving_distance_mpc_array(x, out)
                        }
                    )
                },
                |z| u.comoving_distance_mpc(z),
            );
            check(
                "transverse_comoving_distance_mpc_array",
                &z,
                |x, out| {
                    widest!(
                        |u: &Universe<f64>, x: &[f64], out: &mut [f64]| -> ArrayResult {
                            u.transverse_comoving_distance_mpc_array(x, out)
                        }
                    )
                },
                |z| u.transverse_comoving_distance_mpc(z),
            );
            check(
                "angular_diameter_distance_mpc_array",
                &z,
                |x, out| {
                    widest!(
                        |u: &Universe<f64>, x: &[f64], out: &mut [f64]| -> ArrayResult {
                            u.angular_diameter_distance_mpc_array(x, out)
                        }
                    )
                },
                |z| u.angular_diameter_distance_mpc(z),
            );
            check(
                "luminosity_distance_mpc_array",
                &z,
                |x, out| {
                    widest!(
                        |u: &Universe<f64>, x: &[f64], out: &mut [f64]| -> ArrayResult {
                            u.luminosity_distance_mpc_array(x, out)
                        }
                    )
                },
                |z| u.luminosity_distance_mpc(z),
            );
        }
    }
    cap_level(before);
    eprintln!("levels checked: 0..={} (this CPU)", detected_level());
}
