@echo off
rem Nebulith launcher (Windows): runs nebulith.jar from the folder of this script.
rem Java: %JAVA_HOME%\bin\java.exe if set, else java on PATH. Extra JVM options: %NEBULITH_JAVA_OPTS%.
setlocal
set "NEBULITH_JAR=%~dp0nebulith.jar"
if not exist "%NEBULITH_JAR%" (
  echo nebulith: %NEBULITH_JAR% not found; the launcher must sit beside nebulith.jar 1>&2
  exit /b 1
)
set "NEBULITH_JAVA=java"
if defined JAVA_HOME if exist "%JAVA_HOME%\bin\java.exe" set "NEBULITH_JAVA=%JAVA_HOME%\bin\java.exe"
rem The brief single-run commands start faster with the quick compiler only (QuickStart.java says why;
rem keep the two lists equal). NEBULITH_JAVA_OPTS comes after it, so a user's setting wins.
rem The command is the first argument that is not an option, as Main reads it ('--quiet planet' too).
set "NEBULITH_QUICK="
set "NEBULITH_COMMAND="
call :command %*
for %%c in (point sequence planet interior measured) do if /i "%NEBULITH_COMMAND%"=="%%c" set "NEBULITH_QUICK=-XX:TieredStopAtLevel=1"
rem They also use the serial collector, unless the user's JVM options choose one (two collectors stop the JVM).
set "NEBULITH_GC="
if defined NEBULITH_QUICK set "NEBULITH_GC=-XX:+UseSerialGC"
set "NEBULITH_ALL_OPTS=x %NEBULITH_JAVA_OPTS% %JDK_JAVA_OPTIONS% %JAVA_TOOL_OPTIONS%"
if not "%NEBULITH_ALL_OPTS:GC=%"=="%NEBULITH_ALL_OPTS%" set "NEBULITH_GC="
"%NEBULITH_JAVA%" %NEBULITH_QUICK% %NEBULITH_GC% %NEBULITH_JAVA_OPTS% -jar "%NEBULITH_JAR%" %*
exit /b %ERRORLEVEL%

:command
if "%~1"=="" exit /b 0
set "NEBULITH_ARG=%~1"
if "%NEBULITH_ARG:~0,1%"=="-" (
  shift
  goto command
)
set "NEBULITH_COMMAND=%~1"
exit /b 0
