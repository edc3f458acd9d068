"""Look-alikes: English questions whose words look temporal but are not (reading N).

A wrong date gives a wrong business answer, so a word that only looks like a time word must
give no mention at all: "may" the modal, "march" the verb, "second" the ordinal, "sat" the verb,
"priority 2", "version 2025.1", "top 10", "5 points", "ticket 2025". Beside each trap stands,
where one exists, the same word used as a time word, which must still be found.

Checked against:
- common practice of English work-tracker questions: which of these words are time words in
  context (no published source lists them); the N row of the contract in docs/readings.md;
- the look-alike and not-temporal word lists of locales/en.toml, which these traps exercise.
"""

from __future__ import annotations

import pytest

from tests.helpers import one, run

# id, question: no temporal mention at all.
TRAPS = [
    # The N row of the contract.
    ("N-en-may-modal", "who may review the release"),
    ("N-en-march-verb", "we march on with the backlog"),
    ("N-en-second-ordinal", "the second build failed"),
    ("N-en-sat-verb", "the build sat idle"),
    ("N-en-priority-2", "tickets with priority 2"),
    ("N-en-version-2025.1", "bugs in version 2025.1"),
    ("N-en-top-10", "top 10 assignees"),
    ("N-en-5-points", "tasks worth 5 points"),
    ("N-en-ticket-2025", "who owns ticket 2025"),
    # Month and weekday words as other words.
    ("N-en-may-modal-first-word", "may we close them"),
    ("N-en-May-modal-capitalised-first-word", "May I see the backlog"),
    ("N-en-march-verb-imperative", "march the tickets to done"),
    ("N-en-march-verb-after-should", "we should march forward"),
    ("N-en-March-verb-capitalised-first-word", "March forward, team"),
    ("N-en-sat-verb-on", "who sat on the ticket"),
    ("N-en-sat-verb-with", "sat with the team"),
    ("N-en-sun-noun", "sun damage report"),
    ("N-en-wed-verb", "wed the two specs together"),
    ("N-en-mar-verb", "mar the design"),
    ("N-en-dec-flag", "dec flag cleanup"),
    ("N-en-mon-key", "mon key rotation"),
    ("N-en-Jan-person", "tickets assigned to Jan"),
    # Ordinals, units and direction words with no period.
    ("N-en-second-opinion", "a second opinion on the design"),
    ("N-en-Second-capitalised", "Second build failed"),
    ("N-en-hold-on-a-second", "hold on a second"),
    ("N-en-give-me-a-sec", "give me a sec"),
    ("N-en-a-2-second-delay", "a 2 second delay"),
    ("N-en-10-sec-timeout", "10 sec timeout"),
    ("N-en-second-half-of-the-sprint", "the second half of the sprint"),
    ("N-en-the-first-ticket", "the first ticket"),
    ("N-en-the-2nd-build", "the 2nd build"),
    ("N-en-the-last-one", "the last one to review"),
    ("N-en-the-next-one", "the next one in the queue"),
    ("N-en-next-steps", "next steps for the team"),
    ("N-en-last-but-not-least", "last but not least"),
    ("N-en-last-comment", "the last comment on the ticket"),
    ("N-en-most-recent", "most recent ticket"),
    ("N-en-daily-standup", "daily standup notes"),
    ("N-en-weekly-sync", "weekly sync owners"),
    ("N-en-the-day-job", "the day job"),
    ("N-en-in-a-while", "in a while"),
    ("N-en-at-some-point", "at some point"),
    # Numbers that are not years, dates or counts of time.
    ("N-en-sev-1", "sev 1 incidents"),
    ("N-en-p1", "p1 bugs"),
    ("N-en-v2", "v2 release notes"),
    ("N-en-v2025", "v2025 notes"),
    ("N-en-version-first", "version 2025.1 bugs"),
    ("N-en-release-2025.2", "release 2025.2 blockers"),
    ("N-en-version-dotted-like-a-date", "version 1.2.2020 crash"),
    ("N-en-ticket-hash-2025", "ticket #2025 status"),
    ("N-en-bare-2025-no-cue", "2025 tickets"),
    ("N-en-build-2024", "who fixed build 2024"),
    ("N-en-PR-2023", "owner of PR 2023"),
    ("N-en-epic-2030", "epic 2030 owner"),
    ("N-en-story-1234", "story 1234"),
    ("N-en-room-2025-after-in", "tickets in room 2025"),
    ("N-en-id-range", "ids 1999-2005 are duplicates"),
    ("N-en-fraction", "3/4 of the tests pass"),
    ("N-en-sprint-12", "bugs in sprint 12"),
    ("N-en-sprint-48", "sprint 48"),
    ("N-en-issue-48", "issue 48 assignee"),
    ("N-en-error-404", "error 404 reports"),
    ("N-en-top-3", "top 3 reporters"),
    ("N-en-3-points", "tasks of 3 points"),
    ("N-en-build-2-of-5", "build 2 of 5"),
    ("N-en-5-bugs", "5 bugs open"),
    ("N-en-point-2", "point 2 of the agenda"),
    ("N-en-page-3", "page 3 of the report"),
    ("N-en-older-than-3", "tickets older than 3"),
]

