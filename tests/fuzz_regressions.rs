//! Findings of the coverage-guided fuzzing (`fuzz/`, `make fuzz`), each kept as an ordinary
//! test with the input the fuzzer found. The expected values are the inputs of round trips
//! (a temperature or a redshift sent forward and back), documented errors, or values computed
//! with mpmath at 40 digits from the definitions and closed forms by `fuzz/regression_values.py`
//! (named at each value), never an output of the library.

use relicore::blackbody as bb;
use relicore::cosmology::{Universe, UniverseParameters};
use relicore::decoupling::{HistoryOptions, ThermalHistory};
use relicore::{Error, arg};

/// The inversions to temperature (band radiance, response-weighted radiance) solved on
/// ln value − ln target, which resolves the radiance only to |ln target|·ε relative: the round
/// trip of a radiance of 1e158 missed T = 1 K by 3.1e-14 relative (documented: 1e-14). Found by
/// the `response_and_calibration` target (fails before the fix in `invert_increasing`, which
/// also serves the band inverse).
#[test]
fn response_inverse_round_trip_at_a_large_radiance() {
    let w = [
        2.0,
        4.0,
        4.024233320854661,
        8.048466641709322,
        16.096933283418643,
        32.193866566837286,
        64.38773313367457,
        128.77546626734915,
        257.5509325346983,
        515.1018650693966,
        1030.2037301387932,
        2060.4074602775863,
    ];
    let mut r = [1.0; 12];
    r[9] = 2.77448001762435e180;
    let l = bb::response_weighted_radiance(&w, &r, 1.0).unwrap();
    assert!(l > 1e150, "{l:e}");
    let t: f64 = bb::temperature_from_response_weighted_radiance(&w, &r, l).unwrap();
    assert!((t - 1.0).abs() <= 1e-14, "T = {t:e}");
}

fn rel(got: f64, want: f64) -> f64 {
    ((got - want) / want).abs()
}

/// A flat universe with H0 = 67.36, Ω_m = 0.3153, Ω_b = 0.0493 and the other defaults.
fn flat(change: impl FnOnce(&mut UniverseParameters<f64>)) -> UniverseParameters<f64> {
    let mut p = UniverseParameters::new(67.36, 0.3153);
    p.omega_baryon = 0.0493;
    change(&mut p);
    p
}

/// w0 = 3.3e221 was accepted, and its dark energy, ρ ∝ a^(−1e222), overflowed E² at every
/// a < 1 − 1e-221: the time and distance integrands were 0 at every quadrature node, so the
/// lookback time at z = 1e-4, the comoving distance and the age today came out as Ok(0) (found
/// by the `universe` target). `Universe::new` now refuses a model whose E² overflows between
/// today and a = 1e-30, as documented, naming w0.
#[test]
fn dark_energy_that_overflows_the_expansion_rate_is_refused() {
    let p = flat(|p| p.w0 = 3.3e221);
    assert_eq!(
        Universe::new(p).err(),
        Some(Error::InvalidParameter(arg!(7, w0)))
    );
    let p = flat(|p| {
        p.w0 = 3.3e221;
        p.wa = -3.3e221;
    });
    assert_eq!(
        Universe::new(p).err(),
        Some(Error::InvalidParameter(arg!(7, w0)))
    );
}

