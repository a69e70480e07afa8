//! Findings of the coverage-guided fuzzing (`fuzz/`, `make fuzz`), each kept as an ordinary
//! test with the input the fuzzer found. The expected values are the inputs of round trips
//! (a temperature sent forward and back), never an output of the library.

use relicore::blackbody as bb;

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
