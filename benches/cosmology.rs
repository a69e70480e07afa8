//! Criterion benches of the cosmological background: universe construction (which builds the
//! distance table), every method at a typical redshift, and an array of distances.

use criterion::{Criterion, criterion_group, criterion_main};
use relicore::cosmology::{Universe, UniverseParameters};
use std::hint::black_box;

fn models() -> (Universe<f64>, Universe<f64>) {
    let flat =
        Universe::new(UniverseParameters::new(67.36, 0.3153)).unwrap_or_else(|e| panic!("{e}"));
    let mut p = UniverseParameters::new(67.36, 0.3153);
    p.omega_baryon = 0.02237 / (0.6736 * 0.6736);
    p.n_eff = 3.046;
    p.neutrino_masses_ev = [0.06, 0.0, 0.0];
    p.omega_curvature = 0.01;
    let nu = Universe::new(p).unwrap_or_else(|e| panic!("{e}"));
    (flat, nu)
}

fn construction(c: &mut Criterion) {
    let mut g = c.benchmark_group("universe");
    g.bench_function("new_flat_radiation", |b| {
        b.iter(|| {
            Universe::new(UniverseParameters::new(
                black_box(67.36f64),
                black_box(0.3153),
            ))
        })
    });
    let mut p = UniverseParameters::new(67.36f64, 0.3153);
    p.neutrino_masses_ev = [0.06, 0.0, 0.0];
    g.bench_function("new_massive_neutrino", |b| {
        b.iter(|| Universe::new(black_box(p)))
    });
    g.finish();
}

fn methods(c: &mut Criterion) {
    let (flat, nu) = models();
    let mut g = c.benchmark_group("cosmology_scalar");
    let z = 1.3f64;
    for (name, u) in [("flat", &flat), ("curved_massive_nu", &nu)] {
        g.bench_function(format!("dimensionless_hubble/{name}"), |b| {
            b.iter(|| u.dimensionless_hubble(black_box(z)))
        });
        g.bench_function(format!("luminosity_distance_mpc/{name}"), |b| {
            b.iter(|| u.luminosity_distance_mpc(black_box(z)))
        });
        g.bench_function(format!("age_gyr/{name}"), |b| {
            b.iter(|| u.age_gyr(black_box(z)))
        });
    }
    let u = &nu;
    g.bench_function("hubble_parameter_km_s_mpc", |b| {
        b.iter(|| u.hubble_parameter_km_s_mpc(black_box(z)))
    });
    g.bench_function("omega_matter_at", |b| {
        b.iter(|| u.omega_matter_at(black_box(z)))
    });
    g.bench_function("omega_radiation_at", |b| {
        b.iter(|| u.omega_radiation_at(black_box(z)))
    });
    g.bench_function("omega_dark_energy_at", |b| {
        b.iter(|| u.omega_dark_energy_at(black_box(z)))
    });
    g.bench_function("omega_curvature_at", |b| {
        b.iter(|| u.omega_curvature_at(black_box(z)))
    });
    g.bench_function("critical_density_kg_m3", |b| {
        b.iter(|| u.critical_density_kg_m3(black_box(z)))
    });
    g.bench_function("cmb_temperature_at_k", |b| {
        b.iter(|| u.cmb_temperature_at_k(black_box(z)))
    });
    g.bench_function("comoving_distance_mpc", |b| {
        b.iter(|| u.comoving_distance_mpc(black_box(z)))
    });
    g.bench_function("comoving_distance_mpc_beyond_table", |b| {
        b.iter(|| u.comoving_distance_mpc(black_box(1e5)))
    });
    g.bench_function("transverse_comoving_distance_mpc", |b| {
        b.iter(|| u.transverse_comoving_distance_mpc(black_box(z)))
    });
    g.bench_function("angular_diameter_distance_mpc", |b| {
        b.iter(|| u.angular_diameter_distance_mpc(black_box(z)))
    });
    g.bench_function("angular_diameter_distance_between_mpc", |b| {
        b.iter(|| u.angular_diameter_distance_between_mpc(black_box(0.5), black_box(z)))
    });
    g.bench_function("distance_modulus", |b| {
        b.iter(|| u.distance_modulus(black_box(z)))
    });
    g.bench_function("comoving_volume_gpc3", |b| {
        b.iter(|| u.comoving_volume_gpc3(black_box(z)))
    });
    g.bench_function("differential_comoving_volume_mpc3_sr", |b| {
        b.iter(|| u.differential_comoving_volume_mpc3_sr(black_box(z)))
    });
    g.bench_function("transverse_scale_kpc_per_arcsec", |b| {
        b.iter(|| u.transverse_scale_kpc_per_arcsec(black_box(z)))
    });
    g.bench_function("lookback_time_gyr", |b| {
        b.iter(|| u.lookback_time_gyr(black_box(z)))
    });
    g.bench_function("conformal_time_mpc", |b| {
        b.iter(|| u.conformal_time_mpc(black_box(z)))
    });
    g.bench_function("redshift_at_age_gyr", |b| {
        b.iter(|| u.redshift_at_age_gyr(black_box(5.0)))
    });
    g.bench_function("redshift_at_lookback_time_gyr", |b| {
        b.iter(|| u.redshift_at_lookback_time_gyr(black_box(5.0)))
    });
    g.bench_function("redshift_at_comoving_distance_mpc", |b| {
        b.iter(|| u.redshift_at_comoving_distance_mpc(black_box(3000.0)))
    });
    g.bench_function("redshift_at_luminosity_distance_mpc", |b| {
        b.iter(|| u.redshift_at_luminosity_distance_mpc(black_box(3000.0)))
    });
    g.bench_function("constants", |b| {
        b.iter(|| {
            (
                black_box(u).hubble_distance_mpc(),
                u.hubble_time_gyr(),
                u.omega_radiation(),
                u.omega_dark_energy(),
                u.matter_radiation_equality_redshift(),
                u.parameters().h0_km_s_mpc,
            )
        })
    });
    g.finish();
    let zs: Vec<f64> = (0..1000).map(|i| 0.01 + 3.0 * i as f64 / 1000.0).collect();
    let mut out = vec![0.0; zs.len()];
    c.bench_function("cosmology_array/luminosity_distance_mpc_1000", |b| {
        b.iter(|| {
            for (o, &z) in out.iter_mut().zip(&zs) {
                *o = flat.luminosity_distance_mpc(z).unwrap_or(f64::NAN);
            }
            black_box(&out);
        })
    });
    // the core's array functions (baseline target here; AVX2/AVX-512 in the C and Python faces)
    c.bench_function("cosmology_array/luminosity_distance_mpc_array_1000", |b| {
        b.iter(|| flat.luminosity_distance_mpc_array(black_box(&zs), &mut out))
    });
    c.bench_function("cosmology_array/comoving_distance_mpc_array_1000", |b| {
        b.iter(|| flat.comoving_distance_mpc_array(black_box(&zs), &mut out))
    });
    c.bench_function(
        "cosmology_array/transverse_comoving_distance_mpc_array_1000",
        |b| b.iter(|| flat.transverse_comoving_distance_mpc_array(black_box(&zs), &mut out)),
    );
    c.bench_function(
        "cosmology_array/angular_diameter_distance_mpc_array_1000",
        |b| b.iter(|| flat.angular_diameter_distance_mpc_array(black_box(&zs), &mut out)),
    );
}

criterion_group!(benches, construction, methods);
criterion_main!(benches);
