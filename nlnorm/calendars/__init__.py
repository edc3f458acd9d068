"""Calendar arithmetic: periods, weeks, ISO weeks, local day boundaries in a time zone."""

from .periods import (
    add_months,
    add_units,
    day_span,
    iso_week_start,
    local_instant,
    period_containing,
    period_value,
    shift_period,
    start_of_day,
)

__all__ = [
    "add_months",
    "add_units",
    "day_span",
    "iso_week_start",
    "local_instant",
    "period_containing",
    "period_value",
    "shift_period",
    "start_of_day",
]
