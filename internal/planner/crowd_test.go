package planner

import (
	"fmt"
	"math"
	"slices"
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

// TestCrowdReasons: overlapping stands give each station one short spacing
// reason with the count (exact up to spacingCap, "more than" beyond it) and
// the deepest overlap, and a sight-line reason that names a few stands, not
// hundreds (issue 10 item 12: 35 MB of JSON at 2,000 stations).
func TestCrowdReasons(t *testing.T) {
	for _, tc := range []struct {
		n     int
		count string
	}{
		{60, "59"},                    // every stand overlaps the 59 others
		{spacingCap + 2, "more than"}, // 101 others: one past the cap
		{300, "more than"},
	} {
		t.Run(fmt.Sprint(tc.n), func(t *testing.T) {
			p := mustPlan(t, crowd(tc.n))
			for _, st := range p.Stations {
				for _, c := range st.Checks {
					if len(c.Reason) > 200 {
						t.Fatalf("%s %s: a %d-character reason: %.200s…", st.ID, c.Name, len(c.Reason), c.Reason)
					}
				}
			}
			i := tc.n / 2
			st := p.Stations[i]
			c, _ := st.Check(CheckSpacing)
			// a neighbour 1 mm away (A-0030 or A-0032 for the station
			// A-0031 of 60) overlaps by 0.4 m − 1 mm (hand-computed)
			count := tc.count
			if count == "more than" {
				count = fmt.Sprintf("more than %d", spacingCap)
			}
			want := fmt.Sprintf("overlaps %s other stands, the stand of ", count)
			near := []string{fmt.Sprintf("A-%04d", i), fmt.Sprintf("A-%04d", i+2)}
			rest, ok := strings.CutPrefix(c.Reason, want)
			if c.Verdict != Blocked || !ok || !slices.Contains(near, strings.TrimSuffix(rest, " most, by 399 mm")) {
				t.Errorf("spacing: got %v %q, want blocked %q%s or %s most, by 399 mm", c.Verdict, c.Reason, want, near[0], near[1])
			}
			if c, _ := st.Check(CheckSight); tc.n > 10 && !strings.HasSuffix(c.Reason, " and others") {
				t.Errorf("sight: got %q, want a few stands named and the rest summarised", c.Reason)
			}
		})
	}
}

// packed returns a request with n microphones on posts (base radius 0.2 m)
// on a square grid span metres across beside the jet. With span below
// 0.28 m any two centres are at most 0.28·√2 ≈ 0.396 m apart, less than
// the 0.4 m of two base radii, so every stand overlaps every other however
// large n is; a span of a millimetre piles them up as an as-built file in
// the wrong length unit would.
func packed(n int, span float64) *Request {
	side := int(math.Ceil(math.Sqrt(float64(n))))
	step := span / float64(max(side-1, 1))
	fixed := make([]Fixed, n)
	for i := range fixed {
		fixed[i] = Fixed{Name: fmt.Sprintf("A-%05d", i+1),
			At: r3.Vec{X: 6 + step*float64(i%side), Y: 8 + step*float64(i/side), Z: 1.5}}
	}
	return room(20, Array{Name: "A", Kind: Points, Stand: "post", Fixed: fixed})
}

// BenchmarkPlanCrowd plans crowds of stands that all overlap one another,
// spread over 0.28 m or piled within 1 mm. Its ns/station metric stays
// flat when the cost per station does not grow with the number of stands
// it overlaps (issue 10 item 12: 2,000 such stands took 1.9 s and 4,000
// took 5.6 s; a pile of 10,000 listed 400 million grid entries).
func BenchmarkPlanCrowd(b *testing.B) {
	for _, shape := range []struct {
		name string
		span float64
	}{{"spread", 0.28}, {"piled", 0.001}} {
		for _, n := range []int{1000, 2000, 4000, 10000, 20000} {
			b.Run(fmt.Sprintf("%s/stations=%d", shape.name, n), func(b *testing.B) {
				req := packed(n, shape.span)
				b.ReportAllocs()
				for b.Loop() {
					p, err := New(req)
					if err != nil {
						b.Fatal(err)
					}
					if len(p.Stations) != n {
						b.Fatalf("got %d stations", len(p.Stations))
					}
				}
				b.ReportMetric(float64(b.Elapsed().Nanoseconds())/float64(b.N)/float64(n), "ns/station")
			})
		}
	}
}
