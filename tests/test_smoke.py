"""The examples of the issue that started the project, end to end.

Checked against: hand-computed calendar facts for 2026-12-02 (a Wednesday; ISO week 49).
"""

from datetime import date

import pytest

from tests.helpers import bounds, days, one, run


@pytest.mark.parametrize(
    ("text", "phrase", "value", "first", "n_days"),
    [
        ("which bugs were created last week", "last week", "2026-W48", date(2026, 11, 23), 7),
        ("who closed the most tickets this quarter", "this quarter", "2026-Q4", date(2026, 10, 1), 92),
        ("who may review the May release", "May", "2026-05", date(2026, 5, 1), 31),
        ("list 5 items with priority 2 from 2025", "from 2025", "2025", date(2025, 1, 1), 365),
    ],
    ids=["R2-last-week", "R2-this-quarter", "N-may-modal-R12-May", "N-priority-R17-from-2025"],
)
def test_issue_examples_resolve_to_whole_periods(text, phrase, value, first, n_days):
    m = one(text)
    assert (m.text, m.value) == (phrase, value)
    assert bounds(m) == days(first, n_days)


def test_since_march_keeps_we_out_of_it():
    m = one("what did we ship since March")
    assert m.text == "since March" and m.value == "2026-03-01/.." and m.end is None


def test_between_with_year_on_the_end_only():
    m = one("between 1 March and 15 April 2026")
    assert bounds(m) == (days(date(2026, 3, 1), 1)[0], days(date(2026, 4, 16), 1)[0])


def test_question_without_time_phrase_has_no_mention():
    assert run("who owns ticket WRN-2025 with the most points").mentions == ()
