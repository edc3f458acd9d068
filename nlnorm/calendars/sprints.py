"""The sprint (iteration) calendar: a validated, immutable table of a team's sprints.

Rows have a ``name``, an optional ``number``, a ``start`` and an ``end`` date, an optional
``team`` and an optional ``id`` (the key a SQL predicate can use). Loaded from CSV (with a
header), JSON (a list of objects), a list of dicts, or a query through any DB-API 2
connection. ``end`` is the sprint's last day (inclusive) unless ``end="exclusive"`` says it is
the day after.

Gaps between sprints are normal (an offsite, a holiday week). Overlapping sprints of one team,
reversed or duplicate rows, and unparsable dates are errors naming the row; unsorted rows are
simply sorted.

>>> cal = SprintCalendar.from_rows([
...     {"name": "Harbor-7", "number": 47, "start": "2026-11-23", "end": "2026-12-04"},
...     {"name": "Harbor-6", "number": 46, "start": "2026-11-09", "end": "2026-11-20"},
... ])
>>> [s.name for s in cal.sprints], cal.sprints[1].end   # sorted; end stored exclusive
(['Harbor-6', 'Harbor-7'], datetime.date(2026, 12, 5))
"""

from __future__ import annotations

import csv
import io
import json
import re
from dataclasses import dataclass, field
from datetime import date, datetime
from pathlib import Path
from typing import Any, Iterable, Literal, Mapping, Sequence

from ..errors import NlnormError

__all__ = ["Sprint", "SprintCalendar", "SprintTableError", "sprint_key"]

EndConvention = Literal["inclusive", "exclusive"]
_FIELDS = ("name", "number", "start", "end", "team", "id")


class SprintTableError(NlnormError, ValueError):
    """A sprint table row is wrong; the message names the row and the field."""


@dataclass(frozen=True, slots=True)
class Sprint:
    """One sprint: ``[start, end)`` in local days (``end`` is the day after the last day)."""

    name: str
    start: date
    end: date
    number: int | None = None
    team: str | None = None
    id: Any = None
    row: str = ""  # where the row came from, for messages ("row 3 of sprints.csv")

    @property
    def last_day(self) -> date:
        from datetime import timedelta

        return self.end - timedelta(days=1)

    def label(self) -> str:
        """How notes name the sprint: "Harbor-7 (#47, team Wrenfold)"."""
        extra = []
        if self.number is not None and str(self.number) not in self.name:
            extra.append(f"#{self.number}")
        if self.team:
            extra.append(f"team {self.team}")
        return self.name + (f" ({', '.join(extra)})" if extra else "")


def sprint_key(text: str) -> str:
    """The lookup key of a sprint name: case, spaces, dashes and underscores ignored, a
    leading "sprint" dropped ("Sprint Harbor-7", "harbor 7" and "HARBOR_7" are one key).

    >>> sprint_key("Sprint Harbor-7"), sprint_key("harbor 7")
    ('harbor7', 'harbor7')
    """
    folded = re.sub(r"[\s_\-./]+", "", text.casefold())
    if folded.startswith("sprint") and len(folded) > len("sprint"):
        folded = folded[len("sprint"):]
    return folded


