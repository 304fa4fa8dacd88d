"""No evaluation of text anywhere in the package: no eval, exec, sympify or parse_expr.

Quantities typed by a user go through calcsheet.units.parse_quantity; expressions
come only from Python code. (ruff's S307/S102 rules also forbid eval and exec.)
"""

from __future__ import annotations

import re
from pathlib import Path

PACKAGE = Path(__file__).resolve().parents[1] / "calcsheet"
FORBIDDEN = re.compile(r"\b(eval|exec|sympify|parse_expr|parse_expression|S)\s*\(")


def test_the_package_never_evaluates_text():
    offenders = []
    for path in PACKAGE.rglob("*.py"):
        for number, line in enumerate(path.read_text(encoding="utf-8").splitlines(), start=1):
            code = line.split("#", 1)[0]
            if FORBIDDEN.search(code):
                offenders.append(f"{path.relative_to(PACKAGE.parent)}:{number}: {line.strip()}")
    assert not offenders, "\n".join(offenders)
