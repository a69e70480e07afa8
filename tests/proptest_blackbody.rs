//! Property tests of every public blackbody function.
//!
//! Part 1, robustness: each function, in `f64` and in `f32`, is called with arbitrary inputs —
//! NaN, ±∞, ±0, subnormals, the largest floats, raw bit patterns and log-uniform values of
//! every scale — and must return `Ok` with a finite value or an `Err` naming an existing
//! argument, never panic, and never succeed on a NaN input (`proptest_support::contract`).
//!
//! Part 2, identities of the physics over random valid inputs, each with its source:
//! Stefan-Boltzmann (band over (0, ∞) = σT⁴/π), additivity of band integrals, the change of
//! variables between the wavelength, frequency and wavenumber forms, Wien's displacement law
//! (the peak is a maximum), the closed-form inversions (brightness, Rayleigh-Jeans, ratio and
//! band temperatures, calibration), the response-weighted radiance of a flat response, the
//! microwave conversions (dB_ν/dT, the Rayleigh-Jeans limit, the thermal SZ null).
//!
//! Tolerances are the documented accuracies of the functions involved (rustdoc of each) plus
//! the propagated rounding of the inputs an identity has to form (a conditioning factor times
//! ε), written next to each check.

mod proptest_support;

use proptest::prelude::*;
use proptest_support::{any32, any64, cases, contract, wide};
use relicore::blackbody as bb;
use relicore::blackbody::TwoLoadCalibration;

// ------------------------------------------------------------------------------------------
// Part 1: robustness of every function
// ------------------------------------------------------------------------------------------

/// A robustness property of a one-, two- or three-argument function, in f64 and f32.
macro_rules! robust {
    ($test:ident, $f:ident, 1) => {
        proptest! {
            #![proptest_config(cases(1000))]
            #[test]
            fn $test(a in any64(), a32 in any32()) {
                contract(stringify!($f), &[a], 1, bb::$f::<f64>(a))?;
                contract(stringify!($f), &wide(&[a32]), 1, bb::$f::<f32>(a32))?;
            }
        }
    };
    ($test:ident, $f:ident, 2) => {
        proptest! {
            #![proptest_config(cases(1000))]
            #[test]
            fn $test(a in any64(), b in any64(), a32 in any32(), b32 in any32()) {
                contract(stringify!($f), &[a, b], 2, bb::$f::<f64>(a, b))?;
                contract(stringify!($f), &wide(&[a32, b32]), 2, bb::$f::<f32>(a32, b32))?;
            }
        }
    };
    ($test:ident, $f:ident, 3) => {
        proptest! {
            #![proptest_config(cases(1000))]
            #[test]
            fn $test(a in any64(), b in any64(), c in any64(),
                     a32 in any32(), b32 in any32(), c32 in any32()) {
                contract(stringify!($f), &[a, b, c], 3, bb::$f::<f64>(a, b, c))?;
                contract(stringify!($f), &wide(&[a32, b32, c32]), 3, bb::$f::<f32>(a32, b32, c32))?;
            }
        }
    };
}

robust!(
    robust_spectral_radiance_wavelength,
    spectral_radiance_wavelength,
    2
);
robust!(
    robust_spectral_radiance_frequency,
    spectral_radiance_frequency,
    2
);
robust!(
    robust_spectral_radiance_wavenumber,
    spectral_radiance_wavenumber,
    2
);
robust!(
    robust_photon_radiance_wavelength,
    photon_radiance_wavelength,
    2
);
robust!(
    robust_photon_radiance_frequency,
    photon_radiance_frequency,
    2
);
robust!(
    robust_photon_radiance_wavenumber,
    photon_radiance_wavenumber,
    2
);
robust!(
    robust_radiance_temperature_derivative_wavelength,
    radiance_temperature_derivative_wavelength,
    2
);
robust!(
    robust_radiance_temperature_derivative_frequency,
    radiance_temperature_derivative_frequency,
    2
);
robust!(robust_radiant_exitance, radiant_exitance, 1);
robust!(robust_photon_exitance, photon_exitance, 1);
robust!(robust_peak_wavelength, peak_wavelength, 1);
robust!(robust_peak_frequency, peak_frequency, 1);
robust!(robust_peak_wavenumber, peak_wavenumber, 1);
robust!(robust_photon_peak_wavelength, photon_peak_wavelength, 1);
robust!(robust_photon_peak_frequency, photon_peak_frequency, 1);
robust!(
    robust_temperature_from_peak_wavelength,
    temperature_from_peak_wavelength,
    1
);
robust!(
    robust_temperature_from_peak_frequency,
    temperature_from_peak_frequency,
    1
);
robust!(robust_band_fraction_wavelength, band_fraction_wavelength, 3);
robust!(robust_band_radiance_wavelength, band_radiance_wavelength, 3);
robust!(
    robust_band_photon_radiance_wavelength,
    band_photon_radiance_wavelength,
    3
);
robust!(robust_band_radiance_frequency, band_radiance_frequency, 3);
robust!(
    robust_temperature_from_band_radiance_wavelength,
    temperature_from_band_radiance_wavelength,
    3
);
robust!(
    robust_brightness_temperature_wavelength,
    brightness_temperature_wavelength,
    2
);
robust!(
    robust_brightness_temperature_frequency,
    brightness_temperature_frequency,
    2
);
robust!(
    robust_rayleigh_jeans_temperature,
    rayleigh_jeans_temperature,
    2
);
robust!(
    robust_thermodynamic_to_rayleigh_jeans_factor,
    thermodynamic_to_rayleigh_jeans_factor,
    2
);
robust!(robust_kcmb_to_mjy_per_sr, kcmb_to_mjy_per_sr, 2);
robust!(
    robust_thermal_sz_spectral_shape,
    thermal_sz_spectral_shape,
    2
);
robust!(
    robust_thermal_sz_temperature_shape,
    thermal_sz_temperature_shape,
    2
);
robust!(
    robust_thermal_sz_null_frequency,
    thermal_sz_null_frequency,
    1
);

