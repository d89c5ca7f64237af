package planner

import (
	"math"
	"strings"
	"testing"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"
)

// TestAsBuiltArmChecked checks that an as-built stand base far from its
// microphone is checked along the arm between them: a post beside the jet
// whose arm reaches across the axis is blocked (found in review).
func TestAsBuiltArmChecked(t *testing.T) {
	req := point(r3.Vec{X: 6.2, Y: 5.9, Z: 1.5})
	base := orb.Point{6.2, 4.1}
	req.AsBuilt = map[string]Placement{"m": {Mic: r3.Vec{X: 6.2, Y: 5.9, Z: 1.5}, Base: &base}}
	p := mustPlan(t, req)
	if c, _ := p.Stations[0].Check(CheckVelocity); c.Verdict != Blocked || !strings.Contains(c.Reason, "boom") {
		t.Errorf("got %v: %s", c.Verdict, c.Reason)
	}
}

// TestRingAcousticsFromTheExit checks that a ring's acoustic checks use
// the distance from the nozzle exit, not from the ring's centre on the
// axis: 10 m downstream, 1.2 m off the axis, the path is 10.07 m
// (hand-computed, found in review).
func TestRingAcousticsFromTheExit(t *testing.T) {
	req := room(30, Array{Name: "R", Kind: Ring, Stand: "post", RingX: 10, Radius: 1.2, AzFrom: 0, AzTo: 0, AzStep: 1})
	req.Band = Band{Low: 500, High: 80000}
	p := mustPlan(t, req)
	s := p.Stations[0]
	want := math.Hypot(10, 1.2)
	if math.Abs(s.Radius-want) > 1e-9 {
		t.Errorf("got radius %g, want %g", s.Radius, want)
	}
	if c, _ := s.Check(CheckAbsorption); math.Abs(c.Value-ck80(p)*want) > 1e-9 {
		t.Errorf("absorption over %g m: got %g dB", want, c.Value)
	}
}

func ck80(p *Plan) float64 { return p.Absorption[len(p.Absorption)-1].PerM }

// TestSightThroughWalls checks that a sight line leaving an L-shaped room
// is blocked by its walls (found in review).
func TestSightThroughWalls(t *testing.T) {
	req := point(r3.Vec{X: 4, Y: 16, Z: 1.5})
	req.Cell.Boundary = orb.Ring{{0, 0}, {20, 0}, {20, 8}, {8, 8}, {8, 20}, {0, 20}, {0, 0}}
	req.Exit.Exit = r3.Vec{X: 12, Y: 4, Z: 1.5}
	p := mustPlan(t, req)
	if c, _ := p.Stations[0].Check(CheckSight); c.Verdict == OK || !strings.Contains(c.Reason, "walls") {
		t.Errorf("got %v: %s", c.Verdict, c.Reason)
	}
}

// TestOverheadArcPoles checks that the poles of an arc in the vertical
// plane above the jet stand beside the axis, not on it (found in review).
func TestOverheadArcPoles(t *testing.T) {
	req := room(10, Array{Name: "A", Kind: Arc, Stand: "boom", Radius: 2, From: deg(30), To: deg(150), Step: deg(30), Azimuth: math.Pi / 2})
	p := mustPlan(t, req)
	for _, s := range p.Stations {
		// the jet runs along y = 5: every pole is the boom's length to its side
		if math.Abs(math.Abs(s.Base[1]-5)-0.3) > 1e-9 {
			t.Errorf("%s: pole at %v, want 0.3 m beside the axis", s.ID, s.Base)
		}
	}
}

// TestPointsWithoutStandOnTheFloor checks that a point array with no stand
// puts its microphones on the floor, as planned and as built alike.
func TestPointsWithoutStandOnTheFloor(t *testing.T) {
	req := room(10, Array{Name: "P", Kind: Points, Fixed: []Fixed{{Name: "m", At: r3.Vec{X: 6, Y: 5.7, Z: 1.5}}}})
	if s := mustPlan(t, req).Stations[0]; s.Mic.Z != 0 {
		t.Errorf("planned at %g m, want on the floor", s.Mic.Z)
	}
	req.AsBuilt = map[string]Placement{"m": {Mic: r3.Vec{X: 6, Y: 5.7, Z: 1.5}}}
	if s := mustPlan(t, req).Stations[0]; s.Mic.Z != 0 {
		t.Errorf("as built at %g m, want on the floor", s.Mic.Z)
	}
}

// TestBoomAgainstObstacles checks that a boom reaching over an obstacle at
// its height is caught, though its pole and microphone are clear of it.
func TestBoomAgainstObstacles(t *testing.T) {
	req := point(r3.Vec{X: 3, Y: 8, Z: 1.5})
	req.Arrays[0].Stand = "boom"
	req.Stands[1].BoomLength = 1.0
	// the pole stands 1 m further from the exit at (5, 5) than the
	// microphone; a column 0.5 m across between them at boom height
	mic := r3.Vec{X: 3, Y: 8, Z: 1.5}
	p := mustPlan(t, req)
	b := p.Stations[0].Base
	mid := orb.Point{(mic.X + b[0]) / 2, (mic.Y + b[1]) / 2}
	req.Cell.Obstacles = append(req.Cell.Obstacles, geometryColumn(mid, 0.05, 1.4, 1.6))
	p = mustPlan(t, req)
	if c, _ := p.Stations[0].Check(CheckObstacle); c.Verdict != Blocked {
		t.Errorf("boom through a column: got %v, %s", c.Verdict, c.Reason)
	}
}
