"""Invented mixed-language work-tracker question log for benchmarking.

:func:`generate_mixed` extends :func:`nlnorm.benchlog.generate` (the English
log, reused as is for the English share) to fourteen languages: en, de, fr,
es, it, pt, nl, pl, ru, uk, tr, zh (Simplified), ja and ko.  Each question is
written in one language with the weights of :data:`LANGUAGE_WEIGHTS`; about
5% mix two (an English question carrying one phrase of another language,
"tickets von letzter Woche", "bugs 上周", or the reverse).  As in the English
log about 65% of the questions carry no time phrase and the rest one,
sometimes two, in the forms natives type: "vor drei Tagen", "KW 48",
"il y a deux semaines", "en lo que va de año", "dall'8 marzo",
"на прошлой неделе", "minulої п'ятниці", "Mart'tan beri", "上周一",
"3月以降", "지난주 금요일에".  The questions without a time phrase often hold
look-alike words of their language ("zeig mal", the tag "Tag", "mayor",
"mis à jour", the rover "Mars", "segunda versão", "майки", "лютий баг",
"güncel sürüm", "周报", "日報", "주요"), priorities, versions such as 2025.1 and
ticket keys such as WRN-2025.

The scenario is the invented one of ``examples/demo/SCENARIO.md``: the
Wrenfold team of Quillmere Instruments, its board WRN and its people (Odile
Brannock, Teodor Vashti, ...), transliterated where the script asks for it.
Only ``random.Random(seed)`` is used; the system clock is never read.

Templates are plain strings with slots in braces: ``{s}`` the subject (bugs,
tickets, ...) in its default form and ``{s.gen}`` in another, ``{person}``,
``{board}``, ``{key}``, ``{n}``, ``{label}``, ``{sprint}``, a word of the
language's table (``{status}``, ``{done}``), ``{T}`` and ``{U}`` time
phrases, and ``{g:a|b}`` / ``{p:a|b}``: the form agreeing with the gender of
the subject / the person.  Time patterns have their own slots: ``{month}``,
``{month.gen}``, ``{d}``, ``{y}``, ``{wd.last}``, ``{n.week}`` (a number with
its unit, inflected), ``{nd}`` (a number from 5 to 20, always digits).

>>> log = generate_mixed(400, seed=5)
>>> len(log), log == generate_mixed(400, seed=5)
(400, True)
>>> log == generate_mixed(400, seed=6)
False
>>> all(q and q == q.strip() for q in log)
True
>>> lines = generate_mixed_labelled(3000, seed=1)
>>> {lang for lang, _ in lines} >= set(LANGUAGES)
True
>>> [text for _, text in lines] == generate_mixed(3000, seed=1)
True
>>> generate_mixed(0)
[]
"""

from __future__ import annotations

import random
import re
from collections.abc import Callable, Mapping
from typing import NamedTuple

__all__ = [
    "generate_mixed",
    "generate_mixed_labelled",
    "LANGUAGES",
    "LANGUAGE_WEIGHTS",
    "MIXED_WEIGHT",
    "NO_TIME_SHARE",
]

#: The languages of the log, English first.
LANGUAGES = ("en", "de", "fr", "es", "it", "pt", "nl", "pl", "ru", "uk", "tr",
             "zh", "ja", "ko")
#: Questions per thousand written in each language ...
LANGUAGE_WEIGHTS: dict[str, int] = {
    "en": 310, "de": 80, "fr": 80, "es": 80, "it": 40, "pt": 40, "nl": 40,
    "pl": 40, "ru": 40, "uk": 40, "tr": 40, "zh": 40, "ja": 40, "ko": 40,
}
#: ... and mixing English with one other language; the weights sum to 1000.
MIXED_WEIGHT = 50
#: Target share of questions without a time phrase (as in nlnorm.benchlog).
NO_TIME_SHARE = 0.65
#: Share of time-bearing questions that carry two time phrases.
TWO_PHRASE_SHARE = 0.15

_Words = Mapping[str, str]

# ---------------------------------------------------------------------------
# Shared scenario words (the same in every language).
# ---------------------------------------------------------------------------

_SHARED: dict[str, tuple[str, ...]] = {
    "board": ("Wrenfold", "Fernpath", "Lanternfish", "Copperwick", "Saltmarsh"),
    "key": ("WRN", "WRN", "FP", "LNF", "CPW", "SLT"),
    "label": ("regression", "flaky-test", "ux", "backend", "needs-triage",
              "security", "performance", "docs", "billing", "a11y"),
    "sprint": ("Oxbeck", "Tarnwell", "Tidewrack", "Bramblegate", "Foxglove"),
}

#: The Wrenfold people and their grammatical gender (m / f).
_TEAM = (("Odile Brannock", "f"), ("Teodor Vashti", "m"),
         ("Marisol Quennell", "f"), ("Ysolde Parrimore", "f"),
         ("Bram Ettinsby", "m"), ("Kasimir Ollendre", "m"),
         ("Petra Wyncombe", "f"), ("Odile", "f"), ("Teodor", "m"))
_LATIN_PEOPLE: tuple[_Words, ...] = tuple({"nom": n, "g": g} for n, g in _TEAM)

_MONTH_DAYS = (31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31)


def _ko(word: str, final: bool | None = None) -> dict[str, str]:
    """A Korean noun with its particles, chosen by its last sound.

    ``final`` says whether the word ends in a consonant; by default it is
    read from the last Hangul syllable (words in Latin letters need it).
    """
    if final is None:
        code = ord(word[-1]) - 0xAC00
        final = 0 <= code < 11172 and code % 28 != 0
    return {"pl": word, "nom": word,
            "subj": word + ("이" if final else "가"),
            "obj": word + ("을" if final else "를"),
            "top": word + ("은" if final else "는")}


# ---------------------------------------------------------------------------
# Subjects: the things asked about, with the forms the templates use.
# "g" is the grammatical gender where adjectives and participles agree.
# ---------------------------------------------------------------------------

_SUBJECTS: dict[str, tuple[_Words, ...]] = {
    "de": tuple({"pl": w} for w in (
        "Bugs", "Tickets", "Issues", "Pull Requests", "Releases",
        "Kommentare", "Epics", "Incidents", "Störungen", "Aufgaben",
        "Storys", "Fehler")),
    "fr": tuple({"pl": w, "de": ("d'" if w[0] in "aeiou" else "de ") + w,
                 "g": g} for w, g in (
        ("bugs", "m"), ("tickets", "m"), ("anomalies", "f"),
        ("pull requests", "f"), ("releases", "f"), ("commentaires", "m"),
        ("epics", "f"), ("incidents", "m"), ("demandes", "f"),
        ("tâches", "f"), ("stories", "f"))),
    "es": tuple({"pl": w, "art": f"{a} {w}", "g": g} for w, a, g in (
        ("bugs", "los", "m"), ("tickets", "los", "m"),
        ("incidencias", "las", "f"), ("pull requests", "las", "f"),
        ("releases", "las", "f"), ("comentarios", "los", "m"),
        ("épicas", "las", "f"), ("incidentes", "los", "m"),
        ("tareas", "las", "f"), ("historias", "las", "f"),
        ("errores", "los", "m"))),
    "it": tuple({"pl": w, "art": f"{a} {w}", "di": f"{di} {w}", "g": g}
                for w, a, di, g in (
        ("bug", "i", "dei", "m"), ("ticket", "i", "dei", "m"),
        ("segnalazioni", "le", "delle", "f"),
        ("pull request", "le", "delle", "f"),
        ("release", "le", "delle", "f"), ("commenti", "i", "dei", "m"),
        ("epic", "le", "delle", "f"), ("incidenti", "gli", "degli", "m"),
        ("attività", "le", "delle", "f"), ("storie", "le", "delle", "f"),
        ("issue", "le", "delle", "f"))),
    "pt": tuple({"pl": w, "art": f"{a} {w}", "dos": f"d{a} {w}", "g": g}
                for w, a, g in (
        ("bugs", "os", "m"), ("tickets", "os", "m"), ("chamados", "os", "m"),
        ("pull requests", "os", "m"), ("releases", "as", "f"),
        ("comentários", "os", "m"), ("épicos", "os", "m"),
        ("incidentes", "os", "m"), ("tarefas", "as", "f"),
        ("histórias", "as", "f"), ("issues", "as", "f"))),
    "nl": tuple({"pl": w} for w in (
        "bugs", "tickets", "issues", "pull requests", "releases",
        "opmerkingen", "epics", "incidenten", "taken", "stories",
        "meldingen")),
    "pl": tuple({"pl": w, "gen": gen} for w, gen in (
        ("błędy", "błędów"), ("zgłoszenia", "zgłoszeń"),
        ("tickety", "ticketów"), ("pull requesty", "pull requestów"),
        ("wydania", "wydań"), ("komentarze", "komentarzy"),
        ("epiki", "epików"), ("incydenty", "incydentów"),
        ("zadania", "zadań"), ("bugi", "bugów"),
        ("historyjki", "historyjek"))),
    "ru": tuple({"pl": w, "gen": gen} for w, gen in (
        ("баги", "багов"), ("тикеты", "тикетов"), ("задачи", "задач"),
        ("пул-реквесты", "пул-реквестов"), ("релизы", "релизов"),
        ("комментарии", "комментариев"), ("эпики", "эпиков"),
        ("инциденты", "инцидентов"), ("ошибки", "ошибок"),
        ("обращения", "обращений"))),
    "uk": tuple({"pl": w, "gen": gen} for w, gen in (
        ("баги", "багів"), ("тікети", "тікетів"), ("задачі", "задач"),
        ("пул-реквести", "пул-реквестів"), ("релізи", "релізів"),
        ("коментарі", "коментарів"), ("епіки", "епіків"),
        ("інциденти", "інцидентів"), ("помилки", "помилок"),
        ("звернення", "звернень"))),
    "tr": tuple({"pl": pl, "sg": sg, "acc": acc} for pl, sg, acc in (
        ("hatalar", "hata", "hataları"), ("biletler", "bilet", "biletleri"),
        ("talepler", "talep", "talepleri"),
        ("pull request'ler", "pull request", "pull request'leri"),
        ("sürümler", "sürüm", "sürümleri"),
        ("yorumlar", "yorum", "yorumları"),
        ("epic'ler", "epic", "epic'leri"), ("olaylar", "olay", "olayları"),
        ("görevler", "görev", "görevleri"),
        ("kayıtlar", "kayıt", "kayıtları"))),
    "zh": tuple({"pl": w} for w in (
        "bug", "缺陷", "工单", "问题", "PR", "合并请求", "评论", "史诗",
        "故障", "任务", "需求")),
    "ja": tuple({"pl": w} for w in (
        "バグ", "チケット", "課題", "プルリクエスト", "PR", "コメント",
        "エピック", "インシデント", "タスク", "障害", "不具合")),
    "ko": (_ko("버그"), _ko("티켓"), _ko("이슈"), _ko("풀 리퀘스트"),
           _ko("PR", final=True), _ko("댓글"), _ko("에픽"), _ko("장애"),
           _ko("작업"), _ko("결함"), _ko("요청")),
}

# People: the nominative ("nom") and the other forms a language's templates
# use; "g" is the gender verbs agree with (Slavic past tenses).
_PEOPLE: dict[str, tuple[_Words, ...]] = {
    "de": _LATIN_PEOPLE, "fr": _LATIN_PEOPLE, "es": _LATIN_PEOPLE,
    "it": _LATIN_PEOPLE, "pt": _LATIN_PEOPLE, "nl": _LATIN_PEOPLE,
    "pl": tuple({"nom": n, "gen": gen, "g": g} for n, gen, g in (
        ("Odile Brannock", "Odile Brannock", "f"),
        ("Teodor Vashti", "Teodora Vashtiego", "m"),
        ("Marisol Quennell", "Marisol Quennell", "f"),
        ("Ysolde Parrimore", "Ysolde Parrimore", "f"),
        ("Bram Ettinsby", "Brama Ettinsby'ego", "m"),
        ("Kasimir Ollendre", "Kasimira Ollendre", "m"),
        ("Petra Wyncombe", "Petry Wyncombe", "f"),
        ("Odile", "Odile", "f"), ("Teodor", "Teodora", "m"))),
    "ru": tuple({"nom": n, "gen": gen, "acc": acc, "g": g}
                for n, gen, acc, g in (
        ("Одиль Браннок", "Одиль Браннок", "Одиль Браннок", "f"),
        ("Теодор Вашти", "Теодора Вашти", "Теодора Вашти", "m"),
        ("Марисоль Кеннелл", "Марисоль Кеннелл", "Марисоль Кеннелл", "f"),
        ("Изольда Парримор", "Изольды Парримор", "Изольду Парримор", "f"),
        ("Брам Эттинсби", "Брама Эттинсби", "Брама Эттинсби", "m"),
        ("Казимир Оллендре", "Казимира Оллендре", "Казимира Оллендре", "m"),
        ("Петра Винкомб", "Петры Винкомб", "Петру Винкомб", "f"),
        ("Одиль", "Одиль", "Одиль", "f"),
        ("Теодор", "Теодора", "Теодора", "m"))),
    "uk": tuple({"nom": n, "gen": gen, "acc": acc, "g": g}
                for n, gen, acc, g in (
        ("Оділь Браннок", "Оділь Браннок", "Оділь Браннок", "f"),
        ("Теодор Вашті", "Теодора Вашті", "Теодора Вашті", "m"),
        ("Марісоль Кеннелл", "Марісоль Кеннелл", "Марісоль Кеннелл", "f"),
        ("Ізольда Парримор", "Ізольди Парримор", "Ізольду Парримор", "f"),
        ("Брам Еттінсбі", "Брама Еттінсбі", "Брама Еттінсбі", "m"),
        ("Казимир Оллендре", "Казимира Оллендре", "Казимира Оллендре", "m"),
        ("Петра Вінкомб", "Петри Вінкомб", "Петру Вінкомб", "f"),
        ("Оділь", "Оділь", "Оділь", "f"),
        ("Теодор", "Теодора", "Теодора", "m"))),
    "tr": tuple({"nom": n, "gen": gen} for n, gen in (
        ("Odile Brannock", "Odile Brannock'un"),
        ("Teodor Vashti", "Teodor Vashti'nin"),
        ("Marisol Quennell", "Marisol Quennell'in"),
        ("Ysolde Parrimore", "Ysolde Parrimore'un"),
        ("Bram Ettinsby", "Bram Ettinsby'nin"),
        ("Kasimir Ollendre", "Kasimir Ollendre'nin"),
        ("Petra Wyncombe", "Petra Wyncombe'un"),
        ("Odile", "Odile'in"), ("Teodor", "Teodor'un"))),
    "zh": tuple({"nom": n} for n in (
        "Odile", "Teodor", "Marisol", "Bram", "Kasimir", "Petra",
        "奥迪勒", "特奥多尔", "玛丽索尔", "伊索尔德", "布拉姆", "佩特拉")),
    "ja": tuple({"nom": n} for n in (
        "オディールさん", "テオドールさん", "マリソルさん", "イゾルデさん",
        "ブラムさん", "カシミールさん", "ペトラさん",
        "オディール・ブラノックさん", "Odileさん")),
    "ko": (_ko("오딜 님"), _ko("테오도르 님"), _ko("마리솔 님"),
           _ko("이졸데 님"), _ko("브램 님"), _ko("카시미르 님"),
           _ko("페트라 님"), _ko("오딜 브래녹"), _ko("테오도르 바슈티"),
           _ko("페트라 윈콤")),
}

