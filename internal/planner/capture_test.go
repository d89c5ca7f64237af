package planner_test

import (
	"os"
	"testing"

	"arcwright/internal/layout"
	"arcwright/internal/planner"
)

// TestCaptureOnTheConservativePlume is the reported case: in the
// hard-walled-room demo the nominal 5 % edge is 1.25 m at the 1.40 m hood,
// "ok"; carried on the conservative field it is about 1.5 m, which spills
// (the independent review's reconstruction). A capture of "ok" would also
// silence the floor, wall and ceiling warnings downstream of the hood.
func TestCaptureOnTheConservativePlume(t *testing.T) {
	src, err := os.ReadFile("../../layouts/hard-wall-exhaust-room.yaml")
	if err != nil {
		t.Fatal(err)
	}
	req, _, err := layout.Decode("hard-wall-exhaust-room.yaml", src)
	if err != nil {
		t.Fatal(err)
	}
	plan, err := planner.New(req)
	if err != nil {
		t.Fatal(err)
	}
	worst := planner.OK
	widest := 0.0
	for _, p := range plan.Points {
		widest = max(widest, p.CaptureDiameter)
		if p.Capture > worst {
			worst = p.Capture
		}
	}
	if worst == planner.OK {
		for _, p := range plan.Points {
			t.Logf("%s: %s %s (%.3f m)", p.Name, p.Capture, p.CaptureReason, p.CaptureDiameter)
		}
		t.Error("every point's plume is said to fit the 1.40 m hood, want a spill warning for the widest")
	}
	// about 1.5 m on the conservative straight field (the review's
	// reconstruction, DERIVED), a little more on the bent plume of these
	// buoyant points (about 1.8 m); 1.25 m was the nominal edge
	if widest < 1.4 || widest > 2.0 {
		t.Errorf("widest plume at the hood %.3f m, want 1.4–2.0 m", widest)
	}
}
