"""Portuguese phrases of the team's calendars: sprints (sprint, iteração), business days (dia
útil), fiscal years and quarters (ano fiscal, exercício, trimestre fiscal, FY27, Q1 FY27, T1 FY27).

Checked against: the invented sprint table in calendar_cases (read directly), numpy's
``busday_offset`` for business days (source: numpy; weekend Saturday and Sunday from CLDR via
babel for the pt_BR locale of these tests), pandas' ``Q-MAR`` / ``Y-MAR`` periods for fiscal
quarters and years (source: pandas). The questions are written from knowledge of Portuguese,
Brazilian and European, as used in work-tracker questions (common practice, no published source).

Decisions (common practice, no published source):
- "o último trimestre fiscal" is the previous fiscal quarter (R2), as "último" is a direction word
  in Portuguese ("o último trimestre" is CLDR's last quarter); "as últimas 3 sprints" is R5;
- "em 3 dias úteis" / "daqui a 3 dias úteis" is a point three business days ahead (R4); "within"
  is "em até 5 dias úteis" or "no prazo de 5 dias úteis" (R6), as Brazilian service terms write it;
- "exercício" alone is no unit ("o exercício anterior da apostila" is an exercise): only
  "exercício fiscal" is, and "exercício 2026" with a year is a fiscal year (R25);
- only "sprint" before a number names a sprint: "a iteração 3 do algoritmo" is a loop;
- "deste"/"desta" are "this" like "neste"/"nesta" ("desta sprint", "deste ano fiscal");
  "seguinte" is next ("o dia útil seguinte");
- a bare "ano fiscal", "dia útil" or "sprint" with no direction, number or name names no
  particular period ("Fechamento do ano fiscal", "O job só roda em dias úteis").
"""

from __future__ import annotations

from datetime import date, timedelta

import pytest

from nlnorm import normalize
from tests.calendars.calendar_cases import (
    business_day, calendar_context, fiscal_quarter, fiscal_year, midnight, sprint_span,
)
from tests.helpers import NOW, TODAY, bounds

LANG = "pt"


def mention(text, languages=(LANG,), **fields):  # type: ignore[no-untyped-def]
    result = normalize(text, calendar_context(languages=list(languages), locale="pt_BR", **fields))
    assert len(result.mentions) == 1, (text, [m.text for m in result.mentions])
    return result.mentions[0]


def day_of(n: int):  # type: ignore[no-untyped-def]
    day = business_day(n)
    return midnight(day), midnight(day + timedelta(days=1))


# --- sprints (source: the sprint table; today 2026-12-02 is in Inkwell) ----------------------


@pytest.mark.parametrize("text, phrase, sprint", [
    ("bugs desta sprint", "desta sprint", "Inkwell"),
    ("o que tem na sprint atual", "na sprint atual", "Inkwell"),
    ("histórias da sprint em curso", "da sprint em curso", "Inkwell"),
    ("histórias da sprint ativa", "da sprint ativa", "Inkwell"),
    ("o que ficou pendente na sprint passada", "na sprint passada", "Foxglove"),
    ("tickets da sprint anterior", "da sprint anterior", "Foxglove"),
    ("bugs abertos na última sprint", "na última sprint", "Foxglove"),
    ("o que está planejado para a próxima sprint", "a próxima sprint", "Harbor-7"),
    ("histórias para a sprint que vem", "a sprint que vem", "Harbor-7"),
    ("bugs fechados na penúltima sprint", "na penúltima sprint", "Bramblegate"),
    ("tarefas do penúltimo sprint", "do penúltimo sprint", "Bramblegate"),
    ("bugs da sprint 42", "da sprint 42", "Bramblegate"),
    ("escopo da sprint #43", "da sprint #43", "Foxglove"),
    ("tickets da sprint nº 41", "da sprint nº 41", "Tidewrack"),
    ("quais bugs da sprint Foxglove ainda estão abertos", "da sprint Foxglove", "Foxglove"),
    ("objetivos do sprint Harbor-7", "do sprint Harbor-7", "Harbor-7"),
    ("objetivos da Harbor-7 sprint", "da Harbor-7 sprint", "Harbor-7"),
    ("retro da iteração Inkwell", "da iteração Inkwell", "Inkwell"),
    ("bugs que entraram há 2 sprints", "há 2 sprints", "Bramblegate"),
    ("o que foi fechado há uma sprint", "há uma sprint", "Foxglove"),
])
def test_one_sprint(text, phrase, sprint):
    m = mention(text)
    assert (m.text, m.kind) == (phrase, "sprint")
    assert bounds(m) == sprint_span(sprint)


