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
