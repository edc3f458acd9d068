"""Business days: weekends from CLDR, public holidays from the ``holidays`` package, closures.

Checked against: numpy's ``busday_offset`` and ``busday_count`` with the same weekmask and
holidays (source: numpy); weekend days from Unicode CLDR week data via babel
(``Locale.weekend_start`` / ``weekend_end``); holiday dates from the ``holidays`` package.
"""

from __future__ import annotations

from datetime import date, timedelta

import numpy as np
import pytest
from babel import Locale
from hypothesis import given, settings
from hypothesis import strategies as st

from nlnorm.calendars.business import BusinessCalendar, parse_holidays
from nlnorm.errors import ContextError


def weekmask(cal: BusinessCalendar) -> str:
    return "".join("0" if d in cal.weekend else "1" for d in range(7))


def closed_days(cal: BusinessCalendar, start: date, end: date) -> list[str]:
    days = []
    d = start
    while d < end:
        if d.weekday() not in cal.weekend and cal.holiday(d) is not None:
            days.append(d.isoformat())
        d += timedelta(days=1)
    return days


@pytest.mark.parametrize("locale", ["en_US", "de_DE", "fa_IR", "ar_SA", "he_IL", "en_IN", "pt_BR"])
def test_the_weekend_is_cldr_s(locale):
    # Source: Unicode CLDR week data via babel.
    loc = Locale.parse(locale)
    expected = {loc.weekend_start}
    d = loc.weekend_start
    while d != loc.weekend_end:
        d = (d + 1) % 7
        expected.add(d)
    assert BusinessCalendar.for_locale(locale).weekend == frozenset(expected)


def test_public_holidays_come_from_the_holidays_package_with_observed_days():
    import holidays

    cal = BusinessCalendar.for_locale("en_US", holidays="US")
    table = holidays.country_holidays("US", years=2026)
    for day in table:
        assert not cal.is_open(day), day
    # 2026-07-04 is a Saturday: the package observes it on Friday 3 July.
    assert cal.holiday(date(2026, 7, 3)) and "observed" in cal.holiday(date(2026, 7, 3)).lower()


def test_a_subdivision_adds_its_own_holidays():
    # Source: holidays package; Epiphany (6 January) is a public holiday in Bavaria only.
    bavaria = BusinessCalendar.for_locale("de_DE", holidays="DE-BY")
    berlin = BusinessCalendar.for_locale("de_DE", holidays="DE-BE")
    assert not bavaria.is_open(date(2026, 1, 6)) and berlin.is_open(date(2026, 1, 6))


@pytest.mark.parametrize("value, message", [
    ("XX", "no public-holiday calendar for country 'XX'"),
    ("US-ZZ", "US has no subdivision 'ZZ'"),
    ("", "expected a country code"),
])
def test_a_bad_holiday_calendar_is_named(value, message):
    with pytest.raises(ContextError, match=message):
        parse_holidays(value)


def test_a_calendar_with_no_open_day_is_refused():
    with pytest.raises(ContextError, match="all seven days"):
        BusinessCalendar(frozenset(range(7)))


CALENDARS = [
    BusinessCalendar.for_locale("en_US", holidays="US"),
    BusinessCalendar.for_locale("de_DE", holidays="DE-BY", closures=[date(2026, 12, 28), date(2026, 12, 29)]),
    BusinessCalendar.for_locale("fa_IR"),
    BusinessCalendar.for_locale("he_IL", holidays="IL"),
]


@settings(max_examples=300, deadline=None)
@given(st.sampled_from(range(len(CALENDARS))), st.dates(date(2024, 1, 1), date(2028, 12, 31)),
       st.integers(-25, 25))
def test_stepping_matches_numpy_busday_offset(which, day, n):
    # Source: numpy.busday_offset. nlnorm steps from day (step 0, never counted); numpy first
    # rolls a closed day: forward when stepping back, backward when stepping ahead, which
    # counts the same days.
    cal = CALENDARS[which]
    hol = closed_days(cal, date(2023, 10, 1), date(2029, 4, 1))
    expected = np.busday_offset(day, n, roll="forward" if n <= 0 else "backward",
                                weekmask=weekmask(cal), holidays=hol)
    if n == 0:
        expected = np.datetime64(day)
    got = cal.step(day, n)
    assert np.datetime64(got) == expected
    assert n == 0 or cal.is_open(got)  # a step never lands on a weekend or holiday


@settings(max_examples=200, deadline=None)
@given(st.sampled_from(range(len(CALENDARS))), st.dates(date(2025, 1, 1), date(2027, 12, 31)),
       st.integers(0, 60))
def test_counting_matches_numpy_busday_count(which, start, length):
    # Source: numpy.busday_count.
    cal = CALENDARS[which]
    end = start + timedelta(days=length)
    hol = closed_days(cal, date(2024, 10, 1), date(2028, 4, 1))
    assert cal.count(start, end) == np.busday_count(start, end, weekmask=weekmask(cal), holidays=hol)


def test_closures_say_why():
    cal = BusinessCalendar.for_locale("en_US", closures={date(2026, 12, 24): "release freeze"})
    assert cal.why_closed(date(2026, 12, 24)) == "release freeze"
    assert cal.why_closed(date(2026, 12, 26)) == "Saturday"
    assert cal.why_closed(date(2026, 12, 23)) is None
