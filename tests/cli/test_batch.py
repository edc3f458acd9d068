"""Checked against: JSON Lines format (jsonlines.org: UTF-8, one JSON value per line, lines end
with "\\n", a trailing "\\r" is allowed); RFC 8259 section 8.1 (a parser may ignore a UTF-8 byte
order mark) and section 7 (control characters must be escaped inside strings); IANA tz database
via zoneinfo/tzdata (Europe/Lisbon is UTC+00:00 and America/New_York UTC-05:00 in December
2026); CLDR 49 week data via babel 2.19 (weeks start on Sunday in en_US, Monday in en_GB);
hand-computed calendar facts (2 December 2026 is a Wednesday).

``nlnorm batch``: one output line per input line, in order; a bad line carries its error and
the rest go on. Every run uses a fixed ``--now``.
"""

from __future__ import annotations

import io
import json
import os
import re
import subprocess
import sys
from pathlib import Path
from typing import Any

import pytest

from nlnorm.cli import main
from nlnorm.schema import Result

ROOT = Path(__file__).resolve().parents[2]
BAD_LINES = ROOT / "examples" / "demo" / "bad_lines.jsonl"
#: Wednesday 2 December 2026, 10:00 wall time in Lisbon (= 10:00 UTC).
CLOCK = ["--now", "2026-12-02T10:00", "--tz", "Europe/Lisbon"]
SUMMARY = re.compile(r"^nlnorm batch: (\d+) lines, (\d+) mentions, (\d+) errors in \d+\.\d\d s$")


def batch(capsys: pytest.CaptureFixture[str], *args: str) -> tuple[int, str, str]:
    """Run ``nlnorm batch ARGS`` in this process; return (exit code, stdout, stderr)."""
    code = main(["batch", *args])
    out, err = capsys.readouterr()
    return code, out, err


def records(out: str) -> list[dict[str, Any]]:
    """The JSON lines of an output; every line must end with "\\n" and be an object."""
    assert out == "" or out.endswith("\n")
    return [json.loads(line) for line in out.split("\n")[:-1]]


def write_log(path: Path, lines: list[bytes]) -> Path:
    path.write_bytes(b"".join(line if line.endswith(b"\n") else line + b"\n" for line in lines))
    return path


def jl(obj: Any) -> bytes:
    return json.dumps(obj, ensure_ascii=False).encode("utf-8")


# --- the mixed log: examples/demo/bad_lines.jsonl, then lines of every kind ----------------------

LONG_TEXT = "tickets closed last week and " * 2000 + "reopened today"
UNICODE_TEXT = "Tickets \u00fcberpr\u00fcft — closed yesterday ✓ 🐛 caf\u00e9\u2028and today"

#: (raw line, expected id, None for a good line or the fragments its error must hold)
OWN_LINES: list[tuple[bytes, Any, list[str] | None]] = [
    (b"not json at all", None, ["not valid JSON"]),
    (b"[1, 2]", None, ["expected a JSON object with 'text'", "got array"]),
    (b"42", None, ["expected a JSON object with 'text'", "got number"]),
    (b'"closed last week"', None, ["expected a JSON object with 'text'", "got string"]),
    (b"null", None, ["expected a JSON object with 'text'", "got null"]),
    (jl({"id": "no-text", "question": "what closed today"}), "no-text",
     ["field 'text'", "missing", "'question'"]),
    (jl({"id": 12, "text": ["closed today"]}), 12, ["field 'text' must be a string", "got array"]),
    (jl({"id": 13, "text": 7}), 13, ["field 'text' must be a string", "got number"]),
    (jl({"id": "tz", "text": "closed today", "tz": "America/New_Yrok"}), "tz",
     ["tz='America/New_Yrok' is not an IANA time zone", "did you mean 'America/New_York'?"]),
    (jl({"id": "naive", "text": "closed today", "now": "2026-12-02T09:00:00"}), "naive",
     ["now='2026-12-02T09:00:00'", "no UTC offset", "tz"]),
    (jl({"id": "lang", "text": "closed today", "lang": "xx"}), "lang", ["'xx'", "not available"]),
    (jl({"id": "ws", "text": "closed this week", "week_start": "thursday"}), "ws",
     ["week_start='thursday'", "'monday', 'sunday' or 'saturday'"]),
    (jl({"id": "loc", "text": "closed this week", "locale": "xx_YY"}), "loc",
     ["locale='xx_YY' is not a CLDR locale"]),
    (jl({"id": "when", "text": "closed today", "now": "last Tuesday"}), "when",
     ["now='last Tuesday' is not an ISO 8601 date-time"]),
    (b"", None, ["empty line"]),
    (b"   \t ", None, ["empty line"]),
    (b'{"id": "bytes", "text": "closed \xff today"}', None, ["not valid UTF-8", "0xff"]),
    (b'{"id": "surrogate", "text": "closed \\ud800 today"}', "surrogate", ["lone UTF-16 surrogate"]),
    (b'{"id": "cr", "text": "closed\rtoday"}', None, ["not valid JSON", "control character"]),
    ("\ufeff".encode() + jl({"id": "bom", "text": "closed yesterday"}), "bom", None),
    (jl({"id": "crlf", "text": "closed yesterday"}) + b"\r\n", "crlf", None),
    (jl({"id": 42, "text": "closed today"}), 42, None),
    (jl({"id": 0, "text": "closed today"}), 0, None),
    (jl({"id": 4.5, "text": "closed today"}), 4.5, None),
    (jl({"text": "closed today"}), None, None),
    (jl({"id": "long", "text": LONG_TEXT}), "long", None),
    (jl({"id": "unicode", "text": UNICODE_TEXT}), "unicode", None),
    (jl({"id": "empty-text", "text": ""}), "empty-text", None),
]

