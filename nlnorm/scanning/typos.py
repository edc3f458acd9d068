"""A small, bounded tolerance for misspelt time words.

One edit (a letter left out, added, changed, or two neighbours swapped) on a time word of six
or more letters in a language written with spaces: "yesterdy", "letze Woche", "wendesday".
A corrected word shorter than eight letters counts only inside a phrase that also holds a word
spelt right ("letze Woche"): alone, such a word is too often a real word of another language.
The question is scanned again with the word corrected; a phrase found only that way gets a
lower ``confidence`` and a note saying how the word was read. A correction never turns a known
word into a time word, never yields a weak phrase, and never touches ambiguous or quiet words
(the look-alikes of ``[ambiguous]``), so the trap lists stay clean.
"""

from __future__ import annotations

import re
from collections import defaultdict
from dataclasses import dataclass, field, replace
from types import MappingProxyType
from typing import TYPE_CHECKING, Callable, Mapping, cast

from ..locale import load_locale
from ..model import Candidate, Span
from ..preparing import Prepared

if TYPE_CHECKING:
    from .scanner import Scanner

__all__ = ["TypoIndex", "typo_index", "corrections", "CONFIDENCE", "within_one_edit"]

#: Confidence of a phrase found only after correcting a typo.
CONFIDENCE = 0.8
MIN_LENGTH = 6  # time words shorter than this are never corrected
_WORD = re.compile(r"[^\W\d_]{5,}")


@dataclass(frozen=True, slots=True)
class TypoIndex:
    """Time words by their one-letter deletions, and every word the languages know."""

    deletions: Mapping[str, frozenset[str]]
    known: frozenset[str]
    heads: frozenset[str]  # first three letters of the time words
    tails: frozenset[str]  # last three letters
    memo: dict[str, str | None] = field(default_factory=dict)  # word -> its correction (or None)
    fixable: set[str] = field(default_factory=set)  # the words of memo that have a correction


def _deletions(word: str) -> set[str]:
    return {word[:i] + word[i + 1 :] for i in range(len(word))}


def typo_index(languages: tuple[str, ...], lexicons: tuple[object, ...]) -> TypoIndex | None:
    """The index of the spaced languages among ``languages`` (``None`` if there are none)."""
    from .lexicon import Lexicon

    by_deletion: dict[str, set[str]] = defaultdict(set)
    known: set[str] = set()
    heads: set[str] = set()
    tails: set[str] = set()
    any_spaced = False
    for lang, lex in zip(languages, lexicons):
        assert isinstance(lex, Lexicon)
        data = load_locale(lang)
        if not lex.spaces:
            continue
        any_spaced = True
        refused = set(lex.ambiguous) | set(data.quiet) | set(lex.not_temporal)
        words: set[str] = set()
        for table in lex.words.values():
            for entry in table:
                for token in entry.split():
                    known.add(token)
                    if token.isalpha() and len(token) >= MIN_LENGTH and token not in refused:
                        words.add(token)
        for phrases in data.connectives.values():
            for phrase in phrases:
                for token in phrase.lower().split():
                    known.add(token)
                    if token.isalpha() and len(token) >= MIN_LENGTH:
                        words.add(token)
        known |= refused
        for word in words:
            by_deletion[word].add(word)
            for d in _deletions(word):
                by_deletion[d].add(word)
            heads.add(word[:3])
            tails.add(word[-3:])
    if not any_spaced:
        return None
    return TypoIndex(MappingProxyType({k: frozenset(v) for k, v in by_deletion.items()}),
                     frozenset(known), frozenset(heads), frozenset(tails))


def within_one_edit(a: str, b: str) -> bool:
    """Whether ``a`` becomes ``b`` by one deletion, insertion, substitution or swap of
    neighbours (Damerau-Levenshtein distance 1).

    >>> within_one_edit("yesterdy", "yesterday"), within_one_edit("wendesday", "wednesday")
    (True, True)
    >>> within_one_edit("mouths", "months"), within_one_edit("weekly", "weeks")
    (True, False)
    """
    if a == b:
        return False
    la, lb = len(a), len(b)
    if abs(la - lb) > 1:
        return False
    i = 0
    while i < min(la, lb) and a[i] == b[i]:
        i += 1
    if la == lb:
        if a[i + 1 :] == b[i + 1 :]:
            return True
        return i + 1 < la and a[i] == b[i + 1] and a[i + 1] == b[i] and a[i + 2 :] == b[i + 2 :]
    if la > lb:
        return a[i + 1 :] == b[i:]
    return a[i:] == b[i + 1 :]


def corrections(text: str, index: TypoIndex, taken: list[Span]) -> list[tuple[int, int, str]]:
    """Words of ``text`` one edit from a time word: ``(start, end, time word)``, outside the
    spans already ``taken`` by exact phrases."""
    out: list[tuple[int, int, str]] = []
    memo = index.memo
    words = set(_WORD.findall(text))
    fixable = index.fixable
    extra: dict[str, str] = {}  # corrections of words met when the memory is full
    for word in words.difference(memo):
        fix = _correction(word, index)
        if len(memo) < _MEMO_SIZE:
            memo[word] = fix
            if fix is not None:
                fixable.add(word)
        elif fix is not None:
            extra[word] = fix
    if fixable.isdisjoint(words) and not extra:
        return out  # the common case: no word of the question is a known misspelling
    for m in _WORD.finditer(text):
        word = m.group()
        fix = memo.get(word) or extra.get(word)
        if fix is None:
            continue
        start, end = m.span()
        if any(s.start < end and start < s.end for s in taken):
            continue
        out.append((start, end, fix))
    return out


