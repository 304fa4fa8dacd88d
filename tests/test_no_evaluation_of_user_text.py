"""No evaluation of text anywhere in the package: no eval, exec, sympify or parse_expr.

Quantities typed by a user go through calcsheet.units.parse_quantity; expressions
come only from Python code. The calls are found in the syntax tree of every
module (so a docstring that mentions "S (F8-2)" is not mistaken for sympy's S()).
ruff's S307/S102 rules also forbid eval and exec.
"""

from __future__ import annotations

import ast
from pathlib import Path

PACKAGE = Path(__file__).resolve().parents[1] / "calcsheet"
FORBIDDEN = {"eval", "exec", "sympify", "parse_expr", "parse_expression", "S"}
# The builtin compile() makes code from text; re.compile and typst.compile do not.
FORBIDDEN_BUILTINS = FORBIDDEN | {"compile"}


def _called_name(node: ast.Call) -> str:
    if isinstance(node.func, ast.Name):
        return node.func.id if node.func.id in FORBIDDEN_BUILTINS else ""
    if isinstance(node.func, ast.Attribute):
        return node.func.attr if node.func.attr in FORBIDDEN else ""
    return ""


def test_the_package_never_evaluates_text():
    offenders = []
    for path in PACKAGE.rglob("*.py"):
        tree = ast.parse(path.read_text(encoding="utf-8"), filename=str(path))
        for node in ast.walk(tree):
            if isinstance(node, ast.Call) and _called_name(node):
                offenders.append(f"{path.relative_to(PACKAGE.parent)}:{node.lineno}")
    assert not offenders, "\n".join(offenders)


def test_the_check_finds_a_forbidden_call():
    tree = ast.parse("import sympy as sp\nx = sp.sympify(text)\ny = sp.S(text)\n")
    calls = [_called_name(node) for node in ast.walk(tree) if isinstance(node, ast.Call)]
    assert {"sympify", "S"} <= set(calls)
