//! Runs the core's array functions (the `_array` forms) with the widest SIMD instruction set
//! the CPU offers, for the C and Python faces.
//!
//! The core is portable code: built for the baseline x86-64 target it may use SSE2 only. Its
//! array functions are `#[inline(always)]` and written so that the compiler vectorises them;
//! [`widest!`] compiles the call once more in functions built for AVX2 and for AVX-512 and
//! picks one at run time from what the CPU reports (read once by std and cached). The three
//! compilations perform the same IEEE operations in the same order — Rust never contracts a
//! multiply and an add into an FMA on its own, and vector division and square root are
//! correctly rounded as the scalar ones are — so they give the same bits; the property tests
//! and the cross-language tests check it.
//!
//! Only the choice of instructions happens here; the physics stays in the core.

use std::sync::atomic::{AtomicU8, Ordering};

/// Cap on the level, set by [`cap_level`] (2: no cap).
static CAP: AtomicU8 = AtomicU8::new(2);

/// Which compilation [`widest!`] runs on this CPU: 2 = AVX-512 (F, DQ, VL) with AVX2 and FMA,
/// 1 = AVX2 with FMA, 0 = the baseline of the build target; at most the cap of
/// [`cap_level`]. Detection is std's (cpuid, read once and cached; no allocation).
pub fn level() -> u8 {
    detected().min(CAP.load(Ordering::Relaxed))
}

/// The level the CPU supports, without the cap.
pub fn detected_level() -> u8 {
    detected()
}

/// Caps the level for the whole process (0, 1 or 2; 2 removes the cap): for tests that run
/// the narrower compilations on a wide CPU, and for speed comparisons. Returns the previous cap.
pub fn cap_level(cap: u8) -> u8 {
    CAP.swap(cap.min(2), Ordering::Relaxed)
}

#[cfg(target_arch = "x86_64")]
fn detected() -> u8 {
    let avx2 =
        std::arch::is_x86_feature_detected!("avx2") && std::arch::is_x86_feature_detected!("fma");
    let avx512 = avx2
        && std::arch::is_x86_feature_detected!("avx512f")
        && std::arch::is_x86_feature_detected!("avx512dq")
        && std::arch::is_x86_feature_detected!("avx512vl");
    u8::from(avx2) + u8::from(avx512)
}

#[cfg(not(target_arch = "x86_64"))]
fn detected() -> u8 {
    0
}

/// Evaluates `$body` (a call of a core array function on the named arguments) in the widest
/// compilation the CPU supports: `widest!(|x: &[f64], t: f64, out: &mut [f64]| -> ArrayResult
/// { bb::spectral_radiance_wavelength_array(x, t, out) })`.
#[macro_export]
macro_rules! widest {
    (|$($arg:ident : $ty:ty),* $(,)?| -> $ret:ty $body:block) => {{
        #[allow(unused_unsafe)]
        let result: $ret = 'run: {
            #[cfg(target_arch = "x86_64")]
            {
                #[target_feature(enable = "avx2,fma,avx512f,avx512dq,avx512vl")]
                fn avx512($($arg: $ty),*) -> $ret $body
                #[target_feature(enable = "avx2,fma")]
                fn avx2($($arg: $ty),*) -> $ret $body
                match $crate::level() {
                    // SAFETY: the CPU reported these instruction sets (`level`).
                    2 => break 'run unsafe { avx512($($arg),*) },
                    // SAFETY: as above.
                    1 => break 'run unsafe { avx2($($arg),*) },
                    _ => {}
                }
            }
            $body
        };
        result
    }};
}