# Words of each language's templates.  A value "a|b" agrees with the gender
# of the subject (slot names starting with "p_": with the person's).
_WORDS: dict[str, dict[str, tuple[str, ...]]] = {
    "de": {
        "status": ("offen", "geschlossen", "blockiert", "in Review",
                   "erledigt", "wieder geöffnet"),
        "status_w": ("offenen", "geschlossenen", "blockierten", "erledigten",
                     "wieder geöffneten"),
        "done": ("geschlossen", "geöffnet", "erstellt", "gelöst", "gemergt",
                 "aktualisiert", "angelegt", "erledigt"),
    },
    "fr": {
        "status": ("ouverts|ouvertes", "fermés|fermées", "bloqués|bloquées",
                   "en revue", "résolus|résolues", "rouverts|rouvertes"),
        "done": ("fermés|fermées", "ouverts|ouvertes", "créés|créées",
                 "résolus|résolues", "fusionnés|fusionnées",
                 "mis à jour|mises à jour", "clôturés|clôturées"),
    },
    "es": {
        "status": ("abiertos|abiertas", "cerrados|cerradas",
                   "bloqueados|bloqueadas", "en revisión",
                   "resueltos|resueltas", "reabiertos|reabiertas"),
        "done": ("cerrados|cerradas", "abiertos|abiertas", "creados|creadas",
                 "resueltos|resueltas", "fusionados|fusionadas",
                 "actualizados|actualizadas"),
        "se_verb": ("se cerraron", "se abrieron", "se crearon",
                    "se resolvieron", "se fusionaron", "se actualizaron"),
        "past3": ("cerró", "abrió", "creó", "resolvió", "fusionó",
                  "actualizó"),
    },
    "it": {
        "status": ("aperti|aperte", "chiusi|chiuse", "bloccati|bloccate",
                   "in revisione", "risolti|risolte", "riaperti|riaperte"),
        "done": ("chiusi|chiuse", "aperti|aperte", "creati|create",
                 "risolti|risolte", "mergiati|mergiate",
                 "aggiornati|aggiornate"),
        "past3": ("ha chiuso", "ha aperto", "ha creato", "ha risolto",
                  "ha mergiato", "ha aggiornato"),
    },
    "pt": {
        "status": ("abertos|abertas", "fechados|fechadas",
                   "bloqueados|bloqueadas", "em revisão",
                   "resolvidos|resolvidas", "reabertos|reabertas"),
        "done": ("fechados|fechadas", "abertos|abertas", "criados|criadas",
                 "resolvidos|resolvidas", "mesclados|mescladas",
                 "atualizados|atualizadas"),
        "past3": ("fechou", "abriu", "criou", "resolveu", "mesclou",
                  "atualizou"),
    },
    "nl": {
        "status": ("open", "gesloten", "geblokkeerd", "in review",
                   "opgelost", "heropend"),
        "status_attr": ("open", "gesloten", "geblokkeerde", "opgeloste",
                        "heropende"),
        "done": ("gesloten", "geopend", "aangemaakt", "opgelost", "gemerged",
                 "bijgewerkt"),
    },
    "pl": {
        "status": ("otwarte", "zamknięte", "zablokowane", "w review",
                   "rozwiązane", "ponownie otwarte"),
        "done": ("zamknięte", "otwarte", "utworzone", "rozwiązane",
                 "zmergowane", "zaktualizowane"),
        "impers": ("zamknięto", "otwarto", "utworzono", "rozwiązano",
                   "zmergowano", "zaktualizowano"),
        "p_done": ("zamknął|zamknęła", "otworzył|otworzyła",
                   "utworzył|utworzyła", "rozwiązał|rozwiązała",
                   "zmergował|zmergowała"),
    },
    "ru": {
        "status": ("открытые", "закрытые", "заблокированные", "решённые",
                   "переоткрытые"),
        "status_pred": ("открыты", "не закрыты", "заблокированы", "на ревью",
                        "в работе"),
        "done": ("закрытые", "открытые", "созданные", "решённые",
                 "смерженные", "обновлённые"),
        "they": ("закрыли", "открыли", "создали", "решили", "смержили",
                 "обновили"),
        "p_done": ("закрыл|закрыла", "открыл|открыла", "создал|создала",
                   "решил|решила", "смержил|смержила"),
    },
    "uk": {
        "status": ("відкриті", "закриті", "заблоковані", "вирішені",
                   "повторно відкриті"),
        "done": ("закриті", "відкриті", "створені", "вирішені", "змерджені",
                 "оновлені"),
        "they": ("закрили", "відкрили", "створили", "вирішили", "змерджили",
                 "оновили"),
        "p_done": ("закрив|закрила", "відкрив|відкрила", "створив|створила",
                   "вирішив|вирішила", "змерджив|змерджила"),
    },
    "tr": {
        "status": ("açık", "kapalı", "engellenmiş", "incelemede", "çözülmüş",
                   "yeniden açılmış"),
        "status_attr": ("açık", "kapalı", "engellenmiş", "incelemedeki",
                        "çözülmüş", "yeniden açılmış"),
        "done": ("kapatılan", "açılan", "oluşturulan", "çözülen",
                 "merge edilen", "güncellenen"),
        "done_past": ("kapatıldı", "açıldı", "oluşturuldu", "çözüldü",
                      "merge edildi", "güncellendi"),
    },
    "zh": {
        "status": ("未关闭的", "已关闭的", "被阻塞的", "评审中的", "已解决的",
                   "重新打开的"),
        "done": ("关闭", "创建", "解决", "合并", "更新", "提交"),
    },
    "ja": {
        "status": ("未完了の", "クローズ済みの", "ブロック中の", "レビュー中の",
                   "解決済みの", "再オープンされた"),
        "done": ("クローズされた", "作成された", "解決された", "マージされた",
                 "更新された", "起票された"),
        "done_active": ("クローズした", "作成した", "解決した", "マージした",
                        "更新した", "起票した"),
    },
    "ko": {
        "status": ("열린", "닫힌", "막힌", "리뷰 중인", "해결된", "다시 열린"),
        "done": ("닫힌", "생성된", "해결된", "머지된", "업데이트된", "등록된"),
        "done_act": ("닫은", "생성한", "해결한", "머지한", "업데이트한",
                     "등록한"),
    },
}

# ---------------------------------------------------------------------------
# Templates without a time phrase.  Many hold look-alike words of their
# language; none holds a time phrase.
# ---------------------------------------------------------------------------

_NO_TIME: dict[str, tuple[str, ...]] = {
    "de": (
        "zeig mal alle offenen {s} im Board {board}",
        "wer ist für {key}-2025 zuständig",
        "welche {s} haben das Tag {label}",
        "wie viele {s} sind gerade {status}",
        "liste alle {status_w} {s} von {person}",
        "welche {s} hängen an {key}-{n}",
        "was blockiert {key}-{n}",
        "wer ist der zweite Reviewer bei {key}-{n}",
        "welche {s} sind in Version 2025.1 enthalten",
        "zeig mir alle {s} mit Priorität 2 oder höher",
        "wie viele {s} hat {person} gerade in Arbeit",
        "welche {s} im Sprint {sprint} sind noch {status}",
        "welche {s} haben noch keinen Bearbeiter",
        "wer hat die meisten {s} im Projekt {key}",
        "schau mal, welche {s} mit {label} getaggt sind",
        "wie hoch ist die Durchlaufzeit für {s} mit dem Tag {label}",
        "welche Epics haben mehr als {n1} offene Storys",
        "kannst du mal die {s} mit 5 Punkten oder mehr raussuchen",
        "gibt es Duplikate zu {key}-{n}",
        "welche {s} hat {person} beobachtet, aber nie kommentiert",
        "sortier die {s} im Board {board} nach Priorität",
        "wer hat die zweite Freigabe für Release 2025.1 gegeben",
    ),
    "fr": (
        "combien {s.de} sont {status} sur le board {board}",
        "qui s'occupe du ticket {key}-2025",
        "{g:quels|quelles} {s} bloquent la démo du rover Mars",
        "liste les {s} {status} avec le label {label}",
        "{g:quels|quelles} {s} sont dans la version 2025.1",
        "qui est le second relecteur de {key}-{n}",
        "montre les {s} {g:assignés|assignées} à {person}",
        "quelles epics risquent de glisser",
        "combien {s.de} {person} a en cours",
        "{g:quels|quelles} {s} du sprint {sprint} sont encore {status}",
        "affiche les {s} de priorité 2 ou plus",
        "qu'est-ce qui bloque {key}-{n}",
        "{g:quels|quelles} {s} ont été {g:mis|mises} à jour par {person}",
        "quel est le temps de cycle moyen des {s} {label}",
        "qui a le plus {s.de} {status} dans le projet {key}",
        "{g:quels|quelles} {s} n'ont pas de responsable",
        "trie les {s} du board {board} par priorité",
        "{g:quels|quelles} sont les {s} {g:liés|liées} à {key}-{n}",
        "le dernier commentaire sur {key}-{n} vient de qui",
        "donne-moi les {s} {g:estimés|estimées} à 5 points ou plus",
        "{g:quels|quelles} {s} concernent le module de cartographie Mars",
    ),
    "es": (
        "¿{g:cuántos|cuántas} {s} tiene el tablero {board}?",
        "quién es responsable del ticket {key}-2025",
        "¿qué {s} tienen prioridad mayor?",
        "lista {s.art} {status} con la etiqueta {label}",
        "¿quién hizo la segunda revisión de {key}-{n}?",
        "¿qué ha pasado con {key}-{n}?",
        "muéstrame {s.art} {g:asignados|asignadas} a {person}",
        "¿qué {s} entran en la última versión, la 2025.1?",
        "¿cuál es el tiempo medio de ciclo de {s.art} {label}?",
        "¿cuál es el próximo paso para {key}-{n}?",
        "¿{g:cuántos|cuántas} {s} tiene {person} en curso?",
        "¿qué {s} del sprint {sprint} siguen {status}?",
        "{s.art} con prioridad 2 o superior",
        "qué bloquea {key}-{n}",
        "¿quién tiene más {s} {status} en el proyecto {key}?",
        "¿qué {s} no tienen responsable?",
        "ordena {s.art} del tablero {board} por prioridad",
        "¿hay duplicados de {key}-{n}?",
        "¿qué ticket tiene el mayor número de comentarios?",
        "dame {s.art} {g:estimados|estimadas} en 5 puntos o más",
        "qué épicas pueden retrasarse",
    ),
    "it": (
        "{g:quanti|quante} {s} ci sono sulla board {board}",
        "chi segue il ticket {key}-2025",
        "{s.art} con priorità maggiore",
        "elenca {s.art} {status} con l'etichetta {label}",
        "secondo {person} cosa blocca {key}-{n}",
        "chi è il secondo revisore di {key}-{n}",
        "mostrami {s.art} {g:assegnati|assegnate} a {person}",
        "quali {s} entrano nell'ultima versione, la 2025.1",
        "qual è il tempo medio di ciclo {s.di} {label}",
        "qual è il prossimo passo per {key}-{n}",
        "{g:quanti|quante} {s} ha in corso {person}",
        "quali {s} dello sprint {sprint} sono ancora {status}",
        "{s.art} con priorità 2 o superiore",
        "chi ha più {s} {status} nel progetto {key}",
        "quali {s} non hanno un assegnatario",
        "ordina {s.art} della board {board} per priorità",
        "ci sono duplicati di {key}-{n}?",
        "quale ticket ha il maggior numero di commenti",
        "dammi {s.art} {g:stimati|stimate} a 5 punti o più",
        "quali epic rischiano di slittare",
    ),
    "pt": (
        "{g:quantos|quantas} {s} estão {status} no board {board}",
        "quem é o responsável pelo ticket {key}-2025",
        "{s.art} que entram na segunda versão do firmware",
        "liste {s.art} {status} com a etiqueta {label}",
        "quem fez a segunda revisão do {key}-{n}",
        "qual é a sexta tarefa da lista do sprint {sprint}",
        "mostre {s.art} {g:atribuídos|atribuídas} a {person}",
        "quais {s} entram na versão 2025.1",
        "qual é o tempo médio de ciclo {s.dos} {label}",
        "qual o próximo passo do {key}-{n}",
        "{g:quantos|quantas} {s} {person} tem em andamento",
        "quais {s} do sprint {sprint} continuam {status}",
        "{s.art} com prioridade maior que 2",
        "quem tem mais {s} {status} no projeto {key}",
        "quais {s} estão sem responsável",
        "ordene {s.art} do board {board} por prioridade",
        "existe algum duplicado do {key}-{n}?",
        "quem escreveu o último comentário no {key}-{n}",
        "me mostra {s.art} {g:estimados|estimadas} em 5 pontos ou mais",
        "quais épicos correm risco de atrasar",
    ),
    "nl": (
        "hoeveel open {s} heeft het {board}-board",
        "wie is eigenaar van ticket {key}-2025",
        "welke {s} hebben het label {label}",
        "hoeveel {s} staan nu op {status}",
        "toon alle {status_attr} {s} van {person}",
        "wie is de tweede reviewer van {key}-{n}",
        "welke {s} zitten in versie 2025.1",
        "laat alle {s} met prioriteit 2 of hoger zien",
        "hoeveel {s} heeft {person} onder handen",
        "welke {s} in sprint {sprint} zijn nog {status}",
        "welke {s} hebben nog geen eigenaar",
        "wat is de gemiddelde doorlooptijd van {s} met label {label}",
        "Dag, wat blokkeert {key}-{n}?",
        "Goedemorgen, welke {s} moet ik nog reviewen",
        "welke {s} zitten in de laatste versie",
        "sorteer de {s} van het {board}-board op prioriteit",
        "zijn er duplicaten van {key}-{n}",
        "welke epics hebben meer dan {n1} open stories",
        "wie heeft de meeste {s} in project {key}",
        "welke {s} van 5 punten of meer heeft {person}",
    ),
    "pl": (
        "ile otwartych {s.gen} ma tablica {board}",
        "kto odpowiada za zgłoszenie {key}-2025",
        "które {s} mają etykietę {label}",
        "pokaż {status} {s} z etykietą {label}",
        "kto jest drugim recenzentem {key}-{n}",
        "pokaż {s} przypisane do {person.gen}",
        "które wydania zawierają wersję 2025.1",
        "lista {s.gen} z priorytetem 2 lub wyższym",
        "ile {s.gen} ma w toku {person}",
        "które {s} ze sprintu {sprint} są nadal {status}",
        "które {s} nie mają przypisanej osoby",
        "jaki jest średni czas cyklu dla {s.gen} z etykietą {label}",
        "Dzień dobry, co blokuje {key}-{n}?",
        "co wchodzi do ostatniej wersji firmware'u",
        "posortuj {s} z tablicy {board} według priorytetu",
        "czy są duplikaty {key}-{n}",
        "które epiki mają więcej niż 5 otwartych zadań",
        "kto ma najwięcej {s.gen} w projekcie {key}",
        "jakie {s} mają 5 punktów lub więcej",
        "czy {person} ma jakieś {s} do przejrzenia",
    ),
    "ru": (
        "сколько открытых {s.gen} на доске {board}",
        "кто отвечает за тикет {key}-2025",
        "какие {s} с меткой {label}",
        "покажи {status} {s} с меткой {label}",
        "кто второй ревьюер у {key}-{n}",
        "покажи {s}, назначенные на {person.acc}",
        "какие релизы входят в версию 2025.1",
        "список {s.gen} с приоритетом 2 и выше",
        "сколько {s.gen} сейчас в работе у {person.gen}",
        "какие {s} из спринта {sprint} ещё {status_pred}",
        "какие {s} без исполнителя",
        "какое среднее время цикла у {s.gen} с меткой {label}",
        "найди тикет про майки с логотипом Quillmere",
        "что входит в последнюю версию прошивки",
        "отсортируй {s} на доске {board} по приоритету",
        "есть ли дубликаты у {key}-{n}",
        "какие эпики в проекте Маяк ещё открыты",
        "у кого больше всего {s.gen} в проекте {key}",
        "что блокирует {key}-{n}",
        "какие задачи на 5 и более story points у {person.gen}",
    ),
    "uk": (
        "скільки відкритих {s.gen} на дошці {board}",
        "хто відповідає за тікет {key}-2025",
        "які {s} з міткою {label}",
        "покажи {status} {s} з міткою {label}",
        "хто другий рев'юер у {key}-{n}",
        "покажи {s}, призначені на {person.acc}",
        "які релізи входять у версію 2025.1",
        "список {s.gen} з пріоритетом 2 і вище",
        "скільки {s.gen} зараз у роботі в {person.gen}",
        "які {s} зі спринту {sprint} досі {status}",
        "які {s} без виконавця",
        "який середній час циклу для {s.gen} з міткою {label}",
        "хто займається тим лютим багом у модулі оплати",
        "що входить в останню версію прошивки",
        "відсортуй {s} на дошці {board} за пріоритетом",
        "чи є дублікати у {key}-{n}",
        "що блокує {key}-{n}",
        "у кого найбільше {s.gen} у проєкті {key}",
        "який лютий баг заблокував {key}-{n}",
        "які задачі на 5 і більше story points у {person.gen}",
    ),
    "tr": (
        "{board} panosunda kaç açık hata var",
        "{key}-2025 biletinden kim sorumlu",
        "{label} etiketli {s.acc} göster",
        "hangi {s} hâlâ {status}",
        "{key}-{n} için ikinci inceleyici kim",
        "{person} üzerindeki {status_attr} {s}",
        "2025.1 sürümünde hangi {s} var",
        "öncelik 2 ve üstü {s.acc} listele",
        "{person.gen} üzerinde kaç {s.sg} var",
        "{sprint} sprintinde hâlâ {status} olan {s}",
        "atanmamış {s.acc} listele",
        "{label} etiketli işlerin ortalama çevrim süresi nedir",
        "güncel sürümde hangi {s} var",
        "son sürümde neler değişti",
        "{board} panosundaki {s.acc} önceliğe göre sırala",
        "{key}-{n} için kopya kayıt var mı",
        "{key}-{n} neden engellendi",
        "{key} projesinde en çok {s.sg} kimde",
        "ayarlar sayfasıyla ilgili {s}",
        "güncellenen {s.acc} göster",
        "5 puan ve üzeri {s}",
    ),
    "zh": (
        "{board}看板上有多少个未关闭的{s}",
        "{key}-2025 这个工单归谁负责",
        "带{label}标签的{s}有哪些",
        "列出所有{status}{s}",
        "{key}-{n} 的第二个审阅人是谁",
        "分配给{person}的{s}",
        "版本2025.1包含哪些{s}",
        "优先级2及以上的{s}",
        "{person}手上有多少个进行中的{s}",
        "{sprint} 冲刺里还有哪些未关闭的{s}",
        "哪些{s}还没有负责人",
        "{label}类{s}的平均周期时间是多少",
        "周报里提到的{s}有哪些",
        "下载页面相关的{s}",
        "上线检查清单关联了哪些{s}",
        "按优先级排序{board}看板上的{s}",
        "{key}-{n} 有没有重复的工单",
        "是什么阻塞了{key}-{n}",
        "{key}项目里谁的{s}最多",
        "查一下日志相关的{s}",
    ),
    "ja": (
        "{board}ボードに未完了の{s}はいくつありますか",
        "{key}-2025の担当者は誰ですか",
        "{label}ラベルが付いた{s}を一覧表示して",
        "{status}{s}を見せて",
        "{key}-{n}の2番目のレビュアーは誰",
        "{person}に割り当てられた{s}",
        "バージョン2025.1に含まれる{s}は",
        "優先度2以上の{s}を表示",
        "{person}が対応中の{s}は何件",
        "{sprint}スプリントでまだ残っている{s}",
        "担当者が決まっていない{s}",
        "{label}の{s}の平均サイクル時間は",
        "日報で報告された{s}を探して",
        "週報に載せる{s}の一覧",
        "今後の対応が必要な{s}",
        "月額プランに関する{s}",
        "{key}-{n}をブロックしているのは何",
        "{key}-{n}の重複チケットはある？",
        "{key}プロジェクトで{s}が一番多いのは誰",
        "{board}ボードの{s}を優先度順に並べて",
    ),
    "ko": (
        "{board} 보드에 열린 {s.subj} 몇 개 있나요",
        "{key}-2025 담당자가 누구예요",
        "{label} 라벨이 붙은 {s} 목록",
        "{status} {s.obj} 보여줘",
        "{key}-{n}의 두 번째 리뷰어는 누구인가요",
        "{person}에게 할당된 {s}",
        "버전 2025.1에 포함된 {s}",
        "우선순위 2 이상인 {s.obj} 보여줘",
        "{person.subj} 진행 중인 {s.top} 몇 개인가요",
        "{sprint} 스프린트에서 아직 열린 {s}",
        "담당자가 없는 {s}",
        "{label} {s}의 평균 사이클 시간은",
        "주요 {s} 목록을 보여줘",
        "{key}-{n}의 다음 단계는 뭐예요",
        "최신 버전에서 고쳐진 {s}",
        "주간 보고서에 넣을 {s}",
        "{key}-{n} 블로커가 뭐예요",
        "{key}-{n} 중복 티켓 있어요?",
        "{key} 프로젝트에서 {s.obj} 가장 많이 가진 사람은",
        "{board} 보드의 {s.obj} 우선순위순으로 정렬해줘",
    ),
}

