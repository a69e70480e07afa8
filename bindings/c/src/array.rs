//! Array forms of the spectral functions: a buffer and its length in, a buffer of the same
//! length out, one core call per element, or the core's array form where it has one (no
//! allocation, no second implementation).

use crate::boundary::{elementwise, through_array};
use relicore::ArrayResult;
use relicore::blackbody as bb;
use relicore_dispatch::widest;

/// Array form of `relicore_spectral_radiance_wavelength`: out[i] =
/// spectral_radiance_wavelength(x[i], temperature_k) for i < n, at one temperature.
///
/// * `wavelengths_m`: n wavelengths λ in m, each finite and > 0.
/// * `n`: number of elements of both arrays.
/// * `temperature_k`: temperature T in K, finite and > 0 (when it is not, every element fails).
/// * `out`: n results, B_λ in W m⁻² sr⁻¹ m⁻¹.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (`RELICORE_ERROR_NON_FINITE`, `RELICORE_ERROR_NON_POSITIVE`).
/// `RELICORE_ERROR_NULL_POINTER` when an array pointer is NULL (even for n = 0); then every output
/// of a non-NULL `out` is NaN.
///
/// Computed by the core's array form (blocks of 64 elements in SIMD, in the widest compilation
/// the CPU supports: AVX-512, AVX2 or the baseline), which gives the scalar function's bits;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `wavelengths_m` is NULL or points to n readable `double`; `out` is NULL or points to n writable
/// `double`. `out` may be the same buffer as `wavelengths_m` (computed in place); other overlaps
/// give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_spectral_radiance_wavelength_array(
    wavelengths_m: *const f64,
    n: usize,
    temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the buffers are NULL or valid for n elements (this function's contract).
    unsafe {
        through_array(wavelengths_m, n, out, |x, out| {
            widest!(
                |x: &[f64], temperature_k: f64, out: &mut [f64]| -> ArrayResult {
                    bb::spectral_radiance_wavelength_array(x, temperature_k, out)
                }
            )
        })
    }
}

/// Array form of `relicore_spectral_radiance_frequency`: out[i] = spectral_radiance_frequency(x[i],
/// temperature_k) for i < n, at one temperature.
///
/// * `frequencies_hz`: n frequencies ν in Hz, each finite and > 0.
/// * `n`: number of elements of both arrays.
/// * `temperature_k`: temperature T in K, finite and > 0 (when it is not, every element fails).
/// * `out`: n results, B_ν in W m⁻² sr⁻¹ Hz⁻¹.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (`RELICORE_ERROR_NON_FINITE`, `RELICORE_ERROR_NON_POSITIVE`).
/// `RELICORE_ERROR_NULL_POINTER` when an array pointer is NULL (even for n = 0); then every output
/// of a non-NULL `out` is NaN.
///
/// Computed by the core's array form (blocks of 64 elements in SIMD, in the widest compilation
/// the CPU supports: AVX-512, AVX2 or the baseline), which gives the scalar function's bits;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `frequencies_hz` is NULL or points to n readable `double`; `out` is NULL or points to n writable
/// `double`. `out` may be the same buffer as `frequencies_hz` (computed in place); other overlaps
/// give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_spectral_radiance_frequency_array(
    frequencies_hz: *const f64,
    n: usize,
    temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the buffers are NULL or valid for n elements (this function's contract).
    unsafe {
        through_array(frequencies_hz, n, out, |x, out| {
            widest!(
                |x: &[f64], temperature_k: f64, out: &mut [f64]| -> ArrayResult {
                    bb::spectral_radiance_frequency_array(x, temperature_k, out)
                }
            )
        })
    }
}

