"""Write ``fitgap-run/1`` run artifacts from Python training code.

Standard library only; numpy and pandas values are accepted and converted when they are present.
This file stands alone: copy it into a project as ``fitgap_run.py`` to use it without installing
(which is why the checks and the builder share one file).

    run = Run("out/candidate.json", name="late-sailings-C0.1", metric="accuracy",
              goal="maximize", kind="proportion", best=1.0)
    run.set_split("train", [0.912, 0.915, 0.910])
    run.set_split("validation", [0.883, 0.880, 0.886])
    run.write()

`write()` runs the checks that are cheap here (required keys, proportions within [0, 1], one value
per repeat in every split, increasing curve x, finite numbers, unknown keys) and writes JSON with
``allow_nan=False``; ``npx fitgap validate FILE`` runs the full schema and the predictions check.
"""

from __future__ import annotations

import datetime as _dt
import json
import math
import os
import re

__all__ = [
    "ArtifactError",
    "Run",
    "check_artifact",
    "value_from_examples",
    "write_artifact",
    "FORMAT",
    "INVERSE_KNOBS",
]

FORMAT = "fitgap-run/1"
SPLIT_NAMES = ("train", "train_dev", "validation", "test")
CURVE_NAMES = ("epochs", "training_examples", "regularization")
CURVE_SOURCES = ("held-out", "cross-validation")
AGGREGATES = ("mean", "rmse", "sum")
EVALUATION_ROWS = ("fixed", "per-repeat")
TOP_LEVEL_KEYS = ("$schema", "format", "run", "metric", "reference", "splits",
                  "hyperparameters", "curves", "slices", "predictions", "guardrails", "cost")
#: ``cost`` fields: per-repeat lists and single numbers, all positive.
COST_LISTS = ("trainSeconds", "inferenceMs")
COST_NUMBERS = ("parameters", "memoryMb")
#: Knobs where a smaller value means stronger regularization: scikit-learn's ``C`` ("inverse of
#: regularization strength", LogisticRegression and SVC API reference).
INVERSE_KNOBS = frozenset({"C"})
#: Hyperparameter keys this module adds: the inverse knobs, and which knob each curve's x sweeps.
INVERSE_KNOBS_KEY = "inverse_knobs"
CURVE_KNOBS_KEY = "curve_knobs"
#: Default agreement between per-example values and a split value: 1e-6 x max(1, |value|).
DEFAULT_TOLERANCE = 1e-6


class ArtifactError(ValueError):
    """Bad input for a run artifact. ``issues`` holds ``(path, message)`` pairs; a path reads like
    ``splits.validation.values[2]``."""

    def __init__(self, issues, note=None):
        self.issues = list(issues)
        text = "; ".join(f"{path or 'artifact'}: {message}" for path, message in self.issues)
        super().__init__(f"{text} ({note})" if note else text)


def _fail(path, message):
    raise ArtifactError([(path, message)])


def _plain(value, path="value"):
    """JSON-ready copy of ``value``: numpy scalars and arrays, pandas Series and tuples converted."""
    if value is None or isinstance(value, (str, bool, int, float)):
        return value
    if isinstance(value, dict):
        out = {}
        for key, item in value.items():
            if not isinstance(key, str):
                _fail(path, f"has the key {key!r}; keys must be strings")
            out[key] = _plain(item, f"{path}.{key}")
        return out
    if isinstance(value, (list, tuple)):
        return [_plain(item, f"{path}[{i}]") for i, item in enumerate(value)]
    if hasattr(value, "tolist"):  # numpy arrays and scalars, pandas Series
        return _plain(value.tolist(), path)
    if hasattr(value, "item"):
        return _plain(value.item(), path)
    if hasattr(value, "__iter__") and not isinstance(value, (bytes, bytearray)):  # range, generators
        return [_plain(item, f"{path}[{i}]") for i, item in enumerate(value)]
    _fail(path, f"is a {type(value).__name__}; give a number, string, boolean, list or mapping")


def _number(value, path):
    value = _plain(value, path)
    if isinstance(value, bool) or not isinstance(value, (int, float)):
        _fail(path, f"must be a number (got {value!r})")
    return value


def _numbers(values, path):
    values = _plain(values, path)
    if not isinstance(values, list):
        values = [values]
    return [_number(v, f"{path}[{i}]") for i, v in enumerate(values)]


def _count(value, path):
    value = _number(value, path)
    if float(value).is_integer() and value >= 1:
        return int(value)
    _fail(path, f"must be a whole number >= 1 (got {value!r})")


def _mean(values, path):
    values = _numbers(values, path)
    if not values:
        _fail(path, "needs at least one value")
    return math.fsum(values) / len(values)


