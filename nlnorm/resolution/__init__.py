"""Resolution: a language-free meaning + the context -> an explicit interval.

One resolver per phrase family; each returns the chosen reading and the other plausible ones,
with the context policy that would select each. Nothing here reads a clock: "now" is
``ctx.now``.
"""

from __future__ import annotations

from datetime import timedelta
from typing import TYPE_CHECKING, Any, Callable

from ..model import (
    Between,
    Bounded,
    DateRef,
    DayPeriodRef,
    Duration,
    FiscalRef,
    Grain,
    Interval,
    Kind,
    Meaning,
    Now,
    Offset,
    Reading,
    RelativeDay,
    Resolved,
    Rolling,
    ShiftPeriod,
    SprintRef,
    ToDate,
    WeekdayCount,
    WeekdayRef,
    WeekendRef,
)
from ..parsing import Parsed
from . import absolute, calendars, relative
from .common import Outcome, interval_value, iso, reading

if TYPE_CHECKING:
    from ..context import Context

__all__ = ["resolve", "resolve_meaning"]

_BOUND_IDS = {"since": "R7", "after": "R8", "before": "R9", "until": "R10"}


def resolve(parsed: tuple[Parsed, ...], ctx: "Context") -> tuple[Resolved, ...]:
    """Give each parsed candidate an explicit interval in ``ctx.tz``.

    >>> from nlnorm.context import Context
    >>> from nlnorm.pipeline import prepare, scan, parse
    >>> ctx = Context.at("2026-11-27T10:00+01:00", tz="Europe/Berlin", week_start="monday")
    >>> [r.chosen.interval.value for r in resolve(parse(scan(prepare("last week"), ctx), ctx), ctx)]
    ['2026-W47']
    """
    out: list[Resolved] = []
    for p in parsed:
        if p.meaning is None:
            continue
        try:
            outcome = resolve_meaning(p.meaning, ctx, p.candidate.reading, p.candidate.lang)
        except (OverflowError, ValueError):
            # Beyond the calendar's range (year 1 or 9999): no interval to give.
            continue
        if outcome is None:
            continue
        chosen, alternatives = outcome
        kind = Kind.SPRINT if chosen.sprints else _kind(p.meaning)
        out.append(Resolved(p.candidate, p.meaning, kind, chosen, alternatives))
    return tuple(out)


def _kind(m: Meaning) -> Kind:
    if isinstance(m, Now):
        return Kind.INSTANT
    if isinstance(m, Duration):
        return Kind.DURATION
    return Kind.RANGE


def resolve_meaning(m: Meaning, ctx: "Context", rid: str = "", lang: str = "en") -> Outcome | None:
    """Resolve one meaning; ``rid`` is the reading id the form declared, ``lang`` the language
    of the phrase (for its day periods and weekday usage)."""
    resolver = _RESOLVERS.get(type(m))
    return None if resolver is None else resolver(m, ctx, rid, lang)


def _bounded(m: Bounded, ctx: "Context", lang: str) -> Outcome | None:
    inner = resolve_meaning(m.inner, ctx, "", lang)
    if inner is None:
        return None
    chosen, alts = inner
    rid = _BOUND_IDS[m.relation]

    def bound(r: Reading, policy: str | None) -> Reading:
        iv = r.interval
        if m.relation == "since":
            start, end = iv.start, None
        elif m.relation == "after":
            start, end = iv.end, None
        elif m.relation == "before":
            start, end = None, iv.start
        else:
            start, end = None, iv.end
        value = interval_value(start, end)
        word = {"since": "from the start of", "after": "from the end of",
                "before": "up to the start of", "until": "up to the end of"}[m.relation]
        return Reading(Interval(start, end, iv.grain, value), rid,
                       f"{word} {iv.value} [{r.reading}: {r.note}]", policy, r.sprints)

    return bound(chosen, None), tuple(bound(a, a.policy) for a in alts)


