package export_test

import (
	"bytes"
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/paulmach/orb"
	"github.com/paulmach/orb/geojson"
	"github.com/paulmach/orb/planar"

	"arcwright/internal/export"
	"arcwright/internal/layout"
	"arcwright/internal/planner"
	"os"
)

// coordTol is the largest difference, m, between a written coordinate and
// the value it stands for: half of the 0.1 mm rounding step, plus slack
// for the binary representation.
const coordTol = 0.5e-4 + 1e-9

func writeGeoJSON(t *testing.T, p *planner.Plan) *geojson.FeatureCollection {
	t.Helper()
	var b bytes.Buffer
	if err := export.GeoJSON(&b, p); err != nil {
		t.Fatalf("GeoJSON: %v", err)
	}
	fc, err := geojson.UnmarshalFeatureCollection(b.Bytes())
	if err != nil {
		t.Fatalf("decoding the output with orb/geojson: %v", err)
	}
	return fc
}

// byLayer groups features by their "layer" property.
func byLayer(t *testing.T, fc *geojson.FeatureCollection) map[string][]*geojson.Feature {
	t.Helper()
	m := map[string][]*geojson.Feature{}
	for i, f := range fc.Features {
		layer, ok := f.Properties["layer"].(string)
		if !ok {
			t.Fatalf("feature %d: got no layer property, want one", i)
		}
		m[layer] = append(m[layer], f)
	}
	return m
}

func TestGeoJSONLayers(t *testing.T) {
	p := fixturePlan(t)
	fc := writeGeoJSON(t, p)
	if got, _ := fc.ExtraMembers["coordinate_frame"].(string); !strings.HasPrefix(got, "LOCAL, NOT WGS 84: metres from the layout's datum") || fc.ExtraMembers["geographic"] != false {
		t.Errorf("coordinate_frame: got %v, geographic %v; want the local-frame statement, false", got, fc.ExtraMembers["geographic"])
	}
	if got := fc.ExtraMembers["polar_angle_convention"]; got != "from_inlet" {
		t.Errorf("polar_angle_convention: got %v, want from_inlet", got)
	}
	zones := 0
	for _, e := range []float64{p.Points[p.Governing].Velocity().Length, p.Points[p.GoverningHot].Hot().Length} {
		if e > 0 {
			zones++
		}
	}
	layers := byLayer(t, fc)
	for _, c := range []struct {
		layer string
		n     int
		geom  string
	}{
		{"boundary", 1, "Polygon"},
		{"obstacle", 2, "Polygon"},
		{"keep_out", 1, "Polygon"},
		{"collector", 1, "Point"},
		{"mark", 2, "Point"},
		{"nozzle", 1, "Point"},
		{"jet_axis", 1, "LineString"},
		{"zone", zones, "Polygon"},
		{"zone_margin", zones, "Polygon"},
		{"core", 1, "Polygon"},
		{"arc", 1, "LineString"},
		{"station", len(p.Stations), "Point"},
		{"stand_base", 4, "Point"}, // the three boom stands and the probe mast; not the flush microphone
	} {
		t.Run(c.layer, func(t *testing.T) {
			fs := layers[c.layer]
			if c.layer == "zone" {
				fs = freeZones(fs) // the bent and wall-jet zones: TestGeoJSONCarriedZones
			}
			if len(fs) != c.n {
				t.Fatalf("got %d features, want %d", len(fs), c.n)
			}
			for _, f := range fs {
				if got := f.Geometry.GeoJSONType(); got != c.geom {
					t.Errorf("geometry: got %s, want %s", got, c.geom)
				}
			}
		})
	}
	if zones != 2 {
		t.Errorf("the fixture's governing points have %d zones, want 2 (velocity and hot)", zones)
	}
}

