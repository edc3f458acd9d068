"""Reading locales/: the only module that opens those files.

Each language has one TOML file holding the grammar CLDR lacks (connectives, number words,
phrase forms, look-alike words). :func:`load_locale` validates it with pydantic (unknown keys are
errors), merges the parent chain (``en_GB -> en -> root``) into new frozen objects and caches the
result; cached data is never changed afterwards.

Parsing TOML is most of the cost of loading a file, so ``locales/_parsed/<code>.json`` keeps each
file already parsed, with the SHA-256 of the text it was parsed from, and the scanner's data of
the language (its lexicon and how its forms start, see ``scanning.lexicon.stored_index``).
``python -m nlnorm.locale`` writes them; ``tests/locales/test_parsed_extract.py`` checks they
are current. A file whose text no longer has the recorded hash (a locale file just edited) is
parsed from its TOML, so an edit takes effect at once, only a little slower.
"""

from __future__ import annotations

import functools
import hashlib
import json
from pathlib import Path
from types import MappingProxyType
from typing import Any, Literal, Mapping

from pydantic import BaseModel, ConfigDict, Field, ValidationError, field_validator

from .errors import LocaleError, suggest
from .preparing import fold

__all__ = ["LocaleData", "load_locale", "available_languages", "locales_dir", "Example",
           "cldr_tier_code", "deep_languages", "write_extract"]

RELATIONS = (
    "since",
    "after",
    "before",
    "until",
    "within",
    "on_day",
    "cue",
    "due",
    "from",
    "between",
    "range_join",
    "between_join",
    "since_suffix",
    "from_suffix",
    "since_post",
    "after_post",
    "before_post",
    "until_post",
    "between_post",
    "due_post",
    "deadline",
    "article",  # a word before a day number that belongs to the date ("the", "le", "el")
)
#: Relations of words that follow the phrase they bind (postpositions, "onwards").
POST_RELATIONS = frozenset({"since_suffix", "from_suffix", "since_post", "after_post", "before_post", "until_post",
                            "between_post", "due_post"})


def locales_dir() -> Path:
    """Where the locale files are: beside the package in a wheel, at the project root in a
    source checkout."""
    here = Path(__file__).resolve().parent
    for candidate in (here / "locales", here.parent / "locales"):
        if (candidate / "root.toml").is_file():
            return candidate
    raise LocaleError(f"no locales/ folder with root.toml found beside {here}; reinstall nlnorm")


class _Strict(BaseModel):
    model_config = ConfigDict(extra="forbid", frozen=True)


class Meta(_Strict):
    name: str
    parent: str = "root"
    spaces: bool = True
    case_marks_names: bool = False
    weekday_reading: Literal["nearest", "week"] = "nearest"
    # Month and weekday names are written in lower case ("mars"): a capitalised ambiguous one
    # mid-sentence is another word ("la mission vers Mars"), whatever cue stands before it.
    lowercase_names: bool = False
    particles: tuple[str, ...] = ()  # case endings glued to a phrase ("지난주에", "haftaki")
    # Characters only this language writes among those sharing its script (Japanese kana, a
    # regular-expression class). A phrase this language and another read alike is read as this
    # language's in a question holding one ("2025年以前のチケット"), as the other's otherwise.
    marks: str = ""
    carrier: str = ""  # a short question with {} where a time phrase goes (conformance tests)
    sources: tuple[str, ...] = ()


class DayPeriodPhrase(_Strict):
    day: int
    period: str


class Example(_Strict):
    text: str
    now: str
    value: str | None = None
    tz: str = "UTC"
    reading: str | None = None
    locale: str | None = None
    week_start: str | None = None
    none: bool = False  # true: the text must give no temporal mention
    same_as: str | None = None  # an English phrase meaning the same (checked at random clocks)


class WordList(_Strict):
    words: tuple[str, ...] = ()


class Suffixes(_Strict):
    suffixes: tuple[str, ...] = ()


