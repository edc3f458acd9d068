"""Italian phrases of the team's calendars: sprints (sprint, iterazione), business days (giorno
lavorativo, giornata lavorativa, giorno feriale), fiscal years and quarters (anno fiscale,
esercizio, trimestre fiscale, FY27, Q1 FY27).

Checked against: the invented sprint table in calendar_cases (read directly), numpy's
``busday_offset`` for business days (source: numpy; weekend Saturday and Sunday from CLDR via
babel for the it_IT locale of these tests), pandas' ``Q-MAR`` / ``Y-MAR`` periods for fiscal
quarters and years (source: pandas). The questions are written from knowledge of Italian as used
in work-tracker questions (common practice, no published source).

Decisions (common practice, no published source):
- "l'ultimo trimestre fiscale" is the rolling last three months up to now (R5), as "l'ultimo
  trimestre" is and "the last fiscal quarter" is in English; the previous fiscal quarter is "il
  trimestre fiscale scorso / precedente" (R2);
- "dallo sprint scorso" is since the last sprint (R7: "dallo" is "from/since"), so the tests ask
  for the last sprint with "dello"/"nello";
- "esercizio" alone is no unit ("l'esercizio precedente del manuale" is an exercise): only
  "esercizio fiscale" is, and "esercizio 2026" with a year is a fiscal year (R25);
- only "sprint" before a number names a sprint: "l'iterazione 3 dell'algoritmo" is a loop;
- "successivo" is read as next like "prossimo" ("il giorno lavorativo successivo");
- a bare "anno fiscale", "giorno lavorativo" or "sprint" with no direction, number or name names no
  particular period ("Chiusura dell'anno fiscale", "Cos'è un giorno lavorativo?", "lo sprint
  finale della tappa").
"""

from __future__ import annotations

from datetime import date, timedelta

import pytest

from nlnorm import normalize
from tests.calendars.calendar_cases import (
    business_day, calendar_context, fiscal_quarter, fiscal_year, midnight, sprint_span,
)
from tests.helpers import NOW, TODAY, bounds

LANG = "it"


def mention(text, languages=(LANG,), **fields):  # type: ignore[no-untyped-def]
    result = normalize(text, calendar_context(languages=list(languages), locale="it_IT", **fields))
    assert len(result.mentions) == 1, (text, [m.text for m in result.mentions])
    return result.mentions[0]


def day_of(n: int):  # type: ignore[no-untyped-def]
    day = business_day(n)
    return midnight(day), midnight(day + timedelta(days=1))


# --- sprints (source: the sprint table; today 2026-12-02 is in Inkwell) ----------------------


@pytest.mark.parametrize("text, phrase, sprint", [
    ("bug di questo sprint", "questo sprint", "Inkwell"),
    ("cosa c'è nello sprint corrente", "nello sprint corrente", "Inkwell"),
    ("storie dello sprint in corso", "sprint in corso", "Inkwell"),
    ("storie dello sprint attivo", "sprint attivo", "Inkwell"),
    ("task di quest'iterazione", "quest'iterazione", "Inkwell"),
    ("cosa è rimasto aperto nello sprint scorso", "nello sprint scorso", "Foxglove"),
    ("ticket dello sprint precedente", "sprint precedente", "Foxglove"),
    ("cosa è pianificato per il prossimo sprint", "il prossimo sprint", "Harbor-7"),
    ("storie per lo sprint successivo", "lo sprint successivo", "Harbor-7"),
    ("bug chiusi nel penultimo sprint", "nel penultimo sprint", "Bramblegate"),
    ("task della penultima iterazione", "penultima iterazione", "Bramblegate"),
    ("bug dello sprint 42", "sprint 42", "Bramblegate"),
    ("scope dello sprint #43", "sprint #43", "Foxglove"),
    ("ticket dello sprint n. 41", "sprint n. 41", "Tidewrack"),
    ("quali bug dello sprint Foxglove sono ancora aperti", "sprint Foxglove", "Foxglove"),
    ("obiettivi dello sprint Harbor-7", "sprint Harbor-7", "Harbor-7"),
    ("obiettivi del Harbor-7 sprint", "Harbor-7 sprint", "Harbor-7"),
    ("retro dell'iterazione Inkwell", "iterazione Inkwell", "Inkwell"),
    ("bug entrati 2 sprint fa", "2 sprint fa", "Bramblegate"),
    ("cosa è stato chiuso uno sprint fa", "uno sprint fa", "Foxglove"),
])
def test_one_sprint(text, phrase, sprint):
    m = mention(text)
    assert (m.text, m.kind) == (phrase, "sprint")
    assert bounds(m) == sprint_span(sprint)