#: Capitalised month names that are people's names. English capitalisation alone cannot tell
#: "assigned to June" from "the June release" (locales/en.toml case_marks_names).
NAME_TRAPS = [
    ("N-en-June-person", "tickets assigned to June"),
    ("N-en-August-person", "ask August about it"),
]


@pytest.mark.parametrize(("question",), [(q,) for _, q in TRAPS], ids=[i for i, _ in TRAPS])
def test_a_look_alike_gives_no_temporal_mention(question):
    result = run(question)
    assert result.mentions == ()
    assert result.rewritten == question


@pytest.mark.parametrize(("question",), [(q,) for _, q in NAME_TRAPS], ids=[i for i, _ in NAME_TRAPS])
@pytest.mark.xfail(strict=True, reason="a capitalised ambiguous month mid-sentence is read as a "
                   "name of a period ('the May release'); telling a person's name apart needs a "
                   "context rule the scanner does not have")
def test_a_month_name_used_as_a_persons_name_gives_no_mention(question):
    assert run(question).mentions == ()


def test_there_are_at_least_forty_traps():
    assert len(TRAPS) >= 40
    assert len({q for _, q in TRAPS}) == len(TRAPS)


# id, the word as a look-alike, the word as a time word, the phrase found there.
PAIRS = [
    ("N-en-may-modal-vs-since-May", "who may review the release", "bugs closed since May", "since May"),
    ("N-en-march-verb-vs-in-March", "we march on with the backlog", "bugs fixed in March", "in March"),
    ("N-en-second-ordinal-vs-2-seconds-ago", "the second build failed", "builds started 2 seconds ago",
     "2 seconds ago"),
    ("N-en-sat-verb-vs-on-Sat", "the build sat idle", "deploys on Sat", "on Sat"),
    ("N-en-priority-2-vs-2-days-ago", "tickets with priority 2", "bugs opened 2 days ago", "2 days ago"),
    ("N-en-ticket-2025-vs-in-2025", "who owns ticket 2025", "tickets opened in 2025", "in 2025"),
    ("N-en-bare-2025-vs-during-2025", "2025 tickets", "tickets during 2025", "during 2025"),
    ("N-en-second-opinion-vs-30-seconds-ago", "a second opinion on the design",
     "logged 30 seconds ago", "30 seconds ago"),
    ("N-en-last-one-vs-last-week", "the last one to review", "the last one to review last week",
     "last week"),
    ("N-en-next-steps-vs-next-Monday", "next steps for the team", "next steps for the team next Monday",
     "next Monday"),
]


@pytest.mark.parametrize(("trap", "temporal", "phrase"), [p[1:] for p in PAIRS], ids=[p[0] for p in PAIRS])
def test_the_same_word_is_a_time_word_only_where_the_question_makes_it_one(trap, temporal, phrase):
    assert run(trap).mentions == ()
    assert one(temporal).text == phrase


# id, a question holding a look-alike and a real time phrase, the only phrase to find.
MIXED = [
    ("N-en-may-modal-beside-since-May", "who may review since May", "since May"),
    ("N-en-sat-verb-beside-on-Sat", "the build sat idle on Sat", "on Sat"),
    ("N-en-march-verb-beside-since-March", "we march on since March", "since March"),
    ("N-en-second-ordinal-beside-since-Monday", "the second build since Monday", "since Monday"),
    ("N-en-top-10-beside-this-week", "top 10 assignees this week", "this week"),
    ("N-en-priority-2-beside-from-2-days-ago", "priority 2 bugs from 2 days ago", "from 2 days ago"),
    ("N-en-priority-and-count-beside-from-2025", "list 5 items with priority 2 from 2025", "from 2025"),
    ("N-en-version-beside-an-ISO-date", "version 2025.1 bugs since 2025-03-14", "since 2025-03-14"),
    ("N-en-ticket-number-beside-since-2024", "ticket 2025 since 2024", "since 2024"),
    ("N-en-points-beside-yesterday", "tasks worth 5 points closed yesterday", "yesterday"),
]


@pytest.mark.parametrize(("question", "phrase"), [m[1:] for m in MIXED], ids=[m[0] for m in MIXED])
def test_a_look_alike_beside_a_time_phrase_stays_out_of_the_mention(question, phrase):
    m = one(question)
    assert m.text == phrase
    assert question[m.char_start : m.char_end] == phrase
