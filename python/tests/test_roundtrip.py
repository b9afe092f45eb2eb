"""Round trips: Python writes a baseline and a candidate, `fitgap validate` accepts them and
`fitgap review` gives the expected verdict. Demo scenario (invented): a ferry operator's model of
how late each sailing leaves, retrained with weak and with strong regularization.
"""

import json
import os
import tempfile
import unittest

import _support
from _support import optional

from fitgap_run import Run, add_learning_curve, add_validation_curve, estimator_hyperparameters


class Temp(unittest.TestCase):
    def setUp(self):
        self._dir = tempfile.TemporaryDirectory(prefix="fitgap-roundtrip-")
        self.dir = self._dir.name

    def tearDown(self):
        self._dir.cleanup()


class HandWrittenRoundTrip(Temp):
    """Needs no scikit-learn: values typed in, predictions built to reproduce them."""

    def artifact(self, name, lam, train, validation, wrong):
        run = Run(os.path.join(self.dir, f"{name}.json"), name=f"late-sailings-{name}", metric="error_rate",
                  goal="minimize", kind="proportion", reference=0.01)
        run.set_split("train", train, examples=4000, evaluation_rows="per-repeat")
        run.set_split("validation", validation, examples=1000, evaluation_rows="per-repeat")
        run.set_hyperparameters(**{"lambda": lam, "epochs": 40})
        run.set_curve("epochs", [10, 20, 40], validation=[0.12, validation[0] + 0.005, validation[0]],
                      train=[0.1, train[0] + 0.004, train[0]])
        run.add_slice("night sailings", validation=[v + 0.02 for v in validation], examples=150)
        ids = [f"sailing-{i:04d}" for i in range(1000)]
        run.write_predictions(ids, correct=[0 if i < wrong else 1 for i in range(1000)], repeat=0)
        return run.write()

    def test_validate_and_review(self):
        baseline = self.artifact("baseline", 0.01, [0.020, 0.022, 0.021], [0.080, 0.078, 0.082], 80)
        candidate = self.artifact("candidate", 1.0, [0.045, 0.047, 0.046], [0.060, 0.062, 0.058], 60)
        out = _support.validate(self, baseline, candidate)
        self.assertIn('valid run artifact "late-sailings-baseline" (3 repeat(s))', out)
        report = _support.review(self, baseline, candidate)
        # Train error up 2.5 points (bias up), validation-train gap down from 5.9 to 1.4 points
        # (variance down): the DESIGN.md movement table calls this toward-underfitting; validation
        # error fell from 8.0% to 6.0%.
        self.assertEqual(report["movement"], "toward-underfitting")
        self.assertEqual(_support.change(report), "better")

    def test_validate_rejects_a_hand_edited_nan(self):
        baseline = self.artifact("baseline", 0.01, [0.020], [0.080], 80)
        with open(baseline, encoding="utf-8") as f:
            text = f.read().replace('"lambda": 0.01', '"lambda": NaN')
        with open(baseline, "w", encoding="utf-8") as f:
            f.write(text)
        done = _support.fitgap(self, "validate", baseline)
        self.assertEqual(done.returncode, 2, done.stdout + done.stderr)


class ScikitLearnRoundTrip(Temp):
    """A small scikit-learn run end to end (skipped, with a message, without scikit-learn)."""

    def setUp(self):
        super().setUp()
        optional("sklearn", self)
        self.np = optional("numpy", self)

    def ridge_run(self, name, alpha):
        from sklearn.datasets import make_regression
        from sklearn.linear_model import Ridge
        from sklearn.model_selection import learning_curve, train_test_split, validation_curve
        np = self.np
        noise = 10.0
        X, y = make_regression(n_samples=300, n_features=40, n_informative=25, noise=noise, random_state=11)
        run = Run(os.path.join(self.dir, f"{name}.json"), name=f"delay-minutes-{name}", metric="rmse",
                  goal="minimize", kind="continuous", best=0, unit="min",
                  reference=noise)  # the noise put into the synthetic data: the best RMSE any model can reach
        train, validation = [], []
        for seed in range(5):
            idx_a, idx_b = train_test_split(np.arange(len(y)), test_size=0.4, random_state=seed)
            model = Ridge(alpha=alpha).fit(X[idx_a], y[idx_a])
            squared = (model.predict(X[idx_b]) - y[idx_b]) ** 2
            train.append(float(np.sqrt(np.mean((model.predict(X[idx_a]) - y[idx_a]) ** 2))))
            validation.append(float(np.sqrt(np.mean(squared))))
            if seed == 0:
                kept = (idx_b, squared)
        run.set_split("train", train, examples=180, evaluation_rows="per-repeat")
        run.set_split("validation", validation, examples=120, evaluation_rows="per-repeat")
        run.set_hyperparameters(estimator_hyperparameters(Ridge(alpha=alpha)))
        alphas = [0.1, 1.0, 10.0, 100.0, 1000.0]
        curve = validation_curve(Ridge(), X, y, param_name="alpha", param_range=alphas, cv=4,
                                 scoring="neg_root_mean_squared_error")
        add_validation_curve(run, curve, param_name="alpha", param_range=alphas,
                             scoring="neg_root_mean_squared_error")
        add_learning_curve(run, learning_curve(Ridge(alpha=alpha), X, y, cv=4, train_sizes=[0.2, 0.4, 0.6, 0.8, 1.0],
                                               scoring="neg_root_mean_squared_error"),
                           scoring="neg_root_mean_squared_error")
        idx_b, squared = kept
        run.write_predictions([f"sailing-{i}" for i in idx_b], loss=squared, aggregate="rmse", repeat=0)
        return run.write()

    def test_ridge_strong_regularization_underfits(self):
        baseline = self.ridge_run("alpha-1", 1.0)
        candidate = self.ridge_run("alpha-300", 300.0)
        _support.validate(self, baseline, candidate)
        with open(candidate, encoding="utf-8") as f:
            doc = json.load(f)
        self.assertEqual(doc["curves"]["sources"], {"training_examples": "cross-validation",
                                                    "regularization": "cross-validation"})
        self.assertEqual(doc["predictions"], {"split": "validation", "path": "alpha-300.validation-predictions.csv",
                                              "aggregate": "rmse", "repeat": 0})
        report = _support.review(self, baseline, candidate)
        # alpha 1 -> 300 on 40 features and 180 rows: train RMSE rises from about 9 to about 170 min.
        self.assertEqual(report["movement"], "toward-underfitting")
        self.assertEqual(_support.change(report), "worse")


if __name__ == "__main__":
    unittest.main()
