#!/usr/bin/env python3
"""Timing reference for the sweep benchmark, in Python 3 with numpy.

This is a timing reference, not a second implementation of the criteria: it does roughly the
work of `modalgate check model.json --json out.json` on the sweep file (read the JSON model and
hash it, eigen-analysis of every condition, modal figures, the boundary checks for one aircraft
class, write a JSON file) the way a careful hand script would, with numpy doing the eigen work
batched over a stacked (N, 8, 8) array. Its numbers are not meant to agree with modalgate's
findings digit for digit, and modalgate never reads its output.

By default it writes every field the results contract (modalgate-results/1) names: per condition id,
phase, category, required level and warnings; per mode the eigenvalues, natural frequency,
damping ratio, time constant, times to half and double, period and a basis text; per finding
the criterion, mode, quantity, value, level, verdict, margin, bounds, source and reason. It
does not write what modalgate adds beyond the contract (mode shapes, titles, the n/alpha
method, criteria not applicable, cycles to half), so modalgate still writes more than it.

    python3 bench/reference/modal_reference.py [--lean] model.json out.json

--lean writes only the figures and verdicts (no basis texts, criterion ids, bounds, sources,
reasons, categories, warnings or input hash), as this reference did at first; the bench times
it too, for information, beside the full one the target is set against.

Only state-space conditions with the eight states u, w, q, theta, v, p, r, phi (any order) are
analysed; any other condition is listed as skipped. The file's `units` (SI or US) and its
top-level `gravity`, if any, are read as written: the eigenvalues, participation factors and
modal figures do not depend on the unit of length, and n/alpha = -V Z_w / g takes V and g in
the file's units. The aircraft class is read as written too: the boundaries held here are those
of Classes II-L and III (MIL-F-8785C, Categories B and C), and any other class stops the run.
"""
import hashlib
import json
import math
import sys

import numpy as np

STATES = ["u", "w", "q", "theta", "v", "p", "r", "phi"]
LONGITUDINAL = np.array([1, 1, 1, 1, 0, 0, 0, 0], dtype=bool)
GRAVITY = {"SI": 9.80665, "US": 32.174}  # standard gravity [m/s^2], [ft/s^2]
CLASSES = ("II-L", "III")  # the classes whose boundaries BOUNDS holds
LN2 = math.log(2.0)

# Category by phase code (MIL-F-8785C 1.5; only the codes the sweep uses).
CATEGORY = {"CR": "B", "CL": "B", "PA": "C"}

# Boundaries for Classes II-L and III by category: per level (min, max), None = no bound.
# Sources: MIL-F-8785C 3.2.2.1.2 (short-period damping, from memory), 3.2.2.1.1 (CAP, from
# memory), 3.2.1.2 (phugoid, from memory), 3.3.1.1 (Dutch roll), 3.3.1.2 (roll-mode time
# constant), 3.3.1.3 (spiral time to double). The short-period frequency minimum is the
# Category C one for Classes II-L and III.
BOUNDS = {
    ("short_period", "damping_ratio"): {
        "B": [(0.30, 2.00), (0.20, 2.00), (0.15, None)],
        "C": [(0.35, 1.30), (0.25, 2.00), (0.15, None)],
    },
    ("short_period", "cap"): {
        "B": [(0.085, 3.6), (0.038, 10.0), (None, None)],
        "C": [(0.16, 3.6), (0.096, 10.0), (None, None)],
    },
    ("short_period", "natural_frequency"): {  # Category C only, Classes II-L and III
        "C": [(0.7, None), (0.4, None), (None, None)],
    },
    ("phugoid", "damping_ratio"): {
        "B": [(0.04, None), (0.0, None), (None, None)],
        "C": [(0.04, None), (0.0, None), (None, None)],
    },
    ("phugoid", "time_to_double"): {  # stated for Level 3; a damped phugoid meets it
        "B": [(55.0, None), (55.0, None), (55.0, None)],
        "C": [(55.0, None), (55.0, None), (55.0, None)],
    },
    ("dutch_roll", "damping_ratio"): {
        "B": [(0.08, None), (0.02, None), (0.0, None)],
        "C": [(0.08, None), (0.02, None), (0.0, None)],
    },
    ("dutch_roll", "damping_frequency_product"): {  # Category C: the Classes II-L and III row
        "B": [(0.15, None), (0.05, None), (0.0, None)],
        "C": [(0.10, None), (0.05, None), (0.0, None)],
    },
    ("dutch_roll", "natural_frequency"): {
        "B": [(0.4, None), (0.4, None), (0.4, None)],
        "C": [(0.4, None), (0.4, None), (0.4, None)],
    },
    ("roll", "time_constant"): {
        "B": [(None, 1.4), (None, 3.0), (None, 10.0)],
        "C": [(None, 1.4), (None, 3.0), (None, 10.0)],
    },
    ("spiral", "time_to_double"): {
        "B": [(20.0, None), (12.0, None), (4.0, None)],
        "C": [(20.0, None), (12.0, None), (4.0, None)],
    },
}
MARGINAL = 0.10  # fraction of the boundary (modalgate's default band)

