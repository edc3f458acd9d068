"""nlnorm: explicit, auditable intervals for the time phrases of work-tracker questions.

>>> from nlnorm import Context, normalize
>>> ctx = Context.at("2026-12-02T10:00", tz="Europe/Berlin")
>>> normalize("bugs closed since March", ctx).mentions[0].value
'2026-03-01/..'

The names below are imported on first use (PEP 562), so ``import nlnorm`` and the command
line start fast.
"""

from __future__ import annotations

import importlib
from typing import TYPE_CHECKING, Any

__all__ = [
    "Context",
    "normalize",
    "normalize_many",
    "STAGES",
    "prepare",
    "scan",
    "parse",
    "resolve",
    "annotate",
    "Result",
    "Mention",
    "Alternative",
    "Template",
    "Slot",
    "NlnormError",
    "ContextError",
    "LocaleError",
    "InputError",
]

__version__ = "0.1.0"

_WHERE = {
    "Context": "context",
    "normalize": "pipeline",
    "normalize_many": "pipeline",
    "STAGES": "pipeline",
    "prepare": "pipeline",
    "scan": "pipeline",
    "parse": "pipeline",
    "resolve": "pipeline",
    "annotate": "pipeline",
    "Result": "schema",
    "Mention": "schema",
    "Alternative": "schema",
    "Template": "schema",
    "Slot": "schema",
    "NlnormError": "errors",
    "ContextError": "errors",
    "LocaleError": "errors",
    "InputError": "errors",
}


def __getattr__(name: str) -> Any:
    module = _WHERE.get(name)
    if module is None:
        raise AttributeError(f"module 'nlnorm' has no attribute {name!r}")
    value = getattr(importlib.import_module(f".{module}", __name__), name)
    globals()[name] = value
    return value


def __dir__() -> list[str]:
    return sorted(list(globals()) + __all__)


if TYPE_CHECKING:
    from .context import Context
    from .errors import ContextError, InputError, LocaleError, NlnormError
    from .pipeline import STAGES, annotate, normalize, normalize_many, parse, prepare, resolve, scan
    from .schema import Alternative, Mention, Result, Slot, Template