# ---------------------------------------------------------------------------
# Templates with one time phrase {T}.  Japanese and Korean phrases come with
# their particle (3月に, 3월에); {T.no}, {T.ui} and {T.bare} trade it for
# the particle of a noun ("3月の", "3월의") or drop it.
# ---------------------------------------------------------------------------

_ONE_TIME: dict[str, tuple[str, ...]] = {
    "de": (
        "wie viele {s} wurden {T} {done}",
        "zeig mir alle {s}, die {T} {done} wurden",
        "welche {s} hat {person} {T} {done}",
        "wer hat {T} die meisten {s} geschlossen",
        "was hat {person} {T} gemacht",
        "{s} mit dem Tag {label} {T}",
        "welche Releases gingen {T} raus",
        "gab es {T} Incidents im Board {board}",
        "liste die {status_w} {s} {T}",
        "was ist {T} fällig",
        "welche {s} im Sprint {sprint} wurden {T} {done}",
        "wie viele Story Points haben wir {T} geschafft",
        "welche Kommentare hat {person} {T} geschrieben",
        "was hat sich {T} an {key}-{n} geändert",
        "wie viele Pull Requests wurden {T} in Version 2025.1 gemergt",
        "zeig mal die {s} mit Priorität 2, die {T} {done} wurden",
        "wie lang war die Durchlaufzeit {T}",
        "{T} neu angelegte {s} mit dem Tag {label}",
        "hat {person} {T} {s} aufgemacht",
        "welche {s} sind {T} fällig",
    ),
    "fr": (
        "combien {s.de} ont été {done} {T}",
        "montre-moi les {s} {done} {T}",
        "{g:quels|quelles} {s} ont été {done} par {person} {T}",
        "qui a fermé le plus {s.de} {T}",
        "sur quoi {person} a travaillé {T}",
        "les {s} avec le label {label} {done} {T}",
        "quelles releases sont sorties {T}",
        "y a-t-il eu des incidents {T}",
        "liste les {s} {status} {T} sur le board {board}",
        "qu'est-ce qui arrive à échéance {T}",
        "{g:quels|quelles} {s} du sprint {sprint} ont été {done} {T}",
        "combien de story points on a livrés {T}",
        "les commentaires de {person} {T}",
        "qu'est-ce qui a changé sur {key}-{n} {T}",
        "combien de PR ont été fusionnées {T} dans la version 2025.1",
        "les {s} de priorité 2 {done} {T}",
        "quel était le temps de cycle moyen {T}",
        "{person} a ouvert des {s} {T} ?",
        "{T}, on a fermé combien {s.de}",
        "{g:quels|quelles} {s} doivent être {g:livrés|livrées} {T}",
    ),
    "es": (
        "¿{g:cuántos|cuántas} {s} {se_verb} {T}?",
        "muéstrame {s.art} {done} {T}",
        "¿qué {s} {past3} {person} {T}?",
        "¿quién cerró más {s} {T}?",
        "¿en qué trabajó {person} {T}?",
        "{s.art} con la etiqueta {label} {done} {T}",
        "qué versiones salieron {T}",
        "¿hubo incidentes {T}?",
        "lista {s.art} {status} {T} en el tablero {board}",
        "¿qué vence {T}?",
        "¿qué {s} del sprint {sprint} {se_verb} {T}?",
        "cuántos story points completamos {T}",
        "comentarios de {person} {T}",
        "¿qué cambió en {key}-{n} {T}?",
        "¿cuántas pull requests se fusionaron {T} en la versión 2025.1?",
        "{s.art} con prioridad mayor {done} {T}",
        "¿cuál fue el tiempo medio de ciclo {T}?",
        "¿{person} abrió algún ticket {T}?",
        "{T}, ¿{g:cuántos|cuántas} {s} cerramos?",
        "¿qué {s} hay que entregar {T}?",
    ),
    "it": (
        "{g:quanti|quante} {s} sono {g:stati|state} {done} {T}",
        "mostrami {s.art} {done} {T}",
        "quali {s} {past3} {person} {T}",
        "chi ha chiuso più {s} {T}",
        "su cosa ha lavorato {person} {T}",
        "{s.art} con l'etichetta {label} {done} {T}",
        "quali release sono uscite {T}",
        "ci sono stati incidenti {T}?",
        "elenca {s.art} {status} {T} sulla board {board}",
        "cosa scade {T}",
        "quali {s} dello sprint {sprint} sono {g:stati|state} {done} {T}",
        "quanti story point abbiamo completato {T}",
        "i commenti di {person} {T}",
        "cosa è cambiato su {key}-{n} {T}",
        "quante pull request sono state mergiate {T} nella versione 2025.1",
        "{s.art} con priorità maggiore {done} {T}",
        "qual è stato il tempo medio di ciclo {T}",
        "{person} ha aperto dei ticket {T}?",
        "{T} {g:quanti|quante} {s} abbiamo chiuso",
        "secondo te quali {s} vanno {g:consegnati|consegnate} {T}",
    ),
    "pt": (
        "{g:quantos|quantas} {s} foram {done} {T}",
        "mostre {s.art} {done} {T}",
        "quais {s} {person} {past3} {T}",
        "quem fechou mais {s} {T}",
        "no que {person} trabalhou {T}",
        "{s.art} com a etiqueta {label} {done} {T}",
        "quais releases saíram {T}",
        "teve algum incidente {T}?",
        "liste {s.art} {status} {T} no board {board}",
        "o que vence {T}",
        "quais {s} do sprint {sprint} foram {done} {T}",
        "quantos story points entregamos {T}",
        "comentários de {person} {T}",
        "o que mudou no {key}-{n} {T}",
        "quantos pull requests foram mesclados {T} na versão 2025.1",
        "{s.art} da segunda versão {done} {T}",
        "qual foi o tempo médio de ciclo {T}",
        "{person} abriu algum chamado {T}?",
        "{T}, {g:quantos|quantas} {s} a gente fechou",
        "quais {s} precisam ser entregues {T}",
    ),
    "nl": (
        "hoeveel {s} zijn er {T} {done}",
        "toon de {s} die {T} {done} zijn",
        "welke {s} heeft {person} {T} {done}",
        "wie heeft {T} de meeste {s} gesloten",
        "waar heeft {person} {T} aan gewerkt",
        "{s} met label {label} {T}",
        "welke releases zijn {T} uitgebracht",
        "waren er {T} incidenten",
        "lijst van {status_attr} {s} {T} op het {board}-board",
        "wat moet er {T} af zijn",
        "welke {s} uit sprint {sprint} zijn {T} {done}",
        "hoeveel story points hebben we {T} gehaald",
        "opmerkingen van {person} {T}",
        "wat is er {T} aan {key}-{n} veranderd",
        "hoeveel pull requests zijn {T} in versie 2025.1 gemerged",
        "{s} met prioriteit 2 die {T} {done} zijn",
        "wat was de doorlooptijd {T}",
        "heeft {person} {T} nog {s} aangemaakt",
        "Goedemorgen, hoeveel {s} zijn er {T} bijgekomen",
        "welke {s} moeten {T} klaar zijn",
    ),
    "pl": (
        "ile {s.gen} {impers} {T}",
        "pokaż {s} {done} {T}",
        "które {s} {person} {p_done} {T}",
        "kto zamknął najwięcej {s.gen} {T}",
        "nad czym {person} {p:pracował|pracowała} {T}",
        "{s} z etykietą {label} {done} {T}",
        "jakie wydania wyszły {T}",
        "czy były jakieś incydenty {T}",
        "pokaż {status} {s} {T} na tablicy {board}",
        "co ma termin {T}",
        "które {s} ze sprintu {sprint} {impers} {T}",
        "ile story pointów zrobiliśmy {T}",
        "komentarze {person.gen} {T}",
        "co się zmieniło w {key}-{n} {T}",
        "ile pull requestów zmergowano {T} do wersji 2025.1",
        "{s} z priorytetem 2 {done} {T}",
        "jaki był średni czas cyklu {T}",
        "czy {person} {p:otworzył|otworzyła} jakieś zgłoszenia {T}",
        "{T} ile {s.gen} zamknęliśmy",
        "które {s} mają być gotowe {T}",
    ),
    "ru": (
        "сколько {s.gen} {they} {T}",
        "покажи {s}, {done} {T}",
        "какие {s} {person} {p_done} {T}",
        "кто закрыл больше всего {s.gen} {T}",
        "над чем {p:работал|работала} {person} {T}",
        "{s} с меткой {label}, {done} {T}",
        "какие релизы вышли {T}",
        "были ли инциденты {T}",
        "покажи {status} {s} на доске {board} {T}",
        "что должно быть готово {T}",
        "какие {s} из спринта {sprint} {they} {T}",
        "сколько story points мы закрыли {T}",
        "комментарии {person.gen} {T}",
        "что изменилось в {key}-{n} {T}",
        "сколько пул-реквестов смержили {T} в версию 2025.1",
        "{s} с приоритетом 2, {done} {T}",
        "какое было среднее время цикла {T}",
        "{p:заводил|заводила} ли {person} {s} {T}",
        "{T} сколько {s.gen} мы закрыли",
        "майки для выставки нужно заказать {T}",
    ),
    "uk": (
        "скільки {s.gen} {they} {T}",
        "покажи {s}, {done} {T}",
        "які {s} {person} {p_done} {T}",
        "хто закрив найбільше {s.gen} {T}",
        "над чим {p:працював|працювала} {person} {T}",
        "{s} з міткою {label}, {done} {T}",
        "які релізи вийшли {T}",
        "чи були інциденти {T}",
        "покажи {status} {s} на дошці {board} {T}",
        "що має бути готове {T}",
        "які {s} зі спринту {sprint} {they} {T}",
        "скільки story points ми закрили {T}",
        "коментарі {person.gen} {T}",
        "що змінилося в {key}-{n} {T}",
        "скільки пул-реквестів змерджили {T} у версію 2025.1",
        "{s} з пріоритетом 2, {done} {T}",
        "який був середній час циклу {T}",
        "чи {p:заводив|заводила} {person} {s} {T}",
        "{T} скільки {s.gen} ми закрили",
        "другий рев'ю для {key}-{n} потрібен {T}",
    ),
    "tr": (
        "{T} kaç {s.sg} {done_past}",
        "{T} {done} {s.acc} göster",
        "{person} {T} hangi {s.acc} kapattı",
        "{T} en çok {s.sg} kim kapattı",
        "{person} {T} ne üzerinde çalıştı",
        "{T} {done} {label} etiketli {s}",
        "{T} hangi sürümler yayınlandı",
        "{T} herhangi bir olay yaşandı mı",
        "{board} panosunda {T} {done} {s}",
        "{T} ne teslim edilmeli",
        "{sprint} sprintinde {T} {done} {s}",
        "{T} kaç story point tamamladık",
        "{person.gen} {T} yazdığı yorumlar",
        "{key}-{n} üzerinde {T} ne değişti",
        "2025.1 sürümüne {T} kaç pull request merge edildi",
        "öncelik 2 olan ve {T} {done} {s}",
        "{T} ortalama çevrim süresi neydi",
        "{person} {T} yeni {s.sg} açtı mı",
        "{T} son sürümde neler güncellendi",
        "{T} güncellenen {s}",
    ),
    "zh": (
        "{T}{done}了多少个{s}",
        "显示{T}{done}的{s}",
        "{person}{T}{done}了哪些{s}",
        "{T}谁关闭的{s}最多",
        "{person}{T}在做什么",
        "{T}{done}的带{label}标签的{s}",
        "{T}发布了哪些版本",
        "{T}有没有发生故障",
        "{board}看板上{T}{done}的{s}",
        "{T}有哪些到期的任务",
        "{sprint} 冲刺中{T}{done}的{s}",
        "{T}我们完成了多少故事点",
        "{person}{T}写的评论",
        "{key}-{n} {T}有什么变化",
        "{T}有多少PR合并进了版本2025.1",
        "优先级2且{T}{done}的{s}",
        "{T}的平均周期时间是多少",
        "{person}{T}有没有新建{s}",
        "{T}周报里新增了哪些{s}",
        "{T}上线了哪些功能",
    ),
    "ja": (
        "{T}{done}{s}は何件ですか",
        "{T}{done}{s}を表示して",
        "{person}が{T}{done_active}{s}は？",
        "{T}一番多く{s}をクローズしたのは誰",
        "{person}は{T}何をしていましたか",
        "{T}{done}{label}ラベルの{s}",
        "{T}リリースされたバージョンは",
        "{T}インシデントは発生しましたか",
        "{board}ボードで{T}{done}{s}",
        "{T}期限を迎える{s}は",
        "{sprint}スプリントで{T}{done}{s}",
        "{T}完了したストーリーポイントは合計いくつ",
        "{person}が{T}書いたコメント",
        "{key}-{n}で{T}何が変わった？",
        "{T}バージョン2025.1にマージされたPRは何件",
        "優先度2で{T}{done}{s}",
        "{T.no}平均サイクル時間は",
        "{person}は{T}新しい{s}を起票しましたか",
        "{T}日報に書いた{s}",
        "{T.no}週報用に{s}をまとめて",
    ),
    "ko": (
        "{T} {done} {s.top} 몇 개인가요",
        "{T} {done} {s.obj} 보여줘",
        "{person.subj} {T} {done_act} {s}",
        "{T} {s.obj} 가장 많이 닫은 사람은 누구",
        "{person.subj} {T} 무슨 작업을 했나요",
        "{T} {done} {label} 라벨 {s}",
        "{T} 출시된 릴리스는",
        "{T} 장애가 있었나요",
        "{board} 보드에서 {T} {done} {s}",
        "{T.bare} 마감인 {s}",
        "{sprint} 스프린트에서 {T} {done} {s}",
        "{T} 완료한 스토리 포인트는 몇 점인가요",
        "{person.subj} {T} 남긴 댓글",
        "{key}-{n}에서 {T} 바뀐 내용",
        "{T} 버전 2025.1에 머지된 PR은 몇 개",
        "우선순위가 2인 {s} 중 {T} {done} 것",
        "{T.ui} 평균 사이클 시간은",
        "{person.subj} {T} 새 {s.obj} 등록했나요",
        "{T} 주요 {s}에 무슨 변화가 있었나요",
        "{T} 두 번째 리뷰가 끝난 PR",
    ),
}

