"""Every deep language reads every CLDR relative date field and past/future pattern of its own
locale as CLDR means it, alone and inside a short question in that language.

Checked against: Unicode CLDR 49 via babel 2.19 — each language's relative date fields
("last week", "на прошлой неделе", "上周"), past/future patterns per plural category, and its
plural rules (``babel.Locale.plural_form``), which choose the numbers each pattern is filled
with. Expected intervals come from the standard library and python-dateutil's relativedelta.
The calendar rule for a weekday field ("last Monday") follows the language's
``weekday_reading`` in its locale file: the nearest such day (R14/R15) or that day of the
week before/after (R16) — common practice of the language's speakers, stated in the file.
A weekday field whose text names the week itself (Dutch "volgende week maandag", "Monday of
next week") is that day of that week, whatever the setting: the week word is one of the
language's ``[units] week`` forms.
The short question around each phrase is the locale file's ``carrier``.
"""

from __future__ import annotations

from datetime import date, datetime, timedelta, timezone
from zoneinfo import ZoneInfo

import pytest
from babel import Locale
from dateutil.relativedelta import relativedelta

from nlnorm import Context, Mention, normalize
from nlnorm.locale import available_languages, load_locale
from nlnorm.scanning.scanner import cldr_forms

UTC = timezone.utc
WEEKDAYS = ("mon", "tue", "wed", "thu", "fri", "sat", "sun")
SAMPLE_NUMBERS = (1, 2, 3, 5, 11, 21, 22, 25, 100, 101)
NOW = datetime(2026, 12, 2, 10, 0, tzinfo=ZoneInfo("Europe/Berlin"))  # a Wednesday
WS = 0  # Monday


def languages() -> list[str]:
    return sorted(available_languages())


def cases():
    for lang in languages():
        loc = Locale.parse(lang)
        for source, reading, fixed in cldr_forms(lang):
            slots = dict(fixed)
            if "{num}" in source:
                # The plural category each generated form came from is not kept; fill every
                # form with numbers of every category and keep the phrases CLDR itself writes.
                for n in SAMPLE_NUMBERS:
                    yield pytest.param(lang, source.replace("{num}", str(n)), reading, slots, n,
                                       id=f"{lang}:{source}:{n}")
            else:
                yield pytest.param(lang, source, reading, slots, None, id=f"{lang}:{source}")
        del loc


def _plural_ok(lang: str, source: str, n: int) -> bool:
    """Whether CLDR writes ``source`` with ``n`` (the pattern of n's plural category)."""
    from nlnorm import cldr

    loc = Locale.parse(lang)
    category = loc.plural_form(n)
    for p in cldr.relative_patterns(lang):
        if p.pattern.lower().strip().replace("{0}", "{num}") == source and p.plural == category:
            return True
    return False


def midnight(d: date) -> datetime:
    return datetime(d.year, d.month, d.day, tzinfo=NOW.tzinfo)


