"""Japanese phrases of the team's calendars: sprints (スプリント, イテレーション), business days
(営業日, 稼働日), fiscal years and quarters (会計年度, 会計四半期, FY27, 今年度第3四半期).

Checked against: the invented sprint table in calendar_cases (read directly), numpy's
``busday_offset`` for business days (source: numpy; weekend Saturday and Sunday from CLDR via
babel for the de_DE locale of these tests), pandas' ``Q-MAR`` / ``Y-MAR`` periods for fiscal
quarters and years (source: pandas). The questions are written from knowledge of Japanese as
used in work-tracker questions (no published source).

Decisions (common practice, no published source):
- 年度 alone, 今年度, 昨年度 and "2025年度" stay no mention, as tests/locales/test_ja.py has it
  (a fiscal phrase gives a mention even with no fiscal calendar in the context, read as the
  calendar year, and those questions must give none); the fiscal year words are 会計年度 and
  事業年度. "今年度第3四半期" names a quarter of this fiscal year and is read (R26);
- a bare 営業日 / 会計年度 / スプリント with no direction, number or name is no mention
  ("営業日カレンダー", "会計年度の設定画面", "スプリントレビュー");
- "スプリント3本" (three dashes) and "100mスプリント" are running, not sprints of the table;
- "1Q FY27" is not written here: a number right before a Latin letter starts no form of a
  language written without spaces; "FY27 1Q" and "Q1 FY27" are read.
"""

from __future__ import annotations

from datetime import date, timedelta

import pytest

from nlnorm import normalize
from tests.calendars.calendar_cases import (
    business_day, calendar_context, fiscal_quarter, fiscal_year, midnight, sprint_span,
)
from tests.helpers import NOW, TODAY, bounds


def mention(text, languages=("ja",), **fields):  # type: ignore[no-untyped-def]
    result = normalize(text, calendar_context(languages=list(languages), locale="de_DE", **fields))
    assert len(result.mentions) == 1, (text, [m.text for m in result.mentions])
    return result.mentions[0]


# --- sprints (source: the sprint table; today 2026-12-02 is in Inkwell) ----------------------


@pytest.mark.parametrize("text, phrase, sprint", [
    ("今回のスプリントのバグ", "今回のスプリント", "Inkwell"),
    ("今スプリントで対応するチケット", "今スプリント", "Inkwell"),
    ("現在のスプリントの残タスク", "現在のスプリント", "Inkwell"),
    ("前回のスプリントで残ったもの", "前回のスプリント", "Foxglove"),
    ("前スプリントのバグ", "前スプリント", "Foxglove"),
    ("次回のスプリントの計画", "次回のスプリント", "Harbor-7"),
    ("次スプリントに回すチケット", "次スプリント", "Harbor-7"),
    ("前々回のスプリントで閉じたバグ", "前々回のスプリント", "Bramblegate"),
    ("2つ前のスプリントのベロシティ", "2つ前のスプリント", "Bramblegate"),
    ("スプリント42のバグ", "スプリント42", "Bramblegate"),
    ("第42スプリントの振り返り", "第42スプリント", "Bramblegate"),
    ("スプリント#43の範囲", "スプリント#43", "Foxglove"),
    ("Foxgloveスプリントの未解決バグ", "Foxgloveスプリント", "Foxglove"),
    ("Harbor-7スプリントのゴール", "Harbor-7スプリント", "Harbor-7"),
    ("スプリントInkwellの目標", "スプリントInkwell", "Inkwell"),
    ("スプリント Tidewrack のチケット", "スプリント Tidewrack", "Tidewrack"),
])
def test_one_sprint(text, phrase, sprint):
    m = mention(text)
    assert (m.text, m.kind) == (phrase, "sprint")
    assert bounds(m) == sprint_span(sprint)


@pytest.mark.parametrize("text, phrase", [
    ("直近3スプリントのベロシティ", "直近3スプリント"),
    ("過去3スプリントで閉じたバグ", "過去3スプリント"),
])
def test_the_last_three_sprints_end_where_the_current_one_starts(text, phrase):
    m = mention(text)
    assert m.text == phrase
    assert bounds(m) == (sprint_span("Tidewrack")[0], sprint_span("Inkwell")[0])
    assert m.alternatives[0].policy == "sprint_window=with_current"


