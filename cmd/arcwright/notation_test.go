package main

import (
	"os/exec"
	"path/filepath"
	"regexp"
	"strings"
	"testing"

	"arcwright/internal/units"
)

// otherNotations matches imperial lengths not in the tape notation
// (147' 8", 3' 11-1/4"): "147 ft 7-5/8 in", "3 ft 11 in", "0 ft 3-9/16 in"
// and decimal feet "147.6'" (which reads as 147' 6" on site). The review of
// the pad found all of them for the same lengths on one sheet and summary.
var otherNotations = regexp.MustCompile(`\d+ ft \d|\d+ in\b|\d+\.\d+'`)

// TestImperialOneNotation: on the feet-and-inches demo the same length
// prints the same on every surface — the command-line summary, the plan's
// labels and the tables read back from the PDF — and no other notation of
// a length appears on either.
func TestImperialOneNotation(t *testing.T) {
	if _, err := exec.LookPath("pdftotext"); err != nil {
		t.Skip("pdftotext (poppler-utils) is not installed; .ci/run installs it")
	}
	layout := filepath.Join(demoDir, "outdoor-static-pad.yaml")
	pdf := filepath.Join(t.TempDir(), "pad.pdf")
	out, errOut, code := arc(t, "plan", layout, "--pdf", pdf)
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errOut)
	}
	text, err := exec.Command("pdftotext", "-layout", pdf, "-").Output()
	if err != nil {
		t.Fatal(err)
	}
	sheetText := string(text)
	p, err := loadPlan(layout, "", "")
	if err != nil {
		t.Fatal(err)
	}
	r := units.FormatLength(p.Arrays[0].Radius, units.Imperial)
	if r != `147' 8"` { // 45 m = 147.64 ft (hand-computed): to the inch beyond 100 ft
		t.Fatalf("arc G radius prints %s, want 147' 8\"", r)
	}
	// a ground-plane point's microphone height: the set-out table's cell
	// and the reasons' words print it alike (review: "3 ft 11 in high" in a
	// reason, 3' 11-1/4" in the table)
	var h string
	for _, st := range p.Stations {
		if st.ID == "E-090" {
			h = units.FormatLength(st.Height, units.Imperial)
		}
	}
	if h != `3' 11-1/4"` { // 1.2 m = 47.24 in (hand-computed)
		t.Fatalf("E-090's height prints %s, want 3' 11-1/4\"", h)
	}
	for _, c := range []struct{ surface, text, want string }{
		{"set-out table", sheetText, `3' 11-1/4" -`},
		{"reasons", sheetText, "microphone " + h + " high"},
		{"summary", out, "radius " + r},
		{"plan label", sheetText, "R " + r + " nominal"},
		{"set-out table", sheetText, "E0: " + r},
		{"set-up steps", sheetText, "swing radius " + r},
	} {
		if !strings.Contains(strings.ToLower(c.text), strings.ToLower(c.want)) {
			t.Errorf("%s lacks %q", c.surface, c.want)
		}
	}
	for _, s := range []struct{ surface, text string }{{"summary", out}, {"sheet", sheetText}} {
		for _, m := range otherNotations.FindAllStringIndex(s.text, -1) {
			if strings.HasPrefix(s.text[m[1]:], " microphone") {
				continue // a microphone's size class ("1/4 in microphone"), a name, not a length to set out
			}
			t.Errorf("%s prints a length as %q: want one notation, feet and inches as a tape reads", s.surface, s.text[max(0, m[0]-20):m[1]])
		}
	}
}
