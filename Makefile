# relicore: the two commands are `make demo` and `make test` (see README.md).
# Both install what they need on a fresh machine (gfortran from Debian, a pinned Python venv)
# and are quick when it is already there.

SHELL := /bin/bash
.SHELLFLAGS := -euo pipefail -c
VENV := .venv
PY := $(VENV)/bin/python
export PYO3_PYTHON := $(abspath $(PY))
PREFIX ?= /usr/local

.PHONY: all deps test demo bench install fmt-check clippy rust-test nostd c-test fortran-test python-build python-test bench-build coverage miri clean

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
test: deps generated fmt-check clippy rust-test nostd c-test fortran-test python-test bench-build coverage miri
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

# ---------------------------------------------------------------- demo and benches
demo: deps python-build
	bash examples/run_demo.sh

bench: deps python-build
	cargo bench -p relicore
	bash benches/compare/run.sh

# ---------------------------------------------------------------- install
install:
	cargo build -p relicore-capi --profile release-c
	install -d $(PREFIX)/include $(PREFIX)/lib $(PREFIX)/lib/pkgconfig $(PREFIX)/include/relicore
	install -m 644 include/relicore.h $(PREFIX)/include/relicore.h
	install -m 644 target/release-c/librelicore.a $(PREFIX)/lib/librelicore.a
	install -m 755 target/release-c/librelicore.so $(PREFIX)/lib/librelicore.so
	sed -e 's|@PREFIX@|$(PREFIX)|g' bindings/c/relicore.pc.in > $(PREFIX)/lib/pkgconfig/relicore.pc
	install -m 644 bindings/fortran/relicore.f90 $(PREFIX)/include/relicore/relicore.f90

clean:
	cargo clean
	rm -rf build .gfortran.stamp