/// The dark-energy term was a⁴ · a^(−3(1+w0+wa)) e^(…): with w0 = 3 the second factor passes
/// the largest double below a ≈ 1e-26 although the term (a^(−8)) is finite, so the age at
/// z ≥ 1e26 came out as Ok(0) and at 1e20 as an error; in `f32`, a⁴ underflows to 0 at
/// a = 1e-30, and every model with w above −0.57 was refused as having no big bang. The term is
/// now one exponential. Flat, H0 = 70, Ω_m = 0.3, no radiation, w0 = 3.
#[test]
fn a_stiff_dark_energy_keeps_its_early_ages() {
    let mut p = UniverseParameters::new(70.0, 0.3);
    p.cmb_temperature_k = 0.0;
    p.w0 = 3.0;
    let u = Universe::new(p).unwrap();
    // mpmath quad (fuzz/regression_values.py); at 1e26 also the closed form
    // t_H / (6 √Ω_de (1+z)^6) of a past ruled by w = 3 dark energy, equal to 40 digits
    for (z, want) in [
        (1e8, 2.782583731467631e-48),
        (1e20, 2.782583898422659e-120),
        (1e26, 2.782583898422659e-156),
    ] {
        let got = u.age_gyr(z).unwrap();
        assert!(
            rel(got, want) <= 1e-12,
            "age({z:e}) = {got:e}, want {want:e}"
        );
    }
}

/// The same change in `f32`: flat, H0 = 70, Ω_m = 0.3, no radiation, w0 = −0.5 was refused
/// with `NoBigBang`. E(1) against the closed form √(8 Ω_m + 2^1.5 Ω_de) (mpmath, with the
/// `f32` Ω_m), to 4 `f32` ulp.
#[test]
fn f32_universe_with_w_above_minus_a_half_is_accepted() {
    let mut p = UniverseParameters::new(70.0f32, 0.3);
    p.cmb_temperature_k = 0.0;
    p.w0 = -0.5;
    let u = Universe::new(p).unwrap();
    let want = 2.092820835373226;
    let got = f64::from(u.dimensionless_hubble(1.0).unwrap());
    assert!(
        rel(got, want) <= 4.0 * f64::from(f32::EPSILON),
        "E(1) = {got}"
    );
}

/// A nearly empty universe (Ω_m = 1e-308, T0 = 3e-202 K, so de Sitter to 1e-272): the lookback
/// time at z = 1e12, the top of the inversions' bracket, failed (its integrand 2/s' over 20
/// octaves of s' = √a carries the rounding of 1 − v in s', and the quadrature's estimate never
/// met 4ε), so `redshift_at_lookback_time_gyr` refused every target (found by the `universe`
/// target). The lookback time against t_H ln(1+z) (closed form, mpmath).
#[test]
fn nearly_empty_universe_inverts_its_lookback_time() {
    let mut p = UniverseParameters::new(67.36, 1e-308);
    p.cmb_temperature_k = 3e-202;
    let u = Universe::new(p).unwrap();
    for (z, want) in [(10.0, 34.807650625703396), (1e4, 133.69799508735736)] {
        let t = u.lookback_time_gyr(z).unwrap();
        assert!(rel(t, want) <= 1e-12, "lookback({z:e}) = {t}, want {want}");
        let back = u.redshift_at_lookback_time_gyr(t).unwrap();
        assert!(rel(back, z) <= 1e-12, "z = {z:e} -> {t} -> {back:e}");
    }
    // beyond the documented z ≤ 1e4: measured 2.2e-12 (1 − v rounds s' = 1e-6 to 1e-10
    // relative); the point is that it is a number now
    let t = u.lookback_time_gyr(1e12).unwrap();
    assert!(rel(t, 401.08963070447675) <= 1e-11, "lookback(1e12) = {t}");
}

/// Flat, w0 = −1, wa = 10^0.5 (the fuzzer's largest wa): the age integrand at z ≈ 1e12 carries
/// rounding noise of about 1e-15 relative (an exponential of an argument near 260), the
/// quadrature at 4ε split until its capacity was spent, and the age failed at some redshifts
/// near 1e12, among them the top of the inversions' bracket: `redshift_at_age_gyr` refused every
/// target (found by the `universe` target). Ages against mpmath quad, round trips of the
/// inversion.
#[test]
fn age_inversion_with_a_large_wa() {
    let u = Universe::new(flat(|p| p.wa = 3.1622776601683795)).unwrap();
    let top = 27.631021115928547f64.exp_m1();
    for (z, want) in [
        (1.005e12, 4.975073531682991e-55),
        (top, 5.094177074775376e-55),
    ] {
        let got = u.age_gyr(z).unwrap();
        assert!(
            rel(got, want) <= 1e-12,
            "age({z:e}) = {got:e}, want {want:e}"
        );
    }
    for z in [0.0, 1.0, 10.0, 1e3] {
        let t = u.age_gyr(z).unwrap();
        let back = u.redshift_at_age_gyr(t).unwrap();
        assert!(
            (back - z).abs() <= 1e-12 * z.max(1e-300) + 1e-15,
            "z = {z:e} -> {t} -> {back:e}"
        );
    }
}

