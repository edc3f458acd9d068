"""Checked against: Unicode CLDR day-period rules, weekend days and first day of the week, via
babel (``Locale.day_period_rules``, ``Locale.weekend_start``/``weekend_end``,
``Locale.first_week_day``); the CLDR version is the one ``babel.core.get_cldr_version()``
reports (49 with babel 2.19). Local times come from IANA tzdata via ``zoneinfo``.

The periods of "this morning", "yesterday afternoon", "tonight"... (reading R22) are CLDR's
English day periods morning1, afternoon1, evening1 and night1 on the named local day; the
weekend of "this weekend" (R23) is CLDR's weekend of the locale's territory; "this week" starts
on CLDR's first day of the week for the locale when no week start is given. That "this weekend"
on a weekday is the coming one and "last weekend" the most recent one that has ended is common
practice.
"""

from __future__ import annotations

from datetime import date, datetime, time, timedelta, timezone
from zoneinfo import ZoneInfo

import pytest
from babel import Locale
from babel.core import get_cldr_version

from nlnorm import Context, Mention, cldr, normalize

UTC = timezone.utc
BERLIN = ZoneInfo("Europe/Berlin")
CLDR_VERSION = str(get_cldr_version())
EN_RULES = {
    pid: (spans[0]["from"], spans[0]["before"])
    for pid, spans in Locale("en").day_period_rules[None].items()
    if spans and "from" in spans[0]
}
#: Wednesday 2 December 2026, 10:00 in Berlin; Sunday 6 December 2026, 23:30.
WEDNESDAY = datetime(2026, 12, 2, 10, 0, tzinfo=BERLIN)
SUNDAY = datetime(2026, 12, 6, 23, 30, tzinfo=BERLIN)


def only(text: str, ctx: Context) -> Mention:
    result = normalize(text, ctx)
    assert len(result.mentions) == 1, (text, [m.text for m in result.mentions])
    assert result.mentions[0].text == text
    return result.mentions[0]


def bounds(m: Mention) -> tuple[datetime, datetime]:
    assert m.start is not None and m.end is not None
    return datetime.fromisoformat(m.start), datetime.fromisoformat(m.end)


def wall(day: date, seconds: int, tz: ZoneInfo) -> datetime:
    """The instant ``seconds`` after the start of the wall-clock day (no DST change on these days)."""
    naive = datetime.combine(day, time()) + timedelta(seconds=seconds)
    return naive.replace(tzinfo=tz)


def period_of(day: date, pid: str, tz: ZoneInfo) -> tuple[datetime, datetime]:
    start_s, before_s = EN_RULES[pid]
    end_day = day if before_s > start_s else day + timedelta(days=1)  # a rule may wrap midnight
    return wall(day, start_s, tz), wall(end_day, before_s, tz)


# --- the CLDR data itself ---------------------------------------------------------------------


def test_nlnorm_reads_the_cldr_version_and_english_day_period_rules_babel_ships():
    assert cldr.cldr_version() == CLDR_VERSION
    assert {"morning1", "afternoon1", "evening1", "night1"} <= set(EN_RULES)
    assert cldr.day_period_rules("en") == EN_RULES
    # The rules of a locale cover the day without overlapping (CLDR day-period rules).
    spans = sorted(EN_RULES.values())
    assert spans[0][0] == 0 and spans[-1][1] == 86400
    assert all(a[1] == b[0] for a, b in zip(spans, spans[1:]))


# --- R22 day periods --------------------------------------------------------------------------


@pytest.mark.parametrize(
    ("text", "day_offset", "pid"),
    [
        ("this morning", 0, "morning1"),
        ("this afternoon", 0, "afternoon1"),
        ("this evening", 0, "evening1"),
        ("tonight", 0, "night1"),
        ("yesterday afternoon", -1, "afternoon1"),
        ("yesterday evening", -1, "evening1"),
        ("last night", -1, "night1"),
        ("tomorrow morning", 1, "morning1"),
        ("tomorrow night", 1, "night1"),
    ],
)
@pytest.mark.parametrize("now", [WEDNESDAY, SUNDAY], ids=["wednesday-10h", "sunday-23h30"])
def test_day_period_phrase_is_the_cldr_english_period_of_that_day(text, day_offset, pid, now):
    ctx = Context(now=now)
    for question in (text, f"which tickets were reopened {text}"):
        m = [x for x in normalize(question, ctx).mentions if x.text == text]
        assert len(m) == 1, question
        assert bounds(m[0]) == period_of(now.date() + timedelta(days=day_offset), pid, BERLIN)
        assert m[0].reading == "R22"
        assert f"CLDR {CLDR_VERSION}" in m[0].note and pid in m[0].note


