package layout

import (
	"errors"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// asBuiltBrokenDir holds red-team as-built files, relative to the module
// root, each with its expected errors in a .err file.
const asBuiltBrokenDir = "testdata/asbuilt/broken"

// TestAsBuiltBrokenGolden reads every broken as-built file (bare lengths in
// metres, a 4 m ceiling) and compares the errors with the golden .err file;
// every problem but a whole-file one has a line. The expected texts are our
// own (hand-checked); refresh them with go test ./internal/layout -update.
func TestAsBuiltBrokenGolden(t *testing.T) {
	files, err := filepath.Glob(filepath.Join(repoRoot, asBuiltBrokenDir, "*.csv"))
	if err != nil || len(files) < 5 {
		t.Fatalf("got %d broken as-built files (%v), want at least 5", len(files), err)
	}
	for _, path := range files {
		base := filepath.Base(path)
		t.Run(strings.TrimSuffix(base, ".csv"), func(t *testing.T) {
			data, err := os.ReadFile(path)
			if err != nil {
				t.Fatal(err)
			}
			got, err := DecodeAsBuilt(asBuiltBrokenDir+"/"+base, data, "m", 4)
			var es Errors
			if got != nil || !errors.As(err, &es) {
				t.Fatalf("got %v, %v, want only Errors", got, err)
			}
			text := err.Error() + "\n"
			golden := strings.TrimSuffix(path, ".csv") + ".err"
			if *update {
				if err := os.WriteFile(golden, []byte(text), 0o644); err != nil {
					t.Fatal(err)
				}
				return
			}
			want, err := os.ReadFile(golden)
			if err != nil {
				t.Fatalf("%v (run go test ./internal/layout -update to create it)", err)
			}
			if text != string(want) {
				t.Errorf("got\n%s\nwant\n%s", text, want)
			}
		})
	}
}
