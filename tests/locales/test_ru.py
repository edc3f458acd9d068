"""Russian: worked examples for every reading R1-R23 and D, the policies, numeric dates in the
CLDR order of ``ru``, questions mixing Russian and English, and look-alike words (reading N).

Checked against:
- python-dateutil ``relativedelta``: weekday steps, day, week, month and year arithmetic with
  month-end clamping; stdlib ``calendar.monthrange``/``calendar.isleap``;
- ISO 8601 week dates via stdlib ``date.fromisocalendar``;
- CLDR 49 via babel 2.19: Russian day-period rules (``Locale("ru").day_period_rules``: утро
  04:00-12:00, день 12:00-18:00, вечер 18:00-22:00, ночь 22:00-04:00), the week data of the
  territory RU (``first_week_day``, ``weekend_start``/``weekend_end``) and the order of numeric
  dates (``babel.dates.get_date_format("short", locale="ru")``, day first);
- the IANA tz database via stdlib zoneinfo + tzdata (Berlin daylight-saving changes; Moscow
  keeps UTC+03:00 all year);
- the questions and phrases are written from knowledge of the language (no published source);
- common practice (no published source): "в прошлый понедельник" / "в следующий четверг" mean
  that day of last / next week (locales/ru.toml ``weekday_reading = "week"``); "до X" ends
  before X, "по X" (accusative) and "вплоть до X" take X in, "по X" with the dative ("по
  прошлой неделе") is X itself; "с X по Y" and "между X и Y" take both ends
  in; "в 2 часа" is a clock time, not a length of time.
"""

from __future__ import annotations

from datetime import date, datetime
from typing import Any
from zoneinfo import ZoneInfo

import pytest
from dateutil.relativedelta import FR, MO, SA, SU, TH, TU, WE

from nlnorm.locale import load_locale
from tests.helpers import BERLIN, NOW, TODAY
from tests.locales.slavic_oracles import (
    BEFORE_LEAP_DAY, CAL as _CAL, FUT as _FUT, JANUARY_END, LEAP_DAY, MID_JANUARY, MONDAY_AFTER,
    MONTH_END, NEAREST as _NEAREST, PARAMS, PAST as _PAST, QUARTER_PAST, ROLL as _ROLL, SATURDAY,
    SPRING_BERLIN, SUNDAY, WEEK as _WEEK, D, Runner, all_cases, case, check_tables, first_weekday,
    other_order_policy,
)
from tests.locales import slavic_oracles as so
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

LOCALE = "ru"
RU = Runner("ru", LOCALE)
MOSCOW = ZoneInfo("Europe/Moscow")
#: Wednesday 2 December 2026, 10:00 in Moscow; Sunday 1 March 2026, 10:00 in Moscow.
MOSCOW_NOW = datetime(2026, 12, 2, 10, 0, tzinfo=MOSCOW)
MOSCOW_MARCH_FIRST = datetime(2026, 3, 1, 10, 0, tzinfo=MOSCOW)
_RU_FIRST = first_weekday(LOCALE)


def period(d: date, pid: str, tz: ZoneInfo = BERLIN) -> tuple[str, str]:
    return so.period(LOCALE, d, pid, tz)


def ru_weekend() -> tuple[Any, int]:
    return so.weekend_days(LOCALE)


def weekend(first: date) -> tuple[str, str]:
    return so.weekend(LOCALE, first)


def last_ended_weekend(today: date) -> date:
    return so.last_ended_weekend(LOCALE, today)


def first_open_weekend(today: date) -> date:
    return so.first_open_weekend(LOCALE, today)


def ru_week(d: date) -> tuple[str, str]:
    return so.locale_week(LOCALE, d)


def read_ru(a: int, b: int, y: int) -> date:
    return so.read_numeric(LOCALE, a, b, y)


def one(question: str, **context: Any):  # type: ignore[no-untyped-def]
    return RU.one(question, **context)


def run(question: str, **context: Any):  # type: ignore[no-untyped-def]
    return RU.run(question, **context)


R1 = [
    case("R1-ru-vchera", "Какие баги закрыли вчера?", "вчера", "R1", day(TODAY + D(days=-1)),
         (TODAY + D(days=-1)).isoformat()),
    case("R1-ru-segodnya", "Что сделали сегодня?", "сегодня", "R1", day(TODAY), TODAY.isoformat()),
    case("R1-ru-zavtra", "Что нужно сдать завтра?", "завтра", "R1", day(TODAY + D(days=1))),
    case("R1-ru-pozavchera", "Что переоткрыли позавчера?", "позавчера", "R1", day(TODAY + D(days=-2))),
    case("R1-ru-na-poslezavtra", "Какие задачи на послезавтра?", "на послезавтра", "R1",
         day(TODAY + D(days=2))),
    case("R1-ru-za-vcherashnij-den", "Итоги за вчерашний день", "за вчерашний день", "R1",
         day(TODAY + D(days=-1))),
    case("R1-ru-vchera-Moscow-across-a-month-start", "Кто комментировал вчера?", "вчера", "R1",
         day(MOSCOW_MARCH_FIRST.date() + D(days=-1), MOSCOW), "2026-02-28", now=MOSCOW_MARCH_FIRST),
]

R2 = [
    case("R2-ru-na-proshloj-nedele", "Какие баги были созданы на прошлой неделе?",
         "на прошлой неделе", "R2", ru_week(TODAY + D(weeks=-1)), iso_week_name(TODAY + D(weeks=-1))),
    case("R2-ru-na-etoj-nedele", "Сколько задач закрыто на этой неделе?", "на этой неделе", "R2",
         ru_week(TODAY), iso_week_name(TODAY)),
    case("R2-ru-na-sleduyushchej-nedele", "Что запланировано на следующей неделе?",
         "на следующей неделе", "R2", ru_week(TODAY + D(weeks=1))),
    case("R2-ru-za-proshluyu-nedelyu", "Покажи задачи за прошлую неделю", "за прошлую неделю", "R2",
         ru_week(TODAY + D(weeks=-1))),
    case("R2-ru-v-proshlom-mesyace-at-a-month-end", "Какие баги исправили в прошлом месяце?",
         "в прошлом месяце", "R2", month_of(MONTH_END.date() + D(months=-1)), "2026-02", now=MONTH_END),
    case("R2-ru-v-etom-kvartale", "Кто закрыл больше всего тикетов в этом квартале?",
         "в этом квартале", "R2", quarter_of(TODAY), "2026-Q4"),
    case("R2-ru-za-proshlyj-kvartal", "Велосити за прошлый квартал", "за прошлый квартал", "R2",
         quarter_of(TODAY + D(months=-3)), "2026-Q3"),
    case("R2-ru-na-sleduyushchij-god", "Эпики на следующий год", "на следующий год", "R2",
         year(TODAY.year + 1), "2027"),
    case("R2-ru-po-proshloj-nedele-dative-is-the-week", "Статистика по прошлой неделе",
         "по прошлой неделе", "R2", ru_week(TODAY + D(weeks=-1))),
    case("R2-ru-po-proshlomu-mesyacu-dative", "Отчёт по прошлому месяцу", "по прошлому месяцу", "R2",
         month_of(TODAY + D(months=-1))),
    case("R2-ru-v-proshlom-godu", "Релизы в прошлом году", "в прошлом году", "R2", year(TODAY.year - 1)),
    case("R2-ru-s-etogo-mesyaca-inner", "Баги текущего месяца", "текущего месяца", "R2", month_of(TODAY)),
    case("R2-ru-na-proshloj-nedele-sunday-weeks-on-a-Sunday", "Тикеты, закрытые на прошлой неделе",
         "на прошлой неделе", "R2", week(SUNDAY.date() + D(weeks=-1), SU), "2026-11-29/P1W",
         now=SUNDAY, week_start="sunday"),
]

R3 = [
    case("R3-ru-polgoda-nazad-is-6-months", "Что закрыли полгода назад", "полгода назад", "R3",
         month_of(TODAY + D(months=-6)), (TODAY + D(months=-6)).strftime("%Y-%m")),
    case("R3-ru-3-dnya-nazad", "Баги, открытые 3 дня назад", "3 дня назад", "R3", day(TODAY + D(days=-3))),
    case("R3-ru-pyat-dnej-nazad", "Баги, открытые пять дней назад", "пять дней назад", "R3",
         day(TODAY + D(days=-5))),
    case("R3-ru-dve-nedeli-nazad", "Что сломалось две недели назад", "две недели назад", "R3",
         ru_week(TODAY + D(weeks=-2)), iso_week_name(TODAY + D(weeks=-2))),
    case("R3-ru-mesyac-nazad-at-a-month-end", "Что смержили месяц назад", "месяц назад", "R3",
         month_of((MONTH_END + D(months=-1)).date()), "2026-02", now=MONTH_END),
    case("R3-ru-tri-kvartala-nazad", "Велосити три квартала назад", "три квартала назад", "R3",
         quarter_of(TODAY + D(months=-9)), "2026-Q1"),
    case("R3-ru-god-tomu-nazad", "Открытые баги год тому назад", "год тому назад", "R3",
         year(TODAY.year - 1), "2025"),
    case("R3-ru-2-chasa-nazad", "Алерты 2 часа назад", "2 часа назад", "R3", hour_of(moved(NOW, hours=-2))),
    case("R3-ru-nedelyu-nazad-Moscow", "Что закрыли неделю назад", "неделю назад", "R3",
         span(week_start(MOSCOW_NOW.date() + D(weeks=-1)), week_start(MOSCOW_NOW.date()), MOSCOW),
         now=MOSCOW_NOW),
]

