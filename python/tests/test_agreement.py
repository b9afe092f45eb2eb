"""The Python checks agree with `fitgap validate` on the project's own artifact fixtures.

Never stricter: every artifact fitgap accepts passes `check_artifact`. And every artifact fitgap
rejects is caught in Python too, except where the reason lies outside the JSON (listed below).
"""

import glob
import json
import os
import unittest

import _support

from fitgap_run import check_artifact

PATTERNS = ["test/fixtures/bad/*.json", "test/fixtures/action/*.json", "test/fixtures/design/**/*.json",
            "demo/*.json"]
# Rejected by fitgap for reasons Python's cheap checks do not look at.
OUTSIDE_THE_JSON = {
    "predictions-missing.json": "the predictions CSV does not exist",
    # `fitgap validate` reads the predictions CSV too, as `review` does.
    "cont-pred-bad.json": "a loss in its predictions CSV is not a number",
    "p-bad-header.json": "its predictions CSV has the wrong header",
    "p-duplicate.json": "its predictions CSV repeats an id",
    "p-two.json": "a 0/1 cell of its predictions CSV holds 2",
}


def strict_load(path):
    """Parse like fitgap does: NaN and Infinity literals are not JSON. None when it does not parse."""
    def refuse(name):
        raise ValueError(name)
    try:
        with open(path, encoding="utf-8") as f:
            return json.load(f, parse_constant=refuse)
    except ValueError:
        return None


class AgreementTest(unittest.TestCase):
    def test_python_checks_agree_with_fitgap_validate(self):
        files = sorted({f for p in PATTERNS for f in glob.glob(os.path.join(_support.REPO, p), recursive=True)})
        self.assertGreater(len(files), 20, "the fixtures moved; update PATTERNS")
        relative = [os.path.relpath(f, _support.REPO) for f in files]
        done = _support.fitgap(self, "validate", *relative)
        accepted = {line.split(": valid ")[0] for line in done.stdout.splitlines() if ": valid " in line}
        self.assertTrue(accepted, done.stdout + done.stderr)
        for path, name in zip(files, relative):
            doc = strict_load(path)
            issues = check_artifact(doc) if doc is not None else [("", "not JSON")]
            with self.subTest(file=name):
                if name in accepted:
                    self.assertEqual(issues, [], "Python refuses an artifact fitgap accepts")
                elif os.path.basename(name) not in OUTSIDE_THE_JSON:
                    self.assertNotEqual(issues, [], "fitgap rejects this artifact but Python passes it")


if __name__ == "__main__":
    unittest.main()
