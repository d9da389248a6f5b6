#!/usr/bin/python3
"""Fuzz test of the command line's contract on mutated case files.

Each mutation starts from one of the example cases (cases/*.yaml) or the small test cases
(tests/data/**/*.yaml) and breaks it in one to three ways: a key dropped or duplicated, a
value retyped (number, word, list, map, null), a number scaled by a power of ten, a unit
swapped for one of another dimension, an offset unit or garbage, a list entry dropped,
duplicated or moved, or the YAML text itself broken (a colon deleted, an unbalanced bracket,
a tab, a truncated file, stray bytes). Every mutated file goes through `coldtip check` and
`coldtip run --max-cycles 2`; each must:

  - exit 0, 1 or 2 (3 is an interruption, never asked for here), not by a signal;
  - leave no sign of an uncaught exception or a sanitizer report on stderr;
  - on exit 1 leave nothing in the output folder (nor anywhere in its working folder), and
    `check` and `run` agree on whether the input is bad;
  - on any other exit leave at most the result file, and that an HDF5 file if stderr names it;
  - finish within 10 s of processor time (killed after it) and 4 GiB of memory.

In 4 % of the mutations `run` is given a result path that cannot be written (a missing
folder, a folder); the same rules hold.

Mutation i of seed S is made from its own generator, seeded with "S:i", so one failure is
replayed alone with --seed S --only i; every failure's file is also kept, with a note of
the mutation, under the keep folder.

Environment:
  COLDTIP_FUZZ_COUNT   mutations per shard; overrides --count (as ctest passes it)
and, each only a default that the option of the same name overrides:
  COLDTIP_EXE          the coldtip executable (--exe; default: <repo>/build/coldtip)
  COLDTIP_FUZZ_SEED    the seed (--seed; default: 16)
  COLDTIP_FUZZ_TIME_LIMIT  seconds of processor time allowed to one command (default: 10)
  COLDTIP_FUZZ_KEEP    folder for the failing files (--keep; default: ./fuzz-failures)

Run: /usr/bin/python3 tests/fuzz/fuzz_cases.py --shard 0 --count 500
"""

import argparse
import copy
import glob
import json
import math
import os
import random
import re
import resource
import shutil
import signal
import subprocess
import sys
import tempfile
import time

import yaml

REPO = os.path.abspath(os.path.join(os.path.dirname(__file__), "..", ".."))

EXIT_OK, EXIT_BAD_INPUT, EXIT_SOLVER = 0, 1, 2
ALLOWED_EXITS = (EXIT_OK, EXIT_BAD_INPUT, EXIT_SOLVER)
# Signs on stderr of a process that did not end through its own error handling.
CRASH_SIGNS = ("terminate called", "uncaught", "Aborted", "core dumped", "Segmentation fault",
               "Sanitizer", "runtime error:", "std::bad_alloc", "what():")

# Units a value may be given in instead of its own: other dimensions, offset and
# logarithmic units, prefixes at the edge of the range, and garbage.
UNITS = ["K", "mK", "degC", "degF", "celsius", "Pa", "MPa", "bar", "psi", "atm", "m", "mm",
         "um", "nm", "km", "in", "ft", "Hz", "kHz", "rpm", "s", "ms", "min", "kg", "g", "W",
         "mW", "W/K", "W/m/K", "m^2", "mm^2", "cm^3", "L", "J", "kJ/kg", "in^-1", "m^-1",
         "K^2", "1/K", "m/s", "rad", "degree", "percent", "%", "dB", "lumen", "mole",
         "kg/s", "Pa.s", "", "K K", "m^", "^3", "mm mm mm", "furlong", "1e3", "K)", "(",
         "µm", "Å", "\u00b0C", "\\x00", "m**2", "per", "YAML"]
# Replacement values of another type than the one they replace.
WORDS = ["fast", "", "yes", "no", "true", "null", "~", "nan", "inf", "-inf", ".nan", "1e999",
         "-0", "0", "0x10", "1_000", "3.1.4", "helium", "stainless-304", "copper", "piston",
         "regenerator", "cold-end.outlet", "a" * 300, "\u00e9t\u00e9", "[", "}", "*alias",
         "&anchor", "!!binary aGk=", "'quoted'", "12 34 m", "--", "#"]

