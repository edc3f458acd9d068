"""SQL predicates for the mentions of a normalization result.

A range becomes ``column >= start AND column < end`` (half-open; an open side is left out; the
column stays bare, so an index on it is used). A sprint becomes the same over its dates, or
``key IN (...)`` over the sprint table's keys when asked. Values are bound as placeholders in
the driver's paramstyle, or, with ``style="literal"``, written as typed literals that hold
only digits and separators nlnorm made itself. Names are checked and quoted
(:func:`~nlnorm.sql.dialects.quoted_name`); no text of the question ever reaches SQL.
"""

from __future__ import annotations

from collections.abc import Callable, Mapping
from dataclasses import dataclass
from datetime import date, datetime
from typing import Any, Literal, Union
from zoneinfo import ZoneInfo

from .columns import Column, bound_value, iana_zone
from .dialects import PARAMSTYLES, Dialect, dialect as dialect_named, quoted_name
from .errors import SqlError
from ..errors import suggest

__all__ = ["Fragment", "predicate", "predicates", "placeholder", "ColumnChoice"]

Style = Literal["params", "literal"]
ColumnChoice = Union[str, Column, Mapping[str, Union[str, Column, None]],
                     Callable[[str, Any], Union[str, Column, None]]]
#: Mention kinds that have a period to select rows by.
_PERIODS = ("range", "sprint")


@dataclass(frozen=True, slots=True)
class Fragment:
    """One predicate: its SQL, and the values its placeholders take (in placeholder order for
    qmark / numeric / format, by name for named / pyformat; empty for literal SQL)."""

    dialect: str
    where: str
    params: tuple[Any, ...] | Mapping[str, Any]
    paramstyle: str | None  # None: literal SQL, nothing to bind
    slot: str  # the template placeholder it stands for ("t1")
    column: str

    def json_params(self) -> list[Any] | dict[str, Any]:
        """The bound values as JSON can hold them: ISO 8601 text for dates and datetimes."""
        if isinstance(self.params, Mapping):
            return {k: _json(v) for k, v in self.params.items()}
        return [_json(v) for v in self.params]

    def as_json(self) -> dict[str, Any]:
        return {"dialect": self.dialect, "where": self.where, "params": self.json_params()}


def _json(value: Any) -> Any:
    return value.isoformat() if isinstance(value, (date, datetime)) else value


def placeholder(paramstyle: str, name: str, index: int) -> str:
    """A placeholder as PEP 249 writes it (``index`` counts from 1).

    >>> [placeholder(s, "t1_start", 1) for s in ("qmark", "numeric", "named", "format", "pyformat")]
    ['?', ':1', ':t1_start', '%s', '%(t1_start)s']
    """
    if paramstyle == "qmark":
        return "?"
    if paramstyle == "numeric":
        return f":{index}"
    if paramstyle == "named":
        return f":{name}"
    if paramstyle == "format":
        return "%s"
    if paramstyle == "pyformat":
        return f"%({name})s"
    raise SqlError(f"paramstyle={paramstyle!r}: use one of {', '.join(PARAMSTYLES)} (PEP 249)"
                   f"{suggest(str(paramstyle), PARAMSTYLES)}")


def _quote_text(text: str) -> str:
    return "'" + text.replace("'", "''") + "'"


def _literal(value: Any, column: Column, d: Dialect) -> str:
    if isinstance(value, bool) or value is None:
        raise SqlError(f"cannot write {value!r} as a SQL value")
    if isinstance(value, (int, float)):
        return repr(value)
    if isinstance(value, str):
        return _quote_text(value)
    if isinstance(value, datetime):
        if value.tzinfo is not None or column.kind == "instant":
            text = value.replace(tzinfo=None).isoformat(sep=" ")
            if d.instant_offset:
                text += d.instant_sep + "+00:00"
            return d.instant.format(_quote_text(text))
        text = value.isoformat(sep="T" if d.naive_t else " ")
        return d.naive.format(_quote_text(text))
    if isinstance(value, date):
        return d.date.format(_quote_text(value.isoformat()))
    raise SqlError(f"cannot write a {type(value).__name__} as a SQL value")


