"""The form language of locales/ and its compiler.

A form is a phrase pattern written with spaces between tokens::

    "(in|over|within|during)? the (last|past) {num} {unit}"

- ``{cls}`` is a slot: any word of the lexicon class ``cls`` (or its regular expression);
- ``(a|b)`` is one of several literal words;
- a trailing ``?`` makes the token optional; a leading ``~`` marks the whole form as weak
  (it becomes a mention only with a cue such as a connective);
- anything else is literal text. Between tokens goes white space (``\\s+``), or optional
  white space in languages written without spaces.

Each form compiles to its own anchored regular expression; the scanner tries the forms whose
first character fits the position and keeps the longest match.
"""

from __future__ import annotations

import re
from dataclasses import dataclass

from ..errors import LocaleError
from .lexicon import REGEX_CLASSES, Lexicon

__all__ = ["Form", "compile_form", "CANONICAL_SLOT"]

_TOKEN_PIECE = re.compile(r"\{([a-z_0-9]+)\}|([^{}]+)")
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


@dataclass(frozen=True, slots=True)
class Form:
    """A compiled form of one language."""

    lang: str
    reading: str
    source: str
    regex: re.Pattern[str]
    slots: tuple[tuple[str, str], ...]  # (regex group, slot class)
    fixed: tuple[tuple[str, object], ...]
    weak: bool
    single: str | None  # the slot class when the form is one bare slot
    first_chars: frozenset[str]
    order: int
    tokens: int  # specificity: tokens plus the slots and literal pieces inside them

    @property
    def group(self) -> str:
        """The name of this form's group in a combined expression."""
        return f"f{self.order}"


def _first_chars_of_words(words: object) -> set[str]:
    return {w[0] for w in words if w}  # type: ignore[union-attr]


def compile_form(
    source: str,
    lex: Lexicon,
    reading: str,
    order: int,
    fixed: tuple[tuple[str, object], ...] = (),
    where: str = "",
) -> Form:
    """Compile one form of ``lex.lang``.

    Raises:
        LocaleError: the form names an unknown slot class or is empty (message names ``where``).
    """
    text = source.strip()
    weak = text.startswith("~")
    if weak:
        text = text[1:].strip()
    tokens = text.split()
    if not tokens:
        raise LocaleError(f"{where}: empty form {source!r}")
    sep = r"\s+" if lex.spaces else r"\s*"
    pieces: list[tuple[str, bool, set[str]]] = []  # (regex, optional, first chars)
    weight = 0  # how specific the form is: tokens plus the slots and literals inside them
    slots: list[tuple[str, str]] = []
    for token in tokens:
        optional = token.endswith("?") and len(token) > 1
        body = token[:-1] if optional else token
        if body.startswith("(") and body.endswith(")") and "{" not in body:
            options = [o for o in body[1:-1].split("|") if o]
            rx = "(?:" + "|".join(re.escape(o.lower()) for o in sorted(options, key=len, reverse=True)) + ")"
            firsts = {o[0].lower() for o in options}
            weight += 1
        else:
            parts: list[str] = []
            firsts = set()
            for m in _TOKEN_PIECE.finditer(body):
                weight += 1
                cls, literal = m.group(1), m.group(2)
                if cls:
                    if cls not in lex.regex:
                        known = ", ".join(sorted(set(lex.regex)))
                        raise LocaleError(
                            f"{where}: form {source!r} uses unknown slot {{{cls}}} (known: {known})"
                        )
                    group = f"f{order}_{len(slots)}"
                    slots.append((group, cls))
                    parts.append(f"(?P<{group}>{lex.regex[cls]})")
                    if not parts[:-1]:
                        if cls in REGEX_CLASSES or cls == "num":
                            firsts |= _DIGITS
                        if cls in lex.words:
                            firsts |= _first_chars_of_words(lex.words[cls])
                else:
                    parts.append(re.escape(literal.lower()))
                    if len(parts) == 1:
                        firsts.add(literal[0].lower())
            rx = "".join(parts)
        pieces.append((rx, optional, firsts))
    # Join tokens; an optional token takes its separator with it.
    regex = ""
    first_chars: set[str] = set()
    leading = True
    emitted = False  # has a mandatory token been written yet?
    for rx, optional, firsts in pieces:
        if leading:
            first_chars |= firsts
            leading = optional
        if not emitted:
            regex += f"(?:{rx}{sep})?" if optional else rx
            emitted = not optional
        else:
            regex += f"(?:{sep}{rx})?" if optional else f"{sep}{rx}"
    if lex.spaces:
        regex = rf"(?<!\w)(?:{regex})(?!\w)"
    single = slots[0][1] if len(tokens) == 1 and len(slots) == 1 and not fixed else None
    try:
        compiled = re.compile(regex)
    except re.error as exc:
        raise LocaleError(f"{where}: form {source!r} does not compile: {exc}") from None
    return Form(
        lang=lex.lang,
        reading=reading,
        source=source,
        regex=compiled,
        slots=tuple(slots),
        fixed=fixed,
        weak=weak,
        single=single,
        first_chars=frozenset(first_chars),
        order=order,
        tokens=weight,
    )
