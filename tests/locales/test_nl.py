"""Dutch: worked examples for every reading R1-R23 and D, the policies, numeric dates in the
CLDR order of ``nl``, questions mixing Dutch and English, and look-alike words (reading N).

Checked against:
- python-dateutil ``relativedelta``: weekday steps, day, week, month and year arithmetic with
  month-end clamping; stdlib ``calendar.monthrange``/``calendar.isleap``;
- ISO 8601 week dates via stdlib ``date.fromisocalendar`` (Dutch "week 48" is the ISO week);
- CLDR 49 via babel 2.19: Dutch day-period rules (``Locale("nl").day_period_rules``: ochtend
  06:00-12:00, middag 12:00-18:00, avond 18:00-24:00, nacht 00:00-06:00), the week data of the
  territory NL (``first_week_day``, ``weekend_start``/``weekend_end``) and the order of numeric
  dates (``babel.dates.get_date_format("short", locale="nl")``: dd-MM-y, day first; nl_BE
  d/MM/y);
- the IANA tz database via stdlib zoneinfo + tzdata: Amsterdam keeps the offsets and
  daylight-saving changes of Berlin, so the shared oracles' instants print the same;
- the questions and phrases are written from knowledge of the language (no published source);
- common practice (no published source): "afgelopen maandag" is the nearest Monday before
  today and "volgende week maandag" Monday of next week (locales/nl.toml); an article before
  the direction word ("de afgelopen week", "het afgelopen jaar") reads as English "the past
  week", a rolling window, while "afgelopen week" is the calendar week; "vannacht",
  "gisternacht" and "afgelopen nacht" are the night after yesterday evening; "tot" reads as
  English "until" (up to the end of the day named); "voor" before a date is "before", before
  a relative period it names that period ("voor morgen"); "om 3 uur" is a clock time.
"""

from __future__ import annotations

from datetime import date, datetime
from typing import Any
from zoneinfo import ZoneInfo

import pytest
from babel import Locale
from dateutil.relativedelta import FR, MO, SA, SU, TH, TU, WE, relativedelta

from nlnorm import Context, normalize
from nlnorm.locale import load_locale
from tests.helpers import BERLIN, NOW, TODAY
from tests.resolution.test_readings_en import (
    _cal_ahead,
    _cal_back,
    after,
    alt,
    before,
    day,
    elapsed,
    floor_hour,
    half,
    hour_of,
    in_week,
    iso,
    iso_week,
    iso_week_name,
    joined,
    leap_day,
    after_leap_day,
    midnight,
    month,
    month_of,
    most_recent_year,
    moved,
    next_year_after,
    numeric_order,
    on_or_after,
    on_or_before,
    quarter,
    quarter_of,
    since,
    span,
    strictly_after,
    strictly_before,
    until,
    wall,
    week,
    week_53_monday,
    week_start,
    year,
)

AMSTERDAM = ZoneInfo("Europe/Amsterdam")
BRUSSELS = ZoneInfo("Europe/Brussels")
D = relativedelta
WEEKDAYS = (MO, TU, WE, TH, FR, SA, SU)
LANGS = ("nl",)

# --- clocks (fixed; NOW is Wednesday 2026-12-02 10:00 in Berlin) ------------------------------
#: NOW in Amsterdam: Wednesday 2 December 2026, 10:00.
AMS_NOW = datetime(2026, 12, 2, 10, 0, tzinfo=AMSTERDAM)
SATURDAY = datetime(2026, 12, 5, 10, 0, tzinfo=AMSTERDAM)
SUNDAY = datetime(2026, 12, 6, 10, 0, tzinfo=AMSTERDAM)
MONDAY_AFTER = datetime(2026, 12, 7, 10, 0, tzinfo=AMSTERDAM)
MONTH_END = datetime(2026, 3, 31, 10, 0, tzinfo=AMSTERDAM)
JANUARY_END = datetime(2026, 1, 31, 10, 0, tzinfo=AMSTERDAM)
LEAP_DAY = datetime(2028, 2, 29, 10, 0, tzinfo=AMSTERDAM)
MID_JANUARY = datetime(2027, 1, 15, 10, 0, tzinfo=AMSTERDAM)
BEFORE_LEAP_DAY = datetime(2027, 2, 1, 10, 0, tzinfo=AMSTERDAM)
MARCH_FIRST = datetime(2026, 3, 1, 10, 0, tzinfo=AMSTERDAM)
#: Amsterdam clocks went 02:00 -> 03:00 on 2026-03-29 and 03:00 -> 02:00 on 2026-10-25 (tzdata).
SPRING = datetime(2026, 3, 29, 12, 0, tzinfo=AMSTERDAM)
MORNING_SPRING = datetime(2026, 3, 29, 9, 0, tzinfo=AMSTERDAM)
BEFORE_SPRING = datetime(2026, 3, 28, 12, 0, tzinfo=AMSTERDAM)
AUTUMN = datetime(2026, 10, 25, 12, 0, tzinfo=AMSTERDAM)
#: Not on a whole hour, so a rolling window and whole hours differ.
QUARTER_PAST = datetime(2026, 12, 2, 10, 17, tzinfo=AMSTERDAM)
#: Wednesday 2 December 2026, 10:00 in Brussels (nl_BE).
BRUSSELS_NOW = datetime(2026, 12, 2, 10, 0, tzinfo=BRUSSELS)

_NL = Locale.parse("nl")
_NL_RULES = _NL.day_period_rules[None]
_CAL = "window_reading=calendar"
_ROLL = "window_reading=rolling"
_FUT = "bias=future"
_PAST = "bias=past"
_WEEK = "weekday_reading=week"
_NEAREST = "weekday_reading=nearest"


# --- oracles for Dutch ------------------------------------------------------------------------


def period(d: date, pid: str, tz: ZoneInfo = BERLIN) -> tuple[str, str]:
    """CLDR 49 Dutch day period ``pid`` of local date ``d``, from babel's
    ``Locale("nl").day_period_rules`` (no Dutch period wraps midnight)."""
    rule = _NL_RULES[pid][0]
    start = midnight(d, tz) + D(seconds=rule["from"])
    return iso(start), iso(midnight(d, tz) + D(seconds=rule["before"]))  # type: ignore[return-value]


def nl_weekend() -> tuple[Any, int]:
    """First weekend day and number of weekend days of the territory NL (CLDR via babel)."""
    return WEEKDAYS[_NL.weekend_start], (_NL.weekend_end - _NL.weekend_start) % 7 + 1


def weekend(first: date) -> tuple[str, str]:
    return span(first, first + D(days=nl_weekend()[1]))


def weekend_value(first: date) -> str:
    return f"{first.isoformat()}/P{nl_weekend()[1]}D"


def last_ended_weekend(today: date) -> date:
    first, length = nl_weekend()
    return today + D(days=-length, weekday=first(-1))


def first_open_weekend(today: date) -> date:
    first, length = nl_weekend()
    return today + D(days=-(length - 1), weekday=first(+1))


_NL_FIRST = WEEKDAYS[_NL.first_week_day]


def nl_week(d: date) -> tuple[str, str]:
    """The week holding ``d``, starting on the CLDR first day of the week of NL."""
    return week(d, _NL_FIRST)


def read_nl(a: int, b: int, y: int) -> date:
    """``a-b-y`` read in the CLDR order of ``nl``."""
    return date(y, a, b) if numeric_order("nl") == "MD" else date(y, b, a)


def _past(first_day_in: Any, today: date = TODAY) -> int:
    return most_recent_year(first_day_in, today)


def _future(end_day_in: Any, today: date = TODAY) -> int:
    return next_year_after(end_day_in, today)


def _recent_week(w: int, today: date = TODAY) -> int:
    return most_recent_year(lambda y: date.fromisocalendar(y, w, 1) if w < 53 else week_53_monday(y), today)


def _next_week(w: int, today: date = TODAY) -> int:
    def end(y: int) -> date | None:
        first = date.fromisocalendar(y, w, 1) if w < 53 else week_53_monday(y)
        return None if first is None else first + D(days=7)

    return next_year_after(end, today)


def _to_now(first: tuple[str, str], now: datetime = NOW) -> tuple[str, str]:
    return first[0], iso(now)  # type: ignore[return-value]


# --- running a Dutch question -----------------------------------------------------------------


def case(id: str, question: str, phrase: str, reading: str, bounds: tuple[str | None, str | None],
         value: str | None = None, alts: tuple = (), **context: Any) -> Any:
    return pytest.param(question, phrase, reading, bounds, value, alts, context, id=id)


def run(question: str, **context: Any):  # type: ignore[no-untyped-def]
    now = context.pop("now", AMS_NOW)
    fields = {"languages": LANGS, "locale": "nl", **context}
    if "tz" not in fields:
        fields["tz"] = str(now.tzinfo)
    return normalize(question, Context.at(now, **fields))


def one(question: str, **context: Any):  # type: ignore[no-untyped-def]
    result = run(question, **context)
    assert len(result.mentions) == 1, (question, [m.text for m in result.mentions])
    return result.mentions[0]


