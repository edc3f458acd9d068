"""The English reading contract, R1 to R23: one table of worked examples per reading.

Each row is a question, the phrase nlnorm must find in it, the reading id it must report and
the half-open interval ``[start, end)`` it must resolve to, plus every alternative reading with
the context policy that selects it. Expected values are computed here from the sources below,
not typed in; the clock is always fixed.

Checked against:
- python-dateutil ``relativedelta``: weekday steps (``MO(-1)`` = on or before), day, week,
  month and year arithmetic with month-end clamping (2026-03-31 minus 1 month = 2026-02-28);
- stdlib ``calendar.monthrange`` and ``calendar.isleap``: month lengths and leap years;
- ISO 8601 week dates via stdlib ``date.fromisocalendar`` / ``date.isocalendar``;
- CLDR 49 via babel 2.19: English day-period rules (``Locale.day_period_rules``), territory
  week data (``Locale.first_week_day``, ``weekend_start``/``weekend_end``) and numeric date
  order (``babel.dates.get_date_format("short")``);
- the IANA tz database via stdlib zoneinfo + tzdata: elapsed hours as UTC arithmetic across
  daylight-saving changes;
- common practice: which English phrase takes which reading (the contract in
  docs/readings.md), and two-digit years meaning the current century.
"""

from __future__ import annotations

import calendar
from datetime import date, datetime, timedelta, timezone
from typing import Any
from zoneinfo import ZoneInfo

import pytest
from babel import Locale
from babel.dates import get_date_format
from dateutil.relativedelta import FR, MO, SA, SU, TH, TU, WE, relativedelta

from tests.helpers import BERLIN, NOW, TODAY, one

NEW_YORK = ZoneInfo("America/New_York")
UTC = timezone.utc
#: relativedelta weekdays in ``date.weekday()`` order, so babel's 0 = Monday indexes them.
WEEKDAYS = (MO, TU, WE, TH, FR, SA, SU)

# --- clocks (fixed; NOW is Wednesday 2026-12-02 10:00 in Berlin) ------------------------------
SATURDAY = datetime(2026, 12, 5, 10, 0, tzinfo=BERLIN)
SUNDAY = datetime(2026, 12, 6, 10, 0, tzinfo=BERLIN)
SUNDAY_LATE = datetime(2026, 12, 6, 23, 0, tzinfo=BERLIN)
MONDAY_AFTER = datetime(2026, 12, 7, 10, 0, tzinfo=BERLIN)
MONTH_END = datetime(2026, 3, 31, 10, 0, tzinfo=BERLIN)
MAY_END = datetime(2026, 5, 31, 10, 0, tzinfo=BERLIN)
JANUARY_END = datetime(2026, 1, 31, 10, 0, tzinfo=BERLIN)
LEAP_DAY = datetime(2028, 2, 29, 10, 0, tzinfo=BERLIN)
MID_JANUARY = datetime(2027, 1, 15, 10, 0, tzinfo=BERLIN)
BEFORE_LEAP_DAY = datetime(2027, 2, 1, 10, 0, tzinfo=BERLIN)
MARCH_FIRST = datetime(2026, 3, 1, 10, 0, tzinfo=BERLIN)
#: Berlin clocks went 02:00 -> 03:00 on 2026-03-29 and 03:00 -> 02:00 on 2026-10-25 (tzdata).
BEFORE_SPRING_BERLIN = datetime(2026, 3, 28, 12, 0, tzinfo=BERLIN)
EVE_OF_SPRING_BERLIN = datetime(2026, 3, 28, 10, 0, tzinfo=BERLIN)
SPRING_BERLIN = datetime(2026, 3, 29, 12, 0, tzinfo=BERLIN)
MORNING_SPRING_BERLIN = datetime(2026, 3, 29, 10, 0, tzinfo=BERLIN)
AUTUMN_BERLIN = datetime(2026, 10, 25, 12, 0, tzinfo=BERLIN)
#: New York clocks went 02:00 -> 03:00 on 2026-03-08 (tzdata).
SPRING_NEW_YORK = datetime(2026, 3, 8, 12, 0, tzinfo=NEW_YORK)
#: Not on a whole hour, so a rolling window and whole hours differ.
QUARTER_PAST = datetime(2026, 12, 2, 10, 17, tzinfo=BERLIN)


# --- oracles ----------------------------------------------------------------------------------


def iso(moment: datetime | None) -> str | None:
    return None if moment is None else moment.isoformat(timespec="seconds")


def midnight(d: date, tz: ZoneInfo = BERLIN) -> datetime:
    """Local midnight (it exists on every date these tables use: the zones switch at 02:00)."""
    return datetime(d.year, d.month, d.day, tzinfo=tz)


def span(first: date, end: date, tz: ZoneInfo = BERLIN) -> tuple[str, str]:
    """The local dates ``[first, end)`` as instants at local midnight."""
    return iso(midnight(first, tz)), iso(midnight(end, tz))  # type: ignore[return-value]


def day(d: date, tz: ZoneInfo = BERLIN) -> tuple[str, str]:
    return span(d, d + relativedelta(days=1), tz)


def week_start(d: date, first: Any = MO) -> date:
    """The first day of the week holding ``d``: relativedelta(weekday=first(-1))."""
    return d + relativedelta(weekday=first(-1))


def week(d: date, first: Any = MO) -> tuple[str, str]:
    start = week_start(d, first)
    return span(start, start + relativedelta(weeks=1))


def iso_week_name(d: date) -> str:
    year, number, _ = d.isocalendar()
    return f"{year:04d}-W{number:02d}"


def month(y: int, m: int, tz: ZoneInfo = BERLIN) -> tuple[str, str]:
    """A whole month; its length from calendar.monthrange."""
    return span(date(y, m, 1), date(y, m, calendar.monthrange(y, m)[1]) + relativedelta(days=1), tz)


def month_of(d: date) -> tuple[str, str]:
    return month(d.year, d.month)


def quarter(y: int, q: int) -> tuple[str, str]:
    first = date(y, 3 * q - 2, 1)
    return span(first, first + relativedelta(months=3))


