package export_test

import (
	"bytes"
	"encoding/csv"
	"strings"
	"testing"

	"arcwright/internal/export"
)

// TestAsBuiltTemplate: the as-built form carries only the measured columns
// and one row per station with nothing measured filled in (issue 10 item
// 13: the station CSV, edited into an as-built file, carried 22 columns of
// which four were read).
func TestAsBuiltTemplate(t *testing.T) {
	p := fixturePlan(t)
	var b bytes.Buffer
	if err := export.AsBuiltTemplate(&b, p); err != nil {
		t.Fatal(err)
	}
	recs, err := csv.NewReader(&b).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	if got, want := strings.Join(recs[0], ","), "id,x,y,z,base_x,base_y"; got != want {
		t.Errorf("header: got %s, want %s", got, want)
	}
	if len(recs) != len(p.Stations)+1 {
		t.Fatalf("got %d rows, want %d", len(recs)-1, len(p.Stations))
	}
	for i, r := range recs[1:] {
		if r[0] != p.Stations[i].ID || strings.Join(r[1:], "") != "" {
			t.Errorf("row %d: got %q, want %s and empty cells", i+1, r, p.Stations[i].ID)
		}
	}
}
