//! Checks every structure-growth function against the shared reference vectors of
//! `tests/data/growth.txt`: an independent scipy `solve_ivp` integration of the growth equation,
//! the Heath (1977) integral, the Einstein-de Sitter closed form, an mpmath evaluation of the
//! Eisenstein & Hu 1998 formulae, mpmath quadratures of σ(R), of the BAO distances and of the
//! leapfrog factors, and facts of the trade (Linder 2005, Planck 2020, BOSS DR12; from memory);
//! see the `source` column and `tests/reference/growth_vectors.py`. Tolerances come from the file.

use relicore::cosmology::{Universe, UniverseParameters};
use relicore::growth::{
    LinearGrowth, LinearPowerSpectrum, TransferForm, eisenstein_hu_no_wiggle_transfer_function,
    eisenstein_hu_transfer_function,
};
use relicore::{Error, Result};
use std::collections::{BTreeMap, HashMap};
use std::path::PathBuf;

fn status(e: Error) -> i32 {
    match e {
        Error::NonFinite(_) => -2,
        Error::NonPositive(_) => -3,
        Error::Negative(_) => -4,
        Error::OutOfDomain(_) => -10,
        Error::NoConvergence => -11,
        Error::InvalidParameter(_) => -14,
        Error::NoBigBang => -15,
        Error::CapacityTooSmall(_) => -16,
        _ => -99,
    }
}

fn parse(s: &str) -> f64 {
    match s {
        "inf" | "+inf" => f64::INFINITY,
        "-inf" => f64::NEG_INFINITY,
        "nan" => f64::NAN,
        _ => s.parse().unwrap_or_else(|_| panic!("bad number {s}")),
    }
}

fn universe_call(u: &Universe<f64>, name: &str, a: &[f64]) -> Option<Result<f64>> {
    let g = |i: usize| a.get(i).copied().unwrap_or(f64::NAN);
    Some(match (name, a.len()) {
        ("hubble_distance_at_mpc", 1) => u.hubble_distance_at_mpc(g(0)),
        ("volume_averaged_distance_mpc", 1) => u.volume_averaged_distance_mpc(g(0)),
        ("transverse_comoving_distance_over_sound_horizon", 2) => {
            u.transverse_comoving_distance_over_sound_horizon(g(0), g(1))
        }
        ("hubble_distance_over_sound_horizon", 2) => {
            u.hubble_distance_over_sound_horizon(g(0), g(1))
        }
        ("volume_averaged_distance_over_sound_horizon", 2) => {
            u.volume_averaged_distance_over_sound_horizon(g(0), g(1))
        }
        _ => return None,
    })
}

fn growth_call(gr: &LinearGrowth<f64>, name: &str, a: &[f64]) -> Option<Result<f64>> {
    let g = |i: usize| a.get(i).copied().unwrap_or(f64::NAN);
    Some(match (name, a.len()) {
        ("growth_factor", 1) => gr.growth_factor(g(0)),
        ("growth_rate", 1) => gr.growth_rate(g(0)),
        ("unnormalized_growth_factor", 1) => gr.unnormalized_growth_factor(g(0)),
        ("leapfrog_drift_factor_gyr", 2) => gr.leapfrog_drift_factor_gyr(g(0), g(1)),
        ("leapfrog_kick_factor_gyr", 2) => gr.leapfrog_kick_factor_gyr(g(0), g(1)),
        _ => return None,
    })
}

fn spectrum_call(s: &LinearPowerSpectrum<f64>, name: &str, a: &[f64]) -> Option<Result<f64>> {
    let g = |i: usize| a.get(i).copied().unwrap_or(f64::NAN);
    Some(match (name, a.len()) {
        ("transfer_function", 1) => s.transfer_function(g(0)),
        ("linear_power_spectrum_mpc3", 2) => s.linear_power_spectrum_mpc3(g(0), g(1)),
        ("density_rms_in_sphere", 2) => s.density_rms_in_sphere(g(0), g(1)),
        ("growth_rate_times_sigma8", 1) => s.growth_rate_times_sigma8(g(0)),
        ("sigma8", 0) => Ok(s.sigma8()),
        ("s8", 0) => Ok(s.s8()),
        ("scalar_amplitude", 0) => Ok(s.scalar_amplitude()),
        _ => return None,
    })
}

