"""Scanning: prepared text -> candidate phrases (spans and slot values), no dates yet."""

from __future__ import annotations

import functools
import re
from bisect import bisect_right
from typing import TYPE_CHECKING

from ..model import Candidate, Span
from ..preparing import Prepared
from .combine import combine, dropped_alone
from .typos import holds_typo, index_of, typo_candidates
from .forms import CANONICAL_SLOT
from .lexicon import REGEX_CLASSES, WORD, is_word_char
from .scanner import Scanner, scanner_for

if TYPE_CHECKING:
    from ..context import Context
    from .forms import Form
    from .scanner import Bucket

__all__ = ["scan", "scan_text", "scanner_for", "Scanner"]

# A word in any script: letters, digits and the combining marks that continue them.
_TOKEN = re.compile(f"{WORD}+")
_ASCII_TOKEN = re.compile("[0-9A-Z_a-z]+")  # _TOKEN on ASCII text
_DIGIT = re.compile(r"\d")
# A number that starts a word, not inside a number ("2025.1") or after a key ("WRN-2025").
_LATIN_AFTER_NUMBER = re.compile(r"\d+ *(?:[a-z]|$)")
_FREE_NUMBER = re.compile(r"(?<![\w.,:/#])(?<![^\W\d_]-)\d")
# A number right after a letter that is not a Latin one ("到2025", "以来3"), in languages written
# without spaces; Latin letters before digits make ticket keys and versions ("v2", "q3").
_GLUED_NUMBER = re.compile(r"[^\W\d_a-zA-Z](?=\d)")  # the number starts at the match's end
# The first two runs at a position: letters, digits, or one other character (see runs_key).
_PAIR = re.compile(r"([^\W\d_]+|\d+|[^\w\s])\s*([^\W\d_]+|\d+|[^\w\s])?")


def scan(prepared: Prepared, ctx: "Context") -> tuple[Candidate, ...]:
    """Find the candidate time phrases of a prepared question in ``ctx.languages``.

    >>> from nlnorm.context import Context
    >>> from nlnorm.preparing import prepare
    >>> ctx = Context.at("2026-11-27T10:00", tz="Europe/Berlin")
    >>> [(c.reading, c.slots) for c in scan(prepare("bugs from last week"), ctx)]
    [('R2', (('dir', -1), ('unit', 'week')))]
    """
    global _last_scanner
    last = _last_scanner  # one tuple, read at once: safe when threads share the module
    languages = ctx.languages
    if last is None or last[0] is not languages:
        # Hashing the tuple of languages for scanner_for's cache costs more than this check.
        last = _last_scanner = (languages, scanner_for(languages))
    return scan_text(prepared, last[1])


#: (languages, their scanner): a batch uses one context throughout.
_last_scanner: tuple[tuple[str, ...], Scanner] | None = None


def scan_text(prepared: Prepared, scanner: Scanner) -> tuple[Candidate, ...]:
    """:func:`scan` with an explicit scanner (no context needed): exact phrases, then the
    phrases a one-letter typo hid (lower confidence, see :mod:`nlnorm.scanning.typos`)."""
    text = prepared.text
    # ASCII text needs no class of every script's letters and marks: the same words, sooner.
    present = set((_ASCII_TOKEN if text.isascii() else _TOKEN).findall(text))
    hits, leaders, typo, lettered = _marks(text, scanner, present)
    exact = _scan_exact(prepared, scanner, None, (hits, leaders, lettered))
    if not typo:
        return exact  # no word of the question is one edit from a time word
    fuzzy = typo_candidates(prepared, scanner, exact, _scan_exact)
    if not fuzzy:
        return exact
    return tuple(sorted(exact + fuzzy, key=lambda c: c.span.start))


