"""Every fragment is SQL its dialect parses, and leaves the column bare (sargable).

For every dialect, column kind (with each SQLite encoding, and a local column in another zone),
style (bound parameters in each PEP 249 paramstyle, and literal SQL) and a set of invented
Wrenfold questions (a closed range, one open at its start, one open at its end, and two
mentions in one statement, one open at each side), the fragments are put into
``SELECT ... WHERE (f1) AND (f2)`` and parsed.

Checked against:
- sqlglot's parser (sqlglot 30.x, ``sqlglot.parse_one(sql, read=dialect)``): the statement
  parses in the fragment's dialect; in its expression tree every comparison is ``>=``, ``<`` or
  ``IN``, has the declared column, bare, on its left, and no column on its right; no column
  appears anywhere else (inside a function or cast);
- sqlglot's typing of literals: a literal bound of a ``date`` column is read as a DATE, of a
  ``local`` or ``utc`` column as a timestamp without zone, of an ``instant`` column as a
  timestamp with zone. MySQL is the exception sqlglot cannot see: MySQL's ``TIMESTAMP 'str'``
  literal gives a DATETIME value (MySQL Reference Manual, "Date and Time Literals"), while
  sqlglot types MySQL's TIMESTAMP as its column type, which holds an instant (TIMESTAMPTZ);
- PEP 249 (paramstyles): the placeholders are the ones its paramstyle names, one per value.
"""

from __future__ import annotations

import re
from collections.abc import Iterator
from dataclasses import dataclass
from typing import Any

import pytest
import sqlglot
from sqlglot import exp

from nlnorm import Context, Result, normalize
from nlnorm.calendars.sprints import SprintCalendar
from nlnorm.sql import DIALECTS, PARAMSTYLES, Column, Fragment, predicates, quoted_name

CTX = Context.at("2026-12-02T10:00", tz="Europe/Berlin")

#: Invented questions, by what their periods look like: (question, bounds per mention).
QUESTIONS: dict[str, tuple[str, tuple[int, ...]]] = {
    "closed range": ("which WRN bugs were created last week", (2,)),
    "closed range of dates": ("releases between 1 March and 15 April 2026", (2,)),
    "open start": ("bugs Marisol Quennell filed before 2026-11-02", (1,)),
    "open end": ("tickets closed since March", (1,)),
    "one open at each side": ("tickets opened since Monday and closed before today", (1, 1)),
}


def _columns(dialect: str) -> Iterator[Column]:
    if dialect == "sqlite":
        for kind in ("date", "local", "utc"):
            for encoding in ("text", "text-t"):
                yield Column("created_at", kind, encoding=encoding)  # type: ignore[arg-type]
        yield Column("created_at", "instant", encoding="unix")
        yield Column("created_at", "instant", encoding="julian")
    else:
        for kind in ("date", "local", "utc", "instant"):
            yield Column("created_at", kind)  # type: ignore[arg-type]
    yield Column("issues.created_at", "local", zone="America/New_York")


def _label(col: Column) -> str:
    return "-".join(x for x in (col.name, col.kind, col.encoding, col.zone) if x)


STYLES = [*PARAMSTYLES, "literal"]
CASES = [pytest.param(d, col, style, q, id=f"{d}-{_label(col)}-{style}-{q}")
         for d in DIALECTS for col in _columns(d) for style in STYLES for q in QUESTIONS]

# A DB-API placeholder is the driver's syntax, not SQL: the driver replaces it before the
# database sees the statement. Each one the fragment uses is replaced with "?", a placeholder
# sqlglot parses in every one of the eight dialects, before parsing.
_PLACEHOLDER = {
    "qmark": re.compile(r"\?"),
    "numeric": re.compile(r"(?<![:\w]):([0-9]+)(?!\w)"),
    "named": re.compile(r"(?<![:\w]):([A-Za-z_]\w*)"),
    "format": re.compile(r"%s"),
    "pyformat": re.compile(r"%\(([A-Za-z_]\w*)\)s"),
}


def as_parsable(fragment: Fragment, first_index: int) -> str:
    """The fragment's SQL with its placeholders replaced by "?", after checking they are the
    ones its paramstyle writes, one per bound value, in order."""
    if fragment.paramstyle is None:
        assert fragment.params == ()
        return fragment.where
    pattern = _PLACEHOLDER[fragment.paramstyle]
    found = list(pattern.finditer(fragment.where))
    assert len(found) == len(fragment.params), fragment
    if fragment.paramstyle in ("named", "pyformat"):
        assert isinstance(fragment.params, dict)
        assert [m.group(1) for m in found] == list(fragment.params), fragment
    if fragment.paramstyle == "numeric":
        assert [int(m.group(1)) for m in found] == list(
            range(first_index, first_index + len(found))), fragment
    return pattern.sub("?", fragment.where)


def statement(fragments: dict[str, Fragment]) -> str:
    """``SELECT ... WHERE`` over the fragments in slot order, placeholders made parsable."""
    parts: list[str] = []
    index = 1
    for f in fragments.values():
        parts.append(f"({as_parsable(f, index)})")
        index += len(f.params)
    return "SELECT id FROM issues WHERE " + " AND ".join(parts)


_COMPARISONS = (exp.GTE, exp.GT, exp.LT, exp.LTE, exp.EQ, exp.NEQ, exp.In, exp.Between)


@dataclass(frozen=True)
class Comparison:
    op: type[exp.Expression]
    column: exp.Column
    value: exp.Expression


