package main

import (
	"bytes"
	"strings"
	"testing"

	"arcwright/internal/planner"
)

// TestPlanNoiseTextCrew checks the crew table of the plan text: its heading
// names every EU 2003/10/EC action and limit value, 80/85 dB(A) and
// 135/137 dB(C) peak, limit 87 dB(A) and 140 dB(C) peak (acoustics.md
// §7.1, CONFIRMED), and a position inside a zone says so in its status,
// not only "blocked".
func TestPlanNoiseTextCrew(t *testing.T) {
	p := &planner.Plan{Crew: []planner.CrewExposure{
		{Name: "desk", Point: "idle", AWeighted: 82, Peak: 110, Hours: 1, AllowedHours: 24, Status: planner.Warn},
		{Name: "door", Point: "idle", AWeighted: 90, Peak: 120, Hours: 1, AllowedHours: 2.5, Status: planner.Blocked, InZone: true},
	}}
	var b bytes.Buffer
	planNoiseText(&b, p)
	out := b.String()
	for _, want := range []string{"80/85 dB(A)", "135/137 dB(C) peak", "87 dB(A)", "140 dB(C) peak", "blocked: in a zone"} {
		if !strings.Contains(out, want) {
			t.Errorf("plan text: no %q in\n%s", want, out)
		}
	}
}