def test_this_morning_on_a_dst_day_runs_on_the_wall_clock():
    # Berlin springs forward at 02:00 on 2026-03-29: the morning has 11 hours of elapsed time.
    now = datetime(2026, 3, 29, 9, 0, tzinfo=BERLIN)
    start, end = bounds(only("this morning", Context(now=now)))
    expected = period_of(date(2026, 3, 29), "morning1", BERLIN)
    assert (start, end) == expected
    assert start.utcoffset() == timedelta(hours=1) and end.utcoffset() == timedelta(hours=2)


def test_a_day_period_starting_at_a_skipped_midnight_starts_at_the_first_instant():
    # America/Santiago skipped 00:00-01:00 on 2024-09-08 (tzdata).
    tz = ZoneInfo("America/Santiago")
    start_s, _ = EN_RULES["morning1"]
    start, end = bounds(only("this morning", Context(now=datetime(2024, 9, 8, 9, 0, tzinfo=tz))))
    if start_s == 0:
        assert start.astimezone(tz).replace(tzinfo=None) == datetime(2024, 9, 8, 1, 0)
    else:
        assert start == wall(date(2024, 9, 8), start_s, tz)
    assert end == wall(date(2024, 9, 8), EN_RULES["morning1"][1], tz)


# --- R23 weekends -----------------------------------------------------------------------------


def weekend_of(locale: str) -> list[int]:
    """CLDR weekend days of the locale's territory, 0 = Monday, from weekend_start to _end."""
    loc = Locale.parse(locale)
    days = [int(loc.weekend_start)]
    while days[-1] != int(loc.weekend_end):
        days.append((days[-1] + 1) % 7)
    return days


def test_cldr_weekend_days_per_babel():
    assert weekend_of("en_US") == [5, 6]  # Saturday-Sunday
    assert weekend_of("en_IN") == [6]  # Sunday
    assert weekend_of("fa_IR") == [4]  # Friday
    for locale in ("en_US", "en_IN", "fa_IR", "en_GB", "de"):
        assert list(cldr.weekend_days(locale)) == weekend_of(locale)


def expected_weekends(today: date, days: list[int]) -> tuple[date, date]:
    """(this weekend, last weekend) as first days: the weekend holding today, else the coming
    one; and the most recent one that has ended before today."""
    this = None
    for back in range(len(days)):
        d = today - timedelta(days=back)
        if d.weekday() == days[0] and all(
            (d + timedelta(days=i)).weekday() == days[i] for i in range(len(days))
        ) and today < d + timedelta(days=len(days)):
            this = d
            break
    if this is None:
        this = today + timedelta(days=(days[0] - today.weekday()) % 7)
    return this, this - timedelta(days=7)


@pytest.mark.parametrize("locale", ["en_US", "en_IN", "fa_IR", "en_GB"])
@pytest.mark.parametrize("day", range(7), ids=["mon", "tue", "wed", "thu", "fri", "sat", "sun"])
def test_this_and_last_weekend_are_the_cldr_weekend_of_the_locale(locale, day):
    today = date(2026, 11, 30) + timedelta(days=day)  # 2026-11-30 is a Monday
    now = datetime.combine(today, time(12, 0)).replace(tzinfo=BERLIN)
    ctx = Context(now=now, locale=locale)
    days = weekend_of(locale)
    this, last = expected_weekends(today, days)
    for text, first in (("this weekend", this), ("last weekend", last)):
        m = only(text, ctx)
        start, end = bounds(m)
        assert start == datetime.combine(first, time()).replace(tzinfo=BERLIN), (text, locale, today)
        assert end == datetime.combine(first + timedelta(days=len(days)), time()).replace(tzinfo=BERLIN)
        assert [(first + timedelta(days=i)).weekday() for i in range(len(days))] == days
        assert m.value == f"{first.isoformat()}/P{len(days)}D"


# --- week starts from CLDR week data ----------------------------------------------------------


@pytest.mark.parametrize(("locale", "first_day"), [("en_US", 6), ("en_GB", 0), ("de", 0), ("pt_PT", 6)])
def test_this_week_starts_on_the_cldr_first_day_of_the_locale(locale, first_day):
    assert Locale.parse(locale).first_week_day == first_day  # per CLDR week data via babel
    for now in (WEDNESDAY, SUNDAY):
        ctx = Context(now=now, locale=locale)
        assert ctx.first_weekday == first_day
        start, end = bounds(only("this week", ctx))
        first = now.date() - timedelta(days=(now.weekday() - first_day) % 7)
        assert start == datetime.combine(first, time()).replace(tzinfo=BERLIN)
        assert end == datetime.combine(first + timedelta(days=7), time()).replace(tzinfo=BERLIN)
        assert start.weekday() == first_day


def test_an_explicit_week_start_overrides_the_locale():
    ctx = Context(now=WEDNESDAY, locale="en_US", week_start="monday")
    start, _ = bounds(only("this week", ctx))
    assert start == datetime(2026, 11, 30, tzinfo=BERLIN)
