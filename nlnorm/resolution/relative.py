"""Resolvers for phrases relative to now: R1-R6, R21-R23, "now", "in 3 Sundays"."""

from __future__ import annotations

from datetime import date, datetime, time, timedelta, timezone
from typing import TYPE_CHECKING

from .. import cldr
from ..calendars import add_units, day_span, local_instant, shift_period
from ..calendars.periods import unit_shifted
from ..model import (
    DayPeriodRef,
    Duration,
    Grain,
    Interval,
    Now,
    Offset,
    Reading,
    RelativeDay,
    Rolling,
    ShiftPeriod,
    ToDate,
    WeekdayCount,
    WeekendRef,
)
from .common import Outcome, WEEKDAY_NAMES, dates, instants, iso, reading, week_name

if TYPE_CHECKING:
    from ..context import Context

_SUBDAY = (Grain.SECOND, Grain.MINUTE, Grain.HOUR)
_DURATION = {
    Grain.SECOND: "PT{}S", Grain.MINUTE: "PT{}M", Grain.HOUR: "PT{}H", Grain.DAY: "P{}D",
    Grain.WEEK: "P{}W", Grain.MONTH: "P{}M", Grain.YEAR: "P{}Y",
}


def _period(moment: datetime, grain: Grain, ctx: "Context", shift: int = 0) -> Interval:
    """The whole ``grain`` period containing ``moment``, shifted by ``shift`` periods."""
    if grain in _SUBDAY:
        # Wall-clock units, counted one by one: next to an offset change one can be shorter.
        start, end = unit_shifted(moment, grain, shift)
        whole = end.astimezone(timezone.utc) - start.astimezone(timezone.utc) == timedelta(
            seconds={Grain.SECOND: 1, Grain.MINUTE: 60, Grain.HOUR: 3600}[grain])
        value = f"{iso(start)}/{_DURATION[grain].format(1)}" if whole else f"{iso(start)}/{iso(end)}"
        return Interval(start, end, grain, value)
    first, _ = day_span(moment.date(), grain, ctx.first_weekday)
    first = shift_period(first, grain, shift)
    return dates(first, shift_period(first, grain, 1), grain, ctx)


def relative_day(m: RelativeDay, ctx: "Context") -> Outcome:
    day = ctx.now.date() + timedelta(days=m.offset)
    return reading(dates(day, day + timedelta(days=1), Grain.DAY, ctx), "R1",
                   f"the local day {m.offset:+d} from today" if m.offset else "today, the local day"), ()


def shift_period_(m: ShiftPeriod, ctx: "Context") -> Outcome:
    interval = _period(ctx.now, m.grain, ctx, m.offset)
    which = {-1: "before the current one", 0: "containing now", 1: "after the current one"}.get(
        m.offset, f"{m.offset:+d} from the current one")
    extra = f"; {week_name(ctx)}" if m.grain is Grain.WEEK else ""
    return reading(interval, "R2", f"the whole calendar {m.grain.value} {which}{extra}"), ()


def offset(m: Offset, ctx: "Context", rid: str = "") -> Outcome:
    rid = rid if rid in ("R3", "R4") else ("R3" if m.n < 0 else "R4")  # "0 days ago" is R3
    if m.grain in _SUBDAY:
        interval = _period(add_units(ctx.now, m.grain, m.n), m.grain, ctx)
    else:
        # Calendar units move the local date, as "yesterday" does: a day the zone skipped is
        # still counted (and is empty), not replaced by the day after it.
        day = shift_period(ctx.now.date(), m.grain, m.n)
        first, end = day_span(day, m.grain, ctx.first_weekday)
        interval = dates(first, end, m.grain, ctx)
    when = f"{abs(m.n)} {m.grain.value}(s) {'before' if m.n < 0 else 'after'} now"
    return reading(interval, rid, f"the whole {m.grain.value} containing the moment {when}"), ()


def rolling(m: Rolling, ctx: "Context") -> Outcome:
    rid = "R5" if m.direction < 0 else "R6"
    now = ctx.now
    if m.direction < 0:
        window = instants(add_units(now, m.grain, -m.n), now, m.grain)
    else:
        window = instants(now, add_units(now, m.grain, m.n), m.grain)
    current = _period(now, m.grain, ctx)
    if m.direction < 0:
        first = _period(now, m.grain, ctx, -m.n)
        whole = instants(first.start, current.start, m.grain)
    else:
        nxt = _period(now, m.grain, ctx, 1)
        last = _period(now, m.grain, ctx, m.n)
        whole = instants(nxt.start, last.end, m.grain)
    side = "ending" if m.direction < 0 else "starting"
    roll = reading(window, rid, f"rolling window of {m.n} {m.grain.value}(s) {side} now")
    cal = reading(whole, rid, f"the {m.n} whole calendar {m.grain.value}(s) "
                              f"{'before' if m.direction < 0 else 'after'} the current one")
    # On a unit boundary ("the last 2 hours" at 10:00) both readings are the same interval:
    # then there is no other reading to offer.
    same = (roll.interval.start, roll.interval.end) == (cal.interval.start, cal.interval.end)
    if ctx.window_reading == "calendar":
        return cal, () if same else (_with_policy(roll, "window_reading=rolling"),)
    return roll, () if same else (_with_policy(cal, "window_reading=calendar"),)


