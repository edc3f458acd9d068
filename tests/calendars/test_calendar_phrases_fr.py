"""French phrases of the team's calendars: sprints, fiscal years and quarters, business days.

Checked against: the invented sprint table in calendar_cases (read directly), numpy's
``busday_offset`` for business days (source: numpy; Saturday/Sunday weekend of fr_FR from CLDR
via babel), pandas' ``Q-MAR`` / ``Y-MAR`` periods for fiscal quarters and years (source:
pandas). The French phrases are written as French speakers write them in a tracker (common
practice; no published source): "le sprint en cours", "l'avant-dernier sprint", "il y a 3 jours
ouvrés", "le prochain jour ouvré", "l'exercice précédent", "T1 FY27", "le T3 de l'exercice".

Decisions, documented here and in locales/fr.toml:
- "l'exercice" alone names the fiscal year only beside a direction word or a year
  ("l'exercice en cours", "cet exercice", "l'exercice 2026"); "le prochain exercice de crise"
  and "l'exercice 3 du tutoriel" are exercises.
- "le dernier exercice fiscal", "le prochain trimestre fiscal" (direction word before the unit,
  with the article) read as "le dernier trimestre" does in this project: the rolling window
  (R5/R6) with the whole fiscal period as the ``window_reading=calendar`` alternative; with the
  direction word after the unit ("l'exercice précédent", "le trimestre fiscal prochain") it is
  the whole fiscal period (R2).
- "jours ouvrables" (strictly Monday to Saturday in French law) are read as the context's
  business days, as trackers use the word.
- "l'avant-dernier sprint" is the sprint before last; "l'avant-dernier jour du sprint" is the
  penultimate day and gives no mention.
- "la prochaine sprint review" names the next meeting, not the next sprint.
- "l'exercice 2026/2027" (a fiscal year named by both calendar years) gives no mention: no form
  reads it yet (noted in locales/fr.toml).
"""

from __future__ import annotations

from datetime import date, timedelta

import pytest

from nlnorm import normalize
from tests.calendars.calendar_cases import (
    business_day, calendar_context, fiscal_quarter, fiscal_year, midnight, sprint_span,
)
from tests.helpers import NOW, TODAY, bounds


def mention(text, languages=("fr",), **fields):  # type: ignore[no-untyped-def]
    result = normalize(text, calendar_context(languages=list(languages), **fields))
    assert len(result.mentions) == 1, (text, [m.text for m in result.mentions])
    return result.mentions[0]


def span(first: str, last: str):  # type: ignore[no-untyped-def]
    return sprint_span(first)[0], sprint_span(last)[1]


# --- one sprint (source: the sprint table; today 2026-12-02 falls in Inkwell) ---------------


@pytest.mark.parametrize("text, sprint", [
    ("Quels bugs sont ouverts dans ce sprint ?", "Inkwell"),
    ("Qu'y a-t-il dans le sprint en cours ?", "Inkwell"),
    ("les tickets du sprint actuel", "Inkwell"),
    ("les stories du sprint actif", "Inkwell"),
    ("Qu'est-ce qui a glissé du sprint précédent ?", "Foxglove"),
    ("les bugs du dernier sprint", "Foxglove"),
    ("Qu'est-ce qui est prévu pour le prochain sprint ?", "Harbor-7"),
    ("les tickets du sprint prochain", "Harbor-7"),
    ("les tickets de l'avant-dernier sprint", "Bramblegate"),
    ("Qu'a livré l'avant dernier sprint ?", "Bramblegate"),
    ("les bugs du sprint 42", "Bramblegate"),
    ("le périmètre du sprint n°43", "Foxglove"),
    ("Quels bugs du sprint Foxglove sont encore ouverts ?", "Foxglove"),
    ("les objectifs du sprint Harbor-7", "Harbor-7"),
    ("la démo de l'itération Inkwell", "Inkwell"),
    ("le bilan du Foxglove sprint", "Foxglove"),
])
def test_one_sprint(text, sprint):
    m = mention(text)
    assert m.kind == "sprint"
    assert bounds(m) == sprint_span(sprint)


@pytest.mark.parametrize("text", [
    "la vélocité des 3 derniers sprints",
    "Combien de bugs sur les trois derniers sprints ?",
])
def test_the_last_three_sprints_are_the_completed_ones(text):
    m = mention(text)
    assert bounds(m) == (sprint_span("Tidewrack")[0], sprint_span("Inkwell")[0])
    assert m.alternatives[0].policy == "sprint_window=with_current"


