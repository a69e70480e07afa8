//! The full parameter gradient of the luminosity distance at 10⁶ redshifts (issue 15): by dual
//! numbers (`GradientUniverse::luminosity_distance_mpc_gradient_array`), against the values
//! alone (`luminosity_distance_mpc_array`) and against central finite differences computed with
//! relicore itself (24 perturbed universes, built once outside the timed loop, and 24 value
//! arrays). Before timing, the finite differences' error against the dual gradient is printed
//! (the dual gradient is checked against mpmath to 1e-12 in `tests/dual_cosmology.rs`).
//! Also one call of each blackbody gradient (dual numbers with 2 or 3 partials) beside its plain
//! function, and the seeding of a universe's parameters.

use criterion::{Criterion, criterion_group, criterion_main};
use relicore::blackbody as bb;
use relicore::cosmology::{GRADIENT_LEN, GradientUniverse, Universe, UniverseParameters};
use std::hint::black_box;

const N: usize = 1_000_000;

/// The universes of one central difference: +h and -h, the step h, and whether the parameter is varied.
type Perturbed = (Box<Universe<f64>>, Box<Universe<f64>>, f64, bool);

fn parameters() -> UniverseParameters<f64> {
    let mut p = UniverseParameters::new(67.4, 0.315);
    p.omega_baryon = 0.049;
    p.omega_curvature = 0.01;
    p.w0 = -0.95;
    p.wa = 0.1;
    p
}

/// The perturbed parameter sets of central differences: parameter i (of the 12, in gradient
/// order) moved by ±h_i, h_i = 1e-6 of its size (1e-6 absolute where it is 0).
fn perturbed(p: &UniverseParameters<f64>, i: usize, sign: f64) -> (UniverseParameters<f64>, f64) {
    let mut q = *p;
    let slot: &mut f64 = match i {
        0 => &mut q.h0_km_s_mpc,
        1 => &mut q.omega_matter,
        2 => &mut q.omega_baryon,
        3 => &mut q.omega_curvature,
        4 => &mut q.cmb_temperature_k,
        5 => &mut q.n_eff,
        6 => &mut q.neutrino_masses_ev[0],
        7 => &mut q.neutrino_masses_ev[1],
        8 => &mut q.neutrino_masses_ev[2],
        9 => &mut q.w0,
        10 => &mut q.wa,
        _ => &mut q.helium_mass_fraction,
    };
    let h = if *slot == 0.0 {
        1e-6
    } else {
        1e-6 * slot.abs()
    };
    // masses cannot go below 0: a forward difference there (sign −1 gives the point itself)
    let h_used = if (6..=8).contains(&i) && sign < 0.0 {
        0.0
    } else {
        sign * h
    };
    *slot += h_used;
    (q, h)
}

