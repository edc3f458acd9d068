"""Turkish phrases of the team's calendars: sprints, fiscal years and quarters, business days.

Checked against: the invented sprint table in calendar_cases (read directly), numpy's
``busday_offset`` for business days (source: numpy; the Saturday-Sunday weekend of tr_TR from
Unicode CLDR 49 via babel 2.19), pandas' ``Q-MAR`` / ``Y-MAR`` periods for fiscal quarters and
years (source: pandas). The Turkish phrasing is common practice of Turkish work-tracker
questions, written from knowledge of the language (the English "sprint" and "FY" as Turkish
teams write them, "iş günü", "mali yıl", "mali çeyrek"; no published source).

Decisions (traps): "sprint" with no direction, number or name (a running race, "sprint attı",
"sprint planlaması") names no sprint; "her sprintte" (every sprint) recurs; "ayın son iş günü"
(the last business day of the month) is left out; a bare "mali yıl" names no particular year;
"3 sprint sürdü" (took three sprints) is a length, not a window. "önceki"/"sonraki" alone are
no direction words (as for weeks), but before a sprint or a business day they are.
"""

from __future__ import annotations

from datetime import date, timedelta

import pytest

from nlnorm import normalize
from tests.calendars.calendar_cases import (
    business_day, calendar_context, fiscal_quarter, fiscal_year, midnight, sprint_span,
)
from tests.helpers import NOW, TODAY, bounds

LANG = "tr"
LOCALE = "tr_TR"
#: During Tidewrack, so that two sprints follow the current one in the table.
EARLY = "2026-10-14T10:00"


def mention(text, languages=(LANG,), **fields):  # type: ignore[no-untyped-def]
    result = normalize(text, calendar_context(languages=list(languages), **fields))
    assert len(result.mentions) == 1, (text, [m.text for m in result.mentions])
    m = result.mentions[0]
    assert text[m.char_start : m.char_end] == m.text
    return m


def span(first: str, last: str):  # type: ignore[no-untyped-def]
    return sprint_span(first)[0], sprint_span(last)[1]


def one_day(n: int):  # type: ignore[no-untyped-def]
    day = business_day(n)
    return midnight(day), midnight(day + timedelta(days=1))


# --- sprints (source: the sprint table, read directly) --------------------------------------

SPRINTS = [
    ("this", "Bu sprintte hangi hatalar var?", "Inkwell"),
    ("this", "Mevcut sprintte kalan işler", "Inkwell"),
    ("this", "Aktif sprintin görevleri", "Inkwell"),
    ("last", "Geçen sprintten kalan işler", "Foxglove"),
    ("last", "Önceki sprintin görevleri", "Foxglove"),
    ("last", "Bir önceki iterasyondaki görevler", "Foxglove"),
    ("next", "Gelecek sprintte ne planlandı?", "Harbor-7"),
    ("next", "Bir sonraki sprinte ertelenen hatalar", "Harbor-7"),
    ("before-last", "İki önceki sprintte ne kapattık?", "Bramblegate"),
    ("before-last", "İki önceki sprintin velocity değeri", "Bramblegate"),
    ("number", "Sprint 42 hataları", "Bramblegate"),
    ("number", "Sprint #43 kapsamı", "Foxglove"),
    ("number", "42. sprintte yetişmeyenler", "Bramblegate"),
    ("name-after", "Sprint Harbor 7 hedefleri", "Harbor-7"),
    ("name-after", "Sprint Foxglove kapsamı", "Foxglove"),
    ("name-before", "Foxglove sprintindeki açık hatalar", "Foxglove"),
    ("name-before", "Inkwell sprintinde ne var?", "Inkwell"),
]


@pytest.mark.parametrize("family, text, sprint", SPRINTS, ids=[f"{f}-{t}" for f, t, _ in SPRINTS])
def test_one_sprint(family, text, sprint):
    m = mention(text)
    assert m.kind == "sprint"
    assert bounds(m) == sprint_span(sprint)


WINDOWS = [
    # the last N sprints: the N before the current one, up to where it starts (sprint_window=completed)
    ("last-n", "Son 3 sprintte velocity", NOW, sprint_span("Tidewrack")[0], sprint_span("Inkwell")[0]),
    ("last-n", "Son iki sprintte kaç hata kapattık?", NOW, sprint_span("Bramblegate")[0],
     sprint_span("Inkwell")[0]),
    # the next N sprints: the N after the current one
    ("next-n", "Önümüzdeki iki sprintte ne planlıyoruz?", EARLY, *span("Bramblegate", "Foxglove")),
    ("next-n", "Gelecek 2 sprint için epikler", EARLY, *span("Bramblegate", "Foxglove")),
]


