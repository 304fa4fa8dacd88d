"""Evaluate a step's sympy expression with pint quantities.

The expression tree is walked node by node, so that when two quantities do not
fit together (a force added to a length, the sine of a stress) the error names
the step, the sub-expression and the units that clash. Trigonometric functions
take angles in any angle unit; inverse ones return radians.
"""

from __future__ import annotations

import contextlib
import math
from collections.abc import Callable, Iterator, Mapping

import pint
import sympy as sp

from calcsheet.errors import DefinitionError, DimensionError, EvaluationError
from calcsheet.units import Quantity, ureg

Value = pint.Quantity | float

_RADIAN = ureg.radian


class _ClashError(Exception):
    """Raised inside the walk; turned into a DimensionError that names the step."""

    def __init__(self, node: sp.Basic, detail: str) -> None:
        self.node = node
        self.detail = detail


def evaluate(
    expr: sp.Basic, values: Mapping[sp.Symbol, pint.Quantity], *, step: str
) -> pint.Quantity:
    """Evaluate ``expr`` with the quantities in ``values``; errors name ``step``.

    The first evaluations walk the tree with pint, which checks every unit and names
    any clash. An expression evaluated again with inputs in the same units (a sheet
    rebuilt or re-evaluated after a change of value) takes a compiled float path in
    SI base units, checked once against the pint result; anything unusual there (a
    non-finite value, a domain error) falls back to the pint walk and its message.
    """
    if _plans_wanted:
        fast = _fast_value(expr, values)
        if fast is not None:
            return fast
    result = _evaluate_with_units(expr, values, step=step)
    if _plans_wanted:
        _learn(expr, values, result)
    return _carried(result.magnitude, result.units)


# Compiled plans pay where a sheet is evaluated again (the form, a rebuilt sheet, a batch
# of members sharing steps). A process that builds each sheet once and ends (``calcsheet
# build``) turns them off: counting and compiling there was time spent for nothing.
_plans_wanted = True


@contextlib.contextmanager
def compiled_plans(wanted: bool) -> Iterator[None]:
    """Within the block, whether evaluations learn and use compiled float plans (on by
    default; the setting before comes back after).

    Results are the same either way (every plan is checked against the pint walk
    before use, and values are carried to 12 figures): only the time differs.
    """
    global _plans_wanted
    before, _plans_wanted = _plans_wanted, bool(wanted)
    try:
        yield
    finally:
        _plans_wanted = before


# Values are carried to 12 significant figures, far beyond any engineering use, so
# that the pint walk and the compiled path (which differ in the last bits) give the
# same numbers, and a sheet prints the same bytes whichever path computed it.
CARRIED_FIGURES = 12


def _carried(magnitude: float, units: pint.Unit) -> pint.Quantity:
    number = float(magnitude)
    if math.isfinite(number):
        number = float(f"{number:.{CARRIED_FIGURES}g}")
    return Quantity(number, units)


def _evaluate_with_units(
    expr: sp.Basic, values: Mapping[sp.Symbol, pint.Quantity], *, step: str
) -> pint.Quantity:
    try:
        result = _walk(expr, values)
    except _ClashError as clash:
        raise DimensionError(
            f"step {step!r}: {clash.detail} in {sp.sstr(clash.node)} "
            f"(whole expression: {sp.sstr(expr)})"
        ) from None
    except KeyError as missing:
        raise DefinitionError(
            f"step {step!r} uses {missing.args[0]} before it is defined"
        ) from None
    except (ZeroDivisionError, OverflowError, ValueError) as error:
        raise EvaluationError(f"step {step!r}: {error} in {sp.sstr(expr)}") from None
    except EvaluationError as error:  # raised deep in the walk: say which step
        raise EvaluationError(f"step {step!r}: {error}") from None
    quantity = result if isinstance(result, pint.Quantity) else Quantity(result)
    magnitude = quantity.magnitude
    if isinstance(magnitude, complex) or not math.isfinite(magnitude):
        raise EvaluationError(
            f"step {step!r}: the result {magnitude} is not a real, finite number "
            f"(a square root of a negative value, or a division by zero?) in {sp.sstr(expr)}"
        )
    return quantity


