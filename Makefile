# relicore: the two commands are `make demo` and `make test` (see README.md).
# Both install what they need on a fresh machine (gfortran from Debian, a pinned Python venv)
# and are quick when it is already there.

SHELL := /bin/bash
.SHELLFLAGS := -euo pipefail -c
VENV := .venv
PY := $(VENV)/bin/python
export PYO3_PYTHON := $(abspath $(PY))
PREFIX ?= /usr/local

.PHONY: all deps test demo bench install fmt-check clippy rust-test nostd c-test fortran-test python-build python-test bench-build coverage miri fuzz fuzz-quick clean

all: test

# The generated faces (C exports, Fortran module, Python registrations/wrappers/stubs, harness
# lists) must be current: regenerated in memory from bindings/functions.toml and the core's
# rustdoc and compared; RELICORE_BLESS=1 rewrites them.
.PHONY: generated
generated:
	python3 bindings/generate.py --check


# ---------------------------------------------------------------- dependencies
deps: $(VENV)/.stamp .gfortran.stamp

$(VENV)/.stamp: requirements-dev.txt
	python3 -m venv $(VENV)
	$(VENV)/bin/pip install --quiet --disable-pip-version-check -r requirements-dev.txt
	touch $@

.gfortran.stamp:
	@if ! command -v gfortran >/dev/null 2>&1; then \
	  echo "installing gfortran from Debian's packages"; \
	  SUDO=""; if [ "$$(id -u)" != 0 ]; then SUDO=sudo; fi; \
	  $$SUDO apt-get update -qq && $$SUDO env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq gfortran >/dev/null; \
	fi
	gfortran --version | head -1
	touch $@

# ---------------------------------------------------------------- tests
test: deps generated fmt-check clippy rust-test nostd c-test fortran-test install-test readme-test python-test bench-build coverage miri fuzz-quick
	@echo "make test: all steps passed"

fmt-check:
	cargo fmt --all --check

clippy: deps
	cargo clippy --workspace --all-targets -- -D warnings

rust-test:
	cargo test --workspace --exclude relicore-python
	# the SIMD compilations of the array functions, optimised as shipped, against the scalar bits
	cargo test --release -p relicore-dispatch --quiet

nostd:
	cd tests/nostd-check && cargo build --release --quiet
	@echo "no_std check: the core links into a #![no_std] staticlib with its own panic handler"

c-test:
	bash tests/c/run.sh

fortran-test: deps c-test
	bash tests/fortran/run.sh

python-build: deps
	bash bindings/python/build.sh

python-test: python-build c-test fortran-test
	cargo test -p relicore-python --quiet
	RELICORE_REQUIRE_CROSS=1 $(PY) -m pytest tests/python -q

bench-build:
	cargo bench --workspace --exclude relicore-python --no-run --quiet

coverage: deps
	$(PY) tests/coverage_guard.py

# The C crate's unit tests under miri (undefined behaviour in the unsafe FFI code: pointer
# reads and writes, the universe storage), where a nightly toolchain with the miri component is
# installed; detected, never installed. The header tests are skipped (they run cbindgen).
miri:
	@installed=$$(rustup component list --toolchain nightly --installed 2>/dev/null || true); \
	if printf '%s\n' "$$installed" | grep -q '^miri'; then \
	  echo "miri: cargo +nightly miri test -p relicore-capi --lib"; \
	  MIRIFLAGS=-Zmiri-disable-isolation cargo +nightly miri test -p relicore-capi --lib -- --skip header::; \
	else \
	  echo "miri: skipped (no nightly toolchain with the miri component installed)"; \
	fi

