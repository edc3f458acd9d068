"""Korean: worked examples for every reading R1-R23 and D, the policies, year-first numeric dates
of ``ko``, questions mixing Korean and English, and look-alike words (reading N).

Checked against:
- python-dateutil ``relativedelta``: weekday steps, day, week, month and year arithmetic with
  month-end clamping; stdlib ``calendar.monthrange``/``calendar.isleap``;
- ISO 8601 week dates via stdlib ``date.fromisocalendar``;
- CLDR 49 via babel 2.19: Korean day-period rules (``Locale("ko").day_period_rules``: 아침
  03:00-06:00, 오전 06:00-12:00, 오후 12:00-18:00, 저녁 18:00-21:00, 밤 21:00-03:00), the week
  data of ``ko`` (Monday first) and ``ko_KR`` (Sunday first), the weekend
  (``weekend_start``/``weekend_end``) and the order of numeric dates
  (``babel.dates.get_date_format("short", locale="ko")``: "yy. M. d.", year first);
- the IANA tz database via stdlib zoneinfo + tzdata (Berlin daylight-saving changes; Seoul keeps
  UTC+09:00 all year);
- the questions and phrases are written from knowledge of the language (no published source);
- common practice (no published source): "지난 월요일" / "다음 목요일" mean that day of last /
  next week, paired with CLDR's "이번 월요일" for the Monday of this week (locales/ko.toml
  ``weekday_reading = "week"``), while "오는 금요일" / "돌아오는 금요일" is the coming Friday;
  "X부터" takes X in (R7), "X 이후" starts after X (R8), "X 이전"
  ends before X (R9), "X까지" takes X in (R10); "X부터 Y까지" and "X과 Y 사이" take both ends in;
  "3일 이내" / "3일 안에" is the next 3 days; "지난 3일" needs "동안" or "간" to be a window
  (alone it is also "the 3rd"); "3월 3주차" (a week of a month) is left alone.
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

SEOUL = ZoneInfo("Asia/Seoul")
D = relativedelta
WEEKDAYS = (MO, TU, WE, TH, FR, SA, SU)
LANGS = ("ko",)

# --- clocks (fixed; NOW is Wednesday 2026-12-02 10:00 in Berlin) ------------------------------
SATURDAY = datetime(2026, 12, 5, 10, 0, tzinfo=BERLIN)
SUNDAY = datetime(2026, 12, 6, 10, 0, tzinfo=BERLIN)
MONTH_END = datetime(2026, 3, 31, 10, 0, tzinfo=BERLIN)
LEAP_DAY = datetime(2028, 2, 29, 10, 0, tzinfo=BERLIN)
#: Berlin clocks went 02:00 -> 03:00 on 2026-03-29 (tzdata).
SPRING_BERLIN = datetime(2026, 3, 29, 12, 0, tzinfo=BERLIN)
QUARTER_PAST = datetime(2026, 12, 2, 10, 17, tzinfo=BERLIN)
#: Wednesday 2 December 2026, 10:00 in Seoul; Sunday 1 March 2026, 10:00 in Seoul.
SEOUL_NOW = datetime(2026, 12, 2, 10, 0, tzinfo=SEOUL)
SEOUL_MARCH_FIRST = datetime(2026, 3, 1, 10, 0, tzinfo=SEOUL)

_KO = Locale.parse("ko")
_KO_RULES = _KO.day_period_rules[None]
_KO_FIRST = WEEKDAYS[_KO.first_week_day]
_KR_FIRST = WEEKDAYS[Locale.parse("ko_KR").first_week_day]
_CAL = "window_reading=calendar"
_ROLL = "window_reading=rolling"
_FUT = "bias=future"
_PAST = "bias=past"
_WEEK = "weekday_reading=week"
_NEAREST = "weekday_reading=nearest"


# --- oracles for Korean -----------------------------------------------------------------------


def period(d: date, pid: str, tz: ZoneInfo = BERLIN) -> tuple[str, str]:
    """CLDR 49 Korean day period ``pid`` of local date ``d``, from babel's
    ``Locale("ko").day_period_rules``; a rule whose end is not after its start (밤,
    21:00-03:00) ends on the next day."""
    rule = _KO_RULES[pid][0]
    start = midnight(d, tz) + D(seconds=rule["from"])
    end_day = d if rule["before"] > rule["from"] else d + D(days=1)
    return iso(start), iso(midnight(end_day, tz) + D(seconds=rule["before"]))  # type: ignore[return-value]


def ko_week(d: date, first: Any = _KO_FIRST) -> tuple[str, str]:
    """The week holding ``d``, starting on the CLDR first day of the week of ``ko``."""
    return week(d, first)


def weekend(first: date) -> tuple[str, str]:
    return span(first, first + D(days=weekend_days("ko")[1]))


def weekend_value(first: date) -> str:
    return f"{first.isoformat()}/P{weekend_days('ko')[1]}D"


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
    fields = {"languages": LANGS, "locale": "ko", **context}
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
    assert m.lang == "ko" or m.lang == "und"
    assert m.reading == reading
    assert (m.start, m.end) == bounds
    if value is not None:
        assert m.value == value
    assert tuple((a.reading, a.policy, a.start, a.end) for a in m.alternatives) == alts


PARAMS = ("question", "phrase", "reading", "bounds", "value", "alts", "context")
_YESTERDAY = TODAY + D(days=-1)
_THIS_MONTH = TODAY.replace(day=1)
_THIS_WEEK = week_start(TODAY, _KO_FIRST)

R1 = [
    case("R1-ko-eoje", "어제 닫힌 이슈는?", "어제", "R1", day(_YESTERDAY), _YESTERDAY.isoformat()),
    case("R1-ko-oneul", "오늘 머지된 PR 보여줘", "오늘", "R1", day(TODAY), TODAY.isoformat()),
    case("R1-ko-naeil", "내일 마감인 작업", "내일", "R1", day(TODAY + D(days=1))),
    case("R1-ko-geujeokke-CLDR", "그저께 재오픈된 티켓", "그저께", "R1", day(TODAY + D(days=-2))),
    case("R1-ko-geuje", "그제 재오픈된 티켓", "그제", "R1", day(TODAY + D(days=-2))),
    case("R1-ko-more", "모레 출시될 기능", "모레", "R1", day(TODAY + D(days=2))),
    case("R1-ko-geulpi-three-days-on", "글피 예정된 작업", "글피", "R1", day(TODAY + D(days=3))),
    case("R1-ko-geumil-business", "금일 배포된 변경 사항", "금일", "R1", day(TODAY)),
    case("R1-ko-eojeneun-particle", "어제는 무슨 버그가 있었나?", "어제는", "R1", day(_YESTERDAY)),
    case("R1-ko-eoje-Seoul-across-a-month-start", "어제 누가 댓글을 달았나?", "어제", "R1",
         day(SEOUL_MARCH_FIRST.date() + D(days=-1), SEOUL), "2026-02-28", now=SEOUL_MARCH_FIRST),
]

R2 = [
    case("R2-ko-jinanjue-particle", "지난주에 생성된 버그", "지난주에", "R2", ko_week(TODAY + D(weeks=-1)),
         iso_week_name(TODAY + D(weeks=-1))),
    case("R2-ko-ibeon-ju", "이번 주 배포 목록", "이번 주", "R2", ko_week(TODAY)),
    case("R2-ko-daeum-dal", "다음 달 예정 작업", "다음 달", "R2", month_of(TODAY + D(months=1)), "2027-01"),
    case("R2-ko-jinan-bungi", "지난 분기 매출", "지난 분기", "R2", quarter_of(TODAY + D(months=-3)), "2026-Q3"),
    case("R2-ko-jangnyeone", "작년에 닫힌 이슈", "작년에", "R2", year(2025), "2025"),
    case("R2-ko-geumju-this-week", "금주 배포 일정", "금주", "R2", ko_week(TODAY)),
    case("R2-ko-chaju-next-week", "차주 작업 계획", "차주", "R2", ko_week(TODAY + D(weeks=1))),
    case("R2-ko-ikwol-next-month", "익월 청구 내역", "익월", "R2", month_of(TODAY + D(months=1))),
    case("R2-ko-jeonwol-last-month", "전월 대비 지표", "전월", "R2", month_of(TODAY + D(months=-1))),
    case("R2-ko-jaejangnyeon-two-years-back", "재작년 장애 목록", "재작년", "R2", year(2024)),
    case("R2-ko-ibeon-ju-dongan", "이번 주 동안 생성된 이슈", "이번 주 동안", "R2", ko_week(TODAY)),
    case("R2-ko-jeobeonju-glued", "저번주에 닫힌 티켓", "저번주에", "R2", ko_week(TODAY + D(weeks=-1))),
    case("R2-ko-ibeon-ju-ko_KR-weeks-start-on-Sunday", "이번 주 배포 목록", "이번 주", "R2",
         ko_week(TODAY, _KR_FIRST), locale="ko_KR"),
]

R3 = [
    case("R3-ko-3il-jeon", "3일 전 생성된 버그", "3일 전", "R3", day(TODAY + D(days=-3))),
    case("R3-ko-du-dal-jeone-native-number", "두 달 전에 머지된 PR", "두 달 전에", "R3",
         month_of(TODAY + D(months=-2)), "2026-10"),
    case("R3-ko-iljuil-jeon", "일주일 전 보고된 이슈", "일주일 전", "R3", ko_week(TODAY + D(weeks=-1))),
    case("R3-ko-iteul-jeon", "이틀 전 닫힌 티켓", "이틀 전", "R3", day(TODAY + D(days=-2))),
    case("R3-ko-30bun-jeon", "30분 전 실패한 빌드", "30분 전", "R3", minute_of(moved(NOW, minutes=-30))),
    case("R3-ko-se-sigan-jeon", "세 시간 전 생성된 이슈", "세 시간 전", "R3", hour_of(moved(NOW, hours=-3))),
    case("R3-ko-han-dal-jeon-at-a-month-end", "한 달 전 머지된 변경", "한 달 전", "R3",
         month_of(MONTH_END.date() + D(months=-1)), "2026-02", now=MONTH_END),
    case("R3-ko-handal-jeon-glued", "한달 전에 닫힌 이슈", "한달 전에", "R3", month_of(TODAY + D(months=-1))),
]

R4 = [
    case("R4-ko-2ju-hu", "2주 후 마감인 작업", "2주 후", "R4", ko_week(TODAY + D(weeks=2)),
         iso_week_name(TODAY + D(weeks=2))),
    case("R4-ko-3il-dwi", "3일 뒤 배포될 기능", "3일 뒤", "R4", day(TODAY + D(days=3))),
    case("R4-ko-han-dal-hu", "한 달 후 갱신될 라이선스", "한 달 후", "R4", month_of(TODAY + D(months=1))),
    case("R4-ko-du-sigan-dwie", "두 시간 뒤에 시작할 작업", "두 시간 뒤에", "R4", hour_of(moved(NOW, hours=2))),
    case("R4-ko-iteul-hu", "이틀 후 출시", "이틀 후", "R4", day(TODAY + D(days=2))),
]

R5 = [
    case("R5-ko-jinan-7il-dongan", "지난 7일 동안 생성된 버그", "지난 7일 동안", "R5", (wall(NOW, days=-7), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, TODAY, 7, "days")),)),
    case("R5-ko-choegeun-3ilgan", "최근 3일간 닫힌 티켓", "최근 3일간", "R5", (wall(NOW, days=-3), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, TODAY, 3, "days")),)),
    case("R5-ko-choegeun-iljuil", "최근 일주일 생성된 이슈", "최근 일주일", "R5", (wall(NOW, weeks=-1), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, _THIS_WEEK, 1, "weeks")),)),
    case("R5-ko-jinan-han-dal-dongan", "지난 한 달 동안 머지된 PR", "지난 한 달 동안", "R5",
         (wall(NOW, months=-1), iso(NOW)), alts=(alt("R5", _CAL, _cal_back(NOW, _THIS_MONTH, 1, "months")),)),
    case("R5-ko-jinan-3gaewolgan", "지난 3개월간 생성된 이슈", "지난 3개월간", "R5", (wall(NOW, months=-3), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, _THIS_MONTH, 3, "months")),)),
    case("R5-ko-jinan-24sigan-is-24-real-hours-Berlin-spring", "지난 24시간 동안 발생한 오류",
         "지난 24시간 동안", "R5", (elapsed(SPRING_BERLIN, hours=-24), iso(SPRING_BERLIN)), now=SPRING_BERLIN),
    case("R5-ko-choegeun-2sigan-off-the-hour", "최근 2시간 동안 배포", "최근 2시간 동안", "R5",
         (elapsed(QUARTER_PAST, hours=-2), iso(QUARTER_PAST)),
         alts=(alt("R5", _CAL, (elapsed(floor_hour(QUARTER_PAST), hours=-2), iso(floor_hour(QUARTER_PAST)))),),
         now=QUARTER_PAST),
    case("R5-ko-choegeun-30bun", "최근 30분 동안 실패한 빌드", "최근 30분 동안", "R5",
         (elapsed(NOW, minutes=-30), iso(NOW))),
    case("R5-ko-jinan-2nyeongan-from-a-leap-day", "지난 2년간 발생한 장애", "지난 2년간", "R5",
         (wall(LEAP_DAY, years=-2), iso(LEAP_DAY)),
         alts=(alt("R5", _CAL, _cal_back(LEAP_DAY, date(2028, 1, 1), 2, "years")),), now=LEAP_DAY),
    case("R5-ko-calendar-policy-reads-whole-days", "지난 7일 동안 생성된 버그", "지난 7일 동안", "R5",
         _cal_back(NOW, TODAY, 7, "days"), alts=(alt("R5", _ROLL, (wall(NOW, days=-7), iso(NOW))),),
         window_reading="calendar"),
]

R6 = [
    case("R6-ko-hyanghu-3il-dongan", "향후 3일 동안 마감인 작업", "향후 3일 동안", "R6", (iso(NOW), wall(NOW, days=3)),
         alts=(alt("R6", _CAL, _cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-ko-apeuro-2ju-dongan", "앞으로 2주 동안 예정된 일", "앞으로 2주 동안", "R6", (iso(NOW), wall(NOW, weeks=2)),
         alts=(alt("R6", _CAL, _cal_ahead(NOW, _THIS_WEEK, 2, "weeks")),)),
    case("R6-ko-3il-inaee", "3일 이내에 처리할 버그", "3일 이내에", "R6", (iso(NOW), wall(NOW, days=3)),
         alts=(alt("R6", _CAL, _cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-ko-du-sigan-ane", "두 시간 안에 끝낼 작업", "두 시간 안에", "R6", (iso(NOW), elapsed(NOW, hours=2)),
         alts=(alt("R6", _CAL, (elapsed(floor_hour(NOW), hours=1), elapsed(floor_hour(NOW), hours=3))),)),
    case("R6-ko-hyanghu-2gaewol", "향후 2개월 갱신 예정", "향후 2개월", "R6", (iso(NOW), wall(NOW, months=2)),
         alts=(alt("R6", _CAL, _cal_ahead(NOW, _THIS_MONTH, 2, "months")),)),
]

_MARCH_PAST = month(_past(lambda y: date(y, 3, 1)), 3)
_MARCH_NEXT = month(_future(lambda y: date(y, 4, 1)), 3)
_MONDAY_PAST = day(on_or_before(TODAY, MO))
_MONDAY_NEXT = day(on_or_after(TODAY, MO))
_FRIDAY_PAST = day(on_or_before(TODAY, FR))
_FRIDAY_NEXT = day(on_or_after(TODAY, FR))

R7 = [
    case("R7-ko-jinanjubuteo", "지난주부터 열린 이슈", "지난주부터", "R7", since(ko_week(TODAY + D(weeks=-1))),
         f"{(_THIS_WEEK + D(weeks=-1)).isoformat()}/.."),
    case("R7-ko-3wolbuteo", "3월부터 닫힌 티켓", "3월부터", "R7", since(_MARCH_PAST),
         alts=(alt("R7", _FUT, since(_MARCH_NEXT)),)),
    case("R7-ko-2025nyeonbuteo", "2025년부터 생성된 이슈", "2025년부터", "R7", since(year(2025)), "2025-01-01/.."),
    case("R7-ko-eojebuteo", "어제부터 실패하는 빌드", "어제부터", "R7", since(day(_YESTERDAY))),
    case("R7-ko-woryoilbuteo", "월요일부터 열린 이슈", "월요일부터", "R7", since(_MONDAY_PAST),
         alts=(alt("R7", _FUT, since(_MONDAY_NEXT)),)),
    case("R7-ko-jangnyeon-irae", "작년 이래 쌓인 버그", "작년 이래", "R7", since(year(2025))),
    case("R7-ko-3wol-1ilbuteo", "3월 1일부터 생성된 티켓", "3월 1일부터", "R7",
         since(day(date(_past(lambda y: date(y, 3, 1)), 3, 1))),
         alts=(alt("R7", _FUT, since(day(date(_future(lambda y: date(y, 3, 2)), 3, 1)))),)),
]

R8 = [
    case("R8-ko-3wol-ihu", "3월 이후 생성된 이슈", "3월 이후", "R8", after(_MARCH_PAST),
         alts=(alt("R8", _FUT, after(_MARCH_NEXT)),)),
    case("R8-ko-naeil-ihu", "내일 이후 배포될 기능", "내일 이후", "R8", after(day(TODAY + D(days=1)))),
    case("R8-ko-jinanju-ihue", "지난주 이후에 재오픈된 티켓", "지난주 이후에", "R8",
         after(ko_week(TODAY + D(weeks=-1)))),
    case("R8-ko-2025nyeon-ihu", "2025년 이후 생성된 이슈", "2025년 이후", "R8", after(year(2025))),
]

R9 = [
    case("R9-ko-2025nyeon-ijeone", "2025년 이전에 닫힌 티켓", "2025년 이전에", "R9", before(year(2025)),
         "../2024-12-31"),
    case("R9-ko-3wol-ijeon", "3월 이전 생성된 이슈", "3월 이전", "R9", before(_MARCH_PAST),
         alts=(alt("R9", _FUT, before(_MARCH_NEXT)),)),
    case("R9-ko-oneul-ijeon", "오늘 이전 생성된 이슈", "오늘 이전", "R9", before(day(TODAY))),
    case("R9-ko-jinanju-jeone", "지난주 전에 닫힌 작업", "지난주 전에", "R9", before(ko_week(TODAY + D(weeks=-1)))),
]

R10 = [
    case("R10-ko-geumyoilkkaji-deadline-looks-ahead", "금요일까지 끝내야 할 작업", "금요일까지", "R10",
         until(_FRIDAY_NEXT), alts=(alt("R10", None, until(_FRIDAY_PAST)),)),
    case("R10-ko-3wolkkaji", "3월까지 닫힌 이슈", "3월까지", "R10", until(_MARCH_PAST),
         alts=(alt("R10", _FUT, until(_MARCH_NEXT)),)),
    case("R10-ko-ibeon-jukkaji", "이번 주까지 끝낼 작업", "이번 주까지", "R10", until(ko_week(TODAY))),
    case("R10-ko-oneulkkaji", "오늘까지 생성된 이슈", "오늘까지", "R10", until(day(TODAY))),
    case("R10-ko-daeumjukkaji-glued", "다음주까지 처리할 버그", "다음주까지", "R10",
         until(ko_week(TODAY + D(weeks=1)))),
    case("R10-ko-2026nyeonkkaji", "2026년까지 남은 이슈", "2026년까지", "R10", until(year(2026))),
]

R11 = [
    case("R11-ko-3wolbuteo-5wolkkaji", "3월부터 5월까지 닫힌 이슈", "3월부터 5월까지", "R11",
         joined(_MARCH_PAST, month(2026, 5)), "2026-03-01/2026-05-31",
         alts=(alt("R11", _FUT, joined(_MARCH_NEXT, month(2027, 5))),)),
    case("R11-ko-3wol-tilde-5wol", "3월~5월 릴리스", "3월~5월", "R11", joined(_MARCH_PAST, month(2026, 5)),
         alts=(alt("R11", _FUT, joined(_MARCH_NEXT, month(2027, 5))),)),
    case("R11-ko-3wolgwa-5wol-sai", "3월과 5월 사이에 생성된 버그", "3월과 5월 사이에", "R11",
         joined(_MARCH_PAST, month(2026, 5)), alts=(alt("R11", _FUT, joined(_MARCH_NEXT, month(2027, 5))),)),
    case("R11-ko-11wolbuteo-2wolkkaji-crosses-the-year", "11월부터 2월까지 당직", "11월부터 2월까지", "R11",
         joined(month(2026, 11), month(2027, 2)), "2026-11-01/2027-02-28",
         alts=(alt("R11", _FUT, joined(month(2027, 11), month(2028, 2))),)),
    case("R11-ko-2024nyeongwa-2025nyeon-sai", "2024년과 2025년 사이에 닫힌 이슈", "2024년과 2025년 사이에",
         "R11", joined(year(2024), year(2025))),
    case("R11-ko-jinanjubuteo-ibeon-jukkaji", "지난주부터 이번 주까지 생성된 버그", "지난주부터 이번 주까지",
         "R11", joined(ko_week(TODAY + D(weeks=-1)), ko_week(TODAY))),
    case("R11-ko-woryoilbuteo-geumyoilkkaji", "월요일부터 금요일까지 열린 이슈", "월요일부터 금요일까지", "R11",
         joined(_MONDAY_PAST, day(on_or_after(on_or_before(TODAY, MO), FR))),
         alts=(alt("R11", _FUT, joined(_MONDAY_NEXT, day(on_or_after(on_or_after(TODAY, MO), FR)))),)),
    case("R11-ko-ISO-buteo-ISO-kkaji", "2025-01-01부터 2025-03-31까지 비용", "2025-01-01부터 2025-03-31까지",
         "R11", joined(day(date(2025, 1, 1)), day(date(2025, 3, 31))), "2025-01-01/2025-03-31"),
    case("R11-ko-year-on-the-start-only", "2025년 1월 1일부터 3월 31일까지 비용",
         "2025년 1월 1일부터 3월 31일까지", "R11", joined(day(date(2025, 1, 1)), day(date(2025, 3, 31)))),
]

_MAR14 = (_past(lambda y: date(y, 3, 14)), _future(lambda y: date(y, 3, 15)))
_DEC3 = (_past(lambda y: date(y, 12, 3)), _future(lambda y: date(y, 12, 4)))

R12 = [
    case("R12-ko-3wore", "3월에 생성된 이슈", "3월에", "R12", _MARCH_PAST, "2026-03",
         alts=(alt("R12", _FUT, _MARCH_NEXT),)),
    case("R12-ko-12wol-current-month-counts", "12월 배포 목록", "12월", "R12", month(2026, 12), "2026-12"),
    case("R12-ko-3wol-14ire", "3월 14일에 배포된 버전", "3월 14일에", "R12", day(date(_MAR14[0], 3, 14)),
         alts=(alt("R12", _FUT, day(date(_MAR14[1], 3, 14))),)),
    case("R12-ko-12wol-3il-tomorrow-is-last-years", "12월 3일 배포", "12월 3일", "R12",
         day(date(_DEC3[0], 12, 3)), "2025-12-03", alts=(alt("R12", _FUT, day(date(_DEC3[1], 12, 3))),)),
    case("R12-ko-3bungi", "3분기 매출", "3분기", "R12", quarter(_past(lambda y: date(y, 7, 1)), 3), "2026-Q3",
         alts=(alt("R12", _FUT, quarter(_future(lambda y: date(y, 10, 1)), 3)),)),
    case("R12-ko-1bungie", "1분기에 닫힌 티켓", "1분기에", "R12", quarter(_past(lambda y: date(y, 1, 1)), 1),
         alts=(alt("R12", _FUT, quarter(_future(lambda y: date(y, 4, 1)), 1)),)),
    case("R12-ko-sangbangi", "상반기 목표", "상반기", "R12", half(_past(lambda y: date(y, 1, 1)), 1), "2026-H1",
         alts=(alt("R12", _FUT, half(_future(lambda y: date(y, 7, 1)), 1)),)),
    case("R12-ko-habangi-current-half", "하반기 목표", "하반기", "R12", half(2026, 2), "2026-H2"),
    case("R12-ko-yuwore-Sino-Korean-word", "유월에 생성된 이슈", "유월에", "R12", month(2026, 6),
         alts=(alt("R12", _FUT, month(2027, 6)),)),
    case("R12-ko-3wol14il-glued", "3월14일 배포", "3월14일", "R12", day(date(_MAR14[0], 3, 14)),
         alts=(alt("R12", _FUT, day(date(_MAR14[1], 3, 14))),)),
]

R13 = [
    case("R13-ko-woryoire", "월요일에 생성된 이슈", "월요일에", "R13", _MONDAY_PAST,
         alts=(alt("R13", _FUT, _MONDAY_NEXT),)),
    case("R13-ko-geumyoil", "금요일 배포한 변경", "금요일", "R13", _FRIDAY_PAST, alts=(alt("R13", _FUT, _FRIDAY_NEXT),)),
    case("R13-ko-suyoil-is-today", "수요일에 열린 버그", "수요일에", "R13", day(TODAY)),
    case("R13-ko-geumyoil-magam-deadline-looks-ahead", "금요일 마감인 작업", "금요일", "R13", _FRIDAY_NEXT,
         alts=(alt("R13", None, _FRIDAY_PAST),)),
    case("R13-ko-toyoillal-spoken", "토요일날 배포한 변경", "토요일날", "R13", day(on_or_before(TODAY, SA)),
         alts=(alt("R13", _FUT, day(on_or_after(TODAY, SA))),)),
    case("R13-ko-hwayoil-future-bias", "화요일에 할 회의", "화요일에", "R13", day(on_or_after(TODAY, TU)),
         alts=(alt("R13", _PAST, day(on_or_before(TODAY, TU))),), bias="future"),
]

R14 = [
    case("R14-ko-jinan-woryoil-nearest", "지난 월요일 무엇이 고장났나?", "지난 월요일", "R14",
         day(strictly_before(TODAY, MO)), alts=(alt("R16", _WEEK, day(in_week(TODAY, MO, -1))),),
         weekday_reading="nearest"),
    case("R14-ko-jinan-hwayoil-is-yesterday-nearest", "지난 화요일 생성된 이슈", "지난 화요일", "R14",
         day(strictly_before(TODAY, TU)), alts=(alt("R16", _WEEK, day(in_week(TODAY, TU, -1))),),
         weekday_reading="nearest"),
    case("R14-ko-jinan-geumyoil-both-readings-agree", "지난 금요일 닫힌 티켓", "지난 금요일", "R14",
         day(strictly_before(TODAY, FR)), weekday_reading="nearest"),
    case("R14-ko-jeobeon-suyoil-said-on-a-Wednesday", "저번 수요일 배포", "저번 수요일", "R14",
         day(strictly_before(TODAY, WE)), weekday_reading="nearest"),
    case("R14-ko-jinan-iryoil-said-on-a-Sunday", "지난 일요일 장애", "지난 일요일", "R14",
         day(strictly_before(SUNDAY.date(), SU)), now=SUNDAY, weekday_reading="nearest"),
]

R15 = [
    case("R15-ko-daeum-mogyoil-is-tomorrow-nearest", "다음 목요일 예정된 작업", "다음 목요일", "R15",
         day(strictly_after(TODAY, TH)), alts=(alt("R16", _WEEK, day(in_week(TODAY, TH, 1))),),
         weekday_reading="nearest"),
    case("R15-ko-daeum-geumyoil-nearest", "다음 금요일 데모", "다음 금요일", "R15", day(strictly_after(TODAY, FR)),
         alts=(alt("R16", _WEEK, day(in_week(TODAY, FR, 1))),), weekday_reading="nearest"),
    case("R15-ko-daeum-woryoil-both-readings-agree", "다음 월요일 시작할 작업", "다음 월요일", "R15",
         day(strictly_after(TODAY, MO)), weekday_reading="nearest"),
    case("R15-ko-doraoneun-suyoil-said-on-a-Wednesday", "돌아오는 수요일 회의", "돌아오는 수요일", "R15",
         day(strictly_after(TODAY, WE)), weekday_reading="nearest"),
    case("R15-ko-oneun-geumyoil-is-the-coming-one-by-default", "오는 금요일 데모", "오는 금요일", "R15",
         day(strictly_after(TODAY, FR)), alts=(alt("R16", None, day(in_week(TODAY, FR, 1))),)),
    case("R15-ko-daeum-iryoil-said-on-a-Sunday", "다음 일요일 점검", "다음 일요일", "R15",
         day(strictly_after(SUNDAY.date(), SU)), now=SUNDAY, weekday_reading="nearest"),
]

R16 = [
    case("R16-ko-jinan-woryoil-default-is-last-weeks", "지난 월요일 무엇이 고장났나?", "지난 월요일", "R16",
         day(in_week(TODAY, MO, -1)), in_week(TODAY, MO, -1).isoformat(),
         alts=(alt("R14", _NEAREST, day(strictly_before(TODAY, MO))),)),
    case("R16-ko-daeum-mogyoil-default-is-next-weeks", "다음 목요일 예정된 작업", "다음 목요일", "R16",
         day(in_week(TODAY, TH, 1)), alts=(alt("R15", _NEAREST, day(strictly_after(TODAY, TH))),)),
    case("R16-ko-jinanju-woryoil", "지난주 월요일 생성된 이슈", "지난주 월요일", "R16", day(in_week(TODAY, MO, -1))),
    case("R16-ko-ibeon-ju-suyoil", "이번 주 수요일 회의", "이번 주 수요일", "R16", day(in_week(TODAY, WE, 0))),
    case("R16-ko-daeum-ju-geumyoil", "다음 주 금요일 데모", "다음 주 금요일", "R16", day(in_week(TODAY, FR, 1))),
    case("R16-ko-chaju-hwayoil", "차주 화요일 회의", "차주 화요일", "R16", day(in_week(TODAY, TU, 1))),
    case("R16-ko-ibeon-woryoil-CLDR", "이번 월요일 생성된 이슈", "이번 월요일", "R16", day(in_week(TODAY, MO, 0)),
         alts=(alt("R15", None, day(strictly_after(TODAY, MO))),)),
    case("R16-ko-jinanju-geumyoil-ko_KR-Sunday-weeks", "지난주 금요일 배포", "지난주 금요일", "R16",
         day(in_week(TODAY, FR, -1, _KR_FIRST)), locale="ko_KR"),
]

R17 = [
    case("R17-ko-2025nyeon", "2025년 생성된 이슈", "2025년", "R17", year(2025), "2025"),
    case("R17-ko-2025nyeone", "2025년에 닫힌 티켓", "2025년에", "R17", year(2025)),
    case("R17-ko-2024nyeondo", "2024년도 결산", "2024년도", "R17", year(2024)),
    case("R17-ko-2025nyeon-jung", "2025년 중 생성된 이슈", "2025년 중", "R17", year(2025)),
]

R18 = [
    case("R18-ko-2026nyeon-3wol-14il", "2026년 3월 14일 배포", "2026년 3월 14일", "R18", day(date(2026, 3, 14)),
         "2026-03-14"),
    case("R18-ko-numeric-dots", "2026.03.14 배포", "2026.03.14", "R18", day(date(2026, 3, 14))),
    case("R18-ko-CLDR-medium-with-spaces", "2026. 3. 14. 배포", "2026. 3. 14.", "R18", day(date(2026, 3, 14))),
    case("R18-ko-numeric-slashes", "2026/3/14 배포", "2026/3/14", "R18", day(date(2026, 3, 14))),
    case("R18-ko-ISO-with-particle", "2026-03-14에 닫힌 이슈", "2026-03-14에", "R18", day(date(2026, 3, 14))),
    case("R18-ko-with-weekday", "2026년 3월 14일 토요일 배포", "2026년 3월 14일 토요일", "R18",
         day(date(2026, 3, 14))),
    case("R18-ko-leap-day", "2028년 2월 29일 점검", "2028년 2월 29일", "R18", day(date(2028, 2, 29))),
    case("R18-ko-day-first-numeric-under-a-year-first-locale", "03.04.2026 배포", "03.04.2026", "R18",
         day(date(2026, 4, 3)), alts=(alt("R18", "date_order=MDY", day(date(2026, 3, 4))),)),
]

R19 = [
    case("R19-ko-2025nyeon-3wol", "2025년 3월 생성된 이슈", "2025년 3월", "R19", month(2025, 3), "2025-03"),
    case("R19-ko-2025nyeon-3bungi", "2025년 3분기 매출", "2025년 3분기", "R19", quarter(2025, 3), "2025-Q3"),
    case("R19-ko-2026nyeon-sangbangi", "2026년 상반기 목표", "2026년 상반기", "R19", half(2026, 1), "2026-H1"),
    case("R19-ko-2026nyeon-habangie", "2026년 하반기에 할 일", "2026년 하반기에", "R19", half(2026, 2)),
    case("R19-ko-Q3-2025", "Q3 2025 매출", "Q3 2025", "R19", quarter(2025, 3)),
    case("R19-ko-2025nyeon-1sabungi", "2025년 1사분기 매출", "2025년 1사분기", "R19", quarter(2025, 1)),
    case("R19-ko-2025nyeon-je4bungi", "2025년 제4분기 매출", "2025년 제4분기", "R19", quarter(2025, 4)),
]

R20 = [
    case("R20-ko-2026nyeon-48juchae", "2026년 48주차에 닫힌 이슈", "2026년 48주차에", "R20", iso_week(2026, 48),
         "2026-W48"),
    case("R20-ko-48jucha-past-bias", "48주차 작업", "48주차", "R20", iso_week(_recent_week(48), 48), "2026-W48",
         alts=(alt("R20", _FUT, iso_week(_next_week(48), 48)),)),
    case("R20-ko-2026nyeon-je48ju", "2026년 제48주 작업", "2026년 제48주", "R20", iso_week(2026, 48)),
    case("R20-ko-50jucha-is-last-year", "50주차 작업", "50주차", "R20", iso_week(_recent_week(50), 50), "2025-W50",
         alts=(alt("R20", _FUT, iso_week(_next_week(50), 50)),)),
    case("R20-ko-ISO-2026-W48", "2026-W48 작업", "2026-W48", "R20", iso_week(2026, 48)),
]

R21 = [
    case("R21-ko-olhae-deureo", "올해 들어 생성된 이슈", "올해 들어", "R21", _to_now(year(2026)),
         f"{year(2026)[0]}/{iso(NOW)}"),
    case("R21-ko-ibeon-dal-deureo", "이번 달 들어 닫힌 티켓", "이번 달 들어", "R21", _to_now(month_of(TODAY))),
    case("R21-ko-yeoncho-buteo-jigeumkkaji", "연초부터 지금까지 매출", "연초부터 지금까지", "R21", _to_now(year(2026))),
    case("R21-ko-YTD", "YTD 매출", "YTD", "R21", _to_now(year(2026))),
    case("R21-ko-ibeon-bungi-deureo", "이번 분기 들어 매출", "이번 분기 들어", "R21", _to_now(quarter_of(TODAY))),
    case("R21-ko-ibeon-ju-deureo", "이번 주 들어 생성된 이슈", "이번 주 들어", "R21", _to_now(ko_week(TODAY))),
]

R22 = [
    case("R22-ko-oneul-achim-CLDR-hours", "오늘 아침 생성된 버그", "오늘 아침", "R22", period(TODAY, "morning1")),
    case("R22-ko-eoje-ohu", "어제 오후 배포", "어제 오후", "R22", period(_YESTERDAY, "afternoon1")),
    case("R22-ko-naeil-ojeon", "내일 오전 배포", "내일 오전", "R22", period(TODAY + D(days=1), "morning2")),
    case("R22-ko-eojetbam-crosses-midnight", "어젯밤 발생한 장애", "어젯밤", "R22", period(_YESTERDAY, "night1")),
    case("R22-ko-oneul-bam", "오늘 밤 점검 있나?", "오늘 밤", "R22", period(TODAY, "night1")),
    case("R22-ko-eoje-jeonyeok", "어제 저녁 장애", "어제 저녁", "R22", period(_YESTERDAY, "evening1")),
    case("R22-ko-oneul-ohue-particle", "오늘 오후에 생성된 이슈", "오늘 오후에", "R22", period(TODAY, "afternoon1")),
    case("R22-ko-oneulbam-glued", "오늘밤 점검", "오늘밤", "R22", period(TODAY, "night1")),
    case("R22-ko-oneul-achim-Seoul", "오늘 아침 생성된 버그", "오늘 아침", "R22",
         period(SEOUL_NOW.date(), "morning1", SEOUL), now=SEOUL_NOW),
]

_COMING = first_open_weekend(TODAY, "ko")
_LAST_WE = last_ended_weekend(TODAY, "ko")
R23 = [
    case("R23-ko-ibeon-jumal-on-a-Wednesday", "이번 주말 배포 있나?", "이번 주말", "R23", weekend(_COMING),
         weekend_value(_COMING)),
    case("R23-ko-jinan-jumal", "지난 주말 장애", "지난 주말", "R23", weekend(_LAST_WE), weekend_value(_LAST_WE)),
    case("R23-ko-daeum-jumal-is-the-one-after", "다음 주말 점검", "다음 주말", "R23", weekend(_COMING + D(weeks=1)),
         alts=(alt("R23", None, weekend(_COMING)),)),
    case("R23-ko-jumare-past-bias", "주말에 무엇이 고장났나?", "주말에", "R23", weekend(_LAST_WE),
         alts=(alt("R23", _FUT, weekend(_COMING)),)),
    case("R23-ko-jumare-on-a-Saturday", "주말에 무엇이 고장났나?", "주말에", "R23",
         weekend(first_open_weekend(SATURDAY.date(), "ko")), now=SATURDAY),
    case("R23-ko-ibeon-jumal-on-a-Saturday", "이번 주말 배포 목록", "이번 주말", "R23",
         weekend(first_open_weekend(SATURDAY.date(), "ko")), now=SATURDAY),
    case("R23-ko-jinanjumal-glued", "지난주말 장애", "지난주말", "R23", weekend(_LAST_WE)),
    case("R23-ko-jumal-dongan", "주말 동안 생긴 버그", "주말 동안", "R23", weekend(_LAST_WE),
         alts=(alt("R23", _FUT, weekend(_COMING)),)),
]

TABLES = {"R1": R1, "R2": R2, "R3": R3, "R4": R4, "R5": R5, "R6": R6, "R7": R7, "R8": R8, "R9": R9,
          "R10": R10, "R11": R11, "R12": R12, "R13": R13, "R14": R14, "R15": R15, "R16": R16,
          "R17": R17, "R18": R18, "R19": R19, "R20": R20, "R21": R21, "R22": R22, "R23": R23}
#: Readings that need more examples than the minimum of three (particles and policies).
DEEP = {"R5", "R11", "R12", "R13", "R14", "R15", "R16", "R18", "R22", "R23"}


def _all_cases() -> list[Any]:
    return [pytest.param(*p.values, id=p.id) for table in TABLES.values() for p in table]


def test_every_reading_has_worked_korean_examples() -> None:
    assert sorted(TABLES, key=lambda r: int(r[1:])) == [f"R{i}" for i in range(1, 24)]
    for rid, table in TABLES.items():
        assert len(table) >= (5 if rid in DEEP else 3), rid
        assert all(p.id.startswith(f"{rid}-ko-") for p in table), rid


def test_the_clocks_and_CLDR_facts_the_tables_use() -> None:
    # stdlib date.weekday(); CLDR 49 via babel: "ko" weeks start on Monday, "ko_KR" weeks on
    # Sunday, weekend Saturday-Sunday, numeric dates year first; Seoul keeps UTC+09:00 (tzdata).
    assert (NOW.weekday(), SATURDAY.weekday(), SUNDAY.weekday()) == (2, 5, 6)
    assert _KO_FIRST == MO and _KR_FIRST == SU and weekend_days("ko") == (SA, 2)
    assert get_short_pattern().index("y") < get_short_pattern().index("M") < get_short_pattern().index("d")
    assert SEOUL_NOW.utcoffset() == SEOUL_MARCH_FIRST.utcoffset()


def get_short_pattern() -> str:
    from babel.dates import get_date_format

    return get_date_format("short", locale="ko").pattern


@pytest.mark.parametrize(PARAMS, _all_cases())
def test_korean_phrase_resolves_to_its_interval(question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, _all_cases())
def test_every_korean_alternative_names_a_policy_that_selects_it_or_none(
        question, phrase, reading, bounds, value, alts, context):
    m = one(question, **context)
    for a in m.alternatives:
        if a.policy is None:
            continue
        key, _, setting = a.policy.partition("=")
        chosen = one(question, **{**context, key: setting})
        assert (chosen.start, chosen.end) == (a.start, a.end), a.policy


def test_the_locale_file_reads_last_weekday_as_that_day_of_last_week() -> None:
    # common practice: "지난 월요일" is Monday of last week (stated in locales/ko.toml).
    assert load_locale("ko").meta.weekday_reading == "week"


# --- D: lengths of time -----------------------------------------------------------------------

DURATIONS = [
    ("D-ko-3il-dongan", "3일 동안 열려 있는 이슈", "3일 동안", "P3D"),
    ("D-ko-3ilgan", "3일간 열려 있는 이슈", "3일간", "P3D"),
    ("D-ko-3il-isang", "3일 이상 열린 버그", "3일 이상", "P3D"),
    ("D-ko-2ju-neomge", "2주 넘게 열린 버그", "2주 넘게", "P2W"),
    ("D-ko-choeso-5il-cue", "최소 5일 걸린 작업", "5일", "P5D"),
    ("D-ko-24sigan-isang", "24시간 이상 지연된 작업", "24시간 이상", "PT24H"),
    ("D-ko-du-dal-dongan", "두 달 동안 방치된 이슈", "두 달 동안", "P2M"),
]


@pytest.mark.parametrize(("question", "phrase", "value"), [d[1:] for d in DURATIONS],
                         ids=[d[0] for d in DURATIONS])
def test_D_a_length_of_time_is_a_duration(question, phrase, value):
    # ISO 8601 durations; a cue before ("최소") stays in the question, a Korean postposition
    # after ("동안", "이상", "넘게") is part of the phrase.
    m = one(question)
    assert (m.text, m.kind, m.reading, m.value) == (phrase, "duration", "D", value)
    assert m.start is None and m.end is None


# --- policies ---------------------------------------------------------------------------------

POLICY_FLIPS = [
    ("R12-ko-bias-future-3wore", "3월에 생성된 이슈", {}, ("bias", "future", "past")),
    ("R12-ko-bias-future-3wol-14ire", "3월 14일에 배포된 버전", {}, ("bias", "future", "past")),
    ("R13-ko-bias-future-woryoire", "월요일에 생성된 이슈", {}, ("bias", "future", "past")),
    ("R20-ko-bias-future-48jucha", "48주차 작업", {}, ("bias", "future", "past")),
    ("R23-ko-bias-future-jumare", "주말에 무엇이 고장났나?", {}, ("bias", "future", "past")),
    ("R7-ko-bias-future-3wolbuteo", "3월부터 닫힌 티켓", {}, ("bias", "future", "past")),
    ("R11-ko-bias-future-3wolbuteo-5wolkkaji", "3월부터 5월까지 닫힌 이슈", {}, ("bias", "future", "past")),
    ("R5-ko-window-calendar-jinan-3gaewolgan", "지난 3개월간 생성된 이슈", {},
     ("window_reading", "calendar", "rolling")),
    ("R6-ko-window-calendar-hyanghu-3il", "향후 3일 동안 마감인 작업", {}, ("window_reading", "calendar", "rolling")),
    ("R16-ko-weekday-nearest-jinan-woryoil", "지난 월요일 무엇이 고장났나?", {},
     ("weekday_reading", "nearest", "week")),
    ("R16-ko-weekday-nearest-daeum-mogyoil", "다음 목요일 예정된 작업", {}, ("weekday_reading", "nearest", "week")),
    ("R18-ko-date-order-MDY", "03.04.2026 배포", {}, ("date_order", "MDY", "DMY")),
]


@pytest.mark.parametrize(("question", "base", "setting"), [p[1:] for p in POLICY_FLIPS],
                         ids=[p[0] for p in POLICY_FLIPS])
def test_a_policy_flips_the_korean_reading_and_the_old_one_becomes_the_alternative(question, base, setting):
    key, new, old = setting
    before_ = one(question, **base)
    after_ = one(question, **base, **{key: new})
    offered = [a for a in before_.alternatives if a.policy == f"{key}={new}"]
    assert len(offered) == 1
    assert (after_.start, after_.end, after_.reading) == (offered[0].start, offered[0].end, offered[0].reading)
    assert (after_.start, after_.end) != (before_.start, before_.end)
    back = [a for a in after_.alternatives if a.policy == f"{key}={old}"]
    assert [(a.start, a.end, a.reading) for a in back] == [(before_.start, before_.end, before_.reading)]


# --- Korean and English in one question --------------------------------------------------------

MIXED = [
    ("R2-ko-en-last-week-saengseongdoen-isyu", "last week 생성된 이슈", "last week", "en",
     ko_week(TODAY + D(weeks=-1))),
    ("R2-ko-en-jinanju-bugs", "지난주 생성된 bugs", "지난주", "ko", ko_week(TODAY + D(weeks=-1))),
    ("R13-ko-en-since-Monday", "since Monday 열린 티켓", "since Monday", "en", since(_MONDAY_PAST)),
    ("R1-ko-en-yesterday-dachin-isyu", "yesterday 닫힌 이슈", "yesterday", "en", day(_YESTERDAY)),
    ("R3-ko-en-3il-jeon-PR", "3일 전 생성된 PR", "3일 전", "ko", day(TODAY + D(days=-3))),
    ("R5-ko-en-in-the-last-7-days", "in the last 7 days 생성된 버그", "in the last 7 days", "en",
     (wall(NOW, days=-7), iso(NOW))),
    ("R5-ko-en-choegeun-2ju-merged-PR", "최근 2주 동안 merged PR", "최근 2주 동안", "ko",
     (wall(NOW, weeks=-2), iso(NOW))),
    ("R11-ko-en-releases-3wolbuteo-5wolkkaji", "3월부터 5월까지 releases", "3월부터 5월까지", "ko",
     joined(_MARCH_PAST, month(2026, 5))),
    ("R10-ko-en-geumyoilkkaji-fix-bugs", "금요일까지 fix해야 할 bugs", "금요일까지", "ko", until(_FRIDAY_NEXT)),
    ("R2-ko-en-this-month-baepo", "this month 배포 목록", "this month", "en", month_of(TODAY)),
]


@pytest.mark.parametrize(("question", "phrase", "lang", "bounds"), [m[1:] for m in MIXED],
                         ids=[m[0] for m in MIXED])
def test_a_question_mixing_korean_and_english_finds_the_phrase_in_either(question, phrase, lang, bounds):
    m = one(question, languages=("ko", "en"))
    assert (m.text, m.lang, (m.start, m.end)) == (phrase, lang, bounds)
    assert question[m.char_start : m.char_end] == phrase


def test_a_korean_and_an_english_phrase_in_one_question_are_both_found() -> None:
    result = run("지난주 생성된 bugs와 since Monday 닫힌 tickets", languages=("ko", "en"))
    assert [(m.text, m.lang) for m in result.mentions] == [("지난주", "ko"), ("since Monday", "en")]


# --- look-alikes (reading N) -------------------------------------------------------------------

TRAPS = [
    ("N-ko-jusik-stock", "주식 거래 내역 보여줘"),
    ("N-ko-juju-shareholders", "주주 총회 자료"),
    ("N-ko-juyo-main", "주요 이슈 목록"),
    ("N-ko-jugan-bogoseo-weekly", "주간 보고서 작성자"),
    ("N-ko-100ju-shares-no-cue", "주식 100주 매수"),
    ("N-ko-se-beon-three-times", "세 번 재시도한 빌드"),
    ("N-ko-3beon-isyu-issue-number", "3번 이슈 담당자"),
    ("N-ko-3gae-beogeu-count", "3개 버그 남음"),
    ("N-ko-ibeon-il-this-matter", "이번 일 처리 결과"),
    ("N-ko-jinan-il-past-matters", "지난 일은 잊자"),
    ("N-ko-daeum-dangye", "다음 단계는 뭐야?"),
    ("N-ko-iwoldoen-carried-over", "이월된 작업 목록"),
    ("N-ko-oneullal-nowadays", "오늘날의 개발 트렌드"),
    ("N-ko-wol-danwi-monthly", "월 단위 보고서"),
    ("N-ko-maeju-woryoil-recurring", "매주 월요일 회의"),
    ("N-ko-maeil-achim-recurring", "매일 아침 백업"),
    ("N-ko-iryoilmada-recurring", "일요일마다 점검"),
    ("N-ko-woryobyeong", "월요병 극복 팁"),
    ("N-ko-sigan-chujeok", "시간 추적 기능"),
    ("N-ko-bungibyeol-quarterly", "분기별 목표 설정"),
    ("N-ko-yeongan-gyehoek", "연간 계획 수립"),
    ("N-ko-useonsunwi-2", "우선순위 2 작업"),
    ("N-ko-beojeon-2025.1", "버전 2025.1 버그"),
    ("N-ko-tiket-2025", "티켓 2025 담당자"),
    ("N-ko-sangwi-10gae", "상위 10개 담당자"),
    ("N-ko-5pointeu", "5포인트 작업"),
    ("N-ko-se-bun-three-people", "세 분이 참석했다"),
    ("N-ko-2025gae-hangmok", "2025개 항목 처리"),
    ("N-ko-jumal-geunmu-weak", "주말 근무 수당"),
    ("N-ko-hanguk-sigan", "한국 시간 기준"),
    ("N-ko-daeum-juso-address", "다음 주소로 보내기"),
    ("N-ko-ibeon-jeje-topic", "이번 주제 정리"),
    ("N-ko-jinan-jumun-order", "지난 주문 내역"),
    ("N-ko-ohu-3si-clock-time", "오후 3시 회의"),
    ("N-ko-3wol-3jucha-week-of-month", "3월 3주차 계획"),
    ("N-ko-suyo-yecheuk-demand", "수요 예측 모델"),
    ("N-ko-geumaek-amount", "금액 확인 필요"),
    ("N-ko-iljeong-gwalli", "일정 관리 도구"),
    ("N-ko-isipil-bare-number-word", "이십 명이 참석"),
    ("N-ko-sprint-48", "스프린트 48 버그"),
]


@pytest.mark.parametrize(("question",), [(q,) for _, q in TRAPS], ids=[i for i, _ in TRAPS])
def test_a_korean_look_alike_gives_no_temporal_mention(question):
    result = run(question, languages=("ko", "en"))
    assert result.mentions == ()
    assert result.rewritten == question


def test_there_are_at_least_twenty_five_korean_traps():
    assert len(TRAPS) >= 25
    assert len({q for _, q in TRAPS}) == len(TRAPS)


PAIRS = [
    ("N-ko-jusik-vs-ibeon-ju", "주식 거래 내역", "이번 주 생성된 이슈", "이번 주"),
    ("N-ko-ibeon-il-vs-3il-jeon", "이번 일 처리 결과", "3일 전 생성된 이슈", "3일 전"),
    ("N-ko-se-beon-vs-se-sigan-jeon", "세 번 재시도", "세 시간 전 실패", "세 시간 전"),
    ("N-ko-maeju-woryoil-vs-woryoire", "매주 월요일 회의", "월요일에 생성된 이슈", "월요일에"),
    ("N-ko-oneullal-vs-oneul", "오늘날의 트렌드", "오늘 생성된 이슈", "오늘"),
    ("N-ko-iwoldoen-vs-iwore-kkaji", "이월된 작업 목록", "이월까지 닫힌 이슈", "이월까지"),
    ("N-ko-tiket-2025-vs-2025nyeon", "티켓 2025 담당자", "2025년 생성된 티켓", "2025년"),
    ("N-ko-jumal-geunmu-vs-jumare", "주말 근무 수당", "주말에 생긴 버그", "주말에"),
]


@pytest.mark.parametrize(("trap", "temporal", "phrase"), [p[1:] for p in PAIRS], ids=[p[0] for p in PAIRS])
def test_the_same_korean_word_is_a_time_word_only_where_the_question_makes_it_one(trap, temporal, phrase):
    assert run(trap).mentions == ()
    assert one(temporal).text == phrase


MIXED_TRAPS = [
    ("N-ko-jusik-beside-jinanju", "지난주 주식 거래 내역", "지난주"),
    ("N-ko-useonsunwi-beside-eoje", "우선순위 2 작업 어제 닫힘", "어제"),
    ("N-ko-se-beon-beside-3il-jeon", "세 번 재시도한 빌드 3일 전", "3일 전"),
    ("N-ko-beojeon-beside-ISO-date", "버전 2025.1 버그 2025-03-14부터", "2025-03-14부터"),
]


@pytest.mark.parametrize(("question", "phrase"), [m[1:] for m in MIXED_TRAPS], ids=[m[0] for m in MIXED_TRAPS])
def test_a_korean_look_alike_beside_a_time_phrase_stays_out_of_the_mention(question, phrase):
    m = one(question)
    assert m.text == phrase
    assert question[m.char_start : m.char_end] == phrase