@dataclass(frozen=True, eq=False)
class SprintCalendar:
    """Sprints sorted by team and start. Build with :meth:`from_rows`, :meth:`from_csv`,
    :meth:`from_json`, :meth:`from_query` or :meth:`load`. Compared and hashed by identity
    (a context holding one stays hashable)."""

    sprints: tuple[Sprint, ...]
    source: str = "sprints"
    _by_key: Mapping[str, tuple[Sprint, ...]] = field(default_factory=dict, repr=False, compare=False)
    _by_number: Mapping[int, tuple[Sprint, ...]] = field(default_factory=dict, repr=False, compare=False)

    # -- building ---------------------------------------------------------------------------

    @classmethod
    def from_rows(cls, rows: Iterable[Mapping[str, Any]], end: EndConvention = "inclusive",
                  source: str = "rows", first_row: int = 1) -> "SprintCalendar":
        """Validate rows (mappings with the fields above) into a calendar.

        Raises:
            SprintTableError: naming the row for a missing name, an unparsable or reversed
                date, a duplicate, or two overlapping sprints of one team.
        """
        if end not in ("inclusive", "exclusive"):
            raise SprintTableError(f"end={end!r}: expected 'inclusive' (end is the sprint's "
                                   "last day) or 'exclusive' (end is the day after)")
        from datetime import timedelta

        built: list[Sprint] = []
        for index, row in enumerate(rows, start=first_row):
            where = f"row {index} of {source}"
            if not isinstance(row, Mapping):
                raise SprintTableError(f"{where}: expected an object with name, start and end, "
                                       f"got {type(row).__name__}")
            lowered = {str(k).strip().lower(): v for k, v in row.items()}
            name = lowered.get("name")
            if name is None or not str(name).strip():
                raise SprintTableError(f"{where}: field 'name' is missing or empty")
            start = _date(lowered.get("start"), "start", where)
            last = _date(lowered.get("end"), "end", where)
            stop = last + timedelta(days=1) if end == "inclusive" else last
            if stop <= start:
                said = "last day" if end == "inclusive" else "exclusive end"
                raise SprintTableError(
                    f"{where}: sprint {str(name).strip()!r} ends before it starts "
                    f"(start {start.isoformat()}, {said} {last.isoformat()})"
                    + ("; if 'end' is the day after the last day, use end='exclusive' "
                       "(--sprint-end exclusive)" if end == "inclusive" and last == start - timedelta(days=1) else ""))
            number = _number(lowered.get("number"), where)
            team = lowered.get("team")
            team = str(team).strip() or None if team is not None else None
            built.append(Sprint(str(name).strip(), start, stop, number, team, lowered.get("id"), where))
        if not built:
            raise SprintTableError(f"{source} holds no sprint rows")
        return cls._validated(built, source)

    @classmethod
    def _validated(cls, rows: list[Sprint], source: str) -> "SprintCalendar":
        rows = sorted(rows, key=lambda s: (s.team or "", s.start, s.end))
        seen: dict[tuple[str, str], Sprint] = {}
        numbers: dict[tuple[str, int], Sprint] = {}
        previous: Sprint | None = None
        for s in rows:
            team = s.team or ""
            key = (team, sprint_key(s.name))
            if key in seen:
                raise SprintTableError(f"{s.row}: duplicate sprint {s.name!r}"
                                       + (f" of team {s.team!r}" if s.team else "")
                                       + f" (also {seen[key].row})")
            seen[key] = s
            if s.number is not None:
                if (team, s.number) in numbers:
                    raise SprintTableError(f"{s.row}: duplicate sprint number {s.number}"
                                           + (f" of team {s.team!r}" if s.team else "")
                                           + f" (also {numbers[(team, s.number)].row})")
                numbers[(team, s.number)] = s
            if previous is not None and (previous.team or "") == team and s.start < previous.end:
                raise SprintTableError(
                    f"{s.row}: sprint {s.name!r} ({s.start.isoformat()} to {s.last_day.isoformat()}) "
                    f"overlaps {previous.name!r} ({previous.start.isoformat()} to "
                    f"{previous.last_day.isoformat()}, {previous.row})"
                    + (f" of team {s.team!r}" if s.team else ""))
            previous = s
        by_key: dict[str, list[Sprint]] = {}
        by_number: dict[int, list[Sprint]] = {}
        for s in rows:
            by_key.setdefault(sprint_key(s.name), []).append(s)
            if s.number is not None:
                by_number.setdefault(s.number, []).append(s)
        return cls(tuple(rows), source, {k: tuple(v) for k, v in by_key.items()},
                   {k: tuple(v) for k, v in by_number.items()})

    @classmethod
    def from_csv(cls, path: str | Path | None = None, text: str | None = None,
                 end: EndConvention = "inclusive") -> "SprintCalendar":
        """Read a CSV file with a header row (``name,number,start,end,team``)."""
        source = Path(path).name if path is not None else "CSV"
        if text is None:
            text = _read(path)
        reader = csv.DictReader(io.StringIO(text))
        header = [h.strip().lower() for h in reader.fieldnames or []]
        missing = [f for f in ("name", "start", "end") if f not in header]
        if missing:
            raise SprintTableError(f"{source}: the header {', '.join(header) or '(empty)'} lacks "
                                   f"{', '.join(repr(m) for m in missing)}; expected a header "
                                   "such as name,number,start,end,team")
        rows = [{k: (v if v != "" else None) for k, v in r.items() if k is not None} for r in reader]
        # Row N is line N + 1 of the file (the header is line 1).
        return cls.from_rows(rows, end, source=f"{source} (line = row + 1)")

    @classmethod
    def from_json(cls, path: str | Path | None = None, text: str | None = None,
                  end: EndConvention = "inclusive") -> "SprintCalendar":
        """Read a JSON list of objects (``[{"name": ..., "start": ..., "end": ...}, ...]``)."""
        source = Path(path).name if path is not None else "JSON"
        if text is None:
            text = _read(path)
        try:
            data = json.loads(text)
        except json.JSONDecodeError as exc:
            raise SprintTableError(f"{source} is not valid JSON: {exc}") from None
        if isinstance(data, Mapping) and isinstance(data.get("sprints"), list):
            data = data["sprints"]
        if not isinstance(data, list):
            raise SprintTableError(f"{source}: expected a JSON list of sprint objects, "
                                   f"got {type(data).__name__}")
        return cls.from_rows(data, end, source=source)

    @classmethod
    def from_query(cls, connection: Any, sql: str, params: Sequence[Any] | Mapping[str, Any] = (),
                   end: EndConvention = "inclusive") -> "SprintCalendar":
        """Run ``sql`` on a DB-API 2 connection; its columns are named like the fields
        (``SELECT sprint_name AS name, ...``). Dates may be DATE values or ISO strings."""
        cursor = connection.cursor()
        try:
            cursor.execute(sql, params)
            if cursor.description is None:
                raise SprintTableError("the sprint query returned no result set")
            names = [str(d[0]).lower() for d in cursor.description]
            rows = [dict(zip(names, r)) for r in cursor.fetchall()]
        finally:
            try:
                cursor.close()
            except Exception:  # pragma: no cover - some drivers cannot close twice
                pass
        return cls.from_rows(rows, end, source="the sprint query")

    @classmethod
    def load(cls, path: str | Path, end: EndConvention = "inclusive") -> "SprintCalendar":
        """A ``.csv`` or ``.json`` file, chosen by its suffix (else by its first character)."""
        text = _read(path)
        suffix = Path(path).suffix.lower()
        if suffix == ".json" or (suffix != ".csv" and text.lstrip()[:1] in "[{"):
            return cls.from_json(path, text, end)
        return cls.from_csv(path, text, end)

    # -- looking up -------------------------------------------------------------------------

    @property
    def teams(self) -> tuple[str | None, ...]:
        return tuple(dict.fromkeys(s.team for s in self.sprints))

    def of_team(self, team: str | None) -> tuple[Sprint, ...]:
        """The sprints of ``team`` in order (matched case-insensitively); ``None``: every
        sprint of a table without teams."""
        if team is None:
            return tuple(s for s in self.sprints if s.team is None)
        low = team.casefold()
        return tuple(s for s in self.sprints if (s.team or "").casefold() == low)

    def has_team(self, team: str) -> bool:
        return any((s.team or "").casefold() == team.casefold() for s in self.sprints)

    def named(self, text: str) -> tuple[Sprint, ...]:
        """Sprints whose name matches ``text`` (case and spacing ignored), in every team."""
        return self._by_key.get(sprint_key(text), ())

    def numbered(self, number: int) -> tuple[Sprint, ...]:
        """Sprints with this number, or named by it ("Sprint 42"), in every team."""
        found = self._by_number.get(number, ())
        return found or self._by_key.get(str(number), ())


