//! The relicore demo in Rust, part 1b: an INVENTED thermal scene (the fictional Glimmerfen
//! Ridge Observatory's workshop seen by a fictional thermal camera through an infrared window)
//! turned into a frame of signals and back into an object-temperature image and a
//! combined-standard-uncertainty image.
//!
//! Usage: `thermal_scene [INPUT] [OUT_PREFIX]` (defaults
//! `examples/data/invented_thermal_scene.txt`, `examples/out/thermal_rust`). Reads the scene,
//! paints its regions onto a width × height frame (integer pixel tests only), computes every
//! pixel's signal with the forward measurement equation
//! (`measured_spectral_radiance_wavelength`), turns the frame back into T_obj and u_c with the
//! frame function (`object_temperature_wavelength_with_uncertainty_array`, per-pixel emissivity
//! and its uncertainty, the rest shared), and writes the three images as raw little-endian
//! `f64` (row-major, x fastest, y from the top) to `OUT_PREFIX_signal.f64`,
//! `OUT_PREFIX_temperature.f64` and `OUT_PREFIX_uncertainty.f64`. It prints the region sizes,
//! a summary of the frame and, at each probe pixel, the scalar function's full
//! `TemperatureUncertainty` as `key = value` (17 significant digits), after checking that it
//! has the frame pixel's bits. The C, Fortran and Python versions do the same;
//! `examples/run_demo.sh` compares the four outputs and the image files byte for byte.
//!
//! Run from the repository root: `cargo run --release --example thermal_scene`.

use relicore::blackbody::{
    TemperatureUncertainty, measured_spectral_radiance_wavelength,
    object_temperature_wavelength_with_uncertainty,
    object_temperature_wavelength_with_uncertainty_array,
};
use std::io::Write;
use std::process::ExitCode;

const DEFAULT_INPUT: &str = "examples/data/invented_thermal_scene.txt";
const DEFAULT_PREFIX: &str = "examples/out/thermal_rust";

/// A surface: region 0 is the background, region k the k-th shape.
struct Region {
    emissivity: f64,
    emissivity_uncertainty: f64,
    temperature_k: f64,
}

/// A shape of the scene in integer pixel coordinates.
enum Shape {
    /// The pixels x0 ≤ x < x1, y0 ≤ y < y1.
    Rectangle { x0: i64, y0: i64, x1: i64, y1: i64 },
    /// The pixels with (x − cx)² + (y − cy)² ≤ r².
    Disc { cx: i64, cy: i64, r: i64 },
}

#[derive(Default)]
struct Scene {
    width: usize,
    height: usize,
    wavelength_m: f64,
    reflected_temperature_k: f64,
    transmittance: f64,
    path_temperature_k: f64,
    signal_uncertainty: f64,
    reflected_temperature_uncertainty_k: f64,
    transmittance_uncertainty: f64,
    path_temperature_uncertainty_k: f64,
    regions: Vec<Region>,
    shapes: Vec<Shape>,
    probes: Vec<(usize, usize)>,
}

fn number(token: Option<&str>, line_no: usize) -> Result<f64, String> {
    let t = token.ok_or_else(|| format!("line {line_no}: missing value"))?;
    t.parse::<f64>()
        .map_err(|e| format!("line {line_no}: cannot read {t:?} as a number: {e}"))
}

fn integer(token: Option<&str>, line_no: usize) -> Result<i64, String> {
    let t = token.ok_or_else(|| format!("line {line_no}: missing value"))?;
    t.parse::<i64>()
        .map_err(|e| format!("line {line_no}: cannot read {t:?} as an integer: {e}"))
}

/// Emissivity, its uncertainty, the temperature and the name (which only the plot uses).
fn region<'a>(
    tokens: &mut impl Iterator<Item = &'a str>,
    line_no: usize,
) -> Result<Region, String> {
    let emissivity = number(tokens.next(), line_no)?;
    let emissivity_uncertainty = number(tokens.next(), line_no)?;
    let temperature_k = number(tokens.next(), line_no)?;
    tokens
        .next()
        .ok_or_else(|| format!("line {line_no}: missing name"))?;
    Ok(Region {
        emissivity,
        emissivity_uncertainty,
        temperature_k,
    })
}

