"""Chinese phrases of the team's calendars: sprints (冲刺, 迭代, Sprint), business days (工作日,
营业日), fiscal years and quarters (财年, 财季, FY27).

Checked against: the invented sprint table in calendar_cases (read directly), numpy's
``busday_offset`` for business days (source: numpy; weekend Saturday and Sunday from CLDR via
babel for the de_DE locale of these tests), pandas' ``Q-MAR`` / ``Y-MAR`` periods for fiscal
quarters and years (source: pandas). The questions are written from knowledge of Mandarin as
used in work-tracker questions (no published source).

Decisions (common practice, no published source):
- a bare 财年 / 工作日 / 冲刺 with no direction, number or name is no calendar mention ("财年目标怎么
  定", "只在工作日运行的任务", "冲刺阶段"): it names no particular period;
- "迭代3次" (iterated three times) and "冲刺100米" (a 100-metre dash) are no sprint numbers;
- "上" before 工作日 needs 一 or 个 ("上一个工作日"): "线上工作日志" is an online work log;
- "2026财年" is read by the context's fiscal naming like "FY2026"; "2023年度" stays the calendar
  year (R17, tests/locales/test_zh.py).
"""

from __future__ import annotations

from datetime import date, timedelta

import pytest

from nlnorm import normalize
from tests.calendars.calendar_cases import (
    business_day, calendar_context, fiscal_quarter, fiscal_year, midnight, sprint_span,
)
from tests.helpers import NOW, TODAY, bounds


def mention(text, languages=("zh",), **fields):  # type: ignore[no-untyped-def]
    result = normalize(text, calendar_context(languages=list(languages), locale="de_DE", **fields))
    assert len(result.mentions) == 1, (text, [m.text for m in result.mentions])
    return result.mentions[0]


# --- sprints (source: the sprint table; today 2026-12-02 is in Inkwell) ----------------------


@pytest.mark.parametrize("text, phrase, sprint", [
    ("这个冲刺里的bug", "这个冲刺", "Inkwell"),
    ("本次迭代还有哪些任务", "本次迭代", "Inkwell"),
    ("当前冲刺的用户故事", "当前冲刺", "Inkwell"),
    ("本期迭代的范围", "本期迭代", "Inkwell"),
    ("上个冲刺遗留了什么", "上个冲刺", "Foxglove"),
    ("上一个迭代的工单", "上一个迭代", "Foxglove"),
    ("下个冲刺计划做什么", "下个冲刺", "Harbor-7"),
    ("下一个sprint的目标", "下一个sprint", "Harbor-7"),
    ("上上个冲刺关闭的bug", "上上个冲刺", "Bramblegate"),
    ("上上个迭代的速率", "上上个迭代", "Bramblegate"),
    ("冲刺42的bug", "冲刺42", "Bramblegate"),
    ("Sprint 42里修了什么", "Sprint 42", "Bramblegate"),
    ("迭代#43的范围", "迭代#43", "Foxglove"),
    ("第43个冲刺的回顾", "第43个冲刺", "Foxglove"),
    ("Foxglove冲刺里还没关的bug", "Foxglove冲刺", "Foxglove"),
    ("Harbor-7迭代的目标", "Harbor-7迭代", "Harbor-7"),
    ("冲刺Inkwell的目标", "冲刺Inkwell", "Inkwell"),
    ("迭代Tidewrack里的需求", "迭代Tidewrack", "Tidewrack"),
])
def test_one_sprint(text, phrase, sprint):
    m = mention(text)
    assert (m.text, m.kind) == (phrase, "sprint")
    assert bounds(m) == sprint_span(sprint)


@pytest.mark.parametrize("text, phrase", [
    ("最近3个冲刺的速率", "最近3个冲刺"),
    ("过去三个迭代关闭的bug", "过去三个迭代"),
])
def test_the_last_three_sprints_end_where_the_current_one_starts(text, phrase):
    m = mention(text)
    assert m.text == phrase
    assert bounds(m) == (sprint_span("Tidewrack")[0], sprint_span("Inkwell")[0])
    assert m.alternatives[0].policy == "sprint_window=with_current"


