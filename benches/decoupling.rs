//! Criterion benches of decoupling: the whole thermal history with its summary (timed side by
//! side with a careful scipy implementation of the same equations, with the accuracy of each,
//! in `benches/compare/decoupling_compare.py`; target: at least 1.5× faster than the history of
//! commit 39bd96d, compared in one run), every query at one redshift (target: x_e at
//! one z under 100 ns), the summary getters, Saha equilibrium and the fits.

use criterion::{Criterion, criterion_group, criterion_main};
use relicore::cosmology::{Universe, UniverseParameters};
use relicore::decoupling::{
    HistoryOptions, ThermalHistory, drag_redshift_fit, last_scattering_redshift_fit,
    saha_ionized_fraction,
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

fn history(c: &mut Criterion) {
    let u = universe();
    let mut g = c.benchmark_group("decoupling_history");
    g.sample_size(20);
    g.bench_function("new_with_summary", |b| {
        b.iter(|| ThermalHistory::<f64>::new(black_box(&u), HistoryOptions::default()))
    });
    let reion = HistoryOptions {
        reionization_redshift: Some(7.67),
        ..HistoryOptions::default()
    };
    g.bench_function("new_with_summary_reionized", |b| {
        b.iter(|| ThermalHistory::<f64>::new(black_box(&u), reion))
    });
    let mut h =
        ThermalHistory::<f64>::new(&u, HistoryOptions::default()).unwrap_or_else(|e| panic!("{e}"));
    g.bench_function("compute_in_place", |b| {
        b.iter(|| h.compute_in_place(black_box(&u), HistoryOptions::default()))
    });
    g.finish();
}

fn queries(c: &mut Criterion) {
    let u = universe();
    let h = ThermalHistory::<f64>::new(
        &u,
        HistoryOptions {
            reionization_redshift: Some(7.67),
            ..HistoryOptions::default()
        },
    )
    .unwrap_or_else(|e| panic!("{e}"));
    let plain =
        ThermalHistory::<f64>::new(&u, HistoryOptions::default()).unwrap_or_else(|e| panic!("{e}"));
    let mut g = c.benchmark_group("decoupling_query");
    let z = 1089.7f64;
    g.bench_function("ionized_fraction", |b| {
        b.iter(|| plain.ionized_fraction(black_box(z)))
    });
    g.bench_function("ionized_fraction/reionized", |b| {
        b.iter(|| h.ionized_fraction(black_box(z)))
    });
    g.bench_function("matter_temperature_k", |b| {
        b.iter(|| plain.matter_temperature_k(black_box(z)))
    });
    g.bench_function("optical_depth", |b| {
        b.iter(|| plain.optical_depth(black_box(z)))
    });
    g.bench_function("optical_depth/reionized_z6", |b| {
        b.iter(|| h.optical_depth(black_box(6.3)))
    });
    g.bench_function("visibility", |b| b.iter(|| plain.visibility(black_box(z))));
    g.bench_function("sound_horizon_mpc", |b| {
        b.iter(|| plain.sound_horizon_mpc(black_box(z)))
    });
    let zs: Vec<f64> = (0..1000).map(|i| 1.0 + 9.0 * i as f64).collect();
    g.bench_function("ionized_fraction/array_1000", |b| {
        b.iter(|| {
            zs.iter()
                .map(|&z| plain.ionized_fraction(black_box(z)).unwrap_or(f64::NAN))
                .sum::<f64>()
        })
    });
    g.finish();

    let mut g = c.benchmark_group("decoupling_summary");
    g.bench_function("last_scattering_redshift", |b| {
        b.iter(|| black_box(&h).last_scattering_redshift())
    });
    g.bench_function("drag_redshift", |b| {
        b.iter(|| black_box(&h).drag_redshift())
    });
    g.bench_function("sound_horizon_last_scattering_mpc", |b| {
        b.iter(|| black_box(&h).sound_horizon_last_scattering_mpc())
    });
    g.bench_function("sound_horizon_drag_mpc", |b| {
        b.iter(|| black_box(&h).sound_horizon_drag_mpc())
    });
    g.bench_function("angular_scale_last_scattering", |b| {
        b.iter(|| black_box(&h).angular_scale_last_scattering())
    });
    g.bench_function("age_at_last_scattering_yr", |b| {
        b.iter(|| black_box(&h).age_at_last_scattering_yr())
    });
    g.bench_function("temperature_at_last_scattering_k", |b| {
        b.iter(|| black_box(&h).temperature_at_last_scattering_k())
    });
    g.bench_function("visibility_peak_redshift", |b| {
        b.iter(|| black_box(&h).visibility_peak_redshift())
    });
    g.bench_function("thermal_decoupling_redshift", |b| {
        b.iter(|| black_box(&h).thermal_decoupling_redshift())
    });
    g.bench_function("reionization_optical_depth", |b| {
        b.iter(|| black_box(&h).reionization_optical_depth())
    });
    g.finish();
}

fn equilibrium_and_fits(c: &mut Criterion) {
    let u = universe();
    let mut g = c.benchmark_group("decoupling_scalar");
    g.bench_function("saha_ionized_fraction/z1370", |b| {
        b.iter(|| saha_ionized_fraction(black_box(&u), black_box(1370.0)))
    });
    g.bench_function("saha_ionized_fraction/z6000_helium", |b| {
        b.iter(|| saha_ionized_fraction(black_box(&u), black_box(6000.0)))
    });
    g.bench_function("last_scattering_redshift_fit", |b| {
        b.iter(|| last_scattering_redshift_fit(black_box(0.02237f64), black_box(0.1430)))
    });
    g.bench_function("drag_redshift_fit", |b| {
        b.iter(|| drag_redshift_fit(black_box(0.02237f64), black_box(0.1430)))
    });
    g.finish();
}

criterion_group!(benches, history, queries, equilibrium_and_fits);
criterion_main!(benches);
