"""Resolvers for calendar references: dates, months, quarters, halves, years, ISO weeks
(R12, R17-R20) and weekdays (R13-R16)."""

from __future__ import annotations

import calendar
from datetime import date, timedelta
from typing import TYPE_CHECKING

from ..calendars import add_months, day_span, iso_week_start
from ..locale import load_locale
from ..model import DateRef, Grain, Interval, Reading, WeekdayRef
from .. import cldr
from .common import Outcome, WEEKDAY_NAMES, dates, reading

if TYPE_CHECKING:
    from ..context import Context

_FIXED = {"R17": "explicit year", "R18": "explicit date", "R19": "explicit period",
          "R20": "ISO 8601 week"}


def date_ref_interval(ref: DateRef, year: int, ctx: "Context") -> Interval | None:
    """The interval ``ref`` names in ``year`` (``None`` if it does not exist that year)."""
    try:
        if ref.grain is Grain.DAY:
            assert ref.month is not None and ref.day is not None
            if ref.day > calendar.monthrange(year, ref.month)[1]:
                return None
            first = date(year, ref.month, ref.day)
            return dates(first, first + timedelta(days=1), Grain.DAY, ctx)
        if ref.grain is Grain.WEEK:
            assert ref.week is not None
            if ref.week == 53 and date(year, 12, 28).isocalendar()[1] != 53:
                return None
            first = iso_week_start(year, ref.week)
            # ISO weeks start on Monday whatever the context's week start is.
            interval = dates(first, first + timedelta(days=7), Grain.WEEK, ctx)
            return Interval(interval.start, interval.end, Grain.WEEK, f"{year:04d}-W{ref.week:02d}")
        if ref.grain is Grain.MONTH:
            assert ref.month is not None
            first = date(year, ref.month, 1)
            return dates(first, add_months(first, 1), Grain.MONTH, ctx)
        if ref.grain is Grain.QUARTER:
            assert ref.quarter is not None
            first = date(year, 3 * ref.quarter - 2, 1)
            return dates(first, add_months(first, 3), Grain.QUARTER, ctx)
        if ref.grain is Grain.HALF:
            assert ref.half is not None
            first = date(year, 6 * ref.half - 5, 1)
            return dates(first, add_months(first, 6), Grain.HALF, ctx)
        first = date(year, 1, 1)
        return dates(first, date(year + 1, 1, 1), Grain.YEAR, ctx)
    except (ValueError, OverflowError):
        return None


_REACH = 8


def _both_biases(ref: DateRef, ctx: "Context") -> tuple[Interval | None, Interval | None]:
    """(past, future). Past bias: the latest such period whose start <= now; future bias: the
    earliest whose end > now. The current period counts for both. Years are tried outward
    from now, as far as the rarest fields need: ISO week 53 recurs up to 7 years apart,
    February 29 up to 8 (2096 -> 2104)."""
    now = ctx.now
    past = future = None
    for y in range(now.year, now.year - _REACH - 1, -1):
        iv = date_ref_interval(ref, y, ctx)
        if iv is not None and iv.start is not None and iv.start <= now:
            past = iv
            break
    for y in range(now.year - 1, now.year + _REACH + 1):
        iv = date_ref_interval(ref, y, ctx)
        if iv is not None and iv.end is not None and iv.end > now:
            future = iv
            break
    return past, future


def _what(ref: DateRef) -> str:
    if ref.grain is Grain.DAY:
        return f"{calendar.month_name[ref.month or 1]} {ref.day}"
    if ref.grain is Grain.WEEK:
        return f"ISO week {ref.week}"
    if ref.grain is Grain.MONTH:
        return calendar.month_name[ref.month or 1]
    if ref.grain is Grain.QUARTER:
        return f"Q{ref.quarter}"
    if ref.grain is Grain.HALF:
        return f"H{ref.half}"
    return "year"


