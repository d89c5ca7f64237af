package export_test

import (
	"bytes"
	"encoding/json"
	"math"
	"testing"

	"arcwright/internal/export"
	"arcwright/internal/planner"
)

func writeJSON(t *testing.T, p *planner.Plan) []byte {
	t.Helper()
	var b bytes.Buffer
	if err := export.JSON(&b, p); err != nil {
		t.Fatalf("JSON: %v", err)
	}
	return b.Bytes()
}

func TestJSONGolden(t *testing.T) {
	checkGolden(t, "plan.golden.json", writeJSON(t, fixturePlan(t)))
}

// decodeJSON returns the JSON output of p decoded into generic values.
func decodeJSON(t *testing.T, p *planner.Plan) map[string]any {
	t.Helper()
	var m map[string]any
	if err := json.Unmarshal(writeJSON(t, p), &m); err != nil {
		t.Fatal(err)
	}
	return m
}

// at walks a decoded document by keys (string) and indices (int).
func at(v any, path ...any) any {
	for _, k := range path {
		switch k := k.(type) {
		case string:
			m, _ := v.(map[string]any)
			v = m[k]
		case int:
			l, _ := v.([]any)
			if k >= len(l) {
				return nil
			}
			v = l[k]
		}
	}
	return v
}

// TestJSONValues checks values of the fixture. The arc station far-2 sits
// at 120° from the inlet (60° from the jet axis) on a 3 m arc about the
// exit: x = 3·cos 60° = 1.5 m, y = 3·sin 60° = 2.598076 m, and its pole
// 0.3 m further out at 3.3·(cos 60°, sin 60°) = (1.65, 2.857884) m
// (hand-computed).
func TestJSONValues(t *testing.T) {
	p := fixturePlan(t)
	m := decodeJSON(t, p)
	for _, c := range []struct {
		name string
		path []any
		want any
	}{
		{"convention", []any{"polar_angle_convention"}, "from_inlet"},
		{"source", []any{"source"}, "layouts/model-jet.yaml"},
		{"title", []any{"title"}, "Model jet far-field arc"},
		{"governing point", []any{"governing_point"}, p.Points[p.Governing].Name},
		{"counts ok", []any{"counts", "ok"}, 1.0},
		{"counts warn", []any{"counts", "warn"}, 3.0},
		{"counts blocked", []any{"counts", "blocked"}, 1.0},
		{"far-2 x", []any{"stations", 1, "x_m"}, 1.5},
		{"far-2 y", []any{"stations", 1, "y_m"}, 2.5981},
		{"far-2 z", []any{"stations", 1, "z_m"}, 1.5},
		{"far-2 base x", []any{"stations", 1, "base_x_m"}, 1.65},
		{"far-2 base y", []any{"stations", 1, "base_y_m"}, 2.8579},
		{"far-2 polar", []any{"stations", 1, "polar_deg"}, 120.0},
		{"far-2 nominal polar", []any{"stations", 1, "nominal_polar_deg"}, 120.0},
		{"far-2 radius", []any{"stations", 1, "radius_m"}, 3.0},
		{"far-2 jet x", []any{"stations", 1, "jet", "x_m"}, 1.5},
		{"far-2 jet r", []any{"stations", 1, "jet", "r_m"}, 2.5981},
		{"far-2 jet azimuth", []any{"stations", 1, "jet", "azimuth_deg"}, 0.0},
		{"far-2 stand", []any{"stations", 1, "stand"}, "boom tripod"},
		{"far-2 channel", []any{"stations", 1, "channel"}, 2.0},
		{"far-2 kind", []any{"stations", 1, "kind"}, "arc"},
		{"far-2 line of sight", []any{"stations", 1, "checks", "line_of_sight"}, true},
		{"far-1 line of sight 0.6", []any{"stations", 0, "checks", "line_of_sight"}, false},
		{"far-1 status", []any{"stations", 0, "status"}, "warn"},
		{"far-1 first reason", []any{"stations", 0, "reasons", 0}, `obstacle "camera stand" hides 40 % of the source region`},
		{"far-1 second reason", []any{"stations", 0, "reasons", 1}, "floor-reflection null inside the band"},
		{"ref-1 flush stand", []any{"stations", 3, "stand"}, nil},
		{"ref-1 ground null NaN", []any{"stations", 3, "checks", "ground_null_hz"}, nil},
		{"ref-1 aim", []any{"stations", 3, "aim"}, "grazing"},
		{"ref-1 nominal polar NaN", []any{"stations", 3, "nominal_polar_deg"}, nil},
		{"rake-1 status", []any{"stations", 4, "status"}, "blocked"},
		{"rake-1 missing far-field check", []any{"stations", 4, "checks", "far_field_ratio"}, nil},
		{"rake-1 missing sight check", []any{"stations", 4, "checks", "line_of_sight"}, nil},
		{"rake-1 channel", []any{"stations", 4, "channel"}, 0.0},
		{"far min clear polar", []any{"arrays", 0, "min_clear_polar_deg"}, 160.0},
		{"far interval hi", []any{"arrays", 0, "far_field_radius_interval_m", 1}, 5.4},
		{"far max radius", []any{"arrays", 0, "max_radius_m"}, 5.4},
		{"ref empty interval", []any{"arrays", 1, "far_field_radius_interval_m"}, nil},
		{"ref min clear polar NaN", []any{"arrays", 1, "min_clear_polar_deg"}, nil},
		{"ref max radius (not an arc)", []any{"arrays", 1, "max_radius_m"}, nil},
		{"ref kind", []any{"arrays", 1, "kind"}, "points"},
		{"rake blocked", []any{"arrays", 2, "blocked", 0}, p.Arrays[2].Blocked[0]},
		{"point capture", []any{"points", 0, "collector_capture"}, "ok"},
		{"point capture diameter", []any{"points", 0, "collector_plume_diameter_m"}, 2.1},
		{"absorption band", []any{"absorption", 0, "band"}, "1 kHz"},
		{"absorption centre", []any{"absorption", 0, "centre_hz"}, 1000.0},
	} {
		t.Run(c.name, func(t *testing.T) {
			if got := at(m, c.path...); got != c.want {
				t.Errorf("%v: got %v, want %v", c.path, got, c.want)
			}
		})
	}
}

