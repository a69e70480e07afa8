//! Criterion benches of the blackbody core: spectral radiance (scalar and array, f32 and f64),
//! band radiance, brightness temperature and the other inversions, and the exponential kernel
//! under the Planck function (`math::exp`, beside the `libm` functions it replaced). Speed
//! targets live here and in `benches/compare/`, never in timed tests.

use criterion::{Criterion, criterion_group, criterion_main};
use relicore::blackbody as bb;
use std::hint::black_box;

fn wavelengths64(n: usize) -> Vec<f64> {
    (0..n)
        .map(|i| 0.2e-6 * libm::pow(1000.0, i as f64 / n as f64))
        .collect()
}

fn spectral(c: &mut Criterion) {
    let mut g = c.benchmark_group("spectral_radiance");
    g.bench_function("wavelength_f64_scalar", |b| {
        b.iter(|| bb::spectral_radiance_wavelength(black_box(10e-6), black_box(300.0f64)))
    });
    g.bench_function("wavelength_f32_scalar", |b| {
        b.iter(|| bb::spectral_radiance_wavelength(black_box(10e-6f32), black_box(300.0f32)))
    });
    g.bench_function("frequency_f64_scalar", |b| {
        b.iter(|| bb::spectral_radiance_frequency(black_box(150e9), black_box(2.72548f64)))
    });
    g.bench_function("photon_wavelength_f64_scalar", |b| {
        b.iter(|| bb::photon_radiance_wavelength(black_box(10e-6), black_box(300.0f64)))
    });
    let wl = wavelengths64(1000);
    let wl32: Vec<f32> = wl.iter().map(|&x| x as f32).collect();
    let mut out = vec![0.0f64; wl.len()];
    let mut out32 = vec![0.0f32; wl.len()];
    g.bench_function("wavelength_f64_array_1000", |b| {
        b.iter(|| {
            for (o, &l) in out.iter_mut().zip(&wl) {
                *o = bb::spectral_radiance_wavelength(l, black_box(1500.0)).unwrap_or(f64::NAN);
            }
            black_box(&out);
        })
    });
    g.bench_function("wavelength_f32_array_1000", |b| {
        b.iter(|| {
            for (o, &l) in out32.iter_mut().zip(&wl32) {
                *o = bb::spectral_radiance_wavelength(l, black_box(1500.0f32)).unwrap_or(f32::NAN);
            }
            black_box(&out32);
        })
    });
    // the core's array functions (built here for the baseline target; the C and Python faces
    // run AVX2 or AVX-512 compilations of the same code, see bindings/dispatch)
    g.bench_function("spectral_radiance_wavelength_array_f64_1000", |b| {
        b.iter(|| bb::spectral_radiance_wavelength_array(&wl, black_box(1500.0), &mut out))
    });
    g.bench_function("spectral_radiance_wavelength_array_f32_1000", |b| {
        b.iter(|| bb::spectral_radiance_wavelength_array(&wl32, black_box(1500.0f32), &mut out32))
    });
    let nu: Vec<f64> = wl.iter().map(|&l| 299_792_458.0 / l).collect();
    g.bench_function("spectral_radiance_frequency_array_f64_1000", |b| {
        b.iter(|| bb::spectral_radiance_frequency_array(&nu, black_box(1500.0), &mut out))
    });
    let k: Vec<f64> = wl.iter().map(|&l| 1.0 / l).collect();
    g.bench_function("spectral_radiance_wavenumber_array_f64_1000", |b| {
        b.iter(|| bb::spectral_radiance_wavenumber_array(&k, black_box(1500.0), &mut out))
    });
    g.bench_function("temperature_derivative_wavelength_f64", |b| {
        b.iter(|| {
            bb::radiance_temperature_derivative_wavelength(black_box(10e-6), black_box(300.0f64))
        })
    });
    g.finish();
}

