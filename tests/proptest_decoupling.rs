//! Property tests of every public function of decoupling.
//!
//! Part 1, robustness: `saha_ionized_fraction`, the two fits, `ThermalHistory::new` (arbitrary
//! options) and every query of a history, in `f64` and `f32`, called with arbitrary arguments,
//! return `Ok` with a finite value or an `Err` naming an existing argument, never panic, and
//! never succeed on a NaN argument.
//!
//! Part 2, physics over random plausible universes (flat ΛCDM, baryon density, helium fraction,
//! CMB temperature and Hubble constant drawn around published values), each check with its
//! source: Saha equilibrium is the high-redshift limit of the history (the Peebles equation
//! relaxes to it while the rates exceed H, Peebles 1968); T_m → T_r while Compton coupling is
//! tight (Peyraud 1968; Zeldovich, Kurt & Sunyaev 1969, as common practice); x_e stays within
//! (0, 1 + 2 n_He/n_H]; T_m never exceeds T_r without heating; the optical depth grows with z;
//! τ(z*) = 1 and τ_drag(z_drag) = 1 by definition; θ* = r_s(z*)/D_M(z*), the age and
//! temperature at z* agree with the background functions; the visibility integrates to
//! 1 − e^{−τ} over conformal distance (its definition as a probability density); the sound
//! horizon decreases with z; reionisation adds optical depth that grows with z_re.

mod proptest_support;

use proptest::prelude::*;
use proptest_support::{any32, any64, cases, contract};
use relicore::cosmology::{Universe, UniverseParameters};
use relicore::decoupling::{
    HistoryOptions, ThermalHistory, drag_redshift_fit, last_scattering_redshift_fit,
    saha_ionized_fraction,
};

/// A plausible flat universe: (h, Ω_b h², Ω_c h², T0, Y_p).
fn plausible() -> impl Strategy<Value = (f64, f64, f64, f64, f64)> {
    (
        0.6f64..0.8,
        0.015f64..0.03,
        0.09f64..0.15,
        2.6f64..2.8,
        0.2f64..0.3,
    )
}

fn build(h: f64, wb: f64, wc: f64, t0: f64, y: f64) -> Universe<f64> {
    let mut p = UniverseParameters::new(100.0 * h, (wb + wc) / (h * h));
    p.omega_baryon = wb / (h * h);
    p.cmb_temperature_k = t0;
    p.helium_mass_fraction = y;
    Universe::new(p).unwrap_or_else(|e| panic!("{e}"))
}

fn planck() -> Universe<f64> {
    let h = 0.6736;
    let mut p = UniverseParameters::new(67.36, 0.3153);
    p.omega_baryon = 0.02237 / (h * h);
    p.n_eff = 3.046;
    p.neutrino_masses_ev = [0.06, 0.0, 0.0];
    Universe::new(p).unwrap_or_else(|e| panic!("{e}"))
}

fn planck32() -> Universe<f32> {
    let h = 0.6736f32;
    let mut p = UniverseParameters::new(67.36f32, 0.3153);
    p.omega_baryon = 0.02237 / (h * h);
    Universe::new(p).unwrap_or_else(|e| panic!("{e}"))
}

// ------------------------------------------------------------------------------------------
// Part 1: robustness
// ------------------------------------------------------------------------------------------

proptest! {
    #![proptest_config(cases(400))]

    #[test]
    fn saha_keeps_the_contract(z in any64()) {
        let u = planck();
        contract("saha_ionized_fraction", &[0.0, z], 2, saha_ionized_fraction(&u, z))?;
        if z.is_nan() {
            prop_assert!(saha_ionized_fraction(&u, z).is_err());
        }
    }

    #[test]
    fn saha_keeps_the_contract_f32(z in any32()) {
        let u = planck32();
        let r = saha_ionized_fraction(&u, z);
        contract("saha_ionized_fraction_f32", &[0.0, f64::from(z)], 2, r)?;
    }

    #[test]
    fn fits_keep_the_contract(wb in any64(), wm in any64()) {
        contract("last_scattering_redshift_fit", &[wb, wm], 2, last_scattering_redshift_fit(wb, wm))?;
        contract("drag_redshift_fit", &[wb, wm], 2, drag_redshift_fit(wb, wm))?;
    }

    #[test]
    fn fits_keep_the_contract_f32(wb in any32(), wm in any32()) {
        let w = [f64::from(wb), f64::from(wm)];
        contract("last_scattering_redshift_fit_f32", &w, 2, last_scattering_redshift_fit(wb, wm))?;
        contract("drag_redshift_fit_f32", &w, 2, drag_redshift_fit(wb, wm))?;
    }
}

