"""Periods of the civil calendar and their boundaries in a time zone.

Periods of a day or longer are spans of local dates ``[first, end)`` (end exclusive); they turn
into instants at the first moment of each local day, which is midnight except where a zone skips
it (America/Santiago 2024-09-08 starts at 01:00) or skips a whole day (Pacific/Apia 2011-12-30).
Moving by hours and minutes is elapsed time; the hour or minute containing a moment is the
wall-clock unit, cut where the zone changes its offset (see ``_unit_containing``).
"""

from __future__ import annotations

import functools
from datetime import date, datetime, time, timedelta, timezone
from typing import cast
from zoneinfo import ZoneInfo

from ..model import Grain

__all__ = [
    "add_months",
    "add_units",
    "day_span",
    "iso_week_start",
    "local_instant",
    "period_containing",
    "period_value",
    "shift_period",
    "start_of_day",
]

UTC = timezone.utc
_CALENDAR = (Grain.DAY, Grain.WEEK, Grain.MONTH, Grain.QUARTER, Grain.HALF, Grain.YEAR)
_MONTHS_IN = {Grain.MONTH: 1, Grain.QUARTER: 3, Grain.HALF: 6, Grain.YEAR: 12}
_ELAPSED = {Grain.SECOND: 1, Grain.MINUTE: 60, Grain.HOUR: 3600}


def _exists(naive: datetime, tz: ZoneInfo) -> datetime | None:
    aware = naive.replace(tzinfo=tz)
    back = aware.astimezone(UTC).astimezone(tz)
    return aware if back.replace(tzinfo=None) == naive else None


def local_instant(naive: datetime, tz: ZoneInfo) -> datetime:
    """The instant a wall-clock time names in ``tz``.

    Ambiguous times (a clock set back) take the earlier instant; times that do not exist (a
    clock set forward) take the first instant after the gap, so a period never starts inside it.

    >>> local_instant(datetime(2026, 3, 29, 2, 30), ZoneInfo("Europe/Berlin")).isoformat()
    '2026-03-29T03:00:00+02:00'
    """
    found = _exists(naive, tz)
    if found is not None:
        return found.replace(fold=0) if _exists(naive.replace(fold=0), tz) else found
    # Inside a gap: search the first instant (to the second) whose wall time is >= naive.
    lo = naive.replace(tzinfo=tz).astimezone(UTC) - timedelta(days=2)
    hi = naive.replace(tzinfo=tz, fold=1).astimezone(UTC) + timedelta(days=2)
    while hi - lo > timedelta(seconds=1):
        mid = lo + (hi - lo) / 2
        if mid.astimezone(tz).replace(tzinfo=None) >= naive:
            hi = mid
        else:
            lo = mid
    return hi.replace(microsecond=0).astimezone(tz)


@functools.lru_cache(maxsize=4096)
def start_of_day(day: date, tz: ZoneInfo) -> datetime:
    """The first instant whose local date is ``day`` (or later, for a day the zone skipped).

    >>> start_of_day(date(2024, 9, 8), ZoneInfo("America/Santiago")).isoformat()
    '2024-09-08T01:00:00-03:00'
    """
    return local_instant(datetime.combine(day, time(0)), tz)


def add_months(day: date, months: int) -> date:
    """``day`` moved by whole months, the day of month clamped to the target month's length
    (Mar 31 - 1 month = Feb 28 or 29), as python-dateutil's relativedelta does.

    >>> add_months(date(2024, 3, 31), -1)
    datetime.date(2024, 2, 29)
    """
    index = day.year * 12 + (day.month - 1) + months
    year, month0 = divmod(index, 12)
    if not 1 <= year <= 9999:
        raise OverflowError(f"date out of range: {year:04d}")
    month = month0 + 1
    if month == 12:
        length = 31
    else:
        length = (date(year, month + 1, 1) - date(year, month, 1)).days
    return date(year, month, min(day.day, length))


def add_units(moment: datetime, grain: Grain, n: int) -> datetime:
    """``moment`` moved by ``n`` units of ``grain``.

    Seconds, minutes and hours are elapsed time (24 hours across a DST change are 24 real hours);
    days and longer move the wall clock in the moment's zone, months by calendar arithmetic.

    >>> berlin = ZoneInfo("Europe/Berlin")
    >>> add_units(datetime(2026, 3, 28, 12, tzinfo=berlin), Grain.HOUR, 24).isoformat()
    '2026-03-29T13:00:00+02:00'
    >>> add_units(datetime(2026, 3, 28, 12, tzinfo=berlin), Grain.DAY, 1).isoformat()
    '2026-03-29T12:00:00+02:00'
    """
    tz = moment.tzinfo
    assert isinstance(tz, ZoneInfo), "moments carry a ZoneInfo"
    if grain in _ELAPSED:
        return (moment.astimezone(UTC) + timedelta(seconds=_ELAPSED[grain] * n)).astimezone(tz)
    naive = moment.replace(tzinfo=None)
    if grain is Grain.DAY:
        target = naive + timedelta(days=n)
    elif grain is Grain.WEEK:
        target = naive + timedelta(days=7 * n)
    elif grain in _MONTHS_IN:
        moved = add_months(naive.date(), _MONTHS_IN[grain] * n)
        target = datetime.combine(moved, naive.time())
    else:
        raise ValueError(f"cannot add units of {grain.value!r}")
    return local_instant(target, tz)


