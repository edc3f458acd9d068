"""Adding a language is adding data: the worked example of docs/locales.md, run for real.

Tessan (``qts``) is invented for the example; ISO 639-2 reserves qaa-qtz for local use, so
CLDR has no data for it and every word comes from its locale file.

Checked against: docs/locales.md (the example must work as written).
"""

from __future__ import annotations

import re
import shutil
from pathlib import Path

import pytest

from nlnorm import Context, cldr, locale, normalize
from nlnorm.scanning import lexicon as lexicon_module
from nlnorm.scanning import scanner as scanner_module

DOCS = Path(__file__).resolve().parents[2] / "docs" / "locales.md"


def _tessan_from_docs() -> str:
    text = DOCS.read_text(encoding="utf-8")
    block = re.search(r"```toml\n(.*?name = \"Tessan\".*?)```", text, re.S)
    assert block, "docs/locales.md lost its Tessan example"
    return "\n".join(line[3:] if line.startswith("   ") else line for line in block.group(1).splitlines())


def _clear() -> None:
    for fn in (locale.load_locale, locale.available_languages, lexicon_module.lexicon,
               scanner_module.scanner_for, cldr._cached_language, cldr._cached_locales,
               cldr._extract_language_cached):
        fn.cache_clear()
    for name in dir(cldr):
        fn = getattr(cldr, name)
        if hasattr(fn, "cache_clear"):
            fn.cache_clear()


@pytest.fixture
def tessan(tmp_path, monkeypatch):
    real = locale.locales_dir()
    folder = tmp_path / "locales"
    shutil.copytree(real, folder)
    (folder / "qts.toml").write_text(_tessan_from_docs(), encoding="utf-8")
    monkeypatch.setattr(locale, "locales_dir", lambda: folder)
    _clear()
    yield folder
    monkeypatch.undo()
    _clear()


def test_a_new_language_file_is_found_without_any_list_to_edit(tessan):
    assert "qts" in locale.available_languages()


def test_the_documented_tessan_example_normalizes(tessan):
    ctx = Context.at("2026-11-27T10:00:00+01:00", tz="Europe/Berlin", languages=["qts"])
    m = normalize("ilo vek", ctx).mentions[0]
    assert (m.value, m.lang, m.reading) == ("2026-W47", "qts", "R2")


def test_the_new_language_mixes_with_english_in_one_question(tessan):
    ctx = Context.at("2026-11-27T10:00:00+01:00", tz="Europe/Berlin", languages=["en", "qts"])
    found = [(m.text, m.lang, m.value) for m in normalize("bugs ilo vek or yesterday", ctx).mentions]
    assert found == [("ilo vek", "qts", "2026-W47"), ("yesterday", "en", "2026-11-26")]