@pytest.mark.parametrize("text, phrase", [
    ("今後2スプリントで対応する課題", "今後2スプリント"),
    ("向こう2スプリントの計画", "向こう2スプリント"),
])
def test_the_next_two_sprints_are_the_current_and_the_next(text, phrase):
    m = mention(text)
    assert m.text == phrase
    assert bounds(m) == (sprint_span("Inkwell")[0], sprint_span("Harbor-7")[1])


@pytest.mark.parametrize("text, phrase, start, end", [
    ("スプリント42以降に起票されたバグ", "スプリント42以降", sprint_span("Bramblegate")[0], None),
    ("スプリント42から増えたチケット", "スプリント42から", sprint_span("Bramblegate")[0], None),
    ("スプリント43より前に閉じたもの", "スプリント43より前", None, sprint_span("Foxglove")[0]),
    ("スプリント43までに閉じたもの", "スプリント43までに", None, sprint_span("Foxglove")[1]),
    ("スプリント41からスプリント43までのバグ", "スプリント41からスプリント43まで",
     sprint_span("Tidewrack")[0], sprint_span("Foxglove")[1]),
    ("スプリント41〜43のベロシティ", "スプリント41〜43", sprint_span("Tidewrack")[0], sprint_span("Foxglove")[1]),
    ("スプリント41から43までの完了数", "スプリント41から43まで", sprint_span("Tidewrack")[0], sprint_span("Foxglove")[1]),
])
def test_sprint_bounds(text, phrase, start, end):
    m = mention(text)
    assert m.text == phrase
    assert bounds(m) == (start, end)


def test_an_unknown_sprint_gives_no_mention():
    ctx = calendar_context(languages=["ja"])
    assert normalize("スプリント99の範囲", ctx).mentions == ()
    assert normalize("Marrowboneスプリント", ctx).mentions == ()


# --- business days (source: numpy.busday_offset) ------------------------------------------


@pytest.mark.parametrize("text, phrase, n", [
    ("3営業日前にクローズしたチケット", "3営業日前", -3),
    ("1稼働日前のデプロイ", "1稼働日前", -1),
    ("前営業日のビルド", "前営業日", -1),
    ("前の営業日に起きた障害", "前の営業日", -1),
    ("翌営業日が期限のタスク", "翌営業日", 1),
    ("次の営業日にリリース", "次の営業日", 1),
    ("3営業日後に公開", "3営業日後", 3),
])
def test_business_days(text, phrase, n):
    day = business_day(n)
    m = mention(text)
    assert m.text == phrase
    assert bounds(m) == (midnight(day), midnight(day + timedelta(days=1)))


@pytest.mark.parametrize("text, phrase", [
    ("直近10営業日に起票されたバグ", "直近10営業日"),
    ("過去10営業日の問い合わせ", "過去10営業日"),
])
def test_in_the_last_10_business_days_runs_to_now(text, phrase):
    m = mention(text)
    assert m.text == phrase
    assert bounds(m) == (midnight(business_day(-10)), NOW)


@pytest.mark.parametrize("text, phrase", [
    ("5営業日以内に回答", "5営業日以内"),
    ("今後5営業日の当番", "今後5営業日"),
])
def test_within_5_working_days_runs_from_now(text, phrase):
    m = mention(text)
    assert m.text == phrase
    assert bounds(m) == (NOW, midnight(business_day(5) + timedelta(days=1)))


# --- fiscal years and quarters (source: pandas Q-MAR / Y-MAR periods) -----------------------


