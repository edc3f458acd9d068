"""Word classes of one language: CLDR words from babel plus the grammar in locales/.

A lexicon maps each slot class of the form language (``{month}``, ``{unit}``, ``{dir}``...) to
its words and their values. It is built once per language and cached: from the generated data
in ``locales/_parsed/`` when that was computed from the current files (:func:`stored_index`),
else from CLDR and the locale file.
"""

from __future__ import annotations

import functools
import hashlib
import re
from dataclasses import dataclass
from types import MappingProxyType
from typing import Any, Iterator, Mapping

from .. import cldr
from ..locale import POST_RELATIONS, load_locale
from ..preparing import fold

__all__ = ["Lexicon", "lexicon", "trie_regex", "REGEX_CLASSES", "collapse", "stored_index",
           "fresh_lexicon", "lexicon_words"]

# Slot classes matched by a regular expression rather than a word list. ``day`` gets the
# language's ordinal suffixes appended when the lexicon is built.
REGEX_CLASSES: Mapping[str, str] = MappingProxyType(
    {
        "year": r"(?:19\d\d|20\d\d|2100)(?![.,]\d)",
        "day": r"(?:3[01]|[12]\d|0?[1-9])",
        "day2": r"(?:3[01]|[12]\d|0[1-9])",
        "month2": r"(?:1[0-2]|0[1-9])",
        "qnum": r"[1-4]",
        "hnum": r"[12]",
        "weeknum": r"(?:5[0-3]|[1-4]\d|0?[1-9])",
        "week2": r"(?:5[0-3]|[1-4]\d|0[1-9])",
        "isoday": r"[1-7]",
        # Day-first and month-first dates with "/" or "." (two-digit years too), with "-" and a
        # four-digit year ("14-03-2026", CLDR nl), and year-first with "/" or ".".
        "numdate": r"(?:\d{1,2}[/.]\d{1,2}[/.](?:\d{4}|\d{2})|\d{1,2}-\d{1,2}-\d{4}|\d{4}[/.]\d{1,2}[/.]\d{1,2})(?![/.-]?\d)",
        "digits": r"\d{1,3}",
        # A two-digit year after a fiscal marker ("FY27"): 2000-2099.
        "yy": r"\d\d(?![\d.,])",
    }
)

#: Slot classes whose words may trigger the scanner (the others only ever follow them).
TRIGGER_CLASSES = (
    "relday", "unit", "month", "weekday", "weekday_abbr", "weekend", "to_date", "dayperiod",
    "dayperiod_phrase", "fixed",
)

_SPACES = re.compile(r"\s+")

#: Characters that continue a word although ``\w`` does not match them: combining marks of
#: Latin, Cyrillic, Hebrew, Arabic, the Indic and Southeast Asian scripts, Adlam and Chakma
#: (vowel signs such as Gujarati "ા" are marks, not letters).
_WORD_MARKS = (
    "\u0300-\u036f\u0483-\u0489\u0591-\u05c7\u0610-\u061a\u064b-\u065f\u0670"
    "\u06d6-\u06ed\u0900-\u0dff\u0e00-\u0eff\u0f00-\u0fff\u1000-\u109f\u1780-\u17ff"
    "\u1ab0-\u1aff\u1dc0-\u1dff\u20d0-\u20ff\ufe20-\ufe2f"
    "\U00011100-\U0001114f\U0001e900-\U0001e95f"
)
#: A character inside a word, for word boundaries in every script.
WORD = f"[\\w{_WORD_MARKS}]"
#: Look-arounds: no word character before / after this point.
NO_WORD_BEFORE = f"(?<!{WORD})"
NO_WORD_AFTER = f"(?!{WORD})"


def is_word_char(ch: str) -> bool:
    """Whether ``ch`` continues a word (a letter, digit, underscore or combining mark)."""
    return ch.isalnum() or ch == "_" or _MARK.match(ch) is not None


_MARK = re.compile(f"[{_WORD_MARKS}]")


