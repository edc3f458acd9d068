"""Checked against:
- python-dateutil ``relativedelta``: weekday steps, day, week, month and year arithmetic with
  month-end clamping; stdlib ``calendar.monthrange``/``calendar.isleap``;
- ISO 8601 week dates via stdlib ``date.fromisocalendar``;
- CLDR 49 via babel 2.19: the Chinese day-period names and rules (``Locale("zh").day_periods``
  and ``day_period_rules``: 凌晨 00:00-05:00, 早上 05:00-08:00, 上午 08:00-12:00, 中午
  12:00-13:00, 下午 13:00-19:00, 晚上 19:00-24:00), the week data of ``zh`` (``first_week_day``,
  ``weekend_start``/``weekend_end``) and the order of numeric dates
  (``babel.dates.get_date_format("short", locale="zh")``: y/M/d, year first);
- the IANA tz database via stdlib zoneinfo + tzdata (Berlin daylight-saving changes; Shanghai
  keeps UTC+08:00 all year);
- the questions and phrases are written from knowledge of the language (no published source);
- common practice (no published source): "上周一" / "下周四" name that day of last / next week
  (locales/zh.toml ``weekday_reading = "week"``); "3月之前" ends before March and "截至周五"
  takes Friday in; "从3月到5月" and "3月和5月之间" take both ends in; "三个月" is three months
  but "3月" is March; "每周一" (every Monday) names no one day.

Chinese (Simplified): worked examples for every reading R1-R23 and D, the policies, numeric
dates in the CLDR order of ``zh``, questions mixing Chinese and English, and look-alike words
(reading N).
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

SHANGHAI = ZoneInfo("Asia/Shanghai")
D = relativedelta
WEEKDAYS = (MO, TU, WE, TH, FR, SA, SU)
LANGS = ("zh",)

# --- clocks (fixed; NOW is Wednesday 2026-12-02 10:00 in Berlin) ------------------------------
SATURDAY = datetime(2026, 12, 5, 10, 0, tzinfo=BERLIN)
SUNDAY = datetime(2026, 12, 6, 10, 0, tzinfo=BERLIN)
MONDAY_AFTER = datetime(2026, 12, 7, 10, 0, tzinfo=BERLIN)
MONTH_END = datetime(2026, 3, 31, 10, 0, tzinfo=BERLIN)
MAY_END = datetime(2026, 5, 31, 10, 0, tzinfo=BERLIN)
JANUARY_END = datetime(2026, 1, 31, 10, 0, tzinfo=BERLIN)
LEAP_DAY = datetime(2028, 2, 29, 10, 0, tzinfo=BERLIN)
MID_JANUARY = datetime(2027, 1, 15, 10, 0, tzinfo=BERLIN)
BEFORE_LEAP_DAY = datetime(2027, 2, 1, 10, 0, tzinfo=BERLIN)
#: Berlin clocks went 02:00 -> 03:00 on 2026-03-29 (tzdata).
SPRING_BERLIN = datetime(2026, 3, 29, 12, 0, tzinfo=BERLIN)
MORNING_SPRING_BERLIN = datetime(2026, 3, 29, 10, 0, tzinfo=BERLIN)
BEFORE_SPRING_BERLIN = datetime(2026, 3, 28, 12, 0, tzinfo=BERLIN)
QUARTER_PAST = datetime(2026, 12, 2, 10, 17, tzinfo=BERLIN)
#: Wednesday 2 December 2026, 10:00 in Shanghai; Sunday 1 March 2026, 10:00 in Shanghai.
SHANGHAI_NOW = datetime(2026, 12, 2, 10, 0, tzinfo=SHANGHAI)
SHANGHAI_MARCH_FIRST = datetime(2026, 3, 1, 10, 0, tzinfo=SHANGHAI)

_ZH = Locale.parse("zh")
_ZH_RULES = _ZH.day_period_rules[None]
_CAL = "window_reading=calendar"
_ROLL = "window_reading=rolling"
_FUT = "bias=future"
_PAST = "bias=past"
_WEEK = "weekday_reading=week"
_NEAREST = "weekday_reading=nearest"


# --- oracles for Chinese ----------------------------------------------------------------------


def period_id(name: str) -> str:
    """The CLDR 49 day-period id whose Chinese name (format, wide or abbreviated) is ``name``,
    from babel's ``Locale("zh").day_periods``."""
    for width in ("wide", "abbreviated"):
        for pid, text in _ZH.day_periods["format"][width].items():
            if text == name and pid not in ("am", "pm", "midnight", "noon"):
                return pid
    raise KeyError(name)


def period(d: date, name: str, tz: ZoneInfo = BERLIN) -> tuple[str, str]:
    """The CLDR 49 Chinese day period named ``name`` on local date ``d``, from babel's
    ``Locale("zh").day_period_rules`` (seconds after local midnight)."""
    rule = _ZH_RULES[period_id(name)][0]
    base = midnight(d, tz)
    return iso(base + timedelta(seconds=rule["from"])), iso(base + timedelta(seconds=rule["before"]))  # type: ignore[return-value]


def zh_weekend() -> tuple[Any, int]:
    """First weekend day and number of weekend days of ``zh`` (CLDR week data via babel)."""
    return WEEKDAYS[_ZH.weekend_start], (_ZH.weekend_end - _ZH.weekend_start) % 7 + 1


def weekend(first: date) -> tuple[str, str]:
    return span(first, first + D(days=zh_weekend()[1]))


def weekend_value(first: date) -> str:
    return f"{first.isoformat()}/P{zh_weekend()[1]}D"


def last_ended_weekend(today: date) -> date:
    first, length = zh_weekend()
    return today + D(days=-length, weekday=first(-1))


def first_open_weekend(today: date) -> date:
    first, length = zh_weekend()
    return today + D(days=-(length - 1), weekday=first(+1))


_ZH_FIRST = WEEKDAYS[_ZH.first_week_day]


def zh_week(d: date) -> tuple[str, str]:
    """The week holding ``d``, starting on the CLDR first day of the week of ``zh``."""
    return week(d, _ZH_FIRST)


def zh_order() -> str:
    """The order of the fields in the CLDR short date format of ``zh`` ("YMD")."""
    pattern = get_date_format("short", locale="zh").pattern
    return "".join(sorted("YMD", key=lambda f: pattern.index({"Y": "y", "M": "M", "D": "d"}[f])))


# --- tables -----------------------------------------------------------------------------------


def case(id: str, question: str, phrase: str, reading: str, bounds: tuple[str | None, str | None],
         value: str | None = None, alts: tuple = (), **context: Any) -> Any:
    return pytest.param(question, phrase, reading, bounds, value, alts, context, id=id)


def run(question: str, **context: Any):  # type: ignore[no-untyped-def]
    now = context.pop("now", NOW)
    fields = {"languages": LANGS, "locale": "zh", **context}
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
    assert m.lang in ("zh", "und")
    assert m.reading == reading
    assert (m.start, m.end) == bounds
    if value is not None:
        assert m.value == value
    assert tuple((a.reading, a.policy, a.start, a.end) for a in m.alternatives) == alts


PARAMS = ("question", "phrase", "reading", "bounds", "value", "alts", "context")

R1 = [
    case("R1-zh-jintian", "今天关闭了哪些bug？", "今天", "R1", day(TODAY), TODAY.isoformat()),
    case("R1-zh-zuotian", "昨天谁提交了代码？", "昨天", "R1", day(TODAY + D(days=-1)),
         (TODAY + D(days=-1)).isoformat()),
    case("R1-zh-mingtian", "明天到期的任务有哪些？", "明天", "R1", day(TODAY + D(days=1))),
    case("R1-zh-qiantian", "前天重新打开的工单", "前天", "R1", day(TODAY + D(days=-2))),
    case("R1-zh-houtian", "后天发布什么？", "后天", "R1", day(TODAY + D(days=2))),
    case("R1-zh-daqiantian", "大前天的评论", "大前天", "R1", day(TODAY + D(days=-3))),
    case("R1-zh-jinri-dashboard", "今日新增的bug", "今日", "R1", day(TODAY)),
    case("R1-zh-zuotian-Shanghai-across-a-month-start", "昨天谁评论了？", "昨天", "R1",
         day(SHANGHAI_MARCH_FIRST.date() + D(days=-1), SHANGHAI), "2026-02-28",
         now=SHANGHAI_MARCH_FIRST),
]

