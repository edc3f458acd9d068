"""The combined scanner of a set of languages.

Built once per set of languages and cached. It holds one trigger expression (a trie of every
time word of every language, plus digits): a question with no trigger is done after one regex
pass. Around each trigger it tries the forms whose first character fits, at the trigger and at
the few word starts before it, and keeps the longest match. Scanning cost grows with the number
of triggers in a question, not with the number of languages.
"""

from __future__ import annotations

import functools
import gc
import re
from collections import defaultdict
from collections.abc import Callable, Iterable, Iterator
from collections.abc import Set as AbstractSet
from contextlib import contextmanager
from dataclasses import dataclass, field
from types import MappingProxyType
from typing import Any, Mapping, NamedTuple, TypeAlias

from .. import cldr
from ..locale import load_locale
from ..preparing import fold
from .forms import _FIXED_PIECE, Form, compile_form, form_head, key_of
from ..locale import POST_RELATIONS
from .lexicon import TRIGGER_CLASSES
from .lexicon import (
    NO_WORD_AFTER,
    NO_WORD_BEFORE,
    WORD,
    Lexicon,
    fresh_lexicon,
    index_key,
    is_word_char,
    lexicon,
    stored_index,
    trie_regex,
)

__all__ = ["Scanner", "scanner_for", "cldr_forms", "language_index", "LazyPattern"]


class LazyPattern:
    """A regular expression written and compiled when first used.

    It answers ``match``, ``search``, ``fullmatch``, ``finditer`` and ``findall`` (and any other
    attribute of a compiled pattern) as the compiled expression would; after the first use those
    calls go straight to the compiled expression. Most runs need few of the scanner's large
    expressions, and compiling all of them was a large part of start-up.
    """

    def __init__(self, build: Callable[[], str]) -> None:
        self._build = build
        self._rx: re.Pattern[str] | None = None

    def compiled(self) -> re.Pattern[str]:
        rx = self._rx
        if rx is None:
            rx = re.compile(self._build())
            self._rx = rx
            self.match = rx.match  # type: ignore[method-assign]
            self.search = rx.search  # type: ignore[method-assign]
            self.fullmatch = rx.fullmatch  # type: ignore[method-assign]
            self.finditer = rx.finditer  # type: ignore[method-assign]
            self.findall = rx.findall  # type: ignore[method-assign]
        return rx

    def match(self, *args: Any) -> re.Match[str] | None:
        return self.compiled().match(*args)

    def search(self, *args: Any) -> re.Match[str] | None:
        return self.compiled().search(*args)

    def fullmatch(self, *args: Any) -> re.Match[str] | None:
        return self.compiled().fullmatch(*args)

    def finditer(self, *args: Any) -> Any:
        return self.compiled().finditer(*args)

    def findall(self, *args: Any) -> list[Any]:
        return self.compiled().findall(*args)

    def __getattr__(self, name: str) -> Any:  # pattern, groupindex, groups, flags...
        if name.startswith("_"):
            raise AttributeError(name)
        return getattr(self.compiled(), name)

    def __repr__(self) -> str:
        return f"LazyPattern({'compiled' if self._rx is not None else 'not compiled yet'})"


#: A compiled expression, or one compiled when first used.
PatternLike: TypeAlias = "re.Pattern[str] | LazyPattern"

#: Relations whose words a language with particles may glue to the phrase before them:
#: postpositions ("지난주부터") and the joins of a range ("3월과 5월 사이").
_GLUED_AFTER = POST_RELATIONS | {"range_join", "between_join"}


@dataclass(frozen=True, slots=True)
class Connectives:
    """Connective words of the enabled languages, as expressions and lookups."""

    before: PatternLike  # a connective phrase right before a position (search, endpos)
    join: PatternLike  # the whole gap between two phrases of a range (fullmatch)
    suffix: PatternLike  # "onwards" after a phrase (match at its end)
    day_end: PatternLike  # "-17" after "March 3" (match at its end)
    day_start: PatternLike  # "3 -" before "17 March" (search, endpos)
    relations: Mapping[str, Mapping[str, frozenset[str]]]  # phrase -> lang -> relations
    joins: Mapping[str, Mapping[str, frozenset[str]]]
    last_words: frozenset[str]  # the last word of every spaced connective before a phrase
    glued_tails: frozenset[str]  # last characters of connectives written without a space
    #: range joins that languages with particles write as an ending of the first phrase
    join_endings: Mapping[str, tuple[str, ...]] = field(default_factory=dict)


