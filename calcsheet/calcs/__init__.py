"""Built-in calcs, written with the engine's public API only.

* :func:`calcsheet.calcs.member.member_sheet`: combined stresses at a station of a
  cantilever member under inclined, offset point loads.
"""

from calcsheet.calcs.member import member_sheet

__all__ = ["member_sheet"]