def date_ref(ref: DateRef, ctx: "Context", rid: str, lang: str = "en") -> Outcome | None:
    if ref.year is not None:
        interval = date_ref_interval(ref, ref.year, ctx)
        if interval is None:
            return None
        rid = rid if rid in _FIXED else {Grain.YEAR: "R17", Grain.DAY: "R18", Grain.WEEK: "R20"}.get(ref.grain, "R19")
        note = _FIXED[rid] + ("; ISO weeks run Monday to Sunday" if ref.grain is Grain.WEEK else "")
        alts: tuple[Reading, ...] = ()
        if ref.order is not None:
            source = "date_order" if ctx.date_order else f"CLDR short date format of {ctx.locale}"
            preferred = ctx.date_order or cldr.date_order(ctx.locale)
            if ref.order == preferred:
                note = f"numeric date read {_ORDER_NAMES[ref.order]} ({source})"
            else:
                # The preferred order gives no valid date (13/04/2026 read month first), or
                # cannot apply (a four-digit first field is a year).
                only = ", the only valid reading" if ref.alternate is None else ""
                note = (f"numeric date read {_ORDER_NAMES[ref.order]}{only} "
                        f"({source} is {_ORDER_NAMES[preferred]}, which does not fit)")
        if ref.alternate is not None:
            other = date_ref_interval(ref.alternate, ref.alternate.year or ref.year, ctx)
            swapped = ref.alternate.order or "DMY"
            if other is not None:
                alts = (reading(other, "R18", f"numeric date read {_ORDER_NAMES[swapped]}",
                                f"date_order={swapped}"),)
        return reading(interval, rid, note), alts
    past, future = _both_biases(ref, ctx)
    chosen, other, other_policy = (past, future, "bias=future") if ctx.bias == "past" else (future, past, "bias=past")
    if chosen is None:
        if other is None:
            return None
        chosen, other = other, None
    rid = "R20" if ref.grain is Grain.WEEK else "R12"
    side = "most recent" if ctx.bias == "past" else "next"
    note = f"{_what(ref)} with no year: the {side} one ({ctx.bias} bias; the current one counts)"
    alts = ()
    if other is not None and other.start != chosen.start:
        alts = (reading(other, rid, f"{_what(ref)}: the {'next' if ctx.bias == 'past' else 'most recent'} one",
                        other_policy),)
    return reading(chosen, rid, note), alts


_ORDER_NAMES = {"MDY": "month/day/year", "DMY": "day/month/year", "YMD": "year/month/day"}


def weekday(m: WeekdayRef, ctx: "Context", lang: str) -> Outcome:
    today = ctx.now.date()
    wd = m.weekday
    name = WEEKDAY_NAMES[wd]

    def day_reading(d: date, rid: str, note: str, policy: str | None = None) -> Reading:
        return reading(dates(d, d + timedelta(days=1), Grain.DAY, ctx), rid, note, policy)

    on_or_before = today - timedelta(days=(today.weekday() - wd) % 7)
    on_or_after = today + timedelta(days=(wd - today.weekday()) % 7)

    def in_week(offset: int) -> date:
        first, _ = day_span(today, Grain.WEEK, ctx.first_weekday)
        return first + timedelta(days=7 * offset + (wd - ctx.first_weekday) % 7)

    if m.mode == "bare":
        past = day_reading(on_or_before, "R13", f"the most recent {name} on or before today")
        future = day_reading(on_or_after, "R13", f"the first {name} on or after today")
        if m.deadline:
            # No setting selects the earlier day here: the deadline word decides, whatever the
            # bias (reword the question to mean it).
            return (reading(future.interval, "R13", future.note + " (after a deadline word)"),
                    (reading(past.interval, "R13", past.note, None),) if past.interval.start != future.interval.start else ())
        if ctx.bias == "future":
            return future, ((reading(past.interval, "R13", past.note, "bias=past"),) if on_or_before != on_or_after else ())
        return past, ((reading(future.interval, "R13", future.note, "bias=future"),) if on_or_before != on_or_after else ())
    if m.mode == "week":
        d = in_week(m.week_offset)
        which = {-1: "last week", 0: "this week", 1: "next week"}.get(m.week_offset, f"week {m.week_offset:+d}")
        chosen = day_reading(d, "R16", f"{name} of {which} (weeks start on {ctx.week_start})")
        alts: tuple[Reading, ...] = ()
        if m.week_offset == 0 and d != on_or_after:
            alts = (day_reading(on_or_after, "R15" if on_or_after > today else "R13",
                                f"the first {name} on or after today", None),)
        return chosen, alts
    preference = ctx.weekday_reading or load_locale(lang).meta.weekday_reading if lang != "und" else "nearest"
    if ctx.weekday_reading:
        preference = ctx.weekday_reading
    if m.mode == "last":
        nearest = today - timedelta(days=((today.weekday() - wd) % 7) or 7)
        near = day_reading(nearest, "R14", f"the most recent {name} strictly before today")
        week = day_reading(in_week(-1), "R16", f"{name} of last week (weeks start on {ctx.week_start})")
    else:
        nearest = today + timedelta(days=((wd - today.weekday()) % 7) or 7)
        near = day_reading(nearest, "R15", f"the first {name} strictly after today")
        week = day_reading(in_week(1), "R16", f"{name} of next week (weeks start on {ctx.week_start})")
    if m.nearest:
        # The phrase itself says the nearest day ("次の月曜日", the coming Monday): no setting
        # reads it as that day of the next week, which stays an alternative.
        alts = (reading(week.interval, week.reading, week.note, None),) \
            if near.interval.start != week.interval.start else ()
        return near, alts
    if preference == "week":
        alts = (reading(near.interval, near.reading, near.note, "weekday_reading=nearest"),) \
            if near.interval.start != week.interval.start else ()
        return week, alts
    alts = (reading(week.interval, week.reading, week.note, "weekday_reading=week"),) \
        if near.interval.start != week.interval.start else ()
    return near, alts
