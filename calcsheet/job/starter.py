"""A commented starter job file (``calcsheet new``): every key with what it means."""

STARTER = """\
# calcsheet job file: one member checked for combined stresses.
# Quantities are text with their unit: "6.5 kip", "1.2 m", "35 deg", "50 ksi".
# Axes: the member runs along z from z = 0 (the fixed support of a cantilever) to
# its length; x to the right and y up in the cross-section, origin at the centroid.
version = 1

[sheet]
title = "Davit arm DA-1: combined stresses at the support"
units = "US"                 # "US" (kip, in, ksi) or "SI" (kN, mm, MPa)
detail = "concise"           # governing points step by step, the rest in a table; or "full"

[title_block]
project = "Pump house upgrade"
project_number = "P-0000"
subject = ""                 # empty: the member name and section
calc_number = "C-001"
prepared_by = ""
prepared_date = ""
checked_by = ""
checked_date = ""

# One [[revisions]] entry per issue of the calc; the last one is the current revision.
[[revisions]]
mark = "A"
date = ""
description = "Issued for review"
by = ""

[member]
name = "DA-1"
section = "W8X31"            # a catalog designation, or a table of dimensions:
# section = { kind = "rectangular HSS", H = "8 in", B = "4 in", t = "0.349 in" }
# kinds: plate (b, d), round bar (D), round HSS (OD, t), rectangular HSS (H, B, t),
#        I (d, bf, tw, tf), channel (d, bf, tw, tf), angle (d, b, t), tee (d, bf, tw, tf)
length = "60 in"             # support to free end
stations = ["0 in"]          # where the section is checked, from z = 0; or "auto" (the
                             # default): the critical station, found along the member
supports = "fixed-free"      # fixed at z = 0, free at the end; or "pinned-pinned",
                             # "fixed-pinned", "fixed-fixed", "overhang", "two-span"
# support_positions = ["0 in", "60 in"]  # moves the case's supports (an overhang needs them)
self_weight = true           # the member's own weight, a load of type D (the default)
gravity = "-y"               # the way gravity acts: "-y" for a beam, "-z" for a column
# braces = ["30 in"]         # brace points along the member, from z = 0

# Supports of your own, instead of member.supports: where, and which motions each
# restrains (ux, uy, uz: translations; rx, ry, rz: rotations about x, y, z).
# [[supports]]
# name = "base"
# z = "0 in"
# restrains = ["ux", "uy", "uz", "rx", "ry", "rz"]

[material]
grade = "ASTM A992"          # prefills Fy; or give Fy = "50 ksi" (wins over the grade)

[check]
kind = "allowable stress"    # generic von Mises check against Fy / factor of safety
factor_of_safety = 1.67
# kind = "AISC 360-22"       # or "EN 1993-1-1": the specification's member checks
# method = "LRFD"            # AISC: or "ASD"
# Cb = 1.0                   # AISC: left out, defaulted from the moment diagram (said so)
# load_height = "top flange" # where the load acts for lateral-torsional buckling:
#                            # "top flange", "shear centre" (the default), "bottom flange"
# tip_restraint = "free"     # AISC cantilever tip: "free", "laterally braced",
#                            # "torsionally restrained"
# EN 1993-1-1 only:
# national_annex = "EN recommended values"  # the set of national choices (γM, ψ, 6.10)
# gamma_M0 = 1.0             # partial factors; left out, the national set's values
# gamma_M1 = 1.0
# gamma_M2 = 1.25
# ltb_method = "6.3.2.3"     # or "6.3.2.2"; left out, 6.3.2.3 for rolled I-sections
# interaction_method = "B"   # 6.3.3 k factors by Annex B (the default) or "A"

# Point loads: magnitude and an angle from one axis toward another ...
[[loads]]
name = "hoist"
type = "L"                   # load type, for combinations
z = "60 in"                  # position along the member
magnitude = "3 kip"
angle = "20 deg"
from_axis = "-y"             # the force points cos(angle) along from_axis
toward_axis = "+z"           # ... and sin(angle) along toward_axis
ex = "0 in"                  # offset of the point of application from the centroid
ey = "-4 in"

# ... or by components: components = ["Fx", "Fy", "Fz"]
# [[loads]]
# name = "side"
# z = "30 in"
# components = ["0.3 kip", "0 kip", "0 kip"]

# Distributed loads: force per length (qx, qy, qz) from z_start to z_end, varying
# linearly from q_start to q_end (q_end left out: uniform), at offsets ex, ey:
# [[distributed]]
# name = "wind on arm"
# type = "W"
# z_start = "0 in"
# z_end = "60 in"
# q_start = ["0.02 kip/ft", "0 kip/ft", "0 kip/ft"]
# q_end = ["0.04 kip/ft", "0 kip/ft", "0 kip/ft"]
# ex = "0 in"
# ey = "0 in"

# Concentrated couples (right-hand rule about x, y, z):
# [[moments]]
# name = "twist"
# z = "60 in"
# Mz = "0.5 kip*ft"

[output]
folder = "out"               # inside this job's folder
stem = ""                    # file names; empty: the member name (+ revision)
paper = "letter"             # or "a4"
formats = ["pdf", "html", "json"]
package = false              # true: also one calc package PDF (cover, contents, every sheet)
"""
