"""The generated extract in locales/_parsed/ is current, and reading it changes nothing.

``locales/_parsed/<code>.json`` keeps each locale file parsed (with the SHA-256 of its text) and,
for a language, its lexicon and what the scanner needs of its forms. It is regenerated with
``python -m nlnorm.locale``; a file edited since is parsed from its TOML again.

Its scanner data is keyed by the locale files and the CLDR extract it is computed from, not by
the code that computes it: these tests compare it with what the code computes now, so a change
of that code fails them until the extract is written again.

Checked against: TOML 1.0 via the standard library's tomllib; the lexicon and scanner computed
afresh from the locale files and the CLDR extract (the data the extract is made from).
"""

from __future__ import annotations

import hashlib
import json
import re
import shutil
import tomllib

import pytest

from nlnorm import Context, cldr, locale, normalize
from nlnorm.scanning import lexicon as lexicon_module
from nlnorm.scanning import scanner as scanner_module
from nlnorm.scanning.lexicon import fresh_lexicon, lexicon, stored_index
from nlnorm.scanning.scanner import LazyPattern, language_index

REGEN = "run: python -m nlnorm.locale"
FOLDER = locale.locales_dir() / "_parsed"
FILES = sorted(p for p in locale.locales_dir().glob("*.toml") if not p.stem.startswith("_"))
LANGS = sorted(locale.available_languages())


def _clear() -> None:
    for fn in (locale.load_locale, locale._load, locale.available_languages, lexicon_module.lexicon,
               scanner_module.scanner_for):
        fn.cache_clear()
    for name in dir(cldr):
        fn = getattr(cldr, name)
        if hasattr(fn, "cache_clear"):
            fn.cache_clear()


@pytest.fixture
def copied(tmp_path, monkeypatch):
    """A copy of locales/ that the test may edit, in use instead of the real one."""
    folder = tmp_path / "locales"
    shutil.copytree(locale.locales_dir(), folder)
    monkeypatch.setattr(locale, "locales_dir", lambda: folder)
    _clear()
    yield folder
    monkeypatch.undo()
    _clear()


@pytest.mark.parametrize("path", FILES, ids=[p.stem for p in FILES])
def test_extract_is_the_file_parsed(path):
    text = path.read_text(encoding="utf-8")
    stored = json.loads((FOLDER / f"{path.stem}.json").read_text(encoding="utf-8"))
    assert stored["toml_sha256"] == hashlib.sha256(text.encode("utf-8")).hexdigest(), REGEN
    assert stored["data"] == tomllib.loads(text), REGEN


@pytest.mark.parametrize("lang", LANGS)
def test_stored_scanner_data_is_current(lang):
    stored = stored_index(lang)
    assert stored is not None, f"the extract of {lang} was made from other files; {REGEN}"
    fresh = json.loads(json.dumps(language_index(lang), ensure_ascii=False))
    assert json.loads(json.dumps(dict(stored), ensure_ascii=False)) == fresh, REGEN


@pytest.mark.parametrize("lang", LANGS)
def test_lexicon_read_from_the_extract_equals_the_one_computed(lang):
    read, computed = lexicon(lang), fresh_lexicon(lang)
    assert {k: dict(v) for k, v in read.words.items()} == {k: dict(v) for k, v in computed.words.items()}
    assert [list(v) for v in read.words.values()] == [list(v) for v in computed.words.values()]  # order
    assert read.triggers == computed.triggers
    assert dict(read.regex.items()) == dict(computed.regex.items())
    assert (read.spaces, read.particles, read.glue, read.ordinal_suffixes) == \
        (computed.spaces, computed.particles, computed.glue, computed.ordinal_suffixes)


def test_writing_the_extract_again_gives_the_same_files(copied):
    written = locale.write_extract()
    assert sorted(p.name for p in written) == sorted(p.name for p in FOLDER.glob("*.json")), REGEN
    for path in written:
        assert path.read_bytes() == (FOLDER / path.name).read_bytes(), f"{path.name}: {REGEN}"


