"""The README examples run as they stand, and `fitgap validate` accepts what they write.

Each example is the ```python block between `<!-- NAME:start -->` and `<!-- NAME:end -->` in
python/README.md (and in the main README.md, once it carries the same markers).
"""

import os
import re
import subprocess
import sys
import tempfile
import unittest

import _support
from _support import optional

READMES = [os.path.join(_support.PYTHON_DIR, "README.md"), os.path.join(_support.REPO, "README.md")]


def example(path, name):
    with open(path, encoding="utf-8") as f:
        text = f.read()
    found = re.search(rf"<!-- {name}:start -->\s*```python\n(.*?)```\s*<!-- {name}:end -->", text, re.S)
    return found.group(1) if found else None


class ReadmeExamples(unittest.TestCase):
    def run_example(self, code, artifact):
        with tempfile.TemporaryDirectory(prefix="fitgap-readme-") as folder:
            script = os.path.join(folder, "example.py")
            with open(script, "w", encoding="utf-8") as f:
                f.write(code)
            env = dict(os.environ, PYTHONPATH=_support.PYTHON_DIR)
            done = subprocess.run([sys.executable, script], cwd=folder, env=env, capture_output=True,
                                  text=True, timeout=300)
            self.assertEqual(done.returncode, 0, done.stdout + done.stderr)
            path = os.path.join(folder, artifact)
            self.assertIn(f"wrote {artifact}", done.stdout)
            _support.validate(self, path)

    def test_quick_example(self):
        code = example(READMES[0], "fitgap-run-example")
        self.assertIsNotNone(code, "python/README.md lost its fitgap-run-example markers")
        lines = [line for line in code.splitlines() if line.strip()]
        self.assertLessEqual(len(lines), 15, "the quick example should stay within 15 lines")
        self.run_example(code, "out/candidate.json")

    def test_main_readme_copy(self):
        if not os.path.exists(READMES[1]) or example(READMES[1], "fitgap-run-example") is None:
            self.skipTest("README.md has no fitgap-run-example block yet")
        self.assertEqual(example(READMES[1], "fitgap-run-example"), example(READMES[0], "fitgap-run-example"),
                         "README.md and python/README.md show different examples")

    def test_scikit_learn_example(self):
        optional("sklearn", self)
        code = example(READMES[0], "fitgap-run-sklearn")
        self.assertIsNotNone(code, "python/README.md lost its fitgap-run-sklearn markers")
        self.run_example(code, "out/cv.json")


if __name__ == "__main__":
    unittest.main()
