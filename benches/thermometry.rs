//! Criterion benches of the radiation-thermometry functions: one object temperature
//! with its uncertainty (the firmware case, f32 and f64), the band and response forms, and a
//! 1000 × 1000 frame of signals to object temperature and u_c, with shared and with per-pixel
//! emissivity, in f32 and f64. Speed targets live here, never in timed tests.

use criterion::{Criterion, criterion_group, criterion_main};
use relicore::blackbody as bb;
use std::hint::black_box;

const SIDE: usize = 1000;

/// An invented frame: a smooth 280…360 K object field seen at 10 µm through a window
/// (ε 0.95 or per pixel 0.6…0.98, T_refl 295 K, τ 0.92, T_path 290 K).
fn frame(per_pixel: bool) -> (Vec<f64>, Vec<f64>) {
    let n = SIDE * SIDE;
    let mut sig = Vec::with_capacity(n);
    let mut eps = Vec::with_capacity(if per_pixel { n } else { 1 });
    if !per_pixel {
        eps.push(0.95);
    }
    for i in 0..n {
        let (r, c) = ((i / SIDE) as f64, (i % SIDE) as f64);
        let t = 280.0 + 80.0 * (0.5 + 0.5 * libm::sin(r * 0.01) * libm::cos(c * 0.013));
        let e = if per_pixel {
            0.6 + 0.38 * (0.5 + 0.5 * libm::sin((r + c) * 0.003))
        } else {
            0.95
        };
        if per_pixel {
            eps.push(e);
        }
        sig.push(
            bb::measured_spectral_radiance_wavelength(10e-6, t, e, 295.0, 0.92, 290.0)
                .unwrap_or(f64::NAN),
        );
    }
    (sig, eps)
}

fn scalar(c: &mut Criterion) {
    let mut g = c.benchmark_group("thermometry_scalar");
    let s64 = bb::measured_spectral_radiance_wavelength(10e-6, 310.0, 0.95, 295.0, 0.92, 290.0)
        .unwrap_or(f64::NAN);
    let s32 = s64 as f32;
    g.bench_function("object_temperature_wavelength_with_uncertainty_f32", |b| {
        b.iter(|| {
            bb::object_temperature_wavelength_with_uncertainty(
                black_box(10e-6f32),
                black_box(s32),
                black_box(0.95f32),
                black_box(295.0f32),
                black_box(0.92f32),
                black_box(290.0f32),
                black_box(s32 * 0.01),
                black_box(0.02f32),
                black_box(2.0f32),
                black_box(0.01f32),
                black_box(2.0f32),
            )
        })
    });
    g.bench_function("object_temperature_wavelength_with_uncertainty_f64", |b| {
        b.iter(|| {
            bb::object_temperature_wavelength_with_uncertainty(
                black_box(10e-6),
                black_box(s64),
                black_box(0.95),
                black_box(295.0),
                black_box(0.92),
                black_box(290.0),
                black_box(s64 * 0.01),
                black_box(0.02),
                black_box(2.0),
                black_box(0.01),
                black_box(2.0),
            )
        })
    });
    g.bench_function("object_temperature_wavelength_f32", |b| {
        b.iter(|| {
            bb::object_temperature_wavelength(
                black_box(10e-6f32),
                black_box(s32),
                black_box(0.95f32),
                black_box(295.0f32),
                black_box(0.92f32),
                black_box(290.0f32),
            )
        })
    });
    g.bench_function("object_temperature_wavelength_f64", |b| {
        b.iter(|| {
            bb::object_temperature_wavelength(
                black_box(10e-6),
                black_box(s64),
                black_box(0.95),
                black_box(295.0),
                black_box(0.92),
                black_box(290.0),
            )
        })
    });
    let sb = bb::measured_band_radiance_wavelength(8e-6, 14e-6, 310.0, 0.95, 295.0, 0.92, 290.0)
        .unwrap_or(f64::NAN);
    g.bench_function("object_temperature_band_with_uncertainty_f64", |b| {
        b.iter(|| {
            bb::object_temperature_band_with_uncertainty(
                black_box(8e-6),
                black_box(14e-6),
                black_box(sb),
                0.95,
                295.0,
                0.92,
                290.0,
                sb * 0.01,
                0.02,
                2.0,
                0.01,
                2.0,
            )
        })
    });
    let w = [7.5e-6, 8e-6, 13.5e-6, 14e-6];
    let r = [0.0, 1.0, 1.0, 0.0];
    let sr = bb::measured_response_weighted_radiance(&w, &r, 310.0, 0.95, 295.0, 0.92, 290.0)
        .unwrap_or(f64::NAN);
    g.bench_function("object_temperature_response_with_uncertainty_f64", |b| {
        b.iter(|| {
            bb::object_temperature_response_with_uncertainty(
                &w,
                &r,
                black_box(sr),
                0.95,
                295.0,
                0.92,
                290.0,
                sr * 0.01,
                0.02,
                2.0,
                0.01,
                2.0,
            )
        })
    });
    g.bench_function("calibrated_temperature_with_uncertainty_f32", |b| {
        b.iter(|| {
            bb::calibrated_temperature_with_uncertainty(
                black_box(90e9f32),
                black_box(1200.0f32),
                black_box(300.0f32),
                black_box(400.0f32),
                black_box(77.0f32),
                black_box(700.0f32),
                1.0,
                0.1,
                1.0,
                0.2,
                1.0,
            )
        })
    });
    g.finish();
}

