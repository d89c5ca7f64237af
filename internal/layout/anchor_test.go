package layout

import (
	"math"
	"strings"
	"testing"
)

// TestAnchor decodes the optional geographic anchor (issue 10 item 16):
// without it the request has none; with it, the angles in degrees; a
// missing or out-of-range value is an error at its line and key.
func TestAnchor(t *testing.T) {
	base := string(Starter())
	req, _, err := Decode("starter.yaml", []byte(base))
	if err != nil || req.Anchor != nil {
		t.Fatalf("no anchor: got %v, %v; want nil, nil", req.Anchor, err)
	}
	for _, tt := range []struct {
		name, yaml, err string
	}{
		{"good", "anchor: {latitude: 52.0712, longitude: -1.0213 deg, bearing_of_x: 90 deg}\n", ""},
		{"missing bearing", "anchor:\n  latitude: 52\n  longitude: -1\n", "bearing_of_x: missing"},
		{"latitude too far north", "anchor: {latitude: 89.5, longitude: 3, bearing_of_x: 0}\n", ".latitude: 89.5° is out of range"},
		{"longitude a length", "anchor: {latitude: 10, longitude: 3 m, bearing_of_x: 0}\n", "anchor.longitude"},
	} {
		t.Run(tt.name, func(t *testing.T) {
			req, _, err := Decode("a.yaml", []byte(base+tt.yaml))
			if tt.err != "" {
				if err == nil || !strings.Contains(err.Error(), tt.err) || !strings.Contains(err.Error(), "a.yaml:") {
					t.Fatalf("got %v, want an error with a line and %q", err, tt.err)
				}
				return
			}
			if err != nil {
				t.Fatal(err)
			}
			a := req.Anchor
			if a == nil || math.Abs(a.Latitude*180/math.Pi-52.0712) > 1e-12 || math.Abs(a.Longitude*180/math.Pi+1.0213) > 1e-12 || math.Abs(a.BearingX-math.Pi/2) > 1e-12 {
				t.Errorf("got %+v, want 52.0712°, -1.0213°, 90°", a)
			}
		})
	}
}