def quarter_of(d: date) -> tuple[str, str]:
    return quarter(d.year, (d.month - 1) // 3 + 1)


def half(y: int, h: int) -> tuple[str, str]:
    first = date(y, 6 * h - 5, 1)
    return span(first, first + relativedelta(months=6))


def year(y: int) -> tuple[str, str]:
    return span(date(y, 1, 1), date(y + 1, 1, 1))


def iso_week(y: int, w: int) -> tuple[str, str]:
    """ISO 8601 week ``w`` of ``y``: Monday via date.fromisocalendar, seven days."""
    first = date.fromisocalendar(y, w, 1)
    return span(first, first + relativedelta(days=7))


def wall(moment: datetime, **delta: int) -> str:
    """``moment`` moved on the local wall clock (relativedelta on an aware datetime)."""
    return iso(moment + relativedelta(**delta))  # type: ignore[return-value]


def moved(moment: datetime, **delta: int) -> datetime:
    """``moment`` moved by real elapsed time: the arithmetic is done in UTC."""
    return (moment.astimezone(UTC) + timedelta(**delta)).astimezone(moment.tzinfo)


def elapsed(moment: datetime, **delta: int) -> str:
    return iso(moved(moment, **delta))  # type: ignore[return-value]


def floor_hour(moment: datetime) -> datetime:
    return moment.replace(minute=0, second=0, microsecond=0)


def hour_of(moment: datetime) -> tuple[str, str]:
    start = floor_hour(moment)
    return iso(start), elapsed(start, hours=1)  # type: ignore[return-value]


def on_or_before(d: date, wd: Any) -> date:
    return d + relativedelta(weekday=wd(-1))


def on_or_after(d: date, wd: Any) -> date:
    return d + relativedelta(weekday=wd(+1))


def strictly_before(d: date, wd: Any) -> date:
    return d + relativedelta(days=-1, weekday=wd(-1))


def strictly_after(d: date, wd: Any) -> date:
    return d + relativedelta(days=+1, weekday=wd(+1))


def in_week(d: date, wd: Any, offset: int, first: Any = MO) -> date:
    """Weekday ``wd`` inside the week ``offset`` weeks from the one holding ``d``."""
    return week_start(d, first) + relativedelta(weeks=offset, weekday=wd(+1))


_EN_RULES = Locale.parse("en").day_period_rules[None]


def day_period(d: date, period: str, tz: ZoneInfo = BERLIN) -> tuple[str, str]:
    """CLDR 49 English day period ``period`` (e.g. ``"morning1"``) of local date ``d``, from
    babel's ``Locale("en").day_period_rules``; wall-clock seconds after local midnight."""
    rule = _EN_RULES[period][0]
    base = midnight(d, tz)
    return iso(base + timedelta(seconds=rule["from"])), iso(base + timedelta(seconds=rule["before"]))  # type: ignore[return-value]


def weekend_days(locale: str) -> tuple[Any, int]:
    """The first weekend day (as a relativedelta weekday) and the number of weekend days of
    the locale's territory, from CLDR week data via babel."""
    loc = Locale.parse(locale)
    return WEEKDAYS[loc.weekend_start], (loc.weekend_end - loc.weekend_start) % 7 + 1


def weekend(first: date, locale: str = "en") -> tuple[str, str]:
    _, length = weekend_days(locale)
    return span(first, first + relativedelta(days=length))


def weekend_value(first: date, locale: str = "en") -> str:
    return f"{first.isoformat()}/P{weekend_days(locale)[1]}D"


def last_ended_weekend(today: date, locale: str = "en") -> date:
    """The latest weekend that ended by today's start: its first day is on or before
    today - length (relativedelta(days=-length, weekday=<first>(-1)))."""
    first, length = weekend_days(locale)
    return today + relativedelta(days=-length, weekday=first(-1))


def first_open_weekend(today: date, locale: str = "en") -> date:
    """The weekend holding today, else the coming one: the first weekend not yet ended."""
    first, length = weekend_days(locale)
    return today + relativedelta(days=-(length - 1), weekday=first(+1))


def numeric_order(locale: str) -> str:
    """``"MD"`` or ``"DM"``: which comes first in the locale's CLDR short date format."""
    pattern = get_date_format("short", locale=locale).pattern
    return "MD" if pattern.index("M") < pattern.index("d") else "DM"


def read_numeric(a: int, b: int, y: int, locale: str) -> date:
    """``a/b/y`` read in the locale's CLDR order."""
    return date(y, a, b) if numeric_order(locale) == "MD" else date(y, b, a)


def most_recent_year(first_day_in: Any, today: date = TODAY) -> int:
    """Past bias: the latest year whose period (first day given by ``first_day_in(year)``,
    ``None`` if the year has none) starts on or before today."""
    y = today.year + 1
    while True:
        first = first_day_in(y)
        if first is not None and first <= today:
            return y
        y -= 1


def next_year_after(end_day_in: Any, today: date = TODAY) -> int:
    """Future bias: the earliest year whose period (end day given by ``end_day_in(year)``,
    ``None`` if none) ends after today."""
    y = today.year - 1
    while True:
        end = end_day_in(y)
        if end is not None and end > today:
            return y
        y += 1


def week_53_monday(y: int) -> date | None:
    """ISO 8601: a year has week 53 when 28 December falls in it."""
    return date.fromisocalendar(y, 53, 1) if date(y, 12, 28).isocalendar()[1] == 53 else None


def leap_day(y: int) -> date | None:
    return date(y, 2, 29) if calendar.isleap(y) else None


def after_leap_day(y: int) -> date | None:
    return date(y, 3, 1) if calendar.isleap(y) else None


# --- tables -----------------------------------------------------------------------------------


def alt(reading: str, policy: str | None, bounds: tuple[str | None, str | None]) -> tuple:
    return (reading, policy, bounds[0], bounds[1])


def case(id: str, question: str, phrase: str, reading: str, bounds: tuple[str | None, str | None],
         value: str | None = None, alts: tuple = (), marks: Any = (), **context: Any) -> Any:
    return pytest.param(question, phrase, reading, bounds, value, alts, context, id=id, marks=marks)


def since(bounds: tuple[str, str]) -> tuple[str, None]:
    return bounds[0], None


def after(bounds: tuple[str, str]) -> tuple[str, None]:
    return bounds[1], None


def before(bounds: tuple[str, str]) -> tuple[None, str]:
    return None, bounds[0]


def until(bounds: tuple[str, str]) -> tuple[None, str]:
    return None, bounds[1]


def joined(first: tuple[str | None, str | None], last: tuple[str | None, str | None]) -> tuple:
    return first[0], last[1]


def check(question, phrase, reading, bounds, value, alts, context) -> None:  # type: ignore[no-untyped-def]
    m = one(question, **context)
    assert m.text == phrase
    assert m.reading == reading
    assert (m.start, m.end) == bounds
    if value is not None:
        assert m.value == value
    assert tuple((a.reading, a.policy, a.start, a.end) for a in m.alternatives) == alts


PARAMS = ("question", "phrase", "reading", "bounds", "value", "alts", "context")
D = relativedelta  # short for the tables

# R1: today / yesterday / tomorrow / the day before yesterday / the day after tomorrow.
R1 = [
    case("R1-en-today", "which bugs were closed today", "today", "R1", day(TODAY), TODAY.isoformat()),
    case("R1-en-yesterday", "which bugs were closed yesterday", "yesterday", "R1",
         day(TODAY + D(days=-1)), (TODAY + D(days=-1)).isoformat()),
    case("R1-en-tomorrow", "what is due tomorrow", "tomorrow", "R1", day(TODAY + D(days=1))),
    case("R1-en-the-day-before-yesterday", "what was reopened the day before yesterday",
         "the day before yesterday", "R1", day(TODAY + D(days=-2))),
    case("R1-en-the-day-after-tomorrow", "what is due the day after tomorrow",
         "the day after tomorrow", "R1", day(TODAY + D(days=2))),
    case("R1-en-yesterday-across-a-month-start", "who commented yesterday", "yesterday", "R1",
         day(MARCH_FIRST.date() + D(days=-1)), "2026-02-28", now=MARCH_FIRST),
    case("R1-en-tomorrow-is-a-23-hour-day", "what ships tomorrow", "tomorrow", "R1",
         day(EVE_OF_SPRING_BERLIN.date() + D(days=1)), now=EVE_OF_SPRING_BERLIN),
]

# R2: this / last (previous) / next (coming) + week | month | quarter | year: whole periods.
R2 = [
    case("R2-en-this-week", "tickets created this week", "this week", "R2", week(TODAY),
         iso_week_name(TODAY)),
    case("R2-en-last-week", "which bugs were created last week", "last week", "R2",
         week(TODAY + D(weeks=-1)), iso_week_name(TODAY + D(weeks=-1))),
    case("R2-en-next-week", "what is planned next week", "next week", "R2",
         week(TODAY + D(weeks=1)), iso_week_name(TODAY + D(weeks=1))),
    case("R2-en-last-week-sunday-start-on-a-Sunday", "tickets closed last week", "last week", "R2",
         week(SUNDAY.date() + D(weeks=-1), SU), "2026-11-29/P1W", now=SUNDAY, week_start="sunday"),
    case("R2-en_US-this-week-starts-on-CLDR-first-day", "tickets created this week", "this week",
         "R2", week(TODAY, WEEKDAYS[Locale.parse("en_US").first_week_day]), locale="en_US"),
    case("R2-en_GB-this-week-starts-on-CLDR-first-day", "tickets created this week", "this week",
         "R2", week(TODAY, WEEKDAYS[Locale.parse("en_GB").first_week_day]), locale="en_GB"),
    case("R2-en-last-month-at-a-month-end", "bugs fixed last month", "last month", "R2",
         month_of(MONTH_END.date() + D(months=-1)), "2026-02", now=MONTH_END),
    case("R2-en-this-month", "bugs fixed this month", "this month", "R2", month_of(TODAY), "2026-12"),
    case("R2-en-this-quarter", "who closed the most tickets this quarter", "this quarter", "R2",
         quarter_of(TODAY), "2026-Q4"),
    case("R2-en-previous-quarter", "velocity in the previous quarter", "in the previous quarter", "R2",
         quarter_of(TODAY + D(months=-3)), "2026-Q3"),
    case("R2-en-next-year", "epics planned for next year", "next year", "R2",
         year(TODAY.year + 1), "2027"),
    case("R2-en-coming-month", "releases in the coming month", "in the coming month", "R2",
         month_of(TODAY + D(months=1)), "2027-01"),
]

# R3: N units ago -> the whole unit containing now - N units.
R3 = [
    case("R3-en-3-days-ago", "bugs opened 3 days ago", "3 days ago", "R3", day(TODAY + D(days=-3))),
    case("R3-en-2-weeks-ago", "bugs opened 2 weeks ago", "2 weeks ago", "R3",
         week(TODAY + D(weeks=-2)), iso_week_name(TODAY + D(weeks=-2))),
    case("R3-en-2-weeks-ago-sunday-start", "bugs opened 2 weeks ago", "2 weeks ago", "R3",
         week(TODAY + D(weeks=-2), SU), week_start="sunday"),
    case("R3-en-a-month-ago-at-a-month-end", "what was merged a month ago", "a month ago", "R3",
         month_of((MONTH_END + D(months=-1)).date()), "2026-02", now=MONTH_END),
    case("R3-en-3-months-ago-at-a-month-end", "what was merged 3 months ago", "3 months ago", "R3",
         month_of((MAY_END + D(months=-3)).date()), "2026-02", now=MAY_END),
    case("R3-en-2-quarters-ago", "velocity 2 quarters ago", "2 quarters ago", "R3",
         quarter_of(TODAY + D(months=-6)), "2026-Q2"),
    case("R3-en-1-year-ago", "open bugs 1 year ago", "1 year ago", "R3", year(TODAY.year - 1), "2025"),
    case("R3-en-2-hours-ago", "alerts raised 2 hours ago", "2 hours ago", "R3",
         hour_of(moved(NOW, hours=-2)), f"{hour_of(moved(NOW, hours=-2))[0]}/PT1H"),
    case("R3-en-5-minutes-ago", "builds started 5 minutes ago", "5 minutes ago", "R3",
         (elapsed(NOW, minutes=-5), elapsed(NOW, minutes=-4)), f"{elapsed(NOW, minutes=-5)}/PT1M"),
    case("R3-en-24-hours-ago-across-DST", "alerts raised 24 hours ago", "24 hours ago", "R3",
         hour_of(moved(SPRING_BERLIN, hours=-24)), now=SPRING_BERLIN),
]

# R4: in N units -> the whole unit containing now + N units.
R4 = [
    case("R4-en-in-3-days", "what is due in 3 days", "in 3 days", "R4", day(TODAY + D(days=3))),
    case("R4-en-in-2-weeks", "what is due in 2 weeks", "in 2 weeks", "R4",
         week(TODAY + D(weeks=2)), iso_week_name(TODAY + D(weeks=2))),
    case("R4-en-in-a-month-from-January-31", "what renews in a month", "in a month", "R4",
         month_of((JANUARY_END + D(months=1)).date()), "2026-02", now=JANUARY_END),
    case("R4-en-in-2-hours", "which jobs run in 2 hours", "in 2 hours", "R4",
         hour_of(moved(NOW, hours=2))),
    case("R4-en-in-1-year", "contracts ending in 1 year", "in 1 year", "R4", year(TODAY.year + 1)),
    case("R4-en-in-24-hours-across-DST", "which jobs run in 24 hours", "in 24 hours", "R4",
         hour_of(moved(BEFORE_SPRING_BERLIN, hours=24)),
         now=BEFORE_SPRING_BERLIN),
]


def _cal_back(now: datetime, first: date, n: int, unit: str) -> tuple[str, str]:
    """The n whole calendar units before the current one (whose first day is ``first``)."""
    return span(first + relativedelta(**{unit: -n}), first, now.tzinfo)  # type: ignore[arg-type]


def _cal_ahead(now: datetime, first: date, n: int, unit: str) -> tuple[str, str]:
    """The n whole calendar units after the current one (whose first day is ``first``)."""
    return span(first + relativedelta(**{unit: 1}), first + relativedelta(**{unit: n + 1}), now.tzinfo)  # type: ignore[arg-type]


_THIS_MONTH = TODAY.replace(day=1)
_THIS_WEEK = week_start(TODAY)
_CAL = "window_reading=calendar"
_ROLL = "window_reading=rolling"

# R5: (in|over|within|during) the last/past N units -> rolling [now - N units, now); months and
# years by relativedelta; hours are elapsed time, days and longer move the wall clock.
R5 = [
    case("R5-en-in-the-last-7-days", "bugs in the last 7 days", "in the last 7 days", "R5",
         (wall(NOW, days=-7), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, TODAY, 7, "days")),)),
    case("R5-en-over-the-past-2-weeks", "bugs over the past 2 weeks", "over the past 2 weeks", "R5",
         (wall(NOW, weeks=-2), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, _THIS_WEEK, 2, "weeks")),)),
    case("R5-en-the-last-3-months", "tickets closed the last 3 months", "the last 3 months", "R5",
         (wall(NOW, months=-3), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, _THIS_MONTH, 3, "months")),)),
    case("R5-en-past-month-no-N-is-one-unit", "comments in the past month", "in the past month", "R5",
         (wall(NOW, months=-1), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, _THIS_MONTH, 1, "months")),)),
    case("R5-en-the-past-month-at-a-month-end", "merged the past month", "the past month", "R5",
         (wall(MONTH_END, months=-1), iso(MONTH_END)),
         alts=(alt("R5", _CAL, _cal_back(MONTH_END, date(2026, 3, 1), 1, "months")),), now=MONTH_END),
    case("R5-en-the-last-2-years-from-a-leap-day", "incidents in the last 2 years",
         "in the last 2 years", "R5", (wall(LEAP_DAY, years=-2), iso(LEAP_DAY)),
         alts=(alt("R5", _CAL, _cal_back(LEAP_DAY, date(2028, 1, 1), 2, "years")),), now=LEAP_DAY),
    case("R5-en-during-the-past-year", "releases during the past year", "during the past year", "R5",
         (wall(NOW, years=-1), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, date(2026, 1, 1), 1, "years")),)),
    case("R5-en-last-24-hours-is-24-real-hours-Berlin-spring", "errors within the last 24 hours",
         "within the last 24 hours", "R5", (elapsed(SPRING_BERLIN, hours=-24), iso(SPRING_BERLIN)),
         now=SPRING_BERLIN),
    case("R5-en-last-24-hours-is-24-real-hours-Berlin-autumn", "errors in the last 24 hours",
         "in the last 24 hours", "R5", (elapsed(AUTUMN_BERLIN, hours=-24), iso(AUTUMN_BERLIN)),
         now=AUTUMN_BERLIN),
    case("R5-en-last-24-hours-is-24-real-hours-New-York-spring", "errors in last 24 hours",
         "in last 24 hours", "R5", (elapsed(SPRING_NEW_YORK, hours=-24), iso(SPRING_NEW_YORK)),
         now=SPRING_NEW_YORK),
    case("R5-en-the-past-day-is-wall-clock-across-DST", "alerts over the past day",
         "over the past day", "R5", (wall(SPRING_BERLIN, days=-1), iso(SPRING_BERLIN)),
         alts=(alt("R5", _CAL, _cal_back(SPRING_BERLIN, SPRING_BERLIN.date(), 1, "days")),),
         now=SPRING_BERLIN),
    case("R5-en-last-2-days-is-wall-clock-New-York-spring", "bugs in the last 2 days",
         "in the last 2 days", "R5", (wall(SPRING_NEW_YORK, days=-2), iso(SPRING_NEW_YORK)),
         alts=(alt("R5", _CAL, _cal_back(SPRING_NEW_YORK, SPRING_NEW_YORK.date(), 2, "days")),),
         now=SPRING_NEW_YORK),
    case("R5-en-last-2-hours-off-the-hour", "deploys in the last 2 hours", "in the last 2 hours", "R5",
         (elapsed(QUARTER_PAST, hours=-2), iso(QUARTER_PAST)),
         alts=(alt("R5", _CAL, (elapsed(floor_hour(QUARTER_PAST), hours=-2), iso(floor_hour(QUARTER_PAST)))),),
         now=QUARTER_PAST),
    case("R5-en-past-30-minutes-on-the-hour-has-no-other-reading", "builds in the past 30 minutes",
         "in the past 30 minutes", "R5", (elapsed(NOW, minutes=-30), iso(NOW))),
    case("R5-en-calendar-policy-reads-whole-days", "bugs in the last 7 days", "in the last 7 days",
         "R5", _cal_back(NOW, TODAY, 7, "days"),
         alts=(alt("R5", _ROLL, (wall(NOW, days=-7), iso(NOW))),), window_reading="calendar"),
]

