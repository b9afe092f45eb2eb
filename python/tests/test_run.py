"""The builder and the cheap checks of fitgap_run.run (standard library only, numpy/pandas optional)."""

import datetime
import json
import math
import os
import statistics
import tempfile
import unittest

import _support
from _support import optional

import fitgap_run
from fitgap_run import ArtifactError, Run, check_artifact, value_from_examples


def paths(error):
    return [path for path, _ in error.issues]


class Temp(unittest.TestCase):
    def setUp(self):
        self._dir = tempfile.TemporaryDirectory(prefix="fitgap-run-")
        self.dir = self._dir.name

    def tearDown(self):
        self._dir.cleanup()

    def run_(self, kind="proportion", goal="minimize", **kw):
        name = "error_rate" if kind == "proportion" else "rmse_minutes"
        return Run(os.path.join(self.dir, "candidate.json"), name="harbour-delays", metric=name,
                   goal=goal, kind=kind, **kw)


class GuardrailCostTest(Temp):
    def test_guardrail_and_cost_are_written_and_checked(self):
        run = self.run_()
        run.set_split("validation", [0.061, 0.066], examples=5000)
        run.set_split("train", [0.031, 0.029])
        run.add_guardrail("calibration_error", goal="minimize", kind="continuous",
                          validation=[0.021, 0.022], margin=0.005)
        run.set_cost(train_seconds=[120.5, 118.0], parameters=4200)
        doc = run.to_dict()
        self.assertEqual(list(doc)[-2:], ["guardrails", "cost"])
        self.assertEqual(doc["guardrails"][0]["margin"], 0.005)
        self.assertEqual(doc["cost"], {"trainSeconds": [120.5, 118.0], "parameters": 4200})
        self.assertEqual(check_artifact(doc), [])

    def test_bad_guardrail_and_cost_fields_are_named(self):
        doc = self.run_().set_split("validation", [0.06]).set_split("train", [0.03]).to_dict()
        doc["guardrails"] = [{"metric": {"name": "gap", "goal": "minimize", "kind": "proportion"},
                              "splits": {"validation": {"values": [1.5]}}, "margin": -1}]
        doc["cost"] = {"trainSeconds": [0], "latency": 3}
        found = [path for path, _ in check_artifact(doc)]
        self.assertEqual(sorted(found), ["cost.latency", "cost.trainSeconds", "guardrails[0].margin",
                                         "guardrails[0].splits.validation.values"])


