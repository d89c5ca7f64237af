package planner

import (
	"math"
	"strings"
	"testing"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/geometry"
	"arcwright/internal/jet"
)

// point returns a request with one microphone on a post at the given
// position.
func point(at r3.Vec) *Request {
	return room(10, Array{Name: "P", Kind: Points, Stand: "post", Fixed: []Fixed{{Name: "m", At: at}}})
}

func check(t *testing.T, p *Plan, name string) Check {
	t.Helper()
	c, ok := p.Stations[0].Check(name)
	if !ok {
		t.Fatalf("no %s check", name)
	}
	return c
}

// TestFloorNull checks the floor-reflection check against the acoustics
// reference sheet §3.1 row h_s = h_m = 1.0 m, d = 5.08 m: first null
// 452.1 Hz (COMPUTED with c = 343.2 m/s, image-source model, from memory
// high confidence). The source sits on the axis at the end of the nominal
// core, so the microphone is placed 5.08 m to the side of that point.
func TestFloorNull(t *testing.T) {
	req := point(r3.Vec{})
	req.Cell.Floor = geometry.Hard
	req.Exit.Exit.Z = 1.0
	probe := mustPlan(t, req)
	lc := probe.Points[0].CoreNominal
	req.Arrays[0].Fixed[0].At = r3.Vec{X: 5 + lc, Y: 5 + 5.08, Z: 1.0}
	req.Cell.Boundary = orb.Ring{{0, 0}, {20, 0}, {20, 20}, {0, 20}, {0, 0}}
	p := mustPlan(t, req)
	c := check(t, p, CheckGround)
	if math.Abs(c.Value-452.1) > 0.05 {
		t.Errorf("got first null %.2f Hz, want 452.1", c.Value)
	}
	if c.Verdict != Warn || !strings.Contains(c.Reason, "ground-plane microphone") {
		t.Errorf("got %v %q, want a warning with the remedy", c.Verdict, c.Reason)
	}
	// a treated floor has no null to report
	req.Cell.Floor = geometry.Treated
	p = mustPlan(t, req)
	if c := check(t, p, CheckGround); !math.IsNaN(c.Value) || c.Verdict != OK {
		t.Errorf("treated floor: got %v %v, want NaN, ok", c.Value, c.Verdict)
	}
}

// TestQuarterWave checks the wall check in an anechoic room: at 200 Hz and
// 20 °C a quarter wavelength is 343.2/800 = 0.429 m (hand-computed; the
// λ/4 rule is common practice, ISO 3745 from memory): a microphone 0.40 m
// from the wedge tips warns, one 0.45 m away does not, one 0.2 m away is
// inside the user's 0.3 m wall clearance and is blocked.
func TestQuarterWave(t *testing.T) {
	for _, tt := range []struct {
		gap  float64
		want Verdict
	}{{0.45, OK}, {0.40, Warn}, {0.2, Blocked}} {
		// the post's base (0.2 m) sets the distance: base edge at the gap
		req := point(r3.Vec{X: 5, Y: 10 - 0.2 - tt.gap, Z: 1.5})
		req.Cell.Kind = geometry.Anechoic
		req.Band.Low = 200
		req.Limits.WallClearance = 0.3
		p := mustPlan(t, req)
		c := check(t, p, CheckWall)
		if c.Verdict != tt.want || math.Abs(c.Value-tt.gap) > 1e-9 {
			t.Errorf("gap %g m: got %v %.4f (%s), want %v", tt.gap, c.Verdict, c.Value, c.Reason, tt.want)
		}
	}
}

// TestAbsorptionCheck checks the loss over the path at the band's top
// against the acoustics reference sheet §1.5: 10 kHz at 20 °C, 70 %,
// 101.325 kPa gives 0.117507 dB/m (COMPUTED from ISO 9613-1), so 0.5875 dB
// over 5 m.
func TestAbsorptionCheck(t *testing.T) {
	req := point(r3.Vec{X: 5, Y: 9, Z: 1.5})
	req.Cell.Boundary = orb.Ring{{0, 0}, {20, 0}, {20, 20}, {0, 20}, {0, 0}}
	req.Arrays[0].Fixed[0].At = r3.Vec{X: 5, Y: 10, Z: 1.5} // 5 m from the exit at (5, 5)
	req.Exit.Exit = r3.Vec{X: 5, Y: 5, Z: 1.5}
	req.Band = Band{Low: 500, High: 10000}
	p := mustPlan(t, req)
	c := check(t, p, CheckAbsorption)
	if math.Abs(c.Value-0.117507*5) > 1e-4 {
		t.Errorf("got %.5f dB, want %.5f", c.Value, 0.117507*5)
	}
	if p.Absorption[len(p.Absorption)-1].Band.Nominal != "10 kHz" {
		t.Errorf("absorption table ends at %s, want 10 kHz", p.Absorption[len(p.Absorption)-1].Band.Nominal)
	}
}