NUMBER = re.compile(r"^\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)(.*)$", re.S)
PLAIN = re.compile(r"^[A-Za-z0-9_.+\-/^()\u00b5\u00c5\u00b0\u00e9 ]*[A-Za-z0-9_.)%]$")
YAML_WORDS = {"true", "false", "yes", "no", "on", "off", "null", "~", "y", "n"}


# -------------------------------------------------------------------------------------------
# The case as a tree: a map is a list of [key, value] pairs (so that a key may be duplicated
# and the order is kept), a sequence a Seq, a scalar its text as written.

class Seq(list):
    pass


class PairLoader(yaml.BaseLoader):
    pass


def _constructPairs(loader, node):
    return [[loader.construct_object(k, deep=True), loader.construct_object(v, deep=True)]
            for k, v in node.value]


def _constructSeq(loader, node):
    return Seq(loader.construct_object(v, deep=True) for v in node.value)


PairLoader.add_constructor("tag:yaml.org,2002:map", _constructPairs)
PairLoader.add_constructor("tag:yaml.org,2002:seq", _constructSeq)


def isMap(node):
    return isinstance(node, list) and not isinstance(node, Seq)


def scalarText(s):
    if s is None:
        return "~"
    if PLAIN.match(s) and s.lower() not in YAML_WORDS and not s.startswith(("-", " ")):
        return s
    return json.dumps(s)


def emit(node, indent=0, flow=False):
    """Block style at the top, flow style for small maps and lists (as the cases are)."""
    pad = " " * indent
    if isinstance(node, Seq):
        if flow or not node:
            return "[" + ", ".join(emit(v, flow=True) for v in node) + "]"
        return "".join("\n" + pad + "- " + emit(v, indent + 2, flow=not isMap(v) or
                                                 len(v) <= 4).lstrip() for v in node)
    if isMap(node):
        if flow or not node:
            return "{" + ", ".join(f"{scalarText(str(k))}: {emit(v, flow=True)}"
                                   for k, v in node) + "}"
        lines = []
        for k, v in node:
            small = not (isMap(v) or isinstance(v, Seq)) or len(v) <= 3
            text = emit(v, indent + 2, flow=small)
            sep = "" if text.startswith("\n") else " "
            lines.append(f"{pad}{scalarText(str(k))}:{sep}{text}")
        return ("\n" if indent else "") + "\n".join(lines)
    return scalarText(node)


def nodes(tree):
    """Every (container, index) under tree: the slots a mutation may change."""
    out = []

    def walk(node):
        if isMap(node):
            for i, (_, v) in enumerate(node):
                out.append((node, i))
                walk(v)
        elif isinstance(node, Seq):
            for i, v in enumerate(node):
                out.append((node, i))
                walk(v)
    walk(tree)
    return out


def valueAt(container, i):
    return container[i][1] if isMap(container) else container[i]


def setValue(container, i, value):
    if isMap(container):
        container[i][1] = value
    else:
        container[i] = value


def label(container, i):
    return f"key '{container[i][0]}'" if isMap(container) else f"list entry {i}"


# -------------------------------------------------------------------------------------------
# Mutations of the tree; each returns a one-line description, or None where it does not apply.

def dropKey(rng, tree):
    slots = [s for s in nodes(tree) if isMap(s[0])]
    if not slots:
        return None
    c, i = rng.choice(slots)
    what = label(c, i)
    del c[i]
    return f"dropped {what}"


def duplicateKey(rng, tree):
    slots = [s for s in nodes(tree) if isMap(s[0])]
    if not slots:
        return None
    c, i = rng.choice(slots)
    k, v = c[i]
    c.insert(rng.randint(0, len(c)), [k, copy.deepcopy(v)])
    return f"duplicated key '{k}'"


def retype(rng, tree):
    slots = nodes(tree)
    if not slots:
        return None
    c, i = rng.choice(slots)
    old = valueAt(c, i)
    choice = rng.randrange(6)
    if choice == 0:
        new = rng.choice(WORDS)
    elif choice == 1:
        new = repr(rng.uniform(-10, 10) * 10.0 ** rng.randint(-5, 5))
    elif choice == 2:
        new = Seq([str(rng.randint(0, 9)), "2 mm"][:rng.randint(0, 2)])
    elif choice == 3:
        new = [["value", str(rng.randint(0, 99))], ["unit", "mm"]][:rng.randint(0, 2)]
    elif choice == 4:
        new = None
    else:  # the same value one level down
        new = Seq([old]) if rng.random() < 0.5 else [["value", old]]
    setValue(c, i, new)
    shown = "null" if new is None else emit(new, flow=True)
    return f"retyped {label(c, i)} to {shown[:60]}"


