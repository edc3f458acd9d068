"""Checked against:
- python-dateutil ``relativedelta``: weekday steps, day, week, month and year arithmetic with
  month-end clamping; stdlib ``calendar.isleap``;
- ISO 8601 week dates via stdlib ``date.fromisocalendar``;
- CLDR 49 via babel 2.19: the Japanese day-period names and rules (``Locale("ja").day_periods``
  and ``day_period_rules``: 朝 04:00-12:00, 昼 12:00-16:00, 夕方 16:00-19:00, 夜 19:00-23:00,
  夜中 23:00-04:00), the week data of ``ja`` and ``ja_JP`` (``first_week_day``: Monday for the
  language, Sunday for Japan; ``weekend_start``/``weekend_end``) and the order of numeric dates
  (``babel.dates.get_date_format("short", locale="ja")``: y/MM/dd, year first);
- the IANA tz database via stdlib zoneinfo + tzdata (Berlin daylight-saving changes; Tokyo
  keeps UTC+09:00 all year);
- the questions and phrases are written from knowledge of the language (no published source);
- common practice (no published source): "先週の月曜日" / "来週の木曜日" name that day of last /
  next week (locales/ja.toml ``weekday_reading = "week"``), while "この前の月曜日" and
  "次の月曜日" name the nearest one; "以降" and "以前" take their date in ("3月以降" is from the
  start of March, "2025年以前" up to the end of 2025), "より後" and "より前" leave it out;
  "3日間" and "3か月" are lengths of time but "3日" is the 3rd; 午前 and 午後 (a.m., p.m.) are
  read as CLDR's 朝 and 昼 periods; "今年度" is a fiscal year (from April in Japan), not a
  calendar year, so it gives no mention.

Japanese: worked examples for every reading R1-R23 and D, the policies, numeric dates in the
CLDR order of ``ja``, questions mixing Japanese and English, and look-alike words (reading N).
"""

from __future__ import annotations

from datetime import date, datetime, timedelta
from typing import Any
from zoneinfo import ZoneInfo

import pytest
from babel import Locale
from babel.dates import get_date_format
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
    year,
)

TOKYO = ZoneInfo("Asia/Tokyo")
D = relativedelta
WEEKDAYS = (MO, TU, WE, TH, FR, SA, SU)
LANGS = ("ja",)

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
MORNING_SPRING_BERLIN = datetime(2026, 3, 29, 10, 0, tzinfo=BERLIN)
QUARTER_PAST = datetime(2026, 12, 2, 10, 17, tzinfo=BERLIN)
#: Wednesday 2 December 2026, 10:00 in Tokyo; Sunday 1 March 2026, 10:00 in Tokyo.
TOKYO_NOW = datetime(2026, 12, 2, 10, 0, tzinfo=TOKYO)
TOKYO_MARCH_FIRST = datetime(2026, 3, 1, 10, 0, tzinfo=TOKYO)

_JA = Locale.parse("ja")
_JA_JP = Locale.parse("ja_JP")
_JA_RULES = _JA.day_period_rules[None]
_CAL = "window_reading=calendar"
_ROLL = "window_reading=rolling"
_FUT = "bias=future"
_PAST = "bias=past"
_WEEK = "weekday_reading=week"
_NEAREST = "weekday_reading=nearest"


# --- oracles for Japanese ---------------------------------------------------------------------


def period_id(name: str) -> str:
    """The CLDR 49 day-period id whose Japanese name is ``name``, from babel's
    ``Locale("ja").day_periods`` (午前 and 午後 are CLDR's a.m. and p.m.)."""
    for pid, text in _JA.day_periods["format"]["abbreviated"].items():
        if text == name:
            return pid
    raise KeyError(name)


#: 午前 and 午後 (a.m., p.m.) read as the day periods 朝 and 昼 (locales/ja.toml).
_AM_PM = {"午前": "朝", "午後": "昼"}


def period(d: date, name: str, tz: ZoneInfo = BERLIN) -> tuple[str, str]:
    """The CLDR 49 Japanese day period named ``name`` on local date ``d``, from babel's
    ``Locale("ja").day_period_rules``; a rule whose end is not after its start (夜中,
    23:00-04:00) ends on the next day."""
    rule = _JA_RULES[period_id(_AM_PM.get(name, name))][0]
    base = midnight(d, tz)
    end_day = d if rule["before"] > rule["from"] else d + D(days=1)
    return (iso(base + timedelta(seconds=rule["from"])),  # type: ignore[return-value]
            iso(midnight(end_day, tz) + timedelta(seconds=rule["before"])))


def ja_weekend() -> tuple[Any, int]:
    """First weekend day and number of weekend days of ``ja`` (CLDR week data via babel)."""
    return WEEKDAYS[_JA.weekend_start], (_JA.weekend_end - _JA.weekend_start) % 7 + 1


def weekend(first: date) -> tuple[str, str]:
    return span(first, first + D(days=ja_weekend()[1]))


def weekend_value(first: date) -> str:
    return f"{first.isoformat()}/P{ja_weekend()[1]}D"


def last_ended_weekend(today: date) -> date:
    first, length = ja_weekend()
    return today + D(days=-length, weekday=first(-1))


def first_open_weekend(today: date) -> date:
    first, length = ja_weekend()
    return today + D(days=-(length - 1), weekday=first(+1))


_JA_FIRST = WEEKDAYS[_JA.first_week_day]
_JP_FIRST = WEEKDAYS[_JA_JP.first_week_day]


def ja_week(d: date) -> tuple[str, str]:
    """The week holding ``d``, starting on the CLDR first day of the week of ``ja``."""
    return week(d, _JA_FIRST)


def jp_week(d: date) -> tuple[str, str]:
    """The week holding ``d``, starting on the CLDR first day of the week of ``ja_JP``."""
    return week(d, _JP_FIRST)


def ja_order() -> str:
    """The order of the fields in the CLDR short date format of ``ja`` ("YMD")."""
    pattern = get_date_format("short", locale="ja").pattern
    return "".join(sorted("YMD", key=lambda f: pattern.index({"Y": "y", "M": "M", "D": "d"}[f])))


# --- tables -----------------------------------------------------------------------------------


def case(id: str, question: str, phrase: str, reading: str, bounds: tuple[str | None, str | None],
         value: str | None = None, alts: tuple = (), **context: Any) -> Any:
    return pytest.param(question, phrase, reading, bounds, value, alts, context, id=id)


def run(question: str, **context: Any):  # type: ignore[no-untyped-def]
    now = context.pop("now", NOW)
    fields = {"languages": LANGS, "locale": "ja", **context}
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
    assert question[m.char_start : m.char_end] == phrase
    assert m.lang in ("ja", "und")
    assert m.reading == reading
    assert (m.start, m.end) == bounds
    if value is not None:
        assert m.value == value
    assert tuple((a.reading, a.policy, a.start, a.end) for a in m.alternatives) == alts


PARAMS = ("question", "phrase", "reading", "bounds", "value", "alts", "context")

R1 = [
    case("R1-ja-kyou", "今日閉じられたバグは？", "今日", "R1", day(TODAY), TODAY.isoformat()),
    case("R1-ja-kinou", "昨日コミットしたのは誰？", "昨日", "R1", day(TODAY + D(days=-1)),
         (TODAY + D(days=-1)).isoformat()),
    case("R1-ja-ashita", "明日期限のタスク", "明日", "R1", day(TODAY + D(days=1))),
    case("R1-ja-ototoi-kanji", "一昨日再オープンされたチケット", "一昨日", "R1", day(TODAY + D(days=-2))),
    case("R1-ja-asatte-kanji", "明後日リリースするもの", "明後日", "R1", day(TODAY + D(days=2))),
    case("R1-ja-kinou-hiragana", "きのうのコメント", "きのう", "R1", day(TODAY + D(days=-1))),
    case("R1-ja-ototoi-hiragana", "おとといのビルド", "おととい", "R1", day(TODAY + D(days=-2))),
    case("R1-ja-honjitsu", "本日の新規バグ", "本日", "R1", day(TODAY)),
    case("R1-ja-kinou-Tokyo-across-a-month-start", "昨日コメントしたのは誰？", "昨日", "R1",
         day(TOKYO_MARCH_FIRST.date() + D(days=-1), TOKYO), "2026-02-28", now=TOKYO_MARCH_FIRST),
]

