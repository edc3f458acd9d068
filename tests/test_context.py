"""Checked against: IANA tz database via zoneinfo/tzdata (zone names; Europe/Berlin is UTC+01:00
in winter and UTC+02:00 in summer, skips 02:00-03:00 on 29 March 2026 and repeats 02:00-03:00 on
25 October 2026); CLDR 49 week data via babel 2.19 (``Locale.first_week_day``, 0 = Monday);
ISO 8601 extended date-time format via ``datetime.fromisoformat``.

The reference context: how ``now``, ``tz``, ``week_start``, ``locale`` and ``languages`` are
read, what is refused and what the refusal says.
"""

from __future__ import annotations

from datetime import datetime, timedelta, timezone
from zoneinfo import ZoneInfo

import babel
import pytest

from nlnorm import Context, ContextError, NlnormError
from nlnorm.pipeline import context_with

BERLIN = ZoneInfo("Europe/Berlin")
NEW_YORK = ZoneInfo("America/New_York")
#: Wednesday 2 December 2026, 09:00 UTC = 10:00 in Berlin.
INSTANT = datetime(2026, 12, 2, 9, 0, tzinfo=timezone.utc)


def at(now=INSTANT, **fields) -> Context:
    return Context.at(now, **fields)


def refusal(**fields) -> str:
    """The message of the ContextError that ``Context.at(**fields)`` raises."""
    fields.setdefault("now", INSTANT)
    with pytest.raises(ContextError) as exc:
        Context.at(**fields)
    return str(exc.value)


# --- now and tz ---------------------------------------------------------------------------------


def test_an_aware_now_is_kept_and_converted_into_tz():
    ctx = at(INSTANT, tz="Europe/Berlin")
    assert ctx.now == INSTANT
    assert ctx.now.isoformat() == "2026-12-02T10:00:00+01:00" and ctx.now.tzinfo == BERLIN


def test_an_aware_now_in_another_zone_is_the_same_instant():
    ctx = at(datetime(2026, 12, 2, 4, 0, tzinfo=NEW_YORK), tz="Europe/Berlin")
    assert ctx.now == INSTANT and ctx.now.isoformat() == "2026-12-02T10:00:00+01:00"


def test_a_zoneinfo_now_without_tz_gives_its_zone():
    ctx = at(datetime(2026, 12, 2, 10, 0, tzinfo=BERLIN))
    assert ctx.tz == "Europe/Berlin" and ctx.now == INSTANT


@pytest.mark.parametrize("now", ["2026-12-02T10:00", "2026-12-02T10:00:00",
                                 datetime(2026, 12, 2, 10, 0)])
def test_a_naive_now_with_tz_is_wall_time_there(now):
    ctx = at(now, tz="Europe/Berlin")
    assert ctx.now == INSTANT and ctx.now.isoformat() == "2026-12-02T10:00:00+01:00"


def test_a_naive_now_in_summer_takes_the_summer_offset():
    assert at("2026-07-01T10:00", tz="Europe/Berlin").now.isoformat() == "2026-07-01T10:00:00+02:00"


def test_a_date_alone_is_midnight():
    assert at("2026-12-02", tz="Europe/Berlin").now.isoformat() == "2026-12-02T00:00:00+01:00"


def test_a_naive_now_the_clocks_skipped_is_the_first_instant_after_the_gap():
    ctx = at("2026-03-29T02:30", tz="Europe/Berlin")
    assert ctx.now.isoformat() == "2026-03-29T03:00:00+02:00"


def test_a_naive_now_the_clocks_repeated_is_the_earlier_instant_unless_fold_1():
    assert at("2026-10-25T02:30", tz="Europe/Berlin").now.isoformat() == "2026-10-25T02:30:00+02:00"
    later = at(datetime(2026, 10, 25, 2, 30, fold=1), tz="Europe/Berlin")
    assert later.now.isoformat() == "2026-10-25T02:30:00+01:00"


def test_a_naive_now_without_tz_is_refused_and_the_message_says_to_pass_tz():
    message = refusal(now="2026-12-02T10:00")
    assert message.startswith("now='2026-12-02T10:00:00' has no UTC offset and no tz was given")
    assert "pass tz=" in message


def test_a_fixed_offset_now_without_tz_is_refused():
    for now in ("2026-12-02T10:00+01:00", datetime(2026, 12, 2, 10, tzinfo=timezone(timedelta(hours=1)))):
        message = refusal(now=now)
        assert "fixed UTC offset but no tz was given" in message and "pass tz=" in message


@pytest.mark.parametrize("now", ["2026-12-02T09:00Z", "2026-12-02T09:00z", "2026-12-02T09:00+00:00",
                                 "2026-12-02T09:00-00:00", INSTANT])
def test_a_utc_now_without_tz_is_read_in_utc(now):
    ctx = at(now)
    assert (ctx.tz, ctx.now) == ("UTC", INSTANT)
    assert ctx.now.isoformat() == "2026-12-02T09:00:00+00:00"


