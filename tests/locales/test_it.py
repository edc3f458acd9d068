"""Italian: the reading contract R1-R23 (and D) on Italian work-tracker questions, the policies,
numeric dates in the CLDR order of Italian locales, questions mixing Italian and English, and
look-alike words that must give no mention.

Checked against:
- python-dateutil ``relativedelta``, stdlib ``calendar`` and ``date.fromisocalendar`` (the
  oracles of tests/locales/romance_oracles.py): every expected start and end;
- CLDR 49 via babel 2.19: Italian day-period rules (``Locale("it").day_period_rules``: mattina
  06:00-12:00, pomeriggio 12:00-18:00, sera 18:00-24:00, notte 00:00-06:00), week data of it_IT
  (first day, weekend) and the short date format order (it_IT dd/MM/yy, it_CH dd.MM.yy, en_US
  month first);
- the worked example sentences are written from knowledge of the language (no published
  source);
- common practice (no published source): "lunedì scorso" is the most recent Monday before
  today and "giovedì prossimo" the first Thursday after it; "entro venerdì" and "fino a
  venerdì" look ahead to the coming Friday; "entro 3 giorni" is the next three days from now;
  "stanotte" and "ieri notte" said in the morning are the night that has just ended (CLDR's
  notte of today); "da inizio anno" is the year to date; "a marzo" is in March; "ora" alone is
  now, but "l'ora di punta" is no time phrase.
"""

from __future__ import annotations

from datetime import date

import pytest

from tests.helpers import NOW, TODAY, one, run
from tests.locales.romance_oracles import (
    D, FR, JANUARY_END, MARCH_FIRST, MO, MONTH_END, PARAMS, QUARTER_PAST, SA, SATURDAY,
    SPRING_BERLIN, SU, SUNDAY, TH, TU, WE, after, alt, before, cal_ahead, cal_back, cases_for,
    check, day, day_period, elapsed, first_open_weekend, first_weekday, floor_hour, half, hour_of,
    in_week, iso, iso_week, iso_week_name, joined, last_ended_weekend, midnight, month, month_of,
    moved, most_recent_year, next_year_after, on_or_after, on_or_before, quarter, quarter_of,
    read_numeric, since, strictly_after, strictly_before, until, wall, week, week_start,
    weekend, weekend_value, year,
)

case = cases_for("it")
CAL, ROLL = "window_reading=calendar", "window_reading=rolling"
MARCH = month(most_recent_year(lambda y: date(y, 3, 1)), 3)
MARCH_NEXT = month(next_year_after(lambda y: date(y, 4, 1)), 3)
MONDAY, MONDAY_NEXT = day(on_or_before(TODAY, MO)), day(on_or_after(TODAY, MO))
THIS_WEEK, THIS_MONTH = week_start(TODAY), TODAY.replace(day=1)
FRIDAY, FRIDAY_PAST = day(on_or_after(TODAY, FR)), day(on_or_before(TODAY, FR))
MARCH_1_15 = joined(day(date(2026, 3, 1)), day(date(2026, 3, 15)))
MARCH_1_15_NEXT = joined(day(date(2027, 3, 1)), day(date(2027, 3, 15)))

R1 = [
    case("R1-it-ieri", "Quali bug sono stati chiusi ieri?", "ieri", "R1", day(TODAY + D(days=-1)),
         (TODAY + D(days=-1)).isoformat()),
    case("R1-it-oggi", "Cosa è stato rilasciato oggi?", "oggi", "R1", day(TODAY), TODAY.isoformat()),
    case("R1-it-domani", "Quali task scadono domani?", "domani", "R1", day(TODAY + D(days=1))),
    case("R1-it-l-altro-ieri", "Chi ha riaperto ticket l'altro ieri?", "l'altro ieri", "R1",
         day(TODAY + D(days=-2))),
    case("R1-it-l-altro-ieri-typographic-apostrophe", "Chi ha riaperto ticket l’altro ieri?",
         "l’altro ieri", "R1", day(TODAY + D(days=-2))),
    case("R1-it-dopodomani", "Cosa è previsto dopodomani?", "dopodomani", "R1", day(TODAY + D(days=2))),
    case("R1-it-ieri-across-a-month-start", "Chi ha commentato ieri?", "ieri", "R1",
         day(MARCH_FIRST.date() + D(days=-1)), "2026-02-28", now=MARCH_FIRST),
]

R2 = [
    case("R2-it-la-settimana-scorsa", "Quali ticket sono stati creati la settimana scorsa?",
         "la settimana scorsa", "R2", week(TODAY + D(weeks=-1)), iso_week_name(TODAY + D(weeks=-1))),
    case("R2-it-questa-settimana", "Cosa abbiamo rilasciato questa settimana?", "questa settimana", "R2",
         week(TODAY), iso_week_name(TODAY)),
    case("R2-it-la-prossima-settimana", "Cosa è pianificato la prossima settimana?",
         "la prossima settimana", "R2", week(TODAY + D(weeks=1))),
    case("R2-it-la-settimana-prossima", "Cosa è pianificato la settimana prossima?",
         "la settimana prossima", "R2", week(TODAY + D(weeks=1))),
    case("R2-it-il-mese-scorso", "Quanti bug sono stati corretti il mese scorso?", "il mese scorso",
         "R2", month_of(TODAY + D(months=-1)), "2026-11"),
    case("R2-it-il-mese-scorso-at-a-month-end", "Bug corretti il mese scorso", "il mese scorso", "R2",
         month_of(MONTH_END.date() + D(months=-1)), "2026-02", now=MONTH_END),
    case("R2-it-questo-mese", "Ticket chiusi questo mese", "questo mese", "R2", month_of(TODAY), "2026-12"),
    case("R2-it-il-mese-in-corso", "Ticket chiusi nel mese in corso", "nel mese in corso", "R2",
         month_of(TODAY)),
    case("R2-it-il-trimestre-scorso", "Qual era la velocity il trimestre scorso?",
         "il trimestre scorso", "R2", quarter_of(TODAY + D(months=-3)), "2026-Q3"),
    case("R2-it-quest-anno", "Release pubblicate quest'anno", "quest'anno", "R2", year(TODAY.year), "2026"),
    case("R2-it-l-anno-prossimo", "Quali epic sono previste l'anno prossimo?", "l'anno prossimo", "R2",
         year(TODAY.year + 1), "2027"),
    case("R2-it-lo-scorso-anno", "Incidenti dello scorso anno", "scorso anno", "R2",
         year(TODAY.year - 1), "2025"),
    case("R2-it_IT-questa-settimana-starts-on-CLDR-Monday", "Ticket creati questa settimana",
         "questa settimana", "R2", week(TODAY, first_weekday("it_IT")), locale="it_IT"),
    case("R2-it-questa-settimana-with-a-Sunday-week-start", "Ticket creati questa settimana",
         "questa settimana", "R2", week(TODAY, SU), week_start="sunday"),
    case("R2-it-la-settimana-scorsa-on-a-Sunday", "Ticket chiusi la settimana scorsa",
         "la settimana scorsa", "R2", week(SUNDAY.date() + D(weeks=-1)), now=SUNDAY),
]

