"""The rows a fragment selects on a real engine are the rows Python's own interval membership
selects, for every column kind, both styles (bound parameters in the driver's paramstyle, and
literal SQL), and, where the engine has one, whatever the session's time zone.

Engines: SQLite (stdlib sqlite3; encodings text, text-t, unix, julian), DuckDB (DATE,
TIMESTAMP, TIMESTAMPTZ) and a PostgreSQL 15 server (date, timestamp, timestamptz; see
conftest.py for how the server is found or started). The oracle is Python's datetime and
zoneinfo (the IANA tz database shipped as ``tzdata``):

* instant: ``start <= row < end``, aware datetimes compared as instants;
* utc: the row's naive UTC value against the bounds brought to UTC;
* local: the row's naive wall time in the column's zone against the bounds' wall times there;
* date: the row's local date in the question zone, selected when that day overlaps the
  interval, i.e. it lies from the day of ``start`` to the day of the interval's last
  microsecond ``end - 1 µs``.

Rows sit within seconds of every DST transition of 2025-2027 in the zones tried, within a
second of local midnights, half a second and a microsecond off them, and exactly on the bounds
the generated intervals use.
"""

from __future__ import annotations

import random
import sqlite3
from collections.abc import Callable, Iterator, Mapping, Sequence
from dataclasses import dataclass
from datetime import date, datetime, time, timedelta, timezone
from types import SimpleNamespace
from typing import Any, Literal
from zoneinfo import ZoneInfo

import duckdb
import pytest
from hypothesis import HealthCheck, given, settings
from hypothesis import strategies as st

from nlnorm import Context, normalize
from nlnorm.sql import Column, Fragment, predicate

UTC = timezone.utc
US = timedelta(microseconds=1)
#: Question zones: 1-hour DST (both hemispheres), Santiago (its DST starts at midnight, so that
#: day has no 00:00), Lord Howe (a 30-minute DST), a fixed half-hour offset, and UTC.
ZONES = ("Europe/Berlin", "America/New_York", "America/Santiago", "Australia/Lord_Howe",
         "Asia/Kolkata", "UTC")
#: Session zones of DuckDB and PostgreSQL: far from each other and from every question zone
#: (+12/+13 and -8/-7), so a value read through the session zone would select other rows.
SESSION_ZONES = ("Pacific/Auckland", "America/Los_Angeles")
SPAN = (datetime(2025, 1, 1, tzinfo=UTC), datetime(2028, 1, 1, tzinfo=UTC))
#: SQLite text rows are written at each of these precisions (the stored text is the value the
#: oracle compares): SQLite's datetime() form, its strftime('%f') milliseconds, Python's
#: isoformat() microseconds, and minutes as people often write them.
PRECISIONS = ("s", "ms", "us", "min")
STYLES: tuple[Literal["params", "literal"], ...] = ("params", "literal")
EXAMPLES = 50  # hypothesis examples per engine


def slug(zone: str) -> str:
    return zone.lower().replace("/", "_")


# --- the fixed table of row instants ---------------------------------------------------------

def transitions(zone: ZoneInfo, lo: datetime = SPAN[0], hi: datetime = SPAN[1]) -> list[datetime]:
    """The instants in [lo, hi) where ``zone``'s UTC offset changes, to the second (day steps,
    then bisection on whole seconds; zoneinfo is the oracle)."""
    out: list[datetime] = []
    t = lo
    while t < hi:
        nxt = t + timedelta(days=1)
        if t.astimezone(zone).utcoffset() != nxt.astimezone(zone).utcoffset():
            a, b = int(t.timestamp()), int(nxt.timestamp())  # offset(a) != offset(b)
            off_a = datetime.fromtimestamp(a, UTC).astimezone(zone).utcoffset()
            while b - a > 1:
                mid = (a + b) // 2
                if datetime.fromtimestamp(mid, UTC).astimezone(zone).utcoffset() == off_a:
                    a = mid
                else:
                    b = mid
            out.append(datetime.fromtimestamp(b, UTC))
        t = nxt
    return out


