package main

import (
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"arcwright/internal/sheet"
)

// TestPlanRefusesPaperWithoutRoomForSafety: a sheet 1 that would leave out
// a safety warning is not written: plan --pdf on a paper whose sheet 1
// cannot hold every safety warning exits 1, names papers that can, and
// writes nothing (review of the sheet, item 1).
func TestPlanRefusesPaperWithoutRoomForSafety(t *testing.T) {
	src, err := os.ReadFile(filepath.Join(demoDir, "hard-wall-exhaust-room.yaml"))
	if err != nil {
		t.Fatal(err)
	}
	// thirty crew positions on the jet axis, each inside the velocity zone
	var crew strings.Builder
	crew.WriteString("crew:                        # people in the room during runs\n")
	for i := 0; i < 30; i++ {
		fmt.Fprintf(&crew, "  - name: bay %d\n    at: [%d, 2000]\n    hours: 1 h\n", i+1, 2500+100*i)
	}
	text := strings.Replace(string(src), "crew:                        # people in the room during runs\n", crew.String(), 1)
	if text == string(src) {
		t.Fatal("the demo's crew list was not found to extend")
	}
	dir := t.TempDir()
	layout := filepath.Join(dir, "crowded.yaml")
	if err := os.WriteFile(layout, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
	pdf := filepath.Join(dir, "s.pdf")
	_, errOut, code := arc(t, "plan", layout, "--pdf", pdf, "--paper", "A4", "--scale", "1:50")
	if code != exitError {
		t.Fatalf("got exit %d, want %d; stderr %q", code, exitError, errOut)
	}
	for _, w := range []string{"no room", "safety warning", "A4", "use a paper that has room:", "A0"} {
		if !strings.Contains(errOut, w) {
			t.Errorf("stderr %q lacks %q", errOut, w)
		}
	}
	if _, err := os.Stat(pdf); err == nil {
		t.Error("a PDF was written")
	}
}

// TestLargeSiteSafetyOnSheetOne: the large site's 29 safety warnings (one
// point striking 24 obstacles and more) were pushed off sheet 1 by its
// notes; now every one is on sheet 1, the notes moving on (review of the
// sheet, item 1).
func TestLargeSiteSafetyOnSheetOne(t *testing.T) {
	p, err := loadPlan(filepath.Join("testdata", "large-site.yaml"), "", "")
	if err != nil {
		t.Fatal(err)
	}
	m, err := sheet.Build(p, sheet.Options{Scale: 5000})
	if err != nil {
		t.Fatal(err)
	}
	var words []string
	for _, tx := range m.Pages[0].Texts {
		words = append(words, tx.Text)
	}
	page := strings.Join(strings.Fields(strings.Join(words, " ")), " ")
	on := map[int]bool{}
	for _, l := range m.Warnings {
		if strings.Contains(page, strings.Join(strings.Fields(l.Text), " ")) {
			for _, i := range l.Warnings {
				on[i] = true
			}
		}
	}
	n := 0
	for i, w := range p.Warnings {
		if strings.Contains(w, "wall jet") || strings.Contains(w, "buoyant") || strings.HasPrefix(w, "crew position") || strings.Contains(w, "collector capture") {
			n++
			if !on[i] {
				t.Errorf("not on sheet 1: %q", w)
			}
		}
	}
	if n < 20 {
		t.Errorf("got %d safety warnings, want the site's 29 or so", n)
	}
}
