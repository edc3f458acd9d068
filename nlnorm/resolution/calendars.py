"""Resolvers for the team's own calendars: sprints (from the context's sprint table), fiscal
years and quarters, and business days.

Relative phrases reach these through the same meanings as civil units ("last sprint" is a
shift of -1 sprint, "3 business days ago" an offset of -3 business days, "the last 3 sprints"
a window of 3 sprints); named ones through :class:`SprintRef` and :class:`FiscalRef`.
Readings are documented in docs/readings.md (R2-R6 with these units, R24-R26).
"""

from __future__ import annotations

from datetime import date, datetime, timedelta
from typing import TYPE_CHECKING, Any, Sequence, cast

from ..calendars import add_units, day_span, start_of_day
from ..calendars.fiscal import FiscalCalendar, FiscalYear
from ..model import FiscalRef, Grain, Interval, Offset, Reading, Rolling, ShiftPeriod, SprintRef
from .common import Outcome, dates, instants, interval_value, reading

if TYPE_CHECKING:
    from ..calendars.sprints import Sprint
    from ..context import Context

__all__ = ["CALENDAR_GRAINS", "shift", "offset", "rolling", "sprint_ref", "fiscal_ref"]

CALENDAR_GRAINS = frozenset({Grain.SPRINT, Grain.BUSINESS_DAY, Grain.FISCAL_QUARTER, Grain.FISCAL_YEAR})


# --- sprints ----------------------------------------------------------------------------------


def _sprint_interval(first: "Sprint", last: "Sprint", ctx: "Context") -> Interval:
    start, end = start_of_day(first.start, ctx.zone), start_of_day(last.end, ctx.zone)
    return Interval(start, end, Grain.SPRINT, interval_value(start, end))


def _sprint_reading(chosen: Sequence["Sprint"], rid: str, note: str, ctx: "Context",
                    policy: str | None = None, end: datetime | None = None) -> Reading:
    iv = _sprint_interval(chosen[0], chosen[-1], ctx)
    if end is not None:
        iv = Interval(iv.start, end, Grain.SPRINT, interval_value(iv.start, end))
    names = tuple(s.name for s in chosen)
    # A weekend between two sprints is no gap; business days between them are.
    gaps = [f"{a.name} and {b.name}" for a, b in zip(chosen, chosen[1:])
            if a.end < b.start and ctx.business.count(a.end, b.start) > 0]
    if gaps:
        note += f"; the interval includes the gap between {', '.join(gaps)}"
    return Reading(iv, rid, note, policy, names)


def _teams(ctx: "Context") -> list[tuple[str | None, tuple["Sprint", ...]]]:
    """The sprint lists relative phrases are read in: the context's team, else every team."""
    cal = ctx.sprints
    if ctx.team is not None:
        return [(ctx.team, cal.of_team(ctx.team))]
    return [(team, cal.of_team(team)) for team in cal.teams]


def _where(sprints: tuple["Sprint", ...], today: date) -> tuple[int | None, int | None, int | None]:
    """(index of the sprint holding today, of the last one ended by today, of the first one
    starting after today)."""
    current = ended = upcoming = None
    for i, s in enumerate(sprints):
        if s.start <= today < s.end:
            current = i
        elif s.end <= today:
            ended = i
        elif upcoming is None and s.start > today:
            upcoming = i
    return current, ended, upcoming


def _of(team: str | None) -> str:
    return f" of team {team}" if team else ""


