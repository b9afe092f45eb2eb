"""Shared test helpers: the package on sys.path, the repository root, and the fitgap CLI."""

import importlib
import json
import os
import shutil
import subprocess
import sys

HERE = os.path.dirname(os.path.abspath(__file__))
PYTHON_DIR = os.path.dirname(HERE)
REPO = os.path.dirname(PYTHON_DIR)
CLI = os.path.join(REPO, "dist", "cli.js")
if PYTHON_DIR not in sys.path:
    sys.path.insert(0, PYTHON_DIR)


def optional(module, test):
    """Import an optional library, or skip ``test`` saying which one is missing. With
    FITGAP_REQUIRE_PYTHON_EXTRAS=1 (set it in CI once the libraries are installed) a missing library
    fails the test instead."""
    try:
        return importlib.import_module(module)
    except ImportError as error:
        top = module.split(".")[0]
        pip = {"sklearn": "scikit-learn"}.get(top, top)
        if os.environ.get("FITGAP_REQUIRE_PYTHON_EXTRAS") == "1":
            test.fail(f"{pip} is required here (FITGAP_REQUIRE_PYTHON_EXTRAS=1) but missing: {error}")
        test.skipTest(f"{pip} not installed ({error}); install it to run this check "
                      f"(apt-get install python3-{top}, or pip install {pip})")


def node(test):
    """The node executable; skips with a message when it is missing outside CI, fails in CI."""
    found = shutil.which("node")
    if found is None:
        if os.environ.get("CI"):
            test.fail("node is not on PATH; the round trip through `fitgap validate` needs it")
        test.skipTest("node not on PATH: the round trip through `fitgap validate` needs Node 20")
    if not os.path.exists(CLI):
        subprocess.run(["npm", "run", "-s", "build"], cwd=REPO, check=True)
    return found


def fitgap(test, *args):
    """Run ``node dist/cli.js ARGS`` from the repository root; returns the completed process."""
    return subprocess.run([node(test), CLI, *args], cwd=REPO, capture_output=True, text=True,
                          timeout=120)


def validate(test, *paths):
    """Assert that ``fitgap validate`` accepts every path."""
    done = fitgap(test, "validate", *paths)
    test.assertEqual(done.returncode, 0, f"fitgap validate rejected:\n{done.stdout}{done.stderr}")
    return done.stdout


def review(test, baseline, candidate):
    """``fitgap review --format json`` of two artifacts, parsed (gate off, so exit code 0)."""
    done = fitgap(test, "review", "--baseline", baseline, "--candidate", candidate,
                  "--format", "json", "--fail-on", "none")
    test.assertEqual(done.returncode, 0, f"fitgap review failed:\n{done.stdout}{done.stderr}")
    return json.loads(done.stdout)


def change(report):
    """The validation change of a review, read defensively (key names may still move)."""
    validation = report.get("validation")
    return validation.get("change") if isinstance(validation, dict) else None