@pytest.mark.parametrize(("now", "fragment"), [
    ("last Tuesday", "now='last Tuesday' is not an ISO 8601 date-time"),
    ("2026-13-02T10:00", "now='2026-13-02T10:00' is not an ISO 8601 date-time"),
    ("", "now='' is not an ISO 8601 date-time"),
    (1764666000, "now=1764666000 must be a datetime or an ISO 8601 string"),
    (None, "now=None must be a datetime or an ISO 8601 string"),
])
def test_a_now_that_is_not_a_date_time_is_refused(now, fragment):
    assert fragment in refusal(now=now, tz="Europe/Berlin")


@pytest.mark.parametrize(("tz", "suggestion"), [
    ("Europe/Berln", "Europe/Berlin"),
    ("europe/berlin", "Europe/Berlin"),
    ("America/New_Yrok", "America/New_York"),
    ("Berlin", "Europe/Berlin"),
    ("new york", "America/New_York"),
])
def test_an_unknown_tz_is_refused_with_the_close_zone_name(tz, suggestion):
    message = refusal(tz=tz)
    assert message == f"tz={tz!r} is not an IANA time zone; did you mean {suggestion!r}?"


@pytest.mark.parametrize("tz", ["Mars/Olympus_Base", "../../etc/passwd", "/etc/localtime"])
def test_a_tz_that_is_no_zone_at_all_is_refused_without_a_guess(tz):
    message = refusal(tz=tz)
    assert message.startswith(f"tz={tz!r} is not an IANA time zone") and "did you mean" not in message


def test_a_tz_must_be_a_string():
    assert refusal(tz=5).startswith("tz=5")


# --- week_start -----------------------------------------------------------------------------------


@pytest.mark.parametrize(("given", "read"), [
    ("monday", "monday"), ("Monday", "monday"), ("SUNDAY", "sunday"), (" saturday ", "saturday"),
    ("mon", "monday"), ("mo", "monday"), ("su", "sunday"), ("sat", "saturday"),
    (0, "monday"), (5, "saturday"), (6, "sunday"),
])
def test_week_start_accepts_names_prefixes_and_weekday_numbers(given, read):
    assert at(tz="UTC", week_start=given).week_start == read


@pytest.mark.parametrize("given", ["thursday", "friday", "m", "s", "lundi", 7, -1, 1, True, 1.0])
def test_week_start_refuses_other_days_and_values(given):
    message = refusal(week_start=given)
    assert message == (f"week_start={given!r} is not supported; expected 'monday', 'sunday' "
                       "or 'saturday'")


def test_first_weekday_is_a_number_as_date_weekday():
    assert [at(week_start=w).first_weekday for w in ("monday", "saturday", "sunday")] == [0, 5, 6]


# --- the default week start: CLDR week data through babel -------------------------------------


@pytest.mark.parametrize(("locale", "cldr_day"), [
    ("en_US", 6), ("en_GB", 0), ("de", 0), ("pt_PT", 6), ("fa_IR", 5), ("dv_MV", 4),
])
def test_cldr_first_days_the_defaults_lean_on(locale, cldr_day):
    assert babel.Locale.parse(locale).first_week_day == cldr_day


@pytest.mark.parametrize(("locale", "week_start"), [
    ("en_US", "sunday"),
    ("en_GB", "monday"),
    ("de", "monday"),
    ("pt_PT", "sunday"),     # CLDR 49 gives Portugal Sunday
    ("fa_IR", "saturday"),
    ("dv_MV", "monday"),     # CLDR says Friday, which is not a week start nlnorm offers
    ("en", "monday"),        # no territory: CLDR's world default, as ISO 8601
])
def test_the_default_week_start_comes_from_the_locale(locale, week_start):
    assert at(locale=locale).week_start == week_start


def test_a_given_week_start_wins_over_the_locale():
    assert at(locale="en_US", week_start="monday").week_start == "monday"


# --- locale and languages -------------------------------------------------------------------------


@pytest.mark.parametrize(("given", "read"), [
    ("en-us", "en_US"), ("EN_us", "en_US"), ("en_US", "en_US"), ("en-GB", "en_GB"),
    ("de-at", "de_AT"), ("en", "en"),
])
def test_locale_spellings_become_cldr_ids(given, read):
    assert at(locale=given).locale == read


@pytest.mark.parametrize("given", ["xx", "xx_YY", "english", ""])
def test_an_unknown_locale_is_refused_naming_it(given):
    message = refusal(locale=given)
    assert message.startswith(f"locale={given!r} is not a CLDR locale")
    assert "expected e.g. 'en', 'en_US'" in message


def test_a_locale_must_be_a_string():
    assert refusal(locale=["en"]) == "locale=['en'] must be a string such as 'en_US'"


