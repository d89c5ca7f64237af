package main

import (
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"testing"
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
