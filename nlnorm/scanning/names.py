"""Sprints named in the question ("the Foxglove sprint", "sprint Harbor-7", "im Sprint Inkwell").

Names are not words of any language: they come from the context's sprint table, so this pass
is built per table (and set of languages) and runs only when a table is given. A name counts
only next to a sprint word of an enabled language (its ``[units] sprint`` words), before or
after it, so a sprint named like a board or a person is not read alone. A connective of the
enabled languages right before the phrase binds it as it binds any phrase ("since the
Foxglove sprint"), and two named sprints joined by a range word make a range ("between sprint
Foxglove and sprint Inkwell").
"""

from __future__ import annotations

import re
from typing import TYPE_CHECKING

from ..model import Candidate, Span
from ..preparing import Prepared, fold
from .lexicon import trie_regex

if TYPE_CHECKING:
    from ..calendars.sprints import SprintCalendar
    from .scanner import Scanner

__all__ = ["sprint_names"]

_CACHE: dict[tuple[int, tuple[str, ...]], tuple["SprintCalendar", re.Pattern[str] | None]] = {}
_WORD_BEFORE = re.compile(r"(?<!\w)(\w+)\s+$")
# Letters that continue a word in scripts written with spaces (a name or sprint word must not
# be the start of a longer word there; in scripts without spaces anything may follow).
_SPACED_LETTER = r"[0-9A-Za-z\u00c0-\u024f\u0370-\u03ff\u0400-\u052f]"


def _name_pattern(name: str) -> str:
    """A sprint name as an expression: case folded, any run of spaces, dashes, dots or
    underscores matching any other ("Harbor-7" ~ "harbor 7" ~ "harbor_7")."""
    parts = [re.escape(p) for p in re.split(r"[\s_\-./]+", fold(name)) if p]
    return r"[\s_\-./]*".join(parts)


def _pattern(cal: "SprintCalendar", scanner: "Scanner") -> re.Pattern[str] | None:
    key = (id(cal), scanner.languages)
    found = _CACHE.get(key)
    if found is not None and found[0] is cal:
        return found[1]
    words: set[str] = set()
    for lex in scanner.lexicons.values():
        for word, value in lex.words.get("unit", {}).items():
            if value == "sprint":
                words.add(word)
    names = sorted({s.name for s in cal.sprints if not s.name.strip().isdigit()}, key=len, reverse=True)
    if not words or not names:
        pattern = None
    else:
        name_alt = "|".join(_name_pattern(n) for n in names)
        word_alt = trie_regex(sorted(words))
        pattern = re.compile(
            rf"(?<!{_SPACED_LETTER})(?:(?P<w1>{word_alt})[\s\-]*(?P<n1>{name_alt})"
            rf"|(?P<n2>{name_alt})[\s\-]*(?P<w2>{word_alt}))(?!{_SPACED_LETTER})")
    if len(_CACHE) > 64:
        _CACHE.clear()
    _CACHE[key] = (cal, pattern)
    return pattern


def sprint_names(prepared: Prepared, cal: "SprintCalendar", scanner: "Scanner") -> tuple[Candidate, ...]:
    """The sprints the question names, as R24 candidates (bound by a connective before them
    when there is one, R7-R11)."""
    pattern = _pattern(cal, scanner)
    if pattern is None:
        return ()
    text = prepared.text
    found: list[Candidate] = []
    for m in pattern.finditer(text):
        name = m.group("n1") or m.group("n2")
        lang = _lang_of(scanner, m.group("w1") or m.group("w2") or "")
        found.append(Candidate(Span(m.start(), m.end()), lang, "R24", (("sprint_name", name),)))
    if not found:
        return ()
    return _bind(prepared, found, scanner)


def _lang_of(scanner: "Scanner", word: str) -> str:
    for lang, lex in scanner.lexicons.items():
        if lex.words.get("unit", {}).get(word) == "sprint":
            return lang
    return next(iter(scanner.lexicons))


def _bind(prepared: Prepared, found: list[Candidate], scanner: "Scanner") -> tuple[Candidate, ...]:
    """Connectives before a named sprint, and ranges between two named sprints."""
    from .combine import _BOUND, _POST_BOUND, _group, _relations, _start

    text = prepared.text
    conn = scanner.connectives
    out: list[Candidate] = []
    # A short leading word before a name ("since the Foxglove sprint", "dem Sprint X") joins it,
    # unless it ends a connective itself ("antes del sprint X": "antes del" is the connective).
    joined = []
    bare_starts = []
    for a in found:
        bare_starts.append(a.span.start)
        m = _WORD_BEFORE.search(text, 0, a.span.start)
        if m is not None and m.group(1) in scanner.leader_words and len(m.group(1)) <= 4:
            a = Candidate(Span(m.start(1), a.span.end), a.lang, a.reading, a.slots)
        joined.append(a)
    found = joined
    i = 0
    while i < len(found):
        a = found[i]
        pre = conn.before.search(text, max(0, bare_starts[i] - 32), bare_starts[i])
        word = _group(pre, "c", "c2") if pre else None
        rel = _relations(scanner, word, a.lang) if word else frozenset()
        if rel and pre and bare_starts[i] != a.span.start and _start(pre, "c", "c2") >= a.span.start:
            rel = frozenset()  # the joined word alone ("по Foxglove-спринту"): it stays joined
        if not rel:
            pre = conn.before.search(text, max(0, a.span.start - 32), a.span.start)
            word = _group(pre, "c", "c2") if pre else None
            rel = _relations(scanner, word, a.lang) if word else frozenset()
        else:
            a = Candidate(Span(bare_starts[i], a.span.end), a.lang, a.reading, a.slots)
        start = _start(pre, "c", "c2") if pre else a.span.start
        if i + 1 < len(found):
            b = found[i + 1]
            gap = conn.join.fullmatch(text, a.span.end, b.span.start)
            if gap is not None:
                begin = start if rel & {"between", "from"} else a.span.start
                out.append(Candidate(Span(begin, b.span.end), a.lang, "R11", connective="between",
                                     parts=(a, b)))
                i += 2
                continue
        bound = next((r for r in ("since", "after", "before", "until") if r in rel), None)
        # A postposition after the phrase ("Foxgloveスプリントから", "Foxglove 스프린트부터").
        post = conn.suffix.match(text, a.span.end)
        post_word = _group(post, "s", "s2") if post else None
        post_rel = _relations(scanner, post_word, a.lang) if post_word else frozenset()
        post_bound = next((_POST_BOUND[r] for r in _POST_BOUND if r in post_rel), None)
        if post_bound is not None and post is not None:
            out.append(Candidate(Span(a.span.start if bound is None else start, post.end()), a.lang,
                                 _BOUND[post_bound], connective=post_bound, parts=(a,)))
        elif bound is not None:
            out.append(Candidate(Span(start, a.span.end), a.lang, _BOUND[bound], connective=bound,
                                 parts=(a,)))
        elif rel & {"within", "from", "on_day"}:
            out.append(Candidate(Span(start, a.span.end), a.lang, "R24", a.slots))
        else:
            out.append(a)
        i += 1
    return tuple(out)
