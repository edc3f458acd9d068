"""Dutch phrases of the team's calendars: sprints, fiscal years and quarters, business days.

Checked against: the invented sprint table in calendar_cases (read directly), numpy's
``busday_offset`` for business days (source: numpy; Saturday/Sunday weekend of nl_NL from CLDR
via babel), pandas' ``Q-MAR`` / ``Y-MAR`` periods for fiscal quarters and years (source:
pandas). The Dutch phrases are written as Dutch speakers write them in a tracker (common
practice; no published source): "in de lopende sprint", "de voorvorige sprint", "3 werkdagen
geleden", "de volgende werkdag", "vorig boekjaar", "Q1 FY27", "Q3 van het boekjaar".

Decisions, documented here and in locales/nl.toml:
- "het afgelopen boekjaar" (with the article) reads as "het afgelopen jaar" does in this
  project: the rolling window (R5), with the previous whole fiscal year as the
  ``window_reading=calendar`` alternative; "vorig boekjaar" is the previous fiscal year (R2).
- "de voorlaatste sprint" is the sprint before last; "voorlaatste" with any other unit is
  mostly "penultimate" ("de voorlaatste werkdag van de maand") and gives no mention.
- A unit word alone is no period ("het boekjaar", "een sprint", "mijn eerste werkdag"), nor is a
  plural with no number ("de afgelopen sprints").
- "de volgende sprint review" names the next meeting, not the next sprint.
- "boekjaar 2026/27" (a fiscal year named by both calendar years) gives no mention: no form
  reads it yet (noted in locales/nl.toml).
"""

from __future__ import annotations

from datetime import date, timedelta

import pytest

from nlnorm import normalize
from tests.calendars.calendar_cases import (
    business_day, calendar_context, fiscal_quarter, fiscal_year, midnight, sprint_span,
)
from tests.helpers import NOW, TODAY, bounds


def mention(text, languages=("nl",), **fields):  # type: ignore[no-untyped-def]
    result = normalize(text, calendar_context(languages=list(languages), **fields))
    assert len(result.mentions) == 1, (text, [m.text for m in result.mentions])
    return result.mentions[0]


def span(first: str, last: str):  # type: ignore[no-untyped-def]
    return sprint_span(first)[0], sprint_span(last)[1]


# --- one sprint (source: the sprint table; today 2026-12-02 falls in Inkwell) ---------------


@pytest.mark.parametrize("text, sprint", [
    ("Welke bugs staan open in deze sprint?", "Inkwell"),
    ("Wat zit er in de huidige sprint?", "Inkwell"),
    ("tickets van de lopende sprint", "Inkwell"),
    ("stories van de actieve sprint", "Inkwell"),
    ("Wat is er in de vorige sprint blijven liggen?", "Foxglove"),
    ("bugs uit de afgelopen sprint", "Foxglove"),
    ("Wat staat er gepland voor de volgende sprint?", "Harbor-7"),
    ("Welke stories gaan mee in de komende sprint?", "Harbor-7"),
    ("tickets uit de voorvorige sprint", "Bramblegate"),
    ("Wat leverde de voorlaatste sprint op?", "Bramblegate"),
    ("bugs uit sprint 42", "Bramblegate"),
    ("scope van sprint nr. 43", "Foxglove"),
    ("Welke bugs in de sprint Foxglove staan nog open?", "Foxglove"),
    ("doelen van de Foxglove-sprint", "Foxglove"),
    ("Wat ging er mis in sprint Harbor-7?", "Harbor-7"),
    ("review van de Inkwell sprint", "Inkwell"),
])
def test_one_sprint(text, sprint):
    m = mention(text)
    assert m.kind == "sprint"
    assert bounds(m) == sprint_span(sprint)


@pytest.mark.parametrize("text", [
    "velocity van de laatste 3 sprints",
    "Hoeveel bugs waren er in de afgelopen drie sprints?",
])
def test_the_last_three_sprints_are_the_completed_ones(text):
    m = mention(text)
    assert bounds(m) == (sprint_span("Tidewrack")[0], sprint_span("Inkwell")[0])
    assert m.alternatives[0].policy == "sprint_window=with_current"