@pytest.mark.parametrize("text, phrase", [
    ("接下来两个冲刺要做的需求", "接下来两个冲刺"),
    ("未来2个迭代内到期", "未来2个迭代内"),
])
def test_the_next_two_sprints_are_the_current_and_the_next(text, phrase):
    m = mention(text)
    assert m.text == phrase
    assert bounds(m) == (sprint_span("Inkwell")[0], sprint_span("Harbor-7")[1])


@pytest.mark.parametrize("text, phrase, start, end", [
    ("自冲刺42以来打开的bug", "自冲刺42以来", sprint_span("Bramblegate")[0], None),
    ("从Sprint 42开始的工单", "从Sprint 42开始", sprint_span("Bramblegate")[0], None),
    ("自Foxglove冲刺起", "自Foxglove冲刺", sprint_span("Foxglove")[0], None),
    ("冲刺43之前关闭的", "冲刺43之前", None, sprint_span("Foxglove")[0]),
    ("迭代42以前的需求", "迭代42以前", None, sprint_span("Bramblegate")[0]),
    ("介于冲刺41和冲刺43之间的bug", "介于冲刺41和冲刺43之间", sprint_span("Tidewrack")[0], sprint_span("Foxglove")[1]),
    ("从冲刺41到冲刺43", "从冲刺41到冲刺43", sprint_span("Tidewrack")[0], sprint_span("Foxglove")[1]),
    ("冲刺41到43的速率", "冲刺41到43", sprint_span("Tidewrack")[0], sprint_span("Foxglove")[1]),
])
def test_sprint_bounds(text, phrase, start, end):
    m = mention(text)
    assert m.text == phrase
    assert bounds(m) == (start, end)


def test_an_unknown_sprint_gives_no_mention():
    ctx = calendar_context(languages=["zh"])
    assert normalize("冲刺99的范围", ctx).mentions == ()
    assert normalize("Marrowbone冲刺", ctx).mentions == ()


# --- business days (source: numpy.busday_offset) ------------------------------------------


@pytest.mark.parametrize("text, phrase, n", [
    ("3个工作日前关闭的工单", "3个工作日前", -3),
    ("三个工作日之前的部署", "三个工作日之前", -3),
    ("上一个工作日的构建", "上一个工作日", -1),
    ("前一个营业日的报错", "前一个营业日", -1),
    ("下一个工作日到期", "下一个工作日", 1),
    ("下个工作日上线", "下个工作日", 1),
    ("3个工作日后发布", "3个工作日后", 3),
])
def test_business_days(text, phrase, n):
    day = business_day(n)
    m = mention(text)
    assert m.text == phrase
    assert bounds(m) == (midnight(day), midnight(day + timedelta(days=1)))


@pytest.mark.parametrize("text, phrase", [
    ("过去10个工作日打开的bug", "过去10个工作日"),
    ("最近10个工作日内的提交", "最近10个工作日内"),
])
def test_in_the_last_10_business_days_runs_to_now(text, phrase):
    m = mention(text)
    assert m.text == phrase
    assert bounds(m) == (midnight(business_day(-10)), NOW)


@pytest.mark.parametrize("text, phrase", [
    ("5个工作日内回复", "5个工作日内"),
    ("五个工作日以内处理", "五个工作日以内"),
])
def test_within_5_working_days_runs_from_now(text, phrase):
    m = mention(text)
    assert m.text == phrase
    assert bounds(m) == (NOW, midnight(business_day(5) + timedelta(days=1)))


# --- fiscal years and quarters (source: pandas Q-MAR / Y-MAR periods) -----------------------