R4 = [
    case("R4-ru-cherez-polchasa-is-30-minutes", "Что запустится через полчаса", "через полчаса", "R4",
         (elapsed(NOW, minutes=30), elapsed(NOW, minutes=31))),
    case("R4-ru-cherez-3-dnya", "Что нужно сдать через 3 дня", "через 3 дня", "R4", day(TODAY + D(days=3))),
    case("R4-ru-cherez-dve-nedeli", "Что нужно сдать через две недели", "через две недели", "R4",
         ru_week(TODAY + D(weeks=2)), iso_week_name(TODAY + D(weeks=2))),
    case("R4-ru-cherez-mesyac-from-January-31", "Что продлевается через месяц", "через месяц", "R4",
         month_of((JANUARY_END + D(months=1)).date()), "2026-02", now=JANUARY_END),
    case("R4-ru-cherez-2-chasa", "Какие джобы запустятся через 2 часа", "через 2 часа", "R4",
         hour_of(moved(NOW, hours=2))),
    case("R4-ru-cherez-god", "Контракты, истекающие через год", "через год", "R4", year(TODAY.year + 1)),
    case("R4-ru-cherez-paru-dnej", "Релиз через пару дней", "через пару дней", "R4", day(TODAY + D(days=2))),
]

_THIS_MONTH = TODAY.replace(day=1)
_THIS_WEEK = week_start(TODAY)

R5 = [
    case("R5-ru-za-poslednie-sutki", "Ошибки за последние сутки", "за последние сутки", "R5",
         (wall(NOW, days=-1), iso(NOW)), alts=(alt("R5", _CAL, _cal_back(NOW, TODAY, 1, "days")),)),
    case("R5-ru-za-poslednie-polgoda", "Инциденты за последние полгода", "за последние полгода", "R5",
         (wall(NOW, months=-6), iso(NOW)), alts=(alt("R5", _CAL, _cal_back(NOW, _THIS_MONTH, 6, "months")),)),
    case("R5-ru-za-poslednie-7-dnej", "Баги за последние 7 дней", "за последние 7 дней", "R5",
         (wall(NOW, days=-7), iso(NOW)), alts=(alt("R5", _CAL, _cal_back(NOW, TODAY, 7, "days")),)),
    case("R5-ru-za-poslednie-tri-dnya", "Баги за последние три дня", "за последние три дня", "R5",
         (wall(NOW, days=-3), iso(NOW)), alts=(alt("R5", _CAL, _cal_back(NOW, TODAY, 3, "days")),)),
    case("R5-ru-za-poslednie-dve-nedeli", "Баги за последние две недели", "за последние две недели",
         "R5", (wall(NOW, weeks=-2), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, _THIS_WEEK, 2, "weeks")),)),
    case("R5-ru-poslednie-3-mesyaca", "Тикеты, закрытые последние 3 месяца", "последние 3 месяца",
         "R5", (wall(NOW, months=-3), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, _THIS_MONTH, 3, "months")),)),
    case("R5-ru-za-poslednij-mesyac-no-N-is-one-unit", "Комментарии за последний месяц",
         "за последний месяц", "R5", (wall(NOW, months=-1), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, _THIS_MONTH, 1, "months")),)),
    case("R5-ru-za-poslednyuyu-nedelyu", "Что закрыли за последнюю неделю", "за последнюю неделю",
         "R5", (wall(NOW, weeks=-1), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, _THIS_WEEK, 1, "weeks")),)),
    case("R5-ru-za-3-poslednih-dnya-number-first", "Коммиты за 3 последних дня",
         "за 3 последних дня", "R5", (wall(NOW, days=-3), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, TODAY, 3, "days")),)),
    case("R5-ru-v-techenie-poslednih-dvuh-nedel", "Баги в течение последних двух недель",
         "в течение последних двух недель", "R5", (wall(NOW, weeks=-2), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, _THIS_WEEK, 2, "weeks")),)),
    case("R5-ru-za-prosedshie-2-goda-from-a-leap-day", "Инциденты за прошедшие 2 года",
         "за прошедшие 2 года", "R5", (wall(LEAP_DAY, years=-2), iso(LEAP_DAY)),
         alts=(alt("R5", _CAL, _cal_back(LEAP_DAY, date(2028, 1, 1), 2, "years")),), now=LEAP_DAY),
    case("R5-ru-za-poslednie-24-chasa-is-24-real-hours-Berlin-spring", "Ошибки за последние 24 часа",
         "за последние 24 часа", "R5", (elapsed(SPRING_BERLIN, hours=-24), iso(SPRING_BERLIN)),
         now=SPRING_BERLIN),
    case("R5-ru-za-poslednie-2-chasa-off-the-hour", "Деплои за последние 2 часа",
         "за последние 2 часа", "R5", (elapsed(QUARTER_PAST, hours=-2), iso(QUARTER_PAST)),
         alts=(alt("R5", _CAL, (elapsed(floor_hour(QUARTER_PAST), hours=-2), iso(floor_hour(QUARTER_PAST)))),),
         now=QUARTER_PAST),
    case("R5-ru-calendar-policy-reads-whole-days", "Баги за последние 7 дней", "за последние 7 дней",
         "R5", _cal_back(NOW, TODAY, 7, "days"), alts=(alt("R5", _ROLL, (wall(NOW, days=-7), iso(NOW))),),
         window_reading="calendar"),
]

