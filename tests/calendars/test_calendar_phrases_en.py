"""English phrases of the team's calendars: sprints, fiscal years and quarters, business days.

Checked against: the invented sprint table in calendar_cases (read directly), numpy's
``busday_offset`` for business days (source: numpy; weekend from CLDR for en/de territories via
babel: Saturday and Sunday), pandas' ``Q-MAR`` periods for fiscal quarters (source: pandas),
the ``holidays`` package for public holidays.
"""

from __future__ import annotations

from datetime import date, timedelta

import pytest

from nlnorm import normalize
from tests.calendars.calendar_cases import (
    OTHER_TEAM, SPRINTS, business_day, calendar_context, fiscal_quarter, fiscal_year, midnight, sprint_span,
)
from tests.helpers import NOW, TODAY, bounds


def mention(text, **fields):  # type: ignore[no-untyped-def]
    result = normalize(text, calendar_context(languages=["en"], **fields))
    assert len(result.mentions) == 1, (text, [m.text for m in result.mentions])
    return result.mentions[0]


@pytest.mark.parametrize("text, sprint", [
    ("bugs in this sprint", "Inkwell"),
    ("what is in the current sprint", "Inkwell"),
    ("stories of the active sprint", "Inkwell"),
    ("what slipped from the last sprint", "Foxglove"),
    ("tickets of the previous sprint", "Foxglove"),
    ("what is planned for next sprint", "Harbor-7"),
    ("the upcoming sprint", "Harbor-7"),
    ("the sprint before last", "Bramblegate"),
    ("bugs from sprint 42", "Bramblegate"),
    ("scope of sprint #43", "Foxglove"),
    ("which bugs in the Foxglove sprint are still open", "Foxglove"),
    ("Sprint Harbor-7 goals", "Harbor-7"),
    ("sprint harbor 7 goals", "Harbor-7"),
])
def test_one_sprint(text, sprint):
    m = mention(text)
    assert m.kind == "sprint"
    assert bounds(m) == sprint_span(sprint)


def test_the_last_three_sprints_are_the_completed_ones_with_the_current_one_as_the_alternative():
    m = mention("velocity of the last 3 sprints")
    start, _ = sprint_span("Tidewrack")
    end, _ = sprint_span("Inkwell")  # ends where the current sprint starts
    assert bounds(m) == (start, end)
    alt = m.alternatives[0]
    assert alt.policy == "sprint_window=with_current"
    assert (alt.start, alt.end) == (sprint_span("Bramblegate")[0].isoformat(), NOW.isoformat())


def test_sprint_window_with_current_selects_the_other_reading():
    m = mention("velocity of the last 3 sprints", sprint_window="with_current")
    assert bounds(m) == (sprint_span("Bramblegate")[0], NOW)


@pytest.mark.parametrize("text, start, end", [
    ("bugs opened since sprint 42", sprint_span("Bramblegate")[0], None),
    ("closed before sprint 43", None, sprint_span("Foxglove")[0]),
    ("between sprint 41 and sprint 43", sprint_span("Tidewrack")[0], sprint_span("Foxglove")[1]),
    ("sprints 41 to 43", sprint_span("Tidewrack")[0], sprint_span("Foxglove")[1]),
    ("since the Foxglove sprint", sprint_span("Foxglove")[0], None),
])
def test_sprint_bounds(text, start, end):
    assert bounds(mention(text)) == (start, end)


def test_in_a_gap_this_sprint_is_the_one_that_ended_and_the_next_one_is_the_alternative():
    # 2026-11-11 falls in the offsite week between Bramblegate and Foxglove.
    m = mention("bugs in this sprint", now="2026-11-11T10:00")
    assert bounds(m) == sprint_span("Bramblegate")
    assert bounds_of(m.alternatives[0]) == sprint_span("Foxglove")
    assert "between sprints" in m.note
    assert bounds(mention("last sprint", now="2026-11-11T10:00")) == sprint_span("Bramblegate")
    assert bounds(mention("next sprint", now="2026-11-11T10:00")) == sprint_span("Foxglove")


def bounds_of(alt):  # type: ignore[no-untyped-def]
    from datetime import datetime

    return datetime.fromisoformat(alt.start), datetime.fromisoformat(alt.end)


def test_several_teams_give_one_reading_per_team():
    ctx = calendar_context(languages=["en"], sprints=SPRINTS + OTHER_TEAM, team=None)
    m = normalize("this sprint", ctx).mentions[0]
    assert bounds(m) == sprint_span("Lantern 9")  # teams in order; the reason is given
    assert "several teams" in m.note
    assert [a.policy for a in m.alternatives] == ["team=Wrenfold"]
    assert bounds_of(m.alternatives[0]) == sprint_span("Inkwell")


