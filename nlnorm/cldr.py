"""The only module that reads Unicode CLDR data, through babel.

Month and weekday names, relative date fields ("last week", "in {0} days"), day periods, week
data and date-format order all come from here, never from hand-typed lists. babel keeps the
relative date fields and day-period rules in ``Locale._data`` without a public accessor; reading
them is confined to this module so a babel change touches one place.

Checked against: CLDR 49 as shipped in babel 2.19 (``babel.core.get_cldr_version``).
"""

from __future__ import annotations

import functools
from dataclasses import dataclass
from typing import Any

__all__ = [
    "cldr_version",
    "locale_id",
    "all_locale_ids",
    "first_week_day",
    "weekend_days",
    "month_words",
    "weekday_words",
    "relative_fields",
    "relative_patterns",
    "day_period_words",
    "day_period_rules",
    "date_order",
    "RelativeField",
    "RelativePattern",
]

#: CLDR date-field keys that name a grain nlnorm resolves, mapped to the grain name.
FIELD_GRAINS = {
    "year": "year",
    "quarter": "quarter",
    "month": "month",
    "week": "week",
    "day": "day",
    "hour": "hour",
    "minute": "minute",
    "second": "second",
}
#: CLDR weekday field keys, in ``date.weekday()`` order (0 = Monday).
WEEKDAY_FIELDS = ("mon", "tue", "wed", "thu", "fri", "sat", "sun")


@dataclass(frozen=True, slots=True)
class RelativeField:
    """A CLDR ``relative-type`` entry: ``text`` means offset ``offset`` of ``field``."""

    text: str
    field: str  # a grain name or a weekday field key ("mon")
    offset: int
    width: str  # "", "short" or "narrow"


@dataclass(frozen=True, slots=True)
class RelativePattern:
    """A CLDR past/future pattern: ``pattern`` contains ``{0}``; ``sign`` is -1 (past) or +1."""

    pattern: str
    field: str
    sign: int
    plural: str
    width: str


def _babel() -> Any:
    import babel

    return babel


@functools.cache
def cldr_version() -> str:
    """The CLDR version babel ships, e.g. ``'49'``."""
    from babel.core import get_cldr_version

    return str(get_cldr_version())


@functools.cache
def all_locale_ids() -> tuple[str, ...]:
    """Every locale id babel ships data for."""
    from babel.localedata import locale_identifiers

    return tuple(sorted(locale_identifiers()))


@functools.lru_cache(maxsize=256)
def _locale(code: str) -> Any:
    from babel import Locale

    return Locale.parse(code)


@functools.lru_cache(maxsize=256)
def locale_id(value: str) -> str:
    """Normalize ``de-at`` / ``de_AT`` to the CLDR id ``de_AT``; raise on unknown locales.

    >>> locale_id("en-gb")
    'en_GB'
    """
    from .errors import ContextError, suggest

    text = value.strip().replace("-", "_")
    parts = text.split("_")
    if parts and parts[0]:
        parts[0] = parts[0].lower()
    for i in range(1, len(parts)):
        if len(parts[i]) == 2:
            parts[i] = parts[i].upper()
        elif len(parts[i]) == 4:
            parts[i] = parts[i].title()
    norm = "_".join(parts)
    try:
        loc = _locale(norm)
    except Exception:
        raise ContextError(
            f"locale={value!r} is not a CLDR locale{suggest(norm, all_locale_ids())}; "
            "expected e.g. 'en', 'en_US' or 'de_AT'"
        ) from None
    return str(loc)


@functools.lru_cache(maxsize=256)
def first_week_day(locale: str) -> int:
    """CLDR ``firstDay`` for the locale's territory as 0 = Monday; Monday when CLDR says another
    day than Monday, Sunday or Saturday (nlnorm's week starts).

    >>> first_week_day("en_US"), first_week_day("de_DE"), first_week_day("pt_PT")
    (6, 0, 6)
    """
    day = int(_locale(locale).first_week_day)
    return day if day in (0, 5, 6) else 0


@functools.lru_cache(maxsize=256)
def weekend_days(locale: str) -> tuple[int, ...]:
    """The weekend days of the locale's territory from CLDR week data, 0 = Monday, in order.

    >>> weekend_days("en_US"), weekend_days("fa_IR")
    ((5, 6), (4,))
    """
    loc = _locale(locale)
    start, end = int(loc.weekend_start), int(loc.weekend_end)
    days = [start]
    while days[-1] != end:
        days.append((days[-1] + 1) % 7)
    return tuple(days)


def _plain(value: Any) -> Any:
    if hasattr(value, "items"):
        return {k: _plain(v) for k, v in value.items()}
    return value


@functools.lru_cache(maxsize=512)
def month_words(lang: str) -> dict[str, tuple[tuple[str, int], ...]]:
    """Month names by width: ``{"wide": (("january", 1), ...), "abbreviated": ...}``, lower-case,
    format and stand-alone contexts merged, abbreviations with and without their dot."""
    months = _plain(_locale(lang).months)
    return _name_table(months)


