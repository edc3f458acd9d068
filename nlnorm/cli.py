"""The command line: ``nlnorm normalize``, ``nlnorm batch``, ``nlnorm demo``, ``nlnorm bench``,
``nlnorm schema``.

This is the only module that reads the system clock, and only when ``--now`` is not given.
Heavy imports (pydantic, babel, the scanner) happen after the arguments are parsed, so
``--help`` and argument errors are instant.
"""

from __future__ import annotations

import argparse
import json
import sys
import time
from pathlib import Path
from typing import IO, Any, Literal, Sequence

__all__ = ["main"]

DEMO_NOW = "2026-12-02T10:00:00"
DEMO_TZ = "Europe/Lisbon"
DEMO_SPRINTS = "examples/demo/sprints.csv"
DEMO_TEAM = "Wrenfold"
DEMO_FISCAL_START = "02"


def _context_options(p: argparse.ArgumentParser, demo: bool = False) -> None:
    g = p.add_argument_group("reference context")
    g.add_argument("--now", help="reference time, ISO 8601 (default: the current time; "
                   f"for demo {DEMO_NOW})" if demo else "reference time, ISO 8601; a naive time is "
                   "read in --tz (default: the current time)")
    g.add_argument("--tz", help="IANA time zone, e.g. Europe/Berlin (default: UTC, or the offset "
                   "zone of --now)")
    g.add_argument("--week-start", choices=("monday", "sunday", "saturday"),
                   help="first day of the week (default: from the locale's CLDR week data)")
    g.add_argument("--locale", help="CLDR locale, e.g. en_US or en_GB (default: en)")
    g.add_argument("--lang", help="comma-separated languages to look for: deep ones, 'all', or any CLDR "
                   "locale such as sw or es_MX (default: all deep languages)")
    g.add_argument("--bias", choices=("past", "future"),
                   help="which occurrence a date without year means (default: past)")
    g.add_argument("--window-reading", choices=("rolling", "calendar"),
                   help="'the past 2 weeks' as a window ending now or whole weeks (default: rolling)")
    g.add_argument("--weekday-reading", choices=("nearest", "week"),
                   help="'last Monday' as the nearest one or Monday of last week "
                   "(default: the language's usage)")
    g.add_argument("--date-order", choices=("MDY", "DMY", "YMD"),
                   help="order of numeric dates (default: the locale's CLDR short date format)")
    c = p.add_argument_group("team calendars")
    c.add_argument("--sprints", metavar="FILE",
                   help="sprint table: CSV with a header, or JSON (a list of objects); fields name, "
                   "optional number, start, end (ISO dates; end is the last day), optional team"
                   + (f" (default: {DEMO_SPRINTS})" if demo else ""))
    c.add_argument("--sprint-end", choices=("inclusive", "exclusive"), default="inclusive",
                   help="whether 'end' in the sprint table is the last day (default) or the day after")
    c.add_argument("--team", metavar="NAME", help="the team whose sprints 'this sprint' means"
                   + (f" (default: {DEMO_TEAM})" if demo else " (default: one reading per team)"))
    c.add_argument("--fiscal-start", metavar="MM[-DD]",
                   help="first month (and day) of the fiscal year, e.g. 04 or 04-06"
                   + (f" (default: {DEMO_FISCAL_START})" if demo else " (default: the calendar year)"))
    c.add_argument("--fiscal-name", choices=("start", "end"),
                   help="name a fiscal year by the year it starts or ends in (default: end; FY27 "
                   "runs 2026-04-01 to 2027-03-31 with --fiscal-start 04)")
    c.add_argument("--holidays", metavar="CC[-SUBDIVISION]",
                   help="public holidays for business days, e.g. US, DE-BY (the holidays package); "
                   "the weekend comes from the locale's CLDR data")


