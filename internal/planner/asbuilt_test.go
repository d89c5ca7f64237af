package planner

import (
	"strings"
	"testing"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"
)

// TestAsBuiltMeasurement: with as-built positions, a station left out is
// listed as not measured (not as planned); the microphone and the base are
// checked separately, so a microphone moved without its base is flagged
// whether or not the base was measured (issue 10 item 13).
func TestAsBuiltMeasurement(t *testing.T) {
	// four microphones on boom stands (0.3 m arm) beside the jet
	req := room(10, Array{Name: "B", Kind: Points, Stand: "boom", Fixed: []Fixed{
		{Name: "out", At: r3.Vec{X: 3, Y: 8, Z: 1.5}},
		{Name: "mic-only", At: r3.Vec{X: 4, Y: 8, Z: 1.5}},
		{Name: "base-stayed", At: r3.Vec{X: 5, Y: 8, Z: 1.5}},
		{Name: "both", At: r3.Vec{X: 6, Y: 8, Z: 1.5}},
	}})
	plan := mustPlan(t, req)
	base := func(id string) orb.Point {
		for _, s := range plan.Stations {
			if s.ID == id {
				return s.Base
			}
		}
		t.Fatalf("no station %s", id)
		return orb.Point{}
	}
	stayed, both := base("base-stayed"), base("both")
	moved := orb.Point{both[0] + 0.2, both[1]}
	req.AsBuilt = map[string]Placement{
		"mic-only":    {Mic: r3.Vec{X: 4.2, Y: 8, Z: 1.5}},
		"base-stayed": {Mic: r3.Vec{X: 5.2, Y: 8, Z: 1.5}, Base: &stayed},
		"both":        {Mic: r3.Vec{X: 6.2, Y: 8, Z: 1.5}, Base: &moved},
	}
	p := mustPlan(t, req)
	for _, tt := range []struct {
		id      string
		m       Measurement
		verdict Verdict
		reason  string
	}{
		{"out", NotMeasured, Warn, "not measured"},
		{"mic-only", Measured, Warn, "gives no base_x, base_y"},
		{"base-stayed", Measured, Warn, "one moved without the other"},
		{"both", Measured, OK, "as built: microphone 200 mm, base 200 mm"},
	} {
		var st *Station
		for i := range p.Stations {
			if p.Stations[i].ID == tt.id {
				st = &p.Stations[i]
			}
		}
		c, ok := st.Check(CheckAsBuilt)
		if st.Measurement != tt.m || !ok || c.Verdict != tt.verdict || !strings.Contains(c.Reason, tt.reason) {
			t.Errorf("%s: got %v, %v %q; want %v, %v …%s…", tt.id, st.Measurement, c.Verdict, c.Reason, tt.m, tt.verdict, tt.reason)
		}
		if tt.m == NotMeasured && st.Status == OK {
			t.Errorf("%s: not measured but ok", tt.id)
		}
	}
	// without as-built positions there is no such check
	if _, ok := plan.Stations[0].Check(CheckAsBuilt); ok || plan.Stations[0].Measurement != NoAsBuilt {
		t.Error("a plan without as-built positions has an as-built check")
	}
}
