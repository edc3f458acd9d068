"""Checked against: the standard library calendar (``calendar.monthrange``, ``date.weekday``),
IANA tzdata through ``zoneinfo`` (which instants exist and their UTC offsets), python-dateutil's
``relativedelta`` as the oracle for moving a wall-clock time by days, weeks, months and years,
and UTC arithmetic (``datetime`` + ``timedelta``) for elapsed hours and minutes. Reading "this
week" as the 7 local days from the configured week start, "N days ago" as the whole day
containing that moment, and "the past N days" as the window ending now are common practice
(the project's readings R2-R5). Unicode NFKC and case folding come from ``unicodedata``.

Properties of :func:`nlnorm.normalize` on English phrases, for reference instants from 1900 to
2100 in zones with daylight-saving oddities (see ``tests/property/strategies.py``).
"""

from __future__ import annotations

import calendar
from datetime import datetime, time, timedelta, timezone
from zoneinfo import ZoneInfo

from dateutil.relativedelta import relativedelta
from hypothesis import given, settings
from hypothesis import strategies as st

from nlnorm import Context, Mention, normalize
from tests.property.strategies import WEEKDAY_INDEX, moments, week_starts, with_pinned
from tests.property.test_calendar_invariants import SKIPPED_DAYS, relativedelta_oracle

UTC = timezone.utc
SETTINGS = settings(max_examples=200, deadline=None)

UNITS = {  # grain name -> (singular, plural) as English writes them after a number
    "minute": ("minute", "minutes"),
    "hour": ("hour", "hours"),
    "day": ("day", "days"),
    "week": ("week", "weeks"),
    "month": ("month", "months"),
    "quarter": ("quarter", "quarters"),
    "year": ("year", "years"),
}
CALENDAR_UNITS = ("day", "week", "month", "quarter", "year")
ELAPSED = {"minute": timedelta(minutes=1), "hour": timedelta(hours=1)}
units = st.sampled_from(sorted(UNITS))
counts = st.integers(min_value=1, max_value=120)


# --- helpers ---------------------------------------------------------------------------------


def ctx_for(now: datetime, week_start: str) -> Context:
    return Context(now=now, week_start=week_start)


def utc(moment: datetime) -> datetime:
    return moment.astimezone(UTC)


def only(text: str, ctx: Context) -> Mention:
    result = normalize(text, ctx)
    assert len(result.mentions) == 1, (text, [m.text for m in result.mentions])
    m = result.mentions[0]
    assert m.text == text, (text, m.text)
    return m


def instant(value: str | None, tz: ZoneInfo) -> datetime:
    """A mention bound as an aware datetime in ``tz``, after checking that the written offset is
    the zone's offset at that instant and the written wall clock is the zone's."""
    assert value is not None
    written = datetime.fromisoformat(value)
    inzone = written.astimezone(tz)
    assert (inzone.replace(tzinfo=None), inzone.utcoffset()) == (
        written.replace(tzinfo=None), written.utcoffset()
    ), f"{value} is not how {tz.key} writes that instant ({inzone.isoformat()})"
    return inzone


def bounds(m: Mention, tz: ZoneInfo) -> tuple[datetime, datetime]:
    return instant(m.start, tz), instant(m.end, tz)


def is_first_instant_of_day(moment: datetime, tz: ZoneInfo) -> bool:
    """Local midnight, or the first instant of the local day where midnight does not exist."""
    if moment.time() == time(0):
        return True
    before = utc(moment) - timedelta(seconds=1)
    return before.astimezone(tz).date() < moment.date()


def assert_day_period(m: Mention, tz: ZoneInfo) -> tuple[datetime, datetime]:
    start, end = bounds(m, tz)
    assert is_first_instant_of_day(start, tz), m.start
    assert is_first_instant_of_day(end, tz), m.end
    if utc(start) == utc(end):  # only a day the zone skipped may be empty
        first = datetime.fromisoformat(m.value[:10]).date() if m.grain == "day" else None
        assert (tz.key, first) in SKIPPED_DAYS, (m.text, m.value, m.start)
    else:
        assert utc(start) < utc(end)
    return start, end