class LocaleFile(_Strict):
    """The schema of one locales/*.toml file (every section optional but ``meta``)."""

    meta: Meta
    numbers: dict[str, int] = Field(default_factory=dict)
    ordinals: dict[str, int] = Field(default_factory=dict)
    ordinal_suffixes: Suffixes = Suffixes()
    units: dict[
        Literal["second", "minute", "hour", "day", "week", "month", "quarter", "year",
                "sprint", "business_day", "fiscal_quarter", "fiscal_year"],
        tuple[str, ...],
    ] = Field(default_factory=dict)
    direction: dict[Literal["last", "this", "next"], tuple[str, ...]] = Field(default_factory=dict)
    relative_day: dict[str, tuple[str, ...]] = Field(default_factory=dict)
    day_period_phrases: dict[str, DayPeriodPhrase] = Field(default_factory=dict)
    weekend: WordList = WordList()
    inflections: dict[Literal["month", "weekday"], dict[str, tuple[str, ...]]] = Field(
        default_factory=dict
    )
    to_date: dict[str, Literal["week", "month", "quarter", "year"]] = Field(default_factory=dict)
    connectives: dict[Literal[RELATIONS], tuple[str, ...]] = Field(default_factory=dict)  # type: ignore[valid-type]
    ambiguous: WordList = WordList()
    not_temporal: WordList = WordList()
    quiet: WordList = WordList()
    forms: dict[str, tuple[str, ...]] = Field(default_factory=dict)
    examples: tuple[Example, ...] = ()

    @field_validator("relative_day")
    @classmethod
    def _offsets(cls, value: dict[str, tuple[str, ...]]) -> dict[str, tuple[str, ...]]:
        for key in value:
            try:
                int(key)
            except ValueError:
                raise ValueError(f"key {key!r} must be a day offset such as \"-2\"") from None
        return value

    @field_validator("inflections")
    @classmethod
    def _inflection_keys(cls, value: dict[str, dict[str, tuple[str, ...]]]
                         ) -> dict[str, dict[str, tuple[str, ...]]]:
        for kind, table in value.items():
            top = 12 if kind == "month" else 6
            low = 1 if kind == "month" else 0
            for key in table:
                if not key.isdigit() or not low <= int(key) <= top:
                    raise ValueError(
                        f"[inflections.{kind}] key {key!r} must be a number from {low} to {top}"
                        + (" (0 = Monday)" if kind == "weekday" else "")
                    )
        return value

    @field_validator("forms")
    @classmethod
    def _readings(cls, value: dict[str, tuple[str, ...]]) -> dict[str, tuple[str, ...]]:
        for key in value:
            # "N": forms of phrases that hold a time word but are no time phrase ("guten
            # Morgen"); they give no mention and keep shorter forms from matching inside them.
            if not (key.startswith("R") and key[1:].isdigit()) and key not in ("D", "N"):
                raise ValueError(f"form key {key!r} must be a reading id such as 'R2' (or 'N')")
        return value


class LocaleData:
    """A language's merged, read-only data (its own file over its parents')."""

    __slots__ = ("code", "meta", "chain", "_file", "numbers", "ordinals", "ordinal_suffixes",
                 "units", "direction", "relative_day", "day_period_phrases", "weekend",
                 "to_date", "connectives", "ambiguous", "not_temporal", "quiet", "forms", "root_forms",
                 "inflections",
                 "examples", "digest", "generated")

    def __init__(self, code: str, chain: tuple[str, ...], files: list[LocaleFile],
                 digest: str | None = None, generated: Mapping[str, Any] | None = None) -> None:
        own = files[0]
        self.code = code
        self.chain = chain
        self.meta = own.meta
        # The SHA-256 of the texts of every file of the chain (None for CLDR data alone), and
        # the scanner's data of the language kept in locales/_parsed/ (not checked here: its
        # reader compares its key, see scanning.lexicon.stored_index).
        self.digest = digest
        self.generated = generated

        def merged(attr: str) -> Mapping[str, Any]:
            out: dict[str, Any] = {}
            for f in reversed(files):
                out.update(getattr(f, attr))
            return MappingProxyType(out)

        def words(attr: str) -> frozenset[str]:
            out: set[str] = set()
            for f in files:
                out.update(fold(w) for w in getattr(f, attr).words)
            return frozenset(out)

        self.numbers = merged("numbers")
        self.ordinals = merged("ordinals")
        self.ordinal_suffixes = tuple(
            dict.fromkeys(fold(s) for f in files for s in f.ordinal_suffixes.suffixes)
        )
        self.units = merged("units")
        self.direction = merged("direction")
        self.relative_day = merged("relative_day")
        self.day_period_phrases = merged("day_period_phrases")
        self.weekend = words("weekend")
        self.to_date = merged("to_date")
        self.inflections = merged("inflections")
        self.connectives = merged("connectives")
        self.ambiguous = words("ambiguous")
        self.not_temporal = words("not_temporal")
        self.quiet = words("quiet")
        # Forms of this language and of parents that are languages; root forms are kept apart
        # because they are the same in every language.
        forms: dict[str, tuple[str, ...]] = {}
        for name, f in zip(reversed(chain), reversed(files)):
            if name == "root":
                continue
            for key, value in f.forms.items():
                forms[key] = value
        self.forms = MappingProxyType(forms)
        self.root_forms = MappingProxyType(dict(files[-1].forms)) if chain[-1] == "root" else {}
        self.examples = own.examples

    def __repr__(self) -> str:
        return f"LocaleData({self.code!r}, chain={self.chain!r})"