#: bad_lines.jsonl, as examples/demo/SCENARIO.md describes it: three good lines, five broken.
DEMO_EXPECTED: list[tuple[Any, list[str] | None]] = [
    ("b1", None),
    ("b2", None),
    ("b3", None),
    (None, ["not valid JSON"]),
    ("b5", ["field 'text'", "missing", "'question'"]),
    ("b6", ["tz='Europe/Berln'", "did you mean 'Europe/Berlin'?"]),
    ("b7", ["now='2026-12-02T10:00:00'", "no UTC offset"]),
    ("b8", ["'xx'", "not available"]),
]
EXPECTED = DEMO_EXPECTED + [(want_id, error) for _, want_id, error in OWN_LINES]


@pytest.fixture(scope="module")
def mixed(tmp_path_factory: pytest.TempPathFactory) -> tuple[Path, list[dict[str, Any]], str]:
    """The mixed log run once with ``-o``: (log path, output records, raw output text)."""
    folder = tmp_path_factory.mktemp("mixed")
    log = write_log(folder / "mixed.jsonl",
                    BAD_LINES.read_bytes().splitlines() + [raw for raw, _, _ in OWN_LINES])
    out = folder / "out.jsonl"
    assert main(["batch", str(log), "-o", str(out), *CLOCK]) == 0
    text = out.read_bytes().decode("utf-8")
    return log, records(text), text


def test_the_mixed_log_has_the_lines_the_tests_expect():
    assert len(BAD_LINES.read_bytes().splitlines()) == len(DEMO_EXPECTED) == 8


def test_one_output_line_per_input_line(mixed):
    log, out, text = mixed
    assert log.read_bytes().count(b"\n") == len(EXPECTED) == len(out)
    assert text.count("\n") == len(out) and "\r" not in text


@pytest.mark.parametrize(("number", "want_id", "error"),
                         [(n, i, e) for n, (i, e) in enumerate(EXPECTED, start=1)],
                         ids=[f"line{n}-{i}" for n, (i, _) in enumerate(EXPECTED, start=1)])
def test_each_line_keeps_its_place_echoes_its_id_and_says_what_was_wrong(mixed, number, want_id,
                                                                        error):
    result = mixed[1][number - 1]
    assert result["id"] == want_id and type(result["id"]) is type(want_id)
    if error is None:
        assert result["error"] is None
        assert result["reference"]["tz"] == "Europe/Lisbon"
    else:
        assert result["error"].startswith(f"line {number}: ")
        for fragment in error:
            assert fragment in result["error"], (fragment, result["error"])
        assert result["mentions"] == [] and result["reference"] is None


def test_every_output_line_is_a_result(mixed):
    for record in mixed[1]:
        Result.model_validate(record)


