//! The relicore demo, part 3, in Rust: the starting time and thermal history of the INVENTED
//! toy simulation code "Wrenfold" of the fictional Marrowgate Simulation Group.
//!
//! Reads `examples/data/invented_simulation.txt` (or the path given as the first argument),
//! builds the demo universe and its thermal history (with the invented reionisation redshift)
//! and prints, as `key = value` with 17 significant digits: the run's starting time (the age of
//! the universe at the invented start redshift, in Myr) and its initial x_e and T_m, the
//! last-scattering summary of the history, and x_e, T_m, T_r and T_m/T_r at each invented
//! output redshift. The C, Fortran and Python versions read the same file and print the same
//! keys; `examples/run_demo.sh` compares the four outputs. Every number is computed by the
//! core; this program only reads, calls, converts Gyr to Myr and radians to 100 θ*, divides
//! T_m by T_r and prints.
//!
//! Run from the repository root: `cargo run --release --example simulation_start`.

use relicore::cosmology::{Universe, UniverseParameters};
use relicore::decoupling::{HistoryOptions, ThermalHistory};
use std::process::ExitCode;

const DEFAULT_INPUT: &str = "examples/data/invented_simulation.txt";

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
    start_redshift: f64,
    reionization_redshift: f64,
    outputs: Vec<f64>,
}

fn read_inputs(path: &str) -> Result<Inputs, String> {
    let text = std::fs::read_to_string(path).map_err(|e| format!("cannot read {path}: {e}"))?;
    // every parameter is read from the file; the defaults only fill the struct first
    let mut p = UniverseParameters::new(0.0, 0.0);
    let mut given = [0usize; 10];
    let mut start: Vec<f64> = Vec::new();
    let mut reionization: Vec<f64> = Vec::new();
    let mut outputs = Vec::new();
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
        } else if *key == "simulation_start_redshift" {
            start.push(v);
        } else if *key == "simulation_reionization_redshift" {
            reionization.push(v);
        } else if *key == "simulation_output_redshift" {
            outputs.push(v);
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
    let ([start_redshift], [reionization_redshift]) = (start.as_slice(), reionization.as_slice())
    else {
        return Err(
            "simulation_start_redshift and simulation_reionization_redshift must be given once"
                .to_string(),
        );
    };
    Ok(Inputs {
        params: p,
        start_redshift: *start_redshift,
        reionization_redshift: *reionization_redshift,
        outputs,
    })
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
    let options = HistoryOptions {
        reionization_redshift: Some(inp.reionization_redshift),
        ..HistoryOptions::default()
    };
    // a plain value of about 160 KB, on the main thread's stack (megabytes on the usual
    // platforms; on a small stack use compute_in_place into storage of your own)
    let h: ThermalHistory<f64> =
        ThermalHistory::new(&u, options).map_err(|e| format!("ThermalHistory::new: {e}"))?;
    println!("# relicore simulation start (Rust) -- INVENTED DATA from {path}");
    println!(
        "# fictional toy code Wrenfold (Marrowgate Simulation Group); a demo universe, not a published fit"
    );
    let call = |what: &str, r: relicore::Result<f64>| r.map_err(|e| format!("{what}: {e}"));

    let z = inp.start_redshift;
    let t_m = call("matter_temperature_k", h.matter_temperature_k(z))?;
    let t_r = call("cmb_temperature_at_k", u.cmb_temperature_at_k(z))?;
    print("start_redshift", z);
    print("start_age_myr", call("age_gyr", u.age_gyr(z))? * 1000.0);
    print(
        "start_ionized_fraction",
        call("ionized_fraction", h.ionized_fraction(z))?,
    );
    print("start_matter_temperature_k", t_m);
    print("start_radiation_temperature_k", t_r);
    print("start_temperature_ratio", t_m / t_r);

    print("reionization_redshift", inp.reionization_redshift);
    print(
        "history_last_scattering_redshift",
        h.last_scattering_redshift(),
    );
    print("history_drag_redshift", h.drag_redshift());
    print(
        "history_sound_horizon_last_scattering_mpc",
        h.sound_horizon_last_scattering_mpc(),
    );
    print("history_sound_horizon_drag_mpc", h.sound_horizon_drag_mpc());
    print(
        "history_100_theta_star",
        h.angular_scale_last_scattering() * 100.0,
    );
    print(
        "history_age_at_last_scattering_yr",
        h.age_at_last_scattering_yr(),
    );
    print(
        "history_temperature_at_last_scattering_k",
        h.temperature_at_last_scattering_k(),
    );
    print(
        "history_visibility_peak_redshift",
        h.visibility_peak_redshift(),
    );
    print(
        "history_thermal_decoupling_redshift",
        h.thermal_decoupling_redshift(),
    );
    print(
        "history_reionization_optical_depth",
        h.reionization_optical_depth(),
    );

    for (i, &z) in inp.outputs.iter().enumerate() {
        let p = format!("output_{}_", i + 1);
        let t_m = call("matter_temperature_k", h.matter_temperature_k(z))?;
        let t_r = call("cmb_temperature_at_k", u.cmb_temperature_at_k(z))?;
        print(&format!("{p}z"), z);
        print(
            &format!("{p}age_myr"),
            call("age_gyr", u.age_gyr(z))? * 1000.0,
        );
        print(
            &format!("{p}ionized_fraction"),
            call("ionized_fraction", h.ionized_fraction(z))?,
        );
        print(&format!("{p}matter_temperature_k"), t_m);
        print(&format!("{p}radiation_temperature_k"), t_r);
        print(&format!("{p}temperature_ratio"), t_m / t_r);
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
            eprintln!("simulation_start: {e}");
            ExitCode::FAILURE
        }
    }
}