/// Array form of `relicore_spectral_radiance_wavenumber`: out[i] =
/// spectral_radiance_wavenumber(x[i], temperature_k) for i < n, at one temperature.
///
/// * `wavenumbers_per_m`: n wavenumbers ṽ in m⁻¹, each finite and > 0.
/// * `n`: number of elements of both arrays.
/// * `temperature_k`: temperature T in K, finite and > 0 (when it is not, every element fails).
/// * `out`: n results, B_ṽ in W m⁻² sr⁻¹ per m⁻¹.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (`RELICORE_ERROR_NON_FINITE`, `RELICORE_ERROR_NON_POSITIVE`).
/// `RELICORE_ERROR_NULL_POINTER` when an array pointer is NULL (even for n = 0); then every output
/// of a non-NULL `out` is NaN.
///
/// Computed by the core's array form (blocks of 64 elements in SIMD, in the widest compilation
/// the CPU supports: AVX-512, AVX2 or the baseline), which gives the scalar function's bits;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `wavenumbers_per_m` is NULL or points to n readable `double`; `out` is NULL or points to n
/// writable `double`. `out` may be the same buffer as `wavenumbers_per_m` (computed in place);
/// other overlaps give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_spectral_radiance_wavenumber_array(
    wavenumbers_per_m: *const f64,
    n: usize,
    temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the buffers are NULL or valid for n elements (this function's contract).
    unsafe {
        through_array(wavenumbers_per_m, n, out, |x, out| {
            widest!(
                |x: &[f64], temperature_k: f64, out: &mut [f64]| -> ArrayResult {
                    bb::spectral_radiance_wavenumber_array(x, temperature_k, out)
                }
            )
        })
    }
}

/// Array form of `relicore_photon_radiance_wavelength`: out[i] = photon_radiance_wavelength(x[i],
/// temperature_k) for i < n, at one temperature.
///
/// * `wavelengths_m`: n wavelengths λ in m, each finite and > 0.
/// * `n`: number of elements of both arrays.
/// * `temperature_k`: temperature T in K, finite and > 0 (when it is not, every element fails).
/// * `out`: n results, N_λ in photons s⁻¹ m⁻² sr⁻¹ m⁻¹.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (`RELICORE_ERROR_NON_FINITE`, `RELICORE_ERROR_NON_POSITIVE`).
/// `RELICORE_ERROR_NULL_POINTER` when an array pointer is NULL (even for n = 0); then every output
/// of a non-NULL `out` is NaN.
///
/// Each element is computed by the same code as the scalar function, so the two agree bit for bit;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `wavelengths_m` is NULL or points to n readable `double`; `out` is NULL or points to n writable
/// `double`. `out` may be the same buffer as `wavelengths_m` (computed in place); other overlaps
/// give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_photon_radiance_wavelength_array(
    wavelengths_m: *const f64,
    n: usize,
    temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the buffers are NULL or valid for n elements (this function's contract).
    unsafe {
        elementwise(wavelengths_m, n, out, |x| {
            bb::photon_radiance_wavelength(x, temperature_k)
        })
    }
}

/// Array form of `relicore_photon_radiance_frequency`: out[i] = photon_radiance_frequency(x[i],
/// temperature_k) for i < n, at one temperature.
///
/// * `frequencies_hz`: n frequencies ν in Hz, each finite and > 0.
/// * `n`: number of elements of both arrays.
/// * `temperature_k`: temperature T in K, finite and > 0 (when it is not, every element fails).
/// * `out`: n results, N_ν in photons s⁻¹ m⁻² sr⁻¹ Hz⁻¹.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (`RELICORE_ERROR_NON_FINITE`, `RELICORE_ERROR_NON_POSITIVE`).
/// `RELICORE_ERROR_NULL_POINTER` when an array pointer is NULL (even for n = 0); then every output
/// of a non-NULL `out` is NaN.
///
/// Each element is computed by the same code as the scalar function, so the two agree bit for bit;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `frequencies_hz` is NULL or points to n readable `double`; `out` is NULL or points to n writable
/// `double`. `out` may be the same buffer as `frequencies_hz` (computed in place); other overlaps
/// give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_photon_radiance_frequency_array(
    frequencies_hz: *const f64,
    n: usize,
    temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the buffers are NULL or valid for n elements (this function's contract).
    unsafe {
        elementwise(frequencies_hz, n, out, |x| {
            bb::photon_radiance_frequency(x, temperature_k)
        })
    }
}