@dataclass(frozen=True, slots=True)
class Bucket:
    """Forms that can start with one character, as one expression.

    Alternatives are ordered most specific first (more tokens), then by file order, so the first
    alternative that matches is the intended reading; ``m.lastgroup`` names the form.
    """

    regex: re.Pattern[str]
    forms: Mapping[str, Form]


def _bucket(forms: list[Form]) -> Bucket:
    # Most specific first; on a tie curated forms (no fixed slots) before CLDR-generated ones.
    forms = sorted(forms, key=lambda f: (-f.tokens, bool(f.fixed), f.order))
    pattern = "|".join(f.pattern for f in forms)
    return Bucket(re.compile(pattern), MappingProxyType({f.group: f for f in forms}))


@dataclass(frozen=True, slots=True)
class Scanner:
    """Everything needed to scan text in a set of languages.

    ``buckets(key)`` compiles, on first use, the expressions of the forms that can start with
    ``key``: the first two runs at a position (letters, ``#n`` for n digits, or one other
    character; ``""`` as the second run for forms that may be followed by anything), or ``c:``
    and a character in languages written without spaces: curated forms from locales/ first, then
    the CLDR-generated forms they do not already cover. Compiling lazily keeps start-up short:
    one question needs a few buckets.
    """

    languages: tuple[str, ...]
    trigger_words: frozenset[str]  # time words of spaced languages, as words of a question
    leader_words: frozenset[str]  # words that may start a form before a time word
    endings: tuple[str, ...]  # glued endings and postpositions, longest first ("ki", "부터")
    unspaced_marks: re.Pattern[str] | None  # triggers (group t) and leaders (group l)
    unspaced_gate: re.Pattern[str] | None  # the characters those words can start with
    glued_triggers: frozenset[str]  # time words with one glued ending ("haftaki", "지난주에")
    not_temporal: frozenset[str]  # words after which no number is a date, in any language
    curated: Mapping[object, tuple["Pending", ...]]  # by first run only; compiled on use
    generated: Mapping[object, tuple["Pending", ...]]
    lexicons: Mapping[str, Lexicon]
    connectives: Connectives
    pending: tuple["Pending", ...]  # every form, curated and CLDR-generated
    _cache: dict[object, Any]  # memories of this scanner by key: buckets, word kinds, starts
    _compiled: dict[int, Form]  # CLDR-generated forms compiled so far, by order
    unspaced: bool = False  # some language is written without spaces: try per-character buckets
    lookback: int = 48  # characters before a trigger in which leading words are tried
    marks: tuple[tuple[str, PatternLike], ...] = ()  # (language, its marks): see Meta.marks
    #: The first two characters of the words of ``unspaced_marks`` (the first one alone when
    #: the word is one character, or its second is a space): a place whose first two or first
    #: character are not among them starts none of them.
    unspaced_heads: frozenset[str] = frozenset()

    @property
    def forms(self) -> tuple[Form, ...]:
        """Every form, the CLDR-generated ones compiled now (for tests and tools)."""
        return tuple(p.form(self.lexicons, self._compiled) for p in self.pending)

    def buckets(self, key: object) -> tuple[Bucket, ...]:
        found = self._cache.get(key)
        if found is None:
            found = self._build(key)
            self._cache[key] = found
        return found

    def _build(self, key: object) -> tuple[Bucket, ...]:
        curated = self._forms(self.curated, key)
        generated = self._forms(self.generated, key)
        if curated and generated:
            # Two expressions, the longer match wins: in one alternation the first form that
            # matches would win ("last qtr" of a curated form over CLDR's "last qtr.").
            first = self._shared(curated)
            generated = [f for f in generated if not _covered(f, first)]
            return (first, self._shared(generated)) if generated else (first,)
        forms = curated + generated
        return (self._shared(forms),) if forms else ()

    def _shared(self, forms: list[Form]) -> Bucket:
        """The bucket of exactly these forms; keys with the same forms share one expression
        ("3 дня назад" and "3 дней назад" start alike for the same forms)."""
        signature = ("forms",) + tuple(sorted(f.order for f in forms))
        found = self._cache.get(signature)
        if found is None:
            found = (_bucket(forms),)
            self._cache[signature] = found
        return found[0]


    def _forms(self, table: Mapping[object, tuple["Pending", ...]], key: object) -> list[Form]:
        """The forms of ``table`` that can start with ``key``, compiled now."""
        if isinstance(key, tuple):
            first = key[0]
            pending = table.get(first, ()) + table.get("p:" + first[:2], ())
        else:
            pending = table.get(key, ())
        out = []
        seen: set[int] = set()
        for p in pending:
            if p.order in seen:  # filed both by its first run and by its first two letters
                continue
            seen.add(p.order)
            form = p.form(self.lexicons, self._compiled)
            if isinstance(key, tuple):
                pairs = form.pair_keys
                if pairs is None:
                    heads = form.pair_heads
                    if heads is not None:
                        # Too many pairs to list: the first letters of the second run decide.
                        if key[1][:2] not in heads.get(key[0], ()):
                            continue
                    # Too many even so: the form is tried wherever its first run fits.
                    elif key[1] or key[0] not in form.first_keys:
                        continue
                elif key[1] not in pairs.get(key[0], ()):
                    continue
            out.append(form)
        return out


