"""The reference context every resolution is made against.

A :class:`Context` is immutable and validated once; build it with :meth:`Context.at` from strings
or with keyword arguments. Nothing here reads the system clock: ``now`` is always given.
"""

from __future__ import annotations

import functools
from datetime import date, datetime, timezone, tzinfo
from typing import Any, Literal, cast
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
        sprints: the team's sprint calendar (:class:`~nlnorm.calendars.sprints.SprintCalendar`,
            or rows / a path to a CSV or JSON file, read with inclusive ends).
        team: the team whose sprints "this sprint" means (a table with several teams gives one
            reading per team otherwise).
        fiscal: the fiscal calendar (:class:`~nlnorm.calendars.fiscal.FiscalYear` or
            :class:`~nlnorm.calendars.fiscal.RetailYear`); ``fiscal_start="04"`` (``MM`` or
            ``MM-DD``) and ``fiscal_name="start"|"end"`` build a FiscalYear.
        quarters: ``calendar`` (default) or ``fiscal``: whether a plain "Q3" or "this quarter"
            means a fiscal quarter.
        sprint_window: ``completed`` (default) or ``with_current``: whether "the last 3 sprints"
            are the three before the current one or the current one and the two before it.
        holidays: public holidays for business days, ``"US"``, ``"DE-BY"`` (the ``holidays``
            package); the weekend always comes from CLDR for the locale's territory.
        closures: extra closed days (dates) for business days.

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
    sprints: Any = None  # SprintCalendar | None (validated below)
    team: str | None = None
    fiscal: Any = None  # FiscalYear | RetailYear | None (validated below)
    quarters: Literal["calendar", "fiscal"] = "calendar"
    sprint_window: Literal["completed", "with_current"] = "completed"
    holidays: str | None = None
    closures: tuple[date, ...] = ()

    @classmethod
    def at(cls, now: datetime | str, **kwargs: Any) -> "Context":
        """Build a context from an ISO string or datetime plus keyword fields.

        Raises:
            ContextError: with a message naming the bad field.
        """
        return cls.model_validate({"now": now, **kwargs})

    @classmethod
    def model_validate(cls, obj: Any, **kwargs: Any) -> "Context":
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

    @model_validator(mode="before")
    @classmethod
    def _v_fiscal_start(cls, data: Any) -> Any:
        if isinstance(data, dict) and ("fiscal_start" in data or "fiscal_name" in data):
            from .calendars.fiscal import FiscalYear, Naming, parse_fiscal_start

            data = dict(data)
            start = data.pop("fiscal_start", None)
            naming = data.pop("fiscal_name", None) or "end"
            if start is None:
                if data.get("fiscal") is None:
                    raise ContextError("fiscal_name was given without fiscal_start (e.g. '04')")
                fiscal = data["fiscal"]
                if hasattr(fiscal, "naming") and naming != fiscal.naming:
                    import dataclasses

                    data["fiscal"] = dataclasses.replace(fiscal, naming=naming)
            else:
                month, day = parse_fiscal_start(start)
                # FiscalYear checks the naming and says what it expects
                data["fiscal"] = FiscalYear(month, day, cast(Naming, naming))
        return data

    @field_validator("sprints", mode="before")
    @classmethod
    def _v_sprints(cls, value: Any) -> Any:
        from .calendars.sprints import SprintCalendar

        if value is None or isinstance(value, SprintCalendar):
            return value
        if isinstance(value, (str,)) or hasattr(value, "__fspath__"):
            return SprintCalendar.load(value)
        if isinstance(value, (list, tuple)):
            return SprintCalendar.from_rows(value)
        raise ContextError(f"sprints must be a SprintCalendar, a list of rows or a path, "
                           f"got {type(value).__name__}")

    @field_validator("fiscal", mode="before")
    @classmethod
    def _v_fiscal(cls, value: Any) -> Any:
        from .calendars.fiscal import FiscalYear, RetailYear, parse_fiscal_start

        if value is None or isinstance(value, (FiscalYear, RetailYear)):
            return value
        if isinstance(value, (str, int)):
            month, day = parse_fiscal_start(str(value))
            return FiscalYear(month, day)
        raise ContextError(f"fiscal must be a FiscalYear or RetailYear (or 'MM'/'MM-DD'), "
                           f"got {type(value).__name__}")

    @field_validator("holidays", mode="before")
    @classmethod
    def _v_holidays(cls, value: Any) -> Any:
        if value is None or value == "":
            return None
        from .calendars.business import parse_holidays

        country, sub = parse_holidays(value)
        return country + (f"-{sub}" if sub else "")

    @field_validator("closures", mode="before")
    @classmethod
    def _v_closures(cls, value: Any) -> Any:
        from .calendars.business import _as_date

        if value is None:
            return ()
        if isinstance(value, (str, date)):
            value = [value]
        return tuple(sorted({_as_date(v, "closures") for v in value}))

    @model_validator(mode="after")
    def _v_team(self) -> "Context":
        if self.team is not None:
            team = self.team.strip()
            if not team:
                object.__setattr__(self, "team", None)
            elif self.sprints is not None and not self.sprints.has_team(team):
                known = ", ".join(repr(t) for t in self.sprints.teams if t) or "none"
                raise ContextError(f"team={team!r} has no sprint in the sprint table "
                                   f"(teams: {known}){suggest(team, [t for t in self.sprints.teams if t])}")
        return self

    @property
    def business(self) -> Any:
        """The business-day calendar: CLDR weekend of the locale's territory, ``holidays``,
        ``closures``."""
        return _business(self.locale, self.holidays, self.closures)

    @model_validator(mode="after")
    def _v_zone(self) -> "Context":
        now = self.now
        tz_name = self.tz
        if tz_name:
            tzinfo_: ZoneInfo = zone(tz_name)
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
        # The fields as they are (model_dump would turn calendars into dicts).
        data = {name: getattr(self, name) for name in type(self).model_fields}
        if "week_start" not in self.model_fields_set:
            del data["week_start"]
        data.update(changes)
        return Context.model_validate(data)


@functools.lru_cache(maxsize=64)
def _business(locale: str, holidays: str | None, closures: tuple[date, ...]) -> Any:
    from .calendars.business import BusinessCalendar

    return BusinessCalendar.for_locale(locale, holidays=holidays, closures=closures)


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
