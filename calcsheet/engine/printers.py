"""Print a step three ways (symbolic, substituted, result) for LaTeX, MathML and Typst.

One structural printer (:class:`_ExpressionPrinter`, a subclass of sympy's
:class:`~sympy.printing.printer.Printer` with one ``_print_<Type>`` method per
node type) decides order, signs, fractions and parentheses for every target;
each target supplies only the primitives (how to write a fraction, a symbol, a
quantity). So the three targets cannot drift apart.

Products and sums print in the order the calc author wrote them, which needs the
expression built under ``sympy.evaluate(False)`` (see :func:`as_written`).

The substituted form is printed once as a *template*: every symbol becomes a slot
token, and after an input changes only the slots are filled again with the new
values. Printing sympy trees is slow; filling slots is a string substitution.
"""

from __future__ import annotations

import html
import re
from collections.abc import Callable, Iterator, Mapping, Sequence
from contextlib import contextmanager
from dataclasses import dataclass, replace
from itertools import pairwise

import sympy as sp
from sympy.printing.printer import Printer

from calcsheet.engine.names import NamePart, SymbolName, parse_symbol_name
from calcsheet.engine.typst_literal import typst_string
from calcsheet.errors import DefinitionError
from calcsheet.units import FormattedNumber

_SLOT = re.compile("\ue000(\\d+)([gp])\ue001")

# Precedence of what a printed piece is, to decide where parentheses go.
_RELATION, _SUM, _PRODUCT, _POWER, _ATOM = 1, 2, 3, 4, 5

_FUNCTION_NAMES = {
    sp.sin: "sin",
    sp.cos: "cos",
    sp.tan: "tan",
    sp.asin: "arcsin",
    sp.acos: "arccos",
    sp.atan: "arctan",
    sp.atan2: "atan2",
    sp.exp: "exp",
    sp.log: "ln",
    sp.Min: "min",
    sp.Max: "max",
}

_RELATION_SIGNS = {
    sp.StrictLessThan: "<",
    sp.LessThan: "≤",
    sp.StrictGreaterThan: ">",
    sp.GreaterThan: "≥",
    sp.Equality: "=",
    sp.Unequality: "≠",
}


@contextmanager
def as_written() -> Iterator[None]:
    """Build expressions in this block without sympy's reordering, so they print as written.

    ``P*e*c/I`` then prints as P e c / I rather than sympy's canonical c e P / I.
    """
    with sp.evaluate(False):
        yield


@dataclass(frozen=True)
class Quantityish:
    """A value ready to typeset: its number and its unit as (symbol, exponent) pairs."""

    number: FormattedNumber
    unit: tuple[tuple[str, float], ...] = ()


# A max(...) or min(...) with more arguments than this is shortened (it would leave the page).
LISTED_EXTREMES = 6


def _natural_key(expr: sp.Basic) -> tuple:
    """Sort key reading the numbers in a symbol's name as numbers (σ_2 before σ_10)."""
    return tuple(
        (0, int(piece), "") if piece.isdigit() else (1, 0, piece)
        for piece in re.split(r"(\d+)", str(expr))
    )