def test_a_team_in_the_context_selects_its_calendar():
    ctx = calendar_context(languages=["en"], sprints=SPRINTS + OTHER_TEAM, team="Lanternfish")
    assert bounds(normalize("next sprint", ctx).mentions[0]) == sprint_span("Lantern 10")


def test_a_numbered_sprint_is_looked_up_in_every_team():
    ctx = calendar_context(languages=["en"], sprints=SPRINTS + OTHER_TEAM, team="Wrenfold")
    assert bounds(normalize("sprint 9", ctx).mentions[0]) == sprint_span("Lantern 9")


def test_no_sprint_table_no_sprint_mention():
    from tests.helpers import run

    assert run("bugs from last sprint", languages=["en"]).mentions == ()
    assert run("bugs from sprint 42", languages=["en"]).mentions == ()


def test_an_unknown_sprint_gives_no_mention():
    assert normalize("sprint 99 scope", calendar_context(languages=["en"])).mentions == ()
    assert normalize("the Marrowbone sprint", calendar_context(languages=["en"])).mentions == ()


# --- business days (source: numpy.busday_offset; Saturday/Sunday weekend from CLDR for DE) ---


@pytest.mark.parametrize("text, n", [
    ("tickets closed 3 business days ago", -3),
    ("what happened 1 working day ago", -1),
    ("the last working day", -1),
    ("the previous business day", -1),
    ("due the next business day", 1),
    ("in 3 business days", 3),
])
def test_business_days(text, n):
    day = business_day(n)
    assert bounds(mention(text, locale="de_DE")) == (midnight(day), midnight(day + timedelta(days=1)))


def test_in_the_last_10_business_days_runs_to_now():
    first = business_day(-10)
    assert bounds(mention("bugs opened in the last 10 business days", locale="de_DE")) == (midnight(first), NOW)


def test_within_5_working_days_runs_from_now():
    last = business_day(5)
    assert bounds(mention("answered within 5 working days", locale="de_DE")) == (NOW, midnight(last + timedelta(days=1)))


def test_public_holidays_are_skipped():
    # Source: holidays package; 2026-12-25/26 are public holidays in Bavaria.
    import holidays

    table = [d.isoformat() for d in holidays.country_holidays("DE", subdiv="BY", years=2026)]
    ctx = calendar_context(languages=["en"], locale="de_DE", holidays="DE-BY", now="2026-12-23T10:00")
    m = normalize("due in 2 business days", ctx).mentions[0]
    day = __import__("numpy").busday_offset(date(2026, 12, 23), 2, roll="backward", holidays=table).astype(date)
    assert day == date(2026, 12, 28)
    assert bounds(m) == (midnight(day), midnight(day + timedelta(days=1)))


# --- fiscal years and quarters (source: pandas Q-MAR / Y-MAR periods) ----------------------


@pytest.mark.parametrize("text, expected", [
    ("revenue this fiscal year", fiscal_year(2027)),
    ("releases in FY27", fiscal_year(2027)),
    ("releases in FY2026", fiscal_year(2026)),
    ("this fiscal quarter", fiscal_quarter(TODAY)),
    ("last fiscal quarter", fiscal_quarter(TODAY, -1)),
    ("next fiscal quarter", fiscal_quarter(TODAY, 1)),
    ("Q1 FY27 releases", fiscal_quarter(date(2026, 4, 1))),
    ("fiscal Q3", fiscal_quarter(date(2026, 10, 1))),
])
def test_fiscal(text, expected):
    assert bounds(mention(text)) == expected


def test_fiscal_year_names_have_the_other_convention_as_an_alternative():
    m = mention("releases in FY27")
    alt = m.alternatives[0]
    assert alt.policy == "fiscal_name=start"
    assert bounds_of(alt) == fiscal_year(2028)


def test_plain_quarters_stay_calendar_quarters_unless_the_context_says_fiscal():
    m = mention("bugs closed in Q3")
    assert bounds(m) == (midnight(date(2026, 7, 1)), midnight(date(2026, 10, 1)))
    m = mention("bugs closed in Q3", quarters="fiscal")
    assert bounds(m) == fiscal_quarter(date(2026, 10, 1))
    assert "quarters=calendar" in [a.policy for a in m.alternatives]
    m = mention("this quarter", quarters="fiscal")
    assert bounds(m) == fiscal_quarter(TODAY)
