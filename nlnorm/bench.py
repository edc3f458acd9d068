"""``nlnorm bench``: speed and memory on invented question logs, printed side by side.

Two logs: English only, and a mixed log in every deep language. Each is measured against
dateparser's ``search_dates`` on the same questions in the same run (English told
``languages=["en"]``; the mixed log told the same deep languages). Times are wall-clock on this
machine and drift between runs; the ratios hold better.
"""

from __future__ import annotations

import gc
import json
import os
import statistics
import subprocess
import sys
import time
from datetime import datetime
from typing import Any, Callable, Sequence

__all__ = ["run", "measure", "cli_startup", "peak_rss"]

BENCH_NOW = "2026-12-02T10:00:00"
BENCH_TZ = "Europe/Lisbon"


def _percentile(sorted_values: Sequence[float], q: float) -> float:
    if not sorted_values:
        return float("nan")
    k = min(len(sorted_values) - 1, max(0, round(q * (len(sorted_values) - 1))))
    return sorted_values[k]


def measure(fn: Callable[[str], Any], questions: Sequence[str], keep_times: bool = False
            ) -> dict[str, Any]:
    """Time ``fn`` once per question; median, p99 and mean in microseconds, questions/s (and,
    with ``keep_times``, the sorted timings under ``times``, for :func:`pooled`)."""
    times: list[float] = []
    clock = time.perf_counter_ns
    gc.disable()
    try:
        started = clock()
        for q in questions:
            t0 = clock()
            fn(q)
            times.append((clock() - t0) / 1000)
        total = (clock() - started) / 1e9
    finally:
        gc.enable()
    times.sort()
    figures: dict[str, Any] = {
        "median_us": statistics.median(times),
        "p99_us": _percentile(times, 0.99),
        "mean_us": statistics.fmean(times),
        "qps": len(questions) / total if total else float("inf"),
        "n": float(len(questions)),
    }
    if keep_times:
        figures["times"] = times
    return figures


def pooled(runs: Sequence[dict[str, Any]]) -> dict[str, float]:
    """The figures of several :func:`measure` runs taken together: median, p99 and mean over
    all their timings, questions per second over their total time."""
    times = sorted(t for r in runs for t in r["times"])
    total = sum(r["n"] / r["qps"] for r in runs if r["qps"])
    return {
        "median_us": statistics.median(times),
        "p99_us": _percentile(times, 0.99),
        "mean_us": statistics.fmean(times),
        "qps": len(times) / total if total else float("inf"),
        "n": float(len(times)),
    }


def cli_startup(runs: int = 7, lang: str | None = "en") -> float:
    """Median wall time in ms of ``python -m nlnorm normalize`` on one question, with the
    package's bytecode compiled as an installation has it."""
    cmd = [sys.executable, "-m", "nlnorm", "normalize", "bugs created last week",
           "--now", BENCH_NOW, "--tz", BENCH_TZ, "--indent", "0"]
    if lang:
        cmd += ["--lang", lang]
    # As installed: pip compiles a wheel's modules to bytecode, so the timed runs read it from
    # a private cache (one untimed run writes it) instead of compiling the sources each time.
    import tempfile

    cache = tempfile.mkdtemp(prefix="nlnorm-bench-pycache-")
    env = dict(os.environ, PYTHONPYCACHEPREFIX=cache)
    env.pop("PYTHONDONTWRITEBYTECODE", None)
    subprocess.run(cmd, check=True, capture_output=True, env=env)
    times = []
    for _ in range(runs):
        t0 = time.perf_counter()
        subprocess.run(cmd, check=True, capture_output=True, env=env)
        times.append((time.perf_counter() - t0) * 1000)
    import shutil

    shutil.rmtree(cache, ignore_errors=True)
    return statistics.median(times)


_RSS_SCRIPT = """
import resource, sys
from nlnorm import Context, normalize
from nlnorm.locale import deep_languages
from nlnorm.benchlog import generate, generate_mixed
what, n = sys.argv[1], int(sys.argv[2])
langs = ["en"] if what == "en" else list(deep_languages())
ctx = Context.at("{now}", tz="{tz}", languages=langs)
for q in (generate(n, seed=0) if what == "en" else generate_mixed(n, seed=0)):
    normalize(q, ctx)
if what == "every":
    from nlnorm.bench import load_every_locale
    load_every_locale()
# VmHWM: the peak of this process alone (ru_maxrss keeps the parent's peak across exec).
try:
    with open("/proc/self/status") as status:
        print(next(int(line.split()[1]) for line in status if line.startswith("VmHWM")) / 1024)
except OSError:
    print(resource.getrusage(resource.RUSAGE_SELF).ru_maxrss / 1024)
"""