def check(question, phrase, reading, bounds, value, alts, context) -> None:  # type: ignore[no-untyped-def]
    m = one(question, **context)
    assert m.text == phrase
    assert m.lang in ("nl", "und")
    assert m.reading == reading
    assert (m.start, m.end) == bounds
    if value is not None:
        assert m.value == value
    assert tuple((a.reading, a.policy, a.start, a.end) for a in m.alternatives) == alts


PARAMS = ("question", "phrase", "reading", "bounds", "value", "alts", "context")

# --- tables -----------------------------------------------------------------------------------

R1 = [
    case("R1-nl-gisteren", "Welke bugs zijn gisteren gesloten?", "gisteren", "R1",
         day(TODAY + D(days=-1)), (TODAY + D(days=-1)).isoformat()),
    case("R1-nl-vandaag", "Wat is er vandaag afgerond?", "vandaag", "R1", day(TODAY), TODAY.isoformat()),
    case("R1-nl-morgen-is-tomorrow", "Wat moet morgen af?", "morgen", "R1", day(TODAY + D(days=1))),
    case("R1-nl-Morgen-at-the-start", "Morgen is de release: welke tickets staan open?", "Morgen", "R1",
         day(TODAY + D(days=1))),
    case("R1-nl-eergisteren", "Wat is er eergisteren heropend?", "eergisteren", "R1", day(TODAY + D(days=-2))),
    case("R1-nl-overmorgen", "Wat moet overmorgen klaar zijn?", "overmorgen", "R1", day(TODAY + D(days=2))),
    case("R1-nl-voor-morgen-names-the-day", "Wat staat er voor morgen gepland?", "voor morgen", "R1",
         day(TODAY + D(days=1))),
    case("R1-nl-gisteren-across-a-month-start", "Wie heeft gisteren gereageerd?", "gisteren", "R1",
         day(MARCH_FIRST.date() + D(days=-1)), "2026-02-28", now=MARCH_FIRST),
]

R2 = [
    case("R2-nl-vorige-week", "Welke bugs zijn vorige week aangemaakt?", "vorige week", "R2",
         nl_week(TODAY + D(weeks=-1)), iso_week_name(TODAY + D(weeks=-1))),
    case("R2-nl-deze-week", "Welke bugs zijn deze week aangemaakt?", "deze week", "R2", nl_week(TODAY),
         iso_week_name(TODAY)),
    case("R2-nl-volgende-week", "Wat staat er volgende week gepland?", "volgende week", "R2",
         nl_week(TODAY + D(weeks=1))),
    case("R2-nl-afgelopen-week-without-article", "Bugs van afgelopen week", "van afgelopen week", "R2",
         nl_week(TODAY + D(weeks=-1))),
    case("R2-nl-vorige-maand-at-a-month-end", "Bugs die vorige maand zijn opgelost", "vorige maand", "R2",
         month_of(MONTH_END.date() + D(months=-1)), "2026-02", now=MONTH_END),
    case("R2-nl-deze-maand", "Bugs die deze maand zijn opgelost", "deze maand", "R2", month_of(TODAY), "2026-12"),
    case("R2-nl-vorig-kwartaal", "Velocity vorig kwartaal", "vorig kwartaal", "R2",
         quarter_of(TODAY + D(months=-3)), "2026-Q3"),
    case("R2-nl-dit-kwartaal", "Wie heeft dit kwartaal de meeste tickets gesloten?", "dit kwartaal", "R2",
         quarter_of(TODAY), "2026-Q4"),
    case("R2-nl-volgend-jaar", "Epics die volgend jaar starten", "volgend jaar", "R2", year(TODAY.year + 1), "2027"),
    case("R2-nl-voor-volgend-jaar-names-the-year", "Epics voor volgend jaar", "voor volgend jaar", "R2",
         year(TODAY.year + 1), "2027"),
    case("R2-nl-in-de-komende-maand", "Releases in de komende maand", "in de komende maand", "R2",
         month_of(TODAY + D(months=1)), "2027-01"),
    case("R2-nl-vorige-week-sunday-start-on-a-Sunday", "Tickets die vorige week zijn gesloten",
         "vorige week", "R2", week(SUNDAY.date() + D(weeks=-1), SU), "2026-11-29/P1W", now=SUNDAY,
         week_start="sunday"),
]

R3 = [
    case("R3-nl-3-dagen-geleden", "Bugs die 3 dagen geleden zijn geopend", "3 dagen geleden", "R3",
         day(TODAY + D(days=-3))),
    case("R3-nl-van-2-weken-geleden", "Bugs van 2 weken geleden", "van 2 weken geleden", "R3",
         nl_week(TODAY + D(weeks=-2)), iso_week_name(TODAY + D(weeks=-2))),
    case("R3-nl-een-maand-geleden-at-a-month-end", "Wat is een maand geleden gemerged?",
         "een maand geleden", "R3", month_of((MONTH_END + D(months=-1)).date()), "2026-02", now=MONTH_END),
    case("R3-nl-twee-kwartalen-geleden", "Velocity twee kwartalen geleden", "twee kwartalen geleden", "R3",
         quarter_of(TODAY + D(months=-6)), "2026-Q2"),
    case("R3-nl-een-jaar-geleden", "Open bugs een jaar geleden", "een jaar geleden", "R3",
         year(TODAY.year - 1), "2025"),
    case("R3-nl-twaalf-dagen-geleden", "Tickets van twaalf dagen geleden", "van twaalf dagen geleden", "R3",
         day(TODAY + D(days=-12))),
    case("R3-nl-2-uur-geleden", "Alerts van 2 uur geleden", "van 2 uur geleden", "R3",
         hour_of(moved(NOW, hours=-2))),
    case("R3-nl-5-minuten-geleden", "Builds die 5 minuten geleden startten", "5 minuten geleden", "R3",
         (elapsed(NOW, minutes=-5), elapsed(NOW, minutes=-4))),
    case("R3-nl-3-dagen-terug", "De deploy was 3 dagen terug", "3 dagen terug", "R3", day(TODAY + D(days=-3))),
    case("R3-nl-24-uur-geleden-across-DST", "Alerts 24 uur geleden", "24 uur geleden", "R3",
         hour_of(moved(SPRING, hours=-24)), now=SPRING),
]

R4 = [
    case("R4-nl-over-drie-dagen", "Wat moet over drie dagen af?", "over drie dagen", "R4",
         day(TODAY + D(days=3))),
    case("R4-nl-over-twee-weken", "Wat moet over twee weken af?", "over twee weken", "R4",
         nl_week(TODAY + D(weeks=2)), iso_week_name(TODAY + D(weeks=2))),
    case("R4-nl-over-een-maand-from-January-31", "Wat loopt over een maand af?", "over een maand", "R4",
         month_of((JANUARY_END + D(months=1)).date()), "2026-02", now=JANUARY_END),
    case("R4-nl-over-2-uur", "Welke jobs draaien over 2 uur?", "over 2 uur", "R4", hour_of(moved(NOW, hours=2))),
    case("R4-nl-over-een-jaar", "Contracten die over een jaar aflopen", "over een jaar", "R4",
         year(TODAY.year + 1)),
    case("R4-nl-over-vijftien-minuten", "Wat start er over vijftien minuten?", "over vijftien minuten", "R4",
         (elapsed(NOW, minutes=15), elapsed(NOW, minutes=16))),
    case("R4-nl-over-24-uur-across-DST", "Welke jobs draaien over 24 uur?", "over 24 uur", "R4",
         hour_of(moved(BEFORE_SPRING, hours=24)), now=BEFORE_SPRING),
]

_THIS_MONTH = TODAY.replace(day=1)
_THIS_WEEK = week_start(TODAY, _NL_FIRST)

