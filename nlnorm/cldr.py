"""The only module that reads Unicode CLDR data.

Month and weekday names, relative date fields ("last week", "in {0} days"), day periods, week
data and date-format order all come from CLDR through babel, never from hand-typed lists.

Loading babel's locale data costs about 35 ms, most of a command-line start, so what nlnorm
uses of it is also kept as generated JSON in ``locales/_cldr/`` (``python -m nlnorm.cldr``
writes it; ``tests/locales/test_cldr_cache.py`` checks it equals what babel gives now). A
language or locale missing there is read from babel directly. babel keeps the relative date
fields and day-period rules in ``Locale._data`` without a public accessor; reading them is
confined to this module, so a babel change touches one place.

Checked against: CLDR 49 as shipped in babel 2.19 (``babel.core.get_cldr_version``).
"""

from __future__ import annotations

import functools
import json
from dataclasses import dataclass
from pathlib import Path
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
    "extract_language",
    "extract_locales",
    "extract_digest",
    "write_cache",
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


# --- the generated cache ----------------------------------------------------------------------


def _cache_dir() -> Path:
    from .locale import locales_dir

    return locales_dir() / "_cldr"


@functools.cache
def _cached_language(lang: str) -> dict[str, Any] | None:
    path = _cache_dir() / f"{lang}.json"
    if not path.is_file():
        return None
    data: dict[str, Any] = json.loads(path.read_text(encoding="utf-8"))
    return data


@functools.cache
def _cached_locales() -> dict[str, Any] | None:
    path = _cache_dir() / "_locales.json"
    if not path.is_file():
        return None
    data: dict[str, Any] = json.loads(path.read_text(encoding="utf-8"))
    return data


@functools.cache
def extract_digest(lang: str) -> str | None:
    """The SHA-256 of ``locales/_cldr/<lang>.json`` (line ends unified), or ``None`` when
    there is no extract of the language: what data generated from it is keyed by."""
    import hashlib

    try:
        data = (_cache_dir() / f"{lang}.json").read_bytes()
    except OSError:
        return None
    return hashlib.sha256(data.replace(b"\r\n", b"\n")).hexdigest()


def _language(lang: str) -> dict[str, Any]:
    return _cached_language(lang) or _extract_language_cached(lang)


@functools.lru_cache(maxsize=32)
def _extract_language_cached(lang: str) -> dict[str, Any]:
    data = extract_language(lang)
    # babel keeps every locale's whole data once loaded (~300 KB each); what nlnorm needs is
    # now in ``data``, so let babel's caches go (with every locale of the CLDR tier loaded,
    # 430 MB -> the few MB of the extracts).
    from babel import localedata

    _locale.cache_clear()
    localedata.clear_caches()
    return data


def _locale_row(locale: str) -> list[Any]:
    table = _cached_locales()
    if table is not None and locale in table["locales"]:
        row: list[Any] = table["locales"][locale]
        return row
    return _extract_locale_row(locale)


# --- babel readers (used to build the cache and for anything not in it) -----------------------


@functools.lru_cache(maxsize=256)
def _locale(code: str) -> Any:
    from babel import Locale

    return Locale.parse(code)


def _plain(value: Any) -> Any:
    if hasattr(value, "items"):
        return {k: _plain(v) for k, v in value.items()}
    return value


def _name_table(data: dict[str, Any]) -> dict[str, list[list[Any]]]:
    out: dict[str, dict[str, int]] = {"wide": {}, "abbreviated": {}, "short": {}}
    for context in ("format", "stand-alone"):
        for width in ("wide", "abbreviated", "short"):
            for key, name in (data.get(context, {}).get(width) or {}).items():
                word = str(name).lower()
                out[width].setdefault(word, int(key))
                if word.endswith("."):
                    out[width].setdefault(word[:-1], int(key))
    return {w: [[k, v] for k, v in sorted(d.items())] for w, d in out.items()}