class _ExpressionPrinter(Printer):
    """The structure shared by every target; subclasses give the primitives."""

    printmethod = "_calcsheet_print"

    def __init__(self, slots: Mapping[sp.Symbol, int] | None = None) -> None:
        super().__init__()
        self._slots = slots

    # -- entry points ---------------------------------------------------------------

    def print_expression(self, expr: sp.Basic) -> str:
        """The expression printed with symbol names, or with slot tokens in substitution mode."""
        return self._print(expr)

    def print_extreme_of_many(self, expr: sp.Basic) -> str:
        """max(...) or min(...) of many symbols, shortened so that the line fits the page.

        With more than :data:`LISTED_EXTREMES` arguments the line shows the first two
        and the last in the sheet's numbering (σ_1, σ_2, …, σ_17); the full list is the
        table the step reads from. Anything else prints whole.
        """
        if not isinstance(expr, (sp.Max, sp.Min)) or len(expr.args) <= LISTED_EXTREMES:
            return self._print(expr)
        ordered = sorted(expr.args, key=_natural_key)
        shown = [self._print(arg) for arg in ordered[:2]]
        shown += [self.text("…"), self._print(ordered[-1])]
        return self.function_call(_FUNCTION_NAMES[type(expr)], shown)

    def emptyPrinter(self, expr: object) -> str:
        raise DefinitionError(f"calcsheet cannot print {type(expr).__name__}: {expr}")

    # -- atoms ------------------------------------------------------------------------

    def _print_Symbol(self, symbol: sp.Symbol, grouped: bool = False) -> str:
        if self._slots is not None:
            try:
                return f"\ue000{self._slots[symbol]}{'g' if grouped else 'p'}\ue001"
            except KeyError:
                raise DefinitionError(f"symbol {symbol.name!r} has no value to print") from None
        return self.symbol_name(parse_symbol_name(symbol.name))

    def _print_Integer(self, number: sp.Integer) -> str:
        return self.literal(str(abs(int(number))), negative=int(number) < 0)

    def _print_Float(self, number: sp.Float) -> str:
        value = float(number)
        return self.literal(format(abs(value), "g"), negative=value < 0)

    def _print_Rational(self, number: sp.Rational) -> str:
        fraction = self.fraction(self.literal(str(abs(number.p))), self.literal(str(number.q)))
        return self.minus_prefix() + fraction if number.p < 0 else fraction

    def _print_Pi(self, _: object) -> str:
        return self.constant("π")

    def _print_Exp1(self, _: object) -> str:
        return self.constant("e")

    # -- sums, products, powers --------------------------------------------------------

    def _print_Add(self, expr: sp.Add) -> str:
        pieces = []
        for index, term in enumerate(_flatten(expr, sp.Add)):
            negative, magnitude = _split_sign(term)
            text = self._print_operand(magnitude, _SUM + 1 if index else _SUM)
            if index == 0:
                pieces.append(self.minus_prefix() + text if negative else text)
            else:
                pieces.append((self.minus_operator() if negative else self.plus_operator()) + text)
        return "".join(pieces)

    def _print_Mul(self, expr: sp.Mul) -> str:
        negative, magnitude = _split_sign(expr)
        numerator, denominator = _split_fraction(_flatten(magnitude, sp.Mul))
        if denominator:
            text = self.fraction(
                self._print_product(numerator, alone=True),
                self._print_product(denominator, alone=True),
            )
        else:
            text = self._print_product(numerator, alone=False)
        return self.minus_prefix() + text if negative else text

    def _print_product(self, factors: Sequence[sp.Basic], *, alone: bool) -> str:
        if not factors:
            return self.literal("1")
        if len(factors) == 1 and alone:
            return self._print(factors[0])
        explicit = self._slots is not None
        pieces = [self._print_operand(factors[0], _PRODUCT)]
        for previous, factor in pairwise(factors):
            needs_dot = explicit or (factor.is_Number and previous.is_Number)
            pieces.append(self.times(explicit=needs_dot))
            pieces.append(self._print_operand(factor, _PRODUCT + 1))
        return "".join(pieces)

    def _print_Pow(self, expr: sp.Pow) -> str:
        base, exponent = expr.base, expr.exp
        if exponent == sp.S.Half:
            return self.square_root(self._print(base))
        if exponent.is_Number and exponent < 0:
            return self._print_Mul(sp.Mul(sp.S.One, expr, evaluate=False))
        if base.is_Symbol and self._slots is not None:
            base_text = self._print_Symbol(base, grouped=True)
        else:
            base_text = self._print_operand(base, _POWER + 1)
        return self.power(base_text, self._print(exponent))

    def _print_operand(self, expr: sp.Basic, minimum: int) -> str:
        text = self._print(expr)
        return self.parens(text) if _precedence(expr) < minimum else text

    # -- functions and conditions -----------------------------------------------------

    def _print_Function(self, expr: sp.Function) -> str:
        name = _FUNCTION_NAMES.get(type(expr))
        if name is None:
            raise DefinitionError(f"calcsheet cannot print the function {type(expr).__name__}")
        return self.function_call(name, [self._print(arg) for arg in expr.args])

    _print_Min = _print_Function
    _print_Max = _print_Function

    def _print_Abs(self, expr: sp.Abs) -> str:
        return self.absolute(self._print(expr.args[0]))

    def _print_Piecewise(self, expr: sp.Piecewise) -> str:
        branches = []
        for value, condition in expr.args:
            shown = None if condition is sp.true else self._print(condition)
            branches.append((self._print(value), shown))
        return self.cases(branches)

    def _print_Relational(self, expr: sp.core.relational.Relational) -> str:
        sign = _RELATION_SIGNS[type(expr)]
        return self.relation(self._print(expr.lhs), sign, self._print(expr.rhs))

    def _print_And(self, expr: sp.And) -> str:
        return self.word_between([self._print(arg) for arg in expr.args], "and")

    def _print_Or(self, expr: sp.Or) -> str:
        return self.word_between([self._print(arg) for arg in expr.args], "or")

    # -- primitives each target supplies --------------------------------------------------

    def symbol_name(self, name: SymbolName) -> str:
        raise NotImplementedError

    def literal(self, digits: str, negative: bool = False) -> str:
        raise NotImplementedError

    def constant(self, letter: str) -> str:
        raise NotImplementedError

    # Plain text writes every operator out, so it parenthesises every substituted value
    # ("2*(3 in)"); the typeset targets parenthesise a value only where it would misread.
    parenthesises_every_value = False

    def quantity(self, value: Quantityish, grouped: bool, standalone: bool = False) -> str:
        """A value with its unit: the one place that decides its sign and parentheses.

        A value standing alone (a result, a table cell) carries its minus sign bare. Inside
        an expression a negative value is parenthesised, so "a - (-2 in)" never reads as
        "a - -2 in", and so is a value with a unit that is ``grouped`` (the base of a power:
        "(3 in)^2", not "3 in^2").
        """
        text = self.number_with_unit(value)
        if standalone:
            return self.negated_quantity(text) if value.number.negative else text
        if value.number.negative:
            return self.grouped_quantity(self.minus_prefix() + text)
        if (grouped and value.unit) or self.parenthesises_every_value:
            return self.grouped_quantity(text)
        return self.lone_quantity(text)

    def number_with_unit(self, value: Quantityish) -> str:
        """The value's magnitude and unit, without its sign."""
        raise NotImplementedError

    def negated_quantity(self, text: str) -> str:
        """A negative value standing alone."""
        return self.minus_prefix() + text

    def grouped_quantity(self, inner: str) -> str:
        """A value in parentheses inside an expression."""
        return self.parens(inner)

    def lone_quantity(self, text: str) -> str:
        """A value inside an expression that needs no parentheses."""
        return text

    def plus_operator(self) -> str:
        raise NotImplementedError

    def minus_operator(self) -> str:
        raise NotImplementedError

    def minus_prefix(self) -> str:
        raise NotImplementedError

    def times(self, explicit: bool) -> str:
        raise NotImplementedError

    def fraction(self, numerator: str, denominator: str) -> str:
        raise NotImplementedError

    def square_root(self, radicand: str) -> str:
        raise NotImplementedError

    def power(self, base: str, exponent: str) -> str:
        raise NotImplementedError

    def parens(self, inner: str) -> str:
        raise NotImplementedError

    def function_call(self, name: str, arguments: list[str]) -> str:
        raise NotImplementedError

    def absolute(self, inner: str) -> str:
        raise NotImplementedError

    def cases(self, branches: list[tuple[str, str | None]]) -> str:
        raise NotImplementedError

    def relation(self, left: str, sign: str, right: str) -> str:
        raise NotImplementedError

    def word_between(self, pieces: list[str], word: str) -> str:
        raise NotImplementedError

    def text(self, words: str) -> str:
        raise NotImplementedError

    def chain(self, pieces: Sequence[str]) -> str:
        """Pieces joined by equals signs: ``σ = P/A = 6.50 kip / 7.58 in² = 0.858 ksi``."""
        raise NotImplementedError

    def stacked(self, pieces: Sequence[str]) -> str:
        """A long chain one piece per line, the equals signs aligned under each other."""
        raise NotImplementedError

    # -- slots --------------------------------------------------------------------------

    def fill(self, template: str, values: Sequence[Quantityish]) -> str:
        """Replace the slot tokens of a substituted template by the values, typeset."""
        return _SLOT.sub(
            lambda match: self.quantity(values[int(match[1])], match[2] == "g"), template
        )


