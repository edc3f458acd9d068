"""bind(): SQL a translator wrote against the template, bound from the normalization result.

A model shown "bugs created {t1} or {t2}, and comments {t3}" writes SQL with the template's
slots; bind() turns each into a predicate or a bound value in the driver's paramstyle, and the
SQL then runs on a real engine and selects the rows Python's own interval membership selects.

Checked against:
- PEP 249 (DB-API 2.0), "paramstyle": qmark ``?``, numeric ``:1``, named ``:name``, format
  ``%s``, pyformat ``%(name)s``;
- SQLite (stdlib sqlite3), which takes qmark, numeric and named placeholders;
- DuckDB (pip), which takes qmark and numeric ``$1`` (its own spelling, written by the duckdb
  dialect) placeholders;
- PostgreSQL 15 through psycopg 3, which takes format and pyformat and wants every literal "%"
  doubled in SQL that has parameters (psycopg documentation, "Passing parameters to SQL
  queries");
- sqlglot's parser: the bound SQL still parses in its dialect.
"""

from __future__ import annotations

import sqlite3
from datetime import date, datetime, timedelta, timezone
from typing import Any

from zoneinfo import ZoneInfo

import duckdb
import pytest
import sqlglot

from nlnorm import Context, normalize
from nlnorm.sql import DIALECTS, PARAMSTYLES, Column, SqlError, bind

UTC = timezone.utc
CTX = Context.at("2026-12-02T10:00", tz="Europe/Berlin")
# "last week" = [2026-11-23, 2026-11-30) Berlin = [11-22 23:00, 11-29 23:00) UTC;
# "until Friday" = (.., 2026-12-05) Berlin; "since March" = [2026-03-01, ..) Berlin.
QUESTION = "bugs created last week or until Friday, and comments since March, open now"
RESULT = normalize(QUESTION, CTX)

ISSUES = [  # key, title, created_at (naive UTC, as SQLite's datetime() writes it)
    ("WRN-2101", "Gateway 100% CPU after the firmware update", "2026-11-22 22:59:59"),
    ("WRN-2102", "Portal shows the wrong device clock", "2026-11-22 23:00:00"),
    ("WRN-2103", "Scheduler drops the second maintenance window", "2026-11-29 22:59:59"),
    ("WRN-2104", "Update banner overlaps the table header", "2026-11-29 23:00:00"),
    ("WRN-2105", "Export to CSV cuts long titles", "2026-12-04 22:59:59"),
    ("WRN-2106", "Sensor list sorts 10 before 9", "2026-12-04 23:00:00"),
    ("WRN-2107", "Login page {t1} placeholder shows", "2026-02-28 22:59:59"),
    ("WRN-2108", "Pairing fails on the second try", "2026-02-28 23:00:00"),
]


def _utc(text: str) -> datetime:
    return datetime.fromisoformat(text).replace(tzinfo=UTC)


def _oracle(slot: str) -> list[str]:
    """Python's interval membership: the keys whose instant lies in the slot's interval."""
    s = RESULT.template.slots[slot]
    start = datetime.fromisoformat(s.start) if s.start else None
    end = datetime.fromisoformat(s.end) if s.end else None
    return sorted(k for k, _, at in ISSUES
                  if (start is None or start <= _utc(at)) and (end is None or _utc(at) < end))


def test_the_question_has_the_slots_the_tests_use() -> None:
    assert RESULT.template.text == "bugs created {t1} or {t2}, and comments {t3}, open {t4}"
    assert [m.text for m in RESULT.mentions] == ["last week", "until Friday", "since March", "now"]
    assert _oracle("t1") == ["WRN-2102", "WRN-2103"]


# ---------------------------------------------------------------------------------------------
# What bind writes


def test_a_slot_becomes_the_predicate_over_the_column_named_in_place() -> None:
    sql, params = bind("SELECT key FROM issues WHERE {t1:created_at}", RESULT, "postgres",
                       kind="utc", paramstyle="qmark")
    assert sql == "SELECT key FROM issues WHERE (created_at >= ? AND created_at < ?)"
    assert params == (datetime(2026, 11, 22, 23, 0), datetime(2026, 11, 29, 23, 0))


def test_a_slot_uses_the_column_mapped_to_it_when_none_is_named_in_place() -> None:
    sql, params = bind("SELECT key FROM issues WHERE {t1} OR {t3}", RESULT, "sqlite",
                       column={"t1": Column("created_at", "date"), "*": "updated_at"}, kind="utc")
    assert sql == ("SELECT key FROM issues WHERE (created_at >= ? AND created_at < ?) "
                   "OR (updated_at >= ?)")
    # SQLite has no date type: the bounds are text in the column's encoding (ISO 8601, with a
    # space by default), as its date and time functions write them (SQLite, "Date And Time
    # Functions").
    assert params == ("2026-11-23", "2026-11-30", "2026-02-28 23:00")


