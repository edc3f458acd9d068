"""Second scanning pass: connectives and ranges around the phrases the forms found.

"since X", "before X", "by Friday", "between X and Y", "from X to Y", "X - Y", "March 3-17",
"from March on"; and the cue rule: a weak phrase (a bare year, an ambiguous month such as "may")
stays only when a connective or a range vouches for it.
"""

from __future__ import annotations

import functools
import re
from dataclasses import replace
from typing import Mapping

from ..locale import load_locale
from ..model import Candidate, Span
from ..preparing import Prepared
from .scanner import Connectives, Scanner

__all__ = ["combine", "dropped_alone"]

_BOUND = {"since": "R7", "after": "R8", "before": "R9", "until": "R10"}
_DAY_READINGS = ("R12", "R18")
_SENTENCE_END = re.compile(r"(?:^|[.!?:;\"'(\[]\s*)$")
_PREV_WORD = re.compile(r"(\w+)\W*$")
_LETTERS = re.compile(r"[^\W\d_]+")


#: What a short connective of another language may do to a phrase: join it, which keeps its
#: meaning. One- and two-letter function words of one language are often plain words of another
#: ("what to do tomorrow": Polish "do" is "until"), so as a bound, range or deadline they bind
#: only phrases of their own language and ISO notation ("und"); longer ones ("since letzten
#: Montag") and the glued words of languages written without spaces bind any phrase. No
#: connective of another language vouches for a weak phrase ("we may": Polish "we" is "in").
#: A phrase whose words the connective's language knows as well (a bare number, the weekday
#: abbreviation "пт" of Russian and Ukrainian) is read as that language's: "з пн по пт".
_ACROSS_LANGUAGES = frozenset({"within", "on_day", "cue"})


@functools.cache
def _known_words(lang: str) -> frozenset[str]:
    """Every word of the lexicon of ``lang`` (the words of its multi-word entries too)."""
    from .lexicon import lexicon

    return frozenset(token for table in lexicon(lang).words.values() for entry in table
                     for token in entry.split())


def _reader(scanner: Scanner, table: Mapping[str, frozenset[str]], lang: str,
            phrase: str | None) -> str | None:
    """The language whose relations a connective has with a phrase of ``lang``: ``lang``
    itself, or a language of the connective that knows every word of the phrase."""
    if lang in table:
        return lang
    if phrase is None:
        return None
    words = _LETTERS.findall(phrase)
    for other in table:
        if other in scanner.lexicons and all(w in _known_words(other) for w in words):
            return other
    return None


def _relations(scanner: Scanner, phrase: str, lang: str, text: str | None = None) -> frozenset[str]:
    """The relations of the connective ``phrase`` to a phrase of ``lang`` (its ``text`` when
    known)."""
    key = " ".join(phrase.split())
    table = scanner.connectives.relations.get(key, {})
    reader = _reader(scanner, table, lang, text)
    if reader is not None:
        return table[reader]
    merged: set[str] = set()
    for rels in table.values():
        merged |= rels
    if lang != "und" and len(key) < 3 and merged and not any(
            not scanner.lexicons[other].spaces for other in table if other in scanner.lexicons):
        merged &= _ACROSS_LANGUAGES
    return frozenset(merged)


def _foreign(scanner: Scanner, phrase: str, lang: str, text: str | None = None) -> bool:
    """Whether the connective ``phrase`` belongs to another language than a phrase of ``lang``
    (with ``text``) and that language does not know the phrase's words."""
    if lang == "und":
        return False
    table = scanner.connectives.relations.get(" ".join(phrase.split()), {})
    return _reader(scanner, table, lang, text) is None


def _connective_lang(scanner: Scanner, phrase: str, lang: str) -> str:
    table = scanner.connectives.relations.get(" ".join(phrase.split()), {})
    if lang in table or not table:
        return lang
    return next(iter(table))


def _is_day(c: Candidate) -> bool:
    """A phrase naming one day (a weekday, a date, "the weekend"): "on" goes with it."""
    return c.reading in ("R1", "R13", "R14", "R15", "R16", "R18", "R23") or _has_day(c) or (
        c.slot("unit") == "business_day" and (c.reading in ("R2", "R3", "R4") or (
            c.reading in ("R5", "R6") and c.slot("num") is None)))  # "on the last working day"


def _has_day(c: Candidate) -> bool:
    return c.reading in _DAY_READINGS and c.slot("day") is not None and c.slot("month") is not None


