#!/usr/bin/env python3
"""Tests of the fixture checker itself (fixture.py, generate.build): every rule can fail, and does here."""
import math
import pathlib
import sys
import unittest

sys.path.insert(0, str(pathlib.Path(__file__).resolve().parent))

from fixture import Fixture, Tol, Tolerated, compare, encode, merge, pointwise, project, strip  # noqa: E402
from generate import build  # noqa: E402

T = Tol(rel=1e-12, abs=1e-15, why="test")


def diffs(fresh, committed, tol=T, fields=None):
    return compare(encode(fresh), committed, tol, fields or {}, "fx").differences


class CompareTest(unittest.TestCase):
    def test_relative_and_absolute_parts(self):
        self.assertEqual(diffs([1.0 + 0.9e-12], [1.0]), [])
        self.assertEqual(len(diffs([1.0 + 1.1e-12], [1.0])), 1)
        self.assertEqual(diffs([0.9e-15], [0.0]), [])
        self.assertEqual(len(diffs([1.1e-15], [0.0])), 1)

    def test_exact_kinds(self):
        self.assertEqual(len(diffs({"n": 3}, {"n": 4})), 1)  # integers are exact
        self.assertEqual(len(diffs({"s": "a"}, {"s": "b"})), 1)
        self.assertEqual(len(diffs({"b": True}, {"b": False})), 1)
        self.assertEqual(diffs([math.inf, math.nan, None], ["inf", "nan", None]), [])
        self.assertEqual(len(diffs([-math.inf], ["inf"])), 1)
        self.assertEqual(len(diffs([1.0], [None])), 1)

    def test_shape(self):
        self.assertEqual(len(diffs([1.0, 2.0], [1.0])), 1)
        self.assertEqual(len(diffs({"a": 1.0}, {"b": 1.0})), 1)

    def test_fields_first_match_and_wildcards(self):
        loose = Tol(rel=1e-3, why="loose")
        data = {"cases": [{"y": 1.0005, "x": 1.0005}]}
        committed = {"cases": [{"y": 1.0, "x": 1.0}]}
        found = diffs(data, committed, fields={"cases.y": loose})
        self.assertEqual([d.path for d in found], ["fx.cases[0].x"])
        self.assertEqual(diffs(data, committed, fields={"*": loose, "cases.x": T}), [])  # first match wins

    def test_tolerated_parts_and_pointwise(self):
        data = [Tolerated({"v": 1.001}, Tol(rel=1e-2, why="part")), {"v": 1.001}]
        self.assertEqual([d.path for d in diffs(data, [{"v": 1.0}, {"v": 1.0}])], ["fx[1].v"])
        data = pointwise([1.0, 2.0], [0.1, 1e-9], "points")
        self.assertEqual([d.path for d in diffs(data, [1.05, 2.05])], ["fx[1]"])

    def test_period(self):
        angle = Tol(rel=0, abs=1e-12, why="angle", period=2 * math.pi)
        self.assertEqual(diffs([math.pi], [-math.pi], tol=angle), [])
        self.assertEqual(len(diffs([math.pi], [-math.pi])), 1)

    def test_tol_needs_a_reason(self):
        with self.assertRaises(ValueError):
            Tol(rel=1e-9)


class DeriveTest(unittest.TestCase):
    """Outputs are computed from the committed inputs when those are within tolerance."""

    def fixture(self, a):
        return Fixture({"a": a}, tol=Tol(rel=1e-12, why="inputs"), derive=lambda f: {"y": 1e15 * (f["a"] - 1.0)})

    def test_outputs_follow_the_committed_bits(self):
        committed = {"a": 1.0, "y": 0.0}
        fresh, data, inputs = build(self.fixture(1.0 + 2.2e-16), committed, force=False)
        self.assertEqual(inputs.differences, [])
        self.assertEqual(data, committed)  # this machine's ulp did not reach y
        self.assertEqual(strip(fresh)["y"], 0.0)

    def test_inputs_beyond_tolerance_are_reported_and_used(self):
        committed = {"a": 1.0, "y": 0.0}
        fresh, data, inputs = build(self.fixture(1.001), committed, force=False)
        self.assertEqual(len(inputs.differences), 1)
        self.assertAlmostEqual(data["y"], 1e12, delta=1e3)

    def test_force_uses_this_machine(self):
        _, data, _ = build(self.fixture(1.0 + 2.2e-16), {"a": 1.0, "y": 0.0}, force=True)
        self.assertNotEqual(data["y"], 0.0)


class HelpersTest(unittest.TestCase):
    def test_merge_and_project(self):
        merged = merge([{"a": 1}], [{"b": 2}])
        self.assertEqual(merged, [{"a": 1, "b": 2}])
        self.assertEqual(project({"a": 1, "b": 2}, {"a": 0}), {"a": 1})
        self.assertIsNone(project({"b": 2}, {"a": 0}))
        with self.assertRaises(ValueError):
            merge({"a": 1}, {"a": 2})

    def test_strip_removes_markers(self):
        self.assertEqual(strip(encode([Tolerated(1.5, T), {"c": 1j}])), [1.5, {"c": {"re": 0.0, "im": 1.0}}])


if __name__ == "__main__":
    import io

    log = io.StringIO()
    suite = unittest.defaultTestLoader.loadTestsFromModule(sys.modules[__name__])
    result = unittest.TextTestRunner(stream=log, verbosity=1).run(suite)
    if not result.wasSuccessful():
        print(log.getvalue())
        sys.exit(1)
    print(f"fixture checker: {result.testsRun} self-tests pass")