_TWO_TIME: dict[str, tuple[str, ...]] = {
    "de": (
        "wie viele {s} wurden {T} {done} und wie viele {U}",
        "haben wir {T} mehr {s} geschlossen als {U}",
        "welche {s} wurden {T} angelegt und {U} geschlossen",
        "wer hat {T} mehr {s} {done} als {U}",
    ),
    "fr": (
        "les {s} {g:ouverts|ouvertes} {T} et {done} {U}",
        "a-t-on fermé plus {s.de} {T} que {U}",
        "compare les {s} {done} {T} et {g:ceux|celles} {done} {U}",
        "{g:quels|quelles} {s} {g:créés|créées} {T} sont toujours {status} {U}",
    ),
    "es": (
        "¿{g:cuántos|cuántas} {s} {se_verb} {T} y {g:cuántos|cuántas} {U}?",
        "{s.art} {g:abiertos|abiertas} {T} y {done} {U}",
        "¿cerramos más {s} {T} que {U}?",
        "¿qué {s} {g:creados|creadas} {T} siguen {status} {U}?",
    ),
    "it": (
        "{g:quanti|quante} {s} sono {g:stati|state} {done} {T} e "
        "{g:quanti|quante} {U}",
        "{s.art} {g:aperti|aperte} {T} e {done} {U}",
        "abbiamo chiuso più {s} {T} che {U}?",
        "quali {s} {g:creati|create} {T} sono ancora {status} {U}",
    ),
    "pt": (
        "{g:quantos|quantas} {s} foram {done} {T} e {g:quantos|quantas} {U}",
        "{s.art} {g:abertos|abertas} {T} e {done} {U}",
        "fechamos mais {s} {T} do que {U}?",
        "quais {s} {g:criados|criadas} {T} continuam {status} {U}",
    ),
    "nl": (
        "hoeveel {s} zijn er {T} {done} en hoeveel {U}",
        "{s} aangemaakt {T} en {done} {U}",
        "hebben we {T} meer {s} gesloten dan {U}",
        "welke {s} die {T} zijn aangemaakt, staan {U} nog open",
    ),
    "pl": (
        "ile {s.gen} {impers} {T}, a ile {U}",
        "{s} utworzone {T} i zamknięte {U}",
        "czy {T} zamknęliśmy więcej {s.gen} niż {U}",
        "które {s} utworzone {T} są nadal {status} {U}",
    ),
    "ru": (
        "сколько {s.gen} {they} {T}, а сколько {U}",
        "{s}, созданные {T} и закрытые {U}",
        "закрыли ли мы {T} больше {s.gen}, чем {U}",
        "какие {s}, созданные {T}, всё ещё {status_pred} {U}",
    ),
    "uk": (
        "скільки {s.gen} {they} {T}, а скільки {U}",
        "{s}, створені {T} і закриті {U}",
        "чи закрили ми {T} більше {s.gen}, ніж {U}",
        "які {s}, створені {T}, досі {status} {U}",
    ),
    "tr": (
        "{T} kaç {s.sg} {done_past}, {U} kaç",
        "{T} açılıp {U} kapatılan {s}",
        "{T} ve {U} kapatılan {s.acc} karşılaştır",
        "{T} oluşturulup {U} hâlâ {status} olan {s}",
    ),
    "zh": (
        "{T}和{U}分别{done}了多少个{s}",
        "{T}创建、{U}关闭的{s}",
        "{T}关闭的{s}比{U}多吗",
        "{T}创建的{s}中{U}仍未关闭的有哪些",
    ),
    "ja": (
        "{T.bare}と{U.bare}でそれぞれ{done}{s}は何件",
        "{T}作成されて{U}クローズされた{s}",
        "{T}は{U.bare}より多く{s}をクローズした？",
        "{T}作成された{s}のうち{U.bare}時点でまだ未完了のもの",
    ),
    "ko": (
        "{T.bare}, {U.bare} 각각 {done} {s.top} 몇 개",
        "{T} 생성되고 {U} 닫힌 {s}",
        "{T} {U.bare}보다 {s.obj} 더 많이 닫았나요",
        "{T} 생성된 {s} 중 {U.bare} 기준으로 아직 열린 것",
    ),
}

# ---------------------------------------------------------------------------
# Calendar words.  Months and weekdays in the forms the phrases need
# ("base" is the default form of a slot).
# ---------------------------------------------------------------------------

_MONTHS: dict[str, dict[str, tuple[str, ...]]] = {
    "de": {"base": ("Januar", "Februar", "März", "April", "Mai", "Juni",
                    "Juli", "August", "September", "Oktober", "November",
                    "Dezember")},
    "fr": {"base": ("janvier", "février", "mars", "avril", "mai", "juin",
                    "juillet", "août", "septembre", "octobre", "novembre",
                    "décembre"),
           "de": ("de janvier", "de février", "de mars", "d'avril", "de mai",
                  "de juin", "de juillet", "d'août", "de septembre",
                  "d'octobre", "de novembre", "de décembre")},
    "es": {"base": ("enero", "febrero", "marzo", "abril", "mayo", "junio",
                    "julio", "agosto", "septiembre", "octubre", "noviembre",
                    "diciembre")},
    "it": {"base": ("gennaio", "febbraio", "marzo", "aprile", "maggio",
                    "giugno", "luglio", "agosto", "settembre", "ottobre",
                    "novembre", "dicembre"),
           "a": ("a gennaio", "a febbraio", "a marzo", "ad aprile",
                 "a maggio", "a giugno", "a luglio", "ad agosto",
                 "a settembre", "a ottobre", "a novembre", "a dicembre")},
    "pt": {"base": ("janeiro", "fevereiro", "março", "abril", "maio",
                    "junho", "julho", "agosto", "setembro", "outubro",
                    "novembro", "dezembro")},
    "nl": {"base": ("januari", "februari", "maart", "april", "mei", "juni",
                    "juli", "augustus", "september", "oktober", "november",
                    "december")},
    "pl": {"base": ("styczeń", "luty", "marzec", "kwiecień", "maj",
                    "czerwiec", "lipiec", "sierpień", "wrzesień",
                    "październik", "listopad", "grudzień"),
           "gen": ("stycznia", "lutego", "marca", "kwietnia", "maja",
                   "czerwca", "lipca", "sierpnia", "września", "października",
                   "listopada", "grudnia"),
           "w": ("w styczniu", "w lutym", "w marcu", "w kwietniu", "w maju",
                 "w czerwcu", "w lipcu", "w sierpniu", "we wrześniu",
                 "w październiku", "w listopadzie", "w grudniu")},
    "ru": {"base": ("январь", "февраль", "март", "апрель", "май", "июнь",
                    "июль", "август", "сентябрь", "октябрь", "ноябрь",
                    "декабрь"),
           "gen": ("января", "февраля", "марта", "апреля", "мая", "июня",
                   "июля", "августа", "сентября", "октября", "ноября",
                   "декабря"),
           "loc": ("январе", "феврале", "марте", "апреле", "мае", "июне",
                   "июле", "августе", "сентябре", "октябре", "ноябре",
                   "декабре")},
    "uk": {"base": ("січень", "лютий", "березень", "квітень", "травень",
                    "червень", "липень", "серпень", "вересень", "жовтень",
                    "листопад", "грудень"),
           "gen": ("січня", "лютого", "березня", "квітня", "травня",
                   "червня", "липня", "серпня", "вересня", "жовтня",
                   "листопада", "грудня"),
           "loc": ("січні", "лютому", "березні", "квітні", "травні",
                   "червні", "липні", "серпні", "вересні", "жовтні",
                   "листопаді", "грудні")},
    # Turkish endings follow the last vowel and consonant of the name.
    "tr": {"base": ("Ocak", "Şubat", "Mart", "Nisan", "Mayıs", "Haziran",
                    "Temmuz", "Ağustos", "Eylül", "Ekim", "Kasım", "Aralık"),
           "low": ("ocak", "şubat", "mart", "nisan", "mayıs", "haziran",
                   "temmuz", "ağustos", "eylül", "ekim", "kasım", "aralık"),
           "loc": ("Ocak'ta", "Şubat'ta", "Mart'ta", "Nisan'da", "Mayıs'ta",
                   "Haziran'da", "Temmuz'da", "Ağustos'ta", "Eylül'de",
                   "Ekim'de", "Kasım'da", "Aralık'ta"),
           "abl": ("Ocak'tan", "Şubat'tan", "Mart'tan", "Nisan'dan",
                   "Mayıs'tan", "Haziran'dan", "Temmuz'dan", "Ağustos'tan",
                   "Eylül'den", "Ekim'den", "Kasım'dan", "Aralık'tan"),
           "dat": ("Ocak'a", "Şubat'a", "Mart'a", "Nisan'a", "Mayıs'a",
                   "Haziran'a", "Temmuz'a", "Ağustos'a", "Eylül'e", "Ekim'e",
                   "Kasım'a", "Aralık'a")},
}

_WEEKDAYS: dict[str, dict[str, tuple[str, ...]]] = {
    "de": {"base": ("Montag", "Dienstag", "Mittwoch", "Donnerstag", "Freitag",
                    "Samstag", "Sonntag")},
    "fr": {"base": ("lundi", "mardi", "mercredi", "jeudi", "vendredi",
                    "samedi", "dimanche")},
    "es": {"base": ("lunes", "martes", "miércoles", "jueves", "viernes",
                    "sábado", "domingo")},
    "it": {"base": ("lunedì", "martedì", "mercoledì", "giovedì", "venerdì",
                    "sabato", "domenica"),
           "last": ("lunedì scorso", "martedì scorso", "mercoledì scorso",
                    "giovedì scorso", "venerdì scorso", "sabato scorso",
                    "domenica scorsa"),
           "next": ("lunedì prossimo", "martedì prossimo",
                    "mercoledì prossimo", "giovedì prossimo",
                    "venerdì prossimo", "sabato prossimo",
                    "domenica prossima"),
           "this": ("questo lunedì", "questo martedì", "questo mercoledì",
                    "questo giovedì", "questo venerdì", "questo sabato",
                    "questa domenica")},
    "pt": {"base": ("segunda", "terça", "quarta", "quinta", "sexta",
                    "sábado", "domingo"),
           "on": ("na segunda-feira", "na terça-feira", "na quarta-feira",
                  "na quinta-feira", "na sexta-feira", "no sábado",
                  "no domingo"),
           "last": ("na segunda passada", "na terça passada",
                    "na quarta passada", "na quinta passada",
                    "na sexta passada", "no sábado passado",
                    "no domingo passado"),
           "next": ("na próxima segunda", "na próxima terça",
                    "na próxima quarta", "na próxima quinta",
                    "na próxima sexta", "no próximo sábado",
                    "no próximo domingo"),
           "since_last": ("desde a última segunda", "desde a última terça",
                          "desde a última quarta", "desde a última quinta",
                          "desde a última sexta", "desde o último sábado",
                          "desde o último domingo")},
    "nl": {"base": ("maandag", "dinsdag", "woensdag", "donderdag", "vrijdag",
                    "zaterdag", "zondag")},
    "pl": {"base": ("poniedziałek", "wtorek", "środa", "czwartek", "piątek",
                    "sobota", "niedziela"),
           "gen": ("poniedziałku", "wtorku", "środy", "czwartku", "piątku",
                   "soboty", "niedzieli"),
           "on": ("w poniedziałek", "we wtorek", "w środę", "w czwartek",
                  "w piątek", "w sobotę", "w niedzielę"),
           "last": ("w zeszły poniedziałek", "w zeszły wtorek",
                    "w zeszłą środę", "w zeszły czwartek", "w zeszły piątek",
                    "w zeszłą sobotę", "w zeszłą niedzielę"),
           "next": ("w przyszły poniedziałek", "w przyszły wtorek",
                    "w przyszłą środę", "w przyszły czwartek",
                    "w przyszły piątek", "w przyszłą sobotę",
                    "w przyszłą niedzielę"),
           "since_last": ("od zeszłego poniedziałku", "od zeszłego wtorku",
                          "od zeszłej środy", "od zeszłego czwartku",
                          "od zeszłego piątku", "od zeszłej soboty",
                          "od zeszłej niedzieli")},
    "ru": {"base": ("понедельник", "вторник", "среда", "четверг", "пятница",
                    "суббота", "воскресенье"),
           "gen": ("понедельника", "вторника", "среды", "четверга",
                   "пятницы", "субботы", "воскресенья"),
           "on": ("в понедельник", "во вторник", "в среду", "в четверг",
                  "в пятницу", "в субботу", "в воскресенье"),
           "last": ("в прошлый понедельник", "в прошлый вторник",
                    "в прошлую среду", "в прошлый четверг",
                    "в прошлую пятницу", "в прошлую субботу",
                    "в прошлое воскресенье"),
           "next": ("в следующий понедельник", "в следующий вторник",
                    "в следующую среду", "в следующий четверг",
                    "в следующую пятницу", "в следующую субботу",
                    "в следующее воскресенье"),
           "since_last": ("с прошлого понедельника", "с прошлого вторника",
                          "с прошлой среды", "с прошлого четверга",
                          "с прошлой пятницы", "с прошлой субботы",
                          "с прошлого воскресенья")},
    "uk": {"base": ("понеділок", "вівторок", "середа", "четвер", "п'ятниця",
                    "субота", "неділя"),
           "gen": ("понеділка", "вівторка", "середи", "четверга", "п'ятниці",
                   "суботи", "неділі"),
           "on": ("у понеділок", "у вівторок", "у середу", "у четвер",
                  "у п'ятницю", "у суботу", "у неділю"),
           "last": ("минулого понеділка", "минулого вівторка",
                    "минулої середи", "минулого четверга",
                    "минулої п'ятниці", "минулої суботи", "минулої неділі"),
           "next": ("наступного понеділка", "наступного вівторка",
                    "наступної середи", "наступного четверга",
                    "наступної п'ятниці", "наступної суботи",
                    "наступної неділі"),
           "since_last": ("з минулого понеділка", "з минулого вівторка",
                          "з минулої середи", "з минулого четверга",
                          "з минулої п'ятниці", "з минулої суботи",
                          "з минулої неділі")},
    "tr": {"base": ("pazartesi", "salı", "çarşamba", "perşembe", "cuma",
                    "cumartesi", "pazar"),
           "abl": ("pazartesiden", "salıdan", "çarşambadan", "perşembeden",
                   "cumadan", "cumartesiden", "pazardan"),
           "dat": ("pazartesiye", "salıya", "çarşambaya", "perşembeye",
                   "cumaya", "cumartesiye", "pazara")},
    "zh": {"base": ("一", "二", "三", "四", "五", "六", "日"),
           "zhou": ("周一", "周二", "周三", "周四", "周五", "周六", "周日"),
           "xingqi": ("星期一", "星期二", "星期三", "星期四", "星期五",
                      "星期六", "星期天")},
    "ja": {"base": ("月曜日", "火曜日", "水曜日", "木曜日", "金曜日",
                    "土曜日", "日曜日"),
           "short": ("月曜", "火曜", "水曜", "木曜", "金曜", "土曜", "日曜")},
    "ko": {"base": ("월요일", "화요일", "수요일", "목요일", "금요일",
                    "토요일", "일요일")},
}