/// The lookback inversion near the age today. In a model without radiation, with one
/// neutrino of 2.2e12 eV counted in Ω_m and w0 = 2.13 (found by the `universe` target), the
/// lookback time at z = 9473 is the age today to the last bit (the age at z = 9473 is 6e-19 Gyr),
/// and the inversion refused it: as documented (at or beyond the age today), so the fuzz
/// oracle was wrong. The code's own limit was the lookback time at z = 1e12, which rounding puts
/// on either side of the age today: the inversion accepted the age today itself in the flat
/// default model (z = 4.06e10) and chose among redshifts decades apart by rounding noise near
/// it. From half the age on it now solves the age today minus the target (an exact
/// difference) for z: the age today is refused, and targets one to four ulp below it come back
/// within 1e-12 relative (round trip in the lookback time, the only meaningful one where the
/// lookback time is flat to the last bit).
#[test]
fn lookback_inversion_near_the_age_today() {
    let extreme = flat(|p| {
        p.omega_baryon = 0.0056239566224079275;
        p.cmb_temperature_k = 3.58489968926073e-310;
        p.neutrino_masses_ev = [2_199_028_498_432.001, 0.0, 0.0];
        p.w0 = 2.133493505847732;
        p.helium_mass_fraction = 0.3938166900010079;
    });
    for p in [extreme, flat(|_| {})] {
        let u = Universe::new(p).unwrap();
        let age = u.age_gyr(0.0).unwrap();
        assert_eq!(
            u.redshift_at_lookback_time_gyr(age),
            Err(Error::OutOfDomain(arg!(0, lookback_gyr))),
            "{p:?}"
        );
        for k in 1..=4 {
            let t = f64::from_bits(age.to_bits() - k);
            let z = u.redshift_at_lookback_time_gyr(t).unwrap();
            let back = u.lookback_time_gyr(z).unwrap();
            assert!(
                rel(back, t) <= 1e-12,
                "age − {k} ulp = {t} -> z {z:e} -> {back}"
            );
            // and z is where the age is the exact difference, within the age's 1e-12
            let a = u.age_gyr(z).unwrap();
            assert!(
                rel(a, age - t) <= 1e-12,
                "age({z:e}) = {a:e}, want {:e}",
                age - t
            );
        }
    }
    // the input found: refused where it is the age today (as measured), else a round trip
    let u = Universe::new(extreme).unwrap();
    let t = u.lookback_time_gyr(9472.630307515245).unwrap();
    match u.redshift_at_lookback_time_gyr(t) {
        Err(e) if e == Error::OutOfDomain(arg!(0, lookback_gyr)) => {
            assert!(t >= u.age_gyr(0.0).unwrap(), "{t} refused")
        }
        Ok(z) => assert!(
            rel(u.lookback_time_gyr(z).unwrap(), t) <= 1e-12,
            "{t} -> {z:e}"
        ),
        Err(e) => panic!("{t}: {e:?}"),
    }
}

