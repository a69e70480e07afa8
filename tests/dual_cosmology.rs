//! Gradients of the background by dual numbers (`relicore::cosmology::GradientUniverse`): the
//! partials with respect to z and every parameter against mpmath
//! (`tests/data/gradients/cosmology.txt`: mpmath.diff at 40 digits of an independent mpmath
//! background, closed forms of the Einstein-de Sitter and Milne models and the flat ΛCDM age
//! as second routes; `tests/reference/gradient_vectors.py`), the value part against the plain
//! `f64` universe bit for bit, the inversion's partials by the implicit function theorem
//! against the reciprocal of the distance's, and the errors against the plain ones.

use relicore::Result;
use relicore::cosmology::{
    GRADIENT_ARGUMENT, GRADIENT_LEN, GRADIENT_OMEGA_MATTER, GradientUniverse, Universe,
    UniverseParameters,
};
use std::collections::{BTreeMap, HashMap};
use std::path::PathBuf;

/// A model's gradient universe and its plain universe.
type Pair = (Box<GradientUniverse<f64>>, Box<Universe<f64>>);

fn data(name: &str) -> String {
    let p = PathBuf::from(env!("CARGO_MANIFEST_DIR"))
        .join("tests/data")
        .join(name);
    std::fs::read_to_string(&p).unwrap_or_else(|e| panic!("cannot read {}: {e}", p.display()))
}

fn params(v: &[f64]) -> UniverseParameters<f64> {
    let mut p = UniverseParameters::new(v[0], v[1]);
    p.omega_baryon = v[2];
    p.omega_curvature = v[3];
    p.cmb_temperature_k = v[4];
    p.n_eff = v[5];
    p.neutrino_masses_ev = [v[6], v[7], v[8]];
    p.w0 = v[9];
    p.wa = v[10];
    p.helium_mass_fraction = v[11];
    p
}

type G = (f64, [f64; GRADIENT_LEN]);

fn gradient(u: &GradientUniverse<f64>, name: &str, z: f64) -> Result<G> {
    match name {
        "luminosity_distance_mpc" => u.luminosity_distance_mpc_gradient(z),
        "comoving_distance_mpc" => u.comoving_distance_mpc_gradient(z),
        "hubble_parameter_km_s_mpc" => u.hubble_parameter_km_s_mpc_gradient(z),
        "age_gyr" => u.age_gyr_gradient(z),
        _ => panic!("no gradient for {name}"),
    }
}

fn plain(u: &Universe<f64>, name: &str, z: f64) -> Result<f64> {
    match name {
        "luminosity_distance_mpc" => u.luminosity_distance_mpc(z),
        "comoving_distance_mpc" => u.comoving_distance_mpc(z),
        "hubble_parameter_km_s_mpc" => u.hubble_parameter_km_s_mpc(z),
        "age_gyr" => u.age_gyr(z),
        _ => panic!("no function {name}"),
    }
}

/// Runs `f` on a thread with a large stack (a gradient universe is about 200 KB).
fn big_stack(f: impl FnOnce() + Send + 'static) {
    std::thread::Builder::new()
        .stack_size(64 << 20)
        .spawn(f)
        .expect("thread")
        .join()
        .expect("test thread panicked");
}

#[test]
fn gradients_match_mpmath_and_values_match_the_plain_universe() {
    big_stack(|| {
        let text = data("gradients/cosmology.txt");
        let mut universes: HashMap<String, Pair> = HashMap::new();
        let mut worst: BTreeMap<String, f64> = BTreeMap::new();
        let mut n = 0;
        for line in text.lines() {
            let line = line.trim();
            if line.is_empty() || line.starts_with('#') {
                continue;
            }
            let f: Vec<&str> = line.split(' ').collect();
            if f[0] == "universe" {
                let v: Vec<f64> = f[2..14].iter().map(|s| s.parse().unwrap()).collect();
                let p = params(&v);
                let g =
                    GradientUniverse::with_gradients(p).unwrap_or_else(|e| panic!("{line}: {e}"));
                let u = Universe::new(p).unwrap();
                universes.insert(f[1].to_string(), (Box::new(g), Box::new(u)));
                continue;
            }
            assert_eq!(f[0], "function");
            let (g, u) = &universes[f[1]];
            let (name, field) = f[2].split_once('@').expect("name@field");
            let nargs: usize = f[3].parse().unwrap();
            let args: Vec<f64> = f[4..4 + nargs].iter().map(|s| s.parse().unwrap()).collect();
            let want: f64 = f[4 + nargs].parse().unwrap();
            let kind = f[5 + nargs];
            let tol: f64 = f[6 + nargs].parse().unwrap();
            let z = args[0];
            let (v, d) = gradient(g, name, z).unwrap_or_else(|e| panic!("{line}: {e}"));
            let got = if field == "value" {
                let p = plain(u, name, z).unwrap();
                assert_eq!(v.to_bits(), p.to_bits(), "{line}: value {v:e} plain {p:e}");
                v
            } else {
                // d0 is the redshift, d1.. the twelve parameters in their order
                let i: usize = field.trim_start_matches('d').parse().unwrap();
                if i == 0 {
                    d[GRADIENT_ARGUMENT]
                } else {
                    d[i - 1]
                }
            };
            let err = match kind {
                "rel" if tol == 0.0 => {
                    assert_eq!(got, 0.0, "{line}: must be exactly 0, got {got:e}");
                    0.0
                }
                "rel" => ((got - want) / want).abs(),
                "abs" => (got - want).abs(),
                _ => panic!("{line}: kind {kind}"),
            };
            assert!(err <= tol, "{line}: got {got:e}, error {err:e} > {tol:e}");
            if kind == "rel" && tol > 0.0 {
                let w = worst
                    .entry(format!(
                        "{name}@{}",
                        if field == "value" {
                            "value"
                        } else {
                            "partials"
                        }
                    ))
                    .or_insert(0.0);
                *w = w.max(err);
            }
            n += 1;
        }
        assert!(n > 1000, "only {n} vectors");
        for (k, w) in &worst {
            println!("{k}: worst relative error {w:.2e}");
        }
    });
}