@pytest.mark.parametrize("family, text, now, start, end", WINDOWS, ids=[f"{w[0]}-{w[1]}" for w in WINDOWS])
def test_sprint_windows(family, text, now, start, end):
    m = mention(text, now=now)
    assert bounds(m) == (start, end)


def test_the_last_three_sprints_have_the_current_one_as_the_alternative():
    m = mention(WINDOWS[0][1])
    alt = m.alternatives[0]
    assert alt.policy == "sprint_window=with_current"
    assert (alt.start, alt.end) == (sprint_span("Bramblegate")[0].isoformat(), NOW.isoformat())


BOUNDS = [
    ("since", "Sprint 42'den beri açılan hatalar", sprint_span("Bramblegate")[0], None),
    ("since", "43. sprintten itibaren yapılanlar", sprint_span("Foxglove")[0], None),
    ("before", "Sprint 43'ten önce kapatılan işler", None, sprint_span("Foxglove")[0]),
    ("before", "44. sprintten önce düşen her şey", None, sprint_span("Inkwell")[0]),
    ("since", "Foxglove sprintinden beri yapılanlar", sprint_span("Foxglove")[0], None),
    ("before", "Inkwell sprintinden önce düşen her şey", None, sprint_span("Inkwell")[0]),
    ("between", "Sprint 41 ile sprint 43 arasındaki hatalar", *span("Tidewrack", "Foxglove")),
    ("between", "41-43. sprintlerde velocity", *span("Tidewrack", "Foxglove")),
    ("between", "Sprint 42-44 görevleri", *span("Bramblegate", "Inkwell")),
]


@pytest.mark.parametrize("family, text, start, end", BOUNDS, ids=[f"{b[0]}-{b[1]}" for b in BOUNDS])
def test_sprint_bounds(family, text, start, end):
    assert bounds(mention(text)) == (start, end)


# --- business days (source: numpy.busday_offset; the locale's Saturday/Sunday weekend from CLDR) ---


def test_the_weekend_of_the_locale_is_saturday_and_sunday_in_cldr():
    import babel

    loc = babel.Locale.parse(LOCALE)
    assert (loc.weekend_start, loc.weekend_end) == (5, 6)  # numpy's default weekmask 1111100


DAYS = [
    ("n-ago", "3 iş günü önce kapatılan biletler", -3),
    ("n-ago", "1 iş günü önce ne düştü?", -1),
    ("n-ago", "Beş iş günü önce açılan hatalar", -5),
    ("last-working-day", "Önceki iş gününde ne kapatıldı?", -1),
    ("last-working-day", "Bir önceki iş günü özeti", -1),
    ("next-business-day", "Son tarih: bir sonraki iş günü", 1),
    ("next-business-day", "Ertesi iş günü ne yayına alınacak?", 1),
    ("in-n", "3 iş günü sonra sürüm", 3),
]


@pytest.mark.parametrize("family, text, n", DAYS, ids=[f"{d[0]}-{d[1]}" for d in DAYS])
def test_business_days(family, text, n):
    assert bounds(mention(text, locale=LOCALE)) == one_day(n)


RUNS = [
    ("within-n", "5 iş günü içinde yanıtla", NOW, business_day(5)),
    ("within-n", "İki iş günü içinde düzelt", NOW, business_day(2)),
    ("last-n-days", "Son 10 iş gününde açılan hatalar", business_day(-10), NOW),
    ("last-n-days", "Son 3 iş günündeki olaylar", business_day(-3), NOW),
]


@pytest.mark.parametrize("family, text, start, end", RUNS, ids=[f"{r[0]}-{r[1]}" for r in RUNS])
def test_business_day_windows(family, text, start, end):
    expected = (NOW if start is NOW else midnight(start),
                NOW if end is NOW else midnight(end + timedelta(days=1)))
    assert bounds(mention(text, locale=LOCALE)) == expected


# --- fiscal years and quarters (source: pandas Q-MAR / Y-MAR periods) ------------------------

