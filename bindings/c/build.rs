//! Build script of the C crate: a versioned SONAME for the shared library on ELF targets.
//!
//! `librelicore.so` is linked with the SONAME `librelicore.so.<abi>`, where `<abi>` is the
//! major version, or `0.<minor>` while the major version is 0 (before 1.0 a minor release may
//! change the C ABI, as Cargo's version rules allow). A program linked against the library
//! records that name and the dynamic loader looks for a file of that name; `make install`
//! installs `librelicore.so.<version>` with the links `librelicore.so.<abi>` and `librelicore.so`
//! (Makefile, rule `install`).
//!
//! For the same reason a program linked against the library in the build tree (the shared-library
//! steps of `tests/c/run.sh`, with an rpath to the profile directory) needs a file named like
//! the SONAME there: this script makes the relative link `librelicore.so.<abi> -> librelicore.so`
//! beside the library cargo writes. It is the only file this script writes outside `OUT_DIR`; it
//! is made once and never overwritten.

use std::env;
use std::path::{Path, PathBuf};

fn main() {
    println!("cargo:rerun-if-changed=build.rs");
    let os = env::var("CARGO_CFG_TARGET_OS").unwrap_or_default();
    // ELF targets whose linkers take -soname (GNU ld, gold, lld); macOS and Windows name
    // their libraries differently and are left as cargo builds them.
    let elf = matches!(
        os.as_str(),
        "linux" | "android" | "freebsd" | "netbsd" | "openbsd" | "dragonfly" | "illumos"
    );
    if !elf {
        return;
    }
    let major = env::var("CARGO_PKG_VERSION_MAJOR").unwrap_or_default();
    let minor = env::var("CARGO_PKG_VERSION_MINOR").unwrap_or_default();
    let abi = if major == "0" {
        format!("0.{minor}")
    } else {
        major
    };
    let soname = format!("librelicore.so.{abi}");
    println!("cargo:rustc-cdylib-link-arg=-Wl,-soname,{soname}");

    if let Some(profile_dir) = env::var_os("OUT_DIR").and_then(|d| profile_dir(Path::new(&d))) {
        link_soname(&profile_dir, &soname);
    }
}

/// The profile directory (`<target>/<profile>`) of `OUT_DIR` = `<target>/<profile>/build/<pkg>/out`.
fn profile_dir(out_dir: &Path) -> Option<PathBuf> {
    let build = out_dir.parent()?.parent()?;
    if build.file_name()? != "build" {
        return None;
    }
    Some(build.parent()?.to_path_buf())
}

#[cfg(unix)]
fn link_soname(dir: &Path, soname: &str) {
    let link = dir.join(soname);
    if link.symlink_metadata().is_ok() {
        return; // made by an earlier build (or by hand): left alone
    }
    if let Err(e) = std::os::unix::fs::symlink("librelicore.so", &link) {
        println!(
            "cargo:warning=could not link {} -> librelicore.so: {e}",
            link.display()
        );
    }
}

#[cfg(not(unix))]
fn link_soname(_dir: &Path, _soname: &str) {}