fn frames(c: &mut Criterion) {
    let mut g = c.benchmark_group("thermometry_frame_1000x1000");
    g.sample_size(10);
    for per_pixel in [false, true] {
        let (sig, eps) = frame(per_pixel);
        let sig32: Vec<f32> = sig.iter().map(|&x| x as f32).collect();
        let eps32: Vec<f32> = eps.iter().map(|&x| x as f32).collect();
        let n = sig.len();
        let (mut t64, mut u64_) = (vec![0.0f64; n], vec![0.0f64; n]);
        let (mut t32, mut u32_) = (vec![0.0f32; n], vec![0.0f32; n]);
        let tag = if per_pixel {
            "per_pixel_emissivity"
        } else {
            "shared"
        };
        g.bench_function(format!("with_uncertainty_f64_{tag}"), |b| {
            b.iter(|| {
                bb::object_temperature_wavelength_with_uncertainty_array(
                    10e-6,
                    &sig,
                    &eps,
                    &[295.0],
                    &[0.92],
                    &[290.0],
                    &[1e4],
                    &[0.02],
                    &[2.0],
                    &[0.01],
                    &[2.0],
                    &mut t64,
                    &mut u64_,
                )
            })
        });
        g.bench_function(format!("with_uncertainty_f32_{tag}"), |b| {
            b.iter(|| {
                bb::object_temperature_wavelength_with_uncertainty_array(
                    10e-6f32,
                    &sig32,
                    &eps32,
                    &[295.0],
                    &[0.92],
                    &[290.0],
                    &[1e4],
                    &[0.02],
                    &[2.0],
                    &[0.01],
                    &[2.0],
                    &mut t32,
                    &mut u32_,
                )
            })
        });
        let blank64 = bb::TemperatureUncertainty {
            temperature_k: 0.0f64,
            combined_standard_uncertainty_k: 0.0,
            sensitivity_coefficients: [0.0; 5],
            inputs: 0,
        };
        let mut budgets64 = vec![blank64; n];
        let mut budgets32 = vec![
            bb::TemperatureUncertainty {
                temperature_k: 0.0f32,
                combined_standard_uncertainty_k: 0.0,
                sensitivity_coefficients: [0.0; 5],
                inputs: 0,
            };
            n
        ];
        g.bench_function(format!("budget_f64_{tag}"), |b| {
            b.iter(|| {
                bb::object_temperature_wavelength_budget_array(
                    10e-6,
                    &sig,
                    &eps,
                    &[295.0],
                    &[0.92],
                    &[290.0],
                    &[1e4],
                    &[0.02],
                    &[2.0],
                    &[0.01],
                    &[2.0],
                    &mut budgets64,
                )
            })
        });
        g.bench_function(format!("budget_f32_{tag}"), |b| {
            b.iter(|| {
                bb::object_temperature_wavelength_budget_array(
                    10e-6f32,
                    &sig32,
                    &eps32,
                    &[295.0],
                    &[0.92],
                    &[290.0],
                    &[1e4],
                    &[0.02],
                    &[2.0],
                    &[0.01],
                    &[2.0],
                    &mut budgets32,
                )
            })
        });
        g.bench_function(format!("temperature_only_f32_{tag}"), |b| {
            b.iter(|| {
                bb::object_temperature_wavelength_array(
                    10e-6f32,
                    &sig32,
                    &eps32,
                    &[295.0],
                    &[0.92],
                    &[290.0],
                    &mut t32,
                )
            })
        });
    }
    g.finish();
}

/// The pieces of one object temperature with uncertainty (f32), to see where its time goes.
fn pieces(c: &mut Criterion) {
    let mut g = c.benchmark_group("thermometry_pieces_f32");
    g.bench_function("spectral_radiance_wavelength", |b| {
        b.iter(|| bb::spectral_radiance_wavelength(black_box(10e-6f32), black_box(295.0f32)))
    });
    g.bench_function("radiance_temperature_derivative_wavelength", |b| {
        b.iter(|| {
            bb::radiance_temperature_derivative_wavelength(black_box(10e-6f32), black_box(295.0f32))
        })
    });
    g.bench_function("brightness_temperature_wavelength", |b| {
        b.iter(|| bb::brightness_temperature_wavelength(black_box(10e-6f32), black_box(9.3e6f32)))
    });
    g.bench_function("combined_standard_uncertainty_5", |b| {
        let c5 = [1e-6f32, -20.0, 0.1, -30.0, 0.05];
        let u5 = [1e4f32, 0.02, 2.0, 0.01, 2.0];
        b.iter(|| bb::combined_standard_uncertainty(black_box(&c5), black_box(&u5)))
    });
    g.finish();
}

