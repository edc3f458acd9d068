"""Oracles and table helpers shared by the French, Spanish, Italian and Portuguese tests
(tests/locales/test_fr.py, test_es.py, test_it.py, test_pt.py).

Every expected bound is computed here, never typed in:
- python-dateutil ``relativedelta``: weekday steps (``MO(-1)`` = on or before), day, week,
  month and year arithmetic with month-end clamping;
- stdlib ``calendar.monthrange``: month lengths; ``date.fromisocalendar``: ISO 8601 weeks;
- CLDR 49 via babel 2.19: day-period rules of each language (``Locale.day_period_rules``),
  territory week data (``Locale.first_week_day``, ``weekend_start``/``weekend_end``) and the
  order of numeric dates (``babel.dates.get_date_format("short")``);
- the IANA tz database via zoneinfo: elapsed hours as UTC arithmetic.
"""

from __future__ import annotations

from datetime import date, datetime, timedelta, timezone
from typing import Any
from zoneinfo import ZoneInfo

import pytest
from babel import Locale
from babel.dates import get_date_format
from dateutil.relativedelta import FR, MO, SA, SU, TH, TU, WE, relativedelta

from tests.helpers import BERLIN, NOW, TODAY, one

UTC = timezone.utc
D = relativedelta
#: relativedelta weekdays in ``date.weekday()`` order, so babel's 0 = Monday indexes them.
WEEKDAYS = (MO, TU, WE, TH, FR, SA, SU)

# --- clocks (fixed; NOW is Wednesday 2026-12-02 10:00 in Berlin) ------------------------------
SATURDAY = datetime(2026, 12, 5, 10, 0, tzinfo=BERLIN)
SUNDAY = datetime(2026, 12, 6, 10, 0, tzinfo=BERLIN)
MONDAY_AFTER = datetime(2026, 12, 7, 10, 0, tzinfo=BERLIN)
FRIDAY = datetime(2026, 12, 4, 10, 0, tzinfo=BERLIN)
MONTH_END = datetime(2026, 3, 31, 10, 0, tzinfo=BERLIN)
JANUARY_END = datetime(2026, 1, 31, 10, 0, tzinfo=BERLIN)
MARCH_FIRST = datetime(2026, 3, 1, 10, 0, tzinfo=BERLIN)
LEAP_DAY = datetime(2028, 2, 29, 10, 0, tzinfo=BERLIN)
#: Berlin clocks went 02:00 -> 03:00 on 2026-03-29 (tzdata).
SPRING_BERLIN = datetime(2026, 3, 29, 12, 0, tzinfo=BERLIN)
BEFORE_SPRING_BERLIN = datetime(2026, 3, 28, 12, 0, tzinfo=BERLIN)
#: Not on a whole hour, so a rolling window and whole hours differ.
QUARTER_PAST = datetime(2026, 12, 2, 10, 17, tzinfo=BERLIN)


def iso(moment: datetime | None) -> str | None:
    return None if moment is None else moment.isoformat(timespec="seconds")


def midnight(d: date, tz: ZoneInfo = BERLIN) -> datetime:
    return datetime(d.year, d.month, d.day, tzinfo=tz)


def span(first: date, end: date, tz: ZoneInfo = BERLIN) -> tuple[str, str]:
    """The local dates ``[first, end)`` as instants at local midnight."""
    return iso(midnight(first, tz)), iso(midnight(end, tz))  # type: ignore[return-value]


def day(d: date) -> tuple[str, str]:
    return span(d, d + D(days=1))


def first_weekday(locale: str) -> Any:
    """The CLDR first day of the week of the locale's territory, as a relativedelta weekday."""
    return WEEKDAYS[Locale.parse(locale).first_week_day]


def week_start(d: date, first: Any = MO) -> date:
    return d + D(weekday=first(-1))


def week(d: date, first: Any = MO) -> tuple[str, str]:
    start = week_start(d, first)
    return span(start, start + D(weeks=1))


def iso_week_name(d: date) -> str:
    y, n, _ = d.isocalendar()
    return f"{y:04d}-W{n:02d}"


def month(y: int, m: int) -> tuple[str, str]:
    first = date(y, m, 1)
    return span(first, first + D(months=1))


def month_of(d: date) -> tuple[str, str]:
    return month(d.year, d.month)


def quarter(y: int, q: int) -> tuple[str, str]:
    first = date(y, 3 * q - 2, 1)
    return span(first, first + D(months=3))