def _relative_sprint(k: int, team: str | None, sprints: tuple["Sprint", ...], ctx: "Context",
                     rid: str) -> tuple[Reading, list[Reading]] | None:
    """The sprint ``k`` from the current one (0 = this, -1 = last, +1 = next)."""
    today = ctx.now.date()
    current, ended, upcoming = _where(sprints, today)
    word = {0: "this sprint", -1: "the last sprint", 1: "the next sprint"}.get(k, f"{k:+d} sprints")
    alts: list[Reading] = []
    if current is not None:
        i = current + k
        if not 0 <= i < len(sprints):
            return None
        s = sprints[i]
        where = "the sprint holding today" if k == 0 else f"{abs(k)} sprint(s) {'before' if k < 0 else 'after'} the current one ({sprints[current].name})"
        return _sprint_reading([s], rid, f"{word}{_of(team)}: {s.label()}, {where}", ctx), alts
    # Today falls between sprints (or before the first, or after the last).
    gap = (f"today ({today.isoformat()}) falls between sprints "
           f"{sprints[ended].name if ended is not None else '(none)'} and "
           f"{sprints[upcoming].name if upcoming is not None else '(none)'}")
    if k <= 0:
        if ended is None:
            if k == 0 and upcoming is not None:
                s = sprints[upcoming]
                return _sprint_reading([s], rid, f"{word}{_of(team)}: {s.label()}, the first sprint "
                                       f"(no sprint has ended yet; {gap})", ctx), alts
            return None
        i = ended if k == 0 else ended + k + 1
        if not 0 <= i < len(sprints):
            return None
        s = sprints[i]
        chosen = _sprint_reading([s], rid, f"{word}{_of(team)}: {s.label()}, read from the sprint that "
                                 f"ended most recently ({gap})", ctx)
        other = upcoming if k == 0 else i - 1
        if other is not None and 0 <= other < len(sprints):
            o = sprints[other]
            why = "the sprint starting next" if k == 0 else "the sprint before the one that ended most recently"
            alts.append(_sprint_reading([o], rid, f"{word}{_of(team)} read as {why}: {o.label()} ({gap})",
                                        ctx, "if today between sprints counts as the next one"
                                        if k == 0 else "if the sprint that just ended is 'this' one"))
        return chosen, alts
    if upcoming is None:
        return None
    i = upcoming + k - 1
    if i >= len(sprints):
        return None
    s = sprints[i]
    return _sprint_reading([s], rid, f"{word}{_of(team)}: {s.label()}, counted from the first sprint "
                           f"starting after today ({gap})", ctx), alts


def _per_team(make: Any, ctx: "Context") -> Outcome | None:
    """Run ``make(team, sprints)`` for each team in play; several teams give one reading per
    team, the first chosen and the others as alternatives with the reason."""
    if ctx.sprints is None:
        return None
    found: list[tuple[str | None, Reading, list[Reading]]] = []
    for team, sprints in _teams(ctx):
        if not sprints:
            continue
        got = make(team, sprints)
        if got is not None:
            found.append((team, got[0], got[1]))
    if not found:
        return None
    team, chosen, alts = found[0]
    if len(found) > 1:
        others = ", ".join(t or "(no team)" for t, _, _ in found[1:])
        chosen = Reading(chosen.interval, chosen.reading,
                         chosen.note + f"; several teams have sprints: team {team or '(none)'} was read "
                         f"(set team to choose; other teams: {others})", chosen.policy, chosen.sprints)
        for t, r, _ in found[1:]:
            alts.append(Reading(r.interval, r.reading, r.note, f"team={t}", r.sprints))
    return chosen, tuple(alts)


def _sprint_window(n: int, direction: int, team: str | None, sprints: tuple["Sprint", ...],
                   ctx: "Context", rid: str) -> tuple[Reading, list[Reading]] | None:
    today = ctx.now.date()
    current, ended, upcoming = _where(sprints, today)
    with_current = ctx.sprint_window == "with_current"
    if direction < 0:
        # Completed: the n sprints before the current one (in a gap: the n that ended last).
        last_done = current - 1 if current is not None else ended
        done = None
        if last_done is not None and last_done - n + 1 >= 0:
            picked = sprints[last_done - n + 1 : last_done + 1]
            if current is not None:
                # Up to where the current sprint starts (a gap before it is part of the past).
                done = _sprint_reading(picked, rid, f"the last {n} sprint(s){_of(team)} that ended: "
                                       + ", ".join(s.name for s in picked) + ", up to the start of the "
                                       f"current one ({sprints[current].name})", ctx,
                                       end=start_of_day(sprints[current].start, ctx.zone))
            else:
                done = _sprint_reading(picked, rid, f"the last {n} sprint(s){_of(team)}: "
                                       + ", ".join(s.name for s in picked) + " (today falls between sprints)", ctx)
        cur = None
        if current is not None and current - n + 1 >= 0:
            picked = sprints[current - n + 1 : current + 1]
            cur = _sprint_reading(picked, rid, f"the last {n} sprint(s){_of(team)} counting the current "
                                  "one, up to now: " + ", ".join(s.name for s in picked), ctx, end=ctx.now)
    else:
        first_next = current + 1 if current is not None else upcoming
        done = None
        if first_next is not None and first_next + n <= len(sprints):
            picked = sprints[first_next : first_next + n]
            done = _sprint_reading(picked, rid, f"the next {n} sprint(s){_of(team)} after the current one: "
                                   + ", ".join(s.name for s in picked), ctx)
        cur = None
        if current is not None and current + n <= len(sprints):
            picked = sprints[current : current + n]
            cur = _sprint_reading(picked, rid, f"the next {n} sprint(s){_of(team)} counting the current "
                                  "one: " + ", ".join(s.name for s in picked), ctx)
    first, second, policy = (cur, done, "sprint_window=completed") if with_current else \
        (done, cur, "sprint_window=with_current")
    if first is None:
        first, second = second, None
    if first is None:
        return None
    alts = [] if second is None else [Reading(second.interval, second.reading, second.note, policy, second.sprints)]
    return first, alts


