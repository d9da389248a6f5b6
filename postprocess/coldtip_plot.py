#!/usr/bin/python3
"""Plot one coldtip result file (HDF5) as PNG images engineers look at.

Usage: coldtip_plot.py RESULT.h5 [-o DIR]

Writes into DIR (default: the result's folder) and prints each path written. A plot
whose data is absent is skipped with a note on stderr. Exit 1, naming the file, when
it is missing or not a coldtip result; exit 2 when a plot failed on data shaped
otherwise than expected (the other plots are still written). Images are 1600 x 1000 px
(8 x 5 in at 200 dpi).

    pv_loop.png                 compression-space p-V loop, PV work of the cycle
    cycle_cold_end.png          pressure and mass flow over the cycle at the cold end
    cycle_inertance_inlet.png   the same at the inertance tube inlet
    temperature_profile.png     mean gas and solid temperature along x
    energy_flow.png             cycle-averaged enthalpy flow and acoustic power along x
    phasors.png                 linear-analysis phasors (only with /linear/components)
    compare_runK.png            a comparison (only with /compare): pressure amplitude and
                                flow phase at every port, nonlinear beside linear and lumped
    cooldown.png                cold-end temperature vs time (only when /cooldown exists)
    history.png                 per-cycle cold temperature, cooling and PV power, residual;
                                for a cooldown, its own history against time

When no plot applies to the file (nothing written), exit 1 and say so.

Units are read from each dataset's `units` attribute.
"""

import argparse
import os
import sys

import numpy as np

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))

import plot_layout as layout  # noqa: E402
from coldtip_result import NotAResult, Result, convert, known, text, toSi  # noqa: E402
from matplotlib.ticker import MaxNLocator  # noqa: E402


class Skip(Exception):
    """A plot cannot be made from this file; the text says why."""


def need(result, *names):
    absent = result.missing(*names)
    if absent:
        raise Skip(f"/{absent} not in the file")


def firstHarmonic(samples):
    """Complex amplitude of the first harmonic of samples spread evenly over one period.

    X1 = (2/N) sum_k x_k exp(-i 2 pi k / N)     (discrete Fourier series; common practice)
    """
    n = len(samples)
    return 2.0 / n * np.sum(np.asarray(samples) * np.exp(-2j * np.pi * np.arange(n) / n))


def phaseText(flow, pressure):
    """'leads p by 35 deg' for the first-harmonic phase of flow relative to pressure."""
    d = np.degrees(np.angle(firstHarmonic(flow) / firstHarmonic(pressure)))
    return f"{'leads' if d >= 0 else 'lags'} p by {abs(d):.0f} deg"


def loopIntegral(p, v):
    """Closed-loop integral of p dV over one period from samples spread evenly over it.

    With Fourier coefficients P_k, V_k of the samples (theta = 2 pi t / T):
      oint p dV = int_0^2pi p V' dtheta = 2 pi sum_k i k conj(P_k) V_k
    which is the trapezoidal rule on p V' with V' differentiated spectrally: exact for
    band-limited signals and geometrically convergent for smooth periodic ones
    (Trefethen & Weideman, "The exponentially convergent trapezoidal rule", SIAM Review
    56(3), 2014). A sinusoidal drive volume picks out the first harmonic of p exactly,
    where the polygon (shoelace) area of the samples would be low by O(1/N^2).
    """
    n = len(p)
    P, V = np.fft.rfft(p) / n, np.fft.rfft(v) / n
    m = (n + 1) // 2          # harmonics below Nyquist; the Nyquist term carries no work
    k = np.arange(1, m)
    return float(4 * np.pi * np.real(np.sum(1j * k * np.conj(P[1:m]) * V[1:m])))


