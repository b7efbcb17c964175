"""The looped reference of the many-models workloads (test/bench/monorepo.mjs).

Imports ../shared/bench/ref_check.py once (it is read from there, never copied) and calls its
`main` once per model of a list, inside this one Python process, so that the interpreter and
library imports are paid once, as ../shared/bench/README.md describes:

  /usr/bin/python3 test/bench/ref-loop.py --reference REF_CHECK.py --list MODELS.json \
      --root DIR --degree 3 --ridge 0.1 --folds 5 [--loocv]

MODELS.json is a list of {"name", "train", "holdout"} with paths relative to DIR. Each model's
JSON output is captured, and one JSON object is printed at the end: {"models": {name: {the
figures the benchmark compares}}, "seconds": time inside the loop}.
"""
import argparse
import contextlib
import importlib.util
import io
import json
import os
import time

FIGURES = ("train_rmse", "holdout_rmse", "gap_ratio", "max_std_coef", "loocv_rmse", "cond", "cv_rmse", "leaked_rows")


def load_reference(path):
    spec = importlib.util.spec_from_file_location("ref_check", path)
    module = importlib.util.module_from_spec(spec)
    spec.loader.exec_module(module)
    return module


def main():
    ap = argparse.ArgumentParser(description="ref_check.py looped over many models in one process")
    ap.add_argument("--reference", required=True)
    ap.add_argument("--list", required=True)
    ap.add_argument("--root", required=True)
    ap.add_argument("--degree", required=True)
    ap.add_argument("--ridge", required=True)
    ap.add_argument("--folds", required=True)
    ap.add_argument("--loocv", action="store_true")
    a = ap.parse_args()
    ref = load_reference(a.reference)
    with open(a.list, encoding="utf-8") as f:
        models = json.load(f)
    out = {}
    start = time.perf_counter()
    for m in models:
        argv = [
            "--train", os.path.join(a.root, m["train"]),
            "--holdout", os.path.join(a.root, m["holdout"]),
            "--degree", a.degree, "--ridge", a.ridge, "--folds", a.folds,
        ]
        if a.loocv:
            argv.append("--loocv")
        buffer = io.StringIO()
        with contextlib.redirect_stdout(buffer):
            ref.main(argv)
        result = json.loads(buffer.getvalue())
        out[m["name"]] = {k: result.get(k) for k in FIGURES}
    seconds = time.perf_counter() - start
    print(json.dumps({"models": out, "seconds": seconds}))


if __name__ == "__main__":
    main()