def first_instant(day: date, zone: ZoneInfo) -> datetime:
    """The first instant whose local date in ``zone`` is ``day``, found by bisection over
    instants with zoneinfo's UTC-to-local conversion (no wall-to-UTC conversion used)."""
    a = datetime.combine(day, time(0), UTC) - timedelta(days=1)  # local date < day
    b = datetime.combine(day, time(0), UTC) + timedelta(days=1)  # local date >= day
    while b - a > US:
        mid = a + (b - a) // 2
        if mid.astimezone(zone).date() < day:
            a = mid
        else:
            b = mid
    return b


#: Rows at the edges of "last week" asked on 2026-12-02 in Europe/Berlin (2026-11-23 00:00
#: +01:00 to 2026-11-30 00:00 +01:00), for the named example below.
LAST_WEEK_EDGES = {
    "a microsecond before": datetime(2026, 11, 22, 22, 59, 59, 999_999, tzinfo=UTC),
    "first instant": datetime(2026, 11, 22, 23, tzinfo=UTC),
    "midweek": datetime(2026, 11, 26, 12, tzinfo=UTC),
    "last microsecond": datetime(2026, 11, 29, 22, 59, 59, 999_999, tzinfo=UTC),
    "the exclusive end": datetime(2026, 11, 29, 23, tzinfo=UTC),
}


def _row_instants() -> tuple[list[datetime], dict[str, list[datetime]]]:
    """The row instants, and per zone its transitions and the first instants of its days
    around them (the bounds a question in that zone most often has)."""
    found: set[datetime] = set()
    days: set[date] = set()
    anchors: dict[str, set[datetime]] = {name: set() for name in ZONES}
    for name in ZONES:
        zone = ZoneInfo(name)
        for t in transitions(zone):
            anchors[name].add(t)
            for seconds in (-3600, -1800, -61, -1, 0, 1, 59, 1800, 3600):
                found.add(t + timedelta(seconds=seconds))
            found.update((t - US, t + timedelta(microseconds=500), t + timedelta(seconds=0.5)))
            local_day = t.astimezone(zone).date()
            days.update((local_day - timedelta(days=1), local_day, local_day + timedelta(days=1)))
            for day in (local_day - timedelta(days=1), local_day, local_day + timedelta(days=1)):
                midnight = first_instant(day, zone)
                anchors[name].add(midnight)
                found.update(midnight + timedelta(seconds=s) for s in (-1, 0, 1))
                found.update((midnight - US, midnight + timedelta(seconds=0.5)))
    for name in ("Asia/Kolkata", "UTC"):  # no transitions: midnights of some of those days
        zone = ZoneInfo(name)
        for day in sorted(days)[::6]:
            midnight = first_instant(day, zone)
            anchors[name].add(midnight)
            found.update((midnight - timedelta(seconds=1), midnight, midnight - US,
                          midnight + timedelta(seconds=1)))
    found.update(LAST_WEEK_EDGES.values())
    rng = random.Random(20261202)
    width = int((SPAN[1] - SPAN[0]).total_seconds())
    for i in range(80):
        t = SPAN[0] + timedelta(seconds=rng.randrange(width))
        found.add(t + timedelta(microseconds=rng.randrange(1_000_000)) if i % 4 == 0 else t)
    assert all(anchors.values()) and set().union(*anchors.values()) <= found
    return sorted(found), {name: sorted(a) for name, a in anchors.items()}


INSTANTS, ANCHORS = _row_instants()
POSITION = {t: i for i, t in enumerate(INSTANTS)}


# --- what each stored value means, and the oracle -------------------------------------------

def wall(moment: datetime, zone: str) -> datetime:
    """The naive wall time of an aware moment in ``zone`` (zoneinfo)."""
    return moment.astimezone(ZoneInfo(zone)).replace(tzinfo=None)