def numericSlots(tree):
    return [s for s in nodes(tree)
            if isinstance(valueAt(*s), str) and NUMBER.match(valueAt(*s))]


def scaleNumber(rng, tree):
    slots = numericSlots(tree)
    if not slots:
        return None
    c, i = rng.choice(slots)
    number, rest = NUMBER.match(valueAt(c, i)).groups()
    r = rng.random()
    if r < 0.8:
        k = rng.randint(-30, 30)
        if number.isdigit() and k >= 0:  # an integer stays one: cells: 80 -> 8000000
            value = str(int(number) * 10 ** k)
        else:
            value = f"{float(number) * 10.0 ** k:.6g}"
        how = f"scaled by 1e{k}"
    elif r < 0.9:
        value = f"{-float(number):.6g}"
        how = "negated"
    else:
        value = rng.choice(["0", "1e308", "1e-308", "4.9e-324", "nan", "inf", "2147483648",
                            "9223372036854775808", "-1"])
        how = f"set to {value}"
    setValue(c, i, value + rest)
    return f"{how} {label(c, i)} ({valueAt(c, i)[:40]})"


def swapUnit(rng, tree):
    slots = [s for s in numericSlots(tree) if NUMBER.match(valueAt(*s)).group(2).strip()]
    if not slots:
        slots = numericSlots(tree)
    if not slots:
        return None
    c, i = rng.choice(slots)
    number, rest = NUMBER.match(valueAt(c, i)).groups()
    unit = rng.choice(UNITS)
    setValue(c, i, f"{number} {unit}".rstrip())
    return f"unit of {label(c, i)} '{rest.strip()}' -> '{unit}'"


def editList(rng, tree):
    slots = [s for s in nodes(tree) if isinstance(valueAt(*s), Seq) and valueAt(*s)]
    if not slots:
        return None
    c, i = rng.choice(slots)
    seq = valueAt(c, i)
    j = rng.randrange(len(seq))
    r = rng.randrange(3)
    if r == 0:
        del seq[j]
        return f"dropped entry {j} of {label(c, i)}"
    if r == 1:
        seq.insert(j, copy.deepcopy(seq[j]))
        return f"duplicated entry {j} of {label(c, i)}"
    k = rng.randrange(len(seq))
    seq[j], seq[k] = seq[k], seq[j]
    return f"swapped entries {j} and {k} of {label(c, i)}"


TREE_MUTATIONS = [dropKey, duplicateKey, retype, scaleNumber, scaleNumber, swapUnit, swapUnit,
                  editList]


# -------------------------------------------------------------------------------------------
# Mutations of the text: the YAML structure broken.

def breakText(rng, text):
    lines = text.split("\n")
    n = rng.randrange(max(len(lines), 1))
    r = rng.randrange(9)
    if r == 0 and ":" in text:
        at = rng.choice([m.start() for m in re.finditer(":", text)])
        return text[:at] + text[at + 1:], f"deleted the colon at offset {at}"
    if r == 1:
        at = rng.randrange(len(text) + 1)
        b = rng.choice("[]{}")
        return text[:at] + b + text[at:], f"inserted '{b}' at offset {at}"
    if r == 2 and lines:
        lines[n] = "\t" + lines[n].lstrip(" ")
        return "\n".join(lines), f"tab indentation on line {n + 1}"
    if r == 3:
        at = rng.randrange(len(text) + 1)
        return text[:at], f"truncated at offset {at}"
    if r == 4 and lines:
        lines.insert(n, lines[n])
        return "\n".join(lines), f"duplicated line {n + 1}"
    if r == 5 and lines:
        del lines[n]
        return "\n".join(lines), f"deleted line {n + 1}"
    if r == 6 and lines:
        shift = rng.choice([-2, -1, 1, 2, 4])
        lines[n] = " " * max(0, shift) + lines[n][max(0, -shift):]
        return "\n".join(lines), f"indentation of line {n + 1} moved by {shift}"
    if r == 7:
        at = rng.randrange(len(text) + 1)
        junk = rng.choice(["\x00", "\xff", "&a ", "*a", "!!str ", "---\n", "...\n", "? ",
                           "%YAML 1.2\n", "<<: *a\n", "\ufeff", "- ", ": ", "'", '"', "|\n"])
        return text[:at] + junk + text[at:], f"inserted {junk!r} at offset {at}"
    if len(lines) > 1:
        k = rng.randrange(len(lines))
        lines[n], lines[k] = lines[k], lines[n]
        return "\n".join(lines), f"swapped lines {n + 1} and {k + 1}"
    return text + "\n:", "appended ':'"


