"""Spanish: the reading contract R1-R23 (and D) on Spanish work-tracker questions, the policies,
numeric dates in the CLDR order of Spanish locales, questions mixing Spanish and English, and
look-alike words that must give no mention.

Checked against:
- python-dateutil ``relativedelta``, stdlib ``calendar`` and ``date.fromisocalendar`` (the
  oracles of tests/locales/romance_oracles.py): every expected start and end;
- CLDR 49 via babel 2.19: Spanish day-period rules (``Locale("es").day_period_rules``:
  madrugada 00:00-06:00, mañana 06:00-12:00, tarde 12:00-20:00, noche 20:00-24:00), week data
  of es_ES and es_MX (first day, weekend) and the short date format order (es_ES day first,
  en_US month first);
- the worked example sentences are written from knowledge of the language (no published
  source);
- common practice (no published source): "el lunes pasado" is the most recent Monday before
  today and "el próximo jueves" the first Thursday after it; "desde hace 3 días" is the last
  three days up to now; "hasta el viernes" and "para el viernes" look ahead to the coming
  Friday; "anoche" is yesterday's noche; "en lo que va del año" is the year to date; "mañana"
  alone is tomorrow but "la mañana" is the morning; month and weekday names are written in
  lower case, so a capitalised "Julio" or "Domingo" mid-sentence is a person.
"""

from __future__ import annotations

from datetime import date

import pytest

from tests.helpers import NOW, TODAY, one, run
from tests.locales.romance_oracles import (
    D, FR, JANUARY_END, MARCH_FIRST, MO, MONTH_END, PARAMS, QUARTER_PAST, SATURDAY, SPRING_BERLIN,
    SA, SU, SUNDAY, TH, TU, WE, after, alt, before, cal_ahead, cal_back, cases_for, check, day,
    day_period, elapsed, first_open_weekend, first_weekday, floor_hour, half, hour_of, in_week,
    iso, iso_week, iso_week_name, joined, last_ended_weekend, midnight, month, month_of, moved,
    most_recent_year, next_year_after, on_or_after, on_or_before, quarter, quarter_of,
    read_numeric, since, strictly_after, strictly_before, until, wall, week, week_start,
    weekend, weekend_value, year,
)

case = cases_for("es")
CAL, ROLL = "window_reading=calendar", "window_reading=rolling"
MARCH = month(most_recent_year(lambda y: date(y, 3, 1)), 3)
MARCH_NEXT = month(next_year_after(lambda y: date(y, 4, 1)), 3)
MONDAY, MONDAY_NEXT = day(on_or_before(TODAY, MO)), day(on_or_after(TODAY, MO))
THIS_WEEK, THIS_MONTH = week_start(TODAY), TODAY.replace(day=1)
FRIDAY, FRIDAY_PAST = day(on_or_after(TODAY, FR)), day(on_or_before(TODAY, FR))
MARCH_1_15 = joined(day(date(2026, 3, 1)), day(date(2026, 3, 15)))
MARCH_1_15_NEXT = joined(day(date(2027, 3, 1)), day(date(2027, 3, 15)))

R1 = [
    case("R1-es-ayer", "¿Qué bugs se cerraron ayer?", "ayer", "R1", day(TODAY + D(days=-1)),
         (TODAY + D(days=-1)).isoformat()),
    case("R1-es-hoy", "¿Qué se desplegó hoy?", "hoy", "R1", day(TODAY), TODAY.isoformat()),
    case("R1-es-manana-is-tomorrow", "¿Qué tareas vencen mañana?", "mañana", "R1",
         day(TODAY + D(days=1))),
    case("R1-es-anteayer", "¿Quién reabrió tickets anteayer?", "anteayer", "R1",
         day(TODAY + D(days=-2))),
    case("R1-es-antes-de-ayer", "¿Quién reabrió tickets antes de ayer?", "antes de ayer", "R1",
         day(TODAY + D(days=-2))),
    case("R1-es-pasado-manana", "¿Qué está previsto pasado mañana?", "pasado mañana", "R1",
         day(TODAY + D(days=2))),
    case("R1-es-ayer-across-a-month-start", "¿Quién comentó ayer?", "ayer", "R1",
         day(MARCH_FIRST.date() + D(days=-1)), "2026-02-28", now=MARCH_FIRST),
]

R2 = [
    case("R2-es-la-semana-pasada", "¿Qué tickets se crearon la semana pasada?", "la semana pasada",
         "R2", week(TODAY + D(weeks=-1)), iso_week_name(TODAY + D(weeks=-1))),
    case("R2-es-esta-semana", "¿Qué entregamos esta semana?", "esta semana", "R2", week(TODAY),
         iso_week_name(TODAY)),
    case("R2-es-la-proxima-semana", "¿Qué está planificado la próxima semana?", "la próxima semana",
         "R2", week(TODAY + D(weeks=1))),
    case("R2-es-la-semana-que-viene", "¿Qué está planificado la semana que viene?",
         "la semana que viene", "R2", week(TODAY + D(weeks=1))),
    case("R2-es-el-mes-pasado", "¿Cuántos bugs se corrigieron el mes pasado?", "el mes pasado", "R2",
         month_of(TODAY + D(months=-1)), "2026-11"),
    case("R2-es-el-mes-pasado-at-a-month-end", "Bugs corregidos el mes pasado", "el mes pasado", "R2",
         month_of(MONTH_END.date() + D(months=-1)), "2026-02", now=MONTH_END),
    case("R2-es-este-mes", "Tickets cerrados este mes", "este mes", "R2", month_of(TODAY), "2026-12"),
    case("R2-es-el-mes-en-curso", "Tickets cerrados en el mes en curso", "en el mes en curso", "R2",
         month_of(TODAY)),
    case("R2-es-el-trimestre-pasado", "¿Cuál fue la velocidad el trimestre pasado?",
         "el trimestre pasado", "R2", quarter_of(TODAY + D(months=-3)), "2026-Q3"),
    case("R2-es-este-trimestre", "¿Quién cerró más tickets este trimestre?", "este trimestre", "R2",
         quarter_of(TODAY), "2026-Q4"),
    case("R2-es-el-proximo-ano", "¿Qué épicas están previstas el próximo año?", "el próximo año",
         "R2", year(TODAY.year + 1), "2027"),
    case("R2-es-el-ano-que-viene", "Épicas para el año que viene", "el año que viene", "R2",
         year(TODAY.year + 1)),
    case("R2-es-el-ano-anterior", "Incidentes del año anterior", "del año anterior", "R2",
         year(TODAY.year - 1), "2025"),
    case("R2-es_ES-esta-semana-starts-on-CLDR-Monday", "Tickets creados esta semana", "esta semana",
         "R2", week(TODAY, first_weekday("es_ES")), locale="es_ES"),
    case("R2-es_MX-esta-semana-starts-on-CLDR-Sunday", "Tickets creados esta semana", "esta semana",
         "R2", week(TODAY, first_weekday("es_MX")), locale="es_MX"),
    case("R2-es-la-semana-pasada-on-a-Sunday", "Tickets cerrados la semana pasada",
         "la semana pasada", "R2", week(SUNDAY.date() + D(weeks=-1)), now=SUNDAY),
]