R6 = [
    case("R6-ru-v-blizhajshie-3-dnya", "Что нужно сделать в ближайшие 3 дня", "в ближайшие 3 дня",
         "R6", (iso(NOW), wall(NOW, days=3)), alts=(alt("R6", _CAL, _cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-ru-v-techenie-sleduyushchih-dvuh-nedel", "Что выйдет в течение следующих двух недель",
         "в течение следующих двух недель", "R6", (iso(NOW), wall(NOW, weeks=2)),
         alts=(alt("R6", _CAL, _cal_ahead(NOW, _THIS_WEEK, 2, "weeks")),)),
    case("R6-ru-v-techenie-3-dnej", "Исправить в течение 3 дней", "в течение 3 дней", "R6",
         (iso(NOW), wall(NOW, days=3)), alts=(alt("R6", _CAL, _cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-ru-v-blizhajshij-mesyac-no-N", "Что выйдет в ближайший месяц", "в ближайший месяц", "R6",
         (iso(NOW), wall(NOW, months=1)), alts=(alt("R6", _CAL, _cal_ahead(NOW, _THIS_MONTH, 1, "months")),)),
    case("R6-ru-sleduyushchie-6-chasov", "Джобы на следующие 6 часов", "на следующие 6 часов", "R6",
         (iso(NOW), elapsed(NOW, hours=6)),
         alts=(alt("R6", _CAL, (elapsed(floor_hour(NOW), hours=1), elapsed(floor_hour(NOW), hours=7))),)),
    case("R6-ru-calendar-policy-reads-whole-days", "Что нужно сделать в ближайшие 3 дня",
         "в ближайшие 3 дня", "R6", _cal_ahead(NOW, TODAY, 3, "days"),
         alts=(alt("R6", _ROLL, (iso(NOW), wall(NOW, days=3))),), window_reading="calendar"),
]

_MARCH_PAST = month(most_recent_year(lambda y: date(y, 3, 1)), 3)
_MARCH_NEXT = month(next_year_after(lambda y: date(y, 4, 1)), 3)
_MONDAY_PAST = day(on_or_before(TODAY, MO))
_MONDAY_NEXT = day(on_or_after(TODAY, MO))

R7 = [
    case("R7-ru-s-proshloj-nedeli", "Что выкатили с прошлой недели", "с прошлой недели", "R7",
         since(ru_week(TODAY + D(weeks=-1))), "2026-11-23/.."),
    case("R7-ru-s-marta", "Баги, закрытые с марта", "с марта", "R7", since(_MARCH_PAST), "2026-03-01/..",
         alts=(alt("R7", _FUT, since(_MARCH_NEXT)),)),
    case("R7-ru-s-1-marta", "Баги с 1 марта", "с 1 марта", "R7", since(day(date(2026, 3, 1))),
         alts=(alt("R7", _FUT, since(day(date(2027, 3, 1)))),)),
    case("R7-ru-s-2024-goda", "Тикеты, открытые с 2024 года", "с 2024 года", "R7", since(year(2024)),
         "2024-01-01/.."),
    case("R7-ru-so-vcherashnego-dnya", "Комментарии со вчерашнего дня", "со вчерашнего дня", "R7",
         since(day(TODAY + D(days=-1)))),
    case("R7-ru-s-ponedelnika", "Коммиты с понедельника", "с понедельника", "R7", since(_MONDAY_PAST),
         alts=(alt("R7", _FUT, since(_MONDAY_NEXT)),)),
    case("R7-ru-nachinaya-s-1-marta-2025-goda", "Деплои начиная с 1 марта 2025 года",
         "начиная с 1 марта 2025 года", "R7", since(day(date(2025, 3, 1))), "2025-03-01/.."),
    case("R7-ru-s-nachala-proshlogo-goda", "Инциденты с начала прошлого года",
         "с начала прошлого года", "R7", since(year(TODAY.year - 1))),
    case("R7-ru-s-1-marta-i-pozzhe", "Релизы с 1 марта 2026 и позже", "с 1 марта 2026 и позже", "R7",
         since(day(date(2026, 3, 1)))),
]

R8 = [
    case("R8-ru-posle-marta", "Баги, открытые после марта", "после марта", "R8", after(_MARCH_PAST),
         "2026-04-01/..", alts=(alt("R8", _FUT, after(_MARCH_NEXT)),)),
    case("R8-ru-posle-2025-goda", "Тикеты со сроком после 2025 года", "после 2025 года", "R8",
         after(year(2025))),
    case("R8-ru-posle-proshloj-nedeli", "Переоткрытые после прошлой недели", "после прошлой недели",
         "R8", after(ru_week(TODAY + D(weeks=-1)))),
    case("R8-ru-pozzhe-1-marta-2025-goda", "Комментарии позже 1 марта 2025 года",
         "позже 1 марта 2025 года", "R8", after(day(date(2025, 3, 1)))),
]

R9 = [
    case("R9-ru-do-marta", "Баги, открытые до марта", "до марта", "R9", before(_MARCH_PAST),
         alts=(alt("R9", _FUT, before(_MARCH_NEXT)),)),
    case("R9-ru-do-2025-goda", "Тикеты, закрытые до 2025 года", "до 2025 года", "R9", before(year(2025))),
    case("R9-ru-do-proshloj-nedeli", "Зависшие ещё до прошлой недели", "до прошлой недели", "R9",
         before(ru_week(TODAY + D(weeks=-1)))),
    case("R9-ru-do-pyatnicy-deadline-looks-ahead", "Что нужно сделать до пятницы", "до пятницы", "R9",
         before(day(on_or_after(TODAY, FR))), alts=(alt("R9", None, before(day(on_or_before(TODAY, FR)))),)),
    case("R9-ru-ranshe-vcherashnego-dnya", "Комментарии раньше вчерашнего дня",
         "раньше вчерашнего дня", "R9", before(day(TODAY + D(days=-1)))),
]

R10 = [
    case("R10-ru-po-pyatnicu-deadline-looks-ahead", "Работа запланирована по пятницу", "по пятницу",
         "R10", until(day(on_or_after(TODAY, FR))), alts=(alt("R10", None, until(day(on_or_before(TODAY, FR)))),)),
    case("R10-ru-k-pyatnice-deadline-looks-ahead", "Что должно быть готово к пятнице", "к пятнице",
         "R10", until(day(on_or_after(TODAY, FR))), alts=(alt("R10", None, until(day(on_or_before(TODAY, FR)))),)),
    case("R10-ru-vplot-do-marta", "Заморозка вплоть до марта", "вплоть до марта", "R10", until(_MARCH_PAST),
         alts=(alt("R10", _FUT, until(_MARCH_NEXT)),)),
    case("R10-ru-ne-pozdnee-15-marta-2026-goda", "Сдать не позднее 15 марта 2026 года",
         "не позднее 15 марта 2026 года", "R10", until(day(date(2026, 3, 15)))),
    case("R10-ru-po-proshluyu-nedelyu-accusative", "Дежурства по прошлую неделю", "по прошлую неделю",
         "R10", until(ru_week(TODAY + D(weeks=-1)))),
    case("R10-ru-po-2025-god", "Инциденты по 2025 год", "по 2025 год", "R10", until(year(2025))),
    case("R10-ru-k-koncu-marta", "Закрыть к концу марта", "к концу марта", "R10", until(_MARCH_PAST),
         alts=(alt("R10", _FUT, until(_MARCH_NEXT)),)),
    case("R10-ru-po-segodnyashnij-den", "Дежурство по сегодняшний день", "по сегодняшний день", "R10",
         until(day(TODAY))),
]

R11 = [
    case("R11-ru-s-1-po-15-marta", "Баги с 1 по 15 марта", "с 1 по 15 марта", "R11",
         joined(day(date(2026, 3, 1)), day(date(2026, 3, 15))),
         alts=(alt("R11", _FUT, joined(day(date(2027, 3, 1)), day(date(2027, 3, 15)))),)),
    case("R11-ru-mezhdu-1-i-15-marta", "Релизы между 1 и 15 марта", "между 1 и 15 марта", "R11",
         joined(day(date(2026, 3, 1)), day(date(2026, 3, 15))),
         alts=(alt("R11", _FUT, joined(day(date(2027, 3, 1)), day(date(2027, 3, 15)))),)),
    case("R11-ru-s-marta-po-maj", "Баги с марта по май", "с марта по май", "R11",
         joined(month(2026, 3), month(2026, 5)), alts=(alt("R11", _FUT, joined(month(2027, 3), month(2027, 5))),)),
    case("R11-ru-s-marta-do-maya", "Баги с марта до мая", "с марта до мая", "R11",
         joined(month(2026, 3), month(2026, 5)), alts=(alt("R11", _FUT, joined(month(2027, 3), month(2027, 5))),)),
    case("R11-ru-mezhdu-martom-i-maem-instrumental", "Баги между мартом и маем", "между мартом и маем",
         "R11", joined(month(2026, 3), month(2026, 5)),
         alts=(alt("R11", _FUT, joined(month(2027, 3), month(2027, 5))),)),
    case("R11-ru-s-noyabrya-po-fevral-ends-next-year", "Дежурства с ноября по февраль",
         "с ноября по февраль", "R11", joined(month(2026, 11), month(2027, 2)),
         alts=(alt("R11", _FUT, joined(month(2027, 11), month(2028, 2))),)),
    case("R11-ru-s-ponedelnika-po-pyatnicu", "Коммиты с понедельника по пятницу",
         "с понедельника по пятницу", "R11",
         joined(day(on_or_before(TODAY, MO)), day(on_or_before(TODAY, MO) + D(weekday=FR))),
         alts=(alt("R11", _FUT, joined(day(on_or_after(TODAY, MO)), day(on_or_after(TODAY, MO) + D(weekday=FR)))),)),
    case("R11-ru-mezhdu-ponedelnikom-i-pyatnicej", "Коммиты между понедельником и пятницей",
         "между понедельником и пятницей", "R11",
         joined(day(on_or_before(TODAY, MO)), day(on_or_before(TODAY, MO) + D(weekday=FR))),
         alts=(alt("R11", _FUT, joined(day(on_or_after(TODAY, MO)), day(on_or_after(TODAY, MO) + D(weekday=FR)))),)),
    case("R11-ru-s-pyatnicy-po-ponedelnik-wraps-the-week", "Алерты с пятницы по понедельник",
         "с пятницы по понедельник", "R11",
         joined(day(on_or_before(TODAY, FR)), day(on_or_before(TODAY, FR) + D(weekday=MO))),
         alts=(alt("R11", _FUT, joined(day(on_or_after(TODAY, FR)), day(on_or_after(TODAY, FR) + D(weekday=MO)))),)),
    case("R11-ru-s-pn-po-pt-abbreviations", "Дежурства с пн по пт", "с пн по пт", "R11",
         joined(day(on_or_before(TODAY, MO)), day(on_or_before(TODAY, MO) + D(weekday=FR))),
         alts=(alt("R11", _FUT, joined(day(on_or_after(TODAY, MO)), day(on_or_after(TODAY, MO) + D(weekday=FR)))),)),
    case("R11-ru-ot-1-marta-do-15-aprelya-2026-goda", "Расходы от 1 марта до 15 апреля 2026 года",
         "от 1 марта до 15 апреля 2026 года", "R11", joined(day(date(2026, 3, 1)), day(date(2026, 4, 15)))),
    case("R11-ru-1-en-dash-15-marta", "Баги 1\u201315 марта", "1\u201315 марта", "R11",
         joined(day(date(2026, 3, 1)), day(date(2026, 3, 15))),
         alts=(alt("R11", _FUT, joined(day(date(2027, 3, 1)), day(date(2027, 3, 15)))),)),
    case("R11-ru-s-ISO-po-ISO", "Расходы с 2025-01-01 по 2025-03-31", "с 2025-01-01 по 2025-03-31",
         "R11", joined(day(date(2025, 1, 1)), day(date(2025, 3, 31))), "2025-01-01/2025-03-31"),
    case("R11-ru-s-proshloj-nedeli-po-etu-nedelyu", "Баги с прошлой недели по эту неделю",
         "с прошлой недели по эту неделю", "R11", joined(ru_week(TODAY + D(weeks=-1)), ru_week(TODAY))),
    case("R11-ru-s-2024-po-2025-god", "Инциденты с 2024 по 2025 год", "с 2024 по 2025 год", "R11",
         joined(year(2024), year(2025))),
]


def _past(first_day_in: Any, today: date = TODAY) -> int:
    return most_recent_year(first_day_in, today)


def _future(end_day_in: Any, today: date = TODAY) -> int:
    return next_year_after(end_day_in, today)


_MAR14 = (_past(lambda y: date(y, 3, 14)), _future(lambda y: date(y, 3, 15)))
_DEC3 = (_past(lambda y: date(y, 12, 3)), _future(lambda y: date(y, 12, 4)))

R12 = [
    case("R12-ru-v-marte-prepositional", "Баги в марте", "в марте", "R12", _MARCH_PAST, "2026-03",
         alts=(alt("R12", _FUT, _MARCH_NEXT),)),
    case("R12-ru-v-dekabre-current-month-counts", "Баги в декабре", "в декабре", "R12",
         month(2026, 12), "2026-12"),
    case("R12-ru-v-yanvare", "Баги в январе", "в январе", "R12", month(_past(lambda y: date(y, 1, 1)), 1),
         alts=(alt("R12", _FUT, month(_future(lambda y: date(y, 2, 1)), 1)),)),
    case("R12-ru-v-dekabre-said-in-January", "Баги в декабре", "в декабре", "R12",
         month(_past(lambda y: date(y, 12, 1), MID_JANUARY.date()), 12), "2026-12",
         alts=(alt("R12", _FUT, month(_future(lambda y: date(y + 1, 1, 1), MID_JANUARY.date()), 12)),),
         now=MID_JANUARY),
    case("R12-ru-14-marta", "Релиз 14 марта", "14 марта", "R12", day(date(_MAR14[0], 3, 14)),
         "2026-03-14", alts=(alt("R12", _FUT, day(date(_MAR14[1], 3, 14))),)),
    case("R12-ru-1-go-marta-ordinal-suffix", "Релиз 1-го марта", "1-го марта", "R12",
         day(date(_past(lambda y: date(y, 3, 1)), 3, 1)),
         alts=(alt("R12", _FUT, day(date(_future(lambda y: date(y, 3, 2)), 3, 1))),)),
    case("R12-ru-3-dekabrya-is-last-year", "Выпущено 3 декабря", "3 декабря", "R12",
         day(date(_DEC3[0], 12, 3)), "2025-12-03", alts=(alt("R12", _FUT, day(date(_DEC3[1], 12, 3))),)),
    case("R12-ru-29-fevralya-finds-the-last-leap-year", "Что случилось 29 февраля", "29 февраля", "R12",
         day(date(2024, 2, 29)), "2024-02-29", alts=(alt("R12", _FUT, day(date(2028, 2, 29))),),
         now=BEFORE_LEAP_DAY),
    case("R12-ru-vo-vtorom-kvartale", "Что выпустили во втором квартале", "во втором квартале", "R12",
         quarter(_past(lambda y: date(y, 4, 1)), 2), "2026-Q2",
         alts=(alt("R12", _FUT, quarter(_future(lambda y: date(y, 7, 1)), 2)),)),
    case("R12-ru-v-3-kvartale", "Что выпустили в 3 квартале", "в 3 квартале", "R12",
         quarter(_past(lambda y: date(y, 7, 1)), 3), "2026-Q3",
         alts=(alt("R12", _FUT, quarter(_future(lambda y: date(y, 10, 1)), 3)),)),
    case("R12-ru-v-chetvyortom-kvartale-current-counts", "Что выпустили в четвёртом квартале",
         "в четвёртом квартале", "R12", quarter(2026, 4), "2026-Q4"),
    case("R12-ru-Q3", "Что выпустили в Q3", "в Q3", "R12", quarter(_past(lambda y: date(y, 7, 1)), 3),
         alts=(alt("R12", _FUT, quarter(_future(lambda y: date(y, 10, 1)), 3)),)),
    case("R12-ru-v-pervom-polugodii", "Цели в первом полугодии", "в первом полугодии", "R12",
         half(_past(lambda y: date(y, 1, 1)), 1), "2026-H1",
         alts=(alt("R12", _FUT, half(_future(lambda y: date(y, 7, 1)), 1)),)),
    case("R12-ru-vo-vtoroj-polovine-goda-current-counts", "Найм во второй половине года",
         "во второй половине года", "R12", half(2026, 2), "2026-H2"),
]

R13 = [
    case("R13-ru-v-ponedelnik", "Баги в понедельник", "в понедельник", "R13", _MONDAY_PAST,
         on_or_before(TODAY, MO).isoformat(), alts=(alt("R13", _FUT, _MONDAY_NEXT),)),
    case("R13-ru-v-sredu-is-today", "Баги в среду", "в среду", "R13", day(TODAY)),
    case("R13-ru-v-chetverg", "Баги в четверг", "в четверг", "R13", day(on_or_before(TODAY, TH)),
         alts=(alt("R13", _FUT, day(on_or_after(TODAY, TH))),)),
    case("R13-ru-vo-vtornik", "Что сломалось во вторник", "во вторник", "R13", day(on_or_before(TODAY, TU)),
         alts=(alt("R13", _FUT, day(on_or_after(TODAY, TU))),)),
    case("R13-ru-v-pyatnicu-accusative", "Баги, закрытые в пятницу", "в пятницу", "R13",
         day(on_or_before(TODAY, FR)), alts=(alt("R13", _FUT, day(on_or_after(TODAY, FR))),)),
    case("R13-ru-v-subbotu-accusative", "Деплои в субботу", "в субботу", "R13",
         day(on_or_before(TODAY, SA)), alts=(alt("R13", _FUT, day(on_or_after(TODAY, SA))),)),
    case("R13-ru-v-pt-abbreviation", "Деплои в пт", "в пт", "R13", day(on_or_before(TODAY, FR)),
         alts=(alt("R13", _FUT, day(on_or_after(TODAY, FR))),)),
    case("R13-ru-na-ponedelnik", "Задачи на понедельник", "на понедельник", "R13", _MONDAY_PAST,
         alts=(alt("R13", _FUT, _MONDAY_NEXT),)),
    case("R13-ru-v-voskresene-said-on-a-Sunday", "Баги в воскресенье", "в воскресенье", "R13",
         day(SUNDAY.date()), now=SUNDAY),
    case("R13-ru-future-bias-flips-v-ponedelnik", "Баги в понедельник", "в понедельник", "R13",
         _MONDAY_NEXT, alts=(alt("R13", _PAST, _MONDAY_PAST),), bias="future"),
]

# R14 / R15: the nearest reading, chosen by weekday_reading=nearest (Russian reads these as a
# day of last / next week by default: see R16).
R14 = [
    case("R14-ru-v-proshlyj-ponedelnik-nearest", "Что сломалось в прошлый понедельник",
         "в прошлый понедельник", "R14", day(strictly_before(TODAY, MO)),
         alts=(alt("R16", _WEEK, day(in_week(TODAY, MO, -1))),), weekday_reading="nearest"),
    case("R14-ru-proshlyj-vtornik-is-yesterday-nearest", "Что сломалось прошлый вторник",
         "прошлый вторник", "R14", day(strictly_before(TODAY, TU)),
         alts=(alt("R16", _WEEK, day(in_week(TODAY, TU, -1))),), weekday_reading="nearest"),
    case("R14-ru-v-proshluyu-pyatnicu-nearest-same-day", "Что сломалось в прошлую пятницу",
         "в прошлую пятницу", "R14", day(strictly_before(TODAY, FR)), weekday_reading="nearest"),
    case("R14-ru-v-proshluyu-sredu-said-on-a-Wednesday", "Что сломалось в прошлую среду",
         "в прошлую среду", "R14", day(strictly_before(TODAY, WE)), weekday_reading="nearest"),
    case("R14-ru-v-prosh-pn-CLDR-short", "Что сломалось в прош. пн.", "в прош. пн.", "R14",
         day(strictly_before(TODAY, MO)), alts=(alt("R16", _WEEK, day(in_week(TODAY, MO, -1))),),
         weekday_reading="nearest"),
    case("R14-ru-v-proshloe-voskresene-said-on-a-Sunday", "Что сломалось в прошлое воскресенье",
         "в прошлое воскресенье", "R14", day(strictly_before(SUNDAY.date(), SU)), now=SUNDAY,
         weekday_reading="nearest"),
]

R15 = [
    case("R15-ru-v-blizhajshuyu-pyatnicu-is-the-nearest-whatever-the-setting", "Демо в ближайшую пятницу",
         "в ближайшую пятницу", "R15", day(strictly_after(TODAY, FR)),
         alts=(alt("R16", None, day(in_week(TODAY, FR, 1))),)),
    case("R15-ru-v-sleduyushchij-chetverg-is-tomorrow-nearest", "Что запланировано в следующий четверг",
         "в следующий четверг", "R15", day(strictly_after(TODAY, TH)),
         alts=(alt("R16", _WEEK, day(in_week(TODAY, TH, 1))),), weekday_reading="nearest"),
    case("R15-ru-v-sleduyushchuyu-pyatnicu-nearest", "Демо в следующую пятницу", "в следующую пятницу",
         "R15", day(strictly_after(TODAY, FR)), alts=(alt("R16", _WEEK, day(in_week(TODAY, FR, 1))),),
         weekday_reading="nearest"),
    case("R15-ru-v-sleduyushchij-ponedelnik-nearest-same-day", "Что запланировано в следующий понедельник",
         "в следующий понедельник", "R15", day(strictly_after(TODAY, MO)), weekday_reading="nearest"),
    case("R15-ru-v-sleduyushchuyu-sredu-said-on-a-Wednesday", "Созвон в следующую среду",
         "в следующую среду", "R15", day(strictly_after(TODAY, WE)), weekday_reading="nearest"),
    case("R15-ru-v-sleduyushchee-voskresene-said-on-a-Sunday", "Работы в следующее воскресенье",
         "в следующее воскресенье", "R15", day(strictly_after(SUNDAY.date(), SU)), now=SUNDAY,
         weekday_reading="nearest"),
]

R16 = [
    case("R16-ru-v-proshlyj-ponedelnik-default-is-last-weeks", "Что сломалось в прошлый понедельник",
         "в прошлый понедельник", "R16", day(in_week(TODAY, MO, -1)), in_week(TODAY, MO, -1).isoformat(),
         alts=(alt("R14", _NEAREST, day(strictly_before(TODAY, MO))),)),
    case("R16-ru-v-sleduyushchij-chetverg-default-is-next-weeks", "Что запланировано в следующий четверг",
         "в следующий четверг", "R16", day(in_week(TODAY, TH, 1)),
         alts=(alt("R15", _NEAREST, day(strictly_after(TODAY, TH))),)),
    case("R16-ru-proshlogo-vtornika-genitive", "Отчёт прошлого вторника",
         "прошлого вторника", "R16", day(in_week(TODAY, TU, -1)),
         alts=(alt("R14", _NEAREST, day(strictly_before(TODAY, TU))),)),
    case("R16-ru-v-ponedelnik-proshloj-nedeli", "Что сломалось в понедельник прошлой недели",
         "в понедельник прошлой недели", "R16", day(in_week(TODAY, MO, -1))),
    case("R16-ru-v-pyatnicu-na-sleduyushchej-nedele", "Демо в пятницу на следующей неделе",
         "в пятницу на следующей неделе", "R16", day(in_week(TODAY, FR, 1))),
    case("R16-ru-v-sredu-na-etoj-nedele", "Что было в среду на этой неделе", "в среду на этой неделе",
         "R16", day(in_week(TODAY, WE, 0))),
    case("R16-ru-na-proshloj-nedele-v-ponedelnik", "Что сломалось на прошлой неделе в понедельник",
         "на прошлой неделе в понедельник", "R16", day(in_week(TODAY, MO, -1))),
    case("R16-ru-v-etu-pyatnicu", "Демо в эту пятницу", "в эту пятницу", "R16", day(in_week(TODAY, FR, 0))),
    case("R16-ru-v-etot-ponedelnik-already-past", "Деплои в этот понедельник", "в этот понедельник",
         "R16", day(in_week(TODAY, MO, 0)), alts=(alt("R15", None, day(on_or_after(TODAY, MO))),)),
    case("R16-ru-v-proshloe-voskresene-sunday-weeks", "Что сломалось в прошлое воскресенье",
         "в прошлое воскресенье", "R16", day(in_week(SUNDAY.date(), SU, -1, SU)), now=SUNDAY,
         week_start="sunday"),
]

R17 = [
    case("R17-ru-v-2025-godu", "Баги в 2025 году", "в 2025 году", "R17", year(2025), "2025"),
    case("R17-ru-za-2024-god", "Отчёт за 2024 год", "за 2024 год", "R17", year(2024), "2024"),
    case("R17-ru-na-2022-god", "Численность команды на 2022 год", "на 2022 год", "R17", year(2022)),
    case("R17-ru-v-2023-g", "Сбои в 2023 г.", "в 2023 г.", "R17", year(2023)),
    case("R17-ru-v-2025-m-godu", "Закрыто в 2025-м году", "в 2025-м году", "R17", year(2025)),
    case("R17-ru-za-2025-god-beside-numbers", "Выведи 5 задач с приоритетом 2 за 2025 год",
         "за 2025 год", "R17", year(2025), "2025"),
]

_RU_03_04 = read_ru(3, 4, 2026)
_SWAP = {date(2026, 3, 4): date(2026, 4, 3), date(2026, 4, 3): date(2026, 3, 4)}

R18 = [
    case("R18-ru-14-marta-2025-goda", "Исправлено 14 марта 2025 года", "14 марта 2025 года", "R18",
         day(date(2025, 3, 14)), "2025-03-14"),
    case("R18-ru-14-marta-2025-g", "Исправлено 14 марта 2025 г.", "14 марта 2025 г.", "R18",
         day(date(2025, 3, 14))),
    case("R18-ru-1-go-marta-2025-goda", "Исправлено 1-го марта 2025 года", "1-го марта 2025 года", "R18",
         day(date(2025, 3, 1))),
    case("R18-ru-ISO-date", "Исправлено 2025-03-14", "2025-03-14", "R18", day(date(2025, 3, 14))),
    case("R18-ru-v-pyatnicu-14-marta-2025-g", "Исправлено в пятницу, 14 марта 2025 г.",
         "в пятницу, 14 марта 2025 г.", "R18", day(date(2025, 3, 14))),
    case("R18-ru-numeric-dotted-day-first", "Исправлено 14.03.2025", "14.03.2025", "R18",
         day(date(2025, 3, 14))),
    case("R18-ru-numeric-ambiguous-CLDR-order", "Исправлено 03.04.2026", "03.04.2026", "R18",
         day(_RU_03_04), _RU_03_04.isoformat(),
         alts=(alt("R18", other_order_policy(LOCALE), day(_SWAP[_RU_03_04])),)),
    case("R18-ru-numeric-date-order-policy-MDY", "Исправлено 03.04.2026", "03.04.2026", "R18",
         day(date(2026, 3, 4)), alts=(alt("R18", "date_order=DMY", day(date(2026, 4, 3))),),
         date_order="MDY"),
    case("R18-ru-numeric-only-one-valid-reading", "Исправлено 13.04.2026", "13.04.2026", "R18",
         day(date(2026, 4, 13))),
    case("R18-ru-numeric-two-digit-year", "Исправлено 03.04.26", "03.04.26", "R18", day(_RU_03_04),
         alts=(alt("R18", other_order_policy(LOCALE), day(_SWAP[_RU_03_04])),)),
    case("R18-ru-numeric-slashes-day-first", "Исправлено 3/4/2026", "3/4/2026", "R18", day(_RU_03_04),
         alts=(alt("R18", other_order_policy(LOCALE), day(_SWAP[_RU_03_04])),)),
]

R19 = [
    case("R19-ru-mart-2025", "Баги март 2025", "март 2025", "R19", month(2025, 3), "2025-03"),
    case("R19-ru-v-marte-2025-goda", "Баги в марте 2025 года", "в марте 2025 года", "R19", month(2025, 3)),
    case("R19-ru-Q3-2025", "Выручка Q3 2025", "Q3 2025", "R19", quarter(2025, 3), "2025-Q3"),
    case("R19-ru-tretij-kvartal-2025-goda", "Выручка за третий квартал 2025 года",
         "за третий квартал 2025 года", "R19", quarter(2025, 3), "2025-Q3"),
    case("R19-ru-III-kvartal-2025-g-Roman", "Выручка III квартал 2025 г.", "III квартал 2025 г.", "R19",
         quarter(2025, 3)),
    case("R19-ru-za-1-kvartal-2025-goda", "Выручка за 1 квартал 2025 года", "за 1 квартал 2025 года",
         "R19", quarter(2025, 1), "2025-Q1"),
    case("R19-ru-H1-2026", "Цели H1 2026", "H1 2026", "R19", half(2026, 1), "2026-H1"),
    case("R19-ru-pervoe-polugodie-2026-goda", "Цели на первое полугодие 2026 года",
         "на первое полугодие 2026 года", "R19", half(2026, 1), "2026-H1"),
    case("R19-ru-pervaya-polovina-2026-goda", "Цели первая половина 2026 года",
         "первая половина 2026 года", "R19", half(2026, 1)),
    case("R19-ru-2-e-polugodie-2025-goda", "Цели 2-е полугодие 2025 года", "2-е полугодие 2025 года",
         "R19", half(2025, 2), "2025-H2"),
]


def _recent_week(w: int, today: date = TODAY) -> int:
    return most_recent_year(lambda y: date.fromisocalendar(y, w, 1) if w < 53 else week_53_monday(y), today)


def _next_week(w: int, today: date = TODAY) -> int:
    def end(y: int) -> date | None:
        first = date.fromisocalendar(y, w, 1) if w < 53 else week_53_monday(y)
        return None if first is None else first + D(days=7)

    return next_year_after(end, today)


R20 = [
    case("R20-ru-na-48-j-nedele-2026-goda", "Тикеты на 48-й неделе 2026 года",
         "на 48-й неделе 2026 года", "R20", iso_week(2026, 48), "2026-W48"),
    case("R20-ru-48-ya-nedelya-2026-goda", "Тикеты 48-я неделя 2026 года", "48-я неделя 2026 года",
         "R20", iso_week(2026, 48)),
    case("R20-ru-nedelya-48-past-bias", "Тикеты неделя 48", "неделя 48", "R20",
         iso_week(_recent_week(48), 48), "2026-W48", alts=(alt("R20", _FUT, iso_week(_next_week(48), 48)),)),
    case("R20-ru-na-49-j-nedele-current-counts", "Тикеты на 49-й неделе", "на 49-й неделе", "R20",
         iso_week(2026, 49), "2026-W49"),
    case("R20-ru-na-50-nedele-is-last-year", "Тикеты на 50 неделе", "на 50 неделе", "R20",
         iso_week(_recent_week(50), 50), "2025-W50", alts=(alt("R20", _FUT, iso_week(_next_week(50), 50)),)),
    case("R20-ru-na-53-j-nedele-finds-the-last-long-year", "Тикеты на 53-й неделе", "на 53-й неделе",
         "R20", iso_week(_recent_week(53), 53), "2020-W53", alts=(alt("R20", _FUT, iso_week(_next_week(53), 53)),)),
    case("R20-ru-nedelya-No-12", "Тикеты неделя \u211612", "неделя \u211612", "R20",
         iso_week(_recent_week(12), 12), alts=(alt("R20", _FUT, iso_week(_next_week(12), 12)),)),
    case("R20-ru-W48", "Тикеты W48", "W48", "R20", iso_week(_recent_week(48), 48),
         alts=(alt("R20", _FUT, iso_week(_next_week(48), 48)),)),
    case("R20-ru-ISO-2026-W48", "Тикеты 2026-W48", "2026-W48", "R20", iso_week(2026, 48), "2026-W48"),
]


def _to_now(first: tuple[str, str], now: datetime = NOW) -> tuple[str, str]:
    return first[0], iso(now)  # type: ignore[return-value]


R21 = [
    case("R21-ru-s-nachala-goda", "Выручка с начала года", "с начала года", "R21", _to_now(year(2026)),
         f"{year(2026)[0]}/{iso(NOW)}"),
    case("R21-ru-s-nachala-mesyaca", "Расходы с начала месяца", "с начала месяца", "R21",
         _to_now(month_of(TODAY))),
    case("R21-ru-s-nachala-kvartala", "Выручка с начала квартала", "с начала квартала", "R21",
         _to_now(quarter_of(TODAY))),
    case("R21-ru-s-nachala-tekushchego-goda", "Баги с начала текущего года", "с начала текущего года",
         "R21", _to_now(year(2026))),
    case("R21-ru-s-nachala-nedeli-on-a-Sunday", "Коммиты с начала недели", "с начала недели", "R21",
         _to_now(ru_week(SUNDAY.date()), SUNDAY), now=SUNDAY),
]

R22 = [
    case("R22-ru-segodnya-utrom", "Что сломалось сегодня утром", "сегодня утром", "R22",
         period(TODAY, "morning1")),
    case("R22-ru-segodnya-dnyom", "Что сломалось сегодня днём", "сегодня днём", "R22",
         period(TODAY, "afternoon1")),
    case("R22-ru-segodnya-dnem-without-yo", "Что сломалось сегодня днем", "сегодня днем", "R22",
         period(TODAY, "afternoon1")),
    case("R22-ru-segodnya-vecherom", "Что выкатим сегодня вечером", "сегодня вечером", "R22",
         period(TODAY, "evening1")),
    case("R22-ru-etim-utrom", "Что сломалось этим утром", "этим утром", "R22", period(TODAY, "morning1")),
    case("R22-ru-vchera-vecherom", "Что сломалось вчера вечером", "вчера вечером", "R22",
         period(TODAY + D(days=-1), "evening1")),
    case("R22-ru-vchera-dnyom", "Что сломалось вчера днём", "вчера днём", "R22",
         period(TODAY + D(days=-1), "afternoon1")),
    case("R22-ru-vchera-nochyu-wraps-midnight", "Что упало вчера ночью", "вчера ночью", "R22",
         period(TODAY + D(days=-1), "night1")),
    case("R22-ru-proshloj-nochyu", "Что упало прошлой ночью", "прошлой ночью", "R22",
         period(TODAY + D(days=-1), "night1")),
    case("R22-ru-zavtra-utrom", "Что выкатим завтра утром", "завтра утром", "R22",
         period(TODAY + D(days=1), "morning1")),
    case("R22-ru-zavtra-nochyu", "Джобы завтра ночью", "завтра ночью", "R22", period(TODAY + D(days=1), "night1")),
    case("R22-ru-pozavchera-vecherom-Moscow", "Что сломалось позавчера вечером", "позавчера вечером",
         "R22", period(MOSCOW_NOW.date() + D(days=-2), "evening1", MOSCOW), now=MOSCOW_NOW),
]

_SAT = SATURDAY.date()

R23 = [
    case("R23-ru-v-eti-vyhodnye-on-a-Wednesday", "Деплои в эти выходные", "в эти выходные", "R23",
         weekend(first_open_weekend(TODAY)), f"{first_open_weekend(TODAY).isoformat()}/P{ru_weekend()[1]}D"),
    case("R23-ru-na-etih-vyhodnyh", "Деплои на этих выходных", "на этих выходных", "R23",
         weekend(first_open_weekend(TODAY))),
    case("R23-ru-v-blizhajshie-vyhodnye-is-the-coming-one", "Работы в ближайшие выходные",
         "в ближайшие выходные", "R23", weekend(first_open_weekend(TODAY))),
    case("R23-ru-na-proshlyh-vyhodnyh", "Алерты на прошлых выходных", "на прошлых выходных", "R23",
         weekend(last_ended_weekend(TODAY))),
    case("R23-ru-v-proshlye-vyhodnye", "Алерты в прошлые выходные", "в прошлые выходные", "R23",
         weekend(last_ended_weekend(TODAY))),
    case("R23-ru-v-sleduyushchie-vyhodnye", "Работы в следующие выходные", "в следующие выходные",
         "R23", weekend(first_open_weekend(TODAY) + D(weeks=1)),
         alts=(alt("R23", None, weekend(first_open_weekend(TODAY))),)),
    case("R23-ru-na-vyhodnyh-on-a-Wednesday", "Что сломалось на выходных", "на выходных", "R23",
         weekend(last_ended_weekend(TODAY)), alts=(alt("R23", _FUT, weekend(first_open_weekend(TODAY))),)),
    case("R23-ru-za-vyhodnye", "Что сломалось за выходные", "за выходные", "R23",
         weekend(last_ended_weekend(TODAY)), alts=(alt("R23", _FUT, weekend(first_open_weekend(TODAY))),)),
    case("R23-ru-na-vyhodnyh-future-bias", "Что сломается на выходных", "на выходных", "R23",
         weekend(first_open_weekend(TODAY)), alts=(alt("R23", _PAST, weekend(last_ended_weekend(TODAY))),),
         bias="future"),
    case("R23-ru-v-eti-vyhodnye-on-a-Saturday", "Деплои в эти выходные", "в эти выходные", "R23",
         weekend(first_open_weekend(_SAT)), now=SATURDAY),
    case("R23-ru-na-vyhodnyh-on-a-Saturday-is-this-one", "Пейджи на выходных", "на выходных", "R23",
         weekend(first_open_weekend(_SAT)), now=SATURDAY),
    case("R23-ru-na-proshlyh-vyhodnyh-on-a-Monday", "Алерты на прошлых выходных", "на прошлых выходных",
         "R23", weekend(last_ended_weekend(MONDAY_AFTER.date())), now=MONDAY_AFTER),
]

TABLES = {"R1": R1, "R2": R2, "R3": R3, "R4": R4, "R5": R5, "R6": R6, "R7": R7, "R8": R8,
          "R9": R9, "R10": R10, "R11": R11, "R12": R12, "R13": R13, "R14": R14, "R15": R15,
          "R16": R16, "R17": R17, "R18": R18, "R19": R19, "R20": R20, "R21": R21, "R22": R22,
          "R23": R23}
#: Readings that need more examples than the minimum of three (inflection and policy heavy).
DEEP = {"R5", "R11", "R12", "R13", "R14", "R15", "R16", "R18", "R22", "R23"}


def test_every_reading_has_worked_russian_examples() -> None:
    check_tables(TABLES, "ru", DEEP)


def test_the_clocks_and_CLDR_facts_the_tables_use() -> None:
    # stdlib date.weekday(); CLDR 49 via babel: RU weeks start on Monday, weekend Saturday-Sunday,
    # numeric dates day first; Moscow keeps UTC+03:00 (tzdata).
    assert (NOW.weekday(), SATURDAY.weekday(), SUNDAY.weekday(), MONDAY_AFTER.weekday()) == (2, 5, 6, 0)
    assert _RU_FIRST == MO and ru_weekend() == (SA, 2)
    assert numeric_order("ru") == "DM"
    assert MOSCOW_NOW.utcoffset() == MOSCOW_MARCH_FIRST.utcoffset()


@pytest.mark.parametrize(PARAMS, all_cases(TABLES))
def test_russian_phrase_resolves_to_its_interval(question, phrase, reading, bounds, value, alts, context):
    RU.check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, all_cases(TABLES))
def test_russian_phrase_reads_the_same_with_every_language_on(question, phrase, reading, bounds, value, alts,
                                                          context):
    RU.check_among_every_language(question, phrase, reading, bounds, context)


@pytest.mark.parametrize(PARAMS, all_cases(TABLES))
def test_every_russian_alternative_names_a_policy_that_selects_it_or_none(
        question, phrase, reading, bounds, value, alts, context):
    RU.alternatives_are_selected_by_their_policy(question, context)


def test_the_locale_file_reads_last_weekday_as_that_day_of_last_week() -> None:
    # common practice: "в прошлый понедельник" is Monday of last week (stated in locales/ru.toml).
    assert load_locale("ru").meta.weekday_reading == "week"


# --- D: lengths of time after a cue -----------------------------------------------------------

DURATIONS = [
    ("D-ru-bolee-3-dnej", "Задачи, открытые более 3 дней", "3 дней", "P3D"),
    ("D-ru-dolshe-dvuh-nedel", "Тикеты висят дольше двух недель", "двух недель", "P2W"),
    ("D-ru-na-3-dnya", "Заморозка на 3 дня", "на 3 дня", "P3D"),
    ("D-ru-bolshe-24-chasov", "Ревью идёт больше 24 часов", "24 часов", "PT24H"),
]


@pytest.mark.parametrize(("question", "phrase", "value"), [d[1:] for d in DURATIONS],
                         ids=[d[0] for d in DURATIONS])
def test_D_a_count_of_units_after_a_cue_is_a_duration(question, phrase, value):
    # ISO 8601 durations; the cue words ("более", "дольше") stay in the question.
    m = one(question)
    assert (m.text, m.kind, m.reading, m.value) == (phrase, "duration", "D", value)
    assert m.start is None and m.end is None


# --- policies ---------------------------------------------------------------------------------

POLICY_FLIPS = [
    ("R12-ru-bias-future-v-marte", "Баги в марте", {}, ("bias", "future", "past")),
    ("R12-ru-bias-future-3-dekabrya", "Выпущено 3 декабря", {}, ("bias", "future", "past")),
    ("R13-ru-bias-future-v-ponedelnik", "Баги в понедельник", {}, ("bias", "future", "past")),
    ("R20-ru-bias-future-nedelya-48", "Тикеты неделя 48", {}, ("bias", "future", "past")),
    ("R23-ru-bias-future-na-vyhodnyh", "Что сломалось на выходных", {}, ("bias", "future", "past")),
    ("R7-ru-bias-future-s-marta", "Баги, закрытые с марта", {}, ("bias", "future", "past")),
    ("R11-ru-bias-future-s-marta-po-maj", "Баги с марта по май", {}, ("bias", "future", "past")),
    ("R5-ru-window-calendar-za-poslednie-3-mesyaca", "Тикеты за последние 3 месяца", {},
     ("window_reading", "calendar", "rolling")),
    ("R6-ru-window-calendar-v-blizhajshie-3-dnya", "Что сделать в ближайшие 3 дня", {},
     ("window_reading", "calendar", "rolling")),
    ("R16-ru-weekday-nearest-v-proshlyj-ponedelnik", "Что сломалось в прошлый понедельник", {},
     ("weekday_reading", "nearest", "week")),
    ("R16-ru-weekday-nearest-v-sleduyushchij-chetverg", "Что запланировано в следующий четверг", {},
     ("weekday_reading", "nearest", "week")),
    ("R18-ru-date-order-MDY", "Исправлено 03.04.2026", {}, ("date_order", "MDY", "DMY")),
]


@pytest.mark.parametrize(("question", "base", "setting"), [p[1:] for p in POLICY_FLIPS],
                         ids=[p[0] for p in POLICY_FLIPS])
def test_a_policy_flips_the_russian_reading_and_the_old_one_becomes_the_alternative(question, base, setting):
    RU.policy_flips(question, base, setting)


# --- Russian and English in one question -------------------------------------------------------

MIXED = [
    ("R2-ru-en-tickets-za-proshluyu-nedelyu", "Покажи tickets за прошлую неделю", "за прошлую неделю",
     "ru", ru_week(TODAY + D(weeks=-1))),
    ("R2-ru-en-bugs-na-proshloj-nedele", "Какие bugs закрыли на прошлой неделе", "на прошлой неделе",
     "ru", ru_week(TODAY + D(weeks=-1))),
    ("R1-ru-en-issues-yesterday", "Какие issues закрыли yesterday?", "yesterday", "en",
     day(TODAY + D(days=-1))),
    ("R7-ru-en-PR-since-March", "Покажи все PR since March", "since March", "en", since(_MARCH_PAST)),
    ("R7-ru-en-merge-requests-s-1-marta", "Все merge requests с 1 марта", "с 1 марта", "ru",
     since(day(date(2026, 3, 1)))),
    ("R23-ru-en-deploi-last-weekend", "Какие деплои были last weekend", "last weekend", "en",
     weekend(last_ended_weekend(TODAY))),
    ("R3-ru-en-issues-3-dnya-nazad", "Все issues, созданные 3 дня назад", "3 дня назад", "ru",
     day(TODAY + D(days=-3))),
    ("R5-ru-en-bugs-in-the-last-7-days", "Какие bugs создали in the last 7 days?", "in the last 7 days",
     "en", (wall(NOW, days=-7), iso(NOW))),
    ("R5-ru-en-za-last-3-days", "Баги за last 3 days", "за last 3 days", "en",
     (wall(NOW, days=-3), iso(NOW))),
    ("R11-ru-en-releases-mezhdu-1-i-15-marta", "Все releases между 1 и 15 марта", "между 1 и 15 марта",
     "ru", joined(day(date(2026, 3, 1)), day(date(2026, 3, 15)))),
    ("R2-ru-en-story-points-v-proshlom-mesyace", "Сколько story points закрыли в прошлом месяце",
     "в прошлом месяце", "ru", month_of(TODAY + D(months=-1))),
]


@pytest.mark.parametrize(("question", "phrase", "lang", "bounds"), [m[1:] for m in MIXED],
                         ids=[m[0] for m in MIXED])
def test_a_question_mixing_russian_and_english_finds_the_phrase_in_either(question, phrase, lang, bounds):
    m = one(question, languages=("ru", "en"))
    assert (m.text, m.lang, (m.start, m.end)) == (phrase, lang, bounds)
    assert question[m.char_start : m.char_end] == phrase


def test_a_russian_and_an_english_phrase_in_one_question_are_both_found() -> None:
    result = run("Баги за прошлую неделю и bugs since Monday", languages=("ru", "en"))
    assert [(m.text, m.lang) for m in result.mentions] == [("за прошлую неделю", "ru"),
                                                           ("since Monday", "en")]


# --- look-alikes (reading N) -------------------------------------------------------------------

TRAPS = [
    ("N-ru-majka-is-not-maj", "Сколько стоит майка с логотипом команды?"),
    ("N-ru-majskij-is-not-maj", "Майский релиз отложен"),
    ("N-ru-mayatnik", "Маятник нагрузки качнулся"),
    ("N-ru-sreda-environment", "Тестовая среда снова упала"),
    ("N-ru-srede-environment-prepositional", "Какие баги нашли в тестовой среде?"),
    ("N-ru-peremennye-sredy", "Переменные среды не заданы"),
    ("N-ru-v-srede-razrabotki", "Баги в среде разработки"),
    ("N-ru-Marta-name", "Марта закрыла пять задач"),
    ("N-ru-Maya-name", "Мая посмотрит ревью"),
    ("N-ru-Mayu-name-capitalised-mid-sentence", "Назначь ревью на Маю"),
    ("N-ru-Mae-name-capitalised-mid-sentence", "Отчёт о Мае готов"),
    ("N-ru-vtoroj-ordinal", "Второй билд упал"),
    ("N-ru-vtoraya-ordinal", "Вторая задача в списке"),
    ("N-ru-pervyj-kommit", "Первый коммит в репозитории"),
    ("N-ru-poslednij-kommentarij", "Последний комментарий в задаче"),
    ("N-ru-proshlyj-reliz", "Прошлый релиз был лучше"),
    ("N-ru-sleduyushchij-shag", "Следующий шаг за тобой"),
    ("N-ru-etot-tiket", "Этот тикет уже закрыт"),
    ("N-ru-prioritet-2", "Задачи с приоритетом 2"),
    ("N-ru-versiya-2025.1", "Баги в версии 2025.1"),
    ("N-ru-top-10", "Топ 10 исполнителей"),
    ("N-ru-5-ballov", "Задачи на 5 баллов"),
    ("N-ru-tiket-2025", "Кто владеет тикетом 2025?"),
    ("N-ru-sprint-48", "Баги в спринте 48"),
    ("N-ru-oshibka-404", "Ошибка 404 на странице 3"),
    ("N-ru-3-iz-5", "3 из 5 тестов прошли"),
    ("N-ru-bare-2025-no-cue", "2025 задач закрыто"),
    ("N-ru-nedelya-event", "Неделя качества прошла хорошо"),
    ("N-ru-kazhduyu-nedelyu", "Релизы каждую неделю"),
    ("N-ru-raz-v-nedelyu", "Два релиза в неделю"),
    ("N-ru-den-rozhdeniya", "День рождения команды"),
    ("N-ru-rabochij-den", "Рабочий день закончился"),
    ("N-ru-chas-pik", "Нагрузка в час пик"),
    ("N-ru-chasy-raboty", "Часы работы поддержки"),
    ("N-ru-v-2-chasa-nochi-clock-time", "Деплой в 2 часа ночи"),
    ("N-ru-v-3-dnya-clock-time", "Созвон в 3 дня"),
    ("N-ru-podozhdi-sekundu", "Подожди секунду"),
    ("N-ru-Vt-watt", "Лампа на 60 Вт"),
    ("N-ru-VS-court", "Решение ВС по делу"),
    ("N-ru-sr-compare", "Ср. с предыдущим отчётом"),
    ("N-ru-g-city", "Офис в г. Энск"),
    ("N-ru-vyhodnye-dannye", "Выходные данные отчёта"),
    ("N-ru-subbotnik", "Субботник в офисе"),
    ("N-ru-godovoj-otchyot", "Годовой отчёт готов"),
    ("N-ru-segodnyashnij-reliz", "Сегодняшний релиз"),
    ("N-ru-posle-obeda", "После обеда созвон"),
    ("N-ru-zadacha-14", "Задача 14 у кого?"),
    ("N-ru-zavtrak-is-no-typo-of-zavtra", "Завтрак в офисе в десять"),
    ("N-ru-po-pyatnicam-recurring", "Созвоны по пятницам"),
    ("N-ru-po-ponedelnikam-recurring", "Релизы по понедельникам"),
    ("N-ru-proshlye-dni-plural-no-number", "Прошлые дни были тяжёлыми"),
    ("N-ru-v-proshlye-gody-plural-no-number", "В прошлые годы было лучше"),
    ("N-ru-v-blizhajshie-dni-plural-no-number", "Починим в ближайшие дни"),
    ("N-ru-poslednie-nedeli-plural-no-number", "Последние недели были спокойными"),
    ("N-ru-v-eti-dni", "В эти дни много багов"),
    ("N-ru-na-sleduyushchij-den-told-of", "На следующий день билд упал"),
    ("N-ru-sleduyushchego-dnya-told-of", "Исправили уже следующего дня"),
    ("N-ru-zadachi-na-nedelyu-plan", "Задачи на неделю"),
    ("N-ru-otchyot-za-mesyac", "Отчёт за месяц"),
    ("N-ru-dobroe-utro", "Доброе утро, команда"),
    ("N-ru-vtoraya-polovina-dnya", "Вторая половина дня свободна"),
    ("N-ru-pervaya-nedelya-sprinta", "Первая неделя спринта"),
    ("N-ru-v-10-utra-clock-time", "Созвон в 10 утра"),
]


@pytest.mark.parametrize(("question",), [(q,) for _, q in TRAPS], ids=[i for i, _ in TRAPS])
def test_a_russian_look_alike_gives_no_temporal_mention(question):
    result = run(question, languages=("ru", "en"))
    assert result.mentions == ()
    assert result.rewritten == question


def test_there_are_at_least_twenty_five_russian_traps():
    assert len(TRAPS) >= 25
    assert len({q for _, q in TRAPS}) == len(TRAPS)


PAIRS = [
    ("N-ru-majka-vs-v-mae", "Сколько стоит майка?", "Баги в мае", "в мае"),
    ("N-ru-sreda-vs-v-sredu", "Тестовая среда упала", "Что упало в среду", "в среду"),
    ("N-ru-Marta-vs-s-marta", "Марта закрыла задачу", "Задачи с марта", "с марта"),
    ("N-ru-Maya-vs-14-maya", "Мая посмотрит ревью", "Ревью 14 мая", "14 мая"),
    ("N-ru-vtoroj-vs-vo-vtorom-kvartale", "Второй билд упал", "Билды во втором квартале",
     "во втором квартале"),
    ("N-ru-prioritet-2-vs-2-dnya-nazad", "Задачи с приоритетом 2", "Задачи 2 дня назад", "2 дня назад"),
    ("N-ru-tiket-2025-vs-v-2025-godu", "Кто владеет тикетом 2025?", "Тикеты в 2025 году", "в 2025 году"),
    ("N-ru-v-2-chasa-vs-cherez-2-chasa", "Деплой в 2 часа ночи", "Деплой через 2 часа", "через 2 часа"),
    ("N-ru-nedelya-vs-na-etoj-nedele", "Неделя качества прошла хорошо", "Баги на этой неделе",
     "на этой неделе"),
]


@pytest.mark.parametrize(("trap", "temporal", "phrase"), [p[1:] for p in PAIRS], ids=[p[0] for p in PAIRS])
def test_the_same_russian_word_is_a_time_word_only_where_the_question_makes_it_one(trap, temporal, phrase):
    assert run(trap).mentions == ()
    assert one(temporal).text == phrase


MIXED_TRAPS = [
    ("N-ru-majka-beside-s-maya", "Майки заказали с мая", "с мая"),
    ("N-ru-sreda-beside-vchera", "Тестовая среда упала вчера", "вчера"),
    ("N-ru-vtoroj-beside-s-ponedelnika", "Второй билд с понедельника", "с понедельника"),
    ("N-ru-top-10-beside-na-etoj-nedele", "Топ 10 исполнителей на этой неделе", "на этой неделе"),
    ("N-ru-prioritet-beside-za-2025-god", "Задачи с приоритетом 2 за 2025 год", "за 2025 год"),
    ("N-ru-versiya-beside-ISO-date", "Баги версии 2025.1 с 2025-03-14", "с 2025-03-14"),
]


@pytest.mark.parametrize(("question", "phrase"), [m[1:] for m in MIXED_TRAPS], ids=[m[0] for m in MIXED_TRAPS])
def test_a_russian_look_alike_beside_a_time_phrase_stays_out_of_the_mention(question, phrase):
    m = one(question)
    assert m.text == phrase
    assert question[m.char_start : m.char_end] == phrase
