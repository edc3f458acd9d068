"""Checked against: the standard library calendar (``calendar.monthrange``, ``calendar.isleap``,
``date.weekday``), IANA tzdata through ``zoneinfo`` (which instants exist, their UTC offsets),
and python-dateutil's ``relativedelta`` as the oracle for moving a wall-clock time by days,
weeks, months and years. Elapsed hours and minutes are checked against UTC arithmetic
(``datetime`` in UTC plus ``timedelta``). That a period of one day or longer runs from local
midnight (or the first instant of the day where the zone skips midnight) is common practice.

Properties of the calendar functions of ``nlnorm.calendars``, for reference instants from 1900
to 2100 in zones with daylight-saving oddities (see ``tests/property/strategies.py``).
"""

from __future__ import annotations

import calendar
from datetime import date, datetime, time, timedelta, timezone
from zoneinfo import ZoneInfo

import pytest
from dateutil.relativedelta import relativedelta
from hypothesis import given, settings
from hypothesis import strategies as st

from nlnorm.calendars import (
    add_months,
    add_units,
    day_span,
    local_instant,
    period_containing,
    shift_period,
    start_of_day,
)
from nlnorm.model import Grain
from tests.property.strategies import APIA, WEEKDAY_INDEX, moments, week_starts, with_pinned

UTC = timezone.utc
SETTINGS = settings(max_examples=200, deadline=None)

#: Days a sample zone skipped entirely between 1900 and 2100 (tzdata: Samoa moved across the
#: date line at the end of 2011-12-29). Checked below through zoneinfo.
SKIPPED_DAYS = {("Pacific/Apia", date(2011, 12, 30))}

_RELATIVEDELTA = {
    Grain.DAY: lambda n: relativedelta(days=n),
    Grain.WEEK: lambda n: relativedelta(weeks=n),
    Grain.MONTH: lambda n: relativedelta(months=n),
    Grain.QUARTER: lambda n: relativedelta(months=3 * n),
    Grain.YEAR: lambda n: relativedelta(years=n),
}
_ELAPSED = {Grain.MINUTE: timedelta(minutes=1), Grain.HOUR: timedelta(hours=1)}


# --- helpers: facts about a zone, computed from zoneinfo alone --------------------------------


def utc(moment: datetime) -> datetime:
    """The instant in UTC. Aware datetimes sharing a tzinfo compare and subtract by wall clock
    and ignore ``fold``, so every comparison here is made in UTC."""
    return moment.astimezone(UTC)


def exists(naive: datetime, tz: ZoneInfo, fold: int = 0) -> bool:
    """Whether the wall-clock time ``naive`` (with ``fold``) names a real instant in ``tz``."""
    aware = naive.replace(tzinfo=tz, fold=fold)
    return utc(aware).astimezone(tz).replace(tzinfo=None) == naive


def assert_exists(moment: datetime, tz: ZoneInfo) -> None:
    """``moment`` is written as the zone writes that instant: same wall clock, same offset."""
    assert moment.tzinfo is tz, moment
    canonical = utc(moment).astimezone(tz)
    assert (moment.replace(tzinfo=None), moment.utcoffset()) == (
        canonical.replace(tzinfo=None), canonical.utcoffset()
    ), f"{moment.isoformat()} is not a wall-clock time of {tz.key} (it is {canonical.isoformat()})"


def local(moment: datetime, tz: ZoneInfo) -> datetime:
    return utc(moment).astimezone(tz)


def assert_first_instant_of_day(moment: datetime, tz: ZoneInfo) -> None:
    """Local midnight, or where midnight does not exist, the first instant of that local day."""
    assert_exists(moment, tz)
    wall = local(moment, tz)
    if wall.time() == time(0):
        return
    assert not exists(datetime.combine(wall.date(), time(0)), tz), moment
    before = local(utc(moment) - timedelta(seconds=1), tz)
    assert before.date() < wall.date(), f"{moment.isoformat()} is not the first instant of its day"


