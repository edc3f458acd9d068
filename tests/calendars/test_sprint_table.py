"""The sprint table: loading from CSV, JSON, dicts and DB-API 2 connections, and the errors of a
bad table, each naming the row.

Checked against: the standard library's ``sqlite3`` and DuckDB (pip) as DB-API 2 connections
(source: each engine's own DATE type and cursor.description).
"""

from __future__ import annotations

import json
import sqlite3
from datetime import date

import pytest

from nlnorm.calendars.sprints import SprintCalendar, SprintTableError, sprint_key

ROWS = [
    {"name": "Tidewrack", "number": 41, "start": "2026-10-12", "end": "2026-10-23", "team": "Wrenfold"},
    {"name": "Bramblegate", "number": 42, "start": "2026-10-26", "end": "2026-11-06", "team": "Wrenfold"},
    # A week's gap (the offsite) is normal.
    {"name": "Foxglove", "number": 43, "start": "2026-11-16", "end": "2026-11-27", "team": "Wrenfold"},
    {"name": "Inkwell", "number": 44, "start": "2026-11-30", "end": "2026-12-11", "team": "Wrenfold"},
]


def test_rows_are_sorted_and_ends_stored_exclusive():
    cal = SprintCalendar.from_rows(list(reversed(ROWS)))
    assert [s.name for s in cal.sprints] == ["Tidewrack", "Bramblegate", "Foxglove", "Inkwell"]
    assert cal.sprints[0].end == date(2026, 10, 24) and cal.sprints[0].last_day == date(2026, 10, 23)


def test_exclusive_ends_are_taken_as_given():
    rows = [dict(r, end=r["end"]) for r in ROWS]
    cal = SprintCalendar.from_rows(rows, end="exclusive")
    assert cal.sprints[0].end == date(2026, 10, 23)


def test_names_and_numbers_are_looked_up_tolerantly():
    cal = SprintCalendar.from_rows(ROWS + [
        {"name": "Harbor-7", "start": "2026-12-14", "end": "2026-12-24", "team": "Wrenfold"}])
    assert cal.named("harbor 7")[0].name == "Harbor-7"
    assert cal.named("SPRINT HARBOR_7")[0].name == "Harbor-7"
    assert cal.named("FOXGLOVE")[0].number == 43
    assert cal.numbered(42)[0].name == "Bramblegate"
    assert sprint_key("Sprint 42") == "42"


@pytest.mark.parametrize("bad, message", [
    ({"name": "", "start": "2026-12-14", "end": "2026-12-24"}, r"row 5 of rows: field 'name' is missing"),
    ({"name": "Marrowbone", "start": "2026-13-01", "end": "2026-12-24"}, r"row 5 of rows: field 'start' = '2026-13-01' is not an ISO date"),
    ({"name": "Marrowbone", "start": "2026-12-14"}, r"row 5 of rows: field 'end' is missing"),
    ({"name": "Marrowbone", "start": "2026-12-24", "end": "2026-12-14"}, r"row 5 of rows: sprint 'Marrowbone' ends before it starts"),
    ({"name": "Marrowbone", "number": "x1", "start": "2026-12-14", "end": "2026-12-24"}, r"row 5 of rows: field 'number' = 'x1'"),
    ({"name": "Foxglove", "start": "2027-01-04", "end": "2027-01-15", "team": "Wrenfold"}, r"duplicate sprint 'Foxglove' of team 'Wrenfold'"),
    ({"name": "Marrowbone", "number": 44, "start": "2027-01-04", "end": "2027-01-15", "team": "Wrenfold"}, r"duplicate sprint number 44"),
    ({"name": "Marrowbone", "start": "2026-12-07", "end": "2026-12-18", "team": "Wrenfold"}, r"row 5 of rows: sprint 'Marrowbone' \(2026-12-07 to 2026-12-18\) overlaps 'Inkwell' \(2026-11-30 to 2026-12-11, row 4 of rows\)"),
])
def test_a_bad_row_is_named(bad, message):
    with pytest.raises(SprintTableError, match=message):
        SprintCalendar.from_rows(ROWS + [bad])


