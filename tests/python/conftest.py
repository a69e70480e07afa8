"""pytest configuration for the Python face of relicore.

The package must be built and installed into the project venv first:
`bash bindings/python/build.sh`; `make python-test` does both.
"""

import pytest

try:
    import relicore  # noqa: F401
except ImportError as exc:  # a setup problem: say how to fix it instead of 20 import errors
    pytest.exit(f"relicore is not importable ({exc}); build it first: bash bindings/python/build.sh", returncode=4)