R2 = [
    case("R2-zh-shangzhou", "上周创建了哪些bug？", "上周", "R2", zh_week(TODAY + D(weeks=-1)),
         iso_week_name(TODAY + D(weeks=-1))),
    case("R2-zh-benzhou", "本周关闭了多少工单？", "本周", "R2", zh_week(TODAY), iso_week_name(TODAY)),
    case("R2-zh-zhezhou", "这周创建的工单", "这周", "R2", zh_week(TODAY)),
    case("R2-zh-xiazhou", "下周计划了什么？", "下周", "R2", zh_week(TODAY + D(weeks=1))),
    case("R2-zh-tuichi-dao-xiazhou-within-word-joins", "推迟到下周的任务", "到下周", "R2",
         zh_week(TODAY + D(weeks=1))),
    case("R2-zh-chuangjian-yu-shangzhou-within-word-joins", "创建于上周的工单", "于上周", "R2",
         zh_week(TODAY + D(weeks=-1))),
    case("R2-zh-shangge-xingqi", "上个星期的bug", "上个星期", "R2", zh_week(TODAY + D(weeks=-1))),
    case("R2-zh-xiage-libai", "下个礼拜的评审", "下个礼拜", "R2", zh_week(TODAY + D(weeks=1))),
    case("R2-zh-shanggeyue-at-a-month-end", "上个月修复了哪些bug？", "上个月", "R2",
         month_of(MONTH_END.date() + D(months=-1)), "2026-02", now=MONTH_END),
    case("R2-zh-shangyue", "上月关闭的bug", "上月", "R2", month_of(TODAY + D(months=-1)), "2026-11"),
    case("R2-zh-zhegeyue", "这个月修复的bug", "这个月", "R2", month_of(TODAY), "2026-12"),
    case("R2-zh-benjidu", "本季度谁关闭的工单最多？", "本季度", "R2", quarter_of(TODAY), "2026-Q4"),
    case("R2-zh-shangge-jidu", "上个季度的速度", "上个季度", "R2", quarter_of(TODAY + D(months=-3)),
         "2026-Q3"),
    case("R2-zh-qunian", "去年的事故", "去年", "R2", year(TODAY.year - 1), "2025"),
    case("R2-zh-mingnian", "明年计划的史诗", "明年", "R2", year(TODAY.year + 1), "2027"),
    case("R2-zh-shangzhou-sunday-weeks-on-a-Sunday", "上周关闭的工单", "上周", "R2",
         week(SUNDAY.date() + D(weeks=-1), SU), "2026-11-29/P1W", now=SUNDAY, week_start="sunday"),
]

R3 = [
    case("R3-zh-3-tian-qian", "3天前打开的bug", "3天前", "R3", day(TODAY + D(days=-3))),
    case("R3-zh-liang-zhou-qian", "两周前打开的bug", "两周前", "R3", zh_week(TODAY + D(weeks=-2)),
         iso_week_name(TODAY + D(weeks=-2))),
    case("R3-zh-sange-xingqi-qian", "三个星期前的提交", "三个星期前", "R3", zh_week(TODAY + D(weeks=-3))),
    case("R3-zh-yigeyue-qian-at-a-month-end", "一个月前合并的PR", "一个月前", "R3",
         month_of((MONTH_END + D(months=-1)).date()), "2026-02", now=MONTH_END),
    case("R3-zh-sangeyue-zhiqian-at-a-month-end", "三个月之前合并的PR", "三个月之前", "R3",
         month_of((MAY_END + D(months=-3)).date()), "2026-02", now=MAY_END),
    case("R3-zh-2-ge-jidu-qian", "2个季度前的速度", "2个季度前", "R3", quarter_of(TODAY + D(months=-6)),
         "2026-Q2"),
    case("R3-zh-1-nian-qian", "1年前未解决的bug", "1年前", "R3", year(TODAY.year - 1), "2025"),
    case("R3-zh-liang-xiaoshi-qian", "两小时前的告警", "两小时前", "R3", hour_of(moved(NOW, hours=-2))),
    case("R3-zh-5-fenzhong-qian", "5分钟前开始的构建", "5分钟前", "R3",
         (elapsed(NOW, minutes=-5), elapsed(NOW, minutes=-4))),
    case("R3-zh-ban-xiaoshi-qian", "半小时前的告警", "半小时前", "R3",
         (elapsed(NOW, minutes=-30), elapsed(NOW, minutes=-29))),
    case("R3-zh-bannian-qian", "半年前的bug", "半年前", "R3", month_of((NOW + D(months=-6)).date())),
    case("R3-zh-qiannian", "前年的事故", "前年", "R3", year(TODAY.year - 2), "2024"),
    case("R3-zh-shangshangzhou", "上上周的bug", "上上周", "R3", zh_week(TODAY + D(weeks=-2))),
    case("R3-zh-24-xiaoshi-qian-across-DST", "24小时前的告警", "24小时前", "R3",
         hour_of(moved(SPRING_BERLIN, hours=-24)), now=SPRING_BERLIN),
]

R4 = [
    case("R4-zh-3-tian-hou", "3天后到期的任务", "3天后", "R4", day(TODAY + D(days=3))),
    case("R4-zh-liang-zhou-hou", "两周后到期的任务", "两周后", "R4", zh_week(TODAY + D(weeks=2)),
         iso_week_name(TODAY + D(weeks=2))),
    case("R4-zh-yigeyue-hou-from-January-31", "一个月后续订的合同", "一个月后", "R4",
         month_of((JANUARY_END + D(months=1)).date()), "2026-02", now=JANUARY_END),
    case("R4-zh-2-xiaoshi-hou", "2小时后运行的任务", "2小时后", "R4", hour_of(moved(NOW, hours=2))),
    case("R4-zh-san-tian-yihou", "三天以后上线", "三天以后", "R4", day(TODAY + D(days=3))),
    case("R4-zh-hounian", "后年的计划", "后年", "R4", year(TODAY.year + 2), "2028"),
    case("R4-zh-xiaxiazhou", "下下周的计划", "下下周", "R4", zh_week(TODAY + D(weeks=2))),
    case("R4-zh-24-xiaoshi-hou-across-DST", "24小时后运行的任务", "24小时后", "R4",
         hour_of(moved(BEFORE_SPRING_BERLIN, hours=24)), now=BEFORE_SPRING_BERLIN),
]

_THIS_MONTH = TODAY.replace(day=1)
_THIS_WEEK = week_start(TODAY)

R5 = [
    case("R5-zh-guoqu-san-tian", "过去三天的bug", "过去三天", "R5", (wall(NOW, days=-3), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, TODAY, 3, "days")),)),
    case("R5-zh-zuijin-3-tian", "最近3天的bug", "最近3天", "R5", (wall(NOW, days=-3), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, TODAY, 3, "days")),)),
    case("R5-zh-jin-7-tian", "近7天新建的工单", "近7天", "R5", (wall(NOW, days=-7), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, TODAY, 7, "days")),)),
    case("R5-zh-guoqu-liang-zhou", "过去两周的bug", "过去两周", "R5", (wall(NOW, weeks=-2), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, _THIS_WEEK, 2, "weeks")),)),
    case("R5-zh-zai-guoqu-de-3-tian-li", "在过去的3天里关闭的bug", "在过去的3天里", "R5",
         (wall(NOW, days=-3), iso(NOW)), alts=(alt("R5", _CAL, _cal_back(NOW, TODAY, 3, "days")),)),
    case("R5-zh-zuijin-yigeyue-at-a-month-end", "最近一个月的评论", "最近一个月", "R5",
         (wall(MONTH_END, months=-1), iso(MONTH_END)),
         alts=(alt("R5", _CAL, _cal_back(MONTH_END, date(2026, 3, 1), 1, "months")),), now=MONTH_END),
    case("R5-zh-guoqu-3-geyue", "过去3个月关闭的工单", "过去3个月", "R5", (wall(NOW, months=-3), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, _THIS_MONTH, 3, "months")),)),
    case("R5-zh-guoqu-bannian", "过去半年的bug", "过去半年", "R5", (wall(NOW, months=-6), iso(NOW)),
         alts=(alt("R5", _CAL, _cal_back(NOW, _THIS_MONTH, 6, "months")),)),
    case("R5-zh-guoqu-liang-nian-from-a-leap-day", "过去两年的事故", "过去两年", "R5",
         (wall(LEAP_DAY, years=-2), iso(LEAP_DAY)),
         alts=(alt("R5", _CAL, _cal_back(LEAP_DAY, date(2028, 1, 1), 2, "years")),), now=LEAP_DAY),
    case("R5-zh-guoqu-24-xiaoshi-is-24-real-hours-Berlin-spring", "过去24小时的错误", "过去24小时",
         "R5", (elapsed(SPRING_BERLIN, hours=-24), iso(SPRING_BERLIN)), now=SPRING_BERLIN),
    case("R5-zh-zuijin-liang-xiaoshi-off-the-hour", "最近两小时的部署", "最近两小时", "R5",
         (elapsed(QUARTER_PAST, hours=-2), iso(QUARTER_PAST)),
         alts=(alt("R5", _CAL, (elapsed(floor_hour(QUARTER_PAST), hours=-2), iso(floor_hour(QUARTER_PAST)))),),
         now=QUARTER_PAST),
    case("R5-zh-guoqu-7-tian-Shanghai", "过去7天的bug", "过去7天", "R5",
         (wall(SHANGHAI_NOW, days=-7), iso(SHANGHAI_NOW)),
         alts=(alt("R5", _CAL, _cal_back(SHANGHAI_NOW, SHANGHAI_NOW.date(), 7, "days")),),
         now=SHANGHAI_NOW),
    case("R5-zh-calendar-policy-reads-whole-days", "过去7天的bug", "过去7天", "R5",
         _cal_back(NOW, TODAY, 7, "days"), alts=(alt("R5", _ROLL, (wall(NOW, days=-7), iso(NOW))),),
         window_reading="calendar"),
]

