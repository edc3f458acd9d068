"""Bind SQL a translator wrote against the template of a normalization result.

A model shown the template ("bugs created {t1}") writes SQL with the template's placeholders:

* ``{t1}``: the whole predicate of slot t1 over the column mapped to it;
* ``{t1:created_at}``: the same over the column named in place;
* ``:t1_start`` / ``:t1_end`` (also ``@t1_start`` or ``%(t1_start)s``): one bound value.

:func:`bind` replaces them with placeholders in the driver's paramstyle and returns the values
to bind. Placeholders inside quoted strings, quoted names and comments are left alone; an
unknown slot, or a bound the phrase does not have (the start of "until Friday"), is an error
that says which. With the ``format`` and ``pyformat`` paramstyles the SQL's own "%" signs are
doubled, as those drivers require.
"""

from __future__ import annotations

import re
from collections.abc import Callable
from datetime import datetime
from typing import Any
from zoneinfo import ZoneInfo

from .columns import Column, bound_value, iana_zone
from .dialects import Dialect, dialect as dialect_named
from .errors import SqlError
from .fragments import ColumnChoice, _as_column, _column_for, _Params, _where, bound_placeholder, placeholder

__all__ = ["bind"]

_SLOT = re.compile(r"\{(t[1-9][0-9]*)(?::([^{}\s]+))?\}")
_NAMED = re.compile(r"(?:(?<![:\w]):|@|%\()(t[1-9][0-9]*)_(start|end)(?:\)s)?(?!\w)")
_ANY = re.compile(f"{_SLOT.pattern}|{_NAMED.pattern}")  # one pass: what it writes is not read again
_BACKSLASH_ESCAPES = {"mysql", "bigquery", "spark"}


def _code_spans(sql: str, dialect_name: str) -> list[tuple[int, int]]:
    """The parts of ``sql`` outside string literals, quoted names and comments."""
    out: list[tuple[int, int]] = []
    i, start, n = 0, 0, len(sql)
    backslash = dialect_name in _BACKSLASH_ESCAPES
    while i < n:
        ch = sql[i]
        two = sql[i:i + 2]
        end = -1
        if ch in "'\"`" or (ch == "[" and dialect_name == "tsql"):
            close = "]" if ch == "[" else ch
            j = i + 1
            while j < n:
                if backslash and sql[j] == "\\" and close != "]":
                    j += 2
                    continue
                if sql[j] == close:
                    if j + 1 < n and sql[j + 1] == close:  # doubled: an escaped quote
                        j += 2
                        continue
                    break
                j += 1
            end = j + 1
        elif two == "--":
            j = sql.find("\n", i)
            end = n if j < 0 else j
        elif two == "/*":
            j = sql.find("*/", i + 2)
            end = n if j < 0 else j + 2
        elif ch == "$" and dialect_name == "postgres":
            m = re.match(r"\$([A-Za-z_]\w*)?\$", sql[i:])
            if m:
                j = sql.find(m.group(), i + len(m.group()))
                end = n if j < 0 else j + len(m.group())
        if end >= 0:
            out.append((start, i))
            start = i = min(end, n)
            continue
        i += 1
    out.append((start, n))
    return [(a, b) for a, b in out if b > a]


