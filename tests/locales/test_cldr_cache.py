"""The generated CLDR extract in locales/_cldr/ is exactly what babel gives now.

Checked against: Unicode CLDR via babel (``babel.Locale`` data and ``babel.dates`` formats);
the extract is regenerated with ``python -m nlnorm.cldr``.
"""

from __future__ import annotations

import json

import babel
import pytest

from nlnorm import cldr
from nlnorm.locale import available_languages, locales_dir

FOLDER = locales_dir() / "_cldr"


def _data(extract: dict) -> dict:
    # The versions are recorded for the reader; the data is what must match.
    return {k: v for k, v in extract.items() if k not in ("babel",)}


@pytest.mark.parametrize("lang", sorted(available_languages()))
def test_language_extract_equals_babel(lang):
    cached = json.loads((FOLDER / f"{lang}.json").read_text(encoding="utf-8"))
    assert _data(cached) == _data(cldr.extract_language(lang)), "run: python -m nlnorm.cldr"


def test_extract_names_the_cldr_version_babel_ships():
    cached = json.loads((FOLDER / "_locales.json").read_text(encoding="utf-8"))
    from babel.core import get_cldr_version

    assert cached["cldr"] == str(get_cldr_version()), "run: python -m nlnorm.cldr"
    assert babel.__version__


def test_locale_table_equals_babel_for_a_sample_of_locales():
    cached = json.loads((FOLDER / "_locales.json").read_text(encoding="utf-8"))
    for code in ("en", "en_US", "en_GB", "en_IN", "de", "de_AT", "pt_PT", "fa_IR", "ja", "ar_EG"):
        assert cached["locales"][code] == cldr._extract_locale_row(code), code


def test_locale_table_covers_every_babel_locale():
    from babel.localedata import locale_identifiers

    cached = json.loads((FOLDER / "_locales.json").read_text(encoding="utf-8"))
    missing = set(locale_identifiers()) - set(cached["locales"])
    assert len(missing) <= 5, sorted(missing)[:20]