class Pending(NamedTuple):
    """A form not compiled yet (most are never needed in one run). A named tuple: thousands
    are made at start-up, and a tuple is made several times faster than a frozen dataclass."""

    lang: str
    source: str
    reading: str
    fixed: tuple[tuple[str, object], ...]
    order: int
    where: str = ""  # the locale file and reading of a curated form (for error messages)
    spaced: bool = True

    def form(self, lexicons: Mapping[str, Lexicon], cache: dict[int, Form] | None = None) -> Form:
        found = cache.get(self.order) if cache is not None else None
        if found is None:
            lex = lexicons[self.lang] if self.lang in lexicons else _root_lexicon(lexicons)
            found = compile_form(self.source, lex, self.reading, self.order, self.fixed,
                                 where=self.where or f"CLDR {self.lang}")
            if cache is not None:
                cache[self.order] = found
        return found


class GluedWords(AbstractSet[str]):
    """The words made of one of ``words`` and one of ``endings`` ("hafta" + "ki"), as a
    read-only set answered without listing them: there are tens of thousands, and a lookup
    tries each length of ending once."""

    __slots__ = ("words", "endings", "_lengths", "_all")

    def __init__(self, words: frozenset[str], endings: frozenset[str]) -> None:
        self.words = words
        self.endings = endings
        self._lengths = tuple(sorted({len(e) for e in endings}))
        self._all: frozenset[str] | None = None

    def __contains__(self, text: object) -> bool:
        if not isinstance(text, str) or not self.words:
            return False
        size = len(text)
        for length in self._lengths:
            if length > size:
                break
            cut = size - length
            if text[cut:] in self.endings and text[:cut] in self.words:
                return True
        return False

    def _listed(self) -> frozenset[str]:
        if self._all is None:
            self._all = frozenset(w + e for w in self.words for e in self.endings)
        return self._all

    def __iter__(self) -> Iterator[str]:
        return iter(self._listed())

    def __len__(self) -> int:
        return len(self._listed())

    def __repr__(self) -> str:
        return f"GluedWords({len(self.words)} words, {len(self.endings)} endings)"


def _gate(words: list[str]) -> re.Pattern[str]:
    """One character class of the first characters of ``words``."""
    return re.compile("[" + "".join(sorted({re.escape(w[0]) for w in words if w})) + "]")


#: Above this many first runs a form is filed by their first two letters.
_MANY_KEYS = 64


def _core(word: str) -> str:
    """The longest run of word characters of ``word`` ("qtr." -> "qtr"), as a question's
    words are split."""
    if word.isalnum():  # one run: every character is a word character
        return word
    runs = re.findall(f"{WORD}+", word)
    return max(runs, key=len) if runs else ""


def _root_lexicon(lexicons: Mapping[str, Lexicon]) -> Lexicon:
    """The lexicon of root forms (ISO notation): regex slots only, reported as "und"."""
    lex = next(iter(lexicons.values()))
    return Lexicon(
        lang="und", spaces=True, words=MappingProxyType({}), regex=lex.regex,
        triggers=frozenset(), ambiguous=frozenset(), not_temporal=frozenset(),
        case_marks_names=False,
    )


def _cheap_first(source: str, lex: Lexicon) -> set[str]:
    """Bucket keys (first runs, or ``c:`` characters) a CLDR phrase can start with, read off
    its text without compiling it."""
    text = source.strip()
    if lex.spaces:
        if text.startswith("{num}"):
            return {"#1", "#2", "#3"} | {key_of(w) for w in lex.words.get("num", {})}
        # An ending or a glued postposition may continue a one-word phrase ("지난주에").
        endings = tuple(lex.particles) + tuple(g.split()[0] for g in lex.glue if g.split())
        return {key_of(text)} | {key_of(text + e) for e in endings}
    if text.startswith("{num}"):
        return {"c:" + d for d in "0123456789"} | {"c:" + w[0] for w in lex.words.get("num", {}) if w}
    return {"c:" + text[0]}