def calendar_days(start: datetime, end: datetime) -> int:
    """How many local dates ``[start, end)`` covers (day-aligned bounds)."""
    return (end.date() - start.date()).days


def phrase(n: int, unit: str, pattern: str) -> str:
    word = UNITS[unit][0] if n == 1 else UNITS[unit][1]
    return pattern.format(n=n, unit=word)


# --- weeks ----------------------------------------------------------------------------------


@SETTINGS
@given(now=moments, week_start=week_starts)
@with_pinned()
def test_this_week_contains_now_spans_seven_local_days_from_week_start(now, week_start):
    ctx = ctx_for(now, week_start)
    tz = ctx.zone
    start, end = assert_day_period(only("this week", ctx), tz)
    assert utc(start) <= utc(now) < utc(end)
    first = now.date() - timedelta(days=(now.weekday() - WEEKDAY_INDEX[week_start]) % 7)
    assert first.weekday() == WEEKDAY_INDEX[week_start]
    assert start.date() == first or (tz.key, first) in SKIPPED_DAYS
    assert end.date() == first + timedelta(days=7)
    if (tz.key, first) not in SKIPPED_DAYS:
        assert calendar_days(start, end) == 7


@SETTINGS
@given(now=moments, week_start=week_starts)
@with_pinned()
def test_last_week_ends_at_this_weeks_start_and_next_week_starts_at_its_end(now, week_start):
    ctx = ctx_for(now, week_start)
    tz = ctx.zone
    this = assert_day_period(only("this week", ctx), tz)
    last = assert_day_period(only("last week", ctx), tz)
    nxt = assert_day_period(only("next week", ctx), tz)
    assert utc(last[1]) == utc(this[0])
    assert utc(nxt[0]) == utc(this[1])
    assert utc(last[1]) <= utc(now) < utc(nxt[0])


@SETTINGS
@given(now=moments, week_start=week_starts, unit=st.sampled_from(["hour", "minute"]))
@with_pinned(unit="hour")
def test_last_this_and_next_hour_and_minute_adjoin_and_contain_now(now, week_start, unit):
    ctx = ctx_for(now, week_start)
    tz = ctx.zone
    last, this, nxt = (bounds(only(f"{w} {unit}", ctx), tz) for w in ("last", "this", "next"))
    assert utc(last[1]) == utc(this[0]) and utc(this[1]) == utc(nxt[0])
    assert utc(this[0]) <= utc(now) < utc(this[1])
    for start, end in (last, this, nxt):
        assert timedelta(0) < utc(end) - utc(start) <= ELAPSED[unit]


# --- months, quarters, years ------------------------------------------------------------------


@SETTINGS
@given(now=moments, week_start=week_starts)
@with_pinned()
def test_this_month_holds_exactly_the_days_calendar_monthrange_gives(now, week_start):
    ctx = ctx_for(now, week_start)
    m = only("this month", ctx)
    start, end = assert_day_period(m, ctx.zone)
    assert utc(start) <= utc(now) < utc(end)
    assert (start.year, start.month, start.day) == (now.year, now.month, 1)
    assert calendar_days(start, end) == calendar.monthrange(now.year, now.month)[1]
    assert m.value == f"{now.year:04d}-{now.month:02d}"


@SETTINGS
@given(now=moments, week_start=week_starts, unit=st.sampled_from(["month", "quarter", "year"]))
@with_pinned(unit="quarter")
def test_last_this_and_next_month_quarter_year_tile(now, week_start, unit):
    ctx = ctx_for(now, week_start)
    tz = ctx.zone
    last, this, nxt = (assert_day_period(only(f"{w} {unit}", ctx), tz) for w in ("last", "this", "next"))
    assert utc(last[1]) == utc(this[0]) and utc(this[1]) == utc(nxt[0])
    assert utc(this[0]) <= utc(now) < utc(this[1])
    size = {"month": 1, "quarter": 3, "year": 12}[unit]
    for start, end in (last, this, nxt):
        assert start.day == 1 and (start.month - 1) % size == 0
        assert end.date() == start.date() + relativedelta(months=size)