def _flatten(expr: sp.Basic, kind: type) -> list[sp.Basic]:
    """Nested unevaluated sums (or products) as one list, in written order."""
    if not isinstance(expr, kind):
        return [expr]
    items: list[sp.Basic] = []
    for arg in expr.args:
        items.extend(_flatten(arg, kind))
    return items


def _split_sign(expr: sp.Basic) -> tuple[bool, sp.Basic]:
    """(is negative, the expression without its sign) for a term or a product."""
    if expr.is_Number:
        return (expr < 0, -expr if expr < 0 else expr)
    if not isinstance(expr, sp.Mul):
        return (False, expr)
    negative = False
    kept = []
    for factor in _flatten(expr, sp.Mul):
        if factor.is_Number and factor < 0:
            negative = not negative
            if factor != -1:
                kept.append(-factor)
        else:
            kept.append(factor)
    if not kept:
        return (negative, sp.S.One)
    if len(kept) == 1:
        return (negative, kept[0])
    return (negative, sp.Mul(*kept, evaluate=False))


def _split_fraction(factors: list[sp.Basic]) -> tuple[list[sp.Basic], list[sp.Basic]]:
    numerator, denominator = [], []
    for factor in factors:
        if isinstance(factor, sp.Pow) and factor.exp.is_Number and factor.exp < 0:
            exponent = -factor.exp
            denominator.append(
                factor.base if exponent == 1 else sp.Pow(factor.base, exponent, evaluate=False)
            )
        elif isinstance(factor, sp.Rational) and not factor.is_Integer:
            if factor.p != 1:
                numerator.append(sp.Integer(factor.p))
            denominator.append(sp.Integer(factor.q))
        elif factor == 1 and len(factors) > 1:
            continue
        else:
            numerator.append(factor)
    return numerator, denominator


