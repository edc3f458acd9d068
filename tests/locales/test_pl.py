"""Polish: worked examples for every reading R1-R23 and D, the policies, numeric dates in the
CLDR order of ``pl``, questions mixing Polish and English, and look-alike words (reading N).

Checked against:
- python-dateutil ``relativedelta``: weekday steps, day, week, month and year arithmetic with
  month-end clamping; stdlib ``calendar``; ISO 8601 week dates via ``date.fromisocalendar``;
- CLDR 49 via babel 2.19: Polish day-period rules (``Locale("pl").day_period_rules``: rano
  06:00-10:00, przed południem 10:00-12:00, po południu 12:00-18:00, wieczór 18:00-21:00, noc
  21:00-06:00), the week data of the territory PL (``first_week_day``,
  ``weekend_start``/``weekend_end``) and the order of numeric dates
  (``babel.dates.get_date_format("short", locale="pl")``, day first);
- the IANA tz database via stdlib zoneinfo + tzdata (Berlin and Warsaw daylight-saving changes);
- the questions and phrases are written from knowledge of the language (no published source);
- common practice (no published source): "w zeszły poniedziałek" / "w przyszły czwartek" mean
  that day of last / next week (locales/pl.toml ``weekday_reading = "week"``); "do X" takes X
  in ("do piątku" = by the end of Friday); "od X do Y" and "między X a Y" take both ends in;
  "przed rokiem" / "sprzed tygodnia" mean a year / a week ago; "kilka" (a few) is read as 3 and
  "parę" (a couple) as 2, as English "a few" and "a couple of" are.
"""

from __future__ import annotations

from datetime import date, datetime
from typing import Any
from zoneinfo import ZoneInfo

import pytest
from dateutil.relativedelta import FR, MO, SA, SU, TH, TU, WE

from nlnorm import Context, normalize
from nlnorm.locale import load_locale
from tests.helpers import BERLIN, NOW, TODAY
from tests.locales import slavic_oracles as so
from tests.locales.slavic_oracles import (
    BEFORE_LEAP_DAY, CAL, FUT, JANUARY_END, LEAP_DAY, MID_JANUARY, MONDAY_AFTER, MONTH_END,
    NEAREST, PARAMS, PAST, QUARTER_PAST, ROLL, SATURDAY, SPRING_BERLIN, SUNDAY, WEEK, D, Runner,
    all_cases, case, check_tables, first_weekday, other_order_policy,
)
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
    strictly_after,
    strictly_before,
    until,
    wall,
    week,
    week_53_monday,
    week_start,
    year,
)

LOCALE = "pl"
PL = Runner("pl", LOCALE)
WARSAW = ZoneInfo("Europe/Warsaw")
#: Wednesday 2 December 2026, 10:00 in Warsaw; Warsaw clocks went 02:00 -> 03:00 on 2026-03-29.
WARSAW_NOW = datetime(2026, 12, 2, 10, 0, tzinfo=WARSAW)
SPRING_WARSAW = datetime(2026, 3, 29, 12, 0, tzinfo=WARSAW)
_PL_FIRST = first_weekday(LOCALE)


def period(d: date, pid: str, tz: ZoneInfo = BERLIN) -> tuple[str, str]:
    return so.period(LOCALE, d, pid, tz)


def weekend(first: date) -> tuple[str, str]:
    return so.weekend(LOCALE, first)


def last_ended_weekend(today: date) -> date:
    return so.last_ended_weekend(LOCALE, today)


def first_open_weekend(today: date) -> date:
    return so.first_open_weekend(LOCALE, today)


def pl_week(d: date) -> tuple[str, str]:
    return so.locale_week(LOCALE, d)


def one(question: str, **context: Any):  # type: ignore[no-untyped-def]
    return PL.one(question, **context)


def run(question: str, **context: Any):  # type: ignore[no-untyped-def]
    return PL.run(question, **context)


R1 = [
    case("R1-pl-wczoraj", "Jakie błędy zamknięto wczoraj?", "wczoraj", "R1", day(TODAY + D(days=-1)),
         (TODAY + D(days=-1)).isoformat()),
    case("R1-pl-dzisiaj", "Co zrobiliśmy dzisiaj?", "dzisiaj", "R1", day(TODAY), TODAY.isoformat()),
    case("R1-pl-dzis-short-form", "Co wdrożono dziś?", "dziś", "R1", day(TODAY)),
    case("R1-pl-jutro", "Co trzeba oddać jutro?", "jutro", "R1", day(TODAY + D(days=1))),
    case("R1-pl-przedwczoraj", "Co ponownie otwarto przedwczoraj?", "przedwczoraj", "R1",
         day(TODAY + D(days=-2))),
    case("R1-pl-na-pojutrze", "Jakie zadania są na pojutrze?", "na pojutrze", "R1", day(TODAY + D(days=2))),
    case("R1-pl-na-dzien-dzisiejszy", "Stan na dzień dzisiejszy", "na dzień dzisiejszy", "R1", day(TODAY)),
    case("R1-pl-z-wczorajszego-dnia", "Raport z wczorajszego dnia", "z wczorajszego dnia", "R1",
         day(TODAY + D(days=-1))),
]

R2 = [
    case("R2-pl-w-zeszlym-tygodniu", "Jakie błędy zgłoszono w zeszłym tygodniu?", "w zeszłym tygodniu",
         "R2", pl_week(TODAY + D(weeks=-1)), iso_week_name(TODAY + D(weeks=-1))),
    case("R2-pl-w-tym-tygodniu", "Ile zadań zamknięto w tym tygodniu?", "w tym tygodniu", "R2",
         pl_week(TODAY), iso_week_name(TODAY)),
    case("R2-pl-w-przyszlym-tygodniu", "Co planujemy w przyszłym tygodniu?", "w przyszłym tygodniu",
         "R2", pl_week(TODAY + D(weeks=1))),
    case("R2-pl-za-zeszly-tydzien", "Pokaż zadania za zeszły tydzień", "za zeszły tydzień", "R2",
         pl_week(TODAY + D(weeks=-1))),
    case("R2-pl-w-ubieglym-miesiacu-at-a-month-end", "Jakie błędy naprawiono w ubiegłym miesiącu?",
         "w ubiegłym miesiącu", "R2", month_of(MONTH_END.date() + D(months=-1)), "2026-02", now=MONTH_END),
    case("R2-pl-w-tym-kwartale", "Kto zamknął najwięcej ticketów w tym kwartale?", "w tym kwartale",
         "R2", quarter_of(TODAY), "2026-Q4"),
    case("R2-pl-w-poprzednim-kwartale", "Velocity w poprzednim kwartale", "w poprzednim kwartale", "R2",
         quarter_of(TODAY + D(months=-3)), "2026-Q3"),
    case("R2-pl-na-przyszly-rok", "Epiki na przyszły rok", "na przyszły rok", "R2", year(TODAY.year + 1), "2027"),
    case("R2-pl-w-biezacym-roku", "Releasy w bieżącym roku", "w bieżącym roku", "R2", year(TODAY.year)),
    case("R2-pl-z-zeszlego-miesiaca", "Błędy z zeszłego miesiąca", "z zeszłego miesiąca", "R2",
         month_of(TODAY + D(months=-1))),
    case("R2-pl-w-zeszlym-tygodniu-sunday-weeks-on-a-Sunday", "Tickety zamknięte w zeszłym tygodniu",
         "w zeszłym tygodniu", "R2", week(SUNDAY.date() + D(weeks=-1), SU), "2026-11-29/P1W",
         now=SUNDAY, week_start="sunday"),
]

R3 = [
    case("R3-pl-pol-roku-temu-is-6-months", "Co zamknięto pół roku temu", "pół roku temu", "R3",
         month_of(TODAY + D(months=-6)), (TODAY + D(months=-6)).strftime("%Y-%m")),
    case("R3-pl-3-dni-temu", "Błędy otwarte 3 dni temu", "3 dni temu", "R3", day(TODAY + D(days=-3))),
    case("R3-pl-piec-dni-temu", "Błędy otwarte pięć dni temu", "pięć dni temu", "R3", day(TODAY + D(days=-5))),
    case("R3-pl-dwa-tygodnie-temu", "Co się zepsuło dwa tygodnie temu", "dwa tygodnie temu", "R3",
         pl_week(TODAY + D(weeks=-2)), iso_week_name(TODAY + D(weeks=-2))),
    case("R3-pl-miesiac-temu-at-a-month-end", "Co zmergowano miesiąc temu", "miesiąc temu", "R3",
         month_of((MONTH_END + D(months=-1)).date()), "2026-02", now=MONTH_END),
    case("R3-pl-rok-temu", "Otwarte błędy rok temu", "rok temu", "R3", year(TODAY.year - 1), "2025"),
    case("R3-pl-przed-rokiem", "Otwarte błędy przed rokiem", "przed rokiem", "R3", year(TODAY.year - 1)),
    case("R3-pl-przed-3-dniami", "Co wdrożono przed 3 dniami", "przed 3 dniami", "R3", day(TODAY + D(days=-3))),
    case("R3-pl-sprzed-tygodnia", "Błędy sprzed tygodnia", "sprzed tygodnia", "R3", pl_week(TODAY + D(weeks=-1))),
    case("R3-pl-2-godziny-temu", "Alerty 2 godziny temu", "2 godziny temu", "R3", hour_of(moved(NOW, hours=-2))),
    case("R3-pl-kilka-dni-temu-is-3", "Co zamknięto kilka dni temu", "kilka dni temu", "R3",
         day(TODAY + D(days=-3))),
]

