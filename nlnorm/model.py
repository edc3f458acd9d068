"""The values that flow between pipeline stages.

All are frozen, slotted dataclasses: a stage never changes what it was given. Enum values are the
strings that appear in the output (``Grain.WEEK == "week"``).
"""

from __future__ import annotations

import enum
from dataclasses import dataclass, field
from datetime import datetime
from typing import Any

__all__ = [
    "Grain",
    "Kind",
    "Span",
    "Candidate",
    "Meaning",
    "RelativeDay",
    "ShiftPeriod",
    "Offset",
    "Rolling",
    "DateRef",
    "WeekdayRef",
    "WeekdayCount",
    "ToDate",
    "DayPeriodRef",
    "WeekendRef",
    "Now",
    "Duration",
    "SprintRef",
    "FiscalRef",
    "Bounded",
    "Between",
    "Interval",
    "Reading",
    "Resolved",
]


class Grain(str, enum.Enum):
    """The calendar unit an interval is measured in."""

    SECOND = "second"
    MINUTE = "minute"
    HOUR = "hour"
    DAY = "day"
    WEEK = "week"
    MONTH = "month"
    QUARTER = "quarter"
    HALF = "half"
    YEAR = "year"
    SPRINT = "sprint"
    BUSINESS_DAY = "business_day"
    FISCAL_QUARTER = "fiscal_quarter"
    FISCAL_YEAR = "fiscal_year"

    def __str__(self) -> str:
        return self.value


class Kind(str, enum.Enum):
    """What sort of value a mention stands for."""

    RANGE = "range"
    INSTANT = "instant"
    DURATION = "duration"
    SPRINT = "sprint"
    NUMBER = "number"
    PERSON = "person"
    VALUE = "value"

    def __str__(self) -> str:
        return self.value


@dataclass(frozen=True, slots=True)
class Span:
    """Half-open character offsets ``[start, end)``."""

    start: int
    end: int


@dataclass(frozen=True, slots=True)
class Candidate:
    """A phrase the scanner found, before it means anything.

    ``span`` indexes the prepared (normalized) text; ``slots`` holds the values the locale's
    lexicon gave each slot of the matched form (a grain name, an offset, a month number...).
    ``connective`` and ``parts`` describe combinations such as "since X" or "between X and Y".
    """

    span: Span
    lang: str
    reading: str
    slots: tuple[tuple[str, object], ...] = ()
    weak: bool = False
    connective: str | None = None
    parts: tuple["Candidate", ...] = ()
    confidence: float = 1.0
    nameable: bool = False  # a weak full month/weekday name that capitals can make a name

    def slot(self, name: str, default: Any = None) -> Any:
        """The value a form captured under ``name`` (an int, a str or a tuple, as the form
        made it: the reading says which), else ``default``."""
        for key, value in self.slots:
            if key == name:
                return value
        return default


# --- language-free meanings (output of the parse stage) -------------------------------------


class Meaning:
    """Base of the structured, language-free meanings the parse stage produces.

    Meanings are immutable records: fields come from the class annotations (with defaults from
    class attributes of the same name), compare by type and value, and hash. This base does
    once what ``@dataclass(frozen=True, slots=True)`` would generate per class; with sixteen
    meaning classes that halves the import cost the command line pays at every start.
    """

    __slots__ = ()
    _fields: tuple[str, ...] = ()
    _defaults: dict[str, object] = {}

    def __init_subclass__(cls) -> None:
        names = tuple(k for k in cls.__dict__.get("__annotations__", {}) if not k.startswith("_"))
        defaults = {k: cls.__dict__[k] for k in names if k in cls.__dict__}
        cls._fields = names
        cls._defaults = defaults

    def __init__(self, *args: object, **kwargs: object) -> None:
        fields = self._fields
        if len(args) > len(fields):
            raise TypeError(f"{type(self).__name__} takes {len(fields)} arguments")
        values = dict(zip(fields, args))
        for key, value in kwargs.items():
            if key not in fields or key in values:
                raise TypeError(f"{type(self).__name__}: bad argument {key!r}")
            values[key] = value
        for key in fields:
            if key not in values:
                if key not in self._defaults:
                    raise TypeError(f"{type(self).__name__}: missing argument {key!r}")
                values[key] = self._defaults[key]
            object.__setattr__(self, key, values[key])

    def __setattr__(self, name: str, value: object) -> None:
        raise AttributeError(f"{type(self).__name__} is immutable")

    def _values(self) -> tuple[object, ...]:
        return tuple(self.__dict__[k] for k in self._fields)

    def __eq__(self, other: object) -> bool:
        return type(other) is type(self) and other._values() == self._values()

    def __hash__(self) -> int:
        return hash((type(self), self._values()))

    def __repr__(self) -> str:
        inner = ", ".join(f"{k}={v!r}" for k, v in zip(self._fields, self._values()))
        return f"{type(self).__name__}({inner})"