FISCAL = [
    ("this-fy", "Bu mali yılda gelir", fiscal_year(2027)),
    ("this-fy", "Bu mali yıl planı", fiscal_year(2027)),
    ("last-fq", "Geçen mali çeyrekte yayınlananlar", fiscal_quarter(TODAY, -1)),
    ("last-fq", "Bir önceki mali çeyreğin özeti", fiscal_quarter(TODAY, -1)),
    ("this-fq", "Bu mali çeyrek bütçesi", fiscal_quarter(TODAY)),
    ("fy-yy", "FY27'de yayınlananlar", fiscal_year(2027)),
    ("fy-yy", "FY 27 bütçesi", fiscal_year(2027)),
    ("fy-year", "FY2026'daki sürümler", fiscal_year(2026)),
    ("fy-year", "2026 mali yılında giderler", fiscal_year(2026)),
    ("q-fy", "Q1 FY27 sürümleri", fiscal_quarter(date(2026, 4, 1))),
    ("q-fy", "FY27 2. çeyrekte teslim edilenler", fiscal_quarter(date(2026, 7, 1))),
    ("fiscal-q", "Mali Q3 gelirleri", fiscal_quarter(date(2026, 10, 1))),
    ("fiscal-q", "Mali yılın üçüncü çeyreği özeti", fiscal_quarter(date(2026, 10, 1))),
    ("fiscal-q", "İlk mali çeyrek planı", fiscal_quarter(date(2026, 4, 1))),
]


@pytest.mark.parametrize("family, text, expected", FISCAL, ids=[f"{f[0]}-{f[1]}" for f in FISCAL])
def test_fiscal(family, text, expected):
    assert bounds(mention(text)) == expected


def test_every_phrase_family_has_at_least_two_worked_examples():
    from collections import Counter

    counts = Counter(row[0] for table in (SPRINTS, WINDOWS, BOUNDS, DAYS, RUNS, FISCAL) for row in table)
    thin = {family for family, n in counts.items() if n < 2 and family not in ("in-n", "this-fq")}
    assert not thin, thin


# --- traps: no calendar mention (with the sprint table given) ---------------------------------

TRAPS = [
    ("sprint-race", "Otobüse yetişmek için sprint attı"),
    ("sprint-100m", "100 metre sprint yarışı ertelendi"),
    ("no-direction", "Sprint planlaması toplantısı"),
    ("first-sprint-of-history", "İlk sprint zor geçti"),
    ("last-business-day-of-month", "Ayın son iş günü"),
    ("business-day-over", "İş günü bitti"),
    ("bare-fiscal-year", "Mali yıl kârla kapandı"),
    ("iteration-of-a-loop", "Döngünün her iterasyonu 3 saniye sürüyor"),
    ("sprint-not-in-table", "Sprint 48 hataları"),
    ("three-sprints-of-work", "Bu özellik 3 sprint sürdü"),
    ("every-sprint", "Her sprintte retro yapıyoruz"),
    ("sprinters", "Sprinterler pistte"),
]


@pytest.mark.parametrize("text", [t for _, t in TRAPS], ids=[i for i, _ in TRAPS])
def test_a_look_alike_gives_no_calendar_mention(text):
    result = normalize(text, calendar_context(languages=[LANG, "en"], locale=LOCALE))
    assert result.mentions == (), [m.text for m in result.mentions]


# --- questions mixing Turkish and English -----------------------------------------------------

MIXED = [
    ("Geçen sprintte kapanan bugs", "Geçen sprintte", LANG, sprint_span("Foxglove")),
    ("Son 3 sprintte velocity nasıldı?", "Son 3 sprintte", LANG,
     (sprint_span("Tidewrack")[0], sprint_span("Inkwell")[0])),
    ("Hangi tickets since sprint 42 açık", "since sprint 42", "en", (sprint_span("Bramblegate")[0], None)),
    ("Bu mali yılda revenue", "Bu mali yılda", LANG, fiscal_year(2027)),
]


@pytest.mark.parametrize("text, phrase, lang, expected", MIXED, ids=[m[0] for m in MIXED])
def test_a_mixed_question_finds_the_phrase_in_either_language(text, phrase, lang, expected):
    m = mention(text, languages=(LANG, "en"))
    assert (m.text, m.lang, bounds(m)) == (phrase, lang, expected)
