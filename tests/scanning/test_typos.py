"""A one-letter typo in a time word of six or more letters is still read, with less
confidence and a note saying how; look-alikes and short words are never "corrected".

Checked against: the Damerau-Levenshtein edit distance (one deletion, insertion,
substitution or swap of neighbours), computed independently below; the English reading
contract for the corrected phrases. Typos are written from knowledge of common misspellings
(no published source).
"""

from __future__ import annotations

import pytest

from nlnorm.scanning.typos import CONFIDENCE, within_one_edit
from tests.helpers import one, run

EN = {"languages": ["en"]}


def damerau(a: str, b: str) -> int:
    """Optimal string alignment distance (textbook dynamic programming)."""
    d = [[0] * (len(b) + 1) for _ in range(len(a) + 1)]
    for i in range(len(a) + 1):
        d[i][0] = i
    for j in range(len(b) + 1):
        d[0][j] = j
    for i in range(1, len(a) + 1):
        for j in range(1, len(b) + 1):
            cost = 0 if a[i - 1] == b[j - 1] else 1
            d[i][j] = min(d[i - 1][j] + 1, d[i][j - 1] + 1, d[i - 1][j - 1] + cost)
            if i > 1 and j > 1 and a[i - 1] == b[j - 2] and a[i - 2] == b[j - 1]:
                d[i][j] = min(d[i][j], d[i - 2][j - 2] + 1)
    return d[len(a)][len(b)]


@pytest.mark.parametrize(("a", "b"), [
    ("yesterdy", "yesterday"), ("wendesday", "wednesday"), ("mounths", "months"),
    ("feburary", "february"), ("previuos", "previous"), ("weekly", "weeks"), ("month", "months"),
    ("abcdef", "abcdef"), ("abcdef", "badcfe"), ("tuesdya", "tuesday"), ("quartre", "quarter"),
])
def test_one_edit_agrees_with_the_textbook_distance(a, b):
    assert within_one_edit(a, b) == (damerau(a, b) == 1)


@pytest.mark.parametrize(("question", "phrase", "value", "word"), [
    ("bugs from yesterdy", "from yesterdy", "2026-12-01", "yesterday"),
    ("what was merged wendesday", "wendesday", "2026-12-02", "wednesday"),
    ("closed in the previuos month", "in the previuos month", "2026-11", "previous"),
    ("reopened since Feburary", "since Feburary", "2026-02-01/..", "february"),
    ("failed builds in the last 3 mounths", "in the last 3 mounths",
     "2026-09-02T10:00:00+02:00/2026-12-02T10:00:00+01:00", "months"),
], ids=["typo-en-yesterdy", "typo-en-wendesday", "typo-en-previuos", "typo-en-Feburary",
        "typo-en-mounths"])
def test_a_misspelt_time_word_is_read_with_lower_confidence(question, phrase, value, word):
    m = one(question, **EN)
    assert (m.text, m.value, m.confidence) == (phrase, value, CONFIDENCE)
    assert m.note.startswith("typo: ") and repr(word) in m.note


def test_exact_phrases_keep_full_confidence_beside_a_typo():
    result = run("bugs from yesterdy and last week", **EN)
    assert [(m.text, m.confidence) for m in result.mentions] == [("from yesterdy", CONFIDENCE),
                                                                 ("last week", 1.0)]


@pytest.mark.parametrize("question", [
    "the monitor shows errors",      # "monitor" is no edit of a time word
    "check the mouths of the pipes",  # "mouths" is one edit from "months", but alone no phrase
    "three mondays",                  # a plural weekday with no cue
    "tickets from lsat week",         # "lsat": under six letters, never corrected
    "the weekly report",              # two edits from "weeks"
    "we mayy review it",              # ambiguous words are not corrected into
    "a secnod reviewer",              # quiet words ("second") are not corrected into
])
def test_words_that_only_look_like_typos_give_no_mention(question):
    assert run(question, **EN).mentions == ()


@pytest.mark.parametrize("question", [
    "keine Sorgen wegen der Tickets",  # German "Sorgen" is one edit from "morgen"
    "wir mogen das ticket sluiten",     # Dutch "mogen" (may) is one edit from "morgen"
    "volgens mij is het klaar",        # Dutch "volgens" (according to) vs "volgend"
])
def test_a_short_real_word_of_another_language_is_not_read_as_a_typo(question):
    # A corrected word under eight letters counts only beside a word spelt right.
    assert run(question).mentions == ()


def test_a_short_typo_counts_beside_a_word_spelt_right():
    m = one("Fehler der letze Woche", languages=["de"])
    assert (m.value, m.confidence) == ("2026-W48", CONFIDENCE)
