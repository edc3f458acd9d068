"""Batch use from Python: normalize the demo team's question log into JSON Lines.

``python examples/example_batch.py out.jsonl`` writes one line per question; pytest runs the
``test_`` function. The same job from the shell: ``nlnorm batch examples/demo/questions.jsonl
-o out.jsonl --now 2026-12-02T10:00 --tz Europe/Lisbon``.
"""

from __future__ import annotations

import json
import sys
from pathlib import Path

from nlnorm import Context, normalize_many

LOG = Path(__file__).parent / "demo" / "questions.jsonl"
CTX = Context.at("2026-12-02T10:00", tz="Europe/Lisbon")


def run(out: Path) -> int:
    items = (json.loads(line) for line in LOG.read_text(encoding="utf-8").splitlines())
    with out.open("w", encoding="utf-8") as sink:
        count = 0
        for result in normalize_many(items, CTX):
            sink.write(result.model_dump_json() + "\n")
            count += 1
    return count


def test_every_question_gets_one_line_in_order(tmp_path):
    out = tmp_path / "out.jsonl"
    assert run(out) == len(LOG.read_text(encoding="utf-8").splitlines())
    ids = [json.loads(line)["id"] for line in out.read_text(encoding="utf-8").splitlines()]
    assert ids == [json.loads(line)["id"] for line in LOG.read_text(encoding="utf-8").splitlines()]


if __name__ == "__main__":
    print(run(Path(sys.argv[1] if len(sys.argv) > 1 else "out.jsonl")), "lines written")
