"""How each SQL dialect writes dates, wall-clock timestamps and instants, quotes names, and
which DB-API paramstyle its usual driver takes.

Dialect names are sqlglot's. Literal spellings were checked with sqlglot's parser (see
``tests/sql/test_sqlglot_parses.py``) and, for SQLite, DuckDB and PostgreSQL, on the engines
themselves (``tests/sql/test_engines.py``).
"""

from __future__ import annotations

import functools
import json
import re
import unicodedata
from dataclasses import dataclass
from importlib import resources
from typing import Any

from .errors import SqlError
from ..errors import suggest

__all__ = ["Dialect", "DIALECTS", "PARAMSTYLES", "dialect", "quoted_name"]

#: PEP 249 paramstyles: how a driver wants its placeholders written.
PARAMSTYLES = ("qmark", "numeric", "named", "format", "pyformat")


@dataclass(frozen=True, slots=True)
class Dialect:
    """One dialect: its literal templates (``{}`` is the quoted ISO text) and its driver."""

    name: str
    paramstyle: str  # the paramstyle of the driver most used with it
    driver: str  # that driver, for the docs
    date: str  # a DATE literal
    naive: str  # a timestamp without time zone (wall clock), e.g. "TIMESTAMP {}"
    instant: str  # an instant, written in UTC with "+00:00"
    #: How a placeholder is wrapped for an instant column ("{}" leaves it bare); the bound
    #: value is then an aware UTC datetime, or a naive UTC one when ``instant_naive_param``.
    instant_param: str = "{}"
    instant_naive_param: bool = False
    instant_sep: str = " "  # between the time and "+00:00" in an instant literal
    instant_offset: bool = True  # an instant literal's text ends with "+00:00"
    naive_t: bool = False  # write naive literals with "T" between date and time
    aware_type: str = ""  # the column type that holds instants, for the docs
    naive_type: str = "TIMESTAMP"


DIALECTS: dict[str, Dialect] = {
    d.name: d
    for d in (
        # SQLite has no date type: bounds follow the column's declared encoding (columns.py).
        Dialect("sqlite", "qmark", "sqlite3 (standard library)", "{}", "{}", "{}",
                aware_type="(unix seconds or julian day)", naive_type="TEXT"),
        Dialect("duckdb", "qmark", "duckdb", "DATE {}", "TIMESTAMP {}", "TIMESTAMPTZ {}",
                instant_sep="", aware_type="TIMESTAMPTZ"),
        Dialect("postgres", "pyformat", "psycopg", "DATE {}", "TIMESTAMP {}", "TIMESTAMPTZ {}",
                instant_sep="", aware_type="timestamptz"),
        # MySQL/MariaDB have no type holding an instant with its zone: TIMESTAMP is stored in
        # UTC and read in the session's zone, so the UTC bound is brought into that zone too.
        Dialect("mysql", "format", "PyMySQL / mysqlclient", "DATE {}", "TIMESTAMP {}",
                "CONVERT_TZ({}, '+00:00', @@session.time_zone)",
                instant_param="CONVERT_TZ({}, '+00:00', @@session.time_zone)",
                instant_naive_param=True, instant_offset=False, aware_type="TIMESTAMP",
                naive_type="DATETIME"),
        # A datetime2 becomes a datetimeoffset at +00:00: naive UTC values are safe to bind.
        Dialect("tsql", "qmark", "pyodbc", "CAST({} AS DATE)", "CAST({} AS DATETIME2)",
                "CAST({} AS DATETIMEOFFSET)", instant_naive_param=True, naive_t=True,
                aware_type="DATETIMEOFFSET", naive_type="DATETIME2"),
        Dialect("bigquery", "pyformat", "google-cloud-bigquery (DB-API)", "DATE {}",
                "DATETIME {}", "TIMESTAMP {}", instant_sep="", aware_type="TIMESTAMP",
                naive_type="DATETIME"),
        Dialect("spark", "named", "pyspark spark.sql(args=...) / databricks-sql-connector",
                "DATE {}", "TIMESTAMP_NTZ {}", "TIMESTAMP {}", instant_sep="",
                aware_type="TIMESTAMP", naive_type="TIMESTAMP_NTZ"),
        Dialect("snowflake", "pyformat", "snowflake-connector-python", "DATE {}",
                "{}::TIMESTAMP_NTZ", "{}::TIMESTAMP_TZ", aware_type="TIMESTAMP_TZ",
                naive_type="TIMESTAMP_NTZ"),
    )
}

#: Other names people use for the same dialects.
_ALIASES = {"postgresql": "postgres", "pg": "postgres", "mariadb": "mysql", "mssql": "tsql",
            "sqlserver": "tsql", "databricks": "spark", "sparksql": "spark"}