def _is_name(prepared: Prepared, c: Candidate, scanner: Scanner) -> bool:
    """English-style capitalisation: a capitalised word mid-sentence is a name ("the May release")."""
    lex = scanner.lexicons.get(c.lang)
    if lex is None or not lex.case_marks_names:
        return False
    return _capitalised_mid_sentence(prepared, c)


def _is_other_word(prepared: Prepared, c: Candidate) -> bool:
    """In a language that writes month and weekday names in lower case, a capitalised
    look-alike mid-sentence is another word (French "la mission vers Mars": the planet)."""
    if not c.nameable or c.lang == "und" or not load_locale(c.lang).meta.lowercase_names:
        return False
    return _capitalised_mid_sentence(prepared, c)


def _capitalised_mid_sentence(prepared: Prepared, c: Candidate) -> bool:
    start, _ = prepared.to_original(c.span.start, c.span.end)
    original = prepared.original
    if not original[start : start + 1].isupper():
        return False
    return _SENTENCE_END.search(original[:start]) is None


def _group(m: "re.Match[str]", *names: str) -> str | None:
    # An expression holds only the groups its languages need (no spaced words, no "c").
    groups = m.groupdict()
    for name in names:
        if groups.get(name) is not None:
            return groups[name]
    return None


def _start(m: "re.Match[str]", *names: str) -> int:
    groups = m.groupdict()
    for name in names:
        if groups.get(name) is not None:
            return m.start(name)
    return m.start()


_POST_BOUND = {"since_post": "since", "since_suffix": "since", "after_post": "after",
               "before_post": "before", "until_post": "until"}


