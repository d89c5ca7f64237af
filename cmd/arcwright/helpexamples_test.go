package main

import (
	"bytes"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"
)

// TestHelpExamples runs every example line ("  arcwright …") of every
// command's help in a temporary directory that holds the demos under
// layouts/ and a copy of one as layout.yaml, and wants exit 0: an example a
// reader copies must work. serve runs until stopped and is only parsed.
func TestHelpExamples(t *testing.T) {
	dir := t.TempDir()
	if err := os.Mkdir(filepath.Join(dir, "layouts"), 0o755); err != nil {
		t.Fatal(err)
	}
	for _, demo := range demos {
		b, err := os.ReadFile(filepath.Join(demoDir, demo+".yaml"))
		if err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(filepath.Join(dir, "layouts", demo+".yaml"), b, 0o644); err != nil {
			t.Fatal(err)
		}
		if demo == "anechoic-model-jet" {
			if err := os.WriteFile(filepath.Join(dir, "layout.yaml"), b, 0o644); err != nil {
				t.Fatal(err)
			}
		}
	}
	t.Chdir(dir)
	example := regexp.MustCompile(`(?m)^\s+arcwright (\S.*)$`)
	root := newRootCommand(&bytes.Buffer{}, &bytes.Buffer{})
	n := 0
	for _, c := range root.Commands() {
		for _, m := range example.FindAllStringSubmatch(c.Long+"\n"+c.Example, -1) {
			args := strings.Fields(m[1])
			if args[0] != c.Name() {
				continue // a mention of another command
			}
			n++
			if c.Name() == "serve" {
				continue
			}
			t.Run(m[1], func(t *testing.T) {
				if _, errOut, code := arc(t, args...); code != exitOK {
					t.Errorf("got exit %d, stderr %q, want 0", code, errOut)
				}
			})
		}
	}
	if n < 8 {
		t.Errorf("found %d examples in the help, want at least 8", n)
	}
}
