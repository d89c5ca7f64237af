package main

import (
	"encoding/csv"
	"encoding/json"
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"strings"
	"testing"
)

// TestNominalAndPlacedAgree: on the reviewer's chamber (an arc, a
// near-field line and a ring R of radius 0.9 m about the axis at 1.5 m
// downstream), every station placed where the layout asks shows the same
// radius nominal and as placed in the CSV, the JSON and the sheet's station
// table (review: R-01 showed "nominal 0.900, as placed 1.749", its distance
// from the nozzle exit). The distance in space the checks use has its own
// column.
func TestNominalAndPlacedAgree(t *testing.T) {
	if _, err := exec.LookPath("pdftotext"); err != nil {
		t.Skip("pdftotext (poppler-utils) is not installed; .ci/run installs it")
	}
	dir := t.TempDir()
	csvPath, jsonPath, pdfPath := filepath.Join(dir, "p.csv"), filepath.Join(dir, "p.json"), filepath.Join(dir, "p.pdf")
	if _, errOut, code := arc(t, "plan", "testdata/review-chamber.yaml", "--csv", csvPath, "--json", jsonPath, "--pdf", pdfPath); code != exitOK {
		t.Fatalf("exit %d: %s", code, errOut)
	}
	f, err := os.Open(csvPath)
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	rows, err := csv.NewReader(f).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	col := map[string]int{}
	for i, h := range rows[0] {
		col[h] = i
	}
	kinds := map[string]bool{}
	for _, r := range rows[1:] {
		id, nom, got := r[col["id"]], r[col["nominal_radius_m"]], r[col["radius_m"]]
		if nom == "" {
			continue
		}
		kinds[r[col["kind"]]] = true
		if got != nom {
			t.Errorf("CSV %s (%s): radius_m %s, nominal_radius_m %s: want equal", id, r[col["kind"]], got, nom)
		}
		if strings.HasPrefix(id, "R-") && (nom != "0.9000" || r[col["acoustic_distance_m"]] == nom) {
			t.Errorf("CSV %s: nominal %s, acoustic distance %s: want 0.9000 about the axis and the distance from the exit apart", id, nom, r[col["acoustic_distance_m"]])
		}
		if np, p := r[col["nominal_polar_deg"]], r[col["polar_deg"]]; np != "" && np != p {
			t.Errorf("CSV %s: polar_deg %s, nominal_polar_deg %s: want equal", id, p, np)
		}
	}
	for _, k := range []string{"arc", "near_field", "ring"} {
		if !kinds[k] {
			t.Errorf("no %s station with a nominal radius in the CSV (kinds %v)", k, kinds)
		}
	}
	var doc struct {
		Stations []struct {
			ID      string   `json:"id"`
			Radius  *float64 `json:"radius_m"`
			Nominal *float64 `json:"nominal_radius_m"`
		} `json:"stations"`
	}
	b, err := os.ReadFile(jsonPath)
	if err != nil {
		t.Fatal(err)
	}
	if err := json.Unmarshal(b, &doc); err != nil {
		t.Fatal(err)
	}
	for _, s := range doc.Stations {
		if s.Nominal == nil {
			continue
		}
		if s.Radius == nil || *s.Radius-*s.Nominal > 5e-4 || *s.Nominal-*s.Radius > 5e-4 {
			t.Errorf("JSON %s: radius_m %v, nominal_radius_m %g: want equal", s.ID, s.Radius, *s.Nominal)
		}
	}
	text, err := exec.Command("pdftotext", "-layout", pdfPath, "-").Output()
	if err != nil {
		t.Fatal(err)
	}
	// station table row: ID, channel, array, polar nominal, polar as
	// placed, radius nominal, radius as placed
	row := regexp.MustCompile(`(?m)^\s*R-01\s+\d+\s+R\s+-\s+[\d.]+\s+([\d.]+)\s+([\d.]+)`)
	m := row.FindStringSubmatch(string(text))
	if m == nil {
		t.Fatal("no station table row for R-01 in the PDF text")
	}
	if m[1] != "0.900" || m[2] != "0.900" {
		t.Errorf("sheet R-01: radius nominal %s, as placed %s: want 0.900 both", m[1], m[2])
	}
}
