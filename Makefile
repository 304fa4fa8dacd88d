# Set-up is part of every target: a fresh clone needs only python3 (3.11+) and make.
PYTHON ?= python3
VENV := .venv
PY := $(VENV)/bin/python
STAMP := $(VENV)/.installed-stamp

.PHONY: demo demo-en test bench lint format clean

$(STAMP): pyproject.toml
	$(PYTHON) -m venv $(VENV)
	$(PY) -m pip install --quiet --upgrade pip
	$(PY) -m pip install --quiet -e ".[dev]"
	touch $(STAMP)

## demo: build the demo job (examples/outrigger.toml) into out/ as PDF, HTML and JSON
demo: $(STAMP)
	$(VENV)/bin/calcsheet build examples/outrigger.toml --out out

## demo-en: build the EN demo job (examples/en-bracket.toml: EN 1993-1-1, EN 1990, A4) into out/
demo-en: $(STAMP)
	$(VENV)/bin/calcsheet build examples/en-bracket.toml --out out

## test: lint, then the whole test suite
test: $(STAMP)
	$(PY) -m ruff check .
	$(PY) -m ruff format --check .
	$(PY) -m pytest

## bench: speed figures and ratios against the targets (not a test)
bench: $(STAMP)
	$(PY) bench/run.py

lint: $(STAMP)
	$(PY) -m ruff check .

format: $(STAMP)
	$(PY) -m ruff format .
	$(PY) -m ruff check --fix .

clean:
	rm -rf $(VENV) out build dist *.egg-info .pytest_cache .ruff_cache