def test_good_lines_around_bad_ones_are_resolved(mixed):
    by_id = {r["id"]: r for r in mixed[1] if r["error"] is None}
    assert [m["value"] for m in by_id["b1"]["mentions"]] == ["2026-W48"]
    assert [m["value"] for m in by_id["bom"]["mentions"]] == ["2026-12-01"]
    assert by_id["bom"]["text"] == "closed yesterday"  # the byte order mark is not text
    assert [m["value"] for m in by_id["crlf"]["mentions"]] == ["2026-12-01"]
    assert by_id["crlf"]["text"] == "closed yesterday"
    assert by_id["empty-text"]["mentions"] == []


def test_long_text_is_resolved_whole(mixed):
    result = next(r for r in mixed[1] if r["id"] == "long")
    assert result["text"] == LONG_TEXT
    values = [m["value"] for m in result["mentions"]]
    assert values == ["2026-W48"] * 2000 + ["2026-12-02"]


def test_unicode_text_keeps_its_characters_and_offsets(mixed):
    result = next(r for r in mixed[1] if r["id"] == "unicode")
    assert result["text"] == UNICODE_TEXT
    for m in result["mentions"]:
        assert UNICODE_TEXT[m["char_start"]:m["char_end"]] == m["text"]
    assert [m["text"] for m in result["mentions"]] == ["yesterday", "today"]


# --- the run: exit code, streams, summary -------------------------------------------------------


def test_errors_do_not_change_the_exit_code_and_the_summary_counts_them(capsys, tmp_path):
    log = write_log(tmp_path / "log.jsonl", [jl({"id": 1, "text": "closed today or yesterday"}),
                                             b"{oops", jl({"id": 3, "text": "no time here"}),
                                             jl({"id": 4, "text": "closed last week"})])
    code, out, err = batch(capsys, str(log), *CLOCK)
    assert code == 0
    assert [r["id"] for r in records(out)] == [1, None, 3, 4]
    assert [line for line in err.splitlines() if line] == [err.strip()]
    match = SUMMARY.match(err.strip())
    assert match and match.groups() == ("4", "3", "1")


def test_without_a_file_it_reads_stdin_and_writes_stdout(capsys, monkeypatch):
    monkeypatch.setattr(sys, "stdin", io.StringIO('{"id": "a", "text": "closed today"}\n[]\n'))
    code, out, err = batch(capsys, *CLOCK)
    assert code == 0
    assert [(r["id"], r["error"]) for r in records(out)] == [
        ("a", None), (None, "line 2: expected a JSON object with 'text', got array")]
    assert SUMMARY.match(err.strip()).groups() == ("2", "1", "1")


def test_a_dash_means_stdin(capsys, monkeypatch):
    monkeypatch.setattr(sys, "stdin", io.StringIO('{"text": "closed today"}\n'))
    code, out, _ = batch(capsys, "-", *CLOCK)
    assert code == 0 and records(out)[0]["mentions"][0]["value"] == "2026-12-02"


def test_a_last_line_without_newline_is_still_a_line(capsys, monkeypatch):
    monkeypatch.setattr(sys, "stdin", io.StringIO('{"text": "today"}\n{"text": "yesterday"}'))
    _, out, _ = batch(capsys, *CLOCK)
    assert [r["mentions"][0]["value"] for r in records(out)] == ["2026-12-02", "2026-12-01"]


def test_an_empty_input_gives_an_empty_output(capsys, monkeypatch):
    monkeypatch.setattr(sys, "stdin", io.StringIO(""))
    code, out, err = batch(capsys, *CLOCK)
    assert (code, out) == (0, "") and SUMMARY.match(err.strip()).groups() == ("0", "0", "0")


def test_dash_o_writes_the_file_and_nothing_to_stdout(capsys, tmp_path):
    log = write_log(tmp_path / "in.jsonl", [jl({"id": "x", "text": "closed today"}), b"{"])
    target = tmp_path / "out.jsonl"
    code, out, err = batch(capsys, str(log), "-o", str(target), *CLOCK)
    assert (code, out) == (0, "")
    assert [r["id"] for r in records(target.read_bytes().decode("utf-8"))] == ["x", None]
    assert SUMMARY.match(err.strip())


def test_a_missing_input_file_is_a_one_line_error(capsys, tmp_path):
    code, out, err = batch(capsys, str(tmp_path / "absent.jsonl"), *CLOCK)
    assert (code, out) == (2, "")
    assert err.startswith("nlnorm: error: ") and "absent.jsonl" in err and err.count("\n") == 1