def collapse(text: str) -> str:
    """``text`` normalized as questions are (see ``preparing.fold``), white space folded."""
    return _SPACES.sub(" ", fold(text.strip()))


def trie_regex(words: list[str] | tuple[str, ...] | frozenset[str], spaces: str = r"\s+") -> str:
    """One regular expression matching any of ``words``, factored as a trie.

    Python's ``re`` does not factor a flat ``a|b|c`` alternation, so a trie is an order of
    magnitude faster on large word lists. A space inside a word matches ``spaces``.

    >>> trie_regex(["may", "mayday", "march"])
    'ma(?:rch|y(?:day)?)'
    """
    trie: dict[str, Any] = {}  # character -> subtree; "" marks a word's end
    for word in words:
        if not word:
            continue
        node = trie
        for ch in word:
            node = node.setdefault(ch, {})
        node[""] = {}

    def emit(node: dict[str, Any]) -> str:
        end = "" in node
        branches = []
        for ch in sorted(k for k in node if k):
            piece = spaces if ch == " " else re.escape(ch)
            branches.append(piece + emit(node[ch]))
        if not branches:
            return ""
        if len(branches) == 1 and not end:
            return branches[0]
        body = "(?:" + "|".join(branches) + ")"
        return body + "?" if end else body

    return emit(trie)


#: Word classes every lexicon answers for, even when the language has no words in them.
WORD_CLASSES = ("month", "month_wide", "month_abbr", "weekday", "weekday_abbr", "relday", "relyear", "relmonth",
                "dayperiod", "unit", "dir", "ordinal", "ordinal_half", "weekend", "to_date",
                "dayperiod_phrase", "num")


class Patterns(Mapping[str, str]):
    """The regular expression of each slot class, built on first use (a trie per word class;
    most classes of most languages are never needed in one run)."""

    def __init__(self, words: Mapping[str, Mapping[str, object]], sep: str,
                 suffixes: tuple[str, ...]) -> None:
        self._words = words
        self._sep = sep
        self._suffixes = suffixes
        self._built: dict[str, str] = {}
        self._names = frozenset(words) | frozenset(REGEX_CLASSES) | frozenset(WORD_CLASSES)

    def __getitem__(self, cls: str) -> str:
        found = self._built.get(cls)
        if found is None:
            found = self._build(cls)
            self._built[cls] = found
        return found

    def _build(self, cls: str) -> str:
        if cls not in self._names:
            raise KeyError(cls)
        if cls == "day":
            tail = f"(?:{trie_regex(self._suffixes)})?" if self._suffixes else ""
            return REGEX_CLASSES["day"] + tail + "(?!\\d)"
        if cls == "num":
            table = self._words.get("num")
            words = f"|(?:{trie_regex(sorted(table), self._sep)})" if table else ""
            return r"(?:\d{1,3}" + words + ")"
        if cls in REGEX_CLASSES:
            return REGEX_CLASSES[cls]
        table = self._words.get(cls)
        return "(?:" + trie_regex(sorted(table), self._sep) + ")" if table else "(?!)"

    def __contains__(self, cls: object) -> bool:
        return cls in self._names

    def __iter__(self) -> Iterator[str]:
        return iter(sorted(self._names))

    def __len__(self) -> int:
        return len(self._names)


@dataclass(frozen=True, slots=True)
class Lexicon:
    """Slot classes of one language: ``words[cls][word] -> value``; ``regex[cls]`` for each."""

    lang: str
    spaces: bool
    words: Mapping[str, Mapping[str, object]]
    regex: Mapping[str, str]
    triggers: frozenset[str]
    ambiguous: frozenset[str]
    not_temporal: frozenset[str]
    case_marks_names: bool
    ordinal_suffixes: tuple[str, ...] = ()
    particles: tuple[str, ...] = ()  # endings glued to a phrase, part of the mention
    glue: tuple[str, ...] = ()  # words that may follow a phrase with no space (postpositions)

    def value(self, cls: str, text: str) -> object:
        """The value of ``text`` (as matched) in word class ``cls``."""
        table = self.words.get(cls)
        if table is None:
            return text
        found = table.get(text)  # matched text is already folded: mostly found as it is
        if found is not None:
            return found
        key = collapse(text)
        if key in table:
            return table[key]
        if cls == "num" and key.isdigit():
            return int(key)
        return table.get(key.rstrip("."), key)


