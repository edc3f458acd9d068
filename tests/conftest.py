"""Test-run hooks: print the CLDR tier's pass count at the end of a run."""

from __future__ import annotations


def pytest_terminal_summary(terminalreporter):  # type: ignore[no-untyped-def]
    try:
        from tests.locales.test_cldr_tier_all_locales import SUMMARY
    except Exception:
        return
    if SUMMARY:
        s = SUMMARY
        terminalreporter.write_line(
            f"CLDR tier: {s['passed']} of {s['total']} relative date fields pass in "
            f"{s['locales']} of {s['of']} babel locales ({100 * s['passed'] / s['total']:.1f}%)"
        )
