package export_test

import (
	"bytes"
	"encoding/csv"
	"encoding/json"
	"errors"
	"math"
	"strings"
	"testing"
	"unicode/utf8"

	"arcwright/internal/export"
)

// FuzzWriters puts arbitrary numbers and text into a station, an array and
// a point of the fixture and checks the three outputs: JSON is always
// valid and never holds NaN or Inf; the CSV always reads back with one row
// per station and the reasons intact; GeoJSON fails with ErrNotFinite
// exactly when a coordinate it must write is not finite.
func FuzzWriters(f *testing.F) {
	f.Add(1.5, 2.0, 0.25, "clear")
	f.Add(math.NaN(), math.Inf(1), math.Inf(-1), "")
	f.Add(-0.00001, -math.Pi, 1e300, `quote " and, comma`)
	f.Add(1e-300, 1e21, -5e-7, "line\r\nbreak\rand \n more")
	f.Add(3e15, 0.0, math.Copysign(0, -1), "\xff\xfe not UTF-8")
	f.Fuzz(func(t *testing.T, x, polar, value float64, reason string) {
		p := fixturePlan(t)
		s := &p.Stations[3] // ref-1: not on an arc
		s.Mic.X, s.Polar, s.Radius = x, polar, value
		s.Checks[2].Value = value
		s.Reasons = []string{reason, reason}
		p.Arrays[0].FarField = [2]float64{value, x}
		p.Arrays[0].MinClearPolar = polar
		p.Points[0].CoreNominal, p.Points[0].Exit.Reynolds = x, value

		var jb bytes.Buffer
		if err := export.JSON(&jb, p); err != nil {
			t.Fatalf("JSON: %v", err)
		}
		var m map[string]any
		if err := json.Unmarshal(jb.Bytes(), &m); err != nil {
			t.Fatalf("JSON output does not parse: %v", err)
		}
		if utf8.ValidString(reason) {
			if got := at(m, "stations", 3, "reasons", 0); got != reason {
				t.Errorf("JSON reason: got %q, want %q", got, reason)
			}
		}
		if got := at(m, "stations", 3, "checks", "wall_clearance_m"); (got == nil) != (math.IsNaN(value) || math.IsInf(value, 0)) {
			t.Errorf("JSON wall_clearance_m for %v: got %v", value, got)
		}

		var cb bytes.Buffer
		if err := export.CSV(&cb, p); err != nil {
			t.Fatalf("CSV: %v", err)
		}
		r := csv.NewReader(&cb)
		r.FieldsPerRecord = len(csvColumns)
		recs, err := r.ReadAll()
		if err != nil {
			t.Fatalf("CSV does not read back: %v", err)
		}
		if len(recs) != len(p.Stations)+1 {
			t.Fatalf("CSV: got %d records, want %d", len(recs), len(p.Stations)+1)
		}
		// encoding/csv reads a quoted "\r\n" back as "\n"
		want := strings.ReplaceAll(reason+"; "+reason, "\r\n", "\n")
		if got := recs[4][len(csvColumns)-1]; got != want {
			t.Errorf("CSV reasons: got %q, want %q", got, want)
		}

		err = export.GeoJSON(&bytes.Buffer{}, p)
		finiteX := !math.IsNaN(x) && !math.IsInf(x, 0)
		switch {
		case finiteX && err != nil:
			t.Errorf("GeoJSON with x = %v: got error %v, want none", x, err)
		case !finiteX && !errors.Is(err, export.ErrNotFinite):
			t.Errorf("GeoJSON with x = %v: got error %v, want ErrNotFinite", x, err)
		}
	})
}
