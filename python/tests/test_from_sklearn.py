"""Curves and values from scikit-learn's model-selection results (fitgap_run.from_sklearn).

The first tests feed hand-made arrays shaped like scikit-learn's results and always run; the last
ones call scikit-learn itself and are skipped, with a message, when it is not installed.
"""

import math
import os
import statistics
import tempfile
import unittest
import warnings

import _support  # noqa: F401  (puts the package on sys.path)
from _support import optional

from fitgap_run import (ArtifactError, Run, add_learning_curve, add_search_curve, add_validation_curve,
                        estimator_hyperparameters, is_negated_scorer, scores_to_metric)


def make_run(folder, kind="proportion", goal="minimize"):
    name = "error_rate" if kind == "proportion" else "mse"
    run = Run(os.path.join(folder, "run.json"), name="crate-sorting", metric=name, goal=goal, kind=kind)
    return run.set_split("train", [0.1]).set_split("validation", [0.2])


class Temp(unittest.TestCase):
    def setUp(self):
        self._dir = tempfile.TemporaryDirectory(prefix="fitgap-sklearn-")
        self.dir = self._dir.name

    def tearDown(self):
        self._dir.cleanup()


class ScoresTest(unittest.TestCase):
    # Source: scikit-learn User Guide, "The scoring parameter: defining model evaluation rules":
    # scorers return higher-is-better values; error metrics are available negated as neg_*.
    def test_negated_errors_come_back_positive(self):
        self.assertEqual(scores_to_metric([[-4.0, -2.0], [-1.5, -0.5]], scoring="neg_mean_squared_error",
                                          goal="minimize"), [[4.0, 2.0], [1.5, 0.5]])
        self.assertEqual(scores_to_metric(-3.0, scoring="max_error", goal="minimize"), 3.0)

    def test_scores_follow_the_metric_direction(self):
        self.assertEqual(scores_to_metric([0.75, 0.5], scoring="accuracy", goal="maximize"), [0.75, 0.5])
        self.assertEqual(scores_to_metric([0.75, 0.5], scoring="accuracy", goal="minimize"), [0.25, 0.5])

    def test_an_error_scorer_cannot_feed_a_maximized_metric(self):
        with self.assertRaises(ArtifactError) as caught:
            scores_to_metric([-1.0], scoring="neg_log_loss", goal="maximize")
        self.assertIn("goal 'minimize'", str(caught.exception))
        with self.assertRaises(ArtifactError):
            scores_to_metric([0.5], scoring=None, goal="maximize")

    def test_negated_names(self):
        self.assertTrue(is_negated_scorer("neg_root_mean_squared_error"))
        self.assertFalse(is_negated_scorer("r2"))


