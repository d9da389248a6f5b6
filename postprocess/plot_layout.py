"""Figure layout shared by the coldtip plots: size, titles, and plots along x with the
components marked and named (a band of coloured boxes above the data, a broken x axis
when one component, usually the inertance tube, is much longer than the rest).
"""

import matplotlib

matplotlib.use("Agg")
import matplotlib.pyplot as plt  # noqa: E402  (backend first)
import numpy as np  # noqa: E402

from coldtip_result import convert  # noqa: E402

WIDTH_IN, HEIGHT_IN, DPI = 8.0, 5.0, 200          # 1600 x 1000 px
X_UNIT = "mm"                                     # x along the flow path is shown in mm
# a component longer than LONG_FACTOR times all the others together gets its own panel
LONG_FACTOR = 2.0
LONG_SHARE = 0.28    # width share of that panel

KIND_COLOURS = {
    "duct": "#c8c8c8", "heat-exchanger": "#f4a582", "regenerator": "#a6d96a",
    "tube": "#fee08b", "volume": "#c2a5cf", "orifice": "#8c8c8c", "valve": "#8c8c8c",
    "piston": "#8c8c8c",
}
COLD_COLOUR = "#92c5de"   # the cold heat exchanger stands out from the warm ones
LINK_COLOUR = "#7b3294"   # links across the path (double inlet)

plt.rcParams.update({
    "font.size": 8, "axes.titlesize": 9, "axes.labelsize": 8, "legend.fontsize": 7,
    "xtick.labelsize": 7, "ytick.labelsize": 7, "figure.titlesize": 10,
    "axes.grid": True, "grid.alpha": 0.3, "lines.linewidth": 1.3,
})


def newFigure():
    return plt.figure(figsize=(WIDTH_IN, HEIGHT_IN), dpi=DPI, layout="constrained")


def title(fig, result, what):
    """Figure title: the case, what is shown, and how far the run got."""
    status = result.runStatus()
    fig.suptitle(f"{result.caseName()}: {what}" + (f"\n({status})" if status else ""))


def save(fig, path):
    fig.savefig(path, dpi=DPI)
    plt.close(fig)
    return path


_POWERS = {"^-1": "\u207b\u00b9", "^2": "\u00b2", "^3": "\u00b3"}


def unitLabel(quantity, unit):
    """'quantity [unit]' with powers typeset (m^3 -> m\u00b3)."""
    for ascii, sup in _POWERS.items():
        unit = unit.replace(ascii, sup)
    return f"{quantity} [{unit}]"


