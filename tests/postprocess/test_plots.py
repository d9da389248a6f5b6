#!/usr/bin/python3
"""Tests of postprocess/coldtip_plot.py on a result file made by the real program.

Environment:
  COLDTIP_EXE    the coldtip executable (default: <repo>/build/coldtip)
  COLDTIP_CASES  the folder of example cases, or one case file
                 (default: <repo>/cases/ge-spectrometer-85K.yaml)

Run: /usr/bin/python3 tests/postprocess/test_plots.py -v
(standard-library unittest; pytest is not installed for /usr/bin/python3).
"""

import json
import os
import shutil
import struct
import subprocess
import sys
import tempfile
import unittest
import zlib

import numpy as np

REPO = os.path.abspath(os.path.join(os.path.dirname(__file__), "..", ".."))
SCRIPT = os.path.join(REPO, "postprocess", "coldtip_plot.py")
CASE_NAME = "ge-spectrometer-85K.yaml"
sys.path.insert(0, os.path.join(REPO, "postprocess"))

import h5py  # noqa: E402
import matplotlib.image  # noqa: E402

import coldtip_plot  # noqa: E402
import plot_layout  # noqa: E402
from coldtip_plot import firstHarmonic, loopIntegral, portColours, portPhasors  # noqa: E402
from coldtip_result import Result  # noqa: E402

WIDTH, HEIGHT = 1600, 1000      # the stated image size: 8 x 5 in at 200 dpi
ALWAYS = ["pv_loop.png", "cycle_cold_end.png", "cycle_inertance_inlet.png",
          "temperature_profile.png", "energy_flow.png", "history.png"]
# only when /linear/components and /cooldown exist (history.png of a cooldown is its own)
LATER = ["phasors.png", "cooldown.png", "history.png"]


def casePath():
    given = os.environ.get("COLDTIP_CASES", os.path.join(REPO, "cases"))
    return os.path.join(given, CASE_NAME) if os.path.isdir(given) else given


def plot(result, out):
    return subprocess.run([sys.executable, SCRIPT, result, "-o", out],
                          capture_output=True, text=True, timeout=300)


def pngHeader(path):
    """(width, height, bit depth, colour type) from the PNG signature and IHDR chunk
    (PNG specification, ISO/IEC 15948:2004, sections 5.2 and 11.2.2)."""
    with open(path, "rb") as f:
        data = f.read(33)
    if data[:8] != b"\x89PNG\r\n\x1a\n":
        raise AssertionError(f"{path}: not a PNG (bad signature)")
    length, kind = struct.unpack(">I4s", data[8:16])
    if kind != b"IHDR" or length != 13:
        raise AssertionError(f"{path}: first chunk is not IHDR")
    crc = struct.unpack(">I", data[29:33])[0]
    if zlib.crc32(data[12:29]) != crc:
        raise AssertionError(f"{path}: IHDR checksum wrong")
    width, height, depth, colour = struct.unpack(">IIBB", data[16:26])
    return width, height, depth, colour


class PngChecks:
    def assertGoodPng(self, path):
        self.assertTrue(os.path.isfile(path), f"{path} not written")
        self.assertGreater(os.path.getsize(path), 10_000, f"{path} is nearly empty")
        width, height, _, _ = pngHeader(path)
        self.assertEqual((width, height), (WIDTH, HEIGHT), path)
        rgb = matplotlib.image.imread(path)[..., :3]
        grey = rgb.mean(axis=2)
        # a blank page has no variance; an empty set of axes has some (about 0.08) but
        # no coloured pixels: data lines and component boxes are coloured
        self.assertGreater(float(grey.std()), 0.05, f"{path} looks blank")
        coloured = float(((rgb.max(axis=2) - rgb.min(axis=2)) > 0.3).mean())
        self.assertGreater(coloured, 0.002, f"{path} has no coloured data on it")