# Units after a number: (one, few, many) forms; few and many differ only in
# Polish, Russian and Ukrainian.  Forms are those the phrases need (German
# dative "vor drei Tagen", Russian accusative "через две недели").
_UNITS: dict[str, dict[str, tuple[str, str, str]]] = {
    "de": {"day": ("Tag", "Tagen", "Tagen"), "week": ("Woche", "Wochen", "Wochen"),
           "month": ("Monat", "Monaten", "Monaten")},
    "fr": {"day": ("jour", "jours", "jours"),
           "week": ("semaine", "semaines", "semaines"),
           "month": ("mois", "mois", "mois")},
    "es": {"day": ("día", "días", "días"),
           "week": ("semana", "semanas", "semanas"),
           "month": ("mes", "meses", "meses")},
    "it": {"day": ("giorno", "giorni", "giorni"),
           "week": ("settimana", "settimane", "settimane"),
           "month": ("mese", "mesi", "mesi")},
    "pt": {"day": ("dia", "dias", "dias"),
           "week": ("semana", "semanas", "semanas"),
           "month": ("mês", "meses", "meses")},
    "nl": {"day": ("dag", "dagen", "dagen"), "week": ("week", "weken", "weken"),
           "month": ("maand", "maanden", "maanden")},
    "pl": {"day": ("dzień", "dni", "dni"),
           "week": ("tydzień", "tygodnie", "tygodni"),
           "month": ("miesiąc", "miesiące", "miesięcy")},
    "ru": {"day": ("день", "дня", "дней"),
           "week": ("неделю", "недели", "недель"),
           "month": ("месяц", "месяца", "месяцев")},
    "uk": {"day": ("день", "дні", "днів"),
           "week": ("тиждень", "тижні", "тижнів"),
           "month": ("місяць", "місяці", "місяців")},
    "tr": {"day": ("gün", "gün", "gün"), "week": ("hafta", "hafta", "hafta"),
           "month": ("ay", "ay", "ay")},
    "zh": {"day": ("天", "天", "天"), "week": ("周", "周", "周"),
           "month": ("个月", "个月", "个月")},
    "ja": {"day": ("日", "日", "日"), "week": ("週間", "週間", "週間"),
           "month": ("か月", "か月", "か月")},
    "ko": {"day": ("일", "일", "일"), "week": ("주", "주", "주"),
           "month": ("개월", "개월", "개월")},
}
_GLUED_UNITS = frozenset({"zh", "ja", "ko"})  # "3天", "3日", "3일": no space
_SLAVIC_PLURALS = frozenset({"pl", "ru", "uk"})

# Number words a writer may use instead of digits (Korean writes digits).
_NUMBER_WORDS: dict[str, dict[int, str]] = {
    "de": {2: "zwei", 3: "drei", 4: "vier", 5: "fünf", 6: "sechs",
           7: "sieben", 10: "zehn"},
    "fr": {2: "deux", 3: "trois", 4: "quatre", 5: "cinq", 6: "six",
           7: "sept", 10: "dix"},
    "es": {2: "dos", 3: "tres", 4: "cuatro", 5: "cinco", 6: "seis",
           7: "siete", 10: "diez"},
    "it": {2: "due", 3: "tre", 4: "quattro", 5: "cinque", 6: "sei",
           7: "sette", 10: "dieci"},
    "pt": {2: "dois", 3: "três", 4: "quatro", 5: "cinco", 6: "seis",
           7: "sete", 10: "dez"},
    "nl": {2: "twee", 3: "drie", 4: "vier", 5: "vijf", 6: "zes", 7: "zeven",
           10: "tien"},
    "pl": {2: "dwa", 3: "trzy", 4: "cztery", 5: "pięć", 6: "sześć",
           7: "siedem", 10: "dziesięć"},
    "ru": {2: "два", 3: "три", 4: "четыре", 5: "пять", 6: "шесть",
           7: "семь", 10: "десять"},
    "uk": {2: "два", 3: "три", 4: "чотири", 5: "п'ять", 6: "шість",
           7: "сім", 10: "десять"},
    "tr": {2: "iki", 3: "üç", 4: "dört", 5: "beş", 6: "altı", 7: "yedi",
           10: "on"},
    "zh": {2: "两", 3: "三", 4: "四", 5: "五", 6: "六", 7: "七", 10: "十"},
    "ja": {2: "二", 3: "三", 4: "四", 5: "五", 6: "六", 7: "七", 10: "十"},
}
# Feminine units take another word for two: "две недели", "duas semanas".
_NUMBER_WORD_OVERRIDES: dict[tuple[str, str], dict[int, str]] = {
    ("ru", "week"): {2: "две"},
    ("pt", "week"): {2: "duas"},
}

# Ordinals of quarters and halves in the form the phrases need.
_QUARTER_WORDS: dict[str, tuple[str, str, str, str]] = {
    "de": ("ersten", "zweiten", "dritten", "vierten"),
    "fr": ("premier", "deuxième", "troisième", "quatrième"),
    "es": ("primer", "segundo", "tercer", "cuarto"),
    "it": ("primo", "secondo", "terzo", "quarto"),
    "pt": ("primeiro", "segundo", "terceiro", "quarto"),
    "nl": ("eerste", "tweede", "derde", "vierde"),
    "pl": ("pierwszym", "drugim", "trzecim", "czwartym"),
    "ru": ("в первом", "во втором", "в третьем", "в четвёртом"),
    "uk": ("першому", "другому", "третьому", "четвертому"),
    "tr": ("birinci", "ikinci", "üçüncü", "dördüncü"),
    "zh": ("第一", "第二", "第三", "第四"),
}
_HALF_WORDS: dict[str, tuple[str, str]] = {
    "de": ("ersten", "zweiten"), "fr": ("premier", "second"),
    "es": ("primer", "segundo"), "it": ("primo", "secondo"),
    "pt": ("primeiro", "segundo"), "nl": ("eerste", "tweede"),
    "pl": ("pierwszym", "drugim"), "ru": ("в первом", "во втором"),
    "uk": ("першому", "другому"), "tr": ("ilk", "ikinci"),
    "zh": ("上", "下"), "ja": ("上半期", "下半期"), "ko": ("상반기", "하반기"),
}

# ---------------------------------------------------------------------------
# Time phrases by family, ready to drop into a sentence.  Slots: {d} {d2}
# (a later day of the same month) {db} (a day of {month2}) {dd} {m} {mm}
# {m2} {mm2} {y} {yy} {q} {h} {w} {ww} {nd} {qw} {hw}, {month[.form]},
# {month2[.form]}, {wd[.form]}, {n.day|week|month}, and a few language
# forms: French {do} "1er", Italian {il_d} "l'8", Turkish {y_loc} "2025'te".
# ---------------------------------------------------------------------------

_FAMILIES: tuple[tuple[str, int], ...] = (
    ("day", 10), ("rel", 14), ("ago", 6), ("in", 4), ("window", 10),
    ("bound", 9), ("range", 6), ("bare", 8), ("weekday", 7), ("year", 4),
    ("date", 6), ("monthyear", 7), ("todate", 4), ("partday", 4),
    ("weekend", 3),
)
_FAMILY_NAMES = tuple(name for name, _ in _FAMILIES)
_FAMILY_WEIGHTS = tuple(weight for _, weight in _FAMILIES)