def extract_language(lang: str) -> dict[str, Any]:
    """Everything nlnorm uses of one language's CLDR data, read from babel, as plain JSON.

    A language CLDR does not know (a private-use code such as ``qts``) gets empty tables: its
    locale file then has to hold every word itself.
    """
    from babel.core import UnknownLocaleError, get_cldr_version

    import babel

    try:
        loc = _locale(lang)
    except (UnknownLocaleError, ValueError):
        return {"babel": babel.__version__, "cldr": str(get_cldr_version()), "language": lang,
                "months": _name_table({}), "weekdays": _name_table({}), "relative_fields": [], "relative_patterns": [],
                "day_period_words": [], "day_period_rules": {}}
    fields = _plain(loc._data.get("date_fields", {}))
    rel: list[list[Any]] = []
    pat: list[list[Any]] = []
    for key, entry in fields.items():
        base, _, width = key.partition("-")
        if base not in FIELD_GRAINS and base not in WEEKDAY_FIELDS:
            continue
        name = FIELD_GRAINS.get(base, base)
        for offset, text in (entry.get("relative") or {}).items():
            rel.append([str(text), name, int(offset), width])
        for direction, sign in (("past", -1), ("future", 1)):
            for plural, pattern in (entry.get(direction) or {}).items():
                pat.append([str(pattern), name, sign, str(plural), width])
    periods = _plain(loc.day_periods)
    words: dict[str, str] = {}
    for context in ("stand-alone", "format"):
        for width in ("wide", "abbreviated", "narrow"):
            for pid, name in (periods.get(context, {}).get(width) or {}).items():
                if pid in ("am", "pm", "noon", "midnight"):
                    continue
                word = str(name).lower()
                words.setdefault(word, pid)
                if word.endswith("."):
                    words.setdefault(word[:-1], pid)
    rules = _plain(loc.day_period_rules or {})
    base_rules = rules.get(None) or rules.get("") or {}
    spans: dict[str, list[int]] = {}
    for pid, found in base_rules.items():
        for span in found:
            if "from" in span and "before" in span:
                spans[pid] = [int(span["from"]), int(span["before"])]
    return {
        "babel": babel.__version__,
        "cldr": str(get_cldr_version()),
        "language": lang,
        "months": _name_table(_plain(loc.months)),
        "weekdays": _name_table(_plain(loc.days)),
        "relative_fields": rel,
        "relative_patterns": pat,
        "day_period_words": sorted([w, p] for w, p in words.items()),
        "day_period_rules": spans,
    }


def _extract_locale_row(locale: str) -> list[Any]:
    from babel.dates import get_date_format

    loc = _locale(locale)
    pattern = get_date_format("short", locale=loc).pattern
    order: list[str] = []
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
    return [int(loc.first_week_day), int(loc.weekend_start), int(loc.weekend_end),
            text if text in ("MDY", "DMY", "YMD") else "YMD"]


def extract_locales() -> dict[str, Any]:
    """Week data and numeric date order of every locale babel ships, as plain JSON."""
    from babel.core import get_cldr_version
    from babel.localedata import locale_identifiers

    import babel

    rows = {}
    for code in sorted(locale_identifiers()):
        try:
            rows[code] = _extract_locale_row(code)
        except Exception:  # a locale babel lists but cannot load: leave it to babel at run time
            continue
    return {"babel": babel.__version__, "cldr": str(get_cldr_version()), "locales": rows}


def write_cache(languages: list[str] | None = None) -> list[Path]:
    """Write ``locales/_cldr/<lang>.json`` for each language with a locale file, and
    ``_locales.json``. Returns the paths written."""
    from .locale import available_languages

    folder = _cache_dir()
    folder.mkdir(exist_ok=True)
    written = []
    for lang in sorted(languages or available_languages()):
        path = folder / f"{lang}.json"
        path.write_text(json.dumps(extract_language(lang), ensure_ascii=False, indent=0) + "\n",
                        encoding="utf-8")
        written.append(path)
    path = folder / "_locales.json"
    path.write_text(json.dumps(extract_locales(), ensure_ascii=False, indent=0) + "\n",
                    encoding="utf-8")
    written.append(path)
    return written


# --- the public readers -------------------------------------------------------------------------


@functools.cache
def cldr_version() -> str:
    """The CLDR version of the data in use, e.g. ``'49'``."""
    table = _cached_locales()
    if table is not None:
        return str(table["cldr"])
    from babel.core import get_cldr_version

    return str(get_cldr_version())


@functools.cache
def all_locale_ids() -> tuple[str, ...]:
    """Every locale id babel ships data for."""
    table = _cached_locales()
    if table is not None:
        return tuple(sorted(table["locales"]))
    from babel.localedata import locale_identifiers

    return tuple(sorted(locale_identifiers()))