def dialect(name: str) -> Dialect:
    """The dialect called ``name`` (sqlglot's names; a few common aliases too)."""
    key = name.strip().lower()
    key = _ALIASES.get(key, key)
    found = DIALECTS.get(key)
    if found is None:
        raise SqlError(f"dialect={name!r} is not one nlnorm writes: use one of "
                       f"{', '.join(DIALECTS)}{suggest(key, DIALECTS)}")
    return found


# A plain name part, as SQL:2016 defines an identifier (5.2 <identifier start> and <identifier
# extend>) but stricter: it starts with a letter or "_" and goes on with letters, combining marks
# (Mn, Mc: the vowel signs of Devanagari, say), decimal digits and "_". No format character
# (Cf: zero-width and direction marks), no other connector, and no letter of the Spacing Modifier
# Letters block (U+02B0-U+02FF), whose members look like quotes and primes (U+02BC, U+02B9).
_ASCII_PART = re.compile(r"[A-Za-z_][A-Za-z0-9_]*")
_MAX_PART = 128
_EXTEND = frozenset({"Lu", "Ll", "Lt", "Lm", "Lo", "Mn", "Mc", "Nd"})


def _plain_part(part: str) -> bool:
    if _ASCII_PART.fullmatch(part):
        return True
    if not part or not (part[0] == "_" or unicodedata.category(part[0])[0] == "L"):
        return False
    return all(c == "_" or (unicodedata.category(c) in _EXTEND and not "\u02b0" <= c <= "\u02ff")
               for c in part)


@functools.lru_cache(maxsize=1024)
def quoted_name(name: str, dialect_name: str) -> str:
    """``name`` (``column`` or ``table.column``) as the dialect writes it: each part checked
    to be a plain identifier, then left bare when it is an ASCII name that is no keyword of
    the dialect (so the database folds its case as it does for the rest of the query), else
    quoted the dialect's way (sqlglot). Anything else is refused, never pasted into SQL.

    >>> quoted_name("issues.created_at", "postgres"), quoted_name("order", "mysql")
    ('issues.created_at', '`order`')
    """
    if not isinstance(name, str) or not name:
        raise SqlError(f"column={name!r}: give the column's name, e.g. 'created_at' or "
                       "'issues.created_at'")
    parts = name.split(".")
    for part in parts:
        if len(part) > _MAX_PART or not _plain_part(part):
            raise SqlError(
                f"column={name!r} is not a plain column name: each dot-separated part must be "
                "letters, digits and '_' (not starting with a digit); quotes, spaces, ';', "
                "'--' and other punctuation are refused so that nothing can be pasted into SQL")
    return ".".join(_quote_part(part, dialect_name) for part in parts)


def _quote_part(part: str, dialect_name: str) -> str:
    from sqlglot import exp

    if _ASCII_PART.fullmatch(part) and not _must_quote(part.upper(), dialect_name):
        return part
    return exp.to_identifier(part, quoted=True).sql(dialect=dialect_name)


@functools.cache
def _reserved_words() -> dict[str, Any]:
    """reserved_words.json, read once: each dialect's list, and where it comes from."""
    text = resources.files(__package__).joinpath("reserved_words.json").read_text("utf-8")
    data: dict[str, Any] = json.loads(text)
    return data


@functools.cache
def _reserved(dialect_name: str) -> frozenset[str]:
    """The words the dialect's engine refuses as a bare column name."""
    data = _reserved_words()
    words = set(data[dialect_name].split())
    if dialect_name not in ("postgres", "snowflake"):  # exact lists; quoting there is case-sensitive
        words |= set(data["sql2016"].split())
    return frozenset(words)


@functools.lru_cache(maxsize=4096)
def _must_quote(word: str, dialect_name: str) -> bool:
    if word in _reserved(dialect_name):
        return True
    from sqlglot.dialects.dialect import Dialect as GlotDialect

    if word not in GlotDialect.get_or_raise(dialect_name).tokenizer_class.KEYWORDS:
        return False
    return not _reads_as_bare_column(word, dialect_name)


def _reads_as_bare_column(word: str, dialect_name: str) -> bool:
    """Whether sqlglot reads ``word`` bare as a column on both sides of a comparison."""
    import sqlglot
    from sqlglot import exp

    try:
        tree = sqlglot.parse_one(f"SELECT 1 FROM t WHERE {word} >= 1 AND {word} < 2",
                                 read=dialect_name)
    except sqlglot.errors.SqlglotError:
        return False
    where = tree.args.get("where")
    if where is None or not isinstance(where.this, exp.And):
        return False
    sides = (where.this.left, where.this.right)
    return all(isinstance(c, (exp.GTE, exp.LT)) and isinstance(c.left, exp.Column)
               and c.left.name.upper() == word and not c.left.table for c in sides)