/// The exponential kernel on the Planck exponents of the array bench (x = 0.048 … 48), with
/// the `libm` expm1/exp the Planck function called before, as a reference point.
fn exp_kernel(c: &mut Criterion) {
    use relicore::math::exp;
    let mut g = c.benchmark_group("exp_kernel");
    let xs: Vec<f64> = wavelengths64(1000)
        .iter()
        .map(|l| 1.438_776_877_503_933_9e-2 / (l * 1500.0))
        .collect();
    let xs32: Vec<f32> = xs.iter().map(|&x| x as f32).collect();
    let mut out = vec![0.0f64; xs.len()];
    let mut out32 = vec![0.0f32; xs.len()];
    g.bench_function("exp_m1_dd_f64_array_1000", |b| {
        b.iter(|| {
            for (o, &x) in out.iter_mut().zip(black_box(&xs)) {
                *o = exp::exp_m1_dd(x, 1e-17 * x);
            }
            black_box(&out);
        })
    });
    g.bench_function("libm_expm1_f64_array_1000", |b| {
        b.iter(|| {
            for (o, &x) in out.iter_mut().zip(black_box(&xs)) {
                *o = libm::expm1(x);
            }
            black_box(&out);
        })
    });
    g.bench_function("exp_dd_f64_array_1000", |b| {
        b.iter(|| {
            for (o, &x) in out.iter_mut().zip(black_box(&xs)) {
                *o = exp::exp_dd(x, 1e-17 * x);
            }
            black_box(&out);
        })
    });
    g.bench_function("libm_exp_f64_array_1000", |b| {
        b.iter(|| {
            for (o, &x) in out.iter_mut().zip(black_box(&xs)) {
                *o = libm::exp(x);
            }
            black_box(&out);
        })
    });
    g.bench_function("exp_m1_dd_f32_array_1000", |b| {
        b.iter(|| {
            for (o, &x) in out32.iter_mut().zip(black_box(&xs32)) {
                *o = exp::exp_m1_dd(x, 0.0);
            }
            black_box(&out32);
        })
    });
    g.bench_function("libm_expm1f_f32_array_1000", |b| {
        b.iter(|| {
            for (o, &x) in out32.iter_mut().zip(black_box(&xs32)) {
                *o = libm::expm1f(x);
            }
            black_box(&out32);
        })
    });
    g.finish();
}

fn band_and_inverse(c: &mut Criterion) {
    let mut g = c.benchmark_group("band_and_inversion");
    g.bench_function("band_radiance_wavelength_f64", |b| {
        b.iter(|| {
            bb::band_radiance_wavelength(black_box(8e-6), black_box(14e-6), black_box(300.0f64))
        })
    });
    g.bench_function("band_radiance_wavelength_f32", |b| {
        b.iter(|| {
            bb::band_radiance_wavelength(
                black_box(8e-6f32),
                black_box(14e-6f32),
                black_box(300.0f32),
            )
        })
    });
    g.bench_function("band_fraction_wavelength_f64", |b| {
        b.iter(|| {
            bb::band_fraction_wavelength(black_box(0.0), black_box(2.898e-6), black_box(1000.0f64))
        })
    });
    g.bench_function("brightness_temperature_wavelength_f64", |b| {
        b.iter(|| bb::brightness_temperature_wavelength(black_box(10e-6), black_box(9.9e6f64)))
    });
    g.bench_function("brightness_temperature_wavelength_f32", |b| {
        b.iter(|| bb::brightness_temperature_wavelength(black_box(10e-6f32), black_box(9.9e6f32)))
    });
    g.bench_function("temperature_from_band_radiance_wavelength_f64", |b| {
        b.iter(|| {
            bb::temperature_from_band_radiance_wavelength(
                black_box(8e-6),
                black_box(14e-6),
                black_box(40.0f64),
            )
        })
    });
    g.bench_function("ratio_temperature_f64", |b| {
        b.iter(|| {
            bb::ratio_temperature(
                black_box(0.9e-6),
                black_box(1.05e-6),
                black_box(0.8f64),
                black_box(1.0),
            )
        })
    });
    let wl = [8e-6, 9e-6, 10e-6, 11e-6, 12e-6, 13e-6, 14e-6];
    let r = [0.0, 0.8, 1.0, 1.0, 0.9, 0.7, 0.0];
    g.bench_function("response_weighted_radiance_f64", |b| {
        b.iter(|| bb::response_weighted_radiance(black_box(&wl), black_box(&r), black_box(300.0)))
    });
    g.bench_function("temperature_from_response_weighted_radiance_f64", |b| {
        b.iter(|| {
            bb::temperature_from_response_weighted_radiance(
                black_box(&wl),
                black_box(&r),
                black_box(25.0),
            )
        })
    });
    let cal = bb::two_load_calibration(90e9, 2.1, 300.0, 0.9, 77.0);
    g.bench_function("calibrated_temperature_f64", |b| {
        b.iter(|| cal.and_then(|c| bb::calibrated_temperature(&c, black_box(1.5))))
    });
    g.bench_function("microwave_conversions_f64", |b| {
        b.iter(|| {
            (
                bb::thermodynamic_to_rayleigh_jeans_factor(black_box(150e9), black_box(2.72548f64)),
                bb::kcmb_to_mjy_per_sr(black_box(150e9), black_box(2.72548f64)),
                bb::thermal_sz_spectral_shape(black_box(150e9), black_box(2.72548f64)),
            )
        })
    });
    g.finish();
}