R2 = [
    case("R2-ja-senshuu", "先週作成されたバグは？", "先週", "R2", ja_week(TODAY + D(weeks=-1)),
         iso_week_name(TODAY + D(weeks=-1))),
    case("R2-ja-konshuu", "今週クローズしたチケット", "今週", "R2", ja_week(TODAY), iso_week_name(TODAY)),
    case("R2-ja-senshuu-no-the-particle-stays-in-the-question", "先週のバグは？", "先週", "R2",
         ja_week(TODAY + D(weeks=-1))),
    case("R2-ja-raishuu", "来週の予定は？", "来週", "R2", ja_week(TODAY + D(weeks=1))),
    case("R2-ja-yokushuu", "翌週の予定", "翌週", "R2", ja_week(TODAY + D(weeks=1))),
    case("R2-ja-sengetsu-at-a-month-end", "先月修正したバグ", "先月", "R2",
         month_of(MONTH_END.date() + D(months=-1)), "2026-02", now=MONTH_END),
    case("R2-ja-kongetsu", "今月修正したバグ", "今月", "R2", month_of(TODAY), "2026-12"),
    case("R2-ja-zengetsu", "前月のバグ", "前月", "R2", month_of(TODAY + D(months=-1)), "2026-11"),
    case("R2-ja-kon-shihanki", "今四半期にチケットを一番閉じたのは誰？", "今四半期", "R2", quarter_of(TODAY),
         "2026-Q4"),
    case("R2-ja-zen-shihanki", "前四半期のベロシティ", "前四半期", "R2", quarter_of(TODAY + D(months=-3)),
         "2026-Q3"),
    case("R2-ja-sakunen", "昨年のインシデント", "昨年", "R2", year(TODAY.year - 1), "2025"),
    case("R2-ja-kyonen", "去年のインシデント", "去年", "R2", year(TODAY.year - 1), "2025"),
    case("R2-ja-rainen", "来年のエピック", "来年", "R2", year(TODAY.year + 1), "2027"),
    case("R2-ja_JP-senshuu-weeks-start-on-Sunday", "先週のバグ", "先週", "R2", jp_week(TODAY + D(weeks=-1)),
         "2026-11-22/P1W", locale="ja_JP"),
]

R3 = [
    case("R3-ja-3-ka-mae", "3日前に開かれたバグ", "3日前", "R3", day(TODAY + D(days=-3))),
    case("R3-ja-mikka-mae-kanji-number", "三日前のバグ", "三日前", "R3", day(TODAY + D(days=-3))),
    case("R3-ja-2-shuukan-mae", "2週間前に開かれたバグ", "2週間前", "R3", ja_week(TODAY + D(weeks=-2)),
         iso_week_name(TODAY + D(weeks=-2))),
    case("R3-ja-1-kagetsu-mae-at-a-month-end", "1か月前にマージされたPR", "1か月前", "R3",
         month_of((MONTH_END + D(months=-1)).date()), "2026-02", now=MONTH_END),
    case("R3-ja-3-kagetsu-mae-small-ke", "3ヶ月前のPR", "3ヶ月前", "R3", month_of(TODAY + D(months=-3)), "2026-09"),
    case("R3-ja-2-shihanki-mae", "2四半期前のベロシティ", "2四半期前", "R3", quarter_of(TODAY + D(months=-6)),
         "2026-Q2"),
    case("R3-ja-1-nen-mae", "1年前の未解決バグ", "1年前", "R3", year(TODAY.year - 1), "2025"),
    case("R3-ja-2-jikan-mae", "2時間前のアラート", "2時間前", "R3", hour_of(moved(NOW, hours=-2))),
    case("R3-ja-5-fun-mae", "5分前に始まったビルド", "5分前", "R3",
         (elapsed(NOW, minutes=-5), elapsed(NOW, minutes=-4))),
    case("R3-ja-suujitsu-mae-a-few", "数日前のバグ", "数日前", "R3", day(TODAY + D(days=-3))),
    case("R3-ja-hantoshi-mae", "半年前のバグ", "半年前", "R3", month_of((NOW + D(months=-6)).date())),
    case("R3-ja-sensenshuu", "先々週のバグ", "先々週", "R3", ja_week(TODAY + D(weeks=-2))),
    case("R3-ja-ototoshi", "一昨年のインシデント", "一昨年", "R3", year(TODAY.year - 2), "2024"),
    case("R3-ja-24-jikan-mae-across-DST", "24時間前のアラート", "24時間前", "R3",
         hour_of(moved(SPRING_BERLIN, hours=-24)), now=SPRING_BERLIN),
]

R4 = [
    case("R4-ja-3-ka-go", "3日後に期限のタスク", "3日後", "R4", day(TODAY + D(days=3))),
    case("R4-ja-2-shuukan-go", "2週間後に期限のタスク", "2週間後", "R4", ja_week(TODAY + D(weeks=2)),
         iso_week_name(TODAY + D(weeks=2))),
    case("R4-ja-1-kagetsu-go-from-January-31", "1か月後に更新する契約", "1か月後", "R4",
         month_of((JANUARY_END + D(months=1)).date()), "2026-02", now=JANUARY_END),
    case("R4-ja-2-jikan-go", "2時間後に実行されるジョブ", "2時間後", "R4", hour_of(moved(NOW, hours=2))),
    case("R4-ja-toka-go-kanji-number", "十日後のリリース", "十日後", "R4", day(TODAY + D(days=10))),
    case("R4-ja-saraishuu", "再来週の予定", "再来週", "R4", ja_week(TODAY + D(weeks=2))),
    case("R4-ja-sarainen", "再来年の計画", "再来年", "R4", year(TODAY.year + 2), "2028"),
]

_THIS_MONTH = TODAY.replace(day=1)
_THIS_WEEK = week_start(TODAY)

R5 = [
    case("R5-ja-kako-7-kakan", "過去7日間のバグ", "過去7日間", "R5", (wall(NOW, days=-7), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, TODAY, 7, "days")),)),
    case("R5-ja-chokkin-3-ka", "直近3日のバグ", "直近3日", "R5", (wall(NOW, days=-3), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, TODAY, 3, "days")),)),
    case("R5-ja-koko-2-shuukan", "ここ2週間のバグ", "ここ2週間", "R5", (wall(NOW, weeks=-2), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, _THIS_WEEK, 2, "weeks")),)),
    case("R5-ja-saikin-3-kakan", "最近3日間のバグ", "最近3日間", "R5", (wall(NOW, days=-3), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, TODAY, 3, "days")),)),
    case("R5-ja-kako-1-kagetsu-at-a-month-end", "過去1か月のコメント", "過去1か月", "R5",
         (wall(MONTH_END, months=-1), iso(MONTH_END)),
         alts=(alt("R5", _CAL, _cal_back(MONTH_END, date(2026, 3, 1), 1, "months")),), now=MONTH_END),
    case("R5-ja-kako-3-kagetsu", "過去3か月に閉じたチケット", "過去3か月", "R5", (wall(NOW, months=-3), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, _THIS_MONTH, 3, "months")),)),
    case("R5-ja-kako-hantoshi", "過去半年のバグ", "過去半年", "R5", (wall(NOW, months=-6), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, _THIS_MONTH, 6, "months")),)),
    case("R5-ja-kako-2-nen-from-a-leap-day", "過去2年のインシデント", "過去2年", "R5",
         (wall(LEAP_DAY, years=-2), iso(LEAP_DAY)),
         alts=(alt("R5", _CAL, _cal_back(LEAP_DAY, date(2028, 1, 1), 2, "years")),), now=LEAP_DAY),
    case("R5-ja-kako-24-jikan-is-24-real-hours-Berlin-spring", "過去24時間のエラー", "過去24時間", "R5",
         (elapsed(SPRING_BERLIN, hours=-24), iso(SPRING_BERLIN)), now=SPRING_BERLIN),
    case("R5-ja-chokkin-2-jikan-off-the-hour", "直近2時間のデプロイ", "直近2時間", "R5",
         (elapsed(QUARTER_PAST, hours=-2), iso(QUARTER_PAST)),
         alts=(alt("R5", _CAL, (elapsed(floor_hour(QUARTER_PAST), hours=-2), iso(floor_hour(QUARTER_PAST)))),),
         now=QUARTER_PAST),
    case("R5-ja-kako-7-kakan-Tokyo", "過去7日間のバグ", "過去7日間", "R5",
         (wall(TOKYO_NOW, days=-7), iso(TOKYO_NOW)),
         alts=(alt("R5", _CAL, _cal_back(TOKYO_NOW, TOKYO_NOW.date(), 7, "days")),), now=TOKYO_NOW),
    case("R5-ja-calendar-policy-reads-whole-days", "過去7日間のバグ", "過去7日間", "R5",
         _cal_back(NOW, TODAY, 7, "days"), alts=(alt("R5", _ROLL, (wall(NOW, days=-7), iso(NOW))),),
         window_reading="calendar"),
]

