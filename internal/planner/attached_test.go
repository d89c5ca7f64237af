package planner

import (
	"strings"
	"testing"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/geometry"
	"arcwright/internal/jet"
)

// lowJet is a hot 50.8 mm jet 0.4 m above a hard floor in a 60 m × 20 m
// hall: its conservative velocity zone reaches the floor.
func lowJet(at r3.Vec) *Request {
	req := point(at)
	req.Cell.Boundary = orb.Ring{{0, 0}, {60, 0}, {60, 20}, {0, 20}, {0, 0}}
	req.Cell.Ceiling = 10
	req.Exit.Exit = r3.Vec{X: 2, Y: 10, Z: 0.4}
	req.Nozzle = jet.Nozzle{Kind: jet.Convergent, Diameter: 0.0508}
	req.Points = []jet.Condition{{Name: "hot", Primary: jet.Stream{NPR: 1.8, TotalTemperature: 800}}}
	return req
}

// TestWallJetAlongTheFloor places a flush floor microphone beside the
// axis, downstream of where the zone reaches the floor and outside the
// free zone: the wall jet along the floor (Launder & Rodi 1983 spreading,
// from memory) must block it, with a reason that says so.
func TestWallJetAlongTheFloor(t *testing.T) {
	probe := mustPlan(t, lowJet(r3.Vec{X: 59, Y: 19, Z: 0}))
	var wall *Attached
	for i := range probe.Attached {
		if a := &probe.Attached[i]; a.Surface == "floor" && a.Zone == jet.VelocityZone {
			wall = a
		}
	}
	if wall == nil {
		t.Fatalf("no wall jet along the floor: %+v", probe.Attached)
	}
	pt := probe.Points[0]
	x := wall.X + 4
	side := pt.Velocity().Radius(x) + 0.6 // beside the free zone
	req := lowJet(r3.Vec{X: 2 + x, Y: 10 + side, Z: 0})
	req.Arrays[0].Stand = ""
	p := mustPlan(t, req)
	mic := p.Request.Exit.ToJet(p.Stations[0].Mic)
	if c := pt.Velocity().Clearance(mic.X, mic.R); c < 0.25 {
		t.Fatalf("test point only %.3f m from the free zone: choose one further out", c)
	}
	c := check(t, p, CheckVelocity)
	if c.Verdict != Blocked || !strings.Contains(c.Reason, "wall jet") {
		t.Errorf("a floor microphone in the wall jet: %v %q", c.Verdict, c.Reason)
	}
}

// TestRadialJetOverAnEndWall puts an end wall 3 m downstream of a fast jet:
// a stand beside the impact point on that wall, outside the free zone, must
// be blocked by the radial wall jet (Glauert 1956 form, derived decay).
func TestRadialJetOverAnEndWall(t *testing.T) {
	req := lowJet(r3.Vec{X: 4.6, Y: 12.5, Z: 1.5})
	req.Exit.Exit.Z = 1.5
	req.Cell.Boundary = orb.Ring{{0, 0}, {5, 0}, {5, 20}, {0, 20}, {0, 0}}
	req.Cell.Kind = geometry.HardWalled
	p := mustPlan(t, req)
	radial := false
	for _, a := range p.Attached {
		radial = radial || a.Radial
	}
	if !radial {
		t.Fatalf("no radial wall jet over the end wall: %+v", p.Attached)
	}
	c := check(t, p, CheckVelocity)
	if c.Verdict != Blocked || !strings.Contains(c.Reason, "spread over the wall") {
		t.Errorf("a stand beside the impact point: %v %q", c.Verdict, c.Reason)
	}
}
