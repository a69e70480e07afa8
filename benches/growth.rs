//! Criterion benches of structure growth: construction of a growth table and of a power
//! spectrum (σ8 included), every query at one argument, the array forms over 1000 inputs, σ(R),
//! the transfer functions, the BAO ratios and the leapfrog factors of one step. The speed
//! targets compare with scipy/numpy recipes in `benches/compare/`.

use criterion::{Criterion, criterion_group, criterion_main};
use relicore::cosmology::{Universe, UniverseParameters};
use relicore::growth::{
    LinearGrowth, LinearPowerSpectrum, TransferForm, eisenstein_hu_no_wiggle_transfer_function,
    eisenstein_hu_transfer_function,
};
use std::hint::black_box;

/// Base ΛCDM parameters of Planck Collaboration 2020 (A&A 641, A6, Table 2; from memory).
fn universe() -> Universe<f64> {
    let h = 0.6736;
    let mut p = UniverseParameters::new(67.36, 0.3153);
    p.omega_baryon = 0.02237 / (h * h);
    p.n_eff = 3.046;
    p.neutrino_masses_ev = [0.06, 0.0, 0.0];
    Universe::new(p).unwrap_or_else(|e| panic!("{e}"))
}

fn construction(c: &mut Criterion) {
    let u = universe();
    let mut g = c.benchmark_group("growth_construction");
    g.sample_size(20);
    g.bench_function("linear_growth_new", |b| {
        b.iter(|| LinearGrowth::<f64>::new(black_box(&u)))
    });
    let growth = Box::new(LinearGrowth::new(&u).unwrap_or_else(|e| panic!("{e}")));
    let mut inplace = growth.clone();
    g.bench_function("linear_growth_compute_in_place", |b| {
        b.iter(|| inplace.compute_in_place(black_box(&u)))
    });
    g.bench_function("power_spectrum_with_scalar_amplitude", |b| {
        b.iter(|| {
            LinearPowerSpectrum::with_scalar_amplitude(
                black_box(&growth),
                TransferForm::BaryonOscillations,
                2.1e-9,
                0.9649,
                0.0,
            )
        })
    });
    g.bench_function("power_spectrum_with_sigma8", |b| {
        b.iter(|| {
            LinearPowerSpectrum::with_sigma8(
                black_box(&growth),
                TransferForm::BaryonOscillations,
                0.811,
                0.9649,
                0.0,
            )
        })
    });
    g.finish();
}

fn queries(c: &mut Criterion) {
    let u = universe();
    let growth = Box::new(LinearGrowth::new(&u).unwrap_or_else(|e| panic!("{e}")));
    let s = Box::new(
        LinearPowerSpectrum::with_scalar_amplitude(
            &growth,
            TransferForm::BaryonOscillations,
            2.1e-9,
            0.9649,
            0.0,
        )
        .unwrap_or_else(|e| panic!("{e}")),
    );
    let nw = Box::new(
        LinearPowerSpectrum::with_scalar_amplitude(
            &growth,
            TransferForm::NoWiggle,
            2.1e-9,
            0.9649,
            0.0,
        )
        .unwrap_or_else(|e| panic!("{e}")),
    );
    let mut g = c.benchmark_group("growth_query");
    let z = 49.0f64;
    g.bench_function("growth_factor", |b| {
        b.iter(|| growth.growth_factor(black_box(z)))
    });
    g.bench_function("growth_rate", |b| {
        b.iter(|| growth.growth_rate(black_box(z)))
    });
    g.bench_function("unnormalized_growth_factor", |b| {
        b.iter(|| growth.unnormalized_growth_factor(black_box(z)))
    });
    g.bench_function("transfer_function/oscillations", |b| {
        b.iter(|| s.transfer_function(black_box(0.1)))
    });
    g.bench_function("transfer_function/no_wiggle", |b| {
        b.iter(|| nw.transfer_function(black_box(0.1)))
    });
    g.bench_function("eisenstein_hu_transfer_function", |b| {
        b.iter(|| eisenstein_hu_transfer_function(black_box(0.1), 0.143, 0.02237, 2.7255))
    });
    g.bench_function("eisenstein_hu_no_wiggle_transfer_function", |b| {
        b.iter(|| eisenstein_hu_no_wiggle_transfer_function(black_box(0.1), 0.143, 0.02237, 2.7255))
    });
    g.bench_function("linear_power_spectrum_mpc3", |b| {
        b.iter(|| s.linear_power_spectrum_mpc3(black_box(0.1), black_box(z)))
    });
    g.bench_function("growth_rate_times_sigma8", |b| {
        b.iter(|| s.growth_rate_times_sigma8(black_box(0.5)))
    });
    g.bench_function("sigma8_getter", |b| b.iter(|| black_box(&s).sigma8()));
    g.bench_function("hubble_distance_over_sound_horizon", |b| {
        b.iter(|| u.hubble_distance_over_sound_horizon(black_box(0.51), 147.09))
    });
    g.bench_function("transverse_comoving_distance_over_sound_horizon", |b| {
        b.iter(|| u.transverse_comoving_distance_over_sound_horizon(black_box(0.51), 147.09))
    });
    g.bench_function("volume_averaged_distance_over_sound_horizon", |b| {
        b.iter(|| u.volume_averaged_distance_over_sound_horizon(black_box(0.51), 147.09))
    });
    g.bench_function("leapfrog_drift_factor_gyr/one_step", |b| {
        b.iter(|| growth.leapfrog_drift_factor_gyr(black_box(0.5), black_box(0.505)))
    });
    g.bench_function("leapfrog_kick_factor_gyr/one_step", |b| {
        b.iter(|| growth.leapfrog_kick_factor_gyr(black_box(0.5), black_box(0.505)))
    });
    g.bench_function("leapfrog_drift_factor_gyr/whole_run", |b| {
        b.iter(|| growth.leapfrog_drift_factor_gyr(black_box(0.02), black_box(1.0)))
    });
    let zs: Vec<f64> = (0..1000).map(|i| 0.01 * i as f64 + 0.001).collect();
    let mut out = vec![0.0; 1000];
    g.bench_function("growth_factor_array_1000", |b| {
        b.iter(|| growth.growth_factor_array(black_box(&zs), &mut out))
    });
    g.bench_function("growth_rate_array_1000", |b| {
        b.iter(|| growth.growth_rate_array(black_box(&zs), &mut out))
    });
    let ks: Vec<f64> = (0..1000)
        .map(|i| 10f64.powf(-4.0 + 0.006 * i as f64))
        .collect();
    g.bench_function("linear_power_spectrum_mpc3_array_1000", |b| {
        b.iter(|| s.linear_power_spectrum_mpc3_array(black_box(&ks), 0.0, &mut out))
    });
    g.bench_function("transfer_function_array_1000", |b| {
        b.iter(|| s.transfer_function_array(black_box(&ks), &mut out))
    });
    g.finish();
    let mut g = c.benchmark_group("growth_sigma");
    g.sample_size(20);
    g.bench_function("density_rms_in_sphere/r8", |b| {
        b.iter(|| s.density_rms_in_sphere(black_box(8.0 / 0.6736), 0.0))
    });
    g.bench_function("density_rms_in_sphere/r1", |b| {
        b.iter(|| s.density_rms_in_sphere(black_box(1.0), 0.0))
    });
    g.finish();
}

criterion_group!(benches, construction, queries);
criterion_main!(benches);
