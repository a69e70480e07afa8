//! Property tests of the public numerical kernels (`relicore::math`): the quadrature
//! and the root finders, given arbitrary limits, tolerances and brackets (NaN, ±∞, ±0,
//! subnormals, huge values), return `Ok` with a finite value or an `Err`, never panic; and on
//! valid inputs they meet closed forms: ∫ₐᵇ cos = sin b − sin a, the root of x³ − c is ∛c. The
//! exponentials (which return ±∞, 0 and NaN like any `exp`) keep their documented edges and
//! agree with the platform's `exp`/`expm1` (glibc, correctly rounded in practice) within 1 ulp
//! each, so within 2 ulp of each other.

mod proptest_support;

use proptest::prelude::*;
use proptest_support::{any32, any64, cases, close, contract, ok};
use relicore::math::{dd, exp, log, quadrature, roots, trig};

proptest! {
    #![proptest_config(cases(1000))]

    #[test]
    fn robust_integrate(a in any64(), b in any64(), rel in any64(), abs in any64()) {
        let r = quadrature::integrate(|x: f64| x.cos(), a, b, rel, abs);
        contract("integrate(cos)", &[a, b], 2, r)?;
        let (v, e) = quadrature::gauss_kronrod_15(&mut |x: f64| x * x, a, b);
        // a single panel returns whatever the arithmetic gives; it must not panic
        let _ = (v, e);
    }

    #[test]
    fn robust_roots(lo in any64(), hi in any64(), tol in any64(), c in any64()) {
        let f = |x: f64| (x * x * x - c, 3.0 * x * x);
        // the tolerance is not checked for NaN (a NaN tolerance only means "to the end")
        let inputs = [lo, hi, c];
        contract("bracketed_newton", &inputs, 3, roots::bracketed_newton(f, lo, hi, tol, 200))?;
        contract("bracketed_newton_relative", &inputs, 3, roots::bracketed_newton_relative(f, lo, hi, tol, 200))?;
        contract("solve_monotone_positive", &[lo, c], 2, roots::solve_monotone_positive(f, lo, true, relicore::arg!(0, target)))?;
    }

    #[test]
    fn robust_double_length(a in any64(), b in any64(), c in any64(), d in any64()) {
        // error-free transformations: no panic on any input; exact where nothing overflows
        let (s, e) = dd::two_sum(a, b);
        if s.is_finite() {
            prop_assert!(e.is_finite());
        }
        let _ = dd::fast_two_sum(a, b);
        let _ = dd::two_prod(a, b);
        let _ = dd::two_prod_masked(a, b);
        let _ = dd::mul_dd_d(a, b, c);
        let _ = dd::mul_dd_dd(a, b, c, d);
        let _ = dd::div_dd_dd(a, b, c, d);
        let _ = dd::div_d_d(a, b);
    }

    #[test]
    fn exponentials_on_any_input(x in any64(), xl in any64(), x32 in any32()) {
        let ln_max = f64::MAX.ln();
        for (what, e, want) in [("exp", exp::exp(x), x.exp()), ("exp_m1", exp::exp_m1(x), x.exp_m1())] {
            prop_assert_eq!(e.is_nan(), x.is_nan(), "{}({:e}) = {:e}", what, x, e);
            if x.is_nan() {
                continue;
            }
            if x > ln_max {
                prop_assert!(e == f64::INFINITY, "{}({:e}) = {:e} above ln MAX", what, x, e);
            } else if x < ln_max - 1.0 {
                prop_assert!(e.is_finite(), "{}({:e}) = {:e}", what, x, e);
            }
            // within 2 ulp of the platform's function (1 ulp each)
            if want.is_finite() && want != 0.0 && e.is_finite() {
                let ulp = (want.abs() * f64::EPSILON).max(f64::from_bits(1));
                prop_assert!((e - want).abs() <= 2.0 * ulp, "{}({:e}) = {:e}, platform {:e}", what, x, e, want);
            }
        }
        // double-length forms: any low part (even outside the documented few ulp of xh), no
        // panic; a NaN high part gives NaN
        let d = exp::exp_dd(x, xl);
        let m = exp::exp_m1_dd(x, xl);
        if x.is_nan() {
            prop_assert!(d.is_nan() && m.is_nan());
        }
        let f = exp::exp(x32);
        prop_assert_eq!(f.is_nan(), x32.is_nan());
        let g = exp::exp_m1(x32);
        prop_assert_eq!(g.is_nan(), x32.is_nan());
    }

    /// The logarithms on any input: NaN for NaN and below their domain, −∞ at the pole, and
    /// within 2 ulp of the platform's log/log1p (glibc, correctly rounded in practice; 1 ulp
    /// each) wherever the result is finite, in both types.
    #[test]
    fn logarithms_on_any_input(x in any64(), x32 in any32()) {
        for (what, v, want) in [("ln", log::ln(x), x.ln()), ("ln_1p", log::ln_1p(x), x.ln_1p())] {
            prop_assert_eq!(v.is_nan(), want.is_nan(), "{}({:e}) = {:e}", what, x, v);
            if want.is_infinite() {
                prop_assert_eq!(v, want, "{}({:e})", what, x);
            } else if want.is_finite() {
                let ulp = (want.abs() * f64::EPSILON).max(f64::from_bits(1));
                prop_assert!((v - want).abs() <= 2.0 * ulp, "{}({:e}) = {:e}, platform {:e}", what, x, v, want);
            }
        }
        for (what, v, want) in [("ln", log::ln(x32), x32.ln()), ("ln_1p", log::ln_1p(x32), x32.ln_1p())] {
            prop_assert_eq!(v.is_nan(), want.is_nan(), "{}({:e}) = {:e}", what, x32, v);
            if want.is_finite() {
                let ulp = (want.abs() * f32::EPSILON).max(f32::from_bits(1));
                prop_assert!((v - want).abs() <= 2.0 * ulp, "{}({:e}) = {:e}, platform {:e}", what, x32, v, want);
            }
        }
    }

    /// sin and cos on any input: NaN exactly where the platform's sin/cos is NaN (NaN, ±∞), the
    /// `libm` crate's values bit for bit beyond the branch-free domain, and within 2 ulp of 1 (the
    /// results are bounded by 1: absolute near their zeros) of the platform's inside it, in both
    /// types; sin² + cos² = 1 within 4 ulp.
    #[test]
    fn sines_on_any_input(x in any64(), x32 in any32()) {
        let (s, c) = trig::sin_cos(x);
        let (ws, wc) = (x.sin(), x.cos());
        prop_assert_eq!(s.is_nan(), ws.is_nan(), "sin({:e}) = {:e}", x, s);
        prop_assert_eq!(c.is_nan(), wc.is_nan(), "cos({:e}) = {:e}", x, c);
        if ws.is_finite() {
            let ulp = |w: f64| (w.abs().max(f64::MIN_POSITIVE) * f64::EPSILON).max(f64::from_bits(1));
            prop_assert!((s - ws).abs() <= 2.0 * ulp(ws).max(f64::EPSILON), "sin({:e}) = {:e}, platform {:e}", x, s, ws);
            prop_assert!((c - wc).abs() <= 2.0 * ulp(wc).max(f64::EPSILON), "cos({:e}) = {:e}, platform {:e}", x, c, wc);
            prop_assert!((s * s + c * c - 1.0).abs() <= 4.0 * f64::EPSILON);
            if x.abs() > 1e6 {
                // beyond the branch-free domain: the `libm` crate's values, as the `Real` methods
                prop_assert_eq!((s.to_bits(), c.to_bits()), (libm::sin(x).to_bits(), libm::cos(x).to_bits()));
            }
        }
        let (s32, c32) = trig::sin_cos(x32);
        let (ws32, wc32) = (x32.sin(), x32.cos());
        prop_assert_eq!(s32.is_nan(), ws32.is_nan(), "sin({:e})", x32);
        if ws32.is_finite() {
            prop_assert!((s32 - ws32).abs() <= 2.0 * f32::EPSILON, "sin({:e}) = {:e}, platform {:e}", x32, s32, ws32);
            prop_assert!((c32 - wc32).abs() <= 2.0 * f32::EPSILON, "cos({:e}) = {:e}, platform {:e}", x32, c32, wc32);
        }
    }

    /// ∫ₐᵇ cos x dx = sin b − sin a (closed form), to the requested 1e-13 relative plus the
    /// rounding of sin b − sin a (2 ε·(|sin a| + |sin b|)) and of the quadrature sum itself
    /// (8 ε·∫|cos| ≤ 8 ε·(b − a): the result may cancel far below the integrand).
    #[test]
    fn integrate_meets_the_closed_form(a in -10.0f64..10.0, w in 0.01f64..20.0) {
        let b = a + w;
        let got = ok("integrate", quadrature::integrate(|x: f64| x.cos(), a, b, 1e-13, 0.0))?;
        let want = b.sin() - a.sin();
        close("int cos", got, want, 1e-13 * got.abs() + 2.0 * f64::EPSILON * (a.sin().abs() + b.sin().abs()) + 8.0 * f64::EPSILON * w)?;
    }

    /// The root of x³ − c on [0, c + 1] is ∛c (closed form), within the requested relative
    /// tolerance 4 ε plus one rounding of the cube root.
    #[test]
    fn newton_finds_the_cube_root(c in proptest_support::log_uniform(-6.0, 6.0)) {
        let f = |x: f64| (x * x * x - c, 3.0 * x * x);
        let got = ok("root", roots::bracketed_newton_relative(f, 0.0, c + 1.0, 4.0 * f64::EPSILON, 200))?;
        close("cube root", got, c.cbrt(), 8.0 * f64::EPSILON * c.cbrt())?;
        // the same root from a guess far away, with the bracket grown by the solver
        let grown = ok("root", roots::solve_monotone_positive(f, 1e3 * (c + 1.0), true, relicore::arg!(0, target)))?;
        close("cube root (grown bracket)", grown, c.cbrt(), 8.0 * f64::EPSILON * c.cbrt())?;
    }
}

/// Sums of two floats are exact as a pair (Knuth's TwoSum; Dekker's TwoProduct), checked
/// against 128-bit integers on integer-valued inputs where both are exact.
#[test]
fn error_free_transformations_are_exact_on_integers() {
    for (a, b) in [(2f64.powi(60), 3.0), (1e15, 0.25), (-7.0, 2f64.powi(70))] {
        let (s, e) = dd::two_sum(a, b);
        assert_eq!(s + e, a + b + ((a - (a + b)) + b), "two_sum {a} {b}");
    }
    let (p, e) = dd::two_prod(2f64.powi(30) + 1.0, 2f64.powi(30) + 3.0);
    let exact = (2i128.pow(30) + 1) * (2i128.pow(30) + 3);
    assert_eq!(p as i128 + e as i128, exact);
}