class PlotsOfARealRun(unittest.TestCase, PngChecks):
    """Five cycles of the demo case, plotted."""

    @classmethod
    def setUpClass(cls):
        exe = os.environ.get("COLDTIP_EXE", os.path.join(REPO, "build", "coldtip"))
        case = casePath()
        if not os.access(exe, os.X_OK):
            raise AssertionError(f"coldtip executable {exe} not found: set COLDTIP_EXE")
        if not os.path.isfile(case):
            raise AssertionError(f"case file {case} not found: set COLDTIP_CASES")
        cls.tmp = tempfile.mkdtemp(prefix="coldtip-plots-")
        cls.result = os.path.join(cls.tmp, "run.h5")
        run = subprocess.run([exe, "run", case, "--max-cycles", "5", "-o", cls.result,
                              "--quiet"], capture_output=True, text=True, timeout=600)
        # Five cycles are not the steady state: exit 2 (not converged) with a readable file.
        if run.returncode not in (0, 2) or not os.path.isfile(cls.result):
            raise AssertionError(f"coldtip run failed ({run.returncode}): {run.stderr}")
        cls.out = os.path.join(cls.tmp, "plots")
        cls.proc = plot(cls.result, cls.out)

    @classmethod
    def tearDownClass(cls):
        shutil.rmtree(cls.tmp, ignore_errors=True)

    def test_exit_and_paths_printed(self):
        self.assertEqual(self.proc.returncode, 0, self.proc.stderr)
        printed = [os.path.basename(p) for p in self.proc.stdout.split()]
        self.assertEqual(printed, ALWAYS)
        for p in self.proc.stdout.split():
            self.assertTrue(os.path.isabs(p) or os.path.exists(p), p)

    def test_images_valid(self):
        for name in ALWAYS:
            with self.subTest(name=name):
                self.assertGoodPng(os.path.join(self.out, name))

    def test_later_features_skipped_quietly(self):
        for name in ("phasors.png", "cooldown.png"):
            self.assertFalse(os.path.exists(os.path.join(self.out, name)))
            self.assertNotIn(name, self.proc.stderr)

    def test_default_output_next_to_result(self):
        proc = subprocess.run([sys.executable, SCRIPT, self.result], capture_output=True,
                              text=True, timeout=300)
        self.assertEqual(proc.returncode, 0, proc.stderr)
        self.assertTrue(os.path.isfile(os.path.join(self.tmp, "history.png")))

    def test_pv_work_matches_exact_cycle_integral(self):
        # The loop integral of the 96 sampled (p, V) against the solver's own PV power in
        # /summary, integrated exactly alongside the state (DEVELOPERS.md, "Integration"). The
        # drive volume is a pure sinusoid, so the spectral loop integral is exact for the
        # samples; what is left is the integrator's error (relative tolerance 1e-6 in the
        # case), far below 0.1 %.
        with Result(self.result) as r:
            p = r.data("cycle/pressure")[0][:, 0]
            v = r.data("cycle/drive_volume")[0]
            power = -loopIntegral(p, v) * r.frequency()
            self.assertAlmostEqual(power / r.summary("pv_power_W"), 1.0, delta=1e-3)

    def test_compare_result_is_plotted(self):
        # `coldtip compare RESULT.h5` reads the stored cycle (no new run); its file holds
        # /compare only, and the plot draws what it holds rather than skipping everything
        exe = os.environ.get("COLDTIP_EXE", os.path.join(REPO, "build", "coldtip"))
        cmp = os.path.join(self.tmp, "cmp.h5")
        run = subprocess.run([exe, "compare", self.result, "-o", cmp, "--quiet", "--json"],
                             capture_output=True, text=True, timeout=600)
        self.assertEqual(run.returncode, 0, run.stderr)
        # Phase convention (README.md, "JSON layout"): phases relative to the piston
        # displacement x = X sin(omega t), positive x compressing, so the PV power is
        # 1/2 omega A X |p1| sin(phase of p1): pressure leads when the gas takes up work.
        # A X is the first-harmonic amplitude of the stored drive volume.
        report = json.loads(run.stdout)
        drive = report["components"]["drive"]["nonlinear"]["inlet"]
        with Result(self.result) as r:
            volume = r.data("cycle/drive_volume")[0]
            omega = 2 * np.pi * r.frequency()
        sweep = abs(firstHarmonic(volume))
        pv = 0.5 * omega * sweep * drive["pressure_amplitude_Pa"] * np.sin(
            np.radians(drive["pressure_phase_deg"]))
        self.assertAlmostEqual(pv / report["dft_check"]["pv_power_dft_W"], 1.0, delta=1e-6)
        self.assertGreater(drive["pressure_phase_deg"], 0.0)
        out = os.path.join(self.tmp, "cmp-plots")
        proc = plot(cmp, out)
        self.assertEqual(proc.returncode, 0, proc.stderr)
        printed = [os.path.basename(p) for p in proc.stdout.split()]
        self.assertEqual(printed, ["compare_run0.png"])
        self.assertGoodPng(os.path.join(out, "compare_run0.png"))

    def test_profile_ordered_by_x(self):
        with Result(self.result) as r:
            for group in ("enthalpy_flow", "gas_conduction", "wall_heat", "cells", "faces",
                          "solids"):
                x, _ = r.data(f"profile/{group}/x")
                self.assertTrue(np.all(np.diff(x) >= 0), group)

    def test_cold_end_and_inertance_found_by_name(self):
        with Result(self.result) as r:
            faces = r.strings("grid/faces/name")
            cold, duct = r.coldHeatExchanger(), r.inertance()
            self.assertEqual(cold["name"], "cold-end")
            self.assertEqual(duct["name"], "inertance")
            last = sum(1 for n in r.strings("grid/cells/name") if n.startswith("regenerator[")) - 1
            self.assertEqual([faces[f] for f in r.boundaryFaces(cold)],
                             [f"regenerator[{last}]|cold-end[0]", "cold-end[1]|pulse-tube[0]"])
            self.assertEqual(faces[r.boundaryFaces(duct)[0]], "warm-end[1]|inertance[0]")