# --- "N units ago" / "in N units" --------------------------------------------------------------


def _target(now: datetime, unit: str, n: int) -> datetime:
    """``now`` moved by n units: elapsed time for minutes and hours, the wall clock by
    relativedelta for days and longer."""
    if unit in ELAPSED:
        return utc(now) + n * ELAPSED[unit]
    from nlnorm.model import Grain

    return utc(relativedelta_oracle(now, Grain(unit), n))


def _delta(unit: str, n: int) -> relativedelta:
    if unit == "quarter":
        return relativedelta(months=3 * n)
    return relativedelta(**{f"{unit}s": n})


def assert_holds(m: Mention, start: datetime, end: datetime, now: datetime, unit: str, n: int) -> None:
    """The interval is the unit containing now + n units: the instant (UTC arithmetic) for
    minutes and hours; the local date moved by relativedelta for days and longer, as
    "yesterday" moves the date (so a day the zone skipped still counts, and is empty)."""
    if unit in ELAPSED:
        assert utc(start) <= _target(now, unit, n) < utc(end)
        return
    day = now.date() + _delta(unit, n)
    if utc(start) == utc(end):
        assert m.value == day.isoformat()
    else:
        assert start.date() <= day < end.date()


@SETTINGS
@given(now=moments, week_start=week_starts, unit=units, n=counts)
@with_pinned(unit="hour", n=1)
def test_n_units_ago_is_the_unit_containing_now_minus_n_and_lies_before_now(now, week_start, unit, n):
    ctx = ctx_for(now, week_start)
    m = only(phrase(n, unit, "{n} {unit} ago"), ctx)
    tz = ctx.zone
    start, end = bounds(m, tz) if unit in ELAPSED else assert_day_period(m, tz)
    assert utc(end) <= utc(now)
    assert_holds(m, start, end, now, unit, -n)


@SETTINGS
@given(now=moments, week_start=week_starts, unit=units, n=counts)
@with_pinned(unit="hour", n=1)
def test_in_n_units_is_the_unit_containing_now_plus_n_and_lies_after_now(now, week_start, unit, n):
    ctx = ctx_for(now, week_start)
    m = only(phrase(n, unit, "in {n} {unit}"), ctx)
    tz = ctx.zone
    start, end = bounds(m, tz) if unit in ELAPSED else assert_day_period(m, tz)
    assert utc(start) > utc(now)
    assert_holds(m, start, end, now, unit, n)


# --- rolling windows --------------------------------------------------------------------------


@SETTINGS
@given(now=moments, week_start=week_starts,
       unit=st.sampled_from(["minute", "hour", "day", "week", "month", "year"]), n=counts)
@with_pinned(unit="day", n=1)
def test_the_past_n_units_ends_now_and_starts_where_relativedelta_or_utc_says(now, week_start, unit, n):
    ctx = ctx_for(now, week_start)
    m = only(phrase(n, unit, "the past {n} {unit}"), ctx)
    start, end = bounds(m, ctx.zone)
    assert utc(end) == utc(now)
    assert utc(start) == _target(now, unit, -n)
    assert utc(start) < utc(end)


# --- boundaries of every phrase ---------------------------------------------------------------

DAY_PHRASES = (
    "today", "yesterday", "tomorrow", "this week", "last week", "next week", "this month",
    "last month", "this quarter", "next quarter", "this year", "last year", "2 days ago",
    "in 3 weeks", "last Monday", "next Friday", "this Sunday", "this weekend", "last weekend",
)
SUBDAY_PHRASES = ("this hour", "last hour", "next hour", "3 hours ago", "in 2 hours", "5 minutes ago", "in 10 minutes")


