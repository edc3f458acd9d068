"""Spanish phrases of the team's calendars: sprints (sprint, iteración), business days (día
hábil, día laborable), fiscal years and quarters (año fiscal, ejercicio, trimestre fiscal, FY27,
AF 2026, T1 AF27).

Checked against: the invented sprint table in calendar_cases (read directly), numpy's
``busday_offset`` for business days (source: numpy; weekend Saturday and Sunday from CLDR via
babel for the es_ES locale of these tests), pandas' ``Q-MAR`` / ``Y-MAR`` periods for fiscal
quarters and years (source: pandas). The questions are written from knowledge of Spanish as used
in work-tracker questions (common practice, no published source).

Decisions (common practice, no published source):
- "el último trimestre fiscal" is the rolling last three months up to now (R5), as "el último
  trimestre" is in Spanish and "the last fiscal quarter" in English; the previous fiscal quarter
  is "el trimestre fiscal pasado / anterior" (R2);
- "dentro de 5 días hábiles" is a point five business days ahead (R4), as "dentro de 5 días" is;
  "within" is "en un plazo de 5 días hábiles" (R6) or "en los próximos 5 días hábiles";
- "ejercicio" alone is no unit ("el ejercicio anterior del tutorial" is an exercise): only
  "ejercicio fiscal" is, and "ejercicio 2026" with a year is a fiscal year (R25);
- only "sprint" before a number names a sprint: "la iteración 3 del algoritmo" is a loop;
- a bare "año fiscal", "día hábil" or "sprint" with no direction, number or name names no
  particular period ("Cierre del año fiscal", "¿Qué es un día hábil?", "el sprint final").
"""

from __future__ import annotations

from datetime import date, timedelta

import pytest

from nlnorm import normalize
from tests.calendars.calendar_cases import (
    business_day, calendar_context, fiscal_quarter, fiscal_year, midnight, sprint_span,
)
from tests.helpers import NOW, TODAY, bounds

LANG = "es"


def mention(text, languages=(LANG,), **fields):  # type: ignore[no-untyped-def]
    result = normalize(text, calendar_context(languages=list(languages), locale="es_ES", **fields))
    assert len(result.mentions) == 1, (text, [m.text for m in result.mentions])
    return result.mentions[0]


def day_of(n: int):  # type: ignore[no-untyped-def]
    day = business_day(n)
    return midnight(day), midnight(day + timedelta(days=1))


# --- sprints (source: the sprint table; today 2026-12-02 is in Inkwell) ----------------------


@pytest.mark.parametrize("text, phrase, sprint", [
    ("bugs de este sprint", "de este sprint", "Inkwell"),
    ("¿Qué hay en el sprint actual?", "en el sprint actual", "Inkwell"),
    ("historias del sprint en curso", "del sprint en curso", "Inkwell"),
    ("historias del sprint activo", "del sprint activo", "Inkwell"),
    ("¿Qué quedó pendiente del sprint pasado?", "del sprint pasado", "Foxglove"),
    ("tickets del sprint anterior", "del sprint anterior", "Foxglove"),
    ("¿Qué está planificado para el próximo sprint?", "el próximo sprint", "Harbor-7"),
    ("Historias para el sprint que viene", "el sprint que viene", "Harbor-7"),
    ("bugs cerrados en el penúltimo sprint", "en el penúltimo sprint", "Bramblegate"),
    ("tareas de la penúltima iteración", "de la penúltima iteración", "Bramblegate"),
    ("bugs del sprint 42", "del sprint 42", "Bramblegate"),
    ("alcance del sprint #43", "del sprint #43", "Foxglove"),
    ("tickets del sprint nº 41", "del sprint nº 41", "Tidewrack"),
    ("¿Qué bugs del sprint Foxglove siguen abiertos?", "del sprint Foxglove", "Foxglove"),
    ("objetivos del sprint Harbor-7", "del sprint Harbor-7", "Harbor-7"),
    ("objetivos del Harbor-7 sprint", "del Harbor-7 sprint", "Harbor-7"),
    ("retro de la iteración Inkwell", "de la iteración Inkwell", "Inkwell"),
    ("bugs que entraron hace 2 sprints", "hace 2 sprints", "Bramblegate"),
    ("lo que se cerró hace un sprint", "hace un sprint", "Foxglove"),
])
def test_one_sprint(text, phrase, sprint):
    m = mention(text)
    assert (m.text, m.kind) == (phrase, "sprint")
    assert bounds(m) == sprint_span(sprint)