# --- the compiled path ------------------------------------------------------------------
# Key: (structural hash of the expression, units of its symbols). Sympy's hash is
# structural and cached on each expression, so a rebuilt sheet finds its plans without
# comparing expression trees; two different expressions sharing a 64-bit hash and the
# units of every symbol is not a practical concern. Value: None after one evaluation
# (not worth compiling yet), then (function, factors to base units, (the pint result's
# units, their factor to base units)),
# or False when the compiled path does not reproduce the pint result.
_PLANS: dict[tuple, tuple | bool | None] = {}
_SYMBOLS: dict[int, tuple[sp.Symbol, ...]] = {}
_MAX_PLANS = 50_000


def _symbols_of(expr: sp.Basic) -> tuple[sp.Symbol, ...]:
    key = hash(expr)
    symbols = _SYMBOLS.get(key)
    if symbols is None:
        if len(_SYMBOLS) >= _MAX_PLANS:
            _SYMBOLS.clear()
        symbols = _SYMBOLS[key] = tuple(sorted(expr.free_symbols, key=lambda s: s.name))
    return symbols


def _signature(expr: sp.Basic, values: Mapping[sp.Symbol, pint.Quantity]) -> tuple | None:
    try:
        symbols = _symbols_of(expr)
        return (hash(expr), tuple(values[symbol].units for symbol in symbols))
    except (KeyError, TypeError, AttributeError):
        return None


def _fast_value(expr: sp.Basic, values: Mapping[sp.Symbol, pint.Quantity]) -> pint.Quantity | None:
    key = _signature(expr, values)
    plan = _PLANS.get(key) if key is not None else None
    if not plan:
        return None
    function, factors, (units, to_units) = plan
    try:
        arguments = [
            float(values[symbol].magnitude) * factor
            for symbol, factor in zip(_symbols_of(expr), factors, strict=True)
        ]
        number = float(function(*arguments)) / to_units
    except (ArithmeticError, ValueError, TypeError):
        return None  # the pint walk gives the error its proper message
    if not math.isfinite(number):
        return None
    # In the units the pint walk gives (a check prints its demand in them).
    return _carried(number, units)


def _learn(
    expr: sp.Basic, values: Mapping[sp.Symbol, pint.Quantity], result: pint.Quantity
) -> None:
    """Count an evaluation; on the second with the same units, compile and verify a plan."""
    key = _signature(expr, values)
    if key is None or expr.is_Symbol or expr.is_Number:
        return
    if key not in _PLANS:
        if len(_PLANS) >= _MAX_PLANS:
            _PLANS.clear()
        _PLANS[key] = None
        return
    if _PLANS[key] is not None:
        return
    _PLANS[key] = _compiled(expr, values, result)


def _compiled(
    expr: sp.Basic, values: Mapping[sp.Symbol, pint.Quantity], result: pint.Quantity
) -> tuple | bool:
    symbols = _symbols_of(expr)
    try:
        factors = tuple(
            float(Quantity(1.0, values[symbol].units).to_base_units().magnitude)
            for symbol in symbols
        )
        base = result.to_base_units()
        function = sp.lambdify(symbols, expr, modules="math", dummify=True)
        trial = float(
            function(
                *(float(values[s].magnitude) * f for s, f in zip(symbols, factors, strict=True))
            )
        )
    except Exception:  # an expression the float path cannot take: keep the pint walk
        return False
    expected = float(base.magnitude)
    if not (trial == expected or math.isclose(trial, expected, rel_tol=1e-9)):
        return False
    # Offset units (degrees Celsius) cannot be scaled by a factor: keep the pint walk.
    if any(not values[s]._ok_for_muldiv() for s in symbols):
        return False
    to_units = float(Quantity(1.0, result.units).to_base_units().magnitude)
    return (function, factors, (result.units, to_units))


# A sum whose value lies below this fraction of its largest term is the round-off of a
# sum that closes to zero: values carry 12 figures, so such a sum is left with ~1e-11 of
# its terms, while a residual a checker must see (a lost load, a wrong sign) is a
# sizeable fraction of a term.
ROUND_OFF_OF_ZERO = 1e-8


def sum_closes_to_zero(
    expr: sp.Basic, total: pint.Quantity, values: Mapping[sp.Symbol, pint.Quantity]
) -> bool:
    """Whether ``total``, the value of the sum ``expr``, is the round-off of zero: not
    zero itself, and below :data:`ROUND_OFF_OF_ZERO` of the sum's largest term."""
    magnitude = abs(float(total.magnitude))
    if not isinstance(expr, sp.Add) or magnitude == 0 or not math.isfinite(magnitude):
        return False
    try:
        terms = [_walk(term, values) for term in expr.args]
        largest = max(
            abs(float(term.to(total.units).magnitude))
            if isinstance(term, pint.Quantity)
            else abs(float(Quantity(term, "").to(total.units).magnitude))
            for term in terms
        )
    except (_ClashError, pint.DimensionalityError, ArithmeticError, ValueError, TypeError):
        return False
    return magnitude < ROUND_OFF_OF_ZERO * largest


