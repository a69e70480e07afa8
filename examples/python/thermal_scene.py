#!/usr/bin/env python3
"""The relicore demo in Python, part 1b: an INVENTED thermal scene (the fictional Glimmerfen
Ridge Observatory's workshop seen by a fictional thermal camera through an infrared window)
turned into a frame of signals and back into an object-temperature image and a
combined-standard-uncertainty image.

Usage: thermal_scene.py [INPUT] [OUT_PREFIX]   (defaults examples/data/invented_thermal_scene.txt,
examples/out/thermal_python). Paints the scene's regions onto a height x width numpy frame
(integer pixel tests only), computes every pixel's signal with one broadcasting call of the
forward measurement equation (``relicore.blackbody.measured_spectral_radiance_wavelength``),
turns the frame back into T_obj and u_c with one call of
``relicore.blackbody.object_temperature_wavelength_with_uncertainty`` on the images (per-pixel
emissivity and its uncertainty, the rest scalars; a single wavelength, so it runs through the
core's frame function), and writes the three images as raw little-endian float64 (row-major, x
fastest, y from the top) to OUT_PREFIX_signal.f64, OUT_PREFIX_temperature.f64 and
OUT_PREFIX_uncertainty.f64. Prints the region sizes, a summary of the frame and, at each probe
pixel, the scalar call's named TemperatureUncertainty as ``key = value`` (17 significant
digits), after checking that it has the frame pixel's bits. The Rust, C and Fortran versions do
the same; examples/run_demo.sh compares the four outputs and the image files byte for byte.
"""

from __future__ import annotations

import sys
from dataclasses import dataclass, field
from pathlib import Path

import numpy as np

import relicore.blackbody as bb

DEFAULT_INPUT = "examples/data/invented_thermal_scene.txt"
DEFAULT_PREFIX = "examples/out/thermal_python"

SCALAR_KEYS = {
    "camera_wavelength_m": "wavelength_m",
    "reflected_temperature_k": "reflected_temperature_k",
    "window_transmittance": "transmittance",
    "window_temperature_k": "path_temperature_k",
    "signal_uncertainty_w_m2_sr_m": "signal_uncertainty",
    "reflected_temperature_uncertainty_k": "reflected_temperature_uncertainty_k",
    "window_transmittance_uncertainty": "transmittance_uncertainty",
    "window_temperature_uncertainty_k": "path_temperature_uncertainty_k",
}
COEFFICIENT_NAMES = (
    "signal_k_per_w_m2_sr_m",
    "emissivity_k",
    "reflected_temperature_k_per_k",
    "transmittance_k",
    "window_temperature_k_per_k",
)


@dataclass
class Region:
    """A surface: region 0 is the background, region k the k-th shape."""

    emissivity: float
    emissivity_uncertainty: float
    temperature_k: float
    name: str


@dataclass
class Scene:
    """The invented scene, as read from the data file."""

    width: int = 0
    height: int = 0
    wavelength_m: float = 0.0
    reflected_temperature_k: float = 0.0
    transmittance: float = 0.0
    path_temperature_k: float = 0.0
    signal_uncertainty: float = 0.0
    reflected_temperature_uncertainty_k: float = 0.0
    transmittance_uncertainty: float = 0.0
    path_temperature_uncertainty_k: float = 0.0
    regions: list[Region] = field(default_factory=list)
    #: ("rectangle", x0, y0, x1, y1) or ("disc", cx, cy, r)
    shapes: list[tuple] = field(default_factory=list)
    probes: list[tuple[int, int]] = field(default_factory=list)


def read_scene(path: str | Path) -> Scene:
    """Parses the plain-text scene file (format described in its header)."""
    s = Scene()
    background = None
    shape_regions: list[Region] = []
    want = {"background": 4, "rectangle": 8, "disc": 7, "probe": 2}
    for line_no, raw in enumerate(Path(path).read_text().splitlines(), start=1):
        tokens = raw.split()
        if not tokens or tokens[0].startswith("#"):
            continue
        key, values = tokens[0], tokens[1:]
        if len(values) != want.get(key, 1):
            raise SystemExit(f"thermal_scene: line {line_no}: wrong number of values for {key}")

        def region(v: list[str]) -> Region:
            return Region(float(v[0]), float(v[1]), float(v[2]), v[3])

        if key in SCALAR_KEYS:
            setattr(s, SCALAR_KEYS[key], float(values[0]))
        elif key == "image_width_px":
            s.width = int(values[0])
        elif key == "image_height_px":
            s.height = int(values[0])
        elif key == "background":
            background = region(values)
        elif key == "rectangle":
            s.shapes.append(("rectangle", *(int(v) for v in values[:4])))
            shape_regions.append(region(values[4:]))
        elif key == "disc":
            s.shapes.append(("disc", *(int(v) for v in values[:3])))
            shape_regions.append(region(values[3:]))
        elif key == "probe":
            s.probes.append((int(values[0]), int(values[1])))
        else:
            raise SystemExit(f"thermal_scene: line {line_no}: unknown key {key!r}")
    if background is None:
        raise SystemExit("thermal_scene: no background line")
    if s.width <= 0 or s.height <= 0:
        raise SystemExit("thermal_scene: the frame needs image_width_px and image_height_px")
    if any(not (0 <= x < s.width and 0 <= y < s.height) for x, y in s.probes):
        raise SystemExit("thermal_scene: a probe lies outside the frame")
    s.regions = [background, *shape_regions]
    return s


