"""Curves and values from scikit-learn's model-selection tools, in the metric's own units.

scikit-learn scores are "higher is better": error metrics come negated (``neg_mean_squared_error``,
``neg_log_loss``, ``max_error``). These helpers turn them back into errors, turn a score such as
accuracy into the artifact's direction (error rate = 1 - accuracy for a minimized metric), record
inverse knobs (``C``: smaller is stronger regularization) and mark curves computed by
cross-validation inside the training set as ``curves.sources[name] = "cross-validation"``.

scikit-learn is not imported here: the functions read the arrays and dicts it returns.
"""

from __future__ import annotations

import math

try:
    from .run import ArtifactError, _fail, _plain
except ImportError:  # copied next to fitgap_run.py as a plain module
    from fitgap_run import ArtifactError, _fail, _plain  # type: ignore

__all__ = [
    "add_learning_curve",
    "add_search_curve",
    "add_validation_curve",
    "estimator_hyperparameters",
    "is_negated_scorer",
    "scores_to_metric",
]


def is_negated_scorer(scoring):
    """Whether a scikit-learn scorer returns an error with its sign flipped (``neg_*``, and
    ``max_error``, which keeps its name but is negated like the others)."""
    return scoring.startswith("neg_") or scoring == "max_error"


def scores_to_metric(scores, *, scoring, goal, score_best=1.0):
    """Turn scikit-learn scores (a number or any nesting of lists/arrays) into metric values.

    ``scoring`` is the scorer name given to scikit-learn (``"accuracy"`` or ``"r2"`` when the
    estimator's own ``score`` was used). A negated error scorer gives ``-score`` and needs a
    minimized metric; any other score is kept for a maximized metric and becomes
    ``score_best - score`` (1 - accuracy = error rate) for a minimized one."""
    if not isinstance(scoring, str) or not scoring:
        _fail("scoring", "name the scorer passed to scikit-learn (e.g. 'neg_root_mean_squared_error'; "
                         "'accuracy' or 'r2' when the estimator's own score method was used)")
    negated = is_negated_scorer(scoring)
    if negated and goal != "minimize":
        _fail("metric.goal", f"scorer {scoring!r} measures an error; declare the metric with goal "
                             "'minimize'")
    if negated:
        convert = lambda s: -s  # noqa: E731
    elif goal == "minimize":
        convert = lambda s: score_best - s  # noqa: E731
    else:
        convert = lambda s: s  # noqa: E731

    def walk(value):
        if isinstance(value, list):
            return [walk(item) for item in value]
        if value is None or isinstance(value, bool) or not isinstance(value, (int, float)):
            _fail("scores", f"must hold numbers (got {value!r})")
        return convert(float(value))

    return walk(_plain(scores, "scores"))


def _fold_means(scores, what):
    rows = scores if isinstance(scores, list) else [scores]
    out = []
    for i, row in enumerate(rows):
        row = row if isinstance(row, list) else [row]
        if not row or any(not math.isfinite(v) for v in row):
            _fail(f"{what}[{i}]", f"must hold a finite score per fold (got {row!r}); a NaN score is "
                                  "a failed fit (see scikit-learn's error_score)")
        out.append(math.fsum(row) / len(row))
    return out


def _curve(run, name, xs, train, validation, knob, inverse):
    order = sorted(range(len(xs)), key=lambda i: xs[i])
    for a, b in zip(order, order[1:]):
        if xs[a] == xs[b]:
            _fail(f"curves.{name}", f"has the x value {xs[a]!r} twice; fix the other parameters "
                                    "(fixed=...) so that each x is one point")
    pick = lambda values: [values[i] for i in order] if values is not None else None  # noqa: E731
    run.set_curve(name, pick(xs), pick(validation), train=pick(train), source="cross-validation",
                  knob=knob, inverse=inverse)
    return run


