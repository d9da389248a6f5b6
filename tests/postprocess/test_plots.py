#!/usr/bin/python3
"""Tests of postprocess/coldtip_plot.py on a result file made by the real program.

Environment:
  COLDTIP_EXE    the coldtip executable (default: <repo>/build/coldtip)
  COLDTIP_CASES  the folder of example cases, or one case file
                 (default: <repo>/cases/ge-spectrometer-85K.yaml)

Run: /usr/bin/python3 tests/postprocess/test_plots.py -v
(standard-library unittest; pytest is not installed for /usr/bin/python3).
"""

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

from coldtip_plot import loopIntegral  # noqa: E402
from coldtip_result import Result  # noqa: E402

WIDTH, HEIGHT = 1600, 1000      # the stated image size: 8 x 5 in at 200 dpi
ALWAYS = ["pv_loop.png", "cycle_cold_end.png", "cycle_inertance_inlet.png",
          "temperature_profile.png", "energy_flow.png", "history.png"]
# only when /linear/components and /cooldown exist
LATER = ["phasors.png", "cooldown.png"]


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
        for name in LATER:
            self.assertFalse(os.path.exists(os.path.join(self.out, name)))
            self.assertNotIn(name, self.proc.stderr)

    def test_default_output_next_to_result(self):
        proc = subprocess.run([sys.executable, SCRIPT, self.result], capture_output=True,
                              text=True, timeout=300)
        self.assertEqual(proc.returncode, 0, proc.stderr)
        self.assertTrue(os.path.isfile(os.path.join(self.tmp, "history.png")))

    def test_pv_work_matches_exact_cycle_integral(self):
        # The loop integral of the 96 sampled (p, V) against the solver's own PV power in
        # /summary, integrated exactly alongside the state (DESIGN.md section 3). The
        # drive volume is a pure sinusoid, so the spectral loop integral is exact for the
        # samples; what is left is the integrator's error (relative tolerance 1e-6 in the
        # case), far below 0.1 %.
        with Result(self.result) as r:
            p = r.data("cycle/pressure")[0][:, 0]
            v = r.data("cycle/drive_volume")[0]
            power = -loopIntegral(p, v) * r.frequency()
            self.assertAlmostEqual(power / r.summary("pv_power_W"), 1.0, delta=1e-3)

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
            boundaries = [f"{c}.{e}".encode() for c in ("regenerator", "cold-end")
                          for e in ("inlet", "outlet")]
            lin = f.create_group("linear/components")
            lin["name"] = np.array(boundaries)
            s = np.linspace(0.0, 1.0, len(boundaries))
            for name, values, unit in (
                    ("pressure_amplitude", 2e5 * (1 - 0.3 * s), "Pa"),
                    ("pressure_phase", -15 * s, "deg"),
                    ("volume_flow_amplitude", 8e-5 * (1 - 0.7 * s), "m^3/s"),
                    ("volume_flow_phase", 50 - 80 * s, "deg")):
                lin[name] = values
                lin[name].attrs["units"] = unit
            cool = f.create_group("cooldown")
            t = np.linspace(0.0, 3600.0, 200)
            for name, values, unit in (
                    ("time", t, "s"),
                    ("cold_temperature", 80 + 220 * np.exp(-t / 900), "K"),
                    ("report_temperature", np.array([150.0, 90.0]), "K")):
                cool[name] = values
                cool[name].attrs["units"] = unit

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
            self.assertIn(f"{name} skipped", proc.stderr)


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
