"""Korean phrases of the team's calendars: sprints (스프린트, 이터레이션), business days (영업일,
근무일, "영업일 기준 3일 전"), fiscal years and quarters (회계연도, 회계 분기, FY27).

Checked against: the invented sprint table in calendar_cases (read directly), numpy's
``busday_offset`` for business days (source: numpy; weekend Saturday and Sunday from CLDR via
babel for the de_DE locale of these tests), pandas' ``Q-MAR`` / ``Y-MAR`` periods for fiscal
quarters and years (source: pandas). The questions are written from knowledge of Korean as
used in work-tracker questions (no published source).

Decisions (common practice, no published source):
- particles glue to the phrase as for the other units ("지난 스프린트에", "현재 스프린트의");
- a bare 영업일 / 회계연도 / 스프린트 with no direction, number or name is no mention ("영업일
  계산 로직", "회계연도 설정 메뉴", "스프린트 회고 일정");
- "스프린트 3회" (three dashes) and "100미터 스프린트" are running, not sprints of the table;
- "영업일 기준 N일 전 / 이내 / 후" counts N business days (the 일 there is a business day);
- a number glued to 스프린트 ("스프린트42") is not read: trackers write "스프린트 42".
"""

from __future__ import annotations

from datetime import date, timedelta

import pytest

from nlnorm import normalize
from tests.calendars.calendar_cases import (
    business_day, calendar_context, fiscal_quarter, fiscal_year, midnight, sprint_span,
)
from tests.helpers import NOW, TODAY, bounds


def mention(text, languages=("ko",), **fields):  # type: ignore[no-untyped-def]
    result = normalize(text, calendar_context(languages=list(languages), locale="de_DE", **fields))
    assert len(result.mentions) == 1, (text, [m.text for m in result.mentions])
    return result.mentions[0]


# --- sprints (source: the sprint table; today 2026-12-02 is in Inkwell) ----------------------


@pytest.mark.parametrize("text, phrase, sprint", [
    ("이번 스프린트 버그 목록", "이번 스프린트", "Inkwell"),
    ("현재 스프린트의 작업", "현재 스프린트의", "Inkwell"),
    ("진행 중인 스프린트 이슈", "진행 중인 스프린트", "Inkwell"),
    ("지난 스프린트에 남은 작업", "지난 스프린트에", "Foxglove"),
    ("저번 스프린트 회고 내용", "저번 스프린트", "Foxglove"),
    ("다음 스프린트 계획", "다음 스프린트", "Harbor-7"),
    ("다음 스프린트에 할 일", "다음 스프린트에", "Harbor-7"),
    ("지지난 스프린트에 닫힌 버그", "지지난 스프린트에", "Bramblegate"),
    ("지지난 스프린트 속도", "지지난 스프린트", "Bramblegate"),
    ("스프린트 42 버그", "스프린트 42", "Bramblegate"),
    ("42번째 스프린트 회고", "42번째 스프린트", "Bramblegate"),
    ("스프린트 #43 범위", "스프린트 #43", "Foxglove"),
    ("Foxglove 스프린트에서 안 닫힌 버그", "Foxglove 스프린트", "Foxglove"),
    ("Harbor-7 스프린트 목표", "Harbor-7 스프린트", "Harbor-7"),
    ("스프린트 Inkwell 목표", "스프린트 Inkwell", "Inkwell"),
    ("스프린트 Tidewrack 이슈", "스프린트 Tidewrack", "Tidewrack"),
])
def test_one_sprint(text, phrase, sprint):
    m = mention(text)
    assert (m.text, m.kind) == (phrase, "sprint")
    assert bounds(m) == sprint_span(sprint)


@pytest.mark.parametrize("text, phrase, sprint", [
    ("3스프린트 전 배포된 기능", "3스프린트 전", "Tidewrack"),
    ("세 스프린트 전 버그", "세 스프린트 전", "Tidewrack"),
])
def test_three_sprints_ago(text, phrase, sprint):
    m = mention(text)
    assert (m.text, bounds(m)) == (phrase, sprint_span(sprint))