def _marks(text: str, scanner: Scanner, present: set[str] | None = None
           ) -> tuple[list[int], list[int], bool, bool]:
    """Positions of trigger words and of leading words, in one pass over the words of
    ``text`` (set lookups: no expression over every word of every language to compile), plus
    the expression of the languages written without spaces; and whether a word may be a
    misspelt time word (see :func:`typos.holds_typo`); and whether the text holds a letter
    of the languages written without spaces (see _state).

    What each word is (trigger, leader, number, nothing; misspelt or not) is remembered per
    scanner, so a question whose words are all known to be nothing leaves after two set
    operations."""
    hits: list[int] = []
    leaders: list[int] = []
    if present is None:
        present = set(_TOKEN.findall(text))
    cache = scanner._cache
    state = cache.get("words")
    kinds, letter_gate = state if state is not None else _state(scanner)
    room = len(kinds) < _KINDS_SIZE
    typo = False
    only_numbers = True
    found: list[tuple[str, int]] = []  # (word, kind) of the triggers
    leading: list[str] = []
    index = None
    get = kinds.get
    for word in present:
        kind = get(word)
        if kind is None:  # a word met for the first time: what it is, remembered if there is room
            if index is None:
                index = index_of(scanner)
            kind = _kind(word, scanner) | (_TYPO if holds_typo(word, index) else 0)
            if room:
                kinds[word] = kind
        if kind:
            if kind & _TYPO:
                typo = True
                kind ^= _TYPO
                if not kind:
                    continue
            if kind == _LEADER:
                leading.append(word)
            else:
                found.append((word, kind))
                if kind != _NUMBER:
                    only_numbers = False
    gate = scanner.unspaced_gate
    lettered = letter_gate.search(text) is not None  # _NEVER when no language lacks spaces
    gated = gate is not None and lettered
    if not gated and (not found or (only_numbers and _FREE_NUMBER.search(text) is None)):
        return hits, leaders, typo, lettered  # no time word, and every number is part of a key or a version
    size = len(text)
    for word, kind in found:
        for at in _whole_words(text, word, 0, size):
            if kind == _NUMBER:
                prev = text[at - 1] if at else " "
                # Not inside a number ("2025.1") or a ticket key ("WRN-2025": common practice).
                if prev not in ".,:/#" and not (prev == "-" and at > 1 and text[at - 2].isalpha()):
                    hits.append(at)
            elif kind == _TRIGGER:
                hits.append(at)
            else:
                hits.append(at + kind - _DIGIT_AT)  # "q3", "w48"
    if hits or gated:
        if leading:
            if gated:
                low, high = 0, size
            else:
                # Only leaders within the lookback before a trigger are tried (_scan_exact).
                low, high = max(0, min(hits) - scanner.lookback), max(hits)
            for word in leading:
                leaders.extend(_whole_words(text, word, low, high + len(word)))
            leaders.sort()
        hits.sort()
    if gated and scanner.unspaced_marks is not None:
        # Languages without spaces: the (large) expression runs only where a character that
        # can start one of their words stands; a question in another script skips it.
        marks = scanner.unspaced_marks.match
        heads = scanner.unspaced_heads
        end = -1
        for g in gate.finditer(text):  # type: ignore[union-attr]
            at = g.start()
            if at < end or (text[at:at + 2] not in heads and text[at] not in heads):
                continue  # inside the last word found, or no word starts with these two
            m = marks(text, at)
            if m is not None and m.end() > at:
                (hits if m.lastgroup == "t" else leaders).append(at)
                end = m.end()
        # A number glued after a word of a script written without spaces ("到2025-03-31").
        hits.extend(m.end() for m in _GLUED_NUMBER.finditer(text))
        hits.sort()
        leaders.sort()
    elif gate is not None and hits and not text.isascii() and _DIGIT.search(text) is not None:
        # A number glued after a letter of another script ("с2025"). A number that starts a
        # phrase of a language without spaces ("3天前") is a hit already, so the forms starting
        # there are tried; as a leader it would add no place to try.
        hits.extend(m.end() for m in _GLUED_NUMBER.finditer(text))
        hits = sorted(set(hits))
    return hits, leaders, typo, lettered


# What a word of a question is to the scanner (see _kind); "q3" is _DIGIT_AT + 1.
_NOTHING, _TRIGGER, _LEADER, _NUMBER, _DIGIT_AT = 0, 1, 2, 3, 4
_TYPO = 1 << 20  # added to a word's kind when it may be a misspelt time word
_KINDS_SIZE = 200_000  # words remembered per scanner (a question log repeats its vocabulary)
_State = tuple[dict[str, int], re.Pattern[str]]


def _whole_words(text: str, word: str, low: int, stop: int) -> list[int]:
    """Where ``word`` stands in ``text[low:stop]`` as a whole word: no word character (see
    :func:`is_word_char`, tested quickly for the common case of a space or a letter) on
    either side."""
    out: list[int] = []
    size = len(text)
    at = text.find(word, low, stop)
    while at >= 0:
        end = at + len(word)
        before = text[at - 1] if at else " "
        after = text[end] if end != size else " "
        if not (before.isalnum() or before == "_" or (not before.isascii() and is_word_char(before))) and \
                not (after.isalnum() or after == "_" or (not after.isascii() and is_word_char(after))):
            out.append(at)
        at = text.find(word, at + 1, stop)
    return out


