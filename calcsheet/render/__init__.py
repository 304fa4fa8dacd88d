"""Renderers: the sheet's parts laid out through jinja2 templates (HTML and Typst).

Renderers only read the sheet; every number and formula comes from the engine's
printers, so presentation never recomputes.
"""