def comparisons(sql: str, dialect: str) -> list[Comparison]:
    """The comparisons of the statement's WHERE, parsed by sqlglot, each checked to hold a bare
    column on its left and no column on its right, and every column to stand in one."""
    tree = sqlglot.parse_one(sql, read=dialect)
    where = tree.find(exp.Where)
    assert where is not None, sql
    out: list[Comparison] = []
    for node in where.find_all(*_COMPARISONS):
        assert isinstance(node, (exp.GTE, exp.LT, exp.In)), f"{type(node).__name__} in {sql}"
        left = node.this
        assert isinstance(left, exp.Column), f"the left side is {left.sql(dialect)}, not a bare column: {sql}"
        right: list[exp.Expression] = list(node.expressions) if isinstance(node, exp.In) else [node.expression]
        for value in right:
            assert value.find(exp.Column) is None, f"a column among the values: {sql}"
        out.append(Comparison(type(node), left, right[0]))
    for column in where.find_all(exp.Column):
        assert isinstance(column.parent, (exp.GTE, exp.LT, exp.In)) and column.parent.this is column, \
            f"{column.sql(dialect)} is wrapped in {type(column.parent).__name__}: {sql}"
    return out


def _types(value: exp.Expression) -> set[exp.DataType.Type]:
    return {dt.this for dt in value.find_all(exp.DataType)}


T = exp.DataType.Type
_NAIVE = {T.TIMESTAMP, T.TIMESTAMPNTZ, T.DATETIME, T.DATETIME2}


def check_literal_type(value: exp.Expression, col: Column, dialect: str) -> None:
    """The literal's type as sqlglot reads it fits the column kind (see the module docstring)."""
    if dialect == "sqlite":  # no date types: text, or numbers for unix and julian
        assert isinstance(value, exp.Literal)
        assert value.is_string == (col.sqlite_encoding() in ("text", "text-t"))
        return
    types = _types(value)
    if col.kind == "date":
        assert types == {T.DATE}, value.sql(dialect)
    elif col.kind in ("local", "utc"):
        expected = {T.TIMESTAMPTZ} if dialect == "mysql" else _NAIVE
        assert types and types <= expected, value.sql(dialect)
    elif dialect == "mysql":
        assert isinstance(value, exp.ConvertTimezone), value.sql(dialect)
    else:
        assert types == {T.TIMESTAMPTZ}, value.sql(dialect)


def _fragments(result: Result, col: Column, dialect: str, style: str) -> dict[str, Fragment]:
    if style == "literal":
        return predicates(result, col, dialect, style="literal")
    return predicates(result, col, dialect, paramstyle=style)


@pytest.mark.parametrize("dialect,col,style,question", CASES)
def test_fragment_parses_with_a_bare_column_on_the_left(dialect: str, col: Column, style: str,
                                                        question: str) -> None:
    text, bounds = QUESTIONS[question]
    result = normalize(text, CTX)
    fragments = _fragments(result, col, dialect, style)
    assert [len(f.where.split(" AND ")) for f in fragments.values()] == list(bounds)
    sql = statement(fragments)
    found = comparisons(sql, dialect)
    assert len(found) == sum(bounds), sql
    name = quoted_name(col.name, dialect)
    for c in found:
        assert c.op in (exp.GTE, exp.LT), sql
        assert c.column.sql(dialect=dialect) == name, sql
        if style == "literal":
            check_literal_type(c.value, col, dialect)
        else:
            assert c.value.find(exp.Placeholder) is not None, sql


SPRINTS = SprintCalendar.from_csv(text="name,number,start,end,team\n"
                                       "Oxbeck,46,2026-10-05,2026-10-16,Wrenfold\n"
                                       "Tarnwell,47,2026-10-19,2026-10-30,Wrenfold\n"
                                       "Skelmoor,48,2026-11-09,2026-11-20,Wrenfold\n"
                                       "Brackenrill,49,2026-11-23,2026-12-04,Wrenfold\n")


@pytest.mark.parametrize("style", STYLES)
@pytest.mark.parametrize("dialect", DIALECTS)
def test_sprint_key_predicate_parses_as_a_bare_column_in_a_list(dialect: str, style: str) -> None:
    ctx = Context.at("2026-12-02T10:00", tz="Europe/Berlin", sprints=SPRINTS)
    result = normalize("what slipped from the last 3 sprints", ctx)
    kwargs: dict[str, Any] = {"sprint_key": "sprint_id", "sprints": SPRINTS}
    if style == "literal":
        fragments = predicates(result, "resolved_at", dialect, style="literal", **kwargs)
    else:
        fragments = predicates(result, "resolved_at", dialect, paramstyle=style, **kwargs)
    sql = statement(fragments)
    (found,) = comparisons(sql, dialect)
    assert found.op is exp.In and found.column.name == "sprint_id", sql
    values = sqlglot.parse_one(sql, read=dialect).find(exp.In).expressions  # type: ignore[union-attr]
    if style == "literal":
        assert [v.sql(dialect=dialect) for v in values] == ["46", "47", "48"]
    else:
        assert len(values) == 3 and all(isinstance(v, exp.Placeholder) for v in values)


def test_the_placeholder_check_refuses_a_fragment_whose_placeholders_do_not_match() -> None:
    wrong = Fragment("postgres", "created_at >= %(t1_start)s", {"t1_end": 1}, "pyformat", "t1",
                     "created_at")
    with pytest.raises(AssertionError):
        as_parsable(wrong, 1)


def test_the_tree_check_refuses_a_wrapped_column() -> None:
    with pytest.raises(AssertionError, match="not a bare column"):
        comparisons("SELECT id FROM issues WHERE DATE(created_at) >= ?", "postgres")
    with pytest.raises(AssertionError):
        comparisons("SELECT id FROM issues WHERE created_at BETWEEN ? AND ?", "postgres")
