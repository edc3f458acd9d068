"""Nothing hostile reaches the SQL: not from a column name, not from the question.

A column name is letters, digits and "_" of any script (not starting with a digit), in
dot-separated parts; anything else is refused with an SqlError that says what is allowed. A
name that is a keyword, or not plain ASCII, is quoted the dialect's way. The text of a question
never appears in a fragment or in bound SQL, whatever it holds, and running such a fragment on
SQLite leaves the table as it was.

Checked against:
- sqlglot's parser (sqlglot 30.x): a quoted name reads back as the same identifier, quoted;
- the identifier quoting each dialect documents (common practice, as written in the
  manuals): double quotes for SQLite, DuckDB, PostgreSQL and Snowflake; backticks for MySQL,
  BigQuery and Spark SQL; square brackets for SQL Server (Transact-SQL);
- the engines' own keyword lists, each keyword used as a column name on the engine itself:
  SQLite (stdlib sqlite3; the list from the library's ``sqlite3_keyword_name()``, called
  through ctypes), DuckDB (``duckdb_keywords()``) and PostgreSQL (``pg_get_keywords()``, on the
  server of conftest.py);
- Unicode character properties (``unicodedata``, the Unicode Character Database): which
  look-alike characters are punctuation, format or space characters;
- SQLite (stdlib sqlite3): a hostile question's fragment run with ``executescript`` (which
  would run any statement pasted into it) leaves the table and its rows intact.
"""

from __future__ import annotations

import ctypes
import json
import re
import sqlite3
import unicodedata
from datetime import date, datetime
from importlib import resources
from typing import Any

import duckdb
import pytest
import sqlglot
from sqlglot import exp

from nlnorm import Context, normalize
from nlnorm.calendars.sprints import SprintCalendar
from nlnorm.sql import DIALECTS, PARAMSTYLES, Column, SqlError, bind, predicate, predicates, quoted_name

CTX = Context.at("2026-12-02T10:00", tz="Europe/Berlin")
ALLOWED = "letters, digits and '_' (not starting with a digit)"

# ---------------------------------------------------------------------------------------------
# Hostile column names are refused

HOSTILE_NAMES = {
    "single quote": "created_at'",
    "closing quote and statement": "created_at'; DROP TABLE issues; --",
    "double quote": 'created_at"',
    "quoted name": '"created_at"',
    "backtick": "created_at`",
    "brackets": "[created_at]",
    "closing bracket": "created_at]",
    "semicolon": "created_at;DROP",
    "line comment": "created_at--",
    "block comment": "created_at/*",
    "space": "created at",
    "tab": "created_at\t",
    "newline": "created_at\nOR 1=1",
    "parenthesis": "created_at)",
    "or clause": "created_at OR 1=1",
    "percent placeholder": "%(t1_start)s",
    "qmark": "created_at?",
    "named placeholder": ":t1_start",
    "dollar": "$1",
    "at sign": "@created_at",
    "nul": "created\x00at",
    "empty": "",
    "leading digit": "1created_at",
    "leading fullwidth digit": "\uff11created_at",
    "empty part": "issues..created_at",
    "leading dot": ".created_at",
    "trailing dot": "created_at.",
    "too long": "c" * 129,
    "too long part": "issues." + "c" * 129,
    "fullwidth apostrophe": "created_at\uff07",
    "right single quotation mark": "created_at\u2019",
    "fullwidth quotation mark": "created_at\uff02",
    "fullwidth semicolon": "created_at\uff1b",
    "hyphen": "created\u2010at",
    "prime": "created_at\u2032",
    "zero width space": "created\u200bat",
    "right-to-left override": "created\u202eat",
    "ideographic space": "created\u3000at",
    "fullwidth low line": "created\uff3fat",
}


@pytest.mark.parametrize("dialect", DIALECTS)
@pytest.mark.parametrize("name", HOSTILE_NAMES.values(), ids=HOSTILE_NAMES.keys())
def test_hostile_column_name_is_refused_saying_what_is_allowed(name: str, dialect: str) -> None:
    with pytest.raises(SqlError) as raised:
        quoted_name(name, dialect)
    message = str(raised.value)
    assert ALLOWED in message or "give the column's name" in message
    assert repr(name) in message  # it says which name