def combine(prepared: Prepared, found: list[Candidate], scanner: Scanner) -> tuple[Candidate, ...]:
    """Attach connectives, join ranges and drop weak phrases without a cue."""
    text = prepared.text
    conn = scanner.connectives
    out: list[Candidate] = []
    i = 0
    n = len(found)
    last_words = conn.last_words
    glued_tails = conn.glued_tails
    while i < n:
        a = found[i]
        if a.nameable and _is_other_word(prepared, a):
            i += 1
            continue
        # Cheap test first: is the word before the phrase the end of some connective?
        pre = None
        if _may_follow_connective(text, a.span.start, last_words, glued_tails):
            pre = conn.before.search(text, max(0, a.span.start - 32), a.span.start)
        pre_word = _group(pre, "c", "c2") if pre else None
        pre_start = _start(pre, "c", "c2") if pre else a.span.start
        a_text = text[a.span.start:a.span.end]
        pre_rel = _relations(scanner, pre_word, a.lang, a_text) if pre_word else frozenset()
        if pre and out and out[-1].span.end > pre_start:
            pre, pre_word, pre_rel, pre_start = None, None, frozenset(), a.span.start

        # Ranges: "between X and Y", "from X to Y", "X - Y", "3月から5月まで".
        if i + 1 < n:
            b = found[i + 1]
            gap = conn.join.fullmatch(text, a.span.end, b.span.start)
            # The join may be the ending of the first phrase itself, with only white space to
            # the second: Turkish "Mart'tan Nisan'a kadar".
            ending = _ends_with_join(conn, text, a) if gap is None and \
                not text[a.span.end:b.span.start].strip() else None
            if gap is not None or ending is not None:
                word = _group(gap, "j", "j2") if gap is not None else ending
                needs_between = word is not None and _is_and(scanner, word, a.lang)
                end = b.span.end
                post = conn.suffix.match(text, end)
                post_rel = _relations(scanner, _group(post, "s", "s2") or "", b.lang) if post else frozenset()
                closed = "between_post" in post_rel  # "1 Mart ile 15 Mart arasında"
                if (not needs_between or "between" in pre_rel or closed) and (
                        not (a.weak and b.weak) or pre_rel & {"between", "from"} or closed):
                    start = pre_start if pre_rel & {"between", "from"} else a.span.start
                    if post is not None and post_rel & {"until_post", "between_post"}:
                        end = post.end()  # "まで", "arasında" closing a range
                    out.append(_range(a, b, start, end, pre_word, scanner))
                    i += 2
                    continue
        # "March 3-17", "between March 3 and 17".
        if _has_day(a):
            m = conn.day_end.match(text, a.span.end)
            join = _group(m, "j", "j2") if m is not None else None
            closing = _closing(scanner, text, m.end(), a.lang) if m is not None else None
            if m is not None and (join is None or not _is_and(scanner, join, a.lang)
                                  or "between" in pre_rel or closing is not None):
                year = int(m.group("y")) if m.group("y") else a.slot("year")
                first = _with(a, year=year)
                last = Candidate(
                    Span(_start(m, "d", "d2"), m.end()), a.lang, "R18" if year else a.reading,
                    _slots(a, day=int(_group(m, "d", "d2") or 0), year=year),
                )
                start = pre_start if pre_rel & {"between", "from"} else a.span.start
                out.append(_range(first, last, start, closing or m.end(), pre_word, scanner))
                i += 1
                continue
            m = conn.day_start.search(text, max(0, a.span.start - 40), a.span.start)
            if m is not None:
                pre2 = m.group("pre")
                pre2_rel = _relations(scanner, pre2, a.lang, a_text) if pre2 else frozenset()
                j = m.group("j")
                closing = _closing(scanner, text, a.span.end, a.lang)
                if j is None or not _is_and(scanner, j, a.lang) or "between" in pre2_rel \
                        or closing is not None:
                    first = Candidate(
                        Span(m.start("d"), m.start("d") + len(m.group("d"))), a.lang, a.reading,
                        _slots(a, day=int(m.group("d"))),
                    )
                    start = m.start("pre") if pre2_rel & {"between", "from"} else m.start("d")
                    if out and out[-1].span.end > start:
                        start = m.start("d")
                    out.append(_range(first, a, start, closing or a.span.end, pre2, scanner))
                    i += 1
                    continue

        # A word after the phrase: "March onwards", "geçen haftadan beri", "先週から", "3月まで".
        post = conn.suffix.match(text, a.span.end)
        post_word = _group(post, "s", "s2") if post else None
        post_rel = _relations(scanner, post_word, a.lang) if post_word else frozenset()
        if "from_suffix" in post_rel and "from" in pre_rel:
            post_rel = post_rel | {"since_suffix"}  # "from X on"
        if "due_post" in post_rel:
            a = _deadline(a)  # a deadline word after the day, as verb-final order puts it
        bound = next((_POST_BOUND[r] for r in ("since_post", "after_post", "before_post",
                                                 "until_post", "since_suffix") if r in post_rel),
                     None) if post_rel else None
        if bound is not None and post is not None:
            start = pre_start if pre_rel & {"from", "since", "within", "after", "before", "until"} \
                and _BOUND.get(next((r for r in ("since", "after", "before", "until") if r in pre_rel), ""), "") \
                in ("", _BOUND[bound]) else a.span.start
            if pre_rel & {"from", "within"}:
                start = pre_start
            lang = _connective_lang(scanner, post_word or "", a.lang)
            out.append(Candidate(Span(start, post.end()), lang, _BOUND[bound], connective=bound,
                                 parts=(_deadline(a) if bound == "until" else a,)))
            i += 1
            continue

        # A single connective before the phrase (one of another language does not vouch for a
        # weak word such as "mai"; a bare number such as a year has no language).
        if pre_rel and not (a.weak and _foreign(scanner, pre_word or "", a.lang, a_text)
                            and any(ch.isalpha() for ch in text[a.span.start:a.span.end])):
            lang = _connective_lang(scanner, pre_word or "", a.lang)
            relation = next((r for r in ("since", "after", "before", "until") if r in pre_rel), None)
            deadline = "deadline" in pre_rel
            inner = _deadline(a) if deadline else a
            if relation is not None and a.reading == "D":
                # A length of time has no start or end to bound ("seit 3 Tagen"): the word
                # vouches for it and stays in the question.
                out.append(replace(a, weak=False))
                i += 1
                continue
            if relation is not None:
                out.append(Candidate(Span(pre_start, a.span.end), lang, _BOUND[relation],
                                     connective=relation, parts=(inner,)))
                i += 1
                continue
            if "due" in pre_rel:
                # "due" stays in the question: it says which column the date belongs to.
                out.append(replace(inner, weak=False))
                i += 1
                continue
            if pre_rel & {"within", "from"} or ("on_day" in pre_rel and _is_day(a)):
                out.append(replace(a, span=Span(pre_start, a.span.end), weak=False))
                i += 1
                continue
            if pre_rel & {"cue", "on_day"}:
                out.append(replace(a, weak=False))
                i += 1
                continue
        if a.weak and not (a.nameable and _is_name(prepared, a, scanner)):
            i += 1
            continue
        out.append(replace(a, weak=False) if a.weak else a)
        i += 1
    return tuple(out)


