"""Errors raised by nlnorm.

Every error derives from :class:`NlnormError` and, where one fits, from the builtin it narrows,
so ``except ValueError`` keeps working for callers that do not know nlnorm. Messages name the
input, say what was expected and suggest a fix; ``nlnorm batch`` writes ``str(error)`` into the
line's ``error`` field and goes on.
"""

from __future__ import annotations

import difflib
from collections.abc import Iterable

__all__ = [
    "NlnormError",
    "ContextError",
    "LocaleError",
    "InputError",
    "suggest",
    "closest",
]


class NlnormError(Exception):
    """Base class of every error nlnorm raises on purpose."""


class ContextError(NlnormError, ValueError):
    """The reference context (now, tz, week start, locale, policies) is not usable."""


class LocaleError(NlnormError, ValueError):
    """A locale is unknown, or a file in locales/ does not follow the format."""


class InputError(NlnormError, ValueError):
    """A question or batch line is malformed (not JSON, no text, wrong type)."""


def closest(value: str, known: Iterable[str]) -> str | None:
    """The known value closest to ``value``, if one is close enough.

    >>> closest("Europe/Berln", ["Europe/Berlin", "Europe/Bern"])
    'Europe/Berlin'
    """
    close = difflib.get_close_matches(value, list(known), n=1, cutoff=0.75)
    return close[0] if close else None


def suggest(value: str, known: Iterable[str]) -> str:
    """Return ``"; did you mean 'x'?"`` for the closest known value, or ``""``.

    >>> suggest("Europe/Berln", ["Europe/Berlin", "Europe/Bern"])
    "; did you mean 'Europe/Berlin'?"
    """
    close = closest(value, known)
    return f"; did you mean {close!r}?" if close else ""