def quarter_of(d: date) -> tuple[str, str]:
    return quarter(d.year, (d.month - 1) // 3 + 1)


def half(y: int, h: int) -> tuple[str, str]:
    first = date(y, 6 * h - 5, 1)
    return span(first, first + D(months=6))


def year(y: int) -> tuple[str, str]:
    return span(date(y, 1, 1), date(y + 1, 1, 1))


def iso_week(y: int, w: int) -> tuple[str, str]:
    first = date.fromisocalendar(y, w, 1)
    return span(first, first + D(days=7))


def wall(moment: datetime, **delta: int) -> str:
    """``moment`` moved on the local wall clock."""
    return iso(moment + D(**delta))  # type: ignore[return-value]


def moved(moment: datetime, **delta: int) -> datetime:
    """``moment`` moved by real elapsed time (UTC arithmetic)."""
    return (moment.astimezone(UTC) + timedelta(**delta)).astimezone(moment.tzinfo)


def elapsed(moment: datetime, **delta: int) -> str:
    return iso(moved(moment, **delta))  # type: ignore[return-value]


def floor_hour(moment: datetime) -> datetime:
    return moment.replace(minute=0, second=0, microsecond=0)


def hour_of(moment: datetime) -> tuple[str, str]:
    start = floor_hour(moment)
    return iso(start), elapsed(start, hours=1)  # type: ignore[return-value]


def on_or_before(d: date, wd: Any) -> date:
    return d + D(weekday=wd(-1))


def on_or_after(d: date, wd: Any) -> date:
    return d + D(weekday=wd(+1))


def strictly_before(d: date, wd: Any) -> date:
    return d + D(days=-1, weekday=wd(-1))


def strictly_after(d: date, wd: Any) -> date:
    return d + D(days=+1, weekday=wd(+1))


def in_week(d: date, wd: Any, offset: int, first: Any = MO) -> date:
    """Weekday ``wd`` inside the week ``offset`` weeks from the one holding ``d``."""
    return week_start(d, first) + D(weeks=offset, weekday=wd(+1))


def cal_back(now: datetime, first: date, n: int, unit: str) -> tuple[str, str]:
    """The ``n`` whole calendar units before the current one (whose first day is ``first``)."""
    return span(first + D(**{unit: -n}), first, now.tzinfo)  # type: ignore[arg-type]


def cal_ahead(now: datetime, first: date, n: int, unit: str) -> tuple[str, str]:
    """The ``n`` whole calendar units after the current one (whose first day is ``first``)."""
    return span(first + D(**{unit: 1}), first + D(**{unit: n + 1}), now.tzinfo)  # type: ignore[arg-type]


def day_period(lang: str, d: date, period: str) -> tuple[str, str]:
    """CLDR 49 day period ``period`` of ``lang`` on local date ``d``, from babel's
    ``Locale(lang).day_period_rules``; a period that wraps midnight ends the next day."""
    rule = Locale.parse(lang).day_period_rules[None][period][0]
    base = midnight(d)
    end = base + timedelta(seconds=rule["before"])
    if rule["before"] <= rule["from"]:
        end += timedelta(days=1)
    return iso(base + timedelta(seconds=rule["from"])), iso(end)  # type: ignore[return-value]


def weekend_days(locale: str) -> tuple[Any, int]:
    """The first weekend day and the number of weekend days, CLDR week data via babel."""
    loc = Locale.parse(locale)
    return WEEKDAYS[loc.weekend_start], (loc.weekend_end - loc.weekend_start) % 7 + 1


def weekend(first: date, locale: str) -> tuple[str, str]:
    return span(first, first + D(days=weekend_days(locale)[1]))


def weekend_value(first: date, locale: str) -> str:
    return f"{first.isoformat()}/P{weekend_days(locale)[1]}D"


def last_ended_weekend(today: date, locale: str) -> date:
    """The latest weekend that ended by today's start."""
    first, length = weekend_days(locale)
    return today + D(days=-length, weekday=first(-1))


def first_open_weekend(today: date, locale: str) -> date:
    """The weekend holding today, else the coming one."""
    first, length = weekend_days(locale)
    return today + D(days=-(length - 1), weekday=first(+1))


def day_first(locale: str) -> bool:
    """Whether the locale's CLDR short date format puts the day before the month."""
    pattern = get_date_format("short", locale=locale).pattern
    return pattern.index("d") < pattern.index("M")


def read_numeric(a: int, b: int, y: int, locale: str) -> date:
    """``a/b/y`` read in the locale's CLDR order (day first or month first)."""
    return date(y, b, a) if day_first(locale) else date(y, a, b)


def most_recent_year(first_day_in: Any, today: date = TODAY) -> int:
    """Past bias: the latest year whose period (first day ``first_day_in(year)``) has started."""
    y = today.year + 1
    while first_day_in(y) > today:
        y -= 1
    return y


def next_year_after(end_day_in: Any, today: date = TODAY) -> int:
    """Future bias: the earliest year whose period (end day ``end_day_in(year)``) ends after today."""
    y = today.year - 1
    while end_day_in(y) <= today:
        y += 1
    return y


# --- tables -------------------------------------------------------------------------------------


def alt(reading: str, policy: str | None, bounds: tuple[str | None, str | None]) -> tuple:
    return (reading, policy, bounds[0], bounds[1])


def since(bounds: tuple) -> tuple:
    return bounds[0], None


def after(bounds: tuple) -> tuple:
    return bounds[1], None


def before(bounds: tuple) -> tuple:
    return None, bounds[0]


def until(bounds: tuple) -> tuple:
    return None, bounds[1]


def joined(first: tuple, last: tuple) -> tuple:
    return first[0], last[1]


def cases_for(lang: str):  # type: ignore[no-untyped-def]
    """A ``case`` builder whose questions are read in ``lang`` unless ``languages`` is given."""

    def case(id: str, question: str, phrase: str, reading: str, bounds: tuple, value: str | None = None,
             alts: tuple = (), marks: Any = (), **context: Any) -> Any:
        context.setdefault("languages", (lang,))
        return pytest.param(question, phrase, reading, bounds, value, alts, context, id=id, marks=marks)

    return case


PARAMS = ("question", "phrase", "reading", "bounds", "value", "alts", "context")


def check(question, phrase, reading, bounds, value, alts, context) -> None:  # type: ignore[no-untyped-def]
    """The question holds exactly one mention: that text, reading, interval, value and
    alternatives (reading, policy, start, end), in order."""
    m = one(question, **context)
    assert m.text == phrase
    assert m.reading == reading
    assert (m.start, m.end) == bounds
    if value is not None:
        assert m.value == value
    assert tuple((a.reading, a.policy, a.start, a.end) for a in m.alternatives) == alts


__all__ = [name for name in dir() if not name.startswith("_")] + ["NOW", "TODAY", "BERLIN"]
