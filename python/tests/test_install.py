"""`pip install ./python` builds and installs offline (no index, the interpreter's own setuptools)."""

import os
import shutil
import subprocess
import sys
import tempfile
import unittest

import _support


def build_tools():
    """Why an offline build cannot run here, or None when it can."""
    try:
        import setuptools
    except ImportError:
        return "setuptools is not installed"
    version = tuple(int(p) for p in setuptools.__version__.split(".")[:2] if p.isdigit())
    if version < (61, 0):
        return f"setuptools {setuptools.__version__} is older than 61 (pyproject metadata)"
    if version < (70, 1):
        try:
            import wheel  # noqa: F401  (bdist_wheel before setuptools 70.1)
        except ImportError:
            return f"setuptools {setuptools.__version__} needs the wheel package to build a wheel"
    if subprocess.run([sys.executable, "-m", "pip", "--version"], capture_output=True).returncode != 0:
        return "pip is not available"
    return None


class InstallTest(unittest.TestCase):
    def test_offline_install_into_a_target_folder(self):
        missing = build_tools()
        if missing:
            self.skipTest(f"offline pip install not possible with {sys.executable}: {missing}")
        with tempfile.TemporaryDirectory(prefix="fitgap-install-") as folder:
            source = os.path.join(folder, "src")
            shutil.copytree(_support.PYTHON_DIR, source, ignore=shutil.ignore_patterns(
                "tests", "build", "*.egg-info", "__pycache__"))
            target = os.path.join(folder, "site")
            done = subprocess.run(
                [sys.executable, "-m", "pip", "install", "--no-index", "--no-build-isolation",
                 "--no-deps", "--disable-pip-version-check", "--quiet", "--target", target, source],
                capture_output=True, text=True, timeout=300)
            self.assertEqual(done.returncode, 0, done.stdout + done.stderr)
            probe = ("import fitgap_run, fitgap_run.from_sklearn; "
                     "print(fitgap_run.__version__, fitgap_run.__file__)")
            env = dict(os.environ, PYTHONPATH=target)
            done = subprocess.run([sys.executable, "-c", probe], cwd=folder, env=env, capture_output=True,
                                  text=True)
            self.assertEqual(done.returncode, 0, done.stderr)
            version, path = done.stdout.split()
            self.assertEqual(version, "0.1.0")
            self.assertTrue(path.startswith(target), path)

    def test_core_module_works_as_a_single_copied_file(self):
        with tempfile.TemporaryDirectory(prefix="fitgap-copy-") as folder:
            shutil.copy(os.path.join(_support.PYTHON_DIR, "fitgap_run", "run.py"),
                        os.path.join(folder, "fitgap_run.py"))
            code = ("import fitgap_run\n"
                    "r = fitgap_run.Run('a.json', name='n', metric='error_rate', goal='minimize', kind='proportion')\n"
                    "r.set_split('train', [0.1]).set_split('validation', [0.2])\n"
                    "print(r.write())\n")
            env = {k: v for k, v in os.environ.items() if k != "PYTHONPATH"}
            done = subprocess.run([sys.executable, "-c", code], cwd=folder, env=env, capture_output=True, text=True)
            self.assertEqual((done.returncode, done.stdout.strip()), (0, "a.json"), done.stderr)


if __name__ == "__main__":
    unittest.main()
