package layout

import (
	"testing"

	"arcwright/internal/planner"
)

// TestStarterPlansClean checks that the starter that `arcwright init`
// writes plans with every station ok: a newcomer's first plan shows no
// warning caused by the starter's own layout (issue 10, item 14: it gave
// 13, two of its own stands too close).
func TestStarterPlansClean(t *testing.T) {
	req, warns, err := Decode("starter.yaml", Starter())
	if err != nil || len(warns) > 0 {
		t.Fatalf("Decode: %v, warnings %v", err, warns)
	}
	p, err := planner.New(req)
	if err != nil {
		t.Fatal(err)
	}
	if p.Warn != 0 || p.Blocked != 0 {
		for _, s := range p.Stations {
			if s.Status != planner.OK {
				t.Errorf("%s: %s: %v", s.ID, s.Status, s.Reasons)
			}
		}
	}
}