fn read_scene(path: &str) -> Result<Scene, String> {
    let text = std::fs::read_to_string(path).map_err(|e| format!("cannot read {path}: {e}"))?;
    let mut s = Scene::default();
    let mut background = None;
    let mut shape_regions = Vec::new();
    for (i, line) in text.lines().enumerate() {
        let line_no = i + 1;
        let line = line.trim();
        if line.is_empty() || line.starts_with('#') {
            continue;
        }
        let mut tokens = line.split_whitespace();
        let key = tokens.next().unwrap_or_default();
        match key {
            "image_width_px" => s.width = integer(tokens.next(), line_no)? as usize,
            "image_height_px" => s.height = integer(tokens.next(), line_no)? as usize,
            "camera_wavelength_m" => s.wavelength_m = number(tokens.next(), line_no)?,
            "reflected_temperature_k" => {
                s.reflected_temperature_k = number(tokens.next(), line_no)?
            }
            "window_transmittance" => s.transmittance = number(tokens.next(), line_no)?,
            "window_temperature_k" => s.path_temperature_k = number(tokens.next(), line_no)?,
            "signal_uncertainty_w_m2_sr_m" => {
                s.signal_uncertainty = number(tokens.next(), line_no)?
            }
            "reflected_temperature_uncertainty_k" => {
                s.reflected_temperature_uncertainty_k = number(tokens.next(), line_no)?
            }
            "window_transmittance_uncertainty" => {
                s.transmittance_uncertainty = number(tokens.next(), line_no)?
            }
            "window_temperature_uncertainty_k" => {
                s.path_temperature_uncertainty_k = number(tokens.next(), line_no)?
            }
            "background" => background = Some(region(&mut tokens, line_no)?),
            "rectangle" => {
                let (x0, y0) = (
                    integer(tokens.next(), line_no)?,
                    integer(tokens.next(), line_no)?,
                );
                let (x1, y1) = (
                    integer(tokens.next(), line_no)?,
                    integer(tokens.next(), line_no)?,
                );
                s.shapes.push(Shape::Rectangle { x0, y0, x1, y1 });
                shape_regions.push(region(&mut tokens, line_no)?);
            }
            "disc" => {
                let (cx, cy) = (
                    integer(tokens.next(), line_no)?,
                    integer(tokens.next(), line_no)?,
                );
                let r = integer(tokens.next(), line_no)?;
                s.shapes.push(Shape::Disc { cx, cy, r });
                shape_regions.push(region(&mut tokens, line_no)?);
            }
            "probe" => {
                let (x, y) = (
                    integer(tokens.next(), line_no)?,
                    integer(tokens.next(), line_no)?,
                );
                if x < 0 || y < 0 {
                    return Err(format!("line {line_no}: probe outside the frame"));
                }
                s.probes.push((x as usize, y as usize));
            }
            _ => return Err(format!("line {line_no}: unknown key {key:?}")),
        }
        if tokens.next().is_some() {
            return Err(format!("line {line_no}: unexpected extra value"));
        }
    }
    s.regions
        .push(background.ok_or_else(|| "no background line".to_string())?);
    s.regions.extend(shape_regions);
    if s.width == 0 || s.height == 0 {
        return Err("the frame needs image_width_px and image_height_px".into());
    }
    if s.probes.iter().any(|&(x, y)| x >= s.width || y >= s.height) {
        return Err("a probe lies outside the frame".into());
    }
    Ok(s)
}