def test_the_look_alikes_refused_are_no_letters_or_digits() -> None:
    # Source: the Unicode Character Database (unicodedata): each look-alike above is
    # punctuation (P*), a format character (Cf) or a space (Zs), never a letter or digit.
    for label, name in HOSTILE_NAMES.items():
        odd = [c for c in name if not c.isascii()]
        for c in odd:
            category = unicodedata.category(c)
            assert category[0] in "PCZ" or (label.startswith("leading") and category == "Nd"), (label, category)


@pytest.mark.parametrize("dialect", DIALECTS)
def test_a_hostile_name_is_refused_wherever_a_name_is_given(dialect: str) -> None:
    name = "created_at; DROP TABLE issues; --"
    result = normalize("bugs created last week", CTX)
    mention = result.mentions[0]
    with pytest.raises(SqlError, match=re.escape(ALLOWED)):
        predicate(mention, name, dialect, tz="Europe/Berlin")
    with pytest.raises(SqlError, match=re.escape(ALLOWED)):
        predicates(result, Column(name, "date"), dialect, style="literal")
    with pytest.raises(SqlError, match=re.escape(ALLOWED)):
        predicates(result, {"t1": "issues.created_at;"}, dialect)
    with pytest.raises(SqlError, match=re.escape(ALLOWED)):
        bind("SELECT key FROM issues WHERE {t1:created_at;DROP}", result, dialect)
    sprints = SprintCalendar.from_csv("examples/demo/sprints.csv")
    sprint = normalize("what slipped from the last sprint", Context.at(
        "2026-12-02T10:00", tz="Europe/Berlin", sprints=sprints))
    with pytest.raises(SqlError, match=re.escape(ALLOWED)):
        predicates(sprint, "resolved_at", dialect, sprint_key="sprint_id) OR (1=1",
                   sprints=sprints)


def test_a_name_that_is_no_string_is_refused() -> None:
    with pytest.raises(SqlError, match="give the column's name"):
        quoted_name(None, "postgres")  # type: ignore[arg-type]


# Letters that look like quotes. They are Unicode letters (category Lm) of the Spacing Modifier
# Letters block, which nlnorm refuses whole (source: the Unicode Character Database, block
# U+02B0-U+02FF).
QUOTE_LIKE_LETTERS = {
    "modifier letter apostrophe": "created_at\u02bc",
    "modifier letter double apostrophe": "created_at\u02ee",
    "modifier letter prime": "created_at\u02b9",
    "modifier letter double prime": "created_at\u02ba",
}


@pytest.mark.parametrize("name", QUOTE_LIKE_LETTERS.values(), ids=QUOTE_LIKE_LETTERS.keys())
def test_a_letter_that_looks_like_a_quote_is_refused(name: str) -> None:
    assert all(unicodedata.category(c) == "Lm" for c in name if not c.isascii())
    with pytest.raises(SqlError):
        quoted_name(name, "mysql")


# ---------------------------------------------------------------------------------------------
# Keywords and names of other scripts are quoted the dialect's way

QUOTED = {  # dialect: how "order" is written
    "sqlite": '"order"', "duckdb": '"order"', "postgres": '"order"', "snowflake": '"order"',
    "mysql": "`order`", "bigquery": "`order`", "spark": "`order`", "tsql": "[order]",
}
KEYWORDS = ("order", "select", "group", "where")
# Names of other scripts, with combining marks (Devanagari vowel signs, Mc) and a length mark
# (Katakana U+30FC, Lm) that are part of the word.
LETTER_NAMES = ("créé_le", "日付", "Ärger_seit", "дата_создания", "erstellt_am_ß", "दिनांक", "ユーザー")


def _quoted(name: str, dialect: str) -> str:
    return QUOTED[dialect].replace("order", name)