// TestGeoJSONPolygons checks that every polygon ring is closed, with four
// or more positions, and counter-clockwise (RFC 7946 §3.1.6: "exterior
// rings are counterclockwise", CONFIRMED, quoted in
// http://www.rfc-editor.org/errata/eid5069), and that the zones are the
// envelope outlines mirrored about the axis.
func TestGeoJSONPolygons(t *testing.T) {
	p := fixturePlan(t)
	layers := byLayer(t, writeGeoJSON(t, p))
	for _, layer := range []string{"boundary", "obstacle", "keep_out", "zone"} {
		for _, f := range layers[layer] {
			ring := f.Geometry.(orb.Polygon)[0]
			if len(ring) < 4 {
				t.Errorf("%s %v: got %d positions, want at least 4", layer, f.Properties["name"], len(ring))
				continue
			}
			if ring[0] != ring[len(ring)-1] {
				t.Errorf("%s %v: ring not closed: first %v, last %v", layer, f.Properties["name"], ring[0], ring[len(ring)-1])
			}
			if ring.Orientation() != orb.CCW {
				t.Errorf("%s %v: got a clockwise ring, want counter-clockwise", layer, f.Properties["name"])
			}
		}
	}
	for _, f := range freeZones(layers["zone"]) {
		gov := &p.Points[p.Governing]
		env := gov.Velocity()
		if f.Properties["zone"] == "hot" {
			gov = &p.Points[p.GoverningHot]
			env = gov.Hot()
		}
		if got := f.Properties["point"]; got != gov.Name {
			t.Errorf("zone point: got %v, want %v", got, gov.Name)
		}
		// the jet runs along +X from the datum's X, 0: the zone spans the
		// envelope's length in X and is mirrored about Y = 0
		b := f.Geometry.Bound()
		ex := p.Request.Exit.Exit
		if got, want := b.Max[0]-ex.X, env.Length; math.Abs(got-want) > coordTol {
			t.Errorf("%v zone reach: got %v m, want %v m", f.Properties["zone"], got, want)
		}
		if math.Abs(b.Max[1]+b.Min[1]) > 1e-9 {
			t.Errorf("%v zone: got Y from %v to %v, want a zone symmetric about the axis", f.Properties["zone"], b.Min[1], b.Max[1])
		}
		if b.Max[1] > env.MaxRadius+coordTol || b.Max[1] < env.MaxRadius-env.Tolerance-coordTol {
			t.Errorf("%v zone half-width: got %v m, want the envelope's %v m (outline tolerance %v m)",
				f.Properties["zone"], b.Max[1], env.MaxRadius, env.Tolerance)
		}
	}
	// the camera stand is a disc of radius 0.15 m at (0.45, 2): a 64-gon
	// with its vertices on the circle (hand-computed)
	for _, f := range layers["obstacle"] {
		if f.Properties["name"] != "camera stand" {
			continue
		}
		ring := f.Geometry.(orb.Polygon)[0]
		if len(ring) != 65 {
			t.Errorf("camera stand: got %d positions, want 65 (64 sides, closed)", len(ring))
		}
		for _, q := range ring {
			if d := planar.Distance(q, orb.Point{0.45, 2}); math.Abs(d-0.15) > 2*coordTol {
				t.Errorf("camera stand vertex %v: got %v m from the centre, want 0.15 m", q, d)
			}
		}
	}
}

// TestGeoJSONArcAndAxis checks that the arc line runs from the first to
// the last station of the arc on the 3 m circle about the exit, in 1°
// pieces over the 60° from 90° to 150° (hand-computed), and that the axis
// reaches the end of the longest zone.
func TestGeoJSONArcAndAxis(t *testing.T) {
	p := fixturePlan(t)
	layers := byLayer(t, writeGeoJSON(t, p))
	arc := layers["arc"][0].Geometry.(orb.LineString)
	first, last := p.Stations[0].Mic, p.Stations[2].Mic
	if planar.Distance(arc[0], orb.Point{first.X, first.Y}) > coordTol*2 ||
		planar.Distance(arc[len(arc)-1], orb.Point{last.X, last.Y}) > coordTol*2 {
		t.Errorf("arc: got ends %v and %v, want far-1 and far-3", arc[0], arc[len(arc)-1])
	}
	if len(arc) != 61 {
		t.Errorf("arc: got %d positions, want 61 (60° in 1° pieces)", len(arc))
	}
	for _, q := range arc {
		if d := planar.Distance(q, orb.Point{0, 0}); math.Abs(d-3) > 2*coordTol {
			t.Errorf("arc vertex %v: got %v m from the centre, want 3 m", q, d)
		}
	}

	longest := 0.0
	for i := range p.Points {
		longest = max(longest, p.Points[i].Velocity().Length, p.Points[i].Hot().Length)
	}
	axis := layers["jet_axis"][0].Geometry.(orb.LineString)
	if len(axis) != 2 || axis[0] != (orb.Point{0, 0}) || math.Abs(axis[1][0]-longest) > coordTol || axis[1][1] != 0 {
		t.Errorf("jet axis: got %v, want (0, 0) to (%v, 0)", axis, longest)
	}
}

func TestGeoJSONStationProperties(t *testing.T) {
	p := fixturePlan(t)
	st := byLayer(t, writeGeoJSON(t, p))["station"]
	for i, f := range st {
		s := &p.Stations[i]
		var channel any = float64(s.Channel)
		if s.Kind == planner.Probes {
			channel = nil // a probe stand has no channel (issue 10 item 15)
		}
		for _, c := range []struct {
			key  string
			want any
		}{
			{"id", s.ID}, {"channel", channel}, {"array", s.Array},
			{"status", s.Status.String()}, {"z_m", math.Round(s.Mic.Z*1e4) / 1e4},
			{"polar_deg", math.Round(s.Polar*180/math.Pi*100) / 100},
		} {
			if got := f.Properties[c.key]; got != c.want {
				t.Errorf("%s %s: got %v, want %v", s.ID, c.key, got, c.want)
			}
		}
	}
}