@SETTINGS
@given(now=moments, week_start=week_starts, text=st.sampled_from(DAY_PHRASES + SUBDAY_PHRASES))
@with_pinned(text="this week")
def test_every_bound_exists_in_the_zone_and_starts_its_unit(now, week_start, text):
    ctx = ctx_for(now, week_start)
    m = only(text, ctx)
    tz = ctx.zone
    if text in DAY_PHRASES:
        assert_day_period(m, tz)
        return
    start, end = bounds(m, tz)
    assert utc(start) < utc(end) <= utc(start) + timedelta(hours=1)
    for b in (start, end):
        whole = b.minute == 0 if "hour" in text else True
        assert (b.second == 0 and b.microsecond == 0 and whole) or (
            (utc(b) - timedelta(seconds=1)).astimezone(tz).utcoffset() != b.utcoffset()
        ), (text, b.isoformat())


# --- mention text and spans ---------------------------------------------------------------------

PREFIXES = (
    "", "show bugs created ", "ﬁxed İstanbul tickets ", "Straße: ", "naïve query ",
    "日本語のチケット ", "ΣΊΣΥΦΟΣ said ", "ǅ ", "𝔅𝔲𝔤𝔰 ", "İİİ ", "open ﬀ issues ",
)
SUFFIXES = ("", "?", " please", " — ﬁnished?", " İİ", " ß", " 😀", " ﬃ.", " ΐ", "»")
PHRASES = (
    "last week", "this quarter", "yesterday", "in 3 days", "2 weeks ago", "the past 10 hours",
    "in ３ days", "２ weeks ago", "the past １０ hours", "LAST WEEK", "Next Month", "2026-W53",
    "２０２６-W53", "week 53 of 2026", "between 1 March and 15 April 2026", "since last week",
    "the ﬁrst quarter of 2026", "this morning", "tonight", "3 hr. ago", "last qtr.",
)


@SETTINGS
@given(now=moments, week_start=week_starts, prefix=st.sampled_from(PREFIXES),
       text=st.sampled_from(PHRASES), suffix=st.sampled_from(SUFFIXES))
@with_pinned(prefix="ﬁxed İstanbul tickets ", text="in ３ days", suffix=" İİ")
def test_mention_text_is_the_slice_of_the_question_it_came_from(now, week_start, prefix, text, suffix):
    question = prefix + text + suffix
    result = normalize(question, ctx_for(now, week_start))
    for m in result.mentions:
        assert m.text == question[m.char_start:m.char_end]
    spans = [(m.char_start, m.char_end) for m in result.mentions]
    assert (len(prefix), len(prefix) + len(text)) in spans, (question, spans)


FILLERS = (" and ", " or ", ", ", " but not ", " then closed ", " ﬁled ", " İ ", " 3 points ")


@SETTINGS
@given(now=moments, week_start=week_starts,
       parts=st.lists(st.tuples(st.sampled_from(FILLERS), st.sampled_from(PHRASES)), min_size=1, max_size=4))
@with_pinned(parts=[(" and ", "last week"), (", ", "in ３ days")])
def test_mentions_are_in_order_do_not_overlap_and_slice_the_question(now, week_start, parts):
    question = "bugs" + "".join(f + p for f, p in parts)
    result = normalize(question, ctx_for(now, week_start))
    previous_end = 0
    for m in result.mentions:
        assert m.text == question[m.char_start:m.char_end]
        assert 0 <= m.char_start < m.char_end <= len(question)
        assert m.char_start >= previous_end
        previous_end = m.char_end
        if m.kind == "range" and m.start is not None and m.end is not None:
            assert datetime.fromisoformat(m.start) <= datetime.fromisoformat(m.end)


@SETTINGS
@given(now=moments, week_start=week_starts,
       parts=st.lists(st.tuples(st.sampled_from(FILLERS), st.sampled_from(PHRASES)), min_size=1, max_size=3))
@with_pinned(parts=[(" and ", "this week")])
def test_equal_inputs_give_identical_results(now, week_start, parts):
    question = "tickets" + "".join(f + p for f, p in parts)
    first = normalize(question, ctx_for(now, week_start)).model_dump()
    again = normalize(str(question), Context(now=now.isoformat(), tz=now.tzinfo.key, week_start=week_start))
    assert first == again.model_dump()
    assert first == normalize(question, ctx_for(now, week_start)).model_dump()
