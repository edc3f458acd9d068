"""Helpers shared by the resolvers: intervals from local dates, values, notes."""

from __future__ import annotations

from datetime import date, datetime, timedelta
from typing import TYPE_CHECKING

from ..calendars import period_value, start_of_day
from ..model import Grain, Interval, Reading

if TYPE_CHECKING:
    from ..context import Context

__all__ = ["dates", "instants", "reading", "iso", "interval_value", "is_day_start",
           "WEEKDAY_NAMES", "Outcome"]

WEEKDAY_NAMES = ("Monday", "Tuesday", "Wednesday", "Thursday", "Friday", "Saturday", "Sunday")

#: A resolver's answer: the chosen reading and the other plausible ones.
Outcome = tuple[Reading, tuple[Reading, ...]]


def iso(moment: datetime | None) -> str:
    """ISO 8601 with seconds and the UTC offset (``2026-11-23T00:00:00+01:00``); ``..`` when
    unbounded, as ISO 8601-2 writes an open interval end."""
    if moment is None:
        return ".."
    return moment.isoformat(timespec="seconds") if moment.microsecond == 0 else moment.isoformat()


def dates(first: date, end: date, grain: Grain, ctx: "Context", value: str | None = None) -> Interval:
    """The interval of local dates ``[first, end)`` in the context's zone.

    ``value`` defaults to the period's ISO name when ``[first, end)`` is one whole period of
    ``grain``, else ``first/PnD``.
    """
    tz = ctx.zone
    if value is None:
        try:
            value = period_value(first, grain, ctx.first_weekday)
        except ValueError:
            value = f"{first.isoformat()}/P{(end - first).days}D"
        if grain is Grain.DAY and (end - first).days != 1:
            value = f"{first.isoformat()}/P{(end - first).days}D"
    return Interval(start_of_day(first, tz), start_of_day(end, tz), grain, value)


def instants(start: datetime | None, end: datetime | None, grain: Grain) -> Interval:
    """An interval of instants, valued ``start/end`` (ISO 8601 interval, ``..`` if open)."""
    return Interval(start, end, grain, f"{iso(start)}/{iso(end)}")


def is_day_start(moment: datetime | None) -> bool:
    """Whether ``moment`` is the first instant of its local day (or unbounded)."""
    return moment is None or moment == start_of_day(moment.date(), moment.tzinfo)


def interval_value(start: datetime | None, end: datetime | None) -> str:
    """The ISO 8601 value of an interval that is not one named period.

    Bounds on local day starts are written as calendar dates, the end date inclusive as ISO
    8601 reads a date interval (``2026-03-01/2026-04-15``, ``../2026-02-28``, ``2026-03-01/..``);
    other bounds as date-times with offset (``2026-11-25T10:00:00+01:00/2026-12-02T10:00:00+01:00``).
    ``..`` is an open end (ISO 8601-2).
    """
    if is_day_start(start) and is_day_start(end):
        first = ".." if start is None else start.date().isoformat()
        last = ".." if end is None else (end.date() - timedelta(days=1)).isoformat()
        return f"{first}/{last}"
    return f"{iso(start)}/{iso(end)}"


def reading(interval: Interval, rid: str, note: str, policy: str | None = None) -> Reading:
    return Reading(interval, rid, note, policy)


def week_name(ctx: "Context") -> str:
    return f"weeks start on {ctx.week_start}"

