@echo off
rem Opens JShell with the library on the class path and its public packages imported (Windows).
rem   jshell\frames-jshell.cmd                 interactive
rem   jshell\frames-jshell.cmd script.jsh      runs a script (end it with /exit to leave afterwards)
rem Needs a JDK 17+ and Maven 3.8+ on the PATH. The class path is cached in target\jshell\ at the
rem repository root; Maven runs only when the cache is missing, a class path entry is gone, or a
rem pom.xml, source or resource of a module is newer than it (FRAMES_JSHELL_REBUILD=1 forces a build).
setlocal EnableExtensions
set "ROOT=%~dp0.."
for %%I in ("%ROOT%") do set "ROOT=%%~fI"
set "CACHE=%ROOT%\target\jshell"
set "CPFILE=%CACHE%\classpath-windows.txt"
set "LOG=%CACHE%\build.log"

if defined FRAMES_JSHELL_REBUILD goto build
if not exist "%CPFILE%" goto build
powershell -NoProfile -NonInteractive -Command ^
  "$root='%ROOT%'; $cp=Get-Item '%CPFILE%'; $t=$cp.LastWriteTimeUtc;" ^
  "foreach ($e in (Get-Content $cp.FullName -Raw).Trim().Split(';')) { if ($e -and -not (Test-Path $e)) { exit 1 } }" ^
  "$new = Get-ChildItem -Path $root -Recurse -File -ErrorAction SilentlyContinue | Where-Object { $_.FullName -notmatch '\\(target|\.git)\\' -and ($_.Name -eq 'pom.xml' -or $_.FullName -match '\\src\\main\\') -and $_.LastWriteTimeUtc -gt $t } | Select-Object -First 1;" ^
  "if ($new) { exit 1 } else { exit 0 }"
if errorlevel 1 goto build
goto run

:build
if not exist "%CACHE%" mkdir "%CACHE%"
echo frames-jshell: building the library first (sources changed or no cached class path); log in %LOG% 1>&2
pushd "%ROOT%"
call mvn -B -Dstyle.color=never -DskipTests -Dmaven.javadoc.skip=true -Dmaven.source.skip=true -Dexec.skip=true package dependency:build-classpath -pl frames-examples -am "-Dmdep.outputFile=%CACHE%\dependencies.txt" -DincludeScope=runtime > "%LOG%" 2>&1
if errorlevel 1 goto failed
popd
rem for /f, not set /p: set /p reads at most 1024 characters, a class path can be longer
for /f "usebackq delims=" %%L in ("%CACHE%\dependencies.txt") do set "DEPS=%%L"
> "%CPFILE%" echo %DEPS%;%ROOT%\frames-examples\target\classes
echo frames-jshell: built; starting JShell 1>&2
goto run

:failed
popd
echo frames-jshell: the build failed; the errors from %LOG%: 1>&2
findstr /B /C:"[ERROR]" "%LOG%" 1>&2
exit /b 1

:run
for /f "usebackq delims=" %%L in ("%CPFILE%") do set "CP=%%L"
jshell -J-XX:TieredStopAtLevel=1 --class-path "%CP%" --startup DEFAULT --startup "%ROOT%\jshell\frames.jsh" %*
