"""docs/sql.md cannot drift: every example on that page is run and compared with the page.

The page is read as a list of fenced blocks. Two pairings are checked:

* a ```` ```python ```` block followed by a ```` ```text ```` block: the Python is run (in a fresh
  namespace, from the repository root) and what it prints must be the text block, line for line
  (trailing spaces ignored). Every Python block on the page must have its output block;
* a ```` ```sh ```` block holding one ``nlnorm normalize ...`` command followed by a
  ```` ```json ```` block: the command is run through ``nlnorm.cli.main`` and the ``sql`` field
  of its first mention must equal the JSON.

Checked against:
- the page's own text (the examples and their printed output);
- SQLite (stdlib sqlite3): the unix seconds and julian day numbers on the page are what
  SQLite's ``strftime('%s', ...)`` and ``julianday(...)`` give for the same UTC times, and the
  comparison of the two text forms is SQLite's;
- Python's zoneinfo with the IANA tz database (tzdata): the UTC bounds of the DST days on the
  page (23 and 25 hours in Europe/Berlin, no midnight on 2026-09-06 in America/Santiago);
- nlnorm's command-line parser (``nlnorm normalize --help``, ``nlnorm batch --help``): the
  flags the page documents exist.
"""

from __future__ import annotations

import contextlib
import io
import json
import re
import shlex
import sqlite3
from dataclasses import dataclass
from datetime import datetime, timedelta, timezone
from pathlib import Path
from zoneinfo import ZoneInfo

import pytest

from nlnorm.cli import main
from nlnorm.sql import DIALECTS

ROOT = Path(__file__).resolve().parents[2]
DOC = ROOT / "docs" / "sql.md"

# A fence opens with ``` and a language at the start of a line and closes with ``` alone on a
# line; the page has no nested fences.
_FENCE = re.compile(r"^```([A-Za-z]+)[ \t]*\n(.*?)^```[ \t]*$", re.S | re.M)


@dataclass(frozen=True)
class Block:
    """One fenced block of the page."""

    lang: str
    body: str
    line: int  # the line of its opening fence, counting from 1


def blocks(text: str) -> list[Block]:
    """The fenced blocks of ``text``, in order."""
    return [Block(m.group(1), m.group(2), text.count("\n", 0, m.start()) + 1)
            for m in _FENCE.finditer(text)]


def pairs(found: list[Block], code: str, output: str) -> list[tuple[Block, Block | None]]:
    """Each ``code`` block with the block right after it when that is an ``output`` block."""
    out: list[tuple[Block, Block | None]] = []
    for i, b in enumerate(found):
        if b.lang == code:
            after = found[i + 1] if i + 1 < len(found) else None
            out.append((b, after if after is not None and after.lang == output else None))
    return out


TEXT = DOC.read_text(encoding="utf-8")
BLOCKS = blocks(TEXT)
PYTHON = pairs(BLOCKS, "python", "text")
COMMANDS = [(b, out) for b, out in pairs(BLOCKS, "sh", "json")
            if b.body.strip().startswith("nlnorm normalize ")]


def test_the_fence_reader_reads_blocks_and_their_lines() -> None:
    sample = "intro\n```python\nprint(1)\n```\n\n```text\n1\n```\n"
    found = blocks(sample)
    assert [(b.lang, b.body, b.line) for b in found] == [("python", "print(1)\n", 2),
                                                         ("text", "1\n", 6)]
    assert pairs(found, "python", "text") == [(found[0], found[1])]


def test_the_page_has_examples_to_check() -> None:
    assert len(PYTHON) >= 20
    assert len(COMMANDS) >= 2


@pytest.mark.parametrize("code", [b for b, _ in PYTHON], ids=lambda b: f"line{b.line}")
def test_every_python_block_is_followed_by_its_output(code: Block) -> None:
    output = dict((b.line, o) for b, o in PYTHON)[code.line]
    assert output is not None, f"docs/sql.md line {code.line}: a python block needs a text block after it"


def _run(code: Block) -> str:
    buffer = io.StringIO()
    namespace: dict[str, object] = {"__name__": "docs_sql_example"}
    with contextlib.redirect_stdout(buffer):
        exec(compile(code.body, f"docs/sql.md:{code.line}", "exec"), namespace)
    return buffer.getvalue()


def _lines(text: str) -> list[str]:
    return [line.rstrip() for line in text.rstrip("\n").splitlines()]


@pytest.mark.parametrize("code,output", [p for p in PYTHON if p[1] is not None],
                         ids=lambda b: f"line{b.line}" if isinstance(b, Block) else "")