fn bench(c: &mut Criterion) {
    let p = parameters();
    let u = Box::new(Universe::new(p).expect("universe"));
    let g = Box::new(GradientUniverse::with_gradients(p).expect("gradient universe"));
    let z: Vec<f64> = (0..N).map(|i| 1e-3 + 5.0 * (i as f64) / N as f64).collect();
    let mut values = vec![0.0; N];
    let mut gradients = vec![[0.0; GRADIENT_LEN]; N];
    let fd_universes: Vec<Perturbed> = (0..12)
        .map(|i| {
            let (qp, h) = perturbed(&p, i, 1.0);
            let (qm, _) = perturbed(&p, i, -1.0);
            let one_sided = (6..=8).contains(&i);
            (
                Box::new(Universe::new(qp).expect("u+")),
                Box::new(Universe::new(qm).expect("u-")),
                h,
                one_sided,
            )
        })
        .collect();
    let mut plus = vec![0.0; N];
    let mut minus = vec![0.0; N];
    let mut fd = vec![[0.0; 12]; N];
    let finite_differences =
        |fd: &mut Vec<[f64; 12]>, plus: &mut Vec<f64>, minus: &mut Vec<f64>| {
            for (i, (up, um, h, one_sided)) in fd_universes.iter().enumerate() {
                up.luminosity_distance_mpc_array(&z, plus).expect("D_L+");
                um.luminosity_distance_mpc_array(&z, minus).expect("D_L-");
                let step = if *one_sided { *h } else { 2.0 * h };
                for ((f, a), b) in fd.iter_mut().zip(plus.iter()).zip(minus.iter()) {
                    f[i] = (a - b) / step;
                }
            }
        };
    // accuracy of the finite differences against the dual gradient (relative to the largest
    // partial of each parameter over the redshifts, since single partials cross 0)
    g.luminosity_distance_mpc_gradient_array(&z, &mut values, &mut gradients)
        .expect("gradients");
    finite_differences(&mut fd, &mut plus, &mut minus);
    let mut worst = [0.0f64; 12];
    let mut scale = [0.0f64; 12];
    for (d, f) in gradients.iter().zip(fd.iter()) {
        for i in 0..12 {
            worst[i] = worst[i].max((d[i] - f[i]).abs());
            scale[i] = scale[i].max(d[i].abs());
        }
    }
    for i in 0..12 {
        if scale[i] > 0.0 {
            println!(
                "central differences, parameter {i}: max |FD − dual| / max |dual| = {:.2e}",
                worst[i] / scale[i]
            );
        }
    }
    let mut grp = c.benchmark_group("gradient_luminosity_distance_1e6");
    grp.sample_size(10);
    grp.bench_function("values_only_array", |b| {
        b.iter(|| u.luminosity_distance_mpc_array(black_box(&z), &mut values))
    });
    grp.bench_function("dual_gradient_13_partials", |b| {
        b.iter(|| {
            g.luminosity_distance_mpc_gradient_array(black_box(&z), &mut values, &mut gradients)
        })
    });
    grp.bench_function("central_differences_12_parameters", |b| {
        b.iter(|| finite_differences(&mut fd, &mut plus, &mut minus))
    });
    grp.bench_function("build_gradient_universe", |b| {
        b.iter(|| GradientUniverse::with_gradients(black_box(p)).map(Box::new))
    });
    grp.bench_function("build_24_universes_for_differences", |b| {
        b.iter(|| {
            for i in 0..12 {
                black_box(Universe::new(perturbed(&p, i, 1.0).0).map(Box::new)).ok();
                black_box(Universe::new(perturbed(&p, i, -1.0).0).map(Box::new)).ok();
            }
        })
    });
    grp.finish();
    let mut bg = c.benchmark_group("gradient_blackbody");
    bg.bench_function("spectral_radiance_wavelength", |b| {
        b.iter(|| bb::spectral_radiance_wavelength(black_box(10e-6), black_box(300.0)))
    });
    bg.bench_function("spectral_radiance_wavelength_gradient", |b| {
        b.iter(|| bb::spectral_radiance_wavelength_gradient(black_box(10e-6), black_box(300.0)))
    });
    bg.bench_function("spectral_radiance_frequency_gradient", |b| {
        b.iter(|| bb::spectral_radiance_frequency_gradient(black_box(3e13), black_box(300.0)))
    });
    bg.bench_function("brightness_temperature_wavelength_gradient", |b| {
        b.iter(|| {
            bb::brightness_temperature_wavelength_gradient(black_box(10e-6), black_box(9.9e6))
        })
    });
    bg.bench_function("brightness_temperature_frequency_gradient", |b| {
        b.iter(|| bb::brightness_temperature_frequency_gradient(black_box(3e13), black_box(3e-12)))
    });
    bg.bench_function("band_radiance_wavelength_gradient", |b| {
        b.iter(|| {
            bb::band_radiance_wavelength_gradient(
                black_box(8e-6),
                black_box(14e-6),
                black_box(300.0),
            )
        })
    });
    bg.bench_function("band_radiance_frequency_gradient", |b| {
        b.iter(|| {
            bb::band_radiance_frequency_gradient(black_box(2e13), black_box(4e13), black_box(300.0))
        })
    });
    bg.bench_function("temperature_from_band_radiance_wavelength_gradient", |b| {
        b.iter(|| {
            bb::temperature_from_band_radiance_wavelength_gradient(
                black_box(8e-6),
                black_box(14e-6),
                black_box(50.0),
            )
        })
    });
    bg.bench_function("seeded", |b| b.iter(|| black_box(p).seeded()));
    bg.finish();
}

criterion_group!(benches, bench);
criterion_main!(benches);
