package export

import (
	"bytes"
	"encoding/csv"
	"encoding/json"
	"math"
	"strings"
	"testing"

	"arcwright/internal/jet"
)

func testPlume(t *testing.T) *jet.Plume {
	t.Helper()
	p, err := jet.NewPlume(jet.Nozzle{Kind: jet.Convergent, Diameter: 0.0508},
		jet.Condition{Primary: jet.Stream{NPR: 1.8, TotalTemperature: 800}, Ambient: jet.StandardAmbient()}, jet.DefaultLimits())
	if err != nil {
		t.Fatal(err)
	}
	return p
}

// TestPlumeJSONContract checks every key of the plume command's JSON
// contract and its types, and that the numbers are the model's.
func TestPlumeJSONContract(t *testing.T) {
	p := testPlume(t)
	var b bytes.Buffer
	xs := []float64{0, 0.1, 0.5, 1}
	if err := PlumeJSON(&b, p, xs); err != nil {
		t.Fatal(err)
	}
	var doc map[string]json.RawMessage
	if err := json.Unmarshal(b.Bytes(), &doc); err != nil {
		t.Fatal(err)
	}
	obj := func(raw json.RawMessage) map[string]any {
		var m map[string]any
		if err := json.Unmarshal(raw, &m); err != nil {
			t.Fatalf("%s: %v", raw, err)
		}
		return m
	}
	exit := obj(doc["exit"])
	for _, k := range []string{"mach", "velocity_m_s", "static_temperature_k", "density_kg_m3", "fully_expanded_diameter_m", "acoustic_mach", "reynolds", "convective_mach"} {
		if _, ok := exit[k].(float64); !ok {
			t.Errorf("exit.%s: got %v, want a number", k, exit[k])
		}
	}
	if got := exit["velocity_m_s"].(float64); math.Abs(got-p.Exit().Velocity) > 1e-3 {
		t.Errorf("velocity %g, want %g", got, p.Exit().Velocity)
	}
	var core float64
	if err := json.Unmarshal(doc["potential_core_length_m"], &core); err != nil || math.Abs(core-p.CoreLength(jet.Nominal)) > 1e-4 {
		t.Errorf("core: got %s, want %g", doc["potential_core_length_m"], p.CoreLength(jet.Nominal))
	}
	var prof []map[string]any
	json.Unmarshal(doc["profile"], &prof)
	if len(prof) != len(xs) {
		t.Fatalf("got %d profile rows, want %d", len(prof), len(xs))
	}
	for _, k := range []string{"x_m", "centerline_velocity_m_s", "half_velocity_radius_m", "centerline_temperature_k"} {
		if _, ok := prof[2][k].(float64); !ok {
			t.Errorf("profile.%s: got %v", k, prof[2][k])
		}
	}
	for _, name := range []string{"velocity_envelope", "hot_envelope", "nominal_velocity_envelope", "nominal_hot_envelope"} {
		e := obj(doc[name])
		limKey := "limit_m_s"
		if strings.Contains(name, "hot") {
			limKey = "limit_k"
		}
		for _, k := range []string{limKey, "length_m", "max_radius_m"} {
			if _, ok := e[k].(float64); !ok {
				t.Errorf("%s.%s: got %v, want a number", name, k, e[k])
			}
		}
		pts, ok := e["points"].([]any)
		if !ok || len(pts) < 3 {
			t.Errorf("%s.points: got %v", name, e["points"])
		}
	}
	var warnings []string
	if err := json.Unmarshal(doc["warnings"], &warnings); err != nil {
		t.Errorf("warnings: %v", err)
	}
}

// TestPlumeCSV checks the profile CSV's shape.
func TestPlumeCSV(t *testing.T) {
	var b bytes.Buffer
	if err := PlumeCSV(&b, testPlume(t), []float64{0, 0.2, 0.4}); err != nil {
		t.Fatal(err)
	}
	rows, err := csv.NewReader(&b).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	if len(rows) != 4 || len(rows[0]) != 8 || rows[0][0] != "x_m" {
		t.Errorf("got %d rows of %d columns", len(rows), len(rows[0]))
	}
}
