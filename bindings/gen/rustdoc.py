"""The one home of a function's documentation: its rustdoc in the core (src/). Reads the `///`
lines above `pub fn <name>` and turns them into plain text for the other faces."""

from __future__ import annotations

import re
from pathlib import Path

from .table import ROOT, Function

SRC = ROOT / "src"

class DocError(Exception):
    pass


def _sources(topic: str) -> list[Path]:
    return sorted((SRC / topic).rglob("*.rs"))


def _doc_above(lines: list[str], i: int) -> list[str]:
    """The `///` block above line i, skipping attributes."""
    j = i - 1
    while j >= 0 and lines[j].strip().startswith("#["):
        j -= 1
    doc: list[str] = []
    while j >= 0 and lines[j].strip().startswith("///"):
        text = lines[j].strip()[3:]
        doc.append(text[1:] if text.startswith(" ") else text)
        j -= 1
    return doc[::-1]


_LINK = re.compile(r"\[`?([^\]`]+?)`?\]\([^)]*\)")
_BARE = re.compile(r"\[`([^\]`]+)`\](?!\()")


def plain(text: str) -> str:
    """Rustdoc markup to plain text: intra-doc links become the linked name in backticks."""
    text = _LINK.sub(lambda m: f"`{m.group(1).split('::')[-1]}`", text)
    text = _BARE.sub(lambda m: f"`{m.group(1).split('::')[-1]}`", text)
    return text


_IMPL = re.compile(r"^impl(?:<[^>]*>)?\s+(?:\w+(?:<[^>]*>)?\s+for\s+)?(\w+)")


def _methods(core_type: str, name: str) -> list[tuple[Path, list[str]]]:
    """Doc blocks of `pub fn name(&self ...` inside the impl blocks of `core_type` anywhere in
    src/ (a topic may add methods to another topic's type)."""
    hits = []
    for path in sorted(SRC.rglob("*.rs")):
        lines = path.read_text().splitlines()
        impl = None
        for i, line in enumerate(lines):
            m = _IMPL.match(line)
            if m:
                impl = m.group(1)
            elif line.startswith("}"):
                impl = None
            if impl != core_type or not re.match(rf"^    pub fn {name}\(", line):
                continue
            if "&self" in line or (i + 1 < len(lines) and "&self" in lines[i + 1]):
                hits.append((path, _doc_above(lines, i)))
    return hits


def find(fn: Function) -> tuple[Path, list[str]]:
    """(file, doc lines) of the core function behind `fn`."""
    if fn.recv and not fn.core:
        hits = _methods(fn.recv.core_type, fn.name)
        where = f"the impl blocks of {fn.recv.core_type}"
    else:
        topic, _, name = (fn.core or f"{fn.topic}::{fn.name}").partition("::")
        pattern = re.compile(rf"^pub fn {name}\s*<")
        hits = []
        for path in _sources(topic):
            lines = path.read_text().splitlines()
            hits += [(path, _doc_above(lines, i)) for i, line in enumerate(lines) if pattern.match(line)]
        where = f"src/{topic}"
    if len(hits) != 1:
        raise DocError(f"{fn.name}: found {len(hits)} core definitions in {where}")
    path, doc = hits[0]
    if not doc:
        raise DocError(f"{fn.name}: the core function in {path.relative_to(ROOT)} has no rustdoc")
    return path, [plain(line) for line in doc]


def summary(doc: list[str]) -> str:
    """The first sentence-paragraph of a doc, joined into one line."""
    para: list[str] = []
    for line in doc:
        if not line.strip():
            break
        para.append(line.strip())
    return " ".join(para)
