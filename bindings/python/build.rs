//! Lets `cargo test -p relicore-python` load the libpython the crate was built against
//! (otherwise it may load the system libpython); maturin builds do not need it and are unaffected.

fn main() {
    pyo3_build_config::add_libpython_rpath_link_args();
}
