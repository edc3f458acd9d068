"""Turkish: worked examples for every reading R1-R23 and D, the policies, numeric dates in the
CLDR order of ``tr``, questions mixing Turkish and English, and look-alike words (reading N).

Checked against:
- python-dateutil ``relativedelta``: weekday steps, day, week, month and year arithmetic with
  month-end clamping; stdlib ``calendar.monthrange``/``calendar.isleap``;
- ISO 8601 week dates via stdlib ``date.fromisocalendar``;
- CLDR 49 via babel 2.19: Turkish day-period rules (``Locale("tr").day_period_rules``: sabah
  06:00-11:00, öğleden önce 11:00-12:00, öğleden sonra 12:00-18:00, akşamüstü 18:00-19:00,
  akşam 19:00-21:00, gece 21:00-06:00), the week data of the territory TR (``first_week_day``,
  ``weekend_start``/``weekend_end``) and the order of numeric dates
  (``babel.dates.get_date_format("short", locale="tr")``, day first);
- the IANA tz database via stdlib zoneinfo + tzdata (Berlin daylight-saving changes; Istanbul
  keeps UTC+03:00 all year);
- the questions and phrases are written from knowledge of the language (no published source);
- common practice (no published source): "geçen pazartesi" / "gelecek perşembe" mean that day
  of last / next week, paired with "bu pazartesi" for the Monday of this week (locales/tr.toml
  ``weekday_reading = "week"``); "önümüzdeki cuma" ("the Friday ahead of us") is the coming
  Friday and "önümüzdeki hafta sonu" the coming weekend; "X'e kadar"
  takes X in (R10), "X'ten önce" ends before X; "X ile Y arasında" and "X'ten Y'ye kadar" take
  both ends in; "3 gün içinde" is the next 3 days; "önceki gün" is the day before yesterday;
  "son" opens a window only before a number ("son 3 gün"; "son gün" is a deadline).
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
    first_open_weekend,
    floor_hour,
    half,
    hour_of,
    in_week,
    iso,
    iso_week,
    iso_week_name,
    joined,
    last_ended_weekend,
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
    weekend_days,
    year,
)

ISTANBUL = ZoneInfo("Europe/Istanbul")
D = relativedelta
WEEKDAYS = (MO, TU, WE, TH, FR, SA, SU)
LANGS = ("tr",)

# --- clocks (fixed; NOW is Wednesday 2026-12-02 10:00 in Berlin) ------------------------------
SATURDAY = datetime(2026, 12, 5, 10, 0, tzinfo=BERLIN)
SUNDAY = datetime(2026, 12, 6, 10, 0, tzinfo=BERLIN)
FRIDAY = datetime(2026, 12, 4, 10, 0, tzinfo=BERLIN)
MONTH_END = datetime(2026, 3, 31, 10, 0, tzinfo=BERLIN)
LEAP_DAY = datetime(2028, 2, 29, 10, 0, tzinfo=BERLIN)
MID_JANUARY = datetime(2027, 1, 15, 10, 0, tzinfo=BERLIN)
#: Berlin clocks went 02:00 -> 03:00 on 2026-03-29 and 03:00 -> 02:00 on 2026-10-25 (tzdata).
SPRING_BERLIN = datetime(2026, 3, 29, 12, 0, tzinfo=BERLIN)
AUTUMN_BERLIN = datetime(2026, 10, 25, 12, 0, tzinfo=BERLIN)
QUARTER_PAST = datetime(2026, 12, 2, 10, 17, tzinfo=BERLIN)
#: Wednesday 2 December 2026, 10:00 in Istanbul; Sunday 1 March 2026, 10:00 in Istanbul.
ISTANBUL_NOW = datetime(2026, 12, 2, 10, 0, tzinfo=ISTANBUL)
ISTANBUL_MARCH_FIRST = datetime(2026, 3, 1, 10, 0, tzinfo=ISTANBUL)

_TR = Locale.parse("tr")
_TR_RULES = _TR.day_period_rules[None]
_TR_FIRST = WEEKDAYS[_TR.first_week_day]
_CAL = "window_reading=calendar"
_ROLL = "window_reading=rolling"
_FUT = "bias=future"
_PAST = "bias=past"
_WEEK = "weekday_reading=week"
_NEAREST = "weekday_reading=nearest"


# --- oracles for Turkish ----------------------------------------------------------------------


def period(d: date, pid: str, tz: ZoneInfo = BERLIN) -> tuple[str, str]:
    """CLDR 49 Turkish day period ``pid`` of local date ``d``, from babel's
    ``Locale("tr").day_period_rules``; a rule whose end is not after its start (gece,
    21:00-06:00) ends on the next day."""
    rule = _TR_RULES[pid][0]
    start = midnight(d, tz) + D(seconds=rule["from"])
    end_day = d if rule["before"] > rule["from"] else d + D(days=1)
    return iso(start), iso(midnight(end_day, tz) + D(seconds=rule["before"]))  # type: ignore[return-value]


def tr_week(d: date) -> tuple[str, str]:
    """The week holding ``d``, starting on the CLDR first day of the week of TR."""
    return week(d, _TR_FIRST)


def weekend(first: date) -> tuple[str, str]:
    return span(first, first + D(days=weekend_days("tr")[1]))


def weekend_value(first: date) -> str:
    return f"{first.isoformat()}/P{weekend_days('tr')[1]}D"


def read_tr(a: int, b: int, y: int) -> date:
    """``a.b.y`` read in the CLDR order of ``tr``."""
    return date(y, a, b) if numeric_order("tr") == "MD" else date(y, b, a)


def minute_of(moment: datetime) -> tuple[str, str]:
    start = moment.replace(second=0, microsecond=0)
    return iso(start), elapsed(start, minutes=1)  # type: ignore[return-value]


def _past(first_day_in: Any, today: date = TODAY) -> int:
    return most_recent_year(first_day_in, today)


def _future(end_day_in: Any, today: date = TODAY) -> int:
    return next_year_after(end_day_in, today)


def _to_now(first: tuple[str, str], now: datetime = NOW) -> tuple[str, str]:
    return first[0], iso(now)  # type: ignore[return-value]


def _recent_week(w: int, today: date = TODAY) -> int:
    return most_recent_year(lambda y: date.fromisocalendar(y, w, 1) if w < 53 else week_53_monday(y), today)


def _next_week(w: int, today: date = TODAY) -> int:
    def end(y: int) -> date | None:
        first = date.fromisocalendar(y, w, 1) if w < 53 else week_53_monday(y)
        return None if first is None else first + D(days=7)

    return next_year_after(end, today)


# --- tables -----------------------------------------------------------------------------------


def case(id: str, question: str, phrase: str, reading: str, bounds: tuple[str | None, str | None],
         value: str | None = None, alts: tuple = (), **context: Any) -> Any:
    return pytest.param(question, phrase, reading, bounds, value, alts, context, id=id)


def run(question: str, **context: Any):  # type: ignore[no-untyped-def]
    now = context.pop("now", NOW)
    fields = {"languages": LANGS, "locale": "tr", **context}
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
    assert m.lang == "tr" or m.lang == "und"
    assert m.reading == reading
    assert (m.start, m.end) == bounds
    if value is not None:
        assert m.value == value
    assert tuple((a.reading, a.policy, a.start, a.end) for a in m.alternatives) == alts


PARAMS = ("question", "phrase", "reading", "bounds", "value", "alts", "context")
_YESTERDAY = TODAY + D(days=-1)

R1 = [
    case("R1-tr-dun", "Dün hangi hatalar kapatıldı?", "Dün", "R1", day(_YESTERDAY), _YESTERDAY.isoformat()),
    case("R1-tr-bugun", "Bugün neler birleştirildi?", "Bugün", "R1", day(TODAY), TODAY.isoformat()),
    case("R1-tr-yarin", "Yarın teslim edilecek görevler", "Yarın", "R1", day(TODAY + D(days=1))),
    case("R1-tr-evvelsi-gun-CLDR", "Evvelsi gün yeniden açılan kayıtlar", "Evvelsi gün", "R1",
         day(TODAY + D(days=-2))),
    case("R1-tr-onceki-gun-is-the-day-before-yesterday", "Önceki gün açılan hatalar", "Önceki gün",
         "R1", day(TODAY + D(days=-2))),
    case("R1-tr-obur-gun", "Öbür gün ne yayına çıkıyor?", "Öbür gün", "R1", day(TODAY + D(days=2))),
    case("R1-tr-dunku-particle", "Dünkü toplantıda konuşulan hatalar", "Dünkü", "R1", day(_YESTERDAY)),
    case("R1-tr-bugunku-particle", "Bugünkü deploy'u kim yaptı?", "Bugünkü", "R1", day(TODAY)),
    case("R1-tr-BUGUN-upper-case", "BUGÜN AÇILAN HATALAR", "BUGÜN", "R1", day(TODAY)),
    case("R1-tr-dun-Istanbul-across-a-month-start", "Dün kim yorum yaptı?", "Dün", "R1",
         day(ISTANBUL_MARCH_FIRST.date() + D(days=-1), ISTANBUL), "2026-02-28", now=ISTANBUL_MARCH_FIRST),
]

R2 = [
    case("R2-tr-gecen-hafta", "Geçen hafta açılan hatalar hangileri?", "Geçen hafta", "R2",
         tr_week(TODAY + D(weeks=-1)), iso_week_name(TODAY + D(weeks=-1))),
    case("R2-tr-bu-ay", "Bu ay kapatılan işler", "Bu ay", "R2", month_of(TODAY), "2026-12"),
    case("R2-tr-gelecek-yil", "Gelecek yıl planlanan sürümler", "Gelecek yıl", "R2", year(2027), "2027"),
    case("R2-tr-gecen-ceyrekte-particle", "Geçen çeyrekte kaç hata kapandı?", "Geçen çeyrekte", "R2",
         quarter_of(TODAY + D(months=-3)), "2026-Q3"),
    case("R2-tr-gecen-haftaki-particle", "Geçen haftaki hatalar", "Geçen haftaki", "R2",
         tr_week(TODAY + D(weeks=-1))),
    case("R2-tr-onumuzdeki-hafta", "Önümüzdeki hafta teslim edilecekler", "Önümüzdeki hafta", "R2",
         tr_week(TODAY + D(weeks=1))),
    case("R2-tr-bu-hafta-icinde", "Bu hafta içinde açılan hatalar", "Bu hafta içinde", "R2",
         tr_week(TODAY)),
    case("R2-tr-gectigimiz-ay", "Geçtiğimiz ay kapanan talepler", "Geçtiğimiz ay", "R2",
         month_of(TODAY + D(months=-1)), "2026-11"),
    case("R2-tr-gecen-sene", "Geçen sene kapanan işler", "Geçen sene", "R2", year(2025)),
    case("R2-tr-GECEN-YIL-upper-case-I", "GEÇEN YIL AÇILAN HATALAR", "GEÇEN YIL", "R2", year(2025)),
    case("R2-tr-gecen-hafta-typed-without-Turkish-letters", "gecen hafta acilan hatalar",
         "gecen hafta", "R2", tr_week(TODAY + D(weeks=-1))),
    case("R2-tr-bu-aya-dative-particle", "Bu aya ait hatalar", "Bu aya", "R2", month_of(TODAY)),
]

R3 = [
    case("R3-tr-3-gun-once", "3 gün önce açılan hatalar", "3 gün önce", "R3", day(TODAY + D(days=-3))),
    case("R3-tr-uc-hafta-once-number-word", "Üç hafta önce kapatılan işler", "Üç hafta önce", "R3",
         tr_week(TODAY + D(weeks=-3)), iso_week_name(TODAY + D(weeks=-3))),
    case("R3-tr-bir-ay-once-at-a-month-end", "Bir ay önce birleştirilen değişiklikler", "Bir ay önce",
         "R3", month_of(MONTH_END.date() + D(months=-1)), "2026-02", now=MONTH_END),
    case("R3-tr-2-saat-once", "2 saat önce gelen yorumlar", "2 saat önce", "R3",
         hour_of(moved(NOW, hours=-2))),
    case("R3-tr-IKI-yil-once-dotted-capital-I", "İki yıl önce açılan kayıtlar", "İki yıl önce", "R3",
         year(2024), "2024"),
    case("R3-tr-5-dakika-once", "5 dakika önce düşen servis", "5 dakika önce", "R3",
         minute_of(moved(NOW, minutes=-5))),
    case("R3-tr-3-gun-onceki-particle", "3 gün önceki hatalar", "3 gün önceki", "R3",
         day(TODAY + D(days=-3))),
    case("R3-tr-on-bes-gun-once", "On beş gün önce açılan hatalar", "On beş gün önce", "R3",
         day(TODAY + D(days=-15))),
]

R4 = [
    case("R4-tr-2-hafta-sonra", "2 hafta sonra teslim edilecekler", "2 hafta sonra", "R4",
         tr_week(TODAY + D(weeks=2)), iso_week_name(TODAY + D(weeks=2))),
    case("R4-tr-3-gun-sonra", "3 gün sonra yayına çıkacak sürüm", "3 gün sonra", "R4",
         day(TODAY + D(days=3))),
    case("R4-tr-bir-ay-sonra", "Bir ay sonra yenilenecek lisanslar", "Bir ay sonra", "R4",
         month_of(TODAY + D(months=1)), "2027-01"),
    case("R4-tr-iki-saat-sonra", "İki saat sonra başlayacak işler", "İki saat sonra", "R4",
         hour_of(moved(NOW, hours=2))),
]

_THIS_MONTH = TODAY.replace(day=1)
_THIS_WEEK = week_start(TODAY, _TR_FIRST)

R5 = [
    case("R5-tr-son-7-gun-icinde", "Son 7 gün içinde açılan hatalar", "Son 7 gün içinde", "R5",
         (wall(NOW, days=-7), iso(NOW)), alts=(alt("R5", _CAL, _cal_back(NOW, TODAY, 7, "days")),)),
    case("R5-tr-son-3-gun", "Son 3 gün kapatılan işler", "Son 3 gün", "R5", (wall(NOW, days=-3), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, TODAY, 3, "days")),)),
    case("R5-tr-son-bir-hafta-icinde", "Son bir hafta içinde gelen talepler", "Son bir hafta içinde",
         "R5", (wall(NOW, weeks=-1), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, _THIS_WEEK, 1, "weeks")),)),
    case("R5-tr-son-2-ayda-particle", "Son 2 ayda kapatılan işler", "Son 2 ayda", "R5",
         (wall(NOW, months=-2), iso(NOW)), alts=(alt("R5", _CAL, _cal_back(NOW, _THIS_MONTH, 2, "months")),)),
    case("R5-tr-gectigimiz-3-hafta-boyunca", "Geçtiğimiz 3 hafta boyunca açılan hatalar",
         "Geçtiğimiz 3 hafta boyunca", "R5", (wall(NOW, weeks=-3), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, _THIS_WEEK, 3, "weeks")),)),
    case("R5-tr-son-3-gundur", "Son 3 gündür açık olan hatalar", "Son 3 gündür", "R5",
         (wall(NOW, days=-3), iso(NOW)), alts=(alt("R5", _CAL, _cal_back(NOW, TODAY, 3, "days")),)),
    case("R5-tr-son-1-ay-at-a-month-end-clamps", "Son 1 ay içinde birleştirilenler", "Son 1 ay içinde",
         "R5", (wall(MONTH_END, months=-1), iso(MONTH_END)),
         alts=(alt("R5", _CAL, _cal_back(MONTH_END, date(2026, 3, 1), 1, "months")),), now=MONTH_END),
    case("R5-tr-son-24-saat-is-24-real-hours-Berlin-spring", "Son 24 saat içinde gelen hatalar",
         "Son 24 saat içinde", "R5", (elapsed(SPRING_BERLIN, hours=-24), iso(SPRING_BERLIN)),
         now=SPRING_BERLIN),
    case("R5-tr-son-24-saatte-Berlin-autumn", "Son 24 saatte düşen servisler", "Son 24 saatte", "R5",
         (elapsed(AUTUMN_BERLIN, hours=-24), iso(AUTUMN_BERLIN)), now=AUTUMN_BERLIN),
    case("R5-tr-son-2-saat-off-the-hour", "Son 2 saatteki deploylar", "Son 2 saatteki", "R5",
         (elapsed(QUARTER_PAST, hours=-2), iso(QUARTER_PAST)),
         alts=(alt("R5", _CAL, (elapsed(floor_hour(QUARTER_PAST), hours=-2), iso(floor_hour(QUARTER_PAST)))),),
         now=QUARTER_PAST),
    case("R5-tr-son-30-dakikada", "Son 30 dakikada kırılan derlemeler", "Son 30 dakikada", "R5",
         (elapsed(NOW, minutes=-30), iso(NOW))),
    case("R5-tr-son-2-yil-from-a-leap-day", "Son 2 yıl içindeki olaylar", "Son 2 yıl içindeki", "R5",
         (wall(LEAP_DAY, years=-2), iso(LEAP_DAY)),
         alts=(alt("R5", _CAL, _cal_back(LEAP_DAY, date(2028, 1, 1), 2, "years")),), now=LEAP_DAY),
    case("R5-tr-calendar-policy-reads-whole-days", "Son 7 gün içinde açılan hatalar", "Son 7 gün içinde",
         "R5", _cal_back(NOW, TODAY, 7, "days"), alts=(alt("R5", _ROLL, (wall(NOW, days=-7), iso(NOW))),),
         window_reading="calendar"),
]

R6 = [
    case("R6-tr-onumuzdeki-3-gun-icinde", "Önümüzdeki 3 gün içinde teslim edilecek görevler",
         "Önümüzdeki 3 gün içinde", "R6", (iso(NOW), wall(NOW, days=3)),
         alts=(alt("R6", _CAL, _cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-tr-gelecek-2-hafta", "Gelecek 2 hafta planlanan işler", "Gelecek 2 hafta", "R6",
         (iso(NOW), wall(NOW, weeks=2)), alts=(alt("R6", _CAL, _cal_ahead(NOW, _THIS_WEEK, 2, "weeks")),)),
    case("R6-tr-3-gun-icinde-is-the-next-3-days", "3 gün içinde kapanması gereken hatalar",
         "3 gün içinde", "R6", (iso(NOW), wall(NOW, days=3)),
         alts=(alt("R6", _CAL, _cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-tr-onumuzdeki-6-saat", "Önümüzdeki 6 saat boyunca çalışacak işler",
         "Önümüzdeki 6 saat boyunca", "R6", (iso(NOW), elapsed(NOW, hours=6)),
         alts=(alt("R6", _CAL, (elapsed(floor_hour(NOW), hours=1), elapsed(floor_hour(NOW), hours=7))),)),
    case("R6-tr-onumuzdeki-2-ay", "Önümüzdeki 2 ay yenilenecek sözleşmeler", "Önümüzdeki 2 ay", "R6",
         (iso(NOW), wall(NOW, months=2)), alts=(alt("R6", _CAL, _cal_ahead(NOW, _THIS_MONTH, 2, "months")),)),
]

_MARCH_PAST = month(_past(lambda y: date(y, 3, 1)), 3)
_MARCH_NEXT = month(_future(lambda y: date(y, 4, 1)), 3)
_JANUARY_PAST = month(_past(lambda y: date(y, 1, 1)), 1)
_JANUARY_NEXT = month(_future(lambda y: date(y, 2, 1)), 1)
_MONDAY_PAST = day(on_or_before(TODAY, MO))
_MONDAY_NEXT = day(on_or_after(TODAY, MO))
_FRIDAY_PAST = day(on_or_before(TODAY, FR))
_FRIDAY_NEXT = day(on_or_after(TODAY, FR))

R7 = [
    case("R7-tr-gecen-haftadan-beri", "Geçen haftadan beri açık olan hatalar", "Geçen haftadan beri", "R7",
         since(tr_week(TODAY + D(weeks=-1))), f"{(_THIS_WEEK + D(weeks=-1)).isoformat()}/.."),
    case("R7-tr-Marttan-beri", "Mart'tan beri kapatılan işler", "Mart'tan beri", "R7", since(_MARCH_PAST),
         alts=(alt("R7", _FUT, since(_MARCH_NEXT)),)),
    case("R7-tr-2025ten-bu-yana", "2025'ten bu yana açılan kayıtlar", "2025'ten bu yana", "R7",
         since(year(2025)), "2025-01-01/.."),
    case("R7-tr-dunden-beri", "Dünden beri düşen servisler", "Dünden beri", "R7", since(day(_YESTERDAY))),
    case("R7-tr-pazartesiden-itibaren", "Pazartesiden itibaren açılan hatalar", "Pazartesiden itibaren",
         "R7", since(_MONDAY_PAST), alts=(alt("R7", _FUT, since(_MONDAY_NEXT)),)),
    case("R7-tr-1-Marttan-itibaren", "1 Mart'tan itibaren gelen talepler", "1 Mart'tan itibaren", "R7",
         since(day(date(_past(lambda y: date(y, 3, 1)), 3, 1))),
         alts=(alt("R7", _FUT, since(day(date(_future(lambda y: date(y, 3, 2)), 3, 1)))),)),
    case("R7-tr-Mart-ayindan-beri", "Mart ayından beri bekleyen işler", "Mart ayından beri", "R7",
         since(_MARCH_PAST), alts=(alt("R7", _FUT, since(_MARCH_NEXT)),)),
]

R8 = [
    case("R8-tr-Marttan-sonra", "Mart'tan sonra açılan hatalar", "Mart'tan sonra", "R8", after(_MARCH_PAST),
         alts=(alt("R8", _FUT, after(_MARCH_NEXT)),)),
    case("R8-tr-yarindan-sonra", "Yarından sonra yapılacak işler", "Yarından sonra", "R8",
         after(day(TODAY + D(days=1)))),
    case("R8-tr-gecen-haftadan-sonra", "Geçen haftadan sonra yeniden açılanlar", "Geçen haftadan sonra",
         "R8", after(tr_week(TODAY + D(weeks=-1)))),
    case("R8-tr-2025ten-sonra", "2025'ten sonra açılan kayıtlar", "2025'ten sonra", "R8", after(year(2025))),
]

R9 = [
    case("R9-tr-2025ten-once", "2025'ten önce kapatılan işler", "2025'ten önce", "R9", before(year(2025)),
         "../2024-12-31"),
    case("R9-tr-Marttan-once", "Mart'tan önce açılan hatalar", "Mart'tan önce", "R9", before(_MARCH_PAST),
         alts=(alt("R9", _FUT, before(_MARCH_NEXT)),)),
    case("R9-tr-bugunden-once", "Bugünden önce açılmış kayıtlar", "Bugünden önce", "R9", before(day(TODAY))),
    case("R9-tr-gecen-haftadan-once", "Geçen haftadan önce kapananlar", "Geçen haftadan önce", "R9",
         before(tr_week(TODAY + D(weeks=-1)))),
]

R10 = [
    case("R10-tr-cumaya-kadar-deadline-looks-ahead", "Cumaya kadar bitmesi gereken görevler",
         "Cumaya kadar", "R10", until(_FRIDAY_NEXT), alts=(alt("R10", None, until(_FRIDAY_PAST)),)),
    case("R10-tr-bugune-kadar", "Bugüne kadar açılan hatalar", "Bugüne kadar", "R10", until(day(TODAY))),
    case("R10-tr-Marta-kadar", "Mart'a kadar kapanan işler", "Mart'a kadar", "R10", until(_MARCH_PAST),
         alts=(alt("R10", _FUT, until(_MARCH_NEXT)),)),
    case("R10-tr-en-gec-cuma", "En geç cuma bitecek işler", "En geç cuma", "R10", until(_FRIDAY_NEXT),
         alts=(alt("R10", None, until(_FRIDAY_PAST)),)),
    case("R10-tr-gelecek-haftaya-kadar", "Gelecek haftaya kadar çözülecek hatalar",
         "Gelecek haftaya kadar", "R10", until(tr_week(TODAY + D(weeks=1)))),
    case("R10-tr-cuma-gunune-kadar", "Cuma gününe kadar teslim edilecekler", "Cuma gününe kadar", "R10",
         until(_FRIDAY_NEXT), alts=(alt("R10", None, until(_FRIDAY_PAST)),)),
]

_NOV_TO_FEB = joined(month(2026, 11), month(2027, 2))
R11 = [
    case("R11-tr-1-Mart-ile-15-Mart-arasinda", "1 Mart ile 15 Mart arasında açılan hatalar",
         "1 Mart ile 15 Mart arasında", "R11", joined(day(date(2026, 3, 1)), day(date(2026, 3, 15))),
         "2026-03-01/2026-03-15",
         alts=(alt("R11", _FUT, joined(day(date(2027, 3, 1)), day(date(2027, 3, 15)))),)),
    case("R11-tr-Marttan-Nisana-kadar", "Mart'tan Nisan'a kadar kapatılan işler", "Mart'tan Nisan'a kadar",
         "R11", joined(_MARCH_PAST, month(2026, 4)),
         alts=(alt("R11", _FUT, joined(_MARCH_NEXT, month(2027, 4))),)),
    case("R11-tr-Kasimdan-Subata-kadar-crosses-the-year", "Kasım'dan Şubat'a kadar nöbet listesi",
         "Kasım'dan Şubat'a kadar", "R11", _NOV_TO_FEB, "2026-11-01/2027-02-28",
         alts=(alt("R11", _FUT, joined(month(2027, 11), month(2028, 2))),)),
    case("R11-tr-gecen-haftadan-bu-haftaya-kadar", "Geçen haftadan bu haftaya kadar açılan hatalar",
         "Geçen haftadan bu haftaya kadar", "R11", joined(tr_week(TODAY + D(weeks=-1)), tr_week(TODAY))),
    case("R11-tr-2024-ile-2025-arasinda-bare-years", "2024 ile 2025 arasında kapanan olaylar",
         "2024 ile 2025 arasında", "R11", joined(year(2024), year(2025))),
    case("R11-tr-pazartesiden-cumaya-kadar", "Pazartesiden cumaya kadar açılan hatalar",
         "Pazartesiden cumaya kadar", "R11",
         joined(_MONDAY_PAST, day(on_or_after(on_or_before(TODAY, MO), FR))),
         alts=(alt("R11", _FUT, joined(_MONDAY_NEXT, day(on_or_after(on_or_after(TODAY, MO), FR)))),)),
    case("R11-tr-1-15-Mart-arasi-dash", "1-15 Mart arası sürümler", "1-15 Mart arası", "R11",
         joined(day(date(2026, 3, 1)), day(date(2026, 3, 15))),
         alts=(alt("R11", _FUT, joined(day(date(2027, 3, 1)), day(date(2027, 3, 15)))),)),
    case("R11-tr-1-ile-15-Mart-arasinda-day-numbers", "1 ile 15 Mart arasında açılanlar",
         "1 ile 15 Mart arasında", "R11", joined(day(date(2026, 3, 1)), day(date(2026, 3, 15))),
         alts=(alt("R11", _FUT, joined(day(date(2027, 3, 1)), day(date(2027, 3, 15)))),)),
    case("R11-tr-ISO-ile-ISO-arasinda", "2025-01-01 ile 2025-03-31 arasındaki giderler",
         "2025-01-01 ile 2025-03-31 arasındaki", "R11", joined(day(date(2025, 1, 1)), day(date(2025, 3, 31))),
         "2025-01-01/2025-03-31"),
    case("R11-tr-dunden-bugune-kadar", "Dünden bugüne kadar gelen talepler", "Dünden bugüne kadar", "R11",
         joined(day(_YESTERDAY), day(TODAY))),
    case("R11-tr-Ocak-ve-Mart-arasinda", "Ocak ve Mart arasında açılan hatalar", "Ocak ve Mart arasında",
         "R11", joined(_JANUARY_PAST, month(2026, 3)),
         alts=(alt("R11", _FUT, joined(_JANUARY_NEXT, month(2027, 3))),)),
    case("R11-tr-without-Turkish-letters", "marttan nisana kadar kapananlar", "marttan nisana kadar",
         "R11", joined(_MARCH_PAST, month(2026, 4)),
         alts=(alt("R11", _FUT, joined(_MARCH_NEXT, month(2027, 4))),)),
]

_MAR14 = (_past(lambda y: date(y, 3, 14)), _future(lambda y: date(y, 3, 15)))
_DEC3 = (_past(lambda y: date(y, 12, 3)), _future(lambda y: date(y, 12, 4)))

R12 = [
    case("R12-tr-Martta-apostrophe-particle", "Mart'ta açılan hatalar", "Mart'ta", "R12", _MARCH_PAST,
         "2026-03", alts=(alt("R12", _FUT, _MARCH_NEXT),)),
    case("R12-tr-Aralikta-current-month-counts", "Aralık'ta kapanan işler", "Aralık'ta", "R12",
         month(2026, 12), "2026-12"),
    case("R12-tr-Mart-ayinda", "Mart ayında açılan hatalar", "Mart ayında", "R12", _MARCH_PAST,
         alts=(alt("R12", _FUT, _MARCH_NEXT),)),
    case("R12-tr-14-Martta", "14 Mart'ta yayınlanan sürüm", "14 Mart'ta", "R12",
         day(date(_MAR14[0], 3, 14)), alts=(alt("R12", _FUT, day(date(_MAR14[1], 3, 14))),)),
    case("R12-tr-3-Aralik-tomorrow-is-last-years", "3 Aralık'ta kapanan işler", "3 Aralık'ta", "R12",
         day(date(_DEC3[0], 12, 3)), "2025-12-03", alts=(alt("R12", _FUT, day(date(_DEC3[1], 12, 3))),)),
    case("R12-tr-Q3te", "Q3'te kapanan işler", "Q3'te", "R12",
         quarter(_past(lambda y: date(y, 7, 1)), 3), "2026-Q3",
         alts=(alt("R12", _FUT, quarter(_future(lambda y: date(y, 10, 1)), 3)),)),
    case("R12-tr-ucuncu-ceyrekte", "Üçüncü çeyrekte açılan hatalar", "Üçüncü çeyrekte", "R12",
         quarter(_past(lambda y: date(y, 7, 1)), 3),
         alts=(alt("R12", _FUT, quarter(_future(lambda y: date(y, 10, 1)), 3)),)),
    case("R12-tr-Ilk-ceyrek-dotted-capital-I", "İlk çeyrek hedefleri", "İlk çeyrek", "R12",
         quarter(_past(lambda y: date(y, 1, 1)), 1), "2026-Q1",
         alts=(alt("R12", _FUT, quarter(_future(lambda y: date(y, 4, 1)), 1)),)),
    case("R12-tr-yilin-ilk-yarisinda", "Yılın ilk yarısında açılan hatalar", "Yılın ilk yarısında", "R12",
         half(_past(lambda y: date(y, 1, 1)), 1), "2026-H1",
         alts=(alt("R12", _FUT, half(_future(lambda y: date(y, 7, 1)), 1)),)),
    case("R12-tr-4-ceyrek-current-quarter", "4. çeyrekte kapanan işler", "4. çeyrekte", "R12",
         quarter(2026, 4), "2026-Q4"),
    case("R12-tr-Ocakta", "Ocak'ta açılan talepler", "Ocak'ta", "R12", _JANUARY_PAST, "2026-01",
         alts=(alt("R12", _FUT, _JANUARY_NEXT),)),
    case("R12-tr-martta-without-apostrophe", "martta kapanan hatalar", "martta", "R12", _MARCH_PAST,
         alts=(alt("R12", _FUT, _MARCH_NEXT),)),
    case("R12-tr-Mayis-ayi-boyunca", "Mayıs ayı boyunca açılan hatalar", "Mayıs ayı boyunca", "R12",
         month(2026, 5), alts=(alt("R12", _FUT, month(2027, 5)),)),
]

R13 = [
    case("R13-tr-pazartesi", "Pazartesi açılan hatalar", "Pazartesi", "R13", _MONDAY_PAST,
         alts=(alt("R13", _FUT, _MONDAY_NEXT),)),
    case("R13-tr-cuma-gunu", "Cuma günü kapatılan işler", "Cuma günü", "R13", _FRIDAY_PAST,
         alts=(alt("R13", _FUT, _FRIDAY_NEXT),)),
    case("R13-tr-carsamba-gunu-is-today", "Çarşamba günü açılan hatalar", "Çarşamba günü", "R13", day(TODAY)),
    case("R13-tr-son-tarihi-cuma-deadline-looks-ahead", "Son tarihi cuma olan görevler", "cuma", "R13",
         _FRIDAY_NEXT, alts=(alt("R13", None, _FRIDAY_PAST),)),
    case("R13-tr-persembe", "Perşembe yayınlanan sürüm", "Perşembe", "R13", day(on_or_before(TODAY, TH)),
         alts=(alt("R13", _FUT, day(on_or_after(TODAY, TH))),)),
    case("R13-tr-cumartesi-gunu", "Cumartesi günü yapılan deploy", "Cumartesi günü", "R13",
         day(on_or_before(TODAY, SA)), alts=(alt("R13", _FUT, day(on_or_after(TODAY, SA))),)),
    case("R13-tr-sali-gunu-future-bias", "Salı günü yapılacak toplantı", "Salı günü", "R13",
         day(on_or_after(TODAY, TU)), alts=(alt("R13", _PAST, day(on_or_before(TODAY, TU))),), bias="future"),
]

R14 = [
    case("R14-tr-gecen-pazartesi-nearest", "Geçen pazartesi ne bozuldu?", "Geçen pazartesi", "R14",
         day(strictly_before(TODAY, MO)), alts=(alt("R16", _WEEK, day(in_week(TODAY, MO, -1))),),
         weekday_reading="nearest"),
    case("R14-tr-gecen-sali-is-yesterday-nearest", "Geçen salı açılan hatalar", "Geçen salı", "R14",
         day(strictly_before(TODAY, TU)), alts=(alt("R16", _WEEK, day(in_week(TODAY, TU, -1))),),
         weekday_reading="nearest"),
    case("R14-tr-gecen-cuma-both-readings-agree", "Geçen cuma kapatılan işler", "Geçen cuma", "R14",
         day(strictly_before(TODAY, FR)), weekday_reading="nearest"),
    case("R14-tr-gectigimiz-carsamba-said-on-a-Wednesday", "Geçtiğimiz çarşamba yapılan deploy",
         "Geçtiğimiz çarşamba", "R14", day(strictly_before(TODAY, WE)), weekday_reading="nearest"),
    case("R14-tr-gecen-pzt-CLDR-short", "Geçen pzt. açılan hatalar", "Geçen pzt.", "R14",
         day(strictly_before(TODAY, MO)), alts=(alt("R16", _WEEK, day(in_week(TODAY, MO, -1))),),
         weekday_reading="nearest"),
    case("R14-tr-gecen-pazar-said-on-a-Sunday", "Geçen pazar düşen servisler", "Geçen pazar", "R14",
         day(strictly_before(SUNDAY.date(), SU)), now=SUNDAY, weekday_reading="nearest"),
]

R15 = [
    case("R15-tr-gelecek-persembe-is-tomorrow-nearest", "Gelecek perşembe planlanan işler",
         "Gelecek perşembe", "R15", day(strictly_after(TODAY, TH)),
         alts=(alt("R16", _WEEK, day(in_week(TODAY, TH, 1))),), weekday_reading="nearest"),
    case("R15-tr-onumuzdeki-cuma-is-the-coming-one-by-default", "Önümüzdeki cuma demo var",
         "Önümüzdeki cuma", "R15", day(strictly_after(TODAY, FR)),
         alts=(alt("R16", None, day(in_week(TODAY, FR, 1))),)),
    case("R15-tr-onumuzdeki-cuma-whatever-the-weekday-reading", "Önümüzdeki cuma demo var",
         "Önümüzdeki cuma", "R15", day(strictly_after(TODAY, FR)),
         alts=(alt("R16", None, day(in_week(TODAY, FR, 1))),), weekday_reading="week"),
    case("R15-tr-gelecek-pazartesi-both-readings-agree", "Gelecek pazartesi başlayacak işler",
         "Gelecek pazartesi", "R15", day(strictly_after(TODAY, MO)), weekday_reading="nearest"),
    case("R15-tr-bir-sonraki-carsamba-said-on-a-Wednesday", "Bir sonraki çarşamba toplantı var",
         "Bir sonraki çarşamba", "R15", day(strictly_after(TODAY, WE)), weekday_reading="nearest"),
    case("R15-tr-gelecek-pazar-said-on-a-Sunday", "Gelecek pazar bakım var", "Gelecek pazar", "R15",
         day(strictly_after(SUNDAY.date(), SU)), now=SUNDAY, weekday_reading="nearest"),
]

R16 = [
    case("R16-tr-gecen-pazartesi-default-is-last-weeks", "Geçen pazartesi ne bozuldu?", "Geçen pazartesi",
         "R16", day(in_week(TODAY, MO, -1)), in_week(TODAY, MO, -1).isoformat(),
         alts=(alt("R14", _NEAREST, day(strictly_before(TODAY, MO))),)),
    case("R16-tr-gelecek-persembe-default-is-next-weeks", "Gelecek perşembe planlanan işler",
         "Gelecek perşembe", "R16", day(in_week(TODAY, TH, 1)),
         alts=(alt("R15", _NEAREST, day(strictly_after(TODAY, TH))),)),
    case("R16-tr-gecen-hafta-pazartesi", "Geçen hafta pazartesi açılan hatalar", "Geçen hafta pazartesi",
         "R16", day(in_week(TODAY, MO, -1))),
    case("R16-tr-gecen-haftanin-cumasi", "Geçen haftanın cuması kapanan işler", "Geçen haftanın cuması",
         "R16", day(in_week(TODAY, FR, -1))),
    case("R16-tr-bu-haftanin-carsambasi", "Bu haftanın çarşambası yapılan deploy",
         "Bu haftanın çarşambası", "R16", day(in_week(TODAY, WE, 0))),
    case("R16-tr-gelecek-hafta-sali-gunu", "Gelecek hafta salı günü toplantı", "Gelecek hafta salı günü",
         "R16", day(in_week(TODAY, TU, 1))),
    case("R16-tr-haftaya-sali", "Haftaya salı yayına çıkacaklar", "Haftaya salı", "R16",
         day(in_week(TODAY, TU, 1))),
    case("R16-tr-bu-pazartesi-has-passed", "Bu pazartesi açılan hatalar", "Bu pazartesi", "R16",
         day(in_week(TODAY, MO, 0)), alts=(alt("R15", None, day(strictly_after(TODAY, MO))),)),
    case("R16-tr-gecen-haftaki-cuma-sunday-weeks", "Geçen haftaki cuma kapanan işler",
         "Geçen haftaki cuma", "R16", day(in_week(TODAY, FR, -1, SU)), week_start="sunday"),
]

R17 = [
    case("R17-tr-2025-yilinda", "2025 yılında açılan hatalar", "2025 yılında", "R17", year(2025), "2025"),
    case("R17-tr-2025te-apostrophe", "2025'te kapatılan işler", "2025'te", "R17", year(2025)),
    case("R17-tr-2024-icinde", "2024 içinde yayınlanan sürümler", "2024 içinde", "R17", year(2024)),
    case("R17-tr-2023ten-kalan", "2023'ten kalan hatalar", "2023'ten", "R17", year(2023)),
    case("R17-tr-2026daki-particle", "2026'daki olaylar", "2026'daki", "R17", year(2026)),
]

R18 = [
    case("R18-tr-14-Mart-2025te", "14 Mart 2025'te çıkan sürüm", "14 Mart 2025'te", "R18",
         day(date(2025, 3, 14)), "2025-03-14"),
    case("R18-tr-numeric-day-first-unambiguous", "14.03.2026 tarihinde kapatılan işler",
         "14.03.2026 tarihinde", "R18", day(read_tr(14, 3, 2026)), "2026-03-14"),
    case("R18-tr-numeric-ambiguous-reads-day-first", "03.04.2026'da düzeltilen hata", "03.04.2026'da",
         "R18", day(read_tr(3, 4, 2026)), "2026-04-03",
         alts=(alt("R18", "date_order=MDY", day(date(2026, 3, 4))),)),
    case("R18-tr-numeric-slashes", "14/03/2026 tarihli kayıtlar", "14/03/2026 tarihli", "R18",
         day(read_tr(14, 3, 2026))),
    case("R18-tr-ISO-tarihli", "2025-03-14 tarihli kayıtlar", "2025-03-14 tarihli", "R18",
         day(date(2025, 3, 14))),
    case("R18-tr-with-weekday-after", "14 Mart 2025 Cuma günü çıkan sürüm", "14 Mart 2025 Cuma", "R18",
         day(date(2025, 3, 14))),
    case("R18-tr-weekday-comma-first", "Cuma, 14 Mart 2025 yayını", "Cuma, 14 Mart 2025", "R18",
         day(date(2025, 3, 14))),
    case("R18-tr-5-Ocak-2026-tarihinde", "5 Ocak 2026 tarihinde açılan hatalar", "5 Ocak 2026 tarihinde",
         "R18", day(date(2026, 1, 5))),
    case("R18-tr-29-Subat-2028-leap-day", "29 Şubat 2028 günü yapılacak bakım", "29 Şubat 2028", "R18",
         day(date(2028, 2, 29))),
    case("R18-tr-abbreviated-month-with-year", "3 Ara 2025 tarihinde kapanan iş", "3 Ara 2025 tarihinde",
         "R18", day(date(2025, 12, 3))),
    case("R18-tr-numeric-month-first-under-MDY", "03.04.2026'da düzeltilen hata", "03.04.2026'da", "R18",
         day(date(2026, 3, 4)), alts=(alt("R18", "date_order=DMY", day(read_tr(3, 4, 2026))),),
         date_order="MDY"),
]

R19 = [
    case("R19-tr-Mart-2025te", "Mart 2025'te açılan hatalar", "Mart 2025'te", "R19", month(2025, 3), "2025-03"),
    case("R19-tr-Q3-2025", "Q3 2025 gelirleri", "Q3 2025", "R19", quarter(2025, 3), "2025-Q3"),
    case("R19-tr-2025in-ucuncu-ceyreginde", "2025'in üçüncü çeyreğinde kapanan işler",
         "2025'in üçüncü çeyreğinde", "R19", quarter(2025, 3)),
    case("R19-tr-2026nin-ilk-yarisi", "2026'nın ilk yarısı hedefleri", "2026'nın ilk yarısı", "R19",
         half(2026, 1), "2026-H1"),
    case("R19-tr-H1-2026", "H1 2026 hedefleri", "H1 2026", "R19", half(2026, 1)),
    case("R19-tr-2026-yilinin-ikinci-yarisinda", "2026 yılının ikinci yarısında yapılacaklar",
         "2026 yılının ikinci yarısında", "R19", half(2026, 2), "2026-H2"),
    case("R19-tr-3C-2025-finance", "3Ç 2025 sonuçları", "3Ç 2025", "R19", quarter(2025, 3)),
    case("R19-tr-2025-Mart-ayinda", "2025 Mart ayında açılanlar", "2025 Mart ayında", "R19", month(2025, 3)),
]

R20 = [
    case("R20-tr-2026nin-48-haftasinda", "2026'nın 48. haftasında açılan hatalar",
         "2026'nın 48. haftasında", "R20", iso_week(2026, 48), "2026-W48"),
    case("R20-tr-48-haftada-past-bias", "48. haftada kapanan işler", "48. haftada", "R20",
         iso_week(_recent_week(48), 48), "2026-W48", alts=(alt("R20", _FUT, iso_week(_next_week(48), 48)),)),
    case("R20-tr-hafta-12", "Hafta 12 görevleri", "Hafta 12", "R20", iso_week(_recent_week(12), 12),
         alts=(alt("R20", _FUT, iso_week(_next_week(12), 12)),)),
    case("R20-tr-yilin-50-haftasi-is-last-year", "Yılın 50. haftası planı", "Yılın 50. haftası", "R20",
         iso_week(_recent_week(50), 50), "2025-W50", alts=(alt("R20", _FUT, iso_week(_next_week(50), 50)),)),
    case("R20-tr-2026-yilinin-1-haftasi", "2026 yılının 1. haftası açılanlar", "2026 yılının 1. haftası",
         "R20", iso_week(2026, 1), "2026-W01"),
    case("R20-tr-ISO-2026-W48", "2026-W48 haftasının hataları", "2026-W48", "R20", iso_week(2026, 48)),
]

R21 = [
    case("R21-tr-yilbasindan-beri", "Yılbaşından beri gelen gelir", "Yılbaşından beri", "R21",
         _to_now(year(2026)), f"{year(2026)[0]}/{iso(NOW)}"),
    case("R21-tr-ay-basindan-beri", "Ay başından beri kapatılan işler", "Ay başından beri", "R21",
         _to_now(month_of(TODAY))),
    case("R21-tr-bu-yil-simdiye-kadar", "Bu yıl şimdiye kadar açılan hatalar", "Bu yıl şimdiye kadar",
         "R21", _to_now(year(2026))),
    case("R21-tr-ceyrek-basindan-bu-yana", "Çeyrek başından bu yana gelirler", "Çeyrek başından bu yana",
         "R21", _to_now(quarter_of(TODAY))),
    case("R21-tr-hafta-basindan-beri", "Hafta başından beri açılan hatalar", "Hafta başından beri", "R21",
         _to_now(tr_week(TODAY))),
    case("R21-tr-YTD", "YTD gelir raporu", "YTD", "R21", _to_now(year(2026))),
]

R22 = [
    case("R22-tr-bu-sabah", "Bu sabah gelen hatalar", "Bu sabah", "R22", period(TODAY, "morning1")),
    case("R22-tr-dun-aksam", "Dün akşam yapılan deploy", "Dün akşam", "R22", period(_YESTERDAY, "evening1")),
    case("R22-tr-yarin-sabah", "Yarın sabah yayına çıkacak sürüm", "Yarın sabah", "R22",
         period(TODAY + D(days=1), "morning1")),
    case("R22-tr-dun-gece-crosses-midnight", "Dün gece düşen servisler", "Dün gece", "R22",
         period(_YESTERDAY, "night1")),
    case("R22-tr-bu-gece", "Bu gece bakım var mı?", "Bu gece", "R22", period(TODAY, "night1")),
    case("R22-tr-bugun-ogleden-sonra", "Bugün öğleden sonra açılan hatalar", "Bugün öğleden sonra", "R22",
         period(TODAY, "afternoon1")),
    case("R22-tr-dun-ogleden-sonra", "Dün öğleden sonra kapananlar", "Dün öğleden sonra", "R22",
         period(_YESTERDAY, "afternoon1")),
    case("R22-tr-bu-aksamki-particle", "Bu akşamki deploy'u kim yapacak?", "Bu akşamki", "R22",
         period(TODAY, "evening1")),
    case("R22-tr-dun-aksamustu", "Dün akşamüstü gelen talepler", "Dün akşamüstü", "R22",
         period(_YESTERDAY, "afternoon2")),
    case("R22-tr-dun-aksami-fused", "Dün akşamı düşen servis", "Dün akşamı", "R22",
         period(_YESTERDAY, "evening1")),
    case("R22-tr-bu-sabah-Istanbul", "Bu sabah gelen hatalar", "Bu sabah", "R22",
         period(ISTANBUL_NOW.date(), "morning1", ISTANBUL), now=ISTANBUL_NOW),
]

_COMING = first_open_weekend(TODAY, "tr")
_LAST_WE = last_ended_weekend(TODAY, "tr")
R23 = [
    case("R23-tr-bu-hafta-sonu-on-a-Wednesday", "Bu hafta sonu deploy var mı?", "Bu hafta sonu", "R23",
         weekend(_COMING), weekend_value(_COMING)),
    case("R23-tr-gecen-hafta-sonu", "Geçen hafta sonu düşen servisler", "Geçen hafta sonu", "R23",
         weekend(_LAST_WE), weekend_value(_LAST_WE)),
    case("R23-tr-gelecek-hafta-sonu-is-the-one-after", "Gelecek hafta sonu bakım planı",
         "Gelecek hafta sonu", "R23", weekend(_COMING + D(weeks=1)), alts=(alt("R23", None, weekend(_COMING)),)),
    case("R23-tr-onumuzdeki-hafta-sonu-is-the-coming-one", "Önümüzdeki hafta sonu nöbet kimde?",
         "Önümüzdeki hafta sonu", "R23", weekend(_COMING)),
    case("R23-tr-hafta-sonunda-past-bias", "Hafta sonunda ne bozuldu?", "Hafta sonunda", "R23",
         weekend(_LAST_WE), alts=(alt("R23", _FUT, weekend(_COMING)),)),
    case("R23-tr-hafta-sonunda-on-a-Saturday", "Hafta sonunda ne bozuldu?", "Hafta sonunda", "R23",
         weekend(first_open_weekend(SATURDAY.date(), "tr")), now=SATURDAY),
    case("R23-tr-bu-hafta-sonu-on-a-Saturday", "Bu hafta sonu yapılan deploylar", "Bu hafta sonu", "R23",
         weekend(first_open_weekend(SATURDAY.date(), "tr")), now=SATURDAY),
    case("R23-tr-haftaya-hafta-sonu", "Haftaya hafta sonu bakım var", "Haftaya hafta sonu", "R23",
         weekend(_COMING + D(weeks=1)), alts=(alt("R23", None, weekend(_COMING)),)),
    case("R23-tr-gecen-haftasonu-one-word", "Geçen haftasonu açılan hatalar", "Geçen haftasonu", "R23",
         weekend(_LAST_WE)),
]

TABLES = {"R1": R1, "R2": R2, "R3": R3, "R4": R4, "R5": R5, "R6": R6, "R7": R7, "R8": R8, "R9": R9,
          "R10": R10, "R11": R11, "R12": R12, "R13": R13, "R14": R14, "R15": R15, "R16": R16,
          "R17": R17, "R18": R18, "R19": R19, "R20": R20, "R21": R21, "R22": R22, "R23": R23}
#: Readings that need more examples than the minimum of three (endings and policies).
DEEP = {"R5", "R11", "R12", "R13", "R14", "R15", "R16", "R18", "R22", "R23"}


def _all_cases() -> list[Any]:
    return [pytest.param(*p.values, id=p.id) for table in TABLES.values() for p in table]


def test_every_reading_has_worked_turkish_examples() -> None:
    assert sorted(TABLES, key=lambda r: int(r[1:])) == [f"R{i}" for i in range(1, 24)]
    for rid, table in TABLES.items():
        assert len(table) >= (5 if rid in DEEP else 3), rid
        assert all(p.id.startswith(f"{rid}-tr-") for p in table), rid


def test_the_clocks_and_CLDR_facts_the_tables_use() -> None:
    # stdlib date.weekday(); CLDR 49 via babel: TR weeks start on Monday, weekend Saturday-Sunday,
    # numeric dates day first; Istanbul keeps UTC+03:00 (tzdata).
    assert (NOW.weekday(), SATURDAY.weekday(), SUNDAY.weekday(), FRIDAY.weekday()) == (2, 5, 6, 4)
    assert _TR_FIRST == MO and weekend_days("tr") == (SA, 2)
    assert numeric_order("tr") == "DM"
    assert ISTANBUL_NOW.utcoffset() == ISTANBUL_MARCH_FIRST.utcoffset()


@pytest.mark.parametrize(PARAMS, _all_cases())
def test_turkish_phrase_resolves_to_its_interval(question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, _all_cases())
def test_every_turkish_alternative_names_a_policy_that_selects_it_or_none(
        question, phrase, reading, bounds, value, alts, context):
    m = one(question, **context)
    for a in m.alternatives:
        if a.policy is None:
            continue
        key, _, setting = a.policy.partition("=")
        chosen = one(question, **{**context, key: setting})
        assert (chosen.start, chosen.end) == (a.start, a.end), a.policy


def test_the_locale_file_reads_last_weekday_as_that_day_of_last_week() -> None:
    # common practice: "geçen pazartesi" is Monday of last week (stated in locales/tr.toml).
    assert load_locale("tr").meta.weekday_reading == "week"


# --- D: lengths of time -----------------------------------------------------------------------

DURATIONS = [
    ("D-tr-3-gundur", "3 gündür açık olan hatalar", "3 gündür", "P3D"),
    ("D-tr-iki-haftadir", "İki haftadır bekleyen talepler", "İki haftadır", "P2W"),
    ("D-tr-3-gunden-fazla", "3 günden fazla açık kalan hatalar", "3 günden fazla", "P3D"),
    ("D-tr-3-gunden-beri-is-a-length", "3 günden beri açık olan kayıt", "3 günden beri", "P3D"),
    ("D-tr-en-az-5-gun", "En az 5 gün süren işler", "5 gün", "P5D"),
    ("D-tr-24-saat-boyunca", "24 saat boyunca çalışan iş", "24 saat boyunca", "PT24H"),
    ("D-tr-2-ay-sureyle", "2 ay süreyle dondurulan hesaplar", "2 ay süreyle", "P2M"),
]


@pytest.mark.parametrize(("question", "phrase", "value"), [d[1:] for d in DURATIONS],
                         ids=[d[0] for d in DURATIONS])
def test_D_a_length_of_time_is_a_duration(question, phrase, value):
    # ISO 8601 durations; a cue before ("en az") stays in the question, a Turkish ending or
    # postposition ("-dır", "-den fazla", "boyunca") is part of the phrase.
    m = one(question)
    assert (m.text, m.kind, m.reading, m.value) == (phrase, "duration", "D", value)
    assert m.start is None and m.end is None


# --- policies ---------------------------------------------------------------------------------

POLICY_FLIPS = [
    ("R12-tr-bias-future-Martta", "Mart'ta açılan hatalar", {}, ("bias", "future", "past")),
    ("R12-tr-bias-future-14-Martta", "14 Mart'ta yayınlanan sürüm", {}, ("bias", "future", "past")),
    ("R13-tr-bias-future-pazartesi", "Pazartesi açılan hatalar", {}, ("bias", "future", "past")),
    ("R20-tr-bias-future-48-haftada", "48. haftada kapanan işler", {}, ("bias", "future", "past")),
    ("R23-tr-bias-future-hafta-sonunda", "Hafta sonunda ne bozuldu?", {}, ("bias", "future", "past")),
    ("R7-tr-bias-future-Marttan-beri", "Mart'tan beri kapatılan işler", {}, ("bias", "future", "past")),
    ("R11-tr-bias-future-Marttan-Nisana-kadar", "Mart'tan Nisan'a kadar kapatılan işler", {},
     ("bias", "future", "past")),
    ("R5-tr-window-calendar-son-3-ay", "Son 3 ay içinde kapanan işler", {},
     ("window_reading", "calendar", "rolling")),
    ("R6-tr-window-calendar-onumuzdeki-3-gun", "Önümüzdeki 3 gün içinde yapılacaklar", {},
     ("window_reading", "calendar", "rolling")),
    ("R16-tr-weekday-nearest-gecen-pazartesi", "Geçen pazartesi ne bozuldu?", {},
     ("weekday_reading", "nearest", "week")),
    ("R16-tr-weekday-nearest-gelecek-persembe", "Gelecek perşembe planlanan işler", {},
     ("weekday_reading", "nearest", "week")),
    ("R18-tr-date-order-MDY", "03.04.2026'da düzeltilen hata", {}, ("date_order", "MDY", "DMY")),
]


@pytest.mark.parametrize(("question", "base", "setting"), [p[1:] for p in POLICY_FLIPS],
                         ids=[p[0] for p in POLICY_FLIPS])
def test_a_policy_flips_the_turkish_reading_and_the_old_one_becomes_the_alternative(question, base, setting):
    key, new, old = setting
    before_ = one(question, **base)
    after_ = one(question, **base, **{key: new})
    offered = [a for a in before_.alternatives if a.policy == f"{key}={new}"]
    assert len(offered) == 1
    assert (after_.start, after_.end, after_.reading) == (offered[0].start, offered[0].end, offered[0].reading)
    assert (after_.start, after_.end) != (before_.start, before_.end)
    back = [a for a in after_.alternatives if a.policy == f"{key}={old}"]
    assert [(a.start, a.end, a.reading) for a in back] == [(before_.start, before_.end, before_.reading)]


# --- Turkish and English in one question -------------------------------------------------------

MIXED = [
    ("R2-tr-en-ticketlar-gecen-hafta", "Geçen hafta açılan tickets hangileri?", "Geçen hafta", "tr",
     tr_week(TODAY + D(weeks=-1))),
    ("R2-tr-en-bugs-bu-ay", "Bu ay kapanan bugs", "Bu ay", "tr", month_of(TODAY)),
    ("R1-tr-en-issues-yesterday", "Hangi issues yesterday kapatıldı?", "yesterday", "en", day(_YESTERDAY)),
    ("R7-tr-en-PR-since-March", "Tüm PR'lar since March", "since March", "en", since(_MARCH_PAST)),
    ("R7-tr-en-merge-requests-Marttan-beri", "Mart'tan beri açılan merge requests", "Mart'tan beri", "tr",
     since(_MARCH_PAST)),
    ("R23-tr-en-deploylar-last-weekend", "Hangi deploylar last weekend yapıldı?", "last weekend", "en",
     weekend(last_ended_weekend(TODAY, "en"))),
    ("R3-tr-en-issues-3-gun-once", "3 gün önce açılan issues", "3 gün önce", "tr", day(TODAY + D(days=-3))),
    ("R5-tr-en-bugs-in-the-last-7-days", "Hangi bugs in the last 7 days açıldı?", "in the last 7 days",
     "en", (wall(NOW, days=-7), iso(NOW))),
    ("R5-tr-en-story-points-son-2-hafta", "Son 2 hafta içinde kapanan story points",
     "Son 2 hafta içinde", "tr", (wall(NOW, weeks=-2), iso(NOW))),
    ("R11-tr-en-releases-1-Mart-ile-15-Mart-arasinda", "1 Mart ile 15 Mart arasındaki releases",
     "1 Mart ile 15 Mart arasındaki", "tr", joined(day(date(2026, 3, 1)), day(date(2026, 3, 15)))),
    ("R10-tr-en-tasks-cumaya-kadar", "Cumaya kadar bitmesi gereken tasks", "Cumaya kadar", "tr",
     until(_FRIDAY_NEXT)),
]


@pytest.mark.parametrize(("question", "phrase", "lang", "bounds"), [m[1:] for m in MIXED],
                         ids=[m[0] for m in MIXED])
def test_a_question_mixing_turkish_and_english_finds_the_phrase_in_either(question, phrase, lang, bounds):
    m = one(question, languages=("tr", "en"))
    assert (m.text, m.lang, (m.start, m.end)) == (phrase, lang, bounds)
    assert question[m.char_start : m.char_end] == phrase


def test_a_turkish_and_an_english_phrase_in_one_question_are_both_found() -> None:
    result = run("Geçen hafta açılan bugs ve since Monday kapananlar", languages=("tr", "en"))
    assert [(m.text, m.lang) for m in result.mentions] == [("Geçen hafta", "tr"), ("since Monday", "en")]


# --- look-alikes (reading N) -------------------------------------------------------------------

TRAPS = [
    ("N-tr-Aya-inis-moon", "Ay'a iniş görevini kim aldı?"),
    ("N-tr-ay-isigi-moon", "Ay ışığı teması hazır mı?"),
    ("N-tr-ayin-calisani", "Ayın çalışanı kim?"),
    ("N-tr-aylik-rapor", "Aylık rapor taslağı"),
    ("N-tr-haftalik-toplanti", "Haftalık toplantı notları"),
    ("N-tr-hafta-ici", "Hafta içi nöbet listesi"),
    ("N-tr-hafta-sonu-kampanyasi", "Hafta sonu kampanyası sayfası"),
    ("N-tr-Kalite-Haftasi-event-name", "Kalite Haftası etkinliği"),
    ("N-tr-Hafta-Sonu-Projesi-team-name", "Hafta Sonu Projesi ekibi"),
    ("N-tr-Ay-Yildiz-team-name", "Ay Yıldız takımı"),
    ("N-tr-son-gun-deadline", "Son gün ne zaman?"),
    ("N-tr-son-surum", "Son sürüm notları"),
    ("N-tr-ikinci-derleme", "İkinci derleme başarısız oldu"),
    ("N-tr-ilk-yari-match", "Maçın ilk yarısı"),
    ("N-tr-oncelik-2", "Öncelik 2 olan işler"),
    ("N-tr-surum-2025.1", "Sürüm 2025.1 hataları"),
    ("N-tr-bilet-2025", "Bilet 2025 kimde?"),
    ("N-tr-ilk-10", "İlk 10 atanan kişi"),
    ("N-tr-5-puanlik", "5 puanlık görevler"),
    ("N-tr-Kasima-sor-name", "Kasım'a sor"),
    ("N-tr-Kasimin-gorevleri-name", "Kasım'ın görevleri"),
    ("N-tr-Nisanin-hatalari-name", "Nisan'ın açtığı hatalar"),
    ("N-tr-ocak-stove", "Ocak bakımı yapıldı mı?"),
    ("N-tr-aralik-secimi-range", "Aralık seçimi bozuk"),
    ("N-tr-tarih-araligi", "Tarih aralığı filtresi çalışmıyor"),
    ("N-tr-hangi-aralikta", "Değer hangi aralıkta?"),
    ("N-tr-pazar-payi-market", "Pazar payı raporu"),
    ("N-tr-pazara-cikis", "Pazara çıkış planı"),
    ("N-tr-dunya-haritasi", "Dünya haritası bileşeni"),
    ("N-tr-bugunlerde", "Bugünlerde çok hata var"),
    ("N-tr-yarinlar", "Yarınlar için yol haritası"),
    ("N-tr-gunden-gune", "Hatalar günden güne artıyor"),
    ("N-tr-gunluk-rapor", "Günlük rapor kimde?"),
    ("N-tr-yillik-izin", "Yıllık izin talepleri"),
    ("N-tr-saatlik-ucret", "Saatlik ücret hesaplama"),
    ("N-tr-3-saat-suren-no-cue", "3 saat süren toplantı"),
    ("N-tr-ceyrek-final", "Çeyrek final biletleri"),
    ("N-tr-bir-sonraki-adim", "Bir sonraki adım ne?"),
    ("N-tr-gecen-sefer", "Geçen sefer ne oldu?"),
    ("N-tr-bu-is", "Bu iş kimde?"),
    ("N-tr-on-kisi", "On kişi atandı"),
    ("N-tr-sprint-48", "Sprint 48 hataları"),
    ("N-tr-hata-404", "Hata 404 sayfası"),
    ("N-tr-pazartesileri-recurring", "Pazartesileri toplantı var"),
    ("N-tr-her-pazartesi-recurring", "Her pazartesi toplantı var"),
    ("N-tr-her-cuma-gunu-recurring", "Her cuma günü deploy yapılıyor"),
    ("N-tr-her-hafta-sonu-recurring", "Her hafta sonu nöbet kimde?"),
    ("N-tr-her-3-ayda-bir-recurring", "Her 3 ayda bir rapor"),
    ("N-tr-aksamlari-recurring", "Akşamları kim nöbette?"),
    ("N-tr-sal-raft", "Sal projesi durumu"),
    ("N-tr-may-yeast", "May ayarı tamam mı?"),
    ("N-tr-29-Subat-2027-no-such-day", "29 Şubat 2027 tarihli kayıt"),
    ("N-tr-bare-2025-no-cue", "2025 görev tamamlandı"),
    ("N-tr-dakik", "Dakik ekip ödülü"),
]


@pytest.mark.parametrize(("question",), [(q,) for _, q in TRAPS], ids=[i for i, _ in TRAPS])
def test_a_turkish_look_alike_gives_no_temporal_mention(question):
    result = run(question, languages=("tr", "en"))
    assert result.mentions == ()
    assert result.rewritten == question


def test_there_are_at_least_twenty_five_turkish_traps():
    assert len(TRAPS) >= 25
    assert len({q for _, q in TRAPS}) == len(TRAPS)


PAIRS = [
    ("N-tr-Ay-moon-vs-bu-ay", "Ay'a iniş görevi", "Bu ay açılan hatalar", "Bu ay"),
    ("N-tr-Kasima-sor-vs-Kasimda", "Kasım'a sor", "Kasım'da açılan hatalar", "Kasım'da"),
    ("N-tr-aralik-range-vs-Araliga-kadar", "Tarih aralığı filtresi", "Aralık'a kadar kapananlar",
     "Aralık'a kadar"),
    ("N-tr-son-gun-vs-son-3-gun", "Son gün ne zaman?", "Son 3 gün açılanlar", "Son 3 gün"),
    ("N-tr-ikinci-derleme-vs-ikinci-ceyrek", "İkinci derleme başarısız", "İkinci çeyrekte kapananlar",
     "İkinci çeyrekte"),
    ("N-tr-oncelik-2-vs-2-gun-once", "Öncelik 2 olan işler", "2 gün önce açılan işler", "2 gün önce"),
    ("N-tr-bilet-2025-vs-2025-yilinda", "Bilet 2025 kimde?", "2025 yılında açılan biletler", "2025 yılında"),
    ("N-tr-dunya-vs-dunden-beri", "Dünya haritası", "Dünden beri açık hatalar", "Dünden beri"),
    ("N-tr-pazar-payi-vs-pazar-gunu", "Pazar payı raporu", "Pazar günü düşen servis", "Pazar günü"),
]


@pytest.mark.parametrize(("trap", "temporal", "phrase"), [p[1:] for p in PAIRS], ids=[p[0] for p in PAIRS])
def test_the_same_turkish_word_is_a_time_word_only_where_the_question_makes_it_one(trap, temporal, phrase):
    assert run(trap).mentions == ()
    assert one(temporal).text == phrase


MIXED_TRAPS = [
    ("N-tr-aylik-beside-gecen-ay", "Geçen ay aylık rapor gecikti", "Geçen ay"),
    ("N-tr-oncelik-beside-dun", "Öncelik 2 olan işler dün kapandı", "dün"),
    ("N-tr-ikinci-beside-pazartesiden-beri", "İkinci derleme pazartesiden beri kırık", "pazartesiden beri"),
    ("N-tr-ilk-10-beside-bu-hafta", "Bu hafta ilk 10 atanan", "Bu hafta"),
    ("N-tr-surum-beside-ISO-date", "Sürüm 2025.1 hataları 2025-03-14 tarihinden beri açık",
     "2025-03-14 tarihinden beri"),
    ("N-tr-Kasim-name-beside-Marttan-beri", "Kasım'ın Mart'tan beri açık hataları", "Mart'tan beri"),
]


@pytest.mark.parametrize(("question", "phrase"), [m[1:] for m in MIXED_TRAPS], ids=[m[0] for m in MIXED_TRAPS])
def test_a_turkish_look_alike_beside_a_time_phrase_stays_out_of_the_mention(question, phrase):
    m = one(question)
    assert m.text == phrase
    assert question[m.char_start : m.char_end] == phrase
