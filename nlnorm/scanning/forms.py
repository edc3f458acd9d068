"""The form language of locales/ and its compiler.

A form is a phrase pattern written with spaces between tokens::

    "(in|over|within|during)? the (last|past) {num} {unit}"

- ``{cls}`` is a slot: any word of the lexicon class ``cls`` (or its regular expression);
- ``(a|b)`` is one of several literal words;
- a trailing ``?`` makes the token optional; a leading ``~`` marks the whole form as weak
  (it becomes a mention only with a cue such as a connective);
- ``{slot=value}`` matches no text and gives the slot a fixed value ("上月{unit=month}");
  a value that is a whole number is read as one;
- anything else is literal text. Between tokens goes white space (``\\s+``), or optional
  white space in languages written without spaces.

A form becomes a regular-expression *pattern* here; the scanner compiles patterns lazily, all
forms that can start with one character together, because compiling is the expensive part of
start-up.
"""

from __future__ import annotations

import functools
import re
import sys
from collections.abc import Iterable, Mapping
from dataclasses import dataclass

from ..errors import LocaleError
from ..preparing import fold
from .lexicon import NO_WORD_AFTER, NO_WORD_BEFORE, REGEX_CLASSES, TRIGGER_CLASSES, Lexicon, trie_regex

__all__ = ["Form", "compile_form", "CANONICAL_SLOT"]

#: A literal that may lead a form: a word, or words joined by elision ("dall'inizio").
_LEADING_WORD = re.compile(r"\w+(?:'\w+)*")
_TOKEN_PIECE = re.compile(r"\{([a-z_0-9]+)\}|\(([^(){}]*\|[^(){}]*)\)|([^{}]+?)(?=\{|\([^(){}]*\|[^(){}]*\)|$)")
#: A fixed-value piece ``{unit=month}`` matches no text and gives its slot that value.
_FIXED_PIECE = re.compile(r"\{([a-z_0-9]+)=([^{}=\s]+)\}")
_DIGITS = frozenset("0123456789")

#: Slot classes that share one slot name in the candidate (``month_wide`` is still a month).
CANONICAL_SLOT = {
    "month_wide": "month",
    "month_abbr": "month",
    "month2": "month",
    "weekday_abbr": "weekday",
    "day2": "day",
    "week2": "week",
    "weeknum": "week",
}


@functools.lru_cache(maxsize=4096)
def _compiled(pattern: str) -> re.Pattern[str]:
    return re.compile(pattern)


@dataclass(frozen=True, slots=True)
class Form:
    """A form of one language, as a pattern ready to be compiled."""

    lang: str
    reading: str
    source: str
    pattern: str
    slots: tuple[tuple[str, str], ...]  # (regex group, slot class)
    fixed: tuple[tuple[str, object], ...]
    weak: bool
    single: str | None  # the slot class when the form is one bare slot
    first_chars: frozenset[str]
    first_keys: frozenset[str]  # first runs of the texts the form can start with
    #: first run -> the second runs that may follow it ("" = anything); ``None`` when too many.
    #: A mapping of shared strings rather than a set of pairs: a fifth of the memory.
    pair_keys: Mapping[str, frozenset[str]] | None
    leaders: frozenset[str]  # first words that are not themselves triggers ("the", "in", "last")
    order: int
    spaced: bool
    tokens: int  # specificity: tokens plus the slots and literal pieces inside them
    #: When ``pair_keys`` is ``None``: first run -> the first two letters of the second runs
    #: that may follow it (a coarser index that stays small: "3일" and "3주" of Korean).
    pair_heads: Mapping[str, frozenset[str]] | None = None

    @property
    def group(self) -> str:
        """The name of the empty group that ends this form's pattern."""
        return f"f{self.order}_e"

    @property
    def regex(self) -> re.Pattern[str]:
        """This form alone, compiled (cached), with the word boundary before it; the scanner
        uses combined expressions."""
        prefix = NO_WORD_BEFORE if self.spaced else ""
        return _compiled(prefix + self.pattern)