def _state(scanner: Scanner) -> _State:
    """What the words met so far are to ``scanner``: every word's kind, the words that are
    something (a kind, or a possible typo), the numbers, the possible typos, and the gate of letters of the languages without spaces."""
    found = scanner._cache.get("words")
    if found is None:
        gate = scanner.unspaced_gate
        # The languages without spaces are looked for only in a question holding a character of
        # a script other than Latin, Greek or Cyrillic: digits are found as words of their own,
        # and a Latin word of theirs ("下一个sprint", "Sprint 42里") stands in such a question.
        # A language without spaces written in one of those scripts (some of the CLDR tier) is
        # looked for wherever one of its words can start.
        letters = _NEVER
        if gate is not None:
            from .. import cldr
            from ..preparing import fold

            latin = False
            for lang, lex in scanner.lexicons.items():
                if lex.spaces:
                    continue
                texts = [f.text for f in cldr.relative_fields(lang)] if lang != "und" else []
                other = sum(1 for t in texts if _OTHER_SCRIPT.search(fold(t)))
                latin = latin or (bool(texts) and other * 2 < len(texts))
            # With such a language on, every character that can start a word of theirs counts.
            letters = re.compile(re.sub(r"[0-9]", "", gate.pattern)) if latin else _OTHER_SCRIPT
        found = ({}, letters)
        scanner._cache["words"] = found
    return found


_NEVER = re.compile(r"(?!)")
_OTHER_SCRIPT = re.compile(r"[^\x00-\u024f\u0300-\u052f\u1e00-\u1eff\u2000-\u206f]")


def _kind(tok: str, scanner: Scanner) -> int:
    """What the word ``tok`` of a question is: a trigger, a leading word, a number (whether it
    triggers depends on the character before it), a word holding a digit ("q3"), or nothing."""
    if tok[0].isdigit():
        return _NUMBER
    if tok in scanner.trigger_words:
        return _TRIGGER
    endings = scanner.endings
    if endings and (tok in scanner.glued_triggers or (not tok.isascii() and any(
            base in scanner.trigger_words for base in _without_ending(tok, endings)))):
        return _TRIGGER
    if tok in scanner.leader_words:
        return _LEADER
    if not tok.isalpha():
        for i, ch in enumerate(tok):
            if ch.isdigit():
                return _DIGIT_AT + i
    return _NOTHING


def _without_ending(tok: str, endings: tuple[str, ...]) -> set[str]:
    """``tok`` without one or two glued endings ("haftaki" -> "hafta", "지난주에는" -> "지난주"),
    every way the endings can be cut off ("haftada" is "hafta" + "da", not "haft" + "a" + "da").
    Cost grows with the length of the longest ending, not with the number of endings."""
    table = _ending_table(endings)
    known, lengths = table
    out: set[str] = set()
    for size in lengths:
        if size >= len(tok) or tok[-size:] not in known:
            continue
        base = tok[:-size].rstrip("'")
        if not base:
            continue
        out.add(base)
        for second in lengths:
            if second < len(base) and base[-second:] in known:
                rest = base[:-second].rstrip("'")
                if rest:
                    out.add(rest)
    return out


@functools.lru_cache(maxsize=16)
def _ending_table(endings: tuple[str, ...]) -> tuple[frozenset[str], tuple[int, ...]]:
    return frozenset(endings), tuple(sorted({len(e) for e in endings if e}))


def _elided_start(text: str, k: int) -> int | None:
    """The start of an elided word glued by an apostrophe to the word at ``k`` ("d'" of
    "d'ici"), or ``None``."""
    if k > 1 and text[k - 1] == "'" and text[k - 2].isalpha():
        k -= 1
        while k > 0 and text[k - 1].isalpha():
            k -= 1
        return k
    return None