R6 = [
    case("R6-zh-weilai-san-tian", "未来三天到期的任务", "未来三天", "R6", (iso(NOW), wall(NOW, days=3)),
         alts=(alt("R6", _CAL, _cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-zh-jiexialai-de-liang-zhou", "接下来的两周要做什么？", "接下来的两周", "R6",
         (iso(NOW), wall(NOW, weeks=2)), alts=(alt("R6", _CAL, _cal_ahead(NOW, _THIS_WEEK, 2, "weeks")),)),
    case("R6-zh-weilai-6-xiaoshi", "未来6小时安排的任务", "未来6小时", "R6",
         (iso(NOW), elapsed(NOW, hours=6)),
         alts=(alt("R6", _CAL, (elapsed(floor_hour(NOW), hours=1), elapsed(floor_hour(NOW), hours=7))),)),
    case("R6-zh-3-tian-nei", "3天内修复", "3天内", "R6", (iso(NOW), wall(NOW, days=3)),
         alts=(alt("R6", _CAL, _cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-zh-weilai-yigeyue", "未来一个月上线的功能", "未来一个月", "R6", (iso(NOW), wall(NOW, months=1)),
         alts=(alt("R6", _CAL, _cal_ahead(NOW, _THIS_MONTH, 1, "months")),)),
    case("R6-zh-bannian-nei", "半年内的回归测试", "半年内", "R6", (iso(NOW), wall(NOW, months=6)),
         alts=(alt("R6", _CAL, _cal_ahead(NOW, _THIS_MONTH, 6, "months")),)),
    case("R6-zh-calendar-policy-reads-whole-days", "未来三天到期的任务", "未来三天", "R6",
         _cal_ahead(NOW, TODAY, 3, "days"), alts=(alt("R6", _ROLL, (iso(NOW), wall(NOW, days=3))),),
         window_reading="calendar"),
]

_MARCH_PAST = month(most_recent_year(lambda y: date(y, 3, 1)), 3)
_MARCH_NEXT = month(next_year_after(lambda y: date(y, 4, 1)), 3)
_MONDAY_PAST = day(on_or_before(TODAY, MO))
_MONDAY_NEXT = day(on_or_after(TODAY, MO))

R7 = [
    case("R7-zh-zi-shangzhou-yilai", "自上周以来我们发布了什么？", "自上周以来", "R7",
         since(zh_week(TODAY + D(weeks=-1))), "2026-11-23/.."),
    case("R7-zh-zicong-3-yue-yilai", "自从3月以来关闭的bug", "自从3月以来", "R7", since(_MARCH_PAST),
         "2026-03-01/..", alts=(alt("R7", _FUT, since(_MARCH_NEXT)),)),
    case("R7-zh-cong-shangzhou-qi", "从上周起的bug", "从上周起", "R7", since(zh_week(TODAY + D(weeks=-1)))),
    case("R7-zh-cong-3-yue-kaishi", "从3月开始的bug", "从3月开始", "R7", since(_MARCH_PAST),
         alts=(alt("R7", _FUT, since(_MARCH_NEXT)),)),
    case("R7-zh-2024-nian-yilai", "2024年以来打开的工单", "2024年以来", "R7", since(year(2024)),
         "2024-01-01/.."),
    case("R7-zh-cong-jinnian-3-yue-qi", "从今年3月起一直没人处理的bug", "从今年3月起", "R7",
         since(month(TODAY.year, 3)), "2026-03-01/.."),
    case("R7-zh-shangzhou-yilai", "上周以来的提交", "上周以来", "R7", since(zh_week(TODAY + D(weeks=-1)))),
    case("R7-zh-zi-zhouyi-yilai", "自周一以来的提交", "自周一以来", "R7", since(_MONDAY_PAST),
         alts=(alt("R7", _FUT, since(_MONDAY_NEXT)),)),
    case("R7-zh-cong-ISO-date-qi", "从2025-03-14起的部署", "从2025-03-14起", "R7",
         since(day(date(2025, 3, 14))), "2025-03-14/.."),
]

R8 = [
    case("R8-zh-3-yue-yihou", "3月以后打开的bug", "3月以后", "R8", after(_MARCH_PAST), "2026-04-01/..",
         alts=(alt("R8", _FUT, after(_MARCH_NEXT)),)),
    case("R8-zh-2025-nian-zhihou", "2025年之后到期的工单", "2025年之后", "R8", after(year(2025))),
    case("R8-zh-shangzhou-zhihou", "上周之后重新打开的", "上周之后", "R8", after(zh_week(TODAY + D(weeks=-1)))),
    case("R8-zh-zuotian-yihou", "昨天以后的评论", "昨天以后", "R8", after(day(TODAY + D(days=-1)))),
    case("R8-zh-ISO-date-zhihou", "2025-03-14之后修复的", "2025-03-14之后", "R8",
         after(day(date(2025, 3, 14)))),
]

R9 = [
    case("R9-zh-3-yue-zhiqian", "3月之前打开的bug", "3月之前", "R9", before(_MARCH_PAST), "../2026-02-28",
         alts=(alt("R9", _FUT, before(_MARCH_NEXT)),)),
    case("R9-zh-2025-nian-yiqian", "2025年以前关闭的工单", "2025年以前", "R9", before(year(2025))),
    case("R9-zh-shangzhou-zhiqian", "上周之前就过期的", "上周之前", "R9", before(zh_week(TODAY + D(weeks=-1)))),
    case("R9-zh-zuotian-zhiqian", "昨天之前的评论", "昨天之前", "R9", before(day(TODAY + D(days=-1)))),
]

R10 = [
    case("R10-zh-jiezhi-zhouwu-deadline-looks-ahead", "截至周五必须修复的", "截至周五", "R10",
         until(day(on_or_after(TODAY, FR))), alts=(alt("R10", None, until(day(on_or_before(TODAY, FR)))),)),
    case("R10-zh-dao-zhouwu-weizhi", "到周五为止计划的工作", "到周五为止", "R10",
         until(day(on_or_after(TODAY, FR))), alts=(alt("R10", None, until(day(on_or_before(TODAY, FR)))),)),
    case("R10-zh-jiezhidao-xiazhou", "截止到下周的bug", "截止到下周", "R10", until(zh_week(TODAY + D(weeks=1)))),
    case("R10-zh-zhidao-mingtian", "直到明天值班", "直到明天", "R10", until(day(TODAY + D(days=1)))),
    case("R10-zh-jiezhi-2025-nian", "截至2025年的事故", "截至2025年", "R10", until(year(2025))),
]

R11 = [
    case("R11-zh-cong-3-yue-dao-5-yue", "从3月到5月的bug", "从3月到5月", "R11",
         joined(month(2026, 3), month(2026, 5)), "2026-03-01/2026-05-31",
         alts=(alt("R11", _FUT, joined(month(2027, 3), month(2027, 5))),)),
    case("R11-zh-3-yue-dao-5-yue", "3月到5月的bug", "3月到5月", "R11", joined(month(2026, 3), month(2026, 5)),
         alts=(alt("R11", _FUT, joined(month(2027, 3), month(2027, 5))),)),
    case("R11-zh-cong-1-yue-zhi-3-yue", "从1月至3月的速度", "从1月至3月", "R11",
         joined(month(2026, 1), month(2026, 3)), alts=(alt("R11", _FUT, joined(month(2027, 1), month(2027, 3))),)),
    case("R11-zh-cong-11-yue-dao-2-yue-ends-next-year", "从11月到2月的值班", "从11月到2月", "R11",
         joined(month(2026, 11), month(2027, 2)), alts=(alt("R11", _FUT, joined(month(2027, 11), month(2028, 2))),)),
    case("R11-zh-3-yue-1-ri-dao-15-ri", "3月1日到15日的bug", "3月1日到15日", "R11",
         joined(day(date(2026, 3, 1)), day(date(2026, 3, 15))),
         alts=(alt("R11", _FUT, joined(day(date(2027, 3, 1)), day(date(2027, 3, 15)))),)),
    case("R11-zh-3-yue-1-ri-zhi-15-hao", "3月1日至15号的bug", "3月1日至15号", "R11",
         joined(day(date(2026, 3, 1)), day(date(2026, 3, 15))),
         alts=(alt("R11", _FUT, joined(day(date(2027, 3, 1)), day(date(2027, 3, 15)))),)),
    case("R11-zh-full-dates", "从2025年1月1日到2025年3月31日的支出", "从2025年1月1日到2025年3月31日", "R11",
         joined(day(date(2025, 1, 1)), day(date(2025, 3, 31))), "2025-01-01/2025-03-31"),
    case("R11-zh-ISO-dates-dao", "2025-01-01到2025-03-31的支出", "2025-01-01到2025-03-31", "R11",
         joined(day(date(2025, 1, 1)), day(date(2025, 3, 31)))),
    case("R11-zh-cong-shangzhou-dao-benzhou", "从上周到本周的bug", "从上周到本周", "R11",
         joined(zh_week(TODAY + D(weeks=-1)), zh_week(TODAY))),
    case("R11-zh-cong-di-yi-jidu-dao-di-san-jidu", "从第一季度到第三季度的收入", "从第一季度到第三季度", "R11",
         joined(quarter(2026, 1), quarter(2026, 3)), alts=(alt("R11", _FUT, joined(quarter(2027, 1), quarter(2027, 3))),)),
    case("R11-zh-cong-2024-nian-dao-2025-nian", "从2024年到2025年的事故", "从2024年到2025年", "R11",
         joined(year(2024), year(2025))),
    case("R11-zh-cong-qiantian-dao-jintian", "从前天到今天的编辑", "从前天到今天", "R11",
         joined(day(TODAY + D(days=-2)), day(TODAY))),
    case("R11-zh-jieyu-3-yue-he-5-yue-zhijian", "介于3月和5月之间的bug", "介于3月和5月之间", "R11",
         joined(month(2026, 3), month(2026, 5)), alts=(alt("R11", _FUT, joined(month(2027, 3), month(2027, 5))),)),
    case("R11-zh-3-yue-he-5-yue-zhijian", "3月和5月之间创建的bug", "3月和5月之间", "R11",
         joined(month(2026, 3), month(2026, 5)), alts=(alt("R11", _FUT, joined(month(2027, 3), month(2027, 5))),)),
    case("R11-zh-cong-zhouyi-dao-zhouwu", "从周一到周五的提交", "从周一到周五", "R11",
         joined(day(on_or_before(TODAY, MO)), day(on_or_before(TODAY, MO) + D(weekday=FR))),
         alts=(alt("R11", _FUT, joined(day(on_or_after(TODAY, MO)), day(on_or_after(TODAY, MO) + D(weekday=FR)))),)),
]


def _past(first_day_in: Any, today: date = TODAY) -> int:
    return most_recent_year(first_day_in, today)


def _future(end_day_in: Any, today: date = TODAY) -> int:
    return next_year_after(end_day_in, today)


def leap_day(y: int) -> date | None:
    return date(y, 2, 29) if y % 4 == 0 and (y % 100 != 0 or y % 400 == 0) else None


def after_leap_day(y: int) -> date | None:
    return date(y, 3, 1) if leap_day(y) else None


_MAR14 = (_past(lambda y: date(y, 3, 14)), _future(lambda y: date(y, 3, 15)))
_DEC3 = (_past(lambda y: date(y, 12, 3)), _future(lambda y: date(y, 12, 4)))

R12 = [
    case("R12-zh-3-yue", "3月的bug", "3月", "R12", _MARCH_PAST, "2026-03", alts=(alt("R12", _FUT, _MARCH_NEXT),)),
    case("R12-zh-3-yuefen", "3月份的bug", "3月份", "R12", _MARCH_PAST, alts=(alt("R12", _FUT, _MARCH_NEXT),)),
    case("R12-zh-sanyue-wide-name", "三月的bug", "三月", "R12", _MARCH_PAST, alts=(alt("R12", _FUT, _MARCH_NEXT),)),
    case("R12-zh-zai-3-yue", "在3月关闭的bug", "在3月", "R12", _MARCH_PAST, alts=(alt("R12", _FUT, _MARCH_NEXT),)),
    case("R12-zh-12-yue-current-month-counts", "12月的bug", "12月", "R12", month(2026, 12), "2026-12"),
    case("R12-zh-12-yue-said-in-January", "12月的bug", "12月", "R12",
         month(_past(lambda y: date(y, 12, 1), MID_JANUARY.date()), 12), "2026-12",
         alts=(alt("R12", _FUT, month(_future(lambda y: date(y + 1, 1, 1), MID_JANUARY.date()), 12)),),
         now=MID_JANUARY),
    case("R12-zh-di-san-jidu", "第三季度发布了什么？", "第三季度", "R12",
         quarter(_past(lambda y: date(y, 7, 1)), 3), "2026-Q3",
         alts=(alt("R12", _FUT, quarter(_future(lambda y: date(y, 10, 1)), 3)),)),
    case("R12-zh-san-jidu", "三季度发布了什么？", "三季度", "R12", quarter(_past(lambda y: date(y, 7, 1)), 3),
         alts=(alt("R12", _FUT, quarter(_future(lambda y: date(y, 10, 1)), 3)),)),
    case("R12-zh-Q3", "Q3发布了什么？", "Q3", "R12", quarter(_past(lambda y: date(y, 7, 1)), 3),
         alts=(alt("R12", _FUT, quarter(_future(lambda y: date(y, 10, 1)), 3)),)),
    case("R12-zh-di-si-jidu-current-quarter-counts", "第四季度的收入", "第四季度", "R12", quarter(2026, 4)),
    case("R12-zh-shangbannian", "上半年的目标", "上半年", "R12", half(_past(lambda y: date(y, 1, 1)), 1),
         "2026-H1", alts=(alt("R12", _FUT, half(_future(lambda y: date(y, 7, 1)), 1)),)),
    case("R12-zh-xiabannian-current-half-counts", "下半年的目标", "下半年", "R12", half(2026, 2), "2026-H2"),
    case("R12-zh-3-yue-14-ri", "3月14日发布的", "3月14日", "R12", day(date(_MAR14[0], 3, 14)), "2026-03-14",
         alts=(alt("R12", _FUT, day(date(_MAR14[1], 3, 14))),)),
    case("R12-zh-3-yue-14-hao", "3月14号发布的", "3月14号", "R12", day(date(_MAR14[0], 3, 14)),
         alts=(alt("R12", _FUT, day(date(_MAR14[1], 3, 14))),)),
    case("R12-zh-12-yue-2-ri-today-counts", "12月2日发布的", "12月2日", "R12", day(TODAY)),
    case("R12-zh-12-yue-3-ri-is-last-year", "12月3日发布的", "12月3日", "R12", day(date(_DEC3[0], 12, 3)),
         "2025-12-03", alts=(alt("R12", _FUT, day(date(_DEC3[1], 12, 3))),)),
    case("R12-zh-2-yue-29-ri-finds-the-last-leap-year", "2月29日发生了什么？", "2月29日", "R12",
         day(date(_past(leap_day, BEFORE_LEAP_DAY.date()), 2, 29)), "2024-02-29",
         alts=(alt("R12", _FUT, day(date(_future(after_leap_day, BEFORE_LEAP_DAY.date()), 2, 29))),),
         now=BEFORE_LEAP_DAY),
]

R13 = [
    case("R13-zh-zhouyi", "周一的bug", "周一", "R13", _MONDAY_PAST, on_or_before(TODAY, MO).isoformat(),
         alts=(alt("R13", _FUT, _MONDAY_NEXT),)),
    case("R13-zh-xingqisan-is-today", "星期三的bug", "星期三", "R13", day(TODAY)),
    case("R13-zh-libaiwu", "礼拜五关闭的bug", "礼拜五", "R13", day(on_or_before(TODAY, FR)),
         alts=(alt("R13", _FUT, day(on_or_after(TODAY, FR))),)),
    case("R13-zh-zai-zhousi", "在周四部署的", "在周四", "R13", day(on_or_before(TODAY, TH)),
         alts=(alt("R13", _FUT, day(on_or_after(TODAY, TH))),)),
    case("R13-zh-xingqitian-said-on-a-Sunday", "星期天的bug", "星期天", "R13", day(SUNDAY.date()), now=SUNDAY),
    case("R13-zh-zhouwu-daoqi-looks-ahead", "周五到期的任务", "周五", "R13", day(on_or_after(TODAY, FR)),
         alts=(alt("R13", None, day(on_or_before(TODAY, FR))),)),
    case("R13-zh-zhouyi-jiezhi-looks-ahead", "周一截止的需求", "周一", "R13", day(on_or_after(TODAY, MO)),
         alts=(alt("R13", None, day(on_or_before(TODAY, MO))),)),
    case("R13-zh-jiezhi-zhousi-looks-ahead", "截止周四的工作", "截止周四", "R10",
         until(day(on_or_after(TODAY, TH))), alts=(alt("R10", None, until(day(on_or_before(TODAY, TH)))),)),
    case("R13-zh-future-bias-flips-zhouyi", "周一的bug", "周一", "R13", _MONDAY_NEXT,
         alts=(alt("R13", _PAST, _MONDAY_PAST),), bias="future"),
]

# R14 and R15 are the nearest-day readings: Chinese "上周一" / "下周四" name a day of last /
# next week (R16), so these readings come with weekday_reading=nearest.
R14 = [
    case("R14-zh-shangzhouyi-nearest", "上周一什么坏了？", "上周一", "R14", day(strictly_before(TODAY, MO)),
         alts=(alt("R16", _WEEK, day(in_week(TODAY, MO, -1))),), weekday_reading="nearest"),
    case("R14-zh-shang-xingqi-er-is-yesterday-nearest", "上星期二什么坏了？", "上星期二", "R14",
         day(strictly_before(TODAY, TU)), alts=(alt("R16", _WEEK, day(in_week(TODAY, TU, -1))),),
         weekday_reading="nearest"),
    case("R14-zh-shangzhousan-said-on-a-Wednesday-nearest", "上周三什么坏了？", "上周三", "R14",
         day(strictly_before(TODAY, WE)), weekday_reading="nearest"),
    case("R14-zh-shangge-libaisi-nearest", "上个礼拜四的部署", "上个礼拜四", "R14",
         day(strictly_before(TODAY, TH)), weekday_reading="nearest"),
    case("R14-zh-shangzhouri-said-on-a-Sunday-nearest", "上周日什么坏了？", "上周日", "R14",
         day(strictly_before(SUNDAY.date(), SU)), now=SUNDAY, weekday_reading="nearest"),
]

R15 = [
    case("R15-zh-xiazhousi-is-tomorrow-nearest", "下周四计划了什么？", "下周四", "R15",
         day(strictly_after(TODAY, TH)), alts=(alt("R16", _WEEK, day(in_week(TODAY, TH, 1))),),
         weekday_reading="nearest"),
    case("R15-zh-xiazhouyi-nearest", "下周一计划了什么？", "下周一", "R15", day(strictly_after(TODAY, MO)),
         weekday_reading="nearest"),
    case("R15-zh-xiage-xingqiwu-nearest", "下个星期五的演示", "下个星期五", "R15",
         day(strictly_after(TODAY, FR)), alts=(alt("R16", _WEEK, day(in_week(TODAY, FR, 1))),),
         weekday_reading="nearest"),
    case("R15-zh-xiazhousan-said-on-a-Wednesday-nearest", "下周三计划了什么？", "下周三", "R15",
         day(strictly_after(TODAY, WE)), weekday_reading="nearest"),
]

R16 = [
    case("R16-zh-shangzhouyi", "上周一什么坏了？", "上周一", "R16", day(in_week(TODAY, MO, -1)),
         in_week(TODAY, MO, -1).isoformat(), alts=(alt("R14", _NEAREST, day(strictly_before(TODAY, MO))),)),
    case("R16-zh-xiazhousi", "下周四计划了什么？", "下周四", "R16", day(in_week(TODAY, TH, 1)),
         alts=(alt("R15", _NEAREST, day(strictly_after(TODAY, TH))),)),
    case("R16-zh-xiazhousan-same-either-way", "下周三计划了什么？", "下周三", "R16", day(in_week(TODAY, WE, 1))),
    case("R16-zh-shang-xingqiyi", "上星期一的构建", "上星期一", "R16", day(in_week(TODAY, MO, -1)),
         alts=(alt("R14", _NEAREST, day(strictly_before(TODAY, MO))),)),
    case("R16-zh-benzhouwu", "本周五的演示", "本周五", "R16", day(in_week(TODAY, FR, 0))),
    case("R16-zh-zhezhousan", "这周三的站会", "这周三", "R16", day(in_week(TODAY, WE, 0))),
    case("R16-zh-benzhouyi-already-past", "本周一的部署", "本周一", "R16", day(in_week(TODAY, MO, 0)),
         alts=(alt("R15", None, day(on_or_after(TODAY, MO))),)),
    case("R16-zh-shangzhou-de-zhouyi", "上周的周一什么坏了？", "上周的周一", "R16", day(in_week(TODAY, MO, -1))),
    case("R16-zh-xiazhou-de-xingqiwu", "下周的星期五演示", "下周的星期五", "R16", day(in_week(TODAY, FR, 1))),
    case("R16-zh-shangzhouri-sunday-weeks", "上周日的告警", "上周日", "R16",
         day(in_week(SUNDAY.date(), SU, -1, SU)), now=SUNDAY, week_start="sunday"),
]

R17 = [
    case("R17-zh-2025-nian", "2025年的bug", "2025年", "R17", year(2025), "2025"),
    case("R17-zh-2023-niandu", "2023年度的事故", "2023年度", "R17", year(2023), "2023"),
    case("R17-zh-zai-2022-nian", "在2022年关闭的工单", "在2022年", "R17", year(2022)),
    case("R17-zh-cong-2021-nian-within", "列出优先级2的5个工单，从2021年", "从2021年", "R17", year(2021)),
]

_ZH_3_4 = date(2026, 3, 4)  # 2026/3/4 read year/month/day, the CLDR order of zh

R18 = [
    case("R18-zh-ISO-date", "2025-03-14修复的", "2025-03-14", "R18", day(date(2025, 3, 14)), "2025-03-14"),
    case("R18-zh-nian-yue-ri", "2025年3月14日修复的", "2025年3月14日", "R18", day(date(2025, 3, 14))),
    case("R18-zh-nian-yue-hao", "2025年3月14号修复的", "2025年3月14号", "R18", day(date(2025, 3, 14))),
    case("R18-zh-numeric-year-first-CLDR-order", "2026/3/4修复的", "2026/3/4", "R18", day(_ZH_3_4),
         _ZH_3_4.isoformat()),
    case("R18-zh-numeric-year-first-with-dots", "2026.3.14修复的", "2026.3.14", "R18", day(date(2026, 3, 14))),
    case("R18-zh-numeric-day-first-when-no-year-first", "04/03/2026修复的", "04/03/2026", "R18",
         day(date(2026, 3, 4)), alts=(alt("R18", "date_order=MDY", day(date(2026, 4, 3))),)),
    case("R18-zh-numeric-date-order-policy-MDY", "04/03/2026修复的", "04/03/2026", "R18",
         day(date(2026, 4, 3)), alts=(alt("R18", "date_order=DMY", day(date(2026, 3, 4))),),
         date_order="MDY"),
    case("R18-zh-numeric-only-one-valid-reading", "13/04/2026修复的", "13/04/2026", "R18",
         day(date(2026, 4, 13))),
    case("R18-zh-zai-date", "在2025年3月14日修复的", "在2025年3月14日", "R18", day(date(2025, 3, 14))),
    case("R18-zh-qunian-12-yue-3-ri", "去年12月3日修复的", "去年12月3日", "R18",
         day(date(TODAY.year - 1, 12, 3))),
    case("R18-zh-xiageyue-15-hao", "下个月15号发布的版本", "下个月15号", "R18",
         day((TODAY + D(months=1)).replace(day=15)), "2027-01-15"),
    case("R18-zh-shangyue-3-hao", "上月3号的事故", "上月3号", "R18", day((TODAY + D(months=-1)).replace(day=3))),
]

R19 = [
    case("R19-zh-2025-nian-3-yue", "2025年3月的bug", "2025年3月", "R19", month(2025, 3), "2025-03"),
    case("R19-zh-2025-nian-3-yuefen", "2025年3月份的bug", "2025年3月份", "R19", month(2025, 3)),
    case("R19-zh-2025-nian-di-san-jidu", "2025年第三季度的收入", "2025年第三季度", "R19", quarter(2025, 3),
         "2025-Q3"),
    case("R19-zh-2025-nian-san-jidu", "2025年三季度的收入", "2025年三季度", "R19", quarter(2025, 3)),
    case("R19-zh-2025-nian-q3", "2025年Q3的收入", "2025年Q3", "R19", quarter(2025, 3)),
    case("R19-zh-2026-nian-shangbannian", "2026年上半年的目标", "2026年上半年", "R19", half(2026, 1), "2026-H1"),
    case("R19-zh-2025-nian-xiabannian", "2025年下半年的目标", "2025年下半年", "R19", half(2025, 2), "2025-H2"),
    case("R19-zh-2026-nian-H1", "2026年H1的目标", "2026年H1", "R19", half(2026, 1)),
    case("R19-zh-ISO-year-month-glued", "2025-03的bug", "2025-03", "R19", month(2025, 3), "2025-03"),
    # A year CLDR names relative to now (去年, 今年, 明年) before a month, quarter or half.
    case("R19-zh-qunian-12-yue", "去年12月的事故报告", "去年12月", "R19", month(TODAY.year - 1, 12), "2025-12"),
    case("R19-zh-jinnian-di-yi-jidu", "今年第一季度关闭了多少bug？", "今年第一季度", "R19",
         quarter(TODAY.year, 1), "2026-Q1"),
    case("R19-zh-mingnian-1-yue", "明年1月的发布", "明年1月", "R19", month(TODAY.year + 1, 1)),
    case("R19-zh-qunian-xiabannian", "去年下半年的目标", "去年下半年", "R19", half(TODAY.year - 1, 2)),
]


def _recent_week(w: int, today: date = TODAY) -> int:
    return most_recent_year(lambda y: date.fromisocalendar(y, w, 1) if w < 53 else week_53_monday(y), today)


def _next_week(w: int, today: date = TODAY) -> int:
    def end(y: int) -> date | None:
        first = date.fromisocalendar(y, w, 1) if w < 53 else week_53_monday(y)
        return None if first is None else first + D(days=7)

    return next_year_after(end, today)


R20 = [
    case("R20-zh-2026-nian-di-48-zhou", "2026年第48周的工单", "2026年第48周", "R20", iso_week(2026, 48),
         "2026-W48"),
    case("R20-zh-2027-nian-di-1-zhou", "2027年第1周的工单", "2027年第1周", "R20", iso_week(2027, 1), "2027-W01"),
    case("R20-zh-jinnian-di-48-zhou", "今年第48周的工单", "今年第48周", "R20", iso_week(TODAY.year, 48)),
    case("R20-zh-ISO-2026-W48", "2026-W48的工单", "2026-W48", "R20", iso_week(2026, 48)),
    case("R20-zh-2026-nian-W48", "2026年W48的工单", "2026年W48", "R20", iso_week(2026, 48)),
    case("R20-zh-di-48-zhou-past-bias", "第48周的工单", "第48周", "R20", iso_week(_recent_week(48), 48),
         "2026-W48", alts=(alt("R20", _FUT, iso_week(_next_week(48), 48)),)),
    case("R20-zh-di-49-zhou-current-week-counts", "第49周的工单", "第49周", "R20", iso_week(2026, 49)),
    case("R20-zh-di-50-zhou-is-last-year", "第50周的工单", "第50周", "R20", iso_week(_recent_week(50), 50),
         "2025-W50", alts=(alt("R20", _FUT, iso_week(_next_week(50), 50)),)),
    case("R20-zh-di-53-zhou-finds-the-last-long-year", "第53周的工单", "第53周", "R20",
         iso_week(_recent_week(53), 53), "2020-W53", alts=(alt("R20", _FUT, iso_week(_next_week(53), 53)),)),
    case("R20-zh-W12", "W12的工单", "W12", "R20", iso_week(_recent_week(12), 12),
         alts=(alt("R20", _FUT, iso_week(_next_week(12), 12)),)),
    case("R20-zh-di-48-zhou-future-bias", "第48周的工单", "第48周", "R20", iso_week(_next_week(48), 48),
         "2027-W48", alts=(alt("R20", _PAST, iso_week(_recent_week(48), 48)),), bias="future"),
]


def _to_now(first: tuple[str, str], now: datetime = NOW) -> tuple[str, str]:
    return first[0], iso(now)  # type: ignore[return-value]


R21 = [
    case("R21-zh-jinnian-yilai", "今年以来的收入", "今年以来", "R21", _to_now(year(2026)),
         f"{year(2026)[0]}/{iso(NOW)}"),
    case("R21-zh-nianchu-zhijin", "年初至今的bug", "年初至今", "R21", _to_now(year(2026))),
    case("R21-zh-benyue-zhijin", "本月至今的支出", "本月至今", "R21", _to_now(month_of(TODAY))),
    case("R21-zh-yuechu-yilai", "月初以来的支出", "月初以来", "R21", _to_now(month_of(TODAY))),
    case("R21-zh-benjidu-yilai", "本季度以来的收入", "本季度以来", "R21", _to_now(quarter_of(TODAY))),
    case("R21-zh-benzhou-yilai-on-a-Sunday", "本周以来的提交", "本周以来", "R21",
         _to_now(zh_week(SUNDAY.date()), SUNDAY), now=SUNDAY),
]

R22 = [
    case("R22-zh-jintian-shangwu", "今天上午什么坏了？", "今天上午", "R22", period(TODAY, "上午")),
    case("R22-zh-zuotian-xiawu", "昨天下午什么坏了？", "昨天下午", "R22", period(TODAY + D(days=-1), "下午")),
    case("R22-zh-zuotian-wanshang", "昨天晚上的告警", "昨天晚上", "R22", period(TODAY + D(days=-1), "晚上")),
    case("R22-zh-zuowan", "昨晚什么坏了？", "昨晚", "R22", period(TODAY + D(days=-1), "晚上")),
    case("R22-zh-jinwan", "今晚的任务", "今晚", "R22", period(TODAY, "晚上")),
    case("R22-zh-mingwan", "明晚的发布", "明晚", "R22", period(TODAY + D(days=1), "晚上")),
    case("R22-zh-mingtian-zaoshang", "明天早上发布", "明天早上", "R22", period(TODAY + D(days=1), "早上")),
    case("R22-zh-jinzao", "今早的构建", "今早", "R22", period(TODAY, "早上")),
    case("R22-zh-jintian-lingchen", "今天凌晨的告警", "今天凌晨", "R22", period(TODAY, "凌晨")),
    case("R22-zh-jintian-zhongwu", "今天中午的部署", "今天中午", "R22", period(TODAY, "中午")),
    case("R22-zh-jintian-shangwu-on-a-DST-day-is-wall-clock", "今天上午什么坏了？", "今天上午", "R22",
         period(MORNING_SPRING_BERLIN.date(), "上午"), now=MORNING_SPRING_BERLIN),
    case("R22-zh-zuotian-xiawu-Shanghai", "昨天下午什么坏了？", "昨天下午", "R22",
         period(SHANGHAI_NOW.date() + D(days=-1), "下午", SHANGHAI), now=SHANGHAI_NOW),
]

_SAT = SATURDAY.date()

R23 = [
    case("R23-zh-zhege-zhoumo-on-a-Wednesday", "这个周末部署", "这个周末", "R23",
         weekend(first_open_weekend(TODAY)), weekend_value(first_open_weekend(TODAY))),
    case("R23-zh-shangge-zhoumo-on-a-Wednesday", "上个周末的告警", "上个周末", "R23",
         weekend(last_ended_weekend(TODAY)), weekend_value(last_ended_weekend(TODAY))),
    case("R23-zh-shang-zhoumo-on-a-Wednesday", "上周末的告警", "上周末", "R23", weekend(last_ended_weekend(TODAY))),
    case("R23-zh-xiage-zhoumo-on-a-Wednesday", "下个周末的维护", "下个周末", "R23",
         weekend(first_open_weekend(TODAY) + D(weeks=1)), alts=(alt("R23", None, weekend(first_open_weekend(TODAY))),)),
    case("R23-zh-zai-zhoumo-on-a-Wednesday", "在周末什么坏了？", "在周末", "R23",
         weekend(last_ended_weekend(TODAY)), alts=(alt("R23", _FUT, weekend(first_open_weekend(TODAY))),)),
    case("R23-zh-zai-zhoumo-future-bias", "在周末会出什么问题？", "在周末", "R23",
         weekend(first_open_weekend(TODAY)), alts=(alt("R23", _PAST, weekend(last_ended_weekend(TODAY))),),
         bias="future"),
    case("R23-zh-zhege-zhoumo-on-a-Saturday", "这个周末部署", "这个周末", "R23",
         weekend(first_open_weekend(_SAT)), now=SATURDAY),
    case("R23-zh-shangge-zhoumo-on-a-Saturday", "上个周末的告警", "上个周末", "R23",
         weekend(last_ended_weekend(_SAT)), now=SATURDAY),
    case("R23-zh-xiage-zhoumo-on-a-Saturday", "下个周末的维护", "下个周末", "R23",
         weekend(first_open_weekend(_SAT) + D(weeks=1)), now=SATURDAY),
    case("R23-zh-ben-zhoumo-on-a-Sunday", "本周末部署", "本周末", "R23",
         weekend(first_open_weekend(SUNDAY.date())), now=SUNDAY),
    case("R23-zh-shangge-zhoumo-on-a-Monday", "上个周末的告警", "上个周末", "R23",
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


def test_every_reading_has_worked_chinese_examples() -> None:
    assert sorted(TABLES, key=lambda r: int(r[1:])) == [f"R{i}" for i in range(1, 24)]
    for rid, table in TABLES.items():
        assert len(table) >= (4 if rid in DEEP else 3), rid
        assert all(p.id.startswith(f"{rid}-zh-") for p in table), rid


def test_the_clocks_and_CLDR_facts_the_tables_use() -> None:
    # stdlib date.weekday(); CLDR 49 via babel: zh weeks start on Monday, weekend
    # Saturday-Sunday, numeric dates year first; Shanghai keeps UTC+08:00 (tzdata).
    assert (NOW.weekday(), SATURDAY.weekday(), SUNDAY.weekday(), MONDAY_AFTER.weekday()) == (2, 5, 6, 0)
    assert _ZH_FIRST == MO and zh_weekend() == (SA, 2)
    assert zh_order() == "YMD"
    assert SHANGHAI_NOW.utcoffset() == SHANGHAI_MARCH_FIRST.utcoffset() == timedelta(hours=8)
    assert (period_id("上午"), period_id("下午"), period_id("晚上")) == ("morning2", "afternoon2", "evening1")


@pytest.mark.parametrize(PARAMS, _all_cases())
def test_chinese_phrase_resolves_to_its_interval(question, phrase, reading, bounds, value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, _all_cases())
def test_every_chinese_alternative_names_a_policy_that_selects_it_or_none(
        question, phrase, reading, bounds, value, alts, context):
    m = one(question, **context)
    for a in m.alternatives:
        if a.policy is None:
            continue
        key, _, setting = a.policy.partition("=")
        chosen = one(question, **{**context, key: setting})
        assert (chosen.start, chosen.end) == (a.start, a.end), a.policy


def test_the_locale_file_reads_last_weekday_as_that_day_of_last_week() -> None:
    # common practice: "上周一" is Monday of last week (stated in locales/zh.toml).
    assert load_locale("zh").meta.weekday_reading == "week"


# --- D: lengths of time after a cue -----------------------------------------------------------

DURATIONS = [
    ("D-zh-chaoguo-3-tian", "超过3天未关闭的bug", "3天", "P3D"),
    ("D-zh-chixu-liang-zhou", "持续两周的故障", "两周", "P2W"),
    ("D-zh-changda-24-xiaoshi", "评审长达24小时", "24小时", "PT24H"),
    ("D-zh-zhishao-yigeyue", "至少一个月没有更新的工单", "一个月", "P1M"),
]


@pytest.mark.parametrize(("question", "phrase", "value"), [d[1:] for d in DURATIONS],
                         ids=[d[0] for d in DURATIONS])
def test_D_a_count_of_units_after_a_cue_is_a_duration(question, phrase, value):
    # ISO 8601 durations; the cue words ("超过", "持续") stay in the question.
    m = one(question)
    assert (m.text, m.kind, m.reading, m.value) == (phrase, "duration", "D", value)
    assert m.start is None and m.end is None


def test_a_count_of_units_without_a_cue_is_no_mention() -> None:
    # "一周一次" (once a week): a bare length of time needs a cue.
    assert run("一周一次的发布").mentions == ()


# --- policies ---------------------------------------------------------------------------------

POLICY_FLIPS = [
    ("R12-zh-bias-future-3-yue", "3月的bug", {}, ("bias", "future", "past")),
    ("R12-zh-bias-future-12-yue-3-ri", "12月3日发布的", {}, ("bias", "future", "past")),
    ("R13-zh-bias-future-zhouyi", "周一的bug", {}, ("bias", "future", "past")),
    ("R20-zh-bias-future-di-48-zhou", "第48周的工单", {}, ("bias", "future", "past")),
    ("R23-zh-bias-future-zai-zhoumo", "在周末什么坏了？", {}, ("bias", "future", "past")),
    ("R7-zh-bias-future-zicong-3-yue-yilai", "自从3月以来关闭的bug", {}, ("bias", "future", "past")),
    ("R11-zh-bias-future-cong-3-yue-dao-5-yue", "从3月到5月的bug", {}, ("bias", "future", "past")),
    ("R5-zh-window-calendar-guoqu-3-geyue", "过去3个月关闭的工单", {}, ("window_reading", "calendar", "rolling")),
    ("R6-zh-window-calendar-weilai-san-tian", "未来三天到期的任务", {}, ("window_reading", "calendar", "rolling")),
    ("R16-zh-weekday-nearest-shangzhouyi", "上周一什么坏了？", {}, ("weekday_reading", "nearest", "week")),
    ("R16-zh-weekday-nearest-xiazhousi", "下周四计划了什么？", {}, ("weekday_reading", "nearest", "week")),
    ("R18-zh-date-order-MDY", "04/03/2026修复的", {}, ("date_order", "MDY", "DMY")),
]


@pytest.mark.parametrize(("question", "base", "setting"), [p[1:] for p in POLICY_FLIPS],
                         ids=[p[0] for p in POLICY_FLIPS])
def test_a_policy_flips_the_chinese_reading_and_the_old_one_becomes_the_alternative(question, base, setting):
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
    # CLDR zh writes y/M/d: a four-digit first field is the year whatever date_order says.
    for order in ("DMY", "MDY", "YMD"):
        m = one("2026/3/4修复的", date_order=order)
        assert (m.start, m.end, m.alternatives) == (*day(_ZH_3_4), ())


# --- Chinese and English in one question -------------------------------------------------------

MIXED = [
    ("R2-zh-en-bugs-shangzhou", "bugs 上周", "上周", "zh", zh_week(TODAY + D(weeks=-1))),
    ("R2-zh-en-shangzhou-de-PR", "上周的 PR 有哪些", "上周", "zh", zh_week(TODAY + D(weeks=-1))),
    ("R7-zh-en-show-tickets-zi-shangzhou-yilai", "show tickets 自上周以来", "自上周以来", "zh",
     since(zh_week(TODAY + D(weeks=-1)))),
    ("R3-zh-en-3-tian-qian-merged", "3天前 merged 的 PR", "3天前", "zh", day(TODAY + D(days=-3))),
    ("R2-zh-en-sprint-12-benyue", "sprint 12 里本月关闭的 tickets", "本月", "zh", month_of(TODAY)),
    ("R7-zh-en-bugs-since-shangzhou", "bugs since 上周", "since 上周", "en", since(zh_week(TODAY + D(weeks=-1)))),
    ("R2-zh-en-last-week-de-bug", "last week 的 bug 有哪些", "last week", "en", zh_week(TODAY + D(weeks=-1))),
    ("R19-zh-en-2026-nian-3-yue-release", "2026年3月 release 的 blockers", "2026年3月", "zh", month(2026, 3)),
    ("R1-zh-en-tickets-closed-zuotian", "tickets closed 昨天", "昨天", "zh", day(TODAY + D(days=-1))),
    ("R11-zh-en-cong-Monday-dao-zhouwu", "从 Monday 到 周五 的 commits", "从 Monday 到 周五", "zh",
     joined(day(on_or_before(TODAY, MO)), day(on_or_before(TODAY, MO) + D(weekday=FR)))),
    ("R10-zh-en-jiezhi-Friday", "截至 Friday 的 tasks", "截至 Friday", "zh", until(day(on_or_after(TODAY, FR)))),
    ("R5-zh-en-P1-bugs-zai-guoqu-7-tian", "P1 bugs 在过去7天", "在过去7天", "zh", (wall(NOW, days=-7), iso(NOW))),
    ("R11-zh-en-between-3-yue-and-5-yue", "bugs between 3月 and 5月", "between 3月 and 5月", "en",
     joined(month(2026, 3), month(2026, 5))),
]


@pytest.mark.parametrize(("question", "phrase", "lang", "bounds"), [m[1:] for m in MIXED],
                         ids=[m[0] for m in MIXED])
def test_a_question_mixing_chinese_and_english_finds_the_phrase_in_either(question, phrase, lang, bounds):
    m = one(question, languages=("zh", "en"))
    assert (m.text, m.lang, (m.start, m.end)) == (phrase, lang, bounds)
    assert question[m.char_start : m.char_end] == phrase


def test_a_chinese_and_an_english_phrase_in_one_question_are_both_found() -> None:
    result = run("deploys this weekend 还是下个周末", languages=("zh", "en"))
    assert [(m.text, m.lang) for m in result.mentions] == [("this weekend", "en"), ("下个周末", "zh")]


# --- every language at once ---------------------------------------------------------------------

#: Chinese questions whose phrases Japanese writes alike, read with every deep language enabled:
#: without kana the Chinese reading wins (locales/ja.toml ``marks``).
SHARED_WITH_JAPANESE = [
    ("R9-zh-all-2025-nian-yiqian-leaves-the-year-out", "2025年以前的工单", "2025年以前", before(year(2025))),
    ("R9-zh-all-3-yue-yiqian", "3月以前的bug", "3月以前", before(_MARCH_PAST)),
    ("R17-zh-all-2025-niandu-is-the-calendar-year", "2025年度的事故", "2025年度", year(2025)),
]


@pytest.mark.parametrize(("question", "phrase", "bounds"), [c[1:] for c in SHARED_WITH_JAPANESE],
                         ids=[c[0] for c in SHARED_WITH_JAPANESE])
def test_without_kana_a_phrase_written_alike_in_japanese_is_chinese(question, phrase, bounds):
    m = one(question, languages="all")
    assert (m.text, m.lang, (m.start, m.end)) == (phrase, "zh", bounds)


@pytest.mark.parametrize("question", ["明日之星", "今后的计划", "至今未修复的bug", "每周一的例会"])
def test_a_chinese_look_alike_stays_one_with_every_language(question):
    assert run(question, languages="all").mentions == ()


# --- look-alikes (reading N) -------------------------------------------------------------------

TRAPS = [
    ("N-zh-yige-bug-number-word", "一个bug都没修"),
    ("N-zh-ri-in-riben", "日本团队的bug"),
    ("N-zh-yuedu-baogao", "月度报告谁写"),
    ("N-zh-zhoubao", "周报谁写"),
    ("N-zh-meizhou-yici", "每周一次的同步会"),
    ("N-zh-yizhou-yici", "一周一次的发布"),
    ("N-zh-meizhouyi-every-Monday", "每周一的例会"),
    ("N-zh-youxianji-2", "优先级2的工单"),
    ("N-zh-banben-2025.1", "版本2025.1的bug"),
    ("N-zh-qian-10-ming", "前10名的处理人"),
    ("N-zh-5-ge-dian", "5个点的任务"),
    ("N-zh-gongdan-2025", "工单2025的负责人"),
    ("N-zh-di-er-ge-goujian", "第二个构建失败了"),
    ("N-zh-shangxian", "上线的功能有哪些"),
    ("N-zh-xiazai", "下载失败的bug"),
    ("N-zh-bendi", "本地环境的问题"),
    ("N-zh-shangtian-is-not-a-day", "谁把服务器搞上天了"),
    ("N-zh-zhe-tianqi", "这天气真冷"),
    ("N-zh-rizhi", "查看日志"),
    ("N-zh-nianhui", "年会的预算"),
    ("N-zh-niandu-zongjie", "年度总结"),
    ("N-zh-jidu-mubiao", "季度目标"),
    ("N-zh-xingqi-ji", "星期几都可以"),
    ("N-zh-liangge-ren", "两个人负责"),
    ("N-zh-yitian-daowan", "一天到晚都在开会"),
    ("N-zh-tiantian", "天天加班"),
    ("N-zh-qianduan", "前端的bug"),
    ("N-zh-houduan", "后端的bug"),
    ("N-zh-yiqian-de-banben", "以前的版本"),
    ("N-zh-zhouqi", "周期性任务"),
    ("N-zh-yizhounian", "一周年纪念"),
    ("N-zh-xiage-banben", "下个版本"),
    ("N-zh-shangge-xuqiu", "上个需求"),
    ("N-zh-riqi-ziduan", "日期字段为空"),
    ("N-zh-xiawucha", "下午茶"),
    ("N-zh-miaosha", "秒杀活动的bug"),
    ("N-zh-xiaoshigong", "小时工的工单"),
    ("N-zh-shifen-zhongyao", "十分重要的bug"),
    ("N-zh-santian-liangtou", "三天两头出问题"),
    ("N-zh-mingri-zhixing", "明日之星"),
    ("N-zh-zhoubian", "周边产品"),
    ("N-zh-di-yi-ji", "第一季的剧集"),
    ("N-zh-zuo-libai", "做礼拜"),
    ("N-zh-banben-2025-nian", "修复版本2025年的发布"),
    ("N-zh-bianhao-2024", "编号2024的工单"),
    ("N-zh-meitian", "每天的构建"),
    ("N-zh-meige-san-tian", "每隔三天的备份"),
    ("N-zh-yuedi", "月底结算"),
    ("N-zh-jinhou-de-jihua", "今后的计划"),
    ("N-zh-zuijin-de-tijiao", "最近的提交"),
    ("N-zh-weilai-de-gongneng", "未来的功能"),
    ("N-zh-guoqu-de-banben", "过去的版本"),
    ("N-zh-fenzhongji", "分钟级监控"),
    ("N-zh-zhoutian-alone", "周天的概念"),
    ("N-zh-version-english", "version 1.2.2020 的崩溃"),
]


@pytest.mark.parametrize(("question",), [(q,) for _, q in TRAPS], ids=[i for i, _ in TRAPS])
def test_a_chinese_look_alike_gives_no_temporal_mention(question):
    result = run(question, languages=("zh", "en"))
    assert result.mentions == ()
    assert result.rewritten == question


def test_there_are_at_least_twenty_five_chinese_traps():
    assert len(TRAPS) >= 25
    assert len({q for _, q in TRAPS}) == len(TRAPS)


PAIRS = [
    ("N-zh-yige-bug-vs-yigeyue-qian", "一个bug都没修", "一个月前的bug", "一个月前"),
    ("N-zh-riben-vs-3-ri", "日本团队的bug", "3月3日的bug", "3月3日"),
    ("N-zh-zhoubao-vs-shangzhou", "周报谁写", "上周的周报谁写", "上周"),
    ("N-zh-meizhouyi-vs-zhouyi", "每周一的例会", "周一的例会", "周一"),
    ("N-zh-youxianji-2-vs-2-tian-qian", "优先级2的工单", "2天前的工单", "2天前"),
    ("N-zh-gongdan-2025-vs-2025-nian", "工单2025的负责人", "2025年的负责人", "2025年"),
    ("N-zh-qianduan-vs-zhiqian", "前端的bug", "3月之前的bug", "3月之前"),
    ("N-zh-shangtian-vs-shangzhou", "谁把服务器搞上天了", "谁上周把服务器搞坏了", "上周"),
    ("N-zh-xiawucha-vs-jintian-xiawu", "下午茶", "今天下午的茶歇", "今天下午"),
    ("N-zh-zhoutian-vs-zai-zhoutian", "周天的概念", "在周天部署的", "在周天"),
]


@pytest.mark.parametrize(("trap", "temporal", "phrase"), [p[1:] for p in PAIRS], ids=[p[0] for p in PAIRS])
def test_the_same_chinese_word_is_a_time_word_only_where_the_question_makes_it_one(trap, temporal, phrase):
    assert run(trap).mentions == ()
    assert one(temporal).text == phrase


MIXED_TRAPS = [
    ("N-zh-qianduan-beside-shangzhou", "上周前端的bug", "上周"),
    ("N-zh-meizhouyi-beside-cong-xiazhou-kaishi", "每周一的例会从下周开始", "从下周开始"),
    ("N-zh-youxianji-beside-zi-shangzhou-yilai", "优先级2的工单自上周以来", "自上周以来"),
    ("N-zh-banben-beside-zai-3-yue", "版本2025.1的bug在3月修复", "在3月"),
    ("N-zh-qian-10-ming-beside-benjidu", "前10名的处理人本季度", "本季度"),
    ("N-zh-zhoubao-beside-zuotian", "周报里昨天的bug", "昨天"),
    ("N-zh-riben-beside-shanggeyue", "日本团队上个月的bug", "上个月"),
    ("N-zh-houduan-beside-3-tian-hou", "后端3天后上线", "3天后"),
]


@pytest.mark.parametrize(("question", "phrase"), [m[1:] for m in MIXED_TRAPS], ids=[m[0] for m in MIXED_TRAPS])
def test_a_chinese_look_alike_beside_a_time_phrase_stays_out_of_the_mention(question, phrase):
    m = one(question)
    assert m.text == phrase
    assert question[m.char_start : m.char_end] == phrase
