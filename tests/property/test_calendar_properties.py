"""Properties of the team calendars over random sprint tables, clocks and fiscal calendars.

Checked against: the generated sprint table itself (each property reads it directly); the
standard library's date arithmetic; numpy's ``is_busday`` for business days (source: numpy).
"""

from __future__ import annotations

from datetime import date, datetime, timedelta

import numpy as np
from hypothesis import assume, given, settings
from hypothesis import strategies as st

from nlnorm import Context, normalize


@st.composite
def tables(draw):  # type: ignore[no-untyped-def]
    """Consecutive sprints of one team: lengths 5-21 days, gaps 0-10 days."""
    start = draw(st.dates(date(2024, 1, 1), date(2027, 6, 1)))
    rows = []
    for i in range(draw(st.integers(2, 8))):
        length = draw(st.integers(5, 21))
        rows.append({"name": f"Reach-{i + 1}", "number": i + 1, "start": start.isoformat(),
                     "end": (start + timedelta(days=length - 1)).isoformat()})
        start += timedelta(days=length + draw(st.integers(0, 10)))
    return rows


def context(rows, now: datetime, **fields):  # type: ignore[no-untyped-def]
    return Context.at(now.isoformat(), tz="Europe/Berlin", sprints=rows, languages=["en"], **fields)


def span(m):  # type: ignore[no-untyped-def]
    return datetime.fromisoformat(m.start), datetime.fromisoformat(m.end)


def clocks(rows):  # type: ignore[no-untyped-def]
    first = date.fromisoformat(rows[0]["start"]) - timedelta(days=3)
    last = date.fromisoformat(rows[-1]["end"]) + timedelta(days=3)
    return st.datetimes(datetime(first.year, first.month, first.day), datetime(last.year, last.month, last.day))


@settings(max_examples=120, deadline=None)
@given(st.data())
def test_this_sprint_contains_now_whenever_a_sprint_does(data):
    rows = data.draw(tables())
    now = data.draw(clocks(rows))
    holding = [r for r in rows if date.fromisoformat(r["start"]) <= now.date() <= date.fromisoformat(r["end"])]
    result = normalize("this sprint", context(rows, now))
    if holding:
        start, end = span(result.mentions[0])
        assert start.replace(tzinfo=None) <= now < end.replace(tzinfo=None)
        assert result.mentions[0].kind == "sprint"


@settings(max_examples=120, deadline=None)
@given(st.data())
def test_consecutive_sprints_tile_time_without_overlap(data):
    rows = data.draw(tables())
    ctx = context(rows, datetime(2030, 1, 1))
    spans = [span(normalize(f"sprint {r['number']}", ctx).mentions[0]) for r in rows]
    for (a_start, a_end), (b_start, b_end) in zip(spans, spans[1:]):
        assert a_start < a_end <= b_start < b_end  # in order, never overlapping
    adjacent = [(a, b) for a, b in zip(rows, rows[1:])
                if date.fromisoformat(a["end"]) + timedelta(days=1) == date.fromisoformat(b["start"])]
    for a, b in adjacent:  # no gap in the table: no gap in the intervals
        assert span(normalize(f"sprint {a['number']}", ctx).mentions[0])[1] == \
            span(normalize(f"sprint {b['number']}", ctx).mentions[0])[0]


@settings(max_examples=120, deadline=None)
@given(st.data(), st.integers(1, 3))
def test_the_last_n_sprints_end_where_the_current_sprint_starts_or_now(data, n):
    rows = data.draw(tables())
    now = data.draw(clocks(rows))
    current = [i for i, r in enumerate(rows)
               if date.fromisoformat(r["start"]) <= now.date() <= date.fromisoformat(r["end"])]
    assume(current and current[0] >= n)
    m = normalize(f"the last {n} sprints", context(rows, now)).mentions[0]
    start, end = span(m)
    assert end.date() == date.fromisoformat(rows[current[0]]["start"])
    assert start.date() == date.fromisoformat(rows[current[0] - n]["start"])
    alt = m.alternatives[0]
    assert datetime.fromisoformat(alt.end).replace(tzinfo=None) == now.replace(microsecond=0) or \
        abs(datetime.fromisoformat(alt.end).replace(tzinfo=None) - now) < timedelta(seconds=1)
    m2 = normalize(f"the last {n} sprints", context(rows, now, sprint_window="with_current")).mentions[0]
    assert abs(datetime.fromisoformat(m2.end).replace(tzinfo=None) - now) < timedelta(seconds=1)


@settings(max_examples=150, deadline=None)
@given(st.datetimes(datetime(2020, 1, 1), datetime(2030, 12, 31)), st.integers(1, 30),
       st.sampled_from(["ago", "ahead"]))
def test_business_day_offsets_never_land_on_a_weekend_or_holiday(now, n, way):
    import holidays

    ctx = Context.at(now.isoformat(), tz="Europe/Berlin", locale="de_DE", holidays="DE-BY", languages=["en"])
    text = f"{n} business days ago" if way == "ago" else f"in {n} business days"
    m = normalize(text, ctx).mentions[0]
    day = datetime.fromisoformat(m.start).date()
    table = holidays.country_holidays("DE", subdiv="BY", years=range(day.year - 1, day.year + 2))
    assert np.is_busday(day, holidays=[d.isoformat() for d in table])
    assert (day < now.date()) if way == "ago" else (day > now.date())


@settings(max_examples=150, deadline=None)
@given(st.datetimes(datetime(2000, 1, 1), datetime(2040, 12, 31)), st.integers(1, 12), st.integers(1, 28))
def test_this_fiscal_quarter_and_year_contain_now(now, month, day):
    ctx = Context.at(now.isoformat(), tz="Europe/Berlin", fiscal_start=f"{month:02d}-{day:02d}", languages=["en"])
    for text in ("this fiscal quarter", "this fiscal year"):
        start, end = span(normalize(text, ctx).mentions[0])
        assert start.replace(tzinfo=None) <= now < end.replace(tzinfo=None)