def _parsed_path(path: Path) -> Path:
    """Where the parsed extract of the locale file ``path`` is kept."""
    return path.parent / "_parsed" / f"{path.stem}.json"


def _digest(text: str) -> str:
    return hashlib.sha256(text.encode("utf-8")).hexdigest()


def _stored(path: Path, digest: str) -> dict[str, Any] | None:
    """The parsed extract of ``path`` if it was made from the text with ``digest``."""
    try:
        stored = json.loads(_parsed_path(path).read_text(encoding="utf-8"))
    except (OSError, ValueError):
        return None
    if not isinstance(stored, dict) or stored.get("toml_sha256") != digest:
        return None
    return stored


@functools.lru_cache(maxsize=256)
def _load(path: Path) -> tuple[LocaleFile, str, Mapping[str, Any] | None]:
    """The validated file, the digest of its text, and the generated scanner data kept with
    its parsed extract (``None`` when there is none for this text)."""
    rel = f"locales/{path.name}"
    text = path.read_text(encoding="utf-8")
    digest = _digest(text)
    stored = _stored(path, digest)
    if stored is not None:
        raw = stored["data"]
    else:
        import tomllib  # only for a file edited since its extract was written

        try:
            raw = tomllib.loads(text)
        except tomllib.TOMLDecodeError as exc:
            raise LocaleError(f"{rel} is not valid TOML: {exc}") from None
    try:
        data = LocaleFile.model_validate(raw)
    except ValidationError as exc:
        err = exc.errors()[0]
        where = " ".join(f"[{p}]" if i == 0 else str(p) for i, p in enumerate(err["loc"]))
        got = err.get("input")
        raise LocaleError(f"{rel} {where}: {err['msg'].lower()}, got {got!r}") from None
    generated = stored.get("index") if stored is not None else None
    return data, digest, MappingProxyType(generated) if isinstance(generated, dict) else None


def _read(path: Path) -> LocaleFile:
    """The validated locale file ``path`` (read once)."""
    return _load(path)[0]


def _cldr_only(code: str) -> LocaleFile | None:
    """The locale file of a language nlnorm has no file for: CLDR data alone (the CLDR tier).

    Its phrases are CLDR's relative date fields and past/future patterns; its parent is the
    file of its base language when there is one ("de_AT" -> "de"), else root. Whether the
    language writes spaces between words is read off CLDR: a language whose relative phrases
    ("上周", "สัปดาห์ที่แล้ว") hold no space is scanned without word boundaries.
    """
    from . import cldr

    try:
        locale = cldr.locale_id(code)
    except Exception:
        return None
    base = locale.split("_")[0]
    parent = base if base != locale and (locales_dir() / f"{base}.toml").is_file() else "root"
    phrases = [f.text for f in cldr.relative_fields(locale) if len(f.text) > 2]
    spaces = not phrases or any(" " in p for p in phrases)
    if parent != "root":
        spaces = _read(locales_dir() / f"{parent}.toml").meta.spaces
    return LocaleFile(meta=Meta(name=f"{locale} (CLDR data only)", parent=parent, spaces=spaces,
                                sources=(f"Unicode CLDR {cldr.cldr_version()} via babel",)))