func TestGeoJSONNotFinite(t *testing.T) {
	for _, c := range []struct {
		name   string
		change func(p *planner.Plan)
		want   string // in the message
	}{
		{"station", func(p *planner.Plan) { p.Stations[3].Mic.X = math.NaN() }, `station "ref-1"`},
		{"arc station", func(p *planner.Plan) { p.Stations[1].Mic.Y = math.Inf(1) }, `arc "far"`},
		{"stand base", func(p *planner.Plan) { p.Stations[4].Base[0] = math.NaN() }, `stand_base "rake-1"`},
		{"nozzle", func(p *planner.Plan) { p.Request.Exit.Exit.X = math.NaN() }, "nozzle"},
	} {
		t.Run(c.name, func(t *testing.T) {
			p := fixturePlan(t)
			c.change(p)
			err := export.GeoJSON(&bytes.Buffer{}, p)
			if !errors.Is(err, export.ErrNotFinite) {
				t.Fatalf("got error %v, want one wrapping ErrNotFinite", err)
			}
			if !strings.Contains(err.Error(), c.want) {
				t.Errorf("got error %q, want it to name %s", err, c.want)
			}
		})
	}
}

// TestGeoJSONNullProperty checks that a NaN property is null, not an error.
func TestGeoJSONNullProperty(t *testing.T) {
	p := fixturePlan(t)
	p.Stations[1].Polar = math.NaN()
	st := byLayer(t, writeGeoJSON(t, p))["station"]
	if got, ok := st[1].Properties["polar_deg"]; !ok || got != nil {
		t.Errorf("polar_deg: got %v (present %v), want null", got, ok)
	}
}

// TestGeoJSONCarriedZones: the zones the sheet draws besides the free
// ones, a bent zone of a buoyant point and the wall jets the floor, the
// ceiling and the walls carry on, are written to the zone layer with what
// carries them.
func TestGeoJSONCarriedZones(t *testing.T) {
	src, err := os.ReadFile("../../layouts/hard-wall-exhaust-room.yaml")
	if err != nil {
		t.Fatal(err)
	}
	req, _, err := layout.Decode("hard-wall-exhaust-room.yaml", src)
	if err != nil {
		t.Fatal(err)
	}
	p, err := planner.New(req)
	if err != nil {
		t.Fatal(err)
	}
	fc := writeGeoJSON(t, p)
	carried := map[string]bool{}
	for _, f := range byLayer(t, fc)["zone"] {
		if by, ok := f.Properties["carried_by"].(string); ok {
			carried[by] = true
		}
	}
	if len(p.Attached) > 0 && !carried["wall"] && !carried["floor"] && !carried["ceiling"] {
		t.Errorf("the plan has %d attached zones, the GeoJSON none: %v", len(p.Attached), carried)
	}
	if p.Points[p.Governing].Plume.Bent() != nil && !carried["bent by buoyancy"] {
		t.Errorf("the governing point bends, the GeoJSON has no bent zone: %v", carried)
	}
}

// freeZones keeps the free zones of the zone layer, without the bent and
// wall-jet zones (those say what carries them).
func freeZones(fs []*geojson.Feature) []*geojson.Feature {
	var out []*geojson.Feature
	for _, f := range fs {
		if _, carried := f.Properties["carried_by"]; !carried {
			out = append(out, f)
		}
	}
	return out
}

// TestGeoJSONCrewWorstStatus: a crew position's feature carries the worst
// status over the operating points, not the status of the loudest one (a
// quieter point whose zone reaches the position blocks it), with that
// point and its levels.
func TestGeoJSONCrewWorstStatus(t *testing.T) {
	p := fixturePlan(t)
	p.Crew = []planner.CrewExposure{
		{Name: "desk", Point: "loud", AWeighted: 95, Peak: 120, Hours: 1, AllowedHours: 2.5, Status: planner.Warn},
		{Name: "desk", Point: "bent", AWeighted: 80, Peak: 100, Hours: 1, AllowedHours: 24, Status: planner.Blocked, InZone: true},
		{Name: "desk", Point: "quiet", AWeighted: 70, Peak: 90, Hours: 1, AllowedHours: 24, Status: planner.OK},
	}
	crew := byLayer(t, writeGeoJSON(t, p))["crew"]
	if len(crew) != 1 {
		t.Fatalf("got %d crew features, want 1", len(crew))
	}
	if pr := crew[0].Properties; pr["status"] != "blocked" || pr["point"] != "bent" || pr["a_weighted_db"] != 80.0 {
		t.Errorf("got status %v for %v at %v dB(A), want blocked for bent at 80", pr["status"], pr["point"], pr["a_weighted_db"])
	}
}