def peak_rss(what: str, n: int) -> float:
    """Peak RSS in MB of a fresh process that imports nlnorm alone (not dateparser) and
    normalizes the log of ``what``: ``en`` (English log, English only), ``deep`` (mixed log,
    every deep language) or ``every`` (``deep``, then every CLDR locale's lexicon too)."""
    script = _RSS_SCRIPT.format(now=BENCH_NOW, tz=BENCH_TZ)
    done = subprocess.run([sys.executable, "-c", script, what, str(n)], check=True,
                          capture_output=True, text=True)
    return float(done.stdout.strip().splitlines()[-1])


def _section(title: str, questions: Sequence[str], ctx: Any, dp_languages: list[str] | None,
             sample: int, out: Any, rounds: int = 3) -> dict[str, Any]:
    from .pipeline import normalize

    t0 = time.perf_counter()
    normalize("warm up", ctx)
    warm_ms = (time.perf_counter() - t0) * 1000
    ours = measure(lambda q: normalize(q, ctx), questions)
    with_time = sum(1 for q in questions if normalize(q, ctx).mentions)
    print(f"\n{title}: {len(questions)} invented questions ({with_time} with a time phrase), "
          f"languages {','.join(ctx.languages)}", file=out)
    print(f"  first call (builds the scanner) {warm_ms:9.1f} ms", file=out)
    print(f"  median per question             {ours['median_us']:9.1f} us", file=out)
    print(f"  p99 per question                {ours['p99_us']:9.1f} us", file=out)
    print(f"  mean per question               {ours['mean_us']:9.1f} us  (first pass: "
          "includes compiling the forms each new phrase start needs)", file=out)
    print(f"  questions per second            {ours['qps']:9.0f}", file=out)
    result: dict[str, Any] = {"nlnorm": ours, "first_call_ms": warm_ms}
    if dp_languages is None:
        return result
    try:
        from dateparser.search import search_dates
    except ImportError:
        print("  dateparser is not installed: pip install 'nlnorm[bench]' to compare", file=out)
        return result
    picked = list(questions[: min(sample, len(questions))])
    settings = {"RELATIVE_BASE": datetime.fromisoformat(BENCH_NOW), "PREFER_DATES_FROM": "past"}
    search_dates("warm up last week", languages=dp_languages, settings=settings)
    # Rounds alternate the two over the same questions, so both meet the same state of this
    # noisy machine; each side's figures are over all its rounds' timings.
    theirs_rounds: list[dict[str, Any]] = []
    ours_rounds: list[dict[str, Any]] = []
    for _ in range(rounds):
        theirs_rounds.append(measure(lambda q: search_dates(q, languages=dp_languages,
                                                            settings=settings), picked, True))
        ours_rounds.append(measure(lambda q: normalize(q, ctx), picked, True))
    theirs, ours_same = pooled(theirs_rounds), pooled(ours_rounds)
    ratio = theirs["median_us"] / ours_same["median_us"]
    ratio_mean = theirs["mean_us"] / ours_same["mean_us"]
    print(f"  same {len(picked)} questions, {rounds} alternating rounds:"
          "  nlnorm   search_dates   ratio", file=out)
    print(f"    median us                     {ours_same['median_us']:8.1f} {theirs['median_us']:14.1f}"
          f" {ratio:7.1f}x", file=out)
    print(f"    mean us                       {ours_same['mean_us']:8.1f} {theirs['mean_us']:14.1f}"
          f" {ratio_mean:7.1f}x", file=out)
    print(f"    p99 us                        {ours_same['p99_us']:8.1f} {theirs['p99_us']:14.1f}",
          file=out)
    result.update(search_dates=theirs, ratio_median=ratio, ratio_mean=ratio_mean,
                  dateparser_languages=dp_languages)
    return result


