package planner

import (
	"testing"

	"arcwright/internal/jet"
)

// TestPlanImpingements: the plan lists the contacts its warnings give in
// words, with a place to mark them: the plate of the obstacle test is
// struck on the axis 0.6–1 m downstream of the exit (issue 10 item 11).
func TestPlanImpingements(t *testing.T) {
	p := mustPlan(t, plate())
	found := 0
	for _, im := range p.Impingements {
		if im.Surface != SurfaceObstacle || im.Obstacle != "plate" || im.Zone != jet.VelocityZone {
			continue
		}
		found++
		if im.X < 0.6 || im.X > 1 || im.At[0] < 3.6 || im.At[0] > 4 || im.At[1] != 4.5 {
			t.Errorf("%s: got x %.3f m at %v, want 0.6–1 m on the axis (3.6–4, 4.5)", im.Point, im.X, im.At)
		}
	}
	if found != len(p.Points) {
		t.Errorf("got %d velocity-zone contacts with the plate, want one per point (%d)", found, len(p.Points))
	}
}
