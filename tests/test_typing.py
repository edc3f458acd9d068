"""The package is fully typed: mypy, run strict with the configuration of pyproject.toml
([tool.mypy], with the pydantic plugin), finds no error in nlnorm/.

Checked against: mypy, the reference checker of PEP 484 type hints.
"""

from __future__ import annotations

from pathlib import Path

from mypy import api

ROOT = Path(__file__).resolve().parents[1]


def test_mypy_strict_finds_no_error() -> None:
    out, err, status = api.run(["--config-file", str(ROOT / "pyproject.toml"), str(ROOT / "nlnorm")])
    assert status == 0, out + err
    assert "Success: no issues found" in out
