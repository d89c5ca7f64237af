package layout

import (
	"errors"
	"flag"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

var update = flag.Bool("update", false, "rewrite the golden .err files of testdata/layouts/broken")

// repoRoot is the module root, relative to this package's directory.
const repoRoot = "../.."

// brokenDir holds the broken layouts, relative to the module root; error
// messages name files by this relative path.
const brokenDir = "testdata/layouts/broken"

// TestBrokenGolden decodes every broken layout and compares the error text
// with its golden .err file. The expected texts are our own (hand-checked);
// refresh them with go test ./internal/layout -update.
func TestBrokenGolden(t *testing.T) {
	files, err := filepath.Glob(filepath.Join(repoRoot, brokenDir, "*.yaml"))
	if err != nil {
		t.Fatal(err)
	}
	if len(files) < 10 {
		t.Fatalf("got %d broken layouts, want at least 10", len(files))
	}
	for _, path := range files {
		base := filepath.Base(path)
		t.Run(strings.TrimSuffix(base, ".yaml"), func(t *testing.T) {
			data, err := os.ReadFile(path)
			if err != nil {
				t.Fatal(err)
			}
			req, warns, err := Decode(brokenDir+"/"+base, data)
			if req != nil || warns != nil {
				t.Errorf("got a request %v and warnings %v with the errors, want neither", req != nil, warns)
			}
			var es Errors
			if !errors.As(err, &es) || len(es) == 0 {
				t.Fatalf("got error %v, want a non-empty Errors", err)
			}
			got := err.Error() + "\n"
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
