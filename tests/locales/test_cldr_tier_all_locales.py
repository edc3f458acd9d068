"""The CLDR tier: in every locale babel ships, CLDR's relative date fields ("yesterday",
"last week", "next quarter" and their neighbours) are recognised from CLDR data alone and mean
what CLDR says. The pass count is printed at the end of the run.

Checked against: Unicode CLDR 49 via babel 2.19 — ``babel.localedata.locale_identifiers()``
and each locale's relative date fields; expected intervals from the standard library and
python-dateutil (see tests/locales/test_cldr_conformance.py).
"""

from __future__ import annotations

from collections import Counter

from babel.localedata import locale_identifiers

from nlnorm import Context, cldr, normalize
from nlnorm.locale import load_locale
from tests.locales.test_cldr_conformance import NOW, expected

#: Filled in by the test, printed by tests/conftest.py at the end of the run.
SUMMARY: dict[str, object] = {}
BASE = Context(now=NOW, week_start="monday", languages=["en"])


def _fields(locale: str):
    seen = set()
    for f in cldr.relative_fields(locale):
        text = f.text.strip()
        if not text or (f.field in cldr.WEEKDAY_FIELDS and f.width == "narrow") or text.lower() in seen:
            continue
        seen.add(text.lower())
        if f.field == "second":
            yield text, "NOW", {}
        elif f.field == "day":
            yield text, "R1", {"relday": f.offset}
        elif f.field in cldr.WEEKDAY_FIELDS:
            yield text, "W", {"weekday": cldr.WEEKDAY_FIELDS.index(f.field), "offset": f.offset}
        else:
            yield text, "R2", {"unit": f.field, "dir": f.offset}


def _passes(locale: str, text: str, reading: str, slots: dict) -> bool:
    ctx = BASE.model_copy(update={"languages": (locale,)})
    lang = load_locale(locale).chain[0]
    want = expected(lang, reading, slots, None)
    for m in normalize(text, ctx).mentions:
        if m.char_start == 0 and m.char_end == len(text):
            if want == "now":
                return m.kind == "instant"
            return (m.start, m.end) == (want[0].isoformat(), want[1].isoformat())
    return False


def test_every_babel_locale_reads_its_cldr_relative_fields():
    locales = sorted(locale_identifiers())
    passed = failed = 0
    per_locale_failures: Counter[str] = Counter()
    examples: list[str] = []
    covered = 0
    for locale in locales:
        try:
            cldr.locale_id(locale)
        except Exception:
            continue
        cases = list(_fields(locale))
        if not cases:
            continue
        covered += 1
        for text, reading, slots in cases:
            if _passes(locale, text, reading, slots):
                passed += 1
            else:
                failed += 1
                per_locale_failures[locale] += 1
                if len(examples) < 12:
                    examples.append(f"{locale}: {text!r}")
    total = passed + failed
    SUMMARY.update(locales=covered, of=len(locales), passed=passed, total=total,
                   worst=per_locale_failures.most_common(8), examples=examples)
    assert covered >= 1000
    assert passed / total >= 0.97, SUMMARY
