"""nlnorm: explicit, auditable intervals for the time phrases of work-tracker questions.

>>> from nlnorm import Context, normalize
>>> ctx = Context.at("2026-12-02T10:00", tz="Europe/Berlin")
>>> normalize("bugs closed since March", ctx).mentions[0].value
'2026-03-01/..'
"""

from __future__ import annotations

from .context import Context
from .errors import ContextError, InputError, LocaleError, NlnormError
from .pipeline import STAGES, annotate, normalize, normalize_many, parse, prepare, resolve, scan
from .schema import Alternative, Mention, Result, Slot, Template

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
