"""Ukrainian: worked examples for every reading R1-R23 and D, the policies, numeric dates in the
CLDR order of ``uk``, questions mixing Ukrainian and English (and Russian), apostrophe variants,
and look-alike words (reading N).

Checked against:
- python-dateutil ``relativedelta``: weekday steps, day, week, month and year arithmetic with
  month-end clamping; stdlib ``calendar``; ISO 8601 week dates via ``date.fromisocalendar``;
- CLDR 49 via babel 2.19: Ukrainian day-period rules (``Locale("uk").day_period_rules``: ранок
  04:00-12:00, день 12:00-18:00, вечір 18:00-24:00, ніч 00:00-04:00), the week data of the
  territory UA (``first_week_day``, ``weekend_start``/``weekend_end``) and the order of numeric
  dates (``babel.dates.get_date_format("short", locale="uk")``, day first); CLDR writes the
  apostrophe of "пʼятниця" as U+02BC;
- the IANA tz database via stdlib zoneinfo + tzdata (Berlin and Kyiv daylight-saving changes);
- the questions and phrases are written from knowledge of the language (no published source);
- common practice (no published source): "минулого понеділка" / "наступного четверга" mean that
  day of last / next week (locales/uk.toml ``weekday_reading = "week"``); "до X" ends before X,
  "по X" and "аж до X" take X in; "з X по Y" and "між X і Y" take both ends in; CLDR's narrow
  future pattern "за {0} дн." is "in 3 days"; the night just past
  ("минулої ночі", "вчора вночі") is CLDR's night (00:00-04:00) of today's date; "за три дні"
  spelt out is a length of time ("within three days"), "через три дні" the future day.
"""

from __future__ import annotations

from datetime import date, datetime
from typing import Any
from zoneinfo import ZoneInfo

import pytest
from dateutil.relativedelta import FR, MO, SA, SU, TH, TU, WE