def mutate(rng, source):
    """The mutated text of `source` and the list of what was done to it."""
    steps = []
    text = source
    tree = None
    if rng.random() < 0.85:
        try:
            tree = yaml.load(source, Loader=PairLoader)
        except yaml.YAMLError:
            tree = None
    if tree is not None and (isMap(tree) or isinstance(tree, Seq)):
        for _ in range(rng.choice([1, 1, 1, 2, 3])):
            step = rng.choice(TREE_MUTATIONS)(rng, tree)
            if step:
                steps.append(step)
        text = emit(tree) + "\n"
        if rng.random() < 0.1:
            text, step = breakText(rng, text)
            steps.append(step)
    else:
        for _ in range(rng.choice([1, 1, 2])):
            text, step = breakText(rng, text)
            steps.append(step)
    return text, steps


# -------------------------------------------------------------------------------------------
# Running one mutation.

def baseCases():
    files = sorted(glob.glob(os.path.join(REPO, "cases", "*.yaml")))
    files += sorted(glob.glob(os.path.join(REPO, "tests", "data", "**", "*.yaml"),
                              recursive=True))
    return files


class Limits:
    """What one command may use: `seconds` of processor time, enforced by the kernel so that
    the verdict does not depend on how busy the machine is (a command waiting on nothing is
    killed after WALL_FACTOR times as long on the clock), and `memory_mb` of memory: as
    address space, or under AddressSanitizer (`sanitized`), whose shadow memory needs
    terabytes of address space, as its own hard_rss_limit_mb."""
    WALL_FACTOR = 12

    def __init__(self, seconds, memory_mb, sanitized):
        self.seconds, self.memory_mb, self.sanitized = seconds, memory_mb, sanitized
        self.env = dict(os.environ)
        if sanitized:
            extra = f"hard_rss_limit_mb={memory_mb}"
            old = self.env.get("ASAN_OPTIONS")
            self.env["ASAN_OPTIONS"] = f"{old}:{extra}" if old else extra

    def apply(self):
        cpu = int(math.ceil(self.seconds))
        resource.setrlimit(resource.RLIMIT_CPU, (cpu, cpu + 1))
        if not self.sanitized:
            size = self.memory_mb << 20
            resource.setrlimit(resource.RLIMIT_AS, (size, size))


def runCommand(argv, cwd, limits):
    """(exit code, -signal, or None when killed on the clock; stderr; processor seconds)."""
    before = resource.getrusage(resource.RUSAGE_CHILDREN)
    code = None
    try:
        p = subprocess.run(argv, cwd=cwd, stdin=subprocess.DEVNULL, stdout=subprocess.DEVNULL,
                           stderr=subprocess.PIPE, preexec_fn=limits.apply,
                           env=limits.env,
                           timeout=limits.seconds * Limits.WALL_FACTOR)
        code, err = p.returncode, p.stderr
    except subprocess.TimeoutExpired as e:
        err = e.stderr or b""
    after = resource.getrusage(resource.RUSAGE_CHILDREN)
    cpu = (after.ru_utime - before.ru_utime) + (after.ru_stime - before.ru_stime)
    return code, err.decode("utf-8", "replace"), cpu