proptest! {
    #![proptest_config(cases(24))]

    /// Arbitrary options: Ok, or an error naming the reionisation redshift (1), the highest
    /// redshift (2), helium's second reionisation redshift (3) or width (4); never a panic.
    #[test]
    fn construction_with_any_options(
        zr in any64(),
        top in any64(),
        reion in any::<bool>(),
        helium in any::<bool>(),
        hz in any64(),
        hw in any64(),
    ) {
        let u = planck();
        let mut options = HistoryOptions {
            reionization_redshift: if reion { Some(zr) } else { None },
            highest_redshift: top,
            ..HistoryOptions::default()
        };
        if helium {
            options.helium_reionization_redshift = hz;
            options.helium_reionization_width = hw;
        }
        match ThermalHistory::<f64>::new(&u, options) {
            Ok(h) => {
                prop_assert!(top.is_finite() && (3000.0..=1.0001e4).contains(&top));
                if helium {
                    prop_assert!((0.0..=20.0).contains(&hz) && (0.1..=10.0).contains(&hw));
                }
                prop_assert!(h.last_scattering_redshift().is_finite());
            }
            Err(e) => {
                let a = e.argument();
                prop_assert!(matches!(a, Some(1..=4)), "{e:?}");
                prop_assert!(helium || a != Some(3) && a != Some(4), "{e:?}");
            }
        }
    }
}

proptest! {
    #![proptest_config(cases(600))]

    /// Every query of one history at arbitrary redshifts keeps the contract.
    #[test]
    fn queries_keep_the_contract(z in any64()) {
        let h = history();
        type Q = fn(&ThermalHistory<f64>, f64) -> relicore::Result<f64>;
        let queries: [(&str, Q); 5] = [
            ("ionized_fraction", ThermalHistory::ionized_fraction),
            ("matter_temperature_k", ThermalHistory::matter_temperature_k),
            ("optical_depth", ThermalHistory::optical_depth),
            ("visibility", ThermalHistory::visibility),
            ("sound_horizon_mpc", ThermalHistory::sound_horizon_mpc),
        ];
        for (name, q) in queries {
            let r = q(h, z);
            contract(name, &[z], 1, r)?;
            if (0.0..=1e4).contains(&z) {
                prop_assert!(r.is_ok(), "{name}({z}) = {r:?} inside the table");
            }
        }
    }
}

fn history() -> &'static ThermalHistory<f64> {
    use std::sync::OnceLock;
    static H: OnceLock<Box<ThermalHistory<f64>>> = OnceLock::new();
    H.get_or_init(|| {
        Box::new(
            ThermalHistory::new(
                &planck(),
                HistoryOptions {
                    reionization_redshift: Some(7.67),
                    ..HistoryOptions::default()
                },
            )
            .unwrap_or_else(|e| panic!("{e}")),
        )
    })
}

