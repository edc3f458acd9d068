"""Fiscal years and quarters, and retail 52/53-week years.

Checked against: pandas' quarterly periods with a fiscal year end (``Q-MAR``, ``Q-JUN``, ...;
``Period.qyear`` names a fiscal year by the calendar year it ends in, ``Period.quarter`` is the
fiscal quarter) for fiscal years starting on the first of each month 1-12 (source: pandas).
Retail years: the 53-week years of the calendar ending on the Saturday nearest 31 January
(the US retail calendar; 2012, 2017 and 2023 from memory of published retail calendars) and an
independent computation in the test, marked as such.
"""

from __future__ import annotations

from datetime import date, timedelta

import pandas as pd
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from nlnorm.calendars.fiscal import FiscalYear, RetailYear, parse_fiscal_start
from nlnorm.errors import ContextError

MONTHS = ("JAN", "FEB", "MAR", "APR", "MAY", "JUN", "JUL", "AUG", "SEP", "OCT", "NOV", "DEC")


def pandas_freq(start_month: int) -> str:
    """A fiscal year starting in month m ends in month m - 1: pandas names that end month."""
    return "Q-" + MONTHS[(start_month - 2) % 12]


@pytest.mark.parametrize("start_month", range(1, 13))
@settings(max_examples=60, deadline=None)
@given(day=st.dates(date(1990, 1, 1), date(2060, 12, 31)))
def test_fiscal_quarters_match_pandas(start_month, day):
    # Source: pandas Period with a Q-<end month> frequency.
    period = pd.Period(day, freq=pandas_freq(start_month))
    fy = FiscalYear(start_month=start_month, naming="end")
    assert fy.quarter_of(day) == (period.qyear, period.quarter)
    start, end = fy.quarter_span(period.qyear, period.quarter)
    assert start == period.start_time.date()
    assert end == (period + 1).start_time.date()


@pytest.mark.parametrize("start_month", range(1, 13))
def test_fiscal_years_match_pandas_and_naming_by_start_is_one_less(start_month):
    # Source: pandas (qyear is the fiscal year named by its end).
    day = date(2026, 12, 2)
    period = pd.Period(day, freq=pandas_freq(start_month))
    by_end = FiscalYear(start_month, naming="end")
    by_start = FiscalYear(start_month, naming="start")
    assert by_end.year_of(day) == period.qyear
    shift = 0 if start_month == 1 else 1
    assert by_start.year_of(day) == period.qyear - shift
    assert by_end.year_span(period.qyear) == by_start.year_span(period.qyear - shift)


@settings(max_examples=200, deadline=None)
@given(st.integers(1, 12), st.integers(1, 28), st.sampled_from(["start", "end"]), st.integers(1990, 2060))
def test_fiscal_quarters_tile_the_fiscal_year(month, day, naming, year):
    fy = FiscalYear(month, day, naming)
    start, end = fy.year_span(year)
    spans = [fy.quarter_span(year, q) for q in (1, 2, 3, 4)]
    assert spans[0][0] == start and spans[-1][1] == end
    assert all(a[1] == b[0] for a, b in zip(spans, spans[1:]))
    assert fy.year_span(year)[1] == fy.year_span(year + 1)[0]  # years tile time too
    assert fy.year_of(start) == year and fy.year_of(end - timedelta(days=1)) == year


@pytest.mark.parametrize("value, message", [
    ("13", "must be 1 to 12"), ("04-31", "must be 1 to 28"), ("april", "expected MM or MM-DD"),
])
def test_a_bad_fiscal_start_is_named(value, message):
    with pytest.raises(ContextError, match=message):
        parse_fiscal_start(value)


def independent_retail_weeks(year_end: date, next_end: date) -> int:
    """Independent computation (this test's own): weeks between two year ends."""
    return (next_end - year_end).days // 7


def saturday_nearest_jan_31(y: int) -> date:
    """Independent computation: the Saturday nearest 31 January of year y."""
    target = date(y, 1, 31)
    candidates = [target + timedelta(days=k) for k in range(-3, 4)]
    return next(d for d in candidates if d.weekday() == 5)


def test_retail_years_with_53_weeks():
    # From memory of published US retail calendars (4-5-4, year ending on the Saturday nearest
    # 31 January, named by the year it starts in): 2012, 2017 and 2023 have 53 weeks.
    nrf = RetailYear(end_month=1, weekday=5, rule="nearest", pattern="4-5-4", naming="start")
    long_years = [y for y in range(2000, 2041) if nrf.weeks(y) == 53]
    for y in (2012, 2017, 2023):
        assert y in long_years
    # Independent computation, marked as such: the same list from the Saturday nearest 31 Jan.
    expected = [y for y in range(2000, 2041)
                if independent_retail_weeks(saturday_nearest_jan_31(y), saturday_nearest_jan_31(y + 1)) == 53]
    assert long_years == expected


@settings(max_examples=200, deadline=None)
@given(st.integers(1, 12), st.integers(0, 6), st.sampled_from(["last", "nearest"]),
       st.sampled_from(["4-4-5", "4-5-4", "5-4-4"]), st.sampled_from(["start", "end"]),
       st.integers(1995, 2055))
def test_retail_years_end_on_their_weekday_and_quarters_tile(month, weekday, rule, pattern, naming, year):
    cal = RetailYear(month, weekday, rule, pattern, naming)
    start, end = cal.year_span(year)
    assert (end - start).days in (364, 371)
    assert (end - timedelta(days=1)).weekday() == weekday
    spans = [cal.quarter_span(year, q) for q in (1, 2, 3, 4)]
    assert spans[0][0] == start and spans[-1][1] == end
    assert [(b - a).days for a, b in spans[:3]] == [91, 91, 91]
    months = cal.month_spans(year)
    assert len(months) == 12 and months[0][0] == start and months[-1][1] == end
    assert cal.year_of(start) == year and cal.year_of(end - timedelta(days=1)) == year
    assert cal.year_span(year + 1)[0] == end  # years tile time
    assert cal.quarter_of(spans[2][0]) == (year, 3)
    # The year end is the last such weekday of the month, or the nearest to its last day.
    last = end - timedelta(days=1)
    if rule == "last":
        assert last.month == month and (last + timedelta(days=7)).month != month
