"""Checked against: Unicode CLDR 49 via babel 2.19 — the English relative date fields
(``Locale('en')._data['date_fields']``: "last week", "next qtr.", "yesterday", "now"...), their
past/future patterns per plural category ("{0} days ago", "in {0} hr."), and English plural
rules (``Locale('en').plural_form``), which choose the numbers each plural pattern is filled
with. Expected intervals come from the standard library (``date``, ``timedelta``, ``zoneinfo``)
and python-dateutil's ``relativedelta``.

CLDR says what a phrase names ("last week" = the week before this one, "in {0} days" = N days
from now, "{0} hr. ago" = N hours before now) but not the calendar rule for a weekday: that
"last Sunday" is the nearest Sunday before today, "next Sunday" the nearest after it and
"this Sunday" the Sunday of the current week is common practice (the project's readings
R14-R16 for English). That "in {0} days" is the whole day containing now + N days is the
project's reading R4, likewise common practice.
"""

from __future__ import annotations

from datetime import date, datetime, timedelta, timezone
from zoneinfo import ZoneInfo

import pytest
from babel import Locale
from dateutil.relativedelta import relativedelta

from nlnorm import Context, Mention, cldr, normalize

UTC = timezone.utc
EN = Locale("en")
DATE_FIELDS = EN._data["date_fields"]
GRAINS = ("year", "quarter", "month", "week", "day", "hour", "minute", "second")
WEEKDAYS = ("mon", "tue", "wed", "thu", "fri", "sat", "sun")  # date.weekday() order
#: Keys of CLDR date fields that are not points in time a question asks about relative to now
#: (an era, a time zone, "day of year"...): they carry no relative phrases in English.
NOT_RELATIVE = ("era", "dayOfYear", "dayperiod", "weekOfMonth", "weekday", "weekdayOfMonth", "zone")
SAMPLE_NUMBERS = (0, 1, 2, 3, 5, 11, 21, 100, 101)

#: Fixed clocks: (now, week start). A Wednesday morning; a Sunday late evening; 15 minutes
#: into a new year in another zone.
CLOCKS = (
    (datetime(2026, 12, 2, 10, 0, tzinfo=ZoneInfo("Europe/Berlin")), "monday"),
    (datetime(2026, 12, 6, 23, 30, tzinfo=ZoneInfo("Europe/Berlin")), "sunday"),
    (datetime(2027, 1, 1, 0, 15, tzinfo=ZoneInfo("America/New_York")), "saturday"),
)
QUESTION = "show bugs created {}"
WS = {"monday": 0, "sunday": 6, "saturday": 5}


def _base(key: str) -> tuple[str, str]:
    base, _, width = key.partition("-")
    return base, width


def _entries():
    for key in sorted(DATE_FIELDS):
        base, width = _base(key)
        yield key, base, width, DATE_FIELDS[key]


def _narrow_weekday(base: str, width: str) -> bool:
    return base in WEEKDAYS and width == "narrow"


def relative_cases():
    for key, base, width, entry in _entries():
        if _narrow_weekday(base, width):
            continue
        for offset, text in sorted((entry.get("relative") or {}).items()):
            yield pytest.param(base, width, int(offset), str(text), id=f"{key}:{offset}:{text}")


def pattern_cases():
    for key, base, width, entry in _entries():
        if _narrow_weekday(base, width):
            continue
        for direction, sign in (("past", -1), ("future", 1)):
            for plural, pattern in sorted((entry.get(direction) or {}).items()):
                numbers = [n for n in SAMPLE_NUMBERS if EN.plural_form(n) == plural]
                if base in WEEKDAYS:
                    numbers = [n for n in numbers if n > 0]  # "in 0 Sundays" names no day
                for n in numbers:
                    phrase = str(pattern).replace("{0}", str(n))
                    yield pytest.param(base, width, sign * n, phrase, id=f"{key}:{direction}:{plural}:{phrase}")


# --- expected intervals, from the standard library ------------------------------------------


def midnight(d: date, tz: ZoneInfo) -> datetime:
    return datetime(d.year, d.month, d.day, tzinfo=tz)