def _cheap_trigger(source: str, spaced: bool) -> str:
    """The word of a CLDR phrase that triggers the scanner: its last literal word ("last yr."
    -> "yr", "{0} days ago" -> "ago"), or its longest literal run without spaces ("{0}天前")."""
    parts = [p for p in re.split(r"\{num\}", source) if p.strip()]
    if not parts:
        return ""
    if spaced:
        words = [w.strip(".,") for w in " ".join(parts).split() if w.strip(".,")]
        return words[-1] if words else ""
    return max((p.strip() for p in parts), key=len)


def _covered(form: Form, curated: Bucket) -> bool:
    """Whether a curated form of the same language reads this CLDR phrase the same way."""
    if form.reading == "NOW" or "{" in form.source.replace("{num}", ""):
        return False
    sample = form.source.replace("{num}", "3")
    m = curated.regex.fullmatch(sample)
    if m is None:
        return False
    other = curated.forms[m.lastgroup]  # type: ignore[index]
    return other.lang == form.lang and other.reading == form.reading


_DIGIT_SLOT = re.compile(r"\{(?:year|weeknum|qnum|hnum|day|day2|month2|week2|isoday|numdate|digits|yy)\}")


def _needs_digits(source: str) -> bool:
    """Whether every text of the form holds digits: a token that is not optional holds a slot
    of digits ("{year}", "q{qnum}")."""
    return any(not token.endswith("?") and _DIGIT_SLOT.search(token)
               for token in source.lstrip("~").split())


def _literal_triggers(source: str) -> set[str]:
    """The words that find a form without trigger slots: its longest word that must be there,
    else every word of its first choice that must be there ("(halbjahr|jahreshälfte)")."""
    plain: list[str] = []
    choices: list[list[str]] = []
    for token in _FIXED_PIECE.sub("", source).strip().lstrip("~").split():
        if token.endswith("?") or "{" in token:
            continue
        if token.startswith("(") and token.endswith(")"):
            choices.append([o.lower() for o in token[1:-1].split("|") if o.isalpha()])
        elif token.isalpha():
            plain.append(token.lower())
    if plain:
        return {max(plain, key=len)}
    return set(choices[0]) if choices else set()


def cldr_forms(lang: str) -> list[tuple[str, str, tuple[tuple[str, object], ...]]]:
    """Forms generated from the CLDR relative date fields and past/future patterns of ``lang``:
    ``(form, reading, fixed slots)``.

    Narrow weekday fields ("last M", "in 3 Su") are left out: one or two letters are not a
    weekday in running text.
    """
    out: list[tuple[str, str, tuple[tuple[str, object], ...]]] = []
    seen: set[str] = set()
    weekday_fields = cldr.WEEKDAY_FIELDS
    week_words = {fold(w) for w in load_locale(lang).units.get("week", ())}
    for f in cldr.relative_fields(lang):
        text = fold(f.text).strip()
        if not text or any(c in text for c in "(){}~") or text in seen:
            continue
        if f.field in weekday_fields and f.width == "narrow":
            continue
        seen.add(text)
        if f.field in weekday_fields:
            reading = {-1: "R14", 0: "R16", 1: "R15"}.get(f.offset)
            if reading is None:
                continue
            if week_words & set(text.split()):
                reading = "R16"  # the field names the week itself ("volgende week maandag")
            fixed: tuple[tuple[str, object], ...] = (
                ("weekday", weekday_fields.index(f.field)),
                ("offset", f.offset),
            )
        elif f.field == "day":
            reading, fixed = "R1", (("relday", f.offset),)
        elif f.field == "second":
            if f.offset != 0:
                continue
            reading, fixed = "NOW", ()
        else:
            reading, fixed = "R2", (("unit", f.field), ("dir", f.offset))
        out.append((text, reading, fixed))
    for p in cldr.relative_patterns(lang):
        text = fold(p.pattern).strip()
        if "{0}" not in text or any(c in text for c in "()~") or text in seen:
            continue
        if p.field in weekday_fields and p.width == "narrow":
            continue
        seen.add(text)
        form = text.replace("{0}", "{num}")
        reading = "R3" if p.sign < 0 else "R4"
        if p.field in weekday_fields:
            fixed = (("count_weekday", weekday_fields.index(p.field)), ("sign", p.sign))
        else:
            fixed = (("unit", p.field), ("sign", p.sign))
        out.append((form, reading, fixed))
    return out


