package main

import (
	"os"
	"path/filepath"
	"regexp"
	"testing"

	"ullage/app/buildinfo"
)

// TestFyneAppMetadata: the packaging metadata beside the main package
// (read by "fyne package" and "fyne install") names the program's
// version and an icon that exists.
func TestFyneAppMetadata(t *testing.T) {
	b, err := os.ReadFile("FyneApp.toml")
	if err != nil {
		t.Fatal(err)
	}
	field := func(name string) string {
		m := regexp.MustCompile(`(?m)^` + name + ` = "([^"]*)"$`).FindSubmatch(b)
		if m == nil {
			t.Fatalf("FyneApp.toml has no %s", name)
		}
		return string(m[1])
	}
	if v := field("Version"); v != buildinfo.Version {
		t.Errorf("FyneApp.toml Version %q, buildinfo.Version %q", v, buildinfo.Version)
	}
	if name := field("Name"); name != buildinfo.Name {
		t.Errorf("FyneApp.toml Name %q, buildinfo.Name %q", name, buildinfo.Name)
	}
	// The ID names the preferences folder: changing it loses every
	// reviewer's settings and recent files.
	if id := field("ID"); id != "org.ullage.desktop" {
		t.Errorf("FyneApp.toml ID %q, want org.ullage.desktop (app/gui appID)", id)
	}
	if icon := field("Icon"); !fileExists(filepath.FromSlash(icon)) {
		t.Errorf("FyneApp.toml Icon %q does not exist (relative to app/ullage)", icon)
	}
}

func fileExists(p string) bool {
	_, err := os.Stat(p)
	return err == nil
}
