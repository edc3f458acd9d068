"""docs/readings.md cannot drift: every worked example on that page is run through normalize.

The page writes each example as a fenced block marked ``nlnorm-example`` holding ``key: value``
lines (the format is described on the page itself). This module parses them, runs each question
and compares the mention field by field.

Checked against:
- docs/readings.md: its worked examples, contract table and Policies section;
- the oracle-checked tables of tests/resolution/test_readings_en.py (python-dateutil, stdlib
  calendar, ISO 8601 via date.fromisocalendar, CLDR 49 via babel 2.19) and
  tests/scanning/test_traps_en.py: each example must be one of their rows with the same
  expected values, so the documented dates do not come from the engine alone;
- the field names of ``nlnorm.Context`` and ``nlnorm.Mention``, for the names the page uses.
"""

from __future__ import annotations

import re
from dataclasses import dataclass, field
from pathlib import Path

import pytest

from nlnorm import Context, Mention, normalize
from tests.helpers import NOW, ctx
from tests.resolution.test_readings_en import TABLES
from tests.scanning.test_traps_en import TRAPS

DOC = Path(__file__).resolve().parent.parent / "docs" / "readings.md"
READINGS = [f"R{i}" for i in range(1, 24)] + ["N"]
POLICIES = ("bias", "window_reading", "weekday_reading", "date_order", "week_start", "locale",
            "sprint_window", "quarters")

_BLOCK = re.compile(r"^```nlnorm-example\n(.*?)^```\s*$", re.S | re.M)
_SINGLE = {"id", "question", "now", "tz", "context", "phrase", "reading", "start", "end", "value",
           "note", "alternatives"}


@dataclass(frozen=True)
class Example:
    """One worked example of docs/readings.md."""

    id: str
    question: str
    now: str
    tz: str
    context: dict[str, str] = field(default_factory=dict)
    phrase: str | None = None  # None: the question must give no mention
    reading: str | None = None
    start: str | None = None
    end: str | None = None
    value: str | None = None
    note: str | None = None
    alternatives: tuple[tuple[str, str | None, str | None, str | None], ...] = ()


def _bound(text: str) -> str | None:
    return None if text == "null" else text


def parse_example(body: str) -> Example:
    """Read one block; raise ValueError naming the problem (unknown or repeated key...)."""
    data: dict[str, str] = {}
    alternatives: list[tuple[str, str | None, str | None, str | None]] = []
    for line in body.splitlines():
        if not line.strip():
            continue
        key, sep, value = line.partition(": ")
        if not sep:
            raise ValueError(f"line {line!r} is not 'key: value'")
        if key == "alternative":
            parts = [p.strip() for p in value.split("|")]
            if len(parts) != 4:
                raise ValueError(f"alternative {value!r} needs reading | policy | start | end")
            reading, policy, start, end = parts
            alternatives.append((reading, None if policy == "none" else policy, _bound(start), _bound(end)))
            continue
        if key not in _SINGLE:
            raise ValueError(f"unknown key {key!r}")
        if key in data:
            raise ValueError(f"key {key!r} given twice")
        data[key] = value.strip()
    for key in ("id", "question", "now", "tz", "phrase"):
        if key not in data:
            raise ValueError(f"missing key {key!r}")
    context = {}
    if "context" in data:
        for item in data["context"].split(","):
            name, eq, value = item.strip().partition("=")
            if not eq:
                raise ValueError(f"context item {item!r} is not name=value")
            context[name] = value
    if data["phrase"] == "none":
        extra = set(data) - {"id", "question", "now", "tz", "context", "phrase"}
        if extra or alternatives:
            raise ValueError(f"an example without a mention has further keys: {sorted(extra)}")
        return Example(data["id"], data["question"], data["now"], data["tz"], context)
    for key in ("reading", "start", "end", "value"):
        if key not in data:
            raise ValueError(f"missing key {key!r}")
    if ("alternatives" in data) == bool(alternatives):
        raise ValueError("give either 'alternatives: none' or 'alternative:' lines")
    if "alternatives" in data and data["alternatives"] != "none":
        raise ValueError("'alternatives' can only be 'none'")
    return Example(
        data["id"], data["question"], data["now"], data["tz"], context, data["phrase"],
        data["reading"], _bound(data["start"]), _bound(data["end"]), data["value"],
        data.get("note"), tuple(alternatives),
    )