class CurvesFromArraysTest(Temp):
    def test_learning_curve_means_over_folds(self):
        run = make_run(self.dir)
        sizes = [40, 130, 220]
        train = [[1.0, 0.95, 0.975], [0.9, 0.92, 0.94], [0.9, 0.89, 0.91]]
        test = [[0.6, 0.7, 0.65], [0.8, 0.78, 0.82], [0.85, 0.86, 0.87]]
        add_learning_curve(run, (sizes, train, test, [[0.1] * 3] * 3, [[0.1] * 3] * 3), scoring="accuracy")
        doc = run.to_dict()
        points = doc["curves"]["training_examples"]
        self.assertEqual([p["x"] for p in points], sizes)
        for point, tr, te in zip(points, train, test):
            # Reference: statistics.fmean of the per-fold error rates (1 - accuracy).
            self.assertAlmostEqual(point["train"], statistics.fmean(1 - s for s in tr), places=12)
            self.assertAlmostEqual(point["validation"], statistics.fmean(1 - s for s in te), places=12)
        self.assertEqual(doc["curves"]["sources"], {"training_examples": "cross-validation"})
        self.assertEqual(run.check(), [])

    def test_validation_curve_over_c_is_sorted_and_marked_inverse(self):
        run = make_run(self.dir)
        c_values = [10.0, 1.0, 0.1]
        train = [[0.99, 0.99], [0.95, 0.93], [0.8, 0.82]]
        test = [[0.8, 0.82], [0.9, 0.88], [0.79, 0.81]]
        add_validation_curve(run, (train, test), param_name="logisticregression__C", param_range=c_values,
                             scoring="accuracy")
        doc = run.to_dict()
        points = doc["curves"]["regularization"]
        self.assertEqual([p["x"] for p in points], [0.1, 1.0, 10.0])
        self.assertAlmostEqual(points[0]["validation"], 0.2, places=12)
        self.assertAlmostEqual(points[2]["train"], 0.01, places=12)
        self.assertEqual(doc["hyperparameters"], {"curve_knobs": {"regularization": "logisticregression__C"},
                                                  "inverse_knobs": ["logisticregression__C"]})
        self.assertEqual(doc["curves"]["sources"]["regularization"], "cross-validation")

    def test_direct_knob_is_not_marked_inverse(self):
        run = make_run(self.dir, "continuous")
        add_validation_curve(run, ([[-2.0], [-3.0]], [[-4.0], [-3.5]]), param_name="alpha",
                             param_range=[0.1, 10.0], scoring="neg_mean_squared_error")
        doc = run.to_dict()
        self.assertNotIn("inverse_knobs", doc["hyperparameters"])
        self.assertEqual([(p["x"], p["train"], p["validation"]) for p in doc["curves"]["regularization"]],
                         [(0.1, 2.0, 4.0), (10.0, 3.0, 3.5)])

    def test_failed_fold_is_named(self):
        run = make_run(self.dir)
        with self.assertRaises(ArtifactError) as caught:
            add_validation_curve(run, ([[0.9], [0.9]], [[0.8], [math.nan]]), param_name="C",
                                 param_range=[0.1, 1.0], scoring="accuracy")
        self.assertEqual([p for p, _ in caught.exception.issues], ["test_scores[1]"])

    def test_search_results_hold_other_parameters_fixed(self):
        run = make_run(self.dir)
        params = [{"C": c, "penalty": p} for p in ("l1", "l2") for c in (0.01, 1.0, 100.0)]
        results = {
            "params": params,
            "mean_test_score": [0.70, 0.80, 0.75, 0.72, 0.84, 0.78],
            "mean_train_score": [0.71, 0.85, 0.95, 0.73, 0.88, 0.97],
        }
        add_search_curve(run, results, param="C", scoring="accuracy", fixed={"C": 1.0, "penalty": "l2"})
        points = run.to_dict()["curves"]["regularization"]
        self.assertEqual([p["x"] for p in points], [0.01, 1.0, 100.0])
        self.assertEqual([round(p["validation"], 12) for p in points], [0.28, 0.16, 0.22])
        self.assertEqual([round(p["train"], 12) for p in points], [0.27, 0.12, 0.03])
        with self.assertRaises(ArtifactError):  # without fixing penalty each C appears twice
            add_search_curve(make_run(self.dir), results, param="C", scoring="accuracy", fixed={})

    def test_estimator_hyperparameters_keep_json_values(self):
        class FakeEstimator:
            def get_params(self, deep=False):
                return {"C": 0.5, "hidden_layer_sizes": (64, 32), "solver": "lbfgs", "random_state": None,
                        "estimator": object(), "missing": math.nan, "class_weight": {0: 1.0}}
        self.assertEqual(estimator_hyperparameters(FakeEstimator()),
                         {"C": 0.5, "hidden_layer_sizes": [64, 32], "random_state": None, "solver": "lbfgs"})