def _precedence(expr: sp.Basic) -> int:
    if isinstance(expr, sp.core.relational.Relational):
        return _RELATION
    if isinstance(expr, sp.Add):
        return _SUM
    if expr.is_Number:
        if expr < 0:
            return _SUM
        return _PRODUCT if isinstance(expr, sp.Rational) and not expr.is_Integer else _ATOM
    if isinstance(expr, sp.Mul):
        negative, _ = _split_sign(expr)
        return _SUM if negative else _PRODUCT
    if isinstance(expr, sp.Pow):
        if expr.exp == sp.S.Half:
            return _ATOM
        return _PRODUCT if expr.exp.is_Number and expr.exp < 0 else _POWER
    return _ATOM


# --- LaTeX (notebooks) --------------------------------------------------------------------

_LATEX_GREEK = {
    name: "\\" + name
    for name in (
        "alpha beta gamma delta epsilon zeta eta theta "
        "iota kappa lambda mu nu xi pi rho sigma tau upsilon phi chi psi omega Gamma Delta Theta "
        "Lambda Xi Pi Sigma Upsilon Phi Psi Omega"
    ).split()
}
_LATEX_SIGNS = {"≤": "\\le", "≥": "\\ge", "≠": "\\ne", "<": "<", ">": ">", "=": "="}
_LATEX_FUNCTIONS = {"sin", "cos", "tan", "arcsin", "arccos", "arctan", "exp", "ln", "min", "max"}
_LATEX_SPECIALS = str.maketrans(
    {
        "\\": r"\textbackslash{}",
        "{": r"\{",
        "}": r"\}",
        "$": r"\$",
        "&": r"\&",
        "#": r"\#",
        "^": r"\textasciicircum{}",
        "_": r"\_",
        "%": r"\%",
        "~": r"\textasciitilde{}",
    }
)


