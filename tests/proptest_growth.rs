//! Property tests of every public function of structure growth.
//!
//! Part 1, robustness: every query of a growth and of a power spectrum, the free transfer
//! functions, the BAO and leapfrog functions of a universe, and the spectrum constructors, in
//! `f64` (and the growth in `f32`), called with arbitrary arguments, return `Ok` with a finite
//! value or an `Err` naming an existing argument, never panic, and never succeed on a NaN.
//!
//! Part 2, identities, each with its source: D decreases with z and lies in (0, 1], f > 0
//! (growing mode of the growth equation); P(k, z)/P(k, 0) = D(z)² and σ(R, z) = D(z) σ(R, 0)
//! (linear theory: one growth factor for every k, module doc of `relicore::growth`); the drift
//! and kick integrals are additive over adjacent intervals and change sign with their limits
//! (properties of an integral); D_V³ = z D_M² D_H (Eisenstein et al. 2005, eq. 2); the array
//! forms are the scalar functions bit for bit.

mod proptest_support;

use proptest::prelude::*;
use proptest_support::{any64, cases, close, contract, ok};
use relicore::cosmology::{Universe, UniverseParameters};
use relicore::growth::{
    LinearGrowth, LinearPowerSpectrum, TransferForm, eisenstein_hu_no_wiggle_transfer_function,
    eisenstein_hu_transfer_function,
};
use std::sync::OnceLock;

/// Base ΛCDM of Planck Collaboration 2020 (A&A 641, A6, Table 2; from memory).
fn planck() -> Universe<f64> {
    let h = 0.6736;
    let mut p = UniverseParameters::new(67.36, 0.3153);
    p.omega_baryon = 0.02237 / (h * h);
    p.n_eff = 3.046;
    p.neutrino_masses_ev = [0.06, 0.0, 0.0];
    Universe::new(p).unwrap_or_else(|e| panic!("{e}"))
}

fn growth() -> &'static LinearGrowth<f64> {
    static G: OnceLock<Box<LinearGrowth<f64>>> = OnceLock::new();
    G.get_or_init(|| Box::new(LinearGrowth::new(&planck()).unwrap_or_else(|e| panic!("{e}"))))
}

fn spectrum() -> &'static LinearPowerSpectrum<f64> {
    static S: OnceLock<Box<LinearPowerSpectrum<f64>>> = OnceLock::new();
    S.get_or_init(|| {
        Box::new(
            LinearPowerSpectrum::with_scalar_amplitude(
                growth(),
                TransferForm::BaryonOscillations,
                2.1e-9,
                0.9649,
                0.0,
            )
            .unwrap_or_else(|e| panic!("{e}")),
        )
    })
}

proptest! {
    #![proptest_config(cases(400))]

    #[test]
    fn growth_queries_keep_the_contract(z in any64()) {
        let g = growth();
        for (name, r) in [
            ("growth_factor", g.growth_factor(z)),
            ("growth_rate", g.growth_rate(z)),
            ("unnormalized_growth_factor", g.unnormalized_growth_factor(z)),
        ] {
            contract(name, &[z], 1, r)?;
            if z.is_finite() && z >= 0.0 {
                prop_assert!(r.is_ok(), "{name}({z}) = {r:?}");
            }
        }
    }

    #[test]
    fn spectrum_queries_keep_the_contract(k in any64(), z in any64()) {
        let s = spectrum();
        contract("transfer_function", &[k], 1, s.transfer_function(k))?;
        contract("linear_power_spectrum_mpc3", &[k, z], 2, s.linear_power_spectrum_mpc3(k, z))?;
        contract("growth_rate_times_sigma8", &[z], 1, s.growth_rate_times_sigma8(z))?;
        prop_assert!(s.sigma8().is_finite() && s.s8().is_finite());
    }

    #[test]
    fn transfer_functions_keep_the_contract(k in any64(), wm in any64(), wb in any64(), t0 in any64()) {
        let a = [k, wm, wb, t0];
        contract("eisenstein_hu_transfer_function", &a, 4, eisenstein_hu_transfer_function(k, wm, wb, t0))?;
        contract("eisenstein_hu_no_wiggle_transfer_function", &a, 4,
                 eisenstein_hu_no_wiggle_transfer_function(k, wm, wb, t0))?;
    }

    #[test]
    fn bao_and_leapfrog_keep_the_contract(x in any64(), y in any64()) {
        let u = planck();
        contract("hubble_distance_at_mpc", &[x], 1, u.hubble_distance_at_mpc(x))?;
        contract("volume_averaged_distance_mpc", &[x], 1, u.volume_averaged_distance_mpc(x))?;
        contract("transverse_comoving_distance_over_sound_horizon", &[x, y], 2,
                 u.transverse_comoving_distance_over_sound_horizon(x, y))?;
        contract("hubble_distance_over_sound_horizon", &[x, y], 2, u.hubble_distance_over_sound_horizon(x, y))?;
        contract("volume_averaged_distance_over_sound_horizon", &[x, y], 2,
                 u.volume_averaged_distance_over_sound_horizon(x, y))?;
        let g = growth();
        contract("leapfrog_drift_factor_gyr", &[x, y], 2, g.leapfrog_drift_factor_gyr(x, y))?;
        contract("leapfrog_kick_factor_gyr", &[x, y], 2, g.leapfrog_kick_factor_gyr(x, y))?;
    }
}