def judge(name, code, err, cpu, limits):
    """The contract's breaches by one command, as (class, detail) pairs."""
    if code is None:
        return [("timeout", f"{name} still running after {limits.seconds * Limits.WALL_FACTOR:g}"
                            f" s on the clock ({cpu:.1f} s of processor time; killed)")]
    if code == -signal.SIGXCPU or (code == -signal.SIGKILL and cpu >= limits.seconds):
        return [("timeout", f"{name} used its {limits.seconds:g} s of processor time (killed)")]
    problems = []
    if code < 0:
        problems.append(("signal", f"{name} killed by signal {-code}"))
    elif code not in ALLOWED_EXITS:
        problems.append(("exit code", f"{name} exited {code}"))
    for sign in CRASH_SIGNS:
        if sign in err:
            problems.append((f"'{sign}' on stderr", f"{name} stderr has '{sign}': "
                             f"{err.strip()[-300:]}"))
            break
    if code != EXIT_OK and code is not None and code > 0 and not err.strip():
        problems.append(("silent failure", f"{name} exited {code} with nothing on stderr"))
    return problems


def isHdf5(path):
    """The file starts with the HDF5 signature (the format's superblock at offset 0)."""
    try:
        with open(path, "rb") as f:
            return f.read(8) == b"\x89HDF\r\n\x1a\n"
    except OSError:
        return False


def leftovers(folder, allowed):
    found = []
    for root, _, files in os.walk(folder):
        for f in files:
            rel = os.path.relpath(os.path.join(root, f), folder)
            if rel not in allowed:
                found.append(rel)
    return sorted(found)


# The result file `run` is given: nearly always a new file in an empty folder; sometimes a
# path that cannot be written (a folder that does not exist, a folder itself).
RESULT = "out/result.h5"
BAD_RESULTS = ["out/missing/result.h5", "out"]


def runMutation(exe, text, work, limits, result=RESULT):
    """Runs check and run on `text` in a fresh folder; returns (problems, exits, the larger
    processor time of the two)."""
    shutil.rmtree(work, ignore_errors=True)
    os.makedirs(os.path.join(work, "out"))
    case = os.path.join(work, "case.yaml")
    with open(case, "w", encoding="utf-8", errors="surrogateescape") as f:
        f.write(text)
    problems = []
    check, err, check_cpu = runCommand([exe, "check", "case.yaml"], work, limits)
    problems += judge("check", check, err, check_cpu, limits)
    left = leftovers(work, {"case.yaml"})
    if left:
        problems.append(("files left", f"check left {', '.join(left)}"))
    run, err, run_cpu = runCommand([exe, "run", "case.yaml", "-o", result,
                              "--max-cycles", "2", "--quiet"], work, limits)
    problems += judge("run", run, err, run_cpu, limits)
    if run == EXIT_BAD_INPUT:
        left = leftovers(work, {"case.yaml"})
        if left:
            problems.append(("files left on exit 1", f"run exited 1 and left {', '.join(left)}"))
        if "case.yaml" not in err and result == RESULT:
            problems.append(("unplaced error", "run exited 1 without naming the case file"))
    elif run is not None and run >= 0:  # a killed run may leave what a kill leaves
        left = leftovers(work, {"case.yaml", RESULT})
        if left:
            problems.append(("files left", f"run exited {run} and left {', '.join(left)}"))
        if result == RESULT and RESULT in err and not isHdf5(os.path.join(work, RESULT)):
            problems.append(("promised file missing",
                             f"run exited {run}, named {RESULT}, and it is not an HDF5 file"))
    if check in ALLOWED_EXITS and run in ALLOWED_EXITS and result == RESULT and \
            (check == EXIT_BAD_INPUT) != (run == EXIT_BAD_INPUT):
        problems.append(("check and run disagree", f"check exited {check}, run exited {run}"))
    return problems, (check, run), (check_cpu, run_cpu)


