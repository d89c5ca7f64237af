package main

import (
	"fmt"
	"os"
	"path/filepath"
	"regexp"
	"runtime/debug"
	"strings"
	"testing"

	"arcwright/internal/layout"
)

// TestPlumeImplausibleFlags checks that values no test uses are refused on
// the command line, before any work, with exit status 2, naming the flag
// and the plausible range (issue 10, items 1 and 10).
func TestPlumeImplausibleFlags(t *testing.T) {
	base := []string{"plume", "--diameter", "50.8mm", "--npr", "1.86", "--temperature-ratio", "1"}
	coax := []string{"plume", "--nozzle", "coaxial", "--diameter", "50.8mm", "--secondary-diameter", "100mm", "--npr", "1.86", "--temperature-ratio", "1", "--secondary-temperature-ratio", "1"}
	tests := []struct {
		name string
		args []string
		flag string
		want string
	}{
		{"npr huge", append(base, "--npr", "1e304"), "--npr", "want 1.001 to 50"},
		{"npr NaN", append(base, "--npr", "NaN"), "--npr", "finite"},
		{"npr Inf", append(base, "--npr", "+Inf"), "--npr", "finite"},
		{"npr below one", append(base, "--npr", "0.9"), "--npr", "want 1.001 to 50"},
		{"diameter huge", append(base, "--diameter", "1e200m"), "--diameter", "1.0 mm to 10.0 m"},
		{"diameter NaN", append(base, "--diameter", "NaNmm"), "--diameter", "want a length"},
		{"temperature ratio", append(base, "--temperature-ratio", "1e300"), "--temperature-ratio", "0.5 to 12"},
		{"total temperature", []string{"plume", "--diameter", "50.8mm", "--npr", "1.86", "--total-temperature", "1e9K"}, "--total-temperature", "150 K to 3000 K"},
		{"gamma", append(base, "--gamma", "NaN"), "--gamma", "finite"},
		{"gas constant", append(base, "--gas-constant", "1e9"), "--gas-constant", "implausible"},
		{"ambient pressure", append(base, "--ambient-pressure", "1e9Pa"), "--ambient-pressure", "30.00 kPa to 130.00 kPa"},
		{"velocity limit", append(base, "--velocity-limit", "1e9m/s"), "--velocity-limit", "implausible"},
		{"profile distance", append(base, "--at", "1e300m"), "--at", "implausible"},
		{"secondary npr", append(coax, "--secondary-npr", "1e100"), "--secondary-npr", "want 1.001 to 50"},
		{"design Mach", []string{"plume", "--nozzle", "cd", "--design-mach", "40", "--diameter", "2in", "--npr", "3", "--temperature-ratio", "1"}, "--design-mach", "above 1 up to 5"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			out, errOut, code := arc(t, tt.args...)
			if code != exitUsage {
				t.Errorf("got exit %d, want %d (a bad command line); stderr %q", code, exitUsage, errOut)
			}
			if out != "" {
				t.Errorf("got output %q, want none: the flags are checked before any work", out)
			}
			if !strings.Contains(errOut, `"`+tt.flag+`"`) || !strings.Contains(errOut, tt.want) {
				t.Errorf("got stderr %q, want it to name %s and say %q", errOut, tt.flag, tt.want)
			}
		})
	}
}

// TestAirImplausibleFlags checks the air command's flags the same way.
func TestAirImplausibleFlags(t *testing.T) {
	for _, args := range [][]string{
		{"air", "--temperature", "20C", "--humidity", "300%"},
		{"air", "--temperature", "1e9K", "--humidity", "30%"},
		{"air", "--temperature", "20C", "--humidity", "30%", "--pressure", "1e9Pa"},
		{"air", "--temperature", "20C", "--humidity", "30%", "--distance", "1e300m"},
	} {
		if _, errOut, code := arc(t, args...); code != exitUsage || !strings.Contains(errOut, "implausible") {
			t.Errorf("%v: got exit %d, stderr %q, want exit %d and the plausible range", args, code, errOut, exitUsage)
		}
	}
}

