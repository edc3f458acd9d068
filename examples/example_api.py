"""The Python API in one screen: run it (``python examples/example_api.py``) or let pytest
collect it (the ``test_`` functions check that what it prints stays true).

The Quillmere Instruments team of the demo asks its tracker about last week's bugs.
"""

from __future__ import annotations

from nlnorm import Context, normalize

# A fixed reference: nlnorm never reads the clock unless you ask for "now".
CTX = Context.at("2026-12-02T10:00", tz="Europe/Lisbon", locale="en_GB")
QUESTION = "which WRN bugs did Odile Brannock close last week or since 03/11/2026?"


def main() -> None:
    result = normalize(QUESTION, CTX)
    print(result.rewritten)
    for m in result.mentions:
        print(f"  {m.text!r}: [{m.start}, {m.end})  {m.value}  ({m.reading}: {m.note})")
        for alt in m.alternatives:
            print(f"      or {alt.value} if {alt.policy or 'reworded'}")
    print(result.template.text, {k: (s.start, s.end) for k, s in result.template.slots.items()})


def test_last_week_is_the_calendar_week_before_this_one():
    m = normalize(QUESTION, CTX).mentions[0]
    assert (m.value, m.start, m.end) == ("2026-W48", "2026-11-23T00:00:00+00:00",
                                         "2026-11-30T00:00:00+00:00")


def test_en_gb_reads_numeric_dates_day_first_and_offers_the_other_order():
    m = normalize(QUESTION, CTX).mentions[1]
    assert m.value == "2026-11-03/.."
    assert [(a.value, a.policy) for a in m.alternatives] == [("2026-03-11/..", "date_order=MDY")]


def test_template_has_one_placeholder_per_phrase():
    result = normalize(QUESTION, CTX)
    assert result.template.text == "which WRN bugs did Odile Brannock close {t1} or {t2}?"


if __name__ == "__main__":
    main()
