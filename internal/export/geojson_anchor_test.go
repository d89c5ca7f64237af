package export_test

import (
	"math"
	"testing"

	"github.com/paulmach/orb"

	"arcwright/internal/geometry"
)

// TestGeoJSONAnchor: with an anchor the file holds RFC 7946 WGS 84
// longitudes and latitudes near the anchor and says so; each station is
// where the anchor's conversion puts it (issue 10 item 16: local metres in
// a WGS 84 file put the room at 0° N 0° E).
func TestGeoJSONAnchor(t *testing.T) {
	p := fixturePlan(t)
	a := geometry.Anchor{Latitude: 52.0712 * math.Pi / 180, Longitude: -1.0213 * math.Pi / 180, BearingX: 1.2}
	p.Request.Anchor = &a
	fc := writeGeoJSON(t, p)
	if fc.ExtraMembers["geographic"] != true {
		t.Errorf("geographic: got %v, want true", fc.ExtraMembers["geographic"])
	}
	if got, _ := fc.ExtraMembers["coordinate_frame"].(string); got == "" || got[:6] != "WGS 84" {
		t.Errorf("coordinate_frame: got %q, want the WGS 84 statement", got)
	}
	for _, f := range fc.Features {
		b := f.Geometry.Bound()
		if b.Min[0] > b.Max[0] {
			continue // an empty geometry (a noise contour with no line)
		}
		// every feature lies within 0.01° of the anchor (under 1.1 km)
		if math.Abs(b.Min[0]+1.0213) > 0.01 || math.Abs(b.Max[1]-52.0712) > 0.01 {
			t.Fatalf("%v %v: bound %v is not near the anchor", f.Properties["layer"], f.Properties["id"], b)
		}
		if poly, ok := f.Geometry.(orb.Polygon); ok && poly[0].Orientation() != orb.CCW {
			t.Errorf("%v: exterior ring not counter-clockwise (RFC 7946 §3.1.6)", f.Properties["layer"])
		}
	}
	for _, f := range byLayer(t, fc)["station"] {
		id := f.Properties["id"]
		for _, s := range p.Stations {
			if s.ID != id {
				continue
			}
			lon, lat := a.ToWGS84(orb.Point{s.Mic.X, s.Mic.Y})
			got := f.Geometry.(orb.Point)
			if math.Abs(got[0]-lon) > 1e-9 || math.Abs(got[1]-lat) > 1e-9 {
				t.Errorf("station %v: got %v, want (%.9f, %.9f)", id, got, lon, lat)
			}
		}
	}
}

// TestGeoJSONZonesCut: the zones, their margins and the core are cut at
// the boundary where the sheet stops drawing them (issue 10 item 16): with
// the downstream wall moved to half the velocity zone's length, the zone
// ends at the wall, says "cut", and keeps its area inside the room.
func TestGeoJSONZonesCut(t *testing.T) {
	p := fixturePlan(t)
	vel := p.Points[p.Governing].Velocity()
	wall := vel.Length / 2
	p.Request.Cell.Boundary = orb.Ring{{-3, -6}, {wall, -6}, {wall, 6}, {-3, 6}, {-3, -6}}
	layers := byLayer(t, writeGeoJSON(t, p))
	found := false
	for _, layer := range []string{"zone", "zone_margin"} {
		for _, f := range layers[layer] {
			b := f.Geometry.Bound()
			if b.Max[0] > wall+1e-4 {
				t.Errorf("%s %v: reaches x = %v m, past the wall at %v m", layer, f.Properties["zone"], b.Max[0], wall)
			}
			if layer == "zone" && f.Properties["zone"] == "velocity" {
				found = true
				if f.Properties["cut"] != true || math.Abs(b.Max[0]-wall) > 1e-4 {
					t.Errorf("velocity zone: cut %v, ends at %v m; want cut at the wall, %v m", f.Properties["cut"], b.Max[0], wall)
				}
			}
		}
	}
	if !found {
		t.Fatal("no velocity zone")
	}
	if len(layers["zone_margin"]) == 0 || len(layers["core"]) != 1 {
		t.Errorf("got %d margin bands and %d cores, want the margins and the core the sheet draws", len(layers["zone_margin"]), len(layers["core"]))
	}
}