/// The f32 history: built and queried without a panic, the summary finite.
#[test]
fn history_in_f32() {
    let h = ThermalHistory::<f32>::new(&planck32(), HistoryOptions::default())
        .unwrap_or_else(|e| panic!("{e}"));
    let zs = h.last_scattering_redshift();
    assert!((1000.0..1200.0).contains(&zs), "z* = {zs}");
    for z in [0.0f32, 1.0, 100.0, 1100.0, 5000.0, 1e4] {
        for r in [
            h.ionized_fraction(z),
            h.matter_temperature_k(z),
            h.optical_depth(z),
            h.visibility(z),
            h.sound_horizon_mpc(z),
        ] {
            let v = r.unwrap_or_else(|e| panic!("z = {z}: {e}"));
            assert!(v.is_finite());
        }
    }
    for v in [
        h.drag_redshift(),
        h.sound_horizon_last_scattering_mpc(),
        h.sound_horizon_drag_mpc(),
        h.angular_scale_last_scattering(),
        h.age_at_last_scattering_yr(),
        h.temperature_at_last_scattering_k(),
        h.visibility_peak_redshift(),
        h.thermal_decoupling_redshift(),
        h.reionization_optical_depth(),
    ] {
        assert!(v.is_finite());
    }
}

// ------------------------------------------------------------------------------------------
// Part 2: physics
// ------------------------------------------------------------------------------------------