class LaterFeatures(unittest.TestCase, PngChecks):
    """The phasor and cooldown plots, tested on a small invented file with /linear/components
    and /cooldown (a run of either would cost minutes; the layout is the one they write)."""

    def setUp(self):
        self.tmp = tempfile.mkdtemp(prefix="coldtip-plots-later-")
        self.result = os.path.join(self.tmp, "later.h5")
        with h5py.File(self.result, "w") as f:
            f.create_group("summary").attrs["case"] = "invented-later-features"
            comps = f.create_group("grid/components")
            comps["name"] = np.array([b"drive", b"regenerator", b"cold-end"])
            comps["kind"] = np.array([b"piston", b"regenerator", b"heat-exchanger"])
            # /linear/components as `coldtip linear` writes it: per component an inlet and
            # (prefix outlet_) an outlet; the drive's outlet is the regenerator's inlet
            lin = f.create_group("linear/components")
            lin["name"] = np.array([b"drive", b"regenerator", b"cold-end"])
            ports = np.linspace(0.0, 1.0, 4)
            for prefix, s in (("", ports[[0, 1, 2]]), ("outlet_", ports[[1, 2, 3]])):
                for name, values, unit in (
                        ("pressure_amplitude", 2e5 * (1 - 0.3 * s), "Pa"),
                        ("pressure_phase", -15 * s, "deg"),
                        ("volume_flow_amplitude", 8e-5 * (1 - 0.7 * s), "m^3/s"),
                        ("volume_flow_phase", 50 - 80 * s, "deg")):
                    lin[prefix + name] = values
                    lin[prefix + name].attrs["units"] = unit
            cool = f.create_group("cooldown")
            t = np.linspace(0.0, 3600.0, 200)
            for name, values, unit in (
                    ("time", t, "s"),
                    ("cold_temperature", 80 + 220 * np.exp(-t / 900), "K"),
                    ("cooling_power", 3 * np.exp(-t / 900), "W"),
                    ("pv_power", 50 + 0 * t, "W"),
                    ("report_temperature", np.array([150.0, 90.0]), "K")):
                cool[name] = values
                cool[name].attrs["units"] = unit
            cool.attrs["method"] = "averaged"
            cool.attrs["status"] = "settled"
            # the final cycle's run summary, as `coldtip cooldown` writes it
            f["summary"].attrs["converged"] = 0.0
            f["summary"].attrs["status"] = "not-converged"

    def tearDown(self):
        shutil.rmtree(self.tmp, ignore_errors=True)

    def test_phasors_and_cooldown_drawn(self):
        out = os.path.join(self.tmp, "plots")
        proc = plot(self.result, out)
        self.assertEqual(proc.returncode, 0, proc.stderr)
        self.assertEqual([os.path.basename(p) for p in proc.stdout.split()], LATER)
        for name in LATER:
            with self.subTest(name=name):
                self.assertGoodPng(os.path.join(out, name))
        # the others have no data here: each skipped with a note, none silently
        for name in ALWAYS:
            if name not in LATER:
                self.assertIn(f"{name} skipped", proc.stderr)

    def test_cooldown_history_titled_as_a_cooldown(self):
        # history.png of a cooldown is the cooldown's own history against time, titled with
        # its method and status, never "NOT converged" (the final cycle's /summary flag)
        titles = []
        original = plot_layout.save

        def capture(fig, path):
            titles.append(fig._suptitle.get_text() if fig._suptitle else "")
            return original(fig, path)

        plot_layout.save = capture
        try:
            with Result(self.result) as r:
                path = coldtip_plot.history(r, self.tmp)
        finally:
            plot_layout.save = original
        self.assertGoodPng(path)
        self.assertEqual(len(titles), 1)
        self.assertIn("cooldown history", titles[0])
        self.assertIn("settled", titles[0])
        self.assertNotIn("converged", titles[0])

    def test_phasor_ports_labelled_distinct_and_not_doubled(self):
        with Result(self.result) as r:
            ports, pUnit, uUnit = portPhasors(r, "linear/components")
        labels = [p[0] for p in ports]
        # the drive's outlet and the regenerator's inlet are one port, drawn once
        self.assertEqual(labels, ["drive inlet", "drive outlet = regenerator inlet",
                                  "regenerator outlet = cold-end inlet", "cold-end outlet"])
        self.assertEqual((pUnit, uUnit), ("Pa", "m^3/s"))
        self.assertAlmostEqual(abs(ports[0][1]), 2e5)
        # colours told apart: every pair of 20 at least 0.2 apart in RGB (the phasor plot's
        # earlier viridis ramp put neighbouring ports 0.05 apart)
        rgb = np.array([c[:3] for c in portColours(20)])
        gaps = [np.linalg.norm(a - b) for i, a in enumerate(rgb) for b in rgb[i + 1:]]
        self.assertGreater(min(gaps), 0.2)


