//! The logarithm kernel (`relicore::math::log`) against the mpmath vectors of
//! `tests/data/math_log.txt` (written by `tests/reference/log_vectors.py`: ln x and ln(1 + x) at
//! 50 digits, correctly rounded to f64 or f32; tolerance from the file), plus a dense f32 sweep
//! against the f64 kernel and libm.

mod kernel_vectors;

use kernel_vectors::{ulp32, ulp64};
use relicore::math::log::{ln, ln_1p};

#[test]
fn log_kernel_reference_vectors() {
    kernel_vectors::check("math_log.txt", 1, 8000, "log kernel", |name, a| {
        let x = a[0];
        match name {
            "ln" => ln(x),
            "ln_1p" => ln_1p(x),
            "ln_f32" | "ln_1p_f32" => {
                let h = x as f32;
                assert_eq!(h as f64, x, "{name}({x:e}): argument not f32");
                (if name == "ln_f32" { ln(h) } else { ln_1p(h) }) as f64
            }
            _ => panic!("unknown function {name}"),
        }
    });
}

/// Every f32 in [2^-20, 2^20) (a stride of 7 bit patterns) against the f64 kernel rounded to
/// f32: the f64 result is within 1 f64 ulp, so where it is not within 2^-29 of a rounding
/// boundary it rounds to the correctly rounded f32; the f32 kernel must be within 1 f32 ulp.
#[test]
fn f32_sweep_against_f64_kernel() {
    let (lo, hi) = (2f32.powi(-20).to_bits(), 2f32.powi(20).to_bits());
    let mut worst = (0.0f64, 0.0f64);
    for bits in (lo..hi).step_by(7) {
        let x = f32::from_bits(bits);
        for (got, want) in [
            (ln(x) as f64, ln(x as f64)),
            (ln_1p(x) as f64, ln_1p(x as f64)),
        ] {
            let err = (got - want).abs() / ulp32(want);
            assert!(err <= 1.0, "{x:e}: {got:e} vs {want:e} ({err} ulp)");
            worst.0 = worst.0.max(err);
        }
        // and libm's f64 logarithm agrees with the f64 kernel within 1 ulp
        let (a, b) = (ln(x as f64), libm::log(x as f64));
        worst.1 = worst.1.max((a - b).abs() / ulp64(b));
    }
    println!(
        "f32 sweep: worst {:.4} f32 ulp against the f64 kernel; f64 kernel vs libm {:.3} ulp",
        worst.0, worst.1
    );
    assert!(worst.1 <= 1.0);
}