def _either(spaced: list[str], unspaced: list[str], spaced_fmt: str, unspaced_fmt: str) -> str:
    """One alternation of the spaced words (in ``spaced_fmt``) and the unspaced ones."""
    parts = []
    if spaced:
        parts.append(spaced_fmt.format(trie_regex(sorted(spaced))))
    if unspaced:
        parts.append(unspaced_fmt.format(trie_regex(sorted(unspaced))))
    return "|".join(parts) or "(?!)"


def _connectives(languages: tuple[str, ...]) -> Connectives:
    relations: dict[str, dict[str, set[str]]] = defaultdict(lambda: defaultdict(set))
    joins: dict[str, dict[str, set[str]]] = defaultdict(lambda: defaultdict(set))
    ordinal_suffixes: set[str] = set()
    unspaced_suffixes: set[str] = set()  # "日" of "15日": a day of a language without spaces
    join_endings: dict[str, tuple[str, ...]] = {}
    glued: set[str] = set()  # words written without a space: connectives of unspaced languages
    articles: set[str] = set()  # words before a day number inside a range ("the 1st and the 15th")
    for lang in languages:
        data = load_locale(lang)
        unspaced = not data.meta.spaces
        for relation, phrases in data.connectives.items():
            for phrase in phrases:
                key = " ".join(fold(phrase).split())
                if unspaced or relation in _GLUED_AFTER and data.meta.particles:
                    glued.add(key)  # written after a phrase, with or without a space
                if not key[:1].isalnum() or key[-1:] == "'":
                    glued.add(key)  # "~", "-", an elided "d'": no space needed
                if relation == "article":
                    articles.add(key)
                elif relation == "range_join":
                    joins[key][lang].add("join")
                elif relation == "between_join":
                    joins[key][lang].add("between_join")
                else:
                    relations[key][lang].add(relation)
        ordinal_suffixes.update(data.ordinal_suffixes)
        if unspaced:
            unspaced_suffixes.update(fold(s) for s in data.ordinal_suffixes)
        if data.meta.particles:
            join_endings[lang] = tuple(" ".join(fold(w).split()) for rel in ("range_join", "between_join")
                                       for w in data.connectives.get(rel, ())
                                       if w[:1].isalpha() or w[:1] == "'")
    before_words = [w for w, langs in relations.items()
                    if any(r - POST_RELATIONS for r in langs.values())]
    post_words = [w for w, langs in relations.items() if any(r & POST_RELATIONS for r in langs.values())]

    # The expressions are written and compiled when first used (most questions need few of
    # them, and compiling them all was a large part of start-up).
    def before() -> str:
        before_alt = _either([w for w in before_words if w not in glued],
                             [w for w in before_words if w in glued],
                             NO_WORD_BEFORE + r"(?P<c>{})\s+", r"(?P<c2>{})\s*")
        return rf"(?:{before_alt})$"

    def join() -> str:
        join_alt = _either([w for w in joins if w not in glued], [w for w in joins if w in glued],
                           r"\s+(?P<j>{})\s+", r"\s*(?P<j2>{})\s*")
        return rf"(?:{join_alt}|\s*(?P<dash>-)\s*)"

    def suffix() -> str:
        return _either([w for w in post_words if w not in glued], [w for w in post_words if w in glued],
                       r"\s+(?P<s>{})" + NO_WORD_AFTER, r"\s*(?P<s2>{})")

    def osfx() -> str:
        return f"(?:{trie_regex(sorted(ordinal_suffixes))})?" if ordinal_suffixes else ""

    def spaced_join() -> str:
        # Joins written as words may stand between spaces even where they may also be glued
        # ("1 ile 15 Mart", "3월과 5월").
        return trie_regex(sorted(w for w in joins if w not in glued or w[:1].isalnum())) or "(?!)"

    def article() -> str:
        return trie_regex(sorted(articles)) or "(?!)"

    def day_end() -> str:
        return (
            rf"(?:\s+(?P<j>{spaced_join()})\s+|\s*-\s*)(?:(?:{article()})\s+)?(?P<d>3[01]|[12]\d|0?[1-9]){osfx()}(?![\w/.:-])"
            rf"(?:,?\s+(?P<y>(?:19|20)\d\d)(?!\w))?"
            # Without spaces: a glued join and a day that its suffix closes ("3月1日到15日").
            + (rf"|\s*(?P<j2>{trie_regex(sorted(w for w in joins if w in glued))})\s*"
               rf"(?P<d2>3[01]|[12]\d|0?[1-9])(?:{trie_regex(sorted(unspaced_suffixes))})"
               if unspaced_suffixes and any(w in glued for w in joins) else "")
        )

    def day_start() -> str:
        spaced_before = trie_regex(sorted(w for w in before_words if w not in glued)) or "(?!)"
        return (
            rf"(?<!\w)(?:(?P<pre>{spaced_before})\s+)?(?:(?:{article()})\s+)?"
            rf"(?P<d>3[01]|[12]\d|0?[1-9]){osfx()}(?:\s+(?P<j>{spaced_join()})\s+|\s*-\s*)$"
        )

    def freeze(table: Mapping[str, Mapping[str, Iterable[str]]]
               ) -> Mapping[str, Mapping[str, frozenset[str]]]:
        return MappingProxyType({k: MappingProxyType({lg: frozenset(v) for lg, v in d.items()})
                                 for k, d in table.items()})

    last_words = frozenset(w.split()[-1] for w in before_words if w.split() and w not in glued)
    glued_tails = frozenset(w[-1] for w in before_words if w in glued)
    return Connectives(LazyPattern(before), LazyPattern(join), LazyPattern(suffix),
                       LazyPattern(day_end), LazyPattern(day_start), freeze(relations),
                       freeze(joins), last_words, glued_tails, MappingProxyType(join_endings))