def _sql_options(p: argparse.ArgumentParser) -> None:
    g = p.add_argument_group("SQL predicates (docs/sql.md)")
    g.add_argument("--sql-column", metavar="NAME",
                   help="give every period mention a field 'sql': its predicate over this column "
                   "(e.g. created_at or issues.created_at)")
    g.add_argument("--dialect", metavar="D",
                   help="SQL dialect, sqlglot's name: sqlite, duckdb, postgres, mysql, tsql, "
                   "bigquery, spark, snowflake (needed with --sql-column)")
    g.add_argument("--paramstyle", choices=("qmark", "numeric", "named", "format", "pyformat"),
                   help="placeholders as the DB-API driver wants them (default: the dialect's "
                   "usual driver's)")
    g.add_argument("--column-kind", choices=("date", "local", "utc", "instant"), default="instant",
                   help="how the column stores time: a date; a wall-clock timestamp in --column-zone; "
                   "a timestamp holding UTC; an aware instant such as timestamptz (default)")
    g.add_argument("--column-zone", metavar="ZONE",
                   help="the zone of a 'local' column's wall clock (default: --tz)")
    g.add_argument("--sqlite-encoding", choices=("text", "text-t", "unix", "julian"),
                   help="how a SQLite column writes time (default: text, unix for instants)")
    g.add_argument("--sprint-key", metavar="COLUMN",
                   help="select a sprint mention's rows by this key column (IN the sprints' ids "
                   "from --sprints) instead of by dates")
    g.add_argument("--literal", action="store_true",
                   help="write the values into 'where' (typed literals) instead of placeholders")


def _sql_adder(args: argparse.Namespace, ctx: Any) -> Any:
    """A function adding the ``sql`` field to a result's period mentions, or ``None`` when no
    SQL was asked for."""
    from .errors import InputError

    given = [f for f in ("dialect", "paramstyle", "column_zone", "sqlite_encoding", "sprint_key")
             if getattr(args, f, None) is not None] + (["literal"] if getattr(args, "literal", False) else [])
    if args.sql_column is None:
        if given:
            flags = ", ".join("--" + f.replace("_", "-") for f in given)
            raise InputError(f"{flags}: used only with --sql-column NAME (the column to write "
                             "predicates over)")
        return None
    from .schema import SqlPredicate
    from .sql import Column, dialect, predicate, quoted_name

    if args.dialect is None:
        raise InputError("--sql-column needs --dialect: one of sqlite, duckdb, postgres, mysql, "
                         "tsql, bigquery, spark, snowflake")
    d = dialect(args.dialect)
    if args.sqlite_encoding is not None and d.name != "sqlite":
        raise InputError(f"--sqlite-encoding is for --dialect sqlite, not {d.name}")
    if args.sprint_key is not None and ctx.sprints is None:
        raise InputError("--sprint-key needs --sprints FILE (the table holding the sprints' ids)")
    column = Column(args.sql_column, args.column_kind, zone=args.column_zone,
                    encoding=args.sqlite_encoding)
    quoted_name(column.name, d.name)  # checked now: a bad name is one error, not one per line
    style: Literal["params", "literal"] = "literal" if args.literal else "params"

    def add(result: Any) -> Any:
        if result.error or not result.mentions:
            return result
        changed = []
        for number, m in enumerate(result.mentions, start=1):
            frag = predicate(m, column, d.name, tz=result.reference.tz, slot=f"t{number}",
                             style=style, paramstyle=args.paramstyle, sprint_key=args.sprint_key,
                             sprints=ctx.sprints, team=ctx.team)
            if frag is not None:
                m = m.model_copy(update={"sql": SqlPredicate(**frag.as_json())})
            changed.append(m)
        return result.model_copy(update={"mentions": tuple(changed)})

    return add


class _Parser(argparse.ArgumentParser):
    """argparse with one-line errors: ``nlnorm: error: <what was wrong>; see <prog> --help``."""

    def error(self, message: str) -> Any:
        self.exit(2, f"nlnorm: error: {message}; see '{self.prog} --help'\n")


