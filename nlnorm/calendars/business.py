"""Business days: the locale's weekend from CLDR, public holidays, and closure days.

A :class:`BusinessCalendar` answers one question, "is this day open?", and steps over days that
are not. Weekend days come from CLDR week data for the locale's territory (via babel), public
holidays from the ``holidays`` package for a country and subdivision with its defaults
(observed days included), closures from the caller (an offsite, a release freeze).

>>> from datetime import date
>>> cal = BusinessCalendar.for_locale("en_US", closures=[date(2026, 12, 24)])
>>> cal.step(date(2026, 12, 28), -2)  # Monday, two business days back over a closed Thursday
datetime.date(2026, 12, 23)
"""

from __future__ import annotations

import functools
from dataclasses import dataclass, field
from datetime import date, timedelta
from typing import Callable, Iterable, Mapping

from ..errors import ContextError

__all__ = ["BusinessCalendar", "holiday_source"]

_WEEKDAY_NAMES = ("Monday", "Tuesday", "Wednesday", "Thursday", "Friday", "Saturday", "Sunday")
#: Far enough for any question; a step beyond it means the calendar has no open day at all.
_MAX_STEPS = 3660


@dataclass(frozen=True, slots=True)
class BusinessCalendar:
    """Which days are business days.

    Attributes:
        weekend: weekday numbers (0 = Monday) that are never business days.
        closures: extra closed days (custom closures), with a reason each.
        country / subdivision: the public-holiday calendar of the ``holidays`` package, if any.
    """

    weekend: frozenset[int] = frozenset({5, 6})
    closures: Mapping[date, str] = field(default_factory=dict)
    country: str | None = None
    subdivision: str | None = None

    def __post_init__(self) -> None:
        if not all(isinstance(d, int) and 0 <= d <= 6 for d in self.weekend):
            raise ContextError(f"weekend={sorted(self.weekend)!r}: weekdays are 0 (Monday) to 6")
        if len(self.weekend) == 7:
            raise ContextError("weekend names all seven days: no day would be a business day")
        if self.country is not None:
            holiday_source(self.country, self.subdivision)  # fail early on a bad country

    @classmethod
    def for_locale(
        cls,
        locale: str = "en",
        holidays: str | None = None,
        closures: Iterable[date] | Mapping[date, str] = (),
    ) -> "BusinessCalendar":
        """The calendar of a CLDR locale's territory: its weekend from CLDR, plus the public
        holidays of ``holidays`` (``"US"``, ``"DE-BY"``, ``"US-CA"``) and ``closures``.

        >>> BusinessCalendar.for_locale("fa_IR").weekend
        frozenset({4})
        """
        from .. import cldr

        weekend = frozenset(cldr.weekend_days(cldr.locale_id(locale)))
        country, subdivision = parse_holidays(holidays) if holidays else (None, None)
        if isinstance(closures, Mapping):
            closed = {_as_date(d, "closures"): str(reason) for d, reason in closures.items()}
        else:
            closed = {_as_date(d, "closures"): "closed" for d in closures}
        return cls(weekend, closed, country, subdivision)

    def holiday(self, day: date) -> str | None:
        """Why ``day`` is closed, other than the weekend: a closure or a public holiday."""
        if day in self.closures:
            return self.closures[day]
        if self.country is not None:
            return holiday_source(self.country, self.subdivision)(day.year).get(day)
        return None

    def is_open(self, day: date) -> bool:
        """Whether ``day`` is a business day."""
        return day.weekday() not in self.weekend and self.holiday(day) is None

    def why_closed(self, day: date) -> str | None:
        """``None`` on a business day, else the reason ("Saturday", "Christmas Day")."""
        if day.weekday() in self.weekend:
            return _WEEKDAY_NAMES[day.weekday()]
        return self.holiday(day)

    def step(self, day: date, n: int) -> date:
        """The day reached by stepping ``n`` business days from ``day`` (back when ``n`` < 0).
        ``day`` itself is step 0 and is never counted, whether or not it is a business day;
        ``step(day, 0)`` is ``day``."""
        if n == 0:
            return day
        unit = timedelta(days=1 if n > 0 else -1)
        left = abs(n)
        current = day
        walked = 0
        while left:
            current += unit
            walked += 1
            if walked > _MAX_STEPS * max(1, abs(n)):
                raise ContextError("no business day found: check the weekend and closures")
            if self.is_open(current):
                left -= 1
        return current

    def count(self, start: date, end: date) -> int:
        """Business days in ``[start, end)``."""
        n, day = 0, start
        while day < end:
            n += self.is_open(day)
            day += timedelta(days=1)
        return n

    def describe(self) -> str:
        """How the calendar was built, for notes: "weekend Saturday, Sunday; holidays US-CA"."""
        parts = ["weekend " + ", ".join(_WEEKDAY_NAMES[d] for d in sorted(self.weekend))]
        if self.country:
            parts.append("holidays " + self.country + (f"-{self.subdivision}" if self.subdivision else ""))
        if self.closures:
            parts.append(f"{len(self.closures)} closure day(s)")
        return "; ".join(parts)


def parse_holidays(value: str) -> tuple[str, str | None]:
    """``"US-CA"`` -> ``("US", "CA")``; ``"DE"`` -> ``("DE", None)``. Validated against the
    ``holidays`` package.

    >>> parse_holidays("us-ca")
    ('US', 'CA')
    """
    if not isinstance(value, str) or not value.strip():
        raise ContextError(f"holidays={value!r}: expected a country code such as 'US' or 'DE-BY'")
    country, _, subdivision = value.strip().partition("-")
    country = country.upper()
    sub = subdivision.upper() or None
    holiday_source(country, sub)
    return country, sub


@functools.lru_cache(maxsize=64)
def holiday_source(country: str, subdivision: str | None) -> Callable[[int], Mapping[date, str]]:
    """A function year -> {date: holiday name} for a country (and subdivision), from the
    ``holidays`` package with its defaults (observed days included). Imported on first use:
    the package costs ~60 ms to import."""
    try:
        import holidays as holidays_package
    except ImportError:  # pragma: no cover - a dependency of nlnorm
        raise ContextError("public holidays need the 'holidays' package: pip install holidays") from None
    supported = holidays_package.list_supported_countries()
    if country not in supported:
        from ..errors import suggest

        raise ContextError(f"holidays: no public-holiday calendar for country {country!r}"
                           f"{suggest(country, supported) or ''}")
    subdivisions = supported[country]
    if subdivision is not None and subdivision not in subdivisions:
        shown = ", ".join(subdivisions[:12]) + (", ..." if len(subdivisions) > 12 else "")
        raise ContextError(f"holidays: {country} has no subdivision {subdivision!r}"
                           f" (known: {shown or 'none'})")

    @functools.lru_cache(maxsize=256)
    def year(y: int) -> Mapping[date, str]:
        table = holidays_package.country_holidays(country, subdiv=subdivision, years=y)
        return {d: str(name) for d, name in table.items()}

    return year


def _as_date(value: object, what: str) -> date:
    if isinstance(value, date):
        return value if type(value) is date else date(value.year, value.month, value.day)
    if isinstance(value, str):
        try:
            return date.fromisoformat(value.strip())
        except ValueError:
            pass
    raise ContextError(f"{what}: {value!r} is not a date (expected e.g. '2026-12-24')")
