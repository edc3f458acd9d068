"""French: the reading contract R1-R23 (and D) on French work-tracker questions, the policies,
numeric dates in the CLDR order of French locales, questions mixing French and English, and
look-alike words that must give no mention.

Checked against:
- python-dateutil ``relativedelta``, stdlib ``calendar`` and ``date.fromisocalendar`` (the
  oracles of tests/locales/romance_oracles.py): every expected start and end;
- CLDR 49 via babel 2.19: French day-period rules (``Locale("fr").day_period_rules``: matin
  04:00-12:00, après-midi 12:00-18:00, soir 18:00-24:00, nuit 00:00-04:00), week data of
  fr_FR and fr_CA (first day, weekend) and the short date format order (fr_FR day first,
  fr_CA year first, en_US month first);
- the worked example sentences are written from knowledge of the language (no published
  source);
- common practice (no published source): "lundi dernier" is the most recent Monday before
  today and "jeudi prochain" the first Thursday after it; "depuis 3 jours" is the last three
  days up to now; "d'ici vendredi" and "jusqu'à vendredi" look ahead to the coming Friday;
  "la nuit dernière" is the night that ended this morning (CLDR's night1 of today); month
  names are written in lower case, so a capitalised "Mars" mid-sentence is the planet.
"""

from __future__ import annotations

from datetime import date

import pytest

from tests.helpers import NOW, TODAY, one, run
from tests.locales.romance_oracles import (
    D, FR, JANUARY_END, MARCH_FIRST, MO, MONTH_END, PARAMS, QUARTER_PAST, SATURDAY, SPRING_BERLIN,
    SU, SUNDAY, TH, TU, WE, after, alt, before, cal_ahead, cal_back, cases_for, check, day,
    day_period, elapsed, first_open_weekend, first_weekday, floor_hour, half, hour_of, in_week,
    iso, iso_week, iso_week_name, joined, last_ended_weekend, midnight, month, month_of, moved,
    most_recent_year, next_year_after, on_or_after, on_or_before, quarter, quarter_of,
    read_numeric, since, span, strictly_after, strictly_before, until, wall, week, week_start,
    weekend, weekend_value, year,
)

case = cases_for("fr")
CAL, ROLL = "window_reading=calendar", "window_reading=rolling"
MARCH = month(most_recent_year(lambda y: date(y, 3, 1)), 3)
MARCH_NEXT = month(next_year_after(lambda y: date(y, 4, 1)), 3)
MONDAY, MONDAY_NEXT = day(on_or_before(TODAY, MO)), day(on_or_after(TODAY, MO))
THIS_WEEK, THIS_MONTH = week_start(TODAY), TODAY.replace(day=1)

R1 = [
    case("R1-fr-hier", "Quels bugs ont été fermés hier ?", "hier", "R1", day(TODAY + D(days=-1)),
         (TODAY + D(days=-1)).isoformat()),
    case("R1-fr-aujourd-hui", "Qu'est-ce qui a été livré aujourd'hui ?", "aujourd'hui", "R1",
         day(TODAY), TODAY.isoformat()),
    case("R1-fr-aujourd-hui-typographic-apostrophe", "Qu’est-ce qui a été livré aujourd’hui ?",
         "aujourd’hui", "R1", day(TODAY)),
    case("R1-fr-demain", "Quelles tâches arrivent à échéance demain ?", "demain", "R1",
         day(TODAY + D(days=1))),
    case("R1-fr-avant-hier", "Qui a rouvert des tickets avant-hier ?", "avant-hier", "R1",
         day(TODAY + D(days=-2))),
    case("R1-fr-apres-demain-without-hyphen", "Qu'est-ce qui est prévu après demain ?",
         "après demain", "R1", day(TODAY + D(days=2))),
    case("R1-fr-hier-across-a-month-start", "Qui a commenté hier ?", "hier", "R1",
         day(MARCH_FIRST.date() + D(days=-1)), "2026-02-28", now=MARCH_FIRST),
]

R2 = [
    case("R2-fr-la-semaine-derniere", "Quels tickets ont été créés la semaine dernière ?",
         "la semaine dernière", "R2", week(TODAY + D(weeks=-1)), iso_week_name(TODAY + D(weeks=-1))),
    case("R2-fr-la-semaine-passee", "Quels tickets ont été créés la semaine passée ?",
         "la semaine passée", "R2", week(TODAY + D(weeks=-1))),
    case("R2-fr-cette-semaine", "Qu'avons-nous livré cette semaine ?", "cette semaine", "R2",
         week(TODAY), iso_week_name(TODAY)),
    case("R2-fr-la-semaine-prochaine", "Qu'est-ce qui est planifié la semaine prochaine ?",
         "la semaine prochaine", "R2", week(TODAY + D(weeks=1))),
    case("R2-fr-le-mois-dernier", "Combien de bugs ont été corrigés le mois dernier ?",
         "le mois dernier", "R2", month_of(TODAY + D(months=-1)), "2026-11"),
    case("R2-fr-le-mois-dernier-at-a-month-end", "Bugs corrigés le mois dernier", "le mois dernier",
         "R2", month_of(MONTH_END.date() + D(months=-1)), "2026-02", now=MONTH_END),
    case("R2-fr-ce-mois-ci", "Tickets fermés ce mois-ci", "ce mois-ci", "R2", month_of(TODAY), "2026-12"),
    case("R2-fr-le-mois-passe", "Tickets fermés le mois passé", "le mois passé", "R2",
         month_of(TODAY + D(months=-1))),
    case("R2-fr-le-trimestre-dernier", "Quelle était la vélocité le trimestre dernier ?",
         "le trimestre dernier", "R2", quarter_of(TODAY + D(months=-3)), "2026-Q3"),
    case("R2-fr-le-trimestre-en-cours", "Qui a fermé le plus de tickets pendant le trimestre en cours ?",
         "pendant le trimestre en cours", "R2", quarter_of(TODAY), "2026-Q4"),
    case("R2-fr-l-annee-prochaine", "Quelles épopées sont prévues l'année prochaine ?",
         "l'année prochaine", "R2", year(TODAY.year + 1), "2027"),
    case("R2-fr-l-an-dernier", "Combien d'incidents l'an dernier ?", "l'an dernier", "R2",
         year(TODAY.year - 1), "2025"),
    case("R2-fr-l-annee-precedente", "Incidents de l'année précédente", "de l'année précédente", "R2",
         year(TODAY.year - 1)),
    case("R2-fr-cette-annee", "Releases publiées cette année", "cette année", "R2", year(TODAY.year)),
    case("R2-fr_FR-cette-semaine-starts-on-CLDR-Monday", "Tickets créés cette semaine",
         "cette semaine", "R2", week(TODAY, first_weekday("fr_FR")), locale="fr_FR"),
    case("R2-fr_CA-cette-semaine-starts-on-CLDR-Sunday", "Tickets créés cette semaine",
         "cette semaine", "R2", week(TODAY, first_weekday("fr_CA")), locale="fr_CA"),
    case("R2-fr-la-semaine-derniere-on-a-Sunday", "Tickets fermés la semaine dernière",
         "la semaine dernière", "R2", week(SUNDAY.date() + D(weeks=-1)), now=SUNDAY),
]

