"""The README's promises: two set-up commands, CI running the same test command, and the
Python tour printing what it shows.

Checked against: README.md and .ci/run as committed.
"""

from __future__ import annotations

import re

import pytest
from pathlib import Path

ROOT = Path(__file__).resolve().parents[1]
README = (ROOT / "README.md").read_text(encoding="utf-8")


def _shell_blocks() -> list[str]:
    return [b.strip() for b in re.findall(r"```sh\n(.*?)```", README, re.S)]


def test_readme_opens_with_the_job_then_exactly_two_setup_commands():
    setup = README.split("## Set up", 1)[1].split("\n## ", 1)[0]
    commands = re.findall(r"```sh\n(.*?)```", setup, re.S)
    assert len(commands) == 2
    assert commands[0].strip().endswith("nlnorm demo")
    assert commands[1].strip().endswith("python -m pytest")


def test_ci_runs_exactly_the_readme_test_command():
    test_command = _shell_blocks()[1]
    ci = (ROOT / ".ci" / "run").read_text(encoding="utf-8")
    assert test_command in ci.splitlines()


@pytest.mark.parametrize("index", [0, 1, 2])
def test_python_tour_prints_what_the_readme_shows(index, monkeypatch):
    monkeypatch.chdir(ROOT)  # the calendar tour reads examples/demo/sprints.csv
    block = re.findall(r"```python\n(.*?)```", README, re.S)[index]
    namespace: dict[str, object] = {}
    lines = block.splitlines()
    checked = 0
    for i, line in enumerate(lines):
        if not line or line.startswith("#"):
            continue
        following = lines[i + 1] if i + 1 < len(lines) else ""
        if following.startswith("# ") and not line.startswith(("from ", "import ")) and "=" not in line.split("(")[0]:
            shown = following[2:].split("  #")[0].strip()
            assert repr(eval(line, namespace)) == shown, line
            checked += 1
        else:
            exec(line, namespace)
    assert checked >= 1