@pytest.mark.parametrize("text, phrase, expected", [
    ("本财年的收入", "本财年", fiscal_year(2027)),
    ("这个财年发布了什么", "这个财年", fiscal_year(2027)),
    ("上一财年的事故", "上一财年", fiscal_year(2026)),
    ("上个财季的目标", "上个财季", fiscal_quarter(TODAY, -1)),
    ("上一财季关闭的工单", "上一财季", fiscal_quarter(TODAY, -1)),
    ("本财季的需求", "本财季", fiscal_quarter(TODAY)),
    ("下个财季的计划", "下个财季", fiscal_quarter(TODAY, 1)),
    ("FY27发布了什么", "FY27", fiscal_year(2027)),
    ("2027财年的版本", "2027财年", fiscal_year(2027)),
    ("FY2026的发布", "FY2026", fiscal_year(2026)),
    ("2026财政年度的预算", "2026财政年度", fiscal_year(2026)),
    ("Q1 FY27的发布", "Q1 FY27", fiscal_quarter(date(2026, 4, 1))),
    ("FY27第一季度的版本", "FY27第一季度", fiscal_quarter(date(2026, 4, 1))),
    ("2027财年第一季度", "2027财年第一季度", fiscal_quarter(date(2026, 4, 1))),
    ("2027财年Q1的目标", "2027财年Q1", fiscal_quarter(date(2026, 4, 1))),
    ("财年Q3的bug", "财年Q3", fiscal_quarter(date(2026, 10, 1))),
    ("本财年第三季度", "本财年第三季度", fiscal_quarter(date(2026, 10, 1))),
    ("第三财季关闭的工单", "第三财季", fiscal_quarter(date(2026, 10, 1))),
    ("第一个财季的目标", "第一个财季", fiscal_quarter(date(2026, 4, 1))),
])
def test_fiscal(text, phrase, expected):
    m = mention(text)
    assert m.text == phrase
    assert bounds(m) == expected


def test_a_fiscal_year_name_has_the_other_convention_as_an_alternative():
    m = mention("2027财年的版本")
    assert m.alternatives[0].policy == "fiscal_name=start"


# --- traps: no calendar mention ---------------------------------------------------------------

TRAPS = [
    ("N-zh-baimi-chongci-race", "百米冲刺比赛的报名名单"),
    ("N-zh-chongci-100-mi", "最后冲刺100米"),
    ("N-zh-diedai-3-ci-iterated", "模型迭代3次后的准确率"),
    ("N-zh-chongci-jieduan-push", "冲刺阶段的风险"),
    ("N-zh-diedaiqi-iterator", "迭代器的用法"),
    ("N-zh-gongzuo-rizhi-work-log", "工作日志里的报错"),
    ("N-zh-xianshang-gongzuo-rizhi", "线上工作日志"),
    ("N-zh-zhi-zai-gongzuori", "只在工作日运行的定时任务"),
    ("N-zh-bare-cainian", "财年目标怎么定"),
    ("N-zh-bare-caiji", "财季报告模板"),
]


@pytest.mark.parametrize(("question",), [(q,) for _, q in TRAPS], ids=[i for i, _ in TRAPS])
def test_a_chinese_calendar_look_alike_gives_no_mention(question):
    result = normalize(question, calendar_context(languages=["zh", "en"], locale="de_DE"))
    assert result.mentions == ()
    assert result.rewritten == question


# --- questions mixing Chinese and English ---------------------------------------------------


def test_mixed_english_sprint_word_in_a_chinese_question():
    m = mention("sprint 43里 closed 的 bugs", languages=("zh", "en"))
    assert bounds(m) == sprint_span("Foxglove")


def test_mixed_chinese_phrase_in_an_english_question():
    m = mention("show bugs closed 上个冲刺", languages=("zh", "en"))
    assert (m.text, bounds(m)) == ("上个冲刺", sprint_span("Foxglove"))


def test_mixed_both_phrases_found():
    ctx = calendar_context(languages=["zh", "en"], locale="de_DE")
    result = normalize("FY27 Q1 的 tickets, 以及 3个工作日前 closed 的", ctx)
    assert [m.text for m in result.mentions] == ["FY27 Q1", "3个工作日前"]
    assert bounds(result.mentions[0]) == fiscal_quarter(date(2026, 4, 1))
    day = business_day(-3)
    assert bounds(result.mentions[1]) == (midnight(day), midnight(day + timedelta(days=1)))
