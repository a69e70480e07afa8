"""The one home of a function's documentation: its rustdoc in the core (src/). Reads the `///`
lines above `pub fn <name>` and turns them into plain text for the other faces."""

from __future__ import annotations

import re
from pathlib import Path

from .table import ROOT, Function

SRC = ROOT / "src"

# the file(s) where a receiver's methods live
_RECEIVER_DIRS = {"universe": "cosmology", "history": "decoupling"}


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


def find(fn: Function) -> tuple[Path, list[str]]:
    """(file, doc lines) of the core function behind `fn`."""
    if fn.receiver != "none" and not fn.core:
        topic = _RECEIVER_DIRS[fn.receiver]
        pattern = re.compile(rf"^\s*pub fn {fn.name}\(\s*&self")
        multiline = re.compile(rf"^\s*pub fn {fn.name}\($")
    else:
        topic, _, name = (fn.core or f"{fn.topic}::{fn.name}").partition("::")
        pattern = re.compile(rf"^\s*pub fn {name}\s*<")
        multiline = pattern
    hits = []
    for path in _sources(topic):
        lines = path.read_text().splitlines()
        for i, line in enumerate(lines):
            if pattern.match(line) or (
                multiline.match(line) and i + 1 < len(lines) and "&self" in lines[i + 1]
            ):
                hits.append((path, _doc_above(lines, i)))
    if len(hits) != 1:
        raise DocError(f"{fn.name}: found {len(hits)} core definitions in src/{topic}")
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
