"""Hypothesis strategies shared by the property tests: reference instants and week starts.

Reference instants are drawn from 1900 to 2100 in a sample of IANA zones (tzdata via zoneinfo)
chosen for their daylight-saving oddities:

- Europe/Berlin, America/New_York: one-hour changes at night (2026-03-29, 2026-03-08,
  2026-11-01 are pinned with ``@example``);
- Europe/Dublin: "negative" daylight saving in tzdata (winter is the saved time);
- Australia/Lord_Howe: a half-hour change, so one wall-clock hour lasts 30 or 90 minutes;
- Pacific/Apia: skipped the whole of 2011-12-30 when it crossed the date line;
- Asia/Kolkata: a half-hour offset, and odd historic offsets;
- America/Santiago: changes at midnight, so some days have no 00:00 (2024-09-08);
- UTC.

Every instant comes from ``allow_imaginary=False``: it exists in its zone. Nothing reads the
system clock.
"""

from __future__ import annotations

from datetime import datetime
from zoneinfo import ZoneInfo

from hypothesis import strategies as st

ZONE_NAMES = (
    "Europe/Berlin",
    "America/New_York",
    "Europe/Dublin",
    "Australia/Lord_Howe",
    "Pacific/Apia",
    "Asia/Kolkata",
    "America/Santiago",
    "UTC",
)
ZONES = tuple(ZoneInfo(name) for name in ZONE_NAMES)
WEEK_STARTS = ("monday", "sunday", "saturday")
WEEKDAY_INDEX = {"monday": 0, "sunday": 6, "saturday": 5}

#: Aware reference instants, 1900-2100, in the zones above, never inside a gap.
moments = st.datetimes(
    min_value=datetime(1900, 1, 1),
    max_value=datetime(2100, 12, 31, 23, 59, 59),
    timezones=st.sampled_from(ZONES),
    allow_imaginary=False,
)
week_starts = st.sampled_from(WEEK_STARTS)

SANTIAGO = ZoneInfo("America/Santiago")
APIA = ZoneInfo("Pacific/Apia")
NEW_YORK = ZoneInfo("America/New_York")
BERLIN = ZoneInfo("Europe/Berlin")
LORD_HOWE = ZoneInfo("Australia/Lord_Howe")

#: The pinned days: (instant, why). Each exists in its zone.
PINNED = (
    # 2024-09-08 in Santiago starts at 01:00 (clocks went from 00:00 to 01:00).
    datetime(2024, 9, 8, 12, 0, tzinfo=SANTIAGO),
    # Apia skipped 2011-12-30; the 31st follows the 29th.
    datetime(2011, 12, 31, 9, 30, tzinfo=APIA),
    # New York springs forward at 02:00 on 2026-03-08.
    datetime(2026, 3, 8, 3, 30, tzinfo=NEW_YORK),
    # New York falls back at 02:00 on 2026-11-01; 01:30 happens twice (fold=1: the second).
    datetime(2026, 11, 1, 1, 30, fold=1, tzinfo=NEW_YORK),
    # Berlin springs forward at 02:00 on 2026-03-29.
    datetime(2026, 3, 29, 3, 15, tzinfo=BERLIN),
    # Lord Howe falls back half an hour at 02:00 on 2026-04-05: 01:30-02:00 happens twice.
    datetime(2026, 4, 5, 1, 10, tzinfo=LORD_HOWE),
    datetime(2026, 4, 5, 1, 45, fold=1, tzinfo=LORD_HOWE),
)


def with_pinned(**extra: object):  # type: ignore[no-untyped-def]
    """Decorate a ``@given(now=..., week_start=..., ...)`` test with the pinned instants as
    ``@example``s, cycling through the week starts; ``extra`` gives the other arguments."""
    from hypothesis import example

    def wrap(test):  # type: ignore[no-untyped-def]
        for i, moment in enumerate(PINNED):
            for j in range(len(WEEK_STARTS)):
                test = example(now=moment, week_start=WEEK_STARTS[(i + j) % 3], **extra)(test)
        return test

    return wrap
