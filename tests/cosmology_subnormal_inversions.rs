//! The redshift inversions at subnormal targets (issue: they returned `NoConvergence` for a
//! distance or lookback time of 1e-310). Checked against the Taylor series of each function at
//! z = 0, written here from the closed-form E(z) of each model (the Friedmann equation, common
//! practice): H0·t = z − (1 + E′(0)) z²/2, χ = z − E′(0) z²/2, D_L/D_H = z + (1 − E′(0)/2) z²,
//! inverted to second order; the third-order terms lie far below the smallest subnormal.

use relicore::cosmology::{Universe, UniverseParameters};

/// A model without radiation and neutrinos, so that E²(z) = Ω_m(1+z)³ + Ω_k(1+z)² +
/// Ω_de(1+z)^(3(1+w0)) exactly, and dE²/dz at 0 = 3Ω_m + 2Ω_k + 3(1+w0)Ω_de.
fn model(omega_matter: f64, omega_curvature: f64, w0: f64) -> (Universe<f64>, f64) {
    let p = UniverseParameters {
        omega_curvature,
        cmb_temperature_k: 0.0,
        neutrino_masses_ev: [0.0; 3],
        w0,
        ..UniverseParameters::new(67.36, omega_matter)
    };
    let u = Universe::new(p).expect("model");
    let omega_de = 1.0 - omega_matter - omega_curvature;
    let slope = (3.0 * omega_matter + 2.0 * omega_curvature + 3.0 * (1.0 + w0) * omega_de) / 2.0;
    (u, slope)
}

/// The second-order inverse z = x + k x² of x = z − k z².
fn series(x: f64, k: f64) -> f64 {
    x + (k * x) * x
}

/// Within one unit in the last place of the subnormal range (2^-1074): the series' own rounding.
fn within_a_subnormal_ulp(got: f64, want: f64) -> bool {
    (got - want).abs() <= f64::from_bits(1)
}

#[test]
fn subnormal_targets_give_the_series_redshift() {
    let models = [
        ("flat LCDM", model(0.3153, 0.0, -1.0)),
        ("open, matter and curvature", model(0.3, 0.7, -1.0)),
        // E'(0) = -1.05e298: the second-order term moves the result by tens of subnormal ulps
        ("phantom w0 = -1e298", model(0.3, 0.0, -1e298)),
    ];
    for (name, (u, slope)) in &models {
        let th = u.hubble_time_gyr();
        let dh = u.hubble_distance_mpc();
        for target in [1e-310, 2.5e-309, 1e-315, 3e-320, 1e-300 * 1e-8] {
            let t = target / th;
            let d = target / dh;
            assert!(
                t < f64::MIN_POSITIVE && d < f64::MIN_POSITIVE,
                "{target:e} not subnormal"
            );
            let cases = [
                (
                    "lookback",
                    u.redshift_at_lookback_time_gyr(target),
                    series(t, 0.5 * (1.0 + slope)),
                ),
                (
                    "comoving",
                    u.redshift_at_comoving_distance_mpc(target),
                    series(d, 0.5 * slope),
                ),
                (
                    "luminosity",
                    u.redshift_at_luminosity_distance_mpc(target),
                    series(d, 0.5 * slope - 1.0),
                ),
            ];
            for (what, got, want) in cases {
                let got = got.unwrap_or_else(|e| panic!("{name}: {what}({target:e}) = {e}"));
                assert!(
                    within_a_subnormal_ulp(got, want),
                    "{name}: {what}({target:e}) = {got:e}, series {want:e}"
                );
            }
        }
    }
    // the phantom model's correction is visible: not the first-order value
    let (u, slope) = &models[2].1;
    let t = 2.5e-309 / u.hubble_time_gyr();
    let z = u.redshift_at_lookback_time_gyr(2.5e-309).unwrap();
    assert!(
        z < t && t - z > 8.0 * f64::from_bits(1),
        "{z:e} vs {t:e} (E'(0) = {slope:e})"
    );
}

#[test]
fn targets_across_the_subnormal_boundary_all_converge() {
    // from normal to subnormal dimensionless targets: every call succeeds, the redshift follows
    // the first-order series to 1e-12 where it is normal and is non-decreasing in the target
    let (u, slope) = model(0.3153, 0.0, -1.0);
    let th = u.hubble_time_gyr();
    let dh = u.hubble_distance_mpc();
    let mut previous = [0.0_f64; 3];
    for i in 0..=400 {
        let target = 10f64.powf(-323.0 + 0.06 * f64::from(i));
        let got = [
            u.redshift_at_lookback_time_gyr(target),
            u.redshift_at_comoving_distance_mpc(target),
            u.redshift_at_luminosity_distance_mpc(target),
        ];
        let x = [target / th, target / dh, target / dh];
        let k = [0.5 * (1.0 + slope), 0.5 * slope, 0.5 * slope - 1.0];
        for j in 0..3 {
            let z = got[j].unwrap_or_else(|e| panic!("function {j} at {target:e}: {e}"));
            let want = series(x[j], k[j]);
            if want >= f64::MIN_POSITIVE {
                assert!(
                    (z - want).abs() <= 1e-12 * want,
                    "function {j} at {target:e}: {z:e} vs {want:e}"
                );
            } else {
                assert!(
                    within_a_subnormal_ulp(z, want),
                    "function {j} at {target:e}: {z:e} vs {want:e}"
                );
            }
            assert!(z >= previous[j], "function {j} decreases at {target:e}");
            previous[j] = z;
        }
    }
}

#[test]
fn subnormal_targets_in_single_precision() {
    let p = UniverseParameters::<f32> {
        cmb_temperature_k: 0.0,
        neutrino_masses_ev: [0.0; 3],
        ..UniverseParameters::new(67.36, 0.3153)
    };
    let u = Universe::new(p).expect("model");
    for target in [1e-40_f32, 3e-42, 1e-44] {
        let t = target / u.hubble_time_gyr();
        let d = target / u.hubble_distance_mpc();
        // the second-order term is below the f32 subnormal spacing here: the series is x itself
        assert_eq!(u.redshift_at_lookback_time_gyr(target), Ok(t), "{target:e}");
        assert_eq!(
            u.redshift_at_comoving_distance_mpc(target),
            Ok(d),
            "{target:e}"
        );
        assert_eq!(
            u.redshift_at_luminosity_distance_mpc(target),
            Ok(d),
            "{target:e}"
        );
    }
}