@pytest.mark.parametrize("text, first", [
    ("velocidad de los últimos 3 sprints", "Tidewrack"),
    ("bugs de las últimas dos iteraciones", "Bramblegate"),
])
def test_the_last_n_sprints_end_where_the_current_one_starts(text, first):
    assert bounds(mention(text)) == (sprint_span(first)[0], sprint_span("Inkwell")[0])


@pytest.mark.parametrize("text", ["los próximos dos sprints", "en los 2 próximos sprints"])
def test_the_next_n_sprints_are_the_ones_after_the_current_one(text):
    # On 2026-11-18 (in Foxglove) the next two are Inkwell and Harbor-7.
    m = mention(text, now="2026-11-18T10:00")
    assert bounds(m) == (sprint_span("Inkwell")[0], sprint_span("Harbor-7")[1])
    assert m.alternatives[0].policy == "sprint_window=with_current"


@pytest.mark.parametrize("text, start, end", [
    ("bugs abiertos desde el sprint 42", sprint_span("Bramblegate")[0], None),
    ("tickets creados desde el sprint Foxglove", sprint_span("Foxglove")[0], None),
    ("cerrados antes del sprint 43", None, sprint_span("Foxglove")[0]),
    ("bugs resueltos hasta el sprint Foxglove", None, sprint_span("Foxglove")[1]),
    ("entre el sprint 41 y el sprint 43", sprint_span("Tidewrack")[0], sprint_span("Foxglove")[1]),
    ("bugs cerrados entre el sprint 41 y el 43", sprint_span("Tidewrack")[0], sprint_span("Foxglove")[1]),
    ("los sprints del 41 al 43", sprint_span("Tidewrack")[0], sprint_span("Foxglove")[1]),
    ("del sprint 42 al 44", sprint_span("Bramblegate")[0], sprint_span("Inkwell")[1]),
])
def test_sprint_bounds_and_ranges(text, start, end):
    assert bounds(mention(text)) == (start, end)


@pytest.mark.parametrize("text, start, end", [
    ("bugs resueltos antes del sprint Inkwell", None, sprint_span("Inkwell")[0]),
    ("tickets creados a partir del sprint Foxglove", sprint_span("Foxglove")[0], None),
])
def test_a_connective_ending_in_del_before_a_named_sprint(text, start, end):
    assert bounds(mention(text)) == (start, end)


# --- business days (source: numpy.busday_offset; Saturday/Sunday weekend from CLDR for ES) ---


@pytest.mark.parametrize("text, n", [
    ("tickets cerrados hace 3 días hábiles", -3),
    ("¿Qué pasó hace 1 día laborable?", -1),
    ("bugs del último día hábil", -1),
    ("lo que se abrió el día hábil anterior", -1),
    ("se entrega el próximo día hábil", 1),
    ("para el día laborable siguiente", 1),
    ("el siguiente día hábil", 1),
    ("dentro de 3 días hábiles", 3),
])
def test_business_days(text, n):
    assert bounds(mention(text)) == day_of(n)


@pytest.mark.parametrize("text, n", [
    ("bugs abiertos en los últimos 10 días hábiles", 10),
    ("tickets de los últimos 5 días laborables", 5),
])
def test_in_the_last_n_business_days_runs_to_now(text, n):
    assert bounds(mention(text)) == (midnight(business_day(-n)), NOW)


@pytest.mark.parametrize("text, n", [
    ("respondido en un plazo de 5 días hábiles", 5),
    ("resuelto en los próximos 3 días laborables", 3),
])
def test_within_n_business_days_runs_from_now(text, n):
    assert bounds(mention(text)) == (NOW, midnight(business_day(n) + timedelta(days=1)))


# --- fiscal years and quarters (source: pandas Q-MAR / Y-MAR periods) ----------------------