/// Array form of `relicore_photon_radiance_wavenumber`: out[i] = photon_radiance_wavenumber(x[i],
/// temperature_k) for i < n, at one temperature.
///
/// * `wavenumbers_per_m`: n wavenumbers ṽ in m⁻¹, each finite and > 0.
/// * `n`: number of elements of both arrays.
/// * `temperature_k`: temperature T in K, finite and > 0 (when it is not, every element fails).
/// * `out`: n results, N_ṽ in photons s⁻¹ m⁻² sr⁻¹ per m⁻¹.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (`RELICORE_ERROR_NON_FINITE`, `RELICORE_ERROR_NON_POSITIVE`).
/// `RELICORE_ERROR_NULL_POINTER` when an array pointer is NULL (even for n = 0); then every output
/// of a non-NULL `out` is NaN.
///
/// Each element is computed by the same code as the scalar function, so the two agree bit for bit;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `wavenumbers_per_m` is NULL or points to n readable `double`; `out` is NULL or points to n
/// writable `double`. `out` may be the same buffer as `wavenumbers_per_m` (computed in place);
/// other overlaps give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_photon_radiance_wavenumber_array(
    wavenumbers_per_m: *const f64,
    n: usize,
    temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the buffers are NULL or valid for n elements (this function's contract).
    unsafe {
        elementwise(wavenumbers_per_m, n, out, |x| {
            bb::photon_radiance_wavenumber(x, temperature_k)
        })
    }
}

/// Array form of `relicore_radiance_temperature_derivative_wavelength`: out[i] =
/// radiance_temperature_derivative_wavelength(x[i], temperature_k) for i < n, at one temperature.
///
/// * `wavelengths_m`: n wavelengths λ in m, each finite and > 0.
/// * `n`: number of elements of both arrays.
/// * `temperature_k`: temperature T in K, finite and > 0 (when it is not, every element fails).
/// * `out`: n results, ∂B_λ/∂T in W m⁻² sr⁻¹ m⁻¹ K⁻¹.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (`RELICORE_ERROR_NON_FINITE`, `RELICORE_ERROR_NON_POSITIVE`).
/// `RELICORE_ERROR_NULL_POINTER` when an array pointer is NULL (even for n = 0); then every output
/// of a non-NULL `out` is NaN.
///
/// Each element is computed by the same code as the scalar function, so the two agree bit for bit;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `wavelengths_m` is NULL or points to n readable `double`; `out` is NULL or points to n writable
/// `double`. `out` may be the same buffer as `wavelengths_m` (computed in place); other overlaps
/// give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_radiance_temperature_derivative_wavelength_array(
    wavelengths_m: *const f64,
    n: usize,
    temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the buffers are NULL or valid for n elements (this function's contract).
    unsafe {
        elementwise(wavelengths_m, n, out, |x| {
            bb::radiance_temperature_derivative_wavelength(x, temperature_k)
        })
    }
}

/// Array form of `relicore_radiance_temperature_derivative_frequency`: out[i] =
/// radiance_temperature_derivative_frequency(x[i], temperature_k) for i < n, at one temperature.
///
/// * `frequencies_hz`: n frequencies ν in Hz, each finite and > 0.
/// * `n`: number of elements of both arrays.
/// * `temperature_k`: temperature T in K, finite and > 0 (when it is not, every element fails).
/// * `out`: n results, ∂B_ν/∂T in W m⁻² sr⁻¹ Hz⁻¹ K⁻¹.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (`RELICORE_ERROR_NON_FINITE`, `RELICORE_ERROR_NON_POSITIVE`).
/// `RELICORE_ERROR_NULL_POINTER` when an array pointer is NULL (even for n = 0); then every output
/// of a non-NULL `out` is NaN.
///
/// Each element is computed by the same code as the scalar function, so the two agree bit for bit;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `frequencies_hz` is NULL or points to n readable `double`; `out` is NULL or points to n writable
/// `double`. `out` may be the same buffer as `frequencies_hz` (computed in place); other overlaps
/// give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_radiance_temperature_derivative_frequency_array(
    frequencies_hz: *const f64,
    n: usize,
    temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the buffers are NULL or valid for n elements (this function's contract).
    unsafe {
        elementwise(frequencies_hz, n, out, |x| {
            bb::radiance_temperature_derivative_frequency(x, temperature_k)
        })
    }
}