R3 = [
    case("R3-fr-il-y-a-3-jours", "Quels bugs ont été ouverts il y a 3 jours ?", "il y a 3 jours",
         "R3", day(TODAY + D(days=-3))),
    case("R3-fr-il-y-a-trois-semaines", "Tickets ouverts il y a trois semaines",
         "il y a trois semaines", "R3", week(TODAY + D(weeks=-3)), iso_week_name(TODAY + D(weeks=-3))),
    case("R3-fr-il-y-a-un-mois-at-a-month-end", "Qu'est-ce qui a été fusionné il y a un mois ?",
         "il y a un mois", "R3", month_of((MONTH_END + D(months=-1)).date()), "2026-02", now=MONTH_END),
    case("R3-fr-il-y-a-deux-ans", "Bugs ouverts il y a deux ans", "il y a deux ans", "R3",
         year(TODAY.year - 2), "2024"),
    case("R3-fr-il-y-a-2-annees", "Bugs ouverts il y a 2 années", "il y a 2 années", "R3",
         year(TODAY.year - 2)),
    case("R3-fr-il-y-a-2-heures", "Alertes levées il y a 2 heures", "il y a 2 heures", "R3",
         hour_of(moved(NOW, hours=-2)), f"{hour_of(moved(NOW, hours=-2))[0]}/PT1H"),
    case("R3-fr-il-y-a-5-minutes", "Builds lancés il y a 5 minutes", "il y a 5 minutes", "R3",
         (elapsed(NOW, minutes=-5), elapsed(NOW, minutes=-4))),
    case("R3-fr-il-y-a-un-trimestre", "Vélocité il y a un trimestre", "il y a un trimestre", "R3",
         quarter_of(TODAY + D(months=-3))),
]

R4 = [
    case("R4-fr-dans-3-jours", "Qu'est-ce qui arrive à échéance dans 3 jours ?", "dans 3 jours",
         "R4", day(TODAY + D(days=3))),
    case("R4-fr-dans-deux-semaines", "Qu'est-ce qui est dû dans deux semaines ?",
         "dans deux semaines", "R4", week(TODAY + D(weeks=2)), iso_week_name(TODAY + D(weeks=2))),
    case("R4-fr-dans-un-mois-from-January-31", "Quels contrats se renouvellent dans un mois ?",
         "dans un mois", "R4", month_of((JANUARY_END + D(months=1)).date()), "2026-02", now=JANUARY_END),
    case("R4-fr-dans-2-heures", "Quels jobs tournent dans 2 heures ?", "dans 2 heures", "R4",
         hour_of(moved(NOW, hours=2))),
    case("R4-fr-dans-un-an", "Contrats qui expirent dans un an", "dans un an", "R4",
         year(TODAY.year + 1)),
]

R5 = [
    case("R5-fr-les-7-derniers-jours", "Combien de bugs ont été ouverts les 7 derniers jours ?",
         "les 7 derniers jours", "R5", (wall(NOW, days=-7), iso(NOW)),
         alts=(alt("R5", CAL, cal_back(NOW, TODAY, 7, "days")),)),
    case("R5-fr-au-cours-des-3-derniers-mois", "Tickets fermés au cours des 3 derniers mois",
         "au cours des 3 derniers mois", "R5", (wall(NOW, months=-3), iso(NOW)),
         alts=(alt("R5", CAL, cal_back(NOW, THIS_MONTH, 3, "months")),)),
    case("R5-fr-sur-les-2-dernieres-semaines", "Bugs signalés sur les 2 dernières semaines",
         "sur les 2 dernières semaines", "R5", (wall(NOW, weeks=-2), iso(NOW)),
         alts=(alt("R5", CAL, cal_back(NOW, THIS_WEEK, 2, "weeks")),)),
    case("R5-fr-pendant-les-trente-derniers-jours", "Commentaires pendant les trente derniers jours",
         "pendant les trente derniers jours", "R5", (wall(NOW, days=-30), iso(NOW)),
         alts=(alt("R5", CAL, cal_back(NOW, TODAY, 30, "days")),)),
    case("R5-fr-ces-7-derniers-jours", "Déploiements de ces 7 derniers jours",
         "de ces 7 derniers jours", "R5", (wall(NOW, days=-7), iso(NOW)),
         alts=(alt("R5", CAL, cal_back(NOW, TODAY, 7, "days")),)),
    case("R5-fr-la-derniere-semaine-no-N-is-one-unit", "Bugs ouverts la dernière semaine",
         "la dernière semaine", "R5", (wall(NOW, weeks=-1), iso(NOW)),
         alts=(alt("R5", CAL, cal_back(NOW, THIS_WEEK, 1, "weeks")),)),
    case("R5-fr-le-dernier-mois-at-a-month-end", "Fusions du dernier mois", "du dernier mois", "R5",
         (wall(MONTH_END, months=-1), iso(MONTH_END)),
         alts=(alt("R5", CAL, cal_back(MONTH_END, date(2026, 3, 1), 1, "months")),), now=MONTH_END),
    case("R5-fr-depuis-3-jours", "Quels tickets sont bloqués depuis 3 jours ?", "depuis 3 jours",
         "R5", (wall(NOW, days=-3), iso(NOW)),
         alts=(alt("R5", CAL, cal_back(NOW, TODAY, 3, "days")),)),
    case("R5-fr-les-24-dernieres-heures-are-real-hours-Berlin-spring",
         "Erreurs des 24 dernières heures", "24 dernières heures", "R5",
         (elapsed(SPRING_BERLIN, hours=-24), iso(SPRING_BERLIN)), now=SPRING_BERLIN),
    case("R5-fr-les-dernieres-48-heures", "Erreurs pendant les dernières 48 heures",
         "pendant les dernières 48 heures", "R5", (elapsed(NOW, hours=-48), iso(NOW)),
         alts=(alt("R5", CAL, (elapsed(floor_hour(NOW), hours=-48), iso(floor_hour(NOW)))),)
         if floor_hour(NOW) != NOW else ()),
    case("R5-fr-les-2-dernieres-heures-off-the-hour", "Déploiements dans les 2 dernières heures",
         "dans les 2 dernières heures", "R5", (elapsed(QUARTER_PAST, hours=-2), iso(QUARTER_PAST)),
         alts=(alt("R5", CAL, (elapsed(floor_hour(QUARTER_PAST), hours=-2),
                               iso(floor_hour(QUARTER_PAST)))),), now=QUARTER_PAST),
    case("R5-fr-calendar-policy-reads-whole-days", "Bugs des 7 derniers jours", "7 derniers jours",
         "R5", cal_back(NOW, TODAY, 7, "days"), alts=(alt("R5", ROLL, (wall(NOW, days=-7), iso(NOW))),),
         window_reading="calendar"),
]