def test_an_open_side_is_left_out_of_a_whole_slot() -> None:
    sql, params = bind("WHERE {t2:created_at}", RESULT, "duckdb", kind="date")
    assert sql == "WHERE (created_at < ?)"
    assert params == (date(2026, 12, 5),)


@pytest.mark.parametrize(("paramstyle", "sql", "params"), [
    ("qmark", "created_at >= ? AND created_at < ?", None),
    ("numeric", "created_at >= :1 AND created_at < :2", None),
    ("named", "created_at >= :t1_start AND created_at < :t1_end", "dict"),
    ("format", "created_at >= %s AND created_at < %s", None),
    ("pyformat", "created_at >= %(t1_start)s AND created_at < %(t1_end)s", "dict"),
])
def test_named_bounds_become_the_driver_s_placeholders(paramstyle: str, sql: str, params: Any) -> None:
    # Source: PEP 249, paramstyle.
    values = (datetime(2026, 11, 22, 23, 0), datetime(2026, 11, 29, 23, 0))
    expected = dict(zip(("t1_start", "t1_end"), values)) if params == "dict" else values
    for written in ("created_at >= :t1_start AND created_at < :t1_end",
                    "created_at >= @t1_start AND created_at < @t1_end",
                    "created_at >= %(t1_start)s AND created_at < %(t1_end)s"):
        assert bind(written, RESULT, "postgres", kind="utc", paramstyle=paramstyle) == (sql, expected)


def test_numbering_goes_on_across_slots_and_bounds() -> None:
    sql, params = bind("WHERE {t1:a} AND b < :t2_end AND {t3:c}", RESULT, "sqlite",
                       kind="utc", paramstyle="numeric")
    assert sql == "WHERE (a >= :1 AND a < :2) AND b < :3 AND (c >= :4)"
    assert len(params) == 4


def test_a_slot_used_twice_binds_twice() -> None:
    sql, params = bind("WHERE {t1:a} OR {t1:b}", RESULT, "sqlite", kind="utc")
    assert sql == "WHERE (a >= ? AND a < ?) OR (b >= ? AND b < ?)"
    assert params[:2] == params[2:]


@pytest.mark.parametrize("dialect", DIALECTS)
def test_placeholders_in_strings_quoted_names_and_comments_are_left_alone(dialect: str) -> None:
    quote = {"tsql": "[{t1}]", "mysql": "`{t1}`", "bigquery": "`{t1}`", "spark": "`{t1}`"}.get(
        dialect, '"{t1}"')
    sql = ("SELECT key AS " + quote + " FROM issues -- {t1} and :t1_start\n"
           "WHERE title <> '{t1} :t1_end' /* {t2:x} */ AND {t1:created_at}")
    bound, params = bind(sql, RESULT, dialect, kind="date", paramstyle="qmark")
    assert bound == sql.replace("{t1:created_at}", "(created_at >= ? AND created_at < ?)")
    assert len(params) == 2


def test_a_doubled_quote_inside_a_string_does_not_end_it() -> None:
    sql = "WHERE title <> 'it''s {t1}' AND {t1:created_at}"
    bound, _ = bind(sql, RESULT, "sqlite", kind="date")
    assert bound == "WHERE title <> 'it''s {t1}' AND (created_at >= ? AND created_at < ?)"


@pytest.mark.parametrize("dialect", ["mysql", "bigquery", "spark"])
def test_a_backslash_escaped_quote_inside_a_string_does_not_end_it(dialect: str) -> None:
    # Source: MySQL, BigQuery and Spark SQL take \' as a quote inside a string (common practice).
    sql = "WHERE title <> 'it\\'s {t1}' AND {t1:created_at}"
    bound, _ = bind(sql, RESULT, dialect, kind="date", paramstyle="qmark")
    assert bound == "WHERE title <> 'it\\'s {t1}' AND (created_at >= ? AND created_at < ?)"


def test_a_postgres_dollar_quoted_string_is_left_alone() -> None:
    sql = "SELECT $body$ {t1} :t1_start $body$, $$ {t2} $$ WHERE {t1:created_at}"
    bound, params = bind(sql, RESULT, "postgres", kind="date", paramstyle="qmark")
    assert bound == "SELECT $body$ {t1} :t1_start $body$, $$ {t2} $$ WHERE (created_at >= ? AND created_at < ?)"
    assert len(params) == 2