_KEY_RUN = re.compile(r"[^\W\d_]+|\d+|.", re.S)

#: Lengths of digit runs each numeric slot class can start with.
_DIGIT_KEYS = {
    "year": ("#4",), "day": ("#1", "#2"), "day2": ("#2",), "month2": ("#2",), "qnum": ("#1",),
    "hnum": ("#1",), "weeknum": ("#1", "#2"), "week2": ("#2",), "isoday": ("#1",),
    "numdate": ("#1", "#2", "#4"), "digits": ("#1", "#2", "#3"), "num": ("#1", "#2", "#3"),
    "yy": ("#2",),
}


#: Sample texts of each numeric slot class, enough to know which runs it can start with.
_DIGIT_SAMPLES = {
    "year": ("2000",), "day": ("1", "10"), "day2": ("10",), "month2": ("10",), "qnum": ("1",),
    "hnum": ("1",), "weeknum": ("1", "10"), "week2": ("10",), "isoday": ("1",),
    "numdate": ("1/1/2000", "10/10/2000", "2000/1/1", "1.1.2000", "10.10.2000", "2000.1.1",
                "1-1-2000", "10-10-2000",
                "1/1/20", "10/10/20", "1.1.20", "10.10.20"),
    "digits": ("1", "10", "100"), "num": ("1", "10", "100"), "yy": ("27",),
}
_RUN = re.compile(r"[^\W\d_]+|\d+|[^\w\s]")
_MAX_SAMPLES = 20_000
#: Above this many first runs a form is filed by their first two letters (``"p:" + two``).
MANY_KEYS = 64


def _cat(heads: "Iterable[str]", tails: "Iterable[str]") -> list[str]:
    """Every head followed by every tail, distinct, at most ``_MAX_SAMPLES`` of them (built
    lazily: the full product of two word classes can be millions of strings)."""
    tails = list(tails)
    out: dict[str, None] = {}
    for head in heads:
        for tail in tails:
            out[head + tail] = None
            if len(out) >= _MAX_SAMPLES:
                return list(out)
    return list(out)


def runs_key(text: str, pos: int = 0) -> tuple[str, str]:
    """The first two runs at ``pos`` (letters, digits as ``#n``, or one other character),
    white space skipped: the key of the bucket of forms to try there.

    >>> runs_key("in the last 3 weeks"), runs_key("2026-w48"), runs_key("march")
    (('in', 'the'), ('#4', '-'), ('march', ''))
    """
    first = second = ""
    for m in _RUN.finditer(text, pos):
        run = m.group()
        key = f"#{min(len(run), 4)}" if run[0].isdigit() else run
        if first:
            second = key
            break
        first = key
    return first, second


@functools.lru_cache(maxsize=8192)
def _runs2(sample: str) -> tuple[str, ...]:
    runs = _RUN.findall(sample)[:2]
    return tuple(sys.intern(f"#{min(len(r), 4)}" if r[0].isdigit() else r) for r in runs)


def _pairs_by_first(pairs: set[tuple[str, str]]) -> Mapping[str, frozenset[str]]:
    table: dict[str, set[str]] = {}
    for first, second in pairs:
        table.setdefault(sys.intern(first), set()).add(sys.intern(second))
    out: dict[str, frozenset[str]] = {}
    for first, seconds in table.items():
        key = frozenset(seconds)
        # Many first runs share their second runs (every number word before the same units):
        # one set object serves them all.
        shared = _SHARED_SECONDS.get(key)
        if shared is None:
            shared = key
            if len(_SHARED_SECONDS) < 100_000:
                _SHARED_SECONDS[key] = key
        out[first] = shared
    return out


_SHARED_SECONDS: dict[frozenset[str], frozenset[str]] = {}


