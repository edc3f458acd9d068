"""Checked against: JSON Schema draft 2020-12 via the jsonschema package (docs/schema.json and the
output of ``nlnorm schema``); IANA tz database via zoneinfo/tzdata (Europe/Berlin is UTC+01:00
and America/New_York UTC-05:00 in December 2026); CLDR 49 week data and short date formats via
babel 2.19 (en_US: weeks start on Sunday, month/day/year; en_GB: Monday, day/month/year);
docs/readings.md (what each policy option selects); hand-computed calendar facts (2 December
2026 is a Wednesday).

``nlnorm normalize``, ``nlnorm demo``, ``nlnorm schema`` and ``python -m nlnorm``. Every run
passes ``--now`` except the one test that checks the current time is used without it.
"""

from __future__ import annotations

import json
import subprocess
import sys
from datetime import datetime, timedelta, timezone
from pathlib import Path
from typing import Any

import jsonschema
import pytest

from nlnorm.cli import main
from nlnorm.schema import Result

ROOT = Path(__file__).resolve().parents[2]
SCHEMA_PATH = ROOT / "docs" / "schema.json"
QUESTIONS = ROOT / "examples" / "demo" / "questions.jsonl"
#: Wednesday 2 December 2026, 10:00 in Berlin (UTC+01:00).
CLOCK = ["--now", "2026-12-02T10:00", "--tz", "Europe/Berlin"]


def cli(capsys: pytest.CaptureFixture[str], *args: str) -> tuple[int, str, str]:
    """Run ``nlnorm ARGS`` in this process; return (exit code, stdout, stderr)."""
    try:
        code = main(list(args))
    except SystemExit as exc:  # argparse ends the process on a usage error
        code = exc.code
    out, err = capsys.readouterr()
    return code, out, err


def normalized(capsys: pytest.CaptureFixture[str], text: str, *options: str) -> dict[str, Any]:
    code, out, err = cli(capsys, "normalize", text, *options)
    assert (code, err) == (0, ""), err
    return json.loads(out)


def mention(capsys, text: str, *options: str) -> dict[str, Any]:
    """The single mention of ``text`` normalized at :data:`CLOCK` (unless options repeat it)."""
    result = normalized(capsys, text, *CLOCK, *options)
    assert len(result["mentions"]) == 1, result["mentions"]
    return result["mentions"][0]


# --- the output ---------------------------------------------------------------------------------


def test_prints_one_json_object_that_is_a_result(capsys):
    code, out, err = cli(capsys, "normalize", "which bugs were created last week", *CLOCK)
    assert (code, err) == (0, "")
    result = Result.model_validate(json.loads(out))
    assert result.mentions[0].value == "2026-W48" and result.error is None
    assert out.endswith("}\n")


def test_the_output_validates_against_the_published_schema(capsys):
    if not SCHEMA_PATH.is_file():
        pytest.skip("docs/schema.json is not there")
    schema = json.loads(SCHEMA_PATH.read_text(encoding="utf-8"))
    for text in ("closed last week", "who owns ticket WRN-2025", "between 1 March and 15 April"):
        jsonschema.validate(normalized(capsys, text, *CLOCK), schema)


def test_indent_0_prints_one_line_and_the_default_is_indented(capsys):
    _, one_line, _ = cli(capsys, "normalize", "closed today", "--indent", "0", *CLOCK)
    _, indented, _ = cli(capsys, "normalize", "closed today", *CLOCK)
    assert one_line.count("\n") == 1 and indented.count("\n") > 10
    assert json.loads(one_line) == json.loads(indented)


def test_a_question_without_a_time_phrase_has_no_mentions(capsys):
    result = normalized(capsys, "who owns ticket WRN-2025", *CLOCK)
    assert result["mentions"] == [] and result["rewritten"] == "who owns ticket WRN-2025"


# --- each option changes the result as documented -----------------------------------------------


def test_now_is_the_reference_time(capsys):
    assert mention(capsys, "closed today")["value"] == "2026-12-02"
    assert mention(capsys, "closed today", "--now", "2026-11-20T09:00")["value"] == "2026-11-20"


def test_an_aware_now_is_converted_into_tz(capsys):
    result = normalized(capsys, "closed today", "--now", "2026-12-02T03:00:00Z",
                        "--tz", "America/New_York")
    assert result["reference"]["now"] == "2026-12-01T22:00:00-05:00"
    assert result["mentions"][0]["value"] == "2026-12-01"


def test_a_utc_now_without_tz_is_read_in_utc(capsys):
    result = normalized(capsys, "closed today", "--now", "2026-12-02T10:00:00Z")
    assert result["reference"]["tz"] == "UTC"
    assert result["mentions"][0]["start"] == "2026-12-02T00:00:00+00:00"


def test_tz_decides_where_the_day_starts(capsys):
    assert mention(capsys, "closed today")["start"] == "2026-12-02T00:00:00+01:00"
    m = mention(capsys, "closed today", "--tz", "America/New_York")
    assert (m["start"], m["end"]) == ("2026-12-02T00:00:00-05:00", "2026-12-03T00:00:00-05:00")


