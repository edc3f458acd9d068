"""Invented work-tracker question log for benchmarking.

:func:`generate` produces a deterministic list of English questions such as
people type into the search box of a work-tracking database (issues, sprints,
comments, releases, people).  About 65% of the questions carry no time phrase
at all; the rest carry one, sometimes two.  Many of the time-free questions
contain look-alike words ("may" as a verb, "march" as a verb, "second" as an
ordinal, "priority 2", "version 2025.1", "ticket 2025") so that a benchmark
also measures how cheaply the engine rejects text without a time phrase.

All names (organisation, boards, people, sprints) are invented.  The module
depends only on the standard library and never reads the system clock.

>>> log = generate(50, seed=1)
>>> len(log) == 50
True
>>> generate(20, 3) == generate(20, 3)
True
>>> generate(20, 3) == generate(20, 4)
False
>>> all(isinstance(q, str) and q for q in log)
True
>>> generate(0)
[]

:func:`generate_mixed` (from :mod:`nlnorm.benchlog_mixed`, re-exported here)
gives the same kind of log in fourteen languages, English taking about 30%
and reusing this module's templates; about 5% of its questions mix English
with another language.

>>> mixed = generate_mixed(300, seed=2)
>>> len(mixed), mixed == generate_mixed(300, seed=2)
(300, True)
>>> mixed == generate_mixed(300, seed=3)
False
>>> all(isinstance(q, str) and q.strip() == q and q for q in mixed)
True
>>> langs = {lang for lang, _ in generate_mixed_labelled(2000, seed=2)}
>>> sorted(lang for lang in langs if "+" not in lang)
['de', 'en', 'es', 'fr', 'it', 'ja', 'ko', 'nl', 'pl', 'pt', 'ru', 'tr', 'uk', 'zh']
"""

from __future__ import annotations

import random
import re
from collections.abc import Callable

from nlnorm.benchlog_mixed import generate_mixed, generate_mixed_labelled

__all__ = ["generate", "generate_mixed", "generate_mixed_labelled",
           "NO_TIME_SHARE"]

#: Target share of generated questions that carry no time phrase.
NO_TIME_SHARE = 0.65
#: Share of time-bearing questions that carry two time phrases.
TWO_PHRASE_SHARE = 0.15

_SUBJECTS = (
    "bugs", "tickets", "issues", "pull requests", "releases", "comments",
    "epics", "incidents", "stories", "tasks", "subtasks", "defects",
)
_PEOPLE = (
    "Odile Brannock", "Teodor Vashti", "Marisol Quennell", "Ysolde Parrimore",
    "Bram Ettinsby", "Kasimir Ollendre", "Petra Wyncombe", "Lioba Stravenholt",
    "Anselm Drewcott", "Femke Tallowby", "Rosalind Okwuebe", "Jory Pelloquin",
)
_LABELS = (
    "regression", "flaky-test", "ux", "backend", "needs-triage", "security",
    "performance", "docs", "billing", "onboarding", "tech-debt", "a11y",
)
_BOARDS = ("Fernpath", "Lanternfish", "Copperwick", "Saltmarsh", "Wrenfold")
_KEYS = ("FP", "LNF", "CPW", "SLT", "WRN")
_STATUSES = ("open", "closed", "blocked", "in review", "resolved", "reopened")
_VERBS = ("closed", "opened", "created", "resolved", "merged", "updated",
          "reopened", "filed")
_SPRINTS = ("Tidewrack", "Bramblegate", "Foxglove", "Inkwell", "Marrowbone")
_WORD_NUMS = ("two", "three", "four", "five", "six", "seven", "ten")
_MONTHS = ("January", "February", "March", "April", "May", "June", "July",
           "August", "September", "October", "November", "December")
_MONTH_DAYS = (31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31)
_WEEKDAYS = ("Monday", "Tuesday", "Wednesday", "Thursday", "Friday",
             "Saturday", "Sunday")
_UNITS = ("day", "week", "month", "quarter", "year")

# ---------------------------------------------------------------------------
# Templates.  Slots: {subj} {person} {label} {board} {key} {status} {verb}
# {sprint} {n} {num}; {T} and {U} are time phrases.
# ---------------------------------------------------------------------------

