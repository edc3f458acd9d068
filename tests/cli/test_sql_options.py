"""``--sql-column`` and its options on ``nlnorm normalize`` and ``nlnorm batch``: every period
mention gets ``sql: {dialect, where, params}``.

Checked against: the bounds of each predicate equal the mention's own ``start``/``end``
(converted to UTC with the standard library's zoneinfo), and the predicates are run on SQLite
(standard library sqlite3) over an invented issue table.
"""

from __future__ import annotations

import io
import json
import sqlite3
from datetime import datetime, timezone

import pytest

from nlnorm.cli import main, run_batch
from nlnorm.context import Context

NOW = ["--now", "2026-12-02T10:00", "--tz", "Europe/Berlin"]


def run(capsys, *argv: str) -> tuple[int, str, str]:
    code = main(list(argv))
    out, err = capsys.readouterr()
    return code, out, err


def test_a_period_mention_gets_its_predicate_and_bound_values(capsys):
    code, out, _ = run(capsys, "normalize", "bugs created last week", *NOW,
                       "--sql-column", "created_at", "--dialect", "postgres", "--indent", "0")
    assert code == 0
    m = json.loads(out)["mentions"][0]
    assert m["sql"] == {
        "dialect": "postgres",
        "where": "created_at >= %(t1_start)s AND created_at < %(t1_end)s",
        "params": {"t1_start": "2026-11-22T23:00:00+00:00", "t1_end": "2026-11-29T23:00:00+00:00"},
    }
    # The bound values are the mention's own bounds, in UTC (zoneinfo).
    start = datetime.fromisoformat(m["start"]).astimezone(timezone.utc)
    assert m["sql"]["params"]["t1_start"] == start.isoformat()


def test_positional_paramstyles_give_a_list_named_ones_an_object(capsys):
    _, out, _ = run(capsys, "normalize", "closed since Monday", *NOW, "--sql-column", "closed_at",
                    "--dialect", "mysql", "--indent", "0")
    sql = json.loads(out)["mentions"][0]["sql"]
    assert sql["where"] == ("closed_at >= CONVERT_TZ(%s, '+00:00', @@session.time_zone)")
    assert sql["params"] == ["2026-11-29T23:00:00"]  # naive UTC: MySQL has no aware type
    _, out, _ = run(capsys, "normalize", "closed since Monday", *NOW, "--sql-column", "closed_at",
                    "--dialect", "duckdb", "--paramstyle", "named", "--indent", "0")
    assert json.loads(out)["mentions"][0]["sql"]["params"] == {"t1_start": "2026-11-29T23:00:00+00:00"}


def test_literal_writes_typed_values_and_binds_nothing(capsys):
    _, out, _ = run(capsys, "normalize", "tickets updated yesterday", *NOW, "--sql-column",
                    "updated_on", "--dialect", "tsql", "--column-kind", "date", "--literal",
                    "--indent", "0")
    sql = json.loads(out)["mentions"][0]["sql"]
    assert sql == {"dialect": "tsql", "params": [],
                   "where": "updated_on >= CAST('2026-12-01' AS DATE) AND updated_on < CAST('2026-12-02' AS DATE)"}


def test_a_local_column_in_another_zone_and_a_sqlite_encoding(capsys):
    _, out, _ = run(capsys, "normalize", "bugs from today", *NOW, "--sql-column", "opened",
                    "--dialect", "sqlite", "--column-kind", "local", "--column-zone",
                    "America/New_York", "--sqlite-encoding", "text-t", "--literal", "--indent", "0")
    where = json.loads(out)["mentions"][0]["sql"]["where"]
    # Berlin's 2026-12-02 is 18:00 the day before to 18:00 that day on New York's wall clock.
    assert where == "opened >= '2026-12-01T18:00' AND opened < '2026-12-02T18:00'"


def test_a_mention_that_is_no_period_gets_no_sql_field(capsys):
    _, out, _ = run(capsys, "normalize", "what is open right now", *NOW, "--sql-column", "at",
                    "--dialect", "duckdb", "--indent", "0")
    mentions = json.loads(out)["mentions"]
    assert mentions and mentions[0]["kind"] == "instant" and "sql" not in mentions[0]