# R6: (in|within) the next N units -> [now, now + N units).
R6 = [
    case("R6-en-in-the-next-3-days", "what is due in the next 3 days", "in the next 3 days", "R6",
         (iso(NOW), wall(NOW, days=3)),
         alts=(alt("R6", _CAL, _cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-en-within-the-next-2-weeks", "what lands within the next 2 weeks",
         "within the next 2 weeks", "R6", (iso(NOW), wall(NOW, weeks=2)),
         alts=(alt("R6", _CAL, _cal_ahead(NOW, _THIS_WEEK, 2, "weeks")),)),
    case("R6-en-the-next-6-hours", "jobs scheduled the next 6 hours", "the next 6 hours", "R6",
         (iso(NOW), elapsed(NOW, hours=6)),
         alts=(alt("R6", _CAL, (elapsed(floor_hour(NOW), hours=1), elapsed(floor_hour(NOW), hours=7))),)),
    case("R6-en-next-2-months", "renewals in next 2 months", "in next 2 months", "R6",
         (iso(NOW), wall(NOW, months=2)),
         alts=(alt("R6", _CAL, _cal_ahead(NOW, _THIS_MONTH, 2, "months")),)),
    case("R6-en-within-the-next-month-no-N", "what ships within the next month",
         "within the next month", "R6", (iso(NOW), wall(NOW, months=1)),
         alts=(alt("R6", _CAL, _cal_ahead(NOW, _THIS_MONTH, 1, "months")),)),
    case("R6-en-within-3-days", "fix it within 3 days", "within 3 days", "R6",
         (iso(NOW), wall(NOW, days=3)),
         alts=(alt("R6", _CAL, _cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-en-the-next-24-hours-across-DST", "jobs in the next 24 hours", "in the next 24 hours",
         "R6", (iso(BEFORE_SPRING_BERLIN), elapsed(BEFORE_SPRING_BERLIN, hours=24)),
         alts=(alt("R6", _CAL, (elapsed(BEFORE_SPRING_BERLIN, hours=1), elapsed(BEFORE_SPRING_BERLIN, hours=25))),),
         now=BEFORE_SPRING_BERLIN),
    case("R6-en-calendar-policy-reads-whole-days", "what is due in the next 3 days",
         "in the next 3 days", "R6", _cal_ahead(NOW, TODAY, 3, "days"),
         alts=(alt("R6", _ROLL, (iso(NOW), wall(NOW, days=3))),), window_reading="calendar"),
]

_MARCH_PAST = month(most_recent_year(lambda y: date(y, 3, 1)), 3)
_MARCH_NEXT = month(next_year_after(lambda y: date(y, 4, 1)), 3)
_MONDAY_PAST = day(on_or_before(TODAY, MO))
_MONDAY_NEXT = day(on_or_after(TODAY, MO))

# R7: since X; from X on/onwards -> [start(X), open).
R7 = [
    case("R7-en-since-last-week", "what did we ship since last week", "since last week", "R7",
         since(week(TODAY + D(weeks=-1))), "2026-11-23/.."),
    case("R7-en-since-March", "bugs closed since March", "since March", "R7", since(_MARCH_PAST),
         "2026-03-01/..", alts=(alt("R7", "bias=future", since(_MARCH_NEXT)),)),
    case("R7-en-since-2024", "tickets opened since 2024", "since 2024", "R7", since(year(2024)),
         "2024-01-01/.."),
    case("R7-en-since-yesterday", "comments since yesterday", "since yesterday", "R7",
         since(day(TODAY + D(days=-1)))),
    case("R7-en-since-Monday", "commits since Monday", "since Monday", "R7", since(_MONDAY_PAST),
         alts=(alt("R7", "bias=future", since(_MONDAY_NEXT)),)),
    case("R7-en-from-March-on", "bugs from March on", "from March on", "R7", since(_MARCH_PAST),
         alts=(alt("R7", "bias=future", since(_MARCH_NEXT)),)),
    case("R7-en-from-last-week-onwards", "bugs from last week onwards", "from last week onwards",
         "R7", since(week(TODAY + D(weeks=-1)))),
    case("R7-en-from-an-ISO-date-onward", "deploys from 2025-03-14 onward", "from 2025-03-14 onward",
         "R7", since(day(date(2025, 3, 14))), "2025-03-14/.."),
]

# R8: after X -> [end(X), open).
R8 = [
    case("R8-en-after-March", "bugs opened after March", "after March", "R8", after(_MARCH_PAST),
         "2026-04-01/..", alts=(alt("R8", "bias=future", after(_MARCH_NEXT)),)),
    case("R8-en-after-2025", "tickets due after 2025", "after 2025", "R8", after(year(2025))),
    case("R8-en-after-last-week", "reopened after last week", "after last week", "R8",
         after(week(TODAY + D(weeks=-1)))),
    case("R8-en-after-yesterday", "comments after yesterday", "after yesterday", "R8",
         after(day(TODAY + D(days=-1)))),
]

# R9: before X -> [open, start(X)).
R9 = [
    case("R9-en-before-March", "bugs opened before March", "before March", "R9", before(_MARCH_PAST),
         alts=(alt("R9", "bias=future", before(_MARCH_NEXT)),)),
    case("R9-en-before-2025", "tickets closed before 2025", "before 2025", "R9", before(year(2025))),
    case("R9-en-before-last-week", "stale since before last week", "before last week", "R9",
         before(week(TODAY + D(weeks=-1)))),
    case("R9-en-before-yesterday", "comments before yesterday", "before yesterday", "R9",
         before(day(TODAY + D(days=-1)))),
]

# R10: until / till / up to / through / by X -> [open, end(X)).
R10 = [
    case("R10-en-until-Friday-deadline-looks-ahead", "work planned until Friday", "until Friday",
         "R10", until(day(on_or_after(TODAY, FR))),
         alts=(alt("R10", None, until(day(on_or_before(TODAY, FR)))),)),
    case("R10-en-by-Friday-deadline-looks-ahead", "what must be fixed by Friday", "by Friday", "R10",
         until(day(on_or_after(TODAY, FR))),
         alts=(alt("R10", None, until(day(on_or_before(TODAY, FR)))),)),
    case("R10-en-till-March", "frozen till March", "till March", "R10", until(_MARCH_PAST),
         alts=(alt("R10", "bias=future", until(_MARCH_NEXT)),)),
    case("R10-en-up-to-last-week", "bugs up to last week", "up to last week", "R10",
         until(week(TODAY + D(weeks=-1)))),
    case("R10-en-through-2025", "incidents through 2025", "through 2025", "R10", until(year(2025))),
    case("R10-en-until-tomorrow", "on call until tomorrow", "until tomorrow", "R10",
         until(day(TODAY + D(days=1)))),
]

# R11: between X and Y; from X to/until/through Y; X - Y -> [start(X), end(Y)); an end with
# missing fields takes them from the start and is the first such period not before it.
_FUT = "bias=future"
R11 = [
    case("R11-en-between-March-and-May", "bugs between March and May", "between March and May",
         "R11", joined(month(2026, 3), month(2026, 5)),
         alts=(alt("R11", _FUT, joined(month(2027, 3), month(2027, 5))),)),
    case("R11-en-between-dates-year-on-the-end", "between 1 March and 15 April 2026",
         "between 1 March and 15 April 2026", "R11", joined(day(date(2026, 3, 1)), day(date(2026, 4, 15)))),
    case("R11-en-from-January-to-March", "velocity from January to March", "from January to March",
         "R11", joined(month(2026, 1), month(2026, 3)),
         alts=(alt("R11", _FUT, joined(month(2027, 1), month(2027, 3))),)),
    case("R11-en-from-March-to-January-ends-next-year", "bugs from March to January",
         "from March to January", "R11", joined(month(2026, 3), month(2027, 1)),
         alts=(alt("R11", _FUT, joined(month(2027, 3), month(2028, 1))),)),
    case("R11-en-from-November-to-February", "on-call from November to February",
         "from November to February", "R11", joined(month(2026, 11), month(2027, 2)),
         alts=(alt("R11", _FUT, joined(month(2027, 11), month(2028, 2))),)),
    case("R11-en-from-December-28-to-January-3", "freeze from December 28 to January 3",
         "from December 28 to January 3", "R11", joined(day(date(2025, 12, 28)), day(date(2026, 1, 3))),
         alts=(alt("R11", _FUT, joined(day(date(2026, 12, 28)), day(date(2027, 1, 3)))),)),
    case("R11-en-from-Monday-to-Friday", "commits from Monday to Friday", "from Monday to Friday",
         "R11", joined(day(on_or_before(TODAY, MO)), day(on_or_before(TODAY, MO) + D(weekday=FR))),
         alts=(alt("R11", _FUT, joined(day(on_or_after(TODAY, MO)), day(on_or_after(TODAY, MO) + D(weekday=FR)))),)),
    case("R11-en-from-Friday-to-Monday-wraps-the-week", "alerts from Friday to Monday",
         "from Friday to Monday", "R11",
         joined(day(on_or_before(TODAY, FR)), day(on_or_before(TODAY, FR) + D(weekday=MO))),
         alts=(alt("R11", _FUT, joined(day(on_or_after(TODAY, FR)), day(on_or_after(TODAY, FR) + D(weekday=MO)))),)),
    case("R11-en-Monday-en-dash-Friday", "commits Monday\u2013Friday", "Monday\u2013Friday", "R11",
         joined(day(on_or_before(TODAY, MO)), day(on_or_before(TODAY, MO) + D(weekday=FR))),
         alts=(alt("R11", _FUT, joined(day(on_or_after(TODAY, MO)), day(on_or_after(TODAY, MO) + D(weekday=FR)))),)),
    case("R11-en-March-3-17", "bugs March 3-17", "March 3-17", "R11",
         joined(day(date(2026, 3, 3)), day(date(2026, 3, 17))),
         alts=(alt("R11", _FUT, joined(day(date(2027, 3, 3)), day(date(2027, 3, 17)))),)),
    case("R11-en-between-March-3-and-17", "bugs between March 3 and 17", "between March 3 and 17",
         "R11", joined(day(date(2026, 3, 3)), day(date(2026, 3, 17))),
         alts=(alt("R11", _FUT, joined(day(date(2027, 3, 3)), day(date(2027, 3, 17)))),)),
    case("R11-en-from-ISO-date-to-ISO-date", "spend from 2025-01-01 to 2025-03-31",
         "from 2025-01-01 to 2025-03-31", "R11", joined(day(date(2025, 1, 1)), day(date(2025, 3, 31))),
         # ISO 8601 writes a range of calendar dates with its last day included.
         "2025-01-01/2025-03-31"),
    case("R11-en-ISO-date-en-dash-ISO-date", "spend 2025-01-01 \u2013 2025-01-31",
         "2025-01-01 \u2013 2025-01-31", "R11", joined(day(date(2025, 1, 1)), day(date(2025, 1, 31)))),
    case("R11-en-from-last-week-to-this-week", "bugs from last week to this week",
         "from last week to this week", "R11", joined(week(TODAY + D(weeks=-1)), week(TODAY))),
    case("R11-en-from-Q1-to-Q3", "revenue from Q1 to Q3", "from Q1 to Q3", "R11",
         joined(quarter(2026, 1), quarter(2026, 3)),
         alts=(alt("R11", _FUT, joined(quarter(2027, 1), quarter(2027, 3))),)),
    case("R11-en-from-2024-through-2025", "incidents from 2024 through 2025",
         "from 2024 through 2025", "R11", joined(year(2024), year(2025))),
    case("R11-en-from-the-day-before-yesterday-until-today", "edits from the day before yesterday until today",
         "from the day before yesterday until today", "R11",
         joined(day(TODAY + D(days=-2)), day(TODAY))),
]


def _past(first_day_in: Any, today: date = TODAY) -> int:
    return most_recent_year(first_day_in, today)


def _future(end_day_in: Any, today: date = TODAY) -> int:
    return next_year_after(end_day_in, today)


_MAR14 = (_past(lambda y: date(y, 3, 14)), _future(lambda y: date(y, 3, 15)))
_DEC3 = (_past(lambda y: date(y, 12, 3)), _future(lambda y: date(y, 12, 4)))

# R12: a bare month, quarter, half or "March 14": past bias, the most recent one whose start is
# on or before now (the current one counts); the next one is the alternative (bias=future).
R12 = [
    case("R12-en-in-March", "bugs in March", "in March", "R12", _MARCH_PAST, "2026-03",
         alts=(alt("R12", _FUT, _MARCH_NEXT),)),
    case("R12-en-in-December-current-month-counts", "bugs in December", "in December", "R12",
         month(2026, 12), "2026-12"),
    case("R12-en-in-January", "bugs in January", "in January", "R12",
         month(_past(lambda y: date(y, 1, 1)), 1),
         alts=(alt("R12", _FUT, month(_future(lambda y: date(y, 2, 1)), 1)),)),
    case("R12-en-in-December-said-in-January", "bugs in December", "in December", "R12",
         month(_past(lambda y: date(y, 12, 1), MID_JANUARY.date()), 12), "2026-12",
         alts=(alt("R12", _FUT, month(_future(lambda y: date(y + 1, 1, 1), MID_JANUARY.date()), 12)),),
         now=MID_JANUARY),
    case("R12-en-in-Q3", "what shipped in Q3", "in Q3", "R12",
         quarter(_past(lambda y: date(y, 7, 1)), 3), "2026-Q3",
         alts=(alt("R12", _FUT, quarter(_future(lambda y: date(y, 10, 1)), 3)),)),
    case("R12-en-in-Q4-current-quarter-counts", "what shipped in Q4", "in Q4", "R12",
         quarter(2026, 4), "2026-Q4"),
    case("R12-en-in-the-first-quarter", "what shipped in the first quarter", "in the first quarter",
         "R12", quarter(_past(lambda y: date(y, 1, 1)), 1),
         alts=(alt("R12", _FUT, quarter(_future(lambda y: date(y, 4, 1)), 1)),)),
    case("R12-en-in-H1", "goals in H1", "in H1", "R12", half(_past(lambda y: date(y, 1, 1)), 1),
         "2026-H1", alts=(alt("R12", _FUT, half(_future(lambda y: date(y, 7, 1)), 1)),)),
    case("R12-en-in-H2-current-half-counts", "goals in H2", "in H2", "R12", half(2026, 2), "2026-H2"),
    case("R12-en-the-first-half-of-the-year", "hiring in the first half of the year",
         "in the first half of the year", "R12", half(2026, 1),
         alts=(alt("R12", _FUT, half(2027, 1)),)),
    case("R12-en-March-14", "released March 14", "March 14", "R12", day(date(_MAR14[0], 3, 14)),
         "2026-03-14", alts=(alt("R12", _FUT, day(date(_MAR14[1], 3, 14))),)),
    case("R12-en-on-14-March", "released on 14 March", "on 14 March", "R12",
         day(date(_MAR14[0], 3, 14)), alts=(alt("R12", _FUT, day(date(_MAR14[1], 3, 14))),)),
    case("R12-en-on-December-2-today-counts", "released on December 2", "on December 2", "R12",
         day(TODAY)),
    case("R12-en-on-December-3-is-last-year", "released on December 3", "on December 3", "R12",
         day(date(_DEC3[0], 12, 3)), "2025-12-03", alts=(alt("R12", _FUT, day(date(_DEC3[1], 12, 3))),)),
    case("R12-en-on-the-3rd-of-December", "released on the 3rd of December",
         "on the 3rd of December", "R12", day(date(_DEC3[0], 12, 3)),
         alts=(alt("R12", _FUT, day(date(_DEC3[1], 12, 3))),)),
    case("R12-en-February-29-finds-the-last-leap-year", "what happened on February 29",
         "on February 29", "R12", day(date(_past(leap_day, BEFORE_LEAP_DAY.date()), 2, 29)),
         "2024-02-29",
         alts=(alt("R12", _FUT, day(date(_future(after_leap_day, BEFORE_LEAP_DAY.date()), 2, 29))),),
         now=BEFORE_LEAP_DAY),
]

_PAST = "bias=past"

# R13: a bare weekday -> the most recent one on or before today (bias=future: the first on or
# after today); after a deadline word (by, due, until, till) the first on or after today, and no
# setting selects the earlier one (policy null).
R13 = [
    case("R13-en-on-Monday", "bugs on Monday", "on Monday", "R13", day(on_or_before(TODAY, MO)),
         on_or_before(TODAY, MO).isoformat(), alts=(alt("R13", _FUT, day(on_or_after(TODAY, MO))),)),
    case("R13-en-on-Wednesday-is-today", "bugs on Wednesday", "on Wednesday", "R13", day(TODAY)),
    case("R13-en-on-Thursday", "bugs on Thursday", "on Thursday", "R13",
         day(on_or_before(TODAY, TH)), alts=(alt("R13", _FUT, day(on_or_after(TODAY, TH))),)),
    case("R13-en-bare-Friday-without-on", "bugs closed Friday", "Friday", "R13",
         day(on_or_before(TODAY, FR)), alts=(alt("R13", _FUT, day(on_or_after(TODAY, FR))),)),
    case("R13-en-on-Sat-abbreviation-after-on", "deploys on Sat", "on Sat", "R13",
         day(on_or_before(TODAY, SA)), alts=(alt("R13", _FUT, day(on_or_after(TODAY, SA))),)),
    case("R13-en-on-Sunday-said-on-a-Sunday", "bugs on Sunday", "on Sunday", "R13",
         day(SUNDAY.date()), now=SUNDAY),
    case("R13-en-on-Monday-said-on-a-Sunday", "bugs on Monday", "on Monday", "R13",
         day(on_or_before(SUNDAY.date(), MO)),
         alts=(alt("R13", _FUT, day(on_or_after(SUNDAY.date(), MO))),), now=SUNDAY),
    case("R13-en-due-Friday-looks-ahead", "what is due Friday", "Friday", "R13",
         day(on_or_after(TODAY, FR)), alts=(alt("R13", None, day(on_or_before(TODAY, FR))),)),
    case("R13-en-due-on-Monday-looks-ahead", "tasks due on Monday", "Monday", "R13",
         day(on_or_after(TODAY, MO)), alts=(alt("R13", None, day(on_or_before(TODAY, MO))),)),
    case("R13-en-due-by-Wednesday-is-today", "what is due by Wednesday", "Wednesday", "R13", day(TODAY)),
    case("R13-en-till-Thursday-looks-ahead", "frozen till Thursday", "till Thursday", "R10",
         until(day(on_or_after(TODAY, TH))), alts=(alt("R10", None, until(day(on_or_before(TODAY, TH)))),)),
    case("R13-en-future-bias-flips-on-Monday", "bugs on Monday", "on Monday", "R13",
         day(on_or_after(TODAY, MO)), alts=(alt("R13", _PAST, day(on_or_before(TODAY, MO))),),
         bias="future"),
]

_WEEK = "weekday_reading=week"
_NEAREST = "weekday_reading=nearest"

# R14: last <weekday> -> the most recent one strictly before today; "<weekday> of last week"
# (R16) is the alternative when it is another day (weekday_reading=week).
R14 = [
    case("R14-en-last-Monday", "what broke last Monday", "last Monday", "R14",
         day(strictly_before(TODAY, MO)), strictly_before(TODAY, MO).isoformat(),
         alts=(alt("R16", _WEEK, day(in_week(TODAY, MO, -1))),)),
    case("R14-en-last-Tuesday-is-yesterday", "what broke last Tuesday", "last Tuesday", "R14",
         day(strictly_before(TODAY, TU)), alts=(alt("R16", _WEEK, day(in_week(TODAY, TU, -1))),)),
    case("R14-en-last-Wednesday-said-on-a-Wednesday", "what broke last Wednesday",
         "last Wednesday", "R14", day(strictly_before(TODAY, WE))),
    case("R14-en-last-Thursday", "what broke last Thursday", "last Thursday", "R14",
         day(strictly_before(TODAY, TH))),
    case("R14-en-last-Mon-abbreviation", "what broke last Mon", "last Mon", "R14",
         day(strictly_before(TODAY, MO)), alts=(alt("R16", _WEEK, day(in_week(TODAY, MO, -1))),)),
    case("R14-en-previous-Friday", "deploys previous Friday", "previous Friday", "R14",
         day(strictly_before(TODAY, FR))),
    case("R14-en-this-past-Tuesday", "deploys this past Tuesday", "this past Tuesday", "R14",
         day(strictly_before(TODAY, TU)), alts=(alt("R16", _WEEK, day(in_week(TODAY, TU, -1))),)),
    case("R14-en-last-Sunday-said-on-a-Sunday", "what broke last Sunday", "last Sunday", "R14",
         day(strictly_before(SUNDAY.date(), SU)), now=SUNDAY),
    case("R14-en-last-Saturday-said-on-a-Saturday", "what broke last Saturday", "last Saturday",
         "R14", day(strictly_before(SATURDAY.date(), SA)), now=SATURDAY),
    case("R14-en-last-Sunday-sunday-weeks-offers-last-weeks-Sunday", "what broke last Sunday",
         "last Sunday", "R14", day(strictly_before(TODAY, SU)),
         alts=(alt("R16", _WEEK, day(in_week(TODAY, SU, -1, SU))),), week_start="sunday"),
]

# R15: next <weekday> -> the first one strictly after today; "<weekday> of next week" (R16) is
# the alternative when it is another day (weekday_reading=week).
R15 = [
    case("R15-en-next-Monday", "what is planned next Monday", "next Monday", "R15",
         day(strictly_after(TODAY, MO)), strictly_after(TODAY, MO).isoformat()),
    case("R15-en-next-Wednesday-said-on-a-Wednesday", "planned next Wednesday", "next Wednesday",
         "R15", day(strictly_after(TODAY, WE))),
    case("R15-en-next-Thursday-is-tomorrow", "planned next Thursday", "next Thursday", "R15",
         day(strictly_after(TODAY, TH)), alts=(alt("R16", _WEEK, day(in_week(TODAY, TH, 1))),)),
    case("R15-en-next-Tuesday", "planned next Tuesday", "next Tuesday", "R15",
         day(strictly_after(TODAY, TU))),
    case("R15-en-next-Fri-abbreviation", "demo next Fri", "next Fri", "R15",
         day(strictly_after(TODAY, FR)), alts=(alt("R16", _WEEK, day(in_week(TODAY, FR, 1))),)),
    case("R15-en-this-coming-Friday", "demo this coming Friday", "this coming Friday", "R15",
         day(strictly_after(TODAY, FR)), alts=(alt("R16", _WEEK, day(in_week(TODAY, FR, 1))),)),
    case("R15-en-coming-Saturday", "maintenance coming Saturday", "coming Saturday", "R15",
         day(strictly_after(TODAY, SA)), alts=(alt("R16", _WEEK, day(in_week(TODAY, SA, 1))),)),
    case("R15-en-next-Sunday-said-on-a-Sunday", "planned next Sunday", "next Sunday", "R15",
         day(strictly_after(SUNDAY.date(), SU)), now=SUNDAY),
    case("R15-en-next-Monday-said-on-a-Sunday-sunday-weeks", "planned next Monday", "next Monday",
         "R15", day(strictly_after(SUNDAY.date(), MO)),
         alts=(alt("R16", _WEEK, day(in_week(SUNDAY.date(), MO, 1, SU))),), now=SUNDAY,
         week_start="sunday"),
]

# R16: <weekday> of last / this / next week -> that weekday inside the week offset -1 / 0 / +1
# (weeks start on the context's week_start).
R16 = [
    case("R16-en-Monday-of-last-week", "what broke Monday of last week", "Monday of last week",
         "R16", day(in_week(TODAY, MO, -1)), in_week(TODAY, MO, -1).isoformat()),
    case("R16-en-Friday-of-next-week", "demo Friday of next week", "Friday of next week", "R16",
         day(in_week(TODAY, FR, 1))),
    case("R16-en-Wednesday-of-this-week", "Wednesday of this week", "Wednesday of this week", "R16",
         day(in_week(TODAY, WE, 0))),
    case("R16-en-Monday-this-week-already-past", "deploys Monday this week", "Monday this week",
         "R16", day(in_week(TODAY, MO, 0)), alts=(alt("R15", None, day(on_or_after(TODAY, MO))),)),
    case("R16-en-this-Friday", "demo this Friday", "this Friday", "R16", day(in_week(TODAY, FR, 0))),
    case("R16-en-last-weeks-Friday", "deploys last week's Friday", "last week's Friday", "R16",
         day(in_week(TODAY, FR, -1))),
    case("R16-en-Sunday-of-last-week-sunday-weeks", "Sunday of last week", "Sunday of last week",
         "R16", day(in_week(SUNDAY.date(), SU, -1, SU)), now=SUNDAY, week_start="sunday"),
    case("R16-en-Saturday-of-last-week-sunday-weeks", "Saturday of last week",
         "Saturday of last week", "R16", day(in_week(SUNDAY.date(), SA, -1, SU)), now=SUNDAY,
         week_start="sunday"),
    case("R16-en-Monday-of-this-week-sunday-weeks", "Monday of this week", "Monday of this week",
         "R16", day(in_week(SUNDAY.date(), MO, 0, SU)), now=SUNDAY, week_start="sunday"),
    case("R16-en_US-Sunday-of-this-week-CLDR-week-start", "Sunday of this week",
         "Sunday of this week", "R16",
         day(in_week(TODAY, SU, 0, WEEKDAYS[Locale.parse("en_US").first_week_day])),
         alts=(alt("R15", None, day(on_or_after(TODAY, SU))),), locale="en_US"),
    case("R16-en-week-policy-reads-last-Monday-as-last-weeks", "what broke last Monday",
         "last Monday", "R16", day(in_week(TODAY, MO, -1)),
         alts=(alt("R14", _NEAREST, day(strictly_before(TODAY, MO))),), weekday_reading="week"),
    case("R16-en-week-policy-reads-next-Thursday-as-next-weeks", "planned next Thursday",
         "next Thursday", "R16", day(in_week(TODAY, TH, 1)),
         alts=(alt("R15", _NEAREST, day(strictly_after(TODAY, TH))),), weekday_reading="week"),
]

# R17: an explicit year with a temporal cue -> that year.
R17 = [
    case("R17-en-in-2025", "bugs in 2025", "in 2025", "R17", year(2025), "2025"),
    case("R17-en-during-2023", "outages during 2023", "during 2023", "R17", year(2023), "2023"),
    case("R17-en-the-year-2022", "headcount the year 2022", "the year 2022", "R17", year(2022)),
    case("R17-en-in-year-2021", "closed in year 2021", "in year 2021", "R17", year(2021)),
    case("R17-en-from-2025-beside-numbers", "list 5 items with priority 2 from 2025", "from 2025",
         "R17", year(2025), "2025"),
]

_EN_03_04 = read_numeric(3, 4, 2026, "en")
_GB_03_04 = read_numeric(3, 4, 2026, "en_GB")
_US_03_04 = read_numeric(3, 4, 2026, "en_US")
_OTHER = {date(2026, 3, 4): date(2026, 4, 3), date(2026, 4, 3): date(2026, 3, 4)}
_ORDER_POLICY = {"MD": "date_order=MDY", "DM": "date_order=DMY"}


def _flip(locale: str) -> str:
    return _ORDER_POLICY["DM" if numeric_order(locale) == "MD" else "MD"]


# R18: absolute dates -> that day. Numeric dates follow the locale's CLDR short date order; when
# the other order also gives a date it is the alternative (policy date_order=...).
R18 = [
    case("R18-en-ISO-date", "fixed 2025-03-14", "2025-03-14", "R18", day(date(2025, 3, 14)), "2025-03-14"),
    case("R18-en-day-month-year", "fixed 14 March 2025", "14 March 2025", "R18", day(date(2025, 3, 14))),
    case("R18-en-month-day-comma-year", "fixed March 14, 2025", "March 14, 2025", "R18",
         day(date(2025, 3, 14))),
    case("R18-en-the-14th-of-March-2025", "fixed on the 14th of March 2025",
         "on the 14th of March 2025", "R18", day(date(2025, 3, 14))),
    case("R18-en-weekday-month-day-year", "fixed on Saturday, March 14, 2026",
         "on Saturday, March 14, 2026", "R18", day(date(2026, 3, 14))),
    case("R18-en-numeric-ambiguous", "fixed on 03/04/2026", "on 03/04/2026", "R18", day(_EN_03_04),
         _EN_03_04.isoformat(), alts=(alt("R18", _flip("en"), day(_OTHER[_EN_03_04])),)),
    case("R18-en_US-numeric-ambiguous", "fixed on 03/04/2026", "on 03/04/2026", "R18",
         day(_US_03_04), alts=(alt("R18", _flip("en_US"), day(_OTHER[_US_03_04])),), locale="en_US"),
    case("R18-en_GB-numeric-ambiguous", "fixed on 03/04/2026", "on 03/04/2026", "R18",
         day(_GB_03_04), alts=(alt("R18", _flip("en_GB"), day(_OTHER[_GB_03_04])),), locale="en_GB"),
    case("R18-en-numeric-date-order-policy-DMY", "fixed on 03/04/2026", "on 03/04/2026", "R18",
         day(date(2026, 4, 3)), alts=(alt("R18", "date_order=MDY", day(date(2026, 3, 4))),),
         date_order="DMY"),
    case("R18-en_GB-numeric-date-order-policy-MDY", "fixed on 03/04/2026", "on 03/04/2026", "R18",
         day(date(2026, 3, 4)), alts=(alt("R18", "date_order=DMY", day(date(2026, 4, 3))),),
         locale="en_GB", date_order="MDY"),
    case("R18-en-numeric-only-one-valid-reading", "fixed on 13/04/2026", "on 13/04/2026", "R18",
         day(date(2026, 4, 13))),
    case("R18-en_GB-numeric-only-one-valid-reading", "fixed on 04/13/2026", "on 04/13/2026", "R18",
         day(date(2026, 4, 13)), locale="en_GB"),
    case("R18-en-numeric-same-either-way", "fixed on 03/03/2026", "on 03/03/2026", "R18",
         day(date(2026, 3, 3))),
    case("R18-en-numeric-two-digit-year", "fixed on 03/04/26", "on 03/04/26", "R18",
         day(read_numeric(3, 4, 2026, "en")),
         alts=(alt("R18", _flip("en"), day(_OTHER[read_numeric(3, 4, 2026, "en")])),)),
    case("R18-en-numeric-year-first", "fixed on 2026/04/03", "on 2026/04/03", "R18",
         day(date(2026, 4, 3))),
    case("R18-en_GB-numeric-with-dots", "fixed on 3.4.2026", "on 3.4.2026", "R18",
         day(read_numeric(3, 4, 2026, "en_GB")),
         alts=(alt("R18", _flip("en_GB"), day(_OTHER[read_numeric(3, 4, 2026, "en_GB")])),),
         locale="en_GB"),
]

# R19: month + year, quarter + year, half + year -> that period.
R19 = [
    case("R19-en-in-March-2025", "bugs in March 2025", "in March 2025", "R19", month(2025, 3), "2025-03"),
    case("R19-en-Jan-2025-abbreviation", "bugs Jan 2025", "Jan 2025", "R19", month(2025, 1), "2025-01"),
    case("R19-en-Q3-2025", "revenue Q3 2025", "Q3 2025", "R19", quarter(2025, 3), "2025-Q3"),
    case("R19-en-Q3-slash-2025", "revenue Q3/2025", "Q3/2025", "R19", quarter(2025, 3)),
    case("R19-en-2025-Q3", "revenue 2025 Q3", "2025 Q3", "R19", quarter(2025, 3)),
    case("R19-en-the-third-quarter-of-2025", "revenue the third quarter of 2025",
         "the third quarter of 2025", "R19", quarter(2025, 3)),
    case("R19-en-H1-2026", "goals H1 2026", "H1 2026", "R19", half(2026, 1), "2026-H1"),
    case("R19-en-first-half-of-2026", "goals first half of 2026", "first half of 2026", "R19",
         half(2026, 1), "2026-H1"),
    case("R19-en-the-second-half-of-2025", "goals the second half of 2025",
         "the second half of 2025", "R19", half(2025, 2), "2025-H2"),
    case("R19-en-ISO-2025-Q2", "revenue 2025-Q2", "2025-Q2", "R19", quarter(2025, 2), "2025-Q2"),
    case("R19-en-ISO-2025-H2", "goals 2025-H2", "2025-H2", "R19", half(2025, 2), "2025-H2"),
    case("R19-en-ISO-year-month", "bugs 2025-03", "2025-03", "R19", month(2025, 3), "2025-03"),
]


def _recent_week(w: int, today: date = TODAY) -> int:
    return most_recent_year(lambda y: date.fromisocalendar(y, w, 1) if w < 53 else week_53_monday(y), today)


def _next_week(w: int, today: date = TODAY) -> int:
    def end(y: int) -> date | None:
        first = date.fromisocalendar(y, w, 1) if w < 53 else week_53_monday(y)
        return None if first is None else first + D(days=7)

    return next_year_after(end, today)


# R20: ISO 8601 weeks. With a year: that week. Without ("week 48"): past bias as R12.
R20 = [
    case("R20-en-week-48-of-2026", "tickets week 48 of 2026", "week 48 of 2026", "R20",
         iso_week(2026, 48), "2026-W48"),
    case("R20-en-in-week-1-of-2027", "tickets in week 1 of 2027", "in week 1 of 2027", "R20",
         iso_week(2027, 1), "2027-W01"),
    case("R20-en-ISO-2026-W48", "tickets 2026-W48", "2026-W48", "R20", iso_week(2026, 48), "2026-W48"),
    case("R20-en-ISO-basic-2026W48", "tickets 2026W48", "2026W48", "R20", iso_week(2026, 48)),
    case("R20-en-ISO-2020-W53", "tickets 2020-W53", "2020-W53", "R20", iso_week(2020, 53), "2020-W53"),
    case("R20-en-w48-2026", "tickets w48 2026", "w48 2026", "R20", iso_week(2026, 48)),
    case("R20-en-ISO-week-day-2026-W48-3", "deploys 2026-W48-3", "2026-W48-3", "R20",
         day(date.fromisocalendar(2026, 48, 3)), date.fromisocalendar(2026, 48, 3).isoformat()),
    case("R20-en-bare-week-48-past-bias", "tickets in week 48", "in week 48", "R20",
         iso_week(_recent_week(48), 48), "2026-W48",
         alts=(alt("R20", _FUT, iso_week(_next_week(48), 48)),)),
    case("R20-en-bare-week-49-current-week-counts", "tickets in week 49", "in week 49", "R20",
         iso_week(2026, 49), "2026-W49"),
    case("R20-en-bare-week-50-is-last-year", "tickets in week 50", "in week 50", "R20",
         iso_week(_recent_week(50), 50), "2025-W50",
         alts=(alt("R20", _FUT, iso_week(_next_week(50), 50)),)),
    case("R20-en-bare-week-53-finds-the-last-long-year", "tickets in week 53", "in week 53", "R20",
         iso_week(_recent_week(53), 53), "2020-W53",
         alts=(alt("R20", _FUT, iso_week(_next_week(53), 53)),)),
    case("R20-en-bare-wk-12", "tickets wk 12", "wk 12", "R20", iso_week(_recent_week(12), 12),
         alts=(alt("R20", _FUT, iso_week(_next_week(12), 12)),)),
    case("R20-en-bare-week-48-future-bias", "tickets in week 48", "in week 48", "R20",
         iso_week(_next_week(48), 48), "2027-W48",
         alts=(alt("R20", _PAST, iso_week(_recent_week(48), 48)),), bias="future"),
]


def _to_now(first: tuple[str, str], now: datetime = NOW) -> tuple[str, str]:
    return first[0], iso(now)  # type: ignore[return-value]


# R21: year / quarter / month / week to date -> [start of the current period, now).
R21 = [
    case("R21-en-YTD", "revenue YTD", "YTD", "R21", _to_now(year(2026)),
         f"{year(2026)[0]}/{iso(NOW)}"),
    case("R21-en-so-far-this-year", "bugs so far this year", "so far this year", "R21",
         _to_now(year(2026))),
    case("R21-en-month-to-date", "spend month to date", "month to date", "R21",
         _to_now(month_of(TODAY))),
    case("R21-en-this-month-so-far", "bugs this month so far", "this month so far", "R21",
         _to_now(month_of(TODAY))),
    case("R21-en-quarter-to-date", "revenue quarter to date", "quarter to date", "R21",
         _to_now(quarter_of(TODAY))),
    case("R21-en-QTD", "revenue QTD", "QTD", "R21", _to_now(quarter_of(TODAY))),
    case("R21-en-week-to-date-on-a-Sunday", "commits week to date", "week to date", "R21",
         _to_now(week(SUNDAY.date()), SUNDAY), now=SUNDAY),
    case("R21-en-week-to-date-on-a-Sunday-sunday-weeks", "commits week to date", "week to date",
         "R21", _to_now(week(SUNDAY.date(), SU), SUNDAY), now=SUNDAY, week_start="sunday"),
]

# R22: day periods, from CLDR's English rules via babel.
R22 = [
    case("R22-en-this-morning", "what broke this morning", "this morning", "R22",
         day_period(TODAY, "morning1")),
    case("R22-en-this-afternoon", "what broke this afternoon", "this afternoon", "R22",
         day_period(TODAY, "afternoon1")),
    case("R22-en-this-evening", "what ships this evening", "this evening", "R22",
         day_period(TODAY, "evening1")),
    case("R22-en-tonight", "what ships tonight", "tonight", "R22", day_period(TODAY, "night1")),
    case("R22-en-this-night", "jobs this night", "this night", "R22", day_period(TODAY, "night1")),
    case("R22-en-yesterday-afternoon", "what broke yesterday afternoon", "yesterday afternoon",
         "R22", day_period(TODAY + D(days=-1), "afternoon1")),
    case("R22-en-yesterday-evening", "what broke yesterday evening", "yesterday evening", "R22",
         day_period(TODAY + D(days=-1), "evening1")),
    case("R22-en-last-night", "what broke last night", "last night", "R22",
         day_period(TODAY + D(days=-1), "night1")),
    case("R22-en-yesterday-at-night", "what broke yesterday at night", "yesterday at night", "R22",
         day_period(TODAY + D(days=-1), "night1")),
    case("R22-en-tomorrow-morning", "what ships tomorrow morning", "tomorrow morning", "R22",
         day_period(TODAY + D(days=1), "morning1")),
    case("R22-en-tomorrow-night", "jobs tomorrow night", "tomorrow night", "R22",
         day_period(TODAY + D(days=1), "night1")),
    case("R22-en-this-morning-on-a-DST-day-is-wall-clock", "what broke this morning",
         "this morning", "R22", day_period(MORNING_SPRING_BERLIN.date(), "morning1"),
         now=MORNING_SPRING_BERLIN),
]

_SAT = SATURDAY.date()

# R23: weekends from CLDR week data of the locale's territory (default Saturday-Sunday).
# last = the most recent one that has ended; this = the one holding today, else the coming
# one; next = the one after that (the coming one is the alternative, policy null).
R23 = [
    case("R23-en-this-weekend-on-a-Wednesday", "deploys this weekend", "this weekend", "R23",
         weekend(first_open_weekend(TODAY)), weekend_value(first_open_weekend(TODAY))),
    case("R23-en-last-weekend-on-a-Wednesday", "alerts last weekend", "last weekend", "R23",
         weekend(last_ended_weekend(TODAY)), weekend_value(last_ended_weekend(TODAY))),
    case("R23-en-next-weekend-on-a-Wednesday", "maintenance next weekend", "next weekend", "R23",
         weekend(first_open_weekend(TODAY) + D(weeks=1)),
         alts=(alt("R23", None, weekend(first_open_weekend(TODAY))),)),
    case("R23-en-over-the-weekend-on-a-Wednesday", "what broke over the weekend",
         "over the weekend", "R23", weekend(last_ended_weekend(TODAY)),
         alts=(alt("R23", _FUT, weekend(first_open_weekend(TODAY))),)),
    case("R23-en-over-the-weekend-future-bias", "what breaks over the weekend", "over the weekend",
         "R23", weekend(first_open_weekend(TODAY)),
         alts=(alt("R23", _PAST, weekend(last_ended_weekend(TODAY))),), bias="future"),
    case("R23-en-this-weekend-on-a-Saturday", "deploys this weekend", "this weekend", "R23",
         weekend(first_open_weekend(_SAT)), now=SATURDAY),
    case("R23-en-last-weekend-on-a-Saturday", "alerts last weekend", "last weekend", "R23",
         weekend(last_ended_weekend(_SAT)), now=SATURDAY),
    case("R23-en-next-weekend-on-a-Saturday", "maintenance next weekend", "next weekend", "R23",
         weekend(first_open_weekend(_SAT) + D(weeks=1)), now=SATURDAY),
    case("R23-en-on-the-weekend-on-a-Saturday-is-this-one", "pages on the weekend",
         "on the weekend", "R23", weekend(first_open_weekend(_SAT)), now=SATURDAY),
    case("R23-en-this-weekend-on-a-Sunday", "deploys this weekend", "this weekend", "R23",
         weekend(first_open_weekend(SUNDAY.date())), now=SUNDAY),
    case("R23-en-last-weekend-late-Sunday-is-still-the-one-before", "alerts last weekend",
         "last weekend", "R23", weekend(last_ended_weekend(SUNDAY_LATE.date())), now=SUNDAY_LATE),
    case("R23-en-last-weekend-on-a-Monday", "alerts last weekend", "last weekend", "R23",
         weekend(last_ended_weekend(MONDAY_AFTER.date())), now=MONDAY_AFTER),
    case("R23-en_IL-this-weekend-CLDR-Friday-Saturday", "deploys this weekend", "this weekend",
         "R23", weekend(first_open_weekend(TODAY, "en_IL"), "en_IL"),
         weekend_value(first_open_weekend(TODAY, "en_IL"), "en_IL"), locale="en_IL"),
    case("R23-en_IN-last-weekend-CLDR-Sunday-only", "alerts last weekend", "last weekend", "R23",
         weekend(last_ended_weekend(TODAY, "en_IN"), "en_IN"),
         weekend_value(last_ended_weekend(TODAY, "en_IN"), "en_IN"), locale="en_IN"),
    case("R23-en-this-past-weekend-on-a-Saturday-is-the-last-ended-one", "alerts this past weekend",
         "this past weekend", "R23", weekend(last_ended_weekend(_SAT)), now=SATURDAY,
         marks=pytest.mark.xfail(
             strict=True,
             reason="'this past weekend' has no {dir} slot, so it parses as a bare weekend and "
             "on a weekend day gives the current one; fixing it needs forms that carry a fixed "
             "direction (a form-language change)")),
]

TABLES = {"R1": R1, "R2": R2, "R3": R3, "R4": R4, "R5": R5, "R6": R6, "R7": R7, "R8": R8,
          "R9": R9, "R10": R10, "R11": R11, "R12": R12, "R13": R13, "R14": R14, "R15": R15,
          "R16": R16, "R17": R17, "R18": R18, "R19": R19, "R20": R20, "R21": R21, "R22": R22,
          "R23": R23}


# --- the tests --------------------------------------------------------------------------------


def test_the_clocks_are_what_the_tables_say() -> None:
    # stdlib date.weekday(); DST switches from the IANA tz database (zoneinfo + tzdata).
    assert (NOW.weekday(), SATURDAY.weekday(), SUNDAY.weekday(), MONDAY_AFTER.weekday()) == (2, 5, 6, 0)
    assert NOW.isocalendar()[1] == 49
    hour = timedelta(hours=1)
    assert SPRING_BERLIN.utcoffset() - datetime(2026, 3, 28, 12, tzinfo=BERLIN).utcoffset() == hour
    assert datetime(2026, 10, 24, 12, tzinfo=BERLIN).utcoffset() - AUTUMN_BERLIN.utcoffset() == hour
    assert SPRING_NEW_YORK.utcoffset() - datetime(2026, 3, 7, 12, tzinfo=NEW_YORK).utcoffset() == hour
    assert calendar.isleap(2028) and not calendar.isleap(2027)


def test_every_reading_has_at_least_four_worked_examples() -> None:
    assert sorted(TABLES, key=lambda r: int(r[1:])) == [f"R{i}" for i in range(1, 24)]
    for rid, table in TABLES.items():
        assert len(table) >= 4, rid


@pytest.mark.parametrize(PARAMS, R1)
def test_R1_named_days_are_whole_local_days(question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, R2)
def test_R2_this_last_next_unit_is_the_whole_period_offset_0_minus1_plus1(
        question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, R3)
def test_R3_n_units_ago_is_the_unit_holding_now_minus_n(question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, R4)
def test_R4_in_n_units_is_the_unit_holding_now_plus_n(question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, R5)
def test_R5_the_last_n_units_is_a_rolling_window_ending_now(question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, R6)
def test_R6_the_next_n_units_is_a_rolling_window_starting_now(question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, R7)
def test_R7_since_x_opens_at_the_start_of_x(question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, R8)
def test_R8_after_x_opens_at_the_end_of_x(question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, R9)
def test_R9_before_x_closes_at_the_start_of_x(question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, R10)
def test_R10_until_x_closes_at_the_end_of_x(question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, R11)
def test_R11_ranges_run_from_the_start_of_x_to_the_end_of_y(question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, R12)
def test_R12_a_period_without_year_is_the_most_recent_one_started(
        question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, R13)
def test_R13_a_bare_weekday_is_on_or_before_today_unless_after_a_deadline_word(
        question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, R14)
def test_R14_last_weekday_is_the_most_recent_one_strictly_before_today(
        question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, R15)
def test_R15_next_weekday_is_the_first_one_strictly_after_today(
        question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, R16)
def test_R16_weekday_of_a_week_is_that_day_inside_that_week(question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, R17)
def test_R17_an_explicit_year_with_a_cue_is_that_year(question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, R18)
def test_R18_absolute_dates_are_that_day_in_the_locales_numeric_order(
        question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, R19)
def test_R19_month_quarter_or_half_with_a_year_is_that_period(
        question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, R20)
def test_R20_week_numbers_are_ISO_8601_weeks(question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, R21)
def test_R21_to_date_runs_from_the_start_of_the_current_period_to_now(
        question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, R22)
def test_R22_day_periods_follow_CLDR_English_rules(question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, R23)
def test_R23_weekends_follow_CLDR_week_data(question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


# --- policies ---------------------------------------------------------------------------------

#: (id, question, setting, the setting it replaces): applying the setting must choose the
#: reading the default offered as the alternative naming that setting, and offer the old
#: reading back under the old setting.
POLICY_FLIPS = [
    ("R12-en-bias-future-in-March", "bugs in March", {}, ("bias", "future", "past")),
    ("R12-en-bias-future-on-December-3", "released on December 3", {}, ("bias", "future", "past")),
    ("R13-en-bias-future-on-Monday", "bugs on Monday", {}, ("bias", "future", "past")),
    ("R20-en-bias-future-week-48", "tickets in week 48", {}, ("bias", "future", "past")),
    ("R23-en-bias-future-over-the-weekend", "what broke over the weekend", {}, ("bias", "future", "past")),
    ("R7-en-bias-future-since-March", "bugs closed since March", {}, ("bias", "future", "past")),
    ("R11-en-bias-future-between-March-and-May", "bugs between March and May", {},
     ("bias", "future", "past")),
    ("R5-en-window-calendar-last-3-months", "tickets closed the last 3 months", {},
     ("window_reading", "calendar", "rolling")),
    ("R6-en-window-calendar-next-3-days", "what is due in the next 3 days", {},
     ("window_reading", "calendar", "rolling")),
    ("R14-en-weekday-week-last-Monday", "what broke last Monday", {}, ("weekday_reading", "week", "nearest")),
    ("R15-en-weekday-week-next-Thursday", "planned next Thursday", {}, ("weekday_reading", "week", "nearest")),
    ("R18-en-date-order-DMY", "fixed on 03/04/2026", {}, ("date_order", "DMY", "MDY")),
    ("R18-en_GB-date-order-MDY", "fixed on 03/04/2026", {"locale": "en_GB"}, ("date_order", "MDY", "DMY")),
]


@pytest.mark.parametrize(("question", "base", "setting"), [p[1:] for p in POLICY_FLIPS],
                         ids=[p[0] for p in POLICY_FLIPS])
def test_a_policy_flips_the_reading_and_the_old_one_becomes_the_alternative(question, base, setting):
    key, new, old = setting
    before = one(question, **base)
    after = one(question, **base, **{key: new})
    offered = [a for a in before.alternatives if a.policy == f"{key}={new}"]
    assert len(offered) == 1
    assert (after.start, after.end, after.reading) == (offered[0].start, offered[0].end, offered[0].reading)
    assert (after.start, after.end) != (before.start, before.end)
    back = [a for a in after.alternatives if a.policy == f"{key}={old}"]
    assert [(a.start, a.end, a.reading) for a in back] == [(before.start, before.end, before.reading)]


def _all_cases() -> list[Any]:
    out = []
    for table in TABLES.values():
        for p in table:
            if not p.marks:
                out.append(pytest.param(*p.values, id=p.id))
    return out


@pytest.mark.parametrize(PARAMS, _all_cases())
def test_every_alternative_names_a_policy_that_selects_it_or_none(
        question, phrase, reading, bounds, value, alts, context):
    m = one(question, **context)
    for a in m.alternatives:
        if a.policy is None:
            continue  # no setting selects it: the question has to be reworded
        key, _, setting = a.policy.partition("=")
        chosen = one(question, **{**context, key: setting})
        assert (chosen.start, chosen.end) == (a.start, a.end), a.policy


def test_bounded_readings_name_the_inner_reading_in_the_note() -> None:
    # common practice: the note says how the bound was read, so a caller can show it.
    assert "[R17: explicit year]" in one("tickets opened since 2024").note
    assert "[R12:" in one("bugs opened before March").note


def test_day_period_notes_name_the_CLDR_period_and_version() -> None:
    # CLDR version via babel.core.get_cldr_version; period id from babel's English rules.
    from babel.core import get_cldr_version

    note = one("what broke this afternoon").note
    assert f"CLDR {get_cldr_version()}" in note and "'afternoon1'" in note


def test_a_numeric_date_read_against_the_locale_order_says_so() -> None:
    # CLDR 49 via babel: en reads month first, so 13/04/2026 has only the day-first reading.
    assert numeric_order("en") == "MD"
    note = one("fixed on 13/04/2026").note
    assert "day/month/year" in note and "the only valid reading" in note