class LatexStepPrinter(_ExpressionPrinter):
    """LaTeX math, for Jupyter's MathJax."""

    def _name_part(self, part: NamePart) -> str:
        if part.greek:
            return _LATEX_GREEK[part.text]
        if part.upright:
            return f"\\mathrm{{{part.text}}}"
        return part.text if len(part.text) == 1 else f"\\mathit{{{part.text}}}"

    def symbol_name(self, name: SymbolName) -> str:
        base = self._name_part(name.base)
        if not name.subscripts:
            return base
        return f"{base}_{{{','.join(self._name_part(part) for part in name.subscripts)}}}"

    def literal(self, digits: str, negative: bool = False) -> str:
        digits = digits.replace(",", "{,}")
        return f"-{digits}" if negative else digits

    def constant(self, letter: str) -> str:
        return "\\pi" if letter == "π" else "e"

    def _number(self, number: FormattedNumber) -> str:
        text = number.digits.replace(",", "{,}")
        if number.exponent is not None:
            text += f" \\times 10^{{{number.exponent}}}"
        return text

    def _unit(self, unit: tuple[tuple[str, float], ...]) -> str:
        pieces = []
        for index, (symbol, exponent) in enumerate(unit):
            if symbol == "°":
                pieces.append("{}^{\\circ}")
                continue
            shown = f"\\mathrm{{{symbol}}}"
            power = abs(exponent)
            if power != 1:
                shown += f"^{{{_exponent_text(power)}}}"
            if exponent < 0:
                pieces.append("/" + shown)
            else:
                pieces.append(("\\cdot " if index else "") + shown)
        return "".join(pieces)

    def number_with_unit(self, value: Quantityish) -> str:
        text = self._number(value.number)
        if value.unit:
            unit = self._unit(value.unit)
            text += unit if unit.startswith("{}^") else "\\ " + unit
        return text

    def plus_operator(self) -> str:
        return " + "

    def minus_operator(self) -> str:
        return " - "

    def minus_prefix(self) -> str:
        return "-"

    def times(self, explicit: bool) -> str:
        return " \\cdot " if explicit else " \\, "

    def fraction(self, numerator: str, denominator: str) -> str:
        return f"\\frac{{{numerator}}}{{{denominator}}}"

    def square_root(self, radicand: str) -> str:
        return f"\\sqrt{{{radicand}}}"

    def power(self, base: str, exponent: str) -> str:
        return f"{{{base}}}^{{{exponent}}}"

    def parens(self, inner: str) -> str:
        return f"\\left({inner}\\right)"

    def function_call(self, name: str, arguments: list[str]) -> str:
        head = f"\\{name}" if name in _LATEX_FUNCTIONS else f"\\operatorname{{{name}}}"
        return f"{head}\\left({', '.join(arguments)}\\right)"

    def absolute(self, inner: str) -> str:
        return f"\\left|{inner}\\right|"

    def cases(self, branches: list[tuple[str, str | None]]) -> str:
        rows = [
            f"{value} & {self.text('if ') + condition if condition else self.text('otherwise')}"
            for value, condition in branches
        ]
        return "\\begin{cases} " + " \\\\ ".join(rows) + " \\end{cases}"

    def relation(self, left: str, sign: str, right: str) -> str:
        return f"{left} {_LATEX_SIGNS[sign]} {right}"

    def word_between(self, pieces: list[str], word: str) -> str:
        return f" {self.text(f' {word} ')} ".join(pieces)

    def text(self, words: str) -> str:
        return f"\\text{{{words.translate(_LATEX_SPECIALS)}}}"

    def chain(self, pieces: Sequence[str]) -> str:
        return " = ".join(pieces)

    def stacked(self, pieces: Sequence[str]) -> str:
        rows = [f"{pieces[0]} &= {pieces[1]}", *(f"&= {piece}" for piece in pieces[2:])]
        return "\\begin{aligned}" + " \\\\ ".join(rows) + "\\end{aligned}"


# --- MathML (HTML sheets) ------------------------------------------------------------------

_MATHML_SIGNS = {
    "≤": "&#x2264;",
    "≥": "&#x2265;",
    "≠": "&#x2260;",
    "<": "&lt;",
    ">": "&gt;",
    "=": "=",
}