# Criterion id (the {cat} part is the category, lower case) and paragraph, by (mode, quantity).
CRITERIA = {
    ("short_period", "damping_ratio"): ("short-period-damping-cat-{cat}", "MIL-F-8785C 3.2.2.1.2"),
    ("short_period", "cap"): ("short-period-cap-cat-{cat}", "MIL-F-8785C 3.2.2.1.1"),
    ("short_period", "natural_frequency"): ("short-period-frequency-cat-{cat}-heavy", "MIL-F-8785C 3.2.2.1.1"),
    ("phugoid", "damping_ratio"): ("phugoid-damping", "MIL-F-8785C 3.2.1.2"),
    ("phugoid", "time_to_double"): ("phugoid-time-to-double", "MIL-F-8785C 3.2.1.2"),
    ("dutch_roll", "damping_ratio"): ("dutch-roll-damping-cat-{cat}", "MIL-F-8785C 3.3.1.1"),
    ("dutch_roll", "damping_frequency_product"): ("dutch-roll-damping-frequency-cat-{cat}", "MIL-F-8785C 3.3.1.1"),
    ("dutch_roll", "natural_frequency"): ("dutch-roll-frequency-cat-{cat}", "MIL-F-8785C 3.3.1.1"),
    ("roll", "time_constant"): ("roll-time-constant-cat-{cat}", "MIL-F-8785C 3.3.1.2"),
    ("spiral", "time_to_double"): ("spiral-time-to-double", "MIL-F-8785C 3.3.1.3"),
}


def bounds_json(levels):
    """{"1": {"min": .., "max": ..}, ...}, as the results contract writes bounds."""
    out = {}
    for i, (lo, hi) in enumerate(levels):
        b = {}
        if lo is not None:
            b["min"] = lo
        if hi is not None:
            b["max"] = hi
        out[str(i + 1)] = b
    return out


# Worked out once: criterion id, bounds as written, source, by (mode, quantity, category).
CRITERION_TEXT = {
    (kind, quantity, category): (criterion.format(cat=category.lower()), bounds_json(levels), source)
    for (kind, quantity), (criterion, source) in CRITERIA.items()
    for category, levels in BOUNDS[(kind, quantity)].items()
}


def load(path):
    with open(path, "rb") as f:
        raw = f.read()
    sha256 = hashlib.sha256(raw).hexdigest()
    model = json.loads(raw)
    units = model.get("units")
    if units not in GRAVITY:
        raise SystemExit(f"{path}: units must be SI or US, found {units!r}")
    aircraft_class = model.get("aircraft", {}).get("class")
    if aircraft_class not in CLASSES:
        raise SystemExit(f"{path}: aircraft class {aircraft_class!r}: this reference holds the boundaries of classes {', '.join(CLASSES)} only")
    rows, kept, skipped = [], [], []
    for c in model["conditions"]:
        ss = c.get("stateSpace")
        if not ss or sorted(ss["states"]) != sorted(STATES):
            skipped.append(c["id"])
            continue
        order = [ss["states"].index(s) for s in STATES]
        a = np.asarray(ss["A"], dtype=float)[np.ix_(order, order)]
        rows.append(a)
        kept.append(c)
    return model, sha256, np.stack(rows) if rows else np.zeros((0, 8, 8)), kept, skipped


def analyse(a):
    """Batched eigen-analysis; participation p_ij = |w_ji v_ij| (left x right eigenvectors)."""
    values, right = np.linalg.eig(a)
    left = np.linalg.inv(right)
    participation = np.abs(np.transpose(left, (0, 2, 1)) * right)  # (N, state, mode)
    participation /= participation.sum(axis=1, keepdims=True)
    long_share = participation[:, LONGITUDINAL, :].sum(axis=1)  # (N, mode)
    return values, participation, long_share


def figures(lam):
    re, im = lam.real, abs(lam.imag)
    wn = abs(lam)
    out = {
        "eigenvalues": [{"re": re, "im": im}, {"re": re, "im": -im}] if im > 0 else [{"re": re, "im": 0.0}],
        "naturalFrequency": wn,
        "dampingRatio": (-re / wn) if wn > 0 and im > 0 else None,
        "timeConstant": (-1.0 / re) if im == 0 and re != 0 else None,
        "timeToHalf": (LN2 / -re) if re < 0 else None,
        "timeToDouble": (LN2 / re) if re > 0 else None,
        "period": (2.0 * math.pi / im) if im > 0 else None,
    }
    if im == 0:
        out["naturalFrequency"] = None
    return out