// TestPlumeHelpExample runs the --layout example of the plume command's
// help: its point must exist in the demo (issue 10, item 14).
func TestPlumeHelpExample(t *testing.T) {
	help, _, _ := arc(t, "plume", "--help")
	m := regexp.MustCompile(`arcwright plume (--layout \S+ --point \S+.*)`).FindStringSubmatch(help)
	if m == nil {
		t.Fatalf("the help has no --layout example:\n%s", help)
	}
	args := append([]string{"plume"}, strings.Fields(strings.ReplaceAll(m[1], "layouts/", demoDir+"/"))...)
	if _, errOut, code := arc(t, args...); code != exitOK {
		t.Errorf("%v: got exit %d, stderr %q, want 0", args, code, errOut)
	}
}

// TestNonRegularInputs checks that devices given as the layout or the
// as-built file are refused at once with exit status 1 (issue 10, item 5:
// these read about 1 GB/s until killed).
func TestNonRegularInputs(t *testing.T) {
	layoutPath := demoDir + "/anechoic-model-jet.yaml"
	for _, args := range [][]string{
		{"validate", "/dev/zero"},
		{"plan", "/dev/zero"},
		{"check", layoutPath, "--as-built", "/dev/zero"},
		{"plume", "--layout", "/dev/zero", "--point", "x"},
	} {
		_, errOut, code := arc(t, args...)
		if code != exitError || !strings.Contains(errOut, "/dev/zero: is not a regular file (a device)") {
			t.Errorf("%v: got exit %d, stderr %q, want exit 1 and a clear error", args, code, errOut)
		}
	}
}

// TestUnknownAsBuiltLines checks that check --as-built names each unknown
// station at its line of the as-built file (issue 10, item 8).
func TestUnknownAsBuiltLines(t *testing.T) {
	path := filepath.Join(t.TempDir(), "built.csv")
	if err := os.WriteFile(path, []byte("id;x;y;z\nA-01;6,2;4,1;1,2\nA-1;6;4;1\n"), 0o644); err != nil {
		t.Fatal(err)
	}
	_, errOut, code := arc(t, "check", demoDir+"/anechoic-model-jet.yaml", "--as-built", path)
	if code != exitError || !strings.Contains(errOut, path+`:3: id: no station "A-1" in the plan; did you mean "A-01"?`) {
		t.Errorf("got exit %d, stderr %q, want exit 1 and the unknown ID at line 3", code, errOut)
	}
}

// copyDemo copies the anechoic demo into dir and returns its path.
func copyDemo(t *testing.T, dir string) string {
	t.Helper()
	data, err := os.ReadFile(demoDir + "/anechoic-model-jet.yaml")
	if err != nil {
		t.Fatal(err)
	}
	path := filepath.Join(dir, "L.yaml")
	if err := os.WriteFile(path, data, 0o644); err != nil {
		t.Fatal(err)
	}
	return path
}

// names lists dir.
func names(t *testing.T, dir string) []string {
	t.Helper()
	es, err := os.ReadDir(dir)
	if err != nil {
		t.Fatal(err)
	}
	var out []string
	for _, e := range es {
		out = append(out, e.Name())
	}
	return out
}