proptest! {
    #![proptest_config(cases(24))]

    #[test]
    fn sigma_keeps_the_contract(r in any64(), z in any64()) {
        contract("density_rms_in_sphere", &[r, z], 2, spectrum().density_rms_in_sphere(r, z))?;
    }

    /// Arbitrary primordial parameters: Ok with a finite σ8, or an error naming argument 2, 3
    /// or 4 (or 0 when σ8 cannot be formed); never a panic.
    #[test]
    fn constructors_with_any_parameters(amp in any64(), ns in any64(), alpha in any64(), form in any::<bool>()) {
        let form = if form { TransferForm::BaryonOscillations } else { TransferForm::NoWiggle };
        for r in [
            LinearPowerSpectrum::with_scalar_amplitude(growth(), form, amp, ns, alpha),
            LinearPowerSpectrum::with_sigma8(growth(), form, amp, ns, alpha),
        ] {
            match r {
                Ok(s) => {
                    prop_assert!(amp > 0.0 && ns.is_finite() && alpha.is_finite());
                    prop_assert!(s.sigma8().is_finite() && s.sigma8() > 0.0);
                    prop_assert!(s.scalar_amplitude().is_finite() && s.scalar_amplitude() > 0.0);
                }
                Err(e) => prop_assert!(matches!(e.argument(), Some(0 | 2 | 3 | 4) | None), "{e:?}"),
            }
        }
    }
}