def _longest_token(word: str) -> str:
    return max(word.split(), key=len) if word.split() else word


def lexicon_words(lang: str) -> dict[str, dict[str, object]]:
    """The word classes of ``lang`` (``{cls: {word: value}}``) from CLDR via babel and
    ``locales/<lang>.toml``, computed afresh."""
    data = load_locale(lang)
    words: dict[str, dict[str, object]] = {}

    def put(cls: str, word: str, value: object) -> None:
        words.setdefault(cls, {}).setdefault(collapse(word), value)

    months = cldr.month_words(lang)
    for word, month in months["wide"]:
        put("month", word, month)
        put("month_wide", word, month)
    for word, month in months["abbreviated"]:
        put("month", word, month)
        put("month_abbr", word, month)
    days = cldr.weekday_words(lang)
    for word, day in days["wide"]:
        put("weekday", word, day)
    for word, day in days["abbreviated"]:
        if collapse(word) not in words.get("weekday", {}):
            put("weekday_abbr", word, day)
    # CLDR's short weekday fields write the abbreviation with a dot ("last Sun."), which the
    # weekday names of the same locale may not have: the dotted word is an abbreviation too.
    for field in cldr.relative_fields(lang):
        if field.field in cldr.WEEKDAY_FIELDS and field.width == "short":
            last = fold(field.text).split()[-1] if field.text.split() else ""
            if last.endswith(".") and collapse(last) not in words.get("weekday", {}):
                put("weekday_abbr", last, cldr.WEEKDAY_FIELDS.index(field.field))
    # Inflected forms CLDR does not list (Russian prepositional "в марте", accusative "в среду").
    for number, forms in data.inflections.get("month", {}).items():
        for form in forms:
            put("month", form, int(number))
            put("month_wide", form, int(number))
    for number, forms in data.inflections.get("weekday", {}).items():
        for form in forms:
            put("weekday", form, int(number))
    for field in cldr.relative_fields(lang):
        if field.field == "day":
            put("relday", field.text, field.offset)
        elif field.field == "year":
            put("relyear", field.text, field.offset)  # "去年", "今年": in "去年12月"
        elif field.field == "month":
            put("relmonth", field.text, field.offset)  # "来月", "下个月": in "来月15日"
    for key, phrases in data.relative_day.items():
        for phrase in phrases:
            put("relday", phrase, int(key))
    for word, period in cldr.day_period_words(lang):
        put("dayperiod", word, period)
    for phrase, spec in data.day_period_phrases.items():
        put("dayperiod_phrase", phrase, (spec.day, spec.period))
    for word, number in data.numbers.items():
        put("num", word, number)
    for word, number in data.ordinals.items():
        put("ordinal", word, number)
        put("ordinal_half", word, number)
    for grain, forms in data.units.items():
        for form in forms:
            put("unit", form, grain)
    # CLDR's abbreviated units keep their dot ("in {0} hr.", "last qtr."): a unit word may be
    # written with it, so a curated form reads the whole CLDR phrase. An abbreviation that is
    # also a weekday of the language (Portuguese "seg.", second and Monday) is left to CLDR's
    # own phrases.
    weekday_words = set(words.get("weekday", {})) | set(words.get("weekday_abbr", {}))
    for pattern in cldr.relative_patterns(lang):
        if pattern.field in cldr.FIELD_GRAINS.values() and pattern.width != "narrow":
            tokens = fold(pattern.pattern).split()
            for i, token in enumerate(tokens):
                if token == "{0}" and i + 1 < len(tokens) and tokens[i + 1].endswith("."):
                    if tokens[i + 1] not in weekday_words:
                        put("unit", tokens[i + 1], pattern.field)
    offsets = {"last": -1, "this": 0, "next": 1}
    for name, forms in data.direction.items():
        for form in forms:
            put("dir", form, offsets[name])
    for word in sorted(data.weekend):  # a set: sorted, so that the table is the same every run
        put("weekend", word, True)
    for word, grain in data.to_date.items():
        put("to_date", word, grain)
    return words


