"""Oracles and table helpers shared by the Russian, Polish and Ukrainian tests
(tests/locales/test_ru.py, test_pl.py, test_uk.py).

Every expected bound is computed here or in tests/resolution/test_readings_en.py, never typed
in:
- python-dateutil ``relativedelta``: weekday steps, day, week, month and year arithmetic;
- CLDR 49 via babel 2.19: each language's day-period rules (``Locale.day_period_rules``), its
  territory's week data (``Locale.first_week_day``, ``weekend_start``/``weekend_end``) and the
  order of its numeric dates (``babel.dates.get_date_format("short")``);
- the IANA tz database via stdlib zoneinfo + tzdata.
"""

from __future__ import annotations

from datetime import date, datetime
from typing import Any
from zoneinfo import ZoneInfo

import pytest
from babel import Locale
from dateutil.relativedelta import FR, MO, SA, SU, TH, TU, WE, relativedelta

from nlnorm import Context, Mention, Result, normalize
from tests.helpers import BERLIN, NOW
from tests.resolution.test_readings_en import iso, midnight, numeric_order, span, week

D = relativedelta
#: relativedelta weekdays in ``date.weekday()`` order, so babel's 0 = Monday indexes them.
WEEKDAYS = (MO, TU, WE, TH, FR, SA, SU)
PARAMS = ("question", "phrase", "reading", "bounds", "value", "alts", "context")

# --- clocks (fixed; NOW is Wednesday 2026-12-02 10:00 in Berlin) ------------------------------
SATURDAY = datetime(2026, 12, 5, 10, 0, tzinfo=BERLIN)
SUNDAY = datetime(2026, 12, 6, 10, 0, tzinfo=BERLIN)
MONDAY_AFTER = datetime(2026, 12, 7, 10, 0, tzinfo=BERLIN)
MONTH_END = datetime(2026, 3, 31, 10, 0, tzinfo=BERLIN)
JANUARY_END = datetime(2026, 1, 31, 10, 0, tzinfo=BERLIN)
LEAP_DAY = datetime(2028, 2, 29, 10, 0, tzinfo=BERLIN)
MID_JANUARY = datetime(2027, 1, 15, 10, 0, tzinfo=BERLIN)
BEFORE_LEAP_DAY = datetime(2027, 2, 1, 10, 0, tzinfo=BERLIN)
#: Berlin clocks went 02:00 -> 03:00 on 2026-03-29 (tzdata).
SPRING_BERLIN = datetime(2026, 3, 29, 12, 0, tzinfo=BERLIN)
#: Not on a whole hour, so a rolling window and whole hours differ.
QUARTER_PAST = datetime(2026, 12, 2, 10, 17, tzinfo=BERLIN)

CAL = "window_reading=calendar"
ROLL = "window_reading=rolling"
FUT = "bias=future"
PAST = "bias=past"
WEEK = "weekday_reading=week"
NEAREST = "weekday_reading=nearest"


# --- CLDR facts of a locale -------------------------------------------------------------------


def period(locale: str, d: date, pid: str, tz: ZoneInfo = BERLIN) -> tuple[str, str]:
    """CLDR day period ``pid`` of local date ``d`` in ``locale``, from babel's
    ``Locale.day_period_rules``; a rule whose end is not after its start (a night such as
    22:00-04:00) ends on the next day."""
    rule = Locale.parse(locale).day_period_rules[None][pid][0]
    start = midnight(d, tz) + D(seconds=rule["from"])
    end_day = d if rule["before"] > rule["from"] else d + D(days=1)
    return iso(start), iso(midnight(end_day, tz) + D(seconds=rule["before"]))  # type: ignore[return-value]


def weekend_days(locale: str) -> tuple[Any, int]:
    """First weekend day and number of weekend days of the locale's territory (CLDR)."""
    loc = Locale.parse(locale)
    return WEEKDAYS[loc.weekend_start], (loc.weekend_end - loc.weekend_start) % 7 + 1


def weekend(locale: str, first: date) -> tuple[str, str]:
    return span(first, first + D(days=weekend_days(locale)[1]))


def weekend_value(locale: str, first: date) -> str:
    return f"{first.isoformat()}/P{weekend_days(locale)[1]}D"


def last_ended_weekend(locale: str, today: date) -> date:
    """The latest weekend that ended by today's start."""
    first, length = weekend_days(locale)
    return today + D(days=-length, weekday=first(-1))


