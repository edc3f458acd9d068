"""Fiscal calendars: a fiscal year starting on a given month and day, or a retail 52/53-week
year ending on a weekday, with its quarters.

Naming is configurable because both conventions are in use: ``naming="end"`` calls a fiscal
year by the calendar year it ends in (a year from 2026-04-01 to 2027-03-31 is FY2027, "FY27"),
``naming="start"`` by the year it starts in (FY2026). A fiscal year starting on 1 January is
the calendar year under both.

>>> from datetime import date
>>> fy = FiscalYear(start_month=4, naming="end")
>>> fy.year_of(date(2026, 12, 2)), fy.quarter_of(date(2026, 12, 2))
(2027, (2027, 3))
>>> fy.quarter_span(2027, 3)
(datetime.date(2026, 10, 1), datetime.date(2027, 1, 1))
"""

from __future__ import annotations

from dataclasses import dataclass
from datetime import date, timedelta
from typing import Literal, Protocol

from ..errors import ContextError

__all__ = ["FiscalCalendar", "FiscalYear", "RetailYear", "parse_fiscal_start"]

Naming = Literal["start", "end"]


class FiscalCalendar(Protocol):
    """What resolution needs of a fiscal calendar (both kinds below provide it)."""

    @property
    def naming(self) -> Naming: ...

    def year_of(self, day: date) -> int: ...
    def year_span(self, year: int) -> tuple[date, date]: ...
    def quarter_of(self, day: date) -> tuple[int, int]: ...
    def quarter_span(self, year: int, quarter: int) -> tuple[date, date]: ...
    def describe(self) -> str: ...


def _check_naming(naming: object) -> None:
    if naming not in ("start", "end"):
        raise ContextError(f"fiscal naming={naming!r}: expected 'start' (a fiscal year is "
                           "named by the year it starts in) or 'end' (the year it ends in)")