class NothingToPlot(unittest.TestCase):
    def test_exit_1_when_no_plot_applies(self):
        tmp = tempfile.mkdtemp(prefix="coldtip-plots-none-")
        try:
            path = os.path.join(tmp, "empty.h5")
            with h5py.File(path, "w") as f:
                f.create_group("summary").attrs["case"] = "invented-empty"
                f["grid/components/name"] = np.array([b"drive"])
            proc = plot(path, os.path.join(tmp, "plots"))
            self.assertEqual(proc.returncode, 1, proc.stderr)
            self.assertIn("nothing to plot", proc.stderr)
            self.assertEqual(proc.stdout, "")
        finally:
            shutil.rmtree(tmp, ignore_errors=True)


class BadInput(unittest.TestCase):
    def setUp(self):
        self.tmp = tempfile.mkdtemp(prefix="coldtip-plots-bad-")
        self.out = os.path.join(self.tmp, "plots")

    def tearDown(self):
        shutil.rmtree(self.tmp, ignore_errors=True)

    def assertRefused(self, path, words):
        proc = plot(path, self.out)
        self.assertEqual(proc.returncode, 1, proc.stderr)
        self.assertIn(path, proc.stderr)
        self.assertIn(words, proc.stderr)
        self.assertEqual(proc.stdout, "")
        self.assertFalse(os.path.exists(self.out))

    def test_missing_file(self):
        self.assertRefused(os.path.join(self.tmp, "absent.h5"), "no such file")

    def test_not_hdf5(self):
        path = os.path.join(self.tmp, "text.h5")
        with open(path, "w") as f:
            f.write("not a result\n")
        self.assertRefused(path, "not a coldtip result")

    def test_hdf5_without_summary(self):
        path = os.path.join(self.tmp, "other.h5")
        with h5py.File(path, "w") as f:
            f["data"] = np.arange(3.0)
        self.assertRefused(path, "not a coldtip result")


class LoopIntegral(unittest.TestCase):
    def test_ellipse_with_harmonic(self):
        # p = p0 + pa cos(th) + p3 cos(3 th + a), V = V0 + Va cos(th + phi): closed form
        # oint p dV = -pi pa Va sin(phi) (the third harmonic does no work against a
        # sinusoidal volume: orthogonality of the Fourier basis); the trapezoidal rule is
        # exact for trigonometric polynomials of degree below the sample count
        # (Trefethen & Weideman, "The exponentially convergent trapezoidal rule",
        # SIAM Review 56(3), 2014). Odd and even sample counts.
        p0, pa, p3, v0, va, phi = 3.1e6, 1.2e5, 3e4, 3.2e-6, 1.7e-6, np.radians(40)
        for n in (24, 25):
            theta = 2 * np.pi * np.arange(n) / n
            got = loopIntegral(p0 + pa * np.cos(theta) + p3 * np.cos(3 * theta + 1.0),
                               v0 + va * np.cos(theta + phi))
            self.assertAlmostEqual(got / (-np.pi * pa * va * np.sin(phi)), 1.0, places=10)


if __name__ == "__main__":
    unittest.main()
