"""Design standards are registered once; the job file, the form and the calc agree on them."""

from __future__ import annotations

import typing

import pytest

from calcsheet.calcs.design import DesignBasis
from calcsheet.calcs.design_standards import design_standard, registered
from calcsheet.errors import InputError
from calcsheet.job.schema import CheckSpec
from calcsheet.widgets.checks import CHECK_PANELS


def test_every_registered_standard_has_a_job_kind_and_a_form_panel() -> None:
    kinds = typing.get_args(CheckSpec.model_fields["kind"].annotation)
    assert set(kinds) == set(registered())
    assert set(CHECK_PANELS) == set(registered())


def test_an_unknown_standard_names_the_choices() -> None:
    with pytest.raises(InputError, match="AISC 360-22"):
        design_standard("BS 5950")
    with pytest.raises(InputError, match="check kind"):
        DesignBasis("BS 5950")


def test_a_standard_gives_its_defaults() -> None:
    # AISC Commentary Table C-A-7.1, fixed-free design value 2.1 (from memory);
    # ASCE 7-22 2.3 / 2.4 go with LRFD / ASD (AISC 360-22 B3.1, B3.2).
    assert DesignBasis("AISC 360-22").effective_length_factor == 2.1
    assert DesignBasis("AISC 360-22", method="ASD").combination_standard == "ASCE 7-22 ASD"
    # EN 1990 goes with EN 1993-1-1 (EN 1993-1-1 2.1.2); 2.0 the theoretical fixed-free K
    # (common practice, no source).
    assert DesignBasis("EN 1993-1-1").combination_standard == "EN 1990"
    assert DesignBasis("EN 1993-1-1").effective_length_factor == 2.0
    assert DesignBasis().combination_standard is None
    with pytest.raises(InputError, match="check method"):
        DesignBasis("AISC 360-22", method="WSD")
