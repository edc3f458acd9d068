"""Annotation: resolved phrases -> the intermediate form (mentions, rewritten, template).

The rewritten question states every interval in words a reader and a model cannot misread:
ISO dates, and whether the last day is included ("from 2026-11-23 to 2026-11-29 inclusive"),
or for times of day the exclusive end ("up to but not including 2026-12-02T12:00:00+01:00").
"""

from __future__ import annotations

import functools
from datetime import datetime, timedelta
from typing import TYPE_CHECKING

from .model import Interval, Kind, Reading, Resolved
from .preparing import Prepared
from .resolution.common import is_day_start, iso
from .schema import Alternative, Mention, Reference, Result, Slot, Template, built

if TYPE_CHECKING:
    from .context import Context

__all__ = ["annotate", "explicit", "reference"]


def explicit(interval: Interval, kind: Kind = Kind.RANGE) -> str:
    """Plain, unambiguous wording of an interval.

    >>> from nlnorm.context import Context
    >>> from nlnorm.calendars import start_of_day
    >>> from datetime import date
    >>> from nlnorm.model import Grain
    >>> tz = Context.at("2026-12-02T10:00", tz="Europe/Berlin").zone
    >>> explicit(Interval(start_of_day(date(2026, 11, 23), tz), start_of_day(date(2026, 11, 30), tz), Grain.WEEK, "2026-W48"))
    'from 2026-11-23 to 2026-11-29 inclusive'
    """
    start, end = interval.start, interval.end
    if kind is Kind.DURATION:
        return f"a duration of {interval.value}"
    if kind is Kind.INSTANT and start is not None:
        return f"at {iso(start)}"
    if start is not None and end is not None:
        if is_day_start(start) and is_day_start(end):
            last = end.date() - timedelta(days=1)
            if last <= start.date():
                return f"on {start.date().isoformat()}"
            return f"from {start.date().isoformat()} to {last.isoformat()} inclusive"
        return f"from {iso(start)} up to but not including {iso(end)}"
    if start is not None:
        if is_day_start(start):
            return f"on or after {start.date().isoformat()}"
        return f"at or after {iso(start)}"
    if end is not None:
        if is_day_start(end):
            return f"before {end.date().isoformat()}"
        return f"before {iso(end)}"
    return "at any time"


def _alternative(r: Reading) -> Alternative:
    iv = r.interval
    return built(Alternative, 
        start=None if iv.start is None else iso(iv.start),
        end=None if iv.end is None else iso(iv.end),
        value=iv.value,
        grain=iv.grain.value,
        reading=r.reading,
        policy=r.policy,
        note=r.note,
        sprints=r.sprints,
    )


def _typo_note(r: Resolved) -> str:
    typo = r.candidate.slot("typo")
    if typo is None:
        for part in r.candidate.parts:
            typo = part.slot("typo")
            if typo is not None:
                break
    return f"typo: {typo}; " if typo else ""


def reference(ctx: "Context") -> Reference:
    """The context as the output reports it (cached: contexts are frozen). Looked up by the
    context object itself first: hashing a pydantic model costs more than building this."""
    global _last_reference
    last = _last_reference  # one tuple, read at once: safe when threads share the module
    if last is not None and last[0] is ctx:
        return last[1]
    ref = _reference(ctx)
    _last_reference = (ctx, ref)
    return ref


#: (context, its reference): a batch uses one context throughout.
_last_reference: "tuple[Context, Reference] | None" = None


@functools.lru_cache(maxsize=256)
def _reference(ctx: "Context") -> Reference:
    return Reference(now=iso(ctx.now), tz=ctx.tz, week_start=str(ctx.week_start),
                     locale=ctx.locale, languages=ctx.languages)


def annotate(prepared: Prepared, resolved: tuple[Resolved, ...], ctx: "Context",
             id: object = None) -> Result:
    """Build the :class:`~nlnorm.schema.Result` of one question."""
    original = prepared.original
    if not resolved:
        # Values built here are already valid: skip pydantic's validation on the hot path.
        return built(Result, 
            id=id, text=original, reference=reference(ctx), mentions=(), rewritten=original,
            template=built(Template, text=original, slots={}), error=None,
        )
    mentions: list[Mention] = []
    rewritten: list[str] = []
    template: list[str] = []
    slots: dict[str, Slot] = {}
    cursor = 0
    for index, r in enumerate(resolved, start=1):
        start, end = prepared.to_original(r.candidate.span.start, r.candidate.span.end)
        iv = r.chosen.interval
        s = None if iv.start is None else iso(iv.start)
        e = None if iv.end is None else iso(iv.end)
        if r.kind is Kind.INSTANT:
            e = s
        mentions.append(
            built(Mention, 
                text=original[start:end],
                char_start=start,
                char_end=end,
                kind=r.kind.value,
                start=s,
                end=e,
                grain=iv.grain.value,
                value=iv.value,
                lang=r.candidate.lang,
                reading=r.chosen.reading,
                note=_typo_note(r) + r.chosen.note,
                confidence=r.candidate.confidence,
                alternatives=tuple(_alternative(a) for a in r.alternatives),
                sprints=r.chosen.sprints,
                sql=None,
            )
        )
        name = f"t{index}"
        rewritten.append(original[cursor:start])
        if r.kind is Kind.DURATION:
            # "3 days" is already unambiguous; the ISO duration is added for a model.
            rewritten.append(f"{original[start:end]} ({iv.value})")
        else:
            rewritten.append(explicit(iv, r.kind))
        template.append(original[cursor:start])
        template.append("{" + name + "}")
        slots[name] = built(Slot, start=s, end=e, value=iv.value, kind=r.kind.value, grain=iv.grain.value)
        cursor = end
    rewritten.append(original[cursor:])
    template.append(original[cursor:])
    return built(Result, 
        id=id,
        text=original,
        reference=reference(ctx),
        mentions=tuple(mentions),
        rewritten="".join(rewritten),
        template=built(Template, text="".join(template), slots=slots),
        error=None,
    )
