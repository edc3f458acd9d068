"""Checked against: ISO 8601-1:2019 week dates via the standard library (``date.isocalendar``,
``date.fromisocalendar``); a year has 53 ISO weeks exactly when 28 December falls in week 53
(ISO 8601 via ``date(y, 12, 28).isocalendar()``). Local midnights come from IANA tzdata via
``zoneinfo``.

ISO week notation ("2026-W53", "week 53 of 2026") through :func:`nlnorm.normalize`, and every
ISO week of 2000-2040 through the calendar functions.
"""

from __future__ import annotations

from datetime import date, datetime, timedelta
from zoneinfo import ZoneInfo

import pytest

from nlnorm.calendars import day_span, iso_week_start, period_containing, period_value, start_of_day
from nlnorm.model import Grain
from tests.helpers import BERLIN, bounds, one, run

ISO_YEARS = range(2000, 2041)


def weeks_in(year: int) -> int:
    """ISO 8601: the week holding 28 December is the year's last."""
    return date(year, 12, 28).isocalendar()[1]


def monday(year: int, week: int) -> date:
    return date.fromisocalendar(year, week, 1)


def midnight(d: date, tz: ZoneInfo = BERLIN) -> datetime:
    return datetime(d.year, d.month, d.day, tzinfo=tz)


# --- the calendar facts the tests below lean on, from the standard library --------------------


def test_iso_8601_facts_per_stdlib():
    assert weeks_in(2026) == 53 and weeks_in(2025) == 52 and weeks_in(2009) == 53
    assert date(2027, 1, 1).isocalendar() == (2026, 53, 5)
    assert date(2008, 12, 29).isocalendar() == (2009, 1, 1)
    assert date(2010, 1, 3).isocalendar() == (2009, 53, 7)
    with pytest.raises(ValueError):
        date.fromisocalendar(2025, 53, 1)


# --- notation through normalize --------------------------------------------------------------


@pytest.mark.parametrize("text", ["2026-W53", "2026W53", "week 53 of 2026", "wk 53 2026", "w53 2026",
                                  "the week 53 in 2026"])
def test_week_53_of_2026_is_the_seven_days_from_monday_2026_12_28(text):
    m = one(text)
    assert (m.text, m.value, m.grain, m.reading) == (text, "2026-W53", "week", "R20")
    first = monday(2026, 53)
    assert first == date(2026, 12, 28)
    assert bounds(m) == (midnight(first), midnight(first + timedelta(days=7)))


def test_2027_01_01_lies_in_2026_w53_as_its_fifth_day():
    m = one("2026-W53-5")
    assert m.value == "2027-01-01" == date.fromisocalendar(2026, 53, 5).isoformat()
    assert bounds(m) == (midnight(date(2027, 1, 1)), midnight(date(2027, 1, 2)))
    week = bounds(one("2026-W53"))
    assert week[0] <= midnight(date(2027, 1, 1)) < week[1]


def test_2008_12_29_is_2009_w01_1():
    m = one("2009-W01-1")
    assert m.value == "2008-12-29"
    assert bounds(one("2009-W01"))[0] == midnight(date(2008, 12, 29))
    assert period_value(date(2008, 12, 29), Grain.WEEK) == "2009-W01"


def test_2010_01_03_is_2009_w53_7():
    m = one("2009-W53-7")
    assert m.value == "2010-01-03"
    start, end = bounds(one("2009-W53"))
    assert end == midnight(date(2010, 1, 4)) and start <= midnight(date(2010, 1, 3)) < end
    assert period_value(date(2009, 12, 28), Grain.WEEK) == "2009-W53"


@pytest.mark.parametrize("text", ["2025-W53", "2025W53", "week 53 of 2025", "w53 2025", "2025-W53-1",
                                  "bugs closed in 2025-W53"])
def test_2025_w53_does_not_exist_so_gives_no_mention(text):
    """2025 has 52 ISO weeks. A week that does not exist names no interval; the phrase gives no
    mention rather than a neighbouring week, and its year is not read on its own either."""
    result = run(text)
    assert result.error is None
    assert result.mentions == ()