/// The region index of every pixel (row-major, x fastest), shapes painted in file order.
fn paint(s: &Scene) -> Vec<usize> {
    let mut map = vec![0usize; s.width * s.height];
    for (k, shape) in s.shapes.iter().enumerate() {
        for y in 0..s.height as i64 {
            for x in 0..s.width as i64 {
                let inside = match *shape {
                    Shape::Rectangle { x0, y0, x1, y1 } => x0 <= x && x < x1 && y0 <= y && y < y1,
                    Shape::Disc { cx, cy, r } => (x - cx) * (x - cx) + (y - cy) * (y - cy) <= r * r,
                };
                if inside {
                    map[y as usize * s.width + x as usize] = k + 1;
                }
            }
        }
    }
    map
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

/// Writes an image as raw little-endian f64.
fn write_image(path: &str, image: &[f64]) -> Result<(), String> {
    let mut bytes = Vec::with_capacity(image.len() * 8);
    for v in image {
        bytes.extend_from_slice(&v.to_le_bytes());
    }
    std::fs::File::create(path)
        .and_then(|mut f| f.write_all(&bytes))
        .map_err(|e| format!("cannot write {path}: {e}"))
}

fn run(path: &str, prefix: &str) -> Result<(), String> {
    let s = read_scene(path)?;
    let n = s.width * s.height;
    println!("# relicore thermal-scene demo (Rust) -- INVENTED SCENE from {path}");
    println!("# fictional Glimmerfen Ridge Observatory workshop; no real camera or measurement");

    // The scene, pixel by pixel: region, emissivity and its uncertainty, temperature.
    let map = paint(&s);
    let emissivity: Vec<f64> = map.iter().map(|&k| s.regions[k].emissivity).collect();
    let emissivity_u: Vec<f64> = map
        .iter()
        .map(|&k| s.regions[k].emissivity_uncertainty)
        .collect();
    let scene_t: Vec<f64> = map.iter().map(|&k| s.regions[k].temperature_k).collect();

    // The frame of signals, by the forward measurement equation at every pixel.
    let mut signals = vec![0.0_f64; n];
    for i in 0..n {
        signals[i] = measured_spectral_radiance_wavelength(
            s.wavelength_m,
            scene_t[i],
            emissivity[i],
            s.reflected_temperature_k,
            s.transmittance,
            s.path_temperature_k,
        )
        .map_err(|e| format!("measured_spectral_radiance_wavelength at pixel {i}: {e}"))?;
    }

    // Back to object temperature and u_c with the frame function.
    let mut t_obj = vec![0.0_f64; n];
    let mut u_c = vec![0.0_f64; n];
    object_temperature_wavelength_with_uncertainty_array(
        s.wavelength_m,
        &signals,
        &emissivity,
        &[s.reflected_temperature_k],
        &[s.transmittance],
        &[s.path_temperature_k],
        &[s.signal_uncertainty],
        &emissivity_u,
        &[s.reflected_temperature_uncertainty_k],
        &[s.transmittance_uncertainty],
        &[s.path_temperature_uncertainty_k],
        &mut t_obj,
        &mut u_c,
    )
    .map_err(|e| format!("object_temperature_wavelength_with_uncertainty_array: {e}"))?;

    for k in 0..s.regions.len() {
        let count = map.iter().filter(|&&m| m == k).count();
        print(&format!("region_{k}_pixels"), count as f64);
    }
    print("frame_pixels", n as f64);
    let min = |v: &[f64]| v.iter().copied().fold(f64::INFINITY, f64::min);
    let max = |v: &[f64]| v.iter().copied().fold(f64::NEG_INFINITY, f64::max);
    print("frame_signal_min_w_m2_sr_m", min(&signals));
    print("frame_signal_max_w_m2_sr_m", max(&signals));
    print("frame_temperature_min_k", min(&t_obj));
    print("frame_temperature_max_k", max(&t_obj));
    print("frame_uncertainty_min_k", min(&u_c));
    print("frame_uncertainty_max_k", max(&u_c));
    let round_trip = t_obj
        .iter()
        .zip(&scene_t)
        .map(|(t, t0)| (t - t0).abs())
        .fold(0.0_f64, f64::max);
    print("frame_max_abs_round_trip_error_k", round_trip);

    // The scalar function's full result at each probe pixel, with the frame's bits.
    for (p, &(x, y)) in s.probes.iter().enumerate() {
        let p = p + 1;
        let i = y * s.width + x;
        let r: TemperatureUncertainty<f64> = object_temperature_wavelength_with_uncertainty(
            s.wavelength_m,
            signals[i],
            emissivity[i],
            s.reflected_temperature_k,
            s.transmittance,
            s.path_temperature_k,
            s.signal_uncertainty,
            emissivity_u[i],
            s.reflected_temperature_uncertainty_k,
            s.transmittance_uncertainty,
            s.path_temperature_uncertainty_k,
        )
        .map_err(|e| format!("object_temperature_wavelength_with_uncertainty at probe {p}: {e}"))?;
        if r.temperature_k.to_bits() != t_obj[i].to_bits()
            || r.combined_standard_uncertainty_k.to_bits() != u_c[i].to_bits()
        {
            return Err(format!(
                "probe {p}: the frame pixel differs from the scalar result"
            ));
        }
        print(&format!("probe_{p}_region"), map[i] as f64);
        print(&format!("probe_{p}_signal_w_m2_sr_m"), signals[i]);
        print(&format!("probe_{p}_temperature_k"), r.temperature_k);
        print(
            &format!("probe_{p}_combined_standard_uncertainty_k"),
            r.combined_standard_uncertainty_k,
        );
        let names = [
            "signal_k_per_w_m2_sr_m",
            "emissivity_k",
            "reflected_temperature_k_per_k",
            "transmittance_k",
            "window_temperature_k_per_k",
        ];
        for (name, c) in names.iter().zip(r.sensitivity_coefficients.iter()) {
            print(&format!("probe_{p}_sensitivity_{name}"), *c);
        }
    }

    write_image(&format!("{prefix}_signal.f64"), &signals)?;
    write_image(&format!("{prefix}_temperature.f64"), &t_obj)?;
    write_image(&format!("{prefix}_uncertainty.f64"), &u_c)?;
    Ok(())
}

fn main() -> ExitCode {
    let mut args = std::env::args().skip(1);
    let path = args.next().unwrap_or_else(|| DEFAULT_INPUT.to_string());
    let prefix = args.next().unwrap_or_else(|| DEFAULT_PREFIX.to_string());
    match run(&path, &prefix) {
        Ok(()) => ExitCode::SUCCESS,
        Err(e) => {
            eprintln!("thermal_scene: {e}");
            ExitCode::FAILURE
        }
    }
}