def cldr_tier_code(value: str) -> str | None:
    """The CLDR locale id of a language nlnorm reads from CLDR data alone, or ``None``."""
    from . import cldr

    try:
        return cldr.locale_id(value)
    except Exception:
        return None


@functools.cache
def available_languages() -> frozenset[str]:
    """Codes of every locale file (``root`` and files starting with ``_`` excluded)."""
    return frozenset(
        p.stem for p in locales_dir().glob("*.toml") if p.stem != "root" and not p.stem.startswith("_")
    )


@functools.cache
def load_locale(code: str) -> LocaleData:
    """Load, validate and merge ``locales/<code>.toml`` with its parents.

    >>> en = load_locale("en")
    >>> en.chain, en.direction["last"][0]
    (('en', 'root'), 'last')

    Raises:
        LocaleError: the code has no file, or a file breaks the format (the message names the
            file, the section and the key).
    """
    base = locales_dir()
    chain: list[str] = []
    files: list[LocaleFile] = []
    digests: list[str | None] = []
    generated: Mapping[str, Any] | None = None
    current = code
    while current:
        if current in chain:
            raise LocaleError(f"locales/{current}.toml: parent chain loops ({' -> '.join(chain)})")
        path = base / f"{current}.toml"
        if path.is_file():
            data, file_digest, stored = _load(path)
            digests.append(file_digest)
            if not chain:
                generated = stored
        else:
            digests.append(None)
            from_cldr = _cldr_only(current)
            if from_cldr is None:
                known = available_languages()
                raise LocaleError(
                    f"no locale data for {current!r}{suggest(current, known)} "
                    f"(deep languages: {', '.join(sorted(known))}; any CLDR locale such as "
                    "'sw' or 'es_MX' works from CLDR data alone)"
                )
            data = from_cldr
        chain.append(current)
        files.append(data)
        current = (data.meta.parent or "") if current != "root" else ""
    digest = None
    if all(digests):
        digest = _digest(" ".join(f"{name}:{d}" for name, d in zip(chain, digests)))
    return LocaleData(code, tuple(chain), files, digest, generated if digest else None)


def deep_languages() -> tuple[str, ...]:
    """The languages with a locale file, English first: the default languages to look for."""
    langs = sorted(available_languages())
    return tuple(["en"] + [lang for lang in langs if lang != "en"]) if "en" in langs else tuple(langs)


def _json_lines(value: Any, depth: int = 0) -> str:
    """``value`` as JSON with one member per line down to the entries of the tables (a form,
    a word class, a section of the file), each entry compact on its line."""
    if depth >= 4 or not isinstance(value, (dict, list)) or not value:
        return json.dumps(value, ensure_ascii=False, separators=(",", ":"))
    if isinstance(value, dict):
        items = [json.dumps(k, ensure_ascii=False) + ":" + _json_lines(v, depth + 1)
                 for k, v in value.items()]
        return "{\n" + ",\n".join(items) + "\n}"
    return "[\n" + ",\n".join(_json_lines(v, depth + 1) for v in value) + "\n]"


def write_extract() -> list[Path]:
    """Write ``locales/_parsed/<code>.json`` for root and every language: the file parsed, the
    hash of its text, and for a language the scanner's data of it (computed afresh, see
    ``scanning.scanner.language_index``). Returns the paths written; extracts of files that are
    gone are removed."""
    import tomllib

    from .scanning.scanner import language_index

    base = locales_dir()
    folder = base / "_parsed"
    folder.mkdir(exist_ok=True)
    languages = available_languages()
    written = []
    for path in sorted(base.glob("*.toml")):
        if path.stem.startswith("_"):
            continue
        _read(path)  # the file must follow the format (the error names the section and key)
        text = path.read_text(encoding="utf-8")
        entry: dict[str, Any] = {"toml_sha256": _digest(text), "data": tomllib.loads(text)}
        if path.stem in languages:
            index = language_index(path.stem)
            if index is not None:
                entry["index"] = index
        out = _parsed_path(path)
        out.write_text(_json_lines(entry) + "\n", encoding="utf-8")
        written.append(out)
    for stale in folder.glob("*.json"):
        if stale not in written:
            stale.unlink()
    return written


if __name__ == "__main__":
    from nlnorm import locale as _module  # the package's module, not this __main__ copy

    for _path in _module.write_extract():
        print(f"wrote {_path}")