#[test]
fn inversion_partials_are_those_of_the_implicit_function_theorem() {
    big_stack(|| {
        let mut p = UniverseParameters::new(67.4f64, 0.315);
        p.omega_curvature = 0.02;
        p.w0 = -0.95;
        let g = GradientUniverse::with_gradients(p).unwrap();
        let u = Universe::new(p).unwrap();
        for z in [1e-3, 0.3, 1.0, 2.5, 40.0] {
            let dl = u.luminosity_distance_mpc(z).unwrap();
            let (zz, dz) = g.redshift_at_luminosity_distance_mpc_gradient(dl).unwrap();
            assert_eq!(
                zz.to_bits(),
                u.redshift_at_luminosity_distance_mpc(dl).unwrap().to_bits()
            );
            // ∂z/∂D_L = 1/(∂D_L/∂z), ∂z/∂p = −(∂D_L/∂p)/(∂D_L/∂z), at the root (the two
            // sides are two computations of the same partials, each within 1e-12 of mpmath)
            let (_, d) = g.luminosity_distance_mpc_gradient(zz).unwrap();
            let slope = d[GRADIENT_ARGUMENT];
            let r = (dz[GRADIENT_ARGUMENT] * slope - 1.0).abs();
            assert!(r < 1e-13, "z={z}: {r:e}");
            let want = -d[GRADIENT_OMEGA_MATTER] / slope;
            let r = ((dz[GRADIENT_OMEGA_MATTER] - want) / want).abs();
            assert!(r < 1e-12, "z={z}: {r:e}");
            println!("z={z}: IFT partials agree to {r:.1e}");
        }
    });
}

#[test]
fn errors_and_array_form_are_those_of_the_plain_functions() {
    big_stack(|| {
        let p = UniverseParameters::new(70.0f64, 0.3);
        let g = GradientUniverse::with_gradients(p).unwrap();
        let u = Universe::new(p).unwrap();
        for z in [f64::NAN, -1.0, f64::INFINITY] {
            assert_eq!(
                g.luminosity_distance_mpc_gradient(z).map(|r| r.0),
                u.luminosity_distance_mpc(z)
            );
        }
        let mut bad = p;
        bad.omega_baryon = 0.5;
        assert_eq!(
            GradientUniverse::with_gradients(bad)
                .err()
                .and_then(|e| e.argument_name()),
            Some("omega_baryon")
        );
        let zs = [0.0, 0.1, 1.0, -2.0, 5.0];
        let mut v = [0.0; 5];
        let mut d = [[0.0; GRADIENT_LEN]; 5];
        let r = g.luminosity_distance_mpc_gradient_array(&zs, &mut v, &mut d);
        assert_eq!(r.err().map(|e| e.index), Some(3));
        for (i, &z) in zs.iter().enumerate() {
            if i == 3 {
                assert!(v[i].is_nan());
                continue;
            }
            assert_eq!(
                v[i].to_bits(),
                u.luminosity_distance_mpc(z).unwrap().to_bits()
            );
            assert_eq!(d[i], g.luminosity_distance_mpc_gradient(z).unwrap().1);
        }
        // the slope at z = 0 is kept: ∂D_L/∂z = D_H there
        assert!((d[0][GRADIENT_ARGUMENT] - u.hubble_distance_mpc()).abs() < 1e-9);
    });
}
