"""Write ``fitgap-run/1`` run artifacts from Python training code (see ``run.py``).

The core lives in ``fitgap_run/run.py``, which stands alone: copy it as ``fitgap_run.py`` to use it
without installing. scikit-learn helpers are in ``fitgap_run.from_sklearn`` (no import of
scikit-learn itself).
"""

from .from_sklearn import (
    add_learning_curve,
    add_search_curve,
    add_validation_curve,
    estimator_hyperparameters,
    is_negated_scorer,
    scores_to_metric,
)
from .run import (
    FORMAT,
    INVERSE_KNOBS,
    ArtifactError,
    Run,
    check_artifact,
    value_from_examples,
    write_artifact,
)

__version__ = "0.1.0"

__all__ = [
    "FORMAT",
    "INVERSE_KNOBS",
    "ArtifactError",
    "Run",
    "add_learning_curve",
    "add_search_curve",
    "add_validation_curve",
    "check_artifact",
    "estimator_hyperparameters",
    "is_negated_scorer",
    "scores_to_metric",
    "value_from_examples",
    "write_artifact",
]