@pytest.mark.parametrize("paramstyle", ["format", "pyformat"])
def test_the_sql_s_own_percent_signs_are_doubled_for_percent_drivers(paramstyle: str) -> None:
    # Source: PEP 249 format/pyformat drivers (psycopg, mysqlclient) read every "%" as the start
    # of a placeholder; psycopg's documentation says to write "%%" for a literal one.
    sql, _ = bind("WHERE title LIKE '%CPU%' AND {t1:created_at} AND pct % 2 = 0", RESULT,
                  "postgres", kind="utc", paramstyle=paramstyle)
    assert sql.startswith("WHERE title LIKE '%%CPU%%' AND (created_at >= %")
    assert sql.endswith(" AND pct %% 2 = 0")


def test_other_drivers_keep_percent_signs_as_written() -> None:
    sql, _ = bind("WHERE title LIKE '%CPU%' AND {t1:created_at}", RESULT, "sqlite", kind="utc")
    assert sql == "WHERE title LIKE '%CPU%' AND (created_at >= ? AND created_at < ?)"


def test_instant_bounds_keep_the_dialect_s_cast() -> None:
    sql, params = bind("WHERE created_at >= @t1_start", RESULT, "tsql", kind="instant")
    assert "t1_start" not in sql and sql.startswith("WHERE created_at >= ")
    assert params in ((datetime(2026, 11, 22, 23, 0),),
                      (datetime(2026, 11, 22, 23, 0, tzinfo=UTC),))


@pytest.mark.parametrize("dialect", DIALECTS)
@pytest.mark.parametrize("paramstyle", PARAMSTYLES)
def test_bound_sql_parses_in_its_dialect(dialect: str, paramstyle: str) -> None:
    # Source: sqlglot's parser. Driver placeholders are not SQL; each is swapped for "?" first.
    from tests.sql.test_sqlglot_parses import _PLACEHOLDER  # the swap the fragment test makes

    sql, params = bind("SELECT id FROM issues WHERE ({t1:created_at} OR {t2:updated_at}) "
                       "AND closed_at >= :t3_start", RESULT, dialect, kind="date",
                       paramstyle=paramstyle)
    swapped, count = _PLACEHOLDER[paramstyle].subn("?", sql)
    assert count == len(params) == 4
    sqlglot.parse_one(swapped, read=dialect)


# ---------------------------------------------------------------------------------------------
# Errors say what is wrong


def test_an_unknown_slot_is_an_error_listing_the_slots() -> None:
    with pytest.raises(SqlError, match=r"\{t9\} but the result has no such slot \(slots: t1, t2, t3, t4\)"):
        bind("WHERE {t9:created_at}", RESULT)


def test_a_slot_without_a_column_says_how_to_give_one() -> None:
    with pytest.raises(SqlError, match=r"write \{t1:created_at\} in the SQL or pass column="):
        bind("WHERE {t1}", RESULT)


def test_a_bound_the_phrase_does_not_have_is_an_error() -> None:
    with pytest.raises(SqlError, match="t2_start: 'until Friday' has no start"):
        bind("WHERE created_at >= :t2_start", RESULT)


def test_an_instant_has_no_predicate() -> None:
    with pytest.raises(SqlError, match=r"\{t4\} is 'now', an instant, not a period"):
        bind("WHERE {t4:created_at}", RESULT)


def test_a_result_holding_an_error_binds_nothing() -> None:
    from nlnorm.schema import Result

    failed = Result(id="q7", text="bugs from last week", error="the line is no JSON")
    assert failed.reference is None
    with pytest.raises(SqlError, match="no reference"):
        bind("WHERE {t1:created_at}", failed)


def test_sql_that_is_no_string_is_an_error() -> None:
    with pytest.raises(SqlError, match="sql must be a string, got bytes"):
        bind(b"WHERE {t1:created_at}", RESULT)  # type: ignore[arg-type]


def test_an_unknown_dialect_is_an_error_that_lists_them() -> None:
    with pytest.raises(SqlError, match="dialect='postgress' is not one nlnorm writes"):
        bind("WHERE {t1:created_at}", RESULT, "postgress")


# ---------------------------------------------------------------------------------------------
# Bound SQL runs on real engines and selects what Python selects

TRANSLATED = ("SELECT key FROM issues WHERE ({t1:created_at} OR {t2:created_at}) "
              "AND title NOT LIKE '%{t1}%' ORDER BY key")


def _expected() -> list[str]:
    """Last week or until Friday, but not the title that holds "{t1}" (the string in the SQL
    is the SQL's own, left as written)."""
    keys = sorted(set(_oracle("t1")) | set(_oracle("t2")))
    return [k for k, title, _ in ISSUES if k in keys and "{t1}" not in title]