class MathMLStepPrinter(_ExpressionPrinter):
    """Presentation MathML, which current browsers lay out natively without scripts.

    Written as strings rather than with sympy's DOM-building MathML printers so
    that the slot template works exactly as for the other targets.
    """

    def _name_part(self, part: NamePart) -> str:
        if part.greek:
            return f"<mi>{part.greek}</mi>"
        if part.upright:
            return f'<mi mathvariant="normal">{part.text}</mi>'
        if len(part.text) > 1:  # a multi-letter <mi> would otherwise be upright
            return f'<mi mathvariant="italic">{part.text}</mi>'
        return f"<mi>{part.text}</mi>"

    def symbol_name(self, name: SymbolName) -> str:
        base = self._name_part(name.base)
        if not name.subscripts:
            return base
        parts = '<mo separator="true">,</mo>'.join(
            self._name_part(part) for part in name.subscripts
        )
        subscript = parts if len(name.subscripts) == 1 else f"<mrow>{parts}</mrow>"
        return f"<msub>{base}{subscript}</msub>"

    def literal(self, digits: str, negative: bool = False) -> str:
        number = f"<mn>{digits}</mn>"
        return f"<mo>&#x2212;</mo>{number}" if negative else number

    def constant(self, letter: str) -> str:
        return f"<mi>{letter}</mi>"

    def _number(self, number: FormattedNumber) -> str:
        text = f"<mn>{number.digits}</mn>"
        if number.exponent is not None:
            text += f"<mo>&#xD7;</mo><msup><mn>10</mn><mn>{number.exponent}</mn></msup>"
        return text

    def _unit(self, unit: tuple[tuple[str, float], ...]) -> str:
        pieces = []
        for index, (symbol, exponent) in enumerate(unit):
            shown = f'<mi mathvariant="normal">{html.escape(symbol)}</mi>'
            power = abs(exponent)
            if power != 1:
                shown = f"<msup>{shown}<mn>{_exponent_text(power)}</mn></msup>"
            if exponent < 0:
                pieces.append("<mo>/</mo>" + shown)
            else:
                pieces.append(("<mo>&#x22C5;</mo>" if index else "") + shown)
        return "".join(pieces)

    def number_with_unit(self, value: Quantityish) -> str:
        text = self._number(value.number)
        if value.unit:
            space = "" if value.unit[0][0] == "°" else '<mspace width="0.25em"/>'
            text += space + self._unit(value.unit)
        return text

    def negated_quantity(self, text: str) -> str:
        return f"<mrow>{self.minus_prefix()}{text}</mrow>"

    def lone_quantity(self, text: str) -> str:
        return f"<mrow>{text}</mrow>"

    def plus_operator(self) -> str:
        return "<mo>+</mo>"

    def minus_operator(self) -> str:
        return "<mo>&#x2212;</mo>"

    def minus_prefix(self) -> str:
        return "<mo>&#x2212;</mo>"

    def times(self, explicit: bool) -> str:
        return "<mo>&#x22C5;</mo>" if explicit else "<mo>&#x2062;</mo>"

    def fraction(self, numerator: str, denominator: str) -> str:
        return f"<mfrac><mrow>{numerator}</mrow><mrow>{denominator}</mrow></mfrac>"

    def square_root(self, radicand: str) -> str:
        return f"<msqrt><mrow>{radicand}</mrow></msqrt>"

    def power(self, base: str, exponent: str) -> str:
        return f"<msup><mrow>{base}</mrow><mrow>{exponent}</mrow></msup>"

    def parens(self, inner: str) -> str:
        return f"<mrow><mo>(</mo>{inner}<mo>)</mo></mrow>"

    def function_call(self, name: str, arguments: list[str]) -> str:
        joined = '<mo separator="true">,</mo>'.join(arguments)
        return f"<mi>{name}</mi><mo>&#x2061;</mo><mrow><mo>(</mo>{joined}<mo>)</mo></mrow>"

    def absolute(self, inner: str) -> str:
        return f'<mrow><mo fence="true">|</mo>{inner}<mo fence="true">|</mo></mrow>'

    def cases(self, branches: list[tuple[str, str | None]]) -> str:
        rows = []
        for value, condition in branches:
            shown = self.text("if ") + condition if condition else self.text("otherwise")
            rows.append(
                f'<mtr><mtd columnalign="left"><mrow>{value}</mrow></mtd>'
                f'<mtd columnalign="left"><mrow>{shown}</mrow></mtd></mtr>'
            )
        return f"<mrow><mo>{{</mo><mtable>{''.join(rows)}</mtable></mrow>"

    def relation(self, left: str, sign: str, right: str) -> str:
        return f"{left}<mo>{_MATHML_SIGNS[sign]}</mo>{right}"

    def word_between(self, pieces: list[str], word: str) -> str:
        return self.text(f" {word} ").join(pieces)

    def text(self, words: str) -> str:
        return f"<mtext>{html.escape(words)}</mtext>"

    def chain(self, pieces: Sequence[str]) -> str:
        return "<mo>=</mo>".join(f"<mrow>{piece}</mrow>" for piece in pieces)

    def stacked(self, pieces: Sequence[str]) -> str:
        rows = []
        for index, piece in enumerate(pieces[1:]):
            left = f"<mrow>{pieces[0]}</mrow>" if index == 0 else ""
            rows.append(
                f"<mtr><mtd>{left}</mtd><mtd><mrow><mo>=</mo><mrow>{piece}</mrow></mrow></mtd></mtr>"
            )
        # MathML Core lays out columnalign as centred: the class lets the sheet's style
        # align the symbol right and the pieces left, equals signs under each other.
        return (
            '<mtable class="stacked" columnalign="right left" displaystyle="true">'
            f"{''.join(rows)}</mtable>"
        )