def _between(m: Between, ctx: "Context", lang: str) -> Outcome | None:
    first = resolve_meaning(m.first, ctx, "", lang)
    if first is None:
        return None
    chosen_first, first_alts = first
    last = _resolve_end(m.first, m.last, chosen_first.interval, ctx, lang)
    if last is None:
        return None
    chosen_last, _ = last

    def span(a: Reading, b: Reading, policy: str | None) -> Reading | None:
        s, e = a.interval.start, b.interval.end
        note = f"from the start of {a.interval.value} to the end of {b.interval.value}"
        if s is not None and e is not None and e <= s:
            # Given end first ("from 2026-03-31 to 2026-01-01"): read the bounds in order.
            s, e = b.interval.start, a.interval.end
            note += " (bounds were given in reverse order)"
        grain = a.interval.grain
        sprints = a.sprints + tuple(n for n in b.sprints if n not in a.sprints)
        first, last = a.interval.start, b.interval.end
        if a.sprints and b.sprints and ctx.sprints is not None and first is not None and last is not None:
            # Every sprint of the first end's team between the two ends, not only the ends.
            ends = set(a.sprints + b.sprints)
            teams = {x.team for x in ctx.sprints.sprints if x.name in a.sprints}
            sprints = tuple(x.name for x in ctx.sprints.sprints if x.name in ends or (
                x.team in teams and first.date() <= x.start and x.end <= last.date()))
        return Reading(Interval(s, e, grain, interval_value(s, e)), "R11", note, policy, sprints)

    chosen = span(chosen_first, chosen_last, None)
    alts = []
    for alt in first_alts:
        end = _resolve_end(m.first, m.last, alt.interval, ctx, lang)
        if end is not None:
            r = span(alt, end[0], alt.policy)
            if r is not None:
                alts.append(r)
    assert chosen is not None
    return chosen, tuple(alts)


def _resolve_end(first: Meaning, last: Meaning, start: Interval, ctx: "Context",
                 lang: str) -> Outcome | None:
    """The end of a range. An end with missing fields takes them from the start and is the
    first such period not before it ("from January to March" said in January = this January
    to this March)."""
    if isinstance(last, DateRef) and last.year is None and start.start is not None:
        anchor = start.start
        for year in range(anchor.year, anchor.year + 3):
            iv = absolute.date_ref_interval(last, year, ctx)
            if iv is not None and iv.start is not None and iv.start >= anchor:
                return reading(iv, "R12", "range end: the first such period not before the start"), ()
        return None
    if isinstance(last, WeekdayRef) and last.mode == "bare" and start.start is not None:
        d = start.start.date()
        day = d + timedelta(days=(last.weekday - d.weekday()) % 7)
        from .common import dates

        return reading(dates(day, day + timedelta(days=1), Grain.DAY, ctx), "R13",
                       "range end: the first such day on or after the start"), ()
    return resolve_meaning(last, ctx, "", lang)



# One resolver per meaning type: (meaning, ctx, declared reading id, language) -> outcome.
_RESOLVERS: dict[type, Callable[[Any, "Context", str, str], Outcome | None]] = {
    RelativeDay: lambda m, ctx, rid, lang: relative.relative_day(m, ctx),
    ShiftPeriod: lambda m, ctx, rid, lang: calendars.shift(m, ctx) if m.grain in calendars.CALENDAR_GRAINS
    else relative.shift_period_(m, ctx),
    Offset: lambda m, ctx, rid, lang: calendars.offset(m, ctx, rid) if m.grain in calendars.CALENDAR_GRAINS
    else relative.offset(m, ctx, rid),
    Rolling: lambda m, ctx, rid, lang: calendars.rolling(m, ctx) if m.grain in calendars.CALENDAR_GRAINS
    else relative.rolling(m, ctx),
    SprintRef: lambda m, ctx, rid, lang: calendars.sprint_ref(m, ctx),
    FiscalRef: lambda m, ctx, rid, lang: calendars.fiscal_ref(m, ctx),
    ToDate: lambda m, ctx, rid, lang: relative.to_date(m, ctx),
    DayPeriodRef: lambda m, ctx, rid, lang: relative.day_period(m, ctx),
    WeekendRef: lambda m, ctx, rid, lang: relative.weekend(m, ctx),
    WeekdayCount: lambda m, ctx, rid, lang: relative.weekday_count(m, ctx),
    Now: lambda m, ctx, rid, lang: relative.now(m, ctx),
    Duration: lambda m, ctx, rid, lang: relative.duration(m, ctx),
    DateRef: lambda m, ctx, rid, lang: absolute.date_ref(m, ctx, rid, lang),
    WeekdayRef: lambda m, ctx, rid, lang: absolute.weekday(m, ctx, lang),
    Bounded: lambda m, ctx, rid, lang: _bounded(m, ctx, lang),
    Between: lambda m, ctx, rid, lang: _between(m, ctx, lang),
}