def _parser() -> argparse.ArgumentParser:
    p = _Parser(
        prog="nlnorm",
        description="Rewrite the time phrases of work-tracker questions into explicit intervals.",
    )
    sub = p.add_subparsers(dest="command", required=True, metavar="COMMAND")
    n = sub.add_parser("normalize", help="normalize one question and print its JSON")
    n.add_argument("text", help="the question")
    n.add_argument("--indent", type=int, default=2, help="JSON indent (0: one line)")
    _context_options(n)
    _sql_options(n)
    b = sub.add_parser("batch", help="normalize a JSONL file: one output line per input line")
    b.add_argument("input", nargs="?", default="-", help="input JSONL (default: stdin)")
    b.add_argument("-o", "--output", default="-", help="output JSONL (default: stdout)")
    b.add_argument("--progress", action=argparse.BooleanOptionalAction, default=None,
                   help="show a progress bar (default: when stderr is a terminal)")
    _context_options(b)
    _sql_options(b)
    d = sub.add_parser("demo", help="normalize the bundled question log of the demo team and show it")
    d.add_argument("input", nargs="?", help="a JSONL log (default: examples/demo/questions.jsonl)")
    d.add_argument("--json", action="store_true", help="print JSONL instead of a table")
    _context_options(d, demo=True)
    be = sub.add_parser("bench", help="measure speed and memory on an invented question log")
    be.add_argument("-n", type=int, default=10_000, help="questions in the log (default 10000)")
    be.add_argument("--compare", action=argparse.BooleanOptionalAction, default=True,
                    help="also time dateparser's search_dates on the same questions")
    be.add_argument("--compare-sample", type=int, default=2_000,
                    help="English questions given to search_dates (default 2000; it is slow)")
    be.add_argument("--mixed", action=argparse.BooleanOptionalAction, default=True,
                    help="also run the mixed log in every deep language")
    be.add_argument("--mixed-sample", type=int, default=1000,
                    help="mixed questions given to search_dates with every language (default 1000)")
    be.add_argument("--rounds", type=int, default=3,
                    help="rounds of the side-by-side comparison, alternating the two on the same "
                         "questions (default 3)")
    sub.add_parser("schema", help="print the JSON Schema of the output")
    return p


def _context(args: argparse.Namespace, default_now: str | None = None) -> Any:
    from .context import Context

    for flag in ("now", "tz", "locale", "lang"):
        value = getattr(args, flag, None)
        if value is not None and not value.strip():
            from .errors import ContextError

            raise ContextError(f"--{flag} was given an empty value")
    now: Any = args.now or default_now
    tz = args.tz
    if now is None:
        from datetime import datetime

        from .context import zone

        now = datetime.now(zone(tz or "UTC"))  # the one place nlnorm reads the clock
    fields: dict[str, Any] = {"now": now}
    if tz:
        fields["tz"] = tz
    if default_now and not args.now and not tz:
        fields["tz"] = DEMO_TZ
    for name in ("week_start", "locale", "bias", "window_reading", "weekday_reading", "date_order"):
        value = getattr(args, name, None)
        if value:
            fields[name] = value
    if args.lang:
        fields["languages"] = args.lang
    demo = default_now is not None
    sprints = getattr(args, "sprints", None) or (_demo_file(DEMO_SPRINTS) if demo else None)
    if sprints:
        from .calendars.sprints import SprintCalendar

        fields["sprints"] = SprintCalendar.load(sprints, end=getattr(args, "sprint_end", "inclusive"))
    if getattr(args, "team", None) and not sprints:
        from .errors import ContextError

        raise ContextError("--team needs --sprints FILE (the sprint table the team's sprints are in)")
    team = getattr(args, "team", None) or (DEMO_TEAM if demo and not getattr(args, "sprints", None) else None)
    if team:
        fields["team"] = team
    start = getattr(args, "fiscal_start", None) or (DEMO_FISCAL_START if demo else None)
    if start:
        fields["fiscal_start"] = start
    if getattr(args, "fiscal_name", None):
        if not start:
            from .errors import ContextError

            raise ContextError("--fiscal-name needs --fiscal-start (e.g. --fiscal-start 04)")
        fields["fiscal_name"] = args.fiscal_name
    if getattr(args, "holidays", None):
        fields["holidays"] = args.holidays
    return Context.model_validate(fields)


def _demo_file(relative: str) -> str:
    """A demo file: from the working directory (a checkout), else next to the package."""
    from pathlib import Path

    here = Path(relative)
    if here.is_file():
        return str(here)
    return str(Path(__file__).resolve().parent.parent / relative)


def _fail(message: str) -> int:
    print(f"nlnorm: error: {message}", file=sys.stderr)
    return 2


def main(argv: Sequence[str] | None = None) -> int:
    args = _parser().parse_args(argv)
    from .errors import NlnormError

    try:
        if args.command == "normalize":
            return _normalize(args)
        if args.command == "batch":
            return _batch(args)
        if args.command == "demo":
            return _demo(args)
        if args.command == "bench":
            from .bench import run

            return run(n=args.n, compare=args.compare, compare_sample=args.compare_sample,
                       mixed=args.mixed, mixed_sample=args.mixed_sample, rounds=args.rounds)
        if args.command == "schema":
            from .schema import Result

            _utf8(sys.stdout)
            print(json.dumps(Result.model_json_schema(), indent=2, ensure_ascii=False))
            return 0
    except NlnormError as exc:
        return _fail(str(exc))
    except BrokenPipeError:
        return 0
    except OSError as exc:
        return _fail(f"{exc.filename or ''}: {exc.strerror or exc}")
    return 2