def bind(
    sql: str,
    result: Any,
    dialect: str = "postgres",
    *,
    column: ColumnChoice | None = None,
    kind: str = "instant",
    paramstyle: str | None = None,
    sprint_key: str | None = None,
    sprints: Any = None,
    team: str | None = None,
) -> tuple[str, tuple[Any, ...] | dict[str, Any]]:
    """``sql`` with the template placeholders bound from ``result``: ``(sql, params)``, the
    params in the driver's paramstyle (a tuple, or a dict for named / pyformat).

    >>> from nlnorm import Context, normalize
    >>> ctx = Context.at("2026-12-02T10:00", tz="UTC")
    >>> r = normalize("bugs created last week", ctx)
    >>> bind("SELECT id FROM issues WHERE {t1:created_at} AND title <> '{t1}'", r, "sqlite")[0]
    "SELECT id FROM issues WHERE (created_at >= ? AND created_at < ?) AND title <> '{t1}'"
    """
    if not isinstance(sql, str):
        raise SqlError(f"sql must be a string, got {type(sql).__name__}")
    if result.reference is None:
        raise SqlError("the result has no reference (it holds an error): nothing to bind")
    d = dialect_named(dialect)
    ps = paramstyle or d.paramstyle
    placeholder(ps, "t1", 1)  # checks the paramstyle
    zone = iana_zone(result.reference.tz, "tz")
    slots = {f"t{i}": m for i, m in enumerate(result.mentions, start=1)}
    params = _Params(ps)
    # A driver taking %s / %(name)s placeholders reads every other "%" as one too: the SQL's
    # own ("LIKE '%bug%'") are doubled, as such drivers require.
    percent = ps in ("format", "pyformat")
    own = _doubled_percent if percent else _as_written
    pieces: list[str] = []
    cursor = 0
    for a, b in _code_spans(sql, d.name):
        pieces.append(own(sql[cursor:a]))
        pieces.append(_bind_code(sql[a:b], slots, d, params, column, kind, zone,
                                 sprint_key, sprints, team, own))
        cursor = b
    pieces.append(own(sql[cursor:]))
    return "".join(pieces), params.result()


def _doubled_percent(text: str) -> str:
    return text.replace("%", "%%")


def _as_written(text: str) -> str:
    return text


def _mention(slots: dict[str, Any], slot: str) -> Any:
    found = slots.get(slot)
    if found is None:
        known = ", ".join(slots) or "none: the question has no time phrase"
        raise SqlError(f"the SQL uses {{{slot}}} but the result has no such slot (slots: {known})")
    return found


def _bind_code(code: str, slots: dict[str, Any], d: Dialect, params: _Params,
               column: ColumnChoice | None, kind: str, zone: ZoneInfo, sprint_key: str | None,
               sprints: Any, team: str | None, own: Callable[[str], str]) -> str:
    def whole(m: re.Match[str]) -> str:
        slot, named_column = m.group(1), m.group(2)
        mention = _mention(slots, slot)
        chosen = named_column if named_column is not None else (
            _column_for(column, slot, mention) if column is not None else None)
        if chosen is None:
            raise SqlError(f"{{{slot}}} needs a column: write {{{slot}:created_at}} in the SQL "
                           "or pass column=...")
        where = _where(mention, _as_column(chosen, kind), d, zone, slot, "params", params,
                       sprint_key, sprints, team)
        if where is None:
            article = "an" if mention.kind[:1] in "aeiou" else "a"
            raise SqlError(f"{{{slot}}} is {mention.text!r}, {article} {mention.kind}, not a period: "
                           "there is no predicate to write for it")
        return f"({where})"

    def one(m: re.Match[str]) -> str:
        slot, side = m.group(3), m.group(4)
        mention = _mention(slots, slot)
        text = getattr(mention, side, None)
        if text is None:
            raise SqlError(f"{slot}_{side}: {mention.text!r} has no {side} (it is open on that "
                           f"side); write {{{slot}:column}} to let nlnorm leave that side out")
        chosen = _column_for(column, slot, mention) if column is not None else None
        col = _as_column(chosen, kind) if chosen is not None else Column("value", kind)  # type: ignore[arg-type]
        value = bound_value(datetime.fromisoformat(text), side, col, d.name, zone)
        return bound_placeholder(params, f"{slot}_{side}", value, col, d)

    out: list[str] = []
    cursor = 0
    for m in _ANY.finditer(code):
        out.append(own(code[cursor:m.start()]))
        out.append(whole(m) if m.group(1) else one(m))
        cursor = m.end()
    out.append(own(code[cursor:]))
    return "".join(out)
