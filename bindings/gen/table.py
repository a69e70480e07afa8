"""The table of regular functions (bindings/functions.toml), loaded and checked."""

from __future__ import annotations

import tomllib
from dataclasses import dataclass, field
from pathlib import Path

ROOT = Path(__file__).resolve().parents[2]
TABLE = ROOT / "bindings" / "functions.toml"

TOPICS = ("blackbody", "cosmology", "decoupling", "growth")
RECEIVER_KEYS = {
    "core_type", "core_path", "c_struct", "c_module", "filled_by", "summary", "fortran_type",
    "python_class",
}
PYTHON = ("function", "method", "property")
KEYS = {
    "name", "topic", "receiver", "core", "infallible", "args", "result", "f32", "array",
    "array_f32", "python", "returns", "frame",
}
FRAME_KEYS = {"scalars", "simd", "f32", "scalars_doc", "domains", "outputs", "budget"}
RESULT_KEYS = {
    "core_type", "core_path", "c_struct", "c_module", "fortran_type", "python_type", "fields",
}


@dataclass(frozen=True)
class Receiver:
    """A value passed first (a universe, a thermal history, ...): how each face names it."""

    name: str
    core_type: str
    core_path: str
    c_struct: str
    c_module: str
    filled_by: str
    summary: bool
    fortran_type: str
    python_class: str


RECEIVERS: dict[str, Receiver] = {}


@dataclass(frozen=True)
class Field:
    """One field of a result type: kind 'real' (length 1), 'real' with a length, or 'count'."""

    name: str
    kind: str
    length: int
    meaning: str


@dataclass(frozen=True)
class ResultType:
    """A plain value a function returns instead of a number (a temperature with its uncertainty):
    how each face names it and its fields in the core's order."""

    name: str
    core_type: str
    core_path: str
    c_struct: str
    c_module: str
    fortran_type: str
    python_type: str
    fields: tuple[Field, ...]

    @property
    def width(self) -> int:
        """Number of f64 the value takes as one row (a count becomes a float)."""
        return sum(f.length for f in self.fields)


RESULTS: dict[str, ResultType] = {}


@dataclass(frozen=True)
class Arg:
    name: str
    meaning: str


@dataclass(frozen=True)
class ArrayForm:
    arg: str  # the scalar argument that becomes the array
    name: str  # the array's own name in C and Fortran
    simd: bool  # through the core's `_array` function and the SIMD dispatch

    def index(self, fn: Function) -> int:
        return [a.name for a in fn.args].index(self.arg)


@dataclass(frozen=True)
class FrameForm:
    """The C and Fortran frame (image) form `<name>_array` of an entry: the first `scalars`
    arguments single values, the signal n values, every later argument n values or 1 (shared);
    `outputs` are (name, meaning) of the n-value outputs."""

    scalars: int
    simd: bool  # through the SIMD dispatch (`widest!`) in C
    f32: bool  # a `float` twin `<name>_array_f32`
    scalars_doc: str  # what the single values are, with their domain (C docs)
    domains: tuple[str, ...]  # short domain of each scene parameter after the signal (C docs)
    outputs: tuple[tuple[str, str], ...]
    budget: str | None = None  # a result type's core frame form that fills one result value per element


@dataclass(frozen=True)
class Function:
    name: str
    topic: str
    receiver: str
    core: str | None
    infallible: bool
    args: tuple[Arg, ...]
    result: str
    f32: bool
    array: ArrayForm | None
    array_f32: bool
    python: str
    order: int = field(compare=False)
    returns: str | None = None
    frame: int | None = None  # leading single values of the frame form that Python's array path calls
    frame_form: FrameForm | None = None  # the C and Fortran frame form

    @property
    def frame_core(self) -> str | None:
        """The core's budget frame form of a function with a result type (one value per element)."""
        return self.frame_form.budget if self.frame_form else None

    @property
    def frame_function(self) -> str:
        """The core's frame form that Python's array path calls (a function of the topic's module)."""
        return self.frame_core or f"{self.name}_array"

    @property
    def recv(self) -> Receiver | None:
        """The receiver's description, None for a function without one."""
        return RECEIVERS.get(self.receiver)

    @property
    def result_type(self) -> ResultType | None:
        """The result type's description, None for a function that returns a number."""
        return RESULTS.get(self.returns) if self.returns else None

    @property
    def c_name(self) -> str:
        return f"relicore_{self.name}"

    @property
    def arg_names(self) -> list[str]:
        return [a.name for a in self.args]

    def forms(self) -> list[str]:
        """Every C symbol suffix this entry exports: '', '_f32', '_array', '_array_f32'."""
        out = [""]
        if self.f32:
            out.append("_f32")
        if self.array:
            out.append("_array")
        if self.array_f32:
            out.append("_array_f32")
        return out


