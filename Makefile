# relicore: the two commands are `make demo` and `make test` (see README.md).
# Both install what they need on a fresh machine (gfortran from Debian, a pinned Python venv)
# and are quick when it is already there.

SHELL := /bin/bash
.SHELLFLAGS := -euo pipefail -c
VENV := .venv
PY := $(VENV)/bin/python
export PYO3_PYTHON := $(abspath $(PY))
PREFIX ?= /usr/local

.PHONY: all deps test demo bench install fmt-check clippy rust-test nostd c-test fortran-test python-build python-test bench-build coverage miri fuzz clean

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
test: deps generated fmt-check clippy rust-test nostd c-test fortran-test install-test python-test bench-build coverage miri
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

# Coverage-guided fuzzing of the core (fuzz/, its own workspace; libFuzzer through cargo-fuzz,
# which needs a nightly toolchain): each target for FUZZ_SECONDS seconds, one job, new inputs
# kept in fuzz/target/corpus (the committed seeds in fuzz/corpus are read, not written),
# crashes and contract violations written to fuzz/artifacts/<target>/. Not part of `make test`.
# No sanitizer (-s none): the core forbids unsafe code, and the checks are the contract's.
FUZZ_SECONDS ?= 60
FUZZ_TARGETS := blackbody universe thermal_history response_and_calibration
fuzz:
	@if ! rustup toolchain list 2>/dev/null | grep -q '^nightly'; then \
	  echo "fuzz: skipped (no nightly toolchain installed; cargo-fuzz needs one)"; \
	  exit 0; \
	fi; \
	if ! cargo fuzz --version >/dev/null 2>&1; then \
	  echo "fuzz: installing cargo-fuzz from crates.io"; \
	  cargo install cargo-fuzz --locked; \
	fi; \
	mkdir -p fuzz/target/logs; \
	failed=0; \
	for t in $(FUZZ_TARGETS); do \
	  mkdir -p fuzz/target/corpus/$$t; \
	  echo "fuzz: $$t for $(FUZZ_SECONDS) s"; \
	  rm -f fuzz/fuzz-0.log; \
	  if (cd fuzz && cargo +nightly fuzz run -O -s none $$t target/corpus/$$t corpus/$$t -- \
	        -max_total_time=$(FUZZ_SECONDS) -jobs=1 -timeout=30 -print_final_stats=1) \
	        > fuzz/target/logs/$$t.cargo.log 2>&1; then result=ok; else result=FAILED; failed=1; fi; \
	  if [ -f fuzz/fuzz-0.log ]; then mv fuzz/fuzz-0.log fuzz/target/logs/$$t.log; \
	  else cp fuzz/target/logs/$$t.cargo.log fuzz/target/logs/$$t.log; fi; \
	  execs=$$(grep -h 'stat::number_of_executed_units' fuzz/target/logs/$$t.log | tail -1 | awk '{print $$2}' || true); \
	  echo "fuzz: $$t: $${execs:-?} executions (limit $(FUZZ_SECONDS) s; libFuzzer stops at the first finding): $$result"; \
	  if [ "$$result" != ok ]; then \
	    grep -h -A1 -E "panicked at|ERROR: libFuzzer|Test unit written" fuzz/target/logs/$$t.log | head -12 || true; \
	    echo "fuzz: $$t: full log fuzz/target/logs/$$t.log; inputs in fuzz/artifacts/$$t/"; \
	  fi; \
	done; \
	if [ $$failed = 0 ]; then echo "fuzz: no finding"; else echo "fuzz: findings above"; exit 1; fi

# ---------------------------------------------------------------- demo and benches
demo: deps python-build
	bash examples/run_demo.sh

bench: deps python-build
	cargo bench -p relicore
	bash benches/compare/run.sh

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

clean:
	cargo clean
	rm -rf build .gfortran.stamp