@pytest.mark.parametrize("text", [
    "Wat plannen we voor de komende 2 sprints?",
    "capaciteit in de volgende twee sprints",
])
def test_the_next_two_sprints_follow_the_current_one(text):
    # On 2026-11-18 Foxglove runs; the next two are Inkwell and Harbor-7 (read from the table).
    assert bounds(mention(text, now="2026-11-18T10:00")) == span("Inkwell", "Harbor-7")


@pytest.mark.parametrize("text, sprint", [
    ("Wat stond er 3 sprints geleden open?", "Tidewrack"),
    ("bugs van twee sprints terug", "Bramblegate"),
])
def test_sprints_ago(text, sprint):
    assert bounds(mention(text)) == sprint_span(sprint)


@pytest.mark.parametrize("text, start, end", [
    ("bugs die sinds sprint 42 openstaan", sprint_span("Bramblegate")[0], None),
    ("tickets sinds de Foxglove-sprint", sprint_span("Foxglove")[0], None),
    ("aangemaakt sinds de vorige sprint", sprint_span("Foxglove")[0], None),
    ("gesloten vóór sprint 43", None, sprint_span("Foxglove")[0]),
    ("Wat is er voor de sprint Inkwell gemerged?", None, sprint_span("Inkwell")[0]),
    ("tussen sprint 41 en sprint 43", *span("Tidewrack", "Foxglove")),
    ("van sprint 41 tot sprint 43", *span("Tidewrack", "Foxglove")),
    ("velocity van sprints 41 t/m 43", *span("Tidewrack", "Foxglove")),
])
def test_sprint_bounds(text, start, end):
    assert bounds(mention(text)) == (start, end)


# --- business days (source: numpy.busday_offset; Saturday/Sunday weekend from CLDR nl_NL) ----


@pytest.mark.parametrize("text, n", [
    ("tickets die 3 werkdagen geleden gesloten zijn", -3),
    ("Wat gebeurde er twee werkdagen geleden?", -2),
    ("deploys op de vorige werkdag", -1),
    ("Wat ging er mis op de laatste werkdag?", -1),
    ("Moet dit de volgende werkdag af?", 1),
    ("op de eerstvolgende werkdag", 1),
    ("over 3 werkdagen klaar", 3),
])
def test_business_days(text, n):
    day = business_day(n)
    assert bounds(mention(text, locale="nl_NL")) == (midnight(day), midnight(day + timedelta(days=1)))


@pytest.mark.parametrize("text, n", [
    ("bugs aangemaakt in de afgelopen 10 werkdagen", 10),
    ("deploys van de laatste vijf werkdagen", 5),
])
def test_in_the_last_n_business_days_runs_to_now(text, n):
    assert bounds(mention(text, locale="nl_NL")) == (midnight(business_day(-n)), NOW)


@pytest.mark.parametrize("text, n", [
    ("antwoord binnen 5 werkdagen", 5),
    ("binnen drie werkdagen opgelost", 3),
])
def test_within_n_business_days_runs_from_now(text, n):
    last = business_day(n)
    assert bounds(mention(text, locale="nl_NL")) == (NOW, midnight(last + timedelta(days=1)))


# --- fiscal years and quarters (source: pandas Q-MAR / Y-MAR periods) -----------------------


@pytest.mark.parametrize("text, expected", [
    ("omzet dit boekjaar", fiscal_year(2027)),
    ("releases in het lopende boekjaar", fiscal_year(2027)),
    ("kosten in het huidige fiscale jaar", fiscal_year(2027)),
    ("omzet vorig boekjaar", fiscal_year(2026)),
    ("vorig fiscaal kwartaal", fiscal_quarter(TODAY, -1)),
    ("Wat leverde het vorige fiscale kwartaal op?", fiscal_quarter(TODAY, -1)),
    ("doelen voor het volgende fiscale kwartaal", fiscal_quarter(TODAY, 1)),
    ("releases in FY27", fiscal_year(2027)),
    ("budget van FY 27", fiscal_year(2027)),
    ("releases in FY2026", fiscal_year(2026)),
    ("omzet in boekjaar 2026", fiscal_year(2026)),
    ("omzet in het fiscale jaar 2026", fiscal_year(2026)),
    ("releases in Q1 FY27", fiscal_quarter(date(2026, 4, 1))),
    ("roadmap Q1 van FY27", fiscal_quarter(date(2026, 4, 1))),
    ("bugs in Q3 van het boekjaar", fiscal_quarter(date(2026, 10, 1))),
    ("fiscaal Q3", fiscal_quarter(date(2026, 10, 1))),
    ("het eerste fiscale kwartaal", fiscal_quarter(date(2026, 4, 1))),
    ("in het derde kwartaal van het boekjaar", fiscal_quarter(date(2026, 10, 1))),
])
def test_fiscal(text, expected):
    assert bounds(mention(text)) == expected