def test_the_expected_rows_are_the_ones_before_friday_bar_one() -> None:
    assert _expected() == ["WRN-2101", "WRN-2102", "WRN-2103", "WRN-2104", "WRN-2105", "WRN-2108"]


@pytest.mark.parametrize("paramstyle", ["qmark", "numeric", "named"])
def test_bound_sql_selects_python_s_rows_on_sqlite(paramstyle: str) -> None:
    con = sqlite3.connect(":memory:")
    con.execute("CREATE TABLE issues (key TEXT, title TEXT, created_at TEXT)")
    con.executemany("INSERT INTO issues VALUES (?, ?, ?)", ISSUES)
    sql, params = bind(TRANSLATED, RESULT, "sqlite", kind="utc", paramstyle=paramstyle)
    if paramstyle == "numeric":  # sqlite3 spells numbered placeholders ?1, ?2
        sql = sql.replace(":", "?")
    assert [r[0] for r in con.execute(sql, params)] == _expected()


@pytest.mark.parametrize("kind", ["utc", "instant"])
def test_bound_sql_selects_python_s_rows_on_duckdb(kind: str) -> None:
    con = duckdb.connect()
    con.execute("SET TimeZone = 'Pacific/Auckland'")  # rows must not depend on it
    column_type = "TIMESTAMP" if kind == "utc" else "TIMESTAMPTZ"
    con.execute(f"CREATE TABLE issues (key TEXT, title TEXT, created_at {column_type})")
    for key, title, at in ISSUES:
        value: Any = _utc(at).replace(tzinfo=None) if kind == "utc" else _utc(at)
        con.execute("INSERT INTO issues VALUES (?, ?, ?)", (key, title, value))
    sql, params = bind(TRANSLATED, RESULT, "duckdb", kind=kind)
    assert [r[0] for r in con.execute(sql, params).fetchall()] == _expected()


@pytest.mark.parametrize("paramstyle", ["format", "pyformat"])
@pytest.mark.parametrize("kind", ["date", "utc", "instant"])
def test_bound_sql_selects_python_s_rows_on_postgres(pg_dsn: str, paramstyle: str, kind: str) -> None:
    psycopg = pytest.importorskip("psycopg")
    column_type = {"date": "date", "utc": "timestamp", "instant": "timestamptz"}[kind]
    with psycopg.connect(pg_dsn, autocommit=True) as con:
        con.execute("SET TIME ZONE 'America/Los_Angeles'")  # rows must not depend on it
        con.execute(f"CREATE TEMP TABLE issues (key text, title text, created_at {column_type})")
        berlin = ZoneInfo("Europe/Berlin")
        for key, title, at in ISSUES:
            value: Any = {"date": _utc(at).astimezone(berlin).date(),
                          "utc": _utc(at).replace(tzinfo=None), "instant": _utc(at)}[kind]
            con.execute("INSERT INTO issues VALUES (%s, %s, %s)", (key, title, value))
        sql, params = bind(TRANSLATED, RESULT, "postgres", kind=kind, paramstyle=paramstyle)
        got = [r[0] for r in con.execute(sql, params).fetchall()]
    if kind == "date":  # a date column holds the Berlin day; days overlapping the interval
        days = {k: _utc(at).astimezone(berlin).date() for k, _, at in ISSUES}
        last_week = {k for k, d in days.items() if date(2026, 11, 23) <= d < date(2026, 11, 30)}
        until_friday = {k for k, d in days.items() if d < date(2026, 12, 5)}
        expected = sorted(k for k in last_week | until_friday if k != "WRN-2107")
        assert got == expected
    else:
        assert got == _expected()


def test_the_utc_rows_the_tests_use_sit_on_the_bounds() -> None:
    # last week ends 2026-11-30 00:00 Berlin = 2026-11-29 23:00 UTC (Berlin is UTC+1 in
    # November; IANA tz database via zoneinfo).
    end = datetime.fromisoformat(RESULT.template.slots["t1"].end)
    assert end.astimezone(UTC) == datetime(2026, 11, 29, 23, 0, tzinfo=UTC)
    assert end.astimezone(UTC) - timedelta(seconds=1) == _utc("2026-11-29 22:59:59")


def test_an_unknown_paramstyle_is_an_error_that_lists_them() -> None:
    # Source: PEP 249 names five paramstyles.
    with pytest.raises(SqlError, match="paramstyle='qmarks': use one of qmark, numeric, named, format, pyformat"):
        bind("SELECT 1", RESULT, "sqlite", paramstyle="qmarks")