@dataclass(frozen=True, slots=True)
class FiscalYear:
    """A fiscal year of twelve months starting on ``start_month``/``start_day``; quarters are
    three months each from that day.

    ``start_day`` may be 1 to 28 (a later day does not exist in every month).
    """

    start_month: int = 1
    start_day: int = 1
    naming: Naming = "end"

    def __post_init__(self) -> None:
        if not isinstance(self.start_month, int) or not 1 <= self.start_month <= 12:
            raise ContextError(f"fiscal start month {self.start_month!r} must be 1 to 12")
        if not isinstance(self.start_day, int) or not 1 <= self.start_day <= 28:
            raise ContextError(f"fiscal start day {self.start_day!r} must be 1 to 28 "
                               "(a later day does not exist in every month)")
        _check_naming(self.naming)

    def _start_in(self, calendar_year: int, quarter: int = 1) -> date:
        index = self.start_month - 1 + 3 * (quarter - 1)
        return date(calendar_year + index // 12, index % 12 + 1, self.start_day)

    def _label(self, start_year: int) -> int:
        """The name of the fiscal year that starts in ``start_year``."""
        if self.naming == "start" or (self.start_month, self.start_day) == (1, 1):
            return start_year
        return start_year + 1

    def _start_year(self, label: int) -> int:
        if self.naming == "start" or (self.start_month, self.start_day) == (1, 1):
            return label
        return label - 1

    def year_of(self, day: date) -> int:
        """The name (a year number) of the fiscal year holding ``day``."""
        start_year = day.year if day >= self._start_in(day.year) else day.year - 1
        return self._label(start_year)

    def year_span(self, year: int) -> tuple[date, date]:
        """``[first day, first day of the next fiscal year)`` of fiscal year ``year``."""
        y = self._start_year(year)
        return self._start_in(y), self._start_in(y + 1)

    def quarter_of(self, day: date) -> tuple[int, int]:
        """``(fiscal year, quarter 1-4)`` holding ``day``."""
        label = self.year_of(day)
        y = self._start_year(label)
        q = 4
        while q > 1 and day < self._start_in(y, q):
            q -= 1
        return label, q

    def quarter_span(self, year: int, quarter: int) -> tuple[date, date]:
        if not 1 <= quarter <= 4:
            raise ContextError(f"fiscal quarter {quarter!r} must be 1 to 4")
        y = self._start_year(year)
        return self._start_in(y, quarter), self._start_in(y, quarter + 1)

    def describe(self) -> str:
        return (f"fiscal year starting {self.start_month:02d}-{self.start_day:02d}, "
                f"named by the year it {'starts' if self.naming == 'start' else 'ends'} in")


_PATTERNS = {"4-4-5": (4, 4, 5), "4-5-4": (4, 5, 4), "5-4-4": (5, 4, 4)}


@dataclass(frozen=True, slots=True)
class RetailYear:
    """A 52/53-week fiscal year that ends on ``weekday`` (0 = Monday), either the ``last`` such
    weekday of ``end_month`` or the one ``nearest`` to that month's last day; its quarters are
    13 weeks split into months by ``pattern`` (4-4-5, 4-5-4 or 5-4-4).

    A 53-week year gives its extra week to the fourth quarter (14 weeks, the last month one
    week longer): common practice in retail calendars.

    >>> nrf = RetailYear(end_month=1, weekday=5, rule="nearest", naming="start")
    >>> nrf.year_span(2023)  # a 53-week year
    (datetime.date(2023, 1, 29), datetime.date(2024, 2, 4))
    """

    end_month: int = 1
    weekday: int = 5
    rule: Literal["last", "nearest"] = "nearest"
    pattern: str = "4-5-4"
    naming: Naming = "end"

    def __post_init__(self) -> None:
        if not isinstance(self.end_month, int) or not 1 <= self.end_month <= 12:
            raise ContextError(f"retail year end month {self.end_month!r} must be 1 to 12")
        if not isinstance(self.weekday, int) or not 0 <= self.weekday <= 6:
            raise ContextError(f"retail year weekday {self.weekday!r} must be 0 (Monday) to 6")
        if self.rule not in ("last", "nearest"):
            raise ContextError(f"retail year rule {self.rule!r}: expected 'last' or 'nearest'")
        if self.pattern not in _PATTERNS:
            raise ContextError(f"retail quarter pattern {self.pattern!r}: expected one of "
                               + ", ".join(_PATTERNS))
        _check_naming(self.naming)

    def end_of(self, calendar_year: int) -> date:
        """The last day of the retail year that ends in ``end_month`` of ``calendar_year``."""
        if self.end_month == 12:
            month_end = date(calendar_year, 12, 31)
        else:
            month_end = date(calendar_year, self.end_month + 1, 1) - timedelta(days=1)
        back = (month_end.weekday() - self.weekday) % 7
        last = month_end - timedelta(days=back)
        if self.rule == "last" or back <= 3:
            return last
        return last + timedelta(days=7)  # nearest: up to three days into the next month

    def _label(self, end_year: int) -> int:
        """The name of the year that ends in ``end_month`` of ``end_year``: that year
        (``naming="end"``), or the year before it (``"start"``: a year ending in January 2024
        is 2023, the calendar year it starts in unless it starts in the last days of
        December)."""
        return end_year if self.naming == "end" else end_year - 1

    def _end_year(self, label: int) -> int:
        return label if self.naming == "end" else label + 1

    def year_span(self, year: int) -> tuple[date, date]:
        e = self._end_year(year)
        return self.end_of(e - 1) + timedelta(days=1), self.end_of(e) + timedelta(days=1)

    def weeks(self, year: int) -> int:
        start, end = self.year_span(year)
        return (end - start).days // 7

    def year_of(self, day: date) -> int:
        e = day.year - 1
        while self.end_of(e) < day:
            e += 1
        return self._label(e)

    def quarter_span(self, year: int, quarter: int) -> tuple[date, date]:
        if not 1 <= quarter <= 4:
            raise ContextError(f"fiscal quarter {quarter!r} must be 1 to 4")
        start, end = self.year_span(year)
        q_start = start + timedelta(weeks=13 * (quarter - 1))
        q_end = end if quarter == 4 else q_start + timedelta(weeks=13)
        return q_start, q_end

    def month_spans(self, year: int) -> list[tuple[date, date]]:
        """The twelve fiscal months of ``year`` (the last one a week longer in 53-week years)."""
        start, end = self.year_span(year)
        out = []
        cursor = start
        for _ in range(4):
            for weeks in _PATTERNS[self.pattern]:
                nxt = cursor + timedelta(weeks=weeks)
                out.append((cursor, nxt))
                cursor = nxt
        out[-1] = (out[-1][0], end)
        return out

    def quarter_of(self, day: date) -> tuple[int, int]:
        label = self.year_of(day)
        for q in (1, 2, 3, 4):
            s, e = self.quarter_span(label, q)
            if s <= day < e:
                return label, q
        raise AssertionError("a day lies in one of its year's quarters")  # pragma: no cover

    def describe(self) -> str:
        names = ("Monday", "Tuesday", "Wednesday", "Thursday", "Friday", "Saturday", "Sunday")
        return (f"52/53-week year ending on the {self.rule} {names[self.weekday]} of month "
                f"{self.end_month}, {self.pattern} quarters, named by the year it "
                f"{'starts' if self.naming == 'start' else 'ends'} in")


def parse_fiscal_start(value: str) -> tuple[int, int]:
    """``"04"``, ``"4"``, ``"04-06"`` -> ``(month, day)``.

    >>> parse_fiscal_start("10"), parse_fiscal_start("04-06")
    ((10, 1), (4, 6))
    """
    text = str(value).strip()
    month_text, _, day_text = text.partition("-")
    try:
        month = int(month_text)
        day = int(day_text) if day_text else 1
    except ValueError:
        raise ContextError(f"fiscal start {value!r}: expected MM or MM-DD, e.g. '04' or '04-06'") from None
    FiscalYear(month, day)  # validates
    return month, day