def add_learning_curve(run, result, *, scoring):
    """Add ``curves.training_examples`` from ``sklearn.model_selection.learning_curve(...)``'s
    result ``(train_sizes_abs, train_scores, test_scores[, fit_times, score_times])``: x is the
    number of training examples, values are the mean over folds in metric units."""
    sizes, train_scores, test_scores = list(result)[:3]
    sizes = _plain(sizes, "train_sizes")
    convert = lambda s: scores_to_metric(s, scoring=scoring, goal=run.goal)  # noqa: E731
    return _curve(run, "training_examples", sizes, _fold_means(convert(train_scores), "train_scores"),
                  _fold_means(convert(test_scores), "test_scores"), None, None)


def add_validation_curve(run, result, *, param_name, param_range, scoring, curve="regularization",
                         inverse=None):
    """Add a curve from ``sklearn.model_selection.validation_curve(...)``'s result
    ``(train_scores, test_scores)``: x is the knob's own value (``C`` itself, not 1/C), points are
    sorted by x, and an inverse knob (``C``, or ``inverse=True``) is recorded as such."""
    train_scores, test_scores = list(result)[:2]
    convert = lambda s: scores_to_metric(s, scoring=scoring, goal=run.goal)  # noqa: E731
    xs = _plain(param_range, "param_range")
    return _curve(run, curve, xs, _fold_means(convert(train_scores), "train_scores"),
                  _fold_means(convert(test_scores), "test_scores"), param_name, inverse)


def add_search_curve(run, search, *, param, scoring=None, fixed=None, curve="regularization",
                     inverse=None):
    """Add a curve over one parameter of a fitted ``GridSearchCV`` (or its ``cv_results_`` dict).

    Other parameters are held at ``fixed`` (default: the search's ``best_params_``). Train values
    come from ``mean_train_score`` when the search ran with ``return_train_score=True``. ``scoring``
    defaults to the search's own string ``scoring``; with several scorers it names the one to read
    (``mean_test_<scoring>``)."""
    results = getattr(search, "cv_results_", search)
    if scoring is None:
        scoring = getattr(search, "scoring", None)
        if not isinstance(scoring, str):  # several scorers: the one the search refitted on
            scoring = getattr(search, "refit", None)
        if not isinstance(scoring, str):
            _fail("scoring", "name the scorer the search used (e.g. scoring='accuracy')")
    if fixed is None:
        fixed = getattr(search, "best_params_", None) or {}
    suffix = "score" if "mean_test_score" in results else scoring
    if f"mean_test_{suffix}" not in results:
        _fail("cv_results_", f"has no 'mean_test_{suffix}' column; pass the scorer name it used")
    params = _plain(results["params"], "cv_results_['params']")
    test = _plain(results[f"mean_test_{suffix}"], "cv_results_")
    train_key = f"mean_train_{suffix}"
    train = _plain(results[train_key], "cv_results_") if train_key in results else None
    rows = [i for i, p in enumerate(params) if param in p
            and all(p.get(k) == v for k, v in fixed.items() if k != param and k in p)]
    if not rows:
        _fail("cv_results_", f"has no candidates with parameter {param!r} (and the fixed values)")
    xs = [params[i][param] for i in rows]
    convert = lambda s: scores_to_metric(s, scoring=scoring, goal=run.goal)  # noqa: E731
    validation = _fold_means(convert([[test[i]] for i in rows]), f"mean_test_{suffix}")
    train_values = None if train is None else _fold_means(convert([[train[i]] for i in rows]), train_key)
    return _curve(run, curve, xs, train_values, validation, param, inverse)


def estimator_hyperparameters(estimator, *, deep=False):
    """The estimator's ``get_params()`` that JSON can hold: numbers, strings, booleans, ``None`` and
    lists of those (tuples such as ``hidden_layer_sizes`` become lists). Nested estimators,
    functions, random generators and non-finite numbers are left out."""
    out = {}
    for key, value in sorted(estimator.get_params(deep=deep).items()):
        try:
            value = _plain(value, key)
        except ArtifactError:
            continue
        if _json_leaf(value) or (isinstance(value, list) and all(_json_leaf(v) for v in value)):
            out[key] = value
    return out


def _json_leaf(value):
    if isinstance(value, float):
        return math.isfinite(value)
    return value is None or isinstance(value, (str, bool, int))