class RelativeDay(Meaning):
    """R1: the day ``offset`` days from today."""

    offset: int


class ShiftPeriod(Meaning):
    """R2: the whole calendar period of ``grain`` shifted by ``offset`` from the current one."""

    grain: Grain
    offset: int


class Offset(Meaning):
    """R3 (``n < 0``) / R4 (``n > 0``): the period of ``grain`` containing now + n units."""

    grain: Grain
    n: int


class Rolling(Meaning):
    """R5 (``direction < 0``) / R6 (``direction > 0``): a window of ``n`` units ending/starting now."""

    grain: Grain
    n: int
    direction: int
    explicit_n: bool = True


class DateRef(Meaning):
    """R12, R17-R20: a calendar period given by some of its fields; missing ones come from bias.

    ``alternate`` holds the other reading of a numeric date such as 03/04/2026.
    """

    grain: Grain
    year: int | None = None
    half: int | None = None
    quarter: int | None = None
    month: int | None = None
    week: int | None = None
    day: int | None = None
    alternate: "DateRef | None" = None
    order: str | None = None  # MDY / DMY / YMD for a numeric date


class WeekdayRef(Meaning):
    """R13-R16: a weekday (0 = Monday).

    ``mode`` is ``"bare"`` (R13), ``"last"`` (R14), ``"next"`` (R15) or ``"week"`` (R16, the
    weekday inside the week shifted by ``week_offset``). ``deadline`` marks R13 after by/due/until.
    ``nearest`` marks R14/R15 phrases read the nearest way whatever ``weekday_reading`` says.
    """

    weekday: int
    mode: str
    week_offset: int = 0
    deadline: bool = False
    nearest: bool = False  # the phrase itself names the nearest such day ("次の月曜日")


class WeekdayCount(Meaning):
    """CLDR "in 3 Sundays" / "3 Sundays ago": the n-th such weekday after (n>0) or before today."""

    weekday: int
    n: int


class ToDate(Meaning):
    """R21: from the start of the current period of ``grain`` to now."""

    grain: Grain


class DayPeriodRef(Meaning):
    """R22: a CLDR day period (``"morning1"``...) of the day ``day_offset`` days from today."""

    day_offset: int
    period: str
    lang: str


class WeekendRef(Meaning):
    """R23: this (0) / last (-1) / next (+1) weekend; ``bare`` for "over the weekend"."""

    offset: int
    bare: bool = False


class Now(Meaning):
    """The reference instant itself (CLDR "now")."""


class Duration(Meaning):
    """A length of time with no position ("for 3 days")."""

    grain: Grain
    n: int


class SprintRef(Meaning):
    """R24: a sprint named or numbered in the text ("sprint 42", "the Foxglove sprint"),
    looked up in the context's sprint table."""

    number: int | None = None
    name: str | None = None  # the text that named it
    last: int | None = None  # "sprints 40 to 42": the number of the last one


class FiscalRef(Meaning):
    """R25 / R26: a fiscal year ("FY27") or a quarter of one ("Q1 FY27", "fiscal Q3"); a
    missing year is the current fiscal year's."""

    year: int | None = None
    quarter: int | None = None
    two_digit: bool = False  # the year was written with two digits ("FY27")
    from_plain_quarter: bool = False  # a plain "Q3" read as fiscal because quarters are fiscal


class Bounded(Meaning):
    """R7-R10: ``since`` / ``after`` / ``before`` / ``until`` another meaning."""

    relation: str
    inner: Meaning


class Between(Meaning):
    """R11: from the start of ``first`` to the end of ``last``."""

    first: Meaning
    last: Meaning


# --- resolution output ------------------------------------------------------------------------


@dataclass(frozen=True, slots=True)
class Interval:
    """A half-open interval ``[start, end)`` of aware date-times; ``None`` is unbounded."""

    start: datetime | None
    end: datetime | None
    grain: Grain
    value: str


@dataclass(frozen=True, slots=True)
class Reading:
    """One way of reading a phrase: its interval, the rule id and, for alternatives, the policy."""

    interval: Interval
    reading: str
    note: str
    policy: str | None = None
    sprints: tuple[str, ...] = ()  # the sprints a sprint reading covers, by name


@dataclass(frozen=True, slots=True)
class Resolved:
    """A candidate with its chosen reading and the other plausible ones."""

    candidate: Candidate
    meaning: Meaning
    kind: Kind
    chosen: Reading
    alternatives: tuple[Reading, ...] = field(default=())