/// The forms the faces add: a 64 × 64 frame at one frequency and in a band, with and without
/// uncertainty; the response-table forms; the correlated combination of five inputs.
fn face_forms(c: &mut Criterion) {
    let mut g = c.benchmark_group("thermometry_forms");
    let l = bb::spectral_radiance_frequency(3e13, 300.0).unwrap_or(f64::NAN);
    let lb = bb::band_radiance_wavelength(8e-6, 14e-6, 300.0).unwrap_or(f64::NAN);
    let sig: Vec<f64> = (0..4096).map(|i| l * (0.9 + 1e-4 * f64::from(i))).collect();
    let sigb: Vec<f64> = (0..4096)
        .map(|i| lb * (0.9 + 1e-4 * f64::from(i)))
        .collect();
    let (mut t, mut u) = (vec![0.0; 4096], vec![0.0; 4096]);
    let one = |x: f64| [x];
    g.bench_function("object_temperature_frequency_array_64x64", |b| {
        b.iter(|| {
            bb::object_temperature_frequency_array(
                3e13,
                black_box(&sig),
                &[0.9],
                &[293.0],
                &[0.95],
                &[280.0],
                &mut t,
            )
        })
    });
    g.bench_function("object_temperature_band_array_64x64", |b| {
        b.iter(|| {
            bb::object_temperature_band_array(
                8e-6,
                14e-6,
                black_box(&sigb),
                &[0.9],
                &[293.0],
                &[0.95],
                &[280.0],
                &mut t,
            )
        })
    });
    g.bench_function(
        "object_temperature_frequency_with_uncertainty_array_64x64",
        |b| {
            b.iter(|| {
                bb::object_temperature_frequency_with_uncertainty_array(
                    3e13,
                    black_box(&sig),
                    &[0.9],
                    &[293.0],
                    &[0.95],
                    &[280.0],
                    &one(1e-14),
                    &one(0.01),
                    &one(1.0),
                    &one(0.01),
                    &one(1.0),
                    &mut t,
                    &mut u,
                )
            })
        },
    );
    let mut budgets = vec![bb::TemperatureUncertainty::default(); 64 * 64];
    g.bench_function("object_temperature_frequency_budget_array_64x64", |b| {
        b.iter(|| {
            bb::object_temperature_frequency_budget_array(
                3e13,
                black_box(&sig),
                &[0.9],
                &[295.0],
                &[0.95],
                &[290.0],
                &[1e-14],
                &[0.01],
                &[1.0],
                &[0.01],
                &[1.0],
                &mut budgets,
            )
        })
    });
    g.bench_function("object_temperature_band_budget_array_64x64", |b| {
        b.iter(|| {
            bb::object_temperature_band_budget_array(
                8e-6,
                1.4e-5,
                black_box(&sigb),
                &[0.9],
                &[295.0],
                &[0.95],
                &[290.0],
                &[1.0],
                &[0.01],
                &[1.0],
                &[0.01],
                &[1.0],
                &mut budgets,
            )
        })
    });
    g.bench_function(
        "object_temperature_band_with_uncertainty_array_64x64",
        |b| {
            b.iter(|| {
                bb::object_temperature_band_with_uncertainty_array(
                    8e-6,
                    14e-6,
                    black_box(&sigb),
                    &[0.9],
                    &[293.0],
                    &[0.95],
                    &[280.0],
                    &one(0.1),
                    &one(0.01),
                    &one(1.0),
                    &one(0.01),
                    &one(1.0),
                    &mut t,
                    &mut u,
                )
            })
        },
    );
    let w = [8e-6, 9e-6, 11e-6, 13e-6, 14e-6];
    let r = [0.1, 0.9, 1.0, 0.8, 0.1];
    let m = bb::measured_response_weighted_radiance(&w, &r, 300.0, 0.9, 293.0, 0.95, 280.0)
        .unwrap_or(f64::NAN);
    g.bench_function("object_temperature_response", |b| {
        b.iter(|| bb::object_temperature_response(&w, &r, black_box(m), 0.9, 293.0, 0.95, 280.0))
    });
    g.bench_function("response_weighted_radiance_temperature_derivative", |b| {
        b.iter(|| bb::response_weighted_radiance_temperature_derivative(&w, &r, black_box(300.0)))
    });
    let cs = [0.1, -20.0, 0.05, -15.0, 0.01];
    let us = [1.0, 0.01, 1.0, 0.01, 1.0];
    let mut corr = [0.0; 25];
    for i in 0..5 {
        corr[6 * i] = 1.0;
    }
    corr[1] = 0.3;
    corr[5] = 0.3;
    g.bench_function("combined_standard_uncertainty_correlated_5", |b| {
        b.iter(|| bb::combined_standard_uncertainty_correlated(black_box(&cs), &us, &corr))
    });
    g.finish();
}

criterion_group!(benches, scalar, frames, pieces, face_forms);
criterion_main!(benches);
