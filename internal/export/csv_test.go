package export_test

import (
	"bytes"
	"encoding/csv"
	"math"
	"strconv"
	"strings"
	"testing"

	"arcwright/internal/export"
	"arcwright/internal/planner"
	"arcwright/internal/units"
)

// csvColumns is the column list of the task's contract, spelled out here
// independently of the package's own header.
var csvColumns = []string{
	"id", "channel", "array", "kind", "x_m", "y_m", "z_m", "base_x_m", "base_y_m", "height_m",
	"radius_m", "nominal_radius_m", "polar_deg", "nominal_polar_deg", "acoustic_distance_m", "acoustic_polar_deg", "polar_convention", "azimuth_deg", "stand", "aim", "status",
	"governing_point", "velocity_clearance_m", "velocity_point", "hot_clearance_m", "hot_point", "wall_clearance_m", "oaspl_db", "reasons",
}

func writeCSV(t *testing.T, p *planner.Plan) []byte {
	t.Helper()
	var b bytes.Buffer
	if err := export.CSV(&b, p); err != nil {
		t.Fatalf("CSV: %v", err)
	}
	return b.Bytes()
}

// readCSV parses the output back and returns its rows keyed by column name.
func readCSV(t *testing.T, out []byte) []map[string]string {
	t.Helper()
	r := csv.NewReader(bytes.NewReader(out))
	r.FieldsPerRecord = len(csvColumns)
	recs, err := r.ReadAll()
	if err != nil {
		t.Fatalf("reading the CSV back: %v", err)
	}
	if len(recs) == 0 {
		t.Fatal("got no rows, want a header")
	}
	if got, want := strings.Join(recs[0], ","), strings.Join(csvColumns, ","); got != want {
		t.Fatalf("header: got %s, want %s", got, want)
	}
	rows := make([]map[string]string, len(recs)-1)
	for i, rec := range recs[1:] {
		rows[i] = map[string]string{}
		for j, v := range rec {
			rows[i][csvColumns[j]] = v
		}
	}
	return rows
}

func TestCSVGolden(t *testing.T) {
	checkGolden(t, "plan.golden.csv", writeCSV(t, fixturePlan(t)))
}

func TestCSVShape(t *testing.T) {
	p := fixturePlan(t)
	rows := readCSV(t, writeCSV(t, p))
	if len(rows) != len(p.Stations) {
		t.Fatalf("got %d rows, want %d (one per station)", len(rows), len(p.Stations))
	}
	for i, row := range rows {
		if got, want := row["id"], p.Stations[i].ID; got != want {
			t.Errorf("row %d id: got %q, want %q (plan order)", i+1, got, want)
		}
	}
}

// TestCSVValues checks cells of the fixture; far-2's position is
// hand-computed in TestJSONValues (3 m at 60° from the jet axis), and the
// cells show it with 4 and 2 decimals.
func TestCSVValues(t *testing.T) {
	p := fixturePlan(t)
	rows := readCSV(t, writeCSV(t, p))
	for _, c := range []struct {
		row       int
		col, want string
	}{
		{1, "id", "far-2"},
		{1, "channel", "2"},
		{1, "kind", "arc"},
		{1, "x_m", "1.5000"},
		{1, "y_m", "2.5981"},
		{1, "z_m", "1.5000"},
		{1, "base_x_m", "1.6500"},
		{1, "base_y_m", "2.8579"},
		{1, "radius_m", "3.0000"},
		{1, "nominal_radius_m", "3.0000"},
		{1, "acoustic_distance_m", "3.0000"},
		{1, "polar_deg", "120.00"},
		{1, "acoustic_polar_deg", "120.00"},
		{3, "radius_m", ""}, // a point has no nominal radius to compare with
		{3, "nominal_radius_m", ""},
		{1, "polar_convention", "from_inlet"},
		{1, "azimuth_deg", "0.00"},
		{1, "stand", "boom tripod"},
		{1, "aim", "normal"},
		{1, "status", "warn"},
		{0, "reasons", `obstacle "camera stand" hides 40 % of the source region; floor-reflection null inside the band`},
		{3, "stand", ""},
		{3, "aim", "grazing"},
		{3, "status", "ok"},
		{3, "reasons", ""},
		{4, "channel", ""}, // a probe stand has no channel (issue 10 item 15)
		{4, "status", "blocked"},
		{4, "velocity_clearance_m", strconv.FormatFloat(math.Round(p.Stations[4].Checks[0].Value*1e4)/1e4, 'f', 4, 64)},
	} {
		t.Run(c.col, func(t *testing.T) {
			if got := rows[c.row][c.col]; got != c.want {
				t.Errorf("row %d %s: got %q, want %q", c.row+1, c.col, got, c.want)
			}
		})
	}
}

// TestCSVEmptyCells checks that NaN and ±Inf values and missing checks
// give empty cells, and that the convention column follows the plan.
func TestCSVEmptyCells(t *testing.T) {
	p := fixturePlan(t)
	p.Request.Convention = planner.FromJetAxis
	s := &p.Stations[2]
	s.Mic.Y, s.Polar, s.Jet.Azimuth = math.NaN(), math.Inf(1), math.Inf(-1)
	s.Checks[1].Value = math.NaN()
	s.Checks = s.Checks[:2] // no wall check
	rows := readCSV(t, writeCSV(t, p))
	for _, col := range []string{"y_m", "acoustic_polar_deg", "azimuth_deg", "hot_clearance_m", "wall_clearance_m"} {
		if got := rows[2][col]; got != "" {
			t.Errorf("%s: got %q, want an empty cell", col, got)
		}
	}
	for i, row := range rows {
		if got := row["polar_convention"]; got != "from_jet_axis" {
			t.Errorf("row %d polar_convention: got %q, want %q", i+1, got, "from_jet_axis")
		}
	}
}

// TestCSVQuoting checks that reasons with commas, quotes and line breaks
// read back unchanged.
func TestCSVQuoting(t *testing.T) {
	p := fixturePlan(t)
	p.Stations[3].Reasons = []string{`a "quoted", comma`, "two\nlines"}
	rows := readCSV(t, writeCSV(t, p))
	if got, want := rows[3]["reasons"], `a "quoted", comma; two`+"\n"+`lines`; got != want {
		t.Errorf("got %q, want %q", got, want)
	}
}

// TestCSVImperial: a plan in feet and inches writes its lengths in decimal
// feet under _ft columns, like its reasons (issue 10 item 15); far-2's
// x = 1.5 m is 4.9213 ft (hand-computed, 1 ft = 0.3048 m exactly).
func TestCSVImperial(t *testing.T) {
	p := fixturePlan(t)
	p.Request.Units = units.Imperial
	recs, err := csv.NewReader(bytes.NewReader(writeCSV(t, p))).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	want := strings.Join(export.CSVHeader(units.Imperial), ",")
	if got := strings.Join(recs[0], ","); got != want || !strings.Contains(got, ",x_ft,") || strings.Contains(got, "_m,") {
		t.Fatalf("header: got %s, want %s", got, want)
	}
	if got := recs[2][4]; got != "4.9213" {
		t.Errorf("far-2 x_ft: got %q, want 4.9213", got)
	}
}
