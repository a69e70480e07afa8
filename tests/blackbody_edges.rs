//! Edges of the closed-form brightness temperatures found by the fuzzing (issue of coverage-
//! guided fuzzing): where 2hν³/c² is below the normal range (far-infrared frequencies of
//! 1e-95 Hz and less, subnormal radiances), ln(1 + a/L) is formed from logarithms; its first
//! form returned ln a − ln L + (ln L − ln a) = 0 there, so the temperature was refused.
//! Expected values: T = (hν/k)/ln(1 + 2hν³/(c²L)) in mpmath at 50 digits from the exact SI h, c,
//! k and the exact binary values of the arguments (mpmath, `mp.log1p(a/L)`, rounded to the
//! nearest double); tolerance 5e-13 relative, the documented accuracy of this
//! regime (the logarithms carry an absolute error of about ulp(ln a), ln a ≈ −800).

use relicore::blackbody::brightness_temperature_frequency;

#[test]
fn brightness_temperature_with_an_underflowing_prefactor() {
    for (nu, l, want) in [
        (1e-100, 5e-324, 1.608_099_009_363_606_4e-84),
        (1e-100, 1e-320, 3.254_792_394_951_939_3e-81),
        (1e-95, 1e-310, 3.254_828_630_364_469_7e-81),
        (1e-105, 2e-323, 6.432_396_037_454_427e-74),
    ] {
        let got = brightness_temperature_frequency(nu, l).unwrap_or(f64::NAN);
        let rel = ((got - want) / want).abs();
        assert!(
            rel < 5e-13,
            "nu {nu:e}, L {l:e}: {got:e} vs {want:e} ({rel:e})"
        );
    }
}

/// The band inverse far from its starting guess (fuzz finding): the bracket grew by at most
/// 2^±400 from the guess, so temperatures inside the documented 1e-120 … 1e120 K were refused
/// for bands far from the thermal range. The contract checked: the inverse reproduces the
/// temperature whose band radiance it is given, within the documented 1e-14.
#[test]
fn band_inverse_far_from_its_guess() {
    use relicore::blackbody::{
        band_radiance_wavelength, temperature_from_band_radiance_wavelength,
    };
    for (lo, up, t) in [(1.2e-307, 5.2e54, 4.4), (2.9e-246, 9.96e-5, 3.0e69)] {
        let l = band_radiance_wavelength(lo, up, t).unwrap_or(f64::NAN);
        assert!(l.is_normal(), "[{lo:e}, {up:e}] at {t}: {l:e}");
        let back = temperature_from_band_radiance_wavelength(lo, up, l);
        let rel = back.map(|b| ((b - t) / t).abs());
        assert!(
            matches!(rel, Ok(r) if r <= 1e-14),
            "[{lo:e}, {up:e}] at {t}: {back:?}"
        );
    }
}

/// Band radiance where e^−x at the band's upper edge is below the normal range while the
/// radiance is a normal number (fuzz finding: up to 1e-10 relative lost, so the inverse missed
/// its 1e-14 round trip). Expected: K4 T⁴ Σ e^(−nx)(x³/n + 3x²/n² + 6x/n³ + 6/n⁴), x = hc/(λkT),
/// in mpmath at 50 digits (exact SI constants), rounded to double; tolerance the documented
/// 1e-14, and the inverse's round trip within 1e-14.
#[test]
fn band_radiance_with_a_subnormal_exponential() {
    use relicore::blackbody::{
        band_radiance_wavelength, temperature_from_band_radiance_wavelength,
    };
    for (up, t, want) in [
        (2.07e-9, 9504.0, 2.161_346_340_791_177_7e-302),
        (2.07e-9, 9600.0, 3.275_345_117_450_410_5e-299),
        (1e-9, 20000.0, 6.227_977_514_255_475e-296),
    ] {
        let l = band_radiance_wavelength(0.0, up, t).unwrap_or(f64::NAN);
        let rel = ((l - want) / want).abs();
        assert!(
            rel <= 1e-14,
            "[0, {up:e}] at {t}: {l:e} vs {want:e} ({rel:e})"
        );
        let back = temperature_from_band_radiance_wavelength(0.0, up, l).unwrap_or(f64::NAN);
        assert!(
            ((back - t) / t).abs() <= 1e-14,
            "[0, {up:e}] at {t}: back {back}"
        );
    }
}