def _non_finite(value, path, out):
    if isinstance(value, float) and not math.isfinite(value):
        out.append((path, f"must be a finite number (got {value!r}); JSON has no NaN or Infinity. "
                          "Find where it came from (a failed fit, a division by zero, an empty split)"))
    elif isinstance(value, dict):
        for key, item in value.items():
            _non_finite(item, f"{path}.{key}" if path else key, out)
    elif isinstance(value, list):
        for i, item in enumerate(value):
            _non_finite(item, f"{path}[{i}]", out)


def _is_num(value):
    return isinstance(value, (int, float)) and not isinstance(value, bool)


_DATE_TIME = re.compile(r"^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d(\.\d+)?(Z|[+-]\d\d:\d\d)$", re.I)
_DRIVE = re.compile(r"^[A-Za-z]:")


def check_artifact(doc):
    """The cheap checks of ``schema/fitgap-run-1.schema.json`` and of ``fitgap validate``'s rules.

    Returns a list of ``(path, message)`` pairs, empty when nothing was found. Passing these checks
    does not make an artifact valid: ``npx fitgap validate FILE`` runs the full schema."""
    if not isinstance(doc, dict):
        return [("", "must be a JSON object")]
    return _Checks(doc).issues


class _Checks:
    """One pass over a parsed artifact; ``issues`` collects ``(path, message)`` pairs."""

    def __init__(self, doc):
        self.issues = []
        self.seen = []  # (value, path) of every metric value, for the metric.best rule
        self.repeats = None  # (split name, number of values) of the first split
        _non_finite(doc, "", self.issues)
        self.known(doc, "", TOP_LEVEL_KEYS)
        for key in ("format", "run", "metric", "splits"):
            if key not in doc:
                self.add(key, "is required")
        if "format" in doc and doc["format"] != FORMAT:
            self.add("format", f"must be {FORMAT!r} (got {doc['format']!r})")
        run = self.object(doc, "run")
        if run is not None:
            self.run(run)
        metric = self.object(doc, "metric") or {}
        self.metric(metric)
        self.proportion = metric.get("kind") == "proportion"
        if "reference" in doc:
            self.value(doc["reference"], "reference")
        splits = self.object(doc, "splits")
        if splits is not None:
            self.splits(splits)
        self.object(doc, "hyperparameters")
        curves = self.object(doc, "curves")
        if curves is not None:
            self.curves(curves)
        if "slices" in doc:
            self.slices(doc["slices"])
        predictions = self.object(doc, "predictions")
        if predictions is not None:
            self.predictions(predictions, splits if isinstance(splits, dict) else {})
        if "guardrails" in doc:
            self.guardrails(doc["guardrails"])
        cost = self.object(doc, "cost")
        if cost is not None:
            self.cost(cost)
        if metric.get("goal") == "maximize" and "best" not in metric:
            above = [path for v, path in self.seen if math.isfinite(v) and v > 1]
            if above:
                self.add("metric.best", f"is needed: {above[0]} is above 1 for a maximized metric; "
                                        "state the best possible value (100 for a 0-100 score)")

    def add(self, path, message):
        self.issues.append((path, message))

    def known(self, obj, path, keys):
        for key in obj:
            if key not in keys:
                self.add(f"{path}.{key}" if path else key,
                         f"is not a known key here (known: {', '.join(keys)})")

    def object(self, parent, key, path=None):
        value = parent.get(key)
        if value is not None and not isinstance(value, dict):
            self.add(path or key, "must be an object")
            return None
        return value

    def text(self, obj, key, path, longest, required=True):
        value = obj.get(key)
        if (value is not None or required) and not (isinstance(value, str) and 1 <= len(value) <= longest):
            self.add(path, f"must be a string of 1 to {longest} characters (got {value!r})")

    def choice(self, obj, key, path, allowed):
        if key in obj and obj[key] not in allowed:
            self.add(path, f"must be one of {', '.join(allowed)} (got {obj[key]!r})")

    def count(self, obj, key, path):
        value = obj.get(key)
        if key in obj and not (isinstance(value, int) and not isinstance(value, bool) and value >= 1):
            self.add(path, f"must be a whole number >= 1 (got {value!r})")

    def value(self, v, path):
        """A value in metric units."""
        if not _is_num(v):
            self.add(path, f"must be a number (got {v!r})")
            return
        self.seen.append((v, path))
        if self.proportion and math.isfinite(v) and not 0 <= v <= 1:
            self.add(path, f"must be within [0, 1] for a proportion metric (got {v!r}); "
                           "write rates as fractions (0.07, not 7) or declare kind 'continuous'")

    def run(self, run):
        self.known(run, "run", ("name", "commit", "createdAt"))
        self.text(run, "name", "run.name", 200)
        self.text(run, "commit", "run.commit", 64, required=False)
        created = run.get("createdAt")
        if created is not None and not (isinstance(created, str) and _DATE_TIME.match(created)):
            self.add("run.createdAt", f"must be an RFC 3339 date-time with a time zone (got {created!r})")

    def metric(self, metric):
        self.known(metric, "metric", ("name", "goal", "kind", "best", "unit"))
        self.text(metric, "name", "metric.name", 100)
        self.text(metric, "unit", "metric.unit", 40, required=False)
        for key, allowed in (("goal", ("minimize", "maximize")), ("kind", ("proportion", "continuous"))):
            if key not in metric:
                self.add(f"metric.{key}", "is required")
            self.choice(metric, key, f"metric.{key}", allowed)
        if "best" in metric and not _is_num(metric["best"]):
            self.add("metric.best", f"must be a number (got {metric['best']!r})")

    def splits(self, splits):
        self.known(splits, "splits", SPLIT_NAMES)
        for name in ("train", "validation"):
            if name not in splits:
                self.add(f"splits.{name}", "is required")
        for name in SPLIT_NAMES:
            at = f"splits.{name}"
            split = self.object(splits, name, at)
            if split is None:
                continue
            self.known(split, at, ("examples", "values", "evaluationRows"))
            self.count(split, "examples", f"{at}.examples")
            self.choice(split, "evaluationRows", f"{at}.evaluationRows", EVALUATION_ROWS)
            values = split.get("values")
            if not isinstance(values, list) or not values:
                self.add(f"{at}.values", "must be a non-empty list, one value per repeat")
                continue
            for i, v in enumerate(values):
                self.value(v, f"{at}.values[{i}]")
            if self.repeats is None:
                self.repeats = (name, len(values))
            elif len(values) != self.repeats[1]:
                first, n = self.repeats
                self.add(f"{at}.values", f"has {len(values)} values but splits.{first}.values has {n}; "
                                         "position i in every split is the same trained model")

    def guardrails(self, guardrails):
        if not isinstance(guardrails, list):
            self.add("guardrails", "must be a list of guardrail metrics")
            return
        names = set()
        for i, guardrail in enumerate(guardrails):
            at = f"guardrails[{i}]"
            if not isinstance(guardrail, dict):
                self.add(at, "must be an object with metric, splits and margin")
                continue
            self.known(guardrail, at, ("metric", "splits", "margin"))
            metric = self.object(guardrail, "metric", f"{at}.metric") or {}
            self.known(metric, f"{at}.metric", ("name", "goal", "kind", "best", "unit"))
            self.text(metric, "name", f"{at}.metric.name", 100)
            if metric.get("name") in names:
                self.add(f"{at}.metric.name", f"repeats the guardrail name {metric['name']!r}")
            names.add(metric.get("name"))
            for key, allowed in (("goal", ("minimize", "maximize")), ("kind", ("proportion", "continuous"))):
                if key not in metric:
                    self.add(f"{at}.metric.{key}", "is required")
                self.choice(metric, key, f"{at}.metric.{key}", allowed)
            if "margin" in guardrail and not (_is_num(guardrail["margin"]) and guardrail["margin"] >= 0):
                self.add(f"{at}.margin", f"must be a number >= 0 in the metric's units (got {guardrail['margin']!r})")
            splits = self.object(guardrail, "splits", f"{at}.splits") or {}
            self.known(splits, f"{at}.splits", ("validation", "test"))
            if "validation" not in splits:
                self.add(f"{at}.splits.validation", "is required")
            for name, split in splits.items():
                where = f"{at}.splits.{name}"
                values = split.get("values") if isinstance(split, dict) else None
                if not isinstance(values, list) or not values or not all(_is_num(v) for v in values):
                    self.add(f"{where}.values", "must be a non-empty list of numbers, one per repeat")
                elif metric.get("kind") == "proportion" and not all(0 <= v <= 1 for v in values):
                    self.add(f"{where}.values", "must be within [0, 1] for a proportion guardrail")

    def cost(self, cost):
        self.known(cost, "cost", COST_LISTS + COST_NUMBERS)
        for key in COST_LISTS:
            values = cost.get(key)
            if key in cost and not (isinstance(values, list) and values
                                    and all(_is_num(v) and v > 0 for v in values)):
                self.add(f"cost.{key}", "must be a non-empty list of positive numbers, one per repeat")
        for key in COST_NUMBERS:
            if key in cost and not (_is_num(cost[key]) and cost[key] > 0):
                self.add(f"cost.{key}", f"must be a positive number (got {cost[key]!r})")

    def curves(self, curves):
        self.known(curves, "curves", CURVE_NAMES + ("sources",))
        sources = self.object(curves, "sources", "curves.sources") or {}
        self.known(sources, "curves.sources", CURVE_NAMES)
        for name in sources:
            self.choice(sources, name, f"curves.sources.{name}", CURVE_SOURCES)
        for name in CURVE_NAMES:
            points = curves.get(name)
            if points is None:
                continue
            if not isinstance(points, list) or not points:
                self.add(f"curves.{name}", "must be a non-empty list of points")
                continue
            previous = None
            for i, point in enumerate(points):
                previous = self.point(name, i, point, previous)

    def point(self, name, i, point, previous):
        """Checks one curve point; returns its x for the next point's comparison."""
        at = f"curves.{name}[{i}]"
        if not isinstance(point, dict):
            self.add(at, "must be an object with x and validation")
            return previous
        self.known(point, at, ("x", "train", "validation"))
        for key in ("x", "validation"):
            if key not in point:
                self.add(f"{at}.{key}", "is required")
        for key in ("train", "validation"):
            if key in point:
                self.value(point[key], f"{at}.{key}")
        x = point.get("x")
        if not _is_num(x):
            if "x" in point:
                self.add(f"{at}.x", f"must be a number (got {x!r})")
            return previous
        if name in ("regularization", "training_examples") and x <= 0:
            self.add(f"{at}.x", f"must be > 0 for the {name} curve (got {x!r})")
        if previous is not None and not x > previous:
            self.add(f"{at}.x", f"must be greater than the previous x ({previous!r}); "
                                "sort the points by x and drop duplicates")
        return x

    def slices(self, slices):
        if not isinstance(slices, list):
            self.add("slices", "must be a list")
            return
        names = {}
        for i, item in enumerate(slices):
            at = f"slices[{i}]"
            if not isinstance(item, dict):
                self.add(at, "must be an object")
                continue
            self.known(item, at, ("name", "examples", "train", "validation"))
            name = item.get("name")
            if not isinstance(name, str) or not name:
                self.add(f"{at}.name", f"must be a non-empty string (got {name!r})")
            elif name in names:
                self.add(f"{at}.name", f"must be unique (also at slices[{names[name]}].name)")
            else:
                names[name] = i
            self.count(item, "examples", f"{at}.examples")
            if "validation" not in item:
                self.add(f"{at}.validation", "is required")
            for key in ("train", "validation"):
                if key in item:
                    self.value(item[key], f"{at}.{key}")

    def predictions(self, predictions, splits):
        self.known(predictions, "predictions", ("split", "path", "aggregate", "repeat"))
        split = predictions.get("split")
        if split not in SPLIT_NAMES:
            self.add("predictions.split", f"must be one of {', '.join(SPLIT_NAMES)} (got {split!r})")
        elif split not in splits:
            self.add("predictions.split", f"names splits.{split}, which the artifact does not have")
        path = predictions.get("path")
        if not isinstance(path, str) or not path:
            self.add("predictions.path", "must be a non-empty string")
        elif path.startswith(("/", "\\")) or _DRIVE.match(path) or ".." in re.split(r"[\\/]", path):
            self.add("predictions.path",
                     f"must be a relative path inside the artifact's folder (got {path!r})")
        self.choice(predictions, "aggregate", "predictions.aggregate", AGGREGATES)
        repeat = predictions.get("repeat", 0)
        if isinstance(repeat, bool) or not isinstance(repeat, int) or repeat < 0:
            self.add("predictions.repeat", f"must be a whole number >= 0 (got {repeat!r})")
        elif self.repeats is not None and repeat >= self.repeats[1]:
            self.add("predictions.repeat", f"is {repeat} but the splits have {self.repeats[1]} repeats "
                                           "(counted from 0)")


