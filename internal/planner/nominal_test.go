package planner

import (
	"math"
	"testing"
)

// TestNominalRadius: an arc centred on the axis 1.5 m up with its
// microphones on the floor is asked for at 2 m in plan (the nominal
// radius); each microphone is sqrt(2² + 1.5²) = 2.5 m from the centre as
// placed (hand-computed). Lines have no nominal radius.
func TestNominalRadius(t *testing.T) {
	req := room(10,
		Array{Name: "A", Kind: Arc, Stand: "", Radius: 2, From: deg(60), To: deg(120), Step: deg(30), Height: 0, HasHeight: true},
		Array{Name: "L", Kind: Line, Stand: "post", Offset: 1, XFrom: 1, XTo: 2, Spacing: 1})
	p := mustPlan(t, req)
	for i := range p.Stations {
		s := &p.Stations[i]
		got := p.NominalRadius(s)
		switch s.Array {
		case "A":
			if math.Abs(got-2) > 1e-9 {
				t.Errorf("%s: got nominal radius %g m, want 2", s.ID, got)
			}
			if math.Abs(s.Radius-2.5) > 1e-9 {
				t.Errorf("%s: got as-placed radius %g m, want 2.5 (hand-computed)", s.ID, s.Radius)
			}
		case "L":
			if !math.IsNaN(got) {
				t.Errorf("%s: got nominal radius %g m for a line, want NaN", s.ID, got)
			}
		}
	}
}
