"""How a column stores time, declared by the caller (never guessed), and the bound values that
storage needs.

Bounds are local wall times in the question's zone (the ``start``/``end`` of a mention); each
is converted to what the column holds:

* ``date``: a calendar day. The start is the day holding it, the end the first day after the
  interval (a day partly inside the interval is selected: its rows may be in it).
* ``local``: a wall-clock timestamp without zone, in ``zone`` (default: the question's zone).
* ``utc``: a timestamp without zone holding UTC.
* ``instant``: an aware instant (timestamptz and its kin), compared as an instant.

SQLite has no date or timestamp type, so its ``encoding`` says how the column is written:
``text`` ("2026-03-01 10:00:00", as SQLite's datetime() writes it), ``text-t``
("2026-03-01T10:00:00"), ``unix`` (seconds since 1970, integer or real) or ``julian`` (a julian
day number, as julianday() gives it). Text compares as text, so the two text forms are not
interchangeable: '2026-03-01T10:00' < '2026-03-01 23:00' is false.
"""

from __future__ import annotations

from dataclasses import dataclass
from datetime import date, datetime, time, timedelta, timezone
from typing import Any, Literal
from zoneinfo import ZoneInfo

from .errors import SqlError

__all__ = ["Column", "KINDS", "ENCODINGS", "bound_value"]

KINDS = ("date", "local", "utc", "instant")
ENCODINGS = ("text", "text-t", "unix", "julian")
ColumnKind = Literal["date", "local", "utc", "instant"]
Encoding = Literal["text", "text-t", "unix", "julian"]

_UTC = timezone.utc
_EPOCH = datetime(1970, 1, 1, tzinfo=_UTC)
_JULIAN_MS_AT_EPOCH = 210_866_760_000_000  # SQLite's julian day of 1970-01-01, in ms


@dataclass(frozen=True, slots=True)
class Column:
    """A column the predicate is written for: its name and how it stores time.

    >>> Column("created_at", "local", zone="Europe/Berlin").kind
    'local'
    """

    name: str
    kind: ColumnKind = "instant"
    zone: str | None = None  # the wall-clock zone of a "local" column (default: the question's)
    encoding: Encoding | None = None  # SQLite only (default: text, or unix for instants)

    def __post_init__(self) -> None:
        if self.kind not in KINDS:
            raise SqlError(f"column kind={self.kind!r}: use one of {', '.join(KINDS)} (date; a "
                           "wall-clock timestamp in a zone; a timestamp holding UTC; an aware "
                           "instant such as timestamptz)")
        if self.encoding is not None and self.encoding not in ENCODINGS:
            raise SqlError(f"encoding={self.encoding!r}: use one of {', '.join(ENCODINGS)}")
        if self.encoding in ("unix", "julian") and self.kind != "instant":
            raise SqlError(f"encoding={self.encoding!r} holds instants: declare the column "
                           f"kind='instant', not {self.kind!r}")
        if self.encoding in ("text", "text-t") and self.kind == "instant":
            raise SqlError("a text column holds no zone, so it cannot be kind='instant': "
                           "declare kind='utc' (text in UTC) or kind='local' (wall-clock text)")
        if self.zone is not None:
            if self.kind != "local":
                raise SqlError(f"zone={self.zone!r} is only for kind='local' columns (a "
                               "wall-clock timestamp in that zone)")
            iana_zone(self.zone, "zone")

    def sqlite_encoding(self) -> str:
        """The encoding used on SQLite: the declared one, else text (unix for instants)."""
        if self.encoding is not None:
            return self.encoding
        return "unix" if self.kind == "instant" else "text"


def iana_zone(name: str, what: str) -> ZoneInfo:
    """The IANA zone ``name``, or an SqlError naming the argument ``what`` that gave it."""
    try:
        return ZoneInfo(name)
    except Exception:
        raise SqlError(f"{what}={name!r} is not an IANA time zone, e.g. 'Europe/Berlin'") from None


def day_start(day: date, zone: ZoneInfo) -> datetime:
    """The first instant of ``day`` in ``zone``: local midnight, or the first wall time after
    it where midnight does not exist (a DST change at 00:00, as in America/Santiago)."""
    return datetime.combine(day, time(0), zone).astimezone(_UTC).astimezone(zone)


def bound_value(moment: datetime, side: str, column: Column, dialect_name: str,
                question_zone: ZoneInfo) -> Any:
    """The value a column of this storage is compared with at an interval's ``side``
    (``"start"`` or ``"end"``) ``moment`` (aware): a date, a datetime, or on SQLite the stored
    encoding (str, int or float)."""
    kind = column.kind
    if kind == "date":
        local = moment.astimezone(question_zone)
        day = local.date()
        if side == "end" and local != day_start(day, question_zone):
            day += timedelta(days=1)  # the day the interval ends in is partly inside it
        return day.isoformat() if dialect_name == "sqlite" else day
    if kind == "local":
        zone = ZoneInfo(column.zone) if column.zone else question_zone
        wall = moment.astimezone(zone).replace(tzinfo=None)
        return _text(wall, column.sqlite_encoding()) if dialect_name == "sqlite" else wall
    utc = moment.astimezone(_UTC)
    if kind == "utc":
        wall = utc.replace(tzinfo=None)
        return _text(wall, column.sqlite_encoding()) if dialect_name == "sqlite" else wall
    if dialect_name == "sqlite":
        delta = utc - _EPOCH
        ms_exact = delta.days * 86_400_000_000 + delta.seconds * 1_000_000 + delta.microseconds
        if column.sqlite_encoding() == "julian":
            # SQLite keeps julian days as whole milliseconds divided by 86,400,000.0; a row at
            # whole millisecond m is at or after the bound exactly when m is at or after the
            # bound rounded up to a whole millisecond (rounding down would let in the row just
            # before a bound with a fraction of a millisecond).
            return (-(-ms_exact // 1000) + _JULIAN_MS_AT_EPOCH) / 86_400_000.0
        return ms_exact // 1_000_000 if ms_exact % 1_000_000 == 0 else ms_exact / 1_000_000
    return utc


def _text(wall: datetime, encoding: str) -> str:
    """A wall time as SQLite text, at the shortest precision that is exact (date, minutes,
    seconds, a fraction of a second without trailing zeros): a shorter string sorts before
    every longer one it starts, so '2026-03-01' <= '2026-03-01 00:00:00' and
    '...:30.5' <= '...:30.500', and rows written with or without seconds or with any number
    of fraction digits compare right against it."""
    if wall.time() == time(0):
        return wall.date().isoformat()
    sep = "T" if encoding == "text-t" else " "
    out = f"{wall.date().isoformat()}{sep}{wall.hour:02d}:{wall.minute:02d}"
    if wall.second or wall.microsecond:
        out += f":{wall.second:02d}"
    if wall.microsecond:
        out += f".{wall.microsecond:06d}".rstrip("0")
    return out
