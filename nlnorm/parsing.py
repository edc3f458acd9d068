"""Parsing: a candidate phrase -> a structured, language-free meaning.

The scanner has already looked every slot up in the language's lexicon, so this stage only
decides what the slots mean together: "shift of -1 week, calendar reading", "the 14th of March
of an unknown year", "since <that>".
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import TYPE_CHECKING

from . import cldr
from .model import (
    Between,
    Bounded,
    Candidate,
    DateRef,
    DayPeriodRef,
    Duration,
    FiscalRef,
    Grain,
    Meaning,
    Now,
    Offset,
    RelativeDay,
    Rolling,
    ShiftPeriod,
    SprintRef,
    ToDate,
    WeekdayCount,
    WeekdayRef,
    WeekendRef,
)

if TYPE_CHECKING:
    from .context import Context

__all__ = ["Parsed", "parse", "parse_candidate", "numeric_date"]


@dataclass(frozen=True, slots=True)
class Parsed:
    """A candidate and the meaning parsed from it (``None`` when the slots make no date,
    such as "February 30")."""

    candidate: Candidate
    meaning: Meaning | None


def parse(candidates: tuple[Candidate, ...], ctx: "Context") -> tuple[Parsed, ...]:
    """Give each candidate its language-free meaning.

    >>> from nlnorm.context import Context
    >>> from nlnorm.preparing import prepare
    >>> from nlnorm.scanning import scan
    >>> ctx = Context.at("2026-11-27T10:00", tz="Europe/Berlin")
    >>> [p.meaning for p in parse(scan(prepare("since last week"), ctx), ctx)]
    [Bounded(relation='since', inner=ShiftPeriod(grain=<Grain.WEEK: 'week'>, offset=-1))]
    """
    return tuple(Parsed(c, parse_candidate(c, ctx)) for c in candidates)


def _grain(value: object, ctx: "Context | None" = None) -> Grain:
    grain = Grain(str(value))
    if grain is Grain.QUARTER and ctx is not None and ctx.quarters == "fiscal":
        return Grain.FISCAL_QUARTER  # "this quarter", "last 2 quarters": fiscal ones here
    return grain


def _date_grain(year: object, half: object, quarter: object, month: object, week: object,
                day: object) -> Grain:
    if day is not None:
        return Grain.DAY
    if week is not None:
        return Grain.WEEK
    if month is not None:
        return Grain.MONTH
    if quarter is not None:
        return Grain.QUARTER
    if half is not None:
        return Grain.HALF
    return Grain.YEAR


def numeric_date(text: str, order: str) -> tuple[DateRef | None, DateRef | None]:
    """Read a numeric date such as ``03/04/2026`` in ``order`` (MDY, DMY or YMD).

    Returns the reading and, when the other order also gives a valid date, that one.

    >>> a, b = numeric_date("03/04/2026", "MDY")
    >>> (a.month, a.day), (b.month, b.day)
    ((3, 4), (4, 3))
    """
    sep = next((s for s in "/-" if s in text), ".")
    parts = [int(p) for p in text.split(sep)]
    if len(parts) != 3:
        return None, None
    orders: tuple[str, ...]
    if parts[0] > 999:
        order, orders = "YMD", ("YMD",)
    else:
        orders = (order, "DMY" if order == "MDY" else "MDY") if order in ("MDY", "DMY") else ("DMY", "MDY")
        order = orders[0]
    found: list[DateRef] = []
    for o in orders:
        fields = dict(zip(o, parts))
        year, month, day = fields["Y"], fields["M"], fields["D"]
        if year < 100:
            year += 2000  # two-digit years: common practice in trackers is the current century
        if _valid(year, month, day):
            found.append(DateRef(Grain.DAY, year=year, month=month, day=day, order=o))
    if not found:
        return None, None
    first = found[0]
    other = found[1] if len(found) > 1 and (found[1].month, found[1].day) != (first.month, first.day) else None
    if orders[0] != order and other is None:
        return first, None
    return first, other


def _valid(year: int, month: int, day: int) -> bool:
    import calendar

    return 1 <= month <= 12 and 1 <= day <= calendar.monthrange(year, month)[1] and 1 <= year <= 9999


def parse_candidate(c: Candidate, ctx: "Context") -> Meaning | None:
    """The meaning of one candidate (see :func:`parse`)."""
    if c.connective == "between" and len(c.parts) == 2:
        first = parse_candidate(c.parts[0], ctx)
        last = parse_candidate(c.parts[1], ctx)
        if first is None or last is None:
            return None
        return Between(first, last)
    if c.connective in ("since", "after", "before", "until") and c.parts:
        inner = parse_candidate(c.parts[0], ctx)
        return None if inner is None else Bounded(c.connective, inner)
    slot = c.slot
    r = c.reading
    if r == "NOW":
        return Now()
    if r == "R1":
        return RelativeDay(int(slot("relday")))
    if r == "R2":
        return ShiftPeriod(_grain(slot("unit"), ctx), int(slot("dir")))
    if r in ("R3", "R4"):
        n = int(slot("num", 1))
        sign = -1 if r == "R3" else 1
        weekday = slot("count_weekday")
        if weekday is not None:
            return WeekdayCount(int(weekday), sign * n)
        return Offset(_grain(slot("unit"), ctx), sign * n)
    if r in ("R5", "R6"):
        num = slot("num")
        return Rolling(_grain(slot("unit"), ctx), int(num) if num is not None else 1,
                       -1 if r == "R5" else 1, num is not None)
    if r == "R21":
        grain = slot("to_date") or slot("unit")
        return ToDate(_grain(grain))
    if r == "R22":
        phrase = slot("dayperiod_phrase")
        if phrase is not None:
            day, period = phrase
            return DayPeriodRef(int(day), str(period), c.lang)
        period = slot("dayperiod") or "night1"
        return DayPeriodRef(int(slot("relday", 0)), str(period), c.lang)
    if r == "R23":
        direction = slot("dir")
        return WeekendRef(int(direction) if direction is not None else 0, direction is None)
    if r in ("R13", "R14", "R15", "R16"):
        weekday = int(slot("weekday"))
        if r == "R13":
            return WeekdayRef(weekday, "bare", deadline=bool(slot("deadline", False)))
        if r == "R16":
            offset = slot("dir", slot("offset", 0))
            return WeekdayRef(weekday, "week", int(offset))
        return WeekdayRef(weekday, "last" if r == "R14" else "next", -1 if r == "R14" else 1,
                          nearest=bool(slot("nearest", False)))
    if r == "D":
        return Duration(_grain(slot("unit")), int(slot("num", 1)))
    if r == "R24":
        number = slot("num")
        name = slot("sprint_name")
        last = slot("digits")
        return SprintRef(int(number) if number is not None else None,
                         str(name) if name is not None else None,
                         int(last) if last is not None else None)
    if r in ("R25", "R26"):
        return _parse_fiscal(c)
    meaning = _parse_date(c, ctx)
    if ctx.quarters == "fiscal" and isinstance(meaning, DateRef) and meaning.grain is Grain.QUARTER:
        # Quarters are fiscal in this context: "Q3" is the third fiscal quarter.
        return FiscalRef(meaning.year, meaning.quarter, from_plain_quarter=True)
    return meaning


def _parse_fiscal(c: Candidate) -> Meaning | None:
    year = c.slot("year")
    two = c.slot("yy")
    quarter = c.slot("qnum", c.slot("ordinal"))
    if quarter == -1 and year is None and two is None:
        return ShiftPeriod(Grain.FISCAL_QUARTER, -1)  # "the last fiscal quarter": the previous one
    if quarter is not None and not 1 <= int(quarter) <= 4:
        return None
    if two is not None:
        return FiscalRef(2000 + int(two), int(quarter) if quarter is not None else None, True)
    return FiscalRef(int(year) if year is not None else None,
                     int(quarter) if quarter is not None else None)


def _parse_date(c: Candidate, ctx: "Context") -> DateRef | None:
    slot = c.slot
    numdate = slot("numdate")
    if numdate is not None:
        # A numeric date has no language: it is read in the order of the context's locale
        # (CLDR short date format), whichever language's form matched it.
        order = ctx.date_order or cldr.date_order(ctx.locale)
        first, other = numeric_date(str(numdate), order)
        if first is None:
            return None
        return DateRef(first.grain, year=first.year, month=first.month, day=first.day,
                       alternate=other, order=first.order)
    year = slot("year", slot("year_from_end"))
    offset = slot("relyear", slot("year_offset"))
    if year is None and offset is not None:
        # A year named relative to now ("去年12月": December of last year).
        year = ctx.now.year + int(offset)
    shift = slot("relmonth", slot("month_offset"))
    if slot("month") is None and shift is not None:
        # A month named relative to now ("来月15日": the 15th of next month).
        shifted, index = divmod(ctx.now.year * 12 + ctx.now.month - 1 + int(shift), 12)
        year = shifted if year is None else year
        c = Candidate(c.span, c.lang, c.reading, c.slots + (("month", index + 1),), c.weak)
        slot = c.slot
    half = slot("hnum")
    quarter = slot("qnum")
    ordinal = slot("ordinal", slot("ordinal_half"))
    month = slot("month")
    week = slot("week")
    day = slot("day")
    if ordinal is not None:
        n = int(ordinal)
        # "first quarter" / "second half": the form says which; halves have two, quarters four.
        if _is_half_form(c):
            half = 2 if n == -1 else n
            if half not in (1, 2):
                return None
        else:
            quarter = 4 if n == -1 else n
            if quarter not in (1, 2, 3, 4):
                return None
    grain = _date_grain(year, half, quarter, month, week, day)
    y = int(year) if year is not None else None
    if day is not None and month is not None and y is not None and not _valid(y, int(month), int(day)):
        return None
    if day is not None and month is not None and int(day) > _max_day(int(month)):
        return None
    if week is not None and y is not None and int(week) == 53 and not _has_week_53(y):
        return None
    weekday_of_week = slot("isoday")
    if weekday_of_week is not None and week is not None and y is not None:
        from datetime import date

        d = date.fromisocalendar(y, int(week), int(weekday_of_week))
        return DateRef(Grain.DAY, year=d.year, month=d.month, day=d.day)
    return DateRef(
        grain,
        year=y,
        half=int(half) if half is not None else None,
        quarter=int(quarter) if quarter is not None else None,
        month=int(month) if month is not None else None,
        week=int(week) if week is not None else None,
        day=int(day) if day is not None else None,
    )


def _is_half_form(c: Candidate) -> bool:
    # Forms about halves use the {ordinal_half} slot ("the first half of 2026").
    return c.slot("ordinal_half") is not None


def _max_day(month: int) -> int:
    return (31, 29, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31)[month - 1]


def _has_week_53(year: int) -> bool:
    from datetime import date

    return date(year, 12, 28).isocalendar()[1] == 53