# --- what scanner_for needs of one language -----------------------------------------------------
#
# Per language, as plain data: each curated form with the bucket keys it is filed under, its
# leading words and the literal words that find it; each CLDR-generated form with its keys, its
# leading word and its trigger word. Computed here, or read from ``locales/_parsed/`` (written by
# ``python -m nlnorm.locale`` from ``language_index``) when that was computed from the same files
# and code (``lexicon.stored_index``).

_Curated = tuple[str, str, list[str], list[str], list[str]]  # reading, source, keys, leaders, literal
# source, reading, fixed slots, keys (or _NUM_START), leading word, trigger word
_Generated = tuple[str, str, tuple[tuple[str, object], ...], "list[str] | str", str, str]
_TRIGGER_CLASS_SET = frozenset(TRIGGER_CLASSES)
#: The keys of a CLDR phrase that starts with a number: the same for all of a language's.
_NUM_START = "{num}"


def _curated_entry(reading: str, source: str, lex: Lexicon, spaced: bool) -> _Curated:
    head = form_head(source, lex)
    if spaced:
        keys: Iterable[str] = head.first_keys
        if len(head.first_keys) > _MANY_KEYS:
            # A form that can start with thousands of words (a number glued to a unit in
            # Hangul, words with endings) is filed by their first two letters instead.
            keys = {k if k.startswith("p:") else "p:" + k[:2] for k in keys}
    else:
        keys = {"c:" + ch for ch in head.first_chars}
    # A form with no slot of a trigger class ("das erste Halbjahr") is found by its words.
    # Not needed when a number the form cannot do without finds it (every number is a trigger:
    # "q{qnum} of {year}"), nor for the forms of non-time phrases (N), which only matter
    # around a time word that is a trigger itself: their first words lead to it.
    literal = _literal_triggers(source) if not head.slot_classes & _TRIGGER_CLASS_SET and not (
        spaced and (reading == "N" or _needs_digits(source))) else set()
    return reading, source, sorted(keys), sorted(head.leaders), sorted(literal)


def _generated_entry(source: str, reading: str, fixed: tuple[tuple[str, object], ...],
                     lex: Lexicon) -> _Generated:
    first = source.split()[0] if source.split() else ""
    word = ""
    for ch in first:  # the first word of the phrase ("l" of "l'année", "следв" of "следв.")
        if not is_word_char(ch):
            break
        word += ch
    leader = word if lex.spaces and word and not word[0].isdigit() else ""
    # A phrase that starts with a number starts as every such phrase of the language does.
    keys = _NUM_START if source.strip().startswith("{num}") else sorted(_cheap_first(source, lex))
    return source, reading, fixed, keys, leader, _cheap_trigger(source, lex.spaces)


def _fresh_part(lang: str, lex: Lexicon, root_lex: Lexicon | None
                ) -> tuple[list[_Curated], list[_Generated], list[_Curated]]:
    """The curated forms, the CLDR-generated forms and (given the root lexicon) the root
    forms of ``lang``, computed from its data."""
    data = load_locale(lang)
    curated = [_curated_entry(reading, source, lex, lex.spaces)
               for reading, sources in data.forms.items() for source in sources]
    generated = [_generated_entry(source, reading, fixed, lex) for source, reading, fixed in cldr_forms(lang)]
    root = [] if root_lex is None else [_curated_entry(reading, source, root_lex, True)
                                        for reading, sources in data.root_forms.items()
                                        for source in sources]
    return curated, generated, root


