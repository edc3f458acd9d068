"""``nlnorm bench``: speed and memory on an invented question log, printed side by side.

Times are wall-clock on this machine and drift between runs; the ratio to dateparser's
``search_dates``, measured in the same run on the same questions, holds better.
"""

from __future__ import annotations

import gc
import json
import os
import resource
import statistics
import subprocess
import sys
import time
from datetime import datetime
from typing import Any, Callable, Sequence

__all__ = ["run", "measure", "cli_startup"]

BENCH_NOW = "2026-12-02T10:00:00"
BENCH_TZ = "Europe/Lisbon"


def _percentile(sorted_values: Sequence[float], q: float) -> float:
    if not sorted_values:
        return float("nan")
    k = min(len(sorted_values) - 1, max(0, round(q * (len(sorted_values) - 1))))
    return sorted_values[k]


def measure(fn: Callable[[str], Any], questions: Sequence[str]) -> dict[str, float]:
    """Time ``fn`` once per question; median, p99 and mean in microseconds, questions/s."""
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
    return {
        "median_us": statistics.median(times),
        "p99_us": _percentile(times, 0.99),
        "mean_us": statistics.fmean(times),
        "qps": len(questions) / total if total else float("inf"),
        "n": float(len(questions)),
    }


def cli_startup(runs: int = 7) -> float:
    """Median wall time in ms of ``python -m nlnorm normalize`` on one question."""
    cmd = [sys.executable, "-m", "nlnorm", "normalize", "bugs created last week",
           "--now", BENCH_NOW, "--tz", BENCH_TZ, "--indent", "0"]
    env = dict(os.environ, PYTHONDONTWRITEBYTECODE="1")
    times = []
    for _ in range(runs):
        t0 = time.perf_counter()
        subprocess.run(cmd, check=True, capture_output=True, env=env)
        times.append((time.perf_counter() - t0) * 1000)
    return statistics.median(times)


def _rss_mb() -> float:
    # ru_maxrss is in KiB on Linux.
    return resource.getrusage(resource.RUSAGE_SELF).ru_maxrss / 1024


def run(n: int = 10_000, compare: bool = True, compare_sample: int = 2_000,
        out: Any = None, startup_runs: int = 7) -> int:
    """Run the benchmark and print its figures; returns a process exit code."""
    out = out or sys.stdout
    from .benchlog import generate
    from .context import Context
    from .pipeline import normalize

    questions = generate(n, seed=0)
    ctx = Context.at(BENCH_NOW, tz=BENCH_TZ)
    t0 = time.perf_counter()
    normalize("warm up last week", ctx)
    warm_ms = (time.perf_counter() - t0) * 1000
    rss_loaded = _rss_mb()
    ours = measure(lambda q: normalize(q, ctx), questions)
    with_time = sum(1 for q in questions if normalize(q, ctx).mentions)
    rss_after = _rss_mb()
    startup = cli_startup(startup_runs)

    print(f"nlnorm bench: {len(questions)} invented questions "
          f"({with_time} with a time phrase), now={BENCH_NOW} tz={BENCH_TZ}", file=out)
    print(f"python {sys.version.split()[0]}, 1 process, {os.cpu_count()} cores visible", file=out)
    print("", file=out)
    print(f"  first call (builds the scanner) {warm_ms:9.1f} ms", file=out)
    print(f"  median per question             {ours['median_us']:9.1f} us", file=out)
    print(f"  p99 per question                {ours['p99_us']:9.1f} us", file=out)
    print(f"  mean per question               {ours['mean_us']:9.1f} us", file=out)
    print(f"  questions per second            {ours['qps']:9.0f}", file=out)
    print(f"  peak RSS (all loaded, after run){rss_after:9.1f} MB  (after loading {rss_loaded:.1f} MB)",
          file=out)
    print(f"  CLI start-up, one question      {startup:9.1f} ms  (median of {startup_runs} runs)", file=out)
    result: dict[str, Any] = {"nlnorm": ours, "cli_startup_ms": startup, "rss_mb": rss_after}
    if compare:
        try:
            from dateparser.search import search_dates
        except ImportError:
            print("\n  dateparser is not installed: pip install 'nlnorm[bench]' to compare",
                  file=out)
        else:
            sample = questions[: min(compare_sample, len(questions))]
            base = datetime.fromisoformat(BENCH_NOW)
            settings = {"RELATIVE_BASE": base, "PREFER_DATES_FROM": "past"}
            search_dates("warm up last week", languages=["en"], settings=settings)
            theirs = measure(
                lambda q: search_dates(q, languages=["en"], settings=settings), sample
            )
            ours_same = measure(lambda q: normalize(q, ctx), sample)
            ratio = theirs["median_us"] / ours_same["median_us"]
            ratio_mean = theirs["mean_us"] / ours_same["mean_us"]
            print("", file=out)
            print(f"  same {len(sample)} questions, one run:      nlnorm   search_dates(en)   ratio",
                  file=out)
            print(f"    median us                      {ours_same['median_us']:8.1f} {theirs['median_us']:14.1f}"
                  f" {ratio:9.1f}x", file=out)
            print(f"    mean us                        {ours_same['mean_us']:8.1f} {theirs['mean_us']:14.1f}"
                  f" {ratio_mean:9.1f}x", file=out)
            print(f"    p99 us                         {ours_same['p99_us']:8.1f} {theirs['p99_us']:14.1f}",
                  file=out)
            result["search_dates_en"] = theirs
            result["ratio_median"] = ratio
    print("", file=out)
    print("json: " + json.dumps(result, sort_keys=True), file=out)
    return 0
