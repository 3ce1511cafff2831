@echo off
rem Starts Annalist on Windows: finds Java 17 or later (JAVA_HOME, then PATH), adds the start-up
rem settings of bin/annalist (see the README's "Start-up and memory") and ANNALIST_JAVA_OPTS after
rem them, and passes every argument through. Exits 2 when no suitable Java is found.
setlocal EnableExtensions DisableDelayedExpansion

set "ANNALIST_HOME=%~dp0.."
for %%i in ("%ANNALIST_HOME%") do set "ANNALIST_HOME=%%~fi"

if defined JAVA_HOME goto fromJavaHome
set "JAVA_EXE=java.exe"
where /q java.exe
if errorlevel 1 goto noJava
goto checkVersion

:fromJavaHome
set "JAVA_HOME=%JAVA_HOME:"=%"
set "JAVA_EXE=%JAVA_HOME%\bin\java.exe"
if exist "%JAVA_EXE%" goto checkVersion
echo annalist: JAVA_HOME is set to '%JAVA_HOME%', which holds no bin\java.exe 1>&2
goto installHint

:noJava
echo annalist: no Java found: JAVA_HOME is not set and there is no java.exe on PATH 1>&2
goto installHint

:checkVersion
set "JAVA_VERSION="
rem 'call' first: cmd /c strips the first and last quote of a command that starts with one and holds
rem a parenthesis or more than two quotes (C:\Program Files (x86)\...); after 'call' it keeps them
for /f "tokens=3" %%v in ('call "%JAVA_EXE%" -version 2^>^&1 ^| findstr /i version') do if not defined JAVA_VERSION set "JAVA_VERSION=%%~v"
set "JAVA_MAJOR="
for /f "tokens=1,2 delims=." %%a in ("%JAVA_VERSION%") do (
    if "%%a"=="1" (set "JAVA_MAJOR=%%b") else (set "JAVA_MAJOR=%%a")
)
for /f "delims=-+" %%m in ("%JAVA_MAJOR%") do set "JAVA_MAJOR=%%m"
if not defined JAVA_MAJOR goto tooOld
if %JAVA_MAJOR% GEQ 17 goto run

:tooOld
echo annalist: Annalist needs Java 17 or later; %JAVA_EXE% is version %JAVA_VERSION% 1>&2

:installHint
echo annalist: install a Java 17 (or later) runtime from your vendor, or set JAVA_HOME to one 1>&2
exit /b 2

:run
set "ANNALIST_DEFAULTS=-XX:TieredStopAtLevel=1 -XX:-UsePerfData -Xshare:auto -Xlog:cds*=off"
echo %ANNALIST_JAVA_OPTS% | findstr /r /c:"-XX:+Use[A-Za-z]*GC" >nul || set "ANNALIST_DEFAULTS=-XX:+UseSerialGC %ANNALIST_DEFAULTS%"
rem a batch starts its heap at 192 MB, all of it touched as it starts, so that its footprint does
rem not creep up with its length
set "ANNALIST_START_HEAP=-Xms64m"
if /i "%~1"=="batch" set "ANNALIST_START_HEAP=-Xms192m -XX:+AlwaysPreTouch"
rem a batch compiles methods at a tenth of the usual thresholds, so that its compiled code stops
rem growing early; a scaling of the user's own wins
set "ANNALIST_SCALING="
if /i "%~1"=="batch" set "ANNALIST_SCALING=-XX:CompileThresholdScaling=0.1"
echo %ANNALIST_JAVA_OPTS% | findstr /c:"CompileThresholdScaling" >nul && set "ANNALIST_SCALING="
echo %ANNALIST_JAVA_OPTS% | findstr /c:"-Xmx" /c:"MaxHeapSize" /c:"MaxRAM" >nul || set "ANNALIST_DEFAULTS=-Xmx640m %ANNALIST_START_HEAP% %ANNALIST_DEFAULTS%"
"%JAVA_EXE%" %ANNALIST_DEFAULTS% %ANNALIST_SCALING% "-Dannalist.home=%ANNALIST_HOME%" %ANNALIST_JAVA_OPTS% -cp "%ANNALIST_HOME%\lib\annalist.jar" org.annalist.cli.Main %*
exit /b %ERRORLEVEL%