def write_artifact(doc, path):
    """Check ``doc`` (see `check_artifact`) and write it as JSON to ``path``; returns ``path``.
    Raises `ArtifactError` naming every field that fails."""
    doc = _plain(doc, "artifact")
    issues = check_artifact(doc)
    if issues:
        raise ArtifactError(issues, _validate_note(path))
    text = json.dumps(doc, indent=2, allow_nan=False, ensure_ascii=False) + "\n"
    folder = os.path.dirname(os.path.abspath(path))
    os.makedirs(folder, exist_ok=True)
    partial = f"{path}.partial"
    with open(partial, "w", encoding="utf-8", newline="\n") as out:
        out.write(text)
    os.replace(partial, path)
    return path


def value_from_examples(*, goal, kind, correct=None, loss=None, aggregate="mean", path="predictions"):
    """The split value that per-example values give, by fitgap's rule. Returns ``(value, n)``.

    Proportion metrics take ``correct`` (1 right, 0 wrong): a minimized metric is the error rate
    (share of ``correct == 0``), a maximized one the accuracy (share of ``correct == 1``).
    Continuous metrics take ``loss`` (lower is better per example) and a minimized metric:
    ``mean`` (MAE, log loss, squared error), ``rmse`` (root of the mean; ``loss`` then holds squared
    errors) or ``sum``."""
    if kind == "proportion":
        if correct is None or loss is not None:
            _fail(path, "a proportion metric takes correct=[1 or 0 per example], not loss")
        values = _plain(correct, f"{path}.correct")
        values = values if isinstance(values, list) else [values]
        for i, c in enumerate(values):
            if c not in (0, 1):
                _fail(f"{path}.correct[{i}]", f"must be 1 (right) or 0 (wrong) (got {c!r})")
        if not values:
            _fail(f"{path}.correct", "needs at least one example")
        wrong = sum(1 for c in values if c == 0)
        n = len(values)
        return (wrong / n if goal == "minimize" else (n - wrong) / n), n
    if loss is None or correct is not None:
        _fail(path, "a continuous metric takes loss=[one value per example], not correct")
    if goal != "minimize":
        _fail(path, "per-example loss reproduces a minimized metric only (MAE, RMSE, log loss); "
                    "declare such a metric for the predictions, or leave them out")
    if aggregate not in AGGREGATES:
        _fail(f"{path}.aggregate", f"must be one of {', '.join(AGGREGATES)} (got {aggregate!r})")
    values = _numbers(loss, f"{path}.loss")
    if not values:
        _fail(f"{path}.loss", "needs at least one example")
    expected = "a finite number >= 0 (a squared error)" if aggregate == "rmse" else "a finite number"
    for i, v in enumerate(values):
        if not math.isfinite(v) or (aggregate == "rmse" and v < 0):
            _fail(f"{path}.loss[{i}]", f"must be {expected} (got {v!r})")
    total = math.fsum(values)
    n = len(values)
    return {"mean": total / n, "rmse": math.sqrt(total / n), "sum": total}[aggregate], n


