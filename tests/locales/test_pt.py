"""Portuguese: the reading contract R1-R23 (and D) on Portuguese work-tracker questions
(Brazilian and European usage), the policies, numeric dates in the CLDR order of Portuguese
locales, week starts of pt, pt_BR and pt_PT, questions mixing Portuguese and English, and
look-alike words that must give no mention.

Checked against:
- python-dateutil ``relativedelta``, stdlib ``calendar`` and ``date.fromisocalendar`` (the
  oracles of tests/locales/romance_oracles.py): every expected start and end;
- CLDR 49 via babel 2.19: Portuguese day-period rules (``Locale("pt").day_period_rules``: manhã
  06:00-12:00, tarde 12:00-19:00, noite 19:00-24:00, madrugada 00:00-06:00), week data
  (``Locale.first_week_day``: Sunday for pt_BR and for pt_PT, Monday for pt without a
  territory; weekend Saturday-Sunday) and the short date format order (pt_BR and pt_PT day
  first, en_US month first);
- the worked example sentences are written from knowledge of the language (no published
  source);
- common practice (no published source): "segunda", "terça", "quarta", "quinta" and "sexta"
  name the weekdays ending in "-feira", but "segunda", "quarta", "quinta" and "sexta" are also
  ordinals ("a segunda versão"), so alone they need a cue ("na segunda", "até sexta"); "segunda
  passada" is the most recent Monday before today and "sexta que vem" the first Friday after
  it; "até sexta" and "para sexta" look ahead to the coming Friday; "semana retrasada" is the
  week before last; "ontem à noite" is yesterday's noite; "de 1 a 15 de março" runs from the
  1st to the 15th.
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

case = cases_for("pt")
CAL, ROLL = "window_reading=calendar", "window_reading=rolling"
MARCH = month(most_recent_year(lambda y: date(y, 3, 1)), 3)
MARCH_NEXT = month(next_year_after(lambda y: date(y, 4, 1)), 3)
MONDAY, MONDAY_NEXT = day(on_or_before(TODAY, MO)), day(on_or_after(TODAY, MO))
THIS_WEEK, THIS_MONTH = week_start(TODAY), TODAY.replace(day=1)
FRIDAY, FRIDAY_PAST = day(on_or_after(TODAY, FR)), day(on_or_before(TODAY, FR))
MARCH_1_15 = joined(day(date(2026, 3, 1)), day(date(2026, 3, 15)))
MARCH_1_15_NEXT = joined(day(date(2027, 3, 1)), day(date(2027, 3, 15)))

R1 = [
    case("R1-pt-ontem", "Quais bugs foram fechados ontem?", "ontem", "R1", day(TODAY + D(days=-1)),
         (TODAY + D(days=-1)).isoformat()),
    case("R1-pt-hoje", "O que foi entregue hoje?", "hoje", "R1", day(TODAY), TODAY.isoformat()),
    case("R1-pt-amanha", "Quais tarefas vencem amanhã?", "amanhã", "R1", day(TODAY + D(days=1))),
    case("R1-pt-anteontem", "Quem reabriu tickets anteontem?", "anteontem", "R1", day(TODAY + D(days=-2))),
    case("R1-pt-depois-de-amanha", "O que está previsto depois de amanhã?", "depois de amanhã", "R1",
         day(TODAY + D(days=2))),
    case("R1-pt-ontem-across-a-month-start", "Quem comentou ontem?", "ontem", "R1",
         day(MARCH_FIRST.date() + D(days=-1)), "2026-02-28", now=MARCH_FIRST),
]

R2 = [
    case("R2-pt-a-semana-passada", "Quais tickets foram criados a semana passada?", "a semana passada",
         "R2", week(TODAY + D(weeks=-1)), iso_week_name(TODAY + D(weeks=-1))),
    case("R2-pt-na-semana-passada", "Quais tickets foram criados na semana passada?",
         "na semana passada", "R2", week(TODAY + D(weeks=-1))),
    case("R2-pt-esta-semana", "O que entregamos esta semana?", "esta semana", "R2", week(TODAY),
         iso_week_name(TODAY)),
    case("R2-pt-semana-que-vem", "O que está planejado para a semana que vem?", "a semana que vem",
         "R2", week(TODAY + D(weeks=1))),
    case("R2-pt-o-mes-passado", "Quantos bugs foram corrigidos o mês passado?", "o mês passado", "R2",
         month_of(TODAY + D(months=-1)), "2026-11"),
    case("R2-pt-no-mes-passado-at-a-month-end", "Bugs corrigidos no mês passado", "no mês passado",
         "R2", month_of(MONTH_END.date() + D(months=-1)), "2026-02", now=MONTH_END),
    case("R2-pt-este-mes", "Tickets fechados este mês", "este mês", "R2", month_of(TODAY), "2026-12"),
    case("R2-pt-ultimo-trimestre-CLDR-last-quarter", "Qual foi a velocidade no último trimestre?",
         "no último trimestre", "R2", quarter_of(TODAY + D(months=-3)), "2026-Q3"),
    case("R2-pt-o-ano-que-vem", "Quais épicos estão previstos para o ano que vem?", "o ano que vem",
         "R2", year(TODAY.year + 1), "2027"),
    case("R2-pt-o-proximo-ano", "Épicos do próximo ano", "do próximo ano", "R2", year(TODAY.year + 1)),
    case("R2-pt-a-semana-retrasada", "Bugs abertos na semana retrasada", "na semana retrasada", "R2",
         week(TODAY + D(weeks=-2)), iso_week_name(TODAY + D(weeks=-2))),
    case("R2-pt_BR-esta-semana-starts-on-CLDR-Sunday", "Tickets criados esta semana", "esta semana", "R2",
         week(TODAY, first_weekday("pt_BR")), locale="pt_BR"),
    case("R2-pt_PT-esta-semana-starts-on-CLDR-Sunday", "Tickets criados esta semana", "esta semana", "R2",
         week(TODAY, first_weekday("pt_PT")), locale="pt_PT"),
    case("R2-pt-without-territory-esta-semana-starts-on-CLDR-Monday", "Tickets criados esta semana",
         "esta semana", "R2", week(TODAY, first_weekday("pt")), locale="pt"),
    case("R2-pt_PT-a-semana-passada-on-a-Sunday", "Tickets fechados a semana passada",
         "a semana passada", "R2", week(SUNDAY.date() + D(weeks=-1), first_weekday("pt_PT")), now=SUNDAY,
         locale="pt_PT"),
]

R3 = [
    case("R3-pt-ha-3-dias", "Quais bugs foram abertos há 3 dias?", "há 3 dias", "R3", day(TODAY + D(days=-3))),
    case("R3-pt-ha-tres-semanas", "Tickets abertos há três semanas", "há três semanas", "R3",
         week(TODAY + D(weeks=-3)), iso_week_name(TODAY + D(weeks=-3))),
    case("R3-pt-ha-um-mes-at-a-month-end", "O que foi integrado há um mês?", "há um mês", "R3",
         month_of((MONTH_END + D(months=-1)).date()), "2026-02", now=MONTH_END),
    case("R3-pt-3-dias-atras", "Bugs abertos 3 dias atrás", "3 dias atrás", "R3", day(TODAY + D(days=-3))),
    case("R3-pt-faz-duas-semanas", "Tickets abertos faz duas semanas", "faz duas semanas", "R3",
         week(TODAY + D(weeks=-2))),
    case("R3-pt-ha-2-horas", "Alertas de há 2 horas", "de há 2 horas", "R3", hour_of(moved(NOW, hours=-2)),
         f"{hour_of(moved(NOW, hours=-2))[0]}/PT1H"),
    case("R3-pt-ha-dois-anos", "Bugs abertos há dois anos", "há dois anos", "R3", year(TODAY.year - 2)),
]

R4 = [
    case("R4-pt-em-3-dias", "O que vence em 3 dias?", "em 3 dias", "R4", day(TODAY + D(days=3))),
    case("R4-pt-daqui-a-duas-semanas", "O que sai daqui a duas semanas?", "daqui a duas semanas", "R4",
         week(TODAY + D(weeks=2)), iso_week_name(TODAY + D(weeks=2))),
    case("R4-pt-dentro-de-um-mes-from-January-31", "Que contratos renovam dentro de um mês?",
         "dentro de um mês", "R4", month_of((JANUARY_END + D(months=1)).date()), "2026-02", now=JANUARY_END),
    case("R4-pt-em-2-horas", "Que jobs rodam em 2 horas?", "em 2 horas", "R4", hour_of(moved(NOW, hours=2))),
    case("R4-pt-daqui-a-um-ano", "Contratos que vencem daqui a um ano", "daqui a um ano", "R4",
         year(TODAY.year + 1)),
]

R5 = [
    case("R5-pt-nos-ultimos-7-dias", "Quantos bugs foram abertos nos últimos 7 dias?",
         "nos últimos 7 dias", "R5", (wall(NOW, days=-7), iso(NOW)),
         alts=(alt("R5", CAL, cal_back(NOW, TODAY, 7, "days")),)),
    case("R5-pt-nos-ultimos-3-meses", "Tickets fechados nos últimos 3 meses", "nos últimos 3 meses", "R5",
         (wall(NOW, months=-3), iso(NOW)), alts=(alt("R5", CAL, cal_back(NOW, THIS_MONTH, 3, "months")),)),
    case("R5-pt-nas-ultimas-2-semanas", "Bugs reportados nas últimas 2 semanas",
         "nas últimas 2 semanas", "R5", (wall(NOW, weeks=-2), iso(NOW)),
         alts=(alt("R5", CAL, cal_back(NOW, THIS_WEEK, 2, "weeks")),)),
    case("R5-pt-durante-os-ultimos-trinta-dias", "Comentários durante os últimos trinta dias",
         "durante os últimos trinta dias", "R5", (wall(NOW, days=-30), iso(NOW)),
         alts=(alt("R5", CAL, cal_back(NOW, TODAY, 30, "days")),)),
    case("R5-pt-os-7-ultimos-dias", "Deploys dos 7 últimos dias", "7 últimos dias", "R5",
         (wall(NOW, days=-7), iso(NOW)), alts=(alt("R5", CAL, cal_back(NOW, TODAY, 7, "days")),)),
    case("R5-pt-as-ultimas-24-horas-are-real-hours-Berlin-spring", "Erros nas últimas 24 horas",
         "nas últimas 24 horas", "R5", (elapsed(SPRING_BERLIN, hours=-24), iso(SPRING_BERLIN)),
         now=SPRING_BERLIN),
    case("R5-pt-as-ultimas-2-horas-off-the-hour", "Deploys nas últimas 2 horas", "nas últimas 2 horas",
         "R5", (elapsed(QUARTER_PAST, hours=-2), iso(QUARTER_PAST)),
         alts=(alt("R5", CAL, (elapsed(floor_hour(QUARTER_PAST), hours=-2), iso(floor_hour(QUARTER_PAST)))),),
         now=QUARTER_PAST),
    case("R5-pt-os-ultimos-12-meses-at-a-month-end", "Receita dos últimos 12 meses", "últimos 12 meses",
         "R5", (wall(MONTH_END, months=-12), iso(MONTH_END)),
         alts=(alt("R5", CAL, cal_back(MONTH_END, date(2026, 3, 1), 12, "months")),), now=MONTH_END),
    case("R5-pt-calendar-policy-reads-whole-days", "Bugs nos últimos 7 dias", "nos últimos 7 dias", "R5",
         cal_back(NOW, TODAY, 7, "days"), alts=(alt("R5", ROLL, (wall(NOW, days=-7), iso(NOW))),),
         window_reading="calendar"),
]

R6 = [
    case("R6-pt-nos-proximos-3-dias", "O que vence nos próximos 3 dias?", "nos próximos 3 dias", "R6",
         (iso(NOW), wall(NOW, days=3)), alts=(alt("R6", CAL, cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-pt-nas-proximas-2-semanas", "O que sai nas próximas 2 semanas?", "nas próximas 2 semanas", "R6",
         (iso(NOW), wall(NOW, weeks=2)), alts=(alt("R6", CAL, cal_ahead(NOW, THIS_WEEK, 2, "weeks")),)),
    case("R6-pt-dentro-dos-proximos-3-dias", "Corrigir dentro dos próximos 3 dias",
         "dentro dos próximos 3 dias", "R6", (iso(NOW), wall(NOW, days=3)),
         alts=(alt("R6", CAL, cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-pt-as-proximas-48-horas", "Tickets a tratar nas próximas 48 horas", "nas próximas 48 horas",
         "R6", (iso(NOW), elapsed(NOW, hours=48)),
         alts=(alt("R6", CAL, (elapsed(floor_hour(NOW), hours=1), elapsed(floor_hour(NOW), hours=49))),)),
    case("R6-pt-calendar-policy-reads-whole-days", "O que vence nos próximos 3 dias?",
         "nos próximos 3 dias", "R6", cal_ahead(NOW, TODAY, 3, "days"),
         alts=(alt("R6", ROLL, (iso(NOW), wall(NOW, days=3))),), window_reading="calendar"),
]

R7 = [
    case("R7-pt-desde-marco", "Bugs fechados desde março", "desde março", "R7", since(MARCH), "2026-03-01/..",
         alts=(alt("R7", "bias=future", since(MARCH_NEXT)),)),
    case("R7-pt-desde-a-semana-passada", "O que entregamos desde a semana passada?",
         "desde a semana passada", "R7", since(week(TODAY + D(weeks=-1))), "2026-11-23/.."),
    case("R7-pt-desde-2024", "Tickets abertos desde 2024", "desde 2024", "R7", since(year(2024))),
    case("R7-pt-desde-ontem", "Comentários desde ontem", "desde ontem", "R7", since(day(TODAY + D(days=-1)))),
    case("R7-pt-desde-segunda", "Commits desde segunda", "desde segunda", "R7", since(MONDAY),
         alts=(alt("R7", "bias=future", since(MONDAY_NEXT)),)),
    case("R7-pt-a-partir-de-14-de-marco-de-2025", "Deploys a partir de 14 de março de 2025",
         "a partir de 14 de março de 2025", "R7", since(day(date(2025, 3, 14))), "2025-03-14/.."),
    case("R7-pt-de-marco-em-diante", "Bugs de março em diante", "de março em diante", "R7", since(MARCH),
         alts=(alt("R7", "bias=future", since(MARCH_NEXT)),)),
]

R8 = [
    case("R8-pt-depois-de-marco", "Bugs abertos depois de março", "depois de março", "R8", after(MARCH),
         "2026-04-01/..", alts=(alt("R8", "bias=future", after(MARCH_NEXT)),)),
    case("R8-pt-apos-2025", "Tickets com prazo após 2025", "após 2025", "R8", after(year(2025))),
    case("R8-pt-depois-da-semana-passada", "Reabertos depois da semana passada",
         "depois da semana passada", "R8", after(week(TODAY + D(weeks=-1)))),
    case("R8-pt-apos-14-de-marco-de-2025", "Comentários após 14 de março de 2025",
         "após 14 de março de 2025", "R8", after(day(date(2025, 3, 14)))),
]

R9 = [
    case("R9-pt-antes-de-2025", "Tickets fechados antes de 2025", "antes de 2025", "R9", before(year(2025)),
         "../2024-12-31"),
    case("R9-pt-antes-de-marco", "Bugs abertos antes de março", "antes de março", "R9", before(MARCH),
         alts=(alt("R9", "bias=future", before(MARCH_NEXT)),)),
    case("R9-pt-antes-de-14-de-marco-de-2025", "Tickets criados antes de 14 de março de 2025",
         "antes de 14 de março de 2025", "R9", before(day(date(2025, 3, 14)))),
    case("R9-pt-antes-da-proxima-semana", "Entregar antes da próxima semana", "antes da próxima semana",
         "R9", before(week(TODAY + D(weeks=1)))),
]

R10 = [
    case("R10-pt-ate-sexta-deadline-looks-ahead", "O que precisa ser corrigido até sexta?", "até sexta",
         "R10", until(FRIDAY), alts=(alt("R10", None, until(FRIDAY_PAST)),)),
    case("R10-pt-ate-sexta-feira", "Congelar merges até sexta-feira", "até sexta-feira", "R10",
         until(FRIDAY), alts=(alt("R10", None, until(FRIDAY_PAST)),)),
    case("R10-pt-ate-o-dia-15-de-marco-de-2026", "Freeze até o dia 15 de março de 2026",
         "até o dia 15 de março de 2026", "R10", until(day(date(2026, 3, 15))), "../2026-03-15"),
    case("R10-pt_PT-ate-ao-dia-15-de-marco-de-2026", "Freeze até ao dia 15 de março de 2026",
         "até ao dia 15 de março de 2026", "R10", until(day(date(2026, 3, 15)))),
    case("R10-pt-ate-2025", "Tickets abertos até 2025", "até 2025", "R10", until(year(2025))),
]

R11 = [
    case("R11-pt-entre-marco-e-maio", "Bugs abertos entre março e maio", "entre março e maio", "R11",
         joined(MARCH, month(2026, 5)), "2026-03-01/2026-05-31",
         alts=(alt("R11", "bias=future", joined(MARCH_NEXT, month(2027, 5))),)),
    case("R11-pt-de-novembro-a-fevereiro-rolls-into-the-next-year", "Plantões de novembro a fevereiro",
         "de novembro a fevereiro", "R11", joined(month(2026, 11), month(2027, 2)), "2026-11-01/2027-02-28",
         alts=(alt("R11", "bias=future", joined(month(2027, 11), month(2028, 2))),)),
    case("R11-pt-de-1-a-15-de-marco", "Incidentes de 1 a 15 de março", "de 1 a 15 de março", "R11",
         MARCH_1_15, "2026-03-01/2026-03-15", alts=(alt("R11", "bias=future", MARCH_1_15_NEXT),)),
    case("R11-pt-entre-1-e-15-de-marco", "Incidentes entre 1 e 15 de março", "entre 1 e 15 de março", "R11",
         MARCH_1_15, alts=(alt("R11", "bias=future", MARCH_1_15_NEXT),)),
    case("R11-pt-entre-o-dia-1-e-o-dia-15-de-marco", "Incidentes entre o dia 1 e o dia 15 de março",
         "entre o dia 1 e o dia 15 de março", "R11", MARCH_1_15, alts=(alt("R11", "bias=future", MARCH_1_15_NEXT),)),
    case("R11-pt-do-dia-1-ao-dia-15-de-marco", "Incidentes do dia 1 ao dia 15 de março",
         "do dia 1 ao dia 15 de março", "R11", MARCH_1_15, alts=(alt("R11", "bias=future", MARCH_1_15_NEXT),)),
    case("R11-pt-desde-marco-ate-maio", "Sprints desde março até maio", "desde março até maio", "R11",
         joined(MARCH, month(2026, 5)), alts=(alt("R11", "bias=future", joined(MARCH_NEXT, month(2027, 5))),)),
    case("R11-pt-de-segunda-a-quarta", "Bugs abertos de segunda a quarta", "de segunda a quarta", "R11",
         joined(MONDAY, day(on_or_after(on_or_before(TODAY, MO), WE))),
         alts=(alt("R11", "bias=future", joined(MONDAY_NEXT, day(on_or_after(on_or_after(TODAY, MO), WE)))),)),
    case("R11-pt-de-2024-a-2025", "Incidentes de 2024 a 2025", "de 2024 a 2025", "R11",
         joined(year(2024), year(2025)), "2024-01-01/2025-12-31"),
]

_MARCH_14 = day(date(most_recent_year(lambda y: date(y, 3, 14)), 3, 14))
_MARCH_14_NEXT = day(date(next_year_after(lambda y: date(y, 3, 15)), 3, 14))
R12 = [
    case("R12-pt-em-marco", "Bugs abertos em março", "em março", "R12", MARCH, "2026-03",
         alts=(alt("R12", "bias=future", MARCH_NEXT),)),
    case("R12-pt-em-14-de-marco", "O que quebrou em 14 de março?", "em 14 de março", "R12", _MARCH_14,
         alts=(alt("R12", "bias=future", _MARCH_14_NEXT),)),
    case("R12-pt-no-dia-14-de-marco", "O que quebrou no dia 14 de março?", "no dia 14 de março", "R12",
         _MARCH_14, alts=(alt("R12", "bias=future", _MARCH_14_NEXT),)),
    case("R12-pt-no-mes-de-junho", "Tickets fechados no mês de junho", "no mês de junho", "R12",
         month(2026, 6), alts=(alt("R12", "bias=future", month(2027, 6)),)),
    case("R12-pt-em-dezembro-the-current-month-counts", "Tickets fechados em dezembro", "em dezembro",
         "R12", month(2026, 12), "2026-12"),
    case("R12-pt-no-T3", "Qual foi a velocidade no T3?", "no T3", "R12", quarter(2026, 3), "2026-Q3",
         alts=(alt("R12", "bias=future", quarter(2027, 3)),)),
    case("R12-pt-no-3o-trimestre", "Bugs do 3º trimestre", "do 3º trimestre", "R12", quarter(2026, 3),
         alts=(alt("R12", "bias=future", quarter(2027, 3)),)),
    case("R12-pt-o-primeiro-trimestre", "Metas para o primeiro trimestre", "o primeiro trimestre", "R12",
         quarter(2026, 1), alts=(alt("R12", "bias=future", quarter(2027, 1)),)),
    case("R12-pt-a-segunda-metade-do-ano-is-no-monday", "Plano para a segunda metade do ano",
         "a segunda metade do ano", "R12", half(2026, 2), "2026-H2"),
    case("R12-pt-bias-future-picks-next-march", "Bugs abertos em março", "em março", "R12", MARCH_NEXT,
         alts=(alt("R12", "bias=past", MARCH),), bias="future"),
]

R13 = [
    case("R13-pt-segunda-feira", "O que quebrou segunda-feira?", "segunda-feira", "R13", MONDAY,
         alts=(alt("R13", "bias=future", MONDAY_NEXT),)),
    case("R13-pt-na-segunda-short-name-with-a-cue", "O que quebrou na segunda?", "na segunda", "R13",
         MONDAY, alts=(alt("R13", "bias=future", MONDAY_NEXT),)),
    case("R13-pt-terca", "Bugs abertos terça", "terça", "R13", day(on_or_before(TODAY, TU)),
         alts=(alt("R13", "bias=future", day(on_or_after(TODAY, TU))),)),
    case("R13-pt-na-quarta-is-today", "Bugs abertos na quarta", "na quarta", "R13", day(TODAY)),
    case("R13-pt-no-sabado", "Deploys no sábado", "no sábado", "R13", day(on_or_before(TODAY, SA)),
         alts=(alt("R13", "bias=future", day(on_or_after(TODAY, SA))),)),
    case("R13-pt-para-sexta-due-looks-ahead", "O que está previsto para sexta?", "sexta", "R13", FRIDAY,
         alts=(alt("R13", None, FRIDAY_PAST),)),
    case("R13-pt-na-segunda-bias-future", "O que está previsto na segunda?", "na segunda", "R13",
         MONDAY_NEXT, alts=(alt("R13", "bias=past", MONDAY),), bias="future"),
]

R14 = [
    case("R14-pt-segunda-passada", "O que quebrou segunda passada?", "segunda passada", "R14",
         day(strictly_before(TODAY, MO)), alts=(alt("R16", "weekday_reading=week", day(in_week(TODAY, MO, -1))),)),
    case("R14-pt-na-sexta-feira-passada", "Tickets fechados na sexta-feira passada",
         "na sexta-feira passada", "R14", day(strictly_before(TODAY, FR))),
    case("R14-pt-a-ultima-sexta", "Deploys da última sexta", "da última sexta", "R14",
         day(strictly_before(TODAY, FR))),
    case("R14-pt-quarta-passada-on-a-Wednesday", "Deploys da quarta passada", "da quarta passada", "R14",
         day(strictly_before(TODAY, WE))),
    case("R14-pt-sabado-passado", "Incidentes do sábado passado", "do sábado passado", "R14",
         day(strictly_before(TODAY, SA)),
         alts=() if strictly_before(TODAY, SA) == in_week(TODAY, SA, -1) else
         (alt("R16", "weekday_reading=week", day(in_week(TODAY, SA, -1))),)),
    case("R14-pt-segunda-passada-week-policy-is-monday-of-last-week", "O que quebrou segunda passada?",
         "segunda passada", "R16", day(in_week(TODAY, MO, -1)),
         alts=(alt("R14", "weekday_reading=nearest", day(strictly_before(TODAY, MO))),), weekday_reading="week"),
]

R15 = [
    case("R15-pt-quinta-que-vem-is-tomorrow", "O que está planejado para quinta que vem?", "quinta que vem",
         "R15", day(strictly_after(TODAY, TH)), alts=(alt("R16", "weekday_reading=week", day(in_week(TODAY, TH, 1))),)),
    case("R15-pt-na-proxima-sexta", "Demo na próxima sexta", "na próxima sexta", "R15",
         day(strictly_after(TODAY, FR)), alts=(alt("R16", "weekday_reading=week", day(in_week(TODAY, FR, 1))),)),
    case("R15-pt-proxima-segunda-feira", "Revisão próxima segunda-feira", "próxima segunda-feira", "R15",
         day(strictly_after(TODAY, MO))),
    case("R15-pt-quinta-que-vem-week-policy", "O que está planejado para quinta que vem?", "quinta que vem",
         "R16", day(in_week(TODAY, TH, 1)),
         alts=(alt("R15", "weekday_reading=nearest", day(strictly_after(TODAY, TH))),), weekday_reading="week"),
]

R16 = [
    case("R16-pt-segunda-da-semana-passada", "O que quebrou na segunda da semana passada?",
         "na segunda da semana passada", "R16", day(in_week(TODAY, MO, -1))),
    case("R16-pt-sexta-da-proxima-semana", "Demo na sexta da próxima semana", "na sexta da próxima semana",
         "R16", day(in_week(TODAY, FR, 1))),
    case("R16-pt-terca-desta-semana", "Bugs abertos na terça desta semana", "na terça desta semana", "R16",
         day(in_week(TODAY, TU, 0)), alts=(alt("R15", None, day(on_or_after(TODAY, TU))),)),
    case("R16-pt-quinta-da-semana-que-vem", "Revisão na quinta da semana que vem",
         "na quinta da semana que vem", "R16", day(in_week(TODAY, TH, 1))),
    case("R16-pt-esta-segunda-feira-CLDR-this-week", "O que quebrou esta segunda-feira?",
         "esta segunda-feira", "R16", day(in_week(TODAY, MO, 0)), alts=(alt("R15", None, day(on_or_after(TODAY, MO))),)),
    case("R16-pt_BR-segunda-da-semana-passada-Sunday-weeks", "Incidentes na segunda da semana passada",
         "na segunda da semana passada", "R16", day(in_week(TODAY, MO, -1, first_weekday("pt_BR"))),
         locale="pt_BR"),
]

R17 = [
    case("R17-pt-em-2025", "Quantos bugs em 2025?", "em 2025", "R17", year(2025), "2025"),
    case("R17-pt-no-ano-de-2025", "Incidentes no ano de 2025", "no ano de 2025", "R17", year(2025)),
    case("R17-pt-durante-2023", "Releases durante 2023", "durante 2023", "R17", year(2023)),
    case("R17-pt-de-2025-beside-numbers", "Liste 5 tickets de prioridade 2 de 2025", "de 2025", "R17",
         year(2025)),
]

R18 = [
    case("R18-pt-14-de-marco-de-2025", "O que foi entregue em 14 de março de 2025?",
         "em 14 de março de 2025", "R18", day(date(2025, 3, 14)), "2025-03-14"),
    case("R18-pt-segunda-feira-14-de-marco-de-2022", "Incidente de segunda-feira, 14 de março de 2022",
         "de segunda-feira, 14 de março de 2022", "R18", day(date(2022, 3, 14))),
    case("R18-pt-1o-de-marco-de-2026", "Tickets criados em 1º de março de 2026", "em 1º de março de 2026",
         "R18", day(date(2026, 3, 1))),
    case("R18-pt-no-dia-15-de-marco-de-2026", "Tickets criados no dia 15 de março de 2026",
         "no dia 15 de março de 2026", "R18", day(date(2026, 3, 15))),
    case("R18-pt-ISO", "Deploy de 2025-03-14", "de 2025-03-14", "R18", day(date(2025, 3, 14))),
    case("R18-pt_BR-numeric-day-first", "Corrigido em 14/03/2025", "em 14/03/2025", "R18",
         day(read_numeric(14, 3, 2025, "pt_BR")), locale="pt_BR"),
    case("R18-pt_PT-numeric-ambiguous-day-first", "Corrigido em 03/04/2026", "em 03/04/2026", "R18",
         day(read_numeric(3, 4, 2026, "pt_PT")), alts=(alt("R18", "date_order=MDY", day(date(2026, 3, 4))),),
         locale="pt_PT"),
    case("R18-pt-en_US-locale-reads-month-first", "Corrigido em 03/04/2026", "em 03/04/2026", "R18",
         day(read_numeric(3, 4, 2026, "en_US")), alts=(alt("R18", "date_order=DMY", day(date(2026, 4, 3))),),
         locale="en_US"),
    case("R18-pt-date-order-policy-flips", "Corrigido em 03/04/2026", "em 03/04/2026", "R18",
         day(date(2026, 3, 4)), alts=(alt("R18", "date_order=DMY", day(date(2026, 4, 3))),),
         locale="pt_BR", date_order="MDY"),
]

R19 = [
    case("R19-pt-marco-de-2026", "Bugs de março de 2026", "de março de 2026", "R19", month(2026, 3), "2026-03"),
    case("R19-pt-T3-2025", "Receita T3 2025", "T3 2025", "R19", quarter(2025, 3), "2025-Q3"),
    case("R19-pt-o-terceiro-trimestre-de-2025", "Velocidade no terceiro trimestre de 2025",
         "no terceiro trimestre de 2025", "R19", quarter(2025, 3)),
    case("R19-pt-1o-semestre-de-2026", "Metas do 1º semestre de 2026", "do 1º semestre de 2026", "R19",
         half(2026, 1), "2026-H1"),
    case("R19-pt-o-primeiro-semestre-de-2026", "Orçamento do primeiro semestre de 2026",
         "do primeiro semestre de 2026", "R19", half(2026, 1)),
    case("R19-pt-a-primeira-metade-de-2026", "Roadmap para a primeira metade de 2026",
         "a primeira metade de 2026", "R19", half(2026, 1)),
    case("R19-pt-a-segunda-metade-de-2025-is-no-monday", "Incidentes na segunda metade de 2025",
         "na segunda metade de 2025", "R19", half(2025, 2), "2025-H2"),
]

R20 = [
    case("R20-pt-semana-48-past-bias", "Tickets da semana 48", "da semana 48", "R20", iso_week(2026, 48),
         "2026-W48", alts=(alt("R20", "bias=future", iso_week(2027, 48)),)),
    case("R20-pt-a-semana-48-de-2026", "Tickets da semana 48 de 2026", "da semana 48 de 2026", "R20",
         iso_week(2026, 48)),
    case("R20-pt-na-semana-5-de-2027", "Planejamento na semana 5 de 2027", "na semana 5 de 2027", "R20",
         iso_week(2027, 5), "2027-W05"),
    case("R20-pt-ISO-week", "Tickets da 2026-W48", "da 2026-W48", "R20", iso_week(2026, 48)),
    case("R20-pt_BR-ISO-week-starts-on-Monday-whatever-the-locale", "Tickets da semana 48 de 2026",
         "da semana 48 de 2026", "R20", iso_week(2026, 48), locale="pt_BR"),
]

_YEAR_START = iso(midnight(date(TODAY.year, 1, 1)))
R21 = [
    case("R21-pt-desde-o-inicio-do-ano", "Receita desde o início do ano", "desde o início do ano", "R21",
         (_YEAR_START, iso(NOW))),
    case("R21-pt-desde-o-comeco-do-mes", "Bugs desde o começo do mês", "desde o começo do mês", "R21",
         (iso(midnight(THIS_MONTH)), iso(NOW))),
    case("R21-pt-desde-o-inicio-da-semana", "Tickets desde o início da semana", "desde o início da semana",
         "R21", (iso(midnight(THIS_WEEK)), iso(NOW))),
    case("R21-pt-este-ano-ate-agora", "Incidentes este ano até agora", "este ano até agora", "R21",
         (_YEAR_START, iso(NOW))),
    case("R21-pt-no-acumulado-do-trimestre", "Vendas no acumulado do trimestre", "no acumulado do trimestre",
         "R21", (iso(midnight(date(2026, 10, 1))), iso(NOW))),
]

R22 = [
    case("R22-pt-hoje-de-manha", "O que quebrou hoje de manhã?", "hoje de manhã", "R22",
         day_period("pt", TODAY, "morning1")),
    case("R22-pt-esta-manha", "O que quebrou esta manhã?", "esta manhã", "R22", day_period("pt", TODAY, "morning1")),
    case("R22-pt-ontem-a-tarde", "Alertas de ontem à tarde", "de ontem à tarde", "R22",
         day_period("pt", TODAY + D(days=-1), "afternoon1")),
    case("R22-pt-ontem-a-noite", "O que falhou ontem à noite?", "ontem à noite", "R22",
         day_period("pt", TODAY + D(days=-1), "evening1")),
    case("R22-pt-amanha-de-manha", "Revisão amanhã de manhã", "amanhã de manhã", "R22",
         day_period("pt", TODAY + D(days=1), "morning1")),
    case("R22-pt-hoje-a-noite", "Manutenção hoje à noite", "hoje à noite", "R22",
         day_period("pt", TODAY, "evening1")),
    case("R22-pt-esta-noite", "Manutenção esta noite", "esta noite", "R22", day_period("pt", TODAY, "evening1")),
    case("R22-pt-esta-madrugada", "Jobs que falharam esta madrugada", "esta madrugada", "R22",
         day_period("pt", TODAY, "night1")),
    case("R22-pt-ontem-pela-manha", "Erros ontem pela manhã", "ontem pela manhã", "R22",
         day_period("pt", TODAY + D(days=-1), "morning1")),
]

_BR, _PT = "pt_BR", "pt_PT"
R23 = [
    case("R23-pt-este-fim-de-semana-on-a-Wednesday", "Deploys este fim de semana", "este fim de semana",
         "R23", weekend(first_open_weekend(TODAY, _BR), _BR), weekend_value(first_open_weekend(TODAY, _BR), _BR),
         locale=_BR),
    case("R23-pt-o-fim-de-semana-passado", "Incidentes do fim de semana passado", "do fim de semana passado",
         "R23", weekend(last_ended_weekend(TODAY, _BR), _BR), locale=_BR),
    case("R23-pt-no-proximo-fim-de-semana", "Manutenção no próximo fim de semana", "no próximo fim de semana",
         "R23", weekend(first_open_weekend(TODAY, _BR) + D(weeks=1), _BR),
         alts=(alt("R23", None, weekend(first_open_weekend(TODAY, _BR), _BR)),), locale=_BR),
    case("R23-pt-no-fim-de-semana-past-bias", "O que quebrou no fim de semana?", "no fim de semana", "R23",
         weekend(last_ended_weekend(TODAY, _BR), _BR),
         alts=(alt("R23", "bias=future", weekend(first_open_weekend(TODAY, _BR), _BR)),), locale=_BR),
    case("R23-pt_PT-este-fim-de-semana-on-a-Saturday", "Deploys este fim de semana", "este fim de semana",
         "R23", weekend(first_open_weekend(SATURDAY.date(), _PT), _PT), now=SATURDAY, locale=_PT),
    case("R23-pt_PT-o-ultimo-fim-de-semana-on-a-Sunday", "Incidentes no último fim de semana",
         "no último fim de semana", "R23", weekend(last_ended_weekend(SUNDAY.date(), _PT), _PT), now=SUNDAY,
         locale=_PT),
    case("R23-pt-no-fim-de-semana-que-vem", "Plantão no fim de semana que vem", "no fim de semana que vem",
         "R23", weekend(first_open_weekend(TODAY, _BR) + D(weeks=1), _BR),
         alts=(alt("R23", None, weekend(first_open_weekend(TODAY, _BR), _BR)),), locale=_BR),
    case("R23-pt-durante-o-fim-de-semana-bias-future", "O que roda durante o fim de semana?",
         "durante o fim de semana", "R23", weekend(first_open_weekend(TODAY, _BR), _BR),
         alts=(alt("R23", "bias=past", weekend(last_ended_weekend(TODAY, _BR), _BR)),), locale=_BR,
         bias="future"),
]

DURATIONS = [
    case("D-pt-ha-mais-de-3-dias", "Tickets abertos há mais de 3 dias", "3 dias", "D", (None, None), "P3D"),
    case("D-pt-durante-duas-semanas", "Bloqueado durante duas semanas", "durante duas semanas", "D",
         (None, None), "P2W"),
    case("D-pt-em-menos-de-4-horas", "Incidentes resolvidos em menos de 4 horas", "4 horas", "D",
         (None, None), "PT4H"),
]

PT_EN = ("pt", "en")
MIXED = [
    case("R2-pt+en-tickets-criados-last-week", "Quantos tickets criados last week?", "last week", "R2",
         week(TODAY + D(weeks=-1)), languages=PT_EN),
    case("R2-pt+en-show-bugs-da-semana-passada", "show bugs da semana passada", "da semana passada", "R2",
         week(TODAY + D(weeks=-1)), languages=PT_EN),
    case("R1-pt+en-closed-ontem", "which tickets were closed ontem", "ontem", "R1", day(TODAY + D(days=-1)),
         languages=PT_EN),
    case("R7-pt+en-list-bugs-desde-marco", "list bugs desde março", "desde março", "R7", since(MARCH),
         alts=(alt("R7", "bias=future", since(MARCH_NEXT)),), languages=PT_EN),
    case("R7-pt+en-bugs-criados-since-Monday", "bugs criados since Monday", "since Monday", "R7",
         since(MONDAY), alts=(alt("R7", "bias=future", since(MONDAY_NEXT)),), languages=PT_EN),
    case("R22-pt+en-deploys-previstos-amanha-de-manha", "deploys previstos amanhã de manhã",
         "amanhã de manhã", "R22", day_period("pt", TODAY + D(days=1), "morning1"), languages=PT_EN),
    case("R3-pt+en-open-tickets-ha-3-dias", "open tickets há 3 dias", "há 3 dias", "R3",
         day(TODAY + D(days=-3)), languages=PT_EN),
    case("R2-pt+en-PRs-mergeados-this-week", "PRs mergeados this week", "this week", "R2", week(TODAY),
         languages=PT_EN),
    case("R11-pt+en-incidents-de-1-a-15-de-marco", "incidents de 1 a 15 de março", "de 1 a 15 de março",
         "R11", MARCH_1_15, alts=(alt("R11", "bias=future", MARCH_1_15_NEXT),), languages=PT_EN),
    case("R10-pt+en-fix-it-ate-sexta", "fix it até sexta", "até sexta", "R10", until(FRIDAY),
         alts=(alt("R10", None, until(FRIDAY_PAST)),), languages=PT_EN),
]

TABLES = {
    "R1": R1, "R2": R2, "R3": R3, "R4": R4, "R5": R5, "R6": R6, "R7": R7, "R8": R8, "R9": R9,
    "R10": R10, "R11": R11, "R12": R12, "R13": R13, "R14": R14, "R15": R15, "R16": R16,
    "R17": R17, "R18": R18, "R19": R19, "R20": R20, "R21": R21, "R22": R22, "R23": R23,
}


@pytest.mark.parametrize(PARAMS, [row for rows in TABLES.values() for row in rows])
def test_portuguese_phrase_resolves_to_its_reading_and_interval(question, phrase, reading, bounds, value,
                                                                alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, DURATIONS)
def test_portuguese_length_of_time_after_a_cue_is_an_iso_duration(question, phrase, reading, bounds,
                                                                  value, alts, context):
    m = one(question, **context)
    assert (m.text, m.reading, m.kind, m.value) == (phrase, "D", "duration", value)
    assert (m.start, m.end) == bounds


@pytest.mark.parametrize(PARAMS, MIXED)
def test_question_mixing_portuguese_and_english_finds_the_phrase(question, phrase, reading, bounds,
                                                                 value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


def test_every_reading_has_at_least_three_portuguese_examples():
    assert all(len(rows) >= 3 for rows in TABLES.values()), {k: len(v) for k, v in TABLES.items()}
    assert len(MIXED) >= 8


@pytest.mark.parametrize("locale", ["pt_BR", "pt_PT", "pt"])
def test_portuguese_week_start_is_the_cldr_first_day_of_the_locale(locale):
    m = one("Tickets criados esta semana", languages=("pt",), locale=locale)
    assert (m.start, m.end) == week(TODAY, first_weekday(locale))


# Look-alikes: Portuguese questions whose words look temporal but are not (reading N).
TRAPS = [
    ("N-pt-a-segunda-versao", "Quem revisou a segunda versão?"),
    ("N-pt-na-segunda-vez", "Falhou na segunda vez"),
    ("N-pt-da-segunda-versao", "Bugs da segunda versão"),
    ("N-pt-segunda-opcao", "A segunda opção é melhor"),
    ("N-pt-na-quinta-tentativa", "Passou na quinta tentativa"),
    ("N-pt-a-sexta-parte", "A sexta parte dos testes"),
    ("N-pt-quarta-fase", "Tarefas da quarta fase"),
    ("N-pt-o-segundo-ticket", "O segundo ticket da lista"),
    ("N-pt-um-segundo", "Espera um segundo"),
    ("N-pt-em-segundo-lugar", "Em segundo lugar, o design"),
    ("N-pt-o-mar", "Sensores do mar"),
    ("N-pt-set-de-testes", "O set de testes falha"),
    ("N-pt-dez-tickets", "Dez tickets abertos"),
    ("N-pt-3-out-of-5", "3 out 5 builds"),
    ("N-pt-de-manha-cedo-is-no-tomorrow", "A manhã foi calma"),
    ("N-pt-tarde-demais", "O build chegou tarde demais"),
    ("N-pt-prioridade-2", "Tickets com prioridade 2"),
    ("N-pt-versao-2025.1", "Bugs na versão 2025.1"),
    ("N-pt-ticket-2025", "Quem tem o ticket 2025?"),
    ("N-pt-2025-tickets-no-cue", "2025 tickets abertos"),
    ("N-pt-sprint-12", "Bugs da sprint 12"),
    ("N-pt-top-10", "Top 10 dos contribuidores"),
    ("N-pt-5-pontos", "Tarefas de 5 pontos"),
    ("N-pt-build-2024", "Quem quebrou o build 2024?"),
    ("N-pt-erro-404", "Relatórios de erro 404"),
    ("N-pt-pagina-3", "Página 3 do relatório"),
    ("N-pt-os-2-ultimos-tickets", "Os 2 últimos tickets"),
    ("N-pt-o-ultimo-comentario", "O último comentário do ticket"),
    ("N-pt-o-proximo-passo", "O próximo passo da equipe"),
    ("N-pt-a-ultima-versao", "Bugs da última versão"),
    ("N-pt-um-dia", "Um dia faremos isso"),
    ("N-pt-todos-os-dias", "Reunião todos os dias"),
    ("N-pt-dia-a-dia", "Acompanhamento dia a dia"),
    ("N-pt-horas-extras", "As horas extras da equipe"),
    ("N-pt-em-3-passos", "Deploy em 3 passos"),
    ("N-pt-Marte", "Missão a Marte"),
    ("N-pt-o-primeiro-ticket", "O primeiro ticket da lista"),
    ("N-pt-a-metade-dos-testes", "A metade dos testes falha"),
    ("N-pt-numero-48", "Ticket número 48"),
    ("N-pt-ha-3-bugs", "Há 3 bugs abertos"),
]


@pytest.mark.parametrize(("question",), [(q,) for _, q in TRAPS], ids=[i for i, _ in TRAPS])
def test_portuguese_look_alike_gives_no_temporal_mention(question):
    result = run(question, languages=("pt",))
    assert result.mentions == ()
    assert result.rewritten == question


@pytest.mark.parametrize(("question", "phrase"), [
    ("O que quebrou na segunda?", "na segunda"),
    ("O que quebrou segunda-feira?", "segunda-feira"),
    ("Reunião até sexta", "até sexta"),
    ("Deploy de quinta", "de quinta"),
], ids=["R13-pt-na-segunda", "R13-pt-segunda-feira", "R10-pt-ate-sexta", "R13-pt-de-quinta"])
def test_portuguese_short_weekday_with_a_cue_is_still_a_weekday(question, phrase):
    assert one(question, languages=("pt",)).text == phrase


def test_there_are_at_least_twenty_five_portuguese_traps():
    assert len(TRAPS) >= 25