@pytest.mark.parametrize("text, phrase", [
    ("최근 3개 스프린트 속도", "최근 3개 스프린트"),
    ("지난 3개 스프린트 동안 닫힌 버그", "지난 3개 스프린트 동안"),
])
def test_the_last_three_sprints_end_where_the_current_one_starts(text, phrase):
    m = mention(text)
    assert m.text == phrase
    assert bounds(m) == (sprint_span("Tidewrack")[0], sprint_span("Inkwell")[0])
    assert m.alternatives[0].policy == "sprint_window=with_current"


@pytest.mark.parametrize("text, phrase", [
    ("향후 2개 스프린트 작업", "향후 2개 스프린트"),
    ("다음 2개 스프린트 동안 할 일", "다음 2개 스프린트 동안"),
])
def test_the_next_two_sprints_are_the_current_and_the_next(text, phrase):
    m = mention(text)
    assert m.text == phrase
    assert bounds(m) == (sprint_span("Inkwell")[0], sprint_span("Harbor-7")[1])


@pytest.mark.parametrize("text, phrase, start, end", [
    ("스프린트 42부터 생성된 버그", "스프린트 42부터", sprint_span("Bramblegate")[0], None),
    ("스프린트 42 이후 늘어난 이슈", "스프린트 42 이후", sprint_span("Bramblegate")[1], None),
    ("스프린트 43 이전에 닫힌 것", "스프린트 43 이전에", None, sprint_span("Foxglove")[0]),
    ("스프린트 43까지 닫힌 것", "스프린트 43까지", None, sprint_span("Foxglove")[1]),
    ("스프린트 41부터 스프린트 43까지 버그", "스프린트 41부터 스프린트 43까지",
     sprint_span("Tidewrack")[0], sprint_span("Foxglove")[1]),
    ("스프린트 41과 스프린트 43 사이 이슈", "스프린트 41과 스프린트 43 사이",
     sprint_span("Tidewrack")[0], sprint_span("Foxglove")[1]),
    ("스프린트 41~43 속도", "스프린트 41~43", sprint_span("Tidewrack")[0], sprint_span("Foxglove")[1]),
])
def test_sprint_bounds(text, phrase, start, end):
    m = mention(text)
    assert m.text == phrase
    assert bounds(m) == (start, end)


def test_an_unknown_sprint_gives_no_mention():
    ctx = calendar_context(languages=["ko"])
    assert normalize("스프린트 99 범위", ctx).mentions == ()
    assert normalize("Marrowbone 스프린트", ctx).mentions == ()


# --- business days (source: numpy.busday_offset) ------------------------------------------


@pytest.mark.parametrize("text, phrase, n", [
    ("3영업일 전 닫힌 티켓", "3영업일 전", -3),
    ("영업일 기준 3일 전 배포", "영업일 기준 3일 전", -3),
    ("직전 영업일 빌드 결과", "직전 영업일", -1),
    ("전영업일 장애 내역", "전영업일", -1),
    ("다음 영업일 마감 작업", "다음 영업일", 1),
    ("익영업일 배포 예정", "익영업일", 1),
    ("3영업일 후 공개", "3영업일 후", 3),
    ("영업일 기준 3일 후 배포", "영업일 기준 3일 후", 3),
])
def test_business_days(text, phrase, n):
    day = business_day(n)
    m = mention(text)
    assert m.text == phrase
    assert bounds(m) == (midnight(day), midnight(day + timedelta(days=1)))


@pytest.mark.parametrize("text, phrase", [
    ("최근 10영업일 생성된 버그", "최근 10영업일"),
    ("지난 10영업일 동안 들어온 문의", "지난 10영업일 동안"),
])
def test_in_the_last_10_business_days_runs_to_now(text, phrase):
    m = mention(text)
    assert m.text == phrase
    assert bounds(m) == (midnight(business_day(-10)), NOW)


@pytest.mark.parametrize("text, phrase", [
    ("5영업일 이내 답변", "5영업일 이내"),
    ("영업일 기준 5일 이내 처리", "영업일 기준 5일 이내"),
])
def test_within_5_working_days_runs_from_now(text, phrase):
    m = mention(text)
    assert m.text == phrase
    assert bounds(m) == (NOW, midnight(business_day(5) + timedelta(days=1)))


# --- fiscal years and quarters (source: pandas Q-MAR / Y-MAR periods) -----------------------