def assert_first_instant_of_unit(moment: datetime, tz: ZoneInfo, grain: Grain) -> None:
    """The wall clock shows a whole hour (minute), or the zone's offset changes right then."""
    assert_exists(moment, tz)
    wall = local(moment, tz).replace(tzinfo=None)
    whole = wall.replace(second=0, microsecond=0)
    if grain is Grain.HOUR:
        whole = whole.replace(minute=0)
    if wall == whole:
        return
    before = local(utc(moment) - timedelta(seconds=1), tz)
    assert before.utcoffset() != local(moment, tz).utcoffset(), (
        f"{moment.isoformat()} does not start a wall-clock {grain.value}"
    )


def relativedelta_oracle(now: datetime, grain: Grain, n: int) -> datetime:
    """Where ``now`` moved by n units lands by python-dateutil: the wall-clock result, as an
    instant (the earlier one when it is ambiguous; the first after the gap when it does not
    exist)."""
    tz = now.tzinfo
    assert isinstance(tz, ZoneInfo)
    target = now.replace(tzinfo=None) + _RELATIVEDELTA[grain](n)
    if exists(target, tz, 0):
        return target.replace(tzinfo=tz, fold=0)
    # Inside a gap: the first instant whose wall clock is not earlier than the target.
    lo = utc(target.replace(tzinfo=tz, fold=1))
    hi = utc(target.replace(tzinfo=tz, fold=0))
    lo, hi = min(lo, hi), max(lo, hi)
    while hi - lo > timedelta(seconds=1):
        mid = lo + (hi - lo) / 2
        if mid.astimezone(tz).replace(tzinfo=None) >= target:
            hi = mid
        else:
            lo = mid
    return hi.replace(microsecond=0).astimezone(tz)


# --- the skipped day itself --------------------------------------------------------------------


def test_apia_skipped_2011_12_30_per_tzdata():
    last_second = datetime(2011, 12, 29, 23, 59, 59, tzinfo=APIA)
    after = local(utc(last_second) + timedelta(seconds=1), APIA)
    assert after.replace(tzinfo=None) == datetime(2011, 12, 31)
    start = start_of_day(date(2011, 12, 30), APIA)
    assert utc(start) == utc(start_of_day(date(2011, 12, 31), APIA))
    assert local(start, APIA).replace(tzinfo=None) == datetime(2011, 12, 31)


def test_santiago_2024_09_08_starts_at_one_per_tzdata():
    tz = ZoneInfo("America/Santiago")
    assert not exists(datetime(2024, 9, 8, 0, 0), tz)
    start = start_of_day(date(2024, 9, 8), tz)
    assert local(start, tz).replace(tzinfo=None) == datetime(2024, 9, 8, 1, 0)
    assert_first_instant_of_day(start, tz)


# --- weeks ------------------------------------------------------------------------------------


@SETTINGS
@given(now=moments, week_start=week_starts)
@with_pinned()
def test_week_containing_now_has_seven_days_from_week_start(now, week_start):
    ws = WEEKDAY_INDEX[week_start]
    first, end = day_span(now.date(), Grain.WEEK, ws)
    assert first.weekday() == ws
    assert (end - first).days == 7
    assert first <= now.date() < end
    start, stop = period_containing(now, Grain.WEEK, ws)
    assert (utc(start), utc(stop)) == (utc(start_of_day(first, now.tzinfo)), utc(start_of_day(end, now.tzinfo)))
    assert utc(start) <= utc(now) < utc(stop)
    assert_first_instant_of_day(start, now.tzinfo)
    assert_first_instant_of_day(stop, now.tzinfo)


@SETTINGS
@given(now=moments, week_start=week_starts)
@with_pinned()
def test_last_week_ends_where_this_week_starts_and_next_week_starts_where_it_ends(now, week_start):
    ws = WEEKDAY_INDEX[week_start]
    first, end = day_span(now.date(), Grain.WEEK, ws)
    prev, nxt = shift_period(first, Grain.WEEK, -1), shift_period(first, Grain.WEEK, 1)
    assert day_span(prev, Grain.WEEK, ws) == (prev, first)
    assert day_span(nxt, Grain.WEEK, ws)[0] == end
    start, stop = period_containing(now, Grain.WEEK, ws)
    tz = now.tzinfo
    assert utc(period_containing(local(utc(start) - timedelta(microseconds=1), tz), Grain.WEEK, ws)[1]) == utc(start)
    assert utc(period_containing(stop, Grain.WEEK, ws)[0]) == utc(stop)


# --- months, quarters, halves, years ------------------------------------------------------------