proptest! {
    #![proptest_config(cases(6))]

    #[test]
    fn history_physics((h0, wb, wc, t0, y) in plausible()) {
        let u = build(h0, wb, wc, t0, y);
        let h = ThermalHistory::<f64>::new(&u, HistoryOptions::default())
            .map_err(|e| TestCaseError::fail(format!("{e}")))?;
        let f_he = y / (1.0 - y) * (1.007_825_031_898 / 4.002_603_254_130);
        // Saha is the high-redshift limit (hydrogen's rates exceed H by > 1e6 there)
        for z in [4000.0, 6000.0, 9000.0] {
            let xs = saha_ionized_fraction(&u, z).map_err(|e| TestCaseError::fail(format!("{e}")))?;
            let xh = h.ionized_fraction(z).map_err(|e| TestCaseError::fail(format!("{e}")))?;
            prop_assert!((xh / xs - 1.0).abs() < 1e-7, "z {z}: history {xh} Saha {xs}");
        }
        let mut last_tau = -1.0;
        let mut last_rs = f64::INFINITY;
        for i in 0..=400 {
            let z = 1e4 * (i as f64 / 400.0).powi(3);
            let x = h.ionized_fraction(z).map_err(|e| TestCaseError::fail(format!("{e}")))?;
            prop_assert!(x > 0.0 && x <= (1.0 + 2.0 * f_he) * (1.0 + 1e-12), "x_e({z}) = {x}");
            let tm = h.matter_temperature_k(z).map_err(|e| TestCaseError::fail(format!("{e}")))?;
            let tr = t0 * (1.0 + z);
            prop_assert!(tm > 0.0 && tm <= tr * (1.0 + 1e-9), "T_m({z}) = {tm} > T_r {tr}");
            if z >= 1500.0 {
                // tight Compton coupling
                prop_assert!((tm / tr - 1.0).abs() < 1e-4, "T_m/T_r({z}) = {}", tm / tr);
            }
            let tau = h.optical_depth(z).map_err(|e| TestCaseError::fail(format!("{e}")))?;
            prop_assert!(tau >= last_tau, "optical depth decreases at z {z}");
            last_tau = tau;
            if i % 40 == 0 {
                let rs = h.sound_horizon_mpc(z).map_err(|e| TestCaseError::fail(format!("{e}")))?;
                prop_assert!(rs < last_rs, "sound horizon does not decrease at z {z}");
                last_rs = rs;
            }
        }
        // the summary against its definitions and the background
        let zs = h.last_scattering_redshift();
        let tau_star = h.optical_depth(zs).map_err(|e| TestCaseError::fail(format!("{e}")))?;
        prop_assert!((tau_star - 1.0).abs() < 1e-9, "tau(z*) = {tau_star}");
        let dm = u.transverse_comoving_distance_mpc(zs).map_err(|e| TestCaseError::fail(format!("{e}")))?;
        let rs = h.sound_horizon_mpc(zs).map_err(|e| TestCaseError::fail(format!("{e}")))?;
        prop_assert!((h.sound_horizon_last_scattering_mpc() / rs - 1.0).abs() < 1e-14);
        prop_assert!((h.angular_scale_last_scattering() / (rs / dm) - 1.0).abs() < 1e-14);
        let age = u.age_gyr(zs).map_err(|e| TestCaseError::fail(format!("{e}")))? * 1e9;
        prop_assert!((h.age_at_last_scattering_yr() / age - 1.0).abs() < 1e-14);
        prop_assert!((h.temperature_at_last_scattering_k() / (t0 * (1.0 + zs)) - 1.0).abs() < 1e-15);
        let rd = h.sound_horizon_mpc(h.drag_redshift()).map_err(|e| TestCaseError::fail(format!("{e}")))?;
        prop_assert!((h.sound_horizon_drag_mpc() / rd - 1.0).abs() < 1e-14);
        prop_assert!(h.reionization_optical_depth() == 0.0);
        // the decoupling redshift: T_m/T_r = 0.99 there
        let zd = h.thermal_decoupling_redshift();
        let ratio = h.matter_temperature_k(zd).map_err(|e| TestCaseError::fail(format!("{e}")))? / (t0 * (1.0 + zd));
        prop_assert!((ratio - 0.99).abs() < 1e-9, "T_m/T_r at the decoupling redshift {ratio}");
        // the visibility peak lies next to last scattering
        prop_assert!((h.visibility_peak_redshift() / zs - 1.0).abs() < 0.01);
        // ∫ g dη over conformal distance (dη = D_H dz/E(z), Mpc) = 1 − e^{−τ(z_top)}:
        // trapezoid in u = ln(1+z) on 20000 steps up to z = 3000 (g is negligible above)
        let n = 20_000;
        let top = 3000f64.ln_1p();
        let mut integral = 0.0;
        let mut prev = 0.0;
        for i in 0..=n {
            let uu = top * i as f64 / n as f64;
            let z = uu.exp_m1();
            let g = h.visibility(z).map_err(|e| TestCaseError::fail(format!("{e}")))?;
            let e = u.dimensionless_hubble(z).map_err(|e| TestCaseError::fail(format!("{e}")))?;
            let v = g * u.hubble_distance_mpc() / e * (1.0 + z);
            if i > 0 {
                integral += 0.5 * (v + prev) * top / n as f64;
            }
            prev = v;
        }
        let want = 1.0 - (-h.optical_depth(3000.0).map_err(|e| TestCaseError::fail(format!("{e}")))?).exp();
        prop_assert!((integral - want).abs() < 1e-6, "visibility integrates to {integral}, want {want}");
    }

    /// Reionisation adds optical depth that grows with the reionisation redshift.
    #[test]
    fn reionization_depth_grows((zr1, zr2) in (5.0f64..9.0, 9.5f64..14.0)) {
        let u = planck();
        // boxed: two histories of about 150 KB each would crowd a test thread's stack
        let mk = |zr: f64| ThermalHistory::<f64>::new(&u, HistoryOptions {
            reionization_redshift: Some(zr),
            ..HistoryOptions::default()
        }).map(Box::new);
        let a = mk(zr1).map_err(|e| TestCaseError::fail(format!("{e}")))?;
        let b = mk(zr2).map_err(|e| TestCaseError::fail(format!("{e}")))?;
        let (ta, tb) = (a.reionization_optical_depth(), b.reionization_optical_depth());
        prop_assert!(0.0 < ta && ta < tb, "tau_re({zr1}) = {ta}, tau_re({zr2}) = {tb}");
        // reionisation excluded from z*: the same in both
        prop_assert!(a.last_scattering_redshift() == b.last_scattering_redshift());
        // today the gas is fully ionised: x_e = 1 + 2 f_He (helium twice ionised)
        let x0 = a.ionized_fraction(0.0).map_err(|e| TestCaseError::fail(format!("{e}")))?;
        prop_assert!(x0 > 1.15 && x0 < 1.17, "x_e(0) = {x0}");
    }
}
