"""calcsheet: member checks as calculation sheets that can be reviewed line by line.

The public API for writing a calc lives in :mod:`calcsheet.engine`; quantities and
unit presets in :mod:`calcsheet.units`.
"""

__version__ = "0.1.0"