@SETTINGS
@given(now=moments, week_start=week_starts)
@with_pinned()
def test_month_holds_the_days_calendar_monthrange_gives(now, week_start):
    d = now.date()
    first, end = day_span(d, Grain.MONTH)
    assert first == date(d.year, d.month, 1)
    assert (end - first).days == calendar.monthrange(d.year, d.month)[1]
    assert end == first + relativedelta(months=1)
    start, stop = period_containing(now, Grain.MONTH)
    assert utc(start) <= utc(now) < utc(stop)
    assert_first_instant_of_day(start, now.tzinfo)
    assert_first_instant_of_day(stop, now.tzinfo)


@SETTINGS
@given(now=moments, week_start=week_starts)
@with_pinned()
def test_quarters_halves_and_months_tile_the_year(now, week_start):
    year = now.year
    for grain, size in ((Grain.MONTH, 1), (Grain.QUARTER, 3), (Grain.HALF, 6), (Grain.YEAR, 12)):
        first = date(year, 1, 1)
        covered = 0
        while first.year == year:
            span = day_span(first, grain)
            assert span[0] == first
            assert span[1] == first + relativedelta(months=size)
            assert shift_period(first, grain, 1) == span[1]
            assert shift_period(span[1], grain, -1) == first
            covered += (span[1] - span[0]).days
            first = span[1]
        assert first == date(year + 1, 1, 1)
        assert covered == (366 if calendar.isleap(year) else 365)
    q_first, q_end = day_span(now.date(), Grain.QUARTER)
    assert q_first.month in (1, 4, 7, 10) and q_first.day == 1
    assert (q_end - q_first).days == sum(
        calendar.monthrange(year, m)[1] for m in range(q_first.month, q_first.month + 3)
    )


@SETTINGS
@given(now=moments, week_start=week_starts,
       grain=st.sampled_from([Grain.DAY, Grain.WEEK, Grain.MONTH, Grain.QUARTER, Grain.HALF, Grain.YEAR]))
@with_pinned(grain=Grain.DAY)
def test_consecutive_periods_share_their_boundary_instant(now, week_start, grain):
    ws = WEEKDAY_INDEX[week_start]
    tz = now.tzinfo
    start, stop = period_containing(now, grain, ws)
    assert utc(start) <= utc(now) < utc(stop)
    before = period_containing(local(utc(start) - timedelta(microseconds=1), tz), grain, ws)
    after = period_containing(stop, grain, ws)
    assert utc(before[1]) == utc(start) and utc(after[0]) == utc(stop)
    for s, e in (before, after):
        first = local(s, tz).date()
        if (tz.key, first) not in SKIPPED_DAYS:
            assert utc(s) < utc(e)
        assert_first_instant_of_day(s, tz)
        assert_first_instant_of_day(e, tz)


# --- days and their boundaries --------------------------------------------------------------------


@SETTINGS
@given(now=moments, week_start=week_starts, shift=st.integers(-3, 3))
@with_pinned(shift=1)
def test_start_of_day_is_midnight_or_the_first_instant_of_the_day(now, week_start, shift):
    tz = now.tzinfo
    day = now.date() + timedelta(days=shift)
    start, end = start_of_day(day, tz), start_of_day(day + timedelta(days=1), tz)
    assert_first_instant_of_day(start, tz)
    if (tz.key, day) in SKIPPED_DAYS:
        assert utc(start) == utc(end)  # the zone skipped the day: an empty interval
    else:
        assert utc(start) < utc(end)
        assert local(start, tz).date() == day
        assert local(utc(end) - timedelta(microseconds=1), tz).date() == day


# --- moving by units -----------------------------------------------------------------------------


@SETTINGS
@given(now=moments, week_start=week_starts,
       grain=st.sampled_from([Grain.DAY, Grain.WEEK, Grain.MONTH, Grain.QUARTER, Grain.YEAR]),
       n=st.integers(-60, 60))
@with_pinned(grain=Grain.DAY, n=-1)
def test_add_units_moves_the_wall_clock_as_relativedelta_does(now, week_start, grain, n):
    moved = add_units(now, grain, n)
    assert utc(moved) == utc(relativedelta_oracle(now, grain, n))
    assert_exists(moved, now.tzinfo)


@SETTINGS
@given(now=moments, week_start=week_starts, grain=st.sampled_from([Grain.MINUTE, Grain.HOUR]),
       n=st.integers(-1000, 1000))