# Coverage-guided fuzzing (fuzz/, its own workspace; libFuzzer through cargo-fuzz, which needs
# a nightly toolchain; fuzz/run.sh does the work): `make fuzz` runs each target for
# FUZZ_SECONDS seconds (FUZZ_TARGETS to choose), keeps new inputs in fuzz/target/corpus (the
# committed, minimised seeds in fuzz/corpus are read, not written) and prints executions,
# coverage and findings per target (inputs in fuzz/artifacts/<target>/, every run appended to
# fuzz/target/logs/runs.tsv). The core's targets run without a sanitizer (the core forbids
# unsafe code; the checks are the contract's); c_abi, the C face with arbitrary structs, under
# AddressSanitizer. The `make test` step fuzz-quick builds and runs every target in
# FUZZ_BUDGET seconds in all (build included; it skips, saying why, when the build does not
# fit, e.g. a cold fuzz/target), from 64 committed seeds each, with a fixed seed. Both say
# plainly that they skipped where no nightly toolchain is installed, as `make miri` does, and
# install cargo-fuzz (cargo install cargo-fuzz --locked) where nightly is present and it is not.
FUZZ_SECONDS ?= 60
FUZZ_TARGETS ?=
FUZZ_BUDGET ?= 120
fuzz:
	bash fuzz/run.sh full $(FUZZ_SECONDS) $(FUZZ_TARGETS)

fuzz-quick:
	bash fuzz/run.sh quick $(FUZZ_BUDGET)

# ---------------------------------------------------------------- demo and benches
demo: deps python-build
	bash examples/run_demo.sh

bench: deps python-build
	cargo bench -p relicore
	bash benches/compare/run.sh

# ---------------------------------------------------------------- Python wheel
# make wheel: the Python package as one abi3 wheel (CPython 3.10 and later, this OS and CPU)
# in build/wheel/, built by maturin from the pinned venv (installed first when missing; no
# other download than the package registry's and the crates of Cargo.lock). Users install it with
# `pip install build/wheel/relicore-<version>-cp310-abi3-<platform>.whl`, without Rust (README).
.PHONY: wheel
wheel: $(VENV)/.stamp
	rm -f build/wheel/relicore-*.whl
	cd bindings/python && $(abspath $(VENV))/bin/maturin build --release --locked --quiet --out $(abspath build/wheel)
	@ls -1 build/wheel/relicore-*.whl

# ---------------------------------------------------------------- install
# make install PREFIX=/opt/relicore [DESTDIR=/staging/root]  (README, "Installing"):
#   include/relicore.h, include/relicore/relicore.f90 (the Fortran module's source);
#   lib/librelicore.so.<version>, its SONAME link lib/librelicore.so.<abi> (bindings/c/build.rs
#   sets the SONAME; read back here with readelf) and the link lib/librelicore.so for -lrelicore;
#   lib/librelicore.a;
#   lib/pkgconfig/relicore.pc (shared, with a run path) and relicore-static.pc (the archive):
#   only their `prefix=` line is written, comments are copied unchanged;
#   lib/cmake/relicore/relicoreConfig.cmake and relicoreConfigVersion.cmake (imported targets
#   relicore::relicore, relicore::relicore_static, relicore::fortran, relicore::fortran_static).
# PREFIX must be absolute: it is written into the pkg-config files. The library is the one of
# `cargo build -p relicore-capi --profile release-c` in $(CARGO_TARGET_DIR) (default target),
# run here when cargo is on the PATH; without cargo (sudo make install, whose PATH and HOME are
# root's) the library built before is installed.
RELEASE_C := $(or $(CARGO_TARGET_DIR),target)/release-c
CAPI_VERSION = $(shell sed -n 's/^version = "\(.*\)"$$/\1/p' bindings/c/Cargo.toml | head -n 1)
INSTALL_ROOT = $(DESTDIR)$(PREFIX)

