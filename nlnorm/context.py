"""The reference context every resolution is made against.

A :class:`Context` is immutable and validated once; build it with :meth:`Context.at` from strings
or with keyword arguments. Nothing here reads the system clock: ``now`` is always given.
"""

from __future__ import annotations

import functools
from datetime import datetime, timezone, tzinfo
from typing import Any, Literal
from zoneinfo import ZoneInfo, ZoneInfoNotFoundError

from pydantic import BaseModel, ConfigDict, Field, field_validator, model_validator

from .errors import ContextError, closest, suggest

__all__ = ["Context", "WEEKDAYS", "zone"]

WEEKDAYS = ("monday", "tuesday", "wednesday", "thursday", "friday", "saturday", "sunday")
WeekStart = Literal["monday", "sunday", "saturday"]


@functools.cache
def _all_zones() -> frozenset[str]:
    import zoneinfo

    return frozenset(zoneinfo.available_timezones())


@functools.lru_cache(maxsize=512)
def zone(name: str) -> ZoneInfo:
    """Return the IANA zone ``name`` (from the tzdata package) or raise :class:`ContextError`.

    >>> zone("Europe/Berlin").key
    'Europe/Berlin'
    """
    if not isinstance(name, str) or not name or name.startswith(("/", ".")) or ".." in name:
        raise ContextError(f"tz={name!r} is not an IANA time zone name such as 'Europe/Berlin'")
    try:
        return ZoneInfo(name)
    except (ZoneInfoNotFoundError, ValueError, OSError):
        raise ContextError(
            f"tz={name!r} is not an IANA time zone{_suggest_zone(name)}"
        ) from None


def _suggest_zone(name: str) -> str:
    """``"; did you mean 'Europe/Berlin'?"`` for a misspelt zone or a bare city ("berlin")."""
    close = suggest(name, _all_zones())
    if close:
        return close
    city = name.strip().replace(" ", "_").lower()
    cities: dict[str, str] = {}
    for z in sorted(_all_zones()):
        if "/" in z and not z.startswith(("Etc/", "SystemV/")):
            cities.setdefault(z.rsplit("/", 1)[1].lower(), z)
    if city in cities:
        return f"; did you mean {cities[city]!r}?"
    near = closest(city, cities)
    return f"; did you mean {cities[near]!r}?" if near else ""


def _parse_now(value: Any) -> datetime:
    if isinstance(value, datetime):
        return value
    if isinstance(value, str):
        text = value.strip()
        if text.endswith(("Z", "z")):
            text = text[:-1] + "+00:00"
        try:
            return datetime.fromisoformat(text)
        except ValueError:
            raise ContextError(
                f"now={value!r} is not an ISO 8601 date-time; expected e.g. "
                "'2026-12-02T10:00:00+01:00'"
            ) from None
    raise ContextError(f"now={value!r} must be a datetime or an ISO 8601 string")


def _normalize_locale(value: str) -> str:
    """Turn ``de-AT`` / ``de_at`` into the CLDR id ``de_AT``; validate it against babel."""
    from . import cldr

    return cldr.locale_id(value)