R3 = [
    case("R3-it-3-giorni-fa", "Quali bug sono stati aperti 3 giorni fa?", "3 giorni fa", "R3",
         day(TODAY + D(days=-3))),
    case("R3-it-tre-settimane-fa", "Ticket aperti tre settimane fa", "tre settimane fa", "R3",
         week(TODAY + D(weeks=-3)), iso_week_name(TODAY + D(weeks=-3))),
    case("R3-it-un-mese-fa-at-a-month-end", "Cosa è stato unito un mese fa?", "un mese fa", "R3",
         month_of((MONTH_END + D(months=-1)).date()), "2026-02", now=MONTH_END),
    case("R3-it-due-anni-fa", "Bug aperti due anni fa", "due anni fa", "R3", year(TODAY.year - 2), "2024"),
    case("R3-it-un-ora-fa-elided", "Allarmi di un'ora fa", "un'ora fa", "R3", hour_of(moved(NOW, hours=-1)),
         f"{hour_of(moved(NOW, hours=-1))[0]}/PT1H"),
    case("R3-it-2-ore-fa", "Allarmi scattati 2 ore fa", "2 ore fa", "R3", hour_of(moved(NOW, hours=-2))),
    case("R3-it-5-minuti-fa", "Build avviate 5 minuti fa", "5 minuti fa", "R3",
         (elapsed(NOW, minutes=-5), elapsed(NOW, minutes=-4))),
]

R4 = [
    case("R4-it-tra-3-giorni", "Cosa scade tra 3 giorni?", "tra 3 giorni", "R4", day(TODAY + D(days=3))),
    case("R4-it-fra-due-settimane", "Cosa si consegna fra due settimane?", "fra due settimane", "R4",
         week(TODAY + D(weeks=2)), iso_week_name(TODAY + D(weeks=2))),
    case("R4-it-tra-un-mese-from-January-31", "Quali contratti si rinnovano tra un mese?",
         "tra un mese", "R4", month_of((JANUARY_END + D(months=1)).date()), "2026-02", now=JANUARY_END),
    case("R4-it-tra-un-ora-elided", "Quali job partono tra un'ora?", "tra un'ora", "R4",
         hour_of(moved(NOW, hours=1))),
    case("R4-it-tra-un-anno", "Contratti che scadono tra un anno", "tra un anno", "R4", year(TODAY.year + 1)),
]

R5 = [
    case("R5-it-negli-ultimi-7-giorni", "Quanti bug sono stati aperti negli ultimi 7 giorni?",
         "negli ultimi 7 giorni", "R5", (wall(NOW, days=-7), iso(NOW)),
         alts=(alt("R5", CAL, cal_back(NOW, TODAY, 7, "days")),)),
    case("R5-it-negli-ultimi-3-mesi", "Ticket chiusi negli ultimi 3 mesi", "negli ultimi 3 mesi", "R5",
         (wall(NOW, months=-3), iso(NOW)), alts=(alt("R5", CAL, cal_back(NOW, THIS_MONTH, 3, "months")),)),
    case("R5-it-nelle-ultime-2-settimane", "Bug segnalati nelle ultime 2 settimane",
         "nelle ultime 2 settimane", "R5", (wall(NOW, weeks=-2), iso(NOW)),
         alts=(alt("R5", CAL, cal_back(NOW, THIS_WEEK, 2, "weeks")),)),
    case("R5-it-gli-ultimi-trenta-giorni", "Commenti degli ultimi trenta giorni",
         "ultimi trenta giorni", "R5", (wall(NOW, days=-30), iso(NOW)),
         alts=(alt("R5", CAL, cal_back(NOW, TODAY, 30, "days")),)),
    case("R5-it-gli-ultimi-7-giorni-no-connective", "Deploy: gli ultimi 7 giorni", "gli ultimi 7 giorni",
         "R5", (wall(NOW, days=-7), iso(NOW)), alts=(alt("R5", CAL, cal_back(NOW, TODAY, 7, "days")),)),
    case("R5-it-nell-ultima-settimana-no-N-is-one-unit", "Bug aperti nell'ultima settimana",
         "nell'ultima settimana", "R5", (wall(NOW, weeks=-1), iso(NOW)),
         alts=(alt("R5", CAL, cal_back(NOW, THIS_WEEK, 1, "weeks")),)),
    case("R5-it-l-ultimo-mese-at-a-month-end", "Merge dell'ultimo mese", "ultimo mese", "R5",
         (wall(MONTH_END, months=-1), iso(MONTH_END)),
         alts=(alt("R5", CAL, cal_back(MONTH_END, date(2026, 3, 1), 1, "months")),), now=MONTH_END),
    case("R5-it-le-ultime-24-ore-are-real-hours-Berlin-spring", "Errori delle ultime 24 ore",
         "ultime 24 ore", "R5", (elapsed(SPRING_BERLIN, hours=-24), iso(SPRING_BERLIN)),
         now=SPRING_BERLIN),
    case("R5-it-le-ultime-2-ore-off-the-hour", "Deploy nelle ultime 2 ore", "nelle ultime 2 ore", "R5",
         (elapsed(QUARTER_PAST, hours=-2), iso(QUARTER_PAST)),
         alts=(alt("R5", CAL, (elapsed(floor_hour(QUARTER_PAST), hours=-2), iso(floor_hour(QUARTER_PAST)))),),
         now=QUARTER_PAST),
    case("R5-it-calendar-policy-reads-whole-days", "Bug degli ultimi 7 giorni", "ultimi 7 giorni",
         "R5", cal_back(NOW, TODAY, 7, "days"), alts=(alt("R5", ROLL, (wall(NOW, days=-7), iso(NOW))),),
         window_reading="calendar"),
]