R5 = [
    case("R5-nl-in-de-afgelopen-7-dagen", "Bugs in de afgelopen 7 dagen", "in de afgelopen 7 dagen", "R5",
         (wall(NOW, days=-7), iso(NOW)), alts=(alt("R5", _CAL, _cal_back(NOW, TODAY, 7, "days")),)),
    case("R5-nl-in-de-laatste-twee-weken", "Bugs in de laatste twee weken", "in de laatste twee weken", "R5",
         (wall(NOW, weeks=-2), iso(NOW)), alts=(alt("R5", _CAL, _cal_back(NOW, _THIS_WEEK, 2, "weeks")),)),
    case("R5-nl-de-afgelopen-3-maanden", "Tickets die de afgelopen 3 maanden zijn gesloten",
         "de afgelopen 3 maanden", "R5", (wall(NOW, months=-3), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, _THIS_MONTH, 3, "months")),)),
    case("R5-nl-de-afgelopen-maand-article-is-one-rolling-month", "Reacties van de afgelopen maand",
         "van de afgelopen maand", "R5", (wall(NOW, months=-1), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, _THIS_MONTH, 1, "months")),)),
    case("R5-nl-de-afgelopen-week-at-a-month-end", "Gemerged de afgelopen week", "de afgelopen week", "R5",
         (wall(MONTH_END, weeks=-1), iso(MONTH_END)),
         alts=(alt("R5", _CAL, _cal_back(MONTH_END, week_start(MONTH_END.date(), _NL_FIRST), 1, "weeks")),),
         now=MONTH_END),
    case("R5-nl-het-afgelopen-jaar", "Releases van het afgelopen jaar", "van het afgelopen jaar", "R5",
         (wall(NOW, years=-1), iso(NOW)), alts=(alt("R5", _CAL, _cal_back(NOW, date(2026, 1, 1), 1, "years")),)),
    case("R5-nl-in-het-afgelopen-uur-off-the-hour", "Deploys in het afgelopen uur", "in het afgelopen uur",
         "R5", (elapsed(QUARTER_PAST, hours=-1), iso(QUARTER_PAST)),
         alts=(alt("R5", _CAL, (elapsed(floor_hour(QUARTER_PAST), hours=-1), iso(floor_hour(QUARTER_PAST)))),),
         now=QUARTER_PAST),
    case("R5-nl-gedurende-de-afgelopen-2-jaar-from-a-leap-day", "Incidenten gedurende de afgelopen 2 jaar",
         "gedurende de afgelopen 2 jaar", "R5", (wall(LEAP_DAY, years=-2), iso(LEAP_DAY)),
         alts=(alt("R5", _CAL, _cal_back(LEAP_DAY, date(2028, 1, 1), 2, "years")),), now=LEAP_DAY),
    case("R5-nl-de-afgelopen-24-uur-is-24-real-hours", "Fouten in de afgelopen 24 uur",
         "in de afgelopen 24 uur", "R5", (elapsed(SPRING, hours=-24), iso(SPRING)), now=SPRING),
    case("R5-nl-de-laatste-30-minuten-on-the-hour", "Builds in de laatste 30 minuten",
         "in de laatste 30 minuten", "R5", (elapsed(NOW, minutes=-30), iso(NOW))),
    case("R5-nl-calendar-policy-reads-whole-days", "Bugs in de afgelopen 7 dagen", "in de afgelopen 7 dagen",
         "R5", _cal_back(NOW, TODAY, 7, "days"), alts=(alt("R5", _ROLL, (wall(NOW, days=-7), iso(NOW))),),
         window_reading="calendar"),
]

