package sheet

import (
	"fmt"
	"math"
	"sort"
	"testing"
)

func TestHatchSegments(t *testing.T) {
	square := []Pt{{0, 0}, {10, 0}, {10, 10}, {0, 10}}
	hole := []Pt{{3, 3}, {7, 3}, {7, 7}, {3, 7}}
	tri := []Pt{{0, 0}, {12, 0}, {0, 6}}
	tests := []struct {
		name    string
		rings   [][]Pt
		deg     float64
		spacing float64
		area    float64 // mm²: the hatch's total length times the spacing approaches it
		tol     float64 // mm² (hand-computed bound: one spacing times the widest chord)
	}{
		{"square, horizontal", [][]Pt{square}, 0, 1, 100, 10},
		{"square, 45°", [][]Pt{square}, 45, 0.7, 100, 10},
		{"square, -60°", [][]Pt{square}, -60, 1.1, 100, 16},
		{"square with a hole", [][]Pt{square, hole}, 30, 0.5, 100 - 16, 8},
		{"triangle", [][]Pt{tri}, 90, 0.5, 36, 4},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			segs := hatchSegments(tt.rings, tt.deg, tt.spacing)
			total := 0.0
			want := Pt{math.Cos(tt.deg * math.Pi / 180), -math.Sin(tt.deg * math.Pi / 180)} // y down on the page
			for _, s := range segs {
				d := sub(s[1], s[0])
				l := length(d)
				total += l
				if c := math.Abs(d.X*want.Y - d.Y*want.X); c > 1e-9*l+1e-9 {
					t.Fatalf("segment %v is not along %g°", s, tt.deg)
				}
				mid := lerp(s[0], s[1], 0.5)
				if len(tt.rings) > 1 && mid.X > 3 && mid.X < 7 && mid.Y > 3 && mid.Y < 7 {
					t.Fatalf("segment %v crosses the hole", s)
				}
			}
			if got := total * tt.spacing; math.Abs(got-tt.area) > tt.tol {
				t.Errorf("got hatch length × spacing %.2f mm², want %.2f ± %.2f", got, tt.area, tt.tol)
			}
		})
	}
	if s := hatchSegments([][]Pt{square}, 0, 0); s != nil {
		t.Errorf("got %d segments at spacing 0, want none", len(s))
	}
}

// TestHatchesDistinct: every kind of area has its own hatch angles or fill,
// not only its own colour or outline, so that a black-and-white print tells
// them apart (issue 9 item 6: the velocity zone, the keep-outs and the
// wedge treatment shared one hatch).
func TestHatchesDistinct(t *testing.T) {
	areas := []Style{StyleVelocity, StyleHot, StyleKeepOut, StyleTreatment, StyleObstacle}
	sig := func(s Style) string {
		d, ok := s.Def()
		if !ok {
			t.Fatalf("style %s is not defined", s)
		}
		var angles []float64
		for _, h := range d.Hatches {
			a := math.Mod(h.Angle+180, 180)
			angles = append(angles, a)
		}
		sort.Float64s(angles)
		return fmt.Sprint(angles, d.Fill != nil)
	}
	seen := map[string]Style{}
	for _, s := range areas {
		k := sig(s)
		if o, ok := seen[k]; ok {
			t.Errorf("%s and %s share the hatch %s", s, o, k)
		}
		seen[k] = s
	}
}