def test_an_inclusive_end_given_as_exclusive_gets_a_hint():
    with pytest.raises(SprintTableError, match="use end='exclusive'"):
        SprintCalendar.from_rows([{"name": "One-day", "start": "2026-12-14", "end": "2026-12-13"}])


def test_sprints_of_different_teams_may_overlap():
    other = [{"name": "Lanternfish 9", "start": "2026-11-30", "end": "2026-12-11", "team": "Lanternfish"}]
    cal = SprintCalendar.from_rows(ROWS + other)
    assert cal.teams == ("Lanternfish", "Wrenfold")
    assert [s.name for s in cal.of_team("wrenfold")][-1] == "Inkwell"


def test_csv_with_a_header(tmp_path):
    path = tmp_path / "sprints.csv"
    path.write_text("name,number,start,end,team\n" + "\n".join(
        f"{r['name']},{r['number']},{r['start']},{r['end']},{r['team']}" for r in ROWS) + "\n")
    assert SprintCalendar.load(path).sprints[-1].name == "Inkwell"
    path.write_text("name,number,start,end\nTidewrack,41,2026-10-12,2026-10-02\n")
    with pytest.raises(SprintTableError, match=r"row 1 of sprints.csv \(line = row \+ 1\)"):
        SprintCalendar.load(path)


def test_csv_without_the_needed_columns(tmp_path):
    path = tmp_path / "sprints.csv"
    path.write_text("title,begin,finish\nTidewrack,2026-10-12,2026-10-23\n")
    with pytest.raises(SprintTableError, match="lacks 'name', 'start', 'end'"):
        SprintCalendar.load(path)


def test_json_list(tmp_path):
    path = tmp_path / "sprints.json"
    path.write_text(json.dumps(ROWS))
    assert len(SprintCalendar.load(path).sprints) == 4
    path.write_text("{not json")
    with pytest.raises(SprintTableError, match="sprints.json is not valid JSON"):
        SprintCalendar.load(path)
    path.write_text(json.dumps({"name": "x"}))
    with pytest.raises(SprintTableError, match="expected a JSON list"):
        SprintCalendar.load(path)


def test_a_missing_file_is_named(tmp_path):
    with pytest.raises(SprintTableError, match="does not exist"):
        SprintCalendar.load(tmp_path / "nope.csv")


def _fill(conn, date_type: str) -> None:
    conn.execute(f"CREATE TABLE iterations (title TEXT, seq INTEGER, first_day {date_type}, "
                 f"last_day {date_type}, squad TEXT)")
    for r in ROWS:
        conn.execute("INSERT INTO iterations VALUES (?, ?, ?, ?, ?)",
                     (r["name"], r["number"], r["start"], r["end"], r["team"]))


QUERY = ("SELECT title AS name, seq AS number, first_day AS start, last_day AS \"end\", "
         "squad AS team FROM iterations")


def test_a_live_query_through_sqlite():
    # Source: sqlite3 (standard library); SQLite has no DATE type, dates come back as text.
    conn = sqlite3.connect(":memory:")
    _fill(conn, "TEXT")
    cal = SprintCalendar.from_query(conn, QUERY)
    assert [s.number for s in cal.sprints] == [41, 42, 43, 44]


def test_a_live_query_through_duckdb():
    # Source: DuckDB (pip); DATE columns come back as datetime.date.
    duckdb = pytest.importorskip("duckdb", reason="DuckDB is a test dependency: pip install 'nlnorm[test]'")
    conn = duckdb.connect()
    _fill(conn, "DATE")
    cal = SprintCalendar.from_query(conn, QUERY)
    assert cal.sprints[2].start == date(2026, 11, 16) and cal.sprints[2].team == "Wrenfold"


def test_a_query_row_with_a_bad_date_is_named():
    conn = sqlite3.connect(":memory:")
    _fill(conn, "TEXT")
    conn.execute("UPDATE iterations SET last_day = 'soon' WHERE seq = 43")
    with pytest.raises(SprintTableError, match="row 3 of the sprint query: field 'end' = 'soon'"):
        SprintCalendar.from_query(conn, QUERY + " ORDER BY seq")
