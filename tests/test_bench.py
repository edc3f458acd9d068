"""``nlnorm bench`` runs and prints its figures (a smoke test; nothing here is timed).

Checked against: dateparser's ``search_dates`` runs in the same process on the same questions
(the comparison the benchmark prints).
"""

from __future__ import annotations

import io
import json

from nlnorm.bench import run
from nlnorm.benchlog import generate


def test_bench_prints_every_figure_and_a_json_summary():
    out = io.StringIO()
    assert run(n=300, compare=True, compare_sample=40, out=out, startup_runs=1, mixed=False) == 0
    text = out.getvalue()
    for label in ("median per question", "p99 per question", "questions per second",
                  "peak RSS", "CLI start-up", "search_dates", "ratio", "SQL predicate"):
        assert label in text
    summary = json.loads(text.split("json: ", 1)[1])
    assert summary["english"]["nlnorm"]["n"] == 300 and summary["english"]["ratio_median"] > 0
    # Three alternating rounds over the 40 compared questions: 120 timings on each side.
    assert summary["english"]["search_dates"]["n"] == 120
    assert "times" not in summary["english"]["nlnorm"]
    assert summary["sql"]["n"] > 0 and summary["sql"]["median_us"] > 0


def test_the_benchmark_log_is_mostly_questions_without_time_phrases():
    from nlnorm import Context, normalize

    ctx = Context.at("2026-12-02T10:00", tz="Europe/Lisbon", languages=["en"])
    questions = generate(1000, seed=0)
    with_time = sum(1 for q in questions if normalize(q, ctx).mentions)
    assert 0.2 < with_time / len(questions) < 0.5