#[test]
fn growth_reference_vectors() {
    let path = PathBuf::from(env!("CARGO_MANIFEST_DIR")).join("tests/data/growth.txt");
    let text = std::fs::read_to_string(&path)
        .unwrap_or_else(|e| panic!("cannot read {}: {e}", path.display()));
    let mut universes: HashMap<String, Universe<f64>> = HashMap::new();
    let mut growths: HashMap<String, Box<LinearGrowth<f64>>> = HashMap::new();
    let mut spectra: HashMap<String, Box<LinearPowerSpectrum<f64>>> = HashMap::new();
    let mut passed = 0usize;
    let mut failed = Vec::new();
    let mut worst: BTreeMap<String, f64> = BTreeMap::new();
    for line in text
        .lines()
        .map(str::trim)
        .filter(|l| !l.is_empty() && !l.starts_with('#'))
    {
        let f: Vec<&str> = line.split_whitespace().collect();
        match f[0] {
            "universe" => {
                let v: Vec<f64> = f[2..14].iter().map(|s| parse(s)).collect();
                let p = UniverseParameters {
                    h0_km_s_mpc: v[0],
                    omega_matter: v[1],
                    omega_baryon: v[2],
                    omega_curvature: v[3],
                    cmb_temperature_k: v[4],
                    n_eff: v[5],
                    neutrino_masses_ev: [v[6], v[7], v[8]],
                    w0: v[9],
                    wa: v[10],
                    helium_mass_fraction: v[11],
                };
                let u = Universe::new(p).unwrap_or_else(|e| panic!("universe {}: {e}", f[1]));
                universes.insert(f[1].to_string(), u);
                continue;
            }
            "growth" => {
                let g = LinearGrowth::new(&universes[f[2]])
                    .unwrap_or_else(|e| panic!("growth {}: {e}", f[1]));
                growths.insert(f[1].to_string(), Box::new(g));
                continue;
            }
            "spectrum" => {
                let g = &growths[f[2]];
                let form = match f[3] {
                    "oscillations" => TransferForm::BaryonOscillations,
                    "no_wiggle" => TransferForm::NoWiggle,
                    other => panic!("unknown form {other}"),
                };
                let (value, ns, alpha) = (parse(f[5]), parse(f[6]), parse(f[7]));
                let s = match f[4] {
                    "scalar_amplitude" => {
                        LinearPowerSpectrum::with_scalar_amplitude(g, form, value, ns, alpha)
                    }
                    "sigma8" => LinearPowerSpectrum::with_sigma8(g, form, value, ns, alpha),
                    other => panic!("unknown normalisation {other}"),
                }
                .unwrap_or_else(|e| panic!("spectrum {}: {e}", f[1]));
                spectra.insert(f[1].to_string(), Box::new(s));
                continue;
            }
            _ => {}
        }
        let (name, target) = (f[0], f[1]);
        let n: usize = f[2].parse().expect("nargs");
        let args: Vec<f64> = f[3..3 + n].iter().map(|s| parse(s)).collect();
        let want = parse(f[3 + n]);
        let (kind, tol) = (f[4 + n], parse(f[5 + n]));
        let src = f.get(6 + n).copied().unwrap_or("?");
        let a = |i: usize| args.get(i).copied().unwrap_or(f64::NAN);
        let got = if target == "-" {
            match name {
                "eisenstein_hu_transfer_function" => {
                    eisenstein_hu_transfer_function(a(0), a(1), a(2), a(3))
                }
                "eisenstein_hu_no_wiggle_transfer_function" => {
                    eisenstein_hu_no_wiggle_transfer_function(a(0), a(1), a(2), a(3))
                }
                _ => panic!("no dispatch for {name}"),
            }
        } else if let Some(u) = universes.get(target) {
            universe_call(u, name, &args).unwrap_or_else(|| panic!("no dispatch for {name}/{n}"))
        } else if let Some(g) = growths.get(target) {
            growth_call(g, name, &args).unwrap_or_else(|| panic!("no dispatch for {name}/{n}"))
        } else if let Some(s) = spectra.get(target) {
            spectrum_call(s, name, &args).unwrap_or_else(|| panic!("no dispatch for {name}/{n}"))
        } else {
            panic!("unknown target {target}")
        };
        let (ok, err) = match (kind, got) {
            ("status", Err(e)) => (status(e) == tol as i32, 0.0),
            ("status", Ok(_)) | (_, Err(_)) => (false, f64::INFINITY),
            (_, Ok(v)) => {
                let d = (v - want).abs();
                let (bound, unit) = match kind {
                    "rel" => (tol * want.abs(), want.abs().max(f64::MIN_POSITIVE)),
                    "abs" => (tol, tol.max(f64::MIN_POSITIVE)),
                    _ => panic!("unknown tolerance kind {kind}"),
                };
                (v == want || d <= bound, d / unit)
            }
        };
        let w = worst.entry(format!("{name} [{kind} {src}]")).or_insert(0.0);
        if err.is_finite() && err > *w {
            *w = err;
        }
        if ok {
            passed += 1;
        } else {
            failed.push(format!(
                "{name}@{target}({}) want {want:.17e} got {got:?} ({kind} {tol:e}, {src})",
                f[3..3 + n].join(", ")
            ));
        }
    }
    println!(
        "worst error per function, kind and source (rel: relative; abs: fraction of the tolerance):"
    );
    for (k, v) in &worst {
        println!("  {k:75} {v:.3e}");
    }
    for f in &failed {
        println!("FAIL {f}");
    }
    println!("{passed} passed, {} failed", failed.len());
    assert!(passed > 300, "suspiciously few vectors: {passed}");
    assert!(failed.is_empty(), "{} growth vectors failed", failed.len());
}
