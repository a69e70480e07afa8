//! The sine and cosine kernel (`relicore::math::trig`) against the mpmath vectors of
//! `tests/data/math_trig.txt` (written by `tests/reference/trig_vectors.py`: sin x and cos x at
//! 50 digits, correctly rounded to f64 or f32; tolerance from the file).

mod kernel_vectors;

use relicore::math::trig::sin_cos;

#[test]
fn trig_kernel_reference_vectors() {
    kernel_vectors::check("math_trig.txt", 1, 7000, "trig kernel", |name, a| {
        let x = a[0];
        match name {
            "sin" => sin_cos(x).0,
            "cos" => sin_cos(x).1,
            "sin_f32" | "cos_f32" => {
                let h = x as f32;
                assert_eq!(h as f64, x, "{name}({x:e}): argument not f32");
                let (s, c) = sin_cos(h);
                (if name == "sin_f32" { s } else { c }) as f64
            }
            _ => panic!("unknown function {name}"),
        }
    });
}

/// Outside the branch-free domain the kernel returns libm's values, bit for bit.
#[test]
fn outside_the_fast_domain_is_libm() {
    for &x in &[1.5e6f64, -3e9, 1e300, f64::INFINITY, f64::NAN] {
        let (s, c) = sin_cos(x);
        assert_eq!(s.to_bits(), libm::sin(x).to_bits(), "{x}");
        assert_eq!(c.to_bits(), libm::cos(x).to_bits(), "{x}");
    }
    for &x in &[4.5e3f32, -1e7, f32::INFINITY] {
        let (s, c) = sin_cos(x);
        assert_eq!(s.to_bits(), libm::sinf(x).to_bits(), "{x}");
        assert_eq!(c.to_bits(), libm::cosf(x).to_bits(), "{x}");
    }
}