def test_het_afgelopen_boekjaar_is_the_rolling_window_with_the_fiscal_year_as_alternative():
    m = mention("omzet in het afgelopen boekjaar")
    assert m.reading == "R5"
    assert bounds(m)[1] == NOW
    alt = m.alternatives[0]
    assert alt.policy == "window_reading=calendar"
    assert (alt.start, alt.end) == tuple(x.isoformat() for x in fiscal_year(2026))


def test_fy27_has_the_other_naming_convention_as_an_alternative():
    alt = mention("releases in FY27").alternatives[0]
    assert alt.policy == "fiscal_name=start"
    assert (alt.start, alt.end) == tuple(x.isoformat() for x in fiscal_year(2028))


# --- traps: no calendar mention (with the sprint table and fiscal calendar in the context) --

TRAPS = [
    ("sprint-the-race", "Wie wint de sprint bij de bedrijfsloop?"),
    ("eerste-werkdag", "Hoe was je eerste werkdag bij Quillmere?"),
    ("bare-boekjaar", "Wanneer begint het boekjaar bij Quillmere Instruments?"),
    ("een-sprint-is-no-period", "Hoeveel werkdagen heeft een sprint?"),
    ("drukke-werkdag", "Het was een drukke werkdag"),
    ("de-volgende-sprint-review", "Wanneer is de volgende sprint review?"),
    ("de-vorige-sprint-retro", "Wie leidde de vorige sprint-retro?"),
    ("voor-de-volgende-sprint-review", "Wat moet er af voor de volgende sprint-review?"),
    ("voorlaatste-werkdag-van-de-maand", "Wat gebeurt er op de voorlaatste werkdag van de maand?"),
    ("voorlaatste-dag-van-de-sprint", "Wie deployt op de voorlaatste dag van de sprint?"),
    ("de-afgelopen-sprints-no-number", "Wat hebben we de afgelopen sprints opgeleverd?"),
    ("sprintdoelen-compound", "Wat zijn de sprintdoelen van het team?"),
    ("unknown-sprint-number", "scope van sprint 99"),
    ("unknown-sprint-name", "tickets uit de Marrowbone-sprint"),
    ("boekjaar-spanning-two-years", "budget voor boekjaar 2026/27"),
]


@pytest.mark.parametrize("question", [q for _, q in TRAPS], ids=[i for i, _ in TRAPS])
def test_a_dutch_look_alike_gives_no_calendar_mention(question):
    result = normalize(question, calendar_context(languages=["nl"], locale="nl_NL"))
    assert result.mentions == (), [m.text for m in result.mentions]


# --- mixed Dutch and English -----------------------------------------------------------------


@pytest.mark.parametrize("text, phrase, expected", [
    ("bugs since de vorige sprint", "since de vorige sprint", (sprint_span("Foxglove")[0], None)),
    ("what changed sinds sprint 42", "sinds sprint 42", (sprint_span("Bramblegate")[0], None)),
    ("omzet in FY27 vs. last fiscal year", "in FY27", fiscal_year(2027)),
])
def test_mixed_dutch_and_english(text, phrase, expected):
    result = normalize(text, calendar_context(languages=["nl", "en"]))
    m = result.mentions[0]
    assert m.text == phrase
    assert bounds(m) == expected


def test_mixed_question_finds_both_languages_phrases():
    result = normalize("tickets uit sprint 42 from last week", calendar_context(languages=["nl", "en"]))
    assert [m.text for m in result.mentions] == ["sprint 42", "from last week"]
    assert bounds(result.mentions[0]) == sprint_span("Bramblegate")
    result = normalize("omzet in FY27 vs. last fiscal year", calendar_context(languages=["nl", "en"]))
    assert bounds(result.mentions[1]) == fiscal_year(2026)
