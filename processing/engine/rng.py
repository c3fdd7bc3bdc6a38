"""One seeded random generator per run.

Every algorithm makes exactly one ``numpy.random.Generator(PCG64(seed))``. SEED 0
means "draw a seed for me": a seed is taken from the operating system's entropy,
and returned so that the log, the report and the output can record it.
"""
from dataclasses import dataclass

import numpy as np

MAX_SEED = 2**31 - 1


@dataclass(frozen=True)
class SeededGenerator:
    """A generator together with the seed that made it."""

    generator: np.random.Generator
    seed: int


def make_rng(seed=0):
    """Return a :class:`SeededGenerator` for ``seed`` (0 draws a fresh seed).

    Parameters
    ----------
    seed : int
        A non-negative integer. 0 draws a seed in [1, 2**31 - 1].
    """
    seed = int(seed)
    if seed < 0:
        raise ValueError("The seed must be 0 (draw one) or a positive whole number.")
    if seed == 0:
        seed = int(np.random.SeedSequence().generate_state(1)[0] % MAX_SEED) + 1
    return SeededGenerator(np.random.Generator(np.random.PCG64(seed)), seed)
