"""Beyond the R1-R23 contract: lengths of time (reading D) and the reference instant (NOW).

Checked against: ISO 8601-1:2019 duration notation (PnD, PnW, PnM, PnY, PTnH, PTnM).
"""

from __future__ import annotations

import pytest

from tests.helpers import NOW, one, run


@pytest.mark.parametrize(
    ("question", "phrase", "value"),
    [
        ("tickets open for more than 3 days", "3 days", "P3D"),
        ("reviews stale for two weeks", "two weeks", "P2W"),
        ("epics idle for at least 2 months", "2 months", "P2M"),
        ("incidents resolved in under 4 hours", "4 hours", "PT4H"),
        ("outages longer than 30 minutes", "30 minutes", "PT30M"),
        ("plans for 2 quarters", "2 quarters", "P6M"),
        ("roadmap for 1 year", "1 year", "P1Y"),
    ],
    ids=["D-en-days", "D-en-number-word", "D-en-months", "D-en-hours", "D-en-minutes",
         "D-en-quarters", "D-en-year"],
)
def test_a_length_of_time_after_a_cue_is_a_duration_without_bounds(question, phrase, value):
    m = one(question)
    assert (m.text, m.kind, m.value, m.reading) == (phrase, "duration", value, "D")
    assert m.start is None and m.end is None


def test_a_duration_keeps_its_words_and_gains_the_iso_form_in_the_rewrite():
    assert run("tickets open for more than 3 days").rewritten == "tickets open for more than 3 days (P3D)"


@pytest.mark.parametrize("question", ["3 days ago", "in 3 days", "within 3 days", "the last 3 days"])
def test_anchored_lengths_keep_their_own_readings(question):
    assert one(question).kind == "range"


@pytest.mark.parametrize("question", ["5 points", "top 10 issues", "2 days", "a day to remember"])
def test_a_number_and_unit_without_a_cue_is_no_mention(question):
    assert run(question).mentions == ()


def test_now_is_the_reference_instant():
    m = one("which tickets are open now")
    assert (m.kind, m.reading, m.start, m.end) == ("instant", "NOW", NOW.isoformat(), NOW.isoformat())