/// Ages where the single quadrature over [0, s] cannot converge: dark energy alone with
/// w = −0.9 (integrand 2 s^−0.7 down to s = 0) and a cosmological constant with Ω_m = 1e-200
/// (2/s for 110 octaves of s, then matter) were refused as if the age diverged (found by the
/// `universe` target in a nearly empty model); now summed octave by octave. Against the closed
/// forms t_H 2/(3(1+w)) (1+z)^(−3(1+w)/2) and t_H 2/(3√Ω_Λ) asinh(√(Ω_Λ/Ω_m) (1+z)^(−3/2))
/// (mpmath). Pure de Sitter still diverges, and Ω_m = 1e-308 (a⁴E² below the smallest double
/// before matter takes over) is refused, as documented.
#[test]
fn ages_of_pasts_ruled_by_dark_energy() {
    let mut p = UniverseParameters::new(67.36, 0.0);
    p.cmb_temperature_k = 0.0;
    p.w0 = -0.9;
    let u = Universe::new(p).unwrap();
    for (z, want) in [
        (0.0, 96.77278520197837),
        (1e3, 34.331132420484685),
        (1e12, 1.533_745_284_820_942),
    ] {
        let got = u.age_gyr(z).unwrap();
        assert!(
            rel(got, want) <= 1e-12,
            "w = -0.9: age({z:e}) = {got}, want {want}"
        );
    }
    let mut p = UniverseParameters::new(67.36, 1e-200);
    p.cmb_temperature_k = 0.0;
    let u = Universe::new(p).unwrap();
    for (z, want) in [(0.0, 2234.9835044576694), (1e3, 2134.6965881168976)] {
        let got = u.age_gyr(z).unwrap();
        assert!(
            rel(got, want) <= 1e-12,
            "Ω_m = 1e-200: age({z:e}) = {got}, want {want}"
        );
    }
    let mut p = UniverseParameters::new(67.36, 0.0);
    p.cmb_temperature_k = 0.0;
    let de_sitter = Universe::new(p).unwrap();
    assert_eq!(de_sitter.age_gyr(0.0), Err(Error::OutOfDomain(arg!(0, z))));
    let mut p = UniverseParameters::new(67.36, 1e-308);
    p.cmb_temperature_k = 3e-202;
    let nearly_empty = Universe::new(p).unwrap();
    assert_eq!(
        nearly_empty.age_gyr(0.0),
        Err(Error::OutOfDomain(arg!(0, z)))
    );
}

/// A model far from physical ones (H0 = 3.5e158, Ω_m ≈ 0, Ω_r = 5e-324, phantom dark energy
/// with w0 = −3.16, wa = −3.13, so E(z) falls toward 0 into the past): D_C fails at z ≥ 1e6
/// (it passes 1e30 D_H), so at the top of the inversions' bracket, and
/// `redshift_at_comoving_distance_mpc` refused every target as unreachable, D_C(1) included
/// (found by the `universe` target); the lookback inversion likewise. The search now stops at
/// the largest redshift where the function can be computed. Round trips of the inputs.
#[test]
fn inversions_where_the_distance_fails_at_the_top_of_the_bracket() {
    let p = UniverseParameters {
        h0_km_s_mpc: 3.501_048_893_453_435_7e158,
        omega_matter: 3.602_455_785_444_780_5e-276,
        omega_baryon: 4.416_576_193_967_140_5e-278,
        omega_curvature: 3.476_677_903_917_502e-308,
        cmb_temperature_k: 0.1,
        n_eff: 0.101_808_045_776_723_88,
        neutrino_masses_ev: [7.291_118_542_878_493_6e-304, -0.0, 1.0],
        w0: -3.162_277_660_168_379_5,
        wa: -3.134_016_797_955_952_3,
        helium_mass_fraction: 0.630_957_344_480_193_4,
    };
    let u = Universe::new(p).unwrap();
    assert_eq!(u.comoving_distance_mpc(1e12), Err(Error::NoConvergence));
    for z in [1.0, 1e3, 1e5] {
        let d = u.comoving_distance_mpc(z).unwrap();
        let back = u.redshift_at_comoving_distance_mpc(d).unwrap();
        assert!(rel(back, z) <= 1e-12, "D_C: z = {z:e} -> {d:e} -> {back:e}");
        let t = u.lookback_time_gyr(z).unwrap();
        let back = u.redshift_at_lookback_time_gyr(t).unwrap();
        assert!(
            rel(back, z) <= 1e-12,
            "lookback: z = {z:e} -> {t:e} -> {back:e}"
        );
    }
}