def main():
    env = os.environ.get
    ap = argparse.ArgumentParser(description=__doc__.split("\n")[0])
    ap.add_argument("--exe", default=env("COLDTIP_EXE", os.path.join(REPO, "build", "coldtip")))
    ap.add_argument("--seed", type=int, default=int(env("COLDTIP_FUZZ_SEED", "16")))
    ap.add_argument("--shard", type=int, default=0)
    ap.add_argument("--count", type=int, default=500, help="mutations per shard")
    ap.add_argument("--time-limit", type=float,
                    default=float(env("COLDTIP_FUZZ_TIME_LIMIT", "10")))
    ap.add_argument("--memory-limit", type=int, default=4096, help="MiB per command")
    ap.add_argument("--sanitized", action="store_true",
                    help="coldtip is built with AddressSanitizer: limit memory through it")
    ap.add_argument("--keep", default=env("COLDTIP_FUZZ_KEEP", "fuzz-failures"))
    ap.add_argument("--only", type=int, action="append", help="replay this mutation index")
    ap.add_argument("--print", action="store_true", help="print each mutation's text")
    args = ap.parse_args()
    args.exe = os.path.abspath(args.exe)  # the commands run in their own folder
    if not os.access(args.exe, os.X_OK):
        sys.exit(f"no coldtip executable at {args.exe} (set COLDTIP_EXE or --exe)")
    count = int(env("COLDTIP_FUZZ_COUNT", args.count))
    if args.only:
        indices = args.only
    else:
        indices = range(args.shard * count, (args.shard + 1) * count)
    cases = baseCases()
    sources = {}
    for c in cases:
        with open(c, encoding="utf-8") as f:
            sources[c] = f.read()
    which = ", ".join(map(str, indices)) if args.only else f"{indices[0]}..{indices[-1]}"
    print(f"coldtip fuzz: seed {args.seed} (COLDTIP_FUZZ_SEED), mutations {which} of "
          f"{len(cases)} base cases, limit {args.time_limit:g} s of processor time and "
          f"{args.memory_limit} MiB per command; replay one with: {sys.argv[0]} "
          f"--seed {args.seed} --only INDEX", flush=True)

    limits = Limits(args.time_limit, args.memory_limit, args.sanitized)
    failures = {}
    exits = {}
    slowest = []
    processor = 0.0
    t0 = time.monotonic()
    with tempfile.TemporaryDirectory(prefix="coldtip-fuzz-") as tmp:
        for index in indices:
            rng = random.Random(f"{args.seed}:{index}")
            base = rng.choice(cases)
            text, steps = mutate(rng, sources[base])
            result = RESULT if rng.random() < 0.96 else rng.choice(BAD_RESULTS)
            if result != RESULT:
                steps.append(f"run -o {result}")
            what = f"{os.path.relpath(base, REPO)}: {'; '.join(steps)}"
            if args.print:
                print(f"--- mutation {index}: {what}\n{text}")
            problems, codes, cpu = runMutation(args.exe, text, os.path.join(tmp, "w"), limits,
                                               result)
            exits[codes] = exits.get(codes, 0) + 1
            processor += sum(cpu)
            slowest = sorted(slowest + [(max(cpu), index, what)], reverse=True)[:5]
            if args.only:
                print(f"mutation {index}: check {codes[0]}, run {codes[1]}: {what}")
            if not problems:
                continue
            keep = os.path.join(args.keep, f"seed{args.seed}-mutation{index}.yaml")
            os.makedirs(args.keep, exist_ok=True)
            with open(keep, "w", encoding="utf-8", errors="surrogateescape") as f:
                f.write(text)
            with open(keep + ".txt", "w", encoding="utf-8") as f:
                f.write(f"seed {args.seed} mutation {index}\n{what}\n" +
                        "".join(f"{k}: {d}\n" for k, d in problems))
            for kind, detail in problems:
                failures.setdefault(kind, []).append(index)
                print(f"FAIL seed {args.seed} mutation {index} [{kind}] {detail}\n"
                      f"     {what}\n     kept in {keep}", flush=True)
    seconds = time.monotonic() - t0
    n = len(indices)
    print(f"{n} mutations in {seconds:.1f} s ({n / seconds:.2f} cases/s), {processor:.1f} s of "
          f"processor time in coldtip ({n / max(processor, 1e-9):.2f} cases per processor "
          f"second); (check, run) exits: " +
          ", ".join(f"{k}: {v}" for k, v in sorted(exits.items(), key=str)))
    for cpu, index, what in slowest:
        print(f"slow: mutation {index}, {cpu:.2f} s of processor time: {what}")
    for kind, which in sorted(failures.items()):
        print(f"class '{kind}': {len(which)} mutation(s), e.g. {which[:8]}")
    return 1 if failures else 0


if __name__ == "__main__":
    sys.exit(main())