_NO_TIME = (
    "how many open bugs does the {board} board have",
    "who owns ticket {key}-2025",
    "list the top 10 issues by priority 2 and above",
    "which epics may slip",
    "show tickets assigned to {person}",
    "how many story points did we march through",
    "what is the second most common label",
    "which {subj} sat in review the longest",
    "list {status} {subj} labelled {label}",
    "who has the most {status} {subj} on the {board} board",
    "show me all {subj} tagged {label} and assigned to {person}",
    "what is blocking {key}-{n}",
    "which releases shipped in version 2025.1",
    "how many {subj} are estimated at 5 points or more",
    "does ticket 2025 have any comments",
    "list the {subj} that {person} may be able to pick up",
    "which {subj} in the {sprint} sprint are still {status}",
    "what is the average cycle time for {label} {subj}",
    "who commented most on {key}-{n}",
    "show the second page of {status} {subj}",
    "how many {subj} does {person} have in progress",
    "which {subj} have no assignee",
    "list every epic without a linked release",
    "which teams march ahead of plan on the {board} board",
    "rank people by number of {subj} they {verb}",
    "what labels are used most on {board}",
    "show {subj} with priority 1 or priority 2",
    "which incidents are marked sev {n1}",
    "how many comments mention {label}",
    "who reviewed the most pull requests",
    "list the top {n1} contributors on the {board} board",
    "which {subj} link to {key}-{n}",
    "is {key}-{n} a duplicate of {key}-{n}",
    "which {subj} have more than {n1} comments",
    "can we see the {status} {subj} for the {sprint} sprint",
    "which {subj} has {person} watched but never commented on",
    "count {subj} by status for the {board} project",
    "what may cause the build failures tagged {label}",
    "show the open pull requests that touch version 2025.1",
    "who is the second reviewer on {key}-{n}",
    "list {subj} that sat untouched with no comments",
    "how many {subj} carry the {label} and {label} labels",
    "what did we decide about {key}-{n}",
    "which people are on the {board} team",
    "show all {subj} with 5 points that {person} owns",
    "which epic has the most child {subj}",
    "what is the median number of points per story",
    "which {subj} may need a second review",
    "give me the top 10 {label} {subj} ordered by votes",
    "how many {subj} are currently {status} in {board}",
)

_ONE_TIME = (
    "how many {subj} were {verb} {T}",
    "show {subj} {verb} {T}",
    "list {status} {subj} {verb} {T} on the {board} board",
    "which {subj} did {person} {verb2} {T}",
    "who {verb} the most {subj} {T}",
    "what did {person} work on {T}",
    "{subj} labelled {label} {verb} {T}",
    "how many story points did we complete {T}",
    "show me every comment {person} wrote {T}",
    "which releases went out {T}",
    "count {label} {subj} {verb} {T}",
    "were any incidents opened {T}",
    "list the top 10 {subj} by priority {verb} {T}",
    "which {subj} in the {sprint} sprint were {verb} {T}",
    "what changed on {key}-{n} {T}",
    "{T} how many {subj} did the {board} team close",
    "give me a summary of {subj} {verb} {T}",
    "how many {subj} with priority 2 were {verb} {T}",
    "who commented on {key}-{n} {T}",
    "which epics may slip {T}",
    "show {subj} assigned to {person} that are due {T}",
    "what is due {T}",
    "how many pull requests were merged {T} into version 2025.1",
    "list incidents with sev {n1} reported {T}",
    "what was the average cycle time {T}",
    "how many {subj} did we march through {T}",
    "which {subj} sat in review {T}",
    "did {person} open any {subj} {T}",
    "how many new {label} {subj} appeared {T}",
    "show the second most active reviewer {T}",
    "compare open and closed {subj} {T}",
    "what was the burndown of the {board} board {T}",
    "who joined the {board} team {T}",
    "{subj} {verb} {T} with more than {n1} comments",
    "which {subj} estimated at 5 points were finished {T}",
    "was ticket 2025 touched {T}",
    "what were the most common labels {T}",
    "list {subj} {person} reviewed {T} please",
    "tell me which {subj} were reopened {T} on {board}",
    "how many {subj} are scheduled {T}",
)

_TWO_TIME = (
    "how many {subj} were {verb} {T} compared with {U}",
    "show {subj} opened {T} and closed {U}",
    "compare the {label} {subj} {verb} {T} against {U}",
    "did we close more {subj} {T} than {U}",
    "which {subj} created {T} are still {status} {U}",
    "list {subj} {person} {verb} {T} or {U}",
    "what was {verb} {T} versus {U} on the {board} board",
    "{subj} filed {T} that were resolved {U}",
    "how did the cycle time {T} differ from {U}",
    "who {verb} more {subj} {T} than {U}",
)

_Q_PREFIXES = ("", "", "", "hey, ", "quick question: ", "can you tell me ",
               "I need to know ", "for the standup, ")
_CMD_PREFIXES = ("", "", "", "please ", "hey, ", "for the standup, ")
_SUFFIXES = ("", "", "", "", "?", " please", " in the {board} project",
             " for the {board} board", " across all teams", " for {person}")