proptest! {
    #![proptest_config(cases(200))]

    #[test]
    fn growth_is_monotone_and_bounded(z1 in 0.0f64..1e4, dz in 1e-6f64..1e3) {
        let g = growth();
        let d1 = ok("D", g.growth_factor(z1))?;
        let d2 = ok("D", g.growth_factor(z1 + dz))?;
        prop_assert!(d2 < d1 && d1 <= 1.0 && d2 > 0.0, "{d1} {d2}");
        prop_assert!(ok("f", g.growth_rate(z1))? > 0.0);
    }

    #[test]
    fn spectrum_scales_with_the_growth_factor(k in -4.0f64..2.0, z in 0.0f64..100.0) {
        let s = spectrum();
        let k = 10f64.powf(k);
        let d = ok("D", growth().growth_factor(z))?;
        let p0 = ok("P0", s.linear_power_spectrum_mpc3(k, 0.0))?;
        let pz = ok("Pz", s.linear_power_spectrum_mpc3(k, z))?;
        close("P(k,z)/P(k,0) = D^2", pz / p0, d * d, 1e-13 * d * d)?;
    }

    #[test]
    fn leapfrog_integrals_are_additive(a1 in 1e-6f64..1.0, a2 in 1e-6f64..1.0, a3 in 1e-6f64..1.0) {
        let g = growth();
        for (name, f) in [
            ("drift", LinearGrowth::<f64>::leapfrog_drift_factor_gyr as fn(&LinearGrowth<f64>, f64, f64) -> relicore::Result<f64>),
            ("kick", LinearGrowth::<f64>::leapfrog_kick_factor_gyr),
        ] {
            let i12 = ok(name, f(g, a1, a2))?;
            let i23 = ok(name, f(g, a2, a3))?;
            let i13 = ok(name, f(g, a1, a3))?;
            let i21 = ok(name, f(g, a2, a1))?;
            let scale = i12.abs() + i23.abs() + i13.abs();
            close(name, i12 + i23, i13, 1e-12 * scale)?;
            close(name, i21, -i12, 1e-12 * i12.abs())?;
        }
    }

    #[test]
    fn volume_averaged_distance_definition(z in 1e-4f64..10.0) {
        let u = planck();
        let dv = ok("D_V", u.volume_averaged_distance_mpc(z))?;
        let dm = ok("D_M", u.transverse_comoving_distance_mpc(z))?;
        let dh = ok("D_H", u.hubble_distance_at_mpc(z))?;
        close("D_V^3 / (z D_M^2 D_H)", dv * dv * dv / (z * dm * dm * dh), 1.0, 1e-14)?;
    }

    #[test]
    fn arrays_are_the_scalar_functions(zs in prop::collection::vec(prop_oneof![4 => 0.0f64..2e7, 1 => any64()], 0..200),
                                       ks in prop::collection::vec(prop_oneof![4 => 1e-5f64..1e3, 1 => any64()], 0..100)) {
        let g = growth();
        let mut out = vec![0.0; zs.len()];
        let r = g.growth_factor_array(&zs, &mut out);
        for (i, (&z, &o)) in zs.iter().zip(out.iter()).enumerate() {
            match g.growth_factor(z) {
                Ok(v) => prop_assert_eq!(v.to_bits(), o.to_bits(), "D at {} (z={})", i, z),
                Err(_) => prop_assert!(o.is_nan() && r.is_err()),
            }
        }
        let r = g.growth_rate_array(&zs, &mut out);
        for (i, (&z, &o)) in zs.iter().zip(out.iter()).enumerate() {
            match g.growth_rate(z) {
                Ok(v) => prop_assert_eq!(v.to_bits(), o.to_bits(), "f at {} (z={})", i, z),
                Err(_) => prop_assert!(o.is_nan() && r.is_err()),
            }
        }
        let s = spectrum();
        let mut out = vec![0.0; ks.len()];
        let r = s.linear_power_spectrum_mpc3_array(&ks, 0.5, &mut out);
        for (&k, &o) in ks.iter().zip(out.iter()) {
            match s.linear_power_spectrum_mpc3(k, 0.5) {
                Ok(v) => prop_assert_eq!(v.to_bits(), o.to_bits()),
                Err(_) => prop_assert!(o.is_nan() && r.is_err()),
            }
        }
        let mut short = vec![0.0; zs.len() + 1];
        prop_assert!(g.growth_factor_array(&zs, &mut short).is_err());
    }
}

proptest! {
    #![proptest_config(ProptestConfig::with_cases(64))]

    /// The vectorised P(k) and T(k) array forms (both transfer forms, f64 and f32) are their
    /// scalar functions bit for bit over the whole range of k: inside the kernels' common
    /// domain, across its edges (k ≈ 1e-300, k s ≈ 1e6) and on bad input.
    #[test]
    fn spectrum_arrays_are_the_scalar_functions(
        lks in prop::collection::vec(prop_oneof![6 => -12.0f64..8.0, 2 => -310.0f64..310.0], 0..300),
        bad in prop::collection::vec(any64(), 0..8),
        z in prop_oneof![4 => 0.0f64..20.0, 1 => any64()],
    ) {
        let mut ks: Vec<f64> = lks.iter().map(|l| 10f64.powf(*l)).collect();
        ks.extend(bad);
        let wiggle = spectrum();
        let smooth = LinearPowerSpectrum::with_scalar_amplitude(
            growth(), TransferForm::NoWiggle, 2.1e-9, 0.9649, 0.01).unwrap_or_else(|e| panic!("{e}"));
        for s in [wiggle, &smooth] {
            let mut out = vec![0.0; ks.len()];
            let r = s.linear_power_spectrum_mpc3_array(&ks, z, &mut out);
            for (&k, &o) in ks.iter().zip(out.iter()) {
                match s.linear_power_spectrum_mpc3(k, z) {
                    Ok(v) => prop_assert_eq!(v.to_bits(), o.to_bits(), "P at k={}", k),
                    Err(_) => prop_assert!(o.is_nan() && r.is_err()),
                }
            }
            let r = s.transfer_function_array(&ks, &mut out);
            for (&k, &o) in ks.iter().zip(out.iter()) {
                match s.transfer_function(k) {
                    Ok(v) => prop_assert_eq!(v.to_bits(), o.to_bits(), "T at k={}", k),
                    Err(_) => prop_assert!(o.is_nan() && r.is_err()),
                }
            }
        }
        let s32 = spectrum_f32();
        let k32: Vec<f32> = ks.iter().map(|&k| k as f32).collect();
        let mut out = vec![0.0f32; k32.len()];
        let r = s32.linear_power_spectrum_mpc3_array(&k32, z as f32, &mut out);
        for (&k, &o) in k32.iter().zip(out.iter()) {
            match s32.linear_power_spectrum_mpc3(k, z as f32) {
                Ok(v) => prop_assert_eq!(v.to_bits(), o.to_bits(), "P32 at k={}", k),
                Err(_) => prop_assert!(o.is_nan() && r.is_err()),
            }
        }
    }
}