def sprint_ref(m: SprintRef, ctx: "Context") -> Outcome | None:
    """R24: a sprint by number or name, looked up in every team's sprints."""
    cal = ctx.sprints
    if cal is None:
        return None
    found = cal.numbered(m.number) if m.number is not None else cal.named(m.name or "")
    if not found:
        return None
    last_found: tuple["Sprint", ...] = ()
    if m.last is not None:
        last_found = cal.numbered(m.last)
        if not last_found:
            return None
    if ctx.team is not None:
        mine = [s for s in found if (s.team or "").casefold() == ctx.team.casefold()]
        found = tuple(mine) + tuple(s for s in found if s not in mine)
    readings = []
    for s in found:
        if m.last is not None:
            end = next((e for e in last_found if e.team == s.team and e.start >= s.start), None)
            if end is None:
                continue
            picked = [x for x in cal.of_team(s.team) if s.start <= x.start <= end.start]
            readings.append(_sprint_reading(picked, "R24", f"sprints {s.label()} to {end.label()}", ctx))
        else:
            said = f"sprint {m.number}" if m.number is not None else f"the sprint named {m.name!r}"
            readings.append(_sprint_reading([s], "R24", f"{said}: {s.label()}, "
                                            f"{s.start.isoformat()} to {s.last_day.isoformat()}", ctx))
    if not readings:
        return None
    chosen = readings[0]
    alts = []
    if len(readings) > 1:
        chosen = Reading(chosen.interval, chosen.reading, chosen.note +
                         "; other teams have a sprint by that name or number too", None, chosen.sprints)
        alts = [Reading(r.interval, r.reading, r.note, "team=" + (s.team or ""), r.sprints)
                for r, s in zip(readings[1:], found[1:])]
    return chosen, tuple(alts)


# --- business days ----------------------------------------------------------------------------


def _business_day(day: date, rid: str, note: str, ctx: "Context") -> Reading:
    return reading(dates(day, day + timedelta(days=1), Grain.DAY, ctx), rid,
                   f"{note} ({ctx.business.describe()})")


def _business_shift(k: int, ctx: "Context", rid: str) -> Outcome:
    cal = ctx.business
    today = ctx.now.date()
    if k == 0:
        why = cal.why_closed(today)
        return _business_day(today, rid, "today" + (f", which is not a business day ({why})" if why else
                                                    ", a business day"), ctx), ()
    day = cal.step(today, k)
    word = "the business day before today" if k == -1 else "the business day after today" if k == 1 \
        else f"{abs(k)} business days {'before' if k < 0 else 'after'} today"
    return _business_day(day, rid, word + ", counting only business days", ctx), ()


def _business_window(n: int, direction: int, ctx: "Context", rid: str) -> Outcome:
    cal = ctx.business
    today = ctx.now.date()
    now = ctx.now
    tz = ctx.zone
    if direction < 0:
        first = cal.step(today, -n)
        window = Interval(start_of_day(first, tz), now, Grain.BUSINESS_DAY,
                          interval_value(start_of_day(first, tz), now))
        roll = reading(window, rid, f"from the start of business day {n} before today to now "
                                    f"({cal.describe()})")
        whole = dates(first, today, Grain.BUSINESS_DAY, ctx, value=interval_value(
            start_of_day(first, tz), start_of_day(today, tz)))
        cal_r = reading(whole, rid, f"the {n} business days before today, whole days, today left out "
                                    f"({cal.describe()})", "window_reading=calendar")
    else:
        last = cal.step(today, n)
        end = start_of_day(last + timedelta(days=1), tz)
        roll = reading(Interval(now, end, Grain.BUSINESS_DAY, interval_value(now, end)), rid,
                       f"from now to the end of business day {n} after today ({cal.describe()})")
        first = cal.step(today, 1)
        cal_r = reading(dates(first, last + timedelta(days=1), Grain.BUSINESS_DAY, ctx,
                              value=interval_value(start_of_day(first, tz), end)), rid,
                        f"the {n} business days after today, whole days ({cal.describe()})",
                        "window_reading=calendar")
    if ctx.window_reading == "calendar":
        return Reading(cal_r.interval, rid, cal_r.note), (Reading(roll.interval, rid, roll.note,
                                                                   "window_reading=rolling"),)
    return roll, (cal_r,)


# --- fiscal years and quarters ----------------------------------------------------------------