@pytest.mark.parametrize("given", ["en", "EN", "en,en", ["en"], ("en",), [" en "]])
def test_languages_as_a_string_or_a_list(given):
    assert at(languages=given).languages == ("en",)


def test_the_default_languages_are_every_deep_language_english_first():
    from nlnorm.locale import available_languages

    langs = at().languages
    assert langs[0] == "en" and set(langs) == set(available_languages())


def test_an_iso_639_2_code_and_a_regional_locale_name_the_deep_language():
    # CLDR via babel resolves "eng" to en_US; a deep language is read from its file whatever
    # the region.
    assert at(languages="eng").languages == ("en",)
    assert at(languages=["en_GB", "en"]).languages == ("en",)


def test_a_language_without_a_locale_file_is_read_from_cldr_alone():
    assert at(languages=["sw", "es_MX"]).languages[0] == "sw"


@pytest.mark.parametrize(("given", "fragment"), [
    ("xx", "language 'xx' is not available"),
    (["en", "xx"], "language 'xx' is not available"),
    ("enn", "did you mean 'en'?"),
    ([], "must name at least one language"),
    (5, "must name at least one language"),
])
def test_unknown_languages_are_refused_naming_them(given, fragment):
    assert fragment in refusal(languages=given)


@pytest.mark.parametrize(("field", "value"), [("bias", "sideways"), ("window_reading", "sliding"),
                                              ("weekday_reading", "closest"), ("date_order", "XYZ")])
def test_a_bad_policy_is_refused_naming_the_field_and_value(field, value):
    assert refusal(**{field: value}).startswith(f"{field}={value!r}: Input should be ")


def test_an_unknown_field_is_refused_naming_it():
    assert refusal(timezone="UTC") == "timezone='UTC': Extra inputs are not permitted"


def test_the_constructor_refuses_as_at_does():
    with pytest.raises(ContextError, match="no tz was given"):
        Context(now="2026-12-02T10:00")


# --- the model ------------------------------------------------------------------------------------


def test_context_error_is_a_value_error_and_an_nlnorm_error():
    assert issubclass(ContextError, ValueError) and issubclass(ContextError, NlnormError)
    with pytest.raises(ValueError):
        at(tz="Nowhere/Atall")


def test_a_context_is_frozen():
    ctx = at(tz="Europe/Berlin")
    with pytest.raises(ValueError, match="frozen"):
        ctx.tz = "UTC"
    assert ctx.tz == "Europe/Berlin"


def test_equal_contexts_are_equal_and_hash_alike():
    one = at("2026-12-02T10:00", tz="Europe/Berlin")
    two = at(datetime(2026, 12, 2, 4, 0, tzinfo=NEW_YORK), tz="Europe/Berlin")
    assert one == two and hash(one) == hash(two) and len({one, two}) == 1
    assert one != at(tz="UTC")


def test_replace_changes_fields_and_leaves_the_original_alone():
    ctx = at(tz="Europe/Berlin")
    changed = ctx.replace(bias="future", week_start="sunday")
    assert (changed.bias, changed.week_start, changed.now) == ("future", "sunday", ctx.now)
    assert (ctx.bias, ctx.week_start) == ("past", "monday")


def test_replace_validates_again():
    with pytest.raises(ContextError, match="week_start='friday'"):
        at().replace(week_start="friday")


def test_replace_tz_keeps_the_instant():
    moved = at(tz="Europe/Berlin").replace(tz="America/New_York")
    assert moved.now == INSTANT and moved.now.isoformat() == "2026-12-02T04:00:00-05:00"


def test_replace_locale_derives_a_derived_week_start_again_and_keeps_a_given_one():
    derived = at(locale="en_GB")
    assert derived.replace(locale="en_US").week_start == "sunday"
    assert derived.replace(tz="Europe/Berlin").replace(locale="en_US").week_start == "sunday"
    given = at(locale="en_GB", week_start="saturday")
    assert given.replace(locale="en_US").week_start == "saturday"
    assert given.replace(week_start=None).replace(locale="en_US").week_start == "sunday"


def test_context_with_keeps_the_instant_when_only_tz_changes():
    ctx = at(tz="Europe/Berlin")
    moved = context_with(ctx, {"tz": "America/New_York"})
    assert moved.now == ctx.now == INSTANT and moved.tz == "America/New_York"
    assert moved.now.utcoffset() == timedelta(hours=-5)


def test_context_with_a_new_now_and_tz_reads_the_now_there():
    moved = context_with(at(tz="Europe/Berlin"), {"now": "2026-12-02T04:00", "tz": "America/New_York"})
    assert moved.now == INSTANT


def test_context_with_refuses_a_bad_override():
    with pytest.raises(ContextError, match="tz='Europe/Berln'.*did you mean 'Europe/Berlin'"):
        context_with(at(), {"tz": "Europe/Berln"})