class BuilderTest(Temp):
    def test_writes_keys_in_schema_order(self):
        run = self.run_(reference=0.02, commit="9f1c2ab")
        run.set_split("validation", [0.061, 0.066, 0.059], examples=5000, evaluation_rows="per-repeat")
        run.set_split("train", [0.031, 0.029, 0.030], examples=40000)
        run.set_hyperparameters({"lambda": 0.1}, epochs=30)
        path = run.write()
        with open(path, encoding="utf-8") as f:
            doc = json.load(f)
        self.assertEqual(list(doc), ["format", "run", "metric", "reference", "splits", "hyperparameters"])
        self.assertEqual(list(doc["splits"]), ["train", "validation"])
        self.assertEqual(doc["splits"]["validation"],
                         {"examples": 5000, "values": [0.061, 0.066, 0.059], "evaluationRows": "per-repeat"})
        self.assertEqual(doc["run"], {"name": "harbour-delays", "commit": "9f1c2ab"})
        self.assertEqual(doc["hyperparameters"], {"lambda": 0.1, "epochs": 30})

    def test_nan_names_the_field_and_writes_nothing(self):
        run = self.run_()
        run.set_split("train", [0.03, 0.03, 0.03]).set_split("validation", [0.06, 0.07, float("nan")])
        with self.assertRaises(ArtifactError) as caught:
            run.write()
        self.assertEqual(paths(caught.exception), ["splits.validation.values[2]"])
        self.assertIn("splits.validation.values[2]: must be a finite number", str(caught.exception))
        self.assertIn(f"npx fitgap validate {run.path}", str(caught.exception))
        self.assertFalse(os.path.exists(run.path))

    def test_infinity_in_hyperparameters_is_named(self):
        run = self.run_().set_split("train", [0.1]).set_split("validation", [0.2])
        run.set_hyperparameters(optimizer={"lr": float("inf")})
        with self.assertRaises(ArtifactError) as caught:
            run.write()
        self.assertEqual(paths(caught.exception), ["hyperparameters.optimizer.lr"])

    def test_repeat_counts_must_match(self):
        run = self.run_().set_split("train", [0.03, 0.03]).set_split("validation", [0.06, 0.07, 0.05])
        self.assertEqual([p for p, _ in run.check()], ["splits.validation.values"])

    def test_proportions_within_unit_interval(self):
        run = self.run_(reference=2).set_split("train", [7.0]).set_split("validation", [0.2])
        run.add_slice("night", validation=1.5)
        run.set_curve("epochs", [1, 2], validation=[0.3, -0.1])
        self.assertEqual(sorted(p for p, _ in run.check()),
                         ["curves.epochs[1].validation", "reference", "slices[0].validation",
                          "splits.train.values[0]"])

    def test_continuous_values_may_exceed_one(self):
        run = self.run_("continuous").set_split("train", [4.2]).set_split("validation", [7.5])
        self.assertEqual(run.check(), [])

    def test_curve_x_strictly_increasing_and_positive(self):
        run = self.run_().set_split("train", [0.1]).set_split("validation", [0.2])
        run.set_curve("epochs", [1, 2, 2], validation=[0.3, 0.2, 0.25])
        run.set_curve("regularization", [0, 0.1, 1], validation=[0.3, 0.2, 0.25])
        run.set_curve("training_examples", [-5, 100], validation=[0.3, 0.2])
        self.assertEqual(sorted(p for p, _ in run.check()),
                         ["curves.epochs[2].x", "curves.regularization[0].x", "curves.training_examples[0].x"])

    def test_curve_sources_recorded(self):
        run = self.run_().set_split("train", [0.1]).set_split("validation", [0.2])
        run.set_curve("epochs", [1, 2], validation=[0.3, 0.2], train=[0.25, 0.1])
        run.set_curve("regularization", [0.01, 0.1], validation=[0.3, 0.2], source="cross-validation")
        doc = run.to_dict()
        self.assertEqual(doc["curves"]["sources"], {"epochs": "held-out", "regularization": "cross-validation"})
        self.assertEqual(doc["curves"]["epochs"][0], {"x": 1, "train": 0.25, "validation": 0.3})
        with self.assertRaises(ArtifactError):
            run.set_curve("epochs", [1], validation=[0.3], source="k-fold")
        with self.assertRaises(ArtifactError):
            run.set_curve("epochs", [1, 2], validation=[0.3])

    def test_maximized_metric_above_one_needs_best(self):
        run = Run(os.path.join(self.dir, "a.json"), name="n", metric="translation_score",
                  goal="maximize", kind="continuous")
        run.set_split("train", [88.0]).set_split("validation", [71.5])
        self.assertEqual([p for p, _ in run.check()], ["metric.best"])
        run = Run(os.path.join(self.dir, "a.json"), name="n", metric="translation_score",
                  goal="maximize", kind="continuous", best=100, unit="points")
        run.set_split("train", [88.0]).set_split("validation", [71.5])
        self.assertEqual(run.check(), [])
        self.assertEqual(run.to_dict()["metric"], {"name": "translation_score", "goal": "maximize",
                                                   "kind": "continuous", "best": 100, "unit": "points"})

    def test_booleans_are_not_numbers(self):
        with self.assertRaises(ArtifactError) as caught:
            self.run_().set_split("train", [True])
        self.assertEqual(paths(caught.exception), ["splits.train.values[0]"])

    def test_created_at(self):
        aware = datetime.datetime(2026, 3, 1, 9, 30, tzinfo=datetime.timezone.utc)
        run = self.run_(created_at=aware).set_split("train", [0.1]).set_split("validation", [0.2])
        self.assertEqual(run.to_dict()["run"]["createdAt"], "2026-03-01T09:30:00+00:00")
        self.assertEqual(run.check(), [])
        with self.assertRaises(ArtifactError):
            self.run_(created_at=datetime.datetime(2026, 3, 1))

    def test_unknown_split_and_curve_names(self):
        with self.assertRaises(ArtifactError):
            self.run_().set_split("dev", [0.1])
        with self.assertRaises(ArtifactError):
            self.run_().set_curve("epoch", [1], validation=[0.1])