class ScikitLearnTest(Temp):
    def setUp(self):
        super().setUp()
        self.sklearn = optional("sklearn", self)

    def test_negated_names_agree_with_the_scorer_registry(self):
        from sklearn.metrics import get_scorer, get_scorer_names
        # Source: scikit-learn's own scorer registry; a scorer with sign -1 returns a negated error.
        for name in get_scorer_names():
            with self.subTest(scorer=name):
                self.assertEqual(is_negated_scorer(name), get_scorer(name)._sign < 0)

    def test_cross_validation_scores_turn_back_into_errors(self):
        from sklearn.datasets import make_regression
        from sklearn.linear_model import Ridge
        from sklearn.metrics import mean_squared_error
        from sklearn.model_selection import KFold, cross_val_score
        X, y = make_regression(n_samples=120, n_features=5, noise=4.0, random_state=3)
        folds = KFold(4, shuffle=True, random_state=0)
        scores = cross_val_score(Ridge(alpha=1.0), X, y, cv=folds, scoring="neg_mean_squared_error")
        errors = scores_to_metric(scores, scoring="neg_mean_squared_error", goal="minimize")
        # Reference: mean_squared_error of each fold's own fit, computed by hand.
        for error, (train, test) in zip(errors, folds.split(X)):
            model = Ridge(alpha=1.0).fit(X[train], y[train])
            self.assertAlmostEqual(error, mean_squared_error(y[test], model.predict(X[test])), places=9)

    def test_validation_curve_and_grid_search_agree(self):
        from sklearn.datasets import make_classification
        from sklearn.linear_model import LogisticRegression
        from sklearn.model_selection import GridSearchCV, StratifiedKFold, validation_curve
        X, y = make_classification(n_samples=200, n_features=8, random_state=5)
        cv = StratifiedKFold(4, shuffle=True, random_state=0)
        c_values = [0.001, 0.01, 0.1, 1.0, 10.0]
        curve = validation_curve(LogisticRegression(max_iter=1000), X, y, param_name="C",
                                 param_range=c_values, cv=cv, scoring="accuracy")
        a = add_validation_curve(make_run(self.dir), curve, param_name="C", param_range=c_values,
                                 scoring="accuracy").to_dict()["curves"]["regularization"]
        search = GridSearchCV(LogisticRegression(max_iter=1000), {"C": c_values}, cv=cv, scoring="accuracy",
                              return_train_score=True).fit(X, y)
        b = add_search_curve(make_run(self.dir), search, param="C").to_dict()["curves"]["regularization"]
        # Two scikit-learn entry points over the same folds give the same cross-validated curve.
        self.assertEqual([p["x"] for p in a], c_values)
        for p, q in zip(a, b):
            self.assertAlmostEqual(p["validation"], q["validation"], places=12)
            self.assertAlmostEqual(p["train"], q["train"], places=12)
        # Source: scikit-learn API reference, LogisticRegression: "C: Inverse of regularization
        # strength ... smaller values specify stronger regularization". C = 0.001 underfits.
        self.assertGreater(a[0]["train"], a[-1]["train"])

    def test_learning_curve_and_estimator_parameters(self):
        from sklearn.datasets import make_classification
        from sklearn.model_selection import learning_curve
        from sklearn.exceptions import ConvergenceWarning
        from sklearn.neural_network import MLPClassifier
        X, y = make_classification(n_samples=160, n_features=6, random_state=2)
        model = MLPClassifier(hidden_layer_sizes=(8, 4), max_iter=50, random_state=0)
        with warnings.catch_warnings():  # a short fit is enough to shape the curve
            warnings.simplefilter("ignore", ConvergenceWarning)
            result = learning_curve(model, X, y, cv=3, train_sizes=[0.3, 0.6, 1.0], scoring="accuracy")
        run = make_run(self.dir)
        add_learning_curve(run, result, scoring="accuracy")
        run.set_hyperparameters(estimator_hyperparameters(model))
        doc = run.to_dict()
        self.assertEqual([p["x"] for p in doc["curves"]["training_examples"]], [int(s) for s in result[0]])
        self.assertEqual(doc["hyperparameters"]["hidden_layer_sizes"], [8, 4])
        self.assertEqual(run.check(), [])


if __name__ == "__main__":
    unittest.main()
