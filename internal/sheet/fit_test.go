package sheet_test

import (
	"errors"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"arcwright/internal/sheet"
)

// TestScaleErrorReads: the error for a plan that does not fit the paper
// at the scale asked reports the stations' and nozzle's own extents (never
// more than the whole plan's) and gives its two ways out as two clauses.
// The hard-wall demo asks for 1:25, which A4 cannot hold.
func TestScaleErrorReads(t *testing.T) {
	p := demoPlan(t, "../../layouts/hard-wall-exhaust-room.yaml")
	_, err := sheet.Build(p, sheet.Options{Paper: "A4"})
	if !errors.Is(err, sheet.ErrScale) {
		t.Fatalf("got %v, want ErrScale", err)
	}
	msg := err.Error()
	for _, want := range []string{"1:25", "1:50 fits on A4; or use A3, which holds it at 1:25"} {
		if !strings.Contains(msg, want) {
			t.Errorf("got %q, want it to contain %q", msg, want)
		}
	}
	if strings.Contains(msg, " or A3 paper") {
		t.Errorf("got %q: the two suggestions run together", msg)
	}
	m := regexp.MustCompile(`the plan spans ([0-9.]+) × ([0-9.]+) m, its stations and nozzle alone ([0-9.]+) × ([0-9.]+) m`).FindStringSubmatch(msg)
	if m == nil {
		t.Fatalf("got %q, want the plan's and the stations' extents", msg)
	}
	var v [4]float64
	for i := range v {
		v[i], _ = strconv.ParseFloat(m[i+1], 64)
	}
	if v[2] > v[0] || v[3] > v[1] {
		t.Errorf("got %q: the stations and nozzle span more than the whole plan", msg)
	}
}