def _scan_exact(prepared: Prepared, scanner: Scanner,
                near: tuple[tuple[int, int], ...] | None = None,
                marks: tuple[list[int], list[int], bool] | None = None) -> tuple[Candidate, ...]:
    """The exact phrases of a prepared text; with ``near``, only phrases that may cover one of
    those spans (used after correcting typos: a phrase must hold a corrected word). ``marks``
    are the text's trigger and leader positions when the caller has them (see _marks)."""
    text = prepared.text
    if marks is None:
        hits, leaders, _, lettered = _marks(text, scanner)
    else:
        hits, leaders, lettered = marks
    if near is not None:
        back = scanner.lookback
        hits = [h for h in hits if any(s - back <= h < e + back for s, e in near)]
    if not hits:
        return ()
    # A language with marks (kana: Japanese) wins ties when the question holds one, and loses
    # them when it holds none.
    prefer: dict[str, int] | None = None  # worked out on the first tie that needs it
    # Forms start at a trigger, at the start of the word holding it ("q3"), or at a leading
    # word shortly before it ("in the last 3 weeks").
    positions = set(hits)
    for hit in hits:
        k = hit
        while k > 0 and text[k - 1].isascii() and text[k - 1].isalnum():
            k -= 1
        positions.add(k)
        # A sign before a number starts a form: CLDR's narrow patterns ("-3 a", "+2 j").
        if k > 0 and text[k - 1] in "+-" and text[k].isdigit() and (
                k == 1 or not text[k - 2].isalnum()):
            positions.add(k - 1)
        # An elided word glued to it by an apostrophe starts a form too ("l'année", "dell'anno").
        if k > 1 and text[k - 1] == "'":
            elided = _elided_start(text, k)
            if elided is not None:
                positions.add(elided)
    if leaders:
        back = scanner.lookback
        for hit in hits:
            k = bisect_right(leaders, hit)
            j = k
            while j > 0 and hit - leaders[j - 1] <= back:
                j -= 1
            for lead in leaders[j:k]:
                positions.add(lead)
                if lead > 1 and text[lead - 1] == "'":  # "d'ici 3 jours": the word is "ici"
                    elided = _elided_start(text, lead)
                    if elided is not None:
                        positions.add(elided)
    found: list[tuple[re.Match[str], Form]] = []  # (match, form) of each phrase
    limit = 0
    pair = _PAIR.match
    # The forms of languages without spaces are tried only where _marks looks for them.
    unspaced = scanner.unspaced and lettered
    starts = scanner._cache.get("starts")
    if starts is None:
        starts = scanner._cache["starts"] = {}
    for pos in sorted(positions) if len(positions) > 1 else positions:
        if pos < limit:
            continue
        if pos:
            ch = text[pos - 1]
            at_word = not (ch.isalnum() or ch == "_" or (not ch.isascii() and is_word_char(ch)))
        else:
            at_word = True
        ch = text[pos]
        with_chars = unspaced and not (ch.isdigit() and _LATIN_AFTER_NUMBER.match(text, pos))
        m0 = pair(text, pos) if at_word else None
        # The buckets tried at a place depend only on its first two runs (the text of the
        # match m0) and where it stands: looked up once per such start, not key by key.
        start_key = (m0.group() if m0 is not None else "") + \
            ("\x01" if at_word else "\x00") + (ch if with_chars else "")
        tried = starts.get(start_key)
        if tried is None:
            first = second = ""
            if m0 is not None:
                first, second = m0.groups("")
                if first[0].isdigit():
                    first = _DIGIT_KEYS[min(len(first), 4)]
                if second and second[0].isdigit():
                    second = _DIGIT_KEYS[min(len(second), 4)]
            tried = _buckets_at(scanner, first, second, at_word, ch if with_chars else "")
            if len(starts) < _STARTS_SIZE:
                starts[start_key] = tried
        if not tried:
            continue
        best = None
        best_end = -1
        for by_char, buckets in tried:
            for bucket in buckets:
                m = bucket.regex.match(text, pos)
                if m is None:
                    continue
                if by_char and len(bucket.forms) > 1:
                    if prefer is None:
                        prefer = _preferences(scanner, text)
                    m = _longest(bucket, text, pos, m, prefer)
                end = m.end()
                if end > best_end:
                    # each alternative of a bucket is a named group: lastgroup is never None
                    best, best_end = (m, bucket.forms[m.lastgroup]), end  # type: ignore[index]
                elif end == best_end and best is not None:
                    form = bucket.forms[m.lastgroup]  # type: ignore[index]
                    if prefer is None:
                        prefer = _preferences(scanner, text)
                    if (prefer.get(form.lang, 0), form.tokens, -form.order) > \
                            (prefer.get(best[1].lang, 0), best[1].tokens, -best[1].order):
                        best = (m, form)
        if best is None:
            continue
        limit = best_end
        # Matches of "N" forms only keep shorter forms from matching inside them.
        if best[1].reading != "N":
            found.append(best)
    if not found:
        return ()
    if len(found) == 1:
        # A weak phrase alone with no cue around it ("may", a bare year) is dropped before
        # it is built (combine.dropped_alone proves combine would drop it).
        m, form = found[0]
        slots, weak, nameable = _values(m, form, scanner, prepared)
        if weak and dropped_alone(prepared, m.start(), m.end(), form.reading, slots, nameable,
                                  scanner):
            return ()
        return combine(prepared, [Candidate(Span(m.start(), m.end()), form.lang, form.reading,
                                            slots, weak, nameable=nameable)], scanner)
    return combine(prepared, [_candidate(m, form, scanner, prepared) for m, form in found],
                   scanner)