class HyperparameterTest(Temp):
    def test_tuples_become_lists_and_c_is_an_inverse_knob(self):
        run = self.run_().set_hyperparameters(hidden_layer_sizes=(64, 32), C=0.5)
        run.set_hyperparameters({"logisticregression__C": 2.0, "penalty": "l2"})
        self.assertEqual(run.to_dict()["hyperparameters"], {
            "hidden_layer_sizes": [64, 32], "C": 0.5, "logisticregression__C": 2.0, "penalty": "l2",
            "inverse_knobs": ["C", "logisticregression__C"]})

    def test_declared_inverse_knob_and_curve_knob(self):
        run = self.run_().set_hyperparameters(keep_ratio=0.9, inverse=["keep_ratio"])
        run.set_curve("regularization", [0.1, 1, 10], validation=[0.3, 0.2, 0.25], knob="C")
        hp = run.to_dict()["hyperparameters"]
        self.assertEqual(hp["inverse_knobs"], ["C", "keep_ratio"])
        self.assertEqual(hp["curve_knobs"], {"regularization": "C"})

    def test_objects_are_refused_with_their_path(self):
        with self.assertRaises(ArtifactError) as caught:
            self.run_().set_hyperparameters(model={"scaler": object()})
        self.assertEqual(paths(caught.exception), ["hyperparameters.model.scaler"])

    def test_numpy_values_are_converted(self):
        np = optional("numpy", self)
        run = self.run_().set_split("train", np.array([0.1, 0.2], dtype=np.float32))
        run.set_split("validation", np.array([0.2, 0.3]), examples=np.int64(400))
        run.set_hyperparameters(alpha=np.float64(1e-3), layers=np.array([64, 32]), early=np.bool_(True))
        doc = run.to_dict()
        self.assertEqual(doc["splits"]["validation"], {"examples": 400, "values": [0.2, 0.3]})
        self.assertIsInstance(doc["splits"]["train"]["values"][0], float)
        self.assertEqual(doc["hyperparameters"], {"alpha": 0.001, "layers": [64, 32], "early": True})
        run.set_split("validation", np.array([0.2, np.nan]))
        self.assertEqual([p for p, _ in run.check()], ["splits.validation.values[1]"])


class ExamplesRuleTest(unittest.TestCase):
    def test_error_rate_and_accuracy(self):
        correct = [1, 1, 0, 1, 0, 1, 1, 1]
        # Source (common practice): error rate = wrong / n, accuracy = right / n.
        self.assertEqual(value_from_examples(goal="minimize", kind="proportion", correct=correct), (0.25, 8))
        self.assertEqual(value_from_examples(goal="maximize", kind="proportion", correct=correct), (0.75, 8))

    def test_loss_aggregates(self):
        loss = [1.0, 4.0, 0.25, 2.25]
        # Reference: Python's statistics module (fmean) for the mean, math.fsum for the sum.
        mean, n = value_from_examples(goal="minimize", kind="continuous", loss=loss)
        self.assertEqual((mean, n), (statistics.fmean(loss), 4))
        rmse, _ = value_from_examples(goal="minimize", kind="continuous", loss=loss, aggregate="rmse")
        self.assertAlmostEqual(rmse, math.sqrt(statistics.fmean(loss)), places=15)
        total, _ = value_from_examples(goal="minimize", kind="continuous", loss=loss, aggregate="sum")
        self.assertEqual(total, 7.5)

    def test_against_scikit_learn_metrics(self):
        metrics = optional("sklearn.metrics", self)
        y = [3.0, -0.5, 2.0, 7.0, 4.2]
        p = [2.5, 0.0, 2.0, 8.0, 3.9]
        squared = [(a - b) ** 2 for a, b in zip(y, p)]
        # Source: scikit-learn's mean_squared_error and mean_absolute_error as references.
        rmse, _ = value_from_examples(goal="minimize", kind="continuous", loss=squared, aggregate="rmse")
        self.assertAlmostEqual(rmse, math.sqrt(metrics.mean_squared_error(y, p)), places=12)
        mae, _ = value_from_examples(goal="minimize", kind="continuous", loss=[abs(a - b) for a, b in zip(y, p)])
        self.assertAlmostEqual(mae, metrics.mean_absolute_error(y, p), places=12)
        labels, predicted = [0, 1, 1, 0, 1, 1], [0, 1, 0, 0, 0, 1]
        correct = [int(a == b) for a, b in zip(labels, predicted)]
        error, _ = value_from_examples(goal="minimize", kind="proportion", correct=correct)
        self.assertAlmostEqual(error, metrics.zero_one_loss(labels, predicted), places=15)

    def test_refusals(self):
        with self.assertRaises(ArtifactError) as caught:
            value_from_examples(goal="minimize", kind="proportion", correct=[1, 2])
        self.assertEqual(paths(caught.exception), ["predictions.correct[1]"])
        with self.assertRaises(ArtifactError):
            value_from_examples(goal="maximize", kind="continuous", loss=[0.1])
        with self.assertRaises(ArtifactError):
            value_from_examples(goal="minimize", kind="continuous", loss=[-1.0], aggregate="rmse")
        with self.assertRaises(ArtifactError):
            value_from_examples(goal="minimize", kind="continuous", correct=[1])