@with_pinned(grain=Grain.HOUR, n=1)
def test_add_units_moves_hours_and_minutes_by_elapsed_time(now, week_start, grain, n):
    moved = add_units(now, grain, n)
    assert utc(moved) == utc(now) + n * _ELAPSED[grain]
    assert_exists(moved, now.tzinfo)


@given(day=st.dates(min_value=date(1900, 1, 1), max_value=date(2100, 12, 31)),
       months=st.integers(-2400, 2400))
@SETTINGS
def test_add_months_clamps_like_relativedelta(day, months):
    assert add_months(day, months) == day + relativedelta(months=months)


@SETTINGS
@given(now=moments, week_start=week_starts)
@with_pinned()
def test_local_instant_of_an_existing_wall_time_is_that_time(now, week_start):
    tz = now.tzinfo
    naive = now.replace(tzinfo=None)
    found = local_instant(naive, tz)
    assert found.replace(tzinfo=None) == naive
    assert_exists(found, tz)
    if exists(naive, tz, 1) and utc(naive.replace(tzinfo=tz, fold=1)) != utc(naive.replace(tzinfo=tz, fold=0)):
        assert utc(found) == utc(naive.replace(tzinfo=tz, fold=0))  # ambiguous: the earlier


# --- hours and minutes ---------------------------------------------------------------------------


@SETTINGS
@given(now=moments, week_start=week_starts, grain=st.sampled_from([Grain.MINUTE, Grain.HOUR]))
@with_pinned(grain=Grain.HOUR)
def test_hour_and_minute_containing_now_contain_it_and_tile(now, week_start, grain):
    tz = now.tzinfo
    start, stop = period_containing(now, grain)
    assert utc(start) <= utc(now) < utc(stop)
    assert_first_instant_of_unit(start, tz, grain)
    assert_first_instant_of_unit(stop, tz, grain)
    assert utc(stop) - utc(start) <= _ELAPSED[grain]
    # Starting on a whole unit with no change of offset inside, it is exactly one unit long.
    if start.utcoffset() == stop.utcoffset() and local(start, tz).second == 0 and (
        grain is Grain.MINUTE or local(start, tz).minute == 0
    ):
        assert utc(stop) - utc(start) == _ELAPSED[grain]
    assert utc(period_containing(stop, grain)[0]) == utc(stop)
    assert utc(period_containing(local(utc(start) - timedelta(microseconds=1), tz), grain)[1]) == utc(start)


@pytest.mark.parametrize(
    ("wall", "fold", "expected"),
    [
        # Lord Howe falls back from 02:00 (+11:00) to 01:30 (+10:30) on 2026-04-05: the first
        # pass of the wall-clock hour 01 ends at the change, the repeated half hour is a unit
        # of its own (so no hour lasts longer than 60 minutes).
        (datetime(2026, 4, 5, 1, 45), 1, ("2026-04-05T01:30:00+10:30", "2026-04-05T02:00:00+10:30")),
        (datetime(2026, 4, 5, 1, 45), 0, ("2026-04-05T01:00:00+11:00", "2026-04-05T01:30:00+10:30")),
        # It springs forward from 02:00 (+10:30) to 02:30 (+11:00) on 2026-10-04: the hour 02
        # has only its last 30 minutes.
        (datetime(2026, 10, 4, 2, 45), 0, ("2026-10-04T02:30:00+11:00", "2026-10-04T03:00:00+11:00")),
        # In 1986 the change came at 02:00 (+10:30) too: the hour 01 ends at the jump.
        (datetime(1986, 10, 19, 1, 0), 0, ("1986-10-19T01:00:00+10:30", "1986-10-19T02:30:00+11:00")),
    ],
    ids=["lord-howe-fall-back-second-pass", "lord-howe-fall-back-first-pass", "lord-howe-spring",
         "lord-howe-1986-spring-hour-before"],
)
def test_lord_howe_half_hour_changes_give_wall_clock_hours(wall, fold, expected):
    tz = ZoneInfo("Australia/Lord_Howe")
    now = wall.replace(tzinfo=tz, fold=fold)
    start, stop = period_containing(now, Grain.HOUR)
    assert (start.isoformat(), stop.isoformat()) == expected