def examples(text: str) -> list[Example]:
    return [parse_example(body) for body in _BLOCK.findall(text)]


PAGE = DOC.read_text(encoding="utf-8")
EXAMPLES = examples(PAGE)


def _context(ex: Example) -> Context:
    return Context.at(ex.now, tz=ex.tz, **ex.context)


def test_the_format_reader_refuses_a_malformed_block():
    with pytest.raises(ValueError, match="unknown key"):
        parse_example("id: R1-x\nquestion: today\nnow: 2026-12-02T10:00+01:00\ntz: UTC\nphrse: today")
    with pytest.raises(ValueError, match="either"):
        parse_example("id: R1-x\nquestion: today\nnow: 2026-12-02T10:00+01:00\ntz: UTC\nphrase: today\n"
                      "reading: R1\nstart: a\nend: b\nvalue: c")


def test_every_reading_and_N_has_a_worked_example():
    shown = {ex.id.split("-")[0] for ex in EXAMPLES}
    assert set(READINGS) <= shown, sorted(set(READINGS) - shown)
    assert len({ex.id for ex in EXAMPLES}) == len(EXAMPLES)


def test_an_examples_id_starts_with_the_reading_it_shows():
    for ex in EXAMPLES:
        assert ex.id.split("-")[0] == (ex.reading or "N"), ex.id


@pytest.mark.parametrize("ex", EXAMPLES, ids=[ex.id for ex in EXAMPLES])
def test_a_worked_example_is_what_normalize_returns(ex: Example):
    result = normalize(ex.question, _context(ex))
    if ex.phrase is None:
        assert result.mentions == ()
        return
    assert len(result.mentions) == 1
    m = result.mentions[0]
    assert (m.text, m.reading, m.start, m.end, m.value) == (ex.phrase, ex.reading, ex.start, ex.end, ex.value)
    if ex.note is not None:
        assert m.note == ex.note
    assert tuple((a.reading, a.policy, a.start, a.end) for a in m.alternatives) == ex.alternatives


def _rows() -> list[tuple[str, tuple]]:
    return [(p.id, p.values) for table in TABLES.values() for p in table if not p.marks]


@pytest.mark.parametrize("ex", EXAMPLES, ids=[ex.id for ex in EXAMPLES])
def test_a_worked_example_is_a_row_of_the_oracle_checked_tables(ex: Example):
    if ex.phrase is None:
        assert ex.question in {q for _, q in TRAPS} and _context(ex) == ctx(NOW)
        return
    wanted = _context(ex)
    matches = []
    for row_id, (question, phrase, reading, bounds, value, alts, context) in _rows():
        if question != ex.question:
            continue
        fields = dict(context)
        if ctx(fields.pop("now", NOW), **fields) == wanted:
            matches.append((row_id, phrase, reading, bounds, value, alts))
    assert matches, f"{ex.id}: add this question and context to tests/resolution/test_readings_en.py"
    row_id, phrase, reading, bounds, value, alts = matches[0]
    assert (phrase, reading, bounds) == (ex.phrase, ex.reading, (ex.start, ex.end)), row_id
    assert value is None or value == ex.value, row_id
    assert alts == ex.alternatives, row_id


def test_the_contract_table_has_a_row_for_every_reading():
    rows = {line.split("|")[1].strip() for line in PAGE.splitlines() if line.startswith("| ")}
    assert set(READINGS) <= rows


def _section(title: str) -> str:
    match = re.search(rf"^## {re.escape(title)}\n(.*?)(?=^## |\Z)", PAGE, re.S | re.M)
    assert match, f"no section '## {title}'"
    return match.group(1)


def test_the_policies_section_documents_real_context_fields():
    section = _section("Policies")
    for name in POLICIES:
        assert name in Context.model_fields
        assert f"- `{name}`" in section, name


def test_the_warning_tells_callers_to_show_reading_note_and_alternatives():
    warning = PAGE.split("\n\n")[1]
    assert warning.startswith("> **Warning.**")
    for name in ("reading", "note", "alternatives"):
        assert name in Mention.model_fields
        assert f"`{name}`" in warning
    assert "should show" in warning