_STARTS_SIZE = 100_000
_DIGIT_KEYS = ("", "#1", "#2", "#3", "#4")


def _buckets_at(scanner: Scanner, first: str, second: str, at_word: bool, ch: str
                ) -> tuple[tuple[bool, tuple[Bucket, ...]], ...]:
    """The buckets to try at a place: by its first two runs (at a word start) and by its first
    character (languages without spaces), each marked whether it is a by-character one."""
    out: list[tuple[bool, tuple[Bucket, ...]]] = []
    if at_word and first:
        out.append((False, scanner.buckets((first, second))))
        if second:
            out.append((False, scanner.buckets((first, ""))))
    if ch:
        out.append((True, scanner.buckets("c:" + ch)))
    return tuple((by_char, b) for by_char, b in out if b)


def _preferences(scanner: Scanner, text: str) -> dict[str, int]:
    """A language with marks (kana: Japanese) wins ties when the question holds one, and
    loses them when it holds none."""
    return {lang: 1 if rx.search(text) else -1 for lang, rx in scanner.marks}


def _longest(bucket: Bucket, text: str, pos: int, m: re.Match[str],
             prefer: dict[str, int] | None = None) -> re.Match[str]:
    """The longest match of a bucket's forms at ``pos``. Without word boundaries a form may
    end anywhere ("这个周" inside "这个周末"), so the first alternative that matches is not
    always the longest. On a tie the language ``prefer`` ranks higher wins (see Meta.marks),
    else the bucket's order (the more specific form) stays."""
    rank = (prefer or {}).get
    best, best_rank = m, rank(bucket.forms[m.lastgroup].lang, 0)  # type: ignore[index]
    for form in bucket.forms.values():
        other = form.regex.match(text, pos)
        if other is None:
            continue
        if other.end() > best.end() or (other.end() == best.end() and rank(form.lang, 0) > best_rank):
            best, best_rank = other, rank(form.lang, 0)
    return best


def _candidate(m: re.Match[str], form: Form, scanner: Scanner, prepared: Prepared) -> Candidate:
    slots, weak, nameable = _values(m, form, scanner, prepared)
    return Candidate(Span(m.start(), m.end()), form.lang, form.reading, slots, weak,
                     nameable=nameable)


def _values(m: re.Match[str], form: Form, scanner: Scanner, prepared: Prepared
            ) -> tuple[tuple[tuple[str, object], ...], bool, bool]:
    """The slots of a form's match, whether the phrase is weak, and whether it is nameable."""
    lex = scanner.lexicons.get(form.lang) or next(iter(scanner.lexicons.values()))
    slots: list[tuple[str, object]] = list(form.fixed)
    weak = form.weak
    for group, cls in form.slots:
        raw = m.group(group)
        if raw is None:
            continue
        if cls in REGEX_CLASSES or cls == "day":
            if cls == "numdate":
                value: object = raw
            elif raw.isdigit():
                value = int(raw)
            else:
                digits = "".join(ch for ch in raw if ch.isdigit())
                value = int(digits) if digits else raw
        else:
            value = lex.value(cls, raw)
            if form.single == cls and " ".join(raw.split()) in lex.ambiguous:
                weak = True
        slots.append((CANONICAL_SLOT.get(cls, cls), value))
    if not weak and m.start() > 0 and text_starts_digit(prepared.text, m.start()):
        prev = prepared.text[max(0, m.start() - 24) : m.start()].split()
        # A word that is never followed by a date in any enabled language ("version 1.2.2020").
        if prev and prev[-1].strip(":#-") in scanner.not_temporal:
            weak = True
    if not weak and m.start() > 0 and not lex.spaces and lex.not_temporal:
        # Without spaces the word is glued to the phrase: "每周一" (every Monday), "版本2025年".
        before = prepared.text[max(0, m.start() - 12) : m.start()].rstrip()
        if any(before.endswith(w) for w in lex.not_temporal):
            weak = True
    nameable = weak and form.single in ("month_wide", "weekday") and not form.weak
    return tuple(slots), weak, nameable


def text_starts_digit(text: str, pos: int) -> bool:
    return text[pos : pos + 1].isdigit()