_PHRASES: dict[str, dict[str, tuple[str, ...]]] = {
    "de": {
        "day": ("heute", "gestern", "morgen", "vorgestern", "übermorgen"),
        "rel": ("letzte Woche", "diese Woche", "nächste Woche",
                "vergangene Woche", "in der letzten Woche", "kommende Woche",
                "letzten Monat", "diesen Monat", "nächsten Monat",
                "im vergangenen Monat", "im letzten Quartal",
                "in diesem Quartal", "im nächsten Quartal", "letztes Jahr",
                "dieses Jahr", "nächstes Jahr", "im Vorjahr"),
        "ago": ("vor {n.day}", "vor {n.week}", "vor {n.month}"),
        "in": ("in {n.day}", "in {n.week}", "in {n.month}"),
        "window": ("in den letzten {nd} Tagen", "in den letzten {nd} Wochen",
                   "während der letzten {nd} Tage",
                   "in den nächsten {nd} Tagen",
                   "innerhalb der letzten {nd} Tage"),
        "bound": ("seit {month}", "seit dem {d}. {month}",
                  "vor dem {d}. {month}", "bis zum {d}. {month}",
                  "bis {d}.{m}.", "ab {month}", "seit letztem {wd}",
                  "bis nächsten {wd}", "seit dem {dd}.{mm}.{y}", "vor Q{q}",
                  "bis Ende {month}", "bis spätestens {wd}"),
        "range": ("zwischen dem {d}. und {d2}. {month}",
                  "vom {d}. bis {d2}. {month}", "von {month} bis {month2}",
                  "zwischen {month} und {month2} {y}",
                  "vom {d}. {month} bis zum {db}. {month2}",
                  "{d}.–{d2}. {month}", "vom {d}.{m}. bis {db}.{m2}."),
        "bare": ("im {month}", "in Q{q}", "Q{q}", "in KW {w}", "KW {w}",
                 "in der KW {w}", "in Kalenderwoche {w}", "am {wd}",
                 "im {qw} Quartal", "am {d}. {month}"),
        "weekday": ("letzten {wd}", "nächsten {wd}", "diesen {wd}",
                    "am letzten {wd}", "am kommenden {wd}",
                    "{wd} letzter Woche", "am {wd} nächster Woche"),
        "year": ("{y}", "im Jahr {y}", "in {y}"),
        "date": ("am {d}. {month} {y}", "am {dd}.{mm}.{y}", "{dd}.{mm}.{y}",
                 "am {d}.{m}.{yy}", "am {y}-{mm}-{dd}", "{y}-{mm}-{dd}"),
        "monthyear": ("im {month} {y}", "{month} {y}", "in Q{q} {y}",
                      "in Q{q}/{y}", "in KW {w}/{y}", "im {hw} Halbjahr {y}",
                      "in der {w}. KW {y}"),
        "todate": ("seit Jahresbeginn", "seit Jahresanfang",
                   "dieses Jahr bisher", "bisher in diesem Monat",
                   "seit Monatsanfang", "im laufenden Jahr", "YTD",
                   "seit Quartalsbeginn"),
        "partday": ("heute Morgen", "heute früh", "gestern Nachmittag",
                    "gestern Abend", "morgen Vormittag", "morgen früh",
                    "heute Nachmittag", "gestern Vormittag"),
        "weekend": ("am Wochenende", "letztes Wochenende",
                    "am letzten Wochenende", "nächstes Wochenende",
                    "übers Wochenende"),
    },
    "fr": {
        "day": ("aujourd'hui", "hier", "demain", "avant-hier",
                "après-demain"),
        "rel": ("la semaine dernière", "cette semaine", "la semaine prochaine",
                "la semaine passée", "le mois dernier", "ce mois-ci",
                "le mois prochain", "le mois passé", "le trimestre dernier",
                "ce trimestre", "le trimestre prochain", "l'année dernière",
                "l'an dernier", "cette année", "l'année prochaine"),
        "ago": ("il y a {n.day}", "il y a {n.week}", "il y a {n.month}"),
        "in": ("dans {n.day}", "dans {n.week}", "d'ici {n.week}",
               "dans {n.month}"),
        "window": ("ces {nd} derniers jours", "au cours des {nd} derniers jours",
                   "sur les {nd} derniers jours",
                   "durant les {nd} dernières semaines",
                   "dans les {nd} prochains jours"),
        "bound": ("depuis {month}", "depuis le {do} {month}",
                  "avant le {do} {month}", "jusqu'au {do} {month}",
                  "à partir du {do} {month}", "à partir {month.de}",
                  "depuis {wd} dernier", "avant le T{q}", "d'ici {wd}",
                  "jusqu'à fin {month}", "depuis le {dd}/{mm}/{y}"),
        "range": ("entre le {do} et le {d2} {month}", "du {do} au {d2} {month}",
                  "{month.de} à {month2}", "du {do} {month} au {dbo} {month2}",
                  "entre {month} et {month2} {y}",
                  "du {dd}/{mm} au {d2}/{mm}"),
        "bare": ("en {month}", "au T{q}", "T{q}", "au {qo} trimestre",
                 "semaine {w}", "en semaine {w}", "la semaine {w}", "{wd}",
                 "le {do} {month}", "au Q{q}"),
        "weekday": ("{wd} dernier", "{wd} prochain", "ce {wd}",
                    "{wd} de la semaine dernière",
                    "{wd} de la semaine prochaine"),
        "year": ("en {y}", "sur {y}", "pour {y}", "durant l'année {y}"),
        "date": ("le {do} {month} {y}", "le {dd}/{mm}/{y}", "{dd}/{mm}/{y}",
                 "le {y}-{mm}-{dd}", "le {d}/{m}/{yy}"),
        "monthyear": ("en {month} {y}", "au T{q} {y}",
                      "au {qo} trimestre {y}", "au {hw} semestre {y}",
                      "la semaine {w} de {y}", "en {month} de l'année {y}"),
        "todate": ("depuis le début de l'année", "depuis le 1er janvier",
                   "cette année jusqu'ici", "depuis le début du mois",
                   "en cumul annuel", "YTD"),
        "partday": ("ce matin", "hier après-midi", "hier soir", "demain matin",
                    "cet après-midi", "hier matin", "ce soir", "cette nuit"),
        "weekend": ("ce week-end", "le week-end dernier",
                    "le week-end prochain", "pendant le week-end",
                    "ce weekend"),
    },
    "es": {
        "day": ("hoy", "ayer", "mañana", "anteayer", "pasado mañana"),
        "rel": ("la semana pasada", "esta semana", "la próxima semana",
                "la semana que viene", "el mes pasado", "este mes",
                "el próximo mes", "el mes que viene", "el trimestre pasado",
                "este trimestre", "el próximo trimestre", "el año pasado",
                "este año", "el próximo año", "el año que viene"),
        "ago": ("hace {n.day}", "hace {n.week}", "hace {n.month}"),
        "in": ("dentro de {n.day}", "en {n.week}", "dentro de {n.month}"),
        "window": ("en los últimos {nd} días", "durante las últimas {nd} semanas",
                   "los últimos {nd} días", "en los próximos {nd} días",
                   "en las últimas {nd} semanas"),
        "bound": ("desde {month}", "desde el {d} de {month}",
                  "antes del {d} de {month}", "hasta el {d} de {month}",
                  "a partir de {month}", "desde el {wd} pasado",
                  "antes del Q{q}", "hasta el {wd}", "desde el {dd}/{mm}/{y}",
                  "hasta finales de {month}"),
        "range": ("entre el {d} y el {d2} de {month}",
                  "del {d} al {d2} de {month}", "de {month} a {month2}",
                  "desde {month} hasta {month2}",
                  "del {d} de {month} al {db} de {month2}",
                  "entre {month} y {month2} de {y}"),
        "bare": ("en {month}", "en el Q{q}", "Q{q}", "en el {qw} trimestre",
                 "la semana {w}", "en la semana {w}", "el {wd}",
                 "el {d} de {month}"),
        "weekday": ("el {wd} pasado", "el próximo {wd}", "este {wd}",
                    "el {wd} de la semana pasada", "el {wd} que viene"),
        "year": ("en {y}", "durante {y}", "en el año {y}", "en el {y}"),
        "date": ("el {d} de {month} de {y}", "el {dd}/{mm}/{y}",
                 "{dd}/{mm}/{y}", "el {y}-{mm}-{dd}", "el {d}/{m}/{yy}"),
        "monthyear": ("en {month} de {y}", "en {month} {y}",
                      "en el Q{q} de {y}", "en el {qw} trimestre de {y}",
                      "en el {hw} semestre de {y}", "en la semana {w} de {y}"),
        "todate": ("en lo que va de año", "en lo que va del año",
                   "en lo que va de mes", "desde principios de año",
                   "desde el 1 de enero", "en el acumulado del año", "YTD"),
        "partday": ("esta mañana", "ayer por la tarde", "ayer a la tarde",
                    "anoche", "mañana por la mañana", "esta tarde",
                    "ayer por la mañana", "esta noche"),
        "weekend": ("este fin de semana", "el fin de semana pasado",
                    "el próximo fin de semana", "durante el fin de semana",
                    "el finde"),
    },
    "it": {
        "day": ("oggi", "ieri", "domani", "l'altro ieri", "dopodomani"),
        "rel": ("la settimana scorsa", "questa settimana",
                "la prossima settimana", "la settimana prossima",
                "il mese scorso", "questo mese", "il mese prossimo",
                "lo scorso mese", "lo scorso trimestre", "il trimestre scorso",
                "questo trimestre", "il prossimo trimestre", "l'anno scorso",
                "quest'anno", "l'anno prossimo"),
        "ago": ("{n.day} fa", "{n.week} fa", "{n.month} fa"),
        "in": ("tra {n.day}", "fra {n.week}", "tra {n.month}"),
        "window": ("negli ultimi {nd} giorni", "nelle ultime {nd} settimane",
                   "durante gli ultimi {nd} giorni", "nei prossimi {nd} giorni",
                   "negli ultimi {nd} mesi"),
        "bound": ("da {month}", "{dal_d} {month}", "prima {del_d} {month}",
                  "entro {il_d} {month}", "fino {al_d} {month}",
                  "dall'inizio di {month}", "prima di {month}",
                  "entro {wd}", "da {wd.last}", "fino a fine {month}",
                  "dal {dd}/{mm}/{y}"),
        "range": ("tra {il_d} e {il_d2} {month}", "{dal_d} {al_d2} {month}",
                  "da {month} {month2.a}", "{dal_d} {month} {al_db} {month2}",
                  "tra {month} e {month2} {y}"),
        "bare": ("{month.a}", "in {month}", "nel Q{q}", "Q{q}",
                 "nel {qw} trimestre", "nella settimana {w}", "settimana {w}",
                 "{wd}", "{il_d} {month}"),
        "weekday": ("{wd.last}", "{wd.next}", "{wd.this}",
                    "{wd} della settimana scorsa",
                    "{wd} della prossima settimana"),
        "year": ("nel {y}", "durante il {y}", "per il {y}"),
        "date": ("{il_d} {month} {y}", "il {dd}/{mm}/{y}", "{dd}/{mm}/{y}",
                 "il {y}-{mm}-{dd}", "{d}/{m}/{yy}"),
        "monthyear": ("{month.a} {y}", "{month.a} del {y}", "nel Q{q} {y}",
                      "nel {qw} trimestre del {y}", "nel {hw} semestre {y}",
                      "nella settimana {w} del {y}"),
        "todate": ("da inizio anno", "dall'inizio dell'anno", "da inizio mese",
                   "finora quest'anno", "YTD", "dal 1° gennaio"),
        "partday": ("stamattina", "ieri pomeriggio", "ieri sera",
                    "domani mattina", "oggi pomeriggio", "stasera",
                    "ieri mattina", "stanotte"),
        "weekend": ("questo weekend", "lo scorso weekend", "il weekend scorso",
                    "il prossimo fine settimana", "nel fine settimana"),
    },
    "pt": {
        "day": ("hoje", "ontem", "amanhã", "anteontem", "depois de amanhã"),
        "rel": ("na semana passada", "semana passada", "esta semana",
                "nesta semana", "na próxima semana", "semana que vem",
                "no mês passado", "mês passado", "este mês", "no próximo mês",
                "mês que vem", "no trimestre passado", "neste trimestre",
                "no próximo trimestre", "no ano passado", "este ano",
                "ano que vem"),
        "ago": ("há {n.day}", "{n.day} atrás", "há {n.week}",
                "{n.month} atrás"),
        "in": ("daqui a {n.day}", "em {n.week}", "daqui a {n.month}"),
        "window": ("nos últimos {nd} dias", "nas últimas {nd} semanas",
                   "durante os últimos {nd} dias", "nos próximos {nd} dias",
                   "nos últimos {nd} meses"),
        "bound": ("desde {month}", "desde o dia {d} de {month}",
                  "desde {d} de {month}", "antes de {d} de {month}",
                  "até {d} de {month}", "até o dia {d} de {month}",
                  "a partir de {month}", "{wd.since_last}", "antes do Q{q}",
                  "até {wd}", "até o fim de {month}", "desde {dd}/{mm}/{y}"),
        "range": ("entre {d} e {d2} de {month}", "de {d} a {d2} de {month}",
                  "de {month} a {month2}", "entre {month} e {month2} de {y}",
                  "de {d} de {month} a {db} de {month2}",
                  "do dia {d} ao dia {d2} de {month}"),
        "bare": ("em {month}", "no Q{q}", "Q{q}", "no {qw} trimestre",
                 "na semana {w}", "semana {w}", "{wd.on}", "em {d} de {month}",
                 "no dia {d} de {month}"),
        "weekday": ("{wd.last}", "{wd.next}", "{wd.on} da semana passada",
                    "{wd.on} da semana que vem"),
        "year": ("em {y}", "durante {y}", "no ano de {y}"),
        "date": ("em {d} de {month} de {y}", "no dia {dd}/{mm}/{y}",
                 "{dd}/{mm}/{y}", "em {y}-{mm}-{dd}", "{d}/{m}/{yy}"),
        "monthyear": ("em {month} de {y}", "em {month}/{y}", "no Q{q} de {y}",
                      "no {qw} trimestre de {y}", "no {hw} semestre de {y}",
                      "na semana {w} de {y}"),
        "todate": ("no acumulado do ano", "desde o início do ano",
                   "até agora neste ano", "desde o começo do mês",
                   "no acumulado do mês", "YTD"),
        "partday": ("hoje de manhã", "hoje cedo", "ontem à tarde",
                    "ontem à noite", "amanhã de manhã", "hoje à tarde",
                    "ontem de manhã", "hoje à noite"),
        "weekend": ("no fim de semana", "no último fim de semana",
                    "no próximo fim de semana", "neste fim de semana",
                    "no fds"),
    },
    "nl": {
        "day": ("vandaag", "gisteren", "morgen", "eergisteren", "overmorgen"),
        "rel": ("vorige week", "deze week", "volgende week", "afgelopen week",
                "komende week", "vorige maand", "deze maand",
                "volgende maand", "afgelopen maand", "vorig kwartaal",
                "dit kwartaal", "volgend kwartaal", "vorig jaar", "dit jaar",
                "volgend jaar"),
        "ago": ("{n.day} geleden", "{n.week} geleden", "{n.month} geleden"),
        "in": ("over {n.day}", "over {n.week}", "binnen {n.week}",
               "over {n.month}"),
        "window": ("in de afgelopen {nd} dagen", "de laatste {nd} dagen",
                   "de afgelopen {nd} weken", "in de komende {nd} dagen",
                   "de afgelopen {nd} maanden"),
        "bound": ("sinds {month}", "sinds {d} {month}", "vóór {d} {month}",
                  "voor {d} {month}", "tot {d} {month}",
                  "tot en met {d} {month}", "vanaf {month}",
                  "sinds vorige {wd}", "voor Q{q}", "tot {wd}",
                  "sinds {dd}-{mm}-{y}", "tot eind {month}"),
        "range": ("tussen {d} en {d2} {month}", "van {d} tot {d2} {month}",
                  "van {d} t/m {d2} {month}", "van {month} tot {month2}",
                  "van {d} {month} tot {db} {month2}",
                  "tussen {month} en {month2} {y}"),
        "bare": ("in {month}", "in Q{q}", "Q{q}", "in het {qw} kwartaal",
                 "in week {w}", "week {w}", "op {wd}", "op {d} {month}"),
        "weekday": ("vorige {wd}", "afgelopen {wd}", "volgende {wd}",
                    "komende {wd}", "deze {wd}", "{wd} vorige week",
                    "op {wd} van vorige week"),
        "year": ("in {y}", "in het jaar {y}", "over heel {y}"),
        "date": ("op {d} {month} {y}", "op {dd}-{mm}-{y}", "{dd}-{mm}-{y}",
                 "op {y}-{mm}-{dd}", "{d}-{m}-{y}"),
        "monthyear": ("in {month} {y}", "in Q{q} {y}",
                      "in het {qw} kwartaal van {y}",
                      "in de {hw} helft van {y}", "in week {w} van {y}",
                      "in H{h} {y}"),
        "todate": ("dit jaar tot nu toe", "sinds begin dit jaar",
                   "sinds het begin van het jaar", "deze maand tot nu toe",
                   "sinds 1 januari", "YTD"),
        "partday": ("vanochtend", "vanmorgen", "gistermiddag", "gisteravond",
                    "morgenochtend", "vanmiddag", "gisterochtend", "vannacht"),
        "weekend": ("dit weekend", "afgelopen weekend", "vorig weekend",
                    "volgend weekend", "in het weekend"),
    },
    "pl": {
        "day": ("dzisiaj", "dziś", "wczoraj", "jutro", "przedwczoraj",
                "pojutrze"),
        "rel": ("w zeszłym tygodniu", "w tym tygodniu", "w przyszłym tygodniu",
                "w ubiegłym tygodniu", "w zeszłym miesiącu", "w tym miesiącu",
                "w przyszłym miesiącu", "w poprzednim miesiącu",
                "w poprzednim kwartale", "w tym kwartale",
                "w przyszłym kwartale", "w zeszłym roku", "w tym roku",
                "w przyszłym roku", "w ubiegłym roku"),
        "ago": ("{n.day} temu", "{n.week} temu", "{n.month} temu"),
        "in": ("za {n.day}", "za {n.week}", "za {n.month}"),
        "window": ("w ciągu ostatnich {nd} dni", "przez ostatnie {nd} dni",
                   "w ostatnich {nd} tygodniach",
                   "w ciągu najbliższych {nd} dni", "z ostatnich {nd} dni"),
        "bound": ("od {month.gen}", "od {d} {month.gen}",
                  "przed {d} {month.gen}", "do {d} {month.gen}",
                  "do końca {month.gen}", "{wd.since_last}", "do {wd.gen}",
                  "przed Q{q}", "od {dd}.{mm}.{y}"),
        "range": ("między {d} a {d2} {month.gen}", "od {d} do {d2} {month.gen}",
                  "od {month.gen} do {month2.gen}",
                  "od {d} {month.gen} do {db} {month2.gen}",
                  "{d}–{d2} {month.gen}", "od {month.gen} do {month2.gen} {y}"),
        "bare": ("{month.w}", "w Q{q}", "Q{q}", "w {qw} kwartale",
                 "w {w}. tygodniu", "w tygodniu {w}", "{wd.on}",
                 "{d} {month.gen}"),
        "weekday": ("{wd.last}", "{wd.next}", "{wd.on} w zeszłym tygodniu",
                    "{wd.on} w przyszłym tygodniu"),
        "year": ("w {y} roku", "w {y} r.", "w roku {y}"),
        "date": ("{d} {month.gen} {y}", "{d} {month.gen} {y} r.",
                 "{dd}.{mm}.{y}", "dnia {dd}.{mm}.{y}", "{y}-{mm}-{dd}"),
        "monthyear": ("{month.w} {y}", "{month.w} {y} r.",
                      "w Q{q} {y}", "w {qw} kwartale {y} r.",
                      "w {hw} półroczu {y}", "w {w}. tygodniu {y} r."),
        "todate": ("od początku roku", "w tym roku do tej pory",
                   "od początku miesiąca", "od 1 stycznia",
                   "narastająco od początku roku", "YTD"),
        "partday": ("dziś rano", "dzisiaj rano", "wczoraj po południu",
                    "wczoraj wieczorem", "jutro rano", "dziś po południu",
                    "wczoraj rano", "dziś w nocy"),
        "weekend": ("w weekend", "w ostatni weekend", "w zeszły weekend",
                    "w przyszły weekend", "w ten weekend"),
    },
    "ru": {
        "day": ("сегодня", "вчера", "завтра", "позавчера", "послезавтра"),
        "rel": ("на прошлой неделе", "на этой неделе", "на следующей неделе",
                "на текущей неделе", "в прошлом месяце", "в этом месяце",
                "в следующем месяце", "в текущем месяце", "в прошлом квартале",
                "в этом квартале", "в следующем квартале", "в прошлом году",
                "в этом году", "в следующем году"),
        "ago": ("{n.day} назад", "{n.week} назад", "{n.month} назад"),
        "in": ("через {n.day}", "через {n.week}", "через {n.month}"),
        "window": ("за последние {nd} дней", "за последние {nd} недель",
                   "за прошедшие {nd} дней", "в ближайшие {nd} дней",
                   "за последние {nd} месяцев"),
        "bound": ("с {month.gen}", "с {d} {month.gen}", "до {d} {month.gen}",
                  "до конца {month.gen}", "после {d} {month.gen}",
                  "начиная с {month.gen}", "{wd.since_last}", "до {wd.gen}",
                  "до Q{q}", "с {dd}.{mm}.{y}"),
        "range": ("с {d} по {d2} {month.gen}", "между {d} и {d2} {month.gen}",
                  "с {month.gen} по {month2}",
                  "с {d} {month.gen} по {db} {month2.gen}",
                  "{d}–{d2} {month.gen}", "с {month.gen} по {month2} {y} года"),
        "bare": ("в {month.loc}", "в Q{q}", "Q{q}", "{qw} квартале",
                 "на {w}-й неделе", "на неделе {w}", "{wd.on}",
                 "{d} {month.gen}"),
        "weekday": ("{wd.last}", "{wd.next}", "{wd.on} на прошлой неделе",
                    "{wd.on} на следующей неделе"),
        "year": ("в {y} году", "за {y} год", "в {y} г."),
        "date": ("{d} {month.gen} {y}", "{d} {month.gen} {y} года",
                 "{dd}.{mm}.{y}", "{dd}.{mm}.{yy}", "{y}-{mm}-{dd}"),
        "monthyear": ("в {month.loc} {y}", "в {month.loc} {y} года",
                      "в Q{q} {y}", "{qw} квартале {y} года",
                      "{hw} полугодии {y} года", "на {w}-й неделе {y} года"),
        "todate": ("с начала года", "с начала месяца", "с начала квартала",
                   "с 1 января", "YTD"),
        "partday": ("сегодня утром", "вчера днём", "вчера вечером",
                    "завтра утром", "сегодня днём", "вчера утром",
                    "сегодня вечером"),
        "weekend": ("на выходных", "в эти выходные", "в прошлые выходные",
                    "на прошлых выходных", "в следующие выходные"),
    },
    "uk": {
        "day": ("сьогодні", "вчора", "учора", "завтра", "позавчора",
                "післязавтра"),
        "rel": ("минулого тижня", "цього тижня", "наступного тижня",
                "на минулому тижні", "на цьому тижні", "минулого місяця",
                "цього місяця", "наступного місяця", "минулого кварталу",
                "цього кварталу", "наступного кварталу", "минулого року",
                "цього року", "наступного року", "торік"),
        "ago": ("{n.day} тому", "{n.week} тому", "{n.month} тому"),
        "in": ("через {n.day}", "через {n.week}", "через {n.month}"),
        "window": ("за останні {nd} днів", "за останні {nd} тижнів",
                   "протягом останніх {nd} днів", "у найближчі {nd} днів",
                   "за останні {nd} місяців"),
        "bound": ("з {month.gen}", "з {d} {month.gen}", "до {d} {month.gen}",
                  "до кінця {month.gen}", "після {d} {month.gen}",
                  "починаючи з {month.gen}", "{wd.since_last}", "до {wd.gen}",
                  "до Q{q}", "з {dd}.{mm}.{y}"),
        "range": ("з {d} по {d2} {month.gen}", "з {d} до {d2} {month.gen}",
                  "між {d} і {d2} {month.gen}", "з {month.gen} по {month2}",
                  "з {d} {month.gen} по {db} {month2.gen}",
                  "{d}–{d2} {month.gen}"),
        "bare": ("у {month.loc}", "в Q{q}", "Q{q}", "у {qw} кварталі",
                 "на {w}-му тижні", "на тижні {w}", "{wd.on}",
                 "{d} {month.gen}"),
        "weekday": ("{wd.last}", "{wd.next}", "{wd.on} минулого тижня",
                    "{wd.on} наступного тижня"),
        "year": ("у {y} році", "в {y} році", "за {y} рік", "у {y} р."),
        "date": ("{d} {month.gen} {y}", "{d} {month.gen} {y} року",
                 "{dd}.{mm}.{y}", "{y}-{mm}-{dd}"),
        "monthyear": ("у {month.loc} {y}", "у {month.loc} {y} року",
                      "у Q{q} {y}", "у {qw} кварталі {y} року",
                      "у {hw} півріччі {y} року", "на {w}-му тижні {y} року"),
        "todate": ("з початку року", "з початку місяця", "з початку кварталу",
                   "з 1 січня", "YTD"),
        "partday": ("сьогодні вранці", "вчора вдень", "вчора ввечері",
                    "завтра вранці", "сьогодні вдень", "вчора вранці",
                    "сьогодні ввечері"),
        "weekend": ("на вихідних", "минулих вихідних", "на минулих вихідних",
                    "цими вихідними", "наступних вихідних"),
    },
    "tr": {
        "day": ("bugün", "dün", "yarın", "önceki gün", "öbür gün"),
        "rel": ("geçen hafta", "bu hafta", "gelecek hafta", "önümüzdeki hafta",
                "geçen ay", "bu ay", "gelecek ay", "önümüzdeki ay",
                "geçen çeyrek", "bu çeyrek", "gelecek çeyrek", "geçen yıl",
                "bu yıl", "gelecek yıl", "geçen sene", "bu sene", "seneye"),
        "ago": ("{n.day} önce", "{n.week} önce", "{n.month} önce"),
        "in": ("{n.day} sonra", "{n.week} içinde", "{n.month} sonra"),
        "window": ("son {nd} günde", "son {nd} gün içinde", "son {nd} haftada",
                   "önümüzdeki {nd} gün içinde", "son {nd} ayda"),
        "bound": ("{month.abl} beri", "{d} {month.abl} beri",
                  "{d} {month.dat} kadar", "{d} {month.abl} önce",
                  "{month.low} ayından beri", "geçen {wd.abl} beri",
                  "{wd.dat} kadar", "{qw} çeyrekten önce",
                  "{dd}.{mm}.{y} tarihinden beri", "{month.low} sonuna kadar"),
        "range": ("{d} ile {d2} {month} arasında", "{d}-{d2} {month} arasında",
                  "{month.abl} {month2.dat} kadar",
                  "{d} {month} - {db} {month2} arası",
                  "{month} ile {month2} {y} arasında"),
        "bare": ("{month.loc}", "{month.low} ayında", "{qw} çeyrekte",
                 "Q{q} döneminde", "{w}. haftada", "{w}. hafta",
                 "{wd} günü", "{d} {month.loc}"),
        "weekday": ("geçen {wd}", "gelecek {wd}", "önümüzdeki {wd}",
                    "bu {wd}", "geçen hafta {wd}"),
        "year": ("{y_loc}", "{y} yılında", "{y} boyunca"),
        "date": ("{d} {month} {y_loc}", "{d} {month} {y} tarihinde",
                 "{dd}.{mm}.{y} tarihinde", "{dd}.{mm}.{y}", "{y}-{mm}-{dd}",
                 "{dd}/{mm}/{y}"),
        "monthyear": ("{month} {y_loc}", "{y} {month.low} ayında",
                      "{y} {qw} çeyreğinde", "{y} yılının {hw} yarısında",
                      "{y} yılının {w}. haftasında", "Q{q} {y} döneminde"),
        "todate": ("yılbaşından beri", "yıl başından bu yana",
                   "bu yıl şimdiye kadar", "ay başından beri",
                   "bu ay şimdiye kadar", "YTD"),
        "partday": ("bu sabah", "dün öğleden sonra", "dün akşam", "yarın sabah",
                    "bugün öğleden sonra", "dün sabah", "bu akşam", "dün gece"),
        "weekend": ("hafta sonu", "bu hafta sonu", "geçen hafta sonu",
                    "gelecek hafta sonu", "hafta sonunda"),
    },
    "zh": {
        "day": ("今天", "昨天", "明天", "前天", "后天", "今日"),
        "rel": ("上周", "本周", "这周", "下周", "上个星期", "上个月", "这个月",
                "本月", "下个月", "上季度", "本季度", "下季度", "上一季度",
                "去年", "今年", "明年"),
        "ago": ("{n.day}前", "{n.week}前", "{n.month}前"),
        "in": ("{n.day}后", "{n.week}后", "{n.month}以后"),
        "window": ("过去{nd}天", "最近{nd}天", "近{nd}天", "过去{nd}周",
                   "未来{nd}天内", "最近{nd}个月"),
        "bound": ("自{m}月以来", "{m}月以后", "{m}月{d}日之前",
                  "{m}月{d}日以来", "截至{m}月{d}日", "{m}月{d}号以后",
                  "上周{wd}以来", "{wd.zhou}之前", "Q{q}之前",
                  "{y}/{m}/{d}以来", "到{m}月底"),
        "range": ("{m}月{d}日到{d2}日", "{m}月{d}日至{m}月{d2}日",
                  "从{m}月到{m2}月", "{m}月至{m2}月",
                  "{m}月{d}日到{m2}月{db}日", "{y}年{m}月到{m2}月"),
        "bare": ("{m}月", "{m}月份", "Q{q}", "{qw}季度", "第{w}周",
                 "{wd.zhou}", "{m}月{d}日", "{m}月{d}号"),
        "weekday": ("上周{wd}", "下周{wd}", "这周{wd}", "本周{wd}",
                    "上个{wd.xingqi}"),
        "year": ("{y}年", "在{y}年", "{y}年度"),
        "date": ("{y}年{m}月{d}日", "{y}-{mm}-{dd}", "{y}/{m}/{d}",
                 "{y}.{m}.{d}", "{y}年{m}月{d}号"),
        "monthyear": ("{y}年{m}月", "{y}年{qw}季度", "{y}年Q{q}",
                      "{y}年{hw}半年", "{y}年第{w}周"),
        "todate": ("今年以来", "年初至今", "本月至今", "今年到目前为止",
                   "本季度至今", "YTD"),
        "partday": ("今天上午", "今早", "昨天下午", "昨晚", "明天上午",
                    "今天下午", "昨天上午", "今晚"),
        "weekend": ("周末", "这个周末", "上周末", "下周末", "本周末"),
    },
    "ja": {
        "day": ("今日", "昨日", "明日", "一昨日", "明後日", "きのう"),
        "rel": ("先週", "今週", "来週", "先月", "今月", "来月", "前四半期",
                "今四半期", "来四半期", "去年", "昨年", "今年", "来年"),
        "ago": ("{n.day}前に", "{n.week}前に", "{n.month}前に"),
        "in": ("{n.day}後に", "{n.week}後に", "{n.month}後に"),
        "window": ("過去{nd}日間", "直近{nd}日間", "ここ{nd}日", "過去{nd}週間",
                   "今後{nd}日以内に", "過去{nd}か月"),
        "bound": ("{m}月以降", "{m}月{d}日以降", "{m}月{d}日より前に",
                  "{m}月{d}日まで", "{m}月{d}日以前", "先週の{wd}以降",
                  "{wd}まで", "Q{q}より前に", "{y}/{mm}/{dd}以降",
                  "{m}月末まで"),
        "range": ("{m}月{d}日から{d2}日まで", "{m}月{d}日〜{d2}日に",
                  "{m}月から{m2}月まで", "{m}月〜{m2}月に",
                  "{m}月{d}日から{m2}月{db}日まで",
                  "{y}年{m}月から{m2}月にかけて"),
        "bare": ("{m}月に", "Q{q}に", "第{q}四半期に", "第{w}週に", "{wd}に",
                 "{m}月{d}日に"),
        "weekday": ("先週の{wd}", "来週の{wd}", "今週の{wd}", "先週{wd.short}",
                    "この前の{wd}"),
        "year": ("{y}年に", "{y}年中に", "{y}年度に"),
        "date": ("{y}年{m}月{d}日に", "{y}/{mm}/{dd}に", "{y}/{m}/{d}",
                 "{y}-{mm}-{dd}に"),
        "monthyear": ("{y}年{m}月に", "{y}年Q{q}に", "{y}年第{q}四半期に",
                      "{y}年{hw}に", "{y}年の第{w}週に"),
        "todate": ("年初来", "今年に入ってから", "今月に入ってから",
                   "年初から今まで", "今年累計で", "YTD"),
        "partday": ("今朝", "昨日の午後", "昨夜", "明日の朝", "今日の午後",
                    "昨日の朝", "今夜", "昨晩"),
        "weekend": ("週末に", "今週末", "先週末", "来週末", "週末の間に"),
    },
    "ko": {
        "day": ("오늘", "어제", "내일", "그저께", "모레", "그제"),
        "rel": ("지난주에", "이번 주에", "다음 주에", "지난달에", "이번 달에",
                "다음 달에", "지난 분기에", "이번 분기에", "다음 분기에",
                "작년에", "올해", "내년에", "지난주", "이번 주"),
        "ago": ("{n.day} 전에", "{n.week} 전", "{n.month} 전에"),
        "in": ("{n.day} 후에", "{n.week} 뒤에", "{n.month} 후"),
        "window": ("최근 {nd}일 동안", "지난 {nd}일간", "최근 {nd}주 동안",
                   "앞으로 {nd}일 안에", "최근 {nd}개월간"),
        "bound": ("{m}월 이후", "{m}월 {d}일 이후", "{m}월 {d}일 이전에",
                  "{m}월 {d}일까지", "{m}월 {d}일 전까지",
                  "지난주 {wd} 이후", "{wd}까지", "{q}분기 이전에",
                  "{y}.{mm}.{dd} 이후", "{m}월 말까지"),
        "range": ("{m}월 {d}일부터 {d2}일까지", "{m}월 {d}일~{d2}일",
                  "{m}월부터 {m2}월까지", "{m}월~{m2}월",
                  "{m}월 {d}일부터 {m2}월 {db}일까지",
                  "{y}년 {m}월부터 {m2}월까지"),
        "bare": ("{m}월에", "Q{q}에", "{q}분기에", "{w}주차에", "{wd}에",
                 "{m}월 {d}일에"),
        "weekday": ("지난주 {wd}에", "다음 주 {wd}에", "이번 주 {wd}",
                    "지난 {wd}에", "다음 {wd}"),
        "year": ("{y}년에", "{y}년 동안", "{y}년도에"),
        "date": ("{y}년 {m}월 {d}일에", "{y}.{mm}.{dd}", "{y}. {m}. {d}.",
                 "{y}-{mm}-{dd}에", "{y}/{mm}/{dd}"),
        "monthyear": ("{y}년 {m}월에", "{y}년 Q{q}에", "{y}년 {q}분기에",
                      "{y}년 {hw}에", "{y}년 {w}주차에"),
        "todate": ("연초부터 지금까지", "올해 들어", "이번 달 들어",
                   "올해 누적", "YTD"),
        "partday": ("오늘 아침", "어제 오후", "어젯밤", "내일 아침",
                    "오늘 오후", "어제 아침", "오늘 밤", "어제 저녁"),
        "weekend": ("주말에", "이번 주말에", "지난 주말에", "다음 주말에",
                    "주말 동안"),
    },
}

