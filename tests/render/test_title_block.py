"""The title block's fields are declared once (engine.TitleBlock); the rest follow it."""

from __future__ import annotations

import dataclasses

from calcsheet.engine import Sheet, TitleBlock, title_block_items
from calcsheet.export.payload import sheet_payload
from calcsheet.job.schema import TitleBlockSpec
from calcsheet.render.html import render_html
from calcsheet.render.typst import render_typst

FIELDS = [item.name for item in dataclasses.fields(TitleBlock)]


def test_job_file_keys_are_the_engine_fields_less_the_revision():
    # The revision comes from the job's revision log, not from [title_block].
    assert list(TitleBlockSpec.model_fields) == [name for name in FIELDS if name != "revision"]


def test_every_field_has_a_label_in_declaration_order():
    block = TitleBlock(**{name: f"<{name}>" for name in FIELDS})
    items = title_block_items(block)
    assert [value for _, value in items] == [f"<{name}>" for name in FIELDS]
    assert all(label for label, _ in items)


def test_html_pdf_and_payload_show_every_field_under_its_label():
    block = TitleBlock(**{name: f"v{index}" for index, name in enumerate(FIELDS)})
    sheet = Sheet("Title block", title_block=block)
    html = render_html(sheet)
    markup = render_typst(sheet)
    for label, value in title_block_items(block):
        assert f"<th>{label}</th><td>{value}</td>" in html
        assert f'[*#"{label}"*], "{value}"' in markup
    assert set(sheet_payload(sheet)["title_block"]) == set(FIELDS)