def _fiscal(ctx: "Context") -> tuple[FiscalCalendar, str]:
    if ctx.fiscal is not None:
        return ctx.fiscal, ctx.fiscal.describe()
    return FiscalYear(), "no fiscal calendar was given (fiscal_start): read as the calendar year"


def _fy_name(year: int) -> str:
    return f"FY{year}"


def _fiscal_reading(cal: Any, year: int, q: int | None, rid: str, note: str, ctx: "Context",
                    policy: str | None = None, describe: str = "") -> Reading:
    """Fiscal year ``year`` of ``cal``, or its quarter ``q``, as a reading whose note names it
    and its days."""
    first, end = cal.year_span(year) if q is None else cal.quarter_span(year, q)
    grain = Grain.FISCAL_YEAR if q is None else Grain.FISCAL_QUARTER
    iv = dates(first, end, grain, ctx, value=interval_value(
        start_of_day(first, ctx.zone), start_of_day(end, ctx.zone)))
    name = _fy_name(year) if q is None else f"Q{q} {_fy_name(year)}"
    return reading(iv, rid, f"{note}: {name}, {first.isoformat()} to "
                            f"{(end - timedelta(days=1)).isoformat()} ({describe or cal.describe()})", policy)


def _quarter_plus(year: int, q: int, k: int) -> tuple[int, int]:
    index = year * 4 + (q - 1) + k
    return index // 4, index % 4 + 1


def _fiscal_shift(grain: Grain, k: int, ctx: "Context", rid: str) -> Outcome:
    cal, describe = _fiscal(ctx)
    today = ctx.now.date()
    which = {-1: "the fiscal {} before the current one", 0: "the current fiscal {}",
             1: "the fiscal {} after the current one"}.get(k, "the fiscal {} " + f"{k:+d} from the current one")
    if grain is Grain.FISCAL_YEAR:
        return _fiscal_reading(cal, cal.year_of(today) + k, None, rid, which.format("year"), ctx,
                               describe=describe), ()
    fiscal_year, quarter = cal.quarter_of(today)
    year, q = _quarter_plus(fiscal_year, quarter, k)
    return _fiscal_reading(cal, year, q, rid, which.format("quarter"), ctx, describe=describe), ()


def _fiscal_window(grain: Grain, n: int, direction: int, ctx: "Context", rid: str) -> Outcome:
    cal, describe = _fiscal(ctx)
    today = ctx.now.date()
    now = ctx.now
    months = 12 if grain is Grain.FISCAL_YEAR else 3
    if grain is Grain.FISCAL_YEAR:
        this_year = cal.year_of(today)

        def span(k: int) -> tuple[date, date]:
            """The fiscal year ``k`` from the current one: (first day, day after)."""
            return cal.year_span(this_year + k)
    else:
        y, q = cal.quarter_of(today)

        def span(k: int) -> tuple[date, date]:
            """The fiscal quarter ``k`` from the current one: (first day, day after)."""
            return cal.quarter_span(*_quarter_plus(y, q, k))

    current = span(0)
    unit = "fiscal year(s)" if grain is Grain.FISCAL_YEAR else "fiscal quarter(s)"
    if direction < 0:
        whole = instants(start_of_day(span(-n)[0], ctx.zone), start_of_day(current[0], ctx.zone), grain)
        whole_note = f"the {n} whole {unit} before the current one ({describe})"
        rolled = instants(add_units(now, Grain.MONTH, -months * n), now, grain)
        roll_note = f"rolling window of {months * n} months ending now"
    else:
        whole = instants(start_of_day(current[1], ctx.zone), start_of_day(span(n)[1], ctx.zone), grain)
        whole_note = f"the {n} whole {unit} after the current one ({describe})"
        rolled = instants(now, add_units(now, Grain.MONTH, months * n), grain)
        roll_note = f"rolling window of {months * n} months starting now"
    whole = Interval(whole.start, whole.end, grain, interval_value(whole.start, whole.end))
    roll = reading(rolled, rid, roll_note)
    cal_r = reading(whole, rid, whole_note)
    if ctx.window_reading == "calendar":
        return cal_r, (Reading(roll.interval, rid, roll.note, "window_reading=rolling"),)
    return roll, (Reading(cal_r.interval, rid, cal_r.note, "window_reading=calendar"),)