// TestPlanOutputs checks the destinations of plan: never an input or
// another output (exit 2), all or none, checked before planning, the mode
// of a replaced file kept, "-" for standard output (issue 10, items 2–4).
func TestPlanOutputs(t *testing.T) {
	dir := t.TempDir()
	layoutPath := copyDemo(t, dir)
	before, _ := os.ReadFile(layoutPath)
	same := filepath.Join(dir, "same.out")
	for _, tt := range []struct {
		name string
		args []string
		code int
		want string
	}{
		{"onto the layout", []string{"--csv", layoutPath}, exitUsage, "--csv " + layoutPath + " is the layout"},
		{"onto the layout by a link", []string{"--csv", filepath.Join(dir, "link.yaml")}, exitUsage, "is the layout"},
		{"two outputs, one file", []string{"--pdf", same, "--csv", same}, exitUsage, "are the same file"},
		{"missing directory", []string{"--pdf", filepath.Join(dir, "ok.pdf"), "--csv", "/nonexistent/x.csv"}, exitError, "--csv /nonexistent/x.csv: cannot write in its directory"},
		{"a device", []string{"--pdf", "/dev/zero"}, exitUsage, "is a device"},
		{"a directory", []string{"--json", dir}, exitUsage, "is a directory"},
		{"stdout twice", []string{"--csv", "-", "--json", "-"}, exitUsage, "the same file"},
		{"stdout and --format json", []string{"--csv", "-", "--format", "json"}, exitUsage, "choose one"},
	} {
		t.Run(tt.name, func(t *testing.T) {
			_ = os.Symlink("L.yaml", filepath.Join(dir, "link.yaml"))
			out, errOut, code := arc(t, append([]string{"plan", layoutPath}, tt.args...)...)
			if code != tt.code || !strings.Contains(errOut, tt.want) {
				t.Errorf("got exit %d, stderr %q, want exit %d and %q", code, errOut, tt.code, tt.want)
			}
			if out != "" {
				t.Errorf("got output %q, want none: checked before planning", out)
			}
			if got, _ := os.ReadFile(layoutPath); string(got) != string(before) {
				t.Errorf("the layout was overwritten")
			}
			if n := names(t, dir); len(n) != 2 {
				t.Errorf("directory: got %v, want only L.yaml and link.yaml", n)
			}
		})
	}

	// a replaced file keeps its mode
	csvPath := filepath.Join(dir, "stations.csv")
	if err := os.WriteFile(csvPath, []byte("old"), 0o600); err != nil {
		t.Fatal(err)
	}
	if _, errOut, code := arc(t, "plan", layoutPath, "--csv", csvPath); code != exitOK {
		t.Fatalf("exit %d: %s", code, errOut)
	}
	if fi, err := os.Stat(csvPath); err != nil || fi.Mode().Perm() != 0o600 {
		t.Errorf("mode: got %v, %v, want -rw-------", fi.Mode().Perm(), err)
	}
	// "-" writes the export on standard output, without the summary
	out, _, code := arc(t, "plan", layoutPath, "--csv", "-")
	if code != exitOK || !strings.HasPrefix(out, "id,channel,") || strings.Contains(out, "stations —") {
		t.Errorf("--csv -: exit %d, output starts %.60q, want the CSV alone", code, out)
	}
}

// TestInitDanglingLink checks that init over a dangling symbolic link
// writes the link's target and keeps the link (issue 10, item 4).
func TestInitDanglingLink(t *testing.T) {
	dir := t.TempDir()
	link := filepath.Join(dir, "layout.yaml")
	if err := os.Symlink("real.yaml", link); err != nil {
		t.Fatal(err)
	}
	if _, errOut, code := arc(t, "init", link); code != exitOK {
		t.Fatalf("exit %d: %s", code, errOut)
	}
	if fi, err := os.Lstat(link); err != nil || fi.Mode()&os.ModeSymlink == 0 {
		t.Errorf("the link was replaced by a file")
	}
	if _, err := os.Stat(filepath.Join(dir, "real.yaml")); err != nil {
		t.Errorf("the link's target was not written: %v", err)
	}
	if _, _, code := arc(t, "init", "/dev/zero"); code != exitUsage {
		t.Errorf("init /dev/zero: got exit %d, want %d", code, exitUsage)
	}
}

// TestValidateRefusesWhatPlanRefuses checks that each unplannable layout
// fails validate with the same located error that plan gives (issue 10,
// item 7: validate said valid and plan failed without file, line or key).
func TestValidateRefusesWhatPlanRefuses(t *testing.T) {
	files, err := filepath.Glob("../../testdata/layouts/unplannable/*.yaml")
	if err != nil || len(files) == 0 {
		t.Fatalf("no unplannable layouts: %v", err)
	}
	for _, path := range files {
		t.Run(filepath.Base(path), func(t *testing.T) {
			out, vErr, vCode := arc(t, "validate", path)
			_, pErr, pCode := arc(t, "plan", path, "--csv", filepath.Join(t.TempDir(), "x.csv"))
			if vCode != exitError || pCode != exitError {
				t.Errorf("validate exit %d, plan exit %d, want 1 and 1", vCode, pCode)
			}
			if strings.Contains(out, "valid") {
				t.Errorf("validate said %q", out)
			}
			if vErr != pErr || !strings.HasPrefix(vErr, path+":") {
				t.Errorf("validate said %q, plan said %q, want the same located error", vErr, pErr)
			}
		})
	}
}