def first_open_weekend(locale: str, today: date) -> date:
    """The weekend holding today, else the coming one."""
    first, length = weekend_days(locale)
    return today + D(days=-(length - 1), weekday=first(+1))


def first_weekday(locale: str) -> Any:
    return WEEKDAYS[Locale.parse(locale).first_week_day]


def locale_week(locale: str, d: date) -> tuple[str, str]:
    """The week holding ``d``, starting on the CLDR first day of the week of the locale."""
    return week(d, first_weekday(locale))


def read_numeric(locale: str, a: int, b: int, y: int) -> date:
    """``a.b.y`` read in the CLDR order of ``locale``."""
    return date(y, a, b) if numeric_order(locale) == "MD" else date(y, b, a)


def other_order_policy(locale: str) -> str:
    return {"MD": "date_order=DMY", "DM": "date_order=MDY"}[numeric_order(locale)]


# --- running questions ------------------------------------------------------------------------


def case(id: str, question: str, phrase: str, reading: str, bounds: tuple[str | None, str | None],
         value: str | None = None, alts: tuple = (), **context: Any) -> Any:
    return pytest.param(question, phrase, reading, bounds, value, alts, context, id=id)


class Runner:
    """Normalizes questions of one language in its own locale (numeric order, week data)."""

    def __init__(self, lang: str, locale: str) -> None:
        self.lang = lang
        self.locale = locale

    def run(self, question: str, **context: Any) -> Result:
        now = context.pop("now", NOW)
        fields = {"languages": (self.lang,), "locale": self.locale, **context}
        if "tz" not in fields:
            fields["tz"] = str(now.tzinfo)
        return normalize(question, Context.at(now, **fields))

    def one(self, question: str, **context: Any) -> Mention:
        result = self.run(question, **context)
        assert len(result.mentions) == 1, (question, [m.text for m in result.mentions])
        return result.mentions[0]

    def check(self, question, phrase, reading, bounds, value, alts, context) -> None:  # type: ignore[no-untyped-def]
        m = self.one(question, **context)
        assert m.text == phrase
        assert m.lang in (self.lang, "und")
        assert m.reading == reading
        assert (m.start, m.end) == bounds
        if value is not None:
            assert m.value == value
        assert tuple((a.reading, a.policy, a.start, a.end) for a in m.alternatives) == alts

    def check_among_every_language(self, question, phrase, reading, bounds, context) -> None:  # type: ignore[no-untyped-def]
        """The same phrase, reading and bounds with every deep language on (the default of
        ``Context.languages``), in this language's locale."""
        from nlnorm.locale import deep_languages

        m = self.one(question, **{**context, "languages": deep_languages()})
        assert (m.text, m.reading, (m.start, m.end)) == (phrase, reading, bounds)

    def alternatives_are_selected_by_their_policy(self, question: str, context: dict) -> None:
        m = self.one(question, **context)
        for a in m.alternatives:
            if a.policy is None:
                continue  # no setting selects it: the question has to be reworded
            key, _, setting = a.policy.partition("=")
            chosen = self.one(question, **{**context, key: setting})
            assert (chosen.start, chosen.end) == (a.start, a.end), a.policy

    def policy_flips(self, question: str, base: dict, setting: tuple[str, str, str]) -> None:
        """Applying the setting chooses the reading the default offered under it, and offers
        the old reading back under the old setting."""
        key, new, old = setting
        before = self.one(question, **base)
        after = self.one(question, **base, **{key: new})
        offered = [a for a in before.alternatives if a.policy == f"{key}={new}"]
        assert len(offered) == 1
        assert (after.start, after.end, after.reading) == (offered[0].start, offered[0].end, offered[0].reading)
        assert (after.start, after.end) != (before.start, before.end)
        back = [a for a in after.alternatives if a.policy == f"{key}={old}"]
        assert [(a.start, a.end, a.reading) for a in back] == [(before.start, before.end, before.reading)]


def all_cases(tables: dict[str, list[Any]]) -> list[Any]:
    return [pytest.param(*p.values, id=p.id) for table in tables.values() for p in table]


def check_tables(tables: dict[str, list[Any]], lang: str, deep: set[str]) -> None:
    """Every reading R1-R23 has a table: at least three rows, five for the ``deep`` readings,
    each id starting with its reading and language."""
    assert sorted(tables, key=lambda r: int(r[1:])) == [f"R{i}" for i in range(1, 24)]
    for rid, table in tables.items():
        assert len(table) >= (5 if rid in deep else 3), rid
        assert all(p.id.startswith(f"{rid}-{lang}-") for p in table), rid
