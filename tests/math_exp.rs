//! The table-driven exponential kernel (`relicore::math::exp`) against the mpmath vectors of
//! `tests/data/math_exp.txt` (written by `tests/reference/exp_vectors.py`: e^x and e^x − 1 of
//! double-length arguments at 50 digits, correctly rounded to f64 or f32; tolerance from the
//! file), plus special values and a dense f32 sweep against the f64 kernel.

mod kernel_vectors;

use kernel_vectors::ulp32;
use relicore::math::exp::{exp, exp_dd, exp_m1, exp_m1_dd};

#[test]
fn exp_kernel_reference_vectors() {
    kernel_vectors::check("math_exp.txt", 2, 6000, "exp kernel", |name, a| {
        let (xh, xl) = (a[0], a[1]);
        match name {
            "exp_dd" => exp_dd(xh, xl),
            "exp_m1_dd" => exp_m1_dd(xh, xl),
            "exp_dd_f32" | "exp_m1_dd_f32" => {
                let (h, l) = (xh as f32, xl as f32);
                assert_eq!((h as f64, l as f64), (xh, xl), "{name}: arguments not f32");
                (if name == "exp_dd_f32" {
                    exp_dd(h, l)
                } else {
                    exp_m1_dd(h, l)
                }) as f64
            }
            _ => panic!("unknown function {name}"),
        }
    });
}

#[test]
fn special_values() {
    assert_eq!(exp(0.0f64), 1.0);
    assert_eq!(exp(-0.0f64), 1.0);
    assert_eq!(exp(0.0f32), 1.0);
    assert_eq!(exp_m1(0.0f64), 0.0);
    assert_eq!(exp_m1(0.0f32), 0.0);
    // the smallest arguments: e^x − 1 = x to the last bit
    for x in [1e-300, -1e-300, 5e-324, 1e-20, -1e-20, 2.0f64.powi(-60)] {
        assert_eq!(exp_m1(x), x, "{x:e}");
    }
    for x in [1e-30f32, -1e-30, 1e-40, 1e-12] {
        assert_eq!(exp_m1(x), x, "{x:e}");
    }
    assert_eq!(exp(1000.0f64), f64::INFINITY);
    assert_eq!(exp(f64::INFINITY), f64::INFINITY);
    assert_eq!(exp(-1000.0f64), 0.0);
    assert_eq!(exp(f64::NEG_INFINITY), 0.0);
    assert_eq!(exp(100.0f32), f32::INFINITY);
    assert_eq!(exp(-200.0f32), 0.0);
    assert_eq!(exp_m1(f64::NEG_INFINITY), -1.0);
    assert_eq!(exp_m1(-50.0f64), -1.0);
    assert_eq!(exp_m1(-50.0f32), -1.0);
    assert_eq!(exp_m1(1000.0f64), f64::INFINITY);
    assert!(exp(f64::NAN).is_nan() && exp_m1(f64::NAN).is_nan());
    assert!(exp(f32::NAN).is_nan() && exp_m1(f32::NAN).is_nan());
    // the largest finite result and the smallest subnormal ones
    assert_eq!(exp(709.782_712_893_384f64), 1.797_693_134_862_273_2e308);
    assert_eq!(exp(-745.0f64), 5e-324);
    assert_eq!(exp(-745.2f64), 0.0);
    assert!(exp(88.72f32).is_finite() && exp(88.73f32).is_infinite());
}

/// Every 1009th float of [−103.9, 88.8] (about 2 million values, both signs, every binade)
/// against the f64 kernel rounded to f32, which is within 2^-28 f32 ulp of the exact value: the
/// f32 kernel must be within one f32 ulp. Counts the correctly rounded share as well.
#[test]
fn f32_dense_sweep_against_f64() {
    let mut worst = [0.0f64; 2];
    let mut exact = [0usize; 2];
    let mut n = 0usize;
    for sign in [1.0f32, -1.0] {
        let top = if sign > 0.0 { 88.8f32 } else { 103.9 };
        let mut bits = 1u32; // from the smallest subnormal up
        while f32::from_bits(bits) <= top {
            let x = sign * f32::from_bits(bits);
            bits += 1009;
            n += 1;
            for (i, (got, reference)) in [
                (exp(x), exp(x as f64)),
                (exp_m1(x), if x > -40.0 { exp_m1(x as f64) } else { -1.0 }),
            ]
            .into_iter()
            .enumerate()
            {
                let want = reference as f32;
                if want.is_infinite() {
                    assert!(got.is_infinite() || got == f32::MAX, "{x:e}");
                    continue;
                }
                let err = (got as f64 - reference).abs() / ulp32(reference);
                worst[i] = worst[i].max(err);
                exact[i] += usize::from(got == want);
            }
        }
    }
    println!(
        "f32 sweep ({n} arguments) against the f64 kernel: exp worst {:.3} ulp32 ({:.3}% correctly rounded), exp_m1 worst {:.3} ulp32 ({:.3}%)",
        worst[0],
        100.0 * exact[0] as f64 / n as f64,
        worst[1],
        100.0 * exact[1] as f64 / n as f64
    );
    assert!(worst[0] < 1.0 && worst[1] < 1.0, "{worst:?}");
}