def truncated(moment: datetime, precision: str) -> datetime:
    if precision == "min":
        return moment.replace(second=0, microsecond=0)
    if precision == "s":
        return moment.replace(microsecond=0)
    if precision == "ms":
        return moment.replace(microsecond=moment.microsecond // 1000 * 1000)
    return moment


def sqlite_text(naive: datetime, precision: str, sep: str) -> str:
    """A naive time as text the way the rows of a SQLite table are commonly written (common
    practice: SQLite's datetime() / strftime('%f'), Python's isoformat(), or minutes only)."""
    out = naive.strftime(f"%Y-%m-%d{sep}%H:%M")
    if precision == "min":
        return out
    out += naive.strftime(":%S")
    if precision == "s":
        return out
    if precision == "ms":
        return out + f".{naive.microsecond // 1000:03d}"
    return out + f".{naive.microsecond:06d}"


@dataclass(frozen=True)
class Case:
    """One interval of a question: its zone, its bounds (``None``: open), and the zone of the
    local column compared (``None``: the question's)."""

    zone: str
    start: datetime | None
    end: datetime | None
    local_zone: str | None = None

    def mention(self) -> SimpleNamespace:
        z = ZoneInfo(self.zone)
        return SimpleNamespace(
            kind="range", text="generated",
            start=None if self.start is None else self.start.astimezone(z).isoformat(),
            end=None if self.end is None else self.end.astimezone(z).isoformat())


def holds(kind: str, value: Any, case: Case) -> bool:
    """Whether a row whose column of ``kind`` means ``value`` lies in the interval (Python's
    own comparisons; for date, the day overlaps the interval)."""
    start, end = case.start, case.end
    if kind == "instant":
        return (start is None or start <= value) and (end is None or value < end)
    if kind == "utc":
        return ((start is None or wall(start, "UTC") <= value)
                and (end is None or value < wall(end, "UTC")))
    if kind == "local":
        # A naive wall clock cannot tell the two 01:30s of a repeated hour apart: the storage
        # holds no offset, so a wall time in the repeated hour is in or out by its wall time
        # alone. That is a property of the column, not of the predicate, and the oracle says
        # the same.
        zone = case.local_zone or case.zone
        return ((start is None or wall(start, zone) <= value)
                and (end is None or value < wall(end, zone)))
    assert kind == "date"
    z = ZoneInfo(case.zone)
    return ((start is None or start.astimezone(z).date() <= value)
            and (end is None or value <= (end - US).astimezone(z).date()))


def expected(kind: str, meanings: Mapping[int, Any], case: Case) -> set[int]:
    return {key for key, value in meanings.items() if holds(kind, value, case)}


# --- engines ----------------------------------------------------------------------------------

class Table:
    """A table loaded on one engine: how to run a WHERE clause on it, the session zones to
    run it under, and what each column's values mean (a plain class: its repr stays short in
    hypothesis' reports)."""

    def __init__(self, dialect: str, run: Callable[[str, Any, str | None], set[int]],
                 session_zones: tuple[str | None, ...],
                 meanings: dict[str, dict[int, Any]]) -> None:
        self.dialect = dialect
        self.run = run
        self.session_zones = session_zones
        self.meanings = meanings

    def __repr__(self) -> str:
        return f"Table({self.dialect!r}, {len(next(iter(self.meanings.values())))} rows)"


def _typed_rows() -> tuple[list[str], list[tuple[Any, ...]], dict[str, dict[int, Any]]]:
    """Columns and rows of the DuckDB / PostgreSQL table: the instant, its naive UTC value, and
    per zone its wall time and local date."""
    names = ["id", "inst", "utc"]
    for zone in ZONES:
        names += [f"local_{slug(zone)}", f"date_{slug(zone)}"]
    rows: list[tuple[Any, ...]] = []
    meanings: dict[str, dict[int, Any]] = {n: {} for n in names[1:]}
    for key, t in enumerate(INSTANTS):
        values: list[Any] = [key, t, wall(t, "UTC")]
        for zone in ZONES:
            values += [wall(t, zone), t.astimezone(ZoneInfo(zone)).date()]
        rows.append(tuple(values))
        for n, v in zip(names[1:], values[1:]):
            meanings[n][key] = v
    return names, rows, meanings


def _typed_ddl(name: str, aware: str, naive: str) -> str:
    cols = ["id INTEGER PRIMARY KEY", f"inst {aware}", f"utc {naive}"]
    for zone in ZONES:
        cols += [f"local_{slug(zone)} {naive}", f"date_{slug(zone)} DATE"]
    return f"CREATE TEMP TABLE {name} ({', '.join(cols)})"


@pytest.fixture(scope="module")
def sqlite_table() -> Iterator[Table]:
    conn = sqlite3.connect(":memory:")
    cols = ["id INTEGER PRIMARY KEY", "inst_unix", "inst_julian REAL", "utc_text TEXT",
            "utc_textt TEXT"]
    for zone in ZONES:
        cols += [f"local_text_{slug(zone)} TEXT", f"local_textt_{slug(zone)} TEXT",
                 f"date_{slug(zone)} TEXT"]
    conn.execute(f"CREATE TABLE rows ({', '.join(cols)})")
    meanings: dict[str, dict[int, Any]] = {}

    def mean(column: str, key: int, value: Any) -> None:
        meanings.setdefault(column, {})[key] = value

    rows = []
    for i, t in enumerate(INSTANTS):
        for p, precision in enumerate(PRECISIONS):
            key = i * len(PRECISIONS) + p
            m = truncated(t, precision)
            whole = m.microsecond == 0
            unix: int | float = int(m.timestamp()) if whole else m.timestamp()
            ms = truncated(m, "ms")  # SQLite's julian days hold whole milliseconds
            values: list[Any] = [key, unix, sqlite_text(wall(ms, "UTC"), "ms", " "),
                                 sqlite_text(wall(m, "UTC"), precision, " "),
                                 sqlite_text(wall(m, "UTC"), precision, "T")]
            mean("inst_unix", key, m)
            mean("inst_julian", key, ms)
            mean("utc_text", key, wall(m, "UTC"))
            mean("utc_textt", key, wall(m, "UTC"))
            for zone in ZONES:
                values += [sqlite_text(wall(m, zone), precision, " "),
                           sqlite_text(wall(m, zone), precision, "T"),
                           m.astimezone(ZoneInfo(zone)).date().isoformat()]
                mean(f"local_text_{slug(zone)}", key, wall(m, zone))
                mean(f"local_textt_{slug(zone)}", key, wall(m, zone))
                mean(f"date_{slug(zone)}", key, m.astimezone(ZoneInfo(zone)).date())
            rows.append(tuple(values))
    marks = ", ".join(["?", "?", "julianday(?)"] + ["?"] * (len(cols) - 3))
    conn.executemany(f"INSERT INTO rows VALUES ({marks})", rows)

    def run(where: str, params: Any, session_zone: str | None) -> set[int]:
        return {r[0] for r in conn.execute(f"SELECT id FROM rows WHERE {where}", params)}

    yield Table("sqlite", run, (None,), meanings)
    conn.close()


@pytest.fixture(scope="module")
def duckdb_table() -> Iterator[Table]:
    conn = duckdb.connect()
    conn.execute("SET TimeZone = 'UTC'")
    names, rows, meanings = _typed_rows()
    conn.execute(_typed_ddl("rows", "TIMESTAMPTZ", "TIMESTAMP"))
    conn.executemany(f"INSERT INTO rows VALUES ({', '.join('?' * len(names))})", rows)

    def run(where: str, params: Any, session_zone: str | None) -> set[int]:
        conn.execute(f"SET TimeZone = '{session_zone}'")
        return {r[0] for r in conn.execute(f"SELECT id FROM rows WHERE {where}",
                                           list(params)).fetchall()}

    yield Table("duckdb", run, SESSION_ZONES, meanings)
    conn.close()


@pytest.fixture(scope="module")
def postgres_table(pg_dsn: str) -> Iterator[Table]:
    import psycopg

    conn = psycopg.connect(pg_dsn, autocommit=True)
    conn.execute("SET TimeZone = 'UTC'")
    names, rows, meanings = _typed_rows()
    conn.execute(_typed_ddl("rows", "timestamptz", "timestamp"))
    with conn.cursor() as cur:
        cur.executemany(f"INSERT INTO rows VALUES ({', '.join(['%s'] * len(names))})", rows)

    def run(where: str, params: Any, session_zone: str | None) -> set[int]:
        conn.execute(f"SET TimeZone = '{session_zone}'")
        with conn.cursor() as cur:
            cur.execute(f"SELECT id FROM rows WHERE {where}", params or None)
            return {r[0] for r in cur.fetchall()}

    yield Table("postgres", run, SESSION_ZONES, meanings)
    conn.close()


def columns_for(dialect: str, case: Case) -> list[Column]:
    """The columns of the engine's table a case is checked on."""
    lz = case.local_zone or case.zone
    if dialect == "sqlite":
        return [Column("inst_unix", "instant", encoding="unix"),
                Column("inst_julian", "instant", encoding="julian"),
                Column("utc_text", "utc", encoding="text"),
                Column("utc_textt", "utc", encoding="text-t"),
                Column(f"local_text_{slug(lz)}", "local", zone=case.local_zone, encoding="text"),
                Column(f"local_textt_{slug(lz)}", "local", zone=case.local_zone,
                       encoding="text-t"),
                Column(f"date_{slug(case.zone)}", "date")]
    return [Column("inst", "instant"), Column("utc", "utc"),
            Column(f"local_{slug(lz)}", "local", zone=case.local_zone),
            Column(f"date_{slug(case.zone)}", "date")]


def check(table: Table, case: Case) -> None:
    """Every column, style and session zone selects the oracle's rows."""
    mention = case.mention()
    for column in columns_for(table.dialect, case):
        meanings = table.meanings[column.name]
        want = expected(column.kind, meanings, case)
        for style in STYLES:
            frag = predicate(mention, column, table.dialect, tz=case.zone, style=style)
            assert frag is not None
            for session_zone in table.session_zones:
                got = table.run(frag.where, frag.params, session_zone)
                if got != want:
                    raise AssertionError(_explain(table.dialect, column, frag, session_zone,
                                                  case, got, want, meanings))


def _explain(dialect: str, column: Column, frag: Fragment, session_zone: str | None, case: Case,
             got: set[int], want: set[int], meanings: Mapping[int, Any]) -> str:
    def show(keys: set[int]) -> list[str]:
        return [str(meanings[k]) for k in sorted(keys)[:6]]

    return (f"{dialect} {column} session zone {session_zone}: {case}\n"
            f"  WHERE {frag.where}  params {frag.params!r}\n"
            f"  selected but outside: {show(got - want)}\n"
            f"  inside but not selected: {show(want - got)}")


# --- generated intervals ----------------------------------------------------------------------

_NEAR = [0, 0, 0, 1, -1, 60, -60, 1800, -1800, 3600, -3600, 86_400, -86_400]
_MICROS = [0, 0, 0, 0, 0, 500, 500_000, 999_999]
_LENGTHS = [timedelta(seconds=1), timedelta(minutes=30), timedelta(hours=1), timedelta(hours=23),
            timedelta(days=1), timedelta(hours=25), timedelta(days=7), timedelta(days=31)]


def endpoints(zone: str) -> st.SearchStrategy[datetime]:
    """The zone's transitions and day starts, instants of the row table (so bounds fall
    exactly on rows), instants near them (a second, half an hour, an hour, a day off;
    sometimes a fraction of a second), and instants anywhere in the span."""
    width = int((SPAN[1] - SPAN[0]).total_seconds())
    near = st.builds(lambda t, s, u: t + timedelta(seconds=s, microseconds=u),
                     st.sampled_from(INSTANTS), st.sampled_from(_NEAR), st.sampled_from(_MICROS))
    anywhere = st.integers(0, width).map(lambda s: SPAN[0] + timedelta(seconds=s))
    return st.one_of(st.sampled_from(ANCHORS[zone]), st.sampled_from(INSTANTS), near, anywhere)


@st.composite
def cases(draw: st.DrawFn) -> Case:
    zone = draw(st.sampled_from(ZONES))
    start = draw(endpoints(zone))
    if draw(st.booleans()):
        end = draw(endpoints(zone))
    else:
        end = start + draw(st.sampled_from(_LENGTHS))
    if end == start:
        end = start + timedelta(seconds=1)
    start, end = min(start, end), max(start, end)
    opened = draw(st.sampled_from(["neither"] * 6 + ["start", "end"]))
    local_zone = draw(st.sampled_from([None, None, None, *ZONES]))
    return Case(zone, None if opened == "start" else start, None if opened == "end" else end,
                local_zone)


GENERATED = settings(max_examples=EXAMPLES, deadline=None, derandomize=True, database=None,
                     suppress_health_check=[HealthCheck.too_slow])


@GENERATED
@given(case=cases())
def test_sqlite_selects_the_rows_python_selects(sqlite_table: Table, case: Case) -> None:
    """Checked against: SQLite (stdlib sqlite3: text, text-t, unix, julian columns; the julian
    rows written by SQLite's own julianday()); oracle: Python datetime/zoneinfo membership."""
    check(sqlite_table, case)


@GENERATED
@given(case=cases())
def test_duckdb_selects_the_rows_python_selects(duckdb_table: Table, case: Case) -> None:
    """Checked against: DuckDB (DATE, TIMESTAMP, TIMESTAMPTZ; session TimeZone
    Pacific/Auckland and America/Los_Angeles); oracle: Python datetime/zoneinfo membership."""
    check(duckdb_table, case)


@GENERATED
@given(case=cases())
def test_postgres_selects_the_rows_python_selects(postgres_table: Table, case: Case) -> None:
    """Checked against: PostgreSQL 15 server (real engine: date, timestamp, timestamptz;
    session TimeZone Pacific/Auckland and America/Los_Angeles); oracle: Python
    datetime/zoneinfo membership."""
    check(postgres_table, case)


# --- named examples ---------------------------------------------------------------------------

ENGINES = ("sqlite_table", "duckdb_table", "postgres_table")


def selected(table: Table, mention: Any, column: Column, tz: str) -> set[frozenset[int]]:
    """The row keys selected in each style and session zone (one set when they all agree)."""
    found: set[frozenset[int]] = set()
    for style in STYLES:
        frag = predicate(mention, column, table.dialect, tz=tz, style=style)
        assert frag is not None
        for session_zone in table.session_zones:
            found.add(frozenset(table.run(frag.where, frag.params, session_zone)))
    return found


def instant_column(table: Table) -> Column:
    return Column("inst_unix", "instant", encoding="unix") if table.dialect == "sqlite" \
        else Column("inst", "instant")


def date_column(zone: str) -> Column:
    return Column(f"date_{slug(zone)}", "date")


def local_column(table: Table, zone: str) -> Column:
    return Column(f"local_text_{slug(zone)}" if table.dialect == "sqlite"
                  else f"local_{slug(zone)}", "local")


def key_of(table: Table, moment: datetime) -> int:
    """The key of the row at ``moment`` (on SQLite its microsecond-precision copy)."""
    i = POSITION[moment]
    return i * len(PRECISIONS) + PRECISIONS.index("us") if table.dialect == "sqlite" else i


def keys_between(table: Table, lo: datetime, hi: datetime) -> set[int]:
    """Keys of the rows (microsecond copies on SQLite) whose instant is in [lo, hi) —
    Python's comparison."""
    return {key_of(table, t) for t in INSTANTS if lo <= t < hi}


def on_day(table: Table, zone: str, day: date) -> set[int]:
    """Keys of the rows (microsecond copies on SQLite) whose local date in ``zone`` is ``day``."""
    z = ZoneInfo(zone)
    return keys_between(table, first_instant(day, z),
                        first_instant(day + timedelta(days=1), z))


def restricted(keys: set[frozenset[int]], table: Table) -> set[frozenset[int]]:
    """On SQLite, only the microsecond copies of the rows (the other precisions are checked by
    the generated tests)."""
    if table.dialect != "sqlite":
        return keys
    us = PRECISIONS.index("us")
    return {frozenset(k for k in ks if k % len(PRECISIONS) == us) for ks in keys}


@pytest.mark.parametrize("engine", ENGINES)
def test_last_week_in_berlin_on_an_instant_column(engine: str,
                                                  request: pytest.FixtureRequest) -> None:
    """"last week" asked on Wednesday 2 December 2026 in Europe/Berlin is Monday 23 November
    00:00 +01:00 to Monday 30 November 00:00 +01:00: on an instant column (timestamptz,
    TIMESTAMPTZ, SQLite unix seconds) it selects exactly the rows at its first instant,
    midweek and its last microsecond; not the one a microsecond before it, nor the one at its
    exclusive end; in both styles and under Pacific/Auckland and America/Los_Angeles alike.

    Checked against: PostgreSQL 15 server (real engine), DuckDB, SQLite (stdlib sqlite3);
    oracle: the interval's definition, compared by Python as aware instants."""
    table: Table = request.getfixturevalue(engine)
    ctx = Context.at("2026-12-02T10:00", tz="Europe/Berlin")
    mention = normalize("bugs created last week", ctx).mentions[0]
    assert (mention.start, mention.end) == ("2026-11-23T00:00:00+01:00",
                                            "2026-11-30T00:00:00+01:00")
    column = instant_column(table)
    labels = {key_of(table, t): label for label, t in LAST_WEEK_EDGES.items()}
    found = restricted(selected(table, mention, column, "Europe/Berlin"), table)
    assert len(found) == 1  # every style and session zone selects the same rows
    assert {labels[k] for k in next(iter(found)) if k in labels} == {
        "first instant", "midweek", "last microsecond"}
    lo = datetime(2026, 11, 22, 23, tzinfo=UTC)
    hi = datetime(2026, 11, 29, 23, tzinfo=UTC)
    assert found == {frozenset(keys_between(table, lo, hi))}


def _day_case(question: str, tz: str, now: str) -> Any:
    return normalize(question, Context.at(now, tz=tz)).mentions[0]


def assert_every_kind_selects(table: Table, mention: Any, zone: str, want: set[int]) -> None:
    """The instant, local and date columns of ``table`` all select exactly ``want``."""
    for column in (instant_column(table), local_column(table, zone), date_column(zone)):
        assert restricted(selected(table, mention, column, zone), table) \
            == {frozenset(want)}, (mention.text, column)


@pytest.mark.parametrize("engine", ENGINES)
def test_a_spring_forward_day_has_23_hours(engine: str, request: pytest.FixtureRequest) -> None:
    """29 March 2026 in Europe/Berlin (02:00 becomes 03:00) lasts 23 hours: the day runs from
    2026-03-28 23:00Z to 2026-03-29 22:00Z, and the instant, local and date columns all select
    the rows of that day and no other.

    Checked against: PostgreSQL 15 server (real engine), DuckDB, SQLite (stdlib sqlite3);
    oracle: zoneinfo (IANA tz database) local dates of the rows."""
    table: Table = request.getfixturevalue(engine)
    mention = _day_case("issues created on 29 March 2026", "Europe/Berlin", "2026-12-02T10:00")
    start, end = datetime.fromisoformat(mention.start), datetime.fromisoformat(mention.end)
    assert end - start == timedelta(hours=23)
    want = on_day(table, "Europe/Berlin", date(2026, 3, 29))
    assert len(want) > 10  # rows around the 02:00 transition and both midnights
    assert_every_kind_selects(table, mention, "Europe/Berlin", want)


@pytest.mark.parametrize("engine", ENGINES)
def test_a_fall_back_day_has_25_hours(engine: str, request: pytest.FixtureRequest) -> None:
    """25 October 2026 in Europe/Berlin (03:00 goes back to 02:00) lasts 25 hours; the rows
    of the repeated hour are selected on every column kind (on the local column both 02:30s
    are inside by their wall time, which is all a naive column holds).

    Checked against: PostgreSQL 15 server (real engine), DuckDB, SQLite (stdlib sqlite3);
    oracle: zoneinfo (IANA tz database) local dates of the rows."""
    table: Table = request.getfixturevalue(engine)
    mention = _day_case("issues created on 25 October 2026", "Europe/Berlin", "2026-12-02T10:00")
    start, end = datetime.fromisoformat(mention.start), datetime.fromisoformat(mention.end)
    assert end - start == timedelta(hours=25)
    want = on_day(table, "Europe/Berlin", date(2026, 10, 25))
    repeated = datetime(2026, 10, 25, 1, 0, tzinfo=UTC)  # 03:00 CEST becomes 02:00 CET
    assert keys_between(table, repeated - timedelta(hours=1),
                        repeated + timedelta(hours=1)) <= want
    assert_every_kind_selects(table, mention, "Europe/Berlin", want)


@pytest.mark.parametrize("engine", ENGINES)
def test_santiago_day_without_a_midnight(engine: str, request: pytest.FixtureRequest) -> None:
    """In America/Santiago, 6 September 2026 has no 00:00 (at midnight the clocks go to
    01:00): the day starts at 01:00 -03:00 (04:00Z). The day, the day before (which ends at
    that instant) and each column kind select exactly the rows of their local dates.

    Checked against: PostgreSQL 15 server (real engine), DuckDB, SQLite (stdlib sqlite3);
    oracle: zoneinfo (IANA tz database) local dates of the rows."""
    table: Table = request.getfixturevalue(engine)
    zone = "America/Santiago"
    day = _day_case("issues created on 6 September 2026", zone, "2026-12-02T10:00")
    assert day.start == "2026-09-06T01:00:00-03:00"
    assert first_instant(date(2026, 9, 6), ZoneInfo(zone)) == datetime(2026, 9, 6, 4, tzinfo=UTC)
    before = SimpleNamespace(kind="range", text="5 September 2026",
                             start="2026-09-05T00:00:00-04:00", end=day.start)
    for mention, which in ((day, date(2026, 9, 6)), (before, date(2026, 9, 5))):
        want = on_day(table, zone, which)
        assert len(want) > 5
        assert_every_kind_selects(table, mention, zone, want)


# --- SQLite bounds with a fraction of a second ------------------------------------------------

def _sqlite_rows(texts: Sequence[str]) -> sqlite3.Connection:
    """A table of UTC rows written by SQLite itself: the text at millisecond precision as
    strftime('%Y-%m-%d %H:%M:%f') writes it, and the julian day as julianday() gives it."""
    conn = sqlite3.connect(":memory:")
    conn.execute("CREATE TABLE t (label TEXT, at_text TEXT, at_julian REAL)")
    for text in texts:
        conn.execute("INSERT INTO t VALUES (?, strftime('%Y-%m-%d %H:%M:%f', ?), julianday(?))",
                     (text, text, text))
    return conn


def _sqlite_select(conn: sqlite3.Connection, mention: Any, column: Column) -> list[set[str]]:
    out = []
    for style in STYLES:
        frag = predicate(mention, column, "sqlite", tz="UTC", style=style)
        assert frag is not None
        out.append({r[0] for r in conn.execute(f"SELECT label FROM t WHERE {frag.where}",
                                               frag.params)})
    return out


def test_sqlite_julian_bound_inside_a_millisecond() -> None:
    """A julian-day column holds whole milliseconds (SQLite's julianday()), so a bound at
    10:00:00.0005 must leave out the row at 10:00:00.000 (before it) and take the row at
    10:00:00.001; the end bound 10:00:00.0015 takes .001 and leaves out .002.

    Checked against: SQLite (stdlib sqlite3, julianday()); oracle: Python datetime order."""
    conn = _sqlite_rows(["2026-03-01 10:00:00.000", "2026-03-01 10:00:00.001",
                         "2026-03-01 10:00:00.002"])
    mention = SimpleNamespace(kind="range", text="x", start="2026-03-01T10:00:00.000500+00:00",
                              end="2026-03-01T10:00:00.001500+00:00")
    column = Column("at_julian", "instant", encoding="julian")
    assert _sqlite_select(conn, mention, column) == [{"2026-03-01 10:00:00.001"}] * 2


def test_sqlite_text_bound_with_a_fraction_against_millisecond_rows() -> None:
    """A text row '10:00:00.500' (SQLite's strftime('%f')) is the instant of a bound at
    10:00:00.5: it is inside an interval starting there and outside one ending there.

    Checked against: SQLite (stdlib sqlite3, text comparison of strftime() output); oracle:
    Python datetime order."""
    conn = _sqlite_rows(["2026-03-01 10:00:00.499", "2026-03-01 10:00:00.500",
                         "2026-03-01 10:00:00.501"])
    column = Column("at_text", "utc", encoding="text")
    from_half = SimpleNamespace(kind="range", text="x", start="2026-03-01T10:00:00.500000+00:00",
                                end=None)
    until_half = SimpleNamespace(kind="range", text="x", start=None,
                                 end="2026-03-01T10:00:00.500000+00:00")
    assert _sqlite_select(conn, from_half, column) == [
        {"2026-03-01 10:00:00.500", "2026-03-01 10:00:00.501"}] * 2
    assert _sqlite_select(conn, until_half, column) == [{"2026-03-01 10:00:00.499"}] * 2