fn rel(got: f64, want: f64) -> f64 {
    ((got - want) / want).abs()
}

/// Planck's law where 2hν³/c² or x = hν/kT is below the normal range, or λ⁵ overflows, while
/// the radiance is normal (fuzz findings: the rounded prefactor or x had lost its bits, 2.3e-3
/// relative at ν = 3.07e-91 Hz, T = 0.01 K and 9e-3 at ν = 1.04e-13 Hz, T = 1e300 K; B_λ = 0 at
/// λ = 1e62 m). Expected: Planck's law in mpmath at 40 digits (`fuzz/regression_values.py`,
/// section 6); tolerance 4 ulp, the documented accuracy for normal results.
#[test]
fn planck_law_with_an_underflowing_prefactor_or_x() {
    use relicore::blackbody::{spectral_radiance_frequency, spectral_radiance_wavelength};
    let ulp4 = 4.0 * f64::EPSILON;
    for (nu, t, want) in [
        (3.068_183_443_135_621_4e-91, 0.01, 2.892_241_254_396_67e-223),
        (
            1.038_885_361_494_186_7e-13,
            1e300,
            3.315_943_531_583_252e234,
        ),
    ] {
        let got = spectral_radiance_frequency(nu, t).unwrap_or(f64::NAN);
        assert!(
            rel(got, want) <= ulp4,
            "B_nu({nu:e}, {t:e}) = {got:e}, want {want:e}"
        );
    }
    for (l, t, want) in [
        (1.04e59, 0.01, 7.076_208_552_002_083e-253),
        (1e62, 1.0, 8.278_163_146_904_839e-263),
        (1e10, 1e300, 8.278_163_146_904_84e245),
    ] {
        let got = spectral_radiance_wavelength(l, t).unwrap_or(f64::NAN);
        assert!(
            rel(got, want) <= ulp4,
            "B_lambda({l:e}, {t:e}) = {got:e}, want {want:e}"
        );
    }
}

/// Brightness temperatures where a/L < 1 and a = 2hc²/λ⁵ (or 2hν³/c²) or a/L is below the normal
/// range (fuzz findings): ln(1 + a/L) was formed from ln a − ln L, whose absolute error
/// |ln a|·ε became the relative error of the result, 1.4e-13 at λ = 1.04e59 m, T = 0.01 K and
/// 3.6e-14 at λ = 1 m, T = 1.38e306 K (documented: 1e-14). Expected: Planck's law solved for T
/// in mpmath (`fuzz/regression_values.py`, section 6), within the documented 1e-14; and the
/// round trips T → B → T of the found inputs within 1e-14.
#[test]
fn brightness_temperature_with_a_subnormal_quotient() {
    use relicore::blackbody::{
        brightness_temperature_wavelength, spectral_radiance_frequency,
        spectral_radiance_wavelength,
    };
    for (l, b, want) in [
        (1.04e59, 7e-253, 9.892_303_128_939_692e-3),
        (1.0, 1.1e292, 1.328_797_198_701_361_6e306),
    ] {
        let got = brightness_temperature_wavelength(l, b).unwrap_or(f64::NAN);
        assert!(
            rel(got, want) <= 1e-14,
            "T_b({l:e}, {b:e}) = {got:e}, want {want:e}"
        );
    }
    for (nu, b, want) in [
        (
            3.068_183_443_135_621_4e-91,
            2.9e-223,
            1.002_682_606_643_389_7e-2,
        ),
        (1e-13, 3e234, 9.764_485_891_093_437e299),
    ] {
        let got = brightness_temperature_frequency(nu, b).unwrap_or(f64::NAN);
        assert!(
            rel(got, want) <= 1e-14,
            "T_b({nu:e}, {b:e}) = {got:e}, want {want:e}"
        );
    }
    for (l, t) in [(1.04e59, 0.01), (1.0, 1.38e306)] {
        let b = spectral_radiance_wavelength(l, t).unwrap();
        let back = brightness_temperature_wavelength(l, b).unwrap_or(f64::NAN);
        assert!(
            rel(back, t) <= 1e-14,
            "lambda {l:e}, T {t:e}: back {back:e}"
        );
    }
    for (nu, t) in [
        (3.068_183_443_135_621_4e-91, 0.01),
        (1.038_885_361_494_186_7e-13, 1e300),
    ] {
        let b = spectral_radiance_frequency(nu, t).unwrap();
        let back = brightness_temperature_frequency(nu, b).unwrap_or(f64::NAN);
        assert!(rel(back, t) <= 1e-14, "nu {nu:e}, T {t:e}: back {back:e}");
    }
}