@pytest.mark.parametrize("text, first", [
    ("velocidade das últimas 3 sprints", "Tidewrack"),
    ("bugs das últimas duas iterações", "Bramblegate"),
])
def test_the_last_n_sprints_end_where_the_current_one_starts(text, first):
    assert bounds(mention(text)) == (sprint_span(first)[0], sprint_span("Inkwell")[0])


@pytest.mark.parametrize("text", ["as próximas duas sprints", "nas próximas 2 sprints"])
def test_the_next_n_sprints_are_the_ones_after_the_current_one(text):
    # On 2026-11-18 (in Foxglove) the next two are Inkwell and Harbor-7.
    m = mention(text, now="2026-11-18T10:00")
    assert bounds(m) == (sprint_span("Inkwell")[0], sprint_span("Harbor-7")[1])
    assert m.alternatives[0].policy == "sprint_window=with_current"


@pytest.mark.parametrize("text, start, end", [
    ("bugs abertos desde a sprint 42", sprint_span("Bramblegate")[0], None),
    ("tickets criados desde a sprint Foxglove", sprint_span("Foxglove")[0], None),
    ("fechados antes da sprint 43", None, sprint_span("Foxglove")[0]),
    ("bugs resolvidos até a sprint Foxglove", None, sprint_span("Foxglove")[1]),
    ("entre a sprint 41 e a sprint 43", sprint_span("Tidewrack")[0], sprint_span("Foxglove")[1]),
    ("bugs fechados entre a sprint 41 e a 43", sprint_span("Tidewrack")[0], sprint_span("Foxglove")[1]),
    ("as sprints de 41 a 43", sprint_span("Tidewrack")[0], sprint_span("Foxglove")[1]),
    ("da sprint 42 à 44", sprint_span("Bramblegate")[0], sprint_span("Inkwell")[1]),
])
def test_sprint_bounds_and_ranges(text, start, end):
    assert bounds(mention(text)) == (start, end)


@pytest.mark.parametrize("text, start, end", [
    ("bugs resolvidos antes da sprint Inkwell", None, sprint_span("Inkwell")[0]),
    ("tickets criados a partir da sprint Foxglove", sprint_span("Foxglove")[0], None),
])
def test_a_connective_ending_in_da_before_a_named_sprint(text, start, end):
    assert bounds(mention(text)) == (start, end)


# --- business days (source: numpy.busday_offset; Saturday/Sunday weekend from CLDR for BR) ---


@pytest.mark.parametrize("text, n", [
    ("tickets fechados há 3 dias úteis", -3),
    ("o que aconteceu há 1 dia útil", -1),
    ("bugs do último dia útil", -1),
    ("aberto no dia útil anterior", -1),
    ("entrega no próximo dia útil", 1),
    ("para o dia útil seguinte", 1),
    ("em 3 dias úteis", 3),
    ("daqui a 3 dias úteis", 3),
])
def test_business_days(text, n):
    assert bounds(mention(text)) == day_of(n)


@pytest.mark.parametrize("text, n", [
    ("bugs abertos nos últimos 10 dias úteis", 10),
    ("tickets dos últimos 5 dias uteis", 5),
])
def test_in_the_last_n_business_days_runs_to_now(text, n):
    assert bounds(mention(text)) == (midnight(business_day(-n)), NOW)


@pytest.mark.parametrize("text, n", [
    ("respondido em até 5 dias úteis", 5),
    ("resolvido no prazo de 5 dias úteis", 5),
    ("resolvido nos próximos 3 dias úteis", 3),
])
def test_within_n_business_days_runs_from_now(text, n):
    assert bounds(mention(text)) == (NOW, midnight(business_day(n) + timedelta(days=1)))


# --- fiscal years and quarters (source: pandas Q-MAR / Y-MAR periods) ----------------------


