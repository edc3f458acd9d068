"""Text preparation: a normalized copy of the question with a map back to the original.

Scanning works on a case-folded, NFKC-normalized copy in which dashes and quotes are unified.
Every character of the copy remembers the index of the original character it came from, so a
mention's ``char_start``/``char_end`` always index the caller's string.
"""

from __future__ import annotations

import re
import unicodedata
from dataclasses import dataclass

__all__ = ["Prepared", "prepare", "fold"]

#: Turkish capital dotted I: case folding gives "i" and a combining dot above, which no word
#: of the locale data has ("İKİ" must read as "iki"); it is folded as a plain "I" is.
_DOTTED_CAPITAL_I = "\u0130"

# Length-preserving unifications applied after case folding.
_TRANSLATE = str.maketrans(
    {
        "\u2010": "-", "\u2011": "-", "\u2012": "-", "\u2013": "-", "\u2014": "-",
        "\u2015": "-", "\u2212": "-", "\u2019": "'", "\u2018": "'", "\u201b": "'",
        "\u00a0": " ", "\u202f": " ", "\u2009": " ", "\t": " ", "\n": " ", "\r": " ",
    }
)

_UNIFIED = re.compile("[" + "".join(chr(c) for c in _TRANSLATE) + "]")


@dataclass(frozen=True, slots=True)
class Prepared:
    """The original question, its normalized copy, and where each copy character came from.

    ``offsets`` is ``None`` when the copy has the same length as the original and each character
    maps to the one at the same index (the common case); otherwise ``offsets[i]`` is the original
    index of copy character ``i`` and ``offsets[len(text)] == len(original)``.
    """

    original: str
    text: str
    offsets: tuple[int, ...] | None = None

    def to_original(self, start: int, end: int) -> tuple[int, int]:
        """Map a half-open span of the copy to a half-open span of the original."""
        if self.offsets is None:
            return start, end
        o = self.offsets
        # The end maps to just past the last original character the span covers.
        return o[start], (o[end - 1] + 1 if end > start else o[start])


_new = object.__new__
_slot = Prepared.__dict__  # the slots' descriptors: their setters write a field directly
_set_original = _slot["original"].__set__
_set_text = _slot["text"].__set__
_set_offsets = _slot["offsets"].__set__


def _prepared(original: str, text: str, offsets: tuple[int, ...] | None) -> Prepared:
    """``Prepared(original, text, offsets)`` at half the cost: the frozen dataclass's own
    ``__init__`` goes through ``object.__setattr__`` for each field (every question pays it)."""
    obj = _new(Prepared)
    _set_original(obj, original)
    _set_text(obj, text)
    _set_offsets(obj, offsets)
    return obj


def prepare(text: str) -> Prepared:
    """Normalize ``text`` for scanning.

    >>> p = prepare("Bugs from LAST week")
    >>> p.text, p.offsets
    ('bugs from last week', None)
    >>> p = prepare("ﬁxed since ２０２６–01–05")
    >>> p.text, p.to_original(11, 21)
    ('fixed since 2026-01-05', (10, 20))
    """
    if not isinstance(text, str):
        from .errors import InputError

        raise InputError(f"text must be a string, got {type(text).__name__}")
    if text.isascii():
        folded = text.lower()
        if "\t" in folded or "\n" in folded or "\r" in folded:
            folded = folded.translate(_TRANSLATE)
        return _prepared(text, folded, None)
    original = text
    if _DOTTED_CAPITAL_I in text:
        text = text.replace(_DOTTED_CAPITAL_I, "I")
    if unicodedata.is_normalized("NFKC", text):
        folded = text.casefold()
        if len(folded) == len(text):
            if _UNIFIED.search(folded) is not None:  # translate() is slow on non-ASCII text
                folded = folded.translate(_TRANSLATE)
            return _prepared(original, folded, None)
    pieces: list[str] = []
    offsets: list[int] = []
    for index, ch in enumerate(text):
        piece = unicodedata.normalize("NFKC", ch).casefold().translate(_TRANSLATE)
        pieces.append(piece)
        offsets.extend([index] * len(piece))
    offsets.append(len(text))
    return Prepared(original, "".join(pieces), tuple(offsets))


def fold(text: str) -> str:
    """The normalized form of a word or phrase of locale data, exactly as :func:`prepare`
    normalizes question text (NFKC, case fold, unified dashes and quotes), so that data and
    questions always compare equal.

    >>> fold("l’AÑU pasáu"), fold("Straße")
    ("l'añu pasáu", 'strasse')
    """
    if text.isascii():
        return text.lower().translate(_TRANSLATE)
    text = text.replace(_DOTTED_CAPITAL_I, "I")
    return unicodedata.normalize("NFKC", text).casefold().translate(_TRANSLATE)
