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