@pytest.mark.parametrize(("week_start", "first_day"),
                         [("monday", "2026-11-30"), ("sunday", "2026-11-29"),
                          ("saturday", "2026-11-28")])
def test_week_start_decides_this_week(capsys, week_start, first_day):
    m = mention(capsys, "closed this week", "--week-start", week_start)
    assert m["start"] == f"{first_day}T00:00:00+01:00"


@pytest.mark.parametrize(("locale", "week_start", "date"),
                         [("en", "monday", "2026-03-04"), ("en_US", "sunday", "2026-03-04"),
                          ("en-gb", "monday", "2026-04-03")])
def test_locale_decides_week_start_and_numeric_date_order(capsys, locale, week_start, date):
    result = normalized(capsys, "fixed on 03/04/2026", *CLOCK, "--locale", locale)
    assert result["reference"]["week_start"] == week_start
    assert result["mentions"][0]["value"] == date


def test_lang_names_the_languages_looked_for(capsys):
    result = normalized(capsys, "closed today", *CLOCK, "--lang", "en")
    assert result["reference"]["languages"] == ["en"]
    assert normalized(capsys, "closed today", *CLOCK, "--lang", "EN,en")["reference"][
        "languages"] == ["en"]


def test_bias_picks_the_past_or_the_coming_march(capsys):
    past = mention(capsys, "released in March")
    future = mention(capsys, "released in March", "--bias", "future")
    assert (past["value"], future["value"]) == ("2026-03", "2027-03")
    assert [a["policy"] for a in past["alternatives"]] == ["bias=future"]


def test_window_reading_rolling_ends_now_and_calendar_at_midnight(capsys):
    rolling = mention(capsys, "bugs in the last 7 days")
    calendar = mention(capsys, "bugs in the last 7 days", "--window-reading", "calendar")
    assert (rolling["start"], rolling["end"]) == ("2026-11-25T10:00:00+01:00",
                                                  "2026-12-02T10:00:00+01:00")
    assert (calendar["start"], calendar["end"]) == ("2026-11-25T00:00:00+01:00",
                                                    "2026-12-02T00:00:00+01:00")
    assert [a["policy"] for a in rolling["alternatives"]] == ["window_reading=calendar"]


def test_weekday_reading_nearest_or_monday_of_last_week(capsys):
    nearest = mention(capsys, "what broke last Monday")
    week = mention(capsys, "what broke last Monday", "--weekday-reading", "week")
    assert (nearest["value"], nearest["reading"]) == ("2026-11-30", "R14")
    assert (week["value"], week["reading"]) == ("2026-11-23", "R16")


@pytest.mark.parametrize(("order", "value"), [("MDY", "2026-03-04"), ("DMY", "2026-04-03")])
def test_date_order_reads_a_numeric_date(capsys, order, value):
    assert mention(capsys, "fixed on 03/04/2026", "--date-order", order)["value"] == value


def test_without_now_the_current_time_is_used(capsys):
    before = datetime.now(timezone.utc)
    result = normalized(capsys, "closed today", "--tz", "Europe/Berlin")
    after = datetime.now(timezone.utc)
    used = datetime.fromisoformat(result["reference"]["now"])
    assert result["reference"]["tz"] == "Europe/Berlin"
    assert before - timedelta(seconds=1) <= used <= after  # the output may drop microseconds
    assert used.utcoffset() in (timedelta(hours=1), timedelta(hours=2))


# --- bad options --------------------------------------------------------------------------------


@pytest.mark.parametrize(
    ("options", "fragments"),
    [
        (["--now", "yesterday-ish"], ["now='yesterday-ish'", "ISO 8601"]),
        (["--now", ""], ["--now", "empty"]),
        (["--now", "2026-12-02T10:00"], ["now='2026-12-02T10:00:00'", "no UTC offset", "tz"]),
        (["--now", "2026-12-02T10:00+01:00"], ["fixed UTC offset", "tz"]),
        (["--now", "2026-12-02T10:00", "--tz", "Europe/Berln"],
         ["tz='Europe/Berln'", "did you mean 'Europe/Berlin'?"]),
        (["--now", "2026-12-02T10:00", "--tz", "Berlin"], ["tz='Berlin'", "'Europe/Berlin'"]),
        ([*CLOCK, "--tz", ""], ["--tz", "empty"]),
        ([*CLOCK, "--week-start", "thursday"], ["--week-start", "'thursday'"]),
        ([*CLOCK, "--locale", "xx_YY"], ["locale='xx_YY'", "CLDR locale"]),
        ([*CLOCK, "--lang", "xx"], ["'xx'", "not available"]),
        ([*CLOCK, "--bias", "sideways"], ["--bias", "'sideways'"]),
        ([*CLOCK, "--window-reading", "sliding"], ["--window-reading", "'sliding'"]),
        ([*CLOCK, "--weekday-reading", "closest"], ["--weekday-reading", "'closest'"]),
        ([*CLOCK, "--date-order", "XYZ"], ["--date-order", "'XYZ'"]),
        ([*CLOCK, "--indent", "wide"], ["--indent", "'wide'"]),
        ([*CLOCK, "--colour"], ["--colour"]),
    ],
    ids=["now-not-iso", "now-empty", "now-naive-no-tz", "now-offset-no-tz", "tz-misspelt",
         "tz-bare-city", "tz-empty", "week-start", "locale", "lang", "bias", "window-reading",
         "weekday-reading", "date-order", "indent", "unknown-option"],
)
def test_a_bad_option_exits_2_with_one_line_naming_it(capsys, options, fragments):
    code, out, err = cli(capsys, "normalize", "closed today", *options)
    assert (code, out) == (2, "")
    assert err.startswith("nlnorm: error: ") and err.endswith("\n") and err.count("\n") == 1
    for fragment in fragments:
        assert fragment in err, (fragment, err)