@pytest.mark.parametrize("dialect", DIALECTS)
@pytest.mark.parametrize("name", KEYWORDS + LETTER_NAMES)
def test_keyword_and_letter_names_are_quoted_the_dialect_s_way(name: str, dialect: str) -> None:
    assert quoted_name(name, dialect) == _quoted(name, dialect)
    assert quoted_name(f"issues.{name}", dialect) == f"issues.{_quoted(name, dialect)}"
    fragment = predicates(normalize("bugs created last week", CTX), Column(f"issues.{name}", "date"),
                          dialect, style="literal")["t1"]
    tree = sqlglot.parse_one(f"SELECT 1 FROM issues WHERE {fragment.where}", read=dialect)
    for column in tree.find_all(exp.Column):
        assert column.name == name and column.table == "issues"
        assert column.this.args.get("quoted") is True


@pytest.mark.parametrize("dialect", DIALECTS)
def test_a_plain_ascii_name_stays_bare(dialect: str) -> None:
    assert quoted_name("created_at", dialect) == "created_at"
    assert quoted_name("Issues.CreatedAt", dialect) == "Issues.CreatedAt"


def _sqlite_keywords() -> list[str]:
    # The keyword list compiled into the SQLite library Python's sqlite3 uses.
    lib = ctypes.CDLL(sqlite3.__file__ if False else __import__("_sqlite3").__file__)
    lib.sqlite3_keyword_name.argtypes = [ctypes.c_int, ctypes.POINTER(ctypes.c_char_p),
                                         ctypes.POINTER(ctypes.c_int)]
    out: list[str] = []
    for i in range(lib.sqlite3_keyword_count()):
        text, size = ctypes.c_char_p(), ctypes.c_int()
        lib.sqlite3_keyword_name(i, ctypes.byref(text), ctypes.byref(size))
        out.append(ctypes.string_at(text, size.value).decode().lower())
    return sorted(out)


def _duckdb_keywords() -> list[str]:
    rows = duckdb.connect().execute("SELECT DISTINCT keyword_name FROM duckdb_keywords()").fetchall()
    return sorted(r[0] for r in rows)


def _run_on(con: Any, word: str, dialect: str) -> list[Any]:
    """Rows of a one-row table whose column is called ``word``, selected by a fragment over it."""
    name = quoted_name(word, dialect)
    return con.execute(f'SELECT "{word}" FROM (SELECT 1 AS "{word}") AS t '
                       f"WHERE {name} >= 1 AND {name} < 2").fetchall()


@pytest.mark.parametrize("word", _sqlite_keywords())
def test_every_sqlite_keyword_works_as_a_column_name_on_sqlite(word: str) -> None:
    assert _run_on(sqlite3.connect(":memory:"), word, "sqlite") == [(1,)]


@pytest.fixture(scope="module")
def duck() -> Any:
    return duckdb.connect()


@pytest.mark.parametrize("word", _duckdb_keywords())
def test_every_duckdb_keyword_works_as_a_column_name_on_duckdb(word: str, duck: Any) -> None:
    assert _run_on(duck, word, "duckdb") == [(1,)]


def test_every_postgres_keyword_works_as_a_column_name_on_postgres(pg_dsn: str) -> None:
    psycopg = pytest.importorskip("psycopg")
    failing: list[str] = []
    with psycopg.connect(pg_dsn, autocommit=True) as con:
        words = [r[0] for r in con.execute("SELECT word FROM pg_get_keywords()").fetchall()]
        assert len(words) > 400
        for word in words:
            try:
                if _run_on(con, word, "postgres") != [(1,)]:
                    failing.append(word)
            except psycopg.Error:
                failing.append(word)
    assert failing == []


def _listed(dialect: str) -> set[str]:
    text = resources.files("nlnorm.sql").joinpath("reserved_words.json").read_text("utf-8")
    return set(json.loads(text)[dialect].split())


def test_the_sqlite_list_is_the_library_s_keywords() -> None:
    # Source: sqlite3_keyword_name() of the SQLite library Python links.
    assert _listed("sqlite") == {w.upper() for w in _sqlite_keywords()}


def test_the_duckdb_list_is_its_reserved_and_type_function_keywords(duck: Any) -> None:
    # Source: duckdb_keywords() of the installed DuckDB.
    rows = duck.execute("SELECT keyword_name FROM duckdb_keywords() "
                        "WHERE keyword_category IN ('reserved', 'type_function')").fetchall()
    assert _listed("duckdb") == {r[0].upper() for r in rows}