def fiscal_ref(m: FiscalRef, ctx: "Context") -> Outcome | None:
    """R25 / R26: a named fiscal year or quarter; with no year, the current fiscal year's."""
    cal, describe = _fiscal(ctx)
    today = ctx.now.date()
    rid = "R26" if m.quarter is not None else "R25"
    alts: list[Reading] = []
    if m.year is None:
        if m.quarter is None:
            return None
        year = cal.year_of(today)
        chosen = _fiscal_reading(cal, year, m.quarter, rid, "that quarter of the current fiscal year",
                                         ctx, describe=describe)
        start, end = cal.quarter_span(year, m.quarter)
        if today < start and ctx.bias == "past":
            alts.append(Reading(chosen.interval, rid, chosen.note, "bias=future"))
            chosen = _fiscal_reading(cal, year - 1, m.quarter, rid, "the most recent such fiscal "
                                             "quarter (it has not begun this fiscal year)", ctx, describe=describe)
        elif today >= end and ctx.bias == "future":
            alts.append(Reading(chosen.interval, rid, chosen.note, "bias=past"))
            chosen = _fiscal_reading(cal, year + 1, m.quarter, rid, "the next such fiscal quarter",
                                             ctx, describe=describe)
        return chosen, tuple(alts) + _calendar_quarter(m, ctx)
    said = f"FY{m.year % 100:02d}" if m.two_digit else _fy_name(m.year)
    if m.quarter is None:
        chosen = _fiscal_reading(cal, m.year, None, rid, f"{said} as written", ctx)
    else:
        chosen = _fiscal_reading(cal, m.year, m.quarter, rid, f"Q{m.quarter} {said} as written", ctx,
                                         describe=describe)
    naming = getattr(cal, "naming", "end")
    if ctx.fiscal is not None and _naming_matters(cal):
        import dataclasses

        other_naming = "start" if naming == "end" else "end"
        other = dataclasses.replace(cast(Any, cal), naming=other_naming)  # both kinds are dataclasses
        note = f"{said} named by the year it {'starts' if other_naming == 'start' else 'ends'} in"
        alts.append(_fiscal_reading(other, m.year, m.quarter, rid, note, ctx, f"fiscal_name={other_naming}"))
    return chosen, tuple(alts) + _calendar_quarter(m, ctx)


def _naming_matters(cal: Any) -> bool:
    return not (isinstance(cal, FiscalYear) and (cal.start_month, cal.start_day) == (1, 1))


def _calendar_quarter(m: FiscalRef, ctx: "Context") -> tuple[Reading, ...]:
    """When quarters are fiscal by the context, a plain "Q3" could still be the calendar one."""
    if not m.from_plain_quarter or m.quarter is None:
        return ()
    today = ctx.now.date()
    year = m.year if m.year is not None else today.year
    first, end = day_span(date(year, 3 * (m.quarter - 1) + 1, 1), Grain.QUARTER)
    return (reading(dates(first, end, Grain.QUARTER, ctx), "R12" if m.year is None else "R19",
                    f"the calendar quarter {year}-Q{m.quarter}", "quarters=calendar"),)


# --- dispatch from the shared meanings ---------------------------------------------------------


def shift(m: ShiftPeriod, ctx: "Context") -> Outcome | None:
    if m.grain is Grain.SPRINT:
        return _per_team(lambda team, sprints: _relative_sprint(m.offset, team, sprints, ctx, "R2"), ctx)
    if m.grain is Grain.BUSINESS_DAY:
        return _business_shift(m.offset, ctx, "R2")
    return _fiscal_shift(m.grain, m.offset, ctx, "R2")


def offset(m: Offset, ctx: "Context", rid: str) -> Outcome | None:
    rid = rid if rid in ("R3", "R4") else ("R3" if m.n < 0 else "R4")
    if m.grain is Grain.SPRINT:
        return _per_team(lambda team, sprints: _relative_sprint(m.n, team, sprints, ctx, rid), ctx)
    if m.grain is Grain.BUSINESS_DAY:
        return _business_shift(m.n, ctx, rid)
    return _fiscal_shift(m.grain, m.n, ctx, rid)


def rolling(m: Rolling, ctx: "Context") -> Outcome | None:
    rid = "R5" if m.direction < 0 else "R6"
    if not m.explicit_n and m.grain in (Grain.SPRINT, Grain.BUSINESS_DAY):
        # "the last sprint", "the past working day": one whole sprint or day, as "last sprint".
        return shift(ShiftPeriod(m.grain, -1 if m.direction < 0 else 1), ctx)
    if m.grain is Grain.SPRINT:
        return _per_team(lambda team, sprints: _sprint_window(m.n, m.direction, team, sprints, ctx, rid), ctx)
    if m.grain is Grain.BUSINESS_DAY:
        return _business_window(m.n, m.direction, ctx, rid)
    return _fiscal_window(m.grain, m.n, m.direction, ctx, rid)