R3 = [
    case("R3-es-hace-3-dias", "¿Qué bugs se abrieron hace 3 días?", "hace 3 días", "R3",
         day(TODAY + D(days=-3))),
    case("R3-es-hace-tres-semanas", "Tickets abiertos hace tres semanas", "hace tres semanas", "R3",
         week(TODAY + D(weeks=-3)), iso_week_name(TODAY + D(weeks=-3))),
    case("R3-es-hace-un-mes-at-a-month-end", "¿Qué se fusionó hace un mes?", "hace un mes", "R3",
         month_of((MONTH_END + D(months=-1)).date()), "2026-02", now=MONTH_END),
    case("R3-es-hace-dos-anos", "Bugs abiertos hace dos años", "hace dos años", "R3",
         year(TODAY.year - 2), "2024"),
    case("R3-es-hace-2-horas", "Alertas de hace 2 horas", "de hace 2 horas", "R3",
         hour_of(moved(NOW, hours=-2)), f"{hour_of(moved(NOW, hours=-2))[0]}/PT1H"),
    case("R3-es-hace-5-minutos", "Builds lanzados hace 5 minutos", "hace 5 minutos", "R3",
         (elapsed(NOW, minutes=-5), elapsed(NOW, minutes=-4))),
    case("R3-es-hace-una-semana", "Tickets abiertos hace una semana", "hace una semana", "R3",
         week(TODAY + D(weeks=-1))),
]

R4 = [
    case("R4-es-dentro-de-3-dias", "¿Qué vence dentro de 3 días?", "dentro de 3 días", "R4",
         day(TODAY + D(days=3))),
    case("R4-es-en-dos-semanas", "¿Qué se entrega en dos semanas?", "en dos semanas", "R4",
         week(TODAY + D(weeks=2)), iso_week_name(TODAY + D(weeks=2))),
    case("R4-es-dentro-de-un-mes-from-January-31", "¿Qué contratos se renuevan dentro de un mes?",
         "dentro de un mes", "R4", month_of((JANUARY_END + D(months=1)).date()), "2026-02",
         now=JANUARY_END),
    case("R4-es-dentro-de-2-horas", "¿Qué jobs corren dentro de 2 horas?", "dentro de 2 horas", "R4",
         hour_of(moved(NOW, hours=2))),
    case("R4-es-dentro-de-un-ano", "Contratos que vencen dentro de un año", "dentro de un año", "R4",
         year(TODAY.year + 1)),
]

R5 = [
    case("R5-es-los-ultimos-7-dias", "¿Cuántos bugs se abrieron los últimos 7 días?",
         "los últimos 7 días", "R5", (wall(NOW, days=-7), iso(NOW)),
         alts=(alt("R5", CAL, cal_back(NOW, TODAY, 7, "days")),)),
    case("R5-es-en-los-ultimos-3-meses", "Tickets cerrados en los últimos 3 meses",
         "en los últimos 3 meses", "R5", (wall(NOW, months=-3), iso(NOW)),
         alts=(alt("R5", CAL, cal_back(NOW, THIS_MONTH, 3, "months")),)),
    case("R5-es-durante-las-ultimas-2-semanas", "Bugs reportados durante las últimas 2 semanas",
         "durante las últimas 2 semanas", "R5", (wall(NOW, weeks=-2), iso(NOW)),
         alts=(alt("R5", CAL, cal_back(NOW, THIS_WEEK, 2, "weeks")),)),
    case("R5-es-los-ultimos-treinta-dias", "Comentarios de los últimos treinta días",
         "de los últimos treinta días", "R5", (wall(NOW, days=-30), iso(NOW)),
         alts=(alt("R5", CAL, cal_back(NOW, TODAY, 30, "days")),)),
    case("R5-es-los-7-ultimos-dias", "Despliegues de los 7 últimos días", "de los 7 últimos días",
         "R5", (wall(NOW, days=-7), iso(NOW)), alts=(alt("R5", CAL, cal_back(NOW, TODAY, 7, "days")),)),
    case("R5-es-la-ultima-semana-no-N-is-one-unit", "Bugs abiertos la última semana",
         "la última semana", "R5", (wall(NOW, weeks=-1), iso(NOW)),
         alts=(alt("R5", CAL, cal_back(NOW, THIS_WEEK, 1, "weeks")),)),
    case("R5-es-el-ultimo-mes-at-a-month-end", "Fusiones en el último mes", "en el último mes", "R5",
         (wall(MONTH_END, months=-1), iso(MONTH_END)),
         alts=(alt("R5", CAL, cal_back(MONTH_END, date(2026, 3, 1), 1, "months")),), now=MONTH_END),
    case("R5-es-desde-hace-3-dias", "¿Qué tickets están bloqueados desde hace 3 días?",
         "desde hace 3 días", "R5", (wall(NOW, days=-3), iso(NOW)),
         alts=(alt("R5", CAL, cal_back(NOW, TODAY, 3, "days")),)),
    case("R5-es-las-ultimas-24-horas-are-real-hours-Berlin-spring", "Errores de las últimas 24 horas",
         "de las últimas 24 horas", "R5", (elapsed(SPRING_BERLIN, hours=-24), iso(SPRING_BERLIN)),
         now=SPRING_BERLIN),
    case("R5-es-las-ultimas-2-horas-off-the-hour", "Despliegues en las últimas 2 horas",
         "en las últimas 2 horas", "R5", (elapsed(QUARTER_PAST, hours=-2), iso(QUARTER_PAST)),
         alts=(alt("R5", CAL, (elapsed(floor_hour(QUARTER_PAST), hours=-2),
                               iso(floor_hour(QUARTER_PAST)))),), now=QUARTER_PAST),
    case("R5-es-calendar-policy-reads-whole-days", "Bugs de los últimos 7 días",
         "de los últimos 7 días", "R5", cal_back(NOW, TODAY, 7, "days"),
         alts=(alt("R5", ROLL, (wall(NOW, days=-7), iso(NOW))),), window_reading="calendar"),
]

