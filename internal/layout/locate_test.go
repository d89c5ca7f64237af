package layout

import (
	"errors"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"arcwright/internal/planner"
)

// unplannableDir holds layouts that decode but cannot be planned, with the
// located error of each in a golden .err file.
const unplannableDir = "testdata/layouts/unplannable"

// TestUnplannableGolden decodes each layout of testdata/layouts/unplannable,
// plans it and checks that Locate places the planner's error at the line
// and key of the layout (issue 10, item 7: these gave errors with no file,
// line or key). The expected texts are our own (hand-checked); refresh them
// with go test ./internal/layout -update.
func TestUnplannableGolden(t *testing.T) {
	files, err := filepath.Glob(filepath.Join(repoRoot, unplannableDir, "*.yaml"))
	if err != nil {
		t.Fatal(err)
	}
	if len(files) < 3 {
		t.Fatalf("got %d unplannable layouts, want at least 3", len(files))
	}
	for _, path := range files {
		base := filepath.Base(path)
		t.Run(strings.TrimSuffix(base, ".yaml"), func(t *testing.T) {
			req, _, err := Load(path)
			if err != nil {
				t.Fatalf("Load: %v", err)
			}
			_, perr := planner.New(req)
			if perr == nil {
				t.Fatal("planner.New: got nil, want an error")
			}
			err = Locate(req, perr)
			var es Errors
			if !errors.As(err, &es) || len(es) != 1 || es[0].Line == 0 || es[0].Field == "" || !errors.Is(err, planner.ErrRequest) {
				t.Fatalf("got %v, want one located problem wrapping the planner's error", err)
			}
			got := strings.Replace(err.Error(), filepath.Join(repoRoot, unplannableDir), unplannableDir, 1) + "\n"
			golden := strings.TrimSuffix(path, ".yaml") + ".err"
			if *update {
				if err := os.WriteFile(golden, []byte(got), 0o644); err != nil {
					t.Fatal(err)
				}
				return
			}
			want, err := os.ReadFile(golden)
			if err != nil {
				t.Fatalf("%v (run go test ./internal/layout -update to create it)", err)
			}
			if got != string(want) {
				t.Errorf("got\n%s\nwant\n%s", got, want)
			}
		})
	}
}

// TestLocateUnknown checks that an error Locate cannot place keeps its
// text and the file name, and that nil stays nil.
func TestLocateUnknown(t *testing.T) {
	if Locate(&planner.Request{Source: "x.yaml"}, nil) != nil {
		t.Error("Locate(nil): got an error, want nil")
	}
	err := Locate(&planner.Request{Source: "x.yaml"}, errors.New("something odd"))
	if err == nil || err.Error() != "x.yaml: something odd" {
		t.Errorf("got %v, want the message with the file name", err)
	}
}