class Context(BaseModel):
    """Everything a phrase is resolved against.

    Attributes:
        now: the reference instant, aware; converted into ``tz``. A naive value is accepted only
            together with ``tz`` and is read as wall-clock time there: an ambiguous one (the
            clocks set back) as the earlier instant unless ``fold=1``, a skipped one (the clocks
            set forward) as the first instant after the gap.
        tz: IANA zone name. Defaults to the zone of an aware ``now`` when that is a ZoneInfo,
            or ``"UTC"`` when ``now`` is in UTC.
        week_start: ``monday`` | ``sunday`` | ``saturday``; default from CLDR week data for the
            locale's territory (babel), else Monday as in ISO 8601.
        locale: CLDR locale id (``en``, ``en_US``, ``de_AT``); input like ``en-us`` is accepted.
            It decides week start, weekend days and numeric date order.
        languages: languages whose phrases are looked for: deep languages (a file in
            locales/) and any other CLDR locale ("sw", "es_MX"), read from CLDR data alone.
            Default: every deep language at once, English first.
        bias: ``past`` (default) or ``future``: which occurrence an underspecified date such as
            "March" or "week 48" means (R12).
        window_reading: ``rolling`` (default) or ``calendar``: whether "the past 2 weeks" is the
            window ending now or the 2 whole weeks before the current one (R5).
        weekday_reading: ``nearest`` or ``week``: whether "last Monday" is the nearest Monday
            before today (R14) or Monday of last week (R16); default from the language's data.
        date_order: ``MDY`` | ``DMY`` | ``YMD`` for numeric dates; default from the locale's CLDR
            short date format.

    >>> ctx = Context.at("2026-11-27T10:00", tz="Europe/Berlin")
    >>> ctx.now.isoformat(), ctx.week_start
    ('2026-11-27T10:00:00+01:00', 'monday')
    """

    model_config = ConfigDict(frozen=True, extra="forbid", arbitrary_types_allowed=True)

    now: datetime
    tz: str = ""
    week_start: WeekStart | None = None
    locale: str = "en"
    languages: tuple[str, ...] = Field(default_factory=lambda: _deep())
    bias: Literal["past", "future"] = "past"
    window_reading: Literal["rolling", "calendar"] = "rolling"
    weekday_reading: Literal["nearest", "week"] | None = None
    date_order: Literal["MDY", "DMY", "YMD"] | None = None

    @classmethod
    def at(cls, now: datetime | str, **kwargs: Any) -> "Context":
        """Build a context from an ISO string or datetime plus keyword fields.

        Raises:
            ContextError: with a message naming the bad field.
        """
        return cls.model_validate({"now": now, **kwargs})

    @classmethod
    def model_validate(cls, obj: Any, **kwargs: Any) -> "Context":  # type: ignore[override]
        from pydantic import ValidationError

        try:
            return super().model_validate(obj, **kwargs)
        except ValidationError as exc:
            raise ContextError(_explain(exc)) from None

    def __init__(self, **data: Any) -> None:
        from pydantic import ValidationError

        try:
            super().__init__(**data)
        except ValidationError as exc:
            raise ContextError(_explain(exc)) from None

    @field_validator("now", mode="before")
    @classmethod
    def _v_now(cls, value: Any) -> datetime:
        return _parse_now(value)

    @field_validator("week_start", mode="before")
    @classmethod
    def _v_week_start(cls, value: Any) -> Any:
        if value is None or value == "":
            return None
        given = value
        if isinstance(value, int) and not isinstance(value, bool) and 0 <= value <= 6:
            value = WEEKDAYS[value]
        if isinstance(value, str):
            low = value.strip().lower()
            if low in ("monday", "sunday", "saturday"):
                return low
            for name in ("monday", "sunday", "saturday"):
                if len(low) >= 2 and name.startswith(low):
                    return name
        raise ContextError(
            f"week_start={given!r} is not supported; expected 'monday', 'sunday' or 'saturday'"
        )

    @field_validator("locale", mode="before")
    @classmethod
    def _v_locale(cls, value: Any) -> str:
        if not isinstance(value, str):
            raise ContextError(f"locale={value!r} must be a string such as 'en_US'")
        return _normalize_locale(value)

    @field_validator("languages", mode="before")
    @classmethod
    def _v_languages(cls, value: Any) -> tuple[str, ...]:
        from .locale import available_languages, cldr_tier_code, deep_languages

        if value is None or value == "" or value == "all":
            return deep_languages()
        if isinstance(value, str):
            value = [part for part in value.replace(";", ",").split(",")]
        if not isinstance(value, (list, tuple)) or not value:
            raise ContextError(f"languages={value!r} must name at least one language, e.g. 'en'")
        known = available_languages()
        out: list[str] = []
        for item in value:
            text = str(item).strip()
            code = text.replace("-", "_").lower()
            if code in known:
                found = code
            elif text == "all":
                out.extend(c for c in deep_languages() if c not in out)
                continue
            else:
                tier = cldr_tier_code(text)
                if tier is None:
                    raise ContextError(
                        f"language {item!r} is not available{suggest(code, known)} "
                        f"(deep languages: {', '.join(sorted(known))}; or any CLDR locale "
                        "such as 'sw' or 'es_MX')"
                    )
                base = tier.split("_")[0]
                # A deep language is read from its file whatever the region ("eng", "de_AT"
                # -> "de"); the region's conventions come from the context's locale.
                found = base if base in known else tier
            if found not in out:
                out.append(found)
        return tuple(out)

    @model_validator(mode="after")
    def _v_zone(self) -> "Context":
        now = self.now
        tz_name = self.tz
        if tz_name:
            tzinfo_: tzinfo = zone(tz_name)
        elif now.tzinfo is None:
            raise ContextError(
                f"now={now.isoformat()!r} has no UTC offset and no tz was given; "
                "pass tz='Europe/Berlin' (an IANA name) or an aware now"
            )
        elif isinstance(now.tzinfo, ZoneInfo) and now.tzinfo.key:
            tz_name = now.tzinfo.key
            tzinfo_ = now.tzinfo
        elif now.utcoffset() == timezone.utc.utcoffset(None):
            tz_name = "UTC"
            tzinfo_ = zone("UTC")
        else:
            raise ContextError(
                f"now={now.isoformat()!r} carries a fixed UTC offset but no tz was given; "
                "pass tz='Europe/Berlin' (an IANA name) so that days and weeks follow the "
                "zone's daylight-saving rules"
            )
        if now.tzinfo is None:
            local = now.replace(tzinfo=tzinfo_)
            wall = local.astimezone(timezone.utc).astimezone(tzinfo_).replace(tzinfo=None)
            if wall.replace(fold=0) != now.replace(fold=0):
                # A wall time the clocks skipped: the first instant after the gap, as periods do.
                from .calendars import local_instant

                local = local_instant(now.replace(fold=0), tzinfo_)
        else:
            local = now.astimezone(tzinfo_)
        object.__setattr__(self, "now", local)
        object.__setattr__(self, "tz", tz_name)
        if self.week_start is None:
            from . import cldr

            object.__setattr__(self, "week_start", WEEKDAYS[cldr.first_week_day(self.locale)])
            # Derived, not given: replace() derives it again for another locale.
            self.__pydantic_fields_set__.discard("week_start")
        return self

    # --- derived values (cheap, computed on use) ------------------------------------------

    @property
    def zone(self) -> ZoneInfo:
        """The :class:`~zoneinfo.ZoneInfo` of ``tz``."""
        return zone(self.tz)

    @property
    def first_weekday(self) -> int:
        """``week_start`` as a number, 0 = Monday (as ``date.weekday()`` and babel)."""
        return WEEKDAYS.index(self.week_start or "monday")

    def replace(self, **changes: Any) -> "Context":
        """Return a new context with some fields changed (validated again).

        A new ``tz`` without a new ``now`` keeps the instant. A week start that was derived from
        the locale is derived again from a new ``locale``; one that was given is kept.
        """
        data = self.model_dump()
        if "week_start" not in self.model_fields_set:
            del data["week_start"]
        data.update(changes)
        return Context.model_validate(data)


def _deep() -> tuple[str, ...]:
    from .locale import deep_languages

    return deep_languages()


def _explain(exc: Any) -> str:
    parts = []
    for err in exc.errors():
        loc = ".".join(str(p) for p in err.get("loc", ())) or "context"
        msg = err.get("msg", "invalid")
        if msg.startswith("Value error, "):
            msg = msg[len("Value error, ") :]
        # Messages that already name what was wrong ("language 'xx' is ...") stand alone.
        if loc == "context" or msg.startswith((f"{loc}=", "language ")):
            parts.append(msg)
        else:
            value = err.get("input")
            parts.append(f"{loc}={value!r}: {msg}" if value is not None else f"{loc}: {msg}")
    return "; ".join(parts)


_ = Field  # re-exported for subclasses that add fields