# --- Typst (PDF sheets) --------------------------------------------------------------------

_TYPST_SIGNS = {"≤": "<=", "≥": ">=", "≠": "!=", "<": "<", ">": ">", "=": "="}
_TYPST_FUNCTIONS = {"sin", "cos", "tan", "arcsin", "arccos", "arctan", "exp", "ln", "min", "max"}


class TypstStepPrinter(_ExpressionPrinter):
    """Typst math markup, for the PDF. Words are quoted so Typst never reads them as code."""

    def _name_part(self, part: NamePart) -> str:
        if part.greek:
            return part.text
        if part.upright:
            return f"upright({typst_string(part.text)})"
        return part.text if len(part.text) == 1 else f"italic({typst_string(part.text)})"

    def symbol_name(self, name: SymbolName) -> str:
        base = self._name_part(name.base)
        if not name.subscripts:
            return base
        return f"{base}_({', '.join(self._name_part(part) for part in name.subscripts)})"

    def literal(self, digits: str, negative: bool = False) -> str:
        number = f'"{digits}"' if "," in digits else digits
        return f"-{number}" if negative else number

    def constant(self, letter: str) -> str:
        return "pi" if letter == "π" else "e"

    def _number(self, number: FormattedNumber) -> str:
        text = f'"{number.digits}"' if "," in number.digits else number.digits
        if number.exponent is not None:
            text += f" times 10^({number.exponent})"
        return text

    def _unit(self, unit: tuple[tuple[str, float], ...]) -> str:
        pieces = []
        for index, (symbol, exponent) in enumerate(unit):
            shown = typst_string(symbol)
            power = abs(exponent)
            if power != 1:
                shown += f"^({_exponent_text(power)})"
            if exponent < 0:
                pieces.append(' "/" ' + shown)
            else:
                pieces.append((" dot.op " if index else "") + shown)
        return "".join(pieces)

    def number_with_unit(self, value: Quantityish) -> str:
        text = self._number(value.number)
        if value.unit:
            space = "" if value.unit[0][0] == "°" else " thin "
            text += space + self._unit(value.unit)
        return text

    def grouped_quantity(self, inner: str) -> str:
        return f"({inner})"  # plain parentheses: a value is never tall enough for lr()

    def plus_operator(self) -> str:
        return " + "

    def minus_operator(self) -> str:
        return " - "

    def minus_prefix(self) -> str:
        return "-"

    def times(self, explicit: bool) -> str:
        return " dot.op " if explicit else " "

    def fraction(self, numerator: str, denominator: str) -> str:
        return f"frac({numerator}, {denominator})"

    def square_root(self, radicand: str) -> str:
        return f"sqrt({radicand})"

    def power(self, base: str, exponent: str) -> str:
        return f"{base}^({exponent})"

    def parens(self, inner: str) -> str:
        return f"lr(({inner}))"

    def function_call(self, name: str, arguments: list[str]) -> str:
        head = name if name in _TYPST_FUNCTIONS else f'op("{name}")'
        return f"{head}({', '.join(arguments)})"

    def absolute(self, inner: str) -> str:
        return f"abs({inner})"

    def cases(self, branches: list[tuple[str, str | None]]) -> str:
        rows = []
        for value, condition in branches:
            shown = self.text("if ") + " " + condition if condition else self.text("otherwise")
            rows.append(f"{value} & {shown}")
        return f"cases({', '.join(rows)})"

    def relation(self, left: str, sign: str, right: str) -> str:
        return f"{left} {_TYPST_SIGNS[sign]} {right}"

    def word_between(self, pieces: list[str], word: str) -> str:
        return f" {self.text(f' {word} ')} ".join(pieces)

    def text(self, words: str) -> str:
        return typst_string(words)

    def chain(self, pieces: Sequence[str]) -> str:
        return " = ".join(pieces)

    def stacked(self, pieces: Sequence[str]) -> str:
        rows = [f"{pieces[0]} &= {pieces[1]}", *(f"&= {piece}" for piece in pieces[2:])]
        return " \\\n".join(rows)


