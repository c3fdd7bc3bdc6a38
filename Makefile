# Plotwise: make setup | lint | test | demo | package | translations | update-translations
# Every target is idempotent. `make test` and `make demo` each start from nothing on Debian 12.

SHELL := /bin/bash
HOST_PYTHON := /usr/bin/python3
VENV := .venv
VENV2 := .venv-shapely2
PY := $(VENV)/bin/python
PY2 := $(VENV2)/bin/python
PIP_INSTALL = $(1)/bin/pip install -q --disable-pip-version-check -c constraints.txt
SUDO := $(shell [ "$$(id -u)" = "0" ] || echo sudo)
VERSION := $(shell sed -n 's/^version=//p' metadata.txt)
export QT_QPA_PLATFORM := offscreen
export PYTHONDONTWRITEBYTECODE := 1

# Debian packages: the host and its Python libraries, lrelease for translations,
# Chromium for the report rendering test, scikit-learn and statsmodels as test-only references.
DEB_PACKAGES := python3-qgis qgis-providers qgis python3-numpy python3-scipy python3-shapely \
	python3-pyproj python3-gdal python3-venv python3-sklearn python3-statsmodels qttools5-dev-tools pyqt5-dev-tools \
	chromium poppler-utils zip unzip

.PHONY: setup host venvs translations update-translations lint test test-shapely18 test-shapely2 demo package bench clean

setup: host $(VENV)/.ready $(VENV2)/.ready translations

host:
	@missing=""; for p in $(DEB_PACKAGES); do dpkg -s $$p >/dev/null 2>&1 || missing="$$missing $$p"; done; \
	if [ -n "$$missing" ]; then \
		echo "Installing Debian packages:$$missing"; \
		$(SUDO) apt-get update -qq && \
		DEBIAN_FRONTEND=noninteractive $(SUDO) apt-get install -y -qq --no-install-recommends $$missing; \
	fi
	@$(HOST_PYTHON) -c "import qgis.core, shapely, scipy, pyproj; from osgeo import gdal" \
		|| { echo "The host's Python cannot import qgis, shapely, scipy, pyproj or GDAL."; exit 1; }

# The test venvs run the host headless by default (pytest-qgis starts QGIS before any conftest)
HEADLESS_PTH = echo 'import os; os.environ.setdefault("QT_QPA_PLATFORM", "offscreen")' \
	> "$$($(1)/bin/python -c 'import sysconfig; print(sysconfig.get_paths()["purelib"])')/plotwise_headless.pth"

$(VENV)/.ready: Makefile constraints.txt
	$(HOST_PYTHON) -m venv --system-site-packages $(VENV)
	$(call PIP_INSTALL,$(VENV)) pytest-qgis ruff
	$(call HEADLESS_PTH,$(VENV))
	touch $@

# shapely 2.0 beside the system numpy 1.24 (a plain `pip install shapely` would pull numpy 2)
$(VENV2)/.ready: Makefile constraints.txt
	$(HOST_PYTHON) -m venv --system-site-packages $(VENV2)
	$(call PIP_INSTALL,$(VENV2)) shapely numpy pytest-qgis
	$(call HEADLESS_PTH,$(VENV2))
	touch $@

# The .ts files are the one home of the translations (edit them with Qt Linguist or any .ts editor).
# `make translations` compiles them; unfinished entries are left out, so a changed English string
# shows in English until its translation is done again.
translations:
	@for ts in i18n/*.ts; do [ -e "$$ts" ] || continue; \
		lrelease -silent -nounfinished "$$ts" -qm "$${ts%.ts}.qm" || exit 1; done

# `make update-translations` refreshes the .ts files from the code with Debian's pylupdate5: new strings
# come in unfinished, strings gone from the code stay as obsolete entries (their translation kept for
# reuse). PYLUPDATE_FLAGS=-noobsolete drops those; TS_FILES=... (and TS_SOURCES=...) work on other files (the tests do).
TS_SOURCES ?= $(shell find plugin processing -name '*.py' -not -path '*/__pycache__/*' | LC_ALL=C sort) \
	scripts/build_models.py
TS_FILES ?= $(wildcard i18n/plotwise_*.ts)
PYLUPDATE_FLAGS ?=
update-translations:
	PYTHONWARNINGS=ignore pylupdate5 $(PYLUPDATE_FLAGS) $(TS_SOURCES) -ts $(TS_FILES)

# ruff with ruff.toml (pycodestyle and pyflakes, 120 columns)
lint: $(VENV)/.ready
	$(VENV)/bin/ruff check .

# Lint first (a long line or an unused import fails the build), then the suite twice: the host's stock
# shapely (1.8 on Debian 12), then shapely 2.0.
test: setup lint
	$(MAKE) --no-print-directory test-shapely18
	$(MAKE) --no-print-directory test-shapely2

# pytest exits 5 when it collects nothing: that is not a failure of the code under test
PYTEST_RUN = status=0; $(1) -m pytest -q $(2) || status=$$?; \
	if [ $$status = 5 ]; then echo "no tests collected"; status=0; fi; exit $$status

test-shapely18:
	@echo "== tests with shapely $$($(PY) -c 'import shapely; print(shapely.__version__)')"
	@$(call PYTEST_RUN,$(PY),)

test-shapely2:
	@echo "== tests with shapely $$($(PY2) -c 'import shapely; print(shapely.__version__)')"
	@$(call PYTEST_RUN,$(PY2),-m "not package")

demo: setup
	$(PY) scripts/demo_chain.py

package: translations
	rm -rf build/package dist/plotwise-$(VERSION).zip
	mkdir -p build/package/plotwise dist
	cp __init__.py metadata.txt LICENSE build/package/plotwise/
	cp -r plugin processing build/package/plotwise/
	mkdir -p build/package/plotwise/i18n
	-cp i18n/*.qm build/package/plotwise/i18n/ 2>/dev/null
	find build/package -name '__pycache__' -prune -exec rm -rf {} + ; find build/package -name '*.pyc' -delete
	cd build/package && zip -q -r ../../dist/plotwise-$(VERSION).zip plotwise
	@echo "dist/plotwise-$(VERSION).zip"

bench: setup
	@for b in tests/benchmarks/bench_*.py; do echo "== $$b"; $(PY) $$b || exit 1; done

clean:
	rm -rf build dist demo-output .pytest_cache