def chosen_branch(
    expr: sp.Piecewise, values: Mapping[sp.Symbol, pint.Quantity], *, step: str
) -> int:
    """The index of the branch of ``expr`` that applies to ``values``."""
    try:
        for index, (_, condition) in enumerate(expr.args):
            if _truth(condition, values):
                return index
    except _ClashError as clash:
        raise DimensionError(f"step {step!r}: {clash.detail} in {sp.sstr(clash.node)}") from None
    raise EvaluationError(f"step {step!r}: no branch of {sp.sstr(expr)} applies to these values")


def _walk(node: sp.Basic, values: Mapping[sp.Symbol, pint.Quantity]) -> Value:
    if node.is_Symbol:
        return values[node]
    if node.is_Number:
        return float(node)
    if node is sp.pi:
        return math.pi
    if node is sp.E:
        return math.e
    handler = _HANDLERS.get(type(node))
    if handler is None:
        for kind, candidate in _HANDLERS.items():
            if isinstance(node, kind):
                handler = candidate
                break
    if handler is None:
        raise _ClashError(node, f"{type(node).__name__} is not a supported operation")
    return handler(node, values)


def _add(node: sp.Add, values: Mapping[sp.Symbol, pint.Quantity]) -> Value:
    terms = [_walk(arg, values) for arg in node.args]
    total = terms[0]
    for term, arg in zip(terms[1:], node.args[1:], strict=True):
        try:
            total = total + term
        except pint.DimensionalityError:
            raise _ClashError(
                node, f"cannot add {_describe(total)} and {_describe(term)} (term {sp.sstr(arg)})"
            ) from None
    return total


def _mul(node: sp.Mul, values: Mapping[sp.Symbol, pint.Quantity]) -> Value:
    product: Value = 1.0
    for arg in node.args:
        product = product * _walk(arg, values)
    return product


def _pow(node: sp.Pow, values: Mapping[sp.Symbol, pint.Quantity]) -> Value:
    base = _walk(node.base, values)
    exponent = _plain_number(_walk(node.exp, values), node, "an exponent")
    if _magnitude(base) < 0 and not float(exponent).is_integer():
        raise EvaluationError(
            f"{sp.sstr(node)}: a fractional power of the negative value {_describe(base)}"
        )
    return base**exponent


def _plain_number(value: Value, node: sp.Basic, role: str) -> float:
    if isinstance(value, pint.Quantity):
        if not value.dimensionless:
            raise _ClashError(node, f"{role} must be a plain number, not {_describe(value)}")
        return float(value.to("dimensionless").magnitude)
    return float(value)


def _angle_in_radians(value: Value, node: sp.Basic) -> float:
    if isinstance(value, pint.Quantity):
        if not value.dimensionless:
            raise _ClashError(node, f"the argument must be an angle, not {_describe(value)}")
        return float(value.to(_RADIAN).magnitude)
    return float(value)


def _trig(function: Callable[[float], float]) -> Callable[..., float]:
    def handler(node: sp.Function, values: Mapping[sp.Symbol, pint.Quantity]) -> float:
        return function(_angle_in_radians(_walk(node.args[0], values), node))

    return handler


def _inverse_trig(function: Callable[[float], float]) -> Callable[..., pint.Quantity]:
    def handler(node: sp.Function, values: Mapping[sp.Symbol, pint.Quantity]) -> pint.Quantity:
        argument = _plain_number(_walk(node.args[0], values), node, "the argument")
        return Quantity(function(argument), _RADIAN)

    return handler


def _plain_function(function: Callable[[float], float]) -> Callable[..., float]:
    def handler(node: sp.Function, values: Mapping[sp.Symbol, pint.Quantity]) -> float:
        return function(_plain_number(_walk(node.args[0], values), node, "the argument"))

    return handler