def test_python_example_prints_what_the_page_says(code: Block, output: Block,
                                                  monkeypatch: pytest.MonkeyPatch) -> None:
    monkeypatch.chdir(ROOT)  # the examples read examples/demo/sprints.csv
    assert _lines(_run(code)) == _lines(output.body), f"docs/sql.md line {code.line}"


@pytest.mark.parametrize("command,output", COMMANDS, ids=lambda b: f"line{b.line}" if isinstance(b, Block) else "")
def test_command_line_example_gives_the_sql_field_the_page_shows(
        command: Block, output: Block | None, capsys: pytest.CaptureFixture[str]) -> None:
    assert output is not None, f"docs/sql.md line {command.line}: a command needs a json block after it"
    argv = shlex.split(command.body)
    assert argv[0] == "nlnorm"
    assert main(argv[1:]) == 0
    printed = json.loads(capsys.readouterr().out)
    assert printed["mentions"][0]["sql"] == json.loads(output.body)


def test_there_is_one_worked_example_per_dialect() -> None:
    section = TEXT.split("## Worked examples, one per dialect", 1)[1].split("\n## ", 1)[0]
    examples = [b.body for b in blocks(section) if b.lang == "python"]
    assert len(examples) == len(DIALECTS) == 8
    for name, body in zip(DIALECTS, examples):
        assert f'"{name}"' in body, f"the worked examples go in the order {list(DIALECTS)}"


def test_the_documented_flags_are_the_command_line_s(capsys: pytest.CaptureFixture[str]) -> None:
    flags = ("--sql-column", "--dialect", "--paramstyle", "--column-kind", "--column-zone",
             "--sqlite-encoding", "--sprint-key", "--literal")
    for command in ("normalize", "batch"):
        with pytest.raises(SystemExit):
            main([command, "--help"])
        usage = capsys.readouterr().out
        for flag in flags:
            assert flag in usage, (command, flag)
            assert flag in TEXT


def test_sqlite_numbers_on_the_page_are_sqlite_s() -> None:
    # Source: SQLite's own date functions, for the UTC bounds of "last week" in Berlin.
    con = sqlite3.connect(":memory:")
    start, end = con.execute(
        "SELECT CAST(strftime('%s', '2026-11-22 23:00') AS INTEGER), "
        "CAST(strftime('%s', '2026-11-29 23:00') AS INTEGER)").fetchone()
    assert f"closed_at >= {start} AND closed_at < {end}" in TEXT
    jd_start, jd_end = con.execute(
        "SELECT julianday('2026-11-22 23:00'), julianday('2026-11-29 23:00')").fetchone()
    assert f"closed_at >= {jd_start!r} AND closed_at < {jd_end!r}" in TEXT
    # Source: SQLite compares text byte by byte: ' ' (0x20) sorts before 'T' (0x54).
    assert con.execute("SELECT '2026-03-01T10:00' < '2026-03-01 23:00'").fetchone() == (0,)
    assert "SELECT '2026-03-01T10:00' < '2026-03-01 23:00'" in TEXT


def _utc(day: datetime) -> str:
    return day.astimezone(timezone.utc).strftime("%Y-%m-%d %H:%M:%S")


def test_dst_days_on_the_page_are_the_tz_database_s() -> None:
    # Source: Python's zoneinfo over the IANA tz database (tzdata).
    berlin = ZoneInfo("Europe/Berlin")
    for day, hours in ((datetime(2026, 3, 29), 23), (datetime(2026, 10, 25), 25)):
        start = day.replace(tzinfo=berlin)
        end = (day + timedelta(days=1)).replace(tzinfo=berlin)
        assert (end.astimezone(timezone.utc) - start.astimezone(timezone.utc)) == timedelta(hours=hours)
        assert f"'{_utc(start)}' AND created_at < TIMESTAMP '{_utc(end)}'" in TEXT or \
            f"'{_utc(start)}'::TIMESTAMP_NTZ AND created_at < '{_utc(end)}'::TIMESTAMP_NTZ" in TEXT
    santiago = ZoneInfo("America/Santiago")
    midnight = datetime(2026, 9, 6, 0, 0, tzinfo=santiago)
    # A wall time that does not exist does not survive a round trip through UTC.
    assert midnight.astimezone(timezone.utc).astimezone(santiago).replace(tzinfo=None) == \
        datetime(2026, 9, 6, 1, 0)
    assert "'t1_start': datetime.datetime(2026, 9, 6, 1, 0)" in TEXT