proptest! {
    #![proptest_config(cases(1000))]

    #[test]
    fn robust_ratio_temperature(
        a in any64(), b in any64(), c in any64(), d in any64(),
        a32 in any32(), b32 in any32(), c32 in any32(), d32 in any32(),
    ) {
        contract("ratio_temperature", &[a, b, c, d], 4, bb::ratio_temperature(a, b, c, d))?;
        contract(
            "ratio_temperature",
            &wide(&[a32, b32, c32, d32]),
            4,
            bb::ratio_temperature(a32, b32, c32, d32),
        )?;
    }

    /// two_load_calibration on arbitrary inputs; a calibration it produced, and arbitrary
    /// calibration values it could not have produced, then read with arbitrary readings.
    #[test]
    fn robust_two_load_calibration(
        x in proptest::collection::vec(any64(), 5),
        x32 in proptest::collection::vec(any32(), 5),
        forged in proptest::collection::vec(any64(), 3),
        reading in any64(),
        reading32 in any32(),
    ) {
        let cal = bb::two_load_calibration(x[0], x[1], x[2], x[3], x[4]);
        contract("two_load_calibration", &x, 5, cal.map(|c| c.gain))?;
        contract("two_load_calibration", &x, 5, cal.map(|c| c.offset))?;
        let cal32 = bb::two_load_calibration(x32[0], x32[1], x32[2], x32[3], x32[4]);
        contract("two_load_calibration", &wide(&x32), 5, cal32.map(|c| c.gain))?;
        contract("two_load_calibration", &wide(&x32), 5, cal32.map(|c| c.offset))?;
        let forged = TwoLoadCalibration { frequency_hz: forged[0], gain: forged[1], offset: forged[2] };
        for c in [cal.ok(), Some(forged)].into_iter().flatten() {
            let inputs = [c.frequency_hz, c.gain, c.offset, reading];
            contract("calibrated_temperature", &inputs, 2, bb::calibrated_temperature(&c, reading))?;
            contract(
                "calibrated_brightness_temperature",
                &inputs,
                2,
                bb::calibrated_brightness_temperature(&c, reading),
            )?;
        }
        if let Ok(c) = cal32 {
            let inputs = wide(&[c.frequency_hz, c.gain, c.offset, reading32]);
            contract("calibrated_temperature", &inputs, 2, bb::calibrated_temperature(&c, reading32))?;
            contract(
                "calibrated_brightness_temperature",
                &inputs,
                2,
                bb::calibrated_brightness_temperature(&c, reading32),
            )?;
        }
    }
}

/// A response table: arbitrary values and lengths (0 to 6, the two arrays of different
/// lengths), or an increasing table of physical wavelengths with a non-negative response.
fn table() -> impl Strategy<Value = (Vec<f64>, Vec<f64>)> {
    let hostile = (
        proptest::collection::vec(any64(), 0..7),
        proptest::collection::vec(any64(), 0..7),
    );
    let valid = (2usize..7).prop_flat_map(|n| {
        (
            -8.0f64..-1.0,
            proptest::collection::vec(0.01f64..1.0, n),
            proptest::collection::vec(0.0f64..1.0, n),
        )
            .prop_map(|(start, steps, response)| {
                let mut w = Vec::with_capacity(steps.len());
                let mut l = 10f64.powf(start);
                for s in steps {
                    w.push(l);
                    l *= 1.0 + s;
                }
                (w, response)
            })
    });
    prop_oneof![1 => hostile, 2 => valid]
}