def paint(s: Scene) -> np.ndarray:
    """The region index of every pixel, shape (height, width), shapes painted in file order."""
    y, x = np.mgrid[0 : s.height, 0 : s.width].astype(np.int64)
    region_map = np.zeros((s.height, s.width), dtype=np.int64)
    for k, shape in enumerate(s.shapes, start=1):
        if shape[0] == "rectangle":
            _, x0, y0, x1, y1 = shape
            inside = (x0 <= x) & (x < x1) & (y0 <= y) & (y < y1)
        else:
            _, cx, cy, r = shape
            inside = (x - cx) ** 2 + (y - cy) ** 2 <= r * r
        region_map[inside] = k
    return region_map


def compute(s: Scene) -> tuple[list[tuple[str, float]], dict[str, np.ndarray], np.ndarray]:
    """The printed quantities (key, value) in the order all four programs print them, the three
    images (signal, temperature, uncertainty) and the region map."""
    region_map = paint(s)
    emissivity = np.array([r.emissivity for r in s.regions])[region_map]
    emissivity_u = np.array([r.emissivity_uncertainty for r in s.regions])[region_map]
    scene_t = np.array([r.temperature_k for r in s.regions])[region_map]

    # The frame of signals, by the forward measurement equation at every pixel (one call).
    signals = bb.measured_spectral_radiance_wavelength(
        s.wavelength_m, scene_t, emissivity, s.reflected_temperature_k, s.transmittance, s.path_temperature_k
    )
    # Back to object temperature and u_c (one call on the images; a TemperatureUncertainty of arrays).
    frame = bb.object_temperature_wavelength_with_uncertainty(
        s.wavelength_m, signals, emissivity, s.reflected_temperature_k, s.transmittance, s.path_temperature_k,
        s.signal_uncertainty, emissivity_u, s.reflected_temperature_uncertainty_k, s.transmittance_uncertainty,
        s.path_temperature_uncertainty_k,
    )
    t_obj, u_c = frame.temperature_k, frame.combined_standard_uncertainty_k

    out: list[tuple[str, float]] = []
    for k in range(len(s.regions)):
        out.append((f"region_{k}_pixels", float(np.count_nonzero(region_map == k))))
    out.append(("frame_pixels", float(region_map.size)))
    out.append(("frame_signal_min_w_m2_sr_m", float(signals.min())))
    out.append(("frame_signal_max_w_m2_sr_m", float(signals.max())))
    out.append(("frame_temperature_min_k", float(t_obj.min())))
    out.append(("frame_temperature_max_k", float(t_obj.max())))
    out.append(("frame_uncertainty_min_k", float(u_c.min())))
    out.append(("frame_uncertainty_max_k", float(u_c.max())))
    out.append(("frame_max_abs_round_trip_error_k", float(np.abs(t_obj - scene_t).max())))

    # The scalar call's full result at each probe pixel, with the frame's bits.
    for p, (x, y) in enumerate(s.probes, start=1):
        r = bb.object_temperature_wavelength_with_uncertainty(
            s.wavelength_m, float(signals[y, x]), float(emissivity[y, x]), s.reflected_temperature_k,
            s.transmittance, s.path_temperature_k, s.signal_uncertainty, float(emissivity_u[y, x]),
            s.reflected_temperature_uncertainty_k, s.transmittance_uncertainty, s.path_temperature_uncertainty_k,
        )
        same = np.array([r.temperature_k, r.combined_standard_uncertainty_k]).view(np.uint64)
        frame_bits = np.array([t_obj[y, x], u_c[y, x]]).view(np.uint64)
        if not np.array_equal(same, frame_bits):
            raise SystemExit(f"thermal_scene: probe {p}: the frame pixel differs from the scalar result")
        out.append((f"probe_{p}_region", float(region_map[y, x])))
        out.append((f"probe_{p}_signal_w_m2_sr_m", float(signals[y, x])))
        out.append((f"probe_{p}_temperature_k", r.temperature_k))
        out.append((f"probe_{p}_combined_standard_uncertainty_k", r.combined_standard_uncertainty_k))
        for name, c in zip(COEFFICIENT_NAMES, r.sensitivity_coefficients[: r.inputs]):
            out.append((f"probe_{p}_sensitivity_{name}", c))
    images = {"signal": signals, "temperature": t_obj, "uncertainty": u_c}
    return out, images, region_map


def main(argv: list[str]) -> int:
    path = argv[1] if len(argv) > 1 else DEFAULT_INPUT
    prefix = argv[2] if len(argv) > 2 else DEFAULT_PREFIX
    s = read_scene(path)
    out, images, _ = compute(s)
    print(f"# relicore thermal-scene demo (Python) -- INVENTED SCENE from {path}")
    print("# fictional Glimmerfen Ridge Observatory workshop; no real camera or measurement")
    for key, value in out:
        print(f"{key} = {value:.16e}")
    for kind, image in images.items():
        np.ascontiguousarray(image, dtype="<f8").tofile(f"{prefix}_{kind}.f64")
    return 0


if __name__ == "__main__":
    sys.exit(main(sys.argv))