class PredictionsTest(Temp):
    def proportion_run(self, goal="minimize"):
        run = self.run_(goal=goal)
        values = [0.2, 0.25, 0.3] if goal == "minimize" else [0.8, 0.75, 0.7]
        return run.set_split("train", [0.1, 0.1, 0.1]).set_split("validation", values)

    def test_writes_csv_next_to_the_artifact(self):
        run = self.proportion_run()
        ids = [f"order-{i}" for i in range(20)]
        correct = [0] * 5 + [1] * 15  # error rate 0.25: repeat 1
        csv_path = run.write_predictions(ids, correct=correct, repeat=1)
        self.assertEqual(csv_path, os.path.join(self.dir, "candidate.validation-predictions.csv"))
        with open(csv_path, encoding="utf-8") as f:
            lines = f.read().splitlines()
        self.assertEqual(lines[:3], ["id,correct", "order-0,0", "order-1,0"])
        self.assertEqual(len(lines), 21)
        doc = run.to_dict()
        self.assertEqual(doc["predictions"], {"split": "validation", "path": "candidate.validation-predictions.csv",
                                              "repeat": 1})
        self.assertEqual(doc["splits"]["validation"]["examples"], 20)
        run.write()

    def test_accuracy_counts_correct_ones(self):
        run = self.proportion_run("maximize")
        run.write_predictions(range(4), correct=[1, 1, 1, 0], repeat=1)
        with self.assertRaises(ArtifactError) as caught:
            run.write_predictions(range(4), correct=[1, 0, 0, 0], repeat=1)
        self.assertIn("give 0.25 (accuracy", str(caught.exception))

    def test_mismatch_names_both_numbers_and_the_matching_repeat(self):
        run = self.proportion_run()
        with self.assertRaises(ArtifactError) as caught:
            run.write_predictions(range(10), correct=[0] * 3 + [1] * 7)
        message = str(caught.exception)
        self.assertEqual(paths(caught.exception), ["splits.validation.values[0]"])
        self.assertIn("is 0.2 but the 10 per-example values give 0.3 (error rate", message)
        self.assertIn("pass repeat=2", message)
        self.assertFalse(os.path.exists(os.path.join(self.dir, "candidate.validation-predictions.csv")))

    def test_changed_split_value_fails_at_write(self):
        run = self.proportion_run()
        run.write_predictions(range(5), correct=[0, 1, 1, 1, 1])
        run.set_split("validation", [0.4, 0.25, 0.3])
        with self.assertRaises(ArtifactError) as caught:
            run.write()
        self.assertIn("splits.validation.values[0]", paths(caught.exception))

    def test_ids_and_rows(self):
        run = self.proportion_run()
        for ids, path in ((["a", "b", "a", "c", "d"], "predictions.ids[2]"),
                          (["a", "b,c", "d", "e", "f"], "predictions.ids[1]"),
                          ([" a", "b", "c", "d", "e"], "predictions.ids[0]"),
                          (["a", "b", "c", "d"], "predictions.ids")):
            with self.assertRaises(ArtifactError) as caught:
                run.write_predictions(ids, correct=[0, 1, 1, 1, 1])
            self.assertEqual(paths(caught.exception), [path])

    def test_examples_must_match_rows(self):
        run = self.proportion_run()
        run.set_split("validation", [0.2, 0.25, 0.3], examples=400)
        with self.assertRaises(ArtifactError) as caught:
            run.write_predictions(range(5), correct=[0, 1, 1, 1, 1])
        self.assertEqual(paths(caught.exception), ["splits.validation.examples"])

    def test_repeat_and_split_must_exist(self):
        run = self.proportion_run()
        with self.assertRaises(ArtifactError):
            run.write_predictions(range(5), correct=[0, 1, 1, 1, 1], repeat=3)
        with self.assertRaises(ArtifactError):
            run.write_predictions(range(5), correct=[0, 1, 1, 1, 1], split="test")
        with self.assertRaises(ArtifactError):
            run.write_predictions(range(5), correct=[0, 1, 1, 1, 1], aggregate="mean")

    def test_continuous_rmse_within_tolerance(self):
        run = self.run_("continuous").set_split("train", [1.0]).set_split("validation", [2.5])
        squared = [4.0, 9.0, 4.0, 8.0]  # mean 6.25, root 2.5
        path = run.write_predictions(["s1", "s2", "s3", "s4"], loss=squared, aggregate="rmse")
        with open(path, encoding="utf-8") as f:
            self.assertEqual(f.read(), "id,loss\ns1,4.0\ns2,9.0\ns3,4.0\ns4,8.0\n")
        self.assertEqual(run.to_dict()["predictions"]["aggregate"], "rmse")
        run.set_split("validation", [2.501])
        with self.assertRaises(ArtifactError):
            run.write()
        run.write_predictions(["s1", "s2", "s3", "s4"], loss=squared, aggregate="rmse", tolerance=0.01)
        run.write()

    def test_sum_aggregate(self):
        run = self.run_("continuous").set_split("train", [10.0]).set_split("validation", [12.5])
        run.write_predictions(["a", "b"], loss=[5.0, 7.5], aggregate="sum")
        self.assertEqual(run.check(), [])