from nlnorm.locale import load_locale
from tests.helpers import BERLIN, NOW, TODAY
from tests.locales import slavic_oracles as so
from tests.locales.slavic_oracles import (
    BEFORE_LEAP_DAY, CAL, FUT, JANUARY_END, LEAP_DAY, MID_JANUARY, MONDAY_AFTER, MONTH_END,
    NEAREST, PARAMS, PAST, QUARTER_PAST, ROLL, SATURDAY, SUNDAY, WEEK, D, Runner,
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

LOCALE = "uk"
UK = Runner("uk", LOCALE)
KYIV = ZoneInfo("Europe/Kyiv")
#: Wednesday 2 December 2026, 10:00 in Kyiv; Kyiv clocks went 03:00 -> 04:00 on 2026-03-29.
KYIV_NOW = datetime(2026, 12, 2, 10, 0, tzinfo=KYIV)
SPRING_KYIV = datetime(2026, 3, 29, 12, 0, tzinfo=KYIV)
_UK_FIRST = first_weekday(LOCALE)


def period(d: date, pid: str, tz: ZoneInfo = BERLIN) -> tuple[str, str]:
    return so.period(LOCALE, d, pid, tz)


def weekend(first: date) -> tuple[str, str]:
    return so.weekend(LOCALE, first)


def last_ended_weekend(today: date) -> date:
    return so.last_ended_weekend(LOCALE, today)


def first_open_weekend(today: date) -> date:
    return so.first_open_weekend(LOCALE, today)


def uk_week(d: date) -> tuple[str, str]:
    return so.locale_week(LOCALE, d)


def one(question: str, **context: Any):  # type: ignore[no-untyped-def]
    return UK.one(question, **context)


def run(question: str, **context: Any):  # type: ignore[no-untyped-def]
    return UK.run(question, **context)


R1 = [
    case("R1-uk-uchora", "Які баги закрили учора?", "учора", "R1", day(TODAY + D(days=-1)),
         (TODAY + D(days=-1)).isoformat()),
    case("R1-uk-vchora-spelling", "Які баги закрили вчора?", "вчора", "R1", day(TODAY + D(days=-1))),
    case("R1-uk-sogodni", "Що зробили сьогодні?", "сьогодні", "R1", day(TODAY), TODAY.isoformat()),
    case("R1-uk-zavtra", "Що треба здати завтра?", "завтра", "R1", day(TODAY + D(days=1))),
    case("R1-uk-pozavchora", "Що перевідкрили позавчора?", "позавчора", "R1", day(TODAY + D(days=-2))),
    case("R1-uk-na-pislyazavtra", "Які задачі на післязавтра?", "на післязавтра", "R1", day(TODAY + D(days=2))),
    case("R1-uk-za-vchorashnij-den", "Підсумки за вчорашній день", "за вчорашній день", "R1",
         day(TODAY + D(days=-1))),
]

R2 = [
    case("R2-uk-mynuloho-tyzhnya", "Які баги було створено минулого тижня?", "минулого тижня", "R2",
         uk_week(TODAY + D(weeks=-1)), iso_week_name(TODAY + D(weeks=-1))),
    case("R2-uk-na-mynulomu-tyzhni-locative", "Які баги закрили на минулому тижні?", "на минулому тижні",
         "R2", uk_week(TODAY + D(weeks=-1))),
    case("R2-uk-cogo-tyzhnya", "Скільки задач закрито цього тижня?", "цього тижня", "R2",
         uk_week(TODAY), iso_week_name(TODAY)),
    case("R2-uk-na-nastupnomu-tyzhni", "Що заплановано на наступному тижні?", "на наступному тижні",
         "R2", uk_week(TODAY + D(weeks=1))),
    case("R2-uk-za-mynulyj-tyzhden", "Покажи задачі за минулий тиждень", "за минулий тиждень", "R2",
         uk_week(TODAY + D(weeks=-1))),
    case("R2-uk-mynuloho-misyacya-at-a-month-end", "Які баги виправили минулого місяця?",
         "минулого місяця", "R2", month_of(MONTH_END.date() + D(months=-1)), "2026-02", now=MONTH_END),
    case("R2-uk-cogo-kvartalu", "Хто закрив найбільше тікетів цього кварталу?", "цього кварталу", "R2",
         quarter_of(TODAY), "2026-Q4"),
    case("R2-uk-u-poperednomu-kvartali", "Велосіті у попередньому кварталі", "у попередньому кварталі",
         "R2", quarter_of(TODAY + D(months=-3)), "2026-Q3"),
    case("R2-uk-na-nastupnyj-rik", "Епіки на наступний рік", "на наступний рік", "R2", year(TODAY.year + 1), "2027"),
    case("R2-uk-torik-CLDR", "Релізи торік", "торік", "R2", year(TODAY.year - 1), "2025"),
    case("R2-uk-mynuloho-tyzhnya-sunday-weeks-on-a-Sunday", "Тікети, закриті минулого тижня",
         "минулого тижня", "R2", week(SUNDAY.date() + D(weeks=-1), SU), "2026-11-29/P1W",
         now=SUNDAY, week_start="sunday"),
]

R3 = [
    case("R3-uk-pivroku-tomu-is-6-months", "Що закрили півроку тому", "півроку тому", "R3",
         month_of(TODAY + D(months=-6)), (TODAY + D(months=-6)).strftime("%Y-%m")),
    case("R3-uk-3-dni-tomu", "Баги, відкриті 3 дні тому", "3 дні тому", "R3", day(TODAY + D(days=-3))),
    case("R3-uk-pyat-dniv-tomu-apostrophe", "Баги, відкриті п'ять днів тому", "п'ять днів тому", "R3",
         day(TODAY + D(days=-5))),
    case("R3-uk-pyat-dniv-tomu-typographic-apostrophe", "Баги, відкриті п\u2019ять днів тому",
         "п\u2019ять днів тому", "R3", day(TODAY + D(days=-5))),
    case("R3-uk-dva-tyzhni-tomu", "Що зламалося два тижні тому", "два тижні тому", "R3",
         uk_week(TODAY + D(weeks=-2)), iso_week_name(TODAY + D(weeks=-2))),
    case("R3-uk-misyac-tomu-at-a-month-end", "Що змерджили місяць тому", "місяць тому", "R3",
         month_of((MONTH_END + D(months=-1)).date()), "2026-02", now=MONTH_END),
    case("R3-uk-rik-tomu", "Відкриті баги рік тому", "рік тому", "R3", year(TODAY.year - 1), "2025"),
    case("R3-uk-2-hodyny-tomu", "Алерти 2 години тому", "2 години тому", "R3", hour_of(moved(NOW, hours=-2))),
    case("R3-uk-kilka-dniv-tomu-is-3", "Що закрили кілька днів тому", "кілька днів тому", "R3",
         day(TODAY + D(days=-3))),
]

R4 = [
    case("R4-uk-cherez-3-dni", "Що треба здати через 3 дні", "через 3 дні", "R4", day(TODAY + D(days=3))),
    case("R4-uk-cherez-dva-tyzhni", "Що треба здати через два тижні", "через два тижні", "R4",
         uk_week(TODAY + D(weeks=2)), iso_week_name(TODAY + D(weeks=2))),
    case("R4-uk-cherez-misyac-from-January-31", "Що поновлюється через місяць", "через місяць", "R4",
         month_of((JANUARY_END + D(months=1)).date()), "2026-02", now=JANUARY_END),
    case("R4-uk-cherez-2-hodyny", "Які джоби запустяться через 2 години", "через 2 години", "R4",
         hour_of(moved(NOW, hours=2))),
    case("R4-uk-za-3-dn-CLDR-narrow", "Реліз за 3 дн.", "за 3 дн.", "R4", day(TODAY + D(days=3))),
    case("R4-uk-cherez-paru-dniv", "Реліз через пару днів", "через пару днів", "R4", day(TODAY + D(days=2))),
]

_THIS_MONTH = TODAY.replace(day=1)
_THIS_WEEK = week_start(TODAY)

R5 = [
    case("R5-uk-za-ostanni-pivroku", "Інциденти за останні півроку", "за останні півроку", "R5",
         (wall(NOW, months=-6), iso(NOW)), alts=(alt("R5", CAL, _cal_back(NOW, _THIS_MONTH, 6, "months")),)),
    case("R5-uk-za-ostanni-7-dniv", "Баги за останні 7 днів", "за останні 7 днів", "R5",
         (wall(NOW, days=-7), iso(NOW)), alts=(alt("R5", CAL, _cal_back(NOW, TODAY, 7, "days")),)),
    case("R5-uk-za-ostanni-try-dni", "Баги за останні три дні", "за останні три дні", "R5",
         (wall(NOW, days=-3), iso(NOW)), alts=(alt("R5", CAL, _cal_back(NOW, TODAY, 3, "days")),)),
    case("R5-uk-protyahom-ostannih-dvoh-tyzhniv", "Баги протягом останніх двох тижнів",
         "протягом останніх двох тижнів", "R5", (wall(NOW, weeks=-2), iso(NOW)),
         alts=(alt("R5", CAL, _cal_back(NOW, _THIS_WEEK, 2, "weeks")),)),
    case("R5-uk-ostanni-3-misyaci", "Тікети, закриті останні 3 місяці", "останні 3 місяці", "R5",
         (wall(NOW, months=-3), iso(NOW)), alts=(alt("R5", CAL, _cal_back(NOW, _THIS_MONTH, 3, "months")),)),
    case("R5-uk-za-ostannij-misyac-no-N", "Коментарі за останній місяць", "за останній місяць", "R5",
         (wall(NOW, months=-1), iso(NOW)), alts=(alt("R5", CAL, _cal_back(NOW, _THIS_MONTH, 1, "months")),)),
    case("R5-uk-za-ostannyu-dobu", "Помилки за останню добу", "за останню добу", "R5",
         (wall(NOW, days=-1), iso(NOW)), alts=(alt("R5", CAL, _cal_back(NOW, TODAY, 1, "days")),)),
    case("R5-uk-za-3-ostanni-dni-number-first", "Коміти за 3 останні дні", "за 3 останні дні", "R5",
         (wall(NOW, days=-3), iso(NOW)), alts=(alt("R5", CAL, _cal_back(NOW, TODAY, 3, "days")),)),
    case("R5-uk-za-mynuli-2-roky-from-a-leap-day", "Інциденти за минулі 2 роки", "за минулі 2 роки",
         "R5", (wall(LEAP_DAY, years=-2), iso(LEAP_DAY)),
         alts=(alt("R5", CAL, _cal_back(LEAP_DAY, date(2028, 1, 1), 2, "years")),), now=LEAP_DAY),
    case("R5-uk-za-ostanni-24-hodyny-is-24-real-hours-Kyiv-spring", "Помилки за останні 24 години",
         "за останні 24 години", "R5", (elapsed(SPRING_KYIV, hours=-24), iso(SPRING_KYIV)), now=SPRING_KYIV),
    case("R5-uk-za-ostanni-2-hodyny-off-the-hour", "Деплої за останні 2 години", "за останні 2 години",
         "R5", (elapsed(QUARTER_PAST, hours=-2), iso(QUARTER_PAST)),
         alts=(alt("R5", CAL, (elapsed(floor_hour(QUARTER_PAST), hours=-2), iso(floor_hour(QUARTER_PAST)))),),
         now=QUARTER_PAST),
    case("R5-uk-calendar-policy-reads-whole-days", "Баги за останні 7 днів", "за останні 7 днів", "R5",
         _cal_back(NOW, TODAY, 7, "days"), alts=(alt("R5", ROLL, (wall(NOW, days=-7), iso(NOW))),),
         window_reading="calendar"),
]

R6 = [
    case("R6-uk-u-najblyzhchi-3-dni", "Що зробити у найближчі 3 дні", "у найближчі 3 дні", "R6",
         (iso(NOW), wall(NOW, days=3)), alts=(alt("R6", CAL, _cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-uk-protyahom-nastupnyh-dvoh-tyzhniv", "Що вийде протягом наступних двох тижнів",
         "протягом наступних двох тижнів", "R6", (iso(NOW), wall(NOW, weeks=2)),
         alts=(alt("R6", CAL, _cal_ahead(NOW, _THIS_WEEK, 2, "weeks")),)),
    case("R6-uk-protyahom-3-dniv", "Виправити протягом 3 днів", "протягом 3 днів", "R6",
         (iso(NOW), wall(NOW, days=3)), alts=(alt("R6", CAL, _cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-uk-u-najblyzhchyj-misyac-no-N", "Що вийде у найближчий місяць", "у найближчий місяць", "R6",
         (iso(NOW), wall(NOW, months=1)), alts=(alt("R6", CAL, _cal_ahead(NOW, _THIS_MONTH, 1, "months")),)),
    case("R6-uk-nastupni-6-hodyn", "Джоби на наступні 6 годин", "на наступні 6 годин", "R6",
         (iso(NOW), elapsed(NOW, hours=6)),
         alts=(alt("R6", CAL, (elapsed(floor_hour(NOW), hours=1), elapsed(floor_hour(NOW), hours=7))),)),
    case("R6-uk-calendar-policy-reads-whole-days", "Що зробити у найближчі 3 дні", "у найближчі 3 дні",
         "R6", _cal_ahead(NOW, TODAY, 3, "days"), alts=(alt("R6", ROLL, (iso(NOW), wall(NOW, days=3))),),
         window_reading="calendar"),
]

_MARCH_PAST = month(most_recent_year(lambda y: date(y, 3, 1)), 3)
_MARCH_NEXT = month(next_year_after(lambda y: date(y, 4, 1)), 3)
_MONDAY_PAST = day(on_or_before(TODAY, MO))
_MONDAY_NEXT = day(on_or_after(TODAY, MO))

R7 = [
    case("R7-uk-z-mynuloho-tyzhnya", "Що викотили з минулого тижня", "з минулого тижня", "R7",
         since(uk_week(TODAY + D(weeks=-1))), "2026-11-23/.."),
    case("R7-uk-z-bereznya", "Баги, закриті з березня", "з березня", "R7", since(_MARCH_PAST), "2026-03-01/..",
         alts=(alt("R7", FUT, since(_MARCH_NEXT)),)),
    case("R7-uk-z-1-bereznya", "Баги з 1 березня", "з 1 березня", "R7", since(day(date(2026, 3, 1))),
         alts=(alt("R7", FUT, since(day(date(2027, 3, 1)))),)),
    case("R7-uk-z-2024-roku", "Тікети, відкриті з 2024 року", "з 2024 року", "R7", since(year(2024)),
         "2024-01-01/.."),
    case("R7-uk-z-uchorashnoho-dnya", "Коментарі з учорашнього дня", "з учорашнього дня", "R7",
         since(day(TODAY + D(days=-1)))),
    case("R7-uk-z-ponedilka", "Коміти з понеділка", "з понеділка", "R7", since(_MONDAY_PAST),
         alts=(alt("R7", FUT, since(_MONDAY_NEXT)),)),
    case("R7-uk-vid-1-bereznya-2025-roku", "Деплої від 1 березня 2025 року", "від 1 березня 2025 року",
         "R7", since(day(date(2025, 3, 1))), "2025-03-01/.."),
    case("R7-uk-z-pochatku-mynuloho-roku", "Інциденти з початку минулого року", "з початку минулого року",
         "R7", since(year(TODAY.year - 1))),
    case("R7-uk-z-1-bereznya-i-piznishe", "Релізи з 1 березня 2026 і пізніше", "з 1 березня 2026 і пізніше",
         "R7", since(day(date(2026, 3, 1)))),
]

R8 = [
    case("R8-uk-pislya-bereznya", "Баги, відкриті після березня", "після березня", "R8", after(_MARCH_PAST),
         "2026-04-01/..", alts=(alt("R8", FUT, after(_MARCH_NEXT)),)),
    case("R8-uk-pislya-2025-roku", "Тікети з терміном після 2025 року", "після 2025 року", "R8",
         after(year(2025))),
    case("R8-uk-pislya-mynuloho-tyzhnya", "Перевідкриті після минулого тижня", "після минулого тижня",
         "R8", after(uk_week(TODAY + D(weeks=-1)))),
    case("R8-uk-piznishe-1-bereznya-2025-roku", "Коментарі пізніше 1 березня 2025 року",
         "пізніше 1 березня 2025 року", "R8", after(day(date(2025, 3, 1)))),
]

R9 = [
    case("R9-uk-do-bereznya", "Баги, відкриті до березня", "до березня", "R9", before(_MARCH_PAST),
         alts=(alt("R9", FUT, before(_MARCH_NEXT)),)),
    case("R9-uk-do-2025-roku", "Тікети, закриті до 2025 року", "до 2025 року", "R9", before(year(2025))),
    case("R9-uk-do-mynuloho-tyzhnya", "Зависли ще до минулого тижня", "до минулого тижня", "R9",
         before(uk_week(TODAY + D(weeks=-1)))),
    case("R9-uk-do-pyatnyci-deadline-looks-ahead", "Що треба зробити до п'ятниці", "до п'ятниці", "R9",
         before(day(on_or_after(TODAY, FR))), alts=(alt("R9", None, before(day(on_or_before(TODAY, FR)))),)),
    case("R9-uk-do-pyatnyci-CLDR-apostrophe", "Що треба зробити до п\u02bcятниці", "до п\u02bcятниці",
         "R9", before(day(on_or_after(TODAY, FR))), alts=(alt("R9", None, before(day(on_or_before(TODAY, FR)))),)),
    case("R9-uk-do-pyatnyci-typographic-apostrophe", "Що треба зробити до п\u2019ятниці",
         "до п\u2019ятниці", "R9", before(day(on_or_after(TODAY, FR))),
         alts=(alt("R9", None, before(day(on_or_before(TODAY, FR)))),)),
    case("R9-uk-pered-bereznem-instrumental", "Баги перед березнем", "перед березнем", "R9",
         before(_MARCH_PAST), alts=(alt("R9", FUT, before(_MARCH_NEXT)),)),
]

R10 = [
    case("R10-uk-po-pyatnycyu-deadline-looks-ahead", "Роботу заплановано по п'ятницю", "по п'ятницю",
         "R10", until(day(on_or_after(TODAY, FR))), alts=(alt("R10", None, until(day(on_or_before(TODAY, FR)))),)),
    case("R10-uk-azh-do-pyatnyci", "Що має бути готове аж до п'ятниці", "аж до п'ятниці", "R10",
         until(day(on_or_after(TODAY, FR))), alts=(alt("R10", None, until(day(on_or_before(TODAY, FR)))),)),
    case("R10-uk-ne-piznishe-15-bereznya-2026-roku", "Здати не пізніше 15 березня 2026 року",
         "не пізніше 15 березня 2026 року", "R10", until(day(date(2026, 3, 15)))),
    case("R10-uk-po-2025-rik", "Інциденти по 2025 рік", "по 2025 рік", "R10", until(year(2025))),
    case("R10-uk-do-kincya-bereznya", "Закрити до кінця березня", "до кінця березня", "R10", until(_MARCH_PAST),
         alts=(alt("R10", FUT, until(_MARCH_NEXT)),)),
]

R11 = [
    case("R11-uk-z-1-po-15-bereznya", "Баги з 1 по 15 березня", "з 1 по 15 березня", "R11",
         joined(day(date(2026, 3, 1)), day(date(2026, 3, 15))),
         alts=(alt("R11", FUT, joined(day(date(2027, 3, 1)), day(date(2027, 3, 15)))),)),
    case("R11-uk-mizh-1-i-15-bereznya", "Релізи між 1 і 15 березня", "між 1 і 15 березня", "R11",
         joined(day(date(2026, 3, 1)), day(date(2026, 3, 15))),
         alts=(alt("R11", FUT, joined(day(date(2027, 3, 1)), day(date(2027, 3, 15)))),)),
    case("R11-uk-z-bereznya-po-traven", "Баги з березня по травень", "з березня по травень", "R11",
         joined(month(2026, 3), month(2026, 5)), alts=(alt("R11", FUT, joined(month(2027, 3), month(2027, 5))),)),
    case("R11-uk-vid-bereznya-do-travnya", "Баги від березня до травня", "від березня до травня", "R11",
         joined(month(2026, 3), month(2026, 5)), alts=(alt("R11", FUT, joined(month(2027, 3), month(2027, 5))),)),
    case("R11-uk-mizh-bereznem-i-travnem-instrumental", "Баги між березнем і травнем",
         "між березнем і травнем", "R11", joined(month(2026, 3), month(2026, 5)),
         alts=(alt("R11", FUT, joined(month(2027, 3), month(2027, 5))),)),
    case("R11-uk-z-lystopada-po-lyutyj-ends-next-year", "Чергування з листопада по лютий",
         "з листопада по лютий", "R11", joined(month(2026, 11), month(2027, 2)),
         alts=(alt("R11", FUT, joined(month(2027, 11), month(2028, 2))),)),
    case("R11-uk-z-ponedilka-po-pyatnycyu", "Коміти з понеділка по п'ятницю", "з понеділка по п'ятницю",
         "R11", joined(day(on_or_before(TODAY, MO)), day(on_or_before(TODAY, MO) + D(weekday=FR))),
         alts=(alt("R11", FUT, joined(day(on_or_after(TODAY, MO)), day(on_or_after(TODAY, MO) + D(weekday=FR)))),)),
    case("R11-uk-mizh-ponedilkom-i-pyatnyceyu", "Коміти між понеділком і п'ятницею",
         "між понеділком і п'ятницею", "R11",
         joined(day(on_or_before(TODAY, MO)), day(on_or_before(TODAY, MO) + D(weekday=FR))),
         alts=(alt("R11", FUT, joined(day(on_or_after(TODAY, MO)), day(on_or_after(TODAY, MO) + D(weekday=FR)))),)),
    case("R11-uk-z-pyatnyci-po-ponedilok-wraps-the-week", "Алерти з п'ятниці по понеділок",
         "з п'ятниці по понеділок", "R11",
         joined(day(on_or_before(TODAY, FR)), day(on_or_before(TODAY, FR) + D(weekday=MO))),
         alts=(alt("R11", FUT, joined(day(on_or_after(TODAY, FR)), day(on_or_after(TODAY, FR) + D(weekday=MO)))),)),
    case("R11-uk-z-pn-po-pt-abbreviations", "Чергування з пн по пт", "з пн по пт", "R11",
         joined(day(on_or_before(TODAY, MO)), day(on_or_before(TODAY, MO) + D(weekday=FR))),
         alts=(alt("R11", FUT, joined(day(on_or_after(TODAY, MO)), day(on_or_after(TODAY, MO) + D(weekday=FR)))),)),
    case("R11-uk-vid-1-bereznya-do-15-kvitnya-2026-roku", "Витрати від 1 березня до 15 квітня 2026 року",
         "від 1 березня до 15 квітня 2026 року", "R11", joined(day(date(2026, 3, 1)), day(date(2026, 4, 15)))),
    case("R11-uk-1-en-dash-15-bereznya", "Баги 1\u201315 березня", "1\u201315 березня", "R11",
         joined(day(date(2026, 3, 1)), day(date(2026, 3, 15))),
         alts=(alt("R11", FUT, joined(day(date(2027, 3, 1)), day(date(2027, 3, 15)))),)),
    case("R11-uk-z-ISO-po-ISO", "Витрати з 2025-01-01 по 2025-03-31", "з 2025-01-01 по 2025-03-31", "R11",
         joined(day(date(2025, 1, 1)), day(date(2025, 3, 31))), "2025-01-01/2025-03-31"),
    case("R11-uk-z-mynuloho-tyzhnya-po-cej-tyzhden", "Баги з минулого тижня по цей тиждень",
         "з минулого тижня по цей тиждень", "R11", joined(uk_week(TODAY + D(weeks=-1)), uk_week(TODAY))),
    case("R11-uk-z-2024-po-2025-rik", "Інциденти з 2024 по 2025 рік", "з 2024 по 2025 рік", "R11",
         joined(year(2024), year(2025))),
]


def _past(first_day_in: Any, today: date = TODAY) -> int:
    return most_recent_year(first_day_in, today)


def _future(end_day_in: Any, today: date = TODAY) -> int:
    return next_year_after(end_day_in, today)


_MAR14 = (_past(lambda y: date(y, 3, 14)), _future(lambda y: date(y, 3, 15)))
_DEC3 = (_past(lambda y: date(y, 12, 3)), _future(lambda y: date(y, 12, 4)))

R12 = [
    case("R12-uk-u-berezni-locative", "Баги у березні", "у березні", "R12", _MARCH_PAST, "2026-03",
         alts=(alt("R12", FUT, _MARCH_NEXT),)),
    case("R12-uk-v-berezni", "Баги в березні", "в березні", "R12", _MARCH_PAST,
         alts=(alt("R12", FUT, _MARCH_NEXT),)),
    case("R12-uk-u-hrudni-current-month-counts", "Баги у грудні", "у грудні", "R12", month(2026, 12), "2026-12"),
    case("R12-uk-u-sichni", "Баги у січні", "у січні", "R12", month(_past(lambda y: date(y, 1, 1)), 1),
         alts=(alt("R12", FUT, month(_future(lambda y: date(y, 2, 1)), 1)),)),
    case("R12-uk-u-lyutomu", "Баги у лютому", "у лютому", "R12", month(_past(lambda y: date(y, 2, 1)), 2),
         alts=(alt("R12", FUT, month(_future(lambda y: date(y, 3, 1)), 2)),)),
    case("R12-uk-u-hrudni-said-in-January", "Баги у грудні", "у грудні", "R12",
         month(_past(lambda y: date(y, 12, 1), MID_JANUARY.date()), 12), "2026-12",
         alts=(alt("R12", FUT, month(_future(lambda y: date(y + 1, 1, 1), MID_JANUARY.date()), 12)),),
         now=MID_JANUARY),
    case("R12-uk-14-bereznya", "Реліз 14 березня", "14 березня", "R12", day(date(_MAR14[0], 3, 14)),
         "2026-03-14", alts=(alt("R12", FUT, day(date(_MAR14[1], 3, 14))),)),
    case("R12-uk-3-hrudnya-is-last-year", "Випущено 3 грудня", "3 грудня", "R12",
         day(date(_DEC3[0], 12, 3)), "2025-12-03", alts=(alt("R12", FUT, day(date(_DEC3[1], 12, 3))),)),
    case("R12-uk-29-lyutoho-finds-the-last-leap-year", "Що сталося 29 лютого", "29 лютого", "R12",
         day(date(2024, 2, 29)), "2024-02-29", alts=(alt("R12", FUT, day(date(2028, 2, 29))),),
         now=BEFORE_LEAP_DAY),
    case("R12-uk-u-druhomu-kvartali", "Що випустили у другому кварталі", "у другому кварталі", "R12",
         quarter(_past(lambda y: date(y, 4, 1)), 2), "2026-Q2",
         alts=(alt("R12", FUT, quarter(_future(lambda y: date(y, 7, 1)), 2)),)),
    case("R12-uk-u-III-kvartali-Roman", "Що випустили у III кварталі", "у III кварталі", "R12",
         quarter(_past(lambda y: date(y, 7, 1)), 3), "2026-Q3",
         alts=(alt("R12", FUT, quarter(_future(lambda y: date(y, 10, 1)), 3)),)),
    case("R12-uk-u-chetvertomu-kvartali-current-counts", "Що випустили у четвертому кварталі",
         "у четвертому кварталі", "R12", quarter(2026, 4), "2026-Q4"),
    case("R12-uk-u-Q3", "Що випустили у Q3", "у Q3", "R12", quarter(_past(lambda y: date(y, 7, 1)), 3),
         alts=(alt("R12", FUT, quarter(_future(lambda y: date(y, 10, 1)), 3)),)),
    case("R12-uk-u-pershomu-pivrichchi", "Цілі у першому півріччі", "у першому півріччі", "R12",
         half(_past(lambda y: date(y, 1, 1)), 1), "2026-H1",
         alts=(alt("R12", FUT, half(_future(lambda y: date(y, 7, 1)), 1)),)),
    case("R12-uk-u-druhij-polovyni-roku-current-counts", "Наймання у другій половині року",
         "у другій половині року", "R12", half(2026, 2), "2026-H2"),
]

R13 = [
    case("R13-uk-u-ponedilok", "Баги у понеділок", "у понеділок", "R13", _MONDAY_PAST,
         on_or_before(TODAY, MO).isoformat(), alts=(alt("R13", FUT, _MONDAY_NEXT),)),
    case("R13-uk-v-seredu-is-today-accusative", "Баги в середу", "в середу", "R13", day(TODAY)),
    case("R13-uk-u-chetver", "Баги у четвер", "у четвер", "R13", day(on_or_before(TODAY, TH)),
         alts=(alt("R13", FUT, day(on_or_after(TODAY, TH))),)),
    case("R13-uk-u-vivtorok", "Що зламалося у вівторок", "у вівторок", "R13", day(on_or_before(TODAY, TU)),
         alts=(alt("R13", FUT, day(on_or_after(TODAY, TU))),)),
    case("R13-uk-u-pyatnycyu-accusative", "Баги, закриті у п'ятницю", "у п'ятницю", "R13",
         day(on_or_before(TODAY, FR)), alts=(alt("R13", FUT, day(on_or_after(TODAY, FR))),)),
    case("R13-uk-u-subotu-accusative", "Деплої у суботу", "у суботу", "R13", day(on_or_before(TODAY, SA)),
         alts=(alt("R13", FUT, day(on_or_after(TODAY, SA))),)),
    case("R13-uk-u-pt-abbreviation", "Деплої у пт", "у пт", "R13", day(on_or_before(TODAY, FR)),
         alts=(alt("R13", FUT, day(on_or_after(TODAY, FR))),)),
    case("R13-uk-na-ponedilok", "Задачі на понеділок", "на понеділок", "R13", _MONDAY_PAST,
         alts=(alt("R13", FUT, _MONDAY_NEXT),)),
    case("R13-uk-u-nedilyu-said-on-a-Sunday", "Баги у неділю", "у неділю", "R13", day(SUNDAY.date()), now=SUNDAY),
    case("R13-uk-future-bias-flips-u-ponedilok", "Баги у понеділок", "у понеділок", "R13", _MONDAY_NEXT,
         alts=(alt("R13", PAST, _MONDAY_PAST),), bias="future"),
]

R14 = [
    case("R14-uk-mynuloho-ponedilka-nearest", "Що зламалося минулого понеділка", "минулого понеділка",
         "R14", day(strictly_before(TODAY, MO)), alts=(alt("R16", WEEK, day(in_week(TODAY, MO, -1))),),
         weekday_reading="nearest"),
    case("R14-uk-u-mynulyj-vivtorok-is-yesterday-nearest", "Що зламалося у минулий вівторок",
         "у минулий вівторок", "R14", day(strictly_before(TODAY, TU)),
         alts=(alt("R16", WEEK, day(in_week(TODAY, TU, -1))),), weekday_reading="nearest"),
    case("R14-uk-mynuloyi-pyatnyci-nearest-same-day", "Що зламалося минулої п'ятниці", "минулої п'ятниці",
         "R14", day(strictly_before(TODAY, FR)), weekday_reading="nearest"),
    case("R14-uk-mynuloyi-seredy-said-on-a-Wednesday", "Що зламалося минулої середи", "минулої середи",
         "R14", day(strictly_before(TODAY, WE)), weekday_reading="nearest"),
    case("R14-uk-u-poperednij-ponedilok-nearest", "Що зламалося у попередній понеділок",
         "у попередній понеділок", "R14", day(strictly_before(TODAY, MO)),
         alts=(alt("R16", WEEK, day(in_week(TODAY, MO, -1))),), weekday_reading="nearest"),
    case("R14-uk-mynuloyi-nedili-said-on-a-Sunday", "Що зламалося минулої неділі", "минулої неділі", "R14",
         day(strictly_before(SUNDAY.date(), SU)), now=SUNDAY, weekday_reading="nearest"),
]

R15 = [
    case("R15-uk-u-najblyzhchu-pyatnycyu-is-the-nearest-whatever-the-setting", "Демо у найближчу п'ятницю",
         "у найближчу п'ятницю", "R15", day(strictly_after(TODAY, FR)),
         alts=(alt("R16", None, day(in_week(TODAY, FR, 1))),)),
    case("R15-uk-nastupnoho-chetverha-is-tomorrow-nearest", "Що заплановано наступного четверга",
         "наступного четверга", "R15", day(strictly_after(TODAY, TH)),
         alts=(alt("R16", WEEK, day(in_week(TODAY, TH, 1))),), weekday_reading="nearest"),
    case("R15-uk-u-nastupnu-pyatnycyu-nearest", "Демо у наступну п'ятницю", "у наступну п'ятницю", "R15",
         day(strictly_after(TODAY, FR)), alts=(alt("R16", WEEK, day(in_week(TODAY, FR, 1))),),
         weekday_reading="nearest"),
    case("R15-uk-nastupnoho-ponedilka-nearest-same-day", "Що заплановано наступного понеділка",
         "наступного понеділка", "R15", day(strictly_after(TODAY, MO)), weekday_reading="nearest"),
    case("R15-uk-nastupnoyi-seredy-said-on-a-Wednesday", "Зустріч наступної середи", "наступної середи",
         "R15", day(strictly_after(TODAY, WE)), weekday_reading="nearest"),
    case("R15-uk-nastupnoyi-nedili-said-on-a-Sunday", "Роботи наступної неділі", "наступної неділі", "R15",
         day(strictly_after(SUNDAY.date(), SU)), now=SUNDAY, weekday_reading="nearest"),
]

R16 = [
    case("R16-uk-mynuloho-ponedilka-default-is-last-weeks", "Що зламалося минулого понеділка",
         "минулого понеділка", "R16", day(in_week(TODAY, MO, -1)), in_week(TODAY, MO, -1).isoformat(),
         alts=(alt("R14", NEAREST, day(strictly_before(TODAY, MO))),)),
    case("R16-uk-nastupnoho-chetverha-default-is-next-weeks", "Що заплановано наступного четверга",
         "наступного четверга", "R16", day(in_week(TODAY, TH, 1)),
         alts=(alt("R15", NEAREST, day(strictly_after(TODAY, TH))),)),
    case("R16-uk-u-ponedilok-mynuloho-tyzhnya", "Що зламалося у понеділок минулого тижня",
         "у понеділок минулого тижня", "R16", day(in_week(TODAY, MO, -1))),
    case("R16-uk-u-pyatnycyu-nastupnoho-tyzhnya", "Демо у п'ятницю наступного тижня",
         "у п'ятницю наступного тижня", "R16", day(in_week(TODAY, FR, 1))),
    case("R16-uk-u-seredu-na-comu-tyzhni", "Що було у середу на цьому тижні", "у середу на цьому тижні",
         "R16", day(in_week(TODAY, WE, 0))),
    case("R16-uk-na-mynulomu-tyzhni-v-ponedilok", "Що зламалося на минулому тижні в понеділок",
         "на минулому тижні в понеділок", "R16", day(in_week(TODAY, MO, -1))),
    case("R16-uk-ciyeyi-pyatnyci-CLDR", "Демо цієї п'ятниці", "цієї п'ятниці", "R16", day(in_week(TODAY, FR, 0))),
    case("R16-uk-cogo-ponedilka-already-past", "Деплої цього понеділка", "цього понеділка", "R16",
         day(in_week(TODAY, MO, 0)), alts=(alt("R15", None, day(on_or_after(TODAY, MO))),)),
    case("R16-uk-mynuloyi-nedili-sunday-weeks", "Що зламалося минулої неділі", "минулої неділі", "R16",
         day(in_week(SUNDAY.date(), SU, -1, SU)), now=SUNDAY, week_start="sunday"),
]

R17 = [
    case("R17-uk-u-2025-roci", "Баги у 2025 році", "у 2025 році", "R17", year(2025), "2025"),
    case("R17-uk-za-2024-rik", "Звіт за 2024 рік", "за 2024 рік", "R17", year(2024), "2024"),
    case("R17-uk-na-2022-rik", "Команда на 2022 рік", "на 2022 рік", "R17", year(2022)),
    case("R17-uk-u-2023-r", "Збої у 2023 р.", "у 2023 р.", "R17", year(2023)),
    case("R17-uk-u-2025-mu-roci", "Закрито у 2025-му році", "у 2025-му році", "R17", year(2025)),
    case("R17-uk-za-2025-rik-beside-numbers", "Покажи 5 задач з пріоритетом 2 за 2025 рік",
         "за 2025 рік", "R17", year(2025), "2025"),
]

_UK_03_04 = so.read_numeric(LOCALE, 3, 4, 2026)
_SWAP = {date(2026, 3, 4): date(2026, 4, 3), date(2026, 4, 3): date(2026, 3, 4)}

R18 = [
    case("R18-uk-14-bereznya-2025-roku", "Виправлено 14 березня 2025 року", "14 березня 2025 року", "R18",
         day(date(2025, 3, 14)), "2025-03-14"),
    case("R18-uk-14-bereznya-2025-r", "Виправлено 14 березня 2025 р.", "14 березня 2025 р.", "R18",
         day(date(2025, 3, 14))),
    case("R18-uk-1-ho-bereznya-2025-roku", "Виправлено 1-го березня 2025 року", "1-го березня 2025 року",
         "R18", day(date(2025, 3, 1))),
    case("R18-uk-ISO-date", "Виправлено 2025-03-14", "2025-03-14", "R18", day(date(2025, 3, 14))),
    case("R18-uk-u-pyatnycyu-14-bereznya-2025-r", "Виправлено у п'ятницю, 14 березня 2025 р.",
         "у п'ятницю, 14 березня 2025 р.", "R18", day(date(2025, 3, 14))),
    case("R18-uk-numeric-dotted-day-first", "Виправлено 14.03.2025", "14.03.2025", "R18", day(date(2025, 3, 14))),
    case("R18-uk-numeric-ambiguous-CLDR-order", "Виправлено 03.04.2026", "03.04.2026", "R18",
         day(_UK_03_04), _UK_03_04.isoformat(),
         alts=(alt("R18", other_order_policy(LOCALE), day(_SWAP[_UK_03_04])),)),
    case("R18-uk-numeric-date-order-policy-MDY", "Виправлено 03.04.2026", "03.04.2026", "R18",
         day(date(2026, 3, 4)), alts=(alt("R18", "date_order=DMY", day(date(2026, 4, 3))),), date_order="MDY"),
    case("R18-uk-numeric-only-one-valid-reading", "Виправлено 13.04.2026", "13.04.2026", "R18",
         day(date(2026, 4, 13))),
    case("R18-uk-numeric-two-digit-year", "Виправлено 03.04.26", "03.04.26", "R18", day(_UK_03_04),
         alts=(alt("R18", other_order_policy(LOCALE), day(_SWAP[_UK_03_04])),)),
]

R19 = [
    case("R19-uk-berezen-2025", "Баги березень 2025", "березень 2025", "R19", month(2025, 3), "2025-03"),
    case("R19-uk-u-berezni-2025-roku", "Баги у березні 2025 року", "у березні 2025 року", "R19", month(2025, 3)),
    case("R19-uk-Q3-2025", "Виручка Q3 2025", "Q3 2025", "R19", quarter(2025, 3), "2025-Q3"),
    case("R19-uk-tretij-kvartal-2025-roku", "Виручка за третій квартал 2025 року",
         "за третій квартал 2025 року", "R19", quarter(2025, 3), "2025-Q3"),
    case("R19-uk-III-kvartal-2025-Roman", "Виручка III квартал 2025", "III квартал 2025", "R19", quarter(2025, 3)),
    case("R19-uk-u-3-mu-kvartali-2025-roku", "Виручка у 3-му кварталі 2025 року", "у 3-му кварталі 2025 року",
         "R19", quarter(2025, 3)),
    case("R19-uk-H1-2026", "Цілі H1 2026", "H1 2026", "R19", half(2026, 1), "2026-H1"),
    case("R19-uk-pershe-pivrichchya-2026-roku", "Цілі на перше півріччя 2026 року",
         "на перше півріччя 2026 року", "R19", half(2026, 1), "2026-H1"),
    case("R19-uk-persha-polovyna-2026-roku", "Цілі перша половина 2026 року", "перша половина 2026 року",
         "R19", half(2026, 1)),
    case("R19-uk-II-pivrichchya-2025-Roman", "Цілі II півріччя 2025", "II півріччя 2025", "R19",
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
    case("R20-uk-na-48-mu-tyzhni-2026-roku", "Тікети на 48-му тижні 2026 року", "на 48-му тижні 2026 року",
         "R20", iso_week(2026, 48), "2026-W48"),
    case("R20-uk-48-j-tyzhden-2026-roku", "Тікети 48-й тиждень 2026 року", "48-й тиждень 2026 року", "R20",
         iso_week(2026, 48)),
    case("R20-uk-tyzhden-48-past-bias", "Тікети тиждень 48", "тиждень 48", "R20",
         iso_week(_recent_week(48), 48), "2026-W48", alts=(alt("R20", FUT, iso_week(_next_week(48), 48)),)),
    case("R20-uk-na-49-mu-tyzhni-current-counts", "Тікети на 49-му тижні", "на 49-му тижні", "R20",
         iso_week(2026, 49), "2026-W49"),
    case("R20-uk-50-ho-tyzhnya-is-last-year", "Тікети 50-го тижня", "50-го тижня", "R20",
         iso_week(_recent_week(50), 50), "2025-W50", alts=(alt("R20", FUT, iso_week(_next_week(50), 50)),)),
    case("R20-uk-na-53-mu-tyzhni-finds-the-last-long-year", "Тікети на 53-му тижні", "на 53-му тижні", "R20",
         iso_week(_recent_week(53), 53), "2020-W53", alts=(alt("R20", FUT, iso_week(_next_week(53), 53)),)),
    case("R20-uk-tyzhden-No-12", "Тікети тиждень \u211612", "тиждень \u211612", "R20",
         iso_week(_recent_week(12), 12), alts=(alt("R20", FUT, iso_week(_next_week(12), 12)),)),
    case("R20-uk-W48", "Тікети W48", "W48", "R20", iso_week(_recent_week(48), 48),
         alts=(alt("R20", FUT, iso_week(_next_week(48), 48)),)),
    case("R20-uk-ISO-2026-W48", "Тікети 2026-W48", "2026-W48", "R20", iso_week(2026, 48), "2026-W48"),
]


def _to_now(first: tuple[str, str], now: datetime = NOW) -> tuple[str, str]:
    return first[0], iso(now)  # type: ignore[return-value]


R21 = [
    case("R21-uk-z-pochatku-roku", "Виручка з початку року", "з початку року", "R21", _to_now(year(2026)),
         f"{year(2026)[0]}/{iso(NOW)}"),
    case("R21-uk-z-pochatku-misyacya", "Витрати з початку місяця", "з початку місяця", "R21",
         _to_now(month_of(TODAY))),
    case("R21-uk-z-pochatku-kvartalu", "Виручка з початку кварталу", "з початку кварталу", "R21",
         _to_now(quarter_of(TODAY))),
    case("R21-uk-vid-pochatku-cogo-roku", "Баги від початку цього року", "від початку цього року", "R21",
         _to_now(year(2026))),
    case("R21-uk-z-pochatku-tyzhnya-on-a-Sunday", "Коміти з початку тижня", "з початку тижня", "R21",
         _to_now(uk_week(SUNDAY.date()), SUNDAY), now=SUNDAY),
]

R22 = [
    case("R22-uk-sogodni-vranci", "Що зламалося сьогодні вранці", "сьогодні вранці", "R22",
         period(TODAY, "morning1")),
    case("R22-uk-sogodni-zranku", "Що зламалося сьогодні зранку", "сьогодні зранку", "R22",
         period(TODAY, "morning1")),
    case("R22-uk-sogodni-vden", "Що зламалося сьогодні вдень", "сьогодні вдень", "R22", period(TODAY, "afternoon1")),
    case("R22-uk-sogodni-vvecheri", "Що викотимо сьогодні ввечері", "сьогодні ввечері", "R22",
         period(TODAY, "evening1")),
    case("R22-uk-cogo-ranku", "Що зламалося цього ранку", "цього ранку", "R22", period(TODAY, "morning1")),
    case("R22-uk-vchora-vvecheri-ends-at-midnight", "Що зламалося вчора ввечері", "вчора ввечері", "R22",
         period(TODAY + D(days=-1), "evening1")),
    case("R22-uk-uchora-uvecheri", "Що зламалося учора увечері", "учора увечері", "R22",
         period(TODAY + D(days=-1), "evening1")),
    case("R22-uk-vchora-vden", "Що зламалося вчора вдень", "вчора вдень", "R22",
         period(TODAY + D(days=-1), "afternoon1")),
    case("R22-uk-mynuloyi-nochi-is-todays-CLDR-night", "Що впало минулої ночі", "минулої ночі", "R22",
         period(TODAY, "night1")),
    case("R22-uk-vchora-vnochi-is-todays-CLDR-night", "Що впало вчора вночі", "вчора вночі", "R22",
         period(TODAY, "night1")),
    case("R22-uk-zavtra-vranci", "Що викотимо завтра вранці", "завтра вранці", "R22",
         period(TODAY + D(days=1), "morning1")),
    case("R22-uk-pozavchora-vvecheri-Kyiv", "Що зламалося позавчора ввечері", "позавчора ввечері", "R22",
         period(KYIV_NOW.date() + D(days=-2), "evening1", KYIV), now=KYIV_NOW),
]

_SAT = SATURDAY.date()

R23 = [
    case("R23-uk-cymy-vyhidnymy-on-a-Wednesday", "Деплої цими вихідними", "цими вихідними", "R23",
         weekend(first_open_weekend(TODAY)), so.weekend_value(LOCALE, first_open_weekend(TODAY))),
    case("R23-uk-na-cyh-vyhidnyh", "Деплої на цих вихідних", "на цих вихідних", "R23",
         weekend(first_open_weekend(TODAY))),
    case("R23-uk-mynulymy-vyhidnymy", "Алерти минулими вихідними", "минулими вихідними", "R23",
         weekend(last_ended_weekend(TODAY))),
    case("R23-uk-na-mynulyh-vyhidnyh", "Алерти на минулих вихідних", "на минулих вихідних", "R23",
         weekend(last_ended_weekend(TODAY))),
    case("R23-uk-nastupnymy-vyhidnymy", "Роботи наступними вихідними", "наступними вихідними", "R23",
         weekend(first_open_weekend(TODAY) + D(weeks=1)), alts=(alt("R23", None, weekend(first_open_weekend(TODAY))),)),
    case("R23-uk-na-vyhidnyh-on-a-Wednesday", "Що зламалося на вихідних", "на вихідних", "R23",
         weekend(last_ended_weekend(TODAY)), alts=(alt("R23", FUT, weekend(first_open_weekend(TODAY))),)),
    case("R23-uk-za-vyhidni", "Що зламалося за вихідні", "за вихідні", "R23",
         weekend(last_ended_weekend(TODAY)), alts=(alt("R23", FUT, weekend(first_open_weekend(TODAY))),)),
    case("R23-uk-na-vyhidnyh-future-bias", "Що зламається на вихідних", "на вихідних", "R23",
         weekend(first_open_weekend(TODAY)), alts=(alt("R23", PAST, weekend(last_ended_weekend(TODAY))),),
         bias="future"),
    case("R23-uk-cymy-vyhidnymy-on-a-Saturday", "Деплої цими вихідними", "цими вихідними", "R23",
         weekend(first_open_weekend(_SAT)), now=SATURDAY),
    case("R23-uk-u-vyhidni-on-a-Saturday-is-this-one", "Пейджі у вихідні", "у вихідні", "R23",
         weekend(first_open_weekend(_SAT)), now=SATURDAY),
    case("R23-uk-na-mynulyh-vyhidnyh-on-a-Monday", "Алерти на минулих вихідних", "на минулих вихідних",
         "R23", weekend(last_ended_weekend(MONDAY_AFTER.date())), now=MONDAY_AFTER),
]

TABLES = {"R1": R1, "R2": R2, "R3": R3, "R4": R4, "R5": R5, "R6": R6, "R7": R7, "R8": R8,
          "R9": R9, "R10": R10, "R11": R11, "R12": R12, "R13": R13, "R14": R14, "R15": R15,
          "R16": R16, "R17": R17, "R18": R18, "R19": R19, "R20": R20, "R21": R21, "R22": R22,
          "R23": R23}
DEEP = {"R5", "R11", "R12", "R13", "R14", "R15", "R16", "R18", "R22", "R23"}


def test_every_reading_has_worked_ukrainian_examples() -> None:
    check_tables(TABLES, "uk", DEEP)


def test_the_clocks_and_CLDR_facts_the_tables_use() -> None:
    # stdlib date.weekday(); CLDR 49 via babel: UA weeks start on Monday, weekend Saturday-Sunday,
    # numeric dates day first, Friday written with U+02BC; Kyiv clocks go forward on 2026-03-29.
    assert (NOW.weekday(), SATURDAY.weekday(), SUNDAY.weekday(), MONDAY_AFTER.weekday()) == (2, 5, 6, 0)
    assert _UK_FIRST == MO and so.weekend_days(LOCALE) == (SA, 2)
    assert numeric_order(LOCALE) == "DM"
    from nlnorm import cldr

    assert ("п\u02bcятниця", 4) in cldr.weekday_words(LOCALE)["wide"]
    assert SPRING_KYIV.utcoffset() != datetime(2026, 3, 28, 12, 0, tzinfo=KYIV).utcoffset()


@pytest.mark.parametrize(PARAMS, all_cases(TABLES))
def test_ukrainian_phrase_resolves_to_its_interval(question, phrase, reading, bounds, value, alts, context):
    UK.check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, all_cases(TABLES))
def test_ukrainian_phrase_reads_the_same_with_every_language_on(question, phrase, reading, bounds, value, alts,
                                                          context):
    UK.check_among_every_language(question, phrase, reading, bounds, context)


@pytest.mark.parametrize(PARAMS, all_cases(TABLES))
def test_every_ukrainian_alternative_names_a_policy_that_selects_it_or_none(
        question, phrase, reading, bounds, value, alts, context):
    UK.alternatives_are_selected_by_their_policy(question, context)


def test_the_locale_file_reads_last_weekday_as_that_day_of_last_week() -> None:
    # common practice: "минулого понеділка" is Monday of last week (stated in locales/uk.toml).
    assert load_locale("uk").meta.weekday_reading == "week"


@pytest.mark.parametrize("apostrophe", ["'", "\u2019", "\u02bc"], ids=["ascii", "typographic", "modifier-letter"])
def test_every_apostrophe_spelling_of_friday_is_friday(apostrophe):
    # CLDR writes U+02BC; "’" becomes "'" in text preparation; "'" is what keyboards type.
    question = f"Що треба зробити у п{apostrophe}ятницю"
    m = one(question)
    assert m.text == f"у п{apostrophe}ятницю"
    assert (m.start, m.end) == day(on_or_before(TODAY, FR))


# --- D: lengths of time after a cue -----------------------------------------------------------

DURATIONS = [
    ("D-uk-ponad-3-dni", "Задачі, відкриті понад 3 дні", "3 дні", "P3D"),
    ("D-uk-dovshe-nizh-dva-tyzhni", "Тікети висять довше ніж два тижні", "два тижні", "P2W"),
    ("D-uk-na-3-dni", "Заморозка на 3 дні", "на 3 дні", "P3D"),
    ("D-uk-za-try-dni-within", "Зробили за три дні", "за три дні", "P3D"),
    ("D-uk-bilshe-24-hodyn", "Рев'ю триває більше 24 годин", "24 годин", "PT24H"),
]


@pytest.mark.parametrize(("question", "phrase", "value"), [d[1:] for d in DURATIONS],
                         ids=[d[0] for d in DURATIONS])
def test_D_a_count_of_units_after_a_cue_is_a_duration(question, phrase, value):
    # ISO 8601 durations; the cue words ("понад", "довше ніж") stay in the question.
    m = one(question)
    assert (m.text, m.kind, m.reading, m.value) == (phrase, "duration", "D", value)
    assert m.start is None and m.end is None


# --- policies ---------------------------------------------------------------------------------

POLICY_FLIPS = [
    ("R12-uk-bias-future-u-berezni", "Баги у березні", {}, ("bias", "future", "past")),
    ("R12-uk-bias-future-3-hrudnya", "Випущено 3 грудня", {}, ("bias", "future", "past")),
    ("R13-uk-bias-future-u-ponedilok", "Баги у понеділок", {}, ("bias", "future", "past")),
    ("R20-uk-bias-future-tyzhden-48", "Тікети тиждень 48", {}, ("bias", "future", "past")),
    ("R23-uk-bias-future-na-vyhidnyh", "Що зламалося на вихідних", {}, ("bias", "future", "past")),
    ("R7-uk-bias-future-z-bereznya", "Баги, закриті з березня", {}, ("bias", "future", "past")),
    ("R11-uk-bias-future-z-bereznya-po-traven", "Баги з березня по травень", {}, ("bias", "future", "past")),
    ("R5-uk-window-calendar-za-ostanni-3-misyaci", "Тікети за останні 3 місяці", {},
     ("window_reading", "calendar", "rolling")),
    ("R6-uk-window-calendar-u-najblyzhchi-3-dni", "Що зробити у найближчі 3 дні", {},
     ("window_reading", "calendar", "rolling")),
    ("R16-uk-weekday-nearest-mynuloho-ponedilka", "Що зламалося минулого понеділка", {},
     ("weekday_reading", "nearest", "week")),
    ("R16-uk-weekday-nearest-nastupnoho-chetverha", "Що заплановано наступного четверга", {},
     ("weekday_reading", "nearest", "week")),
    ("R18-uk-date-order-MDY", "Виправлено 03.04.2026", {}, ("date_order", "MDY", "DMY")),
]


@pytest.mark.parametrize(("question", "base", "setting"), [p[1:] for p in POLICY_FLIPS],
                         ids=[p[0] for p in POLICY_FLIPS])
def test_a_policy_flips_the_ukrainian_reading_and_the_old_one_becomes_the_alternative(question, base, setting):
    UK.policy_flips(question, base, setting)


# --- Ukrainian and English (and Russian) in one question ---------------------------------------

MIXED = [
    ("R2-uk-en-tickets-za-mynulyj-tyzhden", "Покажи tickets за минулий тиждень", "за минулий тиждень",
     "uk", uk_week(TODAY + D(weeks=-1))),
    ("R2-uk-en-bugs-mynuloho-tyzhnya", "Які bugs закрили минулого тижня", "минулого тижня", "uk",
     uk_week(TODAY + D(weeks=-1))),
    ("R1-uk-en-issues-yesterday", "Які issues закрили yesterday?", "yesterday", "en", day(TODAY + D(days=-1))),
    ("R7-uk-en-PR-since-March", "Покажи всі PR since March", "since March", "en", since(_MARCH_PAST)),
    ("R7-uk-en-merge-requests-z-1-bereznya", "Усі merge requests з 1 березня", "з 1 березня", "uk",
     since(day(date(2026, 3, 1)))),
    ("R23-uk-en-deploys-last-weekend", "Які деплої були last weekend", "last weekend", "en",
     weekend(last_ended_weekend(TODAY))),
    ("R3-uk-en-issues-3-dni-tomu", "Усі issues, створені 3 дні тому", "3 дні тому", "uk", day(TODAY + D(days=-3))),
    ("R5-uk-en-bugs-in-the-last-7-days", "Які bugs створили in the last 7 days?", "in the last 7 days", "en",
     (wall(NOW, days=-7), iso(NOW))),
    ("R11-uk-en-releases-mizh-1-i-15-bereznya", "Усі releases між 1 і 15 березня", "між 1 і 15 березня",
     "uk", joined(day(date(2026, 3, 1)), day(date(2026, 3, 15)))),
    ("R2-uk-en-story-points-mynuloho-misyacya", "Скільки story points закрили минулого місяця",
     "минулого місяця", "uk", month_of(TODAY + D(months=-1))),
]


@pytest.mark.parametrize(("question", "phrase", "lang", "bounds"), [m[1:] for m in MIXED],
                         ids=[m[0] for m in MIXED])
def test_a_question_mixing_ukrainian_and_english_finds_the_phrase_in_either(question, phrase, lang, bounds):
    m = one(question, languages=("uk", "en"))
    assert (m.text, m.lang, (m.start, m.end)) == (phrase, lang, bounds)
    assert question[m.char_start : m.char_end] == phrase


def test_a_ukrainian_and_an_english_phrase_in_one_question_are_both_found() -> None:
    result = run("Баги за минулий тиждень і bugs since Monday", languages=("uk", "en"))
    assert [(m.text, m.lang) for m in result.mentions] == [("за минулий тиждень", "uk"),
                                                           ("since Monday", "en")]


# Ukrainian and Russian share the Cyrillic script and many words; with both on, each phrase is
# read in its own language.
UK_AND_RU = [
    ("R2-uk-ru-mynuloho-tyzhnya", "Баги минулого тижня", "минулого тижня", "uk", uk_week(TODAY + D(weeks=-1))),
    ("R2-uk-ru-na-proshloj-nedele", "Баги на прошлой неделе", "на прошлой неделе", "ru",
     uk_week(TODAY + D(weeks=-1))),
    ("R9-uk-ru-do-pyatnyci", "Зробити до п'ятниці", "до п'ятниці", "uk", before(day(on_or_after(TODAY, FR)))),
    ("R9-uk-ru-do-pyatnicy", "Сделать до пятницы", "до пятницы", "ru", before(day(on_or_after(TODAY, FR)))),
    ("R13-uk-ru-v-seredu", "Що зламалося в середу", "в середу", "uk", day(TODAY)),
    ("R13-uk-ru-v-sredu", "Что сломалось в среду", "в среду", "ru", day(TODAY)),
]


@pytest.mark.parametrize(("question", "phrase", "lang", "bounds"), [m[1:] for m in UK_AND_RU],
                         ids=[m[0] for m in UK_AND_RU])
def test_with_ukrainian_and_russian_on_each_phrase_is_read_in_its_own_language(question, phrase, lang, bounds):
    m = one(question, languages=("uk", "ru", "en"))
    assert (m.text, m.lang, (m.start, m.end)) == (phrase, lang, bounds)


# --- look-alikes (reading N) -------------------------------------------------------------------

TRAPS = [
    ("N-uk-lyst-letter-not-lyst-abbreviation", "Надішли лист команді"),
    ("N-uk-na-lyst-letter", "Відповідь на лист клієнта"),
    ("N-uk-serp-sickle", "Серп на логотипі"),
    ("N-uk-trav-herbs", "Збір трав у горах"),
    ("N-uk-lyutyj-fierce", "Лютий баг у продакшені"),
    ("N-uk-lyutyj-fierce-mid-sentence", "Це був лютий клієнт"),
    ("N-uk-druhyj-ordinal", "Другий білд упав"),
    ("N-uk-druha-ordinal", "Друга задача у списку"),
    ("N-uk-pershyj-komit", "Перший коміт у репозиторії"),
    ("N-uk-ostannij-komentar", "Останній коментар у задачі"),
    ("N-uk-nastupnyj-krok", "Наступний крок за тобою"),
    ("N-uk-poperednij-reliz", "Попередній реліз був кращим"),
    ("N-uk-cej-tiket", "Цей тікет закрито"),
    ("N-uk-priorytet-2", "Задачі з пріоритетом 2"),
    ("N-uk-versiya-2025.1", "Баги у версії 2025.1"),
    ("N-uk-top-10", "Топ 10 виконавців"),
    ("N-uk-5-baliv", "Задачі на 5 балів"),
    ("N-uk-tiket-2025", "Хто власник тікета 2025?"),
    ("N-uk-sprint-48", "Баги у спринті 48"),
    ("N-uk-pomylka-404", "Помилка 404 на сторінці 3"),
    ("N-uk-3-z-5", "3 з 5 тестів пройшли"),
    ("N-uk-bare-2025-no-cue", "2025 задач закрито"),
    ("N-uk-tyzhden-event", "Тиждень якості пройшов добре"),
    ("N-uk-shchotyzhnya", "Релізи щотижня"),
    ("N-uk-dva-relizy-na-tyzhden", "Два релізи на тиждень"),
    ("N-uk-den-narodzhennya", "День народження команди"),
    ("N-uk-robochyj-den", "Робочий день закінчився"),
    ("N-uk-po-pyatnycyah-recurring", "Зустрічі по п'ятницях"),
    ("N-uk-po-ponedilkah-recurring", "Релізи по понеділках"),
    ("N-uk-nastupnoho-dnya-told-of", "Наступного дня білд упав"),
    ("N-uk-v-ostanni-dni-plural-no-number", "В останні дні було спокійно"),
    ("N-uk-u-nastupni-roky-plural-no-number", "У наступні роки це змінимо"),
    ("N-uk-Vt-watt", "Лампа на 60 Вт"),
    ("N-uk-sr-compare", "Ср. з попереднім звітом"),
    ("N-uk-vyhidni-dani", "Вихідні дані звіту"),
    ("N-uk-simya", "Сім'я розробників"),
    ("N-uk-pyatnychnyj-reliz", "П'ятничний реліз"),
    ("N-uk-richnyj-zvit", "Річний звіт готовий"),
    ("N-uk-sogodnishnij-reliz", "Сьогоднішній реліз"),
    ("N-uk-pislya-obidu", "Після обіду дзвінок"),
    ("N-uk-zadacha-14", "Задача 14 у кого?"),
    ("N-uk-zachekaj-sekundu", "Зачекай секунду"),
    ("N-uk-dobroho-ranku", "Доброго ранку, команда"),
    ("N-uk-plan-na-tyzhden", "План на тиждень"),
    ("N-uk-druha-polovyna-dnya", "Друга половина дня вільна"),
    ("N-uk-pershyj-tyzhden-sprintu", "Перший тиждень спринту"),
    ("N-uk-zvit-za-misyac", "Звіт за місяць"),
]


@pytest.mark.parametrize(("question",), [(q,) for _, q in TRAPS], ids=[i for i, _ in TRAPS])
def test_a_ukrainian_look_alike_gives_no_temporal_mention(question):
    result = run(question, languages=("uk", "en"))
    assert result.mentions == ()
    assert result.rewritten == question


def test_there_are_at_least_twenty_five_ukrainian_traps():
    assert len(TRAPS) >= 25
    assert len({q for _, q in TRAPS}) == len(TRAPS)


PAIRS = [
    ("N-uk-lyst-vs-u-lystopadi", "Надішли лист команді", "Баги у листопаді", "у листопаді"),
    ("N-uk-lyutyj-fierce-vs-u-lyutomu", "Лютий баг у продакшені", "Баги у лютому", "у лютому"),
    ("N-uk-druhyj-vs-u-druhomu-kvartali", "Другий білд упав", "Білди у другому кварталі", "у другому кварталі"),
    ("N-uk-priorytet-2-vs-2-dni-tomu", "Задачі з пріоритетом 2", "Задачі 2 дні тому", "2 дні тому"),
    ("N-uk-tiket-2025-vs-u-2025-roci", "Хто власник тікета 2025?", "Тікети у 2025 році", "у 2025 році"),
    ("N-uk-po-pyatnycyah-vs-po-pyatnycyu", "Зустрічі по п'ятницях", "Зустрічі по п'ятницю", "по п'ятницю"),
    ("N-uk-v-ostanni-dni-vs-za-ostanni-3-dni", "В останні дні було спокійно", "За останні 3 дні було спокійно",
     "За останні 3 дні"),
]


@pytest.mark.parametrize(("trap", "temporal", "phrase"), [p[1:] for p in PAIRS], ids=[p[0] for p in PAIRS])
def test_the_same_ukrainian_word_is_a_time_word_only_where_the_question_makes_it_one(trap, temporal, phrase):
    assert run(trap).mentions == ()
    assert one(temporal).text == phrase


MIXED_TRAPS = [
    ("N-uk-lyst-beside-z-bereznya", "Надішли лист з березня", "з березня"),
    ("N-uk-druhyj-beside-z-ponedilka", "Другий білд з понеділка", "з понеділка"),
    ("N-uk-top-10-beside-cogo-tyzhnya", "Топ 10 виконавців цього тижня", "цього тижня"),
    ("N-uk-priorytet-beside-za-2025-rik", "Задачі з пріоритетом 2 за 2025 рік", "за 2025 рік"),
    ("N-uk-versiya-beside-ISO-date", "Баги версії 2025.1 з 2025-03-14", "з 2025-03-14"),
]


@pytest.mark.parametrize(("question", "phrase"), [m[1:] for m in MIXED_TRAPS], ids=[m[0] for m in MIXED_TRAPS])
def test_a_ukrainian_look_alike_beside_a_time_phrase_stays_out_of_the_mention(question, phrase):
    m = one(question)
    assert m.text == phrase
    assert question[m.char_start : m.char_end] == phrase