def _read(path: str | Path | None) -> str:
    if path is None:
        raise SprintTableError("give a path or the text of the sprint table")
    try:
        return Path(path).read_text(encoding="utf-8-sig")
    except FileNotFoundError:
        raise SprintTableError(f"sprint table {str(path)!r} does not exist") from None
    except (OSError, UnicodeDecodeError) as exc:
        raise SprintTableError(f"sprint table {str(path)!r} cannot be read: {exc}") from None


def _date(value: Any, name: str, where: str) -> date:
    if isinstance(value, datetime):
        return value.date()
    if isinstance(value, date):
        return value
    if value is None or (isinstance(value, str) and not value.strip()):
        raise SprintTableError(f"{where}: field {name!r} is missing")
    if isinstance(value, str):
        text = value.strip()
        try:
            return date.fromisoformat(text[:10]) if len(text) > 10 and text[10] in "T " else date.fromisoformat(text)
        except ValueError:
            pass
    raise SprintTableError(f"{where}: field {name!r} = {value!r} is not an ISO date such as '2026-11-23'")


def _number(value: Any, where: str) -> int | None:
    if value is None or (isinstance(value, str) and not value.strip()):
        return None
    if isinstance(value, bool):
        raise SprintTableError(f"{where}: field 'number' = {value!r} is not a whole number")
    if isinstance(value, int):
        number = value
    elif isinstance(value, float) and value.is_integer():
        number = int(value)
    elif isinstance(value, str) and value.strip().isdigit():
        number = int(value.strip())
    else:
        raise SprintTableError(f"{where}: field 'number' = {value!r} is not a whole number")
    if number < 0:
        raise SprintTableError(f"{where}: field 'number' = {value!r} must not be negative")
    return number