// TestCompletion checks that the shell completion offers the values of
// the flags that take a word from a list, and the layout's operating
// points for --point, instead of file names (issue 10, item 14).
func TestCompletion(t *testing.T) {
	tests := []struct {
		args []string
		want []string
	}{
		{[]string{"plume", "--nozzle", ""}, []string{"convergent", "cd", "rectangular", "coaxial"}},
		{[]string{"plume", "--units", ""}, []string{"metric", "imperial"}},
		{[]string{"air", "--format", ""}, []string{"text", "csv", "json"}},
		{[]string{"plan", "x.yaml", "--paper", ""}, []string{"A4", "A3", "Letter", "Tabloid"}},
		{[]string{"plan", "x.yaml", "--scale", ""}, []string{"1:50", "1:100"}},
		{[]string{"plume", "--layout", demoDir + "/anechoic-model-jet.yaml", "--point", ""}, []string{"CS-060", "HS-090"}},
		{[]string{"validate", ""}, []string{"yaml", "yml"}},
	}
	for _, tt := range tests {
		out, errOut, code := arc(t, append([]string{"__complete"}, tt.args...)...)
		if code != exitOK {
			t.Errorf("%v: exit %d, %s", tt.args, code, errOut)
			continue
		}
		lines := strings.Split(out, "\n")
		for _, w := range tt.want {
			found := false
			for _, l := range lines {
				found = found || l == w
			}
			if !found {
				t.Errorf("%v: got %q, want %q among the completions", tt.args, out, w)
			}
		}
		if strings.Contains(out, ":0\n") {
			t.Errorf("%v: got the default directive (file names), want values only", tt.args)
		}
	}
}

// TestVersion checks that `arcwright version` prints the version, the
// module and the commit as the build recorded them (issue 10, item 14).
func TestVersion(t *testing.T) {
	out, _, code := arc(t, "version")
	if code != exitOK || !strings.HasPrefix(out, "arcwright "+version+"\n") || !strings.Contains(out, "module arcwright") || !strings.Contains(out, "commit ") {
		t.Errorf("got exit %d, %q", code, out)
	}
	var b strings.Builder
	versionText(&b, &debug.BuildInfo{GoVersion: "go1.26.0", Main: debug.Module{Path: "arcwright", Version: "v1.2.3"},
		Settings: []debug.BuildSetting{{Key: "vcs.revision", Value: "0123abc"}, {Key: "vcs.time", Value: "2026-12-02T06:00:00Z"}, {Key: "vcs.modified", Value: "true"}}})
	want := "arcwright " + version + "\nmodule arcwright v1.2.3\ncommit 0123abc with uncommitted changes, committed 2026-12-02T06:00:00Z\nbuilt with go1.26.0\n"
	if b.String() != want {
		t.Errorf("got %q, want %q", b.String(), want)
	}
}

// TestValidateSheetScaleWarns checks that a sheet that does not fit the
// layout's paper and scale is a warning of validate, not an error: plan
// without --pdf, or with --paper and --scale, still plans it.
func TestValidateSheetScaleWarns(t *testing.T) {
	dir := t.TempDir()
	path := filepath.Join(dir, "L.yaml")
	text := strings.Replace(string(layout.Starter()), `# scale: "1:50"`, `scale: "1:10"`, 1)
	if err := os.WriteFile(path, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
	out, errOut, code := arc(t, "validate", path)
	if code != exitOK || !strings.Contains(out, fmt.Sprintf("warning: %s:%d: sheet.scale: scale does not fit", path, lineOf(t, path, "scale: \"1:10\""))) {
		t.Errorf("got exit %d, %q %q, want 0 and a warning about the sheet", code, out, errOut)
	}
}