@pytest.mark.parametrize("text, phrase, expected", [
    ("今会計年度の売上", "今会計年度", fiscal_year(2027)),
    ("当事業年度のリリース", "当事業年度", fiscal_year(2027)),
    ("前会計年度の障害件数", "前会計年度", fiscal_year(2026)),
    ("前会計四半期のチケット", "前会計四半期", fiscal_quarter(TODAY, -1)),
    ("前の会計四半期に閉じたもの", "前の会計四半期", fiscal_quarter(TODAY, -1)),
    ("次の会計四半期の計画", "次の会計四半期", fiscal_quarter(TODAY, 1)),
    ("FY27のリリース", "FY27", fiscal_year(2027)),
    ("FY 27の予算消化", "FY 27", fiscal_year(2027)),
    ("FY2026のリリース", "FY2026", fiscal_year(2026)),
    ("2026会計年度の実績", "2026会計年度", fiscal_year(2026)),
    ("Q1 FY27のリリース", "Q1 FY27", fiscal_quarter(date(2026, 4, 1))),
    ("FY27 1Qの売上", "FY27 1Q", fiscal_quarter(date(2026, 4, 1))),
    ("FY27第1四半期のバグ", "FY27第1四半期", fiscal_quarter(date(2026, 4, 1))),
    ("2027会計年度の1Q", "2027会計年度の1Q", fiscal_quarter(date(2026, 4, 1))),
    ("今年度第3四半期のバグ", "今年度第3四半期", fiscal_quarter(date(2026, 10, 1))),
    ("今年度の3Qに閉じたチケット", "今年度の3Q", fiscal_quarter(date(2026, 10, 1))),
    ("第3会計四半期の目標", "第3会計四半期", fiscal_quarter(date(2026, 10, 1))),
    ("第一会計四半期の目標", "第一会計四半期", fiscal_quarter(date(2026, 4, 1))),
])
def test_fiscal(text, phrase, expected):
    m = mention(text)
    assert m.text == phrase
    assert bounds(m) == expected


def test_a_fiscal_year_name_has_the_other_convention_as_an_alternative():
    m = mention("FY27のリリース")
    assert m.alternatives[0].policy == "fiscal_name=start"


# --- traps: no calendar mention ---------------------------------------------------------------

TRAPS = [
    ("N-ja-100m-sprint-race", "100mスプリントの記録"),
    ("N-ja-sprint-3-hon-dashes", "スプリント3本を走った"),
    ("N-ja-sprint-review-bare", "スプリントレビューの議事録"),
    ("N-ja-eigyoubi-calendar", "営業日カレンダーの設定"),
    ("N-ja-eigyoubi-teigi", "営業日の定義を確認"),
    ("N-ja-kaikei-nendo-settings", "会計年度の設定画面"),
    ("N-ja-konnendo-stays-none", "今年度の予算"),
    ("N-ja-2025-nendo-stays-none", "2025年度の予算"),
]


@pytest.mark.parametrize(("question",), [(q,) for _, q in TRAPS], ids=[i for i, _ in TRAPS])
def test_a_japanese_calendar_look_alike_gives_no_mention(question):
    result = normalize(question, calendar_context(languages=["ja", "en"], locale="de_DE"))
    assert result.mentions == ()
    assert result.rewritten == question


# --- questions mixing Japanese and English --------------------------------------------------


def test_mixed_english_sprint_number_in_a_japanese_question():
    m = mention("sprint 43 で close したバグ", languages=("ja", "en"))
    assert (m.text, bounds(m)) == ("sprint 43", sprint_span("Foxglove"))


def test_mixed_japanese_phrase_in_an_english_question():
    m = mention("show tickets closed 前回のスプリント", languages=("ja", "en"))
    assert (m.text, bounds(m)) == ("前回のスプリント", sprint_span("Foxglove"))


def test_mixed_both_phrases_found():
    ctx = calendar_context(languages=["ja", "en"], locale="de_DE")
    result = normalize("Q1 FY27 の tickets と 3営業日前に open したバグ", ctx)
    assert [m.text for m in result.mentions] == ["Q1 FY27", "3営業日前"]
    assert bounds(result.mentions[0]) == fiscal_quarter(date(2026, 4, 1))
    day = business_day(-3)
    assert bounds(result.mentions[1]) == (midnight(day), midnight(day + timedelta(days=1)))