R6 = [
    case("R6-fr-les-3-prochains-jours", "Qu'est-ce qui est dû les 3 prochains jours ?",
         "les 3 prochains jours", "R6", (iso(NOW), wall(NOW, days=3)),
         alts=(alt("R6", CAL, cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-fr-dans-les-2-prochaines-semaines", "Qu'est-ce qui sort dans les 2 prochaines semaines ?",
         "dans les 2 prochaines semaines", "R6", (iso(NOW), wall(NOW, weeks=2)),
         alts=(alt("R6", CAL, cal_ahead(NOW, THIS_WEEK, 2, "weeks")),)),
    case("R6-fr-d-ici-3-jours", "Corriger d'ici 3 jours", "d'ici 3 jours", "R6",
         (iso(NOW), wall(NOW, days=3)), alts=(alt("R6", CAL, cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-fr-sous-48-heures", "Tickets à traiter sous 48 heures", "sous 48 heures", "R6",
         (iso(NOW), elapsed(NOW, hours=48)),
         alts=(alt("R6", CAL, (elapsed(floor_hour(NOW), hours=1), elapsed(floor_hour(NOW), hours=49))),)),
    case("R6-fr-les-3-jours-a-venir", "Livraisons des 3 jours à venir", "3 jours à venir", "R6",
         (iso(NOW), wall(NOW, days=3)), alts=(alt("R6", CAL, cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-fr-calendar-policy-reads-whole-days", "Qu'est-ce qui est dû les 3 prochains jours ?",
         "les 3 prochains jours", "R6", cal_ahead(NOW, TODAY, 3, "days"),
         alts=(alt("R6", ROLL, (iso(NOW), wall(NOW, days=3))),), window_reading="calendar"),
]

R7 = [
    case("R7-fr-depuis-mars", "Bugs fermés depuis mars", "depuis mars", "R7", since(MARCH),
         "2026-03-01/..", alts=(alt("R7", "bias=future", since(MARCH_NEXT)),)),
    case("R7-fr-depuis-la-semaine-derniere", "Qu'avons-nous livré depuis la semaine dernière ?",
         "depuis la semaine dernière", "R7", since(week(TODAY + D(weeks=-1))), "2026-11-23/.."),
    case("R7-fr-depuis-2024", "Tickets ouverts depuis 2024", "depuis 2024", "R7", since(year(2024)),
         "2024-01-01/.."),
    case("R7-fr-depuis-hier", "Commentaires depuis hier", "depuis hier", "R7",
         since(day(TODAY + D(days=-1)))),
    case("R7-fr-a-partir-de-lundi", "Commits à partir de lundi", "à partir de lundi", "R7",
         since(MONDAY), alts=(alt("R7", "bias=future", since(MONDAY_NEXT)),)),
    case("R7-fr-a-partir-d-avril-elided", "Tickets créés à partir d'avril", "à partir d'avril", "R7",
         since(month(most_recent_year(lambda y: date(y, 4, 1)), 4)),
         alts=(alt("R7", "bias=future", since(month(next_year_after(lambda y: date(y, 5, 1)), 4))),)),
    case("R7-fr-a-partir-du-14-mars-2025", "Déploiements à partir du 14 mars 2025",
         "à partir du 14 mars 2025", "R7", since(day(date(2025, 3, 14))), "2025-03-14/.."),
    case("R7-fr-depuis-une-date-ISO", "Déploiements depuis le 2025-03-14", "depuis le 2025-03-14",
         "R7", since(day(date(2025, 3, 14)))),
]

R8 = [
    case("R8-fr-apres-mars", "Bugs ouverts après mars", "après mars", "R8", after(MARCH),
         "2026-04-01/..", alts=(alt("R8", "bias=future", after(MARCH_NEXT)),)),
    case("R8-fr-apres-2025", "Tickets dus après 2025", "après 2025", "R8", after(year(2025))),
    case("R8-fr-apres-la-semaine-derniere", "Rouverts après la semaine dernière",
         "après la semaine dernière", "R8", after(week(TODAY + D(weeks=-1)))),
    case("R8-fr-apres-le-14-mars-2025", "Commentaires après le 14 mars 2025",
         "après le 14 mars 2025", "R8", after(day(date(2025, 3, 14)))),
]

R9 = [
    case("R9-fr-avant-2025", "Tickets fermés avant 2025", "avant 2025", "R9", before(year(2025)),
         "../2024-12-31"),
    case("R9-fr-avant-mars", "Bugs ouverts avant mars", "avant mars", "R9", before(MARCH),
         alts=(alt("R9", "bias=future", before(MARCH_NEXT)),)),
    case("R9-fr-avant-le-14-mars-2025", "Tickets créés avant le 14 mars 2025",
         "avant le 14 mars 2025", "R9", before(day(date(2025, 3, 14)))),
    case("R9-fr-avant-la-semaine-prochaine", "À livrer avant la semaine prochaine",
         "avant la semaine prochaine", "R9", before(week(TODAY + D(weeks=1)))),
]

_FRIDAY = day(on_or_after(TODAY, FR))
_FRIDAY_PAST = day(on_or_before(TODAY, FR))

R10 = [
    case("R10-fr-jusqu-a-vendredi-deadline-looks-ahead", "Qu'est-ce qui doit être corrigé jusqu'à vendredi ?",
         "jusqu'à vendredi", "R10", until(_FRIDAY), alts=(alt("R10", None, until(_FRIDAY_PAST)),)),
    case("R10-fr-d-ici-vendredi-deadline-looks-ahead", "Qu'est-ce qui doit être fini d'ici vendredi ?",
         "d'ici vendredi", "R10", until(_FRIDAY), alts=(alt("R10", None, until(_FRIDAY_PAST)),)),
    case("R10-fr-jusqu-au-15-mars-2026", "Gel du code jusqu'au 15 mars 2026", "jusqu'au 15 mars 2026",
         "R10", until(day(date(2026, 3, 15))), "../2026-03-15"),
    case("R10-fr-jusqu-en-2025", "Tickets ouverts jusqu'en 2025", "jusqu'en 2025", "R10",
         until(year(2025))),
    case("R10-fr-jusqu-a-la-semaine-derniere", "Bugs jusqu'à la semaine dernière",
         "jusqu'à la semaine dernière", "R10", until(week(TODAY + D(weeks=-1)))),
]

_NOV = month(2026, 11)
R11 = [
    case("R11-fr-entre-mars-et-mai", "Bugs ouverts entre mars et mai", "entre mars et mai", "R11",
         joined(MARCH, month(2026, 5)), "2026-03-01/2026-05-31",
         alts=(alt("R11", "bias=future", joined(MARCH_NEXT, month(2027, 5))),)),
    case("R11-fr-de-novembre-a-fevrier-rolls-into-the-next-year", "Astreintes de novembre à février",
         "de novembre à février", "R11", joined(_NOV, month(2027, 2)), "2026-11-01/2027-02-28",
         alts=(alt("R11", "bias=future", joined(month(2027, 11), month(2028, 2))),)),
    case("R11-fr-du-1er-au-15-mars", "Incidents du 1er au 15 mars", "du 1er au 15 mars", "R11",
         joined(day(date(2026, 3, 1)), day(date(2026, 3, 15))), "2026-03-01/2026-03-15",
         alts=(alt("R11", "bias=future", joined(day(date(2027, 3, 1)), day(date(2027, 3, 15)))),)),
    case("R11-fr-entre-le-1er-et-le-15-mars", "Incidents entre le 1er et le 15 mars",
         "entre le 1er et le 15 mars", "R11", joined(day(date(2026, 3, 1)), day(date(2026, 3, 15))),
         alts=(alt("R11", "bias=future", joined(day(date(2027, 3, 1)), day(date(2027, 3, 15)))),)),
    case("R11-fr-du-1er-mars-au-15-avril-2025", "Sprints du 1er mars au 15 avril 2025",
         "du 1er mars au 15 avril 2025", "R11", joined(day(date(2025, 3, 1)), day(date(2025, 4, 15)))),
    case("R11-fr-entre-lundi-et-mercredi", "Bugs ouverts entre lundi et mercredi",
         "entre lundi et mercredi", "R11", joined(MONDAY, day(on_or_after(on_or_before(TODAY, MO), WE))),
         alts=(alt("R11", "bias=future", joined(MONDAY_NEXT, day(on_or_after(on_or_after(TODAY, MO), WE)))),)),
    case("R11-fr-de-2024-a-2025", "Incidents de 2024 à 2025", "de 2024 à 2025", "R11",
         joined(year(2024), year(2025)), "2024-01-01/2025-12-31"),
    case("R11-fr-du-ISO-au-ISO", "Déploiements du 2025-03-01 au 2025-03-15",
         "du 2025-03-01 au 2025-03-15", "R11", joined(day(date(2025, 3, 1)), day(date(2025, 3, 15)))),
]

_MARCH_14 = day(date(most_recent_year(lambda y: date(y, 3, 14)), 3, 14))
_MARCH_14_NEXT = day(date(next_year_after(lambda y: date(y, 3, 15)), 3, 14))
R12 = [
    case("R12-fr-en-mars", "Bugs ouverts en mars", "en mars", "R12", MARCH, "2026-03",
         alts=(alt("R12", "bias=future", MARCH_NEXT),)),
    case("R12-fr-le-14-mars", "Qu'est-ce qui a cassé le 14 mars ?", "le 14 mars", "R12", _MARCH_14,
         alts=(alt("R12", "bias=future", _MARCH_14_NEXT),)),
    case("R12-fr-au-mois-de-juin", "Tickets fermés au mois de juin", "au mois de juin", "R12",
         month(2026, 6), alts=(alt("R12", "bias=future", month(2027, 6)),)),
    case("R12-fr-en-decembre-the-current-month-counts", "Tickets fermés en décembre",
         "en décembre", "R12", month(2026, 12), "2026-12"),
    case("R12-fr-T3", "Quelle était la vélocité au T3 ?", "au T3", "R12", quarter(2026, 3), "2026-Q3",
         alts=(alt("R12", "bias=future", quarter(2027, 3)),)),
    case("R12-fr-au-3e-trimestre", "Bugs du 3e trimestre", "du 3e trimestre", "R12", quarter(2026, 3),
         alts=(alt("R12", "bias=future", quarter(2027, 3)),)),
    case("R12-fr-le-premier-trimestre", "Objectifs pour le premier trimestre", "le premier trimestre",
         "R12", quarter(2026, 1), alts=(alt("R12", "bias=future", quarter(2027, 1)),)),
    case("R12-fr-la-seconde-moitie-de-l-annee", "Plan pour la seconde moitié de l'année",
         "la seconde moitié de l'année", "R12", half(2026, 2), "2026-H2"),
    case("R12-fr-au-S1-needs-a-cue", "Budget au S1", "au S1", "R12", half(2026, 1),
         alts=(alt("R12", "bias=future", half(2027, 1)),)),
    case("R12-fr-bias-future-picks-next-march", "Bugs ouverts en mars", "en mars", "R12", MARCH_NEXT,
         alts=(alt("R12", "bias=past", MARCH),), bias="future"),
]

R13 = [
    case("R13-fr-lundi", "Qu'est-ce qui a cassé lundi ?", "lundi", "R13", MONDAY,
         alts=(alt("R13", "bias=future", MONDAY_NEXT),)),
    case("R13-fr-mardi", "Bugs ouverts mardi", "mardi", "R13", day(on_or_before(TODAY, TU)),
         alts=(alt("R13", "bias=future", day(on_or_after(TODAY, TU))),)),
    case("R13-fr-mercredi-is-today", "Bugs ouverts mercredi", "mercredi", "R13", day(TODAY)),
    case("R13-fr-pour-vendredi-due-looks-ahead", "Qu'est-ce qui est prévu pour vendredi ?",
         "vendredi", "R13", _FRIDAY, alts=(alt("R13", None, _FRIDAY_PAST),)),
    case("R13-fr-lundi-bias-future", "Qu'est-ce qui est prévu lundi ?", "lundi", "R13", MONDAY_NEXT,
         alts=(alt("R13", "bias=past", MONDAY),), bias="future"),
]

R14 = [
    case("R14-fr-lundi-dernier", "Qu'est-ce qui a cassé lundi dernier ?", "lundi dernier", "R14",
         day(strictly_before(TODAY, MO)), alts=(alt("R16", "weekday_reading=week", day(in_week(TODAY, MO, -1))),)),
    case("R14-fr-vendredi-dernier", "Tickets fermés vendredi dernier", "vendredi dernier", "R14",
         day(strictly_before(TODAY, FR)),
         alts=() if strictly_before(TODAY, FR) == in_week(TODAY, FR, -1) else
         (alt("R16", "weekday_reading=week", day(in_week(TODAY, FR, -1))),)),
    case("R14-fr-le-mercredi-passe-on-a-Wednesday", "Déploiements du mercredi passé",
         "du mercredi passé", "R14", day(strictly_before(TODAY, WE))),
    case("R14-fr-le-mardi-precedent", "Bugs du mardi précédent", "du mardi précédent", "R14",
         day(strictly_before(TODAY, TU)), alts=(alt("R16", "weekday_reading=week", day(in_week(TODAY, TU, -1))),)),
    case("R14-fr-lundi-dernier-week-policy-is-monday-of-last-week", "Qu'est-ce qui a cassé lundi dernier ?",
         "lundi dernier", "R16", day(in_week(TODAY, MO, -1)),
         alts=(alt("R14", "weekday_reading=nearest", day(strictly_before(TODAY, MO))),), weekday_reading="week"),
]

R15 = [
    case("R15-fr-jeudi-prochain-is-tomorrow", "Qu'est-ce qui est planifié jeudi prochain ?",
         "jeudi prochain", "R15", day(strictly_after(TODAY, TH)),
         alts=(alt("R16", "weekday_reading=week", day(in_week(TODAY, TH, 1))),)),
    case("R15-fr-lundi-prochain", "Démo lundi prochain", "lundi prochain", "R15",
         day(strictly_after(TODAY, MO)),
         alts=() if strictly_after(TODAY, MO) == in_week(TODAY, MO, 1) else
         (alt("R16", "weekday_reading=week", day(in_week(TODAY, MO, 1))),)),
    case("R15-fr-le-vendredi-qui-vient", "Revue le vendredi qui vient", "le vendredi qui vient", "R15",
         day(strictly_after(TODAY, FR)), alts=(alt("R16", "weekday_reading=week", day(in_week(TODAY, FR, 1))),)),
    case("R15-fr-jeudi-prochain-week-policy", "Qu'est-ce qui est planifié jeudi prochain ?",
         "jeudi prochain", "R16", day(in_week(TODAY, TH, 1)),
         alts=(alt("R15", "weekday_reading=nearest", day(strictly_after(TODAY, TH))),), weekday_reading="week"),
]

R16 = [
    case("R16-fr-lundi-de-la-semaine-derniere", "Qu'est-ce qui a cassé lundi de la semaine dernière ?",
         "lundi de la semaine dernière", "R16", day(in_week(TODAY, MO, -1))),
    case("R16-fr-vendredi-de-la-semaine-prochaine", "Démo vendredi de la semaine prochaine",
         "vendredi de la semaine prochaine", "R16", day(in_week(TODAY, FR, 1))),
    case("R16-fr-mardi-de-cette-semaine", "Bugs ouverts mardi de cette semaine", "mardi de cette semaine",
         "R16", day(in_week(TODAY, TU, 0)), alts=(alt("R15", None, day(on_or_after(TODAY, TU))),)),
    case("R16-fr-le-jeudi-de-la-semaine-passee", "Incidents le jeudi de la semaine passée",
         "le jeudi de la semaine passée", "R16", day(in_week(TODAY, TH, -1))),
    case("R16-fr-ce-lundi-CLDR-this-week", "Qu'est-ce qui a cassé ce lundi ?", "ce lundi", "R16",
         day(in_week(TODAY, MO, 0)), alts=(alt("R15", None, day(on_or_after(TODAY, MO))),)),
    case("R16-fr_CA-lundi-de-la-semaine-derniere-Sunday-weeks", "Incidents lundi de la semaine dernière",
         "lundi de la semaine dernière", "R16", day(in_week(TODAY, MO, -1, SU)), locale="fr_CA"),
]

R17 = [
    case("R17-fr-en-2025", "Combien de bugs en 2025 ?", "en 2025", "R17", year(2025), "2025"),
    case("R17-fr-l-annee-2025", "Incidents de l'année 2025", "de l'année 2025", "R17", year(2025)),
    case("R17-fr-pendant-2023", "Releases pendant 2023", "pendant 2023", "R17", year(2023)),
    case("R17-fr-de-2025-beside-numbers", "Liste 5 tickets de priorité 2 de 2025", "de 2025", "R17",
         year(2025)),
]

R18 = [
    case("R18-fr-14-mars-2025", "Qu'est-ce qui a été livré le 14 mars 2025 ?", "le 14 mars 2025",
         "R18", day(date(2025, 3, 14)), "2025-03-14"),
    case("R18-fr-le-lundi-14-mars-2022", "Incident du lundi 14 mars 2022", "du lundi 14 mars 2022",
         "R18", day(date(2022, 3, 14))),
    case("R18-fr-le-1er-mars-2026", "Tickets créés le 1er mars 2026", "le 1er mars 2026", "R18",
         day(date(2026, 3, 1))),
    case("R18-fr-ISO", "Déploiement du 2025-03-14", "du 2025-03-14", "R18", day(date(2025, 3, 14))),
    case("R18-fr_FR-numeric-day-first", "Corrigé le 14/03/2025", "14/03/2025", "R18",
         day(read_numeric(14, 3, 2025, "fr_FR")), locale="fr_FR"),
    case("R18-fr_FR-numeric-ambiguous-day-first", "Corrigé le 03/04/2026", "03/04/2026", "R18",
         day(read_numeric(3, 4, 2026, "fr_FR")),
         alts=(alt("R18", "date_order=MDY", day(date(2026, 3, 4))),), locale="fr_FR"),
    case("R18-fr-numeric-with-dots", "Corrigé le 03.04.2026", "03.04.2026", "R18",
         day(read_numeric(3, 4, 2026, "fr_FR")),
         alts=(alt("R18", "date_order=MDY", day(date(2026, 3, 4))),), locale="fr_FR"),
    case("R18-fr-en_US-locale-reads-month-first", "Corrigé le 03/04/2026", "03/04/2026", "R18",
         day(read_numeric(3, 4, 2026, "en_US")),
         alts=(alt("R18", "date_order=DMY", day(date(2026, 4, 3))),), locale="en_US"),
    case("R18-fr-date-order-policy-flips", "Corrigé le 03/04/2026", "03/04/2026", "R18",
         day(date(2026, 3, 4)), alts=(alt("R18", "date_order=DMY", day(date(2026, 4, 3))),),
         locale="fr_FR", date_order="MDY"),
]

R19 = [
    case("R19-fr-mars-2026", "Bugs de mars 2026", "de mars 2026", "R19", month(2026, 3), "2026-03"),
    case("R19-fr-T3-2025", "Chiffre d'affaires T3 2025", "T3 2025", "R19", quarter(2025, 3), "2025-Q3"),
    case("R19-fr-le-troisieme-trimestre-2025", "Vélocité du troisième trimestre 2025",
         "du troisième trimestre 2025", "R19", quarter(2025, 3)),
    case("R19-fr-S1-2026", "Objectifs S1 2026", "S1 2026", "R19", half(2026, 1), "2026-H1"),
    case("R19-fr-le-premier-semestre-2026", "Budget du premier semestre 2026",
         "du premier semestre 2026", "R19", half(2026, 1)),
    case("R19-fr-la-premiere-moitie-de-2026", "Feuille de route de la première moitié de 2026",
         "de la première moitié de 2026", "R19", half(2026, 1)),
    case("R19-fr-le-second-semestre-2025", "Incidents du second semestre 2025",
         "du second semestre 2025", "R19", half(2025, 2), "2025-H2"),
]

R20 = [
    case("R20-fr-semaine-48-past-bias", "Tickets de la semaine 48", "de la semaine 48", "R20",
         iso_week(2026, 48), "2026-W48", alts=(alt("R20", "bias=future", iso_week(2027, 48)),)),
    case("R20-fr-la-semaine-48-de-2026", "Tickets de la semaine 48 de 2026",
         "de la semaine 48 de 2026", "R20", iso_week(2026, 48)),
    case("R20-fr-S48", "Livraisons S48", "S48", "R20", iso_week(2026, 48),
         alts=(alt("R20", "bias=future", iso_week(2027, 48)),)),
    case("R20-fr-S05-2027", "Planning S05 2027", "S05 2027", "R20", iso_week(2027, 5), "2027-W05"),
    case("R20-fr-ISO-week", "Tickets de 2026-W48", "de 2026-W48", "R20", iso_week(2026, 48)),
    case("R20-fr_CA-ISO-week-starts-on-Monday-whatever-the-locale", "Tickets de la semaine 48 de 2026",
         "de la semaine 48 de 2026", "R20", iso_week(2026, 48), locale="fr_CA"),
]

_YEAR_START = iso(midnight(date(TODAY.year, 1, 1)))
R21 = [
    case("R21-fr-depuis-le-debut-de-l-annee", "Chiffre d'affaires depuis le début de l'année",
         "depuis le début de l'année", "R21", (_YEAR_START, iso(NOW))),
    case("R21-fr-depuis-le-debut-du-mois", "Bugs depuis le début du mois", "depuis le début du mois",
         "R21", (iso(midnight(THIS_MONTH)), iso(NOW))),
    case("R21-fr-depuis-le-debut-de-la-semaine", "Tickets depuis le début de la semaine",
         "depuis le début de la semaine", "R21", (iso(midnight(THIS_WEEK)), iso(NOW))),
    case("R21-fr-cette-annee-jusqu-a-present", "Incidents cette année jusqu'à présent",
         "cette année jusqu'à présent", "R21", (_YEAR_START, iso(NOW))),
    case("R21-fr-le-trimestre-en-cours-jusqu-a-aujourd-hui", "Ventes du trimestre en cours jusqu'à aujourd'hui",
         "du trimestre en cours jusqu'à aujourd'hui", "R21", (iso(midnight(date(2026, 10, 1))), iso(NOW))),
]

R22 = [
    case("R22-fr-ce-matin", "Qu'est-ce qui a cassé ce matin ?", "ce matin", "R22",
         day_period("fr", TODAY, "morning1")),
    case("R22-fr-hier-soir", "Alertes d'hier soir", "d'hier soir", "R22",
         day_period("fr", TODAY + D(days=-1), "evening1")),
    case("R22-fr-cet-apres-midi", "Déploiements cet après-midi", "cet après-midi", "R22",
         day_period("fr", TODAY, "afternoon1")),
    case("R22-fr-demain-matin", "Revue demain matin", "demain matin", "R22",
         day_period("fr", TODAY + D(days=1), "morning1")),
    case("R22-fr-hier-apres-midi", "Qu'est-ce qui a cassé hier après-midi ?", "hier après-midi", "R22",
         day_period("fr", TODAY + D(days=-1), "afternoon1")),
    case("R22-fr-hier-dans-l-apres-midi", "Erreurs hier dans l'après-midi", "hier dans l'après-midi",
         "R22", day_period("fr", TODAY + D(days=-1), "afternoon1")),
    case("R22-fr-ce-soir", "Maintenance ce soir", "ce soir", "R22", day_period("fr", TODAY, "evening1")),
    case("R22-fr-cette-nuit", "Qu'est-ce qui a planté cette nuit ?", "cette nuit", "R22",
         day_period("fr", TODAY, "night1")),
    case("R22-fr-la-nuit-derniere", "Jobs échoués la nuit dernière", "la nuit dernière", "R22",
         day_period("fr", TODAY, "night1")),
]

_FR = "fr_FR"
R23 = [
    case("R23-fr-ce-week-end-on-a-Wednesday", "Déploiements ce week-end", "ce week-end", "R23",
         weekend(first_open_weekend(TODAY, _FR), _FR), weekend_value(first_open_weekend(TODAY, _FR), _FR),
         locale=_FR),
    case("R23-fr-le-week-end-dernier", "Incidents du week-end dernier", "du week-end dernier", "R23",
         weekend(last_ended_weekend(TODAY, _FR), _FR), locale=_FR),
    case("R23-fr-le-week-end-prochain", "Maintenance le week-end prochain", "le week-end prochain",
         "R23", weekend(first_open_weekend(TODAY, _FR) + D(weeks=1), _FR),
         alts=(alt("R23", None, weekend(first_open_weekend(TODAY, _FR), _FR)),), locale=_FR),
    case("R23-fr-pendant-le-week-end-past-bias", "Qu'est-ce qui a cassé pendant le week-end ?",
         "pendant le week-end", "R23", weekend(last_ended_weekend(TODAY, _FR), _FR),
         alts=(alt("R23", "bias=future", weekend(first_open_weekend(TODAY, _FR), _FR)),), locale=_FR),
    case("R23-fr-ce-week-end-on-a-Saturday", "Déploiements ce week-end", "ce week-end", "R23",
         weekend(first_open_weekend(SATURDAY.date(), _FR), _FR), now=SATURDAY, locale=_FR),
    case("R23-fr-le-week-end-dernier-on-a-Sunday", "Incidents du week-end dernier", "du week-end dernier",
         "R23", weekend(last_ended_weekend(SUNDAY.date(), _FR), _FR), now=SUNDAY, locale=_FR),
    case("R23-fr-ce-weekend-without-hyphen", "Astreinte ce weekend", "ce weekend", "R23",
         weekend(first_open_weekend(TODAY, _FR), _FR), locale=_FR),
    case("R23-fr-pendant-le-week-end-bias-future", "Qu'est-ce qui tourne pendant le week-end ?",
         "pendant le week-end", "R23", weekend(first_open_weekend(TODAY, _FR), _FR),
         alts=(alt("R23", "bias=past", weekend(last_ended_weekend(TODAY, _FR), _FR)),), locale=_FR,
         bias="future"),
]

DURATIONS = [
    case("D-fr-depuis-plus-de-3-jours", "Tickets ouverts depuis plus de 3 jours", "3 jours", "D",
         (None, None), "P3D"),
    case("D-fr-pendant-deux-semaines", "Bloqué pendant deux semaines", "pendant deux semaines", "D",
         (None, None), "P2W"),
    case("D-fr-moins-de-4-heures", "Incidents résolus en moins de 4 heures", "4 heures", "D",
         (None, None), "PT4H"),
]

#: French words mixed with English in one question; both languages are read.
FR_EN = ("fr", "en")
MIXED = [
    case("R2-fr+en-tickets-crees-last-week", "Combien de tickets créés last week ?", "last week", "R2",
         week(TODAY + D(weeks=-1)), languages=FR_EN),
    case("R2-fr+en-show-bugs-de-la-semaine-derniere", "show bugs de la semaine dernière",
         "de la semaine dernière", "R2", week(TODAY + D(weeks=-1)), languages=FR_EN),
    case("R1-fr+en-closed-hier", "which tickets were closed hier", "hier", "R1", day(TODAY + D(days=-1)),
         languages=FR_EN),
    case("R7-fr+en-list-bugs-depuis-mars", "list bugs depuis mars", "depuis mars", "R7", since(MARCH),
         alts=(alt("R7", "bias=future", since(MARCH_NEXT)),), languages=FR_EN),
    case("R7-fr+en-bugs-crees-since-Monday", "bugs créés since Monday", "since Monday", "R7",
         since(MONDAY), alts=(alt("R7", "bias=future", since(MONDAY_NEXT)),), languages=FR_EN),
    case("R22-fr+en-deploys-prevus-demain-matin", "deploys prévus demain matin", "demain matin", "R22",
         day_period("fr", TODAY + D(days=1), "morning1"), languages=FR_EN),
    case("R3-fr+en-open-tickets-il-y-a-3-jours", "open tickets il y a 3 jours", "il y a 3 jours", "R3",
         day(TODAY + D(days=-3)), languages=FR_EN),
    case("R2-fr+en-PRs-mergees-this-week", "PRs mergées this week", "this week", "R2", week(TODAY),
         languages=FR_EN),
    case("R11-fr+en-incidents-entre-le-1er-et-le-15-mars", "incidents entre le 1er et le 15 mars",
         "entre le 1er et le 15 mars", "R11", joined(day(date(2026, 3, 1)), day(date(2026, 3, 15))),
         alts=(alt("R11", "bias=future", joined(day(date(2027, 3, 1)), day(date(2027, 3, 15)))),),
         languages=FR_EN),
    case("R5-fr+en-bugs-in-the-last-7-days-en-francais", "Bugs in the last 7 days, s'il vous plaît",
         "in the last 7 days", "R5", (wall(NOW, days=-7), iso(NOW)),
         alts=(alt("R5", CAL, cal_back(NOW, TODAY, 7, "days")),), languages=FR_EN),
]

TABLES = {
    "R1": R1, "R2": R2, "R3": R3, "R4": R4, "R5": R5, "R6": R6, "R7": R7, "R8": R8, "R9": R9,
    "R10": R10, "R11": R11, "R12": R12, "R13": R13, "R14": R14, "R15": R15, "R16": R16,
    "R17": R17, "R18": R18, "R19": R19, "R20": R20, "R21": R21, "R22": R22, "R23": R23,
}


@pytest.mark.parametrize(PARAMS, [row for rows in TABLES.values() for row in rows])
def test_french_phrase_resolves_to_its_reading_and_interval(question, phrase, reading, bounds, value,
                                                            alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, DURATIONS)
def test_french_length_of_time_after_a_cue_is_an_iso_duration(question, phrase, reading, bounds,
                                                              value, alts, context):
    m = one(question, **context)
    assert (m.text, m.reading, m.kind, m.value) == (phrase, "D", "duration", value)
    assert (m.start, m.end) == bounds


@pytest.mark.parametrize(PARAMS, MIXED)
def test_question_mixing_french_and_english_finds_the_phrase(question, phrase, reading, bounds,
                                                             value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


def test_every_reading_has_at_least_three_french_examples():
    assert all(len(rows) >= 3 for rows in TABLES.values()), {k: len(v) for k, v in TABLES.items()}
    assert len(MIXED) >= 8


# Look-alikes: French questions whose words look temporal but are not (reading N).
TRAPS = [
    ("N-fr-la-mission-vers-Mars", "Qui suit la mission vers Mars ?"),
    ("N-fr-les-photos-de-Mars-capitalised-planet", "Tickets sur les photos de Mars"),
    ("N-fr-le-rover-sur-Mars", "Bugs du rover sur Mars"),
    ("N-fr-la-planete-mars-lowercase", "Rendu de la planète mars dans le jeu"),
    ("N-fr-la-seconde-version", "Qui a relu la seconde version ?"),
    ("N-fr-attends-une-seconde", "Attends une seconde"),
    ("N-fr-un-second-avis", "Il faut un second avis sur le design"),
    ("N-fr-la-seconde-moitie-du-sprint", "Tâches de la seconde moitié du sprint"),
    ("N-fr-ce-jeu-de-donnees", "Qui a chargé ce jeu de données ?"),
    ("N-fr-le-jeu-de-tests", "Le jeu de tests échoue"),
    ("N-fr-la-mer-du-Nord", "Capteurs de la mer du Nord"),
    ("N-fr-sept-tickets", "Sept tickets sont ouverts"),
    ("N-fr-de-sept-a-dix-tests", "Entre sept et dix tests échouent"),
    ("N-fr-priorite-2", "Tickets de priorité 2"),
    ("N-fr-version-2025.1", "Bugs de la version 2025.1"),
    ("N-fr-ticket-2025", "Qui a le ticket 2025 ?"),
    ("N-fr-2025-tickets-no-cue", "2025 tickets ouverts"),
    ("N-fr-sprint-12", "Bugs du sprint 12"),
    ("N-fr-top-10", "Top 10 des contributeurs"),
    ("N-fr-5-points", "Tâches à 5 points"),
    ("N-fr-build-2024", "Qui a cassé le build 2024 ?"),
    ("N-fr-erreur-404", "Rapports d'erreur 404"),
    ("N-fr-page-3", "Page 3 du rapport"),
    ("N-fr-les-2-derniers-tickets", "Les 2 derniers tickets"),
    ("N-fr-le-dernier-commentaire", "Le dernier commentaire du ticket"),
    ("N-fr-la-prochaine-etape", "La prochaine étape pour l'équipe"),
    ("N-fr-derniere-version", "Bugs de la dernière version"),
    ("N-fr-un-jour-peut-etre", "Un jour peut-être"),
    ("N-fr-tous-les-jours", "Réunion tous les jours"),
    ("N-fr-au-jour-le-jour", "Suivi au jour le jour"),
    ("N-fr-les-heures-supplementaires", "Les heures supplémentaires de l'équipe"),
    ("N-fr-il-y-a-3-bugs", "Il y a 3 bugs ouverts"),
    ("N-fr-avant-tout", "Avant tout, relire le ticket"),
    ("N-fr-le-premier-ticket", "Le premier ticket de la liste"),
    ("N-fr-la-moitie-des-tests", "La moitié des tests passent"),
    ("N-fr-temps-de-reponse", "Temps de réponse du service"),
    ("N-fr-minute-de-silence", "Une minute de silence"),
    ("N-fr-2-sur-5", "Build 2 sur 5"),
    ("N-fr-v2", "Notes de la v2"),
    ("N-fr-numero-48", "Ticket numéro 48"),
]


@pytest.mark.parametrize(("question",), [(q,) for _, q in TRAPS], ids=[i for i, _ in TRAPS])
def test_french_look_alike_gives_no_temporal_mention(question):
    result = run(question, languages=("fr",))
    assert result.mentions == ()
    assert result.rewritten == question


@pytest.mark.parametrize(("question", "phrase"), [
    ("Bugs ouverts en mars", "en mars"),
    ("Tickets de mars 2026", "de mars 2026"),
    ("Incidents depuis le 3 mars", "depuis le 3 mars"),
], ids=["R12-fr-en-mars", "R19-fr-de-mars-2026", "R7-fr-depuis-le-3-mars"])
def test_french_mars_with_a_cue_is_still_the_month(question, phrase):
    assert one(question, languages=("fr",)).text == phrase


def test_there_are_at_least_twenty_five_french_traps():
    assert len(TRAPS) >= 25
