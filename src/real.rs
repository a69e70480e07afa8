//! The sealed floating-point trait every core function is generic over.
//!
//! Arithmetic, comparisons and classification come from [`num_traits::float::FloatCore`]
//! (pure Rust, no platform library). Every transcendental function is routed through the
//! `libm` crate directly, so the same input gives the same bits in every build, whatever
//! features other crates switch on in a workspace (DESIGN 9.1: `num-traits/std` would
//! otherwise silently send `exp_m1` to the platform libm and make the C and Python faces
//! differ by an ulp on some inputs).

use num_traits::float::FloatCore;

mod sealed {
    pub trait Sealed {}
    impl Sealed for f32 {}
    impl Sealed for f64 {}
}

/// A real floating-point type the core computes in: `f32` or `f64`, nothing else.
///
/// The trait is sealed; its methods are thin calls into `libm` (transcendentals) or exact
/// arithmetic helpers (error-free transformations used for double-length intermediates).
pub trait Real:
    FloatCore + sealed::Sealed + core::fmt::Debug + core::fmt::Display + Default + Send + Sync + 'static
{
    /// Number of bits in the significand, including the implicit bit (24 or 53).
    const MANTISSA_DIGITS: u32;
    /// Dekker's splitting constant 2^ceil(p/2) + 1.
    const SPLITTER: Self;
    /// ln of the largest finite value: above this `exp` overflows.
    const LN_MAX: Self;
    /// −ln of the smallest positive subnormal: beyond this `exp(-x)` is zero.
    const LN_MIN_SUBNORMAL_NEG: Self;

    /// Converts an `f64` literal, rounding to nearest for `f32`.
    fn c(x: f64) -> Self;
    /// Converts to `f64` exactly.
    fn to_f64_exact(self) -> f64;
    /// A constant given as an unevaluated sum `hi + lo` of two `f64` (about 106 bits),
    /// returned as a double-length pair of `Self`.
    fn c2(hi: f64, lo: f64) -> (Self, Self);
    /// e^x.
    fn exp(self) -> Self;
    /// e^x − 1, accurate for small x.
    fn exp_m1(self) -> Self;
    /// Natural logarithm.
    fn ln(self) -> Self;
    /// ln(1 + x), accurate for small x.
    fn ln_1p(self) -> Self;
    /// Square root (correctly rounded).
    fn sqrt(self) -> Self;
    /// Cube root.
    fn cbrt(self) -> Self;
    /// Hyperbolic sine.
    fn sinh(self) -> Self;
    /// Hyperbolic tangent.
    fn tanh(self) -> Self;
    /// Hyperbolic cosine.
    fn cosh(self) -> Self;
    /// Sine.
    fn sin(self) -> Self;
    /// Cosine.
    fn cos(self) -> Self;
    /// Largest integer not above x. (`FloatCore::floor` is implemented with `%`, which
    /// compiles to a call of the platform `fmod`; that call drags the unwinding runtime, and
    /// with it `malloc`, into a static C link. This one is `libm`'s.)
    fn floor_libm(self) -> Self;
}

macro_rules! impl_real {
    ($t:ty, $digits:expr, $split:expr, $lnmax:expr, $lnmin:expr,
     $exp:path, $expm1:path, $log:path, $log1p:path, $sqrt:path, $cbrt:path, $sinh:path, $tanh:path, $floor:path, $cosh:path, $sin:path, $cos:path) => {
        impl Real for $t {
            const MANTISSA_DIGITS: u32 = $digits;
            const SPLITTER: Self = $split;
            const LN_MAX: Self = $lnmax;
            const LN_MIN_SUBNORMAL_NEG: Self = $lnmin;
            #[inline(always)]
            fn c(x: f64) -> Self {
                x as $t
            }
            #[inline(always)]
            fn to_f64_exact(self) -> f64 {
                self as f64
            }
            #[inline(always)]
            fn c2(hi: f64, lo: f64) -> (Self, Self) {
                let h = hi as $t;
                let l = ((hi - h as f64) + lo) as $t;
                (h, l)
            }
            #[inline(always)]
            fn exp(self) -> Self {
                $exp(self)
            }
            #[inline(always)]
            fn exp_m1(self) -> Self {
                $expm1(self)
            }
            #[inline(always)]
            fn ln(self) -> Self {
                $log(self)
            }
            #[inline(always)]
            fn ln_1p(self) -> Self {
                $log1p(self)
            }
            #[inline(always)]
            fn sqrt(self) -> Self {
                $sqrt(self)
            }
            #[inline(always)]
            fn cbrt(self) -> Self {
                $cbrt(self)
            }
            #[inline(always)]
            fn sinh(self) -> Self {
                $sinh(self)
            }
            #[inline(always)]
            fn tanh(self) -> Self {
                $tanh(self)
            }
            #[inline(always)]
            fn floor_libm(self) -> Self {
                $floor(self)
            }
            #[inline(always)]
            fn cosh(self) -> Self {
                $cosh(self)
            }
            #[inline(always)]
            fn sin(self) -> Self {
                $sin(self)
            }
            #[inline(always)]
            fn cos(self) -> Self {
                $cos(self)
            }
        }
    };
}

impl_real!(
    f64,
    53,
    134_217_729.0,
    709.782_712_893_384,
    744.440_071_921_381_3,
    libm::exp,
    libm::expm1,
    libm::log,
    libm::log1p,
    libm::sqrt,
    libm::cbrt,
    libm::sinh,
    libm::tanh,
    libm::floor,
    libm::cosh,
    libm::sin,
    libm::cos
);
impl_real!(
    f32,
    24,
    4097.0,
    88.722_84,
    103.278_93,
    libm::expf,
    libm::expm1f,
    libm::logf,
    libm::log1pf,
    libm::sqrtf,
    libm::cbrtf,
    libm::sinhf,
    libm::tanhf,
    libm::floorf,
    libm::coshf,
    libm::sinf,
    libm::cosf
);
