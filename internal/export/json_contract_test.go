package export_test

import (
	"encoding/json"
	"strings"
	"testing"
)

// The contract of the JSON document: every key the data system reads,
// mirrored as raw values so that both presence and JSON type are checked.
type contractDoc struct {
	Convention     json.RawMessage `json:"polar_angle_convention"`
	Source         json.RawMessage `json:"source"`
	Title          json.RawMessage `json:"title"`
	GoverningPoint json.RawMessage `json:"governing_point"`
	Counts         struct {
		OK, Warn, Blocked json.RawMessage
	} `json:"counts"`
	Stations []contractStation `json:"stations"`
	Arrays   []struct {
		Name          json.RawMessage `json:"name"`
		Kind          json.RawMessage `json:"kind"`
		Radius        json.RawMessage `json:"radius_m"`
		MinClearPolar json.RawMessage `json:"min_clear_polar_deg"`
		FarField      json.RawMessage `json:"far_field_radius_interval_m"`
		AutoRadius    json.RawMessage `json:"auto_radius"`
		MaxRadius     json.RawMessage `json:"max_radius_m"`
		FarFieldNote  json.RawMessage `json:"far_field_note"`
		Blocked       json.RawMessage `json:"blocked"`
		Notes         json.RawMessage `json:"notes"`
		Stations      json.RawMessage `json:"stations"`
	} `json:"arrays"`
	Points []struct {
		Name            json.RawMessage `json:"name"`
		Core            json.RawMessage `json:"potential_core_length_m"`
		VelocityLength  json.RawMessage `json:"velocity_envelope_length_m"`
		HotLength       json.RawMessage `json:"hot_envelope_length_m"`
		Capture         json.RawMessage `json:"collector_capture"`
		CaptureReason   json.RawMessage `json:"capture_reason"`
		CaptureDiameter json.RawMessage `json:"collector_plume_diameter_m"`
		Flags           json.RawMessage `json:"flags"`
		Exit            struct {
			Mach, Reynolds        json.RawMessage
			Velocity              json.RawMessage `json:"velocity_m_s"`
			StaticTemperature     json.RawMessage `json:"static_temperature_k"`
			FullyExpandedDiameter json.RawMessage `json:"fully_expanded_diameter_m"`
		} `json:"exit"`
	} `json:"points"`
}

type contractStation struct {
	ID             json.RawMessage `json:"id"`
	Array          json.RawMessage `json:"array"`
	Channel        json.RawMessage `json:"channel"`
	X              json.RawMessage `json:"x_m"`
	Y              json.RawMessage `json:"y_m"`
	Z              json.RawMessage `json:"z_m"`
	Radius         json.RawMessage `json:"radius_m"`
	Polar          json.RawMessage `json:"polar_deg"`
	Distance       json.RawMessage `json:"acoustic_distance_m"`
	SourcePolar    json.RawMessage `json:"acoustic_polar_deg"`
	Status         json.RawMessage `json:"status"`
	GoverningPoint json.RawMessage `json:"governing_point"`
	Checks         struct {
		Velocity    json.RawMessage `json:"velocity_clearance_m"`
		Hot         json.RawMessage `json:"hot_clearance_m"`
		Wall        json.RawMessage `json:"wall_clearance_m"`
		LineOfSight json.RawMessage `json:"line_of_sight"`
		FarField    json.RawMessage `json:"far_field_ratio"`
		GroundNull  json.RawMessage `json:"ground_null_hz"`
		Absorption  json.RawMessage `json:"absorption_db"`
	} `json:"checks"`
	Reasons json.RawMessage `json:"reasons"`
	Kind    json.RawMessage `json:"kind"`
	BaseX   json.RawMessage `json:"base_x_m"`
	BaseY   json.RawMessage `json:"base_y_m"`
	Height  json.RawMessage `json:"height_m"`
	Stand   json.RawMessage `json:"stand"`
	Aim     json.RawMessage `json:"aim"`
	Jet     struct {
		X       json.RawMessage `json:"x_m"`
		R       json.RawMessage `json:"r_m"`
		Azimuth json.RawMessage `json:"azimuth_deg"`
	} `json:"jet"`
	CheckDetails []struct {
		Name, Value, Unit, Verdict, Point, Reason json.RawMessage
	} `json:"check_details"`
}

// kindOf returns the JSON type of a raw value: "missing", "null", "bool",
// "number", "string", "array" or "object".
func kindOf(r json.RawMessage) string {
	if len(r) == 0 {
		return "missing"
	}
	switch r[0] {
	case 'n':
		return "null"
	case 't', 'f':
		return "bool"
	case '"':
		return "string"
	case '[':
		return "array"
	case '{':
		return "object"
	}
	return "number"
}

// wantKind fails unless r has one of the JSON types in kinds ("a|b").
func wantKind(t *testing.T, what string, r json.RawMessage, kinds string) {
	t.Helper()
	k := kindOf(r)
	for _, w := range strings.Split(kinds, "|") {
		if k == w {
			return
		}
	}
	t.Errorf("%s: got %s (%s), want %s", what, k, r, kinds)
}

