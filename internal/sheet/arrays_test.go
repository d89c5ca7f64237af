package sheet

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/planner"
)

// TestArcPointAtEdges asks for angles a hair outside the stations' range,
// as arcTicks does after rounding (issue 9 item 1: a 1:5000 sheet panicked
// with index out of range [-1] in arcPointAt), and for neighbours at one
// polar angle.
func TestArcPointAtEdges(t *testing.T) {
	c := r3.Vec{}
	at := func(deg float64) *planner.Station {
		a := deg * math.Pi / 180
		return &planner.Station{Polar: a, Mic: r3.Vec{X: 60 * math.Cos(a), Y: 60 * math.Sin(a)}}
	}
	ss := []*planner.Station{at(20), at(20.7), at(21.4)}
	for _, theta := range []float64{
		ss[0].Polar - 5e-10, ss[0].Polar, ss[0].Polar + 1e-12,
		ss[2].Polar + 5e-10, ss[2].Polar, (ss[0].Polar + ss[1].Polar) / 2,
	} {
		p, ok := arcPointAt(c, ss, theta)
		if !ok {
			t.Errorf("theta %.12f: got no point, want one", theta)
			continue
		}
		if r := r3.Norm(p); math.Abs(r-60) > 1e-4 {
			t.Errorf("theta %.12f: got a point %g m from the centre, want 60 m (within the 0.1 mm chord sag)", theta, r)
		}
	}
	if _, ok := arcPointAt(c, ss, ss[2].Polar+1e-6); ok {
		t.Error("got a point past the last station, want none")
	}
	// two stations at one polar angle on opposite sides: no runaway
	// subdivision, no panic
	b := at(20)
	b.Mic.Y = -b.Mic.Y
	b.Polar += 1e-9
	if _, ok := arcPointAt(c, []*planner.Station{at(20), b}, at(20).Polar); !ok {
		t.Error("got no point between two stations at one angle")
	}
}