# --- plain text (terminal, logs, and checking that what is printed is what was computed) -----


class PlainStepPrinter(_ExpressionPrinter):
    """ASCII text with explicit operators; substituted values are parenthesised with units."""

    def symbol_name(self, name: SymbolName) -> str:
        return name.name

    def literal(self, digits: str, negative: bool = False) -> str:
        digits = digits.replace(",", "")
        return f"-{digits}" if negative else digits

    def constant(self, letter: str) -> str:
        return "pi" if letter == "π" else "e"

    parenthesises_every_value = True

    def number_with_unit(self, value: Quantityish) -> str:
        text = replace(value.number, negative=False).plain().replace(",", "")
        if value.unit:
            unit = (
                "*".join(
                    (
                        symbol.replace("°", "deg")
                        + (f"**{_exponent_text(power)}" if power != 1 else "")
                    )
                    for symbol, power in value.unit
                    if power > 0
                )
                or "1"
            )
            below = [(symbol, -power) for symbol, power in value.unit if power < 0]
            for symbol, power in below:
                unit += f"/{symbol}" + (f"**{_exponent_text(power)}" if power != 1 else "")
            text = f"{text} {unit}"
        return text

    def plus_operator(self) -> str:
        return " + "

    def minus_operator(self) -> str:
        return " - "

    def minus_prefix(self) -> str:
        return "-"

    def times(self, explicit: bool) -> str:
        return "*"

    def fraction(self, numerator: str, denominator: str) -> str:
        return f"({numerator})/({denominator})"

    def square_root(self, radicand: str) -> str:
        return f"sqrt({radicand})"

    def power(self, base: str, exponent: str) -> str:
        return f"{base}**({exponent})"

    def parens(self, inner: str) -> str:
        return f"({inner})"

    def function_call(self, name: str, arguments: list[str]) -> str:
        return f"{name}({', '.join(arguments)})"

    def absolute(self, inner: str) -> str:
        return f"abs({inner})"

    def cases(self, branches: list[tuple[str, str | None]]) -> str:
        rows = [
            f"{value} if {condition}" if condition else f"{value} otherwise"
            for value, condition in branches
        ]
        return "{" + "; ".join(rows) + "}"

    def relation(self, left: str, sign: str, right: str) -> str:
        ascii_sign = {"≤": "<=", "≥": ">=", "≠": "!="}.get(sign, sign)
        return f"{left} {ascii_sign} {right}"

    def word_between(self, pieces: list[str], word: str) -> str:
        return f" {word} ".join(pieces)

    def text(self, words: str) -> str:
        return words

    def chain(self, pieces: Sequence[str]) -> str:
        return " = ".join(pieces)

    def stacked(self, pieces: Sequence[str]) -> str:
        rows = [f"{pieces[0]} = {pieces[1]}", *(f"= {piece}" for piece in pieces[2:])]
        return "\n".join(rows)


def _exponent_text(power: float) -> str:
    return str(int(power)) if float(power).is_integer() else format(power, "g")


PRINTERS: dict[str, Callable[..., _ExpressionPrinter]] = {
    "latex": LatexStepPrinter,
    "mathml": MathMLStepPrinter,
    "typst": TypstStepPrinter,
    "plain": PlainStepPrinter,
}
TARGETS = tuple(PRINTERS)