// TestInflow checks the entrained inflow, V = 0.04·Uj·D_eff/d (Ricou &
// Spalding 1961 rate 0.32, from memory; line-sink inflow derived), 1 m from
// the axis, hand-computed from the exit state.
func TestInflow(t *testing.T) {
	req := point(r3.Vec{X: 6, Y: 6, Z: 1.5})
	req.Points[0].Primary = jet.Stream{NPR: 2.0, TotalTemperature: 700}
	p := mustPlan(t, req)
	e := p.Points[0].Exit
	want := 0.04 * e.Velocity * e.EffectiveDiameter / 1
	if c := check(t, p, CheckInflow); math.Abs(c.Value-want) > 1e-12 {
		t.Errorf("got %.6f m/s, want %.6f", c.Value, want)
	}
}

// TestCapture checks collector capture: the conservative 5 % velocity
// edge, never narrower than the nominal one (2.0789 r½ for a Gaussian,
// reference sheet §11, DERIVED), against the inlet: ok below the inlet
// diameter, warn up to 1.25 times, blocked above.
func TestCapture(t *testing.T) {
	for _, tt := range []struct {
		diameter float64
		want     Verdict
	}{{3, OK}, {1.3, Warn}, {0.4, Blocked}} {
		req := point(r3.Vec{X: 6, Y: 7, Z: 1.5})
		req.Cell.Collector = &geometry.Collector{Inlet: r3.Vec{X: 8, Y: 5, Z: 1.5}, Diameter: tt.diameter}
		p := mustPlan(t, req)
		pt := p.Points[0]
		x := 3.0
		edge := 2 * pt.Plume.EdgeRadius(jet.Conservative, x, 0.05)
		if math.Abs(pt.CaptureDiameter-edge) > 1e-3 {
			t.Errorf("plume width %.4f, want %.4f", pt.CaptureDiameter, edge)
		}
		if nominal := 2 * 2.0789 * pt.Plume.HalfVelocityRadius(x); edge < nominal { // past the core: rc = 0
			t.Errorf("conservative plume width %.4f is less than the nominal %.4f", edge, nominal)
		}
		if pt.Capture != tt.want {
			t.Errorf("collector %g m (plume %.3f m): got %v, want %v: %s", tt.diameter, edge, pt.Capture, tt.want, pt.CaptureReason)
		}
	}
}

// TestUnevaluated checks that a station is never reported OK when it
// could not be evaluated: a position that is not a number is refused, and
// a check whose value came out NaN blocks the station.
func TestUnevaluated(t *testing.T) {
	_, err := New(point(r3.Vec{X: math.NaN(), Y: 5, Z: 1.5}))
	if err == nil || !strings.Contains(err.Error(), `station "m"`) {
		t.Errorf("got %v, want an error naming the station", err)
	}
	st := Station{}
	ck := &checker{}
	tl := &tally{}
	tl.add(Check{Name: CheckVelocity, Value: 3, Verdict: OK, Point: "a"})
	tl.add(Check{Name: CheckInflow, Value: math.NaN(), Verdict: OK, Point: "a", Reason: "x"})
	ck.finish(&st, tl)
	if st.Status != Blocked || !strings.Contains(strings.Join(st.Reasons, ""), "could not be evaluated") {
		t.Errorf("got %v %v, want blocked as unevaluated", st.Status, st.Reasons)
	}
}

// TestZoneClearance checks the zone checks: a microphone inside the plume
// is blocked with the depth, and one well to the side is OK with the
// governing point named.
func TestZoneClearance(t *testing.T) {
	p := mustPlan(t, point(r3.Vec{X: 5.5, Y: 5, Z: 1.5}))
	c := check(t, p, CheckVelocity)
	if c.Verdict != Blocked || c.Value >= 0 || !strings.Contains(c.Reason, "inside the velocity zone") {
		t.Errorf("on the axis: got %v %g %q", c.Verdict, c.Value, c.Reason)
	}
	p = mustPlan(t, point(r3.Vec{X: 4, Y: 8, Z: 1.5}))
	if c := check(t, p, CheckVelocity); c.Verdict != OK || c.Point != "cold" {
		t.Errorf("to the side: got %v %q", c.Verdict, c.Reason)
	}
	if p.Stations[0].Status == Blocked {
		t.Errorf("to the side: blocked by %v", p.Stations[0].Reasons)
	}
}

// TestImpingement checks the warning that a zone reaches a wall, the floor
// or the ceiling before any collector: in a 10 m room the 5 m/s zone of a
// 25 mm jet reaches the wall 5 m downstream and, with the axis 0.3 m up,
// the floor; a collector 2 m downstream that captures the plume silences
// both.
func TestImpingement(t *testing.T) {
	req := point(r3.Vec{X: 4, Y: 8, Z: 1.5})
	req.Exit.Exit.Z = 0.3
	p := mustPlan(t, req)
	all := strings.Join(p.Warnings, "\n")
	for _, want := range []string{"velocity zone reaches the walls", "velocity zone reaches the floor"} {
		if !strings.Contains(all, want) {
			t.Errorf("warnings lack %q:\n%s", want, all)
		}
	}
	req.Cell.Collector = &geometry.Collector{Inlet: r3.Vec{X: 7, Y: 5, Z: 0.3}, Diameter: 3}
	p = mustPlan(t, req)
	if p.Points[0].Capture == Blocked {
		t.Fatalf("collector does not capture: %s", p.Points[0].CaptureReason)
	}
	for _, w := range p.Warnings {
		if strings.Contains(w, "reaches the walls") {
			t.Errorf("captured plume still warned: %s", w)
		}
	}
}
