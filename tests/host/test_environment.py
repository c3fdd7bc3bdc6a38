"""The test environment a fresh machine builds: pinned tools, any clone folder name.

These guard `make setup` and `make test` themselves, as a new user meets them: a clone
called `plotwise-main` (what a code forge's zip unpacks to) and pip installing only what
`constraints.txt` pins.
"""
import os
import re
import shutil
import subprocess
import sys
import sysconfig
from pathlib import Path

import pytest

REPO = Path(__file__).resolve().parents[2]
IN_CLONE = "PLOTWISE_CLONE_FOLDER_TEST"


def _pins():
    pins = {}
    for line in (REPO / "constraints.txt").read_text(encoding="utf-8").splitlines():
        line = line.split("#", 1)[0].strip()
        if line:
            name, version = line.split("==")
            pins[_canonical(name)] = version.strip()
    return pins


def _canonical(name):
    return re.sub(r"[-_.]+", "-", name).lower()


def test_every_package_pip_installed_into_the_venv_is_pinned():
    site = Path(sysconfig.get_paths()["purelib"])
    if not str(site).startswith(sys.prefix) or sys.prefix == sys.base_prefix:
        pytest.skip("not running in a test venv")
    pins = _pins()
    installed = {}
    for info in site.glob("*.dist-info"):
        name, version = info.name[: -len(".dist-info")].rsplit("-", 1)
        installed[_canonical(name)] = version
    # pip and setuptools come with `python -m venv` itself, not from our install step
    ours = {n: v for n, v in installed.items() if n not in ("pip", "setuptools")}
    assert ours, "the venv holds no pip-installed package: not a venv made by make setup"
    unpinned = {n: v for n, v in ours.items() if n not in pins}
    assert not unpinned, f"installed but not pinned in constraints.txt: {unpinned}"
    wrong = {n: (v, pins[n]) for n, v in ours.items() if pins[n] != v}
    assert not wrong, f"installed version differs from constraints.txt: {wrong}"


def _copy_working_tree(destination):
    """The tracked and untracked (not ignored) files, as a fresh clone of this work would hold."""
    listed = subprocess.run(
        ["git", "ls-files", "--cached", "--others", "--exclude-standard", "-z"],
        cwd=REPO, capture_output=True, check=True,
    ).stdout.decode().split("\0")
    for name in filter(None, listed):
        source = REPO / name
        if source.is_file():
            target = destination / name
            target.parent.mkdir(parents=True, exist_ok=True)
            shutil.copy2(source, target)


@pytest.mark.skipif(os.environ.get(IN_CLONE) == "1", reason="already inside the clone-folder test")
@pytest.mark.skipif(shutil.which("git") is None or not (REPO / ".git").exists(), reason="needs a git checkout")
def test_suite_passes_in_a_clone_folder_that_is_no_python_identifier(tmp_path):
    # A folder named like a forge's zip download; with pytest's default import mode the
    # clone's processing/ shadowed the host's Processing framework there.
    clone = tmp_path / "plotwise-main"
    _copy_working_tree(clone)
    env = dict(os.environ, **{IN_CLONE: "1"})
    tests = ["tests/host/test_allocate.py", "tests/host/test_environment.py", "tests/engine/test_allocation.py"]
    done = subprocess.run(
        [sys.executable, "-m", "pytest", "-q", "-p", "no:cacheprovider", *tests],
        cwd=clone, env=env, capture_output=True, text=True, timeout=600,
    )
    assert done.returncode == 0, done.stdout[-3000:] + done.stderr[-2000:]
    assert " passed" in done.stdout and "error" not in done.stdout.splitlines()[-1]