R6 = [
    case("R6-it-nei-prossimi-3-giorni", "Cosa scade nei prossimi 3 giorni?", "nei prossimi 3 giorni", "R6",
         (iso(NOW), wall(NOW, days=3)), alts=(alt("R6", CAL, cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-it-le-prossime-2-settimane", "Cosa esce le prossime 2 settimane?", "le prossime 2 settimane",
         "R6", (iso(NOW), wall(NOW, weeks=2)), alts=(alt("R6", CAL, cal_ahead(NOW, THIS_WEEK, 2, "weeks")),)),
    case("R6-it-entro-3-giorni", "Correggere entro 3 giorni", "entro 3 giorni", "R6",
         (iso(NOW), wall(NOW, days=3)), alts=(alt("R6", CAL, cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-it-entro-le-prossime-48-ore", "Ticket da gestire entro le prossime 48 ore",
         "entro le prossime 48 ore", "R6", (iso(NOW), elapsed(NOW, hours=48)),
         alts=(alt("R6", CAL, (elapsed(floor_hour(NOW), hours=1), elapsed(floor_hour(NOW), hours=49))),)),
    case("R6-it-calendar-policy-reads-whole-days", "Cosa scade nei prossimi 3 giorni?",
         "nei prossimi 3 giorni", "R6", cal_ahead(NOW, TODAY, 3, "days"),
         alts=(alt("R6", ROLL, (iso(NOW), wall(NOW, days=3))),), window_reading="calendar"),
]

R7 = [
    case("R7-it-da-marzo", "Bug chiusi da marzo", "da marzo", "R7", since(MARCH), "2026-03-01/..",
         alts=(alt("R7", "bias=future", since(MARCH_NEXT)),)),
    case("R7-it-dalla-settimana-scorsa", "Cosa abbiamo rilasciato dalla settimana scorsa?",
         "dalla settimana scorsa", "R7", since(week(TODAY + D(weeks=-1))), "2026-11-23/.."),
    case("R7-it-dal-2024", "Ticket aperti dal 2024", "dal 2024", "R7", since(year(2024))),
    case("R7-it-da-ieri", "Commenti da ieri", "da ieri", "R7", since(day(TODAY + D(days=-1)))),
    case("R7-it-a-partire-da-lunedi", "Commit a partire da lunedì", "a partire da lunedì", "R7",
         since(MONDAY), alts=(alt("R7", "bias=future", since(MONDAY_NEXT)),)),
    case("R7-it-dall-anno-scorso-elided", "Incidenti dall'anno scorso", "dall'anno scorso", "R7",
         since(year(TODAY.year - 1))),
    case("R7-it-dal-14-marzo-2025", "Deploy dal 14 marzo 2025", "dal 14 marzo 2025", "R7",
         since(day(date(2025, 3, 14))), "2025-03-14/.."),
    case("R7-it-da-marzo-in-poi", "Bug da marzo in poi", "da marzo in poi", "R7", since(MARCH),
         alts=(alt("R7", "bias=future", since(MARCH_NEXT)),)),
]

R8 = [
    case("R8-it-dopo-marzo", "Bug aperti dopo marzo", "dopo marzo", "R8", after(MARCH), "2026-04-01/..",
         alts=(alt("R8", "bias=future", after(MARCH_NEXT)),)),
    case("R8-it-dopo-il-2025", "Ticket in scadenza dopo il 2025", "dopo il 2025", "R8", after(year(2025))),
    case("R8-it-dopo-la-settimana-scorsa", "Riaperti dopo la settimana scorsa", "dopo la settimana scorsa",
         "R8", after(week(TODAY + D(weeks=-1)))),
    case("R8-it-dopo-il-14-marzo-2025", "Commenti dopo il 14 marzo 2025", "dopo il 14 marzo 2025", "R8",
         after(day(date(2025, 3, 14)))),
]

R9 = [
    case("R9-it-prima-del-2025", "Ticket chiusi prima del 2025", "prima del 2025", "R9", before(year(2025)),
         "../2024-12-31"),
    case("R9-it-prima-di-marzo", "Bug aperti prima di marzo", "prima di marzo", "R9", before(MARCH),
         alts=(alt("R9", "bias=future", before(MARCH_NEXT)),)),
    case("R9-it-prima-del-14-marzo-2025", "Ticket creati prima del 14 marzo 2025",
         "prima del 14 marzo 2025", "R9", before(day(date(2025, 3, 14)))),
    case("R9-it-prima-della-prossima-settimana", "Consegnare prima della prossima settimana",
         "prima della prossima settimana", "R9", before(week(TODAY + D(weeks=1)))),
]

R10 = [
    case("R10-it-entro-venerdi-deadline-looks-ahead", "Cosa va corretto entro venerdì?", "entro venerdì",
         "R10", until(FRIDAY), alts=(alt("R10", None, until(FRIDAY_PAST)),)),
    case("R10-it-fino-a-venerdi-deadline-looks-ahead", "Blocco dei merge fino a venerdì", "fino a venerdì",
         "R10", until(FRIDAY), alts=(alt("R10", None, until(FRIDAY_PAST)),)),
    case("R10-it-fino-al-15-marzo-2026", "Freeze fino al 15 marzo 2026", "fino al 15 marzo 2026", "R10",
         until(day(date(2026, 3, 15))), "../2026-03-15"),
    case("R10-it-entro-il-2025", "Ticket aperti entro il 2025", "entro il 2025", "R10", until(year(2025))),
    case("R10-it-fino-alla-settimana-scorsa", "Bug fino alla settimana scorsa", "fino alla settimana scorsa",
         "R10", until(week(TODAY + D(weeks=-1)))),
]

R11 = [
    case("R11-it-tra-marzo-e-maggio", "Bug aperti tra marzo e maggio", "tra marzo e maggio", "R11",
         joined(MARCH, month(2026, 5)), "2026-03-01/2026-05-31",
         alts=(alt("R11", "bias=future", joined(MARCH_NEXT, month(2027, 5))),)),
    case("R11-it-da-novembre-a-febbraio-rolls-into-the-next-year", "Reperibilità da novembre a febbraio",
         "da novembre a febbraio", "R11", joined(month(2026, 11), month(2027, 2)), "2026-11-01/2027-02-28",
         alts=(alt("R11", "bias=future", joined(month(2027, 11), month(2028, 2))),)),
    case("R11-it-dal-1-al-15-marzo", "Incidenti dal 1 al 15 marzo", "dal 1 al 15 marzo", "R11", MARCH_1_15,
         "2026-03-01/2026-03-15", alts=(alt("R11", "bias=future", MARCH_1_15_NEXT),)),
    case("R11-it-dal-1-grado-al-15-marzo", "Incidenti dal 1° al 15 marzo", "dal 1° al 15 marzo", "R11",
         MARCH_1_15, alts=(alt("R11", "bias=future", MARCH_1_15_NEXT),)),
    case("R11-it-tra-il-1-e-il-15-marzo", "Incidenti tra il 1 e il 15 marzo", "tra il 1 e il 15 marzo",
         "R11", MARCH_1_15, alts=(alt("R11", "bias=future", MARCH_1_15_NEXT),)),
    case("R11-it-fra-marzo-e-maggio", "Sprint fra marzo e maggio", "fra marzo e maggio", "R11",
         joined(MARCH, month(2026, 5)), alts=(alt("R11", "bias=future", joined(MARCH_NEXT, month(2027, 5))),)),
    case("R11-it-dal-1-marzo-al-15-aprile-2025", "Sprint dal 1 marzo al 15 aprile 2025",
         "dal 1 marzo al 15 aprile 2025", "R11", joined(day(date(2025, 3, 1)), day(date(2025, 4, 15)))),
    case("R11-it-da-lunedi-a-mercoledi", "Bug aperti da lunedì a mercoledì", "da lunedì a mercoledì", "R11",
         joined(MONDAY, day(on_or_after(on_or_before(TODAY, MO), WE))),
         alts=(alt("R11", "bias=future", joined(MONDAY_NEXT, day(on_or_after(on_or_after(TODAY, MO), WE)))),)),
]

_MARCH_14 = day(date(most_recent_year(lambda y: date(y, 3, 14)), 3, 14))
_MARCH_14_NEXT = day(date(next_year_after(lambda y: date(y, 3, 15)), 3, 14))
R12 = [
    case("R12-it-a-marzo", "Bug aperti a marzo", "a marzo", "R12", MARCH, "2026-03",
         alts=(alt("R12", "bias=future", MARCH_NEXT),)),
    case("R12-it-marzo-bare-is-the-month", "Bug di marzo", "marzo", "R12", MARCH,
         alts=(alt("R12", "bias=future", MARCH_NEXT),)),
    case("R12-it-il-14-marzo", "Cosa si è rotto il 14 marzo?", "il 14 marzo", "R12", _MARCH_14,
         alts=(alt("R12", "bias=future", _MARCH_14_NEXT),)),
    case("R12-it-nel-mese-di-giugno", "Ticket chiusi nel mese di giugno", "nel mese di giugno", "R12",
         month(2026, 6), alts=(alt("R12", "bias=future", month(2027, 6)),)),
    case("R12-it-a-dicembre-the-current-month-counts", "Ticket chiusi a dicembre", "a dicembre", "R12",
         month(2026, 12), "2026-12"),
    case("R12-it-ad-aprile", "Rilascio ad aprile", "ad aprile", "R12", month(2026, 4),
         alts=(alt("R12", "bias=future", month(2027, 4)),)),
    case("R12-it-nel-Q3", "Qual era la velocity nel Q3?", "nel Q3", "R12", quarter(2026, 3), "2026-Q3",
         alts=(alt("R12", "bias=future", quarter(2027, 3)),)),
    case("R12-it-il-terzo-trimestre", "Bug del terzo trimestre", "terzo trimestre", "R12",
         quarter(2026, 3), alts=(alt("R12", "bias=future", quarter(2027, 3)),)),
    case("R12-it-la-seconda-meta-dell-anno", "Piano per la seconda metà dell'anno",
         "la seconda metà dell'anno", "R12", half(2026, 2), "2026-H2"),
    case("R12-it-bias-future-picks-next-march", "Bug aperti a marzo", "a marzo", "R12", MARCH_NEXT,
         alts=(alt("R12", "bias=past", MARCH),), bias="future"),
]

R13 = [
    case("R13-it-lunedi", "Cosa si è rotto lunedì?", "lunedì", "R13", MONDAY,
         alts=(alt("R13", "bias=future", MONDAY_NEXT),)),
    case("R13-it-lunedi-without-accent", "Cosa si è rotto lunedi?", "lunedi", "R13", MONDAY,
         alts=(alt("R13", "bias=future", MONDAY_NEXT),)),
    case("R13-it-martedi", "Bug aperti martedì", "martedì", "R13", day(on_or_before(TODAY, TU)),
         alts=(alt("R13", "bias=future", day(on_or_after(TODAY, TU))),)),
    case("R13-it-mercoledi-is-today", "Bug aperti mercoledì", "mercoledì", "R13", day(TODAY)),
    case("R13-it-sabato", "Deploy di sabato", "sabato", "R13", day(on_or_before(TODAY, SA)),
         alts=(alt("R13", "bias=future", day(on_or_after(TODAY, SA))),)),
    case("R13-it-per-venerdi-due-looks-ahead", "Cosa è previsto per venerdì?", "venerdì", "R13", FRIDAY,
         alts=(alt("R13", None, FRIDAY_PAST),)),
    case("R13-it-lunedi-bias-future", "Cosa è previsto lunedì?", "lunedì", "R13", MONDAY_NEXT,
         alts=(alt("R13", "bias=past", MONDAY),), bias="future"),
]

R14 = [
    case("R14-it-lunedi-scorso", "Cosa si è rotto lunedì scorso?", "lunedì scorso", "R14",
         day(strictly_before(TODAY, MO)), alts=(alt("R16", "weekday_reading=week", day(in_week(TODAY, MO, -1))),)),
    case("R14-it-lo-scorso-lunedi", "Cosa si è rotto lo scorso lunedì?", "lo scorso lunedì", "R14",
         day(strictly_before(TODAY, MO)), alts=(alt("R16", "weekday_reading=week", day(in_week(TODAY, MO, -1))),)),
    case("R14-it-venerdi-scorso", "Ticket chiusi venerdì scorso", "venerdì scorso", "R14",
         day(strictly_before(TODAY, FR))),
    case("R14-it-mercoledi-scorso-on-a-Wednesday", "Deploy di mercoledì scorso", "mercoledì scorso", "R14",
         day(strictly_before(TODAY, WE))),
    case("R14-it-lunedi-scorso-week-policy-is-monday-of-last-week", "Cosa si è rotto lunedì scorso?",
         "lunedì scorso", "R16", day(in_week(TODAY, MO, -1)),
         alts=(alt("R14", "weekday_reading=nearest", day(strictly_before(TODAY, MO))),), weekday_reading="week"),
]

R15 = [
    case("R15-it-giovedi-prossimo-is-tomorrow", "Cosa è pianificato giovedì prossimo?", "giovedì prossimo",
         "R15", day(strictly_after(TODAY, TH)), alts=(alt("R16", "weekday_reading=week", day(in_week(TODAY, TH, 1))),)),
    case("R15-it-il-prossimo-giovedi", "Demo il prossimo giovedì", "il prossimo giovedì", "R15",
         day(strictly_after(TODAY, TH)), alts=(alt("R16", "weekday_reading=week", day(in_week(TODAY, TH, 1))),)),
    case("R15-it-lunedi-prossimo", "Revisione lunedì prossimo", "lunedì prossimo", "R15",
         day(strictly_after(TODAY, MO))),
    case("R15-it-giovedi-prossimo-week-policy", "Cosa è pianificato giovedì prossimo?", "giovedì prossimo",
         "R16", day(in_week(TODAY, TH, 1)),
         alts=(alt("R15", "weekday_reading=nearest", day(strictly_after(TODAY, TH))),), weekday_reading="week"),
]

R16 = [
    case("R16-it-lunedi-della-settimana-scorsa", "Cosa si è rotto lunedì della settimana scorsa?",
         "lunedì della settimana scorsa", "R16", day(in_week(TODAY, MO, -1))),
    case("R16-it-venerdi-della-prossima-settimana", "Demo venerdì della prossima settimana",
         "venerdì della prossima settimana", "R16", day(in_week(TODAY, FR, 1))),
    case("R16-it-martedi-di-questa-settimana", "Bug aperti martedì di questa settimana",
         "martedì di questa settimana", "R16", day(in_week(TODAY, TU, 0)),
         alts=(alt("R15", None, day(on_or_after(TODAY, TU))),)),
    case("R16-it-giovedi-della-settimana-prossima", "Revisione giovedì della settimana prossima",
         "giovedì della settimana prossima", "R16", day(in_week(TODAY, TH, 1))),
    case("R16-it-questo-lunedi-CLDR-this-week", "Cosa si è rotto questo lunedì?", "questo lunedì", "R16",
         day(in_week(TODAY, MO, 0)), alts=(alt("R15", None, day(on_or_after(TODAY, MO))),)),
    case("R16-it-lunedi-della-settimana-scorsa-Sunday-weeks", "Incidenti lunedì della settimana scorsa",
         "lunedì della settimana scorsa", "R16", day(in_week(TODAY, MO, -1, SU)), week_start="sunday"),
]

R17 = [
    case("R17-it-nel-2025", "Quanti bug nel 2025?", "nel 2025", "R17", year(2025), "2025"),
    case("R17-it-l-anno-2025", "Incidenti dell'anno 2025", "anno 2025", "R17", year(2025)),
    case("R17-it-durante-il-2023", "Release durante il 2023", "durante il 2023", "R17", year(2023)),
    case("R17-it-del-2025-beside-numbers", "Elenca 5 ticket con priorità 2 del 2025", "2025", "R17",
         year(2025)),
]

R18 = [
    case("R18-it-14-marzo-2025", "Cosa è stato rilasciato il 14 marzo 2025?", "il 14 marzo 2025", "R18",
         day(date(2025, 3, 14)), "2025-03-14"),
    case("R18-it-lunedi-14-marzo-2022", "Incidente di lunedì 14 marzo 2022", "lunedì 14 marzo 2022", "R18",
         day(date(2022, 3, 14))),
    case("R18-it-il-1-grado-marzo-2026", "Ticket creati il 1° marzo 2026", "il 1° marzo 2026", "R18",
         day(date(2026, 3, 1))),
    case("R18-it-ISO", "Deploy del 2025-03-14", "2025-03-14", "R18", day(date(2025, 3, 14))),
    case("R18-it_IT-numeric-day-first", "Corretto il 14/03/2025", "14/03/2025", "R18",
         day(read_numeric(14, 3, 2025, "it_IT")), locale="it_IT"),
    case("R18-it_IT-numeric-ambiguous-day-first", "Corretto il 03/04/2026", "03/04/2026", "R18",
         day(read_numeric(3, 4, 2026, "it_IT")), alts=(alt("R18", "date_order=MDY", day(date(2026, 3, 4))),),
         locale="it_IT"),
    case("R18-it_CH-numeric-with-dots-day-first", "Corretto il 03.04.2026", "03.04.2026", "R18",
         day(read_numeric(3, 4, 2026, "it_CH")), alts=(alt("R18", "date_order=MDY", day(date(2026, 3, 4))),),
         locale="it_CH"),
    case("R18-it-en_US-locale-reads-month-first", "Corretto il 03/04/2026", "03/04/2026", "R18",
         day(read_numeric(3, 4, 2026, "en_US")), alts=(alt("R18", "date_order=DMY", day(date(2026, 4, 3))),),
         locale="en_US"),
    case("R18-it-date-order-policy-flips", "Corretto il 03/04/2026", "03/04/2026", "R18",
         day(date(2026, 3, 4)), alts=(alt("R18", "date_order=DMY", day(date(2026, 4, 3))),),
         locale="it_IT", date_order="MDY"),
]

R19 = [
    case("R19-it-marzo-2026", "Bug di marzo 2026", "marzo 2026", "R19", month(2026, 3), "2026-03"),
    case("R19-it-marzo-del-2026", "Bug di marzo del 2026", "marzo del 2026", "R19", month(2026, 3)),
    case("R19-it-Q3-2025", "Fatturato Q3 2025", "Q3 2025", "R19", quarter(2025, 3), "2025-Q3"),
    case("R19-it-il-terzo-trimestre-del-2025", "Velocity del terzo trimestre del 2025",
         "terzo trimestre del 2025", "R19", quarter(2025, 3)),
    case("R19-it-il-primo-semestre-2026", "Budget del primo semestre 2026", "primo semestre 2026",
         "R19", half(2026, 1), "2026-H1"),
    case("R19-it-la-prima-meta-del-2026", "Roadmap della prima metà del 2026", "prima metà del 2026",
         "R19", half(2026, 1)),
    case("R19-it-H2-2025", "Incidenti H2 2025", "H2 2025", "R19", half(2025, 2), "2025-H2"),
]

R20 = [
    case("R20-it-settimana-48-past-bias", "Ticket della settimana 48", "settimana 48", "R20",
         iso_week(2026, 48), "2026-W48", alts=(alt("R20", "bias=future", iso_week(2027, 48)),)),
    case("R20-it-la-settimana-48-del-2026", "Ticket della settimana 48 del 2026",
         "settimana 48 del 2026", "R20", iso_week(2026, 48)),
    case("R20-it-sett-48", "Consegne sett. 48", "sett. 48", "R20", iso_week(2026, 48),
         alts=(alt("R20", "bias=future", iso_week(2027, 48)),)),
    case("R20-it-ISO-week", "Ticket della 2026-W48", "2026-W48", "R20", iso_week(2026, 48)),
    case("R20-it-ISO-week-starts-on-Monday-whatever-the-week-start", "Ticket della settimana 48 del 2026",
         "settimana 48 del 2026", "R20", iso_week(2026, 48), week_start="sunday"),
]

_YEAR_START = iso(midnight(date(TODAY.year, 1, 1)))
R21 = [
    case("R21-it-da-inizio-anno", "Fatturato da inizio anno", "da inizio anno", "R21", (_YEAR_START, iso(NOW))),
    case("R21-it-dall-inizio-del-mese", "Bug dall'inizio del mese", "dall'inizio del mese", "R21",
         (iso(midnight(THIS_MONTH)), iso(NOW))),
    case("R21-it-dall-inizio-della-settimana", "Ticket dall'inizio della settimana",
         "dall'inizio della settimana", "R21", (iso(midnight(THIS_WEEK)), iso(NOW))),
    case("R21-it-dall-inizio-dell-anno", "Incidenti dall'inizio dell'anno", "dall'inizio dell'anno", "R21",
         (_YEAR_START, iso(NOW))),
    case("R21-it-quest-anno-finora", "Incidenti quest'anno finora", "quest'anno finora", "R21",
         (_YEAR_START, iso(NOW))),
    case("R21-it-da-inizio-trimestre", "Vendite da inizio trimestre", "da inizio trimestre", "R21",
         (iso(midnight(date(2026, 10, 1))), iso(NOW))),
]

R22 = [
    case("R22-it-stamattina", "Cosa si è rotto stamattina?", "stamattina", "R22",
         day_period("it", TODAY, "morning1")),
    case("R22-it-ieri-sera", "Allarmi di ieri sera", "ieri sera", "R22",
         day_period("it", TODAY + D(days=-1), "evening1")),
    case("R22-it-questo-pomeriggio", "Deploy questo pomeriggio", "questo pomeriggio", "R22",
         day_period("it", TODAY, "afternoon1")),
    case("R22-it-domani-mattina", "Revisione domani mattina", "domani mattina", "R22",
         day_period("it", TODAY + D(days=1), "morning1")),
    case("R22-it-ieri-pomeriggio", "Cosa si è rotto ieri pomeriggio?", "ieri pomeriggio", "R22",
         day_period("it", TODAY + D(days=-1), "afternoon1")),
    case("R22-it-stasera", "Manutenzione stasera", "stasera", "R22", day_period("it", TODAY, "evening1")),
    case("R22-it-stanotte", "Cosa è andato in crash stanotte?", "stanotte", "R22", day_period("it", TODAY, "night1")),
    case("R22-it-ieri-notte-is-the-night-just-ended", "Job falliti ieri notte", "ieri notte", "R22",
         day_period("it", TODAY, "night1")),
    case("R22-it-domattina", "Deploy domattina", "domattina", "R22", day_period("it", TODAY + D(days=1), "morning1")),
]

_IT = "it_IT"
R23 = [
    case("R23-it-questo-weekend-on-a-Wednesday", "Deploy questo weekend", "questo weekend", "R23",
         weekend(first_open_weekend(TODAY, _IT), _IT), weekend_value(first_open_weekend(TODAY, _IT), _IT),
         locale=_IT),
    case("R23-it-il-fine-settimana-scorso", "Incidenti del fine settimana scorso", "fine settimana scorso",
         "R23", weekend(last_ended_weekend(TODAY, _IT), _IT), locale=_IT),
    case("R23-it-il-prossimo-weekend", "Manutenzione il prossimo weekend", "il prossimo weekend", "R23",
         weekend(first_open_weekend(TODAY, _IT) + D(weeks=1), _IT),
         alts=(alt("R23", None, weekend(first_open_weekend(TODAY, _IT), _IT)),), locale=_IT),
    case("R23-it-nel-fine-settimana-past-bias", "Cosa si è rotto nel fine settimana?", "nel fine settimana",
         "R23", weekend(last_ended_weekend(TODAY, _IT), _IT),
         alts=(alt("R23", "bias=future", weekend(first_open_weekend(TODAY, _IT), _IT)),), locale=_IT),
    case("R23-it-questo-weekend-on-a-Saturday", "Deploy questo weekend", "questo weekend", "R23",
         weekend(first_open_weekend(SATURDAY.date(), _IT), _IT), now=SATURDAY, locale=_IT),
    case("R23-it-lo-scorso-weekend-on-a-Sunday", "Incidenti dello scorso weekend", "scorso weekend", "R23",
         weekend(last_ended_weekend(SUNDAY.date(), _IT), _IT), now=SUNDAY, locale=_IT),
    case("R23-it-questo-fine-settimana", "Reperibilità questo fine settimana", "questo fine settimana", "R23",
         weekend(first_open_weekend(TODAY, _IT), _IT), locale=_IT),
    case("R23-it-durante-il-weekend-bias-future", "Cosa gira durante il weekend?", "durante il weekend",
         "R23", weekend(first_open_weekend(TODAY, _IT), _IT),
         alts=(alt("R23", "bias=past", weekend(last_ended_weekend(TODAY, _IT), _IT)),), locale=_IT,
         bias="future"),
]

DURATIONS = [
    case("D-it-da-piu-di-3-giorni", "Ticket aperti da più di 3 giorni", "3 giorni", "D", (None, None), "P3D"),
    case("D-it-per-due-settimane", "Bloccato per due settimane", "due settimane", "D", (None, None), "P2W"),
    case("D-it-in-meno-di-4-ore", "Incidenti risolti in meno di 4 ore", "4 ore", "D", (None, None), "PT4H"),
]

IT_EN = ("it", "en")
MIXED = [
    case("R2-it+en-ticket-creati-last-week", "Quanti ticket creati last week?", "last week", "R2",
         week(TODAY + D(weeks=-1)), languages=IT_EN),
    case("R2-it+en-show-bugs-della-settimana-scorsa", "show bugs della settimana scorsa",
         "settimana scorsa", "R2", week(TODAY + D(weeks=-1)), languages=IT_EN),
    case("R1-it+en-closed-ieri", "which tickets were closed ieri", "ieri", "R1", day(TODAY + D(days=-1)),
         languages=IT_EN),
    case("R7-it+en-list-bugs-da-marzo", "list bugs da marzo", "da marzo", "R7", since(MARCH),
         alts=(alt("R7", "bias=future", since(MARCH_NEXT)),), languages=IT_EN),
    case("R7-it+en-bug-creati-since-Monday", "bug creati since Monday", "since Monday", "R7", since(MONDAY),
         alts=(alt("R7", "bias=future", since(MONDAY_NEXT)),), languages=IT_EN),
    case("R22-it+en-deploys-previsti-domani-mattina", "deploys previsti domani mattina", "domani mattina",
         "R22", day_period("it", TODAY + D(days=1), "morning1"), languages=IT_EN),
    case("R3-it+en-open-tickets-3-giorni-fa", "open tickets 3 giorni fa", "3 giorni fa", "R3",
         day(TODAY + D(days=-3)), languages=IT_EN),
    case("R2-it+en-PR-mergiate-this-week", "PR mergiate this week", "this week", "R2", week(TODAY),
         languages=IT_EN),
    case("R11-it+en-incidents-dal-1-al-15-marzo", "incidents dal 1 al 15 marzo", "dal 1 al 15 marzo", "R11",
         MARCH_1_15, alts=(alt("R11", "bias=future", MARCH_1_15_NEXT),), languages=IT_EN),
    case("R5-it+en-errors-in-the-last-24-hours-per-favore", "errors in the last 24 hours, per favore",
         "in the last 24 hours", "R5", (elapsed(NOW, hours=-24), iso(NOW)), languages=IT_EN),
]

TABLES = {
    "R1": R1, "R2": R2, "R3": R3, "R4": R4, "R5": R5, "R6": R6, "R7": R7, "R8": R8, "R9": R9,
    "R10": R10, "R11": R11, "R12": R12, "R13": R13, "R14": R14, "R15": R15, "R16": R16,
    "R17": R17, "R18": R18, "R19": R19, "R20": R20, "R21": R21, "R22": R22, "R23": R23,
}


@pytest.mark.parametrize(PARAMS, [row for rows in TABLES.values() for row in rows])
def test_italian_phrase_resolves_to_its_reading_and_interval(question, phrase, reading, bounds, value,
                                                             alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, DURATIONS)
def test_italian_length_of_time_after_a_cue_is_an_iso_duration(question, phrase, reading, bounds,
                                                               value, alts, context):
    m = one(question, **context)
    assert (m.text, m.reading, m.kind, m.value) == (phrase, "D", "duration", value)
    assert (m.start, m.end) == bounds


@pytest.mark.parametrize(PARAMS, MIXED)
def test_question_mixing_italian_and_english_finds_the_phrase(question, phrase, reading, bounds,
                                                              value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


def test_every_reading_has_at_least_three_italian_examples():
    assert all(len(rows) >= 3 for rows in TABLES.values()), {k: len(v) for k, v in TABLES.items()}
    assert len(MIXED) >= 8


def test_ora_alone_is_now():
    m = one("Quali ticket sono aperti ora?", languages=("it",))
    assert (m.text, m.reading, m.kind, m.start) == ("ora", "NOW", "instant", iso(NOW))


# Look-alikes: Italian questions whose words look temporal but are not (reading N).
TRAPS = [
    ("N-it-l-ora-di-punta", "Errori nell'ora di punta"),
    ("N-it-ora-di-pranzo", "Riunione all'ora di pranzo"),
    ("N-it-l-ora-legale", "Bug dell'ora legale"),
    ("N-it-secondo-me", "Secondo me il ticket è chiuso"),
    ("N-it-secondo-il-team", "Priorità secondo il team"),
    ("N-it-la-seconda-versione", "Chi ha rivisto la seconda versione?"),
    ("N-it-un-secondo", "Aspetta un secondo"),
    ("N-it-in-secondo-luogo", "In secondo luogo, il design"),
    ("N-it-il-mar-Tirreno", "Sensori del mar Tirreno"),
    ("N-it-set-di-test", "Il set di test fallisce"),
    ("N-it-ago-della-bilancia", "L'ago della bilancia"),
    ("N-it-Domenica-person", "Ticket assegnati a Domenica"),
    ("N-it-sei-sicuro", "Sei sicuro del ticket?"),
    ("N-it-cosa-fa-il-build", "Cosa fa il build?"),
    ("N-it-tra-i-ticket", "Tra i ticket aperti, quali sono urgenti?"),
    ("N-it-buongiorno", "Buongiorno, serve aiuto"),
    ("N-it-ogni-giorno", "Riunione ogni giorno"),
    ("N-it-giorno-per-giorno", "Monitoraggio giorno per giorno"),
    ("N-it-un-giorno", "Un giorno lo faremo"),
    ("N-it-settimana-bianca", "Ferie per la settimana bianca"),
    ("N-it-priorita-2", "Ticket con priorità 2"),
    ("N-it-versione-2025.1", "Bug nella versione 2025.1"),
    ("N-it-ticket-2025", "Chi ha il ticket 2025?"),
    ("N-it-2025-ticket-no-cue", "2025 ticket aperti"),
    ("N-it-sprint-12", "Bug dello sprint 12"),
    ("N-it-top-10", "Top 10 dei contributori"),
    ("N-it-5-punti", "Task da 5 punti"),
    ("N-it-build-2024", "Chi ha rotto la build 2024?"),
    ("N-it-errore-404", "Segnalazioni di errore 404"),
    ("N-it-pagina-3", "Pagina 3 del report"),
    ("N-it-gli-ultimi-2-ticket", "Gli ultimi 2 ticket"),
    ("N-it-l-ultimo-commento", "L'ultimo commento del ticket"),
    ("N-it-il-prossimo-passo", "Il prossimo passo per il team"),
    ("N-it-l-ultima-versione", "Bug dell'ultima versione"),
    ("N-it-allora", "Allora chiudiamo il ticket"),
    ("N-it-ancora-aperto", "Il ticket è ancora aperto"),
    ("N-it-le-ore-di-lavoro", "Le ore di lavoro del team"),
    ("N-it-il-primo-ticket", "Il primo ticket della lista"),
    ("N-it-la-meta-dei-test", "La metà dei test fallisce"),
    ("N-it-numero-48", "Ticket numero 48"),
]


@pytest.mark.parametrize(("question",), [(q,) for _, q in TRAPS], ids=[i for i, _ in TRAPS])
def test_italian_look_alike_gives_no_temporal_mention(question):
    result = run(question, languages=("it",))
    assert result.mentions == ()
    assert result.rewritten == question


@pytest.mark.parametrize(("question", "phrase"), [
    ("Deploy di domenica", "domenica"),
    ("Bug di marzo", "marzo"),
    ("Marzo è stato difficile", "Marzo"),
], ids=["R13-it-di-domenica", "R12-it-di-marzo", "R12-it-Marzo-first-word-is-the-month"])
def test_italian_marzo_is_only_a_month_and_domenica_a_day_with_a_cue(question, phrase):
    assert one(question, languages=("it",)).text == phrase


def test_there_are_at_least_twenty_five_italian_traps():
    assert len(TRAPS) >= 25