def test_the_postgres_list_is_its_reserved_and_type_function_keywords(pg_dsn: str) -> None:
    # Source: pg_get_keywords() of the PostgreSQL server (R: reserved; T: reserved, can be a
    # function or type name).
    psycopg = pytest.importorskip("psycopg")
    with psycopg.connect(pg_dsn, autocommit=True) as con:
        rows = con.execute("SELECT word FROM pg_get_keywords() WHERE catcode IN ('R', 'T')").fetchall()
    assert _listed("postgres") == {r[0].upper() for r in rows}


@pytest.mark.parametrize("dialect", ["postgres", "snowflake"])
def test_a_word_the_engine_does_not_reserve_stays_bare_where_quoting_is_case_sensitive(dialect: str) -> None:
    # A quoted name is case-sensitive in PostgreSQL and Snowflake, so "key" or "name" quoted
    # would no longer find the column created as key or KEY (PostgreSQL and Snowflake manuals,
    # "Identifiers"; common practice).
    for word in ("key", "name", "date", "status", "timestamp", "type", "Created_At"):
        assert quoted_name(word, dialect) == word


# ---------------------------------------------------------------------------------------------
# The question's text never reaches the SQL

HOSTILE_QUESTIONS = (
    "bugs from last week'; DROP TABLE issues; --",
    'tickets closed since March"; DELETE FROM issues; /*',
    "bugs created yesterday` OR 1=1 --",
    "issues opened since 2026-11-02) OR (1=1",
    "bugs last week\\'; DROP TABLE issues; --",
    "bugs created last week %(t1_start)s :t1_end ? $1 @t1_start {t1}",
    "bugs since Monday; SELECT * FROM people WHERE 'a'='a",
    "bugs from last week UNION SELECT title FROM issues",
    "bugs from last week\uff07; DROP TABLE issues; --",
    "bugs before 2026-11-02]; DROP TABLE issues; --",
)
# Every word nlnorm writes: keywords and types of the eight dialects, placeholder names.
_WORDS = {"AND", "IN", "DATE", "TIMESTAMP", "TIMESTAMPTZ", "TIMESTAMP_NTZ", "TIMESTAMP_TZ",
          "DATETIME", "DATETIME2", "DATETIMEOFFSET", "CAST", "AS", "CONVERT_TZ",
          "@@session.time_zone", "s", "COLUMN"}
_PLACEHOLDER_NAME = re.compile(r"t[0-9]+_(?:start|end|sprint[0-9]+)")
_ISO_TEXT = re.compile(r"'[0-9T:. +-]*'")
_ISO_VALUE = re.compile(r"[0-9]{4}-[0-9]{2}-[0-9]{2}"
                        r"([ T][0-9]{2}:[0-9]{2}(:[0-9]{2}(\.[0-9]{1,6})?)?([+-][0-9]{2}:[0-9]{2})?)?")


def assert_only_nlnorm_s_text(sql: str, column_sql: str) -> None:
    """``sql`` holds the column, nlnorm's keywords, placeholders, numbers and ISO 8601 text
    only: nothing of the question."""
    for token in ("DROP", "DELETE", "UNION", "SELECT", "1=1", ";", "--", "/*", "`", '"', "]",
                  "$1", "{t1}", "'a'"):
        assert token not in sql.replace(column_sql, " "), (token, sql)
    rest = _ISO_TEXT.sub(" ", sql.replace(column_sql, " COLUMN "))
    assert "'" not in rest, sql
    words = set(re.findall(r"[A-Za-z_@][A-Za-z0-9_.@]*", rest))
    assert {w for w in words if not _PLACEHOLDER_NAME.fullmatch(w)} <= _WORDS, sql
    leftover = re.sub(r"[A-Za-z_@][A-Za-z0-9_.@]*|[0-9]+", "", rest)
    assert set(leftover) <= set(" >=<(),?:%.+-"), sql


def assert_plain_values(params: Any) -> None:
    values = params.values() if isinstance(params, dict) else params
    for v in values:
        if isinstance(v, str):
            assert _ISO_VALUE.fullmatch(v), v
        else:
            assert isinstance(v, (date, datetime, int, float)) and not isinstance(v, bool), v


