"""German phrases of the team's calendars: sprints, fiscal years and quarters, business days.

Checked against: the invented sprint table in calendar_cases (read directly), numpy's
``busday_offset`` for business days (source: numpy; Saturday/Sunday weekend of de_DE from CLDR
via babel), pandas' ``Q-MAR`` / ``Y-MAR`` periods for fiscal quarters and years (source:
pandas). The German phrases are written as German speakers write them in a tracker (common
practice; no published source): "im laufenden Sprint", "der vorletzte Sprint", "vor 3
Arbeitstagen", "am nächsten Werktag", "im GJ27", "Q1 GJ27", "Q3 des Geschäftsjahres".

Decisions, documented here and in locales/de.toml:
- "im letzten Geschäftsquartal" (with the article folded into "im") reads as German "im letzten
  Monat" does in this project: the rolling window (R5), with the previous whole fiscal quarter
  as the ``window_reading=calendar`` alternative. Without the article ("letztes
  Geschäftsquartal", "das letzte Geschäftsquartal") it is the previous fiscal quarter (R2).
- A unit word alone is no period: "das Geschäftsjahr", "ein Sprint", "mein erster Arbeitstag".
- "das nächste Sprint-Review" names the next meeting, not the next sprint.
- "GJ 2026/27" (a fiscal year named by both calendar years) gives no mention: see the report
  noted in locales/de.toml: no form reads it yet.
"""

from __future__ import annotations

from datetime import date, timedelta

import pytest

from nlnorm import normalize
from tests.calendars.calendar_cases import (
    business_day, calendar_context, fiscal_quarter, fiscal_year, midnight, sprint_span,
)
from tests.helpers import NOW, TODAY, bounds


def mention(text, languages=("de",), **fields):  # type: ignore[no-untyped-def]
    result = normalize(text, calendar_context(languages=list(languages), **fields))
    assert len(result.mentions) == 1, (text, [m.text for m in result.mentions])
    return result.mentions[0]


def span(first: str, last: str):  # type: ignore[no-untyped-def]
    return sprint_span(first)[0], sprint_span(last)[1]


# --- one sprint (source: the sprint table; today 2026-12-02 falls in Inkwell) ---------------


@pytest.mark.parametrize("text, sprint", [
    ("Welche Bugs sind in diesem Sprint offen?", "Inkwell"),
    ("Was steht im aktuellen Sprint an?", "Inkwell"),
    ("Tickets im laufenden Sprint", "Inkwell"),
    ("Stories des aktiven Sprints", "Inkwell"),
    ("Was wurde im letzten Sprint nicht fertig?", "Foxglove"),
    ("Bugs aus dem vorigen Sprint", "Foxglove"),
    ("Was ist für den nächsten Sprint geplant?", "Harbor-7"),
    ("Welche Stories kommen in den kommenden Sprint?", "Harbor-7"),
    ("Tickets aus dem vorletzten Sprint", "Bramblegate"),
    ("Was hat der vorletzte Sprint geliefert?", "Bramblegate"),
    ("Bugs aus Sprint 42", "Bramblegate"),
    ("Umfang von Sprint Nr. 43", "Foxglove"),
    ("Welche Bugs im Sprint Foxglove sind noch offen?", "Foxglove"),
    ("Ziele des Foxglove-Sprints", "Foxglove"),
    ("Was lief im Harbor-7-Sprint schief?", "Harbor-7"),
    ("Review von Sprint Inkwell", "Inkwell"),
])
def test_one_sprint(text, sprint):
    m = mention(text)
    assert m.kind == "sprint"
    assert bounds(m) == sprint_span(sprint)


@pytest.mark.parametrize("text", [
    "Velocity der letzten 3 Sprints",
    "Wie viele Bugs gab es in den letzten drei Sprints?",
])
def test_the_last_three_sprints_are_the_completed_ones(text):
    m = mention(text)
    assert bounds(m) == (sprint_span("Tidewrack")[0], sprint_span("Inkwell")[0])
    assert m.alternatives[0].policy == "sprint_window=with_current"


@pytest.mark.parametrize("text", [
    "Was planen wir für die nächsten 2 Sprints?",
    "Kapazität in den nächsten zwei Sprints",
])
def test_the_next_two_sprints_follow_the_current_one(text):
    # On 2026-11-18 Foxglove runs; the next two are Inkwell and Harbor-7 (read from the table).
    assert bounds(mention(text, now="2026-11-18T10:00")) == span("Inkwell", "Harbor-7")