def _token_runs(samples: tuple[str, ...], head: int = 0) -> frozenset[tuple[str, ...]]:
    if head:
        return frozenset(r[:1] + tuple(x[:head] for x in r[1:]) for s in samples if (r := _runs2(s)))
    return frozenset(r for s in samples if (r := _runs2(s)))


def _sample_keys(token_samples: list[tuple[list[str], bool]], head_size: int = 0
                 ) -> set[tuple[str, str]] | None:
    """Every (first run, second run) a form can start with, from sample texts of its tokens
    (tokens are separated by white space, so runs never cross a token boundary); a second run
    of ``""`` means the form may end after one run. ``None`` when there are too many."""
    # Only the tokens a form can start with need pairs: the first, and each one after a run
    # of optional tokens; the others give only the second run.
    head = 0
    while head < len(token_samples) - 1 and token_samples[head][1]:
        head += 1
    tokens = [(_token_runs(tuple(samples), head_size), optional) for samples, optional in token_samples]
    # Walk from the last token back: firsts = runs a suffix can start with, pairs = its keys.
    firsts: frozenset[str] = frozenset({""})
    pairs: set[tuple[str, str]] = set()
    for index in range(len(tokens) - 1, -1, -1):
        runs, optional = tokens[index]
        new_firsts: set[str] = {r[0][:head_size] if head_size else r[0] for r in runs}
        new_pairs: set[tuple[str, str]] = set()
        if index <= head:
            for r in runs:
                if len(r) >= 2:
                    new_pairs.add((r[0], r[1]))
                else:
                    if len(new_pairs) + len(firsts) > _MAX_SAMPLES:
                        return None
                    new_pairs.update((r[0], f) for f in firsts)
            if optional:
                new_pairs |= pairs
        if optional:
            new_firsts |= firsts
        pairs, firsts = new_pairs, frozenset(new_firsts)
        if len(pairs) > _MAX_SAMPLES:
            return None
    return pairs


def key_of(text: str) -> str:
    """The bucket key of a text's start: its first run of letters, or ``#n`` for a run of n
    digits (n capped at 4), or its first character.

    >>> key_of("last week"), key_of("q3"), key_of("2026-w48"), key_of("14th")
    ('last', 'q', '#4', '#2')
    """
    m = _KEY_RUN.match(text)
    if m is None:
        return ""
    run = m.group()
    if run[0].isdigit():
        return f"#{min(len(run), 4)}"
    return run


def _first_words(words: Iterable[str]) -> set[str]:
    return {w.split()[0] for w in words if w.split()}


@dataclass(frozen=True, slots=True)
class _ClassInfo:
    samples: tuple[str, ...]
    firsts: frozenset[str]
    keys: frozenset[str]
    leaders: frozenset[str]


# Keyed by the identity of the lexicon's word table, which the entry keeps alive so that the
# identity cannot be reused by another table.
_CLASS_INFO: dict[tuple[int, str], tuple[object, _ClassInfo]] = {}


def _class_info(lex: Lexicon, cls: str) -> _ClassInfo:
    """What a slot class contributes to a form's first characters, keys, leading words and
    samples (computed once per lexicon and class)."""
    key = (id(lex.words), cls)
    entry = _CLASS_INFO.get(key)
    if entry is not None and entry[0] is lex.words:
        return entry[1]
    table = lex.words.get(cls, {})
    samples = list(_DIGIT_SAMPLES.get(cls, ()))
    samples += [w for w in table if w]
    if cls == "day":
        samples += [d + sfx for d in ("1", "10") for sfx in lex.ordinal_suffixes]
    firsts = {w[0] for w in table if w}
    if cls in REGEX_CLASSES or cls == "num":
        firsts |= _DIGITS
    keys = set(_DIGIT_KEYS.get(cls, ())) | {key_of(w) for w in table if w}
    if cls not in TRIGGER_CLASSES:
        leaders = _first_words(table)
    else:
        leaders = {w.split()[0] for w in table if len(w.split()) > 1}
    found = _ClassInfo(tuple(samples), frozenset(firsts), frozenset(keys), frozenset(leaders))
    _CLASS_INFO[key] = (lex.words, found)
    return found