def _with_policy(r: Reading, policy: str) -> Reading:
    return reading(r.interval, r.reading, r.note, policy)


def to_date(m: ToDate, ctx: "Context") -> Outcome:
    current = _period(ctx.now, m.grain, ctx)
    return reading(instants(current.start, ctx.now, m.grain), "R21",
                   f"from the start of the current {m.grain.value} to now"), ()


def day_period(m: DayPeriodRef, ctx: "Context") -> Outcome | None:
    rules = cldr.day_period_rules(m.lang if m.lang != "und" else "en")
    if m.period not in rules:
        return None
    start_s, before_s = rules[m.period]
    day = ctx.now.date() + timedelta(days=m.day_offset)
    end_day = day if before_s > start_s else day + timedelta(days=1)
    tz = ctx.zone
    start = local_instant(datetime.combine(day, time()) + timedelta(seconds=start_s), tz)
    end = local_instant(datetime.combine(end_day, time()) + timedelta(seconds=before_s), tz)
    hours = f"{start_s // 3600:02d}:{start_s % 3600 // 60:02d}-{before_s // 3600:02d}:{before_s % 3600 // 60:02d}"
    note = (f"CLDR {cldr.cldr_version()} day period {m.period!r} of {m.lang!r} ({hours}) "
            f"on the local day {m.day_offset:+d} from today")
    return reading(instants(start, end, Grain.HOUR), "R22", note), ()


def weekend(m: WeekendRef, ctx: "Context") -> Outcome:
    days = cldr.weekend_days(ctx.locale)
    length = len(days)
    today = ctx.now.date()
    wd = today.weekday()

    def start_on_or_after(d: date) -> date:
        return d + timedelta(days=(days[0] - d.weekday()) % 7)

    current = today - timedelta(days=days.index(wd)) if wd in days else None
    coming = start_on_or_after(today + timedelta(days=1)) if current is None else None
    upcoming = current if current is not None else coming
    assert upcoming is not None
    last_ended = (current or upcoming) - timedelta(days=7)

    def span(first: date, rid: str, note: str, policy: str | None = None) -> Reading:
        names = "-".join(WEEKDAY_NAMES[d][:3] for d in (days[0], days[-1])) if length > 1 else WEEKDAY_NAMES[days[0]]
        interval = dates(first, first + timedelta(days=length), Grain.DAY, ctx,
                         value=f"{first.isoformat()}/P{length}D")
        return reading(interval, rid, f"{note} (weekend {names}, CLDR week data for {ctx.locale})", policy)

    if m.bare:
        # "over the weekend": the current weekend on a weekend day; otherwise the bias decides
        # between the last one and the coming one.
        if current is not None:
            return span(current, "R23", "the current weekend"), ()
        past = span(last_ended, "R23", "the most recent weekend (past bias)")
        future = span(upcoming, "R23", "the coming weekend (future bias)")
        if ctx.bias == "future":
            return future, (reading(past.interval, "R23", past.note, "bias=past"),)
        return past, (reading(future.interval, "R23", future.note, "bias=future"),)
    if m.offset < 0:
        return span(last_ended, "R23", "the most recent weekend that has ended"), ()
    if m.offset == 0:
        return span(upcoming, "R23", "the weekend containing today, else the coming one"), ()
    nxt = upcoming + timedelta(days=7)
    alts = () if current is not None else (span(upcoming, "R23", "the coming weekend"),)
    return span(nxt, "R23", "the weekend after this weekend"), alts


def weekday_count(m: WeekdayCount, ctx: "Context") -> Outcome:
    today = ctx.now.date()
    if m.n > 0:
        first = today + timedelta(days=((m.weekday - today.weekday()) % 7) or 7)
        day = first + timedelta(days=7 * (m.n - 1))
        rid = "R4"
    else:
        first = today - timedelta(days=((today.weekday() - m.weekday) % 7) or 7)
        day = first - timedelta(days=7 * (-m.n - 1))
        rid = "R3"
    note = f"the {abs(m.n)}. {WEEKDAY_NAMES[m.weekday]} {'after' if m.n > 0 else 'before'} today"
    return reading(dates(day, day + timedelta(days=1), Grain.DAY, ctx), rid, note), ()


def now(m: Now, ctx: "Context") -> Outcome:
    return reading(Interval(ctx.now, ctx.now, Grain.SECOND, iso(ctx.now)), "NOW",
                   "the reference instant"), ()


def duration(m: Duration, ctx: "Context") -> Outcome | None:
    if m.grain in (Grain.SPRINT, Grain.BUSINESS_DAY, Grain.FISCAL_QUARTER, Grain.FISCAL_YEAR):
        return None  # no fixed length in ISO 8601 terms ("for 3 sprints")
    if m.grain is Grain.QUARTER:
        value = f"P{3 * m.n}M"
    elif m.grain is Grain.HALF:
        value = f"P{6 * m.n}M"
    else:
        value = _DURATION[m.grain].format(m.n)
    return reading(Interval(None, None, m.grain, value), "D", f"a length of {m.n} {m.grain.value}(s)"), ()
