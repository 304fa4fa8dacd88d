"""A Jupyter form for the member combined-stress calc, with a live preview of its sheet.

from calcsheet.widgets import MemberForm
form = MemberForm.from_job_file("job.toml")
form                                  # the form, in a notebook
form.set_value("loads[0].magnitude", "3 kip")
form.refresh().summary()              # OA-1: OK, utilization ...
form.sheet                            # the sheet shown, for nbconvert --to calcsheet
"""

from calcsheet.widgets.form import FormError, MemberForm

__all__ = ["FormError", "MemberForm"]