def test_a_bad_run_option_stops_before_reading(capsys, tmp_path):
    log = write_log(tmp_path / "in.jsonl", [jl({"text": "today"})])
    code, out, err = batch(capsys, str(log), "--now", "2026-12-02T10:00", "--tz", "Europe/Lisbn")
    assert (code, out) == (2, "")
    assert err == ("nlnorm: error: tz='Europe/Lisbn' is not an IANA time zone; "
                   "did you mean 'Europe/Lisbon'?\n")


# --- per-line overrides change their own line only ----------------------------------------------

#: 03:00 UTC on Wednesday 2 December 2026: still Tuesday 1 December in New York.
EARLY = ["--now", "2026-12-02T03:00", "--tz", "Europe/Lisbon"]


def run_lines(capsys, tmp_path, items: list[dict[str, Any]], *options: str) -> list[dict[str, Any]]:
    log = write_log(tmp_path / "overrides.jsonl", [jl(item) for item in items])
    code, out, _ = batch(capsys, str(log), *options)
    assert code == 0
    return records(out)


def first(result: dict[str, Any]) -> tuple[str, str]:
    m = result["mentions"][0]
    return m["start"], m["end"]


@pytest.mark.parametrize(
    ("override", "text", "changed", "default"),
    [
        ({"now": "2026-11-20T09:00:00+00:00"}, "closed today",
         ("2026-11-20T00:00:00+00:00", "2026-11-21T00:00:00+00:00"),
         ("2026-12-02T00:00:00+00:00", "2026-12-03T00:00:00+00:00")),
        ({"tz": "America/New_York"}, "closed today",
         ("2026-12-01T00:00:00-05:00", "2026-12-02T00:00:00-05:00"),
         ("2026-12-02T00:00:00+00:00", "2026-12-03T00:00:00+00:00")),
        ({"now": "2026-11-20T09:00:00", "tz": "America/New_York"}, "closed today",
         ("2026-11-20T00:00:00-05:00", "2026-11-21T00:00:00-05:00"),
         ("2026-12-02T00:00:00+00:00", "2026-12-03T00:00:00+00:00")),
        ({"week_start": "sunday"}, "closed this week",
         ("2026-11-29T00:00:00+00:00", "2026-12-06T00:00:00+00:00"),
         ("2026-11-30T00:00:00+00:00", "2026-12-07T00:00:00+00:00")),
        ({"locale": "en-US"}, "closed this week",
         ("2026-11-29T00:00:00+00:00", "2026-12-06T00:00:00+00:00"),
         ("2026-11-30T00:00:00+00:00", "2026-12-07T00:00:00+00:00")),
        ({"locale": "en_GB"}, "fixed on 03/04/2026",
         ("2026-04-03T00:00:00+01:00", "2026-04-04T00:00:00+01:00"),
         ("2026-03-04T00:00:00+00:00", "2026-03-05T00:00:00+00:00")),
    ],
    ids=["now", "tz-keeps-the-instant", "naive-now-with-its-tz", "week_start",
         "locale-week-start", "locale-date-order"],
)
def test_an_override_changes_its_line_only(capsys, tmp_path, override, text, changed, default):
    out = run_lines(capsys, tmp_path, [{"id": 1, "text": text}, {"id": 2, "text": text, **override},
                                       {"id": 3, "text": text}], *EARLY)
    assert [r["error"] for r in out] == [None, None, None]
    assert first(out[1]) == changed
    assert first(out[0]) == first(out[2]) == default
    assert out[0]["reference"] == out[2]["reference"]
    assert out[0]["reference"]["now"] == "2026-12-02T03:00:00+00:00"


def test_the_reference_of_an_overridden_line_says_what_it_used(capsys, tmp_path):
    out = run_lines(capsys, tmp_path, [{"text": "today", "tz": "America/New_York",
                                        "locale": "en-us", "lang": "en"}], *EARLY)
    assert out[0]["reference"] == {"now": "2026-12-01T22:00:00-05:00", "tz": "America/New_York",
                                   "week_start": "sunday", "locale": "en_US",
                                   "languages": ["en"]}


def test_a_line_may_name_its_languages_as_a_string_or_a_list(capsys, tmp_path):
    out = run_lines(capsys, tmp_path, [{"text": "today", "lang": "en"},
                                       {"text": "today", "lang": ["EN", "en"]},
                                       {"text": "today", "languages": ["en"]}], *EARLY)
    assert [r["reference"]["languages"] for r in out] == [["en"]] * 3
    assert [r["mentions"][0]["value"] for r in out] == ["2026-12-02"] * 3