@functools.lru_cache(maxsize=256)
def locale_id(value: str) -> str:
    """Normalize ``de-at`` / ``de_AT`` to the CLDR id ``de_AT``; raise on unknown locales.

    >>> locale_id("en-gb")
    'en_GB'
    """
    from .errors import ContextError, closest

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
    table = _cached_locales()
    if table is not None and norm in table["locales"]:
        return norm
    try:
        loc = _locale(norm)
    except Exception:
        near = closest(norm, all_locale_ids())
        raise ContextError(
            f"locale={value!r} is not a CLDR locale; expected e.g. 'en', 'en_US' or 'de_AT'"
            + (f"; did you mean {near!r}?" if near else "")
        ) from None
    return str(loc)


@functools.lru_cache(maxsize=256)
def first_week_day(locale: str) -> int:
    """CLDR ``firstDay`` for the locale's territory as 0 = Monday; Monday when CLDR says another
    day than Monday, Sunday or Saturday (nlnorm's week starts).

    >>> first_week_day("en_US"), first_week_day("de_DE"), first_week_day("pt_PT")
    (6, 0, 6)
    """
    day = int(_locale_row(locale)[0])
    return day if day in (0, 5, 6) else 0


@functools.lru_cache(maxsize=256)
def weekend_days(locale: str) -> tuple[int, ...]:
    """The weekend days of the locale's territory from CLDR week data, 0 = Monday, in order.

    >>> weekend_days("en_US"), weekend_days("fa_IR")
    ((5, 6), (4,))
    """
    row = _locale_row(locale)
    start, end = int(row[1]), int(row[2])
    days = [start]
    while days[-1] != end:
        days.append((days[-1] + 1) % 7)
    return tuple(days)


@functools.lru_cache(maxsize=256)
def date_order(locale: str) -> str:
    """The order of year, month and day in the locale's CLDR short date format.

    >>> date_order("en_US"), date_order("en_GB"), date_order("ja")
    ('MDY', 'DMY', 'YMD')
    """
    return str(_locale_row(locale)[3])


def _names(table: dict[str, list[list[Any]]]) -> dict[str, tuple[tuple[str, int], ...]]:
    return {w: tuple((str(k), int(v)) for k, v in rows) for w, rows in table.items()}


@functools.lru_cache(maxsize=512)
def month_words(lang: str) -> dict[str, tuple[tuple[str, int], ...]]:
    """Month names by width: ``{"wide": (("january", 1), ...), "abbreviated": ...}``, lower-case,
    format and stand-alone contexts merged, abbreviations with and without their dot."""
    return _names(_language(lang)["months"])


@functools.lru_cache(maxsize=512)
def weekday_words(lang: str) -> dict[str, tuple[tuple[str, int], ...]]:
    """Weekday names by width, 0 = Monday, lower-case, both contexts merged."""
    return _names(_language(lang)["weekdays"])


@functools.lru_cache(maxsize=1024)
def relative_fields(lang: str) -> tuple[RelativeField, ...]:
    """Every CLDR ``relative-type`` phrase of ``lang`` ("yesterday", "last week", "next qtr.")."""
    return tuple(RelativeField(t, f, int(o), w) for t, f, o, w in _language(lang)["relative_fields"])


@functools.lru_cache(maxsize=1024)
def relative_patterns(lang: str) -> tuple[RelativePattern, ...]:
    """Every CLDR past/future pattern of ``lang`` ("{0} days ago", "in {0} weeks"), per plural."""
    return tuple(RelativePattern(p, f, int(s), pl, w)
                 for p, f, s, pl, w in _language(lang)["relative_patterns"])


@functools.lru_cache(maxsize=512)
def day_period_words(lang: str) -> tuple[tuple[str, str], ...]:
    """CLDR day-period names of ``lang`` (every width, both contexts) with their period ids,
    e.g. ``("morning", "morning1")``; am/pm/noon/midnight are left out (not periods of a day
    a question asks about)."""
    return tuple((str(w), str(p)) for w, p in _language(lang)["day_period_words"])


@functools.lru_cache(maxsize=512)
def day_period_rules(lang: str) -> dict[str, tuple[int, int]]:
    """CLDR day-period rules of ``lang``: period id -> (from, before) in seconds after midnight.

    A period that wraps midnight has ``before < from`` (it runs into the next day).

    >>> day_period_rules("en")["afternoon1"]
    (43200, 64800)
    """
    return {k: (int(v[0]), int(v[1])) for k, v in _language(lang)["day_period_rules"].items()}


if __name__ == "__main__":
    for written in write_cache():
        print(f"wrote {written}")