/// Band radiance of a band in the Rayleigh-Jeans limit where x³ = (c₂/λT)³ is near or below the
/// smallest normal number (fuzz finding: 6 % off at [1.09e99 m, ∞], T = 3.79e6 K, Ok(0) at
/// T = 1e20 K; and an error where λT overflows, [1e100 m, ∞] at 1e250 K). Expected:
/// K4 T⁴ ∫₀ˣ t³/(eᵗ−1) dt by mpmath quad (`fuzz/regression_values.py`, section 6), within the
/// documented 1e-14, and the inverse's round trip within 1e-14.
#[test]
fn band_radiance_in_the_rayleigh_jeans_underflow() {
    use relicore::blackbody::{
        band_radiance_wavelength, temperature_from_band_radiance_wavelength,
    };
    for (lo, t, want) in [
        (1.09e99, 3.79e6, 8.075_556_178_476_659e-306),
        (1.09e99, 1e20, 2.130_753_609_096_744e-292),
        (1e100, 1e250, 2.759_387_715_634_946_3e-65),
    ] {
        let got = band_radiance_wavelength(lo, f64::INFINITY, t).unwrap_or(f64::NAN);
        assert!(
            rel(got, want) <= 1e-14,
            "[{lo:e}, inf] at {t:e}: {got:e}, want {want:e}"
        );
        if t <= 1e100 {
            let back = temperature_from_band_radiance_wavelength(lo, f64::INFINITY, got)
                .unwrap_or(f64::NAN);
            assert!(
                rel(back, t) <= 1e-14,
                "[{lo:e}, inf] at {t:e}: back {back:e}"
            );
        }
    }
}

/// Band radiance where K4 T⁴ overflows (T above about 1.7e79 K) while the radiance is normal
/// (fuzz finding): the band [1 m, 1.7e98 m] at T = 1.7e98 K was computed in the Rayleigh-Jeans
/// path above and refused below it, so its inverse met an infinite radiance between and
/// returned 1.2e77 K. Expected: K4 T⁴ ∫ t³/(eᵗ−1) dt by mpmath quad (`fuzz/regression_values.py`,
/// section 7), within the documented 1e-14, and the inverse's round trip within 1e-14.
#[test]
fn band_radiance_where_the_t4_prefactor_overflows() {
    use relicore::blackbody::{
        band_radiance_wavelength, temperature_from_band_radiance_wavelength,
    };
    for (lo, up, t, want) in [
        (
            0.997_473_462_943_497,
            1.736_934_399_609_475_5e98,
            1.736_934_399_092_391_7e98,
            4.829_387_920_639_826e83,
        ),
        (1e-3, 1.0, 1e90, 2.759_387_712_875_558_6e84),
    ] {
        let got = band_radiance_wavelength(lo, up, t).unwrap_or(f64::NAN);
        assert!(
            rel(got, want) <= 1e-14,
            "[{lo:e}, {up:e}] at {t:e}: {got:e}, want {want:e}"
        );
        let back = temperature_from_band_radiance_wavelength(lo, up, got).unwrap_or(f64::NAN);
        assert!(
            rel(back, t) <= 1e-14,
            "[{lo:e}, {up:e}] at {t:e}: back {back:e}"
        );
    }
}
