"""Same meaning, same interval: a phrase of any language and its English equivalent resolve
to the same interval at any reference time.

Each locale file's ``[[examples]]`` with ``same_as`` names the English phrase; the tests find
them all, so a new language is covered by adding examples.

Checked against: the English reading contract (docs/readings.md), itself checked against
python-dateutil, the stdlib calendar and CLDR via babel.
"""

from __future__ import annotations

import pytest
from hypothesis import given, settings

from nlnorm import Context, normalize
from nlnorm.locale import available_languages, load_locale
from tests.property.strategies import moments, week_starts

PAIRS = [
    pytest.param(lang, ex.text, ex.same_as, id=f"{lang}-{ex.text[:24]}")
    for lang in sorted(available_languages())
    for ex in load_locale(lang).examples
    if ex.same_as
]


def _interval(text: str, ctx: Context) -> tuple[str | None, str | None]:
    found = normalize(text, ctx).mentions
    assert len(found) == 1, (text, [m.text for m in found])
    return found[0].start, found[0].end


@pytest.mark.skipif(not PAIRS, reason="no locale example names an English equivalent yet")
@pytest.mark.parametrize(("lang", "text", "english"), PAIRS or [("en", "x", "x")])
@settings(max_examples=25, deadline=None)
@given(now=moments, week_start=week_starts)
def test_a_phrase_and_its_english_equivalent_give_the_same_interval(lang, text, english, now,
                                                                    week_start):
    ctx = Context(now=now, week_start=week_start, languages=[lang, "en"])
    assert _interval(text, ctx) == _interval(english, ctx)