/// Near the particle horizon the comoving distance is flat to the last bit: in a closed model
/// (Ω_k = −1, Ω_m = 1) with stiff dark energy (w0 = 3.16, wa = 0.59), D_C(1347) equals D_C(1e12)
/// (found by the `universe` target), and the inversion refused it: the check took a target
/// equal to the value at the top of the bracket for one beyond it, and noise decided between
/// targets and the horizon. From half the horizon on, the inversion now solves the conformal
/// time c·η(z) = c·η0 − target (an exact difference); at or beyond the horizon it refuses, as
/// documented. Round trips in the distance (the meaningful one where it is flat).
#[test]
fn comoving_distance_inversion_near_the_particle_horizon() {
    let p = UniverseParameters {
        h0_km_s_mpc: 199.526_231_496_887_87,
        omega_matter: 1.0,
        omega_baryon: 0.980_068_837_428_639_5,
        omega_curvature: -1.0,
        cmb_temperature_k: 0.101_808_045_776_723_88,
        n_eff: 3.785_725_153_311_983_3,
        neutrino_masses_ev: [0.148_546_479_496_344_14, 1.0, 0.148_546_479_496_344_14],
        w0: 3.162_277_660_168_379_5,
        wa: 0.592_309_938_202_956_7,
        helium_mass_fraction: 0.266_613_633_071_548_23,
    };
    let u = Universe::new(p).unwrap();
    let horizon = u.conformal_time_mpc(0.0).unwrap();
    for z in [0.5, 1.0, 10.0, 1_347.137_000_694_183_1, 1e12] {
        let d = u.comoving_distance_mpc(z).unwrap();
        match u.redshift_at_comoving_distance_mpc(d) {
            Ok(back) => {
                let again = u.comoving_distance_mpc(back).unwrap();
                assert!(
                    rel(again, d) <= 1e-12,
                    "z = {z:e} -> {d} -> {back:e} -> {again}"
                );
                assert!(
                    d < horizon,
                    "{d} at or beyond the horizon {horizon} accepted"
                );
            }
            Err(e) if e == Error::OutOfDomain(arg!(0, distance_mpc)) => {
                assert!(d >= horizon, "{d} refused, horizon {horizon}")
            }
            Err(e) => panic!("z = {z:e} -> {d}: {e:?}"),
        }
    }
    assert_eq!(
        u.redshift_at_comoving_distance_mpc(horizon),
        Err(Error::OutOfDomain(arg!(0, distance_mpc)))
    );
    let below = f64::from_bits(horizon.to_bits() - 1);
    let z = u.redshift_at_comoving_distance_mpc(below).unwrap();
    assert!(rel(u.comoving_distance_mpc(z).unwrap(), below) <= 1e-12);
}

/// The largest x_e of `h` at redshifts uniform in ln(1+z) over [z0, z1] (n + 1 of them) and at
/// `also`, over the model's bound 1 + 2f_He (f_He = n_He/n_H; here Y_p rounds f_He to 0, so the
/// bound is 1).
fn largest_ionized_fraction<T: relicore::Real>(
    h: &ThermalHistory<T>,
    z0: f64,
    z1: f64,
    n: u32,
    also: T,
) -> (f64, f64) {
    let (u0, u1) = (z0.ln_1p(), z1.ln_1p());
    let mut worst = (f64::NEG_INFINITY, 0.0);
    let zs = (0..=n).map(|i| {
        T::c(
            (u0 + (u1 - u0) * f64::from(i) / f64::from(n))
                .exp_m1()
                .min(z1),
        )
    });
    for z in zs.chain([also]) {
        let x = h.ionized_fraction(z).unwrap().to_f64_exact();
        if x > worst.0 {
            worst = (x, z.to_f64_exact());
        }
    }
    worst
}