def test_a_missing_question_or_command_is_a_one_line_error(capsys):
    for args in (["normalize"], [], ["normalise", "today"]):
        code, out, err = cli(capsys, *args)
        assert (code, out) == (2, "") and err.startswith("nlnorm: error: ")
        assert err.count("\n") == 1


# --- demo, schema, python -m nlnorm -------------------------------------------------------------


def demo_ids() -> list[str]:
    return [json.loads(line)["id"] for line in QUESTIONS.read_text(encoding="utf-8").splitlines()]


def test_demo_prints_the_table_of_the_demo_log(capsys):
    code, out, err = cli(capsys, "demo")
    assert (code, err) == (0, "")
    lines = out.splitlines()
    assert lines[0] == ("nlnorm demo: questions.jsonl, now=2026-12-02T10:00:00+00:00 "
                        "tz=Europe/Lisbon week_start=monday locale=en")
    shown = [line.split("]")[0][1:] for line in lines if line.startswith("[")]
    assert shown == demo_ids()
    assert "[q03] show pull requests Teodor Vashti merged last week" in lines
    assert "      'last week' -> 2026-W48  [R2: the whole calendar week before the current one; " \
           "weeks start on monday]" in lines
    assert "      (no time phrase)" in lines
    assert lines[-1].endswith("questions, 54 mentions, 0 errors") and lines[-1].startswith("48 ")


def test_demo_takes_the_context_options(capsys):
    _, out, _ = cli(capsys, "demo", "--now", "2026-11-20T09:00:00Z", "--tz", "Europe/Berlin",
                    "--locale", "en_US")
    assert out.splitlines()[0].endswith("now=2026-11-20T10:00:00+01:00 tz=Europe/Berlin "
                                        "week_start=sunday locale=en_US")


def test_demo_json_prints_one_result_line_per_demo_question(capsys):
    code, out, err = cli(capsys, "demo", "--json")
    assert (code, err) == (0, "")
    results = [Result.model_validate_json(line) for line in out.split("\n")[:-1]]
    assert [r.id for r in results] == demo_ids()
    assert all(r.error is None and r.reference.tz == "Europe/Lisbon" for r in results)


def test_demo_of_the_bad_lines_shows_their_errors(capsys):
    code, out, _ = cli(capsys, "demo", str(ROOT / "examples" / "demo" / "bad_lines.jsonl"))
    assert code == 0
    assert "[b6] ERROR line 6: tz='Europe/Berln' is not an IANA time zone; did you mean " \
           "'Europe/Berlin'?" in out.splitlines()
    assert out.splitlines()[-1] == "8 questions, 2 mentions, 5 errors"


def test_schema_prints_the_json_schema_of_a_result(capsys):
    code, out, err = cli(capsys, "schema")
    assert (code, err) == (0, "")
    schema = json.loads(out)
    jsonschema.Draft202012Validator.check_schema(schema)
    assert schema == Result.model_json_schema()
    if SCHEMA_PATH.is_file():
        assert schema == json.loads(SCHEMA_PATH.read_text(encoding="utf-8"))
    jsonschema.validate(normalized(capsys, "closed since March", *CLOCK), schema)


def test_python_dash_m_nlnorm_help_lists_the_commands():
    done = subprocess.run([sys.executable, "-m", "nlnorm", "--help"], capture_output=True,
                          text=True, timeout=60)
    assert done.returncode == 0 and done.stderr == ""
    assert done.stdout.startswith("usage: nlnorm ")
    for command in ("normalize", "batch", "demo", "bench", "schema"):
        assert command in done.stdout


def test_each_command_has_help(capsys):
    for command in ("normalize", "batch", "demo", "bench", "schema"):
        with pytest.raises(SystemExit) as exc:
            main([command, "--help"])
        assert exc.value.code == 0
        assert capsys.readouterr().out.startswith(f"usage: nlnorm {command}")


def test_python_dash_m_nlnorm_normalize_as_a_process():
    done = subprocess.run([sys.executable, "-m", "nlnorm", "normalize", "closed yesterday",
                           "--indent", "0", *CLOCK], capture_output=True, timeout=60)
    assert done.returncode == 0, done.stderr
    result = Result.model_validate_json(done.stdout)
    assert result.mentions[0].value == "2026-12-01"
