//! Header drift check: generates the C header from this crate with cbindgen, in memory, and
//! compares it with the committed `include/relicore.h`. `RELICORE_BLESS=1 cargo test -p
//! relicore-capi header` rewrites the committed header instead (nothing is written into the
//! source tree otherwise; there is no build.rs).

use std::path::{Path, PathBuf};

fn crate_dir() -> PathBuf {
    PathBuf::from(env!("CARGO_MANIFEST_DIR"))
}

fn committed_header_path() -> PathBuf {
    crate_dir().join("../../include/relicore.h")
}

fn generate() -> String {
    let dir = crate_dir();
    let config = match cbindgen::Config::from_file(dir.join("cbindgen.toml")) {
        Ok(c) => c,
        Err(e) => panic!("cannot read bindings/c/cbindgen.toml: {e}"),
    };
    let bindings = match cbindgen::Builder::new()
        .with_crate(&dir)
        .with_config(config)
        .generate()
    {
        Ok(b) => b,
        Err(e) => panic!("cbindgen failed on bindings/c: {e}"),
    };
    let mut buf = Vec::new();
    bindings.write(&mut buf);
    match String::from_utf8(buf) {
        Ok(s) => s,
        Err(e) => panic!("cbindgen wrote invalid UTF-8: {e}"),
    }
}

fn first_difference(a: &str, b: &str) -> String {
    let (mut la, mut lb) = (a.lines(), b.lines());
    let mut n = 1;
    loop {
        match (la.next(), lb.next()) {
            (Some(x), Some(y)) if x == y => n += 1,
            (None, None) => return "no line differs (line endings?)".to_string(),
            (x, y) => {
                return format!(
                    "first difference at line {n}:\n  committed: {}\n  generated: {}",
                    x.unwrap_or("<end of file>"),
                    y.unwrap_or("<end of file>")
                );
            }
        }
    }
}

#[test]
fn committed_header_matches_the_sources() {
    let generated = generate();
    let path = committed_header_path();
    if std::env::var_os("RELICORE_BLESS").is_some_and(|v| v == "1") {
        if let Err(e) = std::fs::write(&path, &generated) {
            panic!("cannot write {}: {e}", path.display());
        }
        eprintln!("RELICORE_BLESS=1: wrote {}", path.display());
        return;
    }
    let committed = std::fs::read_to_string(&path).unwrap_or_default();
    assert!(
        committed == generated,
        "include/relicore.h is out of date with bindings/c/src ({}).\n{}\n\
         Regenerate it with: RELICORE_BLESS=1 cargo test -p relicore-capi header\n\
         and commit the new header.",
        Path::new(&path).display(),
        first_difference(&committed, &generated)
    );
}

#[test]
fn header_declares_every_export_and_status_code() {
    let h = generate();
    for needle in [
        "#ifndef RELICORE_H",
        "#include <stdint.h>",
        "#include <stddef.h>",
        "#define RELICORE_OK 0",
        "#define RELICORE_ERROR_PANIC -13",
        "#define RELICORE_ERROR_INVALID_PARAMETER -14",
        "#define RELICORE_ERROR_NO_BIG_BANG -15",
        "#define RELICORE_UNIVERSE_STORAGE_WORDS 1920",
        "#define RELICORE_ERROR_CAPACITY_TOO_SMALL -16",
        "#define RELICORE_THERMAL_HISTORY_STORAGE_WORDS 20480",
        "struct relicore_thermal_history_options {",
        "struct relicore_thermal_history {",
        "uint64_t storage[RELICORE_THERMAL_HISTORY_STORAGE_WORDS];",
        "int32_t relicore_thermal_history_compute(const struct relicore_universe *universe,",
        "struct relicore_two_load_calibration {",
        "struct relicore_universe_parameters {",
        "double neutrino_masses_ev[3];",
        "struct relicore_universe {",
        "uint64_t storage[RELICORE_UNIVERSE_STORAGE_WORDS];",
        "int32_t relicore_comoving_distance_mpc(const struct relicore_universe *universe,",
        "int32_t relicore_spectral_radiance_wavelength(double wavelength_m,",
        "size_t n,",
        "const char *relicore_status_message(int32_t status);",
    ] {
        assert!(h.contains(needle), "generated header lacks `{needle}`");
    }
    // every `pub ... extern "C" fn` of the sources appears in the header
    let src = crate_dir().join("src");
    let mut count = 0;
    for entry in std::fs::read_dir(&src).into_iter().flatten().flatten() {
        let text = std::fs::read_to_string(entry.path()).unwrap_or_default();
        for line in text.lines() {
            if let Some(rest) = line.split("extern \"C\" fn ").nth(1) {
                let name = rest.split('(').next().unwrap_or_default();
                assert!(
                    h.contains(&format!("{name}(")),
                    "export {name} missing from the header"
                );
                count += 1;
            }
        }
    }
    assert!(count > 140, "found only {count} exports in bindings/c/src");
}

/// Every prototype of a header, normalised to single spaces and sorted.
fn prototypes(header: &str) -> Vec<String> {
    // drop comments, then split at ';' and keep the function declarations
    let mut text = String::new();
    let mut rest = header;
    while let Some(start) = rest.find("/*") {
        text.push_str(&rest[..start]);
        rest = rest[start..]
            .find("*/")
            .map_or("", |end| &rest[start + end + 2..]);
    }
    text.push_str(rest);
    let mut out: Vec<String> = text
        .split(';')
        .map(|d| d.split_whitespace().collect::<Vec<_>>().join(" "))
        .filter_map(|d| {
            let start = [
                "int32_t relicore_",
                "const char *relicore_",
                "void relicore_",
            ]
            .iter()
            .filter_map(|t| d.rfind(t))
            .max()?;
            let d = &d[start..];
            (d.ends_with(')') && d.contains('(')).then(|| d.to_string())
        })
        .collect();
    out.sort();
    out
}

#[test]
fn the_set_of_prototypes_is_the_committed_list() {
    let committed = std::fs::read_to_string(crate_dir().join("prototypes.txt")).unwrap_or_default();
    let want: Vec<String> = committed
        .lines()
        .filter(|l| !l.starts_with('#') && !l.is_empty())
        .map(str::to_string)
        .collect();
    let got = prototypes(&generate());
    if std::env::var_os("RELICORE_BLESS").is_some_and(|v| v == "1") && got != want {
        let head: String = committed
            .lines()
            .filter(|l| l.starts_with('#'))
            .map(|l| format!("{l}\n"))
            .collect();
        let body: String = got.iter().map(|p| format!("{p}\n")).collect();
        std::fs::write(crate_dir().join("prototypes.txt"), head + &body)
            .expect("write prototypes.txt");
        eprintln!(
            "RELICORE_BLESS=1: wrote bindings/c/prototypes.txt (review its diff: it is the C API)"
        );
        return;
    }
    let missing: Vec<_> = want.iter().filter(|p| !got.contains(p)).collect();
    let extra: Vec<_> = got.iter().filter(|p| !want.contains(p)).collect();
    assert!(
        missing.is_empty() && extra.is_empty(),
        "the header's prototypes differ from bindings/c/prototypes.txt\nmissing: {missing:#?}\nnew: {extra:#?}"
    );
}