def _picture(scanner):
    """What a scanner holds, comparable between two builds."""
    def table(t):
        return {k: [p.order for p in v] for k, v in t.items()}

    conn = scanner.connectives
    return (
        scanner.trigger_words, scanner.leader_words, set(scanner.endings), scanner.glued_triggers,
        scanner.not_temporal, table(scanner.curated), table(scanner.generated),
        scanner.pending, scanner.unspaced, scanner.unspaced_gate and scanner.unspaced_gate.pattern,
        scanner.unspaced_marks and scanner.unspaced_marks.pattern,
        [(lang, rx.pattern) for lang, rx in scanner.marks],
        [getattr(conn, name).pattern for name in ("before", "join", "suffix", "day_end", "day_start")],
        conn.relations, conn.joins, conn.last_words, conn.glued_tails, conn.join_endings,
    )


@pytest.mark.parametrize("languages", [tuple(locale.deep_languages()), ("en",), ("ja", "ko"), ("tr", "de")],
                         ids=lambda t: "+".join(t) if len(t) < 5 else "all")
def test_scanner_from_the_extract_equals_the_one_computed(languages, monkeypatch):
    _clear()
    read = _picture(scanner_module.scanner_for(languages))
    monkeypatch.setattr(lexicon_module, "stored_index", lambda lang: None)
    monkeypatch.setattr(scanner_module, "stored_index", lambda lang: None)
    _clear()
    try:
        computed = _picture(scanner_module.scanner_for(languages))
    finally:
        monkeypatch.undo()
        _clear()
    assert read == computed


def test_an_edited_locale_file_is_read_from_its_toml(copied):
    path = copied / "en.toml"
    text = path.read_text(encoding="utf-8")
    assert "fortnight" not in text
    path.write_text(re.sub(r'(?m)^week = \[', 'week = ["fortnight", ', text, count=1), encoding="utf-8")
    data = locale.load_locale("en")
    assert "fortnight" in data.units["week"]
    assert data.generated is None and stored_index("en") is None
    ctx = Context.at("2026-11-27T10:00:00+01:00", tz="Europe/Berlin", languages=["en"])
    assert [m.value for m in normalize("bugs from last fortnight", ctx).mentions] == ["2026-W47"]


def test_an_extract_of_other_text_is_not_used(copied):
    stored = copied / "_parsed" / "de.json"
    entry = json.loads(stored.read_text(encoding="utf-8"))
    entry["toml_sha256"] = "0" * 64
    entry["data"]["meta"]["name"] = "not German"
    stored.write_text(json.dumps(entry), encoding="utf-8")
    data = locale.load_locale("de")
    assert data.meta.name != "not German" and data.generated is None


def test_a_broken_extract_is_not_used(copied):
    (copied / "_parsed" / "fr.json").write_text("{not json", encoding="utf-8")
    assert locale.load_locale("fr").meta.spaces is True
    assert locale.load_locale("fr").generated is None


def test_stored_scanner_data_of_another_layout_is_not_used(copied, monkeypatch):
    assert stored_index("en") is not None
    monkeypatch.setattr(lexicon_module, "INDEX_FORMAT", lexicon_module.INDEX_FORMAT + 1)
    assert locale.load_locale("en").generated is not None
    assert stored_index("en") is None


def test_stored_scanner_data_of_another_cldr_extract_is_not_used(copied):
    path = copied / "_cldr" / "nl.json"
    path.write_text(path.read_text(encoding="utf-8").replace('"maart"', '"maartt"'), encoding="utf-8")
    assert stored_index("nl") is None
    assert "maartt" in lexicon_module.lexicon("nl").words["month"]


def test_a_language_read_from_cldr_alone_has_no_stored_data():
    assert locale.load_locale("sw").digest is None
    assert stored_index("sw") is None


def test_lazy_pattern_answers_as_the_compiled_pattern():
    built = []

    def build() -> str:
        built.append(1)
        return r"(?P<w>ab+)c?"

    lazy = LazyPattern(build)
    assert not built
    rx = re.compile(build())
    for text in ("xabbc", "abc", "zz", "abab"):
        for method in ("match", "search", "fullmatch"):
            got, want = getattr(lazy, method)(text), getattr(rx, method)(text)
            assert (got and got.span()) == (want and want.span())
        assert [m.span() for m in lazy.finditer(text)] == [m.span() for m in rx.finditer(text)]
        assert lazy.findall(text) == rx.findall(text)
    assert lazy.match("xabc", 1).group("w") == "ab"
    assert lazy.pattern == rx.pattern and lazy.groupindex == rx.groupindex
    assert len(built) == 2  # once for the test's own pattern, once for the lazy one