class SlicesTest(Temp):
    def test_per_repeat_values_average(self):
        run = self.run_().set_split("train", [0.1, 0.1]).set_split("validation", [0.2, 0.2])
        run.add_slice("weekend orders", validation=[0.09, 0.11], train=[0.02, 0.04], examples=800)
        self.assertEqual(run.to_dict()["slices"],
                         [{"name": "weekend orders", "examples": 800, "train": 0.03, "validation": 0.1}])

    def test_from_columns(self):
        run = self.run_().set_split("train", [0.1]).set_split("validation", [0.2])
        frame = {"harbour": ["north", "south", "north", None, "south", "north"],
                 "correct": [1, 0, 0, 1, 1, 1]}
        train = {"harbour": ["north", "south"], "correct": [1, 0]}
        run.add_slices_from_frame(frame, "harbour", train_frame=train)
        self.assertEqual(run.to_dict()["slices"], [
            {"name": "north", "examples": 3, "train": 0.0, "validation": 1 / 3},
            {"name": "south", "examples": 2, "train": 1.0, "validation": 0.5}])

    def test_duplicate_slice_names_are_refused(self):
        run = self.run_().set_split("train", [0.1]).set_split("validation", [0.2])
        run.add_slice("a", validation=0.1).add_slice("a", validation=0.2)
        self.assertEqual([p for p, _ in run.check()], ["slices[1].name"])

    def test_from_pandas_frame_matches_groupby(self):
        pd = optional("pandas", self)
        frame = pd.DataFrame({"berth": ["A", "B", "A", "C", "B", "A", "C", "C"],
                              "loss": [1.0, 2.0, 3.0, 0.5, 4.0, 2.0, 1.5, 1.0]})
        run = self.run_("continuous").set_split("train", [1.0]).set_split("validation", [2.0])
        run.add_slices_from_frame(frame, "berth")
        # Reference: pandas' own group-by mean and size.
        means = frame.groupby("berth")["loss"].mean()
        sizes = frame.groupby("berth").size()
        got = {s["name"]: (s["validation"], s["examples"]) for s in run.to_dict()["slices"]}
        self.assertEqual(sorted(got), list(means.index))
        for name in means.index:
            self.assertAlmostEqual(got[name][0], float(means[name]), places=12)
            self.assertEqual(got[name][1], int(sizes[name]))


class CheckArtifactTest(unittest.TestCase):
    def good(self):
        return {"format": "fitgap-run/1", "run": {"name": "r"},
                "metric": {"name": "error_rate", "goal": "minimize", "kind": "proportion"},
                "splits": {"train": {"values": [0.1]}, "validation": {"values": [0.2]}}}

    def test_good_document(self):
        self.assertEqual(check_artifact(self.good()), [])

    def test_unknown_and_missing_keys(self):
        doc = self.good()
        doc["split"] = doc.pop("splits")
        doc["metric"]["goal"] = "lower"
        doc["predictions"] = {"split": "validation", "path": "../p.csv", "repeat": 2, "agg": "mean"}
        self.assertEqual(sorted(p for p, _ in check_artifact(doc)), [
            "metric.goal", "predictions.agg", "predictions.path", "predictions.split", "split", "splits"])

    def test_predictions_repeat_within_repeats(self):
        doc = self.good()
        doc["predictions"] = {"split": "validation", "path": "p.csv", "repeat": 1}
        self.assertEqual([p for p, _ in check_artifact(doc)], ["predictions.repeat"])

    def test_write_artifact_refuses_nan_before_writing(self):
        doc = self.good()
        doc["reference"] = float("nan")
        with tempfile.TemporaryDirectory() as folder:
            path = os.path.join(folder, "a.json")
            with self.assertRaises(ArtifactError) as caught:
                fitgap_run.write_artifact(doc, path)
            self.assertEqual(paths(caught.exception), ["reference"])
            self.assertFalse(os.path.exists(path))


if __name__ == "__main__":
    unittest.main()