# ----- plots along x ---------------------------------------------------------------
class AlongX:
    """Axes for quantities along the flow path, components marked.

    `bands[c]` is the naming band above column c, `axes[r][c]` the data axes of row r.
    Columns are pieces of a broken x axis; data rows share x within a column and y
    within a row.
    """

    def __init__(self, fig, result, nRows=1):
        self.result = result
        placed = [c for c in result.components() if "x_start" in c]
        unit = result.unit("grid/components/x_start")
        self.xUnit = X_UNIT
        for c in placed:
            c["xs"], self.xUnit = convert(c["x_start"], unit, X_UNIT)
            c["xe"], _ = convert(c["x_end"], unit, X_UNIT)
            c["xs"], c["xe"] = float(c["xs"]), float(c["xe"])
        # links (double-inlet valves) run beside the path from x_start to x_end: drawn as a
        # bracket between their connection points, not as a piece of the path
        self.links = [c for c in placed if c["kind"] == "valve"]
        self.comps = [c for c in placed if c["kind"] != "valve"]
        cold = result.coldHeatExchanger()
        self.coldIndex = cold["index"] if cold else None
        self.panels = self._panels()
        widths = self._widths()
        grid = fig.add_gridspec(1 + nRows, len(self.panels), width_ratios=widths,
                                height_ratios=[0.55] + [4.0] * nRows,
                                wspace=0.04, hspace=0.02)
        self.bands, self.axes = [], [[] for _ in range(nRows)]
        for col, (x0, x1) in enumerate(self.panels):
            band = fig.add_subplot(grid[0, col])
            self.bands.append(band)
            for row in range(nRows):
                share = dict(sharex=band)
                if col > 0:
                    share["sharey"] = self.axes[row][0]
                ax = fig.add_subplot(grid[1 + row, col], **share)
                self.axes[row].append(ax)
                ax.set_xlim(x0, x1)
                self._shade(ax)
                if row < nRows - 1:
                    ax.tick_params(labelbottom=False)
                if col > 0:
                    ax.tick_params(labelleft=False, left=False)
            self._band(band, x0, x1)
        self._breakMarks()
        fig.supxlabel(unitLabel("position along the flow path x", self.xUnit), fontsize=8)

    def x(self, name):
        """A dataset of positions converted to the plot's x unit."""
        values, unit = self.result.data(name)
        return convert(values, unit, X_UNIT)[0]

    def plot(self, row, x, y, **kw):
        """Plot the same line in every column of a row (label only once)."""
        for col, ax in enumerate(self.axes[row]):
            once = kw if col == 0 else {k: v for k, v in kw.items() if k != "label"}
            ax.plot(x, y, **once)

    def each(self, row):
        return self.axes[row]

    # --- layout ---
    def _panels(self):
        total = max((c["xe"] for c in self.comps), default=1.0)
        long = max(self.comps, key=lambda c: c["xe"] - c["xs"], default=None)
        if long is None:
            return [(0.0, total)]
        length = long["xe"] - long["xs"]
        if length <= LONG_FACTOR * (total - length):
            return [(0.0, total)]
        cuts = [0.0, long["xs"], long["xe"], total]
        return [(a, b) for a, b in zip(cuts, cuts[1:]) if b - a > 1e-9 * total]

    def _widths(self):
        if len(self.panels) == 1:
            return [1.0]
        lengths = [b - a for a, b in self.panels]
        longest = int(np.argmax(lengths))
        rest = sum(lengths) - lengths[longest]
        return [LONG_SHARE if i == longest else (1 - LONG_SHARE) * w / rest
                for i, w in enumerate(lengths)]

    def _colour(self, comp):
        if comp["index"] == self.coldIndex:
            return COLD_COLOUR
        return KIND_COLOURS.get(comp["kind"], "#dddddd")

    def _shade(self, ax):
        for c in self.comps:
            if c["xe"] > c["xs"]:
                ax.axvspan(c["xs"], c["xe"], color=self._colour(c), alpha=0.18, lw=0,
                           zorder=0)
        edges = sorted({c["xs"] for c in self.comps} | {c["xe"] for c in self.comps})
        for e in edges:
            ax.axvline(e, color="0.45", lw=0.6, ls="--", zorder=1)
        ax.grid(True, axis="y")
        ax.grid(False, axis="x")

    def _band(self, band, x0, x1):
        """Boxes per component in the lower half; names inside when they fit, else in
        a row of call-outs above with leader lines (placed in _placeCallouts)."""
        band.set_ylim(0, 2.2)
        band.set_yticks([])
        band.tick_params(labelbottom=False, bottom=False)
        band.grid(False)
        for s in band.spines.values():
            s.set_visible(False)
        span = x1 - x0
        band._callouts = []
        for c in self.comps:
            a, b = max(c["xs"], x0), min(c["xe"], x1)
            zeroLength = c["xe"] - c["xs"] <= 1e-9 * span
            if zeroLength:
                if not (x0 - 1e-9 * span <= c["xs"] <= x1 + 1e-9 * span):
                    continue
                band.plot([c["xs"]], [0.95], marker="v", color="0.2", ms=5, clip_on=False)
                band._callouts.append((c["name"], c["xs"]))
                continue
            if b <= a:
                continue
            band.add_patch(matplotlib.patches.Rectangle(
                (a, 0.05), b - a, 0.9, facecolor=self._colour(c), edgecolor="0.3",
                lw=0.6))
            label = band.text((a + b) / 2, 0.5, c["name"], ha="center", va="center",
                              fontsize=7, clip_on=True)
            band._callouts.append((label, (a, b)))
        for link in self.links:
            ends = [x for x in (link["xs"], link["xe"]) if x0 <= x <= x1]
            if not ends:
                continue
            lo, hi = min(link["xs"], link["xe"]), max(link["xs"], link["xe"])
            band.plot([max(lo, x0), min(hi, x1)], [1.2, 1.2], color=LINK_COLOUR, lw=1.2,
                      clip_on=False)
            for x in ends:
                band.plot([x, x], [0.95, 1.2], color=LINK_COLOUR, lw=1.2, clip_on=False)
                band.plot([x], [0.95], marker="o", color=LINK_COLOUR, ms=3, clip_on=False)
            if x0 <= (lo + hi) / 2 <= x1:
                band.text((lo + hi) / 2, 1.32, f"link {link['name']}", ha="center",
                          va="bottom", fontsize=6, color=LINK_COLOUR)
        band.set_xlim(x0, x1)

    def _breakMarks(self):
        if len(self.panels) < 2:
            return
        d = 0.012
        for row in [self.bands] + self.axes:
            for col, ax in enumerate(row):
                if row is not self.bands:
                    if col > 0:
                        ax.spines["left"].set_visible(False)
                    if col < len(row) - 1:
                        ax.spines["right"].set_visible(False)
                kw = dict(transform=ax.transAxes, color="k", clip_on=False, lw=0.8)
                if row is self.bands:
                    continue
                h = d * 1.6
                if col < len(row) - 1:
                    ax.plot((1 - d, 1 + d), (-h, h), **kw)
                    ax.plot((1 - d, 1 + d), (1 - h, 1 + h), **kw)
                if col > 0:
                    ax.plot((-d, d), (-h, h), **kw)
                    ax.plot((-d, d), (1 - h, 1 + h), **kw)

    def placeCallouts(self, fig):
        """Move names that do not fit their box into a call-out row, without overlaps.

        Needs a drawn figure (text sizes are only known to a renderer).
        """
        fig.canvas.draw()
        renderer = fig.canvas.get_renderer()
        for band in self.bands:
            pending = []   # (name, x of the leader's foot)
            for label, where in band._callouts:
                if isinstance(label, str):
                    pending.append((label, where))
                    continue
                a, b = where
                box = band.transData.transform([(a, 0), (b, 0)])
                if label.get_window_extent(renderer).width + 4 > box[1][0] - box[0][0]:
                    label.set_visible(False)
                    pending.append((label.get_text(), (a + b) / 2))
            self._callouts(band, pending, renderer)

    @staticmethod
    def _callouts(band, pending, renderer):
        if not pending:
            return
        pending.sort(key=lambda p: p[1])
        toPix = band.transData.transform
        left, right = band.bbox.x0, band.bbox.x1
        texts = [band.text(x, 1.75, name, ha="center", va="center", fontsize=7)
                 for name, x in pending]
        widths = [t.get_window_extent(renderer).width + 6 for t in texts]
        centres = [toPix((x, 0))[0] for _, x in pending]
        # 1-D label placement: sweep right pushing overlaps apart, then keep in the band
        for i in range(1, len(centres)):
            centres[i] = max(centres[i], centres[i - 1] + (widths[i - 1] + widths[i]) / 2)
        overflow = centres[-1] + widths[-1] / 2 - right
        if overflow > 0:
            centres[-1] -= overflow
            for i in range(len(centres) - 2, -1, -1):
                gap = (widths[i] + widths[i + 1]) / 2
                centres[i] = min(centres[i], centres[i + 1] - gap)
        shift = left - (centres[0] - widths[0] / 2)
        if shift > 0:
            centres = [c + shift for c in centres]
        fromPix = band.transData.inverted().transform
        for t, c, (_, foot) in zip(texts, centres, pending):
            xc = fromPix((c, 0))[0]
            t.set_x(xc)
            band.plot([foot, xc], [0.95, 1.5], color="0.3", lw=0.6, clip_on=False)