R4 = [
    case("R4-pl-za-3-dni", "Co trzeba oddać za 3 dni", "za 3 dni", "R4", day(TODAY + D(days=3))),
    case("R4-pl-za-dwa-tygodnie", "Co trzeba oddać za dwa tygodnie", "za dwa tygodnie", "R4",
         pl_week(TODAY + D(weeks=2)), iso_week_name(TODAY + D(weeks=2))),
    case("R4-pl-za-miesiac-from-January-31", "Co się odnawia za miesiąc", "za miesiąc", "R4",
         month_of((JANUARY_END + D(months=1)).date()), "2026-02", now=JANUARY_END),
    case("R4-pl-za-2-godziny", "Jakie joby ruszą za 2 godziny", "za 2 godziny", "R4",
         hour_of(moved(NOW, hours=2))),
    case("R4-pl-za-rok", "Umowy kończące się za rok", "za rok", "R4", year(TODAY.year + 1)),
    case("R4-pl-za-pare-dni", "Release za parę dni", "za parę dni", "R4", day(TODAY + D(days=2))),
]

_THIS_MONTH = TODAY.replace(day=1)
_THIS_WEEK = week_start(TODAY)

R5 = [
    case("R5-pl-przez-ostatnie-pol-roku", "Incydenty przez ostatnie pół roku", "przez ostatnie pół roku",
         "R5", (wall(NOW, months=-6), iso(NOW)), alts=(alt("R5", CAL, _cal_back(NOW, _THIS_MONTH, 6, "months")),)),
    case("R5-pl-w-ostatnich-7-dniach", "Błędy w ostatnich 7 dniach", "w ostatnich 7 dniach", "R5",
         (wall(NOW, days=-7), iso(NOW)), alts=(alt("R5", CAL, _cal_back(NOW, TODAY, 7, "days")),)),
    case("R5-pl-przez-ostatnie-trzy-dni", "Błędy przez ostatnie trzy dni", "przez ostatnie trzy dni",
         "R5", (wall(NOW, days=-3), iso(NOW)), alts=(alt("R5", CAL, _cal_back(NOW, TODAY, 3, "days")),)),
    case("R5-pl-z-ostatnich-dwoch-tygodni", "Błędy z ostatnich dwóch tygodni", "z ostatnich dwóch tygodni",
         "R5", (wall(NOW, weeks=-2), iso(NOW)),
         alts=(alt("R5", CAL, _cal_back(NOW, _THIS_WEEK, 2, "weeks")),)),
    case("R5-pl-ostatnie-3-miesiace", "Tickety zamknięte ostatnie 3 miesiące", "ostatnie 3 miesiące",
         "R5", (wall(NOW, months=-3), iso(NOW)),
         alts=(alt("R5", CAL, _cal_back(NOW, _THIS_MONTH, 3, "months")),)),
    case("R5-pl-przez-ostatni-miesiac-no-N", "Komentarze przez ostatni miesiąc", "przez ostatni miesiąc",
         "R5", (wall(NOW, months=-1), iso(NOW)),
         alts=(alt("R5", CAL, _cal_back(NOW, _THIS_MONTH, 1, "months")),)),
    case("R5-pl-w-ostatnim-tygodniu", "Co zamknięto w ostatnim tygodniu", "w ostatnim tygodniu", "R5",
         (wall(NOW, weeks=-1), iso(NOW)), alts=(alt("R5", CAL, _cal_back(NOW, _THIS_WEEK, 1, "weeks")),)),
    case("R5-pl-w-ciagu-ostatniej-doby", "Błędy w ciągu ostatniej doby", "w ciągu ostatniej doby", "R5",
         (wall(NOW, days=-1), iso(NOW)), alts=(alt("R5", CAL, _cal_back(NOW, TODAY, 1, "days")),)),
    case("R5-pl-3-ostatnie-dni-number-first", "Commity 3 ostatnie dni", "3 ostatnie dni", "R5",
         (wall(NOW, days=-3), iso(NOW)), alts=(alt("R5", CAL, _cal_back(NOW, TODAY, 3, "days")),)),
    case("R5-pl-w-minionych-2-latach-from-a-leap-day", "Incydenty w minionych 2 latach",
         "w minionych 2 latach", "R5", (wall(LEAP_DAY, years=-2), iso(LEAP_DAY)),
         alts=(alt("R5", CAL, _cal_back(LEAP_DAY, date(2028, 1, 1), 2, "years")),), now=LEAP_DAY),
    case("R5-pl-ostatnie-24-godziny-is-24-real-hours-Warsaw-spring", "Błędy z ostatnich 24 godzin",
         "z ostatnich 24 godzin", "R5", (elapsed(SPRING_WARSAW, hours=-24), iso(SPRING_WARSAW)),
         now=SPRING_WARSAW),
    case("R5-pl-ostatnie-2-godziny-off-the-hour", "Deploye w ostatnich 2 godzinach",
         "w ostatnich 2 godzinach", "R5", (elapsed(QUARTER_PAST, hours=-2), iso(QUARTER_PAST)),
         alts=(alt("R5", CAL, (elapsed(floor_hour(QUARTER_PAST), hours=-2), iso(floor_hour(QUARTER_PAST)))),),
         now=QUARTER_PAST),
    case("R5-pl-calendar-policy-reads-whole-days", "Błędy w ostatnich 7 dniach", "w ostatnich 7 dniach",
         "R5", _cal_back(NOW, TODAY, 7, "days"), alts=(alt("R5", ROLL, (wall(NOW, days=-7), iso(NOW))),),
         window_reading="calendar"),
]