def test_a_bad_override_fails_its_line_only(capsys, tmp_path):
    out = run_lines(capsys, tmp_path, [{"id": 1, "text": "today", "lang": "xx"},
                                       {"id": 2, "text": "today"}], *EARLY)
    assert out[0]["error"].startswith("line 1: ") and out[1]["error"] is None


def test_a_line_locale_keeps_the_week_start_the_run_was_given(capsys, tmp_path):
    out = run_lines(capsys, tmp_path, [{"text": "closed this week", "locale": "en_US"}],
                    *EARLY, "--week-start", "saturday")
    assert out[0]["reference"]["week_start"] == "saturday"
    assert first(out[0])[0] == "2026-11-28T00:00:00+00:00"


def test_a_line_locale_replaces_a_week_start_that_came_from_the_run_locale(capsys, tmp_path):
    out = run_lines(capsys, tmp_path, [{"text": "closed this week", "locale": "en_GB"}],
                    *EARLY, "--locale", "en_US")
    assert out[0]["reference"]["week_start"] == "monday"


def test_run_options_apply_to_every_line(capsys, tmp_path):
    out = run_lines(capsys, tmp_path, [{"text": "closed this week"}, {"text": "closed in March"}],
                    *EARLY, "--week-start", "sunday", "--bias", "future")
    assert first(out[0])[0] == "2026-11-29T00:00:00+00:00"
    assert out[1]["mentions"][0]["value"] == "2027-03"


# --- the progress bar ---------------------------------------------------------------------------


def test_progress_without_a_terminal_leaves_stdout_clean(capsys, tmp_path):
    log = write_log(tmp_path / "in.jsonl", [jl({"text": f"closed {n} days ago"}) for n in range(5)])
    code, out, err = batch(capsys, str(log), "--progress", *CLOCK)
    assert code == 0 and len(records(out)) == 5
    assert "normalizing" in err and SUMMARY.match(err.strip().splitlines()[-1])


def test_progress_reading_stdin(capsys, monkeypatch):
    monkeypatch.setattr(sys, "stdin", io.StringIO('{"text": "today"}\n' * 3))
    code, out, err = batch(capsys, "--progress", *CLOCK)
    assert code == 0 and len(records(out)) == 3 and "normalizing" in err


def test_by_default_no_bar_when_stderr_is_not_a_terminal(capsys, tmp_path):
    assert not sys.stderr.isatty()
    log = write_log(tmp_path / "in.jsonl", [jl({"text": "today"})])
    for extra in ([], ["--no-progress"]):
        code, out, err = batch(capsys, str(log), *extra, *CLOCK)
        assert code == 0 and len(records(out)) == 1
        assert err.count("\n") == 1 and SUMMARY.match(err.strip())


# --- a real process -----------------------------------------------------------------------------


def run_process(*args: str, stdin: bytes | None = None,
                env: dict[str, str] | None = None) -> subprocess.CompletedProcess[bytes]:
    return subprocess.run([sys.executable, "-m", "nlnorm", "batch", *args], input=stdin,
                          capture_output=True, timeout=60, env={**os.environ, **(env or {})})


def test_as_a_process_bad_lines_are_reported_and_the_run_goes_on():
    done = run_process(str(BAD_LINES), *CLOCK)
    assert done.returncode == 0
    out = records(done.stdout.decode("utf-8"))
    assert [r["id"] for r in out] == [i for i, _ in DEMO_EXPECTED]
    assert [r["error"] is None for r in out] == [e is None for _, e in DEMO_EXPECTED]
    assert SUMMARY.match(done.stderr.decode("utf-8").strip()).groups() == ("8", "2", "5")


def test_as_a_process_stdin_and_stdout_are_utf8_whatever_the_locale():
    lines = [jl({"id": "é", "text": "café closed yesterday 🐛"}), jl({"text": "closed today"})]
    done = run_process(*CLOCK, stdin=b"\n".join(lines) + b"\n",
                       env={"PYTHONIOENCODING": "latin-1", "PYTHONUTF8": "0"})
    assert done.returncode == 0, done.stderr
    out = records(done.stdout.decode("utf-8"))
    assert out[0]["id"] == "é" and out[0]["text"] == "café closed yesterday 🐛"
    m = out[0]["mentions"][0]
    assert (m["text"], m["char_start"]) == ("yesterday", 12)
    assert out[1]["mentions"][0]["value"] == "2026-12-02"