# ----- 1. PV loop --------------------------------------------------------------------
def pvLoop(r, out):
    need(r, "cycle/drive_volume", "cycle/pressure")
    v, vUnit = r.data("cycle/drive_volume")
    p, pUnit = r.data("cycle/pressure")
    p = p[:, 0]
    cell = r.strings("grid/cells/name")[0] if r.has("grid/cells/name") else "cell 0"
    vShow, vShown = convert(v, vUnit, "cm^3")
    pShow, pShown = convert(p, pUnit, "MPa")
    siKnown = known(vUnit) and known(pUnit)
    work = -loopIntegral(toSi(p, pUnit), toSi(v, vUnit))
    freq = r.frequency()
    if siKnown:
        workText = (f"work on the gas  $-\\oint p\\,dV$ = {work:.4g} J per cycle"
                    f"\n= {work * freq:.4g} W at {freq:.4g} Hz (spectral, {len(p)} samples)")
    else:
        workText = f"$-\\oint p\\,dV$ = {work:.4g} {pUnit}*{vUnit} per cycle"
    fig = layout.newFigure()
    ax = fig.add_subplot()
    ax.plot(np.append(vShow, vShow[0]), np.append(pShow, pShow[0]), "-", color="C0",
            label=workText)
    ax.fill(vShow, pShow, color="C0", alpha=0.12, lw=0)
    # direction of travel: an arrow a few samples after the start of the cycle
    k = max(1, len(p) // 16)
    ax.annotate("", xy=(vShow[k + 1], pShow[k + 1]), xytext=(vShow[k], pShow[k]),
                arrowprops=dict(arrowstyle="-|>", color="C0", lw=1.3, mutation_scale=14))
    ax.plot(vShow[0], pShow[0], "o", color="C3", ms=4,
            label="start of the sampled cycle (t = 0)")
    summaryPv = r.summary("pv_power_W")
    if summaryPv is not None:
        ax.plot([], [], " ", label=f"/summary pv_power_W = {float(summaryPv):.4g} W "
                                   "(exact cycle integral)")
    ax.set_xlabel(layout.unitLabel("compression-space volume V", vShown))
    ax.set_ylabel(layout.unitLabel(f"pressure p in {cell}", pShown))
    ax.legend(loc="best", framealpha=0.9)
    layout.title(fig, r, "p-V loop of the compression space")
    return layout.save(fig, os.path.join(out, "pv_loop.png"))


# ----- 2. pressure and flow over one cycle -------------------------------------------
def cyclePlot(r, out, fileName, what, pressure, flows):
    """pressure = (label, samples, unit); flows = [(label, samples, unit)]."""
    t, tUnit = r.data("cycle/time")
    period = 1.0 / r.frequency()
    # the samples cover [0, T): repeat the first at t = T so the plot spans the cycle
    tSi = np.append(toSi(t, tUnit) - toSi(t[0], tUnit), period)
    closed = lambda y: np.append(y, y[0])  # noqa: E731
    tShow, tShown = convert(tSi, "s", "ms")
    fig = layout.newFigure()
    top, bottom = fig.subplots(2, 1, sharex=True)
    label, p, pUnit = pressure
    pShow, pShown = convert(p, pUnit, "MPa")
    top.plot(tShow, closed(pShow), color="C0", label=label)
    top.set_ylabel(layout.unitLabel("pressure", pShown))
    top.ticklabel_format(axis="y", useOffset=False)
    top.margins(y=0.25)
    top.legend(loc="best", framealpha=0.9)
    for i, (flabel, m, mUnit) in enumerate(flows):
        mShow, mShown = convert(m, mUnit, "g/s")
        bottom.plot(tShow, closed(mShow), color=f"C{i + 1}", ls=["-", "--"][i % 2],
                    label=f"{flabel} ({phaseText(m, p)})")
    bottom.axhline(0, color="0.3", lw=0.7)
    bottom.set_ylabel(layout.unitLabel("mass flow (+ away from the drive)", mShown))
    bottom.set_xlabel(layout.unitLabel("time in the last cycle", tShown))
    bottom.margins(y=0.25)
    bottom.legend(loc="best", framealpha=0.9)
    bottom.set_xlim(0, convert(period, "s", "ms")[0])
    phase = top.secondary_xaxis(
        "top", functions=(lambda x: x / convert(period, "s", "ms")[0] * 360.0,
                          lambda d: d / 360.0 * convert(period, "s", "ms")[0]))
    phase.set_xlabel("phase in the cycle [deg]")
    phase.set_xticks(np.arange(0, 361, 45))
    layout.title(fig, r, what)
    return layout.save(fig, os.path.join(out, fileName))


def cycleColdEnd(r, out):
    need(r, "cycle/time", "cycle/pressure", "cycle/mass_flow", "grid/cells/name",
         "grid/faces/name", "grid/cells/component", "grid/components/kind")
    hx = r.coldHeatExchanger()
    if hx is None:
        raise Skip("no heat exchanger right after a regenerator (no cold end)")
    cells = r.cellsOf(hx)
    if not cells:
        raise Skip(f"component {hx['name']} has no gas cells")
    cell = cells[(len(cells) - 1) // 2]   # the middle cell (the upstream one of two)
    names, faces = r.strings("grid/cells/name"), r.strings("grid/faces/name")
    p, pUnit = r.data("cycle/pressure")
    m, mUnit = r.data("cycle/mass_flow")
    flows = [(f"mass flow at face {faces[f]}", m[:, f], mUnit)
             for f in r.boundaryFaces(hx) if f is not None]
    return cyclePlot(r, out, "cycle_cold_end.png",
                     f"cold end (heat exchanger {hx['name']}) over one cycle",
                     (f"pressure in cell {names[cell]}", p[:, cell], pUnit), flows)


def cycleInertanceInlet(r, out):
    need(r, "cycle/time", "cycle/pressure", "cycle/mass_flow", "grid/cells/name",
         "grid/faces/name", "grid/cells/x", "grid/faces/x", "grid/cells/component",
         "grid/components/kind")
    duct = r.inertance()
    if duct is None:
        raise Skip("no duct after a pulse tube (no inertance)")
    face = r.boundaryFaces(duct)[0]
    if face is None:
        raise Skip(f"no face enters component {duct['name']}")
    up, down = r.faceNeighbours()[face]
    names, faces = r.strings("grid/cells/name"), r.strings("grid/faces/name")
    xc, _ = r.data("grid/cells/x")
    xf, _ = r.data("grid/faces/x")
    p, pUnit = r.data("cycle/pressure")
    m, mUnit = r.data("cycle/mass_flow")
    # pressure lives in cells: interpolate linearly in x to the face between them
    span = xc[down] - xc[up]
    w = 0.5 if span == 0 else (xf[face] - xc[up]) / span
    pFace = (1 - w) * p[:, up] + w * p[:, down]
    return cyclePlot(r, out, "cycle_inertance_inlet.png",
                     f"inertance inlet (duct {duct['name']}) over one cycle",
                     (f"pressure at face {faces[face]} (linear in x between cells "
                      f"{names[up]} and {names[down]})", pFace, pUnit),
                     [(f"mass flow at face {faces[face]}", m[:, face], mUnit)])


# ----- 3. temperature profile --------------------------------------------------------
def temperatureProfile(r, out):
    need(r, "profile/cells/x", "profile/cells/mean_gas_temperature",
         "grid/components/x_start")
    fig = layout.newFigure()
    lay = layout.AlongX(fig, r)
    x = lay.x("profile/cells/x")
    t, tUnit = r.data("profile/cells/mean_gas_temperature")
    order = np.argsort(x, kind="stable")
    lay.plot(0, x[order], t[order], color="C3", marker=".", ms=3,
             label="gas (cycle mean)")
    if r.has("profile/solids/x", "profile/solids/mean_temperature"):
        xs = lay.x("profile/solids/x")
        ts, tsUnit = r.data("profile/solids/mean_temperature")
        comp = np.zeros(len(xs), int)
        if r.has("grid/solids/component"):
            owner = r.data("grid/solids/component")[0].astype(int)
            comp = owner if owner.size == xs.size else comp
        # one line per component: the matrix and the pulse-tube wall are separate solids
        label = "solid: matrix, walls (cycle mean)"
        for c in np.unique(comp):
            sel = np.flatnonzero(comp == c)
            sel = sel[np.argsort(xs[sel], kind="stable")]
            lay.plot(0, xs[sel], ts[sel], color="C0", lw=1.0, ls="--", marker="x", ms=2.5,
                     label=label)
            label = None
        if tsUnit != tUnit:
            tUnit = f"{tUnit} (gas), {tsUnit} (solid)"
    lay.axes[0][0].set_ylabel(layout.unitLabel("mean temperature", tUnit))
    lay.axes[0][0].legend(loc="best", framealpha=0.9)
    layout.title(fig, r, "mean temperature along the flow path")
    lay.placeCallouts(fig)
    return layout.save(fig, os.path.join(out, "temperature_profile.png"))


# ----- 4. energy flow ----------------------------------------------------------------
def energyFlow(r, out):
    need(r, "grid/components/x_start")
    haveH = r.has("profile/enthalpy_flow/x", "profile/enthalpy_flow/value")
    haveA = r.has("profile/faces/x", "profile/faces/acoustic_power")
    if not (haveH or haveA):
        raise Skip("neither /profile/enthalpy_flow nor /profile/faces/acoustic_power "
                   "in the file")
    fig = layout.newFigure()
    lay = layout.AlongX(fig, r)
    units = []
    for have, xName, yName, label, style in (
            (haveH, "profile/enthalpy_flow/x", "profile/enthalpy_flow/value",
             "enthalpy flow $\\langle\\dot H\\rangle$", dict(color="C3")),
            (haveA, "profile/faces/x", "profile/faces/acoustic_power",
             "acoustic power $\\langle p\\,U\\rangle$", dict(color="C0", ls="--"))):
        if not have:
            continue
        x = lay.x(xName)
        y, unit = r.data(yName)
        order = np.argsort(x, kind="stable")
        lay.plot(0, x[order], y[order], marker=".", ms=3, label=f"{label} [{unit}]",
                 **style)
        units.append(unit)
    for ax in lay.each(0):
        ax.axhline(0, color="0.3", lw=0.7)
    # links run beside the path: their cycle means are stated, not drawn on the path's curve
    for text_ in linkTexts(r):
        lay.axes[0][0].plot([], [], " ", label=text_)
    unit = units[0] if len(set(units)) == 1 else ", ".join(units)
    lay.axes[0][0].set_ylabel(
        layout.unitLabel("cycle-averaged power (+ away from the drive)", unit))
    lay.axes[0][0].legend(loc="best", framealpha=0.9)
    layout.title(fig, r, "cycle-averaged energy flow along the flow path")
    lay.placeCallouts(fig)
    return layout.save(fig, os.path.join(out, "energy_flow.png"))


def linkTexts(r):
    """'link NAME (from -> to): mean mass flow .. g/s, enthalpy flow .. W' per link."""
    if not r.has("profile/links/name", "profile/links/mean_mass_flow",
                 "profile/links/enthalpy_flow"):
        return []
    names = r.strings("profile/links/name")
    ends = (zip(r.strings("profile/links/from"), r.strings("profile/links/to"))
            if r.has("profile/links/from", "profile/links/to") else [("?", "?")] * len(names))
    m, mUnit = r.data("profile/links/mean_mass_flow")
    h, hUnit = r.data("profile/links/enthalpy_flow")
    texts = []
    for n, (a, b), mk, hk in zip(names, ends, m, h):
        big = abs(toSi(mk, mUnit)) >= 1e-5
        mShow, mShown = convert(mk, mUnit, "g/s" if big else "mg/s")
        texts.append(f"link {n}, {a} -> {b}:\nmean mass flow {float(mShow):.3g} {mShown}, "
                     f"enthalpy flow {hk:.3g} {hUnit}")
    return texts


# ----- 5. phasors (linear analysis) --------------------------------------------------
def phasorOf(r, group, quantity):
    """(complex phasor, unit of its amplitude) from `quantity` stored either as a complex
    dataset or as `quantity_amplitude` + `quantity_phase` (phase in deg or rad)."""
    if r.has(f"{group}/{quantity}"):
        ds = r.file[f"{group}/{quantity}"][()]
        if np.iscomplexobj(ds):
            return np.asarray(ds), r.unit(f"{group}/{quantity}")
        if ds.dtype.names and {"r", "i"} <= set(ds.dtype.names):
            return ds["r"] + 1j * ds["i"], r.unit(f"{group}/{quantity}")
    need(r, f"{group}/{quantity}_amplitude", f"{group}/{quantity}_phase")
    amp, unit = r.data(f"{group}/{quantity}_amplitude")
    phase, pUnit = r.data(f"{group}/{quantity}_phase")
    phase = np.radians(phase) if pUnit == "deg" else phase
    return amp * np.exp(1j * phase), unit


def portPhasors(r, group):
    """The ports of the components under `group` (e.g. linear/components), in path order:
    a list of (label, pressure phasor, volume-flow phasor), with the units of each.

    Each component has an inlet (towards the drive) and an outlet (datasets prefixed
    `outlet_`). Where one component's outlet is the next one's inlet (the same face, the
    same phasors), the port is listed once with both names, so no two arrows coincide.
    """
    names = r.strings(f"{group}/name") if r.has(f"{group}/name") else None
    pIn, pUnit = phasorOf(r, group, "pressure")
    uIn, uUnit = phasorOf(r, group, "volume_flow")
    names = names or [f"component {i}" for i in range(len(pIn))]
    sides = [("inlet", pIn, uIn)]
    if r.has(f"{group}/outlet_pressure_amplitude", f"{group}/outlet_volume_flow_amplitude"):
        sides.append(("outlet", phasorOf(r, group, "outlet_pressure")[0],
                      phasorOf(r, group, "outlet_volume_flow")[0]))
    ports = []
    for k, name in enumerate(names):
        for side, p, u in sides:
            pk, uk = complex(p[k]), complex(u[k])
            if not (np.isfinite(pk) and np.isfinite(uk)):
                continue
            label = f"{name} {side}"
            if ports and side == "inlet":
                last = ports[-1]
                same = (abs(pk - last[1]) <= 1e-6 * max(abs(pk), 1e-300)
                        and abs(uk - last[2]) <= 1e-6 * max(abs(uk), 1e-300))
                if same:
                    ports[-1] = (f"{last[0]} = {label}", last[1], last[2])
                    continue
            ports.append((label, pk, uk))
    return ports, pUnit, uUnit


# Ten colours beyond tab10 picked to stay at least 0.2 apart (Euclidean RGB in [0, 1]) from
# tab10 and from each other, none pale enough to vanish on white.
EXTRA_COLOURS = ("#000000", "#a6cee3", "#f0027f", "#b15928", "#fc8d62", "#b2df8a", "#66c2a5",
                 "#1b9e77", "#6a3d9a", "#e6ab02")


def portColours(n):
    """n colours that can be told apart: matplotlib's qualitative tab10, then EXTRA_COLOURS,
    cycling beyond 20 (the arrows are numbered as well)."""
    from matplotlib.colors import to_rgba
    tab10 = layout.plt.get_cmap("tab10")
    palette = [tab10(i) for i in range(10)] + [to_rgba(c) for c in EXTRA_COLOURS]
    return [palette[i % len(palette)] for i in range(n)]


def phasorFigure(r, group, path, what):
    ports, pUnit, uUnit = portPhasors(r, group)
    if not ports:
        raise Skip(f"no port phasors in /{group}")
    fig = layout.newFigure()
    axes = fig.subplots(1, 2)
    colours = portColours(len(ports))
    for ax, col, unit, quantity, wanted in (
            (axes[0], 1, pUnit, "pressure", "MPa"),
            (axes[1], 2, uUnit, "volume flow", "cm^3/s")):
        values = np.array([p[col] for p in ports])
        shown, shownUnit = convert(np.abs(values), unit, wanted)
        z = shown * np.exp(1j * np.angle(values))
        lim = 1.15 * max(np.max(np.abs(z)), 1e-300)
        placed = []
        for k, (zk, ck) in enumerate(zip(z, colours)):
            ax.annotate("", xy=(zk.real, zk.imag), xytext=(0, 0), arrowprops=dict(
                arrowstyle="-|>", color=ck, lw=1.4, mutation_scale=11))
            # the port's number just beyond the arrow's tip, stepped sideways while it would
            # sit on an earlier number (arrows of nearly equal phasors end together)
            outward = zk / abs(zk) if abs(zk) > 0 else -1j
            tip = zk + 0.06 * lim * outward
            while any(abs(tip - q) < 0.07 * lim for q in placed):
                tip += 0.07 * lim * outward * 1j
            placed.append(tip)
            ax.text(tip.real, tip.imag, str(k + 1), color=ck, fontsize=7, ha="center",
                    va="center", fontweight="bold")
        ax.set_xlim(-lim, lim)
        ax.set_ylim(-lim, lim)
        ax.set_aspect("equal")
        ax.axhline(0, color="0.3", lw=0.6)
        ax.axvline(0, color="0.3", lw=0.6)
        ax.set_title(f"{quantity} phasors")
        ax.set_xlabel(layout.unitLabel(f"Re {quantity}", shownUnit))
        ax.set_ylabel(layout.unitLabel(f"Im {quantity}", shownUnit))
    for k, ((label, _, _), ck) in enumerate(zip(ports, colours)):
        axes[1].plot([], [], color=ck, lw=2, label=f"{k + 1}: {label}")
    axes[1].legend(loc="center left", bbox_to_anchor=(1.02, 0.5), title="port",
                   fontsize=6, ncol=1 if len(ports) <= 20 else 2)
    layout.title(fig, r, what)
    return layout.save(fig, path)


def phasors(r, out):
    group = "linear/components"
    if group not in r.file:
        return None
    return phasorFigure(r, group, os.path.join(out, "phasors.png"),
                        "linear analysis: phasors at the component ports\n"
                        "(phases relative to the piston displacement)")


def comparePorts(r, group):
    """[(label, pressure amplitude, flow phase)] of every finite port under group."""
    names = r.strings(f"{group}/name")
    out = []
    for k, name in enumerate(names):
        for side, prefix in (("in", ""), ("out", "outlet_")):
            if not r.has(f"{group}/{prefix}pressure_amplitude", f"{group}/{prefix}flow_phase"):
                continue
            pa, pUnit = r.data(f"{group}/{prefix}pressure_amplitude")
            fp, _ = r.data(f"{group}/{prefix}flow_phase")
            out.append((f"{name} {side}", pa[k], fp[k], pUnit))
    return out


def compareRuns(r, out):
    """One figure per drive amplitude of a `coldtip compare` result: pressure amplitude and
    flow phase arg(U1/p1) at every port, nonlinear beside the linear and lumped models."""
    if "compare" not in r.file:
        return None
    runs = sorted((k for k in r.file["compare"] if k.startswith("run")),
                  key=lambda k: int(k[3:]))
    paths = []
    for run in runs:
        g = f"compare/{run}"
        models = [m for m in ("nonlinear", "linear", "lumped") if r.has(f"{g}/{m}/components/name")]
        if not models:
            continue
        fig = layout.newFigure()
        top, bottom = fig.subplots(2, 1, sharex=True)
        labels = None
        for m, style in zip(models, (dict(color="C0", marker="o"),
                                     dict(color="C1", marker="s", ls="--"),
                                     dict(color="C2", marker="^", ls=":"))):
            ports = comparePorts(r, f"{g}/{m}/components")
            if labels is None:
                labels = [p[0] for p in ports]
            amp, unit = np.array([p[1] for p in ports]), ports[0][3] if ports else "Pa"
            shown, shownUnit = convert(amp, unit, "kPa")
            x = np.arange(len(ports))
            top.plot(x, shown, ms=3, label=m, **style)
            bottom.plot(x, [p[2] for p in ports], ms=3, label=m, **style)
        top.set_ylabel(layout.unitLabel("pressure amplitude |p1|", shownUnit))
        bottom.set_ylabel("flow phase arg(U1/p1) [deg]\n(+ = flow leads pressure)")
        bottom.axhline(0, color="0.3", lw=0.7)
        bottom.set_xticks(np.arange(len(labels)))
        bottom.set_xticklabels(labels, rotation=90, fontsize=5)
        top.legend(loc="best", framealpha=0.9)
        scale = r.file[g].attrs.get("amplitude_scale", 1.0)
        layout.title(fig, r, f"nonlinear cycle against the linear models, drive amplitude "
                             f"x {float(scale):g}")
        paths.append(layout.save(fig, os.path.join(out, f"compare_{run}.png")))
    if not paths:
        raise Skip("/compare holds no run with port phasors")
    return paths


# ----- 6. cooldown -------------------------------------------------------------------
REPORT_NAMES = ("report_temperature", "report_temperatures")


def cooldown(r, out):
    if "cooldown" not in r.file:
        return None
    need(r, "cooldown/time", "cooldown/cold_temperature")
    t, tUnit = r.data("cooldown/time")
    temp, kUnit = r.data("cooldown/cold_temperature")
    tSi = toSi(t, tUnit)
    wanted = "h" if tSi[-1] >= 3 * 3600 else "min" if tSi[-1] >= 180 else "s"
    tShow, tShown = convert(t, tUnit, wanted)
    reports = []
    for n in REPORT_NAMES:
        if r.has(f"cooldown/{n}"):
            reports = list(np.atleast_1d(r.data(f"cooldown/{n}")[0]))
        elif n in r.file["cooldown"].attrs:
            values = np.asarray(r.file["cooldown"].attrs[n], dtype=float)
            reports = list(np.atleast_1d(values))
    fig = layout.newFigure()
    ax = fig.add_subplot()
    ax.plot(tShow, temp, color="C0", label="cold-end temperature")
    # report temperatures: a dotted line each, the crossing marked, times in the legend
    # (close report temperatures would make labels on the plot collide)
    for k, tr in enumerate(sorted(reports, reverse=True)):
        ax.axhline(tr, color="0.5", lw=0.7, ls=":")
        below = np.flatnonzero(temp <= tr)
        if below.size and below[0] > 0:
            i = below[0]
            # linear interpolation between the samples either side of the crossing
            tc = np.interp(tr, [temp[i], temp[i - 1]], [tShow[i], tShow[i - 1]])
            ax.plot(tc, tr, "o", ms=4, color=f"C{k + 1}",
                    label=f"{tr:.4g} {kUnit} reached at {tc:.3g} {tShown}")
        elif below.size:
            ax.plot([], [], " ", label=f"{tr:.4g} {kUnit}: already at the start")
        else:
            ax.plot([], [], " ", label=f"{tr:.4g} {kUnit}: not reached")
    ax.set_xlabel(layout.unitLabel("time", tShown))
    ax.set_ylabel(layout.unitLabel("cold-end temperature", kUnit))
    ax.legend(loc="upper right", framealpha=0.9)
    # the subtitle tells how the cooldown ended (the run summary is of the final cycle)
    attrs = r.file["cooldown"].attrs
    how = ", ".join(text(attrs[k]) for k in ("method", "status") if k in attrs)
    fig.suptitle(f"{r.caseName()}: cooldown of the cold end" + (f"\n({how})" if how else ""))
    return layout.save(fig, os.path.join(out, "cooldown.png"))


# ----- 7. history --------------------------------------------------------------------
def residualTolerance(r):
    """solver.steady.heat_residual from the stored case text, or None."""
    try:
        import yaml
        case = yaml.safe_load(r.caseText()) or {}
        return float(case["solver"]["steady"]["heat_residual"])
    except Exception:   # no YAML module, no case text, key absent: just draw no line
        return None


def cooldownHistory(r, out):
    """The cooldown's own history against time: cold end and bodies, cooling, PV power,
    loads (a cooldown's /history is only that of its final cycle)."""
    need(r, "cooldown/time", "cooldown/cold_temperature")
    t, tUnit = r.data("cooldown/time")
    tSi = toSi(t, tUnit)
    wanted = "h" if tSi[-1] >= 3 * 3600 else "min" if tSi[-1] >= 180 else "s"
    tShow, tShown = convert(t, tUnit, wanted)
    fig = layout.newFigure()
    axes = fig.subplots(2, 2, sharex=True).ravel()
    temp, kUnit = r.data("cooldown/cold_temperature")
    axes[0].plot(tShow, temp, color="C0", label="cold end")
    if r.has("cooldown/body_temperature", "cooldown/body_name"):
        tb, _ = r.data("cooldown/body_temperature")
        for k, name in enumerate(r.strings("cooldown/body_name")):
            if tb.ndim == 2 and k < tb.shape[1]:
                axes[0].plot(tShow, tb[:, k], ls="--", lw=1.0, label=name)
    axes[0].set_title("temperature")
    axes[0].set_ylabel(layout.unitLabel("temperature", kUnit))
    axes[0].legend(loc="best", fontsize=6)
    for name, label, style in (("gross_cooling_power", "gross (taken up by the gas)", "--"),
                               ("cooling_power", "cooling (net of conduction)", "-"),
                               ("net_cooling_power", "net of the loads", ":")):
        if r.has(f"cooldown/{name}"):
            y, unit = r.data(f"cooldown/{name}")
            axes[1].plot(tShow, y, ls=style, label=label)
            axes[1].set_ylabel(layout.unitLabel("power", unit))
    axes[1].axhline(0, color="0.3", lw=0.7)
    axes[1].set_title("cooling at the cold end")
    axes[1].legend(loc="best", fontsize=6)
    if r.has("cooldown/pv_power"):
        y, unit = r.data("cooldown/pv_power")
        axes[2].plot(tShow, y, color="C3")
        axes[2].set_ylabel(layout.unitLabel("PV power", unit))
    axes[2].set_title("PV power")
    if r.has("cooldown/load", "cooldown/load_name"):
        y, unit = r.data("cooldown/load")
        for k, name in enumerate(r.strings("cooldown/load_name")):
            if y.ndim == 2 and k < y.shape[1]:
                axes[3].plot(tShow, y[:, k], label=name)
        axes[3].set_ylabel(layout.unitLabel("load", unit))
        if r.strings("cooldown/load_name"):
            axes[3].legend(loc="best", fontsize=6)
    axes[3].set_title("loads on the cold head")
    for ax in axes[2:]:
        ax.set_xlabel(layout.unitLabel("time", tShown))
    layout.title(fig, r, "cooldown history")
    return layout.save(fig, os.path.join(out, "history.png"))


def history(r, out):
    if r.isCooldown():
        return cooldownHistory(r, out)
    need(r, "history/cycle")
    cycle, _ = r.data("history/cycle")
    panels = (("history/cold_temperature", "cold temperature", False),
              ("history/cooling_power", "cooling power", False),
              ("history/pv_power", "PV power", False),
              ("history/steady_residual", "steady-state residual", True))
    if not any(r.has(name) for name, _, _ in panels):
        raise Skip("no per-cycle history values in the file")
    fig = layout.newFigure()
    axes = fig.subplots(2, 2, sharex=True).ravel()
    for ax, (name, what, log) in zip(axes, panels):
        ax.xaxis.set_major_locator(MaxNLocator(integer=True))
        ax.set_title(what)
        if not r.has(name):
            ax.text(0.5, 0.5, f"/{name} not in the file", ha="center", va="center",
                    transform=ax.transAxes, color="0.4")
            continue
        y, unit = r.data(name)
        marker = "o" if len(y) <= 60 else None
        ax.plot(cycle, np.abs(y) if log else y, marker=marker, ms=3, color="C0",
                label=what)
        if name == "history/cooling_power" and r.has("history/gross_cooling_power"):
            g, _ = r.data("history/gross_cooling_power")
            ax.plot(cycle, g, marker=marker, ms=3, ls="--", color="C1",
                    label="gross cooling power")
            ax.legend(loc="best")
        if log:
            ax.set_yscale("log")
            tol = residualTolerance(r)
            if tol:
                ax.axhline(tol, color="C3", ls="--", lw=0.9, label=f"tolerance {tol:g}")
                ax.legend(loc="best")
        else:
            ax.ticklabel_format(axis="y", useOffset=False)
        ax.set_ylabel(layout.unitLabel(what if not log else f"|{what}|", unit))
    for ax in axes[2:]:
        ax.set_xlabel("cycle")
    layout.title(fig, r, "convergence history per cycle")
    return layout.save(fig, os.path.join(out, "history.png"))


PLOTS = (("pv_loop.png", pvLoop), ("cycle_cold_end.png", cycleColdEnd),
         ("cycle_inertance_inlet.png", cycleInertanceInlet),
         ("temperature_profile.png", temperatureProfile), ("energy_flow.png", energyFlow),
         ("phasors.png", phasors), ("compare_runK.png", compareRuns),
         ("cooldown.png", cooldown), ("history.png", history))


def main(argv=None):
    parser = argparse.ArgumentParser(
        prog="coldtip_plot.py",
        description="Plot a coldtip result file (HDF5) as PNG images.")
    parser.add_argument("result", metavar="RESULT.h5")
    parser.add_argument("-o", "--output", metavar="DIR",
                        help="folder for the images (default: next to the result)")
    args = parser.parse_args(argv)
    out = args.output or os.path.dirname(os.path.abspath(args.result))
    failed = False
    written = 0
    try:
        with Result(args.result) as r:
            os.makedirs(out, exist_ok=True)
            for name, plot in PLOTS:
                try:
                    path = plot(r, out)
                except Skip as why:
                    print(f"coldtip_plot.py: note: {name} skipped: {why}",
                          file=sys.stderr)
                    continue
                except (KeyError, ValueError, IndexError, TypeError) as e:
                    # data present but not shaped as expected: say so, make the others
                    print(f"coldtip_plot.py: error: {name} failed on {args.result}: "
                          f"{type(e).__name__}: {e}", file=sys.stderr)
                    failed = True
                    continue
                for p in ([path] if isinstance(path, str) else path or []):
                    print(p)
                    written += 1
    except NotAResult as e:
        print(f"coldtip_plot.py: error: {e}", file=sys.stderr)
        return 1
    if failed:
        return 2
    if written == 0:
        print(f"coldtip_plot.py: error: {args.result}: nothing to plot (none of the plots "
              "applies to what the file holds)", file=sys.stderr)
        return 1
    return 0


if __name__ == "__main__":
    sys.exit(main())