def _utf8(stream: Any) -> None:
    """Make a standard stream read or write UTF-8 (the encoding of JSON and JSON Lines),
    whatever the platform's locale. On input, lines end at "\\n" only (a stray "\\r" stays in
    its line), and undecodable bytes are kept as surrogate escapes so that the line holding
    them can be reported instead of ending the run."""
    reconfigure = getattr(stream, "reconfigure", None)
    if reconfigure is None:  # not a real stream (a test's StringIO)
        return
    if stream is sys.stdin:
        reconfigure(encoding="utf-8", errors="surrogateescape", newline="\n")
    elif (stream.encoding or "").lower().replace("-", "") != "utf8":
        reconfigure(encoding="utf-8")


def _is_text(value: str) -> bool:
    """Whether ``value`` is valid Unicode text (no lone surrogates, e.g. from bad UTF-8 bytes)."""
    try:
        value.encode("utf-8")
    except UnicodeEncodeError:
        return False
    return True


def _normalize(args: argparse.Namespace) -> int:
    from .errors import InputError
    from .pipeline import normalize

    if not _is_text(args.text):
        raise InputError("the question is not valid UTF-8 text")
    ctx = _context(args)
    add_sql = _sql_adder(args, ctx)
    _utf8(sys.stdout)
    result = normalize(args.text, ctx)
    if add_sql is not None:
        result = add_sql(result)
    indent = args.indent or None
    print(result.model_dump_json(indent=indent))
    return 0


def _open_in(name: str) -> IO[str]:
    if name == "-":
        _utf8(sys.stdin)
        return sys.stdin
    return open(name, encoding="utf-8", errors="surrogateescape", newline="\n")


def _open_out(name: str) -> IO[str]:
    if name == "-":
        _utf8(sys.stdout)
        return sys.stdout
    return open(name, "w", encoding="utf-8", newline="")


def _batch(args: argparse.Namespace) -> int:
    ctx = _context(args)
    add_sql = _sql_adder(args, ctx)
    source = _open_in(args.input)
    sink = _open_out(args.output)
    show = args.progress if args.progress is not None else sys.stderr.isatty()
    total = None
    if show and args.input != "-" and Path(args.input).is_file():  # a pipe can be read once
        with open(args.input, "rb") as fh:
            total = sum(1 for _ in fh)
    started = time.perf_counter()
    try:
        lines, mentions, errors = run_batch(source, sink, ctx, progress=show, total=total,
                                            add_sql=add_sql)
    finally:
        if source is not sys.stdin:
            source.close()
        if sink is not sys.stdout:
            sink.close()
    elapsed = time.perf_counter() - started
    print(f"nlnorm batch: {lines} lines, {mentions} mentions, {errors} errors "
          f"in {elapsed:.2f} s", file=sys.stderr)
    return 0


def run_batch(source: IO[str], sink: IO[str], ctx: Any, progress: bool = False,
              total: int | None = None, add_sql: Any = None) -> tuple[int, int, int]:
    """Normalize each JSONL line of ``source`` into ``sink``; returns (lines, mentions, errors).

    Exactly one output line per input line, in order; a bad line gets its error and the rest
    go on. A byte order mark at the start of a line is ignored (RFC 8259, section 8.1). The
    progress bar, if any, goes to stderr.
    """
    from .errors import NlnormError
    from .pipeline import json_kind, normalize_item
    from .schema import Result

    cache: dict[Any, Any] = {}
    lines = mentions = errors = 0
    bar = None
    if progress:
        from rich.console import Console
        from rich.progress import Progress

        console = Console(stderr=True)
        # On a terminal the bar is redrawn and removed at the end; elsewhere (a log file) it is
        # written once, finished.
        bar = Progress(console=console, transient=console.is_terminal)
        bar.start()
        task = bar.add_task("normalizing", total=total)
    try:
        for number, line in enumerate(source, start=1):
            lines += 1
            raw = line.rstrip("\r\n").removeprefix("\ufeff")
            result = _batch_line(number, raw, ctx, cache, normalize_item, json_kind, Result)
            if add_sql is not None:
                try:
                    result = add_sql(result)
                except NlnormError as exc:  # this line's SQL only: the rest go on
                    result = result.model_copy(update={"error": f"line {number}: {exc}"})
            if result.error:
                errors += 1
            mentions += len(result.mentions)
            sink.write(result.model_dump_json())
            sink.write("\n")
            if bar is not None:
                bar.advance(task)
    finally:
        if bar is not None:
            bar.stop()
    return lines, mentions, errors