R6 = [
    case("R6-pl-w-najblizszych-3-dniach", "Co zrobić w najbliższych 3 dniach", "w najbliższych 3 dniach",
         "R6", (iso(NOW), wall(NOW, days=3)), alts=(alt("R6", CAL, _cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-pl-w-ciagu-nastepnych-dwoch-tygodni", "Co wyjdzie w ciągu następnych dwóch tygodni",
         "w ciągu następnych dwóch tygodni", "R6", (iso(NOW), wall(NOW, weeks=2)),
         alts=(alt("R6", CAL, _cal_ahead(NOW, _THIS_WEEK, 2, "weeks")),)),
    case("R6-pl-w-ciagu-3-dni", "Naprawić w ciągu 3 dni", "w ciągu 3 dni", "R6",
         (iso(NOW), wall(NOW, days=3)), alts=(alt("R6", CAL, _cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-pl-w-najblizszym-miesiacu-no-N", "Co wyjdzie w najbliższym miesiącu",
         "w najbliższym miesiącu", "R6", (iso(NOW), wall(NOW, months=1)),
         alts=(alt("R6", CAL, _cal_ahead(NOW, _THIS_MONTH, 1, "months")),)),
    case("R6-pl-kolejne-6-godzin", "Joby na kolejne 6 godzin", "na kolejne 6 godzin", "R6",
         (iso(NOW), elapsed(NOW, hours=6)),
         alts=(alt("R6", CAL, (elapsed(floor_hour(NOW), hours=1), elapsed(floor_hour(NOW), hours=7))),)),
    case("R6-pl-calendar-policy-reads-whole-days", "Co zrobić w najbliższych 3 dniach",
         "w najbliższych 3 dniach", "R6", _cal_ahead(NOW, TODAY, 3, "days"),
         alts=(alt("R6", ROLL, (iso(NOW), wall(NOW, days=3))),), window_reading="calendar"),
]

_MARCH_PAST = month(most_recent_year(lambda y: date(y, 3, 1)), 3)
_MARCH_NEXT = month(next_year_after(lambda y: date(y, 4, 1)), 3)
_MONDAY_PAST = day(on_or_before(TODAY, MO))
_MONDAY_NEXT = day(on_or_after(TODAY, MO))

R7 = [
    case("R7-pl-od-zeszlego-tygodnia", "Co wdrożyliśmy od zeszłego tygodnia", "od zeszłego tygodnia", "R7",
         since(pl_week(TODAY + D(weeks=-1))), "2026-11-23/.."),
    case("R7-pl-od-marca", "Błędy zamknięte od marca", "od marca", "R7", since(_MARCH_PAST), "2026-03-01/..",
         alts=(alt("R7", FUT, since(_MARCH_NEXT)),)),
    case("R7-pl-od-1-marca", "Błędy od 1 marca", "od 1 marca", "R7", since(day(date(2026, 3, 1))),
         alts=(alt("R7", FUT, since(day(date(2027, 3, 1)))),)),
    case("R7-pl-od-2024-roku", "Tickety otwarte od 2024 roku", "od 2024 roku", "R7", since(year(2024)),
         "2024-01-01/.."),
    case("R7-pl-od-wczoraj", "Komentarze od wczoraj", "od wczoraj", "R7", since(day(TODAY + D(days=-1)))),
    case("R7-pl-od-poniedzialku", "Commity od poniedziałku", "od poniedziałku", "R7", since(_MONDAY_PAST),
         alts=(alt("R7", FUT, since(_MONDAY_NEXT)),)),
    case("R7-pl-poczawszy-od-1-marca-2025-r", "Deploye począwszy od 1 marca 2025 r.",
         "począwszy od 1 marca 2025 r.", "R7", since(day(date(2025, 3, 1))), "2025-03-01/.."),
    case("R7-pl-od-poczatku-zeszlego-roku", "Incydenty od początku zeszłego roku",
         "od początku zeszłego roku", "R7", since(year(TODAY.year - 1))),
    case("R7-pl-od-1-marca-i-pozniej", "Releasy od 1 marca 2026 i później", "od 1 marca 2026 i później",
         "R7", since(day(date(2026, 3, 1)))),
]

R8 = [
    case("R8-pl-po-marcu-locative", "Błędy otwarte po marcu", "po marcu", "R8", after(_MARCH_PAST),
         "2026-04-01/..", alts=(alt("R8", FUT, after(_MARCH_NEXT)),)),
    case("R8-pl-po-2025-roku", "Tickety z terminem po 2025 roku", "po 2025 roku", "R8", after(year(2025))),
    case("R8-pl-po-zeszlym-tygodniu", "Otwarte ponownie po zeszłym tygodniu", "po zeszłym tygodniu",
         "R8", after(pl_week(TODAY + D(weeks=-1)))),
    case("R8-pl-pozniej-niz-1-marca-2025", "Komentarze później niż 1 marca 2025",
         "później niż 1 marca 2025", "R8", after(day(date(2025, 3, 1)))),
    case("R8-pl-po-weekendzie", "Co się zepsuło po weekendzie", "po weekendzie", "R8",
         after(weekend(last_ended_weekend(TODAY))), alts=(alt("R8", FUT, after(weekend(first_open_weekend(TODAY)))),)),
]

R9 = [
    case("R9-pl-przed-marcem-instrumental", "Błędy otwarte przed marcem", "przed marcem", "R9",
         before(_MARCH_PAST), alts=(alt("R9", FUT, before(_MARCH_NEXT)),)),
    case("R9-pl-przed-2025-rokiem", "Tickety zamknięte przed 2025 rokiem", "przed 2025 rokiem", "R9",
         before(year(2025))),
    case("R9-pl-przed-zeszlym-tygodniem", "Wiszące jeszcze przed zeszłym tygodniem",
         "przed zeszłym tygodniem", "R9", before(pl_week(TODAY + D(weeks=-1)))),
    case("R9-pl-sprzed-marca", "Błędy sprzed marca", "sprzed marca", "R9", before(_MARCH_PAST),
         alts=(alt("R9", FUT, before(_MARCH_NEXT)),)),
    case("R9-pl-wczesniej-niz-1-marca-2025", "Komentarze wcześniej niż 1 marca 2025",
         "wcześniej niż 1 marca 2025", "R9", before(day(date(2025, 3, 1)))),
]

R10 = [
    case("R10-pl-do-piatku-deadline-looks-ahead", "Co trzeba zrobić do piątku", "do piątku", "R10",
         until(day(on_or_after(TODAY, FR))), alts=(alt("R10", None, until(day(on_or_before(TODAY, FR)))),)),
    case("R10-pl-najpozniej-do-piatku", "Co ma być gotowe najpóźniej do piątku", "najpóźniej do piątku",
         "R10", until(day(on_or_after(TODAY, FR))), alts=(alt("R10", None, until(day(on_or_before(TODAY, FR)))),)),
    case("R10-pl-az-do-marca", "Zamrożenie aż do marca", "aż do marca", "R10", until(_MARCH_PAST),
         alts=(alt("R10", FUT, until(_MARCH_NEXT)),)),
    case("R10-pl-nie-pozniej-niz-15-marca-2026", "Oddać nie później niż 15 marca 2026",
         "nie później niż 15 marca 2026", "R10", until(day(date(2026, 3, 15)))),
    case("R10-pl-do-2025-roku", "Incydenty do 2025 roku", "do 2025 roku", "R10", until(year(2025))),
    case("R10-pl-do-konca-marca", "Zamknąć do końca marca", "do końca marca", "R10", until(_MARCH_PAST),
         alts=(alt("R10", FUT, until(_MARCH_NEXT)),)),
    case("R10-pl-do-jutra", "Dyżur do jutra", "do jutra", "R10", until(day(TODAY + D(days=1)))),
]

R11 = [
    case("R11-pl-od-1-do-15-marca", "Błędy od 1 do 15 marca", "od 1 do 15 marca", "R11",
         joined(day(date(2026, 3, 1)), day(date(2026, 3, 15))),
         alts=(alt("R11", FUT, joined(day(date(2027, 3, 1)), day(date(2027, 3, 15)))),)),
    case("R11-pl-miedzy-1-a-15-marca", "Releasy między 1 a 15 marca", "między 1 a 15 marca", "R11",
         joined(day(date(2026, 3, 1)), day(date(2026, 3, 15))),
         alts=(alt("R11", FUT, joined(day(date(2027, 3, 1)), day(date(2027, 3, 15)))),)),
    case("R11-pl-od-marca-do-maja", "Błędy od marca do maja", "od marca do maja", "R11",
         joined(month(2026, 3), month(2026, 5)), alts=(alt("R11", FUT, joined(month(2027, 3), month(2027, 5))),)),
    case("R11-pl-miedzy-marcem-a-majem-instrumental", "Błędy między marcem a majem",
         "między marcem a majem", "R11", joined(month(2026, 3), month(2026, 5)),
         alts=(alt("R11", FUT, joined(month(2027, 3), month(2027, 5))),)),
    case("R11-pl-od-listopada-do-lutego-ends-next-year", "Dyżury od listopada do lutego",
         "od listopada do lutego", "R11", joined(month(2026, 11), month(2027, 2)),
         alts=(alt("R11", FUT, joined(month(2027, 11), month(2028, 2))),)),
    case("R11-pl-od-poniedzialku-do-piatku", "Commity od poniedziałku do piątku",
         "od poniedziałku do piątku", "R11",
         joined(day(on_or_before(TODAY, MO)), day(on_or_before(TODAY, MO) + D(weekday=FR))),
         alts=(alt("R11", FUT, joined(day(on_or_after(TODAY, MO)), day(on_or_after(TODAY, MO) + D(weekday=FR)))),)),
    case("R11-pl-miedzy-poniedzialkiem-a-piatkiem", "Commity między poniedziałkiem a piątkiem",
         "między poniedziałkiem a piątkiem", "R11",
         joined(day(on_or_before(TODAY, MO)), day(on_or_before(TODAY, MO) + D(weekday=FR))),
         alts=(alt("R11", FUT, joined(day(on_or_after(TODAY, MO)), day(on_or_after(TODAY, MO) + D(weekday=FR)))),)),
    case("R11-pl-od-piatku-do-poniedzialku-wraps-the-week", "Alerty od piątku do poniedziałku",
         "od piątku do poniedziałku", "R11",
         joined(day(on_or_before(TODAY, FR)), day(on_or_before(TODAY, FR) + D(weekday=MO))),
         alts=(alt("R11", FUT, joined(day(on_or_after(TODAY, FR)), day(on_or_after(TODAY, FR) + D(weekday=MO)))),)),
    case("R11-pl-od-pon-do-pt-abbreviations", "Dyżury od pon do pt", "od pon do pt", "R11",
         joined(day(on_or_before(TODAY, MO)), day(on_or_before(TODAY, MO) + D(weekday=FR))),
         alts=(alt("R11", FUT, joined(day(on_or_after(TODAY, MO)), day(on_or_after(TODAY, MO) + D(weekday=FR)))),)),
    case("R11-pl-od-1-marca-do-15-kwietnia-2026", "Wydatki od 1 marca do 15 kwietnia 2026 r.",
         "od 1 marca do 15 kwietnia 2026 r.", "R11", joined(day(date(2026, 3, 1)), day(date(2026, 4, 15)))),
    case("R11-pl-1-en-dash-15-marca", "Błędy 1\u201315 marca", "1\u201315 marca", "R11",
         joined(day(date(2026, 3, 1)), day(date(2026, 3, 15))),
         alts=(alt("R11", FUT, joined(day(date(2027, 3, 1)), day(date(2027, 3, 15)))),)),
    case("R11-pl-od-ISO-do-ISO", "Wydatki od 2025-01-01 do 2025-03-31", "od 2025-01-01 do 2025-03-31",
         "R11", joined(day(date(2025, 1, 1)), day(date(2025, 3, 31))), "2025-01-01/2025-03-31"),
    case("R11-pl-od-zeszlego-tygodnia-do-tego-tygodnia", "Błędy od zeszłego tygodnia do tego tygodnia",
         "od zeszłego tygodnia do tego tygodnia", "R11", joined(pl_week(TODAY + D(weeks=-1)), pl_week(TODAY))),
    case("R11-pl-od-2024-do-2025-roku", "Incydenty od 2024 do 2025 roku", "od 2024 do 2025 roku", "R11",
         joined(year(2024), year(2025))),
]


def _past(first_day_in: Any, today: date = TODAY) -> int:
    return most_recent_year(first_day_in, today)


def _future(end_day_in: Any, today: date = TODAY) -> int:
    return next_year_after(end_day_in, today)


_MAR14 = (_past(lambda y: date(y, 3, 14)), _future(lambda y: date(y, 3, 15)))
_DEC3 = (_past(lambda y: date(y, 12, 3)), _future(lambda y: date(y, 12, 4)))

R12 = [
    case("R12-pl-w-marcu-locative", "Błędy w marcu", "w marcu", "R12", _MARCH_PAST, "2026-03",
         alts=(alt("R12", FUT, _MARCH_NEXT),)),
    case("R12-pl-w-grudniu-current-month-counts", "Błędy w grudniu", "w grudniu", "R12",
         month(2026, 12), "2026-12"),
    case("R12-pl-w-styczniu", "Błędy w styczniu", "w styczniu", "R12", month(_past(lambda y: date(y, 1, 1)), 1),
         alts=(alt("R12", FUT, month(_future(lambda y: date(y, 2, 1)), 1)),)),
    case("R12-pl-we-wrzesniu", "Błędy we wrześniu", "we wrześniu", "R12",
         month(_past(lambda y: date(y, 9, 1)), 9), alts=(alt("R12", FUT, month(_future(lambda y: date(y, 10, 1)), 9)),)),
    case("R12-pl-w-grudniu-said-in-January", "Błędy w grudniu", "w grudniu", "R12",
         month(_past(lambda y: date(y, 12, 1), MID_JANUARY.date()), 12), "2026-12",
         alts=(alt("R12", FUT, month(_future(lambda y: date(y + 1, 1, 1), MID_JANUARY.date()), 12)),),
         now=MID_JANUARY),
    case("R12-pl-14-marca", "Wydano 14 marca", "14 marca", "R12", day(date(_MAR14[0], 3, 14)),
         "2026-03-14", alts=(alt("R12", FUT, day(date(_MAR14[1], 3, 14))),)),
    case("R12-pl-3-grudnia-is-last-year", "Wydane 3 grudnia", "3 grudnia", "R12",
         day(date(_DEC3[0], 12, 3)), "2025-12-03", alts=(alt("R12", FUT, day(date(_DEC3[1], 12, 3))),)),
    case("R12-pl-29-lutego-finds-the-last-leap-year", "Co się stało 29 lutego", "29 lutego", "R12",
         day(date(2024, 2, 29)), "2024-02-29", alts=(alt("R12", FUT, day(date(2028, 2, 29))),),
         now=BEFORE_LEAP_DAY),
    case("R12-pl-w-drugim-kwartale", "Co wydano w drugim kwartale", "w drugim kwartale", "R12",
         quarter(_past(lambda y: date(y, 4, 1)), 2), "2026-Q2",
         alts=(alt("R12", FUT, quarter(_future(lambda y: date(y, 7, 1)), 2)),)),
    case("R12-pl-w-III-kwartale-Roman", "Co wydano w III kwartale", "w III kwartale", "R12",
         quarter(_past(lambda y: date(y, 7, 1)), 3), "2026-Q3",
         alts=(alt("R12", FUT, quarter(_future(lambda y: date(y, 10, 1)), 3)),)),
    case("R12-pl-w-czwartym-kwartale-current-counts", "Co wydano w czwartym kwartale",
         "w czwartym kwartale", "R12", quarter(2026, 4), "2026-Q4"),
    case("R12-pl-w-Q3", "Co wydano w Q3", "w Q3", "R12", quarter(_past(lambda y: date(y, 7, 1)), 3),
         alts=(alt("R12", FUT, quarter(_future(lambda y: date(y, 10, 1)), 3)),)),
    case("R12-pl-w-pierwszym-polroczu", "Cele w pierwszym półroczu", "w pierwszym półroczu", "R12",
         half(_past(lambda y: date(y, 1, 1)), 1), "2026-H1",
         alts=(alt("R12", FUT, half(_future(lambda y: date(y, 7, 1)), 1)),)),
    case("R12-pl-w-drugiej-polowie-roku-current-counts", "Rekrutacja w drugiej połowie roku",
         "w drugiej połowie roku", "R12", half(2026, 2), "2026-H2"),
]

R13 = [
    case("R13-pl-w-poniedzialek", "Błędy w poniedziałek", "w poniedziałek", "R13", _MONDAY_PAST,
         on_or_before(TODAY, MO).isoformat(), alts=(alt("R13", FUT, _MONDAY_NEXT),)),
    case("R13-pl-w-srode-is-today-accusative", "Błędy w środę", "w środę", "R13", day(TODAY)),
    case("R13-pl-w-czwartek", "Błędy w czwartek", "w czwartek", "R13", day(on_or_before(TODAY, TH)),
         alts=(alt("R13", FUT, day(on_or_after(TODAY, TH))),)),
    case("R13-pl-we-wtorek", "Co się zepsuło we wtorek", "we wtorek", "R13", day(on_or_before(TODAY, TU)),
         alts=(alt("R13", FUT, day(on_or_after(TODAY, TU))),)),
    case("R13-pl-w-sobote-accusative", "Deploye w sobotę", "w sobotę", "R13", day(on_or_before(TODAY, SA)),
         alts=(alt("R13", FUT, day(on_or_after(TODAY, SA))),)),
    case("R13-pl-w-pt-abbreviation", "Deploye w pt", "w pt", "R13", day(on_or_before(TODAY, FR)),
         alts=(alt("R13", FUT, day(on_or_after(TODAY, FR))),)),
    case("R13-pl-na-poniedzialek", "Zadania na poniedziałek", "na poniedziałek", "R13", _MONDAY_PAST,
         alts=(alt("R13", FUT, _MONDAY_NEXT),)),
    case("R13-pl-w-niedziele-said-on-a-Sunday", "Błędy w niedzielę", "w niedzielę", "R13",
         day(SUNDAY.date()), now=SUNDAY),
    case("R13-pl-future-bias-flips-w-poniedzialek", "Błędy w poniedziałek", "w poniedziałek", "R13",
         _MONDAY_NEXT, alts=(alt("R13", PAST, _MONDAY_PAST),), bias="future"),
]

R14 = [
    case("R14-pl-w-zeszly-poniedzialek-nearest", "Co się zepsuło w zeszły poniedziałek",
         "w zeszły poniedziałek", "R14", day(strictly_before(TODAY, MO)),
         alts=(alt("R16", WEEK, day(in_week(TODAY, MO, -1))),), weekday_reading="nearest"),
    case("R14-pl-w-ubiegly-wtorek-is-yesterday-nearest", "Co się zepsuło w ubiegły wtorek",
         "w ubiegły wtorek", "R14", day(strictly_before(TODAY, TU)),
         alts=(alt("R16", WEEK, day(in_week(TODAY, TU, -1))),), weekday_reading="nearest"),
    case("R14-pl-w-zeszly-piatek-nearest-same-day", "Co się zepsuło w zeszły piątek", "w zeszły piątek",
         "R14", day(strictly_before(TODAY, FR)), weekday_reading="nearest"),
    case("R14-pl-w-zeszla-srode-said-on-a-Wednesday", "Co się zepsuło w zeszłą środę", "w zeszłą środę",
         "R14", day(strictly_before(TODAY, WE)), weekday_reading="nearest"),
    case("R14-pl-w-poprzedni-poniedzialek-nearest", "Co się zepsuło w poprzedni poniedziałek",
         "w poprzedni poniedziałek", "R14", day(strictly_before(TODAY, MO)),
         alts=(alt("R16", WEEK, day(in_week(TODAY, MO, -1))),), weekday_reading="nearest"),
    case("R14-pl-w-zeszla-niedziele-said-on-a-Sunday", "Co się zepsuło w zeszłą niedzielę",
         "w zeszłą niedzielę", "R14", day(strictly_before(SUNDAY.date(), SU)), now=SUNDAY,
         weekday_reading="nearest"),
]

R15 = [
    case("R15-pl-w-najblizszy-piatek-is-the-nearest-whatever-the-setting", "Demo w najbliższy piątek",
         "w najbliższy piątek", "R15", day(strictly_after(TODAY, FR)),
         alts=(alt("R16", None, day(in_week(TODAY, FR, 1))),)),
    case("R15-pl-w-przyszly-czwartek-is-tomorrow-nearest", "Co planujemy w przyszły czwartek",
         "w przyszły czwartek", "R15", day(strictly_after(TODAY, TH)),
         alts=(alt("R16", WEEK, day(in_week(TODAY, TH, 1))),), weekday_reading="nearest"),
    case("R15-pl-w-nastepny-piatek-nearest", "Demo w następny piątek", "w następny piątek", "R15",
         day(strictly_after(TODAY, FR)), alts=(alt("R16", WEEK, day(in_week(TODAY, FR, 1))),),
         weekday_reading="nearest"),
    case("R15-pl-w-przyszly-poniedzialek-nearest-same-day", "Co planujemy w przyszły poniedziałek",
         "w przyszły poniedziałek", "R15", day(strictly_after(TODAY, MO)), weekday_reading="nearest"),
    case("R15-pl-w-przyszla-srode-said-on-a-Wednesday", "Spotkanie w przyszłą środę", "w przyszłą środę",
         "R15", day(strictly_after(TODAY, WE)), weekday_reading="nearest"),
    case("R15-pl-w-przyszla-niedziele-said-on-a-Sunday", "Prace w przyszłą niedzielę",
         "w przyszłą niedzielę", "R15", day(strictly_after(SUNDAY.date(), SU)), now=SUNDAY,
         weekday_reading="nearest"),
]

R16 = [
    case("R16-pl-w-zeszly-poniedzialek-default-is-last-weeks", "Co się zepsuło w zeszły poniedziałek",
         "w zeszły poniedziałek", "R16", day(in_week(TODAY, MO, -1)), in_week(TODAY, MO, -1).isoformat(),
         alts=(alt("R14", NEAREST, day(strictly_before(TODAY, MO))),)),
    case("R16-pl-w-przyszly-czwartek-default-is-next-weeks", "Co planujemy w przyszły czwartek",
         "w przyszły czwartek", "R16", day(in_week(TODAY, TH, 1)),
         alts=(alt("R15", NEAREST, day(strictly_after(TODAY, TH))),)),
    case("R16-pl-zeszlego-wtorku-genitive", "Raport z zeszłego wtorku", "z zeszłego wtorku", "R16",
         day(in_week(TODAY, TU, -1)), alts=(alt("R14", NEAREST, day(strictly_before(TODAY, TU))),)),
    case("R16-pl-w-poniedzialek-zeszlego-tygodnia", "Co się zepsuło w poniedziałek zeszłego tygodnia",
         "w poniedziałek zeszłego tygodnia", "R16", day(in_week(TODAY, MO, -1))),
    case("R16-pl-w-piatek-w-przyszlym-tygodniu", "Demo w piątek w przyszłym tygodniu",
         "w piątek w przyszłym tygodniu", "R16", day(in_week(TODAY, FR, 1))),
    case("R16-pl-w-srode-w-tym-tygodniu", "Co było w środę w tym tygodniu", "w środę w tym tygodniu",
         "R16", day(in_week(TODAY, WE, 0))),
    case("R16-pl-w-zeszlym-tygodniu-w-poniedzialek", "Co się zepsuło w zeszłym tygodniu w poniedziałek",
         "w zeszłym tygodniu w poniedziałek", "R16", day(in_week(TODAY, MO, -1))),
    case("R16-pl-w-ten-piatek", "Demo w ten piątek", "w ten piątek", "R16", day(in_week(TODAY, FR, 0))),
    case("R16-pl-w-ten-poniedzialek-already-past", "Deploye w ten poniedziałek", "w ten poniedziałek",
         "R16", day(in_week(TODAY, MO, 0)), alts=(alt("R15", None, day(on_or_after(TODAY, MO))),)),
    case("R16-pl-w-zeszla-niedziele-sunday-weeks", "Co się zepsuło w zeszłą niedzielę",
         "w zeszłą niedzielę", "R16", day(in_week(SUNDAY.date(), SU, -1, SU)), now=SUNDAY,
         week_start="sunday"),
]

R17 = [
    case("R17-pl-w-2025-roku", "Błędy w 2025 roku", "w 2025 roku", "R17", year(2025), "2025"),
    case("R17-pl-za-2024-rok", "Raport za 2024 rok", "za 2024 rok", "R17", year(2024), "2024"),
    case("R17-pl-w-roku-2022", "Zespół w roku 2022", "w roku 2022", "R17", year(2022)),
    case("R17-pl-w-2023-r", "Awarie w 2023 r.", "w 2023 r.", "R17", year(2023)),
    case("R17-pl-w-2025-bare-year-after-w", "Zamknięte w 2025", "w 2025", "R17", year(2025)),
    case("R17-pl-za-2025-rok-beside-numbers", "Pokaż 5 zadań z priorytetem 2 za 2025 rok",
         "za 2025 rok", "R17", year(2025), "2025"),
]

_PL_03_04 = so.read_numeric(LOCALE, 3, 4, 2026)
_SWAP = {date(2026, 3, 4): date(2026, 4, 3), date(2026, 4, 3): date(2026, 3, 4)}

R18 = [
    case("R18-pl-14-marca-2025", "Naprawione 14 marca 2025", "14 marca 2025", "R18",
         day(date(2025, 3, 14)), "2025-03-14"),
    case("R18-pl-14-marca-2025-r", "Naprawione 14 marca 2025 r.", "14 marca 2025 r.", "R18",
         day(date(2025, 3, 14))),
    case("R18-pl-14-marca-2025-roku", "Naprawione 14 marca 2025 roku", "14 marca 2025 roku", "R18",
         day(date(2025, 3, 14))),
    case("R18-pl-ISO-date", "Naprawione 2025-03-14", "2025-03-14", "R18", day(date(2025, 3, 14))),
    case("R18-pl-w-piatek-14-marca-2025-r", "Naprawione w piątek, 14 marca 2025 r.",
         "w piątek, 14 marca 2025 r.", "R18", day(date(2025, 3, 14))),
    case("R18-pl-numeric-dotted-day-first-with-r", "Naprawione 14.03.2025 r.", "14.03.2025 r.", "R18",
         day(date(2025, 3, 14))),
    case("R18-pl-numeric-ambiguous-CLDR-order", "Naprawione 03.04.2026", "03.04.2026", "R18",
         day(_PL_03_04), _PL_03_04.isoformat(),
         alts=(alt("R18", other_order_policy(LOCALE), day(_SWAP[_PL_03_04])),)),
    case("R18-pl-numeric-date-order-policy-MDY", "Naprawione 03.04.2026", "03.04.2026", "R18",
         day(date(2026, 3, 4)), alts=(alt("R18", "date_order=DMY", day(date(2026, 4, 3))),),
         date_order="MDY"),
    case("R18-pl-numeric-only-one-valid-reading", "Naprawione 13.04.2026", "13.04.2026", "R18",
         day(date(2026, 4, 13))),
    case("R18-pl-numeric-two-digit-year", "Naprawione 03.04.26", "03.04.26", "R18", day(_PL_03_04),
         alts=(alt("R18", other_order_policy(LOCALE), day(_SWAP[_PL_03_04])),)),
]

R19 = [
    case("R19-pl-marzec-2025", "Błędy marzec 2025", "marzec 2025", "R19", month(2025, 3), "2025-03"),
    case("R19-pl-w-marcu-2025-roku", "Błędy w marcu 2025 roku", "w marcu 2025 roku", "R19", month(2025, 3)),
    case("R19-pl-Q3-2025", "Przychód Q3 2025", "Q3 2025", "R19", quarter(2025, 3), "2025-Q3"),
    case("R19-pl-trzeci-kwartal-2025-roku", "Przychód za trzeci kwartał 2025 roku",
         "za trzeci kwartał 2025 roku", "R19", quarter(2025, 3), "2025-Q3"),
    case("R19-pl-III-kwartal-2025-Roman", "Przychód III kwartał 2025", "III kwartał 2025", "R19",
         quarter(2025, 3)),
    case("R19-pl-w-3-kwartale-2025-r", "Przychód w 3 kwartale 2025 r.", "w 3 kwartale 2025 r.", "R19",
         quarter(2025, 3)),
    case("R19-pl-H1-2026", "Cele H1 2026", "H1 2026", "R19", half(2026, 1), "2026-H1"),
    case("R19-pl-pierwsze-polrocze-2026-roku", "Cele na pierwsze półrocze 2026 roku",
         "na pierwsze półrocze 2026 roku", "R19", half(2026, 1), "2026-H1"),
    case("R19-pl-pierwsza-polowa-2026-roku", "Cele pierwsza połowa 2026 roku", "pierwsza połowa 2026 roku",
         "R19", half(2026, 1)),
    case("R19-pl-II-polrocze-2025-Roman", "Cele II półrocze 2025", "II półrocze 2025", "R19",
         half(2025, 2), "2025-H2"),
]


def _recent_week(w: int, today: date = TODAY) -> int:
    return most_recent_year(lambda y: date.fromisocalendar(y, w, 1) if w < 53 else week_53_monday(y), today)


def _next_week(w: int, today: date = TODAY) -> int:
    def end(y: int) -> date | None:
        first = date.fromisocalendar(y, w, 1) if w < 53 else week_53_monday(y)
        return None if first is None else first + D(days=7)

    return next_year_after(end, today)


R20 = [
    case("R20-pl-w-48-tygodniu-2026-roku", "Tickety w 48. tygodniu 2026 roku", "w 48. tygodniu 2026 roku",
         "R20", iso_week(2026, 48), "2026-W48"),
    case("R20-pl-48-tydzien-2026", "Tickety 48. tydzień 2026", "48. tydzień 2026", "R20", iso_week(2026, 48)),
    case("R20-pl-tydzien-48-past-bias", "Tickety tydzień 48", "tydzień 48", "R20",
         iso_week(_recent_week(48), 48), "2026-W48", alts=(alt("R20", FUT, iso_week(_next_week(48), 48)),)),
    case("R20-pl-w-49-tygodniu-current-counts", "Tickety w 49. tygodniu", "w 49. tygodniu", "R20",
         iso_week(2026, 49), "2026-W49"),
    case("R20-pl-w-50-tygodniu-is-last-year", "Tickety w 50 tygodniu", "w 50 tygodniu", "R20",
         iso_week(_recent_week(50), 50), "2025-W50", alts=(alt("R20", FUT, iso_week(_next_week(50), 50)),)),
    case("R20-pl-w-53-tygodniu-finds-the-last-long-year", "Tickety w 53. tygodniu", "w 53. tygodniu",
         "R20", iso_week(_recent_week(53), 53), "2020-W53", alts=(alt("R20", FUT, iso_week(_next_week(53), 53)),)),
    case("R20-pl-tydzien-nr-12", "Tickety tydzień nr 12", "tydzień nr 12", "R20",
         iso_week(_recent_week(12), 12), alts=(alt("R20", FUT, iso_week(_next_week(12), 12)),)),
    case("R20-pl-W48", "Tickety W48", "W48", "R20", iso_week(_recent_week(48), 48),
         alts=(alt("R20", FUT, iso_week(_next_week(48), 48)),)),
    case("R20-pl-ISO-2026-W48", "Tickety 2026-W48", "2026-W48", "R20", iso_week(2026, 48), "2026-W48"),
]


def _to_now(first: tuple[str, str], now: datetime = NOW) -> tuple[str, str]:
    return first[0], iso(now)  # type: ignore[return-value]


R21 = [
    case("R21-pl-od-poczatku-roku", "Przychód od początku roku", "od początku roku", "R21",
         _to_now(year(2026)), f"{year(2026)[0]}/{iso(NOW)}"),
    case("R21-pl-od-poczatku-miesiaca", "Wydatki od początku miesiąca", "od początku miesiąca", "R21",
         _to_now(month_of(TODAY))),
    case("R21-pl-od-poczatku-kwartalu", "Przychód od początku kwartału", "od początku kwartału", "R21",
         _to_now(quarter_of(TODAY))),
    case("R21-pl-od-poczatku-biezacego-roku", "Błędy od początku bieżącego roku",
         "od początku bieżącego roku", "R21", _to_now(year(2026))),
    case("R21-pl-od-poczatku-tygodnia-on-a-Sunday", "Commity od początku tygodnia", "od początku tygodnia",
         "R21", _to_now(pl_week(SUNDAY.date()), SUNDAY), now=SUNDAY),
]

R22 = [
    case("R22-pl-dzis-rano", "Co się zepsuło dziś rano", "dziś rano", "R22", period(TODAY, "morning1")),
    case("R22-pl-dzisiaj-przed-poludniem", "Co się zepsuło dzisiaj przed południem",
         "dzisiaj przed południem", "R22", period(TODAY, "morning2")),
    case("R22-pl-dzisiaj-po-poludniu", "Co się zepsuło dzisiaj po południu", "dzisiaj po południu",
         "R22", period(TODAY, "afternoon1")),
    case("R22-pl-dzis-wieczorem", "Co wdrożymy dziś wieczorem", "dziś wieczorem", "R22",
         period(TODAY, "evening1")),
    case("R22-pl-tego-ranka", "Co się zepsuło tego ranka", "tego ranka", "R22", period(TODAY, "morning1")),
    case("R22-pl-wczoraj-wieczorem", "Co się zepsuło wczoraj wieczorem", "wczoraj wieczorem", "R22",
         period(TODAY + D(days=-1), "evening1")),
    case("R22-pl-wczoraj-po-poludniu", "Co się zepsuło wczoraj po południu", "wczoraj po południu", "R22",
         period(TODAY + D(days=-1), "afternoon1")),
    case("R22-pl-wczoraj-w-nocy-wraps-midnight", "Co padło wczoraj w nocy", "wczoraj w nocy", "R22",
         period(TODAY + D(days=-1), "night1")),
    case("R22-pl-zeszlej-nocy", "Co padło zeszłej nocy", "zeszłej nocy", "R22",
         period(TODAY + D(days=-1), "night1")),
    case("R22-pl-jutro-rano", "Co wdrożymy jutro rano", "jutro rano", "R22", period(TODAY + D(days=1), "morning1")),
    case("R22-pl-jutro-w-nocy", "Joby jutro w nocy", "jutro w nocy", "R22", period(TODAY + D(days=1), "night1")),
    case("R22-pl-przedwczoraj-wieczorem-Warsaw", "Co się zepsuło przedwczoraj wieczorem",
         "przedwczoraj wieczorem", "R22", period(WARSAW_NOW.date() + D(days=-2), "evening1", WARSAW),
         now=WARSAW_NOW),
]

_SAT = SATURDAY.date()

R23 = [
    case("R23-pl-w-ten-weekend-on-a-Wednesday", "Deploye w ten weekend", "w ten weekend", "R23",
         weekend(first_open_weekend(TODAY)), so.weekend_value(LOCALE, first_open_weekend(TODAY))),
    case("R23-pl-w-zeszly-weekend", "Alerty w zeszły weekend", "w zeszły weekend", "R23",
         weekend(last_ended_weekend(TODAY))),
    case("R23-pl-w-ubiegly-weekend", "Alerty w ubiegły weekend", "w ubiegły weekend", "R23",
         weekend(last_ended_weekend(TODAY))),
    case("R23-pl-w-przyszly-weekend", "Prace w przyszły weekend", "w przyszły weekend", "R23",
         weekend(first_open_weekend(TODAY) + D(weeks=1)), alts=(alt("R23", None, weekend(first_open_weekend(TODAY))),)),
    case("R23-pl-w-weekend-on-a-Wednesday", "Co się zepsuło w weekend", "w weekend", "R23",
         weekend(last_ended_weekend(TODAY)), alts=(alt("R23", FUT, weekend(first_open_weekend(TODAY))),)),
    case("R23-pl-przez-weekend", "Co się zepsuło przez weekend", "przez weekend", "R23",
         weekend(last_ended_weekend(TODAY)), alts=(alt("R23", FUT, weekend(first_open_weekend(TODAY))),)),
    case("R23-pl-podczas-weekendu", "Co się zepsuło podczas weekendu", "podczas weekendu", "R23",
         weekend(last_ended_weekend(TODAY)), alts=(alt("R23", FUT, weekend(first_open_weekend(TODAY))),)),
    case("R23-pl-w-weekend-future-bias", "Co się zepsuje w weekend", "w weekend", "R23",
         weekend(first_open_weekend(TODAY)), alts=(alt("R23", PAST, weekend(last_ended_weekend(TODAY))),),
         bias="future"),
    case("R23-pl-w-ten-weekend-on-a-Saturday", "Deploye w ten weekend", "w ten weekend", "R23",
         weekend(first_open_weekend(_SAT)), now=SATURDAY),
    case("R23-pl-w-weekend-on-a-Saturday-is-this-one", "Pagery w weekend", "w weekend", "R23",
         weekend(first_open_weekend(_SAT)), now=SATURDAY),
    case("R23-pl-w-zeszly-weekend-on-a-Monday", "Alerty w zeszły weekend", "w zeszły weekend", "R23",
         weekend(last_ended_weekend(MONDAY_AFTER.date())), now=MONDAY_AFTER),
]

TABLES = {"R1": R1, "R2": R2, "R3": R3, "R4": R4, "R5": R5, "R6": R6, "R7": R7, "R8": R8,
          "R9": R9, "R10": R10, "R11": R11, "R12": R12, "R13": R13, "R14": R14, "R15": R15,
          "R16": R16, "R17": R17, "R18": R18, "R19": R19, "R20": R20, "R21": R21, "R22": R22,
          "R23": R23}
DEEP = {"R5", "R11", "R12", "R13", "R14", "R15", "R16", "R18", "R22", "R23"}


def test_every_reading_has_worked_polish_examples() -> None:
    check_tables(TABLES, "pl", DEEP)


def test_the_clocks_and_CLDR_facts_the_tables_use() -> None:
    # stdlib date.weekday(); CLDR 49 via babel: PL weeks start on Monday, weekend Saturday-Sunday,
    # numeric dates day first; Warsaw and Berlin share their offsets on these dates (tzdata).
    assert (NOW.weekday(), SATURDAY.weekday(), SUNDAY.weekday(), MONDAY_AFTER.weekday()) == (2, 5, 6, 0)
    assert _PL_FIRST == MO and so.weekend_days(LOCALE) == (SA, 2)
    assert numeric_order(LOCALE) == "DM"
    assert WARSAW_NOW.utcoffset() == NOW.utcoffset() and SPRING_WARSAW.utcoffset() == SPRING_BERLIN.utcoffset()


@pytest.mark.parametrize(PARAMS, all_cases(TABLES))
def test_polish_phrase_resolves_to_its_interval(question, phrase, reading, bounds, value, alts, context):
    PL.check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, all_cases(TABLES))
def test_polish_phrase_reads_the_same_with_every_language_on(question, phrase, reading, bounds, value, alts,
                                                          context):
    PL.check_among_every_language(question, phrase, reading, bounds, context)


@pytest.mark.parametrize(PARAMS, all_cases(TABLES))
def test_every_polish_alternative_names_a_policy_that_selects_it_or_none(
        question, phrase, reading, bounds, value, alts, context):
    PL.alternatives_are_selected_by_their_policy(question, context)


def test_the_locale_file_reads_last_weekday_as_that_day_of_last_week() -> None:
    # common practice: "w zeszły poniedziałek" is Monday of last week (stated in locales/pl.toml).
    assert load_locale("pl").meta.weekday_reading == "week"


# --- D: lengths of time after a cue -----------------------------------------------------------

DURATIONS = [
    ("D-pl-ponad-3-dni", "Zadania otwarte ponad 3 dni", "3 dni", "P3D"),
    ("D-pl-dluzej-niz-dwa-tygodnie", "Tickety wiszą dłużej niż dwa tygodnie", "dwa tygodnie", "P2W"),
    ("D-pl-przez-3-dni", "Zamrożenie przez 3 dni", "przez 3 dni", "P3D"),
    ("D-pl-ponad-24-godziny", "Review trwa ponad 24 godziny", "24 godziny", "PT24H"),
]


@pytest.mark.parametrize(("question", "phrase", "value"), [d[1:] for d in DURATIONS],
                         ids=[d[0] for d in DURATIONS])
def test_D_a_count_of_units_after_a_cue_is_a_duration(question, phrase, value):
    # ISO 8601 durations; the cue words ("ponad", "dłużej niż") stay in the question.
    m = one(question)
    assert (m.text, m.kind, m.reading, m.value) == (phrase, "duration", "D", value)
    assert m.start is None and m.end is None


# --- policies ---------------------------------------------------------------------------------

POLICY_FLIPS = [
    ("R12-pl-bias-future-w-marcu", "Błędy w marcu", {}, ("bias", "future", "past")),
    ("R12-pl-bias-future-3-grudnia", "Wydane 3 grudnia", {}, ("bias", "future", "past")),
    ("R13-pl-bias-future-w-poniedzialek", "Błędy w poniedziałek", {}, ("bias", "future", "past")),
    ("R20-pl-bias-future-tydzien-48", "Tickety tydzień 48", {}, ("bias", "future", "past")),
    ("R23-pl-bias-future-w-weekend", "Co się zepsuło w weekend", {}, ("bias", "future", "past")),
    ("R7-pl-bias-future-od-marca", "Błędy zamknięte od marca", {}, ("bias", "future", "past")),
    ("R11-pl-bias-future-od-marca-do-maja", "Błędy od marca do maja", {}, ("bias", "future", "past")),
    ("R5-pl-window-calendar-w-ostatnich-3-miesiacach", "Tickety w ostatnich 3 miesiącach", {},
     ("window_reading", "calendar", "rolling")),
    ("R6-pl-window-calendar-w-najblizszych-3-dniach", "Co zrobić w najbliższych 3 dniach", {},
     ("window_reading", "calendar", "rolling")),
    ("R16-pl-weekday-nearest-w-zeszly-poniedzialek", "Co się zepsuło w zeszły poniedziałek", {},
     ("weekday_reading", "nearest", "week")),
    ("R16-pl-weekday-nearest-w-przyszly-czwartek", "Co planujemy w przyszły czwartek", {},
     ("weekday_reading", "nearest", "week")),
    ("R18-pl-date-order-MDY", "Naprawione 03.04.2026", {}, ("date_order", "MDY", "DMY")),
]


@pytest.mark.parametrize(("question", "base", "setting"), [p[1:] for p in POLICY_FLIPS],
                         ids=[p[0] for p in POLICY_FLIPS])
def test_a_policy_flips_the_polish_reading_and_the_old_one_becomes_the_alternative(question, base, setting):
    PL.policy_flips(question, base, setting)


# --- Polish and English in one question --------------------------------------------------------

MIXED = [
    ("R2-pl-en-tickety-z-zeszlego-tygodnia", "Pokaż tickety z zeszłego tygodnia", "z zeszłego tygodnia",
     "pl", pl_week(TODAY + D(weeks=-1))),
    ("R2-pl-en-bugi-w-zeszlym-tygodniu", "Jakie bugi zamknięto w zeszłym tygodniu", "w zeszłym tygodniu",
     "pl", pl_week(TODAY + D(weeks=-1))),
    ("R1-pl-en-issues-yesterday", "Jakie issues zamknięto yesterday?", "yesterday", "en",
     day(TODAY + D(days=-1))),
    ("R7-pl-en-PR-since-March", "Pokaż wszystkie PR since March", "since March", "en", since(_MARCH_PAST)),
    ("R7-pl-en-merge-requesty-od-1-marca", "Wszystkie merge requesty od 1 marca", "od 1 marca", "pl",
     since(day(date(2026, 3, 1)))),
    ("R23-pl-en-deploye-last-weekend", "Jakie deploye były last weekend", "last weekend", "en",
     weekend(last_ended_weekend(TODAY))),
    ("R3-pl-en-issues-3-dni-temu", "Wszystkie issues utworzone 3 dni temu", "3 dni temu", "pl",
     day(TODAY + D(days=-3))),
    ("R5-pl-en-bugs-in-the-last-7-days", "Jakie bugs utworzono in the last 7 days?", "in the last 7 days",
     "en", (wall(NOW, days=-7), iso(NOW))),
    ("R11-pl-en-releasy-miedzy-1-a-15-marca", "Wszystkie release'y między 1 a 15 marca",
     "między 1 a 15 marca", "pl", joined(day(date(2026, 3, 1)), day(date(2026, 3, 15)))),
    ("R2-pl-en-story-points-w-zeszlym-miesiacu", "Ile story points zamknięto w zeszłym miesiącu",
     "w zeszłym miesiącu", "pl", month_of(TODAY + D(months=-1))),
]


@pytest.mark.parametrize(("question", "phrase", "lang", "bounds"), [m[1:] for m in MIXED],
                         ids=[m[0] for m in MIXED])
def test_a_question_mixing_polish_and_english_finds_the_phrase_in_either(question, phrase, lang, bounds):
    m = one(question, languages=("pl", "en"))
    assert (m.text, m.lang, (m.start, m.end)) == (phrase, lang, bounds)
    assert question[m.char_start : m.char_end] == phrase


def test_a_polish_and_an_english_phrase_in_one_question_are_both_found() -> None:
    result = run("Błędy z zeszłego tygodnia i bugs since Monday", languages=("pl", "en"))
    assert [(m.text, m.lang) for m in result.mentions] == [("z zeszłego tygodnia", "pl"),
                                                           ("since Monday", "en")]


# English questions read with every deep language on (the default): a Polish connective that is
# also an English word ("do" = until) must not change the reading of an English phrase.
ENGLISH_WITH_POLISH_ON = [
    ("R1-en-what-to-do-tomorrow", "what to do tomorrow", "tomorrow", "R1"),
    ("R2-en-tasks-to-do-this-week", "tasks to do this week", "this week", "R2"),
]


@pytest.mark.parametrize(("question", "phrase", "reading"), [e[1:] for e in ENGLISH_WITH_POLISH_ON],
                         ids=[e[0] for e in ENGLISH_WITH_POLISH_ON])
def test_a_polish_connective_that_is_an_english_word_leaves_an_english_phrase_alone(question, phrase, reading):
    result = normalize(question, Context.at(NOW, tz="Europe/Berlin"))
    assert "pl" in Context.at(NOW, tz="Europe/Berlin").languages
    assert [(m.text, m.reading) for m in result.mentions] == [(phrase, reading)]


# --- look-alikes (reading N) -------------------------------------------------------------------

TRAPS = [
    ("N-pl-majac-is-not-maj", "Mając dostęp do repozytorium, zrób review"),
    ("N-pl-majowka", "Majówka w biurze"),
    ("N-pl-Maja-name", "Maja zamknęła zadanie"),
    ("N-pl-Maje-name", "Zapytaj Maję o release"),
    ("N-pl-drugi-ordinal", "Drugi build padł"),
    ("N-pl-druga-polowa-sprintu", "Druga połowa sprintu była spokojna"),
    ("N-pl-pierwszy-commit", "Pierwszy commit w repozytorium"),
    ("N-pl-czwarty-sprint", "Czwarty sprint z rzędu"),
    ("N-pl-ostatni-komentarz", "Ostatni komentarz w zadaniu"),
    ("N-pl-nastepny-krok", "Następny krok należy do ciebie"),
    ("N-pl-poprzedni-release", "Poprzedni release był lepszy"),
    ("N-pl-ten-ticket", "Ten ticket jest zamknięty"),
    ("N-pl-priorytet-2", "Zadania z priorytetem 2"),
    ("N-pl-wersja-2025.1", "Błędy w wersji 2025.1"),
    ("N-pl-top-10", "Top 10 osób"),
    ("N-pl-5-punktow", "Zadania za 5 punktów"),
    ("N-pl-ticket-2025", "Kto ma ticket 2025?"),
    ("N-pl-sprint-48", "Błędy w sprincie 48"),
    ("N-pl-blad-404", "Błąd 404 na stronie 3"),
    ("N-pl-3-z-5", "3 z 5 testów przeszło"),
    ("N-pl-bare-2025-no-cue", "2025 zadań zamkniętych"),
    ("N-pl-po-polsku", "Napisz po polsku"),
    ("N-pl-po-kolei", "Po kolei proszę"),
    ("N-pl-za-chwile", "Za chwilę wracam"),
    ("N-pl-od-razu", "Od razu to naprawię"),
    ("N-pl-tydzien-event", "Tydzień Jakości był udany"),
    ("N-pl-co-tydzien", "Release co tydzień"),
    ("N-pl-raz-w-tygodniu", "Dwa releasy w tygodniu"),
    ("N-pl-dzien-dobry", "Dzień dobry zespole"),
    ("N-pl-dobry-wieczor", "Dobry wieczór wszystkim"),
    ("N-pl-sie-for-sie", "Nie da sie tego zrobić"),
    ("N-pl-lis-fox", "Lis w logo zespołu"),
    ("N-pl-sr-average", "Śr. czas odpowiedzi"),
    ("N-pl-lata-flies", "Dron lata nad biurem"),
    ("N-pl-lat-90", "Muzyka z lat 90."),
    ("N-pl-w-piatki-recurring", "Spotkania w piątki"),
    ("N-pl-co-piatek-recurring", "Spotkania co piątek"),
    ("N-pl-w-kazdy-poniedzialek-recurring", "Deploy w każdy poniedziałek"),
    ("N-pl-nastepnego-dnia-told-of", "Następnego dnia build padł"),
    ("N-pl-w-ostatnich-dniach-plural-no-number", "W ostatnich dniach było spokojnie"),
    ("N-pl-w-przyszlych-latach-plural-no-number", "W przyszłych latach to zmienimy"),
    ("N-pl-kolejny-tydzien-opoznienia", "To kolejny tydzień opóźnienia"),
    ("N-pl-rano-daily", "Rano mamy daily"),
    ("N-pl-plan-na-tydzien", "Plan na tydzień"),
    ("N-pl-pierwszy-tydzien-sprintu", "Pierwszy tydzień sprintu"),
    ("N-pl-druga-polowa-dnia", "Druga połowa dnia wolna"),
    ("N-pl-po-tygodniu", "Po tygodniu wrócimy do tematu"),
]


@pytest.mark.parametrize(("question",), [(q,) for _, q in TRAPS], ids=[i for i, _ in TRAPS])
def test_a_polish_look_alike_gives_no_temporal_mention(question):
    result = run(question, languages=("pl", "en"))
    assert result.mentions == ()
    assert result.rewritten == question


def test_there_are_at_least_twenty_five_polish_traps():
    assert len(TRAPS) >= 25
    assert len({q for _, q in TRAPS}) == len(TRAPS)


PAIRS = [
    ("N-pl-majac-vs-w-maju", "Mając dostęp zrób review", "Błędy w maju", "w maju"),
    ("N-pl-Maja-vs-od-maja", "Maja zamknęła zadanie", "Zadania od maja", "od maja"),
    ("N-pl-drugi-vs-w-drugim-kwartale", "Drugi build padł", "Buildy w drugim kwartale", "w drugim kwartale"),
    ("N-pl-priorytet-2-vs-2-dni-temu", "Zadania z priorytetem 2", "Zadania 2 dni temu", "2 dni temu"),
    ("N-pl-ticket-2025-vs-w-2025-roku", "Kto ma ticket 2025?", "Tickety w 2025 roku", "w 2025 roku"),
    ("N-pl-w-piatki-vs-w-piatek", "Spotkania w piątki", "Spotkanie w piątek", "w piątek"),
    ("N-pl-co-tydzien-vs-w-tym-tygodniu", "Release co tydzień", "Release w tym tygodniu", "w tym tygodniu"),
    ("N-pl-w-ostatnich-dniach-vs-w-ostatnich-3-dniach", "W ostatnich dniach było spokojnie",
     "W ostatnich 3 dniach było spokojnie", "W ostatnich 3 dniach"),
]


@pytest.mark.parametrize(("trap", "temporal", "phrase"), [p[1:] for p in PAIRS], ids=[p[0] for p in PAIRS])
def test_the_same_polish_word_is_a_time_word_only_where_the_question_makes_it_one(trap, temporal, phrase):
    assert run(trap).mentions == ()
    assert one(temporal).text == phrase


MIXED_TRAPS = [
    ("N-pl-majac-beside-od-maja", "Mając dostęp od maja, zrób review", "od maja"),
    ("N-pl-drugi-beside-od-poniedzialku", "Drugi build od poniedziałku", "od poniedziałku"),
    ("N-pl-top-10-beside-w-tym-tygodniu", "Top 10 osób w tym tygodniu", "w tym tygodniu"),
    ("N-pl-priorytet-beside-za-2025-rok", "Zadania z priorytetem 2 za 2025 rok", "za 2025 rok"),
    ("N-pl-wersja-beside-ISO-date", "Błędy wersji 2025.1 od 2025-03-14", "od 2025-03-14"),
    ("N-pl-co-piatek-beside-od-marca", "Spotkania co piątek od marca", "od marca"),
]


@pytest.mark.parametrize(("question", "phrase"), [m[1:] for m in MIXED_TRAPS], ids=[m[0] for m in MIXED_TRAPS])
def test_a_polish_look_alike_beside_a_time_phrase_stays_out_of_the_mention(question, phrase):
    m = one(question)
    assert m.text == phrase
    assert question[m.char_start : m.char_end] == phrase
