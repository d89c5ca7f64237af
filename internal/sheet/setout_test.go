package sheet

import (
	"testing"

	"github.com/paulmach/orb"

	"arcwright/internal/units"
)

// TestBaseFix: every base gets a fix a technician can set: two tapes that
// cross at 30° or more (two tapes meeting at a shallow angle fix a point
// poorly along their bisector: common practice for trilateration), or,
// where no pair of marks does, a square offset from the line through two
// marks, or the datum's X and Y (review: tape 2 was "-" with no reason for
// the pad's G-13, G-14 and the hard-walled room's A-02). Distances
// hand-computed.
func TestBaseFix(t *testing.T) {
	pr := printer{sys: units.Metric}
	tests := []struct {
		name       string
		refs       []floorRef
		p          orb.Point
		tape1, tp2 string
	}{
		{"square to two marks", []floorRef{{"A", orb.Point{0, 0}}, {"B", orb.Point{10, 0}}}, orb.Point{0, 5},
			"A: 5.000", "B: 11.180"}, // hypot(10, 5)
		{"nearest pair too shallow, a third mark crosses", []floorRef{{"A", orb.Point{0, 0}}, {"B", orb.Point{-3, 0.2}}, {"C", orb.Point{5, 8}}}, orb.Point{5, 0},
			"A: 5.000", "C: 8.000"}, // A and B lie nearly in line with the base (2°)
		{"in line with the only two marks: offset from their line", []floorRef{{"E0", orb.Point{0, 0}}, {"P1", orb.Point{20, 0}}}, orb.Point{30, 0.5},
			"P1: 10.012", "P1 away from E0: 10.000, offset 0.500 left"}, // hypot(10, 0.5); 10 on from P1, 0.5 to the left walking away from E0
		{"only the datum: its X and Y", []floorRef{{"datum", orb.Point{0, 0}}}, orb.Point{3, 4},
			"datum: 5.000", "square offset: X and Y from the datum"},
		{"on a mark", []floorRef{{"A", orb.Point{2, 2}}, {"B", orb.Point{9, 0}}}, orb.Point{2, 2},
			"at mark A", "on the mark: no tape"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			got := baseFix(pr, tt.refs, tt.p)
			if got[0] != tt.tape1 || got[1] != tt.tp2 {
				t.Errorf("got %q, %q; want %q, %q", got[0], got[1], tt.tape1, tt.tp2)
			}
		})
	}
}
