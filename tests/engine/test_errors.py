"""Engine messages: str() of a converted message is the English text the engine wrote before.

The expected sentences are written out here as the engine produced them before the messages
became translatable (truth by construction: the old f-strings).
"""
import pytest

from plotwise.processing.engine.errors import InputError, Message, message


def test_message_is_the_filled_template_and_hashable():
    m = message("Stratum feature(s) {shown} are empty (cv {cv:.3f}).", shown="3, 7", cv=0.12345)
    assert str(m) == "Stratum feature(s) 3, 7 are empty (cv 0.123)."
    assert f"{m}" == str(m)
    assert isinstance(m, Message) and hash(m) == hash(message(m.template, shown="3, 7", cv=0.12345))
    assert dict(m.values) == {"shown": "3, 7", "cv": 0.12345}


def test_list_values_are_frozen():
    m = message("{ids}", ids=[1, 2])
    hash(m)
    assert dict(m.values)["ids"] == (1, 2)


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