_COMMANDS = ("show", "list", "give", "count", "compare", "rank", "tell")

# ---------------------------------------------------------------------------
# Time phrase families.  Each returns a phrase ready to drop into a sentence
# (with its own preposition where English needs one).
# ---------------------------------------------------------------------------

_Gen = Callable[[random.Random], str]


def _num(rng: random.Random, lo: int = 2, hi: int = 30) -> str:
    if rng.random() < 0.35:
        return rng.choice(_WORD_NUMS)
    return str(rng.randint(lo, hi))


def _year(rng: random.Random) -> int:
    return rng.randint(2023, 2027)


def _month_day(rng: random.Random) -> tuple[int, int]:
    m = rng.randint(1, 12)
    return m, rng.randint(1, _MONTH_DAYS[m - 1])


def _deictic_day(rng: random.Random) -> str:
    return rng.choice(("today", "yesterday", "tomorrow",
                       "the day before yesterday", "the day after tomorrow"))


def _relative_unit(rng: random.Random) -> str:
    mod = rng.choice(("this", "last", "next", "previous", "the coming",
                      "the last", "the next", "the previous"))
    return f"{mod} {rng.choice(_UNITS[1:])}"


def _ago(rng: random.Random) -> str:
    n = _num(rng, 2, 12)
    return f"{n} {rng.choice(_UNITS[:3])}s ago"


def _in_future(rng: random.Random) -> str:
    return f"in {_num(rng, 2, 10)} {rng.choice(_UNITS[:3])}s"


def _window(rng: random.Random) -> str:
    unit, k = rng.choice(_UNITS[:3]), _num(rng, 2, 14)
    return rng.choice((f"in the last {k} {unit}s", f"over the past {unit}",
                       f"the past {k} {unit}s", f"within the next {k} {unit}s",
                       f"during the past {k} {unit}s"))


def _date_text(rng: random.Random) -> str:
    y, (m, d) = _year(rng), _month_day(rng)
    return rng.choice((f"{y:04d}-{m:02d}-{d:02d}",
                       f"{d} {_MONTHS[m - 1]} {y}",
                       f"{_MONTHS[m - 1]} {d}, {y}",
                       f"{m:02d}/{d:02d}/{y:04d}"))


def _open_bound(rng: random.Random) -> str:
    y, (m, d), day = _year(rng), _month_day(rng), rng.choice(_WEEKDAYS[:5])
    return rng.choice((f"since {rng.choice(_MONTHS)}", f"after last {day}",
                       f"since {y:04d}-{m:02d}-{d:02d}", f"until next {day}",
                       f"before Q{rng.randint(1, 4)}", f"by {day}",
                       f"since {_date_text(rng)}"))


def _range(rng: random.Random) -> str:
    a = rng.randint(1, 10)
    b = rng.randint(a + 1, 12)
    kind = rng.randint(0, 2)
    if kind == 0:
        da = rng.randint(1, _MONTH_DAYS[a - 1])
        db = rng.randint(1, _MONTH_DAYS[b - 1])
        return (f"between {da} {_MONTHS[a - 1]} and {db} {_MONTHS[b - 1]}"
                f" {_year(rng)}")
    if kind == 1:
        return f"from {_MONTHS[a - 1]} to {_MONTHS[b - 1]}"
    d1 = rng.randint(1, 14)
    return f"{_MONTHS[a - 1]} {d1} - {rng.randint(d1 + 1, 28)}"


def _bare_period(rng: random.Random) -> str:
    (m, d), bare = _month_day(rng), rng.random() < 0.4
    q = f"Q{rng.randint(1, 4)}" if bare else f"in Q{rng.randint(1, 4)}"
    md = f"{_MONTHS[m - 1]} {d}" if bare else f"on {_MONTHS[m - 1]} {d}"
    wk = ("" if bare else "in ") + f"week {rng.randint(1, 52)}"
    return rng.choice((f"in {_MONTHS[m - 1]}", q, md, wk,
                       f"on {rng.choice(_WEEKDAYS)}", f"during Q{m % 4 + 1}"))


def _weekday_rel(rng: random.Random) -> str:
    day, which = rng.choice(_WEEKDAYS), rng.choice(("last", "next", "this"))
    return rng.choice((f"last {day}", f"next {day}", f"this {day}",
                       f"on {day} of {which} week", f"{day} of {which} week"))


def _year_phrase(rng: random.Random) -> str:
    return f"{rng.choice(('in', 'during', 'for'))} {_year(rng)}"


def _abs_date(rng: random.Random) -> str:
    return rng.choice(("on ", "", "on ")) + _date_text(rng)