install:
	@case "$(PREFIX)" in /*) ;; *) echo "make install: PREFIX must be an absolute path (got '$(PREFIX)')"; exit 1 ;; esac
	@[ -n "$(CAPI_VERSION)" ] || { echo "make install: no version in bindings/c/Cargo.toml"; exit 1; }
	@if command -v cargo >/dev/null 2>&1; then \
	  echo "cargo build -p relicore-capi --profile release-c"; \
	  cargo build -p relicore-capi --profile release-c; \
	elif [ -f $(RELEASE_C)/librelicore.so ] && [ -f $(RELEASE_C)/librelicore.a ]; then \
	  echo "make install: no cargo on this PATH (sudo?): installing the library built before in $(RELEASE_C)"; \
	else \
	  echo "make install: no cargo on this PATH and no library in $(RELEASE_C): build it first, as the user"; \
	  echo "who has the Rust toolchain, with 'cargo build -p relicore-capi --profile release-c'"; \
	  exit 1; \
	fi
	@soname=$$(readelf -d $(RELEASE_C)/librelicore.so | sed -n 's/.*Library soname: \[\(.*\)\]$$/\1/p'); \
	abi=$${soname#librelicore.so.}; \
	if [ -z "$$soname" ] || [ "$$abi" = "$$soname" ]; then \
	  echo "make install: $(RELEASE_C)/librelicore.so has no SONAME librelicore.so.<abi> (bindings/c/build.rs)"; exit 1; \
	fi; \
	real=librelicore.so.$(CAPI_VERSION); \
	lib='$(INSTALL_ROOT)/lib'; \
	set -x; \
	install -d '$(INSTALL_ROOT)/include/relicore' "$$lib/pkgconfig" "$$lib/cmake/relicore"; \
	install -m 644 include/relicore.h '$(INSTALL_ROOT)/include/relicore.h'; \
	install -m 644 bindings/fortran/relicore.f90 '$(INSTALL_ROOT)/include/relicore/relicore.f90'; \
	install -m 644 $(RELEASE_C)/librelicore.a "$$lib/librelicore.a"; \
	install -m 755 $(RELEASE_C)/librelicore.so "$$lib/$$real"; \
	ln -sfn "$$real" "$$lib/$$soname"; \
	ln -sfn "$$soname" "$$lib/librelicore.so"; \
	for pc in relicore relicore-static; do \
	  sed -e 's|^prefix=@PREFIX@$$|prefix=$(PREFIX)|' bindings/c/$$pc.pc.in > "$$lib/pkgconfig/$$pc.pc"; \
	done; \
	for f in relicoreConfig relicoreConfigVersion; do \
	  sed -e "s|@RELICORE_VERSION@|$(CAPI_VERSION)|g" -e "s|@RELICORE_SONAME@|$$soname|g" \
	      -e "s|@RELICORE_ABI@|$$abi|g" -e "s|@RELICORE_SIZEOF_VOID_P@|$$(( $$(getconf LONG_BIT) / 8 ))|g" \
	      bindings/c/cmake/$$f.cmake.in > "$$lib/cmake/relicore/$$f.cmake"; \
	done
	@echo "installed relicore $(CAPI_VERSION) in $(INSTALL_ROOT). Programs linked with"
	@echo "'pkg-config --libs relicore' or CMake's relicore::relicore find the shared library by their"
	@echo "run path; others need '$(PREFIX)/lib' in ld.so's path (ldconfig, see README) or LD_LIBRARY_PATH."

# The install test (tests/install/run.sh): make install into a temporary prefix, then the README's
# C, Fortran and CMake examples built and run as a user would. cmake and pkg-config come from
# Debian's packages when missing (apt-get, as root or with sudo), as gfortran does above.
.PHONY: install-test install-tools
install-tools:
	@missing=""; \
	command -v cmake >/dev/null 2>&1 || missing="$$missing cmake"; \
	command -v pkg-config >/dev/null 2>&1 || missing="$$missing pkgconf"; \
	if [ -n "$$missing" ]; then \
	  echo "installing$$missing from Debian's packages"; \
	  SUDO=""; if [ "$$(id -u)" != 0 ]; then SUDO=sudo; fi; \
	  $$SUDO apt-get update -qq && $$SUDO env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq $$missing >/dev/null; \
	fi
	@cmake --version | head -1
	@echo "pkg-config $$(pkg-config --version)"

install-test: deps install-tools
	bash tests/install/run.sh

# The README snippet test (tests/readme/run.py): every ```python, ```rust, ```c and ```fortran
# block of README.md, read from the file after its `<!-- readme-test: NAME -->` line (the install
# test's convention), run as written: Python in the venv with the package just built, Rust as the
# body of a main returning Result<_, relicore::Error> in a temporary package depending on the
# core (offline), C as the body of main and Fortran in a program (or as the whole program it is),
# both linked with the release-c librelicore.a.
.PHONY: readme-test
readme-test: deps python-build
	$(PY) tests/readme/run.py --python $(PY)

clean:
	cargo clean
	rm -rf build .gfortran.stamp