// TestJSONPointRounding checks that point values are the plan's values
// rounded: lengths to 0.1 mm, others to 6 significant digits.
func TestJSONPointRounding(t *testing.T) {
	p := fixturePlan(t)
	m := decodeJSON(t, p)
	for i := range p.Points {
		pt := &p.Points[i]
		for _, c := range []struct {
			key  []any
			v    float64
			step float64 // largest rounding error
		}{
			{[]any{"potential_core_length_m"}, pt.CoreNominal, 0.5e-4},
			{[]any{"velocity_envelope_length_m"}, pt.Velocity().Length, 0.5e-4},
			{[]any{"hot_envelope_length_m"}, pt.Hot().Length, 0.5e-4},
			{[]any{"exit", "fully_expanded_diameter_m"}, pt.Exit.FullyExpandedDiameter, 0.5e-4},
			{[]any{"exit", "mach"}, pt.Exit.Mach, 0.5e-5 * pt.Exit.Mach},
			{[]any{"exit", "reynolds"}, pt.Exit.Reynolds, 0.5e-5 * pt.Exit.Reynolds},
			{[]any{"exit", "velocity_m_s"}, pt.Exit.Velocity, 0.5e-5 * pt.Exit.Velocity},
		} {
			got, ok := at(m, append([]any{"points", i}, c.key...)...).(float64)
			if !ok || math.Abs(got-c.v) > c.step*(1+1e-9) {
				t.Errorf("%s %v: got %v, want %v within %g", pt.Name, c.key, got, c.v, c.step)
			}
		}
	}
}

// TestJSONNonFinite puts NaN and ±Inf into every kind of field and checks
// that the output is valid JSON with null in their place.
func TestJSONNonFinite(t *testing.T) {
	p := fixturePlan(t)
	inf := math.Inf(1)
	s := &p.Stations[1]
	s.Mic.X, s.Radius, s.Polar, s.Base[1], s.Jet.Azimuth = math.NaN(), inf, -inf, math.NaN(), inf
	s.Checks[0].Value = -inf
	p.Arrays[0].FarField = [2]float64{math.NaN(), inf}
	p.Arrays[0].MinClearPolar = math.NaN()
	p.Points[0].CoreNominal = inf
	p.Points[0].Exit.Reynolds = math.NaN()
	p.Absorption[0].ArrayDB[0] = inf

	out := writeJSON(t, p)
	for _, bad := range []string{"NaN", "Inf"} {
		if bytes.Contains(out, []byte(bad)) {
			t.Errorf("output contains %q", bad)
		}
	}
	var m map[string]any
	if err := json.Unmarshal(out, &m); err != nil {
		t.Fatalf("output is not valid JSON: %v", err)
	}
	for _, path := range [][]any{
		{"stations", 1, "x_m"}, {"stations", 1, "acoustic_distance_m"}, {"stations", 1, "acoustic_polar_deg"},
		{"stations", 1, "base_y_m"}, {"stations", 1, "jet", "azimuth_deg"},
		{"stations", 1, "checks", "velocity_clearance_m"}, {"stations", 1, "check_details", 0, "value"},
		{"arrays", 0, "far_field_radius_interval_m", 0}, {"arrays", 0, "far_field_radius_interval_m", 1},
		{"arrays", 0, "min_clear_polar_deg"}, {"points", 0, "potential_core_length_m"},
		{"points", 0, "exit", "reynolds"}, {"absorption", 0, "arrays_db", 0},
	} {
		if v, ok := at(m, path[:len(path)-1]...).(map[string]any); ok {
			key := path[len(path)-1].(string)
			if got, present := v[key]; !present || got != nil {
				t.Errorf("%v: got %v (present %v), want null", path, got, present)
			}
			continue
		}
		if got := at(m, path...); got != nil {
			t.Errorf("%v: got %v, want null", path, got)
		}
	}
}

// TestJSONConvention checks that the convention is named as the plan has it.
func TestJSONConvention(t *testing.T) {
	for _, c := range []struct {
		conv planner.Convention
		want string
	}{{planner.FromInlet, "from_inlet"}, {planner.FromJetAxis, "from_jet_axis"}} {
		t.Run(c.want, func(t *testing.T) {
			p := fixturePlan(t)
			p.Request.Convention = c.conv
			if got := at(decodeJSON(t, p), "polar_angle_convention"); got != c.want {
				t.Errorf("got %v, want %v", got, c.want)
			}
		})
	}
}