@pytest.mark.parametrize("text", ["2026-W00", "2026-W54"])
def test_week_numbers_outside_1_to_53_give_no_mention(text):
    assert run(text).mentions == ()


@pytest.mark.parametrize("week_start", ["monday", "sunday", "saturday"])
def test_iso_weeks_start_on_monday_whatever_the_week_start(week_start):
    m = one("2026-W49", week_start=week_start)
    assert bounds(m) == (midnight(monday(2026, 49)), midnight(monday(2026, 50)))


@pytest.mark.parametrize(("bias", "year"), [("past", 2020), ("future", 2026)])
def test_week_53_without_year_is_the_nearest_year_with_53_weeks(bias, year):
    # Now is 2026-12-02; 2026-W53 starts 2026-12-28. Past bias: the latest W53 started by now.
    now = datetime(2026, 12, 2, 10, tzinfo=BERLIN)
    past = max(y for y in range(2000, 2027) if weeks_in(y) == 53 and midnight(monday(y, 53)) <= now)
    future = min(y for y in range(2026, 2040) if weeks_in(y) == 53 and midnight(monday(y + 1, 1)) > now)
    assert {"past": past, "future": future}[bias] == year
    m = one("week 53", bias=bias)
    assert m.value == f"{year}-W53"
    assert bounds(m) == (midnight(monday(year, 53)), midnight(monday(year + 1, 1)))


def test_every_iso_week_2000_to_2040_through_normalize():
    for year in ISO_YEARS:
        for week in range(1, weeks_in(year) + 1):
            m = one(f"{year}-W{week:02d}")
            first = monday(year, week)
            assert m.value == f"{year:04d}-W{week:02d}"
            assert bounds(m) == (midnight(first), midnight(first + timedelta(days=7))), m.value


# --- the calendar functions ------------------------------------------------------------------


def test_every_iso_week_2000_to_2040_through_the_calendar_functions():
    expected_next = monday(ISO_YEARS[0], 1)
    for year in ISO_YEARS:
        for week in range(1, weeks_in(year) + 1):
            first = iso_week_start(year, week)
            assert first == date.fromisocalendar(year, week, 1) == expected_next
            assert period_value(first, Grain.WEEK) == f"{year:04d}-W{week:02d}"
            for k in range(7):
                day = first + timedelta(days=k)
                assert day.isocalendar() == (year, week, k + 1)
                assert day_span(day, Grain.WEEK, 0) == (first, first + timedelta(days=7))
            expected_next = first + timedelta(days=7)
        with pytest.raises(ValueError):
            date.fromisocalendar(year, weeks_in(year) + 1, 1)
    assert expected_next == monday(ISO_YEARS[-1] + 1, 1)


@pytest.mark.parametrize("week_start", [6, 5])
def test_period_value_of_a_week_not_starting_monday_is_start_and_duration(week_start):
    first, end = day_span(date(2026, 12, 2), Grain.WEEK, week_start)
    assert first.weekday() == week_start and (end - first).days == 7
    assert period_value(first, Grain.WEEK, week_start) == f"{first.isoformat()}/P1W"


def test_this_week_with_monday_start_is_named_by_its_iso_week_every_day_of_2026():
    for k in range(365):
        day = date(2026, 1, 1) + timedelta(days=k)
        moment = datetime(day.year, day.month, day.day, 12, tzinfo=BERLIN)
        start, end = period_containing(moment, Grain.WEEK, 0)
        year, week, weekday = day.isocalendar()
        assert start == start_of_day(date.fromisocalendar(year, week, 1), BERLIN)
        assert period_value(start.date(), Grain.WEEK) == f"{year:04d}-W{week:02d}"
    m = one("this week", week_start="monday")
    assert m.value == "%04d-W%02d" % date(2026, 12, 2).isocalendar()[:2]
