"""Read a coldtip result file (HDF5; layout in README.md, "Results") for post-processing.

Only reading lives here: datasets with their `units` attribute, strings, the
component network (cells, faces, components by name and kind) and unit scaling
for display. Plotting lives in coldtip_plot.py and plot_layout.py.
"""

import os
import re

import h5py
import numpy as np


# a face inside one component: "regenerator[3|4]"
_INSIDE = re.compile(r"^([^\[\]|]+)\[(\d+)\|(\d+)\]$")


class NotAResult(Exception):
    """The file is missing, unreadable or not a coldtip result; the text names it."""


# unit -> (dimension, factor to SI). Display scaling only: a unit not listed here is
# shown exactly as the file states it, unscaled.
_UNITS = {
    "Pa": ("pressure", 1.0), "kPa": ("pressure", 1e3), "MPa": ("pressure", 1e6),
    "bar": ("pressure", 1e5),
    "m^3": ("volume", 1.0), "cm^3": ("volume", 1e-6), "mm^3": ("volume", 1e-9),
    "m": ("length", 1.0), "cm": ("length", 1e-2), "mm": ("length", 1e-3),
    "kg/s": ("mass flow", 1.0), "g/s": ("mass flow", 1e-3), "mg/s": ("mass flow", 1e-6),
    "m^3/s": ("volume flow", 1.0), "cm^3/s": ("volume flow", 1e-6),
    "s": ("time", 1.0), "ms": ("time", 1e-3), "min": ("time", 60.0),
    "h": ("time", 3600.0),
    "W": ("power", 1.0), "mW": ("power", 1e-3), "kW": ("power", 1e3),
    "J": ("energy", 1.0), "K": ("temperature", 1.0),
    "deg": ("angle", 1.0), "rad": ("angle", 180.0 / np.pi),
}


def convert(values, unit, wanted):
    """Values in `unit` expressed in `wanted`; returns (values, unit shown).

    Falls back to the file's own unit when either unit is unknown or the dimensions
    differ, so a plot never shows a unit the numbers are not in.
    """
    a, b = _UNITS.get(unit), _UNITS.get(wanted)
    if a is None or b is None or a[0] != b[0]:
        return np.asarray(values, dtype=float), unit
    return np.asarray(values, dtype=float) * (a[1] / b[1]), wanted


def known(unit):
    """True when the unit can be scaled (it is in the display table)."""
    return unit in _UNITS


def toSi(values, unit):
    """Values in SI when the unit is known, else unchanged."""
    entry = _UNITS.get(unit)
    return np.asarray(values, dtype=float) * (entry[1] if entry else 1.0)


def text(value):
    """An HDF5 string (bytes, numpy bytes or str) as str."""
    if isinstance(value, (bytes, np.bytes_)):
        return value.decode("utf-8", "replace")
    return str(value)