/// x_e above its bound: the model's x_e never exceeds 1 + 2f_He (x_p ≤ 1: at x_p = 1 the Peebles
/// rate is negative; helium adds at most 2f_He; module doc of `relicore::decoupling`), but the
/// table's cubic interpolant overshot it between nodes where the node values bend sharply and
/// carry the stepper's per-step error (RTOL relative to x_p ≈ 1, which resolves 1 − x_p only
/// coarsely): x_e(1153.87) = 1 + 3.8e-7 with Y_p = 5e-324 (f_He = 0), Ω_m = 8.3e9, w0 = −1.5e112
/// (found by the `thermal_history` target). The interpolated x_e is now held to the bound.
#[test]
fn thermal_history_ionized_fraction_stays_within_its_bound() {
    let p = UniverseParameters {
        h0_km_s_mpc: 20.708_935_634_892_136,
        omega_matter: 8_321_499_136.0,
        omega_baryon: 34_822_033.139_908_96,
        omega_curvature: -0.992_858_045_784_277_7,
        cmb_temperature_k: 10.0,
        n_eff: 10.0,
        neutrino_masses_ev: [1.0, 1.0, 0.000_103_619_652_180_437_24],
        w0: -1.503_067_252_980_010_5e112,
        wa: 1.865_135_440_219_27e-309,
        helium_mass_fraction: 5e-324,
    };
    let u = Universe::new(p).unwrap();
    let options = HistoryOptions {
        reionization_redshift: Some(0.0),
        ..HistoryOptions::default()
    };
    let h = Box::new(ThermalHistory::new(&u, options).unwrap());
    let (x, z) = largest_ionized_fraction(&h, 1100.0, 1200.0, 4000, 1_153.870_396_649_114_6);
    assert!(x <= 1.0, "x_e({z}) = 1 + {:e}", x - 1.0);
    // and over the whole table
    let (x, z) = largest_ionized_fraction(&h, 0.0, 1e4, 20_000, 1e4);
    assert!(x <= 1.0, "x_e({z}) = 1 + {:e}", x - 1.0);
}

/// The same in `f32`, where the per-step tolerance (1.7e-4 relative to x_p ≈ 1) leaves 1 − x_p
/// unresolved until hydrogen recombines: x_e(444.3) = 1.0021 with Y_p = 0, Ω_b = Ω_m = 3.16,
/// Ω_k = −1, T0 = 10 K, N_eff = 10, w0 = 0.10, wa = −0.56 (found by the `thermal_history`
/// target). Held to the bound 1 now (the `f32` history of such a model stays coarse, as its
/// documentation says).
#[test]
fn f32_thermal_history_ionized_fraction_stays_within_its_bound() {
    let p = UniverseParameters::<f32> {
        h0_km_s_mpc: 190.408_87,
        omega_matter: 3.162_277_7,
        omega_baryon: 3.162_277_7,
        omega_curvature: -1.0,
        cmb_temperature_k: 10.0,
        n_eff: 10.0,
        neutrino_masses_ev: [1.0, 0.0001, 0.000_101_800_89],
        w0: 0.101_352_99,
        wa: -0.561_181_7,
        helium_mass_fraction: 0.0,
    };
    let u = Universe::new(p).unwrap();
    let options = HistoryOptions {
        reionization_redshift: Some(0.0),
        highest_redshift: 3_399.812_3,
        ..HistoryOptions::default()
    };
    let h = Box::new(ThermalHistory::new(&u, options).unwrap());
    let (x, z) = largest_ionized_fraction(&h, 400.0, 500.0, 4000, 444.335_17);
    assert!(x <= 1.0, "x_e({z}) = 1 + {:e}", x - 1.0);
    let (x, z) = largest_ionized_fraction(&h, 0.0, 3399.0, 20_000, 3_399.812_3);
    assert!(x <= 1.0, "x_e({z}) = 1 + {:e}", x - 1.0);
}