fn spectrum_f32() -> &'static LinearPowerSpectrum<f32> {
    static S: OnceLock<Box<LinearPowerSpectrum<f32>>> = OnceLock::new();
    S.get_or_init(|| {
        let h = 0.6736f32;
        let mut p = UniverseParameters::new(67.36f32, 0.3153);
        p.omega_baryon = 0.02237 / (h * h);
        let u = Universe::new(p).unwrap_or_else(|e| panic!("{e}"));
        let g = LinearGrowth::<f32>::new(&u).unwrap_or_else(|e| panic!("{e}"));
        Box::new(
            LinearPowerSpectrum::with_scalar_amplitude(
                &g,
                TransferForm::BaryonOscillations,
                2.1e-9,
                0.9649,
                0.0,
            )
            .unwrap_or_else(|e| panic!("{e}")),
        )
    })
}

/// σ(R, z) = D(z) σ(R, 0) and σ(8/h Mpc, 0) = σ8 (definitions), a few cases (each σ is a
/// quadrature).
#[test]
fn sigma_scales_with_the_growth_factor_and_gives_sigma8() {
    let s = spectrum();
    let r8 = 8.0 / 0.6736;
    let s8 = s.density_rms_in_sphere(r8, 0.0).unwrap_or(f64::NAN);
    assert_eq!(s8, s.sigma8());
    for z in [0.5, 3.0] {
        let d = growth().growth_factor(z).unwrap_or(f64::NAN);
        let sz = s.density_rms_in_sphere(r8, z).unwrap_or(f64::NAN);
        assert!((sz - d * s8).abs() <= 1e-15 * s8, "{sz} {}", d * s8);
    }
    // a spectrum normalised to the σ8 of this one has its A_s
    let t = LinearPowerSpectrum::with_sigma8(
        growth(),
        TransferForm::BaryonOscillations,
        s8,
        0.9649,
        0.0,
    )
    .unwrap_or_else(|e| panic!("{e}"));
    assert!(
        (t.scalar_amplitude() / 2.1e-9 - 1.0).abs() < 1e-13,
        "{}",
        t.scalar_amplitude()
    );
}

/// The growth in f32: built and queried without a panic, D(0) = 1, the queries finite.
#[test]
fn growth_in_f32() {
    let h = 0.6736f32;
    let mut p = UniverseParameters::new(67.36f32, 0.3153);
    p.omega_baryon = 0.02237 / (h * h);
    let u = Universe::new(p).unwrap_or_else(|e| panic!("{e}"));
    let g = LinearGrowth::<f32>::new(&u).unwrap_or_else(|e| panic!("{e}"));
    assert_eq!(g.growth_factor(0.0), Ok(1.0));
    for z in [0.0f32, 0.5, 10.0, 1e3, 1e5, 1e8] {
        for r in [
            g.growth_factor(z),
            g.growth_rate(z),
            g.unnormalized_growth_factor(z),
        ] {
            let v = r.unwrap_or_else(|e| panic!("z = {z}: {e}"));
            assert!(v.is_finite() && v > 0.0);
        }
    }
}
