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


# -- converted engine messages read as the old English sentences -----------------------------
# The expected texts are the sentences the engine wrote before (its f-strings), written out here.
def test_allocation_check_values_message():
    from plotwise.processing.engine import allocation

    with pytest.raises(InputError) as err:
        allocation.check_values([4.0, 0.0, -1.0], "area_ha", [5, 7, 9])
    assert err.value.message == (
        "The area_ha is NULL, negative or zero for stratum feature(s) 7, 9. Fill in a positive value for every "
        "stratum, or remove those strata from the layer."
    )
    assert err.value.ids == [7, 9] and err.value.detail.template.startswith("The {name} is NULL, negative or zero")
    with pytest.raises(InputError) as err:
        allocation.check_values([None, 1.0], "sd_c", [1, 2], allow_zero=True)
    assert err.value.message == (
        "The sd_c is NULL or negative for stratum feature(s) 1. Fill in a non-negative value for every "
        "stratum, or remove those strata from the layer."
    )


def test_allocation_default_names_and_long_id_lists():
    from plotwise.processing.engine import allocation

    areas = [1.0] * 25
    areas[3:25] = [0.0] * 22  # 22 bad strata: 20 listed, then the total
    with pytest.raises(InputError) as err:
        allocation.allocate(areas, 0.01, "proportional", total=10)
    listed = ", ".join(str(i) for i in range(4, 24))
    assert err.value.message == (
        f"The stratum area is NULL, negative or zero for stratum feature(s) {listed} … (22 in all). Fill in a "
        "positive value for every stratum, or remove those strata from the layer."
    )


def test_allocation_target_cv_message_formats_numbers_in_the_template():
    from plotwise.processing.engine import allocation

    with pytest.raises(InputError) as err:
        allocation.allocate([10.0, 10.0], 1.0, "neyman", target_cv=0.001, sds=[1.0, 2.0], means=[1.0, 1.0],
                            fpc=False)
    text = err.value.message
    assert text.startswith("The target CV of 0.001 cannot be reached: even all 20 units that fit give an expected "
                           "CV of ")
    assert text.endswith(", or use smaller units.") and "{" not in text


def test_layout_messages():
    from plotwise.processing.engine import layout

    with pytest.raises(InputError) as err:
        layout.LayoutSpec(design=0, shape=1, size=0.0)
    assert err.value.message == "SIZE must be more than 0 m for a square unit; it is 0.0."
    with pytest.raises(InputError) as err:
        layout.counts_from_field([3, None], [10, 11], "n_alloc")
    assert err.value.message == (
        "n_alloc is empty (NULL) or not a number for feature(s) 11. Give every stratum a whole number of units, "
        "or leave N_FIELD unset to use N_UNITS."
    )
    with pytest.raises(InputError) as err:
        layout.counts_from_field([2.5], [4], "n_alloc")
    assert err.value.message == ("n_alloc is not a whole number for feature(s) 4. "
                                 "Round the allocation to whole units first.")


def test_frame_stratification_estimation_messages():
    from shapely.geometry import box

    from plotwise.processing.engine import estimation, frame, stratification

    message_text = frame._emptied_message("exclude", 25000.0, 0.0, box(0, 0, 500, 500))
    assert message_text == (
        "Nothing is left of the study area (INPUT) after removing the excluded polygons (EXCLUDE): they cover all "
        "2.5 ha. Check that EXCLUDE holds only the areas to leave out."
    )
    assert stratification._constant_error("elevation", 312.0).message == (
        "Covariate 'elevation' is constant (312) over the frame: it cannot define strata. Use another covariate, "
        "or check the frame and the raster."
    )
    from plotwise.processing.engine.listing import listed_ids

    many = list(range(1, 61))
    assert str(listed_ids(many)) == ", ".join(str(i) for i in range(1, 21)) + " … (60 in all)"
    with pytest.raises(InputError) as err:
        estimation.estimate_density([1, 2], [1.0, 1.0], [1, 1], {1: 10.0}, confidence=1.5)
    assert err.value.message == "The confidence level must lie between 0 and 1 (got 1.5); use e.g. 0.95."