def _part(lang: str, lex: Lexicon, root_lex: Lexicon | None
          ) -> tuple[list[_Curated], list[_Generated], list[_Curated]]:
    stored = stored_index(lang)
    if stored is None:
        return _fresh_part(lang, lex, root_lex)
    table = stored["scanner"]
    # (_words_in, written out: this runs for thousands of forms at every start)
    curated = [(reading, source, keys.split() if keys.__class__ is str else keys,
                leaders.split() if leaders.__class__ is str else leaders,
                literal.split() if literal.__class__ is str else literal)
               for reading, source, keys, leaders, literal in table["curated"]]
    generated = [(source, reading, tuple(fixed.items()),
                  _NUM_START if keys is None else keys.split() if keys.__class__ is str else keys,
                  leader, trigger)
                 for source, reading, fixed, keys, leader, trigger in table["generated"]]
    root = [(reading, source, _words_in(keys), _words_in(leaders), _words_in(literal))
            for reading, source, keys, leaders, literal in table["root"]] if root_lex is not None else []
    return curated, generated, root


# In the stored data a list of words is one string, the words separated by spaces, when no word
# holds white space (nearly always): a string is read faster than a list, and the collector
# never has to look into it. Fixed slots are an object; the number keys are null.

def _words_out(words: list[str]) -> str | list[str]:
    plain = all(w and not any(ch.isspace() for ch in w) for w in words)
    return " ".join(words) if plain else list(words)


def _words_in(words: str | list[str]) -> list[str]:
    return words.split() if isinstance(words, str) else words


def language_index(lang: str) -> dict[str, Any] | None:
    """The generated data of ``lang`` kept in ``locales/_parsed/<lang>.json``: its lexicon and
    what the scanner needs of its forms, computed afresh, as plain JSON (``None`` when it cannot
    be keyed, see ``lexicon.index_key``)."""
    key = index_key(lang)
    if key is None:
        return None
    lex = fresh_lexicon(lang)
    curated, generated, root = _fresh_part(lang, lex, _root_lexicon({lang: lex}))

    def forms(entries: list[_Curated]) -> list[list[Any]]:
        return [[r, s, _words_out(k), _words_out(ld), _words_out(t)] for r, s, k, ld, t in entries]

    if any(len(dict(fixed)) != len(fixed) for _, _, fixed, _, _, _ in generated):
        raise ValueError(f"{lang}: a CLDR form fixes one slot twice")  # kept as an object below
    return {
        "key": key,
        "lexicon": {"words": {cls: dict(table) for cls, table in lex.words.items()},
                    "triggers": sorted(lex.triggers)},
        "scanner": {"curated": forms(curated),
                    "generated": [[s, r, dict(fixed), None if k == _NUM_START else _words_out(k), ld, t]  # type: ignore[arg-type]
                                  for s, r, fixed, k, ld, t in generated],
                    "root": forms(root)},
    }


@contextmanager
def _collector_paused() -> Iterator[None]:
    """Pause the cyclic garbage collector while the scanner's tables are built: they are tens
    of thousands of new objects and no garbage, and the collector's passes over them cost
    about as much as building them. It runs again afterwards as it was."""
    enabled = gc.isenabled()
    gc.disable()
    try:
        yield
    finally:
        if enabled:
            gc.enable()


@functools.lru_cache(maxsize=64)
def scanner_for(languages: tuple[str, ...]) -> Scanner:
    """The scanner of ``languages`` (built once per tuple and cached)."""
    with _collector_paused():
        return _scanner(languages)