R6 = [
    case("R6-es-los-proximos-3-dias", "¿Qué vence los próximos 3 días?", "los próximos 3 días", "R6",
         (iso(NOW), wall(NOW, days=3)), alts=(alt("R6", CAL, cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-es-en-las-proximas-2-semanas", "¿Qué sale en las próximas 2 semanas?",
         "en las próximas 2 semanas", "R6", (iso(NOW), wall(NOW, weeks=2)),
         alts=(alt("R6", CAL, cal_ahead(NOW, THIS_WEEK, 2, "weeks")),)),
    case("R6-es-dentro-de-los-proximos-3-dias", "Corregir dentro de los próximos 3 días",
         "dentro de los próximos 3 días", "R6", (iso(NOW), wall(NOW, days=3)),
         alts=(alt("R6", CAL, cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-es-durante-las-proximas-48-horas", "Tickets a atender durante las próximas 48 horas",
         "durante las próximas 48 horas", "R6", (iso(NOW), elapsed(NOW, hours=48)),
         alts=(alt("R6", CAL, (elapsed(floor_hour(NOW), hours=1), elapsed(floor_hour(NOW), hours=49))),)),
    case("R6-es-los-3-dias-que-vienen", "Entregas de los 3 días que vienen", "de los 3 días que vienen",
         "R6", (iso(NOW), wall(NOW, days=3)), alts=(alt("R6", CAL, cal_ahead(NOW, TODAY, 3, "days")),)),
    case("R6-es-calendar-policy-reads-whole-days", "¿Qué vence los próximos 3 días?",
         "los próximos 3 días", "R6", cal_ahead(NOW, TODAY, 3, "days"),
         alts=(alt("R6", ROLL, (iso(NOW), wall(NOW, days=3))),), window_reading="calendar"),
]

R7 = [
    case("R7-es-desde-marzo", "Bugs cerrados desde marzo", "desde marzo", "R7", since(MARCH),
         "2026-03-01/..", alts=(alt("R7", "bias=future", since(MARCH_NEXT)),)),
    case("R7-es-desde-la-semana-pasada", "¿Qué entregamos desde la semana pasada?",
         "desde la semana pasada", "R7", since(week(TODAY + D(weeks=-1))), "2026-11-23/.."),
    case("R7-es-desde-2024", "Tickets abiertos desde 2024", "desde 2024", "R7", since(year(2024))),
    case("R7-es-desde-ayer", "Comentarios desde ayer", "desde ayer", "R7", since(day(TODAY + D(days=-1)))),
    case("R7-es-desde-el-lunes", "Commits desde el lunes", "desde el lunes", "R7", since(MONDAY),
         alts=(alt("R7", "bias=future", since(MONDAY_NEXT)),)),
    case("R7-es-a-partir-del-14-de-marzo-de-2025", "Despliegues a partir del 14 de marzo de 2025",
         "a partir del 14 de marzo de 2025", "R7", since(day(date(2025, 3, 14))), "2025-03-14/.."),
    case("R7-es-de-marzo-en-adelante", "Bugs de marzo en adelante", "de marzo en adelante", "R7",
         since(MARCH), alts=(alt("R7", "bias=future", since(MARCH_NEXT)),)),
    case("R7-es-desde-una-fecha-ISO", "Despliegues desde el 2025-03-14", "desde el 2025-03-14", "R7",
         since(day(date(2025, 3, 14)))),
]

R8 = [
    case("R8-es-despues-de-marzo", "Bugs abiertos después de marzo", "después de marzo", "R8",
         after(MARCH), "2026-04-01/..", alts=(alt("R8", "bias=future", after(MARCH_NEXT)),)),
    case("R8-es-despues-de-2025", "Tickets con vencimiento después de 2025", "después de 2025", "R8",
         after(year(2025))),
    case("R8-es-despues-de-la-semana-pasada", "Reabiertos después de la semana pasada",
         "después de la semana pasada", "R8", after(week(TODAY + D(weeks=-1)))),
    case("R8-es-tras-el-14-de-marzo-de-2025", "Comentarios tras el 14 de marzo de 2025",
         "tras el 14 de marzo de 2025", "R8", after(day(date(2025, 3, 14)))),
]

R9 = [
    case("R9-es-antes-de-2025", "Tickets cerrados antes de 2025", "antes de 2025", "R9",
         before(year(2025)), "../2024-12-31"),
    case("R9-es-antes-de-marzo", "Bugs abiertos antes de marzo", "antes de marzo", "R9", before(MARCH),
         alts=(alt("R9", "bias=future", before(MARCH_NEXT)),)),
    case("R9-es-antes-del-14-de-marzo-de-2025", "Tickets creados antes del 14 de marzo de 2025",
         "antes del 14 de marzo de 2025", "R9", before(day(date(2025, 3, 14)))),
    case("R9-es-antes-de-la-proxima-semana", "Entregar antes de la próxima semana",
         "antes de la próxima semana", "R9", before(week(TODAY + D(weeks=1)))),
]

R10 = [
    case("R10-es-hasta-el-viernes-deadline-looks-ahead", "¿Qué hay que corregir hasta el viernes?",
         "hasta el viernes", "R10", until(FRIDAY), alts=(alt("R10", None, until(FRIDAY_PAST)),)),
    case("R10-es-a-mas-tardar-el-viernes", "Terminar a más tardar el viernes",
         "a más tardar el viernes", "R10", until(FRIDAY), alts=(alt("R10", None, until(FRIDAY_PAST)),)),
    case("R10-es-hasta-el-15-de-marzo-de-2026", "Congelación hasta el 15 de marzo de 2026",
         "hasta el 15 de marzo de 2026", "R10", until(day(date(2026, 3, 15))), "../2026-03-15"),
    case("R10-es-hasta-2025", "Tickets abiertos hasta 2025", "hasta 2025", "R10", until(year(2025))),
    case("R10-es-hasta-la-semana-pasada", "Bugs hasta la semana pasada", "hasta la semana pasada",
         "R10", until(week(TODAY + D(weeks=-1)))),
]

R11 = [
    case("R11-es-entre-marzo-y-mayo", "Bugs abiertos entre marzo y mayo", "entre marzo y mayo", "R11",
         joined(MARCH, month(2026, 5)), "2026-03-01/2026-05-31",
         alts=(alt("R11", "bias=future", joined(MARCH_NEXT, month(2027, 5))),)),
    case("R11-es-de-noviembre-a-febrero-rolls-into-the-next-year", "Guardias de noviembre a febrero",
         "de noviembre a febrero", "R11", joined(month(2026, 11), month(2027, 2)), "2026-11-01/2027-02-28",
         alts=(alt("R11", "bias=future", joined(month(2027, 11), month(2028, 2))),)),
    case("R11-es-del-1-al-15-de-marzo", "Incidentes del 1 al 15 de marzo", "del 1 al 15 de marzo", "R11",
         MARCH_1_15, "2026-03-01/2026-03-15", alts=(alt("R11", "bias=future", MARCH_1_15_NEXT),)),
    case("R11-es-entre-el-1-y-el-15-de-marzo", "Incidentes entre el 1 y el 15 de marzo",
         "entre el 1 y el 15 de marzo", "R11", MARCH_1_15, alts=(alt("R11", "bias=future", MARCH_1_15_NEXT),)),
    case("R11-es-desde-marzo-hasta-mayo", "Sprints desde marzo hasta mayo", "desde marzo hasta mayo",
         "R11", joined(MARCH, month(2026, 5)),
         alts=(alt("R11", "bias=future", joined(MARCH_NEXT, month(2027, 5))),)),
    case("R11-es-del-1-de-marzo-al-15-de-abril-de-2025", "Sprints del 1 de marzo al 15 de abril de 2025",
         "del 1 de marzo al 15 de abril de 2025", "R11", joined(day(date(2025, 3, 1)), day(date(2025, 4, 15)))),
    case("R11-es-de-lunes-a-miercoles", "Bugs abiertos de lunes a miércoles", "de lunes a miércoles",
         "R11", joined(MONDAY, day(on_or_after(on_or_before(TODAY, MO), WE))),
         alts=(alt("R11", "bias=future", joined(MONDAY_NEXT, day(on_or_after(on_or_after(TODAY, MO), WE)))),)),
    case("R11-es-de-2024-a-2025", "Incidentes de 2024 a 2025", "de 2024 a 2025", "R11",
         joined(year(2024), year(2025)), "2024-01-01/2025-12-31"),
]

_MARCH_14 = day(date(most_recent_year(lambda y: date(y, 3, 14)), 3, 14))
_MARCH_14_NEXT = day(date(next_year_after(lambda y: date(y, 3, 15)), 3, 14))
R12 = [
    case("R12-es-en-marzo", "Bugs abiertos en marzo", "en marzo", "R12", MARCH, "2026-03",
         alts=(alt("R12", "bias=future", MARCH_NEXT),)),
    case("R12-es-en-mayo-not-mayor", "Tickets cerrados en mayo", "en mayo", "R12", month(2026, 5),
         alts=(alt("R12", "bias=future", month(2027, 5)),)),
    case("R12-es-el-14-de-marzo", "¿Qué se rompió el 14 de marzo?", "el 14 de marzo", "R12", _MARCH_14,
         alts=(alt("R12", "bias=future", _MARCH_14_NEXT),)),
    case("R12-es-el-mes-de-junio", "Tickets cerrados en el mes de junio", "en el mes de junio", "R12",
         month(2026, 6), alts=(alt("R12", "bias=future", month(2027, 6)),)),
    case("R12-es-en-diciembre-the-current-month-counts", "Tickets cerrados en diciembre", "en diciembre",
         "R12", month(2026, 12), "2026-12"),
    case("R12-es-en-el-T3", "¿Cuál fue la velocidad en el T3?", "en el T3", "R12", quarter(2026, 3),
         "2026-Q3", alts=(alt("R12", "bias=future", quarter(2027, 3)),)),
    case("R12-es-el-tercer-trimestre", "Bugs del tercer trimestre", "del tercer trimestre", "R12",
         quarter(2026, 3), alts=(alt("R12", "bias=future", quarter(2027, 3)),)),
    case("R12-es-el-primer-trimestre", "Objetivos para el primer trimestre", "el primer trimestre", "R12",
         quarter(2026, 1), alts=(alt("R12", "bias=future", quarter(2027, 1)),)),
    case("R12-es-la-segunda-mitad-del-ano", "Plan para la segunda mitad del año",
         "la segunda mitad del año", "R12", half(2026, 2), "2026-H2"),
    case("R12-es-julio-with-a-cue", "Vacaciones en julio", "en julio", "R12", month(2026, 7),
         alts=(alt("R12", "bias=future", month(2027, 7)),)),
    case("R12-es-bias-future-picks-next-march", "Bugs abiertos en marzo", "en marzo", "R12", MARCH_NEXT,
         alts=(alt("R12", "bias=past", MARCH),), bias="future"),
]

R13 = [
    case("R13-es-el-lunes", "¿Qué se rompió el lunes?", "el lunes", "R13", MONDAY,
         alts=(alt("R13", "bias=future", MONDAY_NEXT),)),
    case("R13-es-el-martes", "Bugs abiertos el martes", "el martes", "R13", day(on_or_before(TODAY, TU)),
         alts=(alt("R13", "bias=future", day(on_or_after(TODAY, TU))),)),
    case("R13-es-el-miercoles-is-today", "Bugs abiertos el miércoles", "el miércoles", "R13", day(TODAY)),
    case("R13-es-el-sabado-not-sabana", "Despliegues del sábado", "del sábado", "R13",
         day(on_or_before(TODAY, SA)),
         alts=(alt("R13", "bias=future", day(on_or_after(TODAY, SA))),)),
    case("R13-es-para-el-viernes-due-looks-ahead", "¿Qué está previsto para el viernes?", "viernes",
         "R13", FRIDAY, alts=(alt("R13", None, FRIDAY_PAST),)),
    case("R13-es-el-lunes-bias-future", "¿Qué está previsto el lunes?", "el lunes", "R13", MONDAY_NEXT,
         alts=(alt("R13", "bias=past", MONDAY),), bias="future"),
]

R14 = [
    case("R14-es-el-lunes-pasado", "¿Qué se rompió el lunes pasado?", "el lunes pasado", "R14",
         day(strictly_before(TODAY, MO)), alts=(alt("R16", "weekday_reading=week", day(in_week(TODAY, MO, -1))),)),
    case("R14-es-el-pasado-lunes", "¿Qué se rompió el pasado lunes?", "el pasado lunes", "R14",
         day(strictly_before(TODAY, MO)), alts=(alt("R16", "weekday_reading=week", day(in_week(TODAY, MO, -1))),)),
    case("R14-es-el-viernes-pasado", "Tickets cerrados el viernes pasado", "el viernes pasado", "R14",
         day(strictly_before(TODAY, FR))),
    case("R14-es-el-miercoles-pasado-on-a-Wednesday", "Despliegues del miércoles pasado",
         "del miércoles pasado", "R14", day(strictly_before(TODAY, WE))),
    case("R14-es-el-lunes-pasado-week-policy-is-monday-of-last-week", "¿Qué se rompió el lunes pasado?",
         "el lunes pasado", "R16", day(in_week(TODAY, MO, -1)),
         alts=(alt("R14", "weekday_reading=nearest", day(strictly_before(TODAY, MO))),), weekday_reading="week"),
]

R15 = [
    case("R15-es-el-proximo-jueves-is-tomorrow", "¿Qué está planificado el próximo jueves?",
         "el próximo jueves", "R15", day(strictly_after(TODAY, TH)),
         alts=(alt("R16", "weekday_reading=week", day(in_week(TODAY, TH, 1))),)),
    case("R15-es-el-jueves-que-viene", "Demo el jueves que viene", "el jueves que viene", "R15",
         day(strictly_after(TODAY, TH)), alts=(alt("R16", "weekday_reading=week", day(in_week(TODAY, TH, 1))),)),
    case("R15-es-el-lunes-proximo", "Revisión el lunes próximo", "el lunes próximo", "R15",
         day(strictly_after(TODAY, MO))),
    case("R15-es-el-proximo-jueves-week-policy", "¿Qué está planificado el próximo jueves?",
         "el próximo jueves", "R16", day(in_week(TODAY, TH, 1)),
         alts=(alt("R15", "weekday_reading=nearest", day(strictly_after(TODAY, TH))),), weekday_reading="week"),
]

R16 = [
    case("R16-es-el-lunes-de-la-semana-pasada", "¿Qué se rompió el lunes de la semana pasada?",
         "el lunes de la semana pasada", "R16", day(in_week(TODAY, MO, -1))),
    case("R16-es-el-viernes-de-la-proxima-semana", "Demo el viernes de la próxima semana",
         "el viernes de la próxima semana", "R16", day(in_week(TODAY, FR, 1))),
    case("R16-es-el-martes-de-esta-semana", "Bugs abiertos el martes de esta semana",
         "el martes de esta semana", "R16", day(in_week(TODAY, TU, 0)),
         alts=(alt("R15", None, day(on_or_after(TODAY, TU))),)),
    case("R16-es-el-jueves-de-la-semana-que-viene", "Revisión el jueves de la semana que viene",
         "el jueves de la semana que viene", "R16", day(in_week(TODAY, TH, 1))),
    case("R16-es-este-lunes-CLDR-this-week", "¿Qué se rompió este lunes?", "este lunes", "R16",
         day(in_week(TODAY, MO, 0)), alts=(alt("R15", None, day(on_or_after(TODAY, MO))),)),
    case("R16-es_MX-el-lunes-de-la-semana-pasada-Sunday-weeks", "Incidentes el lunes de la semana pasada",
         "el lunes de la semana pasada", "R16", day(in_week(TODAY, MO, -1, SU)), locale="es_MX"),
]

R17 = [
    case("R17-es-en-2025", "¿Cuántos bugs en 2025?", "en 2025", "R17", year(2025), "2025"),
    case("R17-es-el-ano-2025", "Incidentes del año 2025", "del año 2025", "R17", year(2025)),
    case("R17-es-durante-2023", "Releases durante 2023", "durante 2023", "R17", year(2023)),
    case("R17-es-de-2025-beside-numbers", "Lista 5 tickets de prioridad 2 de 2025", "de 2025", "R17",
         year(2025)),
]

R18 = [
    case("R18-es-14-de-marzo-de-2025", "¿Qué se entregó el 14 de marzo de 2025?",
         "el 14 de marzo de 2025", "R18", day(date(2025, 3, 14)), "2025-03-14"),
    case("R18-es-el-lunes-14-de-marzo-de-2022", "Incidente del lunes 14 de marzo de 2022",
         "del lunes 14 de marzo de 2022", "R18", day(date(2022, 3, 14))),
    case("R18-es-el-1o-de-marzo-de-2026", "Tickets creados el 1º de marzo de 2026",
         "el 1º de marzo de 2026", "R18", day(date(2026, 3, 1))),
    case("R18-es-ISO", "Despliegue del 2025-03-14", "del 2025-03-14", "R18", day(date(2025, 3, 14))),
    case("R18-es_ES-numeric-day-first", "Corregido el 14/03/2025", "el 14/03/2025", "R18",
         day(read_numeric(14, 3, 2025, "es_ES")), locale="es_ES"),
    case("R18-es_ES-numeric-ambiguous-day-first", "Corregido el 03/04/2026", "el 03/04/2026", "R18",
         day(read_numeric(3, 4, 2026, "es_ES")),
         alts=(alt("R18", "date_order=MDY", day(date(2026, 3, 4))),), locale="es_ES"),
    case("R18-es-en_US-locale-reads-month-first", "Corregido el 03/04/2026", "el 03/04/2026", "R18",
         day(read_numeric(3, 4, 2026, "en_US")),
         alts=(alt("R18", "date_order=DMY", day(date(2026, 4, 3))),), locale="en_US"),
    case("R18-es-date-order-policy-flips", "Corregido el 03/04/2026", "el 03/04/2026", "R18",
         day(date(2026, 3, 4)), alts=(alt("R18", "date_order=DMY", day(date(2026, 4, 3))),),
         locale="es_ES", date_order="MDY"),
]

R19 = [
    case("R19-es-marzo-de-2026", "Bugs de marzo de 2026", "de marzo de 2026", "R19", month(2026, 3), "2026-03"),
    case("R19-es-T3-2025", "Ingresos T3 2025", "T3 2025", "R19", quarter(2025, 3), "2025-Q3"),
    case("R19-es-el-tercer-trimestre-de-2025", "Velocidad del tercer trimestre de 2025",
         "del tercer trimestre de 2025", "R19", quarter(2025, 3)),
    case("R19-es-S1-2026", "Objetivos S1 2026", "S1 2026", "R19", half(2026, 1), "2026-H1"),
    case("R19-es-el-primer-semestre-de-2026", "Presupuesto del primer semestre de 2026",
         "del primer semestre de 2026", "R19", half(2026, 1)),
    case("R19-es-la-primera-mitad-de-2026", "Hoja de ruta de la primera mitad de 2026",
         "de la primera mitad de 2026", "R19", half(2026, 1)),
    case("R19-es-mayo-2026-not-mayor", "Ventas de mayo 2026", "de mayo 2026", "R19", month(2026, 5)),
]

R20 = [
    case("R20-es-semana-48-past-bias", "Tickets de la semana 48", "de la semana 48", "R20",
         iso_week(2026, 48), "2026-W48", alts=(alt("R20", "bias=future", iso_week(2027, 48)),)),
    case("R20-es-la-semana-48-de-2026", "Tickets de la semana 48 de 2026", "de la semana 48 de 2026",
         "R20", iso_week(2026, 48)),
    case("R20-es-S48", "Entregas S48", "S48", "R20", iso_week(2026, 48),
         alts=(alt("R20", "bias=future", iso_week(2027, 48)),)),
    case("R20-es-ISO-week", "Tickets de 2026-W48", "de 2026-W48", "R20", iso_week(2026, 48)),
    case("R20-es_MX-ISO-week-starts-on-Monday-whatever-the-locale", "Tickets de la semana 48 de 2026",
         "de la semana 48 de 2026", "R20", iso_week(2026, 48), locale="es_MX"),
]

_YEAR_START = iso(midnight(date(TODAY.year, 1, 1)))
R21 = [
    case("R21-es-en-lo-que-va-del-ano", "Ingresos en lo que va del año", "en lo que va del año", "R21",
         (_YEAR_START, iso(NOW))),
    case("R21-es-en-lo-que-va-de-mes", "Bugs en lo que va de mes", "en lo que va de mes", "R21",
         (iso(midnight(THIS_MONTH)), iso(NOW))),
    case("R21-es-en-lo-que-va-de-la-semana", "Tickets en lo que va de la semana",
         "en lo que va de la semana", "R21", (iso(midnight(THIS_WEEK)), iso(NOW))),
    case("R21-es-desde-principios-de-ano", "Incidentes desde principios de año",
         "desde principios de año", "R21", (_YEAR_START, iso(NOW))),
    case("R21-es-desde-el-inicio-del-trimestre", "Ventas desde el inicio del trimestre",
         "desde el inicio del trimestre", "R21", (iso(midnight(date(2026, 10, 1))), iso(NOW))),
]

R22 = [
    case("R22-es-esta-manana", "¿Qué se rompió esta mañana?", "esta mañana", "R22",
         day_period("es", TODAY, "morning2")),
    case("R22-es-ayer-por-la-tarde", "Alertas de ayer por la tarde", "de ayer por la tarde", "R22",
         day_period("es", TODAY + D(days=-1), "evening1")),
    case("R22-es-esta-tarde", "Despliegues esta tarde", "esta tarde", "R22",
         day_period("es", TODAY, "evening1")),
    case("R22-es-manana-por-la-manana", "Revisión mañana por la mañana", "mañana por la mañana", "R22",
         day_period("es", TODAY + D(days=1), "morning2")),
    case("R22-es-anoche", "¿Qué falló anoche?", "anoche", "R22", day_period("es", TODAY + D(days=-1), "night1")),
    case("R22-es-esta-noche", "Mantenimiento esta noche", "esta noche", "R22",
         day_period("es", TODAY, "night1")),
    case("R22-es-esta-madrugada", "Jobs fallidos esta madrugada", "esta madrugada", "R22",
         day_period("es", TODAY, "morning1")),
    case("R22-es-ayer-en-la-noche", "Errores ayer en la noche", "ayer en la noche", "R22",
         day_period("es", TODAY + D(days=-1), "night1")),
]

_ES = "es_ES"
R23 = [
    case("R23-es-este-fin-de-semana-on-a-Wednesday", "Despliegues este fin de semana",
         "este fin de semana", "R23", weekend(first_open_weekend(TODAY, _ES), _ES),
         weekend_value(first_open_weekend(TODAY, _ES), _ES), locale=_ES),
    case("R23-es-el-fin-de-semana-pasado", "Incidentes del fin de semana pasado",
         "del fin de semana pasado", "R23", weekend(last_ended_weekend(TODAY, _ES), _ES), locale=_ES),
    case("R23-es-el-proximo-fin-de-semana", "Mantenimiento el próximo fin de semana",
         "el próximo fin de semana", "R23", weekend(first_open_weekend(TODAY, _ES) + D(weeks=1), _ES),
         alts=(alt("R23", None, weekend(first_open_weekend(TODAY, _ES), _ES)),), locale=_ES),
    case("R23-es-durante-el-fin-de-semana-past-bias", "¿Qué se rompió durante el fin de semana?",
         "durante el fin de semana", "R23", weekend(last_ended_weekend(TODAY, _ES), _ES),
         alts=(alt("R23", "bias=future", weekend(first_open_weekend(TODAY, _ES), _ES)),), locale=_ES),
    case("R23-es-este-fin-de-semana-on-a-Saturday", "Despliegues este fin de semana",
         "este fin de semana", "R23", weekend(first_open_weekend(SATURDAY.date(), _ES), _ES),
         now=SATURDAY, locale=_ES),
    case("R23-es-el-fin-de-semana-pasado-on-a-Sunday", "Incidentes del fin de semana pasado",
         "del fin de semana pasado", "R23", weekend(last_ended_weekend(SUNDAY.date(), _ES), _ES),
         now=SUNDAY, locale=_ES),
    case("R23-es-este-finde", "Guardia este finde", "este finde", "R23",
         weekend(first_open_weekend(TODAY, _ES), _ES), locale=_ES),
    case("R23-es-durante-el-fin-de-semana-bias-future", "¿Qué corre durante el fin de semana?",
         "durante el fin de semana", "R23", weekend(first_open_weekend(TODAY, _ES), _ES),
         alts=(alt("R23", "bias=past", weekend(last_ended_weekend(TODAY, _ES), _ES)),), locale=_ES,
         bias="future"),
]

DURATIONS = [
    case("D-es-mas-de-3-dias", "Tickets abiertos hace más de 3 días", "3 días", "D", (None, None), "P3D"),
    case("D-es-durante-dos-semanas", "Bloqueado durante dos semanas", "durante dos semanas", "D",
         (None, None), "P2W"),
    case("D-es-en-menos-de-4-horas", "Incidentes resueltos en menos de 4 horas", "4 horas", "D",
         (None, None), "PT4H"),
]

ES_EN = ("es", "en")
MIXED = [
    case("R2-es+en-tickets-creados-last-week", "¿Cuántos tickets creados last week?", "last week", "R2",
         week(TODAY + D(weeks=-1)), languages=ES_EN),
    case("R2-es+en-show-bugs-de-la-semana-pasada", "show bugs de la semana pasada",
         "de la semana pasada", "R2", week(TODAY + D(weeks=-1)), languages=ES_EN),
    case("R1-es+en-closed-ayer", "which tickets were closed ayer", "ayer", "R1", day(TODAY + D(days=-1)),
         languages=ES_EN),
    case("R7-es+en-list-bugs-desde-marzo", "list bugs desde marzo", "desde marzo", "R7", since(MARCH),
         alts=(alt("R7", "bias=future", since(MARCH_NEXT)),), languages=ES_EN),
    case("R7-es+en-bugs-creados-since-Monday", "bugs creados since Monday", "since Monday", "R7",
         since(MONDAY), alts=(alt("R7", "bias=future", since(MONDAY_NEXT)),), languages=ES_EN),
    case("R22-es+en-deploys-programados-manana-por-la-manana", "deploys programados mañana por la mañana",
         "mañana por la mañana", "R22", day_period("es", TODAY + D(days=1), "morning2"), languages=ES_EN),
    case("R3-es+en-open-tickets-hace-3-dias", "open tickets hace 3 días", "hace 3 días", "R3",
         day(TODAY + D(days=-3)), languages=ES_EN),
    case("R2-es+en-PRs-mergeados-this-week", "PRs mergeados this week", "this week", "R2", week(TODAY),
         languages=ES_EN),
    case("R11-es+en-incidents-del-1-al-15-de-marzo", "incidents del 1 al 15 de marzo",
         "del 1 al 15 de marzo", "R11", MARCH_1_15, alts=(alt("R11", "bias=future", MARCH_1_15_NEXT),),
         languages=ES_EN),
    case("R5-es+en-errors-in-the-last-24-hours-por-favor", "errors in the last 24 hours, por favor",
         "in the last 24 hours", "R5", (elapsed(NOW, hours=-24), iso(NOW)), languages=ES_EN),
]

TABLES = {
    "R1": R1, "R2": R2, "R3": R3, "R4": R4, "R5": R5, "R6": R6, "R7": R7, "R8": R8, "R9": R9,
    "R10": R10, "R11": R11, "R12": R12, "R13": R13, "R14": R14, "R15": R15, "R16": R16,
    "R17": R17, "R18": R18, "R19": R19, "R20": R20, "R21": R21, "R22": R22, "R23": R23,
}


@pytest.mark.parametrize(PARAMS, [row for rows in TABLES.values() for row in rows])
def test_spanish_phrase_resolves_to_its_reading_and_interval(question, phrase, reading, bounds, value,
                                                             alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


@pytest.mark.parametrize(PARAMS, DURATIONS)
def test_spanish_length_of_time_after_a_cue_is_an_iso_duration(question, phrase, reading, bounds,
                                                               value, alts, context):
    m = one(question, **context)
    assert (m.text, m.reading, m.kind, m.value) == (phrase, "D", "duration", value)
    assert (m.start, m.end) == bounds


@pytest.mark.parametrize(PARAMS, MIXED)
def test_question_mixing_spanish_and_english_finds_the_phrase(question, phrase, reading, bounds,
                                                              value, alts, context):
    check(question, phrase, reading, bounds, value, alts, context)


def test_every_reading_has_at_least_three_spanish_examples():
    assert all(len(rows) >= 3 for rows in TABLES.values()), {k: len(v) for k, v in TABLES.items()}
    assert len(MIXED) >= 8


# Look-alikes: Spanish questions whose words look temporal but are not (reading N).
TRAPS = [
    ("N-es-la-sabana", "Fotos de la sabana africana"),
    ("N-es-la-sabana-de-la-cama", "Pedido de una sábana nueva"),
    ("N-es-el-mayor-numero", "¿Quién tiene el mayor número de bugs?"),
    ("N-es-la-mayoria", "La mayoría de los tests pasan"),
    ("N-es-el-mar", "Sensores del mar Mediterráneo"),
    ("N-es-Julio-person-first-word", "Julio revisó el ticket"),
    ("N-es-Julio-person-after-de", "Tickets de Julio sin revisar"),
    ("N-es-Domingo-person", "Asignado a Domingo"),
    ("N-es-Abril-person", "Pregunta de Abril sobre el diseño"),
    ("N-es-el-segundo-ticket", "El segundo ticket de la lista"),
    ("N-es-la-segunda-version", "¿Quién revisó la segunda versión?"),
    ("N-es-espera-un-segundo", "Espera un segundo"),
    ("N-es-en-segundo-lugar", "En segundo lugar, el diseño"),
    ("N-es-llego-tarde", "El build llegó tarde"),
    ("N-es-mas-tarde", "Lo miramos más tarde"),
    ("N-es-la-manana-is-the-morning", "Las alertas de la mañana"),
    ("N-es-a-las-9-de-la-manana", "La reunión es a las 9 de la mañana"),
    ("N-es-hace-falta", "Hace falta un revisor"),
    ("N-es-la-mesa-de-ayuda", "Tickets de la mesa de ayuda"),
    ("N-es-prioridad-2", "Tickets con prioridad 2"),
    ("N-es-version-2025.1", "Bugs en la versión 2025.1"),
    ("N-es-ticket-2025", "¿Quién tiene el ticket 2025?"),
    ("N-es-2025-tickets-no-cue", "2025 tickets abiertos"),
    ("N-es-sprint-12", "Bugs del sprint 12"),
    ("N-es-top-10", "Top 10 de contribuidores"),
    ("N-es-5-puntos", "Tareas de 5 puntos"),
    ("N-es-build-2024", "¿Quién rompió el build 2024?"),
    ("N-es-error-404", "Informes de error 404"),
    ("N-es-pagina-3", "Página 3 del informe"),
    ("N-es-los-2-ultimos-tickets", "Los 2 últimos tickets"),
    ("N-es-el-ultimo-comentario", "El último comentario del ticket"),
    ("N-es-el-proximo-paso", "El próximo paso para el equipo"),
    ("N-es-la-ultima-version", "Bugs de la última versión"),
    ("N-es-algun-dia", "Algún día lo haremos"),
    ("N-es-todos-los-dias", "Reunión todos los días"),
    ("N-es-dia-a-dia", "Seguimiento día a día"),
    ("N-es-horas-extra", "Las horas extra del equipo"),
    ("N-es-en-3-pasos", "Despliegue en 3 pasos"),
    ("N-es-Marte", "Misión a Marte"),
    ("N-es-el-primer-ticket", "El primer ticket de la lista"),
    ("N-es-la-mitad-de-los-tests", "La mitad de los tests fallan"),
    ("N-es-numero-48", "Ticket número 48"),
]


@pytest.mark.parametrize(("question",), [(q,) for _, q in TRAPS], ids=[i for i, _ in TRAPS])
def test_spanish_look_alike_gives_no_temporal_mention(question):
    result = run(question, languages=("es",))
    assert result.mentions == ()
    assert result.rewritten == question


@pytest.mark.parametrize(("question", "phrase"), [
    ("Vacaciones en julio", "en julio"),
    ("Tickets de abril de 2026", "de abril de 2026"),
    ("Despliegues el domingo", "el domingo"),
], ids=["R12-es-en-julio", "R19-es-de-abril-de-2026", "R13-es-el-domingo"])
def test_spanish_month_or_day_that_is_also_a_name_is_still_a_date_with_a_cue(question, phrase):
    assert one(question, languages=("es",)).text == phrase


def test_there_are_at_least_twenty_five_spanish_traps():
    assert len(TRAPS) >= 25