@pytest.mark.parametrize("text, expected", [
    ("receita deste ano fiscal", fiscal_year(2027)),
    ("gastos do ano fiscal em curso", fiscal_year(2027)),
    ("orçamento do próximo exercício fiscal", fiscal_year(2028)),
    ("fechamento do ano fiscal passado", fiscal_year(2026)),
    ("releases do FY27", fiscal_year(2027)),
    ("releases do FY 27", fiscal_year(2027)),
    ("releases do FY2026", fiscal_year(2026)),
    ("bugs do ano fiscal 2026", fiscal_year(2026)),
    ("auditoria do exercício 2026", fiscal_year(2026)),
    ("este trimestre fiscal", fiscal_quarter(TODAY)),
    ("vendas do trimestre fiscal passado", fiscal_quarter(TODAY, -1)),
    ("o último trimestre fiscal", fiscal_quarter(TODAY, -1)),
    ("o próximo trimestre fiscal", fiscal_quarter(TODAY, 1)),
    ("releases do Q1 FY27", fiscal_quarter(date(2026, 4, 1))),
    ("metas do T1 FY27", fiscal_quarter(date(2026, 4, 1))),
    ("bugs do Q2 do FY27", fiscal_quarter(date(2026, 7, 1))),
    ("resultados do T3 fiscal", fiscal_quarter(date(2026, 10, 1))),
    ("vendas do Q3 fiscal", fiscal_quarter(date(2026, 10, 1))),
    ("o primeiro trimestre fiscal", fiscal_quarter(date(2026, 4, 1))),
    ("o terceiro trimestre fiscal", fiscal_quarter(date(2026, 10, 1))),
])
def test_fiscal(text, expected):
    assert bounds(mention(text)) == expected


def test_fiscal_year_names_have_the_other_convention_as_an_alternative():
    alt = mention("releases do FY27").alternatives[0]
    assert alt.policy == "fiscal_name=start"
    assert (alt.start, alt.end) == tuple(x.isoformat() for x in fiscal_year(2028))


# --- traps: no calendar mention ------------------------------------------------------------


TRAPS = [
    "Ele venceu o sprint dos 100 metros",                    # a running race
    "Meu primeiro dia útil na empresa",                      # a person's first day at work
    "O que é um dia útil?",                                  # a definition
    "Fechamento do ano fiscal",                              # no direction or year
    "O exercício anterior da apostila",                      # an exercise, not a fiscal year
    "A iteração 3 do algoritmo",                             # a loop, not a sprint number
    "Na segunda sprint do projeto",                          # an ordinal, not Monday or a sprint
    "O job só roda em dias úteis",                           # business days in general
    "Bugs da sprint 99",                                     # no such sprint in the table
    "A sprint Marrowbone não existe",                        # no such sprint name
]


@pytest.mark.parametrize("text", TRAPS)
def test_traps_give_no_calendar_mention(text):
    result = normalize(text, calendar_context(languages=[LANG], locale="pt_BR"))
    assert result.mentions == (), [m.text for m in result.mentions]


# --- mixed-language questions (Portuguese with English, as teams write them) ---------------


def test_mixed_english_phrase_in_a_portuguese_question():
    m = mention("Quais bugs foram fechados in the last sprint?", languages=("pt", "en"))
    assert m.text == "in the last sprint" and bounds(m) == sprint_span("Foxglove")


def test_mixed_english_words_around_a_portuguese_sprint_window():
    m = mention("Velocity das últimas 3 sprints", languages=("pt", "en"))
    assert bounds(m) == (sprint_span("Tidewrack")[0], sprint_span("Inkwell")[0])


def test_mixed_portuguese_sprint_and_english_bound():
    ctx = calendar_context(languages=["pt", "en"], locale="pt_BR")
    result = normalize("Tickets da sprint 42 closed since last week", ctx)
    assert [m.text for m in result.mentions] == ["da sprint 42", "since last week"]
    assert bounds(result.mentions[0]) == sprint_span("Bramblegate")
    # CLDR via babel: weeks start on Sunday in Brazil, so last week began on 2026-11-22.
    assert bounds(result.mentions[1])[0] == midnight(date(2026, 11, 22))