# ---------------------------------------------------------------------------
# Mixed questions: an English question with one phrase of another language,
# or a question in another language with an English phrase.  The English
# carriers use the slots of nlnorm.benchlog ({subj}, {status}, {verb}...);
# {T} is the foreign time phrase and {F} a foreign phrase without one.
# ---------------------------------------------------------------------------

_MIXED_EN_TIME = (
    "{subj} {T}",
    "show {subj} {verb} {T}",
    "how many {subj} were {verb} {T}",
    "list {status} {subj} {T}",
    "what did {person} merge {T}",
    "any incidents {T}?",
    "which releases shipped {T}",
    "{subj} on the {board} board {T}",
    "who {verb} the most {subj} {T}",
    "{subj} labelled {label} {T}",
)
_MIXED_EN_PLAIN = (
    "{subj} {F}",
    "show {subj} {F}",
    "list {status} {subj} {F}",
    "how many {subj} {F} are there",
    "which {subj} {F} are still {status}",
)
#: Foreign phrases glued to an English carrier, with their own preposition.
_EMBEDDED_TIME: dict[str, tuple[str, ...]] = {
    "de": ("von letzter Woche", "von gestern", "von heute", "seit gestern"),
    "fr": ("de la semaine dernière", "d'hier", "depuis hier"),
    "es": ("de la semana pasada", "de ayer", "desde ayer"),
    "it": ("della settimana scorsa", "di ieri", "da ieri"),
    "pt": ("da semana passada", "de ontem", "desde ontem"),
    "nl": ("van vorige week", "van gisteren", "sinds gisteren"),
    "pl": ("z zeszłego tygodnia", "z wczoraj", "od wczoraj"),
    "ru": ("с прошлой недели", "со вчерашнего дня", "за вчера"),
    "uk": ("з минулого тижня", "з учорашнього дня", "за вчора"),
    "tr": ("geçen haftadan beri", "dünden beri"),
}
#: Foreign phrases without a time phrase, for English carriers.
_FOREIGN_BITS: dict[str, tuple[str, ...]] = {
    "de": ("ohne Bearbeiter", "mit Priorität 2", "mit dem Tag backend",
           "von Odile"),
    "fr": ("sans responsable", "de priorité 2", "liés au module Mars",
           "mis à jour par Odile"),
    "es": ("sin responsable", "con prioridad mayor", "de la segunda versión",
           "asignados a Odile"),
    "it": ("senza assegnatario", "con priorità maggiore", "secondo Odile",
           "dell'ultima versione"),
    "pt": ("sem responsável", "da segunda versão", "com prioridade maior",
           "do board Wrenfold"),
    "nl": ("zonder eigenaar", "met prioriteit 2", "uit de laatste versie",
           "van Odile"),
    "pl": ("bez przypisanej osoby", "z priorytetem 2", "z ostatniej wersji",
           "które mają etykietę backend"),
    "ru": ("без исполнителя", "с приоритетом 2", "про майки для выставки",
           "из проекта Маяк"),
    "uk": ("без виконавця", "з пріоритетом 2", "про той лютий баг",
           "з останньої версії"),
    "tr": ("atanmamış", "öncelik 2 olan", "güncel sürümdeki",
           "ikinci incelemedeki"),
    "zh": ("没有负责人的", "优先级2的", "周报里的", "跟下载有关的"),
    "ja": ("担当者なし", "優先度2", "日報に載った", "2番目のレビュー待ち"),
    "ko": ("담당자 없는", "우선순위 2", "주요", "최신 버전"),
}
#: English tails for questions in another language without a time phrase.
_ENGLISH_TAILS = (" for the standup", " pls", " for the release notes",
                  " (for the retro)", " - any blockers?")