def _tolerance(value, tolerance):
    return DEFAULT_TOLERANCE * max(1.0, abs(value)) if tolerance is None else tolerance


def _knob_name(key):
    """``logisticregression__C`` -> ``C`` (a scikit-learn pipeline parameter's own name)."""
    return str(key).rsplit("__", 1)[-1]


class Run:
    """Builder for one ``fitgap-run/1`` artifact that will be written to ``path``.

    Setters return the builder, so calls chain. Numbers may be numpy scalars or arrays; per-repeat
    values are lists with one value per repeat (seed), position i being the same trained model in
    every split."""

    def __init__(self, path, *, name, metric, goal, kind, best=None, unit=None, reference=None,
                 commit=None, created_at=None):
        if goal not in ("minimize", "maximize"):
            _fail("metric.goal", f"must be 'minimize' or 'maximize' (got {goal!r})")
        if kind not in ("proportion", "continuous"):
            _fail("metric.kind", f"must be 'proportion' or 'continuous' (got {kind!r})")
        self.path = os.fspath(path)
        run = {"name": name}
        if commit is not None:
            run["commit"] = commit
        if isinstance(created_at, _dt.datetime):
            if created_at.tzinfo is None:
                _fail("run.createdAt", "give a timezone-aware datetime, e.g. datetime.now(timezone.utc)")
            created_at = created_at.isoformat()
        if created_at is not None:
            run["createdAt"] = created_at
        metric = {"name": metric, "goal": goal, "kind": kind}
        if best is not None:
            metric["best"] = _number(best, "metric.best")
        if unit is not None:
            metric["unit"] = unit
        self._doc = {"format": FORMAT, "run": run, "metric": metric, "splits": {}}
        if reference is not None:
            self.set_reference(reference)
        self._predictions = None  # _Predictions of the last write_predictions

    @property
    def kind(self):
        return self._doc["metric"]["kind"]

    @property
    def goal(self):
        return self._doc["metric"]["goal"]

    def set_reference(self, value):
        """Baseline level of performance in metric units (human-level, a prior system, estimated
        Bayes error); the same level for baseline and candidate."""
        self._doc["reference"] = _number(value, "reference")
        return self

    def set_split(self, name, values, *, examples=None, evaluation_rows=None):
        """One value per repeat for split ``name`` (train, train_dev, validation, test).
        ``evaluation_rows``: ``"fixed"`` (every repeat scored the same rows, the default) or
        ``"per-repeat"`` (each seed drew its own rows)."""
        at = f"splits.{name}"
        if name not in SPLIT_NAMES:
            _fail(at, f"is not a split name (use one of {', '.join(SPLIT_NAMES)})")
        split = {"values": _numbers(values, f"{at}.values")}
        if examples is not None:
            split["examples"] = _count(examples, f"{at}.examples")
        if evaluation_rows is not None:
            if evaluation_rows not in EVALUATION_ROWS:
                _fail(f"{at}.evaluationRows",
                      f"must be one of {', '.join(EVALUATION_ROWS)} (got {evaluation_rows!r})")
            split["evaluationRows"] = evaluation_rows
        self._doc["splits"][name] = split
        return self

    def add_guardrail(self, name, *, goal, kind, validation, examples=None, test=None,
                      test_examples=None, margin=None, best=None, unit=None):
        """A metric that must not get worse by more than ``margin`` (its units): calibration
        error, a fairness gap, latency. ``validation`` and ``test``: one value per repeat.
        Without a margin (here or in the config) it is reported but never gates."""
        at = f"guardrails[{len(self._doc.get('guardrails', []))}]"
        metric = {"name": name, "goal": goal, "kind": kind}
        if best is not None:
            metric["best"] = _number(best, f"{at}.metric.best")
        if unit is not None:
            metric["unit"] = unit
        splits = {}
        for split, values, count in (("validation", validation, examples), ("test", test, test_examples)):
            if values is None:
                continue
            splits[split] = {"values": _numbers(values, f"{at}.splits.{split}.values")}
            if count is not None:
                splits[split]["examples"] = _count(count, f"{at}.splits.{split}.examples")
        guardrail = {"metric": metric, "splits": splits}
        if margin is not None:
            guardrail["margin"] = _number(margin, f"{at}.margin")
        self._doc.setdefault("guardrails", []).append(guardrail)
        return self

    def set_cost(self, *, train_seconds=None, inference_ms=None, parameters=None, memory_mb=None):
        """What the run cost: training seconds and inference milliseconds per repeat, the number
        of trained parameters, peak memory in megabytes. Only the fields given are written."""
        cost = self._doc.setdefault("cost", {})
        for key, values in (("trainSeconds", train_seconds), ("inferenceMs", inference_ms)):
            if values is not None:
                cost[key] = _numbers(values, f"cost.{key}")
        for key, value in (("parameters", parameters), ("memoryMb", memory_mb)):
            if value is not None:
                cost[key] = _number(value, f"cost.{key}")
        return self

    def set_hyperparameters(self, values=None, *, inverse=(), **more):
        """Merge hyperparameters (free-form; numbers are compared between runs). numpy values and
        tuples (``hidden_layer_sizes``) become JSON numbers and lists. Knobs where smaller means
        stronger regularization (``C``, or names in ``inverse``) are listed under ``inverse_knobs``."""
        merged = dict(values or {}, **more)
        self._hyperparameters().update(_plain(merged, "hyperparameters"))
        self._mark_inverse([k for k in merged if _knob_name(k) in INVERSE_KNOBS] + list(inverse))
        return self

    def _hyperparameters(self):
        return self._doc.setdefault("hyperparameters", {})

    def _mark_inverse(self, keys):
        if keys:
            target = self._hyperparameters()
            target[INVERSE_KNOBS_KEY] = sorted(set(target.get(INVERSE_KNOBS_KEY, [])) | set(keys))

    def add_slice(self, name, validation, *, train=None, examples=None):
        """A named subset of the data. ``validation`` and ``train`` are a number or one value per
        repeat; per-repeat values are averaged (the mean over repeats is what the slice reports)."""
        at = f"slices[{len(self._doc.get('slices', []))}]"
        item = {"name": str(name)}
        if examples is not None:
            item["examples"] = _count(examples, f"{at}.examples")
        if train is not None:
            item["train"] = _mean(train, f"{at}.train")
        item["validation"] = _mean(validation, f"{at}.validation")
        self._doc.setdefault("slices", []).append(item)
        return self

    def add_slices_from_frame(self, frame, by, *, column=None, train_frame=None, aggregate="mean"):
        """One slice per value of column ``by``, like ``frame.groupby(by)``: each slice's value comes
        from the per-example ``column`` (default ``correct`` for a proportion metric, ``loss``
        otherwise) by the rule of `value_from_examples`; ``examples`` counts its rows. ``frame`` is a
        pandas DataFrame or a dict of columns (one repeat's examples); rows whose key is missing are
        left out. ``train_frame`` (same columns, training examples) adds each slice's train value."""
        column = column or ("correct" if self.kind == "proportion" else "loss")
        groups = _groups(frame, by, column, "frame")
        train_groups = {} if train_frame is None else _groups(train_frame, by, column, "train_frame")
        for key in _sorted_keys(groups):
            train = train_groups.get(key)
            self.add_slice(
                str(key), self._from_examples(groups[key], aggregate, f"slice {key!r}"),
                train=None if train is None else self._from_examples(train, aggregate, f"slice {key!r}"),
                examples=len(groups[key]))
        return self

    def _from_examples(self, values, aggregate, path):
        key = "correct" if self.kind == "proportion" else "loss"
        return value_from_examples(goal=self.goal, kind=self.kind, aggregate=aggregate, path=path,
                                   **{key: values})[0]

    def set_curve(self, name, x, validation, *, train=None, source="held-out", knob=None,
                  inverse=None):
        """A curve: ``x`` with the validation (and optional train) value at each point, in metric
        units. ``source``: ``held-out`` (scored on a held-out split) or ``cross-validation`` (folds
        inside the training set). ``knob``: the hyperparameter that x sweeps, in its own units
        (``C`` for a regularization curve over C); an inverse knob (``C`` or ``inverse=True``) is
        listed under ``inverse_knobs``."""
        at = f"curves.{name}"
        if name not in CURVE_NAMES:
            _fail(at, f"is not a curve name (use one of {', '.join(CURVE_NAMES)})")
        if source not in CURVE_SOURCES:
            _fail(f"curves.sources.{name}", f"must be one of {', '.join(CURVE_SOURCES)} (got {source!r})")
        xs = _numbers(x, f"{at}.x")
        columns = {"train": train, "validation": validation}
        columns = {k: _numbers(v, f"{at}.{k}") for k, v in columns.items() if v is not None}
        for key, values in columns.items():
            if len(values) != len(xs):
                _fail(f"{at}.{key}", f"has {len(values)} values for {len(xs)} x values")
        points = [dict({"x": xi}, **{k: v[i] for k, v in columns.items()}) for i, xi in enumerate(xs)]
        curves = self._doc.setdefault("curves", {})
        curves[name] = points
        curves.setdefault("sources", {})[name] = source
        if knob is not None:
            self._hyperparameters().setdefault(CURVE_KNOBS_KEY, {})[name] = str(knob)
            if inverse or (inverse is None and _knob_name(knob) in INVERSE_KNOBS):
                self._mark_inverse([str(knob)])
        return self

    def write_predictions(self, ids, *, correct=None, loss=None, split="validation", repeat=0,
                          aggregate=None, tolerance=None, filename=None):
        """Check per-example values, then write them as CSV next to the artifact and point
        ``predictions`` at them. Returns the CSV's path.

        Write the predictions of one trained model, the one at position ``repeat`` (0-based) of
        the split's values, and only when they reproduce that value (`value_from_examples`) within
        ``tolerance`` (default 1e-6 x max(1, |value|)). ``ids`` name the examples (unique, no commas,
        the same ids in baseline and candidate so that rows pair). Sets the split's ``examples``
        when it is missing."""
        target = self._doc["splits"].get(split)
        if target is None:
            _fail(f"splits.{split}", "must be set (set_split) before its predictions are written")
        last = len(target["values"]) - 1
        if isinstance(repeat, bool) or not isinstance(repeat, int) or not 0 <= repeat <= last:
            _fail("predictions.repeat",
                  f"must be a position in splits.{split}.values (0 to {last}), got {repeat!r}")
        proportion = self.kind == "proportion"
        if proportion and aggregate is not None:
            _fail("predictions.aggregate", "applies to a continuous metric's loss; leave it out")
        if proportion and self.goal == "maximize" and self._doc["metric"].get("best", 1) != 1:
            _fail("metric.best", "must be 1 for predictions of a maximized proportion (accuracy)")
        aggregate = None if proportion else aggregate or "mean"
        value, n = value_from_examples(goal=self.goal, kind=self.kind, correct=correct, loss=loss,
                                       aggregate=aggregate or "mean")
        rows = _id_strings(ids, "predictions")
        if len(rows) != n:
            _fail("predictions.ids", f"has {len(rows)} ids for {n} per-example values")
        if target.get("examples", n) != n:
            _fail(f"splits.{split}.examples", f"is {target['examples']} but the predictions have {n} rows")
        self._predictions = (split, repeat, value, n, tolerance, aggregate)
        self._check_predictions()
        target.setdefault("examples", n)
        filename = filename or f"{os.path.splitext(os.path.basename(self.path))[0]}.{split}-predictions.csv"
        if os.path.basename(filename) != filename or filename in (".", ".."):
            _fail("predictions.path", f"must be a plain file name next to the artifact (got {filename!r})")
        csv_path = os.path.join(os.path.dirname(os.path.abspath(self.path)), filename)
        per_example = _plain(correct if proportion else loss, "predictions")
        _write_csv(csv_path, "correct" if proportion else "loss", rows,
                   [int(v) if proportion else float(v) for v in _as_list(per_example)])
        entry = {"split": split, "path": filename}
        if aggregate is not None:
            entry["aggregate"] = aggregate
        entry["repeat"] = repeat
        self._doc["predictions"] = entry
        return csv_path

    def _check_predictions(self):
        if self._predictions is None:
            return
        split, repeat, value, n, tolerance, aggregate = self._predictions
        values = self._doc["splits"].get(split, {}).get("values", [])
        at = f"splits.{split}.values[{repeat}]"
        stated = values[repeat] if repeat < len(values) else None
        if not _is_num(stated) or not math.isfinite(stated):
            _fail(at, f"must be a finite number for the predictions of repeat {repeat} (got {stated!r})")
        allowed = _tolerance(stated, tolerance)
        if abs(value - stated) <= allowed:
            return
        if aggregate is None:
            rule = "error rate" if self.goal == "minimize" else "accuracy"
        else:
            rule = f"{aggregate} of loss"
        others = [i for i, v in enumerate(values) if i != repeat and _is_num(v)
                  and abs(value - v) <= _tolerance(v, tolerance)]
        hint = (f"They match repeat {others[0]}: pass repeat={others[0]}." if others
                else "Write the predictions of the model that produced that value.")
        _fail(at, f"is {stated!r} but the {n} per-example values give {value!r} ({rule}; "
                  f"tolerance {allowed:g}). {hint}")

    def to_dict(self):
        """The artifact as a JSON-ready dict (a copy, keys in the schema's order; unchecked)."""
        return _ordered(json.loads(json.dumps(self._doc)))

    def check(self):
        """``(path, message)`` pairs for every cheap check that fails (see `check_artifact`)."""
        issues = check_artifact(self._doc)
        try:
            self._check_predictions()
        except ArtifactError as error:
            issues.extend(error.issues)
        return issues

    def write(self):
        """Check and write the artifact to its path (JSON, no NaN); returns the path. Raises
        `ArtifactError` naming each failing field. ``npx fitgap validate PATH`` runs the rest."""
        issues = self.check()
        if issues:
            raise ArtifactError(issues, _validate_note(self.path))
        return write_artifact(self.to_dict(), self.path)


