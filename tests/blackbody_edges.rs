//! Edges of the closed-form brightness temperatures found by the fuzzing (issue of coverage-
//! guided fuzzing): where 2hν³/c² is below the normal range (far-infrared frequencies of
//! 1e-95 Hz and less, subnormal radiances), ln(1 + a/L) is formed from logarithms; its first
//! form returned ln a − ln L + (ln L − ln a) = 0 there, so the temperature was refused.
//! Expected values: T = (hν/k)/ln(1 + 2hν³/(c²L)) in mpmath at 50 digits from the exact SI h, c,
//! k and the exact binary values of the arguments (`python3` with mpmath, the script in this
//! file's history: `mp.log1p(a/L)`); tolerance 5e-13 relative, the documented accuracy of this
//! regime (the logarithms carry an absolute error of about ulp(ln a), ln a ≈ −800).

use relicore::blackbody::brightness_temperature_frequency;

#[test]
fn brightness_temperature_with_an_underflowing_prefactor() {
    for (nu, l, want) in [
        (1e-100, 5e-324, 1.608_099_009_363_606_4e-84),
        (1e-100, 1e-320, 3.254_792_394_951_939_4e-81),
        (1e-95, 1e-310, 3.254_828_630_364_469_6e-81),
        (1e-105, 2e-323, 6.432_396_037_454_426_3e-74),
    ] {
        let got = brightness_temperature_frequency(nu, l).unwrap_or(f64::NAN);
        let rel = ((got - want) / want).abs();
        assert!(rel < 5e-13, "nu {nu:e}, L {l:e}: {got:e} vs {want:e} ({rel:e})");
    }
}