def _abs_period(rng: random.Random) -> str:
    y, half = _year(rng), rng.choice(("first", "second"))
    return rng.choice((f"in {rng.choice(_MONTHS)} {y}",
                       f"in Q{rng.randint(1, 4)} {y}",
                       f"in H{rng.randint(1, 2)} {y}",
                       f"in the {half} half of {y}",
                       f"in week {rng.randint(1, 52)} of {y}",
                       f"in {y}-W{rng.randint(1, 52):02d}"))


def _to_date(rng: random.Random) -> str:
    return rng.choice(("YTD", "so far this year", "month to date",
                       "year to date", "so far this month", "quarter to date",
                       "so far this week"))


def _part_of_day(rng: random.Random) -> str:
    return rng.choice(("this morning", "yesterday afternoon",
                       "tomorrow morning", "this evening", "last night",
                       "this afternoon", "yesterday morning", "tonight"))


def _weekend(rng: random.Random) -> str:
    return rng.choice(("this weekend", "last weekend", "next weekend",
                       "over the weekend"))


_FAMILIES: tuple[tuple[_Gen, int], ...] = (
    (_deictic_day, 10), (_relative_unit, 14), (_ago, 6), (_in_future, 4),
    (_window, 10), (_open_bound, 9), (_range, 6), (_bare_period, 8),
    (_weekday_rel, 7), (_year_phrase, 4), (_abs_date, 6), (_abs_period, 7),
    (_to_date, 4), (_part_of_day, 4), (_weekend, 3),
)
_FAMILY_GENS = tuple(g for g, _ in _FAMILIES)
_FAMILY_WEIGHTS = tuple(w for _, w in _FAMILIES)


def _time_phrase(rng: random.Random) -> str:
    gen = rng.choices(_FAMILY_GENS, weights=_FAMILY_WEIGHTS)[0]
    return gen(rng)


_VERB2 = {"closed": "close", "opened": "open", "created": "create",
          "resolved": "resolve", "merged": "merge", "updated": "update",
          "reopened": "reopen", "filed": "file"}
_SLOT = re.compile(r"\{(\w+)\}")


_CHOICES: dict[str, tuple[str, ...]] = {
    "subj": _SUBJECTS, "person": _PEOPLE, "label": _LABELS, "board": _BOARDS,
    "key": _KEYS, "status": _STATUSES, "verb": _VERBS, "sprint": _SPRINTS,
    "verb2": tuple(_VERB2[v] for v in _VERBS),
}


def _fill(template: str, rng: random.Random) -> str:
    def slot(match: re.Match[str]) -> str:
        name = match.group(1)
        if name in ("T", "U"):
            return _time_phrase(rng)
        if name == "n":
            return str(rng.randint(1, 4999))
        if name == "n1":
            return str(rng.randint(1, 9))
        return rng.choice(_CHOICES[name])

    return _SLOT.sub(slot, template)


def _question(rng: random.Random) -> str:
    r = rng.random()
    templates: tuple[str, ...]
    if r < NO_TIME_SHARE:
        templates = _NO_TIME
    elif r < NO_TIME_SHARE + (1 - NO_TIME_SHARE) * TWO_PHRASE_SHARE:
        templates = _TWO_TIME
    else:
        templates = _ONE_TIME
    body = _fill(rng.choice(templates), rng)
    first = body.split()[0].lower()
    prefixes = _CMD_PREFIXES if first in _COMMANDS else _Q_PREFIXES
    text = rng.choice(prefixes) + body
    suffix = _fill(rng.choice(_SUFFIXES), rng)
    if ("board" in suffix or "project" in suffix) and (
            "board" in body or "project" in body):
        suffix = ""
    if suffix == "?" and first in _COMMANDS:
        suffix = ""
    if len(text.split()) + len(suffix.split()) <= 25:
        text += suffix
    if len(text.split()) > 25:
        text = body
    if len(text.split()) < 5:
        text += _fill(rng.choice(_SUFFIXES[-4:]), rng)
    if rng.random() < 0.3:
        text = text[0].upper() + text[1:]
    return text


def generate(n: int = 10_000, seed: int = 0) -> list[str]:
    """Return ``n`` invented work-tracker questions, deterministic in ``seed``.

    Only ``random.Random(seed)`` is used, so the same arguments always give
    the same list on every platform and Python version that keeps
    ``random.Random`` stable.
    """
    if n < 0:
        raise ValueError("n must be non-negative")
    rng = random.Random(seed)
    return [_question(rng) for _ in range(n)]


if __name__ == "__main__":  # pragma: no cover
    for line in generate(20):
        print(line)