R6 = [
    case("R6-ja-kongo-3-kakan", "今後3日間に期限のタスク", "今後3日間", "R6", (iso(NOW), wall(NOW, days=3)),
         alts=(alt("R6", _CAL, _cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-ja-korekara-2-shuukan", "これから2週間の作業", "これから2週間", "R6", (iso(NOW), wall(NOW, weeks=2)),
         alts=(alt("R6", _CAL, _cal_ahead(NOW, _THIS_WEEK, 2, "weeks")),)),
    case("R6-ja-mukou-1-kagetsu", "向こう1か月の予定", "向こう1か月", "R6", (iso(NOW), wall(NOW, months=1)),
         alts=(alt("R6", _CAL, _cal_ahead(NOW, _THIS_MONTH, 1, "months")),)),
    case("R6-ja-3-ka-inai", "3日以内に修正", "3日以内", "R6", (iso(NOW), wall(NOW, days=3)),
         alts=(alt("R6", _CAL, _cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-ja-kongo-6-jikan", "今後6時間のジョブ", "今後6時間", "R6", (iso(NOW), elapsed(NOW, hours=6)),
         alts=(alt("R6", _CAL, (elapsed(floor_hour(NOW), hours=1), elapsed(floor_hour(NOW), hours=7))),)),
    case("R6-ja-hantoshi-inai", "半年以内の回帰テスト", "半年以内", "R6", (iso(NOW), wall(NOW, months=6)),
         alts=(alt("R6", _CAL, _cal_ahead(NOW, _THIS_MONTH, 6, "months")),)),
    case("R6-ja-calendar-policy-reads-whole-days", "今後3日間に期限のタスク", "今後3日間", "R6",
         _cal_ahead(NOW, TODAY, 3, "days"), alts=(alt("R6", _ROLL, (iso(NOW), wall(NOW, days=3))),),
         window_reading="calendar"),
]

_MARCH_PAST = month(most_recent_year(lambda y: date(y, 3, 1)), 3)
_MARCH_NEXT = month(next_year_after(lambda y: date(y, 4, 1)), 3)
_MONDAY_PAST = day(on_or_before(TODAY, MO))
_MONDAY_NEXT = day(on_or_after(TODAY, MO))

R7 = [
    case("R7-ja-senshuu-kara", "先週からのバグ", "先週から", "R7", since(ja_week(TODAY + D(weeks=-1))),
         "2026-11-23/.."),
    case("R7-ja-3-gatsu-ikou", "3月以降に閉じたバグ", "3月以降", "R7", since(_MARCH_PAST), "2026-03-01/..",
         alts=(alt("R7", _FUT, since(_MARCH_NEXT)),)),
    case("R7-ja-senshuu-irai", "先週以来のコミット", "先週以来", "R7", since(ja_week(TODAY + D(weeks=-1)))),
    case("R7-ja-2024-nen-kara", "2024年からのチケット", "2024年から", "R7", since(year(2024)), "2024-01-01/.."),
    case("R7-ja-getsuyoubi-kara", "月曜日からのコミット", "月曜日から", "R7", since(_MONDAY_PAST),
         alts=(alt("R7", _FUT, since(_MONDAY_NEXT)),)),
    case("R7-ja-ISO-date-ikou", "2025-03-14以降のデプロイ", "2025-03-14以降", "R7",
         since(day(date(2025, 3, 14))), "2025-03-14/.."),
]

R8 = [
    case("R8-ja-3-gatsu-yori-ato", "3月より後に開いたバグ", "3月より後", "R8", after(_MARCH_PAST), "2026-04-01/..",
         alts=(alt("R8", _FUT, after(_MARCH_NEXT)),)),
    case("R8-ja-2025-nen-yori-ato", "2025年より後に期限のチケット", "2025年より後", "R8", after(year(2025))),
    case("R8-ja-senshuu-yori-ato", "先週より後に再オープンされた", "先週より後", "R8",
         after(ja_week(TODAY + D(weeks=-1)))),
    case("R8-ja-kinou-yori-ato", "昨日より後のコメント", "昨日より後", "R8", after(day(TODAY + D(days=-1)))),
]

R9 = [
    case("R9-ja-3-gatsu-yori-mae", "3月より前に開いたバグ", "3月より前", "R9", before(_MARCH_PAST), "../2026-02-28",
         alts=(alt("R9", _FUT, before(_MARCH_NEXT)),)),
    case("R9-ja-2025-nen-yori-mae", "2025年より前に閉じたチケット", "2025年より前", "R9", before(year(2025))),
    case("R9-ja-senshuu-yori-mae", "先週より前のバグ", "先週より前", "R9", before(ja_week(TODAY + D(weeks=-1)))),
    case("R9-ja-kinou-yori-mae", "昨日より前のコメント", "昨日より前", "R9", before(day(TODAY + D(days=-1)))),
]

R10 = [
    case("R10-ja-kinyoubi-made-deadline-looks-ahead", "金曜日までの作業", "金曜日まで", "R10",
         until(day(on_or_after(TODAY, FR))), alts=(alt("R10", None, until(day(on_or_before(TODAY, FR)))),)),
    case("R10-ja-kinyoubi-madeni", "金曜日までに直すもの", "金曜日までに", "R10",
         until(day(on_or_after(TODAY, FR))), alts=(alt("R10", None, until(day(on_or_before(TODAY, FR)))),)),
    case("R10-ja-raishuu-made", "来週までのバグ", "来週まで", "R10", until(ja_week(TODAY + D(weeks=1)))),
    case("R10-ja-ashita-made", "明日まで当番", "明日まで", "R10", until(day(TODAY + D(days=1)))),
    case("R10-ja-2025-nen-izen-takes-the-year-in", "2025年以前のチケット", "2025年以前", "R10", until(year(2025))),
    case("R10-ja-3-gatsu-izen", "3月以前のバグ", "3月以前", "R10", until(_MARCH_PAST),
         alts=(alt("R10", _FUT, until(_MARCH_NEXT)),)),
]

R11 = [
    case("R11-ja-3-gatsu-kara-5-gatsu-made", "3月から5月までのバグ", "3月から5月まで", "R11",
         joined(month(2026, 3), month(2026, 5)), "2026-03-01/2026-05-31",
         alts=(alt("R11", _FUT, joined(month(2027, 3), month(2027, 5))),)),
    case("R11-ja-3-gatsu-kara-5-gatsu", "3月から5月のバグ", "3月から5月", "R11", joined(month(2026, 3), month(2026, 5)),
         alts=(alt("R11", _FUT, joined(month(2027, 3), month(2027, 5))),)),
    case("R11-ja-wave-dash", "3月〜5月のバグ", "3月〜5月", "R11", joined(month(2026, 3), month(2026, 5)),
         alts=(alt("R11", _FUT, joined(month(2027, 3), month(2027, 5))),)),
    case("R11-ja-fullwidth-tilde", "3月～5月のバグ", "3月～5月", "R11", joined(month(2026, 3), month(2026, 5)),
         alts=(alt("R11", _FUT, joined(month(2027, 3), month(2027, 5))),)),
    case("R11-ja-11-gatsu-kara-2-gatsu-ends-next-year", "11月から2月までの当番", "11月から2月まで", "R11",
         joined(month(2026, 11), month(2027, 2)), alts=(alt("R11", _FUT, joined(month(2027, 11), month(2028, 2))),)),
    case("R11-ja-3-gatsu-1-nichi-kara-15-nichi-made", "3月1日から15日までのバグ", "3月1日から15日まで", "R11",
         joined(day(date(2026, 3, 1)), day(date(2026, 3, 15))),
         alts=(alt("R11", _FUT, joined(day(date(2027, 3, 1)), day(date(2027, 3, 15)))),)),
    case("R11-ja-full-dates", "2025年1月1日から2025年3月31日までの支出", "2025年1月1日から2025年3月31日まで",
         "R11", joined(day(date(2025, 1, 1)), day(date(2025, 3, 31))), "2025-01-01/2025-03-31"),
    case("R11-ja-senshuu-kara-konshuu-made", "先週から今週までのバグ", "先週から今週まで", "R11",
         joined(ja_week(TODAY + D(weeks=-1)), ja_week(TODAY))),
    case("R11-ja-dai-1-shihanki-kara-dai-3-shihanki-made", "第1四半期から第3四半期までの売上",
         "第1四半期から第3四半期まで", "R11", joined(quarter(2026, 1), quarter(2026, 3)),
         alts=(alt("R11", _FUT, joined(quarter(2027, 1), quarter(2027, 3))),)),
    case("R11-ja-2024-nen-kara-2025-nen-made", "2024年から2025年までのインシデント", "2024年から2025年まで", "R11",
         joined(year(2024), year(2025))),
    case("R11-ja-ototoi-kara-kyou-made", "一昨日から今日までの編集", "一昨日から今日まで", "R11",
         joined(day(TODAY + D(days=-2)), day(TODAY))),
    case("R11-ja-3-gatsu-to-5-gatsu-no-aida", "3月と5月の間のバグ", "3月と5月の間", "R11",
         joined(month(2026, 3), month(2026, 5)), alts=(alt("R11", _FUT, joined(month(2027, 3), month(2027, 5))),)),
    case("R11-ja-getsuyoubi-kara-kinyoubi-made", "月曜日から金曜日までのコミット", "月曜日から金曜日まで", "R11",
         joined(day(on_or_before(TODAY, MO)), day(on_or_before(TODAY, MO) + D(weekday=FR))),
         alts=(alt("R11", _FUT, joined(day(on_or_after(TODAY, MO)), day(on_or_after(TODAY, MO) + D(weekday=FR)))),)),
]


def _past(first_day_in: Any, today: date = TODAY) -> int:
    return most_recent_year(first_day_in, today)


def _future(end_day_in: Any, today: date = TODAY) -> int:
    return next_year_after(end_day_in, today)


def leap_day(y: int) -> date | None:
    import calendar

    return date(y, 2, 29) if calendar.isleap(y) else None


def after_leap_day(y: int) -> date | None:
    return date(y, 3, 1) if leap_day(y) else None


_MAR14 = (_past(lambda y: date(y, 3, 14)), _future(lambda y: date(y, 3, 15)))
_DEC3 = (_past(lambda y: date(y, 12, 3)), _future(lambda y: date(y, 12, 4)))

R12 = [
    case("R12-ja-3-gatsu", "3月のバグ", "3月", "R12", _MARCH_PAST, "2026-03", alts=(alt("R12", _FUT, _MARCH_NEXT),)),
    case("R12-ja-fullwidth-3-gatsu", "３月のバグ", "３月", "R12", _MARCH_PAST, alts=(alt("R12", _FUT, _MARCH_NEXT),)),
    case("R12-ja-12-gatsu-current-month-counts", "12月のバグ", "12月", "R12", month(2026, 12), "2026-12"),
    case("R12-ja-12-gatsu-said-in-January", "12月のバグ", "12月", "R12",
         month(_past(lambda y: date(y, 12, 1), MID_JANUARY.date()), 12), "2026-12",
         alts=(alt("R12", _FUT, month(_future(lambda y: date(y + 1, 1, 1), MID_JANUARY.date()), 12)),),
         now=MID_JANUARY),
    case("R12-ja-dai-3-shihanki", "第3四半期にリリースしたもの", "第3四半期", "R12",
         quarter(_past(lambda y: date(y, 7, 1)), 3), "2026-Q3",
         alts=(alt("R12", _FUT, quarter(_future(lambda y: date(y, 10, 1)), 3)),)),
    case("R12-ja-Q3", "Q3にリリースしたもの", "Q3", "R12", quarter(_past(lambda y: date(y, 7, 1)), 3),
         alts=(alt("R12", _FUT, quarter(_future(lambda y: date(y, 10, 1)), 3)),)),
    case("R12-ja-dai-4-shihanki-current-quarter-counts", "第4四半期の売上", "第4四半期", "R12", quarter(2026, 4)),
    case("R12-ja-kamihanki", "上半期の目標", "上半期", "R12", half(_past(lambda y: date(y, 1, 1)), 1),
         "2026-H1", alts=(alt("R12", _FUT, half(_future(lambda y: date(y, 7, 1)), 1)),)),
    case("R12-ja-shimohanki-current-half-counts", "下半期の目標", "下半期", "R12", half(2026, 2), "2026-H2"),
    case("R12-ja-3-gatsu-14-nichi", "3月14日にリリース", "3月14日", "R12", day(date(_MAR14[0], 3, 14)),
         "2026-03-14", alts=(alt("R12", _FUT, day(date(_MAR14[1], 3, 14))),)),
    case("R12-ja-12-gatsu-2-nichi-today-counts", "12月2日にリリース", "12月2日", "R12", day(TODAY)),
    case("R12-ja-12-gatsu-3-nichi-is-last-year", "12月3日にリリース", "12月3日", "R12", day(date(_DEC3[0], 12, 3)),
         "2025-12-03", alts=(alt("R12", _FUT, day(date(_DEC3[1], 12, 3))),)),
    case("R12-ja-2-gatsu-29-nichi-finds-the-last-leap-year", "2月29日に何があった？", "2月29日", "R12",
         day(date(_past(leap_day, BEFORE_LEAP_DAY.date()), 2, 29)), "2024-02-29",
         alts=(alt("R12", _FUT, day(date(_future(after_leap_day, BEFORE_LEAP_DAY.date()), 2, 29))),),
         now=BEFORE_LEAP_DAY),
]

R13 = [
    case("R13-ja-getsuyoubi", "月曜日のバグ", "月曜日", "R13", _MONDAY_PAST, on_or_before(TODAY, MO).isoformat(),
         alts=(alt("R13", _FUT, _MONDAY_NEXT),)),
    case("R13-ja-suiyoubi-is-today", "水曜日のバグ", "水曜日", "R13", day(TODAY)),
    case("R13-ja-kinyou-short-name", "金曜のバグ", "金曜", "R13", day(on_or_before(TODAY, FR)),
         alts=(alt("R13", _FUT, day(on_or_after(TODAY, FR))),)),
    case("R13-ja-mokuyoubi-ni", "木曜日にデプロイしたもの", "木曜日", "R13", day(on_or_before(TODAY, TH)),
         alts=(alt("R13", _FUT, day(on_or_after(TODAY, TH))),)),
    case("R13-ja-nichiyoubi-said-on-a-Sunday", "日曜日のバグ", "日曜日", "R13", day(SUNDAY.date()), now=SUNDAY),
    case("R13-ja-kinyoubi-shimekiri-looks-ahead", "金曜日締め切りのタスク", "金曜日", "R13",
         day(on_or_after(TODAY, FR)), alts=(alt("R13", None, day(on_or_before(TODAY, FR))),)),
    case("R13-ja-getsuyoubi-ga-kigen-looks-ahead", "月曜日が期限の要件", "月曜日", "R13",
         day(on_or_after(TODAY, MO)), alts=(alt("R13", None, day(on_or_before(TODAY, MO))),)),
    case("R13-ja-mokuyoubi-made-looks-ahead", "木曜日まで凍結", "木曜日まで", "R10",
         until(day(on_or_after(TODAY, TH))), alts=(alt("R10", None, until(day(on_or_before(TODAY, TH)))),)),
    case("R13-ja-future-bias-flips-getsuyoubi", "月曜日のバグ", "月曜日", "R13", _MONDAY_NEXT,
         alts=(alt("R13", _PAST, _MONDAY_PAST),), bias="future"),
]

# "この前の月曜日" and "次の月曜日" name the nearest day themselves; "先週の月曜日" / "来週の木曜日"
# read that way only with weekday_reading=nearest.
R14 = [
    case("R14-ja-konomae-no-getsuyoubi", "この前の月曜日に壊れたもの", "この前の月曜日", "R14",
         day(strictly_before(TODAY, MO)), alts=(alt("R16", None, day(in_week(TODAY, MO, -1))),)),
    case("R14-ja-mae-no-kayoubi-is-yesterday", "前の火曜日のビルド", "前の火曜日", "R14",
         day(strictly_before(TODAY, TU)), alts=(alt("R16", None, day(in_week(TODAY, TU, -1))),)),
    case("R14-ja-konomae-no-suiyoubi-said-on-a-Wednesday", "この前の水曜日のデプロイ", "この前の水曜日", "R14",
         day(strictly_before(TODAY, WE))),
    case("R14-ja-senshuu-no-getsuyoubi-nearest", "先週の月曜日に壊れたもの", "先週の月曜日", "R14",
         day(strictly_before(TODAY, MO)), alts=(alt("R16", _WEEK, day(in_week(TODAY, MO, -1))),),
         weekday_reading="nearest"),
    case("R14-ja-konomae-no-nichiyoubi-said-on-a-Sunday", "この前の日曜日のアラート", "この前の日曜日", "R14",
         day(strictly_before(SUNDAY.date(), SU)), now=SUNDAY),
]

R15 = [
    case("R15-ja-tsugi-no-getsuyoubi", "次の月曜日の予定", "次の月曜日", "R15", day(strictly_after(TODAY, MO)),
         strictly_after(TODAY, MO).isoformat()),
    case("R15-ja-kondo-no-kinyoubi", "今度の金曜日のデモ", "今度の金曜日", "R15", day(strictly_after(TODAY, FR)),
         alts=(alt("R16", None, day(in_week(TODAY, FR, 1))),)),
    case("R15-ja-tsugi-no-mokuyoubi-is-tomorrow", "次の木曜日の予定", "次の木曜日", "R15",
         day(strictly_after(TODAY, TH)), alts=(alt("R16", None, day(in_week(TODAY, TH, 1))),)),
    case("R15-ja-raishuu-no-mokuyoubi-nearest", "来週の木曜日の予定", "来週の木曜日", "R15",
         day(strictly_after(TODAY, TH)), alts=(alt("R16", _WEEK, day(in_week(TODAY, TH, 1))),),
         weekday_reading="nearest"),
    case("R15-ja-tsugi-no-suiyoubi-said-on-a-Wednesday", "次の水曜日の予定", "次の水曜日", "R15",
         day(strictly_after(TODAY, WE))),
]

R16 = [
    case("R16-ja-senshuu-no-getsuyoubi", "先週の月曜日に壊れたもの", "先週の月曜日", "R16",
         day(in_week(TODAY, MO, -1)), in_week(TODAY, MO, -1).isoformat(),
         alts=(alt("R14", _NEAREST, day(strictly_before(TODAY, MO))),)),
    case("R16-ja-senshuu-getsuyou-short", "先週月曜に壊れたもの", "先週月曜", "R16", day(in_week(TODAY, MO, -1)),
         alts=(alt("R14", _NEAREST, day(strictly_before(TODAY, MO))),)),
    case("R16-ja-raishuu-no-mokuyoubi", "来週の木曜日の予定", "来週の木曜日", "R16", day(in_week(TODAY, TH, 1)),
         alts=(alt("R15", _NEAREST, day(strictly_after(TODAY, TH))),)),
    case("R16-ja-raishuu-no-suiyoubi-same-either-way", "来週の水曜日の予定", "来週の水曜日", "R16",
         day(in_week(TODAY, WE, 1))),
    case("R16-ja-konshuu-no-kinyoubi", "今週の金曜日のデモ", "今週の金曜日", "R16", day(in_week(TODAY, FR, 0))),
    case("R16-ja-konshuu-no-getsuyoubi-already-past", "今週の月曜日のデプロイ", "今週の月曜日", "R16",
         day(in_week(TODAY, MO, 0)), alts=(alt("R15", None, day(on_or_after(TODAY, MO))),)),
    case("R16-ja-mae-no-shuu-no-getsuyoubi", "前の週の月曜日のビルド", "前の週の月曜日", "R16",
         day(in_week(TODAY, MO, -1))),
    case("R16-ja-tsugi-no-shuu-no-kinyoubi", "次の週の金曜日の予定", "次の週の金曜日", "R16",
         day(in_week(TODAY, FR, 1))),
    case("R16-ja_JP-konshuu-no-nichiyoubi-weeks-start-on-Sunday", "今週の日曜日のアラート", "今週の日曜日", "R16",
         day(in_week(TODAY, SU, 0, _JP_FIRST)), alts=(alt("R15", None, day(on_or_after(TODAY, SU))),),
         locale="ja_JP"),
]

R17 = [
    case("R17-ja-2025-nen", "2025年のバグ", "2025年", "R17", year(2025), "2025"),
    case("R17-ja-2023-nen-ni", "2023年に起きたインシデント", "2023年", "R17", year(2023), "2023"),
    case("R17-ja-2022-nen-no", "優先度2の5件のチケット、2022年の分", "2022年", "R17", year(2022)),
]

R18 = [
    case("R18-ja-ISO-date", "2025-03-14に修正", "2025-03-14", "R18", day(date(2025, 3, 14)), "2025-03-14"),
    case("R18-ja-nen-gatsu-nichi", "2025年3月14日に修正", "2025年3月14日", "R18", day(date(2025, 3, 14))),
    case("R18-ja-with-the-weekday-in-brackets", "2025年3月14日(金)に修正", "2025年3月14日(金)", "R18",
         day(date(2025, 3, 14))),
    case("R18-ja-with-the-weekday-in-fullwidth-brackets", "2026年3月14日（土）に修正", "2026年3月14日（土）", "R18",
         day(date(2026, 3, 14))),
    case("R18-ja-numeric-year-first-CLDR-order", "2026/03/04に修正", "2026/03/04", "R18", day(date(2026, 3, 4)),
         "2026-03-04"),
    case("R18-ja-numeric-day-first-when-no-year-first", "04/03/2026に修正", "04/03/2026", "R18",
         day(date(2026, 3, 4)), alts=(alt("R18", "date_order=MDY", day(date(2026, 4, 3))),)),
    case("R18-ja-numeric-date-order-policy-MDY", "04/03/2026に修正", "04/03/2026", "R18",
         day(date(2026, 4, 3)), alts=(alt("R18", "date_order=DMY", day(date(2026, 3, 4))),), date_order="MDY"),
    case("R18-ja-numeric-only-one-valid-reading", "13/04/2026に修正", "13/04/2026", "R18", day(date(2026, 4, 13))),
    case("R18-ja-kyonen-no-12-gatsu-3-nichi", "去年の12月3日にリリース", "去年の12月3日", "R18",
         day(date(TODAY.year - 1, 12, 3))),
    case("R18-ja-raigetsu-15-nichi", "来月15日にリリース", "来月15日", "R18",
         day((TODAY + D(months=1)).replace(day=15)), "2027-01-15"),
    case("R18-ja-sengetsu-3-ka", "先月3日のインシデント", "先月3日", "R18", day((TODAY + D(months=-1)).replace(day=3))),
]

R19 = [
    case("R19-ja-2025-nen-3-gatsu", "2025年3月のバグ", "2025年3月", "R19", month(2025, 3), "2025-03"),
    case("R19-ja-2025-nen-dai-3-shihanki", "2025年第3四半期の売上", "2025年第3四半期", "R19", quarter(2025, 3),
         "2025-Q3"),
    case("R19-ja-2025-nen-no-dai-san-shihanki", "2025年の第三四半期の売上", "2025年の第三四半期", "R19",
         quarter(2025, 3)),
    case("R19-ja-2025-nen-Q3", "2025年Q3の売上", "2025年Q3", "R19", quarter(2025, 3)),
    case("R19-ja-2026-nen-kamihanki", "2026年上半期の目標", "2026年上半期", "R19", half(2026, 1), "2026-H1"),
    case("R19-ja-2025-nen-shimohanki", "2025年下半期の目標", "2025年下半期", "R19", half(2025, 2), "2025-H2"),
    case("R19-ja-2026-nen-H1", "2026年H1の目標", "2026年H1", "R19", half(2026, 1)),
    case("R19-ja-ISO-year-month-glued", "2025-03のバグ", "2025-03", "R19", month(2025, 3), "2025-03"),
    # A year named relative to now: CLDR's 昨年/今年/来年, or colloquial 去年.
    case("R19-ja-kotoshi-no-3-gatsu", "今年の3月のバグ", "今年の3月", "R19", month(TODAY.year, 3), "2026-03"),
    case("R19-ja-sakunen-no-12-gatsu", "昨年の12月のインシデント", "昨年の12月", "R19", month(TODAY.year - 1, 12)),
    case("R19-ja-kyonen-3-gatsu", "去年3月のバグ", "去年3月", "R19", month(TODAY.year - 1, 3), "2025-03"),
    case("R19-ja-kotoshi-no-dai-1-shihanki", "今年の第1四半期の売上", "今年の第1四半期", "R19",
         quarter(TODAY.year, 1), "2026-Q1"),
]


def _recent_week(w: int, today: date = TODAY) -> int:
    return most_recent_year(lambda y: date.fromisocalendar(y, w, 1) if w < 53 else week_53_monday(y), today)


def _next_week(w: int, today: date = TODAY) -> int:
    def end(y: int) -> date | None:
        first = date.fromisocalendar(y, w, 1) if w < 53 else week_53_monday(y)
        return None if first is None else first + D(days=7)

    return next_year_after(end, today)


R20 = [
    case("R20-ja-2026-nen-dai-48-shuu", "2026年第48週のチケット", "2026年第48週", "R20", iso_week(2026, 48),
         "2026-W48"),
    case("R20-ja-2027-nen-dai-1-shuu", "2027年第1週のチケット", "2027年第1週", "R20", iso_week(2027, 1), "2027-W01"),
    case("R20-ja-kotoshi-dai-48-shuu", "今年第48週のチケット", "今年第48週", "R20", iso_week(TODAY.year, 48)),
    case("R20-ja-ISO-2026-W48", "2026-W48のチケット", "2026-W48", "R20", iso_week(2026, 48)),
    case("R20-ja-2026-nen-W48", "2026年W48のチケット", "2026年W48", "R20", iso_week(2026, 48)),
    case("R20-ja-dai-48-shuu-past-bias", "第48週のチケット", "第48週", "R20", iso_week(_recent_week(48), 48),
         "2026-W48", alts=(alt("R20", _FUT, iso_week(_next_week(48), 48)),)),
    case("R20-ja-dai-49-shuu-current-week-counts", "第49週のチケット", "第49週", "R20", iso_week(2026, 49)),
    case("R20-ja-dai-50-shuu-is-last-year", "第50週のチケット", "第50週", "R20", iso_week(_recent_week(50), 50),
         "2025-W50", alts=(alt("R20", _FUT, iso_week(_next_week(50), 50)),)),
    case("R20-ja-dai-53-shuu-finds-the-last-long-year", "第53週のチケット", "第53週", "R20",
         iso_week(_recent_week(53), 53), "2020-W53", alts=(alt("R20", _FUT, iso_week(_next_week(53), 53)),)),
    case("R20-ja-W12", "W12のチケット", "W12", "R20", iso_week(_recent_week(12), 12),
         alts=(alt("R20", _FUT, iso_week(_next_week(12), 12)),)),
    case("R20-ja-dai-48-shuu-future-bias", "第48週のチケット", "第48週", "R20", iso_week(_next_week(48), 48),
         "2027-W48", alts=(alt("R20", _PAST, iso_week(_recent_week(48), 48)),), bias="future"),
]


def _to_now(first: tuple[str, str], now: datetime = NOW) -> tuple[str, str]:
    return first[0], iso(now)  # type: ignore[return-value]


R21 = [
    case("R21-ja-nensho-kara-ima-made", "年初から今までの売上", "年初から今まで", "R21", _to_now(year(2026)),
         f"{year(2026)[0]}/{iso(NOW)}"),
    case("R21-ja-nenshorai", "年初来の売上", "年初来", "R21", _to_now(year(2026))),
    case("R21-ja-kotoshi-ni-haitte-kara", "今年に入ってからのバグ", "今年に入ってから", "R21", _to_now(year(2026))),
    case("R21-ja-gessho-kara-ima-made", "月初から今までの支出", "月初から今まで", "R21", _to_now(month_of(TODAY))),
    case("R21-ja-kon-shihanki-koremade", "今四半期これまでの売上", "今四半期これまで", "R21",
         _to_now(quarter_of(TODAY))),
    case("R21-ja-konshuu-koremade-on-a-Sunday", "今週これまでのコミット", "今週これまで", "R21",
         _to_now(ja_week(SUNDAY.date()), SUNDAY), now=SUNDAY),
]

R22 = [
    case("R22-ja-kesa", "今朝壊れたもの", "今朝", "R22", period(TODAY, "朝")),
    case("R22-ja-kinou-no-gogo", "昨日の午後壊れたもの", "昨日の午後", "R22", period(TODAY + D(days=-1), "午後")),
    case("R22-ja-kyou-no-gozen", "今日の午前のデプロイ", "今日の午前", "R22", period(TODAY, "午前")),
    case("R22-ja-sakuya", "昨夜壊れたもの", "昨夜", "R22", period(TODAY + D(days=-1), "夜")),
    case("R22-ja-konya", "今夜のタスク", "今夜", "R22", period(TODAY, "夜")),
    case("R22-ja-konban", "今晩のリリース", "今晩", "R22", period(TODAY, "夜")),
    case("R22-ja-ashita-no-asa", "明日の朝リリース", "明日の朝", "R22", period(TODAY + D(days=1), "朝")),
    case("R22-ja-kyou-no-yuugata", "今日の夕方のビルド", "今日の夕方", "R22", period(TODAY, "夕方")),
    case("R22-ja-kinou-no-yonaka-wraps-midnight", "昨日の夜中のアラート", "昨日の夜中", "R22",
         period(TODAY + D(days=-1), "夜中")),
    case("R22-ja-kyou-no-hiru", "今日の昼のデプロイ", "今日の昼", "R22", period(TODAY, "昼")),
    case("R22-ja-kesa-on-a-DST-day-is-wall-clock", "今朝壊れたもの", "今朝", "R22",
         period(MORNING_SPRING_BERLIN.date(), "朝"), now=MORNING_SPRING_BERLIN),
    case("R22-ja-kinou-no-gogo-Tokyo", "昨日の午後壊れたもの", "昨日の午後", "R22",
         period(TOKYO_NOW.date() + D(days=-1), "午後", TOKYO), now=TOKYO_NOW),
]

_SAT = SATURDAY.date()

R23 = [
    case("R23-ja-konshuumatsu-on-a-Wednesday", "今週末にデプロイ", "今週末", "R23",
         weekend(first_open_weekend(TODAY)), weekend_value(first_open_weekend(TODAY))),
    case("R23-ja-senshuumatsu-on-a-Wednesday", "先週末のアラート", "先週末", "R23",
         weekend(last_ended_weekend(TODAY)), weekend_value(last_ended_weekend(TODAY))),
    case("R23-ja-raishuumatsu-on-a-Wednesday", "来週末のメンテナンス", "来週末", "R23",
         weekend(first_open_weekend(TODAY) + D(weeks=1)), alts=(alt("R23", None, weekend(first_open_weekend(TODAY))),)),
    case("R23-ja-kono-shuumatsu-on-a-Wednesday", "この週末にデプロイ", "この週末", "R23",
         weekend(first_open_weekend(TODAY))),
    case("R23-ja-shuumatsu-made-a-bound-vouches", "週末までに直すもの", "週末までに", "R10",
         until(weekend(last_ended_weekend(TODAY))), alts=(alt("R10", _FUT, until(weekend(first_open_weekend(TODAY)))),)),
    case("R23-ja-konshuumatsu-on-a-Saturday", "今週末にデプロイ", "今週末", "R23",
         weekend(first_open_weekend(_SAT)), now=SATURDAY),
    case("R23-ja-senshuumatsu-on-a-Saturday", "先週末のアラート", "先週末", "R23",
         weekend(last_ended_weekend(_SAT)), now=SATURDAY),
    case("R23-ja-raishuumatsu-on-a-Saturday", "来週末のメンテナンス", "来週末", "R23",
         weekend(first_open_weekend(_SAT) + D(weeks=1)), now=SATURDAY),
    case("R23-ja-tsugi-no-shuumatsu-on-a-Sunday", "次の週末のメンテナンス", "次の週末", "R23",
         weekend(first_open_weekend(SUNDAY.date()) + D(weeks=1)), now=SUNDAY),
    case("R23-ja-senshuumatsu-on-a-Monday", "先週末のアラート", "先週末", "R23",
         weekend(last_ended_weekend(MONDAY_AFTER.date())), now=MONDAY_AFTER),
]

TABLES = {"R1": R1, "R2": R2, "R3": R3, "R4": R4, "R5": R5, "R6": R6, "R7": R7, "R8": R8,
          "R9": R9, "R10": R10, "R11": R11, "R12": R12, "R13": R13, "R14": R14, "R15": R15,
          "R16": R16, "R17": R17, "R18": R18, "R19": R19, "R20": R20, "R21": R21, "R22": R22,
          "R23": R23}
#: Readings that get more worked examples than the three every reading has.
DEEP = ("R5", "R11", "R12", "R13", "R14", "R15", "R16", "R18", "R22", "R23")


def _all_cases() -> list[Any]:
    return [pytest.param(*p.values, id=p.id) for table in TABLES.values() for p in table]


def test_every_reading_has_worked_japanese_examples() -> None:
    assert sorted(TABLES, key=lambda r: int(r[1:])) == [f"R{i}" for i in range(1, 24)]
    for rid, table in TABLES.items():
        assert len(table) >= (4 if rid in DEEP else 3), rid
        assert all(p.id.startswith(f"{rid}-ja") for p in table), rid


def test_the_clocks_and_CLDR_facts_the_tables_use() -> None:
    # stdlib date.weekday(); CLDR 49 via babel: ja weeks start on Monday, ja_JP weeks on Sunday,
    # weekend Saturday-Sunday, numeric dates year first; Tokyo keeps UTC+09:00 (tzdata).
    assert (NOW.weekday(), SATURDAY.weekday(), SUNDAY.weekday(), MONDAY_AFTER.weekday()) == (2, 5, 6, 0)
    assert _JA_FIRST == MO and _JP_FIRST == SU and ja_weekend() == (SA, 2)
    assert ja_order() == "YMD"
    assert TOKYO_NOW.utcoffset() == TOKYO_MARCH_FIRST.utcoffset() == timedelta(hours=9)
    assert (period_id("朝"), period_id("昼"), period_id("夜中")) == ("morning1", "afternoon1", "night2")
    assert (period_id("午前"), period_id("午後")) == ("am", "pm")


@pytest.mark.parametrize(PARAMS, _all_cases())
def test_japanese_phrase_resolves_to_its_interval(question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, _all_cases())
def test_every_japanese_alternative_names_a_policy_that_selects_it_or_none(
        question, phrase, reading, bounds, value, alts, context):
    m = one(question, **context)
    for a in m.alternatives:
        if a.policy is None:
            continue
        key, _, setting = a.policy.partition("=")
        chosen = one(question, **{**context, key: setting})
        assert (chosen.start, chosen.end) == (a.start, a.end), a.policy


def test_the_locale_file_reads_last_weekday_as_that_day_of_last_week() -> None:
    # common practice: "先週の月曜日" is Monday of last week (stated in locales/ja.toml).
    assert load_locale("ja").meta.weekday_reading == "week"


def test_a_phrase_naming_the_nearest_day_keeps_it_whatever_the_policy() -> None:
    # common practice: "次の木曜日" is the coming Thursday; weekday_reading does not move it.
    for policy in ("week", "nearest"):
        m = one("次の木曜日の予定", weekday_reading=policy)
        assert (m.reading, (m.start, m.end)) == ("R15", day(strictly_after(TODAY, TH)))


# --- D: lengths of time -----------------------------------------------------------------------

DURATIONS = [
    ("D-ja-3-kakan", "3日間で修正したバグ", "3日間", "P3D"),
    ("D-ja-2-shuukan", "2週間続いた障害", "2週間", "P2W"),
    ("D-ja-24-jikan", "24時間かかったレビュー", "24時間", "PT24H"),
    ("D-ja-3-kagetsu", "3か月のプロジェクト", "3か月", "P3M"),
    ("D-ja-30-funkan", "30分間のメンテナンス", "30分間", "PT30M"),
]


@pytest.mark.parametrize(("question", "phrase", "value"), [d[1:] for d in DURATIONS],
                         ids=[d[0] for d in DURATIONS])
def test_D_a_count_of_units_with_kan_is_a_duration(question, phrase, value):
    # ISO 8601 durations; "間" (a span of) marks a length of time.
    m = one(question)
    assert (m.text, m.kind, m.reading, m.value) == (phrase, "duration", "D", value)
    assert m.start is None and m.end is None


def test_a_day_number_alone_is_no_length_of_time() -> None:
    # "3日" is the 3rd of a month; "3日以上" names no day and no length the engine reads.
    assert run("3日以上放置されたバグ").mentions == ()


# --- policies ---------------------------------------------------------------------------------

POLICY_FLIPS = [
    ("R12-ja-bias-future-3-gatsu", "3月のバグ", {}, ("bias", "future", "past")),
    ("R12-ja-bias-future-12-gatsu-3-nichi", "12月3日にリリース", {}, ("bias", "future", "past")),
    ("R13-ja-bias-future-getsuyoubi", "月曜日のバグ", {}, ("bias", "future", "past")),
    ("R20-ja-bias-future-dai-48-shuu", "第48週のチケット", {}, ("bias", "future", "past")),
    ("R7-ja-bias-future-3-gatsu-ikou", "3月以降に閉じたバグ", {}, ("bias", "future", "past")),
    ("R11-ja-bias-future-3-gatsu-kara-5-gatsu-made", "3月から5月までのバグ", {}, ("bias", "future", "past")),
    ("R10-ja-bias-future-3-gatsu-izen", "3月以前のバグ", {}, ("bias", "future", "past")),
    ("R5-ja-window-calendar-kako-3-kagetsu", "過去3か月に閉じたチケット", {}, ("window_reading", "calendar", "rolling")),
    ("R6-ja-window-calendar-kongo-3-kakan", "今後3日間に期限のタスク", {}, ("window_reading", "calendar", "rolling")),
    ("R16-ja-weekday-nearest-senshuu-no-getsuyoubi", "先週の月曜日に壊れたもの", {},
     ("weekday_reading", "nearest", "week")),
    ("R16-ja-weekday-nearest-raishuu-no-mokuyoubi", "来週の木曜日の予定", {}, ("weekday_reading", "nearest", "week")),
    ("R18-ja-date-order-MDY", "04/03/2026に修正", {}, ("date_order", "MDY", "DMY")),
]


@pytest.mark.parametrize(("question", "base", "setting"), [p[1:] for p in POLICY_FLIPS],
                         ids=[p[0] for p in POLICY_FLIPS])
def test_a_policy_flips_the_japanese_reading_and_the_old_one_becomes_the_alternative(question, base, setting):
    key, new, old = setting
    before_ = one(question, **base)
    after_ = one(question, **base, **{key: new})
    offered = [a for a in before_.alternatives if a.policy == f"{key}={new}"]
    assert len(offered) == 1
    assert (after_.start, after_.end, after_.reading) == (offered[0].start, offered[0].end, offered[0].reading)
    assert (after_.start, after_.end) != (before_.start, before_.end)
    back = [a for a in after_.alternatives if a.policy == f"{key}={old}"]
    assert [(a.start, a.end, a.reading) for a in back] == [(before_.start, before_.end, before_.reading)]


def test_a_year_first_numeric_date_has_no_other_order() -> None:
    # CLDR ja writes y/MM/dd: a four-digit first field is the year whatever date_order says.
    for order in ("DMY", "MDY", "YMD"):
        m = one("2026/03/04に修正", date_order=order)
        assert (m.start, m.end, m.alternatives) == (*day(date(2026, 3, 4)), ())


# --- Japanese and English in one question ------------------------------------------------------

MIXED = [
    ("R2-ja-en-bugs-senshuu", "bugs 先週", "先週", "ja", ja_week(TODAY + D(weeks=-1))),
    ("R2-ja-en-senshuu-no-PR", "先週の PR は？", "先週", "ja", ja_week(TODAY + D(weeks=-1))),
    ("R7-ja-en-show-tickets-senshuu-kara", "show tickets 先週から", "先週から", "ja",
     since(ja_week(TODAY + D(weeks=-1)))),
    ("R3-ja-en-3-ka-mae-merge", "3日前に merge された PR", "3日前", "ja", day(TODAY + D(days=-3))),
    ("R2-ja-en-sprint-12-kongetsu", "sprint 12 で今月 close した tickets", "今月", "ja", month_of(TODAY)),
    ("R2-ja-en-last-week-no-bug", "last week のバグ", "last week", "en", ja_week(TODAY + D(weeks=-1))),
    ("R19-ja-en-2026-nen-3-gatsu-release", "2026年3月の release の blockers", "2026年3月", "ja", month(2026, 3)),
    ("R1-ja-en-tickets-closed-kinou", "tickets closed 昨日", "昨日", "ja", day(TODAY + D(days=-1))),
    ("R5-ja-en-P1-bugs-kako-7-kakan", "P1 bugs 過去7日間", "過去7日間", "ja", (wall(NOW, days=-7), iso(NOW))),
    ("R10-ja-en-kinyoubi-made-no-tasks", "金曜日までの tasks", "金曜日まで", "ja", until(day(on_or_after(TODAY, FR)))),
    ("R7-ja-en-since-Monday-no-commits", "since Monday の commits", "since Monday", "en", since(_MONDAY_PAST)),
    ("R7-ja-en-open-issues-3-gatsu-ikou", "open issues 3月以降", "3月以降", "ja", since(_MARCH_PAST)),
    ("R7-ja-en-bugs-since-senshuu", "bugs since 先週", "since 先週", "en", since(ja_week(TODAY + D(weeks=-1)))),
]


@pytest.mark.parametrize(("question", "phrase", "lang", "bounds"), [m[1:] for m in MIXED],
                         ids=[m[0] for m in MIXED])
def test_a_question_mixing_japanese_and_english_finds_the_phrase_in_either(question, phrase, lang, bounds):
    m = one(question, languages=("ja", "en"))
    assert (m.text, m.lang, (m.start, m.end)) == (phrase, lang, bounds)
    assert question[m.char_start : m.char_end] == phrase


def test_a_german_connective_before_a_japanese_phrase() -> None:
    # "tickets von 先週": German "von" (from) joins the Japanese phrase it stands before.
    m = one("tickets von 先週", languages=("ja", "de", "en"))
    assert (m.text, (m.start, m.end)) == ("von 先週", ja_week(TODAY + D(weeks=-1)))


def test_a_japanese_and_an_english_phrase_in_one_question_are_both_found() -> None:
    result = run("deploys this weekend それとも来週末", languages=("ja", "en"))
    assert [(m.text, m.lang) for m in result.mentions] == [("this weekend", "en"), ("来週末", "ja")]


# --- every language at once ---------------------------------------------------------------------

#: Japanese questions whose phrases Chinese writes alike, read with every deep language enabled:
#: kana in the question make the Japanese reading win (locales/ja.toml ``marks``).
SHARED_WITH_CHINESE = [
    ("R10-ja-all-2025-nen-izen-takes-the-year-in", "2025年以前のチケット", "2025年以前", until(year(2025))),
    ("R10-ja-all-3-gatsu-izen", "3月以前のバグ", "3月以前", until(_MARCH_PAST)),
    ("R2-ja-all-kotoshi", "今年のバグ", "今年", year(2026)),
]


@pytest.mark.parametrize(("question", "phrase", "bounds"), [c[1:] for c in SHARED_WITH_CHINESE],
                         ids=[c[0] for c in SHARED_WITH_CHINESE])
def test_kana_make_a_phrase_written_alike_in_chinese_japanese(question, phrase, bounds):
    m = one(question, languages="all")
    assert (m.text, m.lang, (m.start, m.end)) == (phrase, "ja", bounds)


@pytest.mark.parametrize("question", ["2025年度の予算", "前年比の売上", "今回のリリース"])
def test_a_japanese_look_alike_stays_one_with_every_language(question):
    assert run(question, languages="all").mentions == ()


# --- look-alikes (reading N) -------------------------------------------------------------------

TRAPS = [
    ("N-ja-nichi-in-nihon", "日本チームのバグ"),
    ("N-ja-konkai", "今回のリリース"),
    ("N-ja-kondo-no-kaigi", "今度の会議で話す"),
    ("N-ja-imasara", "今更だけど"),
    ("N-ja-kongo-no-yotei", "今後の予定"),
    ("N-ja-ima-no-tokoro", "今のところ問題なし"),
    ("N-ja-getsugaku", "月額料金のバグ"),
    ("N-ja-maishuu-getsuyoubi", "毎週月曜日の定例"),
    ("N-ja-mainichi", "毎日のビルド"),
    ("N-ja-maitsuki", "毎月のレポート"),
    ("N-ja-kakushuu", "隔週の同期会"),
    ("N-ja-ichinichijuu", "一日中会議"),
    ("N-ja-mikka-bouzu", "三日坊主"),
    ("N-ja-kingaku", "金額のバグ"),
    ("N-ja-nenmatsu-chousei", "年末調整"),
    ("N-ja-getsumatsu", "月末の締め"),
    ("N-ja-konnendo-fiscal-year", "今年度の予算"),
    ("N-ja-sakunendo-fiscal-year", "昨年度の実績"),
    ("N-ja-2025-nendo-fiscal-year", "2025年度の予算"),
    ("N-ja-nichiyou-daiku", "日曜大工"),
    ("N-ja-Asuka-name", "明日香のチケット"),
    ("N-ja-Kyouko-name", "今日子さんのレビュー"),
    ("N-ja-asahi", "朝日新聞"),
    ("N-ja-choukai", "朝会の議事録"),
    ("N-ja-yakan-batch", "夜間バッチ"),
    ("N-ja-hiruyasumi", "昼休み"),
    ("N-ja-shuukan-report", "週刊レポート"),
    ("N-ja-tokidoki", "時々落ちる"),
    ("N-ja-jikan-ga-nai", "時間がない"),
    ("N-ja-ichijiteki", "一時的な問題"),
    ("N-ja-sagyou-jikan", "作業時間の記録"),
    ("N-ja-yuusendo-2", "優先度2のチケット"),
    ("N-ja-version-2025.1", "バージョン2025.1のバグ"),
    ("N-ja-top-10", "トップ10の担当者"),
    ("N-ja-5-points", "5ポイントのタスク"),
    ("N-ja-ticket-2025", "チケット2025の担当者"),
    ("N-ja-bangou-2024", "番号2024のチケット"),
    ("N-ja-dai-2-han", "第2版の仕様"),
    ("N-ja-futari", "二人で対応"),
    ("N-ja-24-jikan-taiou", "24時間対応のサポート"),
    ("N-ja-24-jikan-taisei", "24時間体制"),
    ("N-ja-bunseki", "分析の結果"),
    ("N-ja-jibun", "自分のタスク"),
    ("N-ja-zenkai", "前回の会議"),
    ("N-ja-zenhan", "前半の議題"),
    ("N-ja-senjitsu", "先日の件"),
    ("N-ja-raikyaku", "来客対応"),
    ("N-ja-hizuke", "日付が空"),
    ("N-ja-shuumatsu-taiou-alone", "週末対応"),
    ("N-ja-zennenhi", "前年比"),
    ("N-ja-version-english", "version 1.2.2020 のクラッシュ"),
    ("N-ja-3-ka-ijou", "3日以上放置されたバグ"),
]


@pytest.mark.parametrize(("question",), [(q,) for _, q in TRAPS], ids=[i for i, _ in TRAPS])
def test_a_japanese_look_alike_gives_no_temporal_mention(question):
    result = run(question, languages=("ja", "en"))
    assert result.mentions == ()
    assert result.rewritten == question


def test_there_are_at_least_twenty_five_japanese_traps():
    assert len(TRAPS) >= 25
    assert len({q for _, q in TRAPS}) == len(TRAPS)


PAIRS = [
    ("N-ja-nihon-vs-3-ka-mae", "日本チームのバグ", "3日前のバグ", "3日前"),
    ("N-ja-konkai-vs-kongetsu", "今回のリリース", "今月のリリース", "今月"),
    ("N-ja-kongo-no-yotei-vs-kongo-3-kakan", "今後の予定", "今後3日間の予定", "今後3日間"),
    ("N-ja-maishuu-getsuyoubi-vs-getsuyoubi", "毎週月曜日の定例", "月曜日の定例", "月曜日"),
    ("N-ja-yuusendo-2-vs-2-ka-mae", "優先度2のチケット", "2日前のチケット", "2日前"),
    ("N-ja-ticket-2025-vs-2025-nen", "チケット2025の担当者", "2025年の担当者", "2025年"),
    ("N-ja-konnendo-vs-kotoshi", "今年度の予算", "今年の予算", "今年"),
    ("N-ja-Asuka-vs-ashita", "明日香のチケット", "明日のチケット", "明日"),
    ("N-ja-nichiyou-daiku-vs-nichiyoubi", "日曜大工", "日曜日の作業", "日曜日"),
    ("N-ja-24-jikan-taiou-vs-24-jikan-inai", "24時間対応のサポート", "24時間以内のサポート", "24時間以内"),
]


@pytest.mark.parametrize(("trap", "temporal", "phrase"), [p[1:] for p in PAIRS], ids=[p[0] for p in PAIRS])
def test_the_same_japanese_word_is_a_time_word_only_where_the_question_makes_it_one(trap, temporal, phrase):
    assert run(trap).mentions == ()
    assert one(temporal).text == phrase


MIXED_TRAPS = [
    ("N-ja-nihon-beside-senshuu", "日本チームの先週のバグ", "先週"),
    ("N-ja-konkai-beside-raishuu-kara", "今回のリリースは来週から", "来週から"),
    ("N-ja-yuusendo-beside-senshuu-kara", "優先度2のチケット、先週から", "先週から"),
    ("N-ja-version-beside-3-gatsu", "バージョン2025.1のバグは3月に修正", "3月"),
    ("N-ja-top-10-beside-kon-shihanki", "トップ10の担当者、今四半期", "今四半期"),
    ("N-ja-maishuu-beside-kinou", "毎週の定例で昨日のバグ", "昨日"),
    ("N-ja-konnendo-beside-sengetsu", "今年度の予算で先月の支出", "先月"),
    ("N-ja-zenkai-beside-3-ka-go", "前回の会議から3日後", "3日後"),
]


@pytest.mark.parametrize(("question", "phrase"), [m[1:] for m in MIXED_TRAPS], ids=[m[0] for m in MIXED_TRAPS])
def test_a_japanese_look_alike_beside_a_time_phrase_stays_out_of_the_mention(question, phrase):
    m = one(question)
    assert m.text == phrase
    assert question[m.char_start : m.char_end] == phrase
