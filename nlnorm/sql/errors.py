"""The error of the SQL stage."""

from __future__ import annotations

from ..errors import NlnormError

__all__ = ["SqlError"]


class SqlError(NlnormError, ValueError):
    """A column, dialect, paramstyle or template cannot give a safe, correct predicate."""