def _scanner(languages: tuple[str, ...]) -> Scanner:
    lexicons = {lang: lexicon(lang) for lang in languages}
    mine: list[Pending] = []  # curated forms from locales/, not compiled yet
    pending: list[Pending] = []
    curated: dict[object, list[Pending]] = defaultdict(list)
    generated: dict[object, list[Pending]] = defaultdict(list)
    leaders_spaced: set[str] = set()
    leaders_unspaced: set[str] = set()
    cldr_triggers: dict[bool, set[str]] = {True: set(), False: set()}
    lang_triggers: dict[str, set[str]] = defaultdict(set)
    # Words of CLDR phrases without slots ("now") trigger too, and so do the words of forms
    # with no slot of a trigger class ("das erste Halbjahr").
    extra: set[str] = set()
    extra_unspaced: set[str] = set()
    order = 0
    for i, lang in enumerate(languages):
        lex = lexicons[lang]
        spaced = lex.spaces
        own, cldr_own, root = _part(lang, lex, _root_lexicon(lexicons) if i == 0 else None)
        where = f"locales/{lang}.toml [forms]"
        leaders = leaders_spaced if spaced else leaders_unspaced
        literal_words = extra if spaced else extra_unspaced
        for reading, source, keys, first_words, literal in own:
            p = Pending(lang, source, reading, (), order, f"{where} {reading}", spaced)
            order += 1
            mine.append(p)
            for key in keys:
                curated[key].append(p)
            leaders.update(first_words)
            literal_words.update(literal)
        triggers = cldr_triggers[spaced]
        mine_triggers = lang_triggers[lang]
        num_keys = sorted(_cheap_first(_NUM_START, lex))
        for source, reading, fixed, cldr_keys, leader, trigger in cldr_own:
            p = Pending(lang, source, reading, fixed, order, "", spaced)
            order += 1
            pending.append(p)
            for key in num_keys if cldr_keys == _NUM_START else cldr_keys:
                generated[key].append(p)
            if leader:
                leaders_spaced.add(leader)
            if trigger:
                triggers.add(trigger)
                mine_triggers.add(trigger)
            if not fixed and reading == "NOW":
                extra.add(max(source.split(), key=len))
        for reading, source, keys, first_words, literal in root:
            p = Pending("und", source, reading, (), order, "locales/root.toml", True)
            order += 1
            mine.append(p)
            for key in keys:
                curated[key].append(p)
            leaders_spaced.update(first_words)
            extra.update(literal)
    spaced_triggers = sorted({t for lex in lexicons.values() if lex.spaces for t in lex.triggers} | extra
                             | cldr_triggers[True])
    quiet = {w for lang in languages for w in load_locale(lang).quiet}
    spaced_triggers = [t for t in spaced_triggers if t not in quiet]
    unspaced = sorted({t for lex in lexicons.values() if not lex.spaces for t in lex.triggers}
                      | cldr_triggers[False] | extra_unspaced)
    # Spaced languages: words are looked up in sets, one pass over the question's words
    # (digits that start a number trigger too; see scanning._marks). Languages written
    # without spaces: one expression, since their words are not separated.
    triggers_all = set(spaced_triggers) | set(unspaced)
    trigger_words = {_core(t) for t in spaced_triggers} - {""}
    endings: set[str] = set()
    glued_words: set[str] = set()
    for lang, lex in lexicons.items():
        if lex.spaces and (lex.particles or lex.glue):
            endings |= set(lex.particles) | set(lex.glue)
            trigger_words |= {_core(t) for t in lang_triggers[lang] - quiet}
            glued_words |= {_core(t) for t in set(lex.triggers) | lang_triggers[lang]} - quiet
    leader_words = {_core(w) for w in leaders_spaced if w not in triggers_all} - trigger_words - {""}
    unspaced_leaders = sorted(w for w in leaders_unspaced if w not in triggers_all)
    marks = None
    if unspaced or unspaced_leaders:
        marks = LazyPattern(lambda: _either(unspaced, [], "(?P<t>{})", "")
                            + ("|(?P<l>" + trie_regex(unspaced_leaders) + ")" if unspaced_leaders else ""))
    return Scanner(
        languages=languages,
        trigger_words=frozenset(trigger_words),
        leader_words=frozenset(leader_words),
        endings=tuple(sorted(endings, key=len, reverse=True)),
        unspaced_marks=marks,  # type: ignore[arg-type]
        unspaced_gate=_gate(unspaced + unspaced_leaders) if marks is not None else None,
        # A space in a word matches any white space: such a word is filed by its first character.
        unspaced_heads=frozenset(w[:1] if w[1:2].isspace() else w[:2]
                                 for w in unspaced + unspaced_leaders if w),
        glued_triggers=GluedWords(frozenset(glued_words), frozenset(endings)),  # type: ignore[arg-type]
        not_temporal=frozenset(w for lex in lexicons.values() for w in lex.not_temporal),
        curated=MappingProxyType({k: tuple(v) for k, v in curated.items()}),
        generated=MappingProxyType({k: tuple(v) for k, v in generated.items()}),
        lexicons=MappingProxyType(lexicons),
        connectives=_connectives(languages),
        pending=tuple(mine) + tuple(pending),
        _cache={},
        _compiled={},
        unspaced=any(not lex.spaces for lex in lexicons.values()),
        marks=tuple((lang, LazyPattern(functools.partial(_mark_class, load_locale(lang).meta.marks)))
                    for lang in languages if load_locale(lang).meta.marks),
    )


def _mark_class(marks: str) -> str:
    return f"[{marks}]"