class TableError(Exception):
    pass


TABLE_FUNCTION_KEYS = {"name", "args", "returns", "c_doc", "fortran_doc", "fortran_result", "python_doc"}


@dataclass(frozen=True)
class TableFunction:
    """A response-table function ([[table_function]]): the response table (wavelengths_m,
    response_table) first, then the single values `args`; a `float` twin; blackbody topic."""

    name: str
    args: tuple[str, ...]
    returns: str | None
    c_doc: str
    fortran_doc: str
    fortran_result: str | None
    python_doc: str

    @property
    def result_type(self) -> ResultType | None:
        return RESULTS.get(self.returns) if self.returns else None


def table_functions(path: Path = TABLE) -> list[TableFunction]:
    """The [[table_function]] entries (not part of `load()`: no harness list takes them)."""
    with open(path, "rb") as f:
        raw = tomllib.load(f)
    out = []
    for e in raw.get("table_function", []):
        where = f"{path.name}: table_function {e.get('name')!r}"
        if set(e) - TABLE_FUNCTION_KEYS or not {"name", "args", "c_doc", "fortran_doc", "python_doc"} <= set(e):
            raise TableError(f"{where}: keys are {sorted(TABLE_FUNCTION_KEYS)} (returns, fortran_result optional)")
        if bool(e.get("returns")) == bool(e.get("fortran_result")):
            raise TableError(f"{where}: give returns (a result type) or fortran_result, not both")
        if e.get("returns") and e["returns"] not in raw.get("result", {}):
            raise TableError(f"{where}: returns must name a [result.<name>]")
        out.append(TableFunction(e["name"], tuple(e["args"]), e.get("returns"), e["c_doc"].strip("\n"),
                                 e["fortran_doc"], e.get("fortran_result"), e["python_doc"]))
    return out


