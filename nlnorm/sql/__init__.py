"""SQL predicate fragments for the periods a question names, in eight dialects.

>>> from nlnorm import Context, normalize
>>> from nlnorm.sql import Column, predicates
>>> ctx = Context.at("2026-12-02T10:00", tz="Europe/Berlin")
>>> r = normalize("bugs created last week", ctx)
>>> f = predicates(r, Column("created_at", "local"), "mysql", style="literal")["t1"]
>>> f.where
"created_at >= TIMESTAMP '2026-11-23 00:00:00' AND created_at < TIMESTAMP '2026-11-30 00:00:00'"

See docs/sql.md: how each column kind is compared, one worked example per dialect, and the
binding of SQL written against the template (:func:`bind`).
"""

from __future__ import annotations

from .binding import bind
from .columns import ENCODINGS, KINDS, Column
from .dialects import DIALECTS, PARAMSTYLES, Dialect, dialect, quoted_name
from .errors import SqlError
from .fragments import Fragment, placeholder, predicate, predicates

__all__ = ["Column", "Fragment", "predicate", "predicates", "bind", "SqlError", "DIALECTS",
           "PARAMSTYLES", "KINDS", "ENCODINGS", "Dialect", "dialect", "quoted_name", "placeholder"]
