package layout

import (
	"fmt"
	"strings"
	"testing"
)

// TestStationOutsideTheCell checks that a single station placed outside
// the boundary is an error at its line, and that an angle range that does
// not end on a whole step is warned (found in review).
func TestStationOutsideTheCell(t *testing.T) {
	base := string(Starter())
	bad := strings.Replace(base, "at: [6.5 m, 6.3 m, 1.8 m]", "at: [20.0 m, 7.5 m, 1.8 m]", 1)
	// the line of the station in the starter, wherever the starter puts it
	line := strings.Count(base[:strings.Index(base, "at: [6.5 m, 6.3 m, 1.8 m]")], "\n") + 1
	_, _, err := Decode("x.yaml", []byte(bad))
	if want := fmt.Sprintf("x.yaml:%d:", line); err == nil || !strings.Contains(err.Error(), want) || !strings.Contains(err.Error(), "outside the cell's boundary") {
		t.Errorf("got %v, want an error at line %d saying the station is outside", err, line)
	}
	short := strings.Replace(base, "polar: {from: 30 deg, to: 120 deg, step: 10 deg}", "polar: {from: 30 deg, to: 155 deg, step: 10 deg}", 1)
	_, warnings, err := Decode("x.yaml", []byte(short))
	if err != nil {
		t.Fatal(err)
	}
	found := false
	for _, w := range warnings {
		found = found || strings.Contains(w.String(), "stop at 150.0°, short of 155.0°")
	}
	if !found {
		t.Errorf("no warning about the range stopping short: %v", warnings)
	}
}