def test_without_sql_options_the_output_has_no_sql_field(capsys):
    _, out, _ = run(capsys, "normalize", "bugs created last week", *NOW, "--indent", "0")
    assert "sql" not in json.loads(out)["mentions"][0]


def test_sprint_key_selects_by_the_sprint_table_keys(capsys, tmp_path):
    table = tmp_path / "sprints.csv"
    table.write_text("id,name,number,start,end\n701,Oxbeck,46,2026-10-05,2026-10-16\n"
                     "702,Tarnwell,47,2026-10-19,2026-10-30\n", encoding="utf-8")
    _, out, _ = run(capsys, "normalize", "issues closed in the Tarnwell sprint", *NOW, "--sprints",
                    str(table), "--sql-column", "closed_at", "--dialect", "postgres",
                    "--sprint-key", "sprint_id", "--indent", "0")
    sql = json.loads(out)["mentions"][0]["sql"]
    assert sql["where"] == "sprint_id IN (%(t1_sprint1)s)"
    assert sql["params"] == {"t1_sprint1": "702"}


@pytest.mark.parametrize("argv, message", [
    (["--dialect", "duckdb"], "--dialect: used only with --sql-column"),
    (["--sql-column", "created_at"], "--sql-column needs --dialect"),
    (["--sql-column", "created_at; DROP TABLE issues", "--dialect", "duckdb"], "not a plain column name"),
    (["--sql-column", "created_at", "--dialect", "oracel"], "is not one nlnorm writes"),
    (["--sql-column", "c", "--dialect", "duckdb", "--sqlite-encoding", "unix"], "is for --dialect sqlite"),
    (["--sql-column", "c", "--dialect", "duckdb", "--sprint-key", "sprint_id"], "needs --sprints"),
    (["--sql-column", "c", "--dialect", "sqlite", "--column-kind", "date", "--sqlite-encoding", "unix"],
     "holds instants"),
])
def test_bad_sql_options_are_one_clear_error(capsys, argv, message):
    code, out, err = run(capsys, "normalize", "bugs from last week", *NOW, *argv)
    assert code == 2 and out == "" and message in err


def test_batch_adds_sql_to_every_line_and_keeps_one_line_per_input(tmp_path):
    ctx = Context.at("2026-12-02T10:00", tz="Europe/Berlin")
    import argparse

    from nlnorm.cli import _sql_adder

    args = argparse.Namespace(sql_column="created_at", dialect="sqlite", paramstyle=None,
                              column_kind="utc", column_zone=None, sqlite_encoding="text",
                              sprint_key=None, literal=False)
    source = io.StringIO('{"id": 1, "text": "bugs created last week"}\nnot json\n'
                         '{"id": 3, "text": "tickets opened since March"}\n')
    sink = io.StringIO()
    lines, mentions, errors = run_batch(source, sink, ctx, add_sql=_sql_adder(args, ctx))
    rows = [json.loads(line) for line in sink.getvalue().splitlines()]
    assert (lines, errors, len(rows)) == (3, 1, 3)
    assert rows[1]["error"].startswith("line 2:")
    # Run both predicates on SQLite over an invented table of naive UTC text timestamps.
    db = sqlite3.connect(":memory:")
    db.execute("CREATE TABLE issues (id INTEGER, created_at TEXT)")
    db.executemany("INSERT INTO issues VALUES (?, ?)", [
        (1, "2026-11-22 22:59:59"), (2, "2026-11-22 23:00:00"), (3, "2026-11-29 22:59:59"),
        (4, "2026-11-29 23:00:00"), (5, "2026-02-28 23:00:00"), (6, "2026-02-28 22:59"),
    ])
    got = []
    for row in (rows[0], rows[2]):
        sql = row["mentions"][0]["sql"]
        got.append([i for (i,) in db.execute(
            f"SELECT id FROM issues WHERE {sql['where']} ORDER BY id", sql["params"])])
    # since March: from 2026-03-01 in Berlin, 2026-02-28 23:00 UTC; row 6 is a minute before.
    assert got == [[2, 3], [1, 2, 3, 4, 5]]