@dataclass(frozen=True, slots=True)
class FormHead:
    """What the scanner must know of a form before compiling it: how it can start."""

    first_keys: frozenset[str]
    first_chars: frozenset[str]
    leaders: frozenset[str]
    slot_classes: frozenset[str]


_SLOT = re.compile(r"\{([a-z_0-9]+)\}")


def form_head(source: str, lex: Lexicon) -> FormHead:
    """How ``source`` can start, read off its leading tokens without building its pattern."""
    tokens = _FIXED_PIECE.sub("", source).strip().lstrip("~").split()
    keys: set[str] = set()
    chars: set[str] = set()
    leaders: set[str] = set()
    # An ending or a glued postposition continues the word a match ends with ("dünkü",
    # "지난주부터"): a token that may end the form starts runs with those endings too.
    endings = tuple(lex.particles) + tuple(g.split()[0] for g in lex.glue if g.split()) \
        if lex.spaces and (lex.particles or lex.glue) else ()
    for i, token in enumerate(tokens):
        optional = token.endswith("?") and len(token) > 1
        body = token[:-1] if optional else token
        words: list[str] = []
        if body.startswith("(") and body.endswith(")") and "{" not in body:
            options = [fold(o) for o in body[1:-1].split("|") if o]
            keys |= {key_of(o) for o in options}
            chars |= {o[0] for o in options}
            leaders |= {o for o in options if o[0].isalpha()}
            words = options
        else:
            m = _TOKEN_PIECE.match(body)
            if m is None:
                continue
            cls, choice, literal = m.group(1), m.group(2), m.group(3)
            if choice is not None:
                options = [fold(o) for o in choice.split("|") if o]
                keys |= {key_of(o) for o in options}
                chars |= {o[0] for o in options}
            elif cls:
                if cls not in lex.regex:
                    raise LocaleError(f"form {source!r} uses unknown slot {{{cls}}}")
                info = _class_info(lex, cls)
                keys |= info.keys
                chars |= info.firsts
                leaders |= info.leaders
            elif literal:
                lowered = fold(literal)
                keys.add(key_of(lowered))
                chars.add(lowered[0])
                word = _LEADING_WORD.match(lowered)
                if word and word.end() == len(lowered) and m.end() == len(body):
                    leaders.add(lowered)
            # The texts the whole token can be: a slot glued to a word makes one run of
            # letters in scripts such as Hangul ("{dir}주" is "지난주"). A token of one piece
            # starts as that piece does, which the keys above already hold.
            pieces_of_token = list(_TOKEN_PIECE.finditer(body))
            words = [""] if len(pieces_of_token) > 1 or endings else []
            for piece in pieces_of_token if words else ():
                p_cls, p_choice, p_literal = piece.group(1), piece.group(2), piece.group(3)
                if p_choice is not None:
                    texts = [fold(o) for o in p_choice.split("|") if o]
                elif p_cls:
                    texts = list(_class_info(lex, p_cls).samples) if p_cls in lex.regex else [""]
                else:
                    texts = [fold(p_literal)]
                words = _cat(words, texts)
            words = [w for w in words if w]
        if len(words) > MANY_KEYS:
            # Thousands of texts (a number glued to a unit in Hangul): the scanner files such
            # a form by their first two letters, so only those are kept.
            keys |= {"p:" + w[:2] for w in words}
        else:
            keys |= {key_of(w) for w in words}
        if endings and words and all(t.endswith("?") and len(t) > 1 for t in tokens[i + 1:]):
            # Only a word that is one run can grow by an ending glued to it.
            singles = [w for w in words if key_of(w) == w] if len(words) <= MANY_KEYS else words
            if len(singles) * len(endings) <= MANY_KEYS * 8:
                grown = {key_of(w + e) for w in singles for e in endings}
                keys |= grown if len(grown) <= MANY_KEYS else {"p:" + k[:2] for k in grown}
            else:
                keys |= {"p:" + (w + endings[0])[:2] for w in singles}
        if not optional:
            break
    return FormHead(frozenset(keys), frozenset(chars), frozenset(leaders),
                    frozenset(_SLOT.findall(source)))