def calendar_period(day: date, grain: str) -> tuple[date, date]:
    if grain == "day":
        return day, day + timedelta(days=1)
    if grain == "week":
        first = day - timedelta(days=(day.weekday() - WS) % 7)
        return first, first + timedelta(days=7)
    months = {"month": 1, "quarter": 3, "year": 12}[grain]
    first = date(day.year, (day.month - 1) // months * months + 1, 1)
    return first, first + relativedelta(months=months)


def moved(day: date, grain: str, n: int) -> date:
    if grain == "quarter":
        return day + relativedelta(months=3 * n)
    return day + relativedelta(**{f"{grain}s": n})


def wall_unit(instant: datetime, grain: str) -> tuple[datetime, datetime]:
    wall = instant.astimezone(NOW.tzinfo)
    size = {"hour": timedelta(hours=1), "minute": timedelta(minutes=1), "second": timedelta(seconds=1)}[grain]
    floor = wall.replace(microsecond=0)
    if grain in ("hour", "minute"):
        floor = floor.replace(second=0)
    if grain == "hour":
        floor = floor.replace(minute=0)
    return floor, floor + size


def expected(lang: str, reading: str, slots: dict, n: int | None,
             phrase: str = "") -> tuple[datetime, datetime] | str:
    today = NOW.date()
    if reading == "NOW":
        return "now"
    if "relday" in slots:
        d = today + timedelta(days=int(slots["relday"]))
        return midnight(d), midnight(d + timedelta(days=1))
    if "weekday" in slots:  # last / this / next <weekday>
        wd, offset = int(slots["weekday"]), int(slots["offset"])
        week_reading = load_locale(lang).meta.weekday_reading
        week_words = {w.lower() for w in load_locale(lang).units.get("week", ())}
        names_week = bool(week_words & set(phrase.lower().split()))
        first, _ = calendar_period(today, "week")
        if offset == 0 or week_reading == "week" or names_week:
            d = first + timedelta(days=7 * offset + (wd - WS) % 7)
        elif offset < 0:
            d = today - timedelta(days=((today.weekday() - wd) % 7) or 7)
        else:
            d = today + timedelta(days=((wd - today.weekday()) % 7) or 7)
        return midnight(d), midnight(d + timedelta(days=1))
    if "count_weekday" in slots:
        wd, sign = int(slots["count_weekday"]), int(slots["sign"])
        assert n is not None
        if sign > 0:
            d = today + timedelta(days=((wd - today.weekday()) % 7) or 7) + timedelta(weeks=n - 1)
        else:
            d = today - timedelta(days=((today.weekday() - wd) % 7) or 7) - timedelta(weeks=n - 1)
        return midnight(d), midnight(d + timedelta(days=1))
    grain = str(slots["unit"])
    if "dir" in slots:  # "last week"
        offset = int(slots["dir"])
        if grain in ("hour", "minute", "second"):
            start, _ = wall_unit(NOW + {"hour": timedelta(hours=offset), "minute": timedelta(minutes=offset),
                                        "second": timedelta(seconds=offset)}[grain], grain)
            return wall_unit(start, grain)
        first, _ = calendar_period(today, grain)
        first, end = calendar_period(moved(first, grain, offset), grain)
        return midnight(first), midnight(end)
    sign = int(slots["sign"])
    assert n is not None
    if grain in ("hour", "minute", "second"):
        step = {"hour": timedelta(hours=1), "minute": timedelta(minutes=1), "second": timedelta(seconds=1)}[grain]
        return wall_unit(NOW.astimezone(UTC) + sign * n * step, grain)
    first, end = calendar_period(moved(today, grain, sign * n), grain)
    return midnight(first), midnight(end)


def mention_of(question: str, phrase: str, ctx: Context) -> Mention:
    result = normalize(question, ctx)
    at = question.lower().index(phrase.lower())
    found = [m for m in result.mentions if m.char_start <= at and m.char_end >= at + len(phrase)]
    assert found, (question, [(m.text, m.char_start, m.char_end) for m in result.mentions])
    return found[0]


PASSED: dict[str, list[int]] = {}


@pytest.mark.parametrize(("lang", "phrase", "reading", "slots", "n"), list(cases()))
def test_cldr_phrase_of_the_language_means_what_cldr_says(lang, phrase, reading, slots, n):
    if n is not None and not _plural_ok(lang, phrase.replace(str(n), "{num}", 1), n):
        pytest.skip("CLDR writes another plural form for this number")
    carrier = load_locale(lang).meta.carrier or "{}"
    ctx = Context(now=NOW, week_start="monday", languages=[lang])
    want = expected(lang, reading, slots, n, phrase)
    for question in (phrase, carrier.format(phrase)):
        m = mention_of(question, phrase, ctx)
        if want == "now":
            assert m.kind == "instant" and datetime.fromisoformat(m.start) == NOW
            continue
        got = (datetime.fromisoformat(m.start), datetime.fromisoformat(m.end))
        assert got == want, (lang, question, m.reading, m.note)
