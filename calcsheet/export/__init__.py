"""Outputs written to disk: HTML and PDF files of a sheet."""