def calendar_period(day: date, grain: str, week_start: str) -> tuple[date, date]:
    """The local dates [first, end) of the calendar ``grain`` containing ``day``."""
    if grain == "day":
        return day, day + timedelta(days=1)
    if grain == "week":
        first = day - timedelta(days=(day.weekday() - WS[week_start]) % 7)
        return first, first + timedelta(days=7)
    months = {"month": 1, "quarter": 3, "year": 12}[grain]
    first = date(day.year, (day.month - 1) // months * months + 1, 1)
    return first, first + relativedelta(months=months)


def moved(day: date, grain: str, n: int) -> date:
    if grain == "quarter":
        return day + relativedelta(months=3 * n)
    return day + relativedelta(**{f"{grain}s": n})


def wall_unit(instant: datetime, grain: str, tz: ZoneInfo) -> tuple[datetime, datetime]:
    """The hour, minute or second containing ``instant`` (no offset change near these clocks)."""
    wall = instant.astimezone(tz)
    size = {"hour": timedelta(hours=1), "minute": timedelta(minutes=1), "second": timedelta(seconds=1)}[grain]
    floor = wall.replace(microsecond=0)
    if grain in ("hour", "minute"):
        floor = floor.replace(second=0)
    if grain == "hour":
        floor = floor.replace(minute=0)
    return floor, floor + size


def expected_relative(now: datetime, week_start: str, field: str, offset: int) -> tuple[datetime, datetime]:
    tz = now.tzinfo
    assert isinstance(tz, ZoneInfo)
    if field in ("hour", "minute", "second"):
        assert offset == 0  # English CLDR has only "this hour", "this minute", "now"
        return wall_unit(now, field, tz)
    if field in WEEKDAYS:
        wd = WEEKDAYS.index(field)
        today = now.date()
        if offset < 0:
            day = today - timedelta(days=((today.weekday() - wd) % 7) or 7)
        elif offset > 0:
            day = today + timedelta(days=((wd - today.weekday()) % 7) or 7)
        else:
            first, _ = calendar_period(today, "week", week_start)
            day = first + timedelta(days=(wd - WS[week_start]) % 7)
        return midnight(day, tz), midnight(day + timedelta(days=1), tz)
    first, _ = calendar_period(now.date(), field, week_start)
    first, end = calendar_period(moved(first, field, offset), field, week_start)
    return midnight(first, tz), midnight(end, tz)


def expected_pattern(now: datetime, week_start: str, field: str, n: int) -> tuple[datetime, datetime]:
    tz = now.tzinfo
    assert isinstance(tz, ZoneInfo)
    if field in ("hour", "minute", "second"):
        step = {"hour": timedelta(hours=1), "minute": timedelta(minutes=1), "second": timedelta(seconds=1)}[field]
        return wall_unit(now.astimezone(UTC) + n * step, field, tz)
    if field in WEEKDAYS:
        wd = WEEKDAYS.index(field)
        today = now.date()
        if n > 0:  # the n-th such weekday after today
            day = today + timedelta(days=((wd - today.weekday()) % 7) or 7) + timedelta(weeks=n - 1)
        else:  # the n-th such weekday before today
            day = today - timedelta(days=((today.weekday() - wd) % 7) or 7) - timedelta(weeks=-n - 1)
        return midnight(day, tz), midnight(day + timedelta(days=1), tz)
    first, end = calendar_period(moved(now.date(), field, n), field, week_start)
    return midnight(first, tz), midnight(end, tz)


def mention_of(question: str, phrase: str, ctx: Context) -> Mention:
    result = normalize(question, ctx)
    at = question.index(phrase)
    found = [m for m in result.mentions if (m.char_start, m.char_end) == (at, at + len(phrase))]
    assert found, (question, [(m.text, m.char_start, m.char_end) for m in result.mentions])
    return found[0]


def interval(m: Mention) -> tuple[datetime, datetime]:
    assert m.start is not None and m.end is not None
    return datetime.fromisoformat(m.start), datetime.fromisoformat(m.end)


# --- the reader of nlnorm.cldr returns every English field of babel ---------------------------


def test_every_english_date_field_key_is_a_grain_a_weekday_or_not_relative():
    for key, base, _width, entry in _entries():
        has_relative = any(entry.get(k) for k in ("relative", "past", "future"))
        assert base in GRAINS or base in WEEKDAYS or (base in NOT_RELATIVE and not has_relative), key


def test_relative_fields_of_nlnorm_cldr_are_the_babel_ones():
    from_babel = {
        (str(text), base, int(offset), width)
        for _key, base, width, entry in _entries()
        if base in GRAINS or base in WEEKDAYS
        for offset, text in (entry.get("relative") or {}).items()
    }
    ours = {(f.text, f.field, f.offset, f.width) for f in cldr.relative_fields("en")}
    assert ours == from_babel
    assert len(from_babel) > 100


def test_relative_patterns_of_nlnorm_cldr_are_the_babel_ones():
    from_babel = {
        (str(pattern), base, sign, plural, width)
        for _key, base, width, entry in _entries()
        if base in GRAINS or base in WEEKDAYS
        for direction, sign in (("past", -1), ("future", 1))
        for plural, pattern in (entry.get(direction) or {}).items()
    }
    ours = {(p.pattern, p.field, p.sign, p.plural, p.width) for p in cldr.relative_patterns("en")}
    assert ours == from_babel
    assert {p for *_, p, _w in from_babel} == {"one", "other"}  # English plural categories


# --- every relative field means what CLDR says -----------------------------------------------


@pytest.mark.parametrize(("field", "width", "offset", "text"), list(relative_cases()))
def test_cldr_relative_field_resolves_to_its_meaning(field, width, offset, text):
    for now, week_start in CLOCKS:
        ctx = Context(now=now, week_start=week_start)
        for question in (text, QUESTION.format(text)):
            m = mention_of(question, text, ctx)
            assert m.text == text
            if field == "second":
                assert (m.kind, m.start, m.end) == ("instant", m.start, m.start)
                assert datetime.fromisoformat(m.start) == now
                continue
            assert m.kind == "range"
            assert interval(m) == expected_relative(now, week_start, field, offset), (question, now)


def narrow_weekday_phrases() -> list[str]:
    out = set()
    for _key, base, width, entry in _entries():
        if _narrow_weekday(base, width):
            out.update(str(t) for t in (entry.get("relative") or {}).values())
            for direction in ("past", "future"):
                out.update(str(p).replace("{0}", "3") for p in (entry.get(direction) or {}).values())
    return sorted(out)


@pytest.mark.parametrize("text", narrow_weekday_phrases())
def test_narrow_weekday_fields_and_patterns_are_not_read_as_weekdays(text):
    """CLDR's narrow weekday fields ("last Su", "this M", "in 3 Tu") are one or two letters: in
    running text they are not weekdays (a documented choice of
    nlnorm.scanning.scanner.cldr_forms)."""
    now, week_start = CLOCKS[0]
    result = normalize(QUESTION.format(text), Context(now=now, week_start=week_start))
    assert all(m.grain != "day" for m in result.mentions), [(m.text, m.value) for m in result.mentions]


# --- every past/future pattern, per plural, means what CLDR says ------------------------------


@pytest.mark.parametrize(("field", "width", "n", "phrase"), list(pattern_cases()))
def test_cldr_pattern_filled_per_plural_rule_resolves_to_its_meaning(field, width, n, phrase):
    for now, week_start in CLOCKS:
        ctx = Context(now=now, week_start=week_start)
        for question in (phrase, QUESTION.format(phrase)):
            m = mention_of(question, phrase, ctx)
            assert m.text == phrase and m.kind == "range"
            assert interval(m) == expected_pattern(now, week_start, field, n), (question, now)


def test_last_week_is_the_week_before_this_week_and_now_is_the_instant():
    now, week_start = CLOCKS[0]
    ctx = Context(now=now, week_start=week_start)
    last, this = mention_of("last week", "last week", ctx), mention_of("this week", "this week", ctx)
    assert interval(last)[1] == interval(this)[0]
    assert interval(this)[1] - interval(this)[0] == timedelta(days=7)
    assert (last.value, this.value) == ("2026-W48", "2026-W49")
    m = mention_of("now", "now", ctx)
    assert m.kind == "instant" and m.start == m.end == "2026-12-02T10:00:00+01:00"