def _atan2(node: sp.atan2, values: Mapping[sp.Symbol, pint.Quantity]) -> pint.Quantity:
    y_value, x_value = (_walk(arg, values) for arg in node.args)
    if isinstance(x_value, pint.Quantity) or isinstance(y_value, pint.Quantity):
        y_quantity, x_quantity = Quantity(y_value), Quantity(x_value)
        try:
            x_magnitude = x_quantity.to(y_quantity.units).magnitude
        except pint.DimensionalityError:
            raise _ClashError(
                node,
                f"atan2 needs two values of one dimension, not {_describe(y_value)} "
                f"and {_describe(x_value)}",
            ) from None
        return Quantity(math.atan2(y_quantity.magnitude, x_magnitude), _RADIAN)
    return Quantity(math.atan2(y_value, x_value), _RADIAN)


def _abs(node: sp.Abs, values: Mapping[sp.Symbol, pint.Quantity]) -> Value:
    return abs(_walk(node.args[0], values))


def _extreme(pick: Callable[..., Value]) -> Callable[..., Value]:
    def handler(node: sp.Basic, values: Mapping[sp.Symbol, pint.Quantity]) -> Value:
        candidates = [_walk(arg, values) for arg in node.args]
        try:
            return pick(candidates, key=_comparable(candidates[0], node))
        except pint.DimensionalityError:
            raise _ClashError(node, "cannot compare values of different dimensions") from None

    return handler


def _comparable(reference: Value, node: sp.Basic) -> Callable[[Value], float]:
    unit = reference.units if isinstance(reference, pint.Quantity) else None

    def key(value: Value) -> float:
        if unit is None:
            return _plain_number(value, node, "a compared value")
        if not isinstance(value, pint.Quantity):
            value = Quantity(value)
        return float(value.to(unit).magnitude)

    return key


def _piecewise(node: sp.Piecewise, values: Mapping[sp.Symbol, pint.Quantity]) -> Value:
    for branch_expr, condition in node.args:
        if _truth(condition, values):
            return _walk(branch_expr, values)
    raise EvaluationError(f"no branch of {sp.sstr(node)} applies to these values")


_COMPARISONS: dict[type, Callable[[float, float], bool]] = {
    sp.StrictLessThan: lambda a, b: a < b,
    sp.LessThan: lambda a, b: a <= b,
    sp.StrictGreaterThan: lambda a, b: a > b,
    sp.GreaterThan: lambda a, b: a >= b,
    sp.Equality: lambda a, b: a == b,
    sp.Unequality: lambda a, b: a != b,
}


def _truth(condition: sp.Basic, values: Mapping[sp.Symbol, pint.Quantity]) -> bool:
    if condition is sp.true:
        return True
    if condition is sp.false:
        return False
    if isinstance(condition, sp.And):
        return all(_truth(arg, values) for arg in condition.args)
    if isinstance(condition, sp.Or):
        return any(_truth(arg, values) for arg in condition.args)
    if isinstance(condition, sp.Not):
        return not _truth(condition.args[0], values)
    compare = _COMPARISONS.get(type(condition))
    if compare is None:
        raise _ClashError(condition, f"{type(condition).__name__} is not a supported condition")
    left = _walk(condition.lhs, values)
    right = _walk(condition.rhs, values)
    key = _comparable(left, condition)
    try:
        return compare(key(left), key(right))
    except pint.DimensionalityError:
        raise _ClashError(
            condition, f"cannot compare {_describe(left)} with {_describe(right)}"
        ) from None


def _magnitude(value: Value) -> float:
    return value.magnitude if isinstance(value, pint.Quantity) else value


def _describe(value: Value) -> str:
    if isinstance(value, pint.Quantity):
        if value.unitless:
            return f"the number {value.magnitude:.4g}"
        return f"{value.magnitude:.4g} {value.units:~P} ({value.dimensionality})"
    return f"the number {value:.4g}"


_HANDLERS: dict[type, Callable[..., Value]] = {
    sp.Add: _add,
    sp.Mul: _mul,
    sp.Pow: _pow,
    sp.sin: _trig(math.sin),
    sp.cos: _trig(math.cos),
    sp.tan: _trig(math.tan),
    sp.asin: _inverse_trig(math.asin),
    sp.acos: _inverse_trig(math.acos),
    sp.atan: _inverse_trig(math.atan),
    sp.atan2: _atan2,
    sp.exp: _plain_function(math.exp),
    sp.log: _plain_function(math.log),
    sp.Abs: _abs,
    sp.Min: _extreme(min),
    sp.Max: _extreme(max),
    sp.Piecewise: _piecewise,
}