/// Array form of `relicore_brightness_temperature_wavelength`: out[i] =
/// brightness_temperature_wavelength(wavelength_m, spectral_radiance[i]) for i < n, at one spectral
/// coordinate.
///
/// * `wavelength_m`: wavelength λ in m, finite and > 0 (when it is not, every element fails).
/// * `spectral_radiance`: n spectral radiances L in W m⁻² sr⁻¹ m⁻¹, each finite and > 0.
/// * `n`: number of elements of both arrays.
/// * `out`: n brightness temperatures in K.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (`RELICORE_ERROR_NON_FINITE`, `RELICORE_ERROR_NON_POSITIVE`).
/// `RELICORE_ERROR_NULL_POINTER` when an array pointer is NULL (even for n = 0); then every output
/// of a non-NULL `out` is NaN.
///
/// Each element is computed by the same code as the scalar function, so the two agree bit for bit;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `spectral_radiance` is NULL or points to n readable `double`; `out` is NULL or points to n
/// writable `double`. `out` may be the same buffer as `spectral_radiance`; other overlaps give
/// unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_brightness_temperature_wavelength_array(
    wavelength_m: f64,
    spectral_radiance: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the buffers are NULL or valid for n elements (this function's contract).
    unsafe {
        elementwise(spectral_radiance, n, out, |l| {
            bb::brightness_temperature_wavelength(wavelength_m, l)
        })
    }
}

/// Array form of `relicore_brightness_temperature_frequency`: out[i] =
/// brightness_temperature_frequency(frequency_hz, spectral_radiance[i]) for i < n, at one spectral
/// coordinate.
///
/// * `frequency_hz`: frequency ν in Hz, finite and > 0 (when it is not, every element fails).
/// * `spectral_radiance`: n spectral radiances L in W m⁻² sr⁻¹ Hz⁻¹, each finite and > 0.
/// * `n`: number of elements of both arrays.
/// * `out`: n brightness temperatures in K.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (`RELICORE_ERROR_NON_FINITE`, `RELICORE_ERROR_NON_POSITIVE`).
/// `RELICORE_ERROR_NULL_POINTER` when an array pointer is NULL (even for n = 0); then every output
/// of a non-NULL `out` is NaN.
///
/// Each element is computed by the same code as the scalar function, so the two agree bit for bit;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `spectral_radiance` is NULL or points to n readable `double`; `out` is NULL or points to n
/// writable `double`. `out` may be the same buffer as `spectral_radiance`; other overlaps give
/// unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_brightness_temperature_frequency_array(
    frequency_hz: f64,
    spectral_radiance: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the buffers are NULL or valid for n elements (this function's contract).
    unsafe {
        elementwise(spectral_radiance, n, out, |l| {
            bb::brightness_temperature_frequency(frequency_hz, l)
        })
    }
}

/// Array form of `relicore_spectral_radiance_wavelength_f32`: out[i] =
/// spectral_radiance_wavelength(x[i], temperature_k) for i < n, at one temperature.
///
/// * `wavelengths_m`: n wavelengths λ in m, each finite and > 0.
/// * `n`: number of elements of both arrays.
/// * `temperature_k`: temperature T in K, finite and > 0 (when it is not, every element fails).
/// * `out`: n results, B_λ in W m⁻² sr⁻¹ m⁻¹.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (`RELICORE_ERROR_NON_FINITE`, `RELICORE_ERROR_NON_POSITIVE`).
/// `RELICORE_ERROR_NULL_POINTER` when an array pointer is NULL (even for n = 0); then every output
/// of a non-NULL `out` is NaN.
///
/// Computed by the core's array form (blocks of 64 elements in SIMD, in the widest compilation
/// the CPU supports: AVX-512, AVX2 or the baseline), which gives the scalar function's bits;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `wavelengths_m` is NULL or points to n readable `float`; `out` is NULL or points to n writable
/// `float`. `out` may be the same buffer as `wavelengths_m` (computed in place); other overlaps
/// give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_spectral_radiance_wavelength_array_f32(
    wavelengths_m: *const f32,
    n: usize,
    temperature_k: f32,
    out: *mut f32,
) -> i32 {
    // SAFETY: the buffers are NULL or valid for n elements (this function's contract).
    unsafe {
        through_array(wavelengths_m, n, out, |x, out| {
            widest!(
                |x: &[f32], temperature_k: f32, out: &mut [f32]| -> ArrayResult {
                    bb::spectral_radiance_wavelength_array(x, temperature_k, out)
                }
            )
        })
    }
}