@pytest.mark.parametrize("text, phrase, expected", [
    ("이번 회계연도 매출", "이번 회계연도", fiscal_year(2027)),
    ("당해 회계연도 배포 건수", "당해 회계연도", fiscal_year(2027)),
    ("지난 회계연도 장애", "지난 회계연도", fiscal_year(2026)),
    ("지난 회계 분기 티켓", "지난 회계 분기", fiscal_quarter(TODAY, -1)),
    ("직전 회계분기 실적", "직전 회계분기", fiscal_quarter(TODAY, -1)),
    ("다음 회계 분기 계획", "다음 회계 분기", fiscal_quarter(TODAY, 1)),
    ("FY27 릴리스", "FY27", fiscal_year(2027)),
    ("FY 27 예산", "FY 27", fiscal_year(2027)),
    ("FY2026 릴리스", "FY2026", fiscal_year(2026)),
    ("2026 회계연도 실적", "2026 회계연도", fiscal_year(2026)),
    ("Q1 FY27 릴리스", "Q1 FY27", fiscal_quarter(date(2026, 4, 1))),
    ("FY27 1분기 매출", "FY27 1분기", fiscal_quarter(date(2026, 4, 1))),
    ("2027 회계연도 1분기 목표", "2027 회계연도 1분기", fiscal_quarter(date(2026, 4, 1))),
    ("회계연도 기준 3분기 버그", "회계연도 기준 3분기", fiscal_quarter(date(2026, 10, 1))),
    ("이번 회계연도 3분기 이슈", "이번 회계연도 3분기", fiscal_quarter(date(2026, 10, 1))),
    ("첫 번째 회계 분기 목표", "첫 번째 회계 분기", fiscal_quarter(date(2026, 4, 1))),
])
def test_fiscal(text, phrase, expected):
    m = mention(text)
    assert m.text == phrase
    assert bounds(m) == expected


def test_a_fiscal_year_name_has_the_other_convention_as_an_alternative():
    m = mention("FY27 릴리스")
    assert m.alternatives[0].policy == "fiscal_name=start"


# --- traps: no calendar mention ---------------------------------------------------------------

TRAPS = [
    ("N-ko-100m-sprint-race", "100미터 스프린트 기록"),
    ("N-ko-sprint-3hoe-dashes", "스프린트 3회 반복 훈련"),
    ("N-ko-sprint-hoego-bare", "스프린트 회고 일정"),
    ("N-ko-yeongeobil-gyesan", "영업일 계산 로직"),
    ("N-ko-yeongeobil-batch", "영업일에만 도는 배치"),
    ("N-ko-hoegyeyeondo-settings", "회계연도 설정 메뉴"),
    ("N-ko-jinan-il-stays-none", "지난 일은 잊자"),
]


@pytest.mark.parametrize(("question",), [(q,) for _, q in TRAPS], ids=[i for i, _ in TRAPS])
def test_a_korean_calendar_look_alike_gives_no_mention(question):
    result = normalize(question, calendar_context(languages=["ko", "en"], locale="de_DE"))
    assert result.mentions == ()
    assert result.rewritten == question


# --- questions mixing Korean and English ------------------------------------------------------


def test_mixed_english_sprint_number_in_a_korean_question():
    m = mention("sprint 43의 버그 중 close된 것", languages=("ko", "en"))
    assert bounds(m) == sprint_span("Foxglove")


def test_mixed_korean_phrase_in_an_english_question():
    m = mention("show tickets closed 지난 스프린트", languages=("ko", "en"))
    assert (m.text, bounds(m)) == ("지난 스프린트", sprint_span("Foxglove"))


def test_mixed_both_phrases_found():
    ctx = calendar_context(languages=["ko", "en"], locale="de_DE")
    result = normalize("Q1 FY27 tickets 중 3영업일 전 open된 버그", ctx)
    assert [m.text for m in result.mentions] == ["Q1 FY27", "3영업일 전"]
    assert bounds(result.mentions[0]) == fiscal_quarter(date(2026, 4, 1))
    day = business_day(-3)
    assert bounds(result.mentions[1]) == (midnight(day), midnight(day + timedelta(days=1)))


def test_mixed_latin_sprint_word_takes_korean_particles():
    m = mention("지난 sprint에 닫힌 이슈", languages=("ko", "en"))
    assert (m.text, bounds(m)) == ("지난 sprint에", sprint_span("Foxglove"))