def run(n: int = 10_000, compare: bool = True, compare_sample: int = 2_000,
        out: Any = None, startup_runs: int = 7, mixed: bool = True,
        mixed_sample: int = 1000, rounds: int = 3) -> int:
    """Run the benchmark and print its figures; returns a process exit code."""
    out = out or sys.stdout
    from .benchlog import generate
    from .context import Context
    from .locale import deep_languages

    print(f"nlnorm bench: now={BENCH_NOW} tz={BENCH_TZ}; python {sys.version.split()[0]}, "
          f"1 process, {os.cpu_count()} cores visible", file=out)
    summary: dict[str, Any] = {}
    english = Context.at(BENCH_NOW, tz=BENCH_TZ, languages=["en"])
    summary["english"] = _section("English log", generate(n, seed=0), english,
                                  ["en"] if compare else None, compare_sample, out, rounds)
    if mixed:
        from .benchlog import generate_mixed

        langs = list(deep_languages())
        everything = Context.at(BENCH_NOW, tz=BENCH_TZ, languages=langs)
        summary["mixed"] = _section(f"Mixed log, {len(langs)} deep languages at once",
                                    generate_mixed(n, seed=0), everything,
                                    langs if compare else None, mixed_sample, out, rounds)
    print("", file=out)
    # Memory is measured in fresh processes that import nlnorm alone: this one also holds
    # dateparser and both logs.
    summary["rss_english_mb"] = peak_rss("en", n)
    if mixed:
        summary["rss_deep_mb"] = peak_rss("deep", n)
        summary["rss_every_locale_mb"] = peak_rss("every", n)
    print(f"  peak RSS, English log, English      {summary['rss_english_mb']:7.1f} MB  "
          "(fresh process, nlnorm alone)", file=out)
    if mixed:
        print(f"  peak RSS, mixed log, every deep language {summary['rss_deep_mb']:7.1f} MB", file=out)
        print(f"  peak RSS, + every CLDR locale       {summary['rss_every_locale_mb']:7.1f} MB", file=out)
    summary["sql"] = sql_timing(generate(n, seed=0), english)
    print(f"  SQL predicate of one mention      {summary['sql']['median_us']:7.1f} us median, "
          f"{summary['sql']['p99_us']:.1f} us p99 ({summary['sql']['n']:.0f} predicates: 8 "
          "dialects x 4 column kinds x params/literal)", file=out)
    summary["cli_startup_en_ms"] = cli_startup(startup_runs, "en")
    print(f"  CLI start-up, one question, --lang en  {summary['cli_startup_en_ms']:7.1f} ms "
          f"(median of {startup_runs})", file=out)
    if mixed:
        summary["cli_startup_all_ms"] = cli_startup(startup_runs, None)
        print(f"  CLI start-up, every deep language      {summary['cli_startup_all_ms']:7.1f} ms "
              f"(median of {startup_runs})", file=out)
    print("", file=out)
    print("json: " + json.dumps(summary, sort_keys=True), file=out)
    return 0


def sql_timing(questions: Sequence[str], ctx: Any, limit: int = 300) -> dict[str, float]:
    """Median and p99 µs to write one period mention's SQL predicate (``nlnorm.sql.predicate``),
    over the first ``limit`` period mentions of ``questions``, in every dialect, column kind and
    style (params, literal)."""
    from .pipeline import normalize
    from .sql import DIALECTS, Column, predicate

    mentions: list[Any] = []
    for q in questions:
        mentions.extend(m for m in normalize(q, ctx).mentions if m.kind in ("range", "sprint"))
        if len(mentions) >= limit:
            break
    kinds = ("date", "local", "utc", "instant")
    times: list[float] = []
    clock = time.perf_counter_ns
    tz = ctx.tz
    for name in DIALECTS:
        for kind in kinds:
            column = Column("created_at", kind)  # type: ignore[arg-type]
            for style in ("params", "literal"):
                predicate(mentions[0], column, name, tz=tz, style=style)  # warm: quoting cache
                for m in mentions:
                    t0 = clock()
                    predicate(m, column, name, tz=tz, style=style)
                    times.append((clock() - t0) / 1000)
    times.sort()
    return {"median_us": statistics.median(times), "p99_us": _percentile(times, 0.99),
            "n": float(len(times))}


def load_every_locale() -> None:
    """Load the CLDR data and lexicon of every locale babel ships (the CLDR tier)."""
    from . import cldr
    from .scanning.lexicon import lexicon

    for code in cldr.all_locale_ids():
        try:
            lexicon(code)
        except Exception:  # a locale babel lists but cannot load: not part of the tier
            continue
