//! The relicore demo, part 2, in Rust: the table of the INVENTED Quillmere Deep Field Survey's
//! follow-up objects (per object: luminosity distance, distance modulus, apparent magnitude,
//! half-light radius as an angle, lookback time, age of the universe when the light left).
//!
//! Reads `examples/data/invented_catalogue.txt` (or the path given as the first argument) and
//! prints every computed quantity as `key = value` with 17 significant digits. The C, Fortran
//! and Python versions read the same file and print the same keys; `examples/run_demo.sh`
//! compares the four outputs. Every number is computed by the core; this program only reads,
//! calls and prints.
//!
//! Run from the repository root: `cargo run --release --example catalogue_table`.

use relicore::cosmology::{Universe, UniverseParameters};
use std::process::ExitCode;

const DEFAULT_INPUT: &str = "examples/data/invented_catalogue.txt";

const UNIVERSE_KEYS: [&str; 10] = [
    "universe_h0_km_s_mpc",
    "universe_omega_matter",
    "universe_omega_baryon",
    "universe_omega_curvature",
    "universe_cmb_temperature_k",
    "universe_n_eff",
    "universe_neutrino_mass_ev",
    "universe_w0",
    "universe_wa",
    "universe_helium_mass_fraction",
];

struct Inputs {
    params: UniverseParameters<f64>,
    /// the follow-up objects' redshifts, absolute magnitudes and half-light radii (kpc)
    objects: [Vec<f64>; 3],
}

const OBJECT_KEYS: [&str; 3] = [
    "object_redshift",
    "object_absolute_magnitude",
    "object_half_light_radius_kpc",
];

fn read_inputs(path: &str) -> Result<Inputs, String> {
    let text = std::fs::read_to_string(path).map_err(|e| format!("cannot read {path}: {e}"))?;
    // every parameter is read from the file; the defaults only fill the struct first
    let mut p = UniverseParameters::new(0.0, 0.0);
    let mut given = [0usize; 10];
    let mut objects: [Vec<f64>; 3] = [Vec::new(), Vec::new(), Vec::new()];
    for (i, line) in text.lines().enumerate() {
        let line_no = i + 1;
        let line = line.trim();
        if line.is_empty() || line.starts_with('#') {
            continue;
        }
        let fields: Vec<&str> = line.split_whitespace().collect();
        let [key, value] = fields.as_slice() else {
            return Err(format!("line {line_no}: want \"key value\""));
        };
        if key.starts_with("catalogue_") {
            continue; // the Python catalogue demo's keys
        }
        let v: f64 = value
            .parse()
            .map_err(|e| format!("line {line_no}: cannot read {value:?} as a number: {e}"))?;
        if let Some(which) = UNIVERSE_KEYS.iter().position(|k| k == key) {
            let n = given[which];
            given[which] += 1;
            let slot = match which {
                0 => &mut p.h0_km_s_mpc,
                1 => &mut p.omega_matter,
                2 => &mut p.omega_baryon,
                3 => &mut p.omega_curvature,
                4 => &mut p.cmb_temperature_k,
                5 => &mut p.n_eff,
                6 => p
                    .neutrino_masses_ev
                    .get_mut(n)
                    .ok_or_else(|| format!("line {line_no}: more than three neutrino masses"))?,
                7 => &mut p.w0,
                8 => &mut p.wa,
                _ => &mut p.helium_mass_fraction,
            };
            if which != 6 && n > 0 {
                return Err(format!("line {line_no}: {key} given twice"));
            }
            *slot = v;
        } else if let Some(list) = OBJECT_KEYS
            .iter()
            .position(|k| k == key)
            .and_then(|which| objects.get_mut(which))
        {
            list.push(v);
        } else {
            return Err(format!("line {line_no}: unknown key {key:?}"));
        }
    }
    for (k, n) in UNIVERSE_KEYS.iter().zip(given) {
        let want = if *k == "universe_neutrino_mass_ev" {
            3
        } else {
            1
        };
        if n != want {
            return Err(format!("{k} must be given {want} time(s), got {n}"));
        }
    }
    if objects.iter().any(|list| list.len() != objects[0].len()) {
        return Err(format!(
            "{} must be given equally often",
            OBJECT_KEYS.join(", ")
        ));
    }
    Ok(Inputs { params: p, objects })
}

/// 17 significant digits in the C `%.16e` form, so the four programs print alike.
fn fmt17(v: f64) -> String {
    let s = format!("{v:.16e}");
    match s.split_once('e') {
        Some((mantissa, exp)) => {
            let (sign, digits) = match exp.strip_prefix('-') {
                Some(d) => ('-', d),
                None => ('+', exp),
            };
            format!("{mantissa}e{sign}{digits:0>2}")
        }
        None => s,
    }
}

fn print(key: &str, value: f64) {
    println!("{key} = {}", fmt17(value));
}

fn run(path: &str) -> Result<(), String> {
    let inp = read_inputs(path)?;
    let u = Universe::new(inp.params).map_err(|e| format!("Universe::new: {e}"))?;
    println!("# relicore catalogue table (Rust) -- INVENTED DATA from {path}");
    println!("# fictional Quillmere Deep Field Survey; an invented universe, not a published fit");
    let call = |what: &str, r: relicore::Result<f64>| r.map_err(|e| format!("{what}: {e}"));
    print("universe_age_today_gyr", call("age_gyr", u.age_gyr(0.0))?);
    let [redshifts, magnitudes, radii] = &inp.objects;
    for (i, ((&z, &m_abs), &radius_kpc)) in redshifts.iter().zip(magnitudes).zip(radii).enumerate()
    {
        let p = format!("object_{}_", i + 1);
        print(&format!("{p}redshift"), z);
        print(&format!("{p}absolute_magnitude"), m_abs);
        print(&format!("{p}half_light_radius_kpc"), radius_kpc);
        print(
            &format!("{p}luminosity_distance_mpc"),
            call("luminosity_distance_mpc", u.luminosity_distance_mpc(z))?,
        );
        let modulus = call("distance_modulus", u.distance_modulus(z))?;
        print(&format!("{p}distance_modulus"), modulus);
        print(&format!("{p}apparent_magnitude"), m_abs + modulus);
        let scale = call(
            "transverse_scale_kpc_per_arcsec",
            u.transverse_scale_kpc_per_arcsec(z),
        )?;
        print(&format!("{p}half_light_radius_arcsec"), radius_kpc / scale);
        print(
            &format!("{p}lookback_time_gyr"),
            call("lookback_time_gyr", u.lookback_time_gyr(z))?,
        );
        print(
            &format!("{p}age_at_emission_gyr"),
            call("age_gyr", u.age_gyr(z))?,
        );
    }
    Ok(())
}

fn main() -> ExitCode {
    let path = std::env::args()
        .nth(1)
        .unwrap_or_else(|| DEFAULT_INPUT.to_string());
    match run(&path) {
        Ok(()) => ExitCode::SUCCESS,
        Err(e) => {
            eprintln!("catalogue_table: {e}");
            ExitCode::FAILURE
        }
    }
}