def compile_form(
    source: str,
    lex: Lexicon,
    reading: str,
    order: int,
    fixed: tuple[tuple[str, object], ...] = (),
    where: str = "",
) -> Form:
    """Translate one form of ``lex.lang`` into a pattern.

    Raises:
        LocaleError: the form names an unknown slot class or is empty (message names ``where``).
    """
    text = source.strip()
    weak = text.startswith("~")
    if weak:
        text = text[1:].strip()
    given = tuple((name, int(value) if re.fullmatch(r"-?\d+", value) else value)
                  for name, value in _FIXED_PIECE.findall(text))
    if given:
        fixed = tuple(fixed) + given
        text = _FIXED_PIECE.sub("", text)
    tokens = text.split()
    if not tokens:
        raise LocaleError(f"{where}: empty form {source!r}")
    sep = r"\s+" if lex.spaces else r"\s*"
    # (regex, optional, first chars, leader words, first keys)
    pieces: list[tuple[str, bool, set[str], set[str], set[str]]] = []
    slots: list[tuple[str, str]] = []
    token_samples: list[tuple[list[str], bool]] = []
    weight = 0  # how specific the form is: tokens plus the slots and literals inside them
    bare = True
    for token in tokens:
        optional = token.endswith("?") and len(token) > 1
        body = token[:-1] if optional else token
        leaders: set[str] = set()
        keys: set[str] = set()
        if body.startswith("(") and body.endswith(")") and "{" not in body:
            options = [fold(o) for o in body[1:-1].split("|") if o]
            rx = "(?:" + "|".join(re.escape(o) for o in sorted(options, key=len, reverse=True)) + ")"
            firsts = {o[0] for o in options}
            leaders = {o for o in options if o[0].isalpha()}
            keys = {key_of(o) for o in options}
            token_samples.append((options, optional))
            weight += 1
        else:
            parts: list[str] = []
            firsts = set()
            samples = [""]
            bare = True  # the token is one slot and nothing else
            for m in _TOKEN_PIECE.finditer(body):
                weight += 1
                cls, choice, literal = m.group(1), m.group(2), m.group(3)
                first_piece = not parts
                if choice is not None:
                    # Options inside a token: "{year}'(te|de|ta|da)".
                    options = [fold(o) for o in choice.split("|") if o]
                    samples = _cat(samples, options)
                    parts.append("(?:" + "|".join(re.escape(o) for o in sorted(options, key=len, reverse=True)) + ")")
                    bare = False
                    if first_piece:
                        firsts |= {o[0] for o in options}
                        keys |= {key_of(o) for o in options}
                elif cls:
                    if cls not in lex.regex:
                        known = ", ".join(sorted(set(lex.regex)))
                        raise LocaleError(
                            f"{where}: form {source!r} uses unknown slot {{{cls}}} (known: {known})"
                        )
                    info = _class_info(lex, cls)
                    piece_samples = info.samples
                    samples = _cat(samples, piece_samples)
                    group = f"f{order}_{len(slots)}"
                    slots.append((group, cls))
                    parts.append(f"(?P<{group}>{lex.regex[cls]})")
                    if first_piece:
                        firsts |= info.firsts
                        keys |= info.keys
                        leaders |= info.leaders
                else:
                    bare = False
                    lowered = fold(literal)
                    samples = [a + lowered for a in samples]
                    parts.append(re.escape(lowered))
                    if first_piece:
                        firsts.add(lowered[0])
                        keys.add(key_of(lowered))
                        word = _LEADING_WORD.match(lowered)
                        if word and word.end() == len(lowered) and len(parts) == 1 and \
                                m.end() == len(body):
                            leaders.add(lowered)
            rx = "".join(parts)
            token_samples.append((samples, optional))
        pieces.append((rx, optional, firsts, leaders, keys))
    if lex.spaces and (lex.particles or lex.glue):
        # An ending or a glued postposition continues the word the match ends with ("haftaki",
        # "martta", "지난주부터"), so the runs a form can start with include those words too.
        endings = tuple(lex.particles) + tuple(g.split()[0] for g in lex.glue if g.split())
        for i in range(len(token_samples)):
            if all(opt for _, opt in token_samples[i + 1:]):
                samples_i, opt_i = token_samples[i]
                grown = _cat(samples_i, endings)
                token_samples[i] = (list(samples_i) + grown, opt_i)
                if i == 0 or all(opt for _, opt in token_samples[:i]):
                    rx_i, optional_i, firsts_i, leaders_i, keys_i = pieces[i]
                    pieces[i] = (rx_i, optional_i, firsts_i, leaders_i, keys_i | {key_of(t) for t in grown})
    # Join tokens; an optional token takes its separator with it.
    regex = ""
    first_chars: set[str] = set()
    first_words: set[str] = set()
    first_keys: set[str] = set()
    leading = True
    emitted = False  # has a mandatory token been written yet?
    for rx, optional, firsts, leaders, keys in pieces:
        if leading:
            first_chars |= firsts
            first_words |= leaders
            first_keys |= keys
            leading = optional
        if not emitted:
            regex += f"(?:{rx}{sep})?" if optional else rx
            emitted = not optional
        else:
            regex += f"(?:{sep}{rx})?" if optional else f"{sep}{rx}"
    # The end of the form is marked by an empty group: in a combined expression the last group
    # to close names the form that matched. (The scanner checks the word boundary before a
    # form itself, so spaced forms need only the one after.)
    if lex.spaces and (lex.particles or lex.glue):
        # Languages that glue endings and postpositions to words ("지난주에", "지난주부터").
        ends = f"(?:{trie_regex(lex.particles)})?" if lex.particles else ""
        glue = f"(?={trie_regex(lex.glue)})|" if lex.glue else ""
        regex = rf"(?:{regex}){ends}(?:{glue}{NO_WORD_AFTER})"
    elif lex.spaces:
        regex = rf"(?:{regex}){NO_WORD_AFTER}"
    regex += f"(?P<f{order}_e>)"
    # A bare word: one token that is one slot ("{month}", not "{year}'te" or "{month} ayı").
    single = slots[0][1] if len(tokens) == 1 and len(slots) == 1 and not fixed and bare else None
    pair_keys = _sample_keys(token_samples) if lex.spaces else None
    heads = _sample_keys(token_samples, 2) if lex.spaces and pair_keys is None else None
    return Form(
        lang=lex.lang,
        reading=reading,
        source=source,
        pattern=regex,
        slots=tuple(slots),
        fixed=fixed,
        weak=weak,
        single=single,
        first_chars=frozenset(first_chars),
        first_keys=frozenset(first_keys),
        pair_keys=_pairs_by_first(pair_keys) if pair_keys is not None else None,
        leaders=frozenset(first_words),
        order=order,
        spaced=lex.spaces,
        tokens=weight,
        pair_heads=_pairs_by_first(heads) if heads is not None else None,
    )


def check_pattern(form: Form, where: str) -> None:
    """Compile ``form`` alone to report a broken pattern with its place (used by the tests)."""
    try:
        re.compile(form.pattern)
    except re.error as exc:
        raise LocaleError(f"{where}: form {form.source!r} does not compile: {exc}") from None
