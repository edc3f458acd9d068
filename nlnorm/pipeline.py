"""The public entry points: run the stages in order.

``STAGES`` names the pipeline; each stage is a pure function callable on its own::

    prepare(text) -> Prepared
    scan(prepared, ctx) -> tuple[Candidate, ...]
    parse(candidates, ctx) -> tuple[Parsed, ...]
    resolve(parsed, ctx) -> tuple[Resolved, ...]
    annotate(prepared, resolved, ctx) -> Result
"""

from __future__ import annotations

from collections.abc import Iterable, Iterator, Mapping
from typing import Any

from .context import Context, _parse_now
from .errors import ContextError, InputError, NlnormError
from .parsing import parse
from .model import Candidate
from .preparing import Prepared, prepare
from .resolution import resolve
from .rewriting import annotate
from .scanning import scan
from .schema import Result

__all__ = ["STAGES", "normalize", "normalize_many", "normalize_item", "context_with", "prepare", "scan", "parse", "resolve", "annotate"]

STAGES = (prepare, scan, parse, resolve, annotate)

_CONTEXT_FIELDS = ("now", "tz", "week_start", "locale", "languages", "bias", "window_reading",
                   "weekday_reading", "date_order")


def normalize(text: str, ctx: Context, id: object = None) -> Result:
    """Find and resolve every time phrase of ``text`` against ``ctx``.

    >>> ctx = Context.at("2026-12-02T10:00", tz="Europe/Berlin")
    >>> r = normalize("which bugs were created last week", ctx)
    >>> m = r.mentions[0]
    >>> m.text, m.value, m.start, m.end
    ('last week', '2026-W48', '2026-11-23T00:00:00+01:00', '2026-11-30T00:00:00+01:00')
    >>> r.rewritten
    'which bugs were created from 2026-11-23 to 2026-11-29 inclusive'
    """
    prepared = prepare(text)
    candidates = scan(prepared, ctx)
    if ctx.sprints is not None:
        candidates = _with_sprint_names(prepared, candidates, ctx)
    resolved = resolve(parse(candidates, ctx), ctx) if candidates else ()
    return annotate(prepared, resolved, ctx, id=id)


def _with_sprint_names(prepared: Prepared, candidates: tuple[Candidate, ...], ctx: Context
                       ) -> tuple[Candidate, ...]:
    """Add the sprints the question names (from the context's sprint table); a phrase the
    scanner found wins over a named sprint it overlaps unless the name's phrase is longer."""
    from .scanning import scanner_for
    from .scanning.names import sprint_names

    named = sprint_names(prepared, ctx.sprints, scanner_for(ctx.languages))
    if not named:
        return candidates
    kept = list(candidates)
    for n in named:
        clash = [c for c in kept if c.span.start < n.span.end and n.span.start < c.span.end]
        if all((n.span.end - n.span.start) > (c.span.end - c.span.start) for c in clash):
            kept = [c for c in kept if c not in clash] + [n]
    return tuple(sorted(kept, key=lambda c: c.span.start))


def normalize_many(
    items: Iterable[str | Mapping[str, Any]], ctx: Context
) -> Iterator[Result]:
    """Normalize many questions lazily, one :class:`Result` per item, in order.

    An item is a string, or a mapping with ``text`` and optionally ``id`` and any context field
    (``now``, ``tz``, ``week_start``, ``locale``, ``lang``/``languages``...) that overrides
    ``ctx`` for that item. A bad item gives a result whose ``error`` says what was wrong; the
    rest go on.

    >>> ctx = Context.at("2026-12-02T10:00", tz="Europe/Berlin")
    >>> [r.error or r.mentions[0].value for r in normalize_many(["today", {"text": "x", "tz": "Mars/Base"}], ctx)]
    ['2026-12-02', "tz='Mars/Base' is not an IANA time zone"]
    """
    cache: dict[tuple[tuple[str, str], ...], Context] = {}
    for item in items:
        yield normalize_item(item, ctx, cache)


def normalize_item(
    item: str | Mapping[str, Any],
    ctx: Context,
    cache: dict[tuple[tuple[str, str], ...], Context] | None = None,
) -> Result:
    """Normalize one batch item (see :func:`normalize_many`); never raises for bad input."""
    item_id: object = None
    text: object = None
    try:
        if isinstance(item, str):
            return normalize(item, ctx)
        if not isinstance(item, Mapping):
            raise InputError(f"expected a JSON object with 'text', got {json_kind(item)}")
        item_id = item.get("id")
        text = item.get("text")
        if text is None:
            found = ", ".join(repr(str(k)) for k in item) or "none"
            what = "is null" if "text" in item else f"is missing (fields found: {found})"
            raise InputError(f"field 'text' (the question to normalize) {what}")
        if not isinstance(text, str):
            raise InputError(f"field 'text' must be a string, got {json_kind(text)}")
        overrides = _overrides(item)
        if "now" in overrides and "tz" not in overrides:
            now = _parse_now(overrides["now"])
            if now.utcoffset() is None:
                raise ContextError(
                    f"now={overrides['now']!r} has no UTC offset and the item gives no tz; add "
                    "a tz (an IANA name such as 'Europe/Berlin') or write the offset, e.g. "
                    "'2026-12-02T10:00:00+01:00'"
                )
        local = ctx
        if overrides:
            key = tuple(sorted((k, repr(v)) for k, v in overrides.items()))
            known = cache.get(key) if cache is not None else None
            if known is None:
                known = context_with(ctx, overrides)
                if cache is not None and len(cache) < 1024:
                    cache[key] = known
            local = known
        return normalize(text, local, id=item_id)
    except NlnormError as exc:
        return Result(id=item_id, text=text if isinstance(text, str) else None, error=str(exc))


def json_kind(value: object) -> str:
    """The JSON name of a value's type: null, boolean, number, string, array or object."""
    if value is None:
        return "null"
    if isinstance(value, bool):
        return "boolean"
    if isinstance(value, (int, float)):
        return "number"
    if isinstance(value, str):
        return "string"
    if isinstance(value, (list, tuple)):
        return "array"
    if isinstance(value, Mapping):
        return "object"
    return type(value).__name__


def _overrides(item: Mapping[str, Any]) -> dict[str, Any]:
    out: dict[str, Any] = {}
    for key in _CONTEXT_FIELDS:
        if key in item and item[key] is not None:
            out[key] = item[key]
    if "lang" in item and item["lang"] is not None:
        out["languages"] = item["lang"]
    return out


def context_with(ctx: Context, overrides: Mapping[str, Any]) -> Context:
    """``ctx`` with some fields replaced (:meth:`Context.replace`): a new ``tz`` without a new
    ``now`` keeps the instant; a week start derived from the locale follows a new ``locale``,
    a given one is kept."""
    return ctx.replace(**dict(overrides))
