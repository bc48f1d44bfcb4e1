#!/usr/bin/env pwsh
<#
.SYNOPSIS
    Builds, tests, demonstrates and packs LogicProof.

.DESCRIPTION
    PowerShell 7. On Linux and macOS PowerShell comes as a dotnet local tool pinned in .config/dotnet-tools.json:
        dotnet tool restore
        dotnet pwsh build.ps1 test
    Tasks (run in the order given; any failing step stops the script with a non-zero exit code):
        restore  dotnet restore LogicProof.sln
        build    dotnet build LogicProof.sln
        test     dotnet test LogicProof.sln
        demo     logicproof check on the shipped examples, and simulate on the shipped trace
        pack     dotnet pack the CLI as a dotnet tool into ./artifacts/package
        parser   regenerate src/LogicProof.Language/Generated from grammar/LogicProof.g4 (needs Node.js/npx)
        all      restore, build, test, demo, pack (the default; parser is left out because it rewrites
                 committed files and needs the npm registry)

.EXAMPLE
    dotnet pwsh build.ps1
.EXAMPLE
    dotnet pwsh build.ps1 build test -Configuration Debug -ArtifactsPath /tmp/art-me
#>
[CmdletBinding()]
param(
    [Parameter(Position = 0, ValueFromRemainingArguments = $true)]
    [ValidateSet('restore', 'build', 'test', 'demo', 'pack', 'parser', 'all')]
    [string[]] $Task = @('all'),

    [ValidateSet('Debug', 'Release')]
    [string] $Configuration = 'Release',

    # Passed to dotnet as --artifacts-path, so that several people can build in one tree at once.
    [string] $ArtifactsPath = ''
)

Set-StrictMode -Version Latest
$ErrorActionPreference = 'Stop'
$PSNativeCommandUseErrorActionPreference = $false   # exit codes are checked explicitly below

$env:DOTNET_CLI_UI_LANGUAGE = 'en'
$env:DOTNET_NOLOGO = '1'
$env:DOTNET_CLI_TELEMETRY_OPTOUT = '1'

$Root = $PSScriptRoot
$Solution = Join-Path $Root 'LogicProof.sln'
$CliProject = Join-Path $Root 'src/LogicProof.Cli/LogicProof.Cli.csproj'
$PackageOutput = Join-Path $Root 'artifacts/package'
$Examples = Join-Path $Root 'examples'
$AntlrNgVersion = '1.0.10'   # keep equal to scripts/generate-parser.sh

# Later steps skip work an earlier step of this run has done, and do it themselves when run alone.
$script:Restored = $false
$script:Built = $false

function Write-Step([string] $Text) {
    Write-Host ''
    Write-Host "== $Text" -ForegroundColor Cyan
}

# Runs a native command and stops the build unless its exit code is one of $Expected.
function Invoke-Checked {
    param(
        [Parameter(Mandatory)] [string] $FilePath,
        [string[]] $Arguments = @(),
        [int[]] $Expected = @(0)
    )
    Write-Host "> $FilePath $($Arguments -join ' ')" -ForegroundColor DarkGray
    & $FilePath @Arguments
    $code = $LASTEXITCODE
    if ($Expected -notcontains $code) {
        throw "'$FilePath $($Arguments -join ' ')' exited with $code (expected $($Expected -join ' or '))."
    }
}

function Get-CommonArguments {
    $arguments = @('-c', $Configuration)
    if ($ArtifactsPath) {
        $arguments += @('--artifacts-path', $ArtifactsPath)
    }
    return $arguments
}

function Invoke-Restore {
    Write-Step 'restore'
    $arguments = @('restore', $Solution)
    if ($ArtifactsPath) {
        $arguments += @('--artifacts-path', $ArtifactsPath)
    }
    Invoke-Checked dotnet $arguments
    $script:Restored = $true
}

function Invoke-Build {
    Write-Step "build ($Configuration)"
    $arguments = @('build', $Solution) + (Get-CommonArguments)
    if ($script:Restored) {
        $arguments += '--no-restore'
    }
    Invoke-Checked dotnet $arguments
    $script:Built = $true
}

function Get-NoBuildArgument {
    if ($script:Built) { return @('--no-build') }
    return @()
}

function Invoke-Test {
    Write-Step "test ($Configuration)"
    Invoke-Checked dotnet (@('test', $Solution) + (Get-NoBuildArgument) + (Get-CommonArguments))
}

# Runs the logicproof CLI from the build output; exit codes follow the table in README.md.
function Invoke-LogicProof {
    param([string[]] $Arguments, [int[]] $Expected = @(0))
    $runArguments = @('run', '--project', $CliProject, '--no-build') + (Get-CommonArguments) + @('--') + $Arguments
    Invoke-Checked dotnet $runArguments $Expected
}