# ---------------------------------------------------------------------------
# Framing: openings and endings people add, and which scripts have case.
# ---------------------------------------------------------------------------

_PREFIXES: dict[str, tuple[str, ...]] = {
    "de": ("", "", "", "", "Hey, ", "Kurze Frage: ", "Für das Standup: ",
           "Moin, "),
    "fr": ("", "", "", "", "Salut, ", "Petite question : ", "Pour le daily : "),
    "es": ("", "", "", "", "Oye, ", "Una pregunta: ", "Para la daily: "),
    "it": ("", "", "", "", "Ciao, ", "Domanda veloce: ", "Per lo standup: "),
    "pt": ("", "", "", "", "Oi, ", "Pergunta rápida: ", "Pra daily: "),
    "nl": ("", "", "", "", "Hoi, ", "Snelle vraag: ", "Voor de standup: "),
    "pl": ("", "", "", "", "Hej, ", "Szybkie pytanie: ", "Na daily: "),
    "ru": ("", "", "", "", "Привет, ", "Вопрос: ", "Для стендапа: "),
    "uk": ("", "", "", "", "Привіт, ", "Питання: ", "Для стендапу: "),
    "tr": ("", "", "", "", "Merhaba, ", "Hızlı bir soru: ", "Standup için: "),
    "zh": ("", "", "", "", "请问", "帮我查一下", "麻烦看下"),
    "ja": ("", "", "", "", "すみません、", "確認です：", "朝会用に"),
    "ko": ("", "", "", "", "혹시 ", "질문: ", "스탠드업용으로 "),
}
_ENDINGS: dict[str, tuple[str, ...]] = {
    "de": ("", "", "", "?", "?", " bitte"),
    "fr": ("", "", "", " ?", "?", " stp"),
    "es": ("", "", "", "", " por favor"),
    "it": ("", "", "", "?", "?", " per favore"),
    "pt": ("", "", "", "?", "?", " por favor"),
    "nl": ("", "", "", "?", "?", " a.u.b."),
    "pl": ("", "", "", "?", "?", " proszę"),
    "ru": ("", "", "", "?", "?", " пожалуйста"),
    "uk": ("", "", "", "?", "?", " будь ласка"),
    "tr": ("", "", "", "?", "?", " lütfen"),
    "zh": ("", "", "", "？", "?"),
    "ja": ("", "", "", "？", "?"),
    "ko": ("", "", "", "?"),
}
_CASED = frozenset({"de", "fr", "es", "it", "pt", "nl", "pl", "ru", "uk",
                    "tr"})
_QUESTION_MARKS = ("?", "？")

# ---------------------------------------------------------------------------
# Filling templates.
# ---------------------------------------------------------------------------

_SLOT = re.compile(r"\{(?:([gp]):([^{}]*)|(\w+)(?:\.(\w+))?)\}")
_TIME_SLOT = re.compile(r"\{(\w+)(?:\.(\w+))?\}")
_PARTICLES = {"ja": "に", "ko": "에"}
_NOUN_PARTICLES = {"no": "の", "ui": "의"}


def _plural_index(lang: str, k: int) -> int:
    """Index of the unit form for ``k``: 0 one, 1 few, 2 many."""
    if lang in _SLAVIC_PLURALS:
        if k % 10 == 1 and k % 100 != 11:
            return 0 if lang != "pl" or k == 1 else 2
        if 2 <= k % 10 <= 4 and not 12 <= k % 100 <= 14:
            return 1
        return 2
    return 0 if k == 1 else 1


def _count(lang: str, unit: str, rng: random.Random) -> str:
    """A number of days, weeks or months, inflected: "vor drei Tagen"."""
    k = rng.randint(2, 12)
    words = _NUMBER_WORDS.get(lang, {})
    number = str(k)
    if k in words and rng.random() < 0.35:
        number = _NUMBER_WORD_OVERRIDES.get((lang, unit), {}).get(k, words[k])
    form = _UNITS[lang][unit][_plural_index(lang, k)]
    return number + ("" if lang in _GLUED_UNITS else " ") + form


def _italian_day(prep: str, day: int) -> str:
    """'il 3', "l'8", 'il 1°'; fused with a preposition: "dall'11"."""
    if day in (8, 11):
        return {"il": "l'", "dal": "dall'", "al": "all'", "del": "dell'"}[prep] \
            + str(day)
    return f"{prep} {day}°" if day == 1 else f"{prep} {day}"


# Turkish locative ending of a year, by its last digit as spoken (2023-2027
# end in üç, dört, beş, altı, yedi).
_TR_YEAR_LOC = ("'da", "'de", "'de", "'te", "'te", "'te", "'da", "'de",
                "'de", "'da")


def _time_phrase(lang: str, rng: random.Random) -> str:
    """One time phrase of ``lang``, of a family drawn by weight."""
    family = rng.choices(_FAMILY_NAMES, weights=_FAMILY_WEIGHTS)[0]
    return _fill_time(lang, rng.choice(_PHRASES[lang][family]), rng)


def _fill_time(lang: str, pattern: str, rng: random.Random) -> str:
    """Fill a time pattern of ``lang`` with a drawn date, number, weekday."""
    y = rng.randint(2023, 2027)
    a = rng.randint(1, 12)
    b = rng.randint(a + 1, min(a + 5, 12)) if a < 12 else rng.randint(1, 3)
    d = rng.randint(1, _MONTH_DAYS[a - 1] - 1)
    d2 = rng.randint(d + 1, _MONTH_DAYS[a - 1])
    db = rng.randint(1, _MONTH_DAYS[b - 1])
    q, h, w, wd = rng.randint(1, 4), rng.randint(1, 2), rng.randint(1, 52), \
        rng.randrange(7)
    values = {
        "y": str(y), "yy": f"{y % 100:02d}", "m": str(a), "mm": f"{a:02d}",
        "m2": str(b), "mm2": f"{b:02d}", "d": str(d), "dd": f"{d:02d}",
        "d2": str(d2), "db": str(db), "q": str(q), "h": str(h), "w": str(w),
        "ww": f"{w:02d}", "nd": str(rng.randint(5, 20)),
        "qw": _QUARTER_WORDS.get(lang, ("",) * 4)[q - 1],
        "hw": _HALF_WORDS.get(lang, ("", ""))[h - 1],
    }
    if lang == "fr":
        values |= {"do": "1er" if d == 1 else str(d),
                   "dbo": "1er" if db == 1 else str(db),
                   "qo": "1er" if q == 1 else f"{q}e"}
    elif lang == "it":
        values |= {"il_d": _italian_day("il", d), "dal_d": _italian_day("dal", d),
                   "al_d": _italian_day("al", d), "del_d": _italian_day("del", d),
                   "il_d2": _italian_day("il", d2),
                   "al_d2": _italian_day("al", d2),
                   "al_db": _italian_day("al", db)}
    elif lang == "tr":
        values["y_loc"] = f"{y}{_TR_YEAR_LOC[y % 10]}"

    def slot(match: re.Match[str]) -> str:
        name, form = match.group(1), match.group(2)
        if name in ("month", "month2"):
            month = a if name == "month" else b
            return _MONTHS[lang][form or "base"][month - 1]
        if name == "wd":
            return _WEEKDAYS[lang][form or "base"][wd]
        if name == "n":
            return _count(lang, form or "day", rng)
        return values[name]

    return _TIME_SLOT.sub(slot, pattern)


def _phrase_form(lang: str, phrase: str, form: str | None) -> str:
    """A Japanese or Korean phrase with its particle kept, dropped or traded."""
    if form is None:
        return phrase
    particle = _PARTICLES.get(lang, "")
    bare = phrase[:-len(particle)] if particle and phrase.endswith(particle) \
        else phrase
    return bare + _NOUN_PARTICLES.get(form, "")


def _render(lang: str, template: str, rng: random.Random,
            time_phrase: Callable[[], str]) -> str:
    """Fill one template of ``lang``; ``time_phrase`` gives {T} and {U}."""
    subject = rng.choice(_SUBJECTS[lang])
    person = rng.choice(_PEOPLE[lang])
    s_gender = 0 if subject.get("g", "m") == "m" else 1
    p_gender = 0 if person.get("g", "m") == "m" else 1

    def slot(match: re.Match[str]) -> str:
        agree, options, name, form = match.groups()
        if agree:
            return options.split("|")[s_gender if agree == "g" else p_gender]
        if name in ("T", "U"):
            return _phrase_form(lang, time_phrase(), form)
        if name == "s":
            return subject[form or "pl"]
        if name == "person":
            return person[form or "nom"]
        if name == "n":
            return str(rng.randint(1, 4999))
        if name == "n1":
            return str(rng.randint(1, 9))
        if name in _SHARED:
            return rng.choice(_SHARED[name])
        value = rng.choice(_WORDS[lang][name])
        if "|" in value:
            value = value.split("|")[p_gender if name.startswith("p_")
                                     else s_gender]
        return value

    return _SLOT.sub(slot, template)


def _capitalize(lang: str, text: str) -> str:
    first = "İ" if lang == "tr" and text[0] == "i" else text[0].upper()
    return first + text[1:]


def _frame(lang: str, body: str, rng: random.Random) -> str:
    """Add an opening and an ending, and sometimes a capital."""
    text = rng.choice(_PREFIXES[lang]) + body
    ending = rng.choice(_ENDINGS[lang])
    if not body.endswith(_QUESTION_MARKS):
        text += ending
    if lang in _CASED and rng.random() < 0.4:
        text = _capitalize(lang, text)
    return text


def _templates(lang: str, rng: random.Random) -> tuple[str, ...]:
    r = rng.random()
    if r < NO_TIME_SHARE:
        return _NO_TIME[lang]
    if r < NO_TIME_SHARE + (1 - NO_TIME_SHARE) * TWO_PHRASE_SHARE:
        return _TWO_TIME[lang]
    return _ONE_TIME[lang]


def _question(lang: str, rng: random.Random) -> str:
    """One question in ``lang`` (not English)."""
    template = rng.choice(_templates(lang, rng))
    body = _render(lang, template, rng, lambda: _time_phrase(lang, rng))
    return _frame(lang, body, rng)


_FOREIGN = tuple(lang for lang in LANGUAGES if lang != "en")
_FOREIGN_WEIGHTS = tuple(LANGUAGE_WEIGHTS[lang] for lang in _FOREIGN)
_CHOICE_LABELS = (*LANGUAGES, "mixed")
_CHOICE_WEIGHTS = (*(LANGUAGE_WEIGHTS[lang] for lang in LANGUAGES),
                   MIXED_WEIGHT)


class _English(NamedTuple):
    """The pieces of the English log (nlnorm.benchlog) reused here."""

    question: Callable[[random.Random], str]
    fill: Callable[[str, random.Random], str]
    time_phrase: Callable[[random.Random], str]


def _english() -> _English:
    # Imported on use: nlnorm.benchlog re-exports this module's functions.
    from nlnorm import benchlog

    return _English(benchlog._question, benchlog._fill, benchlog._time_phrase)


def _mixed(rng: random.Random, english: _English) -> tuple[str, str]:
    """A question mixing English with one other language."""
    other = rng.choices(_FOREIGN, weights=_FOREIGN_WEIGHTS)[0]
    with_time = rng.random() >= NO_TIME_SHARE
    if rng.random() < 0.5:  # English carrying a phrase of ``other``
        if with_time:
            carrier = rng.choice(_MIXED_EN_TIME)
            if other in _EMBEDDED_TIME and rng.random() < 0.3:
                phrase = rng.choice(_EMBEDDED_TIME[other])
            else:
                phrase = _time_phrase(other, rng)
            text = carrier.replace("{T}", phrase)
        else:
            carrier = rng.choice(_MIXED_EN_PLAIN)
            text = carrier.replace("{F}", rng.choice(_FOREIGN_BITS[other]))
        return f"en+{other}", english.fill(text, rng)
    if with_time:  # ``other`` carrying an English time phrase
        template = rng.choice(_ONE_TIME[other])
        body = _render(other, template, rng, lambda: english.time_phrase(rng))
    else:
        template = rng.choice(_NO_TIME[other])
        body = _render(other, template, rng, lambda: "")
        tail = rng.choice(_ENGLISH_TAILS)
        if body.endswith(_QUESTION_MARKS):  # "¿...? pls" -> "¿... pls?"
            tail += "" if tail.endswith("?") else body[-1]
            body = body[:-1]
        body += tail
    return f"{other}+en", body


def generate_mixed_labelled(n: int = 10_000,
                            seed: int = 0) -> list[tuple[str, str]]:
    """Like :func:`generate_mixed`, each question with its language.

    The label is a code of :data:`LANGUAGES`, or ``"en+de"`` for an English
    question carrying a German phrase and ``"de+en"`` for the reverse.

    >>> generate_mixed_labelled(3, seed=4) == generate_mixed_labelled(3, seed=4)
    True
    >>> all(lang.split("+")[0] in LANGUAGES
    ...     for lang, _ in generate_mixed_labelled(200))
    True
    """
    if n < 0:
        raise ValueError("n must be non-negative")
    rng = random.Random(seed)
    english = _english()
    lines: list[tuple[str, str]] = []
    for _ in range(n):
        lang = rng.choices(_CHOICE_LABELS, weights=_CHOICE_WEIGHTS)[0]
        if lang == "en":
            lines.append(("en", english.question(rng)))
        elif lang == "mixed":
            lines.append(_mixed(rng, english))
        else:
            lines.append((lang, _question(lang, rng)))
    return lines


def generate_mixed(n: int = 10_000, seed: int = 0) -> list[str]:
    """Return ``n`` invented work-tracker questions in fourteen languages.

    Deterministic in ``seed``: only ``random.Random(seed)`` is used, so the
    same arguments give the same list wherever ``random.Random`` is stable.
    The English share is drawn from :func:`nlnorm.benchlog.generate`'s
    templates.

    >>> log = generate_mixed(100, seed=3)
    >>> len(log), log == generate_mixed(100, seed=3)
    (100, True)
    """
    return [text for _, text in generate_mixed_labelled(n, seed)]


if __name__ == "__main__":  # pragma: no cover
    for label, line in generate_mixed_labelled(40):
        print(f"{label:6} {line}")
