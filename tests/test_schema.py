"""The intermediate form: its published JSON Schema and the fast builder behind it.

Checked against: JSON Schema draft 2020-12 via the jsonschema package (validator of
docs/schema.json); pydantic v2 validation of the same models.
"""

from __future__ import annotations

import json
from pathlib import Path

import jsonschema
import pytest

from nlnorm.schema import Result
from tests.helpers import run

SCHEMA_PATH = Path(__file__).resolve().parents[1] / "docs" / "schema.json"
QUESTIONS = [
    "which bugs were created last week",
    "tickets closed between 1 March and 15 April 2026",
    "what shipped since 2026-W40 or before March",
    "who owns ticket WRN-2025",
    "comments from yesterday afternoon, this weekend and 03/04/2026",
    "incidents opened in the last 3 hours",
]


def test_published_schema_is_the_schema_of_the_code():
    published = json.loads(SCHEMA_PATH.read_text(encoding="utf-8"))
    assert published == Result.model_json_schema(), "run: nlnorm schema > docs/schema.json"


@pytest.mark.parametrize("text", QUESTIONS)
def test_every_output_validates_against_the_published_schema(text):
    schema = json.loads(SCHEMA_PATH.read_text(encoding="utf-8"))
    data = json.loads(run(text).model_dump_json())
    jsonschema.validate(data, schema)


@pytest.mark.parametrize("text", QUESTIONS)
def test_fast_built_results_equal_validated_models(text):
    fast = run(text)
    checked = Result.model_validate(fast.model_dump())
    assert checked == fast
    assert checked.model_dump_json() == fast.model_dump_json()
