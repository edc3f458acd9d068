"""Checked against: hand-computed calendar facts (2 December 2026 is a Wednesday in ISO week 49);
IANA tz database via zoneinfo/tzdata (Europe/Berlin UTC+01:00, America/New_York UTC-05:00 in
December 2026); CLDR 49 week data via babel 2.19 (en_US weeks start on Sunday); the Python
profiler hook ``sys.setprofile``, whose ``c_call`` events see every call of a C function such
as ``datetime.now`` made from Python code.

The Python API: ``normalize_many`` for batches, the stages on their own, and ``normalize`` as a
pure function of its text and context.
"""

from __future__ import annotations

import datetime as dt
import itertools
import sys
import time
from collections.abc import Iterator

import pytest

import nlnorm
from nlnorm import STAGES, Context, Result, annotate, normalize, normalize_many, parse, prepare
from nlnorm import resolve, scan
from nlnorm.pipeline import normalize_item
from tests.helpers import NOW, ctx

QUESTIONS = [
    "which bugs were created last week",
    "who owns ticket WRN-2025",
    "tickets closed between 1 March and 15 April 2026 with priority 2",
    "what shipped since 2026-W40 or before March",
    "comments from yesterday afternoon, this weekend and 03/04/2026",
    "incidents opened in the last 3 hours",
    "what broke last Monday and what is due next Thursday",
    "Bugs FROM last WEEK — ﬁxed since ２０２６–01–05",
    "",
]


def values(result: Result) -> list[str]:
    return [m.value for m in result.mentions]


# --- normalize_many -------------------------------------------------------------------------------


def test_normalize_many_takes_strings_and_gives_one_result_each_in_order():
    results = list(normalize_many(["closed today", "no time here", "closed yesterday"], ctx()))
    assert [values(r) for r in results] == [["2026-12-02"], [], ["2026-12-01"]]
    assert all(r.error is None and r.id is None for r in results)


def test_normalize_many_takes_mappings_with_ids_and_echoes_them():
    items = [{"id": "a", "text": "closed today"}, {"id": 7, "text": "closed last week"},
             {"id": 0.5, "text": "nothing"}, {"text": "closed yesterday"}]
    results = list(normalize_many(items, ctx()))
    assert [r.id for r in results] == ["a", 7, 0.5, None]
    assert [values(r) for r in results] == [["2026-12-02"], ["2026-W48"], [], ["2026-12-01"]]


def test_normalize_many_mixes_strings_and_mappings():
    results = list(normalize_many(["closed today", {"id": 2, "text": "closed today"}], ctx()))
    assert [(r.id, values(r)) for r in results] == [(None, ["2026-12-02"]), (2, ["2026-12-02"])]


def test_each_result_equals_normalize_of_its_item():
    c = ctx()
    assert list(normalize_many(QUESTIONS, c)) == [normalize(q, c) for q in QUESTIONS]


def test_normalize_many_of_nothing_is_nothing():
    assert list(normalize_many([], ctx())) == []


def test_normalize_many_is_lazy():
    taken: list[int] = []

    def items() -> Iterator[str]:
        for n in itertools.count():
            taken.append(n)
            yield f"closed {n} days ago"

    results = normalize_many(items(), ctx())
    assert taken == [] and iter(results) is results
    assert values(next(results)) == ["2026-12-02"] and taken == [0]
    assert [values(r) for r in itertools.islice(results, 2)] == [["2026-12-01"], ["2026-11-30"]]
    assert taken == [0, 1, 2]


@pytest.mark.parametrize(
    ("override", "text", "value", "start"),
    [
        ({"tz": "America/New_York"}, "closed today", "2026-12-02", "2026-12-02T00:00:00-05:00"),
        ({"now": "2026-11-20T09:00:00+01:00"}, "closed today", "2026-11-20",
         "2026-11-20T00:00:00+01:00"),
        ({"now": "2026-11-20T09:00", "tz": "America/New_York"}, "closed today", "2026-11-20",
         "2026-11-20T00:00:00-05:00"),
        ({"now": dt.datetime(2026, 11, 20, 9, tzinfo=dt.timezone.utc)}, "closed today",
         "2026-11-20", "2026-11-20T00:00:00+01:00"),
        ({"week_start": "sunday"}, "closed this week", "2026-11-29/P1W",
         "2026-11-29T00:00:00+01:00"),
        ({"locale": "en_US"}, "closed this week", "2026-11-29/P1W", "2026-11-29T00:00:00+01:00"),
        ({"locale": "en_GB"}, "fixed on 03/04/2026", "2026-04-03", "2026-04-03T00:00:00+02:00"),
        ({"bias": "future"}, "released in March", "2027-03", "2027-03-01T00:00:00+01:00"),
        ({"window_reading": "calendar"}, "bugs in the last 7 days",
         "2026-11-25T00:00:00+01:00/2026-12-02T00:00:00+01:00", "2026-11-25T00:00:00+01:00"),
        ({"weekday_reading": "week"}, "what broke last Monday", "2026-11-23",
         "2026-11-23T00:00:00+01:00"),
        ({"date_order": "DMY"}, "fixed on 03/04/2026", "2026-04-03", "2026-04-03T00:00:00+02:00"),
        ({"lang": "en"}, "closed today", "2026-12-02", "2026-12-02T00:00:00+01:00"),
        ({"languages": ["en"]}, "closed today", "2026-12-02", "2026-12-02T00:00:00+01:00"),
    ],
    ids=["tz", "now", "naive-now-with-tz", "datetime-now", "week_start", "locale-week",
         "locale-dates", "bias", "window_reading", "weekday_reading", "date_order", "lang",
         "languages"],
)
def test_an_item_overrides_the_context_for_itself_only(override, text, value, start):
    plain = normalize(text, ctx())
    results = list(normalize_many([text, {"text": text, **override}, text], ctx()))
    assert results[0] == results[2] == plain
    m = results[1].mentions[0]
    assert (m.value, m.start) == (value, start)