def index_of(scanner: "Scanner") -> TypoIndex | None:
    """The typo index of ``scanner``'s languages (built on first use, kept with the scanner;
    ``None`` when none of them is written with spaces)."""
    cache = scanner._cache
    if "typos" not in cache:
        cache["typos"] = typo_index(
            scanner.languages, tuple(scanner.lexicons[lang] for lang in scanner.languages))
    return cast("TypoIndex | None", cache["typos"])


def holds_typo(word: str, index: TypoIndex | None) -> bool:
    """Whether ``word`` (a whole word of a question, as the scanner splits them) holds a run
    of letters one edit from a time word. The scanner asks once per word it meets and
    remembers the answer, so a question holding no such word skips the typo pass at once."""
    return index is not None and any(_correction(run, index) is not None
                                     for run in _WORD.findall(word))


_UNSEEN = object()
_MEMO_SIZE = 200_000  # words remembered per scanner (a question log repeats its vocabulary)


def _correction(word: str, index: TypoIndex) -> str | None:
    """The one time word ``word`` is one edit from, or ``None``."""
    if word in index.known or (word[:3] not in index.heads and word[-3:] not in index.tails):
        return None
    deletions = index.deletions
    found = set(deletions.get(word, ()))
    for d in _deletions(word):
        found |= deletions.get(d, frozenset())
    found = {w for w in found if within_one_edit(word, w)}
    if len(found) > 1:
        same_start = {w for w in found if w[0] == word[0]}
        found = same_start if len(same_start) == 1 else set()
    return found.pop() if len(found) == 1 else None


#: A corrected word this long may stand alone as a phrase ("yesterdy", "wendesday").
LONG = 8


def _vouched(text: str, start: int, end: int, covered: list[tuple[int, int, str]]) -> bool:
    """Whether a phrase found after correcting typos is trustworthy: it holds a word or number
    spelt right besides the corrected ones ("letze Woche"), or every correction is a long word.
    A short word alone is too often a real word of another language ("Sorgen", "mogen" are one
    edit from "morgen")."""
    if all(len(word) >= LONG for _, _, word in covered):
        return True
    rest = list(text[start:end])
    for s, e, _ in covered:
        for i in range(s - start, e - start):
            rest[i] = " "
    return any(ch.isalnum() for ch in rest)


def corrected(prepared: Prepared, fixes: list[tuple[int, int, str]]
              ) -> tuple[Prepared, list[int], tuple[tuple[int, int], ...]]:
    """The prepared text with each word replaced; for every character of the new text the
    index of the character of ``prepared.text`` it stands for (plus one entry for the end);
    and where each replacement stands in the new text. The new text is only scanned: its
    phrases are mapped back with that index, so it needs no map to the original."""
    text = prepared.text
    pieces: list[str] = []
    back: list[int] = []
    spans: list[tuple[int, int]] = []
    cursor = 0
    size_so_far = 0
    for start, end, word in fixes:
        pieces.append(text[cursor:start])
        back.extend(range(cursor, start))
        size_so_far += start - cursor
        pieces.append(word)
        # Every letter of the replacement maps into the misspelt word, first onto its first
        # letter and last onto its last, so a phrase covering one covers the other.
        span, size = end - start, len(word)
        back.extend(start + (i * (span - 1)) // max(size - 1, 1) for i in range(size))
        spans.append((size_so_far, size_so_far + size))
        size_so_far += size
        cursor = end
    pieces.append(text[cursor:])
    back.extend(range(cursor, len(text)))
    back.append(len(text))
    return Prepared(prepared.original, "".join(pieces), None), back, tuple(spans)


def mapped(c: Candidate, back: list[int], note: str) -> Candidate:
    """A candidate of the corrected text, with its spans moved back onto the prepared text."""
    parts = tuple(mapped(p, back, note) for p in c.parts)
    span = Span(back[c.span.start], back[c.span.end - 1] + 1)
    return replace(c, span=span, parts=parts, confidence=CONFIDENCE,
                   slots=c.slots + (("typo", note),) if not c.parts else c.slots)


def typo_candidates(prepared: Prepared, scanner: "Scanner", exact: tuple[Candidate, ...],
                    scan_exact: Callable[..., tuple[Candidate, ...]]) -> tuple[Candidate, ...]:
    """Phrases found only after correcting misspelt time words (the caller has seen that a
    word of the question may be one: see :func:`holds_typo`)."""
    index = index_of(scanner)
    if index is None:
        return ()
    fixes = corrections(prepared.text, index, [c.span for c in exact])
    if not fixes:
        return ()
    fixed, back, near = corrected(prepared, fixes)
    # A phrase found after correcting must hold a corrected word: only the forms that start
    # near one (within the scanner's lookback) are tried.
    found = scan_exact(fixed, scanner, near)
    out = []
    for c in found:
        covered = [f for f in fixes if back[c.span.start] <= f[0] and f[1] <= back[c.span.end - 1] + 1]
        if not covered or any(e.span.start < back[c.span.end - 1] + 1 and back[c.span.start] < e.span.end
                              for e in exact):
            continue
        if not _vouched(prepared.text, back[c.span.start], back[c.span.end - 1] + 1, covered):
            continue
        note = ", ".join(f"{prepared.text[s:e]!r} read as {w!r}" for s, e, w in covered)
        out.append(mapped(c, back, note))
    return tuple(out)