class Result:
    """An open coldtip result file. Use as a context manager."""

    def __init__(self, path):
        self.path = path
        if not os.path.exists(path):
            raise NotAResult(f"{path}: no such file")
        if os.path.isdir(path):
            raise NotAResult(f"{path}: is a directory, not a coldtip result file")
        try:
            self.file = h5py.File(path, "r")
        except OSError:
            raise NotAResult(f"{path}: not a coldtip result (not an HDF5 file)") from None
        missing = [g for g in ("summary", "grid/components") if g not in self.file]
        if missing:
            self.file.close()
            raise NotAResult(f"{path}: not a coldtip result (no /{missing[0]} in it)")

    def __enter__(self):
        return self

    def __exit__(self, *exc):
        self.file.close()

    def has(self, *names):
        """True when every dataset or group named exists."""
        return all(n in self.file for n in names)

    def missing(self, *names):
        """The first of `names` absent from the file, or None."""
        return next((n for n in names if n not in self.file), None)

    def data(self, name):
        """(values as float array, units attribute as str)."""
        ds = self.file[name]
        return np.asarray(ds[()], dtype=float), self.unit(name)

    def unit(self, name):
        """The `units` attribute of a dataset, or '?' when the file does not say."""
        u = self.file[name].attrs.get("units")
        return text(u) if u is not None else "?"

    def strings(self, name):
        return [text(s) for s in self.file[name][()]]

    def summary(self, key, default=None):
        value = self.file["summary"].attrs.get(key)
        if value is None:
            return default
        return text(value) if isinstance(value, (bytes, np.bytes_, str)) else value

    def caseName(self):
        name = self.summary("case")
        return name if name else os.path.splitext(os.path.basename(self.path))[0]

    def caseText(self):
        """The case file text stored in /case, or '' when absent."""
        if "case" not in self.file:
            return ""
        return text(self.file["case"].attrs.get("text", b""))

    def isCooldown(self):
        return "cooldown" in self.file

    def isCompare(self):
        return "compare" in self.file

    def runStatus(self):
        """One line saying how far the run got, for plot subtitles.

        A cooldown is described by its own method and status (settled, time limit...): its
        /summary is that of the final cycle only, whose "converged" says nothing about it.
        A frequency-domain file (linear, compare) has no convergence to report.
        """
        if self.isCooldown():
            attrs = self.file["cooldown"].attrs
            parts = [f"cooldown {text(attrs[k])}" if k == "method" else f"status: {text(attrs[k])}"
                     for k in ("method", "status") if k in attrs]
            return ", ".join(parts)
        if self.summary("status") == "frequency-domain":
            return "frequency-domain analysis"
        cycles = self.summary("cycles")
        status = self.summary("status", "")
        converged = self.summary("converged")
        parts = []
        if cycles is not None:
            parts.append(f"{int(cycles)} cycles")
        if converged is not None:
            parts.append("converged" if float(converged) > 0.5 else "NOT converged")
        if status:
            parts.append(f"status: {status}")
        return ", ".join(parts)

    def frequency(self):
        """Drive frequency [Hz] from /summary, else from the sampled cycle spacing."""
        f = self.summary("frequency_Hz")
        if f:
            return float(f)
        t, unit = self.data("cycle/time")
        t = toSi(t, unit)
        return 1.0 / (len(t) * (t[1] - t[0]))

    # ----- network --------------------------------------------------------------
    def components(self):
        """List of dicts: index, name, kind, x_start, x_end (file's length unit)."""
        names = self.strings("grid/components/name")
        kinds = (self.strings("grid/components/kind") if self.has("grid/components/kind")
                 else [""] * len(names))
        comps = [{"index": i, "name": n, "kind": k}
                 for i, (n, k) in enumerate(zip(names, kinds))]
        if self.has("grid/components/x_start", "grid/components/x_end"):
            xs, _ = self.data("grid/components/x_start")
            xe, _ = self.data("grid/components/x_end")
            for c, a, b in zip(comps, xs, xe):
                c["x_start"], c["x_end"] = float(a), float(b)
        return comps

    def componentAfter(self, kindBefore, kindWanted, immediately=False):
        """First component of kindWanted after the first one of kindBefore, or None."""
        comps = self.components()
        first = next((c for c in comps if c["kind"] == kindBefore), None)
        if first is None:
            return None
        for c in comps[first["index"] + 1:]:
            if c["kind"] == kindWanted:
                return c
            if immediately:
                return None
        return None

    def coldHeatExchanger(self):
        """The heat exchanger right after the first regenerator."""
        return self.componentAfter("regenerator", "heat-exchanger", immediately=True)

    def inertance(self):
        """The first duct after the pulse tube."""
        return self.componentAfter("tube", "duct")

    def cellIndex(self):
        return {n: i for i, n in enumerate(self.strings("grid/cells/name"))}

    def cellsOf(self, component):
        comp, _ = self.data("grid/cells/component")
        return [i for i, c in enumerate(comp.astype(int)) if c == component["index"]]

    def faceNeighbours(self):
        """Per face, (upstream cell, downstream cell) indices from the face names.

        Face names are 'a|b' between two named cells, or 'comp[i|j]' inside one
        component (the naming the solver writes in /grid/faces/name).
        """
        cells = self.cellIndex()
        out = []
        for name in self.strings("grid/faces/name"):
            inside = _INSIDE.match(name)
            if inside:
                base, i, j = inside.groups()
                up, down = f"{base}[{i}]", f"{base}[{j}]"
            elif "|" in name:
                up, down = name.split("|", 1)
            else:
                up = down = None
            out.append((cells.get(up), cells.get(down)))
        return out

    def boundaryFaces(self, component):
        """(inlet face, outlet face) of a component: faces with one neighbour in it."""
        comp, _ = self.data("grid/cells/component")
        comp = comp.astype(int)
        inlet = outlet = None
        for f, (up, down) in enumerate(self.faceNeighbours()):
            if up is None or down is None:
                continue
            inUp = comp[up] == component["index"]
            inDown = comp[down] == component["index"]
            if inDown and not inUp:
                inlet = f
            elif inUp and not inDown:
                outlet = f
        return inlet, outlet