def _validate_note(path):
    return f"nothing written; once fixed, `npx fitgap validate {path}` runs the full schema"


def _ordered(doc):
    """Keys in the order of the schema, so artifacts read alike and diff well."""
    out = {key: doc[key] for key in TOP_LEVEL_KEYS if key in doc}
    splits = out.get("splits", {})
    for split in splits.values():
        ordered = {key: split[key] for key in ("examples", "values", "evaluationRows") if key in split}
        split.clear()
        split.update(ordered)
    if "splits" in out:
        out["splits"] = {key: splits[key] for key in SPLIT_NAMES if key in splits}
    curves = out.get("curves")
    if curves is not None:
        out["curves"] = {key: curves[key] for key in CURVE_NAMES + ("sources",) if key in curves}
    return out


def _as_list(value):
    return value if isinstance(value, list) else [value]


def _write_csv(path, column, ids, values):
    os.makedirs(os.path.dirname(path), exist_ok=True)
    with open(path, "w", encoding="utf-8", newline="\n") as out:
        out.write(f"id,{column}\n")
        for row_id, v in zip(ids, values):
            out.write(f"{row_id},{v!r}\n")


def _id_strings(ids, path):
    out, seen = [], {}
    for i, raw in enumerate(_as_list(_plain(ids, f"{path}.ids"))):
        at = f"{path}.ids[{i}]"
        if isinstance(raw, (dict, list, bool)) or raw is None:
            _fail(at, f"must be a string or a number (got {raw!r})")
        text = str(raw)
        if not text or text != text.strip() or any(c in text for c in ",\r\n"):
            _fail(at, f"must be non-empty, without commas, line breaks or surrounding spaces (got {text!r})")
        if text in seen:
            _fail(at, f"repeats the id {text!r} (also at ids[{seen[text]}]); ids must be unique")
        seen[text] = i
        out.append(text)
    return out


def _column(frame, name, where):
    try:
        column = frame[name]
    except (KeyError, IndexError, TypeError):
        _fail(where, f"has no column {name!r}")
    return _as_list(_plain(column, f"{where}[{name!r}]"))


def _groups(frame, by, column, where):
    keys = _column(frame, by, where)
    values = _column(frame, column, where)
    if len(keys) != len(values):
        _fail(where, f"columns {by!r} and {column!r} differ in length")
    groups = {}
    for key, v in zip(keys, values):
        if key is None or (isinstance(key, float) and math.isnan(key)):
            continue
        groups.setdefault(key, []).append(v)
    return groups


def _sorted_keys(groups):
    try:
        return sorted(groups)
    except TypeError:
        return sorted(groups, key=str)
