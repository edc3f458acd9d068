"""The intermediate form: what nlnorm returns for each question, as pydantic models.

``docs/schema.json`` is generated from :class:`Result` (``nlnorm schema``) and checked by the
tests, so the published schema cannot drift from the code.
"""

from __future__ import annotations

from typing import Any, TypeVar

from pydantic import BaseModel, ConfigDict, Field

__all__ = ["Alternative", "Mention", "Slot", "Template", "Reference", "Result", "built"]


class _Out(BaseModel):
    model_config = ConfigDict(frozen=True, extra="forbid")


_M = TypeVar("_M", bound=BaseModel)


class Alternative(_Out):
    """Another plausible reading of a mention, and the context policy that would select it."""

    start: str | None = Field(description="inclusive start, ISO 8601 with UTC offset; null if unbounded")
    end: str | None = Field(description="exclusive end, ISO 8601 with UTC offset; null if unbounded")
    value: str = Field(description="ISO 8601 form of the alternative")
    grain: str
    reading: str = Field(description="the reading id (R1-R26) of this alternative")
    policy: str | None = Field(
        description="the context setting that selects this reading, e.g. 'bias=future'; null "
        "when no setting does (reword the question instead)"
    )
    note: str = Field(description="how the phrase is read this way, in plain words")
    sprints: tuple[str, ...] = Field(default=(), description="the sprints this reading covers "
                                     "(sprint readings only), by name")


class SqlPredicate(_Out):
    """A mention's period as a SQL predicate (when one was asked for: ``--sql-column``)."""

    dialect: str = Field(description="sqlglot's name of the dialect the predicate is written in")
    where: str = Field(description="the predicate: column >= start AND column < end (an open "
                       "side left out); 1 = 1 when both sides are open")
    params: list[Any] | dict[str, Any] = Field(
        description="the bound values in placeholder order (qmark, numeric, format) or by name "
        "(named, pyformat), as ISO 8601 text (numbers for SQLite's unix and julian columns); "
        "empty when the values are written into 'where' (--literal)")


class Mention(_Out):
    """One phrase of the question with the explicit value it stands for."""

    text: str = Field(description="the phrase exactly as in the question")
    char_start: int = Field(description="start index into the question (Python str index)")
    char_end: int = Field(description="end index (exclusive); text == question[char_start:char_end]")
    kind: str = Field(description="range | instant | duration | sprint | number | person | value")
    start: str | None = Field(description="inclusive start, ISO 8601 with UTC offset; null if unbounded")
    end: str | None = Field(description="exclusive end, ISO 8601 with UTC offset; null if unbounded")
    grain: str = Field(description="minute | hour | day | week | month | quarter | half | year | "
                       "sprint | business_day | fiscal_quarter | fiscal_year")
    value: str = Field(description="ISO 8601 form: 2026-12-01, 2026-W48, 2026-11, 2026-Q4, 2026-H2, "
                       "2026, P3D, or an interval: calendar dates with the end date included "
                       "(2026-03-01/2026-04-15, ../2026-02-28) or date-times with offset; "
                       "'..' is an open end (ISO 8601-2); start and end are always exact")
    lang: str = Field(description="language that matched the phrase ('und' for ISO notation)")
    reading: str = Field(description="the default-reading id it used (R1-R26; see docs/readings.md)")
    note: str = Field(description="how the phrase was read, in plain words")
    confidence: float = Field(1.0, description="1.0, lower for a phrase matched with a typo")
    alternatives: tuple[Alternative, ...] = Field(
        default=(), description="other plausible readings, each with the policy selecting it"
    )
    sprints: tuple[str, ...] = Field(default=(), description="kind 'sprint': the names of the "
                                     "sprints the interval covers, from the sprint table")
    sql: SqlPredicate | None = Field(
        None, exclude_if=lambda v: v is None,
        description="the period as a SQL predicate, present only when one was asked for "
        "(--sql-column); left out for a mention that is no period (an instant, a duration)")


class Slot(_Out):
    """The bound values of one template placeholder."""

    start: str | None
    end: str | None
    value: str
    kind: str
    grain: str


class Template(_Out):
    """The question with each phrase replaced by ``{t1}``, ``{t2}``... and the bound values."""

    text: str
    slots: dict[str, Slot]


class Reference(_Out):
    """The context the question was resolved against."""

    now: str
    tz: str
    week_start: str
    locale: str
    languages: tuple[str, ...]


class Result(_Out):
    """Everything nlnorm says about one question."""

    id: Any = Field(None, description="the input line's id, echoed (batch)")
    text: str | None = Field(description="the question as given")
    reference: Reference | None = Field(None, description="now, zone and conventions used")
    mentions: tuple[Mention, ...] = ()
    rewritten: str | None = Field(
        None,
        description="the question with each phrase replaced by explicit ISO dates; says whether "
        "the last day is included",
    )
    template: Template | None = None
    error: str | None = Field(None, description="null unless the input was bad; then what was wrong")


def built(cls: type[_M], **values: Any) -> _M:
    """An instance of ``cls`` from values that are already valid, without validation.

    The annotation stage builds every output this way on the hot path: it is twice as fast as
    ``model_construct`` because it sets every field itself. ``tests/test_schema.py`` checks
    that the result equals a validated model, so a pydantic change cannot slip through.
    """
    obj = _new(cls)
    _set_dict(obj, values)
    _set_fields_set(obj, set(values))
    _set_extra(obj, None)
    _set_private(obj, None)
    return obj


def _slot_setter(name: str) -> Any:
    """The setter of the storage ``name`` of pydantic's models (what ``object.__setattr__``
    finds for it), called directly: no attribute lookup per output built."""
    for klass in BaseModel.__mro__:
        found = vars(klass).get(name)
        if found is not None and hasattr(found, "__set__"):
            return found.__set__
    return lambda obj, value: object.__setattr__(obj, name, value)


_new = object.__new__
_set_dict = _slot_setter("__dict__")
_set_fields_set = _slot_setter("__pydantic_fields_set__")
_set_extra = _slot_setter("__pydantic_extra__")
_set_private = _slot_setter("__pydantic_private__")
