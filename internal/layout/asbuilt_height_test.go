package layout

import (
	"math"
	"strings"
	"testing"
)

// TestAsBuiltHeight: the station CSV writes a station's height twice (z_m
// and height_m); an edit of either is read, and an edit of one that leaves
// the other disagreeing is refused at its line, never silently dropped
// (issue 10 item 13: height_m edits were ignored).
func TestAsBuiltHeight(t *testing.T) {
	const head = "id,channel,x_m,y_m,z_m,height_m,reasons\n"
	for _, tt := range []struct {
		name, row string
		z         float64
		err       string
	}{
		{"both agree", "A-01,1,5,7,1.5000,1.5000,\n", 1.5, ""},
		{"height edited alone", "A-01,1,5,7,1.5000,1.6200,\n", 0, "built.csv:2: height: 1.620 m, but z is 1.500 m: both are the microphone's height above the floor; change both, or leave one empty"},
		{"z left empty", "A-01,1,5,7,,1.62,\n", 1.62, ""},
		{"height left empty", "A-01,1,5,7,1.62,,\n", 1.62, ""},
	} {
		t.Run(tt.name, func(t *testing.T) {
			got, err := DecodeAsBuilt("built.csv", []byte(head+tt.row), "mm", 4)
			if tt.err != "" {
				if err == nil || err.Error() != tt.err {
					t.Fatalf("got %v, want %s", err, tt.err)
				}
				return
			}
			if err != nil {
				t.Fatal(err)
			}
			if z := got["A-01"].Mic.Z; math.Abs(z-tt.z) > 1e-12 {
				t.Errorf("got z %g m, want %g", z, tt.z)
			}
		})
	}
}

// TestAsBuiltFeetColumns: a station CSV written for a layout in feet
// (x_ft …) reads back in feet: 10 ft = 3.048 m (hand-computed, 1 ft =
// 0.3048 m exactly).
func TestAsBuiltFeetColumns(t *testing.T) {
	csv := "id,channel,x_ft,y_ft,z_ft,base_x_ft,base_y_ft,height_ft,radius_ft,velocity_clearance_ft,reasons\nG-01,1,10,20,5,10,20,5,30,1,\n"
	got, err := DecodeAsBuilt("built.csv", []byte(csv), "mm", math.Inf(1))
	if err != nil {
		t.Fatal(err)
	}
	p := got["G-01"]
	checkF(t, "X", p.Mic.X, 3.048)
	checkF(t, "Z", p.Mic.Z, 1.524)
	if p.Base == nil {
		t.Fatal("got no base")
	}
	checkF(t, "base X", p.Base[0], 3.048)
}

// TestAsBuiltTemplateRows: a row with an ID and every measured cell empty
// is a station not measured: it gives no position (so the planner lists it
// as unmeasured), and a file of only such rows is no error; a row filled in
// part is still refused.
func TestAsBuiltTemplateRows(t *testing.T) {
	csv := "id,x,y,z,base_x,base_y\nA-01,,,,,\nA-02,5,7,1.5,,\n"
	got, err := DecodeAsBuilt("built.csv", []byte(csv), "m", 4)
	if err != nil {
		t.Fatal(err)
	}
	if _, ok := got["A-01"]; ok || len(got) != 1 {
		t.Errorf("got %v, want only A-02 (A-01 not measured)", got)
	}
	got, err = DecodeAsBuilt("built.csv", []byte("id,x,y,z\nA-01,,,\n"), "m", 4)
	if err != nil || got == nil || len(got) != 0 {
		t.Errorf("a template left empty: got %v, %v; want an empty set of positions", got, err)
	}
	if _, err := DecodeAsBuilt("built.csv", []byte("id,x,y,z\nA-01,5,,\n"), "m", 4); err == nil || !strings.Contains(err.Error(), "built.csv:2: y") {
		t.Errorf("a row filled in part: got %v, want an error at line 2, y", err)
	}
}