def _bind_value(value: Any, column: Column, d: Dialect) -> Any:
    """The value handed to the driver: instants as aware UTC datetimes, or naive UTC where the
    dialect's driver cannot take an aware one."""
    if isinstance(value, datetime) and value.tzinfo is not None and d.instant_naive_param:
        return value.replace(tzinfo=None)
    return value


class _Params:
    """Placeholders of one statement, numbered and named in order."""

    def __init__(self, paramstyle: str, first_index: int = 1) -> None:
        self.paramstyle = paramstyle
        self.index = first_index
        self.values: list[tuple[str, Any]] = []

    def add(self, name: str, value: Any) -> str:
        text = placeholder(self.paramstyle, name, self.index)
        self.index += 1
        self.values.append((name, value))
        return text

    def result(self) -> tuple[Any, ...] | dict[str, Any]:
        if self.paramstyle in ("named", "pyformat"):
            return dict(self.values)
        return tuple(v for _, v in self.values)


def _as_column(choice: str | Column, kind: str) -> Column:
    return choice if isinstance(choice, Column) else Column(choice, kind)  # type: ignore[arg-type]


def predicate(
    mention: Any,
    column: str | Column,
    dialect: str = "postgres",
    *,
    tz: str | ZoneInfo,
    slot: str = "t1",
    kind: str = "instant",
    style: Style = "params",
    paramstyle: str | None = None,
    sprint_key: str | None = None,
    sprints: Any = None,
    team: str | None = None,
    first_index: int = 1,
) -> Fragment | None:
    """The predicate of one mention (a :class:`~nlnorm.schema.Mention` or a template
    :class:`~nlnorm.schema.Slot`) over ``column``; ``None`` when the mention is no period
    (an instant, a duration, a number).

    ``tz`` is the question's zone (``result.reference.tz``): a date column's days and a local
    column's wall clock are read in it. ``kind`` is the column's storage when ``column`` is a
    name (see :class:`Column`). With ``sprint_key``, a sprint mention selects rows by that key
    column instead: ``sprint_key IN (...)`` over the ids of its sprints in ``sprints`` (the
    :class:`~nlnorm.calendars.sprints.SprintCalendar`; a row without an id gives its number,
    else its name).

    >>> from nlnorm import Context, normalize
    >>> ctx = Context.at("2026-12-02T10:00", tz="Europe/Berlin")
    >>> m = normalize("bugs created last week", ctx).mentions[0]
    >>> f = predicate(m, "created_at", "postgres", tz="Europe/Berlin")
    >>> f.where
    'created_at >= %(t1_start)s AND created_at < %(t1_end)s'
    >>> [v.isoformat() for v in f.params.values()]
    ['2026-11-22T23:00:00+00:00', '2026-11-29T23:00:00+00:00']
    >>> predicate(m, "created_on", "sqlite", tz="Europe/Berlin", kind="date", style="literal").where
    "created_on >= '2026-11-23' AND created_on < '2026-11-30'"
    """
    d = dialect_named(dialect)
    col = _as_column(column, kind)
    if style not in ("params", "literal"):
        raise SqlError(f"style={style!r}: use 'params' (placeholders and bound values) or "
                       "'literal' (values written into the SQL)")
    ps = paramstyle or d.paramstyle
    if style == "params":
        placeholder(ps, slot, 1)  # checks the paramstyle
    zone = tz if isinstance(tz, ZoneInfo) else iana_zone(tz, "tz")
    params = _Params(ps, first_index)
    where = _where(mention, col, d, zone, slot, style, params, sprint_key, sprints, team)
    if where is None:
        return None
    bound = style == "params"
    by = sprint_key if sprint_key is not None and mention.kind == "sprint" else col.name
    return Fragment(d.name, where, params.result() if bound else (), ps if bound else None, slot, by)


def _where(mention: Any, col: Column, d: Dialect, zone: ZoneInfo, slot: str, style: str,
           params: _Params, sprint_key: str | None, sprints: Any, team: str | None) -> str | None:
    """The SQL of one mention's predicate, its bound values added to ``params`` (none in the
    literal style); ``None`` when the mention is no period."""
    if getattr(mention, "kind", None) not in _PERIODS:
        return None
    name = quoted_name(col.name, d.name)
    if mention.kind == "sprint" and sprint_key is not None:
        return _key_predicate(mention, sprint_key, d, style, params, slot, sprints, team)
    parts: list[str] = []
    for side, text in (("start", mention.start), ("end", mention.end)):
        if text is None:
            continue
        value = bound_value(datetime.fromisoformat(text), side, col, d.name, zone)
        op = ">=" if side == "start" else "<"
        if style == "literal":
            parts.append(f"{name} {op} {_literal(value, col, d)}")
        else:
            parts.append(f"{name} {op} {bound_placeholder(params, f'{slot}_{side}', value, col, d)}")
    return " AND ".join(parts) if parts else "1 = 1"