def _columns(dialect: str) -> list[Column]:
    if dialect == "sqlite":
        return [Column("created_at", "date"), Column("created_at", "utc", encoding="text-t"),
                Column("created_at", "local"), Column("created_at", "instant", encoding="julian")]
    return [Column("created_at", k) for k in ("date", "local", "utc", "instant")]  # type: ignore[arg-type]


@pytest.mark.parametrize("dialect", DIALECTS)
@pytest.mark.parametrize("question", HOSTILE_QUESTIONS)
def test_hostile_text_in_the_question_never_reaches_a_fragment(question: str, dialect: str) -> None:
    result = normalize(question, CTX)
    assert any(m.kind == "range" for m in result.mentions), question  # not a vacuous check
    for col in _columns(dialect):
        name = quoted_name(col.name, dialect)
        for style in (*PARAMSTYLES, "literal"):
            if style == "literal":
                fragments = predicates(result, col, dialect, style="literal")
            else:
                fragments = predicates(result, col, dialect, paramstyle=style)
            assert fragments
            for f in fragments.values():
                assert_only_nlnorm_s_text(f.where, name)
                assert_plain_values(f.params)
                assert_plain_values(f.json_params())


@pytest.mark.parametrize("dialect", DIALECTS)
@pytest.mark.parametrize("question", HOSTILE_QUESTIONS)
def test_hostile_text_in_the_question_never_reaches_bound_sql(question: str, dialect: str) -> None:
    result = normalize(question, CTX)
    head = "SELECT key FROM issues WHERE "
    for style in PARAMSTYLES:
        sql, params = bind(head + "{t1:created_at}", result, dialect, kind="utc", paramstyle=style)
        assert sql.startswith(head)
        assert_only_nlnorm_s_text(sql[len(head):], "created_at")
        assert_plain_values(params)


ISSUES = [  # key, title, closed_at (UTC, as SQLite's datetime() writes it)
    ("WRN-1187", "Scheduler drops the second maintenance window", "2026-11-23 08:15:00"),
    ("WRN-1190", "Firmware download stalls at 99%", "2026-11-29 22:59:59"),
    ("WRN-1194", "Portal shows the wrong device clock", "2026-11-29 23:00:00"),
    ("WRN-1201", "Update banner overlaps the table header", "2026-11-22 22:59:59"),
]


def _issues() -> sqlite3.Connection:
    con = sqlite3.connect(":memory:")
    con.execute("CREATE TABLE issues (key TEXT PRIMARY KEY, title TEXT, closed_at TEXT)")
    con.execute("CREATE TABLE people (name TEXT)")
    con.executemany("INSERT INTO issues VALUES (?, ?, ?)", ISSUES)
    return con


def _intact(con: sqlite3.Connection) -> None:
    tables = {r[0] for r in con.execute("SELECT name FROM sqlite_master WHERE type = 'table'")}
    assert {"issues", "people"} <= tables
    assert con.execute("SELECT key, title, closed_at FROM issues ORDER BY key").fetchall() == sorted(ISSUES)


@pytest.mark.parametrize("question", [q for q in HOSTILE_QUESTIONS if "last week" in q])
def test_a_hostile_question_s_fragment_run_on_sqlite_leaves_the_table_intact(question: str) -> None:
    # "last week" in Berlin is [2026-11-22 23:00, 2026-11-29 23:00) in UTC.
    result = normalize(question, CTX)
    col = Column("closed_at", "utc")
    con = _issues()
    literal = predicates(result, col, "sqlite", style="literal")["t1"]
    # executescript runs every statement of its text: a pasted "; DROP TABLE" would run too.
    con.executescript(f"CREATE TABLE hits AS SELECT key FROM issues WHERE {literal.where};")
    assert [r[0] for r in con.execute("SELECT key FROM hits ORDER BY key")] == ["WRN-1187", "WRN-1190"]
    _intact(con)
    bound = predicates(result, col, "sqlite")["t1"]
    rows = con.execute(f"SELECT key FROM issues WHERE {bound.where} ORDER BY key", bound.params).fetchall()
    assert rows == [("WRN-1187",), ("WRN-1190",)]
    sql, params = bind("SELECT key FROM issues WHERE {t1} ORDER BY key", result, "sqlite",
                       column=col)
    assert con.execute(sql, params).fetchall() == rows
    _intact(con)