fn every_other_function(c: &mut Criterion) {
    let mut g = c.benchmark_group("blackbody_other");
    let t = 300.0f64;
    g.bench_function("spectral_radiance_wavenumber", |b| {
        b.iter(|| bb::spectral_radiance_wavenumber(black_box(1e5), black_box(t)))
    });
    g.bench_function("photon_radiance_frequency", |b| {
        b.iter(|| bb::photon_radiance_frequency(black_box(3e13), black_box(t)))
    });
    g.bench_function("photon_radiance_wavenumber", |b| {
        b.iter(|| bb::photon_radiance_wavenumber(black_box(1e5), black_box(t)))
    });
    g.bench_function("radiance_temperature_derivative_frequency", |b| {
        b.iter(|| bb::radiance_temperature_derivative_frequency(black_box(3e13), black_box(t)))
    });
    g.bench_function("radiant_exitance", |b| {
        b.iter(|| bb::radiant_exitance(black_box(t)))
    });
    g.bench_function("photon_exitance", |b| {
        b.iter(|| bb::photon_exitance(black_box(t)))
    });
    g.bench_function("peaks", |b| {
        b.iter(|| {
            (
                bb::peak_wavelength(black_box(t)),
                bb::peak_frequency(black_box(t)),
                bb::peak_wavenumber(black_box(t)),
                bb::photon_peak_wavelength(black_box(t)),
                bb::photon_peak_frequency(black_box(t)),
                bb::temperature_from_peak_wavelength(black_box(1e-5)),
                bb::temperature_from_peak_frequency(black_box(1e13)),
            )
        })
    });
    g.bench_function("band_photon_radiance_wavelength", |b| {
        b.iter(|| {
            bb::band_photon_radiance_wavelength(black_box(8e-6), black_box(14e-6), black_box(t))
        })
    });
    g.bench_function("band_radiance_frequency", |b| {
        b.iter(|| bb::band_radiance_frequency(black_box(1e12), black_box(3e13), black_box(t)))
    });
    g.bench_function("brightness_temperature_frequency", |b| {
        b.iter(|| bb::brightness_temperature_frequency(black_box(150e9), black_box(3e-18)))
    });
    g.bench_function("rayleigh_jeans_temperature", |b| {
        b.iter(|| bb::rayleigh_jeans_temperature(black_box(150e9), black_box(3e-18)))
    });
    g.bench_function("two_load_calibration", |b| {
        b.iter(|| {
            bb::two_load_calibration(
                black_box(90e9),
                black_box(2.1),
                black_box(300.0),
                black_box(0.9),
                black_box(77.0),
            )
        })
    });
    let cal = bb::two_load_calibration(90e9, 2.1, 300.0, 0.9, 77.0);
    g.bench_function("calibrated_brightness_temperature", |b| {
        b.iter(|| cal.and_then(|c| bb::calibrated_brightness_temperature(&c, black_box(1.5))))
    });
    g.bench_function("thermal_sz_temperature_shape", |b| {
        b.iter(|| bb::thermal_sz_temperature_shape(black_box(150e9), black_box(2.72548f64)))
    });
    g.bench_function("thermal_sz_null_frequency", |b| {
        b.iter(|| bb::thermal_sz_null_frequency(black_box(2.72548f64)))
    });
    g.finish();
}

criterion_group!(
    benches,
    spectral,
    exp_kernel,
    band_and_inverse,
    every_other_function
);
criterion_main!(benches);