@pytest.mark.parametrize("text", [
    "Que planifie-t-on pour les 2 prochains sprints ?",
    "la capacité sur les deux prochains sprints",
])
def test_the_next_two_sprints_follow_the_current_one(text):
    # On 2026-11-18 Foxglove runs; the next two are Inkwell and Harbor-7 (read from the table).
    assert bounds(mention(text, now="2026-11-18T10:00")) == span("Inkwell", "Harbor-7")


@pytest.mark.parametrize("text, sprint", [
    ("Qu'est-ce qui était ouvert il y a 3 sprints ?", "Tidewrack"),
    ("les bugs d'il y a deux sprints", "Bramblegate"),
])
def test_sprints_ago(text, sprint):
    assert bounds(mention(text)) == sprint_span(sprint)


@pytest.mark.parametrize("text, start, end", [
    ("les bugs ouverts depuis le sprint 42", sprint_span("Bramblegate")[0], None),
    ("les tickets créés depuis le sprint Foxglove", sprint_span("Foxglove")[0], None),
    ("à partir du sprint précédent", sprint_span("Foxglove")[0], None),
    ("fermés avant le sprint 43", None, sprint_span("Foxglove")[0]),
    ("Qu'est-ce qui a été mergé avant le sprint Inkwell ?", None, sprint_span("Inkwell")[0]),
    ("entre le sprint 41 et le sprint 43", *span("Tidewrack", "Foxglove")),
    ("du sprint 41 au sprint 43", *span("Tidewrack", "Foxglove")),
    ("la vélocité des sprints 41 à 43", *span("Tidewrack", "Foxglove")),
])
def test_sprint_bounds(text, start, end):
    assert bounds(mention(text)) == (start, end)


# --- business days (source: numpy.busday_offset; Saturday/Sunday weekend from CLDR fr_FR) ----


@pytest.mark.parametrize("text, n", [
    ("les tickets fermés il y a 3 jours ouvrés", -3),
    ("Que s'est-il passé il y a deux jours ouvrables ?", -2),
    ("les déploiements du dernier jour ouvré", -1),
    ("Qu'est-ce qui a cassé le jour ouvré précédent ?", -1),
    ("Est-ce dû le prochain jour ouvré ?", 1),
    ("livré le jour ouvré prochain", 1),
    ("prêt dans 3 jours ouvrés", 3),
])
def test_business_days(text, n):
    day = business_day(n)
    assert bounds(mention(text, locale="fr_FR")) == (midnight(day), midnight(day + timedelta(days=1)))


@pytest.mark.parametrize("text, n", [
    ("les bugs créés au cours des 10 derniers jours ouvrés", 10),
    ("les déploiements des 5 derniers jours ouvrés", 5),
])
def test_in_the_last_n_business_days_runs_to_now(text, n):
    assert bounds(mention(text, locale="fr_FR")) == (midnight(business_day(-n)), NOW)


@pytest.mark.parametrize("text, n", [
    ("réponse sous 5 jours ouvrés", 5),
    ("résolu d'ici trois jours ouvrés", 3),
])
def test_within_n_business_days_runs_from_now(text, n):
    last = business_day(n)
    assert bounds(mention(text, locale="fr_FR")) == (NOW, midnight(last + timedelta(days=1)))


# --- fiscal years and quarters (source: pandas Q-MAR / Y-MAR periods) -----------------------


@pytest.mark.parametrize("text, expected", [
    ("le chiffre d'affaires de cet exercice", fiscal_year(2027)),
    ("les releases de l'exercice en cours", fiscal_year(2027)),
    ("les coûts de l'exercice fiscal en cours", fiscal_year(2027)),
    ("le CA de cet exercice fiscal", fiscal_year(2027)),
    ("le CA de l'exercice précédent", fiscal_year(2026)),
    ("au cours de l'exercice dernier", fiscal_year(2026)),
    ("le trimestre fiscal précédent", fiscal_quarter(TODAY, -1)),
    ("Qu'a rapporté le trimestre fiscal dernier ?", fiscal_quarter(TODAY, -1)),
    ("les objectifs du trimestre fiscal prochain", fiscal_quarter(TODAY, 1)),
    ("les releases en FY27", fiscal_year(2027)),
    ("le budget FY 27", fiscal_year(2027)),
    ("les releases en FY2026", fiscal_year(2026)),
    ("le CA de l'exercice 2026", fiscal_year(2026)),
    ("sur l'exercice fiscal 2026", fiscal_year(2026)),
    ("les releases du T1 FY27", fiscal_quarter(date(2026, 4, 1))),
    ("la roadmap Q1 FY27", fiscal_quarter(date(2026, 4, 1))),
    ("le T1 de l'exercice 2027", fiscal_quarter(date(2026, 4, 1))),
    ("les bugs du T3 fiscal", fiscal_quarter(date(2026, 10, 1))),
    ("le T3 de l'exercice en cours", fiscal_quarter(date(2026, 10, 1))),
    ("le premier trimestre fiscal", fiscal_quarter(date(2026, 4, 1))),
    ("au troisième trimestre de l'exercice", fiscal_quarter(date(2026, 10, 1))),
])
def test_fiscal(text, expected):
    assert bounds(mention(text)) == expected