def load(path: Path = TABLE) -> list[Function]:
    with open(path, "rb") as f:
        raw = tomllib.load(f)
    RECEIVERS.clear()
    RESULTS.clear()
    for tname, r in raw.get("result", {}).items():
        if set(r) != RESULT_KEYS:
            raise TableError(f"{path.name}: result {tname!r} needs exactly the keys {sorted(RESULT_KEYS)}")
        fields = []
        for f in r["fields"]:
            fname, kind, meaning = (s.strip() for s in f.split(":", 2))
            length = 1
            if kind.startswith("real[") and kind.endswith("]"):
                kind, length = "real", int(kind[5:-1])
            if kind not in ("real", "count") or not fname.isidentifier():
                raise TableError(f"{path.name}: result {tname!r}: field {f!r} is not 'name: real|real[n]|count: meaning'")
            fields.append(Field(fname, kind, length, meaning))
        RESULTS[tname] = ResultType(name=tname, fields=tuple(fields), **{k: v for k, v in r.items() if k != "fields"})
    for rname, r in raw.get("receiver", {}).items():
        if set(r) != RECEIVER_KEYS:
            raise TableError(f"{path.name}: receiver {rname!r} needs exactly the keys {sorted(RECEIVER_KEYS)}")
        RECEIVERS[rname] = Receiver(name=rname, **r)
    fns: list[Function] = []
    seen: set[str] = set()
    for i, e in enumerate(raw.get("function", [])):
        where = f"{path.name}: function {e.get('name', i)!r}"
        unknown = set(e) - KEYS
        if unknown:
            raise TableError(f"{where}: unknown keys {sorted(unknown)}")
        for k in ("name", "topic", "args", "result", "python"):
            if k not in e:
                raise TableError(f"{where}: missing {k}")
        if e["name"] in seen:
            raise TableError(f"{where}: listed twice")
        seen.add(e["name"])
        args = []
        for a in e["args"]:
            name, sep, meaning = a.partition(": ")
            if not sep or not name.isidentifier():
                raise TableError(f"{where}: argument {a!r} is not 'name: meaning'")
            args.append(Arg(name, meaning))
        receiver = e.get("receiver", "none")
        arr = e.get("array")
        array = ArrayForm(arr["arg"], arr["name"], bool(arr.get("simd", False))) if arr else None
        frame_form = None
        if "frame" in e:
            fr = e["frame"]
            if set(fr) - FRAME_KEYS or "scalars" not in fr:
                raise TableError(f"{where}: frame needs scalars and takes only {sorted(FRAME_KEYS)}")
            outs = fr.get("outputs", [f"out: {e['result'].split(',')[0]}"])
            frame_form = FrameForm(
                scalars=int(fr["scalars"]), simd=bool(fr.get("simd", False)), f32=bool(fr.get("f32", False)),
                scalars_doc=fr.get("scalars_doc", ""), domains=tuple(fr.get("domains", ())),
                outputs=tuple(tuple(o.split(": ", 1)) for o in outs),
                budget=fr.get("budget"),
            )
        fn = Function(
            name=e["name"],
            topic=e["topic"],
            receiver=receiver,
            core=e.get("core"),
            infallible=bool(e.get("infallible", False)),
            args=tuple(args),
            result=e["result"],
            f32=bool(e.get("f32", False)),
            array=array,
            array_f32=bool(e.get("array_f32", False)),
            python=e["python"],
            order=i,
            returns=e.get("returns"),
            # a result type's frame form gives T and u_c only: Python's array path calls its
            # budget form (the whole result value per element)
            frame=frame_form.scalars if frame_form and (frame_form.budget or not e.get("returns")) else None,
            frame_form=frame_form,
        )
        if fn.returns and fn.returns not in RESULTS:
            raise TableError(f"{where}: returns must be one of {sorted(RESULTS)}")
        if fn.returns and (fn.array or fn.receiver != "none" or fn.python != "function"):
            raise TableError(f"{where}: a function with a result type is a plain function without array form")
        ff = fn.frame_form
        if ff and not (0 < ff.scalars < len(fn.args) and not fn.array and fn.receiver == "none"):
            raise TableError(f"{where}: frame scalars must leave the signal and the scene as slices")
        if ff and bool(ff.budget) != bool(fn.returns):
            raise TableError(f"{where}: the frame of a function with a result type (and only such) names its "
                             "budget form (frame.budget), the core function that writes one result value per element")
        if ff and not (0 < len(ff.domains) <= len(fn.args) - ff.scalars - 1 and ff.outputs):
            raise TableError(f"{where}: frame needs the domains of the scene (the parameters after the "
                             "signal; any later ones are standard uncertainties) and its outputs")
        if fn.topic not in TOPICS:
            raise TableError(f"{where}: topic must be one of {TOPICS}")
        if fn.receiver != "none" and fn.receiver not in RECEIVERS:
            raise TableError(f"{where}: receiver must be none or one of {sorted(RECEIVERS)}")
        if fn.python not in PYTHON:
            raise TableError(f"{where}: python must be one of {PYTHON}")
        if fn.python != "function" and fn.receiver == "none":
            raise TableError(f"{where}: a {fn.python} needs a receiver")
        if fn.python == "property" and fn.args:
            raise TableError(f"{where}: a property takes no arguments")
        if fn.array and fn.array.arg not in fn.arg_names:
            raise TableError(f"{where}: array argument {fn.array.arg!r} is not an argument")
        if fn.array_f32 and not (fn.array and fn.f32):
            raise TableError(f"{where}: array_f32 needs array and f32")
        if fn.f32 and fn.receiver != "none":
            raise TableError(f"{where}: f32 twins exist only for functions without a receiver")
        if fn.infallible and fn.args:
            raise TableError(f"{where}: only constants (no arguments) are infallible")
        fns.append(fn)
    return fns


def thermometry_names() -> set[str]:
    """The functions whose reference vectors are in tests/data/thermometry*.txt (the
    measurement equation and the uncertainty functions): the thermometry harnesses test them,
    the blackbody harnesses do not."""
    names: set[str] = set()
    for path in sorted((ROOT / "tests" / "data").glob("thermometry*.txt")):
        for line in path.read_text().splitlines():
            if line and not line.startswith("#") and line[0].isalpha():
                name = line.split()[0].split("@")[0]
                names.add(name[: -len("_f32")] if name.endswith("_f32") else name)
    return names