R6 = [
    case("R6-nl-in-de-komende-3-dagen", "Wat moet in de komende 3 dagen af?", "in de komende 3 dagen", "R6",
         (iso(NOW), wall(NOW, days=3)), alts=(alt("R6", _CAL, _cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-nl-binnen-de-komende-2-weken", "Wat landt binnen de komende 2 weken?",
         "binnen de komende 2 weken", "R6", (iso(NOW), wall(NOW, weeks=2)),
         alts=(alt("R6", _CAL, _cal_ahead(NOW, _THIS_WEEK, 2, "weeks")),)),
    case("R6-nl-voor-de-komende-6-uur", "Jobs voor de komende 6 uur", "voor de komende 6 uur", "R6",
         (iso(NOW), elapsed(NOW, hours=6)),
         alts=(alt("R6", _CAL, (elapsed(floor_hour(NOW), hours=1), elapsed(floor_hour(NOW), hours=7))),)),
    case("R6-nl-in-de-komende-2-maanden", "Verlengingen in de komende 2 maanden", "in de komende 2 maanden",
         "R6", (iso(NOW), wall(NOW, months=2)), alts=(alt("R6", _CAL, _cal_ahead(NOW, _THIS_MONTH, 2, "months")),)),
    case("R6-nl-binnen-de-volgende-maand-no-N", "Wat komt binnen de volgende maand?",
         "binnen de volgende maand", "R6", (iso(NOW), wall(NOW, months=1)),
         alts=(alt("R6", _CAL, _cal_ahead(NOW, _THIS_MONTH, 1, "months")),)),
    case("R6-nl-binnen-3-dagen", "Graag binnen 3 dagen oplossen", "binnen 3 dagen", "R6",
         (iso(NOW), wall(NOW, days=3)), alts=(alt("R6", _CAL, _cal_ahead(NOW, TODAY, 3, "days")),)),
]

_MARCH_PAST = month(_past(lambda y: date(y, 3, 1)), 3)
_MARCH_NEXT = month(_future(lambda y: date(y, 4, 1)), 3)
_MONDAY_PAST = day(on_or_before(TODAY, MO))
_MONDAY_NEXT = day(on_or_after(TODAY, MO))
_MAR1 = (day(date(_past(lambda y: date(y, 3, 1)), 3, 1)), day(date(_future(lambda y: date(y, 3, 2)), 3, 1)))
_MAR15 = (day(date(_past(lambda y: date(y, 3, 15)), 3, 15)), day(date(_future(lambda y: date(y, 3, 16)), 3, 15)))
_W40 = (iso_week(_recent_week(40), 40), iso_week(_next_week(40), 40))

R7 = [
    case("R7-nl-sinds-vorige-week", "Wat hebben we sinds vorige week opgeleverd?", "sinds vorige week", "R7",
         since(nl_week(TODAY + D(weeks=-1))), "2026-11-23/.."),
    case("R7-nl-sinds-maart", "Bugs die sinds maart zijn gesloten", "sinds maart", "R7", since(_MARCH_PAST),
         "2026-03-01/..", alts=(alt("R7", _FUT, since(_MARCH_NEXT)),)),
    case("R7-nl-sinds-2024", "Tickets die sinds 2024 open staan", "sinds 2024", "R7", since(year(2024)),
         "2024-01-01/.."),
    case("R7-nl-sinds-gisteren", "Reacties sinds gisteren", "sinds gisteren", "R7", since(day(TODAY + D(days=-1)))),
    case("R7-nl-sinds-maandag", "Commits sinds maandag", "sinds maandag", "R7", since(_MONDAY_PAST),
         alts=(alt("R7", _FUT, since(_MONDAY_NEXT)),)),
    case("R7-nl-vanaf-1-maart", "Fouten vanaf 1 maart", "vanaf 1 maart", "R7", since(_MAR1[0]),
         alts=(alt("R7", _FUT, since(_MAR1[1])),)),
    case("R7-nl-sinds-week-40", "Tickets sinds week 40", "sinds week 40", "R7", since(_W40[0]),
         alts=(alt("R7", _FUT, since(_W40[1])),)),
    case("R7-nl-vanaf-morgen", "Wat geldt er vanaf morgen?", "vanaf morgen", "R7", since(day(TODAY + D(days=1)))),
    case("R7-nl-vanaf-ISO-date", "Deploys vanaf 2025-03-14", "vanaf 2025-03-14", "R7",
         since(day(date(2025, 3, 14))), "2025-03-14/.."),
]

R8 = [
    case("R8-nl-na-maart", "Bugs die na maart zijn geopend", "na maart", "R8", after(_MARCH_PAST),
         "2026-04-01/..", alts=(alt("R8", _FUT, after(_MARCH_NEXT)),)),
    case("R8-nl-na-2025", "Tickets met een deadline na 2025", "na 2025", "R8", after(year(2025))),
    case("R8-nl-na-vorige-week", "Heropend na vorige week", "na vorige week", "R8",
         after(nl_week(TODAY + D(weeks=-1)))),
    case("R8-nl-na-15-maart", "Tickets na 15 maart", "na 15 maart", "R8", after(_MAR15[0]),
         alts=(alt("R8", _FUT, after(_MAR15[1])),)),
    case("R8-nl-later-dan-gisteren", "Reacties later dan gisteren", "later dan gisteren", "R8",
         after(day(TODAY + D(days=-1)))),
]

R9 = [
    case("R9-nl-voor-maart", "Bugs die voor maart zijn geopend", "voor maart", "R9", before(_MARCH_PAST),
         alts=(alt("R9", _FUT, before(_MARCH_NEXT)),)),
    case("R9-nl-vóór-2025", "Tickets die vóór 2025 zijn gesloten", "vóór 2025", "R9", before(year(2025)),
         "../2024-12-31"),
    case("R9-nl-voor-15-maart", "Tickets aangemaakt voor 15 maart", "voor 15 maart", "R9", before(_MAR15[0]),
         alts=(alt("R9", _FUT, before(_MAR15[1])),)),
    case("R9-nl-voor-vrijdag-deadline-looks-ahead", "Wat moet voor vrijdag af?", "voor vrijdag", "R9",
         before(day(on_or_after(TODAY, FR))), alts=(alt("R9", None, before(day(on_or_before(TODAY, FR)))),)),
    case("R9-nl-eerder-dan-gisteren", "Reacties eerder dan gisteren", "eerder dan gisteren", "R9",
         before(day(TODAY + D(days=-1)))),
]

R10 = [
    case("R10-nl-tot-vrijdag-deadline-looks-ahead", "Wat moet tot vrijdag opgelost zijn?", "tot vrijdag",
         "R10", until(day(on_or_after(TODAY, FR))), alts=(alt("R10", None, until(day(on_or_before(TODAY, FR)))),)),
    case("R10-nl-uiterlijk-vrijdag", "Wat moet uiterlijk vrijdag klaar zijn?", "uiterlijk vrijdag", "R10",
         until(day(on_or_after(TODAY, FR))), alts=(alt("R10", None, until(day(on_or_before(TODAY, FR)))),)),
    case("R10-nl-tot-en-met-maart", "Bevroren tot en met maart", "tot en met maart", "R10", until(_MARCH_PAST),
         alts=(alt("R10", _FUT, until(_MARCH_NEXT)),)),
    case("R10-nl-t/m-vorige-week", "Bugs t/m vorige week", "t/m vorige week", "R10",
         until(nl_week(TODAY + D(weeks=-1)))),
    case("R10-nl-t/m-2025", "Incidenten t/m 2025", "t/m 2025", "R10", until(year(2025))),
    case("R10-nl-tot-morgen", "Dienst tot morgen", "tot morgen", "R10", until(day(TODAY + D(days=1)))),
]

R11 = [
    case("R11-nl-tussen-maart-en-mei", "Bugs tussen maart en mei", "tussen maart en mei", "R11",
         joined(month(2026, 3), month(2026, 5)), alts=(alt("R11", _FUT, joined(month(2027, 3), month(2027, 5))),)),
    case("R11-nl-tussen-1-en-15-maart", "Tickets tussen 1 en 15 maart", "tussen 1 en 15 maart", "R11",
         joined(day(date(2026, 3, 1)), day(date(2026, 3, 15))),
         alts=(alt("R11", _FUT, joined(day(date(2027, 3, 1)), day(date(2027, 3, 15)))),)),
    case("R11-nl-van-1-maart-tot-15-april-2026", "Uitgaven van 1 maart tot 15 april 2026",
         "van 1 maart tot 15 april 2026", "R11", joined(day(date(2026, 3, 1)), day(date(2026, 4, 15))),
         "2026-03-01/2026-04-15"),
    case("R11-nl-van-januari-tot-maart", "Velocity van januari tot maart", "van januari tot maart", "R11",
         joined(month(2026, 1), month(2026, 3)), alts=(alt("R11", _FUT, joined(month(2027, 1), month(2027, 3))),)),
    case("R11-nl-van-november-tot-februari", "Dienst van november tot februari", "van november tot februari",
         "R11", joined(month(2026, 11), month(2027, 2)),
         alts=(alt("R11", _FUT, joined(month(2027, 11), month(2028, 2))),)),
    case("R11-nl-van-maandag-tot-vrijdag", "Commits van maandag tot vrijdag", "van maandag tot vrijdag", "R11",
         joined(day(on_or_before(TODAY, MO)), day(on_or_before(TODAY, MO) + D(weekday=FR))),
         alts=(alt("R11", _FUT, joined(day(on_or_after(TODAY, MO)), day(on_or_after(TODAY, MO) + D(weekday=FR)))),)),
    case("R11-nl-van-vrijdag-tot-maandag-wraps-the-week", "Alerts van vrijdag tot maandag",
         "van vrijdag tot maandag", "R11",
         joined(day(on_or_before(TODAY, FR)), day(on_or_before(TODAY, FR) + D(weekday=MO))),
         alts=(alt("R11", _FUT, joined(day(on_or_after(TODAY, FR)), day(on_or_after(TODAY, FR) + D(weekday=MO)))),)),
    case("R11-nl-maandag-t/m-vrijdag", "Commits maandag t/m vrijdag", "maandag t/m vrijdag", "R11",
         joined(day(on_or_before(TODAY, MO)), day(on_or_before(TODAY, MO) + D(weekday=FR))),
         alts=(alt("R11", _FUT, joined(day(on_or_after(TODAY, MO)), day(on_or_after(TODAY, MO) + D(weekday=FR)))),)),
    case("R11-nl-3-17-maart", "Bugs 3-17 maart", "3-17 maart", "R11",
         joined(day(date(2026, 3, 3)), day(date(2026, 3, 17))),
         alts=(alt("R11", _FUT, joined(day(date(2027, 3, 3)), day(date(2027, 3, 17)))),)),
    case("R11-nl-tussen-week-10-en-week-12", "Welke bugs zijn tussen week 10 en week 12 gefixt?",
         "tussen week 10 en week 12", "R11", joined(iso_week(2026, 10), iso_week(2026, 12)),
         alts=(alt("R11", _FUT, joined(iso_week(2027, 10), iso_week(2027, 12))),)),
    case("R11-nl-van-numeric-tot-numeric", "Uitgaven van 01-01-2025 tot 31-03-2025",
         "van 01-01-2025 tot 31-03-2025", "R11", joined(day(date(2025, 1, 1)), day(date(2025, 3, 31))),
         "2025-01-01/2025-03-31"),
    case("R11-nl-van-2024-tot-2025", "Incidenten van 2024 tot 2025", "van 2024 tot 2025", "R11",
         joined(year(2024), year(2025))),
    case("R11-nl-van-vorige-week-tot-deze-week", "Bugs van vorige week tot deze week",
         "van vorige week tot deze week", "R11", joined(nl_week(TODAY + D(weeks=-1)), nl_week(TODAY))),
    case("R11-nl-van-eergisteren-tot-vandaag", "Wijzigingen van eergisteren tot vandaag",
         "van eergisteren tot vandaag", "R11", joined(day(TODAY + D(days=-2)), day(TODAY))),
]

_MAR14 = (_past(lambda y: date(y, 3, 14)), _future(lambda y: date(y, 3, 15)))
_DEC3 = (_past(lambda y: date(y, 12, 3)), _future(lambda y: date(y, 12, 4)))

R12 = [
    case("R12-nl-in-maart", "Bugs in maart", "in maart", "R12", _MARCH_PAST, "2026-03",
         alts=(alt("R12", _FUT, _MARCH_NEXT),)),
    case("R12-nl-in-mei", "Bugs in mei", "in mei", "R12", month(_past(lambda y: date(y, 5, 1)), 5),
         alts=(alt("R12", _FUT, month(_future(lambda y: date(y, 6, 1)), 5)),)),
    case("R12-nl-in-december-current-month-counts", "Bugs in december", "in december", "R12",
         month(2026, 12), "2026-12"),
    case("R12-nl-in-december-said-in-January", "Bugs in december", "in december", "R12",
         month(_past(lambda y: date(y, 12, 1), MID_JANUARY.date()), 12), "2026-12",
         alts=(alt("R12", _FUT, month(_future(lambda y: date(y + 1, 1, 1), MID_JANUARY.date()), 12)),),
         now=MID_JANUARY),
    case("R12-nl-in-Q3", "Wat is in Q3 opgeleverd?", "in Q3", "R12", quarter(_past(lambda y: date(y, 7, 1)), 3),
         "2026-Q3", alts=(alt("R12", _FUT, quarter(_future(lambda y: date(y, 10, 1)), 3)),)),
    case("R12-nl-in-het-derde-kwartaal", "Wat is in het derde kwartaal opgeleverd?", "in het derde kwartaal",
         "R12", quarter(_past(lambda y: date(y, 7, 1)), 3),
         alts=(alt("R12", _FUT, quarter(_future(lambda y: date(y, 10, 1)), 3)),)),
    case("R12-nl-in-het-1e-kwartaal", "Wat is in het 1e kwartaal opgeleverd?", "in het 1e kwartaal", "R12",
         quarter(_past(lambda y: date(y, 1, 1)), 1),
         alts=(alt("R12", _FUT, quarter(_future(lambda y: date(y, 4, 1)), 1)),)),
    case("R12-nl-in-het-eerste-halfjaar", "Werving in het eerste halfjaar", "in het eerste halfjaar", "R12",
         half(_past(lambda y: date(y, 1, 1)), 1), "2026-H1",
         alts=(alt("R12", _FUT, half(_future(lambda y: date(y, 7, 1)), 1)),)),
    case("R12-nl-in-de-tweede-helft-van-het-jaar-current-counts", "Doelen in de tweede helft van het jaar",
         "in de tweede helft van het jaar", "R12", half(2026, 2), "2026-H2"),
    case("R12-nl-op-14-maart", "Uitgebracht op 14 maart", "op 14 maart", "R12", day(date(_MAR14[0], 3, 14)),
         "2026-03-14", alts=(alt("R12", _FUT, day(date(_MAR14[1], 3, 14))),)),
    case("R12-nl-op-2-december-today-counts", "Uitgebracht op 2 december", "op 2 december", "R12", day(TODAY)),
    case("R12-nl-op-3-december-is-last-year", "Uitgebracht op 3 december", "op 3 december", "R12",
         day(date(_DEC3[0], 12, 3)), "2025-12-03", alts=(alt("R12", _FUT, day(date(_DEC3[1], 12, 3))),)),
    case("R12-nl-op-29-februari-finds-the-last-leap-year", "Wat gebeurde er op 29 februari?",
         "op 29 februari", "R12", day(date(_past(leap_day, BEFORE_LEAP_DAY.date()), 2, 29)), "2024-02-29",
         alts=(alt("R12", _FUT, day(date(_future(after_leap_day, BEFORE_LEAP_DAY.date()), 2, 29))),),
         now=BEFORE_LEAP_DAY),
]

R13 = [
    case("R13-nl-op-maandag", "Bugs op maandag", "op maandag", "R13", day(on_or_before(TODAY, MO)),
         on_or_before(TODAY, MO).isoformat(), alts=(alt("R13", _FUT, day(on_or_after(TODAY, MO))),)),
    case("R13-nl-op-woensdag-is-today", "Bugs op woensdag", "op woensdag", "R13", day(TODAY)),
    case("R13-nl-donderdag-bare", "Welke bugs zijn donderdag gesloten?", "donderdag", "R13",
         day(on_or_before(TODAY, TH)), alts=(alt("R13", _FUT, day(on_or_after(TODAY, TH))),)),
    case("R13-nl-op-zaterdag", "Deploys op zaterdag", "op zaterdag", "R13", day(on_or_before(TODAY, SA)),
         alts=(alt("R13", _FUT, day(on_or_after(TODAY, SA))),)),
    case("R13-nl-op-zondag-said-on-a-Sunday", "Bugs op zondag", "op zondag", "R13", day(SUNDAY.date()),
         now=SUNDAY),
    case("R13-nl-deadline-op-maandag-looks-ahead", "Taken met deadline op maandag", "maandag", "R13",
         day(on_or_after(TODAY, MO)), alts=(alt("R13", None, day(on_or_before(TODAY, MO))),)),
    case("R13-nl-future-bias-flips-op-maandag", "Bugs op maandag", "op maandag", "R13",
         day(on_or_after(TODAY, MO)), alts=(alt("R13", _PAST, day(on_or_before(TODAY, MO))),), bias="future"),
]

R14 = [
    case("R14-nl-afgelopen-maandag", "Wat is er afgelopen maandag kapotgegaan?", "afgelopen maandag", "R14",
         day(strictly_before(TODAY, MO)), strictly_before(TODAY, MO).isoformat(),
         alts=(alt("R16", _WEEK, day(in_week(TODAY, MO, -1))),)),
    case("R14-nl-afgelopen-dinsdag-is-yesterday", "Wat is er afgelopen dinsdag kapotgegaan?",
         "afgelopen dinsdag", "R14", day(strictly_before(TODAY, TU)),
         alts=(alt("R16", _WEEK, day(in_week(TODAY, TU, -1))),)),
    case("R14-nl-afgelopen-woensdag-said-on-a-Wednesday", "Wat is er afgelopen woensdag kapotgegaan?",
         "afgelopen woensdag", "R14", day(strictly_before(TODAY, WE))),
    case("R14-nl-vorige-vrijdag", "Deploys vorige vrijdag", "vorige vrijdag", "R14", day(strictly_before(TODAY, FR))),
    case("R14-nl-afgelopen-maan.-CLDR-abbreviation", "Wat is er afgelopen maan. kapotgegaan?",
         "afgelopen maan.", "R14", day(strictly_before(TODAY, MO)),
         alts=(alt("R16", _WEEK, day(in_week(TODAY, MO, -1))),)),
    case("R14-nl-afgelopen-zondag-said-on-a-Sunday", "Wat is er afgelopen zondag kapotgegaan?",
         "afgelopen zondag", "R14", day(strictly_before(SUNDAY.date(), SU)), now=SUNDAY),
    case("R14-nl-afgelopen-zondag-sunday-weeks-offers-last-weeks-Sunday", "Wat gebeurde er afgelopen zondag?",
         "afgelopen zondag", "R14", day(strictly_before(TODAY, SU)),
         alts=(alt("R16", _WEEK, day(in_week(TODAY, SU, -1, SU))),), week_start="sunday"),
]

R15 = [
    case("R15-nl-komende-maandag", "Wat staat er komende maandag gepland?", "komende maandag", "R15",
         day(strictly_after(TODAY, MO)), strictly_after(TODAY, MO).isoformat()),
    case("R15-nl-volgende-woensdag-said-on-a-Wednesday", "Gepland volgende woensdag", "volgende woensdag",
         "R15", day(strictly_after(TODAY, WE))),
    case("R15-nl-volgende-donderdag-is-tomorrow", "Gepland volgende donderdag", "volgende donderdag", "R15",
         day(strictly_after(TODAY, TH)), alts=(alt("R16", _WEEK, day(in_week(TODAY, TH, 1))),)),
    case("R15-nl-aanstaande-vrijdag", "Demo aanstaande vrijdag", "aanstaande vrijdag", "R15",
         day(strictly_after(TODAY, FR)), alts=(alt("R16", _WEEK, day(in_week(TODAY, FR, 1))),)),
    case("R15-nl-komende-zaterdag", "Onderhoud komende zaterdag", "komende zaterdag", "R15",
         day(strictly_after(TODAY, SA)), alts=(alt("R16", _WEEK, day(in_week(TODAY, SA, 1))),)),
    case("R15-nl-volgende-zondag-said-on-a-Sunday", "Gepland volgende zondag", "volgende zondag", "R15",
         day(strictly_after(SUNDAY.date(), SU)), now=SUNDAY),
]

R16 = [
    case("R16-nl-maandag-vorige-week", "Wat is er maandag vorige week kapotgegaan?", "maandag vorige week",
         "R16", day(in_week(TODAY, MO, -1)), in_week(TODAY, MO, -1).isoformat()),
    case("R16-nl-vorige-week-maandag", "Wat is er vorige week maandag kapotgegaan?", "vorige week maandag",
         "R16", day(in_week(TODAY, MO, -1))),
    case("R16-nl-maandag-van-de-vorige-week", "Wat gebeurde er maandag van de vorige week?",
         "maandag van de vorige week", "R16", day(in_week(TODAY, MO, -1))),
    case("R16-nl-vrijdag-volgende-week", "Demo vrijdag volgende week", "vrijdag volgende week", "R16",
         day(in_week(TODAY, FR, 1))),
    case("R16-nl-volgende-week-donderdag-CLDR-field-names-the-week", "Demo volgende week donderdag",
         "volgende week donderdag", "R16", day(in_week(TODAY, TH, 1))),
    case("R16-nl-woensdag-deze-week", "Tickets woensdag deze week", "woensdag deze week", "R16",
         day(in_week(TODAY, WE, 0))),
    case("R16-nl-deze-vrijdag", "Demo deze vrijdag", "deze vrijdag", "R16", day(in_week(TODAY, FR, 0))),
    case("R16-nl-zondag-vorige-week-sunday-weeks", "zondag vorige week", "zondag vorige week", "R16",
         day(in_week(SUNDAY.date(), SU, -1, SU)), now=SUNDAY, week_start="sunday"),
    case("R16-nl-week-policy-reads-afgelopen-maandag-as-last-weeks", "Wat is er afgelopen maandag kapotgegaan?",
         "afgelopen maandag", "R16", day(in_week(TODAY, MO, -1)),
         alts=(alt("R14", _NEAREST, day(strictly_before(TODAY, MO))),), weekday_reading="week"),
]

R17 = [
    case("R17-nl-in-2025", "Bugs in 2025", "in 2025", "R17", year(2025), "2025"),
    case("R17-nl-in-het-jaar-2025", "Bugs in het jaar 2025", "in het jaar 2025", "R17", year(2025), "2025"),
    case("R17-nl-tijdens-2023", "Storingen tijdens 2023", "tijdens 2023", "R17", year(2023)),
    case("R17-nl-van-2025-beside-numbers", "Toon 5 tickets met prioriteit 2 van 2025", "van 2025", "R17",
         year(2025), "2025"),
]

_NL_03_04 = read_nl(3, 4, 2026)
_OTHER_03_04 = date(2026, _NL_03_04.day, _NL_03_04.month)
_OTHER_ORDER = {"MD": "date_order=DMY", "DM": "date_order=MDY"}

R18 = [
    case("R18-nl-14-maart-2025", "Opgelost op 14 maart 2025", "op 14 maart 2025", "R18",
         day(date(2025, 3, 14)), "2025-03-14"),
    case("R18-nl-vrijdag-14-maart-2025", "Opgelost vrijdag 14 maart 2025", "vrijdag 14 maart 2025", "R18",
         day(date(2025, 3, 14))),
    case("R18-nl-numeric-with-hyphens-CLDR-nl", "Opgelost op 14-03-2026", "op 14-03-2026", "R18",
         day(date(2026, 3, 14)), "2026-03-14"),
    case("R18-nl-numeric-with-slashes", "Opgelost op 14/03/2026", "op 14/03/2026", "R18", day(date(2026, 3, 14))),
    case("R18-nl-numeric-ambiguous-reads-CLDR-nl-order", "Opgelost op 03-04-2026", "op 03-04-2026", "R18",
         day(_NL_03_04), _NL_03_04.isoformat(),
         alts=(alt("R18", _OTHER_ORDER[numeric_order("nl")], day(_OTHER_03_04)),)),
    case("R18-nl-nl_BE-numeric-ambiguous-Brussels", "Opgelost op 03/04/2026", "op 03/04/2026", "R18",
         day(_NL_03_04, BRUSSELS), alts=(alt("R18", _OTHER_ORDER[numeric_order("nl_BE")], day(_OTHER_03_04, BRUSSELS)),),
         now=BRUSSELS_NOW, locale="nl_BE"),
    case("R18-nl-ISO-date", "Opgelost op 2025-03-14", "op 2025-03-14", "R18", day(date(2025, 3, 14))),
    case("R18-nl-1-april-2026", "Release op 1 april 2026", "op 1 april 2026", "R18", day(date(2026, 4, 1))),
    case("R18-nl-abbreviated-month", "Release op 14 jan 2026", "op 14 jan 2026", "R18", day(date(2026, 1, 14))),
]

R19 = [
    case("R19-nl-maart-2026", "Bugs maart 2026", "maart 2026", "R19", month(2026, 3), "2026-03"),
    case("R19-nl-in-mei-2025", "Bugs in mei 2025", "in mei 2025", "R19", month(2025, 5), "2025-05"),
    case("R19-nl-Q3-2025", "Omzet Q3 2025", "Q3 2025", "R19", quarter(2025, 3), "2025-Q3"),
    case("R19-nl-het-derde-kwartaal-van-2025", "Omzet het derde kwartaal van 2025",
         "het derde kwartaal van 2025", "R19", quarter(2025, 3), "2025-Q3"),
    case("R19-nl-3e-kwartaal-2025", "Omzet 3e kwartaal 2025", "3e kwartaal 2025", "R19", quarter(2025, 3)),
    case("R19-nl-eerste-halfjaar-2026", "Doelen eerste halfjaar 2026", "eerste halfjaar 2026", "R19",
         half(2026, 1), "2026-H1"),
    case("R19-nl-H1-2026", "Doelen H1 2026", "H1 2026", "R19", half(2026, 1), "2026-H1"),
    case("R19-nl-in-de-eerste-helft-van-2026", "Doelen in de eerste helft van 2026",
         "in de eerste helft van 2026", "R19", half(2026, 1)),
    case("R19-nl-tweede-helft-2025", "Doelen tweede helft 2025", "tweede helft 2025", "R19", half(2025, 2),
         "2025-H2"),
]

R20 = [
    case("R20-nl-week-48-2026", "Tickets week 48 2026", "week 48 2026", "R20", iso_week(2026, 48), "2026-W48"),
    case("R20-nl-week-48-van-2026", "Tickets week 48 van 2026", "week 48 van 2026", "R20", iso_week(2026, 48)),
    case("R20-nl-in-week-48-past-bias", "Tickets in week 48", "in week 48", "R20",
         iso_week(_recent_week(48), 48), "2026-W48", alts=(alt("R20", _FUT, iso_week(_next_week(48), 48)),)),
    case("R20-nl-wk-48", "Tickets wk 48", "wk 48", "R20", iso_week(_recent_week(48), 48),
         alts=(alt("R20", _FUT, iso_week(_next_week(48), 48)),)),
    case("R20-nl-weeknummer-48", "Tickets weeknummer 48", "weeknummer 48", "R20", iso_week(_recent_week(48), 48),
         alts=(alt("R20", _FUT, iso_week(_next_week(48), 48)),)),
    case("R20-nl-in-week-49-current-counts", "Tickets in week 49", "in week 49", "R20", iso_week(2026, 49),
         "2026-W49"),
    case("R20-nl-in-week-50-is-last-year", "Tickets in week 50", "in week 50", "R20",
         iso_week(_recent_week(50), 50), "2025-W50", alts=(alt("R20", _FUT, iso_week(_next_week(50), 50)),)),
    case("R20-nl-week-53-van-2026-a-long-year", "Tickets week 53 van 2026", "week 53 van 2026", "R20",
         iso_week(2026, 53), "2026-W53"),
    case("R20-nl-ISO-2026-W48", "Tickets 2026-W48", "2026-W48", "R20", iso_week(2026, 48), "2026-W48"),
]

R21 = [
    case("R21-nl-sinds-begin-dit-jaar", "Omzet sinds begin dit jaar", "sinds begin dit jaar", "R21",
         _to_now(year(2026)), f"{year(2026)[0]}/{iso(NOW)}"),
    case("R21-nl-sinds-het-begin-van-de-maand", "Uitgaven sinds het begin van de maand",
         "sinds het begin van de maand", "R21", _to_now(month_of(TODAY))),
    case("R21-nl-sinds-het-begin-van-het-kwartaal", "Omzet sinds het begin van het kwartaal",
         "sinds het begin van het kwartaal", "R21", _to_now(quarter_of(TODAY))),
    case("R21-nl-dit-jaar-tot-nu-toe", "Omzet dit jaar tot nu toe", "dit jaar tot nu toe", "R21",
         _to_now(year(2026))),
    case("R21-nl-YTD", "Omzet YTD", "YTD", "R21", _to_now(year(2026))),
    case("R21-nl-deze-week-tot-nu-toe-on-a-Sunday", "Commits deze week tot nu toe", "deze week tot nu toe",
         "R21", _to_now(nl_week(SUNDAY.date()), SUNDAY), now=SUNDAY),
]

R22 = [
    case("R22-nl-vanochtend", "Wat is er vanochtend kapotgegaan?", "vanochtend", "R22", period(TODAY, "morning1")),
    case("R22-nl-vanmorgen", "Wat is er vanmorgen kapotgegaan?", "vanmorgen", "R22", period(TODAY, "morning1")),
    case("R22-nl-vanmiddag", "Wat is er vanmiddag kapotgegaan?", "vanmiddag", "R22", period(TODAY, "afternoon1")),
    case("R22-nl-vanavond", "Wat deployen we vanavond?", "vanavond", "R22", period(TODAY, "evening1")),
    case("R22-nl-deze-ochtend", "Wat is er deze ochtend kapotgegaan?", "deze ochtend", "R22",
         period(TODAY, "morning1")),
    case("R22-nl-gisteravond", "Wat is er gisteravond kapotgegaan?", "gisteravond", "R22",
         period(TODAY + D(days=-1), "evening1")),
    case("R22-nl-gistermiddag", "Wat is er gistermiddag kapotgegaan?", "gistermiddag", "R22",
         period(TODAY + D(days=-1), "afternoon1")),
    case("R22-nl-gisteren-in-de-middag", "Wat is er gisteren in de middag gebeurd?", "gisteren in de middag",
         "R22", period(TODAY + D(days=-1), "afternoon1")),
    case("R22-nl-vannacht-is-the-night-just-past", "Wat is er vannacht gecrasht?", "vannacht", "R22",
         period(TODAY, "night1")),
    case("R22-nl-gisternacht", "Wat is er gisternacht gecrasht?", "gisternacht", "R22", period(TODAY, "night1")),
    case("R22-nl-afgelopen-nacht", "Wat is er afgelopen nacht gecrasht?", "afgelopen nacht", "R22",
         period(TODAY, "night1")),
    case("R22-nl-morgenochtend", "Wat leveren we morgenochtend op?", "morgenochtend", "R22",
         period(TODAY + D(days=1), "morning1")),
    case("R22-nl-morgenavond", "Jobs morgenavond", "morgenavond", "R22", period(TODAY + D(days=1), "evening1")),
    case("R22-nl-morgennacht-is-the-night-after-tomorrow-evening", "Jobs morgennacht", "morgennacht", "R22",
         period(TODAY + D(days=2), "night1")),
    case("R22-nl-vanochtend-on-a-DST-day-is-wall-clock", "Wat is er vanochtend kapotgegaan?", "vanochtend",
         "R22", period(MORNING_SPRING.date(), "morning1"), now=MORNING_SPRING),
]

_SAT = SATURDAY.date()

R23 = [
    case("R23-nl-dit-weekend-on-a-Wednesday", "Deploys dit weekend", "dit weekend", "R23",
         weekend(first_open_weekend(TODAY)), weekend_value(first_open_weekend(TODAY))),
    case("R23-nl-afgelopen-weekend", "Alerts afgelopen weekend", "afgelopen weekend", "R23",
         weekend(last_ended_weekend(TODAY)), weekend_value(last_ended_weekend(TODAY))),
    case("R23-nl-vorig-weekend", "Alerts vorig weekend", "vorig weekend", "R23", weekend(last_ended_weekend(TODAY))),
    case("R23-nl-volgend-weekend", "Onderhoud volgend weekend", "volgend weekend", "R23",
         weekend(first_open_weekend(TODAY) + D(weeks=1)), alts=(alt("R23", None, weekend(first_open_weekend(TODAY))),)),
    case("R23-nl-komend-weekend", "Onderhoud komend weekend", "komend weekend", "R23",
         weekend(first_open_weekend(TODAY) + D(weeks=1)), alts=(alt("R23", None, weekend(first_open_weekend(TODAY))),)),
    case("R23-nl-in-het-weekend-on-a-Wednesday", "Wat is er in het weekend kapotgegaan?", "in het weekend", "R23",
         weekend(last_ended_weekend(TODAY)), alts=(alt("R23", _FUT, weekend(first_open_weekend(TODAY))),)),
    case("R23-nl-tijdens-het-weekend", "Wat is er tijdens het weekend blijven liggen?", "tijdens het weekend",
         "R23", weekend(last_ended_weekend(TODAY)), alts=(alt("R23", _FUT, weekend(first_open_weekend(TODAY))),)),
    case("R23-nl-in-het-weekend-future-bias", "Wat gaat er in het weekend mis?", "in het weekend", "R23",
         weekend(first_open_weekend(TODAY)), alts=(alt("R23", _PAST, weekend(last_ended_weekend(TODAY))),),
         bias="future"),
    case("R23-nl-dit-weekend-on-a-Saturday", "Deploys dit weekend", "dit weekend", "R23",
         weekend(first_open_weekend(_SAT)), now=SATURDAY),
    case("R23-nl-afgelopen-weekend-on-a-Saturday", "Alerts afgelopen weekend", "afgelopen weekend", "R23",
         weekend(last_ended_weekend(_SAT)), now=SATURDAY),
    case("R23-nl-in-het-weekend-on-a-Saturday-is-this-one", "Pagers in het weekend", "in het weekend", "R23",
         weekend(first_open_weekend(_SAT)), now=SATURDAY),
    case("R23-nl-afgelopen-weekend-on-a-Monday", "Alerts afgelopen weekend", "afgelopen weekend", "R23",
         weekend(last_ended_weekend(MONDAY_AFTER.date())), now=MONDAY_AFTER),
]

TABLES = {"R1": R1, "R2": R2, "R3": R3, "R4": R4, "R5": R5, "R6": R6, "R7": R7, "R8": R8,
          "R9": R9, "R10": R10, "R11": R11, "R12": R12, "R13": R13, "R14": R14, "R15": R15,
          "R16": R16, "R17": R17, "R18": R18, "R19": R19, "R20": R20, "R21": R21, "R22": R22,
          "R23": R23}
#: Readings that need more examples than the minimum of three (inflection and policy heavy).
DEEP = {"R5", "R11", "R12", "R13", "R14", "R15", "R16", "R18", "R22", "R23"}


def _all_cases() -> list[Any]:
    return [pytest.param(*p.values, id=p.id) for table in TABLES.values() for p in table]


def test_every_reading_has_worked_dutch_examples() -> None:
    assert sorted(TABLES, key=lambda r: int(r[1:])) == [f"R{i}" for i in range(1, 24)]
    for rid, table in TABLES.items():
        assert len(table) >= (6 if rid in DEEP else 3), rid
        assert all(p.id.startswith(f"{rid}-nl-") for p in table), rid


def test_the_clocks_and_CLDR_facts_the_tables_use() -> None:
    # stdlib date.weekday(); CLDR 49 via babel: NL weeks start on Monday, weekend Saturday-Sunday,
    # numeric dates day first in nl and nl_BE; tzdata: Amsterdam and Brussels keep Berlin's
    # offsets on every clock used here, so the shared oracles' instants print the same.
    assert (NOW.weekday(), SATURDAY.weekday(), SUNDAY.weekday(), MONDAY_AFTER.weekday()) == (2, 5, 6, 0)
    assert _NL_FIRST == MO and nl_weekend() == (SA, 2)
    assert numeric_order("nl") == "DM" and numeric_order("nl_BE") == "DM"
    assert week_53_monday(2026) is not None
    for clock in (AMS_NOW, SATURDAY, SUNDAY, MONDAY_AFTER, MONTH_END, JANUARY_END, LEAP_DAY, MID_JANUARY,
                  BEFORE_LEAP_DAY, MARCH_FIRST, SPRING, MORNING_SPRING, BEFORE_SPRING, AUTUMN, QUARTER_PAST,
                  BRUSSELS_NOW):
        assert clock.utcoffset() == clock.replace(tzinfo=BERLIN).utcoffset(), clock
    assert AMS_NOW == NOW


@pytest.mark.parametrize(PARAMS, _all_cases())
def test_dutch_phrase_resolves_to_its_interval(question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, _all_cases())
def test_every_dutch_alternative_names_a_policy_that_selects_it_or_none(
        question, phrase, reading, bounds, value, alts, context):
    m = one(question, **context)
    for a in m.alternatives:
        if a.policy is None:
            continue
        key, _, setting = a.policy.partition("=")
        chosen = one(question, **{**context, key: setting})
        assert (chosen.start, chosen.end) == (a.start, a.end), a.policy


def test_the_locale_file_reads_last_weekday_as_the_nearest_one() -> None:
    # common practice: "afgelopen maandag" is the nearest Monday before today (locales/nl.toml).
    assert load_locale("nl").meta.weekday_reading == "nearest"


# --- D: lengths of time after a cue -----------------------------------------------------------

DURATIONS = [
    ("D-nl-langer-dan-3-dagen", "Tickets die langer dan 3 dagen open staan", "3 dagen", "P3D"),
    ("D-nl-al-twee-weken", "Tickets die al twee weken open staan", "twee weken", "P2W"),
    ("D-nl-3-dagen-lang", "Het project lag 3 dagen lang stil", "3 dagen lang", "P3D"),
    ("D-nl-meer-dan-24-uur", "Reviews die meer dan 24 uur duren", "meer dan 24 uur", "PT24H"),
    ("D-nl-ouder-dan-een-week", "Tickets ouder dan een week", "een week", "P1W"),
]


@pytest.mark.parametrize(("question", "phrase", "value"), [d[1:] for d in DURATIONS],
                         ids=[d[0] for d in DURATIONS])
def test_D_a_count_of_units_after_a_cue_is_a_duration(question, phrase, value):
    # ISO 8601 durations; cue words ("langer dan", "al") stay in the question.
    m = one(question)
    assert (m.text, m.kind, m.reading, m.value) == (phrase, "duration", "D", value)
    assert m.start is None and m.end is None


# --- policies ---------------------------------------------------------------------------------

POLICY_FLIPS = [
    ("R12-nl-bias-future-in-maart", "Bugs in maart", {}, ("bias", "future", "past")),
    ("R12-nl-bias-future-op-3-december", "Uitgebracht op 3 december", {}, ("bias", "future", "past")),
    ("R13-nl-bias-future-op-maandag", "Bugs op maandag", {}, ("bias", "future", "past")),
    ("R20-nl-bias-future-week-48", "Tickets in week 48", {}, ("bias", "future", "past")),
    ("R23-nl-bias-future-in-het-weekend", "Wat is er in het weekend kapotgegaan?", {}, ("bias", "future", "past")),
    ("R7-nl-bias-future-sinds-maart", "Bugs sinds maart", {}, ("bias", "future", "past")),
    ("R11-nl-bias-future-tussen-maart-en-mei", "Bugs tussen maart en mei", {}, ("bias", "future", "past")),
    ("R5-nl-window-calendar-de-afgelopen-3-maanden", "Tickets van de afgelopen 3 maanden", {},
     ("window_reading", "calendar", "rolling")),
    ("R5-nl-window-calendar-de-afgelopen-week", "Bugs van de afgelopen week", {},
     ("window_reading", "calendar", "rolling")),
    ("R6-nl-window-calendar-in-de-komende-3-dagen", "Wat moet in de komende 3 dagen af?", {},
     ("window_reading", "calendar", "rolling")),
    ("R14-nl-weekday-week-afgelopen-maandag", "Wat is er afgelopen maandag kapotgegaan?", {},
     ("weekday_reading", "week", "nearest")),
    ("R15-nl-weekday-week-volgende-donderdag", "Gepland volgende donderdag", {},
     ("weekday_reading", "week", "nearest")),
    ("R18-nl-date-order-MDY", "Opgelost op 03-04-2026", {}, ("date_order", "MDY", "DMY")),
    ("R18-nl_BE-date-order-MDY", "Opgelost op 03/04/2026", {"locale": "nl_BE"}, ("date_order", "MDY", "DMY")),
]


@pytest.mark.parametrize(("question", "base", "setting"), [p[1:] for p in POLICY_FLIPS],
                         ids=[p[0] for p in POLICY_FLIPS])
def test_a_policy_flips_the_dutch_reading_and_the_old_one_becomes_the_alternative(question, base, setting):
    key, new, old = setting
    before_ = one(question, **base)
    after_ = one(question, **base, **{key: new})
    offered = [a for a in before_.alternatives if a.policy == f"{key}={new}"]
    assert len(offered) == 1
    assert (after_.start, after_.end, after_.reading) == (offered[0].start, offered[0].end, offered[0].reading)
    assert (after_.start, after_.end) != (before_.start, before_.end)
    back = [a for a in after_.alternatives if a.policy == f"{key}={old}"]
    assert [(a.start, a.end, a.reading) for a in back] == [(before_.start, before_.end, before_.reading)]


def test_numeric_dates_follow_the_context_locale_nl_against_en_US() -> None:
    # CLDR 49 via babel: nl writes dd-MM-y (day first), en_US M/d/yy (month first).
    assert numeric_order("nl") == "DM" and numeric_order("en_US") == "MD"
    nl = one("Opgelost op 03-04-2026")
    us = one("Opgelost op 03-04-2026", locale="en_US")
    assert (nl.start, nl.end) == day(read_nl(3, 4, 2026))
    assert (us.start, us.end) == day(date(2026, 3, 4))


# --- Dutch and English in one question --------------------------------------------------------

MIXED = [
    ("MIX-nl-en-tickets-van-vorige-week", "tickets van vorige week", "van vorige week", "nl",
     nl_week(TODAY + D(weeks=-1))),
    ("MIX-nl-en-bugs-sinds-maandag", "show bugs sinds maandag", "sinds maandag", "nl", since(_MONDAY_PAST)),
    ("MIX-nl-en-last-week-in-Dutch", "Welke bugs zijn last week aangemaakt?", "last week", "en",
     nl_week(TODAY + D(weeks=-1))),
    ("MIX-nl-en-since-afgelopen-maandag", "tickets closed since afgelopen maandag",
     "since afgelopen maandag", "en", since(day(strictly_before(TODAY, MO)))),
    ("MIX-nl-en-created-3-dagen-geleden", "show tickets created 3 dagen geleden", "3 dagen geleden", "nl",
     day(TODAY + D(days=-3))),
    ("MIX-nl-en-tussen-March-en-mei", "bugs tussen March en mei", "tussen March en mei", "nl",
     joined(month(2026, 3), month(2026, 5))),
    ("MIX-nl-en-deploys-in-het-weekend", "deploys in het weekend", "in het weekend", "nl",
     weekend(last_ended_weekend(TODAY))),
    ("MIX-nl-en-fouten-since-yesterday", "fouten since yesterday", "since yesterday", "en",
     since(day(TODAY + D(days=-1)))),
    ("MIX-nl-en-PRs-merged-in-week-48", "PRs gemerged in week 48", "in week 48", "en",
     iso_week(_recent_week(48), 48)),
    ("MIX-nl-en-velocity-vorig-kwartaal", "velocity vorig kwartaal", "vorig kwartaal", "nl",
     quarter_of(TODAY + D(months=-3))),
    ("MIX-nl-en-due-uiterlijk-vrijdag", "which tickets are due uiterlijk vrijdag", "uiterlijk vrijdag", "nl",
     until(day(on_or_after(TODAY, FR)))),
]


@pytest.mark.parametrize(("question", "phrase", "lang", "bounds"), [m[1:] for m in MIXED],
                         ids=[m[0] for m in MIXED])
def test_a_question_mixing_dutch_and_english_finds_the_phrase_in_either(question, phrase, lang, bounds):
    m = one(question, languages=("nl", "en"))
    assert (m.text, m.lang, (m.start, m.end)) == (phrase, lang, bounds)


def test_a_dutch_and_an_english_phrase_in_one_question_are_both_found() -> None:
    result = run("bugs opened last week en gisteren gesloten", languages=("nl", "en"))
    assert [(m.text, m.lang) for m in result.mentions] == [("last week", "en"), ("gisteren", "nl")]
    assert [(m.start, m.end) for m in result.mentions] == [nl_week(TODAY + D(weeks=-1)), day(TODAY + D(days=-1))]


# --- look-alikes (reading N) ------------------------------------------------------------------

TRAPS = [
    ("N-nl-maar-is-no-maart", "Maar welke tickets zijn nog open?"),
    ("N-nl-zo-is-no-zondag", "Zo veel open bugs?"),
    ("N-nl-tot-zo", "Ik kijk ernaar, tot zo"),
    ("N-nl-ma-is-no-maandag", "Welke tickets heeft ma aangemaakt?"),
    ("N-nl-elke-morgen", "Welke jobs draaien elke morgen?"),
    ("N-nl-de-hele-morgen", "Wie heeft de hele morgen aan het ticket gewerkt?"),
    ("N-nl-in-de-morgen", "Wat draait er in de morgen?"),
    ("N-nl-goedemorgen", "Goedemorgen, welke bugs staan open?"),
    ("N-nl-goede-morgen", "Goede morgen, welke bugs staan open?"),
    ("N-nl-s-morgens", "Welke jobs draaien 's morgens?"),
    ("N-nl-mogen-is-no-morgen", "Welke tickets mogen dicht?"),
    ("N-nl-zorgen-is-no-morgen", "Wie gaat zorgen voor de release?"),
    ("N-nl-volgens-is-no-volgend", "Welke tickets zijn volgens de planning klaar?"),
    ("N-nl-om-3-uur-clock-time", "Welke jobs draaien om 3 uur?"),
    ("N-nl-tot-17-uur-clock-time", "Wie heeft dienst tot 17 uur?"),
    ("N-nl-van-9-tot-17-uur", "Wie is bereikbaar van 9 tot 17 uur?"),
    ("N-nl-de-volgende-dag", "Welke tickets zijn de volgende dag gesloten?"),
    ("N-nl-de-afgelopen-weken-no-number", "Welke bugs waren er de afgelopen weken?"),
    ("N-nl-maandags-recurring", "Welke jobs draaien maandags?"),
    ("N-nl-Jan-person", "Wie bekijkt de tickets van Jan?"),
    ("N-nl-Augustus-person", "Wat heeft Augustus gedaan?"),
    ("N-nl-tweede-build", "De tweede build is mislukt"),
    ("N-nl-eerste-fout", "De eerste fout in het log"),
    ("N-nl-volgende-stappen", "De volgende stappen voor het team"),
    ("N-nl-laatste-opmerking", "De laatste opmerking bij het ticket"),
    ("N-nl-per-dag", "Hoeveel tickets zijn het per dag?"),
    ("N-nl-dag-greeting", "Dag team, welke bugs staan open?"),
    ("N-nl-prioriteit-2", "Tickets met prioriteit 2"),
    ("N-nl-versie-2025.1", "Bugs in versie 2025.1"),
    ("N-nl-ticket-2025", "Wie is eigenaar van ticket 2025?"),
    ("N-nl-top-10", "De top 10 behandelaars"),
    ("N-nl-5-punten", "Taken met 5 punten"),
    ("N-nl-sprint-12", "Fouten in sprint 12"),
    ("N-nl-bug-2024", "Wie heeft bug 2024 gemeld?"),
    ("N-nl-ticket-key", "Status van WRN-2025"),
    ("N-nl-meer-dan-2025-tickets", "Hebben we meer dan 2025 tickets?"),
    ("N-nl-foutcode-404", "Meldingen met foutcode 404"),
    ("N-nl-pagina-3", "Pagina 3 van het rapport"),
    ("N-nl-fraction", "3/4 van de tests slaagt"),
    ("N-nl-bare-2025-no-cue", "2025 tickets staan open"),
    ("N-nl-meisje-no-mei", "Het meisje meldde een bug"),
    ("N-nl-weekblad", "Wie schrijft het weekblad?"),
]


@pytest.mark.parametrize(("question",), [(q,) for _, q in TRAPS], ids=[i for i, _ in TRAPS])
def test_a_dutch_look_alike_gives_no_temporal_mention(question):
    result = run(question)
    assert result.mentions == ()
    assert result.rewritten == question


def test_there_are_at_least_twenty_five_dutch_traps():
    assert len(TRAPS) >= 25
    assert len({q for _, q in TRAPS}) == len(TRAPS)


def test_the_nth_weekday_of_a_period_is_not_read_as_a_single_weekday():
    # "de laatste maandag van de maand" is no reading nlnorm has; no mention beats a wrong one.
    assert run("Welke tickets zijn op de laatste maandag van de maand aangemaakt?").mentions == ()
    assert run("Wat gebeurt er op de eerste vrijdag in het kwartaal?").mentions == ()


PAIRS = [
    ("N-nl-maar-vs-in-maart", "Maar welke tickets zijn nog open?", "Welke tickets zijn in maart open?",
     "in maart"),
    ("N-nl-elke-morgen-vs-morgen", "Welke jobs draaien elke morgen?", "Welke jobs draaien morgen?", "morgen"),
    ("N-nl-mogen-vs-morgen", "Welke tickets mogen dicht?", "Welke tickets moeten morgen dicht?", "morgen"),
    ("N-nl-om-3-uur-vs-over-3-uur", "Welke jobs draaien om 3 uur?", "Welke jobs draaien over 3 uur?",
     "over 3 uur"),
    ("N-nl-de-volgende-dag-vs-volgende-week", "Welke tickets zijn de volgende dag gesloten?",
     "Welke tickets worden volgende week gesloten?", "volgende week"),
    ("N-nl-Jan-vs-14-jan-2026", "Wie bekijkt de tickets van Jan?", "Tickets van 14 jan 2026",
     "van 14 jan 2026"),
    ("N-nl-ticket-2025-vs-in-2025", "Wie is eigenaar van ticket 2025?", "Tickets in 2025", "in 2025"),
    ("N-nl-laatste-opmerking-vs-vorige-week", "De laatste opmerking bij het ticket",
     "De laatste opmerking van vorige week", "van vorige week"),
]


@pytest.mark.parametrize(("trap", "temporal", "phrase"), [p[1:] for p in PAIRS], ids=[p[0] for p in PAIRS])
def test_the_same_dutch_word_is_a_time_word_only_where_the_question_makes_it_one(trap, temporal, phrase):
    assert run(trap).mentions == ()
    assert one(temporal).text == phrase


MIXED_TRAPS = [
    ("N-nl-maar-beside-sinds-mei", "Maar welke tickets staan sinds mei open?", "sinds mei"),
    ("N-nl-goedemorgen-beside-gisteren", "Goedemorgen, wat is er gisteren kapotgegaan?", "gisteren"),
    ("N-nl-prioriteit-beside-3-dagen-geleden", "Tickets met prioriteit 2 van 3 dagen geleden",
     "van 3 dagen geleden"),
    ("N-nl-versie-beside-ISO-date", "Bugs in versie 2025.1 sinds 2025-03-14", "sinds 2025-03-14"),
    ("N-nl-om-3-uur-beside-gisteren", "Welke jobs draaiden gisteren om 3 uur?", "gisteren"),
]


@pytest.mark.parametrize(("question", "phrase"), [m[1:] for m in MIXED_TRAPS], ids=[m[0] for m in MIXED_TRAPS])
def test_a_dutch_look_alike_beside_a_time_phrase_stays_out_of_the_mention(question, phrase):
    m = one(question)
    assert m.text == phrase
    assert question[m.char_start : m.char_end] == phrase