def _triggers(words: Mapping[str, Mapping[str, object]]) -> frozenset[str]:
    triggers: set[str] = set()
    for cls in TRIGGER_CLASSES:
        for word in words.get(cls, {}):
            triggers.add(_longest_token(word))
    return frozenset(triggers)


def _build(lang: str, words: dict[str, dict[str, object]], triggers: frozenset[str]) -> Lexicon:
    data = load_locale(lang)
    suffixes = data.ordinal_suffixes
    sep = r"\s+" if data.meta.spaces else r"\s*"
    regex = Patterns(words, sep, tuple(suffixes))
    return Lexicon(
        lang=lang,
        spaces=data.meta.spaces,
        words=MappingProxyType({k: MappingProxyType(v) for k, v in words.items()}),
        regex=regex,
        triggers=triggers,
        ambiguous=data.ambiguous,
        not_temporal=data.not_temporal,
        case_marks_names=data.meta.case_marks_names,
        ordinal_suffixes=tuple(suffixes),
        particles=tuple(fold(p) for p in data.meta.particles),
        glue=tuple(sorted({fold(w) for rel, words in data.connectives.items()
                           if rel in POST_RELATIONS or rel in ("range_join", "between_join")
                           for w in words})) if data.meta.particles else (),
    )


@functools.cache
def lexicon(lang: str) -> Lexicon:
    """Build (once) the lexicon of ``lang`` from CLDR via babel and ``locales/<lang>.toml``,
    or read it from the generated data when that is current (the same lexicon, sooner)."""
    stored = stored_index(lang)
    if stored is None:
        return fresh_lexicon(lang)
    table = stored["lexicon"]
    words: dict[str, dict[str, object]] = {
        cls: ({w: tuple(v) for w, v in entries.items()} if cls in _TUPLE_VALUES else entries)
             for cls, entries in table["words"].items()}
    return _build(lang, words, frozenset(table["triggers"]))


def fresh_lexicon(lang: str) -> Lexicon:
    """The lexicon of ``lang`` computed from CLDR and the locale file, never from the
    generated data (not cached: for writing and checking that data)."""
    words = lexicon_words(lang)
    return _build(lang, words, _triggers(words))


#: Word classes whose values are tuples (JSON keeps them as lists).
_TUPLE_VALUES = frozenset({"dayperiod_phrase"})

#: The layout of the generated scanner data; a change of layout changes this number, so that
#: data of another layout is never read.
INDEX_FORMAT = 2


def index_key(lang: str) -> str | None:
    """What the generated scanner data of ``lang`` is computed from, as one hash: the texts
    of its locale files, its CLDR extract and the layout of the data (``None`` when one of them
    is missing, as for a language read from CLDR data alone). The code that computes the data
    is not in the key: ``tests/locales/test_parsed_extract.py`` checks that the stored data
    equals what the code computes now."""
    digest = load_locale(lang).digest
    cldr_digest = cldr.extract_digest(lang)
    if digest is None or cldr_digest is None:
        return None
    return hashlib.sha256(f"{INDEX_FORMAT} {digest} {cldr_digest}".encode()).hexdigest()


def stored_index(lang: str) -> Mapping[str, Any] | None:
    """The generated scanner data of ``lang`` kept in ``locales/_parsed/`` (its lexicon and
    how its forms start, see ``scanner.language_index``) if it was computed from exactly the
    current locale files and CLDR extract, else ``None``."""
    stored = load_locale(lang).generated
    if stored is None:
        return None
    key = index_key(lang)
    return stored if key is not None and stored.get("key") == key else None
