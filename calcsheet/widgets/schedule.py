"""Run an action once typing has paused: a timer on the kernel's event loop, or a thread.

In a Jupyter kernel, widget changes arrive on the kernel's asyncio loop, so the
timer is scheduled there and the action runs on the same thread as every other
widget update. Outside a running loop (a script, a test) a daemon
:class:`threading.Timer` does the same job.
"""

from __future__ import annotations

import asyncio
import threading
from collections.abc import Callable
from typing import Protocol


class _Cancellable(Protocol):
    def cancel(self) -> None: ...


class Debouncer:
    """Call ``action`` ``delay`` seconds after the last :meth:`poke`; earlier pokes are dropped."""

    def __init__(self, action: Callable[[], None], delay: float) -> None:
        self.action = action
        self.delay = delay
        self._pending: _Cancellable | None = None
        self._lock = threading.Lock()

    @property
    def pending(self) -> bool:
        """Whether a call is waiting for the pause to end."""
        return self._pending is not None

    def poke(self) -> None:
        """Something changed: (re)start the wait."""
        with self._lock:
            self._cancel()
            try:
                loop = asyncio.get_running_loop()
            except RuntimeError:
                timer = threading.Timer(self.delay, self._fire)
                timer.daemon = True
                timer.start()
                self._pending = timer
            else:
                self._pending = loop.call_later(self.delay, self._fire)

    def cancel(self) -> None:
        """Drop a waiting call (the action is being run now by other means)."""
        with self._lock:
            self._cancel()

    def _cancel(self) -> None:
        if self._pending is not None:
            self._pending.cancel()
            self._pending = None

    def _fire(self) -> None:
        with self._lock:
            self._pending = None
        self.action()


def on_the_kernel_loop(action: Callable[[], None], delay: float) -> _Cancellable | None:
    """Call ``action`` once, ``delay`` seconds from now, on the running event loop; cancellable.

    For work done ahead while a person reads the form: it runs only in a Jupyter
    kernel (a running loop), between widget updates. Outside one (a script, a test)
    nothing is scheduled and None is returned: a thread would run the work beside the
    caller's own.
    """
    try:
        loop = asyncio.get_running_loop()
    except RuntimeError:
        return None
    return loop.call_later(delay, action)