def test_an_item_tz_keeps_the_instant_of_the_shared_now():
    result = next(normalize_many([{"text": "today", "tz": "America/New_York"}], ctx()))
    assert result.reference.now == "2026-12-02T04:00:00-05:00"


def test_an_item_locale_keeps_a_week_start_the_context_was_given():
    shared = ctx(week_start="saturday")
    result = next(normalize_many([{"text": "closed this week", "locale": "en_US"}], shared))
    assert result.reference.week_start == "saturday"


def test_a_none_override_means_no_override():
    result = next(normalize_many([{"text": "closed today", "tz": None, "now": None}], ctx()))
    assert result == normalize("closed today", ctx())


@pytest.mark.parametrize(
    ("item", "want_id", "fragments"),
    [
        (5, None, ["expected a JSON object with 'text', got number"]),
        (None, None, ["expected a JSON object with 'text', got null"]),
        (["closed today"], None, ["expected a JSON object with 'text', got array"]),
        ({"id": 1, "question": "closed today"}, 1, ["field 'text'", "missing", "'question'"]),
        ({"id": 2, "text": None}, 2, ["field 'text'", "null"]),
        ({"id": 3, "text": 3.5}, 3, ["field 'text' must be a string, got number"]),
        ({"id": 4, "text": "today", "tz": "Europe/Berln"}, 4, ["did you mean 'Europe/Berlin'?"]),
        ({"id": 5, "text": "today", "now": "2026-12-02T10:00"}, 5, ["no UTC offset", "tz"]),
        ({"id": 6, "text": "today", "now": dt.datetime(2026, 12, 2, 10)}, 6, ["no UTC offset"]),
        ({"id": 7, "text": "today", "now": "soon"}, 7, ["now='soon' is not an ISO 8601"]),
        ({"id": 8, "text": "today", "week_start": "friday"}, 8, ["week_start='friday'"]),
        ({"id": 9, "text": "today", "locale": "xx_YY"}, 9, ["locale='xx_YY'"]),
        ({"id": 10, "text": "today", "lang": "xx"}, 10, ["'xx'", "not available"]),
        ({"id": 11, "text": "today", "bias": "sideways"}, 11, ["bias='sideways'"]),
    ],
    ids=["number", "null", "list", "no-text", "null-text", "text-number", "tz", "naive-now",
         "naive-datetime", "now-not-iso", "week_start", "locale", "lang", "bias"],
)
def test_a_bad_item_gives_an_error_result_and_the_rest_go_on(item, want_id, fragments):
    before, bad, after = normalize_many(["closed today", item, {"id": "z", "text": "today"}],
                                        ctx())
    assert before.error is None and after.error is None and after.id == "z"
    assert bad.id == want_id and bad.mentions == () and bad.reference is None
    for fragment in fragments:
        assert fragment in bad.error, (fragment, bad.error)


def test_an_error_result_keeps_the_text_when_it_is_a_string():
    result = normalize_item({"id": 1, "text": "closed today", "tz": "Nowhere"}, ctx())
    assert (result.id, result.text) == (1, "closed today") and result.error


def test_normalize_refuses_a_text_that_is_not_a_string():
    with pytest.raises(nlnorm.InputError):
        normalize(42, ctx())  # type: ignore[arg-type]


# --- the stages -----------------------------------------------------------------------------------


def test_the_stages_are_the_public_functions_in_order():
    assert STAGES == (prepare, scan, parse, resolve, annotate)
    assert [f.__name__ for f in STAGES] == ["prepare", "scan", "parse", "resolve", "annotate"]


@pytest.mark.parametrize("text", QUESTIONS)
def test_the_stages_composed_by_hand_equal_normalize(text):
    c = ctx()
    prepared = prepare(text)
    candidates = scan(prepared, c)
    parsed = parse(candidates, c)
    resolved = resolve(parsed, c)
    assert annotate(prepared, resolved, c) == normalize(text, c)
    assert annotate(prepared, resolved, c, id="q") == normalize(text, c, id="q")