def iso_week_start(year: int, week: int) -> date:
    """Monday of ISO 8601 week ``week`` of ``year``.

    >>> iso_week_start(2026, 53)
    datetime.date(2026, 12, 28)
    """
    return date.fromisocalendar(year, week, 1)


def day_span(day: date, grain: Grain, week_start: int = 0) -> tuple[date, date]:
    """The local dates ``[first, end)`` of the ``grain`` period containing ``day``.

    >>> day_span(date(2026, 12, 2), Grain.WEEK, week_start=6)
    (datetime.date(2026, 11, 29), datetime.date(2026, 12, 6))
    >>> day_span(date(2026, 12, 2), Grain.QUARTER)
    (datetime.date(2026, 10, 1), datetime.date(2027, 1, 1))
    """
    if grain is Grain.DAY:
        return day, day + timedelta(days=1)
    if grain is Grain.WEEK:
        first = day - timedelta(days=(day.weekday() - week_start) % 7)
        return first, first + timedelta(days=7)
    size = _MONTHS_IN.get(grain)
    if size is None:
        raise ValueError(f"{grain.value!r} is not a calendar period of days")
    month = (day.month - 1) // size * size + 1
    first = date(day.year, month, 1)
    return first, add_months(first, size)


def shift_period(first: date, grain: Grain, n: int) -> date:
    """The first day of the ``grain`` period ``n`` periods after the one starting at ``first``.

    >>> shift_period(date(2026, 10, 1), Grain.QUARTER, -1)
    datetime.date(2026, 7, 1)
    """
    if grain is Grain.DAY:
        return first + timedelta(days=n)
    if grain is Grain.WEEK:
        return first + timedelta(days=7 * n)
    return add_months(first, _MONTHS_IN[grain] * n)


def period_containing(
    moment: datetime, grain: Grain, week_start: int = 0
) -> tuple[datetime, datetime]:
    """The instants ``[start, end)`` of the ``grain`` period containing ``moment``, in its zone.

    >>> berlin = ZoneInfo("Europe/Berlin")
    >>> s, e = period_containing(datetime(2026, 11, 27, 10, tzinfo=berlin), Grain.WEEK)
    >>> s.isoformat(), e.isoformat()
    ('2026-11-23T00:00:00+01:00', '2026-11-30T00:00:00+01:00')
    """
    tz = moment.tzinfo
    assert isinstance(tz, ZoneInfo), "moments carry a ZoneInfo"
    if grain in _ELAPSED:
        return _unit_containing(moment, grain, tz)
    first, end = day_span(moment.date(), grain, week_start)
    return start_of_day(first, tz), start_of_day(end, tz)


def _floor(wall: datetime, grain: Grain) -> datetime:
    if grain is Grain.SECOND:
        return wall.replace(microsecond=0)
    if grain is Grain.MINUTE:
        return wall.replace(second=0, microsecond=0)
    return wall.replace(minute=0, second=0, microsecond=0)


def _readings(naive: datetime, tz: ZoneInfo) -> list[datetime]:
    """The UTC instants whose wall clock in ``tz`` reads ``naive`` (two where the clock was set
    back), or the first instant after the gap when it does not exist."""
    found = {a.astimezone(UTC) for fold in (0, 1) if (a := _exists(naive.replace(fold=fold), tz))}
    return sorted(found) or [local_instant(naive, tz).astimezone(UTC)]


def _offset_change(lo: datetime, hi: datetime, tz: ZoneInfo) -> datetime:
    """The first instant in ``(lo, hi]`` (UTC) whose UTC offset differs from ``lo``'s, to the
    second (tzdata changes offsets on whole seconds)."""
    offset = lo.astimezone(tz).utcoffset()
    while hi - lo > timedelta(seconds=1):
        mid = lo + (hi - lo) / 2
        if mid.astimezone(tz).utcoffset() == offset:
            lo = mid
        else:
            hi = mid
    return hi.replace(microsecond=0)


def _starts_unit(change: datetime, before: timedelta, tz: ZoneInfo, grain: Grain) -> bool:
    """Whether the offset change at ``change`` (from offset ``before``) begins a new unit: the
    clock was set back (the repeated time is a unit of its own), or it jumped to a whole unit
    or into another unit."""
    after = change.astimezone(tz)
    if cast(timedelta, after.utcoffset()) < before:
        return True
    wall = after.replace(tzinfo=None)
    just_before = (change + before).replace(tzinfo=None) - timedelta(microseconds=1)
    return _floor(wall, grain) == wall or _floor(wall, grain) != _floor(just_before, grain)