function Invoke-Demo {
    if (-not $script:Built) {
        Write-Step "build the CLI ($Configuration)"
        Invoke-Checked dotnet (@('build', $CliProject) + (Get-CommonArguments))
        $script:Built = $true
    }
    Write-Step 'demo: check the correct Quillmere bay 7 scheme (expect exit 0: every rule proved)'
    Invoke-LogicProof @('check', (Join-Path $Examples 'quillmere-bay7/qm7-close-trip.lpl'))

    Write-Step 'demo: simulate bay 7 through close, protection trip, lockout, refused close and reset'
    Invoke-LogicProof @(
        'simulate', (Join-Path $Examples 'quillmere-bay7/qm7-close-trip.lpl'),
        '--inputs', (Join-Path $Examples 'quillmere-bay7/close-trip-lockout.csv'),
        '--changes-only')

    Write-Step 'demo: check the pumping scheme of bay 9 (expect exit 1: no-pumping violated, with the trace)'
    Invoke-LogicProof @('check', (Join-Path $Examples 'pumping/qm9-pumping.lpl')) -Expected @(1)

    Write-Step 'demo: check the corrected bay 9 scheme (expect exit 0)'
    Invoke-LogicProof @('check', (Join-Path $Examples 'pumping/qm9-corrected.lpl'))
}

function Invoke-Pack {
    Write-Step "pack the logicproof dotnet tool into $PackageOutput"
    Invoke-Checked dotnet (@('pack', $CliProject, '-o', $PackageOutput) + (Get-NoBuildArgument) + (Get-CommonArguments))
}

function Invoke-Parser {
    Write-Step "regenerate the parser (antlr-ng $AntlrNgVersion)"
    $script = Join-Path $Root 'scripts/generate-parser.sh'
    $bash = Get-Command bash -ErrorAction SilentlyContinue
    if ($bash -and -not $IsWindows) {
        Invoke-Checked $bash.Source @($script)
        return
    }

    # Windows without bash: the same npx call and the same header rewrite as scripts/generate-parser.sh.
    $work = Join-Path ([IO.Path]::GetTempPath()) ("logicproof-parser-" + [Guid]::NewGuid().ToString('N'))
    New-Item -ItemType Directory -Path $work | Out-Null
    try {
        Copy-Item (Join-Path $Root 'grammar/LogicProof.g4') $work
        Push-Location $work
        try {
            Invoke-Checked npx @('--yes', "antlr-ng@$AntlrNgVersion", '-Dlanguage=CSharp', '-v', 'true',
                '-p', 'LogicProof.Language.Generated', '-o', 'gen', 'LogicProof.g4')
        }
        finally {
            Pop-Location
        }
        $out = Join-Path $Root 'src/LogicProof.Language/Generated'
        if (Test-Path $out) {
            Remove-Item -Recurse -Force $out
        }
        New-Item -ItemType Directory -Path $out | Out-Null
        $header = "// Generated from grammar/LogicProof.g4 by antlr-ng $AntlrNgVersion. Do not edit."
        $utf8 = [Text.UTF8Encoding]::new($false)
        foreach ($file in Get-ChildItem (Join-Path $work 'gen') -Filter '*.cs') {
            $text = [IO.File]::ReadAllText($file.FullName)
            $text = [Text.RegularExpressions.Regex]::Replace($text, '(?m)^// Generated from .*LogicProof\.g4[^\r\n]*', $header)
            [IO.File]::WriteAllText((Join-Path $out $file.Name), $text, $utf8)
        }
        Get-ChildItem (Join-Path $work 'gen') -Include '*.interp', '*.tokens' -Recurse |
            Copy-Item -Destination $out
    }
    finally {
        Remove-Item -Recurse -Force $work -ErrorAction SilentlyContinue
    }
}

$steps = foreach ($name in $Task) {
    if ($name -eq 'all') { 'restore', 'build', 'test', 'demo', 'pack' } else { $name }
}

try {
    foreach ($step in $steps) {
        switch ($step) {
            'restore' { Invoke-Restore }
            'build' { Invoke-Build }
            'test' { Invoke-Test }
            'demo' { Invoke-Demo }
            'pack' { Invoke-Pack }
            'parser' { Invoke-Parser }
        }
    }
}
catch {
    Write-Host "build.ps1: $($_.Exception.Message)" -ForegroundColor Red
    exit 1
}
Write-Host ''
Write-Host "build.ps1: done ($($steps -join ', '))." -ForegroundColor Green
exit 0