func TestJSONContract(t *testing.T) {
	p := fixturePlan(t)
	var d contractDoc
	// untagged fields (counts, check_details, exit.mach) match their keys
	// case-insensitively, as encoding/json does
	if err := json.Unmarshal(writeJSON(t, p), &d); err != nil {
		t.Fatal(err)
	}
	wantKind(t, "polar_angle_convention", d.Convention, "string")
	wantKind(t, "source", d.Source, "string")
	wantKind(t, "title", d.Title, "string")
	wantKind(t, "governing_point", d.GoverningPoint, "string")
	wantKind(t, "counts.ok", d.Counts.OK, "number")
	wantKind(t, "counts.warn", d.Counts.Warn, "number")
	wantKind(t, "counts.blocked", d.Counts.Blocked, "number")
	if len(d.Stations) != len(p.Stations) || len(d.Arrays) != len(p.Arrays) || len(d.Points) != len(p.Points) {
		t.Fatalf("got %d stations, %d arrays, %d points, want %d, %d, %d",
			len(d.Stations), len(d.Arrays), len(d.Points), len(p.Stations), len(p.Arrays), len(p.Points))
	}
	for _, s := range d.Stations {
		id := string(s.ID)
		for _, f := range []struct {
			name  string
			raw   json.RawMessage
			kinds string
		}{
			{"id", s.ID, "string"}, {"array", s.Array, "string"}, {"channel", s.Channel, "number"},
			{"x_m", s.X, "number"}, {"y_m", s.Y, "number"}, {"z_m", s.Z, "number"},
			{"radius_m", s.Radius, "number|null"}, {"polar_deg", s.Polar, "number"},
			{"acoustic_distance_m", s.Distance, "number"}, {"acoustic_polar_deg", s.SourcePolar, "number"},
			{"status", s.Status, "string"}, {"governing_point", s.GoverningPoint, "string"},
			{"checks.velocity_clearance_m", s.Checks.Velocity, "number"},
			{"checks.hot_clearance_m", s.Checks.Hot, "number"},
			{"checks.wall_clearance_m", s.Checks.Wall, "number"},
			{"checks.line_of_sight", s.Checks.LineOfSight, "bool|null"},
			{"checks.far_field_ratio", s.Checks.FarField, "number|null"},
			{"checks.ground_null_hz", s.Checks.GroundNull, "number|null"},
			{"checks.absorption_db", s.Checks.Absorption, "number|null"},
			{"reasons", s.Reasons, "array"}, {"kind", s.Kind, "string"},
			{"base_x_m", s.BaseX, "number"}, {"base_y_m", s.BaseY, "number"}, {"height_m", s.Height, "number"},
			{"stand", s.Stand, "string|null"}, {"aim", s.Aim, "string"},
			{"jet.x_m", s.Jet.X, "number"}, {"jet.r_m", s.Jet.R, "number"}, {"jet.azimuth_deg", s.Jet.Azimuth, "number"},
		} {
			wantKind(t, id+" "+f.name, f.raw, f.kinds)
		}
		if len(s.CheckDetails) == 0 {
			t.Errorf("%s check_details: got none, want every check", id)
		}
		for _, c := range s.CheckDetails {
			wantKind(t, id+" check name", c.Name, "string")
			wantKind(t, id+" check value", c.Value, "number|null")
			wantKind(t, id+" check unit", c.Unit, "string")
			wantKind(t, id+" check verdict", c.Verdict, "string")
			wantKind(t, id+" check point", c.Point, "string")
			wantKind(t, id+" check reason", c.Reason, "string")
		}
	}
	for _, a := range d.Arrays {
		id := string(a.Name)
		wantKind(t, id+" name", a.Name, "string")
		wantKind(t, id+" kind", a.Kind, "string")
		wantKind(t, id+" radius_m", a.Radius, "number")
		wantKind(t, id+" min_clear_polar_deg", a.MinClearPolar, "number|null")
		wantKind(t, id+" far_field_radius_interval_m", a.FarField, "array|null")
		wantKind(t, id+" auto_radius", a.AutoRadius, "bool")
		wantKind(t, id+" max_radius_m", a.MaxRadius, "number|null")
		wantKind(t, id+" far_field_note", a.FarFieldNote, "string")
		wantKind(t, id+" blocked", a.Blocked, "array")
		wantKind(t, id+" notes", a.Notes, "array")
		wantKind(t, id+" stations", a.Stations, "number")
	}
	for _, pt := range d.Points {
		id := string(pt.Name)
		wantKind(t, id+" name", pt.Name, "string")
		wantKind(t, id+" potential_core_length_m", pt.Core, "number")
		wantKind(t, id+" velocity_envelope_length_m", pt.VelocityLength, "number")
		wantKind(t, id+" hot_envelope_length_m", pt.HotLength, "number")
		wantKind(t, id+" collector_capture", pt.Capture, "string")
		wantKind(t, id+" capture_reason", pt.CaptureReason, "string")
		wantKind(t, id+" collector_plume_diameter_m", pt.CaptureDiameter, "number")
		wantKind(t, id+" flags", pt.Flags, "array")
		wantKind(t, id+" exit.mach", pt.Exit.Mach, "number")
		wantKind(t, id+" exit.velocity_m_s", pt.Exit.Velocity, "number")
		wantKind(t, id+" exit.static_temperature_k", pt.Exit.StaticTemperature, "number")
		wantKind(t, id+" exit.fully_expanded_diameter_m", pt.Exit.FullyExpandedDiameter, "number")
		wantKind(t, id+" exit.reynolds", pt.Exit.Reynolds, "number")
	}
}
