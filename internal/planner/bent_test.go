package planner

import (
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/geometry"
	"arcwright/internal/jet"
)

// hotSlowRequest is a 0.1 m, 20 m/s, 400 K exhaust (the jet reference
// sheet's §9 bending case, L_M = 2.81 m) in a 30 m room, with zones drawn
// to 1 m/s and 5 K above ambient so that they reach well into the bend.
func hotSlowRequest(at r3.Vec) *Request {
	req := point(at)
	req.Cell.Boundary[1][0], req.Cell.Boundary[2][0] = 30, 30
	req.Cell.Ceiling = 30
	req.Exit.Exit = r3.Vec{X: 2, Y: 5, Z: 1}
	req.Nozzle = jet.Nozzle{Kind: jet.Convergent, Diameter: 0.1}
	g := jet.Air()
	m := 20 / g.SoundSpeed(400-20*20/(2*g.Cp()))
	req.Points = []jet.Condition{{Name: "idle", Primary: jet.Stream{NPR: g.PressureRatio(m), TotalTemperature: 400}}}
	req.Limits.Velocity = 1
	req.Limits.Temperature = req.Ambient.Temperature + 5
	return req
}

// TestBentZoneBlocksAStation places a microphone on the bent path of a
// hot, slow exhaust, well above its straight zones: it must be blocked by
// the bent zone, and the reason must say so.
func TestBentZoneBlocksAStation(t *testing.T) {
	probe := mustPlan(t, hotSlowRequest(r3.Vec{X: 28, Y: 28, Z: 1}))
	pt := probe.Points[0]
	bp := pt.Plume.Bent()
	if bp == nil {
		t.Fatal("no bent plume")
	}
	// a path point 8 m downstream, where the path has risen well above
	// the straight zone
	var on jet.BentPoint
	for _, q := range bp.Path {
		if q.X >= 8 {
			on = q
			break
		}
	}
	if straight := pt.Velocity().Radius(on.X) + pt.Hot().Radius(on.X); on.Z < straight+0.5 {
		t.Fatalf("path at x %.2f m is only %.2f m up (straight zones %.2f m): choose a point further along", on.X, on.Z, straight)
	}
	p := mustPlan(t, hotSlowRequest(r3.Vec{X: 2 + on.X, Y: 5, Z: 1 + on.Z}))
	st := p.Stations[0]
	if st.Status != Blocked {
		t.Fatalf("a microphone on the bent path is %v: %v", st.Status, st.Reasons)
	}
	c := check(t, p, CheckVelocity)
	if !strings.Contains(c.Reason, "bent by buoyancy") {
		t.Errorf("reason %q does not say the zone is bent", c.Reason)
	}
	// the straight envelope alone would have called it clear
	mic := p.Request.Exit.ToJet(st.Mic)
	if s := pt.Velocity().Clearance(mic.X, mic.R); s < 0 {
		t.Errorf("straight clearance %.3f m: the test point is inside the straight zone too", s)
	}
	if math.IsNaN(c.Value) || c.Value >= 0 {
		t.Errorf("bent clearance %.3f m, want negative", c.Value)
	}
}

// TestCaptureFollowsTheBentPlume: a 6 m hood on the axis 10 m downstream
// of a hot, slow exhaust whose path has risen several metres there must
// not be called a capture (found in review: the straight plume fitted).
func TestCaptureFollowsTheBentPlume(t *testing.T) {
	req := hotSlowRequest(r3.Vec{X: 28, Y: 28, Z: 1})
	req.Cell.Collector = &geometry.Collector{Inlet: r3.Vec{X: 12, Y: 5, Z: 1}, Diameter: 6}
	p := mustPlan(t, req)
	pt := p.Points[0]
	if pt.Capture == OK {
		t.Errorf("capture ok: %s", pt.CaptureReason)
	}
}
