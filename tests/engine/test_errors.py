"""Engine messages: str() of a converted message is the English text the engine wrote before.

The expected sentences are written out here as the engine produced them before the messages
became translatable (truth by construction: the old f-strings).
"""
import pytest

import pickle

from plotwise.processing.engine.errors import InputError, Message, message


def test_message_is_the_filled_template_and_hashable():
    m = message("Stratum feature(s) {shown} are empty (cv {cv:.3f}).", shown="3, 7", cv=0.12345)
    assert str(m) == "Stratum feature(s) 3, 7 are empty (cv 0.123)."
    assert type(str(m)) is str and f"{m}" == str(m)
    assert isinstance(m, Message) and hash(m) == hash(message(m.template, shown="3, 7", cv=0.12345))
    assert dict(m.values) == {"shown": "3, 7", "cv": 0.12345}
    assert m.template == "Stratum feature(s) {shown} are empty (cv {cv:.3f})."


def test_message_behaves_as_its_english_text():
    m = message("The total of {total} units exceeds {n}.", total=12, n=10)
    assert "12 units" in m and m.startswith("The total") and " ".join([m, "x"]).endswith("10. x")
    assert m == "The total of 12 units exceeds 10."
    again = pickle.loads(pickle.dumps(m))
    assert again.template == m.template and dict(again.values) == dict(m.values)


def test_message_is_immutable():
    m = message("{n}", n=1)
    try:
        m.template = "other"
    except AttributeError:
        pass
    else:
        raise AssertionError("a Message must not change")


def test_nested_message_is_formatted():
    inner = message("{n} more", n=4)
    assert str(message("ids 1, 2 and {rest}", rest=inner)) == "ids 1, 2 and 4 more"


def test_input_error_keeps_english_text_and_the_message():
    m = message("The unit area must be a positive number (got {area:g}).", area=-2.0)
    error = InputError(m, ids=[5])
    assert error.message == "The unit area must be a positive number (got -2)."
    assert str(error) == error.message
    assert error.detail is m and error.ids == [5]
    with pytest.raises(ValueError, match="positive number"):
        raise error


def test_input_error_accepts_plain_text():
    error = InputError("Plain text.")
    assert error.message == "Plain text." and error.detail is None and error.ids == []
