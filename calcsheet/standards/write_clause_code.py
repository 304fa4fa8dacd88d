"""Write every clause's numeric function as Python code, once, for every process.

Run ``python -m calcsheet.standards.write_clause_code`` after changing a clause.

:meth:`Clause.numeric` evaluates a clause's sympy expression on numpy arrays.
Turning the expression into a function (sympy's ``lambdify``) costs tens of
milliseconds a clause, paid again in every process. Instead the functions are
printed once by sympy's NumPy printer (the printer ``lambdify`` itself uses) into
the module :mod:`calcsheet.standards.clause_code`, keyed by
:attr:`Clause.written_key`; a test keeps the module in step with the clauses.
"""

from __future__ import annotations

import importlib
import pkgutil
from pathlib import Path

from sympy.printing.numpy import NumPyPrinter

import calcsheet.standards
from calcsheet.standards.clause import ALL_CLAUSES, Clause

TARGET = Path(__file__).with_name("clause_code.py")
HEADER = '''"""Numeric functions of the clauses, written by calcsheet.standards.write_clause_code.

Do not edit: run ``python -m calcsheet.standards.write_clause_code`` after changing a
clause (a test says when). Each function is sympy's NumPy printing of the clause's
expression; the key is :attr:`calcsheet.standards.clause.Clause.written_key`.
"""

# ruff: noqa

import functools

import numpy

# The printer writes Abs as a bare abs(), which lambdify's NumPy namespace makes numpy's.
abs = numpy.absolute

'''


def load_all_clauses() -> list[Clause]:
    """Every clause the standards package makes (its modules imported first)."""
    for module in pkgutil.walk_packages(calcsheet.standards.__path__, "calcsheet.standards."):
        if module.name.rsplit(".", 1)[-1] not in ("write_clause_code", "clause_code"):
            importlib.import_module(module.name)
    return [c for c in ALL_CLAUSES if c.build.__module__.startswith("calcsheet.standards.")]


def clause_code(clauses: list[Clause]) -> str:
    """The module text for ``clauses`` (each builder once, in key order).

    Keyed by :attr:`Clause.written_key` (cheap to find at run time); each function
    also names its expression's :attr:`Clause.code_key`, so that a formula changed in
    a helper the builder calls changes this text and the test comparing it fails.
    """
    functions: dict[str, str] = {}
    for clause in clauses:
        key = clause.written_key
        if key in functions:
            continue
        printer = NumPyPrinter({"fully_qualified_modules": True, "inline": True})
        body = printer.doprint(clause.placeholder_expression)
        arguments = ", ".join(clause.parameters)
        functions[key] = (
            f"def _{key}({arguments}):\n"
            f"    # {clause.reference}: {clause.description}\n"
            f"    # expression {clause.code_key}\n"
            f"    return {body}\n"
        )
    table = "".join(f'    "{key}": _{key},\n' for key in sorted(functions))
    return (
        HEADER
        + "\n\n".join(functions[key] for key in sorted(functions))
        + "\n\nFUNCTIONS = {\n"
        + table
        + "}\n"
    )


def main() -> None:
    TARGET.write_text(clause_code(load_all_clauses()), encoding="utf-8")
    print(f"wrote {TARGET}")


if __name__ == "__main__":
    main()