@pytest.mark.parametrize("text, sprint", [
    ("Was war vor 3 Sprints offen?", "Tidewrack"),
    ("Bugs von vor zwei Sprints", "Bramblegate"),
])
def test_sprints_ago(text, sprint):
    assert bounds(mention(text)) == sprint_span(sprint)


@pytest.mark.parametrize("text, start, end", [
    ("Bugs, die seit Sprint 42 offen sind", sprint_span("Bramblegate")[0], None),
    ("Tickets seit dem Foxglove-Sprint", sprint_span("Foxglove")[0], None),
    ("seit dem letzten Sprint erstellt", sprint_span("Foxglove")[0], None),
    ("vor Sprint 43 geschlossen", None, sprint_span("Foxglove")[0]),
    ("Was wurde vor dem Sprint Inkwell gemergt?", None, sprint_span("Inkwell")[0]),
    ("zwischen Sprint 41 und Sprint 43", *span("Tidewrack", "Foxglove")),
    ("von Sprint 41 bis Sprint 43", *span("Tidewrack", "Foxglove")),
    ("Velocity der Sprints 41 bis 43", *span("Tidewrack", "Foxglove")),
])
def test_sprint_bounds(text, start, end):
    assert bounds(mention(text)) == (start, end)


# --- business days (source: numpy.busday_offset; Saturday/Sunday weekend from CLDR de_DE) ----


@pytest.mark.parametrize("text, n", [
    ("Tickets, die vor 3 Arbeitstagen geschlossen wurden", -3),
    ("Was ist vor zwei Werktagen passiert?", -2),
    ("Deploys am letzten Arbeitstag", -1),
    ("Was lief am vorigen Werktag schief?", -1),
    ("Ist das am nächsten Werktag fällig?", 1),
    ("bis zum nächsten Arbeitstag", 1),
    ("in 3 Werktagen fällig", 3),
])
def test_business_days(text, n):
    day = business_day(n)
    m = mention(text, locale="de_DE")
    start, end = bounds(m)
    if m.reading == "R10":  # "bis zum nächsten Arbeitstag": up to the end of that day
        assert (start, end) == (None, midnight(day + timedelta(days=1)))
    else:
        assert (start, end) == (midnight(day), midnight(day + timedelta(days=1)))


@pytest.mark.parametrize("text, n", [
    ("Bugs, die in den letzten 10 Arbeitstagen erstellt wurden", 10),
    ("Deploys der letzten fünf Werktage", 5),
])
def test_in_the_last_n_business_days_runs_to_now(text, n):
    assert bounds(mention(text, locale="de_DE")) == (midnight(business_day(-n)), NOW)


@pytest.mark.parametrize("text, n", [
    ("Antwort innerhalb von 5 Arbeitstagen", 5),
    ("binnen drei Werktagen erledigt", 3),
])
def test_within_n_business_days_runs_from_now(text, n):
    last = business_day(n)
    assert bounds(mention(text, locale="de_DE")) == (NOW, midnight(last + timedelta(days=1)))


# --- fiscal years and quarters (source: pandas Q-MAR / Y-MAR periods) -----------------------


@pytest.mark.parametrize("text, expected", [
    ("Umsatz in diesem Geschäftsjahr", fiscal_year(2027)),
    ("Releases im laufenden Geschäftsjahr", fiscal_year(2027)),
    ("Kosten im aktuellen Fiskaljahr", fiscal_year(2027)),
    ("Umsatz letztes Geschäftsjahr", fiscal_year(2026)),
    ("letztes Geschäftsquartal", fiscal_quarter(TODAY, -1)),
    ("Was hat das letzte Geschäftsquartal gebracht?", fiscal_quarter(TODAY, -1)),
    ("Ziele für das nächste Geschäftsquartal", fiscal_quarter(TODAY, 1)),
    ("Releases im GJ27", fiscal_year(2027)),
    ("Budget für FY27", fiscal_year(2027)),
    ("Releases im GJ 2026", fiscal_year(2026)),
    ("Umsatz im Geschäftsjahr 2026", fiscal_year(2026)),
    ("FY2026 Umsatz", fiscal_year(2026)),
    ("Releases in Q1 GJ27", fiscal_quarter(date(2026, 4, 1))),
    ("Planung für Q1 FY27", fiscal_quarter(date(2026, 4, 1))),
    ("Q2/GJ2027 Ziele", fiscal_quarter(date(2026, 7, 1))),
    ("Bugs im Q3 des Geschäftsjahres", fiscal_quarter(date(2026, 10, 1))),
    ("Q3 des laufenden Geschäftsjahres", fiscal_quarter(date(2026, 10, 1))),
    ("im dritten Geschäftsquartal", fiscal_quarter(date(2026, 10, 1))),
    ("das erste Geschäftsquartal", fiscal_quarter(date(2026, 4, 1))),
    ("im dritten Quartal des Geschäftsjahres", fiscal_quarter(date(2026, 10, 1))),
])
def test_fiscal(text, expected):
    assert bounds(mention(text)) == expected


