"""Shared test helpers: a fixed clock and one-line ways to normalize.

The clock is fixed; no test calls ``datetime.now()``.
"""

from __future__ import annotations

from datetime import date, datetime, timedelta
from typing import Any
from zoneinfo import ZoneInfo

from nlnorm import Context, Mention, Result, normalize

BERLIN = ZoneInfo("Europe/Berlin")
#: Wednesday, 2 December 2026, 10:00 in Berlin (UTC+01:00).
NOW = datetime(2026, 12, 2, 10, 0, tzinfo=BERLIN)
TODAY = NOW.date()


def ctx(now: datetime | str = NOW, **fields: Any) -> Context:
    """A context at ``now`` (default :data:`NOW`), Berlin unless ``tz`` is given."""
    if isinstance(now, datetime) and now.tzinfo is None and "tz" not in fields:
        fields["tz"] = "Europe/Berlin"
    if isinstance(now, str) and "tz" not in fields:
        fields["tz"] = "Europe/Berlin"
    return Context.at(now, **fields)


def run(text: str, **fields: Any) -> Result:
    """Normalize ``text`` at :data:`NOW` (or ``now=...``) with context fields."""
    now = fields.pop("now", NOW)
    return normalize(text, ctx(now, **fields))


def one(text: str, **fields: Any) -> Mention:
    """The single mention of ``text``; fails if there is not exactly one."""
    result = run(text, **fields)
    assert len(result.mentions) == 1, (text, [m.text for m in result.mentions])
    return result.mentions[0]


def bounds(m: Mention) -> tuple[datetime | None, datetime | None]:
    """A mention's start and end as aware datetimes."""
    parse = lambda s: None if s is None else datetime.fromisoformat(s)  # noqa: E731
    return parse(m.start), parse(m.end)


def local_midnight(d: date, tz: ZoneInfo = BERLIN) -> datetime:
    """Local midnight of ``d`` (for zones and days where it exists)."""
    return datetime(d.year, d.month, d.day, tzinfo=tz)


def days(start: date, n: int) -> tuple[datetime, datetime]:
    """``[midnight of start, midnight of start + n days)`` in Berlin."""
    return local_midnight(start), local_midnight(start + timedelta(days=n))