def bound_placeholder(params: _Params, name: str, value: Any, col: Column, d: Dialect) -> str:
    """The placeholder of one bound value added to ``params``, wrapped as the dialect wants it
    for an instant column."""
    ph = params.add(name, _bind_value(value, col, d))
    if col.kind == "instant" and d.instant_param != "{}":
        ph = d.instant_param.format(ph)
    return ph


def _key_predicate(mention: Any, key: str, d: Dialect, style: str, params: _Params, slot: str,
                   sprints: Any, team: str | None) -> str:
    if sprints is None:
        raise SqlError("sprint_key needs the sprint table (sprints=...) to find the sprints' keys")
    names = tuple(getattr(mention, "sprints", ()) or ())
    keys: list[Any] = []
    for sprint_name in names:
        for s in sprints.named(sprint_name):
            if team is not None and (s.team or "").casefold() != team.casefold():
                continue
            value = s.id if s.id is not None else s.number if s.number is not None else s.name
            if value not in keys:
                keys.append(value)
    if not keys:
        raise SqlError(f"the sprints of {getattr(mention, 'text', slot)!r} ({', '.join(names) or 'none'}) "
                       "are not in the sprint table given: pass the table the question was "
                       "normalized with")
    column = quoted_name(key, d.name)
    if style == "literal":
        items = [repr(k) if isinstance(k, int) and not isinstance(k, bool) else _quote_text(str(k))
                 for k in keys]
    else:
        items = [params.add(f"{slot}_sprint{i}", k) for i, k in enumerate(keys, start=1)]
    return f"{column} IN ({', '.join(items)})"


def _column_for(choice: ColumnChoice, slot: str, mention: Any) -> str | Column | None:
    if isinstance(choice, (str, Column)):
        return choice
    if isinstance(choice, Mapping):
        for key in (slot, getattr(mention, "kind", None), "*"):
            if key in choice:
                return choice[key]  # type: ignore[index]
        return None
    return choice(slot, mention)


def predicates(
    result: Any,
    column: ColumnChoice,
    dialect: str = "postgres",
    *,
    kind: str = "instant",
    style: Style = "params",
    paramstyle: str | None = None,
    sprint_key: str | None = None,
    sprints: Any = None,
    team: str | None = None,
) -> dict[str, Fragment]:
    """The predicates of every period mention of a :class:`~nlnorm.schema.Result`, by
    template slot (``t1``, ``t2``...). ``column`` is one column for all, a mapping from slot
    name, mention kind or ``"*"`` to a column (``None`` leaves a mention out), or a function
    ``(slot, mention) -> column``. Numbered placeholders count on across the mentions, so the
    fragments can go into one statement in slot order.

    >>> from nlnorm import Context, normalize
    >>> ctx = Context.at("2026-12-02T10:00", tz="UTC")
    >>> r = normalize("opened since Monday and closed before today", ctx)
    >>> {k: f.where for k, f in predicates(r, {"t1": "opened_at", "t2": "closed_at"}, "duckdb").items()}
    {'t1': 'opened_at >= ?', 't2': 'closed_at < ?'}
    """
    if result.reference is None:
        raise SqlError("the result has no reference (it holds an error): nothing to write")
    tz = result.reference.tz
    out: dict[str, Fragment] = {}
    index = 1
    for number, mention in enumerate(result.mentions, start=1):
        slot = f"t{number}"
        chosen = _column_for(column, slot, mention)
        if chosen is None:
            continue
        frag = predicate(mention, chosen, dialect, tz=tz, slot=slot, kind=kind, style=style,
                         paramstyle=paramstyle, sprint_key=sprint_key, sprints=sprints,
                         team=team, first_index=index)
        if frag is not None:
            out[slot] = frag
            index += len(frag.params)
    return out
