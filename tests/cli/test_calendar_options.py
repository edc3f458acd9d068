"""The team-calendar options of ``nlnorm normalize`` and ``nlnorm batch``: --sprints,
--sprint-end, --team, --fiscal-start, --fiscal-name, --holidays.

Checked against: the invented demo sprint table (examples/demo/sprints.csv, read directly);
the holidays package (25 December 2026 is a public holiday in the US); CLDR week data via babel
(Saturday/Sunday weekend for en).
"""

from __future__ import annotations

import json
from pathlib import Path

from nlnorm.cli import _parser
from tests.cli.test_normalize import CLOCK, ROOT, cli, mention

SPRINTS = ROOT / "examples" / "demo" / "sprints.csv"


def test_the_calendar_options_are_exactly_these():
    for command in ("normalize", "batch"):
        sub = _parser()._subparsers._group_actions[0].choices[command]  # type: ignore[union-attr]
        group = next(g for g in sub._action_groups if g.title == "team calendars")
        flags = sorted(f for a in group._group_actions for f in a.option_strings)
        assert flags == ["--fiscal-name", "--fiscal-start", "--holidays", "--sprint-end", "--sprints", "--team"]


def test_sprints_from_a_csv_file(capsys):
    m = mention(capsys, "what slipped from the last sprint", "--sprints", str(SPRINTS), "--lang", "en")
    assert m["kind"] == "sprint"
    assert (m["start"], m["end"]) == ("2026-11-09T00:00:00+01:00", "2026-11-21T00:00:00+01:00")  # Skelmoor


def test_sprint_end_exclusive_reads_end_as_the_day_after(tmp_path: Path, capsys):
    table = tmp_path / "sprints.json"
    table.write_text(json.dumps([{"name": "Brackenrill", "start": "2026-11-23", "end": "2026-12-05"}]))
    m = mention(capsys, "this sprint", "--sprints", str(table), "--sprint-end", "exclusive", "--lang", "en")
    assert m["end"] == "2026-12-05T00:00:00+01:00"


def test_a_bad_sprint_table_names_the_row(tmp_path: Path, capsys):
    table = tmp_path / "sprints.csv"
    table.write_text("name,start,end\nOxbeck,2026-10-05,2026-10-16\nTarnwell,2026-10-30,2026-10-19\n")
    code, out, err = cli(capsys, "normalize", "this sprint", *CLOCK, "--sprints", str(table))
    assert code == 2 and out == ""
    assert "row 2 of sprints.csv" in err and "ends before it starts" in err


def test_an_unknown_team_is_refused_with_the_known_ones(capsys):
    code, _, err = cli(capsys, "normalize", "this sprint", *CLOCK, "--sprints", str(SPRINTS), "--team", "Wrenfeld")
    assert code == 2 and "team='Wrenfeld' has no sprint" in err and "'Wrenfold'" in err


def test_a_team_without_a_sprint_table_is_refused(capsys):
    code, _, err = cli(capsys, "normalize", "this sprint", *CLOCK, "--team", "Wrenfold")
    assert code == 2 and "--team needs --sprints FILE" in err


def test_fiscal_start_and_name(capsys):
    m = mention(capsys, "releases in FY27", "--fiscal-start", "02", "--lang", "en")
    assert (m["start"], m["end"]) == ("2026-02-01T00:00:00+01:00", "2027-02-01T00:00:00+01:00")
    m = mention(capsys, "releases in FY27", "--fiscal-start", "02", "--fiscal-name", "start", "--lang", "en")
    assert (m["start"], m["end"]) == ("2027-02-01T00:00:00+01:00", "2028-02-01T00:00:00+01:00")


def test_fiscal_name_without_fiscal_start_is_refused(capsys):
    code, _, err = cli(capsys, "normalize", "FY27", *CLOCK, "--fiscal-name", "start")
    assert code == 2 and "--fiscal-name needs --fiscal-start" in err


def test_holidays_skip_public_holidays(capsys):
    # Source: holidays package (US: Christmas Day, Friday 25 December 2026).
    options = ["--now", "2026-12-24T10:00", "--tz", "America/New_York", "--lang", "en"]
    code, out, err = cli(capsys, "normalize", "next business day", *options, "--holidays", "US")
    m = json.loads(out)["mentions"][0]
    assert m["start"] == "2026-12-28T00:00:00-05:00"
    code, out, err = cli(capsys, "normalize", "next business day", *options)
    assert json.loads(out)["mentions"][0]["start"] == "2026-12-25T00:00:00-05:00"
    code, _, err = cli(capsys, "normalize", "next business day", *options, "--holidays", "XX")
    assert code == 2 and "no public-holiday calendar for country 'XX'" in err


def test_batch_takes_the_calendar_options(tmp_path: Path, capsys):
    log = tmp_path / "log.jsonl"
    log.write_text('{"text": "bugs opened since sprint 47"}\n{"text": "Q1 FY27"}\n')
    code, out, _ = cli(capsys, "batch", str(log), *CLOCK, "--sprints", str(SPRINTS), "--fiscal-start", "02",
                       "--lang", "en")
    lines = [json.loads(x) for x in out.splitlines()]
    assert code == 0 and len(lines) == 2
    assert lines[0]["mentions"][0]["start"] == "2026-10-19T00:00:00+02:00"  # Tarnwell
    assert lines[1]["mentions"][0]["start"] == "2026-02-01T00:00:00+01:00"