def _may_follow_connective(text: str, start: int, last_words: frozenset[str] | set[str],
                           glued_tails: frozenset[str] | set[str] | str) -> bool:
    """Whether a connective may end right before ``start``: the word before it is the last
    word of one, or the character before it (or before the spaces before it) ends a glued
    one. The cheap test before the connectives' expression is tried."""
    k = start - 1
    return k >= 0 and (text[k] in glued_tails or (
        k > 0 and text[k] == " " and (text[text.rfind(" ", 0, k) + 1:k] in last_words
                                      or _before_spaces(text, k) in glued_tails)))


def dropped_alone(prepared: Prepared, start: int, end: int, reading: str,
                  slots: tuple[tuple[str, object], ...], nameable: bool, scanner: Scanner) -> bool:
    """Whether :func:`combine` drops a weak phrase found alone in a question, decided before
    the phrase is built: no connective may end before it, no word after it is one, it names
    no day ("March 3-17"), and it is not a capitalised name. When this says ``False``
    :func:`combine` decides; when ``True`` it would have dropped the phrase by its last rule
    (a weak phrase without a cue)."""
    if reading in _DAY_READINGS and _slot(slots, "day") is not None \
            and _slot(slots, "month") is not None:
        return False
    if nameable:
        first, _ = prepared.to_original(start, end)
        if prepared.original[first : first + 1].isupper():
            return False  # a name ("the May release") or another word: combine decides
    conn = scanner.connectives
    if _may_follow_connective(prepared.text, start, conn.last_words, conn.glued_tails):
        return False
    return conn.suffix.match(prepared.text, end) is None


def _slot(slots: tuple[tuple[str, object], ...], name: str) -> object:
    """:meth:`Candidate.slot` of a candidate with these slots."""
    for key, value in slots:
        if key == name:
            return value
    return None


def _closing(scanner: Scanner, text: str, end: int, lang: str) -> int | None:
    """The end of a word after a range that closes it ("1-15 Mart arasında", "1日から15日まで"),
    if there is one."""
    post = scanner.connectives.suffix.match(text, end)
    if post is None:
        return None
    word = _group(post, "s", "s2") or ""
    return post.end() if _relations(scanner, word, lang) & {"between_post", "until_post"} else None


def _ends_with_join(conn: Connectives, text: str, a: Candidate) -> str | None:
    """The range join of its language that the phrase ``a`` ends with, written as an ending
    (languages with particles: the Turkish ablative "Mart'tan", Korean "3월과"), if any."""
    endings = conn.join_endings.get(a.lang, ())
    phrase = text[a.span.start : a.span.end]
    return next((e for e in endings if len(phrase) > len(e) and phrase.endswith(e)), None)


def _before_spaces(text: str, k: int) -> str:
    """The character before the run of spaces that ends at ``k``."""
    while k >= 0 and text[k] == " ":
        k -= 1
    return text[k] if k >= 0 else ""


def _is_and(scanner: Scanner, word: str, lang: str) -> bool:
    """Whether ``word`` joins a range only after "between" ("and"; not "to" or "-")."""
    table = scanner.connectives.joins.get(" ".join(word.split()), {})
    found = table.get(lang) or next(iter(table.values()), frozenset())
    return "between_join" in found


def _deadline(c: Candidate) -> Candidate:
    if c.reading == "R13":
        return replace(c, slots=c.slots + (("deadline", True),))
    return c


def _slots(c: Candidate, **changes: object) -> tuple[tuple[str, object], ...]:
    data = dict(c.slots)
    data.update({k: v for k, v in changes.items() if v is not None})
    return tuple(data.items())


def _with(c: Candidate, **changes: object) -> Candidate:
    if all(v is None for v in changes.values()):
        return c
    return replace(c, slots=_slots(c, **changes))


def _range(a: Candidate, b: Candidate, start: int, end: int, pre: str | None,
           scanner: Scanner) -> Candidate:
    lang = a.lang if a.lang != "und" else b.lang
    if pre:
        lang = _connective_lang(scanner, pre, lang)
    # An explicit year on the end applies to a start that has none ("1 March - 15 April 2026").
    if b.slot("year") is not None and a.slot("year") is None and a.reading in ("R12", "R18", "R19", "R20"):
        a = replace(a, slots=a.slots + (("year_from_end", b.slot("year")),))
    return Candidate(Span(start, end), lang, "R11", connective="between",
                     parts=(replace(a, weak=False), replace(b, weak=False)))