proptest! {
    #![proptest_config(cases(300))]

    #[test]
    fn robust_response_weighted_radiance((w, r) in table(), t in any64()) {
        let mut inputs = w.clone();
        inputs.extend(&r);
        inputs.push(t);
        contract("response_weighted_radiance", &inputs, 3, bb::response_weighted_radiance(&w, &r, t))?;
        let w32: Vec<f32> = w.iter().map(|&v| v as f32).collect();
        let r32: Vec<f32> = r.iter().map(|&v| v as f32).collect();
        contract(
            "response_weighted_radiance (f32)",
            &inputs,
            3,
            bb::response_weighted_radiance(&w32, &r32, t as f32),
        )?;
    }

    #[test]
    fn robust_temperature_from_response_weighted_radiance((w, r) in table(), l in any64()) {
        let mut inputs = w.clone();
        inputs.extend(&r);
        inputs.push(l);
        contract(
            "temperature_from_response_weighted_radiance",
            &inputs,
            3,
            bb::temperature_from_response_weighted_radiance(&w, &r, l),
        )?;
        let w32: Vec<f32> = w.iter().map(|&v| v as f32).collect();
        let r32: Vec<f32> = r.iter().map(|&v| v as f32).collect();
        contract(
            "temperature_from_response_weighted_radiance (f32)",
            &inputs,
            3,
            bb::temperature_from_response_weighted_radiance(&w32, &r32, l as f32),
        )?;
    }
}

// ------------------------------------------------------------------------------------------
// Part 2: identities of the physics over random valid inputs (f64)
// ------------------------------------------------------------------------------------------

use proptest_support::{close, log_uniform, ok};

const EPS: f64 = f64::EPSILON;
/// Exact SI 2019 defining constants (BIPM, The International System of Units, 9th ed., 2019).
const C: f64 = 299_792_458.0;
const H: f64 = 6.626_070_15e-34;
const K: f64 = 1.380_649e-23;
/// Apéry's constant ζ(3) = 1.2020569031595942854… (DLMF §25.6), rounded to double.
const ZETA3: f64 = 1.202_056_903_159_594_3;

/// σ = 2π⁵k⁴/(15h³c²), formed here from the exact constants (Stefan 1879, Boltzmann 1884;
/// closed form of ∫ B_ν dν dΩ); relative rounding of this evaluation below 12 ε.
fn sigma() -> f64 {
    let pi = std::f64::consts::PI;
    2.0 * pi.powi(5) * K.powi(4) / (15.0 * H.powi(3) * C * C)
}

/// x = hc/(λkT), to a few ε.
fn x_of(wavelength: f64, t: f64) -> f64 {
    H * C / (wavelength * K * t)
}

/// A wavelength and temperature with x = hc/λkT between 1e-6 and 600 (Rayleigh-Jeans limit
/// to deep Wien tail, every result a normal double): λ log-uniform in [1e-8, 1] m.
fn planck_point() -> impl Strategy<Value = (f64, f64)> {
    (log_uniform(-8.0, 0.0), log_uniform(-6.0, 2.78)).prop_map(|(l, x)| (l, H * C / (l * K * x)))
}