@pytest.mark.parametrize("text, first", [
    ("velocity degli ultimi 3 sprint", "Tidewrack"),
    ("bug delle ultime due iterazioni", "Bramblegate"),
])
def test_the_last_n_sprints_end_where_the_current_one_starts(text, first):
    assert bounds(mention(text)) == (sprint_span(first)[0], sprint_span("Inkwell")[0])


@pytest.mark.parametrize("text", ["i prossimi due sprint", "nei prossimi 2 sprint"])
def test_the_next_n_sprints_are_the_ones_after_the_current_one(text):
    # On 2026-11-18 (in Foxglove) the next two are Inkwell and Harbor-7.
    m = mention(text, now="2026-11-18T10:00")
    assert bounds(m) == (sprint_span("Inkwell")[0], sprint_span("Harbor-7")[1])
    assert m.alternatives[0].policy == "sprint_window=with_current"


@pytest.mark.parametrize("text, start, end", [
    ("bug aperti dallo sprint 42", sprint_span("Bramblegate")[0], None),
    ("ticket creati a partire dallo sprint Foxglove", sprint_span("Foxglove")[0], None),
    ("chiusi prima dello sprint 43", None, sprint_span("Foxglove")[0]),
    ("bug risolti prima dello sprint Inkwell", None, sprint_span("Inkwell")[0]),
    ("tra lo sprint 41 e lo sprint 43", sprint_span("Tidewrack")[0], sprint_span("Foxglove")[1]),
    ("bug chiusi tra lo sprint 41 e il 43", sprint_span("Tidewrack")[0], sprint_span("Foxglove")[1]),
    ("gli sprint dal 41 al 43", sprint_span("Tidewrack")[0], sprint_span("Foxglove")[1]),
    ("dallo sprint 42 al 44", sprint_span("Bramblegate")[0], sprint_span("Inkwell")[1]),
])
def test_sprint_bounds_and_ranges(text, start, end):
    assert bounds(mention(text)) == (start, end)


# --- business days (source: numpy.busday_offset; Saturday/Sunday weekend from CLDR for IT) ---


@pytest.mark.parametrize("text, n", [
    ("ticket chiusi 3 giorni lavorativi fa", -3),
    ("cosa è successo 1 giorno lavorativo fa", -1),
    ("bug dell'ultimo giorno lavorativo", -1),
    ("aperto il giorno lavorativo precedente", -1),
    ("consegna il prossimo giorno lavorativo", 1),
    ("per il giorno lavorativo successivo", 1),
    ("tra 3 giorni lavorativi", 3),
])
def test_business_days(text, n):
    assert bounds(mention(text)) == day_of(n)


@pytest.mark.parametrize("text, n", [
    ("bug aperti negli ultimi 10 giorni lavorativi", 10),
    ("ticket delle ultime 5 giornate lavorative", 5),
])
def test_in_the_last_n_business_days_runs_to_now(text, n):
    assert bounds(mention(text)) == (midnight(business_day(-n)), NOW)


@pytest.mark.parametrize("text, n", [
    ("risposto entro 5 giorni lavorativi", 5),
    ("risolto nei prossimi 3 giorni lavorativi", 3),
])
def test_within_n_business_days_runs_from_now(text, n):
    assert bounds(mention(text)) == (NOW, midnight(business_day(n) + timedelta(days=1)))


# --- fiscal years and quarters (source: pandas Q-MAR / Y-MAR periods) ----------------------