def test_im_letzten_geschaeftsquartal_is_the_rolling_window_with_the_fiscal_quarter_as_alternative():
    m = mention("Umsatz im letzten Geschäftsquartal")
    assert m.reading == "R5"
    assert bounds(m)[1] == NOW
    alt = m.alternatives[0]
    assert alt.policy == "window_reading=calendar"
    assert (alt.start, alt.end) == tuple(x.isoformat() for x in fiscal_quarter(TODAY, -1))


def test_gj27_has_the_other_naming_convention_as_an_alternative():
    alt = mention("Releases im GJ27").alternatives[0]
    assert alt.policy == "fiscal_name=start"
    assert (alt.start, alt.end) == tuple(x.isoformat() for x in fiscal_year(2028))


# --- traps: no calendar mention (with the sprint table and fiscal calendar in the context) --

TRAPS = [
    ("sprint-the-race", "Wer gewinnt den Sprint beim Firmenlauf?"),
    ("100-Meter-Sprint", "Wer läuft den 100-Meter-Sprint?"),
    ("erster-Arbeitstag", "Wie war dein erster Arbeitstag bei Quillmere?"),
    ("bare-Geschäftsjahr", "Wann beginnt das Geschäftsjahr bei Quillmere Instruments?"),
    ("werktags-adverb", "Der Support ist werktags erreichbar"),
    ("ein-Sprint-is-no-period", "Wie viele Arbeitstage hat ein Sprint?"),
    ("das-nächste-Sprint-Review", "Wann ist das nächste Sprint-Review?"),
    ("die-letzte-Sprint-Retro", "Wer hat die letzte Sprint-Retro moderiert?"),
    ("Sprintziel-compound", "Was ist das Sprintziel?"),
    ("vorletzter-Arbeitstag-des-Monats", "Was passiert am vorletzten Arbeitstag des Monats?"),
    ("vorletzter-Tag-des-Sprints", "Wer deployt am vorletzten Tag des Sprints?"),
    ("unknown-sprint-number", "Umfang von Sprint 99"),
    ("unknown-sprint-name", "Tickets aus dem Marrowbone-Sprint"),
    ("Geschäftsjahr-spanning-two-years", "Budget für das GJ 2026/27"),
    ("Abschluss-des-Geschäftsjahres", "Wer bereitet den Abschluss des Geschäftsjahres vor?"),
]


@pytest.mark.parametrize("question", [q for _, q in TRAPS], ids=[i for i, _ in TRAPS])
def test_a_german_look_alike_gives_no_calendar_mention(question):
    result = normalize(question, calendar_context(languages=["de"], locale="de_DE"))
    assert result.mentions == (), [m.text for m in result.mentions]


# --- mixed German and English ----------------------------------------------------------------


@pytest.mark.parametrize("text, phrase, expected", [
    ("Bugs since letztem Sprint", "since letztem Sprint", (sprint_span("Foxglove")[0], None)),
    ("what changed seit Sprint 42", "seit Sprint 42", (sprint_span("Bramblegate")[0], None)),
    ("Umsatz im FY27 vs. last fiscal year", "im FY27", fiscal_year(2027)),
])
def test_mixed_german_and_english(text, phrase, expected):
    result = normalize(text, calendar_context(languages=["de", "en"]))
    m = result.mentions[0]
    assert m.text == phrase
    assert bounds(m) == expected


def test_mixed_question_finds_both_languages_phrases():
    result = normalize("Tickets aus Sprint 42 from last week", calendar_context(languages=["de", "en"]))
    assert [m.text for m in result.mentions] == ["Sprint 42", "from last week"]
    assert bounds(result.mentions[0]) == sprint_span("Bramblegate")
    result = normalize("Umsatz im FY27 vs. last fiscal year", calendar_context(languages=["de", "en"]))
    assert bounds(result.mentions[1]) == fiscal_year(2026)