proptest! {
    #![proptest_config(cases(500))]

    /// Stefan-Boltzmann: ∫₀^∞ B_λ dλ = ∫₀^∞ B_ν dν = σT⁴/π and the band fraction of (0, ∞)
    /// is 1; πσT⁴/π = radiant_exitance; ∫₀^∞ N_λ dλ = 4ζ(3)k³T³/(h³c²)... × π = photon
    /// exitance (closed forms, e.g. Modest 2013 ch. 1). Tolerance: the documented band
    /// accuracy 1e-14 relative (2 ulp for the exitances) plus 16 ε for σ and T⁴ formed here.
    #[test]
    fn stefan_boltzmann_law(t in log_uniform(-2.0, 8.0)) {
        let total = sigma() * t.powi(4) / std::f64::consts::PI;
        let tol = (1e-14 + 16.0 * EPS) * total;
        close("band_radiance_wavelength(0, inf)",
              ok("band", bb::band_radiance_wavelength(0.0, f64::INFINITY, t))?, total, tol)?;
        close("band_radiance_frequency(0, inf)",
              ok("band", bb::band_radiance_frequency(0.0, f64::INFINITY, t))?, total, tol)?;
        close("band_fraction_wavelength(0, inf)",
              ok("fraction", bb::band_fraction_wavelength(0.0, f64::INFINITY, t))?, 1.0, 1e-15)?;
        close("radiant_exitance", ok("exitance", bb::radiant_exitance(t))?,
              sigma() * t.powi(4), 18.0 * EPS * sigma() * t.powi(4))?;
        // photon exitance 4πζ(3)k³T³/(h³c²) (the photon analogue: 2ζ(3) = ∫ t²/(eᵗ−1) dt)
        let pi = std::f64::consts::PI;
        let photons = 4.0 * pi * ZETA3 * (K * t).powi(3) / (H.powi(3) * C * C);
        close("photon_exitance", ok("photon", bb::photon_exitance(t))?, photons, 16.0 * EPS * photons)?;
        close("pi * band_photon_radiance_wavelength(0, inf)",
              pi * ok("band photon", bb::band_photon_radiance_wavelength(0.0, f64::INFINITY, t))?,
              photons, (1e-14 + 16.0 * EPS) * photons)?;
    }

    /// Additivity of the band integral, L(λ₁, λ₂) + L(λ₂, λ₃) = L(λ₁, λ₃) (linearity of the
    /// integral). Tolerance: the documented accuracy max(1e-14·L, 1e-15·σT⁴/π) of each term.
    #[test]
    fn band_integrals_add_up(t in log_uniform(0.0, 5.0), e in prop::array::uniform3(-1.5f64..1.5)) {
        let mut edges = e.map(|v| bb::peak_wavelength(t).unwrap_or(f64::NAN) * 10f64.powf(v));
        edges.sort_by(f64::total_cmp);
        prop_assume!(edges[0] < edges[1] && edges[1] < edges[2]);
        let total = sigma() * t.powi(4) / std::f64::consts::PI;
        let acc = |l: f64| (1e-14 * l).max(1e-15 * total);
        let a = ok("a", bb::band_radiance_wavelength(edges[0], edges[1], t))?;
        let b = ok("b", bb::band_radiance_wavelength(edges[1], edges[2], t))?;
        let ab = ok("ab", bb::band_radiance_wavelength(edges[0], edges[2], t))?;
        close("L(l1,l2) + L(l2,l3) vs L(l1,l3)", a + b, ab, acc(a) + acc(b) + acc(ab) + 2.0 * EPS * ab)?;
        let fa = ok("fa", bb::band_fraction_wavelength(edges[0], edges[1], t))?;
        let fb = ok("fb", bb::band_fraction_wavelength(edges[1], edges[2], t))?;
        let fab = ok("fab", bb::band_fraction_wavelength(edges[0], edges[2], t))?;
        close("F(l1,l2) + F(l2,l3) vs F(l1,l3)", fa + fb, fab, 3e-15 + 2.0 * EPS)?;
        let pa = ok("pa", bb::band_photon_radiance_wavelength(edges[0], edges[1], t))?;
        let pb = ok("pb", bb::band_photon_radiance_wavelength(edges[1], edges[2], t))?;
        let pab = ok("pab", bb::band_photon_radiance_wavelength(edges[0], edges[2], t))?;
        let ptotal = ok("pt", bb::band_photon_radiance_wavelength(0.0, f64::INFINITY, t))?;
        let pacc = |n: f64| (1e-14 * n).max(1e-15 * ptotal);
        close("N(l1,l2) + N(l2,l3) vs N(l1,l3)", pa + pb, pab, pacc(pa) + pacc(pb) + pacc(pab) + 2.0 * EPS * pab)?;
    }

    /// Change of variables ν = c/λ: ∫_{λ₁}^{λ₂} B_λ dλ = ∫_{c/λ₂}^{c/λ₁} B_ν dν. Tolerance:
    /// the documented accuracy of both, plus the rounding of c/λ at each edge (ε relative,
    /// moving the integral by ε·λB_λ at that edge).
    #[test]
    fn band_in_wavelength_equals_band_in_frequency(t in log_uniform(0.0, 5.0), e in prop::array::uniform2(-1.5f64..1.5)) {
        let peak = ok("peak", bb::peak_wavelength(t))?;
        let (l1, l2) = (peak * 10f64.powf(e[0].min(e[1])), peak * 10f64.powf(e[0].max(e[1])));
        prop_assume!(l1 < l2);
        let total = sigma() * t.powi(4) / std::f64::consts::PI;
        let lw = ok("lambda", bb::band_radiance_wavelength(l1, l2, t))?;
        let lf = ok("nu", bb::band_radiance_frequency(C / l2, C / l1, t))?;
        let edge = |l: f64| l * bb::spectral_radiance_wavelength(l, t).unwrap_or(f64::NAN);
        let tol = (1e-14 * lw).max(1e-15 * total) * 2.0 + 2.0 * EPS * (edge(l1) + edge(l2));
        close("band lambda vs band nu", lf, lw, tol)?;
    }

    /// The spectral forms are one law in three variables: B_ν(c/λ)·c/λ² = B_λ(λ),
    /// B_ṽ(1/λ)/λ² = B_λ(λ), and the photon forms divide by the photon energy:
    /// N_λ = B_λ λ/(hc), N_ν = B_ν/(hν), N_ṽ = B_ṽ/(hcṽ) (Planck 1901; any radiometry text).
    /// Tolerance: 4 ulp per function (documented), 4 ε for the products here, and the
    /// conditioning |d ln B/d ln ν| ≤ 3 + x times the ε rounding of c/λ or 1/λ.
    #[test]
    fn planck_forms_agree((l, t) in planck_point()) {
        let x = x_of(l, t);
        let bl = ok("B_lambda", bb::spectral_radiance_wavelength(l, t))?;
        let nu = C / l;
        let v = 1.0 / l;
        let bn = ok("B_nu", bb::spectral_radiance_frequency(nu, t))?;
        let bv = ok("B_v", bb::spectral_radiance_wavenumber(v, t))?;
        let cond = (3.0 + x) * EPS;
        let rel = 12.0 * EPS + cond;
        close("B_nu(c/l) c/l^2 vs B_lambda", bn * nu / l, bl, rel * bl)?;
        close("B_v(1/l) / l^2 vs B_lambda", bv * v / l, bl, rel * bl)?;
        let nl = ok("N_lambda", bb::photon_radiance_wavelength(l, t))?;
        close("N_lambda hc/l vs B_lambda", nl * (H * C / l), bl, 12.0 * EPS * bl)?;
        let nn = ok("N_nu", bb::photon_radiance_frequency(nu, t))?;
        close("N_nu h nu vs B_nu", nn * (H * nu), bn, 12.0 * EPS * bn)?;
        let nv = ok("N_v", bb::photon_radiance_wavenumber(v, t))?;
        close("N_v h c v vs B_v", nv * (H * C * v), bv, 12.0 * EPS * bv)?;
        // and the temperature derivatives transform like B: dB_ν/dT (c/λ)·c/λ² = dB_λ/dT
        let dl = ok("dB_lambda/dT", bb::radiance_temperature_derivative_wavelength(l, t))?;
        let dn = ok("dB_nu/dT", bb::radiance_temperature_derivative_frequency(nu, t))?;
        close("dB_nu/dT c/l^2 vs dB_lambda/dT", dn * nu / l, dl, (20.0 * EPS + cond + x * EPS) * dl)?;
    }

    /// ∂B/∂T against central differences of B itself, with Richardson's a-posteriori bound:
    /// the error of the step-h/2 difference is below |D(h) − D(h/2)| (the truncation error is
    /// O(h²) and shrinks by 4), plus the rounding 8 ulp·B·T/h of the differences.
    #[test]
    fn temperature_derivative_is_the_derivative((l, t0) in planck_point()) {
        let x = x_of(l, t0);
        prop_assume!(x > 1e-3 && x < 50.0);
        let b = |t: f64| bb::spectral_radiance_wavelength(l, t).unwrap_or(f64::NAN);
        let d = |h: f64| (b(t0 + h) - b(t0 - h)) / (2.0 * h);
        let h = 1e-3 * t0 / x.max(1.0);
        let (d1, d2) = (d(h), d(h / 2.0));
        let want = ok("dB/dT", bb::radiance_temperature_derivative_wavelength(l, t0))?;
        let tol = (d1 - d2).abs() + 16.0 * EPS * b(t0) * t0 / h / t0 + 8.0 * EPS * want;
        close("dB_lambda/dT vs central difference", d2, want, tol)?;
        let nu = C / l;
        let bn = |t: f64| bb::spectral_radiance_frequency(nu, t).unwrap_or(f64::NAN);
        let dn = |h: f64| (bn(t0 + h) - bn(t0 - h)) / (2.0 * h);
        let (e1, e2) = (dn(h), dn(h / 2.0));
        let want = ok("dB_nu/dT", bb::radiance_temperature_derivative_frequency(nu, t0))?;
        let tol = (e1 - e2).abs() + 16.0 * EPS * bn(t0) / h + 8.0 * EPS * want;
        close("dB_nu/dT vs central difference", e2, want, tol)?;
    }

    /// Wien's displacement law: each peak is a maximum of its form (the value 1e-4 either side
    /// is lower: the drop, about 1e-8 relative, is far above the 4-ulp accuracy), and the
    /// peaks invert: T(λ_max(T)) = T, T(ν_max(T)) = T within 2 roundings each way.
    #[test]
    fn peaks_are_maxima_and_invert(t in log_uniform(-1.0, 6.0)) {
        let around = |f: &dyn Fn(f64) -> f64, p: f64, what: &str| -> std::result::Result<(), TestCaseError> {
            let top = f(p);
            prop_assert!(f(p * (1.0 - 1e-4)) < top && f(p * (1.0 + 1e-4)) < top,
                "{what}: not a maximum at {p:e} for T = {t:e}");
            Ok(())
        };
        let lm = ok("peak_wavelength", bb::peak_wavelength(t))?;
        around(&|l| bb::spectral_radiance_wavelength(l, t).unwrap_or(f64::NAN), lm, "B_lambda")?;
        let nm = ok("peak_frequency", bb::peak_frequency(t))?;
        around(&|n| bb::spectral_radiance_frequency(n, t).unwrap_or(f64::NAN), nm, "B_nu")?;
        let vm = ok("peak_wavenumber", bb::peak_wavenumber(t))?;
        around(&|v| bb::spectral_radiance_wavenumber(v, t).unwrap_or(f64::NAN), vm, "B_v")?;
        let plm = ok("photon_peak_wavelength", bb::photon_peak_wavelength(t))?;
        around(&|l| bb::photon_radiance_wavelength(l, t).unwrap_or(f64::NAN), plm, "N_lambda")?;
        let pnm = ok("photon_peak_frequency", bb::photon_peak_frequency(t))?;
        around(&|n| bb::photon_radiance_frequency(n, t).unwrap_or(f64::NAN), pnm, "N_nu")?;
        close("T(peak_wavelength(T))", ok("inv", bb::temperature_from_peak_wavelength(lm))?, t, 4.0 * EPS * t)?;
        close("T(peak_frequency(T))", ok("inv", bb::temperature_from_peak_frequency(nm))?, t, 4.0 * EPS * t)?;
        // the frequency and wavenumber peaks are the same x: ν_max = c·ṽ_max
        close("peak_frequency = c peak_wavenumber", nm, C * vm, 4.0 * EPS * nm)?;
    }

    /// Brightness temperature is the closed-form inverse of Planck's law: T_b(λ, B_λ(λ, T)) =
    /// T, T_b(ν, B_ν(ν, T)) = T (documented round trip 1e-14 relative).
    #[test]
    fn brightness_temperature_inverts_planck((l, t) in planck_point()) {
        let bl = ok("B_lambda", bb::spectral_radiance_wavelength(l, t))?;
        close("T_b(l, B_lambda)", ok("T_b", bb::brightness_temperature_wavelength(l, bl))?, t, 1e-14 * t)?;
        let nu = C / l;
        let bn = ok("B_nu", bb::spectral_radiance_frequency(nu, t))?;
        close("T_b(nu, B_nu)", ok("T_b", bb::brightness_temperature_frequency(nu, bn))?, t, 1e-14 * t)?;
        // Rayleigh-Jeans temperature c²B_ν/(2kν²) of a blackbody: T·x/(eˣ − 1) (closed form);
        // tolerance 2 + 4 ulp and the conditioning x of x/(eˣ−1) times the 3 ε of x here.
        let x = H * nu / (K * t);
        if x < 30.0 {
            let want = t * x / x.exp_m1();
            close("T_RJ(nu, B_nu)", ok("T_RJ", bb::rayleigh_jeans_temperature(nu, bn))?, want,
                  (10.0 + 3.0 * x) * EPS * want)?;
        }
    }

    /// The ratio temperature inverts ε₁B_λ(λ₁,T)/(ε₂B_λ(λ₂,T)). Tolerance: the documented
    /// 1e-13 relative plus the rounding of the ratio formed here (10 ε) divided by its
    /// sensitivity d ln R/d ln T = x₁/(1−e^−x₁) − x₂/(1−e^−x₂).
    #[test]
    fn ratio_temperature_inverts_planck(
        t in log_uniform(1.0, 4.0),
        x1 in log_uniform(-2.0, 2.0),
        x2 in log_uniform(-2.0, 2.0),
        e in 0.2f64..5.0,
    ) {
        prop_assume!((x1 - x2).abs() >= 0.5);
        let (l1, l2) = (H * C / (x1 * K * t), H * C / (x2 * K * t));
        let b1 = ok("B1", bb::spectral_radiance_wavelength(l1, t))?;
        let b2 = ok("B2", bb::spectral_radiance_wavelength(l2, t))?;
        let sens = (x1 / -(-x1).exp_m1() - x2 / -(-x2).exp_m1()).abs();
        let got = ok("ratio_temperature", bb::ratio_temperature(l1, l2, e * b1 / b2, e))?;
        close("ratio_temperature", got, t, (1e-13 + 10.0 * EPS / sens) * t)?;
    }

    /// The band temperature inverts the band radiance (documented round trip 1e-14 relative),
    /// for bands holding at least 1e-3 of the emission (where the band radiance itself is
    /// accurate to 1e-12 relative).
    #[test]
    fn band_temperature_inverts_band_radiance(t in log_uniform(0.0, 5.0), e in prop::array::uniform2(-1.0f64..1.0)) {
        let peak = ok("peak", bb::peak_wavelength(t))?;
        let (l1, l2) = (peak * 10f64.powf(e[0].min(e[1])), peak * 10f64.powf(e[0].max(e[1])));
        prop_assume!(l1 < l2);
        prop_assume!(bb::band_fraction_wavelength(l1, l2, t).unwrap_or(0.0) >= 1e-3);
        let l = ok("band", bb::band_radiance_wavelength(l1, l2, t))?;
        let got = ok("T(band)", bb::temperature_from_band_radiance_wavelength(l1, l2, l))?;
        close("temperature_from_band_radiance_wavelength", got, t, 1e-14 * t)?;
    }

    /// A flat response r = 1 on [λ₁, λ₂] measures the band radiance (documented accuracy
    /// 1e-13 relative for the response form, 1e-14 for the band); scaling the response by a
    /// power of two scales the result exactly (the quadrature is linear and its stopping test
    /// relative); the inverse recovers T (documented round trip 1e-14 relative).
    #[test]
    fn response_weighted_radiance_identities(
        t in log_uniform(1.0, 4.0),
        e in prop::array::uniform2(-0.7f64..0.7),
        k in -20i32..20,
        shape in prop::array::uniform3(0.05f64..1.0),
    ) {
        let peak = ok("peak", bb::peak_wavelength(t))?;
        let (l1, l2) = (peak * 10f64.powf(e[0].min(e[1])), peak * 10f64.powf(e[0].max(e[1])));
        prop_assume!(l1 < l2 && l2 / l1 > 1.01);
        let w = [l1, l2];
        let flat = ok("flat", bb::response_weighted_radiance(&w, &[1.0, 1.0], t))?;
        let band = ok("band", bb::band_radiance_wavelength(l1, l2, t))?;
        close("flat response vs band radiance", flat, band, 1.1e-13 * band)?;
        let lm = 0.5 * (l1 + l2);
        let w3 = [l1, lm, l2];
        let scale = 2f64.powi(k);
        let r = ok("r", bb::response_weighted_radiance(&w3, &shape, t))?;
        let scaled = shape.map(|v| v * scale);
        let rs = ok("r scaled", bb::response_weighted_radiance(&w3, &scaled, t))?;
        prop_assert_eq!(rs.to_bits(), (r * scale).to_bits(), "scaling by 2^{} not exact", k);
        let back = ok("inverse", bb::temperature_from_response_weighted_radiance(&w3, &shape, r))?;
        close("temperature_from_response_weighted_radiance", back, t, 1e-14 * t)?;
    }

    /// Two-load calibration: the line goes through both loads, so each load's reading gives
    /// back its temperature (documented 1e-13 relative), and the brightness temperature of a
    /// reading is the Rayleigh-Jeans brightness J = (hν/k)/(e^(hν/kT) − 1) of the load
    /// (closed form; plus the conditioning x·3 ε of J formed here). Both also carry the
    /// conditioning of the line itself: the offset is formed from the readings and J =
    /// (reading − offset)/gain, so J carries an absolute error of a few ε·(|reading| +
    /// |reading_hot| + |reading_cold| + |offset|)/|gain| (large relative to J when the readings
    /// sit far from zero compared with their span, or when J of the cold load is far below J of
    /// the hot one, as for a 3 K load at 1 THz), and T = θ/ln(1 + θ/J) passes a relative error of
    /// J on with a factor below 1.
    #[test]
    fn calibration_reproduces_its_loads(
        nu in log_uniform(9.0, 12.0),
        tc in log_uniform(0.5, 2.5),
        ratio in 1.1f64..20.0,
        reading_cold in -1e3f64..1e3,
        span in log_uniform(-2.0, 4.0),
    ) {
        let th = tc * ratio;
        let reading_hot = reading_cold + span;
        let cal = ok("cal", bb::two_load_calibration(nu, reading_hot, th, reading_cold, tc))?;
        for (r, t) in [(reading_hot, th), (reading_cold, tc)] {
            let x = H * nu / (K * t);
            let j = (H * nu / K) / x.exp_m1();
            let line = 4.0 * EPS * (r.abs() + reading_hot.abs() + reading_cold.abs() + cal.offset.abs())
                / cal.gain.abs();
            let got = ok("J", bb::calibrated_brightness_temperature(&cal, r))?;
            close("J(reading)", got, j, (1e-13 + 3.0 * (1.0 + x) * EPS) * j + line)?;
            let got = ok("T", bb::calibrated_temperature(&cal, r))?;
            close("T(reading of a load)", got, t, 1e-13 * t + line * t / j)?;
        }
    }

    /// Microwave conversions: K_CMB → MJy/sr is 1e20·dB_ν/dT (README, microwave conversions), and dT_RJ/dT_CMB =
    /// c²/(2kν²)·dB_ν/dT (derivative of the Rayleigh-Jeans temperature); tolerance: 8 ulp for
    /// each function (documented) and 4 ε here. In the Rayleigh-Jeans limit x ≪ 1:
    /// ((x/2)/sinh(x/2))² = 1 − x²/12 + O(x⁴) and x coth(x/2) − 4 = −2 + x²/6 + O(x⁴)
    /// (Taylor series of closed forms).
    #[test]
    fn microwave_conversions(nu in log_uniform(8.0, 13.0), t0 in 1.0f64..10.0) {
        let db = ok("dB_nu/dT", bb::radiance_temperature_derivative_frequency(nu, t0))?;
        let kc = ok("kcmb", bb::kcmb_to_mjy_per_sr(nu, t0))?;
        close("kcmb_to_mjy_per_sr vs 1e20 dB/dT", kc, 1e20 * db, 20.0 * EPS * kc)?;
        let f = ok("rj factor", bb::thermodynamic_to_rayleigh_jeans_factor(nu, t0))?;
        let want = C * C / (2.0 * K * nu * nu) * db;
        close("thermodynamic_to_rayleigh_jeans_factor", f, want, 22.0 * EPS * want)?;
        let x = H * nu / (K * t0);
        if x < 1e-3 {
            prop_assert!((1.0 - f) >= -8.0 * EPS && (1.0 - f) <= x * x / 12.0 + 8.0 * EPS,
                "RJ limit of the factor: 1 - {f:e} vs x^2/12 = {:e}", x * x / 12.0);
            let shape = ok("f(x)", bb::thermal_sz_temperature_shape(nu, t0))?;
            prop_assert!((shape + 2.0).abs() <= x * x / 6.0 + 8.0 * EPS,
                "RJ limit of the SZ shape: {shape:e} vs -2");
        }
        // g(x) = x² · dT_RJ/dT_CMB · f(x) (g = x⁴eˣ/(eˣ−1)² f, factor = x²eˣ/(eˣ−1)²)
        let shape = ok("f(x)", bb::thermal_sz_temperature_shape(nu, t0))?;
        let g = ok("g(x)", bb::thermal_sz_spectral_shape(nu, t0))?;
        let want = x * x * f * shape;
        let tol = 2e-15 * (x + 4.0) * x * x * f + 16.0 * EPS * want.abs();
        close("thermal_sz_spectral_shape vs x^2 factor f", g, want, tol)?;
    }

    /// The thermal SZ null: f(x₀) = 0 at ν₀ = thermal_sz_null_frequency(T₀) (within its
    /// documented 1e-15·(x+4) plus f' ≈ 1 times the 4 ε of x), and f changes sign there.
    #[test]
    fn thermal_sz_null_is_the_zero(t0 in log_uniform(-1.0, 3.0)) {
        let nu0 = ok("null", bb::thermal_sz_null_frequency(t0))?;
        let x0 = H * nu0 / (K * t0);
        let f0 = ok("f(nu0)", bb::thermal_sz_temperature_shape(nu0, t0))?;
        prop_assert!(f0.abs() <= 1e-15 * (x0 + 4.0) + 4.0 * EPS * x0, "f(nu0) = {f0:e}");
        let below = ok("f-", bb::thermal_sz_temperature_shape(nu0 * (1.0 - 1e-6), t0))?;
        let above = ok("f+", bb::thermal_sz_temperature_shape(nu0 * (1.0 + 1e-6), t0))?;
        prop_assert!(below < 0.0 && above > 0.0, "no sign change: {below:e} {above:e}");
        let g0 = ok("g(nu0)", bb::thermal_sz_spectral_shape(nu0, t0))?;
        prop_assert!(g0.abs() <= 1e-15 * (x0 + 4.0) * x0.powi(4) + 1e-13, "g(nu0) = {g0:e}");
    }
}