@pytest.mark.parametrize("text, expected", [
    ("fatturato di quest'anno fiscale", fiscal_year(2027)),
    ("spese dell'anno fiscale in corso", fiscal_year(2027)),
    ("budget del prossimo esercizio fiscale", fiscal_year(2028)),
    ("chiusura dell'anno fiscale scorso", fiscal_year(2026)),
    ("release dell'FY27", fiscal_year(2027)),
    ("release del FY 27", fiscal_year(2027)),
    ("release dell'FY2026", fiscal_year(2026)),
    ("bug dell'anno fiscale 2026", fiscal_year(2026)),
    ("revisione dell'esercizio 2026", fiscal_year(2026)),
    ("questo trimestre fiscale", fiscal_quarter(TODAY)),
    ("vendite del trimestre fiscale scorso", fiscal_quarter(TODAY, -1)),
    ("il trimestre fiscale precedente", fiscal_quarter(TODAY, -1)),
    ("il prossimo trimestre fiscale", fiscal_quarter(TODAY, 1)),
    ("release del Q1 FY27", fiscal_quarter(date(2026, 4, 1))),
    ("obiettivi del T1 FY27", fiscal_quarter(date(2026, 4, 1))),
    ("bug del Q2 dell'FY27", fiscal_quarter(date(2026, 7, 1))),
    ("risultati del Q3 fiscale", fiscal_quarter(date(2026, 10, 1))),
    ("il T3 fiscale", fiscal_quarter(date(2026, 10, 1))),
    ("il primo trimestre fiscale", fiscal_quarter(date(2026, 4, 1))),
    ("il terzo trimestre fiscale", fiscal_quarter(date(2026, 10, 1))),
])
def test_fiscal(text, expected):
    assert bounds(mention(text)) == expected


def test_the_last_fiscal_quarter_is_the_rolling_three_months_as_the_last_quarter_is():
    start, end = bounds(mention("l'ultimo trimestre fiscale"))
    assert end == NOW and (start.year, start.month, start.day) == (2026, 9, 2)


def test_fiscal_year_names_have_the_other_convention_as_an_alternative():
    alt = mention("release dell'FY27").alternatives[0]
    assert alt.policy == "fiscal_name=start"
    assert (alt.start, alt.end) == tuple(x.isoformat() for x in fiscal_year(2028))


# --- traps: no calendar mention ------------------------------------------------------------


TRAPS = [
    "Ha vinto lo sprint finale della tappa",                 # a cycling sprint
    "Il mio primo giorno lavorativo in azienda",             # a person's first day at work
    "Cos'è un giorno lavorativo?",                           # a definition
    "Chiusura dell'anno fiscale",                            # no direction or year
    "L'esercizio precedente del manuale",                    # an exercise, not a fiscal year
    "L'iterazione 3 dell'algoritmo",                         # a loop, not a sprint number
    "Il job gira solo nei giorni feriali",                   # weekdays in general
    "Bug dello sprint 99",                                   # no such sprint in the table
    "Lo sprint Marrowbone non esiste",                       # no such sprint name
]


@pytest.mark.parametrize("text", TRAPS)
def test_traps_give_no_calendar_mention(text):
    result = normalize(text, calendar_context(languages=[LANG], locale="it_IT"))
    assert result.mentions == (), [m.text for m in result.mentions]


# --- mixed-language questions (Italian with English, as teams write them) ------------------


def test_mixed_english_phrase_in_an_italian_question():
    m = mention("Quali bug sono stati chiusi in the last sprint?", languages=("it", "en"))
    assert m.text == "in the last sprint" and bounds(m) == sprint_span("Foxglove")


def test_mixed_english_words_around_an_italian_sprint_window():
    m = mention("Velocity degli ultimi 3 sprint", languages=("it", "en"))
    assert bounds(m) == (sprint_span("Tidewrack")[0], sprint_span("Inkwell")[0])


def test_mixed_italian_sprint_and_english_bound():
    ctx = calendar_context(languages=["it", "en"], locale="it_IT")
    result = normalize("Ticket dello sprint 42 closed since last week", ctx)
    assert [m.text for m in result.mentions] == ["sprint 42", "since last week"]
    assert bounds(result.mentions[0]) == sprint_span("Bramblegate")
    assert bounds(result.mentions[1])[0] == midnight(date(2026, 11, 23))
