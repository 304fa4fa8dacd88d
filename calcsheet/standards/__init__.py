"""Standards: one module per standard, one :class:`Clause` per clause or equation."""

from calcsheet.standards.clause import Clause, clause

__all__ = ["Clause", "clause"]
