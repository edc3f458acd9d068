"""Shared fixtures for the team-calendar phrases of every language: an invented sprint table of
the Wrenfold team (Quillmere Instruments), and oracles computed independently of nlnorm.

Oracles: business days by numpy's ``busday_offset`` (source: numpy) with the weekend from CLDR
via babel and holidays from the ``holidays`` package; fiscal quarters by pandas' quarterly
periods ``Q-MAR`` (source: pandas); sprints by reading the table above directly.
"""

from __future__ import annotations

from datetime import date, datetime, timedelta

import numpy as np

from tests.helpers import BERLIN, NOW, TODAY

#: Invented: the Wrenfold team's sprints, a week's gap (the offsite) between Bramblegate and
#: Foxglove; and a second team, Lanternfish, with sprints of its own.
SPRINTS = [
    {"name": "Tidewrack", "number": 41, "start": "2026-10-12", "end": "2026-10-23", "team": "Wrenfold"},
    {"name": "Bramblegate", "number": 42, "start": "2026-10-26", "end": "2026-11-06", "team": "Wrenfold"},
    {"name": "Foxglove", "number": 43, "start": "2026-11-16", "end": "2026-11-27", "team": "Wrenfold"},
    {"name": "Inkwell", "number": 44, "start": "2026-11-30", "end": "2026-12-11", "team": "Wrenfold"},
    {"name": "Harbor-7", "number": 45, "start": "2026-12-14", "end": "2026-12-24", "team": "Wrenfold"},
]
OTHER_TEAM = [
    {"name": "Lantern 9", "number": 9, "start": "2026-11-23", "end": "2026-12-04", "team": "Lanternfish"},
    {"name": "Lantern 10", "number": 10, "start": "2026-12-07", "end": "2026-12-18", "team": "Lanternfish"},
]
#: The fiscal year starts on 1 April and is named by the year it ends in (FY27 = 2026-04-01 to
#: 2027-03-31): the demo company's convention (invented).
FISCAL = {"fiscal_start": "04", "fiscal_name": "end"}


def calendar_context(**fields):  # type: ignore[no-untyped-def]
    from tests.helpers import ctx

    base = dict(sprints=SPRINTS, team="Wrenfold", **FISCAL)
    base.update(fields)
    now = base.pop("now", NOW)
    return ctx(now, **base)


def midnight(d: date) -> datetime:
    return datetime(d.year, d.month, d.day, tzinfo=BERLIN)


def sprint_span(name: str) -> tuple[datetime, datetime]:
    """[local midnight of its first day, local midnight after its last day), from the table."""
    row = next(r for r in SPRINTS + OTHER_TEAM if r["name"] == name)
    return midnight(date.fromisoformat(row["start"])), midnight(date.fromisoformat(row["end"]) + timedelta(days=1))


def business_day(n: int, holidays: list[str] | None = None, weekmask: str = "1111100") -> date:
    """Source: numpy.busday_offset — the day n business days from today (today is step 0)."""
    roll = "forward" if n <= 0 else "backward"
    if n == 0:
        return TODAY
    return np.busday_offset(TODAY, n, roll=roll, weekmask=weekmask, holidays=holidays or []).astype(date)


def fiscal_quarter(day: date, shift: int = 0) -> tuple[datetime, datetime]:
    """Source: pandas Period with frequency Q-MAR (a fiscal year ending in March)."""
    import pandas as pd

    p = pd.Period(day, freq="Q-MAR") + shift
    return midnight(p.start_time.date()), midnight((p + 1).start_time.date())


def fiscal_year(label: int) -> tuple[datetime, datetime]:
    """Source: pandas Period with frequency A-MAR / Y-MAR: the fiscal year ending in March of
    ``label``."""
    import pandas as pd

    p = pd.Period(f"{label}-03", freq="Y-MAR")
    return midnight(p.start_time.date()), midnight((p + 1).start_time.date())
