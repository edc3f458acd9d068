"""The invented question logs of ``nlnorm bench``: shape, determinism, mix.

Checked against: the weights declared in ``nlnorm.benchlog_mixed`` (the log
is invented, so its own declared mix is the reference) and the Unicode
blocks of each script (Cyrillic U+0400-U+04FF, CJK U+4E00-U+9FFF, kana
U+3040-U+30FF, Hangul syllables U+AC00-U+D7A3).  Nothing here asserts what
nlnorm finds in the questions.
"""

from __future__ import annotations

import random
import re
from collections import Counter

import pytest

from nlnorm import benchlog, benchlog_mixed
from nlnorm.benchlog import generate, generate_mixed, generate_mixed_labelled
from nlnorm.benchlog_mixed import LANGUAGE_WEIGHTS, LANGUAGES, MIXED_WEIGHT

N = 10_000
FOREIGN = [lang for lang in LANGUAGES if lang != "en"]


@pytest.fixture(scope="module")
def labelled() -> list[tuple[str, str]]:
    return generate_mixed_labelled(N, seed=0)


def test_the_same_seed_gives_the_same_list() -> None:
    assert generate_mixed(2000, seed=7) == generate_mixed(2000, seed=7)
    assert generate_mixed(500, seed=7) != generate_mixed(500, seed=8)
    assert generate_mixed() == generate_mixed(N, 0)


def test_a_shorter_log_is_a_prefix_of_a_longer_one() -> None:
    assert generate_mixed(3000, seed=4)[:1000] == generate_mixed(1000, seed=4)


@pytest.mark.parametrize("n", [0, 1, 2, 37, 1000])
def test_length(n: int) -> None:
    assert len(generate_mixed(n, seed=3)) == n
    assert len(generate_mixed_labelled(n, seed=3)) == n


def test_default_length_and_negative_n(
        labelled: list[tuple[str, str]]) -> None:
    assert len(labelled) == N
    with pytest.raises(ValueError):
        generate_mixed(-1)


def test_generate_mixed_is_the_text_of_the_labelled_log(
        labelled: list[tuple[str, str]]) -> None:
    assert generate_mixed(N, seed=0) == [text for _, text in labelled]


def test_no_question_is_empty_or_unfinished(
        labelled: list[tuple[str, str]]) -> None:
    for lang, text in labelled:
        assert isinstance(text, str) and text, lang
        assert text == text.strip(), (lang, text)
        assert "{" not in text and "}" not in text, (lang, text)
        assert "  " not in text, (lang, text)


def test_every_language_appears_and_so_do_mixed_questions(
        labelled: list[tuple[str, str]]) -> None:
    labels = {lang for lang, _ in labelled}
    assert set(LANGUAGES) <= labels
    mixed = {lang for lang in labels if "+" in lang}
    assert {f"en+{lang}" for lang in FOREIGN} <= mixed
    assert {f"{lang}+en" for lang in FOREIGN} <= mixed


def test_the_weights_sum_to_a_thousand() -> None:
    assert set(LANGUAGE_WEIGHTS) == set(LANGUAGES)
    assert sum(LANGUAGE_WEIGHTS.values()) + MIXED_WEIGHT == 1000
    assert LANGUAGE_WEIGHTS["en"] == 310
    assert all(LANGUAGE_WEIGHTS[lang] == 80 for lang in ("de", "fr", "es"))


def test_shares_per_language_match_the_weights(
        labelled: list[tuple[str, str]]) -> None:
    counts = Counter("mixed" if "+" in lang else lang for lang, _ in labelled)
    for lang in LANGUAGES:
        share = counts[lang] / N
        assert abs(share - LANGUAGE_WEIGHTS[lang] / 1000) < 0.015, (lang, share)
    assert abs(counts["mixed"] / N - MIXED_WEIGHT / 1000) < 0.015


def test_mixed_questions_split_between_both_directions(
        labelled: list[tuple[str, str]]) -> None:
    mixed = [lang for lang, _ in labelled if "+" in lang]
    english_first = sum(lang.startswith("en+") for lang in mixed)
    assert 0.35 < english_first / len(mixed) < 0.65


_SCRIPTS = {
    "ru": re.compile("[\u0400-\u04ff]"),
    "uk": re.compile("[\u0400-\u04ff]"),
    "zh": re.compile("[\u4e00-\u9fff]"),
    "ja": re.compile("[\u3040-\u30ff\u4e00-\u9fff]"),
    "ko": re.compile("[\uac00-\ud7a3]"),
}


def test_questions_are_written_in_their_language_script(
        labelled: list[tuple[str, str]]) -> None:
    for lang, text in labelled:
        foreign = next((part for part in lang.split("+") if part != "en"), None)
        if foreign in _SCRIPTS:
            assert _SCRIPTS[foreign].search(text), (lang, text)
        if lang == "uk":
            assert not re.search("[ыэъё]", text), text  # Russian-only letters


def test_the_english_share_comes_from_the_english_log(
        labelled: list[tuple[str, str]]) -> None:
    english = {text for lang, text in labelled if lang == "en"}
    assert english and all(not _SCRIPTS["ru"].search(t) for t in english)
    assert len(english) > 0.8 * sum(lang == "en" for lang, _ in labelled)
    # generate() itself is unchanged by the mixed log.
    assert generate(20, 3) == generate(20, 3)


@pytest.mark.parametrize("lang", FOREIGN)
def test_each_language_has_enough_templates(lang: str) -> None:
    no_time = benchlog_mixed._NO_TIME[lang]
    with_time = benchlog_mixed._ONE_TIME[lang] + benchlog_mixed._TWO_TIME[lang]
    assert len(no_time) >= 15 and len(with_time) >= 15
    assert len(set(no_time)) == len(no_time)
    assert len(set(with_time)) == len(with_time)
    assert not any("{T}" in t or "{T." in t for t in no_time)
    assert all("{T" in t for t in with_time)
    assert all("{U" in t for t in benchlog_mixed._TWO_TIME[lang])


def test_english_has_enough_templates() -> None:
    assert len(benchlog._NO_TIME) >= 15
    assert len(benchlog._ONE_TIME) + len(benchlog._TWO_TIME) >= 15


@pytest.mark.parametrize("lang", FOREIGN)
def test_every_template_and_time_pattern_fills(lang: str) -> None:
    rng = random.Random(lang)
    templates = (benchlog_mixed._NO_TIME[lang] + benchlog_mixed._ONE_TIME[lang]
                 + benchlog_mixed._TWO_TIME[lang])
    for template in templates:
        for _ in range(12):  # different subjects, people and genders
            text = benchlog_mixed._render(
                lang, template, rng,
                lambda: benchlog_mixed._time_phrase(lang, rng))
            assert text and "{" not in text and "}" not in text, (template, text)
    phrases = benchlog_mixed._PHRASES[lang]
    assert set(phrases) == set(benchlog_mixed._FAMILY_NAMES)
    for family, patterns in phrases.items():
        assert len(patterns) >= 3, family
        for pattern in patterns:
            for _ in range(12):
                text = benchlog_mixed._fill_time(lang, pattern, rng)
                assert text and "{" not in text, (pattern, text)
