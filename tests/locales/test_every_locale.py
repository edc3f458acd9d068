"""Every file in locales/ follows the format, compiles, and its own examples hold.

The tests find the files themselves: adding a language needs no list to edit.

Checked against: the examples written in each locale file by someone who reads the language
(their ``sources`` say who); TOML 1.0 via the standard library's tomllib.
"""

from __future__ import annotations

import re
import tomllib
from pathlib import Path

import pytest

from nlnorm import Context, normalize
from nlnorm.errors import LocaleError
from nlnorm.locale import LocaleFile, available_languages, load_locale, locales_dir
from nlnorm.scanning.forms import check_pattern
from nlnorm.scanning.scanner import scanner_for

LANGS = sorted(available_languages())
EXAMPLES = [
    pytest.param(lang, ex, id=f"{lang}-{i}-{ex.text[:30]}")
    for lang in LANGS
    for i, ex in enumerate(load_locale(lang).examples)
]


@pytest.mark.parametrize("lang", LANGS)
def test_locale_file_loads_and_merges_its_parents(lang):
    data = load_locale(lang)
    assert data.chain[0] == lang and data.chain[-1] == "root"
    assert data.meta.sources, f"locales/{lang}.toml [meta] sources: say where the data comes from"


@pytest.mark.parametrize("lang", LANGS)
def test_every_form_of_the_language_compiles(lang):
    scanner = scanner_for((lang,))
    for form in scanner.forms:
        check_pattern(form, f"locales/{form.lang}.toml")
        re.compile(form.pattern)


@pytest.mark.parametrize("lang", LANGS)
def test_language_has_a_generated_cldr_extract(lang):
    assert (locales_dir() / "_cldr" / f"{lang}.json").is_file(), "run: python -m nlnorm.cldr"


def test_template_follows_the_format():
    raw = tomllib.loads((locales_dir() / "_template.toml").read_text(encoding="utf-8"))
    LocaleFile.model_validate(raw)


def test_template_is_not_a_language():
    assert "_template" not in available_languages()


@pytest.mark.parametrize(("lang", "example"), EXAMPLES)
def test_locale_examples_hold(lang, example):
    ctx = Context.at(example.now, tz=example.tz, languages=[lang],
                     **({"locale": example.locale} if example.locale else {}),
                     **({"week_start": example.week_start} if example.week_start else {}))
    result = normalize(example.text, ctx)
    if example.none:
        assert result.mentions == ()
        return
    assert [m.value for m in result.mentions][:1] == [example.value], result.mentions
    if example.reading:
        assert result.mentions[0].reading == example.reading


def _write(tmp_path: Path, body: str) -> Path:
    path = tmp_path / "xx.toml"
    path.write_text(body, encoding="utf-8")
    return path


@pytest.mark.parametrize(
    ("body", "message"),
    [
        ('[meta]\nname = "X"\n[units]\nweek = "vek"\n', "locales/xx.toml [units] week"),
        ('[meta]\nname = "X"\n[colours]\nred = 1\n', "locales/xx.toml [colours]"),
        ('[meta]\nname = "X"\n[forms]\nweekly = ["x"]\n', "reading id"),
        ('[meta]\nname = "X"\n[relative_day]\nsoon = ["x"]\n', "day offset"),
        ("[meta\n", "is not valid TOML"),
    ],
    ids=["list-expected", "unknown-section", "bad-reading-id", "bad-day-offset", "not-toml"],
)
def test_a_broken_locale_file_gets_an_error_naming_file_section_and_key(tmp_path, body, message):
    from nlnorm.locale import _read

    with pytest.raises(LocaleError, match=re.escape(message)):
        _read(_write(tmp_path, body))


def test_a_form_with_an_unknown_slot_names_the_form():
    from nlnorm.scanning.forms import compile_form
    from nlnorm.scanning.lexicon import lexicon

    with pytest.raises(LocaleError, match=r"unknown slot \{colour\}"):
        compile_form("{colour} week", lexicon("en"), "R2", 0, where="locales/en.toml [forms] R2")


def test_unknown_language_lists_the_known_ones():
    with pytest.raises(LocaleError, match="deep languages: .*en"):
        load_locale("xx")