def test_each_stage_can_be_looked_at_on_its_own():
    c = ctx()
    prepared = prepare("Bugs closed LAST week")
    assert (prepared.original, prepared.text) == ("Bugs closed LAST week", "bugs closed last week")
    candidates = scan(prepared, c)
    assert [prepared.text[x.span.start:x.span.end] for x in candidates] == ["last week"]
    parsed = parse(candidates, c)
    assert len(parsed) == 1 and parsed[0].meaning is not None
    resolved = resolve(parsed, c)
    assert [r.chosen.interval.value for r in resolved] == ["2026-W48"]
    result = annotate(prepared, resolved, c)
    assert result.rewritten == "Bugs closed from 2026-11-23 to 2026-11-29 inclusive"
    assert result.mentions[0].text == "LAST week"


def test_a_stage_gives_the_same_output_each_time():
    c = ctx()
    prepared = prepare(QUESTIONS[4])
    assert prepare(QUESTIONS[4]) == prepared
    assert scan(prepared, c) == scan(prepared, c)
    assert parse(scan(prepared, c), c) == parse(scan(prepared, c), c)


# --- normalize is pure ----------------------------------------------------------------------------


def test_the_same_input_gives_an_equal_output():
    c = ctx()
    first = [normalize(q, c) for q in QUESTIONS]
    for q in QUESTIONS:  # other contexts in between leave nothing behind
        normalize(q, ctx(tz="America/New_York", week_start="sunday", bias="future"))
    again = [normalize(q, Context.at(NOW, tz="Europe/Berlin")) for q in QUESTIONS]
    assert first == again
    assert [r.model_dump_json() for r in first] == [r.model_dump_json() for r in again]


def test_a_later_now_changes_the_output_only_through_the_context():
    early, late = ctx(), ctx(NOW + dt.timedelta(days=7))
    assert values(normalize("closed today", early)) == ["2026-12-02"]
    assert values(normalize("closed today", late)) == ["2026-12-09"]
    assert values(normalize("closed today", early)) == ["2026-12-02"]


#: The wall-clock functions, by name, with the class or module each belongs to.
CLOCKS = {"now": (dt.datetime,), "utcnow": (dt.datetime,), "today": (dt.datetime, dt.date),
          "time": (time,), "time_ns": (time,), "localtime": (time,), "gmtime": (time,),
          "ctime": (time,), "asctime": (time,), "strftime": (time,)}


def clock_reads(run) -> list[str]:
    """The wall-clock functions ``run()`` calls, as seen by the profiler."""
    seen: list[str] = []

    def watch(frame, event, arg):
        if event == "c_call":
            owner = getattr(arg, "__self__", None)
            if any(owner is o for o in CLOCKS.get(arg.__name__, ())):
                seen.append(arg.__qualname__)

    sys.setprofile(watch)
    try:
        run()
    finally:
        sys.setprofile(None)
    return seen


def test_the_profiler_sees_a_clock_read():
    assert clock_reads(lambda: dt.datetime.now(dt.timezone.utc)) == ["datetime.now"]
    assert clock_reads(time.time) == ["time"]


def test_normalize_reads_no_clock():
    c = ctx()
    assert clock_reads(lambda: [normalize(q, c) for q in QUESTIONS]) == []


def test_normalize_many_and_new_contexts_read_no_clock():
    items = [{"text": q, "tz": "America/New_York", "locale": "en_US"} for q in QUESTIONS]
    assert clock_reads(lambda: list(normalize_many(items, ctx()))) == []
    assert clock_reads(lambda: Context.at("2026-12-02T10:00", tz="Asia/Tokyo")) == []


class _Meta(type):
    def __instancecheck__(cls, obj):
        return isinstance(obj, cls.__mro__[1])

    def __subclasscheck__(cls, sub):
        return issubclass(sub, cls.__mro__[1])


def _no_clock(*args, **kwargs):
    raise AssertionError("nlnorm read the system clock")


class ClocklessDatetime(dt.datetime, metaclass=_Meta):
    now = utcnow = today = classmethod(_no_clock)


class ClocklessDate(dt.date, metaclass=_Meta):
    today = classmethod(_no_clock)


def test_normalize_works_when_datetime_in_nlnorm_modules_has_no_clock(monkeypatch):
    c = ctx()
    expected = [normalize(q, c) for q in QUESTIONS]
    patched = 0
    for name, module in list(sys.modules.items()):
        if name == "nlnorm" or name.startswith("nlnorm."):
            for attr, stand_in in (("datetime", ClocklessDatetime), ("date", ClocklessDate)):
                if getattr(module, attr, None) is stand_in.__mro__[1]:
                    monkeypatch.setattr(module, attr, stand_in)
                    patched += 1
    assert patched >= 5
    assert [normalize(q, c) for q in QUESTIONS] == expected
    assert all(values(normalize(q, ctx(tz="America/New_York"))) is not None for q in QUESTIONS)