def basis(lam, share, column):
    """Why the mode got its name, in words: the root, the block's share, the two largest states."""
    top = sorted(range(len(STATES)), key=lambda i: -column[i])[:2]
    dominant = ", ".join(f"{STATES[i]} {100 * column[i]:.0f} %" for i in top)
    block = "longitudinal" if share > 0.5 else "lateral-directional"
    held = share if share > 0.5 else 1 - share
    if abs(lam.imag) > 1e-9:
        root = f"oscillatory pair {lam.real:.3g} +/- {abs(lam.imag):.3g}i ({abs(lam):.3g} rad/s)"
    else:
        root = f"real root {lam.real:.3g}"
    return f"{root}; {100 * held:.0f} % {block} participation; dominant {dominant}"


def identify(values, long_share):
    """Name the modes of one condition: by block (participation), then by frequency.
    Returns (kind, eigenvalue, index of the mode's column)."""
    modes = []
    tol = 1e-9
    for block, is_long in (("long", True), ("lat", False)):
        sel = [(lam, j) for j, (lam, s) in enumerate(zip(values, long_share)) if (s > 0.5) == is_long]
        pairs = sorted([(lam, j) for lam, j in sel if lam.imag > tol], key=lambda x: abs(x[0]))
        reals = sorted([(lam, j) for lam, j in sel if abs(lam.imag) <= tol], key=lambda x: abs(x[0]))
        if is_long:
            if len(pairs) == 2:
                modes.append(("phugoid", *pairs[0]))
                modes.append(("short_period", *pairs[1]))
            else:
                modes.extend(("other", lam, j) for lam, j in pairs + reals)
        else:
            if pairs:
                modes.append(("dutch_roll", *pairs[-1]))
                modes.extend(("other", lam, j) for lam, j in pairs[:-1])
            if len(reals) >= 2:
                modes.append(("spiral", *reals[0]))
                modes.append(("roll", *reals[-1]))
                modes.extend(("other", lam, j) for lam, j in reals[1:-1])
            else:
                modes.extend(("other", lam, j) for lam, j in reals)
    return modes


def level_of(value, levels):
    for i, (lo, hi) in enumerate(levels):
        if (lo is None or value >= lo) and (hi is None or value <= hi):
            return i + 1
    return None


def judge(value, levels, required):
    """(level reached, verdict against the required level, margin to its nearer bound)."""
    level = level_of(value, levels)
    lo, hi = levels[required - 1]
    margins = [m for m in ((value - lo) if lo is not None else None, (hi - value) if hi is not None else None) if m is not None]
    margin = min(margins) if margins else None
    if level is None or level > required:
        return level, "fail", margin
    edge = lo if lo is not None and (hi is None or value - lo <= hi - value) else hi
    band = MARGINAL * abs(edge) if edge not in (None, 0) else 0.01
    return level, ("marginal" if margin is not None and margin < band else "pass"), margin


def check(kind, quantity, value, category, required=1):
    if LEAN:
        return check_lean(kind, quantity, value, category, required)
    levels = BOUNDS[(kind, quantity)][category]
    criterion, bounds, source = CRITERION_TEXT[(kind, quantity, category)]
    common = {"criterion": criterion, "mode": kind, "quantity": quantity, "value": value}
    tail = {"bounds": bounds, "source": source}
    if value is None:
        return {**common, "level": None, "verdict": "not_evaluated", "margin": None, **tail,
                "reason": f"the {kind.replace('_', ' ')} has no {quantity.replace('_', ' ')}"}
    level, verdict, margin = judge(value, levels, required)
    reached = f"Level {level} reached" if level is not None else "no level reached"
    return {**common, "level": level, "verdict": verdict, "margin": margin, **tail,
            "reason": f"{reached} (Level {required} required)"}


def check_lean(kind, quantity, value, category, required=1):
    """Figures and verdicts only (--lean)."""
    levels = BOUNDS[(kind, quantity)][category]
    if value is None:
        return {"mode": kind, "quantity": quantity, "value": value, "verdict": "not_evaluated", "level": None, "margin": None}
    level, verdict, margin = judge(value, levels, required)
    return {"mode": kind, "quantity": quantity, "value": value, "verdict": verdict, "level": level, "margin": margin}