/// Array form of `relicore_spectral_radiance_frequency_f32`: out[i] =
/// spectral_radiance_frequency(x[i], temperature_k) for i < n, at one temperature.
///
/// * `frequencies_hz`: n frequencies ν in Hz, each finite and > 0.
/// * `n`: number of elements of both arrays.
/// * `temperature_k`: temperature T in K, finite and > 0 (when it is not, every element fails).
/// * `out`: n results, B_ν in W m⁻² sr⁻¹ Hz⁻¹.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (`RELICORE_ERROR_NON_FINITE`, `RELICORE_ERROR_NON_POSITIVE`).
/// `RELICORE_ERROR_NULL_POINTER` when an array pointer is NULL (even for n = 0); then every output
/// of a non-NULL `out` is NaN.
///
/// Computed by the core's array form (blocks of 64 elements in SIMD, in the widest compilation
/// the CPU supports: AVX-512, AVX2 or the baseline), which gives the scalar function's bits;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `frequencies_hz` is NULL or points to n readable `float`; `out` is NULL or points to n writable
/// `float`. `out` may be the same buffer as `frequencies_hz` (computed in place); other overlaps
/// give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_spectral_radiance_frequency_array_f32(
    frequencies_hz: *const f32,
    n: usize,
    temperature_k: f32,
    out: *mut f32,
) -> i32 {
    // SAFETY: the buffers are NULL or valid for n elements (this function's contract).
    unsafe {
        through_array(frequencies_hz, n, out, |x, out| {
            widest!(
                |x: &[f32], temperature_k: f32, out: &mut [f32]| -> ArrayResult {
                    bb::spectral_radiance_frequency_array(x, temperature_k, out)
                }
            )
        })
    }
}

/// Array form of `relicore_spectral_radiance_wavenumber_f32`: out[i] =
/// spectral_radiance_wavenumber(x[i], temperature_k) for i < n, at one temperature.
///
/// * `wavenumbers_per_m`: n wavenumbers ṽ in m⁻¹, each finite and > 0.
/// * `n`: number of elements of both arrays.
/// * `temperature_k`: temperature T in K, finite and > 0 (when it is not, every element fails).
/// * `out`: n results, B_ṽ in W m⁻² sr⁻¹ per m⁻¹.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (`RELICORE_ERROR_NON_FINITE`, `RELICORE_ERROR_NON_POSITIVE`).
/// `RELICORE_ERROR_NULL_POINTER` when an array pointer is NULL (even for n = 0); then every output
/// of a non-NULL `out` is NaN.
///
/// Computed by the core's array form (blocks of 64 elements in SIMD, in the widest compilation
/// the CPU supports: AVX-512, AVX2 or the baseline), which gives the scalar function's bits;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `wavenumbers_per_m` is NULL or points to n readable `float`; `out` is NULL or points to n
/// writable `float`. `out` may be the same buffer as `wavenumbers_per_m` (computed in place); other
/// overlaps give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_spectral_radiance_wavenumber_array_f32(
    wavenumbers_per_m: *const f32,
    n: usize,
    temperature_k: f32,
    out: *mut f32,
) -> i32 {
    // SAFETY: the buffers are NULL or valid for n elements (this function's contract).
    unsafe {
        through_array(wavenumbers_per_m, n, out, |x, out| {
            widest!(
                |x: &[f32], temperature_k: f32, out: &mut [f32]| -> ArrayResult {
                    bb::spectral_radiance_wavenumber_array(x, temperature_k, out)
                }
            )
        })
    }
}