@functools.lru_cache(maxsize=512)
def weekday_words(lang: str) -> dict[str, tuple[tuple[str, int], ...]]:
    """Weekday names by width, 0 = Monday, lower-case, both contexts merged."""
    return _name_table(_plain(_locale(lang).days))


def _name_table(data: dict[str, Any]) -> dict[str, tuple[tuple[str, int], ...]]:
    out: dict[str, dict[str, int]] = {"wide": {}, "abbreviated": {}, "short": {}}
    for context in ("format", "stand-alone"):
        for width in ("wide", "abbreviated", "short"):
            for key, name in (data.get(context, {}).get(width) or {}).items():
                word = str(name).lower()
                out[width].setdefault(word, int(key))
                if word.endswith("."):
                    out[width].setdefault(word[:-1], int(key))
    return {w: tuple(sorted(d.items())) for w, d in out.items()}


@functools.lru_cache(maxsize=1024)
def relative_fields(lang: str) -> tuple[RelativeField, ...]:
    """Every CLDR ``relative-type`` phrase of ``lang`` ("yesterday", "last week", "next qtr.")."""
    fields = _plain(_locale(lang)._data.get("date_fields", {}))
    out: list[RelativeField] = []
    for key, entry in fields.items():
        base, _, width = key.partition("-")
        if base not in FIELD_GRAINS and base not in WEEKDAY_FIELDS:
            continue
        for offset, text in (entry.get("relative") or {}).items():
            out.append(RelativeField(str(text), FIELD_GRAINS.get(base, base), int(offset), width))
    return tuple(out)


@functools.lru_cache(maxsize=1024)
def relative_patterns(lang: str) -> tuple[RelativePattern, ...]:
    """Every CLDR past/future pattern of ``lang`` ("{0} days ago", "in {0} weeks"), per plural."""
    fields = _plain(_locale(lang)._data.get("date_fields", {}))
    out: list[RelativePattern] = []
    for key, entry in fields.items():
        base, _, width = key.partition("-")
        if base not in FIELD_GRAINS and base not in WEEKDAY_FIELDS:
            continue
        for direction, sign in (("past", -1), ("future", 1)):
            for plural, pattern in (entry.get(direction) or {}).items():
                out.append(
                    RelativePattern(str(pattern), FIELD_GRAINS.get(base, base), sign, plural, width)
                )
    return tuple(out)


@functools.lru_cache(maxsize=512)
def day_period_words(lang: str) -> tuple[tuple[str, str], ...]:
    """CLDR day-period names of ``lang`` (every width, both contexts) with their period ids,
    e.g. ``("morning", "morning1")``; am/pm/noon/midnight are left out (not periods of a day
    a question asks about)."""
    periods = _plain(_locale(lang).day_periods)
    out: dict[str, str] = {}
    for context in ("stand-alone", "format"):
        for width in ("wide", "abbreviated", "narrow"):
            for pid, name in (periods.get(context, {}).get(width) or {}).items():
                if pid in ("am", "pm", "noon", "midnight"):
                    continue
                word = str(name).lower()
                out.setdefault(word, pid)
                if word.endswith("."):
                    out.setdefault(word[:-1], pid)
    return tuple(sorted(out.items()))


@functools.lru_cache(maxsize=512)
def day_period_rules(lang: str) -> dict[str, tuple[int, int]]:
    """CLDR day-period rules of ``lang``: period id -> (from, before) in seconds after midnight.

    A period that wraps midnight has ``before < from`` (it runs into the next day).

    >>> day_period_rules("en")["afternoon1"]
    (43200, 64800)
    """
    rules = _plain(_locale(lang).day_period_rules or {})
    base = rules.get(None) or rules.get("") or {}
    out: dict[str, tuple[int, int]] = {}
    for pid, spans in base.items():
        for span in spans:
            if "from" in span and "before" in span:
                out[pid] = (int(span["from"]), int(span["before"]))
    return out


@functools.lru_cache(maxsize=256)
def date_order(locale: str) -> str:
    """The order of year, month and day in the locale's CLDR short date format.

    >>> date_order("en_US"), date_order("en_GB"), date_order("ja")
    ('MDY', 'DMY', 'YMD')
    """
    from babel.dates import get_date_format

    pattern = get_date_format("short", locale=_locale(locale)).pattern
    order = []
    in_quote = False
    for ch in pattern:
        if ch == "'":
            in_quote = not in_quote
            continue
        if in_quote:
            continue
        key = {"y": "Y", "M": "M", "L": "M", "d": "D"}.get(ch)
        if key and key not in order:
            order.append(key)
    text = "".join(order)
    return text if text in ("MDY", "DMY", "YMD") else "YMD"