def evaluate(condition, modes):
    category = CATEGORY.get(condition["phase"])
    by_kind = {kind: f for kind, f in modes}
    findings = []

    def add(kind, quantity, value):
        if category is None:
            return
        findings.append(check(kind, quantity, value, category))

    def add_time_to_double(kind, t2):
        # A convergent mode never doubles: it meets every level. JSON has no infinity, so the
        # finding carries null as its value, as modalgate's results writer does.
        if t2 is None and category is not None:
            f = check(kind, "time_to_double", 1e300, category)
            f.update({"value": None, "margin": None})
            if not LEAN:
                f["reason"] = f"convergent {kind}: never doubles"
            findings.append(f)
        else:
            add(kind, "time_to_double", t2)

    sp = by_kind.get("short_period")
    if sp:
        add("short_period", "damping_ratio", sp["dampingRatio"])
        n_alpha = condition["_nAlpha"]
        add("short_period", "cap", sp["naturalFrequency"] ** 2 / n_alpha if n_alpha > 0 else None)
        if category == "C":
            add("short_period", "natural_frequency", sp["naturalFrequency"])
    ph = by_kind.get("phugoid")
    add("phugoid", "damping_ratio", ph["dampingRatio"] if ph else None)
    if ph:
        add_time_to_double("phugoid", ph["timeToDouble"])
    dr = by_kind.get("dutch_roll")
    add("dutch_roll", "damping_ratio", dr["dampingRatio"] if dr else None)
    add("dutch_roll", "damping_frequency_product", dr["dampingRatio"] * dr["naturalFrequency"] if dr else None)
    add("dutch_roll", "natural_frequency", dr["naturalFrequency"] if dr else None)
    roll = by_kind.get("roll")
    add("roll", "time_constant", roll["timeConstant"] if roll else None)
    spiral = by_kind.get("spiral")
    if spiral:
        add_time_to_double("spiral", spiral["timeToDouble"])
    return findings


LEAN = False


def main(argv):
    global LEAN
    if len(argv) == 4 and argv[1] == "--lean":
        LEAN = True
        argv = [argv[0], *argv[2:]]
    if len(argv) != 3:
        print("usage: modal_reference.py [--lean] MODEL.json OUT.json", file=sys.stderr)
        return 2
    model, sha256, a, kept, skipped = load(argv[1])
    values, participation, long_share = analyse(a)
    # n/alpha = -V Z_w / g [g/rad], from the w row of A (column 1 of the canonical order);
    # V and g in the file's units.
    g = model.get("gravity", GRAVITY[model["units"]])
    n_alpha = -np.array([c["airspeed"] for c in kept]) * a[:, 1, 1] / g if len(kept) else np.zeros(0)

    conditions = []
    summary = {"pass": 0, "marginal": 0, "fail": 0, "not_evaluated": 0}
    for k, c in enumerate(kept):
        shares = long_share[k].tolist()
        columns = None if LEAN else participation[k].T.tolist()  # (mode, state)
        named = identify(values[k].tolist(), shares)
        if LEAN:
            modes = [(kind, figures(lam)) for kind, lam, _ in named]
        else:
            modes = [(kind, {**figures(lam), "basis": basis(lam, shares[j], columns[j])}) for kind, lam, j in named]
        c["_nAlpha"] = float(n_alpha[k])
        findings = evaluate(c, modes)
        for f in findings:
            summary[f["verdict"]] += 1
        if LEAN:
            conditions.append({"id": c["id"], "phase": c["phase"], "modes": [{"kind": kind, **f} for kind, f in modes], "findings": findings})
            continue
        category = CATEGORY.get(c["phase"])
        conditions.append({
            "id": c["id"],
            "phase": c["phase"],
            "category": category,
            "requiredLevel": 1,
            "modes": [{"kind": kind, **f} for kind, f in modes],
            "findings": findings,
            "warnings": [] if category else [f"phase {c['phase']} has no category here"],
        })
    out = {
        "format": "modalgate-reference/1" + ("-lean" if LEAN else ""),
        "note": "timing reference only, not a second implementation of the criteria",
        "tool": {"name": "modal_reference.py", "numpy": np.__version__},
        "inputs": [{"role": "model", "path": argv[1], "sha256": sha256}],
        "aircraft": model["aircraft"],
        "summary": summary,
        "skipped": skipped,
        "conditions": conditions,
    }
    with open(argv[2], "w", encoding="utf-8") as f:
        # Compact: with an indent, the json module falls back to its pure-Python encoder.
        f.write(json.dumps(out, allow_nan=False))
    print(f"reference: {len(conditions)} conditions, {summary}", file=sys.stderr)
    return 0


if __name__ == "__main__":
    sys.exit(main(sys.argv))