@pytest.mark.parametrize("text, expected", [
    ("ingresos de este año fiscal", fiscal_year(2027)),
    ("gastos del año fiscal en curso", fiscal_year(2027)),
    ("presupuesto del próximo ejercicio fiscal", fiscal_year(2028)),
    ("cierre del año fiscal pasado", fiscal_year(2026)),
    ("releases del FY27", fiscal_year(2027)),
    ("entregas del AF27", fiscal_year(2027)),
    ("releases del FY2026", fiscal_year(2026)),
    ("entregas del AF 2026", fiscal_year(2026)),
    ("bugs del año fiscal 2026", fiscal_year(2026)),
    ("auditoría del ejercicio 2026", fiscal_year(2026)),
    ("este trimestre fiscal", fiscal_quarter(TODAY)),
    ("ventas del trimestre fiscal pasado", fiscal_quarter(TODAY, -1)),
    ("el trimestre fiscal anterior", fiscal_quarter(TODAY, -1)),
    ("el próximo trimestre fiscal", fiscal_quarter(TODAY, 1)),
    ("releases del T1 AF27", fiscal_quarter(date(2026, 4, 1))),
    ("objetivos del Q1 FY27", fiscal_quarter(date(2026, 4, 1))),
    ("bugs del Q2 del FY27", fiscal_quarter(date(2026, 7, 1))),
    ("resultados del T3 fiscal", fiscal_quarter(date(2026, 10, 1))),
    ("ventas del Q3 fiscal", fiscal_quarter(date(2026, 10, 1))),
    ("el primer trimestre fiscal", fiscal_quarter(date(2026, 4, 1))),
    ("el tercer trimestre fiscal", fiscal_quarter(date(2026, 10, 1))),
])
def test_fiscal(text, expected):
    assert bounds(mention(text)) == expected


def test_the_last_fiscal_quarter_is_the_rolling_three_months_as_the_last_quarter_is():
    # R5: three months back from now (2026-09-02 10:00), up to now.
    start, end = bounds(mention("el último trimestre fiscal"))
    assert end == NOW and (start.year, start.month, start.day) == (2026, 9, 2)


def test_fiscal_year_names_have_the_other_convention_as_an_alternative():
    alt = mention("releases del FY27").alternatives[0]
    assert alt.policy == "fiscal_name=start"
    assert (alt.start, alt.end) == tuple(x.isoformat() for x in fiscal_year(2028))


# --- traps: no calendar mention ------------------------------------------------------------


TRAPS = [
    "Ganó el sprint de los 100 metros en el campeonato",     # a running race
    "El sprint final del proyecto fue duro",                 # no direction, number or name
    "Mi primer día hábil en la empresa",                     # a person's first day at work
    "¿Qué es un día hábil?",                                 # a definition
    "Cierre del año fiscal",                                 # no direction or year
    "El ejercicio anterior del tutorial",                    # an exercise, not a fiscal year
    "La iteración 3 del algoritmo",                          # a loop, not a sprint number
    "Los días hábiles del calendario laboral",
    "Bugs del sprint 99",                                    # no such sprint in the table
    "El sprint Marrowbone no existe",                        # no such sprint name
]


@pytest.mark.parametrize("text", TRAPS)
def test_traps_give_no_calendar_mention(text):
    result = normalize(text, calendar_context(languages=[LANG], locale="es_ES"))
    assert result.mentions == (), [m.text for m in result.mentions]


# --- mixed-language questions (Spanish with English, as teams write them) ------------------


def test_mixed_english_phrase_in_a_spanish_question():
    m = mention("¿Qué bugs se cerraron in the last sprint?", languages=("es", "en"))
    assert m.text == "in the last sprint" and bounds(m) == sprint_span("Foxglove")


def test_mixed_english_words_around_a_spanish_sprint_window():
    m = mention("Velocity de los últimos 3 sprints", languages=("es", "en"))
    assert bounds(m) == (sprint_span("Tidewrack")[0], sprint_span("Inkwell")[0])


def test_mixed_spanish_sprint_and_english_bound():
    ctx = calendar_context(languages=["es", "en"], locale="es_ES")
    result = normalize("Tickets del sprint 42 closed since last week", ctx)
    assert [m.text for m in result.mentions] == ["del sprint 42", "since last week"]
    assert bounds(result.mentions[0]) == sprint_span("Bramblegate")
    assert bounds(result.mentions[1])[0] == midnight(date(2026, 11, 23))
