"""Type stubs for the relicore package (hand-kept; tests/python/test_faces.py checks them)."""

from typing import Final

from relicore import blackbody as blackbody
from relicore import constants as constants
from relicore import cosmology as cosmology
from relicore import decoupling as decoupling
from relicore import growth as growth
from relicore.cosmology import Universe as Universe
from relicore.decoupling import ThermalHistory as ThermalHistory

class RelicoreError(ValueError):
    """Invalid input to a relicore function (a ValueError)."""

    function: str | None
    argument: str | None
    index: tuple[int, ...] | None
    status: int | None

__version__: Final[str]
__all__: Final[list[str]]
