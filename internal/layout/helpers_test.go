package layout

import (
	"math"
	"strings"
	"testing"

	"arcwright/internal/planner"
)

// baseLayout is a small valid layout that the table tests edit.
const baseLayout = `arcwright: 1
title:
  title: Test layout
polar_angle: from_jet_axis
cell:
  kind: anechoic
  boundary: [[0, 0], [8, 0], [8, 6], [0, 6], [0, 0]]
  ceiling: 4 m
nozzle:
  exit: [2, 3]
  axis_height: 1.5 m
  kind: convergent
  diameter: 50.8 mm
operating_points:
  - name: P1
    npr: 1.5
    temperature_ratio: 1
band:
  low: 200 Hz
  high: 20 kHz
stands:
  - name: tripod
    base_radius: 0.3 m
    pole_diameter: 25 mm
arrays:
  - name: A
    stand: tripod
    arc:
      radius: 3 m
      polar: {from: 30 deg, to: 150 deg, step: 10 deg}
`

// edit returns base with each pair old → new replaced once; it fails the
// test when old is not in base.
func edit(t *testing.T, base string, pairs ...string) string {
	t.Helper()
	if len(pairs)%2 != 0 {
		t.Fatalf("edit: odd number of strings")
	}
	for i := 0; i < len(pairs); i += 2 {
		if !strings.Contains(base, pairs[i]) {
			t.Fatalf("edit: %q is not in the layout", pairs[i])
		}
		base = strings.Replace(base, pairs[i], pairs[i+1], 1)
	}
	return base
}

// mustDecode decodes text and fails the test on any error.
func mustDecode(t *testing.T, text string) (*planner.Request, []Warning) {
	t.Helper()
	req, warns, err := Decode("test.yaml", []byte(text))
	if err != nil {
		t.Fatalf("Decode: %v", err)
	}
	if req == nil {
		t.Fatalf("Decode: got a nil request and no error")
	}
	return req, warns
}

// decodeErrors decodes text, which must fail, and returns the problems.
func decodeErrors(t *testing.T, text string) Errors {
	t.Helper()
	req, _, err := Decode("test.yaml", []byte(text))
	if err == nil {
		t.Fatalf("Decode: got no error, want one")
	}
	if req != nil {
		t.Errorf("Decode: got a request with the error, want nil")
	}
	es, ok := err.(Errors)
	if !ok {
		t.Fatalf("Decode: got error of type %T, want Errors", err)
	}
	return es
}

// relTol is the relative tolerance of float comparisons of converted
// values: the conversions are a multiplication or two, so a few ulps.
const relTol = 1e-12

// near reports whether got is within relTol of want (relative), or both are
// the same infinity.
func near(got, want float64) bool {
	if math.IsInf(want, 0) || want == 0 {
		return got == want
	}
	return math.Abs(got-want) <= relTol*math.Abs(want)
}