@pytest.mark.parametrize("text, reading, expected", [
    ("le CA du dernier exercice fiscal", "R5", fiscal_year(2026)),
    ("le prochain trimestre fiscal", "R6", fiscal_quarter(TODAY, 1)),
])
def test_a_direction_word_before_the_fiscal_unit_is_the_window_with_the_period_as_alternative(
        text, reading, expected):
    m = mention(text)
    assert m.reading == reading
    alt = m.alternatives[0]
    assert alt.policy == "window_reading=calendar"
    assert (alt.start, alt.end) == tuple(x.isoformat() for x in expected)


def test_fy27_has_the_other_naming_convention_as_an_alternative():
    alt = mention("les releases en FY27").alternatives[0]
    assert alt.policy == "fiscal_name=start"
    assert (alt.start, alt.end) == tuple(x.isoformat() for x in fiscal_year(2028))


# --- traps: no calendar mention (with the sprint table and fiscal calendar in the context) --

TRAPS = [
    ("sprint-the-race", "Qui a gagné le sprint de la course d'entreprise ?"),
    ("exercice-de-crise", "Quand a lieu le prochain exercice de crise ?"),
    ("exercice-d-evacuation", "Qui organise le prochain exercice d'évacuation ?"),
    ("exercice-incendie", "Le dernier exercice incendie s'est bien passé ?"),
    ("exercice-3-du-tutoriel", "Faites l'exercice 3 du tutoriel"),
    ("bare-exercice-fiscal", "Quand commence l'exercice fiscal chez Quillmere Instruments ?"),
    ("un-sprint-is-no-period", "Combien de jours ouvrés compte un sprint ?"),
    ("premier-jour-ouvre", "Quel était ton premier jour ouvré ?"),
    ("la-prochaine-sprint-review", "Quand a lieu la prochaine sprint review ?"),
    ("le-prochain-sprint-planning", "Qui anime le prochain sprint planning ?"),
    ("avant-dernier-jour-ouvre-du-mois", "Que se passe-t-il l'avant-dernier jour ouvré du mois ?"),
    ("avant-dernier-jour-du-sprint", "Qui déploie l'avant-dernier jour du sprint ?"),
    ("unknown-sprint-number", "le périmètre du sprint 99"),
    ("unknown-sprint-name", "les tickets du sprint Marrowbone"),
    ("exercice-spanning-two-years", "le budget de l'exercice 2026/2027"),
]


@pytest.mark.parametrize("question", [q for _, q in TRAPS], ids=[i for i, _ in TRAPS])
def test_a_french_look_alike_gives_no_calendar_mention(question):
    result = normalize(question, calendar_context(languages=["fr"], locale="fr_FR"))
    assert result.mentions == (), [m.text for m in result.mentions]


# --- mixed French and English ----------------------------------------------------------------


@pytest.mark.parametrize("text, phrase, expected", [
    ("bugs since le sprint précédent", "since le sprint précédent", (sprint_span("Foxglove")[0], None)),
    ("what changed depuis le sprint 42", "depuis le sprint 42", (sprint_span("Bramblegate")[0], None)),
    ("le CA en FY27 vs. last fiscal year", "en FY27", fiscal_year(2027)),
])
def test_mixed_french_and_english(text, phrase, expected):
    result = normalize(text, calendar_context(languages=["fr", "en"]))
    m = result.mentions[0]
    assert m.text == phrase
    assert bounds(m) == expected


def test_mixed_question_finds_both_languages_phrases():
    result = normalize("les tickets du sprint 42 from last week", calendar_context(languages=["fr", "en"]))
    assert [m.text for m in result.mentions] == ["du sprint 42", "from last week"]
    assert bounds(result.mentions[0]) == sprint_span("Bramblegate")
    result = normalize("le CA en FY27 vs. last fiscal year", calendar_context(languages=["fr", "en"]))
    assert bounds(result.mentions[1]) == fiscal_year(2026)