def _batch_line(number: int, raw: str, ctx: Any, cache: dict[Any, Any], normalize_item: Any,
                json_kind: Any, result_cls: Any) -> Any:
    """The result of one batch line; never raises, its error starts with ``line N:``."""

    def failed(message: str, item_id: Any = None) -> Any:
        return result_cls(id=item_id, text=None, error=f"line {number}: {message}")

    if not _is_text(raw):
        at = next(i for i, ch in enumerate(raw) if "\ud800" <= ch <= "\udfff")
        code = ord(raw[at])
        what = f"byte 0x{code - 0xDC00:02x}" if 0xDC80 <= code <= 0xDCFF else f"U+{code:04X}"
        return failed(f"not valid UTF-8 ({what} at character {at + 1}); JSON Lines files are UTF-8")
    if not raw.strip():
        return failed("empty line; expected a JSON object with 'text'")
    try:
        item = json.loads(raw)
    except json.JSONDecodeError as exc:
        return failed(f"not valid JSON: {exc.msg} at character {exc.colno}")
    if not isinstance(item, dict):
        return failed(f"expected a JSON object with 'text', got {json_kind(item)}")
    if "\\u" in raw and not _is_text(json.dumps(item, ensure_ascii=False)):
        item_id = item.get("id")
        return failed("a \\u escape stands for a lone UTF-16 surrogate, which is not text",
                      item_id if _is_text(json.dumps(item_id, ensure_ascii=False)) else None)
    try:
        result = normalize_item(item, ctx, cache)
    except Exception as exc:  # a bug in nlnorm must not cost the rest of the run
        return failed(f"internal error while normalizing ({type(exc).__name__}: {exc}); "
                      "please report it with this line", item.get("id"))
    if result.error:
        result = result.model_copy(update={"error": f"line {number}: {result.error}"})
    return result


def _demo_path(given: str | None) -> Path:
    if given:
        return Path(given)
    here = Path(__file__).resolve().parent
    for candidate in (here.parent / "examples" / "demo" / "questions.jsonl",
                      here / "examples" / "demo" / "questions.jsonl"):
        if candidate.is_file():
            return candidate
    from .errors import InputError

    raise InputError("the demo log examples/demo/questions.jsonl was not found; "
                     "pass a JSONL file: nlnorm demo PATH")


def _demo(args: argparse.Namespace) -> int:
    import io

    path = _demo_path(args.input)
    ctx = _context(args, default_now=DEMO_NOW)
    out = io.StringIO()
    with open(path, encoding="utf-8", errors="surrogateescape", newline="\n") as fh:
        lines, mentions, errors = run_batch(fh, out, ctx)
    if args.json:
        _utf8(sys.stdout)
        sys.stdout.write(out.getvalue())
        return 0
    print(f"nlnorm demo: {path.name}, now={ctx.now.isoformat()} tz={ctx.tz} "
          f"week_start={ctx.week_start} locale={ctx.locale}\n")
    for raw in out.getvalue().split("\n")[:-1]:  # not splitlines(): text may hold U+2028
        result = json.loads(raw)
        qid = result.get("id") or "-"
        if result.get("error"):
            print(f"[{qid}] ERROR {result['error']}\n")
            continue
        print(f"[{qid}] {result['text']}")
        if not result["mentions"]:
            print("      (no time phrase)")
        for m in result["mentions"]:
            print(f"      {m['text']!r} -> {m['value']}  [{m['reading']}: {m['note']}]")
            for alt in m["alternatives"]:
                how = alt["policy"] or "reword"
                print(f"          or {alt['value']} ({how})")
        if result["mentions"]:
            print(f"      => {result['rewritten']}")
        print()
    print(f"{lines} questions, {mentions} mentions, {errors} errors")
    return 0
