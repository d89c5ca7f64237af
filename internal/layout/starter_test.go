package layout

import (
	"strconv"
	"strings"
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

// TestStarterStatesRanges checks that the starter's comments state the
// plausible ranges that Decode enforces (issue 10, item 1).
func TestStarterStatesRanges(t *testing.T) {
	text := string(Starter())
	for _, want := range []string{
		"above 1, up to " + short(MaxNPR),
		short(MinTotalTemperature) + " K to " + short(MaxTotalTemperature) + " K",
		short(MinTemperatureRatio) + " to " + short(MaxTemperatureRatio),
		short(MinGasConstant) + " to " + short(MaxGasConstant),
		"1 mm to " + short(MaxNozzleSize) + " m",
		"up to " + short(MaxVelocityLimit) + " m/s",
		"most " + strconv.Itoa(MaxNameLength) + " characters",
	} {
		if !strings.Contains(text, want) {
			t.Errorf("the starter does not say %q", want)
		}
	}
}
