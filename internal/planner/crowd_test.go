package planner

import (
	"fmt"
	"strings"
	"testing"

	"gonum.org/v1/gonum/spatial/r3"
)

// crowd returns a request with n microphones on posts (base radius 0.2 m)
// 1 mm apart along a line beside the jet: every stand overlaps every other.
func crowd(n int) *Request {
	fixed := make([]Fixed, n)
	for i := range fixed {
		fixed[i] = Fixed{Name: fmt.Sprintf("A-%04d", i+1), At: r3.Vec{X: 6 + 0.001*float64(i), Y: 8, Z: 1.5}}
	}
	return room(20, Array{Name: "A", Kind: Points, Stand: "post", Fixed: fixed})
}

// TestCrowdReasons: 300 overlapping stands give each station one short
// spacing reason with the count and the deepest overlap, and a sight-line
// reason that names a few stands, not hundreds (issue 10 item 12: 35 MB of
// JSON at 2,000 stations).
func TestCrowdReasons(t *testing.T) {
	const n = 300
	p := mustPlan(t, crowd(n))
	for _, st := range p.Stations {
		for _, c := range st.Checks {
			if len(c.Reason) > 200 {
				t.Fatalf("%s %s: a %d-character reason: %.200s…", st.ID, c.Name, len(c.Reason), c.Reason)
			}
		}
	}
	st := p.Stations[n/2]
	c, _ := st.Check(CheckSpacing)
	// a neighbour 1 mm away (A-0150 or A-0152) overlaps by 0.4 m − 1 mm
	// (hand-computed)
	want := fmt.Sprintf("overlaps %d other stands, the stand of A-015", n-1)
	if c.Verdict != Blocked || !strings.HasPrefix(c.Reason, want) || !strings.HasSuffix(c.Reason, " most, by 399 mm") {
		t.Errorf("spacing: got %v %q, want blocked %q… most, by 399 mm", c.Verdict, c.Reason, want)
	}
	if c, _ := st.Check(CheckSight); !strings.HasSuffix(c.Reason, " and others") {
		t.Errorf("sight: got %q, want a few stands named and the rest summarised", c.Reason)
	}
}