def _unit_containing(moment: datetime, grain: Grain, tz: ZoneInfo) -> tuple[datetime, datetime]:
    """The wall-clock second, minute or hour containing ``moment``.

    A unit starts where the wall clock shows a whole unit, or where a change of offset begins a
    new one (see :func:`_starts_unit`); it ends where the next one starts. With whole-hour
    changes every unit lasts exactly one unit of elapsed time; a change by another amount
    (Australia/Lord_Howe moves by 30 minutes, old local mean times by odd seconds) makes one
    shorter, never longer.
    """
    size = timedelta(seconds=_ELAPSED[grain])
    at = moment.astimezone(UTC)
    floor = _floor(moment.replace(tzinfo=None), grain)
    start = max((t for t in _readings(floor, tz) if t <= at), default=at)
    offset = start.astimezone(tz).utcoffset()
    assert offset is not None
    if at.astimezone(tz).utcoffset() != offset:
        change = _offset_change(start, at, tz)
        if _starts_unit(change, offset, tz, grain):
            start = change
    t = start
    while True:  # the end: the next whole unit, or a change of offset that begins a unit
        offset = t.astimezone(tz).utcoffset()
        assert offset is not None
        wall = t.astimezone(tz).replace(tzinfo=None)
        nxt = t + (_floor(wall, grain) + size - wall)
        if nxt.astimezone(tz).utcoffset() == offset:
            end = nxt
            break
        change = _offset_change(t, nxt, tz)
        if _starts_unit(change, offset, tz, grain):
            end = change
            break
        t = change
    return start.astimezone(tz), end.astimezone(tz)


def unit_shifted(moment: datetime, grain: Grain, n: int) -> tuple[datetime, datetime]:
    """The wall-clock second, minute or hour ``n`` units after (``n < 0``: before) the one
    containing ``moment``, counted unit by unit, so that next to an offset change a short unit
    counts as one.

    >>> s, e = unit_shifted(datetime(2026, 3, 29, 3, 15, tzinfo=ZoneInfo("Europe/Berlin")), Grain.HOUR, -1)
    >>> s.isoformat(), e.isoformat()
    ('2026-03-29T01:00:00+01:00', '2026-03-29T03:00:00+02:00')
    """
    tz = moment.tzinfo
    assert isinstance(tz, ZoneInfo), "moments carry a ZoneInfo"
    size = timedelta(seconds=_ELAPSED[grain])
    start, end = _unit_containing(moment, grain, tz)
    start, end = start.astimezone(UTC), end.astimezone(UTC)
    for _ in range(abs(n)):
        # Fast path: a whole unit at a steady offset is exactly one unit of elapsed time.
        edge = end if n > 0 else start - size
        wall = edge.astimezone(tz)
        naive = wall.replace(tzinfo=None)
        if naive == _floor(naive, grain) and wall.utcoffset() == (edge + size).astimezone(tz).utcoffset():
            start, end = edge, edge + size
            continue
        probe = end if n > 0 else start - timedelta(microseconds=1)
        found = _unit_containing(probe.astimezone(tz), grain, tz)
        start, end = found[0].astimezone(UTC), found[1].astimezone(UTC)
    return start.astimezone(tz), end.astimezone(tz)


def period_value(first: date, grain: Grain, week_start: int = 0) -> str:
    """The ISO 8601 name of the period starting on ``first``: ``2026-12-01``, ``2026-W48``,
    ``2026-11``, ``2026-Q4``, ``2026-H2``, ``2026``; a week that does not start on Monday is
    not an ISO week and is written as start and duration, ``2026-11-22/P1W``.

    >>> period_value(date(2026, 11, 23), Grain.WEEK), period_value(date(2026, 10, 1), Grain.QUARTER)
    ('2026-W48', '2026-Q4')
    """
    if grain is Grain.DAY:
        return first.isoformat()
    if grain is Grain.WEEK:
        if first.weekday() == 0:
            year, week, _ = first.isocalendar()
            return f"{year:04d}-W{week:02d}"
        return f"{first.isoformat()}/P1W"
    if grain is Grain.MONTH:
        return f"{first.year:04d}-{first.month:02d}"
    if grain is Grain.QUARTER:
        return f"{first.year:04d}-Q{(first.month - 1) // 3 + 1}"
    if grain is Grain.HALF:
        return f"{first.year:04d}-H{(first.month - 1) // 6 + 1}"
    if grain is Grain.YEAR:
        return f"{first.year:04d}"
    raise ValueError(f"{grain.value!r} has no period name")
