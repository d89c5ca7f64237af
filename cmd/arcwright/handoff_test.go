package main

import (
	"encoding/csv"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"
)

// readCSVFile reads a CSV file written by a command.
func readCSVFile(t *testing.T, path string) [][]string {
	t.Helper()
	f, err := os.Open(path)
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	recs, err := csv.NewReader(f).ReadAll()
	if err != nil {
		t.Fatalf("%s: %v", path, err)
	}
	return recs
}

// identifier is a column name that imports cleanly into a spreadsheet, a
// data frame or a database table.
var identifier = regexp.MustCompile(`^[A-Za-z_][A-Za-z0-9_]*$`)

// TestAirCSVHeaders: air --format csv names its columns with letters,
// digits and underscores only, each once (issue 10 item 15: "loss_db_3.000_m"
// and "loss_db_S_3.124_m_(mean)" did not import cleanly).
func TestAirCSVHeaders(t *testing.T) {
	for _, args := range [][]string{
		{"air", "--temperature", "20C", "--humidity", "70%", "--from", "1kHz", "--to", "80kHz", "--distance", "3m,5m", "--format", "csv"},
		{"air", filepath.Join(demoDir, "anechoic-model-jet.yaml"), "--format", "csv"},
		{"air", filepath.Join(demoDir, "outdoor-static-pad.yaml"), "--format", "csv"},
	} {
		out, errOut, code := arc(t, args...)
		if code != exitOK {
			t.Fatalf("%v: exit %d: %s", args, code, errOut)
		}
		recs, err := csv.NewReader(strings.NewReader(out)).ReadAll()
		if err != nil {
			t.Fatalf("%v: %v", args, err)
		}
		seen := map[string]bool{}
		for _, h := range recs[0] {
			if !identifier.MatchString(h) || seen[h] {
				t.Errorf("%v: column %q is not a unique identifier (header %q)", args, h, recs[0])
			}
			seen[h] = true
		}
	}
	out, _, _ := arc(t, "air", "--temperature", "20C", "--humidity", "70%", "--distance", "3m,5m", "--format", "csv")
	if !strings.HasPrefix(out, "band,frequency_hz,db_per_m,loss_db_3000mm,loss_db_5000mm\n") {
		t.Errorf("got header %q, want the paths in millimetres", strings.SplitN(out, "\n", 2)[0])
	}
}

// metricLength matches a length printed in metric units.
var metricLength = regexp.MustCompile(`\d (m|mm|cm|km)\b`)

// TestCSVUnits: the station CSV of a layout in feet and inches has its
// lengths in feet (columns ending _ft) and its reasons in feet and inches,
// the same system (issue 10 item 15: metre columns beside reasons in feet);
// a metric layout keeps metre columns.
func TestCSVUnits(t *testing.T) {
	dir := t.TempDir()
	for _, tt := range []struct {
		demo, suffix string
	}{{"outdoor-static-pad", "_ft"}, {"hard-wall-exhaust-room", "_m"}} {
		path := filepath.Join(dir, tt.demo+".csv")
		if _, errOut, code := arc(t, "plan", filepath.Join(demoDir, tt.demo+".yaml"), "--csv", path); code != exitOK {
			t.Fatalf("%s: exit %d: %s", tt.demo, code, errOut)
		}
		recs := readCSVFile(t, path)
		head := strings.Join(recs[0], ",")
		for _, c := range []string{"x", "y", "z", "base_x", "base_y", "height", "radius", "velocity_clearance"} {
			if !strings.Contains(","+head+",", ","+c+tt.suffix+",") {
				t.Errorf("%s: no column %s%s in %s", tt.demo, c, tt.suffix, head)
			}
		}
		if tt.suffix != "_ft" {
			continue
		}
		reasons := len(recs[0]) - 1
		for _, r := range recs[1:] {
			if m := metricLength.FindString(r[reasons]); m != "" {
				t.Errorf("%s %s: a metric length %q in the reasons of a CSV in feet: %s", tt.demo, r[0], m, r[reasons])
			}
		}
	}
}
